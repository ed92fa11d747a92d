/**
 * The steering estimate (chapter "steering"): how fast a whole-body spinner can translate for a
 * window width and depth, how far latency turns its push and the phase lead that cancels it, the
 * wheels' gyroscopic moment and, with one wheel and a skid, the spin at which the skid lifts.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatQuantity } from "../core/units.ts";
import { SKID_LIFT_MARGIN, steeringEstimate, steeringEstimateInputs } from "../steering/estimate.ts";

export const form = /* @__PURE__ */ defineForm({
  id: "steering",
  title: "Steering while spinning",
  chapter: "steering",
  anchor: "steering-calculator",
  order: 85,
  inputs: steeringEstimateInputs,
  /** The page's simulation view: shown (`sim=1`) and its distance field (`dist`). */
  pageKeys: ["sim", "dist"],
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = steeringEstimate;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: Parameters<typeof formatQuantity>[1]) => formatQuantity(v, kind, { system }).text;
    const lift = r.skidLiftSpeed;
    return [
      {
        title: "Steering while spinning",
        status: r.status,
        rule: `Push within ${q(values.directionTolerance, "angle")} of the commanded direction (marginal up to twice that)${lift === null ? "" : `; the spin below ${Math.round(SKID_LIFT_MARGIN * 100)} % of the skid lift speed`}`,
        margin: `${r.reason} Kinematic translation speed ${q(r.translationSpeed, "speed")} at ${q(values.spinSpeed, "angularSpeed")}${lift === null ? "" : `; the skid lifts at ${q(lift, "angularSpeed")}`}`,
        figure: figureOf("Kinematic translation speed", r.translationSpeed, "speed", system),
        details: [
          figureOf("Direction error", r.directionError, "angle", system),
          figureOf("Phase lead that cancels it", r.leadToCancel, "angle", system),
          figureOf("Gyroscopic moment per wheel", r.gyroscopicMoment, "torque", system),
          ...(lift === null ? [] : [figureOf("Skid lift speed", lift, "angularSpeed", system)]),
        ],
      },
    ];
  },
});
