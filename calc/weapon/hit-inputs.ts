/**
 * What the hit calculator asks for: its input declarations, apart from the calculation itself
 * (calc/weapon/impact.ts) so that a page that only reads or writes a design's weapon-hit section does not carry
 * the physics.
 */
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

/** Numeric inputs of the hit calculator, in SI. Defaults: the invented `DEMO_HIT`. */
export const weaponHitInputs = defineInputs({
  rotorInertia: {
    label: "Rotor inertia",
    kind: "inertia",
    min: 1e-7,
    max: 50,
    default: 0.010125,
    urlKey: "J",
    help: "Moment of inertia of everything that spins with the weapon, about its axle.",
  },
  weaponSpeed: {
    label: "Weapon speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(10),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(8000),
    urlKey: "rpm",
    help: "Spin speed just before the hit.",
  },
  tipRadius: { label: "Tip radius", kind: "length", min: 0.005, max: 2, default: 0.09, urlKey: "r", help: "From the axle to the point that strikes." },
  impactors: {
    label: "Impactors",
    kind: "count",
    min: 1,
    max: 16,
    default: 2,
    integer: true,
    urlKey: "n",
    help: "Striking points around the rotor, evenly spaced.",
  },
  targetMass: {
    label: "Opponent's effective mass",
    kind: "mass",
    min: 0.01,
    max: 1000,
    default: 13.6,
    urlKey: "mo",
    help: "The mass that moves with the struck point: the whole opponent for a solid hit on its body, less for a hit on a loose part.",
  },
  robotMass: {
    label: "Your robot's mass",
    kind: "mass",
    min: 0.05,
    max: 1000,
    default: 13.6,
    urlKey: "m",
    help: "The whole robot carrying the weapon, free to recoil.",
  },
  restitution: {
    label: "Coefficient of restitution",
    kind: "fraction",
    min: 0,
    max: 1,
    default: 0.2,
    unit: { metric: "frac", us: "frac" },
    urlKey: "e",
    help: "0: tip and target move on together (fully plastic); 1: they part as fast as they met (no loss).",
  },
  closingSpeed: {
    label: "Closing speed",
    kind: "speed",
    min: 0,
    max: 50,
    default: 2,
    urlKey: "vc",
    help: "How fast the robots approach each other; it sets the bite.",
  },
  stoppingDistance: {
    label: "Crush distance",
    kind: "length",
    min: 1e-5,
    max: 0.5,
    default: 0.02,
    urlKey: "s",
    help: "How far the contact crushes before tip and target move together: a fraction of a millimetre for hard steel, more for plastic or rubber mounts. Only the force estimate uses it.",
  },
});

export type WeaponHitInput = { [K in keyof typeof weaponHitInputs]: number };
