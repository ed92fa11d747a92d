/**
 * Server-side pieces an MDX chapter may use (no JavaScript reaches the browser from these).
 * A calculator is placed with `Calculator` and its widget module, imported straight from its file:
 * `import * as widget from "#components/calculators/placement.tsx"` then `<Calculator widget={widget} />`.
 */
export { default as Q } from "./ui/Q.astro";
export { default as SafetyNotice } from "./ui/SafetyNotice.astro";
export { default as Calculator } from "./calc-ui/Calculator.astro";
export { siteUrl } from "./calc-ui/site.ts";
