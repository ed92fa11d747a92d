/**
 * The drift model of calc/heading/drift.ts at points worked by hand: the corrected reading and the
 * term-by-term drift with every error present, the speed where the corrected reading is exactly 0,
 * the lowest estimable speed, the radius band at its closed end, the speed range and what limits
 * each end, the plot series' sampling, and which field each overflow refusal names.
 *
 * Every reference value below is derived by hand from the module's formulas (ω̂² = (a_meas − b̂)/r̂,
 * a_meas = (1 + k)ω²r cos θ + b; centripetal a = ω²r, OpenStax College Physics ch. 6), with the
 * arithmetic beside it; the inputs are picked so that the arithmetic stays exact.
 */
import { describe, expect, it } from "vitest";
import {
  type SpinRateErrorModel,
  assumedRadiusBand,
  headingDriftAt,
  headingDriftSeries,
  lowestEstimableSpeed,
  speedRangeWithinBudget,
} from "../../../calc/heading/drift.ts";
import { refusal } from "../../support/refusal.ts";

/** An exact calibration on a 0.5 m radius (binary-exact figures). */
const EXACT: SpinRateErrorModel = { assumedRadius: 0.5, trueRadius: 0.5, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 };

describe("headingDriftAt with every error term present", () => {
  // ω = 10 rad/s, r̂ = 16 mm, r = 20 mm, k = 0.25, θ = 60° (cos θ = 0.5), b = 0.5 m/s², b̂ = 0.25 m/s².
  const point = headingDriftAt({
    angularSpeed: 10,
    assumedRadius: 0.016,
    trueRadius: 0.02,
    scaleError: 0.25,
    bias: 0.5,
    biasCorrection: 0.25,
    tilt: Math.PI / 3,
  });

  it("reports the corrected reading (1 + k)ω²r cos θ + b − b̂ = 1.25 × 100 × 0.02 × 0.5 + 0.5 − 0.25 = 1.5 m/s²", () => {
    expect(point.correctedReading).toBeCloseTo(1.5, 12);
  });

  it("estimates ω̂ = √(1.5 / 0.016) = √93.75 = 9.68246 rad/s, a drift of −0.31754 rad/s", () => {
    expect(point.estimate!).toBeCloseTo(Math.sqrt(93.75), 12);
    expect(point.driftRate!).toBeCloseTo(Math.sqrt(93.75) - 10, 12);
    expect(point.speedRatio!).toBeCloseTo(Math.sqrt(93.75) / 10, 12);
  });

  it("splits the linear drift into radius +1.25, scale +1.25, tilt −2.5 (speed-proportional part 0) and bias +0.78125 rad/s", () => {
    // radius: ω/2 · (r − r̂)/r̂ = 5 × 0.004/0.016 = 1.25; scale: ω/2 · k = 5 × 0.25 = 1.25;
    // tilt: ω/2 · (cos θ − 1) = 5 × (−0.5) = −2.5; bias: (b − b̂)/(2 r̂ ω) = 0.25/(2 × 0.016 × 10) = 0.78125.
    expect(point.linear.radius).toBeCloseTo(1.25, 12);
    expect(point.linear.scale).toBeCloseTo(1.25, 12);
    expect(point.linear.tilt).toBeCloseTo(-2.5, 12);
    expect(point.linear.speedProportional).toBeCloseTo(0, 12);
    expect(point.linear.bias).toBeCloseTo(0.78125, 12);
    expect(point.linear.total).toBeCloseTo(0.78125, 12);
  });

  it("refuses a negative tilt, naming it in rad", () => {
    const error = refusal(() => headingDriftAt({ ...EXACT, angularSpeed: 10, tilt: -0.01 }));
    expect(error.param).toBe("tilt");
    expect(error.unit).toBe("rad");
    expect(error.message).toBe("tilt must be at least 0 rad and less than π/2 rad (90°) (got -0.01 rad)");
  });
});

describe("where the corrected reading is exactly 0", () => {
  // r = r̂ = 0.5 m, b̂ = 2 m/s², ω = 2 rad/s: a_meas − b̂ = 2² × 0.5 − 2 = 0, so ω̂² = 0/r̂ = 0.
  const model = { ...EXACT, biasCorrection: 2 };

  it("has no estimate (the firmware cannot take the root of 0 as a spin rate), and no bias-alone figure either", () => {
    const point = headingDriftAt({ ...model, angularSpeed: 2 });
    expect(point.correctedReading).toBe(0);
    expect(point.defined).toBe(false);
    expect(point.estimate).toBeNull();
    expect(point.driftRate).toBeNull();
    expect(point.alone.bias).toBeNull();
  });

  it("gives no radius band at that speed", () => {
    expect(assumedRadiusBand({ ...model, angularSpeed: 2, budget: 1 })).toEqual({ status: "no-estimate", low: null, high: null, zeroDriftRadius: null });
  });

  it("is the lowest estimable speed, 2 rad/s (√(b̂/r) = √(2/0.5))", () => {
    expect(lowestEstimableSpeed(model)).toBe(2);
  });
});

describe("lowestEstimableSpeed", () => {
  // ω₀ = √((b̂ − b)/((1 + k) r cos θ)): k = 0.25, θ = 60°, r = 10 mm, b̂ − b = 0.625 m/s²:
  // (1 + k) r cos θ = 1.25 × 0.01 × 0.5 = 0.00625 m, ω₀² = 0.625/0.00625 = 100, ω₀ = 10 rad/s.
  const model: SpinRateErrorModel = { assumedRadius: 0.008, trueRadius: 0.01, scaleError: 0.25, bias: 0.125, biasCorrection: 0.75, tilt: Math.PI / 3 };

  it("is 10 rad/s with a scale error and a tilt, whatever radius the firmware assumes", () => {
    expect(lowestEstimableSpeed(model)).toBeCloseTo(10, 12);
    expect(lowestEstimableSpeed({ ...model, assumedRadius: 0.012 })).toBeCloseTo(10, 12);
  });

  it("is exactly 0 (not −0) when the offset is corrected exactly", () => {
    expect(lowestEstimableSpeed({ ...model, biasCorrection: 0.125 })).toBe(0);
  });

  it("names the model when it is not an object", () => {
    const error = refusal(() => lowestEstimableSpeed(null as never));
    expect(error.param).toBe("model");
  });

  it("names the true radius when the speed would overflow, in the words of the lowest speed", () => {
    // (b̂ − b)/(r) = 1e100/1e−250 = 1e350: past the largest double; r is the most extreme input.
    const error = refusal(() => lowestEstimableSpeed({ ...EXACT, trueRadius: 1e-250, biasCorrection: 1e100 }));
    expect(error.param).toBe("trueRadius");
    expect(error.value).toBe(1e-250);
    expect(error.unit).toBe("m");
    expect(error.expected).toBe("large enough for the lowest speed to stay finite");
  });
});

describe("which input an overflowing drift names", () => {
  const at = (fields: Partial<SpinRateErrorModel> & { angularSpeed: number }) => refusal(() => headingDriftAt({ ...EXACT, ...fields }));

  it.each([
    // (r − r̂)/r̂ · ω² = (0.01/1e−305) × 1e10 = 1e313: past the largest double.
    {
      note: "a tiny assumed radius",
      fields: { assumedRadius: 1e-305, trueRadius: 0.01, angularSpeed: 1e5 },
      param: "assumedRadius",
      value: 1e-305,
      unit: "m",
      size: "large",
    },
    // (1e300 − 0.01)/0.01 · 1e10 = 1e312.
    {
      note: "a huge true radius",
      fields: { assumedRadius: 0.01, trueRadius: 1e300, angularSpeed: 1e5 },
      param: "trueRadius",
      value: 1e300,
      unit: "m",
      size: "small",
    },
    // (b − b̂)/r̂ = 1e300/1e−10 = 1e310.
    {
      note: "a huge offset",
      fields: { assumedRadius: 1e-10, trueRadius: 1e-10, bias: 1e300, angularSpeed: 1 },
      param: "bias",
      value: 1e300,
      unit: "m/s²",
      size: "small",
    },
    {
      note: "a huge offset correction",
      fields: { assumedRadius: 1e-10, trueRadius: 1e-10, biasCorrection: -1e300, angularSpeed: 1 },
      param: "biasCorrection",
      value: -1e300,
      unit: "m/s²",
      size: "small",
    },
    // ω² = 1e320.
    { note: "a huge spin rate", fields: { angularSpeed: 1e160 }, param: "angularSpeed", value: 1e160, unit: "rad/s", size: "small" },
  ])("names $param for $note, with its value and unit", ({ fields, param, value, unit, size }) => {
    const error = at(fields);
    expect(error.param).toBe(param);
    expect(error.value).toBe(value);
    expect(error.unit).toBe(unit);
    expect(error.expected).toBe(`${size} enough for the drift to stay finite`);
  });
});

describe("assumedRadiusBand", () => {
  it("is open above when the budget equals the spin rate (ω̂ may then fall to 0): ω = D = 2 rad/s, r = 0.5 m", () => {
    // N = ω²r = 2; r̂_lo = N/(ω + D)² = 2/16 = 0.125 m; r̂₀ = N/ω² = 0.5 m; r̂_hi = N/(ω − D)² has no finite value.
    expect(assumedRadiusBand({ ...EXACT, angularSpeed: 2, budget: 2 })).toEqual({ status: "upper-unbounded", low: 0.125, high: null, zeroDriftRadius: 0.5 });
  });

  it("names the spin rate when the band overflows at a huge speed (ω² = 1e320)", () => {
    const error = refusal(() => assumedRadiusBand({ ...EXACT, angularSpeed: 1e160, budget: 1 }));
    expect(error.param).toBe("angularSpeed");
    expect(error.value).toBe(1e160);
    expect(error.unit).toBe("rad/s");
    expect(error.expected).toBe("small enough for the radius band to stay finite");
  });

  it("names the budget when the top of the band overflows", () => {
    // N ≈ b = 1 m/s²; ω − D = 2e−160, (ω − D)² = 4e−320, r̂_hi = 1/4e−320 = 2.5e319: past the largest double.
    const error = refusal(() => assumedRadiusBand({ ...EXACT, bias: 1, angularSpeed: 3e-160, budget: 1e-160 }));
    expect(error.param).toBe("budget");
    expect(error.value).toBe(1e-160);
    expect(error.unit).toBe("rad/s");
  });

  it("names the spin rate when an open-above band overflows at a tiny speed", () => {
    // N ≈ b = 1 m/s²; r̂₀ = N/ω² = 1/1e−340: past the largest double (D = 1 rad/s ≥ ω: open above).
    const error = refusal(() => assumedRadiusBand({ ...EXACT, bias: 1, angularSpeed: 1e-170, budget: 1 }));
    expect(error.param).toBe("angularSpeed");
    expect(error.value).toBe(1e-170);
    expect(error.expected).toBe("large enough for the radius band to stay finite");
  });
});

describe("speedRangeWithinBudget", () => {
  // r = r̂ = 0.5 m and k = 0.25: G = 1.25, so ω̂² = 1.25 ω² + β.
  const GAIN = { ...EXACT, scaleError: 0.25 };

  it("starts where the estimate starts when that is within budget: b̂ = 0.3125 m/s², D = 1 rad/s", () => {
    // β = −0.3125/0.5 = −0.625; ω̂ = 0 at ω₀ = √(0.625/1.25) = √0.5 = 0.70711 rad/s, where the drift is −ω₀ (|·| < D);
    // top: √(1.25ω² − 0.625) = ω + 1 ⇒ ω² − 8ω − 6.5 = 0 ⇒ ω = 4 + √22.5 = 8.74342 rad/s.
    const range = speedRangeWithinBudget({ ...GAIN, biasCorrection: 0.3125, budget: 1 });
    expect(range.status).toBe("bounded");
    expect(range.lowLimit).toBe("estimate-undefined");
    expect(range.highLimit).toBe("budget");
    expect(range.low!).toBeCloseTo(Math.sqrt(0.5), 12);
    expect(range.high!).toBeCloseTo(4 + Math.sqrt(22.5), 12);
  });

  it("starts at the budget when the estimate starts too slow: same model, D = 0.5 rad/s", () => {
    // At ω₀ = 0.70711 the drift is −0.70711, over D. Low: √(1.25ω² − 0.625) = ω − 0.5 ⇒ ω² + 4ω − 3.5 = 0 ⇒ ω = −2 + √7.5;
    // high: √(1.25ω² − 0.625) = ω + 0.5 ⇒ ω² − 4ω − 3.5 = 0 ⇒ ω = 2 + √7.5.
    const range = speedRangeWithinBudget({ ...GAIN, biasCorrection: 0.3125, budget: 0.5 });
    expect(range.lowLimit).toBe("budget");
    expect(range.highLimit).toBe("budget");
    expect(range.low!).toBeCloseTo(-2 + Math.sqrt(7.5), 12);
    expect(range.high!).toBeCloseTo(2 + Math.sqrt(7.5), 12);
  });

  it("keeps standstill in the range when the offset's drift there is exactly the budget: b = 5.445 m/s², D = 3.3 rad/s", () => {
    // β = 5.445/0.5 = 10.89 = 3.3², so at ω → 0 the drift √β = D exactly (the budget is a closed bound);
    // top: √(1.25ω² + 10.89) = ω + 3.3 ⇒ 0.25ω² − 6.6ω = 0 ⇒ ω = 26.4 rad/s.
    const range = speedRangeWithinBudget({ ...GAIN, bias: 5.445, budget: 3.3 });
    expect(range.low).toBe(0);
    expect(range.lowLimit).toBe("standstill");
    expect(range.high!).toBeCloseTo(26.4, 12);
  });

  it("is 1 to 3 rad/s with an offset left in: b = 0.5 m/s², D = 0.5 rad/s", () => {
    // β = 0.5/0.5 = 1: √(1.25ω² + 1) = ω + 0.5 ⇒ 0.25ω² − ω + 0.75 = 0 ⇒ ω² − 4ω + 3 = 0 ⇒ ω = 1 or 3.
    const range = speedRangeWithinBudget({ ...GAIN, bias: 0.5, budget: 0.5 });
    expect(range).toEqual({ status: "bounded", low: 1, high: 3, lowLimit: "budget", highLimit: "budget" });
  });
});

describe("headingDriftSeries", () => {
  it("ends exactly on the top speed asked for", () => {
    // 0.2 + (0.9 − 0.2) × 1/1 rounds to 0.8999999999999999 in binary: the last point is taken as given instead.
    const series = headingDriftSeries({ ...EXACT, lowSpeed: 0.2, highSpeed: 0.9, points: 2 });
    expect(series.map((p) => p.angularSpeed)).toEqual([0.2, 0.9]);
  });

  it("refuses a count of points that is not whole", () => {
    const error = refusal(() => headingDriftSeries({ ...EXACT, lowSpeed: 1, highSpeed: 2, points: 2.5 }));
    expect(error.param).toBe("points");
    expect(error.message).toBe("points must be a whole number (got 2.5)");
  });

  it("refuses a top speed not above the bottom one, in rad/s", () => {
    const error = refusal(() => headingDriftSeries({ ...EXACT, lowSpeed: 10, highSpeed: 10 }));
    expect(error.param).toBe("highSpeed");
    expect(error.unit).toBe("rad/s");
    expect(error.bound).toEqual({ relation: "greater", limit: 10, kind: "angularSpeed", other: "lowSpeed" });
    expect(error.message).toBe("highSpeed must be greater than lowSpeed (10 rad/s) (got 10 rad/s)");
  });

  it("names the top of the range when a speed near it overflows (ω² = 1e320)", () => {
    const error = refusal(() => headingDriftSeries({ ...EXACT, lowSpeed: 1, highSpeed: 1e160, points: 2 }));
    expect(error.param).toBe("highSpeed");
    expect(error.value).toBe(1e160);
    expect(error.unit).toBe("rad/s");
  });

  it("names the bottom of the range when a speed near it overflows (the bias term β/(2ω) = 2/2e−310)", () => {
    const error = refusal(() => headingDriftSeries({ ...EXACT, bias: 1, lowSpeed: 1e-310, highSpeed: 1, points: 2 }));
    expect(error.param).toBe("lowSpeed");
    expect(error.value).toBe(1e-310);
    expect(error.unit).toBe("rad/s");
  });

  it("names the top of the range for a sample exactly halfway (ties go to the top)", () => {
    // 1, 1.5e154, 3e154 rad/s: the middle one is the first to overflow (1.5e154² = 2.25e308).
    const error = refusal(() => headingDriftSeries({ ...EXACT, lowSpeed: 1, highSpeed: 3e154, points: 3 }));
    expect(error.param).toBe("highSpeed");
    expect(error.value).toBe(3e154);
  });
});
