/**
 * The build sheet over every calculator of the handbook, at once: what the command line and the
 * tests run. A page loads only the checks a design holds and runs `runChecksWith` over them.
 */
import type { UnitSystem } from "../core/units.ts";
import { type CheckResult, runChecksWith } from "./checks.ts";
import type { Design } from "./design.ts";
import { CALCULATORS } from "./calculators.ts";

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
export function runChecks(design: Design, system: UnitSystem = design?.units): CheckResult[] {
  return runChecksWith(CALCULATORS, design, system);
}
