/**
 * Formatting for the spin-up calculator: quantities in the user's unit system, speeds in rpm to
 * four figures, the regimes in words. No DOM.
 */
import type { SpinUpRegime } from "../../calc/drivetrain/results.ts";
import { fieldUnit, type InputSpec } from "../../calc/core/inputs.ts";
import { formatNumber, formatQuantity, fromSI, type QuantityKind, type UnitSystem, unitDef } from "../../calc/core/units.ts";

/** A quantity in the user's system: "1.01 s", "345 J", "62.8 m/s". */
export const fmt = (valueSI: number, kind: QuantityKind, system: UnitSystem, significant = 3): string =>
  formatQuantity(valueSI, kind, { system, significant }).text;

/** A time, with the start of a run written plainly: "0 s", "763 ms", "1.01 s". */
export const seconds = (valueSI: number): string => (valueSI === 0 ? "0 s" : formatQuantity(valueSI, "time").text);

/** A speed in rpm to four figures: "10000 rpm". */
export const rpm = (valueSI: number): string => formatQuantity(valueSI, "angularSpeed", { unit: "rpm", significant: 4 }).text;

/** A current: "60.0 A". */
export const amps = (valueSI: number): string => formatQuantity(valueSI, "current", { unit: "A" }).text;

/** A charge in mAh (3.6 C = 1 mAh exactly): "125 mAh". */
export const mAh = (coulombs: number): string => `${formatNumber(coulombs / 3.6)} mAh`;

/** A label inside a sentence: only its first letter lowered, so "Motor Kv" reads "motor Kv" and "Cells in series (S)" keeps its S. */
export const inSentence = (label: string): string => label.charAt(0).toLowerCase() + label.slice(1);

/** A share in per cent: "12.7 %". */
export const percent = (fraction: number): string => `${formatNumber(fraction * 100)} %`;

/** How each regime reads in results and legends. */
export const REGIME_TEXT: Record<SpinUpRegime, string> = {
  "current-limit": "Current limit: the controller caps each motor's current, so the torque is constant",
  voltage: "Voltage: back-EMF sets the current, which falls as the speed rises",
  traction: "Traction: the wheels slip, so grip sets the pace",
  stalled: "Stalled: friction holds the drive at rest",
};

/** Short regime names for the strip's legend. */
export const REGIME_NAME: Record<SpinUpRegime, string> = {
  "current-limit": "Current limit",
  voltage: "Voltage (back-EMF)",
  traction: "Traction (wheels slip)",
  stalled: "Stalled",
};

/** An SI value as field text in the field's unit for `system`: "2", "45 mm". */
export function textFor(spec: InputSpec, valueSI: number, system: UnitSystem, digits = 6): string {
  const unit = fieldUnit(spec, system);
  const n = Number(fromSI(valueSI, unit).toPrecision(digits));
  const symbol = unitDef(unit).symbol;
  return symbol ? `${n} ${symbol}` : String(n);
}
