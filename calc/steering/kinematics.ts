/**
 * Steering while spinning, in closed form: the kinematic limit (wheels rolling without slip) of a
 * whole-body spinner whose firmware adds drive to each wheel over a window of its heading.
 *
 * Picture two wheels at ±R on the body, axles radial, rolling tangentially. In the body frame they
 * are a differential drive of track 2R (siegwart-autonomous-robots): the common part of their rim
 * speeds spins the body, the difference moves it along the body's forward axis, which turns with
 * the body. The firmware raises a wheel's rim speed by δ while that wheel's rolling direction lies
 * within ±w/2 of the commanded direction ψ (and, optionally, lowers it by δ over the opposite
 * window). Averaged over one revolution, the translation is the Fourier fundamental of that
 * rectangular pulse train (oppenheim-willsky-signals): δ·sin(w/2)/π along ψ, twice that with the
 * opposite window. SI in and out: m, m/s, rad, rad/s, s, Hz.
 */
import { requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

const TWO_PI = 2 * Math.PI;

function requireWidth(windowWidth: number, oppositeWindow: boolean): void {
  // With the opposite window both windows must fit in one turn without overlapping.
  requireInRange("windowWidth", windowWidth, "rad", { min: 0, max: oppositeWindow ? Math.PI : TWO_PI, minOpen: true });
}

export interface PulseTrainFundamental {
  /** Duty cycle, the mean of the unit pulse train, w/(2π) [-]. */
  dutyCycle: number;
  /** Complex Fourier coefficient c₁ = sin(w/2)/π of a unit pulse centred at 0 [-]. */
  fundamental: number;
  /** Cosine amplitude of the fundamental, a₁ = 2c₁ = (2/π)·sin(w/2) [-]. */
  cosineAmplitude: number;
}

/**
 * Mean and fundamental of a unit rectangular pulse of width w repeating every turn
 * (oppenheim-willsky-signals §3.3, the periodic square wave with ω₀T₁ = w/2).
 *
 * Formula: $a_0 = \dfrac{w}{2\pi}$, $c_1 = \dfrac{1}{2\pi}\int_{-w/2}^{w/2}\cos\varphi\,d\varphi = \dfrac{\sin(w/2)}{\pi}$, $a_1 = 2c_1$
 *
 * @param windowWidth w, the pulse width in angle [rad], greater than 0 and at most 2π
 * @returns duty cycle, c₁ and a₁ [-]
 *
 * Assumptions: a pulse of height 1 centred on angle 0; an off-centre pulse has the same |c₁|.
 * @example
 * pulseTrainFundamental({ windowWidth: Math.PI / 2 }).fundamental // → 0.225079 (sin 45°/π)
 *
 * Sources: oppenheim-willsky-signals.
 */
export function pulseTrainFundamental(input: { windowWidth: number }): PulseTrainFundamental {
  const { windowWidth } = requireInputObject(input);
  requireWidth(windowWidth, false);
  const fundamental = Math.sin(windowWidth / 2) / Math.PI; // oppenheim-willsky-signals: a_k = sin(kω₀T₁)/(kπ), k = 1
  return { dutyCycle: windowWidth / TWO_PI, fundamental, cosineAmplitude: 2 * fundamental };
}

/**
 * Mean translation speed of a whole-body spinner in the kinematic limit: each wheel's rim speed
 * is raised by δ over a window of width w centred on the commanded direction, and optionally
 * lowered by δ over the opposite window (siegwart-autonomous-robots differential drive in the
 * body frame; oppenheim-willsky-signals for the revolution average).
 *
 * Formula: $\bar v = k\,\delta\,\dfrac{\sin(w/2)}{\pi}$ along ψ, k = 1 (add window only) or 2 (add and opposite)
 *
 * Derivation: two wheels at ±R; while wheel 1 is pulsed the body moves along wheel 1's rolling
 * direction at δ/2 (half the rim-speed difference); averaging δ/2·cos(φ − ψ) over its window and
 * the turn gives δ·sin(w/2)/(2π); wheel 2's pulse half a turn later adds the same.
 *
 * @param depth δ, the rim-speed change during a window [m/s], 0 or more
 * @param windowWidth w [rad], greater than 0, at most 2π (at most π with the opposite window)
 * @param oppositeWindow true when the drive is also lowered by δ over the opposite window (default false)
 * @returns v̄ [m/s], along the commanded direction
 *
 * Assumptions: no slip; steady spin much larger than δ/R (the spin rate does not change during a
 * pulse); evenly spaced wheels all pulsed alike (the result is the same for 2, 3 or 4 wheels).
 * Valid as the limit of high grip, stiff motors and low spin; the simulation shows how far a real
 * drive falls below it.
 * @example
 * kinematicTranslationSpeed({ depth: 1, windowWidth: Math.PI / 2 }) // → 0.225079
 *
 * Sources: siegwart-autonomous-robots, oppenheim-willsky-signals.
 */
export function kinematicTranslationSpeed(input: { depth: number; windowWidth: number; oppositeWindow?: boolean }): number {
  const { depth, windowWidth, oppositeWindow = false } = requireInputObject(input);
  requireNonNegative("depth", depth, "m/s");
  requireWidth(windowWidth, oppositeWindow === true);
  const factor = oppositeWindow === true ? 2 : 1;
  return depth * ((factor * Math.sin(windowWidth / 2)) / Math.PI); // oppenheim-willsky-signals: c₁ = sin(w/2)/π (a factor of at most 2/π < 1 first: never past depth, so no overflow)
}

/**
 * Rim-speed depth of a duty step in the stiff-motor limit: a DC motor at no load turns at its
 * terminal voltage times Kv, so raising the duty by ΔD raises the rim speed by ΔD·V·Kv·r_w/G
 * (motor-constants-wikipedia; erickson-power-electronics for the averaged duty).
 *
 * Formula: $\delta = \Delta D\,V\,K_v\,\dfrac{r_w}{G}$
 *
 * @param dutyStep ΔD, the modulation depth as a share of full duty [-], 0 to 1
 * @param voltage V, the supply voltage [V], greater than 0
 * @param kv K_v [rad/(s·V)], greater than 0
 * @param wheelRadius r_w [m], greater than 0
 * @param gearRatio G, motor turns per wheel turn [-], greater than 0 (default 1)
 * @returns δ [m/s]
 *
 * Assumptions: winding and pack resistance negligible next to the load (the limit in which the
 * wheels are speed sources). @example
 * kinematicRimSpeedDepth({ dutyStep: 0.1, voltage: 12, kv: 100, wheelRadius: 0.02 }) // → 2.4
 *
 * Sources: motor-constants-wikipedia, erickson-power-electronics.
 */
export function kinematicRimSpeedDepth(input: { dutyStep: number; voltage: number; kv: number; wheelRadius: number; gearRatio?: number }): number {
  const { dutyStep, voltage, kv, wheelRadius, gearRatio = 1 } = requireInputObject(input);
  requireInRange("dutyStep", dutyStep, "", { min: 0, max: 1 });
  requirePositive("voltage", voltage, "V");
  requirePositive("kv", kv, "rad/(s·V)");
  requirePositive("wheelRadius", wheelRadius, "m");
  requirePositive("gearRatio", gearRatio, "");
  const depth = ((dutyStep * voltage) / gearRatio) * kv * wheelRadius; // motor-constants-wikipedia: ω = K_v·V
  return requireFiniteResult(depth, "rim speed", { voltage: [voltage, "V"] });
}

export interface DifferentialDriveMotion {
  /** v, speed of the midpoint along the forward axis [m/s]. */
  speed: number;
  /** ω, turn rate, positive anticlockwise (right wheel faster) [rad/s]. */
  turnRate: number;
  /** v/ω, radius of the midpoint's path [m]; null when driving straight (ω = 0, or a radius beyond the double range). */
  turnRadius: number | null;
}

/**
 * Forward kinematics of a differential drive (siegwart-autonomous-robots ch. 3).
 *
 * Formula: $v = \dfrac{v_R + v_L}{2}$, $\omega = \dfrac{v_R - v_L}{b}$, $R = v/\omega$
 *
 * @param leftSpeed v_L, left rim speed [m/s], finite
 * @param rightSpeed v_R, right rim speed [m/s], finite
 * @param track b, distance between the wheels' contact points [m], greater than 0
 * @returns v [m/s], ω [rad/s], R [m] (null when straight)
 *
 * Assumptions: rolling without slip, wheels on one axle through the midpoint.
 * @example
 * differentialDriveKinematics({ leftSpeed: 1, rightSpeed: 2, track: 0.25 }) // → { speed: 1.5, turnRate: 4, turnRadius: 0.375 }
 *
 * Sources: siegwart-autonomous-robots.
 */
export function differentialDriveKinematics(input: { leftSpeed: number; rightSpeed: number; track: number }): DifferentialDriveMotion {
  const { leftSpeed, rightSpeed, track } = requireInputObject(input);
  requireFinite("leftSpeed", leftSpeed, "m/s");
  requireFinite("rightSpeed", rightSpeed, "m/s");
  requirePositive("track", track, "m");
  const speed = rightSpeed / 2 + leftSpeed / 2; // siegwart-autonomous-robots: v = (v_R + v_L)/2, halved first so it cannot overflow
  const turnRate = rightSpeed / track - leftSpeed / track; // siegwart-autonomous-robots: ω = (v_R − v_L)/b
  requireFiniteResult(turnRate, "turn rate", { track: [track, "m"] });
  const radius = speed / turnRate; // ±∞ or NaN when straight (ω = 0), both reported as null
  return { speed, turnRate, turnRadius: Number.isFinite(radius) ? radius : null };
}

/**
 * Inverse kinematics of a differential drive: the rim speeds for a speed and turn rate
 * (siegwart-autonomous-robots ch. 3).
 *
 * Formula: $v_L = v - \omega b/2$, $v_R = v + \omega b/2$
 *
 * @param speed v [m/s], finite; turnRate ω [rad/s], finite; track b [m], greater than 0
 * @returns left and right rim speeds [m/s]
 *
 * @example
 * differentialDriveWheelSpeeds({ speed: 0, turnRate: Math.PI, track: 0.762 }) // → { left: −1.19695, right: 1.19695 }
 *
 * Sources: siegwart-autonomous-robots.
 */
export function differentialDriveWheelSpeeds(input: { speed: number; turnRate: number; track: number }): { left: number; right: number } {
  const { speed, turnRate, track } = requireInputObject(input);
  requireFinite("speed", speed, "m/s");
  requireFinite("turnRate", turnRate, "rad/s");
  requirePositive("track", track, "m");
  const half = turnRate * (track / 2); // siegwart-autonomous-robots: ±ω·b/2
  requireFiniteResult(half, "half-track speed", { turnRate: [turnRate, "rad/s"] });
  const left = speed - half;
  const right = speed + half;
  requireFiniteResult(left, "left rim speed", { speed: [speed, "m/s"] });
  requireFiniteResult(right, "right rim speed", { speed: [speed, "m/s"] });
  return { left, right };
}

/**
 * Direction error of the translation caused by latency and by the control loop's sample-and-hold:
 * the drive pulses fire late, so the push turns forward by the angle the robot spins meanwhile
 * (latencyHeadingLag: ψ = ωL; headingStepPerLoop: one loop period turns ω/f, and a sample-and-hold
 * delays by half a period on average, franklin-powell-workman-digital-control).
 *
 * Formula: $\Delta\psi = \Omega\left(L + \dfrac{1}{2f}\right) - \varphi_{lead}$
 *
 * @param spinSpeed Ω [rad/s], 0 or more
 * @param latency L, sensor-to-wheel delay [s], 0 or more
 * @param loopRate f, control-loop rate [Hz], greater than 0
 * @param phaseLead φ_lead, the lead the firmware already applies [rad], finite (default 0)
 * @returns Δψ [rad], positive in the spin direction
 *
 * Assumptions: steady spin; the wheels respond at once to the drive (their own lag adds to this
 * and is what the simulation measures). @example
 * latencyDirectionError({ spinSpeed: 314.159, latency: 0.0005, loopRate: 2000 }) // → 0.2356 (13.5°)
 *
 * Sources: openstax-up1-rotational-kinematics, franklin-powell-workman-digital-control.
 */
export function latencyDirectionError(input: { spinSpeed: number; latency: number; loopRate: number; phaseLead?: number }): number {
  const { spinSpeed, latency, loopRate, phaseLead = 0 } = requireInputObject(input);
  requireFinite("phaseLead", phaseLead, "rad");
  // The sums below are checked as a whole, so that an overflow names spinSpeed (not the helpers' angularSpeed).
  requireNonNegative("spinSpeed", spinSpeed, "rad/s");
  requireNonNegative("latency", latency, "s");
  requirePositive("loopRate", loopRate, "Hz");
  const lag = spinSpeed * latency; // openstax-up1-rotational-kinematics: ψ = ωL (latencyHeadingLag)
  const hold = spinSpeed / loopRate / 2; // franklin-powell-workman-digital-control: mean hold delay T/2 (headingStepPerLoop)
  const error = lag + hold - phaseLead;
  return requireFiniteResult(error, "direction error", { spinSpeed: [spinSpeed, "rad/s"] });
}

/**
 * The phase lead that cancels the latency and sample-and-hold delay: fire each window early by the
 * angle the robot turns during the delay (latencyHeadingLag, franklin-powell-workman-digital-control).
 *
 * Formula: $\varphi_{lead} = \Omega\left(L + \dfrac{1}{2f}\right)$
 *
 * @param spinSpeed Ω [rad/s], 0 or more; latency L [s], 0 or more; loopRate f [Hz], greater than 0
 * @returns φ_lead [rad]
 *
 * @example
 * phaseLeadForLatency({ spinSpeed: 314.159, latency: 0.0005, loopRate: 2000 }) // → 0.2356
 *
 * Sources: openstax-up1-rotational-kinematics, franklin-powell-workman-digital-control.
 */
export function phaseLeadForLatency(input: { spinSpeed: number; latency: number; loopRate: number }): number {
  const { spinSpeed, latency, loopRate } = requireInputObject(input);
  return latencyDirectionError({ spinSpeed, latency, loopRate, phaseLead: 0 });
}
