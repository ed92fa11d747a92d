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
import { CALCULATORS } from "./registry.ts";

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
  try {
    return calc.cards(values, calc.run(values), system);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    if (!(error instanceof CalcInputError) && !(error instanceof Error)) throw error;
    return [
      {
        title: calc.title,
        status: "fails",
        rule: "The inputs must be valid before anything can be checked",
        margin: `Could not compute: ${message}`,
        figure: null,
        details: [],
      },
    ];
  }
}

/**
 * Runs every check the design has values for, in build-sheet order.
 *
 * @param design a design read by `readDesign` (every value already within its declared range)
 * @param system units for the texts ("metric" or "us")
 * @returns the cards of every calculator with a section; a check whose inputs cannot be computed
 * fails with the reason
 *
 * Sources: those of each calculator's entry function (openstax-college-physics, iso-21940-11,
 * iso-898-1, timoshenko-goodier, …).
 */
export function runChecks(design: Design, system: UnitSystem = design.units): CheckResult[] {
  const results: CheckResult[] = [];
  for (const calc of CALCULATORS) {
    const stored = design[calc.id];
    if (stored === undefined) continue;
    const list = calc.section.kind === "list";
    const entries = (list ? stored : [stored]) as AnyValues[];
    for (const [i, values] of entries.entries()) {
      if (calc.present && !calc.present(values)) continue;
      const index = list ? i : null;
      for (const card of cardsFor(calc, values, system)) {
        const base = index === null ? calc.id : `${calc.id}[${index}]`;
        results.push({
          ...card,
          id: card.key ? `${base}.${card.key}` : base,
          section: calc.id,
          index,
          title: list ? `${card.title}: ${values.name}` : card.title,
        });
      }
    }
  }
  return results;
}

/** The worst status of a set of results (information does not count). */
export function overallStatus(results: readonly CheckResult[]): CheckStatus | "empty" {
  return worstStatus(results.map((r) => r.status));
}

/** Replaces control characters (which could move a terminal's cursor or forge a line) with "?". */
export function terminalSafe(text: string): string {
  return text.replace(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u2028\u2029]/g, "?").replace(/\n/g, " ");
}

/** Plain-text build sheet, as the command line prints it: each card led by the build sheet's mark and word ("✔ Holds"). */
export function buildSheetText(design: Design, results: readonly CheckResult[]): string {
  const mark = (status: CheckStatus) => `${STATUS_MARKS[status]} ${STATUS_WORDS[status]}`.padEnd(17);
  const indent = " ".repeat(19);
  const safe = terminalSafe;
  const lines = [`Build sheet: ${safe(design.name)}`, `Design saved ${safe(design.modified.slice(0, 10))}; units ${design.units}`, ""];
  for (const r of results) {
    lines.push(`${mark(r.status)}  ${safe(r.title)}${r.figure ? `: ${r.figure.label} ${r.figure.text}` : ""}`);
    lines.push(`${indent}rule:   ${safe(r.rule)}`);
    lines.push(`${indent}result: ${safe(r.margin)}`);
    for (const d of r.details) lines.push(`${indent}${d.label}: ${d.text}`);
  }
  const overall = overallStatus(results);
  lines.push("", `Overall: ${overall === "empty" ? "nothing to check" : STATUS_WORDS[overall]}`);
  lines.push(
    "",
    "Safety: figures come from simplified models and typical strengths; they certify nothing. Spin up only in a rated enclosure; your event's rules and local codes come first.",
  );
  return `${lines.join("\n")}\n`;
}
