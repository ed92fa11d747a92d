/**
 * A small SVG chart: tick values from d3-array (the same "nice numbers" tick algorithm d3's
 * scales use, at 1.3 KB instead of d3-scale's 11 KB with colour interpolation), any number of
 * line series and of dot series (readings, residuals), horizontal and vertical reference lines,
 * shaded bands, an optional logarithmic x axis and an optional second y axis on the right.
 * Renders on the server too. It carries a text summary for screen readers; the numbers
 * themselves are in the results beside it.
 */
import { ticks } from "d3-array";

type Point = readonly [number, number];

export interface ChartSeries {
  label: string;
  points: readonly Point[];
  className: string;
  /** Plot against the right-hand axis. */
  right?: boolean;
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
  /** Label of the right-hand axis; the axis is drawn only with `y2Domain`. */
  y2Label?: string;
  xDomain: readonly [number, number];
  yDomain: readonly [number, number];
  y2Domain?: readonly [number, number];
  /** Logarithmic x axis (the domain must be above 0). */
  xLog?: boolean;
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

/** A map from a domain to a pixel range, linear or in log10. */
function scale(domain: readonly [number, number], range: readonly [number, number], log = false) {
  const t = log ? Math.log10 : (v: number) => v;
  const d0 = t(domain[0]);
  const span = t(domain[1]) - d0 || 1;
  return (v: number) => range[0] + ((t(v) - d0) / span) * (range[1] - range[0]);
}

/** Tick values: d3's nice numbers, or 1-2-5 steps per decade on a log axis. */
function tickValues(domain: readonly [number, number], log: boolean, count: number): number[] {
  if (!log) return ticks(domain[0], domain[1], count);
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(domain[0])); e <= Math.ceil(Math.log10(domain[1])); e++) {
    for (const m of [1, 2, 5]) {
      const v = Number((m * 10 ** e).toPrecision(3));
      if (v >= domain[0] * (1 - 1e-9) && v <= domain[1] * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

function tickText(value: number): string {
  const abs = Math.abs(value);
  if (abs === 0) return "0";
  if (abs >= 1e5 || abs < 1e-3) return value.toExponential(0);
  return String(Number(value.toPrecision(4)));
}

export function Chart(props: ChartProps) {
  const { title, summary, xLabel, yLabel, y2Label, xDomain, yDomain, y2Domain, xLog = false, series = [], dots = [], hLines = [], vLines = [], hBands = [], width = 640, height = 320 } = props;
  const m = { top: 12, right: y2Domain ? 56 : 16, bottom: 44, left: 56 };
  const x = scale(xDomain, [m.left, width - m.right], xLog);
  const y = scale(yDomain, [height - m.bottom, m.top]);
  const y2 = y2Domain ? scale(y2Domain, [height - m.bottom, m.top]) : y;
  const yOf = (s: ChartSeries) => (s.right ? y2 : y);
  const clipId = `clip-${title.replace(/[^a-z0-9]/gi, "").slice(0, 24)}`;
  const path = (s: ChartSeries) => s.points.map(([px, py], i) => `${i === 0 ? "M" : "L"}${x(px).toFixed(1)},${yOf(s)(py).toFixed(1)}`).join("");
  const plotW = width - m.left - m.right;
  const bottom = height - m.bottom;
  const legend = [...hBands, ...series, ...dots.map((d) => ({ ...d, className: `${d.className} swatch-dot` })), ...hLines, ...vLines];
  return (
    <figure class="chart">
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
          {tickValues(yDomain, false, 6).map((t) => (
            <g key={`y${t}`}>
              <line x1={m.left} x2={width - m.right} y1={y(t)} y2={y(t)} />
              <text x={m.left - 6} y={y(t)} dy="0.32em" text-anchor="end">{tickText(t)}</text>
            </g>
          ))}
          {y2Domain
            ? tickValues(y2Domain, false, 6).map((t) => (
                <text key={`r${t}`} x={width - m.right + 6} y={y2(t)} dy="0.32em">{tickText(t)}</text>
              ))
            : null}
          {tickValues(xDomain, xLog, 6).map((t) => (
            <g key={`x${t}`}>
              <line x1={x(t)} x2={x(t)} y1={m.top} y2={bottom} />
              <text x={x(t)} y={bottom + 16} text-anchor="middle">{tickText(t)}</text>
            </g>
          ))}
          <text class="chart-axis-label" x={(m.left + width - m.right) / 2} y={height - 6} text-anchor="middle">{xLabel}</text>
          <text class="chart-axis-label" transform={`translate(14 ${(m.top + bottom) / 2}) rotate(-90)`} text-anchor="middle">{yLabel}</text>
          {y2Domain && y2Label ? (
            <text class="chart-axis-label" transform={`translate(${width - 8} ${(m.top + bottom) / 2}) rotate(90)`} text-anchor="middle">{y2Label}</text>
          ) : null}
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
                <circle key={i} cx={x(px).toFixed(1)} cy={yOf(s)(py).toFixed(1)} r="5" />
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
