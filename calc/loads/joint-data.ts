import type { SourceKey } from "../sources/index.ts";

// ---------------------------------------------------------------------------------------------
// Data: bolt modulus, preload shares, nut factors, slip factors, the tapped part's shear rule.

/** E of a steel bolt, 207 GPa (shigley-mechanical-design Table A-5 and Table 8-8: steel 207 GPa, 30 Mpsi) [Pa]. */
export const BOLT_STEEL_MODULUS = 207e9;

/**
 * Recommended preload as a share of the proof load F_p = A_t S_p (shigley-mechanical-design
 * Eq. 8-31): 0.75 for a connection taken apart and its fasteners reused, 0.90 for a permanent one.
 */
export const RECOMMENDED_PRELOAD_SHARE = { reusable: 0.75, permanent: 0.9 } as const;

/**
 * Nut (torque) factor K by thread condition (shigley-mechanical-design Table 8-15), the value
 * `T = K F_i d` uses. Shigley: K = 0.20 for thread and collar friction f = f_c = 0.15 "no matter what
 * size bolts are employed" (Eq. 8-26), his recommended value when the condition is not stated.
 * Spread: other sources give 0.295 for dry zinc plate where Shigley gives 0.20 (bickford-bolted-joints,
 * ch. 2, Table 1), so the same torque can give about ±25 % preload between joints; treat K as an input.
 */
export const NUT_FACTORS = [
  { condition: "Non-plated, black finish", nutFactor: 0.3 },
  { condition: "Zinc-plated", nutFactor: 0.2 },
  { condition: "Lubricated", nutFactor: 0.18 },
  { condition: "Cadmium-plated", nutFactor: 0.16 },
  { condition: "With an anti-seize compound", nutFactor: 0.12 },
] as const;

/** K = 0.2, Shigley's unlubricated steel value (shigley-mechanical-design Eq. 8-26, p. 463). */
export const DEFAULT_NUT_FACTOR = 0.2;

/**
 * Slip (friction) coefficients of faying surfaces, APPROXIMATE: EN 1090-2 Table 18 classes A–D
 * (en-1090-2) and the RCSC classes (rcsc-structural-joints). These are steel surfaces prepared for
 * structural friction joints; no such table covers anodised or bare machined aluminium, which is why
 * the check takes μ as an input and defaults to the lowest class (D, as rolled, 0.20).
 */
export const SLIP_FACTORS = [
  { surface: "EN 1090-2 class A: blasted with shot or grit, loose rust removed", frictionCoefficient: 0.5, source: "en-1090-2" },
  { surface: "EN 1090-2 class B: blasted, then spray-metallised or zinc-silicate coated", frictionCoefficient: 0.4, source: "en-1090-2" },
  { surface: "EN 1090-2 class C: wire-brushed or flame-cleaned, loose rust removed", frictionCoefficient: 0.3, source: "en-1090-2" },
  { surface: "EN 1090-2 class D: as rolled", frictionCoefficient: 0.2, source: "en-1090-2" },
  { surface: "RCSC (1988) class A: clean mill scale", frictionCoefficient: 0.33, source: "rcsc-structural-joints" },
  { surface: "RCSC (1988) class B: blast-cleaned", frictionCoefficient: 0.5, source: "rcsc-structural-joints" },
] as const satisfies readonly { surface: string; frictionCoefficient: number; source: SourceKey }[];

/** μ = 0.20, the lowest EN 1090-2 class (D, surfaces as rolled): the conservative default (en-1090-2). */
export const DEFAULT_FRICTION_COEFFICIENT = 0.2;

/**
 * Shear strength of the tapped part's material as a fraction of its ultimate tensile strength,
 * τ = 0.6 R_m: the fastener rule (ifi-shear-rule, "approximately 60 percent" for carbon steel) taken
 * over for the part. For 6061-T6 the Aluminum Association's typical values give 207/310 = 0.67
 * (aluminum-association-typical), so 0.6 is about 10 % on the safe side there; for plastics it is a
 * rough estimate only.
 */
export const MATERIAL_SHEAR_RATIO = 0.6;

// ---------------------------------------------------------------------------------------------
