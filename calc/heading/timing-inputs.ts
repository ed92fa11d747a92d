/**
 * What the heading-timing calculator asks for: its input declarations, apart from the calculation itself
 * (calc/heading/timing.ts) so that a page that only reads or writes a design's timing section does not carry
 * the physics.
 */
import { TURN } from "../core/constants.ts";
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

/** Inputs of the timing calculator, in SI. */
export const headingTimingInputs = /* @__PURE__ */ defineInputs({
  topSpeed: {
    label: "Top speed",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(3000),
    urlKey: "rpm",
    help: "The fastest the robot spins.",
  },
  loopRate: {
    label: "Control-loop rate",
    kind: "frequency",
    min: 1,
    max: 1e6,
    default: 1000,
    urlKey: "hz",
    help: "How often the firmware reads the sensor and updates the heading.",
  },
  latency: {
    label: "Latency",
    kind: "time",
    min: 0,
    max: 1,
    default: 0.0005,
    urlKey: "lat",
    help: "Fixed delay from reading the sensor to the output acting (motor command or LED).",
  },
  onTime: {
    label: "Heading LED on-time",
    kind: "time",
    min: 0,
    max: 1,
    default: 0.001,
    urlKey: "on",
    help: "How long the heading LED stays lit each revolution.",
  },
  targetArc: {
    label: "Arc wanted",
    kind: "angle",
    min: 0,
    minOpen: true,
    max: TURN,
    default: (20 * Math.PI) / 180,
    urlKey: "arc",
    help: "How wide the lit arc should look at top speed.",
  },
  targetStep: {
    label: "Largest heading step",
    kind: "angle",
    min: 1e-4,
    max: TURN,
    default: (5 * Math.PI) / 180,
    urlKey: "step",
    help: "The largest heading change allowed between two loop updates at top speed.",
  },
});

export type HeadingTimingInput = { [K in keyof typeof headingTimingInputs]: number };
