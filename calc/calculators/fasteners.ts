/**
 * The fastener calculator (chapter "fasteners"): whether a bolted joint holding a spinning part (or
 * carrying a known load) survives, by the joint check of calc/loads/joint.ts: the clamp from the
 * preload, friction, the slipped bolt's shear and bending over a stack, the bolt in tension, the
 * thread tapped into the part. A design lists several joints. The form (inputs, menus, link keys)
 * is declared in calc/loads/joint-form.ts.
 *
 * Link keys: the earlier average-shear check's keys still open (m, r, rpm, n, size, cls, mode, fail,
 * thin keep their meaning); its shear ratio (sr) and shear plane (plane) are read as page keys and no
 * longer change the result.
 */
import { ratioFigure, figureOf, type CheckFigure } from "../core/check.ts";
import { defineCalculator } from "../core/calculator.ts";
import { formatNumber, formatQuantity } from "../core/units.ts";
import type { JointModeName } from "../loads/joint-inputs.ts";
import { boltedJointCheck } from "../loads/joint.ts";
import { form, gradeWords, JOINT_MODE_WORDS, strengthBasisWords } from "../loads/joint-form.ts";

export { fastenerChoices, fastenerInputApplies, form, gradeWords, JOINT_MODE_WORDS, RETIRED_LINK_KEYS, strengthBasisWords } from "../loads/joint-form.ts";

/**
 * What the calculator computes; the cards below speak for the build sheet and the command line. Its
 * page loads this code only once the inputs leave the defaults (the defaults' result is computed at
 * build time), so the page itself carries the form and not the check.
 */
export const run = boltedJointCheck;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: "force" | "angularSpeed" | "stress") => formatQuantity(v, kind, { system }).text;
    const factors: CheckFigure[] = (Object.keys(JOINT_MODE_WORDS) as JointModeName[])
      .filter((mode) => r.safetyFactors[mode] !== null)
      .map((mode) => ratioFigure(`Safety factor, ${JOINT_MODE_WORDS[mode]}`, r.safetyFactors[mode]!));
    const load = r.part ? `${q(r.totalLoad, "force")} pull at ${q(values.angularSpeed, "angularSpeed")}` : `${q(r.totalLoad, "force")} load`;
    const part = r.tappedThread ? `; part thread ${r.tappedThread.materialBasis} values` : "";
    return [
      {
        title: "Fasteners",
        status: r.verdict,
        rule: `Safety factor at least ${formatNumber(values.marginalBelow)} holds, below ${formatNumber(values.failBelow)} fails (${values.count} × ${r.thread.label} ${gradeWords(r.grade)} in ${r.jointMode}, ${strengthBasisWords(r)} strengths${part})`,
        margin: `${load}, preload ${q(r.preload.force, "force")} per bolt: ${JOINT_MODE_WORDS[r.governs]} governs, safety factor ${formatNumber(r.safetyFactor)}. ${r.reason}`,
        figure: ratioFigure("Safety factor", r.safetyFactor),
        details: [...factors, figureOf("Preload per bolt", r.preload.force, "force", system), figureOf("Load on each bolt", r.loadPerBolt, "force", system)],
      },
    ];
  },
});
