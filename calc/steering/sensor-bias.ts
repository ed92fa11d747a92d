/**
 * Drive pulses seen by a single heading accelerometer.
 *
 * A wheel pushes along its own rolling direction, which is fixed in the body. A drive pulse comes
 * at the same heading every turn, so the extra wheel force reaches a body-mounted sensor at the
 * same phase every time: its body-frame average over a turn does not vanish, and a radial sensor
 * reads it as a bias b that only exists while the robot is driving. The firmware turns the reading
 * into a spin rate ω̂ = √((a + b)/r) (spinner-heading-practice; calc/heading/drift.ts), so the bias
 * becomes a heading drift ≈ b/(2rω) that appears only during a move.
 *
 * Body-frame average of the pulse forces: wheel i pulsed by ΔF_i over a window of width w (and by
 * −ΔF_i over the opposite window, if used) gives ⟨F⟩ = (w/2π)·Σ_i (ΔF_i,add − ΔF_i,opp)·e_t,i, where
 * e_t,i is wheel i's rolling direction in the body (oppenheim-willsky-signals: the average of a
 * pulse train is its duty cycle). It cancels when
 * - the modulation is symmetric (the opposite window on): each wheel's add and opposite pulses
 *   cancel in the body frame while both push the same way over the floor;
 * - two or more evenly spaced wheels are pulsed alike: Σ e_t,i = 0 (their pushes point opposite
 *   ways in the body, though each pushes along ψ over the floor);
 * - the sensor's radial axis is perpendicular to the pulsed wheel's rolling direction (the sensor on
 *   the line through the wheel's contact point and the centre);
 * - two opposed sensors are averaged: any translation of the centre adds to one reading what it
 *   takes from the other (hibbeler-dynamics-2016 §16.7, calc/heading/drift.ts `opposedSensorsDrift`).
 * So it bites a one-wheel robot with add-only windows, and any robot whose wheels respond unequally.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { headingDriftAt } from "../heading/drift.ts";
import { opposedSensorsDrift } from "../heading/opposed.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";
import { asCallerNames } from "../core/caller-names.ts";

/**
 * Bias on a radial accelerometer from the drive pulses: the body-frame average of the pulse
 * forces, divided by the mass, along the sensor's inward axis (oppenheim-willsky-signals duty
 * cycle; newton-second-law a = F/M).
 *
 * Formula: $b = -\dfrac{1}{M}\,\dfrac{w}{2\pi}\sum_i k_i\,\Delta F\;\hat e_{t,i}\cdot\hat e_{r,s}$, with $k_i = 1$ (add only) or $0$ (add and opposite),
 * $\hat e_{t,i}\cdot\hat e_{r,s} = \sin(\beta - \alpha_i)$, $\alpha_i = 2\pi i/n$
 *
 * @param pulseForce ΔF, the extra tangential force a wheel gives during its window [N], 0 or more
 * @param robotMass M [kg], greater than 0
 * @param windowWidth w [rad], greater than 0 and at most 2π
 * @param oppositeWindow true when the drive is also taken away over the opposite window (default false)
 * @param wheelCount n, evenly spaced driven wheels, a whole number 1 to 8 (default 1)
 * @param sensorAngle β, the sensor's position angle from wheel 0, in the spin direction [rad], finite
 * @returns b [m/s²], added to the sensor's centripetal reading (inward axis positive)
 *
 * Assumptions: equal pulses on every wheel; the pulse force's direction fixed in the body (the
 * wheel's rolling direction); the robot's velocity changes averaged out in the body frame over the
 * turn (they rotate with respect to the body). @example
 * drivePulseBias({ pulseForce: 3, robotMass: 1.5, windowWidth: Math.PI / 2, sensorAngle: Math.PI / 2 }) // → −0.5
 *
 * Sources: oppenheim-willsky-signals, newton-second-law.
 */
export function drivePulseBias(input: {
  pulseForce: number;
  robotMass: number;
  windowWidth: number;
  oppositeWindow?: boolean;
  wheelCount?: number;
  sensorAngle: number;
}): number {
  const { pulseForce, robotMass, windowWidth, oppositeWindow = false, wheelCount = 1, sensorAngle } = requireInputObject(input);
  requireNonNegative("pulseForce", pulseForce, "N");
  requirePositive("robotMass", robotMass, "kg");
  requireInRange("windowWidth", windowWidth, "rad", { min: 0, max: oppositeWindow === true ? Math.PI : 2 * Math.PI, minOpen: true });
  requireInRange("wheelCount", wheelCount, "", { min: 1, max: 8 });
  if (!Number.isInteger(wheelCount)) throw new CalcInputError({ param: "wheelCount", value: wheelCount, expected: "a whole number", unit: "" });
  requireFinite("sensorAngle", sensorAngle, "rad");
  if (oppositeWindow === true) return 0;
  let sum = 0;
  // e_t,i·e_r,s = cos(α_i + π/2 − β) = sin(β − α_i); exactly 0 for evenly spaced wheels (n ≥ 2)
  if (wheelCount === 1) sum = Math.sin(sensorAngle);
  const duty = windowWidth / (2 * Math.PI); // oppenheim-willsky-signals: mean of the pulse train
  const bias = -((pulseForce / robotMass) * duty * sum); // newton-second-law: a = F/M, inward axis
  return requireFiniteResult(bias === 0 ? 0 : bias, "bias", { pulseForce: [pulseForce, "N"] });
}

export interface DrivePulseDrift {
  /** b [m/s²] (see `drivePulseBias` for the closed form; here as given). */
  bias: number;
  /** ω̂ − ω of the single sensor while driving [rad/s]; null when its reading would be 0 or less. */
  driftRate: number | null;
  /** The same per revolution [rad]; null likewise. */
  driftPerRevolution: number | null;
  /** ω̂ − ω of two opposed sensors at the same radius, averaged [rad/s] (0: the pulse acceleration cancels). */
  opposedPairDriftRate: number;
}

/**
 * Heading drift a drive-pulse bias causes on one radial accelerometer, in the terms of
 * calc/heading/drift.ts (spinner-heading-practice: ω̂ = √((a + b)/r)), and on an opposed pair,
 * which cancels it (hibbeler-dynamics-2016 §16.7).
 *
 * Formula: $\hat\omega = \sqrt{\dfrac{\omega^2 r + b}{r}}$, drift $= \hat\omega - \omega \approx \dfrac{b}{2r\omega}$; pair: $\hat\omega = \sqrt{\dfrac{a_1 + a_2}{2r}} = \omega$
 *
 * @param bias b, the pulse bias along the sensor's inward axis [m/s²], finite
 * @param angularSpeed ω, the spin [rad/s], greater than 0
 * @param sensorRadius r [m], greater than 0
 * @returns the single sensor's drift [rad/s] and per revolution [rad], and the pair's [rad/s]
 *
 * @example
 * drivePulseHeadingDrift({ bias: -0.5, angularSpeed: 314.16, sensorRadius: 0.012 }).driftRate // → −0.0663
 *
 * Sources: spinner-heading-practice, hibbeler-dynamics-2016.
 */
export function drivePulseHeadingDrift(input: { bias: number; angularSpeed: number; sensorRadius: number }): DrivePulseDrift {
  const { bias, angularSpeed, sensorRadius } = requireInputObject(input);
  requireFinite("bias", bias, "m/s²");
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requirePositive("sensorRadius", sensorRadius, "m");
  // spinner-heading-practice: ω̂ = √((ω²r + b)/r), via calc/heading/drift.ts
  const single = asCallerNames(
    {
      assumedRadius: "sensorRadius",
      // Stryker disable next-line StringLiteral: equivalent, the blame list names assumedRadius first and an equal trueRadius never outranks it (and sensorRadius is already checked positive)
      trueRadius: "sensorRadius",
    },
    () => headingDriftAt({ angularSpeed, assumedRadius: sensorRadius, trueRadius: sensorRadius, scaleError: 0, bias, biasCorrection: 0, tilt: 0 }),
  );
  // hibbeler-dynamics-2016: a translation acceleration a_L adds to one sensor and takes from the other
  const pair = asCallerNames(
    {
      radius1: "sensorRadius",
      // Stryker disable next-line StringLiteral: equivalent, the blame list names radius1 first and an equal radius2 never outranks it (and sensorRadius is already checked positive)
      radius2: "sensorRadius",
      linearAcceleration: ["bias", bias],
    },
    // Stryker disable next-line UnaryOperator: equivalent, the pair sums a₁ + a₂ (IEEE addition commutes) and overflows alike for ±b; the single sensors it swaps are not returned
    () => opposedSensorsDrift({ angularSpeed, radius1: sensorRadius, radius2: sensorRadius, offset: 0, linearAcceleration: -bias }),
  );
  // Both calls check their own results (requireFiniteFields): every drift here is finite or null.
  return {
    bias,
    driftRate: single.driftRate,
    driftPerRevolution: single.driftPerRevolution,
    opposedPairDriftRate: pair.pair.driftRate ?? 0,
  };
}
