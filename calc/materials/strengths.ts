/**
 * The strengths and elastic constants of each material of the handbook's table: what a stress
 * check needs (a shaft's yield, its stiffness), kept apart from the sources, locators and notes of
 * calc/materials/materials.ts (whose rows include these) so that a calculator page that only checks
 * a stress does not carry the whole table. Each value's source is its row's `source` and `locator`
 * there. SI: Pa, [-].
 */
import type { MaterialId } from "./densities.ts";

/** What a stress check needs to know about a material. */
export interface MaterialStrength {
  /** Whether strengths are typical values or specified minimums. */
  basis: "typical" | "minimum";
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
}

const MPa = 1e6;
const GPa = 1e9;

/** The materials in table order, with their strengths and elastic constants (sources: calc/materials/materials.ts, row by row). */
export const MATERIAL_STRENGTHS = {
  "al-6061-t6": {
    basis: "typical",
    yieldStrength: 276 * MPa,
    ultimateStrength: 310 * MPa,
    youngsModulus: 68.9 * GPa,
    poissonRatio: 0.33,
  },
  "steel-4130-normalized": {
    basis: "typical",
    yieldStrength: 435 * MPa,
    ultimateStrength: 670 * MPa,
    youngsModulus: 205 * GPa,
    poissonRatio: 0.29,
  },
  "steel-4130-annealed": {
    basis: "typical",
    yieldStrength: 460 * MPa,
    ultimateStrength: 560 * MPa,
    youngsModulus: 205 * GPa,
    poissonRatio: 0.29,
  },
  "steel-4340-annealed": {
    basis: "typical",
    yieldStrength: 470 * MPa,
    ultimateStrength: 745 * MPa,
    youngsModulus: 205 * GPa,
    poissonRatio: 0.29,
  },
  "steel-4340-normalized": {
    basis: "typical",
    yieldStrength: 710 * MPa,
    ultimateStrength: 1110 * MPa,
    youngsModulus: 205 * GPa,
    poissonRatio: 0.29,
  },
  "steel-4340-qt650": {
    basis: "typical",
    yieldStrength: 834 * MPa,
    ultimateStrength: 931 * MPa,
    youngsModulus: 205 * GPa,
    poissonRatio: 0.29,
  },
  "tool-steel-s7-t205": {
    basis: "typical",
    yieldStrength: 1450 * MPa,
    ultimateStrength: 2170 * MPa,
    youngsModulus: 205 * GPa,
    poissonRatio: 0.29,
  },
  "ti-6al-4v-annealed": {
    basis: "typical",
    yieldStrength: 830 * MPa,
    ultimateStrength: 900 * MPa,
    youngsModulus: 114 * GPa,
    poissonRatio: 0.33,
  },
  "uhmw-pe": {
    basis: "typical",
    yieldStrength: 21.4 * MPa,
    ultimateStrength: 38.6 * MPa,
    yieldStrengthRange: [21.4 * MPa, 27.6 * MPa],
    ultimateStrengthRange: [38.6 * MPa, 48.3 * MPa],
    youngsModulus: 0.69 * GPa,
    poissonRatio: 0.46,
  },
  polycarbonate: {
    basis: "typical",
    yieldStrength: 62.1 * MPa,
    ultimateStrength: 62.8 * MPa,
    ultimateStrengthRange: [62.8 * MPa, 72.4 * MPa],
    youngsModulus: 2.38 * GPa,
    poissonRatio: 0.36,
  },
} as const satisfies Record<MaterialId, MaterialStrength>;
