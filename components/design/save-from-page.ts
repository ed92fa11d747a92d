/**
 * "Save to design" on a calculator page: reads the calculator's state from the page's query
 * string and writes it into the active design saved in this browser (making one if there is none).
 * Loaded only when the button is pressed.
 */
import { newDesign, type Design, type DesignSection } from "../../calc/design/design.ts";
import { readField, type InputSpecs } from "../../calc/core/inputs.ts";
import { accelerometerPlacementInputs } from "../../calc/rotation/rotation.ts";
import { headingDriftInputs } from "../../calc/heading/drift-budget.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { decodeState } from "../calc-ui/permalink.ts";
import { fastenerCheckInputs, rimCheckInputs } from "../../calc/loads/index.ts";
import { drivetrainInputs, DRIVE_TYPE_URL_KEY, requireDriveType } from "../../calc/drivetrain/inputs.ts";
import { readChoices } from "../loads/choices.ts";
import { FASTENER_CHOICES } from "../loads/fastener-model.ts";
import { rimChoices } from "../loads/rim-model.ts";
import { defaultSection } from "../../calc/design/design.ts";
import { massBalanceInputs } from "../../calc/mass/mass-balance.ts";
import { parseLayout } from "../../calc/mass/layout-text.ts";
import { readPoints } from "../mass/model.ts";
import { loadStore, newId, saveStore } from "./store.ts";

/** SI values of a calculator from its query string; null with the reason when a field does not read. */
export function valuesFromQuery<S extends InputSpecs>(specs: S, query: string, scope = ""): { values: { [K in keyof S]: number } } | { error: string } {
  const decoded = decodeState(specs, query, scope);
  const system: UnitSystem = decoded.system ?? "metric";
  const values = {} as { [K in keyof S]: number };
  for (const [name, spec] of Object.entries(specs)) {
    const text = decoded.texts[name];
    if (text === undefined) {
      (values as Record<string, number>)[name] = spec.default;
      continue;
    }
    const reading = readField(spec, text, system);
    if (!reading.ok) return { error: reading.error.message };
    (values as Record<string, number>)[name] = reading.value;
  }
  return { values };
}

/** Writes a section into a design; returns the new design. */
export function withSection(design: Design, section: DesignSection, query: string): Design | { error: string } {
  const stamp = new Date().toISOString();
  switch (section) {
    case "placement": {
      const read = valuesFromQuery(accelerometerPlacementInputs, query);
      return "error" in read ? read : { ...design, placement: read.values, modified: stamp };
    }
    case "headingDrift": {
      const read = valuesFromQuery(headingDriftInputs, query);
      return "error" in read ? read : { ...design, headingDrift: read.values, modified: stamp };
    }
    case "fasteners": {
      const read = valuesFromQuery(fastenerCheckInputs, query);
      if ("error" in read) return read;
      const choices = readChoices(FASTENER_CHOICES, query).values;
      const base = defaultSection("fasteners")[0]!;
      const list = design.fasteners ?? [];
      const entry = { ...base, ...read.values, ...choices, name: `Fasteners ${list.length + 1}` };
      return { ...design, fasteners: [...list, entry].slice(-24), modified: stamp };
    }
    case "rims": {
      const read = valuesFromQuery(rimCheckInputs, query);
      if ("error" in read) return read;
      const choices = readChoices(rimChoices([]), query).values;
      const list = design.rims ?? [];
      const entry = { ...defaultSection("rims")[0]!, ...read.values, shape: choices.shape ?? defaultSection("rims")[0]!.shape, name: `Rim ${list.length + 1}` };
      return { ...design, rims: [...list, entry].slice(-24), modified: stamp };
    }
    case "drivetrain": {
      const read = valuesFromQuery(drivetrainInputs, query);
      if ("error" in read) return read;
      let driveType: string = "weapon";
      try {
        driveType = requireDriveType(new URLSearchParams(query).get(DRIVE_TYPE_URL_KEY) ?? "weapon");
      } catch {
        return { error: "the drive type in the page address is not weapon or spinner." };
      }
      return { ...design, drivetrain: { ...read.values, driveType }, modified: stamp };
    }
    case "mass": {
      const read = valuesFromQuery(massBalanceInputs, query);
      if ("error" in read) return read;
      const params = new URLSearchParams(query);
      const layout = parseLayout(params.get("l") ?? "");
      if (!layout.ok && layout.parts.length === 0) return { error: "the parts list in the page address could not be read." };
      const system: UnitSystem = params.get("u") === "us" ? "us" : "metric";
      const points = params.get("pts") ? (readPoints(params.get("pts")!, system).points ?? []) : [];
      return { ...design, mass: { scalars: read.values, parts: layout.parts, candidates: points }, modified: stamp };
    }
    default:
      return { error: "This calculator cannot be saved to a design yet." };
  }
}

/** Saves the page's calculator state into the active design; returns a message for the page. */
export function saveToActiveDesign(storage: Storage, section: DesignSection, query: string): string {
  const { store } = loadStore(storage);
  let entry = store.designs.find((d) => d.id === store.activeId);
  if (!entry) {
    entry = { id: newId(), design: newDesign("My robot") };
    store.designs.push(entry);
    store.activeId = entry.id;
  }
  const next = withSection(entry.design, section, query);
  if ("error" in next) return `Not saved: ${next.error}`;
  entry.design = next;
  saveStore(storage, store);
  return `Saved to the design “${next.name}”. The build sheet shows it.`;
}
