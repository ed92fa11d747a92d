/**
 * The calibration calculator's model: the readings as text (pasted, typed or loaded from a file),
 * the units bare numbers are read in, the fit settings; the rows read from the text, the fit of
 * a = r·ω² + b and its curves, and the page link. The rows travel in the link in the versioned
 * compact form of calc/heading/calibration.ts; the text box is rebuilt from them when a link is opened.
 * Text the model wrote itself (the demo, a link's rows) comes with its reading, so the text reader
 * (calc/heading/csv.ts) loads only when someone edits the text or picks another unit for bare numbers.
 * No DOM.
 */
import { batch, computed, signal } from "../calc-ui/reactive.ts";
import { CALIBRATION_ROWS_MAX, decodeCalibrationRows, encodeCalibrationRows } from "../../calc/heading/calibration-rows.ts";
import { calibrationCurve, calibrationFitInputs, demoCalibrationRows, fitCalibration } from "../../calc/heading/calibration.ts";
import { calibrationRowsToCsv, readingOfWrittenRows } from "../../calc/heading/calibration-text.ts";
import type { CalibrationCsv, parseCalibrationCsv } from "../../calc/heading/csv.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import type { UnitId, UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";
import { linkFor, readLink, writeLink } from "../../calc/core/calculator.ts";
import { form as calibration } from "../../calc/calculators/calibration.ts";
import { headingDriftForm as headingDrift } from "../../calc/heading/drift-inputs.ts";
import { saveToDesign } from "../calc-ui/save.ts";
import { siteUrl } from "../calc-ui/site.ts";

/** Units a bare speed may be read in, by the name the link uses. */
export const SPEED_UNITS = { rpm: "rpm", "rev/s": "rps", "rad/s": "rad/s" } as const satisfies Record<string, UnitId>;
/** Units a bare reading may be read in, as written in the link ("g" is the unit id "gn"). */
export const ACCELERATION_UNITS = { g: "gn", "m/s2": "m/s2" } as const satisfies Record<string, UnitId>;
export type SpeedUnitKey = keyof typeof SPEED_UNITS;
export type AccelerationUnitKey = keyof typeof ACCELERATION_UNITS;

/** Link keys of the page: the units bare numbers in the text box are read in. */
const SPEED_UNIT_KEY = "su";
const ACCELERATION_UNIT_KEY = "au";

const DEMO_ROWS = demoCalibrationRows();
/** The text the box starts with: the chapter's invented demo readings (a comment line, then the rows). */
export const DEMO_TEXT = `# Invented demo readings, not measured: reference speed and radial reading\n${calibrationRowsToCsv(DEMO_ROWS)}`;

/** The text reader, `parseCalibrationCsv`. */
export type TextReader = typeof parseCalibrationCsv;

/** Loads the text reader on first use. */
const loadReader = (): Promise<TextReader> => import("../../calc/heading/csv.ts").then((m) => m.parseCalibrationCsv);

const LABELS = Object.fromEntries(Object.entries(calibrationFitInputs).map(([k, s]) => [k, s.label]));

/**
 * @param system the unit system the fields start in
 * @param reader the text reader, when the caller has it already (the server, tests); otherwise it
 * loads the first time the text differs from what the model wrote
 */
export function createCalibrationModel(system: UnitSystem = "metric", reader?: TextReader) {
  const fields = createFieldsModel(calibration.inputs, system);
  const text = signal(DEMO_TEXT);
  const speedUnit = signal<SpeedUnitKey>("rpm");
  const accelerationUnit = signal<AccelerationUnitKey>("g");
  /** A problem reading a file (too large, unreadable). */
  const fileError = signal<string | null>(null);
  /** Text this model wrote, with its units for bare numbers and the reading the reader would give. */
  const written = signal({
    text: DEMO_TEXT,
    speedUnit: speedUnit.value,
    accelerationUnit: accelerationUnit.value,
    reading: readingOfWrittenRows(DEMO_ROWS, {}, 2),
  });
  const readText = signal<TextReader | null>(reader ?? null);
  let loading: Promise<void> | null = null;
  /** Loads the reader (once); resolves when `parsed` reads the current text. */
  function loadTextReader(): Promise<void> {
    loading ??= loadReader().then((read) => {
      readText.value = read;
    });
    return loading;
  }

  let last: CalibrationCsv | null = null;
  const parsed = computed(() => {
    const own = written.value;
    if (text.value === own.text && speedUnit.value === own.speedUnit && accelerationUnit.value === own.accelerationUnit) {
      last = own.reading;
      return last;
    }
    const read = readText.value;
    if (!read) {
      // The reader arrives in a moment and this recomputes; until then the last reading stands.
      void loadTextReader();
      return last ?? own.reading;
    }
    last = read(text.value, { speedUnit: SPEED_UNITS[speedUnit.value], accelerationUnit: ACCELERATION_UNITS[accelerationUnit.value] });
    return last;
  });

  /**
   * The rows as the link carries them (the first 500, each number exactly), read back: the fit
   * always uses these, so a reopened link gives exactly the same numbers.
   */
  const data = computed(() => {
    const rows = parsed.value.rows.slice(0, CALIBRATION_ROWS_MAX);
    const encoded = encodeCalibrationRows(rows);
    return { encoded, rows: decodeCalibrationRows(encoded).rows, lines: rows.map((r) => r.line), dropped: parsed.value.rows.length - rows.length };
  });

  const outcome = computed(() => {
    const values = fields.values.value;
    if (!values) return { fit: null, curve: null, error: null };
    const rows = data.value.rows;
    try {
      const fit = fitCalibration(rows, { spikeThreshold: values.spikeThreshold, confidence: values.confidence });
      const top = Math.max(...rows.map((r) => r.angularSpeed));
      return { fit, curve: calibrationCurve({ fit, lowSpeed: 0, highSpeed: top * 1.05 }), error: null };
    } catch (error) {
      if (error instanceof CalcInputError && error.param === "rows") {
        return { fit: null, curve: null, error: { field: "rows", message: `The fit needs ${error.expected}; the text gives ${rows.length} usable.` } };
      }
      return { fit: null, curve: null, error: fieldMessage(error, LABELS, fields.system.value) };
    }
  });

  /** The drift-budget page with the fitted radius and offset as its firmware values, or null without a usable fit. */
  const handoff = computed(() => {
    const fit = outcome.value.fit;
    if (!fit || !(fit.radius > 0)) return null;
    const link = linkFor(headingDrift, { assumedRadius: fit.radius, biasCorrection: fit.bias }, { system: fields.system.value });
    return siteUrl(link);
  });

  /** Applies a link: the fit settings and the rows as the calculator declares them; the text box's units here. */
  function applyQuery(search: string): void {
    const read = readLink(calibration, search);
    const notices = [...read.notices];
    const params = new URLSearchParams(search);
    const unitFrom = <K extends string>(key: string, options: Record<K, string>, target: { value: K }, what: string) => {
      const [value, ...more] = params.getAll(key);
      if (value === undefined) return;
      if (more.length > 0) notices.push(`The link sets "${key}" more than once; the first value was used.`);
      if (Object.hasOwn(options, value)) target.value = value as K;
      else notices.push(`The link's unit for bare ${what} is not one this page reads (use ${Object.keys(options).join(", ")}); kept ${target.value}.`);
    };
    batch(() => {
      fields.applyTexts(read.texts, read.system);
      unitFrom(SPEED_UNIT_KEY, SPEED_UNITS, speedUnit, "speeds");
      unitFrom(ACCELERATION_UNIT_KEY, ACCELERATION_UNITS, accelerationUnit, "readings");
      if (read.extras.rows !== undefined) {
        const decoded = calibration.extras.rows.read(read.extras.rows, fields.system.value);
        notices.push(...decoded.notices);
        const rows = decoded.value ?? [];
        const linkText = calibrationRowsToCsv(rows);
        written.value = { text: linkText, speedUnit: speedUnit.value, accelerationUnit: accelerationUnit.value, reading: readingOfWrittenRows(rows) };
        text.value = linkText;
      }
      fields.notices.value = notices;
    });
  }

  /** The query string for the current state, keeping other keys found in `existing`. */
  function queryFor(existing: string): string {
    const texts = Object.fromEntries(Object.entries(fields.texts).map(([k, t]) => [k, t.value]));
    const page = { [SPEED_UNIT_KEY]: speedUnit.value, [ACCELERATION_UNIT_KEY]: accelerationUnit.value };
    return writeLink(calibration, { texts, choices: {}, extras: { rows: data.value.encoded } }, fields.system.value, existing, page);
  }

  /** Saves the fit settings and the rows into a design. */
  const save = () => saveToDesign(calibration, fields.values.value ? { ...fields.values.value, rows: data.value.rows } : null);

  return { fields, text, speedUnit, accelerationUnit, fileError, parsed, data, outcome, handoff, applyQuery, queryFor, save, loadTextReader };
}

export type CalibrationModel = ReturnType<typeof createCalibrationModel>;
