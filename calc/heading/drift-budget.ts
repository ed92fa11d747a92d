/**
 * The drift-budget calculator: its inputs and its one entry `headingDrift` (the drift at a speed,
 * the radius band and the speed range that stay within a budget, and the verdict).
 */
import { CalcInputError } from "../core/errors.ts";
import { defineInputs } from "../core/inputs.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { rpmToRadPerSecond } from "../core/units.ts";
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
  round6,
  speedRangeWithinBudget,
} from "./drift.ts";

/** Inputs of the drift-budget calculator, in SI. */
export const headingDriftInputs = /* @__PURE__ */ defineInputs({
  angularSpeed: {
    label: "Spin speed",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(2000),
    urlKey: "rpm",
    help: "The true spin rate at which to read the drift.",
  },
  assumedRadius: {
    label: "Radius in firmware",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.012,
    urlKey: "ra",
    help: "The sensor radius the firmware divides by.",
  },
  trueRadius: {
    label: "True radius",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.0127,
    urlKey: "rt",
    help: "The real distance from the spin axis (through the centre of mass) to the sensing element.",
  },
  scaleError: {
    label: "Sensor scale error",
    kind: "fraction",
    min: -0.5,
    max: 0.5,
    default: 0,
    urlKey: "k",
    help: "How far the radial axis reads high (+) or low (−), e.g. 2 % for a part that reads 102 g at 100 g.",
  },
  bias: {
    label: "Sensor offset",
    kind: "acceleration",
    min: -50 * STANDARD_GRAVITY,
    max: 50 * STANDARD_GRAVITY,
    default: 0.2 * STANDARD_GRAVITY,
    urlKey: "b",
    help: "What the radial axis reads at rest with no acceleration along it (its zero-g offset).",
  },
  biasCorrection: {
    label: "Offset subtracted in firmware",
    kind: "acceleration",
    min: -50 * STANDARD_GRAVITY,
    max: 50 * STANDARD_GRAVITY,
    default: 0,
    urlKey: "bh",
    help: "The offset the firmware removes before dividing by the radius.",
  },
  tilt: {
    label: "Axis tilt",
    kind: "angle",
    min: 0,
    max: (80 * Math.PI) / 180,
    default: 0,
    urlKey: "tilt",
    help: "Angle between the sensing axis and the line to the spin axis.",
  },
  budget: {
    label: "Drift the driver can trim",
    kind: "angularSpeed",
    min: 0,
    minOpen: true,
    max: (3600 * Math.PI) / 180,
    default: (10 * Math.PI) / 180,
    unit: { metric: "deg/s", us: "deg/s" },
    urlKey: "budget",
    help: "The heading drift rate the driver can hold off with the trim control.",
  },
  lowSpeed: {
    label: "Plot from",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(200),
    urlKey: "lo",
    help: "Lowest speed on the drift plot.",
  },
  highSpeed: {
    label: "Plot to",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(3000),
    urlKey: "hi",
    help: "Highest speed on the drift plot.",
  },
  accelerationNoise: {
    label: "Reading noise",
    kind: "acceleration",
    min: 0,
    max: 50 * STANDARD_GRAVITY,
    default: 0,
    urlKey: "n",
    help: "RMS noise of one radial reading; 0 if unknown.",
  },
});

export type HeadingDriftInput = { [K in keyof typeof headingDriftInputs]: number };

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
 * smoothing). Example: the defaults (2000 rpm, r̂ = 12.0 mm, r = 12.7 mm, 0.2 g offset left in):
 * drift 6.401 rad/s (366.8 °/s), over budget; radius band 12.7235 mm to 12.7660 mm; no speed range.
 *
 * Sources: spinner-heading-practice, openstax-college-physics, ieee-1293-1998, nist-ehandbook-propagation.
 */
export function headingDrift(input: HeadingDriftInput): HeadingDriftResult {
  requireWithinSpecs(headingDriftInputs, input);
  if (!(input.highSpeed > input.lowSpeed)) {
    throw new CalcInputError({
      param: "highSpeed",
      value: input.highSpeed,
      expected: `greater than lowSpeed (${round6(input.lowSpeed)} rad/s)`,
      unit: "rad/s",
    });
  }
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
