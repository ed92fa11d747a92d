/**
 * What the rim check asks for: its input declarations, apart from the calculation itself
 * (calc/loads/rims.ts) so that a page that only reads or writes a design's rims section does not carry
 * the physics.
 */
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";
import type { MaterialId } from "../materials/densities.ts";
import type { ChoiceOption } from "./common.ts";
import { safetyThresholdInputs } from "./threshold-inputs.ts";

/** Shapes the rim check knows. */
export const RIM_SHAPE_OPTIONS = [
  { value: "thin-ring", label: "Thin ring (a rim or shell with nothing inside)" },
  { value: "solid-disk", label: "Solid disk (no hole)" },
  { value: "annular-disk", label: "Disk with a bore" },
] as const satisfies readonly ChoiceOption[];

export type RimShape = (typeof RIM_SHAPE_OPTIONS)[number]["value"];

/** The basis of the strengths entered: specified minimums (a standard's, for design) or typical values. */
export const STRENGTH_BASIS_OPTIONS = [
  { value: "minimum", label: "Specified minimum" },
  { value: "typical", label: "Typical" },
] as const satisfies readonly ChoiceOption[];

export type MaterialStrengthBasis = (typeof STRENGTH_BASIS_OPTIONS)[number]["value"];

/** The material fields of the rim check: density [kg/m³], yield and ultimate strength [Pa], Poisson's ratio [-]. */
export interface RimMaterialValues {
  density: number;
  yieldStrength: number;
  ultimateStrength: number;
  poisson: number;
}

/** Default material of the rim check (a row of calc/materials.ts). */
export const DEFAULT_RIM_MATERIAL: MaterialId = "al-6061-t6";

/**
 * The default material's values, as the rim check's field defaults: the 6061-T6 row of the
 * materials table at its specified minimum strengths, 35/38 ksi (astm-b221; density
 * substech-materials, ν asm-matweb-datasheets). Written out here so that the rim calculator's page
 * does not load the whole table; a test keeps them equal to `rimMaterial(DEFAULT_RIM_MATERIAL)`,
 * and the table itself is offered through calc/loads/index.ts.
 */
export const DEFAULT_RIM_MATERIAL_VALUES: Readonly<RimMaterialValues> = {
  density: 2700,
  yieldStrength: 241316505.26089266,
  ultimateStrength: 262000777.14039773,
  poisson: 0.33,
};
const DEFAULT_MATERIAL = DEFAULT_RIM_MATERIAL_VALUES;

/** Numeric inputs of the rim check, in SI. Choices: `RIM_SHAPE_OPTIONS` (and, in calc/loads/index.ts, `RIM_MATERIAL_OPTIONS` to fill the material fields via `rimMaterial`). */
export const rimCheckInputs = defineInputs({
  outerRadius: {
    label: "Outer radius",
    kind: "length",
    min: 0.005,
    max: 2,
    default: 0.125,
    urlKey: "ro",
    help: "Radius of the outside edge: the tip of the rim or disk.",
  },
  innerRadius: {
    label: "Bore radius",
    kind: "length",
    min: 0,
    max: 2,
    default: 0.115,
    urlKey: "ri",
    help: "Radius of the central hole; read only for a disk with a bore, and must be less than the outer radius.",
  },
  density: {
    label: "Density",
    kind: "density",
    min: 100,
    max: 25000,
    default: DEFAULT_MATERIAL.density,
    urlKey: "rho",
    help: "Mass density of the material.",
  },
  yieldStrength: {
    label: "Yield strength",
    kind: "stress",
    min: 1e6,
    max: 5e9,
    default: DEFAULT_MATERIAL.yieldStrength,
    urlKey: "sy",
    help: "Yield or 0.2 % proof strength of the material in its actual condition.",
  },
  ultimateStrength: {
    label: "Ultimate strength",
    kind: "stress",
    min: 1e6,
    max: 5e9,
    default: DEFAULT_MATERIAL.ultimateStrength,
    urlKey: "su",
    help: "Ultimate tensile strength; at least the yield strength.",
  },
  poisson: {
    label: "Poisson's ratio",
    kind: "fraction",
    min: 0,
    max: 0.5,
    default: DEFAULT_MATERIAL.poisson,
    unit: { metric: "frac", us: "frac" },
    urlKey: "nu",
    help: "About 0.3 for metals; read for disks only (a thin ring does not depend on it).",
  },
  angularSpeed: {
    label: "Speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(1),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The top speed the part will see.",
  },
  ...safetyThresholdInputs("part"),
});

export type RimCheckInput = { [K in keyof typeof rimCheckInputs]: number } & {
  /** A value of `RIM_SHAPE_OPTIONS`. */
  shape: string;
  /** A value of `STRENGTH_BASIS_OPTIONS`: what the strengths entered are; "minimum" when left out. */
  strengthBasis?: string;
};

/** Choice defaults of the rim check. */
export const RIM_CHOICE_DEFAULTS = { shape: "thin-ring", strengthBasis: "minimum" } as const satisfies {
  shape: RimShape;
  strengthBasis: MaterialStrengthBasis;
};
