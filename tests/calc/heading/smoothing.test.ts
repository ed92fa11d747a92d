/**
 * Smoothing the spin-rate estimate (calc/heading/smoothing.ts): the edges of the single-pole filter's
 * figures, the spike figures at the median's and the settling rule's limits, the trade-off series'
 * spacing and its option refusals, and the input a non-finite result is blamed on.
 */
import { describe, expect, it } from "vitest";
import {
  emaRampLag,
  emaTimeConstant,
  headingSmoothing,
  headingSmoothingInputs,
  medianFilterDelay,
  smoothingTradeoffSeries,
  spikeRateError,
  type HeadingSmoothingInput,
} from "../../../calc/heading/smoothing.ts";
import { refusal } from "../../support/refusal.ts";

const DEFAULTS = Object.fromEntries(Object.entries(headingSmoothingInputs).map(([k, v]) => [k, v.default])) as HeadingSmoothingInput;

describe("a spike on an estimate at rest", () => {
  it("gives no rate error when there is neither speed nor spike (√(0 + 0) − 0 = 0, not 0/0)", () => {
    expect(spikeRateError({ angularSpeed: 0, assumedRadius: 0.012, spike: 0 })).toBe(0);
  });

  it("gives √(S/r̂) when the estimate sits at 0 (hand: √(9.8 / 0.01) = √980 = 31.305 rad/s)", () => {
    expect(spikeRateError({ angularSpeed: 0, assumedRadius: 0.01, spike: 9.8 })).toBeCloseTo(31.304951684997057, 12);
  });
});

describe("the spike figures of the smoothing check", () => {
  it("a median of 3 (the calculator's default) already removes the spike: no shift, nothing to settle, no heading error", () => {
    const r = headingSmoothing({ ...DEFAULTS, medianLength: 3 });
    expect(r.spikeRateError).toBeGreaterThan(0);
    expect(r.spikeFirstShift).toBe(0);
    expect(r.spikeSettleSamples).toBe(0);
    expect(r.spikeHeadingError).toBe(0);
    expect(r.spikesRejectedPerWindow).toBe(1);
  });

  it("without a median, α = 0.1 settles below 1 % of the spike after 22 samples (hand: 0.1·0.9²¹ = 0.0109, 0.1·0.9²² = 0.0098)", () => {
    const r = headingSmoothing({ ...DEFAULTS, medianLength: 1, smoothingFactor: 0.1 });
    expect(r.spikeFirstShift).toBeCloseTo(0.1 * r.spikeRateError, 12);
    expect(r.spikeSettleSamples).toBe(22);
  });

  it("a reading with no spike leaves nothing to settle, whatever α", () => {
    const r = headingSmoothing({ ...DEFAULTS, medianLength: 1, smoothingFactor: 0.1, spike: 0 });
    expect(r.spikeRateError).toBe(0);
    expect(r.spikeFirstShift).toBe(0);
    expect(r.spikeSettleSamples).toBe(0);
    expect(r.spikeHeadingError).toBe(0);
  });

  it("at α = 0.01 the spike's own sample moves the output by exactly 1 % of the spike, not below it: one more sample settles it (0.01·0.99 < 0.01)", () => {
    const r = headingSmoothing({ ...DEFAULTS, medianLength: 1, smoothingFactor: 0.01 });
    expect(r.spikeFirstShift).toBeCloseTo(0.01 * r.spikeRateError, 12);
    expect(r.spikeSettleSamples).toBe(1);
  });

  it("below α = 0.01 the first shift is already under 1 % of the spike: 0 samples to settle", () => {
    expect(headingSmoothing({ ...DEFAULTS, medianLength: 1, smoothingFactor: 0.005 }).spikeSettleSamples).toBe(0);
  });

  it("at α = 1 (no smoothing) the whole spike passes on its sample and is gone on the next", () => {
    const r = headingSmoothing({ ...DEFAULTS, medianLength: 1, smoothingFactor: 1 });
    expect(r.spikeFirstShift).toBe(r.spikeRateError);
    expect(r.spikeSettleSamples).toBe(1);
  });
});

describe("the heading error at the end of a short spin-up", () => {
  it("sums the EMA's error over the two samples of the ramp (hand: α = 0.5, Δt = 1 ms, AΔt = 0.1 rad/s per sample; errors 0.05 and 0.075 rad/s; 0.125 × 1 ms = 1.25e-4 rad)", () => {
    // x_n = 0.1n, y_n = y_{n−1} + 0.5(x_n − y_{n−1}) from rest: y_1 = 0.05, y_2 = 0.125; e_1 = 0.05, e_2 = 0.075.
    const r = headingSmoothing({ ...DEFAULTS, sampleRate: 1000, smoothingFactor: 0.5, spinUpAcceleration: 100, speedChange: 0.2, medianLength: 1 });
    expect(r.spinUpDuration).toBeCloseTo(0.002, 15);
    expect(r.headingErrorAtRampEnd).toBeCloseTo(1.25e-4, 15);
    // Once settled: Δω·τ_lag = 0.2 rad/s × Δt(1 − α)/α = 0.2 × 1 ms = 2e-4 rad.
    expect(r.headingErrorAfterSpinUp).toBeCloseTo(2e-4, 15);
  });

  it("with α = 0.01 over 100 samples the start-up transient is still large (hand: 0.99·(1 − 0.99¹⁰⁰)/0.01 = 62.76 samples of the 100)", () => {
    // AΔt·τ_lag·(N − transient) with AΔt = 0.1 rad/s, τ_lag = 99 ms, N = 100: 0.1 × 0.099 × (100 − 62.76) = 0.3687 rad.
    const r = headingSmoothing({ ...DEFAULTS, sampleRate: 1000, smoothingFactor: 0.01, spinUpAcceleration: 100, speedChange: 10, medianLength: 1 });
    const transient = (0.99 * (1 - 0.99 ** 100)) / 0.01;
    expect(transient).toBeCloseTo(62.76, 2);
    expect(r.headingErrorAtRampEnd).toBeCloseTo(0.1 * 0.099 * (100 - transient), 12);
  });
});

describe("the trade-off series", () => {
  it("spaces α evenly in log from the smallest to 1 (three points from 0.01: 0.01, 0.1, 1) at the sample period 1/f_s", () => {
    const s = smoothingTradeoffSeries({ ...DEFAULTS, sampleRate: 1000, medianLength: 1 }, { smallestFactor: 0.01, points: 3 });
    expect(s.map((p) => p.smoothingFactor)).toEqual([expect.closeTo(0.01, 15), expect.closeTo(0.1, 15), 1]);
    // τ_lag = Δt(1 − α)/α at Δt = 1 ms: 99 ms, 9 ms, 0.
    expect(s[0]!.emaLag).toBeCloseTo(0.099, 12);
    expect(s[1]!.emaLag).toBeCloseTo(0.009, 12);
    expect(s[2]!.emaLag).toBe(0);
  });

  it("refuses an even median window, as the single check does", () => {
    const error = refusal(() => smoothingTradeoffSeries({ ...DEFAULTS, medianLength: 4 }));
    expect(error).toMatchObject({ param: "medianLength", value: 4, expected: "an odd whole number", unit: "" });
    expect(error.message).toBe("medianLength must be an odd whole number (got 4)");
  });

  it("refuses a smallest α of 1 or more, or below 1e-4, by name", () => {
    expect(refusal(() => smoothingTradeoffSeries(DEFAULTS, { smallestFactor: 1 }))).toMatchObject({ param: "smallestFactor", value: 1, unit: "" });
    expect(refusal(() => smoothingTradeoffSeries(DEFAULTS, { smallestFactor: 5e-5 }))).toMatchObject({ param: "smallestFactor", value: 5e-5 });
    expect(smoothingTradeoffSeries(DEFAULTS, { smallestFactor: 0.999, points: 2 })[0]!.smoothingFactor).toBeCloseTo(0.999, 14);
  });

  it("refuses fewer than 2 points, more than 501, and a fractional count, by name", () => {
    expect(refusal(() => smoothingTradeoffSeries(DEFAULTS, { points: 1 }))).toMatchObject({ param: "points", value: 1, unit: "" });
    expect(refusal(() => smoothingTradeoffSeries(DEFAULTS, { points: 502 }))).toMatchObject({ param: "points", value: 502 });
    const error = refusal(() => smoothingTradeoffSeries(DEFAULTS, { points: 2.5 }));
    expect(error).toMatchObject({ param: "points", value: 2.5, expected: "a whole number", unit: "" });
    expect(error.message).toBe("points must be a whole number (got 2.5)");
  });
});

describe("the median window", () => {
  it("refuses an even window by name, without a unit", () => {
    const error = refusal(() => medianFilterDelay({ windowLength: 4, samplePeriod: 0.001 }));
    expect(error).toMatchObject({ param: "windowLength", value: 4, expected: "an odd whole number", unit: "" });
    expect(error.message).toBe("windowLength must be an odd whole number (got 4)");
  });
});

describe("a result that would leave the doubles names the input that took it there", () => {
  it("a time constant Δt/α past the largest double names the sample period, in s", () => {
    // −1e300 s / ln(1 − 1e-10) ≈ 1e310 s
    const error = refusal(() => emaTimeConstant({ smoothingFactor: 1e-10, samplePeriod: 1e300 }));
    expect(error).toMatchObject({ param: "samplePeriod", value: 1e300, unit: "s" });
    expect(error.message).toBe("samplePeriod must be small enough for the time constant to stay finite (got 1e+300 s)");
  });

  it("a ramp lag Δt(1 − α)/α past the largest double names the sample period, in s", () => {
    const error = refusal(() => emaRampLag({ smoothingFactor: 1e-10, samplePeriod: 1e300 }));
    expect(error).toMatchObject({ param: "samplePeriod", value: 1e300, unit: "s" });
    expect(error.message).toBe("samplePeriod must be small enough for the ramp lag to stay finite (got 1e+300 s)");
  });

  it("a median delay (N − 1)/2·Δt past the largest double names the sample period, in s (2 × 1e308 s)", () => {
    const error = refusal(() => medianFilterDelay({ windowLength: 5, samplePeriod: 1e308 }));
    expect(error).toMatchObject({ param: "samplePeriod", value: 1e308, unit: "s" });
    expect(error.message).toBe("samplePeriod must be small enough for the filter delay to stay finite (got 1e+308 s)");
  });

  it("a spike S/r̂ past the largest double names the spike in m/s², or the radius in m when that is the more extreme", () => {
    const bySpike = refusal(() => spikeRateError({ angularSpeed: 100, assumedRadius: 1e-10, spike: 1e300 }));
    expect(bySpike).toMatchObject({ param: "spike", value: 1e300, unit: "m/s²" });
    expect(bySpike.message).toBe("spike must be small enough for the rate error to stay finite (got 1e+300 m/s²)");
    const byRadius = refusal(() => spikeRateError({ angularSpeed: 100, assumedRadius: 1e-300, spike: 1e10 }));
    expect(byRadius).toMatchObject({ param: "assumedRadius", value: 1e-300, unit: "m" });
    expect(byRadius.message).toBe("assumedRadius must be large enough for the rate error to stay finite (got 1e-300 m)");
  });

  it("with every input extreme, the one furthest from 1 in orders of magnitude is named: a speed of 1e305 rad/s", () => {
    const error = refusal(() => spikeRateError({ angularSpeed: 1e305, assumedRadius: 1e-10, spike: 1e300 }));
    expect(error).toMatchObject({ param: "angularSpeed", value: 1e305, unit: "rad/s" });
    expect(error.message).toBe("angularSpeed must be small enough for the rate error to stay finite (got 1e+305 rad/s)");
  });
});
