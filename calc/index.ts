/**
 * Whirlbook's calculation module: the public API. Pure TypeScript, SI units in and out, no DOM.
 * Every chapter, widget, worked example and the command line call these functions.
 */
export * from "./errors.ts";
export * from "./constants.ts";
export * from "./sources.ts";
export * from "./units.ts";
export * from "./inputs.ts";
export * from "./rotation.ts";
export * from "./heading.ts";
export * from "./mass.ts";
export * from "./loads.ts";
export * from "./drivetrain.ts";
export * from "./calibration.ts";
export * from "./csv.ts";
export * from "./materials.ts";
export * from "./fasteners.ts";
export * from "./motor.ts";
export * from "./design.ts";
export * from "./checks.ts";
export * from "./demo-design.ts";
export * from "./unit-definitions.ts";
