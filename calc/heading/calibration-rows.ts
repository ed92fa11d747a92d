/**
 * Calibration rows as compact, versioned text for a URL: "v1:1200:31.5,1800:70.9" (rpm:g), and
 * reading it back with a problem per row that cannot be read.
 */
import { RAD_PER_S_PER_RPM, STANDARD_GRAVITY } from "../core/constants.ts";
import { CalcInputError, requireFinite, requireNonNegative } from "../core/errors.ts";
import { exactNumberText, readExactNumber } from "../core/units.ts";
import type { CalibrationRow } from "./calibration.ts";
import { requireInputObject, requireList } from "../core/spec-check.ts";

// Compact text form of the rows, for a URL: "v1:1200:31.5,1800:70.9" (rpm:g).

/** Version tag of the encoding this module writes. */
export const CALIBRATION_ROWS_VERSION = 1;
/** Most rows the text form carries. */
export const CALIBRATION_ROWS_MAX = 500;

/**
 * Writes calibration rows as compact text for a URL: a version tag, then speed:acceleration pairs
 * in rpm and standard gravities, six significant figures, comma-separated.
 *
 * Formula: "v1:" + ω₁[rpm] ":" a₁[g] "," ω₂[rpm] ":" a₂[g] …
 *
 * @param rows readings (ω [rad/s] ≥ 0, a [m/s²] finite), at most 500
 * @returns the text, e.g. "v1:1200:31.5,1800:70.9"
 *
 * @example
 * encodeCalibrationRows([{ angularSpeed: rpmToRadPerSecond(1200), acceleration: 31.5 * STANDARD_GRAVITY }]) // → "v1:1200:31.5"
 *
 * Sources: nist-sp811 (rpm and g_n definitions).
 */
export function encodeCalibrationRows(rows: readonly CalibrationRow[]): string {
  if (requireList(rows, "rows").length > CALIBRATION_ROWS_MAX) {
    throw new CalcInputError({ param: "rows", value: rows.length, expected: `at most ${CALIBRATION_ROWS_MAX} readings`, unit: "" });
  }
  const pieces = rows.map((row, i) => {
    requireInputObject(row, `rows[${i}]`);
    requireNonNegative(`rows[${i}].angularSpeed`, row.angularSpeed, "rad/s");
    requireFinite(`rows[${i}].acceleration`, row.acceleration, "m/s²");
    return `${exactNumberText(row.angularSpeed, RAD_PER_S_PER_RPM)}:${exactNumberText(row.acceleration, STANDARD_GRAVITY)}`;
  });
  return `v${CALIBRATION_ROWS_VERSION}:${pieces.join(",")}`;
}

/** A piece of the text form that could not be read. */
export interface RowTextProblem {
  /** 1-based position of the piece among the comma-separated pieces (0 for the text as a whole). */
  piece: number;
  /** The piece as found (at most 40 characters). */
  text: string;
  reason: string;
}

export interface DecodedCalibrationRows {
  /** The version read, or null when the text carried none or an unknown one. */
  version: number | null;
  rows: CalibrationRow[];
  problems: RowTextProblem[];
}

function clip(text: string): string {
  return text.length > 40 ? `${text.slice(0, 40)}…` : text;
}

/**
 * A number of the text form in SI; +∞ for one written as a number that passes the largest double
 * (it still reads once its exponent is cut off), null for anything else.
 */
function readNumber(text: string, factor: number): number | null {
  const value = readExactNumber(text, factor);
  if (value !== null || readExactNumber(text.replace(/e\+?\d+/i, ""), 1) === null) return value;
  return Number.POSITIVE_INFINITY;
}

/**
 * Reads the text form written by `encodeCalibrationRows`. Never throws: pieces that cannot be read
 * are skipped and each is reported with its position and the reason.
 *
 * Formula: inverse of `encodeCalibrationRows` (rpm → rad/s × π/30, g → m/s² × 9.806 65)
 *
 * @param text the text from the URL (any string)
 * @returns the rows [rad/s, m/s²], the version, and the problems
 *
 * Assumptions: text without a version tag is read as version 1 and says so; an unknown version
 * yields no rows.
 *
 * @example
 * decodeCalibrationRows("v1:1200:31.5,abc").rows.length // → 1; decodeCalibrationRows("v1:1200:31.5,abc").problems.at(0) // → { piece: 2, text: "abc", … }
 *
 * Sources: nist-sp811, cgpm-1901.
 */
export function decodeCalibrationRows(text: string): DecodedCalibrationRows {
  const problems: RowTextProblem[] = [];
  let body = typeof text === "string" ? text.trim() : "";
  let version: number | null = CALIBRATION_ROWS_VERSION;
  const tag = /^v(\d{1,6}):/i.exec(body);
  if (tag) {
    version = Number(tag[1]);
    body = body.slice(tag[0].length);
    if (version !== CALIBRATION_ROWS_VERSION) {
      return {
        version: null,
        rows: [],
        problems: [{ piece: 0, text: clip(tag[0]), reason: `unknown version ${version}; this reader knows v${CALIBRATION_ROWS_VERSION}` }],
      };
    }
  } else if (body !== "") {
    problems.push({ piece: 0, text: "", reason: `no version tag; read as v${CALIBRATION_ROWS_VERSION}` });
    version = null;
  }
  const rows: CalibrationRow[] = [];
  if (body === "") return { version, rows, problems };
  const pieces = body.split(",");
  pieces.forEach((raw, i) => {
    const piece = raw.trim();
    const at = i + 1;
    if (i >= CALIBRATION_ROWS_MAX) {
      if (i === CALIBRATION_ROWS_MAX) {
        problems.push({ piece: at, text: clip(piece), reason: `more than ${CALIBRATION_ROWS_MAX} readings; the rest are skipped` });
      }
      return;
    }
    const parts = piece.split(":");
    if (parts.length !== 2) {
      problems.push({ piece: at, text: clip(piece), reason: piece === "" ? "empty piece" : "expected speed:acceleration (rpm:g)" });
      return;
    }
    const [speedText, accText] = parts as [string, string];
    const angularSpeed = readNumber(speedText, RAD_PER_S_PER_RPM);
    const acceleration = readNumber(accText, STANDARD_GRAVITY);
    if (angularSpeed === null) {
      problems.push({ piece: at, text: clip(piece), reason: `speed "${clip(speedText)}" is not a number` });
      return;
    }
    if (acceleration === null) {
      problems.push({ piece: at, text: clip(piece), reason: `acceleration "${clip(accText)}" is not a number` });
      return;
    }
    if (!Number.isFinite(angularSpeed) || !Number.isFinite(acceleration)) {
      problems.push({ piece: at, text: clip(piece), reason: "number too large" });
      return;
    }
    if (angularSpeed < 0) {
      problems.push({ piece: at, text: clip(piece), reason: "speed must be 0 or more" });
      return;
    }
    rows.push({ angularSpeed, acceleration });
  });
  return { version, rows, problems };
}
