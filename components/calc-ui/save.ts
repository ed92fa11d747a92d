/**
 * What a calculator's "Save to design" button calls: the design writer loads on the first press
 * (components/design/save.ts), and only it.
 */
import type { AnyForm, AnyValues } from "../../calc/core/calculator.ts";

export async function saveToDesign(calc: AnyForm, values: AnyValues | null): Promise<string> {
  if (!values) return "Not saved: correct the fields marked above first.";
  try {
    const { saveIntoActiveDesign } = await import("../design/save.ts");
    return saveIntoActiveDesign(localStorage, calc, values);
  } catch {
    return "Not saved: this browser does not allow saving (storage disabled).";
  }
}

/** Saves several calculators of one page (each into its own section); the last message tells. */
export async function saveAll(models: readonly { save(): Promise<string> }[]): Promise<string> {
  let message = "";
  for (const model of models) message = await model.save();
  return message;
}
