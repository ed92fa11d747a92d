import { CalcInputError, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// Round sections and their stresses.

/** Section properties of a solid or hollow round shaft. */
export interface RoundSection {
  /** A = π(d² − d_i²)/4 [m²]. */
  area: number;
  /** I = π(d⁴ − d_i⁴)/64, second moment of area about a diameter [m⁴]. */
  secondMoment: number;
  /** Z = I/(d/2), elastic section modulus in bending [m³]. */
  sectionModulus: number;
  /** J = π(d⁴ − d_i⁴)/32, polar second moment [m⁴]. */
  polarMoment: number;
}

function requireBore(diameter: number, bore: number): void {
  requireNonNegative("bore", bore, "m");
  if (!(bore < diameter)) {
    throw new CalcInputError({ param: "bore", value: bore, expected: `less than the outer diameter (${Number(diameter.toPrecision(6))} m)`, unit: "m" });
  }
}

/**
 * Section properties of a round shaft, solid or hollow (shigley-bending-torsion).
 *
 * Formula: $I = \dfrac{\pi (d^4 - d_i^4)}{64}$, $Z = \dfrac{2I}{d}$, $J = 2I$, $A = \dfrac{\pi (d^2 - d_i^2)}{4}$
 *
 * @param diameter d, outer diameter [m], greater than 0
 * @param bore d_i, inner diameter [m], 0 (solid, the default) up to less than d
 * @returns area [m²], secondMoment I [m⁴], sectionModulus Z [m³], polarMoment J [m⁴]
 *
 * @example
 * roundSection({ diameter: 0.012 }) // → { secondMoment: 1.0179e-9, sectionModulus: 1.6965e-7, … }
 * Sources: shigley-bending-torsion.
 */
export function roundSection(input: { diameter: number; bore?: number }): RoundSection {
  const fields = requireInputObject(input);
  const { diameter } = fields;
  const bore = fields.bore ?? 0;
  requirePositive("diameter", diameter, "m");
  requireBore(diameter, bore);
  const named = { diameter: [diameter, "m"], bore: [bore, "m"] } as const;
  // d⁴ − d_i⁴ written as (d² − d_i²)(d² + d_i²) to keep precision for thin walls.
  const d2 = diameter * diameter;
  const b2 = bore * bore;
  const fourth = (d2 - b2) * (d2 + b2);
  const secondMoment = requireFiniteResult((Math.PI * fourth) / 64, "second moment of area", named); // shigley-bending-torsion: I = π(d⁴ − d_i⁴)/64
  if (!(secondMoment > 0)) {
    // Only a wall thinner than the rounding of d² (or a diameter whose fourth power underflows) gets here.
    throw bore > 0
      ? new CalcInputError({ param: "bore", value: bore, expected: "small enough to leave a wall with a second moment of area above 0", unit: "m" })
      : new CalcInputError({ param: "diameter", value: diameter, expected: "large enough for the second moment of area to be above 0", unit: "m" });
  }
  return {
    area: (Math.PI * (d2 - b2)) / 4,
    secondMoment,
    // I ≤ πd⁴/64 is a double, so d is below 1.2e77 m and Z = I/(d/2) ≤ πd³/32 is one too.
    sectionModulus: secondMoment / (diameter / 2), // shigley-bending-torsion: Z = I/c
    polarMoment: 2 * secondMoment, // shigley-bending-torsion: J = 2I for a round section
  };
}

/**
 * Bending stress at the surface of a round shaft (shigley-bending-torsion).
 *
 * Formula: $\sigma = \dfrac{M c}{I} = \dfrac{32\,M\,d}{\pi (d^4 - d_i^4)}$ (solid: $\dfrac{32 M}{\pi d^3}$)
 *
 * @param moment M [N·m], 0 or more
 * @param diameter d [m], greater than 0
 * @param bore d_i [m], 0 (default) up to less than d
 * @returns σ [Pa]
 *
 * @example
 * bendingStress({ moment: 30, diameter: 0.012 }) // → 1.768e8
 * Sources: shigley-bending-torsion.
 */
export function bendingStress(input: { moment: number; diameter: number; bore?: number }): number {
  const fields = requireInputObject(input);
  requireNonNegative("moment", fields.moment, "N·m");
  const section = roundSection({ diameter: fields.diameter, bore: fields.bore });
  return requireFiniteResult(fields.moment / section.sectionModulus, "bending stress", {
    moment: [fields.moment, "N·m"],
    diameter: [fields.diameter, "m"],
  }); // shigley-bending-torsion: σ = M/Z
}

/**
 * Torsional shear stress at the surface of a round shaft (shigley-bending-torsion).
 *
 * Formula: $\tau = \dfrac{T r}{J} = \dfrac{16\,T\,d}{\pi (d^4 - d_i^4)}$ (solid: $\dfrac{16 T}{\pi d^3}$)
 *
 * @param torque T [N·m], 0 or more
 * @param diameter d [m], greater than 0
 * @param bore d_i [m], 0 (default) up to less than d
 * @returns τ [Pa]
 *
 * @example
 * torsionalStress({ torque: 10, diameter: 0.012 }) // → 2.947e7
 * Sources: shigley-bending-torsion.
 */
export function torsionalStress(input: { torque: number; diameter: number; bore?: number }): number {
  const fields = requireInputObject(input);
  requireNonNegative("torque", fields.torque, "N·m");
  const section = roundSection({ diameter: fields.diameter, bore: fields.bore });
  // T/(J/r), not T·r/J: the product T·r would overflow first for a torque near the largest double.
  return requireFiniteResult(fields.torque / (section.polarMoment / (fields.diameter / 2)), "torsional stress", {
    torque: [fields.torque, "N·m"],
    diameter: [fields.diameter, "m"],
  }); // shigley-bending-torsion: τ = T·r/J
}

// ---------------------------------------------------------------------------------------------
