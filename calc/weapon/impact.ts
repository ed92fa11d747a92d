/**
 * What one hit does: a spinning rotor (inertia J at Ω, striking at radius r) hits a free body
 * (the opponent, mass m_o) along the line of the tip's motion, with a coefficient of restitution
 * e. Impulse and momentum as the dynamics texts treat eccentric impact of a body turning about a
 * pin: the rotor acts at its tip like a mass J/r²; when the attacking robot is free to recoil,
 * its mass M adds in series. Out: the impulse, the rotor's speed after the hit, the energy given
 * to the opponent, taken by your own robot's recoil and lost, the bite, and an ESTIMATE of the
 * contact force from a stopping (crush) distance. SI in and out.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { rpmToRadPerSecond } from "../core/units.ts";
import { type NamedValue, requireWithinSpecs as requireDeclaredInputs, requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

/**
 * The mass a body turning about an axle presents at a point at radius r along the direction of
 * that point's motion; when the axle itself is on a free body of mass M (your robot), that mass
 * adds in series (beer-johnston-dynamics §17.12, hibbeler-eccentric-impact).
 *
 * Formula: $m_{tip} = \left(\dfrac{r^2}{J} + \dfrac{1}{M}\right)^{-1}$; held axle ($M \to \infty$): $m_{tip} = J/r^2$
 *
 * @param inertia J, about the axle [kg·m²], greater than 0
 * @param tipRadius r, axle to the striking point [m], greater than 0
 * @param selfMass M, the robot carrying the axle, free to move [kg], greater than 0; omit for an axle held fixed
 * @returns m_tip [kg]
 *
 * Assumptions: the impulse acts along the tip's direction of motion (perpendicular to the radius);
 * the robot translates without turning (its own yaw inertia is taken as infinite, so a free
 * robot that also turns gives a little less).
 * @example
 * effectiveTipMass({ inertia: 0.05, tipRadius: 0.1 }) // → 5
 * Sources: beer-johnston-dynamics, hibbeler-eccentric-impact.
 */
export function effectiveTipMass(input: { inertia: number; tipRadius: number; selfMass?: number }): number {
  const fields = requireInputObject(input);
  const { inertia, tipRadius, selfMass } = fields;
  requirePositive("inertia", inertia, "kg·m²");
  requirePositive("tipRadius", tipRadius, "m");
  if (selfMass !== undefined) requirePositive("selfMass", selfMass, "kg");
  const named: Record<string, NamedValue> = { inertia: [inertia, "kg·m²"], tipRadius: [tipRadius, "m"] };
  // Stryker disable next-line ConditionalExpression: equivalent, an absent selfMass listed last scores 0 and is never the most extreme input blamed
  if (selfMass !== undefined) named.selfMass = [selfMass, "kg"];
  const compliance = requireFiniteResult((tipRadius / inertia) * tipRadius + (selfMass === undefined ? 0 : 1 / selfMass), "tip compliance", named); // hibbeler-eccentric-impact: v_tip = ω·r, ω changes by P·r/J
  return requireFiniteResult(1 / compliance, "effective tip mass", named);
}

/** The result of `rotorImpact`. */
export interface RotorImpact {
  /** Speed at which the tip closes on the target along the line of impact, Ω·r − v_t [m/s]. */
  approachSpeed: number;
  /** m_tip of `effectiveTipMass` [kg]. */
  effectiveTipMass: number;
  /** μ = (1/m_tip + 1/m_o)⁻¹ [kg]. */
  reducedMass: number;
  /** P = (1 + e)·μ·v_a [N·s]; your robot takes the same impulse the other way. */
  impulse: number;
  /** Ω after the hit (negative: the rotor bounced back) [rad/s]. */
  spinSpeedAfter: number;
  /** Ω − Ω′ [rad/s]. */
  speedDrop: number;
  /** Target velocity along the line after the hit [m/s]. */
  targetVelocityAfter: number;
  /** Your robot's velocity after the hit, −P/M (0 for an axle held fixed) [m/s]. */
  selfVelocityAfter: number;
  /** ½·J·(Ω² − Ω′²): what the rotor gave up [J]. */
  rotorEnergyDrop: number;
  /** ½·m_o·(v_t′² − v_t²): what the target gained [J]. */
  energyToTarget: number;
  /** ½·M·V² of your robot's recoil [J]. */
  energyToSelf: number;
  /** ½·μ·(1 − e²)·v_a²: lost to deformation, heat, noise and vibration [J]. */
  energyLost: number;
  /** ½·μ·v_a²: the relative energy absorbed by the crush at its deepest [J]. */
  compressionEnergy: number;
}

/**
 * A spinning rotor strikes a free body along its tip's line of motion: impulse–momentum with the
 * coefficient of restitution, as for eccentric impact of a body turning about a pin
 * (beer-johnston-dynamics, hibbeler-eccentric-impact, meriam-kraige-dynamics).
 *
 * Formula: $v_a = \Omega r - v_t$, $\mu = \left(\dfrac{1}{m_{tip}} + \dfrac{1}{m_o}\right)^{-1}$, $P = (1+e)\,\mu\,v_a$,
 * $\Omega' = \Omega - \dfrac{P r}{J}$, $v_t' = v_t + \dfrac{P}{m_o}$, $V = -\dfrac{P}{M}$, $\Delta E = \tfrac12 \mu (1 - e^2) v_a^2$
 *
 * @param inertia J [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], 0 or more
 * @param tipRadius r [m], greater than 0
 * @param targetMass m_o, the body hit (free) [kg], greater than 0
 * @param restitution e [-], 0 (fully plastic: tip and target move on together) to 1 (no energy lost)
 * @param targetVelocity v_t, the target's velocity along the tip's direction of motion before the hit [m/s], less than Ω·r (default 0)
 * @param selfMass M, your robot, free to recoil [kg], greater than 0; omit for an axle held fixed
 * @returns impulse [N·s], speeds after [rad/s, m/s], the energy split [J] (see `RotorImpact`)
 *
 * Assumptions: one instantaneous impulse along the tip's line of motion through the target's
 * centre of mass (a central hit on the target; no friction, no spin given to the target); your
 * robot, if free, moves before the hit at the same velocity as the frame v_t is measured in;
 * rigid bodies away from the contact.
 * @example
 * rotorImpact({ inertia: 0.05, spinSpeed: 500, tipRadius: 0.1, targetMass: 13.6, restitution: 0.2 })
 * // → { impulse: 219.35, spinSpeedAfter: 61.29, targetVelocityAfter: 16.13, energyLost: 4387.1, … }
 * Sources: beer-johnston-dynamics, hibbeler-eccentric-impact, meriam-kraige-dynamics.
 */
export function rotorImpact(input: {
  inertia: number;
  spinSpeed: number;
  tipRadius: number;
  targetMass: number;
  restitution: number;
  targetVelocity?: number;
  selfMass?: number;
}): RotorImpact {
  const fields = requireInputObject(input);
  const { inertia, spinSpeed, tipRadius, targetMass, restitution, selfMass } = fields;
  const targetVelocity = fields.targetVelocity ?? 0;
  const tipMass = effectiveTipMass({ inertia, tipRadius, selfMass });
  requireNonNegative("spinSpeed", spinSpeed, "rad/s");
  requirePositive("targetMass", targetMass, "kg");
  requireInRange("restitution", restitution, "", { min: 0, max: 1 });
  requireFinite("targetVelocity", targetVelocity, "m/s");
  const named: Record<string, NamedValue> = {
    inertia: [inertia, "kg·m²"],
    spinSpeed: [spinSpeed, "rad/s"],
    tipRadius: [tipRadius, "m"],
    targetMass: [targetMass, "kg"],
    targetVelocity: [targetVelocity, "m/s"],
  };
  // Stryker disable next-line ConditionalExpression: equivalent, an absent selfMass listed last scores 0 and is never the most extreme input blamed
  if (selfMass !== undefined) named.selfMass = [selfMass, "kg"];
  const tipSpeed = requireFiniteResult(spinSpeed * tipRadius, "tip speed", named);
  const approachSpeed = requireFiniteResult(tipSpeed - targetVelocity, "approach speed", named);
  if (!(approachSpeed > 0) && targetVelocity === 0) {
    // A target at rest and a tip that does not move (no spin, or Ω·r below the smallest double).
    const [param, value, unit] = spinSpeed > 0 ? ["tipRadius", tipRadius, "m"] : ["spinSpeed", spinSpeed, "rad/s"];
    throw new CalcInputError({ param, value, expected: "large enough that the tip moves (Ω·r greater than 0 m/s)", unit });
  }
  if (!(approachSpeed > 0)) {
    throw new CalcInputError({
      param: "targetVelocity",
      value: targetVelocity,
      expected: `less than the tip speed Ω·r (${Number(tipSpeed.toPrecision(6))} m/s): otherwise the tip never reaches the target`,
      unit: "m/s",
    });
  }
  const targetCompliance = requireFiniteResult(1 / targetMass, "target compliance", named);
  // Finite without a check: each compliance is at least 1/Number.MAX_VALUE (5.6e-309), so μ is at most about 9e307 kg.
  const reducedMass = 1 / (1 / tipMass + targetCompliance); // beer-johnston-dynamics: two-body reduced mass
  const impulse = requireFiniteResult((1 + restitution) * reducedMass * approachSpeed, "impulse", named); // hibbeler-eccentric-impact: restitution along the line of impact
  const speedDrop = requireFiniteResult((impulse / inertia) * tipRadius, "speed drop", named); // hibbeler-eccentric-impact: angular impulse P·r = J·ΔΩ
  const spinSpeedAfter = spinSpeed - speedDrop;
  const targetVelocityAfter = requireFiniteResult(targetVelocity + impulse / targetMass, "target velocity", named); // beer-johnston-dynamics: m·Δv = P
  const selfVelocityAfter = selfMass === undefined ? 0 : requireFiniteResult(-impulse / selfMass, "recoil velocity", named); // beer-johnston-dynamics: M·ΔV = −P
  // ½J(Ω² − Ω′²) = ½J·ΔΩ·(Ω + Ω′), written so that it cannot overflow before the last product.
  const rotorEnergyDrop = requireFiniteResult(0.5 * inertia * speedDrop * (spinSpeed + spinSpeedAfter), "rotor energy drop", named);
  const energyToTarget = requireFiniteResult(
    0.5 * targetMass * (targetVelocityAfter - targetVelocity) * (targetVelocityAfter + targetVelocity),
    "energy to the target",
    named,
  );
  const energyToSelf = requireFiniteResult(0.5 * (selfMass ?? 0) * selfVelocityAfter * selfVelocityAfter, "energy to your robot", named);
  const compressionEnergy = requireFiniteResult(0.5 * reducedMass * approachSpeed * approachSpeed, "compression energy", named); // beer-johnston-dynamics: relative kinetic energy ½μv²
  const energyLost = requireFiniteResult(compressionEnergy * (1 - restitution) * (1 + restitution), "energy lost", named); // ΔE = ½μ(1 − e²)v²
  return {
    approachSpeed,
    effectiveTipMass: tipMass,
    reducedMass,
    impulse,
    spinSpeedAfter,
    speedDrop,
    targetVelocityAfter,
    selfVelocityAfter,
    rotorEnergyDrop,
    energyToTarget,
    energyToSelf,
    energyLost,
    compressionEnergy,
  };
}

/** A force estimate from a crush distance. */
export interface ImpactForceEstimate {
  /** E/s: the force if it were constant over the crush (its average over distance) [N]. */
  average: number;
  /** 2E/s: the peak if the force grows in proportion to the crush (a linear contact) [N]. */
  peak: number;
  /** (2/π)·peak: the linear contact's average over TIME, as for a half-sine pulse [N]. */
  timeAverage: number;
  /** π·s/(2·v_a): time from touch to deepest crush for the linear contact; null without an approach speed [s]. */
  compressionTime: number | null;
}

/**
 * An ESTIMATE of the contact force of a hit from the energy the crush absorbs and the distance
 * over which it is absorbed: the work–energy average, and the peak of a linear contact, whose
 * force rises as a quarter sine in time (hyperphysics-work-energy, linear-contact-model,
 * lalanne-mechanical-shock).
 *
 * Formula: $F_{avg} = \dfrac{E}{s}$, $F_{peak} = \dfrac{2E}{s}$, $\bar F_t = \dfrac{2}{\pi} F_{peak}$, $t_c = \dfrac{\pi s}{2 v_a}$
 *
 * @param energy E, absorbed by the crush (`RotorImpact.compressionEnergy`) [J], 0 or more
 * @param stoppingDistance s, how far the contact crushes before the tip and target move together [m], greater than 0
 * @param approachSpeed v_a [m/s], greater than 0; optional, for the compression time
 * @returns the average (constant-force) and peak (linear-contact) forces [N], the time-average [N] and the compression time [s]
 *
 * The estimate spans a factor of 2 at one distance (average to peak) and scales as 1/s: the
 * distance is rarely known to better than a factor of 2 or 3, so treat the forces as a range.
 * Hard steel on steel crushes a fraction of a millimetre (very high forces); plastic armour,
 * rubber mounts and sliding lengthen it.
 * @example
 * impactForceEstimate({ energy: 3600, stoppingDistance: 0.01 }) // → { average: 360 000, peak: 720 000, … }
 * Sources: hyperphysics-work-energy, linear-contact-model, lalanne-mechanical-shock.
 */
export function impactForceEstimate(input: { energy: number; stoppingDistance: number; approachSpeed?: number }): ImpactForceEstimate {
  const fields = requireInputObject(input);
  const { energy, stoppingDistance, approachSpeed } = fields;
  requireNonNegative("energy", energy, "J");
  requirePositive("stoppingDistance", stoppingDistance, "m");
  if (approachSpeed !== undefined) requirePositive("approachSpeed", approachSpeed, "m/s");
  const named: Record<string, NamedValue> = { energy: [energy, "J"], stoppingDistance: [stoppingDistance, "m"] };
  // Stryker disable next-line ConditionalExpression: equivalent, an absent approachSpeed listed last scores 0 and is never the most extreme input blamed
  if (approachSpeed !== undefined) named.approachSpeed = [approachSpeed, "m/s"];
  const average = requireFiniteResult(energy / stoppingDistance, "average force", named); // hyperphysics-work-energy: work = F_avg·d
  const peak = requireFiniteResult(2 * average, "peak force", named); // linear-contact-model: E = ½·F_peak·s
  return {
    average,
    peak,
    timeAverage: (2 / Math.PI) * peak, // lalanne-mechanical-shock: a half-sine averages 2/π of its peak
    compressionTime: approachSpeed === undefined ? null : requireFiniteResult(((Math.PI / 2) * stoppingDistance) / approachSpeed, "compression time", named), // linear-contact-model: a quarter period, π/(2ω_n), with s = v_a/ω_n
  };
}

/**
 * Peak of a half-sine force pulse from its impulse and duration: the shape a linear contact
 * gives (lalanne-mechanical-shock).
 *
 * Formula: $F_{peak} = \dfrac{\pi}{2}\,\dfrac{P}{\tau}$ (the pulse $F_{peak}\sin(\pi t/\tau)$ has impulse $2F_{peak}\tau/\pi$)
 *
 * @param impulse P [N·s], 0 or more
 * @param duration τ [s], greater than 0
 * @returns F_peak [N]
 *
 * @example
 * halfSinePeakForce({ impulse: 2, duration: 0.001 }) // → 3141.6
 * Sources: lalanne-mechanical-shock.
 */
export function halfSinePeakForce(input: { impulse: number; duration: number }): number {
  const { impulse, duration } = requireInputObject(input);
  requireNonNegative("impulse", impulse, "N·s");
  requirePositive("duration", duration, "s");
  return requireFiniteResult((Math.PI / 2) * (impulse / duration), "peak force", { impulse: [impulse, "N·s"], duration: [duration, "s"] }); // lalanne-mechanical-shock
}

// ---------------------------------------------------------------------------------------------
// The calculator: what a hit does.

export { weaponHitInputs, type WeaponHitInput } from "./hit-inputs.ts";
import { weaponHitInputs, type WeaponHitInput } from "./hit-inputs.ts";

/** The result of `weaponHit`. */
export interface WeaponHit {
  /** Ω·r [m/s]. */
  tipSpeed: number;
  /** ½·J·Ω² before the hit [J]. */
  storedEnergy: number;
  /** Time between two impactors passing, 2π/(n·Ω) [s]. */
  timeBetweenImpactors: number;
  /** Bite: how far the robots close in that time, v_c·2π/(n·Ω) [m]. */
  bite: number;
  /** The hit with your robot free to recoil. */
  impact: RotorImpact;
  /** ½·J·(Ω² − Ω′²) as a fraction of the stored energy [-]. */
  energyFractionUsed: number;
  /** Ω′ ÷ Ω [-] (negative: the rotor bounced back). */
  speedRatioAfter: number;
  /** Contact force estimate at the crush distance entered. */
  force: ImpactForceEstimate;
}

/**
 * What one hit does: tip speed, stored energy, bite, the impulse, the rotor's speed after the
 * hit, the energy given to the opponent, taken by your robot's recoil and lost, and an estimate
 * of the contact force (beer-johnston-dynamics, hibbeler-eccentric-impact, weapon-bite,
 * hyperphysics-work-energy, linear-contact-model, lalanne-mechanical-shock).
 *
 * Formula: as `rotorImpact` with $v_t = 0$ and $M$ = your robot; bite $d = v_c \cdot \dfrac{2\pi}{n\Omega}$;
 * $F_{avg} = E_c/s$, $F_{peak} = 2E_c/s$ with $E_c = \tfrac12 \mu v_a^2$
 *
 * @param input every field of `weaponHitInputs` [SI]
 * @returns see `WeaponHit`; no verdict (nothing is judged): the peak force feeds the shaft check's `impactForce`
 *
 * Assumptions: as `rotorImpact`; the tip strikes along its own line of motion with the opponent at
 * rest along that line (the closing speed is across it, so it sets the bite and not the energy);
 * one clean hit with the full bite taken (a bite shallower than the impactor's engagement
 * glances off and delivers less).
 * @example
 * weaponHit(DEMO_HIT) // → { tipSpeed: 75.4, bite: 0.0075, impact: { impulse: 95.5, … }, force: { average: 1.5e5, peak: 3.0e5, … } }
 * Sources: beer-johnston-dynamics, hibbeler-eccentric-impact, weapon-bite, hyperphysics-work-energy,
 * linear-contact-model, lalanne-mechanical-shock, openstax-university-physics-1.
 */
export function weaponHit(input: WeaponHitInput): WeaponHit {
  const v = requireDeclaredInputs(weaponHitInputs, input);
  const tipSpeed = v.weaponSpeed * v.tipRadius;
  const storedEnergy = 0.5 * v.rotorInertia * v.weaponSpeed * v.weaponSpeed; // openstax-university-physics-1: K = ½Iω²
  const timeBetweenImpactors = (2 * Math.PI) / (v.weaponSpeed * v.impactors); // weapon-bite: T/n
  const impact = rotorImpact({
    inertia: v.rotorInertia,
    spinSpeed: v.weaponSpeed,
    tipRadius: v.tipRadius,
    targetMass: v.targetMass,
    restitution: v.restitution,
    selfMass: v.robotMass,
  });
  // Every figure is finite across the declared ranges (at most 2e4 m/s at the tip, 3e9 J stored, 300 m of bite), so no check follows.
  return {
    tipSpeed,
    storedEnergy,
    timeBetweenImpactors,
    bite: v.closingSpeed * timeBetweenImpactors, // weapon-bite: d = v·T/n
    impact,
    energyFractionUsed: impact.rotorEnergyDrop / storedEnergy,
    speedRatioAfter: impact.spinSpeedAfter / v.weaponSpeed,
    force: impactForceEstimate({ energy: impact.compressionEnergy, stoppingDistance: v.stoppingDistance, approachSpeed: impact.approachSpeed }),
  };
}

/**
 * An invented scenario (no real robot): the 2.5 kg, 180 mm disc of `DEMO_VERTICAL_SPINNER_TURN`
 * (J = 0.010125 kg·m², two impactors at 90 mm) at 8000 rpm on a 13.6 kg robot hits a 13.6 kg
 * opponent squarely, e = 0.2, closing at 2 m/s; the hit is taken up over 20 mm (the opponent's
 * armour and frame giving way). Result: 75.4 m/s at the tip, 3553 J stored, 7.5 mm of bite; the
 * impulse is 95.5 N·s and the rotor gives up nearly all its energy (it ends turning slowly
 * backwards); 336 J go to the opponent, as much to your own robot's recoil (both leave at
 * 7.0 m/s), 2881 J are lost; the contact force is estimated at 150 kN (average over the crush)
 * to 300 kN (peak of a linear contact). For the chapter's worked example.
 */
export const DEMO_HIT: WeaponHitInput = {
  rotorInertia: 0.010125,
  weaponSpeed: rpmToRadPerSecond(8000),
  tipRadius: 0.09,
  impactors: 2,
  targetMass: 13.6,
  robotMass: 13.6,
  restitution: 0.2,
  closingSpeed: 2,
  stoppingDistance: 0.02,
};
