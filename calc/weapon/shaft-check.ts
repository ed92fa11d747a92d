/**
 * The calculator "weapon shaft and bearings": its inputs, its entry `weaponShaftCheck` (the loads
 * on the shaft from the gyroscopic moment, the residual unbalance, the rotor's weight and a hit;
 * bending stress and deflection for the layout; the bearings' rating life and static safety; with
 * a verdict naming what governs) and an invented demo.
 */
import { STANDARD_GRAVITY } from "../core/constants.ts";
import { CalcInputError } from "../core/errors.ts";
import { isMaterialId, MATERIAL_DENSITIES, MATERIAL_IDS, type MaterialId } from "../materials/densities.ts";
import { MATERIAL_STRENGTHS } from "../materials/strengths.ts";
import { type BearingCheck, bearingCheck, BEARING_TYPE_OPTIONS, type BearingType, STATIC_SAFETY_GUIDE } from "./bearings.ts";
import { ratioOrNull, requireWithinSpecs as requireDeclaredInputs, requireInputObject } from "../core/spec-check.ts";
import { requireChoice as requireOption } from "../core/choices.ts";
import type { LoadVerdict as Verdict } from "../loads/common.ts";
import { overhungCouple, overhungPointLoad, simplySupportedCouple, simplySupportedPointLoad } from "./beams.ts";
import { type RoundSection, bendingStress, roundSection, torsionalStress } from "./shaft.ts";

// The calculator: weapon shaft and bearings.

export {
  SHAFT_AXLE_OPTIONS,
  SHAFT_KIND_OPTIONS,
  SHAFT_LAYOUT_OPTIONS,
  SHAFT_MATERIAL_OPTIONS,
  type ShaftAxle,
  type ShaftKind,
  type ShaftLayout,
  WEAPON_SHAFT_CHOICE_DEFAULTS,
  type WeaponShaftInput,
  weaponShaftInputs,
} from "./shaft-inputs.ts";
import {
  SHAFT_AXLE_OPTIONS,
  SHAFT_KIND_OPTIONS,
  SHAFT_LAYOUT_OPTIONS,
  type ShaftAxle,
  type ShaftKind,
  type ShaftLayout,
  type WeaponShaftInput,
  weaponShaftInputs,
} from "./shaft-inputs.ts";

/** Life the rolling bearings should reach below which the margin is called thin, as a multiple of the required life (a choice; 2 on life is 1.26 on load for ball bearings). */
export const LIFE_THIN_FACTOR = 2;

/** A criterion of the shaft check with its verdict. */
export interface ShaftCriterion {
  /** What is checked. */
  criterion: "shaft-yield" | "bearing-static" | "bearing-life";
  verdict: Verdict;
  /** The figure judged: safety factor on yield, s0, or L10h ÷ required life [-]; null when there is no load (or too little for the figure to be a finite double). */
  value: number | null;
  /** Below this it fails [-]. */
  failBelow: number;
  /** Below this the margin is thin [-]. */
  marginalBelow: number;
}

/** The result of `weaponShaftCheck`. */
export interface WeaponShaftCheck {
  layout: ShaftLayout;
  shaft: ShaftKind;
  axle: ShaftAxle;
  bearingType: BearingType;
  material: { id: MaterialId; name: string; condition: string; basis: "typical" | "minimum"; yieldStrength: number; youngsModulus: number };
  loads: {
    /** U·Ω² [N]. */
    unbalanceForce: number;
    /** m·g [N]; across the shaft when horizontal, along it when vertical. */
    weight: number;
    /** The hit [N]. */
    impactForce: number;
    /** Running load across the shaft at the rotor, unbalance + weight (horizontal) [N]. */
    runningForce: number;
    /** Running load plus the hit [N]. */
    peakForce: number;
    /** J·Ω·q [N·m]. */
    gyroscopicMoment: number;
    /** Axial load on the bearings: the input plus the weight of a vertical rotor [N]. */
    axialLoad: number;
    /** Motor torque carried (0 for a dead shaft) [N·m]. */
    torque: number;
  };
  /** Support reactions (bearings of a live shaft, frame mounts of a dead one), running and at the peak of a hit [N]. */
  supports: { first: { running: number; peak: number }; second: { running: number; peak: number } };
  /** Largest bending moment (at the rotor, or at the near support when overhung), running and peak [N·m]. */
  bendingMoment: { running: number; peak: number };
  section: RoundSection;
  /** Bending stress at the peak [Pa]. */
  bendingStress: number;
  /** Torsional stress (live shaft) [Pa]. */
  torsionalStress: number;
  /** Von Mises stress at the peak [Pa]. */
  vonMisesStress: number;
  /** "fully-reversed" for a live shaft (rotating bending), "steady" for a dead one. */
  stressCycle: "fully-reversed" | "steady";
  /** S_y / σ' [-]; null when nothing loads the shaft (or the stress is so small the factor passes the largest double). */
  safetyFactor: number | null;
  /** Deflection of the shaft at the rotor, running and at the peak [m]. */
  deflection: { running: number; peak: number };
  /** Radial loads on the two bearings (live: at the supports; dead: in the rotor's hub), running and at the peak [N]. */
  bearingLoads: { first: { running: number; peak: number }; second: { running: number; peak: number } };
  /** The more heavily loaded bearing's checks (iso-281, iso-76). */
  bearing: BearingCheck & { requiredLifeHours: number; staticSafetyGuide: number };
  criteria: ShaftCriterion[];
  verdict: Verdict;
  /** The criterion that decides the verdict. */
  governs: ShaftCriterion["criterion"];
  reason: string;
}

function verdictOf(value: number | null, failBelow: number, marginalBelow: number): Verdict {
  if (value === null) return "holds";
  return value < failBelow ? "fails" : value < marginalBelow ? "marginal" : "holds";
}

const SEVERITY: Record<Verdict, number> = { holds: 0, marginal: 1, fails: 2 };

/**
 * The weapon shaft and its bearings while the weapon runs and when it hits: loads, support and
 * bearing reactions, bending moment, stresses, deflection at the rotor, safety factor on yield,
 * ISO 281 life and ISO 76 static safety, with a verdict naming what governs
 * (shigley-beam-deflection-table, roark-beam-formulas, shigley-bending-torsion,
 * shigley-distortion-energy, meriam-kraige-dynamics, rigid-rotor-unbalance, iso-281, iso-76,
 * bearing-static-safety-guide, safety-factor-practice).
 *
 * Formula: $F_u = U\Omega^2$, $W = m g$, $M_g = J\Omega q$, $P = F_u + W + F_{hit}$;
 * between: $M = \dfrac{P a b}{L} + \dfrac{M_g \max(a,b)}{L}$, $y = \dfrac{P a^2 b^2}{3EIL} + \dfrac{M_g a b |b-a|}{3EIL}$;
 * overhung: $M = P c + M_g$, $y = \dfrac{P c^2 (L+c)}{3EI} + \dfrac{M_g c (2L+3c)}{6EI}$;
 * $\sigma = \dfrac{32 M d}{\pi(d^4 - d_i^4)}$, $\tau = \dfrac{16 T d}{\pi(d^4 - d_i^4)}$, $\sigma' = \sqrt{\sigma^2 + 3\tau^2}$, $n = S_y/\sigma'$;
 * bearings: live $R$ = support reactions; dead $R = P/2 + M_g/s$; $L_{10} = (C/P)^p$, $s_0 = C_0/P_0$
 *
 * @param input the numeric fields of `weaponShaftInputs` (SI) plus `layout`, `shaft`, `axle`, `bearingType`, `material`
 * @returns loads, reactions, moment, stresses, deflection, safety factor, bearing life and static safety, the criteria with their verdicts, and the verdict with what governs and why
 *
 * Verdict: the worst of three criteria (ties: the one closest to its threshold):
 * - shaft yield: n = S_y/σ' at the peak of a hit, fails below `failBelow`, thin below `marginalBelow`;
 * - bearing static safety under the hit: s0 below 1 fails (the raceways dent), below the guideline
 *   for rotating bearings under pronounced shock with normal requirements (1.5 ball, 3 roller) thin;
 * - bearing life in running (no hit): L10h below the required life fails, below `LIFE_THIN_FACTOR`
 *   times it thin.
 *
 * Assumptions:
 * - Every transverse load (unbalance, weight, hit) acts in one plane and they add, and the
 *   gyroscopic couple adds to them with the sign that hurts: the worst case, since the unbalance
 *   force turns and the others point where the robot's motion puts them.
 * - The rotor acts at one point (its mid-plane); the supports are simple (free to tilt); the shaft
 *   is uniform, slender (shear deflection and transverse shear stress ignored), linear elastic.
 * - Dead shaft: the rotor's centre of mass lies midway between its two hub bearings, which share
 *   the transverse load equally and carry the gyroscopic couple as a force pair over their spacing.
 *   Strictly the unbalance share of the stress turns with the rotor and so alternates.
 * - Live shaft: bending stress is fully reversed every turn, so FATIGUE governs its long-term life:
 *   this check is against yield only; check the endurance limit (with surface, size and notch
 *   factors) separately. The torque is the motor's steady torque, not a torque spike from a hit.
 * - Both bearings have the same ratings; the axial load (with a vertical rotor's weight) is taken
 *   by each bearing in its check (conservative: usually one bearing locates the shaft).
 * - Strength: the material table's yield strength, typical or specified minimum as its basis says.
 * - Not checked: shaft slope at the bearings, keyways and shoulders (stress concentration), the
 *   critical (whirling) speed, fretting of the bearing seats.
 * @example
 * weaponShaftCheck(DEMO_SHAFT) // → { verdict: "fails", governs: "bearing-static", … } (see the demo)
 * Sources: shigley-beam-deflection-table, roark-beam-formulas, shigley-bending-torsion,
 * shigley-distortion-energy, meriam-kraige-dynamics, rigid-rotor-unbalance, iso-281, iso-76,
 * bearing-static-safety-guide, safety-factor-practice, cgpm-1901.
 */
export function weaponShaftCheck(input: WeaponShaftInput): WeaponShaftCheck {
  const fields = requireInputObject(input);
  const layout = requireOption("layout", fields.layout, SHAFT_LAYOUT_OPTIONS);
  const shaft = requireOption("shaft", fields.shaft, SHAFT_KIND_OPTIONS);
  const axle = requireOption("axle", fields.axle, SHAFT_AXLE_OPTIONS);
  const bearingType = requireOption("bearingType", fields.bearingType, BEARING_TYPE_OPTIONS);
  if (typeof fields.material !== "string" || !isMaterialId(fields.material)) {
    throw new CalcInputError({ param: "material", value: fields.material, expected: `one of ${MATERIAL_IDS.map((id) => `"${id}"`).join(", ")}`, unit: "" });
  }
  const materialId = fields.material;
  const v = requireDeclaredInputs(weaponShaftInputs, fields);
  if (layout === "between" && !(v.rotorPosition <= v.bearingSpan)) {
    throw new CalcInputError({
      param: "rotorPosition",
      value: v.rotorPosition,
      expected: `at most the support span (${Number(v.bearingSpan.toPrecision(6))} m) for a rotor between the supports`,
      unit: "m",
    });
  }
  if (!(v.shaftBore < v.shaftDiameter)) {
    throw new CalcInputError({
      param: "shaftBore",
      value: v.shaftBore,
      expected: `less than the shaft diameter (${Number(v.shaftDiameter.toPrecision(6))} m)`,
      unit: "m",
    });
  }
  if (!(v.marginalBelow >= v.failBelow)) {
    throw new CalcInputError({ param: "marginalBelow", value: v.marginalBelow, expected: `at least the fail threshold, ${v.failBelow}`, unit: "" });
  }
  const weightOnAxle = axle === "vertical" ? v.rotorMass * STANDARD_GRAVITY : 0;
  const axialLoad = v.axialLoad + weightOnAxle;
  if (bearingType === "roller" && axialLoad > 0) {
    throw new CalcInputError({
      param: "bearingType",
      value: bearingType,
      expected:
        '"ball" when the bearings carry an axial load (here the axial input or a vertical rotor\'s weight): cylindrical roller bearings are taken to carry none, so give the thrust its own bearing',
      unit: "",
    });
  }

  // The rows of calc/materials/materials.ts, read from the two parts it is made of (the page then
  // carries the numbers without the sources and notes).
  const material = { ...MATERIAL_DENSITIES[materialId], ...MATERIAL_STRENGTHS[materialId] };
  const E = material.youngsModulus;
  const section = roundSection({ diameter: v.shaftDiameter, bore: v.shaftBore });
  const I = section.secondMoment;

  // Loads.
  const unbalanceForce = v.unbalance * v.weaponSpeed * v.weaponSpeed; // rigid-rotor-unbalance: F = U·ω²
  const weight = v.rotorMass * STANDARD_GRAVITY; // cgpm-1901: W = m·g_n
  const runningForce = unbalanceForce + (axle === "horizontal" ? weight : 0);
  const peakForce = runningForce + v.impactForce;
  const gyroscopic = v.rotorInertia * v.weaponSpeed * v.turnRate; // meriam-kraige-dynamics: M = I·Ω·p
  const torque = shaft === "live" ? v.motorTorque : 0;

  // Beam: supports, largest moment, deflection at the rotor, for a transverse force P with the couple.
  const beam = (P: number) => {
    if (layout === "between") {
      const span = v.bearingSpan;
      const a = v.rotorPosition;
      const point = simplySupportedPointLoad({ force: P, span, position: a, youngsModulus: E, secondMoment: I });
      const couple = simplySupportedCouple({ moment: gyroscopic, span, position: a, youngsModulus: E, secondMoment: I });
      return {
        first: point.leftReaction + couple.reaction,
        second: point.rightReaction + couple.reaction,
        moment: point.momentAtLoad + Math.max(couple.momentBeforeCouple, couple.momentAfterCouple), // worst side of the jump
        deflection: point.deflectionAtLoad + couple.deflectionAtCouple,
      };
    }
    const point = overhungPointLoad({ force: P, span: v.bearingSpan, overhang: v.overhang, youngsModulus: E, secondMoment: I });
    const couple = overhungCouple({ moment: gyroscopic, span: v.bearingSpan, overhang: v.overhang, youngsModulus: E, secondMoment: I });
    return {
      first: point.farReaction + couple.reaction,
      second: point.nearReaction + couple.reaction,
      moment: point.momentAtNearSupport + couple.momentAtNearSupport,
      deflection: point.tipDeflection + couple.tipDeflection,
    };
  };
  const running = beam(runningForce);
  const peak = beam(peakForce);

  // Stresses at the peak.
  const sigma = bendingStress({ moment: peak.moment, diameter: v.shaftDiameter, bore: v.shaftBore });
  const tau = torsionalStress({ torque, diameter: v.shaftDiameter, bore: v.shaftBore });
  // As vonMisesStress (calc/loads/common.ts), written out so the page does not load the loads module for one line.
  const sigmaVm = Math.hypot(sigma, Math.sqrt(3) * tau); // shigley-distortion-energy: σ' = √(σ² + 3τ²)
  const safety = ratioOrNull(material.yieldStrength, sigmaVm); // safety-factor-practice: n = S_y/σ'

  // Bearings: at the supports of a live shaft, in the hub of a dead one.
  const hubLoad = (P: number) => P / 2 + gyroscopic / v.hubBearingSpacing; // khurmi-gupta-theory-of-machines: F = C/x on each bearing
  const bearingLoads =
    shaft === "live"
      ? { first: { running: running.first, peak: peak.first }, second: { running: running.second, peak: peak.second } }
      : { first: { running: hubLoad(runningForce), peak: hubLoad(peakForce) }, second: { running: hubLoad(runningForce), peak: hubLoad(peakForce) } };
  const heavierPeak = Math.max(bearingLoads.first.peak, bearingLoads.second.peak);
  const heavierRunning = Math.max(bearingLoads.first.running, bearingLoads.second.running);
  const check = bearingCheck({
    bearingType,
    dynamicLoadRating: v.dynamicLoadRating,
    staticLoadRating: v.staticLoadRating,
    radialLoad: heavierRunning,
    shockRadialLoad: heavierPeak,
    axialLoad,
    radialFactor: v.radialFactor,
    axialFactor: v.axialFactor,
    angularSpeed: v.weaponSpeed,
  });
  const guide = STATIC_SAFETY_GUIDE.rotating.shock.normal[bearingType]; // bearing-static-safety-guide: rotating, pronounced shock, normal requirements (as staticSafetyGuide)
  const requiredLifeHours = v.requiredLife / 3600;
  const lifeRatio = check.ratingLifeHours === null ? null : ratioOrNull(check.ratingLifeHours, requiredLifeHours);

  const criteria: ShaftCriterion[] = [
    {
      criterion: "shaft-yield",
      value: safety,
      failBelow: v.failBelow,
      marginalBelow: v.marginalBelow,
      verdict: verdictOf(safety, v.failBelow, v.marginalBelow),
    },
    {
      criterion: "bearing-static",
      value: check.staticSafetyFactor,
      failBelow: 1,
      marginalBelow: guide,
      verdict: verdictOf(check.staticSafetyFactor, 1, guide),
    },
    {
      criterion: "bearing-life",
      value: lifeRatio,
      failBelow: 1,
      marginalBelow: LIFE_THIN_FACTOR,
      verdict: verdictOf(lifeRatio, 1, LIFE_THIN_FACTOR),
    },
  ];
  const closeness = (c: ShaftCriterion) => (c.value === null ? Number.POSITIVE_INFINITY : c.value / c.marginalBelow);
  const governing = criteria.reduce((worst, c) =>
    SEVERITY[c.verdict] > SEVERITY[worst.verdict] || (SEVERITY[c.verdict] === SEVERITY[worst.verdict] && closeness(c) < closeness(worst)) ? c : worst,
  );

  const result: Omit<WeaponShaftCheck, "reason"> = {
    layout,
    shaft,
    axle,
    bearingType,
    material: {
      id: materialId,
      name: material.name,
      condition: material.condition,
      basis: material.basis,
      yieldStrength: material.yieldStrength,
      youngsModulus: material.youngsModulus,
    },
    loads: { unbalanceForce, weight, impactForce: v.impactForce, runningForce, peakForce, gyroscopicMoment: gyroscopic, axialLoad, torque },
    supports: { first: { running: running.first, peak: peak.first }, second: { running: running.second, peak: peak.second } },
    bendingMoment: { running: running.moment, peak: peak.moment },
    section,
    bendingStress: sigma,
    torsionalStress: tau,
    vonMisesStress: sigmaVm,
    stressCycle: shaft === "live" ? "fully-reversed" : "steady",
    safetyFactor: safety,
    deflection: { running: running.deflection, peak: peak.deflection },
    bearingLoads,
    bearing: { ...check, requiredLifeHours, staticSafetyGuide: guide },
    criteria,
    verdict: governing.verdict,
    governs: governing.criterion,
  };
  // Every figure is finite: the declared ranges bound each load, and the section check keeps I above 0.
  return { ...result, reason: shaftReason(result, governing) };
}

function figure(x: number): string {
  return Number(x.toPrecision(2)).toString();
}

function shaftReason(r: Omit<WeaponShaftCheck, "reason">, c: ShaftCriterion): string {
  const basis = {
    typical: " (typical strength: the specified minimum can be lower)",
    // Stryker disable next-line StringLiteral: equivalent, no row of the material table gives a specified minimum
    minimum: "",
  }[r.material.basis];
  if (c.value === null) return "Nothing loads the shaft or the bearings.";
  switch (c.criterion) {
    case "shaft-yield": {
      const cycle = r.stressCycle === "fully-reversed" ? "; the live shaft's bending is fully reversed, so check fatigue too" : "";
      if (c.verdict === "fails")
        return `The shaft yields at the peak of a hit: safety factor ${figure(c.value)} on yield${basis}, below ${figure(c.failBelow)}.`;
      if (c.verdict === "marginal")
        return `The shaft's safety factor on yield at the peak of a hit is ${figure(c.value)}${basis}, below ${figure(c.marginalBelow)}${cycle}.`;
      return `Every check holds; the closest is the shaft, at a safety factor of ${figure(c.value)} on yield at the peak of a hit${basis}${cycle}.`;
    }
    case "bearing-static":
      if (c.verdict === "fails") return `A hit overloads the bearings: static safety factor s0 = ${figure(c.value)}, below 1, so the raceways dent.`;
      if (c.verdict === "marginal")
        return `The bearings' static safety factor under a hit is ${figure(c.value)}, below the guideline of ${figure(c.marginalBelow)} for shock loads.`;
      return `Every check holds; the closest is the bearings' static safety factor under a hit, ${figure(c.value)} against a guideline of ${figure(c.marginalBelow)}.`;
    case "bearing-life":
      if (c.verdict === "fails") return `The bearings' rating life is ${figure(c.value)} times the life required: fewer than 90 % of them would last.`;
      if (c.verdict === "marginal") return `The bearings' rating life is only ${figure(c.value)} times the life required.`;
      return `Every check holds; the closest is the bearings' rating life, ${figure(c.value)} times the life required.`;
  }
}
