/**
 * Calibration rows written as text (calc/heading/calibration-text.ts): the refusals of the writer
 * and of its reading-without-reading twin, by the field they name. 1 rpm = π/30 rad/s, 1 °/s = π/180
 * rad/s (NIST SP 811); 1 gₙ = 9.806 65 m/s² (3rd CGPM, 1901).
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { calibrationRowsToCsv, readingOfWrittenRows } from "../../../calc/heading/calibration-text.ts";

describe("writing calibration rows as text: refusals", () => {
  it("names a default unit of another kind by its option", () => {
    expect(() => calibrationRowsToCsv([], { speedUnit: "mm" })).toThrow('speedUnit must be a unit of rotational speed (rad/s, rpm, rps, deg/s) (got "mm")');
    expect(() => calibrationRowsToCsv([], { accelerationUnit: "rpm" })).toThrow(
      'accelerationUnit must be a unit of acceleration (m/s2, gn, ft/s2) (got "rpm")',
    );
    expect(() => readingOfWrittenRows([], { accelerationUnit: "rpm" })).toThrow(
      'accelerationUnit must be a unit of acceleration (m/s2, gn, ft/s2) (got "rpm")',
    );
  });

  it("refuses a reading that is not a number, naming its row and field", () => {
    const call = () =>
      calibrationRowsToCsv([
        { angularSpeed: 100, acceleration: 300 },
        { angularSpeed: Number.NaN, acceleration: 300 },
      ]);
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow("rows[1].angularSpeed must be a finite number (got not a number)");
    expect(() => readingOfWrittenRows([{ angularSpeed: 100, acceleration: Number.POSITIVE_INFINITY }])).toThrow(
      "rows[0].acceleration must be a finite number (got infinity)",
    );
  });

  it("refuses a reading whose number in the written unit would overflow, showing the value as received", () => {
    // 1e308 rad/s ÷ (π/180) = 5.7e309 °/s, past the largest double (about 1.8e308)
    const call = () => calibrationRowsToCsv([{ angularSpeed: 1e308, acceleration: 0 }], { speedUnit: "deg/s" });
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow("rows[0].angularSpeed must be a finite number (got 1e+308)");
  });
});
