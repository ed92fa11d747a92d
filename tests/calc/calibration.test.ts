import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { errorFunction, linearRegression, rSquared } from "simple-statistics";
// @ts-expect-error: the package ships no type declarations
import { TheilSenRegression } from "ml-regression-theil-sen";
import { CalcInputError, isSourceKey, rpmToRadPerSecond, STANDARD_GRAVITY } from "#calc";
import { checkValue } from "../../calc/core/inputs.ts";
import {
  calibrationCurve,
  calibrationFitInputs,
  DEMO_CALIBRATION_READINGS,
  demoCalibrationRows,
  fitCalibration,
  type CalibrationRow,
} from "../../calc/heading/calibration.ts";
import { decodeCalibrationRows, encodeCalibrationRows } from "../../calc/heading/calibration-rows.ts";
import { fitStraightLine } from "../../calc/numerics/line-fit.ts";
import { logGamma, normalCdf, normalQuantile, studentTCdf, studentTQuantile } from "../../calc/numerics/special.ts";
import { readFileSync } from "node:fs";
import { expectRefusal } from "../support/refusal.ts";

/** mulberry32, then Box–Muller: a seeded source of normal deviates for the Monte Carlo checks. */
function normalSource(seed: number): () => number {
  let s = seed;
  const uniform = () => {
    s = (s + 0x6d2b79f5) | 0;
    let t = Math.imul(s ^ (s >>> 15), 1 | s);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

// Anscombe (1973), data sets I–IV. Values as printed in the Oxford Index entry "Anscombe's
// regression data" (Upton & Cook, A Dictionary of Statistics) and in the scipython.com copy.
const ANSCOMBE_X = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const ANSCOMBE_Y1 = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];
const ANSCOMBE_Y2 = [9.14, 8.14, 8.74, 8.77, 9.26, 8.1, 6.13, 3.1, 9.13, 7.26, 4.74];
const ANSCOMBE_Y3 = [7.46, 6.77, 12.74, 7.11, 7.81, 8.84, 6.08, 5.39, 8.15, 6.42, 5.73];
const ANSCOMBE_X4 = [8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8];
const ANSCOMBE_Y4 = [6.58, 5.76, 7.71, 8.84, 8.47, 7.04, 5.25, 12.5, 5.56, 7.91, 6.89];

describe("straight-line fit: reference cases", () => {
  const fitI = fitStraightLine({ x: ANSCOMBE_X, y: ANSCOMBE_Y1 });
  const fitII = fitStraightLine({ x: ANSCOMBE_X, y: ANSCOMBE_Y2 });
  const fitIII = fitStraightLine({ x: ANSCOMBE_X, y: ANSCOMBE_Y3 });
  const cases = [
    {
      source: "anscombe-1973",
      locator: "data set I: slope 0.500 (3 decimals, as quoted in Wikipedia's table)",
      got: fitI.leastSquares.slope,
      expected: 0.5,
      rtol: 0.0005 / 0.5,
      note: "half a unit in the last printed digit",
    },
    {
      source: "anscombe-1973",
      locator: "data set I: intercept 3.00 (2 decimals)",
      got: fitI.leastSquares.intercept,
      expected: 3.0,
      rtol: 0.005 / 3,
      note: "half a unit in the last printed digit",
    },
    {
      source: "anscombe-1973",
      locator: "data set I: R² 0.67 (2 decimals)",
      got: fitI.leastSquares.rSquared!,
      expected: 0.67,
      rtol: 0.005 / 0.67,
      note: "half a unit in the last printed digit",
    },
    {
      source: "anscombe-1973",
      locator: "data set I: correlation 0.816 (3 decimals)",
      got: Math.sqrt(fitI.leastSquares.rSquared!),
      expected: 0.816,
      rtol: 0.0005 / 0.816,
      note: "half a unit in the last printed digit",
    },
    {
      source: "anscombe-1973",
      locator: "data set II: the same line, slope 0.500",
      got: fitII.leastSquares.slope,
      expected: 0.5,
      rtol: 0.0005 / 0.5,
      note: "half a unit in the last printed digit",
    },
    {
      source: "anscombe-1973",
      locator: "data set III: the same line, intercept 3.00",
      got: fitIII.leastSquares.intercept,
      expected: 3.0,
      rtol: 0.005 / 3,
      note: "half a unit in the last printed digit",
    },
    {
      source: "anscombe-1973 (FROM MEMORY, unconfirmed)",
      locator: "data set I: estimated standard error of the slope 0.118",
      got: fitI.leastSquares.slopeStdError,
      expected: 0.118,
      rtol: 0.0005 / 0.118,
      note: "from memory of the paper's table",
    },
  ];
  it.each(cases)("$source — $locator", ({ got, expected, rtol }) => {
    expect(Math.abs(got - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));
  });

  it("anscombe-1973 data set III: flags the one point off the line (13, 12.74), which the other ten follow to 0.01", () => {
    expect(fitIII.spikes.flagged).toEqual([2]);
    expect(fitIII.leastSquaresWithoutSpikes!.residuals.every((r) => Math.abs(r) < 0.01)).toBe(true);
    expect(fitI.spikes.flagged).toEqual([]);
  });

  it("anscombe-1973 data set IV: refuses it, since its x takes only two values", () => {
    const call = () => fitStraightLine({ x: ANSCOMBE_X4, y: ANSCOMBE_Y4 });
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow("x must be at least 3 different values (got 2)");
  });
});

describe("Student t and normal distributions", () => {
  const tCases = [
    {
      source: "DERIVED-EXACT (ν = 1 is the Cauchy law, abramowitz-stegun-1964 §26.7)",
      locator: "t₀.₉₇₅,₁ = tan(0.475π)",
      inputs: { probability: 0.975, degreesOfFreedom: 1 },
      expected: Math.tan(0.475 * Math.PI),
      rtol: 1e-9,
      note: "bisection on the incomplete beta function",
    },
    {
      source: "DERIVED-EXACT (ν = 2: F(t) = ½ + t/(2√(2 + t²)))",
      locator: "t₀.₉₇₅,₂ = 0.95·√(2/0.0975)",
      inputs: { probability: 0.975, degreesOfFreedom: 2 },
      expected: 0.95 * Math.sqrt(2 / 0.0975),
      rtol: 1e-9,
      note: "",
    },
    {
      source: "DERIVED-EXACT (ν = 2)",
      locator: "t₀.₉₉₅,₂",
      inputs: { probability: 0.995, degreesOfFreedom: 2 },
      expected: (2 * 0.995 - 1) / Math.sqrt(2 * 0.995 * 0.005),
      rtol: 1e-9,
      note: "",
    },
    {
      source: "t table (FROM MEMORY)",
      locator: "t₀.₉₇₅ with 4 d.f. = 2.776",
      inputs: { probability: 0.975, degreesOfFreedom: 4 },
      expected: 2.776,
      rtol: 0.0005 / 2.776,
      note: "printed to 3 decimals",
    },
    {
      source: "t table (FROM MEMORY)",
      locator: "t₀.₉₇₅ with 9 d.f. = 2.262",
      inputs: { probability: 0.975, degreesOfFreedom: 9 },
      expected: 2.262,
      rtol: 0.0005 / 2.262,
      note: "printed to 3 decimals",
    },
    {
      source: "t table (FROM MEMORY)",
      locator: "t₀.₉₇₅ with 10 d.f. = 2.228",
      inputs: { probability: 0.975, degreesOfFreedom: 10 },
      expected: 2.228,
      rtol: 0.0005 / 2.228,
      note: "printed to 3 decimals",
    },
    {
      source: "t table (FROM MEMORY)",
      locator: "t₀.₉₇₅ with 30 d.f. = 2.042",
      inputs: { probability: 0.975, degreesOfFreedom: 30 },
      expected: 2.042,
      rtol: 0.0005 / 2.042,
      note: "printed to 3 decimals",
    },
    {
      source: "t table (FROM MEMORY)",
      locator: "t₀.₉₅ with 5 d.f. = 2.015",
      inputs: { probability: 0.95, degreesOfFreedom: 5 },
      expected: 2.015,
      rtol: 0.0005 / 2.015,
      note: "printed to 3 decimals",
    },
  ];
  it.each(tCases)("$source — $locator", ({ inputs, expected, rtol }) => {
    expect(Math.abs(studentTQuantile(inputs) - expected)).toBeLessThanOrEqual(rtol * expected);
  });

  it("inverts its own distribution function and is odd about p = ½", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), fc.double({ min: 0.5, max: 200, noNaN: true }), (p, nu) => {
        const t = studentTQuantile({ probability: p, degreesOfFreedom: nu });
        const back = studentTCdf({ t, degreesOfFreedom: nu });
        const mirror = studentTQuantile({ probability: 1 - p, degreesOfFreedom: nu });
        return Math.abs(back - p) <= 1e-10 && Math.abs(t + mirror) <= 1e-9 * Math.max(1, Math.abs(t));
      }),
      { numRuns: 80 },
    );
  });

  it("tends to the normal quantile as the degrees of freedom grow", () => {
    const z = normalQuantile({ probability: 0.975 });
    const t = studentTQuantile({ probability: 0.975, degreesOfFreedom: 1e6 });
    // first Cornish–Fisher term: t ≈ z + (z³ + z)/(4ν)
    expect(t - z).toBeCloseTo((z ** 3 + z) / 4e6, 8);
  });

  it("stays right at any number of degrees of freedom, up to the normal limit", () => {
    // The expansion about the normal distribution (abramowitz-stegun-1964 26.7.5, first order):
    // F(t) = Φ(t) − φ(t)·(t³ + t)/(4ν) + O(ν⁻²). Before, the beta form lost all precision for large ν
    // (F(2) at ν = 10¹⁵ came out as 0.9906, and the quantile at ν = 10²⁰ as 0).
    const phi2 = Math.exp(-2) / Math.sqrt(2 * Math.PI);
    for (const nu of [1e6, 1e8, 1e10, 1e15, 1e20, 1e300]) {
      expect(Math.abs(studentTCdf({ t: 2, degreesOfFreedom: nu }) - (normalCdf({ z: 2 }) - (phi2 * 10) / (4 * nu))), String(nu)).toBeLessThanOrEqual(1e-12);
      const z = normalQuantile({ probability: 0.975 });
      expect(Math.abs(studentTQuantile({ probability: 0.975, degreesOfFreedom: nu }) - z - (z ** 3 + z) / (4 * nu)), String(nu)).toBeLessThanOrEqual(1e-10);
    }
    // No step where the method changes: just below ν = 10⁶ the beta form agrees.
    expect(Math.abs(studentTCdf({ t: 2, degreesOfFreedom: 999_999 }) - studentTCdf({ t: 2, degreesOfFreedom: 1e6 }))).toBeLessThanOrEqual(1e-10);
    expect(studentTCdf({ t: -40, degreesOfFreedom: 1e12 })).toBeGreaterThanOrEqual(0);
    expect(studentTCdf({ t: 40, degreesOfFreedom: 1e12 })).toBeLessThanOrEqual(1);
    expect(studentTCdf({ t: 1e200, degreesOfFreedom: 1e12 })).toBe(1);
    expect(studentTCdf({ t: -Number.MAX_VALUE, degreesOfFreedom: 1e300 })).toBe(0);
    // Φ itself at the extremes (it gave NaN for z = −10³⁰⁰).
    expect(normalCdf({ z: -1e300 })).toBe(0);
    expect(normalCdf({ z: 1e300 })).toBe(1);
    expect(normalCdf({ z: -38 })).toBeGreaterThan(0);
  });

  it("gives z₀.₉₇₅ = 1.959964 (normal table, FROM MEMORY; 7 significant figures)", () => {
    expect(Math.abs(normalQuantile({ probability: 0.975 }) - 1.959964)).toBeLessThanOrEqual(5e-7);
    expect(normalCdf({ z: normalQuantile({ probability: 0.1 }) })).toBeCloseTo(0.1, 14);
  });

  it("agrees with simple-statistics' error function, within that function's stated 1.2e-7", () => {
    for (let z = -6; z <= 6; z += 0.25) {
      expect(Math.abs(normalCdf({ z }) - 0.5 * (1 + errorFunction(z / Math.SQRT2)))).toBeLessThanOrEqual(1.5e-7);
    }
  });

  it("computes ln Γ exactly enough at integers and half-integers (Γ(n) = (n − 1)!, Γ(½) = √π)", () => {
    expect(logGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 13);
    expect(logGamma(5)).toBeCloseTo(Math.log(24), 13);
    expect(logGamma(11)).toBeCloseTo(Math.log(3628800), 12);
    expect(logGamma(4.5)).toBeCloseTo(Math.log((105 / 16) * Math.sqrt(Math.PI)), 13);
    expect(logGamma(0.1)).toBeCloseTo(Math.log(9.513507698668732), 12);
  });

  it("rejects a probability of 1 by name", () => {
    expect(() => studentTQuantile({ probability: 1, degreesOfFreedom: 3 })).toThrow("probability must be greater than 0 and less than 1 (got 1)");
  });
});

describe("straight-line fit: second methods", () => {
  const random = normalSource(7);
  const xs = Array.from({ length: 25 }, (_, i) => 3 + i * 1.7);
  const ys = xs.map((x) => 0.8 * x - 4 + 0.9 * random());

  it("matches simple-statistics' least squares and R² (1e-12: both centre the sums)", () => {
    const ours = fitStraightLine({ x: xs, y: ys });
    const theirs = linearRegression(xs.map((x, i) => [x, ys[i]!]));
    expect(ours.leastSquares.slope).toBeCloseTo(theirs.m, 12);
    expect(ours.leastSquares.intercept).toBeCloseTo(theirs.b, 12);
    const r2 = rSquared(
      xs.map((x, i) => [x, ys[i]!]),
      (x: number) => theirs.m * x + theirs.b,
    );
    expect(ours.leastSquares.rSquared!).toBeCloseTo(r2, 12);
  });

  it("matches ml-regression-theil-sen when the counts of slopes and intercepts are odd (7 points, 21 pairs)", () => {
    const x = [1, 2.5, 3, 4.2, 6, 7.1, 9];
    const y = [2.1, 3.9, 4.4, 30, 8.2, 9.1, 12.3];
    const ours = fitStraightLine({ x, y }).theilSen;
    const theirs = new TheilSenRegression(x, y) as { slope: number; intercept: number };
    expect(ours.slope).toBeCloseTo(theirs.slope, 12);
    expect(ours.intercept).toBeCloseTo(theirs.intercept, 12);
  });

  it("averages the two middle slopes for an even count (that library takes the lower one instead)", () => {
    const x = [1, 2, 3, 5];
    const y = [1, 3, 4, 11];
    const slopes: number[] = [];
    for (let i = 0; i < 4; i++) for (let j = i + 1; j < 4; j++) slopes.push((y[j]! - y[i]!) / (x[j]! - x[i]!));
    slopes.sort((a, b) => a - b);
    expect(fitStraightLine({ x, y }).theilSen.slope).toBeCloseTo((slopes[2]! + slopes[3]!) / 2, 14);
  });

  it("covers the true slope and intercept about 95 % of the time with its t intervals (Monte Carlo, 400 fits of 6 points)", () => {
    const noise = normalSource(2024);
    let slopeHits = 0;
    let interceptHits = 0;
    const runs = 400;
    const x = [1, 2, 4, 5, 7, 10];
    for (let k = 0; k < runs; k++) {
      const y = x.map((xi) => 2 * xi + 5 + noise());
      const ls = fitStraightLine({ x, y }).leastSquares;
      if (ls.slopeInterval.low <= 2 && 2 <= ls.slopeInterval.high) slopeHits++;
      if (ls.interceptInterval.low <= 5 && 5 <= ls.interceptInterval.high) interceptHits++;
    }
    // binomial standard error √(0.95·0.05/400) = 0.011; allow ±0.04
    expect(Math.abs(slopeHits / runs - 0.95)).toBeLessThan(0.04);
    expect(Math.abs(interceptHits / runs - 0.95)).toBeLessThan(0.04);
  });

  it("covers the true slope roughly 95 % of the time with the Theil–Sen interval (Monte Carlo, 300 fits of 15 points)", () => {
    const noise = normalSource(99);
    let hits = 0;
    const runs = 300;
    const x = Array.from({ length: 15 }, (_, i) => i + 1);
    for (let k = 0; k < runs; k++) {
      const y = x.map((xi) => 0.5 * xi + noise());
      const ci = fitStraightLine({ x, y }).theilSen.slopeInterval!;
      if (ci.low <= 0.5 && 0.5 <= ci.high) hits++;
    }
    // the interval rests on a normal approximation and interpolated ranks: allow 0.90 to 0.99
    expect(hits / runs).toBeGreaterThan(0.9);
    expect(hits / runs).toBeLessThan(0.99);
  });

  it("takes the Theil–Sen interval's ranks from Gilbert's formula, and gives none for 4 points", () => {
    const x = Array.from({ length: 12 }, (_, i) => i);
    const y = x.map((v) => 3 * v + Math.sin(5 * v));
    const ts = fitStraightLine({ x, y }).theilSen;
    const n = 12;
    const nPairs = 66;
    const c = normalQuantile({ probability: 0.975 }) * Math.sqrt((n * (n - 1) * (2 * n + 5)) / 18);
    const slopes: number[] = [];
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) slopes.push((y[j]! - y[i]!) / (x[j]! - x[i]!));
    slopes.sort((a, b) => a - b);
    const at = (rank: number) => slopes[Math.floor(rank) - 1]! + (rank - Math.floor(rank)) * (slopes[Math.floor(rank)]! - slopes[Math.floor(rank) - 1]!);
    expect(ts.slopeInterval!.low).toBeCloseTo(at((nPairs - c) / 2), 12);
    expect(ts.slopeInterval!.high).toBeCloseTo(at((nPairs + c) / 2 + 1), 12);
    const small = fitStraightLine({ x: [1, 2, 3, 4], y: [1, 2, 3.1, 4] }).theilSen;
    expect(small.slopeInterval).toBeNull();
    expect(small.ranks.low).toBeLessThan(1); // too few points for a 95 % interval
    expect(ts.ranks.low).toBeCloseTo((nPairs - c) / 2, 12);
  });

  it("solves Huber's estimating equations Σψ(r/s) = 0 and Σψ(r/s)·x = 0", () => {
    const y = [...ys];
    y[4] = y[4]! + 25;
    const h = fitStraightLine({ x: xs, y }).huber;
    expect(h.converged).toBe(true);
    const psi = h.residuals.map((r) => Math.max(-h.tuning, Math.min(h.tuning, r / h.scale)));
    expect(Math.abs(psi.reduce((a, b) => a + b, 0))).toBeLessThan(1e-8);
    expect(Math.abs(psi.reduce((a, p, i) => a + p * xs[i]!, 0))).toBeLessThan(1e-8 * Math.max(...xs));
    expect(h.weights[4]!).toBeLessThan(0.2);
  });

  it("becomes least squares when the Huber tuning is very wide", () => {
    const f = fitStraightLine({ x: xs, y: ys, huberTuning: 1e6 });
    expect(f.huber.slope).toBeCloseTo(f.leastSquares.slope, 12);
    expect(f.huber.intercept).toBeCloseTo(f.leastSquares.intercept, 11);
  });
});

describe("spike flags", () => {
  it("scales by the mean absolute deviation when more than half the residuals are exactly zero", () => {
    const x = [1, 2, 3, 4, 5, 6];
    const y = [3, 5, 7, 9, 11, 23];
    const f = fitStraightLine({ x, y });
    expect(f.spikes.scaleFrom).toBe("mean-absolute-deviation");
    expect(f.spikes.scale).toBeCloseTo(Math.sqrt(Math.PI / 2) * (10 / 6), 12);
    expect(f.spikes.flagged).toEqual([5]);
  });

  it("gives each point's distance from the median in robust standard deviations, |M_i| (Iglewicz & Hoaglin 1993), and flags those beyond k", () => {
    // Same data: residuals 0,0,0,0,0,10 about the median 0, σ̂ = √(π/2)·10/6, so the last point lies 10/σ̂ = 6/√(π/2) = 4.787 away.
    const f = fitStraightLine({ x: [1, 2, 3, 4, 5, 6], y: [3, 5, 7, 9, 11, 23] });
    expect(f.spikes.robustDistance[5]).toBeCloseTo(6 / Math.sqrt(Math.PI / 2), 12);
    expect(f.spikes.robustDistance).toEqual(f.spikes.modifiedZ.map(Math.abs));
    expect(f.spikes.flagged).toEqual(f.spikes.robustDistance.flatMap((d, i) => (d > f.spikes.threshold ? [i] : [])));
  });

  it("never flags round-off in exact data (resolution floor)", () => {
    const rows = [300, 700, 1100, 1500, 1900, 2300, 2700].map((rpm) => {
      const w = rpmToRadPerSecond(rpm);
      return { angularSpeed: w, acceleration: 0.0127 * w * w + 0.3 * STANDARD_GRAVITY };
    });
    const f = fitCalibration(rows);
    expect(f.spikes.flagged).toEqual([]);
    expect(f.method).toBe("least-squares");
  });

  it("cannot flag anything among 3 readings, where a spike is indistinguishable", () => {
    const f = fitStraightLine({ x: [1, 2, 3], y: [1, 2, 30] });
    expect(f.spikes.flagged).toEqual([]);
  });

  it("honours a chosen threshold", () => {
    const x = [1, 2, 3, 4, 5, 6, 7, 8, 9];
    const y = [1.1, 1.9, 3.05, 3.98, 5.02, 6.1, 6.95, 8.04, 9.6];
    const strict = fitStraightLine({ x, y, spikeThreshold: 1 });
    const loose = fitStraightLine({ x, y, spikeThreshold: 100 });
    expect(strict.spikes.flagged.length).toBeGreaterThan(0);
    expect(loose.spikes.flagged).toEqual([]);
  });
});

describe("calibration fit", () => {
  const truth = { radius: 0.0127, bias: 0.3 * STANDARD_GRAVITY };
  const speeds = [300, 600, 900, 1200, 1500, 1800, 2100, 2400, 2700, 3000].map(rpmToRadPerSecond);

  it("gives back the radius and offset the readings were made from", () => {
    const rows = speeds.map((w) => ({ angularSpeed: w, acceleration: truth.radius * w * w + truth.bias }));
    const f = fitCalibration(rows);
    expect(f.radius).toBeCloseTo(truth.radius, 13);
    expect(f.bias).toBeCloseTo(truth.bias, 9);
    expect(f.leastSquares.rSquared).toBeCloseTo(1, 12);
    expect(f.speedSquared[0]).toBeCloseTo(speeds[0]! ** 2, 9);
  });

  it("flags a planted 15 g spike among noisy readings and refits without it", () => {
    const noise = normalSource(31);
    const rows = speeds.map((w) => ({ angularSpeed: w, acceleration: truth.radius * w * w + truth.bias + 0.2 * STANDARD_GRAVITY * noise() }));
    rows[6]!.acceleration += 15 * STANDARD_GRAVITY;
    const f = fitCalibration(rows);
    expect(f.spikes.flagged).toEqual([6]);
    expect(f.method).toBe("least-squares-without-spikes");
    expect(Math.abs(f.radius / truth.radius - 1)).toBeLessThan(0.005);
    expect(Math.abs(f.leastSquares.slope / truth.radius - 1)).toBeGreaterThan(Math.abs(f.radius / truth.radius - 1));
  });

  it("gives the radius's relative standard error, SE(r̂)/r̂, from the least-squares line it chose", () => {
    // Standard error of a least-squares slope, s/√Sxx (draper-smith-1998, ch. 1), over the slope.
    const noise = normalSource(31);
    const rows = speeds.map((w) => ({ angularSpeed: w, acceleration: truth.radius * w * w + truth.bias + 0.2 * STANDARD_GRAVITY * noise() }));
    rows[6]!.acceleration += 15 * STANDARD_GRAVITY;
    const f = fitCalibration(rows);
    const clean = f.leastSquaresWithoutSpikes!;
    const x = f.speedSquared.filter((_, i) => i !== 6);
    const residuals = clean.residuals;
    const mean = x.reduce((a, b) => a + b, 0) / x.length;
    const sxx = x.reduce((a, v) => a + (v - mean) ** 2, 0);
    const s = Math.sqrt(residuals.reduce((a, r) => a + r * r, 0) / (x.length - 2));
    expect(f.radiusRelativeStdError!).toBeCloseTo(s / Math.sqrt(sxx) / f.radius, 9);
    expect(f.radiusRelativeStdError).toBe(clean.slopeStdError / f.radius);
  });

  it("has no relative standard error when the radius comes from Theil–Sen", () => {
    const rows = [1, 1, 1, 1, 2, 2, 2, 2, 3, 4].map((w, i) => ({ angularSpeed: w, acceleration: 2 * w * w + (i >= 8 ? 50 : 0) }));
    expect(fitCalibration(rows).radiusRelativeStdError).toBeNull();
  });

  it("falls back to Theil–Sen when fewer than 3 different speeds remain after removing spikes", () => {
    // four readings each at two speeds on the line a = 2ω², then one spiked reading at each of two more speeds
    const speedsUsed = [1, 1, 1, 1, 2, 2, 2, 2, 3, 4];
    const rows = speedsUsed.map((w, i) => ({ angularSpeed: w, acceleration: 2 * w * w + (i >= 8 ? 50 : 0) }));
    const f = fitCalibration(rows);
    expect(f.spikes.flagged).toEqual([8, 9]);
    expect(f.leastSquaresWithoutSpikes).toBeNull();
    expect(f.method).toBe("theil-sen");
    expect(f.radius).toBe(2);
    expect(f.bias).toBe(0);
  });

  it("needs at least 3 readings at different speeds, and says so", () => {
    const rows = [
      { angularSpeed: 100, acceleration: 120 },
      { angularSpeed: 100, acceleration: 121 },
      { angularSpeed: 200, acceleration: 480 },
    ];
    const call = () => fitCalibration(rows);
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow("rows must be at least 3 readings at different speeds (got 2)");
  });

  it("names the reading that is not a number", () => {
    const rows = [
      { angularSpeed: 100, acceleration: 120 },
      { angularSpeed: 150, acceleration: Number.NaN },
      { angularSpeed: 200, acceleration: 480 },
    ];
    expect(() => fitCalibration(rows)).toThrow("rows[1].acceleration must be a finite number (got not a number)");
    expect(() => fitCalibration([{ angularSpeed: -1, acceleration: 0 }])).toThrow("rows[0].angularSpeed must be 0 rad/s or more (got -1 rad/s)");
  });

  it("names the reading whose speed squared leaves the doubles (ω² = 1e400 rad²/s² for 1e200 rad/s), not the whole list", () => {
    const rows = [
      { angularSpeed: 100, acceleration: 120 },
      { angularSpeed: 1e200, acceleration: 1 },
      { angularSpeed: 200, acceleration: 480 },
    ];
    expectRefusal(
      () => fitCalibration(rows),
      "rows[1].angularSpeed",
      1e200,
      "rad/s",
      "rows[1].angularSpeed must be a speed whose square is a finite number (below about 1.3e154 rad/s) (got 1e+200 rad/s)",
    );
    // √(MAX_VALUE) = 1.34e154 rad/s: just below it the square is finite and the fit goes on to its other checks.
    expect(() => fitCalibration([...rows.slice(0, 1), { angularSpeed: 1.3e154, acceleration: 1 }, ...rows.slice(2)])).not.toThrow(/angularSpeed/);
  });

  it("never returns a non-finite number for valid readings; degenerate ones are refused by name (fast-check)", () => {
    const row = fc.record({ angularSpeed: fc.double({ min: 0, max: 2000, noNaN: true }), acceleration: fc.double({ min: -1e4, max: 1e5, noNaN: true }) });
    fc.assert(
      fc.property(fc.array(row, { minLength: 3, maxLength: 25 }), (rows) => {
        fc.pre(new Set(rows.map((r) => r.angularSpeed * r.angularSpeed)).size >= 3);
        let f: ReturnType<typeof fitCalibration>;
        try {
          f = fitCalibration(rows);
        } catch (e) {
          // too few different speeds, or speeds so small that ω² underflows: refused by name
          return e instanceof CalcInputError && e.param === "rows";
        }
        const numbers = [
          f.radius,
          f.bias,
          f.leastSquares.slopeStdError,
          f.leastSquares.tQuantile,
          f.theilSen.slope,
          f.huber.slope,
          f.spikes.scale,
          ...f.spikes.modifiedZ,
        ];
        return numbers.every(Number.isFinite);
      }),
      { numRuns: 100 },
    );
  });

  it("draws the fitted curve over a speed range", () => {
    const rows = speeds.map((w) => ({ angularSpeed: w, acceleration: truth.radius * w * w }));
    const curve = calibrationCurve({ fit: fitCalibration(rows), lowSpeed: 0, highSpeed: rpmToRadPerSecond(2000), points: 3 });
    expect(curve).toHaveLength(3);
    expect(curve[2]!.recommended).toBeCloseTo(0.0127 * rpmToRadPerSecond(2000) ** 2, 8);
  });
});

describe("the calibration calculator's inputs and demo readings", () => {
  it("declares defaults that pass their own checks, with labels, help and short unique URL keys", () => {
    const specs = Object.values(calibrationFitInputs);
    expect(new Set(specs.map((s) => s.urlKey)).size).toBe(specs.length);
    for (const spec of specs) {
      expect(checkValue(spec, spec.default, "metric")).toBeNull();
      expect(spec.help!.length).toBeGreaterThan(10);
    }
  });

  it("converts the invented demo readings to SI", () => {
    const rows = demoCalibrationRows();
    expect(rows).toHaveLength(DEMO_CALIBRATION_READINGS.length);
    // 600 rpm = 62.832 rad/s; 5.37 g = 52.662 m/s² (hand: 600·π/30, 5.37 × 9.80665)
    expect(rows[0]!.angularSpeed).toBeCloseTo(62.83185307, 7);
    expect(rows[0]!.acceleration).toBeCloseTo(52.6617105, 6);
  });

  it("flags the planted knock at 2000 rpm and, without it, recovers the 12.7 mm and 0.2 g the readings were made from", () => {
    const f = fitCalibration(demoCalibrationRows());
    expect(f.spikes.flagged).toEqual([7]);
    expect(DEMO_CALIBRATION_READINGS[7]![0]).toBe(2000);
    expect(f.method).toBe("least-squares-without-spikes");
    // the flagged residual lies outside the bounds, every other one inside
    const r = f.theilSen.residuals;
    for (const [i, ri] of r.entries()) expect(ri < f.spikes.bounds.low || ri > f.spikes.bounds.high, `reading ${i}`).toBe(i === 7);
    expect(f.spikes.bounds.high - f.spikes.center).toBeCloseTo(3.5 * f.spikes.scale, 12);
    // within two standard errors of the truth (the hand-written scatter is up to ±0.24 g)
    expect(Math.abs(f.radius - 0.0127)).toBeLessThan(2 * f.leastSquaresWithoutSpikes!.slopeStdError);
    expect(Math.abs(f.bias - 0.2 * STANDARD_GRAVITY)).toBeLessThan(2 * f.leastSquaresWithoutSpikes!.interceptStdError);
    // the spike drags the plain least-squares slope away
    expect(Math.abs(f.leastSquares.slope - 0.0127)).toBeGreaterThan(Math.abs(f.radius - 0.0127));
  });
});

describe("rows as text for a URL", () => {
  it("writes rpm:g pairs behind a version tag", () => {
    const rows: CalibrationRow[] = [
      { angularSpeed: rpmToRadPerSecond(1200), acceleration: 31.5 * STANDARD_GRAVITY },
      { angularSpeed: rpmToRadPerSecond(1800), acceleration: 70.9 * STANDARD_GRAVITY },
    ];
    expect(encodeCalibrationRows(rows)).toBe("v1:1200:31.5,1800:70.9");
  });

  it("reads back what it writes to six significant figures (fast-check)", () => {
    const row = fc.record({ angularSpeed: fc.double({ min: 0, max: 5000, noNaN: true }), acceleration: fc.double({ min: -1e4, max: 1e5, noNaN: true }) });
    fc.assert(
      fc.property(fc.array(row, { maxLength: 40 }), (rows) => {
        const back = decodeCalibrationRows(encodeCalibrationRows(rows));
        if (back.problems.length > 0 || back.rows.length !== rows.length) return false;
        return back.rows.every((r, i) => {
          const close = (a: number, b: number) => Math.abs(a - b) <= 5e-6 * Math.abs(b) + 1e-300;
          return close(r.angularSpeed, rows[i]!.angularSpeed) && close(r.acceleration, rows[i]!.acceleration);
        });
      }),
    );
  });

  it("reports each bad piece by position and reads the rest", () => {
    const d = decodeCalibrationRows("v1:1200:31.5,abc,1500:x,-3:2,,1800:70.9");
    expect(d.rows).toHaveLength(2);
    expect(d.problems.map((p) => [p.piece, p.reason])).toEqual([
      [2, "expected speed:acceleration (rpm:g)"],
      [3, 'acceleration "x" is not a number'],
      [4, "speed must be 0 or more"],
      [5, "empty piece"],
    ]);
  });

  it("refuses an unknown version and reads untagged text as v1, saying so", () => {
    expect(decodeCalibrationRows("v9:1:2")).toMatchObject({
      version: null,
      rows: [],
      problems: [{ piece: 0, reason: "unknown version 9; this reader knows v1" }],
    });
    const untagged = decodeCalibrationRows("1200:31.5");
    expect(untagged.rows).toHaveLength(1);
    expect(untagged.problems[0]!.reason).toBe("no version tag; read as v1");
    expect(decodeCalibrationRows("")).toEqual({ version: 1, rows: [], problems: [] });
  });

  it("never throws on any text (fast-check)", () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: "binary" }), fc.stringMatching(/^(v\d:)?([-\d.e:,x ]{0,30})$/)), (text) => {
        const d = decodeCalibrationRows(text);
        return Array.isArray(d.rows) && d.rows.every((r) => Number.isFinite(r.angularSpeed) && Number.isFinite(r.acceleration));
      }),
      { numRuns: 300 },
    );
  });
});

describe("source keys", () => {
  it("names only keys that exist in the bibliography, in every doc comment of calc/heading/calibration.ts and calibration-inputs.ts", () => {
    const text = ["calibration.ts", "calibration-inputs.ts"]
      .map((file) => readFileSync(new URL(`../../calc/heading/${file}`, import.meta.url), "utf8"))
      .join("\n");
    const keys = [...text.matchAll(/Sources: ([^\n]+(?:\n \* [a-z0-9-]+(?:, [a-z0-9-]+)*\.?)?)/g)].flatMap((m) =>
      m[1]!
        .replace(/\n \* /g, " ")
        .replace(/\.$/, "")
        .split(/,\s*/),
    );
    expect(keys.length).toBeGreaterThan(8);
    for (const key of keys) expect(isSourceKey(key.trim().replace(/\s*\(.*\)$/, "")), key).toBe(true);
  });
});

describe("regression pins (our own digits, not outside references)", () => {
  it("pins the demo calibration: 12.7031 mm and 0.2049 g without the spike", () => {
    const f = fitCalibration(demoCalibrationRows());
    expect(f.radius * 1000).toBeCloseTo(12.703056937531846, 10);
    expect(f.bias / STANDARD_GRAVITY).toBeCloseTo(0.20488665365560768, 10);
    expect(f.leastSquares.slope * 1000).toBeCloseTo(12.752713482618729, 10);
  });

  it("pins Anscombe I to full precision", () => {
    const f = fitStraightLine({ x: ANSCOMBE_X, y: ANSCOMBE_Y1 });
    expect(f.leastSquares.slope).toBeCloseTo(0.5000909090909091, 13);
    expect(f.leastSquares.intercept).toBeCloseTo(3.0000909090909103, 12);
    expect(f.leastSquares.slopeStdError).toBeCloseTo(0.11790550059563408, 12);
    expect(f.leastSquares.tQuantile).toBeCloseTo(2.2621571627982036, 10);
    expect(f.theilSen.slope).toBeCloseTo(0.5016666666666668, 13);
  });
});
