/**
 * What the opposed-sensors comparison asks for: its input declarations, apart from the calculation itself
 * (calc/heading/opposed.ts) so that a page that only reads or writes a design's opposed-sensors section does not carry
 * the physics.
 */
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

/** Inputs of the opposed-sensors comparison, in SI. */
export const opposedSensorsInputs = /* @__PURE__ */ defineInputs({
  angularSpeed: {
    label: "Spin speed",
    kind: "angularSpeed",
    min: 0.1,
    max: 10000,
    default: /* @__PURE__ */ rpmToRadPerSecond(2000),
    urlKey: "rpm",
    help: "The true spin rate at which to compare one sensor with the pair.",
  },
  radius1: {
    label: "Sensor 1 radius",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.012,
    urlKey: "r1",
    help: "Distance from the nominal spin centre to sensor 1's sensing element.",
  },
  radius2: {
    label: "Sensor 2 radius",
    kind: "length",
    min: 0.0001,
    max: 1,
    default: 0.012,
    urlKey: "r2",
    help: "The same for sensor 2, on the opposite side of the centre.",
  },
  offset: {
    label: "Centre-of-mass uncertainty",
    kind: "length",
    min: 0,
    max: 0.1,
    default: 0.0005,
    urlKey: "e",
    help: "How far the real spin centre may lie from the nominal one, along the line through both sensors.",
  },
});

export type OpposedSensorsInput = { [K in keyof typeof opposedSensorsInputs]: number };
