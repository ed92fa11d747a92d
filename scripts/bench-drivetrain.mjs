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
 * and reports the longest batch (how long the page can go without answering input). Last, the
 * worst case found: the slowest single run over inputs anywhere in their declared ranges.
 */
import { ms, printTimings } from "./bench-timing.mjs";
// Node reads and shows every quantity kind (a page registers only its own).
import "../calc/core/all-units.ts";
import { CalcInputError } from "../calc/core/errors.ts";
import { drivetrainInputs } from "../calc/drivetrain/inputs.ts";
import { MAX_TRIALS } from "../calc/drivetrain/model.ts";
import { siSymbol } from "../calc/core/spec-check.ts";
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

// The worst case: the slowest single spin-up over inputs anywhere in their declared ranges. Every
// input at each end of its range beside the demo values, then random designs (a fixed seed, so
// runs compare) with each input drawn log-uniformly across its range and now and then at an end.
// A run is bounded by its step budget (MAX_TRIALS); a design out of the model's reach is refused
// by name (CalcInputError) before it starts.
const random = (() => {
  let state = 20240611;
  return () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
})();
const lowEnd = (spec) => (spec.minOpen ? (spec.min === 0 ? Number.MIN_VALUE : spec.min * (1 + Number.EPSILON)) : spec.min);
function draw(spec) {
  const u = random();
  if (u < 0.05) return lowEnd(spec);
  if (u < 0.1) return spec.max;
  if (spec.integer) return Math.ceil(spec.min) + Math.floor(random() * (Math.floor(spec.max) - Math.ceil(spec.min) + 1));
  const low = Math.max(lowEnd(spec), spec.max * 1e-6, 1e-12);
  return low * (spec.max / low) ** random();
}
const candidates = [];
for (const base of [DEMO_WEAPON, DEMO_SPINNER]) {
  for (const [name, spec] of Object.entries(drivetrainInputs)) {
    candidates.push({ ...base, [name]: lowEnd(spec) }, { ...base, [name]: spec.max });
  }
}
// A spinner with absurdly light wheels for strong motors: the stiffest design the tests know.
const RPM = Math.PI / 30;
candidates.push({
  ...DEMO_SPINNER,
  wheelInertia: 1e-8,
  motorRotorInertia: 0,
  motorCount: 8,
  motorKv: 50 * RPM,
  motorResistance: 1e-3,
  cellResistance: 0,
  currentLimit: 1000,
});
for (let i = 0; i < 400; i++) {
  const input = { driveType: random() < 0.5 ? "weapon" : "spinner" };
  for (const [name, spec] of Object.entries(drivetrainInputs)) input[name] = draw(spec);
  candidates.push(input);
}
let worst = null;
let most = null;
let refused = 0;
const stopped = new Map();
for (const input of candidates) {
  const start = performance.now();
  let result;
  try {
    result = simulateSpinUp(input, { series: false });
  } catch (error) {
    if (!(error instanceof CalcInputError)) throw error;
    refused++;
    continue;
  }
  const elapsed = performance.now() - start;
  if (result.endReason === "step-limit") {
    const why = /in \d+ steps/.test(result.warnings[0])
      ? "at the step count"
      : /switched/.test(result.warnings[0])
        ? "by grip switches"
        : "by a step shrunk to nothing";
    stopped.set(why, (stopped.get(why) ?? 0) + 1);
  }
  if (!worst || elapsed > worst.elapsed) worst = { elapsed, input, result };
  const steps = result.solver.acceptedSteps + result.solver.rejectedSteps;
  if (!most || steps > most.steps) most = { steps, elapsed, result };
}
const base = worst.input.driveType === "spinner" ? DEMO_SPINNER : DEMO_WEAPON;
const unusual = Object.keys(drivetrainInputs)
  .map((name) => [name, worst.input[name], Math.abs(Math.log10(Math.abs(worst.input[name] / base[name]) || Number.MIN_VALUE))])
  .filter(([, , distance]) => distance > 0.3)
  .sort((a, b) => b[2] - a[2])
  .slice(0, 4)
  .map(([name, value]) => `${name} ${Number(value.toPrecision(3))} ${siSymbol(drivetrainInputs[name])}`.trim());
const s = worst.result.solver;
console.log(
  `\nWorst case over ${candidates.length} designs (${refused} refused as beyond the model's reach; stopped by the step budget of ${MAX_TRIALS} steps: ${
    [...stopped].map(([why, n]) => `${n} ${why}`).join(", ") || "none"
  }):`,
);
console.log(
  `  ${ms(worst.elapsed)} for a ${worst.input.driveType}, ${s.acceptedSteps + s.rejectedSteps} steps, ended by ${worst.result.endReason} at ${worst.result.endTime.toPrecision(3)} s; ` +
    `furthest from the demo: ${unusual.join(", ") || "none"}`,
);
if (worst.result.warnings.length) console.log(`  "${worst.result.warnings.join(" ")}"`);
console.log(
  `  most steps: ${most.steps} in ${ms(most.elapsed)}, ended by ${most.result.endReason}${most.result.warnings.length ? `: "${most.result.warnings.join(" ")}"` : ""}`,
);
