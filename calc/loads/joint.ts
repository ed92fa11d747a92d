/**
 * Bolted joints that hold: the clamp a tightened bolt puts on a joint and the friction it gives,
 * what the bolt sees once the joint slips (shear plus bending over a spacer or washer stack), how a
 * preloaded bolt shares an external tension with the parts it clamps (Shigley's joint-stiffness
 * treatment), and whether the thread tapped into the part strips. One entry, `boltedJointCheck`,
 * reports the safety factor of every mode, the one that governs, and a verdict. SI in and out:
 * kg, m, rad/s, N, N·m, Pa.
 *
 * The treatment of preload, stiffness and the tension factors follows Shigley's Mechanical
 * Engineering Design, 9th ed., chapter 8 (shigley-mechanical-design).
 */
import { STANDARD_GRAVITY } from "../constants.ts";
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../errors.ts";
import { defineInputs } from "../inputs.ts";
import { requireChoice, requireMarginalAtLeastFail, safetyThresholdInputs, type ChoiceOption, type LoadVerdict } from "../loads-common.ts";
import { MATERIAL_IDS, MATERIALS, type MaterialId } from "../materials.ts";
import type { PartLoad } from "../rotation.ts";
import type { SourceKey } from "../sources.ts";
import { formatNumber, rpmToRadPerSecond } from "../units.ts";
import {
  FASTENER_GRADE_OPTIONS,
  FASTENER_SIZE_OPTIONS,
  fastenerThread,
  gradeForSize,
  type FastenerGrade,
  type FastenerGradeId,
  type FastenerSizeId,
  type FastenerThread,
} from "./inch-fasteners.ts";

/** Throws a `CalcInputError` naming `param` when a result overflowed: the inputs were too extreme. */
function requireFiniteResult(param: string, input: number, result: number, unit: string): number {
  if (!Number.isFinite(result)) {
    throw new CalcInputError({ param, value: input, expected: "small enough that the result stays a finite number", unit });
  }
  return result;
}

// ---------------------------------------------------------------------------------------------
// Data: bolt modulus, preload shares, nut factors, slip factors, the tapped part's shear rule.

/** E of a steel bolt, 207 GPa (shigley-mechanical-design Table A-5 and Table 8-8: steel 207 GPa, 30 Mpsi) [Pa]. */
export const BOLT_STEEL_MODULUS = 207e9;

/**
 * Recommended preload as a share of the proof load F_p = A_t S_p (shigley-mechanical-design
 * Eq. 8-31): 0.75 for a connection taken apart and its fasteners reused, 0.90 for a permanent one.
 */
export const RECOMMENDED_PRELOAD_SHARE = { reusable: 0.75, permanent: 0.9 } as const;

/**
 * Nut (torque) factor K by thread condition (shigley-mechanical-design Table 8-15), the value
 * `T = K F_i d` uses. Shigley: K = 0.20 for thread and collar friction f = f_c = 0.15 "no matter what
 * size bolts are employed" (Eq. 8-26), his recommended value when the condition is not stated.
 * Spread: other sources give 0.295 for dry zinc plate where Shigley gives 0.20 (bickford-bolted-joints,
 * ch. 2, Table 1), so the same torque can give about ±25 % preload between joints; treat K as an input.
 */
export const NUT_FACTORS = [
  { condition: "Non-plated, black finish", nutFactor: 0.3 },
  { condition: "Zinc-plated", nutFactor: 0.2 },
  { condition: "Lubricated", nutFactor: 0.18 },
  { condition: "Cadmium-plated", nutFactor: 0.16 },
  { condition: "With an anti-seize compound", nutFactor: 0.12 },
] as const;

/** K = 0.2, Shigley's unlubricated steel value (shigley-mechanical-design Eq. 8-26, p. 463). */
export const DEFAULT_NUT_FACTOR = 0.2;

/**
 * Slip (friction) coefficients of faying surfaces, APPROXIMATE: EN 1090-2 Table 18 classes A–D
 * (en-1090-2) and the RCSC classes (rcsc-structural-joints). These are steel surfaces prepared for
 * structural friction joints; no such table covers anodised or bare machined aluminium, which is why
 * the check takes μ as an input and defaults to the lowest class (D, as rolled, 0.20).
 */
export const SLIP_FACTORS = [
  { surface: "EN 1090-2 class A: blasted with shot or grit, loose rust removed", frictionCoefficient: 0.5, source: "en-1090-2" },
  { surface: "EN 1090-2 class B: blasted, then spray-metallised or zinc-silicate coated", frictionCoefficient: 0.4, source: "en-1090-2" },
  { surface: "EN 1090-2 class C: wire-brushed or flame-cleaned, loose rust removed", frictionCoefficient: 0.3, source: "en-1090-2" },
  { surface: "EN 1090-2 class D: as rolled", frictionCoefficient: 0.2, source: "en-1090-2" },
  { surface: "RCSC (1988) class A: clean mill scale", frictionCoefficient: 0.33, source: "rcsc-structural-joints" },
  { surface: "RCSC (1988) class B: blast-cleaned", frictionCoefficient: 0.5, source: "rcsc-structural-joints" },
] as const satisfies readonly { surface: string; frictionCoefficient: number; source: SourceKey }[];

/** μ = 0.20, the lowest EN 1090-2 class (D, surfaces as rolled): the conservative default (en-1090-2). */
export const DEFAULT_FRICTION_COEFFICIENT = 0.2;

/**
 * Shear strength of the tapped part's material as a fraction of its ultimate tensile strength,
 * τ = 0.6 R_m: the fastener rule (ifi-shear-rule, "approximately 60 percent" for carbon steel) taken
 * over for the part. For 6061-T6 the Aluminum Association's typical values give 207/310 = 0.67
 * (aluminum-association-typical), so 0.6 is about 10 % on the safe side there; for plastics it is a
 * rough estimate only.
 */
export const MATERIAL_SHEAR_RATIO = 0.6;

// ---------------------------------------------------------------------------------------------
// Preload.

/**
 * Preload from tightening torque by the nut-factor relation (shigley-mechanical-design Eq. 8-27).
 *
 * Formula: $F_i = \dfrac{T}{K\,d}$
 *
 * @param torque T, tightening torque [N·m], 0 or more
 * @param nutFactor K [-], 0.01 to 1 (0.2 unlubricated steel; see `NUT_FACTORS`)
 * @param nominalDiameter d [m], greater than 0
 * @returns F_i [N]
 *
 * Assumptions: K lumps thread and under-head friction; its scatter (about ±25 % between sources and
 * finishes, bickford-bolted-joints) passes straight into the preload.
 *
 * @example
 * preloadFromTorque({ torque: 5.10996, nutFactor: 0.2, nominalDiameter: 0.004 }) // → 6387.45
 *
 * Sources: shigley-mechanical-design, bickford-bolted-joints.
 */
export function preloadFromTorque({ torque, nutFactor, nominalDiameter }: { torque: number; nutFactor: number; nominalDiameter: number }): number {
  requireNonNegative("torque", torque, "N·m");
  requireInRange("nutFactor", nutFactor, "", { min: 0.01, max: 1 });
  requirePositive("nominalDiameter", nominalDiameter, "m");
  return requireFiniteResult("torque", torque, torque / (nutFactor * nominalDiameter), "N·m"); // shigley-mechanical-design Eq. 8-27
}

/**
 * Tightening torque for a preload by the nut-factor relation (shigley-mechanical-design Eq. 8-27).
 *
 * Formula: $T = K\,F_i\,d$
 *
 * @param preload F_i [N], 0 or more
 * @param nutFactor K [-], 0.01 to 1
 * @param nominalDiameter d [m], greater than 0
 * @returns T [N·m]
 *
 * @example
 * tighteningTorque({ preload: 25000, nutFactor: 0.2, nominalDiameter: 0.75 }) // → 3750 (Shigley Ex. 8-3(b), lbf·in units)
 *
 * Sources: shigley-mechanical-design.
 */
export function tighteningTorque({ preload, nutFactor, nominalDiameter }: { preload: number; nutFactor: number; nominalDiameter: number }): number {
  requireNonNegative("preload", preload, "N");
  requireInRange("nutFactor", nutFactor, "", { min: 0.01, max: 1 });
  requirePositive("nominalDiameter", nominalDiameter, "m");
  return requireFiniteResult("preload", preload, nutFactor * preload * nominalDiameter, "N"); // shigley-mechanical-design Eq. 8-27
}

/**
 * Recommended preload: a share of the proof load (shigley-mechanical-design Eqs. 8-31, 8-32).
 *
 * Formula: $F_i = 0.75\,F_p$ (reused fasteners) or $0.90\,F_p$ (permanent), $F_p = A_t\,S_p$
 *
 * @param proofLoad F_p [N], greater than 0
 * @param use "reusable" or "permanent"
 * @returns F_i [N]
 *
 * @example
 * recommendedPreload({ proofLoad: 8516.6, use: "reusable" }) // → 6387.45 (M4 class 12.9)
 *
 * Sources: shigley-mechanical-design.
 */
export function recommendedPreload({ proofLoad, use }: { proofLoad: number; use: "reusable" | "permanent" }): number {
  requirePositive("proofLoad", proofLoad, "N");
  const share = RECOMMENDED_PRELOAD_SHARE[requireChoice("use", use, USE_OPTIONS)];
  return share * proofLoad; // shigley-mechanical-design Eq. 8-31
}

const USE_OPTIONS = [
  { value: "reusable", label: "Reused fasteners" },
  { value: "permanent", label: "Permanent connection" },
] as const satisfies readonly ChoiceOption[];

// ---------------------------------------------------------------------------------------------
// Joint stiffness and the share of an external tension.

/**
 * Axial stiffness of a bolt: its unthreaded shank and its threaded length in the grip act as two
 * springs in series (shigley-mechanical-design Eq. 8-17).
 *
 * Formula: $k_b = \dfrac{A_d\,A_t\,E}{A_d\,l_t + A_t\,l_d}$
 *
 * @param shankArea A_d, major-diameter area π d²/4 [m²], greater than 0
 * @param stressArea A_t, tensile stress area [m²], greater than 0
 * @param shankLength l_d, unthreaded length in the grip [m], 0 or more
 * @param threadLength l_t, threaded length in the grip [m], 0 or more; l_d + l_t greater than 0
 * @param youngsModulus E of the bolt [Pa], greater than 0
 * @returns k_b [N/m]
 *
 * @example
 * boltStiffness({ shankArea: 0.3068, stressArea: 0.226, shankLength: 0.75, threadLength: 0.75, youngsModulus: 30e6 }) // → 5.21e6 (Shigley Ex. 8-4, lbf/in)
 *
 * Sources: shigley-mechanical-design.
 */
export function boltStiffness({
  shankArea,
  stressArea,
  shankLength,
  threadLength,
  youngsModulus,
}: {
  shankArea: number;
  stressArea: number;
  shankLength: number;
  threadLength: number;
  youngsModulus: number;
}): number {
  requirePositive("shankArea", shankArea, "m²");
  requirePositive("stressArea", stressArea, "m²");
  requireNonNegative("shankLength", shankLength, "m");
  requireNonNegative("threadLength", threadLength, "m");
  requirePositive("youngsModulus", youngsModulus, "Pa");
  if (!(shankLength + threadLength > 0)) {
    throw new CalcInputError({ param: "threadLength", value: threadLength, expected: "greater than 0 m when the shank length is 0", unit: "m" });
  }
  // Written as E / (l_t/A_t + l_d/A_d), the same expression, so that no product overflows.
  const compliance = threadLength / stressArea + shankLength / shankArea; // shigley-mechanical-design Eq. 8-17
  return requireFiniteResult("youngsModulus", youngsModulus, youngsModulus / compliance, "Pa");
}

/**
 * Stiffness of the clamped members by the 30° frustum model, for members of one material, a washer
 * face of 1.5 d and a grip l (shigley-mechanical-design Eq. 8-22).
 *
 * Formula: $k_m = \dfrac{0.5774\,\pi E d}{2\ln\!\left(5\,\dfrac{0.5774\,l + 0.5\,d}{0.5774\,l + 2.5\,d}\right)}$
 *
 * @param youngsModulus E of the members [Pa], greater than 0
 * @param nominalDiameter d [m], greater than 0
 * @param gripLength l, the clamped thickness (for a cap screw in a tapped hole, the effective grip) [m], greater than 0
 * @returns k_m [N/m]
 *
 * Assumptions: both members of one material; the pressure cone of half-angle 30° fits inside the
 * members. Wileman's exponential fit (Shigley Eq. 8-23) gives values within a few per cent.
 *
 * @example
 * memberStiffness({ youngsModulus: 14e6, nominalDiameter: 0.625, gripLength: 1.5 }) // → 8.95e6 (Shigley Ex. 8-4, lbf/in)
 *
 * Sources: shigley-mechanical-design.
 */
export function memberStiffness({
  youngsModulus,
  nominalDiameter,
  gripLength,
}: {
  youngsModulus: number;
  nominalDiameter: number;
  gripLength: number;
}): number {
  requirePositive("youngsModulus", youngsModulus, "Pa");
  requirePositive("nominalDiameter", nominalDiameter, "m");
  requirePositive("gripLength", gripLength, "m");
  const a = 0.5774 * gripLength;
  // ln(5(a + 0.5d)/(a + 2.5d)) = ln(1 + 4a/(a + 2.5d)), written with log1p for a short grip.
  const logTerm = Math.log1p((4 * a) / (a + 2.5 * nominalDiameter)); // shigley-mechanical-design Eq. 8-22
  const stiffness = (0.5774 * Math.PI * youngsModulus * nominalDiameter) / (2 * logTerm); // shigley-mechanical-design Eq. 8-22
  return requireFiniteResult("gripLength", gripLength, stiffness, "m");
}

/**
 * Joint stiffness constant: the share of an external tension the bolt takes (shigley-mechanical-design).
 *
 * Formula: $C = \dfrac{k_b}{k_b + k_m}$
 *
 * @param boltStiffness k_b [N/m], greater than 0
 * @param memberStiffness k_m [N/m], greater than 0
 * @returns C [-], between 0 and 1
 *
 * @example
 * jointStiffnessFactor({ boltStiffness: 5.21e6, memberStiffness: 8.95e6 }) // → 0.368 (Shigley Ex. 8-4)
 *
 * Sources: shigley-mechanical-design.
 */
export function jointStiffnessFactor({ boltStiffness: kb, memberStiffness: km }: { boltStiffness: number; memberStiffness: number }): number {
  requirePositive("boltStiffness", kb, "N/m");
  requirePositive("memberStiffness", km, "N/m");
  return 1 / (1 + km / kb); // shigley-mechanical-design, C = k_b/(k_b + k_m), written so that no sum overflows
}

/** The loads in a preloaded joint under an external tension. */
export interface TensionJointLoads {
  /** F_b, tension in the bolt [N]. */
  boltLoad: number;
  /** F_m, compression left in the members (0 once separated) [N]. */
  memberLoad: number;
  /** P_0 = F_i/(1 − C), the external load at which the joint opens [N]. */
  separationLoad: number;
  /** True when P ≥ P_0: the members carry nothing and the bolt the whole load. */
  separated: boolean;
}

/**
 * Bolt and member loads of a preloaded joint under an external tension P per bolt
 * (shigley-mechanical-design p. 461; F_m written here as a compression, positive while clamped).
 *
 * Formula: $F_b = F_i + C\,P,\quad F_m = F_i - (1 - C)\,P,\quad P_0 = \dfrac{F_i}{1 - C}$; for $P \ge P_0$: $F_b = P,\ F_m = 0$
 *
 * @param preload F_i [N], 0 or more
 * @param stiffnessFactor C [-], greater than 0 and less than 1
 * @param externalLoad P, external tension per bolt [N], 0 or more
 * @returns F_b, F_m, P_0 [N] and whether the joint has separated
 *
 * @example
 * tensionJointLoads({ preload: 10330.5, stiffnessFactor: 0.453734, externalLoad: 2000 }) // → F_b = 11237.97, F_m = 9237.97, P_0 = 18911.1
 *
 * Sources: shigley-mechanical-design.
 */
export function tensionJointLoads({
  preload,
  stiffnessFactor,
  externalLoad,
}: {
  preload: number;
  stiffnessFactor: number;
  externalLoad: number;
}): TensionJointLoads {
  requireNonNegative("preload", preload, "N");
  requireInRange("stiffnessFactor", stiffnessFactor, "", { min: 0, max: 1, minOpen: true, maxOpen: true });
  requireNonNegative("externalLoad", externalLoad, "N");
  const separationLoad = requireFiniteResult("preload", preload, preload / (1 - stiffnessFactor), "N"); // shigley-mechanical-design Eq. 8-30 (P_0)
  if (externalLoad >= separationLoad) return { boltLoad: externalLoad, memberLoad: 0, separationLoad, separated: true };
  return {
    boltLoad: preload + stiffnessFactor * externalLoad, // shigley-mechanical-design, F_b = CP + F_i
    memberLoad: preload - (1 - stiffnessFactor) * externalLoad, // shigley-mechanical-design, F_m = (1 − C)P − F_i, sign turned
    separationLoad,
    separated: false,
  };
}

/** Shigley's three safety factors of a preloaded bolt under an external tension. */
export interface TensionJointFactors {
  /** n_p = F_p/F_b: proof load over bolt load, with the load on (Shigley's yielding factor, Eq. 8-28) [-]. */
  yieldFactor: number;
  /** n_L: how many times P can grow before the bolt reaches its proof load (Eq. 8-29), 0 if the preload alone reaches it [-]. */
  loadFactor: number;
  /** n_0 = P_0/P: how many times P can grow before the joint opens (Eq. 8-30) [-]. */
  separationFactor: number;
}

/**
 * Safety factors of a preloaded bolt in tension (shigley-mechanical-design Eqs. 8-28 to 8-30, 9th ed.;
 * some editions call the load factor n_p). The load factor is extended past separation: once the joint
 * opens the bolt takes the whole load, so the proof load is reached at P = F_p instead.
 *
 * Formula: $n_p = \dfrac{S_p A_t}{C P + F_i},\quad n_L = \dfrac{S_p A_t - F_i}{C P}\ \text{(while } S_p A_t \le P_0\text{, else } S_p A_t / P),\quad n_0 = \dfrac{F_i}{P(1 - C)}$
 *
 * @param preload F_i [N], 0 or more
 * @param stiffnessFactor C [-], greater than 0 and less than 1
 * @param externalLoad P per bolt [N], greater than 0
 * @param proofLoad F_p = S_p A_t [N], greater than 0
 * @returns n_p, n_L and n_0 [-]
 *
 * Assumptions: static load; the bolt is judged at its proof load as Shigley does. A bolt tightened
 * to 0.75 F_p starts with n_p = 1.33 at most, whatever the load: most of its strength is already used.
 *
 * @example
 * tensionJointFactors({ preload: 14400, stiffnessFactor: 0.368, externalLoad: 6000, proofLoad: 19210 }) // → n_p = 1.16, n_L = 2.18, n_0 = 3.80 (Shigley Ex. 8-4, lbf)
 *
 * Sources: shigley-mechanical-design.
 */
export function tensionJointFactors({
  preload,
  stiffnessFactor,
  externalLoad,
  proofLoad,
}: {
  preload: number;
  stiffnessFactor: number;
  externalLoad: number;
  proofLoad: number;
}): TensionJointFactors {
  requirePositive("externalLoad", externalLoad, "N");
  requirePositive("proofLoad", proofLoad, "N");
  const { boltLoad, separationLoad } = tensionJointLoads({ preload, stiffnessFactor, externalLoad });
  const yieldFactor = proofLoad / boltLoad; // shigley-mechanical-design Eq. 8-28
  let loadAtProof: number;
  if (preload >= proofLoad) loadAtProof = 0;
  else if (proofLoad <= separationLoad)
    loadAtProof = (proofLoad - preload) / stiffnessFactor; // shigley-mechanical-design Eq. 8-29
  else loadAtProof = proofLoad; // separated: the bolt alone carries P
  return {
    yieldFactor: requireFiniteResult("externalLoad", externalLoad, yieldFactor, "N"),
    loadFactor: requireFiniteResult("externalLoad", externalLoad, loadAtProof / externalLoad, "N"),
    separationFactor: requireFiniteResult("externalLoad", externalLoad, separationLoad / externalLoad, "N"), // shigley-mechanical-design Eq. 8-30
  };
}

// ---------------------------------------------------------------------------------------------
// Clamp and slip; the bolt once it slips.

/**
 * Shear a friction joint carries before it slips: friction on every faying surface under the clamp
 * of every bolt (en-1090-2 / en-1993-1-8 slip resistance without its partial factor; shigley-mechanical-design §8-12).
 *
 * Formula: $V_{slip} = \mu\,F_i\,n_b\,n_s$
 *
 * @param preload F_i per bolt [N], 0 or more
 * @param frictionCoefficient μ [-], greater than 0 and at most 1.5 (see `SLIP_FACTORS`; approximate)
 * @param boltCount n_b [-], a whole number, 1 or more
 * @param interfaces n_s, faying surfaces the load crosses [-], a whole number, 1 or more
 * @returns V_slip [N]
 *
 * Assumptions: the clamp stays at F_i (no external tension, no loss to embedding or loosening); μ
 * is a rough figure, and the preload behind it scatters with the nut factor.
 *
 * @example
 * slipResistance({ preload: 6387.45, frictionCoefficient: 0.2, boltCount: 4, interfaces: 1 }) // → 5109.96
 *
 * Sources: en-1090-2, en-1993-1-8, shigley-mechanical-design.
 */
export function slipResistance({
  preload,
  frictionCoefficient,
  boltCount,
  interfaces,
}: {
  preload: number;
  frictionCoefficient: number;
  boltCount: number;
  interfaces: number;
}): number {
  requireNonNegative("preload", preload, "N");
  requireInRange("frictionCoefficient", frictionCoefficient, "", { min: 0, max: 1.5, minOpen: true });
  requireWholeCount("boltCount", boltCount);
  requireWholeCount("interfaces", interfaces);
  return requireFiniteResult("preload", preload, frictionCoefficient * preload * boltCount * interfaces, "N"); // en-1090-2
}

function requireWholeCount(param: string, value: number): void {
  requireInRange(param, value, "", { min: 1, max: 1e6 });
  if (!Number.isInteger(value)) throw new CalcInputError({ param, value, expected: "a whole number", unit: "" });
}

/** How the bolt's ends are held once the stack it passes through has slipped sideways. */
export const END_CONDITION_OPTIONS = [
  { value: "cantilever", label: "Cantilever: the head is free to tilt, M = F·h (conservative)" },
  { value: "guided", label: "Guided: both ends held square, M = F·h/2" },
] as const satisfies readonly ChoiceOption[];

export type EndCondition = (typeof END_CONDITION_OPTIONS)[number]["value"];

/**
 * Bending moment in a bolt that carries a sideways load across a stack of height h once the joint
 * has slipped: a cantilever fixed where it enters the part (M = F h), or a beam held square at both
 * ends (M = F h/2) (roark-beams Table 8.1).
 *
 * Formula: $M = F\,h$ (cantilever), $M = F\,h/2$ (guided)
 *
 * @param force F, the sideways load on this bolt [N], 0 or more
 * @param height h, from the face the bolt is held in to where the load acts [m], 0 or more
 * @param endCondition a value of `END_CONDITION_OPTIONS`
 * @returns M [N·m]
 *
 * Assumptions: elastic beam, load at the top of the stack; the cantilever is the upper bound (head
 * free to tilt), the guided beam the lower (head and part both held square).
 *
 * @example
 * boltBendingMoment({ force: 146, height: 0.005, endCondition: "cantilever" }) // → 0.73
 *
 * Sources: roark-beams.
 */
export function boltBendingMoment({ force, height, endCondition }: { force: number; height: number; endCondition: string }): number {
  requireNonNegative("force", force, "N");
  requireNonNegative("height", height, "m");
  const condition = requireChoice("endCondition", endCondition, END_CONDITION_OPTIONS);
  const moment = condition === "cantilever" ? force * height : (force * height) / 2; // roark-beams Table 8.1
  return requireFiniteResult("force", force, moment, "N");
}

/**
 * Bending stress at the root of the thread: the bending formula on a solid circle of the root
 * (minor) diameter (roark-beams; shigley-mechanical-design §8-12).
 *
 * Formula: $\sigma_b = \dfrac{32\,M}{\pi\,d_r^3}$
 *
 * @param moment M [N·m], 0 or more
 * @param rootDiameter d_r [m], greater than 0 (d₃ metric, d_r inch; see `fastenerThread`)
 * @returns σ_b [Pa]
 *
 * @example
 * rootBendingStress({ moment: 0.73, rootDiameter: 3.1411915e-3 }) // → 239.9e6
 *
 * Sources: roark-beams, shigley-mechanical-design.
 */
export function rootBendingStress({ moment, rootDiameter }: { moment: number; rootDiameter: number }): number {
  requireNonNegative("moment", moment, "N·m");
  requirePositive("rootDiameter", rootDiameter, "m");
  const stress = (32 * moment) / (Math.PI * rootDiameter ** 3); // roark-beams, σ = M/Z with Z = πd³/32
  return requireFiniteResult("moment", moment, stress, "N·m");
}

/**
 * Von Mises equivalent stress of a normal stress and a shear stress on one plane (shigley-distortion-energy).
 *
 * Formula: $\sigma' = \sqrt{\sigma^2 + 3\tau^2}$
 *
 * @param normalStress σ [Pa], finite
 * @param shearStress τ [Pa], finite
 * @returns σ' [Pa]
 *
 * @example
 * vonMisesStress({ normalStress: 239.9e6, shearStress: 16.63e6 }) // → 241.6e6
 *
 * Sources: shigley-distortion-energy.
 */
export function vonMisesStress({ normalStress, shearStress }: { normalStress: number; shearStress: number }): number {
  requireFinite("normalStress", normalStress, "Pa");
  requireFinite("shearStress", shearStress, "Pa");
  const equivalent = Math.hypot(normalStress, Math.sqrt(3) * shearStress); // shigley-distortion-energy
  return requireFiniteResult("normalStress", normalStress, equivalent, "Pa");
}

/**
 * Eurocode 3's reduction of a bolt's shear resistance for packing thicker than d/3 under it, a
 * published cross-check of how much a stack weakens the bolt (en-1993-1-8 §3.6.1(12), clause number
 * from memory).
 *
 * Formula: $\beta_p = \dfrac{9\,d}{8\,d + 3\,t_p} \le 1$
 *
 * @param nominalDiameter d [m], greater than 0
 * @param packingThickness t_p [m], 0 or more
 * @returns β_p [-], 1 for packing up to d/3
 *
 * @example
 * eurocodePackingFactor({ nominalDiameter: 0.004, packingThickness: 0.005 }) // → 0.766
 *
 * Sources: en-1993-1-8.
 */
export function eurocodePackingFactor({ nominalDiameter, packingThickness }: { nominalDiameter: number; packingThickness: number }): number {
  requirePositive("nominalDiameter", nominalDiameter, "m");
  requireNonNegative("packingThickness", packingThickness, "m");
  const ratio = packingThickness / nominalDiameter;
  return Math.min(1, 9 / (8 + 3 * ratio)); // en-1993-1-8: β_p = 9d/(8d + 3t_p) ≤ 1
}

// ---------------------------------------------------------------------------------------------
// The thread in the part.

/**
 * Shear area of an internal thread, the area along which the part's thread strips off: geometric
 * minimum per FED-STD-H28 (fed-std-h28-2; machinerys-handbook, "length of engagement").
 *
 * Formula: $A_n = \pi\,n\,L_e\,D_{s,min}\left[\dfrac{1}{2n} + 0.577\,35\,(D_{s,min} - E_{n,max})\right],\quad n = 1/P$
 *
 * @param engagedLength L_e, length of full thread engaged [m], greater than 0
 * @param pitch P [m], greater than 0
 * @param externalMajorMin D_s,min, minimum major diameter of the screw [m], greater than 0
 * @param internalPitchMax E_n,max, maximum pitch diameter of the tapped hole [m], greater than 0 and less than D_s,min
 * @returns A_n [m²]
 *
 * Assumptions: the worst fit of the tolerance classes (largest hole, smallest screw). The standard
 * notes that the effective area is "somewhat less" than this geometric value.
 *
 * @example
 * internalThreadShearArea({ engagedLength: 0.0254, pitch: 0.00127, externalMajorMin: 0.2408 * 0.0254, internalPitchMax: 0.2224 * 0.0254 }) // → 0.539 in² (1/4-20 per inch)
 *
 * Sources: fed-std-h28-2, machinerys-handbook.
 */
export function internalThreadShearArea({
  engagedLength,
  pitch,
  externalMajorMin,
  internalPitchMax,
}: {
  engagedLength: number;
  pitch: number;
  externalMajorMin: number;
  internalPitchMax: number;
}): number {
  requirePositive("engagedLength", engagedLength, "m");
  requirePositive("pitch", pitch, "m");
  requirePositive("externalMajorMin", externalMajorMin, "m");
  requirePositive("internalPitchMax", internalPitchMax, "m");
  if (!(internalPitchMax < externalMajorMin)) {
    throw new CalcInputError({
      param: "internalPitchMax",
      value: internalPitchMax,
      expected: `less than the screw's minimum major diameter, ${externalMajorMin} m`,
      unit: "m",
    });
  }
  const n = 1 / pitch;
  const area = Math.PI * n * engagedLength * externalMajorMin * (1 / (2 * n) + 0.57735 * (externalMajorMin - internalPitchMax)); // fed-std-h28-2
  return requireFiniteResult("engagedLength", engagedLength, area, "m");
}

/**
 * Shear strength of a part's material from its ultimate tensile strength by the 0.6 rule
 * (ifi-shear-rule; checked against aluminum-association-typical for 6061-T6). See `MATERIAL_SHEAR_RATIO`.
 *
 * Formula: $\tau_u \approx 0.6\,R_m$
 *
 * @param ultimateStrength R_m [Pa], greater than 0
 * @returns τ_u [Pa]
 *
 * @example
 * materialShearStrength({ ultimateStrength: 310e6 }) // → 186e6 (6061-T6 typical; the typical shear is 207 MPa)
 *
 * Sources: ifi-shear-rule, aluminum-association-typical.
 */
export function materialShearStrength({ ultimateStrength }: { ultimateStrength: number }): number {
  requirePositive("ultimateStrength", ultimateStrength, "Pa");
  return MATERIAL_SHEAR_RATIO * ultimateStrength; // ifi-shear-rule
}

/** Stripping of a thread tapped into a part. */
export interface TappedThreadStrength {
  /** A_n at the given engagement [m²]. */
  shearArea: number;
  /** τ of the part's material, 0.6 R_m [Pa]. */
  shearStrength: number;
  /** F_strip = τ A_n, the load that strips the part's thread [N]. */
  strippingLoad: number;
  /** The bolt's minimum breaking load A_s R_m,min [N]. */
  boltBreakingLoad: number;
  /** L_e at which the part's thread is as strong as the bolt: F_strip = A_s R_m,min [m]. */
  engagementForFullStrength: number;
}

/**
 * Stripping load of a thread tapped into a part at a given engagement, and the engagement at which
 * it equals the bolt's breaking load (fed-std-h28-2, machinerys-handbook, ifi-shear-rule).
 *
 * Formula: $F_{strip} = 0.6\,R_{m,part}\,A_n(L_e),\qquad L_{e,full} = \dfrac{A_s\,R_{m,bolt}}{0.6\,R_{m,part}\,A_n/L_e}$
 *
 * @param thread from `fastenerThread` (pitch, D_s,min, E_n,max, A_s)
 * @param boltTensileStrength R_m,min of the bolt [Pa], greater than 0
 * @param partUltimateStrength R_m of the part's material [Pa], greater than 0
 * @param engagedLength L_e [m], greater than 0
 * @returns A_n, τ, F_strip, the bolt's breaking load and L_e,full
 *
 * Assumptions: the part's thread is the weaker (true for aluminium and plastics under a steel bolt);
 * full-form thread over L_e; the geometric shear area of the worst fit.
 *
 * @example
 * tappedThreadStrength({ thread: fastenerThread("M4"), boltTensileStrength: 1220e6, partUltimateStrength: 345e6, engagedLength: 0.008 }) // → F_strip = 12 865 N (τ = 207 MPa)
 *
 * Sources: fed-std-h28-2, machinerys-handbook, ifi-shear-rule.
 */
export function tappedThreadStrength({
  thread,
  boltTensileStrength,
  partUltimateStrength,
  engagedLength,
}: {
  thread: FastenerThread;
  boltTensileStrength: number;
  partUltimateStrength: number;
  engagedLength: number;
}): TappedThreadStrength {
  requirePositive("boltTensileStrength", boltTensileStrength, "Pa");
  const shearStrength = materialShearStrength({ ultimateStrength: partUltimateStrength });
  const geometry = { pitch: thread.pitch, externalMajorMin: thread.externalMajorMin, internalPitchMax: thread.internalPitchMax };
  const shearArea = internalThreadShearArea({ engagedLength, ...geometry });
  const areaPerLength = shearArea / engagedLength;
  const boltBreakingLoad = thread.stressArea * boltTensileStrength; // iso-898-1 Table 4 (A_s R_m,min)
  return {
    shearArea,
    shearStrength,
    strippingLoad: requireFiniteResult("engagedLength", engagedLength, shearStrength * shearArea, "m"), // fed-std-h28-2
    boltBreakingLoad,
    engagementForFullStrength: requireFiniteResult("boltTensileStrength", boltTensileStrength, boltBreakingLoad / (shearStrength * areaPerLength), "Pa"),
  };
}

// ---------------------------------------------------------------------------------------------
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

/** What the bolt threads into: a nut, or a thread tapped into a part of one of the table's materials. */
export const THREAD_IN_OPTIONS: readonly ChoiceOption<"nut" | MaterialId>[] = [
  { value: "nut", label: "A nut of the matching grade" },
  ...MATERIAL_IDS.map((id) => ({ value: id, label: `A tapped hole in ${MATERIALS[id].name}, ${MATERIALS[id].condition}` })),
];

/** Materials of the clamped parts, for their stiffness: the rows of the materials table. */
export const MEMBER_MATERIAL_OPTIONS: readonly ChoiceOption<MaterialId>[] = MATERIAL_IDS.map((id) => ({
  value: id,
  label: `${MATERIALS[id].name}, ${MATERIALS[id].condition}`,
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
  radius: {
    label: "Radius of the part",
    kind: "length",
    min: 0.001,
    max: 2,
    default: 0.07,
    urlKey: "r",
    help: "From the spin axis to the part's own centre of mass.",
  },
  angularSpeed: {
    label: "Speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(1),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The top speed the part will see.",
  },
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

/** SI symbol of each kind the joint inputs use, for error messages. */
const SI_SYMBOL: Record<string, string> = { mass: "kg", length: "m", angularSpeed: "rad/s", force: "N", torque: "N·m", fraction: "", count: "" };

function requireJointInput(name: keyof typeof boltedJointInputs, value: number): number {
  const spec = boltedJointInputs[name];
  const unit = SI_SYMBOL[spec.kind] ?? "";
  requireFinite(name, value, unit);
  const lowOk = "minOpen" in spec && spec.minOpen ? value > spec.min : value >= spec.min;
  const whole = !("integer" in spec && spec.integer) || Number.isInteger(value);
  if (!lowOk || !(value <= spec.max) || !whole) {
    const shown = (bound: number) => `${Number(bound.toPrecision(6))}${unit ? ` ${unit}` : ""}`;
    const expected = `${whole ? "" : "a whole number "}at least ${shown(spec.min)} and at most ${shown(spec.max)}`;
    throw new CalcInputError({ param: name, value, expected, unit });
  }
  return value;
}

/** a/b, or null when b is 0 or so small that the ratio is not a finite number (no preload to speak of). */
function ratioOrNull(a: number, b: number): number | null {
  const ratio = a / b;
  return b > 0 && Number.isFinite(ratio) ? ratio : null;
}

/** Verdict for a factor that may be 0 (safety-factor-practice). */
function verdictFor(factor: number, failBelow: number, marginalBelow: number): LoadVerdict {
  return factor < failBelow ? "fails" : factor < marginalBelow ? "marginal" : "holds"; // safety-factor-practice
}

const SEVERITY: Record<LoadVerdict, number> = { holds: 0, marginal: 1, fails: 2 };

const n3 = (value: number) => formatNumber(value, 3);
const mm = (metres: number) => `${formatNumber(metres * 1000, 3)} mm`;

/**
 * The bolted-joint check: preload from a share of proof load or from torque, the clamp and whether it
 * slips, the bolt's shear and bending over a stack once it slips, the load sharing of a preloaded
 * joint in tension, the stripping of a thread tapped into the part, each mode's safety factor, the
 * governing mode and a verdict (shigley-mechanical-design ch. 8, en-1090-2, roark-beams,
 * shigley-distortion-energy, fed-std-h28-2, safety-factor-practice).
 *
 * Formula: shear mode: $n_{slip} = \dfrac{\mu F_i n_b n_s}{F}$; slipped bolt $\tau = \dfrac{F}{n_b A_s}$,
 * $\sigma_b = \dfrac{32\,F h}{n_b\,\pi d_r^3}$ (cantilever; half for guided), $n_{bend} = \dfrac{R_{p0.2}}{\sqrt{\sigma_b^2 + 3\tau^2}}$,
 * $n_{shear} = \dfrac{\min(\tau_y, \tau_u)}{\tau}$; the joint's factor is $\max(n_{slip}, \min(n_{shear}, n_{bend}))$:
 * it fails only when the load beats the clamp and then the bolt. Tension mode: Shigley's $n_L$ and $n_0$
 * (see `tensionJointFactors`) and the same load factor for the tapped thread. In shear the tapped
 * thread carries only the preload: its factor $F_{strip}/F_i$ decides when its verdict is the worse.
 *
 * @param input the numeric fields of `boltedJointInputs` (SI) plus the choices size, grade, jointMode,
 * endCondition, preloadFrom, loadFrom, threadIn and memberMaterial
 * @returns preload, stiffness, slip or tension results, the tapped thread's strength, each mode's safety
 * factor, the governing mode, its factor and a verdict with a reason
 *
 * Assumptions:
 * - The bolts share the load equally; no prying. Static load at the given speed: impacts and fatigue
 *   are not checked, and a robot's hits are far larger than its spin load.
 * - Shear mode: the clamp holds while μ F_i n_b n_s exceeds the load. A slipped bolt carries the load in
 *   shear on A_s and in bending over the stack height at the root diameter, judged by von Mises against
 *   R_p0.2,min without the preload (as bearing-type joints are judged: shigley-mechanical-design §8-12,
 *   en-1993-1-8); the root fibre with the preload still in it is reported beside. When the clamp holds
 *   but the slipped bolt would fail (n below failBelow), the verdict is at best "marginal": the joint
 *   then holds only while the preload lasts.
 * - Tension mode: Shigley's stiffness model with a steel bolt (207 GPa), members of one material and a
 *   30° frustum; in a tapped hole the effective grip is the clamped thickness plus d/2 (Shigley Table 8-7
 *   for threads deeper than d). A joint that opens (n_0 < 1) is at best "marginal".
 * - Preload scatter from the nut factor is not applied; K's spread is about ±25 %.
 * - The tapped thread: FED-STD-H28 geometric shear area at the worst 6g/6H or 2A/2B fit, τ = 0.6 R_m of
 *   the part's table row (typical values for most rows: see `tappedThread.materialBasis`).
 *
 * @example
 * // The invented demo robot's seven washers (42 g at 55 mm, 2400 rpm) on one M4 8.8 into 6061-T6, 5 mm stack:
 * // slip factor 5.23 (friction governs, holds); slipped, the bolt bends: σ_b = 240 MPa, n_bend = 2.65.
 *
 * Sources: shigley-mechanical-design, en-1090-2, en-1993-1-8, roark-beams, shigley-distortion-energy,
 * fed-std-h28-2, ifi-shear-rule, iso-898-1, sae-j429, astm-a574, safety-factor-practice.
 */
export function boltedJointCheck(input: BoltedJointInput): BoltedJointCheck {
  if (input === null || typeof input !== "object") {
    throw new CalcInputError({ param: "input", value: input, expected: "an object with the joint's inputs", unit: "" });
  }
  const size = requireChoice("size", input.size, FASTENER_SIZE_OPTIONS);
  requireChoice("grade", input.grade, FASTENER_GRADE_OPTIONS);
  const jointMode = requireChoice("jointMode", input.jointMode, JOINT_MODE_OPTIONS);
  const endCondition = requireChoice("endCondition", input.endCondition, END_CONDITION_OPTIONS);
  const preloadFrom = requireChoice("preloadFrom", input.preloadFrom, PRELOAD_SOURCE_OPTIONS);
  const loadFrom = requireChoice("loadFrom", input.loadFrom, LOAD_SOURCE_OPTIONS);
  const threadIn = requireChoice("threadIn", input.threadIn, THREAD_IN_OPTIONS);
  const memberMaterial = requireChoice("memberMaterial", input.memberMaterial, MEMBER_MATERIAL_OPTIONS);
  const v = Object.fromEntries(
    (Object.keys(boltedJointInputs) as (keyof typeof boltedJointInputs)[]).map((name) => [name, requireJointInput(name, input[name])]),
  ) as { [K in keyof typeof boltedJointInputs]: number };
  requireMarginalAtLeastFail(v.failBelow, v.marginalBelow);
  if (!(v.shankLength <= v.gripLength)) {
    throw new CalcInputError({ param: "shankLength", value: v.shankLength, expected: `at most the clamped thickness, ${v.gripLength} m`, unit: "m" });
  }

  const thread = fastenerThread(size);
  const { grade: strengths, withinScope, scopeNote } = gradeForSize({ grade: input.grade, size });
  const d = thread.nominalDiameter;

  // Load: F = mω²r (newton-second-law), as loads-bolts.ts writes it out; or the given force.
  let part: PartLoad | null = null;
  let totalLoad = v.load;
  if (loadFrom === "spin") {
    const acceleration = v.angularSpeed * v.angularSpeed * v.radius; // newton-second-law
    part = { acceleration, gLoad: acceleration / STANDARD_GRAVITY, force: v.partMass * acceleration };
    totalLoad = part.force;
  }
  const loadPerBolt = totalLoad / v.count;

  // Preload (shigley-mechanical-design Eqs. 8-27, 8-31, 8-32).
  const proofLoad = thread.stressArea * strengths.proofStress; // shigley-mechanical-design Eq. 8-32
  const preloadForce =
    preloadFrom === "share" ? v.preloadShare * proofLoad : preloadFromTorque({ torque: v.tighteningTorque, nutFactor: v.nutFactor, nominalDiameter: d });
  const preload = {
    force: preloadForce,
    proofLoad,
    shareOfProof: preloadForce / proofLoad,
    stress: preloadForce / thread.stressArea,
    torque: tighteningTorque({ preload: preloadForce, nutFactor: v.nutFactor, nominalDiameter: d }),
    proofFactor: ratioOrNull(proofLoad, preloadForce),
  };

  // Stiffness (shigley-mechanical-design Eqs. 8-17, 8-22; Table 8-7 for the tapped hole's effective grip).
  const tapped = threadIn !== "nut";
  const effectiveGrip = v.gripLength + (tapped ? d / 2 : 0);
  const kb = boltStiffness({
    shankArea: (Math.PI / 4) * d * d,
    stressArea: thread.stressArea,
    shankLength: v.shankLength,
    threadLength: effectiveGrip - v.shankLength,
    youngsModulus: BOLT_STEEL_MODULUS,
  });
  const km = memberStiffness({ youngsModulus: MATERIALS[memberMaterial].youngsModulus, nominalDiameter: d, gripLength: effectiveGrip });
  const stiffness = { effectiveGrip, bolt: kb, members: km, factor: jointStiffnessFactor({ boltStiffness: kb, memberStiffness: km }) };

  // The tapped thread.
  let tappedThread: BoltedJointCheck["tappedThread"] = null;
  if (tapped) {
    const row = MATERIALS[threadIn];
    const strength = tappedThreadStrength({
      thread,
      boltTensileStrength: strengths.tensileStrength,
      partUltimateStrength: row.ultimateStrength,
      engagedLength: v.engagedLength,
    });
    tappedThread = { ...strength, material: threadIn, materialBasis: row.basis };
  }

  const safetyFactors: Record<JointModeName, number | null> = { friction: null, shear: null, bending: null, tension: null, stripping: null };
  let slip: BoltedJointCheck["slip"] = null;
  let tension: BoltedJointCheck["tension"] = null;
  let governs: JointModeName;
  let safetyFactor: number;
  let verdict: LoadVerdict;
  let reason: string;
  const strip = tappedThread;

  if (jointMode === "shear") {
    const clampCapacity = slipResistance({ preload: preloadForce, frictionCoefficient: v.frictionCoefficient, boltCount: v.count, interfaces: v.interfaces });
    const slipFactor = clampCapacity / totalLoad; // en-1090-2
    const shearStress = loadPerBolt / thread.stressArea; // iso-898-1: shear through the thread on A_s
    const bendingMoment = boltBendingMoment({ force: loadPerBolt, height: v.stackHeight, endCondition });
    const bendingStress = rootBendingStress({ moment: bendingMoment, rootDiameter: thread.rootDiameter });
    const equivalentStress = vonMisesStress({ normalStress: bendingStress, shearStress });
    const rootFibreWithPreload = preload.stress + bendingStress;
    slip = {
      clampCapacity,
      factor: slipFactor,
      slips: clampCapacity < totalLoad,
      shearStress,
      bendingMoment,
      bendingStress,
      equivalentStress,
      rootFibreWithPreload,
      rootYieldsWithPreload: rootFibreWithPreload > strengths.yieldStrength,
      eurocodePackingFactor: eurocodePackingFactor({ nominalDiameter: d, packingThickness: v.stackHeight }),
    };
    safetyFactors.friction = slipFactor;
    safetyFactors.shear = Math.min(strengths.shearYield, strengths.shearUltimate) / shearStress; // ifi-shear-rule, shigley-distortion-energy
    safetyFactors.bending = bendingStress > 0 ? strengths.yieldStrength / equivalentStress : null; // shigley-distortion-energy
    const bending = safetyFactors.bending;
    const boltMode: JointModeName = bending !== null && bending < safetyFactors.shear ? "bending" : "shear";
    const boltFactor = Math.min(safetyFactors.shear, bending ?? Number.MAX_VALUE);
    const slipped = boltMode === "bending" ? `bent over the ${mm(v.stackHeight)} stack` : "sheared";
    if (slipFactor >= boltFactor) {
      governs = "friction";
      safetyFactor = slipFactor;
    } else {
      governs = boltMode;
      safetyFactor = boltFactor;
    }
    verdict = verdictFor(safetyFactor, v.failBelow, v.marginalBelow);
    if (governs === "friction") {
      reason = `Holds by friction: the clamp carries ${n3(slipFactor)} × the load. If it slips, the bolt is ${slipped}: n = ${n3(boltFactor)}.`;
      if (boltFactor < v.failBelow && verdict === "holds") {
        verdict = "marginal";
        reason = `Holds only while the clamp lasts (friction n = ${n3(slipFactor)}): if it slips, the bolt is ${slipped} and fails (n = ${n3(boltFactor)}).`;
      }
    } else {
      const clamp = preloadForce > 0 ? `The clamp carries only ${n3(slipFactor)} × the load, so the joint slips` : "With no preload the joint slips";
      reason = `${clamp} and the bolt is ${slipped}: n = ${n3(boltFactor)}.`;
    }
    // In shear the tapped thread carries the preload only: a tightening check, not a factor on the load.
    // It takes over when its own verdict is worse than the load path's.
    safetyFactors.stripping = strip ? ratioOrNull(strip.strippingLoad, preloadForce) : null; // fed-std-h28-2
    if (safetyFactors.stripping !== null) {
      const threadVerdict = verdictFor(safetyFactors.stripping, v.failBelow, v.marginalBelow);
      if (SEVERITY[threadVerdict] > SEVERITY[verdict]) {
        governs = "stripping";
        safetyFactor = safetyFactors.stripping;
        verdict = threadVerdict;
        reason = `The thread tapped into the part strips at ${n3(safetyFactor)} × the preload (${n3(strip!.strippingLoad)} N against ${n3(preloadForce)} N): tightening it may strip it.`;
      }
    }
  } else {
    const loads = tensionJointLoads({ preload: preloadForce, stiffnessFactor: stiffness.factor, externalLoad: loadPerBolt });
    const factors = tensionJointFactors({ preload: preloadForce, stiffnessFactor: stiffness.factor, externalLoad: loadPerBolt, proofLoad });
    tension = { ...loads, ...factors };
    safetyFactors.tension = factors.loadFactor;
    safetyFactors.friction = null;
    if (strip) {
      // The same extension as the load factor: the thread strips when the bolt's load reaches F_strip.
      let loadAtStrip: number;
      if (strip.strippingLoad <= preloadForce) loadAtStrip = 0;
      else if (strip.strippingLoad <= loads.separationLoad)
        loadAtStrip = (strip.strippingLoad - preloadForce) / stiffness.factor; // shigley-mechanical-design
      else loadAtStrip = strip.strippingLoad;
      safetyFactors.stripping = loadAtStrip / loadPerBolt;
    }
    governs = "tension";
    safetyFactor = factors.loadFactor;
    if (safetyFactors.stripping !== null && safetyFactors.stripping < safetyFactor) {
      governs = "stripping";
      safetyFactor = safetyFactors.stripping;
    }
    verdict = verdictFor(safetyFactor, v.failBelow, v.marginalBelow);
    const share = `${n3(100 * preload.shareOfProof)} % of its proof load`;
    reason =
      governs === "tension"
        ? `The preload already takes ${share}; the load can grow ${n3(factors.loadFactor)} × before the bolt reaches proof (with the load on, proof over bolt load n_p = ${n3(factors.yieldFactor)}).`
        : `The thread tapped into the part strips at ${n3(safetyFactor)} × the load (it carries the bolt's whole tension, ${n3(loads.boltLoad)} N).`;
    if (factors.separationFactor < 1 && verdict === "holds") {
      verdict = "marginal";
      reason += ` But the joint opens at ${n3(loads.separationLoad)} N per bolt (n_0 = ${n3(factors.separationFactor)}): the bolt then carries the whole load and loosens.`;
    }
  }

  if (preload.proofFactor !== null && preload.proofFactor < 1) {
    if (jointMode === "shear") safetyFactors.tension = preload.proofFactor;
    governs = "tension";
    safetyFactor = preload.proofFactor;
    verdict = "fails";
    reason = `The preload is ${n3(preload.shareOfProof)} × the proof load: the bolt yields while it is tightened.`;
  }

  return {
    size,
    grade: strengths.id,
    jointMode,
    endCondition,
    preloadFrom,
    loadFrom,
    threadIn,
    memberMaterial,
    thread,
    strengths,
    gradeWithinScope: withinScope,
    gradeScopeNote: scopeNote,
    part,
    totalLoad,
    loadPerBolt,
    preload,
    stiffness,
    slip,
    tension,
    tappedThread,
    safetyFactors,
    governs,
    safetyFactor,
    verdict,
    reason,
  };
}

/** Source keys this module relies on. */
export const JOINT_SOURCES_USED: readonly SourceKey[] = [
  "shigley-mechanical-design",
  "shigley-distortion-energy",
  "en-1090-2",
  "en-1993-1-8",
  "rcsc-structural-joints",
  "bickford-bolted-joints",
  "roark-beams",
  "fed-std-h28-2",
  "machinerys-handbook",
  "ifi-shear-rule",
  "aluminum-association-typical",
  "iso-898-1",
  "iso-898-2",
  "newton-second-law",
  "safety-factor-practice",
];
