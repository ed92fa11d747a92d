/**
 * The radius trim (chapter "heading-trim"): the firmware radius that cancels a drift the builder
 * sees, per turn or timed per second.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { defineChoices } from "../core/choices.ts";
import { formatQuantity } from "../core/units.ts";
import { radiusTrim } from "../heading/drift-trim.ts";
import { radiusTrimInputs } from "../heading/drift-trim-inputs.ts";

/** Which way the heading drifted, and how the drift was measured. */
export const radiusTrimChoices = defineChoices({
  sense: {
    label: "The heading",
    urlKey: "s",
    options: [
      { value: "ahead", label: "runs ahead of the robot" },
      { value: "behind", label: "falls behind the robot" },
    ],
    default: "ahead",
  },
  measure: {
    label: "You measured",
    urlKey: "per",
    options: [
      { value: "turn", label: "the drift in one turn" },
      { value: "second", label: "the drift per second" },
    ],
    default: "turn",
  },
});

export const form = /* @__PURE__ */ defineForm({
  id: "radiusTrim",
  title: "Radius from a drift you see",
  chapter: "heading-trim",
  anchor: "trim-calculator",
  order: 19,
  inputs: radiusTrimInputs,
  choices: radiusTrimChoices,
  applies: (input, values) =>
    input === "driftPerTurn" ? values.measure !== "second" : input === "driftRate" || input === "angularSpeed" ? values.measure === "second" : true,
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = radiusTrim;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const len = (v: number) => formatQuantity(v, "length", { system, significant: 4 }).text;
    // Stryker disable next-line ObjectLiteral: equivalent, angles show in degrees in both unit systems
    const drift = formatQuantity(Math.abs(r.driftPerRevolution), "angle", { system }).text;
    return [
      {
        title: "Radius from a drift you see",
        status: "info",
        rule: "The firmware radius that cancels the drift at the speed it was seen: r̂′ = r̂·(1 + X/360°)²",
        margin:
          r.driftPerRevolution === 0
            ? `No drift with ${len(values.assumedRadius)}: keep it`
            : `The heading ${r.driftPerRevolution > 0 ? "ran ahead" : "fell behind"} ${drift} per turn with ${len(values.assumedRadius)}: set ${len(r.radius)}`,
        figure: figureOf("Radius to set", r.radius, "length", system, undefined, 4),
        details: [figureOf("Change", r.change, "length", system, undefined, 3)],
      },
    ];
  },
});
