/**
 * Mounting points as people type them and links carry them: "55, 0; 0, 55" (x, y pairs in the
 * length unit of the unit system, or with units), read with the same field reader as every input.
 */
import { readField, type InputSpec } from "../core/inputs.ts";
import { quantityToText, type UnitSystem } from "../core/units.ts";
import type { MountingPoint } from "./counterweight.ts";

/** Most mounting points a layout holds. */
export const MAX_MOUNTING_POINTS = 20;

/** One coordinate of a mounting point, declared like any input. */
const COORDINATE: InputSpec = { label: "Coordinate", kind: "length", min: -2, max: 2, default: 0, urlKey: "", unit: { metric: "mm", us: "in" } };

/**
 * Reads "55, 0; 0, 55" into mounting points (SI). A bare number is in mm (metric) or inches (US).
 *
 * @param text the typed or linked text
 * @param system the unit system bare numbers are read in
 * @returns the points, or null with the reason to show beside the field
 *
 * Sources: none (a text format of our own).
 */
export function readMountingPoints(text: string, system: UnitSystem): { points: MountingPoint[] | null; error: string | null } {
  const items = text.split(";").filter((item) => item.trim() !== "");
  if (items.length === 0 || items.length > MAX_MOUNTING_POINTS) {
    return { points: null, error: `Enter 1 to ${MAX_MOUNTING_POINTS} points, as x, y pairs separated by semicolons.` };
  }
  const points: MountingPoint[] = [];
  for (const [i, item] of items.entries()) {
    const xy = item.split(",");
    const read = xy.map((t) => readField(COORDINATE, t, system));
    const bad = read.find((r) => !r.ok);
    if (xy.length !== 2 || bad) {
      return {
        points: null,
        error: `Point ${i + 1} must be two coordinates, x and y, separated by a comma${bad && !bad.ok ? ` (${bad.error.message})` : ""}.`,
      };
    }
    points.push({ x: (read[0] as { value: number }).value, y: (read[1] as { value: number }).value });
  }
  return { points, error: null };
}

/**
 * Writes mounting points as text that `readMountingPoints` reads back exactly: "55mm,0mm;0mm,55mm".
 *
 * @param points the points [m]
 * @param system the unit system (mm or inches)
 * @returns the text, without spaces
 *
 * Sources: none (a text format of our own).
 */
export function writeMountingPoints(points: readonly MountingPoint[], system: UnitSystem): string {
  const unit = system === "us" ? "in" : "mm";
  return points.map((p) => `${quantityToText(p.x, unit)},${quantityToText(p.y, unit)}`).join(";");
}
