/**
 * Steering while spinning: closed forms (kinematics, gyroscopic wheel loads, drive-pulse sensor
 * bias), the simulation's entry, its sweep and its path. The model's inner parts (model.ts,
 * controller.ts, run.ts, drive.ts, contact.ts) are imported directly where needed; the unchecked
 * kernels of the inner loop (the contact forces written into arrays, the per-revolution figures of
 * a run) stay out of the public API.
 */
export * from "./kinematics.ts";
export * from "./gyro.ts";
export * from "./estimate.ts";
export * from "./sensor-bias.ts";
export { brushTyreForce, LOW_SPEED } from "./contact.ts";
export * from "./drive.ts";
export * from "./inputs.ts";
export { readSteeringOptions, simulateSteering } from "./simulate.ts";
export type { SteeringEnergy, SteeringOptions, SteeringResult, SteeringRevolution, SteeringVerdict } from "./simulate.ts";
export * from "./sweep.ts";
export * from "./path.ts";
export { SteeringModel } from "./model.ts";
export type { SteeringLeg } from "./controller.ts";

/** Source keys the steering modules rely on. */
export const STEERING_SOURCE_KEYS = [
  "dormand-prince-1980",
  "hairer-norsett-wanner-1",
  "hairer-dopri5-code",
  "dowell-jarratt-1971",
  "siegwart-autonomous-robots",
  "oppenheim-willsky-signals",
  "franklin-powell-workman-digital-control",
  "meriam-kraige-dynamics",
  "khurmi-gupta-theory-of-machines",
  "pacejka-tyre-dynamics",
  "battery-thevenin-model",
  "erickson-power-electronics",
  "ctms-dc-motor-speed",
  "motor-constants-wikipedia",
  "serway-beichner-5e",
  "quadratic-air-drag",
  "openstax-up1-rotational-kinematics",
  "spinner-heading-practice",
  "hibbeler-dynamics-2016",
  "newton-second-law",
  "cgpm-1901",
] as const;
