/**
 * What a calculator says about a design: a verdict in the handbook's three words (Holds, Marginal,
 * Fails) or a figure for information, the rule that decides it, where the design stands against it,
 * and the figures worth a glance. The calculator's own banner, the build sheet and the command line
 * all show the same card.
 */
import { formatNumber, formatQuantity, siUnit, type QuantityKind, type UnitId, type UnitSystem, unitDef } from "./units.ts";

/** How a check stands. "info" carries a figure without judging it. */
export type CheckStatus = "holds" | "marginal" | "fails" | "info";

/** The word each status is shown as, everywhere. */
export const STATUS_WORDS: Readonly<Record<CheckStatus, string>> = { holds: "Holds", marginal: "Marginal", fails: "Fails", info: "For information" };

/** Plain marks for each status that survive black-and-white printing and a terminal. */
export const STATUS_MARKS: Readonly<Record<CheckStatus, string>> = { holds: "✔", marginal: "▲", fails: "✖", info: "i" };

export interface CheckFigure {
  label: string;
  /** The value in SI (or a plain ratio). */
  value: number;
  /** The SI unit of `value`, "" for a ratio. */
  unit: string;
  /** Formatted for the chosen unit system. */
  text: string;
}

/** One card of a check: a calculator gives one or more for a design. */
export interface CheckCard {
  /** Tells several cards of one calculator apart ("sensor", "energy"); absent for the main card. */
  key?: string;
  title: string;
  status: CheckStatus;
  /** The rule that decides the status, in words. */
  rule: string;
  /** Where the design stands against the rule, in words with numbers: the reason for the status. */
  margin: string;
  /** The headline figure. */
  figure: CheckFigure | null;
  /** Other figures worth a glance. */
  details: CheckFigure[];
}

/** A figure of a quantity, formatted in the system's display unit (or in `unit`). */
export function figureOf(label: string, value: number, kind: QuantityKind, system: UnitSystem, unit?: UnitId, significant = 3): CheckFigure {
  return { label, value, unit: unitDef(siUnit(kind)).symbol, text: formatQuantity(value, kind, { system, unit, significant }).text };
}

/** A figure that is a plain ratio (a safety factor). */
export function ratioFigure(label: string, value: number): CheckFigure {
  return { label, value, unit: "", text: formatNumber(value, 3) };
}

/** The worst status of a set of cards (information does not count); "empty" when nothing is judged. */
export function worstStatus(statuses: readonly CheckStatus[]): Exclude<CheckStatus, "info"> | "empty" {
  const judged = statuses.filter((s) => s !== "info");
  if (judged.length === 0) return "empty";
  if (judged.includes("fails")) return "fails";
  if (judged.includes("marginal")) return "marginal";
  return "holds";
}
