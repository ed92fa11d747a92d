/**
 * Calibration rows as text for a URL (calc/heading/calibration-rows.ts): the 500-reading limit both
 * ways, the refusals of bad rows by position, and what the reader says about each piece it cannot
 * read (a speed that is no number, a number past the largest double, a long piece clipped).
 */
import { describe, expect, it } from "vitest";
import { CALIBRATION_ROWS_MAX, decodeCalibrationRows, encodeCalibrationRows } from "../../../calc/heading/calibration-rows.ts";
import type { CalibrationRow } from "../../../calc/heading/calibration.ts";
import { refusal } from "../../support/refusal.ts";

const ROW: CalibrationRow = { angularSpeed: 0, acceleration: 0 };

describe("writing rows", () => {
  it("writes up to 500 readings and refuses a 501st by name, without a unit", () => {
    expect(CALIBRATION_ROWS_MAX).toBe(500);
    const text = encodeCalibrationRows(Array<CalibrationRow>(500).fill(ROW));
    expect(text.split(",")).toHaveLength(500);
    expect(text.startsWith("v1:0:0,0:0")).toBe(true);
    const error = refusal(() => encodeCalibrationRows(Array<CalibrationRow>(501).fill(ROW)));
    expect(error).toMatchObject({ param: "rows", value: 501, expected: "at most 500 readings", unit: "" });
    expect(error.message).toBe("rows must be at most 500 readings (got 501)");
  });

  it("refuses rows that are not a list by name", () => {
    expect(refusal(() => encodeCalibrationRows("1200:31.5" as unknown as CalibrationRow[]))).toMatchObject({ param: "rows", expected: "a list" });
  });

  it("names the bad row by its position and field, in its SI unit", () => {
    expect(refusal(() => encodeCalibrationRows([ROW, null as unknown as CalibrationRow]))).toMatchObject({ param: "rows[1]", value: null });
    expect(refusal(() => encodeCalibrationRows([ROW, { angularSpeed: -1, acceleration: 0 }]))).toMatchObject({
      param: "rows[1].angularSpeed",
      value: -1,
      unit: "rad/s",
      expected: "0 rad/s or more",
    });
    expect(refusal(() => encodeCalibrationRows([ROW, { angularSpeed: 1, acceleration: Number.NaN }]))).toMatchObject({
      param: "rows[1].acceleration",
      unit: "m/s²",
      expected: "a finite number",
    });
  });
});

describe("reading rows", () => {
  it("reads the first 500 readings and reports, once, where the rest begin", () => {
    for (const count of [501, 502]) {
      const d = decodeCalibrationRows(`v1:${Array<string>(count).fill("1200:31.5").join(",")}`);
      expect(d.rows).toHaveLength(500);
      expect(d.problems).toEqual([{ piece: 501, text: "1200:31.5", reason: "more than 500 readings; the rest are skipped" }]);
    }
    expect(decodeCalibrationRows(`v1:${Array<string>(500).fill("1200:31.5").join(",")}`)).toMatchObject({ rows: { length: 500 }, problems: [] });
  });

  it("says when a speed is no number, and keeps reading", () => {
    const d = decodeCalibrationRows("v1:abc:5,1200:31.5");
    expect(d.rows).toHaveLength(1);
    expect(d.problems).toEqual([{ piece: 1, text: "abc:5", reason: 'speed "abc" is not a number' }]);
  });

  it("says when a speed or reading is written as a number but passes the largest double (1e400 rpm, 2e308 g), not that it is no number", () => {
    const d = decodeCalibrationRows("v1:1e400:5,1200:2e308,-1E+400:1,1200:31.5");
    expect(d.rows).toHaveLength(1);
    expect(d.problems).toEqual([
      { piece: 1, text: "1e400:5", reason: "number too large" },
      { piece: 2, text: "1200:2e308", reason: "number too large" },
      { piece: 3, text: "-1E+400:1", reason: "number too large" },
    ]);
    // an exponent on no number is still no number
    for (const speed of ["xe400", "e400", ".e400"]) expect(decodeCalibrationRows(`v1:${speed}:5`).problems[0]!.reason).toBe(`speed "${speed}" is not a number`);
  });

  it("shows a piece of up to 40 characters whole, and a longer one clipped to 40 with an ellipsis", () => {
    const forty = "x".repeat(40);
    expect(decodeCalibrationRows(`v1:${forty}`).problems[0]).toEqual({ piece: 1, text: forty, reason: "expected speed:acceleration (rpm:g)" });
    expect(decodeCalibrationRows(`v1:${forty}yz`).problems[0]!.text).toBe(`${forty}…`);
  });

  it("reads spaces around the text and after each comma as nothing", () => {
    const d = decodeCalibrationRows("  v1:1200:31.5, 1800:70.9  ");
    expect(d).toMatchObject({ version: 1, problems: [] });
    expect(d.rows).toHaveLength(2);
  });

  it("takes a version tag only at the start: a second link pasted behind the first is a bad piece, not a tag", () => {
    const d = decodeCalibrationRows("1200:31.5,v1:1800:70.9");
    expect(d.version).toBeNull();
    expect(d.rows).toHaveLength(1);
    expect(d.problems).toEqual([
      { piece: 0, text: "", reason: "no version tag; read as v1" },
      { piece: 2, text: "v1:1800:70.9", reason: "expected speed:acceleration (rpm:g)" },
    ]);
  });

  it("reads a version of several digits and refuses it as unknown", () => {
    expect(decodeCalibrationRows("v12:1200:31.5")).toEqual({
      version: null,
      rows: [],
      problems: [{ piece: 0, text: "v12:", reason: "unknown version 12; this reader knows v1" }],
    });
  });

  it("reads anything that is not text as empty text, without a problem", () => {
    for (const value of [null, undefined, 42]) expect(decodeCalibrationRows(value as unknown as string)).toEqual({ version: 1, rows: [], problems: [] });
  });
});
