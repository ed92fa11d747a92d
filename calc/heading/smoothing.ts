/**
 * Smoothing the spin-rate estimate: what an exponential moving average (after an optional running
 * median) costs in lag during a spin-up and does to one spike. SI in and out: rad/s, m/s², s, Hz.
 */
import { CalcInputError, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireWithinSpecs, requireInputObject, requireFiniteFields, requireFiniteResult } from "../core/spec-check.ts";

// 2. Smoothing.

function requireSmoothingFactor(smoothingFactor: number): void {
  requireInRange("smoothingFactor", smoothingFactor, "", { min: 0, max: 1, minOpen: true });
}

/**
 * Time constant of an exponential moving average y += α(x − y) run at a fixed sample rate
 * (smith-dsp-1997 ch. 19 single-pole filter, 1 − α = e^(−Δt/τ); nist-ehandbook-exp-smoothing).
 *
 * Formula: $\tau = -\dfrac{\Delta t}{\ln(1 - \alpha)}$ (exact), $\tau \approx \Delta t/\alpha$ for small α
 *
 * @param smoothingFactor α [-], 0 < α ≤ 1
 * @param samplePeriod Δt [s], greater than 0
 * @returns τ [s] (0 when α = 1: no smoothing) and the small-α approximation [s]
 *
 * @example
 * emaTimeConstant({ smoothingFactor: 0.1, samplePeriod: 0.001 }) // → { exact: 0.00949, smallFactorApproximation: 0.010 } [s] (α = 0.1 at 1 kHz: 9.49 ms, approximation 10 ms)
 *
 * Sources: smith-dsp-1997, nist-ehandbook-exp-smoothing.
 */
export function emaTimeConstant(input: { smoothingFactor: number; samplePeriod: number }): {
  exact: number;
  smallFactorApproximation: number;
} {
  const { smoothingFactor, samplePeriod } = requireInputObject(input);
  requireSmoothingFactor(smoothingFactor);
  requirePositive("samplePeriod", samplePeriod, "s");
  // smith-dsp-1997: 1 − α = e^(−Δt/τ)
  // Stryker disable next-line ConditionalExpression: equivalent, at α = 1 the formula gives −Δt/ln(0) = −Δt/−∞ = +0 as well
  const exact = smoothingFactor === 1 ? 0 : -samplePeriod / Math.log1p(-smoothingFactor);
  return requireFiniteFields({ exact, smallFactorApproximation: samplePeriod / smoothingFactor }, "time constant", { samplePeriod: [samplePeriod, "s"] });
}

/**
 * Smoothing factor that gives a chosen time constant (smith-dsp-1997 ch. 19, inverse of
 * `emaTimeConstant`).
 *
 * Formula: $\alpha = 1 - e^{-\Delta t/\tau}$
 *
 * @param timeConstant τ [s], 0 or more (0 gives α = 1)
 * @param samplePeriod Δt [s], greater than 0
 * @returns α [-]
 *
 * @example
 * emaFactorForTimeConstant({ timeConstant: 0.01, samplePeriod: 0.001 }) // → 0.0952 (τ = 10 ms at 1 kHz)
 *
 * Sources: smith-dsp-1997.
 */
export function emaFactorForTimeConstant(input: { timeConstant: number; samplePeriod: number }): number {
  const { timeConstant, samplePeriod } = requireInputObject(input);
  requireNonNegative("timeConstant", timeConstant, "s");
  requirePositive("samplePeriod", samplePeriod, "s");
  // Stryker disable next-line ConditionalExpression: equivalent, at τ = 0 the formula gives −expm1(−Δt/0) = −expm1(−∞) = 1 as well
  if (timeConstant === 0) return 1;
  // Finite without a guard: 1 − e^(−x) lies between 0 and 1 for every x from 0 to +∞.
  return -Math.expm1(-samplePeriod / timeConstant);
}

/**
 * Steady-state delay of an exponential moving average tracking a ramp (brown-1963; derived here:
 * with e_n = x_n − y_n and x rising by cΔt per sample, e_n = (1 − α)(e_{n−1} + cΔt), whose fixed
 * point is e = cΔt(1 − α)/α).
 *
 * Formula: $\tau_{lag} = \Delta t\,\dfrac{1 - \alpha}{\alpha}$; lag in the tracked quantity $= c\,\tau_{lag}$
 *
 * @param smoothingFactor α [-], 0 < α ≤ 1
 * @param samplePeriod Δt [s], greater than 0
 * @returns τ_lag [s]
 *
 * Assumptions: the output is compared with the input at the same sample (both taken at t_n). The
 * mean delay of the filter's impulse response is the same (1 − α)/α samples, so a speed change Δω
 * leaves a heading error of Δω·τ_lag once the filter settles, whatever the ramp's shape.
 *
 * @example
 * emaRampLag({ smoothingFactor: 0.1, samplePeriod: 0.001 }) // → 0.0090 [s] (9.0 ms)
 *
 * Sources: brown-1963, smith-dsp-1997.
 */
export function emaRampLag(input: { smoothingFactor: number; samplePeriod: number }): number {
  const { smoothingFactor, samplePeriod } = requireInputObject(input);
  requireSmoothingFactor(smoothingFactor);
  requirePositive("samplePeriod", samplePeriod, "s");
  // brown-1963: single smoothing lags a linear trend by (1 − α)/α periods
  return requireFiniteResult((samplePeriod * (1 - smoothingFactor)) / smoothingFactor, "ramp lag", { samplePeriod: [samplePeriod, "s"] });
}

/**
 * Factor by which an exponential moving average shrinks the scatter of white noise (roberts-1959,
 * steady-state variance of the geometric moving average).
 *
 * Formula: $\sigma_y / \sigma_x = \sqrt{\alpha / (2 - \alpha)}$
 *
 * @param smoothingFactor α [-], 0 < α ≤ 1
 * @returns σ_y/σ_x [-]
 *
 * @example
 * emaNoiseFactor({ smoothingFactor: 0.1 }) // → 0.229
 *
 * Sources: roberts-1959.
 */
export function emaNoiseFactor(input: { smoothingFactor: number }): number {
  const { smoothingFactor } = requireInputObject(input);
  requireSmoothingFactor(smoothingFactor);
  return Math.sqrt(smoothingFactor / (2 - smoothingFactor));
}

/**
 * How far one spike in the reading moves the spin-rate estimate (spinner-heading-practice,
 * ω̂ = √(ω² + S/r̂) for a spike S on top of the steady reading).
 *
 * Formula: $S_\omega = \sqrt{\omega^2 + S/\hat r} - \omega$
 *
 * @param angularSpeed ω, the speed the estimate sits at [rad/s], 0 or more
 * @param assumedRadius r̂ [m], greater than 0
 * @param spike S, the extra acceleration in one reading [m/s²], 0 or more
 * @returns S_ω [rad/s]
 *
 * @example
 * spikeRateError({ angularSpeed: rpmToRadPerSecond(2000), assumedRadius: 0.012, spike: 50 * STANDARD_GRAVITY }) // → 81.64 [rad/s]
 *
 * Sources: spinner-heading-practice.
 */
export function spikeRateError(input: { angularSpeed: number; assumedRadius: number; spike: number }): number {
  const { angularSpeed, assumedRadius, spike } = requireInputObject(input);
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requirePositive("assumedRadius", assumedRadius, "m");
  requireNonNegative("spike", spike, "m/s²");
  const extra = spike / assumedRadius;
  if (extra === 0) return 0;
  // √(ω² + x) − ω = x/(√(ω² + x) + ω), no cancellation
  return requireFiniteResult(extra / (Math.sqrt(angularSpeed * angularSpeed + extra) + angularSpeed), "rate error", {
    angularSpeed: [angularSpeed, "rad/s"],
    assumedRadius: [assumedRadius, "m"],
    spike: [spike, "m/s²"],
  });
}

/**
 * Delay a running median of N samples adds (tukey-1977, running medians; on a straight ramp the
 * median of an odd window is its middle sample).
 *
 * Formula: $\tau_{med} = \dfrac{N - 1}{2}\,\Delta t$
 *
 * @param windowLength N [-], odd whole number, 1 to 99 (1 means no median)
 * @param samplePeriod Δt [s], greater than 0
 * @returns τ_med [s]
 *
 * @example
 * medianFilterDelay({ windowLength: 3, samplePeriod: 0.001 }) // → 0.001 [s] (1 ms)
 *
 * Sources: tukey-1977.
 */
export function medianFilterDelay(input: { windowLength: number; samplePeriod: number }): number {
  const { windowLength, samplePeriod } = requireInputObject(input);
  requireMedianWindow(windowLength);
  requirePositive("samplePeriod", samplePeriod, "s");
  return requireFiniteResult(((windowLength - 1) / 2) * samplePeriod, "filter delay", { samplePeriod: [samplePeriod, "s"] });
}

function requireMedianWindow(windowLength: number): void {
  requireInRange("windowLength", windowLength, "", { min: 1, max: 99 });
  if (!Number.isInteger(windowLength) || windowLength % 2 !== 1) {
    throw new CalcInputError({ param: "windowLength", value: windowLength, expected: "an odd whole number", unit: "" });
  }
}

export { headingSmoothingInputs, type HeadingSmoothingInput } from "./smoothing-inputs.ts";
import { headingSmoothingInputs, type HeadingSmoothingInput } from "./smoothing-inputs.ts";

export interface SmoothingFigures {
  /** α [-]. */
  smoothingFactor: number;
  /** EMA time constant, exact [s]. */
  timeConstant: number;
  /** Δt/α [s]. */
  timeConstantApproximation: number;
  /** Steady ramp delay of the EMA alone [s]. */
  emaLag: number;
  /** Delay of the running median [s]. */
  medianDelay: number;
  /** emaLag + medianDelay [s]. */
  totalDelay: number;
  /** How far the estimate trails the true rate during the spin-up [rad/s] (positive = trails). */
  rateLagDuringSpinUp: number;
  /** Heading drift rate during the spin-up, ω̂ − ω [rad/s] (negative: heading falls behind). */
  driftRateDuringSpinUp: number;
  /** Heading error left by the whole speed change once the filter has settled [rad] (falls behind for a spin-up). */
  headingErrorAfterSpinUp: number;
  /** Heading error accumulated by the end of the ramp, EMA only [rad]. */
  headingErrorAtRampEnd: number;
  /** White-noise scatter after the EMA, as a fraction of before [-]. */
  noiseFactor: number;
  /** Rate error one spike puts in the raw estimate [rad/s]. */
  spikeRateError: number;
  /** How far the EMA output moves on the spike's sample [rad/s] (after a median of 3 or more: 0). */
  spikeFirstShift: number;
  /** Samples after the spike until its effect on the EMA output is below 1 % of the spike [-]. */
  spikeSettleSamples: number;
  /** Heading error one spike leaves [rad] (the EMA spreads it but keeps all of it: S_ω·Δt; a median of 3 or more removes it). */
  spikeHeadingError: number;
}

/** Heading-error figures of the EMA (and optional median) at one α; shared by the check and the series. */
function smoothingFigures(
  smoothingFactor: number,
  samplePeriod: number,
  spinUpAcceleration: number,
  speedChange: number,
  spikeRate: number,
  medianLength: number,
): SmoothingFigures {
  const tc = emaTimeConstant({ smoothingFactor, samplePeriod });
  const emaLag = emaRampLag({ smoothingFactor, samplePeriod });
  const medianDelay = medianFilterDelay({ windowLength: medianLength, samplePeriod });
  const totalDelay = emaLag + medianDelay;
  const rateLag = spinUpAcceleration * totalDelay;
  // Exact sum for the EMA started at rest on the ramp: Σ e_n Δt with e_n = AΔt(1−α)/α·(1 − (1−α)^n), n = 1..N
  const keep = 1 - smoothingFactor;
  const samples = speedChange / (spinUpAcceleration * samplePeriod);
  const transient = smoothingFactor === 1 ? 0 : (keep * -Math.expm1(samples * Math.log1p(-smoothingFactor))) / smoothingFactor;
  const headingErrorAtRampEnd = spinUpAcceleration * samplePeriod * emaLag * (samples - transient);
  const rejects = medianLength >= 3;
  const firstShift = rejects ? 0 : smoothingFactor * spikeRate;
  let settle = 0;
  if (!rejects && spikeRate > 0 && smoothingFactor >= 0.01) {
    // Stryker disable next-line ConditionalExpression: equivalent, at α = 1 the formula gives ⌊ln(0.01)/ln(0)⌋ + 1 = ⌊+0⌋ + 1 = 1 as well
    settle = smoothingFactor === 1 ? 1 : Math.floor(Math.log(0.01 / smoothingFactor) / Math.log1p(-smoothingFactor)) + 1;
  }
  return {
    smoothingFactor,
    timeConstant: tc.exact,
    timeConstantApproximation: tc.smallFactorApproximation,
    emaLag,
    medianDelay,
    totalDelay,
    rateLagDuringSpinUp: rateLag,
    driftRateDuringSpinUp: -rateLag,
    headingErrorAfterSpinUp: speedChange * totalDelay,
    headingErrorAtRampEnd,
    noiseFactor: emaNoiseFactor({ smoothingFactor }),
    spikeRateError: spikeRate,
    spikeFirstShift: firstShift,
    spikeSettleSamples: settle,
    spikeHeadingError: rejects ? 0 : spikeRate * samplePeriod,
  };
}

export interface HeadingSmoothingResult extends SmoothingFigures {
  /** 1/f_s [s]. */
  samplePeriod: number;
  /** Duration of the spin-up, Δω/A [s]. */
  spinUpDuration: number;
  /** Consecutive spike samples one median window can reject, (N − 1)/2 [-]. */
  spikesRejectedPerWindow: number;
}

/**
 * The smoothing check: what an exponential moving average (after an optional running median)
 * costs in lag during a spin-up and what it does to one spike (smith-dsp-1997, brown-1963,
 * roberts-1959, tukey-1977).
 *
 * Formula: $\tau = -\Delta t/\ln(1-\alpha)$; $\tau_{lag} = \Delta t(1-\alpha)/\alpha + \tfrac{N-1}{2}\Delta t$;
 * drift during spin-up $= -\dot\omega\,\tau_{lag}$; heading error after a change Δω $= \Delta\omega\,\tau_{lag}$;
 * one spike: EMA shift $\alpha S_\omega$ then $\alpha(1-\alpha)^m S_\omega$, heading error $S_\omega \Delta t$
 *
 * @param input every field of `headingSmoothingInputs`, SI
 * @returns the figures above [s, rad/s, rad, -]
 *
 * Assumptions: the filter smooths the spin-rate estimate ω̂ (after the square root) once per
 * sample; the median sees each spike as a single sample. An EMA does not shrink the heading error
 * of a spike, it spreads it: the sum of α(1 − α)^m over m is 1.
 *
 * @example
 * headingSmoothing({ sampleRate: 1000, smoothingFactor: 0.1, spinUpAcceleration: rpmToRadPerSecond(2000), speedChange: rpmToRadPerSecond(3000), speed: rpmToRadPerSecond(2000), assumedRadius: 0.012, spike: 50 * STANDARD_GRAVITY, medianLength: 3 }) // → { totalDelay: 0.010, driftRateDuringSpinUp: −2.09, spinUpDuration: 1.5, headingErrorAfterSpinUp: 3.14, … } (the defaults: 10 ms delay, −120 °/s during the spin-up, 180° behind afterwards)
 *
 * Sources: smith-dsp-1997, brown-1963, roberts-1959, tukey-1977, spinner-heading-practice.
 */
export function headingSmoothing(input: HeadingSmoothingInput): HeadingSmoothingResult {
  requireWithinSpecs(headingSmoothingInputs, input);
  if (input.medianLength % 2 !== 1) {
    throw new CalcInputError({ param: "medianLength", value: input.medianLength, expected: "an odd whole number", unit: "" });
  }
  const samplePeriod = 1 / input.sampleRate;
  const spikeRate = spikeRateError({ angularSpeed: input.speed, assumedRadius: input.assumedRadius, spike: input.spike });
  const figures = smoothingFigures(input.smoothingFactor, samplePeriod, input.spinUpAcceleration, input.speedChange, spikeRate, input.medianLength);
  // No finiteness guard: the declared ranges keep every figure below 1e11.
  return {
    ...figures,
    samplePeriod,
    spinUpDuration: input.speedChange / input.spinUpAcceleration,
    spikesRejectedPerWindow: (input.medianLength - 1) / 2,
  };
}

/**
 * The smoothing trade-off over α, for a plot: lag and spin-up heading error against noise and
 * spike response (same formulas as `headingSmoothing`).
 *
 * Formula: α_i log-spaced from α_min to 1; each point as in `headingSmoothing`
 *
 * @param input every field of `headingSmoothingInputs` (its α is ignored), SI
 * @param smallestFactor α_min [-], 1e-4 ≤ α_min < 1 (default 0.005)
 * @param points number of α values [-], whole, 2 to 501 (default 60)
 * @returns one `SmoothingFigures` per α, α rising
 *
 * @example
 * smoothingTradeoffSeries({ sampleRate: 1000, smoothingFactor: 0.1, spinUpAcceleration: rpmToRadPerSecond(2000), speedChange: rpmToRadPerSecond(3000), speed: rpmToRadPerSecond(2000), assumedRadius: 0.012, spike: 50 * STANDARD_GRAVITY, medianLength: 1 }).at(-1) // → { smoothingFactor: 1, emaLag: 0, noiseFactor: 1, spikeRateError: 81.64, spikeFirstShift: 81.64, … } (at α = 1 and no median the EMA adds no delay and passes the whole spike)
 *
 * Sources: smith-dsp-1997, brown-1963, roberts-1959, tukey-1977.
 */
export function smoothingTradeoffSeries(input: HeadingSmoothingInput, options: { smallestFactor?: number; points?: number } = {}): SmoothingFigures[] {
  const { smallestFactor = 0.005, points = 60 } = requireInputObject(options);
  requireWithinSpecs(headingSmoothingInputs, input);
  if (input.medianLength % 2 !== 1) {
    throw new CalcInputError({ param: "medianLength", value: input.medianLength, expected: "an odd whole number", unit: "" });
  }
  requireInRange("smallestFactor", smallestFactor, "", { min: 1e-4, max: 1, maxOpen: true });
  requireInRange("points", points, "", { min: 2, max: 501 });
  if (!Number.isInteger(points)) throw new CalcInputError({ param: "points", value: points, expected: "a whole number", unit: "" });
  const samplePeriod = 1 / input.sampleRate;
  const spikeRate = spikeRateError({ angularSpeed: input.speed, assumedRadius: input.assumedRadius, spike: input.spike });
  const out: SmoothingFigures[] = [];
  const logMin = Math.log(smallestFactor);
  for (let i = 0; i < points; i++) {
    // The last α is 1 exactly: i/(points − 1) is then 1, the exponent 0.
    const alpha = Math.exp(logMin * (1 - i / (points - 1)));
    out.push(smoothingFigures(alpha, samplePeriod, input.spinUpAcceleration, input.speedChange, spikeRate, input.medianLength));
  }
  // No finiteness guard: the declared ranges and α ≥ 1e-4 keep every figure below 1e11.
  return out;
}
