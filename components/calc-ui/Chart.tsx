/**
 * A small SVG chart: tick values from d3-array (the same "nice numbers" tick algorithm d3's
 * scales use, at 1.3 KB instead of d3-scale's 11 KB with colour interpolation), any number of
 * line series and of dot series (readings, residuals), horizontal and vertical reference lines,
 * shaded bands, and an optional logarithmic x axis.
 * Renders on the server too, 640 units wide; in the browser it redraws at the width it is shown
 * at when that is narrower (a phone), so its text keeps its CSS size (12–13 px) instead of shrinking
 * with the drawing (`useDrawWidth`, which a strip drawn beside a chart uses to line up with it). It carries a text summary for screen readers; the numbers themselves are in
 * the results beside it.
 */
import { ticks } from "d3-array";
import { useEffect, useMemo } from "preact/hooks";
import { signal } from "./reactive.ts";

type Point = readonly [number, number];

export interface ChartSeries {
  label: string;
  points: readonly Point[];
  className: string;
}
export interface ChartLine {
  value: number;
  label: string;
  className: string;
}
export interface ChartBand {
  from: number;
  to: number;
  label: string;
  className: string;
}

export interface ChartProps {
  title: string;
  /** One or two sentences read by screen readers in place of the picture. */
  summary: string;
  xLabel: string;
  yLabel: string;
  xDomain: readonly [number, number];
  yDomain: readonly [number, number];
  /** Logarithmic x axis (the domain must be above 0); give its tick values in `xTicks`. */
  xLog?: boolean;
  /** Tick values of the x axis, instead of d3's nice numbers. */
  xTicks?: readonly number[];
  /** Series drawn as lines. */
  series?: readonly ChartSeries[];
  /** Series drawn as dots. */
  dots?: readonly ChartSeries[];
  hLines?: readonly ChartLine[];
  vLines?: readonly ChartLine[];
  /** Horizontal bands (y ranges), drawn under everything else. */
  hBands?: readonly ChartBand[];
  width?: number;
  height?: number;
}

/**
 * The width to draw a figure at: the width it is shown at when that is narrower than `drawn` (one
 * unit = one CSS pixel, so text keeps its size on a phone), else `drawn`; `drawn` on the server and
 * until the figure is measured. Figures drawn side by side with the same `drawn` and margins line up.
 * Returns the width and the ref to put on the figure's element.
 */
export function useDrawWidth(drawn: number): [number, (el: HTMLElement | null) => void] {
  const view = useMemo(() => ({ shown: signal(0), el: null as HTMLElement | null }), []);
  useEffect(() => {
    const el = view.el;
    if (!el || typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver(() => {
      view.shown.value = Math.round(el.clientWidth);
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [view]);
  const shown = view.shown.value;
  return [
    shown > 0 && shown < drawn ? shown : drawn,
    (el) => {
      view.el = el;
    },
  ];
}

/** A map from a domain to a pixel range, linear or in log10, to 0.1 px (finer is invisible and only bloats the markup). */
function scale(domain: readonly [number, number], range: readonly [number, number], log = false) {
  const t = log ? Math.log10 : (v: number) => v;
  const d0 = t(domain[0]);
  const span = t(domain[1]) - d0 || 1;
  return (v: number) => Math.round((range[0] + ((t(v) - d0) / span) * (range[1] - range[0])) * 10) / 10;
}

function tickText(value: number): string {
  const abs = Math.abs(value);
  if (abs === 0) return "0";
  if (abs >= 1e5 || abs < 1e-3) return value.toExponential(0);
  return String(Number(value.toPrecision(4)));
}

export function Chart(props: ChartProps) {
  const {
    title,
    summary,
    xLabel,
    yLabel,
    xDomain,
    yDomain,
    xLog = false,
    xTicks,
    series = [],
    dots = [],
    hLines = [],
    vLines = [],
    hBands = [],
    width: drawn = 640,
    height: tall = 320,
  } = props;
  // Narrower than drawn: a little taller than the drawing's proportion so the plot keeps some height.
  const [width, ref] = useDrawWidth(drawn);
  const height = width === drawn ? tall : Math.round(Math.max(220, tall * (width / drawn) * 1.3));
  const m = { top: 12, right: 16, bottom: 44, left: 56 };
  const x = scale(xDomain, [m.left, width - m.right], xLog);
  const y = scale(yDomain, [height - m.bottom, m.top]);
  const clipId = `clip-${title.replace(/[^a-z0-9]/gi, "").slice(0, 24)}`;
  const path = (s: ChartSeries) => s.points.map(([px, py], i) => `${i === 0 ? "M" : "L"}${x(px)},${y(py)}`).join("");
  const plotW = width - m.left - m.right;
  const bottom = height - m.bottom;
  const legend = [...hBands, ...series, ...dots.map((d) => ({ ...d, className: `${d.className} swatch-dot` })), ...hLines, ...vLines];
  return (
    <figure class="chart" ref={ref}>
      <svg viewBox={`0 0 ${width} ${height}`} role="img" aria-label={`${title}. ${summary}`} preserveAspectRatio="xMidYMid meet">
        <defs>
          <clipPath id={clipId}>
            <rect x={m.left} y={m.top} width={plotW} height={bottom - m.top} />
          </clipPath>
        </defs>
        <g clip-path={`url(#${clipId})`} aria-hidden="true">
          {hBands.map((b) => {
            const top = y(Math.min(b.to, yDomain[1]));
            return <rect key={b.label} class={b.className} x={m.left} width={plotW} y={top} height={Math.max(0, y(Math.max(b.from, yDomain[0])) - top)} />;
          })}
        </g>
        <g class="chart-grid" aria-hidden="true">
          {ticks(yDomain[0], yDomain[1], 6).map((t) => (
            <g key={`y${t}`}>
              <line x1={m.left} x2={width - m.right} y1={y(t)} y2={y(t)} />
              <text x={m.left - 6} y={y(t)} dy="0.32em" text-anchor="end">
                {tickText(t)}
              </text>
            </g>
          ))}
          {(xTicks ?? ticks(xDomain[0], xDomain[1], Math.min(6, Math.floor(plotW / 70)))).map((t) => (
            <g key={`x${t}`}>
              <line x1={x(t)} x2={x(t)} y1={m.top} y2={bottom} />
              <text x={x(t)} y={bottom + 16} text-anchor="middle">
                {tickText(t)}
              </text>
            </g>
          ))}
          <text class="chart-axis-label" x={(m.left + width - m.right) / 2} y={height - 6} text-anchor="middle">
            {xLabel}
          </text>
          <text class="chart-axis-label" transform={`translate(14 ${(m.top + bottom) / 2}) rotate(-90)`} text-anchor="middle">
            {yLabel}
          </text>
        </g>
        <g clip-path={`url(#${clipId})`} aria-hidden="true">
          {hLines.map((l) => (
            <line key={l.label} class={l.className} x1={m.left} x2={width - m.right} y1={y(l.value)} y2={y(l.value)} />
          ))}
          {vLines.map((l) => (
            <line key={l.label} class={l.className} x1={x(l.value)} x2={x(l.value)} y1={m.top} y2={bottom} />
          ))}
          {series.map((s) => (
            <path key={s.label} class={s.className} d={path(s)} fill="none" />
          ))}
          {dots.map((s) => (
            <g key={s.label} class={s.className}>
              {s.points.map(([px, py], i) => (
                <circle key={i} cx={x(px)} cy={y(py)} r="5" />
              ))}
            </g>
          ))}
        </g>
      </svg>
      <figcaption>
        <ul class="chart-legend">
          {legend.map((item) => (
            <li key={item.label}>
              <span class={`swatch ${item.className}`} aria-hidden="true" />
              {item.label}
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
