/**
 * What the accelerometer-placement calculator asks for: its input declarations, apart from the calculation itself
 * (calc/rotation/rotation.ts) so that a page that only reads or writes a design's placement section does not carry
 * the physics.
 */
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

/** Inputs of the accelerometer-placement calculator, in SI. */
export const accelerometerPlacementInputs = defineInputs({
  topSpeed: {
    label: "Top speed",
    kind: "angularSpeed",
    min: 0,
    minOpen: true,
    max: rpmToRadPerSecond(60000),
    default: rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The fastest the robot will spin.",
  },
  lowSpeed: {
    label: "Lowest tracked speed",
    kind: "angularSpeed",
    min: 0,
    minOpen: true,
    max: rpmToRadPerSecond(60000),
    default: rpmToRadPerSecond(400),
    urlKey: "low",
    help: "The slowest spin at which the heading must still be tracked.",
  },
  radius: {
    label: "Sensor radius",
    kind: "length",
    min: 0,
    minOpen: true,
    max: 2,
    default: 0.02,
    urlKey: "r",
    help: "Distance from the spin axis (the centre of mass) to the sensing element.",
  },
  fullScale: {
    label: "Sensor full scale",
    kind: "acceleration",
    min: 0,
    minOpen: true,
    max: 10000 * STANDARD_GRAVITY,
    default: 200 * STANDARD_GRAVITY,
    urlKey: "fs",
    help: "The range of the radial axis, e.g. 200 gₙ for a ±200 gₙ part.",
  },
  margin: {
    label: "Headroom kept",
    kind: "fraction",
    min: 0,
    max: 0.95,
    default: 0.2,
    urlKey: "m",
    help: "Fraction of full scale left free at top speed, for wobble, vibration and sensor tolerance.",
  },
  step: {
    label: "Resolution (1 LSB)",
    kind: "acceleration",
    min: 0,
    minOpen: true,
    max: 100 * STANDARD_GRAVITY,
    default: 0.1 * STANDARD_GRAVITY,
    urlKey: "step",
    help: "One count (1 LSB) of the radial axis, as the data sheet gives it: full-scale span ÷ 2^bits.",
  },
  noise: {
    label: "Sensor noise",
    kind: "acceleration",
    min: 0,
    max: 100 * STANDARD_GRAVITY,
    default: 0,
    urlKey: "noise",
    help: "RMS noise at your sample rate; the larger of the resolution and the noise is what the firmware can resolve. 0 if unknown.",
  },
  resolution: {
    label: "Speed resolution wanted",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 0.5,
    default: 0.02,
    urlKey: "res",
    help: "How finely one reading must resolve the spin rate at the lowest tracked speed.",
  },
  partMass: {
    label: "Part mass",
    kind: "mass",
    min: 0,
    minOpen: true,
    max: 100,
    default: 0.05,
    urlKey: "pm",
    help: "Any other part to check: its mass.",
  },
  partRadius: {
    label: "Part radius",
    kind: "length",
    min: 0,
    max: 2,
    default: 0.06,
    urlKey: "pr",
    help: "Distance from the spin axis to that part's own centre of mass.",
  },
});

export type AccelerometerPlacementInput = { [K in keyof typeof accelerometerPlacementInputs]: number };
