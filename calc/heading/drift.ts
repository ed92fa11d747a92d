/**
 * Heading from an accelerometer: a whole-body spinner that steers while spinning estimates its spin
 * rate from the radial (centripetal) reading of an accelerometer, ω̂ = √((a − b̂)/r̂), and
 * integrates it to a heading. This module works out how calibration errors turn into heading drift
 * (exactly, and term by term), the firmware radii and the speeds that keep it within a budget.
 * SI in and out: rad/s, rad, m, m/s², s, Hz.
 *
 * Sign convention throughout: drift = ω̂ − ω. Positive drift means the estimated heading runs ahead
 * of the true heading (the robot "thinks" it has turned further than it has).
 */
import { CalcInputError, requireFinite, requireInRange, requirePositive, requireRelation } from "../core/errors.ts";
import { TURN } from "../core/constants.ts";
import { type NamedValue, requireFiniteFields, requireFiniteResult, requireInputObject } from "../core/spec-check.ts";
import { asCallerNames } from "../core/caller-names.ts";

// ---------------------------------------------------------------------------------------------
// Helpers.

/**
 * Real roots of A x² + B x + C = 0 without cancellation (numerical-recipes-2007 §5.6:
 * q = −½(B + sgn(B)√(B² − 4AC)), x₁ = q/A, x₂ = C/q). Returns finite roots only.
 */
function quadraticRoots(a: number, b: number, c: number): number[] {
  // Stryker disable next-line ConditionalExpression,BlockStatement: equivalent, with a = 0 the general formula gives q = −b, a root ±∞ (dropped) and c/q = −c/b, the same
  if (a === 0) {
    // Stryker disable next-line ConditionalExpression,ArrayDeclaration: equivalent, the one caller passes b = ±2D, never 0 (D > 0)
    if (b === 0) return [];
    // Stryker disable next-line MethodExpression,UnaryOperator: equivalent, the caller drops roots that are not finite, and its two calls (b = ±2D) give c/2D and −c/2D, so a flipped sign only swaps them
    return [-c / b].filter(Number.isFinite);
  }
  const disc = b * b - 4 * a * c;
  // Stryker disable next-line ConditionalExpression,EqualityOperator,ArrayDeclaration: equivalent, a negative discriminant gives NaN roots (dropped), a zero one a double root where the drift only touches ±D, and the caller drops a root that is not a positive number
  if (disc < 0) return [];
  // Stryker disable next-line UnaryOperator,EqualityOperator: equivalent, a flipped q negates both roots, and the caller's two calls (b = ±2D) have each other's roots negated, so their union is the same; b is never 0
  const q = -0.5 * (b + (b >= 0 ? 1 : -1) * Math.sqrt(disc));
  const roots = [q / a];
  // Stryker disable next-line ConditionalExpression: equivalent, |q| ≥ |b|/2 = D > 0, and c/0 would be dropped as not finite anyway
  if (q !== 0) roots.push(c / q);
  // Stryker disable next-line MethodExpression: equivalent, the one caller drops roots that are not finite
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
  requireInputObject(m, "model");
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

/** The model's inputs by name, for the finiteness guard. */
function modelInputs(m: SpinRateErrorModel, extra: Record<string, NamedValue> = {}): Record<string, NamedValue> {
  return {
    assumedRadius: [m.assumedRadius, "m"],
    trueRadius: [m.trueRadius, "m"],
    bias: [m.bias, "m/s²"],
    biasCorrection: [m.biasCorrection, "m/s²"],
    ...extra,
  };
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
 *
 * @example
 * headingDriftAt({ angularSpeed: rpmToRadPerSecond(2000), assumedRadius: 0.008, trueRadius: 0.009, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 }) // → { speedRatio: 1.06066, driftRate: 12.70, driftPerRevolution: 0.3811, … } (ω̂/ω = √(9/8); 728 °/s, 21.84° per revolution)
 *
 * Sources: spinner-heading-practice, openstax-college-physics, ieee-1293-1998, abramowitz-stegun-1964.
 */
export function headingDriftAt(input: { angularSpeed: number } & SpinRateErrorModel): DriftPoint {
  const { angularSpeed } = requireInputObject(input);
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
  return requireFiniteFields(
    {
      angularSpeed,
      defined: exact !== null,
      correctedReading,
      estimate: exact?.estimate ?? null,
      driftRate: exact?.drift ?? null,
      driftPerRevolution: exact ? (TURN * exact.drift) / angularSpeed : null,
      speedRatio: exact ? exact.estimate / angularSpeed : null,
      linear: { ...linear, speedProportional: linear.radius + linear.scale + linear.tilt, total: linear.radius + linear.scale + linear.tilt + linear.bias },
      alone,
    },
    "drift",
    modelInputs(input, { angularSpeed: [angularSpeed, "rad/s"] }),
  );
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
 * @example
 * lowestEstimableSpeed({ assumedRadius: 0.012, trueRadius: 0.012, scaleError: 0, bias: 0, biasCorrection: 0.5 * STANDARD_GRAVITY, tilt: 0 }) // → 20.2 [rad/s] (193 rpm: the offset over-corrected by 0.5 g)
 *
 * Sources: spinner-heading-practice, openstax-college-physics.
 */
export function lowestEstimableSpeed(model: SpinRateErrorModel): number {
  requireModel(model);
  const r = reduce(model);
  return requireFiniteResult(r.biasTerm < 0 ? Math.sqrt(-r.biasTerm / r.gain) : 0, "lowest speed", modelInputs(model));
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
 * @example
 * assumedRadiusBand({ angularSpeed: rpmToRadPerSecond(2800), budget: (10 * Math.PI) / 180, assumedRadius: 0.012, trueRadius: 0.0127, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 }) // → { status: "bounded", low: 0.0126849, high: 0.0127151, … } [m] (about ±0.12 % around r = 12.7 mm)
 *
 * Sources: spinner-heading-practice, openstax-college-physics.
 */
export function assumedRadiusBand(input: { angularSpeed: number; budget: number } & SpinRateErrorModel): RadiusBand {
  const { angularSpeed, budget } = requireInputObject(input);
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requirePositive("budget", budget, "rad/s");
  requireModel(input);
  const n = (1 + input.scaleError) * Math.cos(input.tilt) * input.trueRadius * angularSpeed * angularSpeed + input.bias - input.biasCorrection;
  const named = modelInputs(input, { angularSpeed: [angularSpeed, "rad/s"], budget: [budget, "rad/s"] });
  if (!(n > 0)) return { status: "no-estimate", low: null, high: null, zeroDriftRadius: null };
  const low = n / (angularSpeed + budget) ** 2;
  const zeroDriftRadius = n / (angularSpeed * angularSpeed);
  if (budget >= angularSpeed) return requireFiniteFields({ status: "upper-unbounded", low, high: null, zeroDriftRadius }, "radius band", named);
  return requireFiniteFields({ status: "bounded", low, high: n / (angularSpeed - budget) ** 2, zeroDriftRadius }, "radius band", named);
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
 * with the exact drift, so no linearisation enters.
 *
 * @example
 * speedRangeWithinBudget({ budget: (10 * Math.PI) / 180, assumedRadius: 0.012, trueRadius: 0.0127, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 }) // → { low: 0, high: 6.07, lowLimit: "standstill", … } [rad/s] (up to 58.0 rpm only)
 * speedRangeWithinBudget({ budget: (10 * Math.PI) / 180, assumedRadius: 0.01269, trueRadius: 0.0127, scaleError: 0, bias: 0.02 * STANDARD_GRAVITY, biasCorrection: 0, tilt: 0 }) // → { low: 49.79, high: 393.2, lowLimit: "budget", highLimit: "budget", … } [rad/s] (475 to 3755 rpm, 0.02 g of offset left in)
 *
 * Sources: spinner-heading-practice, numerical-recipes-2007.
 */
export function speedRangeWithinBudget(input: { budget: number } & SpinRateErrorModel): SpeedRange {
  const { budget } = requireInputObject(input);
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
  // Stryker disable next-line ConditionalExpression,EqualityOperator: equivalent, for β ≥ 0 the root gives NaN or −0, which never passes the w > 0 filter below nor equals a low end above 0
  const threshold = beta < 0 ? Math.sqrt(-beta / reduced.gain) : 0;
  // Stryker disable next-line EqualityOperator: equivalent, a cut at 0 repeats the first point, and its empty segment probes standstill, which is inside only when the segment after it is
  const cuts = [...quadraticRoots(a, -2 * d, beta - d * d), ...quadraticRoots(a, 2 * d, beta - d * d), d, threshold].filter((w) => w > 0 && Number.isFinite(w));
  const points = [0, ...new Set(cuts)].sort((x, y) => x - y);
  // Segments (points[i], points[i+1]) and the last one (points[n-1], ∞); test each at an interior point.
  let low: number | null = null;
  let high: number | null = null;
  let unbounded = false;
  // Stryker disable next-line EqualityOperator: equivalent, a pass past the end probes NaN, which is never inside
  for (let i = 0; i < points.length; i++) {
    const from = points[i]!;
    const to = points[i + 1];
    const probe =
      to === undefined
        ? // Stryker disable next-line MethodExpression,ArithmeticOperator: equivalent, any probe past the last cut (from ≥ D > 0) tests alike: the drift crosses ±D at no higher speed
          Math.max(2 * from, from + 1)
        : from + (to - from) / 2;
    if (!inside(probe)) {
      // Stryker disable next-line ConditionalExpression: equivalent, the speeds within budget are one interval (see Assumptions), so no segment after its end is inside
      if (low !== null) break; // one interval: stop at its end
      continue;
    }
    if (low === null) low = from;
    if (to === undefined) unbounded = true;
    else high = to;
  }
  if (low === null) return { status: "empty", low: null, high: null, lowLimit: "none", highLimit: "none" };
  // low is above 0 here, so it equals the threshold only when there is one.
  const lowLimit: SpeedLimit = low === 0 ? "standstill" : low === threshold ? "estimate-undefined" : "budget";
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
 * @example
 * const rates = headingDriftSeries({ lowSpeed: rpmToRadPerSecond(1200), highSpeed: rpmToRadPerSecond(2800), points: 3, assumedRadius: 0.012, trueRadius: 0.0127, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 }).map((point) => point.driftRate);
 * rates.at(0) // → 3.613 [rad/s] (207 °/s); rates.at(1) // → 6.022 [rad/s] (345 °/s); rates.at(2) // → 8.431 [rad/s] (483 °/s)
 *
 * Sources: spinner-heading-practice, openstax-college-physics, abramowitz-stegun-1964.
 */
export function headingDriftSeries(input: { lowSpeed: number; highSpeed: number; points?: number } & SpinRateErrorModel): DriftPoint[] {
  const { lowSpeed, highSpeed, points = 61 } = requireInputObject(input);
  requirePositive("lowSpeed", lowSpeed, "rad/s");
  requireFinite("highSpeed", highSpeed, "rad/s");
  requireRelation("highSpeed", highSpeed, "greater", lowSpeed, { kind: "angularSpeed", unit: "rad/s", other: "lowSpeed" });
  requireInRange("points", points, "", { min: 2, max: 2001 });
  if (!Number.isInteger(points)) throw new CalcInputError({ param: "points", value: points, expected: "a whole number", unit: "" });
  // Stryker disable next-line CallExpression: equivalent, headingDriftAt checks the same model at the first sampled speed, and a refusal of a model field passes through asCallerNames as it is (kept here to refuse before any work)
  requireModel(input);
  const out: DriftPoint[] = [];
  for (let i = 0; i < points; i++) {
    const w = i === points - 1 ? highSpeed : lowSpeed + ((highSpeed - lowSpeed) * i) / (points - 1);
    // A refusal at a sampled speed names the end of the range it lies nearer to.
    const end: readonly [string, number] = w >= (lowSpeed + highSpeed) / 2 ? ["highSpeed", highSpeed] : ["lowSpeed", lowSpeed];
    out.push(asCallerNames({ angularSpeed: end }, () => headingDriftAt({ ...input, angularSpeed: w })));
  }
  return out;
}
