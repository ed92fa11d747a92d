/**
 * ISO metric fasteners as data: coarse-thread sizes with their pitch and tensile stress area, and
 * the strength of the common steel property classes. SI throughout: m, m², Pa, N.
 *
 * The tables hold what the standards print; the functions derive what the tables imply (stress area
 * from the thread geometry, minimum tensile and proof loads, Eurocode design resistances) so that
 * every tabulated number can be checked against its formula.
 */
import { CalcInputError, requireInRange, requirePositive } from "../core/errors.ts";
import { requireChoice, type ChoiceOption } from "./common.ts";
import type { SourceKey } from "../sources/index.ts";
import { requireInputObject, requireFiniteResult } from "../core/spec-check.ts";

// Choosing from a fixed list lives with the shared load-check helpers; re-exported here, where it started.
export { requireChoice, type ChoiceOption };

// ---------------------------------------------------------------------------------------------
// Thread geometry.

// The size and class menus live in fastener-options.ts (a page can draw them without these tables).
export { PROPERTY_CLASS_OPTIONS, THREAD_SIZE_OPTIONS, type PropertyClassId, type ThreadSize } from "./fastener-options.ts";
import { PROPERTY_CLASS_OPTIONS, THREAD_SIZE_OPTIONS, type PropertyClassId, type ThreadSize } from "./fastener-options.ts";

export interface MetricThread {
  /** Designation, e.g. "M4". */
  size: ThreadSize;
  /** d, the basic major (nominal) diameter [m]. */
  nominalDiameter: number;
  /** P, the coarse pitch [m] (iso-261). */
  pitch: number;
  /** A_s,nom, the tensile stress area as the standard tabulates it, to 3 significant figures [m²]. */
  stressArea: number;
  /** Where the tabulated stress area is printed. */
  stressAreaSource: SourceKey;
}

/**
 * ISO metric coarse threads M2–M12: pitch (iso-261) and tabulated tensile stress area A_s,nom
 * (iso-898-1 Table 4 for M3–M12; gb-t-16823-1 for M2 and M2.5, which ISO 898-1's load tables
 * start above). Every tabulated area agrees with `tensileStressArea` to its printed precision.
 */
export const METRIC_COARSE_THREADS: Readonly<Record<ThreadSize, MetricThread>> = {
  M2: { size: "M2", nominalDiameter: 0.002, pitch: 0.0004, stressArea: 2.07e-6, stressAreaSource: "gb-t-16823-1" },
  "M2.5": { size: "M2.5", nominalDiameter: 0.0025, pitch: 0.00045, stressArea: 3.39e-6, stressAreaSource: "gb-t-16823-1" },
  M3: { size: "M3", nominalDiameter: 0.003, pitch: 0.0005, stressArea: 5.03e-6, stressAreaSource: "iso-898-1" },
  M4: { size: "M4", nominalDiameter: 0.004, pitch: 0.0007, stressArea: 8.78e-6, stressAreaSource: "iso-898-1" },
  M5: { size: "M5", nominalDiameter: 0.005, pitch: 0.0008, stressArea: 14.2e-6, stressAreaSource: "iso-898-1" },
  M6: { size: "M6", nominalDiameter: 0.006, pitch: 0.001, stressArea: 20.1e-6, stressAreaSource: "iso-898-1" },
  M8: { size: "M8", nominalDiameter: 0.008, pitch: 0.00125, stressArea: 36.6e-6, stressAreaSource: "iso-898-1" },
  M10: { size: "M10", nominalDiameter: 0.01, pitch: 0.0015, stressArea: 58.0e-6, stressAreaSource: "iso-898-1" },
  M12: { size: "M12", nominalDiameter: 0.012, pitch: 0.00175, stressArea: 84.3e-6, stressAreaSource: "iso-898-1" },
};

/** The thread of a size, after checking the size is one of `THREAD_SIZE_OPTIONS` (param "size"). */
export function metricThread(size: string, param = "size"): MetricThread {
  return METRIC_COARSE_THREADS[requireChoice(param, size, THREAD_SIZE_OPTIONS)];
}

export interface ThreadDiameters {
  /** H, height of the fundamental triangle, (√3/2)·P [m]. */
  fundamentalTriangleHeight: number;
  /** d₂, basic pitch diameter, d − (3/4)·H = d − 0.649 519 P [m]. */
  pitchDiameter: number;
  /** d₁, basic minor diameter, d − (5/4)·H = d − 1.082 532 P [m]. */
  minorDiameter: number;
  /** d₃ = d₁ − H/6 = d − 1.226 869 P, the diameter used for the stress area [m]. */
  stressDiameterD3: number;
}

/**
 * Basic diameters of an ISO metric thread from its nominal diameter and pitch (iso-68-1 basic
 * profile; iso-724 basic dimensions; d₃ as iso-898-1 defines it for the stress area).
 *
 * Formula: $H = \tfrac{\sqrt3}{2}P,\quad d_2 = d - \tfrac34 H,\quad d_1 = d - \tfrac54 H,\quad d_3 = d_1 - \tfrac{H}{6}$
 *
 * @param nominalDiameter d, basic major diameter [m], greater than 0
 * @param pitch P [m], greater than 0 and less than d/1.3 (so that d₃ stays positive)
 * @returns H, d₂, d₁, d₃ [m]
 *
 * @example
 * threadDiameters({ nominalDiameter: 0.004, pitch: 0.0007 }) // → { pitchDiameter: 0.00354534, minorDiameter: 0.00324223, stressDiameterD3: 0.00314119, … } (M4 × 0.7)
 * Sources: iso-68-1, iso-724, iso-898-1.
 */
export function threadDiameters(input: { nominalDiameter: number; pitch: number }): ThreadDiameters {
  const { nominalDiameter, pitch } = requireInputObject(input);
  requirePositive("nominalDiameter", nominalDiameter, "m");
  requirePositive("pitch", pitch, "m");
  if (!(pitch < nominalDiameter / 1.3)) {
    const limit = Number((nominalDiameter / 1.3).toPrecision(4));
    throw new CalcInputError({ param: "pitch", value: pitch, expected: `less than the nominal diameter ÷ 1.3, ${limit} m`, unit: "m" });
  }
  const fundamentalTriangleHeight = (Math.sqrt(3) / 2) * pitch; // iso-68-1
  const pitchDiameter = nominalDiameter - 0.75 * fundamentalTriangleHeight; // iso-724
  const minorDiameter = nominalDiameter - 1.25 * fundamentalTriangleHeight; // iso-724
  const stressDiameterD3 = minorDiameter - fundamentalTriangleHeight / 6; // iso-898-1
  return { fundamentalTriangleHeight, pitchDiameter, minorDiameter, stressDiameterD3 };
}

/**
 * Tensile stress area of an ISO metric thread from its geometry (iso-898-1): the area of a circle
 * whose diameter is the mean of the pitch diameter d₂ and d₃.
 *
 * Formula: $A_s = \dfrac{\pi}{4}\left(\dfrac{d_2 + d_3}{2}\right)^2 = \dfrac{\pi}{4}\,(d - 0.938\,194\,P)^2$
 *
 * @param nominalDiameter d [m], greater than 0
 * @param pitch P [m], greater than 0 and less than d/1.3
 * @returns A_s [m²]
 *
 * Assumptions: basic (zero-tolerance) thread profile; that is what the standard's table is built
 * on.
 * @example
 * tensileStressArea({ nominalDiameter: 0.004, pitch: 0.0007 }) // → 8.77872e-6 [m²] (M4 × 0.7; table: 8.78 mm²)
 * tensileStressArea({ nominalDiameter: 0.002, pitch: 0.0004 }) // → 2.07323e-6 [m²] (M2 × 0.4; table: 2.07 mm²)
 * Sources: iso-898-1, iso-724, iso-68-1.
 */
export function tensileStressArea(input: { nominalDiameter: number; pitch: number }): number {
  const { nominalDiameter, pitch } = requireInputObject(input);
  const { pitchDiameter, stressDiameterD3 } = threadDiameters({ nominalDiameter, pitch });
  const mean = (pitchDiameter + stressDiameterD3) / 2;
  return requireFiniteResult((Math.PI / 4) * mean * mean, "stress area", { nominalDiameter: [nominalDiameter, "m"] }); // iso-898-1
}

// ---------------------------------------------------------------------------------------------
// Property classes.

export interface PropertyClass {
  id: PropertyClassId;
  /** R_m,nom, nominal tensile strength, (first number) × 100 MPa [Pa]. */
  tensileStrengthNominal: number;
  /** R_m,min, minimum tensile strength [Pa]. */
  tensileStrengthMin: number;
  /** Nominal yield: R_eL for 4.6, R_p0.2 for the others [Pa]. */
  yieldStrengthNominal: number;
  /** Minimum yield: R_eL,min for 4.6, R_p0.2,min for the others [Pa]. */
  yieldStrengthMin: number;
  /** Which yield the standard specifies: lower yield strength, or stress at 0.2 % non-proportional elongation. */
  yieldKind: "ReL" | "Rp0.2";
  /** S_p, stress under proof load, tested on the whole bolt [Pa]. */
  proofStress: number;
  /** Scope of the row, where the standard splits a class by diameter. */
  note: string;
}

/**
 * ISO 898-1 Table 3 rows for 4.6, 8.8 (d ≤ 16 mm), 10.9 and 12.9 (iso-898-1). The checks in
 * calc/loads/index.ts use the minimum values: a bolt of the class is only guaranteed to reach those.
 */
export const PROPERTY_CLASSES: Readonly<Record<PropertyClassId, PropertyClass>> = {
  "4.6": {
    id: "4.6",
    tensileStrengthNominal: 400e6,
    tensileStrengthMin: 400e6,
    yieldStrengthNominal: 240e6,
    yieldStrengthMin: 240e6,
    yieldKind: "ReL",
    proofStress: 225e6,
    note: "all diameters",
  },
  "8.8": {
    id: "8.8",
    tensileStrengthNominal: 800e6,
    tensileStrengthMin: 800e6,
    yieldStrengthNominal: 640e6,
    yieldStrengthMin: 640e6,
    yieldKind: "Rp0.2",
    proofStress: 580e6,
    note: "row for d ≤ 16 mm (every size offered here)",
  },
  "10.9": {
    id: "10.9",
    tensileStrengthNominal: 1000e6,
    tensileStrengthMin: 1040e6,
    yieldStrengthNominal: 900e6,
    yieldStrengthMin: 940e6,
    yieldKind: "Rp0.2",
    proofStress: 830e6,
    note: "all diameters",
  },
  "12.9": {
    id: "12.9",
    tensileStrengthNominal: 1200e6,
    tensileStrengthMin: 1220e6,
    yieldStrengthNominal: 1080e6,
    yieldStrengthMin: 1100e6,
    yieldKind: "Rp0.2",
    proofStress: 970e6,
    note: "all diameters",
  },
};

/** The class's table row, after checking it is one of `PROPERTY_CLASS_OPTIONS` (param "propertyClass"). */
export function propertyClass(id: string, param = "propertyClass"): PropertyClass {
  return PROPERTY_CLASSES[requireChoice(param, id, PROPERTY_CLASS_OPTIONS)];
}

/**
 * Minimum ultimate tensile load of a bolt: the tabulated stress area times the class's minimum
 * tensile strength (iso-898-1, Table 4 is built this way).
 *
 * Formula: $F_{m,min} = A_{s,nom}\,R_{m,min}$
 *
 * @param size a value of `THREAD_SIZE_OPTIONS`
 * @param propertyClass a value of `PROPERTY_CLASS_OPTIONS`
 * @returns F_m,min [N]
 *
 * @example
 * minimumUltimateTensileLoad({ size: "M6", propertyClass: "8.8" }) // → 16080 [N] (20.1 mm² × 800 MPa; table: 16 100 N)
 * Sources: iso-898-1.
 */
export function minimumUltimateTensileLoad(input: { size: string; propertyClass: string }): number {
  const { size, propertyClass: classId } = requireInputObject(input);
  return metricThread(size).stressArea * propertyClass(classId).tensileStrengthMin; // iso-898-1
}

/**
 * Proof load of a bolt: tabulated stress area times the class's proof stress, the load a whole bolt
 * must carry without measurable permanent stretch (iso-898-1).
 *
 * Formula: $F_p = A_{s,nom}\,S_p$
 *
 * @param size a value of `THREAD_SIZE_OPTIONS`
 * @param propertyClass a value of `PROPERTY_CLASS_OPTIONS`
 * @returns F_p [N]
 *
 * @example
 * proofLoad({ size: "M4", propertyClass: "8.8" }) // → 5092 [N] (8.78 mm² × 580 MPa; table: 5100 N)
 * Sources: iso-898-1.
 */
export function proofLoad(input: { size: string; propertyClass: string }): number {
  const { size, propertyClass: classId } = requireInputObject(input);
  return metricThread(size).stressArea * propertyClass(classId).proofStress; // iso-898-1
}

// ---------------------------------------------------------------------------------------------
// Shear strength of a bolt: one rule for every class and grade.

/**
 * Shear ultimate of bolt steel as a fraction of its specified minimum tensile strength: τ_u = 0.6 R_m,min
 * (ifi-shear-rule: "shear strengths of carbon steel fasteners may be assumed to be approximately 60
 * percent of their specified minimum tensile strengths"). ISO 898-1 specifies no shear strength.
 *
 * One rule for every class, paired with the distortion-energy shear yield τ_y = R_p0.2,min/√3
 * (shigley-distortion-energy). Since R_p0.2 ≤ R_m for every class, τ_y/τ_u ≤ 1/(0.6·√3) = 0.962: the
 * shear yield can never exceed the shear ultimate. Eurocode 3's α_v (0.6 for 4.6, 5.6 and 8.8, 0.5 for
 * 10.9; en-1993-1-8 Table 3.4) is a design-resistance coefficient that goes with γ_M2, not a material
 * shear strength: paired with the von Mises yield, α_v = 0.5 gives τ_u below τ_y for 10.9 (520 < 542.7 MPa)
 * and for 12.9 (610 < 635.1 MPa). The handbook spread of the ratio is about 0.5 to 0.75 (shear-ultimate-ratio).
 */
export const BOLT_SHEAR_ULTIMATE_RATIO = 0.6;

/** A bolt's shear strengths under the one rule of `boltShearStrengths`. */
export interface BoltShearStrengths {
  /** τ_y = R_p0.2,min/√3, distortion-energy shear yield [Pa]. */
  shearYield: number;
  /** τ_u = 0.6 R_m,min [Pa]. */
  shearUltimate: number;
}

/**
 * Shear yield and shear ultimate of bolt steel from its specified minimum tensile yield and tensile
 * strength, by one rule for every class and grade (shigley-distortion-energy, ifi-shear-rule).
 *
 * Formula: $\tau_y = \dfrac{R_{p0.2,min}}{\sqrt3} \approx 0.577\,R_{p0.2,min},\qquad \tau_u = 0.6\,R_{m,min}$
 *
 * @param yieldStrength R_p0.2,min (or R_eL,min) [Pa], greater than 0 and at most `tensileStrength`
 * @param tensileStrength R_m,min [Pa], greater than 0
 * @returns shearYield and shearUltimate [Pa]; shearYield ≤ 0.962 × shearUltimate always
 *
 * Assumptions: both are estimates from the tensile values (the standards specify no shear strength);
 * the basis stays that of the inputs (specified minimum for the ISO 898-1, SAE J429 and ASTM A574 rows).
 *
 * @example
 * boltShearStrengths({ yieldStrength: 940e6, tensileStrength: 1040e6 }) // → { shearYield: 542.7e6, shearUltimate: 624e6 } (class 10.9)
 *
 * Sources: shigley-distortion-energy, ifi-shear-rule, iso-898-1.
 */
export function boltShearStrengths(input: { yieldStrength: number; tensileStrength: number }): BoltShearStrengths {
  const { yieldStrength, tensileStrength } = requireInputObject(input);
  requirePositive("tensileStrength", tensileStrength, "Pa");
  requirePositive("yieldStrength", yieldStrength, "Pa");
  if (!(yieldStrength <= tensileStrength)) {
    throw new CalcInputError({ param: "yieldStrength", value: yieldStrength, expected: `at most the tensile strength, ${tensileStrength} Pa`, unit: "Pa" });
  }
  return {
    shearYield: yieldStrength / Math.sqrt(3), // shigley-distortion-energy
    shearUltimate: BOLT_SHEAR_ULTIMATE_RATIO * tensileStrength, // ifi-shear-rule
  };
}

/**
 * Shear strengths of an ISO 898-1 property class from its minimum R_p0.2 (R_eL for 4.6) and R_m
 * (iso-898-1 Table 3, shigley-distortion-energy, ifi-shear-rule).
 *
 * Formula: $\tau_y = R_{p0.2,min}/\sqrt3,\qquad \tau_u = 0.6\,R_{m,min}$
 *
 * @param propertyClass a value of `PROPERTY_CLASS_OPTIONS`
 * @returns shearYield and shearUltimate [Pa]
 *
 * @example
 * propertyClassShearStrengths({ propertyClass: "12.9" }) // → { shearYield: 635.1e6, shearUltimate: 732e6 }
 *
 * Sources: iso-898-1, shigley-distortion-energy, ifi-shear-rule.
 */
export function propertyClassShearStrengths(input: { propertyClass: string }): BoltShearStrengths {
  const { propertyClass: classId } = requireInputObject(input);
  const row = propertyClass(classId);
  return boltShearStrengths({ yieldStrength: row.yieldStrengthMin, tensileStrength: row.tensileStrengthMin });
}

// ---------------------------------------------------------------------------------------------
// Eurocode 3 design resistances (a cross-check and a reference point for the shear ratio).

/**
 * EN 1993-1-8 Table 3.4 shear factor α_v for a shear plane through the thread. 12.9 is outside the
 * classes Eurocode 3 covers, so it has no value here (null).
 */
export const EN1993_THREAD_SHEAR_FACTOR: Readonly<Record<PropertyClassId, number | null>> = {
  "4.6": 0.6,
  "8.8": 0.6,
  "10.9": 0.5,
  "12.9": null,
};

/** γ_M2, the partial factor EN 1993-1-8 recommends for bolt resistance (§2.2). */
export const EN1993_GAMMA_M2 = 1.25;

/**
 * Design shear resistance of one bolt per shear plane (en-1993-1-8, Table 3.4).
 *
 * Formula: $F_{v,Rd} = \dfrac{\alpha_v\,f_{ub}\,A}{\gamma_{M2}}$
 *
 * @param area A: A_s when the shear plane passes through the thread, the shank area otherwise [m²], greater than 0
 * @param ultimateStrength f_ub, the bolt's nominal ultimate strength [Pa], greater than 0
 * @param shearFactor α_v [-], greater than 0 and at most 1 (0.6 or 0.5 in the code)
 * @param partialFactor γ_M2 [-], at least 1 (1.25 recommended)
 * @returns F_v,Rd [N]
 *
 * Assumptions: a structural design value, with the partial factor built in; the loads module's
 * safety factors are reported against the unfactored strength instead.
 * @example
 * eurocodeBoltShearResistance({ area: 245e-6, ultimateStrength: 400e6, shearFactor: 0.6 }) // → 47040 [N] (class 4.6, M20: 0.6 × 400 MPa × 245 mm² / 1.25)
 * Sources: en-1993-1-8.
 */
export function eurocodeBoltShearResistance(input: { area: number; ultimateStrength: number; shearFactor: number; partialFactor?: number }): number {
  const { area, ultimateStrength, shearFactor, partialFactor = EN1993_GAMMA_M2 } = requireInputObject(input);
  requirePositive("area", area, "m²");
  requirePositive("ultimateStrength", ultimateStrength, "Pa");
  requireInRange("shearFactor", shearFactor, "", { min: 0, max: 1, minOpen: true });
  requireInRange("partialFactor", partialFactor, "", { min: 1, max: 10 });
  return requireFiniteResult((shearFactor * ultimateStrength * area) / partialFactor, "shear resistance", {
    area: [area, "m²"],
    ultimateStrength: [ultimateStrength, "Pa"],
    // Not α_v (at most 1) or γ_M2 (1 to 10): when the product overflows, f_ub and A each exceed 1/α_v, so are further from 1.
  }); // en-1993-1-8 Table 3.4
}

/**
 * Design tension resistance of one bolt (en-1993-1-8, Table 3.4).
 *
 * Formula: $F_{t,Rd} = \dfrac{k_2\,f_{ub}\,A_s}{\gamma_{M2}}$
 *
 * @param stressArea A_s [m²], greater than 0
 * @param ultimateStrength f_ub [Pa], greater than 0
 * @param k2 [-], 0.9 for ordinary heads, 0.63 for countersunk bolts; greater than 0 and at most 1
 * @param partialFactor γ_M2 [-], at least 1 (1.25 recommended)
 * @returns F_t,Rd [N]
 *
 * @example
 * eurocodeBoltTensionResistance({ stressArea: 245e-6, ultimateStrength: 400e6 }) // → 70560 [N] (class 4.6, M20: 0.9 × 400 MPa × 245 mm² / 1.25)
 * Sources: en-1993-1-8.
 */
export function eurocodeBoltTensionResistance(input: { stressArea: number; ultimateStrength: number; k2?: number; partialFactor?: number }): number {
  const { stressArea, ultimateStrength, k2 = 0.9, partialFactor = EN1993_GAMMA_M2 } = requireInputObject(input);
  requirePositive("stressArea", stressArea, "m²");
  requirePositive("ultimateStrength", ultimateStrength, "Pa");
  requireInRange("k2", k2, "", { min: 0, max: 1, minOpen: true });
  requireInRange("partialFactor", partialFactor, "", { min: 1, max: 10 });
  return requireFiniteResult((k2 * ultimateStrength * stressArea) / partialFactor, "tension resistance", {
    stressArea: [stressArea, "m²"],
    ultimateStrength: [ultimateStrength, "Pa"],
    // Not k₂ (at most 1) or γ_M2 (1 to 10): when the product overflows, f_ub and A each exceed 1/k₂, so are further from 1.
  }); // en-1993-1-8 Table 3.4
}

/** Source keys this module relies on (checked by the meta test). */
export const FASTENERS_SOURCES: readonly SourceKey[] = [
  "iso-898-1",
  "iso-261",
  "iso-68-1",
  "iso-724",
  "gb-t-16823-1",
  "en-1993-1-8",
  "shigley-distortion-energy",
  "ifi-shear-rule",
];
