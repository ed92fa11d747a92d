/**
 * The parts list as compact, versioned text for the calculator's URL, and reading it back with a
 * problem per part that cannot be read (never throws).
 */
import { CalcInputError } from "../core/errors.ts";
import { isMaterialId } from "../materials/materials.ts";

import { type LayoutPart, MAX_PARTS, type PartMassSpec, type PartShape, type PartShapeKind, checkPart } from "./parts.ts";

// ---------------------------------------------------------------------------------------------
// A compact, versioned text form of the parts list for the calculator's URL.
//
// "v1~disk_body_0_0_2_70_al-6061-t6_5~pt_battery_15_0_12_280" — parts separated by "~", fields
// by "_", all URL-safe. Lengths in mm, masses in g, angles in degrees, inertia in g·mm².
// Field order: shape, name, x, y, z, then the shape's dimensions, then the mass: a number (grams)
// or a material id followed, except for cylinders, by the thickness in mm.
//   pt     (no dimensions)          disk  radius            ring radius
//   ann    inner, outer radius      plate length, width, angle
//   rod    length, angle            cyl   radius, height
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
  custom: "cust",
};
const TOKEN_SHAPES: Record<string, PartShapeKind> = Object.fromEntries(Object.entries(SHAPE_TOKENS).map(([k, v]) => [v, k as PartShapeKind]));
const DIM_COUNT: Record<PartShapeKind, number> = { point: 0, disk: 1, ring: 1, annulus: 2, plate: 3, rod: 2, cylinder: 2, custom: 3 };
const MM = 1e-3;
const GRAM = 1e-3;
const DEG = Math.PI / 180;
const G_MM2 = 1e-9;
const NUMBER_TEXT = /^-?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
/** Longest layout text the parser reads [characters]. */
const MAX_LAYOUT_TEXT = 20_000;

function numberText(value: number): string {
  const n = Number(value.toPrecision(9));
  return Object.is(n, -0) ? "0" : String(n);
}

function nameText(name: string): string {
  return encodeURIComponent(name).replace(/_/g, "%5F").replace(/~/g, "%7E");
}

function shapeDims(shape: PartShape): number[] {
  switch (shape.kind) {
    case "point":
      return [];
    case "disk":
    case "ring":
      return [shape.radius / MM];
    case "annulus":
      return [shape.innerRadius / MM, shape.outerRadius / MM];
    case "plate":
      return [shape.length / MM, shape.width / MM, shape.angle / DEG];
    case "rod":
      return [shape.length / MM, shape.angle / DEG];
    case "cylinder":
      return [shape.radius / MM, shape.height / MM];
    case "custom":
      return [shape.inertiaZ / G_MM2, shape.productXZ / G_MM2, shape.productYZ / G_MM2];
  }
}

/**
 * Writes a parts list as compact URL-safe text (format above), 9 significant figures per number.
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
      ...[part.x, part.y, part.z].map((v) => numberText(v / MM)),
      ...shapeDims(part.shape).map(numberText),
    ];
    if (part.mass.kind === "given") fields.push(numberText(part.mass.mass / GRAM));
    else {
      fields.push(part.mass.material);
      if (part.shape.kind !== "cylinder") fields.push(numberText((part.mass.thickness ?? 0) / MM));
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

function parsePartToken(token: string): LayoutPart | string {
  const fields = token.split("_");
  const kind = TOKEN_SHAPES[fields[0] ?? ""];
  if (!kind) return `unknown shape "${(fields[0] ?? "").slice(0, 12)}"; use one of ${Object.values(SHAPE_TOKENS).join(", ")}`;
  const nDims = DIM_COUNT[kind];
  const minFields = 5 + nDims + 1;
  if (fields.length < minFields) return `a ${SHAPE_TOKENS[kind]} part needs ${minFields} fields, got ${fields.length}`;
  let name: string;
  try {
    name = decodeURIComponent(fields[1]!);
  } catch {
    return "the name is not valid percent-encoded text";
  }
  const numbers: number[] = [];
  for (let i = 2; i < 5 + nDims; i++) {
    const text = fields[i]!;
    if (!NUMBER_TEXT.test(text)) return `field ${i + 1} ("${text.slice(0, 12)}") is not a number`;
    numbers.push(Number(text));
  }
  const [x, y, z, ...dims] = numbers as [number, number, number, ...number[]];
  const d = (i: number): number => dims[i]!;
  const shape: PartShape =
    kind === "point"
      ? { kind }
      : kind === "disk" || kind === "ring"
        ? { kind, radius: d(0) * MM }
        : kind === "annulus"
          ? { kind, innerRadius: d(0) * MM, outerRadius: d(1) * MM }
          : kind === "plate"
            ? { kind, length: d(0) * MM, width: d(1) * MM, angle: d(2) * DEG }
            : kind === "rod"
              ? { kind, length: d(0) * MM, angle: d(1) * DEG }
              : kind === "cylinder"
                ? { kind, radius: d(0) * MM, height: d(1) * MM }
                : { kind, inertiaZ: d(0) * G_MM2, productXZ: d(1) * G_MM2, productYZ: d(2) * G_MM2 };
  const massField = fields[5 + nDims]!;
  let mass: PartMassSpec;
  let used = 6 + nDims;
  if (NUMBER_TEXT.test(massField)) {
    mass = { kind: "given", mass: Number(massField) * GRAM };
  } else if (isMaterialId(massField)) {
    if (kind === "cylinder") {
      mass = { kind: "material", material: massField };
    } else {
      const t = fields[used];
      if (t === undefined || !NUMBER_TEXT.test(t)) return `material "${massField}" needs a thickness in mm after it`;
      mass = { kind: "material", material: massField, thickness: Number(t) * MM };
      used += 1;
    }
  } else {
    return `mass "${massField.slice(0, 20)}" is neither a number of grams nor a known material`;
  }
  if (fields.length !== used) return `a ${SHAPE_TOKENS[kind]} part has ${used} fields here, got ${fields.length}`;
  const part: LayoutPart = { name, shape, mass, x: x * MM, y: y * MM, z: z * MM };
  try {
    checkPart(part);
  } catch (error) {
    return error instanceof CalcInputError ? error.message.replace(/^part\./, "") : "the part is not valid";
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
 * Example: "v1~pt_a_0_0_0_10~blob_b_0_0_0_1" gives one part and the problem
 * { index: 1, reason: 'unknown shape "blob"; …' }. Sources: none (a text format of our own).
 */
export function parseLayout(text: unknown): LayoutParseResult {
  if (typeof text !== "string") return { ok: false, version: null, parts: [], problems: [{ index: null, reason: "the layout must be text" }] };
  if (text.length > MAX_LAYOUT_TEXT)
    return { ok: false, version: null, parts: [], problems: [{ index: null, reason: `the layout text is longer than ${MAX_LAYOUT_TEXT} characters` }] };
  const [head, ...tokens] = text.trim().split("~");
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
    else parts.push(result);
  });
  return { ok: problems.length === 0, version, parts, problems };
}
