/**
 * The smoothing calculator (chapter "heading-timing", beside the loop timing, link keys "s."):
 * what an average (after an optional running median) costs in lag and does to one spike.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatQuantity } from "../core/units.ts";
import { headingSmoothing } from "../heading/smoothing.ts";
import { headingSmoothingInputs } from "../heading/smoothing-inputs.ts";

export const form = /* @__PURE__ */ defineForm({
  id: "headingSmoothing",
  title: "Smoothing",
  chapter: "heading-timing",
  anchor: "timing-calculator",
  order: 31,
  scope: "s",
  inputs: headingSmoothingInputs,
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = headingSmoothing;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(_values, r, system) {
    return [
      {
        title: "Smoothing",
        status: "info",
        rule: "What the smoothing costs: the delay of the estimate, and the heading it loses over a spin-up",
        // Stryker disable next-line ObjectLiteral: equivalent, times and angles show in the same units in both unit systems
        margin: `Delay ${formatQuantity(r.totalDelay, "time", { system }).text}; the heading falls ${formatQuantity(Math.abs(r.headingErrorAfterSpinUp), "angle", { system }).text} behind over the spin-up`,
        figure: figureOf("Delay of the estimate", r.totalDelay, "time", system),
        details: [figureOf("Drift rate during the spin-up", r.driftRateDuringSpinUp, "angularSpeed", system, "deg/s")],
      },
    ];
  },
});
