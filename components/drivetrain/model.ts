/**
 * The spin-up calculator's model: the design (calc/calculators/spin-up.ts, with its drive type)
 * simulated with its time series, up to three comparison variants (variants.ts) and a one-input
 * sweep (sweep.ts). The page link is the descriptor's grammar: the design's keys, then the
 * variants ("variants=2&b.ratio=3") and the sweep ("s.p=ratio&s.from=1…"), as
 * `readSpinUpView`/`spinUpViewKeys` read and write them. No DOM.
 */
import {
  applies,
  form as spinUp,
  run as spinUpRun,
  readSpinUpView,
  SPINNER_ONLY,
  spinUpViewKeys,
  SWEEP_SCOPE,
  SWEEPABLE,
  VARIANT_SCOPES,
} from "../../calc/calculators/spin-up.ts";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../calc/drivetrain/demo.ts";
import type { DriveType, DrivetrainInput, DrivetrainParameter } from "../../calc/drivetrain/inputs.ts";
import type { SpinUpResult } from "../../calc/drivetrain/results.ts";
import { simulateSpinUp } from "../../calc/drivetrain/simulate.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { fieldMessage } from "../calc-ui/fields.ts";
import { createCalculatorModel, type FieldError } from "../calc-ui/model.ts";
import { batch, computed, type Signal } from "../calc-ui/reactive.ts";
import { createSweep, textFor } from "./sweep.ts";
import { createVariants } from "./variants.ts";

export { applies, SPINNER_ONLY, SWEEPABLE };
export { POINTS_SPEC, sweepSpec, defaultSweepRange, type SweepState } from "./sweep.ts";
export type { Variant, VariantOutcome } from "./variants.ts";
export type { FieldError };

export type Name = DrivetrainParameter;
export const SPECS = spinUp.inputs;
export const NAMES = Object.keys(SPECS) as Name[];
/** Link scopes of the comparison variants (the design itself is A). */
export const VARIANT_KEYS = VARIANT_SCOPES;

const _LABELS: Record<string, string> = Object.fromEntries(NAMES.map((n) => [n, SPECS[n].label]));

export interface Outcome {
  input: DrivetrainInput | null;
  result: SpinUpResult | null;
  error: FieldError;
}

export function createSpinUpModel(system: UnitSystem = "metric") {
  const design = createCalculatorModel(spinUp, spinUpRun, system);
  const { fields } = design;
  const driveType = design.choices.driveType as Signal<DriveType>;
  const values = computed(() => design.values.value as DrivetrainInput | null);

  /** The design simulated with its time series (the build sheet's run leaves the series out). */
  const outcome = computed<Outcome>(() => {
    const input = values.value;
    if (!input) return { input: null, result: null, error: null };
    try {
      return { input, result: simulateSpinUp(input), error: null };
    } catch (error) {
      return { input: null, result: null, error: fieldMessage(error, SPECS, fields.system.value) };
    }
  });

  const variants = createVariants({ fields, values, driveType }, outcome);
  const sweep = createSweep({ fields, values, hasResult: computed(() => outcome.value.result !== null) });

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
      if (variants.variants.value.length === 0 && holdsDemo(current)) {
        const demo = next === "spinner" ? DEMO_SPINNER : DEMO_WEAPON;
        for (const name of NAMES) fields.texts[name].value = textFor(SPECS[name], demo[name], fields.system.value);
      }
      sweep.fitDriveType(next);
      driveType.value = next;
    });
  }

  function setSystem(next: UnitSystem): void {
    batch(() => {
      sweep.setSystem(next);
      design.setSystem(next);
      variants.setSystem(next);
    });
  }

  /** Applies a link: the design, then its variants and sweep. */
  function applyQuery(search: string): void {
    batch(() => {
      design.applyQuery(search);
      const view = readSpinUpView(search, driveType.value);
      variants.applyTexts(view.view.variants);
      sweep.applyText(view.view.sweep);
      design.notices.value = [...design.notices.value, ...view.notices];
    });
  }

  /** The link of the whole calculator: the design's keys, the variants and the sweep. */
  function queryFor(existing: string): string {
    const mine = new RegExp(`^(?:${[...VARIANT_SCOPES, SWEEP_SCOPE].join("|")})\\.`);
    const others = new URLSearchParams(existing);
    for (const key of [...others.keys()]) if (mine.test(key)) others.delete(key);
    return design.queryFor(others.toString(), spinUpViewKeys({ variants: variants.texts(), sweep: sweep.text() }, driveType.value));
  }

  return {
    fields,
    driveType,
    /** Where the current limit acts, and how the no-load loss is modelled. */
    currentLimitAt: design.choices.currentLimitAt,
    noLoadLoss: design.choices.noLoadLoss,
    values,
    outcome,
    variants: variants.variants,
    variantInputs: variants.variantInputs,
    comparison: variants.comparison,
    addVariant: variants.add,
    removeVariant: variants.remove,
    changeInVariant: variants.change,
    unchangeInVariant: variants.unchange,
    sweep: {
      on: sweep.on,
      parameter: sweep.parameter,
      from: sweep.from,
      to: sweep.to,
      points: sweep.points,
      fromReading: sweep.fromReading,
      toReading: sweep.toReading,
      pointsReading: sweep.pointsReading,
      rangeError: sweep.rangeError,
      state: sweep.state,
      setParameter: sweep.setParameter,
      start: sweep.start,
    },
    runSweeps: sweep.run,
    setDriveType,
    setSystem,
    notices: design.notices,
    /** The whole calculator's state as a link, for `syncWithUrl` and `linkFor`. */
    link: { applyQuery, queryFor },
    save: design.save,
  };
}

export type SpinUpModel = ReturnType<typeof createSpinUpModel>;
