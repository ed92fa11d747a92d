/**
 * Comparing drive designs: several variants simulated side by side, and a sweep of one input with
 * the best point marked.
 */
import { CalcInputError, requireInRange, requireNonNegative } from "../core/errors.ts";
import type { InputSpec } from "../core/inputs.ts";
import { type DrivetrainInput, type DrivetrainParameter, drivetrainInputs, validateDrivetrainInput } from "./inputs.ts";
import { requireWhole, siSymbol, requireInputObject } from "../core/spec-check.ts";
import type { SpinUpOptions, SpinUpResult, SpinUpVerdict } from "./results.ts";
import { simulateSpinUp } from "./simulate.ts";

// ---------------------------------------------------------------------------------------------
// Design comparison.

export interface DrivetrainComparison {
  /** One result per variant, in the order given. */
  results: SpinUpResult[];
  /** The variant that reaches its target first; null if none does. */
  fastestIndex: number | null;
  /** The variant with the highest top speed. */
  topSpeedIndex: number;
}

/**
 * Runs several design variants side by side (the same simulation as `simulateSpinUp`).
 *
 * @param variants 1 to 6 complete inputs (each with its own target)
 * @param options as in `simulateSpinUp`
 * @returns each variant's result, the fastest to its target and the one with the highest top speed
 *
 * Example: the demo weapon on 4 cells, on 6 cells, and on 4 cells with a 1.5:1 reduction reaches
 * 10 000 rpm in 1.01 s, 0.93 s and 1.22 s: the 6-cell variant is fastest and tops out highest.
 * Sources: as `simulateSpinUp`.
 */
export function compareDrivetrains(variants: readonly DrivetrainInput[], options: SpinUpOptions = {}): DrivetrainComparison {
  if (!Array.isArray(variants) || variants.length < 1 || variants.length > 6) {
    throw new CalcInputError({
      param: "variants",
      value: Array.isArray(variants) ? variants.length : variants,
      expected: "a list of 1 to 6 designs",
      unit: "",
    });
  }
  const results = variants.map((v) => simulateSpinUp(v, options));
  let fastestIndex: number | null = null;
  let topSpeedIndex = 0;
  results.forEach((r, i) => {
    if (r.timeToTarget !== null && (fastestIndex === null || r.timeToTarget < results[fastestIndex]!.timeToTarget!)) fastestIndex = i;
    if (r.topSpeed > results[topSpeedIndex]!.topSpeed) topSpeedIndex = i;
  });
  return { results, fastestIndex, topSpeedIndex };
}

export interface SweepPoint {
  /** The swept parameter's value [SI]. */
  value: number;
  /** [s], null if the target is not reached. */
  timeToTarget: number | null;
  /** [s], null if 90 % of the target is not reached. */
  timeTo90: number | null;
  /** [rad/s] */
  topSpeed: number;
  verdict: SpinUpVerdict;
  /** [A] */
  peakBatteryCurrent: number;
  /** Stored energy at the top speed [J]. */
  storedEnergy: number;
  /** True at the best point (see `DrivetrainSweep.optimumBy`). */
  isOptimum: boolean;
}

export interface DrivetrainSweep {
  parameter: DrivetrainParameter;
  points: SweepPoint[];
  /** Index of the best point: the shortest time to target, or, if no point reaches it, the highest top speed. */
  optimumIndex: number;
  optimumBy: "time-to-target" | "top-speed";
}

/** Throws unless `parameter` names one of the numeric spin-up inputs. */
function requireParameter(parameter: string): DrivetrainParameter {
  if (!Object.hasOwn(drivetrainInputs, parameter)) {
    throw new CalcInputError({ param: "parameter", value: parameter, expected: 'one of the spin-up inputs (e.g. "gearRatio")', unit: "" });
  }
  return parameter as DrivetrainParameter;
}

/**
 * The values a sweep visits: evenly spaced from `from` to `to`, or, for a whole-number input,
 * each whole number in the range once. Split out of `sweepDrivetrain` so that a page can run the
 * points in small batches and stay responsive.
 *
 * @param parameter the input to vary, any key of `drivetrainInputs`
 * @param from first value [SI], within the parameter's declared range
 * @param to last value [SI], within the declared range (may be below `from`)
 * @param points 2 to 200 values (default 50); a whole-number parameter takes each whole number in
 *   the range once, at most `points` of them, spread evenly
 * @returns the values [SI], in sweep order
 *
 * @example
 * sweepValues({ parameter: "gearRatio", from: 1, to: 4, points: 4 }).length // → 4 (1, 2, 3, 4)
 * sweepValues({ parameter: "cellCount", from: 2, to: 8, points: 50 }).length // → 7 (2, 3, 4, 5, 6, 7, 8)
 * Sources: as `simulateSpinUp`.
 */
export function sweepValues(input: { parameter: DrivetrainParameter | string; from: number; to: number; points?: number }): number[] {
  const { parameter, from, to, points = 50 } = requireInputObject(input);
  const name = requireParameter(parameter);
  const spec: InputSpec = drivetrainInputs[name];
  const unit = siSymbol(spec);
  const range = { min: spec.min, max: spec.max, minOpen: spec.minOpen };
  requireInRange("from", from, unit, range);
  requireInRange("to", to, unit, range);
  requireWhole("points", points, 2, 200);
  if (!spec.integer) return Array.from({ length: points }, (_, i) => (i === points - 1 ? to : from + ((to - from) * i) / (points - 1)));
  const lo = Math.ceil(Math.min(from, to));
  const hi = Math.floor(Math.max(from, to));
  const all: number[] = [];
  for (let v = lo; v <= hi; v++) all.push(v);
  if (all.length === 0) throw new CalcInputError({ param: "to", value: to, expected: `a range holding at least one whole number (from ${from})`, unit });
  // Stryker disable next-line ConditionalExpression,EqualityOperator: equivalent, with no more whole numbers than points the spread picks every one of them in order (steps of at most one index) and the Set drops the repeats
  let values = all.length <= points ? all : Array.from({ length: points }, (_, i) => all[Math.round((i * (all.length - 1)) / (points - 1))]!);
  values = [...new Set(values)];
  // Stryker disable next-line EqualityOperator: equivalent, from = to leaves at most one value, which reversing does not change
  if (from > to) values.reverse();
  return values;
}

/**
 * One point of a sweep: the base design with one input changed, simulated without a time series
 * (the same simulation as `simulateSpinUp`).
 *
 * @param base a complete input
 * @param parameter the input to change, any key of `drivetrainInputs`
 * @param value its value [SI], within its declared range
 * @returns times to 90 % and 100 % of the target [s] (null if not reached), top speed [rad/s],
 *   verdict, peak battery current [A] and stored energy at the top speed [J]; `isOptimum` false
 *
 * @example
 * sweepPoint({ base: DEMO_WEAPON, parameter: "gearRatio", value: 3 }) // → { timeToTarget: null, verdict: "falls-short", … } (tops out below 10 000 rpm)
 * Sources: as `simulateSpinUp`.
 */
export function sweepPoint(input: { base: DrivetrainInput; parameter: DrivetrainParameter | string; value: number }): SweepPoint {
  const { base, parameter, value } = requireInputObject(input);
  const name = requireParameter(parameter);
  // Stryker disable next-line ObjectLiteral,BooleanLiteral: equivalent, the time series is not read here and does not change the figures that are
  const r = simulateSpinUp({ ...base, [name]: value }, { series: false });
  return {
    value,
    timeToTarget: r.timeToTarget,
    timeTo90: r.timeTo90,
    topSpeed: r.topSpeed,
    verdict: r.verdict,
    peakBatteryCurrent: r.peakBatteryCurrent,
    storedEnergy: r.atTopSpeed.storedEnergy,
    isOptimum: false,
  };
}

/**
 * Marks the best point of a sweep: the shortest time to target; if no point reaches the target,
 * the highest top speed. Of points equal within the integration tolerance (1e-7), the first wins.
 * Sets `isOptimum` on that point (and clears it on the others).
 *
 * @param points one or more sweep points, in sweep order
 * @returns the index of the best point and the rule that chose it
 *
 * @example
 * markSweepOptimum([{ timeToTarget: null, topSpeed: 100 }, { timeToTarget: 1.2, topSpeed: 200 }, { timeToTarget: 1, topSpeed: 300 }, { timeToTarget: 1.1, topSpeed: 300 }]) // → { optimumIndex: 2, optimumBy: "time-to-target" }
 * Sources: as `simulateSpinUp`.
 */
export function markSweepOptimum(points: SweepPoint[]): { optimumIndex: number; optimumBy: DrivetrainSweep["optimumBy"] } {
  if (!Array.isArray(points) || points.length === 0) {
    throw new CalcInputError({ param: "points", value: Array.isArray(points) ? 0 : points, expected: "a list of at least one sweep point", unit: "" });
  }
  points.forEach(requireSweepPoint);
  const TIE = 1e-7;
  let optimumIndex = -1;
  points.forEach((p, i) => {
    p.isOptimum = false;
    if (p.timeToTarget !== null && (optimumIndex < 0 || p.timeToTarget < points[optimumIndex]!.timeToTarget! * (1 - TIE))) optimumIndex = i;
  });
  let optimumBy: DrivetrainSweep["optimumBy"] = "time-to-target";
  if (optimumIndex < 0) {
    optimumBy = "top-speed";
    optimumIndex = 0;
    points.forEach((p, i) => {
      if (p.topSpeed > points[optimumIndex]!.topSpeed * (1 + TIE)) optimumIndex = i;
    });
  }
  points[optimumIndex]!.isOptimum = true;
  return { optimumIndex, optimumBy };
}

/** Throws a `CalcInputError` naming the field unless point `i` has a finite top speed and a finite or null time to target. */
function requireSweepPoint(point: Pick<SweepPoint, "timeToTarget" | "topSpeed">, i: number): void {
  requireInputObject(point, `points[${i}]`);
  if (point.timeToTarget !== null) requireNonNegative(`points[${i}].timeToTarget`, point.timeToTarget, "s");
  requireNonNegative(`points[${i}].topSpeed`, point.topSpeed, "rad/s");
}

/** What a sweep's points add up to, for a one-line summary. */
export interface SweepSummary {
  /** Shortest time to target among the points [s]; null when none reaches it. */
  shortestTimeToTarget: number | null;
  /** Longest time to target among the points that reach it [s]; null when none does. */
  longestTimeToTarget: number | null;
  /** How many points never reach the target [-]. */
  missedCount: number;
  /** Lowest and highest top speed among the points [rad/s]. */
  lowestTopSpeed: number;
  highestTopSpeed: number;
}

/**
 * The extremes of a sweep: shortest and longest time to target, how many values miss the target,
 * and the range of top speeds (order statistics of the simulated points).
 *
 * Formula: $t_{min} = \min_i t_i$, $t_{max} = \max_i t_i$ over the points that reach the target;
 * $\Omega_{min}, \Omega_{max}$ over all points
 *
 * @param points one or more sweep points
 * @returns times [s] (null when no point reaches the target), a count [-], top speeds [rad/s]
 *
 * @example
 * summariseSweep([{ timeToTarget: null, topSpeed: 100 }, { timeToTarget: 1.2, topSpeed: 200 }, { timeToTarget: 1, topSpeed: 300 }]) // → { shortestTimeToTarget: 1, longestTimeToTarget: 1.2, missedCount: 1, … }
 * Sources: tukey-1977 (the extremes of a batch); the points themselves as `simulateSpinUp`.
 */
export function summariseSweep(points: readonly SweepPoint[]): SweepSummary {
  if (!Array.isArray(points) || points.length === 0) {
    throw new CalcInputError({ param: "points", value: Array.isArray(points) ? 0 : String(points), expected: "a list of at least one sweep point", unit: "" });
  }
  points.forEach(requireSweepPoint);
  // The extremes of each batch of figures, its least and greatest values (tukey-1977).
  const times = points.flatMap((p) => (p.timeToTarget === null ? [] : [p.timeToTarget]));
  const tops = points.map((p) => p.topSpeed);
  return {
    shortestTimeToTarget: times.length ? Math.min(...times) : null,
    longestTimeToTarget: times.length ? Math.max(...times) : null,
    missedCount: points.length - times.length,
    lowestTopSpeed: Math.min(...tops),
    highestTopSpeed: Math.max(...tops),
  };
}

/**
 * Varies one numeric input over a range and reports time to target and top speed at each value,
 * with the best point marked (the same simulation as `simulateSpinUp`, without time series):
 * `sweepValues`, then `sweepPoint` at each value, then `markSweepOptimum`.
 *
 * @param base a complete input; every field but `parameter` is held
 * @param parameter the input to vary, any key of `drivetrainInputs`
 * @param from first value [SI], within the parameter's declared range
 * @param to last value [SI], within the declared range (may be below `from`)
 * @param points 2 to 200 evenly spaced values (default 50); a whole-number parameter takes each
 *   whole number in the range once, at most `points` of them
 * @returns one point per value and the optimum
 *
 * Example: the demo weapon's reduction from 1 to 4 in 31 points: time to 10 000 rpm is shortest at
 * 2.0 (1.01 s); above 2.2 the motor can no longer reach 10 000 rpm, so those points report null.
 * Sources: as `simulateSpinUp`.
 */
export function sweepDrivetrain(input: {
  base: DrivetrainInput;
  parameter: DrivetrainParameter | string;
  from: number;
  to: number;
  points?: number;
}): DrivetrainSweep {
  const { base, parameter, from, to, points = 50 } = requireInputObject(input);
  validateDrivetrainInput(base);
  const name = requireParameter(parameter);
  const values = sweepValues({ parameter: name, from, to, points });
  const out = values.map((value) => sweepPoint({ base, parameter: name, value }));
  const { optimumIndex, optimumBy } = markSweepOptimum(out);
  return { parameter: name, points: out, optimumIndex, optimumBy };
}
