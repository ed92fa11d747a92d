import { describe, expect, it } from "vitest";
import { expectWellDeclared } from "../../support/arbitraries.ts";
import fc from "fast-check";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { MATERIALS } from "../../../calc/materials/materials.ts";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";
import { BEARING_TYPE_OPTIONS, basicRatingLife, ratingLifeHours } from "../../../calc/weapon/bearings.ts";
import { vonMisesStress } from "../../../calc/loads/common.ts";
import { bendingStress, roundSection, torsionalStress } from "../../../calc/weapon/shaft.ts";
import { cantileverEndLoad, overhungCouple, overhungPointLoad, simplySupportedCouple, simplySupportedPointLoad } from "../../../calc/weapon/beams.ts";
import {
  SHAFT_AXLE_OPTIONS,
  SHAFT_KIND_OPTIONS,
  SHAFT_LAYOUT_OPTIONS,
  SHAFT_MATERIAL_OPTIONS,
  WEAPON_SHAFT_CHOICE_DEFAULTS,
  weaponShaftCheck,
  weaponShaftInputs,
  type WeaponShaftInput,
} from "../../../calc/weapon/shaft-check.ts";
import { DEMO_SHAFT } from "../../../calc/weapon/shaft-demo.ts";
import { anyField, anyFinite, defaultsOf, expectClose, expectFiniteOrNamedError, validInputs, expectEachFieldNamed } from "./support.ts";

const rpm = rpmToRadPerSecond;
const DEFAULTS: WeaponShaftInput = { ...defaultsOf(weaponShaftInputs), ...WEAPON_SHAFT_CHOICE_DEFAULTS };

/**
 * Deflection by integrating M/(EI) twice (a second method, independent of the tables): midpoint
 * rule for the slope (cells never straddle a jump placed on a node), trapezoid for the deflection,
 * then the line through the two supports (at x = 0 and x = span) subtracted. Both rules are
 * second order: on a 1 µm grid over tens of millimetres the error is below 1e-8 relative, so the
 * comparisons use 1e-6.
 */
function integratedDeflection(moment: (x: number) => number, length: number, span: number, EI: number, at: number, h = 1e-6): number {
  // A 1 µm grid puts every position used below (whole micrometres) on a node.
  const cells = Math.round(length / h);
  const slope = new Float64Array(cells + 1);
  for (let i = 0; i < cells; i++) slope[i + 1] = slope[i]! + (moment((i + 0.5) * h) / EI) * h;
  const y = new Float64Array(cells + 1);
  for (let i = 0; i < cells; i++) y[i + 1] = y[i]! + ((slope[i]! + slope[i + 1]!) / 2) * h;
  const iSpan = Math.round(span / h);
  const iAt = Math.round(at / h);
  return y[iAt]! - (y[iSpan]! * (iAt * h)) / span;
}

// ---------------------------------------------------------------------------------------------

describe("beam cases against published tables and worked examples", () => {
  const CASES = [
    {
      source: "Engineering ToolBox, 'Cantilever Beams – Moments and Deflections', worked example",
      locator: "F = 3000 N at L = 5000 mm, I = 8.196×10⁷ mm⁴, E = 200 000 N/mm²: M = 1.5×10⁷ N·mm",
      actual: () => cantileverEndLoad({ force: 3000, length: 5, youngsModulus: 200e9, secondMoment: 8.196e-5 }).rootMoment,
      expected: 15000,
      rtol: 1e-15,
      note: "exact",
    },
    {
      source: "Engineering ToolBox, 'Cantilever Beams – Moments and Deflections', worked example",
      locator: "the same beam: δ = 7.6 mm",
      actual: () => cantileverEndLoad({ force: 3000, length: 5, youngsModulus: 200e9, secondMoment: 8.196e-5 }).tipDeflection,
      expected: 0.0076,
      rtol: 6.6e-3,
      note: "printed to 2 figures (our 7.63 mm)",
    },
    {
      source: "Engineering ToolBox, 'Beams – Supported at Both Ends – Continuous and Point Loads', worked example (W 12 × 35 beam)",
      locator: "F = 10 000 lb at mid-span of L = 100 in, I = 285 in⁴, y = 6.25 in: σ = 5482 psi",
      actual: () => (simplySupportedPointLoad({ force: 10000, span: 100, position: 50, youngsModulus: 29e6, secondMoment: 285 }).momentAtLoad * 6.25) / 285,
      expected: 5482,
      rtol: 9.2e-5,
      note: "printed to the psi (inch-pound units throughout)",
    },
    {
      source: "pickedshares.com, 'Beam calculator – central force', worked example",
      locator: "I = 1 670 000 mm⁴, E = 210 000 N/mm², L = 3000 mm, F = 1000 N: 'a deflection of 1.60 mm'",
      actual: () => simplySupportedPointLoad({ force: 1000, span: 3000, position: 1500, youngsModulus: 210000, secondMoment: 1.67e6 }).deflectionAtLoad,
      expected: 1.6,
      rtol: 3.2e-3,
      note: "printed to 3 figures (N and mm throughout)",
    },
    {
      source: "pickedshares.com, 'Beam calculator – central force', worked example",
      locator: "the same beam with F = 9375 N: '15.04 mm'",
      actual: () => simplySupportedPointLoad({ force: 9375, span: 3000, position: 1500, youngsModulus: 210000, secondMoment: 1.67e6 }).deflectionAtLoad,
      expected: 15.04,
      rtol: 3.4e-4,
      note: "printed to 4 figures",
    },
  ];
  it.each(CASES.map((c) => [`${c.source}: ${c.locator}`, c] as const))("%s", (_, c) => {
    expectClose(c.actual(), c.expected, c.rtol);
  });

  it("Shigley's Mechanical Engineering Design Table A-9 case 6 (simple supports, intermediate load), as reproduced in its appendix tables: R1 = F·b/l, R2 = F·a/l and y_AB = F·b·x/(6EIl)·(x² + b² − l²) at x = a", () => {
    const F = 1500;
    const l = 0.08;
    const a = 0.02;
    const b = l - a;
    const EI = 200e9 * 2e-9;
    const r = simplySupportedPointLoad({ force: F, span: l, position: a, youngsModulus: 200e9, secondMoment: 2e-9 });
    expectClose(r.leftReaction, (F * b) / l, 1e-15);
    expectClose(r.rightReaction, (F * a) / l, 1e-15);
    expectClose(r.momentAtLoad, (F * b * a) / l, 1e-15); // M_AB = F·b·x/l at x = a
    expectClose(r.deflectionAtLoad, -((F * b * a) / (6 * EI * l)) * (a * a + b * b - l * l), 1e-13);
  });

  it("Shigley Table A-9 case 10 (simple supports, overhanging load), as reproduced: y_BC = F(x − l)/(6EI)·((x − l)² − a(3x − l)) at the tip equals y_C = −F·a²(l + a)/(3EI)", () => {
    const F = 800;
    const l = 0.05;
    const a = 0.03;
    const EI = 205e9 * 1e-9;
    const r = overhungPointLoad({ force: F, span: l, overhang: a, youngsModulus: 205e9, secondMoment: 1e-9 });
    const x = l + a;
    expectClose(r.tipDeflection, -((F * (x - l)) / (6 * EI)) * ((x - l) ** 2 - a * (3 * x - l)), 1e-13);
    expectClose(r.farReaction, (F * a) / l, 1e-15);
    expectClose(r.nearReaction, (F * (l + a)) / l, 1e-15);
  });

  it("tends to the cantilever (Shigley Table A-9 case 1, y = F·l³/(3EI)) as the support span shrinks", () => {
    const cantilever = cantileverEndLoad({ force: 1000, length: 0.03, youngsModulus: 200e9, secondMoment: 1e-9 }).tipDeflection;
    const overhung = overhungPointLoad({ force: 1000, span: 1e-9, overhang: 0.03, youngsModulus: 200e9, secondMoment: 1e-9 }).tipDeflection;
    expectClose(overhung, cantilever, 1e-7);
  });

  it("round section, solid: I = πd⁴/64 and Z = πd³/32 (the circular-section formulas as printed in strength-of-materials notes)", () => {
    const s = roundSection({ diameter: 0.02 });
    expectClose(s.secondMoment, (Math.PI * 0.02 ** 4) / 64, 1e-15);
    expectClose(s.sectionModulus, (Math.PI * 0.02 ** 3) / 32, 1e-15);
    expectClose(s.polarMoment, (Math.PI * 0.02 ** 4) / 32, 1e-15);
    expectClose(bendingStress({ moment: 150, diameter: 0.02 }), (32 * 150) / (Math.PI * 0.02 ** 3), 1e-14);
    expectClose(torsionalStress({ torque: 150, diameter: 0.02 }), (16 * 150) / (Math.PI * 0.02 ** 3), 1e-14);
  });

  it("round section, hollow: the bore → 0 limit is the solid section, and a thin wall tends to I = π·d³·t/8", () => {
    expectClose(roundSection({ diameter: 0.02, bore: 1e-9 }).secondMoment, roundSection({ diameter: 0.02 }).secondMoment, 1e-14);
    const t = 1e-5;
    expectClose(roundSection({ diameter: 0.02, bore: 0.02 - 2 * t }).secondMoment, (Math.PI * 0.02 ** 3 * t) / 8, 2e-3);
  });

  it("von Mises: pure torsion gives √3·τ, so the shaft yields in shear at S_y/√3 = 0.577·S_y (Shigley, distortion-energy theory)", () => {
    expectClose(vonMisesStress({ normalStress: 0, shearStress: 100e6 }), Math.sqrt(3) * 100e6, 1e-15);
    expect(vonMisesStress({ normalStress: -250e6, shearStress: 0 })).toBe(250e6);
    expect(Number.isFinite(vonMisesStress({ normalStress: 1e200, shearStress: 1e200 }))).toBe(true);
  });

  it("regression pins (our own digits, not published): d = 12 mm, L = 60 mm, 2000 N at mid-span gives 176.8388257 MPa and 44.20970641 µm; a 20 mm cantilever with 5000 N at 30 mm gives 190.9859317 MPa and 28.64788976 µm (E = 200 GPa)", () => {
    const I12 = roundSection({ diameter: 0.012 }).secondMoment;
    const span = simplySupportedPointLoad({ force: 2000, span: 0.06, position: 0.03, youngsModulus: 200e9, secondMoment: I12 });
    expectClose(bendingStress({ moment: span.momentAtLoad, diameter: 0.012 }), 176.8388257e6, 1e-9);
    expectClose(span.deflectionAtLoad, 4.420970641e-5, 1e-9);
    const I20 = roundSection({ diameter: 0.02 }).secondMoment;
    const arm = cantileverEndLoad({ force: 5000, length: 0.03, youngsModulus: 200e9, secondMoment: I20 });
    expectClose(bendingStress({ moment: arm.rootMoment, diameter: 0.02 }), 190.9859317e6, 1e-9);
    expectClose(arm.tipDeflection, 2.864788976e-5, 1e-9);
  });
});

describe("beam deflections against double integration of M/EI (a second method)", () => {
  const E = 205e9;
  const I = 1.2e-9;
  it.each([0.01, 0.025, 0.03, 0.045])("point load at a = %s m on a 60 mm span", (a) => {
    const F = 1000;
    const L = 0.06;
    const r = simplySupportedPointLoad({ force: F, span: L, position: a, youngsModulus: E, secondMoment: I });
    const M = (x: number) => (x < a ? (F * (L - a) * x) / L : (F * a * (L - x)) / L);
    expectClose(r.deflectionAtLoad, -integratedDeflection(M, L, L, E * I, a), 1e-6);
  });

  it.each([0.012, 0.02, 0.036, 0.048])("couple at a = %s m on a 60 mm span", (a) => {
    const C = 40;
    const L = 0.06;
    const r = simplySupportedCouple({ moment: C, span: L, position: a, youngsModulus: E, secondMoment: I });
    const M = (x: number) => (x < a ? (C * x) / L : (C * (x - L)) / L);
    expectClose(Math.abs(integratedDeflection(M, L, L, E * I, a)), r.deflectionAtCouple, 1e-6);
    expectClose(r.momentBeforeCouple, Math.abs(M(a - 1e-12)), 1e-9);
    expectClose(r.momentAfterCouple, Math.abs(M(a + 1e-12)), 1e-9);
  });

  it("gives no deflection under a couple at mid-span (antisymmetry)", () => {
    expect(simplySupportedCouple({ moment: 40, span: 0.06, position: 0.03, youngsModulus: E, secondMoment: I }).deflectionAtCouple).toBe(0);
  });

  it.each([
    [0.04, 0.02],
    [0.06, 0.01],
    [0.02, 0.03],
  ])("overhang: point load and couple at the tip, span %s m, overhang %s m", (L, c) => {
    const F = 600;
    const C = 25;
    const point = overhungPointLoad({ force: F, span: L, overhang: c, youngsModulus: E, secondMoment: I });
    const couple = overhungCouple({ moment: C, span: L, overhang: c, youngsModulus: E, secondMoment: I });
    const Mpoint = (x: number) => (x < L ? (-F * c * x) / L : -F * (L + c - x));
    const Mcouple = (x: number) => (x < L ? (C * x) / L : C);
    expectClose(Math.abs(integratedDeflection(Mpoint, L + c, L, E * I, L + c)), point.tipDeflection, 1e-6);
    expectClose(Math.abs(integratedDeflection(Mcouple, L + c, L, E * I, L + c)), couple.tipDeflection, 1e-6);
  });
});

// ---------------------------------------------------------------------------------------------

describe("weaponShaftCheck", () => {
  it("declares a unique URL key, a label and a default inside the range for every field", () => {
    expectWellDeclared(weaponShaftInputs);
  });

  it("uses the invented demo as its defaults", () => {
    expect(DEMO_SHAFT).toEqual(DEFAULTS);
  });

  it("fails the invented demo on the bearings' static safety under a hit", () => {
    const r = weaponShaftCheck(DEMO_SHAFT);
    expect(r.verdict).toBe("fails");
    expect(r.governs).toBe("bearing-static");
    expect(r.reason).toMatch(/s0 = 0\.35/);
    expect(r.stressCycle).toBe("steady");
    expect(r.torsionalStress).toBe(0);
    // Regression pins (our own digits).
    expectClose(r.bearing.staticSafetyFactor!, 0.3530782951, 1e-9);
    expectClose(r.bearing.ratingLifeHours!, 16.96518436, 1e-9);
    expectClose(r.safetyFactor!, 0.9610024249, 1e-9);
  });

  it("adds the loads: unbalance U·Ω², weight m·g across a horizontal shaft, the hit, and the couple J·Ω·q", () => {
    const r = weaponShaftCheck(DEFAULTS);
    expectClose(r.loads.unbalanceForce, 2e-5 * rpm(8000) ** 2, 1e-15);
    expectClose(r.loads.weight, 2.5 * STANDARD_GRAVITY, 1e-15);
    expectClose(r.loads.runningForce, r.loads.unbalanceForce + r.loads.weight, 1e-15);
    expectClose(r.loads.peakForce, r.loads.runningForce + 8000, 1e-15);
    expectClose(r.loads.gyroscopicMoment, 0.010125 * rpm(8000) * 2 * Math.PI, 1e-15);
  });

  it("between the supports: reactions F·b/L + M_g/L, moment F·a·b/L + M_g·max(a, b)/L, stress 32M/(πd³)", () => {
    const input = { ...DEFAULTS, shaft: "live", rotorPosition: 0.02 };
    const r = weaponShaftCheck(input);
    const P = r.loads.peakForce;
    const Mg = r.loads.gyroscopicMoment;
    expectClose(r.supports.first.peak, (P * 0.04) / 0.06 + Mg / 0.06, 1e-14);
    expectClose(r.supports.second.peak, (P * 0.02) / 0.06 + Mg / 0.06, 1e-14);
    expectClose(r.bendingMoment.peak, (P * 0.02 * 0.04) / 0.06 + (Mg * 0.04) / 0.06, 1e-14);
    expectClose(r.bendingStress, (32 * r.bendingMoment.peak) / (Math.PI * 0.012 ** 3), 1e-13);
    // A live shaft runs in its bearings at the supports.
    expect(r.bearingLoads.first).toEqual(r.supports.first);
  });

  it("overhung: the largest moment is P·c + M_g at the near support", () => {
    const r = weaponShaftCheck({ ...DEFAULTS, layout: "overhung", overhang: 0.025 });
    expectClose(r.bendingMoment.peak, r.loads.peakForce * 0.025 + r.loads.gyroscopicMoment, 1e-14);
    expectClose(r.supports.second.peak, (r.loads.peakForce * (0.06 + 0.025)) / 0.06 + r.loads.gyroscopicMoment / 0.06, 1e-14);
  });

  it("dead shaft: each hub bearing carries half the transverse load plus the couple over its spacing", () => {
    const r = weaponShaftCheck(DEFAULTS);
    expectClose(r.bearingLoads.first.running, r.loads.runningForce / 2 + r.loads.gyroscopicMoment / 0.02, 1e-14);
    expectClose(r.bearingLoads.second.peak, r.loads.peakForce / 2 + r.loads.gyroscopicMoment / 0.02, 1e-14);
  });

  it("live shaft: carries the motor torque as 16T/(πd³), combined by von Mises, and its bending is fully reversed", () => {
    const r = weaponShaftCheck({ ...DEFAULTS, shaft: "live", motorTorque: 20 });
    expectClose(r.torsionalStress, (16 * 20) / (Math.PI * 0.012 ** 3), 1e-13);
    expectClose(r.vonMisesStress, Math.sqrt(r.bendingStress ** 2 + 3 * r.torsionalStress ** 2), 1e-14);
    expect(r.stressCycle).toBe("fully-reversed");
    expect(r.loads.torque).toBe(20);
  });

  it("judges the shaft on the material table's yield strength and bends it by its Young's modulus", () => {
    const steel = weaponShaftCheck({ ...DEFAULTS, material: "steel-4340-qt650" });
    const ti = weaponShaftCheck({ ...DEFAULTS, material: "ti-6al-4v-annealed" });
    expectClose(ti.safetyFactor! / steel.safetyFactor!, MATERIALS["ti-6al-4v-annealed"].yieldStrength / MATERIALS["steel-4340-qt650"].yieldStrength, 1e-14);
    expectClose(ti.deflection.peak / steel.deflection.peak, 205e9 / 114e9, 1e-14);
    expect(steel.material.basis).toBe("typical");
  });

  it("puts a vertical rotor's weight on the bearings along the shaft, not across it", () => {
    const r = weaponShaftCheck({ ...DEFAULTS, axle: "vertical", axialLoad: 10, axialFactor: 1.5, radialFactor: 0.56 });
    expectClose(r.loads.axialLoad, 10 + 2.5 * STANDARD_GRAVITY, 1e-15);
    expectClose(r.loads.runningForce, r.loads.unbalanceForce, 1e-15);
    expectClose(r.bearing.equivalentLoad, 0.56 * r.bearingLoads.first.running + 1.5 * r.loads.axialLoad, 1e-14);
  });

  it("uses the ISO 281 life of the more heavily loaded bearing at the weapon speed", () => {
    const r = weaponShaftCheck({ ...DEFAULTS, shaft: "live", rotorPosition: 0.015, bearingType: "roller" });
    const heavier = Math.max(r.bearingLoads.first.running, r.bearingLoads.second.running);
    const L10 = basicRatingLife({ dynamicLoadRating: 5400, equivalentLoad: heavier, bearingType: "roller" });
    expectClose(r.bearing.ratingLifeHours!, ratingLifeHours({ ratingLife: L10, angularSpeed: rpm(8000) }), 1e-13);
    expect(r.bearing.staticSafetyGuide).toBe(3);
  });

  it("holds a stout design, calls a thin margin marginal, and names the governing criterion", () => {
    const stout = { ...DEFAULTS, impactForce: 0, turnRate: 0, dynamicLoadRating: 60000, staticLoadRating: 40000, shaftDiameter: 0.03 };
    const r = weaponShaftCheck(stout);
    expect(r.verdict).toBe("holds");
    expect(r.reason).toMatch(/^Every check holds/);
    const thin = weaponShaftCheck({ ...stout, marginalBelow: 20, failBelow: 1 });
    expect(thin.criteria.find((c) => c.criterion === "shaft-yield")!.verdict).toBe(thin.safetyFactor! < 20 ? "marginal" : "holds");
  });

  it("refuses what cannot be built, by name", () => {
    const bad: [Partial<WeaponShaftInput>, string][] = [
      [{ rotorPosition: 0.07 }, "rotorPosition"],
      [{ shaftBore: 0.012 }, "shaftBore"],
      [{ failBelow: 3, marginalBelow: 2 }, "marginalBelow"],
      [{ bearingType: "roller", axialLoad: 5 }, "bearingType"],
      [{ bearingType: "roller", axle: "vertical" }, "bearingType"],
      [{ material: "unobtainium" }, "material"],
      [{ layout: "sideways" }, "layout"],
      [{ shaft: "floating" }, "shaft"],
      [{ axle: "diagonal" }, "axle"],
    ];
    for (const [change, param] of bad) {
      expect(() => weaponShaftCheck({ ...DEFAULTS, ...change } as WeaponShaftInput), param).toThrow(expect.objectContaining({ name: "CalcInputError", param }));
    }
    expect(() => weaponShaftCheck(undefined as unknown as WeaponShaftInput)).toThrow(expect.objectContaining({ param: "input" }));
  });

  it("says what it expected and what it got", () => {
    try {
      weaponShaftCheck({ ...DEFAULTS, shaftDiameter: 0.6 });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CalcInputError);
      expect((error as CalcInputError).message).toBe("shaftDiameter must be at least 0.001 m and at most 0.5 m (got 0.6 m)");
    }
  });

  it("lists every material of the table as a choice", () => {
    expect(SHAFT_MATERIAL_OPTIONS.map((o) => o.value)).toEqual(Object.keys(MATERIALS));
  });
});

// ---------------------------------------------------------------------------------------------

describe("fuzz: never a non-finite number, every bad input a named CalcInputError", () => {
  const RUNS = { numRuns: 300 };

  it("gives finite numbers for every valid input of the shaft check, with every choice", () => {
    fc.assert(
      fc.property(
        validInputs(weaponShaftInputs),
        fc.record({
          layout: fc.constantFrom(...SHAFT_LAYOUT_OPTIONS.map((o) => o.value)),
          shaft: fc.constantFrom(...SHAFT_KIND_OPTIONS.map((o) => o.value)),
          axle: fc.constantFrom(...SHAFT_AXLE_OPTIONS.map((o) => o.value)),
          bearingType: fc.constantFrom(...BEARING_TYPE_OPTIONS.map((o) => o.value)),
          material: fc.constantFrom(...SHAFT_MATERIAL_OPTIONS.map((o) => o.value)),
        }),
        (numbers, choices) => {
          const input = { ...numbers, ...choices };
          fc.pre(input.shaftBore < input.shaftDiameter && input.marginalBelow >= input.failBelow);
          fc.pre(input.layout === "overhung" || input.rotorPosition <= input.bearingSpan);
          fc.pre(input.bearingType === "ball" || (input.axialLoad === 0 && input.axle === "horizontal"));
          expectFiniteOrNamedError(() => weaponShaftCheck(input), []);
        },
      ),
      RUNS,
    );
  });

  it("names the field for every out-of-range, non-finite, null or missing value of the shaft check", () => {
    expectEachFieldNamed(weaponShaftInputs, DEFAULTS, weaponShaftCheck, RUNS);
  });

  it("gives finite numbers or a named CalcInputError for any value of the shaft check's fields", () => {
    const names = Object.keys(weaponShaftInputs);
    fc.assert(
      fc.property(fc.dictionary(fc.constantFrom(...names), anyField), fc.constantFrom<unknown>("dead", "live", "spinning", undefined), (fields, shaft) => {
        expectFiniteOrNamedError(() => weaponShaftCheck({ ...DEFAULTS, ...(fields as object), shaft } as WeaponShaftInput), [...names, "shaft", "bearingType"]);
      }),
      RUNS,
    );
  });

  const stiff = ["youngsModulus", "secondMoment"];
  const PRIMITIVES: [string, (x: Record<string, unknown>) => unknown, string[]][] = [
    ["roundSection", (x) => roundSection(x as never), ["diameter", "bore"]],
    ["bendingStress", (x) => bendingStress(x as never), ["moment", "diameter", "bore"]],
    ["torsionalStress", (x) => torsionalStress(x as never), ["torque", "diameter", "bore"]],
    ["vonMisesStress", (x) => vonMisesStress(x as never), ["normalStress", "shearStress"]],
    ["simplySupportedPointLoad", (x) => simplySupportedPointLoad(x as never), ["force", "span", "position", ...stiff]],
    ["simplySupportedCouple", (x) => simplySupportedCouple(x as never), ["moment", "span", "position", ...stiff]],
    ["overhungPointLoad", (x) => overhungPointLoad(x as never), ["force", "span", "overhang", ...stiff]],
    ["overhungCouple", (x) => overhungCouple(x as never), ["moment", "span", "overhang", ...stiff]],
    ["cantileverEndLoad", (x) => cantileverEndLoad(x as never), ["force", "length", ...stiff]],
  ];
  it.each(PRIMITIVES.map((p) => [p[0], p] as const))("%s: finite over the whole double range, or a named CalcInputError", (_, [, fn, numeric]) => {
    for (const field of [anyFinite, anyField]) {
      fc.assert(
        fc.property(fc.record(Object.fromEntries(numeric.map((k) => [k, field]))), (numbers) => {
          expectFiniteOrNamedError(() => fn(numbers), numeric);
        }),
        RUNS,
      );
    }
    for (const nothing of [null, undefined]) expect(() => fn(nothing as never)).toThrow(expect.objectContaining({ name: "CalcInputError", param: "input" }));
  });
});
