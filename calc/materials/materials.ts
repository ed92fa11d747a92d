/**
 * Materials: a small table of room-temperature properties for the metals and plastics a spinning
 * robot is commonly built from, each row with its condition (heat treatment decides most of a
 * steel's strength), its source and how sure we are of each value. SI units: kg/m³, Pa, [-].
 *
 * Where a source gives a range, the single design value is the LOW end of the range (the
 * conservative choice for strength) and the range is kept beside it.
 */
import type { SourceKey } from "../sources/index.ts";
import { MATERIAL_DENSITIES, type MaterialId } from "./densities.ts";
import { MATERIAL_STRENGTHS } from "./strengths.ts";

/** The numeric properties a row carries. */
export type MaterialProperty = "density" | "yieldStrength" | "ultimateStrength" | "youngsModulus" | "poissonRatio";

/**
 * How well a row's strength and density values are backed:
 * - "confirmed": seen in a retrieved copy of the named source;
 * - "confirmed-secondary": seen only in a secondary reproduction of the named table;
 * - "partly-from-memory": some values (listed in `fromMemory`) were not confirmed in a retrieved text.
 */
export type MaterialStatus = "confirmed" | "confirmed-secondary" | "partly-from-memory";

export interface Material {
  /** Short stable id, also used in URLs. */
  id: string;
  /** Material name, e.g. "AISI 4130 steel". */
  name: string;
  /** Heat treatment or form the numbers belong to. */
  condition: string;
  /** Whether strengths are typical values or specified minimums. */
  basis: "typical" | "minimum";
  /** ρ, mass density [kg/m³]. */
  density: number;
  /** Yield strength or 0.2 % proof stress (for polymers, the tensile yield) [Pa]; low end of `yieldStrengthRange` when given. */
  yieldStrength: number;
  /** Ultimate tensile strength [Pa]; low end of `ultimateStrengthRange` when given. */
  ultimateStrength: number;
  /** The range the source gives for yield, [low, high] [Pa]. */
  yieldStrengthRange?: readonly [number, number];
  /** The range the source gives for ultimate strength, [low, high] [Pa]. */
  ultimateStrengthRange?: readonly [number, number];
  /** E, Young's modulus [Pa]. */
  youngsModulus: number;
  /** ν, Poisson's ratio [-]. */
  poissonRatio: number;
  /** Bibliography key of the density and strength values. */
  source: SourceKey;
  /** Where in that source (data sheet, table, row). */
  locator: string;
  /** Further sources used for some of the values (density, elastic constants). */
  otherSources: readonly SourceKey[];
  /** How the density and strength values are backed. */
  status: MaterialStatus;
  /** Values that are from memory: believed right, not seen in a retrieved text of the source. */
  fromMemory: readonly MaterialProperty[];
  /** One sentence on use or caveats. */
  note: string;
  /**
   * The specified minimum strengths a material standard gives for this condition, where one does:
   * what checks use by default. Absent when the table has only typical values for the row.
   */
  minimum?: {
    /** Minimum yield or 0.2 % proof strength [Pa]. */
    yieldStrength: number;
    /** Minimum ultimate tensile strength [Pa]. */
    ultimateStrength: number;
    /** The standard. */
    source: SourceKey;
    /** Where in it (table, product form, thickness range). */
    locator: string;
  };
}

/** One ksi (1000 lbf/in²) in pascals: 1000 × 4.4482216152605 N / 0.0254² m² (nist-sp811, exact from the definitions). */
const KSI = (1000 * 4.4482216152605) / (0.0254 * 0.0254);

/**
 * The material table; each row names the data sheet or table its values were read from.
 * Sources: substech-materials, asm-matweb-datasheets, s7-nominal-properties-table,
 * callister-integrated-3e, matweb-polymer-overview.
 */
export const MATERIALS = {
  "al-6061-t6": {
    ...MATERIAL_DENSITIES["al-6061-t6"],
    ...MATERIAL_STRENGTHS["al-6061-t6"],
    source: "substech-materials",
    locator: "6061, T6/T651: yield 276 MPa, tensile 310 MPa, density 2.70 g/cm³; E = 68.9 GPa and ν = 0.33 from the ASM/MatWeb 6061-T6 data sheet",
    otherSources: ["asm-matweb-datasheets"],
    status: "confirmed",
    fromMemory: [],
    note: "Typical values are not for design: the specified minimums (35/38 ksi, 241/262 MPa, for extrusions) are lower, and checks use those.",
    minimum: {
      yieldStrength: 35 * KSI,
      ultimateStrength: 38 * KSI,
      source: "astm-b221",
      locator:
        "6061-T6, T6510, T6511 extrusions up to 0.249 in: tensile ≥ 38 ksi, yield ≥ 35 ksi (the same 38/35 ksi as the seamless-cylinder table of 49 CFR 178.46)",
    },
  },
  "steel-4130-normalized": {
    ...MATERIAL_DENSITIES["steel-4130-normalized"],
    ...MATERIAL_STRENGTHS["steel-4130-normalized"],
    source: "asm-matweb-datasheets",
    locator: "AISI 4130 steel, normalized at 870 °C (data sheet M4130R); E and ν 'typical for steel'",
    otherSources: [],
    status: "confirmed",
    fromMemory: [],
    note: "Strength depends strongly on heat treatment; quote the condition with the numbers.",
  },
  "steel-4130-annealed": {
    ...MATERIAL_DENSITIES["steel-4130-annealed"],
    ...MATERIAL_STRENGTHS["steel-4130-annealed"],
    source: "asm-matweb-datasheets",
    locator: "AISI 4130 steel, annealed at 865 °C (data sheet M4130A); E and ν 'typical for steel'",
    otherSources: [],
    status: "confirmed",
    fromMemory: [],
    note: "As printed, the annealed yield (460 MPa) exceeds the normalized yield (435 MPa); both are the data sheets' typical values.",
  },
  "steel-4340-annealed": {
    ...MATERIAL_DENSITIES["steel-4340-annealed"],
    ...MATERIAL_STRENGTHS["steel-4340-annealed"],
    source: "asm-matweb-datasheets",
    locator: "AISI 4340 steel, annealed (data sheet M434AA); E and ν 'typical for steel'",
    otherSources: [],
    status: "confirmed",
    fromMemory: [],
    note: "Soft condition, as bought before hardening.",
  },
  "steel-4340-normalized": {
    ...MATERIAL_DENSITIES["steel-4340-normalized"],
    ...MATERIAL_STRENGTHS["steel-4340-normalized"],
    source: "asm-matweb-datasheets",
    locator: "AISI 4340 steel, normalized, 100 mm round (data sheet M434AE); E and ν 'typical for steel'",
    otherSources: [],
    status: "confirmed",
    fromMemory: [],
    note: "Section size matters: the data sheet is for a 100 mm round.",
  },
  "steel-4340-qt650": {
    ...MATERIAL_DENSITIES["steel-4340-qt650"],
    ...MATERIAL_STRENGTHS["steel-4340-qt650"],
    source: "asm-matweb-datasheets",
    locator: "AISI 4340 steel, oil quenched 800 °C, 650 °C temper, 50 mm round (data sheet M434AP); E and ν 'typical for steel'",
    otherSources: [],
    status: "confirmed",
    fromMemory: [],
    note: "A high temper: tough rather than hard. Lower tempering temperatures give far higher strength.",
  },
  "tool-steel-s7-t205": {
    ...MATERIAL_DENSITIES["tool-steel-s7-t205"],
    ...MATERIAL_STRENGTHS["tool-steel-s7-t205"],
    source: "s7-nominal-properties-table",
    locator: "row 'S7 205°C (400°F) 2170 (315) 1450 (210) 7.0 20 58'; density 7.76 g/cm³",
    otherSources: [],
    status: "partly-from-memory",
    fromMemory: ["youngsModulus", "poissonRatio"],
    note: "Nominal values from a secondary copy of the table. E and ν are taken as the typical steel values (205 GPa, 0.29), not read from an S7 source.",
  },
  "ti-6al-4v-annealed": {
    ...MATERIAL_DENSITIES["ti-6al-4v-annealed"],
    ...MATERIAL_STRENGTHS["ti-6al-4v-annealed"],
    source: "asm-matweb-datasheets",
    locator: "Ti-6Al-4V (Grade 5), annealed (data sheet MTP644): density 4.43 g/cc, UTS 900 MPa, yield 830 MPa, E 114 GPa, ν 0.33",
    otherSources: [],
    status: "confirmed",
    fromMemory: [],
    note: "Typical values; the specified minimums (ASTM B348/B265 Grade 5) are about 828/897 MPa.",
  },
  "uhmw-pe": {
    ...MATERIAL_DENSITIES["uhmw-pe"],
    ...MATERIAL_STRENGTHS["uhmw-pe"],
    source: "callister-integrated-3e",
    locator:
      "App. B: Table B.1 density 0.94 g/cm³ and Table B.2 E = 0.69 GPa (both confirmed); Table B.4 yield 21.4–27.6 MPa and tensile 38.6–48.3 MPa; ν ≈ 0.46",
    otherSources: [],
    status: "partly-from-memory",
    fromMemory: ["yieldStrength", "ultimateStrength", "poissonRatio"],
    note: "Density and modulus are confirmed; the strengths and ν are from memory and vary with grade and temperature.",
  },
  polycarbonate: {
    ...MATERIAL_DENSITIES.polycarbonate,
    ...MATERIAL_STRENGTHS.polycarbonate,
    source: "callister-integrated-3e",
    locator:
      "App. B: Table B.5 yield 62.1 MPa and Table B.2 E = 2.38 GPa (both confirmed); Table B.4 tensile 62.8–72.4 MPa; Table B.3 ν ≈ 0.36; density 1.20 g/cc from the MatWeb polycarbonate overview",
    otherSources: ["matweb-polymer-overview"],
    status: "partly-from-memory",
    fromMemory: ["ultimateStrength", "poissonRatio"],
    note: "Density, yield and modulus are confirmed; the tensile range and ν are from memory.",
  },
} as const satisfies Record<MaterialId, Material>;
