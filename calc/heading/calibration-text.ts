/**
 * Calibration rows written as text: the CSV the calibration page shows and offers for download,
 * and — without running the reader — exactly what `parseCalibrationCsv` (calc/heading/csv.ts) would make of
 * that text. A page opened from a link shows rows it wrote itself, so it needs the reader only
 * once someone edits the text; the reader then loads on that first edit.
 */
import { CalcInputError } from "../core/errors.ts";
import type { CalibrationRow } from "./calibration.ts";
import type { CalibrationCsv, CalibrationCsvOptions } from "./csv.ts";
import { type UnitId, unitDef } from "../core/units.ts";
import { requireUnitOfKind } from "../core/unit-tools.ts";

/** The rows as written: text lines and the numbers a reader gets back from them (six significant figures). */
function written(rows: readonly CalibrationRow[], options: CalibrationCsvOptions) {
  const speedUnit = options.speedUnit ?? "rpm";
  const accelerationUnit = options.accelerationUnit ?? "gn";
  requireUnitOfKind("speedUnit", speedUnit, "angularSpeed");
  requireUnitOfKind("accelerationUnit", accelerationUnit, "acceleration");
  const round = (value: number, unit: UnitId, param: string): number => {
    const n = Number((value / unitDef(unit).factor).toPrecision(6));
    if (!Number.isFinite(n)) throw new CalcInputError({ param, value, expected: "a finite number", unit: "" });
    return n;
  };
  const values = rows.map(
    (row, i) => [round(row.angularSpeed, speedUnit, `rows[${i}].angularSpeed`), round(row.acceleration, accelerationUnit, `rows[${i}].acceleration`)] as const,
  );
  const header = [`speed (${unitDef(speedUnit).symbol})`, `reading (${unitDef(accelerationUnit).symbol})`];
  return { speedUnit, accelerationUnit, values, header };
}

/**
 * Writes calibration rows as text that `parseCalibrationCsv` reads back: a header naming the units,
 * then one "speed,reading" line per row, six significant figures (rfc-4180 §2 layout; units by
 * nist-sp811 and cgpm-1901 through calc/core/units.ts).
 *
 * Formula: value = SI value / unit factor, to six significant figures
 *
 * @param rows readings [rad/s, m/s²]; each value finite
 * @param options speedUnit (default "rpm") and accelerationUnit (default "gn") to write in
 * @returns the text, e.g. "speed (rpm),reading (g)\n1200,31.5\n"
 *
 * Example: one row of 125.664 rad/s and 308.911 m/s² → "speed (rpm),reading (g)\n1200,31.5\n".
 * Sources: rfc-4180, nist-sp811, cgpm-1901.
 */
export function calibrationRowsToCsv(rows: readonly CalibrationRow[], options: CalibrationCsvOptions = {}): string {
  const { values, header } = written(rows, options);
  return `${header.join(",")}\n${values.map(([w, a]) => `${w},${a}\n`).join("")}`;
}

/**
 * What `parseCalibrationCsv` returns for the text `calibrationRowsToCsv(rows, options)` writes,
 * when that text starts on line `headerLine` (lines above it blank or comments), computed without
 * reading the text (rfc-4180, nist-sp811, cgpm-1901 as in the writer and the reader).
 *
 * Formula: row i on line headerLine + 1 + i; ω = n_ω × unit factor, a = n_a × unit factor, with
 * n the six-significant-figure numbers written
 *
 * @param rows readings [rad/s, m/s²]; each value finite
 * @param options the units the text is written in (defaults "rpm", "gn")
 * @param headerLine 1-based line of the header [-] (default 1)
 * @returns the reading of that text, equal to the reader's result field for field
 *
 * Example: one row of 1200 rpm and 31.5 g under a header on line 2 → one row on line 3, notes
 * "columns separated by commas" and the header line. Sources: rfc-4180, nist-sp811, cgpm-1901.
 */
export function readingOfWrittenRows(rows: readonly CalibrationRow[], options: CalibrationCsvOptions = {}, headerLine = 1): CalibrationCsv {
  const { speedUnit, accelerationUnit, values, header } = written(rows, options);
  return {
    rows: values.map(([w, a], i) => ({
      line: headerLine + 1 + i,
      angularSpeed: w * unitDef(speedUnit).factor,
      acceleration: a * unitDef(accelerationUnit).factor,
    })),
    problems: [],
    separator: ",",
    decimalComma: false,
    header: { line: headerLine, fields: header },
    speedColumn: 0,
    accelerationColumn: 1,
    speedUnit,
    accelerationUnit,
    notes: [
      "columns separated by commas",
      `line ${headerLine} read as a header: speed in column 1 (${unitDef(speedUnit).symbol}), acceleration in column 2 (${unitDef(accelerationUnit).symbol})`,
    ],
  };
}
