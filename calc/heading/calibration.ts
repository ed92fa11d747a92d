/**
 * Calibration of an accelerometer-based spin-rate estimate: fit the radial reading against a
 * reference speed, a = r·ω² + b, to get the effective radius r (which absorbs the sensor's scale
 * error and tilt) and the offset b. Least squares with standard errors and Student-t intervals,
 * Theil–Sen with a distribution-free interval for the slope, a Huber M-fit, and spike flags from the
 * robust residuals. Also the small statistical functions these need (Student t and normal
 * quantiles) and a compact, versioned text form of the rows for a URL. SI in and out.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { defineInputs } from "../core/inputs.ts";
import { fromSI, toSI } from "../core/units.ts";

// ---------------------------------------------------------------------------------------------
// Special functions.

/** Lanczos coefficients (g = 7, n = 9) for ln Γ; numerical-recipes-2007 §6.1 describes the method. */
const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059, 12.507343278686905, -0.13857109526572012,
  9.9843695780195716e-6, 1.5056327351493116e-7,
];

/**
 * Natural logarithm of the gamma function for x > 0 (numerical-recipes-2007 §6.1, Lanczos
 * approximation).
 *
 * Formula: $\Gamma(x+1) \approx \sqrt{2\pi}\,(x + g + \tfrac12)^{x + 1/2} e^{-(x+g+1/2)} A_g(x)$, with reflection for x < ½
 *
 * @param x [-], greater than 0
 * @returns ln Γ(x) [-]
 *
 * Example: ln Γ(0.5) = ln √π = 0.5723649429; ln Γ(5) = ln 24 = 3.1780538303.
 * Sources: numerical-recipes-2007, abramowitz-stegun-1964.
 */
export function logGamma(x: number): number {
  requirePositive("x", x, "");
  if (x < 0.5) {
    // reflection Γ(x)Γ(1 − x) = π / sin(πx) (abramowitz-stegun-1964 6.1.17)
    return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  }
  const z = x - 1;
  let sum = LANCZOS[0]!;
  for (let i = 1; i < LANCZOS.length; i++) sum += LANCZOS[i]! / (z + i);
  const t = z + 7.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

/** Continued fraction for the incomplete beta function, modified Lentz (numerical-recipes-2007 §6.4, betacf). */
function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 1000; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-16) break;
  }
  return h;
}

/**
 * Regularised incomplete beta function I_x(a, b), with 1 − x passed separately so that x near 1
 * loses no digits (numerical-recipes-2007 §6.4; abramowitz-stegun-1964 §26.5).
 */
function incompleteBeta(x: number, oneMinusX: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (oneMinusX <= 0) return 1;
  const front = Math.exp(logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(oneMinusX));
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(a, b, x)) / a;
  return 1 - (front * betaContinuedFraction(b, a, oneMinusX)) / b;
}

/**
 * Cumulative distribution of Student's t (abramowitz-stegun-1964 §26.7, via the incomplete beta
 * function of §26.5).
 *
 * Formula: $F(t) = 1 - \tfrac12 I_{\nu/(\nu+t^2)}(\nu/2, 1/2)$ for t ≥ 0, $F(-t) = 1 - F(t)$
 *
 * @param t [-], finite
 * @param degreesOfFreedom ν [-], greater than 0
 * @returns F(t) [-]
 *
 * Example: ν = 1 (Cauchy): F(1) = 0.75. Sources: abramowitz-stegun-1964, numerical-recipes-2007.
 */
export function studentTCdf({ t, degreesOfFreedom }: { t: number; degreesOfFreedom: number }): number {
  requireFinite("t", t, "");
  requirePositive("degreesOfFreedom", degreesOfFreedom, "");
  return studentTCdfUnchecked(t, degreesOfFreedom);
}

function studentTCdfUnchecked(t: number, nu: number): number {
  const t2 = t * t;
  // abramowitz-stegun-1964 26.7.1 in incomplete-beta form: two-tailed area = I_{ν/(ν+t²)}(ν/2, ½)
  const tail = 0.5 * incompleteBeta(nu / (nu + t2), t2 / (nu + t2), nu / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/** Solves I_x(ν/2, ½) = target for x by bisection (I_x rises with x). */
function solveBetaForTail(target: number, nu: number): number {
  let lo = 0;
  let hi = 1;
  for (let i = 0; i < 400; i++) {
    const mid = lo + (hi - lo) / 2;
    if (mid === lo || mid === hi) break;
    if (incompleteBeta(mid, 1 - mid, nu / 2, 0.5) < target) lo = mid;
    else hi = mid;
  }
  return lo + (hi - lo) / 2;
}

/**
 * Quantile of Student's t: the t with F(t) = p (abramowitz-stegun-1964 §26.7; inverted by
 * bisection on the incomplete beta function, numerical-recipes-2007 §6.4).
 *
 * Formula: $t_p$ such that $\tfrac12 I_{\nu/(\nu+t_p^2)}(\nu/2, 1/2) = 1 - p$ for p > ½
 *
 * @param probability p [-], 0 < p < 1
 * @param degreesOfFreedom ν [-], greater than 0
 * @returns t_p [-]
 *
 * Assumptions: accurate to about 1e-10 relative. Example: p = 0.975, ν = 1: tan(0.475π) = 12.7062;
 * ν = 2: 4.3027. Sources: abramowitz-stegun-1964, numerical-recipes-2007.
 */
export function studentTQuantile({ probability, degreesOfFreedom }: { probability: number; degreesOfFreedom: number }): number {
  requireInRange("probability", probability, "", { min: 0, max: 1, minOpen: true, maxOpen: true });
  requirePositive("degreesOfFreedom", degreesOfFreedom, "");
  if (probability === 0.5) return 0;
  const upper = probability > 0.5;
  const tailArea = upper ? 1 - probability : probability;
  const x = solveBetaForTail(2 * tailArea, degreesOfFreedom);
  const t = Math.sqrt((degreesOfFreedom * (1 - x)) / x);
  return upper ? t : -t;
}

/** Complementary error function from the incomplete gamma function Q(½, x²) (numerical-recipes-2007 §6.2). */
function erfcPositive(x: number): number {
  if (x === 0) return 1;
  const a = 0.5;
  const z = x * x;
  const logFront = -z + a * Math.log(z) - 0.5 * Math.log(Math.PI); // ln Γ(½) = ln √π exactly
  if (z < a + 1) {
    // series for P(a, z); erfc = 1 − P
    let ap = a;
    let del = 1 / a;
    let sum = del;
    for (let n = 0; n < 1000; n++) {
      ap += 1;
      del *= z / ap;
      sum += del;
      if (Math.abs(del) < Math.abs(sum) * 1e-17) break;
    }
    return 1 - sum * Math.exp(logFront);
  }
  // continued fraction for Q(a, z), modified Lentz
  const tiny = 1e-300;
  let b = z + 1 - a;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 1000; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + an / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-16) break;
  }
  return Math.exp(logFront) * h;
}

/**
 * Standard normal cumulative distribution (abramowitz-stegun-1964 §26.2; erfc from the incomplete
 * gamma function, numerical-recipes-2007 §6.2).
 *
 * Formula: $\Phi(z) = \tfrac12\,\mathrm{erfc}(-z/\sqrt2)$
 *
 * @param z [-], finite
 * @returns Φ(z) [-]
 *
 * Example: Φ(1.959964) = 0.975. Sources: abramowitz-stegun-1964, numerical-recipes-2007.
 */
export function normalCdf({ z }: { z: number }): number {
  requireFinite("z", z, "");
  const e = 0.5 * erfcPositive(Math.abs(z) / Math.SQRT2);
  return z >= 0 ? 1 - e : e;
}

/**
 * Standard normal quantile: the z with Φ(z) = p (abramowitz-stegun-1964 §26.2; bisection on the
 * upper tail ½ erfc(z/√2)).
 *
 * Formula: $z_p$ such that $\tfrac12\,\mathrm{erfc}(z_p/\sqrt2) = 1 - p$ for p > ½
 *
 * @param probability p [-], 0 < p < 1
 * @returns z_p [-]
 *
 * Example: p = 0.975: 1.959964. Sources: abramowitz-stegun-1964, numerical-recipes-2007.
 */
export function normalQuantile({ probability }: { probability: number }): number {
  requireInRange("probability", probability, "", { min: 0, max: 1, minOpen: true, maxOpen: true });
  if (probability === 0.5) return 0;
  const upper = probability > 0.5;
  const tailArea = upper ? 1 - probability : probability;
  let lo = 0;
  let hi = 40;
  for (let i = 0; i < 400; i++) {
    const mid = lo + (hi - lo) / 2;
    if (mid === lo || mid === hi) break;
    if (0.5 * erfcPositive(mid / Math.SQRT2) > tailArea) lo = mid;
    else hi = mid;
  }
  const z = lo + (hi - lo) / 2;
  return upper ? z : -z;
}

// ---------------------------------------------------------------------------------------------
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

function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const n = s.length;
  const mid = Math.floor(n / 2);
  return n % 2 === 1 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

/** Values closer than this fraction of the largest |x| count as the same x. */
const SAME_X = 1e-12;

function sameXTolerance(x: readonly number[]): number {
  return SAME_X * x.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
}

/** Sizes of the groups of equal x (within the tolerance), after sorting. */
function xGroups(x: readonly number[]): number[] {
  const tol = sameXTolerance(x);
  const sorted = [...x].sort((a, b) => a - b);
  const groups: number[] = [];
  let last = Number.NEGATIVE_INFINITY;
  for (const v of sorted) {
    if (groups.length > 0 && v - last <= tol) groups[groups.length - 1]! += 1;
    else groups.push(1);
    last = v;
  }
  return groups;
}

function countDistinct(values: readonly number[]): number {
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
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      // theil-1950: slope of every pair with different x
      if (Math.abs(x[j]! - x[i]!) > tol) slopes.push((y[j]! - y[i]!) / (x[j]! - x[i]!));
    }
  }
  slopes.sort((a, b) => a - b);
  const slope = median(slopes);
  // sen-1968 / theil-1950: intercept as the median of y_i − slope·x_i
  const intercept = median(x.map((xi, i) => y[i]! - slope * xi));
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
  const slopeInterval = m1 >= 1 && m2 + 1 <= nPairs ? { low: atRank(slopes, m1), high: atRank(slopes, m2 + 1) } : null;
  return { slope, intercept, slopeInterval, ranks: { low: m1, high: m2 + 1 }, pairCount: nPairs, residuals };
}

function round4(x: number): number {
  return Number(x.toPrecision(4));
}

function robustScale(residuals: readonly number[], floor: number): { center: number; scale: number; from: ScaleSource } {
  const center = median(residuals);
  const deviations = residuals.map((r) => Math.abs(r - center));
  // iglewicz-hoaglin-1993: σ̂ = MAD/0.6745 = 1.4826·MAD
  let scale = 1.482602218505602 * median(deviations);
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
  let weights = x.map(() => 1);
  let converged = false;
  let iterations = 0;
  for (iterations = 1; iterations <= 200; iterations++) {
    // huber-1964 ψ(u) = max(−c, min(c, u)); holland-welsch-1977 IRLS weights w = ψ(u)/u = min(1, c/|u|)
    weights = x.map((xi, i) => {
      const u = Math.abs((y[i]! - (slope * xi + intercept)) / scale);
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

function requireFitOptions(confidence: number, spikeThreshold: number, huberTuning: number): void {
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
 * Example: Anscombe's data set I gives y = 3.0001 + 0.5001x, R² = 0.6665.
 *
 * Sources: draper-smith-1998, theil-1950, sen-1968, gilbert-1987, huber-1964, holland-welsch-1977,
 * iglewicz-hoaglin-1993, johnson-kotz-balakrishnan-1994, abramowitz-stegun-1964.
 */
export function fitStraightLine({
  x,
  y,
  confidence = 0.95,
  spikeThreshold = 3.5,
  huberTuning = 1.345,
}: {
  x: readonly number[];
  y: readonly number[];
  confidence?: number;
  spikeThreshold?: number;
  huberTuning?: number;
}): StraightLineFit {
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
  if (x.length < 3 || distinctX < 3) {
    throw new CalcInputError({ param: "x", value: distinctX, expected: "at least 3 different values", unit: "" });
  }
  return fitChecked(x, y, confidence, spikeThreshold, huberTuning, "x");
}

/** Every number in a fit, for the final finiteness check. */
function numbersOf(value: unknown, out: number[] = []): number[] {
  if (typeof value === "number") out.push(value);
  else if (Array.isArray(value)) for (const v of value) numbersOf(v, out);
  else if (value !== null && typeof value === "object") for (const v of Object.values(value)) numbersOf(v, out);
  return out;
}

function fitChecked(
  x: readonly number[],
  y: readonly number[],
  confidence: number,
  spikeThreshold: number,
  huberTuning: number,
  param: string,
): StraightLineFit {
  const leastSquares = leastSquaresLine(x, y, confidence);
  const theilSen = theilSenLine(x, y, confidence);
  const yScale = y.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  const floor = Math.max(1e-9 * yScale, 1e-300);
  const robust = robustScale(theilSen.residuals, floor);
  const modifiedZ = theilSen.residuals.map((r) => (r - robust.center) / robust.scale);
  const flagged = modifiedZ.flatMap((m, i) => (Math.abs(m) > spikeThreshold ? [i] : []));
  const huber = huberLine(x, y, theilSen, robust.scale, huberTuning, 1e-12 * (yScale + robust.scale));
  let leastSquaresWithoutSpikes: LeastSquaresLine | null = null;
  if (flagged.length > 0) {
    const keep = x.flatMap((_, i) => (flagged.includes(i) ? [] : [i]));
    const kx = keep.map((i) => x[i]!);
    if (keep.length >= 3 && countDistinct(kx) >= 3) {
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
// The calibration fit.

/** One calibration reading: a reference spin rate and the radial acceleration read at it. */
export interface CalibrationRow {
  /** ω, from a tachometer or a timed video [rad/s], 0 or more. */
  angularSpeed: number;
  /** a, the radial reading at that speed [m/s²]. */
  acceleration: number;
}

export type CalibrationMethod = "least-squares" | "least-squares-without-spikes" | "theil-sen";

export interface CalibrationFit extends StraightLineFit {
  /** The radius to put in firmware [m]: the recommended fit's slope (it absorbs scale error and tilt). */
  radius: number;
  /** The offset to subtract in firmware [m/s²]: the recommended fit's intercept. */
  bias: number;
  /** Which fit gave radius and bias. */
  method: CalibrationMethod;
  /** x_i = ω_i² [rad²/s²], in input order. */
  speedSquared: number[];
}

/**
 * Fits the calibration line a = r·ω² + b to reference readings (openstax-college-physics a = ω²r
 * with ieee-1293-1998 offset and scale; fits as in `fitStraightLine`). The slope is the effective
 * radius and the intercept the offset; in slope and intercept fields, units are m and m/s².
 *
 * Formula: $a_i = \hat r\,\omega_i^2 + \hat b$, fitted in $x_i = \omega_i^2$
 *
 * @param rows readings, at least 3 at different speeds; ω [rad/s] ≥ 0 and a [m/s²] finite
 * @param options confidence [-] (0.95), spikeThreshold k [-] (3.5), huberTuning c [-] (1.345)
 * @returns every fit, the spike report, and the recommended radius [m] and offset [m/s²]:
 * least squares when nothing is flagged, least squares without the spikes when enough points
 * remain, else Theil–Sen
 *
 * Assumptions: the reference speed is right; the fitted radius is (1 + k) r cos θ, which is the
 * number the firmware needs (it cancels scale error and tilt at every speed). Example: readings
 * made exactly from r = 12.7 mm and b = 0.3 g at 600, 1200, 1800 and 2400 rpm give back 12.7 mm
 * and 2.942 m/s².
 *
 * Sources: openstax-college-physics, ieee-1293-1998, draper-smith-1998, theil-1950, sen-1968,
 * gilbert-1987, iglewicz-hoaglin-1993.
 */
export function fitCalibration(
  rows: readonly CalibrationRow[],
  options: { confidence?: number; spikeThreshold?: number; huberTuning?: number } = {},
): CalibrationFit {
  const { confidence = 0.95, spikeThreshold = 3.5, huberTuning = 1.345 } = options;
  if (!Array.isArray(rows)) throw new CalcInputError({ param: "rows", value: String(rows), expected: "a list of readings", unit: "" });
  rows.forEach((row, i) => {
    requireNonNegative(`rows[${i}].angularSpeed`, row?.angularSpeed, "rad/s");
    requireFinite(`rows[${i}].acceleration`, row?.acceleration, "m/s²");
  });
  requireFitOptions(confidence, spikeThreshold, huberTuning);
  const speedSquared = rows.map((r) => r.angularSpeed * r.angularSpeed);
  const distinct = countDistinct(speedSquared);
  if (rows.length < 3 || distinct < 3) {
    throw new CalcInputError({ param: "rows", value: distinct, expected: "at least 3 readings at different speeds", unit: "" });
  }
  const fit = fitChecked(
    speedSquared,
    rows.map((r) => r.acceleration),
    confidence,
    spikeThreshold,
    huberTuning,
    "rows",
  );
  const chosen =
    fit.spikes.flagged.length === 0
      ? { line: fit.leastSquares, method: "least-squares" as const }
      : fit.leastSquaresWithoutSpikes
        ? { line: fit.leastSquaresWithoutSpikes, method: "least-squares-without-spikes" as const }
        : { line: fit.theilSen, method: "theil-sen" as const };
  return { ...fit, radius: chosen.line.slope, bias: chosen.line.intercept, method: chosen.method, speedSquared };
}

/** Inputs of the calibration calculator besides the readings themselves, in SI. */
export const calibrationFitInputs = /* @__PURE__ */ defineInputs({
  spikeThreshold: {
    label: "Spike threshold k",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 100,
    default: 3.5,
    unit: { metric: "frac", us: "frac" },
    urlKey: "k",
    help: "A reading is flagged when its residual lies more than k robust standard deviations (1.4826 × MAD) from the median residual.",
  },
  confidence: {
    label: "Confidence level",
    kind: "fraction",
    min: 0.5,
    max: 0.999,
    default: 0.95,
    urlKey: "cl",
    help: "How sure the intervals around the fitted radius and offset should be.",
  },
});

/**
 * Invented calibration readings for the chapter's demo robot (not a real machine and not
 * measured): [reference speed (rpm), radial reading (g)]. Made from a = 12.7 mm · ω² + 0.2 g,
 * rounded to 0.01 g, with scatter of up to ±0.24 g written in by hand and one reading at 2000 rpm
 * made 6 g high, as a knock against the test stand would.
 */
export const DEMO_CALIBRATION_READINGS: readonly (readonly [number, number])[] = [
  [600, 5.37],
  [800, 9.18],
  [1000, 14.54],
  [1200, 20.6],
  [1400, 28.26],
  [1600, 36.39],
  [1800, 46.3],
  [2000, 63.01],
  [2200, 68.7],
  [2400, 82.13],
  [2600, 96.12],
  [2800, 111.73],
];

/**
 * The demo readings in SI (unit conversion only: nist-sp811 rpm, cgpm-1901 standard gravity).
 *
 * Formula: ω = n·2π/60, a = a_[g]·g_n
 *
 * @returns the rows of `DEMO_CALIBRATION_READINGS` [rad/s, m/s²]
 *
 * Example: the first row, 600 rpm and 5.37 g, is 62.83 rad/s and 52.66 m/s².
 * Sources: nist-sp811, cgpm-1901.
 */
export function demoCalibrationRows(): CalibrationRow[] {
  return DEMO_CALIBRATION_READINGS.map(([rpm, g]) => ({ angularSpeed: toSI(rpm, "rpm"), acceleration: toSI(g, "gn") }));
}

/** A point of the calibration plot. */
export interface CalibrationCurvePoint {
  /** ω [rad/s]. */
  angularSpeed: number;
  /** Least-squares line at ω [m/s²]. */
  leastSquares: number;
  /** Theil–Sen line at ω [m/s²]. */
  theilSen: number;
  /** The recommended line at ω [m/s²]. */
  recommended: number;
}

/**
 * The fitted calibration curves over a speed range, for a plot over the readings
 * (openstax-college-physics, a = r ω² + b).
 *
 * Formula: $a(\omega) = \hat r\,\omega^2 + \hat b$ for each fit
 *
 * @param fit the result of `fitCalibration`
 * @param lowSpeed ω_lo [rad/s], 0 or more
 * @param highSpeed ω_hi [rad/s], greater than ω_lo
 * @param points number of speeds [-], whole, 2 to 2001 (default 61)
 * @returns one point per speed [rad/s, m/s²]
 *
 * Example: r = 12.7 mm, b = 0 at 2000 rpm: 557.1 m/s². Sources: openstax-college-physics.
 */
export function calibrationCurve({
  fit,
  lowSpeed,
  highSpeed,
  points = 61,
}: {
  fit: CalibrationFit;
  lowSpeed: number;
  highSpeed: number;
  points?: number;
}): CalibrationCurvePoint[] {
  requireNonNegative("lowSpeed", lowSpeed, "rad/s");
  requireFinite("highSpeed", highSpeed, "rad/s");
  if (!(highSpeed > lowSpeed)) {
    throw new CalcInputError({ param: "highSpeed", value: highSpeed, expected: `greater than lowSpeed (${round4(lowSpeed)} rad/s)`, unit: "rad/s" });
  }
  requireInRange("points", points, "", { min: 2, max: 2001 });
  if (!Number.isInteger(points)) throw new CalcInputError({ param: "points", value: points, expected: "a whole number", unit: "" });
  const out: CalibrationCurvePoint[] = [];
  for (let i = 0; i < points; i++) {
    const w = i === points - 1 ? highSpeed : lowSpeed + ((highSpeed - lowSpeed) * i) / (points - 1);
    const x = w * w;
    out.push({
      angularSpeed: w,
      leastSquares: fit.leastSquares.slope * x + fit.leastSquares.intercept,
      theilSen: fit.theilSen.slope * x + fit.theilSen.intercept,
      recommended: fit.radius * x + fit.bias,
    });
  }
  return out;
}

// ---------------------------------------------------------------------------------------------
// Compact text form of the rows, for a URL: "v1:1200:31.5,1800:70.9" (rpm:g).

/** Version tag of the encoding this module writes. */
export const CALIBRATION_ROWS_VERSION = 1;
/** Most rows the text form carries. */
export const CALIBRATION_ROWS_MAX = 500;

const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

function compactNumber(value: number): string {
  return String(Number(value.toPrecision(6))).replace("e+", "e");
}

/**
 * Writes calibration rows as compact text for a URL: a version tag, then speed:acceleration pairs
 * in rpm and standard gravities, six significant figures, comma-separated.
 *
 * Formula: "v1:" + ω₁[rpm] ":" a₁[g] "," ω₂[rpm] ":" a₂[g] …
 *
 * @param rows readings (ω [rad/s] ≥ 0, a [m/s²] finite), at most 500
 * @returns the text, e.g. "v1:1200:31.5,1800:70.9"
 *
 * Example: 1200 rpm reading 31.5 g → "v1:1200:31.5". Sources: nist-sp811 (rpm and g_n definitions).
 */
export function encodeCalibrationRows(rows: readonly CalibrationRow[]): string {
  if (rows.length > CALIBRATION_ROWS_MAX) {
    throw new CalcInputError({ param: "rows", value: rows.length, expected: `at most ${CALIBRATION_ROWS_MAX} readings`, unit: "" });
  }
  const pieces = rows.map((row, i) => {
    requireNonNegative(`rows[${i}].angularSpeed`, row.angularSpeed, "rad/s");
    requireFinite(`rows[${i}].acceleration`, row.acceleration, "m/s²");
    return `${compactNumber(fromSI(row.angularSpeed, "rpm"))}:${compactNumber(fromSI(row.acceleration, "gn"))}`;
  });
  return `v${CALIBRATION_ROWS_VERSION}:${pieces.join(",")}`;
}

/** A piece of the text form that could not be read. */
export interface RowTextProblem {
  /** 1-based position of the piece among the comma-separated pieces (0 for the text as a whole). */
  piece: number;
  /** The piece as found (at most 40 characters). */
  text: string;
  reason: string;
}

export interface DecodedCalibrationRows {
  /** The version read, or null when the text carried none or an unknown one. */
  version: number | null;
  rows: CalibrationRow[];
  problems: RowTextProblem[];
}

function clip(text: string): string {
  return text.length > 40 ? `${text.slice(0, 40)}…` : text;
}

/**
 * Reads the text form written by `encodeCalibrationRows`. Never throws: pieces that cannot be read
 * are skipped and each is reported with its position and the reason.
 *
 * Formula: inverse of `encodeCalibrationRows` (rpm → rad/s × π/30, g → m/s² × 9.806 65)
 *
 * @param text the text from the URL (any string)
 * @returns the rows [rad/s, m/s²], the version, and the problems
 *
 * Assumptions: text without a version tag is read as version 1 and says so; an unknown version
 * yields no rows. Example: "v1:1200:31.5,abc" → one row and a problem at piece 2.
 * Sources: nist-sp811, cgpm-1901.
 */
export function decodeCalibrationRows(text: string): DecodedCalibrationRows {
  const problems: RowTextProblem[] = [];
  let body = typeof text === "string" ? text.trim() : "";
  let version: number | null = CALIBRATION_ROWS_VERSION;
  const tag = /^v(\d{1,6}):/i.exec(body);
  if (tag) {
    version = Number(tag[1]);
    body = body.slice(tag[0].length);
    if (version !== CALIBRATION_ROWS_VERSION) {
      return {
        version: null,
        rows: [],
        problems: [{ piece: 0, text: clip(tag[0]), reason: `unknown version ${version}; this reader knows v${CALIBRATION_ROWS_VERSION}` }],
      };
    }
  } else if (body !== "") {
    problems.push({ piece: 0, text: "", reason: `no version tag; read as v${CALIBRATION_ROWS_VERSION}` });
    version = null;
  }
  const rows: CalibrationRow[] = [];
  if (body === "") return { version, rows, problems };
  const pieces = body.split(",");
  pieces.forEach((raw, i) => {
    const piece = raw.trim();
    const at = i + 1;
    if (i >= CALIBRATION_ROWS_MAX) {
      if (i === CALIBRATION_ROWS_MAX) {
        problems.push({ piece: at, text: clip(piece), reason: `more than ${CALIBRATION_ROWS_MAX} readings; the rest are skipped` });
      }
      return;
    }
    const parts = piece.split(":");
    if (parts.length !== 2) {
      problems.push({ piece: at, text: clip(piece), reason: piece === "" ? "empty piece" : "expected speed:acceleration (rpm:g)" });
      return;
    }
    const [speedText, accText] = parts as [string, string];
    if (!PLAIN_NUMBER.test(speedText)) {
      problems.push({ piece: at, text: clip(piece), reason: `speed "${clip(speedText)}" is not a number` });
      return;
    }
    if (!PLAIN_NUMBER.test(accText)) {
      problems.push({ piece: at, text: clip(piece), reason: `acceleration "${clip(accText)}" is not a number` });
      return;
    }
    const rpm = Number(speedText);
    const g = Number(accText);
    if (!Number.isFinite(rpm) || !Number.isFinite(g)) {
      problems.push({ piece: at, text: clip(piece), reason: "number too large" });
      return;
    }
    if (rpm < 0) {
      problems.push({ piece: at, text: clip(piece), reason: "speed must be 0 or more" });
      return;
    }
    rows.push({ angularSpeed: toSI(rpm, "rpm"), acceleration: toSI(g, "gn") });
  });
  return { version, rows, problems };
}
