/**
 * Formatting the rim calculator needs and the fastener calculator does not: speeds in rpm and the
 * units of a chart axis. Formatting and conversion only; no physics.
 */
import { displayUnit, formatNumber, fromSI, radPerSecondToRpm, type QuantityKind, type UnitSystem, unitDef } from "../../calc/core/units.ts";

export const rpm = (angularSpeed: number) => `${formatNumber(radPerSecondToRpm(angularSpeed))} rpm`;

/** The unit symbol and converter for an axis of `kind` in `system`. */
export function axis(kind: QuantityKind, system: UnitSystem): { symbol: string; of: (valueSI: number) => number } {
  const unit = displayUnit(kind, system);
  return { symbol: unitDef(unit).symbol, of: (valueSI: number) => fromSI(valueSI, unit) };
}
