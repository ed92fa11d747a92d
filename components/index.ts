/**
 * Everything an MDX chapter may use, from one place.
 */
export { default as PlacementCalculator } from "./placement/PlacementCalculator.tsx";
export { default as Q } from "./ui/Q.astro";
export { default as SafetyNotice } from "./ui/SafetyNotice.astro";
