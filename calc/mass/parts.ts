/**
 * The parts of a spinning robot's layout: their shapes, how their mass is given (directly or from a
 * material and thickness), the checks every part must pass, and each part's volume, mass and own
 * moments and products of inertia about its own centre. SI: kg, m, kg·m².
 *
 * Frame: the layout's origin is the geometric centre (the middle of the outline, where the firmware
 * assumes the spin axis to be); x and y lie in the spin plane, z is the height along the spin axis.
 * Angles are counter-clockwise from +x, in radians. Products of inertia use the POSITIVE-PRODUCT
 * convention: $I'_{xz}$ is a part's own product about its own centre; the inertia-tensor element is
 * the negative of it.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requireRelation } from "../core/errors.ts";
import { isMaterialId, MATERIAL_DENSITIES, type MaterialId } from "../materials/densities.ts";
import { requireFiniteFields } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// Parts.

/**
 * The shape of a part, with the dimensions its inertia needs [m, rad, kg·m²]:
 * - `point`: a small part whose own inertia is neglected;
 * - `disk`: solid disk in the xy plane, radius R;
 * - `ring`: thin ring (hoop) in the xy plane, mean radius R;
 * - `annulus`: thick annulus in the xy plane, inner and outer radius;
 * - `plate`: rectangular plate in the xy plane, its length along the direction `angle`;
 * - `rod`: slender rod in the xy plane along the direction `angle`;
 * - `cylinder`: solid cylinder whose axis is parallel to z (the spin axis);
 * - `lyingCylinder`: solid cylinder lying in the xy plane, its axis along the direction `angle` (a
 *   drive motor lying radially);
 * - `custom`: any part whose own moment of inertia about the axis through its own centre, parallel
 *   to z, is known, with its own products of inertia (positive-product convention).
 */
export type PartShape =
  | { kind: "point" }
  | { kind: "disk"; radius: number }
  | { kind: "ring"; radius: number }
  | { kind: "annulus"; innerRadius: number; outerRadius: number }
  | { kind: "plate"; length: number; width: number; angle: number }
  | { kind: "rod"; length: number; angle: number }
  | { kind: "cylinder"; radius: number; height: number }
  | { kind: "lyingCylinder"; radius: number; length: number; angle: number }
  | { kind: "custom"; inertiaZ: number; productXZ: number; productYZ: number };

export type PartShapeKind = PartShape["kind"];

/**
 * How a part's mass is known: weighed (`given`), or from a material of the materials table and the
 * shape's volume. `thickness` [m] is the axial thickness of a disk, annulus or plate, and the
 * diameter of the round section of a ring or rod; a cylinder's volume comes from its own height or
 * length (any thickness is ignored). Point and custom parts need a given mass.
 */
export type PartMassSpec = { kind: "given"; mass: number } | { kind: "material"; material: MaterialId; thickness?: number };

/** One row of the parts list. */
export interface LayoutPart {
  /** A name for the row, e.g. "battery". */
  name: string;
  shape: PartShape;
  mass: PartMassSpec;
  /** Position of the part's own centre of mass from the geometric centre [m]. */
  x: number;
  /** [m] */
  y: number;
  /** Height of the part's own centre of mass along the spin axis [m]. */
  z: number;
}

/** The shape kinds, in the order a part picker lists them. */
export const PART_SHAPE_KINDS: readonly PartShapeKind[] = ["point", "disk", "ring", "annulus", "plate", "rod", "cylinder", "lyingCylinder", "custom"];

/** Largest coordinate or dimension accepted [m]: keeps every sum finite. */
const MAX_LENGTH = 100;
/** Largest part mass accepted [kg]. */
export const MAX_PART_MASS = 10_000;
/** Largest own inertia or product accepted for a custom part [kg·m²]. */
const MAX_OWN_INERTIA = 1e6;
/** Longest part name kept [characters]. */
export const MAX_NAME_LENGTH = 60;
/** Most parts in one layout. */
export const MAX_PARTS = 200;

const LENGTH = { min: 0, max: MAX_LENGTH, minOpen: true };
const COORDINATE = { min: -MAX_LENGTH, max: MAX_LENGTH };
const ANGLE = { min: -4 * Math.PI, max: 4 * Math.PI };
const PRODUCT = { min: -MAX_OWN_INERTIA, max: MAX_OWN_INERTIA };

/** Checks a part dimension: greater than 0 m and at most 100 m (param names the field). @internal */
export function requireLength(param: string, value: number): number {
  return requireInRange(param, value, "m", LENGTH);
}

/** Checks a coordinate: within ±100 m (param names the field). @internal */
export function requireCoordinate(param: string, value: number): number {
  return requireInRange(param, value, "m", COORDINATE);
}

/**
 * Checks one part and throws a `CalcInputError` whose param names the field, e.g.
 * "parts[2].shape.outerRadius". Used at the entry of every function that reads parts.
 *
 * @param part the part
 * @param prefix how the message names it, e.g. "parts[2]"
 *
 * Sources: none (input validation, no formula).
 */
export function checkPart(part: LayoutPart, prefix = "part"): void {
  if (typeof part !== "object" || part === null) {
    throw new CalcInputError({ param: prefix, value: String(part), expected: "a part object", unit: "" });
  }
  if (typeof part.name !== "string" || part.name.length > MAX_NAME_LENGTH) {
    throw new CalcInputError({ param: `${prefix}.name`, value: String(part.name), expected: `text of at most ${MAX_NAME_LENGTH} characters`, unit: "" });
  }
  requireCoordinate(`${prefix}.x`, part.x);
  requireCoordinate(`${prefix}.y`, part.y);
  requireCoordinate(`${prefix}.z`, part.z);
  const s = part.shape;
  const p = `${prefix}.shape`;
  switch (s?.kind) {
    case "point":
      break;
    case "disk":
    case "ring":
      requireLength(`${p}.radius`, s.radius);
      break;
    case "annulus":
      requireInRange(`${p}.innerRadius`, s.innerRadius, "m", { min: 0, max: MAX_LENGTH });
      requireLength(`${p}.outerRadius`, s.outerRadius);
      requireRelation(`${p}.innerRadius`, s.innerRadius, "less", s.outerRadius, { kind: "length", unit: "m", other: "outerRadius" });
      break;
    case "plate":
      requireLength(`${p}.length`, s.length);
      requireLength(`${p}.width`, s.width);
      requireInRange(`${p}.angle`, s.angle, "rad", ANGLE);
      break;
    case "rod":
      requireLength(`${p}.length`, s.length);
      requireInRange(`${p}.angle`, s.angle, "rad", ANGLE);
      break;
    case "cylinder":
      requireLength(`${p}.radius`, s.radius);
      requireLength(`${p}.height`, s.height);
      break;
    case "lyingCylinder":
      requireLength(`${p}.radius`, s.radius);
      requireLength(`${p}.length`, s.length);
      requireInRange(`${p}.angle`, s.angle, "rad", ANGLE);
      break;
    case "custom":
      requireInRange(`${p}.inertiaZ`, s.inertiaZ, "kg·m²", { min: 0, max: MAX_OWN_INERTIA });
      requireInRange(`${p}.productXZ`, s.productXZ, "kg·m²", PRODUCT);
      requireInRange(`${p}.productYZ`, s.productYZ, "kg·m²", PRODUCT);
      break;
    default:
      throw new CalcInputError({
        param: `${p}.kind`,
        value: String((s as { kind?: unknown } | undefined)?.kind),
        expected: `one of ${PART_SHAPE_KINDS.join(", ")}`,
        unit: "",
      });
  }
  const m = part.mass;
  if (m?.kind === "given") {
    requireInRange(`${prefix}.mass.mass`, m.mass, "kg", { min: 0, max: MAX_PART_MASS, minOpen: true });
  } else if (m?.kind === "material") {
    if (!isMaterialId(m.material)) {
      throw new CalcInputError({ param: `${prefix}.mass.material`, value: String(m.material), expected: "a material of the materials table", unit: "" });
    }
    if (s.kind === "point" || s.kind === "custom") {
      throw new CalcInputError({ param: `${prefix}.mass.kind`, value: "material", expected: `"given" for a ${s.kind} part (it has no volume)`, unit: "" });
    }
    if (s.kind !== "cylinder" && s.kind !== "lyingCylinder") {
      if (m.thickness === undefined) {
        throw new CalcInputError({
          param: `${prefix}.mass.thickness`,
          value: "missing",
          expected: "a thickness (disk, annulus, plate) or section diameter (ring, rod) greater than 0 m",
          unit: "",
        });
      }
      requireLength(`${prefix}.mass.thickness`, m.thickness);
    }
    if (!(MATERIAL_DENSITIES[m.material].density * volumeOf(s, m.thickness ?? 0) > 0)) {
      // A volume below the smallest double comes out as 0: the smallest dimension in it took it there.
      const dims: [string, number][] = Object.entries(s).filter(([k, v]) => k !== "angle" && typeof v === "number") as [string, number][];
      // Stryker disable next-line ConditionalExpression: equivalent, a missing thickness pushed as undefined never compares less than a number, so it is never named
      if (m.thickness !== undefined) dims.push(["thickness", m.thickness]);
      const [name, value] = dims.reduce((a, b) => (b[1] < a[1] ? b : a));
      throw new CalcInputError({
        param: name === "thickness" ? `${prefix}.mass.thickness` : `${p}.${name}`,
        value,
        expected: "large enough for the part's volume, and so its mass, to be greater than 0",
        unit: "m",
      });
    }
  } else {
    throw new CalcInputError({
      param: `${prefix}.mass.kind`,
      value: String((m as { kind?: unknown } | undefined)?.kind),
      expected: '"given" or "material"',
      unit: "",
    });
  }
}

/**
 * Volume of a part made of a material (oxford-concise-mathematics, plane areas × thickness).
 *
 * Formula: disk $\pi R^2 t$; ring $2\pi R\cdot\pi d^2/4$; annulus $\pi(R_o^2 - R_i^2)\,t$;
 * plate $L W t$; rod $L\,\pi d^2/4$; cylinder $\pi R^2 h$; lying cylinder $\pi R^2 L$
 *
 * @param part a part whose mass kind is "material" (checked)
 * @returns V [m³]
 *
 * @example
 * partVolume({ name: "plate", shape: { kind: "disk", radius: 0.07 }, mass: { kind: "material", material: "al-6061-t6", thickness: 0.005 }, x: 0, y: 0, z: 0 }) // → 7.697e-5 [m³] (0.208 kg of 6061)
 * Sources: oxford-concise-mathematics.
 */
export function partVolume(part: LayoutPart): number {
  checkPart(part);
  if (part.mass.kind !== "material") {
    throw new CalcInputError({ param: "part.mass.kind", value: part.mass.kind, expected: '"material" (a given mass has no volume here)', unit: "" });
  }
  return volumeOf(part.shape, part.mass.thickness ?? 0);
}

function volumeOf(shape: PartShape, thickness: number): number {
  const roundSection = (Math.PI * thickness * thickness) / 4;
  switch (shape.kind) {
    case "disk":
      return Math.PI * shape.radius * shape.radius * thickness;
    case "ring":
      return 2 * Math.PI * shape.radius * roundSection;
    case "annulus":
      return Math.PI * (shape.outerRadius - shape.innerRadius) * (shape.outerRadius + shape.innerRadius) * thickness;
    case "plate":
      return shape.length * shape.width * thickness;
    case "rod":
      return shape.length * roundSection;
    case "cylinder":
      return Math.PI * shape.radius * shape.radius * shape.height;
    case "lyingCylinder":
      return Math.PI * shape.radius * shape.radius * shape.length;
    // Stryker disable next-line ConditionalExpression: equivalent, only a material part has its volume taken, and checkPart refuses a point or custom part of a material
    default:
      return 0;
  }
}

/**
 * Mass of a part: the given mass, or density × volume for a material part
 * (oxford-concise-mathematics for the volumes; density from the materials table).
 *
 * Formula: $m = \rho V$
 *
 * @param part the part (checked)
 * @returns m [kg]
 *
 * @example
 * partMass({ name: "ring", shape: { kind: "annulus", innerRadius: 0.068, outerRadius: 0.075 }, mass: { kind: "material", material: "steel-4130-normalized", thickness: 0.024 }, x: 0, y: 0, z: 0 }) // → 0.592 [kg] (4130, ρ = 7850 kg/m³)
 * Sources: oxford-concise-mathematics, asm-matweb-datasheets.
 */
export function partMass(part: LayoutPart): number {
  return massOf(part);
}

/** A part's mass [kg]: given, or its material's density × its volume (the part is checked first). @internal */
export function massOf(part: LayoutPart): number {
  checkPart(part);
  if (part.mass.kind === "given") return part.mass.mass;
  return MATERIAL_DENSITIES[part.mass.material].density * volumeOf(part.shape, part.mass.thickness ?? 0);
}

/** A part's own inertia about its own centre (axes parallel to the layout's). */
export interface OwnInertia {
  /** About the axis through the part's centre, parallel to z [kg·m²]. */
  inertiaZ: number;
  /** Own product I'_xz, positive-product convention [kg·m²]. */
  productXZ: number;
  /** Own product I'_yz [kg·m²]. */
  productYZ: number;
}

/**
 * A part's own moment of inertia about the axis through its own centre parallel to the spin axis,
 * and its own products of inertia (oxford-concise-mathematics; young-freedman-university-physics
 * for the rod).
 *
 * Formula: point $0$; disk and cylinder $\tfrac12 mR^2$; ring $mR^2$; annulus
 * $\tfrac12 m(R_i^2 + R_o^2)$; plate $\tfrac1{12} m(L^2 + W^2)$; rod $\tfrac1{12} mL^2$; lying
 * cylinder (about a diameter through its centre) $\tfrac1{12} m(3R^2 + L^2)$
 *
 * @param part the part (checked)
 * @returns inertiaZ [kg·m²], productXZ and productYZ [kg·m²]
 *
 * Assumptions: every built-in shape is symmetric about its own mid-plane parallel to xy, so its own
 * products I'_xz and I'_yz are exactly 0 (only a custom part can carry its own); a lying cylinder's
 * axis is horizontal, so z is one of its principal axes and its products are 0 too. The plate formula
 * holds for any thickness; the ring and rod are idealised: a round section of diameter d adds
 * 3md²/16 (ring) and md²/16 (rod), a relative error of 0.19 (d/R)² and 0.75 (d/L)².
 * @example
 * partOwnInertia({ name: "disk", shape: { kind: "disk", radius: 0.1 }, mass: { kind: "given", mass: 2 }, x: 0, y: 0, z: 0 }) // → { inertiaZ: 0.01, productXZ: 0, productYZ: 0 }
 * Sources: oxford-concise-mathematics, mathmos-moments-of-inertia (annulus),
 * web-formulas-moment-of-inertia (plate, rod), young-freedman-university-physics (rod),
 * web-formulas-moment-of-inertia (lying cylinder).
 */
export function partOwnInertia(part: LayoutPart): OwnInertia {
  checkPart(part);
  return ownInertiaOf(part.shape, massOf(part));
}

/** A shape's own inertia and products about its own centre for mass m [kg·m²] (both checked first). @internal */
export function ownInertiaOf(shape: PartShape, m: number): OwnInertia {
  requireNonNegative("m", m, "kg");
  // Stryker disable next-line StringLiteral: equivalent, the probe part's name is never shown, and any short name passes
  checkPart({ name: "", shape, mass: { kind: "given", mass: 1 }, x: 0, y: 0, z: 0 }, "part");
  return requireFiniteFields(inertiaOf(shape, m), "own inertia", { m: [m, "kg"] });
}

/** ownInertiaOf for a shape and mass already checked. */
function inertiaOf(shape: PartShape, m: number): OwnInertia {
  const zero = { productXZ: 0, productYZ: 0 };
  switch (shape.kind) {
    case "point":
      return { inertiaZ: 0, ...zero };
    case "disk":
    case "cylinder":
      return { inertiaZ: 0.5 * m * shape.radius * shape.radius, ...zero };
    case "ring":
      return { inertiaZ: m * shape.radius * shape.radius, ...zero };
    case "annulus":
      return { inertiaZ: 0.5 * m * (shape.innerRadius * shape.innerRadius + shape.outerRadius * shape.outerRadius), ...zero };
    case "plate":
      return { inertiaZ: (m * (shape.length * shape.length + shape.width * shape.width)) / 12, ...zero };
    case "rod":
      return { inertiaZ: (m * shape.length * shape.length) / 12, ...zero };
    case "lyingCylinder":
      // Solid cylinder about a diameter through its centre, mR²/4 + mL²/12 = m(3R² + L²)/12 (web-formulas-moment-of-inertia).
      return { inertiaZ: (m * (3 * shape.radius * shape.radius + shape.length * shape.length)) / 12, ...zero };
    case "custom":
      return { inertiaZ: shape.inertiaZ, productXZ: shape.productXZ, productYZ: shape.productYZ };
  }
}

/** Direction of a plan vector, atan2 kept in (−π, π] and without a negative zero [rad]. @internal */
export function directionOf(vx: number, vy: number): number {
  requireFinite("vx", vx, "");
  requireFinite("vy", vy, "");
  const a = Math.atan2(vy, vx);
  return a === -Math.PI ? Math.PI : a + 0;
}
