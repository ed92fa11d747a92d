/**
 * Unified inch fasteners as data, beside the ISO metric ones of calc/fasteners.ts: the small UNC/UNF
 * sizes builders use with their tensile stress areas, the SAE J429 grades and ASTM A574 socket-head
 * cap screws with their specified minimum strengths, the class 2A/2B thread limits the stripping check
 * needs, and one lookup that answers for any size or grade, metric or inch. SI throughout: m, m², Pa.
 *
 * Same shapes as `METRIC_COARSE_THREADS` and `PROPERTY_CLASSES`, so a calculator can offer both
 * systems from one list (`FASTENER_SIZE_OPTIONS`, `FASTENER_GRADE_OPTIONS`).
 */
import { INCH, POUND_FORCE } from "../core/constants.ts";
import { CalcInputError, requirePositive } from "../core/errors.ts";
import {
  boltShearStrengths,
  METRIC_COARSE_THREADS,
  PROPERTY_CLASS_OPTIONS,
  PROPERTY_CLASSES,
  threadDiameters,
  type PropertyClassId,
  type ThreadSize,
} from "./fasteners.ts";
import { requireChoice } from "./common.ts";
import type { SourceKey } from "../sources/index.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

/** 1 ksi = 1000 lbf/in² = 6.894 757 MPa (nist-sp811). */
const KSI = (1000 * POUND_FORCE) / (INCH * INCH);

/** Coefficient of the pitch diameter, 3√3/8 = 0.649 519 (asme-b1-1 basic profile; shigley-mechanical-design Table 8-2). */
const PITCH_DIAMETER_COEFF = (3 * Math.sqrt(3)) / 8;
/** Coefficient of the root diameter used for the stress area, 3√3/4 = 1.299 038 (shigley-mechanical-design Table 8-2). */
const ROOT_DIAMETER_COEFF = (3 * Math.sqrt(3)) / 4;

// ---------------------------------------------------------------------------------------------
// Inch thread sizes.

// The size and grade menus live in fastener-options.ts (a page can draw them without these tables).
export {
  FASTENER_GRADE_OPTIONS,
  FASTENER_SIZE_OPTIONS,
  INCH_GRADE_OPTIONS,
  INCH_THREAD_SIZE_OPTIONS,
  type FastenerGradeId,
  type FastenerSizeId,
  type InchGradeId,
  type InchThreadSize,
} from "./fastener-options.ts";
import {
  FASTENER_GRADE_OPTIONS,
  FASTENER_SIZE_OPTIONS,
  INCH_GRADE_OPTIONS,
  INCH_THREAD_SIZE_OPTIONS,
  type FastenerGradeId,
  type FastenerSizeId,
  type InchGradeId,
  type InchThreadSize,
} from "./fastener-options.ts";

export interface InchThread {
  /** Designation, e.g. "#10-32". */
  size: InchThreadSize;
  /** Coarse (UNC) or fine (UNF) series. */
  series: "UNC" | "UNF";
  /** D, basic major diameter [m]; a numbered size N has D = 0.060 + 0.013 N in. */
  nominalDiameter: number;
  /** n, threads per inch [1/in]. */
  threadsPerInch: number;
  /** P = 1/n, the pitch [m]. */
  pitch: number;
  /** A_s as the table prints it [in²], kept as printed for the check to the last digit. */
  stressAreaSquareInches: number;
  /** A_s as the table prints it, in SI [m²]. */
  stressArea: number;
  /** Where the tabulated stress area is printed. */
  stressAreaSource: SourceKey;
}

function inchRow(size: InchThreadSize, series: "UNC" | "UNF", diameterInches: number, threadsPerInch: number, stressAreaSquareInches: number): InchThread {
  return {
    size,
    series,
    nominalDiameter: diameterInches * INCH,
    threadsPerInch,
    pitch: INCH / threadsPerInch,
    stressAreaSquareInches,
    stressArea: stressAreaSquareInches * INCH * INCH,
    stressAreaSource: "shigley-mechanical-design",
  };
}

/**
 * Unified inch threads with the tensile stress areas of Shigley's Table 8-2, compiled from ANSI
 * B1.1-1974 (shigley-mechanical-design; the same figures head the ASTM A574 load table, astm-a574,
 * whose footnote builds them by FED-STD-H28). Every area agrees with `unifiedTensileStressArea` to
 * its printed digit except #4-40: the table prints 0.00604 in², the formula gives 0.006 033 in²
 * (+0.12 %); the printed value is kept.
 */
export const INCH_THREADS: Readonly<Record<InchThreadSize, InchThread>> = {
  "#2-56": inchRow("#2-56", "UNC", 0.086, 56, 0.0037),
  "#4-40": inchRow("#4-40", "UNC", 0.112, 40, 0.00604),
  "#6-32": inchRow("#6-32", "UNC", 0.138, 32, 0.00909),
  "#8-32": inchRow("#8-32", "UNC", 0.164, 32, 0.014),
  "#10-24": inchRow("#10-24", "UNC", 0.19, 24, 0.0175),
  "#10-32": inchRow("#10-32", "UNF", 0.19, 32, 0.02),
  "1/4-20": inchRow("1/4-20", "UNC", 0.25, 20, 0.0318),
  "5/16-18": inchRow("5/16-18", "UNC", 0.3125, 18, 0.0524),
  "3/8-16": inchRow("3/8-16", "UNC", 0.375, 16, 0.0775),
};

/** The row of an inch size, after checking it is one of `INCH_THREAD_SIZE_OPTIONS` (param "size"). */
export function inchThread(size: string, param = "size"): InchThread {
  return INCH_THREADS[requireChoice(param, size, INCH_THREAD_SIZE_OPTIONS)];
}

/** Basic diameters of a Unified inch thread. */
export interface UnifiedThreadDiameters {
  /** d_p = D − 0.649 519 P, basic pitch diameter [m]. */
  pitchDiameter: number;
  /** d_r = D − 1.299 038 P, the minor (root) diameter used for the stress area and for bending [m]. */
  rootDiameter: number;
}

function requireUnifiedPitch(nominalDiameter: number, pitch: number): void {
  requirePositive("nominalDiameter", nominalDiameter, "m");
  requirePositive("pitch", pitch, "m");
  if (!(pitch < nominalDiameter / ROOT_DIAMETER_COEFF)) {
    const limit = Number((nominalDiameter / ROOT_DIAMETER_COEFF).toPrecision(4));
    throw new CalcInputError({ param: "pitch", value: pitch, expected: `less than the nominal diameter ÷ 1.299, ${limit} m`, unit: "m" });
  }
}

/**
 * Basic pitch and root diameters of a Unified inch thread (asme-b1-1, as Shigley's Table 8-2 footnote
 * states them: shigley-mechanical-design).
 *
 * Formula: $d_p = D - 0.649\,519\,P,\qquad d_r = D - 1.299\,038\,P$
 *
 * @param nominalDiameter D, basic major diameter [m], greater than 0
 * @param pitch P = 1/n [m], greater than 0 and less than D/1.299 (so that d_r stays positive)
 * @returns d_p and d_r [m]
 *
 * @example
 * unifiedThreadDiameters({ nominalDiameter: 0.00635, pitch: 0.00127 }) // → { pitchDiameter: 5.5251e-3, rootDiameter: 4.7002e-3 } (1/4-20: d_p = 5.5251 mm, d_r = 4.7002 mm)
 *
 * Sources: asme-b1-1, shigley-mechanical-design.
 */
export function unifiedThreadDiameters(input: { nominalDiameter: number; pitch: number }): UnifiedThreadDiameters {
  const { nominalDiameter, pitch } = requireInputObject(input);
  requireUnifiedPitch(nominalDiameter, pitch);
  return {
    pitchDiameter: nominalDiameter - PITCH_DIAMETER_COEFF * pitch, // asme-b1-1
    rootDiameter: nominalDiameter - ROOT_DIAMETER_COEFF * pitch, // shigley-mechanical-design Table 8-2
  };
}

/**
 * Tensile stress area of a Unified inch thread: the circle on the mean of the pitch and root
 * diameters (asme-b1-1; fed-std-h28-2; shigley-mechanical-design Table 8-2 footnote).
 *
 * Formula: $A_s = \dfrac{\pi}{4}\left(\dfrac{d_p + d_r}{2}\right)^2 = 0.7854\left(D - \dfrac{0.9743}{n}\right)^2$
 *
 * @param nominalDiameter D [m], greater than 0
 * @param pitch P = 1/n [m], greater than 0 and less than D/1.299
 * @returns A_s [m²]
 *
 * Assumptions: basic (zero-tolerance) profile, as the tables are built. The exact coefficient is
 * 9√3/16 = 0.974 278 6; the standard prints it as 0.9743.
 *
 * @example
 * unifiedTensileStressArea({ nominalDiameter: 0.00635, pitch: 0.00127 }) // → 20.530e-6 (0.031 821 in², table 0.0318)
 *
 * Sources: asme-b1-1, fed-std-h28-2, shigley-mechanical-design.
 */
export function unifiedTensileStressArea(input: { nominalDiameter: number; pitch: number }): number {
  const { nominalDiameter, pitch } = requireInputObject(input);
  const { pitchDiameter, rootDiameter } = unifiedThreadDiameters({ nominalDiameter, pitch });
  const mean = (pitchDiameter + rootDiameter) / 2;
  return requireFiniteResult((Math.PI / 4) * mean * mean, "stress area", { nominalDiameter: [nominalDiameter, "m"] }); // asme-b1-1
}

// ---------------------------------------------------------------------------------------------
// Class 2A / 2B limits (for the thread-stripping areas).

/** Class 2A external and class 2B internal limits a stripping check needs. */
export interface UnifiedClass2Limits {
  /** Class 2A pitch-diameter tolerance, rounded to 0.0001 in as the standard tabulates it [m]. */
  pitchTolerance2A: number;
  /** Class 2A allowance, 0.3 × that tolerance, rounded to 0.0001 in [m]. */
  allowance2A: number;
  /** Major-diameter tolerance of the external thread, 0.060 P^(2/3) in, rounded to 0.0001 in [m]. */
  majorTolerance2A: number;
  /** D_s,min, minimum major diameter of the class 2A external thread [m]. */
  externalMajorMin: number;
  /** E_n,max, maximum pitch diameter of the class 2B internal thread [m]. */
  internalPitchMax: number;
}

const round4 = (inches: number) => Math.round(inches * 1e4) / 1e4;
const round6 = (inches: number) => Math.round(inches * 1e6) / 1e6;

/**
 * Class 2A external major-diameter minimum and class 2B internal pitch-diameter maximum of a Unified
 * inch thread, from the ASME B1.1 tolerance formulas, worked in inches: each term of the pitch tolerance
 * to 0.000 001 in, each tolerance and limit to 0.0001 in, as the standard's tables are (asme-b1-1).
 *
 * Formula: $T_{d2,2A} = 0.0015\,D^{1/3} + 0.0015\,\sqrt{L_E} + 0.015\,P^{2/3}$ with $L_E = D$;
 * $es = 0.3\,T_{d2,2A}$; $T_d = 0.060\,P^{2/3}$; $D_{s,min} = D - es - T_d$; $E_{n,max} = D - 0.649\,519\,P + 1.3\,T_{d2,2A}$ (inches)
 *
 * @param nominalDiameter D [m], greater than 0 (the formulas are stated for D up to 6 in)
 * @param pitch P [m], greater than 0 and less than D/1.299
 * @returns the 2A tolerance and allowance, the major tolerance, D_s,min and E_n,max [m]
 *
 * Assumptions: standard length of engagement L_E = D (this reproduces the published 2A/2B limits,
 * e.g. 1/4-20: D_s,min 0.2408 in, E_n,max 0.2224 in); uncoated threads.
 *
 * @example
 * unifiedClass2Limits({ nominalDiameter: 0.00635, pitch: 0.00127 }) // → { externalMajorMin: 6.11632e-3, internalPitchMax: 5.64896e-3, … } (1/4-20: D_s,min = 0.2408 in, E_n,max = 0.2224 in)
 *
 * Sources: asme-b1-1.
 */
export function unifiedClass2Limits(input: { nominalDiameter: number; pitch: number }): UnifiedClass2Limits {
  const { nominalDiameter, pitch } = requireInputObject(input);
  requireUnifiedPitch(nominalDiameter, pitch);
  if (!(nominalDiameter <= 6 * INCH)) {
    throw new CalcInputError({
      param: "nominalDiameter",
      value: nominalDiameter,
      expected: `at most 6 in (${Number((6 * INCH).toPrecision(12))} m)`,
      unit: "m",
    });
  }
  const d = nominalDiameter / INCH;
  const p = pitch / INCH;
  const p23 = p ** (2 / 3);
  // Each term to 0.000 001 in, each tolerance to 0.0001 in: this reproduces the published limits.
  const tolerance = round6(0.0015 * Math.cbrt(d)) + round6(0.0015 * Math.sqrt(d)) + round6(0.015 * p23); // asme-b1-1, class 2A, LE = D
  const pitchTolerance2A = round4(tolerance);
  const allowance2A = round4(0.3 * tolerance); // asme-b1-1: allowance 0.3 × class 2A pitch tolerance
  const majorTolerance2A = round4(0.06 * p23); // asme-b1-1: major-diameter tolerance
  const externalMajorMin = round4(d - allowance2A - majorTolerance2A);
  const internalPitchMax = round4(round4(d - PITCH_DIAMETER_COEFF * p) + round4(1.3 * tolerance)); // asme-b1-1: class 2B = 1.3 × 2A
  return {
    pitchTolerance2A: pitchTolerance2A * INCH,
    allowance2A: allowance2A * INCH,
    majorTolerance2A: majorTolerance2A * INCH,
    externalMajorMin: externalMajorMin * INCH,
    internalPitchMax: internalPitchMax * INCH,
  };
}

/** Class 6g external and 6H internal limits of the metric sizes: D_s,min and E_n,max [m]. */
const METRIC_6G_6H_LIMITS: Readonly<Record<ThreadSize, { externalMajorMin: number; internalPitchMax: number }>> = {
  M2: { externalMajorMin: 1.886e-3, internalPitchMax: 1.83e-3 },
  "M2.5": { externalMajorMin: 2.38e-3, internalPitchMax: 2.303e-3 },
  M3: { externalMajorMin: 2.874e-3, internalPitchMax: 2.775e-3 },
  M4: { externalMajorMin: 3.838e-3, internalPitchMax: 3.663e-3 },
  M5: { externalMajorMin: 4.826e-3, internalPitchMax: 4.605e-3 },
  M6: { externalMajorMin: 5.794e-3, internalPitchMax: 5.5e-3 },
  M8: { externalMajorMin: 7.76e-3, internalPitchMax: 7.348e-3 },
  M10: { externalMajorMin: 9.732e-3, internalPitchMax: 9.206e-3 },
  M12: { externalMajorMin: 11.701e-3, internalPitchMax: 11.063e-3 },
};

// ---------------------------------------------------------------------------------------------
// Inch grades.

/** What the strengths of a row are: every bolt of the grade is guaranteed to reach them. */
export type StrengthBasis = "specified minimum";

export interface InchGrade {
  id: InchGradeId;
  /** Tensile strength; the standards give only a minimum, so nominal = minimum [Pa]. */
  tensileStrengthNominal: number;
  /** Minimum tensile strength [Pa]. */
  tensileStrengthMin: number;
  /** Yield strength (0.2 % offset); nominal = minimum [Pa]. */
  yieldStrengthNominal: number;
  /** Minimum yield strength, 0.2 % offset [Pa]. */
  yieldStrengthMin: number;
  /** Which yield the standard specifies. */
  yieldKind: "Rp0.2";
  /** S_p, proof stress [Pa]. */
  proofStress: number;
  /** The printed values [ksi]: proof, tensile, yield. */
  printedKsi: { proof: number; tensile: number; yield: number };
  /** Basis of every strength of the row. */
  basis: StrengthBasis;
  /** The standard the row comes from. */
  standard: SourceKey;
  /** Sizes the standard covers with these values, [smallest, largest] nominal diameter [m]. */
  scope: readonly [number, number];
  /** Scope of the row, in words. */
  note: string;
}

function gradeRow(
  id: InchGradeId,
  standard: SourceKey,
  ksi: { proof: number; tensile: number; yield: number },
  scopeInches: readonly [number, number],
  note: string,
): InchGrade {
  return {
    id,
    tensileStrengthNominal: ksi.tensile * KSI,
    tensileStrengthMin: ksi.tensile * KSI,
    yieldStrengthNominal: ksi.yield * KSI,
    yieldStrengthMin: ksi.yield * KSI,
    yieldKind: "Rp0.2",
    proofStress: ksi.proof * KSI,
    printedKsi: ksi,
    basis: "specified minimum",
    standard,
    scope: [scopeInches[0] * INCH, scopeInches[1] * INCH],
    note,
  };
}

/**
 * SAE J429 grades 2, 5 and 8 (sae-j429, as Shigley's Table 8-9 prints them: shigley-mechanical-design)
 * and ASTM A574 socket-head cap screws of 0.500 in and smaller (astm-a574). All values are specified
 * minimums. SAE J429 starts at 1/4 in: for the numbered sizes below it this module applies the grade's
 * J429 values by extension, an assumption flagged by `gradeForSize` (`withinScope: false`); ASTM A574
 * covers 0.060 in and up, so every size here.
 */
export const INCH_GRADES: Readonly<Record<InchGradeId, InchGrade>> = {
  "sae-2": gradeRow("sae-2", "sae-j429", { proof: 55, tensile: 74, yield: 57 }, [0.25, 0.75], "J429 grade 2 row for 1/4 to 3/4 in"),
  "sae-5": gradeRow("sae-5", "sae-j429", { proof: 85, tensile: 120, yield: 92 }, [0.25, 1], "J429 grade 5 row for 1/4 to 1 in"),
  "sae-8": gradeRow("sae-8", "sae-j429", { proof: 120, tensile: 150, yield: 130 }, [0.25, 1.5], "J429 grade 8, 1/4 to 1 1/2 in"),
  a574: gradeRow("a574", "astm-a574", { proof: 140, tensile: 180, yield: 153 }, [0.06, 0.5], "A574 row for 0.500 in and smaller"),
};

/** The row of an inch grade, after checking it is one of `INCH_GRADE_OPTIONS` (param "grade"). */
export function inchGrade(id: string, param = "grade"): InchGrade {
  return INCH_GRADES[requireChoice(param, id, INCH_GRADE_OPTIONS)];
}

// ---------------------------------------------------------------------------------------------
// One lookup for both systems.

/** A thread of either system, with everything a joint check needs. */
export interface FastenerThread {
  size: FastenerSizeId;
  system: "metric" | "inch";
  /** The option label, e.g. "M4 × 0.7" or "#10-32 UNF". */
  label: string;
  /** d, basic major diameter [m]. */
  nominalDiameter: number;
  /** P [m]. */
  pitch: number;
  /** A_s as tabulated [m²]. */
  stressArea: number;
  stressAreaSource: SourceKey;
  /** Basic pitch diameter d₂ / d_p [m]. */
  pitchDiameter: number;
  /** Root (minor) diameter for bending: d₃ = d − 1.226 869 P (metric), d_r = D − 1.299 038 P (inch) [m]. */
  rootDiameter: number;
  /** π d_r²/4 [m²]. */
  rootArea: number;
  /** Tolerance classes the limits below belong to. */
  toleranceClasses: "6g/6H" | "2A/2B";
  /** D_s,min, minimum major diameter of the external thread [m]. */
  externalMajorMin: number;
  /** E_n,max, maximum pitch diameter of the internal thread [m]. */
  internalPitchMax: number;
  /** Where the limits come from. */
  limitsSource: SourceKey;
}

/**
 * Diameters, pitch, stress area, root diameter and class-2 fit limits of any size id, metric or
 * inch (iso-898-1, iso-724, asme-b1-13m for metric; asme-b1-1, shigley-mechanical-design for inch).
 *
 * Formula: metric $d_3 = d - 1.226\,869\,P$; inch $d_r = D - 1.299\,038\,P$; $A_r = \pi d_r^2/4$
 *
 * @param size a value of `FASTENER_SIZE_OPTIONS`
 * @param param the name a bad size is reported under (default "size")
 * @returns the thread's data in SI [m, m²]
 *
 * @example
 * fastenerThread("M4").rootDiameter // → 3.1412e-3
 *
 * Sources: iso-898-1, iso-724, asme-b1-13m, asme-b1-1, shigley-mechanical-design.
 */
export function fastenerThread(size: string, param = "size"): FastenerThread {
  const id = requireChoice(param, size, FASTENER_SIZE_OPTIONS);
  const label = FASTENER_SIZE_OPTIONS.find((o) => o.value === id)!.label;
  if (id in METRIC_COARSE_THREADS) {
    const row = METRIC_COARSE_THREADS[id as ThreadSize];
    const { pitchDiameter, stressDiameterD3 } = threadDiameters(row);
    const limits = METRIC_6G_6H_LIMITS[id as ThreadSize];
    return {
      size: id,
      system: "metric",
      label,
      nominalDiameter: row.nominalDiameter,
      pitch: row.pitch,
      stressArea: row.stressArea,
      stressAreaSource: row.stressAreaSource,
      pitchDiameter,
      rootDiameter: stressDiameterD3, // iso-898-1 d₃; shigley-mechanical-design Table 8-1
      rootArea: (Math.PI / 4) * stressDiameterD3 * stressDiameterD3,
      toleranceClasses: "6g/6H",
      ...limits,
      limitsSource: "asme-b1-13m",
    };
  }
  const row = INCH_THREADS[id as InchThreadSize];
  const { pitchDiameter, rootDiameter } = unifiedThreadDiameters(row);
  const { externalMajorMin, internalPitchMax } = unifiedClass2Limits(row);
  return {
    size: id,
    system: "inch",
    label,
    nominalDiameter: row.nominalDiameter,
    pitch: row.pitch,
    stressArea: row.stressArea,
    stressAreaSource: row.stressAreaSource,
    pitchDiameter,
    rootDiameter,
    rootArea: (Math.PI / 4) * rootDiameter * rootDiameter,
    toleranceClasses: "2A/2B",
    externalMajorMin,
    internalPitchMax,
    limitsSource: "asme-b1-1",
  };
}

/** A grade of either system: its specified minimum strengths, its shear strengths, and their basis. */
export interface FastenerGrade {
  id: FastenerGradeId;
  system: "metric" | "inch";
  label: string;
  /** S_p, proof stress [Pa]. */
  proofStress: number;
  /** R_p0.2,min (R_eL,min for 4.6) [Pa]. */
  yieldStrength: number;
  /** R_m,min [Pa]. */
  tensileStrength: number;
  /** τ_y = yieldStrength/√3 [Pa] (`boltShearStrengths`). */
  shearYield: number;
  /** τ_u = 0.6 tensileStrength [Pa] (`boltShearStrengths`). */
  shearUltimate: number;
  /** Basis of the tensile values; the shear values are derived from them by the stated rule. */
  basis: StrengthBasis;
  /** The standard the tensile values come from. */
  standard: SourceKey;
  /** Sizes the standard covers with these values, [smallest, largest] [m]; metric classes: all sizes here. */
  scope: readonly [number, number];
}

/**
 * The strengths of any grade id, metric class or inch grade, with their basis (iso-898-1, sae-j429,
 * astm-a574) and the shear strengths by one rule (shigley-distortion-energy, ifi-shear-rule).
 *
 * Formula: $\tau_y = R_{p0.2,min}/\sqrt3,\qquad \tau_u = 0.6\,R_{m,min}$
 *
 * @param grade a value of `FASTENER_GRADE_OPTIONS`
 * @param param the name a bad grade is reported under (default "grade")
 * @returns proof, yield, tensile and shear strengths [Pa], basis "specified minimum" and the standard
 *
 * @example
 * fastenerGrade("a574").proofStress // → 965.3e6 (140 ksi)
 *
 * Sources: iso-898-1, sae-j429, astm-a574, shigley-distortion-energy, ifi-shear-rule.
 */
export function fastenerGrade(grade: string, param = "grade"): FastenerGrade {
  const id = requireChoice(param, grade, FASTENER_GRADE_OPTIONS);
  const label = FASTENER_GRADE_OPTIONS.find((o) => o.value === id)!.label;
  const metric = id in PROPERTY_CLASSES;
  const row = metric ? PROPERTY_CLASSES[id as PropertyClassId] : INCH_GRADES[id as InchGradeId];
  const shear = boltShearStrengths({ yieldStrength: row.yieldStrengthMin, tensileStrength: row.tensileStrengthMin });
  return {
    id,
    system: metric ? "metric" : "inch",
    label,
    proofStress: row.proofStress,
    yieldStrength: row.yieldStrengthMin,
    tensileStrength: row.tensileStrengthMin,
    ...shear,
    basis: "specified minimum",
    standard: metric ? "iso-898-1" : (row as InchGrade).standard,
    scope: metric ? [METRIC_COARSE_THREADS.M2.nominalDiameter, METRIC_COARSE_THREADS.M12.nominalDiameter] : (row as InchGrade).scope,
  };
}

/** A grade checked against a size. */
export interface GradeForSize {
  grade: FastenerGrade;
  /** False when the size lies outside the sizes the grade's standard covers (values applied by extension). */
  withinScope: boolean;
  /** What was assumed, in a sentence; empty when within scope. */
  scopeNote: string;
}

/**
 * A grade for a given size: refuses a grade of the other system (a metric class on an inch size or
 * the reverse) and says when the size lies outside the sizes the grade's standard covers (sae-j429
 * starts at 1/4 in; astm-a574 covers 0.060 in and up).
 *
 * @param grade a value of `FASTENER_GRADE_OPTIONS`, of the size's system
 * @param size a value of `FASTENER_SIZE_OPTIONS`
 * @returns the grade, whether the size is within the standard's scope, and the assumption if not
 *
 * @example
 * gradeForSize({ grade: "sae-8", size: "#10-32" }).withinScope // → false (J429 starts at 1/4 in)
 *
 * Sources: sae-j429, astm-a574, iso-898-1.
 */
export function gradeForSize(input: { grade: string; size: string }): GradeForSize {
  const { grade, size } = requireInputObject(input);
  const thread = fastenerThread(size);
  const row = fastenerGrade(grade);
  if (row.system !== thread.system) {
    const allowed = (thread.system === "metric" ? PROPERTY_CLASS_OPTIONS : INCH_GRADE_OPTIONS).map((o) => o.value).join(", ");
    throw new CalcInputError({ param: "grade", value: grade, expected: `one of ${allowed} for the ${thread.system} size ${thread.size}`, unit: "" });
  }
  const d = thread.nominalDiameter;
  // No tolerance: the scope's ends and the sizes are the same table values (inches × INCH, or the metric rows), so compare exactly.
  // Stryker disable next-line ConditionalExpression: equivalent, no size in the tables (3/8 in and M12 at most) is above a grade's upper scope end; kept for the standard's range
  const withinScope = d >= row.scope[0] && d <= row.scope[1];
  const scopeNote = withinScope
    ? ""
    : `${row.label}: its standard covers ${Number((row.scope[0] / INCH).toPrecision(3))} to ${Number((row.scope[1] / INCH).toPrecision(3))} in; for ${thread.size} its values are applied by extension, an assumption.`;
  return { grade: row, withinScope, scopeNote };
}

/** Source keys this module relies on. */
export const INCH_FASTENERS_SOURCES: readonly SourceKey[] = [
  "asme-b1-1",
  "fed-std-h28-2",
  "shigley-mechanical-design",
  "sae-j429",
  "astm-a574",
  "asme-b1-13m",
  "iso-965-1",
  "iso-898-1",
  "shigley-distortion-energy",
  "ifi-shear-rule",
  "intl-yard-pound-1959",
  "nist-sp811",
];
