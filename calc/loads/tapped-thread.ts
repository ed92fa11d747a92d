import { CalcInputError, requirePositive } from "../core/errors.ts";
import type { FastenerThread } from "./inch-fasteners.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";
import { MATERIAL_SHEAR_RATIO } from "./joint-data.ts";

// The thread in the part.

/**
 * Shear area of an internal thread, the area along which the part's thread strips off: geometric
 * minimum per FED-STD-H28 (fed-std-h28-2; machinerys-handbook, "length of engagement").
 *
 * Formula: $A_n = \pi\,n\,L_e\,D_{s,min}\left[\dfrac{1}{2n} + 0.577\,35\,(D_{s,min} - E_{n,max})\right],\quad n = 1/P$
 *
 * @param engagedLength L_e, length of full thread engaged [m], greater than 0
 * @param pitch P [m], greater than 0
 * @param externalMajorMin D_s,min, minimum major diameter of the screw [m], greater than 0
 * @param internalPitchMax E_n,max, maximum pitch diameter of the tapped hole [m], greater than 0 and less than D_s,min
 * @returns A_n [m²]
 *
 * Assumptions: the worst fit of the tolerance classes (largest hole, smallest screw). The standard
 * notes that the effective area is "somewhat less" than this geometric value.
 *
 * @example
 * internalThreadShearArea({ engagedLength: 0.0254, pitch: 0.00127, externalMajorMin: 0.2408 * 0.0254, internalPitchMax: 0.2224 * 0.0254 }) // → 3.4773e-4 (0.539 in²: 1/4-20 over one inch of engagement)
 *
 * Sources: fed-std-h28-2, machinerys-handbook.
 */
export function internalThreadShearArea(input: { engagedLength: number; pitch: number; externalMajorMin: number; internalPitchMax: number }): number {
  const { engagedLength, pitch, externalMajorMin, internalPitchMax } = requireInputObject(input);
  requirePositive("engagedLength", engagedLength, "m");
  requirePositive("pitch", pitch, "m");
  requirePositive("externalMajorMin", externalMajorMin, "m");
  requirePositive("internalPitchMax", internalPitchMax, "m");
  if (!(internalPitchMax < externalMajorMin)) {
    throw new CalcInputError({
      param: "internalPitchMax",
      value: internalPitchMax,
      expected: `less than the screw's minimum major diameter, ${externalMajorMin} m`,
      unit: "m",
    });
  }
  const n = 1 / pitch;
  const area = Math.PI * n * engagedLength * externalMajorMin * (1 / (2 * n) + 0.57735 * (externalMajorMin - internalPitchMax)); // fed-std-h28-2
  return requireFiniteResult(area, "shear area", {
    engagedLength: [engagedLength, "m"],
    pitch: [pitch, "m"],
    externalMajorMin: [externalMajorMin, "m"],
    internalPitchMax: [internalPitchMax, "m"],
  });
}

/**
 * Shear strength of a part's material from its ultimate tensile strength by the 0.6 rule
 * (ifi-shear-rule; checked against aluminum-association-typical for 6061-T6). See `MATERIAL_SHEAR_RATIO`.
 *
 * Formula: $\tau_u \approx 0.6\,R_m$
 *
 * @param ultimateStrength R_m [Pa], greater than 0
 * @returns τ_u [Pa]
 *
 * @example
 * materialShearStrength({ ultimateStrength: 310e6 }) // → 186e6 (6061-T6 typical; the typical shear is 207 MPa)
 *
 * Sources: ifi-shear-rule, aluminum-association-typical.
 */
export function materialShearStrength(input: { ultimateStrength: number }): number {
  const { ultimateStrength } = requireInputObject(input);
  requirePositive("ultimateStrength", ultimateStrength, "Pa");
  return requireFiniteResult(MATERIAL_SHEAR_RATIO * ultimateStrength, "shear strength", { ultimateStrength: [ultimateStrength, "Pa"] }); // ifi-shear-rule
}

/** Stripping of a thread tapped into a part. */
export interface TappedThreadStrength {
  /** A_n at the given engagement [m²]. */
  shearArea: number;
  /** τ of the part's material, 0.6 R_m [Pa]. */
  shearStrength: number;
  /** F_strip = τ A_n, the load that strips the part's thread [N]. */
  strippingLoad: number;
  /** The bolt's minimum breaking load A_s R_m,min [N]. */
  boltBreakingLoad: number;
  /** L_e at which the part's thread is as strong as the bolt: F_strip = A_s R_m,min [m]. */
  engagementForFullStrength: number;
}

/**
 * Stripping load of a thread tapped into a part at a given engagement, and the engagement at which
 * it equals the bolt's breaking load (fed-std-h28-2, machinerys-handbook, ifi-shear-rule).
 *
 * Formula: $F_{strip} = 0.6\,R_{m,part}\,A_n(L_e),\qquad L_{e,full} = \dfrac{A_s\,R_{m,bolt}}{0.6\,R_{m,part}\,A_n/L_e}$
 *
 * @param thread from `fastenerThread` (pitch, D_s,min, E_n,max, A_s)
 * @param boltTensileStrength R_m,min of the bolt [Pa], greater than 0
 * @param partUltimateStrength R_m of the part's material [Pa], greater than 0
 * @param engagedLength L_e [m], greater than 0
 * @returns A_n, τ, F_strip, the bolt's breaking load and L_e,full
 *
 * Assumptions: the part's thread is the weaker (true for aluminium and plastics under a steel bolt);
 * full-form thread over L_e; the geometric shear area of the worst fit.
 *
 * @example
 * tappedThreadStrength({ thread: fastenerThread("M4"), boltTensileStrength: 1220e6, partUltimateStrength: 345e6, engagedLength: 0.008 }) // → { strippingLoad: 12 866, shearStrength: 207e6, … } (F_strip = 12 866 N at τ = 207 MPa)
 *
 * Sources: fed-std-h28-2, machinerys-handbook, ifi-shear-rule.
 */
export function tappedThreadStrength(input: {
  thread: FastenerThread;
  boltTensileStrength: number;
  partUltimateStrength: number;
  engagedLength: number;
}): TappedThreadStrength {
  const { thread, boltTensileStrength, partUltimateStrength, engagedLength } = requireInputObject(input);
  requireInputObject(thread, "thread");
  requirePositive("boltTensileStrength", boltTensileStrength, "Pa");
  // Checked here under its own name, so that a refusal names the field the caller wrote.
  requirePositive("partUltimateStrength", partUltimateStrength, "Pa");
  const shearStrength = materialShearStrength({ ultimateStrength: partUltimateStrength });
  const geometry = { pitch: thread.pitch, externalMajorMin: thread.externalMajorMin, internalPitchMax: thread.internalPitchMax };
  const shearArea = internalThreadShearArea({ engagedLength, ...geometry });
  const areaPerLength = shearArea / engagedLength;
  const boltBreakingLoad = thread.stressArea * boltTensileStrength; // iso-898-1 Table 4 (A_s R_m,min)
  return {
    shearArea,
    shearStrength,
    strippingLoad: requireFiniteResult(shearStrength * shearArea, "stripping load", { engagedLength: [engagedLength, "m"] }), // fed-std-h28-2
    boltBreakingLoad,
    engagementForFullStrength: requireFiniteResult(boltBreakingLoad / (shearStrength * areaPerLength), "full-strength engagement", {
      boltTensileStrength: [boltTensileStrength, "Pa"],
    }),
  };
}

// ---------------------------------------------------------------------------------------------
