/**
 * The parts list as compact, versioned text for the calculator's URL, and reading it back with a
 * problem per part that cannot be read (never throws).
 */
import { CalcInputError } from "../core/errors.ts";
import { exactNumberText, readExactNumber } from "../core/units.ts";
import { isMaterialId } from "../materials/densities.ts";

import { type LayoutPart, MAX_PARTS, type PartMassSpec, type PartShape, type PartShapeKind, checkPart } from "./parts.ts";

// ---------------------------------------------------------------------------------------------
// A compact, versioned text form of the parts list for the calculator's URL.
//
// "v1~disk_body_0_0_2_70_al-6061-t6_5~pt_battery_15_0_12_280" — parts separated by "~", fields
// by "_", all URL-safe. Lengths in mm, masses in g, angles in degrees, inertia in g·mm²; a number
// followed by "si" is in SI units instead (written when no number in the unit reads back exactly).
// Field order: shape, name, x, y, z, then the shape's dimensions, then the mass: a number (grams)
// or a material id followed, except for cylinders (upright or lying), by the thickness in mm.
//   pt     (no dimensions)          disk  radius            ring radius
//   ann    inner, outer radius      plate length, width, angle
//   rod    length, angle            cyl   radius, height
//   lcyl   radius, length, angle    (a cylinder lying in the spin plane)
//   cust   Izz, Ixz, Iyz [g·mm²]   (mass must be given)

/** Version of the text form written by `encodeLayout`. */
export const LAYOUT_TEXT_VERSION = 1;

const SHAPE_TOKENS: Record<PartShapeKind, string> = {
  point: "pt",
  disk: "disk",
  ring: "ring",
  annulus: "ann",
  plate: "plate",
  rod: "rod",
  cylinder: "cyl",
  lyingCylinder: "lcyl",
  custom: "cust",
};
// A Map, not an object: a token such as "toString" or "constructor" must not find what every object inherits.
const TOKEN_SHAPES = new Map(Object.entries(SHAPE_TOKENS).map(([k, v]) => [v, k as PartShapeKind]));
const DIM_COUNT: Record<PartShapeKind, number> = { point: 0, disk: 1, ring: 1, annulus: 2, plate: 3, rod: 2, cylinder: 2, lyingCylinder: 3, custom: 3 };
const MM = 1e-3;
const GRAM = 1e-3;
const DEG = Math.PI / 180;
const G_MM2 = 1e-9;
/** The unit of each dimension of a shape, as a factor to SI. */
const DIM_FACTORS: Record<PartShapeKind, readonly number[]> = {
  point: [],
  disk: [MM],
  ring: [MM],
  annulus: [MM, MM],
  plate: [MM, MM, DEG],
  rod: [MM, DEG],
  cylinder: [MM, MM],
  lyingCylinder: [MM, MM, DEG],
  custom: [G_MM2, G_MM2, G_MM2],
};
/** Longest layout text the parser reads [characters]. */
const MAX_LAYOUT_TEXT = 20_000;

function nameText(name: string): string {
  return encodeURIComponent(name).replace(/_/g, "%5F").replace(/~/g, "%7E");
}

/** A shape's dimensions as text, each in its unit (mm, degrees, g·mm²), exactly. */
function shapeDims(shape: PartShape): string[] {
  const mm = (v: number) => exactNumberText(v, MM);
  switch (shape.kind) {
    case "point":
      return [];
    case "disk":
    case "ring":
      return [mm(shape.radius)];
    case "annulus":
      return [mm(shape.innerRadius), mm(shape.outerRadius)];
    case "plate":
      return [mm(shape.length), mm(shape.width), exactNumberText(shape.angle, DEG)];
    case "rod":
      return [mm(shape.length), exactNumberText(shape.angle, DEG)];
    case "cylinder":
      return [mm(shape.radius), mm(shape.height)];
    case "lyingCylinder":
      return [mm(shape.radius), mm(shape.length), exactNumberText(shape.angle, DEG)];
    case "custom":
      return [shape.inertiaZ, shape.productXZ, shape.productYZ].map((v) => exactNumberText(v, G_MM2));
  }
}

/**
 * Writes a parts list as compact URL-safe text (format above); every number reads back exactly
 * (the shortest such number in its unit, or the SI value marked "si" when no number in the unit does).
 *
 * @param parts the parts list (each checked)
 * @returns text such as "v1~disk_body_0_0_2_70_al-6061-t6_5~pt_battery_15_0_12_280"
 *
 * Sources: none (a text format of our own).
 */
export function encodeLayout(parts: readonly LayoutPart[]): string {
  if (!Array.isArray(parts) || parts.length > MAX_PARTS) {
    throw new CalcInputError({
      param: "parts",
      value: Array.isArray(parts) ? parts.length : String(parts),
      expected: `a list of at most ${MAX_PARTS} parts`,
      unit: "",
    });
  }
  const list: readonly LayoutPart[] = parts;
  const tokens = list.map((part, i) => {
    checkPart(part, `parts[${i}]`);
    const fields = [
      SHAPE_TOKENS[part.shape.kind],
      nameText(part.name),
      ...[part.x, part.y, part.z].map((v) => exactNumberText(v, MM)),
      ...shapeDims(part.shape),
    ];
    if (part.mass.kind === "given") fields.push(exactNumberText(part.mass.mass, GRAM));
    else {
      fields.push(part.mass.material);
      if (part.shape.kind !== "cylinder" && part.shape.kind !== "lyingCylinder") fields.push(exactNumberText(part.mass.thickness ?? 0, MM));
    }
    return fields.join("_");
  });
  return [`v${LAYOUT_TEXT_VERSION}`, ...tokens].join("~");
}

/** One problem found while reading a layout text. */
export interface LayoutProblem {
  /** Index of the bad part (0-based, in the text), or null when the whole text is at fault. */
  index: number | null;
  /** What is wrong, in words. */
  reason: string;
  /**
   * The rule a part broke, when it broke one (a `CalcInputError` from `checkPart`), and its shape:
   * for a page to word in its editor's terms (`describePartProblem`); `reason` then gives the error
   * as `checkPart` states it.
   */
  error?: unknown;
  shape?: PartShapeKind;
}

export interface LayoutParseResult {
  /** True when every part was read. */
  ok: boolean;
  /** The version the text declared, or null if unreadable. */
  version: number | null;
  /** The parts that were read (bad ones are left out). */
  parts: LayoutPart[];
  problems: LayoutProblem[];
}

function parsePartToken(token: string): LayoutPart | string | { error: unknown; shape: PartShapeKind } {
  const fields = token.split("_");
  // Stryker disable next-line StringLiteral: equivalent, split always gives at least one piece, so the fallback is never used
  const shapeToken = fields[0] ?? "";
  const kind = TOKEN_SHAPES.get(shapeToken);
  if (!kind) return `unknown shape "${shapeToken.slice(0, 12)}"; use one of ${Object.values(SHAPE_TOKENS).join(", ")}`;
  const nDims = DIM_COUNT[kind];
  const minFields = 5 + nDims + 1;
  if (fields.length < minFields) return `a ${SHAPE_TOKENS[kind]} part needs ${minFields} fields, got ${fields.length}`;
  let name: string;
  try {
    name = decodeURIComponent(fields[1]!);
  } catch {
    return "the name is not valid percent-encoded text";
  }
  // Each number field's unit: x, y, z in mm, then the shape's dimensions.
  const factors = [MM, MM, MM, ...DIM_FACTORS[kind]];
  const numbers: number[] = [];
  for (let i = 2; i < 5 + nDims; i++) {
    const text = fields[i]!;
    const value = readExactNumber(text, factors[i - 2]!);
    if (value === null) return `field ${i + 1} ("${text.slice(0, 12)}") is not a number`;
    numbers.push(value);
  }
  const [x, y, z, ...dims] = numbers as [number, number, number, ...number[]];
  const d = (i: number): number => dims[i]!;
  const shape: PartShape =
    kind === "point"
      ? { kind }
      : kind === "disk" || kind === "ring"
        ? { kind, radius: d(0) }
        : kind === "annulus"
          ? { kind, innerRadius: d(0), outerRadius: d(1) }
          : kind === "plate"
            ? { kind, length: d(0), width: d(1), angle: d(2) }
            : kind === "rod"
              ? { kind, length: d(0), angle: d(1) }
              : kind === "cylinder"
                ? { kind, radius: d(0), height: d(1) }
                : kind === "lyingCylinder"
                  ? { kind, radius: d(0), length: d(1), angle: d(2) }
                  : { kind, inertiaZ: d(0), productXZ: d(1), productYZ: d(2) };
  const massField = fields[5 + nDims]!;
  let mass: PartMassSpec;
  let used = 6 + nDims;
  const given = readExactNumber(massField, GRAM);
  if (given !== null) {
    mass = { kind: "given", mass: given };
  } else if (isMaterialId(massField)) {
    if (kind === "cylinder" || kind === "lyingCylinder") {
      mass = { kind: "material", material: massField };
    } else {
      // Stryker disable next-line ConditionalExpression: equivalent, a missing field read as a number is null too (the text "undefined" is no number)
      const t = fields[used] === undefined ? null : readExactNumber(fields[used]!, MM);
      if (t === null) return `material "${massField}" needs a thickness in mm after it`;
      mass = { kind: "material", material: massField, thickness: t };
      used += 1;
    }
  } else {
    return `mass "${massField.slice(0, 20)}" is neither a number of grams nor a known material`;
  }
  if (fields.length !== used) return `a ${SHAPE_TOKENS[kind]} part has ${used} fields here, got ${fields.length}`;
  const part: LayoutPart = { name, shape, mass, x, y, z };
  try {
    checkPart(part);
  } catch (error) {
    return { error, shape: kind };
  }
  return part;
}

/**
 * Reads a layout text written by `encodeLayout`. Never throws: every bad part is reported by its
 * index and reason, and the good parts are still returned.
 *
 * @param text the text, e.g. from the URL
 * @returns ok, version, the parts read and the problems found
 *
 * The text "v1~pt_a_0_0_0_10~blob_b_0_0_0_1" gives one part and the problem { index: 1, reason:
 * 'unknown shape "blob"; …' }.
 * @example
 * parseLayout("v1~pt_a_0_0_0_10~blob_b_0_0_0_1").problems[0] // → { index: 1, … }
 * parseLayout("v1~pt_a_0_0_0_10~blob_b_0_0_0_1").parts.length // → 1
 * Sources: none (a text format of our own).
 */
export function parseLayout(text: unknown): LayoutParseResult {
  if (typeof text !== "string") return { ok: false, version: null, parts: [], problems: [{ index: null, reason: "the layout must be text" }] };
  if (text.length > MAX_LAYOUT_TEXT)
    return { ok: false, version: null, parts: [], problems: [{ index: null, reason: `the layout text is longer than ${MAX_LAYOUT_TEXT} characters` }] };
  const [head, ...tokens] = text.trim().split("~");
  // Stryker disable next-line StringLiteral: equivalent, split always gives at least one piece, so the fallback is never used
  const match = /^v(\d+)$/.exec(head ?? "");
  if (!match) return { ok: false, version: null, parts: [], problems: [{ index: null, reason: 'the layout text must start with a version such as "v1"' }] };
  const version = Number(match[1]);
  if (version !== LAYOUT_TEXT_VERSION) {
    return {
      ok: false,
      version,
      parts: [],
      problems: [{ index: null, reason: `version ${version} is not known; this reader understands v${LAYOUT_TEXT_VERSION}` }],
    };
  }
  const problems: LayoutProblem[] = [];
  const parts: LayoutPart[] = [];
  if (tokens.length > MAX_PARTS) problems.push({ index: null, reason: `only the first ${MAX_PARTS} parts are read (got ${tokens.length})` });
  tokens.slice(0, MAX_PARTS).forEach((token, index) => {
    const result = parsePartToken(token);
    if (typeof result === "string") problems.push({ index, reason: result });
    else if ("error" in result) problems.push({ index, reason: (result.error as Error).message, ...result });
    else parts.push(result);
  });
  return { ok: problems.length === 0, version, parts, problems };
}
