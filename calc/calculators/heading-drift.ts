/**
 * The drift-budget calculator (chapter "heading-drift"): how far a spin-rate estimate drifts at a
 * speed for the firmware's radius and offset, against the driver's trim budget.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator } from "../core/calculator.ts";
import { formatQuantity } from "../core/units.ts";
import { headingDrift } from "../heading/drift-budget.ts";
import { headingDriftForm } from "../heading/drift-inputs.ts";

export const form = headingDriftForm;

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = headingDrift;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: "angularSpeed" | "angle", unit?: "deg/s") => formatQuantity(v, kind, { system, unit }).text;
    const drift = r.atSpeed.driftRate;
    return [
      {
        title: "Heading drift",
        status: r.verdict === "within-budget" ? "holds" : "fails",
        rule: `Drift at ${q(values.angularSpeed, "angularSpeed")} within ±${q(values.budget, "angularSpeed", "deg/s")}`,
        margin:
          drift === null
            ? "No estimate at this speed: the corrected reading is zero or negative"
            : `Drifts ${q(drift, "angularSpeed", "deg/s")} (${q(r.atSpeed.driftPerRevolution ?? 0, "angle")} per revolution)`,
        figure: drift === null ? null : figureOf("Drift rate", drift, "angularSpeed", system, "deg/s"),
        details: [],
      },
    ];
  },
});
