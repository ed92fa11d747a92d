/**
 * What the mass-layout calculator asks for besides its parts list: its scalar input declarations,
 * apart from the calculator itself (calc/mass/mass-balance.ts) so that a page that only reads or
 * writes a design's mass section does not carry the physics.
 */
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";
import type { MountingPoint } from "./counterweight.ts";
import type { LayoutPart } from "./parts.ts";

/** Scalar inputs of the mass-and-balance calculator, in SI (the parts list comes separately). */
export const massBalanceInputs = defineInputs({
  spinSpeed: {
    label: "Spin speed",
    kind: "angularSpeed",
    min: 0,
    minOpen: true,
    max: rpmToRadPerSecond(60000),
    default: rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The fastest the robot spins in service.",
  },
  targetOffset: {
    label: "Target offset",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 0.05,
    default: 0.0002,
    urlKey: "et",
    help: "The largest distance between the centre of mass and the geometric centre you will accept.",
  },
  balanceGrade: {
    label: "Balance grade",
    kind: "speed",
    min: 0.0004,
    max: 4,
    default: 0.1,
    urlKey: "G",
    unit: { metric: "mm/s", us: "mm/s" },
    help: "Balance quality grade G = e·Ω in mm/s, from G 0.4 to G 4000; G 100 is 100 mm/s.",
  },
  correctionRadius: {
    label: "Counterweight radius",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 2,
    default: 0.055,
    urlKey: "cr",
    help: "Distance from the geometric centre at which a counterweight (or a correction mass) can sit.",
  },
  maxRadius: {
    label: "Largest mounting radius",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 2,
    default: 0.065,
    urlKey: "rmax",
    help: "The farthest from the centre a counterweight can be mounted.",
  },
  counterweightMass: {
    label: "Counterweight mass",
    kind: "mass",
    min: 0,
    minOpen: true,
    max: 100,
    default: 0.045,
    urlKey: "cm",
    help: "A counterweight you already have: the calculator finds the radius it needs.",
  },
  planeZ1: {
    label: "Lower correction plane",
    kind: "length",
    min: -2,
    max: 2,
    default: 0.004,
    urlKey: "z1",
    help: "Height of the lower plane for a two-plane correction.",
  },
  planeZ2: {
    label: "Upper correction plane",
    kind: "length",
    min: -2,
    max: 2,
    default: 0.024,
    urlKey: "z2",
    help: "Height of the upper plane; must differ from the lower one.",
  },
  sensorX: {
    label: "Sensor x",
    kind: "length",
    min: -2,
    max: 2,
    default: -0.032,
    urlKey: "sx",
    help: "Sensor position from the geometric centre, x.",
  },
  sensorY: {
    label: "Sensor y",
    kind: "length",
    min: -2,
    max: 2,
    default: 0,
    urlKey: "sy",
    help: "Sensor position from the geometric centre, y.",
  },
  sideGrip: {
    label: "Wheel side grip",
    kind: "fraction",
    min: 0,
    max: 3,
    default: 0.8,
    unit: { metric: "frac", us: "frac" },
    urlKey: "mu",
    help: "Sideways friction coefficient of the drive wheels (0.8: rubber sliding on concrete); 0: no grip.",
  },
  gripShare: {
    label: "Weight on the drive wheels",
    kind: "fraction",
    min: 0,
    max: 1,
    default: 0.9,
    unit: { metric: "frac", us: "frac" },
    urlKey: "ws",
    help: "Share of the weight on the drive wheels, whose centre is taken as the geometric centre.",
  },
  supportRadius: {
    label: "Support radius",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 2,
    default: 0.07,
    urlKey: "sr",
    help: "From the centre to the nearest edge the robot could tip over (wheel or skid contact).",
  },
});

export type MassBalanceScalars = { [K in keyof typeof massBalanceInputs]: number };

export type MassBalanceInput = MassBalanceScalars & {
  /** The parts list. */
  parts: readonly LayoutPart[];
  /** Mounting points offered for a counterweight (optional). */
  candidates?: readonly MountingPoint[];
};
