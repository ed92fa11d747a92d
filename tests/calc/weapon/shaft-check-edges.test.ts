/**
 * The weapon shaft check at its edges: each verdict's sentence (shaft, bearings' static safety,
 * bearings' life; failing, thin, holding; dead and live shaft), a figure exactly at its threshold,
 * a rotor that loads neither the shaft nor the bearings' life, the rotor past mid-span and the
 * overhung rotor with the gyroscopic couple, and each refusal's wording.
 * The regression pins in the sentences are our own digits, rounded to two figures as shown.
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { MATERIALS } from "../../../calc/materials/materials.ts";
import { WEAPON_SHAFT_CHOICE_DEFAULTS, type WeaponShaftInput, weaponShaftCheck, weaponShaftInputs } from "../../../calc/weapon/shaft-check.ts";
import { defaultsOf, expectClose } from "./support.ts";

const DEFAULTS: WeaponShaftInput = { ...defaultsOf(weaponShaftInputs), ...WEAPON_SHAFT_CHOICE_DEFAULTS };
const TYPICAL = " (typical strength: the specified minimum can be lower)";
const FATIGUE = "; the live shaft's bending is fully reversed, so check fatigue too";
/** Bearings far stronger than the loads, so the shaft governs. */
const STRONG_BEARINGS = { staticLoadRating: 1e6, dynamicLoadRating: 1e6 };
/** A 30 mm shaft, far stiffer than the loads need, so the bearings govern. */
const STOUT_SHAFT = { shaftDiameter: 0.03 };

const check = (change: Partial<WeaponShaftInput>) => weaponShaftCheck({ ...DEFAULTS, ...change } as WeaponShaftInput);
const criterion = (r: ReturnType<typeof weaponShaftCheck>, name: string) => r.criteria.find((c) => c.criterion === name)!;

function refusal(change: Partial<WeaponShaftInput>): CalcInputError {
  try {
    check(change);
  } catch (error) {
    expect(error).toBeInstanceOf(CalcInputError);
    return error as CalcInputError;
  }
  return expect.unreachable("no CalcInputError");
}

describe("the sentence that gives the verdict", () => {
  it("a shaft that yields: its factor, the strength basis and the fail threshold", () => {
    const r = check({ ...STRONG_BEARINGS, shaftDiameter: 0.008 });
    expect([r.verdict, r.governs]).toEqual(["fails", "shaft-yield"]);
    expect(r.reason).toBe(`The shaft yields at the peak of a hit: safety factor 0.28 on yield${TYPICAL}, below 1.`);
  });

  it("a thin margin on a dead shaft: no fatigue note, since its bending stress does not reverse", () => {
    const r = check({ ...STRONG_BEARINGS, shaftDiameter: 0.013 });
    expect([r.verdict, r.governs, r.stressCycle]).toEqual(["marginal", "shaft-yield", "steady"]);
    expect(r.reason).toBe(`The shaft's safety factor on yield at the peak of a hit is 1.2${TYPICAL}, below 2.`);
  });

  it("a thin margin on a live shaft: the fatigue note, since its bending is fully reversed every turn", () => {
    const r = check({ ...STRONG_BEARINGS, shaft: "live", shaftDiameter: 0.014 });
    expect([r.verdict, r.governs, r.stressCycle]).toEqual(["marginal", "shaft-yield", "fully-reversed"]);
    expect(r.reason).toBe(`The shaft's safety factor on yield at the peak of a hit is 1.5${TYPICAL}, below 2${FATIGUE}.`);
  });

  it("every check holding with the shaft closest to its threshold, dead and live", () => {
    const quiet = { ...STOUT_SHAFT, impactForce: 0, turnRate: 0, dynamicLoadRating: 60000, staticLoadRating: 40000, marginalBelow: 10 };
    // Closeness is the figure over its thin threshold: the shaft 3800/10 = 380, the bearings 2100/1.5 = 1400.
    const dead = check(quiet);
    expect([dead.verdict, dead.governs]).toEqual(["holds", "shaft-yield"]);
    expect(dead.reason).toBe(`Every check holds; the closest is the shaft, at a safety factor of 3800 on yield at the peak of a hit${TYPICAL}.`);
    const live = check({ ...quiet, shaft: "live" });
    expect([live.verdict, live.governs]).toEqual(["holds", "shaft-yield"]);
    expect(live.reason).toBe(`Every check holds; the closest is the shaft, at a safety factor of 1600 on yield at the peak of a hit${TYPICAL}${FATIGUE}.`);
  });

  it("the bearings' static safety under a hit below the guideline for shock (1.5 for ball bearings), and above it", () => {
    const thin = check({ ...STOUT_SHAFT, staticLoadRating: 9000, dynamicLoadRating: 1e6 });
    expect([thin.verdict, thin.governs]).toEqual(["marginal", "bearing-static"]);
    expect(thin.reason).toBe("The bearings' static safety factor under a hit is 1.3, below the guideline of 1.5 for shock loads.");
    const holds = check({ ...STOUT_SHAFT, staticLoadRating: 20000, dynamicLoadRating: 1e6 });
    expect([holds.verdict, holds.governs]).toEqual(["holds", "bearing-static"]);
    expect(holds.reason).toBe("Every check holds; the closest is the bearings' static safety factor under a hit, 3 against a guideline of 1.5.");
  });

  it("the bearings' rating life below the required life, below twice it, and above", () => {
    const base = { ...STOUT_SHAFT, staticLoadRating: 1e6, impactForce: 0 };
    const short = check({ ...base, dynamicLoadRating: 2000 });
    expect([short.verdict, short.governs]).toEqual(["fails", "bearing-life"]);
    expect(short.reason).toBe("The bearings' rating life is 0.043 times the life required: fewer than 90 % of them would last.");
    const thin = check({ ...base, dynamicLoadRating: 6500 });
    expect([thin.verdict, thin.governs]).toEqual(["marginal", "bearing-life"]);
    expect(thin.reason).toBe("The bearings' rating life is only 1.5 times the life required.");
    const long = check({ ...base, dynamicLoadRating: 9000 });
    expect([long.verdict, long.governs]).toEqual(["holds", "bearing-life"]);
    expect(long.reason).toBe("Every check holds; the closest is the bearings' rating life, 3.9 times the life required.");
  });
});

describe("figures at their thresholds", () => {
  it("calls a static safety factor of exactly 1 thin, not failing: it fails only below 1", () => {
    const first = check({ ...STOUT_SHAFT });
    // C0 equal to the static equivalent load: s0 = C0/P0 = 1 exactly.
    const r = check({ ...STOUT_SHAFT, staticLoadRating: first.bearing.staticEquivalentLoad });
    expect(r.bearing.staticSafetyFactor).toBe(1);
    expect(criterion(r, "bearing-static").verdict).toBe("marginal");
  });

  it("holds a shaft whose safety factor equals the thin threshold: it is thin only below it", () => {
    const n = check({ ...STRONG_BEARINGS, shaftDiameter: 0.02 }).safetyFactor!;
    expect(n).toBeGreaterThan(1);
    expect(n).toBeLessThan(10);
    const atThin = check({ ...STRONG_BEARINGS, shaftDiameter: 0.02, marginalBelow: n });
    expect(criterion(atThin, "shaft-yield").verdict).toBe("holds");
    const atFail = check({ ...STRONG_BEARINGS, shaftDiameter: 0.02, failBelow: n, marginalBelow: n });
    expect(criterion(atFail, "shaft-yield").verdict).toBe("holds");
  });
});

describe("a rotor that loads neither the shaft nor the bearings' life", () => {
  // A balanced vertical rotor, not hit and not turned: nothing bends the shaft, nothing loads the
  // bearings across, and with Y = 0 its weight along the shaft does not enter the dynamic load.
  const r = check({ axle: "vertical", unbalance: 0, impactForce: 0, turnRate: 0 });

  it("has no safety factor and no life figure, and holds on both", () => {
    expect(r.safetyFactor).toBeNull();
    expect(r.bearing.ratingLifeHours).toBeNull();
    expect(r.criteria.map((c) => [c.criterion, c.verdict, c.value === null])).toEqual([
      ["shaft-yield", "holds", true],
      ["bearing-static", "holds", false],
      ["bearing-life", "holds", true],
    ]);
  });

  it("is judged on the bearings' static safety under the weight along the shaft, the only figure it has", () => {
    expect([r.verdict, r.governs]).toEqual(["holds", "bearing-static"]);
    expect(r.reason).toMatch(/^Every check holds; the closest is the bearings' static safety factor under a hit, /);
  });
});

describe("the rotor's place on the shaft, with the gyroscopic couple", () => {
  const E = MATERIALS["steel-4340-qt650"].youngsModulus;
  const I = (Math.PI * 0.012 ** 4) / 64;

  it("past mid-span (a = 45 mm of 60): moment F·a·b/L + M_g·a/L, the larger side of the couple's jump, and the heavier support is the second", () => {
    const r = check({ shaft: "live", rotorPosition: 0.045 });
    const P = r.loads.peakForce;
    const Mg = r.loads.gyroscopicMoment;
    const [a, b, L] = [0.045, 0.015, 0.06];
    expectClose(r.bendingMoment.peak, (P * a * b) / L + (Mg * a) / L, 1e-13);
    // Deflection under the rotor (Shigley Table A-9 cases 6 and 8, superposed): P·a²·b²/(3EIL) + M_g·a·b·(a − b)/(3EIL).
    expectClose(r.deflection.peak, (P * a * a * b * b) / (3 * E * I * L) + (Mg * a * b * (a - b)) / (3 * E * I * L), 1e-12);
    expect(r.supports.second.peak).toBeGreaterThan(r.supports.first.peak);
    expectClose(r.bearing.staticEquivalentLoad, r.supports.second.peak, 1e-15);
  });

  it("before mid-span the heavier support is the first, and its load is the one the static check takes", () => {
    const r = check({ shaft: "live", rotorPosition: 0.015 });
    expect(r.supports.first.peak).toBeGreaterThan(r.supports.second.peak);
    expectClose(r.bearing.staticEquivalentLoad, r.supports.first.peak, 1e-15);
  });

  it("overhung: far support P·c/L + M_g/L and tip deflection P·c²(L + c)/(3EI) + M_g·c(2L + 3c)/(6EI)", () => {
    const r = check({ layout: "overhung", overhang: 0.025 });
    const P = r.loads.peakForce;
    const Mg = r.loads.gyroscopicMoment;
    const [c, L] = [0.025, 0.06];
    expectClose(r.supports.first.peak, (P * c) / L + Mg / L, 1e-14);
    expectClose(r.deflection.peak, (P * c * c * (L + c)) / (3 * E * I) + (Mg * c * (2 * L + 3 * c)) / (6 * E * I), 1e-12);
  });
});

describe("refusals, in words", () => {
  it("a rotor past the far support, by its position and the span", () => {
    const error = refusal({ rotorPosition: 0.07 });
    expect(error.message).toBe("rotorPosition must be at most the support span (0.06 m) for a rotor between the supports (got 0.07 m)");
    expect(error.unit).toBe("m");
  });

  it("a bore as large as the shaft, by the bore and the diameter", () => {
    const error = refusal({ shaftBore: 0.012 });
    expect(error.message).toBe("shaftBore must be less than the shaft diameter (0.012 m) (got 0.012 m)");
    expect(error.unit).toBe("m");
  });

  it("a thin threshold below the fail threshold, by the thin one", () => {
    const error = refusal({ failBelow: 3, marginalBelow: 2 });
    expect(error.message).toBe("marginalBelow must be at least the fail threshold, 3 (got 2)");
    expect(error.unit).toBe("");
  });

  it("roller bearings under an axial load, by the bearing type, saying why", () => {
    const error = refusal({ bearingType: "roller", axialLoad: 5 });
    expect(error.message).toBe(
      'bearingType must be "ball" when the bearings carry an axial load (here the axial input or a vertical rotor\'s weight): cylindrical roller bearings are taken to carry none, so give the thrust its own bearing (got "roller")',
    );
    expect(error.unit).toBe("");
  });

  it("a bearing type or a material no list holds, by name, listing the materials", () => {
    expect(refusal({ bearingType: "needle" }).param).toBe("bearingType");
    const error = refusal({ material: "unobtainium" });
    expect([error.param, error.unit]).toEqual(["material", ""]);
    expect(error.message).toMatch(/^material must be one of "al-6061-t6", "steel-4130-normalized", .*, "polycarbonate" \(got "unobtainium"\)$/);
  });
});
