/**
 * "Save to design" on a calculator page: writes one calculator's values into the active design
 * saved in this browser (making one if there is none), as its descriptor lays them out. Loaded only
 * when the button is pressed, with nothing of the other calculators.
 */
import type { AnyForm, AnyValues } from "../../calc/core/calculator.ts";
import { newDesign } from "../../calc/design/format.ts";
import { newId, readRawStore, writeRawStore } from "./saved.ts";

/** Saves `values` into the active design; returns a message for the page. */
export function saveIntoActiveDesign(storage: Storage, calc: AnyForm, values: AnyValues): string {
  const store = readRawStore(storage);
  if (store === null) return "Not saved: the designs saved in this browser could not be read. Open the build sheet to see why.";
  let entry = store.designs.find((d) => d.id === store.activeId);
  if (!entry) {
    entry = { id: newId(), design: newDesign("My robot") };
    store.designs.push(entry);
    store.activeId = entry.id;
  }
  const design = entry.design;
  if (calc.section.kind === "list") {
    const list = Array.isArray(design[calc.id]) ? (design[calc.id] as AnyValues[]) : [];
    const entryValues = { name: `${calc.section.entryName} ${list.length + 1}`, ...values };
    design[calc.id] = [...list, entryValues].slice(-calc.section.max);
  } else {
    design[calc.id] = values;
  }
  design.modified = new Date().toISOString();
  writeRawStore(storage, store);
  return `Saved to the design “${String(design.name)}”. The build sheet shows it.`;
}
