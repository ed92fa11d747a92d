import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { CalcInputError } from "../../calc/core/errors.ts";
import type { InputSpec, InputSpecs } from "../../calc/core/inputs.ts";
import { partLoad } from "../../calc/rotation/rotation.ts";
import { rpmToRadPerSecond, radPerSecondToRpm } from "../../calc/core/units.ts";
import { isSourceKey } from "../../calc/sources/index.ts";
import { LOADS_SOURCES as LOADS_BIBLIOGRAPHY } from "../../calc/sources/loads.ts";
import { MATERIALS } from "../../calc/materials/materials.ts";
import { demoRobotBalance } from "../../calc/mass/demo.ts";
import {
  EN1993_THREAD_SHEAR_FACTOR,
  eurocodeBoltShearResistance,
  FASTENERS_SOURCES,
  minimumUltimateTensileLoad,
  PROPERTY_CLASS_OPTIONS,
  PROPERTY_CLASSES,
  THREAD_SIZE_OPTIONS,
} from "../../calc/loads/fasteners.ts";
import {
  annularDiskBoreStress,
  annularDiskPeakRadialStress,
  annularDiskStress,
  boltStress,
  DEFAULT_SHEAR_RATIO,
  DEFAULT_RIM_MATERIAL,
  DEFAULT_RIM_MATERIAL_VALUES,
  DEMO_WASHER_STACK,
  demoRobotLoads,
  FASTENER_CHOICE_DEFAULTS,
  fastenerCheck,
  fastenerCheckInputs,
  fastenerStressCurve,
  fastenerStrengths,
  LOADING_MODE_OPTIONS,
  LOADS_SOURCES,
  RIM_CHOICE_DEFAULTS,
  RIM_MATERIAL_OPTIONS,
  RIM_SHAPE_OPTIONS,
  rimCheck,
  rimCheckInputs,
  rimMaterial,
  rimMaterialChoices,
  rimStressProfile,
  safetyFactor,
  safetyVerdict,
  SHEAR_PLANE_OPTIONS,
  solidDiskCentreStress,
  solidDiskStress,
  speedAtStress,
  thinRingHoopStress,
  thinRingLimitTipSpeed,
  tipSpeed,
  type FastenerCheckInput,
  type RimCheckInput,
} from "../../calc/loads/index.ts";
import { expectParamError, expectWellDeclared, invalidInputArb } from "../support/arbitraries.ts";

function expectClose(actual: number, expected: number, rtol: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));
}

/** Every number anywhere in a plain result object. */
function numbersIn(value: unknown): number[] {
  if (typeof value === "number") return [value];
  if (value && typeof value === "object") return Object.values(value).flatMap(numbersIn);
  return [];
}

function defaultsOf<T extends InputSpecs>(specs: T): { [K in keyof T]: number } {
  return Object.fromEntries(Object.entries(specs).map(([k, spec]) => [k, spec.default])) as { [K in keyof T]: number };
}

const FASTENER_DEFAULTS: FastenerCheckInput = { ...defaultsOf(fastenerCheckInputs), ...FASTENER_CHOICE_DEFAULTS };
const RIM_DEFAULTS: RimCheckInput = { ...defaultsOf(rimCheckInputs), ...RIM_CHOICE_DEFAULTS };

const RPM_10000 = rpmToRadPerSecond(10000);
const STEEL = { density: 7850, poisson: 0.3 };

// ---------------------------------------------------------------------------------------------

describe("spinning ring and disk stresses against the printed closed forms", () => {
  // Each expected value is evaluated from the source's own printed arrangement of the formula,
  // so only floating-point rounding separates it from ours: rtol 1e-12.
  const w = RPM_10000;
  const v = w * 0.1;
  const CASES = [
    {
      source: "carvill-data-handbook",
      locator: "§1.2.7, thin ring: σt = ρv² = ρr²ω²",
      inputs: { shape: "ring", density: 7850, radius: 0.1 },
      actual: () => thinRingHoopStress({ density: 7850, angularSpeed: w, radius: 0.1 }),
      expected: 7850 * v * v,
      rtol: 1e-12,
      note: "Carvill, Mechanical Engineer's Data Handbook, §1.2.7, thin ring",
    },
    {
      source: "carvill-data-handbook",
      locator: "§1.2.7, solid disk: σt = σr = ρv²(3 + ν)/8 at r = 0",
      inputs: { shape: "solid disk", density: 7850, radius: 0.1 },
      actual: () => solidDiskCentreStress({ ...STEEL, angularSpeed: w, outerRadius: 0.1 }),
      expected: (7850 * v * v * (3 + 0.3)) / 8,
      rtol: 1e-12,
      note: "Carvill, Mechanical Engineer's Data Handbook, §1.2.7, solid disk",
    },
    {
      source: "timoshenko-goodier",
      locator: "solid disk σ_r(r), as printed in Encyclopaedia Britannica, 11th ed., 'Elasticity' §80: ⅛ω²ρa²(3+σ) − ⅛ω²ρr²(3+σ)",
      inputs: { shape: "solid disk", r: 0.03 },
      actual: () => solidDiskStress({ ...STEEL, angularSpeed: w, outerRadius: 0.1, radius: 0.03 }).radial,
      expected: (w * w * 7850 * 0.01 * 3.3) / 8 - (w * w * 7850 * 0.0009 * 3.3) / 8,
      rtol: 1e-12,
      note: "Britannica writes σ for Poisson's ratio and a for the outer radius",
    },
    {
      source: "timoshenko-goodier",
      locator: "solid disk σ_θ(r), Encyclopaedia Britannica, 11th ed., 'Elasticity' §80: ⅛ω²ρa²(3+σ) − ⅛ω²ρr²(1+3σ)",
      inputs: { shape: "solid disk", r: 0.07 },
      actual: () => solidDiskStress({ ...STEEL, angularSpeed: w, outerRadius: 0.1, radius: 0.07 }).hoop,
      expected: (w * w * 7850 * 0.01 * 3.3) / 8 - (w * w * 7850 * 0.0049 * 1.9) / 8,
      rtol: 1e-12,
      note: "",
    },
    {
      source: "timoshenko-goodier",
      locator: "solid disk σ_θ(r), SymPy output in the GitHub notebook jeevanjyoti4/advmechsolids2023, rotating_disk.ipynb",
      inputs: { shape: "solid disk", r: 0.05 },
      actual: () => solidDiskStress({ ...STEEL, angularSpeed: w, outerRadius: 0.1, radius: 0.05 }).hoop,
      // omega**2*rho*(b**2*nu + 3*b**2 - 3*nu*r**2 - r**2)/8
      expected: (w ** 2 * 7850 * (0.1 ** 2 * 0.3 + 3 * 0.1 ** 2 - 3 * 0.3 * 0.05 ** 2 - 0.05 ** 2)) / 8,
      rtol: 1e-12,
      note: "",
    },
    {
      source: "timoshenko-goodier",
      locator: "bored disk σ_r(r), Shigley & Mischke, Mechanical Engineering Design, 5th ed. (1989), as reproduced at engineersedge.com, re-derived with SymPy",
      inputs: { shape: "bored disk", a: 0.01, r: 0.05 },
      actual: () => annularDiskStress({ ...STEEL, angularSpeed: w, innerRadius: 0.01, outerRadius: 0.1, radius: 0.05 }).radial,
      expected: (3.3 / 8) * 7850 * w * w * (0.01 + 0.0001 - (0.0001 * 0.01) / 0.0025 - 0.0025),
      rtol: 1e-12,
      note: "",
    },
    {
      source: "timoshenko-goodier",
      locator: "bored disk σ_θ(r), Shigley & Mischke, Mechanical Engineering Design, 5th ed. (1989), as reproduced at engineersedge.com, re-derived with SymPy",
      inputs: { shape: "bored disk", a: 0.01, r: 0.05 },
      actual: () => annularDiskStress({ ...STEEL, angularSpeed: w, innerRadius: 0.01, outerRadius: 0.1, radius: 0.05 }).hoop,
      expected: (3.3 / 8) * 7850 * w * w * (0.01 + 0.0001 + (0.0001 * 0.01) / 0.0025) - (1.9 / 8) * 7850 * w * w * 0.0025,
      rtol: 1e-12,
      note: "",
    },
    {
      source: "roark-rotating-disks",
      locator: "bored disk, hoop stress at the bore: (3+ν)/4 · ρω²[b² + (1−ν)/(3+ν) · a²], re-derived with SymPy from plane-stress equilibrium",
      inputs: { shape: "bored disk", a: 0.01 },
      actual: () => annularDiskBoreStress({ ...STEEL, angularSpeed: w, innerRadius: 0.01, outerRadius: 0.1 }),
      expected: (3.3 / 4) * 7850 * w * w * (0.01 + (0.7 / 3.3) * 0.0001),
      rtol: 1e-12,
      note: "the form printed with misplaced parentheses on engineersedge is not used",
    },
    {
      source: "timoshenko-goodier",
      locator: "bored disk, largest radial stress (3+ν)/8 · ρω²(b − a)² at r = √(ab), re-derived with SymPy from plane-stress equilibrium",
      inputs: { shape: "bored disk", a: 0.01 },
      actual: () => annularDiskPeakRadialStress({ ...STEEL, angularSpeed: w, innerRadius: 0.01, outerRadius: 0.1 }).stress,
      expected: (3.3 / 8) * 7850 * w * w * 0.09 ** 2,
      rtol: 1e-12,
      note: "",
    },
  ];

  it.each(CASES)("$source, $locator", ({ actual, expected, rtol }) => {
    expectClose(actual(), expected, rtol);
  });

  it("puts the largest radial stress of a bored disk at √(ab), where the radial stress indeed peaks", () => {
    const body = { ...STEEL, angularSpeed: w, innerRadius: 0.01, outerRadius: 0.1 };
    const peak = annularDiskPeakRadialStress(body);
    expect(peak.radius).toBeCloseTo(Math.sqrt(0.001), 15);
    const at = (radius: number) => annularDiskStress({ ...body, radius }).radial;
    expectClose(at(peak.radius), peak.stress, 1e-12);
    expect(at(peak.radius * 1.01)).toBeLessThan(peak.stress);
    expect(at(peak.radius * 0.99)).toBeLessThan(peak.stress);
  });

  it("gives the solid disk a rim hoop stress of (1−ν)/4 · ρω²b² and no radial stress there (Timoshenko & Goodier's solid-disk σ_θ(r), σ_r(r) at r = b)", () => {
    const rim = solidDiskStress({ ...STEEL, angularSpeed: w, outerRadius: 0.1, radius: 0.1 });
    expectClose(rim.hoop, (0.7 / 4) * 7850 * w * w * 0.01, 1e-12);
    expect(rim.radial).toBe(0);
  });

  it("finds the tip speed of 2400 rpm at 125 mm to be 10π m/s (openstax-college-physics, v = rω)", () => {
    expectClose(tipSpeed({ angularSpeed: rpmToRadPerSecond(2400), radius: 0.125 }), 10 * Math.PI, 1e-12);
  });
});

// ---------------------------------------------------------------------------------------------

/**
 * A second method: the bored disk solved numerically. Plane-stress radial equilibrium in terms of
 * the radial displacement u(r) is u'' + u'/r − u/r² = −(1−ν²)ρω²r/E. In units where ρω² = 1,
 * b = 1 and E = 1 − ν², it reads u'' + u'/x − u/x² = −x, with σ_r = u' + νu/x and σ_θ = u/x + νu'
 * in units of ρω²b². Shooting from the bore (σ_r(a) = 0) and solving the linear condition
 * σ_r(1) = 0 for the unknown u(a) gives the stresses without the closed form.
 */
/** The part of odex's solver used here. odex ships its TypeScript source, which does not pass this
 * repo's strict compiler settings, so it is loaded untyped and described by this interface. */
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], x1: number): { y: number[] };
}
const { Solver } = createRequire(import.meta.url)("odex") as { Solver: new (dimension: number) => OdexSolver };

function boredDiskByShooting(poisson: number, innerRatio: number, ratios: readonly number[]): { radial: number; hoop: number }[] {
  const solver = new Solver(2);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  const equation = (x: number, y: number[]) => [y[1]!, -y[1]! / x + y[0]! / (x * x) - x];
  const a = innerRatio;
  const stateAt = (s: number, x: number): [number, number] => {
    const start = [s, (-poisson * s) / a];
    const y = x === a ? start : solver.solve(equation, a, start, x).y;
    return [y[0]!, y[1]!];
  };
  const radialAt = (s: number, x: number) => {
    const [u, du] = stateAt(s, x);
    return du + (poisson * u) / x;
  };
  const g0 = radialAt(0, 1);
  const g1 = radialAt(1, 1);
  const s = -g0 / (g1 - g0);
  return ratios.map((x) => {
    const [u, du] = stateAt(s, x);
    return { radial: du + (poisson * u) / x, hoop: u / x + poisson * du };
  });
}

describe("the bored disk, solved a second way", () => {
  // Tolerance: the ODE solver runs at 1e-13; shooting on a linear problem adds no iteration
  // error, so 1e-8 of the bore stress leaves a wide margin over the solver's error.
  it.each([
    { poisson: 0.3, innerRatio: 0.1 },
    { poisson: 0.33, innerRatio: 0.5 },
    { poisson: 0.46, innerRatio: 0.9 },
    { poisson: 0, innerRatio: 0.02 },
  ])("matches the closed form for ν = $poisson, a/b = $innerRatio by integrating the equilibrium equation (odex)", ({ poisson, innerRatio }) => {
    const ratios = [innerRatio, innerRatio + (1 - innerRatio) * 0.25, Math.sqrt(innerRatio), innerRatio + (1 - innerRatio) * 0.75, 1];
    const numeric = boredDiskByShooting(poisson, innerRatio, ratios);
    const body = { density: 1, poisson, angularSpeed: 1, innerRadius: innerRatio, outerRadius: 1 };
    const scale = annularDiskBoreStress(body);
    ratios.forEach((x, i) => {
      const closed = annularDiskStress({ ...body, radius: x });
      expect(Math.abs(numeric[i]!.radial - closed.radial)).toBeLessThanOrEqual(1e-8 * scale);
      expect(Math.abs(numeric[i]!.hoop - closed.hoop)).toBeLessThanOrEqual(1e-8 * scale);
    });
  });

  it("satisfies radial equilibrium dσ_r/dr + (σ_r − σ_θ)/r + ρω²r = 0 everywhere, checked by central differences", () => {
    // Step h = 1e-5 r: truncation ~(h/r)² = 1e-10 and round-off ~1e-16·r/h = 1e-11 of the terms'
    // size, so the residual must vanish to 1e-6 of the sum of the three terms' magnitudes.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 0.01, max: 0.9, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (poisson, innerRatio, where) => {
          const b = 0.1;
          const a = innerRatio * b;
          const body = { density: 7850, poisson, angularSpeed: 500, innerRadius: a, outerRadius: b };
          const low = a * (1 + 2e-5);
          const r = low + where * (b * (1 - 2e-5) - low);
          const h = 1e-5 * r;
          const at = (radius: number) => annularDiskStress({ ...body, radius });
          const mid = at(r);
          const terms = [(at(r + h).radial - at(r - h).radial) / (2 * h), (mid.radial - mid.hoop) / r, 7850 * 500 * 500 * r];
          const residual = terms[0]! + terms[1]! + terms[2]!;
          const size = terms.reduce((sum, t) => sum + Math.abs(t), 0);
          expect(Math.abs(residual)).toBeLessThanOrEqual(1e-6 * size);
        },
      ),
    );
  });

  it("leaves both edges free of radial stress", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.5, noNaN: true }), fc.double({ min: 0.001, max: 0.999, noNaN: true }), (poisson, innerRatio) => {
        const body = { density: 2700, poisson, angularSpeed: 1000, innerRadius: innerRatio * 0.2, outerRadius: 0.2 };
        const scale = annularDiskBoreStress(body);
        expect(Math.abs(annularDiskStress({ ...body, radius: body.innerRadius }).radial)).toBeLessThanOrEqual(1e-12 * scale);
        expect(Math.abs(annularDiskStress({ ...body, radius: body.outerRadius }).radial)).toBeLessThanOrEqual(1e-12 * scale);
      }),
    );
  });
});

// ---------------------------------------------------------------------------------------------

describe("limiting cases of spinning disks", () => {
  const body = { ...STEEL, angularSpeed: RPM_10000, outerRadius: 0.1 };
  const centre = solidDiskCentreStress(body);

  it("doubles the solid disk's centre stress at a vanishingly small bore (the factor-of-two bore effect)", () => {
    // bore/centre = 2 + 2(1−ν)/(3+ν)·(a/b)²: at a/b = 1e-6 the excess is ~4e-13.
    expectClose(annularDiskBoreStress({ ...body, innerRadius: 1e-7 }) / centre, 2, 1e-12);
  });

  it("approaches the factor of two from above: any bore makes the peak more than twice the solid disk's", () => {
    // The bored-disk closed form (Timoshenko & Goodier) gives 2 + 2(1−ν)/(3+ν)·(a/b)² > 2.
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 0.999, noNaN: true }), fc.double({ min: 0, max: 0.5, noNaN: true }), (ratio, poisson) => {
        const b = { ...body, poisson };
        const ratioToCentre = annularDiskBoreStress({ ...b, innerRadius: ratio * 0.1 }) / solidDiskCentreStress(b);
        expect(ratioToCentre).toBeGreaterThan(2);
        expectClose(ratioToCentre, 2 + ((2 * (1 - poisson)) / (3 + poisson)) * ratio * ratio, 1e-12);
      }),
    );
  });

  it("tends to the thin-ring stress ρω²b² as the bore grows to the outer radius", () => {
    // At a = b(1 − 1e-6) the bore stress differs from ρω²b² by about (1−ν)/2 · 2e-6 ≈ 1e-6.
    const ring = thinRingHoopStress({ density: 7850, angularSpeed: RPM_10000, radius: 0.1 });
    expectClose(annularDiskBoreStress({ ...body, innerRadius: 0.1 * (1 - 1e-6) }), ring, 2e-6);
  });

  it("agrees between the rim check's bored disk and thin ring for a ring 1/1000 of its radius thick", () => {
    const ring = rimCheck({ ...RIM_DEFAULTS, shape: "thin-ring" });
    const bored = rimCheck({ ...RIM_DEFAULTS, shape: "annular-disk", innerRadius: RIM_DEFAULTS.outerRadius * 0.999 });
    expectClose(bored.peakStress, ring.peakStress, 1e-3);
    expect(bored.peakStress).toBeLessThanOrEqual(ring.peakStress);
  });

  it("orders the shapes: a solid disk is the least stressed, then the bored disk, then the ring at the same tip speed", () => {
    for (const innerRatio of [0.01, 0.3, 0.9]) {
      const solid = rimCheck({ ...RIM_DEFAULTS, shape: "solid-disk" }).peakStress;
      const bored = rimCheck({ ...RIM_DEFAULTS, shape: "annular-disk", innerRadius: RIM_DEFAULTS.outerRadius * innerRatio }).peakStress;
      const ring = rimCheck({ ...RIM_DEFAULTS, shape: "thin-ring" }).peakStress;
      expect(solid).toBeLessThan(bored);
      expect(bored).toBeLessThan(ring);
    }
  });

  it("reports shape factors σ/(ρv²) of 1 for a ring and (3+ν)/8 for a solid disk (carvill-data-handbook §1.2.7)", () => {
    expect(rimCheck({ ...RIM_DEFAULTS, shape: "thin-ring" }).shapeFactor).toBeCloseTo(1, 14);
    expectClose(rimCheck({ ...RIM_DEFAULTS, shape: "solid-disk" }).shapeFactor, (3 + RIM_DEFAULTS.poisson) / 8, 1e-12);
  });

  it("does not let Poisson's ratio change a thin ring's stress", () => {
    expect(rimCheck({ ...RIM_DEFAULTS, poisson: 0 }).peakStress).toBe(rimCheck({ ...RIM_DEFAULTS, poisson: 0.5 }).peakStress);
  });
});

// ---------------------------------------------------------------------------------------------

describe("stress grows with the square of the speed", () => {
  const validSpeed = fc.double({ min: rpmToRadPerSecond(1), max: rpmToRadPerSecond(50000), noNaN: true });

  it("quadruples the rim's peak stress when the speed doubles, and keeps its limit speeds", () => {
    fc.assert(
      fc.property(validSpeed, fc.constantFrom(...RIM_SHAPE_OPTIONS.map((o) => o.value)), (angularSpeed, shape) => {
        const slow = rimCheck({ ...RIM_DEFAULTS, shape, angularSpeed });
        const fast = rimCheck({ ...RIM_DEFAULTS, shape, angularSpeed: 2 * angularSpeed });
        expectClose(fast.peakStress, 4 * slow.peakStress, 1e-12);
        expectClose(fast.speedAtYield, slow.speedAtYield, 1e-12);
        expectClose(fast.speedAtUltimate, slow.speedAtUltimate, 1e-12);
      }),
    );
  });

  it("quadruples the bolt stress when the speed doubles, and keeps its limit speeds", () => {
    fc.assert(
      fc.property(validSpeed, fc.constantFrom(...LOADING_MODE_OPTIONS.map((o) => o.value)), (angularSpeed, mode) => {
        const slow = fastenerCheck({ ...FASTENER_DEFAULTS, mode, angularSpeed });
        const fast = fastenerCheck({ ...FASTENER_DEFAULTS, mode, angularSpeed: 2 * angularSpeed });
        expectClose(fast.stress, 4 * slow.stress, 1e-12);
        expectClose(fast.safetyFactor, slow.safetyFactor / 4, 1e-12);
        expectClose(fast.speedAtYield, slow.speedAtYield, 1e-12);
      }),
    );
  });

  it("brings the safety factor to exactly 1 when run at the reported limit speed (round trip)", () => {
    const rim = rimCheck(RIM_DEFAULTS);
    expectClose(rimCheck({ ...RIM_DEFAULTS, angularSpeed: rim.speedAtYield }).safetyFactorYield, 1, 1e-12);
    expectClose(rimCheck({ ...RIM_DEFAULTS, angularSpeed: rim.speedAtUltimate }).safetyFactorUltimate, 1, 1e-12);
    const bolt = fastenerCheck(FASTENER_DEFAULTS);
    expectClose(fastenerCheck({ ...FASTENER_DEFAULTS, angularSpeed: bolt.speedAtYield }).safetyFactorYield, 1, 1e-12);
    expectClose(fastenerCheck({ ...FASTENER_DEFAULTS, angularSpeed: bolt.speedAtUltimate }).safetyFactorUltimate, 1, 1e-12);
  });

  it("finds the limit speed ω·√(S/σ) directly", () => {
    expectClose(speedAtStress({ angularSpeed: 100, stress: 25e6, strength: 100e6 }), 200, 1e-15);
  });
});

// ---------------------------------------------------------------------------------------------

describe("the fastener check", () => {
  it("gives the part exactly the g and pull of the rotation module's partLoad (same F = mω²r, written out in loads-bolts.ts)", () => {
    const check = fastenerCheck(FASTENER_DEFAULTS);
    expect(check.part).toEqual(partLoad({ mass: FASTENER_DEFAULTS.partMass, radius: FASTENER_DEFAULTS.radius, angularSpeed: FASTENER_DEFAULTS.angularSpeed }));
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 20, noNaN: true }),
        fc.double({ min: 0.001, max: 2, noNaN: true }),
        fc.double({ min: rpmToRadPerSecond(1), max: rpmToRadPerSecond(100000), noNaN: true }),
        (partMass, radius, angularSpeed) => {
          const { part } = fastenerCheck({ ...FASTENER_DEFAULTS, partMass, radius, angularSpeed });
          expect(part).toEqual(partLoad({ mass: partMass, radius, angularSpeed }));
        },
      ),
    );
  });

  it("carries, in tension, exactly the ISO 898-1 minimum ultimate tensile load at the ultimate: M6 8.8, 16 100 N (Table 4, ± 0.5 %)", () => {
    const check = fastenerCheck({ ...FASTENER_DEFAULTS, size: "M6", propertyClass: "8.8", mode: "tension" });
    expectClose(check.ultimateLoad, 16100, 5e-3);
    expect(check.ultimateLoad).toBeCloseTo(minimumUltimateTensileLoad({ size: "M6", propertyClass: "8.8" }), 9);
  });

  it("compares tension with the class's minimum yield R_p0.2 and minimum R_m, so yield always governs", () => {
    for (const { value } of PROPERTY_CLASS_OPTIONS) {
      const check = fastenerCheck({ ...FASTENER_DEFAULTS, propertyClass: value, mode: "tension" });
      expect(check.yieldStrength).toBe(PROPERTY_CLASSES[value].yieldStrengthMin);
      expect(check.ultimateStrength).toBe(PROPERTY_CLASSES[value].tensileStrengthMin);
      expect(check.governs).toBe("yield");
    }
  });

  it("uses a shear-to-tensile ratio of 0.5 by default and reports it", () => {
    expect(DEFAULT_SHEAR_RATIO).toBe(0.5);
    expect(fastenerCheckInputs.shearRatio.default).toBe(0.5);
    const check = fastenerCheck(FASTENER_DEFAULTS);
    expect(check.shearRatio).toBe(0.5);
    expect(check.ultimateStrength).toBe(0.5 * PROPERTY_CLASSES["8.8"].tensileStrengthMin);
  });

  it("takes shear yield as R_p0.2/√3 = 0.577 R_p0.2 (shigley-distortion-energy; 0.577 as quoted on eng-tips thread 155277)", () => {
    const check = fastenerCheck(FASTENER_DEFAULTS);
    // Printed to 3 decimals: ± 0.0005.
    expect(Math.abs(check.yieldStrength / PROPERTY_CLASSES["8.8"].yieldStrengthMin - 0.577)).toBeLessThanOrEqual(0.0005);
  });

  it("equals the Eurocode 3 shear resistance with γ_M2 = 1 when the shear ratio is set to α_v (M12, 8.8)", () => {
    const check = fastenerCheck({ ...FASTENER_DEFAULTS, size: "M12", propertyClass: "8.8", shearRatio: EN1993_THREAD_SHEAR_FACTOR["8.8"]! });
    const eurocode = eurocodeBoltShearResistance({ area: 84.3e-6, ultimateStrength: 800e6, shearFactor: 0.6, partialFactor: 1 });
    expectClose(check.ultimateLoad, eurocode, 1e-12);
  });

  it("halves the stress on each bolt when a second bolt shares the pull", () => {
    const one = fastenerCheck(FASTENER_DEFAULTS);
    const two = fastenerCheck({ ...FASTENER_DEFAULTS, count: 2 });
    expectClose(two.stress, one.stress / 2, 1e-12);
    expectClose(two.forcePerBolt, one.part.force / 2, 1e-12);
  });

  it("takes shear through the shank on the full nominal area, which is larger than A_s", () => {
    const thread = fastenerCheck(FASTENER_DEFAULTS);
    const shank = fastenerCheck({ ...FASTENER_DEFAULTS, shearPlane: "shank" });
    expectClose(shank.area, (Math.PI / 4) * 0.004 ** 2, 1e-12);
    expect(shank.area).toBeGreaterThan(thread.area);
    expect(shank.safetyFactor).toBeGreaterThan(thread.safetyFactor);
  });

  it("computes average bolt stress as F/(nA)", () => {
    expect(boltStress({ force: 1000, count: 4, area: 1e-5 })).toBeCloseTo(25e6, 6);
  });

  it("calls a 1 kg part at 100 mm and 10 000 rpm on one M2 class 4.6 bolt a failure", () => {
    const check = fastenerCheck({ ...FASTENER_DEFAULTS, partMass: 1, radius: 0.1, angularSpeed: RPM_10000, size: "M2", propertyClass: "4.6" });
    expect(check.safetyFactor).toBeLessThan(1);
    expect(check.verdict).toBe("fails");
  });

  it("flags a bolt with a safety factor of 1.5 as marginal", () => {
    const base = fastenerCheck(FASTENER_DEFAULTS);
    const check = fastenerCheck({ ...FASTENER_DEFAULTS, partMass: (FASTENER_DEFAULTS.partMass * base.safetyFactor) / 1.5 });
    expectClose(check.safetyFactor, 1.5, 1e-12);
    expect(check.verdict).toBe("marginal");
  });

  it("draws a stress curve from standstill to the top speed that passes through the check's own stress", () => {
    const check = fastenerCheck(FASTENER_DEFAULTS);
    const curve = fastenerStressCurve(FASTENER_DEFAULTS, { maxSpeed: 2 * FASTENER_DEFAULTS.angularSpeed, points: 3 });
    expect(curve).toHaveLength(3);
    expect(curve[0]).toEqual({ angularSpeed: 0, stress: 0 });
    expectClose(curve[1]!.stress, check.stress, 1e-12);
    expectClose(curve[2]!.stress, 4 * check.stress, 1e-12);
    expect(curve[2]!.angularSpeed).toBe(2 * FASTENER_DEFAULTS.angularSpeed);
  });
});

// ---------------------------------------------------------------------------------------------

describe("verdicts", () => {
  it.each([
    { n: 0.99, verdict: "fails" },
    { n: 1, verdict: "marginal" },
    { n: 1.99, verdict: "marginal" },
    { n: 2, verdict: "holds" },
  ])("calls a safety factor of $n '$verdict' with the default thresholds 1 and 2 (safety-factor-practice)", ({ n, verdict }) => {
    expect(safetyVerdict({ safetyFactor: n })).toBe(verdict);
  });

  it("follows thresholds the user sets", () => {
    expect(safetyVerdict({ safetyFactor: 2.5, failBelow: 1.5, marginalBelow: 3 })).toBe("marginal");
    expect(safetyVerdict({ safetyFactor: 1.2, failBelow: 1.5, marginalBelow: 3 })).toBe("fails");
  });

  it("divides strength by stress", () => {
    expect(safetyFactor({ strength: 400e6, stress: 100e6 })).toBe(4);
  });
});

// ---------------------------------------------------------------------------------------------

describe("the rim check", () => {
  it("starts from the 6061-T6 row of the materials table at its specified minimums (ASTM B221: 35 ksi yield, 38 ksi ultimate; SubsTech 2.70 g/cm³; ν 0.33 ASM/MatWeb)", () => {
    // 1 ksi = 6.894 757 MPa (NIST SP 811, Appendix B): 35 ksi = 241.3 MPa, 38 ksi = 262.0 MPa, as the standard's table prints them.
    const six = rimMaterial("al-6061-t6");
    expect(six).toMatchObject({ density: 2700, poisson: 0.33, strengthBasis: "minimum" });
    expect(Math.abs(six.yieldStrength / 241.3e6 - 1)).toBeLessThan(5e-4);
    expect(Math.abs(six.ultimateStrength / 262.0e6 - 1)).toBeLessThan(5e-4);
    expect(rimCheckInputs.density.default).toBe(2700);
    expect(rimCheckInputs.yieldStrength.default).toBe(six.yieldStrength);
    expect(rimCheckInputs.ultimateStrength.default).toBe(six.ultimateStrength);
    expect(rimCheckInputs.poisson.default).toBe(0.33);
  });

  it("still offers the typical 6061-T6 values (SubsTech: 276 MPa, 310 MPa), marked as typical", () => {
    expect(rimMaterial("al-6061-t6", "typical")).toEqual({
      density: 2700,
      yieldStrength: 276e6,
      ultimateStrength: 310e6,
      poisson: 0.33,
      strengthBasis: "typical",
    });
  });

  it("marks a row without a standard minimum as typical, whichever basis is asked for", () => {
    expect(rimMaterial("steel-4130-normalized").strengthBasis).toBe("typical");
    expect(rimMaterial("steel-4130-normalized").yieldStrength).toBe(435e6);
  });

  it("carries the basis of the strengths into the check's result, and refuses an unknown basis by name", () => {
    expect(rimCheck({ ...RIM_DEFAULTS, ...rimMaterial("al-6061-t6", "typical") }).strengthBasis).toBe("typical");
    const { strengthBasis: _b, ...old } = { ...RIM_DEFAULTS, ...rimMaterial("al-6061-t6") };
    expect(rimCheck(old).strengthBasis).toBe("minimum");
    expect(() => rimCheck({ ...RIM_DEFAULTS, strengthBasis: "guessed" })).toThrow(/strengthBasis/);
  });

  it("offers every row of the materials table, and each fills a valid rim check", () => {
    expect(RIM_MATERIAL_OPTIONS.map((o) => o.value)).toEqual(Object.keys(MATERIALS));
    for (const { value } of RIM_MATERIAL_OPTIONS) {
      const check = rimCheck({ ...RIM_DEFAULTS, ...rimMaterial(value) });
      expect(numbersIn(check).every(Number.isFinite)).toBe(true);
    }
  });

  it("puts the peak stress at the rim of a ring, the centre of a solid disk and the bore of a bored disk", () => {
    expect(rimCheck({ ...RIM_DEFAULTS, shape: "thin-ring" }).peakStressRadius).toBe(RIM_DEFAULTS.outerRadius);
    expect(rimCheck({ ...RIM_DEFAULTS, shape: "solid-disk" }).peakStressRadius).toBe(0);
    expect(rimCheck({ ...RIM_DEFAULTS, shape: "annular-disk" }).peakStressRadius).toBe(RIM_DEFAULTS.innerRadius);
  });

  it.each(["solid-disk", "annular-disk"] as const)("draws a %s profile from the inside to the rim whose largest hoop stress is the check's peak", (shape) => {
    const input = { ...RIM_DEFAULTS, shape, innerRadius: 0.03 };
    const profile = rimStressProfile(input, { points: 21 });
    const check = rimCheck(input);
    expect(profile).toHaveLength(21);
    expect(profile[0]!.radius).toBe(shape === "solid-disk" ? 0 : 0.03);
    expect(profile.at(-1)!.radius).toBe(input.outerRadius);
    expect(Math.abs(profile.at(-1)!.radial)).toBeLessThanOrEqual(1e-12 * check.peakStress);
    expectClose(Math.max(...profile.map((p) => p.hoop)), check.peakStress, 1e-12);
    for (const p of profile) expect(p.hoop).toBeGreaterThanOrEqual(p.radial);
  });

  it("spaces a profile's points evenly from the inside to the rim", () => {
    const profile = rimStressProfile({ ...RIM_DEFAULTS, shape: "annular-disk", innerRadius: 0.03 }, { points: 5 });
    const step = (RIM_DEFAULTS.outerRadius - 0.03) / 4;
    for (const [i, p] of profile.entries()) expect(p.radius).toBeCloseTo(0.03 + i * step, 15);
    expect(rimStressProfile({ ...RIM_DEFAULTS, shape: "solid-disk" }, { points: 3 })[1]!.radius).toBeCloseTo(RIM_DEFAULTS.outerRadius / 2, 15);
  });

  it("draws a thin ring as a single point at its radius", () => {
    const profile = rimStressProfile(RIM_DEFAULTS);
    expect(profile).toHaveLength(1);
    expect(profile[0]).toMatchObject({ radius: RIM_DEFAULTS.outerRadius, radial: 0 });
  });

  it("refuses a profile of one point, naming the field", () => {
    expect(() => rimStressProfile(RIM_DEFAULTS, { points: 1 })).toThrow("points must be at least 2 and at most 1000 (got 1)");
  });
});

// ---------------------------------------------------------------------------------------------

describe("inputs", () => {
  function arbitraryFor(spec: InputSpec): fc.Arbitrary<number> {
    if (spec.integer) return fc.integer({ min: Math.ceil(spec.min), max: Math.floor(spec.max) });
    return fc.double({ min: spec.min, max: spec.max, noNaN: true, minExcluded: spec.minOpen === true });
  }

  function validInputs<T extends InputSpecs>(specs: T): fc.Arbitrary<{ [K in keyof T]: number }> {
    const record = Object.fromEntries(Object.entries(specs).map(([k, spec]) => [k, arbitraryFor(spec)]));
    return fc.record(record) as unknown as fc.Arbitrary<{ [K in keyof T]: number }>;
  }

  it("declares a unique URL key, a label and a default inside the range for every field", () => {
    for (const specs of [fastenerCheckInputs, rimCheckInputs] as InputSpecs[]) expectWellDeclared(specs);
  });

  it("gives a finite result for every valid fastener input", () => {
    fc.assert(
      fc.property(
        validInputs(fastenerCheckInputs),
        fc.constantFrom(...THREAD_SIZE_OPTIONS.map((o) => o.value)),
        fc.constantFrom(...PROPERTY_CLASS_OPTIONS.map((o) => o.value)),
        fc.constantFrom(...LOADING_MODE_OPTIONS.map((o) => o.value)),
        fc.constantFrom(...SHEAR_PLANE_OPTIONS.map((o) => o.value)),
        (numbers, size, propertyClass, mode, shearPlane) => {
          const marginalBelow = Math.max(numbers.marginalBelow, numbers.failBelow);
          const check = fastenerCheck({ ...numbers, marginalBelow, size, propertyClass, mode, shearPlane });
          expect(numbersIn(check).every(Number.isFinite)).toBe(true);
          expect(check.safetyFactor).toBeGreaterThan(0);
        },
      ),
    );
  });

  it("gives a finite result and profile for every valid rim input", () => {
    fc.assert(
      fc.property(
        validInputs(rimCheckInputs),
        fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }),
        fc.constantFrom(...RIM_SHAPE_OPTIONS.map((o) => o.value)),
        (numbers, boreRatio, shape) => {
          const input: RimCheckInput = {
            ...numbers,
            shape,
            innerRadius: boreRatio * numbers.outerRadius,
            yieldStrength: Math.min(numbers.yieldStrength, numbers.ultimateStrength),
            ultimateStrength: Math.max(numbers.yieldStrength, numbers.ultimateStrength),
            marginalBelow: Math.max(numbers.marginalBelow, numbers.failBelow),
          };
          const check = rimCheck(input);
          expect(numbersIn(check).every(Number.isFinite)).toBe(true);
          expect(numbersIn(rimStressProfile(input, { points: 5 })).every(Number.isFinite)).toBe(true);
        },
      ),
    );
  });

  it("throws a CalcInputError naming the field for every invalid number in the fastener check", () => {
    const fields = Object.keys(fastenerCheckInputs) as (keyof typeof fastenerCheckInputs)[];
    fc.assert(
      fc.property(
        fc.constantFrom(...fields).chain((field) => fc.tuple(fc.constant(field), invalidInputArb(fastenerCheckInputs[field]))),
        ([field, value]) => expectParamError(() => fastenerCheck({ ...FASTENER_DEFAULTS, [field]: value }), field),
      ),
    );
  });

  it("throws a CalcInputError naming the field for every invalid number in the rim check", () => {
    const fields = Object.keys(rimCheckInputs) as (keyof typeof rimCheckInputs)[];
    fc.assert(
      fc.property(
        fc.constantFrom(...fields).chain((field) => fc.tuple(fc.constant(field), invalidInputArb(rimCheckInputs[field]))),
        fc.constantFrom(...RIM_SHAPE_OPTIONS.map((o) => o.value)),
        ([field, value], shape) => expectParamError(() => rimCheck({ ...RIM_DEFAULTS, shape, [field]: value }), field),
      ),
    );
  });

  it.each([
    { field: "size", value: "M7", message: 'size must be one of M2, M2.5, M3, M4, M5, M6, M8, M10, M12 (got "M7")' },
    { field: "propertyClass", value: "9.8", message: 'propertyClass must be one of 4.6, 8.8, 10.9, 12.9 (got "9.8")' },
    { field: "mode", value: "torsion", message: 'mode must be one of shear, tension (got "torsion")' },
    { field: "shearPlane", value: "diagonal", message: 'shearPlane must be one of thread, shank (got "diagonal")' },
  ])("rejects $field = '$value', listing the allowed options", ({ field, value, message }) => {
    expect(() => fastenerCheck({ ...FASTENER_DEFAULTS, [field]: value })).toThrow(CalcInputError);
    expect(() => fastenerCheck({ ...FASTENER_DEFAULTS, [field]: value })).toThrow(message);
  });

  it("rejects a shape that is not on the list, listing the allowed shapes", () => {
    expect(() => rimCheck({ ...RIM_DEFAULTS, shape: "cone" })).toThrow('shape must be one of thin-ring, solid-disk, annular-disk (got "cone")');
  });

  it("rejects a material id that is not in the table, naming the field", () => {
    expect(() => rimMaterial("unobtainium")).toThrow(CalcInputError);
    expect(() => rimMaterial("unobtainium")).toThrow(/^material must be one of al-6061-t6, .* \(got "unobtainium"\)$/);
  });

  it("throws a CalcInputError naming the field for any string that is not a loading mode or shape", () => {
    fc.assert(
      fc.property(
        fc.string().filter((s) => s !== "shear" && s !== "tension"),
        (mode) => expectParamError(() => fastenerCheck({ ...FASTENER_DEFAULTS, mode }), "mode"),
      ),
    );
    fc.assert(
      fc.property(
        fc.string().filter((s) => !RIM_SHAPE_OPTIONS.some((o) => o.value === s)),
        (shape) => expectParamError(() => rimCheck({ ...RIM_DEFAULTS, shape }), "shape"),
      ),
    );
  });

  it("rejects a 'thin' threshold below the 'fails' threshold", () => {
    expect(() => fastenerCheck({ ...FASTENER_DEFAULTS, failBelow: 3, marginalBelow: 2 })).toThrow("marginalBelow must be at least failBelow (3) (got 2)");
    expect(() => rimCheck({ ...RIM_DEFAULTS, failBelow: 3, marginalBelow: 2 })).toThrow(CalcInputError);
  });

  it("rejects a yield strength above the ultimate strength", () => {
    expect(() => rimCheck({ ...RIM_DEFAULTS, yieldStrength: 400e6, ultimateStrength: 310e6 })).toThrow(
      "yieldStrength must be at most ultimateStrength (310000000 Pa) (got 400000000 Pa)",
    );
  });

  it("rejects a bore as large as the outer radius, or no bore, for a disk with a bore", () => {
    expect(() => rimCheck({ ...RIM_DEFAULTS, shape: "annular-disk", innerRadius: 0.125 })).toThrow(
      "innerRadius must be greater than 0 m and less than 0.125 m (got 0.125 m)",
    );
    expect(() => rimCheck({ ...RIM_DEFAULTS, shape: "annular-disk", innerRadius: 0 })).toThrow(CalcInputError);
  });

  it("states the allowed range in readable numbers", () => {
    expect(() => fastenerCheck({ ...FASTENER_DEFAULTS, angularSpeed: 0 })).toThrow(
      "angularSpeed must be at least 0.10472 rad/s and at most 10472 rad/s (got 0 rad/s)",
    );
    expect(() => fastenerCheck({ ...FASTENER_DEFAULTS, count: 1.5 })).toThrow("count must be a whole number at least 1 and at most 64 (got 1.5)");
    expect(() => fastenerCheck({ ...FASTENER_DEFAULTS, partMass: Number.NaN })).toThrow("partMass must be a finite number (got not a number)");
  });

  it("ignores the bore of a solid disk or a ring, but still checks it is a length in range", () => {
    expect(rimCheck({ ...RIM_DEFAULTS, shape: "solid-disk", innerRadius: 0.2 }).peakStress).toBe(
      rimCheck({ ...RIM_DEFAULTS, shape: "solid-disk", innerRadius: 0 }).peakStress,
    );
  });

  it("refuses a solid-disk radius beyond the rim, naming it", () => {
    expect(() => solidDiskStress({ ...STEEL, angularSpeed: 100, outerRadius: 0.1, radius: 0.2 })).toThrow(
      "radius must be at least 0 m and at most 0.1 m (got 0.2 m)",
    );
  });
});

// ---------------------------------------------------------------------------------------------

describe("helpers added for the chapters and calculators", () => {
  it("compares bolt stress with R_p0.2,min and R_m,min in tension, R_p0.2,min/√3 and k·R_m,min in shear (ISO 898-1 Table 3, 8.8: 640 and 800 MPa)", () => {
    expect(fastenerStrengths({ propertyClass: "8.8", mode: "tension" })).toEqual({ yieldStrength: 640e6, ultimateStrength: 800e6 });
    const shear = fastenerStrengths({ propertyClass: "8.8", mode: "shear" });
    // 640/√3 = 369.5 MPa (shigley-distortion-energy, 0.577 S_y); 0.5 × 800 = 400 MPa.
    expectClose(shear.yieldStrength, 369.5e6, 5e-4);
    expect(shear.ultimateStrength).toBe(400e6);
    expect(fastenerStrengths({ propertyClass: "4.6", mode: "shear", shearRatio: 0.6 }).ultimateStrength).toBeCloseTo(240e6, 3);
  });

  it("gives fastenerCheck exactly the strengths of fastenerStrengths, for every class and mode", () => {
    for (const { value: propertyClass } of PROPERTY_CLASS_OPTIONS) {
      for (const { value: mode } of LOADING_MODE_OPTIONS) {
        const check = fastenerCheck({ ...FASTENER_DEFAULTS, propertyClass, mode, shearRatio: 0.6 });
        expect({ yieldStrength: check.yieldStrength, ultimateStrength: check.ultimateStrength }).toEqual(
          fastenerStrengths({ propertyClass, mode, shearRatio: 0.6 }),
        );
      }
    }
  });

  it("refuses an unknown class or mode, and a shear ratio out of range, naming the field", () => {
    expect(() => fastenerStrengths({ propertyClass: "9.9", mode: "shear" })).toThrow(CalcInputError);
    expect(() => fastenerStrengths({ propertyClass: "8.8", mode: "bending" })).toThrow(/^mode must be one of shear, tension/);
    expect(() => fastenerStrengths({ propertyClass: "8.8", mode: "shear", shearRatio: 0.2 })).toThrow(/^shearRatio must be at least 0.3/);
  });

  it("finds a thin ring's limit tip speed √(S/ρ) (carvill-data-handbook: σ = ρv²), and the rim check agrees at any size", () => {
    // 6061-T6: √(310e6 / 2700) = 338.8 m/s.
    expectClose(thinRingLimitTipSpeed({ density: 2700, strength: 310e6 }), 338.8, 5e-4);
    for (const outerRadius of [0.02, 0.125, 1.5]) {
      const rim = rimCheck({ ...RIM_DEFAULTS, shape: "thin-ring", outerRadius, innerRadius: outerRadius / 2 });
      expectClose(rim.tipSpeedAtUltimate, thinRingLimitTipSpeed({ density: RIM_DEFAULTS.density, strength: RIM_DEFAULTS.ultimateStrength }), 1e-12);
    }
    expect(() => thinRingLimitTipSpeed({ density: 0, strength: 1e6 })).toThrow(/^density must be greater than 0/);
  });

  it("keeps the rim check's default material values equal to the 6061-T6 row of the materials table", () => {
    expect(DEFAULT_RIM_MATERIAL).toBe("al-6061-t6");
    const { strengthBasis, ...values } = rimMaterial(DEFAULT_RIM_MATERIAL);
    expect(DEFAULT_RIM_MATERIAL_VALUES).toEqual(values);
    expect(strengthBasis).toBe("minimum");
    expect(rimCheckInputs.density.default).toBe(MATERIALS["al-6061-t6"].density);
    expect(rimCheckInputs.poisson.default).toBe(MATERIALS["al-6061-t6"].poissonRatio);
  });

  it("offers every material as a choice carrying its own values", () => {
    const choices = rimMaterialChoices();
    expect(choices.map((c) => c.value)).toEqual(RIM_MATERIAL_OPTIONS.map((o) => o.value));
    for (const choice of choices) {
      const row = MATERIALS[choice.value];
      expect(choice).toEqual({
        ...RIM_MATERIAL_OPTIONS.find((o) => o.value === choice.value),
        detail: `${row.name}, ${row.condition}; ${"minimum" in row ? "specified minimum strengths" : "typical strengths (no standard minimum in the table)"}`,
        ...rimMaterial(choice.value),
      });
    }
  });

  it("labels every material with a menu name short enough for a phone menu (24 characters at most)", () => {
    for (const choice of rimMaterialChoices()) expect(choice.label.length).toBeLessThanOrEqual(24);
  });
});

describe("worked example: the invented demo robot", () => {
  const demo = demoRobotLoads();

  it("says the robot is invented", () => {
    expect(demo.description).toMatch(/invented/);
  });

  it("checks the same washer stack as the mass-layout worked example (calc/mass.ts demoRobotBalance)", () => {
    const balance = demoRobotBalance();
    const at = balance.balance.counterweight.atRadius;
    expectClose(DEMO_WASHER_STACK.mass, balance.washerMass, 1e-12);
    expectClose(DEMO_WASHER_STACK.radius, Math.hypot(at.x, at.y), 1e-12);
    expectClose(rpmToRadPerSecond(DEMO_WASHER_STACK.rpm), balance.spinSpeed, 1e-12);
    expect(demo.boltInput).toMatchObject({ partMass: balance.washerMass, angularSpeed: balance.spinSpeed });
    expectClose(demo.boltInput.radius, Math.hypot(at.x, at.y), 1e-12);
  });

  it("holds its 42 g of washers on one M4 class 8.8 bolt in shear at 2400 rpm, with a wide margin", () => {
    expect(demo.boltInput).toMatchObject({ partMass: 0.042, radius: 0.055, size: "M4", propertyClass: "8.8", mode: "shear", count: 1 });
    expect(radPerSecondToRpm(demo.boltInput.angularSpeed)).toBeCloseTo(2400, 9);
    expect(demo.bolt.verdict).toBe("holds");
    // Hand check to 3 significant figures: ω = 80π rad/s; a = ω²·0.055 = 3470 m/s² (354 g);
    // F = 0.042 × 3474 = 146 N; τ = 146 N / 8.78 mm² = 16.6 MPa; τ_y = 640/√3 = 370 MPa → n = 22.2;
    // yield reached at 2400 rpm × √22.2 = 11 300 rpm.
    expectClose(demo.bolt.part.gLoad, 354, 5e-3);
    expectClose(demo.bolt.part.force, 146, 5e-3);
    expectClose(demo.bolt.stress, 16.6e6, 5e-3);
    expectClose(demo.bolt.safetyFactor, 22.2, 5e-3);
    expectClose(radPerSecondToRpm(demo.bolt.speedAtYield), 11300, 5e-3);
  });

  it("takes another washer stack when asked (the chapter passes the mass-layout result through)", () => {
    const other = demoRobotLoads({ washerMass: 0.04, washerRadius: 0.07 });
    // 40 g at 70 mm, 2400 rpm: F = 0.04 × (80π)² × 0.07 = 177 N; τ = 20.1 MPa; n = 18.3.
    expectClose(other.bolt.part.force, 177, 5e-3);
    expectClose(other.bolt.safetyFactor, 18.3, 5e-3);
    expect(other.description).toContain("40 g");
    expect(other.description).toContain("70 mm");
  });

  it("keeps its 6061-T6 ring rim far from yield on the specified minimums, with a burst estimate near 23 800 rpm", () => {
    expect(demo.rim.verdict).toBe("holds");
    expect(demo.rim.strengthBasis).toBe("minimum");
    // v = 10π m/s = 31.4 m/s; σ = 2700 × 31.4² = 2.66 MPa; n_y = 241.3/2.66 = 90.6; ω_u = 2400 rpm × √(262.0/2.66).
    expectClose(demo.rim.tipSpeed, 31.4, 5e-3);
    expectClose(demo.rim.peakStress, 2.66e6, 5e-3);
    expectClose(demo.rim.safetyFactorYield, 90.6, 5e-3);
    expectClose(radPerSecondToRpm(demo.rim.speedAtUltimate), 23800, 5e-3);
  });
});

// ---------------------------------------------------------------------------------------------

describe("sources", () => {
  function documentedSourceKeys(path: string): { undocumented: string[]; keys: string[] } {
    const text = readFileSync(new URL(path, import.meta.url), "utf8");
    const exported = [...text.matchAll(/^export function (\w+)/gm)].map((m) => m[1]!);
    const documented = new Set([...text.matchAll(/\/\*\*(?:(?!\*\/)[\s\S])*\*\/\s*export function (\w+)/g)].map((m) => m[1]!));
    const keys = [...text.matchAll(/Sources:([\s\S]*?)(?:\.\s*\n|\*\/)/g)].flatMap((m) => [...m[1]!.matchAll(/[a-z0-9]+(?:-[a-z0-9]+)+/g)].map((k) => k[0]));
    return { undocumented: exported.filter((name) => !documented.has(name)), keys };
  }

  it.each([
    "../../calc/loads/index.ts",
    "../../calc/loads/common.ts",
    "../../calc/loads/bolts.ts",
    "../../calc/loads/rims.ts",
    "../../calc/loads/fasteners.ts",
  ])("documents every exported function of %s and cites only known keys", (path) => {
    const { undocumented, keys } = documentedSourceKeys(path);
    expect(undocumented).toEqual([]);
    expect(keys.length).toBeGreaterThan(0);
    expect(keys.filter((k) => !isSourceKey(k))).toEqual([]);
  });

  it("lists only known source keys, and uses every bibliography entry it adds", () => {
    expect([...LOADS_SOURCES, ...FASTENERS_SOURCES].filter((k) => !isSourceKey(k))).toEqual([]);
    const used = new Set<string>([...LOADS_SOURCES, ...FASTENERS_SOURCES]);
    expect(Object.keys(LOADS_BIBLIOGRAPHY).filter((k) => !used.has(k))).toEqual([]);
  });
});

// ---------------------------------------------------------------------------------------------

describe("regression pins (our own digits, not outside authorities)", () => {
  // Computed in double precision (Python) from the closed forms of Carvill §1.2.7 and Timoshenko & Goodier
  // (thin ring ρω²R², solid and bored disk), printed to 10 significant figures: rtol 1e-9.
  const MPa = 1e6;
  it.each([
    { name: "steel ring at v = 100 m/s", actual: () => thinRingHoopStress({ density: 7850, angularSpeed: 1000, radius: 0.1 }), expected: 78.5 * MPa },
    { name: "aluminium ring at v = 150 m/s", actual: () => thinRingHoopStress({ density: 2700, angularSpeed: 1500, radius: 0.1 }), expected: 60.75 * MPa },
    {
      name: "steel ring, R = 0.1 m, 10 000 rpm",
      actual: () => thinRingHoopStress({ density: 7850, angularSpeed: RPM_10000, radius: 0.1 }),
      expected: 86.08488283 * MPa,
    },
    {
      name: "steel solid disk centre, b = 0.1 m, 10 000 rpm",
      actual: () => solidDiskCentreStress({ ...STEEL, angularSpeed: RPM_10000, outerRadius: 0.1 }),
      expected: 35.51001417 * MPa,
    },
    {
      name: "steel solid disk rim hoop",
      actual: () => solidDiskStress({ ...STEEL, angularSpeed: RPM_10000, outerRadius: 0.1, radius: 0.1 }).hoop,
      expected: 15.0648545 * MPa,
    },
    {
      name: "steel bored disk, a = 0.01 m, bore hoop",
      actual: () => annularDiskBoreStress({ ...STEEL, angularSpeed: RPM_10000, innerRadius: 0.01, outerRadius: 0.1 }),
      expected: 71.17067688 * MPa,
    },
    {
      name: "steel bored disk, a = 0.01 m, largest radial",
      actual: () => annularDiskPeakRadialStress({ ...STEEL, angularSpeed: RPM_10000, innerRadius: 0.01, outerRadius: 0.1 }).stress,
      expected: 28.76311148 * MPa,
    },
  ])("$name: $expected Pa", ({ actual, expected }) => {
    expectClose(actual(), expected, 1e-9);
  });

  it("demo robot bolt and rim (values of this module, pinned)", () => {
    const demo = demoRobotLoads();
    expectClose(demo.bolt.part.force, 145.91223146570508, 1e-12);
    expectClose(demo.bolt.stress, 16618705.178326318, 1e-12);
    expectClose(demo.bolt.safetyFactor, 22.23423355287981, 1e-12);
    expectClose(demo.bolt.speedAtYield, 1185.0889298704328, 1e-12);
    expectClose(demo.rim.peakStress, 2664793.1882941267, 1e-12);
    // On the specified minimum ultimate, 38 ksi (2710.7467879070055 rad/s on the typical 310 MPa).
    expectClose(demo.rim.speedAtUltimate, 2492.0651659770247, 1e-12);
  });
});

describe("the verdict thresholds", () => {
  it.each([
    ["safetyVerdict", () => safetyVerdict({ safetyFactor: 2.5, failBelow: 3, marginalBelow: 2 })],
    ["fastenerCheck", () => fastenerCheck({ ...FASTENER_DEFAULTS, failBelow: 3, marginalBelow: 2 })],
    ["rimCheck", () => rimCheck({ ...RIM_DEFAULTS, failBelow: 3, marginalBelow: 2 })],
  ])("%s refuses a marginal threshold below the fail threshold, naming both", (_, run) => {
    expect(run).toThrow(CalcInputError);
    expect(run).toThrow(/^marginalBelow must be at least failBelow \(3\) \(got 2\)$/);
  });

  it("puts a factor exactly at a threshold in the better band (safety-factor-practice)", () => {
    expect(safetyVerdict({ safetyFactor: 1 })).toBe("marginal");
    expect(safetyVerdict({ safetyFactor: 2 })).toBe("holds");
    expect(safetyVerdict({ safetyFactor: 1.5, failBelow: 1.5, marginalBelow: 1.5 })).toBe("holds");
  });
});
