import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";
import {
  basicRatingLife,
  BEARING_TYPE_OPTIONS,
  bearingCheck,
  equivalentDynamicLoad,
  equivalentStaticLoad,
  LIFE_EXPONENT,
  lifeExponent,
  ratingLifeHours,
  requiredDynamicLoadRating,
  STATIC_SAFETY_GUIDE,
  staticSafetyFactor,
  staticSafetyGuide,
} from "../../../calc/weapon/bearings.ts";
import { anyField, anyFinite, expectClose, expectFiniteOrNamedError } from "./support.ts";

const rpm = rpmToRadPerSecond;

describe("ISO 281 basic rating life against published worked examples", () => {
  const CASES = [
    {
      source:
        "A rolling-bearing manufacturer's general catalogue, calculation example 1 on basic rating life (deep-groove ball bearing, 45 mm bore, 03 series)",
      locator: "C = 55.3 kN, P = F_r = 10 kN: L10 = '169 million revolutions'",
      actual: () => basicRatingLife({ dynamicLoadRating: 55300, equivalentLoad: 10000, bearingType: "ball" }),
      expected: 169,
      rtol: 3e-3,
      note: "printed to 3 figures",
    },
    {
      source: "A rolling-bearing manufacturer's general catalogue, calculation example 1 on basic rating life",
      locator: "the same bearing at n = 3000 r/min: L10h = '940 operating hours'",
      actual: () =>
        ratingLifeHours({ ratingLife: basicRatingLife({ dynamicLoadRating: 55300, equivalentLoad: 10000, bearingType: "ball" }), angularSpeed: rpm(3000) }),
      expected: 940,
      rtol: 5.4e-4,
      note: "printed to 3 figures (our 939.5)",
    },
    {
      source: "A published exercise solution on ball-bearing life (ISO 281 form)",
      locator: "'L10 = (16/2)^3 = 512 million revolutions'",
      actual: () => basicRatingLife({ dynamicLoadRating: 16, equivalentLoad: 2, bearingType: "ball" }),
      expected: 512,
      rtol: 1e-15,
      note: "exact",
    },
    {
      source: "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 8th ed., solutions manual, problem 11-3 (straight roller bearing)",
      locator: "'FD = 1.4(1650) = 2310 lbf = 10.279 kN', 'C10 = 10.279 (1440/1)^(3/10) = 91.1 kN'",
      actual: () => requiredDynamicLoadRating({ equivalentLoad: 10279, ratingLife: 1440, bearingType: "roller" }),
      expected: 91100,
      rtol: 5.5e-4,
      note: "printed to 3 figures; the inverse of L10 = (C/P)^(10/3)",
    },
    {
      source: "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 8th ed., solutions manual, problem 11-2",
      locator: "design life 50 000 h at 480 rev/min: 'xD = 50 000(480)(60)/10^6 = 1440' rating lives, i.e. L10h = 50 000 h for L10 = 1440",
      actual: () => ratingLifeHours({ ratingLife: 1440, angularSpeed: rpm(480) }),
      expected: 50000,
      rtol: 1e-12,
      note: "exact arithmetic",
    },
    {
      source: "Budynas & Nisbett, Shigley's Mechanical Engineering Design, 8th ed., solutions manual, problem 11-1",
      locator: "30 000 h at 300 rev/min: 'xD = 30 000(300)(60)/10^6 = 540', i.e. L10h = 30 000 h for L10 = 540",
      actual: () => ratingLifeHours({ ratingLife: 540, angularSpeed: rpm(300) }),
      expected: 30000,
      rtol: 1e-12,
      note: "exact arithmetic",
    },
  ];
  it.each(CASES.map((c) => [`${c.source}: ${c.locator}`, c] as const))("%s", (_, c) => {
    expectClose(c.actual(), c.expected, c.rtol);
  });

  it("uses the ISO 281 exponents: 3 for ball bearings, 10/3 for roller bearings", () => {
    expect(lifeExponent({ bearingType: "ball" })).toBe(3);
    expect(lifeExponent({ bearingType: "roller" })).toBe(10 / 3);
    expect(LIFE_EXPONENT).toEqual({ ball: 3, roller: 10 / 3 });
  });

  it.each(BEARING_TYPE_OPTIONS.map((o) => o.value))("round-trips life and load rating for %s bearings", (bearingType) => {
    const life = basicRatingLife({ dynamicLoadRating: 12000, equivalentLoad: 2000, bearingType });
    expectClose(requiredDynamicLoadRating({ equivalentLoad: 2000, ratingLife: life, bearingType }), 12000, 1e-13);
  });

  it("regression pins (our own digits, not published): 5.4 kN on 1.2 kN at 9000 rpm gives 91.125 million revolutions and 168.75 h; a roller bearing of 12 kN on 2 kN gives 392.4980481", () => {
    const ball = basicRatingLife({ dynamicLoadRating: 5400, equivalentLoad: 1200, bearingType: "ball" });
    expectClose(ball, 91.125, 1e-12);
    expectClose(ratingLifeHours({ ratingLife: ball, angularSpeed: rpm(9000) }), 168.75, 1e-12);
    expectClose(basicRatingLife({ dynamicLoadRating: 12000, equivalentLoad: 2000, bearingType: "roller" }), 392.4980481, 1e-9);
  });

  it("halves the life in hours when the speed doubles, and divides it by 8 when a ball bearing's load doubles", () => {
    const at = (P: number, n: number) =>
      ratingLifeHours({ ratingLife: basicRatingLife({ dynamicLoadRating: 5000, equivalentLoad: P, bearingType: "ball" }), angularSpeed: n });
    expectClose(at(1000, 200) / at(1000, 400), 2, 1e-14);
    expectClose(at(1000, 200) / at(2000, 200), 8, 1e-14);
  });
});

describe("equivalent loads and the static safety factor", () => {
  it("takes P = F_r for a purely radial load (ISO 281: X = 1, Y = 0)", () => {
    expect(equivalentDynamicLoad({ radialLoad: 1234 })).toBe(1234);
  });

  it("combines radial and axial load as X·F_r + Y·F_a", () => {
    expectClose(equivalentDynamicLoad({ radialLoad: 1000, axialLoad: 400, radialFactor: 0.56, axialFactor: 1.71 }), 560 + 684, 1e-15);
  });

  it("ISO 76 for a deep-groove ball bearing: P0 = 0.6·F_r + 0.5·F_a, and P0 = F_r when that is larger (as printed in a bearing maker's technical pages)", () => {
    // 'P0r=0.6Fr+0.5Fa', 'when P0r<Fr ; P0r=Fr'
    expect(equivalentStaticLoad({ radialLoad: 1000 })).toBe(1000);
    expect(equivalentStaticLoad({ radialLoad: 1000, axialLoad: 700 })).toBe(1000); // 0.6·1000 + 0.5·700 = 950 < 1000
    expectClose(equivalentStaticLoad({ radialLoad: 1000, axialLoad: 1000 }), 1100, 1e-15);
    expect(equivalentStaticLoad({ radialLoad: 1000, axialLoad: 1000, radialFactor: 1, axialFactor: 0 })).toBe(1000);
  });

  it("gives s0 = C0/P0; regression pin (our own digits): 2.36 kN on 1.8 kN is 1.311111111", () => {
    expectClose(staticSafetyFactor({ staticLoadRating: 2360, staticEquivalentLoad: 1800 }), 1.311111111, 1e-9);
  });

  it("guideline table for s0 (rolling-bearing manufacturers' general catalogues, row 'Pronounced shock loads': ≥ 1,5 ≥ 2,5 ≥ 1,5 ≥ 3 ≥ 2 ≥ 4 ≥ 1 ≥ 2)", () => {
    const shock = STATIC_SAFETY_GUIDE.rotating.shock;
    expect([shock.unimportant.ball, shock.unimportant.roller, shock.normal.ball, shock.normal.roller, shock.high.ball, shock.high.roller]).toEqual([
      1.5, 2.5, 1.5, 3, 2, 4,
    ]);
    expect([STATIC_SAFETY_GUIDE.stationary.shock.ball, STATIC_SAFETY_GUIDE.stationary.shock.roller]).toEqual([1, 2]);
    expect(staticSafetyGuide({ bearingType: "ball" })).toBe(1.5);
    expect(staticSafetyGuide({ bearingType: "roller" })).toBe(3);
    expect(staticSafetyGuide({ bearingType: "roller", rotating: false })).toBe(2);
  });

  it("guideline table for s0, row 'Normal': 0,5 1 1 1,5 2 3,5 0,5 1", () => {
    const normal = STATIC_SAFETY_GUIDE.rotating.normal;
    expect([normal.unimportant.ball, normal.unimportant.roller, normal.normal.ball, normal.normal.roller, normal.high.ball, normal.high.roller]).toEqual([
      0.5, 1, 1, 1.5, 2, 3.5,
    ]);
    expect([STATIC_SAFETY_GUIDE.stationary.normal.ball, STATIC_SAFETY_GUIDE.stationary.normal.roller]).toEqual([0.5, 1]);
  });

  it("fails a static check below the shock guideline in the worked robot case: s0 = 1.31 < 1.5 for a rotating ball bearing", () => {
    const r = bearingCheck({
      bearingType: "ball",
      dynamicLoadRating: 5400,
      staticLoadRating: 2360,
      radialLoad: 1200,
      shockRadialLoad: 1800,
      angularSpeed: rpm(9000),
    });
    expect(r.staticSafetyFactor!).toBeLessThan(staticSafetyGuide({ bearingType: "ball" }));
    expectClose(r.ratingLifeHours!, 168.75, 1e-12);
  });

  it("reports an unlimited life and no static factor (null) for a bearing with no load", () => {
    const r = bearingCheck({ bearingType: "roller", dynamicLoadRating: 5400, staticLoadRating: 2360, radialLoad: 0, shockRadialLoad: 0, angularSpeed: 100 });
    expect(r).toMatchObject({ ratingLife: null, ratingLifeHours: null, staticSafetyFactor: null });
  });

  it("refuses an axial load on a roller bearing, naming axialLoad", () => {
    expect(() =>
      bearingCheck({
        bearingType: "roller",
        dynamicLoadRating: 5400,
        staticLoadRating: 2360,
        radialLoad: 10,
        shockRadialLoad: 10,
        axialLoad: 5,
        angularSpeed: 100,
      }),
    ).toThrow(expect.objectContaining({ name: "CalcInputError", param: "axialLoad" }));
  });

  it("names an unknown bearing type", () => {
    expect(() => basicRatingLife({ dynamicLoadRating: 1, equivalentLoad: 1, bearingType: "needle" })).toThrow(
      expect.objectContaining({ name: "CalcInputError", param: "bearingType" }),
    );
  });
});

describe("fuzz: never a non-finite number, every bad input a named CalcInputError", () => {
  const RUNS = { numRuns: 300 };
  const type = fc.constantFrom<unknown>("ball", "roller", "needle", null);
  const PRIMITIVES: [string, (x: Record<string, unknown>) => unknown, string[], Record<string, fc.Arbitrary<unknown>>][] = [
    ["equivalentDynamicLoad", (x) => equivalentDynamicLoad(x as never), ["radialLoad", "axialLoad", "radialFactor", "axialFactor"], {}],
    ["equivalentStaticLoad", (x) => equivalentStaticLoad(x as never), ["radialLoad", "axialLoad", "radialFactor", "axialFactor"], {}],
    ["basicRatingLife", (x) => basicRatingLife(x as never), ["dynamicLoadRating", "equivalentLoad"], { bearingType: type }],
    ["ratingLifeHours", (x) => ratingLifeHours(x as never), ["ratingLife", "angularSpeed"], {}],
    ["requiredDynamicLoadRating", (x) => requiredDynamicLoadRating(x as never), ["equivalentLoad", "ratingLife"], { bearingType: type }],
    ["staticSafetyFactor", (x) => staticSafetyFactor(x as never), ["staticLoadRating", "staticEquivalentLoad"], {}],
    [
      "bearingCheck",
      (x) => bearingCheck(x as never),
      ["dynamicLoadRating", "staticLoadRating", "radialLoad", "shockRadialLoad", "axialLoad", "radialFactor", "axialFactor", "angularSpeed"],
      { bearingType: type },
    ],
  ];
  it.each(PRIMITIVES.map((p) => [p[0], p] as const))("%s: finite over the whole double range, or a named CalcInputError", (_, [, fn, numeric, choices]) => {
    const names = [...numeric, ...Object.keys(choices)];
    for (const field of [anyFinite, anyField]) {
      fc.assert(
        fc.property(fc.record(Object.fromEntries(numeric.map((k) => [k, field]))), fc.record(choices), (numbers, picked) => {
          expectFiniteOrNamedError(() => fn({ ...numbers, ...picked }), names);
        }),
        RUNS,
      );
    }
    for (const nothing of [null, undefined]) expect(() => fn(nothing as never)).toThrow(expect.objectContaining({ name: "CalcInputError", param: "input" }));
  });

  it("staticSafetyGuide names a choice that is not in its lists", () => {
    expect(() => staticSafetyGuide({ bearingType: "ball", loading: "gentle" })).toThrow(expect.objectContaining({ param: "loading" }));
    expect(() => staticSafetyGuide({ bearingType: "ball", requirements: "extreme" })).toThrow(expect.objectContaining({ param: "requirements" }));
    expect(() => staticSafetyGuide({ bearingType: "ball", rotating: "yes" as unknown as boolean })).toThrow(expect.objectContaining({ param: "rotating" }));
    expect(() => staticSafetyGuide(null as never)).toThrow(expect.objectContaining({ param: "input" }));
  });
});
