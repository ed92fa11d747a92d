/**
 * Reads calibration readings (reference speed, radial acceleration) from pasted or uploaded text:
 * comma-, semicolon-, tab- or space-separated, with or without a header that names the units, with
 * a decimal comma where the separator allows it, blank lines and '#' comments. Pure: it takes the
 * text and returns rows in SI plus every line it could not read, by line number and reason. It
 * never throws on any text.
 */
import type { CalibrationRow } from "./calibration.ts";
import { findUnit, parseQuantity, type UnitId, unitDef } from "../core/units.ts";
import { requireUnitOfKind } from "../core/unit-tools.ts";

export type CsvSeparator = "," | ";" | "\t" | "whitespace";

export interface CalibrationCsvOptions {
  /** Unit of a bare speed when the header names none [unit id of kind angularSpeed] (default "rpm"). */
  speedUnit?: UnitId;
  /** Unit of a bare acceleration when the header names none [unit id of kind acceleration] (default "gn", standard gravities). */
  accelerationUnit?: UnitId;
}

/** A line that was skipped, and why. */
export interface CsvProblem {
  /** 1-based line number in the text. */
  line: number;
  /** The line as found (at most 60 characters). */
  text: string;
  reason: string;
}

/** A reading with the line it came from. */
export interface CsvRow extends CalibrationRow {
  line: number;
}

export interface CalibrationCsv {
  /** Readings in SI [rad/s, m/s²], in text order. */
  rows: CsvRow[];
  /** Every non-blank, non-comment line that gave no reading. */
  problems: CsvProblem[];
  /** The column separator found, null when the text holds no data. */
  separator: CsvSeparator | null;
  /** True when a comma is read as a decimal mark (separator ';', tab or spaces). */
  decimalComma: boolean;
  /** The header line, when the first line holds no number. */
  header: { line: number; fields: string[] } | null;
  /** 0-based column of the speed. */
  speedColumn: number;
  /** 0-based column of the acceleration. */
  accelerationColumn: number;
  /** Unit bare speed numbers are read in. */
  speedUnit: UnitId;
  /** Unit bare acceleration numbers are read in. */
  accelerationUnit: UnitId;
  /** How the text was read, in plain words (shown beside the result). */
  notes: string[];
}

const MAX_LINES = 20000;
const NUMBER_START = /^[+\-−]?(?:\d+(?:\.\d*)?|\.\d+)/;

function clip(text: string, n = 60): string {
  return text.length > n ? `${text.slice(0, n)}…` : text;
}

/** Splits one line on a single-character separator, honouring double quotes (rfc-4180 §2). */
function splitQuoted(line: string, sep: string): { fields: string[]; unclosed: boolean } {
  const fields: string[] = [];
  let field = "";
  let inQuotes = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i]!;
    if (inQuotes) {
      if (ch === '"') {
        if (line[i + 1] === '"') {
          field += '"';
          i++;
        } else inQuotes = false;
      } else field += ch;
    } else if (ch === '"') inQuotes = true;
    else if (ch === sep) {
      fields.push(field.trim());
      field = "";
    } else field += ch;
  }
  fields.push(field.trim());
  return { fields, unclosed: inQuotes };
}

function splitLine(line: string, separator: CsvSeparator): { fields: string[]; unclosed: boolean } {
  // Stryker disable next-line MethodExpression: equivalent, every line arrives trimmed (parseCalibrationCsv trims each body)
  if (separator === "whitespace") return { fields: line.trim().split(/\s+/), unclosed: false };
  const out = splitQuoted(line, separator);
  // a trailing separator leaves an empty last field: drop trailing empties
  while (out.fields.length > 1 && out.fields[out.fields.length - 1] === "") out.fields.pop();
  return out;
}

/** Turns a decimal comma into a point when allowed; null when a comma is not allowed here. */
function normaliseDecimal(cell: string, decimalComma: boolean): string | null {
  if (!cell.includes(",")) return cell;
  if (!decimalComma) return null;
  if (cell.includes(".") || cell.split(",").length > 2) return cell; // let the number reader reject it
  return cell.replace(",", ".");
}

function looksNumeric(cell: string, decimalComma: boolean): boolean {
  const c = normaliseDecimal(cell, decimalComma) ?? cell;
  return NUMBER_START.test(c);
}

type ColumnKind = "speed" | "acceleration";

/** What a header field says: its quantity and, when it names one, its unit. */
function classifyHeader(field: string): { kind: ColumnKind | null; unit: UnitId | null } {
  // Stryker disable next-line ArrayDeclaration: equivalent, a starting text that names no unit is passed over
  const candidates: string[] = [];
  for (const m of field.matchAll(/[([{]([^)\]}]*)[)\]}]/g)) candidates.push(m[1]!.trim());
  // Stryker disable next-line MethodExpression: equivalent, header fields come already trimmed from splitLine
  candidates.push(field.trim());
  // Stryker disable next-line MethodExpression,StringLiteral: equivalent, an empty piece is passed over by the loop below anyway
  candidates.push(...field.split(/[\s_,;:=()[\]{}]+/).filter((t) => t !== ""));
  for (const c of candidates) {
    // Stryker disable next-line StringLiteral: equivalent, findUnit finds no unit for the empty text either
    if (c === "" || c.length > 30) continue;
    const speed = findUnit(c, "angularSpeed");
    if (speed) return { kind: "speed", unit: speed };
    const acc = findUnit(c, "acceleration");
    if (acc) return { kind: "acceleration", unit: acc };
  }
  if (/speed|omega|ω|spin|rev|rate|tach/i.test(field)) return { kind: "speed", unit: null };
  if (/acc|^a$|^a\W|reading|force/i.test(field)) return { kind: "acceleration", unit: null };
  // Stryker disable next-line ObjectLiteral: equivalent, a missing kind compares unequal to "speed" and "acceleration" just as null does
  return { kind: null, unit: null };
}

function chooseSeparator(lines: readonly string[]): CsvSeparator | null {
  if (lines.length === 0) return null;
  const count = (ch: string) => lines.filter((l) => l.includes(ch)).length;
  const tab = count("\t");
  const semi = count(";");
  const comma = count(",");
  const best = Math.max(tab, semi, comma);
  if (best === 0) return "whitespace";
  if (tab === best) return "\t";
  if (semi === best) return ";";
  return ",";
}

function separatorName(sep: CsvSeparator): string {
  return sep === "," ? "commas" : sep === ";" ? "semicolons" : sep === "\t" ? "tabs" : "spaces";
}

/**
 * Reads calibration readings from text (rfc-4180 §2 for quoting and the optional header; units by
 * nist-sp811 and cgpm-1901 through calc/core/units.ts).
 *
 * Formula: ω [rad/s] = value × unit factor (rpm: π/30; rev/s: 2π); a [m/s²] = value × unit
 * factor (g: 9.806 65)
 *
 * @param text the whole text (any string; never throws on it)
 * @param options default units for bare numbers: speedUnit (rpm), accelerationUnit (gn)
 * @returns rows in SI with their line numbers, every skipped line with its reason, and how the
 * text was read (separator, decimal comma, header, columns, units, notes)
 *
 * Rules: the separator is the one of tab, ';' or ',' found on most lines (ties in that order), else
 * spaces; with ';', tab or spaces a comma is a decimal mark. '#' starts a comment anywhere on a
 * line. The first line is a header when none of its fields starts with a number; a header field
 * naming a unit ("speed (rpm)", "a [m/s2]", "g", "rad/s") fixes that column's unit and kind, and
 * the speed and acceleration columns are found by kind (else speed first, acceleration second).
 * A cell may carry its own unit ("1200 rpm").
 *
 * @example
 * parseCalibrationCsv("rpm;g\n1200;31,5") // → { rows: { length: 1 }, separator: ";", decimalComma: true, … }; parseCalibrationCsv("rpm;g\n1200;31,5").rows.at(0) // → { angularSpeed: 125.66, acceleration: 308.91, … }
 *
 * Sources: rfc-4180, nist-sp811, cgpm-1901.
 */
export function parseCalibrationCsv(text: string, options: CalibrationCsvOptions = {}): CalibrationCsv {
  const defaultSpeedUnit = options.speedUnit ?? "rpm";
  const defaultAccelerationUnit = options.accelerationUnit ?? "gn";
  requireUnitOfKind("speedUnit", defaultSpeedUnit, "angularSpeed");
  requireUnitOfKind("accelerationUnit", defaultAccelerationUnit, "acceleration");

  const source = typeof text === "string" ? text.replace(/^\uFEFF/, "") : "";
  const physical = source.split(/\r\n|\r|\n/);
  const problems: CsvProblem[] = [];
  const notes: string[] = [];
  // Only a line past the limit that holds something is skipped: a final line break or trailing blank lines are not.
  if (physical.slice(MAX_LINES).some((l) => l.trim() !== "")) {
    problems.push({ line: MAX_LINES + 1, text: "", reason: `more than ${MAX_LINES} lines; the rest are skipped` });
  }
  const content: { line: number; text: string }[] = [];
  physical.slice(0, MAX_LINES).forEach((raw, i) => {
    const hash = raw.indexOf("#");
    const body = (hash >= 0 ? raw.slice(0, hash) : raw).trim();
    if (body !== "") content.push({ line: i + 1, text: body });
  });

  const separator = chooseSeparator(content.map((c) => c.text));
  const decimalComma = separator !== null && separator !== ",";
  const result: CalibrationCsv = {
    rows: [],
    problems,
    separator,
    decimalComma,
    header: null,
    speedColumn: 0,
    accelerationColumn: 1,
    speedUnit: defaultSpeedUnit,
    accelerationUnit: defaultAccelerationUnit,
    notes,
  };
  if (separator === null) {
    notes.push("no data found (only blank lines and comments)");
    return result;
  }
  notes.push(`columns separated by ${separatorName(separator)}${decimalComma ? "; a comma is read as a decimal mark" : ""}`);

  let dataLines = content;
  const first = splitLine(content[0]!.text, separator);
  if (!first.unclosed && !first.fields.some((f) => looksNumeric(f, decimalComma))) {
    result.header = { line: content[0]!.line, fields: first.fields };
    dataLines = content.slice(1);
    const kinds = first.fields.map(classifyHeader);
    let sc = kinds.findIndex((k) => k.kind === "speed");
    let ac = kinds.findIndex((k, i) => k.kind === "acceleration" && i !== sc);
    if (sc < 0) sc = ac === 0 ? 1 : 0;
    if (ac < 0) ac = sc === 0 ? 1 : 0;
    result.speedColumn = sc;
    result.accelerationColumn = ac;
    const su = kinds[sc]?.kind === "speed" ? kinds[sc]!.unit : null;
    const au = kinds[ac]?.kind === "acceleration" ? kinds[ac]!.unit : null;
    if (su) result.speedUnit = su;
    if (au) result.accelerationUnit = au;
    notes.push(
      `line ${content[0]!.line} read as a header: speed in column ${sc + 1} (${unitDef(result.speedUnit).symbol}${su ? "" : ", no unit named, default"}), ` +
        `acceleration in column ${ac + 1} (${unitDef(result.accelerationUnit).symbol}${au ? "" : ", no unit named, default"})`,
    );
  } else {
    notes.push(`no header: column 1 is speed (${unitDef(defaultSpeedUnit).symbol}), column 2 is acceleration (${unitDef(defaultAccelerationUnit).symbol})`);
  }

  const used = Math.max(result.speedColumn, result.accelerationColumn) + 1;
  let extraNoted = false;
  for (const { line, text: body } of dataLines) {
    const { fields, unclosed } = splitLine(body, separator);
    const report = (reason: string) => problems.push({ line, text: clip(body), reason });
    if (unclosed) {
      report("a double quote is not closed");
      continue;
    }
    if (fields.length < used) {
      report(`expected at least ${used} columns, found ${fields.length}`);
      continue;
    }
    if (!extraNoted && fields.slice(used).some((f) => f !== "")) {
      notes.push(`columns after column ${used} are ignored (first seen on line ${line})`);
      extraNoted = true;
    }
    const cell = (index: number, name: string, kind: "angularSpeed" | "acceleration", unit: UnitId): number | null => {
      const raw = fields[index]!;
      if (raw === "") {
        report(`${name} is empty`);
        return null;
      }
      const normal = normaliseDecimal(raw, decimalComma);
      if (normal === null) {
        report(`${name} "${clip(raw, 20)}" holds a comma, which cannot be a decimal mark when commas separate the columns`);
        return null;
      }
      const parsed = parseQuantity(normal, kind, unit);
      if (!parsed.ok) {
        report(`${name} "${clip(raw, 20)}" ${parsed.message}`);
        return null;
      }
      return parsed.valueSI;
    };
    const w = cell(result.speedColumn, "speed", "angularSpeed", result.speedUnit);
    if (w === null) continue;
    const a = cell(result.accelerationColumn, "acceleration", "acceleration", result.accelerationUnit);
    if (a === null) continue;
    // Both are finite here: parseQuantity returns ok only with a finite value ("number too large" otherwise).
    if (w < 0) {
      report("speed must be 0 or more");
      continue;
    }
    result.rows.push({ line, angularSpeed: w, acceleration: a });
  }
  return result;
}
