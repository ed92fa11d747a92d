/**
 * Special functions for the fits: log-gamma, the regularised incomplete beta, and the Student t and
 * normal distributions (cumulative and quantile).
 */
import { requireFinite, requireInRange, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// Special functions.

/** The Euler–Mascheroni constant γ (abramowitz-stegun-1964 6.1.3). */
const EULER_GAMMA = 0.5772156649015329;

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
 * @param x [-], greater than 0; below 1e-10 the series ln Γ(x) = −ln x − γx (abramowitz-stegun-1964
 *   6.1.33, with ln Γ(x) = ln Γ(1 + x) − ln x) replaces the reflection, whose π/sin(πx) would
 *   overflow for x near the smallest doubles
 * @returns ln Γ(x) [-]; a CalcInputError names x when ln Γ(x) passes the largest double (x near Number.MAX_VALUE)
 *
 * @example
 * logGamma(0.5) // → 0.5723649429 (ln √π)
 * logGamma(5) // → 3.1780538303 (ln 24)
 * Sources: numerical-recipes-2007, abramowitz-stegun-1964.
 */
export function logGamma(x: number): number {
  requirePositive("x", x, "");
  // abramowitz-stegun-1964 6.1.33: ln Γ(1 + x) = −γx + O(x²), and ln Γ(x) = ln Γ(1 + x) − ln x
  // Stryker disable next-line EqualityOperator: equivalent, at x = 1e-10 the series and the reflection give the same double (23.025850929882736)
  if (x < 1e-10) return -Math.log(x) - EULER_GAMMA * x;
  if (x < 0.5) {
    // reflection Γ(x)Γ(1 − x) = π / sin(πx) (abramowitz-stegun-1964 6.1.17)
    return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  }
  const z = x - 1;
  let sum = LANCZOS[0]!;
  for (let i = 1; i < LANCZOS.length; i++) sum += LANCZOS[i]! / (z + i);
  const t = z + 7.5;
  return requireFiniteResult(0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum), "ln Γ(x)", { x: [x, ""] });
}

/** Continued fraction for the incomplete beta function, modified Lentz (numerical-recipes-2007 §6.4, betacf). */
function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  // No guard against d = 0 here: both callers pass x < (a + 1)/(a + b + 2), so d ≥ 2/(a + b + 2) > 0.
  let d = 1 - (qab * x) / qap;
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
  // At 1 − x = 0 (t = 0) the front factor below is e^(−∞) = 0, and the result 1 − 0 = 1 without a guard.
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
 * @example
 * studentTCdf({ t: 1, degreesOfFreedom: 1 }) // → 0.75 (Cauchy)
 * Sources: abramowitz-stegun-1964, numerical-recipes-2007.
 */
export function studentTCdf(input: { t: number; degreesOfFreedom: number }): number {
  const { t, degreesOfFreedom } = requireInputObject(input);
  requireFinite("t", t, "");
  requirePositive("degreesOfFreedom", degreesOfFreedom, "");
  if (degreesOfFreedom >= LARGE_NU) {
    // abramowitz-stegun-1964 26.7.5 inverted to first order: F(t) = Φ(t) − φ(t)·(t³ + t)/(4ν) + O(ν⁻²).
    // For ν ≥ 10⁶ the neglected terms are below 10⁻¹²; the beta form loses precision there
    // (ln Γ(ν/2 + ½) − ln Γ(ν/2) cancels).
    const density = Math.exp(-0.5 * t * t) / Math.sqrt(2 * Math.PI);
    // The correction moves F toward ½ (its sign is that of t), so F stays within [0, 1].
    // Beyond |t| ≈ 38 the density is 0 in doubles (and t³ may overflow): F is Φ(t) there.
    return density === 0 ? normalCdf({ z: t }) : normalCdf({ z: t }) - (density * (t * t * t + t)) / (4 * degreesOfFreedom);
  }
  return studentTCdfUnchecked(t, degreesOfFreedom);
}

/** ν from which Student's t is taken from its expansion about the normal distribution. */
const LARGE_NU = 1e6;

function studentTCdfUnchecked(t: number, nu: number): number {
  const t2 = t * t;
  // abramowitz-stegun-1964 26.7.1 in incomplete-beta form: two-tailed area = I_{ν/(ν+t²)}(ν/2, ½)
  const tail = 0.5 * incompleteBeta(nu / (nu + t2), t2 / (nu + t2), nu / 2, 0.5);
  // Stryker disable next-line EqualityOperator: equivalent, at t = 0 the tail is ½ and both branches give ½
  return t >= 0 ? 1 - tail : tail;
}

/** Solves I_x(ν/2, ½) = target for x by bisection (I_x rises with x). */
function solveBetaForTail(target: number, nu: number): number {
  let lo = 0;
  let hi = 1;
  for (let i = 0; i < 400; i++) {
    const mid = lo + (hi - lo) / 2;
    // Stryker disable next-line ConditionalExpression,LogicalOperator: equivalent, once mid equals an end the loop only repeats the same mid, which is returned either way
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
 * Assumptions: accurate to about 1e-10 relative.
 * @example
 * studentTQuantile({ probability: 0.975, degreesOfFreedom: 1 }) // → 12.7062 (tan(0.475π))
 * studentTQuantile({ probability: 0.975, degreesOfFreedom: 2 }) // → 4.3027
 * Sources: abramowitz-stegun-1964, numerical-recipes-2007.
 */
export function studentTQuantile(input: { probability: number; degreesOfFreedom: number }): number {
  const { probability, degreesOfFreedom } = requireInputObject(input);
  requireInRange("probability", probability, "", { min: 0, max: 1, minOpen: true, maxOpen: true });
  requirePositive("degreesOfFreedom", degreesOfFreedom, "");
  if (probability === 0.5) return 0;
  if (degreesOfFreedom >= LARGE_NU) {
    // abramowitz-stegun-1964 26.7.5: t_p = z + (z³ + z)/(4ν) + (5z⁵ + 16z³ + 3z)/(96ν²) + O(ν⁻³), z = Φ⁻¹(p).
    const z = normalQuantile({ probability });
    const nu = degreesOfFreedom;
    return z + (z ** 3 + z) / (4 * nu) + (5 * z ** 5 + 16 * z ** 3 + 3 * z) / (96 * nu * nu);
  }
  // Stryker disable next-line EqualityOperator: equivalent, p = ½ has returned above
  const upper = probability > 0.5;
  const tailArea = upper ? 1 - probability : probability;
  const x = solveBetaForTail(2 * tailArea, degreesOfFreedom);
  const t = Math.sqrt((degreesOfFreedom * (1 - x)) / x);
  return upper ? t : -t;
}

/** Complementary error function from the incomplete gamma function Q(½, x²) (numerical-recipes-2007 §6.2). */
function erfcPositive(x: number): number {
  // No special case for x = 0: the series below gives 1 − 2·e^(−∞) = 1.
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
      // Stryker disable next-line ConditionalExpression,EqualityOperator: equivalent, a term below 1e-17 of the sum is under half its ulp: adding it and the smaller ones after it leaves the sum unchanged
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
 * @example
 * normalCdf({ z: 1.959964 }) // → 0.975
 * Sources: abramowitz-stegun-1964, numerical-recipes-2007.
 */
export function normalCdf(input: { z: number }): number {
  const { z } = requireInputObject(input);
  requireFinite("z", z, "");
  // Φ(−40) ≈ 4·10⁻³⁵⁰ is below the smallest double: the tails are exactly 0 and 1 in doubles beyond
  // |z| = 40, and the series would overflow (z² = ∞) for |z| above 10¹⁵⁴.
  // Stryker disable next-line EqualityOperator: equivalent, at |z| = 40 the series gives exactly 0 and 1 too, and z ≠ 0 there
  if (Math.abs(z) >= 40) return z > 0 ? 1 : 0;
  const e = 0.5 * erfcPositive(Math.abs(z) / Math.SQRT2);
  // Stryker disable next-line EqualityOperator: equivalent, at z = 0 e = ½ and both branches give ½
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
 * @example
 * normalQuantile({ probability: 0.975 }) // → 1.959964
 * Sources: abramowitz-stegun-1964, numerical-recipes-2007.
 */
export function normalQuantile(input: { probability: number }): number {
  const { probability } = requireInputObject(input);
  requireInRange("probability", probability, "", { min: 0, max: 1, minOpen: true, maxOpen: true });
  if (probability === 0.5) return 0;
  // Stryker disable next-line EqualityOperator: equivalent, p = ½ has returned above
  const upper = probability > 0.5;
  const tailArea = upper ? 1 - probability : probability;
  let lo = 0;
  let hi = 40;
  for (let i = 0; i < 400; i++) {
    const mid = lo + (hi - lo) / 2;
    // Stryker disable next-line ConditionalExpression,LogicalOperator: equivalent, once mid equals an end the loop only repeats the same mid, which is returned either way
    if (mid === lo || mid === hi) break;
    if (0.5 * erfcPositive(mid / Math.SQRT2) > tailArea) lo = mid;
    else hi = mid;
  }
  const z = lo + (hi - lo) / 2;
  return upper ? z : -z;
}

// ---------------------------------------------------------------------------------------------
