/**
 * Every whole calculator at once (form, calc entry and build-sheet cards), in build-sheet order:
 * what the command line, the design tests and the build use. Pages load a calculator's check only
 * when they need it (calc/design/registry.ts `loadCalculators`), so they never import this module.
 */
import type { AnyCalculator } from "../core/calculator.ts";

// Stryker disable next-line all: the bundler reads these arguments as written (a mutated one is no longer a static glob)
const modules = import.meta.glob<AnyCalculator>("../calculators/*.ts", { eager: true, import: "default", query: "?registry" });

/** The calculators, in build-sheet order, with their calc entries and cards (every check's code). */
export const CALCULATORS: readonly AnyCalculator[] = Object.values(modules).sort((a, b) => a.order - b.order);

/** The calculator that fills a design section, if there is one. */
export function calculatorFor(section: string): AnyCalculator | undefined {
  return CALCULATORS.find((c) => c.id === section);
}
