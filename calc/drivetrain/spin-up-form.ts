/**
 * The spin-up calculator's form (calc/calculators/spin-up.ts is its descriptor): the drive type and
 * model choices and the inputs that apply to each drive type. Apart from the simulation, so that
 * the page can show its form without loading it; the page's own link keys (variants and sweep) are
 * in spin-up-view.ts, which the build sheet does not need.
 */
import { defineChoices } from "../core/choices.ts";
import { defineForm } from "../core/calculator.ts";
import {
  CURRENT_LIMIT_AT_OPTIONS,
  DRIVE_TYPE_OPTIONS,
  DRIVE_TYPE_URL_KEY,
  type DrivetrainParameter,
  drivetrainInputs,
  NO_LOAD_LOSS_OPTIONS,
} from "./inputs.ts";

/** The drive type, with its link key. */
export const driveTypeChoice = defineChoices({
  driveType: {
    label: "Drive type",
    urlKey: DRIVE_TYPE_URL_KEY,
    options: DRIVE_TYPE_OPTIONS,
    default: "weapon",
    help: "A weapon's motors turn a rotor; a whole-body spinner's motors turn wheels that spin the whole robot.",
  },
  currentLimitAt: {
    label: "Current limit acts on",
    urlKey: "limat",
    options: CURRENT_LIMIT_AT_OPTIONS,
    default: "motor",
    help: "Where the controller holds the current: each motor's (phase) current, the current it draws from the battery, or nowhere.",
  },
  noLoadLoss: {
    label: "No-load loss",
    urlKey: "loss",
    options: NO_LOAD_LOSS_OPTIONS,
    default: "constant",
    help: "A constant torque K_t·I₀, or a torque that grows with speed and equals K_t·I₀ at the speed I₀ was measured at.",
  },
});

export const form = /* @__PURE__ */ defineForm({
  id: "drivetrain",
  title: "Spin-up and stored energy",
  chapter: "spin-up",
  anchor: "spin-up-calculator",
  order: 80,
  inputs: drivetrainInputs,
  choices: driveTypeChoice,
  pageKeys: ["variants"],
  applies: (input, values) => {
    // Stryker disable next-line StringLiteral: equivalent, applies() tells only "spinner" apart, so a missing drive type read as "" is a weapon too
    const type = values.driveType ?? "weapon";
    return applies(input, type) && (input !== "noLoadVoltage" || values.noLoadLoss === "speed");
  },
});

// ---------------------------------------------------------------------------------------------
// The page's own link keys: comparison variants and the sweep.

/** Inputs read only for a whole-body spinner (the wheels and their grip). */
export const SPINNER_ONLY: readonly DrivetrainParameter[] = [
  "drivenWheels",
  "wheelRadius",
  "wheelOffset",
  "wheelInertia",
  "weightShare",
  "staticFriction",
  "kineticFriction",
];

/** True when input `name` is read for drive type `type` (a weapon has no wheels). */
export function applies(name: string, type: string): boolean {
  return type === "spinner" || !(SPINNER_ONLY as readonly string[]).includes(name);
}
