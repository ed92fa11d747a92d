/**
 * The drift-budget calculator: its inputs and its one entry `headingDrift` (the drift at a speed,
 * the radius band and the speed range that stay within a budget, and the verdict).
 */
import { requireRelation } from "../core/errors.ts";
import { type HeadingDriftInput, headingDriftInputs } from "./drift-inputs.ts";
import { requireWithinSpecs } from "../core/spec-check.ts";
import {
  type DriftPoint,
  type RadiusBand,
  type SpeedRange,
  type SpinRateErrorModel,
  assumedRadiusBand,
  headingDriftAt,
  headingDriftSeries,
  lowestEstimableSpeed,
  speedRangeWithinBudget,
} from "./drift.ts";

export type DriftVerdict = "within-budget" | "over-budget" | "no-estimate";

export interface HeadingDriftResult {
  /** The drift at the chosen speed. */
  atSpeed: DriftPoint;
  /** Whether |drift| ≤ budget at the chosen speed. */
  verdict: DriftVerdict;
  /** Budget − |ω̂ − ω| at the chosen speed [rad/s]: positive within budget, negative over; null when no estimate. */
  budgetMargin: number | null;
  /** Assumed radii that would keep the drift within budget at the chosen speed. */
  radiusBand: RadiusBand;
  /** Speeds over which the present calibration stays within budget. */
  speedRange: SpeedRange;
  /** Below this speed the corrected reading is 0 or less [rad/s] (0 when it never is). */
  lowestEstimableSpeed: number;
  /** 1σ scatter of one spin-rate estimate from reading noise [rad/s], null when not defined. */
  rateNoise: number | null;
  /** Drift over the plot range (61 points). */
  series: DriftPoint[];
}

/**
 * The drift-budget check: drift at a speed, the radius band and speed range that keep it within
 * the driver's trim, and the drift curve for the plot (spinner-heading-practice; noise by
 * nist-ehandbook-propagation).
 *
 * Formula: drift $= \hat\omega - \omega$ (see `headingDriftAt`); rate noise
 * $\sigma_{\hat\omega} \approx \dfrac{\sigma_a}{2\hat r\,\hat\omega}$
 *
 * @param input every field of `headingDriftInputs`, SI
 * @returns drift, band, range, series, a verdict and the margin left in the budget [rad/s]
 *
 * Assumptions: steady spin; the noise figure is first-order (propagation of error) and says how
 * much one reading scatters, not how the heading wanders (that depends on the loop rate and any
 * smoothing).
 *
 * @example
 * headingDrift({ angularSpeed: rpmToRadPerSecond(2000), assumedRadius: 0.012, trueRadius: 0.0127, scaleError: 0, bias: 0.2 * STANDARD_GRAVITY, biasCorrection: 0, tilt: 0, budget: (10 * Math.PI) / 180, lowSpeed: rpmToRadPerSecond(200), highSpeed: rpmToRadPerSecond(3000), accelerationNoise: 0 }) // → { atSpeed: { driftRate: 6.401, … }, verdict: "over-budget", radiusBand: { low: 0.0127235, high: 0.0127660, … }, speedRange: { status: "empty", … }, … } (the defaults: 366.8 °/s; no speed range within budget)
 *
 * Sources: spinner-heading-practice, openstax-college-physics, ieee-1293-1998, nist-ehandbook-propagation.
 */
export function headingDrift(input: HeadingDriftInput): HeadingDriftResult {
  requireWithinSpecs(headingDriftInputs, input);
  requireRelation("highSpeed", input.highSpeed, "greater", input.lowSpeed, { kind: "angularSpeed", unit: "rad/s", other: "lowSpeed" });
  const model: SpinRateErrorModel = {
    assumedRadius: input.assumedRadius,
    trueRadius: input.trueRadius,
    scaleError: input.scaleError,
    bias: input.bias,
    biasCorrection: input.biasCorrection,
    tilt: input.tilt,
  };
  const atSpeed = headingDriftAt({ ...model, angularSpeed: input.angularSpeed });
  const verdict: DriftVerdict = atSpeed.driftRate === null ? "no-estimate" : Math.abs(atSpeed.driftRate) <= input.budget ? "within-budget" : "over-budget";
  // nist-ehandbook-propagation: σ_ω̂ = |∂ω̂/∂a| σ_a, ∂ω̂/∂a = 1/(2 r̂ ω̂)
  const rateNoise = atSpeed.estimate === null ? null : input.accelerationNoise / (2 * input.assumedRadius * atSpeed.estimate);
  // No finiteness guard: each part is checked by its own function, and within the declared ranges the rate noise is at most 490/(2 × 1e−4 × 2.2e−162) and the margin at most the budget.
  return {
    atSpeed,
    verdict,
    budgetMargin: atSpeed.driftRate === null ? null : input.budget - Math.abs(atSpeed.driftRate),
    radiusBand: assumedRadiusBand({ ...model, angularSpeed: input.angularSpeed, budget: input.budget }),
    speedRange: speedRangeWithinBudget({ ...model, budget: input.budget }),
    lowestEstimableSpeed: lowestEstimableSpeed(model),
    rateNoise,
    series: headingDriftSeries({ ...model, lowSpeed: input.lowSpeed, highSpeed: input.highSpeed, points: 61 }),
  };
}

// ---------------------------------------------------------------------------------------------
