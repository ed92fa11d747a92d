import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  assumedRadiusBand,
  beaconArc,
  CalcInputError,
  checkValue,
  demoSpinnerRadiusExample,
  emaFactorForTimeConstant,
  emaNoiseFactor,
  emaRampLag,
  emaTimeConstant,
  headingDrift,
  headingDriftAt,
  headingDriftInputs,
  headingDriftSeries,
  headingSmoothing,
  headingSmoothingInputs,
  headingStepPerLoop,
  headingTiming,
  headingTimingInputs,
  isSourceKey,
  latencyHeadingLag,
  loopRateForStep,
  lowestEstimableSpeed,
  medianFilterDelay,
  onTimeForArc,
  opposedSensorsCheck,
  opposedSensorsDrift,
  opposedSensorsInputs,
  rpmToRadPerSecond,
  smoothingTradeoffSeries,
  speedRangeWithinBudget,
  spikeRateError,
  STANDARD_GRAVITY,
  type HeadingDriftInput,
  type HeadingSmoothingInput,
  type HeadingTimingInput,
  type InputSpecs,
  type SpinRateErrorModel,
} from "#calc";
import { readFileSync } from "node:fs";

const DEG = Math.PI / 180;
const toDeg = (rad: number) => rad / DEG;
const EXACT: SpinRateErrorModel = { assumedRadius: 0.012, trueRadius: 0.012, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 };

function defaultsOf<T extends InputSpecs>(specs: T): { [K in keyof T]: number } {
  return Object.fromEntries(Object.entries(specs).map(([k, v]) => [k, v.default])) as { [K in keyof T]: number };
}

/** Every number anywhere in a result is finite (nulls allowed). */
function expectAllFinite(value: unknown, path = "result"): void {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) throw new Error(`${path} is ${value}`);
  } else if (Array.isArray(value)) for (const [i, v] of value.entries()) expectAllFinite(v, `${path}[${i}]`);
  else if (value !== null && typeof value === "object") for (const [k, v] of Object.entries(value)) expectAllFinite(v, `${path}.${k}`);
}

/** Arbitrary for one input spec (SI), inside its declared range. */
function specArbitrary(spec: InputSpecs[string]): fc.Arbitrary<number> {
  if (spec.integer) return fc.integer({ min: Math.ceil(spec.min), max: Math.floor(spec.max) });
  return fc.double({ min: spec.min, max: spec.max, minExcluded: spec.minOpen === true, noNaN: true, noDefaultInfinity: true });
}

function specsArbitrary<T extends InputSpecs>(specs: T): fc.Arbitrary<{ [K in keyof T]: number }> {
  return fc.record(Object.fromEntries(Object.entries(specs).map(([k, v]) => [k, specArbitrary(v)]))) as unknown as fc.Arbitrary<{ [K in keyof T]: number }>;
}

// ---------------------------------------------------------------------------------------------
// A second method for the drift: build the sensor reading from vector kinematics (positions of the
// sensing element in the world frame, differentiated twice numerically, rotated back into the
// body and projected on the tilted axis), then integrate the firmware's estimate over whole
// revolutions in small steps and compare the heading gained with the true heading.

type Vec = [number, number, number];
const rotateZ = ([x, y, z]: Vec, phi: number): Vec => [Math.cos(phi) * x - Math.sin(phi) * y, Math.sin(phi) * x + Math.cos(phi) * y, z];
const dot = (a: Vec, b: Vec) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

function simulatedDriftPerRevolution(
  model: SpinRateErrorModel,
  angularSpeed: number,
  {
    tiltPlane = "in-plane",
    gravity = false,
    revolutions = 5,
    stepsPerRevolution = 200,
  }: { tiltPlane?: "in-plane" | "out-of-plane"; gravity?: boolean; revolutions?: number; stepsPerRevolution?: number } = {},
): number {
  const p: Vec = [model.trueRadius, 0, 0];
  const c = Math.cos(model.tilt);
  const s = Math.sin(model.tilt);
  const axis: Vec = tiltPlane === "in-plane" ? [-c, s, 0] : [-c, 0, s];
  const h = (2 * Math.PI) / angularSpeed / stepsPerRevolution;
  const delta = 1e-4 / angularSpeed;
  let estimated = 0;
  let truth = 0;
  for (let i = 0; i < revolutions * stepsPerRevolution; i++) {
    const t = i * h;
    const at = (tau: number) => rotateZ(p, angularSpeed * tau);
    const [m, z0, q] = [at(t - delta), at(t), at(t + delta)];
    const accWorld: Vec = [0, 1, 2].map((k) => (q[k]! - 2 * z0[k]! + m[k]!) / (delta * delta)) as Vec;
    // an accelerometer reads specific force: acceleration minus gravity (gravity along −z)
    const specific: Vec = gravity ? [accWorld[0], accWorld[1], accWorld[2] + STANDARD_GRAVITY] : accWorld;
    const body = rotateZ(specific, -angularSpeed * t);
    const reading = (1 + model.scaleError) * dot(axis, body) + model.bias;
    estimated += Math.sqrt((reading - model.biasCorrection) / model.assumedRadius) * h;
    truth += angularSpeed * h;
  }
  return (estimated - truth) / revolutions;
}

describe("heading drift: reference cases", () => {
  const driftCases = [
    {
      source: "common practice",
      locator: "assumed radius 8 mm, true 9 mm: ω̂/ω = √(9/8) ≈ 1.0607",
      inputs: { ...EXACT, assumedRadius: 0.008, trueRadius: 0.009, angularSpeed: rpmToRadPerSecond(2000) },
      output: (p: ReturnType<typeof headingDriftAt>) => p.speedRatio!,
      expected: 1.0607,
      rtol: 5e-5,
      note: "printed to 5 significant figures; half a unit in the last digit",
    },
    {
      source: "common practice",
      locator: "the same mismatch gives ≈ 21.8° of drift per revolution",
      inputs: { ...EXACT, assumedRadius: 0.008, trueRadius: 0.009, angularSpeed: rpmToRadPerSecond(1500) },
      output: (p: ReturnType<typeof headingDriftAt>) => toDeg(p.driftPerRevolution!),
      expected: 21.8,
      rtol: 5e-3,
      note: "3 significant figures; the angle per revolution does not depend on speed",
    },
    {
      source: "DERIVED-EXACT from ω̂ = √(a/r̂), a = ω²r",
      locator: "radius only: ω̂/ω = √(r/r̂) = √(9/8)",
      inputs: { ...EXACT, assumedRadius: 0.008, trueRadius: 0.009, angularSpeed: 100 },
      output: (p: ReturnType<typeof headingDriftAt>) => p.speedRatio!,
      expected: Math.sqrt(9 / 8),
      rtol: 1e-12,
      note: "floating point only",
    },
    {
      source: "DERIVED-EXACT from a_meas = (1 + k)ω²r",
      locator: "scale error k = 0.21: ω̂/ω = √1.21 = 1.1, so 36° per revolution",
      inputs: { ...EXACT, scaleError: 0.21, angularSpeed: 200 },
      output: (p: ReturnType<typeof headingDriftAt>) => toDeg(p.driftPerRevolution!),
      expected: 36,
      rtol: 1e-12,
      note: "floating point only",
    },
    {
      source: "DERIVED-EXACT from a_meas = ω²r cos θ",
      locator: "tilt 60°: ω̂/ω = √cos 60° = √0.5",
      inputs: { ...EXACT, tilt: 60 * DEG, angularSpeed: 300 },
      output: (p: ReturnType<typeof headingDriftAt>) => p.speedRatio!,
      expected: Math.SQRT1_2,
      rtol: 1e-12,
      note: "floating point only",
    },
    {
      source: "DERIVED-EXACT from a_meas = ω²r + b",
      locator: "offset b − b̂ = 0.3 m/s², r̂ = 10 mm, ω² = 30 rad²/s²: ω̂² = 60, ratio √2",
      inputs: { ...EXACT, assumedRadius: 0.01, trueRadius: 0.01, bias: 0.3, angularSpeed: Math.sqrt(30) },
      output: (p: ReturnType<typeof headingDriftAt>) => p.speedRatio!,
      expected: Math.SQRT2,
      rtol: 1e-12,
      note: "floating point only",
    },
  ];
  it.each(driftCases)("$source — $locator", ({ inputs, output, expected, rtol }) => {
    const got = output(headingDriftAt(inputs));
    expect(Math.abs(got - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));
  });

  const timingCases = [
    {
      source: "openstax-up1-rotational-kinematics",
      locator: "§10.1 θ = ωt: 3000 rpm = 18 000 °/s, so a 1 kHz loop steps 18°",
      inputs: { angularSpeed: rpmToRadPerSecond(3000), loopRate: 1000 },
      run: (i: { angularSpeed: number; loopRate: number }) => toDeg(headingStepPerLoop(i)),
      expected: 18,
      rtol: 1e-12,
      note: "DERIVED-EXACT",
    },
    {
      source: "openstax-up1-rotational-kinematics",
      locator: "§10.1 θ = ωt: 0.5 ms of latency at 3000 rpm is 9°",
      inputs: { angularSpeed: rpmToRadPerSecond(3000), loopRate: 1000 },
      run: (i: { angularSpeed: number }) => toDeg(latencyHeadingLag({ angularSpeed: i.angularSpeed, latency: 0.0005 })),
      expected: 9,
      rtol: 1e-12,
      note: "DERIVED-EXACT",
    },
  ];
  it.each(timingCases)("$source — $locator", ({ inputs, run, expected, rtol }) => {
    expect(Math.abs(run(inputs) - expected)).toBeLessThanOrEqual(rtol * expected);
  });

  const emaCases = [
    {
      source: "smith-dsp-1997",
      locator: "ch. 19: single-pole filter b₁ = e^(−1/d) decays to 36.8 % in d samples; d = 10",
      inputs: { smoothingFactor: 1 - Math.exp(-1 / 10), samplePeriod: 0.001 },
      expected: 0.01,
      rtol: 1e-12,
      note: "the relation is exact; floating point only",
    },
    {
      source: "smith-dsp-1997",
      locator: "ch. 19: d = 2.5 samples at 400 Hz",
      inputs: { smoothingFactor: 1 - Math.exp(-1 / 2.5), samplePeriod: 1 / 400 },
      expected: 2.5 / 400,
      rtol: 1e-12,
      note: "the relation is exact; floating point only",
    },
  ];
  it.each(emaCases)("$source — $locator", ({ inputs, expected, rtol }) => {
    expect(Math.abs(emaTimeConstant(inputs).exact - expected)).toBeLessThanOrEqual(rtol * expected);
  });
});

describe("heading drift: closed form against a kinematic simulation", () => {
  const models: { name: string; model: SpinRateErrorModel; rpm: number }[] = [
    { name: "radius mismatch (the demo robot)", model: { ...EXACT, assumedRadius: 0.012, trueRadius: 0.0127 }, rpm: 2800 },
    {
      name: "every error at once",
      model: { assumedRadius: 0.02, trueRadius: 0.0207, scaleError: -0.03, bias: 0.8, biasCorrection: 0.2, tilt: 7 * DEG },
      rpm: 900,
    },
    { name: "over-corrected offset at low speed", model: { ...EXACT, bias: 0.1, biasCorrection: 2.5 }, rpm: 300 },
  ];
  // Tolerance: the second difference of positions carries a relative error of about 1e-8 in the
  // acceleration (truncation (ωδ)²/12 and round-off ε·r/δ²), i.e. ~1e-8 ω in the estimate, which
  // is below 1e-5 of these drifts.
  it.each(models)("matches the integrated heading over 5 revolutions: $name", ({ model, rpm }) => {
    const w = rpmToRadPerSecond(rpm);
    const closed = headingDriftAt({ ...model, angularSpeed: w }).driftPerRevolution!;
    const simulated = simulatedDriftPerRevolution(model, w);
    expect(Math.abs(simulated - closed)).toBeLessThanOrEqual(1e-5 * Math.abs(closed));
  });

  it("gives the same drift whether the axis tilts in the spin plane or out of it", () => {
    const model = { ...EXACT, tilt: 12 * DEG, trueRadius: 0.0125 };
    const w = 250;
    const a = simulatedDriftPerRevolution(model, w, { tiltPlane: "in-plane" });
    const b = simulatedDriftPerRevolution(model, w, { tiltPlane: "out-of-plane" });
    expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-6 * Math.abs(a));
  });

  it("treats gravity seen through an out-of-plane tilt as an offset of g·sin θ, as its doc says", () => {
    const model = { ...EXACT, tilt: 5 * DEG };
    const w = 150;
    const simulated = simulatedDriftPerRevolution(model, w, { tiltPlane: "out-of-plane", gravity: true });
    const closed = headingDriftAt({ ...model, bias: STANDARD_GRAVITY * Math.sin(model.tilt), angularSpeed: w }).driftPerRevolution!;
    expect(Math.abs(simulated - closed)).toBeLessThanOrEqual(1e-5 * Math.abs(closed));
  });
});

describe("heading drift: limiting cases and structure", () => {
  it("is exactly zero when the calibration is exact", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 0.1, max: 1e4, noNaN: true }),
        (radius, bias, w) => {
          const p = headingDriftAt({ ...EXACT, assumedRadius: radius, trueRadius: radius, bias, biasCorrection: bias, angularSpeed: w });
          return p.driftRate === 0 && p.driftPerRevolution === 0 && p.linear.total === 0;
        },
      ),
    );
  });

  it("is zero to round-off when the firmware radius absorbs scale error and tilt, (1 + k) r cos θ", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 0.2, noNaN: true }),
        fc.double({ min: -0.3, max: 0.3, noNaN: true }),
        fc.double({ min: 0, max: 1.3, noNaN: true }),
        fc.double({ min: 1, max: 1e4, noNaN: true }),
        (r, k, tilt, w) => {
          const assumedRadius = (1 + k) * r * Math.cos(tilt);
          const p = headingDriftAt({ ...EXACT, trueRadius: r, scaleError: k, tilt, assumedRadius, angularSpeed: w });
          return Math.abs(p.driftRate!) <= 1e-13 * w;
        },
      ),
    );
  });

  it("agrees with the linearised sum to second order as the errors shrink", () => {
    const base = { assumedRadius: 0.012, trueRadius: 0.0121, scaleError: 0.01, bias: 0.5, biasCorrection: 0.1, tilt: 3 * DEG };
    const w = 200;
    const errorAt = (s: number) => {
      const m = {
        assumedRadius: base.assumedRadius,
        trueRadius: base.assumedRadius + s * (base.trueRadius - base.assumedRadius),
        scaleError: s * base.scaleError,
        bias: s * base.bias,
        biasCorrection: s * base.biasCorrection,
        tilt: Math.sqrt(s) * base.tilt, // the tilt term is already second order in θ
      };
      const p = headingDriftAt({ ...m, angularSpeed: w });
      return Math.abs(p.driftRate! - p.linear.total);
    };
    // halving every first-order error should quarter the gap (ratio 4 ± 10 %)
    const ratio = errorAt(0.02) / errorAt(0.01);
    expect(ratio).toBeGreaterThan(3.6);
    expect(ratio).toBeLessThan(4.4);
  });

  it("reports each term alone exactly as the full formula does with only that term", () => {
    const w = 180;
    const p = headingDriftAt({ assumedRadius: 0.01, trueRadius: 0.011, scaleError: 0.05, bias: 3, biasCorrection: 1, tilt: 10 * DEG, angularSpeed: w });
    expect(p.alone.radius).toBeCloseTo(headingDriftAt({ ...EXACT, assumedRadius: 0.01, trueRadius: 0.011, angularSpeed: w }).driftRate!, 12);
    expect(p.alone.scale).toBeCloseTo(headingDriftAt({ ...EXACT, scaleError: 0.05, angularSpeed: w }).driftRate!, 12);
    expect(p.alone.tilt).toBeCloseTo(headingDriftAt({ ...EXACT, tilt: 10 * DEG, angularSpeed: w }).driftRate!, 12);
    expect(p.alone.bias!).toBeCloseTo(
      headingDriftAt({ ...EXACT, assumedRadius: 0.01, trueRadius: 0.01, bias: 3, biasCorrection: 1, angularSpeed: w }).driftRate!,
      12,
    );
  });

  it("grows the radius and scale terms in proportion to speed and shrinks the offset term as 1/ω", () => {
    const m = { ...EXACT, trueRadius: 0.0125, scaleError: 0.02, bias: 2 };
    const a = headingDriftAt({ ...m, angularSpeed: 100 }).linear;
    const b = headingDriftAt({ ...m, angularSpeed: 300 }).linear;
    expect(b.radius / a.radius).toBeCloseTo(3, 12);
    expect(b.scale / a.scale).toBeCloseTo(3, 12);
    expect(b.bias / a.bias).toBeCloseTo(1 / 3, 12);
    expect(b.speedProportional / a.speedProportional).toBeCloseTo(3, 12);
    expect(a.speedProportional).toBeCloseTo(a.radius + a.scale + a.tilt, 15);
  });

  it("reports no estimate (not NaN) below the speed where the corrected reading reaches zero", () => {
    const m = { ...EXACT, bias: 0, biasCorrection: 0.5 * STANDARD_GRAVITY };
    const w0 = lowestEstimableSpeed(m);
    expect(w0).toBeCloseTo(Math.sqrt((0.5 * STANDARD_GRAVITY) / 0.012), 10);
    const below = headingDriftAt({ ...m, angularSpeed: 0.9 * w0 });
    expect(below).toMatchObject({ defined: false, estimate: null, driftRate: null, driftPerRevolution: null, speedRatio: null });
    expect(below.correctedReading).toBeLessThan(0);
    expect(below.alone.bias).toBeNull();
    expectAllFinite(below);
    expect(headingDriftAt({ ...m, angularSpeed: 1.1 * w0 }).defined).toBe(true);
    expect(lowestEstimableSpeed({ ...m, biasCorrection: -1 })).toBe(0);
  });

  it("spaces the series evenly and ends exactly at the top speed", () => {
    const s = headingDriftSeries({ ...EXACT, trueRadius: 0.0127, lowSpeed: 100, highSpeed: 300, points: 5 });
    expect(s.map((p) => p.angularSpeed)).toEqual([100, 150, 200, 250, 300]);
  });
});

describe("heading drift: the radius band and the speed range", () => {
  it("puts the band's ends exactly where the drift equals the budget", () => {
    const m = { ...EXACT, trueRadius: 0.0127, scaleError: 0.01, bias: 1.5, biasCorrection: 0.5, tilt: 4 * DEG };
    const w = rpmToRadPerSecond(2400);
    const budget = 10 * DEG;
    const band = assumedRadiusBand({ ...m, angularSpeed: w, budget });
    expect(band.status).toBe("bounded");
    expect(headingDriftAt({ ...m, assumedRadius: band.low!, angularSpeed: w }).driftRate!).toBeCloseTo(budget, 10);
    expect(headingDriftAt({ ...m, assumedRadius: band.high!, angularSpeed: w }).driftRate!).toBeCloseTo(-budget, 10);
    expect(headingDriftAt({ ...m, assumedRadius: band.zeroDriftRadius!, angularSpeed: w }).driftRate!).toBeCloseTo(0, 12);
  });

  it("leaves the band open above when the budget is at least the spin rate, and says so", () => {
    const band = assumedRadiusBand({ ...EXACT, angularSpeed: 5, budget: 6 });
    expect(band).toMatchObject({ status: "upper-unbounded", high: null });
    expect(band.low).toBeGreaterThan(0);
  });

  it("has no band when the corrected reading is not positive", () => {
    expect(assumedRadiusBand({ ...EXACT, biasCorrection: 100, angularSpeed: 10, budget: 0.1 })).toEqual({
      status: "no-estimate",
      low: null,
      high: null,
      zeroDriftRadius: null,
    });
  });

  it("finds the speed range that dense sampling of the exact drift finds (fast-check)", () => {
    const grid = Array.from({ length: 3000 }, (_, i) => 1e-2 * 10 ** ((6 * i) / 2999)); // 0.01 to 10 000 rad/s
    fc.assert(
      fc.property(
        fc.double({ min: 0.005, max: 0.03, noNaN: true }),
        fc.double({ min: -0.05, max: 0.05, noNaN: true }),
        fc.double({ min: -0.05, max: 0.05, noNaN: true }),
        fc.double({ min: -5, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        (r, dr, k, db, tilt, budget) => {
          const m = { assumedRadius: r, trueRadius: r * (1 + dr), scaleError: k, bias: db, biasCorrection: 0, tilt };
          const range = speedRangeWithinBudget({ ...m, budget });
          for (const w of grid) {
            const p = headingDriftAt({ ...m, angularSpeed: w });
            const inside = p.driftRate !== null && Math.abs(p.driftRate) <= budget;
            const inRange =
              range.low !== null && w >= range.low && (range.high === null || w <= range.high) && !(w === range.low && range.lowLimit === "estimate-undefined");
            if (inside !== inRange) {
              const nearEdge = [range.low, range.high].some((e) => e !== null && Math.abs(w - e) <= 1e-7 * Math.max(w, 1));
              if (!nearEdge) return false;
            }
          }
          return true;
        },
      ),
      { numRuns: 60 },
    );
  });

  it("ends a bounded range where the drift reaches the budget", () => {
    const m = { ...EXACT, assumedRadius: 0.01269, trueRadius: 0.0127, bias: 0.02 * STANDARD_GRAVITY };
    const budget = 10 * DEG;
    const r = speedRangeWithinBudget({ ...m, budget });
    expect(r).toMatchObject({ status: "bounded", lowLimit: "budget", highLimit: "budget" });
    expect(Math.abs(headingDriftAt({ ...m, angularSpeed: r.low! }).driftRate!)).toBeCloseTo(budget, 10);
    expect(Math.abs(headingDriftAt({ ...m, angularSpeed: r.high! }).driftRate!)).toBeCloseTo(budget, 10);
  });

  it("is unbounded above when only an offset is left, since its drift falls as 1/ω", () => {
    const r = speedRangeWithinBudget({ ...EXACT, bias: 2, budget: 0.5 });
    expect(r).toMatchObject({ status: "unbounded-above", high: null, highLimit: "none", lowLimit: "budget" });
    // linear estimate of the low end: (b/r̂)/(2ω) = D
    expect(r.low!).toBeCloseTo(2 / 0.012 / (2 * 0.5), -1);
  });

  it("starts at standstill when the drift never reaches the budget at low speed", () => {
    const r = speedRangeWithinBudget({ ...EXACT, trueRadius: 0.0121, budget: 1 });
    expect(r).toMatchObject({ status: "bounded", low: 0, lowLimit: "standstill", highLimit: "budget" });
  });

  it("starts where the estimate appears when an over-corrected offset costs less than the budget", () => {
    const m = { ...EXACT, biasCorrection: 0.01 };
    const r = speedRangeWithinBudget({ ...m, budget: 2 });
    expect(r).toMatchObject({ status: "unbounded-above", lowLimit: "estimate-undefined" });
    expect(r.low!).toBeCloseTo(lowestEstimableSpeed(m), 12);
  });

  it("is empty, not NaN, when no speed meets the budget", () => {
    const r = speedRangeWithinBudget({ ...EXACT, trueRadius: 0.0127, bias: 0.2 * STANDARD_GRAVITY, budget: 10 * DEG });
    expect(r).toEqual({ status: "empty", low: null, high: null, lowLimit: "none", highLimit: "none" });
  });
});

describe("heading drift: the calculator entry", () => {
  it("runs on its declared defaults and finds them over budget", () => {
    const r = headingDrift(defaultsOf(headingDriftInputs));
    expect(r.verdict).toBe("over-budget");
    // margin = budget − |drift| = 10 − 366.75 °/s
    expect(toDeg(r.budgetMargin!)).toBeCloseTo(10 - 366.75202097162, 8);
    expect(r.series).toHaveLength(61);
    expect(r.rateNoise).toBe(0);
  });

  it("estimates the rate scatter from reading noise to first order", () => {
    const input = { ...defaultsOf(headingDriftInputs), accelerationNoise: 0.5 * STANDARD_GRAVITY };
    const r = headingDrift(input);
    const est = r.atSpeed.estimate!;
    // finite-difference check of ∂ω̂/∂a
    const bumped = headingDriftAt({ ...input, bias: input.bias + 1e-3, angularSpeed: input.angularSpeed }).estimate!;
    expect(r.rateNoise!).toBeCloseTo((input.accelerationNoise * (bumped - est)) / 1e-3, 4);
  });

  it("never returns a non-finite number for any valid input (fast-check)", () => {
    fc.assert(
      fc.property(specsArbitrary(headingDriftInputs), (raw) => {
        const input: HeadingDriftInput = raw.lowSpeed < raw.highSpeed ? raw : { ...raw, lowSpeed: 0.1, highSpeed: 10000 };
        expectAllFinite(headingDrift(input));
      }),
      { numRuns: 150 },
    );
  });

  it("throws a CalcInputError naming every input that is out of range (fast-check)", () => {
    const names = Object.keys(headingDriftInputs) as (keyof typeof headingDriftInputs)[];
    fc.assert(
      fc.property(fc.constantFrom(...names), fc.constantFrom("below", "above", "nan"), (name, how) => {
        const spec = headingDriftInputs[name];
        const bad = how === "nan" ? Number.NaN : how === "below" ? spec.min - 1 : spec.max * 2 + 1;
        const input = { ...defaultsOf(headingDriftInputs), [name]: bad };
        try {
          headingDrift(input);
        } catch (e) {
          return e instanceof CalcInputError && e.param === name;
        }
        return false;
      }),
    );
  });

  it("explains a bad radius in words and SI", () => {
    const call = () => headingDrift({ ...defaultsOf(headingDriftInputs), assumedRadius: 0 });
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow("assumedRadius must be at least 0.0001 m and at most 1 m (got 0 m)");
  });

  it("rejects a plot range that runs backwards", () => {
    expect(() => headingDrift({ ...defaultsOf(headingDriftInputs), lowSpeed: 300, highSpeed: 200 })).toThrow(
      "highSpeed must be greater than lowSpeed (300 rad/s) (got 200 rad/s)",
    );
  });

  it("rejects a tilt of 90° and a scale error of −100 %", () => {
    expect(() => headingDriftAt({ ...EXACT, tilt: Math.PI / 2, angularSpeed: 1 })).toThrow("tilt must be at least 0 rad and less than π/2 rad (90°)");
    expect(() => headingDriftAt({ ...EXACT, scaleError: -1, angularSpeed: 1 })).toThrow(CalcInputError);
    expect(() => headingDriftAt({ ...EXACT, scaleError: -1, angularSpeed: 1 })).toThrow("scaleError must be greater than −1 (got -1)");
    expect(() => headingDriftAt({ ...EXACT, angularSpeed: 0 })).toThrow("angularSpeed must be greater than 0 rad/s (got 0 rad/s)");
  });
});

describe("timing", () => {
  it("inverts the step and the arc exactly", () => {
    const w = rpmToRadPerSecond(2750);
    const f = loopRateForStep({ angularSpeed: w, targetStep: 4 * DEG });
    expect(headingStepPerLoop({ angularSpeed: w, loopRate: f })).toBeCloseTo(4 * DEG, 14);
    const t = onTimeForArc({ angularSpeed: w, targetArc: 25 * DEG });
    expect(beaconArc({ angularSpeed: w, onTime: t })).toBeCloseTo(25 * DEG, 14);
  });

  it("reports the defaults: 18° steps against a 5° target, an 18° arc against 20°", () => {
    const r = headingTiming(defaultsOf(headingTimingInputs));
    expect(toDeg(r.headingStep)).toBeCloseTo(18, 10);
    expect(toDeg(r.arcWidth)).toBeCloseTo(18, 10);
    expect(r.loopRateNeeded).toBeCloseTo(3600, 8);
    expect(r.updatesPerRevolution).toBeCloseTo(20, 10);
    expect(r).toMatchObject({ stepOk: false, arcOk: true, verdict: "step-too-large", onTimeBelowLoopPeriod: false });
  });

  it("never returns a non-finite number for any valid input (fast-check)", () => {
    fc.assert(
      fc.property(specsArbitrary(headingTimingInputs), (input: HeadingTimingInput) => expectAllFinite(headingTiming(input))),
      { numRuns: 200 },
    );
  });

  it("throws a CalcInputError for a zero loop rate", () => {
    expect(() => headingTiming({ ...defaultsOf(headingTimingInputs), loopRate: 0 })).toThrow(
      "loopRate must be at least 1 Hz and at most 1000000 Hz (got 0 Hz)",
    );
    expect(() => headingStepPerLoop({ angularSpeed: 1, loopRate: -5 })).toThrow(CalcInputError);
  });
});

describe("smoothing", () => {
  /** Runs median-of-N (optional) then the EMA over the samples; returns the outputs. */
  function filter(samples: readonly number[], alpha: number, medianLength = 1): number[] {
    const window: number[] = [];
    let y = samples[0]!;
    return samples.map((x) => {
      window.push(x);
      while (window.length < medianLength) window.unshift(samples[0]!);
      if (window.length > medianLength) window.shift();
      const m = [...window].sort((a, b) => a - b)[(medianLength - 1) / 2]!;
      y += alpha * (m - y);
      return y;
    });
  }

  it("steps to 1 − 1/e of a step after one time constant (discrete response 1 − (1 − α)^n)", () => {
    const alpha = 0.05;
    const dt = 0.002;
    const out = filter([0, ...Array<number>(400).fill(1)], alpha);
    const tau = emaTimeConstant({ smoothingFactor: alpha, samplePeriod: dt }).exact;
    const n = 37;
    expect(out[n]!).toBeCloseTo(1 - Math.exp((-n * dt) / tau), 12);
  });

  it("approaches Δt/α as α shrinks", () => {
    const a = emaTimeConstant({ smoothingFactor: 1e-4, samplePeriod: 1 });
    expect(a.exact / a.smallFactorApproximation).toBeCloseTo(1, 3); // 1 − α/2 + …
    expect(emaTimeConstant({ smoothingFactor: 1, samplePeriod: 1 }).exact).toBe(0);
    expect(emaFactorForTimeConstant({ timeConstant: emaTimeConstant({ smoothingFactor: 0.3, samplePeriod: 0.01 }).exact, samplePeriod: 0.01 })).toBeCloseTo(
      0.3,
      14,
    );
  });

  it("lags a ramp by Δt(1 − α)/α exactly once settled (simulation)", () => {
    const alpha = 0.08;
    const dt = 1e-3;
    const accel = 250;
    const ramp = Array.from({ length: 2000 }, (_, n) => accel * n * dt);
    const out = filter(ramp, alpha);
    const lag = (ramp[1999]! - out[1999]!) / accel;
    expect(lag).toBeCloseTo(emaRampLag({ smoothingFactor: alpha, samplePeriod: dt }), 12);
  });

  it("leaves Δω × total delay of heading error after a spin-up, with or without a median (simulation)", () => {
    const dt = 1e-3;
    const accel = 200;
    const dw = 100; // 500 samples of ramp
    for (const [alpha, med] of [
      [0.1, 1],
      [0.03, 3],
      [0.5, 5],
    ] as const) {
      const x = Array.from({ length: 4000 }, (_, n) => Math.min(accel * n * dt, dw));
      const y = filter(x, alpha, med);
      const error = x.reduce((acc, xi, i) => acc + (xi - y[i]!) * dt, 0);
      const input: HeadingSmoothingInput = {
        ...defaultsOf(headingSmoothingInputs),
        sampleRate: 1 / dt,
        smoothingFactor: alpha,
        spinUpAcceleration: accel,
        speedChange: dw,
        medianLength: med,
      };
      expect(error).toBeCloseTo(headingSmoothing(input).headingErrorAfterSpinUp, 9);
      if (med === 1) {
        const atEnd = x.slice(0, 501).reduce((acc, xi, i) => acc + (xi - y[i]!) * dt, 0);
        expect(atEnd).toBeCloseTo(headingSmoothing(input).headingErrorAtRampEnd, 9);
      }
    }
  });

  it("moves the estimate by α·S on the spike's sample, keeps its whole heading error, and a median of 3 removes it (simulation)", () => {
    const alpha = 0.2;
    const dt = 1e-3;
    const base = 200;
    const spike = 80;
    const x = Array.from({ length: 400 }, (_, n) => (n === 10 ? base + spike : base));
    const y = filter(x, alpha);
    expect(y[10]! - base).toBeCloseTo(alpha * spike, 10);
    expect(y[13]! - base).toBeCloseTo(alpha * (1 - alpha) ** 3 * spike, 10);
    expect(y.reduce((acc, yi) => acc + (yi - base) * dt, 0)).toBeCloseTo(spike * dt, 12);
    expect(filter(x, alpha, 3).every((v) => v === base)).toBe(true);
  });

  it("turns an acceleration spike into a rate spike through the square root", () => {
    const w = 209.4;
    const r = 0.012;
    const s = 50 * STANDARD_GRAVITY;
    expect(spikeRateError({ angularSpeed: w, assumedRadius: r, spike: s })).toBeCloseTo(Math.sqrt(w * w + s / r) - w, 9);
    expect(spikeRateError({ angularSpeed: w, assumedRadius: r, spike: 0 })).toBe(0);
  });

  it("reports the spike figures for an EMA alone and for a median in front", () => {
    const base = { ...defaultsOf(headingSmoothingInputs), medianLength: 1, smoothingFactor: 0.5 };
    const r = headingSmoothing(base);
    expect(r.spikeFirstShift).toBeCloseTo(0.5 * r.spikeRateError, 12);
    expect(r.spikeSettleSamples).toBe(6); // 0.5·0.5⁶ = 0.0078 < 0.01 ≤ 0.5·0.5⁵
    expect(r.spikeHeadingError).toBeCloseTo(r.spikeRateError * r.samplePeriod, 12);
    const m = headingSmoothing({ ...base, medianLength: 5 });
    expect(m).toMatchObject({ spikeFirstShift: 0, spikeHeadingError: 0, spikesRejectedPerWindow: 2 });
    expect(m.medianDelay).toBeCloseTo(2 * m.samplePeriod, 15);
  });

  it("shrinks white noise by √(α/(2 − α)) (roberts-1959; simulation, 3 % for 100 000 samples)", () => {
    let seed = 12345;
    const rand = () => {
      // mulberry32: a small, well-mixed 32-bit generator
      seed = (seed + 0x6d2b79f5) | 0;
      let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
      t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
      return ((t ^ (t >>> 14)) >>> 0) / 4294967296 - 0.5;
    };
    const alpha = 0.1;
    const x = Array.from({ length: 100000 }, rand);
    const y = filter(x, alpha).slice(1000);
    const variance = (v: number[]) => {
      const m = v.reduce((a, b) => a + b, 0) / v.length;
      return v.reduce((a, b) => a + (b - m) ** 2, 0) / v.length;
    };
    const ratio = Math.sqrt(variance(y) / variance(x));
    expect(Math.abs(ratio / emaNoiseFactor({ smoothingFactor: alpha }) - 1)).toBeLessThan(0.03);
  });

  it("gives a trade-off series with α rising to 1, where the EMA adds no delay", () => {
    const s = smoothingTradeoffSeries({ ...defaultsOf(headingSmoothingInputs), medianLength: 1 }, { points: 30 });
    expect(s).toHaveLength(30);
    expect(s[0]!.smoothingFactor).toBeCloseTo(0.005, 14);
    expect(s.at(-1)).toMatchObject({ smoothingFactor: 1, emaLag: 0, noiseFactor: 1, timeConstant: 0 });
    for (let i = 1; i < s.length; i++) expect(s[i]!.emaLag).toBeLessThan(s[i - 1]!.emaLag);
  });

  it("never returns a non-finite number for any valid input (fast-check)", () => {
    fc.assert(
      fc.property(specsArbitrary(headingSmoothingInputs), fc.integer({ min: 0, max: 7 }), (raw, k) => {
        const input = { ...raw, medianLength: 2 * k + 1 };
        expectAllFinite(headingSmoothing(input));
        expectAllFinite(smoothingTradeoffSeries(input, { points: 5 }));
      }),
      { numRuns: 150 },
    );
  });

  it("refuses an even median window and a smoothing factor of 0", () => {
    expect(() => headingSmoothing({ ...defaultsOf(headingSmoothingInputs), medianLength: 4 })).toThrow("medianLength must be an odd whole number (got 4)");
    expect(() => medianFilterDelay({ windowLength: 2, samplePeriod: 1 })).toThrow(CalcInputError);
    expect(() => emaRampLag({ smoothingFactor: 0, samplePeriod: 1 })).toThrow("smoothingFactor must be greater than 0 and at most 1 (got 0)");
  });
});

describe("two opposed sensors", () => {
  it("cancel any centre-of-mass offset and any common acceleration along their line (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.002, max: 0.1, noNaN: true }),
        fc.double({ min: 0.002, max: 0.1, noNaN: true }),
        fc.double({ min: -0.9, max: 0.9, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 5, max: 1000, noNaN: true }),
        (r1, r2, frac, aL, w) => {
          const e = frac * Math.min(r1, r2);
          const r = opposedSensorsDrift({ angularSpeed: w, radius1: r1, radius2: r2, offset: e, linearAcceleration: aL });
          return Math.abs(r.pair.driftRate!) <= 1e-12 * w && (aL !== 0 || Math.abs(r.offsetEstimate! - e) <= 1e-9 * Math.max(r1, r2));
        },
      ),
    );
  });

  it("drifts with one sensor exactly as a radius error of e does", () => {
    const w = rpmToRadPerSecond(2000);
    const r = opposedSensorsDrift({ angularSpeed: w, radius1: 0.012, radius2: 0.015, offset: 0.0005 });
    expect(r.sensor1.driftRate!).toBeCloseTo(headingDriftAt({ ...EXACT, assumedRadius: 0.012, trueRadius: 0.0115, angularSpeed: w }).driftRate!, 12);
    expect(r.sensor2.driftRate!).toBeCloseTo(headingDriftAt({ ...EXACT, assumedRadius: 0.015, trueRadius: 0.0155, angularSpeed: w }).driftRate!, 12);
  });

  it("matches the vector kinematics of two inward-facing sensors on a translating, spinning body", () => {
    // sensor 1 at +x, sensor 2 at −x of the nominal centre; spin centre at +e; the body accelerates by aL along +x
    const [w, r1, r2, e, aL] = [150, 0.02, 0.018, 0.001, 30];
    const centripetal = (p: number): number => -w * w * p; // x-component of −ω² p
    const reading1 = -(centripetal(r1 - e) + aL); // axis −x̂
    const reading2 = centripetal(-(r2 + e)) + aL; // axis +x̂
    const r = opposedSensorsDrift({ angularSpeed: w, radius1: r1, radius2: r2, offset: e, linearAcceleration: aL });
    expect(r.sensor1.estimate!).toBeCloseTo(Math.sqrt(reading1 / r1), 12);
    expect(r.sensor2.estimate!).toBeCloseTo(Math.sqrt(reading2 / r2), 12);
  });

  it("reports a sensor that ends up beyond the spin centre as giving no estimate", () => {
    const r = opposedSensorsDrift({ angularSpeed: 100, radius1: 0.01, radius2: 0.01, offset: 0.012 });
    expect(r.sensor1).toEqual({ defined: false, estimate: null, driftRate: null, driftPerRevolution: null });
    expect(r.pair.driftRate).toBe(0);
  });

  it("rejects a negative radius by name", () => {
    expect(() => opposedSensorsDrift({ angularSpeed: 100, radius1: -0.01, radius2: 0.01, offset: 0 })).toThrow(
      "radius1 must be greater than 0 m (got -0.01 m)",
    );
  });
});

describe("two opposed sensors: the calculator entry", () => {
  const defaults = defaultsOf(opposedSensorsInputs);

  it("compares one sensor with the pair over ±e: the worst single-sensor drift sits where the centre moves toward it", () => {
    // r₁ = r₂ = 12 mm, e = 0.5 mm, 2000 rpm: ω(√(11.5/12) − 1) = −4.4097 rad/s (hand: 209.44 × (0.978945 − 1))
    const r = opposedSensorsCheck(defaults);
    expect(r.singleWorstDriftRate!).toBeCloseTo(4.409746715664806, 10);
    expect(toDeg(r.singleWorstPerRevolution!)).toBeCloseTo(7.58, 2);
    expect(r.pairWorstDriftRate).toBeLessThanOrEqual(1e-12);
    expect(r.towardSensor2.sensor1.driftRate!).toBeCloseTo(4.318794787657803, 10);
  });

  it("gives no single-sensor figure (not NaN) once the uncertainty reaches the sensor's radius", () => {
    const r = opposedSensorsCheck({ ...defaults, offset: 0.013 });
    expect(r.singleWorstDriftRate).toBeNull();
    expect(r.singleWorstPerRevolution).toBeNull();
    expect(r.pairWorstDriftRate).toBeLessThanOrEqual(1e-12);
  });

  it("is exact for a perfectly centred robot", () => {
    const r = opposedSensorsCheck({ ...defaults, offset: 0 });
    expect(r.singleWorstDriftRate).toBe(0);
  });

  it("rejects an input outside its declaration by name", () => {
    expect(() => opposedSensorsCheck({ ...defaults, radius2: 0 })).toThrow(CalcInputError);
    expect(() => opposedSensorsCheck({ ...defaults, offset: -0.001 })).toThrow("offset must be at least 0 m and at most 0.1 m (got -0.001 m)");
  });
});

describe("input declarations", () => {
  const all = { headingDriftInputs, headingTimingInputs, headingSmoothingInputs, opposedSensorsInputs };
  it.each(Object.entries(all))("%s: every default passes its own check, with a label, help and a short unique URL key", (_, specs) => {
    const keys = Object.values(specs).map((s) => s.urlKey);
    expect(new Set(keys).size).toBe(keys.length);
    for (const spec of Object.values(specs) as InputSpecs[string][]) {
      expect(checkValue(spec, spec.default, "metric")).toBeNull();
      expect(spec.urlKey.length).toBeLessThanOrEqual(6);
      expect(spec.label.length).toBeGreaterThan(0);
      expect(spec.help?.length ?? 0).toBeGreaterThan(0);
    }
  });
});

describe("source keys", () => {
  it("names only keys that exist in the bibliography, in every doc comment of calc/heading/drift.ts and calc/heading/timing.ts", () => {
    const text = ["heading/drift.ts", "heading/timing.ts"].map((f) => readFileSync(new URL(`../../calc/${f}`, import.meta.url), "utf8")).join("\n");
    const keys = [...text.matchAll(/Sources: ([^\n]+)/g)].flatMap((m) => m[1]!.replace(/\.$/, "").split(/,\s*/));
    expect(keys.length).toBeGreaterThan(10);
    for (const key of keys) expect(isSourceKey(key.trim()), key).toBe(true);
  });
});

describe("regression pins (our own digits, not outside references)", () => {
  it("pins the chapter's invented demo spinner: 12.0 mm assumed, 12.7 mm true", () => {
    const ex = demoSpinnerRadiusExample();
    expect(ex.speedRatio).toBeCloseTo(1.028753290800731, 12);
    expect(ex.rows[0]!.driftRateDegreesPerSecond).toBeCloseTo(207.02369376526, 8);
    expect(ex.rows[1]!.driftRateDegreesPerSecond).toBeCloseTo(483.05528545228, 8);
    expect(ex.rows[0]!.driftPerRevolutionDegrees).toBeCloseTo(10.351184688263, 9);
    expect(ex.rows[1]!.driftPerRevolutionDegrees).toBeCloseTo(10.351184688263, 9);
    expect(ex.bandAtTopSpeed.low!).toBeCloseTo(0.012684894440825, 14);
    expect(ex.bandAtTopSpeed.high!).toBeCloseTo(0.0127151325574903, 14);
  });

  it("gives the demo band's half-width as a fraction of the true radius, (r̂_high − r̂_low)/(2r) ≈ 0.119 %", () => {
    // Half-width of the band over r, the definition in spinner-heading-practice; band edges pinned above.
    const ex = demoSpinnerRadiusExample();
    expect(ex.bandHalfWidthFraction!).toBeCloseTo((0.0127151325574903 - 0.012684894440825) / (2 * 0.0127), 12);
    expect(ex.bandHalfWidthFraction!).toBeCloseTo(0.00119047703, 10);
  });

  it("pins the drift calculator's defaults", () => {
    const r = headingDrift(defaultsOf(headingDriftInputs));
    expect(toDeg(r.atSpeed.driftRate!)).toBeCloseTo(366.75202097162, 8);
    expect(r.radiusBand.low!).toBeCloseTo(0.012723498296094, 14);
    expect(r.radiusBand.high!).toBeCloseTo(0.012765980731639, 14);
    expect(r.speedRange.status).toBe("empty");
  });

  it("pins the smoothing calculator's defaults: 10 ms of delay, −120 °/s during the spin-up, 180° after", () => {
    const r = headingSmoothing(defaultsOf(headingSmoothingInputs));
    expect(r.totalDelay).toBeCloseTo(0.01, 14);
    expect(toDeg(r.driftRateDuringSpinUp)).toBeCloseTo(-120, 9);
    expect(toDeg(r.headingErrorAfterSpinUp)).toBeCloseTo(180, 9);
    expect(r.spikeRateError).toBeCloseTo(81.637713390343, 9);
  });

  it("pins the opposed-sensor example: 12 mm each side, 0.5 mm offset, 2000 rpm", () => {
    const r = opposedSensorsDrift({ angularSpeed: rpmToRadPerSecond(2000), radius1: 0.012, radius2: 0.012, offset: 0.0005 });
    expect(r.sensor1.driftRate!).toBeCloseTo(-4.409746715664806, 10);
    expect(r.sensor2.driftRate!).toBeCloseTo(4.318794787657803, 10);
    expect(r.pair.driftRate).toBe(0);
  });
});
