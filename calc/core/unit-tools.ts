/**
 * Unit helpers only some pages need, kept apart from calc/core/units.ts so that the code every
 * calculator page shares does not carry them: converting between two units, checking a unit id of a
 * kind (the calibration file's columns).
 */
import { CalcInputError } from "./errors.ts";
import { fromSI, kindName, type QuantityKind, toSI, type UnitId, unitsOfKind, unitDef, lookupUnit } from "./units.ts";

/** Converts between two units of the same kind. */
export function convert(value: number, from: UnitId, to: UnitId): number {
  const si = toSI(value, from); // a CalcInputError naming "from" for an unknown unit
  const kind = unitDef(from).kind;
  const target = lookupUnit(to);
  // An unknown unit gets fromSI's own refusal ("to must be one of …"); a known one of another kind this.
  if (target && target.kind !== kind) throw new CalcInputError({ param: "to", value: to, expected: `a unit of ${kindName(kind)}, as ${from} is`, unit: "" });
  return fromSI(si, to);
}

/**
 * Checks that `unit` is a known unit id of `kind`; throws a CalcInputError naming `param` otherwise.
 *
 * @param param the input's name, for the message
 * @param unit a unit id (untrusted)
 * @param kind the quantity kind the unit must measure
 * @returns the unit id, typed
 */
export function requireUnitOfKind(param: string, unit: unknown, kind: QuantityKind): UnitId {
  const def = lookupUnit(unit);
  if (!def || def.kind !== kind) {
    throw new CalcInputError({ param, value: String(unit), expected: `a unit of ${kindName(kind)} (${unitsOfKind(kind).join(", ")})`, unit: "" });
  }
  return unit as UnitId;
}
