/**
 * Editing a parts list: pure helpers that each return a new array (add, duplicate, remove, move,
 * mirror), so the calculator's undo and the design file never share a mutable list.
 */
import { CalcInputError } from "../core/errors.ts";

import { type LayoutPart, MAX_NAME_LENGTH, type PartShape, checkPart } from "./parts.ts";
import { requireList } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// Editing the parts list: pure helpers, each returning a new array.

function requireIndex(param: string, index: number, length: number, allowEnd = false): number {
  const max = allowEnd ? length : length - 1;
  if (!Number.isInteger(index) || index < 0 || index > max) {
    throw new CalcInputError({ param, value: index, expected: max < 0 ? "an index into a non-empty list" : `a whole number from 0 to ${max}`, unit: "" });
  }
  return index;
}

/**
 * A part's name with a suffix such as " (copy)", the name shortened so that the whole stays within
 * `MAX_NAME_LENGTH` characters and the suffix always shows: a copy never takes its original's name.
 *
 * @param name the original name
 * @param suffix what to add, at most `MAX_NAME_LENGTH` characters
 * @returns the new name, at most `MAX_NAME_LENGTH` characters
 *
 * @example
 * suffixedName("washer", " (copy)") // → "washer (copy)"
 * Sources: none (list bookkeeping, no formula).
 */
export function suffixedName(name: string, suffix: string): string {
  if (typeof name !== "string") throw new CalcInputError({ param: "name", value: String(name), expected: "text", unit: "" });
  if (typeof suffix !== "string" || suffix.length > MAX_NAME_LENGTH) {
    throw new CalcInputError({ param: "suffix", value: String(suffix), expected: `text of at most ${MAX_NAME_LENGTH} characters`, unit: "" });
  }
  return `${name.slice(0, MAX_NAME_LENGTH - suffix.length)}${suffix}`;
}

/**
 * Adds a part at `index` (default: the end). Pure: returns a new list.
 *
 * @param parts the list
 * @param part the new part (checked)
 * @param index where it goes, 0 … parts.length
 * @returns the new list
 *
 * Sources: none (list bookkeeping, no formula).
 */
export function addPart(parts: readonly LayoutPart[], part: LayoutPart, index?: number): LayoutPart[] {
  requireList(parts, "parts");
  checkPart(part);
  const at = index ?? parts.length;
  requireIndex("index", at, parts.length, true);
  return [...parts.slice(0, at), part, ...parts.slice(at)];
}

/**
 * Inserts a copy of the part at `index` right after it, its name marked "(copy)".
 *
 * @param parts the list
 * @param index the part to copy
 * @returns the new list
 *
 * Sources: none (list bookkeeping, no formula).
 */
export function duplicatePart(parts: readonly LayoutPart[], index: number): LayoutPart[] {
  requireIndex("index", index, requireList(parts, "parts").length);
  const original = parts[index]!;
  checkPart(original, `parts[${index}]`);
  const name = suffixedName(original.name, " (copy)");
  return [...parts.slice(0, index + 1), { ...original, name }, ...parts.slice(index + 1)];
}

/**
 * Removes the part at `index`.
 *
 * @param parts the list
 * @param index the part to remove
 * @returns the new list
 *
 * Sources: none (list bookkeeping, no formula).
 */
export function removePart(parts: readonly LayoutPart[], index: number): LayoutPart[] {
  requireIndex("index", index, requireList(parts, "parts").length);
  return [...parts.slice(0, index), ...parts.slice(index + 1)];
}

/**
 * Moves the part at `from` so that it ends up at index `to`.
 *
 * @param parts the list
 * @param from index of the part to move
 * @param to index it ends up at
 * @returns the new list
 *
 * Sources: none (list bookkeeping, no formula).
 */
export function movePart(parts: readonly LayoutPart[], from: number, to: number): LayoutPart[] {
  requireIndex("from", from, requireList(parts, "parts").length);
  requireIndex("to", to, parts.length);
  const next = [...parts];
  const [moved] = next.splice(from, 1);
  next.splice(to, 0, moved!);
  return next;
}

/**
 * Which line a part is mirrored across: "x" (the x axis: y → −y), "y" (the y axis: x → −x), or
 * "origin" (a half turn about the spin axis: x → −x and y → −y).
 */
export type MirrorAxis = "x" | "y" | "origin";

/**
 * The mirror image of a part in the spin plane; z is kept. Plate and rod directions are reflected
 * (θ → −θ across x, θ → π − θ across y, θ → θ + π through the origin), and a custom part's own
 * products change sign with the coordinate that flips.
 *
 * @param part the part (checked)
 * @param axis "x", "y" or "origin"
 * @returns the mirrored part (same name)
 *
 * @example
 * mirrorPart({ name: "plate", shape: { kind: "plate", length: 0.04, width: 0.02, angle: 0.5 }, mass: { kind: "given", mass: 0.1 }, x: 0.03, y: 0.04, z: 0.01 }, "x") // → { x: 0.03, y: -0.04, z: 0.01, shape: { angle: -0.5, … }, … }
 * Sources: none (plane geometry, no formula).
 */
export function mirrorPart(part: LayoutPart, axis: MirrorAxis): LayoutPart {
  checkPart(part);
  if (axis !== "x" && axis !== "y" && axis !== "origin") {
    throw new CalcInputError({ param: "axis", value: String(axis), expected: '"x", "y" or "origin"', unit: "" });
  }
  const flipX = axis !== "x";
  const flipY = axis !== "y";
  const reflectAngle = (a: number): number => {
    // A direction is a line, so angles are kept in (−π, π] after the reflection.
    const raw = axis === "x" ? -a : axis === "y" ? Math.PI - a : a + Math.PI;
    return Math.atan2(Math.sin(raw), Math.cos(raw));
  };
  const s = part.shape;
  const shape: PartShape =
    s.kind === "plate" || s.kind === "rod"
      ? { ...s, angle: reflectAngle(s.angle) }
      : s.kind === "custom"
        ? { ...s, productXZ: flipX ? -s.productXZ : s.productXZ, productYZ: flipY ? -s.productYZ : s.productYZ }
        : s;
  return { ...part, shape, x: flipX ? -part.x : part.x, y: flipY ? -part.y : part.y };
}

/**
 * Replaces the part at `index` by its mirror image (see `mirrorPart`).
 *
 * @param parts the list
 * @param index the part to mirror
 * @param axis "x", "y" or "origin"
 * @returns the new list
 *
 * Sources: none (list bookkeeping, no formula).
 */
export function mirrorPartInList(parts: readonly LayoutPart[], index: number, axis: MirrorAxis): LayoutPart[] {
  requireIndex("index", index, requireList(parts, "parts").length);
  return parts.map((p, i) => (i === index ? mirrorPart(p, axis) : p));
}

/**
 * Inserts the mirror image of the part at `index` right after it, named "(mirror)". With axis
 * "origin" the pair's centre of mass lies on the spin axis.
 *
 * @param parts the list
 * @param index the part to mirror
 * @param axis "x", "y" or "origin"
 * @returns the new list
 *
 * Sources: none (list bookkeeping, no formula).
 */
export function addMirrorCopy(parts: readonly LayoutPart[], index: number, axis: MirrorAxis): LayoutPart[] {
  requireIndex("index", index, requireList(parts, "parts").length);
  const image = mirrorPart(parts[index]!, axis);
  const name = suffixedName(image.name, " (mirror)");
  return [...parts.slice(0, index + 1), { ...image, name }, ...parts.slice(index + 1)];
}
