/**
 * Centrifugal loads: what survives the spin. The pull a spinning part puts on the bolts that hold
 * it, the stress in those bolts against their property class, and the hoop and radial stresses in
 * a spinning ring or disk against its material, each with a safety factor, the speeds at which
 * yield and ultimate strength are reached, and a verdict. SI in and out: kg, m, rad/s, N, Pa, m/s.
 *
 * This file is the topic's public face. The code lives in three parts so that a page with one
 * calculator loads only its own half: loads-common.ts (safety factor, verdict, limit speed,
 * validation), loads-bolts.ts (the fastener check) and loads-rims.ts (the rim check).
 */
import { rpmToRadPerSecond } from "../core/units.ts";
import { DEFAULT_SAFETY_THRESHOLDS } from "./common.ts";
import { DEFAULT_SHEAR_RATIO, fastenerCheck, type FastenerCheck, type FastenerCheckInput } from "./bolts.ts";
import { rimCheck, type RimCheck, type RimCheckInput, type RimMaterialValues, type MaterialStrengthBasis } from "./rims.ts";
import { requireChoice, type ChoiceOption } from "./common.ts";
import { type Material, MATERIALS } from "../materials/materials.ts";
import { MATERIAL_IDS, type MaterialId } from "../materials/densities.ts";
import type { SourceKey } from "../sources/index.ts";
import { requireInputObject } from "../core/spec-check.ts";
import { boltedJointCheck } from "./joint.ts";
import { BOLTED_JOINT_CHOICE_DEFAULTS, boltedJointInputs, type BoltedJointCheck, type BoltedJointInput } from "./joint-inputs.ts";

export * from "./common.ts";
export * from "./bolts.ts";
export * from "./rims.ts";

// ---------------------------------------------------------------------------------------------
// Materials for the rim check.

/** Materials offered for the rim check: the rows of the materials table, labelled with their short menu names. */
export const RIM_MATERIAL_OPTIONS: readonly ChoiceOption<MaterialId>[] = MATERIAL_IDS.map((id) => ({
  value: id,
  label: MATERIALS[id].menuName,
}));

/**
 * The rim check's material fields filled from a row of the materials table (param "material"),
 * with the basis of the strengths: the specified minimums where a standard gives them (the default,
 * and what a design check should use), else the table's typical values. `basis: "typical"` asks for
 * the typical values of every row.
 */
export function rimMaterial(id: string, basis: "minimum" | "typical" = "minimum"): RimMaterialValues & { strengthBasis: MaterialStrengthBasis } {
  const row: Material = MATERIALS[requireChoice("material", id, RIM_MATERIAL_OPTIONS)];
  const strengths = basis === "minimum" && row.minimum ? row.minimum : row;
  return {
    density: row.density,
    yieldStrength: strengths.yieldStrength,
    ultimateStrength: strengths.ultimateStrength,
    poisson: row.poissonRatio,
    strengthBasis: basis === "minimum" && row.minimum ? "minimum" : "typical",
  };
}

/** One material choice with the values it fills in. */
export interface RimMaterialChoice extends RimMaterialValues {
  value: MaterialId;
  label: string;
  /** The row's full name and condition ("AISI 4340 steel, oil quenched from 800 °C, …") and the strengths' basis, shown under the menu. */
  detail: string;
  /** Whether the strengths filled in are specified minimums or typical values. */
  strengthBasis: MaterialStrengthBasis;
}

/**
 * Every row of the materials table as a choice for the rim calculator, with its values: built once
 * at build time and handed to the calculator, so that the page does not load the table's sources
 * and notes. Sources: as each row of calc/materials.ts.
 *
 * @returns the choices in table order
 */
export function rimMaterialChoices(): RimMaterialChoice[] {
  return RIM_MATERIAL_OPTIONS.map((option) => ({
    ...option,
    detail: `${MATERIALS[option.value].name}, ${MATERIALS[option.value].condition}; ${(MATERIALS[option.value] as Material).minimum ? "specified minimum strengths" : "typical strengths (no standard minimum in the table)"}`,
    ...rimMaterial(option.value),
  }));
}

// ---------------------------------------------------------------------------------------------
// Worked example.

/** The invented demo robot's inputs and results. */
export interface DemoRobotLoads {
  /** What the scenario is. */
  description: string;
  boltInput: FastenerCheckInput;
  /** The earlier average-shear check of the same bolt (kept for comparison: it ignores the clamp and the stack). */
  bolt: FastenerCheck;
  /** The same bolt as a joint: tightened to 75 % of proof, with a nut, the washers a stack under its head. */
  jointInput: BoltedJointInput;
  joint: BoltedJointCheck;
  rimInput: RimCheckInput;
  rim: RimCheck;
}

/**
 * The counterweight of the mass-layout worked example (calc/mass.ts `demoRobotBalance`): seven
 * 6 g steel washers, 42 g, under one bolt 55 mm from the spin axis, at 2400 rpm. Kept here as
 * plain numbers so the loads module does not import the mass module; a test keeps them in step.
 */
export const DEMO_WASHER_STACK = { mass: 0.042, radius: 0.055, rpm: 2400 } as const;

/**
 * How the demo's washer stack is bolted (invented): the seven washers are 1.2 mm thick, an 8.4 mm
 * stack under the head of the M4, which passes through the 5 mm base plate into a nut; tightened to
 * 75 % of its proof load with the default nut factor and friction coefficient.
 */
export const DEMO_WASHER_JOINT = { stackHeight: 0.0084, plateThickness: 0.005 } as const;

/**
 * Worked example on a demo robot of our own invention (not a real machine): a whole-body spinner
 * with a 6061-T6 ring rim of 125 mm outer radius, topping out at 2400 rpm, balanced by a stack of
 * steel washers under one M4 class 8.8 bolt, the bolt loaded in shear (newton-second-law,
 * iso-898-1, carvill-data-handbook).
 *
 * Formula: as `fastenerCheck`, `boltedJointCheck` and `rimCheck`
 *
 * @param washerMass mass of the washer stack [kg] (default `DEMO_WASHER_STACK.mass`, 42 g)
 * @param washerRadius spin axis to the stack's centre of mass [m] (default 55 mm)
 * @param topSpeed the robot's top speed [rad/s] (default 2400 rpm)
 * @returns the inputs and results of the checks: the bolt's average shear, the bolt as a joint, the rim
 *
 * Example: with the defaults the bolt sees 146 N, τ = 16.6 MPa, average-shear n = 22.2; as a joint
 * the clamp carries the stack 5.24 times over (friction governs, holds), and once slipped the bolt
 * bends over the 8.4 mm stack, n = 1.58. The rim sees 2.665 MPa at 31.4 m/s tip speed, n = 104,
 * burst estimate 25 900 rpm.
 *
 * Sources: newton-second-law, iso-898-1, shear-ultimate-ratio, shigley-mechanical-design, roark-beams,
 * carvill-data-handbook, safety-factor-practice.
 */
export function demoRobotLoads(input: { washerMass?: number; washerRadius?: number; topSpeed?: number } = {}): DemoRobotLoads {
  const {
    washerMass = DEMO_WASHER_STACK.mass,
    washerRadius = DEMO_WASHER_STACK.radius,
    topSpeed = rpmToRadPerSecond(DEMO_WASHER_STACK.rpm),
  } = requireInputObject(input);
  const boltInput: FastenerCheckInput = {
    partMass: washerMass,
    radius: washerRadius,
    angularSpeed: topSpeed,
    count: 1,
    shearRatio: DEFAULT_SHEAR_RATIO,
    failBelow: DEFAULT_SAFETY_THRESHOLDS.failBelow,
    marginalBelow: DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
    size: "M4",
    propertyClass: "8.8",
    mode: "shear",
    shearPlane: "thread",
  };
  const jointInput: BoltedJointInput = {
    ...(Object.fromEntries(Object.entries(boltedJointInputs).map(([name, spec]) => [name, spec.default])) as {
      [K in keyof typeof boltedJointInputs]: number;
    }),
    ...BOLTED_JOINT_CHOICE_DEFAULTS,
    partMass: washerMass,
    radius: washerRadius,
    angularSpeed: topSpeed,
    stackHeight: DEMO_WASHER_JOINT.stackHeight,
    gripLength: DEMO_WASHER_JOINT.stackHeight + DEMO_WASHER_JOINT.plateThickness,
    threadIn: "nut",
  };
  const rimInput: RimCheckInput = {
    shape: "thin-ring",
    outerRadius: 0.125,
    innerRadius: 0.115,
    ...rimMaterial("al-6061-t6"),
    angularSpeed: topSpeed,
    failBelow: DEFAULT_SAFETY_THRESHOLDS.failBelow,
    marginalBelow: DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
  };
  const grams = Number((washerMass * 1000).toPrecision(4));
  const mm = Number((washerRadius * 1000).toPrecision(4));
  return {
    description: `An invented whole-body spinner (not a real robot): 6061-T6 ring rim, 125 mm outer radius; ${grams} g of steel counterweight washers under one M4 class 8.8 bolt at ${mm} mm radius, in shear.`,
    boltInput,
    bolt: fastenerCheck(boltInput),
    jointInput,
    joint: boltedJointCheck(jointInput),
    rimInput,
    rim: rimCheck(rimInput),
  };
}

/** Source keys this module relies on (checked by the meta test). */
export const LOADS_SOURCES: readonly SourceKey[] = [
  "newton-second-law",
  "openstax-college-physics",
  "iso-898-1",
  "shigley-distortion-energy",
  "shear-ultimate-ratio",
  "shigley-mechanical-design",
  "roark-beams",
  "en-1993-1-8",
  "carvill-data-handbook",
  "timoshenko-goodier",
  "roark-rotating-disks",
  "safety-factor-practice",
];
