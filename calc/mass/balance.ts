/**
 * Balance of a spinning body: static unbalance and the force it makes, balance quality grades and
 * the permissible residual unbalance (ISO 21940-11), couple unbalance from the products of inertia,
 * and a two-plane correction. SI: kg, m, kg·m, rad/s, N, N·m, and G in m/s.
 */
import { CalcInputError, requireFinite, requireNonNegative, requirePositive } from "../core/errors.ts";

import { requireCoordinate, requireLength } from "./parts.ts";
import { directionOf } from "./parts.ts";
import { requireInputObject, requireFiniteFields, requireFiniteResult } from "../core/spec-check.ts";

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
 * wheel) orbits it on a circle of radius e.
 * @example
 * staticUnbalance({ totalMass: 1.4, offset: 0.002, angularSpeed: rpmToRadPerSecond(2400) }) // → { unbalance: 0.0028, force: 176.9 } (U = 2800 g·mm)
 * Sources: rigid-rotor-unbalance, newton-second-law.
 */
export function staticUnbalance(input: { totalMass: number; offset: number; angularSpeed: number }): StaticUnbalance {
  const { totalMass, offset, angularSpeed } = requireInputObject(input);
  requirePositive("totalMass", totalMass, "kg");
  requireNonNegative("offset", offset, "m");
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  const unbalance = totalMass * offset;
  return requireFiniteFields({ unbalance, force: unbalance * angularSpeed * angularSpeed }, "static unbalance", {
    totalMass: [totalMass, "kg"],
    offset: [offset, "m"],
    angularSpeed: [angularSpeed, "rad/s"],
  });
}

export { BALANCE_GRADES, type BalanceGrade, standardBalanceGrade } from "./balance-grades.ts";
import { BALANCE_GRADES, type BalanceGrade } from "./balance-grades.ts";

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
 * @example
 * equivalentBalanceGrade({ offset: 20.05e-6, angularSpeed: rpmToRadPerSecond(3000) }) // → 0.00630 [m/s] (G 6.3)
 * Sources: iso-21940-11.
 */
export function equivalentBalanceGrade(input: { offset: number; angularSpeed: number }): number {
  const { offset, angularSpeed } = requireInputObject(input);
  requireNonNegative("offset", offset, "m");
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  return requireFiniteResult(offset * angularSpeed, "balance grade", { offset: [offset, "m"], angularSpeed: [angularSpeed, "rad/s"] });
}

/**
 * The finest standard grade a body meets: the smallest G in `BALANCE_GRADES` at or above its
 * equivalent grade (iso-21940-11), or null when it is coarser than G 4000.
 *
 * @param grade the equivalent grade [m/s], 0 or more
 * @returns the grade, or null
 *
 * @example
 * finestGradeMet(0.0063) // → { label: "G 6.3", value: 0.0063 }
 * finestGradeMet(0.00631) // → { label: "G 16", value: 0.016 }
 * Sources: iso-21940-11.
 */
export function finestGradeMet(grade: number): BalanceGrade | null {
  requireNonNegative("grade", grade, "m/s");
  // A value equal to a grade up to rounding (e.g. 0.0063000000000001) meets that grade.
  // Stryker disable next-line EqualityOperator: equivalent, < and ≤ differ only at exactly the grade × (1 + 10⁻¹²)
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
 * to that plane; with two planes, half is usually allowed in each.
 * @example
 * permissibleResidualUnbalance({ totalMass: 453.59237, grade: 0.0025, angularSpeed: rpmToRadPerSecond(15000) }) // → { unbalance: 7.219e-4, perPlane: 3.610e-4, … } (1000 lb at 15 000 rpm, G 2.5: 721.9 g·mm = 1.003 oz·in, 0.501 oz·in per plane)
 * Sources: iso-21940-11, energy-tech-balancing-example, bloch-geitner-machinery-maintenance.
 */
export function permissibleResidualUnbalance(input: { totalMass: number; grade: number; angularSpeed: number }): PermissibleUnbalance {
  const { totalMass, grade, angularSpeed } = requireInputObject(input);
  requirePositive("totalMass", totalMass, "kg");
  requirePositive("grade", grade, "m/s");
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  const specificUnbalance = grade / angularSpeed;
  const unbalance = totalMass * specificUnbalance;
  return requireFiniteFields({ unbalance, specificUnbalance, perPlane: unbalance / 2 }, "permissible unbalance", {
    totalMass: [totalMass, "kg"],
    grade: [grade, "m/s"],
    angularSpeed: [angularSpeed, "rad/s"],
  });
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
 * magnitude. For 10 g at (50 mm, 0, +10 mm) and 10 g at (−50 mm, 0, −10 mm), I_xz = 1.0e-5 kg·m².
 * @example
 * coupleUnbalance({ productXZ: 1e-5, productYZ: 0, angularSpeed: rpmToRadPerSecond(2400) }) // → { couple: 1.0e-5, moment: 0.632, … }
 * Sources: rigid-rotor-unbalance.
 */
export function coupleUnbalance(input: { productXZ: number; productYZ: number; angularSpeed: number }): CoupleUnbalance {
  const { productXZ, productYZ, angularSpeed } = requireInputObject(input);
  requireFinite("productXZ", productXZ, "kg·m²");
  requireFinite("productYZ", productYZ, "kg·m²");
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  const couple = Math.hypot(productXZ, productYZ);
  return requireFiniteFields(
    { couple, moment: angularSpeed * angularSpeed * couple, angle: couple > 0 ? directionOf(productXZ, productYZ) : 0 },
    "couple unbalance",
    { productXZ: [productXZ, "kg·m²"], productYZ: [productYZ, "kg·m²"], angularSpeed: [angularSpeed, "rad/s"] },
  );
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
 * geometric axis and both products of inertia about it vanish. For 10 g at (50 mm, 0, 10 mm) alone (first moment 5e-4 kg·m, product 5e-6 kg·m²), planes at 0
 * and 20 mm, r = 50 mm: 5 g at 180° (π rad) in each plane.
 * @example
 * twoPlaneCorrection({ firstMomentX: 5e-4, firstMomentY: 0, productXZ: 5e-6, productYZ: 0, planeZ1: 0, planeZ2: 0.02, radius: 0.05 }) // → { lower: { mass: 0.005, angle: 3.1416, … }, upper: { mass: 0.005, angle: 3.1416, … } }
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
  const { firstMomentX: ux, firstMomentY: uy, productXZ: cx, productYZ: cy, planeZ1: z1, planeZ2: z2, radius } = requireInputObject(input);
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
    // A vector past the doubles has no direction: the finiteness guard below names the input instead.
    const angle = unbalance > 0 && Number.isFinite(unbalance) ? directionOf(vx, vy) : 0;
    return { mass: unbalance / radius, angle, x: radius * Math.cos(angle), y: radius * Math.sin(angle), z, unbalance };
  };
  return requireFiniteFields(
    { lower: place((z2 * ux - cx) / span, (z2 * uy - cy) / span, z1), upper: place((cx - z1 * ux) / span, (cy - z1 * uy) / span, z2) },
    "correction mass",
    {
      radius: [radius, "m"],
      firstMomentX: [ux, "kg·m"],
      firstMomentY: [uy, "kg·m"],
      productXZ: [cx, "kg·m²"],
      productYZ: [cy, "kg·m²"],
      planeZ1: [z1, "m"],
      planeZ2: [z2, "m"],
    },
  );
}
