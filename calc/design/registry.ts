/**
 * Every calculator of the handbook, found by file name: each module in calc/calculators/ exports
 * one descriptor as its default. The build sheet, the design file, the command line and search
 * iterate this list; nothing else lists the calculators. (The bundler expands the file list; the
 * command line's module hook, scripts/node-glob.mjs, does the same under Node.)
 */
import type { AnyCalculator } from "../core/calculator.ts";

// Imported under their own module ids ("?registry"): a chapter imports only a descriptor's `form`
// and `run`, and the bundler can then leave the cards (build-sheet sentences) out of its pages
// instead of putting them in a chunk the chapter shares with the build sheet.
const modules = import.meta.glob<AnyCalculator>("../calculators/*.ts", { eager: true, import: "default", query: "?registry" });

/** The calculators, in build-sheet order. */
export const CALCULATORS: readonly AnyCalculator[] = Object.values(modules).sort((a, b) => a.order - b.order);

const BY_ID = new Map(CALCULATORS.map((c) => [c.id, c]));

/** The calculator that fills a design section, if there is one. */
export function calculatorFor(section: string): AnyCalculator | undefined {
  return BY_ID.get(section);
}
