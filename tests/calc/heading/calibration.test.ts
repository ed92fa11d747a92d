/**
 * The calibration fit's refusals and its smallest accepted input (calc/heading/calibration.ts):
 * a = r·ω² + b through readings made exactly from r = 0.02 m and b = 3 m/s².
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { fitCalibration } from "../../../calc/heading/calibration.ts";

const exact = (speeds: number[]) => speeds.map((w) => ({ angularSpeed: w, acceleration: 0.02 * w * w + 3 }));

describe("the calibration fit: what it accepts and refuses", () => {
  it("fits three readings at three different speeds, the fewest it takes", () => {
    // 100, 200, 300 rad/s → a = 0.02·ω² + 3 = 203, 803, 1803 m/s², on the line exactly
    const f = fitCalibration(exact([100, 200, 300]));
    expect(f.method).toBe("least-squares");
    expect(f.radius).toBeCloseTo(0.02, 12);
    expect(f.bias).toBeCloseTo(3, 9);
  });

  it("refuses two readings, naming rows and the count of different speeds", () => {
    expect(() => fitCalibration(exact([100, 200]))).toThrow("rows must be at least 3 readings at different speeds (got 2)");
  });

  it("refuses options that are not an object, by the name options", () => {
    const call = () => fitCalibration(exact([100, 200, 300]), 5 as unknown as object);
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow("options must be an object of named inputs (got 5)");
  });

  it("refuses readings that are not a list, by the name rows, without a unit", () => {
    let caught: unknown;
    try {
      fitCalibration("100,203" as unknown as []);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(CalcInputError);
    expect(caught).toMatchObject({ param: "rows", expected: "a list of readings", unit: "", message: 'rows must be a list of readings (got "100,203")' });
  });

  it("refuses an acceleration that is not a number by its row, in m/s²", () => {
    const rows = exact([100, 200, 300]);
    rows[2]!.acceleration = Number.NaN;
    let caught: unknown;
    try {
      fitCalibration(rows);
    } catch (e) {
      caught = e;
    }
    expect(caught).toMatchObject({ param: "rows[2].acceleration", unit: "m/s²", message: "rows[2].acceleration must be a finite number (got not a number)" });
  });

  it("checks the Huber tuning before counting the speeds, so a bad tuning is named even among too few readings", () => {
    expect(() => fitCalibration(exact([100, 200]), { huberTuning: 0 })).toThrow("huberTuning must be greater than 0 (got 0)");
  });
});
