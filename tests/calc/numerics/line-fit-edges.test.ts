import { describe, expect, it } from "vitest";
import { linearRegression, rSquared, sampleCorrelation } from "simple-statistics";
import { countDistinct, fitChecked, fitStraightLine, median, requireFitOptions } from "../../../calc/numerics/line-fit.ts";
import { normalQuantile } from "../../../calc/numerics/special.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

describe("median", () => {
  it("sorts by value, not as text: the median of 10, 9, 2 is 9 (as text 10 < 2 < 9 would give 2)", () => {
    expect(median([10, 9, 2])).toBe(9);
  });

  it("takes the mean of the two middle values of an even list: 4, 1, 3, 2 → (2 + 3)/2 = 2.5", () => {
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([7])).toBe(7);
  });

  it("halves each middle value before adding, so two of the largest doubles give that double back, not infinity", () => {
    expect(median([Number.MAX_VALUE, Number.MAX_VALUE])).toBe(Number.MAX_VALUE);
    expect(median([-Number.MAX_VALUE, -Number.MAX_VALUE, 1, 5])).toBe(-Number.MAX_VALUE / 2 + 0.5);
  });

  it("leaves the caller's list in its order", () => {
    const values = [3, 1, 2];
    median(values);
    expect(values).toEqual([3, 1, 2]);
  });

  it("refuses an empty list, a non-list and a value that is not a number, by name", () => {
    expectRefusal(() => median([]), "values", [], "", "values must be a list of at least one number (got a list of 0)");
    expectRefusal(() => median("3" as never), "values", "3", "", 'values must be a list of at least one number (got "3")');
    expectRefusal(() => median([1, Number.NaN, 2]), "values[1]", Number.NaN, "", "values[1] must be a finite number (got not a number)");
    expectRefusal(
      () => median([1, 2, Number.POSITIVE_INFINITY]),
      "values[2]",
      Number.POSITIVE_INFINITY,
      "",
      "values[2] must be a finite number (got infinity)",
    );
  });
});

describe("countDistinct", () => {
  it("counts values, in any order", () => {
    expect(countDistinct([3, 1, 2, 1, 3])).toBe(3);
    expect(countDistinct([5])).toBe(1);
    expect(countDistinct([])).toBe(0);
  });

  it("counts values closer than 1e-12 of the largest |value| as one, the bound itself included", () => {
    // Largest |value| 1, so values within 1e-12 of each other are one value: 0 and 1e-12 are 1e-12 apart exactly.
    expect(countDistinct([-1, 0, 1e-12])).toBe(2);
    expect(countDistinct([-1, 0, 2e-12])).toBe(3);
  });

  it("takes the largest magnitude from a negative value too: with −1000 present, 0 and 1e-9 are one value", () => {
    // tolerance 1e-12·|−1000| = 1e-9
    expect(countDistinct([-1000, 0, 1e-9])).toBe(2);
    expect(countDistinct([-1000, 0, 3e-9])).toBe(3);
  });

  it("counts an infinite value as a value of its own (before, it made the tolerance infinite and 1, 2, ∞ counted as one)", () => {
    expect(countDistinct([1, Number.POSITIVE_INFINITY, 2])).toBe(3);
    expect(countDistinct([Number.NEGATIVE_INFINITY, 0, 1e-13, 1])).toBe(3); // 0 and 1e-13 within 1e-12 of |1|
    expect(countDistinct([Number.NEGATIVE_INFINITY])).toBe(1);
  });

  it("refuses something that is not a list", () => {
    expectRefusal(() => countDistinct(5 as never), "values", 5, "", "values must be a list (got 5)");
  });
});

describe("least squares, worked by hand", () => {
  // x = 0, 1, 2, 3; y = 1, 3, 2, 5. x̄ = 1.5, ȳ = 2.75; Sxx = 2.25 + 0.25 + 0.25 + 2.25 = 5;
  // Sxy = (−1.5)(−1.75) + (−0.5)(0.25) + (0.5)(−0.75) + (1.5)(2.25) = 2.625 − 0.125 − 0.375 + 3.375 = 5.5;
  // slope 5.5/5 = 1.1, intercept 2.75 − 1.1·1.5 = 1.1; residuals −0.1, 0.8, −1.3, 0.6;
  // SSE = 0.01 + 0.64 + 1.69 + 0.36 = 2.7; SST = 3.0625 + 0.0625 + 0.5625 + 5.0625 = 8.75;
  // s² = 2.7/2 = 1.35; se(b₁) = √(1.35/5) = √0.27; se(b₀) = √(1.35·(1/4 + 2.25/5)) = √0.945;
  // t₀.₉₇₅,₂ = 0.95/√(2·0.975·0.025) = 4.302653 (ν = 2 closed form; t tables print 4.303).
  const x = [0, 1, 2, 3];
  const y = [1, 3, 2, 5];
  const ls = fitStraightLine({ x, y }).leastSquares;
  const t = 0.95 / Math.sqrt(2 * 0.975 * 0.025);

  it("gives slope, intercept, residuals and R² = 1 − 2.7/8.75", () => {
    expect(ls.slope).toBeCloseTo(1.1, 14);
    expect(ls.intercept).toBeCloseTo(1.1, 14);
    for (const [i, r] of ls.residuals.entries()) expect(r).toBeCloseTo([-0.1, 0.8, -1.3, 0.6][i]!, 14);
    expect(ls.rSquared).toBeCloseTo(1 - 2.7 / 8.75, 14);
  });

  it("agrees with simple-statistics on the line, R² and the correlation", () => {
    const pairs = x.map((v, i) => [v, y[i]!]);
    const line = linearRegression(pairs);
    expect(ls.slope).toBeCloseTo(line.m, 14);
    expect(ls.intercept).toBeCloseTo(line.b, 14);
    expect(ls.rSquared!).toBeCloseTo(
      rSquared(pairs, (v: number) => line.m * v + line.b),
      14,
    );
    expect(Math.sqrt(ls.rSquared!)).toBeCloseTo(sampleCorrelation(x, y), 14);
  });

  it("gives s = √1.35, the standard errors √0.27 and √0.945, 2 degrees of freedom and t = 4.302653", () => {
    expect(ls.degreesOfFreedom).toBe(2);
    expect(ls.residualStdDev).toBeCloseTo(Math.sqrt(1.35), 14);
    expect(ls.slopeStdError).toBeCloseTo(Math.sqrt(0.27), 14);
    expect(ls.interceptStdError).toBeCloseTo(Math.sqrt(0.945), 14);
    expect(ls.tQuantile).toBeCloseTo(t, 10);
    expect(ls.tQuantile).toBeCloseTo(4.303, 3);
  });

  it("puts the intervals at b ± t·se on both sides", () => {
    expect(ls.slopeInterval.low).toBeCloseTo(1.1 - t * Math.sqrt(0.27), 9);
    expect(ls.slopeInterval.high).toBeCloseTo(1.1 + t * Math.sqrt(0.27), 9);
    expect(ls.interceptInterval.low).toBeCloseTo(1.1 - t * Math.sqrt(0.945), 9);
    expect(ls.interceptInterval.high).toBeCloseTo(1.1 + t * Math.sqrt(0.945), 9);
  });

  it("takes the two-sided quantile of the chosen confidence: 90 % uses t₀.₉₅,₂ = 0.9/√(2·0.95·0.05) = 2.919986", () => {
    const ls90 = fitStraightLine({ x, y, confidence: 0.9 }).leastSquares;
    expect(ls90.tQuantile).toBeCloseTo(0.9 / Math.sqrt(2 * 0.95 * 0.05), 10);
    expect(ls90.tQuantile).toBeCloseTo(2.92, 2); // t table (from memory): 2.920
  });

  it("has no R² when every y is the same (SST = 0), and a flat line with zero-width intervals", () => {
    const flat = fitStraightLine({ x: [1, 2, 3, 4], y: [2, 2, 2, 2] }).leastSquares;
    expect(flat.rSquared).toBeNull();
    expect(flat.slope).toBe(0);
    expect(flat.intercept).toBe(2);
    expect(flat.slopeInterval).toEqual({ low: 0, high: 0 });
  });

  it("gives R² = 1 and zero standard errors for points exactly on a line", () => {
    const exact = fitStraightLine({ x: [1, 2, 3, 4, 5], y: [3, 5, 7, 9, 11] }).leastSquares;
    expect(exact.rSquared).toBe(1);
    expect(exact.residualStdDev).toBe(0);
    expect(exact.slopeStdError).toBe(0);
    expect(exact.interceptStdError).toBe(0);
  });
});

describe("Theil–Sen, worked by hand", () => {
  // Same points. Pairwise slopes: (3−1)/1 = 2, (2−1)/2 = 0.5, (5−1)/3 = 4/3, (2−3)/1 = −1, (5−3)/2 = 1,
  // (5−2)/1 = 3; ordered −1, 0.5, 1, 4/3, 2, 3; median (1 + 4/3)/2 = 7/6.
  // y − 7/6·x = 1, 11/6, −1/3, 1.5; ordered −1/3, 1, 1.5, 11/6; median (1 + 1.5)/2 = 1.25.
  const x = [0, 1, 2, 3];
  const y = [1, 3, 2, 5];
  const z975 = normalQuantile({ probability: 0.975 });

  it("gives slope 7/6, intercept 1.25 and the residuals about that line", () => {
    const ts = fitStraightLine({ x, y }).theilSen;
    expect(ts.slope).toBeCloseTo(7 / 6, 14);
    expect(ts.intercept).toBeCloseTo(1.25, 14);
    for (const [i, r] of ts.residuals.entries()) expect(r).toBeCloseTo([-0.25, 7 / 12, -19 / 12, 0.25][i]!, 14);
    expect(ts.pairCount).toBe(6);
  });

  it("gives no 95 % interval for 4 points, but reports the ranks: Var S = 4·3·13/18, C = z·√Var S", () => {
    // C = 1.959964·√(156/18) = 5.76998; ranks (6 − C)/2 = 0.11501 and (6 + C)/2 + 1 = 6.88499.
    const ts = fitStraightLine({ x, y }).theilSen;
    const c = z975 * Math.sqrt(156 / 18);
    expect(ts.slopeInterval).toBeNull();
    expect(ts.ranks.low).toBeCloseTo((6 - c) / 2, 12);
    expect(ts.ranks.high).toBeCloseTo((6 + c) / 2 + 1, 12);
    expect(ts.ranks.low).toBeCloseTo(0.11501, 5);
  });

  it("gives a 50 % interval for the same points, interpolated between the ordered slopes", () => {
    // z₀.₇₅ = 0.674490 (normal table); C = 0.674490·√(156/18) = 0.674490·2.943920 = 1.985644; ranks
    // (6 − 1.985644)/2 = 2.007178 and (6 + 1.985644)/2 + 1 = 4.992822:
    // low = 0.5 + 0.007178·(1 − 0.5), high = 4/3 + 0.992822·(2 − 4/3).
    const ts = fitStraightLine({ x, y, confidence: 0.5 }).theilSen;
    const c = normalQuantile({ probability: 0.75 }) * Math.sqrt(156 / 18);
    const lowRank = (6 - c) / 2;
    const highRank = (6 + c) / 2 + 1;
    expect(lowRank).toBeCloseTo(2.007178, 5);
    expect(ts.ranks).toEqual({ low: lowRank, high: highRank });
    expect(ts.slopeInterval!.low).toBeCloseTo(0.5 + (lowRank - 2) * 0.5, 12);
    expect(ts.slopeInterval!.high).toBeCloseTo(4 / 3 + (highRank - 4) * (2 - 4 / 3), 12);
  });

  it("reads the 95 % interval off the 66 ordered pairwise slopes of 12 points on y = x²", () => {
    const n = 12;
    const xs = Array.from({ length: n }, (_, i) => i);
    const ys = xs.map((v) => v * v);
    const varS = (n * (n - 1) * (2 * n + 5)) / 18;
    const ts = fitStraightLine({ x: xs, y: ys }).theilSen;
    // y = x²: the slope of pair (i, j) is i + j; 66 of them.
    const slopes: number[] = [];
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) slopes.push(i + j);
    slopes.sort((a, b) => a - b);
    const c = z975 * Math.sqrt(varS);
    const lo = (66 - c) / 2;
    const hi = (66 + c) / 2 + 1;
    const at = (r: number) => slopes[Math.floor(r) - 1]! + (r - Math.floor(r)) * (slopes[Math.floor(r)]! - slopes[Math.floor(r) - 1]!);
    expect(ts.slopeInterval!.low).toBeCloseTo(at(lo), 12);
    expect(ts.slopeInterval!.high).toBeCloseTo(at(hi), 12);
    expect(ts.slope).toBe(11); // the 33rd and 34th of the ordered sums i + j are both 11
  });

  it("leaves out pairs with the same x and corrects Var S for the ties (gilbert-1987 ch. 16)", () => {
    // x = 1, 1, 2, …, 11 (12 points, one tie of 2): 66 − 1 = 65 pairs;
    // Var S = (12·11·29 − 2·1·9)/18 = (3828 − 18)/18 = 211.667.
    const xs = [1, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11];
    const ys = xs.map((v, i) => 2 * v + [0.3, -0.2, 0.1, -0.4, 0.25, 0, 0.15, -0.1, 0.35, -0.3, 0.05, 0.2][i]!);
    const ts = fitStraightLine({ x: xs, y: ys }).theilSen;
    expect(ts.pairCount).toBe(65);
    const c = z975 * Math.sqrt(3810 / 18);
    expect(ts.ranks.low).toBeCloseTo((65 - c) / 2, 12);
    expect(ts.ranks.high).toBeCloseTo((65 + c) / 2 + 1, 12);
    // Without the tie correction the ranks would come from Var S = 3828/18.
    expect(ts.ranks.low).not.toBeCloseTo((65 - z975 * Math.sqrt(3828 / 18)) / 2, 3);
  });

  it("gives the interval from the smallest to the largest slope when the low rank is exactly 1", () => {
    // x = 1, 1, 2, 2, 3; y = 1, 2, 2, 4, 5. Slopes of the 8 pairs with different x, ordered: 0, 1, 1, 1.5, 2, 2, 3, 3.
    // Two ties of 2: Var S = (5·4·15 − 2·(2·1·9))/18 = 264/18. Rank 1 needs C = 8 − 2 = 6, z = 6/√(264/18) = 1.566699,
    // confidence 2Φ(z) − 1 = 0.882815; this double is the one (found by bisection) at which the computed rank is 1 exactly.
    const ts = fitStraightLine({ x: [1, 1, 2, 2, 3], y: [1, 2, 2, 4, 5], confidence: 0.8828149128018618 }).theilSen;
    expect(ts.pairCount).toBe(8);
    expect(ts.slope).toBe(1.75);
    expect(ts.ranks).toEqual({ low: 1, high: 8 });
    expect(ts.slopeInterval).toEqual({ low: 0, high: 3 });
  });

  it("leaves out a pair exactly 1e-12 of the largest |x| apart (the bound counts as the same x)", () => {
    // x = −1, 0, 1e-12, 1: largest |x| 1, and 0 and 1e-12 are exactly 1e-12 apart: 6 − 1 = 5 pairs.
    const f = fitStraightLine({ x: [-1, 0, 1e-12, 1], y: [0, 1, 2, 3] });
    expect(f.theilSen.pairCount).toBe(5);
    expect(f.distinctX).toBe(3);
  });

  it("counts x values within 1e-12 of the largest |x| as the same x: their pair gives no slope", () => {
    const xs = [0, 1e-13, 1, 2, 3];
    const ts = fitStraightLine({ x: xs, y: [0, 5, 1, 2, 3] }).theilSen;
    expect(ts.pairCount).toBe(9);
    expect(fitStraightLine({ x: xs, y: [0, 5, 1, 2, 3] }).distinctX).toBe(4);
  });
});

describe("spike flags and the robust scale", () => {
  it("floors the scale at 1e-9 of the largest |y| for points exactly on a line, and says so", () => {
    // y = 2x + 1 at x = 1…5: largest |y| 11, so σ̂ = 1.1e-8.
    const s = fitStraightLine({ x: [1, 2, 3, 4, 5], y: [3, 5, 7, 9, 11] }).spikes;
    expect(s.scaleFrom).toBe("resolution-floor");
    expect(s.scale).toBeCloseTo(1.1e-8, 22);
    expect(s.center).toBe(0);
    expect(s.bounds.high).toBeCloseTo(3.5 * 1.1e-8, 22);
    expect(s.flagged).toEqual([]);
  });

  it("calls the scale the resolution floor when 1.4826·MAD equals the floor exactly", () => {
    // Six points near y = 0 and a seventh far above: the far point sets the largest |y| (the floor is 1e-9 of it)
    // but, lying above every other, moves neither the median slope nor the median intercept, so the MAD stays.
    const x = [1, 2, 3, 4, 5, 6, 7];
    const near = [0.1, -0.2, 0.05, 0.3, -0.1, 0.2];
    const madScale = fitStraightLine({ x, y: [...near, 1e6] }).spikes.scale;
    // The far reading whose floor 1e-9·y₇ is that scale to the last bit.
    let far = madScale / 1e-9;
    for (let k = 1; 1e-9 * far !== madScale && k < 100; k++) far = (madScale / 1e-9) * (1 + (k % 2 ? k : -k) * 2 ** -53);
    expect(1e-9 * far).toBe(madScale);
    const atFloor = fitStraightLine({ x, y: [...near, far] }).spikes;
    expect(atFloor.scale).toBe(madScale);
    expect(atFloor.scaleFrom).toBe("resolution-floor");
    expect(fitStraightLine({ x, y: [...near, far / 2] }).spikes.scaleFrom).toBe("mad");
  });

  it("takes the largest |y| from negative readings as well", () => {
    const s = fitStraightLine({ x: [1, 2, 3, 4, 5], y: [-3, -5, -7, -9, -11] }).spikes;
    expect(s.scale).toBeCloseTo(1.1e-8, 22);
  });

  it("floors the scale at 1e-300 when every y is 0", () => {
    const f = fitStraightLine({ x: [1, 2, 3], y: [0, 0, 0] });
    expect(f.spikes.scale).toBe(1e-300);
    expect(f.spikes.scaleFrom).toBe("resolution-floor");
    expect(f.spikes.robustDistance).toEqual([0, 0, 0]);
  });

  it("scales by √(π/2)·mean |r − median| when the MAD is 0, and refits without the flagged point", () => {
    // x = 1…4, y = 1, 2, 30, 4. Pairwise slopes 1, 14.5, 1, 28, 1, −26 ⇒ median 1; y − x = 0, 0, 27, 0 ⇒ intercept 0;
    // residuals 0, 0, 27, 0: MAD 0, mean |r| = 6.75, σ̂ = 1.253314·6.75 = 8.459870; M₃ = 27/8.459870 = 3.191538.
    const f = fitStraightLine({ x: [1, 2, 3, 4], y: [1, 2, 30, 4], spikeThreshold: 3 });
    expect(f.spikes.scaleFrom).toBe("mean-absolute-deviation");
    expect(f.spikes.scale).toBeCloseTo(Math.sqrt(Math.PI / 2) * 6.75, 12);
    expect(f.spikes.robustDistance[2]).toBeCloseTo(3.191538, 6);
    expect(f.spikes.modifiedZ).toEqual([0, 0, f.spikes.robustDistance[2], 0]);
    expect(f.spikes.bounds.low).toBeCloseTo(-3 * f.spikes.scale, 12);
    expect(f.spikes.bounds.high).toBeCloseTo(3 * f.spikes.scale, 12);
    expect(f.spikes.flagged).toEqual([2]);
    // Three points remain at three different x, all on y = x: the refit is exact, with 1 degree of freedom
    // and t₀.₉₇₅,₁ = tan(0.475π) = 12.7062 (Cauchy law).
    const refit = f.leastSquaresWithoutSpikes!;
    expect(refit.slope).toBeCloseTo(1, 14);
    expect(refit.intercept).toBeCloseTo(0, 14);
    expect(refit.degreesOfFreedom).toBe(1);
    expect(refit.tQuantile).toBeCloseTo(Math.tan(0.475 * Math.PI), 9);
    expect(refit.residuals).toHaveLength(3);
    // With the default k = 3.5 nothing is flagged, and there is no refit.
    const loose = fitStraightLine({ x: [1, 2, 3, 4], y: [1, 2, 30, 4] });
    expect(loose.spikes.flagged).toEqual([]);
    expect(loose.leastSquaresWithoutSpikes).toBeNull();
  });

  it("does not flag a point exactly k robust standard deviations out, only beyond", () => {
    const x = [1, 2, 3, 4];
    const y = [1, 2, 30, 4];
    const d = fitStraightLine({ x, y }).spikes.robustDistance[2]!;
    expect(fitStraightLine({ x, y, spikeThreshold: d }).spikes.flagged).toEqual([]);
    expect(fitStraightLine({ x, y, spikeThreshold: d * (1 - 1e-12) }).spikes.flagged).toEqual([2]);
  });

  it("gives no refit when fewer than 3 different x remain after the spikes", () => {
    // x = 1, 1, 1, 2, 2, 2, 3 on y = x but y₇ = 30: nine slopes of 1 among fifteen ⇒ slope 1, residuals 0 … 0, 27;
    // σ̂ = √(π/2)·27/7 = 4.834, M₇ = 5.585 > 3.5. Removing it leaves only x = 1 and 2.
    const f = fitStraightLine({ x: [1, 1, 1, 2, 2, 2, 3], y: [1, 1, 1, 2, 2, 2, 30] });
    expect(f.spikes.flagged).toEqual([6]);
    expect(f.spikes.robustDistance[6]).toBeCloseTo(27 / (Math.sqrt(Math.PI / 2) * (27 / 7)), 12);
    expect(f.leastSquaresWithoutSpikes).toBeNull();
  });
});

describe("Huber M-fit", () => {
  it("stops after one step for points exactly on a line, with every weight 1", () => {
    const h = fitStraightLine({ x: [1, 2, 3, 4, 5], y: [3, 5, 7, 9, 11] }).huber;
    expect(h).toEqual({
      slope: 2,
      intercept: 1,
      tuning: 1.345,
      scale: h.scale,
      weights: [1, 1, 1, 1, 1],
      iterations: 1,
      converged: true,
      residuals: [0, 0, 0, 0, 0],
    });
  });

  it("weights a point beyond c robust standard deviations by c·σ̂/|r| and the rest by 1, with σ̂ the spike scale", () => {
    const f = fitStraightLine({ x: [0, 1, 2, 3], y: [1, 3, 2, 5] });
    const h = f.huber;
    expect(h.scale).toBe(f.spikes.scale);
    expect(h.converged).toBe(true);
    expect(h.iterations).toBeGreaterThan(1);
    expect(h.iterations).toBeLessThan(200);
    h.weights.forEach((w, i) => {
      expect(w).toBeCloseTo(Math.min(1, (h.tuning * h.scale) / Math.abs(h.residuals[i]!)), 9);
    });
    expect(h.weights.filter((w) => w < 1)).toHaveLength(1);
    expect(h.weights[2]!).toBeLessThan(1);
  });

  it("gives up after 200 reweighting steps and says it did not converge", () => {
    // A tuning of 0.01 robust standard deviations down-weights nearly every point, and the reweighting
    // creeps towards the least-absolute-deviations line far too slowly to settle in 200 steps.
    const h = fitStraightLine({ x: [11, 20, 3, 7, 6, 7, 3, 6], y: [4, 6, 6, 0, 3, 1, 5, 5], huberTuning: 0.01 }).huber;
    expect(h.iterations).toBe(200);
    expect(h.converged).toBe(false);
    expect(Number.isFinite(h.slope) && Number.isFinite(h.intercept)).toBe(true);
  });

  it("uses the chosen tuning constant", () => {
    const h = fitStraightLine({ x: [0, 1, 2, 3], y: [1, 3, 2, 5], huberTuning: 0.5 }).huber;
    expect(h.tuning).toBe(0.5);
    h.weights.forEach((w, i) => {
      expect(w).toBeCloseTo(Math.min(1, (0.5 * h.scale) / Math.abs(h.residuals[i]!)), 9);
    });
  });
});

describe("what a fit reports about its inputs", () => {
  it("counts the points and the different x, and echoes the confidence", () => {
    const f = fitStraightLine({ x: [1, 1, 2, 3], y: [1, 1.2, 2, 3], confidence: 0.9 });
    expect(f.count).toBe(4);
    expect(f.distinctX).toBe(3);
    expect(f.confidence).toBe(0.9);
    expect(f.spikes.threshold).toBe(3.5);
  });
});

describe("refusals", () => {
  it("refuses y of another length, or no lists, naming y and the count x has", () => {
    expectRefusal(() => fitStraightLine({ x: [1, 2, 3], y: [1, 2] }), "y", 2, "", "y must be as many values as x (3) (got 2)");
    expectRefusal(() => fitStraightLine({ x: [1, 2, 3], y: 7 as never }), "y", "7", "", 'y must be as many values as x (3) (got "7")');
    expectRefusal(() => fitStraightLine({ x: "a" as never, y: [1, 2, 3] }), "y", 3, "", "y must be as many values as x (0) (got 3)");
    expectRefusal(() => fitStraightLine(null as never), "input", null, "", "input must be an object of named inputs (got null)");
  });

  it("names the reading that is not a number", () => {
    expectRefusal(() => fitStraightLine({ x: [1, 2, Number.NaN], y: [1, 2, 3] }), "x[2]", Number.NaN, "", "x[2] must be a finite number (got not a number)");
    expectRefusal(
      () => fitStraightLine({ x: [1, 2, 3], y: [Number.NEGATIVE_INFINITY, 2, 3] }),
      "y[0]",
      Number.NEGATIVE_INFINITY,
      "",
      "y[0] must be a finite number (got minus infinity)",
    );
  });

  it("refuses a confidence of 0 or 1, and a threshold or tuning of 0", () => {
    const xy = { x: [1, 2, 3], y: [1, 2, 4] };
    expectRefusal(() => fitStraightLine({ ...xy, confidence: 1 }), "confidence", 1, "", "confidence must be greater than 0 and less than 1 (got 1)");
    expectRefusal(() => fitStraightLine({ ...xy, confidence: 0 }), "confidence", 0, "", "confidence must be greater than 0 and less than 1 (got 0)");
    expectRefusal(() => fitStraightLine({ ...xy, spikeThreshold: 0 }), "spikeThreshold", 0, "", "spikeThreshold must be greater than 0 (got 0)");
    expectRefusal(() => fitStraightLine({ ...xy, huberTuning: 0 }), "huberTuning", 0, "", "huberTuning must be greater than 0 (got 0)");
    expectRefusal(() => requireFitOptions(0.95, 3.5, -1), "huberTuning", -1, "", "huberTuning must be greater than 0 (got -1)");
    expect(() => requireFitOptions(Number.MIN_VALUE, Number.MIN_VALUE, Number.MIN_VALUE)).not.toThrow();
    expect(() => requireFitOptions(1 - 2 ** -53, 1e300, 1e300)).not.toThrow();
  });

  it("needs 3 different x, and names how many it got", () => {
    expectRefusal(() => fitStraightLine({ x: [1, 2], y: [1, 2] }), "x", 2, "", "x must be at least 3 different values (got 2)");
    expectRefusal(() => fitStraightLine({ x: [1, 2, 2, 1], y: [1, 2, 3, 4] }), "x", 2, "", "x must be at least 3 different values (got 2)");
    expect(fitStraightLine({ x: [1, 2, 3], y: [1, 2, 4] }).count).toBe(3);
  });

  it("refuses values whose sums overflow, naming the list the caller gave", () => {
    const message = 'x must be values spread enough, and small enough, to fit a line in double precision (got "values out of reach")';
    expectRefusal(() => fitStraightLine({ x: [1e300, 2e300, 3e300], y: [1, 2, 3] }), "x", "values out of reach", "", message);
    expectRefusal(() => fitStraightLine({ x: [1, 2, 3], y: [1e300, -1e300, 1e300] }), "x", "values out of reach", "", message);
    const e = refusal(() => fitChecked([1e300, 2e300, 3e300], [1, 2, 3], 0.95, 3.5, 1.345, "speed"));
    expect(e.param).toBe("speed");
  });

  it("fitChecked refuses lists that are not two of as many finite numbers, at least 3, naming the given field", () => {
    const expected = "two lists of as many finite numbers, at least 3";
    const msg = (got: string) => `speed must be ${expected} (got ${got})`;
    expectRefusal(() => fitChecked([1, 2], [1, 2], 0.95, 3.5, 1.345, "speed"), "speed", 2, "", msg("2"));
    expectRefusal(() => fitChecked([1, 2, 3], [1, 2], 0.95, 3.5, 1.345, "speed"), "speed", 3, "", msg("3"));
    expectRefusal(() => fitChecked([1, 2, 3], "y" as never, 0.95, 3.5, 1.345, "speed"), "speed", 3, "", msg("3"));
    expectRefusal(() => fitChecked("x" as never, [1, 2, 3], 0.95, 3.5, 1.345, "speed"), "speed", "x", "", msg('"x"'));
    expectRefusal(() => fitChecked("abc" as never, [1, 2, 3], 0.95, 3.5, 1.345, "speed"), "speed", "abc", "", msg('"abc"'));
    expectRefusal(() => fitChecked([1, Number.NaN, 3], [1, 2, 3], 0.95, 3.5, 1.345, "speed"), "speed", 3, "", msg("3"));
    expectRefusal(() => fitChecked([1, 2, 3], [1, 2, Number.POSITIVE_INFINITY], 0.95, 3.5, 1.345, "speed"), "speed", 3, "", msg("3"));
    expectRefusal(
      () => fitChecked([1, 2, 3], [1, 2, 4], 2, 3.5, 1.345, "speed"),
      "confidence",
      2,
      "",
      "confidence must be greater than 0 and less than 1 (got 2)",
    );
    expect(fitChecked([1, 2, 3], [1, 2, 4], 0.95, 3.5, 1.345, "speed").count).toBe(3);
  });
});
