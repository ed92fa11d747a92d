/**
 * Whirlbook's calculation module: the public API. Pure TypeScript, SI units in and out, no DOM.
 * Every chapter, widget, worked example and the command line call these functions.
 */
export * from "./core/errors.ts";
export * from "./core/constants.ts";
export * from "./sources/index.ts";
export * from "./core/units.ts";
export * from "./core/inputs.ts";
export * from "./rotation/rotation.ts";
export * from "./heading/drift.ts";
export * from "./heading/drift-inputs.ts";
export * from "./heading/drift-budget.ts";
export * from "./heading/opposed.ts";
export * from "./heading/drift-demo.ts";
export * from "./heading/timing.ts";
export * from "./heading/smoothing.ts";
export * from "./mass/parts.ts";
export * from "./mass/properties.ts";
export * from "./mass/editing.ts";
export * from "./mass/layout-text.ts";
export * from "./mass/drawing.ts";
export * from "./mass/balance.ts";
export * from "./mass/counterweight.ts";
export * from "./mass/sensor.ts";
export * from "./mass/mass-balance.ts";
export * from "./mass/demo.ts";
export * from "./loads/index.ts";
export * from "./drivetrain/figures.ts";
export * from "./drivetrain/inputs.ts";
export * from "./drivetrain/results.ts";
export * from "./drivetrain/simulate.ts";
export * from "./drivetrain/compare.ts";
export * from "./drivetrain/demo.ts";
export * from "./numerics/special.ts";
export * from "./numerics/line-fit.ts";
export * from "./heading/calibration.ts";
export * from "./heading/calibration-rows.ts";
export * from "./heading/csv.ts";
export * from "./materials/materials.ts";
export * from "./loads/fasteners.ts";
export * from "./drivetrain/motor.ts";
export * from "./design/design.ts";
export * from "./design/checks.ts";
export * from "./design/demo.ts";
export * from "./core/unit-definitions.ts";
export * from "./core/calculator.ts";
