import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { CalcInputError } from "../../calc/core/errors.ts";
import {
  BOLT_SHEAR_ULTIMATE_RATIO,
  boltShearStrengths,
  EN1993_GAMMA_M2,
  EN1993_THREAD_SHEAR_FACTOR,
  eurocodeBoltShearResistance,
  eurocodeBoltTensionResistance,
  METRIC_COARSE_THREADS,
  metricThread,
  minimumUltimateTensileLoad,
  PROPERTY_CLASS_OPTIONS,
  PROPERTY_CLASSES,
  propertyClass,
  propertyClassShearStrengths,
  proofLoad,
  requireChoice,
  tensileStressArea,
  THREAD_SIZE_OPTIONS,
  threadDiameters,
  type ThreadSize,
} from "../../calc/loads/fasteners.ts";
import { isSourceKey } from "../../calc/sources/index.ts";

/** Relative tolerance of ± half a unit in the last printed digit: "2.07" → 0.005 / 2.07. */
function halfUnitRtol(printed: string): number {
  const decimals = printed.includes(".") ? printed.split(".")[1]!.length : 0;
  return (0.5 * 10 ** -decimals) / Math.abs(Number(printed));
}

function expectClose(actual: number, expected: number, rtol: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));
}

const MM2 = 1e-6;

interface StressAreaCase {
  source: string;
  locator: string;
  inputs: { size: ThreadSize };
  /** The value as printed [mm²]. */
  printed: string;
  expected: number;
  rtol: number;
  note: string;
}

function stressAreaCase(size: ThreadSize, printed: string, source: string, locator: string, note = ""): StressAreaCase {
  return { source, locator, inputs: { size }, printed, expected: Number(printed) * MM2, rtol: halfUnitRtol(printed), note };
}

const ISO_TABLE_4 = "Table 4, copy at usefastener.com/knowledge/404";
const STRESS_AREAS: StressAreaCase[] = [
  stressAreaCase("M2", "2.07", "gb-t-16823-1", "stress-area table, copy at china-reducers.com", "ISO 898-1's load tables start at M3"),
  stressAreaCase("M2.5", "3.39", "gb-t-16823-1", "stress-area table, copy at china-reducers.com"),
  stressAreaCase("M3", "5.03", "iso-898-1", ISO_TABLE_4),
  stressAreaCase("M4", "8.78", "iso-898-1", ISO_TABLE_4),
  stressAreaCase("M5", "14.2", "iso-898-1", ISO_TABLE_4),
  stressAreaCase("M6", "20.1", "iso-898-1", ISO_TABLE_4),
  stressAreaCase("M8", "36.6", "iso-898-1", ISO_TABLE_4),
  stressAreaCase("M10", "58", "iso-898-1", ISO_TABLE_4, "printed as 58 in the copy; also 58 in the slsbearings.com copy of the same table"),
  stressAreaCase("M12", "84.3", "iso-898-1", ISO_TABLE_4, "also the A_s of the en-1993-1-8 design tables (orangebook.arcelormittal.com)"),
];

describe("tensile stress areas of ISO metric coarse threads", () => {
  it.each(STRESS_AREAS)("$source, $locator: $inputs.size has A_s = $printed mm² in the table", ({ inputs, expected }) => {
    // Data entry: the table holds exactly the printed value.
    expect(METRIC_COARSE_THREADS[inputs.size].stressArea).toBeCloseTo(expected, 15);
  });

  it.each(STRESS_AREAS)(
    "$source, $locator: the A_s formula reproduces $inputs.size's $printed mm² to ± half a unit in the last digit",
    ({ inputs, expected, rtol }) => {
      const { nominalDiameter, pitch } = METRIC_COARSE_THREADS[inputs.size];
      expectClose(tensileStressArea({ nominalDiameter, pitch }), expected, rtol);
    },
  );

  it("offers every size of the table, each once, smallest first", () => {
    const values = THREAD_SIZE_OPTIONS.map((o) => o.value);
    expect(values).toEqual(Object.keys(METRIC_COARSE_THREADS));
    const diameters = values.map((v) => METRIC_COARSE_THREADS[v].nominalDiameter);
    expect([...diameters].sort((a, b) => a - b)).toEqual(diameters);
    for (const option of THREAD_SIZE_OPTIONS) expect(option.label.startsWith(option.value)).toBe(true);
  });

  it("cites a known bibliography entry for every tabulated area", () => {
    for (const thread of Object.values(METRIC_COARSE_THREADS)) expect(isSourceKey(thread.stressAreaSource)).toBe(true);
  });

  it("gives the same area from the d₂/d₃ definition and from the 0.938 194 P short form (engineersedge; ux.uis.no)", () => {
    // The short form's coefficient is printed to 6 decimals: its rounding (≤ 5e-7·P on the
    // diameter) moves the area by under 1e-6 relative for every thread here.
    for (const { nominalDiameter: d, pitch: p } of Object.values(METRIC_COARSE_THREADS)) {
      expectClose(tensileStressArea({ nominalDiameter: d, pitch: p }), (Math.PI / 4) * (d - 0.938194 * p) ** 2, 1e-6);
    }
  });

  it("builds d₂, d₁ and d₃ with the ISO 724 coefficients 0.649 519, 1.082 532 and 1.226 869 (ux.uis.no StressArea)", () => {
    // Coefficients printed to 6 decimals: tolerance half a unit of the 6th decimal times P.
    for (const { nominalDiameter: d, pitch: p } of Object.values(METRIC_COARSE_THREADS)) {
      const t = threadDiameters({ nominalDiameter: d, pitch: p });
      const tol = 5e-7 * p;
      expect(Math.abs(t.fundamentalTriangleHeight - 0.866025 * p)).toBeLessThanOrEqual(tol);
      expect(Math.abs(t.pitchDiameter - (d - 0.649519 * p))).toBeLessThanOrEqual(tol);
      expect(Math.abs(t.minorDiameter - (d - 1.082532 * p))).toBeLessThanOrEqual(tol);
      expect(Math.abs(t.stressDiameterD3 - (d - 1.226869 * p))).toBeLessThanOrEqual(tol);
    }
  });

  it("never gives a non-finite or non-positive area for any allowed diameter and pitch", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 0.2, noNaN: true }), fc.double({ min: 1e-3, max: 0.999, noNaN: true }), (d, fraction) => {
        const area = tensileStressArea({ nominalDiameter: d, pitch: (fraction * d) / 1.3 });
        expect(Number.isFinite(area) && area > 0).toBe(true);
      }),
    );
  });

  it("names the pitch when it is too coarse for the diameter", () => {
    expect(() => tensileStressArea({ nominalDiameter: 0.004, pitch: 0.004 })).toThrow(CalcInputError);
    expect(() => tensileStressArea({ nominalDiameter: 0.004, pitch: 0.004 })).toThrow(
      "pitch must be less than the nominal diameter ÷ 1.3, 0.003077 m (got 0.004 m)",
    );
  });
});

describe("ISO 898-1 property classes (Table 3)", () => {
  const MPa = 1e6;
  // Confirmed against several published reproductions of ISO 898-1 Table 3.
  const ROWS = [
    {
      source: "iso-898-1",
      locator: "Table 3, class 4.6",
      inputs: { id: "4.6" },
      expected: { rmNom: 400, rmMin: 400, yNom: 240, yMin: 240, kind: "ReL", sp: 225 },
      rtol: 0,
      note: "R_eL",
    },
    {
      source: "iso-898-1",
      locator: "Table 3, class 8.8 (d ≤ 16 mm)",
      inputs: { id: "8.8" },
      expected: { rmNom: 800, rmMin: 800, yNom: 640, yMin: 640, kind: "Rp0.2", sp: 580 },
      rtol: 0,
      note: "d > 16 mm row not used",
    },
    {
      source: "iso-898-1",
      locator: "Table 3, class 10.9",
      inputs: { id: "10.9" },
      expected: { rmNom: 1000, rmMin: 1040, yNom: 900, yMin: 940, kind: "Rp0.2", sp: 830 },
      rtol: 0,
      note: "",
    },
    {
      source: "iso-898-1",
      locator: "Table 3, class 12.9",
      inputs: { id: "12.9" },
      expected: { rmNom: 1200, rmMin: 1220, yNom: 1080, yMin: 1100, kind: "Rp0.2", sp: 970 },
      rtol: 0,
      note: "",
    },
  ] as const;

  it.each(ROWS)("$source, $locator: holds the printed strengths exactly", ({ inputs, expected }) => {
    const row = propertyClass(inputs.id);
    expect(row.tensileStrengthNominal).toBe(expected.rmNom * MPa);
    expect(row.tensileStrengthMin).toBe(expected.rmMin * MPa);
    expect(row.yieldStrengthNominal).toBe(expected.yNom * MPa);
    expect(row.yieldStrengthMin).toBe(expected.yMin * MPa);
    expect(row.yieldKind).toBe(expected.kind);
    expect(row.proofStress).toBe(expected.sp * MPa);
  });

  it.each(PROPERTY_CLASS_OPTIONS.map((o) => o.value))("follows the designation rule for %s: first number × 100 MPa and second ÷ 10 of it", (id) => {
    const [first, second] = id.split(".").map(Number) as [number, number];
    const row = PROPERTY_CLASSES[id];
    expect(row.tensileStrengthNominal).toBeCloseTo(first * 100 * MPa, 3);
    expect(row.yieldStrengthNominal).toBeCloseTo((first * 100 * second * MPa) / 10, 3);
  });

  it("keeps proof stress below the minimum yield and the minimum yield below the minimum tensile strength", () => {
    for (const row of Object.values(PROPERTY_CLASSES)) {
      expect(row.proofStress).toBeLessThan(row.yieldStrengthMin);
      expect(row.yieldStrengthMin).toBeLessThan(row.tensileStrengthMin);
      expect(row.tensileStrengthMin).toBeGreaterThanOrEqual(row.tensileStrengthNominal);
    }
  });
});

describe("ISO 898-1 minimum ultimate tensile and proof loads", () => {
  // Loads are printed rounded to about 3 significant figures, not uniformly: ± 0.5 %.
  const LOAD_TABLE = "Table 4 (A_s,nom × R_m,min), copy at usefastener.com/knowledge/404";
  const ULTIMATE = [
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M3", propertyClass: "12.9" }, expected: 6140, rtol: 5e-3, note: "5.03 × 1220 = 6136.6" },
    {
      source: "iso-898-1",
      locator: LOAD_TABLE,
      inputs: { size: "M4", propertyClass: "10.9" },
      expected: 9130,
      rtol: 5e-3,
      note: "the copy prints 91130, a typo; slsbearings.com prints 9,130",
    },
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M5", propertyClass: "10.9" }, expected: 14800, rtol: 5e-3, note: "14.2 × 1040 = 14 768" },
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M5", propertyClass: "12.9" }, expected: 17300, rtol: 5e-3, note: "" },
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M6", propertyClass: "8.8" }, expected: 16100, rtol: 5e-3, note: "20.1 × 800 = 16 080" },
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M8", propertyClass: "8.8" }, expected: 29200, rtol: 5e-3, note: "" },
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M8", propertyClass: "12.9" }, expected: 44600, rtol: 5e-3, note: "" },
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M10", propertyClass: "8.8" }, expected: 46400, rtol: 5e-3, note: "" },
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M12", propertyClass: "4.6" }, expected: 33700, rtol: 5e-3, note: "" },
    { source: "iso-898-1", locator: LOAD_TABLE, inputs: { size: "M12", propertyClass: "8.8" }, expected: 67400, rtol: 5e-3, note: "" },
  ];
  const PROOF_TABLE = "proof loads for hexagon bolts, copy at slsbearings.com tensile-strength page";
  const PROOF = [
    { source: "iso-898-1", locator: PROOF_TABLE, inputs: { size: "M3", propertyClass: "12.9" }, expected: 4880, rtol: 5e-3, note: "5.03 × 970" },
    { source: "iso-898-1", locator: PROOF_TABLE, inputs: { size: "M4", propertyClass: "8.8" }, expected: 5100, rtol: 5e-3, note: "8.78 × 580 = 5092" },
    { source: "iso-898-1", locator: PROOF_TABLE, inputs: { size: "M6", propertyClass: "10.9" }, expected: 16700, rtol: 5e-3, note: "" },
    { source: "iso-898-1", locator: PROOF_TABLE, inputs: { size: "M10", propertyClass: "8.8" }, expected: 33700, rtol: 5e-3, note: "" },
    { source: "iso-898-1", locator: PROOF_TABLE, inputs: { size: "M12", propertyClass: "12.9" }, expected: 81800, rtol: 5e-3, note: "" },
  ];

  it.each(ULTIMATE)("$source, $locator: $inputs.size class $inputs.propertyClass carries $expected N at minimum", ({ inputs, expected, rtol }) => {
    expectClose(minimumUltimateTensileLoad(inputs), expected, rtol);
  });

  it.each(PROOF)("$source, $locator: $inputs.size class $inputs.propertyClass has a proof load of $expected N", ({ inputs, expected, rtol }) => {
    expectClose(proofLoad(inputs), expected, rtol);
  });
});

describe("EN 1993-1-8 design resistances (cross-check of the shear factor)", () => {
  // Steel producer's EN 1993-1-8 design tables, orangebook.arcelormittal.com nodes 46, 50, 74.
  // Printed to 0.1 kN (± 0.05 kN) or to whole kN (± 0.5 kN). A_s is the table's own.
  const kN = 1000;
  const CASES = [
    {
      source: "en-1993-1-8",
      locator: "Table 3.4; design table, class 4.6 M20",
      inputs: { propertyClass: "4.6", area: 245e-6, kind: "shear" },
      expected: 47.0 * kN,
      rtol: 0.05 / 47.0,
      note: "α_v = 0.6",
    },
    {
      source: "en-1993-1-8",
      locator: "Table 3.4; design table, class 4.6 M20",
      inputs: { propertyClass: "4.6", area: 245e-6, kind: "tension" },
      expected: 70.6 * kN,
      rtol: 0.05 / 70.6,
      note: "k₂ = 0.9",
    },
    {
      source: "en-1993-1-8",
      locator: "Table 3.4; design table, class 4.6 M12",
      inputs: { propertyClass: "4.6", area: 84.3e-6, kind: "shear" },
      expected: 16.2 * kN,
      rtol: 0.05 / 16.2,
      note: "",
    },
    {
      source: "en-1993-1-8",
      locator: "Table 3.4; design table, class 4.6 M12",
      inputs: { propertyClass: "4.6", area: 84.3e-6, kind: "tension" },
      expected: 24.3 * kN,
      rtol: 0.05 / 24.3,
      note: "",
    },
    {
      source: "en-1993-1-8",
      locator: "Table 3.4; design table, class 8.8 M20",
      inputs: { propertyClass: "8.8", area: 245e-6, kind: "shear" },
      expected: 94.1 * kN,
      rtol: 0.05 / 94.1,
      note: "α_v = 0.6",
    },
    {
      source: "en-1993-1-8",
      locator: "Table 3.4; design table, class 10.9 countersunk M20",
      inputs: { propertyClass: "10.9", area: 245e-6, kind: "shear" },
      expected: 98 * kN,
      rtol: 0.5 / 98,
      note: "α_v = 0.5",
    },
    {
      source: "en-1993-1-8",
      locator: "Table 3.4; design table, class 10.9 countersunk M20",
      inputs: { propertyClass: "10.9", area: 245e-6, kind: "tension-countersunk" },
      expected: 123 * kN,
      rtol: 0.5 / 123,
      note: "k₂ = 0.63",
    },
  ] as const;

  it.each(CASES)("$source, $locator: $inputs.kind resistance $expected N", ({ inputs, expected, rtol }) => {
    const row = propertyClass(inputs.propertyClass);
    // Eurocode uses the nominal f_ub.
    const ultimateStrength = row.tensileStrengthNominal;
    const value =
      inputs.kind === "shear"
        ? eurocodeBoltShearResistance({ area: inputs.area, ultimateStrength, shearFactor: EN1993_THREAD_SHEAR_FACTOR[row.id]! })
        : eurocodeBoltTensionResistance({ stressArea: inputs.area, ultimateStrength, k2: inputs.kind === "tension" ? 0.9 : 0.63 });
    expectClose(value, expected, rtol);
  });

  it("uses the recommended γ_M2 = 1.25 (strokeforge.tech, quoting EN 1993-1-8 §2.2)", () => {
    expect(EN1993_GAMMA_M2).toBe(1.25);
  });

  it("has no Eurocode shear factor for class 12.9, which Eurocode 3 does not cover", () => {
    expect(EN1993_THREAD_SHEAR_FACTOR["12.9"]).toBeNull();
  });

  it("names a shear factor above 1", () => {
    expect(() => eurocodeBoltShearResistance({ area: 1e-5, ultimateStrength: 8e8, shearFactor: 1.2 })).toThrow(
      /^shearFactor must be greater than 0 and at most 1 \(got 1\.2\)$/,
    );
  });
});

describe("shear strength of a bolt: one rule for every class", () => {
  const MPa = 1e6;
  // The rule: τ_y = R_p0.2,min/√3 (Shigley's distortion-energy shear yield, 0.577 S_y) and
  // τ_u = 0.6 R_m,min (Industrial Fasteners Institute: "approximately 60 percent of their specified
  // minimum tensile strengths", as quoted by a fastener maker's technical note). Inputs: ISO 898-1 Table 3.
  const CASES = [
    {
      source: "iso-898-1 + ifi-shear-rule",
      locator: "Table 3, class 4.6 (R_eL 240, R_m 400 MPa)",
      inputs: { propertyClass: "4.6" },
      expected: { y: 138.564, u: 240 },
      rtol: 5e-6,
      note: "",
    },
    {
      source: "iso-898-1 + ifi-shear-rule",
      locator: "Table 3, class 8.8 (640, 800 MPa)",
      inputs: { propertyClass: "8.8" },
      expected: { y: 369.504, u: 480 },
      rtol: 5e-6,
      note: "",
    },
    {
      source: "iso-898-1 + ifi-shear-rule",
      locator: "Table 3, class 10.9 (940, 1040 MPa)",
      inputs: { propertyClass: "10.9" },
      expected: { y: 542.709, u: 624 },
      rtol: 5e-6,
      note: "",
    },
    {
      source: "iso-898-1 + ifi-shear-rule",
      locator: "Table 3, class 12.9 (1100, 1220 MPa)",
      inputs: { propertyClass: "12.9" },
      expected: { y: 635.085, u: 732 },
      rtol: 5e-6,
      note: "",
    },
  ] as const;

  it.each(CASES)("$source, $locator: τ_y = $expected.y MPa and τ_u = $expected.u MPa", ({ inputs, expected, rtol }) => {
    const { shearYield, shearUltimate } = propertyClassShearStrengths(inputs);
    expectClose(shearYield, expected.y * MPa, rtol);
    expectClose(shearUltimate, expected.u * MPa, rtol);
  });

  it("uses 0.6 of the minimum tensile strength for the shear ultimate of every class", () => {
    expect(BOLT_SHEAR_ULTIMATE_RATIO).toBe(0.6);
  });

  it.each(PROPERTY_CLASS_OPTIONS.map((o) => o.value))("never puts the shear yield of class %s above its shear ultimate", (id) => {
    const { shearYield, shearUltimate } = propertyClassShearStrengths({ propertyClass: id });
    expect(shearYield).toBeLessThanOrEqual(shearUltimate);
  });

  it("never puts the shear yield above the shear ultimate for any yield at or below the tensile strength", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e6, max: 3e9, noNaN: true }), fc.double({ min: 1e-6, max: 1, noNaN: true }), (tensileStrength, ratio) => {
        const { shearYield, shearUltimate } = boltShearStrengths({ tensileStrength, yieldStrength: ratio * tensileStrength });
        expect(shearYield).toBeLessThanOrEqual(shearUltimate);
      }),
    );
  });

  it("refuses a yield strength above the tensile strength, naming it", () => {
    expect(() => boltShearStrengths({ yieldStrength: 900e6, tensileStrength: 800e6 })).toThrow(CalcInputError);
    expect(() => boltShearStrengths({ yieldStrength: 900e6, tensileStrength: 800e6 })).toThrow(/^yieldStrength must be at most the tensile strength/);
  });
});

describe("regression pins from the engineering review: the old pairing of α_v with the von Mises yield", () => {
  // The review found τ_y above τ_u for 10.9 and 12.9 when τ_u = 0.5 R_m (Eurocode's α_v for 10.9)
  // is paired with τ_y = R_p0.2/√3. These pins keep the review's numbers and show the new rule's.
  const MPa = 1e6;
  it.each([
    { id: "10.9", oldUltimate: 520, yield: 542.7 },
    { id: "12.9", oldUltimate: 610, yield: 635.1 },
  ] as const)("class $id: τ_y = $yield MPa exceeded the old 0.5 R_m = $oldUltimate MPa, and stays below the new τ_u", ({ id, oldUltimate, yield: y }) => {
    const row = PROPERTY_CLASSES[id];
    const { shearYield, shearUltimate } = propertyClassShearStrengths({ propertyClass: id });
    expectClose(shearYield, y * MPa, 1e-3);
    expect(0.5 * row.tensileStrengthMin).toBe(oldUltimate * MPa);
    expect(shearYield).toBeGreaterThan(0.5 * row.tensileStrengthMin);
    expect(shearYield).toBeLessThan(shearUltimate);
  });
});

describe("choosing a size or a class", () => {
  it("rejects a size outside the list, naming the field and the allowed sizes", () => {
    expect(() => metricThread("M7")).toThrow(CalcInputError);
    expect(() => metricThread("M7")).toThrow('size must be one of M2, M2.5, M3, M4, M5, M6, M8, M10, M12 (got "M7")');
  });

  it("rejects a class outside the list, naming the field and the allowed classes", () => {
    expect(() => propertyClass("9.8")).toThrow('propertyClass must be one of 4.6, 8.8, 10.9, 12.9 (got "9.8")');
  });

  it("reports the field's structured fields as well as the message", () => {
    try {
      requireChoice("mode", 3, [{ value: "shear", label: "Shear" }]);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CalcInputError);
      expect(error).toMatchObject({ param: "mode", value: 3, expected: "one of shear", unit: "" });
    }
  });

  it("throws a CalcInputError naming the field for any string that is not a size", () => {
    const sizes = new Set<string>(THREAD_SIZE_OPTIONS.map((o) => o.value));
    fc.assert(
      fc.property(
        fc.string().filter((s) => !sizes.has(s)),
        (s) => {
          expect(() => metricThread(s)).toThrow(CalcInputError);
          try {
            metricThread(s);
          } catch (error) {
            expect((error as CalcInputError).param).toBe("size");
          }
        },
      ),
    );
  });
});

describe("regression pins (our own digits, not outside authorities)", () => {
  // Computed in double precision from the ISO 898-1 formula A_s = (π/4)·((d₂ + d₃)/2)², printed to 4 decimals: ± 1e-4 mm².
  const PINS: [ThreadSize, number][] = [
    ["M2", 2.07321],
    ["M2.5", 3.39079],
    ["M3", 5.03084],
    ["M4", 8.77874],
    ["M5", 14.1825],
    ["M6", 20.1234],
    ["M8", 36.6085],
  ];
  it.each(PINS)("A_s of %s from the formula is %f mm² within 1e-4 mm²", (size, mm2) => {
    const { nominalDiameter, pitch } = METRIC_COARSE_THREADS[size];
    expect(Math.abs(tensileStressArea({ nominalDiameter, pitch }) / MM2 - mm2)).toBeLessThanOrEqual(1e-4);
  });

  it("M4 × 0.7 has d₂ = 3.545 337 mm and d₃ = 3.141 191 mm", () => {
    const t = threadDiameters({ nominalDiameter: 0.004, pitch: 0.0007 });
    expect(t.pitchDiameter * 1000).toBeCloseTo(3.5453367, 6);
    expect(t.stressDiameterD3 * 1000).toBeCloseTo(3.1411915, 6);
  });
});

describe("the fastener rules at their equality edges", () => {
  it("refuses a pitch of exactly the nominal diameter ÷ 1.3 (the minor diameter would vanish), and takes one just below", () => {
    expect(() => threadDiameters({ nominalDiameter: 0.0013, pitch: 0.001 })).toThrow(
      "pitch must be less than the nominal diameter ÷ 1.3, 0.001 m (got 0.001 m)",
    );
    expect(threadDiameters({ nominalDiameter: 0.0013, pitch: 0.000999 }).minorDiameter).toBeGreaterThan(0);
  });

  it("takes a yield strength equal to the tensile strength (a material with no hardening), and refuses one above it", () => {
    // τ_y = S_y/√3 (distortion energy theory, Shigley 9th ed., §5-5)
    const equal = boltShearStrengths({ yieldStrength: 500e6, tensileStrength: 500e6 });
    expect(equal.shearYield).toBeCloseTo(500e6 / Math.sqrt(3), 0);
    expect(() => boltShearStrengths({ yieldStrength: 500.1e6, tensileStrength: 500e6 })).toThrow(
      "yieldStrength must be at most the tensile strength, 500000000 Pa (got 500100000 Pa)",
    );
  });
});
