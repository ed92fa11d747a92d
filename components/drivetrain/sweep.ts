/**
 * The spin-up calculator's sweep: one input varied over a range, every point simulated in batches
 * that leave the page responsive, the best point marked. No DOM (the runner uses timers only when
 * started).
 */
import { applies } from "../../calc/drivetrain/spin-up-form.ts";
import { SWEEPABLE } from "../../calc/drivetrain/spin-up-view.ts";
import { form as spinUp } from "../../calc/drivetrain/spin-up-form.ts";
import { type DrivetrainSweep, markSweepOptimum, type SweepPoint, sweepPoint, sweepValues } from "../../calc/drivetrain/compare.ts";
import type { DriveType, DrivetrainInput, DrivetrainParameter } from "../../calc/drivetrain/inputs.ts";
import { fieldUnit, type InputSpec, readField } from "../../calc/core/inputs.ts";
import { parseQuantity, type UnitSystem, unitDef } from "../../calc/core/units.ts";
import { textFor } from "./format.ts";
import { type FieldsModel, fieldMessage } from "../calc-ui/fields.ts";
import { batch, computed, effect, type ReadonlySignal, type Signal, signal } from "../calc-ui/reactive.ts";

type Name = DrivetrainParameter;
const SPECS = spinUp.inputs;

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

/** A sweep range around `value` that stays inside the input's declared range. */
export function defaultSweepRange(name: Name, value: number): [number, number] {
  const spec: InputSpec = SPECS[name];
  if (spec.integer) return [Math.max(spec.min, value - 2), Math.min(spec.max, value + 4)];
  const low = spec.min > 0 || spec.minOpen ? Math.max(value / 2, spec.min * (spec.minOpen ? 1.01 : 1)) : value / 2;
  const high = Math.min(value * 2, spec.max);
  return [low, high > low ? high : spec.max];
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

const now = () => (typeof performance === "undefined" ? Date.now() : performance.now());

export function createSweep(design: { fields: FieldsModel<typeof SPECS>; values: ReadonlySignal<DrivetrainInput | null>; hasResult: ReadonlySignal<boolean> }) {
  const { fields } = design;
  const on = signal(false);
  const parameter = signal<Name>("gearRatio");
  const from = signal("");
  const to = signal("");
  const points = signal(String(POINTS_SPEC.default));
  const fromReading = computed(() => readField(sweepSpec(parameter.value, "from"), from.value, fields.system.value));
  const toReading = computed(() => readField(sweepSpec(parameter.value, "to"), to.value, fields.system.value));
  const pointsReading = computed(() => readField(POINTS_SPEC, points.value, fields.system.value));
  /** A rule across the sweep's fields, shown beside "To". */
  const rangeError = computed(() => {
    const a = fromReading.value;
    const b = toReading.value;
    return a.ok && b.ok && a.value === b.value ? "To must differ from From." : null;
  });
  const state = signal<SweepState>({ status: "off" });
  /** The last finished sweep while it is on (shown while a change reruns it). */
  const last = signal<Extract<SweepState, { status: "done" }> | null>(null);

  /** Picks the input to sweep and fills its range around the design's current value. */
  function setParameter(name: Name): void {
    const reading = fields.readings[name].value;
    const [low, high] = defaultSweepRange(name, reading.ok ? reading.value : SPECS[name].default);
    const system = fields.system.value;
    batch(() => {
      parameter.value = name;
      from.value = textFor(sweepSpec(name, "from"), low, system, 4);
      to.value = textFor(sweepSpec(name, "to"), high, system, 4);
    });
  }
  setParameter(parameter.value);

  /**
   * Runs the sweep whenever it is on and its inputs change: the points in batches of about 8 ms,
   * yielding to the page between batches (`schedule`), so typing never waits for a whole sweep.
   * Returns the function that stops it. Browser or test only.
   */
  function run(schedule: (next: () => void) => void = (next) => void setTimeout(next, 0)): () => void {
    let cancel = () => {};
    const stop = effect(() => {
      cancel();
      cancel = () => {};
      if (!on.value) {
        batch(() => {
          state.value = { status: "off" };
          last.value = null;
        });
        return;
      }
      const base = design.values.value;
      const name = parameter.value;
      const a = fromReading.value;
      const b = toReading.value;
      const count = pointsReading.value;
      if (!base || !design.hasResult.value || !a.ok || !b.ok || !count.ok || rangeError.value || !applies(name, base.driveType as DriveType)) {
        state.value = { status: "waiting" };
        return;
      }
      let list: number[];
      try {
        list = sweepValues({ parameter: name, from: a.value, to: b.value, points: count.value });
      } catch (error) {
        state.value = { status: "error", message: fieldMessage(error, { from: "From", to: "To", points: "Points" }).message };
        return;
      }
      const done: SweepPoint[] = [];
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
            done.push(sweepPoint({ base, parameter: name, value: list[next]! }));
          } catch (error) {
            skipped++;
            skippedReason ??= fieldMessage(error, SPECS, fields.system.value).message;
          }
          next++;
        } while (next < list.length && now() - batchStart < 8);
        if (next < list.length) {
          state.value = { status: "running", done: next, total: list.length };
          schedule(batchOfPoints);
        } else if (done.length === 0) {
          state.value = { status: "error", message: skippedReason ?? "No value of the sweep could be computed." };
        } else {
          const best = markSweepOptimum(done);
          const finished = { status: "done", parameter: name, points: done, ...best, skipped, skippedReason, elapsed: now() - started } as const;
          // Drawn in a task of its own: the last batch and the results' charts and table never add up in one.
          schedule(() => {
            if (stopped) return;
            batch(() => {
              state.value = finished;
              last.value = finished;
            });
          });
        }
      };
      state.value = { status: "running", done: 0, total: list.length };
      schedule(batchOfPoints);
    });
    return () => {
      cancel();
      stop();
    };
  }

  /** Shows "3000rpm" from a link as "3000 rpm"; text that does not read is left as it came. */
  function tidy(spec: InputSpec, text: string): string {
    const parsed = parseQuantity(text, spec.kind, fieldUnit(spec, fields.system.value));
    const symbol = parsed.ok ? unitDef(parsed.unit).symbol : "";
    return parsed.ok && /\d\s*\D/.test(text) ? `${parsed.number}${symbol ? ` ${symbol}` : ""}` : text;
  }

  /** Shows a link's sweep (null: none). */
  function applyText(sweep: { parameter: Name; from: string; to: string; points: string } | null): void {
    if (!sweep) return;
    batch(() => {
      setParameter(sweep.parameter);
      if (sweep.from) from.value = tidy(sweepSpec(sweep.parameter, "from"), sweep.from);
      if (sweep.to) to.value = tidy(sweepSpec(sweep.parameter, "to"), sweep.to);
      if (sweep.points) points.value = sweep.points;
      on.value = true;
    });
  }

  /** The sweep as field text for the link, or null while none is shown. */
  const text = () => (on.value ? { parameter: parameter.value, from: from.value, to: to.value, points: points.value } : null);

  /** Re-expresses the range in the new system's unit. */
  function setSystem(next: UnitSystem): void {
    const convert = (field: Signal<string>, reading: ReadonlySignal<ReturnType<typeof readField>>, spec: InputSpec) => {
      const r = reading.value;
      if (r.ok && r.unit !== fieldUnit(spec, next)) field.value = textFor(spec, r.value, next, 6);
    };
    convert(from, fromReading, sweepSpec(parameter.value, "from"));
    convert(to, toReading, sweepSpec(parameter.value, "to"));
  }

  /** Keeps the swept input one that applies to the drive type. */
  function fitDriveType(type: DriveType): void {
    if (!applies(parameter.value, type)) setParameter("gearRatio");
  }

  return {
    on,
    parameter,
    from,
    to,
    points,
    fromReading,
    toReading,
    pointsReading,
    rangeError,
    state,
    last,
    setParameter,
    start: () => {
      on.value = true;
    },
    run,
    applyText,
    text,
    setSystem,
    fitDriveType,
    sweepable: SWEEPABLE,
  };
}
