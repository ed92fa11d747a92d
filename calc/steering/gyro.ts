/**
 * The gyroscopic moment of a spinner's wheels, and what it does to the wheel loads.
 *
 * Each driven wheel (and the rotor of its motor) spins about a radial axle that the body carries
 * round at Ω. Its spin angular momentum H = (J_w + s·G·J_m)·ω_w points along the axle and turns
 * with the body, so the axle must supply dH/dt = Ω ẑ × H: a moment (J_w + s·G·J_m)·ω_w·Ω about the
 * wheel's tangential axis (steady precession with the spin axis normal to the precession axis,
 * meriam-kraige-dynamics; the same C = I·ω·ω_p as khurmi-gupta-theory-of-machines). Rolling
 * without slip, ω_w = Ω·R/r_w, so the moment is (J_w + s·G·J_m)·(R/r_w)·Ω². Here s = +1 when the
 * motor rotor turns the same way as the wheel (direct drive, a belt, or two gear meshes) and −1 when
 * one gear mesh reverses it; G is motor turns per wheel turn, so the rotor's momentum counts
 * G·J_m (not the G²·J_m that reflects its inertia).
 *
 * Its reaction on the body pushes the wheel's side down (for the wheel rolling in the spin
 * direction, whichever way the body spins). With two or more evenly spaced wheels the reactions
 * cancel on the body: the floor loads do not change, but each wheel's moment loads its own axle
 * and motor bearings. With one wheel and a skid the moment shifts weight from the skid to the
 * wheel, and the skid lifts when the moment reaches M·g·R. SI in and out.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

function requireSense(rotorSense: number): 1 | -1 {
  if (rotorSense !== 1 && rotorSense !== -1) throw new CalcInputError({ param: "rotorSense", value: rotorSense, expected: "1 or −1", unit: "" });
  return rotorSense;
}

/** J_w + s·G·J_m, validated. */
function spinningInertia(wheelInertia: number, rotorInertia: number, gearRatio: number, rotorSense: number): number {
  requireNonNegative("wheelInertia", wheelInertia, "kg·m²");
  requireNonNegative("rotorInertia", rotorInertia, "kg·m²");
  requirePositive("gearRatio", gearRatio, "");
  const s = requireSense(rotorSense);
  const inertia = wheelInertia + s * gearRatio * rotorInertia; // meriam-kraige-dynamics: H = Σ I·ω about the axle
  return requireFiniteResult(inertia, "angular momentum per wheel speed", { rotorInertia: [rotorInertia, "kg·m²"] });
}

/**
 * Gyroscopic moment on a wheel whose radial axle the body turns at Ω (meriam-kraige-dynamics,
 * steady precession; khurmi-gupta-theory-of-machines ch. 14, C = I·ω·ω_p).
 *
 * Formula: $M = (J_w + s\,G\,J_m)\,\omega_w\,\Omega$
 *
 * @param wheelInertia J_w, the wheel and hub about its axle [kg·m²], 0 or more
 * @param rotorInertia J_m, the motor rotors driving this wheel, together, about their shafts [kg·m²], 0 or more (default 0)
 * @param gearRatio G, motor turns per wheel turn [-], greater than 0 (default 1)
 * @param rotorSense s, +1 when the rotor turns with the wheel, −1 when one gear mesh reverses it (default +1)
 * @param wheelSpeed ω_w, the wheel's speed about its axle [rad/s], finite
 * @param spinSpeed Ω, the body's spin (the axle's turn rate) [rad/s], finite
 * @returns M [N·m], about the wheel's tangential axis (the sign follows ω_w·Ω)
 *
 * Assumptions: axle perpendicular to the spin axis; the wheel symmetric about its axle; steady
 * rates (a changing ω_w adds J·ω̇_w about the axle itself, not about the tangential axis).
 * @example
 * wheelGyroscopicMoment({ wheelInertia: 0.0140625, wheelSpeed: 104.72, spinSpeed: 6.2832 }) // → 9.2528
 *
 * Sources: meriam-kraige-dynamics, khurmi-gupta-theory-of-machines.
 */
export function wheelGyroscopicMoment(input: {
  wheelInertia: number;
  rotorInertia?: number;
  gearRatio?: number;
  rotorSense?: 1 | -1;
  wheelSpeed: number;
  spinSpeed: number;
}): number {
  const { wheelInertia, rotorInertia = 0, gearRatio = 1, rotorSense = 1, wheelSpeed, spinSpeed } = requireInputObject(input);
  const inertia = spinningInertia(wheelInertia, rotorInertia, gearRatio, rotorSense);
  requireFinite("wheelSpeed", wheelSpeed, "rad/s");
  requireFinite("spinSpeed", spinSpeed, "rad/s");
  const moment = inertia * wheelSpeed * spinSpeed; // meriam-kraige-dynamics: M = I·ω·Ω (steady precession, 90°)
  return requireFiniteResult(moment, "gyroscopic moment", { spinSpeed: [spinSpeed, "rad/s"] });
}

/**
 * Gyroscopic moment of a wheel rolling without slip on a spinner: the wheel turns at Ω·R/r_w
 * (meriam-kraige-dynamics, steady precession; rolling kinematics v = ω·r).
 *
 * Formula: $M = (J_w + s\,G\,J_m)\,\dfrac{R}{r_w}\,\Omega^2$
 *
 * @param wheelInertia J_w [kg·m²], 0 or more; rotorInertia J_m [kg·m²] (default 0); gearRatio G (default 1); rotorSense s (default +1)
 * @param wheelRadius r_w [m], greater than 0
 * @param contactRadius R, centre of mass to the wheel's contact point [m], greater than 0
 * @param spinSpeed Ω [rad/s], finite
 * @returns M [N·m]
 *
 * @example
 * rollingWheelGyroscopicMoment({ wheelInertia: 4e-6, rotorInertia: 3e-6, wheelRadius: 0.018, contactRadius: 0.07, spinSpeed: 314.16 }) // → 2.6867
 *
 * Sources: meriam-kraige-dynamics.
 */
export function rollingWheelGyroscopicMoment(input: {
  wheelInertia: number;
  rotorInertia?: number;
  gearRatio?: number;
  rotorSense?: 1 | -1;
  wheelRadius: number;
  contactRadius: number;
  spinSpeed: number;
}): number {
  const { wheelInertia, rotorInertia = 0, gearRatio = 1, rotorSense = 1, wheelRadius, contactRadius, spinSpeed } = requireInputObject(input);
  requirePositive("wheelRadius", wheelRadius, "m");
  requirePositive("contactRadius", contactRadius, "m");
  requireFinite("spinSpeed", spinSpeed, "rad/s");
  const wheelSpeed = requireFiniteResult((spinSpeed * contactRadius) / wheelRadius, "wheel speed", { spinSpeed: [spinSpeed, "rad/s"] }); // rolling: ω_w r_w = Ω R
  return wheelGyroscopicMoment({ wheelInertia, rotorInertia, gearRatio, rotorSense, wheelSpeed, spinSpeed });
}

/**
 * Force on each of two bearings that carry a gyroscopic moment as a couple
 * (khurmi-gupta-theory-of-machines ch. 14: F = C/x).
 *
 * Formula: $F = M/L$
 *
 * @param moment M [N·m], finite
 * @param bearingSpacing L, distance between the two bearings along the axle [m], greater than 0
 * @returns F [N], one bearing pushed up and the other down (add the static loads)
 *
 * @example
 * gyroscopicBearingForce({ moment: 9.2528, bearingSpacing: 0.1 }) // → 92.528
 *
 * Sources: khurmi-gupta-theory-of-machines.
 */
export function gyroscopicBearingForce(input: { moment: number; bearingSpacing: number }): number {
  const { moment, bearingSpacing } = requireInputObject(input);
  requireFinite("moment", moment, "N·m");
  requirePositive("bearingSpacing", bearingSpacing, "m");
  const force = moment / bearingSpacing; // khurmi-gupta-theory-of-machines: F = C/x
  return requireFiniteResult(force, "bearing force", { bearingSpacing: [bearingSpacing, "m"] });
}

/**
 * Spin speed at which a one-wheel spinner's skid lifts: the wheel's gyroscopic moment carries the
 * whole weight (meriam-kraige-dynamics; moment balance about the wheel's tangential axis).
 *
 * Formula: $\Omega_{lift} = \sqrt{\dfrac{M\,g\,r_w}{J_w + s\,G\,J_m}}$
 *
 * Derivation: wheel and skid sit on opposite sides of the centre of mass at the same radius R and
 * share the weight equally at rest. Vertical balance N_w + N_s = M·g; moments about the tangential
 * axis through the centre (N_w − N_s)·R = (J_w + sGJ_m)(R/r_w)Ω². So N_s = M·g/2 − (J_w + sGJ_m)Ω²/(2r_w),
 * which reaches 0 at Ω_lift; R drops out.
 *
 * @param robotMass M [kg], greater than 0
 * @param wheelRadius r_w [m], greater than 0
 * @param wheelInertia J_w [kg·m²]; rotorInertia J_m [kg·m²] (default 0); gearRatio G (default 1); rotorSense s (default +1)
 * @returns Ω_lift [rad/s]; null when J_w + sGJ_m ≤ 0 (the moment then presses the skid down instead)
 *
 * Assumptions: centre of mass at the centre, on the line through wheel and skid; the robot stable
 * about that line (a broad skid); friction forces' moment about the centre of mass (their height)
 * neglected; rolling without slip. @example
 * skidLiftSpeed({ robotMass: 1.5, wheelRadius: 0.018, wheelInertia: 4e-6, rotorInertia: 3e-6 }) // → 194.5 (1857 rpm)
 *
 * Sources: meriam-kraige-dynamics, cgpm-1901.
 */
export function skidLiftSpeed(input: {
  robotMass: number;
  wheelRadius: number;
  wheelInertia: number;
  rotorInertia?: number;
  gearRatio?: number;
  rotorSense?: 1 | -1;
}): number | null {
  const { robotMass, wheelRadius, wheelInertia, rotorInertia = 0, gearRatio = 1, rotorSense = 1 } = requireInputObject(input);
  requirePositive("robotMass", robotMass, "kg");
  requirePositive("wheelRadius", wheelRadius, "m");
  const inertia = spinningInertia(wheelInertia, rotorInertia, gearRatio, rotorSense);
  if (!(inertia > 0)) return null;
  const speed = Math.sqrt(((robotMass * STANDARD_GRAVITY) / inertia) * wheelRadius); // Ω² = M g r_w/(J_w + sGJ_m)
  return requireFiniteResult(speed, "lift speed", { wheelInertia: [wheelInertia, "kg·m²"] });
}

export interface WheelLoads {
  /** Normal load on each driven wheel [N]. */
  wheelLoad: number;
  /** Load on the skid [N]: opposite the wheel (one wheel), or at the centre (two or more, the weight the wheels do not carry). */
  skidLoad: number;
  /** True when the gyroscopic moment would need a negative skid load: the skid is off the floor and the robot rides on one wheel (it then tips: outside this model). */
  skidLifted: boolean;
  /** True when a reversed rotor's moment would need a negative wheel load: the wheel is off the floor. */
  wheelLifted: boolean;
  /** Gyroscopic moment of each wheel, rolling [N·m]. */
  gyroscopicMoment: number;
}

/**
 * Normal loads on a spinner's wheels and skid as a function of spin speed, with the wheels'
 * gyroscopic moment (meriam-kraige-dynamics; statics of the layout described in `skidLiftSpeed`).
 *
 * Formula: one wheel and a skid opposite at R: $N_w = \dfrac{Mg}{2} + \dfrac{M_{gy}}{2R}$, $N_s = Mg - N_w$,
 * $M_{gy} = (J_w + sGJ_m)\dfrac{R}{r_w}\Omega^2$; n ≥ 2 evenly spaced wheels: $N_w = \dfrac{s_w M g}{n}$, the
 * moments cancel on the body, $N_s = (1 - s_w) M g$ at the centre
 *
 * @param wheelCount n, driven wheels [-], a whole number 1 to 8
 * @param robotMass M [kg], greater than 0
 * @param weightShare s_w, share of the weight on the wheels when n ≥ 2 [-], greater than 0 and at most 1 (default 1; not read for one wheel)
 * @param wheelInertia, rotorInertia, gearRatio, rotorSense as in `wheelGyroscopicMoment`
 * @param wheelRadius r_w [m], contactRadius R [m], greater than 0
 * @param spinSpeed Ω [rad/s], finite
 * @returns loads [N], whether the skid (or a reversed rotor's wheel) lifts, and the moment [N·m]; a lifted skid reports N_s = 0, N_w = M·g
 *
 * @example
 * wheelNormalLoads({ wheelCount: 1, robotMass: 1.5, wheelInertia: 4e-6, rotorInertia: 3e-6, wheelRadius: 0.018, contactRadius: 0.07, spinSpeed: 100 }) // → { wheelLoad: 9.2994, skidLoad: 5.4105, … } [N]
 *
 * Sources: meriam-kraige-dynamics, cgpm-1901.
 */
export function wheelNormalLoads(input: {
  wheelCount: number;
  robotMass: number;
  weightShare?: number;
  wheelInertia: number;
  rotorInertia?: number;
  gearRatio?: number;
  rotorSense?: 1 | -1;
  wheelRadius: number;
  contactRadius: number;
  spinSpeed: number;
}): WheelLoads {
  const {
    wheelCount,
    robotMass,
    weightShare = 1,
    wheelInertia,
    rotorInertia = 0,
    gearRatio = 1,
    rotorSense = 1,
    wheelRadius,
    contactRadius,
    spinSpeed,
  } = requireInputObject(input);
  requireInRange("wheelCount", wheelCount, "", { min: 1, max: 8 });
  if (!Number.isInteger(wheelCount)) throw new CalcInputError({ param: "wheelCount", value: wheelCount, expected: "a whole number", unit: "" });
  requirePositive("robotMass", robotMass, "kg");
  requireInRange("weightShare", weightShare, "", { min: 0, max: 1, minOpen: true });
  const moment = rollingWheelGyroscopicMoment({ wheelInertia, rotorInertia, gearRatio, rotorSense, wheelRadius, contactRadius, spinSpeed });
  const weight = requireFiniteResult(robotMass * STANDARD_GRAVITY, "weight", { robotMass: [robotMass, "kg"] }); // cgpm-1901: W = M·g_n
  if (wheelCount >= 2) {
    return {
      wheelLoad: (weightShare * weight) / wheelCount,
      skidLoad: (1 - weightShare) * weight,
      skidLifted: false,
      wheelLifted: false,
      gyroscopicMoment: moment,
    };
  }
  const shift = requireFiniteResult(moment / (2 * contactRadius), "load shift", { spinSpeed: [spinSpeed, "rad/s"] }); // (N_w − N_s)·R = M_gy
  const wheelLoad = weight / 2 + shift;
  if (wheelLoad >= weight) return { wheelLoad: weight, skidLoad: 0, skidLifted: true, wheelLifted: false, gyroscopicMoment: moment };
  if (wheelLoad <= 0) return { wheelLoad: 0, skidLoad: weight, skidLifted: false, wheelLifted: true, gyroscopicMoment: moment };
  return { wheelLoad, skidLoad: weight - wheelLoad, skidLifted: false, wheelLifted: false, gyroscopicMoment: moment };
}
