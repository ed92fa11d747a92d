/**
 * Two opposed sensors (calc/heading/opposed.ts): a sensor on the spin centre, residual offsets and a
 * common acceleration in one sensor and in the pair, a pair that reads nothing, the check's worst
 * cases, and the input a result past the largest double is blamed on.
 */
import { describe, expect, it } from "vitest";
import { opposedSensorsCheck, opposedSensorsDrift } from "../../../calc/heading/opposed.ts";
import { refusal } from "../../support/refusal.ts";

const NONE = { defined: false, estimate: null, driftRate: null, driftPerRevolution: null };

describe("one sensor and the pair", () => {
  it("a sensor the spin centre has moved onto reads 0 and gives no estimate; the other and the pair still do (hand: ω = 100 rad/s, r = 10 mm, e = 10 mm)", () => {
    const r = opposedSensorsDrift({ angularSpeed: 100, radius1: 0.01, radius2: 0.01, offset: 0.01 });
    expect(r.sensor1).toEqual(NONE);
    // sensor 2 sits 20 mm from the true centre: ω̂₂ = ω√(20/10) = 141.42 rad/s
    expect(r.sensor2.defined).toBe(true);
    expect(r.sensor2.estimate).toBeCloseTo(100 * Math.SQRT2, 12);
    // the pair: (0 + 100²·0.02)/(0.01 + 0.01) = 100² → ω̂ = 100, and ê = ½[0 − (0 − 200)/100²] = 0.01 m
    expect(r.pair).toMatchObject({ defined: true, estimate: 100, driftRate: 0 });
    expect(r.offsetEstimate).toBeCloseTo(0.01, 15);
  });

  it("adds each sensor's residual offset to its own reading (hand: ω = 100 rad/s, r = 10 mm, δ₁ = +10, δ₂ = −20 m/s²)", () => {
    const r = opposedSensorsDrift({ angularSpeed: 100, radius1: 0.01, radius2: 0.01, offset: 0, residualBias1: 10, residualBias2: -20 });
    // a₁ = 100 + 10 = 110, a₂ = 100 − 20 = 80 m/s²
    expect(r.sensor1.estimate).toBeCloseTo(Math.sqrt(110 / 0.01), 12); // 104.88 rad/s
    expect(r.sensor2.estimate).toBeCloseTo(Math.sqrt(80 / 0.01), 12); // 89.44 rad/s
    expect(r.pair.estimate).toBeCloseTo(Math.sqrt(190 / 0.02), 12); // 97.47 rad/s: the offsets do not cancel
    // ê = ½[0 − (110 − 80)/9500] = −1.5789 mm
    expect(r.offsetEstimate).toBeCloseTo(-30 / 19000, 15);
  });

  it("a common acceleration toward sensor 1 lowers its reading, raises the other's, and cancels in the pair (hand: a_L = 50 m/s²)", () => {
    const r = opposedSensorsDrift({ angularSpeed: 100, radius1: 0.01, radius2: 0.01, offset: 0, linearAcceleration: 50 });
    expect(r.sensor1.estimate).toBeCloseTo(Math.sqrt(50 / 0.01), 12); // a₁ = 100 − 50
    expect(r.sensor2.estimate).toBeCloseTo(Math.sqrt(150 / 0.01), 12); // a₂ = 100 + 50
    expect(r.pair.estimate).toBeCloseTo(100, 12);
    // read as an offset: ê = ½[0 − (50 − 150)/100²] = a_L/ω² = 5 mm
    expect(r.offsetEstimate).toBeCloseTo(0.005, 15);
  });

  it("when the offsets leave the pair's sum at or below 0, the pair gives no estimate and no offset (hand: ω = 10 rad/s, δ₁ = −10 m/s²)", () => {
    // a₁ = 100·0.01 − 10 = −9, a₂ = 1: the sum −8 m/s²
    const r = opposedSensorsDrift({ angularSpeed: 10, radius1: 0.01, radius2: 0.01, offset: 0, residualBias1: -10 });
    expect(r.pair).toEqual(NONE);
    expect(r.sensor1).toEqual(NONE);
    expect(r.sensor2).toMatchObject({ defined: true, estimate: 10 });
    expect(r.offsetEstimate).toBeNull();
  });

  it("refuses a residual offset or common acceleration that is not a number, by name, in m/s²", () => {
    const base = { angularSpeed: 100, radius1: 0.01, radius2: 0.01, offset: 0 };
    for (const param of ["residualBias1", "residualBias2", "linearAcceleration"]) {
      const error = refusal(() => opposedSensorsDrift({ ...base, [param]: Number.NaN }));
      expect(error).toMatchObject({ param, expected: "a finite number", unit: "m/s²" });
      expect(error.message).toBe(`${param} must be a finite number (got not a number)`);
    }
  });
});

describe("the opposed-sensors check", () => {
  it("has no worst single-sensor drift when sensor 1 gives no estimate at one end of ±e (e = r₁ = 10 mm)", () => {
    const c = opposedSensorsCheck({ angularSpeed: 100, radius1: 0.01, radius2: 0.01, offset: 0.01 });
    expect(c.towardSensor1.sensor1.defined).toBe(false);
    expect(c.towardSensor2.sensor1.defined).toBe(true);
    expect(c.singleWorstDriftRate).toBeNull();
    expect(c.singleWorstPerRevolution).toBeNull();
  });

  it("reports the pair's worst drift as the larger of its two ends, round-off only (a sweep of speeds, radii and offsets)", () => {
    let differ = 0;
    for (const angularSpeed of [10, 47.1, 100, 123.4, 300, 1000])
      for (const radius1 of [0.005, 0.01, 0.0137, 0.02])
        for (const radius2 of [0.01, 0.011, 0.015])
          for (const offset of [0.0005, 0.001, 0.003]) {
            const c = opposedSensorsCheck({ angularSpeed, radius1, radius2, offset });
            const ends = [Math.abs(c.towardSensor1.pair.driftRate!), Math.abs(c.towardSensor2.pair.driftRate!)];
            expect(c.pairWorstDriftRate).toBe(Math.max(...ends));
            expect(c.pairWorstDriftRate).toBeLessThan(1e-13 * angularSpeed);
            if (ends[0] !== ends[1]) differ++;
          }
    // round-off makes the two ends differ in many of these, either way round
    expect(differ).toBeGreaterThan(10);
  });
});

describe("a result past the largest double names the input that took it there, in its unit", () => {
  const base = { angularSpeed: 100, radius1: 0.012, radius2: 0.012, offset: 0 };
  it.each([
    ["angularSpeed", { angularSpeed: 1e200 }, 1e200, "rad/s", "1e+200 rad/s"],
    ["radius1", { angularSpeed: 1e10, radius1: 1e300 }, 1e300, "m", "1e+300 m"],
    ["radius2", { angularSpeed: 1e10, radius2: 1e300 }, 1e300, "m", "1e+300 m"],
    ["offset", { angularSpeed: 1e10, offset: 1e300 }, 1e300, "m", "1e+300 m"],
    ["residualBias1", { residualBias1: 1e308 }, 1e308, "m/s²", "1e+308 m/s²"],
    ["residualBias2", { residualBias2: 1e308 }, 1e308, "m/s²", "1e+308 m/s²"],
    ["linearAcceleration", { linearAcceleration: 1e308 }, 1e308, "m/s²", "1e+308 m/s²"],
  ] as const)("%s: named with its value and SI unit", (param, change, value, unit, shown) => {
    const error = refusal(() => opposedSensorsDrift({ ...base, ...change }));
    expect(error).toMatchObject({ param, value, unit });
    expect(error.message).toBe(`${param} must be small enough for the opposed sensors drift to stay finite (got ${shown})`);
  });
});
