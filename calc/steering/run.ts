/**
 * One integration of the steering model with calc/numerics/ode.ts: the window edges as state
 * events, the drive changes at the loop's ticks as time events, a revolution counter and the
 * commanded-distance crossing as record-only events, and the peaks read after each step.
 */
import { DormandPrince45, type OdeResult, type OdeStatus } from "../numerics/ode.ts";
import { Modulator, type SteeringLeg } from "./controller.ts";
import { E_ABX, E_ABY, S_OM, S_TH, S_X, S_Y, type SteeringModel } from "./model.ts";
import type { SteeringInput } from "./inputs.ts";

export interface SteeringRunOptions {
  /** The commanded move: one or more legs, the first starting at 0. */
  legs: readonly SteeringLeg[];
  /** Simulated time [s]. */
  duration: number;
  /** Relative tolerance of the integrator. */
  relativeTolerance: number;
  /** Step budget. */
  maxSteps: number;
  /** Distance along x (the commanded direction) whose first crossing is timed [m]. */
  target?: { distance: number };
  /** Times at which to sample the state (for a path plot). */
  outputTimes?: Float64Array;
  /** An integrator of the model's dimension to reuse (a sweep runs many). */
  integrator?: DormandPrince45;
}

export interface SteeringRun {
  status: OdeStatus;
  endTime: number;
  y0: Float64Array;
  y: Float64Array;
  solver: Pick<OdeResult, "steps" | "accepted" | "rejected" | "evaluations" | "events" | "timeEvents">;
  /** Drive changes that reached the wheels. */
  switches: number;
  /** Times [s], centre-of-mass positions [m] and the body-frame acceleration integrals [m/s] each time the heading passes a whole turn (from 0). */
  revolutions: { time: number[]; x: number[]; y: number[]; abx: number[]; aby: number[] };
  /** First time the displacement along x (the commanded direction) reaches the target distance [s], or null. */
  crossTime: number | null;
  peakGrip: number;
  slidingTime: number;
  skidLiftedTime: number;
  peakBatteryCurrent: number;
  minBatteryVoltage: number;
  peakMotorCurrent: number;
  output: Float64Array | null;
  outputCount: number;
}

/**
 * Runs the model over the options' move (see the module comment). The model must be built from
 * the same (validated) input.
 *
 * @param model the ODE system; input the validated input (window, loop, latency); options the move and solver settings
 * @returns the raw run: status, states, revolution samples, crossing time, peaks, samples
 */
export function runSteering(model: SteeringModel, input: SteeringInput, options: SteeringRunOptions): SteeringRun {
  const mod = new Modulator(model, {
    windowWidth: input.windowWidth,
    oppositeWindow: input.oppositeWindow === 1,
    phaseLead: input.phaseLead,
    loopRate: input.loopRate,
    latency: input.latency,
    legs: options.legs,
  });
  const n = model.dimension;
  const y0 = model.initialState();
  mod.start(y0);
  const rtol = options.relativeTolerance;
  const atol = new Float64Array(n);
  const vScale = Math.max(0.01 * model.spin0 * model.R, 0.01);
  const eScale = 0.5 * model.J * model.spin0 * model.spin0;
  atol[S_X] = rtol * Math.max(model.R, 0.01);
  atol[S_Y] = atol[S_X]!;
  atol[2] = rtol * vScale;
  atol[3] = rtol * vScale;
  atol[S_TH] = rtol * 2 * Math.PI;
  atol[S_OM] = rtol * model.spin0;
  for (let i = 0; i < model.n; i++) atol[6 + i] = rtol * model.wheel0;
  for (let k = model.e0; k < model.e0 + 7; k++) atol[k] = rtol * eScale;
  atol[model.e0 + 7] = Number.POSITIVE_INFINITY; // the body-frame acceleration integrals follow; they steer nothing
  atol[model.e0 + 8] = Number.POSITIVE_INFINITY;

  const revTime: number[] = [0];
  const revX: number[] = [0];
  const revY: number[] = [0];
  const revAbx: number[] = [0];
  const revAby: number[] = [0];
  let nextTurn = 2 * Math.PI;
  let crossTime: number | null = null;
  const target = options.target;
  const edges = mod.edgeCount;
  const events = [
    ...mod.events,
    { g: (_t: number, y: Float64Array) => y[S_TH]! - nextTurn, direction: 1 as const },
    // The target line, when there is one, is square to the x axis (the commanded direction) at its distance.
    ...(target ? [{ g: (_t: number, y: Float64Array) => y[S_X]! - target.distance, direction: 1 as const }] : []),
  ];
  let peakGrip = 0;
  let slidingTime = 0;
  let skidLiftedTime = 0;
  let peakIb = 0;
  let minVb = model.voc;
  let peakI = 0;
  const ode = options.integrator ?? new DormandPrince45(n);
  const gap = Math.min(input.windowWidth, 2 * Math.PI - input.windowWidth);
  const result = ode.solve((_t, y, dy) => model.rhs(y, dy), 0, y0, options.duration, {
    rtol,
    atol,
    maxSteps: options.maxSteps,
    // A window may not hide inside one step: each step turns at most half the narrower of the window
    // and the gap between (and at most a sixth of a turn), with a margin for the spin rising by half.
    maxStep: Math.min(options.duration, Math.min(Math.PI / 3, gap >= 1e-3 ? gap / 2 : Math.PI / 3) / (1.5 * model.spin0)),
    events,
    onEvent: (hit, y) => {
      if (hit.index < edges) return mod.onEdge(hit.t, y);
      if (hit.index === edges) {
        revTime.push(hit.t);
        revX.push(y[S_X]!);
        revY.push(y[S_Y]!);
        revAbx.push(y[model.e0 + E_ABX]!);
        revAby.push(y[model.e0 + E_ABY]!);
        nextTurn += 2 * Math.PI;
      } else if (crossTime === null) crossTime = hit.t;
      return "continue";
    },
    nextTimeEvent: (t) => mod.nextTimeEvent(t),
    onTimeEvent: (t, y) => mod.onTime(t, y),
    onStep: (s) => {
      // The model's last evaluation is at the current state (first-same-as-last, or a restart).
      const dt = s.t - s.tPrev;
      peakGrip = Math.max(peakGrip, model.lastGrip);
      if (model.lastGrip >= 1) slidingTime += dt;
      if (model.lastSkidLifted) skidLiftedTime += dt;
      peakIb = Math.max(peakIb, model.pack.batteryCurrent);
      minVb = Math.min(minVb, model.pack.batteryVoltage);
      for (let i = 0; i < model.n; i++) peakI = Math.max(peakI, Math.abs(model.current[i]!));
      return undefined;
    },
    outputTimes: options.outputTimes,
  });
  return {
    status: result.status,
    endTime: result.t,
    y0,
    y: result.y,
    solver: {
      steps: result.steps,
      accepted: result.accepted,
      rejected: result.rejected,
      evaluations: result.evaluations,
      events: result.events,
      timeEvents: result.timeEvents,
    },
    switches: mod.switches,
    revolutions: { time: revTime, x: revX, y: revY, abx: revAbx, aby: revAby },
    crossTime,
    peakGrip,
    slidingTime,
    skidLiftedTime,
    peakBatteryCurrent: peakIb,
    minBatteryVoltage: minVb,
    peakMotorCurrent: peakI,
    output: result.output,
    outputCount: result.outputCount,
  };
}
