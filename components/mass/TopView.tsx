/**
 * The layout seen from above, to scale: every part's outline, the geometric centre, the centre of
 * mass, the sensor and the proposed counterweight, with a scale bar and a text summary. Geometry
 * comes from calc/ (layoutDrawing); this only maps metres to the picture.
 */
import type { LayoutDrawing, Point2 } from "../../calc/mass/drawing.ts";
import { formatQuantity, type UnitSystem } from "../../calc/core/units.ts";

export interface TopViewProps {
  drawing: LayoutDrawing;
  /** Sensor position [m]. */
  sensor: Point2;
  /** Proposed counterweight position [m], if any. */
  counterweight: Point2 | null;
  /** One or two sentences describing the picture (also its accessible name). */
  summary: string;
  system: UnitSystem;
}

const SIZE = 320;

export function TopView({ drawing, sensor, counterweight, summary, system }: TopViewProps) {
  const { minX, minY, maxX, maxY } = drawing.bounds;
  const xs = [minX, maxX, sensor[0], ...(counterweight ? [counterweight[0]] : [])];
  const ys = [minY, maxY, sensor[1], ...(counterweight ? [counterweight[1]] : [])];
  const x0 = Math.min(...xs);
  const y1 = Math.max(...ys);
  const span = Math.max(Math.max(...xs) - x0, y1 - Math.min(...ys), 0.01) * 1.12;
  const k = SIZE / span;
  // Centre the drawing: shift by half the unused span on each axis.
  const dx = (span - (Math.max(...xs) - x0)) / 2;
  const dy = (span - (y1 - Math.min(...ys))) / 2;
  const r = (v: number) => Math.round(v * 10) / 10;
  const X = (x: number) => r((x - x0 + dx) * k);
  const Y = (y: number) => r((y1 + dy - y) * k);
  const circle = (cx: number, cy: number, radius: number) => {
    const R = r(radius * k);
    return `M${r(X(cx) - R)},${Y(cy)}a${R},${R} 0 1 0 ${r(2 * R)},0a${R},${R} 0 1 0 ${r(-2 * R)},0Z`;
  };
  // Scale bar: 1, 2 or 5 × 10ⁿ display units, at most a third of the span.
  const unitSI = system === "us" ? 0.0254 : 0.001;
  const third = span / 3 / unitSI;
  const p = 10 ** Math.floor(Math.log10(third));
  const bar = (third / p >= 5 ? 5 : third / p >= 2 ? 2 : 1) * p * unitSI;
  const mark = (point: Point2, cls: string, d: (x: number, y: number) => string) => (
    <path class={cls} d={d(X(point[0]), Y(point[1])).replace(/\d+\.\d{2,}/g, (n) => String(r(Number(n))))} />
  );
  return (
    <figure class="mass-top">
      <svg viewBox={`0 0 ${SIZE} ${SIZE + 28}`} role="img" aria-label={`Top view of the layout, to scale. ${summary}`}>
        {drawing.outlines.map(({ index, outline: o }) => {
          const [cx, cy] = o.centre;
          switch (o.kind) {
            case "circle":
            case "hoop":
              return <path key={index} class={`mv-part${o.kind === "hoop" ? " mv-hoop" : ""}`} d={circle(cx, cy, o.radius)} />;
            case "annulus":
              return (
                <path
                  key={index}
                  class="mv-part mv-fill"
                  fill-rule="evenodd"
                  d={circle(cx, cy, o.outerRadius) + (o.innerRadius > 0 ? circle(cx, cy, o.innerRadius) : "")}
                />
              );
            case "polygon":
              return <path key={index} class="mv-part mv-fill" d={`M${o.corners.map(([x, y]) => `${X(x)},${Y(y)}`).join("L")}Z`} />;
            case "segment":
              return <path key={index} class="mv-part mv-hoop" d={`M${X(o.from[0])},${Y(o.from[1])}L${X(o.to[0])},${Y(o.to[1])}`} />;
            default:
              return <path key={index} class="mv-dot" d={circle(cx, cy, 2.5 / k)} />;
          }
        })}
        {counterweight ? mark(counterweight, "mv-cw", (x, y) => `M${x - 7},${y}a7,7 0 1 0 14,0a7,7 0 1 0 -14,0Z`) : null}
        {mark(drawing.geometricCentre, "mv-geo", (x, y) => `M${x - 9},${y}h18M${x},${y - 9}v18`)}
        {mark(drawing.centreOfMass, "mv-com", (x, y) => `M${x - 4.5},${y}a4.5,4.5 0 1 0 9,0a4.5,4.5 0 1 0 -9,0Z`)}
        {mark(sensor, "mv-sensor", (x, y) => `M${x},${y - 7}l7,7-7,7-7-7Z`)}
        <path class="mv-bar" d={`M8,${SIZE + 14}h${r(bar * k)}`} />
        <text class="mv-text" x={r(bar * k + 14)} y={SIZE + 19}>
          {formatQuantity(bar, "length", { system, significant: 1 }).text}
        </text>
      </svg>
      <figcaption>
        <ul class="mass-key">
          <li>
            <span class="mv-key-geo" aria-hidden="true">
              +
            </span>{" "}
            geometric centre
          </li>
          <li>
            <span class="mv-key-com" aria-hidden="true">
              ●
            </span>{" "}
            centre of mass
          </li>
          <li>
            <span class="mv-key-sensor" aria-hidden="true">
              ◆
            </span>{" "}
            sensor
          </li>
          <li>
            <span class="mv-key-cw" aria-hidden="true">
              ◌
            </span>{" "}
            counterweight
          </li>
        </ul>
        {summary}
      </figcaption>
    </figure>
  );
}
