import { rpmToRadPerSecond } from "../core/units.ts";
import { ratioOrNull, requireWithinSpecs as requireDeclaredInputs, requireInputObject } from "../core/spec-check.ts";
import { requireChoice as requireOption } from "../core/choices.ts";
import type { LoadVerdict as Verdict } from "../loads/common.ts";
import {
  AXLE_OPTIONS,
  type AxleOrientation,
  HORIZONTAL_SPIN_OPTIONS,
  type HorizontalSpin,
  type RobotMotion,
  VERTICAL_SPIN_OPTIONS,
  type VerticalSpin,
  angularMomentum,
  bearingForcePair,
  gyroscopicMoment,
  gyroscopicReaction,
} from "./gyroscopic.ts";
import { precessionRate } from "./precession.ts";
import { type TurnLift, driveTurnRateLimit, liftTurnRate, requireComInsideTrack, weightRestoringMoment } from "./tipping.ts";

// The calculator: turning with a spinning weapon.

export { DEFAULT_LIFT_MARGIN, WEAPON_TURN_CHOICE_DEFAULTS, type WeaponTurnInput, weaponTurnInputs } from "./turn-inputs.ts";
import { DEFAULT_LIFT_MARGIN, type WeaponTurnInput, weaponTurnInputs } from "./turn-inputs.ts";

/** The turn part of the check (not made for a whole-body spinner). */
export interface WeaponTurnSection {
  /** The turn rate entered [rad/s]. */
  turnRate: number;
  /** Gyroscopic moment at that turn rate: J·Ω·ψ̇ for a horizontal axle, 0 for a vertical one [N·m]. */
  gyroscopicMoment: number;
  /** What that moment does while turning left (turning right does the opposite); null for a vertical axle. */
  gyroscopicEffectTurningLeft: RobotMotion | null;
  /** Centrifugal overturning moment at that turn rate and the forward speed, m·|v|·ψ̇·h [N·m]. */
  centrifugalMoment: number;
  /** Force pair on the weapon's bearings at that turn rate [N]. */
  bearingForce: number;
  /** Turning left and turning right at the forward speed. */
  left: TurnLift;
  right: TurnLift;
  /** The lower of the two lift turn rates [rad/s]; null when no turn lifts a wheel. */
  liftTurnRate: number | null;
  /** The turn that lifts first; null when none does. */
  liftTurn: "left" | "right" | null;
  /** Fastest turn the drive reaches at the forward speed, 2(v_max − |v|)/t [rad/s]. */
  driveTurnRate: number;
  /** Fastest turn in place, 2·v_max/t [rad/s]. */
  driveTurnRateInPlace: number;
  /** True when the turn rate entered lifts a wheel in at least one direction. */
  turnRateLifts: boolean;
  /** True when the drive's fastest turn lifts a wheel in at least one direction. */
  driveTurnLifts: boolean;
  /** Lift turn rate ÷ the larger of the drive's turn rate and the turn rate entered [-]; null when none lifts or neither turns (or the quotient passes the largest double). */
  margin: number | null;
}

/** The tilt part: what a pitch or roll rate does. */
export interface WeaponTiltSection {
  /** The pitch or roll rate entered [rad/s]. */
  tiltRate: number;
  /** J·Ω·rate [N·m]. */
  moment: number;
  /** Force pair on the weapon's bearings [N]; null for a whole-body spinner (no weapon bearings). */
  bearingForce: number | null;
  /** What the moment does when the nose rises. */
  whenNoseRises: RobotMotion | null;
  /** What the moment does when the left side rises. */
  whenLeftSideRises: RobotMotion | null;
  /** Vertical axes only: the pitch rate at which the roll it causes lifts a side, m·g·(t/2 − |y_c|)/(J·Ω) [rad/s]; null for a horizontal axle (it yaws instead). */
  liftTiltRate: number | null;
  /** Lift pitch rate ÷ the rate entered [-]; null when not applicable or the rate is 0 (or so small the quotient passes the largest double). */
  margin: number | null;
}

/** The result of `weaponTurnCheck`. */
export interface WeaponTurnCheck {
  axle: AxleOrientation;
  /** The spin direction read (horizontal or vertical option, by axle). */
  spin: HorizontalSpin | VerticalSpin;
  /** H = J·Ω [N·m·s]. */
  angularMomentum: number;
  /** Null for a whole-body spinner. */
  turn: WeaponTurnSection | null;
  tilt: WeaponTiltSection;
  precession: {
    /** The tilting moment entered [N·m]. */
    tiltingMoment: number;
    /** Ω_p = M/(J·Ω) [rad/s]. */
    rate: number;
    /** The angle entered [rad]. */
    angle: number;
    /** Time to precess through it [s]; null when the moment is 0 (or so small the time passes the largest double). */
    time: number | null;
  };
  verdict: Verdict;
  /** Which check decides the verdict; null when nothing lifts. */
  governs: "turn" | "tilt" | null;
  /** One or two sentences: why. */
  reason: string;
}

function ratioText(x: number): string {
  return Number(x.toPrecision(2)).toString();
}

/**
 * Turning with a spinning weapon: the gyroscopic and centrifugal moments at a turn, the turn rate
 * at which a wheel lifts (each way) against the turn rate the drive can reach, what a pitch or
 * roll does, the bearing force pair, and how fast a tilted spinner precesses
 * (meriam-kraige-dynamics, khurmi-gupta-theory-of-machines, gillespie-vehicle-dynamics,
 * siegwart-autonomous-mobile-robots, dudek-jenkin-mobile-robotics).
 *
 * Formula: $M_g = J\Omega\dot\psi$, $\dot\psi_{lift} = \dfrac{m g (t/2 \pm y_c)}{|s J\Omega + m v h|}$,
 * $\dot\psi_{drive} = \dfrac{2(v_{max} - |v|)}{t}$, $F = M/L$, $\Omega_p = \dfrac{M_t}{J\Omega}$
 *
 * @param input the numeric fields of `weaponTurnInputs` (SI) plus `axle`, `horizontalSpin`, `verticalSpin`
 * @returns the turn section (horizontal and vertical axles), the tilt and precession sections, a verdict, what governs it and the reason
 *
 * Verdict (thresholds: 1 and `liftMargin`):
 * - turn (horizontal and vertical axles): margin = lowest lift turn rate ÷ the larger of the
 *   drive's fastest turn at the forward speed and the turn rate entered;
 * - tilt (vertical axle and whole body): margin = lift pitch rate ÷ the pitch rate entered;
 * - the smaller margin governs: at most 1 "fails" (a full-speed turn, or the rate entered, lifts
 *   a wheel), below `liftMargin` "marginal", otherwise "holds" (also when nothing lifts).
 * Assumptions: as `liftTurnRate` and `precessionRate`; for a vertical axle, turning makes no
 * gyroscopic moment (the turn is about the spin axis) and only the centrifugal moment can lift a
 * wheel in a turn; the lift pitch rate treats the robot as if all four corners were still on the
 * ground, so it is an estimate. Not modelled: bumps, the robot's roll inertia, tyre slip.
 * @example
 * weaponTurnCheck(DEMO_VERTICAL_SPINNER_TURN) // → { verdict: "fails", governs: "turn", … } (see the demo)
 * Sources: meriam-kraige-dynamics, khurmi-gupta-theory-of-machines, gillespie-vehicle-dynamics,
 * siegwart-autonomous-mobile-robots, dudek-jenkin-mobile-robotics.
 */
export function weaponTurnCheck(input: WeaponTurnInput): WeaponTurnCheck {
  const fields = requireInputObject(input);
  const axle = requireOption("axle", fields.axle, AXLE_OPTIONS);
  const spin =
    axle === "horizontal"
      ? requireOption("horizontalSpin", fields.horizontalSpin, HORIZONTAL_SPIN_OPTIONS)
      : requireOption("verticalSpin", fields.verticalSpin, VERTICAL_SPIN_OPTIONS);
  const v = requireDeclaredInputs(weaponTurnInputs, fields);
  requireComInsideTrack(v.comOffset, v.trackWidth);
  const J = v.rotorInertia;
  const omega = v.weaponSpeed;
  const angularMomentumValue = angularMomentum({ inertia: J, spinSpeed: omega });

  // Turn section.
  let turn: WeaponTurnSection | null = null;
  if (axle !== "whole-body") {
    const driveTurnRate = driveTurnRateLimit({ wheelTopSpeed: v.wheelTopSpeed, trackWidth: v.trackWidth, forwardSpeed: v.forwardSpeed });
    const driveTurnRateInPlace = driveTurnRateLimit({ wheelTopSpeed: v.wheelTopSpeed, trackWidth: v.trackWidth });
    // A vertical axle makes no gyroscopic moment in a turn (the turn is about the spin axis), so only
    // the centrifugal moment is left: the spin is set to 0 for the roll moment.
    const lift = (turnWay: "left" | "right"): TurnLift =>
      axle === "horizontal"
        ? liftTurnRate({
            inertia: J,
            spinSpeed: omega,
            spin,
            robotMass: v.robotMass,
            trackWidth: v.trackWidth,
            comHeight: v.comHeight,
            comOffset: v.comOffset,
            forwardSpeed: v.forwardSpeed,
            turn: turnWay,
          })
        : liftTurnRate({
            inertia: J,
            spinSpeed: 0,
            spin: "front-up",
            robotMass: v.robotMass,
            trackWidth: v.trackWidth,
            comHeight: v.comHeight,
            comOffset: v.comOffset,
            forwardSpeed: v.forwardSpeed,
            turn: turnWay,
          });
    const left = lift("left");
    const right = lift("right");
    const candidates = [left, right].filter((l) => l.liftTurnRate !== null);
    const first = candidates.length === 0 ? null : candidates.reduce((a, b) => (b.liftTurnRate! < a.liftTurnRate! ? b : a));
    const gyroscopic = axle === "horizontal" ? gyroscopicMoment({ inertia: J, spinSpeed: omega, turnRate: v.turnRate }) : 0;
    const reference = Math.max(driveTurnRate, v.turnRate);
    const lowest = first?.liftTurnRate ?? null;
    turn = {
      turnRate: v.turnRate,
      gyroscopicMoment: gyroscopic,
      // A vertical axle turned about itself gives null (no moment), as the field promises.
      gyroscopicEffectTurningLeft: gyroscopicReaction({ axle, spin, motion: "yaw-left", inertia: J, spinSpeed: omega, rate: 1 }).effect,
      centrifugalMoment: v.robotMass * Math.abs(v.forwardSpeed) * v.turnRate * v.comHeight, // gillespie-vehicle-dynamics: m·v·ψ̇·h
      bearingForce: bearingForcePair({ moment: gyroscopic, bearingSpan: v.bearingSpan }),
      left,
      right,
      liftTurnRate: lowest,
      liftTurn: first?.turn ?? null,
      driveTurnRate,
      driveTurnRateInPlace,
      turnRateLifts: lowest !== null && v.turnRate >= lowest,
      driveTurnLifts: lowest !== null && driveTurnRate >= lowest,
      margin: lowest === null ? null : ratioOrNull(lowest, reference),
    };
  }

  // Tilt section.
  const tiltMoment = gyroscopicMoment({ inertia: J, spinSpeed: omega, turnRate: v.tiltRate });
  const reactionTo = (motion: RobotMotion) => gyroscopicReaction({ axle, spin, motion, inertia: J, spinSpeed: omega, rate: 1 }).effect;
  let liftTiltRate: number | null = null;
  if (axle !== "horizontal") {
    // khurmi-gupta-theory-of-machines: C = I·ω·ω_P about the roll axis; gillespie-vehicle-dynamics: lift at m·g·(t/2 − |y_c|)
    const weakerSide = weightRestoringMoment({ robotMass: v.robotMass, trackWidth: v.trackWidth, comOffset: Math.abs(v.comOffset), side: "right" });
    liftTiltRate = weakerSide / angularMomentumValue;
  }
  const tilt: WeaponTiltSection = {
    tiltRate: v.tiltRate,
    moment: tiltMoment,
    bearingForce: axle === "whole-body" ? null : bearingForcePair({ moment: tiltMoment, bearingSpan: v.bearingSpan }),
    whenNoseRises: reactionTo("nose-up"),
    whenLeftSideRises: reactionTo("left-up"),
    liftTiltRate,
    margin: liftTiltRate === null ? null : ratioOrNull(liftTiltRate, v.tiltRate),
  };

  const rate = precessionRate({ moment: v.tiltingMoment, inertia: J, spinSpeed: omega });
  const precession = {
    tiltingMoment: v.tiltingMoment,
    rate,
    angle: v.precessionAngle,
    // khurmi-gupta-theory-of-machines: t = θ/ω_P; null for no moment, or one so small the time passes the largest double
    time: ratioOrNull(v.precessionAngle * angularMomentumValue, v.tiltingMoment),
  };

  // Verdict: the smaller margin governs.
  const turnMargin = turn?.margin ?? null;
  const tiltMargin = tilt.margin;
  let governs: "turn" | "tilt" | null = null;
  if (turnMargin !== null && (tiltMargin === null || turnMargin <= tiltMargin)) governs = "turn";
  else if (tiltMargin !== null) governs = "tilt";
  const margin = governs === "turn" ? turnMargin! : governs === "tilt" ? tiltMargin! : null;
  const verdict: Verdict = margin === null ? "holds" : margin <= 1 ? "fails" : margin < v.liftMargin ? "marginal" : "holds";
  // No finiteness guard: the declared ranges keep every figure finite.
  return {
    axle,
    spin,
    angularMomentum: angularMomentumValue,
    turn,
    tilt,
    precession,
    verdict,
    governs,
    reason: turnReason(verdict, governs, margin, turn, v.turnRate, v.liftMargin, axle),
  };
}

function turnReason(
  verdict: Verdict,
  governs: "turn" | "tilt" | null,
  margin: number | null,
  turn: WeaponTurnSection | null,
  turnRate: number,
  liftMargin: number,
  axle: AxleOrientation,
): string {
  // margin is null exactly when nothing governs.
  if (margin === null) {
    return axle === "whole-body"
      ? "Nothing entered tips the robot: with no pitch or roll rate, the spin makes no moment that could lift a side."
      : "No turn and no tilt entered lifts a wheel: the moments either cancel or nothing turns.";
  }
  if (governs === "turn" && turn) {
    const lifting = turn.liftTurn === "left" ? turn.left : turn.right;
    const which = turn.driveTurnRate >= turnRate ? "the drive's fastest turn" : "the turn rate entered";
    const what = `Turning ${turn.liftTurn} lifts the ${lifting.wheel} (${lifting.side}) wheels at ${ratioText(margin)} times ${which}`;
    if (verdict === "fails") return `${what}: a full turn lifts a wheel.`;
    if (verdict === "marginal") return `${what}: below the margin of ${ratioText(liftMargin)}, so a hard turn, a bump or a hit can lift a wheel.`;
    return `${what}: the wheels stay down with the margin of ${ratioText(liftMargin)} or more.`;
  }
  const what = `A pitch at the rate entered rolls the robot; a side lifts at ${ratioText(margin)} times that rate`;
  if (verdict === "fails") return `${what}: the pitch rate entered lifts a side.`;
  if (verdict === "marginal") return `${what}: below the margin of ${ratioText(liftMargin)}.`;
  return `${what}: the margin of ${ratioText(liftMargin)} is kept.`;
}

/**
 * An invented scenario (no real robot): a 13.6 kg robot carrying a 2.5 kg, 180 mm steel disc
 * (J = ½·m·r² = 0.010125 kg·m²) on a horizontal axle, front edge moving up at 8000 rpm; wheels
 * 280 mm apart with a 3.5 m/s top speed; centre of mass 45 mm up, on the centreline; turning at
 * 360 °/s while moving forward at 1 m/s; weapon bearings 50 mm apart. Result: H = 8.48 N·m·s;
 * the outer wheels lift from 2.37 rad/s (136 °/s) either way, 0.13 of the 17.9 rad/s the drive
 * reaches at 1 m/s, so the check fails: the weapon, not the drive, sets how fast this robot can
 * turn. For the chapter's worked example.
 */
export const DEMO_VERTICAL_SPINNER_TURN: WeaponTurnInput = {
  axle: "horizontal",
  horizontalSpin: "front-up",
  verticalSpin: "counterclockwise",
  rotorInertia: 0.010125,
  weaponSpeed: rpmToRadPerSecond(8000),
  robotMass: 13.6,
  trackWidth: 0.28,
  comHeight: 0.045,
  comOffset: 0,
  forwardSpeed: 1,
  wheelTopSpeed: 3.5,
  turnRate: 2 * Math.PI,
  tiltRate: 3,
  bearingSpan: 0.05,
  tiltingMoment: 20,
  precessionAngle: Math.PI / 12,
  liftMargin: DEFAULT_LIFT_MARGIN,
};
