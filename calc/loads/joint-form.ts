/**
 * The fastener calculator's form (calc/calculators/fasteners.ts adds the check and its cards): its
 * inputs, menus, link keys and words, in a module of their own so that the calculator's page can draw
 * the form without loading the joint check (calc/loads/joint.ts), which it loads on first use.
 *
 * Link keys: the earlier average-shear check's keys still open (m, r, rpm, n, size, cls, mode, fail,
 * thin keep their meaning); its shear ratio (sr) and shear plane (plane) are read as page keys and no
 * longer change the result.
 */
import { defineChoices } from "../core/choices.ts";
import { defineForm } from "../core/calculator.ts";
import { FASTENER_GRADE_OPTIONS, FASTENER_SIZE_OPTIONS } from "./fastener-options.ts";
import {
  BOLTED_JOINT_CHOICE_DEFAULTS,
  boltedJointInputs,
  JOINT_MODE_OPTIONS,
  LOAD_SOURCE_OPTIONS,
  MEMBER_MATERIAL_OPTIONS,
  PRELOAD_SOURCE_OPTIONS,
  THREAD_IN_OPTIONS,
  type BoltedJointCheck,
  type JointModeName,
} from "./joint-inputs.ts";

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
    options: LOAD_SOURCE_OPTIONS,
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
    options: FASTENER_GRADE_OPTIONS,
    default: BOLTED_JOINT_CHOICE_DEFAULTS.grade,
    help: "The mark on the head. Strengths are the standard's specified minimums: ISO 898-1 for metric classes, SAE J429 or ASTM A574 for inch.",
  },
  jointMode: {
    label: "Loading",
    urlKey: "mode",
    options: JOINT_MODE_OPTIONS,
    default: BOLTED_JOINT_CHOICE_DEFAULTS.jointMode,
    help: "A bolt parallel to the spin axis is loaded in shear; one pointing at the axis, in tension.",
  },
  preloadFrom: {
    label: "Preload from",
    urlKey: "pf",
    options: PRELOAD_SOURCE_OPTIONS,
    default: BOLTED_JOINT_CHOICE_DEFAULTS.preloadFrom,
    help: "The clamp force in the bolt: a share of its proof load, or from the torque by T = K·F·d (Shigley).",
  },
  threadIn: {
    label: "Threads into",
    urlKey: "into",
    options: THREAD_IN_OPTIONS,
    default: BOLTED_JOINT_CHOICE_DEFAULTS.threadIn,
    help: "A nut of the matching grade, or a thread tapped into a part of this material (checked for stripping).",
  },
  endCondition: {
    label: "Bolt over the stack",
    urlKey: "end",
    options: [
      { value: "cantilever", label: "Head free to tilt" },
      { value: "guided", label: "Both ends held square" },
    ],
    default: BOLTED_JOINT_CHOICE_DEFAULTS.endCondition,
    help: "How the slipped bolt bends over the stack (Roark): free to tilt, M = F·h, the safe choice; held square at both ends, M = F·h/2.",
  },
  memberMaterial: {
    label: "Clamped parts",
    urlKey: "mat",
    options: MEMBER_MATERIAL_OPTIONS,
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

/** The grade in words: "class 8.8", "SAE J429 grade 5". */
export function gradeWords(grade: string): string {
  return /^\d/.test(grade) ? `class ${grade}` : (FASTENER_GRADE_OPTIONS.find((o) => o.value === grade)?.label ?? grade);
}

/** The basis of the bolt's strengths in words: "ISO 898-1 specified minimum". */
export function strengthBasisWords(r: BoltedJointCheck): string {
  const standard = r.strengths.standard === "iso-898-1" ? "ISO 898-1" : r.strengths.standard === "sae-j429" ? "SAE J429" : "ASTM A574";
  return `${standard} ${r.strengths.basis}`;
}
