/**
 * Mass properties of a whole layout: total mass, centre of mass, moment of inertia about the spin
 * axis through the geometric centre and through the centre of mass, and the products of inertia
 * that make a couple unbalance. Positive-product convention:
 * $I_{xz} = \sum \left[ I'_{xz} + m\,(x - \bar x)(z - \bar z) \right]$.
 */
import { CalcInputError } from "../core/errors.ts";

import { type LayoutPart, MAX_PARTS, checkPart, massOf, ownInertiaOf } from "./parts.ts";
import { directionOf } from "./parts.ts";

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
 * @example
 * massProperties([{ name: "disk", shape: { kind: "disk", radius: 0.1 }, mass: { kind: "given", mass: 2 }, x: 0, y: 0, z: 0 }, { name: "weight", shape: { kind: "point" }, mass: { kind: "given", mass: 0.1 }, x: 0.1, y: 0, z: 0 }]) // → { totalMass: 2.1, centreX: 0.004762, inertiaAboutOrigin: 0.011, inertiaAboutCentre: 0.0109524, … } (I_G = 0.011 − 2.1·0.004762²)
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
  // Masses near the smallest doubles would lose their digits in m·x: the sums that give the centre
  // are taken over masses scaled up by a power of two (exact), then scaled back.
  const scale = Math.max(...masses) < 2 ** -500 ? 2 ** 500 : 1;
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
    totalMass += m * scale;
    sx += m * scale * p.x;
    sy += m * scale * p.y;
    sz += m * scale * p.z;
    inertiaAboutOrigin += o.inertiaZ + m * (p.x * p.x + p.y * p.y);
    productXZAboutOrigin += o.productXZ + m * p.x * p.z;
    productYZAboutOrigin += o.productYZ + m * p.y * p.z;
  });
  const centreX = sx / totalMass;
  const centreY = sy / totalMass;
  const centreZ = sz / totalMass;
  const fractions = masses.map((m) => (m * scale) / totalMass);
  totalMass /= scale;
  sx /= scale;
  sy /= scale;
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
      massFraction: fractions[i]!,
    })),
  };
}
