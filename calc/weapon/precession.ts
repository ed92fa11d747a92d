import { requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

// Precession of a spinner tilted by a moment.

/**
 * Precession rate of a spinning body under a moment at right angles to its spin axis: a
 * whole-body spinner (or a robot carrying a large rotor) hit so as to tilt it turns its axis
 * sideways at this rate instead of tipping over (khurmi-gupta-theory-of-machines Ex. 14.1,
 * meriam-kraige-dynamics).
 *
 * Formula: $\Omega_p = \dfrac{M}{J\,\Omega}$
 *
 * @param moment M, the tilting moment [N·m], 0 or more
 * @param inertia J, about the spin axis [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], greater than 0
 * @returns Ω_p [rad/s]
 *
 * Assumptions: steady precession of a fast top (J·Ω much larger than the body's angular momentum
 * about the other axes), axis at 90° to the moment, nutation ignored.
 * @example
 * precessionRate({ moment: 30, inertia: 0.05, spinSpeed: 209.44 }) // → 2.865
 * Sources: khurmi-gupta-theory-of-machines, meriam-kraige-dynamics.
 */
export function precessionRate(input: { moment: number; inertia: number; spinSpeed: number }): number {
  const { moment, inertia, spinSpeed } = requireInputObject(input);
  requireNonNegative("moment", moment, "N·m");
  requirePositive("inertia", inertia, "kg·m²");
  requirePositive("spinSpeed", spinSpeed, "rad/s");
  const named = { moment: [moment, "N·m"], inertia: [inertia, "kg·m²"], spinSpeed: [spinSpeed, "rad/s"] } as const;
  const h = requireFiniteResult(inertia * spinSpeed, "angular momentum", named);
  return requireFiniteResult(moment / h, "precession rate", named); // khurmi-gupta-theory-of-machines: ω_P = C/(I·ω)
}

/**
 * Time a spinner takes to precess through an angle under a steady tilting moment
 * (khurmi-gupta-theory-of-machines, meriam-kraige-dynamics).
 *
 * Formula: $t = \dfrac{\theta}{\Omega_p} = \dfrac{\theta\,J\,\Omega}{M}$
 *
 * @param angle θ [rad], greater than 0
 * @param moment M [N·m], greater than 0
 * @param inertia J [kg·m²], greater than 0
 * @param spinSpeed Ω [rad/s], greater than 0
 * @returns t [s]
 *
 * Assumptions: as `precessionRate`, with M held for the whole time.
 * @example
 * precessionTime({ angle: 0.5, moment: 30, inertia: 0.05, spinSpeed: 209.44 }) // → 0.1745
 * Sources: khurmi-gupta-theory-of-machines, meriam-kraige-dynamics.
 */
export function precessionTime(input: { angle: number; moment: number; inertia: number; spinSpeed: number }): number {
  const { angle, moment, inertia, spinSpeed } = requireInputObject(input);
  requirePositive("angle", angle, "rad");
  requirePositive("moment", moment, "N·m");
  const rate = precessionRate({ moment, inertia, spinSpeed });
  const named = { angle: [angle, "rad"], moment: [moment, "N·m"], inertia: [inertia, "kg·m²"], spinSpeed: [spinSpeed, "rad/s"] } as const;
  // An underflowed rate (0) gives θ/0 = +∞ (θ > 0): a precession too slow to represent, refused naming the input that caused it.
  return requireFiniteResult(angle / rate, "precession time", named);
}

// ---------------------------------------------------------------------------------------------
