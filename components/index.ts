/**
 * Server-side pieces an MDX chapter may use (no JavaScript reaches the browser from these).
 * Calculators (islands) are imported straight from their own files in the chapter, e.g.
 * `import PlacementCalculator from "../../components/placement/PlacementCalculator.tsx"`: an island
 * re-exported from here would make every calculator's code part of every calculator page.
 */
export { default as Q } from "./ui/Q.astro";
export { default as SafetyNotice } from "./ui/SafetyNotice.astro";
