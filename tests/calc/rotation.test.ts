import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  accelerometerPlacement,
  accelerometerPlacementInputs,
  angularSpeedForAcceleration,
  CalcInputError,
  centripetalAcceleration,
  centripetalAccelerationCurve,
  maxSensorRadius,
  minSensorRadius,
  partLoad,
  radiusForAcceleration,
  rpmToRadPerSecond,
  sensorCountSize,
  speedResolution,
  STANDARD_GRAVITY,
  type AccelerometerPlacementInput,
  type InputSpec,
} from "#calc";

const rel = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);

describe("centripetal acceleration a = ω²r: published and trade references", () => {
  const cases = [
    {
      source: "OpenStax College Physics",
      locator: "ch. 6, ultracentrifuge example (r = 7.50 cm, 7.5 × 10⁴ rev/min)",
      inputs: { rpm: 75000, radius: 0.075 },
      expected: 4.63e6,
      rtol: 5e-3, // printed to 3 significant figures (from memory; the recomputed value agrees)
      note: "answer printed as 4.63 × 10⁶ m/s²",
    },
    {
      source: "common practice",
      locator: "builders' rule of thumb: about 400 g at about 2000 rpm sits near 89 mm",
      inputs: { rpm: 2000, radius: 0.089 },
      expected: 400 * STANDARD_GRAVITY,
      rtol: 5e-3, // "about 400 g": 398.09 g is within half a percent
      note: "398.09 g",
    },
  ];
  it.each(cases)("$source, $locator", ({ inputs, expected, rtol }) => {
    const a = centripetalAcceleration({ angularSpeed: rpmToRadPerSecond(inputs.rpm), radius: inputs.radius });
    expect(rel(a, expected)).toBeLessThanOrEqual(rtol);
  });

  it("gives 398.09 g at 2000 rpm and 89 mm (computed in double precision from openstax-college-physics a_c = rω² and g_n; ± 0.01)", () => {
    const a = centripetalAcceleration({ angularSpeed: rpmToRadPerSecond(2000), radius: 0.089 });
    expect(Math.abs(a / STANDARD_GRAVITY - 398.09)).toBeLessThanOrEqual(0.01);
  });

  it("agrees with v²/r, the textbook's other form (OpenStax College Physics ch. 6)", () => {
    const omega = rpmToRadPerSecond(75000);
    const v = omega * 0.075;
    expect(rel(centripetalAcceleration({ angularSpeed: omega, radius: 0.075 }), (v * v) / 0.075)).toBeLessThan(1e-12);
  });

  it("puts ≈ 400 g at ≈ 89 mm when asked for the radius at 2000 rpm (common practice, inverse)", () => {
    const r = radiusForAcceleration({ angularSpeed: rpmToRadPerSecond(2000), acceleration: 400 * STANDARD_GRAVITY });
    expect(Math.abs(r - 0.089)).toBeLessThan(0.0005);
  });
});

describe("rotation: round trips and limiting cases", () => {
  const omega = fc.double({ min: 1e-2, max: 1e4, noNaN: true });
  const radius = fc.double({ min: 1e-4, max: 2, noNaN: true });

  it("goes radius → acceleration → radius unchanged (property)", () => {
    fc.assert(
      fc.property(omega, radius, (w, r) => {
        const a = centripetalAcceleration({ angularSpeed: w, radius: r });
        expect(rel(radiusForAcceleration({ angularSpeed: w, acceleration: a }), r)).toBeLessThan(1e-12);
        expect(rel(angularSpeedForAcceleration({ radius: r, acceleration: a }), w)).toBeLessThan(1e-12);
      }),
    );
  });

  it("reads exactly (1 − m)·F at r_max and top speed", () => {
    const topSpeed = rpmToRadPerSecond(3000);
    const r = maxSensorRadius({ fullScale: 200 * STANDARD_GRAVITY, margin: 0.2, topSpeed });
    expect(rel(centripetalAcceleration({ angularSpeed: topSpeed, radius: r }), 160 * STANDARD_GRAVITY)).toBeLessThan(1e-12);
  });

  it("resolves speed to exactly p at r_min and the lowest speed (inverse of speedResolution)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        (step, lowSpeed, resolution) => {
          const r = minSensorRadius({ step, lowSpeed, resolution });
          expect(rel(speedResolution({ step, angularSpeed: lowSpeed, radius: r }), resolution)).toBeLessThan(1e-9);
        },
      ),
    );
  });

  it("matches the small-step approximation Δω/ω ≈ Δa/(2a) when the step is tiny", () => {
    const a = centripetalAcceleration({ angularSpeed: 100, radius: 0.02 });
    const exact = speedResolution({ step: 1e-3, angularSpeed: 100, radius: 0.02 });
    expect(rel(exact, 1e-3 / (2 * a))).toBeLessThan(1e-5);
  });

  it("gives zero acceleration at zero speed or on the axis", () => {
    expect(centripetalAcceleration({ angularSpeed: 0, radius: 0.1 })).toBe(0);
    expect(centripetalAcceleration({ angularSpeed: 100, radius: 0 })).toBe(0);
  });
});

describe("part load F = m·ω²·r (Newton's second law, OpenStax University Physics §6.3)", () => {
  it("pulls 189.5 N for 50 g at 60 mm and 2400 rpm (regression pin, computed from the closed form)", () => {
    const load = partLoad({ mass: 0.05, radius: 0.06, angularSpeed: rpmToRadPerSecond(2400) });
    expect(load.force).toBeCloseTo(189.4964045, 6);
    expect(load.gLoad).toBeCloseTo(386.4651119, 6);
  });
});

describe("sensor count size Δa = S/2^b (a uniform quantiser, common practice: data-sheet sensitivity in g per count)", () => {
  it("gives 400 g / 4096 = 0.09765625 g per count for a ±200 g, 12-bit part (exact: 4096 is a power of two)", () => {
    // 400/4096 = 0.09765625 exactly; times g_n = 9.80665 m/s² (CGPM 1901).
    expect(sensorCountSize({ span: 400 * STANDARD_GRAVITY, bits: 12 })).toBe(0.09765625 * STANDARD_GRAVITY);
    expect(sensorCountSize({ span: 400 * STANDARD_GRAVITY, bits: 12 })).toBeCloseTo(0.957680664, 9);
  });

  it("halves with each extra bit (second method: repeated halving)", () => {
    let half = 32 * STANDARD_GRAVITY;
    for (let bits = 1; bits <= 16; bits++) {
      half /= 2;
      expect(sensorCountSize({ span: 32 * STANDARD_GRAVITY, bits })).toBe(half);
    }
  });

  it.each([
    { inputs: { span: 0, bits: 12 }, param: "span" },
    { inputs: { span: 1, bits: 0 }, param: "bits" },
    { inputs: { span: 1, bits: 33 }, param: "bits" },
    { inputs: { span: 1, bits: 12.5 }, param: "bits" },
    { inputs: { span: Number.NaN, bits: 12 }, param: "span" },
  ])("names $param for $inputs", ({ inputs, param }) => {
    expect(() => sensorCountSize(inputs)).toThrow(CalcInputError);
    try {
      sensorCountSize(inputs);
    } catch (e) {
      expect((e as CalcInputError).param).toBe(param);
    }
  });

  it("never returns a non-finite number over the whole double range (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: Number.MIN_VALUE, max: Number.MAX_VALUE, noNaN: true }), fc.integer({ min: 1, max: 32 }), (span, bits) => {
        expect(Number.isFinite(sensorCountSize({ span, bits }))).toBe(true);
      }),
    );
  });
});

describe("acceleration curve a_i = ω_i²r over evenly spaced speeds (OpenStax College Physics §6.2)", () => {
  it("gives 0, 480 and 1920 m/s² at 0, 200 and 400 rad/s and 12 mm (a = ω²r by hand)", () => {
    // 200² × 0.012 = 480; 400² × 0.012 = 1920.
    const c = centripetalAccelerationCurve({ radius: 0.012, maxSpeed: 400, intervals: 2 });
    expect(c.map((p) => p.angularSpeed)).toEqual([0, 200, 400]);
    expect(c[0]!.acceleration).toBe(0);
    expect(c[1]!.acceleration).toBeCloseTo(480, 9);
    expect(c[2]!.acceleration).toBeCloseTo(1920, 9);
  });

  it("agrees point by point with centripetalAcceleration and has intervals + 1 points", () => {
    const c = centripetalAccelerationCurve({ radius: 0.03, maxSpeed: rpmToRadPerSecond(3600), intervals: 60 });
    expect(c).toHaveLength(61);
    for (const p of c) expect(p.acceleration).toBe(centripetalAcceleration({ angularSpeed: p.angularSpeed, radius: 0.03 }));
  });

  it.each([
    { inputs: { radius: -1, maxSpeed: 1, intervals: 2 }, param: "radius" },
    { inputs: { radius: 1, maxSpeed: 0, intervals: 2 }, param: "maxSpeed" },
    { inputs: { radius: 1, maxSpeed: 1, intervals: 0 }, param: "intervals" },
    { inputs: { radius: 1, maxSpeed: 1, intervals: 2.5 }, param: "intervals" },
    { inputs: { radius: 1e300, maxSpeed: 1e300, intervals: 2 }, param: "maxSpeed" },
  ])("names $param for $inputs", ({ inputs, param }) => {
    try {
      centripetalAccelerationCurve(inputs);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CalcInputError);
      expect((e as CalcInputError).param).toBe(param);
    }
  });
});

describe("rotation: errors name the input and the allowed range", () => {
  it.each([
    { call: () => centripetalAcceleration({ angularSpeed: -1, radius: 0.1 }), message: "angularSpeed must be 0 rad/s or more (got -1 rad/s)" },
    { call: () => centripetalAcceleration({ angularSpeed: 1, radius: Number.NaN }), message: "radius must be a finite number (got not a number)" },
    { call: () => radiusForAcceleration({ angularSpeed: 0, acceleration: 1 }), message: "angularSpeed must be greater than 0 rad/s (got 0 rad/s)" },
    { call: () => maxSensorRadius({ fullScale: 100, margin: 1, topSpeed: 10 }), message: "margin must be at least 0 and less than 1 (got 1)" },
    { call: () => minSensorRadius({ step: 1, lowSpeed: 10, resolution: 0 }), message: "resolution must be greater than 0 and at most 1 (got 0)" },
    { call: () => partLoad({ mass: 0, radius: 0.1, angularSpeed: 10 }), message: "mass must be greater than 0 kg (got 0 kg)" },
  ])("throws CalcInputError: $message", ({ call, message }) => {
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow(message);
  });

  it("reports a lowest tracked speed above the top speed against lowSpeed", () => {
    const input = { ...defaults(), lowSpeed: rpmToRadPerSecond(3000), topSpeed: rpmToRadPerSecond(2000) };
    try {
      accelerometerPlacement(input);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CalcInputError);
      expect((error as CalcInputError).param).toBe("lowSpeed");
      expect((error as CalcInputError).expected).toBe("at most topSpeed (209.44 rad/s)");
    }
  });
});

function defaults(): AccelerometerPlacementInput {
  return Object.fromEntries(Object.entries(accelerometerPlacementInputs).map(([k, s]) => [k, s.default])) as AccelerometerPlacementInput;
}

/** Any valid placement input: every value drawn inside its declared range. */
const validInput = fc.record(
  Object.fromEntries(
    Object.entries(accelerometerPlacementInputs).map(([name, spec]) => [
      name,
      fc.double({ min: (spec as InputSpec).minOpen ? Math.max(spec.min, 0) + 1e-9 * (spec.max - spec.min) : spec.min, max: spec.max, noNaN: true }),
    ]),
  ) as { [K in keyof AccelerometerPlacementInput]: fc.Arbitrary<number> },
);

describe("accelerometer placement", () => {
  it("finds the demo window 8.65–15.9 mm at 3000/500 rpm, 12-bit ±200 g, 2 % (regression pin)", () => {
    const r = accelerometerPlacement({
      ...defaults(),
      topSpeed: rpmToRadPerSecond(3000),
      lowSpeed: rpmToRadPerSecond(500),
      radius: 0.012,
      step: (400 / 4096) * STANDARD_GRAVITY,
      resolution: 0.02,
    });
    expect(r.maxRadius * 1000).toBeCloseTo(15.897942, 5);
    expect(r.minRadius * 1000).toBeCloseTo(8.646535, 5);
    expect(r.verdict).toBe("fits");
    expect(r.fullScaleUsed).toBeCloseTo((314.1592653589793 ** 2 * 0.012) / (200 * STANDARD_GRAVITY), 12);
  });

  it("gives the outer edge with no headroom beside the one with it: r = F/ω², 19.87 mm for ±200 g at 3000 rpm (a = ω²r, OpenStax College Physics ch. 6)", () => {
    const r = accelerometerPlacement({ ...defaults(), topSpeed: rpmToRadPerSecond(3000), margin: 0.2 });
    // 200 × 9.80665 / (100π)² = 1961.33 / 98 696.04 = 0.0198724 m
    expect(r.maxRadiusNoHeadroom).toBeCloseTo((200 * STANDARD_GRAVITY) / (100 * Math.PI) ** 2, 15);
    expect(r.maxRadiusNoHeadroom * 1000).toBeCloseTo(19.8724, 4);
    expect(r.maxRadius / r.maxRadiusNoHeadroom).toBeCloseTo(0.8, 12);
  });

  it("says when no radius satisfies both limits", () => {
    const r = accelerometerPlacement({
      ...defaults(),
      topSpeed: rpmToRadPerSecond(3000),
      lowSpeed: rpmToRadPerSecond(500),
      step: (400 / 4096) * STANDARD_GRAVITY,
      resolution: 0.01,
    });
    expect(r.minRadius).toBeGreaterThan(r.maxRadius);
    expect(r.windowExists).toBe(false);
    expect(r.verdict).toBe("no-window");
  });

  it("flags a sensor outside r_max as too far out and inside r_min as too close in", () => {
    expect(accelerometerPlacement({ ...defaults(), radius: 0.05 }).verdict).toBe("too-far-out");
    expect(accelerometerPlacement({ ...defaults(), radius: 0.002, resolution: 0.05 }).verdict).toBe("too-close-in");
  });

  it("opens on defaults that fit (the first thing a reader sees is a working check)", () => {
    expect(accelerometerPlacement(defaults()).verdict).toBe("fits");
  });

  it("gives the other part's pull as the mass that weighs as much, F/g_n (W = m·g, Newton's second law), and its release speed v = ω·r (OpenStax College Physics §6.1)", () => {
    // 50 g at 60 mm and 2400 rpm: ω = 80π rad/s, F = 0.05 × (80π)² × 0.06 = 189.4964 N; g_n = 9.80665 m/s² exactly (CGPM 1901).
    const r = accelerometerPlacement({ ...defaults(), topSpeed: rpmToRadPerSecond(2400), partMass: 0.05, partRadius: 0.06 });
    expect(r.partHangingMass).toBeCloseTo((0.05 * (80 * Math.PI) ** 2 * 0.06) / 9.80665, 9);
    expect(r.partHangingMass).toBeCloseTo(19.3233, 4);
    // v = 80π × 0.06 = 4.8π = 15.0796 m/s.
    expect(r.partReleaseSpeed).toBeCloseTo(4.8 * Math.PI, 12);
  });

  it("uses the larger of step and noise", () => {
    const r = accelerometerPlacement({ ...defaults(), step: 0.1 * STANDARD_GRAVITY, noise: 0.5 * STANDARD_GRAVITY });
    expect(r.effectiveStep).toBe(0.5 * STANDARD_GRAVITY);
  });

  it("never gives a non-finite output for any valid input (property)", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        fc.pre(input.lowSpeed <= input.topSpeed);
        const r = accelerometerPlacement(input);
        for (const [key, value] of Object.entries(r)) {
          if (typeof value === "number") expect(Number.isFinite(value), key).toBe(true);
        }
        expect(Number.isFinite(r.part.force)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it("throws a named CalcInputError for any invalid value of any input (property)", () => {
    const names = Object.keys(accelerometerPlacementInputs) as (keyof AccelerometerPlacementInput)[];
    fc.assert(
      fc.property(
        fc.constantFrom(...names.filter((n) => n !== "partRadius" && n !== "noise")),
        fc.constantFrom(-1, 0, Number.NaN, Number.POSITIVE_INFINITY),
        (name, bad) => {
          fc.pre(!(name === "margin" && bad === 0));
          const input = { ...defaults(), [name]: bad };
          expect(() => accelerometerPlacement(input)).toThrow(CalcInputError);
        },
      ),
    );
  });
});
