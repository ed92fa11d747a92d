/**
 * The drift-budget calculator's inputs and its form (what it holds and where it lives), apart from
 * the physics: other calculators link to it (the calibration hands over its fit, the mass layout
 * its sensor radius), and a link needs only this.
 */
import { defineForm } from "../core/calculator.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

/** Inputs of the drift-budget calculator, in SI. */
export const headingDriftInputs = /* @__PURE__ */ defineInputs({
  angularSpeed: {
    label: "Spin speed",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(2000),
    urlKey: "rpm",
    help: "The true spin rate at which to read the drift.",
  },
  assumedRadius: {
    label: "Radius in firmware",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.012,
    urlKey: "ra",
    help: "The sensor radius the firmware divides by.",
  },
  trueRadius: {
    label: "True radius",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.0127,
    urlKey: "rt",
    help: "The real distance from the spin axis (through the centre of mass) to the sensing element.",
  },
  scaleError: {
    label: "Sensor scale error",
    kind: "fraction",
    min: -0.5,
    max: 0.5,
    default: 0,
    urlKey: "k",
    help: "How far the radial axis reads high (+) or low (−), e.g. 2 % for a part that reads 102 g at 100 g.",
  },
  bias: {
    label: "Sensor offset",
    kind: "acceleration",
    min: -50 * STANDARD_GRAVITY,
    max: 50 * STANDARD_GRAVITY,
    default: 0.2 * STANDARD_GRAVITY,
    urlKey: "b",
    help: "What the radial axis reads at rest with no acceleration along it (its zero-g offset).",
  },
  biasCorrection: {
    label: "Offset subtracted in firmware",
    kind: "acceleration",
    min: -50 * STANDARD_GRAVITY,
    max: 50 * STANDARD_GRAVITY,
    default: 0,
    urlKey: "bh",
    help: "The offset the firmware removes before dividing by the radius.",
  },
  tilt: {
    label: "Axis tilt",
    kind: "angle",
    min: 0,
    max: (80 * Math.PI) / 180,
    default: 0,
    urlKey: "tilt",
    help: "Angle between the sensing axis and the line to the spin axis.",
  },
  budget: {
    label: "Drift the driver can trim",
    kind: "angularSpeed",
    min: 0,
    minOpen: true,
    max: (3600 * Math.PI) / 180,
    default: (10 * Math.PI) / 180,
    unit: { metric: "deg/s", us: "deg/s" },
    urlKey: "budget",
    help: "The heading drift rate the driver can hold off with the trim control.",
  },
  lowSpeed: {
    label: "Plot from",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(200),
    urlKey: "lo",
    help: "Lowest speed on the drift plot.",
  },
  highSpeed: {
    label: "Plot to",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(3000),
    urlKey: "hi",
    help: "Highest speed on the drift plot.",
  },
  accelerationNoise: {
    label: "Reading noise",
    kind: "acceleration",
    min: 0,
    max: 50 * STANDARD_GRAVITY,
    default: 0,
    urlKey: "n",
    help: "RMS noise of one radial reading; 0 if unknown.",
  },
});

export type HeadingDriftInput = { [K in keyof typeof headingDriftInputs]: number };

/** The drift budget's form: see calc/calculators/heading-drift.ts for what it computes. */
export const headingDriftForm = /* @__PURE__ */ defineForm({
  id: "headingDrift",
  title: "Heading drift",
  chapter: "heading-drift",
  anchor: "drift-calculator",
  order: 20,
  inputs: headingDriftInputs,
});
