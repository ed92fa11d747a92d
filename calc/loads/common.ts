/**
 * Centrifugal loads, the shared part: the safety factor, its verdict,
 * the speed at which a stress that grows with ω² reaches a limit, and input validation against a
 * declaration. Used by the bolt check (loads-bolts.ts) and the rim check (loads-rims.ts); the
 * public face of the topic is calc/loads/index.ts. SI in and out.
 */
import { CalcInputError, requireInRange, requirePositive, requireRelation } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";
export { requireChoice, type ChoiceOption } from "../core/choices.ts";
import { DEFAULT_SAFETY_THRESHOLDS } from "./threshold-inputs.ts";
export { DEFAULT_SAFETY_THRESHOLDS, safetyThresholdInputs } from "./threshold-inputs.ts";

// ---------------------------------------------------------------------------------------------
// Safety factor, verdict and limit speed (shared by the bolt and the rim checks).

/** How a checked part stands: below `failBelow` it fails, below `marginalBelow` the margin is thin. */
export type LoadVerdict = "holds" | "marginal" | "fails";

/**
 * Safety factor of a stressed part: how many times the working stress fits into the strength
 * (safety-factor-practice).
 *
 * Formula: $n = \dfrac{S}{\sigma}$
 *
 * @param strength S, the strength compared with [Pa], greater than 0
 * @param stress σ, the working stress [Pa], greater than 0
 * @returns n [-]
 *
 * @example
 * safetyFactor({ strength: 400e6, stress: 20.1e6 }) // → 19.9
 * Sources: safety-factor-practice.
 */
export function safetyFactor(input: { strength: number; stress: number }): number {
  const { strength, stress } = requireInputObject(input);
  requirePositive("strength", strength, "Pa");
  requirePositive("stress", stress, "Pa");
  return requireFiniteResult(strength / stress, "safety factor", { strength: [strength, "Pa"], stress: [stress, "Pa"] }); // safety-factor-practice
}

/**
 * Verdict for a safety factor against two thresholds (safety-factor-practice).
 *
 * Formula: fails when $n < n_{fail}$, marginal when $n_{fail} \le n < n_{thin}$, holds otherwise
 *
 * @param safetyFactor n [-], greater than 0
 * @param failBelow n_fail [-], greater than 0 (default 1: the stress reaches the strength)
 * @param marginalBelow n_thin [-], at least n_fail (default 2, a common margin when loads are rough estimates)
 * @returns "fails", "marginal" or "holds"
 *
 * @example
 * safetyVerdict({ safetyFactor: 1.6 }) // → "marginal"
 * Sources: safety-factor-practice.
 */
export function safetyVerdict(input: { safetyFactor: number; failBelow?: number; marginalBelow?: number }): LoadVerdict {
  const {
    safetyFactor: n,
    failBelow = DEFAULT_SAFETY_THRESHOLDS.failBelow,
    marginalBelow = DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
  } = requireInputObject(input);
  requirePositive("safetyFactor", n, "");
  requirePositive("failBelow", failBelow, "");
  requireMarginalAtLeastFail(failBelow, marginalBelow);
  return n < failBelow ? "fails" : n < marginalBelow ? "marginal" : "holds";
}

/** Throws a `CalcInputError` naming "marginalBelow" unless it is at least `failBelow`. */
export function requireMarginalAtLeastFail(failBelow: number, marginalBelow: number): void {
  requirePositive("marginalBelow", marginalBelow, "");
  requireRelation("marginalBelow", marginalBelow, "at-least", failBelow, { kind: "fraction", unit: "", other: "failBelow" });
}

/**
 * Speed at which a stress that grows with the square of the speed reaches a limit: every
 * centrifugal stress here is proportional to ω² (newton-second-law: F = mω²r).
 *
 * Formula: $\omega_{lim} = \omega\,\sqrt{S / \sigma}$
 *
 * @param angularSpeed ω, the speed at which `stress` was found [rad/s], greater than 0
 * @param stress σ at ω [Pa], greater than 0
 * @param strength S, the limit [Pa], greater than 0
 * @returns ω_lim [rad/s]
 *
 * @example
 * speedAtStress({ angularSpeed: rpmToRadPerSecond(2400), stress: 2.665e6, strength: 310e6 }) // → 2711 [rad/s] (25 900 rpm)
 * Sources: newton-second-law.
 */
export function speedAtStress(input: { angularSpeed: number; stress: number; strength: number }): number {
  const { angularSpeed, stress, strength } = requireInputObject(input);
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  return requireFiniteResult(angularSpeed * Math.sqrt(safetyFactor({ strength, stress })), "speed at stress", { angularSpeed: [angularSpeed, "rad/s"] }); // σ ∝ ω², newton-second-law
}

// ---------------------------------------------------------------------------------------------
// Input validation against a declaration.

/** Throws a `CalcInputError` naming "points" unless it is a whole number from 2 to 1000. */
export function requirePointCount(points: number): void {
  requireInRange("points", points, "", { min: 2, max: 1000 });
  if (!Number.isInteger(points)) throw new CalcInputError({ param: "points", value: points, expected: "a whole number", unit: "" });
}

/**
 * Von Mises (distortion-energy) equivalent stress of a normal stress and a shear stress on one
 * plane: a shaft surface in bending and torsion, a bolt root in bending and shear
 * (shigley-distortion-energy, shigley-bending-torsion).
 *
 * Formula: $\sigma' = \sqrt{\sigma^2 + 3\tau^2}$
 *
 * @param normalStress σ [Pa], finite
 * @param shearStress τ [Pa], finite
 * @returns σ' [Pa]
 *
 * @example
 * vonMisesStress({ normalStress: 100e6, shearStress: 50e6 }) // → 1.323e8
 *
 * Sources: shigley-distortion-energy, shigley-bending-torsion.
 */
export function vonMisesStress(input: { normalStress: number; shearStress: number }): number {
  const fields = requireInputObject(input);
  const sigma = fields.normalStress;
  const tau = fields.shearStress;
  if (typeof sigma !== "number" || !Number.isFinite(sigma))
    throw new CalcInputError({ param: "normalStress", value: sigma, expected: "a finite number", unit: "Pa" });
  if (typeof tau !== "number" || !Number.isFinite(tau)) throw new CalcInputError({ param: "shearStress", value: tau, expected: "a finite number", unit: "Pa" });
  // hypot avoids the overflow of σ² for very large finite stresses.
  return requireFiniteResult(Math.hypot(sigma, Math.sqrt(3) * tau), "equivalent stress", { normalStress: [sigma, "Pa"], shearStress: [tau, "Pa"] }); // shigley-distortion-energy
}
