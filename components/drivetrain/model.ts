/**
 * The spin-up calculator's model: the design (calc/drivetrain/spin-up-form.ts, with its drive type)
 * simulated with its time series, up to three comparison variants (variants.ts) and a one-input
 * sweep (sweep.ts). The page link is the descriptor's grammar: the design's keys, then the
 * variants ("variants=2&b.ratio=3") and the sweep ("s.p=ratio&s.from=1…"), as
 * `readSpinUpView`/`spinUpViewKeys` read and write them. No DOM.
 *
 * What loads when: the page comes with the default design's result, computed when the site was
 * built (`prepared`), so opening it simulates nothing. The simulation's code loads on the first
 * change (or at once when the link holds other values), and each run happens in a task of its own
 * after the edit, the newest edit winning. The comparison and the sweep load on first use (or at
 * once when the link holds them).
 */
import { applies, form as spinUp, SPINNER_ONLY } from "../../calc/drivetrain/spin-up-form.ts";
import { readSpinUpView, spinUpViewKeys, SWEEP_SCOPE, SWEEPABLE, VARIANT_SCOPES } from "../../calc/drivetrain/spin-up-view.ts";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../calc/drivetrain/demo-robots.ts";
import type { DriveType, DrivetrainInput, DrivetrainParameter } from "../../calc/drivetrain/inputs.ts";
import type { SpinUpResult } from "../../calc/drivetrain/results.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { fieldMessage } from "../calc-ui/fields.ts";
import { createCalculatorModel, type FieldError } from "../calc-ui/model.ts";
import { batch, computed, effect, type Signal, signal } from "../calc-ui/reactive.ts";
import type { SpinUpViewText } from "../../calc/drivetrain/spin-up-view.ts";
import { textFor } from "./format.ts";
import type { createSweep, SweepState } from "./sweep.ts";
import type { createVariants, Variant, VariantOutcome } from "./variants.ts";

export { applies, SPINNER_ONLY, SWEEPABLE };
export type { SweepState, Variant, VariantOutcome };
export type { FieldError };

export type Name = DrivetrainParameter;
export const SPECS = spinUp.inputs;
export const NAMES = Object.keys(SPECS) as Name[];
/** Link scopes of the comparison variants (the design itself is A). */
export const VARIANT_KEYS = VARIANT_SCOPES;

export interface Outcome {
  input: DrivetrainInput | null;
  result: SpinUpResult | null;
  error: FieldError;
}

/** The default design and its result, computed when the site is built and shipped with the page. */
export interface SpinUpPrepared {
  input: Readonly<DrivetrainInput>;
  result: SpinUpResult;
}

export type VariantsPart = ReturnType<typeof createVariants>;
export type SweepPart = ReturnType<typeof createSweep>;

/** The code that loads on demand: the simulation, the comparison (model and view), the sweep (model and view). */
export interface SpinUpModules {
  simulation: Pick<typeof import("../../calc/drivetrain/simulate.ts"), "simulateSpinUp">;
  compare: typeof import("./Compare.tsx");
  sweep: typeof import("./Sweep.tsx");
}

const LOADERS: { [K in keyof SpinUpModules]: () => Promise<SpinUpModules[K]> } = {
  simulation: () => import("../../calc/drivetrain/simulate.ts"),
  compare: () => import("./Compare.tsx"),
  sweep: () => import("./Sweep.tsx"),
};

export interface SpinUpModelOptions {
  system?: UnitSystem;
  /** The default design's result, computed at build time; shown while the design holds exactly those values. */
  prepared?: SpinUpPrepared | null;
  /** Modules already at hand (tests): no loading, the parts exist from the start. */
  modules?: Partial<SpinUpModules>;
  /** Runs work later, after the edit that asked for it (default: a task of its own); tests pass `(next) => next()`. */
  schedule?: (next: () => void) => void;
}

/** True when two designs hold the same values (numbers to 1e-12: field text reads back within rounding of its last digit). */
function sameDesign(a: Readonly<DrivetrainInput>, b: Readonly<DrivetrainInput>): boolean {
  const keys = Object.keys(a);
  if (keys.length !== Object.keys(b).length) return false;
  return keys.every((key) => {
    const x = a[key as keyof DrivetrainInput];
    const y = b[key as keyof DrivetrainInput];
    return typeof x === "number" && typeof y === "number" ? Math.abs(x - y) <= 1e-12 * Math.abs(y) : x === y;
  });
}

const later = (next: () => void) => void setTimeout(next, 0);

export function createSpinUpModel(options: SpinUpModelOptions = {}) {
  const { prepared = null, schedule = later } = options;
  // The descriptor's own run (the build sheet's, without the time series) is not used here: the
  // outcome below simulates with the series, in the simulation's own chunk.
  const design = createCalculatorModel(spinUp, () => null, options.system ?? "metric");
  const { fields } = design;
  const driveType = design.choices.driveType as Signal<DriveType>;
  const values = computed(() => design.values.value as DrivetrainInput | null);

  /** Loaded modules by name; a module being loaded has its promise in `loading`. */
  const modules = signal<Partial<SpinUpModules>>({ ...options.modules });
  const loading = new Map<keyof SpinUpModules, Promise<unknown>>();
  function load<K extends keyof SpinUpModules>(name: K): Promise<SpinUpModules[K]> {
    const have = modules.peek()[name];
    if (have) return Promise.resolve(have);
    let promise = loading.get(name) as Promise<SpinUpModules[K]> | undefined;
    if (!promise) {
      promise = LOADERS[name]().then((module) => {
        modules.value = { ...modules.peek(), [name]: module };
        return module;
      });
      loading.set(name, promise);
      // A failed load may be retried by the next request.
      promise.catch(() => loading.delete(name));
    }
    return promise;
  }
  /** Runs `use` with module `name`: at once when it is here, else once it has loaded. */
  function withModule<K extends keyof SpinUpModules>(name: K, use: (module: SpinUpModules[K]) => void): void {
    const have = modules.peek()[name];
    if (have) use(have);
    else load(name).then(use, () => {});
  }

  /** The design's result: the prepared one while the design is the default, else the newest simulation. */
  const outcome = signal<Outcome>({ input: null, result: null, error: null });
  /** The same, one task later: the charts, drawn after the figures so that no task does both. */
  const charted = signal<Outcome>(outcome.peek());
  /** The error beside a field; changes only when the error does (the form re-renders only then). */
  const fieldError = signal<FieldError>(null);
  /** True while a change waits for its simulation (the results shown are the previous design's). */
  const pending = signal(false);
  /** Whether the design has a result; changes only when that does (the sweep restarts on it). */
  const hasResult = signal(false);
  /** Shows an outcome: the figures now, the charts `later` (or now). */
  function show(next: Outcome, mine: number, chartsLater: boolean): void {
    batch(() => {
      outcome.value = next;
      pending.value = false;
      hasResult.value = next.result !== null;
      const e = fieldError.peek();
      if (next.error?.field !== e?.field || next.error?.message !== e?.message) fieldError.value = next.error;
      if (!chartsLater) charted.value = next;
    });
    if (chartsLater)
      schedule(() => {
        if (mine === generation) charted.value = next;
      });
  }
  let generation = 0;
  let changed = false;
  function simulate(sim: SpinUpModules["simulation"], input: DrivetrainInput): Outcome {
    try {
      return { input, result: sim.simulateSpinUp(input), error: null };
    } catch (error) {
      return { input: null, result: null, error: fieldMessage(error, SPECS, fields.system.peek()) };
    }
  }
  effect(() => {
    const input = values.value;
    const mine = ++generation;
    if (!input) {
      changed = true;
      return show({ input: null, result: null, error: null }, mine, false);
    }
    // The prepared result stands for the page as it opened; from the first change on, every design is simulated (the defaults too).
    if (prepared && !changed && sameDesign(input, prepared.input)) return show({ input, result: prepared.result, error: null }, mine, false);
    changed = true;
    pending.value = true;
    // One run takes well under a frame; it runs in a task of its own after the edit, and only if no newer edit came meanwhile.
    withModule("simulation", (sim) =>
      schedule(() => {
        if (mine === generation) show(simulate(sim, input), mine, true);
      }),
    );
  });

  /** The comparison and the sweep, once their code has loaded (null before). */
  const variantsPart = signal<VariantsPart | null>(null);
  const sweepPart = signal<SweepPart | null>(null);
  /** A link's comparison and sweep, kept for the link while their code loads. */
  let waitingView: SpinUpViewText = { variants: [], sweep: null };
  let stopSweeps: (() => void) | null = null;
  let started = false;

  function variants(then?: (part: VariantsPart) => void): void {
    withModule("compare", (module) => {
      let part = variantsPart.peek();
      if (!part) {
        part = module.createVariants({ fields, values, driveType }, outcome);
        part.run(schedule);
        part.applyTexts(waitingView.variants);
        part.setSystem(fields.system.peek());
        waitingView = { ...waitingView, variants: [] };
        variantsPart.value = part;
      }
      then?.(part);
    });
  }

  function sweep(then?: (part: SweepPart) => void): void {
    withModule("sweep", (module) => {
      let part = sweepPart.peek();
      if (!part) {
        part = module.createSweep({ fields, values, hasResult });
        part.applyText(waitingView.sweep);
        waitingView = { ...waitingView, sweep: null };
        sweepPart.value = part;
        if (started) stopSweeps = part.run(schedule);
      }
      then?.(part);
    });
  }
  if (options.modules?.compare) variants();
  if (options.modules?.sweep) sweep();

  /** True when every field holds the demo robot of `type` (nothing edited yet). */
  function holdsDemo(type: string): boolean {
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
      if ((variantsPart.peek()?.variants.value.length ?? waitingView.variants.length) === 0 && holdsDemo(current)) {
        const demo = next === "spinner" ? DEMO_SPINNER : DEMO_WEAPON;
        for (const name of NAMES) fields.texts[name].value = textFor(SPECS[name], demo[name], fields.system.value);
      }
      sweepPart.peek()?.fitDriveType(next);
      driveType.value = next;
    });
  }

  function setSystem(next: UnitSystem): void {
    batch(() => {
      sweepPart.peek()?.setSystem(next);
      design.setSystem(next);
      variantsPart.peek()?.setSystem(next);
    });
  }

  /** Applies a link: the design, then its variants and sweep (their code loads first when the link holds them). */
  function applyQuery(search: string): void {
    batch(() => {
      design.applyQuery(search);
      const view = readSpinUpView(search, driveType.value);
      design.notices.value = [...design.notices.value, ...view.notices];
      const v = variantsPart.peek();
      const s = sweepPart.peek();
      if (v) v.applyTexts(view.view.variants);
      if (s) s.applyText(view.view.sweep);
      waitingView = { variants: v ? [] : view.view.variants, sweep: s ? null : view.view.sweep };
      if (!v && view.view.variants.length > 0) variants();
      if (!s && view.view.sweep) sweep();
    });
  }

  /** The link of the whole calculator: the design's keys, the variants and the sweep. */
  function queryFor(existing: string): string {
    const mine = new RegExp(`^(?:${[...VARIANT_SCOPES, SWEEP_SCOPE].join("|")})\\.`);
    const others = new URLSearchParams(existing);
    for (const key of [...others.keys()]) if (mine.test(key)) others.delete(key);
    const v = variantsPart.value;
    const s = sweepPart.value;
    const view = { variants: v ? v.texts() : waitingView.variants, sweep: s ? s.text() : waitingView.sweep };
    return design.queryFor(others.toString(), spinUpViewKeys(view, driveType.value));
  }

  /** Starts what runs in the browser only: the sweep runner (now, or when the sweep's code arrives). Returns the stop. */
  function start(): () => void {
    started = true;
    const part = sweepPart.peek();
    if (part && !stopSweeps) stopSweeps = part.run(schedule);
    return () => {
      started = false;
      stopSweeps?.();
      stopSweeps = null;
    };
  }

  const noVariants: Variant[] = [];
  return {
    fields,
    driveType,
    /** Where the current limit acts, and how the no-load loss is modelled. */
    currentLimitAt: design.choices.currentLimitAt,
    noLoadLoss: design.choices.noLoadLoss,
    values,
    outcome,
    charted,
    fieldError,
    pending,
    modules,
    variantsPart,
    sweepPart,
    variants: computed(() => variantsPart.value?.variants.value ?? noVariants),
    variantInputs: computed(() => variantsPart.value?.variantInputs.value ?? []),
    comparison: computed(() => variantsPart.value?.comparison.value ?? null),
    /** Loads the comparison (once) and adds a variant. */
    addVariant: () => variants((part) => part.add()),
    removeVariant: (index: number) => variantsPart.peek()?.remove(index),
    changeInVariant: (index: number, name: Name) => variantsPart.peek()?.change(index, name),
    unchangeInVariant: (index: number, name: Name) => variantsPart.peek()?.unchange(index, name),
    /** Loads the sweep (once); `then` runs with it. */
    openSweep: sweep,
    /** Loads the sweep (once) and runs it. */
    startSweep: () => sweep((part) => part.start()),
    start,
    setDriveType,
    setSystem,
    notices: design.notices,
    /** The whole calculator's state as a link, for `syncWithUrl` and `linkFor`. */
    link: { applyQuery, queryFor },
    save: design.save,
  };
}

export type SpinUpModel = ReturnType<typeof createSpinUpModel>;
