/**
 * The search entries of every calculator's fields (components/search/entries.ts), written at
 * build time as /search-fields.json; the search page loads it on the first search.
 */
// The entries name every field's units: every unit table, whatever page the build renders first.
import "../calc/core/all-units.ts";
import { CALCULATORS } from "../calc/design/calculators.ts";
import { searchEntries } from "../components/search/entries.ts";

export function GET(): Response {
  return new Response(JSON.stringify(searchEntries(CALCULATORS)), { headers: { "Content-Type": "application/json" } });
}
