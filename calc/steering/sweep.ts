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

/** `count` (at least 2: the default grids have 7 widths and 6 depths) values from `from` to `to`, evenly spaced. */
function evenly(from: number, to: number, count: number): number[] {
  return Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}

/** A sweep that runs one cell at a time (see `startSteeringSweep`). */
export interface SteeringSweepRun {
  /** Cells in the grid, feasible or not. */
  total: number;
  /** Cells done so far. */
  done(): number;
  /**
   * Runs the next cell (a feasible cell is one short simulation, about a millisecond for the demo
   * robot); returns the finished sweep after the last cell, null before.
   */
  step(): SteeringSweep | null;
}

/**
 * The window-and-depth sweep of `sweepSteering`, checked at once but run one cell per `step()`, so
 * a page can spread it over several tasks and stay responsive (each cell as `simulateSteering`:
 * dormand-prince-1980, pacejka-tyre-dynamics, battery-thevenin-model).
 *
 * Formula: $\bar v(w, \delta)$ = |mean velocity over the final revolutions| of a run of the given duration, one cell per step
 *
 * @param input every field of `steeringInputs` [SI]; its window width and depth are replaced
 * @param windowWidths widths to try [rad], 1 to 24 values (default 7, from 30° to the largest allowed)
 * @param depths depths to try [-], 1 to 24 values (default 6, from 0.05 to 0.3)
 * @param duration simulated time per cell [s], 0.05 to 10 (default the smaller of the input's and 0.4 s)
 * @returns a run: its cell count, the cells done, and `step()`, which gives the finished grid
 *   (speeds [m/s], direction errors [rad], spin lost [rad/s], the best cell) after the last cell
 *
 * Assumptions: as `sweepSteering`; every input is checked before the first cell. @example
 * const run = startSteeringSweep({ input: DEMO_STEERING_SPINNER }); let sweep = null; while (!sweep) sweep = run.step(); sweep.best // → { row: 6, column: 4 }
 *
 * Sources: dormand-prince-1980, pacejka-tyre-dynamics, battery-thevenin-model.
 */
export function startSteeringSweep(args: {
  input: SteeringInput;
  windowWidths?: readonly number[];
  depths?: readonly number[];
  duration?: number;
}): SteeringSweepRun {
  const { input, windowWidths, depths, duration } = requireInputObject(args, "args");
  validateSteeringInput(input);
  const maxWidth = input.oppositeWindow === 1 ? Math.PI : 2 * Math.PI;
  const widths = windowWidths ? [...windowWidths] : evenly(Math.PI / 6, input.oppositeWindow === 1 ? Math.PI : (300 * Math.PI) / 180, 7);
  const ds = depths ? [...depths] : evenly(0.05, 0.3, 6);
  for (const [name, list] of [
    ["windowWidths", widths],
    ["depths", ds],
  ] as const) {
    // Both are copied into arrays above, so only the count can be wrong.
    if (list.length < 1 || list.length > 24) {
      throw new CalcInputError({ param: name, value: list.length, expected: "a list of 1 to 24 values", unit: "" });
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
  const total = widths.length * ds.length;
  const cells: SteeringSweepCell[][] = widths.map(() => []);
  let best: { row: number; column: number } | null = null;
  let bestSpeed = -1;
  let done = 0;
  let finished: SteeringSweep | null = null;

  function runCell(row: number, column: number): SteeringSweepCell {
    const w = widths[row]!;
    const d = ds[column]!;
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
  }

  return {
    total,
    done: () => done,
    step() {
      if (finished) return finished;
      const row = Math.floor(done / ds.length);
      const column = done % ds.length;
      cells[row]!.push(runCell(row, column));
      done++;
      if (done < total) return null;
      if (best !== null) {
        const b: { row: number; column: number } = best;
        cells[b.row]![b.column]!.isBest = true;
      }
      finished = requireFiniteFields({ windowWidths: widths, depths: ds, cells, best, duration: time }, "steering sweep", () =>
        declaredInputs(steeringInputs, input),
      );
      return finished;
    },
  };
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
 * compares cells at the same time. All cells run at once (`startSteeringSweep` runs them one at a time). @example
 * sweepSteering({ input: DEMO_STEERING_SPINNER }).best // → { row: 6, column: 4 }: 180° and depth 0.25, 0.77 m/s after 0.4 s
 *
 * Sources: dormand-prince-1980, pacejka-tyre-dynamics, battery-thevenin-model.
 */
export function sweepSteering(args: { input: SteeringInput; windowWidths?: readonly number[]; depths?: readonly number[]; duration?: number }): SteeringSweep {
  const run = startSteeringSweep(args);
  for (;;) {
    const sweep = run.step();
    if (sweep) return sweep;
  }
}
