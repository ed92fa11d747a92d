/**
 * Registers every unit table, for code that may meet any quantity kind: the command line, the build
 * sheet (a design holds every calculator's inputs), the build and tests. A calculator page registers
 * only the kinds its code names (scripts/site/unit-kinds.mjs).
 */
import { unitTables } from "./unit-table.ts";
import { useUnits } from "./units.ts";

useUnits(unitTables());
