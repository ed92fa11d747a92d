/**
 * The path of the centre of mass for a commanded move of several legs (say 0.5 s one way, then
 * 0.5 s at 90°), sampled densely enough to show the body's wobble, for a top-view plot.
 */
import { CalcInputError, requireFinite, requireInRange } from "../core/errors.ts";
import { type SteeringInput, steeringInputs, validateSteeringInput } from "./inputs.ts";
import { S_OM, S_TH, SteeringModel } from "./model.ts";
import { requireInputObject, declaredInputs, requireFiniteFields } from "../core/spec-check.ts";
import { runSteering } from "./run.ts";
import type { SteeringOptions } from "./simulate.ts";
import { readSteeringOptions } from "./simulate.ts";

export interface SteeringPathPoint {
  /** [s] */
  time: number;
  /** Centre of mass [m]. */
  x: number;
  y: number;
  /** Body heading (wheel 0's radius) [rad], wrapped to (−π, π]. */
  heading: number;
  /** Spin [rad/s]. */
  spinSpeed: number;
}

export interface SteeringPath {
  points: SteeringPathPoint[];
  /** The legs as run: start time [s] and direction [rad]. */
  legs: { start: number; direction: number }[];
  /** Where the centre of mass was at the end of each leg [m]. */
  legEnds: { x: number; y: number }[];
  /**
   * The body's wobble: the largest distance of a sample from the centre of mass's mean over the
   * revolution around it (one turn at the starting spin) [m]; 0 with fewer than 4 samples a turn.
   */
  wobble: number;
  /** How the run ended. */
  status: string;
  endTime: number;
}

/**
 * Largest distance of a sample from the mean over the turn centred on it: a symmetric window of one
 * turn (trapezoid weights, so a steady translation averages to the centre sample exactly).
 */
function pathWobble(points: readonly SteeringPathPoint[], perTurn: number): number {
  if (perTurn < 4) return 0;
  const half = Math.floor(perTurn / 2);
  const even = perTurn % 2 === 0;
  let wobble = 0;
  for (let k = half; k + half < points.length; k++) {
    let sx = 0;
    let sy = 0;
    for (let j = -half; j <= half; j++) {
      const weight = even && Math.abs(j) === half ? 0.5 : 1;
      // Stryker disable next-line ArithmeticOperator: equivalent, j runs over −half…half and the weight depends on |j| only, so k − j sums the same samples
      sx += weight * points[k + j]!.x;
      // Stryker disable next-line ArithmeticOperator: equivalent, j runs over −half…half and the weight depends on |j| only, so k − j sums the same samples
      sy += weight * points[k + j]!.y;
    }
    wobble = Math.max(wobble, Math.hypot(points[k]!.x - sx / perTurn, points[k]!.y - sy / perTurn));
  }
  return wobble;
}

/**
 * Simulates a commanded move of one or more legs and samples the centre of mass and heading
 * (the model of `simulateSteering`: dormand-prince-1980, pacejka-tyre-dynamics; sampling on the
 * integrator's dense output, hairer-norsett-wanner-1 §II.6).
 *
 * Formula: $\vec x(t_k)$, $\theta(t_k)$ at $t_k = k\,\Delta t$, $\Delta t = 2\pi/(\Omega_0\,p)$ (p points per revolution)
 *
 * @param input every field of `steeringInputs` [SI] (its duration is replaced by the legs' total)
 * @param legs the move: each a direction [rad] held for a duration [s]; 1 to 20 legs, 0.05 to 10 s in all (default 0.5 s at 0, then 0.5 s at π/2)
 * @param pointsPerRevolution samples per turn at the starting spin, 4 to 64 (default 12), at most `maxPoints` in all
 * @param maxPoints 10 to 20 000 (default 6000)
 * @param options tolerance and step budget (as `simulateSteering`)
 * @returns the sampled path [m, rad, rad/s], the legs, where each ended [m], and the wobble about the
 *   per-revolution mean path [m]
 *
 * @example
 * steeringPath({ input: { ...DEMO_STEERING_SPINNER, phaseLead: 1.319 } }).legEnds[1] // → { x: 0.55, y: 0.28 } [m], after (0.29, −0.02) m: it coasts on along x while it turns
 *
 * Sources: dormand-prince-1980, pacejka-tyre-dynamics, hairer-norsett-wanner-1.
 */
export function steeringPath(args: {
  input: SteeringInput;
  legs?: readonly { direction: number; duration: number }[];
  pointsPerRevolution?: number;
  maxPoints?: number;
  options?: SteeringOptions;
}): SteeringPath {
  const {
    input,
    legs = [
      { direction: 0, duration: 0.5 },
      { direction: Math.PI / 2, duration: 0.5 },
    ],
    pointsPerRevolution = 12,
    maxPoints = 6000,
    options,
  } = requireInputObject(args, "args");
  validateSteeringInput(input);
  const opts = readSteeringOptions(options);
  if (!Array.isArray(legs) || legs.length < 1 || legs.length > 20) {
    throw new CalcInputError({ param: "legs", value: Array.isArray(legs) ? legs.length : legs, expected: "a list of 1 to 20 legs", unit: "" });
  }
  const runLegs: { start: number; direction: number }[] = [];
  let total = 0;
  legs.forEach((leg, i) => {
    if (leg === null || typeof leg !== "object")
      throw new CalcInputError({ param: `legs[${i}]`, value: leg, expected: "an object { direction, duration }", unit: "" });
    requireFinite(`legs[${i}].direction`, leg.direction, "rad");
    requireInRange(`legs[${i}].duration`, leg.duration, "s", { min: 0.001, max: 10 });
    runLegs.push({ start: total, direction: leg.direction });
    total += leg.duration;
  });
  requireInRange("total duration of the legs", total, "s", { min: 0.05, max: 10 });
  requireInRange("pointsPerRevolution", pointsPerRevolution, "", { min: 4, max: 64 });
  requireInRange("maxPoints", maxPoints, "", { min: 10, max: 20_000 });
  if (!Number.isInteger(maxPoints)) throw new CalcInputError({ param: "maxPoints", value: maxPoints, expected: "a whole number", unit: "" });
  const runInput = { ...input, duration: total };
  const model = new SteeringModel(runInput);
  const step = Math.max((2 * Math.PI) / (input.spinSpeed * pointsPerRevolution), total / (maxPoints - 1));
  const count = Math.min(maxPoints, Math.floor(total / step) + 1);
  const times = Float64Array.from({ length: count }, (_, k) => Math.min(total, k * step));
  const ends = runLegs.slice(1).map((l) => l.start);
  const run = runSteering(model, runInput, {
    legs: runLegs,
    duration: total,
    relativeTolerance: opts.relativeTolerance,
    maxSteps: opts.maxSteps,
    outputTimes: times,
  });
  const n = model.dimension;
  const out = run.output!;
  const points: SteeringPathPoint[] = [];
  for (let k = 0; k < run.outputCount; k++) {
    const th = out[k * n + S_TH]!;
    points.push({ time: times[k]!, x: out[k * n]!, y: out[k * n + 1]!, heading: Math.atan2(Math.sin(th), Math.cos(th)), spinSpeed: out[k * n + S_OM]! });
  }
  // Position at each leg's end, from the nearest sample at or before it (the last leg: the final state).
  const legEnds = ends.map((t) => {
    let best = points[0]!;
    for (const p of points) if (p.time <= t) best = p;
    return { x: best.x, y: best.y };
  });
  legEnds.push({ x: run.y[0]!, y: run.y[1]! });
  const wobble = pathWobble(points, Math.round((2 * Math.PI) / (input.spinSpeed * step)));
  return requireFiniteFields({ points, legs: runLegs, legEnds, wobble, status: run.status, endTime: run.endTime }, "steering path", () =>
    declaredInputs(steeringInputs, input),
  );
}
