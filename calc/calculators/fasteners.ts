/**
 * The fastener calculator (chapter "fasteners"): whether the bolts holding a spinning part survive
 * its centrifugal pull, by ISO 898-1 class strengths. A design lists several joints.
 */
import { ratioFigure, figureOf } from "../core/check.ts";
import { defineChoices } from "../core/choices.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatNumber, formatQuantity } from "../core/units.ts";
import { FASTENER_CHOICE_DEFAULTS, fastenerCheck, fastenerCheckInputs, LOADING_MODE_OPTIONS, SHEAR_PLANE_OPTIONS } from "../loads/bolts.ts";
import { PROPERTY_CLASS_OPTIONS, THREAD_SIZE_OPTIONS } from "../loads/fasteners.ts";

/** The category inputs of the fastener check, with their link keys. */
export const fastenerChoices = defineChoices({
  size: {
    label: "Thread size",
    urlKey: "size",
    options: THREAD_SIZE_OPTIONS,
    default: FASTENER_CHOICE_DEFAULTS.size,
    help: "ISO metric coarse thread: nominal diameter × pitch, in mm.",
  },
  propertyClass: {
    label: "Property class",
    urlKey: "cls",
    options: PROPERTY_CLASS_OPTIONS,
    default: FASTENER_CHOICE_DEFAULTS.propertyClass,
    help: "The number stamped on the head; the strengths are the ISO 898-1 minimums. Q&T: quenched and tempered.",
  },
  mode: {
    label: "Loading",
    urlKey: "mode",
    options: LOADING_MODE_OPTIONS,
    default: FASTENER_CHOICE_DEFAULTS.mode,
    help: "A bolt parallel to the spin axis is loaded in shear; one pointing at the axis, in tension.",
  },
  shearPlane: {
    label: "Shear plane",
    urlKey: "plane",
    options: SHEAR_PLANE_OPTIONS,
    default: FASTENER_CHOICE_DEFAULTS.shearPlane,
    help: "Read in shear only. Through the thread is the safe choice unless the plain shank surely spans the joint face.",
  },
});

export const form = /* @__PURE__ */ defineForm({
  id: "fasteners",
  title: "Fasteners",
  chapter: "fasteners",
  anchor: "fastener-calculator",
  order: 60,
  list: { max: 24, entryName: "Fasteners" },
  inputs: fastenerCheckInputs,
  choices: fastenerChoices,
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = fastenerCheck;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: "force" | "angularSpeed" | "stress") => formatQuantity(v, kind, { system }).text;
    return [
      {
        title: "Fasteners",
        status: r.verdict,
        rule: `Safety factor at least ${formatNumber(values.marginalBelow)} holds, below ${formatNumber(values.failBelow)} fails (${values.count} × ${r.size} class ${r.propertyClass} in ${r.mode}, ISO 898-1 minimum strengths)`,
        margin: `${q(r.part.force, "force")} pull at ${q(values.angularSpeed, "angularSpeed")}: ${q(r.stress, "stress")} per bolt, safety factor ${formatNumber(r.safetyFactor)} (${r.governs})`,
        figure: ratioFigure("Safety factor", r.safetyFactor),
        details: [
          figureOf("Speed at which the bolts yield", r.speedAtYield, "angularSpeed", system),
          figureOf("Load on each bolt", r.forcePerBolt, "force", system),
        ],
      },
    ];
  },
});
