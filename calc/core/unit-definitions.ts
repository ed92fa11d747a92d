/**
 * Where each unit's factor comes from: its definition in words, whether it is exact, derived or
 * approximate, and the source. Kept apart from calc/core/units.ts so that calculators in the browser
 * do not carry this text; tests check that every unit has an entry here.
 */
import type { SourceKey } from "../sources/index.ts";
import type { UnitId } from "./units.ts";

/** How a unit's factor is known. */
export type Exactness = "exact" | "derived" | "approximate";

export interface UnitDefinition {
  exactness: Exactness;
  /** The definition, in words, e.g. "0.0254 m exactly". */
  definition: string;
  source: SourceKey;
}

export const UNIT_DEFINITIONS = {
  m: { exactness: "exact", definition: "SI base unit", source: "nist-sp811" },
  cm: { exactness: "exact", definition: "0.01 m", source: "nist-sp811" },
  mm: { exactness: "exact", definition: "0.001 m", source: "nist-sp811" },
  in: { exactness: "exact", definition: "0.0254 m exactly", source: "nist-sp811" },
  ft: { exactness: "exact", definition: "0.3048 m exactly", source: "nist-sp811" },
  m2: { exactness: "exact", definition: "SI coherent unit", source: "nist-sp811" },
  mm2: { exactness: "exact", definition: "10⁻⁶ m²", source: "nist-sp811" },
  in2: { exactness: "exact", definition: "6.4516 × 10⁻⁴ m² exactly (0.0254 m squared)", source: "nist-sp811" },
  kg: { exactness: "exact", definition: "SI base unit", source: "nist-sp811" },
  g: { exactness: "exact", definition: "0.001 kg", source: "nist-sp811" },
  lb: { exactness: "exact", definition: "0.453 592 37 kg exactly", source: "intl-yard-pound-1959" },
  oz: { exactness: "exact", definition: "1/16 lb = 0.028 349 523 125 kg", source: "nist-sp811" },
  "m/s2": { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  gn: { exactness: "exact", definition: "standard gravity, 9.806 65 m/s² exactly", source: "cgpm-1901" },
  "ft/s2": { exactness: "exact", definition: "0.3048 m/s²", source: "nist-sp811" },
  "rad/s": { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  rpm: { exactness: "exact", definition: "2π/60 rad/s (1 rev = 2π rad)", source: "nist-sp811" },
  rps: { exactness: "exact", definition: "2π rad/s", source: "nist-sp811" },
  "deg/s": { exactness: "exact", definition: "π/180 rad/s", source: "nist-sp811" },
  "rad/s2": { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  "rpm/s": { exactness: "exact", definition: "2π/60 rad/s²", source: "nist-sp811" },
  rad: { exactness: "exact", definition: "SI coherent unit", source: "nist-sp811" },
  deg: { exactness: "exact", definition: "π/180 rad", source: "nist-sp811" },
  rev: { exactness: "exact", definition: "2π rad", source: "nist-sp811" },
  s: { exactness: "exact", definition: "SI base unit", source: "nist-sp811" },
  h: { exactness: "exact", definition: "3600 s", source: "nist-sp811" },
  ms: { exactness: "exact", definition: "0.001 s", source: "nist-sp811" },
  us: { exactness: "exact", definition: "0.000 001 s", source: "nist-sp811" },
  Hz: { exactness: "exact", definition: "SI unit, 1/s", source: "nist-sp811" },
  kHz: { exactness: "exact", definition: "1000 Hz", source: "nist-sp811" },
  N: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  kN: { exactness: "exact", definition: "1000 N", source: "nist-sp811" },
  lbf: { exactness: "exact", definition: "lb × g_n = 4.448 221 615 260 5 N", source: "nist-sp811" },
  ozf: { exactness: "exact", definition: "lbf/16", source: "nist-sp811" },
  "m/s": { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  "mm/s": { exactness: "exact", definition: "0.001 m/s (balance grades are quoted in it)", source: "nist-sp811" },
  "km/h": { exactness: "exact", definition: "1/3.6 m/s", source: "nist-sp811" },
  "ft/s": { exactness: "exact", definition: "0.3048 m/s", source: "nist-sp811" },
  mph: { exactness: "exact", definition: "1609.344 m per 3600 s", source: "nist-sp811" },
  J: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  kJ: { exactness: "exact", definition: "1000 J", source: "nist-sp811" },
  Wh: { exactness: "exact", definition: "3600 J", source: "nist-sp811" },
  ft·lbf: { exactness: "exact", definition: "0.3048 m × lbf", source: "nist-sp811" },
  W: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  kW: { exactness: "exact", definition: "1000 W", source: "nist-sp811" },
  N·m: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  lbf·in: { exactness: "exact", definition: "lbf × 0.0254 m", source: "nist-sp811" },
  ozf·in: { exactness: "exact", definition: "ozf × 0.0254 m", source: "nist-sp811" },
  kg·m2: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  g·cm2: { exactness: "exact", definition: "1e-7 kg·m²", source: "nist-sp811" },
  lb·in2: { exactness: "exact", definition: "lb × (0.0254 m)²", source: "nist-sp811" },
  oz·in2: { exactness: "exact", definition: "oz × (0.0254 m)²", source: "nist-sp811" },
  Pa: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  MPa: { exactness: "exact", definition: "1e6 Pa", source: "nist-sp811" },
  GPa: { exactness: "exact", definition: "1e9 Pa", source: "nist-sp811" },
  psi: { exactness: "exact", definition: "lbf/in²", source: "nist-sp811" },
  ksi: { exactness: "exact", definition: "1000 lbf/in²", source: "nist-sp811" },
  "kg/m3": { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  "g/cm3": { exactness: "exact", definition: "1000 kg/m³", source: "nist-sp811" },
  "lb/in3": { exactness: "exact", definition: "lb/(0.0254 m)³", source: "nist-sp811" },
  kg·m: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  g·mm: { exactness: "exact", definition: "1e-6 kg·m", source: "nist-sp811" },
  oz·in: { exactness: "exact", definition: "oz × 0.0254 m", source: "nist-sp811" },
  V: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  A: { exactness: "exact", definition: "SI base unit", source: "nist-sp811" },
  ohm: { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  mohm: { exactness: "exact", definition: "0.001 Ω", source: "nist-sp811" },
  "rad/(s·V)": { exactness: "exact", definition: "SI unit", source: "nist-sp811" },
  "rpm/V": { exactness: "exact", definition: "2π/60 rad/(s·V)", source: "nist-sp811" },
  frac: { exactness: "exact", definition: "ratio", source: "nist-sp811" },
  pct: { exactness: "exact", definition: "1/100", source: "nist-sp811" },
  ppm: { exactness: "exact", definition: "1e-6", source: "nist-sp811" },
  count: { exactness: "exact", definition: "a whole number", source: "nist-sp811" },
} as const satisfies Record<UnitId, UnitDefinition>;
