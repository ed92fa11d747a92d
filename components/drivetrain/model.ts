/**
 * The spin-up calculator's model: the design's fields and drive type, up to three comparison
 * variants, and a one-input sweep; each with the calc/ result or the error it raised, mapped to its
 * field. No DOM (the sweep runner uses timers only when started).
 *
 * The page URL (format version 1, all keys readable):
 *
 * | Key | Holds |
 * |---|---|
 * | `v=1` | format version |
 * | `u=metric` or `u=us` | unit system |
 * | `type=weapon` or `type=spinner` | drive type |
 * | `motors=1&kv=1400rpm/V&ratio=2&…` | the design: each input's URL key from `drivetrainInputs`, its text as typed (spaces removed); only the inputs that apply to the drive type are written |
 * | `variants=2` | how many comparison variants there are (0 to 3; they are called B, C and D) |
 * | `b.ratio=3&b.cells=6` | variant B: only the inputs that differ from the design; `c.…` for C, `d.…` for D |
 * | `s.p=ratio&s.from=1&s.to=4&s.n=50` | the sweep, present while one is shown: the input varied (its URL key), the range in that input's units, the number of points |
 *
 * A variant is a copy of the design with the listed inputs changed, so editing the design moves
 * every variant with it. Variants share the design's drive type and unit system. Keys a link holds
 * for a variant beyond `variants` still open that variant. Anything unknown, repeated, too long or
 * out of place is reported as a plain-text notice and ignored.
 */
import { batch, computed, effect, signal, type ReadonlySignal, type Signal } from "../calc-ui/reactive.ts";
import { compareDrivetrains, markSweepOptimum, sweepPoint, sweepValues, type DrivetrainSweep, type SweepPoint } from "../../calc/drivetrain/compare.ts";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../calc/drivetrain/demo.ts";
import {
  DRIVE_TYPE_OPTIONS,
  DRIVE_TYPE_URL_KEY,
  drivetrainInputs,
  validateDrivetrainInput,
  type DriveType,
  type DrivetrainInput,
  type DrivetrainParameter,
} from "../../calc/drivetrain/inputs.ts";
import { simulateSpinUp } from "../../calc/drivetrain/simulate.ts";
import type { SpinUpResult } from "../../calc/drivetrain/results.ts";
import { fieldUnit, readField, type FieldReading, type InputSpec } from "../../calc/core/inputs.ts";
import { fromSI, parseQuantity, UNITS, type UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage, type FieldsModel } from "../calc-ui/fields.ts";
import { decodeState, encodeState, MAX_VALUE_LENGTH } from "../calc-ui/permalink.ts";
import type { UrlState } from "../calc-ui/url-sync.ts";

export type Specs = typeof drivetrainInputs;
export type Name = DrivetrainParameter;

export const SPECS: Specs = drivetrainInputs;
export const NAMES = Object.keys(SPECS) as Name[];
const LABELS: Record<string, string> = Object.fromEntries(NAMES.map((n) => [n, SPECS[n].label]));

/** Inputs read only for a whole-body spinner (the wheels and their grip). */
export const SPINNER_ONLY: readonly Name[] = ["drivenWheels", "wheelRadius", "wheelOffset", "wheelInertia", "weightShare", "staticFriction", "kineticFriction"];

/** True when `name` is read for this drive type. */
export const applies = (name: Name, type: DriveType): boolean => type === "spinner" || !SPINNER_ONLY.includes(name);

/** URL scopes of the comparison variants, in order (the design itself is A). */
export const VARIANT_KEYS = ["b", "c", "d"] as const;
/** URL key of the number of variants. */
export const VARIANTS_URL_KEY = "variants";
/** URL scope of the sweep settings. */
export const SWEEP_SCOPE = "s";

/** Inputs the sweep offers, in menu order (the spinner-only ones only for a spinner). */
export const SWEEPABLE: readonly Name[] = [
  "gearRatio",
  "cellCount",
  "currentLimit",
  "motorKv",
  "motorCount",
  "motorResistance",
  "throttle",
  "cellResistance",
  "inertia",
  "wheelRadius",
  "wheelOffset",
  "weightShare",
  "staticFriction",
];

/** The sweep's point count, declared like any other input. */
export const POINTS_SPEC: InputSpec = {
  label: "Points",
  kind: "count",
  min: 2,
  max: 200,
  integer: true,
  default: 50,
  urlKey: "n",
  help: "How many values to simulate, 2 to 200.",
};

/** The from/to field of a sweep over `name`: the input's own kind, range and units. */
export function sweepSpec(name: Name, end: "from" | "to"): InputSpec {
  return {
    ...SPECS[name],
    label: end === "from" ? "From" : "To",
    urlKey: end,
    help: end === "from" ? "First value of the sweep." : "Last value of the sweep.",
  };
}

/** An SI value as field text in the field's unit for `system`, to 4 significant figures. */
export function textFor(spec: InputSpec, valueSI: number, system: UnitSystem, digits = 6): string {
  const unit = fieldUnit(spec, system);
  const n = Number(fromSI(valueSI, unit).toPrecision(digits));
  const symbol = UNITS[unit].symbol;
  return symbol ? `${n} ${symbol}` : String(n);
}

/** Shows "3000rpm" from a link as "3000 rpm"; text that does not read is left as it came. */
function tidy(spec: InputSpec, text: string, system: UnitSystem): string {
  const parsed = parseQuantity(text, spec.kind, fieldUnit(spec, system));
  const symbol = parsed.ok ? UNITS[parsed.unit].symbol : "";
  return parsed.ok && /\d\s*\D/.test(text) ? `${parsed.number}${symbol ? ` ${symbol}` : ""}` : text;
}

/** A short, printable rendering of untrusted text for a notice. */
function quote(text: string): string {
  const printable = text.replace(/[\u0000-\u001f\u007f]/g, "?");
  return `"${printable.length > 24 ? `${printable.slice(0, 24)}…` : printable}"`;
}

/** A sweep range around `value` that stays inside the input's declared range. */
export function defaultSweepRange(name: Name, value: number): [number, number] {
  const spec: InputSpec = SPECS[name];
  if (spec.integer) return [Math.max(spec.min, value - 2), Math.min(spec.max, value + 4)];
  const low = spec.min > 0 || spec.minOpen ? Math.max(value / 2, spec.min * (spec.minOpen ? 1.01 : 1)) : value / 2;
  const high = Math.min(value * 2, spec.max);
  return [low, high > low ? high : spec.max];
}

/** An error from calc/, mapped to its field (null: shown above the results). */
export type FieldError = { field: string | null; message: string } | null;

export interface Outcome {
  input: DrivetrainInput | null;
  result: SpinUpResult | null;
  error: FieldError;
}

/** A comparison variant: its own field texts, and which of them differ from the design. */
export interface Variant {
  fields: FieldsModel<Specs>;
  changed: Signal<Name[]>;
}

export interface VariantOutcome {
  /** The full input (design plus changes), when every changed field reads and the whole is valid. */
  input: DrivetrainInput | null;
  result: SpinUpResult | null;
  error: FieldError;
}

export type SweepState =
  | { status: "off" }
  | { status: "waiting" }
  | { status: "error"; message: string }
  | { status: "running"; done: number; total: number }
  | {
      status: "done";
      parameter: Name;
      points: SweepPoint[];
      optimumIndex: number;
      optimumBy: DrivetrainSweep["optimumBy"];
      /** Values the simulation refused (e.g. a grip coefficient below the sliding one), with the first reason. */
      skipped: number;
      skippedReason: string | null;
      /** Wall time of the whole sweep [ms]. */
      elapsed: number;
    };

/** Reads a design from field readings; inputs that do not apply to the type fall back to their default. */
function readDesign(readings: { [K in Name]: ReadonlySignal<FieldReading> }, type: DriveType): DrivetrainInput | null {
  const out: Record<string, number | string> = { driveType: type };
  for (const name of NAMES) {
    const reading = readings[name].value;
    if (!applies(name, type)) out[name] = reading.ok ? reading.value : SPECS[name].default;
    else if (reading.ok) out[name] = reading.value;
    else return null;
  }
  return out as DrivetrainInput;
}

const now = () => (typeof performance === "undefined" ? Date.now() : performance.now());

export function createSpinUpModel(system: UnitSystem = "metric") {
  const fields = createFieldsModel(SPECS, system);
  const driveType = signal<DriveType>("weapon");
  const variants = signal<Variant[]>([]);
  const notices = fields.notices;

  const values = computed(() => readDesign(fields.readings, driveType.value));

  const outcome = computed<Outcome>(() => {
    const input = values.value;
    if (!input) return { input: null, result: null, error: null };
    try {
      return { input, result: simulateSpinUp(input), error: null };
    } catch (error) {
      return { input: null, result: null, error: fieldMessage(error, LABELS) };
    }
  });

  // ---- Variants -------------------------------------------------------------------------------

  const variantInputs = computed<VariantOutcome[]>(() => {
    const base = values.value;
    const type = driveType.value;
    return variants.value.map((variant) => {
      if (!base) return { input: null, result: null, error: null };
      const input: Record<string, number | string> = { ...base };
      for (const name of variant.changed.value) {
        if (!applies(name, type)) continue;
        const reading = variant.fields.readings[name].value;
        if (!reading.ok) return { input: null, result: null, error: null };
        input[name] = reading.value;
      }
      try {
        validateDrivetrainInput(input as DrivetrainInput);
        return { input: input as DrivetrainInput, result: null, error: null };
      } catch (error) {
        return { input: null, result: null, error: fieldMessage(error, LABELS) };
      }
    });
  });

  /** Every variant's result, and which design (0 = the design, 1… = B…) is fastest to its target. */
  const comparison = computed(() => {
    const base = outcome.value;
    const list = variantInputs.value;
    if (!base.input || !base.result || list.length === 0) return null;
    const valid = list.filter((v) => v.input !== null);
    const run = compareDrivetrains([base.input, ...valid.map((v) => v.input!)]);
    let k = 1;
    const outcomes = list.map((v) => (v.input ? { ...v, result: run.results[k++]! } : v));
    // Index into [design, ...variants], counting the invalid variants too.
    const designIndex = (i: number | null) => (i === null ? null : i === 0 ? 0 : list.indexOf(valid[i - 1]!) + 1);
    return { base: run.results[0]!, variants: outcomes, fastest: designIndex(run.fastestIndex), highest: designIndex(run.topSpeedIndex) };
  });

  function addVariant(): void {
    if (variants.value.length >= VARIANT_KEYS.length) return;
    variants.value = [...variants.value, { fields: createFieldsModel(SPECS, fields.system.value), changed: signal<Name[]>([]) }];
  }

  function removeVariant(index: number): void {
    variants.value = variants.value.filter((_, i) => i !== index);
  }

  /** Makes a variant differ in `name`, starting from the design's current text. */
  function changeInVariant(index: number, name: Name): void {
    const variant = variants.value[index];
    if (!variant || variant.changed.value.includes(name)) return;
    batch(() => {
      variant.fields.texts[name].value = fields.texts[name].value;
      variant.changed.value = [...variant.changed.value, name];
    });
  }

  function unchangeInVariant(index: number, name: Name): void {
    const variant = variants.value[index];
    if (variant) variant.changed.value = variant.changed.value.filter((n) => n !== name);
  }

  // ---- Sweep ----------------------------------------------------------------------------------

  const sweepOn = signal(false);
  const sweepParameter = signal<Name>("gearRatio");
  const sweepFrom = signal("");
  const sweepTo = signal("");
  const sweepPoints = signal(String(POINTS_SPEC.default));
  const fromReading = computed(() => readField(sweepSpec(sweepParameter.value, "from"), sweepFrom.value, fields.system.value));
  const toReading = computed(() => readField(sweepSpec(sweepParameter.value, "to"), sweepTo.value, fields.system.value));
  const pointsReading = computed(() => readField(POINTS_SPEC, sweepPoints.value, fields.system.value));
  /** A rule across the sweep's fields, shown beside "To". */
  const sweepRangeError = computed(() => {
    const a = fromReading.value;
    const b = toReading.value;
    return a.ok && b.ok && a.value === b.value ? "To must differ from From." : null;
  });
  const sweepState = signal<SweepState>({ status: "off" });

  /** Picks the input to sweep and fills its range around the design's current value. */
  function setSweepParameter(name: Name): void {
    const reading = fields.readings[name].value;
    const [low, high] = defaultSweepRange(name, reading.ok ? reading.value : SPECS[name].default);
    const system = fields.system.value;
    batch(() => {
      sweepParameter.value = name;
      sweepFrom.value = textFor(sweepSpec(name, "from"), low, system, 4);
      sweepTo.value = textFor(sweepSpec(name, "to"), high, system, 4);
    });
  }

  setSweepParameter(sweepParameter.value);

  function startSweep(): void {
    sweepOn.value = true;
  }

  /**
   * Runs the sweep whenever it is on and its inputs change: the points in batches of about 8 ms,
   * yielding to the page between batches (`schedule`), so typing never waits for a whole sweep.
   * Returns the function that stops it. Browser or test only.
   */
  function runSweeps(schedule: (next: () => void) => void = (next) => void setTimeout(next, 0)): () => void {
    let cancel = () => {};
    const stop = effect(() => {
      cancel();
      cancel = () => {};
      if (!sweepOn.value) {
        sweepState.value = { status: "off" };
        return;
      }
      const base = values.value;
      const parameter = sweepParameter.value;
      const from = fromReading.value;
      const to = toReading.value;
      const count = pointsReading.value;
      if (!base || !outcome.value.result || !from.ok || !to.ok || !count.ok || sweepRangeError.value || !applies(parameter, base.driveType as DriveType)) {
        sweepState.value = { status: "waiting" };
        return;
      }
      let list: number[];
      try {
        list = sweepValues({ parameter, from: from.value, to: to.value, points: count.value });
      } catch (error) {
        sweepState.value = { status: "error", message: fieldMessage(error, { from: "From", to: "To", points: "Points" }).message };
        return;
      }
      const points: SweepPoint[] = [];
      let next = 0;
      let skipped = 0;
      let skippedReason: string | null = null;
      let stopped = false;
      cancel = () => {
        stopped = true;
      };
      const started = now();
      const batchOfPoints = () => {
        if (stopped) return;
        const batchStart = now();
        do {
          try {
            points.push(sweepPoint({ base, parameter, value: list[next]! }));
          } catch (error) {
            skipped++;
            skippedReason ??= fieldMessage(error, LABELS).message;
          }
          next++;
        } while (next < list.length && now() - batchStart < 8);
        if (next < list.length) {
          sweepState.value = { status: "running", done: next, total: list.length };
          schedule(batchOfPoints);
        } else if (points.length === 0) {
          sweepState.value = { status: "error", message: skippedReason ?? "No value of the sweep could be computed." };
        } else {
          const best = markSweepOptimum(points);
          sweepState.value = { status: "done", parameter, points, ...best, skipped, skippedReason, elapsed: now() - started };
        }
      };
      sweepState.value = { status: "running", done: 0, total: list.length };
      schedule(batchOfPoints);
    });
    return () => {
      cancel();
      stop();
    };
  }

  // ---- Drive type and units -------------------------------------------------------------------

  /** True when every field holds the demo robot of `type` (nothing edited yet). */
  function holdsDemo(type: DriveType): boolean {
    const demo = type === "spinner" ? DEMO_SPINNER : DEMO_WEAPON;
    return NAMES.every((name) => {
      const reading = fields.readings[name].value;
      return reading.ok && Math.abs(reading.value - demo[name]) <= 1e-9 * Math.abs(demo[name]);
    });
  }

  /**
   * Switches the drive type. While the fields still hold one demo robot, the other demo's values
   * come in with the switch (a fresh page switched to "spinner" shows the demo spinner); edited
   * values are kept as they are.
   */
  function setDriveType(next: DriveType): void {
    const current = driveType.value;
    if (next === current) return;
    batch(() => {
      if (variants.value.length === 0 && holdsDemo(current)) {
        const demo = next === "spinner" ? DEMO_SPINNER : DEMO_WEAPON;
        for (const name of NAMES) fields.texts[name].value = textFor(SPECS[name], demo[name], fields.system.value);
      }
      if (!applies(sweepParameter.value, next)) setSweepParameter("gearRatio");
      driveType.value = next;
    });
  }

  function setSystem(next: UnitSystem): void {
    const convert = (text: Signal<string>, reading: ReadonlySignal<FieldReading>, spec: InputSpec) => {
      const r = reading.value;
      if (r.ok && r.unit !== fieldUnit(spec, next)) text.value = textFor(spec, r.value, next, 6);
    };
    batch(() => {
      convert(sweepFrom, fromReading, sweepSpec(sweepParameter.value, "from"));
      convert(sweepTo, toReading, sweepSpec(sweepParameter.value, "to"));
      fields.setSystem(next);
      for (const variant of variants.value) variant.fields.setSystem(next);
    });
  }

  // ---- The URL --------------------------------------------------------------------------------

  function applyQuery(search: string): void {
    const params = new URLSearchParams(search);
    const extra: string[] = [];
    const rest = new URLSearchParams();
    let type: DriveType | null = null;
    let count = 0;
    const seen = new Set<string>();
    const scoped = new Map<string, [string, string][]>();
    for (const [key, value] of params) {
      const dot = key.indexOf(".");
      if (dot >= 0) {
        const scope = key.slice(0, dot);
        if (!scoped.has(scope)) scoped.set(scope, []);
        scoped.get(scope)!.push([key.slice(dot + 1), value]);
        continue;
      }
      if (key !== DRIVE_TYPE_URL_KEY && key !== VARIANTS_URL_KEY) {
        rest.append(key, value);
        continue;
      }
      if (seen.has(key)) {
        extra.push(`The link sets ${quote(key)} more than once; the first value was used.`);
        continue;
      }
      seen.add(key);
      if (key === DRIVE_TYPE_URL_KEY) {
        const option = DRIVE_TYPE_OPTIONS.find((o) => o.value === value);
        if (option) type = option.value;
        else extra.push(`The link's drive type ${quote(value)} is not one this calculator offers (use "weapon" or "spinner"); it was ignored.`);
      } else if (/^[0-3]$/.test(value)) count = Number(value);
      else extra.push(`The link's number of variants ${quote(value)} is not 0 to 3; it was ignored.`);
    }
    for (const scope of scoped.keys()) {
      const index = (VARIANT_KEYS as readonly string[]).indexOf(scope);
      if (index >= 0) count = Math.max(count, index + 1);
      else if (scope !== SWEEP_SCOPE) extra.push(`The link has parameters for ${quote(`${scope}.`)}, which this calculator does not use; they were ignored.`);
    }

    batch(() => {
      if (type) driveType.value = type;
      fields.applyQuery(rest.toString());
      const system = fields.system.value;
      const next: Variant[] = [];
      for (let i = 0; i < count; i++) {
        const decoded = decodeState(SPECS, search, VARIANT_KEYS[i]);
        const variant: Variant = { fields: createFieldsModel(SPECS, system), changed: signal<Name[]>([]) };
        const changed: Name[] = [];
        for (const name of NAMES) {
          const text = decoded.texts[name];
          if (text === undefined) continue;
          variant.fields.texts[name].value = tidy(SPECS[name], text, system);
          changed.push(name);
        }
        variant.changed.value = changed;
        extra.push(...decoded.notices);
        next.push(variant);
      }
      variants.value = next;
      readSweep(scoped.get(SWEEP_SCOPE) ?? [], extra);
      notices.value = [...notices.value, ...extra];
    });
  }

  function readSweep(entries: [string, string][], extra: string[]): void {
    if (entries.length === 0) return;
    const given = new Map<string, string>();
    for (const [key, value] of entries) {
      const full = `${SWEEP_SCOPE}.${key}`;
      if (given.has(key)) extra.push(`The link sets ${quote(full)} more than once; the first value was used.`);
      else if (!["p", "from", "to", "n"].includes(key))
        extra.push(`The link has a parameter ${quote(full)} that this calculator does not use; it was ignored.`);
      else if (value.length > MAX_VALUE_LENGTH)
        extra.push(`The link's value for ${quote(full)} is longer than ${MAX_VALUE_LENGTH} characters; it was ignored.`);
      else given.set(key, value);
    }
    const key = given.get("p");
    const name = SWEEPABLE.find((n) => SPECS[n].urlKey === key);
    if (!name || !applies(name, driveType.value)) {
      extra.push(
        key === undefined
          ? "The link has sweep settings but no input to sweep (s.p); they were ignored."
          : `The link asks to sweep ${quote(key)}, which this calculator cannot sweep for this drive type; the sweep was left off.`,
      );
      return;
    }
    setSweepParameter(name);
    const system = fields.system.value;
    if (given.has("from")) sweepFrom.value = tidy(sweepSpec(name, "from"), given.get("from")!, system);
    if (given.has("to")) sweepTo.value = tidy(sweepSpec(name, "to"), given.get("to")!, system);
    if (given.has("n")) sweepPoints.value = given.get("n")!;
    sweepOn.value = true;
  }

  function queryFor(existing: string): string {
    const type = driveType.value;
    const texts: Record<string, string> = {};
    for (const name of NAMES) if (applies(name, type)) texts[name] = fields.texts[name].value;
    const list = variants.value;
    const extra: Record<string, string> = { [DRIVE_TYPE_URL_KEY]: type };
    if (list.length > 0) extra[VARIANTS_URL_KEY] = String(list.length);
    const params = new URLSearchParams(encodeState(SPECS, texts, fields.system.value, "", existing, extra));
    const mine = new RegExp(`^(?:${[...VARIANT_KEYS, SWEEP_SCOPE].join("|")})\\.`);
    for (const key of [...params.keys()]) if (mine.test(key)) params.delete(key);
    const compact = (text: string) => text.replace(/\s+/g, "");
    list.forEach((variant, i) => {
      for (const name of variant.changed.value)
        if (applies(name, type)) params.set(`${VARIANT_KEYS[i]}.${SPECS[name].urlKey}`, compact(variant.fields.texts[name].value));
    });
    if (sweepOn.value) {
      params.set(`${SWEEP_SCOPE}.p`, SPECS[sweepParameter.value].urlKey);
      params.set(`${SWEEP_SCOPE}.from`, compact(sweepFrom.value));
      params.set(`${SWEEP_SCOPE}.to`, compact(sweepTo.value));
      params.set(`${SWEEP_SCOPE}.n`, compact(sweepPoints.value));
    }
    params.delete("v");
    params.sort();
    return `v=1&${params.toString()}`.replace(/%2F/g, "/");
  }

  /** The whole calculator's state as a link, for `syncWithUrl` and `linkFor`. */
  const link: UrlState = { applyQuery, queryFor };

  return {
    fields,
    driveType,
    values,
    outcome,
    variants,
    variantInputs,
    comparison,
    addVariant,
    removeVariant,
    changeInVariant,
    unchangeInVariant,
    sweep: {
      on: sweepOn,
      parameter: sweepParameter,
      from: sweepFrom,
      to: sweepTo,
      points: sweepPoints,
      fromReading,
      toReading,
      pointsReading,
      rangeError: sweepRangeError,
      state: sweepState,
      setParameter: setSweepParameter,
      start: startSweep,
    },
    runSweeps,
    setDriveType,
    setSystem,
    link,
  };
}

export type SpinUpModel = ReturnType<typeof createSpinUpModel>;
