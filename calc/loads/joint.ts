/**
 * The bolted-joint check: preload, clamp and slip, the bolt in shear and bending or in tension,
 * and the thread in the part; which mode governs, its safety factor and a verdict with the reason.
 */
import { requireDeclared } from "../core/spec-check.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { CalcInputError, requireRelation } from "../core/errors.ts";
import { requireChoice, requireMarginalAtLeastFail, type LoadVerdict, vonMisesStress } from "./common.ts";
import { MATERIALS } from "../materials/materials.ts";
import type { PartLoad } from "../rotation/rotation.ts";
import type { SourceKey } from "../sources/index.ts";
import { formatNumber } from "../core/units.ts";
import { FASTENER_GRADE_OPTIONS, FASTENER_SIZE_OPTIONS, fastenerThread, gradeForSize } from "./inch-fasteners.ts";
import { BOLT_STEEL_MODULUS } from "./joint-data.ts";
import {
  type BoltedJointCheck,
  type BoltedJointInput,
  JOINT_MODE_OPTIONS,
  type JointModeName,
  LOAD_SOURCE_OPTIONS,
  MEMBER_MATERIAL_OPTIONS,
  PRELOAD_SOURCE_OPTIONS,
  THREAD_IN_OPTIONS,
  boltedJointInputs,
} from "./joint-inputs.ts";
import { boltStiffness, jointStiffnessFactor, memberStiffness, tensionJointFactors, tensionJointLoads } from "./joint-stiffness.ts";
import { preloadFromTorque, tighteningTorque } from "./preload.ts";
import { END_CONDITION_OPTIONS, boltBendingMoment, eurocodePackingFactor, rootBendingStress, slipResistance } from "./slip.ts";
import { tappedThreadStrength } from "./tapped-thread.ts";

/** Checks one input against its declaration. */
const requireJointInput = (name: keyof typeof boltedJointInputs, value: number): number => requireDeclared(boltedJointInputs[name], name, value);

/** a/b, or null when b is 0 or so small that the ratio is not a finite number (no preload to speak of). */
function ratioOrNull(a: number, b: number): number | null {
  const ratio = a / b;
  // Stryker disable next-line EqualityOperator: equivalent, for b = 0 the ratio is ±∞ or NaN, which the finiteness test refuses
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
 *   for threads deeper than d). A joint that opens (n_0 ≤ 1: no clamp left in the members) is at best "marginal".
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
  requireRelation("shankLength", v.shankLength, "at-most", v.gripLength, { kind: "length", unit: "m", other: "the clamped thickness" });

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
      // The bolt is the stronger path: the clamp gives first, under the load itself or beyond it.
      const clamp =
        preloadForce <= 0
          ? "With no preload the joint slips"
          : slipFactor < 1
            ? `The clamp carries only ${n3(slipFactor)} × the load, so the joint slips`
            : `The clamp holds up to ${n3(slipFactor)} × the load; past that the joint slips`;
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
      // Stryker disable next-line EqualityOperator: equivalent, at F_strip = F_i both branches give 0
      if (strip.strippingLoad <= preloadForce) loadAtStrip = 0;
      // Stryker disable next-line EqualityOperator: equivalent, at F_strip = P_0 = F_i/(1 − C) both branches give P_0 (to within an ulp)
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
    if (loads.separated && verdict === "holds") {
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

  // No finiteness guard: every function above has its own, and within the declared ranges the load is at least about
  // 10⁻⁹ N, so every ratio to it stays below about 10²⁰.
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
