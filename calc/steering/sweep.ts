/**
 * Mean translation speed over a grid of window widths and modulation depths, with the best point
 * marked: the same simulation as `simulateSteering`, short and at a looser tolerance, for a map.
 */
import { CalcInputError, requireInRange } from "../core/errors.ts";
import { DormandPrince45 } from "../numerics/ode.ts";
import { type SteeringInput, steeringInputs, validateSteeringInput } from "./inputs.ts";
import { SteeringModel } from "./model.ts";
import { runSteering } from "./run.ts";
import { revolutionFigures } from "./simulate.ts";
import { requireInputObject, declaredInputs, requireFiniteFields } from "../core/spec-check.ts";

export interface SteeringSweepCell {
  windowWidth: number;
  depth: number;
  /** False where the depth exceeds the duty left around the spin's base duty: no run. */
  feasible: boolean;
  /** Mean translation speed over the final revolutions [m/s]; null where not feasible. */
  speed: number | null;
  /** Direction of travel minus the commanded direction [rad]; null where not feasible. */
  directionError: number | null;
  /** Spin lost [rad/s]; null where not feasible. */
  spinLost: number | null;
  /** True at the fastest feasible cell. */
  isBest: boolean;
}

export interface SteeringSweep {
  /** Window widths, the grid's rows [rad]. */
  windowWidths: number[];
  /** Depths, the grid's columns [-]. */
  depths: number[];
  /** cells[i][j] at windowWidths[i], depths[j]. */
  cells: SteeringSweepCell[][];
  /** Row and column of the fastest cell; null when no cell is feasible. */
  best: { row: number; column: number } | null;
  /** Simulated time of each cell [s]. */
  duration: number;
}

function evenly(from: number, to: number, count: number): number[] {
  return Array.from({ length: count }, (_, i) => (count === 1 ? from : from + ((to - from) * i) / (count - 1)));
}

/**
 * Mean translation speed against window width and depth, each cell a short simulation
 * (as `simulateSteering`: dormand-prince-1980, pacejka-tyre-dynamics, battery-thevenin-model), with
 * the fastest cell marked.
 *
 * Formula: $\bar v(w, \delta)$ = |mean velocity over the final revolutions| of a run of the given duration
 *
 * @param input every field of `steeringInputs` [SI]; its window width and depth are replaced
 * @param windowWidths widths to try [rad], 1 to 24 values (default 7, from 30° to the largest allowed)
 * @param depths depths to try [-], 1 to 24 values (default 6, from 0.05 to 0.3)
 * @param duration simulated time per cell [s], 0.05 to 10 (default the smaller of the input's and 0.4 s)
 * @returns the grid (speeds [m/s], direction errors [rad], spin lost [rad/s]) and the best cell
 *
 * Assumptions: as `simulateSteering`. A short run may not have reached its final speed; the map
 * compares cells at the same time. @example
 * sweepSteering({ input: DEMO_STEERING_SPINNER }).best // → { row: 6, column: 4 }: 180° and depth 0.25, 0.77 m/s after 0.4 s
 *
 * Sources: dormand-prince-1980, pacejka-tyre-dynamics, battery-thevenin-model.
 */
export function sweepSteering(args: { input: SteeringInput; windowWidths?: readonly number[]; depths?: readonly number[]; duration?: number }): SteeringSweep {
  const { input, windowWidths, depths, duration } = requireInputObject(args, "args");
  validateSteeringInput(input);
  const maxWidth = input.oppositeWindow === 1 ? Math.PI : 2 * Math.PI;
  const widths = windowWidths ? [...windowWidths] : evenly(Math.PI / 6, input.oppositeWindow === 1 ? Math.PI : (300 * Math.PI) / 180, 7);
  const ds = depths ? [...depths] : evenly(0.05, 0.3, 6);
  for (const [name, list] of [
    ["windowWidths", widths],
    ["depths", ds],
  ] as const) {
    if (!Array.isArray(list) || list.length < 1 || list.length > 24) {
      throw new CalcInputError({ param: name, value: Array.isArray(list) ? list.length : list, expected: "a list of 1 to 24 values", unit: "" });
    }
  }
  for (const [i, w] of widths.entries()) requireInRange(`windowWidths[${i}]`, w, "rad", { min: 0, max: maxWidth, minOpen: true });
  for (const [j, d] of ds.entries()) requireInRange(`depths[${j}]`, d, "", { min: steeringInputs.depth.min, max: steeringInputs.depth.max });
  const time = duration ?? Math.min(input.duration, 0.4);
  requireInRange("duration", time, "s", { min: steeringInputs.duration.min, max: steeringInputs.duration.max });

  // The base duty does not depend on the window or depth: one model per depth check, one integrator for all.
  const probe = new SteeringModel({ ...input, depth: 0 });
  const headroom = input.oppositeWindow === 1 ? Math.min(1 - probe.baseDuty, probe.baseDuty) : 1 - probe.baseDuty;
  const integrator = new DormandPrince45(probe.dimension);
  let best: { row: number; column: number } | null = null;
  let bestSpeed = -1;
  const cells = widths.map((w, row) =>
    ds.map((d, column): SteeringSweepCell => {
      if (d > headroom) return { windowWidth: w, depth: d, feasible: false, speed: null, directionError: null, spinLost: null, isBest: false };
      const cellInput = { ...input, windowWidth: w, depth: d, duration: time };
      const model = new SteeringModel(cellInput);
      const run = runSteering(model, cellInput, { legs: [{ start: 0, direction: 0 }], duration: time, relativeTolerance: 1e-4, maxSteps: 200_000, integrator });
      const rev = revolutionFigures(run);
      const speed = Math.hypot(rev.velocity.x, rev.velocity.y);
      if (speed > bestSpeed * (1 + 1e-9)) {
        bestSpeed = speed;
        best = { row, column };
      }
      return {
        windowWidth: w,
        depth: d,
        feasible: true,
        speed,
        directionError: speed > 0 ? Math.atan2(rev.velocity.y, rev.velocity.x) : 0,
        spinLost: Math.max(0, input.spinSpeed - rev.lowestSpin),
        isBest: false,
      };
    }),
  );
  if (best !== null) {
    const b: { row: number; column: number } = best;
    cells[b.row]![b.column]!.isBest = true;
  }
  return requireFiniteFields({ windowWidths: widths, depths: ds, cells, best, duration: time }, "steering sweep", () => declaredInputs(steeringInputs, input));
}
