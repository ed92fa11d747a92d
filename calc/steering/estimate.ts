/**
 * The steering estimate: the closed forms of steering while spinning, gathered for the chapter's
 * calculator (fast enough for every keystroke, no simulation): the kinematic translation speed for
 * a window width and depth, the direction error that latency and the loop's hold cause and the
 * phase lead that cancels it, the wheels' gyroscopic moment and, for one wheel and a skid, the
 * spin at which the skid lifts. The simulation (simulate.ts) shows how far a real drive falls
 * below these limits. SI in and out.
 */
import { requireWithinSpecs } from "../core/spec-check.ts";
import { steeringEstimateInputs } from "./estimate-inputs.ts";
import { rollingWheelGyroscopicMoment, skidLiftSpeed } from "./gyro.ts";
import { kinematicRimSpeedDepth, kinematicTranslationSpeed, latencyDirectionError, phaseLeadForLatency, pulseTrainFundamental } from "./kinematics.ts";

export { steeringEstimateInputs };

export type SteeringEstimateInput = { [K in keyof typeof steeringEstimateInputs]: number };

/** A spin within this share of the skid lift speed is judged marginal [-]. */
export const SKID_LIFT_MARGIN = 0.8;

export interface SteeringEstimate {
  status: "holds" | "marginal" | "fails";
  /** One sentence saying why. */
  reason: string;
  /** The reason in a few words ("push on course", "skid lifts"). */
  summary: string;
  /** Pack voltage with no current flowing, N·V_cell [V]. */
  openCircuitVoltage: number;
  /** δ, the rim-speed change the depth gives in the stiff-motor limit [m/s]. */
  rimSpeedDepth: number;
  /** Rim speed at the spin speed, Ω·R [m/s]. */
  rimSpeed: number;
  /** Duty cycle of one window, w/(2π) [-]. */
  dutyCycle: number;
  /** v̄, the kinematic translation speed along the commanded direction [m/s]. */
  translationSpeed: number;
  /** Direction error with the phase lead entered, Ω(L + 1/(2f)) − φ_lead [rad]. */
  directionError: number;
  /** The phase lead that cancels latency and hold, Ω(L + 1/(2f)) [rad]. */
  leadToCancel: number;
  /** Gyroscopic moment on each wheel's axle, (J_w + G·n·J_m)(R/r_w)Ω² [N·m]. */
  gyroscopicMoment: number;
  /** One wheel and a skid: the spin at which the skid lifts [rad/s]; null with two or more wheels. */
  skidLiftSpeed: number | null;
}

/**
 * Closed-form steering estimate of a whole-body spinner (siegwart-autonomous-robots,
 * oppenheim-willsky-signals, franklin-powell-workman-digital-control, meriam-kraige-dynamics).
 *
 * Formula: $\delta = D\,N V_{cell} K_v\,r_w/G$, $\bar v = k\,\delta\,\sin(w/2)/\pi$,
 * $\Delta\psi = \Omega(L + \tfrac{1}{2f}) - \varphi_{lead}$, $M = (J_w + G\,n\,J_m)\tfrac{R}{r_w}\Omega^2$,
 * $\Omega_{lift} = \sqrt{M_r g\, r_w/(J_w + G\,n\,J_m)}$
 *
 * @param input every field of `steeringEstimateInputs` [SI]: spin speed [rad/s], robot mass [kg],
 *   wheel count, wheel radius and offset [m], wheel and rotor inertia [kg·m²], motors per wheel,
 *   gear ratio [-], Kv [rad/(s·V)], cells, cell voltage [V], window width [rad], depth [-],
 *   opposite window (0 or 1), phase lead [rad], loop rate [Hz], latency [s], direction tolerance [rad]
 * @returns the figures and a verdict: the direction error against the tolerance (marginal up to
 *   twice it), and for one wheel the spin against the skid lift speed (marginal above 80 % of it)
 *
 * Assumptions: wheels roll without slip and follow the drive at once (stiff motors, no sag);
 * steady spin; the rotor turns the same way as the wheel. Upper limits: the simulation gives the
 * speed a real drive reaches. @example
 * steeringEstimate(DEMO_STEERING_SPINNER).translationSpeed // → 4.68693 (the demo robot; extra fields are ignored)
 *
 * Sources: siegwart-autonomous-robots, oppenheim-willsky-signals, franklin-powell-workman-digital-control, meriam-kraige-dynamics, motor-constants-wikipedia.
 */
export function steeringEstimate(input: SteeringEstimateInput): SteeringEstimate {
  const v = requireWithinSpecs(steeringEstimateInputs, input);
  const opposite = v.oppositeWindow === 1;
  const openCircuitVoltage = v.cellCount * v.cellVoltage; // battery-thevenin-model: open-circuit voltage of cells in series
  const rimSpeedDepth = kinematicRimSpeedDepth({
    dutyStep: v.depth,
    voltage: openCircuitVoltage,
    kv: v.motorKv,
    wheelRadius: v.wheelRadius,
    gearRatio: v.gearRatio,
  });
  const translationSpeed = kinematicTranslationSpeed({ depth: rimSpeedDepth, windowWidth: v.windowWidth, oppositeWindow: opposite }); // oppenheim-willsky-signals
  const { dutyCycle } = pulseTrainFundamental({ windowWidth: v.windowWidth });
  const timing = { spinSpeed: v.spinSpeed, latency: v.latency, loopRate: v.loopRate };
  const directionError = latencyDirectionError({ ...timing, phaseLead: v.phaseLead }); // franklin-powell-workman-digital-control
  const leadToCancel = phaseLeadForLatency(timing);
  const wheel = { wheelInertia: v.wheelInertia, rotorInertia: v.motorsPerWheel * v.motorRotorInertia, gearRatio: v.gearRatio, wheelRadius: v.wheelRadius };
  const gyroscopicMoment = rollingWheelGyroscopicMoment({ ...wheel, contactRadius: v.wheelOffset, spinSpeed: v.spinSpeed }); // meriam-kraige-dynamics
  const lift = v.wheelCount === 1 ? skidLiftSpeed({ ...wheel, robotMass: v.robotMass }) : null; // meriam-kraige-dynamics
  const rimSpeed = v.spinSpeed * v.wheelOffset; // openstax-up1-rotational-kinematics: v = ωr
  const deg = (a: number) => `${(Math.abs(a) * 180) / Math.PI < 10 ? ((a * 180) / Math.PI).toFixed(1) : Math.round((a * 180) / Math.PI)}°`;
  const errorShare = Math.abs(directionError) / v.directionTolerance;
  let status: SteeringEstimate["status"] = errorShare <= 1 ? "holds" : errorShare <= 2 ? "marginal" : "fails";
  let summary = errorShare <= 1 ? "push on course" : "push off course";
  let reason =
    errorShare <= 1
      ? `The push points ${deg(directionError)} off the commanded direction, within the ${deg(v.directionTolerance)} tolerance.`
      : `The push points ${deg(directionError)} off the commanded direction, beyond the ${deg(v.directionTolerance)} tolerance: a phase lead of ${deg(leadToCancel)} cancels it.`;
  if (lift !== null) {
    const liftShare = v.spinSpeed / lift;
    if (liftShare >= 1) {
      status = "fails";
      summary = "skid lifts";
      reason = `The skid lifts: the wheel's gyroscopic moment carries the whole weight from ${Math.round((lift * 30) / Math.PI)} rpm, below the spin speed.`;
    } else if (liftShare >= SKID_LIFT_MARGIN && status === "holds") {
      status = "marginal";
      summary = "skid close to lifting";
      reason = `The skid is close to lifting: the spin speed is ${Math.round(liftShare * 100)} % of the ${Math.round((lift * 30) / Math.PI)} rpm at which it does.`;
    }
  }
  return {
    status,
    reason,
    summary,
    openCircuitVoltage,
    rimSpeedDepth,
    rimSpeed,
    dutyCycle,
    translationSpeed,
    directionError,
    leadToCancel,
    gyroscopicMoment,
    skidLiftSpeed: lift,
  };
}
