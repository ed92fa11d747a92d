/**
 * Heading from an accelerometer: a whole-body spinner that steers while spinning estimates its spin
 * rate from the radial (centripetal) reading of an accelerometer, ω̂ = √((a − b̂)/r̂), and
 * integrates it to a heading. This module works out how calibration errors turn into heading drift
 * (exactly, and term by term) and why two opposed sensors do not care where the centre of mass is.
 * Re-exported by calc/heading.ts. SI in and out: rad/s, rad, m, m/s², s, Hz.
 *
 * Sign convention throughout: drift = ω̂ − ω. Positive drift means the estimated heading runs ahead
 * of the true heading (the robot "thinks" it has turned further than it has).
 */
import { CalcInputError, requireFinite, requireInRange, requirePositive } from "../core/errors.ts";
import { defineInputs } from "../core/inputs.ts";
import { STANDARD_GRAVITY, TURN } from "../core/constants.ts";
import { fromSI, rpmToRadPerSecond } from "../core/units.ts";
import { requireWithinSpecs } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// Helpers (not exported).

function round6(x: number): number {
  return Number(x.toPrecision(6));
}

/**
 * Real roots of A x² + B x + C = 0 without cancellation (numerical-recipes-2007 §5.6:
 * q = −½(B + sgn(B)√(B² − 4AC)), x₁ = q/A, x₂ = C/q). Returns finite roots only.
 */
function quadraticRoots(a: number, b: number, c: number): number[] {
  if (a === 0) {
    if (b === 0) return [];
    return [-c / b].filter(Number.isFinite);
  }
  const disc = b * b - 4 * a * c;
  if (disc < 0) return [];
  const q = -0.5 * (b + (b >= 0 ? 1 : -1) * Math.sqrt(disc));
  const roots = [q / a];
  if (q !== 0) roots.push(c / q);
  return roots.filter(Number.isFinite);
}

// ---------------------------------------------------------------------------------------------
// 1. Drift budget.

/**
 * How the firmware's assumptions differ from the robot. All SI.
 *
 * The reading is modelled as $a_{meas} = (1 + k)\,\omega^2 r \cos\theta + b$ (ieee-1293-1998 style
 * bias and scale-factor terms). The tilt θ is the angle between the sensing axis and the true
 * radial direction; the axis then sees cos θ of the centripetal term. Whether the tilt is in the
 * spin plane or out of it, the centripetal part is the same; an out-of-plane tilt on a robot whose
 * spin axis is vertical also picks up g·sin θ from gravity (add it to `bias`), and an in-plane tilt
 * picks up r·sin θ·dω/dt during a spin-up (not modelled: steady speed).
 */
export interface SpinRateErrorModel {
  /** r̂, the radius the firmware assumes [m], greater than 0. */
  assumedRadius: number;
  /** r, the sensing element's true distance from the spin axis [m], greater than 0. */
  trueRadius: number;
  /** k, the sensor's scale-factor error on the radial axis [-], greater than −1 (0.02 = reads 2 % high). */
  scaleError: number;
  /** b, the sensor's true zero-g offset on the radial axis [m/s²]. */
  bias: number;
  /** b̂, the offset the firmware subtracts [m/s²]. */
  biasCorrection: number;
  /** θ, the sensing axis's tilt from the true radial direction [rad], 0 ≤ θ < π/2. */
  tilt: number;
}

function requireModel(m: SpinRateErrorModel): void {
  requirePositive("assumedRadius", m.assumedRadius, "m");
  requirePositive("trueRadius", m.trueRadius, "m");
  requireFinite("scaleError", m.scaleError, "");
  if (!(m.scaleError > -1)) {
    throw new CalcInputError({ param: "scaleError", value: m.scaleError, expected: "greater than −1", unit: "" });
  }
  requireFinite("bias", m.bias, "m/s²");
  requireFinite("biasCorrection", m.biasCorrection, "m/s²");
  requireFinite("tilt", m.tilt, "rad");
  if (!(m.tilt >= 0 && m.tilt < Math.PI / 2)) {
    throw new CalcInputError({ param: "tilt", value: m.tilt, expected: "at least 0 rad and less than π/2 rad (90°)", unit: "rad" });
  }
}

/** The model reduced to ω̂² = G ω² + β, with G − 1 formed without cancellation. */
interface ReducedModel {
  /** G = (1 + k) cos θ · r / r̂ [-]. */
  gain: number;
  /** G − 1, computed as (r[k cos θ − 2 sin²(θ/2)] + (r − r̂)) / r̂ so that it is exactly 0 for an exact calibration. */
  gainError: number;
  /** β = (b − b̂)/r̂ [rad²/s²]. */
  biasTerm: number;
}

function reduce(m: SpinRateErrorModel): ReducedModel {
  const cos = Math.cos(m.tilt);
  const halfSin = Math.sin(m.tilt / 2);
  // (1 + k)cos θ − 1 = k cos θ − 2 sin²(θ/2) (half-angle identity, abramowitz-stegun-1964 ch. 4)
  const sensorGainError = m.scaleError * cos - 2 * halfSin * halfSin;
  const gainError = (m.trueRadius * sensorGainError + (m.trueRadius - m.assumedRadius)) / m.assumedRadius;
  return {
    gain: ((1 + m.scaleError) * cos * m.trueRadius) / m.assumedRadius,
    gainError,
    biasTerm: (m.bias - m.biasCorrection) / m.assumedRadius,
  };
}

/** ω̂ − ω at ω, or null when the corrected reading is 0 or less (spinner-heading-practice). */
function exactDrift(r: ReducedModel, angularSpeed: number): { estimate: number; drift: number } | null {
  const excess = r.gainError * angularSpeed * angularSpeed + r.biasTerm; // ω̂² − ω²
  const estimateSquared = angularSpeed * angularSpeed + excess;
  if (!(estimateSquared > 0)) return null;
  const estimate = Math.sqrt(estimateSquared);
  // ω̂ − ω = (ω̂² − ω²)/(ω̂ + ω): no cancellation when the error is small
  return { estimate, drift: excess / (estimate + angularSpeed) };
}

/** Linearised drift contributions of each error term [rad/s]; their sum is `total`. */
export interface DriftTerms {
  /** From r ≠ r̂ [rad/s]. */
  radius: number;
  /** From the scale-factor error k [rad/s]. */
  scale: number;
  /** From the tilt θ [rad/s] (always 0 or negative). */
  tilt: number;
  /** From the uncorrected bias b − b̂ [rad/s]. */
  bias: number;
  /** Radius + scale + tilt: the part that grows in proportion to ω [rad/s]. */
  speedProportional: number;
  /** Sum of the four [rad/s]. */
  total: number;
}

/** Each error term acting alone, exactly [rad/s]; the bias term is null where it alone leaves no estimate. */
export interface DriftTermsAlone {
  radius: number;
  scale: number;
  tilt: number;
  bias: number | null;
}

/** Drift figures at one true spin rate. */
export interface DriftPoint {
  /** ω, the true spin rate [rad/s]. */
  angularSpeed: number;
  /** False when the corrected reading a_meas − b̂ is 0 or less: the firmware has no estimate. */
  defined: boolean;
  /** a_meas − b̂, the reading after the firmware's offset correction [m/s²]. */
  correctedReading: number;
  /** ω̂ [rad/s], null when not defined. */
  estimate: number | null;
  /** ω̂ − ω, exact [rad/s], null when not defined. */
  driftRate: number | null;
  /** Heading error gained per true revolution, 2π(ω̂/ω − 1) [rad], null when not defined. */
  driftPerRevolution: number | null;
  /** ω̂/ω [-], null when not defined. */
  speedRatio: number | null;
  /** First-order contributions of each term. */
  linear: DriftTerms;
  /** Each term alone, exact. */
  alone: DriftTermsAlone;
}

/**
 * Heading drift rate at one spin rate, exact and term by term (spinner-heading-practice;
 * openstax-college-physics a = ω²r; ieee-1293-1998 error model; abramowitz-stegun-1964 binomial
 * series for the linear terms).
 *
 * Formula: $\hat\omega = \sqrt{\dfrac{(1+k)\,\omega^2 r\cos\theta + b - \hat b}{\hat r}}$,
 * drift $= \hat\omega - \omega$; linearised
 * $\hat\omega - \omega \approx \tfrac{\omega}{2}\left(\tfrac{r - \hat r}{\hat r} + k + (\cos\theta - 1)\right) + \dfrac{b - \hat b}{2\hat r\,\omega}$
 *
 * @param angularSpeed ω, true spin rate [rad/s], greater than 0
 * @param model the firmware's assumptions vs the robot (see `SpinRateErrorModel`)
 * @returns the exact drift [rad/s], per revolution [rad], the estimate [rad/s], the linear and
 * exact-alone contributions [rad/s]; `defined: false` (with nulls) when a_meas − b̂ ≤ 0
 *
 * Assumptions: steady spin about a fixed axis through the centre of mass; noise-free reading.
 * The radius and scale terms grow ∝ ω (a constant angle per revolution); the bias term falls ∝ 1/ω.
 * Example: r̂ = 8 mm, r = 9 mm, at 2000 rpm: ω̂/ω = √(9/8) = 1.06066, drift 12.70 rad/s
 * (728 °/s), 0.3811 rad (21.84°) per revolution.
 *
 * Sources: spinner-heading-practice, openstax-college-physics, ieee-1293-1998, abramowitz-stegun-1964.
 */
export function headingDriftAt(input: { angularSpeed: number } & SpinRateErrorModel): DriftPoint {
  const { angularSpeed } = input;
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requireModel(input);
  const reduced = reduce(input);
  const w2 = angularSpeed * angularSpeed;
  // ieee-1293-1998: a_meas = (1 + k) a + b, with a = ω² r cos θ (openstax-college-physics)
  const correctedReading = (1 + input.scaleError) * Math.cos(input.tilt) * w2 * input.trueRadius + input.bias - input.biasCorrection;
  const exact = exactDrift(reduced, angularSpeed);
  const halfW = angularSpeed / 2;
  // binomial series √(1 + x) ≈ 1 + x/2 (abramowitz-stegun-1964 ch. 3), one term at a time
  const halfSin = Math.sin(input.tilt / 2);
  const linear = {
    radius: (halfW * (input.trueRadius - input.assumedRadius)) / input.assumedRadius,
    scale: halfW * input.scaleError,
    tilt: -halfW * 2 * halfSin * halfSin,
    bias: reduced.biasTerm / (2 * angularSpeed),
  };
  const aloneBias = Math.sqrt(Math.max(0, w2 + reduced.biasTerm));
  const alone: DriftTermsAlone = {
    radius: angularSpeed * (Math.sqrt(input.trueRadius / input.assumedRadius) - 1),
    scale: angularSpeed * (Math.sqrt(1 + input.scaleError) - 1),
    tilt: angularSpeed * (Math.sqrt(Math.cos(input.tilt)) - 1),
    bias: w2 + reduced.biasTerm > 0 ? reduced.biasTerm / (aloneBias + angularSpeed) : null,
  };
  return {
    angularSpeed,
    defined: exact !== null,
    correctedReading,
    estimate: exact?.estimate ?? null,
    driftRate: exact?.drift ?? null,
    driftPerRevolution: exact ? (TURN * exact.drift) / angularSpeed : null,
    speedRatio: exact ? exact.estimate / angularSpeed : null,
    linear: { ...linear, speedProportional: linear.radius + linear.scale + linear.tilt, total: linear.radius + linear.scale + linear.tilt + linear.bias },
    alone,
  };
}

/**
 * The speed below which the corrected reading is 0 or less and the firmware has no estimate
 * (spinner-heading-practice; solves (1 + k) ω² r cos θ + b − b̂ = 0).
 *
 * Formula: $\omega_0 = \sqrt{\dfrac{\hat b - b}{(1+k)\,r\cos\theta}}$ when $\hat b > b$, else 0
 *
 * @param model see `SpinRateErrorModel`
 * @returns ω₀ [rad/s]; 0 when the estimate exists at every speed above 0
 *
 * Example: over-corrected bias b̂ − b = 0.5 g with r = 12 mm gives ω₀ = 20.2 rad/s (193 rpm).
 * Sources: spinner-heading-practice, openstax-college-physics.
 */
export function lowestEstimableSpeed(model: SpinRateErrorModel): number {
  requireModel(model);
  const r = reduce(model);
  return r.biasTerm < 0 ? Math.sqrt(-r.biasTerm / r.gain) : 0;
}

export type RadiusBandStatus = "bounded" | "upper-unbounded" | "no-estimate";

/** The values of assumed radius r̂ that keep the drift within budget at one speed. */
export interface RadiusBand {
  /** "upper-unbounded" when the budget is at least the spin rate (ω̂ may fall to 0); "no-estimate" when the corrected reading is 0 or less. */
  status: RadiusBandStatus;
  /** Smallest r̂ within budget [m], null when no-estimate. */
  low: number | null;
  /** Largest r̂ within budget [m], null when unbounded or no-estimate. */
  high: number | null;
  /** The r̂ that gives zero drift at this speed [m], null when no-estimate. */
  zeroDriftRadius: number | null;
}

/**
 * The band of assumed radius that keeps |ω̂ − ω| within a budget at one speed
 * (spinner-heading-practice; ω̂ = √(N/r̂) solved for r̂).
 *
 * Formula: $N = (1+k)\,\omega^2 r\cos\theta + b - \hat b$;
 * $\hat r_{lo} = \dfrac{N}{(\omega + D)^2}$, $\hat r_{hi} = \dfrac{N}{(\omega - D)^2}$ (unbounded when D ≥ ω),
 * $\hat r_0 = N/\omega^2$
 *
 * @param angularSpeed ω [rad/s], greater than 0
 * @param budget D, the drift rate the driver can trim [rad/s], greater than 0
 * @param model the error model; its `assumedRadius` is ignored (it is what this function finds)
 * @returns the band [m] and its status
 *
 * Example: r = 12.7 mm, no other error, 2800 rpm, D = 10 °/s: r̂ from 12.6849 mm to 12.7151 mm
 * (about ±0.12 %). Sources: spinner-heading-practice, openstax-college-physics.
 */
export function assumedRadiusBand(input: { angularSpeed: number; budget: number } & SpinRateErrorModel): RadiusBand {
  const { angularSpeed, budget } = input;
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requirePositive("budget", budget, "rad/s");
  requireModel(input);
  const n = (1 + input.scaleError) * Math.cos(input.tilt) * input.trueRadius * angularSpeed * angularSpeed + input.bias - input.biasCorrection;
  if (!(n > 0)) return { status: "no-estimate", low: null, high: null, zeroDriftRadius: null };
  const low = n / (angularSpeed + budget) ** 2;
  const zeroDriftRadius = n / (angularSpeed * angularSpeed);
  if (budget >= angularSpeed) return { status: "upper-unbounded", low, high: null, zeroDriftRadius };
  return { status: "bounded", low, high: n / (angularSpeed - budget) ** 2, zeroDriftRadius };
}

export type SpeedRangeStatus = "bounded" | "unbounded-above" | "empty";
/** What sets an end of the speed range. */
export type SpeedLimit = "standstill" | "estimate-undefined" | "budget" | "none";

/** The speeds over which a calibration keeps the drift within budget. */
export interface SpeedRange {
  status: SpeedRangeStatus;
  /** Lowest speed within budget [rad/s] (an open end when `lowLimit` is "standstill" or "estimate-undefined"), null when empty. */
  low: number | null;
  /** Highest speed within budget [rad/s], null when empty or unbounded above. */
  high: number | null;
  /** What sets the low end. */
  lowLimit: SpeedLimit;
  /** What sets the high end ("none" when unbounded or empty). */
  highLimit: SpeedLimit;
}

/**
 * The range of spin rates over which a given calibration keeps |ω̂ − ω| within a budget, solved
 * exactly (spinner-heading-practice; numerical-recipes-2007 §5.6 for the quadratics).
 *
 * Formula: with $\hat\omega^2 = G\omega^2 + \beta$, $G = (1+k)\cos\theta\,r/\hat r$, $\beta = (b-\hat b)/\hat r$:
 * $\hat\omega - \omega \le D \iff (G-1)\omega^2 - 2D\omega + \beta - D^2 \le 0$ and, for ω > D,
 * $\hat\omega - \omega \ge -D \iff (G-1)\omega^2 + 2D\omega + \beta - D^2 \ge 0$
 *
 * @param budget D [rad/s], greater than 0
 * @param model see `SpinRateErrorModel`
 * @returns the range [rad/s] with what limits each end; never Infinity: an open top is `high: null`
 *
 * Assumptions: the set is one interval (ω̂ − ω is convex when β > 0, concave with a negative maximum
 * or monotone otherwise); it is found from the roots and each segment between them is tested
 * with the exact drift, so no linearisation enters. Example: r̂ = 12.0 mm, r = 12.7 mm, D = 10 °/s:
 * from standstill to 6.07 rad/s (58.0 rpm) only; r̂ = 12.69 mm with 0.02 g of offset left in:
 * 49.79 to 393.2 rad/s (475 to 3755 rpm).
 *
 * Sources: spinner-heading-practice, numerical-recipes-2007.
 */
export function speedRangeWithinBudget(input: { budget: number } & SpinRateErrorModel): SpeedRange {
  const { budget } = input;
  requirePositive("budget", budget, "rad/s");
  requireModel(input);
  const reduced = reduce(input);
  const a = reduced.gainError;
  const beta = reduced.biasTerm;
  const d = budget;
  const inside = (w: number): boolean => {
    const e = exactDrift(reduced, w);
    return e !== null && Math.abs(e.drift) <= d;
  };
  const threshold = beta < 0 ? Math.sqrt(-beta / reduced.gain) : 0;
  const cuts = [...quadraticRoots(a, -2 * d, beta - d * d), ...quadraticRoots(a, 2 * d, beta - d * d), d, threshold].filter((w) => w > 0 && Number.isFinite(w));
  const points = [0, ...new Set(cuts)].sort((x, y) => x - y);
  // Segments (points[i], points[i+1]) and the last one (points[n-1], ∞); test each at an interior point.
  let low: number | null = null;
  let high: number | null = null;
  let unbounded = false;
  for (let i = 0; i < points.length; i++) {
    const from = points[i]!;
    const to = points[i + 1];
    const probe = to === undefined ? Math.max(2 * from, from + 1) : from + (to - from) / 2;
    if (!inside(probe)) {
      if (low !== null) break; // one interval: stop at its end
      continue;
    }
    if (low === null) low = from;
    if (to === undefined) unbounded = true;
    else high = to;
  }
  if (low === null) return { status: "empty", low: null, high: null, lowLimit: "none", highLimit: "none" };
  const lowLimit: SpeedLimit = low === 0 ? "standstill" : threshold > 0 && low === threshold ? "estimate-undefined" : "budget";
  if (unbounded) return { status: "unbounded-above", low, high: null, lowLimit, highLimit: "none" };
  return { status: "bounded", low, high, lowLimit, highLimit: "budget" };
}

/**
 * Drift over a range of speeds, for a plot of drift vs rpm with each term's contribution
 * (spinner-heading-practice; see `headingDriftAt`).
 *
 * Formula: $\hat\omega(\omega_i) - \omega_i$ at $\omega_i = \omega_{lo} + i\,(\omega_{hi} - \omega_{lo})/(n - 1)$
 *
 * @param lowSpeed ω_lo [rad/s], greater than 0
 * @param highSpeed ω_hi [rad/s], greater than ω_lo
 * @param points n, number of evenly spaced speeds [-], whole, 2 to 2001 (default 61)
 * @param model see `SpinRateErrorModel`
 * @returns one `DriftPoint` per speed; undefined points carry `defined: false` and nulls
 *
 * Example: r̂ = 12 mm, r = 12.7 mm from 1200 to 2800 rpm in 3 points: 207, 345, 483 °/s.
 * Sources: spinner-heading-practice, openstax-college-physics, abramowitz-stegun-1964.
 */
export function headingDriftSeries(input: { lowSpeed: number; highSpeed: number; points?: number } & SpinRateErrorModel): DriftPoint[] {
  const { lowSpeed, highSpeed, points = 61 } = input;
  requirePositive("lowSpeed", lowSpeed, "rad/s");
  requireFinite("highSpeed", highSpeed, "rad/s");
  if (!(highSpeed > lowSpeed)) {
    throw new CalcInputError({ param: "highSpeed", value: highSpeed, expected: `greater than lowSpeed (${round6(lowSpeed)} rad/s)`, unit: "rad/s" });
  }
  requireInRange("points", points, "", { min: 2, max: 2001 });
  if (!Number.isInteger(points)) throw new CalcInputError({ param: "points", value: points, expected: "a whole number", unit: "" });
  requireModel(input);
  const out: DriftPoint[] = [];
  for (let i = 0; i < points; i++) {
    const w = i === points - 1 ? highSpeed : lowSpeed + ((highSpeed - lowSpeed) * i) / (points - 1);
    out.push(headingDriftAt({ ...input, angularSpeed: w }));
  }
  return out;
}

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
// 2. Two opposed sensors.

export interface OpposedSensorEstimate {
  /** False when the corrected reading is 0 or less. */
  defined: boolean;
  /** ω̂ [rad/s], null when not defined. */
  estimate: number | null;
  /** ω̂ − ω [rad/s], null when not defined. */
  driftRate: number | null;
  /** Heading error per revolution [rad], null when not defined. */
  driftPerRevolution: number | null;
}

export interface OpposedSensorsResult {
  /** Sensor 1 alone, dividing by its nominal radius r₁. */
  sensor1: OpposedSensorEstimate;
  /** Sensor 2 alone, dividing by its nominal radius r₂. */
  sensor2: OpposedSensorEstimate;
  /** The pair: (a₁ + a₂)/(r₁ + r₂). */
  pair: OpposedSensorEstimate;
  /** Centre-of-mass offset recovered from the difference a₁ − a₂ with the pair's ω̂ [m], null when not defined. */
  offsetEstimate: number | null;
}

function estimateFrom(reading: number, radius: number, angularSpeed: number): OpposedSensorEstimate {
  if (!(reading > 0)) return { defined: false, estimate: null, driftRate: null, driftPerRevolution: null };
  const estimate = Math.sqrt(reading / radius);
  // ω̂ − ω = (ω̂² − ω²)/(ω̂ + ω)
  const drift = (reading / radius - angularSpeed * angularSpeed) / (estimate + angularSpeed);
  return { defined: true, estimate, driftRate: drift, driftPerRevolution: (TURN * drift) / angularSpeed };
}

/**
 * One sensor vs an opposed pair when the spin centre is not where the firmware thinks
 * (hibbeler-dynamics-2016 §16.7, a_P = a_O + ω × (ω × r) for a rigid body; openstax-college-physics).
 *
 * Formula: with the spin centre moved by e toward sensor 1,
 * $a_1 = \omega^2(r_1 - e) - a_L + \delta_1$, $a_2 = \omega^2(r_2 + e) + a_L + \delta_2$;
 * single: $\hat\omega_1 = \sqrt{a_1/r_1}$; pair: $\hat\omega = \sqrt{\dfrac{a_1 + a_2}{r_1 + r_2}}$,
 * in which e and the common acceleration a_L cancel; $\hat e = \tfrac12\left[(r_1 - r_2) - (a_1 - a_2)/\hat\omega^2\right]$
 *
 * @param angularSpeed ω [rad/s], greater than 0
 * @param radius1 r₁, sensor 1's distance from the nominal centre [m], greater than 0
 * @param radius2 r₂, sensor 2's distance on the other side [m], greater than 0
 * @param offset e, spin-centre offset toward sensor 1 along the line through both [m], finite (signed)
 * @param residualBias1 δ₁, offset left in sensor 1 after correction [m/s²] (default 0)
 * @param residualBias2 δ₂, the same for sensor 2 [m/s²] (default 0)
 * @param linearAcceleration a_L, the body's acceleration along the line, toward sensor 1 [m/s²] (default 0)
 * @returns each estimate with its drift [rad/s] and drift per revolution [rad], and ê [m]
 *
 * Assumptions: both sensing axes point at the nominal centre and lie in the spin plane; steady
 * spin. Example: r₁ = r₂ = 12 mm, e = 0.5 mm, 2000 rpm: sensor 1 alone drifts −4.410 rad/s
 * (−7.58° per revolution), sensor 2 +4.319 rad/s, the pair 0, and ê = 0.5 mm.
 *
 * Sources: hibbeler-dynamics-2016, openstax-college-physics, spinner-heading-practice.
 */
export function opposedSensorsDrift(input: {
  angularSpeed: number;
  radius1: number;
  radius2: number;
  offset: number;
  residualBias1?: number;
  residualBias2?: number;
  linearAcceleration?: number;
}): OpposedSensorsResult {
  const { angularSpeed, radius1, radius2, offset, residualBias1 = 0, residualBias2 = 0, linearAcceleration = 0 } = input;
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requirePositive("radius1", radius1, "m");
  requirePositive("radius2", radius2, "m");
  requireFinite("offset", offset, "m");
  requireFinite("residualBias1", residualBias1, "m/s²");
  requireFinite("residualBias2", residualBias2, "m/s²");
  requireFinite("linearAcceleration", linearAcceleration, "m/s²");
  const w2 = angularSpeed * angularSpeed;
  // hibbeler-dynamics-2016: centripetal part ω²·(distance to the true centre), plus the common translation
  const a1 = w2 * (radius1 - offset) - linearAcceleration + residualBias1;
  const a2 = w2 * (radius2 + offset) + linearAcceleration + residualBias2;
  const pair = estimateFrom(a1 + a2, radius1 + radius2, angularSpeed);
  const offsetEstimate = pair.estimate === null ? null : (radius1 - radius2 - (a1 - a2) / (pair.estimate * pair.estimate)) / 2;
  return {
    sensor1: estimateFrom(a1, radius1, angularSpeed),
    sensor2: estimateFrom(a2, radius2, angularSpeed),
    pair,
    offsetEstimate,
  };
}

/** Inputs of the opposed-sensors comparison, in SI. */
export const opposedSensorsInputs = /* @__PURE__ */ defineInputs({
  angularSpeed: {
    label: "Spin speed",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(2000),
    urlKey: "rpm",
    help: "The true spin rate at which to compare one sensor with the pair.",
  },
  radius1: {
    label: "Sensor 1 radius",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.012,
    urlKey: "r1",
    help: "Distance from the nominal spin centre to sensor 1's sensing element.",
  },
  radius2: {
    label: "Sensor 2 radius",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.012,
    urlKey: "r2",
    help: "The same for sensor 2, on the opposite side of the centre.",
  },
  offset: {
    label: "Centre-of-mass uncertainty",
    kind: "length",
    min: 0,
    max: 0.1,
    default: 0.0005,
    urlKey: "e",
    help: "How far the real spin centre may lie from the nominal one, along the line through both sensors.",
  },
});

export type OpposedSensorsInput = { [K in keyof typeof opposedSensorsInputs]: number };

export interface OpposedSensorsCheck {
  /** The spin centre moved e toward sensor 1 (offset +e). */
  towardSensor1: OpposedSensorsResult;
  /** The spin centre moved e toward sensor 2 (offset −e). */
  towardSensor2: OpposedSensorsResult;
  /** Largest |ω̂₁ − ω| of sensor 1 alone for any offset within ±e [rad/s]; null when it gives no estimate at one end. */
  singleWorstDriftRate: number | null;
  /** The same per true revolution [rad]; null likewise. */
  singleWorstPerRevolution: number | null;
  /** Largest |ω̂ − ω| of the pair within ±e [rad/s] (0 up to round-off). */
  pairWorstDriftRate: number;
}

/**
 * The opposed-sensors comparison at one speed: sensor 1 alone against the pair, with the spin
 * centre anywhere within ±e of where the firmware assumes it (hibbeler-dynamics-2016 §16.7;
 * openstax-college-physics; see `opposedSensorsDrift`).
 *
 * Formula: $\hat\omega_1 - \omega = \omega\left(\sqrt{(r_1 \mp e)/r_1} - 1\right)$ for one sensor;
 * $\hat\omega = \sqrt{\dfrac{a_1 + a_2}{r_1 + r_2}} = \omega$ for the pair, whatever e
 *
 * @param input every field of `opposedSensorsInputs`, SI
 * @returns both ends of the offset range, the worst single-sensor drift [rad/s] and per revolution
 * [rad] (null when sensor 1 gives no estimate at an end, e ≥ r₁), and the pair's worst drift [rad/s]
 *
 * Assumptions: as `opposedSensorsDrift`, with no residual offsets and no common acceleration; one
 * sensor's drift is monotone in e, so the worst case sits at one end of ±e. Example: r₁ = r₂ =
 * 12 mm, e = 0.5 mm, 2000 rpm: one sensor up to 4.410 rad/s (252.7 °/s, 7.58° per revolution), the pair 0.
 *
 * Sources: hibbeler-dynamics-2016, openstax-college-physics, spinner-heading-practice.
 */
export function opposedSensorsCheck(input: OpposedSensorsInput): OpposedSensorsCheck {
  requireWithinSpecs(opposedSensorsInputs, input);
  const common = { angularSpeed: input.angularSpeed, radius1: input.radius1, radius2: input.radius2 };
  const towardSensor1 = opposedSensorsDrift({ ...common, offset: input.offset });
  const towardSensor2 = opposedSensorsDrift({ ...common, offset: -input.offset });
  const a = towardSensor1.sensor1;
  const b = towardSensor2.sensor1;
  const worst = a.driftRate === null || b.driftRate === null ? null : Math.max(Math.abs(a.driftRate), Math.abs(b.driftRate));
  return {
    towardSensor1,
    towardSensor2,
    singleWorstDriftRate: worst,
    singleWorstPerRevolution: worst === null ? null : (TURN * worst) / input.angularSpeed,
    pairWorstDriftRate: Math.max(Math.abs(towardSensor1.pair.driftRate ?? 0), Math.abs(towardSensor2.pair.driftRate ?? 0)),
  };
}

// ---------------------------------------------------------------------------------------------
// 3. Worked example for the chapter.

/** One row of the radius-mismatch example, in SI and in the degrees the chapter prints. */
export interface RadiusMismatchRow {
  /** Spin speed [rpm] as given. */
  rpm: number;
  /** ω [rad/s]. */
  angularSpeed: number;
  /** ω̂ − ω [rad/s]. */
  driftRate: number;
  /** The same [°/s]. */
  driftRateDegreesPerSecond: number;
  /** Per revolution [rad]. */
  driftPerRevolution: number;
  /** The same [°]. */
  driftPerRevolutionDegrees: number;
}

export interface RadiusMismatchExample {
  assumedRadius: number;
  trueRadius: number;
  /** ω̂/ω = √(r/r̂) [-]. */
  speedRatio: number;
  rows: RadiusMismatchRow[];
  /** Assumed-radius band that would keep |drift| ≤ budget at the highest speed given. */
  bandAtTopSpeed: RadiusBand;
  /** The budget used for the band [rad/s]. */
  budget: number;
}

/**
 * Drift from a radius mismatch alone at a few speeds, with degree figures for the text
 * (spinner-heading-practice, openstax-college-physics).
 *
 * Formula: $\hat\omega/\omega = \sqrt{r/\hat r}$, drift $= \omega(\sqrt{r/\hat r} - 1)$, per revolution $360°(\sqrt{r/\hat r} - 1)$
 *
 * @param assumedRadius r̂ [m], greater than 0
 * @param trueRadius r [m], greater than 0
 * @param speedsRpm speeds [rpm], each greater than 0, at least one
 * @param budget D for the radius band at the top speed [rad/s], greater than 0 (default 10 °/s)
 * @returns rows [rad/s, °/s, rad, °] and the band [m]
 *
 * Example: see `demoSpinnerRadiusExample`. Sources: spinner-heading-practice, openstax-college-physics.
 */
export function radiusMismatchExample({
  assumedRadius,
  trueRadius,
  speedsRpm,
  budget = (10 * Math.PI) / 180,
}: {
  assumedRadius: number;
  trueRadius: number;
  speedsRpm: readonly number[];
  budget?: number;
}): RadiusMismatchExample {
  if (speedsRpm.length === 0) throw new CalcInputError({ param: "speedsRpm", value: 0, expected: "at least one speed", unit: "" });
  const model: SpinRateErrorModel = { assumedRadius, trueRadius, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 };
  const rows = speedsRpm.map((rpm, i) => {
    requirePositive(`speedsRpm[${i}]`, rpm, "rpm");
    const point = headingDriftAt({ ...model, angularSpeed: rpmToRadPerSecond(rpm) });
    const driftRate = point.driftRate!;
    const driftPerRevolution = point.driftPerRevolution!;
    return {
      rpm,
      angularSpeed: point.angularSpeed,
      driftRate,
      driftRateDegreesPerSecond: fromSI(driftRate, "deg/s"),
      driftPerRevolution,
      driftPerRevolutionDegrees: fromSI(driftPerRevolution, "deg"),
    };
  });
  const top = Math.max(...speedsRpm);
  return {
    assumedRadius,
    trueRadius,
    speedRatio: Math.sqrt(trueRadius / assumedRadius),
    rows,
    bandAtTopSpeed: assumedRadiusBand({ ...model, angularSpeed: rpmToRadPerSecond(top), budget }),
    budget,
  };
}

/**
 * An invented demo robot for the chapter (not a real machine): its firmware assumes the sensor
 * sits 12.0 mm from the spin axis, but the real centre of mass puts it at 12.7 mm.
 */
export const DEMO_HEADING_SPINNER = {
  assumedRadius: 0.012,
  trueRadius: 0.0127,
  speedsRpm: [1200, 2800],
} as const;

/**
 * The chapter's worked example: the invented demo spinner's drift at 1200 and 2800 rpm
 * (spinner-heading-practice, openstax-college-physics).
 *
 * Formula: $\hat\omega/\omega = \sqrt{12.7/12.0} = 1.028753$; drift per revolution 10.35°
 *
 * @returns see `radiusMismatchExample`
 *
 * Example: 1200 rpm: 3.613 rad/s (207.0 °/s); 2800 rpm: 8.431 rad/s (483.1 °/s); 10.35° per
 * revolution at both. To stay within 10 °/s at 2800 rpm the firmware radius must lie between
 * 12.6849 mm and 12.7151 mm. Sources: spinner-heading-practice, openstax-college-physics.
 */
export function demoSpinnerRadiusExample(): RadiusMismatchExample {
  return radiusMismatchExample({ ...DEMO_HEADING_SPINNER });
}
