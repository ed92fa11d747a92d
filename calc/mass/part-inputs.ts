/**
 * The numeric fields of a part of the mass layout, declared once: label, kind, allowed range and
 * the unit each is shown in (lengths in mm or in, mass in g or oz, inertia in g·cm² or oz·in²). The
 * parts editor builds its fields from them, and a part read from a link or a design file is
 * described in their words (part-messages.ts). These are the editor's ranges; `checkPart`
 * (parts.ts) accepts wider ones.
 */
import { defineInputs, type InputSpec } from "../core/inputs.ts";

const LEN = { metric: "mm", us: "in" } as const;
const length = (label: string, help: string, def: number, min = 0): InputSpec => ({
  label,
  kind: "length",
  min,
  minOpen: min === 0,
  max: 2,
  default: def,
  urlKey: "",
  unit: LEN,
  help,
});
const inertia = (label: string, help: string, min: number): InputSpec => ({
  label,
  kind: "inertia",
  min,
  max: 1000,
  default: 0,
  urlKey: "",
  unit: { metric: "g·cm2", us: "oz·in2" },
  help,
});

/** The numeric fields a part can have, in SI (lengths in m, angles in rad, inertia in kg·m²). */
export const PART_INPUTS = defineInputs({
  mass: { label: "Mass", kind: "mass", min: 0, minOpen: true, max: 100, default: 0.05, urlKey: "", unit: { metric: "g", us: "oz" }, help: "As weighed." },
  thickness: length("Thickness", "Along the spin axis.", 0.003),
  section: length("Section diameter", "Of the round bar it is made of.", 0.003),
  radius: length("Radius", "Outer radius.", 0.02),
  innerRadius: { ...length("Inner radius", "Radius of the hole.", 0.01), minOpen: false },
  outerRadius: length("Outer radius", "Radius of the outside.", 0.02),
  length: length("Length", "Along its direction.", 0.05),
  width: length("Width", "Across its direction.", 0.03),
  height: length("Height", "Along the spin axis.", 0.02),
  angle: {
    label: "Direction",
    kind: "angle",
    min: -2 * Math.PI,
    max: 2 * Math.PI,
    default: 0,
    urlKey: "",
    unit: { metric: "deg", us: "deg" },
    help: "Of its length, counter-clockwise from +x.",
  },
  inertiaZ: { ...inertia("Own inertia about z", "About its own centre, parallel to the spin axis.", 0), default: 1e-5 },
  productXZ: inertia("Own product I′xz", "About its own centre; 0 if symmetric.", -1000),
  productYZ: inertia("Own product I′yz", "About its own centre; 0 if symmetric.", -1000),
  x: length("x", "From the geometric centre.", 0, -2),
  y: length("y", "From the geometric centre.", 0, -2),
  z: length("Height z", "Of its own centre of mass above the base.", 0, -2),
});
