import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { addMirrorCopy, addPart, duplicatePart, mirrorPart, mirrorPartInList, movePart, removePart } from "../../calc/mass/editing.ts";
import { applyCounterweight, counterweightAtCandidates, counterweightAtRadius, counterweightRadiusForMass } from "../../calc/mass/counterweight.ts";
import {
  BALANCE_GRADES,
  coupleUnbalance,
  equivalentBalanceGrade,
  finestGradeMet,
  standardBalanceGrade,
  permissibleResidualUnbalance,
  staticUnbalance,
  twoPlaneCorrection,
} from "../../calc/mass/balance.ts";
import {
  checkPart,
  MAX_NAME_LENGTH,
  MAX_PART_MASS,
  MAX_PARTS,
  partMass,
  partOwnInertia,
  partVolume,
  type LayoutPart,
  type PartShape,
} from "../../calc/mass/parts.ts";
import { counterweightPlan, massBalance, massBalanceInputs, type MassBalanceScalars } from "../../calc/mass/mass-balance.ts";
import { demoRobotBalance, demoRobotParts, MASS_BALANCE_SOURCE_KEYS } from "../../calc/mass/demo.ts";
import { encodeLayout, parseLayout } from "../../calc/mass/layout-text.ts";
import { describePartProblem } from "../../calc/mass/part-messages.ts";
import { layoutDrawing, partOutline } from "../../calc/mass/drawing.ts";
import { massProperties } from "../../calc/mass/properties.ts";
import { trueSensorRadius } from "../../calc/mass/sensor.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import { MATERIALS } from "../../calc/materials/materials.ts";
import { isSourceKey } from "../../calc/sources/index.ts";
import { fromSI, rpmToRadPerSecond, toSI } from "../../calc/core/units.ts";

// ---------------------------------------------------------------------------------------------
// Helpers.

const point = (mass: number, x: number, y: number, z = 0, name = "p"): LayoutPart => ({
  name,
  shape: { kind: "point" },
  mass: { kind: "given", mass },
  x,
  y,
  z,
});
const given = (shape: PartShape, mass: number, x = 0, y = 0, z = 0, name = "part"): LayoutPart => ({ name, shape, mass: { kind: "given", mass }, x, y, z });

function expectRel(actual: number, expected: number, rtol: number): void {
  const scale = Math.max(Math.abs(expected), Number.MIN_VALUE);
  expect(Math.abs(actual - expected) / scale, `${actual} vs ${expected}`).toBeLessThanOrEqual(rtol);
}

/** Every number reachable in a result is finite (null and strings allowed). */
function expectAllFinite(value: unknown, path = "result"): void {
  if (typeof value === "number") {
    expect(Number.isFinite(value), `${path} = ${value}`).toBe(true);
  } else if (Array.isArray(value)) {
    for (const [i, v] of value.entries()) expectAllFinite(v, `${path}[${i}]`);
  } else if (value !== null && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) expectAllFinite(v, `${path}.${k}`);
  }
}

function expectInputError(run: () => unknown, param: string, text?: RegExp): void {
  let caught: unknown;
  try {
    run();
  } catch (error) {
    caught = error;
  }
  expect(caught).toBeInstanceOf(CalcInputError);
  expect((caught as CalcInputError).param).toBe(param);
  if (text) expect((caught as CalcInputError).message).toMatch(text);
}

const DEFAULTS = Object.fromEntries(Object.entries(massBalanceInputs).map(([k, spec]) => [k, spec.default])) as MassBalanceScalars;

import { coord, len, massArb, partArb } from "../support/arbitraries.ts";
import { expectRefusal } from "../support/refusal.ts";
const layoutArb = fc.array(partArb, { minLength: 1, maxLength: 8 });

// ---------------------------------------------------------------------------------------------

describe("moments of inertia of each shape against the handbook table", () => {
  // Formulas: each row's source (Concise Oxford Dictionary of Mathematics App. 3, mathmos, web-formulas,
  // Young & Freedman Table 9.2); values computed in double precision from those formulas, to 10
  // significant figures or exactly, so rtol 1e-12 (floating point only).
  const CASES = [
    {
      source: "oxford-concise-mathematics",
      locator: "App. 3, disc about axis ½Mr²",
      inputs: given({ kind: "disk", radius: 0.1 }, 2),
      expected: 0.01,
      rtol: 1e-12,
      note: "solid disk 2 kg, R 0.1 m",
    },
    {
      source: "oxford-concise-mathematics",
      locator: "App. 3, hoop about axis Mr²",
      inputs: given({ kind: "ring", radius: 0.1 }, 2),
      expected: 0.02,
      rtol: 1e-12,
      note: "thin ring 2 kg, R 0.1 m",
    },
    {
      source: "mathmos-moments-of-inertia",
      locator: "annulus ½M(a²+b²)",
      inputs: given({ kind: "annulus", innerRadius: 0.05, outerRadius: 0.1 }, 2),
      expected: 0.0125,
      rtol: 1e-12,
      note: "annulus 2 kg, 0.05/0.1 m",
    },
    {
      source: "web-formulas-moment-of-inertia",
      locator: "rectangular plate M(L²+W²)/12",
      inputs: given({ kind: "plate", length: 0.3, width: 0.1, angle: 0 }, 1),
      expected: 0.008333333333,
      rtol: 1e-10,
      note: "plate 1 kg, 0.3 × 0.1 m (printed to 10 s.f.)",
    },
    {
      source: "web-formulas-moment-of-inertia",
      locator: "rectangular plate, turned in its plane",
      inputs: given({ kind: "plate", length: 0.3, width: 0.1, angle: 1.1 }, 1),
      expected: 0.008333333333,
      rtol: 1e-10,
      note: "the normal-axis inertia does not depend on the in-plane angle",
    },
    {
      source: "web-formulas-moment-of-inertia",
      locator: "bar about centre ML²/12",
      inputs: given({ kind: "rod", length: 0.3, angle: 0.4 }, 1),
      expected: 0.0075,
      rtol: 1e-12,
      note: "rod 1 kg, L 0.3 m",
    },
    {
      source: "oxford-concise-mathematics",
      locator: "App. 3, solid cylinder about axis ½Mr²",
      inputs: given({ kind: "cylinder", radius: 0.05, height: 0.2 }, 2),
      expected: 0.0025,
      rtol: 1e-12,
      note: "cylinder 2 kg, R 0.05 m, about its own (z) axis",
    },
    {
      source: "web-formulas-moment-of-inertia",
      locator: "particle Md², at its own centre",
      inputs: point(0.1, 0, 0),
      expected: 0,
      rtol: 0,
      note: "a point has no own inertia",
    },
  ];
  it.each(CASES)("$source, $locator: $note", ({ inputs, expected, rtol }) => {
    const own = partOwnInertia(inputs);
    if (expected === 0) expect(own.inertiaZ).toBe(0);
    else expectRel(own.inertiaZ, expected, rtol);
    expect(own.productXZ).toBe(0);
    expect(own.productYZ).toBe(0);
  });

  it("web-formulas-moment-of-inertia, particle Md²: 0.1 kg at 0.1 m from the axis has I = 0.001 kg·m²", () => {
    expectRel(massProperties([point(0.1, 0.1, 0)]).inertiaAboutOrigin, 0.001, 1e-12);
  });

  it("young-freedman-university-physics, Table 9.2 (rod about one end, ⅓ML²): the parallel-axis theorem gives 0.03 kg·m²", () => {
    // 1 kg rod of 0.3 m centred at x = 0.15 m, so one end is on the axis: 0.0075 + 1 × 0.15² = 0.03.
    const rod = given({ kind: "rod", length: 0.3, angle: 0 }, 1, 0.15, 0, 0);
    expectRel(massProperties([rod]).inertiaAboutOrigin, 0.03, 1e-12);
    expectRel(massProperties([rod]).inertiaAboutOrigin, (1 * 0.3 ** 2) / 3, 1e-12);
  });

  it("oxford-concise-mathematics, annulus from dimensions: steel ρ 7850, 20–100 mm, 10 mm thick (computed in double precision from I = ρπt(R₂⁴ − R₁⁴)/2: m = 2.367504224 kg, I = 0.01231102196 kg·m²)", () => {
    const ring: LayoutPart = {
      name: "flywheel",
      shape: { kind: "annulus", innerRadius: 0.02, outerRadius: 0.1 },
      mass: { kind: "material", material: "steel-4130-normalized", thickness: 0.01 },
      x: 0,
      y: 0,
      z: 0,
    };
    expect(MATERIALS["steel-4130-normalized"].density).toBe(7850);
    expectRel(partMass(ring), 2.367504224, 1e-9);
    expectRel(partOwnInertia(ring).inertiaZ, 0.01231102196, 1e-9);
    // Second method: integrate ρ·2πr·t·r² dr in closed form, ρπt(R₂⁴ − R₁⁴)/2.
    expectRel(partOwnInertia(ring).inertiaZ, (7850 * Math.PI * 0.01 * (0.1 ** 4 - 0.02 ** 4)) / 2, 1e-12);
  });

  it("keeps the thin ring and slender rod idealisations exactly as the handbook states them (section diameter ignored)", () => {
    const wire: LayoutPart = {
      name: "hoop",
      shape: { kind: "ring", radius: 0.1 },
      mass: { kind: "material", material: "al-6061-t6", thickness: 0.004 },
      x: 0,
      y: 0,
      z: 0,
    };
    const m = partMass(wire);
    expectRel(m, 2700 * 2 * Math.PI * 0.1 * ((Math.PI * 0.004 ** 2) / 4), 1e-12);
    expectRel(partOwnInertia(wire).inertiaZ, m * 0.01, 1e-12);
  });

  it("computes volume × density for every material shape", () => {
    const t = 0.005;
    const mk = (shape: PartShape, thickness?: number): LayoutPart => ({
      name: "",
      shape,
      mass: { kind: "material", material: "al-6061-t6", ...(thickness === undefined ? {} : { thickness }) },
      x: 0,
      y: 0,
      z: 0,
    });
    expectRel(partVolume(mk({ kind: "disk", radius: 0.07 }, t)), Math.PI * 0.07 ** 2 * t, 1e-12);
    expectRel(partVolume(mk({ kind: "annulus", innerRadius: 0.05, outerRadius: 0.07 }, t)), Math.PI * (0.07 ** 2 - 0.05 ** 2) * t, 1e-12);
    expectRel(partVolume(mk({ kind: "plate", length: 0.1, width: 0.05, angle: 0 }, t)), 0.1 * 0.05 * t, 1e-12);
    expectRel(partVolume(mk({ kind: "rod", length: 0.1, angle: 0 }, t)), (0.1 * Math.PI * t * t) / 4, 1e-12);
    expectRel(partVolume(mk({ kind: "cylinder", radius: 0.01, height: 0.03 })), Math.PI * 0.01 ** 2 * 0.03, 1e-12);
    // Doc example: 6061 disk, 70 mm radius, 5 mm thick → 7.697e-5 m³ and 0.208 kg.
    expectRel(partVolume(mk({ kind: "disk", radius: 0.07 }, t)), 7.697e-5, 5e-4);
    expectRel(partMass(mk({ kind: "disk", radius: 0.07 }, t)), 0.208, 5e-3);
  });
});

describe("composite bodies against hand sums (centre-of-mass, parallel-axis-theorem)", () => {
  const parts: LayoutPart[] = [
    given({ kind: "disk", radius: 0.1 }, 2, 0, 0, 0),
    given({ kind: "ring", radius: 0.08 }, 0.5, 0.02, 0, 0.01),
    point(0.1, -0.05, 0.03, 0.02),
    given({ kind: "plate", length: 0.06, width: 0.04, angle: 0.7 }, 0.2, 0.03, -0.04, 0.005),
    given({ kind: "rod", length: 0.1, angle: 1.2 }, 0.05, -0.02, -0.02, 0.015),
    given({ kind: "custom", inertiaZ: 1e-4, productXZ: 2e-6, productYZ: -1e-6 }, 0.3, 0.01, 0.05, 0.03),
  ];
  const props = massProperties(parts);
  // Hand sums, written out term by term.
  const M = 2 + 0.5 + 0.1 + 0.2 + 0.05 + 0.3;
  const xb = (0.5 * 0.02 + 0.1 * -0.05 + 0.2 * 0.03 + 0.05 * -0.02 + 0.3 * 0.01) / M;
  const yb = (0.1 * 0.03 + 0.2 * -0.04 + 0.05 * -0.02 + 0.3 * 0.05) / M;
  const zb = (0.5 * 0.01 + 0.1 * 0.02 + 0.2 * 0.005 + 0.05 * 0.015 + 0.3 * 0.03) / M;
  const own = 0.5 * 2 * 0.1 ** 2 + 0.5 * 0.08 ** 2 + (0.2 * (0.06 ** 2 + 0.04 ** 2)) / 12 + (0.05 * 0.1 ** 2) / 12 + 1e-4;
  const IO =
    own + 0.5 * 0.02 ** 2 + 0.1 * (0.05 ** 2 + 0.03 ** 2) + 0.2 * (0.03 ** 2 + 0.04 ** 2) + 0.05 * (0.02 ** 2 + 0.02 ** 2) + 0.3 * (0.01 ** 2 + 0.05 ** 2);
  const Pxz =
    2e-6 +
    2 * (0 - xb) * (0 - zb) +
    0.5 * (0.02 - xb) * (0.01 - zb) +
    0.1 * (-0.05 - xb) * (0.02 - zb) +
    0.2 * (0.03 - xb) * (0.005 - zb) +
    0.05 * (-0.02 - xb) * (0.015 - zb) +
    0.3 * (0.01 - xb) * (0.03 - zb);
  const Pyz =
    -1e-6 +
    2 * (0 - yb) * (0 - zb) +
    0.5 * (0 - yb) * (0.01 - zb) +
    0.1 * (0.03 - yb) * (0.02 - zb) +
    0.2 * (-0.04 - yb) * (0.005 - zb) +
    0.05 * (-0.02 - yb) * (0.015 - zb) +
    0.3 * (0.05 - yb) * (0.03 - zb);

  it("sums the mass and the centre of mass", () => {
    expectRel(props.totalMass, M, 1e-14);
    expectRel(props.centreX, xb, 1e-12);
    expectRel(props.centreY, yb, 1e-12);
    expectRel(props.centreZ, zb, 1e-12);
    expectRel(props.offset, Math.hypot(xb, yb), 1e-12);
  });

  it("sums the inertia about the geometric centre, and about the centre of mass by the parallel-axis theorem", () => {
    expectRel(props.inertiaAboutOrigin, IO, 1e-12);
    // Second route: I_G = I_O − M e² (loses a few digits to cancellation, hence 1e-10).
    expectRel(props.inertiaAboutCentre, IO - M * (xb * xb + yb * yb), 1e-10);
  });

  it("sums the products of inertia about the centre of mass (positive-product convention, own terms included)", () => {
    expectRel(props.productXZ, Pxz, 1e-10);
    expectRel(props.productYZ, Pyz, 1e-10);
    // About the geometric axis from z = 0: I_xz,O = I_xz,G + M x̄ z̄.
    expectRel(props.productXZAboutOrigin, Pxz + M * xb * zb, 1e-10);
    expectRel(props.productYZAboutOrigin, Pyz + M * yb * zb, 1e-10);
  });

  it("matches the doc example: 2 kg disk plus 0.1 kg at 0.1 m", () => {
    const p = massProperties([given({ kind: "disk", radius: 0.1 }, 2), point(0.1, 0.1, 0)]);
    expectRel(p.centreX, (0.1 * 0.1) / 2.1, 1e-14);
    expectRel(p.inertiaAboutOrigin, 0.011, 1e-12);
    expectRel(p.inertiaAboutCentre, 0.0109524, 0.00000005 / 0.0109524); // printed to 6 s.f.
  });

  it("gives zero products for flat parts all at one height, whatever their plan positions", () => {
    const flat = [
      given({ kind: "plate", length: 0.1, width: 0.02, angle: 0.3 }, 0.4, 0.05, 0.01, 0.01),
      given({ kind: "disk", radius: 0.03 }, 0.2, -0.04, 0.02, 0.01),
      point(0.05, 0.01, -0.06, 0.01),
    ];
    const p = massProperties(flat);
    expect(Math.abs(p.productXZ)).toBeLessThan(1e-18);
    expect(Math.abs(p.productYZ)).toBeLessThan(1e-18);
  });

  it("lists each part's mass and share", () => {
    expect(props.parts.map((r) => r.mass)).toEqual([2, 0.5, 0.1, 0.2, 0.05, 0.3]);
    expectRel(
      props.parts.reduce((s, r) => s + r.massFraction, 0),
      1,
      1e-14,
    );
  });
});

describe("ISO 21940-11 balance quality grades", () => {
  it("iso-21940-11, Table 1 (and bloch-geitner-machinery-maintenance Table 6-5): the eleven grades G 0.4 … G 4000", () => {
    expect(BALANCE_GRADES.map((g) => g.label)).toEqual(["G 0.4", "G 1", "G 2.5", "G 6.3", "G 16", "G 40", "G 100", "G 250", "G 630", "G 1600", "G 4000"]);
    expect(BALANCE_GRADES.map((g) => Number((g.value * 1000).toPrecision(12)))).toEqual([0.4, 1, 2.5, 6.3, 16, 40, 100, 250, 630, 1600, 4000]);
  });

  it("iso-21940-11: adjacent grades differ by a factor of about 2.5", () => {
    for (let i = 1; i < BALANCE_GRADES.length; i++) {
      const ratio = BALANCE_GRADES[i]!.value / BALANCE_GRADES[i - 1]!.value;
      expect(ratio).toBeGreaterThanOrEqual(2.5 - 1e-12);
      expect(ratio).toBeLessThanOrEqual(2.54 + 1e-12);
    }
  });

  const m1000lb = toSI(1000, "lb");
  const n15000 = rpmToRadPerSecond(15000);
  const REFERENCE = [
    {
      source: "energy-tech-balancing-example",
      locator: "p. 4, 1000 lb, 15 000 rpm, G 2.5",
      inputs: { totalMass: m1000lb, grade: 0.0025, angularSpeed: n15000 },
      expected: 1.0,
      pick: (u: { unbalance: number; perPlane: number }) => fromSI(u.unbalance, "oz·in"),
      rtol: 0.05,
      note: "printed 1.0 oz·in: ± half a unit in the last digit (ours 1.0026, also within 1 %)",
    },
    {
      source: "energy-tech-balancing-example",
      locator: "p. 4, per-plane allowance",
      inputs: { totalMass: m1000lb, grade: 0.0025, angularSpeed: n15000 },
      expected: 0.5,
      pick: (u: { unbalance: number; perPlane: number }) => fromSI(u.perPlane, "oz·in"),
      rtol: 0.1,
      note: "printed 0.5 oz·in (one significant figure)",
    },
    {
      source: "energy-tech-balancing-example",
      locator: "p. 3, U_per = G·6.015·W/N (G 1, 1 lb, 1 rpm)",
      inputs: { totalMass: toSI(1, "lb"), grade: 0.001, angularSpeed: rpmToRadPerSecond(1) },
      expected: 6.015,
      pick: (u: { unbalance: number; perPlane: number }) => fromSI(u.unbalance, "oz·in"),
      rtol: 0.0005 / 6.015,
      note: "constant printed to 4 s.f.; exact value 6.01530",
    },
    {
      source: "iso-21940-11",
      locator: "rpm form U_per = 9549·G·m/n (1 kg, G 1, 1 rpm), as quoted in a trade summary",
      inputs: { totalMass: 1, grade: 0.001, angularSpeed: rpmToRadPerSecond(1) },
      expected: 9549,
      pick: (u: { unbalance: number; perPlane: number }) => fromSI(u.unbalance, "g·mm"),
      rtol: 0.5 / 9549,
      note: "printed 9549 g·mm; exact value 9549.2966",
    },
  ];
  it.each(REFERENCE)("$source, $locator", ({ inputs, expected, pick, rtol }) => {
    expectRel(pick(permissibleResidualUnbalance(inputs)), expected, rtol);
  });

  it("bloch-geitner-machinery-maintenance, Fig. 6-33 notes: each of two planes is allowed half of U_per", () => {
    const u = permissibleResidualUnbalance({ totalMass: 1.4, grade: 0.04, angularSpeed: 300 });
    expect(u.perPlane).toBe(u.unbalance / 2);
  });

  it("iso-21940-11: the grade relation G = e·Ω round-trips with e_per = G/Ω", () => {
    fc.assert(
      fc.property(fc.constantFrom(...BALANCE_GRADES), fc.double({ min: 1, max: 6000, noNaN: true }), ({ value }, w) => {
        const { specificUnbalance } = permissibleResidualUnbalance({ totalMass: 2, grade: value, angularSpeed: w });
        expectRel(equivalentBalanceGrade({ offset: specificUnbalance, angularSpeed: w }), value, 1e-14);
        expect(finestGradeMet(equivalentBalanceGrade({ offset: specificUnbalance, angularSpeed: w }))?.value).toBe(value);
      }),
      { numRuns: 100 },
    );
  });

  it("iso-21940-11: e_per in µm equals e_per in g·mm/kg", () => {
    const u = permissibleResidualUnbalance({ totalMass: 1, grade: 0.0063, angularSpeed: rpmToRadPerSecond(3000) });
    expectRel(u.specificUnbalance / 1e-6, fromSI(u.unbalance, "g·mm"), 1e-12);
  });

  it("iso-21940-11 Table 1: names the standard grade a value equals (to a relative 1e-9), and none between grades", () => {
    // The grades G 0.4 … G 4000 in mm/s, from iso-21940-11 Table 1.
    expect(standardBalanceGrade(0.0063)?.label).toBe("G 6.3");
    expect(standardBalanceGrade(6.3 * 0.001)?.label).toBe("G 6.3");
    expect(standardBalanceGrade(4)?.label).toBe("G 4000");
    expect(standardBalanceGrade(0.0004)?.label).toBe("G 0.4");
    expect(standardBalanceGrade(0.005)).toBeNull();
    expect(standardBalanceGrade(0.0063 * (1 + 1e-6))).toBeNull();
    for (const g of BALANCE_GRADES) expect(standardBalanceGrade(g.value)).toBe(g);
    expectInputError(() => standardBalanceGrade(-1), "grade", /^grade must be 0 m\/s or more \(got -1 m\/s\)$/);
  });

  it("picks the finest grade met, and none beyond G 4000", () => {
    expect(finestGradeMet(0)?.label).toBe("G 0.4");
    expect(finestGradeMet(0.0063)?.label).toBe("G 6.3");
    expect(finestGradeMet(0.00631)?.label).toBe("G 16");
    expect(finestGradeMet(4)?.label).toBe("G 4000");
    expect(finestGradeMet(4.001)).toBeNull();
  });

  it("rates the doc example: 20.05 µm at 3000 rpm is 6.30 mm/s", () => {
    expectRel(equivalentBalanceGrade({ offset: 20.05e-6, angularSpeed: rpmToRadPerSecond(3000) }), 0.0063, 5e-4);
  });
});

describe("static and couple unbalance", () => {
  it("newton-second-law: 1.4 kg at e = 2 mm and 2400 rpm is 2800 g·mm and 176.9 N", () => {
    const s = staticUnbalance({ totalMass: 1.4, offset: 0.002, angularSpeed: rpmToRadPerSecond(2400) });
    expectRel(fromSI(s.unbalance, "g·mm"), 2800, 1e-12);
    expectRel(s.force, 176.9, 0.05 / 176.9); // doc example printed to 4 s.f.
    expectRel(s.force, 1.4 * 0.002 * rpmToRadPerSecond(2400) ** 2, 1e-14);
  });

  it("gives no force at rest and none with the centre of mass on the axis", () => {
    expect(staticUnbalance({ totalMass: 1, offset: 0.01, angularSpeed: 0 }).force).toBe(0);
    expect(staticUnbalance({ totalMass: 1, offset: 0, angularSpeed: 100 }).force).toBe(0);
  });

  it("rocks with ω²·|(I_xz, I_yz)|: two 10 g masses on a tilted diagonal give 0.632 N·m at 2400 rpm", () => {
    const p = massProperties([point(0.01, 0.05, 0, 0.01), point(0.01, -0.05, 0, -0.01)]);
    expect(p.offset).toBe(0);
    expectRel(p.productXZ, 1e-5, 1e-12);
    const c = coupleUnbalance({ productXZ: p.productXZ, productYZ: p.productYZ, angularSpeed: rpmToRadPerSecond(2400) });
    expectRel(c.moment, 0.632, 0.0005 / 0.632); // doc example printed to 3 s.f.
    expect(c.angle).toBe(0);
  });

  it("agrees with Euler's equations: the moment equals |ω × (I·ω)| built from the full inertia tensor", () => {
    // Second method: H = J ω with J the tensor (−I_xz off the diagonal), moment = ω × H in body axes.
    fc.assert(
      fc.property(layoutArb, fc.double({ min: 1, max: 500, noNaN: true }), (parts, w) => {
        const p = massProperties(parts);
        const H = [-p.productXZ * w, -p.productYZ * w, p.inertiaAboutCentre * w];
        const moment = [-w * H[1]!, w * H[0]!, 0];
        const c = coupleUnbalance({ productXZ: p.productXZ, productYZ: p.productYZ, angularSpeed: w });
        const expected = Math.hypot(moment[0]!, moment[1]!);
        expect(Math.abs(c.moment - expected)).toBeLessThanOrEqual(1e-12 * Math.max(expected, 1e-300) + 1e-300);
      }),
      { numRuns: 100 },
    );
  });
});

describe("the couple against the grade's allowance per plane", () => {
  it("hand formula (rigid-rotor-unbalance; bloch-geitner-machinery-maintenance, half of U_per per plane): a pure couple of 1e-5 kg·m² between planes 20 mm apart is ±500 g·mm per plane", () => {
    const parts = [given({ kind: "disk", radius: 0.06 }, 1.5), point(0.01, 0.05, 0, 0.01), point(0.01, -0.05, 0, -0.01)];
    const r = massBalance({ ...DEFAULTS, parts, planeZ1: 0, planeZ2: 0.02 });
    expect(r.layout.offset).toBe(0);
    // C/b = 1e-5/0.02 = 5e-4 kg·m; U_per/2 = 1.52 kg × 0.1 m/s / 251.3 rad/s / 2 = 302.4 g·mm: share 1.653.
    expectRel(r.coupleShareOfPermissible, 5e-4 / r.permissible.perPlane, 1e-12);
    expectRel(r.coupleShareOfPermissible, 5e-4 / ((1.52 * 0.1) / rpmToRadPerSecond(2400) / 2), 1e-12);
    // Planes twice as far apart halve the share; a layout with no couple has none.
    expectRel(massBalance({ ...DEFAULTS, parts, planeZ1: -0.01, planeZ2: 0.03 }).coupleShareOfPermissible, r.coupleShareOfPermissible / 2, 1e-12);
    expect(massBalance({ ...DEFAULTS, parts: [parts[0]!] }).coupleShareOfPermissible).toBe(0);
  });

  it("names the upper plane when the planes are so close that the couple per plane would overflow", () => {
    const parts = [given({ kind: "disk", radius: 0.06 }, 1.5), point(0.01, 0.05, 0, 0.01), point(0.01, -0.05, 0, -0.01)];
    expect(() => massBalance({ ...DEFAULTS, parts, planeZ1: 0, planeZ2: 5e-324 })).toThrow(/planeZ2/);
  });
});

describe("two-plane correction", () => {
  it("rigid-rotor-unbalance: 10 g at (50 mm, 0, 10 mm) with planes at 0 and 20 mm and r = 50 mm takes 5 g at 180° in each plane", () => {
    const p = massProperties([point(0.01, 0.05, 0, 0.01)]);
    const c = twoPlaneCorrection({
      firstMomentX: p.firstMomentX,
      firstMomentY: p.firstMomentY,
      productXZ: p.productXZAboutOrigin,
      productYZ: p.productYZAboutOrigin,
      planeZ1: 0,
      planeZ2: 0.02,
      radius: 0.05,
    });
    expectRel(c.lower.mass, 0.005, 1e-12);
    expectRel(c.upper.mass, 0.005, 1e-12);
    expect(c.lower.angle).toBe(Math.PI);
    expect(c.upper.angle).toBe(Math.PI);
  });

  it("cancels both the static and the couple unbalance of any layout, exactly", () => {
    fc.assert(
      fc.property(layoutArb, coord, coord, len(0.01, 0.2), (parts, z1, dz, radius) => {
        fc.pre(Math.abs(dz) > 1e-3);
        const z2 = z1 + dz;
        const p = massProperties(parts);
        const c = twoPlaneCorrection({
          firstMomentX: p.firstMomentX,
          firstMomentY: p.firstMomentY,
          productXZ: p.productXZAboutOrigin,
          productYZ: p.productYZAboutOrigin,
          planeZ1: z1,
          planeZ2: z2,
          radius,
        });
        const fixed = [...parts];
        for (const m of [c.lower, c.upper]) if (m.mass > 0) fixed.push(point(m.mass, m.x, m.y, m.z));
        const q = massProperties(fixed);
        // Scale of the quantities cancelled: the first moments and products involved.
        const uScale = Math.max(...parts.map((_part, i) => p.parts[i]!.mass * 0.3), c.lower.unbalance, c.upper.unbalance);
        expect(Math.abs(q.firstMomentX)).toBeLessThan(1e-12 * uScale + 1e-18);
        expect(Math.abs(q.firstMomentY)).toBeLessThan(1e-12 * uScale + 1e-18);
        const cScale = uScale * (0.5 + Math.abs(z1) + Math.abs(z2)) + 0.002;
        expect(Math.abs(q.productXZAboutOrigin)).toBeLessThan(1e-11 * cScale);
        expect(Math.abs(q.productYZAboutOrigin)).toBeLessThan(1e-11 * cScale);
      }),
      { numRuns: 150 },
    );
  });

  it("refuses two planes at the same height", () => {
    expectInputError(
      () => twoPlaneCorrection({ firstMomentX: 1, firstMomentY: 0, productXZ: 0, productYZ: 0, planeZ1: 0.01, planeZ2: 0.01, radius: 0.05 }),
      "planeZ2",
      /different from the other plane/,
    );
  });
});

describe("counterweights", () => {
  const base = { totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002 };

  it("centre-of-mass: at a given radius, 45.65 g at 55 mm opposite a 2 mm offset reaches 0.2 mm (50.91 g reaches zero)", () => {
    const a = counterweightAtRadius({ ...base, radius: 0.055 });
    expect(a.status).toBe("placed");
    expectRel(a.mass, 0.04565, 5e-4);
    expectRel(a.massForZero, 0.05091, 5e-4);
    expect(a.angle).toBe(Math.PI);
    expectRel(a.offsetAfter, 0.0002, 1e-12);
    expectRel(applyCounterweight({ parts: [point(1.4, 0.002, 0)], mass: a.massForZero, x: a.x, y: a.y, z: 0 }).after.offset + 1, 1, 1e-15);
    expectRel(applyCounterweight({ parts: [point(1.4, 0.002, 0)], mass: a.maxMass!, x: a.x, y: a.y, z: 0 }).after.offset, 0.0002, 1e-9);
  });

  it("centre-of-mass: a 50 g weight needs 56 mm, works from 50.2 to 61.8 mm, and is too far out if only 45 mm is available", () => {
    const b = counterweightRadiusForMass({ ...base, mass: 0.05, maxRadius: 0.065 });
    expect(b.status).toBe("placed");
    expectRel(b.radius!, 0.056, 1e-12);
    expectRel(b.minRadius, 0.0502, 1e-12);
    expectRel(b.maxRadiusWithinTarget, 0.0618, 1e-12);
    const tight = counterweightRadiusForMass({ ...base, mass: 0.05, maxRadius: 0.045 });
    expect(tight.status).toBe("too-far-out");
    expect(tight.radius).toBeNull();
    // r_0 = 56 mm lies beyond a 53 mm limit but the band starts at 50.2 mm: the limit itself is
    // recommended, leaving (1.4 × 2 − 0.05 × 53) g·m / 1.45 kg = 0.1034 mm (hand sum), inside 0.2 mm.
    const between = counterweightRadiusForMass({ ...base, mass: 0.05, maxRadius: 0.053 });
    expect(between.status).toBe("placed");
    expectRel(between.radius!, 0.053, 1e-12);
    expectRel(between.offsetAfter!, (1.4 * 0.002 - 0.05 * 0.053) / 1.45, 1e-9);
    expect(between.offsetAfter!).toBeLessThan(0.0002);
  });

  it("centre-of-mass: among mounting points, only the one on the far side works, and it needs the same 45.65 g", () => {
    const c = counterweightAtCandidates({
      ...base,
      candidates: [
        { x: 0.055, y: 0 },
        { x: 0, y: 0.055 },
        { x: -0.055, y: 0 },
      ],
    });
    expect(c.best).toBe(2);
    expect(c.candidates[0]!.feasible).toBe(false);
    expect(c.candidates[0]!.reason).toMatch(/never enters the target circle/);
    expect(c.candidates[1]!.feasible).toBe(false);
    expectRel(c.candidates[2]!.mass!, counterweightAtRadius({ ...base, radius: 0.055 }).mass, 1e-12);
  });

  it("recommends the mounting point that needs the least mass, the first of equals", () => {
    // On the far side the mass falls as the radius grows (m ≈ M(e − e_t)/(r + e_t)): 80 mm beats 55 and 30 mm.
    const far = counterweightAtCandidates({
      ...base,
      candidates: [
        { x: -0.03, y: 0 },
        { x: -0.08, y: 0 },
        { x: -0.055, y: 0 },
      ],
    });
    expect(far.best).toBe(1);
    expect(far.candidates[1]!.mass!).toBeLessThan(far.candidates[2]!.mass!);
    expect(far.candidates[2]!.mass!).toBeLessThan(far.candidates[0]!.mass!);
    // Two points mirrored about the line of the offset need the same mass: the first is named.
    const mirrored = counterweightAtCandidates({
      ...base,
      candidates: [
        { x: 0.05, y: 0 },
        { x: -0.055, y: 0.003 },
        { x: -0.055, y: -0.003 },
      ],
    });
    expect(mirrored.candidates[1]!.mass).toBe(mirrored.candidates[2]!.mass);
    expect(mirrored.best).toBe(1);
    expect(counterweightAtCandidates({ ...base, candidates: [{ x: 0.05, y: 0 }] }).best).toBeNull();
  });

  it("counts an offset exactly at the target as within it", () => {
    const at = { ...base, centreX: base.targetOffset };
    expect(counterweightRadiusForMass({ ...at, mass: 0.01, maxRadius: 0.05 }).status).toBe("not-needed");
    expect(counterweightAtCandidates({ ...at, candidates: [{ x: -0.05, y: 0 }] }).candidates[0]).toMatchObject({
      feasible: true,
      mass: 0,
      reason: "already within target",
    });
  });

  it("needs nothing when the offset is already within the target", () => {
    const ok = { ...base, centreX: 0.0001 };
    expect(counterweightAtRadius({ ...ok, radius: 0.05 })).toMatchObject({ status: "not-needed", mass: 0 });
    expect(counterweightRadiusForMass({ ...ok, mass: 0.01, maxRadius: 0.05 }).status).toBe("not-needed");
    expect(counterweightAtCandidates({ ...ok, candidates: [{ x: 0.05, y: 0 }] }).candidates[0]).toMatchObject({ feasible: true, mass: 0 });
  });

  it("dilutes the offset with mass at the centre: m = M(e − e_t)/e_t", () => {
    const c = counterweightAtCandidates({ ...base, candidates: [{ x: 0, y: 0 }] });
    expectRel(c.candidates[0]!.mass!, (1.4 * (0.002 - 0.0002)) / 0.0002, 1e-12);
  });

  // Second method for the candidate solver: walk the segment from c toward p by bisection on the
  // fraction t = m/(M + m), independent of the quadratic. Tolerance 1e-9: bisection runs to 1e-15 in t.
  function bisectionMass(M: number, cx: number, cy: number, et: number, px: number, py: number): number | null {
    const at = (t: number) => Math.hypot(cx + t * (px - cx), cy + t * (py - cy));
    if (at(0) <= et) return 0;
    const dx = px - cx;
    const dy = py - cy;
    const d2 = dx * dx + dy * dy;
    const tStar = d2 > 0 ? Math.min(1, Math.max(0, -(cx * dx + cy * dy) / d2)) : 0;
    if (at(tStar) > et) return null;
    // t = 1 is the point itself, reached only with infinite mass.
    if (tStar >= 1 && at(1) >= et) return null;
    let lo = 0;
    let hi = tStar;
    for (let i = 0; i < 200; i++) {
      const mid = (lo + hi) / 2;
      if (at(mid) > et) lo = mid;
      else hi = mid;
    }
    return (M * hi) / (1 - hi);
  }

  it("solves the candidate quadratic exactly: it agrees with a bisection along the line, and nothing lighter works", () => {
    fc.assert(
      fc.property(massArb, coord, coord, fc.double({ min: 1e-4, max: 0.02, noNaN: true }), coord, coord, (M, cx, cy, et, px, py) => {
        const [r] = counterweightAtCandidates({ totalMass: M, centreX: cx, centreY: cy, targetOffset: et, candidates: [{ x: px, y: py }] }).candidates;
        const check = bisectionMass(M, cx, cy, et, px, py);
        // Skip razor-edge cases where the line only grazes the circle.
        const grazing = (() => {
          const dx = px - cx;
          const dy = py - cy;
          const d = Math.hypot(dx, dy);
          return d > 0 && Math.abs(Math.abs(cx * dy - cy * dx) / d - et) < 1e-9;
        })();
        fc.pre(!grazing && Math.abs(Math.hypot(px, py) - et) > 1e-9);
        if (check === null) {
          expect(r!.feasible).toBe(false);
        } else {
          expect(r!.feasible).toBe(true);
          expect(Math.abs(r!.mass! - check)).toBeLessThanOrEqual(1e-9 * Math.max(check, M));
          expect(r!.offsetAfter!).toBeLessThanOrEqual(et * (1 + 1e-9));
          if (r!.mass! > 1e-9 * M) {
            const lighter = applyCounterweight({ parts: [point(M, cx, cy)], mass: r!.mass! * (1 - 1e-6), x: px, y: py, z: 0 }).after.offset;
            expect(lighter).toBeGreaterThan(et);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  it("brings any layout within the target when the computed counterweight is added", () => {
    fc.assert(
      fc.property(layoutArb, fc.double({ min: 1e-4, max: 0.01, noNaN: true }), len(0.02, 0.3), (parts, et, radius) => {
        const p = massProperties(parts);
        const a = counterweightAtRadius({ totalMass: p.totalMass, centreX: p.centreX, centreY: p.centreY, targetOffset: et, radius });
        const after = a.mass > 0 ? applyCounterweight({ parts, mass: a.mass, x: a.x, y: a.y, z: p.centreZ }).after : p;
        expect(after.offset).toBeLessThanOrEqual(et * (1 + 1e-9));
        if (a.mass > 0) {
          // A counterweight at the height of the centre of mass leaves the products unchanged.
          expect(Math.abs(after.productXZ - p.productXZ)).toBeLessThanOrEqual(1e-12 + 1e-9 * Math.abs(p.productXZ));
        }
        const b = counterweightRadiusForMass({ totalMass: p.totalMass, centreX: p.centreX, centreY: p.centreY, targetOffset: et, mass: 0.05, maxRadius: 0.2 });
        if (b.status === "placed") {
          expect(applyCounterweight({ parts, mass: 0.05, x: b.x!, y: b.y!, z: 0 }).after.offset).toBeLessThanOrEqual(et * (1 + 1e-9));
        }
      }),
      { numRuns: 150 },
    );
  });

  it("adds the counterweight as a new point-mass row and leaves the input list untouched", () => {
    const parts = Object.freeze([point(1, 0.01, 0, 0, "body")]);
    const r = applyCounterweight({ parts, mass: 0.1, x: -0.1, y: 0, z: 0.01 });
    expect(parts).toHaveLength(1);
    expect(r.parts.at(-1)).toEqual({ name: "counterweight", shape: { kind: "point" }, mass: { kind: "given", mass: 0.1 }, x: -0.1, y: 0, z: 0.01 });
    expect(r.before.offset).toBe(0.01);
    expectRel(r.after.offset + 1, 1, 1e-15);
  });
});

describe("true sensor radius and heading drift", () => {
  it("openstax-college-physics (a = ω²r): a sensor 32 mm out, 2 mm beyond the true centre, runs 11.1° ahead per revolution", () => {
    const s = trueSensorRadius({ centreX: 0.002, centreY: 0, sensorX: -0.032, sensorY: 0 });
    expectRel(s.radiusTrue, 0.034, 1e-12);
    expectRel(s.difference, 0.002, 1e-9);
    expectRel(s.rateRatio, Math.sqrt(34 / 32), 1e-12);
    expectRel(fromSI(s.driftPerRevolution, "deg"), 360 * (Math.sqrt(34 / 32) - 1), 1e-12);
    expectRel(fromSI(s.driftPerRevolution, "deg"), 11.1, 5e-3);
    expect(s.singleAxis?.rateRatio).toBe(s.rateRatio);
  });

  it("shows no drift with the centre of mass on the axis", () => {
    const s = trueSensorRadius({ centreX: 0, centreY: 0, sensorX: 0.03, sensorY: 0.01 });
    expect(s.rateRatio).toBe(1);
    expect(s.driftPerRevolution).toBe(0);
    expect(s.axisMisalignment).toBe(0);
  });

  it("tells a two-axis magnitude from a single radial axis when the offset is sideways", () => {
    const s = trueSensorRadius({ centreX: 0.002, centreY: 0, sensorX: 0, sensorY: 0.032 });
    expectRel(s.radiusTrue, Math.hypot(0.002, 0.032), 1e-12);
    expectRel(s.singleAxis!.radialComponent, 0.032, 1e-12);
    expect(s.singleAxis!.driftPerRevolution).toBe(0);
    expectRel(s.axisMisalignment, Math.atan2(0.002, 0.032), 1e-12);
  });

  it("has no single-axis reading when the true centre lies beyond the sensor", () => {
    expect(trueSensorRadius({ centreX: 0.04, centreY: 0, sensorX: 0.03, sensorY: 0 }).singleAxis).toBeNull();
  });

  it("agrees with the acceleration of the sensor point found by finite differences of its path", () => {
    // Second method: the sensor turns about the centre of mass; a = d²p/dt² by a central difference
    // (error ~ (ωh)²/12 ≈ 1e-8 with ωh = 3e-4), then ω̂ = √(|a|/r̂).
    fc.assert(
      fc.property(coord, coord, coord, coord, fc.double({ min: 10, max: 400, noNaN: true }), (cx, cy, sx, sy, w) => {
        fc.pre(Math.hypot(sx, sy) > 0.005);
        const pos = (t: number): [number, number] => {
          const c = Math.cos(w * t);
          const s = Math.sin(w * t);
          return [cx + c * (sx - cx) - s * (sy - cy), cy + s * (sx - cx) + c * (sy - cy)];
        };
        const h = 3e-4 / w;
        const [a0, a1] = pos(-h);
        const [b0, b1] = pos(0);
        const [c0, c1] = pos(h);
        const acc = Math.hypot((a0 - 2 * b0 + c0) / (h * h), (a1 - 2 * b1 + c1) / (h * h));
        const estimate = Math.sqrt(acc / Math.hypot(sx, sy)) / w;
        const s = trueSensorRadius({ centreX: cx, centreY: cy, sensorX: sx, sensorY: sy });
        expect(Math.abs(estimate - s.rateRatio)).toBeLessThan(1e-4 * Math.max(1, s.rateRatio));
      }),
      { numRuns: 100 },
    );
  });

  it("refuses a sensor at the geometric centre", () => {
    expectInputError(() => trueSensorRadius({ centreX: 0.001, centreY: 0, sensorX: 0, sensorY: 0 }), "sensorX", /away from the geometric centre/);
  });
});

describe("editing the parts list", () => {
  const a = point(0.1, 0.01, 0, 0, "a");
  const b = point(0.2, 0, 0.02, 0, "b");
  const c = given({ kind: "plate", length: 0.06, width: 0.02, angle: 0.5 }, 0.3, 0.03, 0.04, 0.01, "c");
  const list = Object.freeze([a, b, c]);

  it("adds, duplicates, removes and reorders without touching the input", () => {
    expect(addPart(list, point(1, 0, 0, 0, "d")).map((p) => p.name)).toEqual(["a", "b", "c", "d"]);
    expect(addPart(list, point(1, 0, 0, 0, "d"), 0).map((p) => p.name)).toEqual(["d", "a", "b", "c"]);
    expect(duplicatePart(list, 1).map((p) => p.name)).toEqual(["a", "b", "b (copy)", "c"]);
    expect(removePart(list, 0).map((p) => p.name)).toEqual(["b", "c"]);
    expect(movePart(list, 0, 2).map((p) => p.name)).toEqual(["b", "c", "a"]);
    expect(movePart(list, 2, 0).map((p) => p.name)).toEqual(["c", "a", "b"]);
    expect(list.map((p) => p.name)).toEqual(["a", "b", "c"]);
  });

  it("mirrors across x, across y and through the origin, turning plates and rods with them", () => {
    const mx = mirrorPart(c, "x");
    expect([mx.x, mx.y, mx.z]).toEqual([0.03, -0.04, 0.01]);
    expect(mx.shape).toEqual({ kind: "plate", length: 0.06, width: 0.02, angle: -0.5 });
    const my = mirrorPart(c, "y");
    expect([my.x, my.y]).toEqual([-0.03, 0.04]);
    expectRel((my.shape as { angle: number }).angle, Math.PI - 0.5, 1e-15);
    const mo = mirrorPart(c, "origin");
    expect([mo.x, mo.y]).toEqual([-0.03, -0.04]);
    // Plate corners of the mirror image are the mirror images of the corners.
    const corners = (p: LayoutPart) =>
      (partOutline(p) as { corners: readonly (readonly [number, number])[] }).corners.map(([x, y]) => `${x.toFixed(12)},${y.toFixed(12)}`).sort();
    expect(corners(mx)).toEqual(
      (partOutline(c) as { corners: readonly (readonly [number, number])[] }).corners.map(([x, y]) => `${x.toFixed(12)},${(-y + 0).toFixed(12)}`).sort(),
    );
    expect(mirrorPartInList(list, 2, "x")[2]).toEqual(mx);
    expect(addMirrorCopy(list, 0, "y").map((p) => p.name)).toEqual(["a", "a (mirror)", "b", "c"]);
  });

  it("turns a plate half a turn through the origin, mirrors only the part asked for, and refuses another axis", () => {
    // Through the origin a direction θ becomes θ + π, kept in (−π, π]: 0.5 → 0.5 − π.
    expectRel((mirrorPart(c, "origin").shape as { angle: number }).angle, 0.5 - Math.PI, 1e-15);
    const mirrored = mirrorPartInList(list, 2, "x");
    expect(mirrored.slice(0, 2)).toEqual([a, b]);
    expect(() => mirrorPart(c, "z" as never)).toThrow('axis must be "x", "y" or "origin" (got "z")');
    const cu = given({ kind: "custom", inertiaZ: 1e-4, productXZ: 2e-6, productYZ: -3e-6 }, 0.1, 0.01, 0.02, 0.03);
    expect(mirrorPart(cu, "origin").shape).toEqual({ kind: "custom", inertiaZ: 1e-4, productXZ: -2e-6, productYZ: 3e-6 });
  });

  it(`keeps a copy's or a mirror's name within ${MAX_NAME_LENGTH} characters`, () => {
    const long = { ...a, name: "n".repeat(MAX_NAME_LENGTH) };
    expect(duplicatePart([long], 0)[1]!.name).toBe(`${"n".repeat(MAX_NAME_LENGTH - 7)} (copy)`);
    expect(duplicatePart([long], 0)[1]!.name).toHaveLength(MAX_NAME_LENGTH);
    expect(addMirrorCopy([long], 0, "x")[1]!.name).toBe(`${"n".repeat(MAX_NAME_LENGTH - 9)} (mirror)`);
  });

  it("flips a custom part's own products with the coordinate that flips", () => {
    const cu = given({ kind: "custom", inertiaZ: 1e-4, productXZ: 2e-6, productYZ: -3e-6 }, 0.1, 0.01, 0.02, 0.03);
    expect(mirrorPart(cu, "x").shape).toEqual({ kind: "custom", inertiaZ: 1e-4, productXZ: 2e-6, productYZ: 3e-6 });
    expect(mirrorPart(cu, "y").shape).toEqual({ kind: "custom", inertiaZ: 1e-4, productXZ: -2e-6, productYZ: -3e-6 });
  });

  it("puts the centre of mass on the axis for any part plus its mirror image through the origin", () => {
    fc.assert(
      fc.property(layoutArb, (parts) => {
        const both = parts.flatMap((p) => [p, mirrorPart(p, "origin")]);
        const props = massProperties(both);
        expect(Math.abs(props.centreX)).toBeLessThan(1e-15);
        expect(Math.abs(props.centreY)).toBeLessThan(1e-15);
        // The half-turn copy also cancels both products about the geometric axis.
        expect(Math.abs(props.productXZAboutOrigin)).toBeLessThan(1e-15);
        expect(Math.abs(props.productYZAboutOrigin)).toBeLessThan(1e-15);
      }),
      { numRuns: 200 },
    );
  });

  it("restores the part when mirrored twice across the same line", () => {
    fc.assert(
      fc.property(partArb, fc.constantFrom("x" as const, "y" as const, "origin" as const), (part, axis) => {
        const back = mirrorPart(mirrorPart(part, axis), axis);
        expect(back.x).toBe(part.x);
        expect(back.y).toBe(part.y);
        if (back.shape.kind === "plate" || back.shape.kind === "rod") {
          const a0 = (part.shape as { angle: number }).angle;
          const a1 = back.shape.angle;
          // Directions are lines: equal modulo π.
          expect(Math.abs(Math.sin(a1 - a0))).toBeLessThan(1e-12);
        }
        expectRel(massProperties([back]).inertiaAboutOrigin + 1, massProperties([part]).inertiaAboutOrigin + 1, 1e-14);
      }),
      { numRuns: 200 },
    );
  });

  it("reports an index out of range by name", () => {
    expectInputError(() => removePart(list, 3), "index", /from 0 to 2/);
    expectInputError(() => movePart(list, 0, -1), "to");
    expectInputError(() => duplicatePart([], 0), "index", /non-empty list/);
  });
});

describe("URL text of the parts list", () => {
  it("writes a short readable token per part (lengths in mm, masses in g, angles in degrees)", () => {
    const parts: LayoutPart[] = [
      { name: "body", shape: { kind: "disk", radius: 0.07 }, mass: { kind: "material", material: "al-6061-t6", thickness: 0.005 }, x: 0, y: 0, z: 0.0025 },
      point(0.28, 0.015, 0, 0.012, "battery"),
      given({ kind: "plate", length: 0.045, width: 0.03, angle: Math.PI / 6 }, 0.035, -0.03, 0.02, 0.012, "board 1"),
    ];
    expect(encodeLayout(parts)).toBe("v1~disk_body_0_0_2.5_70_al-6061-t6_5~pt_battery_15_0_12_280~plate_board%201_-30_20_12_45_30_30_35");
  });

  it("round-trips any layout exactly (every number written as its shortest exact decimal)", () => {
    fc.assert(
      fc.property(layoutArb, (parts) => {
        const read = parseLayout(encodeLayout(parts));
        expect(read.problems).toEqual([]);
        expect(read.ok).toBe(true);
        // Exact numbers, so no tolerance: the same parts, and so the same mass properties to the bit.
        expect(read.parts).toEqual(parts);
        expect(massProperties(read.parts)).toEqual(massProperties(parts));
        expect(encodeLayout(read.parts)).toBe(encodeLayout(parts));
      }),
      { numRuns: 200 },
    );
  });

  it("reports each bad part by its index and reason, and keeps the good ones", () => {
    const text =
      "v1~pt_ok_0_0_0_10~blob_x_0_0_0_1~disk_d_0_0_0_abc_5~ann_a_0_0_0_50_40_30~disk_m_0_0_0_50_mithril_3~disk_t_0_0_0_50_al-6061-t6~pt_extra_0_0_0_10_11~pt_bad%ZZ_0_0_0_1";
    const r = parseLayout(text);
    expect(r.ok).toBe(false);
    expect(r.parts.map((p) => p.name)).toEqual(["ok"]);
    expect(r.problems.map((p) => p.index)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(r.problems[0]!.reason).toMatch(/unknown shape "blob"/);
    expect(r.problems[1]!.reason).toMatch(/field 6 \("abc"\) is not a number/);
    // The rule as checkPart states it, and as data for a page to word: in the parts editor's words
    // and the link's own units (millimetres).
    expect(r.problems[2]!.reason).toBe("part.shape.innerRadius must be less than outerRadius (0.04 m) (got 0.05 m)");
    expect(describePartProblem(r.problems[2]!.error, r.problems[2]!)).toEqual({
      label: "Inner radius",
      rule: "must be less than the outer radius (40 mm) (got 50 mm)",
    });
    expect(r.problems[3]!.reason).toMatch(/neither a number of grams nor a known material/);
    expect(r.problems[4]!.reason).toMatch(/needs a thickness/);
    expect(r.problems[5]!.reason).toMatch(/has 6 fields here, got 7/);
    expect(r.problems[6]!.reason).toMatch(/percent-encoded/);
  });

  it("reports a missing or unknown version for the whole text", () => {
    expect(parseLayout("pt_a_0_0_0_1")).toMatchObject({ ok: false, version: null, problems: [{ index: null }] });
    expect(parseLayout("v2~pt_a_0_0_0_1").problems[0]!.reason).toMatch(/version 2 is not known/);
    expect(parseLayout(42).problems[0]!.reason).toMatch(/must be text/);
    expect(parseLayout("v1")).toEqual({ ok: true, version: 1, parts: [], problems: [] });
  });

  it("never throws, whatever the text", () => {
    const pieces = fc.constantFrom("v1", "~", "_", "pt", "disk", "cust", "0", "-1", "1e400", "NaN", "%", "%41", "al-6061-t6", "", "x", ".5", "1e-3");
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.array(pieces, { maxLength: 30 }).map((p) => p.join("")),
        ),
        (text) => {
          const r = parseLayout(text);
          expect(r.ok).toBe(r.problems.length === 0);
          for (const p of r.parts) expect(() => checkPart(p)).not.toThrow();
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe("top-view drawing data", () => {
  it("gives a circle, a hoop, an annulus, rotated plate corners and rod end points", () => {
    expect(partOutline(given({ kind: "disk", radius: 0.05 }, 1, 0.01, 0.02))).toEqual({ kind: "circle", centre: [0.01, 0.02], radius: 0.05 });
    expect(partOutline(given({ kind: "cylinder", radius: 0.01, height: 0.02 }, 1))).toMatchObject({ kind: "circle", radius: 0.01 });
    expect(partOutline(given({ kind: "ring", radius: 0.05 }, 1))).toMatchObject({ kind: "hoop", radius: 0.05 });
    expect(partOutline(given({ kind: "annulus", innerRadius: 0.03, outerRadius: 0.05 }, 1))).toMatchObject({
      kind: "annulus",
      innerRadius: 0.03,
      outerRadius: 0.05,
    });
    expect(partOutline(point(1, 0.1, 0.2))).toEqual({ kind: "point", centre: [0.1, 0.2] });
    const plate = partOutline(given({ kind: "plate", length: 0.04, width: 0.02, angle: Math.PI / 2 }, 1, 0.1, 0));
    expect(plate.kind).toBe("polygon");
    const corners = (plate as { corners: readonly (readonly [number, number])[] }).corners;
    const expected = [
      [0.11, -0.02],
      [0.11, 0.02],
      [0.09, 0.02],
      [0.09, -0.02],
    ];
    corners.forEach(([x, y], i) => {
      expect(x).toBeCloseTo(expected[i]![0]!, 14);
      expect(y).toBeCloseTo(expected[i]![1]!, 14);
    });
    const rod = partOutline(given({ kind: "rod", length: 0.1, angle: Math.PI / 4 }, 1));
    expect(rod.kind).toBe("segment");
    const { from, to } = rod as { from: readonly [number, number]; to: readonly [number, number] };
    expectRel(Math.hypot(to[0] - from[0], to[1] - from[1]), 0.1, 1e-14);
  });

  it("bounds every outline and both centres", () => {
    const d = layoutDrawing(demoRobotParts());
    expect(d.outlines).toHaveLength(demoRobotParts().length);
    expectRel(d.bounds.maxX, 0.075, 1e-12);
    expectRel(d.bounds.minY, -0.075, 1e-12);
    expect(d.geometricCentre).toEqual([0, 0]);
    expect(d.centreOfMass[0]).toBeGreaterThan(0);
  });
});

describe("input checks", () => {
  it("names the field of a bad part in the parts list", () => {
    expectInputError(
      () => massProperties([point(1, 0, 0), given({ kind: "annulus", innerRadius: 0.06, outerRadius: 0.05 }, 1)]),
      "parts[1].shape.innerRadius",
      /^parts\[1\]\.shape\.innerRadius must be less than outerRadius \(0\.05 m\) \(got 0\.06 m\)$/,
    );
    expectInputError(() => massProperties([point(-1, 0, 0)]), "parts[0].mass.mass", /greater than 0 kg and at most 10000 kg \(got -1 kg\)/);
    expectInputError(
      () => massProperties([{ ...point(1, 0, 0), mass: { kind: "material", material: "al-6061-t6", thickness: 0.01 } }]),
      "parts[0].mass.kind",
      /"given" for a point part/,
    );
    expectInputError(
      () => massProperties([{ ...given({ kind: "disk", radius: 0.05 }, 1), mass: { kind: "material", material: "al-6061-t6" } }]),
      "parts[0].mass.thickness",
    );
    expectInputError(
      () => massProperties([{ ...given({ kind: "disk", radius: 0.05 }, 1), mass: { kind: "material", material: "adamant" as never, thickness: 0.01 } }]),
      "parts[0].mass.material",
      /materials table/,
    );
    expectInputError(() => massProperties([point(1, Number.NaN, 0)]), "parts[0].x", /finite number \(got not a number\)/);
    expectInputError(() => massProperties([]), "parts", /1 to 200 parts/);
  });

  it("throws CalcInputError naming the parameter for any invalid scalar", () => {
    const bad = fc.oneof(fc.constant(Number.NaN), fc.constant(Number.POSITIVE_INFINITY), fc.double({ max: -1e-9, noNaN: true }));
    fc.assert(
      fc.property(bad, fc.constantFrom("totalMass", "grade", "angularSpeed"), (value, param) => {
        const input = { totalMass: 1, grade: 0.0063, angularSpeed: 100, [param]: value };
        expectInputError(() => permissibleResidualUnbalance(input), param);
      }),
      { numRuns: 100 },
    );
    fc.assert(
      fc.property(bad, fc.constantFrom("totalMass", "targetOffset", "radius"), (value, param) => {
        const input = { totalMass: 1, centreX: 0.001, centreY: 0, targetOffset: 1e-4, radius: 0.05, [param]: value };
        expectInputError(() => counterweightAtRadius(input), param);
      }),
      { numRuns: 100 },
    );
    expectInputError(
      () => staticUnbalance({ totalMass: 0, offset: 0.001, angularSpeed: 10 }),
      "totalMass",
      /^totalMass must be greater than 0 kg \(got 0 kg\)$/,
    );
    expectInputError(() => counterweightAtRadius({ totalMass: 1, centreX: 0, centreY: 0, targetOffset: 0, radius: 0.05 }), "targetOffset");
    expectInputError(() => counterweightAtCandidates({ totalMass: 1, centreX: 0, centreY: 0, targetOffset: 1e-4, candidates: [] }), "candidates");
    expectInputError(
      () => counterweightAtCandidates({ totalMass: 1, centreX: 0, centreY: 0, targetOffset: 1e-4, candidates: [{ x: 0, y: Number.NaN }] }),
      "candidates[0].y",
    );
    expectInputError(() => massBalance({ ...DEFAULTS, parts: demoRobotParts(), balanceGrade: 5 }), "balanceGrade", /at most 4 m\/s/);
  });
});

describe("the mass-and-balance calculator", () => {
  it("declares each input with a unique URL key and a default inside its range", () => {
    const specs = Object.values(massBalanceInputs);
    expect(new Set(specs.map((s) => s.urlKey)).size).toBe(specs.length);
    for (const s of specs) {
      expect(s.default).toBeGreaterThanOrEqual(s.min);
      expect(s.default).toBeLessThanOrEqual(s.max);
    }
    expect(BALANCE_GRADES.some((g) => g.value === massBalanceInputs.balanceGrade.default)).toBe(true);
  });

  it("never returns a non-finite number for any valid layout and inputs", () => {
    fc.assert(
      fc.property(
        layoutArb,
        fc.record({
          spinSpeed: fc.double({ min: 1, max: 6000, noNaN: true }),
          targetOffset: fc.double({ min: 1e-6, max: 0.05, noNaN: true }),
          balanceGrade: fc.constantFrom(...BALANCE_GRADES.map((g) => g.value)),
          correctionRadius: len(0.001, 2),
          maxRadius: len(0.001, 2),
          counterweightMass: fc.double({ min: 1e-4, max: 100, noNaN: true }),
          planeZ1: fc.double({ min: -0.1, max: 0, noNaN: true }),
          planeZ2: fc.double({ min: 0.001, max: 0.1, noNaN: true }),
          sensorX: fc.double({ min: 0.001, max: 0.2, noNaN: true }),
          sensorY: coord,
          sideGrip: fc.double({ min: 0, max: 3, noNaN: true }),
          gripShare: fc.double({ min: 0, max: 1, noNaN: true }),
          supportRadius: len(0.001, 2),
        }),
        fc.array(fc.record({ x: coord, y: coord }), { maxLength: 4 }),
        (parts, scalars, candidates) => {
          const r = massBalance({ ...scalars, parts, candidates });
          expectAllFinite(r);
          expect(r.fix.after.offset).toBeLessThanOrEqual(Math.max(scalars.targetOffset, r.layout.offset) * (1 + 1e-9));
        },
      ),
      { numRuns: 150 },
    );
  });

  it("reports the worked example of the invented demo robot the way the chapter tells it", () => {
    const d = demoRobotBalance();
    const b = d.balance;
    expect(b.offsetVerdict).toBe("outside-target");
    expect(b.gradeVerdict).toBe("exceeds-grade");
    expect(b.gradeMet?.label).toBe("G 630");
    expect(b.counterweight.candidates?.best).toBe(2);
    expect(b.fix.method).toBe("candidate");
    expect(b.counterweight.forMass.status).toBe("placed");
    expect(d.washers).toBe(7);
    // The stack's distance from the axis, √(x² + y²) (oxford-concise-mathematics): the 55 mm bolt circle.
    expect(d.washerRadius).toBeCloseTo(Math.hypot(b.counterweight.atRadius.x, b.counterweight.atRadius.y), 15);
    expect(d.washerRadius).toBeCloseTo(0.055, 12);
    expect(d.withWashers.after.offset).toBeLessThan(d.targetOffset);
    expect(d.sensorWithWashers.driftPerRevolution).toBeLessThan(b.sensor.before.driftPerRevolution / 10);
    // The layout is symmetric in y, so the centre of mass lies on the x axis.
    expect(b.layout.centreY).toBe(0);
  });

  it("offers the demo's counterweight four bolts 55 mm out on ±x and ±y, and stacks the washers on one as a part named by their count", () => {
    const d = demoRobotBalance();
    expect(d.mountingPoints).toEqual([
      { x: 0.055, y: 0 },
      { x: 0, y: 0.055 },
      { x: -0.055, y: 0 },
      { x: 0, y: -0.055 },
    ]);
    const parts = demoRobotParts();
    expect(d.withWashers.parts.slice(0, parts.length)).toEqual(parts);
    // 7 washers of 6 g (DEMO_WASHER_MASS) = 42 g, at the candidate the balance picked.
    expect(d.withWashers.parts[parts.length]).toMatchObject({ name: "7 washers", shape: { kind: "point" }, mass: { kind: "given", mass: d.washerMass } });
    expect(d.washerMass).toBeCloseTo(0.042, 15);
  });

  it("says how the offset is fixed: at the counterweight radius without mounting points, not at all within the target, and not with a mass beyond any part's", () => {
    const parts = demoRobotParts();
    const atRadius = massBalance({ ...DEFAULTS, parts, candidates: [] });
    expect(atRadius.fix.method).toBe("correction-radius");
    expect(atRadius.fix.parts).toHaveLength(parts.length + 1);
    expect(atRadius.fix.after.offset).toBeLessThanOrEqual(DEFAULTS.targetOffset * (1 + 1e-9));
    const within = massBalance({ ...DEFAULTS, parts, candidates: [], targetOffset: 0.01 });
    expect(within.fix.method).toBe("none");
    expect(within.fix.parts).toEqual(parts);
    expect(within.fix.after).toBe(within.fix.before);
    // 100 kg half a metre off the axis, brought within 1 µm by a weight 1 µm from it: about 50 t, beyond MAX_PART_MASS.
    const lopsided = [point(100, 0.5, 0, 0, "heavy"), point(1, -0.5, 0, 0, "light")];
    const heavy = massBalance({ ...DEFAULTS, parts: lopsided, candidates: [], correctionRadius: 1e-6, targetOffset: 1e-6 });
    expect(heavy.counterweight.atRadius.mass).toBeGreaterThan(MAX_PART_MASS);
    expect(heavy.fix.method).toBe("too-heavy");
    expect(heavy.fix.parts).toEqual(lopsided);
  });

  it("iso-21940-11: gives U/U_per, which equals eΩ/G for the chosen grade, and e/e_target, each on the side of 1 its verdict says", () => {
    // U = M·e and U_per = M·G/Ω (iso-21940-11), so U/U_per = eΩ/G; e/e_target by definition (centre-of-mass).
    const d = demoRobotBalance();
    const b = d.balance;
    const grade = massBalanceInputs.balanceGrade.default;
    expectRel(b.unbalanceShareOfPermissible, (b.layout.offset * d.spinSpeed) / grade, 1e-12);
    expect(b.unbalanceShareOfPermissible).toBe(b.static.unbalance / b.permissible.unbalance);
    expect(b.unbalanceShareOfPermissible > 1).toBe(b.gradeVerdict === "exceeds-grade");
    expect(b.offsetShareOfTarget).toBe(b.layout.offset / d.targetOffset);
    expect(b.offsetShareOfTarget > 1).toBe(b.offsetVerdict === "outside-target");
  });

  it("names targetOffset when e/e_target would overflow, instead of returning Infinity", () => {
    expectInputError(() => massBalance({ ...DEFAULTS, parts: demoRobotParts(), targetOffset: 5e-324 }), "targetOffset", /finite/);
  });

  it("uses only bibliography keys that exist", () => {
    for (const key of MASS_BALANCE_SOURCE_KEYS) expect(isSourceKey(key), key).toBe(true);
  });
});

describe("the counterweight the calculator applies (counterweightPlan)", () => {
  const demoInput = (extra: Partial<MassBalanceScalars> = {}, candidates?: { x: number; y: number }[]) => ({
    ...DEFAULTS,
    ...extra,
    parts: demoRobotParts(),
    candidates,
  });
  const plan = (input: ReturnType<typeof demoInput>, mode: "radius" | "mass" | "points") => counterweightPlan({ input, balance: massBalance(input), mode });

  it("centre-of-mass: rounds the demo's 38.99 g at 55 mm up to 39.0 g, which lands inside the 0.2 mm target", () => {
    const p = plan(demoInput(), "radius");
    expect(p.status).toBe("apply");
    expect(p.counterweight!.mass).toBe(0.039);
    expectRel(p.counterweight!.x, -0.055, 1e-12);
    expect(Math.abs(p.counterweight!.y)).toBeLessThan(1e-15);
    // Hand sum: (1.399388 kg × 1.73790 mm − 39.0 g × 55 mm) / 1.438388 kg = (2.432 − 2.145) g·m / 1.438388 kg = 0.19953 mm.
    expectRel(p.after!.offset, (0.002432 - 0.039 * 0.055) / (1.399388144269552 + 0.039), 1e-6);
    expect(p.after!.offset).toBeLessThan(0.0002);
    expect(p.after!.gradeMet?.label).toBe("G 100");
    expect(p.after!.parts).toHaveLength(10);
    expect(p.after!.parts.at(-1)).toMatchObject({ name: "counterweight", shape: { kind: "point" }, mass: { kind: "given", mass: 0.039 } });
    // At the height of the centre of mass: the products of inertia about it are unchanged.
    expect(p.counterweight!.z).toBe(massProperties(demoRobotParts()).centreZ);
    // Polar form of the mounting point, r = √(x² + y²), θ = atan2(y, x) (oxford-concise-mathematics): 55 mm toward −x.
    expectRel(p.counterweight!.radius, 0.055, 1e-12);
    expectRel(p.counterweight!.angle, Math.PI, 1e-12);
    expect(p.counterweight!.radius).toBe(Math.hypot(p.counterweight!.x, p.counterweight!.y));
  });

  it("centre-of-mass: puts a 45 g weight in hand at the zero-offset radius, 54.04 mm, unrounded", () => {
    const p = plan(demoInput(), "mass");
    expect(p.counterweight!.mass).toBe(0.045);
    expectRel(Math.hypot(p.counterweight!.x, p.counterweight!.y), 0.002432 / 0.045, 1e-9);
    expect(p.after!.offset).toBeLessThan(1e-12);
    expect(plan(demoInput({ counterweightMass: 0.03 }), "mass").status).toBe("none");
  });

  it("picks the one bolt of four on the far side, and says none when no point works or none is given", () => {
    const bolts = [
      { x: 0.055, y: 0 },
      { x: 0, y: 0.055 },
      { x: -0.055, y: 0 },
      { x: 0, y: -0.055 },
    ];
    const p = plan(demoInput({}, bolts), "points");
    expect(p.counterweight).toMatchObject({ mass: 0.039, x: -0.055, y: 0 });
    expect(plan(demoInput({}, [bolts[0]!]), "points").status).toBe("none");
    expect(plan(demoInput(), "points").status).toBe("none");
  });

  it("needs nothing when the layout is already within the target", () => {
    const input = { ...DEFAULTS, parts: [point(1, 0.0001, 0)] };
    expect(counterweightPlan({ input, balance: massBalance(input), mode: "radius" })).toEqual({ status: "not-needed", counterweight: null, after: null });
  });

  it("keeps the exact least mass when rounding up would overshoot a narrow workable band", () => {
    // e = 9.9075 mm, e_t = 1 µm, r = 50 mm: the band is 198.126 g to 198.174 g, so 199 g would overshoot.
    const input = { ...DEFAULTS, targetOffset: 1e-6, correctionRadius: 0.05, parts: [point(1, 0.0099075, 0)] };
    const balance = massBalance(input);
    const p = counterweightPlan({ input, balance, mode: "radius" });
    expect(p.counterweight!.mass).toBe(balance.counterweight.atRadius.mass);
    expect(p.after!.offset).toBeLessThanOrEqual(1e-6 * (1 + 1e-9));
  });

  it("brings any layout within the target in every mode that answers (property)", () => {
    fc.assert(
      fc.property(
        layoutArb,
        fc.double({ min: 1e-4, max: 0.01, noNaN: true }),
        len(0.02, 0.3),
        fc.constantFrom("radius" as const, "mass" as const, "points" as const),
        (parts, et, r, mode) => {
          const input = {
            ...DEFAULTS,
            parts,
            targetOffset: et,
            correctionRadius: r,
            maxRadius: 0.3,
            candidates: [
              { x: r, y: 0 },
              { x: -r, y: 0 },
              { x: 0, y: r },
              { x: 0, y: -r },
            ],
          };
          const balance = massBalance(input);
          const p = counterweightPlan({ input, balance, mode });
          expectAllFinite(p);
          if (p.status === "apply") expect(p.after!.offset).toBeLessThanOrEqual(et * (1 + 1e-9));
          else expect(p.status).toBe(balance.offsetVerdict === "within-target" ? "not-needed" : "none");
        },
      ),
      { numRuns: 150 },
    );
  });
});

describe("the mass-and-balance calculator and its counterweight at their edges", () => {
  // A pure couple: 10 g at (50 mm, 0, 10 mm) and 10 g at (−50 mm, 0, −10 mm) on a 1.5 kg disk, I_xz = 1e-5 kg·m².
  const couplePair = [given({ kind: "disk", radius: 0.06 }, 1.5), point(0.01, 0.05, 0, 0.01), point(0.01, -0.05, 0, -0.01)];
  const planFor = (input: Parameters<typeof massBalance>[0], mode: "radius" | "mass" | "points") =>
    counterweightPlan({ input, balance: massBalance(input), mode });

  it("counts an offset exactly on the target as within it (centre-of-mass: e ≤ e_target)", () => {
    const r = massBalance({ ...DEFAULTS, parts: [point(1, 0.0002, 0)], targetOffset: 0.0002 });
    expect([r.layout.offset, r.offsetShareOfTarget, r.offsetVerdict, r.fix.method]).toEqual([0.0002, 1, "within-target", "none"]);
  });

  it("refuses two planes at one height in the two-plane correction's words, not as an overflow of the couple per plane", () => {
    expectRefusal(
      () => massBalance({ ...DEFAULTS, parts: couplePair, planeZ1: 0.01, planeZ2: 0.01 }),
      "planeZ2",
      0.01,
      "m",
      "planeZ2 must be a height different from the other plane (0.01 m) (got 0.01 m)",
    );
  });

  it("names the upper plane, in m, when the planes are so close that the couple per plane passes the largest double", () => {
    // C/b = 1e-5 kg·m² / 1e-315 m = 1e310 kg·m, past the largest double (about 1.8e308).
    expectRefusal(
      () => massBalance({ ...DEFAULTS, parts: couplePair, planeZ1: 0, planeZ2: 1e-315 }),
      "planeZ2",
      1e-315,
      "m",
      "planeZ2 must be far enough from the lower plane that the couple per plane stays finite (got 1e-315 m)",
    );
  });

  it("names the target offset, in m, when e/e_target passes the largest double", () => {
    // e/e_t = 1.738 mm / 1e-315 m = 1.7e312.
    expectRefusal(
      () => massBalance({ ...DEFAULTS, parts: demoRobotParts(), targetOffset: 1e-315 }),
      "targetOffset",
      1e-315,
      "m",
      "targetOffset must be large enough that the offset as a share of it stays finite (got 1e-315 m)",
    );
  });

  it("adds a counterweight of exactly the 10 000 kg part limit, and none heavier", () => {
    // M = 10 000 kg at e = 66.40625 mm, e_t = 1.953125 mm, r = 62.5 mm (binary fractions, so exact):
    // m = M(e − e_t)/(r + e_t) = 10 000 × 64.453125 / 64.453125 = 10 000 kg, which is MAX_PART_MASS.
    const input = { ...DEFAULTS, parts: [point(MAX_PART_MASS, 0.06640625, 0)], targetOffset: 0.001953125, correctionRadius: 0.0625 };
    const r = massBalance(input);
    expect(r.counterweight.atRadius.mass).toBe(MAX_PART_MASS);
    expect(r.fix.method).toBe("correction-radius");
    // (10 000 × 66.40625 − 10 000 × 62.5)/20 000 = 1.953125 mm: on the target.
    expect(r.fix.after.offset).toBeCloseTo(0.001953125, 15);
    const plan = planFor(input, "radius");
    expect(plan.status).toBe("apply");
    expect(plan.counterweight!.mass).toBe(MAX_PART_MASS);
    // 100 kg half a metre off the axis, brought within 1 µm by a weight 1 µm from it: about 50 t.
    const lopsided = { ...DEFAULTS, parts: [point(100, 0.5, 0, 0, "heavy"), point(1, -0.5, 0, 0, "light")], correctionRadius: 1e-6, targetOffset: 1e-6 };
    expect(planFor(lopsided, "radius")).toEqual({ status: "none", counterweight: null, after: null });
  });

  it(`leaves a list of ${MAX_PARTS} parts as it is: there is no room for a counterweight row`, () => {
    // 200 parts of 10 g, one of them 50 mm out: e = 0.5 g·m / 2 kg = 0.25 mm, outside the 0.2 mm target.
    const parts = Array.from({ length: MAX_PARTS }, (_, i) => point(0.01, i === 0 ? 0.05 : 0, 0, 0, `p${i}`));
    const input = { ...DEFAULTS, parts };
    const r = massBalance(input);
    expect(r.layout.offset).toBeCloseTo(0.00025, 15);
    expect(r.offsetVerdict).toBe("outside-target");
    expect(r.fix.method).toBe("list-full"); // not "none", which means within the target
    expect(r.fix.parts).toHaveLength(MAX_PARTS);
    expect(r.fix.after).toBe(r.fix.before);
    expect(planFor(input, "radius").status).toBe("none");
  });

  it("rounds a least mass of 485.15 g up to 486 g, not to the nearest 485 g, which would leave the offset outside the target", () => {
    // m = M(e − e_t)/(r + e_t) = 1 kg × 9.8 mm / 20.2 mm = 0.485149 kg.
    const input = { ...DEFAULTS, parts: [point(1, 0.01, 0)], targetOffset: 0.0002, correctionRadius: 0.02 };
    const plan = planFor(input, "radius");
    expect(plan.counterweight!.mass).toBe(0.486);
    // e' = (M e − m r)/(M + m) = (0.01 − 0.486 × 0.02)/1.486 = 0.18843 mm.
    expect(plan.after!.offset).toBeCloseTo(0.00028 / 1.486, 15);
  });

  it("keeps a least mass that already has three figures, 0.5 kg, instead of rounding it up to 0.501 kg", () => {
    // m = M(e − e_t)/(r + e_t) = (0.015625 − 0.001953125)/(0.025390625 + 0.001953125) = 0.013671875/0.02734375 = 0.5 kg.
    const input = { ...DEFAULTS, parts: [point(1, 0.015625, 0)], targetOffset: 0.001953125, correctionRadius: 0.025390625 };
    const plan = planFor(input, "radius");
    expect(plan.counterweight!.mass).toBe(0.5);
    // e' = (0.015625 − 0.5 × 0.025390625)/1.5 = 0.001953125 m: exactly on the target.
    expect(plan.after!.offset).toBeCloseTo(0.001953125, 15);
  });

  it("takes a rounded-up mass that lands exactly on the far edge of the workable band", () => {
    // u = 2⁻²⁰ m (about 0.95 µm) as the target, e = 31.25 mm − 1.5u, r = 62.5 mm: the band runs from
    // m_min = (e − u)/(r + u) = 0.49996 kg to m_max = (e + u)/(r − u) = (31.25 mm − 0.5u)/(62.5 mm − u) = 0.5 kg,
    // so rounding up to 3 figures gives 0.5 kg, whose offset |e − 0.5 r|/1.5 = 1.5u/1.5 = u is the target itself.
    const u = 2 ** -20;
    const input = { ...DEFAULTS, parts: [point(1, 0.03125 - 1.5 * u, 0)], targetOffset: u, correctionRadius: 0.0625 };
    const plan = planFor(input, "radius");
    expect(plan.counterweight!.mass).toBe(0.5);
    expect(plan.after!.offset).toBe(u);
  });

  it("puts a weight in hand of 45.67 g at its radius as given, not rounded to three figures", () => {
    // r₀ = M e / m = 1.4 kg × 2 mm / 45.67 g = 61.31 mm, inside the 65 mm maximum.
    const plan = planFor({ ...DEFAULTS, parts: [point(1.4, 0.002, 0)], counterweightMass: 0.04567 }, "mass");
    expect(plan.status).toBe("apply");
    expect(plan.counterweight!.mass).toBe(0.04567);
    expect(plan.counterweight!.radius).toBeCloseTo(0.0028 / 0.04567, 15);
  });

  it("names the request, its input or its balance that is not an object, and parts that are not a list", () => {
    const input = { ...DEFAULTS, parts: demoRobotParts() };
    const balance = massBalance(input);
    const plan = counterweightPlan as (request: unknown) => unknown;
    expectRefusal(() => plan(null), "request", null, "", "request must be an object of named inputs (got null)");
    expectRefusal(() => plan({ input: null, balance, mode: "radius" }), "input", null, "", "input must be an object of named inputs (got null)");
    expectRefusal(() => plan({ input, balance: null, mode: "radius" }), "balance", null, "", "balance must be an object of named inputs (got null)");
    expectRefusal(() => plan({ input: { ...input, parts: "hub" }, balance, mode: "radius" }), "parts", "hub", "", 'parts must be a list (got "hub")');
  });

  it("names the spin speed of the input it is given, in the calculator's words, when the grip radius would pass the largest double", () => {
    // d_g = μ s g/Ω² = 0.8 × 0.9 × 9.80665 / (1e-160)² = 7.1e320 m.
    const input = { ...DEFAULTS, parts: demoRobotParts() };
    const balance = massBalance(input);
    expectRefusal(
      () => counterweightPlan({ input: { ...input, spinSpeed: 1e-160 }, balance, mode: "radius" }),
      "spinSpeed",
      1e-160,
      "rad/s",
      "spinSpeed must be large enough that the grip radius μ·s·g/Ω² stays finite (got 1e-160 rad/s)",
    );
  });
});

describe("regression pins (our own digits from this module, not outside references)", () => {
  const d = demoRobotBalance();
  const b = d.balance;
  it.each([
    { what: "demo total mass [kg]", value: b.layout.totalMass, pin: 1.399388144269552 },
    { what: "demo offset e [m]", value: b.layout.offset, pin: 0.0017379023896686274 },
    { what: "demo centre height [m]", value: b.layout.centreZ, pin: 0.014665262829302762 },
    { what: "demo I about the centre of mass [kg·m²]", value: b.layout.inertiaAboutCentre, pin: 0.004350416920800062 },
    { what: "demo I about the geometric centre [kg·m²]", value: b.layout.inertiaAboutOrigin, pin: 0.004354643499411737 },
    { what: "demo I_xz [kg·m²]", value: b.layout.productXZ, pin: -9.299192008643043e-7 },
    { what: "demo static unbalance [kg·m]", value: b.static.unbalance, pin: 0.002432 },
    { what: "demo rotating force at 2400 rpm [N]", value: b.static.force, pin: 153.61841858207563 },
    { what: "demo equivalent grade [m/s]", value: b.equivalentGrade, pin: 0.43678251040312843 },
    { what: "demo U_per for G 100 [kg·m]", value: b.permissible.unbalance, pin: 0.0005567988511617339 },
    { what: "demo counterweight at 55 mm [kg]", value: b.counterweight.atRadius.mass, pin: 0.03898772411496539 },
    { what: "demo radius for a 45 g weight [m]", value: b.counterweight.forMass.radius!, pin: 0.05404444444444445 },
    { what: "demo two-plane lower mass [kg]", value: b.twoPlane.lower.mass, pin: 0.021483636363636368 },
    { what: "demo two-plane upper mass [kg]", value: b.twoPlane.upper.mass, pin: 0.022734545454545455 },
    // About the spin centre, 0.112 mm of grip short of the centre of mass (0.16836 rad/rev when it was taken about the centre of mass).
    { what: "demo sensor drift before [rad/rev]", value: b.sensor.before.driftPerRevolution, pin: 0.15766577966829862 },
    { what: "demo spin centre before, from the wheels' centre [m]", value: b.spinCentre.before.distanceFromWheels, pin: 0.0016261199837924376 },
    { what: "demo couple against the weight's moment on 70 mm [-]", value: b.lift.ratio, pin: 0.06114599671393513 },
    { what: "demo offset with 7 washers [m]", value: d.withWashers.after.offset, pin: 8.464062957991494e-5 },
    // The wheels hold a 0.085 mm orbit at 2400 rpm: the robot turns about their centre (0.0083 rad/rev about the centre of mass).
    { what: "demo sensor drift with washers [rad/rev]", value: d.sensorWithWashers.driftPerRevolution, pin: 0 },
    {
      what: "G 6.3 at 3000 rpm, e_per [m] (computed in double precision from ISO 21940-11 G = e_per·Ω)",
      value: permissibleResidualUnbalance({ totalMass: 1, grade: 0.0063, angularSpeed: rpmToRadPerSecond(3000) }).specificUnbalance,
      pin: 20.05352283e-6,
    },
    {
      what: "1000 lb, 15 000 rpm, G 2.5 in g·mm (energy-tech-balancing-example p. 4, recomputed in SI in double precision)",
      value: fromSI(permissibleResidualUnbalance({ totalMass: toSI(1000, "lb"), grade: 0.0025, angularSpeed: rpmToRadPerSecond(15000) }).unbalance, "g·mm"),
      pin: 721.914678,
    },
  ])("$what", ({ value, pin }) => {
    expectRel(value, pin, 1e-9);
  });
});
