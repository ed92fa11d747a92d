/**
 * The fastener calculator (chapter "fasteners"): whether a bolted joint holding a spinning part (or
 * carrying a known load) survives, by the joint check of calc/loads/joint.ts: the clamp from the
 * preload, friction, the slipped bolt's shear and bending over a stack, the bolt in tension, the
 * thread tapped into the part. A design lists several joints.
 *
 * Link keys: the earlier average-shear check's keys still open (m, r, rpm, n, size, cls, mode, fail,
 * thin keep their meaning); its shear ratio (sr) and shear plane (plane) are read as page keys and no
 * longer change the result.
 */
import { ratioFigure, figureOf, type CheckFigure } from "../core/check.ts";
import { defineChoices } from "../core/choices.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatNumber, formatQuantity } from "../core/units.ts";
import { INCH_GRADE_OPTIONS, FASTENER_SIZE_OPTIONS } from "../loads/inch-fasteners.ts";
import { PROPERTY_CLASS_OPTIONS } from "../loads/fasteners.ts";
import { BOLTED_JOINT_CHOICE_DEFAULTS, boltedJointInputs, type JointModeName } from "../loads/joint-inputs.ts";
import { boltedJointCheck } from "../loads/joint.ts";
import { MATERIAL_IDS, MATERIAL_DENSITIES } from "../materials/densities.ts";

/** Menu names of the inch grades, short enough for a phone; the standards' full names are in the chapter. */
const INCH_GRADE_MENU: Record<(typeof INCH_GRADE_OPTIONS)[number]["value"], string> = {
  "sae-2": "SAE J429 grade 2",
  "sae-5": "SAE J429 grade 5",
  "sae-8": "SAE J429 grade 8",
  a574: "ASTM A574 socket head",
};

/** The words for each mode the check can name as governing. */
export const JOINT_MODE_WORDS: Readonly<Record<JointModeName, string>> = {
  friction: "friction (the clamp)",
  shear: "bolt shear",
  bending: "bolt bending over the stack",
  tension: "bolt tension",
  stripping: "thread stripping in the part",
};

/** The category inputs of the fastener check, with their link keys. */
export const fastenerChoices = defineChoices({
  loadFrom: {
    label: "Load",
    urlKey: "load",
    options: [
      { value: "spin", label: "A spinning part" },
      { value: "force", label: "A known force" },
    ],
    default: BOLTED_JOINT_CHOICE_DEFAULTS.loadFrom,
    help: "The pull of a part held at a radius at top speed (F = mω²r), or a force you know.",
  },
  size: {
    label: "Thread size",
    urlKey: "size",
    options: FASTENER_SIZE_OPTIONS,
    default: BOLTED_JOINT_CHOICE_DEFAULTS.size,
    help: "ISO metric coarse (nominal diameter × pitch, mm) or Unified inch (number or inch size − threads per inch).",
  },
  grade: {
    label: "Class or grade",
    urlKey: "cls",
    options: [...PROPERTY_CLASS_OPTIONS, ...INCH_GRADE_OPTIONS.map((o) => ({ value: o.value, label: INCH_GRADE_MENU[o.value] }))],
    default: BOLTED_JOINT_CHOICE_DEFAULTS.grade,
    help: "The mark on the head. Strengths are the standard's specified minimums: ISO 898-1 for metric classes, SAE J429 or ASTM A574 for inch.",
  },
  jointMode: {
    label: "Loading",
    urlKey: "mode",
    options: [
      { value: "shear", label: "Shear: the load runs across the bolts" },
      { value: "tension", label: "Tension: the load pulls along the bolts" },
    ],
    default: BOLTED_JOINT_CHOICE_DEFAULTS.jointMode,
    help: "A bolt parallel to the spin axis is loaded in shear; one pointing at the axis, in tension.",
  },
  preloadFrom: {
    label: "Preload from",
    urlKey: "pf",
    options: [
      { value: "share", label: "A share of proof load" },
      { value: "torque", label: "Tightening torque" },
    ],
    default: BOLTED_JOINT_CHOICE_DEFAULTS.preloadFrom,
    help: "The clamp force in the bolt: a share of its proof load, or from the torque by T = K·F·d (Shigley).",
  },
  threadIn: {
    label: "Threads into",
    urlKey: "into",
    options: [{ value: "nut", label: "A nut" }, ...MATERIAL_IDS.map((id) => ({ value: id, label: `Tapped ${MATERIAL_DENSITIES[id].menuName}` }))],
    default: BOLTED_JOINT_CHOICE_DEFAULTS.threadIn,
    help: "A nut of the matching grade, or a thread tapped into the part (checked for stripping).",
  },
  endCondition: {
    label: "Bolt over the stack",
    urlKey: "end",
    options: [
      { value: "cantilever", label: "Head free to tilt (M = F·h)" },
      { value: "guided", label: "Both ends held square (M = F·h/2)" },
    ],
    default: BOLTED_JOINT_CHOICE_DEFAULTS.endCondition,
    help: "How the slipped bolt bends over the stack (Roark). Free to tilt is the safe choice.",
  },
  memberMaterial: {
    label: "Clamped parts",
    urlKey: "mat",
    options: MATERIAL_IDS.map((id) => ({ value: id, label: MATERIAL_DENSITIES[id].menuName })),
    default: BOLTED_JOINT_CHOICE_DEFAULTS.memberMaterial,
    help: "Material of the parts the bolt clamps, for the joint's stiffness (read in tension).",
  },
});

type Choice = "spin" | "force" | "share" | "torque";

/** Which number inputs the joint check reads for the current choices (links leave out the others). */
export function fastenerInputApplies(input: string, values: Partial<Record<string, unknown>>): boolean {
  const loadFrom = (values.loadFrom ?? BOLTED_JOINT_CHOICE_DEFAULTS.loadFrom) as Choice;
  const preloadFrom = (values.preloadFrom ?? BOLTED_JOINT_CHOICE_DEFAULTS.preloadFrom) as Choice;
  const jointMode = values.jointMode ?? BOLTED_JOINT_CHOICE_DEFAULTS.jointMode;
  const threadIn = values.threadIn ?? BOLTED_JOINT_CHOICE_DEFAULTS.threadIn;
  switch (input) {
    case "partMass":
    case "radius":
    case "angularSpeed":
      return loadFrom === "spin";
    case "load":
      return loadFrom === "force";
    case "preloadShare":
      return preloadFrom === "share";
    case "tighteningTorque":
      return preloadFrom === "torque";
    case "engagedLength":
      return threadIn !== "nut";
    case "stackHeight":
    case "frictionCoefficient":
    case "interfaces":
      return jointMode === "shear";
    default:
      return true;
  }
}

/** Link keys of the earlier average-shear check that the page still accepts (and says it no longer reads). */
export const RETIRED_LINK_KEYS = ["sr", "plane"] as const;

export const form = /* @__PURE__ */ defineForm({
  id: "fasteners",
  title: "Fasteners",
  chapter: "fasteners",
  anchor: "fastener-calculator",
  order: 60,
  list: { max: 24, entryName: "Fasteners" },
  inputs: boltedJointInputs,
  choices: fastenerChoices,
  pageKeys: RETIRED_LINK_KEYS,
  applies: fastenerInputApplies,
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = boltedJointCheck;

/** The grade in words: "class 8.8", "SAE J429 grade 5". */
export function gradeWords(grade: string): string {
  return grade in INCH_GRADE_MENU ? INCH_GRADE_MENU[grade as keyof typeof INCH_GRADE_MENU] : `class ${grade}`;
}

/** The basis of the bolt's strengths in words: "ISO 898-1 specified minimum". */
export function strengthBasisWords(r: ReturnType<typeof boltedJointCheck>): string {
  const standard = r.strengths.standard === "iso-898-1" ? "ISO 898-1" : r.strengths.standard === "sae-j429" ? "SAE J429" : "ASTM A574";
  return `${standard} ${r.strengths.basis}`;
}

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
