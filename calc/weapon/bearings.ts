/**
 * Rolling bearings of a weapon: ISO 281 basic rating life from the equivalent dynamic load, the
 * ISO 76 static safety factor under a shock (a hit), and the guideline values that static safety
 * factor is judged against. SI in and out, except where ISO 281 defines its own units: the basic
 * rating life L10 in millions of revolutions and L10h in hours (both said in each name).
 */
import { CalcInputError, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";
import { type ChoiceOption, requireChoice as requireOption } from "../core/choices.ts";

import { BEARING_TYPE_OPTIONS, type BearingType } from "./shaft-inputs.ts";

/** The two rolling-bearing families ISO 281 gives a life exponent for (declared with the shaft check's inputs). */
export { BEARING_TYPE_OPTIONS, type BearingType };

/** Performance requirements of the guideline table for s0 (smooth, quiet running matters more to the right). */
export const BEARING_REQUIREMENT_OPTIONS = [
  { value: "unimportant", label: "Performance requirements unimportant" },
  { value: "normal", label: "Normal performance requirements" },
  { value: "high", label: "High performance requirements" },
] as const satisfies readonly ChoiceOption[];

export type BearingRequirements = (typeof BEARING_REQUIREMENT_OPTIONS)[number]["value"];

/** Load cases of the guideline table for s0. */
export const BEARING_LOADING_OPTIONS = [
  { value: "normal", label: "Normal loads" },
  { value: "shock", label: "Pronounced shock loads" },
] as const satisfies readonly ChoiceOption[];

export type BearingLoading = (typeof BEARING_LOADING_OPTIONS)[number]["value"];

/** ISO 281 life exponent p: 3 for ball bearings, 10/3 for roller bearings (iso-281). */
export const LIFE_EXPONENT = { ball: 3, roller: 10 / 3 } as const satisfies Record<BearingType, number>;

/**
 * Guideline minimum static safety factors s0 = C0/P0 (bearing-static-safety-guide): rotating
 * bearings by loading and performance requirements, and non-rotating bearings by loading.
 * Under pronounced shock, where the size of the shock is not known, use at least these values.
 */
export const STATIC_SAFETY_GUIDE = {
  rotating: {
    normal: { unimportant: { ball: 0.5, roller: 1 }, normal: { ball: 1, roller: 1.5 }, high: { ball: 2, roller: 3.5 } },
    shock: { unimportant: { ball: 1.5, roller: 2.5 }, normal: { ball: 1.5, roller: 3 }, high: { ball: 2, roller: 4 } },
  },
  stationary: { normal: { ball: 0.5, roller: 1 }, shock: { ball: 1, roller: 2 } },
} as const;

/** Default static equivalent-load factors of a single-row radial ball bearing, P0 = 0.6·F_r + 0.5·F_a (iso-76). */
export const BALL_STATIC_FACTORS = { radialFactor: 0.6, axialFactor: 0.5 } as const;

/**
 * ISO 281 life exponent of a bearing type (iso-281, shigley-rolling-bearings).
 *
 * Formula: $p = 3$ (ball), $p = 10/3$ (roller)
 *
 * @param bearingType a value of `BEARING_TYPE_OPTIONS`
 * @returns p [-]
 * @example
 * lifeExponent({ bearingType: "roller" }) // → 3.333
 * Sources: iso-281, shigley-rolling-bearings.
 */
export function lifeExponent(input: { bearingType: string }): number {
  const { bearingType } = requireInputObject(input);
  return LIFE_EXPONENT[requireOption("bearingType", bearingType, BEARING_TYPE_OPTIONS)];
}

/**
 * Equivalent dynamic load of a radial bearing: the constant radial load that would give the same
 * life as the actual radial and axial loads (iso-281).
 *
 * Formula: $P = X\,F_r + Y\,F_a$
 *
 * @param radialLoad F_r [N], 0 or more
 * @param axialLoad F_a [N], 0 or more (default 0)
 * @param radialFactor X [-], greater than 0 (default 1)
 * @param axialFactor Y [-], 0 or more (default 0)
 * @returns P [N]
 *
 * Assumptions: X and Y come from the bearing's table for its F_a/C0 ratio; the defaults X = 1,
 * Y = 0 are ISO 281's values for a purely radial load (and for a deep-groove ball bearing while
 * F_a/F_r ≤ e).
 * @example
 * equivalentDynamicLoad({ radialLoad: 1000, axialLoad: 400, radialFactor: 0.56, axialFactor: 1.71 }) // → 1244
 * Sources: iso-281.
 */
export function equivalentDynamicLoad(input: { radialLoad: number; axialLoad?: number; radialFactor?: number; axialFactor?: number }): number {
  const fields = requireInputObject(input);
  const { radialLoad } = fields;
  const axialLoad = fields.axialLoad ?? 0;
  const radialFactor = fields.radialFactor ?? 1;
  const axialFactor = fields.axialFactor ?? 0;
  requireNonNegative("radialLoad", radialLoad, "N");
  requireNonNegative("axialLoad", axialLoad, "N");
  requirePositive("radialFactor", radialFactor, "");
  requireNonNegative("axialFactor", axialFactor, "");
  return requireFiniteResult(radialFactor * radialLoad + axialFactor * axialLoad, "equivalent load", {
    radialLoad: [radialLoad, "N"],
    axialLoad: [axialLoad, "N"],
    radialFactor: [radialFactor, ""],
    axialFactor: [axialFactor, ""],
  }); // iso-281: P = X·F_r + Y·F_a
}

/**
 * Static equivalent load of a radial bearing, for the static safety factor under the largest
 * (shock) load (iso-76).
 *
 * Formula: $P_0 = \max(F_r,\ X_0 F_r + Y_0 F_a)$
 *
 * @param radialLoad F_r, the largest radial load, e.g. during a hit [N], 0 or more
 * @param axialLoad F_a [N], 0 or more (default 0)
 * @param radialFactor X0 [-], greater than 0 (default 0.6, single-row radial ball bearing)
 * @param axialFactor Y0 [-], 0 or more (default 0.5, single-row radial ball bearing)
 * @returns P0 [N]
 *
 * Assumptions: for a cylindrical roller bearing (no axial load) P0 = F_r: pass radialFactor 1,
 * axialFactor 0.
 * @example
 * equivalentStaticLoad({ radialLoad: 1000, axialLoad: 1000 }) // → 1100
 * Sources: iso-76.
 */
export function equivalentStaticLoad(input: { radialLoad: number; axialLoad?: number; radialFactor?: number; axialFactor?: number }): number {
  const fields = requireInputObject(input);
  const { radialLoad } = fields;
  const axialLoad = fields.axialLoad ?? 0;
  const radialFactor = fields.radialFactor ?? BALL_STATIC_FACTORS.radialFactor;
  const axialFactor = fields.axialFactor ?? BALL_STATIC_FACTORS.axialFactor;
  requireNonNegative("radialLoad", radialLoad, "N");
  requireNonNegative("axialLoad", axialLoad, "N");
  requirePositive("radialFactor", radialFactor, "");
  requireNonNegative("axialFactor", axialFactor, "");
  const combined = radialFactor * radialLoad + axialFactor * axialLoad; // iso-76: P0r = X0·F_r + Y0·F_a
  return requireFiniteResult(Math.max(radialLoad, combined), "static equivalent load", {
    radialLoad: [radialLoad, "N"],
    axialLoad: [axialLoad, "N"],
    radialFactor: [radialFactor, ""],
    axialFactor: [axialFactor, ""],
  }); // iso-76: P0r = F_r when that is larger
}

/**
 * ISO 281 basic rating life: the number of revolutions that 90 % of a large group of identical
 * bearings reach before the first sign of fatigue (iso-281, shigley-rolling-bearings).
 *
 * Formula: $L_{10} = \left(\dfrac{C}{P}\right)^p$ [10⁶ revolutions], p = 3 (ball), 10/3 (roller)
 *
 * @param dynamicLoadRating C, the bearing's basic dynamic load rating [N], greater than 0
 * @param equivalentLoad P [N], greater than 0
 * @param bearingType a value of `BEARING_TYPE_OPTIONS`
 * @returns L10 [millions of revolutions]
 *
 * Assumptions: 90 % reliability, conventional materials and lubrication (the ISO 281 life
 * modification factor a_ISO = 1), constant load and speed; not meaningful when P is above about
 * C/2 (heavy loads) or below the bearing's minimum load.
 * @example
 * basicRatingLife({ dynamicLoadRating: 16, equivalentLoad: 2, bearingType: "ball" }) // → 512
 * Sources: iso-281, shigley-rolling-bearings.
 */
export function basicRatingLife(input: { dynamicLoadRating: number; equivalentLoad: number; bearingType: string }): number {
  const { dynamicLoadRating, equivalentLoad, bearingType } = requireInputObject(input);
  const p = lifeExponent({ bearingType: bearingType as string });
  requirePositive("dynamicLoadRating", dynamicLoadRating, "N");
  requirePositive("equivalentLoad", equivalentLoad, "N");
  return requireFiniteResult((dynamicLoadRating / equivalentLoad) ** p, "rating life", {
    dynamicLoadRating: [dynamicLoadRating, "N"],
    equivalentLoad: [equivalentLoad, "N"],
  }); // iso-281: L10 = (C/P)^p
}

/**
 * ISO 281 basic rating life in operating hours at a constant speed (iso-281).
 *
 * Formula: $L_{10h} = \dfrac{10^6\,L_{10}}{60\,n}$, $n = \dfrac{60\,\Omega}{2\pi}$ [r/min]
 *
 * @param ratingLife L10 [millions of revolutions], 0 or more
 * @param angularSpeed Ω, the speed of the turning ring relative to the other [rad/s], greater than 0
 * @returns L10h [h]
 *
 * @example
 * ratingLifeHours({ ratingLife: 91.125, angularSpeed: 942.48 }) // → 168.75 (9000 rpm)
 * Sources: iso-281.
 */
export function ratingLifeHours(input: { ratingLife: number; angularSpeed: number }): number {
  const { ratingLife, angularSpeed } = requireInputObject(input);
  requireNonNegative("ratingLife", ratingLife, "");
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  const revolutionsPerHour = (angularSpeed / (2 * Math.PI)) * 3600;
  return requireFiniteResult((ratingLife * 1e6) / revolutionsPerHour, "rating life in hours", {
    ratingLife: [ratingLife, ""],
    angularSpeed: [angularSpeed, "rad/s"],
  }); // iso-281: L10h = 10⁶·L10/(60·n)
}

/**
 * The basic dynamic load rating a bearing needs for a life at a load: the inverse of
 * `basicRatingLife` (shigley-rolling-bearings, iso-281).
 *
 * Formula: $C = P\,L_{10}^{1/p}$
 *
 * @param equivalentLoad P [N], greater than 0
 * @param ratingLife L10, the life wanted [millions of revolutions], greater than 0
 * @param bearingType a value of `BEARING_TYPE_OPTIONS`
 * @returns C [N]
 *
 * @example
 * requiredDynamicLoadRating({ equivalentLoad: 10279, ratingLife: 1440, bearingType: "roller" }) // → 91 088
 * Sources: shigley-rolling-bearings, iso-281.
 */
export function requiredDynamicLoadRating(input: { equivalentLoad: number; ratingLife: number; bearingType: string }): number {
  const { equivalentLoad, ratingLife, bearingType } = requireInputObject(input);
  const p = lifeExponent({ bearingType: bearingType as string });
  requirePositive("equivalentLoad", equivalentLoad, "N");
  requirePositive("ratingLife", ratingLife, "");
  return requireFiniteResult(equivalentLoad * ratingLife ** (1 / p), "load rating", {
    equivalentLoad: [equivalentLoad, "N"],
    ratingLife: [ratingLife, ""],
  }); // shigley-rolling-bearings: C10 = F_D·x_D^(1/a)
}

/**
 * Static safety factor of a bearing under its largest load (iso-76).
 *
 * Formula: $s_0 = \dfrac{C_0}{P_0}$
 *
 * @param staticLoadRating C0, the bearing's basic static load rating [N], greater than 0
 * @param staticEquivalentLoad P0 [N], greater than 0
 * @returns s0 [-]; below 1 the raceways dent permanently (more than 1/10 000 of the rolling-element diameter)
 *
 * @example
 * staticSafetyFactor({ staticLoadRating: 2360, staticEquivalentLoad: 1800 }) // → 1.311
 * Sources: iso-76.
 */
export function staticSafetyFactor(input: { staticLoadRating: number; staticEquivalentLoad: number }): number {
  const { staticLoadRating, staticEquivalentLoad } = requireInputObject(input);
  requirePositive("staticLoadRating", staticLoadRating, "N");
  requirePositive("staticEquivalentLoad", staticEquivalentLoad, "N");
  return requireFiniteResult(staticLoadRating / staticEquivalentLoad, "static safety factor", {
    staticLoadRating: [staticLoadRating, "N"],
    staticEquivalentLoad: [staticEquivalentLoad, "N"],
  }); // iso-76: s0 = C0/P0
}

/**
 * The guideline minimum static safety factor for a bearing (bearing-static-safety-guide).
 *
 * Formula: table lookup, e.g. rotating, pronounced shock, normal requirements: $s_0 \ge 1.5$ (ball), $\ge 3$ (roller)
 *
 * @param bearingType a value of `BEARING_TYPE_OPTIONS`
 * @param loading a value of `BEARING_LOADING_OPTIONS` (default "shock")
 * @param requirements a value of `BEARING_REQUIREMENT_OPTIONS` (default "normal"; read for rotating bearings)
 * @param rotating whether the bearing turns (default true)
 * @returns the guideline minimum s0 [-]
 *
 * @example
 * staticSafetyGuide({ bearingType: "ball" }) // → 1.5
 * Sources: bearing-static-safety-guide.
 */
export function staticSafetyGuide(input: { bearingType: string; loading?: string; requirements?: string; rotating?: boolean }): number {
  const fields = requireInputObject(input);
  const bearingType = requireOption("bearingType", fields.bearingType, BEARING_TYPE_OPTIONS);
  const loading = requireOption("loading", fields.loading ?? "shock", BEARING_LOADING_OPTIONS);
  const rotating = fields.rotating ?? true;
  if (typeof rotating !== "boolean") throw new CalcInputError({ param: "rotating", value: rotating, expected: "true or false", unit: "" });
  if (!rotating) return STATIC_SAFETY_GUIDE.stationary[loading][bearingType];
  const requirements = requireOption("requirements", fields.requirements ?? "normal", BEARING_REQUIREMENT_OPTIONS);
  return STATIC_SAFETY_GUIDE.rotating[loading][requirements][bearingType];
}

/** One bearing's life and static check. */
export interface BearingCheck {
  /** P = X·F_r + Y·F_a in running [N]. */
  equivalentLoad: number;
  /** L10 [millions of revolutions]; null when the running load is 0 (or so small the life passes the largest double). */
  ratingLife: number | null;
  /** L10h [h]; null as `ratingLife`. */
  ratingLifeHours: number | null;
  /** P0 under the shock load [N]. */
  staticEquivalentLoad: number;
  /** s0 = C0/P0 [-]; null when the shock load is 0 (or so small the factor passes the largest double). */
  staticSafetyFactor: number | null;
}

/**
 * One bearing's ISO 281 life in running and ISO 76 static safety factor under a shock
 * (iso-281, iso-76).
 *
 * Formula: $P = X F_r + Y F_a$, $L_{10} = (C/P)^p$, $L_{10h} = \dfrac{10^6 L_{10}}{60 n}$, $P_0 = \max(F_r, X_0 F_r + Y_0 F_a)$, $s_0 = C_0/P_0$
 *
 * @param bearingType a value of `BEARING_TYPE_OPTIONS`; a roller bearing takes no axial load here
 * @param dynamicLoadRating C [N], greater than 0
 * @param staticLoadRating C0 [N], greater than 0
 * @param radialLoad F_r in running [N], 0 or more
 * @param shockRadialLoad F_r at the peak of a hit [N], 0 or more
 * @param axialLoad F_a [N], 0 or more (default 0; must be 0 for a roller bearing)
 * @param radialFactor X [-] (default 1), axialFactor Y [-] (default 0)
 * @param angularSpeed Ω [rad/s], greater than 0
 * @returns P, L10, L10h, P0 and s0
 *
 * @example
 * bearingCheck({ bearingType: "ball", dynamicLoadRating: 5400, staticLoadRating: 2360, radialLoad: 1200, shockRadialLoad: 1800, angularSpeed: 942.48 })
 * // → { ratingLife: 91.125, ratingLifeHours: 168.75, staticSafetyFactor: 1.311, … }
 * Sources: iso-281, iso-76.
 */
export function bearingCheck(input: {
  bearingType: string;
  dynamicLoadRating: number;
  staticLoadRating: number;
  radialLoad: number;
  shockRadialLoad: number;
  axialLoad?: number;
  radialFactor?: number;
  axialFactor?: number;
  angularSpeed: number;
}): BearingCheck {
  const fields = requireInputObject(input);
  const bearingType = requireOption("bearingType", fields.bearingType, BEARING_TYPE_OPTIONS);
  requirePositive("dynamicLoadRating", fields.dynamicLoadRating, "N");
  requirePositive("staticLoadRating", fields.staticLoadRating, "N");
  requirePositive("angularSpeed", fields.angularSpeed, "rad/s");
  requireNonNegative("shockRadialLoad", fields.shockRadialLoad, "N");
  const axialLoad = fields.axialLoad ?? 0;
  requireNonNegative("axialLoad", axialLoad, "N");
  if (bearingType === "roller" && axialLoad > 0) {
    throw new CalcInputError({
      param: "axialLoad",
      value: axialLoad,
      expected: "0 N for a roller bearing (a cylindrical roller bearing is taken to carry no axial load: use a ball bearing or a separate thrust bearing)",
      unit: "N",
    });
  }
  const equivalentLoad = equivalentDynamicLoad({
    radialLoad: fields.radialLoad,
    axialLoad,
    radialFactor: fields.radialFactor,
    axialFactor: fields.axialFactor,
  });
  const ratio = fields.dynamicLoadRating / equivalentLoad;
  const life = ratio ** LIFE_EXPONENT[bearingType]; // iso-281: L10 = (C/P)^p
  const ratingLife = Number.isFinite(life) ? life : null;
  const hours = ratingLife === null ? null : (ratingLife * 1e6) / ((fields.angularSpeed / (2 * Math.PI)) * 3600); // iso-281: L10h = 10⁶·L10/(60·n)
  // Stryker disable next-line ConditionalExpression: equivalent, a roller bearing's axial load is 0 (refused above), and max(F_r, 0.6·F_r) = F_r as with X0 = 1
  const staticFactors = bearingType === "ball" ? BALL_STATIC_FACTORS : { radialFactor: 1, axialFactor: 0 };
  const shock = fields.shockRadialLoad;
  const staticEquivalentLoad = requireFiniteResult(
    Math.max(shock, staticFactors.radialFactor * shock + staticFactors.axialFactor * axialLoad),
    "static equivalent load",
    {
      shockRadialLoad: [shock, "N"],
      axialLoad: [axialLoad, "N"],
    },
  ); // iso-76: P0r = max(F_r, X0·F_r + Y0·F_a)
  const s0 = fields.staticLoadRating / staticEquivalentLoad; // iso-76: s0 = C0/P0
  return {
    equivalentLoad,
    ratingLife,
    ratingLifeHours: Number.isFinite(hours) ? hours : null, // Number.isFinite(null) is false
    staticEquivalentLoad,
    staticSafetyFactor: Number.isFinite(s0) ? s0 : null,
  };
}
