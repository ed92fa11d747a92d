import { CalcInputError } from "../core/errors.ts";
import { requireWithinSpecs } from "../core/spec-check.ts";
import { TURN } from "../core/constants.ts";

export { radiusTrimInputs, type RadiusTrimInput, type RadiusTrimMeasure, type RadiusTrimSense } from "./drift-trim-inputs.ts";
import { radiusTrimInputs, type RadiusTrimInput } from "./drift-trim-inputs.ts";

export interface RadiusTrim {
  /** X, the signed drift per turn [rad]: positive when the heading ran ahead. */
  driftPerRevolution: number;
  /** q = ω̂/ω, how fast the estimate ran [-]. */
  speedRatio: number;
  /** r̂′ = r̂·q², the radius that cancels the drift at that speed [m]. */
  radius: number;
  /** r̂′ − r̂ [m]: positive means set a larger radius. */
  change: number;
}

/**
 * The firmware radius that cancels a drift seen at one speed (spinner-heading-practice): from the
 * drift per turn X, or from a drift rate D timed at spin rate ω (one turn takes 2π/ω, so X = 2π·D/ω).
 *
 * Formula: $q = \hat\omega/\omega = 1 + X/2\pi$, $\hat r' = \hat r\,q^2$, since
 * $\hat\omega = \sqrt{(a - \hat b)/\hat r}$ at a fixed reading scales as $\hat r^{-1/2}$.
 *
 * @param input.assumedRadius r̂ [m]; `sense` "ahead" | "behind"; `measure` "turn" | "second";
 *   `driftPerTurn` |X| [rad]; `driftRate` |D| [rad/s]; `angularSpeed` ω [rad/s].
 * @returns The signed drift per turn [rad], q [-], r̂′ [m] and r̂′ − r̂ [m].
 * Assumptions: steady speed while the drift was seen; the drift is the spin-rate estimate's (not a
 * loop timing lag, which is an offset, not a drift). A heading that falls behind by a full turn or
 * more per turn has no radius that cancels it.
 * @example
 * radiusTrim({ assumedRadius: 0.008, sense: "ahead", measure: "turn", driftPerTurn: Math.PI / 9, driftRate: 0, angularSpeed: 200 }).radius // → 0.00891358
 * Sources: spinner-heading-practice, openstax-college-physics.
 */
export function radiusTrim(input: RadiusTrimInput): RadiusTrim {
  const { assumedRadius, driftPerTurn, driftRate, angularSpeed } = requireWithinSpecs(radiusTrimInputs, input);
  const { sense, measure } = input;
  if (sense !== "ahead" && sense !== "behind") throw new CalcInputError({ param: "sense", value: sense, expected: "one of ahead, behind", unit: "" });
  if (measure !== "turn" && measure !== "second") throw new CalcInputError({ param: "measure", value: measure, expected: "one of turn, second", unit: "" });
  // One turn takes 2π/ω, so a drift rate D gives X = 2π·D/ω per turn (openstax-college-physics, ω = Δθ/Δt).
  const size = measure === "turn" ? driftPerTurn : (TURN * driftRate) / angularSpeed;
  if (size > Math.PI) {
    // Past half a turn per turn the heading is not drifting but lost; the declared range of the
    // per-turn input ends there, and a timed rate is held to the same.
    throw new CalcInputError({ param: "driftRate", value: driftRate, expected: "at most 180° of drift per turn at this spin speed", unit: "rad/s" });
  }
  const driftPerRevolution = sense === "ahead" ? size : -size;
  // q = ω̂/ω = 1 + X/2π: the heading moves 2π·q in one true turn (spinner-heading-practice).
  const speedRatio = 1 + driftPerRevolution / TURN;
  // Half a turn per turn at most (refused above), so q is at least 1/2 and the radius below is positive.
  // r̂′ = r̂·q²: at a fixed reading ω̂ ∝ r̂^(−1/2) (spinner-heading-practice).
  const radius = assumedRadius * speedRatio * speedRatio;
  return { driftPerRevolution, speedRatio, radius, change: radius - assumedRadius };
}
