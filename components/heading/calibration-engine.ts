/**
 * The calibration page's computing half: the fit of the readings with its hand-over link to the
 * drift budget, and the text a link's readings are shown as. The page comes with the outcome for
 * its demo readings as data (`calibrationStart`, run when the site is built, with these very
 * functions), so in the browser this module loads only when the readings or the fit settings first
 * differ from the demo's (an edit, or a link that carries other readings). No DOM.
 */
import { linkFor } from "../../calc/core/calculator.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { type CalibrationFit, type CalibrationRow, calibrationFitInputs, demoCalibrationRows, fitCalibration } from "../../calc/heading/calibration.ts";
import { decodeCalibrationRows, encodeCalibrationRows } from "../../calc/heading/calibration-rows.ts";
import { calibrationRowsToCsv, readingOfWrittenRows } from "../../calc/heading/calibration-text.ts";
import type { CalibrationCsv } from "../../calc/heading/csv.ts";
import { headingDriftForm as headingDrift } from "../../calc/heading/drift-inputs.ts";
import { form as calibration } from "../../calc/calculators/calibration.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";
import { siteUrl } from "../calc-ui/site.ts";

/** The fit settings the page reads from its fields. */
export interface CalibrationSettings {
  spikeThreshold: number;
  confidence: number;
}

/** What the page shows for a set of readings and settings. */
export interface CalibrationOutcome {
  fit: CalibrationFit | null;
  /** Why there is no fit: the field it concerns ("rows" for the readings, null for none) and the message. */
  error: { field: string | null; message: string } | null;
  /** The drift-budget page with the fitted radius and offset as its firmware values, in each unit system; null without a usable fit. */
  handoff: Record<UnitSystem, string> | null;
}

/** The page's state before any edit, computed when the site is built and shipped with the page (it must survive JSON). */
export interface CalibrationStart {
  /** The text the box starts with. */
  text: string;
  /** What the text reader makes of it. */
  reading: CalibrationCsv;
  /** The settings the outcome was computed with (the fields' defaults). */
  settings: CalibrationSettings;
  outcome: CalibrationOutcome;
}

const LABELS = Object.fromEntries(Object.entries(calibrationFitInputs).map(([k, s]) => [k, s.label]));

/** The drift budget's link with the fit's radius and offset as the firmware's values. */
function handoffIn(fit: CalibrationFit, system: UnitSystem): string {
  return siteUrl(linkFor(headingDrift, { assumedRadius: fit.radius, biasCorrection: fit.bias }, { system }));
}

/**
 * Fits the rows with the settings, as the page shows it: the fit and its hand-over links, or the
 * reason there is none, worded for the field it concerns (in `system`'s units).
 */
export function evaluateCalibration(rows: readonly CalibrationRow[], settings: CalibrationSettings, system: UnitSystem): CalibrationOutcome {
  try {
    const fit = fitCalibration(rows, { spikeThreshold: settings.spikeThreshold, confidence: settings.confidence });
    const handoff = fit.radius > 0 ? { metric: handoffIn(fit, "metric"), us: handoffIn(fit, "us") } : null;
    return { fit, error: null, handoff };
  } catch (error) {
    if (error instanceof CalcInputError && error.param === "rows") {
      return { fit: null, handoff: null, error: { field: "rows", message: `The fit needs ${error.expected}; the text gives ${rows.length} usable.` } };
    }
    return { fit: null, handoff: null, error: fieldMessage(error, LABELS, system) };
  }
}

/**
 * Rows as the text box shows them (a header naming the units, then one pair a line), with what the
 * text reader makes of that text, so that the reader need not load to read it.
 *
 * @param comment a comment line written above the header (none when absent)
 */
export function writtenRows(rows: readonly CalibrationRow[], comment?: string): { text: string; reading: CalibrationCsv } {
  const csv = calibrationRowsToCsv(rows);
  return comment === undefined
    ? { text: csv, reading: readingOfWrittenRows(rows) }
    : { text: `# ${comment}\n${csv}`, reading: readingOfWrittenRows(rows, {}, 2) };
}

/**
 * The page's state before any edit: the chapter's invented demo readings, fitted as the page fits
 * them: with the settings its fields start with (read from their text, as the page reads them) and
 * the rows as its link carries them, read back.
 */
export function calibrationStart(): CalibrationStart {
  const { text, reading } = writtenRows(demoCalibrationRows(), "Invented demo readings, not measured: reference speed and radial reading");
  const values = createFieldsModel(calibration.inputs, "metric").values.value;
  if (!values) throw new Error("The calibration fields' defaults do not read back as valid values.");
  const settings = { spikeThreshold: values.spikeThreshold, confidence: values.confidence };
  const rows = decodeCalibrationRows(encodeCalibrationRows(reading.rows)).rows;
  return { text, reading, settings, outcome: evaluateCalibration(rows, settings, "metric") };
}
