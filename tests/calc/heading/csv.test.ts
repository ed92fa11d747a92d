/**
 * The calibration file reader (calc/heading/csv.ts): its limits, how it finds the separator, the
 * header and the columns, and the words of every note and refusal a user sees beside the result.
 * Quoting follows RFC 4180 §2; units: 1 rpm = π/30 rad/s, 1 rev/s = 2π rad/s (NIST SP 811), and
 * 1 gₙ = 9.806 65 m/s² (3rd CGPM, 1901).
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { parseCalibrationCsv } from "../../../calc/heading/csv.ts";

const RPM = Math.PI / 30; // rad/s per rpm (NIST SP 811)
const GN = 9.80665; // m/s² per standard gravity (3rd CGPM, 1901)

describe("the calibration file reader's limits", () => {
  it("reads at most 20 000 lines and says the rest are skipped, on line 20 001", () => {
    const lines = Array.from({ length: 20001 }, (_, i) => `${i + 1},1`);
    const r = parseCalibrationCsv(lines.join("\n"));
    expect(r.rows).toHaveLength(20000);
    expect(r.rows.at(-1)).toMatchObject({ line: 20000, angularSpeed: 20000 * RPM });
    expect(r.problems).toEqual([{ line: 20001, text: "", reason: "more than 20000 lines; the rest are skipped" }]);
  });

  it("reads exactly 20 000 lines without a word, even when a line break, blank lines or spaces follow the last one", () => {
    const lines = Array.from({ length: 20000 }, (_, i) => `${i + 1},1`);
    for (const tail of ["", "\n", "\r\n", "\n\n   \n"]) {
      const r = parseCalibrationCsv(lines.join("\n") + tail);
      expect(r.rows).toHaveLength(20000);
      expect(r.problems).toEqual([]);
    }
  });

  it("shows a skipped line as found up to 60 characters, then an ellipsis", () => {
    const sixty = `${"x".repeat(58)},1`; // 58 + 2 = 60 characters
    const long = `${"y".repeat(70)},1`;
    const r = parseCalibrationCsv(`${sixty}\n${long}`);
    expect(r.problems.map((p) => p.text)).toEqual([sixty, `${"y".repeat(60)}…`]);
  });

  it("quotes a cell in a refusal up to 20 characters, then an ellipsis", () => {
    const r = parseCalibrationCsv(`${"a".repeat(20)},1\n${"b".repeat(21)},1`);
    expect(r.problems.map((p) => p.reason)).toEqual([
      `speed "${"a".repeat(20)}" must start with a number, e.g. 2400 rpm`,
      `speed "${"b".repeat(20)}…" must start with a number, e.g. 2400 rpm`,
    ]);
  });

  it("reads anything that is not text as no data at all, without throwing", () => {
    const r = parseCalibrationCsv(null as unknown as string);
    expect(r).toMatchObject({ rows: [], problems: [], separator: null, header: null });
    expect(r.notes).toEqual(["no data found (only blank lines and comments)"]);
  });

  it("reads no decimal comma in a text with no data", () => {
    expect(parseCalibrationCsv("\n# only a comment\n").decimalComma).toBe(false);
  });

  it("refuses a default acceleration unit of another kind, by name", () => {
    const call = () => parseCalibrationCsv("1,2", { accelerationUnit: "rpm" });
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow('accelerationUnit must be a unit of acceleration (m/s2, gn, ft/s2) (got "rpm")');
  });
});

describe("the calibration file reader's notes", () => {
  it("names the separator it found, and says when a comma is a decimal mark", () => {
    expect(parseCalibrationCsv("1200,31.5").notes[0]).toBe("columns separated by commas");
    expect(parseCalibrationCsv("1200;31,5").notes[0]).toBe("columns separated by semicolons; a comma is read as a decimal mark");
    expect(parseCalibrationCsv("1200\t31,5").notes[0]).toBe("columns separated by tabs; a comma is read as a decimal mark");
    expect(parseCalibrationCsv("1200 31.5").notes[0]).toBe("columns separated by spaces; a comma is read as a decimal mark");
  });

  it("says which column is which without a header, in the default units or the ones it is given", () => {
    expect(parseCalibrationCsv("1200,31.5").notes[1]).toBe("no header: column 1 is speed (rpm), column 2 is acceleration (gₙ)");
    expect(parseCalibrationCsv("1200,31.5", { speedUnit: "rps", accelerationUnit: "m/s2" }).notes[1]).toBe(
      "no header: column 1 is speed (rev/s), column 2 is acceleration (m/s²)",
    );
  });

  it("says which header column is which, and which units were not named but taken by default", () => {
    expect(parseCalibrationCsv("speed,reading (g)\n1200,31.5").notes[1]).toBe(
      "line 1 read as a header: speed in column 1 (rpm, no unit named, default), acceleration in column 2 (gₙ)",
    );
    expect(parseCalibrationCsv("rpm,reading\n1200,31.5").notes[1]).toBe(
      "line 1 read as a header: speed in column 1 (rpm), acceleration in column 2 (gₙ, no unit named, default)",
    );
  });

  it("says once, at the first line that has them, that columns past the ones used are ignored", () => {
    const r = parseCalibrationCsv("1200,31.5\n1500,49.2,first run\n1800,70.9,second run");
    expect(r.notes).toEqual([
      "columns separated by commas",
      "no header: column 1 is speed (rpm), column 2 is acceleration (gₙ)",
      "columns after column 2 are ignored (first seen on line 2)",
    ]);
    expect(r.rows).toHaveLength(3);
  });
});

describe("the calibration file reader's header and columns", () => {
  it("takes the first line for data, not a header, when any of its fields starts with a number", () => {
    const r = parseCalibrationCsv("1200,n/a\n1500,49.2");
    expect(r.header).toBeNull();
    expect(r.problems).toEqual([{ line: 1, text: "1200,n/a", reason: 'acceleration "n/a" must start with a number, e.g. 32 gₙ' }]);
    expect(r.rows.map((row) => row.line)).toEqual([2]);
  });

  it("takes a first line of quoted numbers with decimal commas for data, even where commas separate the columns", () => {
    const r = parseCalibrationCsv('"1200,5","31,5"\n1500,49.2');
    expect(r.header).toBeNull();
    expect(r.problems.map((p) => [p.line, p.reason])).toEqual([
      [1, 'speed "1200,5" holds a comma, which cannot be a decimal mark when commas separate the columns'],
    ]);
  });

  it("trims the spaces around each header field", () => {
    expect(parseCalibrationCsv("rpm, g\n1200, 31.5").header).toEqual({ line: 1, fields: ["rpm", "g"] });
  });

  it("reads a doubled quote inside a quoted field as one quote (RFC 4180 §2, rule 7)", () => {
    const r = parseCalibrationCsv('"speed ""reference""",g\n1200,31.5');
    expect(r.header?.fields).toEqual(['speed "reference"', "g"]);
    expect(r.rows).toHaveLength(1);
  });

  it("finds a unit joined to a word by an underscore: speed_rps, accel_m/s2", () => {
    const r = parseCalibrationCsv("speed_rps,accel_m/s2\n20,300");
    expect(r).toMatchObject({ speedUnit: "rps", accelerationUnit: "m/s2" });
    expect(r.rows[0]!.angularSpeed).toBeCloseTo(20 * 2 * Math.PI, 12); // 20 rev/s × 2π = 125.66 rad/s
    expect(r.rows[0]!.acceleration).toBe(300);
  });

  it("finds a unit written with a space between its factors in brackets, 'm s-2' (NIST SP 811 §6.1.6)", () => {
    const r = parseCalibrationCsv("rpm,a (m s-2)\n1200,300");
    expect(r.accelerationUnit).toBe("m/s2");
    expect(r.rows[0]!.acceleration).toBe(300);
  });

  it("finds a bracketed unit padded with spaces, as in a column-aligned export", () => {
    const r = parseCalibrationCsv(`rpm,a [${" ".repeat(13)}m s-2${" ".repeat(13)}]\n1200,300`);
    expect(r.accelerationUnit).toBe("m/s2");
    expect(r.rows[0]!.acceleration).toBe(300);
  });

  it("finds the columns by their words when no unit is named: speed, spin, … and reading, acc…", () => {
    const r = parseCalibrationCsv("time (s);reading;spin\n0,5;31,5;1200");
    expect(r).toMatchObject({ speedColumn: 2, accelerationColumn: 1, speedUnit: "rpm", accelerationUnit: "gn" });
    expect(r.rows[0]!.angularSpeed).toBeCloseTo(1200 * RPM, 12); // 1200 × π/30 = 125.66 rad/s
    expect(r.rows[0]!.acceleration).toBeCloseTo(31.5 * GN, 12); // 31.5 × 9.806 65 = 308.91 m/s²
  });

  it("takes a lone 'a', or 'a' followed by a bracket, for the acceleration", () => {
    expect(parseCalibrationCsv("speed;x;a\n1;2;3")).toMatchObject({ speedColumn: 0, accelerationColumn: 2 });
    expect(parseCalibrationCsv("time;speed;a (counts)\n1;2;3")).toMatchObject({ speedColumn: 1, accelerationColumn: 2 });
  });

  it("does not take a word that merely starts with, ends in or holds the letter a for the acceleration", () => {
    for (const other of ["delta", "axis", "data (raw)"]) {
      expect(parseCalibrationCsv(`speed;${other};a\n1;2;3`), other).toMatchObject({ speedColumn: 0, accelerationColumn: 2 });
    }
  });

  it("puts the speed in the first column the acceleration leaves, when only the acceleration is named", () => {
    expect(parseCalibrationCsv("note;reading\n1200;31,5")).toMatchObject({ speedColumn: 0, accelerationColumn: 1 });
    expect(parseCalibrationCsv("reading;note\n31,5;1200")).toMatchObject({ speedColumn: 1, accelerationColumn: 0 });
    expect(parseCalibrationCsv("reading;note\n31,5;1200").rows[0]!.angularSpeed).toBeCloseTo(1200 * RPM, 12);
  });

  it("puts the acceleration in the first column the speed leaves, when only the speed is named", () => {
    expect(parseCalibrationCsv("speed;note\n1200;31,5")).toMatchObject({ speedColumn: 0, accelerationColumn: 1 });
    expect(parseCalibrationCsv("note;speed\n31,5;1200")).toMatchObject({ speedColumn: 1, accelerationColumn: 0 });
  });

  it("reads a header of one acceleration field without throwing, and asks each line for two columns", () => {
    const r = parseCalibrationCsv("accel_g\n31.5\n49.2");
    expect(r).toMatchObject({ speedColumn: 1, accelerationColumn: 0, accelerationUnit: "gn", rows: [] });
    expect(r.problems.map((p) => [p.line, p.reason])).toEqual([
      [2, "expected at least 2 columns, found 1"],
      [3, "expected at least 2 columns, found 1"],
    ]);
  });
});

describe("the calibration file reader's cells", () => {
  it("counts a line of separators only as one empty column", () => {
    const r = parseCalibrationCsv("1200,31.5\n,\n1500,49.2");
    expect(r.problems).toEqual([{ line: 2, text: ",", reason: "expected at least 2 columns, found 1" }]);
  });

  it("reads '1,500' as 1.5 where a comma is a decimal mark, not as ambiguous", () => {
    const r = parseCalibrationCsv("1200;1,500");
    expect(r.problems).toEqual([]);
    expect(r.rows[0]!.acceleration).toBeCloseTo(1.5 * GN, 12); // 1.5 × 9.806 65 = 14.709 975 m/s²
  });

  it("leaves a cell with a point and a comma to the number reader, which reads what follows the number as a unit", () => {
    const r = parseCalibrationCsv("1.234,5;31,5");
    expect(r.problems.map((p) => p.reason)).toEqual(['speed "1.234,5" has a unit ",5" that is not a rotational speed unit; use rad/s, rpm, rev/s, °/s']);
  });

  it("leaves a cell with two commas to the number reader, which finds its first comma ambiguous", () => {
    const r = parseCalibrationCsv("1200;1,000,000");
    expect(r.problems.map((p) => p.reason)).toEqual([
      'acceleration "1,000,000" is ambiguous: write 1000 or 1.000 (a comma can be a decimal mark or a thousands separator)',
    ]);
  });
});
