/**
 * Timing of the steering simulation (calc/steering/): a 3 s move at 3000 rpm (about 150
 * revolutions, two pulse edges per wheel per revolution and more with the opposite window), the
 * calculator's default run, the window-and-depth map and the two-leg path, each the median of many
 * runs after a warm-up.
 *
 * Run from the repository root with the pinned Node:
 *   npx node --experimental-strip-types scripts/bench-steering.mjs
 *
 * Targets: the 3 s simulation under 20 ms; the default map (7 × 6 cells) under 150 ms. Timings on a
 * shared machine vary; the median and the 90th percentile are printed, with the load average.
 */
import { printTimings } from "./bench-timing.mjs";
// Node reads and shows every quantity kind (a page registers only its own).
import "../calc/core/all-units.ts";
import { DEMO_STEERING_SPINNER, simulateSteering, steeringPath, sweepSteering } from "../calc/steering/index.ts";

const steps = (r) => `${r.solver.steps} steps, ${r.solver.evaluations} evaluations, ${r.pulseEdges} pulse edges, ${r.revolutions.length} revolutions`;

const cases = [
  {
    label: "3 s move at 3000 rpm, demo robot (two wheels, opposite window on)",
    target: 20,
    runs: 100,
    warmup: 20,
    fn: () => simulateSteering({ ...DEMO_STEERING_SPINNER, duration: 3 }),
    note: steps,
  },
  {
    label: "3 s move at 3000 rpm, demo robot, add-only windows",
    target: 20,
    runs: 100,
    warmup: 20,
    fn: () => simulateSteering({ ...DEMO_STEERING_SPINNER, duration: 3, oppositeWindow: 0 }),
    note: steps,
  },
  {
    label: "calculator default (1.5 s)",
    target: 10,
    runs: 200,
    warmup: 20,
    fn: () => simulateSteering(DEMO_STEERING_SPINNER),
    note: steps,
  },
  {
    label: "window × depth map, 7 × 6 cells of 0.4 s",
    target: 150,
    runs: 20,
    warmup: 3,
    fn: () => sweepSteering({ input: DEMO_STEERING_SPINNER }),
    note: (r) => `best: ${((r.windowWidths[r.best.row] * 180) / Math.PI).toFixed(0)}°, depth ${r.depths[r.best.column].toFixed(2)}`,
  },
  {
    label: "two-leg path (0.5 s + 0.5 s), 12 points per revolution",
    target: 20,
    runs: 100,
    warmup: 10,
    fn: () => steeringPath({ input: DEMO_STEERING_SPINNER }),
    note: (r) => `${r.points.length} points`,
  },
];

printTimings("Steering simulation timing", cases);
