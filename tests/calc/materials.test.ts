import { describe, expect, it } from "vitest";
import { MATERIALS, type MaterialProperty } from "../../calc/materials/materials.ts";
import { isMaterialId, MATERIAL_IDS, type MaterialId } from "../../calc/materials/densities.ts";
import { isSourceKey } from "../../calc/sources/index.ts";

const MPA = 1e6;
const GPA = 1e9;

interface Row {
  source: string;
  locator: string;
  id: MaterialId;
  /** Density [g/cm³], yield and ultimate [MPa] exactly as printed in the source. */
  expected: { densityGcm3: number; yieldMPa: number; ultimateMPa: number; yieldRangeMPa?: [number, number]; ultimateRangeMPa?: [number, number] };
  note: string;
}

// Reference values: each row names the published data sheet or table it was read from.
const TABLE: Row[] = [
  {
    source: "substech-materials",
    locator: "6061 T6/T651: tensile 310 MPa, yield 276 MPa, density 2.70·10³ kg/m³",
    id: "al-6061-t6",
    expected: { densityGcm3: 2.7, yieldMPa: 276, ultimateMPa: 310 },
    note: "published",
  },
  {
    source: "asm-matweb-datasheets",
    locator: "AISI 4130 normalized 870 °C, M4130R",
    id: "steel-4130-normalized",
    expected: { densityGcm3: 7.85, yieldMPa: 435, ultimateMPa: 670 },
    note: "published",
  },
  {
    source: "asm-matweb-datasheets",
    locator: "AISI 4130 annealed 865 °C, M4130A",
    id: "steel-4130-annealed",
    expected: { densityGcm3: 7.85, yieldMPa: 460, ultimateMPa: 560 },
    note: "published",
  },
  {
    source: "asm-matweb-datasheets",
    locator: "AISI 4340 annealed, M434AA",
    id: "steel-4340-annealed",
    expected: { densityGcm3: 7.85, yieldMPa: 470, ultimateMPa: 745 },
    note: "published",
  },
  {
    source: "asm-matweb-datasheets",
    locator: "AISI 4340 normalized 100 mm round, M434AE",
    id: "steel-4340-normalized",
    expected: { densityGcm3: 7.85, yieldMPa: 710, ultimateMPa: 1110 },
    note: "published",
  },
  {
    source: "asm-matweb-datasheets",
    locator: "AISI 4340 OQ 800 °C, 650 °C temper, 50 mm, M434AP",
    id: "steel-4340-qt650",
    expected: { densityGcm3: 7.85, yieldMPa: 834, ultimateMPa: 931 },
    note: "published",
  },
  {
    source: "s7-nominal-properties-table",
    locator: "S7 tempered 205 °C (58 HRC)",
    id: "tool-steel-s7-t205",
    expected: { densityGcm3: 7.76, yieldMPa: 1450, ultimateMPa: 2170 },
    note: "published, read in a secondary reproduction of the nominal-properties table",
  },
  {
    source: "asm-matweb-datasheets",
    locator: "Ti-6Al-4V Grade 5 annealed, MTP644",
    id: "ti-6al-4v-annealed",
    expected: { densityGcm3: 4.43, yieldMPa: 830, ultimateMPa: 900 },
    note: "published",
  },
  {
    source: "callister-integrated-3e",
    locator: "App. B Tables B.1 and B.4, UHMWPE",
    id: "uhmw-pe",
    expected: { densityGcm3: 0.94, yieldMPa: 21.4, ultimateMPa: 38.6, yieldRangeMPa: [21.4, 27.6], ultimateRangeMPa: [38.6, 48.3] },
    note: "density published (Table B.1); strength ranges (Table B.4) from memory; design value = low end",
  },
  {
    source: "callister-integrated-3e",
    locator: "App. B Tables B.4 and B.5, polycarbonate",
    id: "polycarbonate",
    expected: { densityGcm3: 1.2, yieldMPa: 62.1, ultimateMPa: 62.8, ultimateRangeMPa: [62.8, 72.4] },
    note: "density (MatWeb polycarbonate overview) and yield (Table B.5) published; tensile range (Table B.4) from memory; design value = low end",
  },
];

describe("the material table reproduces the reference rows", () => {
  it.each(TABLE)("$source, $locator: density, yield and ultimate as printed ($note)", ({ id, expected }) => {
    const m = MATERIALS[id];
    // Exact decimal values from the source; the only error allowed is one rounding of the unit scale.
    expect(m.density / 1000).toBeCloseTo(expected.densityGcm3, 12);
    expect(m.yieldStrength / MPA).toBeCloseTo(expected.yieldMPa, 10);
    expect(m.ultimateStrength / MPA).toBeCloseTo(expected.ultimateMPa, 10);
    const yr: readonly [number, number] | undefined = "yieldStrengthRange" in m ? m.yieldStrengthRange : undefined;
    const ur: readonly [number, number] | undefined = "ultimateStrengthRange" in m ? m.ultimateStrengthRange : undefined;
    expect(yr?.map((v) => Number((v / MPA).toPrecision(12)))).toEqual(expected.yieldRangeMPa);
    expect(ur?.map((v) => Number((v / MPA).toPrecision(12)))).toEqual(expected.ultimateRangeMPa);
  });

  it("lists exactly the ten rows of the reference table, in table order", () => {
    expect(MATERIAL_IDS).toEqual(TABLE.map((r) => r.id));
  });

  it("names the row's source key as its primary source", () => {
    for (const row of TABLE) expect(MATERIALS[row.id].source).toBe(row.source);
  });
});

describe("elastic constants", () => {
  it.each([
    { source: "asm-matweb-datasheets", locator: "6061-T6", id: "al-6061-t6" as const, E: 68.9, nu: 0.33 },
    { source: "asm-matweb-datasheets", locator: "4130/4340 'typical for steel'", id: "steel-4130-normalized" as const, E: 205, nu: 0.29 },
    { source: "asm-matweb-datasheets", locator: "4340 'typical for steel'", id: "steel-4340-qt650" as const, E: 205, nu: 0.29 },
    { source: "asm-matweb-datasheets", locator: "Ti-6Al-4V MTP644", id: "ti-6al-4v-annealed" as const, E: 114, nu: 0.33 },
    { source: "callister-integrated-3e", locator: "Table B.2, polycarbonate", id: "polycarbonate" as const, E: 2.38, nu: 0.36 },
    { source: "callister-integrated-3e", locator: "Table B.2, UHMWPE", id: "uhmw-pe" as const, E: 0.69, nu: 0.46 },
  ])("$source, $locator: E = $E GPa, ν = $nu", ({ id, E, nu }) => {
    expect(MATERIALS[id].youngsModulus / GPA).toBeCloseTo(E, 10);
    expect(MATERIALS[id].poissonRatio).toBe(nu);
  });
});

describe("every row is honest about its backing", () => {
  it("uses only bibliography keys that exist", () => {
    for (const id of MATERIAL_IDS) {
      const m = MATERIALS[id];
      expect(isSourceKey(m.source)).toBe(true);
      for (const key of m.otherSources) expect(isSourceKey(key)).toBe(true);
    }
  });

  it("marks the values the reference table calls FROM MEMORY", () => {
    const memo = (id: MaterialId): readonly MaterialProperty[] => MATERIALS[id].fromMemory;
    expect(memo("uhmw-pe")).toEqual(expect.arrayContaining(["yieldStrength", "ultimateStrength"]));
    expect(memo("polycarbonate")).toContain("ultimateStrength");
    expect(memo("polycarbonate")).not.toContain("yieldStrength");
    expect(memo("tool-steel-s7-t205")).toEqual(expect.arrayContaining(["youngsModulus", "poissonRatio"]));
    for (const id of MATERIAL_IDS) {
      expect(MATERIALS[id].status === "partly-from-memory").toBe(memo(id).length > 0);
    }
  });

  it("stores the condition with every row, and the id under its own key", () => {
    for (const id of MATERIAL_IDS) {
      expect(MATERIALS[id].id).toBe(id);
      expect(MATERIALS[id].condition.length).toBeGreaterThan(0);
    }
  });

  it("keeps the design strength at the low end of any range and below or at the ultimate", () => {
    for (const id of MATERIAL_IDS) {
      const m = MATERIALS[id];
      if ("yieldStrengthRange" in m) expect(m.yieldStrength).toBe(m.yieldStrengthRange[0]);
      if ("ultimateStrengthRange" in m) expect(m.ultimateStrength).toBe(m.ultimateStrengthRange[0]);
      expect(m.yieldStrength).toBeLessThanOrEqual(m.ultimateStrength);
    }
  });

  it("recognises its own ids and nothing else", () => {
    expect(isMaterialId("al-6061-t6")).toBe(true);
    expect(isMaterialId("unobtainium")).toBe(false);
    expect(isMaterialId("toString")).toBe(false);
  });
});
