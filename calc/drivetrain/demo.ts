import type { SourceKey } from "../sources/index.ts";
import type { DrivetrainInput } from "./inputs.ts";
import { DEMO_SPINNER, DEMO_WEAPON } from "./demo-robots.ts";
import type { SpinUpResult } from "./results.ts";
import { simulateSpinUp } from "./simulate.ts";

// ---------------------------------------------------------------------------------------------
// Worked example.

// The demo robots live apart from the simulation, so that a page can start from them without loading it.
export { DEMO_SPINNER, DEMO_WEAPON };

export interface DrivetrainWorkedExample {
  /** Says that the robots are invented. */
  note: string;
  weapon: { input: Readonly<DrivetrainInput>; result: SpinUpResult };
  spinner: { input: Readonly<DrivetrainInput>; result: SpinUpResult };
}

/**
 * The chapter's worked example: the invented demo weapon and demo spinner, simulated.
 *
 * @returns both inputs and results (with time series for the plots)
 *
 * Example: the weapon reaches 10 000 rpm in 1.01 s; the spinner's wheels slip for 2.22 s of its
 * 2.23 s to 3000 rpm, so traction, not the motors, sets its pace. Sources: as `simulateSpinUp`.
 */
export function drivetrainWorkedExample(): DrivetrainWorkedExample {
  return {
    note: "Both robots are invented for this handbook; their numbers are plausible, not measured.",
    weapon: { input: DEMO_WEAPON, result: simulateSpinUp(DEMO_WEAPON) },
    spinner: { input: DEMO_SPINNER, result: simulateSpinUp(DEMO_SPINNER) },
  };
}

/** Source keys this module relies on (checked by the meta test). */
export const DRIVETRAIN_SOURCE_KEYS: readonly SourceKey[] = [
  "motor-constants-wikipedia",
  "ctms-dc-motor-speed",
  "battery-thevenin-model",
  "erickson-power-electronics",
  "gear-efficiency-model",
  "serway-beichner-5e",
  "leine-stick-slip-1998",
  "quadratic-air-drag",
  "dormand-prince-1980",
  "hairer-norsett-wanner-1",
  "openstax-university-physics-1",
  "softschools-rotational-ke",
  "weapon-bite",
];
