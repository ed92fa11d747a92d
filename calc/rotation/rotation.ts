/**
 * Rotation: acceleration at a radius, where an accelerometer can sit on a spinning robot, and the
 * pull a spinning part puts on its mounts. SI in and out: rad/s, m, m/s², kg, N.
 */
import { CalcInputError, requireInRange, requireNonNegative, requirePositive, requireRelation } from "../core/errors.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { requireFiniteResult, requireInputObject, requireWhole, requireWithinSpecs } from "../core/spec-check.ts";
import type { SourceKey } from "../sources/index.ts";

/**
 * Centripetal acceleration of a point at a radius from the spin axis (openstax-college-physics).
 *
 * Formula: $a = \omega^2 r$
 *
 * @param angularSpeed ω, spin rate [rad/s], finite, 0 or more
 * @param radius r, distance from the spin axis [m], finite, 0 or more
 * @returns a, acceleration toward the axis [m/s²]
 *
 * Assumptions: steady rotation about a fixed axis; the tangential term r·dω/dt of a spin-up is not
 * included.
 *
 * @example
 * centripetalAcceleration({ angularSpeed: rpmToRadPerSecond(2000), radius: 0.089 }) // → 3903.98 [m/s²] (398.09 g at 209.44 rad/s)
 *
 * Sources: openstax-college-physics.
 */
export function centripetalAcceleration(input: { angularSpeed: number; radius: number }): number {
  const { angularSpeed, radius } = requireInputObject(input);
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requireNonNegative("radius", radius, "m");
  return requireFiniteResult(angularSpeed * angularSpeed * radius, "acceleration", { angularSpeed: [angularSpeed, "rad/s"], radius: [radius, "m"] });
}

/** One point of an acceleration-against-speed curve. */
export interface AccelerationCurvePoint {
  /** ω [rad/s] */
  angularSpeed: number;
  /** a = ω²r [m/s²] */
  acceleration: number;
}

/**
 * Centripetal acceleration at one radius over evenly spaced speeds from 0 to a maximum, for a plot
 * (openstax-college-physics).
 *
 * Formula: $\omega_i = \omega_{max}\,i/n$, $a_i = \omega_i^2 r$ for $i = 0 \dots n$
 *
 * @param radius r, distance from the spin axis [m], 0 or more
 * @param maxSpeed ω_max, the last speed [rad/s], greater than 0
 * @param intervals n, the number of equal steps [-], a whole number from 1 to 1000 (n + 1 points)
 * @returns the n + 1 points, speeds [rad/s] and accelerations [m/s²]
 *
 * Assumptions: as `centripetalAcceleration` (steady rotation).
 * @example
 * centripetalAccelerationCurve({ radius: 0.012, maxSpeed: 400, intervals: 2 })[1] // → { angularSpeed: 200, acceleration: 480 } (then 400 rad/s, 1920 m/s²)
 * Sources: openstax-college-physics.
 */
export function centripetalAccelerationCurve(input: { radius: number; maxSpeed: number; intervals: number }): AccelerationCurvePoint[] {
  const { radius, maxSpeed, intervals } = requireInputObject(input);
  requireNonNegative("radius", radius, "m");
  requirePositive("maxSpeed", maxSpeed, "rad/s");
  requireWhole("intervals", intervals, 1, 1000);
  if (!Number.isFinite(maxSpeed * maxSpeed * radius)) {
    throw new CalcInputError({ param: "maxSpeed", value: maxSpeed, expected: "small enough that ω²r stays finite", unit: "rad/s" });
  }
  const points: AccelerationCurvePoint[] = [];
  for (let i = 0; i <= intervals; i += 1) {
    // Evenly spaced speeds; a = ω²r at each (openstax-college-physics).
    const angularSpeed = (maxSpeed * i) / intervals;
    points.push({ angularSpeed, acceleration: centripetalAcceleration({ angularSpeed, radius }) });
  }
  return points;
}

/**
 * Radius at which a given centripetal acceleration occurs at a given spin rate
 * (openstax-college-physics, a = ω²r solved for r).
 *
 * Formula: $r = a / \omega^2$
 *
 * @param angularSpeed ω [rad/s], greater than 0
 * @param acceleration a [m/s²], 0 or more
 * @returns r [m]
 *
 * @example
 * radiusForAcceleration({ angularSpeed: rpmToRadPerSecond(2000), acceleration: 398.09 * STANDARD_GRAVITY }) // → 0.089 [m]
 *
 * Sources: openstax-college-physics.
 */
export function radiusForAcceleration(input: { angularSpeed: number; acceleration: number }): number {
  const { angularSpeed, acceleration } = requireInputObject(input);
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requireNonNegative("acceleration", acceleration, "m/s²");
  return requireFiniteResult(acceleration / (angularSpeed * angularSpeed), "radius", {
    angularSpeed: [angularSpeed, "rad/s"],
    acceleration: [acceleration, "m/s²"],
  });
}

/**
 * Spin rate at which a point at a radius sees a given acceleration
 * (openstax-college-physics, a = ω²r solved for ω).
 *
 * Formula: $\omega = \sqrt{a / r}$
 *
 * @param radius r [m], greater than 0
 * @param acceleration a [m/s²], 0 or more
 * @returns ω [rad/s]
 *
 * @example
 * angularSpeedForAcceleration({ radius: 0.089, acceleration: 3903.98 }) // → 209.44 [rad/s] (2000 rpm)
 *
 * Sources: openstax-college-physics.
 */
export function angularSpeedForAcceleration(input: { radius: number; acceleration: number }): number {
  const { radius, acceleration } = requireInputObject(input);
  requirePositive("radius", radius, "m");
  requireNonNegative("acceleration", acceleration, "m/s²");
  return requireFiniteResult(Math.sqrt(acceleration / radius), "speed", { radius: [radius, "m"], acceleration: [acceleration, "m/s²"] });
}

/**
 * Largest radius at which an accelerometer stays below a chosen fraction of its full scale at top
 * speed (openstax-college-physics, a = ω²r with a capped at (1 − m)·F).
 *
 * Formula: $r_{max} = \dfrac{(1 - m)\,F}{\omega_{top}^2}$
 *
 * @param fullScale F, the sensor's full-scale range on the radial axis [m/s²], greater than 0
 * @param margin m, headroom kept below full scale [-], 0 ≤ m < 1
 * @param topSpeed ω_top, the highest spin rate [rad/s], greater than 0
 * @returns r_max [m]
 *
 * Assumptions: the sensor's radial axis points at the spin axis; only the centripetal term counts
 * (impacts add far larger, brief spikes).
 *
 * @example
 * maxSensorRadius({ fullScale: 200 * STANDARD_GRAVITY, margin: 0.2, topSpeed: rpmToRadPerSecond(3000) }) // → 0.0159 [m] (15.9 mm)
 *
 * Sources: openstax-college-physics.
 */
export function maxSensorRadius(input: { fullScale: number; margin: number; topSpeed: number }): number {
  const { fullScale, margin, topSpeed } = requireInputObject(input);
  requirePositive("fullScale", fullScale, "m/s²");
  requireInRange("margin", margin, "", { min: 0, max: 1, maxOpen: true });
  requirePositive("topSpeed", topSpeed, "rad/s");
  return requireFiniteResult(((1 - margin) * fullScale) / (topSpeed * topSpeed), "largest radius", {
    topSpeed: [topSpeed, "rad/s"],
    fullScale: [fullScale, "m/s²"],
  });
}

/**
 * Relative speed resolution at a radius: how much the speed estimate ω̂ = √(a/r) jumps when the
 * reading changes by one step (sensor-quantisation, a = ω²r).
 *
 * Formula: $\dfrac{\Delta\omega}{\omega} = \sqrt{1 + \dfrac{\Delta a}{\omega^2 r}} - 1$
 *
 * @param step Δa, the smallest change the sensor reports: one count, or its noise if larger [m/s²], greater than 0
 * @param angularSpeed ω [rad/s], greater than 0
 * @param radius r [m], greater than 0
 * @returns Δω/ω [-]
 *
 * @example
 * speedResolution({ step: STANDARD_GRAVITY, angularSpeed: rpmToRadPerSecond(400), radius: 0.02 }) // → 0.131 (13 %: a step of 1 g on 3.58 g)
 *
 * Sources: sensor-quantisation, openstax-college-physics.
 */
export function speedResolution(input: { step: number; angularSpeed: number; radius: number }): number {
  const { step, angularSpeed, radius } = requireInputObject(input);
  requirePositive("step", step, "m/s²");
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requirePositive("radius", radius, "m");
  // √(1 + x) − 1 written as x/(√(1 + x) + 1), which keeps its digits when x is small.
  const x = step / (angularSpeed * angularSpeed * radius);
  return requireFiniteResult(x / (Math.sqrt(1 + x) + 1), "speed resolution", {
    angularSpeed: [angularSpeed, "rad/s"],
    radius: [radius, "m"],
    step: [step, "m/s²"],
  });
}

/**
 * Size of one count of a digital sensor: its full-scale span split into 2^bits equal steps
 * (sensor-quantisation).
 *
 * Formula: $\Delta a = \dfrac{S}{2^{b}}$
 *
 * @param span S, the full-scale span, e.g. 400 g for a ±200 g range [m/s²], greater than 0
 * @param bits b, the output word length [-], a whole number from 1 to 32
 * @returns Δa, one count [m/s²]
 *
 * Assumptions: a linear converter with equal steps over the whole span.
 * @example
 * sensorCountSize({ span: 400 * 9.80665, bits: 12 }) // → 0.957681 (0.0977 g)
 * Sources: sensor-quantisation.
 */
export function sensorCountSize(input: { span: number; bits: number }): number {
  const { span, bits } = requireInputObject(input);
  requirePositive("span", span, "m/s²");
  requireWhole("bits", bits, 1, 32);
  // Uniform quantiser step, full span over 2^bits codes (sensor-quantisation).
  // Finite without a check: span is finite and 2^bits ≥ 2, so the count is at most half the span.
  return span / 2 ** bits;
}

/**
 * Smallest radius at which one sensor step still resolves the spin rate to a chosen fraction at
 * the lowest speed the heading must track (sensor-quantisation; inverse of `speedResolution`).
 *
 * Formula: $r_{min} = \dfrac{\Delta a}{\omega_{low}^2\,\left[(1 + p)^2 - 1\right]}$
 *
 * @param step Δa, one count or the noise, whichever is larger [m/s²], greater than 0
 * @param lowSpeed ω_low, the lowest spin rate that must be tracked [rad/s], greater than 0
 * @param resolution p, the speed resolution wanted, as a fraction [-], 0 < p ≤ 1
 * @returns r_min [m]
 *
 * Assumptions: exact inversion, not the small-step approximation Δω/ω ≈ Δa/(2a). Averaging several
 * readings can resolve finer than one count; this is the single-reading bound.
 *
 * @example
 * minSensorRadius({ step: 0.1 * STANDARD_GRAVITY, lowSpeed: rpmToRadPerSecond(400), resolution: 0.01 }) // → 0.0278 [m] (27.8 mm)
 *
 * Sources: sensor-quantisation, openstax-college-physics.
 */
export function minSensorRadius(input: { step: number; lowSpeed: number; resolution: number }): number {
  const { step, lowSpeed, resolution } = requireInputObject(input);
  requirePositive("step", step, "m/s²");
  requirePositive("lowSpeed", lowSpeed, "rad/s");
  requireInRange("resolution", resolution, "", { min: 0, max: 1, minOpen: true });
  // (1 + p)² − 1 written as p(2 + p), which keeps its digits when p is small.
  return requireFiniteResult(step / (lowSpeed * lowSpeed * resolution * (2 + resolution)), "smallest radius", {
    lowSpeed: [lowSpeed, "rad/s"],
    step: [step, "m/s²"],
    resolution: [resolution, ""],
  });
}

export interface PartLoad {
  /** Centripetal acceleration at the part's centre of mass [m/s²]. */
  acceleration: number;
  /** The same in standard gravities [-]. */
  gLoad: number;
  /** Radial pull the part puts on its mounts [N]. */
  force: number;
}

/**
 * The g a part sees at its radius and the radial pull on its mounts (newton-second-law).
 *
 * Formula: $F = m\,\omega^2 r$
 *
 * @param mass m, the part's mass [kg], greater than 0
 * @param radius r, spin axis to the part's own centre of mass [m], 0 or more
 * @param angularSpeed ω [rad/s], 0 or more
 * @returns acceleration [m/s²], gLoad [-], force [N]
 *
 * Assumptions: the part is small next to its radius (for a large part use its own centre of mass).
 *
 * @example
 * partLoad({ mass: 0.05, radius: 0.06, angularSpeed: rpmToRadPerSecond(2400) }) // → { acceleration: 3790, gLoad: 386, force: 189 } (a 50 g part)
 *
 * Sources: newton-second-law.
 */
export function partLoad(input: { mass: number; radius: number; angularSpeed: number }): PartLoad {
  const { mass, radius, angularSpeed } = requireInputObject(input);
  requirePositive("mass", mass, "kg");
  const acceleration = centripetalAcceleration({ angularSpeed, radius });
  const force = requireFiniteResult(mass * acceleration, "force", { mass: [mass, "kg"], angularSpeed: [angularSpeed, "rad/s"], radius: [radius, "m"] });
  return { acceleration, gLoad: acceleration / STANDARD_GRAVITY, force };
}

// ---------------------------------------------------------------------------------------------
// The accelerometer-placement calculator: its inputs and its one entry point.

export { accelerometerPlacementInputs, type AccelerometerPlacementInput } from "./placement-inputs.ts";
import { accelerometerPlacementInputs, type AccelerometerPlacementInput } from "./placement-inputs.ts";

export type PlacementVerdict = "fits" | "too-far-out" | "too-close-in" | "no-window";

export interface AccelerometerPlacement {
  /** Smallest radius that resolves speed to `resolution` at `lowSpeed` [m]. */
  minRadius: number;
  /** Largest radius that keeps `margin` of full scale free at `topSpeed` [m]. */
  maxRadius: number;
  /** Largest radius at which the sensor just reaches full scale at `topSpeed`, with no headroom, F/ω² [m]. */
  maxRadiusNoHeadroom: number;
  /** True when minRadius ≤ maxRadius: some radius satisfies both. */
  windowExists: boolean;
  /** The larger of step and noise [m/s²]. */
  effectiveStep: number;
  /** Acceleration at the sensor at top speed [m/s²]. */
  accelerationAtTop: number;
  /** That as a fraction of full scale [-]. */
  fullScaleUsed: number;
  /** The most the sensor may read: full scale less the headroom, (1 − m)·F [m/s²]. */
  readingLimit: number;
  /** Acceleration at the sensor at the lowest tracked speed [m/s²]. */
  accelerationAtLow: number;
  /** Speed resolution of one reading at the lowest tracked speed [-]. */
  resolutionAtLow: number;
  /** Speed at which the sensor reaches full scale at this radius [rad/s]. */
  saturationSpeed: number;
  /** Where the chosen radius stands. */
  verdict: PlacementVerdict;
  /** The other part's load at top speed. */
  part: PartLoad;
  /** Mass whose weight under standard gravity equals that part's pull, F/g_n [kg]. */
  partHangingMass: number;
  /** Speed at which that part leaves if it lets go at top speed, tangent to its circle, ω·r [m/s]. */
  partReleaseSpeed: number;
}

/**
 * The accelerometer-placement check: the window of radii that neither saturates at top speed nor
 * starves at low speed, where the chosen radius stands, and the load on one other part.
 *
 * Formula: $r_{min} = \dfrac{\Delta a}{\omega_{low}^2[(1+p)^2-1]} \le r \le r_{max} = \dfrac{(1-m)F}{\omega_{top}^2}$;
 * for the other part $F_p = m_p\,\omega_{top}^2 r_p$, $m_{eq} = F_p/g_n$, $v = \omega_{top} r_p$
 *
 * @param input every field of `accelerometerPlacementInputs`, SI
 * @returns the window (and its outer edge with no headroom), the chosen radius's figures and a verdict; the other part's load, the mass
 * that weighs as much [kg] and the speed it leaves at if it lets go [m/s]
 *
 * Assumptions: rotation about the centre of mass; the radius is measured from there. Sources:
 * openstax-college-physics, sensor-quantisation, newton-second-law.
 */
export function accelerometerPlacement(input: AccelerometerPlacementInput): AccelerometerPlacement {
  const { topSpeed, lowSpeed, radius, fullScale, margin, step, noise, resolution, partMass, partRadius } = requireWithinSpecs(
    accelerometerPlacementInputs,
    input,
  );
  requireRelation("lowSpeed", lowSpeed, "at-most", topSpeed, { kind: "angularSpeed", unit: "rad/s", other: "topSpeed" });
  const effectiveStep = Math.max(step, noise);
  const minRadius = minSensorRadius({ step: effectiveStep, lowSpeed, resolution });
  const maxRadius = maxSensorRadius({ fullScale, margin, topSpeed });
  const accelerationAtTop = centripetalAcceleration({ angularSpeed: topSpeed, radius });
  const accelerationAtLow = centripetalAcceleration({ angularSpeed: lowSpeed, radius });
  const resolutionAtLow = speedResolution({ step: effectiveStep, angularSpeed: lowSpeed, radius });
  const windowExists = minRadius <= maxRadius;
  const part = partLoad({ mass: partMass, radius: partRadius, angularSpeed: topSpeed });
  const verdict: PlacementVerdict = !windowExists ? "no-window" : radius > maxRadius ? "too-far-out" : radius < minRadius ? "too-close-in" : "fits";
  // Every field is finite: each comes from a guarded call above or is a product of bounded, finite inputs.
  return {
    minRadius,
    maxRadius,
    // The same bound with no headroom, r = F/ω² (openstax-college-physics, a = ω²r).
    maxRadiusNoHeadroom: maxSensorRadius({ fullScale, margin: 0, topSpeed }),
    windowExists,
    effectiveStep,
    accelerationAtTop,
    fullScaleUsed: requireFiniteResult(accelerationAtTop / fullScale, "share of full scale", { fullScale: [fullScale, "m/s²"] }),
    readingLimit: (1 - margin) * fullScale, // headroom kept below full scale
    accelerationAtLow,
    resolutionAtLow,
    saturationSpeed: angularSpeedForAcceleration({ radius, acceleration: fullScale }),
    verdict,
    part,
    // Weight W = m g solved for m (newton-second-law).
    partHangingMass: part.force / STANDARD_GRAVITY,
    // Tangential speed of a point on a circle, v = ω r (openstax-college-physics).
    partReleaseSpeed: topSpeed * partRadius,
  };
}

/** Source keys this module relies on (checked by the meta test). */
export const ROTATION_SOURCES: readonly SourceKey[] = ["openstax-college-physics", "sensor-quantisation", "newton-second-law"];
