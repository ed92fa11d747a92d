/**
 * The spin-up calculator's comparison variants: up to three copies of the design with a few inputs
 * changed (B, C, D), each simulated beside the design, one per task. A variant holds only what
 * differs, so editing the design moves every variant with it. No DOM (the runner uses timers only
 * through the `schedule` it is given).
 */
import { applies } from "../../calc/drivetrain/spin-up-form.ts";
import { VARIANT_SCOPES } from "../../calc/drivetrain/spin-up-view.ts";
import { form as spinUp } from "../../calc/drivetrain/spin-up-form.ts";
import { simulateSpinUp } from "../../calc/drivetrain/simulate.ts";
import { type DrivetrainInput, type DrivetrainParameter, validateDrivetrainInput } from "../../calc/drivetrain/inputs.ts";
import type { SpinUpResult } from "../../calc/drivetrain/results.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, type FieldsModel, fieldMessage } from "../calc-ui/fields.ts";
import type { FieldError } from "../calc-ui/model.ts";
import { batch, computed, effect, type ReadonlySignal, type Signal, signal } from "../calc-ui/reactive.ts";

export type Name = DrivetrainParameter;
type Specs = typeof spinUp.inputs;

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

/** The design and its variants simulated: each column's result, and which column is fastest and tops out highest (0 = the design). */
export interface Comparison {
  base: SpinUpResult;
  variants: VariantOutcome[];
  fastest: number | null;
  highest: number | null;
}

/**
 * @param design the design's field texts and its values (null while a field does not read)
 * @param base the design's own simulation (input and result), which the comparison reuses
 */
export function createVariants(
  design: { fields: FieldsModel<Specs>; values: ReadonlySignal<DrivetrainInput | null>; driveType: ReadonlySignal<string> },
  base: ReadonlySignal<{ input: DrivetrainInput | null; result: SpinUpResult | null }>,
) {
  const variants = signal<Variant[]>([]);

  const variantInputs = computed<VariantOutcome[]>(() => {
    const values = design.values.value;
    const type = design.driveType.value;
    return variants.value.map((variant) => {
      if (!values) return { input: null, result: null, error: null };
      const input: Record<string, number | string> = { ...values };
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
        return { input: null, result: null, error: fieldMessage(error, spinUp.inputs, design.fields.system.value) };
      }
    });
  });

  /** Every variant's result, and which design (0 = the design, 1… = B…) is fastest to its target. */
  const comparison = signal<Comparison | null>(null);

  /**
   * Simulates the variants whenever the design or a variant changes: one variant per task
   * (`schedule`), the design's own result reused, the newest change winning (a run overtaken by a
   * change stops). Until a run ends, the table shows the previous one. Returns the stop.
   */
  function run(schedule: (next: () => void) => void): () => void {
    let generation = 0;
    const stop = effect(() => {
      const own = base.value;
      const list = variantInputs.value;
      const mine = ++generation;
      if (!own.input || !own.result || list.length === 0) {
        comparison.value = null;
        return;
      }
      // The design changed and its own run is on its way: the table stays as it was until then.
      if (own.input !== design.values.peek()) return;
      const ownResult = own.result;
      const outcomes: VariantOutcome[] = list.map((v) => ({ ...v }));
      let k = 0;
      const next = () => {
        if (mine !== generation) return;
        while (k < list.length && !list[k]!.input) k++;
        if (k < list.length) {
          const outcome = outcomes[k]!;
          try {
            outcome.result = simulateSpinUp(outcome.input!);
          } catch (error) {
            outcome.input = null;
            outcome.error = fieldMessage(error, spinUp.inputs, design.fields.system.peek());
          }
          k++;
          schedule(next);
          return;
        }
        // As compareDrivetrains ranks them: the first shortest time to target, the first highest top speed.
        const results = [ownResult, ...outcomes.map((v) => v.result)];
        let fastest: number | null = null;
        let highest = 0;
        results.forEach((r, i) => {
          if (!r) return;
          if (r.timeToTarget !== null && (fastest === null || r.timeToTarget < results[fastest]!.timeToTarget!)) fastest = i;
          if (r.topSpeed > results[highest]!.topSpeed) highest = i;
        });
        comparison.value = { base: ownResult, variants: outcomes, fastest, highest };
      };
      schedule(next);
    });
    return () => {
      generation++;
      stop();
    };
  }

  const blank = (): Variant => ({ fields: createFieldsModel(spinUp.inputs, design.fields.system.value), changed: signal<Name[]>([]) });

  function add(): void {
    if (variants.value.length < VARIANT_SCOPES.length) variants.value = [...variants.value, blank()];
  }

  function remove(index: number): void {
    variants.value = variants.value.filter((_, i) => i !== index);
  }

  /** Makes a variant differ in `name`, starting from the design's current text. */
  function change(index: number, name: Name): void {
    const variant = variants.value[index];
    if (!variant || variant.changed.value.includes(name)) return;
    batch(() => {
      variant.fields.texts[name].value = design.fields.texts[name].value;
      variant.changed.value = [...variant.changed.value, name];
    });
  }

  function unchange(index: number, name: Name): void {
    const variant = variants.value[index];
    if (variant) variant.changed.value = variant.changed.value.filter((n) => n !== name);
  }

  /** Replaces the variants with those of a link (field text by input name). */
  function applyTexts(list: readonly Record<string, string>[]): void {
    variants.value = list.map((changed) => {
      const variant = blank();
      variant.fields.applyTexts(changed as Partial<Record<Name, string>>);
      variant.changed.value = Object.keys(changed) as Name[];
      return variant;
    });
  }

  /** Each variant's changed inputs as field text, for the link. */
  const texts = (): Record<string, string>[] =>
    variants.value.map((v) => Object.fromEntries(v.changed.value.map((name) => [name, v.fields.texts[name].value])));

  function setSystem(next: UnitSystem): void {
    for (const variant of variants.value) variant.fields.setSystem(next);
  }

  return { variants, variantInputs, comparison, run, add, remove, change, unchange, applyTexts, texts, setSystem };
}
