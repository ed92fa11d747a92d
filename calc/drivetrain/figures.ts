/**
 * Closed-form figures of a spinning rotor at a speed: stored energy, tip speed, bite, and the
 * acceleration a traction or current limit allows. SI: kg·m², rad/s, m, m/s, J, N·m.
 */
import { requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireWhole, requireInputObject, requireFiniteResult } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// Closed-form figures at a speed.

/**
 * Kinetic energy of a body spinning about a fixed axis (openstax-university-physics-1).
 *
 * Formula: $E = \tfrac12 J \Omega^2$
 *
 * @param inertia J, moment of inertia about the spin axis [kg·m²], 0 or more
 * @param angularSpeed Ω [rad/s], finite
 * @returns E [J]
 *
 * @example
 * rotorKineticEnergy({ inertia: 1e-4, angularSpeed: 760 }) // → 28.88 [J] (softschools-rotational-ke)
 * rotorKineticEnergy({ inertia: 0.01, angularSpeed: rpmToRadPerSecond(2000) }) // → 219.32 [J]
 *
 * Sources: openstax-university-physics-1, softschools-rotational-ke.
 */
export function rotorKineticEnergy(input: { inertia: number; angularSpeed: number }): number {
  const { inertia, angularSpeed } = requireInputObject(input);
  requireNonNegative("inertia", inertia, "kg·m²");
  requireFinite("angularSpeed", angularSpeed, "rad/s");
  return requireFiniteResult(0.5 * inertia * angularSpeed * angularSpeed, "kinetic energy", {
    inertia: [inertia, "kg·m²"],
    angularSpeed: [angularSpeed, "rad/s"],
  }); // openstax-university-physics-1: K = ½Iω²
}

/**
 * Peripheral speed of a point at a radius from the spin axis (openstax-university-physics-1).
 *
 * Formula: $v = \Omega r$
 *
 * @param angularSpeed Ω [rad/s], 0 or more
 * @param radius r [m], 0 or more
 * @returns v [m/s]
 *
 * @example
 * rotorTipSpeed({ angularSpeed: rpmToRadPerSecond(10000), radius: 0.06 }) // → 62.83 [m/s]
 * Sources: openstax-university-physics-1.
 */
export function rotorTipSpeed(input: { angularSpeed: number; radius: number }): number {
  const { angularSpeed, radius } = requireInputObject(input);
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requireNonNegative("radius", radius, "m");
  return requireFiniteResult(angularSpeed * radius, "rotor tip speed", { angularSpeed: [angularSpeed, "rad/s"], radius: [radius, "m"] }); // openstax-university-physics-1: v = rω
}

/**
 * Bite of a spinning weapon: how far an opponent closes between two impactor passes (weapon-bite).
 *
 * Formula: $d = \dfrac{v\,T}{n} = \dfrac{2\pi v}{n\,\Omega}$ (in rpm: $d = v \cdot \dfrac{60}{\mathrm{rpm}} \cdot \dfrac1n$)
 *
 * @param closingSpeed v, speed at which the two robots approach [m/s], 0 or more
 * @param angularSpeed Ω, weapon speed [rad/s], greater than 0
 * @param impactors n, impactors evenly spaced around the weapon, a whole number 1 or more
 * @returns d [m]
 *
 * Assumptions: evenly spaced impactors of equal reach; constant closing speed over one pass.
 * @example
 * biteDepth({ closingSpeed: 3, angularSpeed: rpmToRadPerSecond(10000), impactors: 2 }) // → 0.0090 [m]
 * Sources: weapon-bite.
 */
export function biteDepth(input: { closingSpeed: number; angularSpeed: number; impactors: number }): number {
  const { closingSpeed, angularSpeed, impactors } = requireInputObject(input);
  requireNonNegative("closingSpeed", closingSpeed, "m/s");
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requireWhole("impactors", impactors, 1, 1000);
  return requireFiniteResult((closingSpeed * (2 * Math.PI)) / (angularSpeed * impactors), "bite depth", {
    closingSpeed: [closingSpeed, "m/s"],
    angularSpeed: [angularSpeed, "rad/s"],
  }); // weapon-bite: d = v·T/n
}

/**
 * Largest angular acceleration traction allows a whole-body spinner whose wheels slip
 * (serway-beichner-5e, kinetic friction at the contact, and Newton's second law for rotation).
 *
 * Formula: $\dot\Omega = \dfrac{\mu\,N_n\,R - T_f}{J}$, summed over the driven wheels ($N_n = s\,M\,g$ in total)
 *
 * @param frictionCoefficient μ, kinetic (sliding) or static (gripping) [-], greater than 0
 * @param normalForce N_n, total load on the driven wheels [N], greater than 0
 * @param contactRadius R, centre of mass to the wheels' contact points [m], greater than 0
 * @param inertia J, the robot about its centre of mass [kg·m²], greater than 0
 * @param frictionTorque T_f, constant friction torque (skids, bearings) [N·m], 0 or more (default 0)
 * @returns Ω̇ [rad/s²]; 0 when the friction torque holds the robot still
 *
 * @example
 * tractionLimitedAcceleration({ frictionCoefficient: 0.8, normalForce: 13.24, contactRadius: 0.07, inertia: 0.005 }) // → 148.3 [rad/s²]
 * Sources: serway-beichner-5e.
 */
export function tractionLimitedAcceleration(input: {
  frictionCoefficient: number;
  normalForce: number;
  contactRadius: number;
  inertia: number;
  frictionTorque?: number;
}): number {
  const { frictionCoefficient, normalForce, contactRadius, inertia, frictionTorque = 0 } = requireInputObject(input);
  requirePositive("frictionCoefficient", frictionCoefficient, "");
  requirePositive("normalForce", normalForce, "N");
  requirePositive("contactRadius", contactRadius, "m");
  requirePositive("inertia", inertia, "kg·m²");
  requireNonNegative("frictionTorque", frictionTorque, "N·m");
  return requireFiniteResult(Math.max(0, frictionCoefficient * normalForce * contactRadius - frictionTorque) / inertia, "acceleration", {
    frictionCoefficient: [frictionCoefficient, ""],
    normalForce: [normalForce, "N"],
    contactRadius: [contactRadius, "m"],
    inertia: [inertia, "kg·m²"],
    frictionTorque: [frictionTorque, "N·m"],
  }); // serway-beichner-5e: f_k = μ_k n
}

/**
 * Angular acceleration of a current-limited drive: every motor at its current limit, so the
 * torque is constant (motor-constants-wikipedia, gear-efficiency-model).
 *
 * Formula: $\dot\Omega = \dfrac{\eta\,G\,N\,K_t\,(I_{lim} - I_0) - T_f}{J + \eta G^2 N J_m}$
 *
 * @param currentLimit I_lim, per motor [A], greater than 0
 * @param torqueConstant K_t [N·m/A], greater than 0
 * @param inertia J at the output [kg·m²], greater than 0
 * @param motorCount N (default 1), ratio G (default 1), efficiency η (default 1)
 * @param noLoadCurrent I_0 [A] (default 0), frictionTorque T_f [N·m] (default 0), motorRotorInertia J_m [kg·m²] (default 0)
 * @returns Ω̇ [rad/s²]; 0 when the losses hold the drive still
 *
 * Example: I_lim = 60 A, Kv = 1400 rpm/V, G = 2, η = 0.95, I_0 = 1.2 A, T_f = 0.01 N·m,
 * J = 6.3 × 10⁻⁴ kg·m², J_m = 8 × 10⁻⁶ kg·m² → 1139 rad/s².
 *
 * Sources: motor-constants-wikipedia, gear-efficiency-model.
 */
export function currentLimitedAcceleration(input: {
  currentLimit: number;
  torqueConstant: number;
  inertia: number;
  motorCount?: number;
  ratio?: number;
  efficiency?: number;
  noLoadCurrent?: number;
  frictionTorque?: number;
  motorRotorInertia?: number;
}): number {
  const {
    currentLimit,
    torqueConstant,
    inertia,
    motorCount = 1,
    ratio = 1,
    efficiency = 1,
    noLoadCurrent = 0,
    frictionTorque = 0,
    motorRotorInertia = 0,
  } = requireInputObject(input);
  requirePositive("currentLimit", currentLimit, "A");
  requirePositive("torqueConstant", torqueConstant, "N·m/A");
  requirePositive("inertia", inertia, "kg·m²");
  requirePositive("motorCount", motorCount, "");
  requirePositive("ratio", ratio, "");
  requireInRange("efficiency", efficiency, "", { min: 0, max: 1, minOpen: true });
  requireNonNegative("noLoadCurrent", noLoadCurrent, "A");
  requireNonNegative("frictionTorque", frictionTorque, "N·m");
  requireNonNegative("motorRotorInertia", motorRotorInertia, "kg·m²");
  const drive = efficiency * ratio * motorCount * torqueConstant * (currentLimit - noLoadCurrent) - frictionTorque; // T = η G N K_t I
  return requireFiniteResult(Math.max(0, drive) / (inertia + efficiency * ratio * ratio * motorCount * motorRotorInertia), "current limited acceleration", {
    currentLimit: [currentLimit, "A"],
    torqueConstant: [torqueConstant, "N·m/A"],
    inertia: [inertia, "kg·m²"],
    motorCount: [motorCount, ""],
    ratio: [ratio, ""],
    efficiency: [efficiency, ""],
    noLoadCurrent: [noLoadCurrent, "A"],
    frictionTorque: [frictionTorque, "N·m"],
    motorRotorInertia: [motorRotorInertia, "kg·m²"],
  });
}
