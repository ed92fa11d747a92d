/**
 * The loop-timing calculator (chapter "heading-timing"): what the control loop's period, its
 * latency and a heading LED's on-time cost in heading at top speed.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatQuantity } from "../core/units.ts";
import { headingTiming } from "../heading/timing.ts";
import { headingTimingInputs } from "../heading/timing-inputs.ts";

export const form = /* @__PURE__ */ defineForm({
  id: "headingTiming",
  title: "Loop timing",
  chapter: "heading-timing",
  anchor: "timing-calculator",
  order: 30,
  inputs: headingTimingInputs,
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = headingTiming;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    // Stryker disable next-line ObjectLiteral: equivalent, angles show in degrees in both unit systems
    const deg = (v: number) => formatQuantity(v, "angle", { system }).text;
    // Stryker disable next-line ObjectLiteral: equivalent, frequencies show in Hz/kHz in both unit systems
    const hz = (v: number) => formatQuantity(v, "frequency", { system }).text;
    const missed = [
      r.stepOk ? null : `the heading moves ${deg(r.headingStep)} per loop (a ${hz(r.loopRateNeeded)} loop meets ${deg(values.targetStep)})`,
      r.arcOk
        ? null
        : // Stryker disable next-line ObjectLiteral: equivalent, times show in µs/ms/s in both unit systems
          `the heading LED lights ${deg(r.arcWidth)} per turn (${formatQuantity(r.onTimeNeeded, "time", { system }).text} on-time gives ${deg(values.targetArc)})`,
    ].filter((m) => m !== null);
    return [
      {
        title: "Loop timing",
        status: missed.length === 0 ? "holds" : missed.length === 1 ? "marginal" : "fails",
        // Stryker disable next-line ObjectLiteral: equivalent, spin speeds show in rpm in both unit systems
        rule: `At ${formatQuantity(values.topSpeed, "angularSpeed", { system }).text}: heading step per loop at most ${deg(values.targetStep)}, heading LED arc at most ${deg(values.targetArc)}`,
        margin:
          missed.length === 0
            ? `Step ${deg(r.headingStep)} per loop, arc ${deg(r.arcWidth)}, latency offset ${deg(r.latencyLag)}`
            : `At top speed ${missed.join("; ")}`,
        figure: figureOf("Heading step per loop", r.headingStep, "angle", system),
        details: [figureOf("Offset from latency", r.latencyLag, "angle", system), figureOf("Heading LED arc", r.arcWidth, "angle", system)],
      },
    ];
  },
});
