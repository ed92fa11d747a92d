/**
 * The search entries of the calculators' fields: every input, choice and result of every
 * calculator in the registry, with its label, its names in code and in links (the field's
 * symbols), its unit, its help sentence, and the address that opens the calculator at that field.
 * Built once at build time into search-fields.json; the search page loads it on the first search.
 */
import type { AnyCalculator } from "../../calc/core/calculator.ts";
import { initialValues } from "../../calc/core/calculator.ts";
import { fieldUnit } from "../../calc/core/inputs.ts";
import { unitDef } from "../../calc/core/units.ts";

export interface SearchEntry {
  /** "input" (a number field), "choice" (a menu) or "output" (a result the calculator shows). */
  kind: "input" | "choice" | "output";
  /** The field's label, as the calculator shows it: "Motor Kv". */
  label: string;
  /** Its names in code and in links ("motorKv", "kv"): what a reader may know it by. */
  keys: string[];
  /** Unit symbols, metric first, then US when different: "mm, in". Empty for a pure number. */
  unit: string;
  /** The field's help sentence, or the calculator's words for a result. */
  help: string;
  /** The calculator's name. */
  calculator: string;
  /**
   * Address relative to the site's base that opens the calculator at the field. A field the page
   * shows only for some choices (a spinner's wheels) has no element until then: after the build,
   * such an entry opens the calculator itself (scripts/site/search-fields.mjs).
   */
  url: string;
  /** Address of the calculator itself: where `url` falls back to. Dropped from the built file. */
  calculatorUrl?: string;
}

/** The units a number field shows, metric and US, without repeats. */
function unitsOf(calc: AnyCalculator, name: string): string {
  const spec = calc.inputs[name]!;
  const symbols = [fieldUnit(spec, "metric"), fieldUnit(spec, "us")].map((u) => unitDef(u).symbol).filter(Boolean);
  return [...new Set(symbols)].join(", ");
}

/**
 * The results a calculator shows on its default values: each card's headline figure and its other
 * figures, by label (a calculator that cannot compute its defaults contributes none).
 */
function outputsOf(calc: AnyCalculator): { label: string; help: string }[] {
  try {
    const values = initialValues(calc);
    const cards = calc.cards(values, calc.run(values), "metric");
    const out: { label: string; help: string }[] = [];
    for (const card of cards) {
      // The card's rule says what the result is judged against (the numbers are the defaults').
      if (card.figure) out.push({ label: card.figure.label, help: card.rule });
      for (const detail of card.details) out.push({ label: detail.label, help: card.rule });
    }
    return out.filter((o, i) => out.findIndex((p) => p.label === o.label) === i);
  } catch {
    return [];
  }
}

/** Every field of every calculator, in build-sheet order. */
export function searchEntries(calculators: readonly AnyCalculator[]): SearchEntry[] {
  const entries: SearchEntry[] = [];
  for (const calc of calculators) {
    const calculatorUrl = `chapters/${calc.chapter}/#${calc.anchor}`;
    const at = (name: string) => `${calculatorUrl}-${name}`;
    for (const [name, spec] of Object.entries(calc.inputs)) {
      entries.push({
        kind: "input",
        label: spec.label,
        keys: [name, spec.urlKey],
        unit: unitsOf(calc, name),
        help: spec.help ?? "",
        calculator: calc.title,
        url: at(name),
        calculatorUrl,
      });
    }
    for (const [name, spec] of Object.entries(calc.choices)) {
      entries.push({
        kind: "choice",
        label: spec.label,
        keys: [name, spec.urlKey],
        unit: "",
        help: spec.help ?? "",
        calculator: calc.title,
        url: at(name),
        calculatorUrl,
      });
    }
    for (const output of outputsOf(calc)) {
      entries.push({
        kind: "output",
        label: output.label,
        keys: [],
        unit: "",
        help: output.help,
        calculator: calc.title,
        url: calculatorUrl,
        calculatorUrl,
      });
    }
  }
  return entries;
}
