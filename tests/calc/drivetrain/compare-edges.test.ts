/**
 * Comparing drive designs and sweeping one input, at their edges: six variants accepted, ties in
 * time to target and top speed going to the first, the optimum's tolerance band of 1e-7 in both
 * directions, the refusals of a bad sweep point or list by field, unit and wording, and a base that
 * is refused before any point is run.
 */
import { describe, expect, it } from "vitest";
import { compareDrivetrains, markSweepOptimum, summariseSweep, sweepDrivetrain, sweepValues, type SweepPoint } from "../../../calc/drivetrain/compare.ts";
import { DEMO_WEAPON } from "../../../calc/drivetrain/demo-robots.ts";
import { refusal } from "../../support/refusal.ts";

/** A sweep point with only the fields the optimum and the summary read (the rest demo values). */
const pt = (timeToTarget: number | null, topSpeed: number): SweepPoint => ({
  value: 1,
  timeToTarget,
  timeTo90: null,
  topSpeed,
  verdict: "falls-short",
  peakBatteryCurrent: 0,
  storedEnergy: 0,
  isOptimum: false,
});

describe("compareDrivetrains at its edges", () => {
  it("takes six variants, the most it allows, and refuses a seventh", () => {
    const six = Array.from({ length: 6 }, (_, i) => ({ ...DEMO_WEAPON, cellCount: 2 + i }));
    const c = compareDrivetrains(six, { series: false });
    expect(c.results).toHaveLength(6);
    // More cells, more voltage: the 7-cell variant tops out highest.
    expect(c.topSpeedIndex).toBe(5);
    const e = refusal(() => compareDrivetrains([...six, DEMO_WEAPON], { series: false }));
    expect({ param: e.param, value: e.value, expected: e.expected }).toEqual({ param: "variants", value: 7, expected: "a list of 1 to 6 designs" });
  });

  it("gives a tie in time to target and in top speed to the first of the tied variants", () => {
    const c = compareDrivetrains([DEMO_WEAPON, DEMO_WEAPON], { series: false });
    expect(c.results[0]!.timeToTarget).toBe(c.results[1]!.timeToTarget);
    expect(c.fastestIndex).toBe(0);
    expect(c.topSpeedIndex).toBe(0);
  });
});

describe("the sweep's optimum (markSweepOptimum): the first of points within 1e-7", () => {
  it("keeps the first point when a later one is longer, even by less than the band", () => {
    expect(markSweepOptimum([pt(1, 100), pt(1.1, 100)])).toEqual({ optimumIndex: 0, optimumBy: "time-to-target" });
    expect(markSweepOptimum([pt(1, 100), pt(1 + 5e-8, 100)]).optimumIndex).toBe(0);
  });

  it("keeps the first point when a later one is shorter by exactly the band, and moves when it is shorter by more", () => {
    expect(markSweepOptimum([pt(1, 100), pt(1 * (1 - 1e-7), 100)]).optimumIndex).toBe(0);
    expect(markSweepOptimum([pt(1, 100), pt(1 - 2e-7, 100)]).optimumIndex).toBe(1);
  });

  it("chooses by time whenever the first point reaches the target, even when another tops out higher", () => {
    const points = [pt(1, 100), pt(2, 200)];
    expect(markSweepOptimum(points)).toEqual({ optimumIndex: 0, optimumBy: "time-to-target" });
    expect(points.map((p) => p.isOptimum)).toEqual([true, false]);
  });

  it("with no point at the target, keeps the first of top speeds within 1e-7 and moves beyond", () => {
    expect(markSweepOptimum([pt(null, 100), pt(null, 100 * (1 + 1e-7))])).toEqual({ optimumIndex: 0, optimumBy: "top-speed" });
    expect(markSweepOptimum([pt(null, 100), pt(null, 100 * (1 + 2e-7))]).optimumIndex).toBe(1);
  });

  it("refuses a point that is not an object, a negative time and a negative top speed, by field and unit", () => {
    const notObject = refusal(() => markSweepOptimum([pt(1, 100), null as unknown as SweepPoint]));
    expect({ param: notObject.param, value: notObject.value, expected: notObject.expected }).toEqual({
      param: "points[1]",
      value: null,
      expected: "an object of named inputs",
    });
    const time = refusal(() => markSweepOptimum([pt(-1, 100)]));
    expect({ param: time.param, value: time.value, unit: time.unit }).toEqual({ param: "points[0].timeToTarget", value: -1, unit: "s" });
    const top = refusal(() => markSweepOptimum([pt(1, 100), pt(1, -5)]));
    expect({ param: top.param, value: top.value, unit: top.unit }).toEqual({ param: "points[1].topSpeed", value: -5, unit: "rad/s" });
  });
});

describe("summariseSweep's refusals", () => {
  it("refuses an empty list and a value that is not a list, naming the points", () => {
    const empty = refusal(() => summariseSweep([]));
    expect({ param: empty.param, value: empty.value, unit: empty.unit, expected: empty.expected }).toEqual({
      param: "points",
      value: 0,
      unit: "",
      expected: "a list of at least one sweep point",
    });
    const text = refusal(() => summariseSweep("none" as unknown as SweepPoint[]));
    expect({ param: text.param, value: text.value }).toEqual({ param: "points", value: "none" });
    expect(text.message).toBe('points must be a list of at least one sweep point (got "none")');
  });

  it("refuses a negative time to target by field and unit", () => {
    const e = refusal(() => summariseSweep([pt(1, 100), pt(-2, 100)]));
    expect({ param: e.param, value: e.value, unit: e.unit }).toEqual({ param: "points[1].timeToTarget", value: -2, unit: "s" });
  });
});

describe("sweeps: the parameter's name and the base design", () => {
  it("refuses a name that is not a spin-up input, saying what it takes", () => {
    const e = refusal(() => sweepValues({ parameter: "gearing", from: 1, to: 2 }));
    expect({ param: e.param, value: e.value, expected: e.expected }).toEqual({
      param: "parameter",
      value: "gearing",
      expected: 'one of the spin-up inputs (e.g. "gearRatio")',
    });
  });

  it("refuses a base that is out of range even in the swept input, before any point is run", () => {
    const e = refusal(() => sweepDrivetrain({ base: { ...DEMO_WEAPON, gearRatio: -1 }, parameter: "gearRatio", from: 1, to: 2, points: 2 }));
    expect({ param: e.param, value: e.value }).toEqual({ param: "gearRatio", value: -1 });
  });
});
