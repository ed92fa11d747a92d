/**
 * Centrifugal loads on bolts: the pull a spinning part puts on the bolts that hold it, the stress
 * on each bolt against its ISO 898-1 property class, the safety factors, the speeds at which the
 * bolts yield and break, and a verdict. Re-exported by calc/loads/index.ts. SI in and out.
 */
import { CalcInputError, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireDeclared, requireFiniteFields, requireInputObject, requireFiniteResult } from "../core/spec-check.ts";
import { defineInputs } from "../core/inputs.ts";
import { SPINNING_PART_INPUTS } from "./spinning-part.ts";
import type { PartLoad } from "../rotation/rotation.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";
import {
  metricThread,
  PROPERTY_CLASS_OPTIONS,
  propertyClass as propertyClassRow,
  THREAD_SIZE_OPTIONS,
  type PropertyClassId,
  type ThreadSize,
} from "./fasteners.ts";
import {
  safetyThresholdInputs,
  requireChoice,
  requireMarginalAtLeastFail,
  requirePointCount,
  safetyFactor,
  safetyVerdict,
  speedAtStress,
  type ChoiceOption,
  type LoadVerdict,
} from "./common.ts";

// ---------------------------------------------------------------------------------------------
// Bolts holding a spinning part.

/** How the radial pull meets the bolts. */
export const LOADING_MODE_OPTIONS = [
  { value: "shear", label: "Shear: the pull runs across the bolts" },
  { value: "tension", label: "Tension: the pull runs along the bolts" },
] as const satisfies readonly ChoiceOption[];

export type LoadingMode = (typeof LOADING_MODE_OPTIONS)[number]["value"];

/** Where the shear plane cuts the bolt (only read in shear). */
export const SHEAR_PLANE_OPTIONS = [
  { value: "thread", label: "Through the thread (stress area Aₛ)" },
  { value: "shank", label: "Through the plain shank (nominal diameter)" },
] as const satisfies readonly ChoiceOption[];

export type ShearPlane = (typeof SHEAR_PLANE_OPTIONS)[number]["value"];

/**
 * Shear-to-tensile ratio used by default for the ultimate shear strength of a bolt: τ_u = 0.5 R_m
 * (shear-ultimate-ratio). ISO 898-1 specifies no shear strength; 0.5 is the lower Eurocode 3
 * thread-shear factor α_v (0.5 for 10.9, 0.6 for 4.6 and 8.8, en-1993-1-8 Table 3.4, class split
 * from memory) and the low end of the 0.5–0.75 spread of handbook rules, so it is conservative for
 * every class here. Status: a rule of practice, not a material constant; the check takes it as an input.
 */
export const DEFAULT_SHEAR_RATIO = 0.5;

/** Choice defaults of the fastener check (the numeric defaults are in `fastenerCheckInputs`). */
export const FASTENER_CHOICE_DEFAULTS = { size: "M4", propertyClass: "8.8", mode: "shear", shearPlane: "thread" } as const satisfies {
  size: ThreadSize;
  propertyClass: PropertyClassId;
  mode: LoadingMode;
  shearPlane: ShearPlane;
};

/** Numeric inputs of the fastener check, in SI. Choices: `THREAD_SIZE_OPTIONS`, `PROPERTY_CLASS_OPTIONS`, `LOADING_MODE_OPTIONS`, `SHEAR_PLANE_OPTIONS`. */
export const fastenerCheckInputs = defineInputs({
  partMass: {
    label: "Part mass",
    kind: "mass",
    min: 1e-4,
    max: 20,
    default: 0.04,
    urlKey: "m",
    help: "Everything the bolts hold up against the spin: the part, its washers, and the bolts' own heads if you want them counted.",
  },
  radius: SPINNING_PART_INPUTS.radius,
  angularSpeed: SPINNING_PART_INPUTS.angularSpeed,
  count: {
    label: "Number of bolts",
    kind: "count",
    min: 1,
    max: 64,
    default: 1,
    integer: true,
    urlKey: "n",
    help: "Bolts sharing the pull, assumed to share it equally.",
  },
  shearRatio: {
    label: "Shear-to-tensile ratio",
    kind: "fraction",
    min: 0.3,
    max: 1,
    default: DEFAULT_SHEAR_RATIO,
    unit: { metric: "frac", us: "frac" },
    urlKey: "sr",
    help: "Ultimate shear strength as a fraction of Rₘ. 0.5 is conservative; 0.6 is the common rule and Eurocode 3's value for 4.6 and 8.8.",
  },
  ...safetyThresholdInputs("bolt"),
});

export type FastenerCheckInput = { [K in keyof typeof fastenerCheckInputs]: number } & {
  /** A value of `THREAD_SIZE_OPTIONS`. */
  size: string;
  /** A value of `PROPERTY_CLASS_OPTIONS`. */
  propertyClass: string;
  /** A value of `LOADING_MODE_OPTIONS`. */
  mode: string;
  /** A value of `SHEAR_PLANE_OPTIONS`; read only in shear; "thread" when omitted. */
  shearPlane?: string;
};

export interface FastenerCheck {
  size: ThreadSize;
  propertyClass: PropertyClassId;
  mode: LoadingMode;
  shearPlane: ShearPlane;
  /** g at the part's radius and its total radial pull. */
  part: PartLoad;
  /** The pull on each bolt, total / count [N]. */
  forcePerBolt: number;
  /** Area the stress is taken on: A_s, or the shank area in shear through the shank [m²]. */
  area: number;
  /** Average tensile stress σ or shear stress τ on that area [Pa]. */
  stress: number;
  /** Yield the stress is compared with: R_eL/R_p0.2 (min) in tension, that ÷ √3 in shear [Pa]. */
  yieldStrength: number;
  /** Ultimate the stress is compared with: R_m,min in tension, shearRatio × R_m,min in shear [Pa]. */
  ultimateStrength: number;
  /** The shear-to-tensile ratio used (reported in tension too, though unused there) [-]. */
  shearRatio: number;
  /** yieldStrength / stress [-]. */
  safetyFactorYield: number;
  /** ultimateStrength / stress [-]. */
  safetyFactorUltimate: number;
  /** The smaller of the two [-]. */
  safetyFactor: number;
  /** Which limit gives `safetyFactor`. */
  governs: "yield" | "ultimate";
  /** Speed at which the bolts reach their yield strength [rad/s]. */
  speedAtYield: number;
  /** Speed at which the bolts reach their ultimate strength [rad/s]. */
  speedAtUltimate: number;
  /** Pull all bolts together carry at their ultimate strength [N]. */
  ultimateLoad: number;
  verdict: LoadVerdict;
}

/**
 * Average stress in a group of bolts sharing a load equally (iso-898-1: stresses of a threaded
 * bolt are taken on its stress area A_s).
 *
 * Formula: $\sigma = \dfrac{F}{n\,A}$
 *
 * @param force F, the total load [N], 0 or more
 * @param count n, bolts sharing it [-], a whole number, 1 or more
 * @param area A, each bolt's load-bearing area [m²], greater than 0
 * @returns σ (or τ in shear) [Pa]
 *
 * @example
 * boltStress({ force: 176.9, count: 1, area: 8.78e-6 }) // → 20.1e6 [Pa] (one M4)
 * Sources: iso-898-1.
 */
export function boltStress(input: { force: number; count: number; area: number }): number {
  const { force, count, area } = requireInputObject(input);
  requireNonNegative("force", force, "N");
  requireInRange("count", count, "", { min: 1, max: Number.MAX_SAFE_INTEGER });
  if (!Number.isInteger(count)) throw new CalcInputError({ param: "count", value: count, expected: "a whole number", unit: "" });
  requirePositive("area", area, "m²");
  // Not the count: a whole number below 2^53, it is never the input furthest from 1 when F/(nA) overflows.
  return requireFiniteResult(force / (count * area), "bolt stress", { force: [force, "N"], area: [area, "m²"] });
}

/** The strengths a bolt's stress is compared with, for one property class and loading mode. */
export interface FastenerStrengths {
  /** R_eL,min or R_p0.2,min in tension; that ÷ √3 in shear [Pa]. */
  yieldStrength: number;
  /** R_m,min in tension; shearRatio × R_m,min in shear [Pa]. */
  ultimateStrength: number;
}

/**
 * The yield and ultimate strength a bolt's average stress is compared with: the ISO 898-1
 * minimums in tension, and in shear the distortion-energy shear yield and a fixed fraction of
 * R_m,min (iso-898-1, shigley-distortion-energy, shear-ultimate-ratio).
 *
 * Formula: tension $S_y = R_{p0.2,min},\ S_u = R_{m,min}$; shear $\tau_y = R_{p0.2,min}/\sqrt3,\ \tau_u = k\,R_{m,min}$
 *
 * @param propertyClass a value of `PROPERTY_CLASS_OPTIONS`
 * @param mode a value of `LOADING_MODE_OPTIONS`
 * @param shearRatio k [-], 0.3 to 1 (read in shear only; default `DEFAULT_SHEAR_RATIO`)
 * @returns yieldStrength and ultimateStrength [Pa]
 *
 * @example
 * fastenerStrengths({ propertyClass: "8.8", mode: "shear", shearRatio: 0.5 }) // → { yieldStrength: 369.5e6, ultimateStrength: 400e6 } (τ_y = 640 MPa/√3)
 * Sources: iso-898-1, shigley-distortion-energy, shear-ultimate-ratio.
 */
export function fastenerStrengths(input: { propertyClass: string; mode: string; shearRatio?: number }): FastenerStrengths {
  const { propertyClass: classId, mode: modeId, shearRatio = DEFAULT_SHEAR_RATIO } = requireInputObject(input);
  const strengths = propertyClassRow(classId);
  const mode = requireChoice("mode", modeId, LOADING_MODE_OPTIONS);
  requireDeclared(fastenerCheckInputs.shearRatio, "shearRatio", shearRatio);
  return mode === "tension"
    ? { yieldStrength: strengths.yieldStrengthMin, ultimateStrength: strengths.tensileStrengthMin } // iso-898-1 Table 3
    : {
        yieldStrength: strengths.yieldStrengthMin / Math.sqrt(3), // shigley-distortion-energy
        ultimateStrength: shearRatio * strengths.tensileStrengthMin, // shear-ultimate-ratio
      };
}

/**
 * The fastener check: the pull of a spinning part shared by its bolts, the stress on each bolt's
 * tensile stress area, and the safety factors against the property class's minimum strengths
 * (newton-second-law, iso-898-1, shigley-distortion-energy, shear-ultimate-ratio).
 *
 * Formula: $F = m\,\omega^2 r,\quad \sigma = \dfrac{F}{n\,A_s},\quad n_y = \dfrac{R_{p0.2,min}}{\sigma},\ n_u = \dfrac{R_{m,min}}{\sigma}$ in tension;
 * $\tau = \dfrac{F}{n\,A_s},\quad n_y = \dfrac{R_{p0.2,min}/\sqrt3}{\tau},\ n_u = \dfrac{k\,R_{m,min}}{\tau}$ in shear
 *
 * @param input the numeric fields of `fastenerCheckInputs` (SI) plus `size`, `propertyClass`, `mode` and optionally `shearPlane`
 * @returns the part's load, the stress per bolt, both safety factors, the limit speeds and a verdict
 *
 * Assumptions:
 * - The bolts share the pull equally; no prying, no bending (a stack of washers standing proud of
 *   the joint bends the bolt and raises its stress), no clamp friction (friction from the preload
 *   carries part of a shear load, so ignoring it is conservative).
 * - Shear is taken through the thread on A_s by default: the smaller area, so conservative when
 *   the shank may or may not reach the joint face.
 * - Strengths are the ISO 898-1 minimums (R_eL/R_p0.2 min, R_m,min), the values every bolt of
 *   the class is guaranteed to reach; the nominal values are in `PROPERTY_CLASSES` for comparison.
 * - Shear yield by the distortion-energy (von Mises) criterion, τ_y = R_p0.2/√3; ultimate shear as
 *   `shearRatio` × R_m (ISO 898-1 specifies no shear strength; see `DEFAULT_SHEAR_RATIO`).
 * - Steady spin only: impacts, fatigue and the threads of a nut or tapped hole are not checked.
 *
 * Example (invented): 40 g of washers on one M4 class 8.8 bolt, shear, at 70 mm and 2400 rpm:
 * 451 g, 176.9 N, τ = 20.1 MPa; n_y = 18.3 (yield governs), n_u = 19.9 → "holds".
 *
 * Sources: newton-second-law, iso-898-1, shigley-distortion-energy, shear-ultimate-ratio,
 * en-1993-1-8, safety-factor-practice.
 */
export function fastenerCheck(input: FastenerCheckInput): FastenerCheck {
  requireInputObject(input);
  const size = requireChoice("size", input.size, THREAD_SIZE_OPTIONS);
  const classId = requireChoice("propertyClass", input.propertyClass, PROPERTY_CLASS_OPTIONS);
  const mode = requireChoice("mode", input.mode, LOADING_MODE_OPTIONS);
  const shearPlane = requireChoice("shearPlane", input.shearPlane ?? FASTENER_CHOICE_DEFAULTS.shearPlane, SHEAR_PLANE_OPTIONS);
  const partMass = requireDeclared(fastenerCheckInputs.partMass, "partMass", input.partMass);
  const radius = requireDeclared(fastenerCheckInputs.radius, "radius", input.radius);
  const angularSpeed = requireDeclared(fastenerCheckInputs.angularSpeed, "angularSpeed", input.angularSpeed);
  const count = requireDeclared(fastenerCheckInputs.count, "count", input.count);
  const shearRatio = requireDeclared(fastenerCheckInputs.shearRatio, "shearRatio", input.shearRatio);
  const failBelow = requireDeclared(fastenerCheckInputs.failBelow, "failBelow", input.failBelow);
  const marginalBelow = requireDeclared(fastenerCheckInputs.marginalBelow, "marginalBelow", input.marginalBelow);
  // Stryker disable next-line CallExpression: equivalent, safetyVerdict refuses the same thresholds in the same words before a result is returned (kept here to refuse before any work)
  requireMarginalAtLeastFail(failBelow, marginalBelow);

  const thread = metricThread(size);
  const { yieldStrength, ultimateStrength } = fastenerStrengths({ propertyClass: classId, mode, shearRatio });
  // F = mω²r, as rotation.ts `partLoad` computes it (newton-second-law; a test checks the two agree).
  // Written out here so that the bolt calculator's page does not load the rotation module.
  const acceleration = angularSpeed * angularSpeed * radius;
  const part: PartLoad = { acceleration, gLoad: acceleration / STANDARD_GRAVITY, force: partMass * acceleration };
  const area = mode === "shear" && shearPlane === "shank" ? (Math.PI / 4) * thread.nominalDiameter * thread.nominalDiameter : thread.stressArea; // iso-898-1 Table 4
  const stress = boltStress({ force: part.force, count, area });
  const safetyFactorYield = safetyFactor({ strength: yieldStrength, stress });
  const safetyFactorUltimate = safetyFactor({ strength: ultimateStrength, stress });
  const governs = safetyFactorYield <= safetyFactorUltimate ? "yield" : "ultimate";
  const governing = Math.min(safetyFactorYield, safetyFactorUltimate);
  // No finiteness guard: every figure comes from a guarded function or, within the declared ranges, stays below about 10¹⁶.
  return {
    size,
    propertyClass: classId,
    mode,
    shearPlane,
    part,
    forcePerBolt: part.force / count,
    area,
    stress,
    yieldStrength,
    ultimateStrength,
    shearRatio,
    safetyFactorYield,
    safetyFactorUltimate,
    safetyFactor: governing,
    governs,
    speedAtYield: speedAtStress({ angularSpeed, stress, strength: yieldStrength }),
    speedAtUltimate: speedAtStress({ angularSpeed, stress, strength: ultimateStrength }),
    ultimateLoad: count * area * ultimateStrength,
    verdict: safetyVerdict({ safetyFactor: governing, failBelow, marginalBelow }),
  };
}

/** One point of a stress-against-speed curve. */
export interface StressAtSpeed {
  /** ω [rad/s]. */
  angularSpeed: number;
  /** Stress at that speed [Pa]. */
  stress: number;
}

/**
 * Bolt stress from standstill to a top speed, for a plot with the yield and ultimate lines of
 * `fastenerCheck` drawn across it (newton-second-law: σ ∝ ω²).
 *
 * Formula: $\sigma(\omega) = \dfrac{m\,\omega^2 r}{n\,A}$
 *
 * @param input as for `fastenerCheck`
 * @param maxSpeed the right end of the curve [rad/s], greater than 0
 * @param points number of points, a whole number from 2 to 1000 (default 50)
 * @returns `points` pairs from ω = 0 to maxSpeed, stress in [Pa]
 *
 * Sources: newton-second-law, iso-898-1.
 */
export function fastenerStressCurve(input: FastenerCheckInput, options: { maxSpeed: number; points?: number }): StressAtSpeed[] {
  const { maxSpeed, points = 50 } = requireInputObject(options);
  requirePositive("maxSpeed", maxSpeed, "rad/s");
  requirePointCount(points);
  const atInput = fastenerCheck(input);
  const perOmegaSquared = atInput.stress / (input.angularSpeed * input.angularSpeed);
  const curve = Array.from({ length: points }, (_, i) => {
    // The last point is the top speed itself: (ω_max·i)/(n − 1) at i = n − 1 can miss it by an ulp.
    const last = i === points - 1;
    const angularSpeed = last ? maxSpeed : (maxSpeed * i) / (points - 1);
    return { angularSpeed, stress: perOmegaSquared * angularSpeed * angularSpeed };
  });
  return requireFiniteFields(curve, "stress", { maxSpeed: [maxSpeed, "rad/s"] });
}
