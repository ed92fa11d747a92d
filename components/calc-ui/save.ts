/**
 * What a calculator's "Save to design" button calls: the design writer loads on the first press
 * (components/design/save.ts), and only it.
 */
import type { AnyForm, AnyValues } from "../../calc/core/calculator.ts";
import type { Signal } from "./reactive.ts";

const writer = () => import("../design/save.ts");

export async function saveToDesign(calc: AnyForm, values: AnyValues | null): Promise<string> {
  if (!values) return "Not saved: correct the fields marked above first.";
  try {
    return await (await writer()).saveFromPage(calc, values);
  } catch {
    return "Not saved: the save failed.";
  }
}

/** On a page that knows where "Save to design" writes (opened from the build sheet), says so: "Saving into: …". */
export function showTarget(status: Signal<string>): void {
  if (/save\.to=/.test(location.search))
    writer()
      .then((w) => w.describeTarget())
      .then((text) => {
        if (text) status.value = text;
      });
}

/** Saves several calculators of one page (each into its own section); the last message tells. */
export async function saveAll(models: readonly { save(): Promise<string> }[]): Promise<string> {
  let message = "";
  for (const model of models) message = await model.save();
  return message;
}
