/**
 * The calibration calculator's model: the readings as text (pasted, typed or loaded from a file),
 * the units bare numbers are read in, the fit settings; the rows read from the text, the fit of
 * a = r·ω² + b, and the page link. The rows travel in the link in the versioned compact form of
 * calc/heading/calibration-rows.ts; the text box is rebuilt from them when a link is opened.
 * The page comes with its start (the demo text, its reading and its fit, computed when the site is
 * built: `calibrationStart` in calibration-engine.ts), so the code that fits
 * (calibration-engine.ts) loads only once the readings or settings differ from the start's, and the
 * text reader (calc/heading/csv.ts) only once someone edits the text or picks another unit for bare
 * numbers. No DOM.
 */
import { batch, computed, signal } from "../calc-ui/reactive.ts";
import { CALIBRATION_ROWS_MAX, decodeCalibrationRows, encodeCalibrationRows } from "../../calc/heading/calibration-rows.ts";
import type { CalibrationRow } from "../../calc/heading/calibration-inputs.ts";
import type { CalibrationCsv, parseCalibrationCsv } from "../../calc/heading/csv.ts";
import type { UnitId, UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel } from "../calc-ui/fields.ts";
import { readLink, writeLink } from "../../calc/core/calculator.ts";
import { form as calibration } from "../../calc/calculators/calibration.ts";
import { saveToDesign } from "../calc-ui/save.ts";
import type { CalibrationOutcome, CalibrationStart } from "./calibration-engine.ts";

/** Units a bare speed may be read in, by the name the link uses. */
export const SPEED_UNITS = { rpm: "rpm", "rev/s": "rps", "rad/s": "rad/s" } as const satisfies Record<string, UnitId>;
/** Units a bare reading may be read in, as written in the link ("g" is the unit id "gn"). */
export const ACCELERATION_UNITS = { g: "gn", "m/s2": "m/s2" } as const satisfies Record<string, UnitId>;
export type SpeedUnitKey = keyof typeof SPEED_UNITS;
export type AccelerationUnitKey = keyof typeof ACCELERATION_UNITS;

/** Link keys of the page: the units bare numbers in the text box are read in. */
const SPEED_UNIT_KEY = "su";
const ACCELERATION_UNIT_KEY = "au";

/** The text reader, `parseCalibrationCsv`. */
export type TextReader = typeof parseCalibrationCsv;
/** The fitting code (calibration-engine.ts). */
export type CalibrationEngine = typeof import("./calibration-engine.ts");

/** Loads the text reader on first use. */
const loadReader = (): Promise<TextReader> => import("../../calc/heading/csv.ts").then((m) => m.parseCalibrationCsv);
/** Loads the fitting code on first use. */
const loadEngineModule = (): Promise<CalibrationEngine> => import("./calibration-engine.ts");

/** Resolves in a later task (lets the browser paint and handle input in between). */
export const nextTask = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

/** No fit while a field holds no valid value (the field shows why). */
const NO_OUTCOME: CalibrationOutcome = { fit: null, error: null, handoff: null };

export interface CalibrationModelOptions {
  /** The unit system the fields start in (default metric). */
  system?: UnitSystem;
  /** The text reader, when the caller has it already (the server, tests); otherwise it loads the first time the text differs from what the model wrote. */
  reader?: TextReader;
  /** The fitting code, when the caller has it already; otherwise it loads the first time the readings or settings differ from the start's. */
  engine?: CalibrationEngine;
}

/**
 * @param start the page's state before any edit (the demo text, its reading and its outcome)
 */
export function createCalibrationModel(start: CalibrationStart, options: CalibrationModelOptions = {}) {
  const fields = createFieldsModel(calibration.inputs, options.system);
  const text = signal(start.text);
  const speedUnit = signal<SpeedUnitKey>("rpm");
  const accelerationUnit = signal<AccelerationUnitKey>("g");
  /** A problem reading a file (too large, unreadable). */
  const fileError = signal<string | null>(null);
  /** Text this model wrote, with its units for bare numbers and the reading the reader would give. */
  const written = signal({ text: start.text, speedUnit: speedUnit.value, accelerationUnit: accelerationUnit.value, reading: start.reading });
  const readText = signal<TextReader | null>(options.reader ?? null);
  const engine = signal<CalibrationEngine | null>(options.engine ?? null);
  /** A link's rows waiting for the fitting code to be written into the text box. */
  const linkRows = signal<CalibrationRow[] | null>(null);

  let engineLoading: Promise<void> | null = null;
  /** Loads the fitting code (once); resolves when `outcome` can compute. */
  function loadEngine(): Promise<void> {
    engineLoading ??= loadEngineModule().then(async (module) => {
      // The code has just been evaluated: compute and redraw in a task of their own, so that
      // neither makes that task longer.
      await nextTask();
      batch(() => {
        engine.value = module;
        const rows = linkRows.value;
        if (rows) showRows(module, rows);
      });
    });
    return engineLoading;
  }
  let readerLoading: Promise<void> | null = null;
  /** Loads the reader and the fitting code (once each); resolves when `parsed` and `outcome` follow the current text. */
  function loadTextReader(): Promise<void> {
    readerLoading ??= loadReader().then((read) => {
      readText.value = read;
    });
    return Promise.all([readerLoading, loadEngine()]).then(() => undefined);
  }

  /** True while the text box holds text this model wrote, read in the units it wrote it for. */
  const ownText = computed(() => {
    const own = written.value;
    return text.value === own.text && speedUnit.value === own.speedUnit && accelerationUnit.value === own.accelerationUnit;
  });
  let last: CalibrationCsv = start.reading;
  const parsed = computed(() => {
    if (ownText.value) {
      last = written.value.reading;
      return last;
    }
    const read = readText.value;
    if (!read) {
      // The reader arrives in a moment and this recomputes; until then the last reading stands.
      void loadTextReader();
      return last;
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
  const startEncoded = data.value.encoded;

  /** True while the readings and settings are the start's, whose outcome came with the page. */
  const atStart = computed(() => {
    const values = fields.values.value;
    return (
      values !== null &&
      data.value.encoded === startEncoded &&
      values.spikeThreshold === start.settings.spikeThreshold &&
      values.confidence === start.settings.confidence
    );
  });

  let lastOutcome: CalibrationOutcome = start.outcome;
  /**
   * The fit and its links, or why there is none: computed once the fitting code is here; before
   * that, the start's outcome while nothing differs from the start (it is what the code computes).
   */
  const outcome = computed((): CalibrationOutcome => {
    const values = fields.values.value;
    const live = engine.value;
    if (values && !live && !atStart.value) {
      // The fitting code arrives in a moment and this recomputes; until then the last outcome stands.
      void loadEngine();
      return lastOutcome;
    }
    lastOutcome = !values ? NO_OUTCOME : live ? live.evaluateCalibration(data.value.rows, values, fields.system.value) : start.outcome;
    return lastOutcome;
  });

  /** True while code the current state needs is still loading (the figures shown are the last ones). */
  const pending = computed(
    () => linkRows.value !== null || (engine.value === null && fields.values.value !== null && !atStart.value) || (readText.value === null && !ownText.value),
  );

  let lastShown = { outcome: start.outcome, data: data.value, parsed: start.reading };
  /**
   * What the results and charts show: the outcome with the rows and reading it was computed from.
   * While code is loading, the last of these together (the outcome alone would be stale against
   * newer rows).
   */
  const shown = computed(() => {
    const now = outcome.value;
    if (!pending.value) lastShown = { outcome: now, data: data.value, parsed: parsed.value };
    return lastShown;
  });

  /** The drift-budget page with the fitted radius and offset as its firmware values, or null without a usable fit. */
  const handoff = computed(() => shown.value.outcome.handoff?.[fields.system.value] ?? null);

  /** Shows rows in the text box as the model writes them (their reading comes with them). */
  function showRows(module: CalibrationEngine, rows: readonly CalibrationRow[]): void {
    const shown = module.writtenRows(rows);
    batch(() => {
      linkRows.value = null;
      written.value = { text: shown.text, speedUnit: speedUnit.value, accelerationUnit: accelerationUnit.value, reading: shown.reading };
      text.value = shown.text;
    });
  }

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
        // The text is written by the fitting code, which the link's rows need anyway.
        if (engine.value) showRows(engine.value, rows);
        else {
          linkRows.value = rows;
          void loadEngine();
        }
      }
      fields.notices.value = notices;
    });
  }

  /** The rows the link carries: a link's rows still waiting to be shown, else the text's. */
  const linkData = () => {
    const waiting = linkRows.value;
    return waiting ? { encoded: encodeCalibrationRows(waiting), rows: waiting } : data.value;
  };

  /** The query string for the current state, keeping other keys found in `existing`. */
  function queryFor(existing: string): string {
    const texts = Object.fromEntries(Object.entries(fields.texts).map(([k, t]) => [k, t.value]));
    const page = { [SPEED_UNIT_KEY]: speedUnit.value, [ACCELERATION_UNIT_KEY]: accelerationUnit.value };
    return writeLink(calibration, { texts, choices: {}, extras: { rows: linkData().encoded } }, fields.system.value, existing, page);
  }

  /** Saves the fit settings and the rows into a design. */
  const save = () => saveToDesign(calibration, fields.values.value ? { ...fields.values.value, rows: linkData().rows } : null);

  return {
    start,
    fields,
    text,
    speedUnit,
    accelerationUnit,
    fileError,
    parsed,
    data,
    outcome,
    pending,
    shown,
    handoff,
    applyQuery,
    queryFor,
    save,
    loadTextReader,
    loadEngine,
  };
}

export type CalibrationModel = ReturnType<typeof createCalibrationModel>;
