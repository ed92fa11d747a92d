import { defineInputs } from "../core/inputs.ts";
import { SPINNING_PART_INPUTS } from "./spinning-part.ts";
import type { ChoiceOption, LoadVerdict } from "./common.ts";
import { safetyThresholdInputs } from "./threshold-inputs.ts";
import { MATERIAL_DENSITIES, MATERIAL_IDS, type MaterialId } from "../materials/densities.ts";
import type { PartLoad } from "../rotation/rotation.ts";
import type { FastenerGrade, FastenerGradeId, FastenerSizeId, FastenerThread } from "./inch-fasteners.ts";
import { DEFAULT_FRICTION_COEFFICIENT, DEFAULT_NUT_FACTOR, RECOMMENDED_PRELOAD_SHARE } from "./joint-data.ts";
import type { TensionJointFactors, TensionJointLoads } from "./joint-stiffness.ts";
import type { EndCondition } from "./slip.ts";
import type { TappedThreadStrength } from "./tapped-thread.ts";

// The joint check.

/** How the load meets the joint. */
export const JOINT_MODE_OPTIONS = [
  { value: "shear", label: "Shear: the load runs across the bolts (friction first, then the bolt)" },
  { value: "tension", label: "Tension: the load pulls the joint apart along the bolts" },
] as const satisfies readonly ChoiceOption[];

export type JointMode = (typeof JOINT_MODE_OPTIONS)[number]["value"];

/** Where the preload comes from. */
export const PRELOAD_SOURCE_OPTIONS = [
  { value: "share", label: "A share of the proof load" },
  { value: "torque", label: "The tightening torque (T = K·F·d)" },
] as const satisfies readonly ChoiceOption[];

export type PreloadSource = (typeof PRELOAD_SOURCE_OPTIONS)[number]["value"];

/** Where the load comes from. */
export const LOAD_SOURCE_OPTIONS = [
  { value: "spin", label: "A spinning part: its mass, radius and speed" },
  { value: "force", label: "A known force" },
] as const satisfies readonly ChoiceOption[];

export type LoadSource = (typeof LOAD_SOURCE_OPTIONS)[number]["value"];

/** What the bolt threads into: a nut, or a thread tapped into a part of one of the table's materials (labelled by its menu name). */
export const THREAD_IN_OPTIONS: readonly ChoiceOption<"nut" | MaterialId>[] = [
  { value: "nut", label: "A nut" },
  ...MATERIAL_IDS.map((id) => ({ value: id, label: MATERIAL_DENSITIES[id].menuName })),
];

/** Materials of the clamped parts, for their stiffness: the rows of the materials table. */
export const MEMBER_MATERIAL_OPTIONS: readonly ChoiceOption<MaterialId>[] = MATERIAL_IDS.map((id) => ({
  value: id,
  label: MATERIAL_DENSITIES[id].menuName,
}));

/** Choice defaults of the joint check (the numeric defaults are in `boltedJointInputs`). */
export const BOLTED_JOINT_CHOICE_DEFAULTS = {
  size: "M4",
  grade: "8.8",
  jointMode: "shear",
  endCondition: "cantilever",
  preloadFrom: "share",
  loadFrom: "spin",
  threadIn: "al-6061-t6",
  memberMaterial: "al-6061-t6",
} as const satisfies {
  size: FastenerSizeId;
  grade: FastenerGradeId;
  jointMode: JointMode;
  endCondition: EndCondition;
  preloadFrom: PreloadSource;
  loadFrom: LoadSource;
  threadIn: "nut" | MaterialId;
  memberMaterial: MaterialId;
};

/**
 * Numeric inputs of the joint check, in SI. Choices: `FASTENER_SIZE_OPTIONS` (size),
 * `FASTENER_GRADE_OPTIONS` (grade, of the size's system), `JOINT_MODE_OPTIONS`, `END_CONDITION_OPTIONS`,
 * `PRELOAD_SOURCE_OPTIONS`, `LOAD_SOURCE_OPTIONS`, `THREAD_IN_OPTIONS`, `MEMBER_MATERIAL_OPTIONS`.
 */
export const boltedJointInputs = defineInputs({
  partMass: {
    label: "Part mass",
    kind: "mass",
    min: 1e-4,
    max: 20,
    default: 0.04,
    urlKey: "m",
    help: "Everything the bolts hold against the spin (read when the load comes from a spinning part).",
  },
  radius: SPINNING_PART_INPUTS.radius,
  angularSpeed: SPINNING_PART_INPUTS.angularSpeed,
  load: {
    label: "Load on the joint",
    kind: "force",
    min: 0.001,
    max: 1e6,
    default: 100,
    urlKey: "F",
    help: "The total load all the bolts share (read when the load is a known force).",
  },
  count: {
    label: "Number of bolts",
    kind: "count",
    min: 1,
    max: 64,
    default: 1,
    integer: true,
    urlKey: "n",
    help: "Bolts sharing the load, assumed to share it equally.",
  },
  stackHeight: {
    label: "Stack height",
    kind: "length",
    min: 0,
    max: 0.1,
    default: 0.005,
    urlKey: "h",
    help: "Height of the washers, spacer or part between the face the bolt is held in and where the sideways load acts; 0 when the load acts right at that face.",
  },
  gripLength: {
    label: "Clamped thickness",
    kind: "length",
    min: 0.0005,
    max: 0.2,
    default: 0.005,
    urlKey: "grip",
    help: "Thickness of everything the bolt clamps; for a tapped hole, of the parts above the threaded one.",
  },
  shankLength: {
    label: "Plain shank in the grip",
    kind: "length",
    min: 0,
    max: 0.2,
    default: 0,
    urlKey: "shank",
    help: "Length of unthreaded shank inside the clamped thickness; 0 for a fully threaded screw.",
  },
  preloadShare: {
    label: "Preload share of proof load",
    kind: "fraction",
    min: 0,
    max: 1,
    default: RECOMMENDED_PRELOAD_SHARE.reusable,
    urlKey: "pre",
    help: "Preload as a share of the bolt's proof load: 0.75 is the usual figure for a joint taken apart again, 0 an untightened bolt (read when the preload is a share).",
  },
  tighteningTorque: {
    label: "Tightening torque",
    kind: "torque",
    min: 0,
    max: 1000,
    default: 3,
    urlKey: "T",
    help: "The torque the bolt is tightened to (read when the preload comes from the torque).",
  },
  nutFactor: {
    label: "Nut factor K",
    kind: "fraction",
    min: 0.05,
    max: 0.5,
    default: DEFAULT_NUT_FACTOR,
    unit: { metric: "frac", us: "frac" },
    urlKey: "K",
    help: "0.2 for plain or zinc-plated steel, about 0.18 oiled, 0.12 with an anti-seize compound; the same torque gives about ±25 % preload.",
  },
  frictionCoefficient: {
    label: "Friction coefficient",
    kind: "fraction",
    min: 0.05,
    max: 1,
    default: DEFAULT_FRICTION_COEFFICIENT,
    unit: { metric: "frac", us: "frac" },
    urlKey: "mu",
    help: "Slip coefficient of the clamped faces: 0.2 for faces as rolled or machined, up to 0.5 for grit-blasted steel. Approximate.",
  },
  interfaces: {
    label: "Slip faces",
    kind: "count",
    min: 1,
    max: 8,
    default: 1,
    integer: true,
    urlKey: "nf",
    help: "Clamped faces the sideways load must slide across (1 for one part on a plate).",
  },
  engagedLength: {
    label: "Thread engagement",
    kind: "length",
    min: 0.0005,
    max: 0.1,
    default: 0.008,
    urlKey: "le",
    help: "Length of full thread engaged in the tapped hole (read when the bolt threads into a part).",
  },
  ...safetyThresholdInputs("joint"),
});

export type BoltedJointInput = { [K in keyof typeof boltedJointInputs]: number } & {
  /** A value of `FASTENER_SIZE_OPTIONS`. */
  size: string;
  /** A value of `FASTENER_GRADE_OPTIONS` of the size's system. */
  grade: string;
  /** A value of `JOINT_MODE_OPTIONS`. */
  jointMode: string;
  /** A value of `END_CONDITION_OPTIONS` (read in shear). */
  endCondition: string;
  /** A value of `PRELOAD_SOURCE_OPTIONS`. */
  preloadFrom: string;
  /** A value of `LOAD_SOURCE_OPTIONS`. */
  loadFrom: string;
  /** A value of `THREAD_IN_OPTIONS`. */
  threadIn: string;
  /** A value of `MEMBER_MATERIAL_OPTIONS`. */
  memberMaterial: string;
};

/** The modes the check can name as governing. */
export type JointModeName = "friction" | "shear" | "bending" | "tension" | "stripping";

export interface BoltedJointCheck {
  size: FastenerSizeId;
  grade: FastenerGradeId;
  jointMode: JointMode;
  endCondition: EndCondition;
  preloadFrom: PreloadSource;
  loadFrom: LoadSource;
  threadIn: "nut" | MaterialId;
  memberMaterial: MaterialId;
  /** The thread's data (diameters, areas, fit limits). */
  thread: FastenerThread;
  /** The grade's strengths, their basis and its standard. */
  strengths: FastenerGrade;
  /** False when the size lies outside the sizes the grade's standard covers. */
  gradeWithinScope: boolean;
  /** The assumption made when outside the standard's scope, else "". */
  gradeScopeNote: string;
  /** g and pull of the spinning part; null when the load is a given force. */
  part: PartLoad | null;
  /** F, total load on the joint [N]. */
  totalLoad: number;
  /** F/n, load per bolt [N]. */
  loadPerBolt: number;
  preload: {
    /** F_i per bolt [N]. */
    force: number;
    /** F_p = A_s S_p [N]. */
    proofLoad: number;
    /** F_i/F_p [-]. */
    shareOfProof: number;
    /** F_i/A_s [Pa]. */
    stress: number;
    /** T = K F_i d, the torque for that preload at the nut factor given [N·m]. */
    torque: number;
    /** F_p/F_i, how far the preload alone stands below proof; null without preload (or one too small for the ratio to be finite) [-]. */
    proofFactor: number | null;
  };
  stiffness: {
    /** l', the grip the stiffnesses use: clamped thickness, plus d/2 in a tapped hole [m]. */
    effectiveGrip: number;
    /** k_b [N/m]. */
    bolt: number;
    /** k_m [N/m]. */
    members: number;
    /** C [-]. */
    factor: number;
  };
  /** Shear mode only, else null. */
  slip: {
    /** μ F_i n_b n_s, the shear the clamp carries before slipping [N]. */
    clampCapacity: number;
    /** Clamp capacity over the load [-]. */
    factor: number;
    /** True when the load exceeds the clamp capacity. */
    slips: boolean;
    /** τ = (F/n)/A_s once slipped [Pa]. */
    shearStress: number;
    /** M on each bolt over the stack [N·m]. */
    bendingMoment: number;
    /** σ_b at the root [Pa]. */
    bendingStress: number;
    /** σ' = √(σ_b² + 3τ²) [Pa]. */
    equivalentStress: number;
    /** σ_i + σ_b: the root's outer fibre if the preload were still in the bolt [Pa]. */
    rootFibreWithPreload: number;
    /** True when that exceeds the yield strength: the bolt would yield locally and lose clamp. */
    rootYieldsWithPreload: boolean;
    /** Eurocode 3's packing factor β_p for a stack of this height (a cross-check, not used in the verdict) [-]. */
    eurocodePackingFactor: number;
  } | null;
  /** Tension mode only, else null. */
  tension: (TensionJointLoads & TensionJointFactors) | null;
  /** The thread tapped into the part; null for a nut. */
  tappedThread: (TappedThreadStrength & { material: MaterialId; materialBasis: "typical" | "minimum" }) | null;
  /** The safety factor of each mode; null where the mode does not apply (stripping in shear: null without preload). */
  safetyFactors: Record<JointModeName, number | null>;
  /** The mode that decides the verdict. */
  governs: JointModeName;
  /** Its safety factor [-]. */
  safetyFactor: number;
  verdict: LoadVerdict;
  /** One or two sentences on why. */
  reason: string;
}
