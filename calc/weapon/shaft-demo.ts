/**
 * The weapon chapters' worked examples: invented scenarios (no real robot or part).
 */
import { rpmToRadPerSecond } from "../core/units.ts";
import type { WeaponShaftInput } from "./shaft-check.ts";

/**
 * An invented scenario (no real robot or part): the 2.5 kg, 180 mm steel disc of
 * `DEMO_VERTICAL_SPINNER_TURN` at 8000 rpm on a dead 12 mm shaft of quenched-and-tempered 4340
 * steel, clamped by two frame plates 60 mm apart with the disc in the middle; the disc turns on
 * two deep-groove ball bearings of 12 mm bore 20 mm apart in its hub (C = 5.4 kN, C0 = 2.36 kN,
 * a generic size class); the robot yaws at 360 °/s; 20 g·mm of residual unbalance; a glancing
 * hit of 8 kN peak (an invented figure: a full-bite hit, as `DEMO_HIT` estimates, is far
 * harder); 20 h of running wanted. Result: the gyroscopic couple (53 N·m) puts 2.7 kN on each
 * hub bearing in the turn, so their life is 17 h (short of 20 h), and with the hit they see
 * 6.7 kN against C0 = 2.36 kN (s0 = 0.35: the raceways dent), which governs; the shaft's
 * safety factor on yield is 0.96. For the chapter's worked example.
 */
export const DEMO_SHAFT: WeaponShaftInput = {
  layout: "between",
  shaft: "dead",
  axle: "horizontal",
  bearingType: "ball",
  material: "steel-4340-qt650",
  rotorMass: 2.5,
  rotorInertia: 0.010125,
  weaponSpeed: rpmToRadPerSecond(8000),
  turnRate: 2 * Math.PI,
  unbalance: 2e-5,
  impactForce: 8000,
  motorTorque: 1.5,
  bearingSpan: 0.06,
  rotorPosition: 0.03,
  overhang: 0.02,
  hubBearingSpacing: 0.02,
  shaftDiameter: 0.012,
  shaftBore: 0,
  dynamicLoadRating: 5400,
  staticLoadRating: 2360,
  axialLoad: 0,
  radialFactor: 1,
  axialFactor: 0,
  requiredLife: 20 * 3600,
  failBelow: 1,
  marginalBelow: 2,
};
