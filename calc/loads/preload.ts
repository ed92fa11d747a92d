import { requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireChoice, type ChoiceOption } from "./common.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";
import { RECOMMENDED_PRELOAD_SHARE } from "./joint-data.ts";

// Preload.

/**
 * Preload from tightening torque by the nut-factor relation (shigley-mechanical-design Eq. 8-27).
 *
 * Formula: $F_i = \dfrac{T}{K\,d}$
 *
 * @param torque T, tightening torque [N·m], 0 or more
 * @param nutFactor K [-], 0.01 to 1 (0.2 unlubricated steel; see `NUT_FACTORS`)
 * @param nominalDiameter d [m], greater than 0
 * @returns F_i [N]
 *
 * Assumptions: K lumps thread and under-head friction; its scatter (about ±25 % between sources and
 * finishes, bickford-bolted-joints) passes straight into the preload.
 *
 * @example
 * preloadFromTorque({ torque: 5.10996, nutFactor: 0.2, nominalDiameter: 0.004 }) // → 6387.45
 *
 * Sources: shigley-mechanical-design, bickford-bolted-joints.
 */
export function preloadFromTorque(input: { torque: number; nutFactor: number; nominalDiameter: number }): number {
  const { torque, nutFactor, nominalDiameter } = requireInputObject(input);
  requireNonNegative("torque", torque, "N·m");
  requireInRange("nutFactor", nutFactor, "", { min: 0.01, max: 1 });
  requirePositive("nominalDiameter", nominalDiameter, "m");
  return requireFiniteResult(torque / (nutFactor * nominalDiameter), "preload", { torque: [torque, "N·m"] }); // shigley-mechanical-design Eq. 8-27
}

/**
 * Tightening torque for a preload by the nut-factor relation (shigley-mechanical-design Eq. 8-27).
 *
 * Formula: $T = K\,F_i\,d$
 *
 * @param preload F_i [N], 0 or more
 * @param nutFactor K [-], 0.01 to 1
 * @param nominalDiameter d [m], greater than 0
 * @returns T [N·m]
 *
 * @example
 * tighteningTorque({ preload: 25000, nutFactor: 0.2, nominalDiameter: 0.75 }) // → 3750 (Shigley Ex. 8-3(b), lbf·in units)
 *
 * Sources: shigley-mechanical-design.
 */
export function tighteningTorque(input: { preload: number; nutFactor: number; nominalDiameter: number }): number {
  const { preload, nutFactor, nominalDiameter } = requireInputObject(input);
  requireNonNegative("preload", preload, "N");
  requireInRange("nutFactor", nutFactor, "", { min: 0.01, max: 1 });
  requirePositive("nominalDiameter", nominalDiameter, "m");
  return requireFiniteResult(nutFactor * preload * nominalDiameter, "tightening torque", { preload: [preload, "N"] }); // shigley-mechanical-design Eq. 8-27
}

/**
 * Recommended preload: a share of the proof load (shigley-mechanical-design Eqs. 8-31, 8-32).
 *
 * Formula: $F_i = 0.75\,F_p$ (reused fasteners) or $0.90\,F_p$ (permanent), $F_p = A_t\,S_p$
 *
 * @param proofLoad F_p [N], greater than 0
 * @param use "reusable" or "permanent"
 * @returns F_i [N]
 *
 * @example
 * recommendedPreload({ proofLoad: 8516.6, use: "reusable" }) // → 6387.45 (M4 class 12.9)
 *
 * Sources: shigley-mechanical-design.
 */
export function recommendedPreload(input: { proofLoad: number; use: "reusable" | "permanent" }): number {
  const { proofLoad, use } = requireInputObject(input);
  requirePositive("proofLoad", proofLoad, "N");
  const share = RECOMMENDED_PRELOAD_SHARE[requireChoice("use", use, USE_OPTIONS)];
  // Finite without a guard: a share of at most 0.9 of a finite load.
  return share * proofLoad; // shigley-mechanical-design Eq. 8-31
}

const USE_OPTIONS = [
  { value: "reusable", label: "Reused fasteners" },
  { value: "permanent", label: "Permanent connection" },
] as const satisfies readonly ChoiceOption[];

// ---------------------------------------------------------------------------------------------
