/**
 * Timing of the spin-up simulation (calc/drivetrain/): one simulation of 10 s of spin-up, and a
 * 50-point design sweep, each the median of many runs after a warm-up.
 *
 * Run from the repository root with the pinned Node:
 *   npx node --experimental-strip-types scripts/bench-drivetrain.mjs
 *
 * Targets: a 10-second simulation under 5 ms; a 50-point sweep well under 100 ms. Timings on a
 * shared machine vary; the median and the 90th percentile are printed, with the load average.
 * The last case runs a sweep as the spin-up page does: point by point, in batches of about 8 ms,
 * and reports the longest batch (how long the page can go without answering input).
 */
import { printTimings } from "./bench-timing.mjs";
import { DEMO_SPINNER, DEMO_WEAPON } from "../calc/drivetrain/demo.ts";
import { markSweepOptimum, sweepDrivetrain, sweepPoint, sweepValues } from "../calc/drivetrain/compare.ts";
import { simulateSpinUp } from "../calc/drivetrain/simulate.ts";

const cases = [
  {
    label: "10 s simulation, demo weapon, run to the limit",
    target: 5,
    runs: 500,
    warmup: 50,
    fn: () => simulateSpinUp({ ...DEMO_WEAPON, maxTime: 10 }, { stopAtSteadyState: false }),
    note: (r) => `${r.solver.acceptedSteps} steps, ${r.solver.evaluations} evaluations`,
  },
  {
    label: "10 s simulation, demo spinner, run to the limit",
    target: 5,
    runs: 500,
    warmup: 50,
    fn: () => simulateSpinUp({ ...DEMO_SPINNER, maxTime: 10 }, { stopAtSteadyState: false }),
    note: (r) => `${r.solver.acceptedSteps} steps, ${r.solver.evaluations} evaluations`,
  },
  {
    label: "demo weapon, stopping at steady state (as the widget runs it)",
    target: 5,
    runs: 500,
    warmup: 50,
    fn: () => simulateSpinUp(DEMO_WEAPON),
    note: (r) => `ends at ${r.endTime.toFixed(2)} s, ${r.series.length} plot points`,
  },
  {
    label: "demo spinner, stopping at steady state (as the widget runs it)",
    target: 5,
    runs: 500,
    warmup: 50,
    fn: () => simulateSpinUp(DEMO_SPINNER),
    note: (r) => `ends at ${r.endTime.toFixed(2)} s, ${r.series.length} plot points`,
  },
  {
    label: "50-point sweep, demo weapon, reduction 0.5 to 4",
    target: 100,
    runs: 40,
    warmup: 5,
    fn: () => sweepDrivetrain({ base: DEMO_WEAPON, parameter: "gearRatio", from: 0.5, to: 4, points: 50 }),
    note: (r) => `optimum ${r.points[r.optimumIndex].value.toFixed(2)} by ${r.optimumBy}`,
  },
  {
    label: "50-point sweep, demo spinner, wheel radius 8 to 40 mm",
    target: 100,
    runs: 40,
    warmup: 5,
    fn: () => sweepDrivetrain({ base: DEMO_SPINNER, parameter: "wheelRadius", from: 0.008, to: 0.04, points: 50 }),
    note: (r) => `optimum ${(r.points[r.optimumIndex].value * 1000).toFixed(1)} mm by ${r.optimumBy}`,
  },
  {
    label: "50-point sweep, demo weapon, point by point in 8 ms batches (as the page runs it)",
    target: 100,
    runs: 40,
    warmup: 5,
    fn: () => {
      const values = sweepValues({ parameter: "gearRatio", from: 0.5, to: 4, points: 50 });
      const points = [];
      let longest = 0;
      let next = 0;
      while (next < values.length) {
        const start = performance.now();
        do points.push(sweepPoint({ base: DEMO_WEAPON, parameter: "gearRatio", value: values[next++] }));
        while (next < values.length && performance.now() - start < 8);
        longest = Math.max(longest, performance.now() - start);
      }
      return { ...markSweepOptimum(points), points, longest };
    },
    note: (r) => `optimum ${r.points[r.optimumIndex].value.toFixed(2)} by ${r.optimumBy}; longest batch ${r.longest.toFixed(2)} ms`,
  },
];

printTimings("Spin-up simulation timing", cases);
