/**
 * The calibration plot's curves (calc/heading/calibration-inputs.ts): each line a = r ω² + b at evenly
 * spaced speeds, the exact ends, and the refusals of a missing fit, an empty speed range and a
 * fractional point count.
 */
import { describe, expect, it } from "vitest";
import { calibrationCurve, type CurveLines } from "../../../calc/heading/calibration-inputs.ts";
import { refusal } from "../../support/refusal.ts";

// Three different lines, each with an intercept, so that every one is read from its own fields.
const FIT: CurveLines = {
  leastSquares: { slope: 0.01, intercept: 2 },
  theilSen: { slope: 0.012, intercept: -1 },
  radius: 0.0127,
  bias: 1.96,
};

describe("the calibration curves", () => {
  it("puts each line a = r ω² + b at evenly spaced speeds (hand: 100, 150, 200 rad/s; ω² = 1e4, 22 500, 4e4 rad²/s²)", () => {
    const c = calibrationCurve({ fit: FIT, lowSpeed: 100, highSpeed: 200, points: 3 });
    expect(c.map((p) => p.angularSpeed)).toEqual([100, 150, 200]);
    // least squares 0.01 ω² + 2: 102, 227, 402 m/s²
    expect(c.map((p) => p.leastSquares)).toEqual([expect.closeTo(102, 12), expect.closeTo(227, 12), expect.closeTo(402, 12)]);
    // Theil–Sen 0.012 ω² − 1: 119, 269, 479 m/s²
    expect(c.map((p) => p.theilSen)).toEqual([expect.closeTo(119, 12), expect.closeTo(269, 12), expect.closeTo(479, 12)]);
    // recommended 0.0127 ω² + 1.96: 128.96, 287.71, 509.96 m/s²
    expect(c.map((p) => p.recommended)).toEqual([expect.closeTo(128.96, 12), expect.closeTo(287.71, 12), expect.closeTo(509.96, 12)]);
  });

  it("ends exactly at the high speed asked for, where low + (high − low) would round past it (0.2 + 0.7 = 0.8999999999999999)", () => {
    for (const points of [3, 61]) {
      const c = calibrationCurve({ fit: FIT, lowSpeed: 0.2, highSpeed: 0.9, points });
      expect(c[0]!.angularSpeed).toBe(0.2);
      expect(c.at(-1)!.angularSpeed).toBe(0.9);
    }
  });

  it("refuses a missing fit by name", () => {
    const error = refusal(() => calibrationCurve({ fit: null as unknown as CurveLines, lowSpeed: 0, highSpeed: 100 }));
    expect(error).toMatchObject({ param: "fit", value: null, unit: "" });
    expect(error.message).toBe("fit must be an object of named inputs (got null)");
  });

  it("refuses a high speed not above the low one, naming both, with the rule as data for a screen in other units", () => {
    const error = refusal(() => calibrationCurve({ fit: FIT, lowSpeed: 100, highSpeed: 50 }));
    expect(error).toMatchObject({
      param: "highSpeed",
      value: 50,
      unit: "rad/s",
      expected: "greater than lowSpeed (100 rad/s)",
      bound: { relation: "greater", limit: 100, kind: "angularSpeed", other: "lowSpeed" },
    });
    expect(error.message).toBe("highSpeed must be greater than lowSpeed (100 rad/s) (got 50 rad/s)");
  });

  it("refuses a fractional number of points by name", () => {
    const error = refusal(() => calibrationCurve({ fit: FIT, lowSpeed: 0, highSpeed: 100, points: 2.5 }));
    expect(error).toMatchObject({ param: "points", value: 2.5, expected: "a whole number", unit: "" });
    expect(error.message).toBe("points must be a whole number (got 2.5)");
  });
});
