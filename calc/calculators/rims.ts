/**
 * The rim and disk calculator (chapter "rims"): the hoop and radial stress in a spinning ring or
 * disk against its material, and the speeds at which it yields and bursts. A design lists several.
 */
import { figureOf, ratioFigure } from "../core/check.ts";
import { defineChoices } from "../core/choices.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatNumber, formatQuantity } from "../core/units.ts";
import { rimCheck } from "../loads/rims.ts";
import { RIM_CHOICE_DEFAULTS, RIM_SHAPE_OPTIONS, rimCheckInputs, STRENGTH_BASIS_OPTIONS } from "../loads/rim-inputs.ts";

/** The rim's category input, with its link key. */
export const rimChoices = defineChoices({
  shape: {
    label: "Shape",
    urlKey: "shape",
    options: RIM_SHAPE_OPTIONS,
    default: RIM_CHOICE_DEFAULTS.shape,
    help: "A ring is checked at its outer radius; a disk with a bore peaks at the bore.",
  },
  strengthBasis: {
    label: "Strengths are",
    urlKey: "basis",
    options: STRENGTH_BASIS_OPTIONS,
    default: RIM_CHOICE_DEFAULTS.strengthBasis,
    help: "A standard's minimums (design on these) or typical values (not for design).",
  },
});

export const form = /* @__PURE__ */ defineForm({
  id: "rims",
  title: "Rims and disks",
  chapter: "rims",
  anchor: "rim-calculator",
  order: 70,
  list: { max: 24, entryName: "Rim" },
  inputs: rimCheckInputs,
  choices: rimChoices,
  // The page's material menu ("mat") fills the material fields; the design keeps the values.
  pageKeys: ["mat"],
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = rimCheck;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: "angularSpeed" | "stress" | "speed") => formatQuantity(v, kind, { system }).text;
    return [
      {
        title: "Rim",
        status: r.verdict,
        rule: `Safety factor against yield at least ${formatNumber(values.marginalBelow)} holds, below ${formatNumber(values.failBelow)} fails; on ${r.strengthBasis === "minimum" ? "specified minimum strengths" : "typical strengths, which a part may fall short of"}`,
        margin: `Peak stress ${q(r.peakStress, "stress")} at ${q(values.angularSpeed, "angularSpeed")} (tip speed ${q(r.tipSpeed, "speed")}); yields at ${q(r.speedAtYield, "angularSpeed")}, bursts near ${q(r.speedAtUltimate, "angularSpeed")}`,
        figure: ratioFigure("Safety factor against yield", r.safetyFactorYield),
        details: [figureOf("Estimated burst speed", r.speedAtUltimate, "angularSpeed", system), figureOf("Tip speed", r.tipSpeed, "speed", system)],
      },
    ];
  },
});
