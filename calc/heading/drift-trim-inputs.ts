/**
 * What the radius trim asks for: its input declarations, apart from the calculation itself
 * (calc/heading/drift-trim.ts) so that a page that only reads or writes a design's radius-trim section does not carry
 * the physics.
 */
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

/** Inputs of the radius trim, in SI. */
export const radiusTrimInputs = /* @__PURE__ */ defineInputs({
  assumedRadius: {
    label: "Radius in firmware now",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.008,
    urlKey: "ra",
    help: "The radius the firmware divided by while you watched the drift.",
  },
  driftPerTurn: {
    label: "Drift per turn",
    kind: "angle",
    min: 0,
    max: Math.PI,
    default: (20 * Math.PI) / 180,
    urlKey: "x",
    help: "How far the heading moves in one turn of the robot, from a video or by counting turns against the heading LED.",
  },
  driftRate: {
    label: "Drift per second",
    kind: "angularSpeed",
    min: 0,
    max: (3600 * Math.PI) / 180,
    default: (10 * Math.PI) / 180,
    unit: { metric: "deg/s", us: "deg/s" },
    urlKey: "dr",
    help: "How fast the heading turns on its own while the robot spins at the speed below.",
  },
  angularSpeed: {
    label: "Spin speed when you saw it",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(2000),
    urlKey: "rpm",
    help: "The true spin rate during the drift you timed.",
  },
});

export type RadiusTrimSense = "ahead" | "behind";
export type RadiusTrimMeasure = "turn" | "second";

export interface RadiusTrimInput {
  /** r̂, the radius the firmware used [m]. */
  assumedRadius: number;
  /** Whether the heading ran ahead of the robot (estimate too fast) or fell behind. */
  sense: RadiusTrimSense;
  /** Whether the drift was seen per turn or timed per second. */
  measure: RadiusTrimMeasure;
  /** |X|, the drift in one turn [rad] (read when `measure` is "turn"). */
  driftPerTurn: number;
  /** |D|, the drift rate [rad/s] (read when `measure` is "second"). */
  driftRate: number;
  /** ω, the true spin rate while the drift rate was timed [rad/s] (read when `measure` is "second"). */
  angularSpeed: number;
}
