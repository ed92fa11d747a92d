import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { CalcInputError, isSourceKey, rpmToRadPerSecond, STANDARD_GRAVITY } from "#calc";
import { parseCalibrationCsv } from "../../calc/heading/csv.ts";
import { calibrationRowsToCsv, readingOfWrittenRows } from "../../calc/heading/calibration-text.ts";
import { readFileSync } from "node:fs";

const rpm = rpmToRadPerSecond;
const g = (x: number) => x * STANDARD_GRAVITY;

describe("reading calibration text", () => {
  it("reads a comma-separated file with a header naming rpm and g", () => {
    const r = parseCalibrationCsv("speed_rpm,accel_g\n1200,31.5\n1800,70.9\n");
    expect(r.separator).toBe(",");
    expect(r.decimalComma).toBe(false);
    expect(r.header).toEqual({ line: 1, fields: ["speed_rpm", "accel_g"] });
    expect(r.rows).toHaveLength(2);
    expect(r.rows[0]!.angularSpeed).toBeCloseTo(rpm(1200), 12);
    expect(r.rows[1]!.acceleration).toBeCloseTo(g(70.9), 12);
    expect(r.problems).toEqual([]);
  });

  it("reads semicolons with decimal commas, and keeps line numbers past blanks and comments", () => {
    const r = parseCalibrationCsv("# spin test, bench 2\nrpm;g\n\n1200;31,5\n# redo\n1800;70,9 # windy\n");
    expect(r.separator).toBe(";");
    expect(r.decimalComma).toBe(true);
    expect(r.rows.map((row) => row.line)).toEqual([4, 6]);
    expect(r.rows[0]!.acceleration).toBeCloseTo(g(31.5), 12);
    expect(r.rows[1]!.acceleration).toBeCloseTo(g(70.9), 12);
  });

  it("reads tabs with decimal commas and no header, in the default units", () => {
    const r = parseCalibrationCsv("1200\t31,5\r\n1800\t70,9\r\n");
    expect(r).toMatchObject({ separator: "\t", decimalComma: true, header: null, speedUnit: "rpm", accelerationUnit: "gn" });
    expect(r.rows).toHaveLength(2);
  });

  it("reads space-separated columns", () => {
    const r = parseCalibrationCsv("1200 31.5\n1800   70.9");
    expect(r.separator).toBe("whitespace");
    expect(r.rows).toHaveLength(2);
  });

  it("takes the units from the header, and finds the columns by what they hold", () => {
    const r = parseCalibrationCsv("a [m/s2]; ω (rad/s); note\n300;100;first\n1200;200;second\n");
    expect(r).toMatchObject({ speedColumn: 1, accelerationColumn: 0, speedUnit: "rad/s", accelerationUnit: "m/s2" });
    expect(r.rows[0]).toMatchObject({ angularSpeed: 100, acceleration: 300 });
    expect(r.notes.some((n) => n.startsWith("columns after column 2 are ignored"))).toBe(true);
  });

  it("uses the default units it is given when the header names none", () => {
    const r = parseCalibrationCsv("speed,acceleration\n100,300\n", { speedUnit: "rad/s", accelerationUnit: "m/s2" });
    expect(r.rows[0]).toMatchObject({ angularSpeed: 100, acceleration: 300 });
    expect(r.notes.join(" ")).toMatch(/no unit named, default/);
  });

  it("accepts a unit written in the cell itself", () => {
    const r = parseCalibrationCsv("20 rev/s, 300 m/s2\n");
    expect(r.rows[0]!.angularSpeed).toBeCloseTo(40 * Math.PI, 12);
    expect(r.rows[0]!.acceleration).toBeCloseTo(300, 12);
  });

  it("handles a byte-order mark, quoted fields and a trailing separator", () => {
    const r = parseCalibrationCsv('\uFEFF"rpm","g"\n"1200","31.5",\n');
    expect(r.header?.fields).toEqual(["rpm", "g"]);
    expect(r.rows).toHaveLength(1);
  });

  it("reports every malformed row by line number with a reason, and skips it", () => {
    const text = ["rpm,g", "1200,31.5", "1500", "abc,40", "-100,2", '"1800,70.9"', '2100,"12', "2400,", "2700,3e999"].join("\n");
    const r = parseCalibrationCsv(text);
    expect(r.rows.map((row) => row.line)).toEqual([2]);
    expect(r.problems.map((p) => [p.line, p.reason])).toEqual([
      [3, "expected at least 2 columns, found 1"],
      [4, 'speed "abc" must start with a number, e.g. 2400 rpm'],
      [5, "speed must be 0 or more"],
      [6, "expected at least 2 columns, found 1"],
      [7, "a double quote is not closed"],
      [8, "expected at least 2 columns, found 1"],
      [9, 'acceleration "3e999" must be a finite number, e.g. 32 gₙ'],
    ]);
  });

  it("refuses a comma inside a value when commas separate the columns", () => {
    const r = parseCalibrationCsv('1200,"31,5"\n');
    expect(r.problems[0]!.reason).toBe('acceleration "31,5" holds a comma, which cannot be a decimal mark when commas separate the columns');
  });

  it("reports an empty cell as empty", () => {
    const r = parseCalibrationCsv("1200;;\n1300; ;5\n");
    expect(r.problems.map((p) => p.reason)).toEqual(["expected at least 2 columns, found 1", "acceleration is empty"]);
  });

  it("says so when there is no data at all", () => {
    const r = parseCalibrationCsv("# nothing yet\n\n");
    expect(r).toMatchObject({ rows: [], problems: [], separator: null });
    expect(r.notes).toEqual(["no data found (only blank lines and comments)"]);
  });

  it("refuses a default unit of the wrong kind, by name", () => {
    const call = () => parseCalibrationCsv("1,2", { speedUnit: "mm" });
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow('speedUnit must be a unit of rotational speed (rad/s, rpm, rps, deg/s) (got "mm")');
  });
});

describe("reading calibration text: properties", () => {
  const csvish = fc
    .array(
      fc.oneof(
        fc.stringMatching(/^[-+0-9.,;\t "#a-z/()[\]]{0,24}$/),
        fc.tuple(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: -1e4, max: 1e4, noNaN: true })).map(([a, b]) => `${a},${b}`),
      ),
      { maxLength: 12 },
    )
    .map((lines) => lines.join("\n"));

  it("never throws on any text (fast-check)", () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: "binary" }), csvish), (text) => {
        const r = parseCalibrationCsv(text);
        return r.rows.every((row) => Number.isFinite(row.angularSpeed) && row.angularSpeed >= 0 && Number.isFinite(row.acceleration));
      }),
      { numRuns: 400 },
    );
  });

  it("accounts for every line that holds anything: a row, a problem, or the header (fast-check)", () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: "binary" }), csvish), (text) => {
        const r = parseCalibrationCsv(text);
        const contentLines = text
          .replace(/^\uFEFF/, "")
          .split(/\r\n|\r|\n/)
          .filter((l) => l.replace(/#.*$/, "").trim() !== "").length;
        return r.rows.length + r.problems.length + (r.header ? 1 : 0) === contentLines;
      }),
      { numRuns: 400 },
    );
  });

  it("reads back rows written in any supported layout (fast-check)", () => {
    const layout = fc.record({
      sep: fc.constantFrom(",", ";", "\t"),
      header: fc.boolean(),
      crlf: fc.boolean(),
    });
    const rows = fc.array(fc.tuple(fc.integer({ min: 0, max: 30000 }), fc.double({ min: -100, max: 1000, noNaN: true })), { minLength: 1, maxLength: 15 });
    fc.assert(
      fc.property(layout, rows, ({ sep, header, crlf }, data) => {
        const num = (v: number) => (sep === "," ? String(v) : String(v).replace(".", ","));
        const lines = data.map(([s, a]) => `${s}${sep}${num(a)}`);
        if (header) lines.unshift(`speed (rpm)${sep}reading (g)`);
        const r = parseCalibrationCsv(lines.join(crlf ? "\r\n" : "\n"));
        if (r.problems.length > 0 || r.rows.length !== data.length) return false;
        return r.rows.every(
          (row, i) =>
            Math.abs(row.angularSpeed - rpm(data[i]![0])) <= 1e-12 * rpm(data[i]![0]) &&
            Math.abs(row.acceleration - g(data[i]![1])) <= 1e-12 * Math.abs(g(data[i]![1])),
        );
      }),
      { numRuns: 200 },
    );
  });
});

describe("writing rows back as text", () => {
  it("writes a header naming the units and one line per row", () => {
    expect(calibrationRowsToCsv([{ angularSpeed: rpm(1200), acceleration: g(31.5) }])).toBe("speed (rpm),reading (gₙ)\n1200,31.5\n");
    expect(calibrationRowsToCsv([], { speedUnit: "rad/s", accelerationUnit: "m/s2" })).toBe("speed (rad/s),reading (m/s²)\n");
  });

  it("is read back by the parser, header and all, to six significant figures (fast-check)", () => {
    const row = fc.record({ angularSpeed: fc.double({ min: 0, max: 5000, noNaN: true }), acceleration: fc.double({ min: -1e4, max: 1e5, noNaN: true }) });
    const units = fc.constantFrom(["rpm", "gn"], ["rps", "m/s2"], ["rad/s", "ft/s2"]) as fc.Arbitrary<["rpm" | "rps" | "rad/s", "gn" | "m/s2" | "ft/s2"]>;
    fc.assert(
      fc.property(fc.array(row, { maxLength: 30 }), units, (rows, [speedUnit, accelerationUnit]) => {
        const back = parseCalibrationCsv(calibrationRowsToCsv(rows, { speedUnit, accelerationUnit }));
        const close = (a: number, b: number) => Math.abs(a - b) <= 5e-6 * Math.abs(b) + 1e-300;
        return (
          back.problems.length === 0 &&
          back.rows.length === rows.length &&
          back.rows.every((r, i) => close(r.angularSpeed, rows[i]!.angularSpeed) && close(r.acceleration, rows[i]!.acceleration))
        );
      }),
    );
  });

  it("refuses a unit of the wrong kind by name", () => {
    expect(() => calibrationRowsToCsv([], { speedUnit: "mm" })).toThrow(CalcInputError);
    expect(() => readingOfWrittenRows([], { accelerationUnit: "rpm" })).toThrow(CalcInputError);
  });

  it("knows, without reading it, exactly what the reader makes of the text it wrote (fast-check)", () => {
    const row = fc.record({ angularSpeed: fc.double({ min: 0, max: 5000, noNaN: true }), acceleration: fc.double({ min: -1e4, max: 1e5, noNaN: true }) });
    const units = fc.constantFrom(["rpm", "gn"], ["rps", "m/s2"], ["rad/s", "ft/s2"]) as fc.Arbitrary<["rpm" | "rps" | "rad/s", "gn" | "m/s2" | "ft/s2"]>;
    fc.assert(
      fc.property(fc.array(row, { maxLength: 30 }), units, fc.nat({ max: 3 }), (rows, [speedUnit, accelerationUnit], comments) => {
        const text = "# a comment\n".repeat(comments) + calibrationRowsToCsv(rows, { speedUnit, accelerationUnit });
        expect(readingOfWrittenRows(rows, { speedUnit, accelerationUnit }, comments + 1)).toEqual(parseCalibrationCsv(text));
      }),
    );
  });
});

describe("source keys", () => {
  it("names only keys that exist in the bibliography, in every doc comment of calc/heading/csv.ts", () => {
    const text = readFileSync(new URL("../../calc/heading/csv.ts", import.meta.url), "utf8");
    const keys = [...text.matchAll(/Sources: ([^\n]+)/g)].flatMap((m) => m[1]!.replace(/\.$/, "").split(/,\s*/));
    expect(keys.length).toBeGreaterThan(0);
    for (const key of keys) expect(isSourceKey(key.trim()), key).toBe(true);
  });
});
