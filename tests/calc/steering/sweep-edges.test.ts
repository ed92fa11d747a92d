/**
 * The window-and-depth sweep: its refusals, default grid and time, feasibility against the duty
 * headroom, and the best cell (calc/steering/sweep.ts), from the mutation report.
 */
import { describe, expect, it } from "vitest";
import { DEMO_STEERING_SPINNER } from "../../../calc/steering/inputs.ts";
import { SteeringModel } from "../../../calc/steering/model.ts";
import { startSteeringSweep, sweepSteering } from "../../../calc/steering/sweep.ts";
import { refusal } from "../../support/refusal.ts";

const D = { ...DEMO_STEERING_SPINNER };
const DEG = Math.PI / 180;
const close = (actual: number, expected: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-12 * Math.abs(expected));

describe("the sweep refuses a bad grid before the first cell", () => {
  it("refuses a missing argument object as args", () => {
    expect(refusal(() => startSteeringSweep(undefined as never)).message).toBe("args must be an object of named inputs (got nothing)");
  });

  it("takes 24 widths and refuses 25 or none, giving the count", () => {
    expect(startSteeringSweep({ input: D, windowWidths: Array.from({ length: 24 }, () => 1), depths: [0.1] }).total).toBe(24);
    const many = refusal(() => startSteeringSweep({ input: D, windowWidths: Array.from({ length: 25 }, () => 1) }));
    expect(many.param).toBe("windowWidths");
    expect(many.value).toBe(25);
    expect(many.expected).toBe("a list of 1 to 24 values");
    expect(many.unit).toBe("");
    const none = refusal(() => startSteeringSweep({ input: D, depths: [] }));
    expect(none.param).toBe("depths");
    expect(none.value).toBe(0);
  });

  it("refuses a zero width in rad, and a width past half a turn only with the opposite window on", () => {
    const zero = refusal(() => startSteeringSweep({ input: D, windowWidths: [1, 0] }));
    expect(zero.message).toBe("windowWidths[1] must be greater than 0 rad and at most 3.141592653589793 rad (got 0 rad)");
    expect(startSteeringSweep({ input: D, windowWidths: [Math.PI] }).total).toBe(6);
    expect(refusal(() => startSteeringSweep({ input: D, windowWidths: [3.2] })).param).toBe("windowWidths[0]");
    const addOnly = { ...D, oppositeWindow: 0 };
    expect(startSteeringSweep({ input: addOnly, windowWidths: [3.2, 2 * Math.PI] }).total).toBe(12);
    expect(refusal(() => startSteeringSweep({ input: addOnly, windowWidths: [6.3] })).param).toBe("windowWidths[0]");
  });
});

describe("the sweep's grid and time", () => {
  it("runs each cell for the smaller of the input's time and 0.4 s", () => {
    expect(sweepSteering({ input: { ...D, duration: 0.1 }, windowWidths: [2], depths: [0.1] }).duration).toBe(0.1);
    expect(startSteeringSweep({ input: D, windowWidths: [2], depths: [0.1] }).step()?.duration).toBe(0.4);
  });

  it("tries 7 widths from 30° to 300° in 45° steps with the add window only, and 6 depths from 0.05 to 0.3 in steps of 0.05", () => {
    const sweep = sweepSteering({ input: { ...D, oppositeWindow: 0 }, depths: [0.05], duration: 0.05 });
    [30, 75, 120, 165, 210, 255, 300].forEach((deg, i) => {
      close(sweep.windowWidths[i]!, deg * DEG);
    });
    expect(sweep.windowWidths).toHaveLength(7);
    const run = startSteeringSweep({ input: D, windowWidths: [2], duration: 0.05 });
    expect(run.total).toBe(6);
    let done = null;
    while (!done) done = run.step();
    [0.05, 0.1, 0.15, 0.2, 0.25, 0.3].forEach((d, j) => {
      close(done.depths[j]!, d);
    });
  });
});

describe("the sweep's feasible cells and its best", () => {
  // The headroom is the duty left above and, with the opposite window on, below the base duty.
  const base = new SteeringModel(D).baseDuty;

  it("runs a depth equal to the headroom and leaves a deeper one out, with no speed, error or spin lost", () => {
    const headroom = Math.min(1 - base, base);
    const sweep = sweepSteering({ input: D, windowWidths: [2], depths: [headroom, headroom * 1.001], duration: 0.05 });
    expect(sweep.cells[0]![0]!.feasible).toBe(true);
    expect(sweep.cells[0]![1]).toEqual({
      windowWidth: 2,
      depth: headroom * 1.001,
      feasible: false,
      speed: null,
      directionError: null,
      spinLost: null,
      isBest: false,
    });
  });

  it("with the add window only, runs depths up to 1 − base duty, past the base duty itself (spinning at 150 rad/s, where the base duty is under a half)", () => {
    const addOnly = { ...D, spinSpeed: 150, oppositeWindow: 0 };
    const baseAdd = new SteeringModel(addOnly).baseDuty;
    expect(1 - baseAdd).toBeGreaterThan(baseAdd);
    const sweep = sweepSteering({ input: addOnly, windowWidths: [2], depths: [1 - baseAdd, (1 - baseAdd) * 1.001], duration: 0.05 });
    expect(sweep.cells[0]!.map((c) => c.feasible)).toEqual([true, false]);
  });

  it("with the opposite window on, stops at the base duty itself when it is under a half (spinning at 150 rad/s): the opposite window takes the duty down by the depth", () => {
    const slow = { ...D, spinSpeed: 150 };
    const baseSlow = new SteeringModel(slow).baseDuty;
    expect(baseSlow).toBeLessThan(0.5);
    const sweep = sweepSteering({ input: slow, windowWidths: [2], depths: [baseSlow, baseSlow * 1.001], duration: 0.05 });
    expect(sweep.cells[0]!.map((c) => c.feasible)).toEqual([true, false]);
  });

  it("has no best cell when no cell is feasible", () => {
    const sweep = sweepSteering({ input: D, windowWidths: [2], depths: [1], duration: 0.05 });
    expect(sweep.best).toBeNull();
    expect(sweep.cells[0]![0]!.isBest).toBe(false);
  });

  it("marks the first of two equally fast cells as the best", () => {
    const sweep = sweepSteering({ input: D, windowWidths: [2, 2], depths: [0.1], duration: 0.05 });
    expect(sweep.cells[0]![0]!.speed).toBe(sweep.cells[1]![0]!.speed);
    expect(sweep.best).toEqual({ row: 0, column: 0 });
    expect(sweep.cells.map((r) => r[0]!.isBest)).toEqual([true, false]);
  });

  it("marks a faster later cell as the best: a 120° window outruns a 30° one (the push's fundamental grows as sin(w/2), oppenheim-willsky-signals §3.3)", () => {
    const sweep = sweepSteering({ input: D, windowWidths: [30 * DEG, 120 * DEG], depths: [0.2], duration: 0.2 });
    expect(sweep.best).toEqual({ row: 1, column: 0 });
  });
});
