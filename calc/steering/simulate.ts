/**
 * The steering calculator's entry: simulate a whole-body spinner translating toward a commanded
 * direction and report what a builder reads (speed, direction, spin lost, slip, energy, sensor
 * drift) with a verdict.
 *
 * Verdict rule: "holds" when the mean direction of travel over the final revolutions is within the
 * direction tolerance of the commanded direction and the robot covers the commanded distance
 * within the simulated time; "fails" when a one-wheel robot's skid lifts (it would ride on its
 * wheel and tip, which this planar model cannot follow); otherwise "marginal" when the run stopped
 * at its step budget (the figures then cover only the part simulated); "fails" when the robot does
 * not translate (under 1 mm/s) or goes off by more than twice the tolerance; "marginal" when it is
 * off by up to twice the tolerance or does not cover the distance in time.
 */
import { CalcInputError, requireInRange } from "../core/errors.ts";
import type { OdeStatus } from "../numerics/ode.ts";
import { skidLiftSpeed } from "./gyro.ts";
import { type SteeringInput, steeringInputs, validateSteeringInput } from "./inputs.ts";
import { kinematicRimSpeedDepth, kinematicTranslationSpeed, latencyDirectionError } from "./kinematics.ts";
import { E_ABX, E_ABY, E_COPPER, E_DRAG, E_DRAWN, E_NOLOAD, E_PACK, E_SKID, E_SLIP, S_OM, SteeringModel } from "./model.ts";
import { runSteering, type SteeringRun } from "./run.ts";
import { drivePulseHeadingDrift } from "./sensor-bias.ts";
import { declaredInputs, requireFiniteFields } from "../core/spec-check.ts";

export type SteeringVerdict = "holds" | "marginal" | "fails";

export interface SteeringRevolution {
  /** Time the heading completed this turn [s]. */
  time: number;
  /** Centre of mass then [m]. */
  x: number;
  y: number;
  /** Mean translation speed over this turn [m/s]. */
  speed: number;
  /** Mean spin over this turn, 2π/Δt [rad/s]. */
  spinSpeed: number;
}

export interface SteeringEnergy {
  /** From the cells' open-circuit voltage, ∫V_oc·I_b dt [J]. */
  drawn: number;
  /** Change of kinetic energy: translation, spin, wheels and rotors [J]. */
  kineticStored: number;
  /** Cell internal resistance [J]. */
  packLoss: number;
  /** Motor windings [J]. */
  copperLoss: number;
  /** The motors' no-load loss torque [J]. */
  noLoadLoss: number;
  /** Tyre slip, longitudinal and lateral [J]. */
  slipLoss: number;
  /** Skid sliding [J]. */
  skidLoss: number;
  /** Air drag on the spin [J]. */
  dragLoss: number;
  /** Sum of the losses [J]. */
  totalLoss: number;
  /** |drawn − stored − losses| / drawn [-]. */
  balanceError: number;
}

export interface SteeringResult {
  verdict: SteeringVerdict;
  /** One sentence saying why. */
  reason: string;
  /** How the integration ended ("done" at the end of the simulated time). */
  status: OdeStatus;
  /** Simulated time reached [s]. */
  endTime: number;
  /** The commanded direction (world +x) [rad]. */
  commandedDirection: number;
  /** Mean speed over the final revolutions (up to ten, at most half the run) [m/s]. */
  translationSpeed: number;
  /** Highest mean speed over one revolution [m/s]. */
  peakTranslationSpeed: number;
  /** Highest change of the per-revolution mean velocity per unit time [m/s²]. */
  peakAcceleration: number;
  /** Mean direction of travel over the final revolutions [rad]. */
  travelDirection: number;
  /** Travel direction minus the commanded direction, in (−π, π], positive in the spin direction [rad]. */
  directionError: number;
  /** Ω₀·(L + T/2) − φ_lead: the part of the error latency and the loop's hold explain [rad]. */
  latencyDirectionError: number;
  /** The rest: the wheels' and motors' own response lag [rad]. */
  responseLag: number;
  /** The phase lead that would cancel the direction error: φ_lead + Δψ [rad]. */
  leadToCancel: number;
  /** Where the centre of mass ended [m]. */
  displacement: { x: number; y: number };
  /** First time the robot is the commanded distance along the commanded direction [s]; null if not within the run. */
  timeToDistance: number | null;
  /** The closed-form kinematic-limit speed for this window and depth with stiff motors (kinematics.ts) [m/s]. */
  kinematicLimitSpeed: number;
  /** Spin at the start [rad/s]. */
  initialSpin: number;
  /** Mean spin over the last revolution [rad/s]. */
  finalSpin: number;
  /** Initial spin minus the lowest per-revolution mean [rad/s] (0 when it never dropped). */
  spinLost: number;
  /** Duty holding the spin before the move [-]. */
  baseDuty: number;
  /** Share of the energy drawn that went into tyre slip [-]. */
  slipEnergyShare: number;
  /** Most grip any wheel used at an accepted step, |F|/(μF_z) [-] (1 = sliding). */
  peakGripShare: number;
  /** Share of the time some wheel was sliding (judged at the accepted steps) [-]. */
  slidingTimeShare: number;
  /** One wheel: the spin at which its skid lifts [rad/s] (null with two or more wheels). */
  skidLiftSpeed: number | null;
  /** One wheel: share of the time the skid was off the floor [-]. */
  skidLiftedShare: number;
  energy: SteeringEnergy;
  peakBatteryCurrent: number;
  minBatteryVoltage: number;
  peakMotorCurrent: number;
  openCircuitVoltage: number;
  /**
   * The drive pulses seen by the heading accelerometer: the body-frame mean acceleration over the
   * final revolutions and at steady spin before the move (x along wheel 0's radius) [m/s²], the bias
   * the pulses add along the sensor's inward axis (driving minus steady) [m/s²], the drift it causes
   * [rad/s, rad per turn], and an opposed pair's drift [rad/s].
   */
  sensor: {
    meanBodyAcceleration: { x: number; y: number };
    steadyBodyAcceleration: { x: number; y: number };
    bias: number;
    driftRate: number | null;
    driftPerRevolution: number | null;
    opposedPairDriftRate: number;
  };
  /** One entry per completed revolution, for plots. */
  revolutions: SteeringRevolution[];
  /** Drive changes that reached the wheels (pulse edges). */
  pulseEdges: number;
  solver: SteeringRun["solver"];
  warnings: string[];
}

/** Options of a run (not physics). */
export interface SteeringOptions {
  /** Relative tolerance of the integrator, 1e-9 to 1e-3 (default 1e-6). */
  relativeTolerance?: number;
  /** Step budget, 100 to 10 000 000 (default 500 000). */
  maxSteps?: number;
  /** Keep the per-revolution list (default true). */
  revolutions?: boolean;
}

/** Reads and checks the options. */
export function readSteeringOptions(options: SteeringOptions | undefined): Required<SteeringOptions> {
  const o = options ?? {};
  const relativeTolerance = o.relativeTolerance ?? 1e-6;
  requireInRange("relativeTolerance", relativeTolerance, "", { min: 1e-9, max: 1e-3 });
  const maxSteps = o.maxSteps ?? 500_000;
  requireInRange("maxSteps", maxSteps, "", { min: 100, max: 1e7 });
  if (!Number.isInteger(maxSteps)) throw new CalcInputError({ param: "maxSteps", value: maxSteps, expected: "a whole number", unit: "" });
  return { relativeTolerance, maxSteps, revolutions: o.revolutions ?? true };
}

/** Wraps an angle to (−π, π]. */
function wrap(angle: number): number {
  return angle - 2 * Math.PI * Math.ceil((angle - Math.PI) / (2 * Math.PI));
}

/** Mean velocity over the final revolutions of a run, and the per-revolution figures. @internal */
export function revolutionFigures(run: SteeringRun): {
  velocity: { x: number; y: number };
  /** Body-frame mean acceleration over the same revolutions [m/s²]. */
  bodyAcceleration: { x: number; y: number };
  peakSpeed: number;
  peakAcceleration: number;
  lowestSpin: number;
  finalSpin: number;
  list: SteeringRevolution[];
} {
  const { time, x, y } = run.revolutions;
  const k = time.length - 1;
  const list: SteeringRevolution[] = [];
  let peakSpeed = 0;
  let peakAcceleration = 0;
  let lowestSpin = Number.POSITIVE_INFINITY;
  let prevVx = 0;
  let prevVy = 0;
  let prevMid = 0;
  for (let i = 1; i <= k; i++) {
    const dt = time[i]! - time[i - 1]!;
    const vx = (x[i]! - x[i - 1]!) / dt;
    const vy = (y[i]! - y[i - 1]!) / dt;
    const speed = Math.hypot(vx, vy);
    const spin = (2 * Math.PI) / dt;
    const mid = (time[i]! + time[i - 1]!) / 2;
    if (i > 1) peakAcceleration = Math.max(peakAcceleration, Math.hypot(vx - prevVx, vy - prevVy) / (mid - prevMid));
    prevVx = vx;
    prevVy = vy;
    prevMid = mid;
    peakSpeed = Math.max(peakSpeed, speed);
    lowestSpin = Math.min(lowestSpin, spin);
    list.push({ time: time[i]!, x: x[i]!, y: y[i]!, speed, spinSpeed: spin });
  }
  let velocity = { x: 0, y: 0 };
  let bodyAcceleration = { x: 0, y: 0 };
  const { abx, aby } = run.revolutions;
  if (k >= 2) {
    const j = Math.max(0, k - Math.min(10, Math.floor(k / 2)));
    const span = time[k]! - time[j]!;
    velocity = { x: (x[k]! - x[j]!) / span, y: (y[k]! - y[j]!) / span };
    bodyAcceleration = { x: (abx[k]! - abx[j]!) / span, y: (aby[k]! - aby[j]!) / span };
  } else if (run.endTime > 0) velocity = { x: run.y[0]! / run.endTime, y: run.y[1]! / run.endTime };
  const finalSpin = list.length > 0 ? list[list.length - 1]!.spinSpeed : run.y[S_OM]!;
  return { velocity, bodyAcceleration, peakSpeed, peakAcceleration, lowestSpin: Number.isFinite(lowestSpin) ? lowestSpin : finalSpin, finalSpin, list };
}

/**
 * Steering while spinning: a planar simulation of a whole-body spinner whose firmware pulses each
 * wheel's drive over a window of its heading, integrated with calc/numerics/ode.ts
 * (dormand-prince-1980, hairer-norsett-wanner-1); model in model.ts, timing in controller.ts.
 *
 * Formula: $M\dot{\vec v} = \sum_i \vec F_i + \vec F_{skid}$, $J\dot\Omega = \sum_i R\,F_{t,i} + \tau_{skid} - c\,\Omega|\Omega|$,
 * $(J_w + mG^2J_m)\dot\omega_i = GmK_t(I_i - I_0) - r_wF_{t,i}$, tyre forces by the brush model
 * (pacejka-tyre-dynamics), currents from the sagging pack (battery-thevenin-model, erickson-power-electronics)
 *
 * @param input every field of `steeringInputs` [SI]
 * @param options tolerance, step budget, whether to keep the per-revolution list (see `SteeringOptions`)
 * @returns speeds [m/s], directions [rad], times [s], spin [rad/s], energies [J], currents [A],
 *   voltages [V], the sensor drift [rad/s], the per-revolution list, and a verdict (module comment)
 *
 * Assumptions: flat floor; the robot stays level (one wheel: the skid carries the rest of the
 * weight until it would lift); rigid body; the motor controllers are ideal averaged stages (no
 * dead time, no inductance); tyres by the isotropic brush model with no relaxation length; the
 * firmware's heading is the true heading delayed by the latency (its own estimation errors are
 * the heading chapter's subject, see `sensor`). The robot starts spinning steadily at the spin speed, at rest.
 * @example
 * simulateSteering(DEMO_STEERING_SPINNER).translationSpeed // → 1.16 m/s, but 75.5° ahead of the commanded direction; with phaseLead 1.319 rad it holds the direction (−0.7°) and covers 1 m in 1.16 s
 *
 * Sources: dormand-prince-1980, hairer-norsett-wanner-1, pacejka-tyre-dynamics, battery-thevenin-model,
 * erickson-power-electronics, meriam-kraige-dynamics, franklin-powell-workman-digital-control,
 * siegwart-autonomous-robots, oppenheim-willsky-signals.
 */
export function simulateSteering(input: SteeringInput, options?: SteeringOptions): SteeringResult {
  validateSteeringInput(input);
  const opts = readSteeringOptions(options);
  const model = new SteeringModel(input);
  const run = runSteering(model, input, {
    legs: [{ start: 0, direction: 0 }],
    duration: input.duration,
    relativeTolerance: opts.relativeTolerance,
    maxSteps: opts.maxSteps,
    target: { distance: input.commandedDistance },
  });
  const y = run.y;
  const e0 = model.e0;
  const rev = revolutionFigures(run);
  const kineticStored = model.kineticEnergy(y) - model.kineticEnergy(run.y0);
  const losses = {
    packLoss: y[e0 + E_PACK]!,
    copperLoss: y[e0 + E_COPPER]!,
    noLoadLoss: y[e0 + E_NOLOAD]!,
    slipLoss: y[e0 + E_SLIP]!,
    skidLoss: y[e0 + E_SKID]!,
    dragLoss: y[e0 + E_DRAG]!,
  };
  const totalLoss = losses.packLoss + losses.copperLoss + losses.noLoadLoss + losses.slipLoss + losses.skidLoss + losses.dragLoss;
  // Stryker disable next-line ArithmeticOperator: equivalent, E_DRAWN is 0 so e0 − E_DRAWN is e0 + E_DRAWN
  const drawn = y[e0 + E_DRAWN]!;
  const energy: SteeringEnergy = {
    drawn,
    kineticStored,
    ...losses,
    totalLoss,
    balanceError: drawn !== 0 ? Math.abs(drawn - kineticStored - totalLoss) / Math.abs(drawn) : Math.abs(kineticStored + totalLoss),
  };

  const speed = Math.hypot(rev.velocity.x, rev.velocity.y);
  const travelDirection = speed > 0 ? Math.atan2(rev.velocity.y, rev.velocity.x) : 0;
  const directionError = wrap(travelDirection);
  const latencyError = latencyDirectionError({ spinSpeed: input.spinSpeed, latency: input.latency, loopRate: input.loopRate, phaseLead: input.phaseLead });
  const endTime = run.endTime;
  // Sensor: body-frame mean acceleration over the final revolutions; the bias along the sensor's inward axis, −ā·e_r(β).
  // A one-wheel robot's wheel and skid forces sum to a force fixed in the body even with no drive
  // pulses: a constant offset that a calibration at steady spin removes. The pulse bias is the change.
  // The body's acceleration depends on the state only (tyre and skid forces), not on the drive commands.
  const dy0 = new Float64Array(model.dimension);
  model.rhs(run.y0, dy0);
  const steady = { x: dy0[e0 + E_ABX]!, y: dy0[e0 + E_ABY]! };
  const abx = rev.bodyAcceleration.x;
  const aby = rev.bodyAcceleration.y;
  const bias = -((abx - steady.x) * Math.cos(input.sensorAngle) + (aby - steady.y) * Math.sin(input.sensorAngle));
  const drift = drivePulseHeadingDrift({ bias, angularSpeed: input.spinSpeed, sensorRadius: input.sensorRadius });
  const rimDepth = kinematicRimSpeedDepth({
    dutyStep: input.depth,
    voltage: model.voc,
    kv: input.motorKv,
    wheelRadius: input.wheelRadius,
    gearRatio: input.gearRatio,
  });

  const warnings: string[] = [];
  const tol = input.directionTolerance;
  const budgetHit = run.status === "step-limit" || run.status === "step-too-small";
  let verdict: SteeringVerdict;
  let reason: string;
  const deg = (a: number) => `${a >= 0 ? "" : "−"}${Math.abs((a * 180) / Math.PI).toFixed(1)}°`;
  if (budgetHit) {
    warnings.push(`stopped: too stiff to resolve in ${run.solver.steps} steps, at ${endTime.toPrecision(3)} s of ${input.duration} s.`);
  }
  if (run.skidLiftedTime > 0)
    warnings.push("The skid lifts off the floor: the robot would ride on its wheel and tip, which this planar model does not follow.");
  if (run.skidLiftedTime > 0) {
    verdict = "fails";
    reason = "The wheel's gyroscopic moment lifts the skid at this spin speed.";
  } else if (budgetHit) {
    verdict = "marginal";
    reason = `The run stopped at its step budget at ${endTime.toPrecision(3)} s; the figures cover only that part.`;
  } else if (speed < 1e-3) {
    verdict = "fails";
    reason = "The robot does not translate (under 1 mm/s).";
  } else if (Math.abs(directionError) > 2 * tol) {
    verdict = "fails";
    reason = `It travels ${deg(directionError)} off the commanded direction, more than twice the ${deg(tol)} tolerance; a phase lead of ${deg(wrap(input.phaseLead + directionError))} would cancel it.`;
  } else if (Math.abs(directionError) > tol) {
    verdict = "marginal";
    reason = `It travels ${deg(directionError)} off the commanded direction, beyond the ${deg(tol)} tolerance.`;
  } else if (run.crossTime === null) {
    verdict = "marginal";
    reason = `It keeps to the direction but does not cover ${input.commandedDistance} m in ${input.duration} s.`;
  } else {
    verdict = "holds";
    reason = `It travels within ${deg(tol)} of the commanded direction and covers ${input.commandedDistance} m in ${run.crossTime.toFixed(3)} s.`;
  }

  return requireFiniteFields(
    {
      verdict,
      reason,
      status: run.status,
      endTime,
      commandedDirection: 0,
      translationSpeed: speed,
      peakTranslationSpeed: rev.peakSpeed,
      peakAcceleration: rev.peakAcceleration,
      travelDirection,
      directionError,
      latencyDirectionError: latencyError,
      responseLag: wrap(directionError - latencyError),
      leadToCancel: wrap(input.phaseLead + directionError),
      displacement: { x: y[0]!, y: y[1]! },
      timeToDistance: run.crossTime,
      kinematicLimitSpeed: kinematicTranslationSpeed({ depth: rimDepth, windowWidth: input.windowWidth, oppositeWindow: input.oppositeWindow === 1 }),
      initialSpin: input.spinSpeed,
      finalSpin: rev.finalSpin,
      spinLost: Math.max(0, input.spinSpeed - rev.lowestSpin),
      baseDuty: model.baseDuty,
      slipEnergyShare: drawn > 0 ? losses.slipLoss / drawn : 0,
      peakGripShare: run.peakGrip,
      slidingTimeShare: endTime > 0 ? run.slidingTime / endTime : 0,
      skidLiftSpeed:
        input.wheelCount === 1
          ? skidLiftSpeed({
              robotMass: input.robotMass,
              wheelRadius: input.wheelRadius,
              wheelInertia: input.wheelInertia,
              rotorInertia: input.motorsPerWheel * input.motorRotorInertia,
              gearRatio: input.gearRatio,
            })
          : null,
      skidLiftedShare: endTime > 0 ? run.skidLiftedTime / endTime : 0,
      energy,
      peakBatteryCurrent: run.peakBatteryCurrent,
      minBatteryVoltage: run.minBatteryVoltage,
      peakMotorCurrent: run.peakMotorCurrent,
      openCircuitVoltage: model.voc,
      sensor: {
        meanBodyAcceleration: { x: abx, y: aby },
        steadyBodyAcceleration: steady,
        bias,
        driftRate: drift.driftRate,
        driftPerRevolution: drift.driftPerRevolution,
        opposedPairDriftRate: drift.opposedPairDriftRate,
      },
      revolutions: opts.revolutions ? rev.list : [],
      pulseEdges: run.switches,
      solver: run.solver,
      warnings,
    },
    "steering figures",
    () => declaredInputs(steeringInputs, input),
  );
}
