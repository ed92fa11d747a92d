/**
 * The build sheet: every calculator's cards for one design, in build-sheet order, each with a
 * status (Holds, Marginal, Fails, or for information), the rule and margin that decided it, and its
 * key figure. The same code feeds the build-sheet page and the command line.
 */
import { type CheckCard, type CheckStatus, STATUS_MARKS, STATUS_WORDS, worstStatus } from "../core/check.ts";
import type { AnyCalculator, AnyValues } from "../core/calculator.ts";
import { CalcInputError } from "../core/errors.ts";
import type { UnitSystem } from "../core/units.ts";
import type { Design } from "./design.ts";
import { requireInputObject, requireList } from "../core/spec-check.ts";

export type { CheckFigure, CheckStatus } from "../core/check.ts";

export interface CheckResult extends CheckCard {
  /** Stable id, e.g. "fasteners[1]", "mass.sensor". */
  id: string;
  /** The design section (calculator id) it belongs to. */
  section: string;
  /** Index within a list section (fasteners, rims), else null. */
  index: number | null;
}

/** The cards of one set of values; a set that cannot be computed gives one failing card with the reason. */
export function cardsFor(calc: AnyCalculator, values: AnyValues, system: UnitSystem): CheckCard[] {
  requireInputObject(calc, "calc");
  try {
    return calc.cards(values, calc.run(values), system);
  } catch (error) {
    if (!(error instanceof CalcInputError) && !(error instanceof Error)) throw error;
    return [notComputed(calc, error.message)];
  }
}

/** The one failing card of a set of values that cannot be computed. */
function notComputed(calc: AnyCalculator, message: string): CheckCard {
  return {
    title: calc.title,
    status: "fails",
    rule: "The inputs must be valid before anything can be checked",
    margin: `Could not compute: ${message}`,
    figure: null,
    details: [],
  };
}

/**
 * `runChecks` over the given calculators only (a page that loaded the checks a design holds passes
 * those), in the order given.
 *
 * @param calculators whole calculators (calc entry and cards), in build-sheet order
 * @param design a design read by `readDesign`
 * @param system units for the texts ("metric" or "us")
 * @returns the cards of each given calculator the design has a section for
 */
export function runChecksWith(calculators: readonly AnyCalculator[], design: Design, system: UnitSystem = design?.units): CheckResult[] {
  requireList(calculators, "calculators");
  requireInputObject(design, "design");
  const results: CheckResult[] = [];
  for (const calc of calculators) {
    const stored = design[calc.id];
    if (stored === undefined) continue;
    const list = calc.section.kind === "list";
    // A design that did not come through readDesign may hold anything: a section of the wrong
    // shape gives the failing card, as values that cannot be computed do.
    const entries = (list ? (Array.isArray(stored) ? stored : [stored]) : [stored]) as unknown[];
    for (const [i, values] of entries.entries()) {
      const index = list ? i : null;
      let cards: CheckCard[];
      if (list && !Array.isArray(stored)) cards = [notComputed(calc, `${calc.id} must be a list`)];
      else if (values === null || typeof values !== "object") cards = [notComputed(calc, `${calc.id} must be an object of named values`)];
      else {
        try {
          if (calc.present && !calc.present(values as AnyValues)) continue;
        } catch (error) {
          if (!(error instanceof Error)) throw error;
        }
        cards = cardsFor(calc, values as AnyValues, system);
      }
      const name = (values as { name?: unknown } | null)?.name;
      for (const card of cards) {
        const base = index === null ? calc.id : `${calc.id}[${index}]`;
        results.push({
          ...card,
          id: card.key ? `${base}.${card.key}` : base,
          section: calc.id,
          index,
          title: list ? `${card.title}: ${name}` : card.title,
        });
      }
    }
  }
  return results;
}

/** The worst status of a set of results (information does not count). */
export function overallStatus(results: readonly CheckResult[]): CheckStatus | "empty" {
  if (!Array.isArray(results)) throw new CalcInputError({ param: "results", value: results, expected: "a list of check results", unit: "" });
  return worstStatus(results.map((r) => r.status));
}

/**
 * Characters a terminal or a text viewer acts on instead of showing: C0 controls (line feed, carriage
 * return, escape, tab…), DEL, C1 controls (U+009B starts a control sequence like ESC [), the Unicode
 * line and paragraph separators, and the direction marks, embeddings, overrides and isolates that
 * reorder what follows them.
 */
const CONTROL_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

/**
 * Writes every control character (which could clear a terminal, move its cursor, retitle its window,
 * forge a line or reverse the text after it) as a visible escape, `\r` and `\n` included.
 *
 * @param text any text, e.g. a design's name
 * @returns the text with each control character written as `\n`, `\r`, `\t` or `\uXXXX`
 * @example
 * terminalSafe("a\u001b[2J\r\nb") // → "a\u001b[2J\r\nb"
 */
export function terminalSafe(text: string): string {
  if (typeof text !== "string") throw new CalcInputError({ param: "text", value: text, expected: "text", unit: "" });
  return text.replace(CONTROL_CHARACTERS, (c) => {
    const named: Record<string, string> = { "\n": "\\n", "\r": "\\r", "\t": "\\t" };
    return named[c] ?? `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`;
  });
}

/** Plain-text build sheet, as the command line prints it: each card led by the build sheet's mark and word ("✔ Holds"); every text from the design goes through `terminalSafe`. */
export function buildSheetText(design: Design, results: readonly CheckResult[]): string {
  requireInputObject(design, "design");
  requireList(results, "results");
  const mark = (status: CheckStatus) => `${STATUS_MARKS[status]} ${STATUS_WORDS[status]}`.padEnd(17);
  const indent = " ".repeat(19);
  const safe = terminalSafe;
  const lines = [`Build sheet: ${safe(design.name)}`, `Design saved ${safe(String(design.modified).slice(0, 10))}; units ${safe(String(design.units))}`, ""];
  for (const r of results) {
    lines.push(`${mark(r.status)}  ${safe(r.title)}${r.figure ? `: ${safe(r.figure.label)} ${safe(r.figure.text)}` : ""}`);
    lines.push(`${indent}rule:   ${safe(r.rule)}`);
    lines.push(`${indent}result: ${safe(r.margin)}`);
    for (const d of r.details) lines.push(`${indent}${safe(d.label)}: ${safe(d.text)}`);
  }
  const overall = overallStatus(results);
  lines.push("", `Overall: ${overall === "empty" ? "nothing to check" : STATUS_WORDS[overall]}`);
  lines.push(
    "",
    "Safety: figures come from simplified models and typical strengths; they certify nothing. Spin up only in a rated enclosure; your event's rules and local codes come first.",
  );
  return `${lines.join("\n")}\n`;
}
