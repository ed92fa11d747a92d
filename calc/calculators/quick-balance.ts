/**
 * The quick balance check (chapter "quick-balance"): one part added to or moved within a robot
 * that was balanced, against a balance grade or a wobble force the builder accepts, and the
 * counterweight that cancels it.
 */
import { figureOf, ratioFigure } from "../core/check.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { defineChoices } from "../core/choices.ts";
import { formatQuantity } from "../core/units.ts";
import { BALANCE_GRADES } from "../mass/balance-grades.ts";
import { quickBalance } from "../mass/quick-balance.ts";
import { QUICK_BALANCE_MARGIN, quickBalanceInputs } from "../mass/quick-balance-inputs.ts";

/** How the limit is set, which grade, and whether the part is added or moved. */
export const quickBalanceChoices = /* @__PURE__ */ defineChoices({
  limit: {
    label: "Set the limit by",
    urlKey: "lim",
    options: [
      { value: "grade", label: "a balance grade" },
      { value: "force", label: "a wobble force" },
    ],
    default: "grade",
  },
  grade: {
    label: "Balance grade",
    urlKey: "G",
    options: BALANCE_GRADES.map((g) => ({ value: g.label.slice(2), label: g.label })),
    default: "100",
  },
  change: {
    label: "The part is",
    urlKey: "p",
    options: [
      { value: "added", label: "added" },
      { value: "moved", label: "moved" },
    ],
    default: "added",
  },
});

export const form = /* @__PURE__ */ defineForm({
  id: "quickBalance",
  title: "Quick balance check",
  chapter: "quick-balance",
  anchor: "balance-calculator",
  order: 51,
  inputs: quickBalanceInputs,
  choices: quickBalanceChoices,
  applies: (input, values) =>
    input === "wobbleForce"
      ? values.limit === "force"
      : input === "partRadius"
        ? values.change !== "moved"
        : input === "moveDistance"
          ? values.change === "moved"
          : true,
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = quickBalance;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: Parameters<typeof formatQuantity>[1]) => formatQuantity(v, kind, { system }).text;
    const limit = r.allowance.grade ? `${r.allowance.grade.label} (ISO 21940-11)` : `a wobble force of ${q(r.allowance.force, "force")}`;
    return [
      {
        title: "Quick balance check",
        status: r.status,
        rule: `The part alone within ${limit} at ${q(values.spinSpeed, "angularSpeed")}: U ≤ U_per = ${q(r.allowance.unbalance, "unbalance")}; marginal up to ${QUICK_BALANCE_MARGIN} × U_per`,
        margin: `The part ${values.change === "moved" ? "moved" : "added"} puts the centre of mass ${q(r.offset, "length")} off the axis (limit ${q(r.allowance.offset, "length")}): a ${q(r.counterweight, "mass")} counterweight at ${q(values.counterweightRadius, "length")}, opposite, cancels it`,
        figure: figureOf("Counterweight that cancels it", r.counterweight, "mass", system),
        details: [
          figureOf("Least counterweight within the limit", r.leastCounterweight, "mass", system),
          figureOf("Centre-of-mass offset", r.offset, "length", system),
          figureOf("Unbalance", r.unbalance, "unbalance", system),
          figureOf("Rotating force", r.force, "force", system),
          ratioFigure("Share of the limit", r.shareOfLimit),
        ],
      },
    ];
  },
});
