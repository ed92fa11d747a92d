/**
 * Formatting shared by the two loads calculators: quantities in the user's system, areas, the
 * verdict's tone and the grid of results (the rim calculator's speeds and chart axes are in
 * ./chart-format.ts). Formatting only; no physics.
 */
import { INCH } from "../../calc/core/constants.ts";
import type { ComponentChildren } from "preact";
import type { LoadVerdict } from "../../calc/loads/common.ts";
import { formatNumber, formatQuantity, type QuantityKind, type UnitSystem } from "../../calc/core/units.ts";

export const q = (value: number, kind: QuantityKind, system: UnitSystem) => formatQuantity(value, kind, { system }).text;

/** An area in mm² (metric) or in² (US). */
export function area(valueSI: number, system: UnitSystem): string {
  const inch = INCH;
  return system === "us" ? `${formatNumber(valueSI / (inch * inch))} in²` : `${formatNumber(valueSI * 1e6)} mm²`;
}

export const VERDICT_TONE: Record<LoadVerdict, "ok" | "warn" | "bad"> = { holds: "ok", marginal: "warn", fails: "bad" };

/** The verdict rule in words: "fails below 1, marginal below 2, holds at 2 or more". */
export function verdictRule(failBelow: number, marginalBelow: number): string {
  const f = String(Number(failBelow.toPrecision(4)));
  const m = String(Number(marginalBelow.toPrecision(4)));
  return `fails below ${f}, marginal from ${f} to below ${m}, holds at ${m} or more`;
}

/** The results grid: one [label, data-out key, formatted value] per row. */
export function Outputs({ rows }: { rows: readonly (readonly [ComponentChildren, string, string])[] }) {
  return (
    <dl class="results-grid">
      {rows.map(([label, key, value]) => (
        <div key={key}>
          <dt>{label}</dt>
          <dd data-out={key}>{value}</dd>
        </div>
      ))}
    </dl>
  );
}
