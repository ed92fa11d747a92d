/**
 * Formatting shared by the heading calculators: drift rates in °/s and angles in degrees (the
 * units builders trim and steer in, whatever the unit system), signed where the sign matters.
 */
import { formatQuantity, type QuantityKind, type UnitId, type UnitSystem } from "../../calc/core/units.ts";

function signedText(valueSI: number, kind: QuantityKind, unit: UnitId, signed: boolean): string {
  const text = formatQuantity(valueSI, kind, { unit }).text;
  return signed && valueSI > 0 ? `+${text}` : text;
}

/** "+12.3 °/s" / "−4.50 °/s"; "12.3 °/s" for the size alone (`signed: false`). */
export const degPerSecond = (valueSI: number, signed = true) => signedText(signed ? valueSI : Math.abs(valueSI), "angularSpeed", "deg/s", signed);

/** "+10.4°" / "−7.58°"; "7.58°" for the size alone (`signed: false`). */
export const degrees = (valueSI: number, signed = true) => signedText(signed ? valueSI : Math.abs(valueSI), "angle", "deg", signed);

/** A quantity in the user's unit system. */
export const inSystem = (valueSI: number, kind: QuantityKind, system: UnitSystem, significant = 3) =>
  formatQuantity(valueSI, kind, { system, significant }).text;

/** A plain number as typed, up to 4 significant figures, no padding zeros: "3.5", "95", "99.9". */
export const plain = (value: number) => String(Number(value.toPrecision(4)));
