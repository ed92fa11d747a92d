/**
 * A small SVG line chart: tick values from d3-array (the same "nice numbers" tick algorithm d3's
 * scales use, at 1.3 KB instead of d3-scale's 11 KB with colour interpolation), any number of series, horizontal
 * and vertical reference lines, and shaded bands. Renders on the server too. It carries a text
 * summary for screen readers; the numbers themselves are in the results beside it.
 */
import { ticks } from "d3-array";

/** A linear map from a domain to a pixel range, with its tick values. */
function linear(domain: readonly [number, number], range: readonly [number, number]) {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = d1 - d0 || 1;
  const map = (value: number) => r0 + ((value - d0) / span) * (r1 - r0);
  map.ticks = (count: number) => ticks(d0, d1, count);
  return map;
}

export interface ChartSeries {
  label: string;
  points: readonly (readonly [number, number])[];
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
  series: readonly ChartSeries[];
  hLines?: readonly ChartLine[];
  vLines?: readonly ChartLine[];
  /** Horizontal bands (y ranges), drawn under everything else. */
  hBands?: readonly ChartBand[];
  width?: number;
  height?: number;
}

const MARGIN = { top: 12, right: 16, bottom: 44, left: 56 };

function tickText(value: number): string {
  const abs = Math.abs(value);
  if (abs === 0) return "0";
  if (abs >= 1e5 || abs < 1e-3) return value.toExponential(0);
  return String(Number(value.toPrecision(4)));
}

export function Chart({ title, summary, xLabel, yLabel, xDomain, yDomain, series, hLines = [], vLines = [], hBands = [], width = 640, height = 320 }: ChartProps) {
  const x = linear(xDomain, [MARGIN.left, width - MARGIN.right]);
  const y = linear(yDomain, [height - MARGIN.bottom, MARGIN.top]);
  const clipId = `clip-${title.replace(/[^a-z0-9]/gi, "").slice(0, 24)}`;
  const path = (points: ChartSeries["points"]) =>
    points.map(([px, py], i) => `${i === 0 ? "M" : "L"}${x(px).toFixed(1)},${y(py).toFixed(1)}`).join("");
  return (
    <figure class="chart">
      <svg viewBox={`0 0 ${width} ${height}`} role="img" aria-label={`${title}. ${summary}`} preserveAspectRatio="xMidYMid meet">
        <defs>
          <clipPath id={clipId}>
            <rect x={MARGIN.left} y={MARGIN.top} width={width - MARGIN.left - MARGIN.right} height={height - MARGIN.top - MARGIN.bottom} />
          </clipPath>
        </defs>
        <g clip-path={`url(#${clipId})`}>
          {hBands.map((band) => (
            <rect key={band.label} class={band.className} x={MARGIN.left} width={width - MARGIN.left - MARGIN.right} y={y(Math.min(band.to, yDomain[1]))} height={Math.max(0, y(Math.max(band.from, yDomain[0])) - y(Math.min(band.to, yDomain[1])))} />
          ))}
        </g>
        <g class="chart-grid" aria-hidden="true">
          {y.ticks(6).map((t) => (
            <g key={`y${t}`}>
              <line x1={MARGIN.left} x2={width - MARGIN.right} y1={y(t)} y2={y(t)} />
              <text x={MARGIN.left - 6} y={y(t)} dy="0.32em" text-anchor="end">{tickText(t)}</text>
            </g>
          ))}
          {x.ticks(6).map((t) => (
            <g key={`x${t}`}>
              <line x1={x(t)} x2={x(t)} y1={MARGIN.top} y2={height - MARGIN.bottom} />
              <text x={x(t)} y={height - MARGIN.bottom + 16} text-anchor="middle">{tickText(t)}</text>
            </g>
          ))}
          <text class="chart-axis-label" x={(MARGIN.left + width - MARGIN.right) / 2} y={height - 6} text-anchor="middle">{xLabel}</text>
          <text class="chart-axis-label" transform={`translate(14 ${(MARGIN.top + height - MARGIN.bottom) / 2}) rotate(-90)`} text-anchor="middle">{yLabel}</text>
        </g>
        <g clip-path={`url(#${clipId})`} aria-hidden="true">
          {hLines.map((line) => (
            <line key={line.label} class={line.className} x1={MARGIN.left} x2={width - MARGIN.right} y1={y(line.value)} y2={y(line.value)} />
          ))}
          {vLines.map((line) => (
            <line key={line.label} class={line.className} x1={x(line.value)} x2={x(line.value)} y1={MARGIN.top} y2={height - MARGIN.bottom} />
          ))}
          {series.map((s) => (
            <path key={s.label} class={s.className} d={path(s.points)} fill="none" />
          ))}
        </g>
      </svg>
      <figcaption>
        <ul class="chart-legend">
          {hBands.map((b) => (<li key={b.label}><span class={`swatch ${b.className}`} aria-hidden="true" />{b.label}</li>))}
          {series.map((s) => (<li key={s.label}><span class={`swatch ${s.className}`} aria-hidden="true" />{s.label}</li>))}
          {hLines.map((l) => (<li key={l.label}><span class={`swatch ${l.className}`} aria-hidden="true" />{l.label}</li>))}
          {vLines.map((l) => (<li key={l.label}><span class={`swatch ${l.className}`} aria-hidden="true" />{l.label}</li>))}
        </ul>
      </figcaption>
    </figure>
  );
}
