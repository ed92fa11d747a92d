/**
 * Straight-line fits y = slope·x + intercept: least squares with standard errors and Student-t
 * intervals, Theil–Sen with a distribution-free interval for the slope, a Huber M-fit, and spike
 * flags from the robust residuals.
 */
import { CalcInputError, requireFinite, requireInRange, requirePositive } from "../core/errors.ts";
import { normalQuantile, studentTQuantile } from "./special.ts";
import { requireInputObject, requireList } from "../core/spec-check.ts";

// Straight-line fits.

/** A closed interval [low, high]. */
export interface ConfidenceInterval {
  low: number;
  high: number;
}

export interface LeastSquaresLine {
  /** Fitted slope [y-unit per x-unit]. */
  slope: number;
  /** Fitted intercept [y-unit]. */
  intercept: number;
  /** Standard error of the slope. */
  slopeStdError: number;
  /** Standard error of the intercept. */
  interceptStdError: number;
  /** Confidence interval of the slope (Student t). */
  slopeInterval: ConfidenceInterval;
  /** Confidence interval of the intercept (Student t). */
  interceptInterval: ConfidenceInterval;
  /** n − 2 [-]. */
  degreesOfFreedom: number;
  /** The two-sided t quantile used [-]. */
  tQuantile: number;
  /** √(SSE/(n − 2)) [y-unit]. */
  residualStdDev: number;
  /** 1 − SSE/SST [-]; null when every y is equal (SST = 0). */
  rSquared: number | null;
  /** y_i − (slope·x_i + intercept), in input order. */
  residuals: number[];
}

export interface TheilSenLine {
  /** Median of the pairwise slopes. */
  slope: number;
  /** Median of y_i − slope·x_i. */
  intercept: number;
  /**
   * Distribution-free interval for the slope: the ordered pairwise slopes at `ranks` (normal
   * approximation to Kendall's S, approximate below about 10 points); null when `ranks.low` < 1,
   * too few points for this confidence.
   */
  slopeInterval: ConfidenceInterval | null;
  /** 1-based, possibly fractional ranks of the interval's ends among the `pairCount` ordered slopes [-]. */
  ranks: { low: number; high: number };
  /** Number of pairs with different x [-]. */
  pairCount: number;
  residuals: number[];
}

export interface HuberLine {
  slope: number;
  intercept: number;
  /** c, in units of the robust scale [-]. */
  tuning: number;
  /** The robust scale the residuals are divided by [y-unit]. */
  scale: number;
  /** Final weight of each point [-], 1 for points within c·scale. */
  weights: number[];
  iterations: number;
  converged: boolean;
  residuals: number[];
}

export type ScaleSource = "mad" | "mean-absolute-deviation" | "resolution-floor";

export interface SpikeReport {
  /** k [-]. */
  threshold: number;
  /** Robust scale σ̂ of the Theil–Sen residuals [y-unit]. */
  scale: number;
  /** How σ̂ was found: 1.4826·MAD; 1.2533·mean absolute deviation when the MAD is 0; or the resolution floor. */
  scaleFrom: ScaleSource;
  /** Median of the Theil–Sen residuals, the centre the modified z-scores are taken from [y-unit]. */
  center: number;
  /** Residuals outside [center − k·σ̂, center + k·σ̂] are flagged [y-unit]. */
  bounds: ConfidenceInterval;
  /** (r_i − median r)/σ̂ for each point [-]. */
  modifiedZ: number[];
  /** |modified z| for each point: how many robust standard deviations it lies from the median, on either side [-]. */
  robustDistance: number[];
  /** Indices (0-based, input order) of points with |modified z| > k. */
  flagged: number[];
}

export interface StraightLineFit {
  /** Number of points [-]. */
  count: number;
  /** Number of different x values [-]. */
  distinctX: number;
  /** Confidence level of the intervals [-]. */
  confidence: number;
  leastSquares: LeastSquaresLine;
  theilSen: TheilSenLine;
  huber: HuberLine;
  spikes: SpikeReport;
  /** Least squares again without the flagged points; null when nothing was flagged or fewer than 3 different x remain. */
  leastSquaresWithoutSpikes: LeastSquaresLine | null;
}

/** The median of a list (a copy is sorted). @internal */
export function median(values: readonly number[]): number {
  if (!Array.isArray(values) || values.length === 0)
    throw new CalcInputError({ param: "values", value: values, expected: "a list of at least one number", unit: "" });
  for (const [i, v] of values.entries()) requireFinite(`values[${i}]`, v, "");
  return middleOf(values);
}

/** The median of values already checked (tukey-1977). */
function middleOf(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const n = s.length;
  const mid = Math.floor(n / 2);
  // The mean of the two middle values of an even list, each halved first so that it cannot overflow.
  return n % 2 === 1 ? s[mid]! : s[mid - 1]! / 2 + s[mid]! / 2;
}

/** Values closer than this fraction of the largest |x| count as the same x. */
const SAME_X = 1e-12;

function sameXTolerance(x: readonly number[]): number {
  // From the finite values only: an infinite one would make every value "the same".
  return SAME_X * x.reduce((m, v) => (Number.isFinite(v) ? Math.max(m, Math.abs(v)) : m), 0);
}

/** Sizes of the groups of equal x (within the tolerance), after sorting. */
function xGroups(x: readonly number[]): number[] {
  const tol = sameXTolerance(x);
  const sorted = [...x].sort((a, b) => a - b);
  const groups: number[] = [];
  let last = Number.NEGATIVE_INFINITY;
  for (const v of sorted) {
    // The first value always starts a group: v − (−∞) is ∞ (or NaN for v = −∞), never within the finite tolerance.
    if (v - last <= tol) groups[groups.length - 1]! += 1;
    else groups.push(1);
    last = v;
  }
  return groups;
}

/** How many different values a list holds. @internal */
export function countDistinct(values: readonly number[]): number {
  requireList(values, "values");
  return xGroups(values).length;
}

function leastSquaresLine(x: readonly number[], y: readonly number[], confidence: number): LeastSquaresLine {
  const n = x.length;
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    sx += x[i]!;
    sy += y[i]!;
  }
  const mx = sx / n;
  const my = sy / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i]! - mx;
    const dy = y[i]! - my;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  // draper-smith-1998 ch. 1: b₁ = Sxy/Sxx, b₀ = ȳ − b₁ x̄
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  const residuals = x.map((xi, i) => y[i]! - (slope * xi + intercept));
  const sse = residuals.reduce((acc, r) => acc + r * r, 0);
  const dof = n - 2;
  // draper-smith-1998 ch. 1: s² = SSE/(n − 2); se(b₁) = s/√Sxx; se(b₀) = s √(1/n + x̄²/Sxx)
  const s = Math.sqrt(sse / dof);
  const slopeStdError = s / Math.sqrt(sxx);
  const interceptStdError = s * Math.sqrt(1 / n + (mx * mx) / sxx);
  const tq = studentTQuantile({ probability: 1 - (1 - confidence) / 2, degreesOfFreedom: dof });
  return {
    slope,
    intercept,
    slopeStdError,
    interceptStdError,
    slopeInterval: { low: slope - tq * slopeStdError, high: slope + tq * slopeStdError },
    interceptInterval: { low: intercept - tq * interceptStdError, high: intercept + tq * interceptStdError },
    degreesOfFreedom: dof,
    tQuantile: tq,
    residualStdDev: s,
    // draper-smith-1998 ch. 1: R² = 1 − SSE/SST
    rSquared: syy > 0 ? 1 - sse / syy : null,
    residuals,
  };
}

/** Value at a 1-based, possibly fractional rank of an ascending list (linear interpolation). */
function atRank(sorted: readonly number[], rank: number): number {
  const lo = Math.floor(rank);
  const frac = rank - lo;
  const a = sorted[lo - 1]!;
  if (frac === 0) return a;
  const b = sorted[lo]!;
  return a + frac * (b - a);
}

function theilSenLine(x: readonly number[], y: readonly number[], confidence: number): TheilSenLine {
  const n = x.length;
  const tol = sameXTolerance(x);
  const slopes: number[] = [];
  // Stryker disable next-line EqualityOperator: equivalent, at i = n the inner loop starts at n + 1 and runs no pass
  for (let i = 0; i < n; i++) {
    // Stryker disable next-line EqualityOperator: equivalent, at j = n x[j] is undefined, |NaN| > tol is false and no slope is added
    for (let j = i + 1; j < n; j++) {
      // theil-1950: slope of every pair with different x
      if (Math.abs(x[j]! - x[i]!) > tol) slopes.push((y[j]! - y[i]!) / (x[j]! - x[i]!));
    }
  }
  slopes.sort((a, b) => a - b);
  const slope = middleOf(slopes);
  // sen-1968 / theil-1950: intercept as the median of y_i − slope·x_i
  const intercept = middleOf(x.map((xi, i) => y[i]! - slope * xi));
  const residuals = x.map((xi, i) => y[i]! - (slope * xi + intercept));
  // gilbert-1987 ch. 16: Var(S) = [n(n−1)(2n+5) − Σ t(t−1)(2t+5)]/18 (ties in x), C = z √Var(S)
  let tieTerm = 0;
  for (const t of xGroups(x)) tieTerm += t * (t - 1) * (2 * t + 5);
  const varS = (n * (n - 1) * (2 * n + 5) - tieTerm) / 18;
  const z = normalQuantile({ probability: 1 - (1 - confidence) / 2 });
  const c = z * Math.sqrt(varS);
  const nPairs = slopes.length;
  const m1 = (nPairs - c) / 2;
  const m2 = (nPairs + c) / 2;
  // m1 ≥ 1 means C ≤ nPairs − 2, so the high rank (nPairs + C)/2 + 1 ≤ nPairs also holds (both sides are
  // exact or rounded the same way): the interval never reads past the last slope.
  const slopeInterval = m1 >= 1 ? { low: atRank(slopes, m1), high: atRank(slopes, m2 + 1) } : null;
  return { slope, intercept, slopeInterval, ranks: { low: m1, high: m2 + 1 }, pairCount: nPairs, residuals };
}

function robustScale(residuals: readonly number[], floor: number): { center: number; scale: number; from: ScaleSource } {
  const center = middleOf(residuals);
  const deviations = residuals.map((r) => Math.abs(r - center));
  // iglewicz-hoaglin-1993: σ̂ = MAD/0.6745 = 1.4826·MAD
  let scale = 1.482602218505602 * middleOf(deviations);
  let from: ScaleSource = "mad";
  if (scale === 0) {
    // johnson-kotz-balakrishnan-1994 ch. 13: mean absolute deviation = σ√(2/π), so σ = √(π/2)·MeanAD
    scale = Math.sqrt(Math.PI / 2) * (deviations.reduce((a, b) => a + b, 0) / deviations.length);
    from = "mean-absolute-deviation";
  }
  if (!(scale > floor)) {
    scale = floor;
    from = "resolution-floor";
  }
  return { center, scale, from };
}

function weightedLine(x: readonly number[], y: readonly number[], w: readonly number[]): { slope: number; intercept: number } {
  let sw = 0;
  let swx = 0;
  let swy = 0;
  for (let i = 0; i < x.length; i++) {
    sw += w[i]!;
    swx += w[i]! * x[i]!;
    swy += w[i]! * y[i]!;
  }
  const mx = swx / sw;
  const my = swy / sw;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < x.length; i++) {
    const dx = x[i]! - mx;
    sxx += w[i]! * dx * dx;
    sxy += w[i]! * dx * (y[i]! - my);
  }
  const slope = sxy / sxx;
  return { slope, intercept: my - slope * mx };
}

function huberLine(
  x: readonly number[],
  y: readonly number[],
  start: { slope: number; intercept: number },
  scale: number,
  tuning: number,
  tolerance: number,
): HuberLine {
  let { slope, intercept } = start;
  // Stryker disable next-line ArrowFunction: equivalent, the loop below always runs and sets every weight before one is read
  let weights = x.map(() => 1);
  let converged = false;
  let iterations = 0;
  for (iterations = 1; iterations <= 200; iterations++) {
    // huber-1964 ψ(u) = max(−c, min(c, u)); holland-welsch-1977 IRLS weights w = ψ(u)/u = min(1, c/|u|)
    weights = x.map((xi, i) => {
      const u = Math.abs((y[i]! - (slope * xi + intercept)) / scale);
      // Stryker disable next-line EqualityOperator: equivalent, at u = c both branches give the weight 1 (c/u = 1)
      return u <= tuning ? 1 : tuning / u;
    });
    const next = weightedLine(x, y, weights);
    let change = 0;
    for (const xi of x) change = Math.max(change, Math.abs((next.slope - slope) * xi + (next.intercept - intercept)));
    slope = next.slope;
    intercept = next.intercept;
    if (change <= tolerance) {
      converged = true;
      break;
    }
  }
  const residuals = x.map((xi, i) => y[i]! - (slope * xi + intercept));
  return { slope, intercept, tuning, scale, weights, iterations: Math.min(iterations, 200), converged, residuals };
}

/** Checks the confidence, spike threshold and Huber tuning of a fit. @internal */
export function requireFitOptions(confidence: number, spikeThreshold: number, huberTuning: number): void {
  requireInRange("confidence", confidence, "", { min: 0, max: 1, minOpen: true, maxOpen: true });
  requirePositive("spikeThreshold", spikeThreshold, "");
  requirePositive("huberTuning", huberTuning, "");
}

/**
 * Fits y = slope·x + intercept three ways (draper-smith-1998 least squares with Student-t
 * intervals; theil-1950 and sen-1968 median of pairwise slopes, gilbert-1987 interval; huber-1964
 * M-fit by holland-welsch-1977 IRLS) and flags spikes by the modified z-score of the Theil–Sen
 * residuals (iglewicz-hoaglin-1993).
 *
 * Formula: least squares $b_1 = S_{xy}/S_{xx}$, $b_0 = \bar y - b_1\bar x$,
 * $\mathrm{se}(b_1) = s/\sqrt{S_{xx}}$, $\mathrm{se}(b_0) = s\sqrt{1/n + \bar x^2/S_{xx}}$, $s^2 = \mathrm{SSE}/(n-2)$,
 * interval $b \pm t_{1-\alpha/2,\,n-2}\,\mathrm{se}$; Theil–Sen $b_1 = \mathrm{med}_{i<j}\dfrac{y_j - y_i}{x_j - x_i}$,
 * $b_0 = \mathrm{med}(y_i - b_1 x_i)$; spike when $|r_i - \tilde r| / (1.4826\,\mathrm{MAD}) > k$
 *
 * @param x abscissae, at least 3 points with at least 3 different values, finite
 * @param y ordinates, same length, finite
 * @param confidence level of the intervals [-], 0 < level < 1 (default 0.95)
 * @param spikeThreshold k [-], greater than 0 (default 3.5)
 * @param huberTuning c [-], greater than 0 (default 1.345)
 * @returns the three fits, the spike report and a least-squares refit without the spikes
 *
 * Assumptions: x values closer than 1e-12 of the largest |x| count as equal; the robust scale never
 * falls below 1e-9 of the largest |y| (so round-off in exact data is never flagged); when the MAD is
 * 0 the scale comes from the mean absolute deviation. Data whose sums underflow or overflow in
 * double precision are refused with a CalcInputError.
 * @example
 * fitStraightLine({ x: [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5], y: [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68] }).leastSquares // → { intercept: 3.0001, slope: 0.5001, rSquared: 0.6665, … } (Anscombe's data set I)
 *
 * Sources: draper-smith-1998, theil-1950, sen-1968, gilbert-1987, huber-1964, holland-welsch-1977,
 * iglewicz-hoaglin-1993, johnson-kotz-balakrishnan-1994, abramowitz-stegun-1964.
 */
export function fitStraightLine(input: {
  x: readonly number[];
  y: readonly number[];
  confidence?: number;
  spikeThreshold?: number;
  huberTuning?: number;
}): StraightLineFit {
  const { x, y, confidence = 0.95, spikeThreshold = 3.5, huberTuning = 1.345 } = requireInputObject(input);
  if (!Array.isArray(x) || !Array.isArray(y) || x.length !== y.length) {
    throw new CalcInputError({
      param: "y",
      value: Array.isArray(y) ? y.length : String(y),
      expected: `as many values as x (${Array.isArray(x) ? x.length : 0})`,
      unit: "",
    });
  }
  for (const [i, v] of x.entries()) requireFinite(`x[${i}]`, v, "");
  for (const [i, v] of y.entries()) requireFinite(`y[${i}]`, v, "");
  requireFitOptions(confidence, spikeThreshold, huberTuning);
  const distinctX = countDistinct(x);
  // Fewer than 3 points always means fewer than 3 different x, so one check covers both.
  if (distinctX < 3) {
    throw new CalcInputError({ param: "x", value: distinctX, expected: "at least 3 different values", unit: "" });
  }
  return fitChecked(x, y, confidence, spikeThreshold, huberTuning, "x");
}

/** Every number in a fit, for the final finiteness check. */
function numbersOf(value: unknown, out: number[] = []): number[] {
  // A list is an object too: Object.values gives its items in order.
  if (typeof value === "number") out.push(value);
  else if (value !== null && typeof value === "object") for (const v of Object.values(value)) numbersOf(v, out);
  return out;
}

/** The straight-line fit on inputs already checked. @internal */
export function fitChecked(
  x: readonly number[],
  y: readonly number[],
  confidence: number,
  spikeThreshold: number,
  huberTuning: number,
  param: string,
): StraightLineFit {
  if (!Array.isArray(x) || !Array.isArray(y) || x.length !== y.length || x.length < 3 || !x.every(Number.isFinite) || !y.every(Number.isFinite)) {
    throw new CalcInputError({
      param: String(param),
      value: Array.isArray(x) ? x.length : x,
      expected: "two lists of as many finite numbers, at least 3",
      unit: "",
    });
  }
  requireFitOptions(confidence, spikeThreshold, huberTuning);
  const leastSquares = leastSquaresLine(x, y, confidence);
  const theilSen = theilSenLine(x, y, confidence);
  const yScale = y.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  const floor = Math.max(1e-9 * yScale, 1e-300);
  const robust = robustScale(theilSen.residuals, floor);
  const modifiedZ = theilSen.residuals.map((r) => (r - robust.center) / robust.scale);
  // Distance from the centre in robust standard deviations, |M_i| (iglewicz-hoaglin-1993).
  const robustDistance = modifiedZ.map((m) => Math.abs(m));
  const flagged = robustDistance.flatMap((d, i) => (d > spikeThreshold ? [i] : []));
  const huber = huberLine(x, y, theilSen, robust.scale, huberTuning, 1e-12 * (yScale + robust.scale));
  let leastSquaresWithoutSpikes: LeastSquaresLine | null = null;
  if (flagged.length > 0) {
    const keep = x.flatMap((_, i) => (flagged.includes(i) ? [] : [i]));
    const kx = keep.map((i) => x[i]!);
    // Fewer than 3 kept points always means fewer than 3 different x, so one check covers both.
    if (countDistinct(kx) >= 3) {
      leastSquaresWithoutSpikes = leastSquaresLine(
        kx,
        keep.map((i) => y[i]!),
        confidence,
      );
    }
  }
  const fit: StraightLineFit = {
    count: x.length,
    distinctX: countDistinct(x),
    confidence,
    leastSquares,
    theilSen,
    huber,
    spikes: {
      threshold: spikeThreshold,
      scale: robust.scale,
      scaleFrom: robust.from,
      center: robust.center,
      // iglewicz-hoaglin-1993: |r − median r| > k·σ̂ flags a point
      bounds: { low: robust.center - spikeThreshold * robust.scale, high: robust.center + spikeThreshold * robust.scale },
      modifiedZ,
      robustDistance,
      flagged,
    },
    leastSquaresWithoutSpikes,
  };
  // Values so close together or so extreme that the sums underflow or overflow cannot be fitted.
  if (!numbersOf(fit).every(Number.isFinite)) {
    throw new CalcInputError({
      param,
      value: "values out of reach",
      expected: "values spread enough, and small enough, to fit a line in double precision",
      unit: "",
    });
  }
  return fit;
}

// ---------------------------------------------------------------------------------------------
