/**
 * The invented demo robots of the spin-up chapter and calculator (values only: no simulation, so
 * that a page can start from them without loading it; `drivetrainWorkedExample` in demo.ts
 * simulates them).
 */
import { type DrivetrainInput, RPM, drivetrainInputs } from "./inputs.ts";

/**
 * An invented demo weapon (not any real robot): a 1.5 kg robot with a 120 mm steel disc
 * (0.35 kg, J = ½·m·r² = 6.3 × 10⁻⁴ kg·m²), one 1400 rpm/V outrunner (45 mΩ, 1.2 A no-load) on a
 * 2:1 belt at 95 %, 4 cells at 4.1 V and 8 mΩ each, a 60 A limit, aiming for 10 000 rpm.
 */
export const DEMO_WEAPON: Readonly<DrivetrainInput> = Object.freeze({
  driveType: "weapon",
  currentLimitAt: "motor",
  noLoadLoss: "constant",
  ...Object.fromEntries(Object.entries(drivetrainInputs).map(([key, spec]) => [key, spec.default])),
} as DrivetrainInput);

/**
 * An invented demo whole-body spinner (not any real robot): 1.5 kg, J = 0.005 kg·m² about its
 * centre, two direct-drive wheels of 18 mm radius whose contacts sit 70 mm from the centre and
 * carry 90 % of the weight, one 1100 rpm/V motor per wheel (90 mΩ, 0.6 A no-load, 30 A limit),
 * 3 cells at 4.1 V and 10 mΩ each, rubber on dry concrete (μ_s = 1.0, μ_k = 0.8), aiming for 3000 rpm.
 */
export const DEMO_SPINNER: Readonly<DrivetrainInput> = Object.freeze({
  ...DEMO_WEAPON,
  driveType: "spinner",
  motorCount: 2,
  motorKv: 1100 * RPM,
  motorResistance: 0.09,
  noLoadCurrent: 0.6,
  motorRotorInertia: 3e-6,
  currentLimit: 30,
  cellCount: 3,
  cellResistance: 0.01,
  gearRatio: 1,
  gearEfficiency: 1,
  inertia: 0.005,
  frictionTorque: 0.02,
  dragTorque: 0.05,
  dragReferenceSpeed: 3000 * RPM,
  targetSpeed: 3000 * RPM,
  tipRadius: 0.09,
  impactors: 1,
});
