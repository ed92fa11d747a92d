/**
 * What the heading-smoothing calculator asks for: its input declarations, apart from the calculation itself
 * (calc/heading/smoothing.ts) so that a page that only reads or writes a design's smoothing section does not carry
 * the physics.
 */
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

/** Inputs of the smoothing calculator, in SI. */
export const headingSmoothingInputs = /* @__PURE__ */ defineInputs({
  sampleRate: {
    label: "Sample rate",
    kind: "frequency",
    min: 1,
    max: 1e6,
    default: 1000,
    urlKey: "fs",
    help: "How often a new spin-rate estimate enters the filter.",
  },
  smoothingFactor: {
    label: "Smoothing factor α",
    kind: "fraction",
    min: 1e-4,
    max: 1,
    default: 0.1,
    unit: { metric: "frac", us: "frac" },
    urlKey: "a",
    help: "The weight of each new sample in y += α(x − y); 1 means no smoothing.",
  },
  spinUpAcceleration: {
    label: "Spin-up rate",
    kind: "angularAcceleration",
    min: 0.01,
    max: 1e6,
    default: /* @__PURE__ */ rpmToRadPerSecond(2000),
    urlKey: "acc",
    help: "How fast the spin rate rises during a spin-up (rpm gained per second).",
  },
  speedChange: {
    label: "Speed change",
    kind: "angularSpeed",
    min: 0,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(3000),
    urlKey: "dw",
    help: "How much the spin rate changes over the spin-up.",
  },
  speed: {
    label: "Speed for the spike check",
    kind: "angularSpeed",
    min: 0,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(2000),
    urlKey: "rpm",
    help: "The spin rate at which a spike arrives.",
  },
  assumedRadius: {
    label: "Radius in firmware",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.012,
    urlKey: "r",
    help: "The sensor radius the firmware divides by.",
  },
  spike: {
    label: "Spike size",
    kind: "acceleration",
    min: 0,
    max: 10000 * STANDARD_GRAVITY,
    default: 50 * STANDARD_GRAVITY,
    urlKey: "spk",
    help: "Extra acceleration in one reading from a hit or a bump.",
  },
  medianLength: {
    label: "Median window",
    kind: "count",
    min: 1,
    max: 15,
    default: 3,
    integer: true,
    urlKey: "med",
    help: "Samples in the running median before the average (odd; 1 means no median).",
  },
});

export type HeadingSmoothingInput = { [K in keyof typeof headingSmoothingInputs]: number };
