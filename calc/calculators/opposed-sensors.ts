/**
 * The opposed-sensors comparison (chapter "heading-drift", beside the drift budget, link keys
 * "p."): one sensor against a pair when the spin centre is uncertain.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatQuantity } from "../core/units.ts";
import { opposedSensorsCheck } from "../heading/opposed.ts";
import { opposedSensorsInputs } from "../heading/opposed-inputs.ts";

export const form = /* @__PURE__ */ defineForm({
  id: "opposedSensors",
  title: "One sensor or an opposed pair",
  chapter: "heading-drift",
  anchor: "drift-calculator",
  order: 21,
  scope: "p",
  inputs: opposedSensorsInputs,
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = opposedSensorsCheck;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const off = formatQuantity(values.offset, "length", { system }).text;
    const single = r.singleWorstPerRevolution;
    const pairRate = formatQuantity(r.pairWorstDriftRate, "angularSpeed", { system, unit: "deg/s" }).text;
    return [
      {
        title: "One sensor or an opposed pair",
        status: "info",
        rule: `Heading drift when the spin centre is anywhere within ${off} of where the firmware assumes it`,
        margin:
          single === null
            ? `One sensor gives no estimate at one end of ±${off}; the pair is unaffected`
            : // Stryker disable next-line ObjectLiteral: equivalent, angles show in degrees in both unit systems
              `One sensor drifts up to ${formatQuantity(single, "angle", { system }).text} per revolution; the pair ${pairRate}`,
        figure: single === null ? null : figureOf("One sensor, worst drift per revolution", single, "angle", system),
        details: [figureOf("Pair, worst drift rate", r.pairWorstDriftRate, "angularSpeed", system, "deg/s")],
      },
    ];
  },
});
