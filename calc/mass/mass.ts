/**
 * Mass layout and balance. A spinning robot turns about its centre of mass, not about the centre
 * of its outline: this module sums a parts list into mass, centre of mass, moments and products of
 * inertia; rates the offset as static unbalance and as a balance quality grade; sizes a
 * counterweight or a two-plane correction; and works out how far a sensor really sits from the
 * spin axis and what that does to a heading estimate. SI in and out: kg, m, rad, rad/s, kg·m,
 * kg·m², N, N·m.
 *
 * Frame: the layout's origin is the geometric centre (the middle of the outline, where the firmware
 * assumes the spin axis to be); x and y lie in the spin plane, z is the height along the spin axis.
 * Angles are counter-clockwise from +x, in radians.
 *
 * Products of inertia use the POSITIVE-PRODUCT convention:
 * $I_{xz} = \sum \left[ I'_{xz} + m\,(x - \bar x)(z - \bar z) \right]$, where $I'_{xz}$ is a part's
 * own product about its own centre. The inertia-tensor element is the negative of this.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { defineInputs } from "../core/inputs.ts";
import { isMaterialId, MATERIALS, type MaterialId } from "../materials/materials.ts";
import { rpmToRadPerSecond } from "../core/units.ts";
import type { SourceKey } from "../sources/index.ts";

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
  | { kind: "custom"; inertiaZ: number; productXZ: number; productYZ: number };

export type PartShapeKind = PartShape["kind"];

/**
 * How a part's mass is known: weighed (`given`), or from a material of the materials table and the
 * shape's volume. `thickness` [m] is the axial thickness of a disk, annulus or plate, and the
 * diameter of the round section of a ring or rod; a cylinder's volume comes from its own height
 * (any thickness is ignored). Point and custom parts need a given mass.
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
export const PART_SHAPE_KINDS: readonly PartShapeKind[] = ["point", "disk", "ring", "annulus", "plate", "rod", "cylinder", "custom"];

/** Largest coordinate or dimension accepted [m]: keeps every sum finite. */
const MAX_LENGTH = 100;
/** Largest part mass accepted [kg]. */
const MAX_PART_MASS = 10_000;
/** Largest own inertia or product accepted for a custom part [kg·m²]. */
const MAX_OWN_INERTIA = 1e6;
/** Longest part name kept [characters]. */
const MAX_NAME_LENGTH = 60;
/** Most parts in one layout. */
export const MAX_PARTS = 200;

function requireLength(param: string, value: number): number {
  requirePositive(param, value, "m");
  return requireInRange(param, value, "m", { min: 0, max: MAX_LENGTH, minOpen: true });
}

function requireCoordinate(param: string, value: number): number {
  return requireInRange(param, value, "m", { min: -MAX_LENGTH, max: MAX_LENGTH });
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
      if (!(s.innerRadius < s.outerRadius)) {
        throw new CalcInputError({ param: `${p}.innerRadius`, value: s.innerRadius, expected: `less than the outer radius (${s.outerRadius} m)`, unit: "m" });
      }
      break;
    case "plate":
      requireLength(`${p}.length`, s.length);
      requireLength(`${p}.width`, s.width);
      requireInRange(`${p}.angle`, s.angle, "rad", { min: -4 * Math.PI, max: 4 * Math.PI });
      break;
    case "rod":
      requireLength(`${p}.length`, s.length);
      requireInRange(`${p}.angle`, s.angle, "rad", { min: -4 * Math.PI, max: 4 * Math.PI });
      break;
    case "cylinder":
      requireLength(`${p}.radius`, s.radius);
      requireLength(`${p}.height`, s.height);
      break;
    case "custom":
      requireInRange(`${p}.inertiaZ`, s.inertiaZ, "kg·m²", { min: 0, max: MAX_OWN_INERTIA });
      requireInRange(`${p}.productXZ`, s.productXZ, "kg·m²", { min: -MAX_OWN_INERTIA, max: MAX_OWN_INERTIA });
      requireInRange(`${p}.productYZ`, s.productYZ, "kg·m²", { min: -MAX_OWN_INERTIA, max: MAX_OWN_INERTIA });
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
    requirePositive(`${prefix}.mass.mass`, m.mass, "kg");
    requireInRange(`${prefix}.mass.mass`, m.mass, "kg", { min: 0, max: MAX_PART_MASS, minOpen: true });
  } else if (m?.kind === "material") {
    if (!isMaterialId(m.material)) {
      throw new CalcInputError({ param: `${prefix}.mass.material`, value: String(m.material), expected: "a material of the materials table", unit: "" });
    }
    if (s.kind === "point" || s.kind === "custom") {
      throw new CalcInputError({ param: `${prefix}.mass.kind`, value: "material", expected: `"given" for a ${s.kind} part (it has no volume)`, unit: "" });
    }
    if (s.kind !== "cylinder") {
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
 * plate $L W t$; rod $L\,\pi d^2/4$; cylinder $\pi R^2 h$
 *
 * @param part a part whose mass kind is "material" (checked)
 * @returns V [m³]
 *
 * Example: a 6061 disk of radius 70 mm and thickness 5 mm has V = 7.697e-5 m³ (0.208 kg).
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
 * Example: a 4130 annulus, 68–75 mm radii, 24 mm thick: ρ = 7850 kg/m³, m = 0.592 kg.
 * Sources: oxford-concise-mathematics, asm-matweb-datasheets.
 */
export function partMass(part: LayoutPart): number {
  checkPart(part);
  return massOf(part);
}

function massOf(part: LayoutPart): number {
  if (part.mass.kind === "given") return part.mass.mass;
  return MATERIALS[part.mass.material].density * volumeOf(part.shape, part.mass.thickness ?? 0);
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
 * $\tfrac12 m(R_i^2 + R_o^2)$; plate $\tfrac1{12} m(L^2 + W^2)$; rod $\tfrac1{12} mL^2$
 *
 * @param part the part (checked)
 * @returns inertiaZ [kg·m²], productXZ and productYZ [kg·m²]
 *
 * Assumptions: every built-in shape is symmetric about its own mid-plane parallel to xy, so its own
 * products I'_xz and I'_yz are exactly 0 (only a custom part can carry its own). The plate formula
 * holds for any thickness; the ring and rod are idealised: a round section of diameter d adds
 * 3md²/16 (ring) and md²/16 (rod), a relative error of 0.19 (d/R)² and 0.75 (d/L)².
 * Example: a solid disk of 2 kg and radius 0.1 m has I = 0.01 kg·m².
 * Sources: oxford-concise-mathematics, mathmos-moments-of-inertia (annulus),
 * web-formulas-moment-of-inertia (plate, rod), young-freedman-university-physics (rod).
 */
export function partOwnInertia(part: LayoutPart): OwnInertia {
  checkPart(part);
  return ownInertiaOf(part.shape, massOf(part));
}

function ownInertiaOf(shape: PartShape, m: number): OwnInertia {
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
    case "custom":
      return { inertiaZ: shape.inertiaZ, productXZ: shape.productXZ, productYZ: shape.productYZ };
  }
}

// ---------------------------------------------------------------------------------------------
// Mass properties of the whole layout.

/** One part's row in the mass-properties table. */
export interface PartRow {
  name: string;
  /** [kg] */
  mass: number;
  /** Own inertia about its own centre, parallel to z [kg·m²]. */
  ownInertia: number;
  /** Distance of the part's centre from the geometric centre, in plan [m]. */
  radius: number;
  /** Share of the total mass [-]. */
  massFraction: number;
}

export interface MassProperties {
  /** M [kg] */
  totalMass: number;
  /** x̄ [m] */
  centreX: number;
  /** ȳ [m] */
  centreY: number;
  /** z̄ [m] */
  centreZ: number;
  /** e, plan distance of the centre of mass from the geometric centre [m]. */
  offset: number;
  /** Direction of the offset, atan2(ȳ, x̄) [rad]; 0 when the offset is 0. */
  offsetAngle: number;
  /** Σ m x, the static unbalance vector about the geometric axis, x part [kg·m]. */
  firstMomentX: number;
  /** Σ m y [kg·m] */
  firstMomentY: number;
  /** I about the spin axis through the centre of mass [kg·m²]. */
  inertiaAboutCentre: number;
  /** I about the axis through the geometric centre [kg·m²]. */
  inertiaAboutOrigin: number;
  /** I_xz about the centre of mass, positive-product convention [kg·m²]. */
  productXZ: number;
  /** I_yz about the centre of mass [kg·m²]. */
  productYZ: number;
  /** Σ (I'_xz + m x z): the product about the geometric axis with z measured from z = 0 [kg·m²]. */
  productXZAboutOrigin: number;
  /** Σ (I'_yz + m y z) [kg·m²] */
  productYZAboutOrigin: number;
  /** Per-part rows, in list order. */
  parts: readonly PartRow[];
}

/**
 * Mass, centre of mass, moments and products of inertia of a parts list (centre-of-mass;
 * parallel-axis-theorem; shape inertias from partOwnInertia).
 *
 * Formula: $M = \sum m_j$, $\bar{\mathbf r} = \sum m_j \mathbf r_j / M$,
 * $I_{z,G} = \sum \left[ I'_j + m_j\left((x_j-\bar x)^2 + (y_j-\bar y)^2\right) \right]$,
 * $I_{z,O} = \sum \left[ I'_j + m_j (x_j^2 + y_j^2) \right] = I_{z,G} + M e^2$,
 * $I_{xz} = \sum \left[ I'_{xz,j} + m_j (x_j - \bar x)(z_j - \bar z) \right]$ (and likewise $I_{yz}$)
 *
 * @param parts the parts list, 1 to MAX_PARTS rows (each checked; errors name "parts[i].field")
 * @returns MassProperties (kg, m, rad, kg·m, kg·m²)
 *
 * Assumptions: rigid body; positions are the parts' own centres of mass. Products use the
 * positive-product convention (tensor element = −I_xz). The I about the centre is summed
 * directly about x̄, ȳ (not as I_O − Me²) to avoid cancellation.
 * Example: 2 kg disk (R 0.1 m) at the origin plus 0.1 kg at (0.1, 0, 0): M = 2.1 kg,
 * x̄ = 4.762 mm, I_O = 0.011 kg·m², I_G = 0.011 − 2.1·0.004762² = 0.0109524 kg·m².
 * Sources: centre-of-mass, parallel-axis-theorem, oxford-concise-mathematics.
 */
export function massProperties(parts: readonly LayoutPart[]): MassProperties {
  if (!Array.isArray(parts) || parts.length === 0 || parts.length > MAX_PARTS) {
    throw new CalcInputError({
      param: "parts",
      value: Array.isArray(parts) ? parts.length : String(parts),
      expected: `a list of 1 to ${MAX_PARTS} parts`,
      unit: "",
    });
  }
  for (const [i, part] of parts.entries()) checkPart(part, `parts[${i}]`);
  const masses = parts.map(massOf);
  const own = parts.map((p, i) => ownInertiaOf(p.shape, masses[i]!));
  let totalMass = 0;
  let sx = 0;
  let sy = 0;
  let sz = 0;
  let inertiaAboutOrigin = 0;
  let productXZAboutOrigin = 0;
  let productYZAboutOrigin = 0;
  parts.forEach((p, i) => {
    const m = masses[i]!;
    const o = own[i]!;
    totalMass += m;
    sx += m * p.x;
    sy += m * p.y;
    sz += m * p.z;
    inertiaAboutOrigin += o.inertiaZ + m * (p.x * p.x + p.y * p.y);
    productXZAboutOrigin += o.productXZ + m * p.x * p.z;
    productYZAboutOrigin += o.productYZ + m * p.y * p.z;
  });
  const centreX = sx / totalMass;
  const centreY = sy / totalMass;
  const centreZ = sz / totalMass;
  let inertiaAboutCentre = 0;
  let productXZ = 0;
  let productYZ = 0;
  parts.forEach((p, i) => {
    const m = masses[i]!;
    const o = own[i]!;
    const dx = p.x - centreX;
    const dy = p.y - centreY;
    const dz = p.z - centreZ;
    inertiaAboutCentre += o.inertiaZ + m * (dx * dx + dy * dy);
    productXZ += o.productXZ + m * dx * dz;
    productYZ += o.productYZ + m * dy * dz;
  });
  const offset = Math.hypot(centreX, centreY);
  return {
    totalMass,
    centreX,
    centreY,
    centreZ,
    offset,
    offsetAngle: offset > 0 ? directionOf(centreX, centreY) : 0,
    firstMomentX: sx,
    firstMomentY: sy,
    inertiaAboutCentre,
    inertiaAboutOrigin,
    productXZ,
    productYZ,
    productXZAboutOrigin,
    productYZAboutOrigin,
    parts: parts.map((p, i) => ({
      name: p.name,
      mass: masses[i]!,
      ownInertia: own[i]!.inertiaZ,
      radius: Math.hypot(p.x, p.y),
      massFraction: masses[i]! / totalMass,
    })),
  };
}

// ---------------------------------------------------------------------------------------------
// Editing the parts list: pure helpers, each returning a new array.

/** Direction of a plan vector, atan2 kept in (−π, π] and without a negative zero [rad]. */
function directionOf(vx: number, vy: number): number {
  const a = Math.atan2(vy, vx);
  return a === -Math.PI ? Math.PI : a + 0;
}

function requireIndex(param: string, index: number, length: number, allowEnd = false): number {
  const max = allowEnd ? length : length - 1;
  if (!Number.isInteger(index) || index < 0 || index > max) {
    throw new CalcInputError({ param, value: index, expected: max < 0 ? "an index into a non-empty list" : `a whole number from 0 to ${max}`, unit: "" });
  }
  return index;
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
export function addPart(parts: readonly LayoutPart[], part: LayoutPart, index: number = parts.length): LayoutPart[] {
  checkPart(part);
  requireIndex("index", index, parts.length, true);
  return [...parts.slice(0, index), part, ...parts.slice(index)];
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
  requireIndex("index", index, parts.length);
  const original = parts[index]!;
  const name = `${original.name} (copy)`.slice(0, MAX_NAME_LENGTH);
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
  requireIndex("index", index, parts.length);
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
  requireIndex("from", from, parts.length);
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
 * Example: a plate at (30, 40, 10) mm turned 0.5 rad, mirrored across x, sits at (30, −40, 10) mm
 * turned −0.5 rad. Sources: none (plane geometry, no formula).
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
  requireIndex("index", index, parts.length);
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
  requireIndex("index", index, parts.length);
  const image = mirrorPart(parts[index]!, axis);
  const name = `${image.name} (mirror)`.slice(0, MAX_NAME_LENGTH);
  return [...parts.slice(0, index + 1), { ...image, name }, ...parts.slice(index + 1)];
}

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

// ---------------------------------------------------------------------------------------------
// Top-view drawing data (pure geometry in metres; the widget turns it into SVG).

export type Point2 = readonly [number, number];

/** A part's outline in the xy plane. */
export type PartOutline =
  | { kind: "point"; centre: Point2 }
  | { kind: "circle"; centre: Point2; radius: number }
  | { kind: "hoop"; centre: Point2; radius: number }
  | { kind: "annulus"; centre: Point2; innerRadius: number; outerRadius: number }
  | { kind: "polygon"; centre: Point2; corners: readonly Point2[] }
  | { kind: "segment"; centre: Point2; from: Point2; to: Point2 };

/**
 * The outline of one part seen from above: a circle for a disk or cylinder, a hoop for a thin
 * ring, inner and outer circles for an annulus, the four rotated corners of a plate
 * (counter-clockwise), the end points of a rod, and a marker for point and custom parts.
 *
 * @param part the part (checked)
 * @returns the outline [m]
 *
 * Example: a 40 × 20 mm plate at (100, 0) mm turned 90° has corners (110, −20), (110, 20),
 * (90, 20), (90, −20) mm. Sources: none (plane geometry, no formula).
 */
export function partOutline(part: LayoutPart): PartOutline {
  checkPart(part);
  const centre: Point2 = [part.x, part.y];
  const s = part.shape;
  switch (s.kind) {
    case "point":
    case "custom":
      return { kind: "point", centre };
    case "disk":
    case "cylinder":
      return { kind: "circle", centre, radius: s.radius };
    case "ring":
      return { kind: "hoop", centre, radius: s.radius };
    case "annulus":
      return { kind: "annulus", centre, innerRadius: s.innerRadius, outerRadius: s.outerRadius };
    case "plate": {
      const c = Math.cos(s.angle);
      const n = Math.sin(s.angle);
      const hl = s.length / 2;
      const hw = s.width / 2;
      const corner = (u: number, v: number): Point2 => [part.x + u * c - v * n, part.y + u * n + v * c];
      return { kind: "polygon", centre, corners: [corner(-hl, -hw), corner(hl, -hw), corner(hl, hw), corner(-hl, hw)] };
    }
    case "rod": {
      const dx = (s.length / 2) * Math.cos(s.angle);
      const dy = (s.length / 2) * Math.sin(s.angle);
      return { kind: "segment", centre, from: [part.x - dx, part.y - dy], to: [part.x + dx, part.y + dy] };
    }
  }
}

export interface LayoutDrawing {
  /** One outline per part, in list order. */
  outlines: readonly { index: number; name: string; outline: PartOutline }[];
  /** The centre of mass in plan [m]. */
  centreOfMass: Point2;
  /** The geometric centre (always the origin). */
  geometricCentre: Point2;
  /** Box holding every outline and both centres [m]. */
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
}

function outlineExtent(o: PartOutline): Point2[] {
  switch (o.kind) {
    case "point":
      return [o.centre];
    case "circle":
    case "hoop":
      return [
        [o.centre[0] - o.radius, o.centre[1] - o.radius],
        [o.centre[0] + o.radius, o.centre[1] + o.radius],
      ];
    case "annulus":
      return [
        [o.centre[0] - o.outerRadius, o.centre[1] - o.outerRadius],
        [o.centre[0] + o.outerRadius, o.centre[1] + o.outerRadius],
      ];
    case "polygon":
      return [...o.corners];
    case "segment":
      return [o.from, o.to];
  }
}

/**
 * Everything a top-view drawing of the layout needs: outlines, both centres and a bounding box.
 *
 * @param parts the parts list (checked)
 * @returns outlines and bounds [m]
 *
 * Sources: centre-of-mass (for the marked centre).
 */
export function layoutDrawing(parts: readonly LayoutPart[]): LayoutDrawing {
  const props = massProperties(parts);
  const outlines = parts.map((part, index) => ({ index, name: part.name, outline: partOutline(part) }));
  const points: Point2[] = [[0, 0], [props.centreX, props.centreY], ...outlines.flatMap((o) => outlineExtent(o.outline))];
  return {
    outlines,
    centreOfMass: [props.centreX, props.centreY],
    geometricCentre: [0, 0],
    bounds: {
      minX: Math.min(...points.map((p) => p[0])),
      minY: Math.min(...points.map((p) => p[1])),
      maxX: Math.max(...points.map((p) => p[0])),
      maxY: Math.max(...points.map((p) => p[1])),
    },
  };
}

// ---------------------------------------------------------------------------------------------
// Balance: static unbalance, balance quality grade, couple unbalance, two-plane correction.

export interface StaticUnbalance {
  /** U = M·e [kg·m] (show in g·mm). */
  unbalance: number;
  /** F = M·e·ω², the rotating force [N]. */
  force: number;
}

/**
 * Static unbalance of a body whose centre of mass sits a distance e from the axis it is meant to
 * spin about, and the rotating force it makes (rigid-rotor-unbalance; newton-second-law).
 *
 * Formula: $U = M e$, $F = U \omega^2 = M e \omega^2$
 *
 * @param totalMass M [kg], greater than 0
 * @param offset e [m], 0 or more
 * @param angularSpeed ω [rad/s], 0 or more
 * @returns unbalance [kg·m], force [N]
 *
 * Assumptions: F is the force needed to hold the geometric centre on the axis (as bearings would).
 * A free-spinning robot instead turns about its centre of mass, and its geometric centre (and every
 * wheel) orbits it on a circle of radius e. Example: 1.4 kg, e = 2 mm, 2400 rpm: U = 2800 g·mm,
 * F = 176.9 N.
 * Sources: rigid-rotor-unbalance, newton-second-law.
 */
export function staticUnbalance({ totalMass, offset, angularSpeed }: { totalMass: number; offset: number; angularSpeed: number }): StaticUnbalance {
  requirePositive("totalMass", totalMass, "kg");
  requireNonNegative("offset", offset, "m");
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  const unbalance = totalMass * offset;
  return { unbalance, force: unbalance * angularSpeed * angularSpeed };
}

/** One standard balance quality grade. */
export interface BalanceGrade {
  /** Designation, e.g. "G 6.3". */
  label: string;
  /** e_per·Ω [m/s] (the designation number is this in mm/s). */
  value: number;
}

/**
 * The standard balance quality grades, finest first: G 0.4 … G 4000 (iso-21940-11 Table 1, the
 * same in ISO 1940-1; bloch-geitner-machinery-maintenance Table 6-5). Values in m/s.
 */
export const BALANCE_GRADES: readonly BalanceGrade[] = [0.4, 1, 2.5, 6.3, 16, 40, 100, 250, 630, 1600, 4000].map((mmPerS) => ({
  label: `G ${mmPerS}`,
  value: mmPerS / 1000,
}));

/**
 * Equivalent balance quality grade of a body: its mass eccentricity times its service speed
 * (iso-21940-11).
 *
 * Formula: $G = e\,\Omega$
 *
 * @param offset e, the mass eccentricity (centre-of-mass offset) [m], 0 or more
 * @param angularSpeed Ω, the maximum service speed [rad/s], 0 or more
 * @returns G [m/s] (the grade number is G in mm/s)
 *
 * Example: e = 20.05 µm at 3000 rpm gives 6.30 mm/s (G 6.3). Sources: iso-21940-11.
 */
export function equivalentBalanceGrade({ offset, angularSpeed }: { offset: number; angularSpeed: number }): number {
  requireNonNegative("offset", offset, "m");
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  return offset * angularSpeed;
}

/**
 * The finest standard grade a body meets: the smallest G in `BALANCE_GRADES` at or above its
 * equivalent grade (iso-21940-11), or null when it is coarser than G 4000.
 *
 * @param grade the equivalent grade [m/s], 0 or more
 * @returns the grade, or null
 *
 * Example: 0.0063 m/s meets G 6.3; 0.00631 m/s meets only G 16. Sources: iso-21940-11.
 */
export function finestGradeMet(grade: number): BalanceGrade | null {
  requireNonNegative("grade", grade, "m/s");
  // A value equal to a grade up to rounding (e.g. 0.0063000000000001) meets that grade.
  return BALANCE_GRADES.find((g) => grade <= g.value * (1 + 1e-12)) ?? null;
}

export interface PermissibleUnbalance {
  /** U_per = M·G/Ω [kg·m]. */
  unbalance: number;
  /** e_per = G/Ω [m]. */
  specificUnbalance: number;
  /** Half of U_per, allowed in each of two correction planes [kg·m]. */
  perPlane: number;
}

/**
 * Permissible residual unbalance for a balance quality grade (iso-21940-11; plane split from
 * bloch-geitner-machinery-maintenance).
 *
 * Formula: $e_{per} = G / \Omega$, $U_{per} = M\,G / \Omega$
 *
 * @param totalMass M [kg], greater than 0
 * @param grade G [m/s], greater than 0 (e.g. 0.0025 for G 2.5)
 * @param angularSpeed Ω, the maximum service speed [rad/s], greater than 0
 * @returns unbalance [kg·m], specificUnbalance [m], perPlane [kg·m]
 *
 * Assumptions: rigid rotor. For a disc-shaped body with one correction plane the full U_per applies
 * to that plane; with two planes, half is usually allowed in each. Example: 453.59237 kg (1000 lb),
 * 15 000 rpm, G 2.5: U_per = 7.219e-4 kg·m = 721.9 g·mm = 1.003 oz·in (0.501 oz·in per plane).
 * Sources: iso-21940-11, energy-tech-balancing-example, bloch-geitner-machinery-maintenance.
 */
export function permissibleResidualUnbalance({
  totalMass,
  grade,
  angularSpeed,
}: {
  totalMass: number;
  grade: number;
  angularSpeed: number;
}): PermissibleUnbalance {
  requirePositive("totalMass", totalMass, "kg");
  requirePositive("grade", grade, "m/s");
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  const specificUnbalance = grade / angularSpeed;
  const unbalance = totalMass * specificUnbalance;
  return { unbalance, specificUnbalance, perPlane: unbalance / 2 };
}

export interface CoupleUnbalance {
  /** |(I_xz, I_yz)|, the couple unbalance [kg·m²]. */
  couple: number;
  /** ω²·|(I_xz, I_yz)|, the rocking moment that turns with the body [N·m]. */
  moment: number;
  /** Direction in the spin plane of the mass lying above the centre of mass, atan2(I_yz, I_xz) [rad]; 0 when balanced. */
  angle: number;
}

/**
 * Couple unbalance and the rocking moment it makes at speed, from the products of inertia about
 * the centre of mass (rigid-rotor-unbalance; Euler's equations for steady spin about z).
 *
 * Formula: $M_{rock} = \omega^2 \sqrt{I_{xz}^2 + I_{yz}^2}$
 *
 * @param productXZ I_xz about the centre of mass, positive-product convention [kg·m²]
 * @param productYZ I_yz [kg·m²]
 * @param angularSpeed ω [rad/s], 0 or more
 * @returns couple [kg·m²], moment [N·m], angle [rad]
 *
 * Assumptions: steady spin about the z axis through the centre of mass; in body axes the moment
 * that must act on the body is (ω² I_yz, −ω² I_xz, 0). The sign convention does not change the
 * magnitude. Example: 10 g at (50 mm, 0, +10 mm) and 10 g at (−50 mm, 0, −10 mm): I_xz =
 * 1.0e-5 kg·m²; at 2400 rpm the rocking moment is 0.632 N·m.
 * Sources: rigid-rotor-unbalance.
 */
export function coupleUnbalance({ productXZ, productYZ, angularSpeed }: { productXZ: number; productYZ: number; angularSpeed: number }): CoupleUnbalance {
  requireFinite("productXZ", productXZ, "kg·m²");
  requireFinite("productYZ", productYZ, "kg·m²");
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  const couple = Math.hypot(productXZ, productYZ);
  return { couple, moment: angularSpeed * angularSpeed * couple, angle: couple > 0 ? directionOf(productXZ, productYZ) : 0 };
}

/** A correction mass at a point. */
export interface CorrectionMass {
  /** [kg] */
  mass: number;
  /** Direction from the spin axis [rad]; 0 when no mass is needed. */
  angle: number;
  /** [m] */
  x: number;
  /** [m] */
  y: number;
  /** Height of the plane [m]. */
  z: number;
  /** m·r [kg·m] */
  unbalance: number;
}

export interface TwoPlaneCorrection {
  lower: CorrectionMass;
  upper: CorrectionMass;
}

/**
 * Two correction masses, one in each of two planes at heights z1 and z2 and at a common radius,
 * that cancel both the static and the couple unbalance about the geometric axis, solved exactly
 * (rigid-rotor-unbalance; centre-of-mass; parallel-axis-theorem for the products).
 *
 * Formula: with $\mathbf U = \sum m\,(x, y)$ and $\mathbf C = \sum [ (I'_{xz}, I'_{yz}) + m\,(x, y)\,z ]$,
 * $\mathbf u_1 + \mathbf u_2 = -\mathbf U$ and $z_1\mathbf u_1 + z_2\mathbf u_2 = -\mathbf C$, so
 * $\mathbf u_1 = \dfrac{z_2\mathbf U - \mathbf C}{z_1 - z_2}$, $\mathbf u_2 = \dfrac{\mathbf C - z_1\mathbf U}{z_1 - z_2}$,
 * $m_i = |\mathbf u_i| / r$
 *
 * @param firstMomentX U_x = Σ m x [kg·m] (MassProperties.firstMomentX)
 * @param firstMomentY U_y [kg·m]
 * @param productXZ C_x = Σ (I'_xz + m x z), about the geometric axis from z = 0 [kg·m²] (MassProperties.productXZAboutOrigin)
 * @param productYZ C_y [kg·m²]
 * @param planeZ1 z1, height of the lower correction plane [m]
 * @param planeZ2 z2, height of the upper plane [m], different from z1
 * @param radius r, the correction radius [m], greater than 0
 * @returns lower and upper correction masses (mass [kg], angle [rad], position [m])
 *
 * Assumptions: the corrections are point masses; after adding them the centre of mass lies on the
 * geometric axis and both products of inertia about it vanish. Example: 10 g at (50 mm, 0, 10 mm)
 * alone, planes at 0 and 20 mm, r = 50 mm: 5 g at 180° in each plane.
 * Sources: rigid-rotor-unbalance, centre-of-mass, parallel-axis-theorem.
 */
export function twoPlaneCorrection(input: {
  firstMomentX: number;
  firstMomentY: number;
  productXZ: number;
  productYZ: number;
  planeZ1: number;
  planeZ2: number;
  radius: number;
}): TwoPlaneCorrection {
  const { firstMomentX: ux, firstMomentY: uy, productXZ: cx, productYZ: cy, planeZ1: z1, planeZ2: z2, radius } = input;
  requireFinite("firstMomentX", ux, "kg·m");
  requireFinite("firstMomentY", uy, "kg·m");
  requireFinite("productXZ", cx, "kg·m²");
  requireFinite("productYZ", cy, "kg·m²");
  requireCoordinate("planeZ1", z1);
  requireCoordinate("planeZ2", z2);
  requireLength("radius", radius);
  if (!(z1 !== z2)) {
    throw new CalcInputError({ param: "planeZ2", value: z2, expected: `a height different from the other plane (${z1} m)`, unit: "m" });
  }
  const span = z1 - z2;
  const place = (vx: number, vy: number, z: number): CorrectionMass => {
    const unbalance = Math.hypot(vx, vy);
    const angle = unbalance > 0 ? directionOf(vx, vy) : 0;
    return { mass: unbalance / radius, angle, x: radius * Math.cos(angle), y: radius * Math.sin(angle), z, unbalance };
  };
  return {
    lower: place((z2 * ux - cx) / span, (z2 * uy - cy) / span, z1),
    upper: place((cx - z1 * ux) / span, (cy - z1 * uy) / span, z2),
  };
}

// ---------------------------------------------------------------------------------------------
// Counterweights: bring the centre of mass back within a target offset.

interface CentreInput {
  /** M, mass before the counterweight [kg] */
  totalMass: number;
  /** x̄ [m] */
  centreX: number;
  /** ȳ [m] */
  centreY: number;
  /** e_target, the largest acceptable offset [m], greater than 0 */
  targetOffset: number;
}

function checkCentre({ totalMass, centreX, centreY, targetOffset }: CentreInput): number {
  requirePositive("totalMass", totalMass, "kg");
  requireCoordinate("centreX", centreX);
  requireCoordinate("centreY", centreY);
  requirePositive("targetOffset", targetOffset, "m");
  return Math.hypot(centreX, centreY);
}

/** Plan offset of the centre of mass after adding mass m at (px, py). */
function offsetWith(totalMass: number, centreX: number, centreY: number, mass: number, px: number, py: number): number {
  const total = totalMass + mass;
  return Math.hypot((totalMass * centreX + mass * px) / total, (totalMass * centreY + mass * py) / total);
}

export interface CounterweightAtRadius {
  /** "not-needed" when the offset is already within the target. */
  status: "not-needed" | "placed";
  /** Least mass that brings the offset to the target [kg] (0 when not needed). */
  mass: number;
  /** Mass that brings the offset to exactly 0: M e / r [kg]. */
  massForZero: number;
  /** Largest mass that still keeps the offset within the target [kg]; null when any larger mass also works (r ≤ e_target). */
  maxMass: number | null;
  /** Direction to mount it, opposite the offset [rad]. */
  angle: number;
  /** [m] */
  x: number;
  /** [m] */
  y: number;
  /** Offset after adding `mass` [m]. */
  offsetAfter: number;
}

/**
 * Counterweight at a given radius: how much mass, and in which direction, brings the centre of
 * mass within a target offset (centre-of-mass).
 *
 * Formula: placed opposite the offset, $|M e - m r| \le e_t (M + m)$, so
 * $m_{min} = \dfrac{M (e - e_t)}{r + e_t}$, $m_0 = \dfrac{M e}{r}$, $m_{max} = \dfrac{M (e + e_t)}{r - e_t}$
 *
 * @param totalMass M [kg], centreX x̄ [m], centreY ȳ [m], targetOffset e_t [m] > 0
 * @param radius r, where the counterweight's centre will sit [m], greater than 0
 * @returns status, mass [kg], massForZero [kg], maxMass [kg] or null, angle [rad], x, y [m], offsetAfter [m]
 *
 * Assumptions: the counterweight is a point mass. The direction opposite the offset needs the least
 * mass at any radius (it shortens the first moment the most for each gram). Example: 1.4 kg with
 * e = 2 mm, e_t = 0.2 mm, r = 55 mm: 45.65 g (50.91 g for zero offset).
 * Sources: centre-of-mass.
 */
export function counterweightAtRadius(input: CentreInput & { radius: number }): CounterweightAtRadius {
  const e = checkCentre(input);
  const { totalMass, centreX, centreY, targetOffset, radius } = input;
  requireLength("radius", radius);
  const angle = e > 0 ? directionOf(-centreX, -centreY) : 0;
  const x = radius * Math.cos(angle);
  const y = radius * Math.sin(angle);
  const massForZero = (totalMass * e) / radius;
  const maxMass = radius > targetOffset ? (totalMass * (e + targetOffset)) / (radius - targetOffset) : null;
  if (e <= targetOffset) {
    return { status: "not-needed", mass: 0, massForZero, maxMass, angle, x, y, offsetAfter: e };
  }
  const mass = (totalMass * (e - targetOffset)) / (radius + targetOffset);
  return { status: "placed", mass, massForZero, maxMass, angle, x, y, offsetAfter: offsetWith(totalMass, centreX, centreY, mass, x, y) };
}

export interface CounterweightForMass {
  /** "too-far-out" when even the smallest workable radius exceeds the max radius. */
  status: "not-needed" | "placed" | "too-far-out";
  /**
   * Recommended radius: the zero-offset radius when it fits inside the max radius, else the max
   * radius itself (the workable radius nearest the zero-offset one, which leaves the smallest
   * offset) [m]; null when impossible.
   */
  radius: number | null;
  /** Radius for zero offset, M e / m [m]. */
  radiusForZero: number;
  /** Smallest radius that meets the target, (M e − e_t(M+m))/m, not below 0 [m]. */
  minRadius: number;
  /** Largest radius that meets the target, (M e + e_t(M+m))/m [m]. */
  maxRadiusWithinTarget: number;
  /** Direction to mount it, opposite the offset [rad]. */
  angle: number;
  /** Position at the recommended radius [m]; null when impossible. */
  x: number | null;
  y: number | null;
  /** Offset after mounting at the recommended radius [m]; null when impossible. */
  offsetAfter: number | null;
}

/**
 * Counterweight of a given mass: at what radius, and in which direction, it brings the centre of
 * mass within the target, and whether that radius fits inside the robot (centre-of-mass).
 *
 * Formula: opposite the offset, $|M e - m r| \le e_t (M + m)$ gives
 * $r \in \left[\dfrac{M e - e_t (M+m)}{m},\ \dfrac{M e + e_t (M+m)}{m}\right]$, with $r_0 = M e / m$
 *
 * @param totalMass M [kg], centreX, centreY [m], targetOffset e_t [m] > 0
 * @param mass m, the counterweight [kg], greater than 0
 * @param maxRadius the largest radius a counterweight can be mounted at [m], greater than 0
 * @returns status, radius (recommended) [m] or null, radiusForZero, minRadius, maxRadiusWithinTarget [m], angle [rad], x, y, offsetAfter
 *
 * Assumptions: when r_0 lies beyond the max radius but the workable band reaches inside it, the
 * max radius is recommended: it is the closest to r_0 the robot allows, so it leaves the smallest
 * offset, rather than the band's inner edge, where the offset sits exactly on the target and any
 * mounting tolerance pushes it out.
 * Example: 1.4 kg with e = 2 mm, e_t = 0.2 mm, m = 50 g: r_0 = 56 mm; workable 50.2–61.8 mm. With a
 * 53 mm limit: 53 mm, offset 0.103 mm. With a 45 mm limit: too far out.
 * Sources: centre-of-mass.
 */
export function counterweightRadiusForMass(input: CentreInput & { mass: number; maxRadius: number }): CounterweightForMass {
  const e = checkCentre(input);
  const { totalMass, centreX, centreY, targetOffset, mass, maxRadius } = input;
  requirePositive("mass", mass, "kg");
  requireInRange("mass", mass, "kg", { min: 0, max: MAX_PART_MASS, minOpen: true });
  requireLength("maxRadius", maxRadius);
  const angle = e > 0 ? directionOf(-centreX, -centreY) : 0;
  const radiusForZero = (totalMass * e) / mass;
  const minRadius = Math.max(0, (totalMass * e - targetOffset * (totalMass + mass)) / mass);
  const maxRadiusWithinTarget = (totalMass * e + targetOffset * (totalMass + mass)) / mass;
  const status: CounterweightForMass["status"] = e <= targetOffset ? "not-needed" : minRadius > maxRadius ? "too-far-out" : "placed";
  if (status === "too-far-out") {
    return { status, radius: null, radiusForZero, minRadius, maxRadiusWithinTarget, angle, x: null, y: null, offsetAfter: null };
  }
  const radius = Math.min(radiusForZero, maxRadius);
  const x = radius * Math.cos(angle);
  const y = radius * Math.sin(angle);
  return { status, radius, radiusForZero, minRadius, maxRadiusWithinTarget, angle, x, y, offsetAfter: offsetWith(totalMass, centreX, centreY, mass, x, y) };
}

/** A mounting point offered for a counterweight [m]. */
export interface MountingPoint {
  x: number;
  y: number;
}

export interface CandidateResult {
  index: number;
  x: number;
  y: number;
  /** False when no mass at this point reaches the target. */
  feasible: boolean;
  /** Least mass that reaches the target [kg]; null when infeasible. */
  mass: number | null;
  /** Offset with that mass [m]; null when infeasible. */
  offsetAfter: number | null;
  /** Why a point is infeasible, or "already within target". */
  reason: string | null;
}

export interface CandidateChoice {
  /** Index of the point needing the least mass, or null when none works. */
  best: number | null;
  candidates: readonly CandidateResult[];
}

/**
 * Picks, among given mounting points, the one that needs the least added mass to bring the centre
 * of mass within the target, solved exactly along the line from the centre of mass toward each
 * point (centre-of-mass).
 *
 * Formula: with $\mathbf c$ the offset and $\mathbf p$ the point, the least $m \ge 0$ with
 * $|M\mathbf c + m\mathbf p| \le e_t (M + m)$ is the first root of
 * $A m^2 + B m + C = 0$, $A = |\mathbf p|^2 - e_t^2$, $B = 2M(\mathbf c\cdot\mathbf p - e_t^2)$,
 * $C = M^2(|\mathbf c|^2 - e_t^2)$: $m = \dfrac{2C}{-B + \sqrt{B^2 - 4AC}}$
 *
 * @param totalMass M [kg], centreX, centreY [m], targetOffset e_t [m] > 0
 * @param candidates 1 to 100 mounting points (x, y) [m]
 * @returns best index or null, and each point's mass [kg], offsetAfter [m] or the reason it fails
 *
 * Assumptions: each point takes only mass (m ≥ 0), as a point mass. As m grows the centre of mass
 * slides from c toward p; a point works when that segment enters the target circle. The root form
 * used is free of cancellation and covers A > 0, A = 0 and A < 0 alike. Example: 1.4 kg with
 * c = (2 mm, 0), e_t = 0.2 mm, point (−55 mm, 0): 45.65 g; point (55 mm, 0): infeasible.
 * Sources: centre-of-mass.
 */
export function counterweightAtCandidates(input: CentreInput & { candidates: readonly MountingPoint[] }): CandidateChoice {
  const e = checkCentre(input);
  const { totalMass: M, centreX: cx, centreY: cy, targetOffset: et, candidates } = input;
  if (!Array.isArray(candidates) || candidates.length === 0 || candidates.length > 100) {
    throw new CalcInputError({
      param: "candidates",
      value: Array.isArray(candidates) ? candidates.length : String(candidates),
      expected: "a list of 1 to 100 mounting points",
      unit: "",
    });
  }
  const results = candidates.map((c, index): CandidateResult => {
    requireCoordinate(`candidates[${index}].x`, c.x);
    requireCoordinate(`candidates[${index}].y`, c.y);
    if (e <= et) return { index, x: c.x, y: c.y, feasible: true, mass: 0, offsetAfter: e, reason: "already within target" };
    const A = c.x * c.x + c.y * c.y - et * et;
    const B = 2 * M * (cx * c.x + cy * c.y - et * et);
    const C = M * M * (e - et) * (e + et);
    const D = B * B - 4 * A * C;
    const denominator = -B + Math.sqrt(Math.max(D, 0));
    if (D < 0 || !(denominator > 0)) {
      return {
        index,
        x: c.x,
        y: c.y,
        feasible: false,
        mass: null,
        offsetAfter: null,
        reason: "the line from the centre of mass toward this point never enters the target circle",
      };
    }
    const mass = (2 * C) / denominator;
    return { index, x: c.x, y: c.y, feasible: true, mass, offsetAfter: offsetWith(M, cx, cy, mass, c.x, c.y), reason: null };
  });
  let best: number | null = null;
  for (const r of results) if (r.feasible && (best === null || r.mass! < results[best]!.mass!)) best = r.index;
  return { best, candidates: results };
}

export interface AppliedCounterweight {
  /** The new parts list, ending with the counterweight. */
  parts: LayoutPart[];
  before: MassProperties;
  after: MassProperties;
}

/**
 * Adds a counterweight point mass to the layout and reports the mass properties before and after
 * (centre-of-mass; parallel-axis-theorem).
 *
 * @param parts the parts list (checked)
 * @param mass [kg], greater than 0
 * @param x, y, z where its centre sits [m]
 * @param name row name, default "counterweight"
 * @returns the new list, and MassProperties before and after
 *
 * Example: 1 kg at (10 mm, 0) plus 0.1 kg at (−100 mm, 0) puts the centre of mass on the axis.
 *
 * Assumptions: a counterweight at the height of the centre of mass (z = z̄) leaves the products of
 * inertia about the centre of mass unchanged; any other height adds couple unbalance.
 * Sources: centre-of-mass, parallel-axis-theorem.
 */
export function applyCounterweight({
  parts,
  mass,
  x,
  y,
  z,
  name = "counterweight",
}: {
  parts: readonly LayoutPart[];
  mass: number;
  x: number;
  y: number;
  z: number;
  name?: string;
}): AppliedCounterweight {
  const before = massProperties(parts);
  requireInRange("mass", mass, "kg", { min: 0, max: MAX_PART_MASS, minOpen: true });
  const counterweight: LayoutPart = { name, shape: { kind: "point" }, mass: { kind: "given", mass }, x, y, z };
  checkPart(counterweight, "counterweight");
  const next = [...parts, counterweight];
  return { parts: next, before, after: massProperties(next) };
}

// ---------------------------------------------------------------------------------------------
// True sensor radius and the heading drift it causes.

export interface TrueSensorRadius {
  /** r, distance from the actual spin axis (the centre of mass) [m]. */
  radiusTrue: number;
  /** r̂, distance from the geometric centre, which the firmware assumes [m]. */
  radiusAssumed: number;
  /** r − r̂ [m]. */
  difference: number;
  /** ω̂/ω = √(r/r̂) [-]. */
  rateRatio: number;
  /** ω̂/ω − 1 [-]. */
  rateError: number;
  /** Heading drift per true revolution, 2π(√(r/r̂) − 1) [rad] (positive: the estimate runs ahead). */
  driftPerRevolution: number;
  /** Angle between the true radial direction and the direction to the geometric centre [rad]. */
  axisMisalignment: number;
  /** The same figures for a single sensing axis aimed at the geometric centre; null when its reading would be 0 or negative. */
  singleAxis: { radialComponent: number; rateRatio: number; driftPerRevolution: number } | null;
}

/**
 * Where a sensor really sits relative to the spin axis, and the heading drift when the firmware
 * assumes the geometric radius (openstax-college-physics, a = ω² r).
 *
 * Formula: $r = |\mathbf p - \bar{\mathbf c}|$, $\hat r = |\mathbf p|$, $a = \omega^2 r$,
 * $\hat\omega = \sqrt{a / \hat r} = \omega\sqrt{r/\hat r}$, drift per revolution $= 2\pi\left(\sqrt{r/\hat r} - 1\right)$
 *
 * @param centreX x̄ [m], centreY ȳ [m] (the centre of mass the body spins about)
 * @param sensorX sensor position x [m], sensorY [m]; not at the geometric centre
 * @returns radii [m], ratios [-], drift [rad per revolution], misalignment [rad], single-axis figures
 *
 * Assumptions: steady spin about the centre of mass; `rateRatio` is for a reading of the whole
 * in-plane acceleration (two axes combined). A single axis aimed at the geometric centre reads only
 * the component ω²(r̂ − c·p̂) and gives `singleAxis`. Example: sensor at (−32 mm, 0), centre of mass
 * at (2 mm, 0): r = 34 mm, ω̂/ω = 1.0308, drift +11.1° per revolution.
 * Sources: openstax-college-physics.
 */
export function trueSensorRadius({
  centreX,
  centreY,
  sensorX,
  sensorY,
}: {
  centreX: number;
  centreY: number;
  sensorX: number;
  sensorY: number;
}): TrueSensorRadius {
  requireCoordinate("centreX", centreX);
  requireCoordinate("centreY", centreY);
  requireCoordinate("sensorX", sensorX);
  requireCoordinate("sensorY", sensorY);
  const radiusAssumed = Math.hypot(sensorX, sensorY);
  if (!(radiusAssumed > 0)) {
    throw new CalcInputError({
      param: "sensorX",
      value: sensorX,
      expected: "a sensor position away from the geometric centre (radius greater than 0 m)",
      unit: "m",
    });
  }
  const dx = sensorX - centreX;
  const dy = sensorY - centreY;
  const radiusTrue = Math.hypot(dx, dy);
  const rateRatio = Math.sqrt(radiusTrue / radiusAssumed);
  const radialComponent = (sensorX * dx + sensorY * dy) / radiusAssumed;
  const sideways = (sensorX * dy - sensorY * dx) / radiusAssumed;
  const axisMisalignment = radiusTrue > 0 ? Math.atan2(sideways, radialComponent) : 0;
  const singleRatio = radialComponent > 0 ? Math.sqrt(radialComponent / radiusAssumed) : null;
  return {
    radiusTrue,
    radiusAssumed,
    difference: radiusTrue - radiusAssumed,
    rateRatio,
    rateError: rateRatio - 1,
    driftPerRevolution: 2 * Math.PI * (rateRatio - 1),
    axisMisalignment,
    singleAxis: singleRatio === null ? null : { radialComponent, rateRatio: singleRatio, driftPerRevolution: 2 * Math.PI * (singleRatio - 1) },
  };
}

// ---------------------------------------------------------------------------------------------
// The mass-and-balance calculator: its scalar inputs and its one entry point.

/** Scalar inputs of the mass-and-balance calculator, in SI (the parts list comes separately). */
export const massBalanceInputs = defineInputs({
  spinSpeed: {
    label: "Spin speed",
    kind: "angularSpeed",
    min: 0,
    minOpen: true,
    max: rpmToRadPerSecond(60000),
    default: rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The fastest the robot spins in service.",
  },
  targetOffset: {
    label: "Target offset",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 0.05,
    default: 0.0002,
    urlKey: "et",
    help: "The largest distance between the centre of mass and the geometric centre you will accept.",
  },
  balanceGrade: {
    label: "Balance grade",
    kind: "speed",
    min: 0.0004,
    max: 4,
    default: 0.1,
    urlKey: "G",
    unit: { metric: "mm/s", us: "mm/s" },
    help: "Balance quality grade G = e·Ω in mm/s, from G 0.4 to G 4000; G 100 is 100 mm/s.",
  },
  correctionRadius: {
    label: "Counterweight radius",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 2,
    default: 0.055,
    urlKey: "cr",
    help: "Distance from the geometric centre at which a counterweight (or a correction mass) can sit.",
  },
  maxRadius: {
    label: "Largest mounting radius",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 2,
    default: 0.065,
    urlKey: "rmax",
    help: "The farthest from the centre a counterweight can be mounted.",
  },
  counterweightMass: {
    label: "Counterweight mass",
    kind: "mass",
    min: 0,
    minOpen: true,
    max: 100,
    default: 0.045,
    urlKey: "cm",
    help: "A counterweight you already have: the calculator finds the radius it needs.",
  },
  planeZ1: {
    label: "Lower correction plane",
    kind: "length",
    min: -2,
    max: 2,
    default: 0.004,
    urlKey: "z1",
    help: "Height of the lower plane for a two-plane correction.",
  },
  planeZ2: {
    label: "Upper correction plane",
    kind: "length",
    min: -2,
    max: 2,
    default: 0.024,
    urlKey: "z2",
    help: "Height of the upper plane; must differ from the lower one.",
  },
  sensorX: {
    label: "Sensor x",
    kind: "length",
    min: -2,
    max: 2,
    default: -0.032,
    urlKey: "sx",
    help: "Sensor position from the geometric centre, x.",
  },
  sensorY: {
    label: "Sensor y",
    kind: "length",
    min: -2,
    max: 2,
    default: 0,
    urlKey: "sy",
    help: "Sensor position from the geometric centre, y.",
  },
});

export type MassBalanceScalars = { [K in keyof typeof massBalanceInputs]: number };

export type MassBalanceInput = MassBalanceScalars & {
  /** The parts list. */
  parts: readonly LayoutPart[];
  /** Mounting points offered for a counterweight (optional). */
  candidates?: readonly MountingPoint[];
};

export interface MassBalance {
  layout: MassProperties;
  static: StaticUnbalance;
  /** e·Ω [m/s]. */
  equivalentGrade: number;
  /** The finest standard grade met, or null when coarser than G 4000. */
  gradeMet: BalanceGrade | null;
  /** U_per for the chosen grade. */
  permissible: PermissibleUnbalance;
  /** Whether U ≤ U_per. */
  gradeVerdict: "meets-grade" | "exceeds-grade";
  /** Whether e ≤ e_target. */
  offsetVerdict: "within-target" | "outside-target";
  couple: CoupleUnbalance;
  twoPlane: TwoPlaneCorrection;
  counterweight: {
    atRadius: CounterweightAtRadius;
    forMass: CounterweightForMass;
    candidates: CandidateChoice | null;
  };
  /**
   * The layout with the least counterweight added: at the best candidate if one works, else at the
   * correction radius; at height z̄. "too-heavy" (layout unchanged) when the mass would exceed the
   * 10 000 kg part limit.
   */
  fix: AppliedCounterweight & { method: "none" | "correction-radius" | "candidate" | "too-heavy" };
  sensor: { before: TrueSensorRadius; after: TrueSensorRadius };
}

/**
 * The mass-and-balance check: mass properties of the layout, static and couple unbalance, the
 * balance grade it meets against the chosen one, counterweight options, a two-plane correction,
 * the layout with the counterweight added, and the sensor radius before and after.
 *
 * Formula: $e = |\bar{\mathbf c}|$, $U = M e$, $G = e\,\Omega$, $U_{per} = M G_{chosen} / \Omega$,
 * $M_{rock} = \Omega^2\sqrt{I_{xz}^2 + I_{yz}^2}$, $m_{min} = M(e - e_t)/(r + e_t)$
 *
 * @param input the parts, optional candidates, and every field of `massBalanceInputs` (SI)
 * @returns MassBalance
 *
 * Assumptions: rigid body spinning steadily about the vertical axis through its centre of mass; the
 * counterweight goes at the height of the centre of mass so that it adds no couple.
 * Sources: centre-of-mass, parallel-axis-theorem, iso-21940-11, rigid-rotor-unbalance,
 * openstax-college-physics.
 */
export function massBalance(input: MassBalanceInput): MassBalance {
  const { parts, candidates, spinSpeed, targetOffset, balanceGrade, correctionRadius, maxRadius, counterweightMass, planeZ1, planeZ2, sensorX, sensorY } =
    input;
  requirePositive("spinSpeed", spinSpeed, "rad/s");
  const layout = massProperties(parts);
  const stat = staticUnbalance({ totalMass: layout.totalMass, offset: layout.offset, angularSpeed: spinSpeed });
  const equivalentGrade = equivalentBalanceGrade({ offset: layout.offset, angularSpeed: spinSpeed });
  requireInRange("balanceGrade", balanceGrade, "m/s", { min: 0.0004, max: 4 });
  const permissible = permissibleResidualUnbalance({ totalMass: layout.totalMass, grade: balanceGrade, angularSpeed: spinSpeed });
  const centre = { totalMass: layout.totalMass, centreX: layout.centreX, centreY: layout.centreY, targetOffset };
  const atRadius = counterweightAtRadius({ ...centre, radius: correctionRadius });
  const forMass = counterweightRadiusForMass({ ...centre, mass: counterweightMass, maxRadius });
  const choice = candidates && candidates.length > 0 ? counterweightAtCandidates({ ...centre, candidates }) : null;
  const twoPlane = twoPlaneCorrection({
    firstMomentX: layout.firstMomentX,
    firstMomentY: layout.firstMomentY,
    productXZ: layout.productXZAboutOrigin,
    productYZ: layout.productYZAboutOrigin,
    planeZ1,
    planeZ2,
    radius: correctionRadius,
  });
  const bestCandidate = choice && choice.best !== null ? choice.candidates[choice.best]! : null;
  const unchanged = { parts: [...parts], before: layout, after: layout };
  const useCandidate = bestCandidate !== null && bestCandidate.mass !== null && bestCandidate.mass > 0;
  const fixMass = useCandidate ? bestCandidate.mass! : atRadius.mass;
  let fix: MassBalance["fix"];
  if (atRadius.status === "not-needed") {
    fix = { method: "none", ...unchanged };
  } else if (!(fixMass <= MAX_PART_MASS)) {
    fix = { method: "too-heavy", ...unchanged };
  } else if (useCandidate) {
    fix = { method: "candidate", ...applyCounterweight({ parts, mass: fixMass, x: bestCandidate.x, y: bestCandidate.y, z: layout.centreZ }) };
  } else {
    fix = { method: "correction-radius", ...applyCounterweight({ parts, mass: fixMass, x: atRadius.x, y: atRadius.y, z: layout.centreZ }) };
  }
  return {
    layout,
    static: stat,
    equivalentGrade,
    gradeMet: finestGradeMet(equivalentGrade),
    permissible,
    gradeVerdict: stat.unbalance <= permissible.unbalance ? "meets-grade" : "exceeds-grade",
    offsetVerdict: layout.offset <= targetOffset ? "within-target" : "outside-target",
    couple: coupleUnbalance({ productXZ: layout.productXZ, productYZ: layout.productYZ, angularSpeed: spinSpeed }),
    twoPlane,
    counterweight: { atRadius, forMass, candidates: choice },
    fix,
    sensor: {
      before: trueSensorRadius({ centreX: layout.centreX, centreY: layout.centreY, sensorX, sensorY }),
      after: trueSensorRadius({ centreX: fix.after.centreX, centreY: fix.after.centreY, sensorX, sensorY }),
    },
  };
}

// ---------------------------------------------------------------------------------------------
// The counterweight the calculator offers to add, with the figures after it.

/**
 * Which counterweight question to answer: the mass at a chosen radius ("radius"), the radius for a
 * mass in hand ("mass"), or the least mass among mounting points ("points").
 */
export type CounterweightMode = "radius" | "mass" | "points";

/** Balance figures of a layout, for a before/after comparison. */
export interface BalanceSnapshot {
  /** e [m] */
  offset: number;
  /** e·Ω [m/s] */
  equivalentGrade: number;
  /** Finest standard grade met, or null when coarser than G 4000. */
  gradeMet: BalanceGrade | null;
  /** The sensor about the new centre of mass. */
  sensor: TrueSensorRadius;
}

export interface CounterweightPlan {
  /**
   * "apply": adding `counterweight` brings the offset within the target; "not-needed": it already
   * is; "none": this mode has no answer (mass too light for the max radius, no feasible mounting
   * point, no points given, more than 10 000 kg, or the list already holds the most parts allowed).
   */
  status: "apply" | "not-needed" | "none";
  /** The point mass to add, at height z̄: mass [kg], position [m]; null unless "apply". */
  counterweight: { mass: number; x: number; y: number; z: number } | null;
  /** The layout with the counterweight as its last row, and its figures; null unless "apply". */
  after: (BalanceSnapshot & { parts: LayoutPart[] }) | null;
}

/** Rounds a positive value up to `figures` significant figures; exact values stay put. */
function roundUpSignificant(value: number, figures: number): number {
  const step = 10 ** (Math.floor(Math.log10(value)) - figures + 1);
  return Number((Math.ceil(value / step - 1e-9) * step).toPrecision(figures));
}

/**
 * The counterweight one mode of the calculator proposes, ready to add to the layout, and the
 * offset, balance grade and sensor figures with it in place (centre-of-mass; iso-21940-11 for the
 * grade; openstax-college-physics for the sensor radius).
 *
 * Formula: adding m at $\mathbf p$: $\bar{\mathbf c}' = \dfrac{M\bar{\mathbf c} + m\,\mathbf p}{M + m}$,
 * $e' = |\bar{\mathbf c}'|$, $G' = e'\,\Omega$
 *
 * @param input the calculator's input (parts, candidates and every scalar, SI)
 * @param balance massBalance(input)
 * @param mode "radius", "mass" or "points"
 * @returns status; counterweight (mass [kg], x, y, z [m]) or null; after (parts, offset [m],
 * equivalentGrade [m/s], gradeMet, sensor) or null
 *
 * Assumptions: a least mass puts the offset exactly on the target, where rounding or a mounting
 * tolerance pushes it out; so the "radius" and "points" masses are rounded UP to 3 significant
 * figures (what a workshop scale resolves), which moves the offset inside the target, unless that
 * would overshoot the far edge of the workable band (then the exact mass is kept). In "mass" mode
 * the given mass goes at the radius counterweightRadiusForMass recommends. The counterweight sits
 * at z̄, so it adds no couple.
 * Example: the invented demo robot (1.399 kg, e = 1.738 mm toward +x, target 0.2 mm, r = 55 mm)
 * needs 38.99 g; the plan adds 39.0 g at (−55, 0) mm and leaves e = 0.1996 mm.
 * Sources: centre-of-mass, iso-21940-11, openstax-college-physics.
 */
export function counterweightPlan({ input, balance, mode }: { input: MassBalanceInput; balance: MassBalance; mode: CounterweightMode }): CounterweightPlan {
  const none = (status: "not-needed" | "none"): CounterweightPlan => ({ status, counterweight: null, after: null });
  if (balance.offsetVerdict === "within-target") return none("not-needed");
  const { atRadius, forMass, candidates } = balance.counterweight;
  const best = candidates && candidates.best !== null ? candidates.candidates[candidates.best]! : null;
  const pick =
    mode === "radius"
      ? atRadius
      : mode === "mass"
        ? forMass.status === "placed"
          ? { mass: input.counterweightMass, x: forMass.x!, y: forMass.y! }
          : null
        : best;
  if (!pick || !(pick.mass! <= MAX_PART_MASS) || input.parts.length >= MAX_PARTS) return none("none");
  const z = balance.layout.centreZ;
  const place = (mass: number) => ({ mass, ...applyCounterweight({ parts: input.parts, mass, x: pick.x, y: pick.y, z }) });
  let placed = place(pick.mass!);
  if (mode !== "mass") {
    const rounded = place(roundUpSignificant(pick.mass!, 3));
    if (rounded.after.offset <= input.targetOffset) placed = rounded;
  }
  const { after } = placed;
  const equivalentGrade = equivalentBalanceGrade({ offset: after.offset, angularSpeed: input.spinSpeed });
  return {
    status: "apply",
    counterweight: { mass: placed.mass, x: pick.x, y: pick.y, z },
    after: {
      parts: placed.parts,
      offset: after.offset,
      equivalentGrade,
      gradeMet: finestGradeMet(equivalentGrade),
      sensor: trueSensorRadius({ centreX: after.centreX, centreY: after.centreY, sensorX: input.sensorX, sensorY: input.sensorY }),
    },
  };
}

// ---------------------------------------------------------------------------------------------
// Worked example: an invented demo robot.

/** Mass of one counterweight washer in the demo (an invented value for a plain steel washer) [kg]. */
export const DEMO_WASHER_MASS = 0.006;

/**
 * The parts list of an invented demo robot (not a real machine): a round body of about 1.4 kg with
 * an aluminium base, a steel armour ring, a polycarbonate lid, two drive motors, and a battery
 * pushed off-centre toward +x; its accelerometer sits on the far side at (−32 mm, 0).
 *
 * @returns the parts list (a new array each call); total 1.399 kg, centre of mass 1.74 mm toward +x
 *
 * Sources: asm-matweb-datasheets, substech-materials, matweb-polymer-overview (densities).
 */
export function demoRobotParts(): LayoutPart[] {
  return [
    { name: "base plate", shape: { kind: "disk", radius: 0.07 }, mass: { kind: "material", material: "al-6061-t6", thickness: 0.005 }, x: 0, y: 0, z: 0.0025 },
    {
      name: "armour ring",
      shape: { kind: "annulus", innerRadius: 0.068, outerRadius: 0.075 },
      mass: { kind: "material", material: "steel-4130-normalized", thickness: 0.025 },
      x: 0,
      y: 0,
      z: 0.0175,
    },
    { name: "lid", shape: { kind: "disk", radius: 0.07 }, mass: { kind: "material", material: "polycarbonate", thickness: 0.003 }, x: 0, y: 0, z: 0.0315 },
    {
      name: "battery",
      shape: { kind: "plate", length: 0.07, width: 0.035, angle: Math.PI / 2 },
      mass: { kind: "given", mass: 0.28 },
      x: 0.012,
      y: 0,
      z: 0.0135,
    },
    { name: "left drive motor", shape: { kind: "cylinder", radius: 0.014, height: 0.025 }, mass: { kind: "given", mass: 0.075 }, x: 0, y: 0.04, z: 0.0175 },
    { name: "right drive motor", shape: { kind: "cylinder", radius: 0.014, height: 0.025 }, mass: { kind: "given", mass: 0.075 }, x: 0, y: -0.04, z: 0.0175 },
    {
      name: "controller board",
      shape: { kind: "plate", length: 0.045, width: 0.03, angle: Math.PI / 6 },
      mass: { kind: "given", mass: 0.035 },
      x: -0.03,
      y: 0.02,
      z: 0.012,
    },
    { name: "accelerometer", shape: { kind: "point" }, mass: { kind: "given", mass: 0.004 }, x: -0.032, y: 0, z: 0.008 },
    {
      name: "wiring and fasteners",
      shape: { kind: "custom", inertiaZ: 4e-5, productXZ: 0, productYZ: 0 },
      mass: { kind: "given", mass: 0.05 },
      x: 0.005,
      y: -0.014,
      z: 0.012,
    },
  ];
}

export interface DemoRobotBalance {
  parts: LayoutPart[];
  spinSpeed: number;
  targetOffset: number;
  balance: MassBalance;
  /** Whole washers needed at the correction radius to reach the target [-]. */
  washers: number;
  /** Their total mass [kg]. */
  washerMass: number;
  /** The layout with the washer stack added, and its properties. */
  withWashers: AppliedCounterweight;
  /** Sensor figures with the washers in place. */
  sensorWithWashers: TrueSensorRadius;
}

/**
 * The chapter's worked example on the invented demo robot: its unbalance at 2400 rpm, the
 * counterweight that brings its centre of mass within 0.2 mm, rounded up to whole 6 g washers
 * stacked under one bolt at 55 mm, and what that does to the sensor radius.
 *
 * @returns the inputs, the full MassBalance, the washer count and the layout with the washers
 * Sources: centre-of-mass, parallel-axis-theorem, iso-21940-11, openstax-college-physics.
 */
export function demoRobotBalance(): DemoRobotBalance {
  const parts = demoRobotParts();
  const defaults = Object.fromEntries(Object.entries(massBalanceInputs).map(([k, spec]) => [k, spec.default])) as MassBalanceScalars;
  const bolt = 0.055;
  const candidates: MountingPoint[] = [
    { x: bolt, y: 0 },
    { x: 0, y: bolt },
    { x: -bolt, y: 0 },
    { x: 0, y: -bolt },
  ];
  const balance = massBalance({ ...defaults, parts, candidates, correctionRadius: bolt });
  const needed = balance.counterweight.atRadius.mass;
  const washers = Math.ceil(needed / DEMO_WASHER_MASS - 1e-9);
  const washerMass = washers * DEMO_WASHER_MASS;
  const at = balance.counterweight.atRadius;
  const withWashers =
    washers > 0
      ? applyCounterweight({ parts, mass: washerMass, x: at.x, y: at.y, z: balance.layout.centreZ, name: `${washers} washers` })
      : { parts: [...parts], before: balance.layout, after: balance.layout };
  return {
    parts,
    spinSpeed: defaults.spinSpeed,
    targetOffset: defaults.targetOffset,
    balance,
    washers,
    washerMass,
    withWashers,
    sensorWithWashers: trueSensorRadius({
      centreX: withWashers.after.centreX,
      centreY: withWashers.after.centreY,
      sensorX: defaults.sensorX,
      sensorY: defaults.sensorY,
    }),
  };
}

/** Source keys this module relies on (checked by the meta test). */
export const MASS_BALANCE_SOURCE_KEYS: readonly SourceKey[] = [
  "centre-of-mass",
  "parallel-axis-theorem",
  "oxford-concise-mathematics",
  "young-freedman-university-physics",
  "mathmos-moments-of-inertia",
  "web-formulas-moment-of-inertia",
  "iso-21940-11",
  "bloch-geitner-machinery-maintenance",
  "energy-tech-balancing-example",
  "rigid-rotor-unbalance",
  "newton-second-law",
  "openstax-college-physics",
  "asm-matweb-datasheets",
];
