/**
 * Heading timing for a whole-body spinner that steers from an accelerometer-based spin-rate
 * estimate: what the control loop's period, its latency and a heading LED's on-time cost in heading
 * at top speed. SI in and out: rad/s, rad, s, Hz.
 */
import { requireNonNegative, requirePositive } from "../core/errors.ts";
import { TURN } from "../core/constants.ts";
import { requireWithinSpecs, requireInputObject, requireFiniteResult } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// 1. Timing.

/**
 * Heading the robot turns through in one control-loop period (openstax-up1-rotational-kinematics,
 * θ = ωt at constant ω).
 *
 * Formula: $\Delta\psi = \omega\,\Delta t = \omega / f$
 *
 * @param angularSpeed ω [rad/s], 0 or more
 * @param loopRate f, control-loop rate [Hz], greater than 0
 * @returns Δψ [rad]
 *
 * @example
 * headingStepPerLoop({ angularSpeed: rpmToRadPerSecond(3000), loopRate: 1000 }) // → 0.314 [rad] (18.0° per update)
 *
 * Sources: openstax-up1-rotational-kinematics.
 */
export function headingStepPerLoop(input: { angularSpeed: number; loopRate: number }): number {
  const { angularSpeed, loopRate } = requireInputObject(input);
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requirePositive("loopRate", loopRate, "Hz");
  return requireFiniteResult(angularSpeed / loopRate, "heading step", { angularSpeed: [angularSpeed, "rad/s"], loopRate: [loopRate, "Hz"] });
}

/**
 * Heading offset from a fixed latency between reading the sensor and acting on the output
 * (openstax-up1-rotational-kinematics, θ = ωt). It is a speed-dependent offset, not a drift: it
 * does not grow with time, and firmware can lead its output by ω̂·L to cancel it.
 *
 * Formula: $\psi_{lag} = \omega L$
 *
 * @param angularSpeed ω [rad/s], 0 or more
 * @param latency L [s], 0 or more
 * @returns ψ_lag [rad]
 *
 * @example
 * latencyHeadingLag({ angularSpeed: rpmToRadPerSecond(3000), latency: 0.0005 }) // → 0.157 [rad] (9.0°)
 *
 * Sources: openstax-up1-rotational-kinematics.
 */
export function latencyHeadingLag(input: { angularSpeed: number; latency: number }): number {
  const { angularSpeed, latency } = requireInputObject(input);
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requireNonNegative("latency", latency, "s");
  return requireFiniteResult(angularSpeed * latency, "heading lag", { angularSpeed: [angularSpeed, "rad/s"], latency: [latency, "s"] });
}

/**
 * Arc swept while the heading LED is lit (openstax-up1-rotational-kinematics, θ = ωt).
 *
 * Formula: $w = \omega\,t_{on}$
 *
 * @param angularSpeed ω [rad/s], 0 or more
 * @param onTime t_on [s], 0 or more
 * @returns w [rad]
 *
 * Assumptions: the LED is switched by a timer; if the loop switches it, the on-time cannot be
 * shorter than one loop period and the arc's start moves by up to one heading step.
 * @example
 * beaconArc({ angularSpeed: rpmToRadPerSecond(3000), onTime: 0.001 }) // → 0.314 [rad] (18.0°)
 *
 * Sources: openstax-up1-rotational-kinematics.
 */
export function beaconArc(input: { angularSpeed: number; onTime: number }): number {
  const { angularSpeed, onTime } = requireInputObject(input);
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requireNonNegative("onTime", onTime, "s");
  return requireFiniteResult(angularSpeed * onTime, "beacon arc", { angularSpeed: [angularSpeed, "rad/s"], onTime: [onTime, "s"] });
}

/**
 * Loop rate needed to keep the heading step under a target at top speed
 * (openstax-up1-rotational-kinematics, θ = ωt solved for t).
 *
 * Formula: $f = \omega_{top} / \Delta\psi_{target}$
 *
 * @param angularSpeed ω_top [rad/s], 0 or more
 * @param targetStep Δψ_target [rad], greater than 0
 * @returns f [Hz]
 *
 * @example
 * loopRateForStep({ angularSpeed: rpmToRadPerSecond(3000), targetStep: (5 * Math.PI) / 180 }) // → 3600 [Hz] (5° steps)
 *
 * Sources: openstax-up1-rotational-kinematics.
 */
export function loopRateForStep(input: { angularSpeed: number; targetStep: number }): number {
  const { angularSpeed, targetStep } = requireInputObject(input);
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requirePositive("targetStep", targetStep, "rad");
  return requireFiniteResult(angularSpeed / targetStep, "loop rate", { angularSpeed: [angularSpeed, "rad/s"], targetStep: [targetStep, "rad"] });
}

/**
 * Heading LED on-time that gives a target arc at top speed (openstax-up1-rotational-kinematics).
 *
 * Formula: $t_{on} = w_{target} / \omega_{top}$
 *
 * @param angularSpeed ω_top [rad/s], greater than 0
 * @param targetArc w_target [rad], 0 or more
 * @returns t_on [s]
 *
 * @example
 * onTimeForArc({ angularSpeed: rpmToRadPerSecond(3000), targetArc: (20 * Math.PI) / 180 }) // → 0.00111 [s] (1.11 ms for a 20° arc)
 *
 * Sources: openstax-up1-rotational-kinematics.
 */
export function onTimeForArc(input: { angularSpeed: number; targetArc: number }): number {
  const { angularSpeed, targetArc } = requireInputObject(input);
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requireNonNegative("targetArc", targetArc, "rad");
  return requireFiniteResult(targetArc / angularSpeed, "on-time", { angularSpeed: [angularSpeed, "rad/s"], targetArc: [targetArc, "rad"] });
}

export { headingTimingInputs, type HeadingTimingInput } from "./timing-inputs.ts";
import { headingTimingInputs, type HeadingTimingInput } from "./timing-inputs.ts";

export interface HeadingTimingResult {
  /** 1/f [s]. */
  loopPeriod: number;
  /** Heading change per loop update at top speed [rad]. */
  headingStep: number;
  /** Loop updates per revolution at top speed [-]. */
  updatesPerRevolution: number;
  /** Heading offset from the latency at top speed [rad]. */
  latencyLag: number;
  /** Arc lit per revolution at top speed [rad]. */
  arcWidth: number;
  /** Loop rate that meets the target step [Hz]. */
  loopRateNeeded: number;
  /** On-time that gives the target arc [s]. */
  onTimeNeeded: number;
  /** True when the on-time is shorter than one loop period (needs a timer, not the loop). */
  onTimeBelowLoopPeriod: boolean;
  stepOk: boolean;
  arcOk: boolean;
  verdict: "ok" | "step-too-large" | "arc-too-wide" | "both";
}

/**
 * The timing check at top speed: heading step per loop, latency offset, heading LED arc, and the loop
 * rate and on-time that meet the targets (openstax-up1-rotational-kinematics).
 *
 * Formula: $\Delta\psi = \omega/f$, $\psi_{lag} = \omega L$, $w = \omega t_{on}$,
 * $f_{need} = \omega/\Delta\psi_{target}$, $t_{need} = w_{target}/\omega$
 *
 * @param input every field of `headingTimingInputs`, SI
 * @returns the figures above [rad, s, Hz] and a verdict
 *
 * @example
 * headingTiming({ topSpeed: rpmToRadPerSecond(3000), loopRate: 1000, latency: 0.0005, onTime: 0.001, targetArc: (20 * Math.PI) / 180, targetStep: (5 * Math.PI) / 180 }) // → { headingStep: 0.314, latencyLag: 0.157, arcWidth: 0.314, loopRateNeeded: 3600, onTimeNeeded: 0.00111, verdict: "step-too-large", … } (the defaults: step and arc 18.0°, lag 9.0°)
 *
 * Sources: openstax-up1-rotational-kinematics.
 */
export function headingTiming(input: HeadingTimingInput): HeadingTimingResult {
  requireWithinSpecs(headingTimingInputs, input);
  const { topSpeed, loopRate, latency, onTime, targetArc, targetStep } = requireInputObject(input);
  const headingStep = headingStepPerLoop({ angularSpeed: topSpeed, loopRate });
  const arcWidth = beaconArc({ angularSpeed: topSpeed, onTime });
  const stepOk = headingStep <= targetStep;
  const arcOk = arcWidth <= targetArc;
  // No finiteness guard: the declared ranges keep every figure at or below 1e8.
  return {
    loopPeriod: 1 / loopRate,
    headingStep,
    updatesPerRevolution: (TURN * loopRate) / topSpeed,
    latencyLag: latencyHeadingLag({ angularSpeed: topSpeed, latency }),
    arcWidth,
    loopRateNeeded: loopRateForStep({ angularSpeed: topSpeed, targetStep }),
    onTimeNeeded: onTimeForArc({ angularSpeed: topSpeed, targetArc }),
    onTimeBelowLoopPeriod: onTime < 1 / loopRate,
    stepOk,
    arcOk,
    verdict: stepOk && arcOk ? "ok" : !stepOk && !arcOk ? "both" : !stepOk ? "step-too-large" : "arc-too-wide",
  };
}

// ---------------------------------------------------------------------------------------------
