/**
 * What the calculator "weapon shaft and bearings" asks for: its choice lists, choice defaults and
 * numeric input declarations, apart from the check itself (calc/weapon/shaft-check.ts) so that a
 * page that only reads or writes a design's shaft section does not carry the physics.
 */
import type { ChoiceOption } from "../core/choices.ts";
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";
import { MATERIAL_DENSITIES, MATERIAL_IDS, type MaterialId } from "../materials/densities.ts";

/** The two rolling-bearing families ISO 281 gives a life exponent for. */
export const BEARING_TYPE_OPTIONS = [
  { value: "ball", label: "Ball (deep-groove)" },
  { value: "roller", label: "Roller (cylindrical)" },
] as const satisfies readonly ChoiceOption[];

export type BearingType = (typeof BEARING_TYPE_OPTIONS)[number]["value"];

/** Where the rotor sits on its shaft. */
export const SHAFT_LAYOUT_OPTIONS = [
  { value: "between", label: "Between two supports" },
  { value: "overhung", label: "Overhung" },
] as const satisfies readonly ChoiceOption[];

export type ShaftLayout = (typeof SHAFT_LAYOUT_OPTIONS)[number]["value"];

/** Whether the shaft turns. */
export const SHAFT_KIND_OPTIONS = [
  { value: "dead", label: "Dead shaft" },
  { value: "live", label: "Live shaft" },
] as const satisfies readonly ChoiceOption[];

export type ShaftKind = (typeof SHAFT_KIND_OPTIONS)[number]["value"];

/** Which way the shaft points (decides whether the rotor's weight bends the shaft or pushes along it). */
export const SHAFT_AXLE_OPTIONS = [
  { value: "horizontal", label: "Horizontal shaft" },
  { value: "vertical", label: "Vertical shaft" },
] as const satisfies readonly ChoiceOption[];

export type ShaftAxle = (typeof SHAFT_AXLE_OPTIONS)[number]["value"];

/** The shaft materials: every row of calc/materials.ts. */
export const SHAFT_MATERIAL_OPTIONS: readonly ChoiceOption<MaterialId>[] = /* @__PURE__ */ MATERIAL_IDS.map((id) => ({
  value: id,
  label: `${MATERIAL_DENSITIES[id].name}, ${MATERIAL_DENSITIES[id].condition}`,
}));

/** Choice defaults of the shaft check (the numeric defaults are in `weaponShaftInputs`). */
export const WEAPON_SHAFT_CHOICE_DEFAULTS = {
  layout: "between",
  shaft: "dead",
  axle: "horizontal",
  bearingType: "ball",
  material: "steel-4340-qt650",
} as const satisfies { layout: ShaftLayout; shaft: ShaftKind; axle: ShaftAxle; bearingType: BearingType; material: MaterialId };

/**
 * Numeric inputs of the shaft check, in SI. Choices: `SHAFT_LAYOUT_OPTIONS`, `SHAFT_KIND_OPTIONS`,
 * `SHAFT_AXLE_OPTIONS`, `BEARING_TYPE_OPTIONS`, `SHAFT_MATERIAL_OPTIONS`. Defaults: the invented
 * `DEMO_SHAFT`.
 */
export const weaponShaftInputs = defineInputs({
  rotorMass: { label: "Rotor mass", kind: "mass", min: 0.001, max: 500, default: 2.5, urlKey: "mr", help: "Everything that turns with the weapon." },
  rotorInertia: {
    label: "Rotor inertia",
    kind: "inertia",
    min: 1e-7,
    max: 50,
    default: 0.010125,
    urlKey: "J",
    help: "About the rotor's spin axis.",
  },
  weaponSpeed: {
    label: "Weapon speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(10),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(8000),
    urlKey: "rpm",
    help: "Running speed: it sets the unbalance force and the bearings' life.",
  },
  turnRate: {
    label: "Turn rate of the axle",
    kind: "angularSpeed",
    min: 0,
    max: 200,
    default: 2 * Math.PI,
    unit: { metric: "deg/s", us: "deg/s" },
    urlKey: "yaw",
    help: "Yaw rate for a horizontal shaft; pitch or roll rate for a vertical one.",
  },
  unbalance: {
    label: "Residual unbalance",
    kind: "unbalance",
    min: 0,
    max: 1,
    default: 2e-5,
    urlKey: "U",
    help: "Rotor mass times its centre of mass's offset from the axis.",
  },
  impactForce: {
    label: "Peak force of a hit",
    kind: "force",
    min: 0,
    max: 1e7,
    default: 8000,
    urlKey: "Fi",
    help: "Largest force of a hit on the rotor, across the shaft.",
  },
  motorTorque: {
    label: "Motor torque through the shaft",
    kind: "torque",
    min: 0,
    max: 1e4,
    default: 1.5,
    urlKey: "T",
    help: "Torque a live shaft carries from the drive to the rotor.",
  },
  bearingSpan: {
    label: "Support span",
    kind: "length",
    min: 0.002,
    max: 2,
    default: 0.06,
    urlKey: "L",
    help: "A live shaft's bearings, a dead shaft's frame mounts.",
  },
  rotorPosition: {
    label: "Rotor position",
    kind: "length",
    min: 0,
    max: 2,
    default: 0.03,
    urlKey: "a",
    help: "First support to the rotor's mid-plane, at most the span.",
  },
  overhang: {
    label: "Overhang",
    kind: "length",
    min: 0.0005,
    max: 2,
    default: 0.02,
    urlKey: "c",
    help: "Nearer support to the rotor's mid-plane.",
  },
  hubBearingSpacing: {
    label: "Rotor bearing spacing",
    kind: "length",
    min: 0.001,
    max: 1,
    default: 0.02,
    urlKey: "s",
    help: "Between the two bearings in the rotor's hub.",
  },
  shaftDiameter: {
    label: "Shaft diameter",
    kind: "length",
    min: 0.001,
    max: 0.5,
    default: 0.012,
    urlKey: "d",
    help: "Outer diameter where the bending moment is largest.",
  },
  shaftBore: { label: "Shaft bore", kind: "length", min: 0, max: 0.5, default: 0, urlKey: "di", help: "Inner diameter of a hollow shaft; 0 for a solid one." },
  dynamicLoadRating: {
    label: "Bearing dynamic load rating C",
    kind: "force",
    min: 1,
    max: 1e7,
    default: 5400,
    urlKey: "C",
    help: "Of one bearing, from its maker's table.",
  },
  staticLoadRating: {
    label: "Bearing static load rating C0",
    kind: "force",
    min: 1,
    max: 1e7,
    default: 2360,
    urlKey: "C0",
    help: "Of one bearing, from its maker's table.",
  },
  axialLoad: {
    label: "Axial load on the bearings",
    kind: "force",
    min: 0,
    max: 1e7,
    default: 0,
    urlKey: "Fa",
    help: "Thrust along the shaft; a vertical rotor's weight is added.",
  },
  radialFactor: {
    label: "Radial load factor X",
    kind: "fraction",
    min: 0.1,
    max: 2,
    default: 1,
    unit: { metric: "frac", us: "frac" },
    urlKey: "X",
    help: "From the bearing table; 1 for a purely radial load.",
  },
  axialFactor: {
    label: "Axial load factor Y",
    kind: "fraction",
    min: 0,
    max: 5,
    default: 0,
    unit: { metric: "frac", us: "frac" },
    urlKey: "Y",
    help: "From the bearing table; 0 for a purely radial load.",
  },
  requiredLife: {
    label: "Required bearing life",
    kind: "time",
    min: 60,
    max: 1e9,
    default: 20 * 3600,
    unit: { metric: "h", us: "h" },
    urlKey: "life",
    help: "Running time at the weapon speed they should last.",
  },
  failBelow: {
    label: "Fails below",
    kind: "fraction",
    min: 1,
    max: 10,
    default: 1,
    unit: { metric: "frac", us: "frac" },
    urlKey: "fail",
    help: "Shaft safety factor on yield below which it fails.",
  },
  marginalBelow: {
    label: "Marginal below",
    kind: "fraction",
    min: 1,
    max: 20,
    default: 2,
    unit: { metric: "frac", us: "frac" },
    urlKey: "thin",
    help: "Shaft safety factor on yield below which it is marginal.",
  },
});

export type WeaponShaftInput = { [K in keyof typeof weaponShaftInputs]: number } & {
  /** A value of `SHAFT_LAYOUT_OPTIONS`. */
  layout: string;
  /** A value of `SHAFT_KIND_OPTIONS`. */
  shaft: string;
  /** A value of `SHAFT_AXLE_OPTIONS`. */
  axle: string;
  /** A value of `BEARING_TYPE_OPTIONS`. */
  bearingType: string;
  /** A value of `SHAFT_MATERIAL_OPTIONS`. */
  material: string;
};
