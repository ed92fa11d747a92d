/**
 * The weapon shaft in motion: the loads a running weapon puts on its shaft (gyroscopic couple,
 * residual unbalance, weight, a hit), the beam cases that turn them into bending moments,
 * reactions and deflection, the stresses in a solid or hollow round shaft, the safety factor on
 * yield, and the bearings' life and static safety (bearings.ts). SI in and out.
 *
 * Two layouts: the rotor between two supports (simply supported, rotor anywhere along the span),
 * and an overhung rotor beyond the nearer of two supports. Two shaft kinds: a live shaft turns
 * with the rotor in bearings at the supports (its bending stress is fully reversed once per turn,
 * and it carries the motor torque); a dead shaft is held still by the frame at the supports while
 * the rotor turns on its own pair of bearings (bending only, a steady stress).
 */
import { STANDARD_GRAVITY } from "../constants.ts";
import { CalcInputError, requireNonNegative, requirePositive } from "../errors.ts";
import { defineInputs } from "../inputs.ts";
import { isMaterialId, MATERIAL_IDS, MATERIALS, type MaterialId } from "../materials.ts";
import { rpmToRadPerSecond } from "../units.ts";
import { type BearingCheck, bearingCheck, BEARING_TYPE_OPTIONS, type BearingType, staticSafetyGuide } from "./bearings.ts";
import { type ChoiceOption, ratioOrNull, requireDeclaredInputs, requireFiniteResult, requireInputObject, requireOption, type Verdict } from "./common.ts";

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
    sectionModulus: requireFiniteResult(secondMoment / (diameter / 2), "section modulus", named), // shigley-bending-torsion: Z = I/c
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
  return requireFiniteResult((fields.torque * (fields.diameter / 2)) / section.polarMoment, "torsional stress", {
    torque: [fields.torque, "N·m"],
    diameter: [fields.diameter, "m"],
  }); // shigley-bending-torsion: τ = T·r/J
}

/**
 * Von Mises (distortion-energy) equivalent stress of a shaft surface carrying bending and
 * torsion (shigley-distortion-energy, shigley-bending-torsion).
 *
 * Formula: $\sigma' = \sqrt{\sigma^2 + 3\tau^2}$
 *
 * @param bendingStress σ [Pa], finite
 * @param shearStress τ [Pa], finite
 * @returns σ' [Pa]
 *
 * @example
 * vonMisesStress({ bendingStress: 100e6, shearStress: 50e6 }) // → 1.323e8
 * Sources: shigley-distortion-energy, shigley-bending-torsion.
 */
export function vonMisesStress(input: { bendingStress: number; shearStress: number }): number {
  const fields = requireInputObject(input);
  const sigma = fields.bendingStress;
  const tau = fields.shearStress;
  if (typeof sigma !== "number" || !Number.isFinite(sigma))
    throw new CalcInputError({ param: "bendingStress", value: sigma, expected: "a finite number", unit: "Pa" });
  if (typeof tau !== "number" || !Number.isFinite(tau)) throw new CalcInputError({ param: "shearStress", value: tau, expected: "a finite number", unit: "Pa" });
  // hypot avoids the overflow of σ² for very large finite stresses.
  return requireFiniteResult(Math.hypot(sigma, Math.sqrt(3) * tau), "von Mises stress", { bendingStress: [sigma, "Pa"], shearStress: [tau, "Pa"] }); // shigley-distortion-energy
}

// ---------------------------------------------------------------------------------------------
// Beam cases.

interface BeamStiffness {
  youngsModulus: number;
  secondMoment: number;
}

function requireStiffness(fields: Record<string, unknown>): BeamStiffness {
  requirePositive("youngsModulus", fields.youngsModulus as number, "Pa");
  requirePositive("secondMoment", fields.secondMoment as number, "m⁴");
  return { youngsModulus: fields.youngsModulus as number, secondMoment: fields.secondMoment as number };
}

function requirePositionInSpan(position: number, span: number): void {
  requireNonNegative("position", position, "m");
  if (!(position <= span)) {
    throw new CalcInputError({ param: "position", value: position, expected: `at most the span (${Number(span.toPrecision(6))} m)`, unit: "m" });
  }
}

/** A point load on a simply supported span. */
export interface SpanPointLoad {
  /** R1 = F·b/L, at the support the position is measured from [N]. */
  leftReaction: number;
  /** R2 = F·a/L [N]. */
  rightReaction: number;
  /** Largest bending moment, under the load, F·a·b/L [N·m]. */
  momentAtLoad: number;
  /** Deflection under the load, F·a²·b²/(3·E·I·L) [m]. */
  deflectionAtLoad: number;
}

/**
 * Simply supported beam with a point load anywhere along the span (shigley-beam-deflection-table
 * case 6, roark-beam-formulas case 1e).
 *
 * Formula: $R_1 = \dfrac{F b}{L}$, $R_2 = \dfrac{F a}{L}$, $M_{max} = \dfrac{F a b}{L}$, $y_F = \dfrac{F a^2 b^2}{3 E I L}$, $b = L - a$
 *
 * @param force F [N], 0 or more
 * @param span L, between the supports [m], greater than 0
 * @param position a, from the left support to the load [m], 0 to L
 * @param youngsModulus E [Pa], greater than 0
 * @param secondMoment I [m⁴], greater than 0
 * @returns reactions [N], moment under the load [N·m], deflection under the load [m]
 *
 * Assumptions: small deflections, linear elastic, slender beam (shear deflection ignored), supports
 * free to rotate (self-aligning bearings or short bearing seats).
 * @example
 * simplySupportedPointLoad({ force: 2000, span: 0.06, position: 0.03, youngsModulus: 200e9, secondMoment: 1.0179e-9 })
 * // → { leftReaction: 1000, rightReaction: 1000, momentAtLoad: 30, deflectionAtLoad: 4.421e-5 }
 * Sources: shigley-beam-deflection-table, roark-beam-formulas.
 */
export function simplySupportedPointLoad(input: { force: number; span: number; position: number; youngsModulus: number; secondMoment: number }): SpanPointLoad {
  const fields = requireInputObject(input);
  const { force, span, position } = fields;
  requireNonNegative("force", force, "N");
  requirePositive("span", span, "m");
  requirePositionInSpan(position, span);
  const { youngsModulus: E, secondMoment: I } = requireStiffness(fields);
  const a = position;
  const b = span - position;
  const named = { force: [force, "N"], span: [span, "m"], position: [position, "m"], youngsModulus: [E, "Pa"], secondMoment: [I, "m⁴"] } as const;
  // Each quotient is formed so that no intermediate overflows before the last step.
  return {
    leftReaction: requireFiniteResult(force * (b / span), "reaction", named), // shigley-beam-deflection-table 6: R1 = F·b/l
    rightReaction: requireFiniteResult(force * (a / span), "reaction", named), // R2 = F·a/l
    momentAtLoad: requireFiniteResult(force * a * (b / span), "bending moment", named), // M = F·a·b/l
    deflectionAtLoad: requireFiniteResult((((force / (3 * E * I)) * a * a) / span) * b * b, "deflection", named), // y = F·a²·b²/(3EIl)
  };
}

/** A point moment (couple) on a simply supported span. */
export interface SpanCouple {
  /** Each support's reaction, M/L, one up and one down [N]. */
  reaction: number;
  /** Bending moment just before the couple, M·a/L [N·m]. */
  momentBeforeCouple: number;
  /** Bending moment just after the couple, M·b/L [N·m]. */
  momentAfterCouple: number;
  /** Deflection at the couple, M·a·b·|b − a|/(3·E·I·L) [m]; 0 at mid-span. */
  deflectionAtCouple: number;
}

/**
 * Simply supported beam with a couple (a point moment) anywhere along the span: the gyroscopic
 * moment of a rotor on the shaft (shigley-beam-deflection-table case 8, roark-beam-formulas
 * case 3e).
 *
 * Formula: $R = \dfrac{M}{L}$, $M(a^-) = \dfrac{M a}{L}$, $M(a^+) = \dfrac{M b}{L}$, $y_M = \dfrac{M a b\,|b - a|}{3 E I L}$
 *
 * @param moment M [N·m], 0 or more
 * @param span L [m], greater than 0
 * @param position a, from the left support [m], 0 to L
 * @param youngsModulus E [Pa], greater than 0
 * @param secondMoment I [m⁴], greater than 0
 * @returns reaction pair [N], the moments on either side of the couple [N·m], deflection there [m]
 *
 * Assumptions: as `simplySupportedPointLoad`.
 * @example
 * simplySupportedCouple({ moment: 60, span: 0.06, position: 0.02, youngsModulus: 200e9, secondMoment: 1.0179e-9 })
 * // → { reaction: 1000, momentBeforeCouple: 20, momentAfterCouple: 40, deflectionAtCouple: 2.62e-5 }
 * Sources: shigley-beam-deflection-table, roark-beam-formulas.
 */
export function simplySupportedCouple(input: { moment: number; span: number; position: number; youngsModulus: number; secondMoment: number }): SpanCouple {
  const fields = requireInputObject(input);
  const { moment, span, position } = fields;
  requireNonNegative("moment", moment, "N·m");
  requirePositive("span", span, "m");
  requirePositionInSpan(position, span);
  const { youngsModulus: E, secondMoment: I } = requireStiffness(fields);
  const a = position;
  const b = span - position;
  const named = { moment: [moment, "N·m"], span: [span, "m"], position: [position, "m"], youngsModulus: [E, "Pa"], secondMoment: [I, "m⁴"] } as const;
  return {
    reaction: requireFiniteResult(moment / span, "reaction", named), // shigley-beam-deflection-table 8: R1 = −R2 = M_B/l
    momentBeforeCouple: requireFiniteResult(moment * (a / span), "bending moment", named), // M_AB = M_B·x/l at x = a
    momentAfterCouple: requireFiniteResult(moment * (b / span), "bending moment", named), // M_BC = M_B·(x − l)/l at x = a
    deflectionAtCouple: requireFiniteResult((((moment / (3 * E * I)) * a) / span) * b * Math.abs(b - a), "deflection", named), // y_AB at x = a
  };
}

/** A load at the end of an overhang beyond two supports. */
export interface OverhangLoad {
  /** At the far support [N]. */
  farReaction: number;
  /** At the support next to the overhang [N]. */
  nearReaction: number;
  /** Largest bending moment, at the near support [N·m]. */
  momentAtNearSupport: number;
  /** Deflection at the end of the overhang [m]. */
  tipDeflection: number;
}

/**
 * Beam on two supports with a point load at the end of an overhang beyond one of them: an
 * overhung rotor (shigley-beam-deflection-table case 10).
 *
 * Formula: $R_{far} = \dfrac{F c}{L}$, $R_{near} = \dfrac{F (L + c)}{L}$, $M_{max} = F c$, $y_{tip} = \dfrac{F c^2 (L + c)}{3 E I}$
 *
 * @param force F [N], 0 or more
 * @param span L, between the two supports [m], greater than 0
 * @param overhang c, from the near support to the load [m], 0 or more
 * @param youngsModulus E [Pa], greater than 0
 * @param secondMoment I [m⁴], greater than 0
 * @returns reactions [N], moment at the near support [N·m], tip deflection [m]
 *
 * Assumptions: as `simplySupportedPointLoad`. As L → 0 the tip deflection tends to the
 * cantilever's F·c³/(3EI) (`cantileverEndLoad`), the stiff limit of a clamped stub.
 * @example
 * overhungPointLoad({ force: 1000, span: 0.04, overhang: 0.02, youngsModulus: 200e9, secondMoment: 1.0179e-9 })
 * // → { farReaction: 500, nearReaction: 1500, momentAtNearSupport: 20, tipDeflection: 3.93e-5 }
 * Sources: shigley-beam-deflection-table.
 */
export function overhungPointLoad(input: { force: number; span: number; overhang: number; youngsModulus: number; secondMoment: number }): OverhangLoad {
  const fields = requireInputObject(input);
  const { force, span, overhang } = fields;
  requireNonNegative("force", force, "N");
  requirePositive("span", span, "m");
  requireNonNegative("overhang", overhang, "m");
  const { youngsModulus: E, secondMoment: I } = requireStiffness(fields);
  const named = { force: [force, "N"], span: [span, "m"], overhang: [overhang, "m"], youngsModulus: [E, "Pa"], secondMoment: [I, "m⁴"] } as const;
  return {
    farReaction: requireFiniteResult(force * (overhang / span), "reaction", named), // shigley-beam-deflection-table 10: R1 = F·a/l (magnitude)
    nearReaction: requireFiniteResult(force * ((span + overhang) / span), "reaction", named), // R2 = F(l + a)/l
    momentAtNearSupport: requireFiniteResult(force * overhang, "bending moment", named), // M at the support = F·a
    tipDeflection: requireFiniteResult((force / (3 * E * I)) * overhang * overhang * (span + overhang), "deflection", named), // y_C = F·a²(l + a)/(3EI)
  };
}

/** A couple at the end of an overhang beyond two supports. */
export interface OverhangCouple {
  /** Each support's reaction, M/L, one up and one down [N]. */
  reaction: number;
  /** Bending moment along the overhang and at the near support, M [N·m]. */
  momentAtNearSupport: number;
  /** Deflection at the end of the overhang [m]. */
  tipDeflection: number;
}

/**
 * Beam on two supports with a couple at the end of an overhang: the gyroscopic moment of an
 * overhung rotor (shigley-beam-deflection-table case 8 for the span, superposed with a
 * cantilever carrying an end moment along the overhang, roark-beam-formulas).
 *
 * Formula: $R = \dfrac{M}{L}$, $M_{max} = M$, $y_{tip} = \dfrac{M c\,(2L + 3c)}{6 E I}$
 *
 * @param moment M [N·m], 0 or more
 * @param span L [m], greater than 0
 * @param overhang c [m], 0 or more
 * @param youngsModulus E [Pa], greater than 0
 * @param secondMoment I [m⁴], greater than 0
 * @returns reaction pair [N], moment at the near support [N·m], tip deflection [m]
 *
 * Derivation: the span rotates at the near support by θ = M·L/(3EI) (case 8 with the couple at
 * that support), carried to the tip as θ·c, plus the overhang's own bending M·c²/(2EI).
 * @example
 * overhungCouple({ moment: 20, span: 0.04, overhang: 0.02, youngsModulus: 200e9, secondMoment: 1.0179e-9 })
 * // → { reaction: 500, momentAtNearSupport: 20, tipDeflection: 4.58e-5 }
 * Sources: shigley-beam-deflection-table, roark-beam-formulas.
 */
export function overhungCouple(input: { moment: number; span: number; overhang: number; youngsModulus: number; secondMoment: number }): OverhangCouple {
  const fields = requireInputObject(input);
  const { moment, span, overhang } = fields;
  requireNonNegative("moment", moment, "N·m");
  requirePositive("span", span, "m");
  requireNonNegative("overhang", overhang, "m");
  const { youngsModulus: E, secondMoment: I } = requireStiffness(fields);
  const named = { moment: [moment, "N·m"], span: [span, "m"], overhang: [overhang, "m"], youngsModulus: [E, "Pa"], secondMoment: [I, "m⁴"] } as const;
  return {
    reaction: requireFiniteResult(moment / span, "reaction", named), // shigley-beam-deflection-table 8: R = M/l
    momentAtNearSupport: moment,
    tipDeflection: requireFiniteResult((moment / (6 * E * I)) * overhang * (2 * span + 3 * overhang), "deflection", named), // θ·c + M·c²/(2EI)
  };
}

/**
 * Cantilever with a point load at its free end (shigley-beam-deflection-table case 1,
 * roark-beam-formulas case 1a).
 *
 * Formula: $M_{max} = F\,l$, $y_{tip} = \dfrac{F l^3}{3 E I}$
 *
 * @param force F [N], 0 or more
 * @param length l, from the clamp to the load [m], greater than 0
 * @param youngsModulus E [Pa], greater than 0
 * @param secondMoment I [m⁴], greater than 0
 * @returns rootMoment [N·m], tipDeflection [m]
 *
 * @example
 * cantileverEndLoad({ force: 5000, length: 0.03, youngsModulus: 200e9, secondMoment: 7.854e-9 }) // → { rootMoment: 150, tipDeflection: 2.865e-5 }
 * Sources: shigley-beam-deflection-table, roark-beam-formulas.
 */
export function cantileverEndLoad(input: { force: number; length: number; youngsModulus: number; secondMoment: number }): {
  rootMoment: number;
  tipDeflection: number;
} {
  const fields = requireInputObject(input);
  const { force, length } = fields;
  requireNonNegative("force", force, "N");
  requirePositive("length", length, "m");
  const { youngsModulus: E, secondMoment: I } = requireStiffness(fields);
  const named = { force: [force, "N"], length: [length, "m"], youngsModulus: [E, "Pa"], secondMoment: [I, "m⁴"] } as const;
  return {
    rootMoment: requireFiniteResult(force * length, "bending moment", named), // shigley-beam-deflection-table 1: M = −F·l
    tipDeflection: requireFiniteResult((force / (3 * E * I)) * length * length * length, "deflection", named), // y_max = −F·l³/(3EI)
  };
}

// ---------------------------------------------------------------------------------------------
// The calculator: weapon shaft and bearings.

/** Where the rotor sits on its shaft. */
export const SHAFT_LAYOUT_OPTIONS = [
  { value: "between", label: "Rotor between two supports" },
  { value: "overhung", label: "Rotor overhung beyond the nearer support" },
] as const satisfies readonly ChoiceOption[];

export type ShaftLayout = (typeof SHAFT_LAYOUT_OPTIONS)[number]["value"];

/** Whether the shaft turns. */
export const SHAFT_KIND_OPTIONS = [
  { value: "dead", label: "Dead shaft: held by the frame, the rotor turns on its own bearings" },
  { value: "live", label: "Live shaft: turns with the rotor, in bearings at the supports" },
] as const satisfies readonly ChoiceOption[];

export type ShaftKind = (typeof SHAFT_KIND_OPTIONS)[number]["value"];

/** Which way the shaft points (decides whether the rotor's weight bends the shaft or pushes along it). */
export const SHAFT_AXLE_OPTIONS = [
  { value: "horizontal", label: "Horizontal shaft (vertical disc, drum, bar)" },
  { value: "vertical", label: "Vertical shaft (horizontal spinner)" },
] as const satisfies readonly ChoiceOption[];

export type ShaftAxle = (typeof SHAFT_AXLE_OPTIONS)[number]["value"];

/** The shaft materials: every row of calc/materials.ts. */
export const SHAFT_MATERIAL_OPTIONS: readonly ChoiceOption<MaterialId>[] = MATERIAL_IDS.map((id) => ({
  value: id,
  label: `${MATERIALS[id].name}, ${MATERIALS[id].condition}`,
}));

/** Choice defaults of the shaft check (the numeric defaults are in `weaponShaftInputs`). */
export const WEAPON_SHAFT_CHOICE_DEFAULTS = {
  layout: "between",
  shaft: "dead",
  axle: "horizontal",
  bearingType: "ball",
  material: "steel-4340-qt650",
} as const satisfies { layout: ShaftLayout; shaft: ShaftKind; axle: ShaftAxle; bearingType: BearingType; material: MaterialId };

/** Life the rolling bearings should reach below which the margin is called thin, as a multiple of the required life (a choice; 2 on life is 1.26 on load for ball bearings). */
export const LIFE_THIN_FACTOR = 2;

/**
 * Numeric inputs of the shaft check, in SI. Choices: `SHAFT_LAYOUT_OPTIONS`, `SHAFT_KIND_OPTIONS`,
 * `SHAFT_AXLE_OPTIONS`, `BEARING_TYPE_OPTIONS`, `SHAFT_MATERIAL_OPTIONS`. Defaults: the invented
 * `DEMO_SHAFT`.
 */
export const weaponShaftInputs = defineInputs({
  rotorMass: { label: "Rotor mass", kind: "mass", min: 0.001, max: 500, default: 2.5, urlKey: "mr", help: "Everything that turns with the weapon." },
  rotorInertia: {
    label: "Rotor inertia",
    kind: "inertia",
    min: 1e-7,
    max: 50,
    default: 0.010125,
    urlKey: "J",
    help: "Moment of inertia of the rotor about its spin axis.",
  },
  weaponSpeed: {
    label: "Weapon speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(10),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(8000),
    urlKey: "rpm",
    help: "Spin speed while running; it sets the unbalance force and the bearings' life in hours.",
  },
  turnRate: {
    label: "Turn rate of the axle",
    kind: "angularSpeed",
    min: 0,
    max: 200,
    default: 2 * Math.PI,
    unit: { metric: "deg/s", us: "deg/s" },
    urlKey: "yaw",
    help: "How fast the shaft's direction changes: the robot's yaw rate for a horizontal shaft, its pitch or roll rate for a vertical one.",
  },
  unbalance: {
    label: "Residual unbalance",
    kind: "unbalance",
    min: 0,
    max: 1,
    default: 2e-5,
    urlKey: "U",
    help: "Mass times offset of the rotor's centre of mass from the spin axis (the mass-layout chapter computes it).",
  },
  impactForce: {
    label: "Peak force of a hit",
    kind: "force",
    min: 0,
    max: 1e7,
    default: 8000,
    urlKey: "Fi",
    help: "The largest force a hit puts on the rotor, across the shaft (the hit calculator estimates it).",
  },
  motorTorque: {
    label: "Motor torque through the shaft",
    kind: "torque",
    min: 0,
    max: 1e4,
    default: 1.5,
    urlKey: "T",
    help: "Torque the shaft carries from the drive to the rotor; read for a live shaft only.",
  },
  bearingSpan: {
    label: "Support span",
    kind: "length",
    min: 0.002,
    max: 2,
    default: 0.06,
    urlKey: "L",
    help: "Distance between the shaft's two supports: the bearings of a live shaft, the frame mounts of a dead one.",
  },
  rotorPosition: {
    label: "Rotor position",
    kind: "length",
    min: 0,
    max: 2,
    default: 0.03,
    urlKey: "a",
    help: "Rotor between the supports: from the first support to the rotor's mid-plane, at most the span.",
  },
  overhang: {
    label: "Overhang",
    kind: "length",
    min: 0.0005,
    max: 2,
    default: 0.02,
    urlKey: "c",
    help: "Overhung rotor: from the nearer support to the rotor's mid-plane.",
  },
  hubBearingSpacing: {
    label: "Rotor bearing spacing",
    kind: "length",
    min: 0.001,
    max: 1,
    default: 0.02,
    urlKey: "s",
    help: "Dead shaft: distance between the two bearings inside the rotor's hub; they carry the gyroscopic moment as a force pair.",
  },
  shaftDiameter: {
    label: "Shaft diameter",
    kind: "length",
    min: 0.001,
    max: 0.5,
    default: 0.012,
    urlKey: "d",
    help: "Outer diameter where the bending moment is largest.",
  },
  shaftBore: { label: "Shaft bore", kind: "length", min: 0, max: 0.5, default: 0, urlKey: "di", help: "Inner diameter of a hollow shaft; 0 for a solid one." },
  dynamicLoadRating: {
    label: "Bearing dynamic load rating C",
    kind: "force",
    min: 1,
    max: 1e7,
    default: 5400,
    urlKey: "C",
    help: "Basic dynamic load rating of one bearing, from its maker's table.",
  },
  staticLoadRating: {
    label: "Bearing static load rating C0",
    kind: "force",
    min: 1,
    max: 1e7,
    default: 2360,
    urlKey: "C0",
    help: "Basic static load rating of one bearing, from its maker's table.",
  },
  axialLoad: {
    label: "Axial load on the bearings",
    kind: "force",
    min: 0,
    max: 1e7,
    default: 0,
    urlKey: "Fa",
    help: "Thrust along the shaft (a vertical rotor's weight is added to it). Roller bearings are taken to carry none.",
  },
  radialFactor: {
    label: "Radial load factor X",
    kind: "fraction",
    min: 0.1,
    max: 2,
    default: 1,
    unit: { metric: "frac", us: "frac" },
    urlKey: "X",
    help: "From the bearing table for your axial-to-radial ratio; 1 for a purely radial load.",
  },
  axialFactor: {
    label: "Axial load factor Y",
    kind: "fraction",
    min: 0,
    max: 5,
    default: 0,
    unit: { metric: "frac", us: "frac" },
    urlKey: "Y",
    help: "From the bearing table for your axial-to-radial ratio; 0 for a purely radial load.",
  },
  requiredLife: {
    label: "Required bearing life",
    kind: "time",
    min: 60,
    max: 1e9,
    default: 20 * 3600,
    urlKey: "life",
    help: "Running time the bearings should last at the weapon speed (20 h is 72 000 s).",
  },
  failBelow: {
    label: "Fails below",
    kind: "fraction",
    min: 1,
    max: 10,
    default: 1,
    unit: { metric: "frac", us: "frac" },
    urlKey: "fail",
    help: "Shaft safety factor on yield under which the shaft is called a failure.",
  },
  marginalBelow: {
    label: "Thin below",
    kind: "fraction",
    min: 1,
    max: 20,
    default: 2,
    unit: { metric: "frac", us: "frac" },
    urlKey: "thin",
    help: "Shaft safety factor on yield under which the margin is flagged as thin.",
  },
});

export type WeaponShaftInput = { [K in keyof typeof weaponShaftInputs]: number } & {
  /** A value of `SHAFT_LAYOUT_OPTIONS`. */
  layout: string;
  /** A value of `SHAFT_KIND_OPTIONS`. */
  shaft: string;
  /** A value of `SHAFT_AXLE_OPTIONS`. */
  axle: string;
  /** A value of `BEARING_TYPE_OPTIONS`. */
  bearingType: string;
  /** A value of `SHAFT_MATERIAL_OPTIONS`. */
  material: string;
};

/** A criterion of the shaft check with its verdict. */
export interface ShaftCriterion {
  /** What is checked. */
  criterion: "shaft-yield" | "bearing-static" | "bearing-life";
  verdict: Verdict;
  /** The figure judged: safety factor on yield, s0, or L10h ÷ required life [-]; null when there is no load (or too little for the figure to be a finite double). */
  value: number | null;
  /** Below this it fails [-]. */
  failBelow: number;
  /** Below this the margin is thin [-]. */
  marginalBelow: number;
}

/** The result of `weaponShaftCheck`. */
export interface WeaponShaftCheck {
  layout: ShaftLayout;
  shaft: ShaftKind;
  axle: ShaftAxle;
  bearingType: BearingType;
  material: { id: MaterialId; name: string; condition: string; basis: "typical" | "minimum"; yieldStrength: number; youngsModulus: number };
  loads: {
    /** U·Ω² [N]. */
    unbalanceForce: number;
    /** m·g [N]; across the shaft when horizontal, along it when vertical. */
    weight: number;
    /** The hit [N]. */
    impactForce: number;
    /** Running load across the shaft at the rotor, unbalance + weight (horizontal) [N]. */
    runningForce: number;
    /** Running load plus the hit [N]. */
    peakForce: number;
    /** J·Ω·q [N·m]. */
    gyroscopicMoment: number;
    /** Axial load on the bearings: the input plus the weight of a vertical rotor [N]. */
    axialLoad: number;
    /** Motor torque carried (0 for a dead shaft) [N·m]. */
    torque: number;
  };
  /** Support reactions (bearings of a live shaft, frame mounts of a dead one), running and at the peak of a hit [N]. */
  supports: { first: { running: number; peak: number }; second: { running: number; peak: number } };
  /** Largest bending moment (at the rotor, or at the near support when overhung), running and peak [N·m]. */
  bendingMoment: { running: number; peak: number };
  section: RoundSection;
  /** Bending stress at the peak [Pa]. */
  bendingStress: number;
  /** Torsional stress (live shaft) [Pa]. */
  torsionalStress: number;
  /** Von Mises stress at the peak [Pa]. */
  vonMisesStress: number;
  /** "fully-reversed" for a live shaft (rotating bending), "steady" for a dead one. */
  stressCycle: "fully-reversed" | "steady";
  /** S_y / σ' [-]; null when nothing loads the shaft (or the stress is so small the factor passes the largest double). */
  safetyFactor: number | null;
  /** Deflection of the shaft at the rotor, running and at the peak [m]. */
  deflection: { running: number; peak: number };
  /** Radial loads on the two bearings (live: at the supports; dead: in the rotor's hub), running and at the peak [N]. */
  bearingLoads: { first: { running: number; peak: number }; second: { running: number; peak: number } };
  /** The more heavily loaded bearing's checks (iso-281, iso-76). */
  bearing: BearingCheck & { requiredLifeHours: number; staticSafetyGuide: number };
  criteria: ShaftCriterion[];
  verdict: Verdict;
  /** The criterion that decides the verdict. */
  governs: ShaftCriterion["criterion"];
  reason: string;
}

function verdictOf(value: number | null, failBelow: number, marginalBelow: number): Verdict {
  if (value === null) return "holds";
  return value < failBelow ? "fails" : value < marginalBelow ? "marginal" : "holds";
}

const SEVERITY: Record<Verdict, number> = { holds: 0, marginal: 1, fails: 2 };

/**
 * The weapon shaft and its bearings while the weapon runs and when it hits: loads, support and
 * bearing reactions, bending moment, stresses, deflection at the rotor, safety factor on yield,
 * ISO 281 life and ISO 76 static safety, with a verdict naming what governs
 * (shigley-beam-deflection-table, roark-beam-formulas, shigley-bending-torsion,
 * shigley-distortion-energy, meriam-kraige-dynamics, rigid-rotor-unbalance, iso-281, iso-76,
 * bearing-static-safety-guide, safety-factor-practice).
 *
 * Formula: $F_u = U\Omega^2$, $W = m g$, $M_g = J\Omega q$, $P = F_u + W + F_{hit}$;
 * between: $M = \dfrac{P a b}{L} + \dfrac{M_g \max(a,b)}{L}$, $y = \dfrac{P a^2 b^2}{3EIL} + \dfrac{M_g a b |b-a|}{3EIL}$;
 * overhung: $M = P c + M_g$, $y = \dfrac{P c^2 (L+c)}{3EI} + \dfrac{M_g c (2L+3c)}{6EI}$;
 * $\sigma = \dfrac{32 M d}{\pi(d^4 - d_i^4)}$, $\tau = \dfrac{16 T d}{\pi(d^4 - d_i^4)}$, $\sigma' = \sqrt{\sigma^2 + 3\tau^2}$, $n = S_y/\sigma'$;
 * bearings: live $R$ = support reactions; dead $R = P/2 + M_g/s$; $L_{10} = (C/P)^p$, $s_0 = C_0/P_0$
 *
 * @param input the numeric fields of `weaponShaftInputs` (SI) plus `layout`, `shaft`, `axle`, `bearingType`, `material`
 * @returns loads, reactions, moment, stresses, deflection, safety factor, bearing life and static safety, the criteria with their verdicts, and the verdict with what governs and why
 *
 * Verdict: the worst of three criteria (ties: the one closest to its threshold):
 * - shaft yield: n = S_y/σ' at the peak of a hit, fails below `failBelow`, thin below `marginalBelow`;
 * - bearing static safety under the hit: s0 below 1 fails (the raceways dent), below the guideline
 *   for rotating bearings under pronounced shock with normal requirements (1.5 ball, 3 roller) thin;
 * - bearing life in running (no hit): L10h below the required life fails, below `LIFE_THIN_FACTOR`
 *   times it thin.
 *
 * Assumptions:
 * - Every transverse load (unbalance, weight, hit) acts in one plane and they add, and the
 *   gyroscopic couple adds to them with the sign that hurts: the worst case, since the unbalance
 *   force turns and the others point where the robot's motion puts them.
 * - The rotor acts at one point (its mid-plane); the supports are simple (free to tilt); the shaft
 *   is uniform, slender (shear deflection and transverse shear stress ignored), linear elastic.
 * - Dead shaft: the rotor's centre of mass lies midway between its two hub bearings, which share
 *   the transverse load equally and carry the gyroscopic couple as a force pair over their spacing.
 *   Strictly the unbalance share of the stress turns with the rotor and so alternates.
 * - Live shaft: bending stress is fully reversed every turn, so FATIGUE governs its long-term life:
 *   this check is against yield only; check the endurance limit (with surface, size and notch
 *   factors) separately. The torque is the motor's steady torque, not a torque spike from a hit.
 * - Both bearings have the same ratings; the axial load (with a vertical rotor's weight) is taken
 *   by each bearing in its check (conservative: usually one bearing locates the shaft).
 * - Strength: the material table's yield strength, typical or specified minimum as its basis says.
 * - Not checked: shaft slope at the bearings, keyways and shoulders (stress concentration), the
 *   critical (whirling) speed, fretting of the bearing seats.
 * @example
 * weaponShaftCheck(DEMO_SHAFT) // → { verdict: "fails", governs: "bearing-static", … } (see the demo)
 * Sources: shigley-beam-deflection-table, roark-beam-formulas, shigley-bending-torsion,
 * shigley-distortion-energy, meriam-kraige-dynamics, rigid-rotor-unbalance, iso-281, iso-76,
 * bearing-static-safety-guide, safety-factor-practice, cgpm-1901.
 */
export function weaponShaftCheck(input: WeaponShaftInput): WeaponShaftCheck {
  const fields = requireInputObject(input);
  const layout = requireOption("layout", fields.layout, SHAFT_LAYOUT_OPTIONS);
  const shaft = requireOption("shaft", fields.shaft, SHAFT_KIND_OPTIONS);
  const axle = requireOption("axle", fields.axle, SHAFT_AXLE_OPTIONS);
  const bearingType = requireOption("bearingType", fields.bearingType, BEARING_TYPE_OPTIONS);
  if (typeof fields.material !== "string" || !isMaterialId(fields.material)) {
    throw new CalcInputError({ param: "material", value: fields.material, expected: `one of ${MATERIAL_IDS.map((id) => `"${id}"`).join(", ")}`, unit: "" });
  }
  const materialId = fields.material;
  const v = requireDeclaredInputs(weaponShaftInputs, fields);
  if (layout === "between" && !(v.rotorPosition <= v.bearingSpan)) {
    throw new CalcInputError({
      param: "rotorPosition",
      value: v.rotorPosition,
      expected: `at most the support span (${Number(v.bearingSpan.toPrecision(6))} m) for a rotor between the supports`,
      unit: "m",
    });
  }
  if (!(v.shaftBore < v.shaftDiameter)) {
    throw new CalcInputError({
      param: "shaftBore",
      value: v.shaftBore,
      expected: `less than the shaft diameter (${Number(v.shaftDiameter.toPrecision(6))} m)`,
      unit: "m",
    });
  }
  if (!(v.marginalBelow >= v.failBelow)) {
    throw new CalcInputError({ param: "marginalBelow", value: v.marginalBelow, expected: `at least the fail threshold, ${v.failBelow}`, unit: "" });
  }
  const weightOnAxle = axle === "vertical" ? v.rotorMass * STANDARD_GRAVITY : 0;
  const axialLoad = v.axialLoad + weightOnAxle;
  if (bearingType === "roller" && axialLoad > 0) {
    throw new CalcInputError({
      param: "bearingType",
      value: bearingType,
      expected:
        '"ball" when the bearings carry an axial load (here the axial input or a vertical rotor\'s weight): cylindrical roller bearings are taken to carry none, so give the thrust its own bearing',
      unit: "",
    });
  }

  const material = MATERIALS[materialId];
  const E = material.youngsModulus;
  const section = roundSection({ diameter: v.shaftDiameter, bore: v.shaftBore });
  const I = section.secondMoment;

  // Loads.
  const unbalanceForce = v.unbalance * v.weaponSpeed * v.weaponSpeed; // rigid-rotor-unbalance: F = U·ω²
  const weight = v.rotorMass * STANDARD_GRAVITY; // cgpm-1901: W = m·g_n
  const runningForce = unbalanceForce + (axle === "horizontal" ? weight : 0);
  const peakForce = runningForce + v.impactForce;
  const gyroscopic = v.rotorInertia * v.weaponSpeed * v.turnRate; // meriam-kraige-dynamics: M = I·Ω·p
  const torque = shaft === "live" ? v.motorTorque : 0;

  // Beam: supports, largest moment, deflection at the rotor, for a transverse force P with the couple.
  const beam = (P: number) => {
    if (layout === "between") {
      const span = v.bearingSpan;
      const a = v.rotorPosition;
      const b = span - a;
      const point = simplySupportedPointLoad({ force: P, span, position: a, youngsModulus: E, secondMoment: I });
      const couple = simplySupportedCouple({ moment: gyroscopic, span, position: a, youngsModulus: E, secondMoment: I });
      return {
        first: point.leftReaction + couple.reaction,
        second: point.rightReaction + couple.reaction,
        moment: point.momentAtLoad + (a >= b ? couple.momentBeforeCouple : couple.momentAfterCouple), // worst side of the jump
        deflection: point.deflectionAtLoad + couple.deflectionAtCouple,
      };
    }
    const point = overhungPointLoad({ force: P, span: v.bearingSpan, overhang: v.overhang, youngsModulus: E, secondMoment: I });
    const couple = overhungCouple({ moment: gyroscopic, span: v.bearingSpan, overhang: v.overhang, youngsModulus: E, secondMoment: I });
    return {
      first: point.farReaction + couple.reaction,
      second: point.nearReaction + couple.reaction,
      moment: point.momentAtNearSupport + couple.momentAtNearSupport,
      deflection: point.tipDeflection + couple.tipDeflection,
    };
  };
  const running = beam(runningForce);
  const peak = beam(peakForce);

  // Stresses at the peak.
  const sigma = bendingStress({ moment: peak.moment, diameter: v.shaftDiameter, bore: v.shaftBore });
  const tau = torsionalStress({ torque, diameter: v.shaftDiameter, bore: v.shaftBore });
  const sigmaVm = vonMisesStress({ bendingStress: sigma, shearStress: tau });
  const safety = ratioOrNull(material.yieldStrength, sigmaVm); // safety-factor-practice: n = S_y/σ'

  // Bearings: at the supports of a live shaft, in the hub of a dead one.
  const hubLoad = (P: number) => P / 2 + gyroscopic / v.hubBearingSpacing; // khurmi-gupta-theory-of-machines: F = C/x on each bearing
  const bearingLoads =
    shaft === "live"
      ? { first: { running: running.first, peak: peak.first }, second: { running: running.second, peak: peak.second } }
      : { first: { running: hubLoad(runningForce), peak: hubLoad(peakForce) }, second: { running: hubLoad(runningForce), peak: hubLoad(peakForce) } };
  const heavier = bearingLoads.first.peak >= bearingLoads.second.peak ? bearingLoads.first : bearingLoads.second;
  const heavierRunning = Math.max(bearingLoads.first.running, bearingLoads.second.running);
  const check = bearingCheck({
    bearingType,
    dynamicLoadRating: v.dynamicLoadRating,
    staticLoadRating: v.staticLoadRating,
    radialLoad: heavierRunning,
    shockRadialLoad: heavier.peak,
    axialLoad,
    radialFactor: v.radialFactor,
    axialFactor: v.axialFactor,
    angularSpeed: v.weaponSpeed,
  });
  const guide = staticSafetyGuide({ bearingType, loading: "shock", requirements: "normal" });
  const requiredLifeHours = v.requiredLife / 3600;
  const lifeRatio = check.ratingLifeHours === null ? null : ratioOrNull(check.ratingLifeHours, requiredLifeHours);

  const criteria: ShaftCriterion[] = [
    {
      criterion: "shaft-yield",
      value: safety,
      failBelow: v.failBelow,
      marginalBelow: v.marginalBelow,
      verdict: verdictOf(safety, v.failBelow, v.marginalBelow),
    },
    {
      criterion: "bearing-static",
      value: check.staticSafetyFactor,
      failBelow: 1,
      marginalBelow: guide,
      verdict: verdictOf(check.staticSafetyFactor, 1, guide),
    },
    {
      criterion: "bearing-life",
      value: lifeRatio,
      failBelow: 1,
      marginalBelow: LIFE_THIN_FACTOR,
      verdict: verdictOf(lifeRatio, 1, LIFE_THIN_FACTOR),
    },
  ];
  const closeness = (c: ShaftCriterion) => (c.value === null ? Number.POSITIVE_INFINITY : c.value / c.marginalBelow);
  const governing = criteria.reduce((worst, c) =>
    SEVERITY[c.verdict] > SEVERITY[worst.verdict] || (SEVERITY[c.verdict] === SEVERITY[worst.verdict] && closeness(c) < closeness(worst)) ? c : worst,
  );

  const result: WeaponShaftCheck = {
    layout,
    shaft,
    axle,
    bearingType,
    material: {
      id: materialId,
      name: material.name,
      condition: material.condition,
      basis: material.basis,
      yieldStrength: material.yieldStrength,
      youngsModulus: material.youngsModulus,
    },
    loads: { unbalanceForce, weight, impactForce: v.impactForce, runningForce, peakForce, gyroscopicMoment: gyroscopic, axialLoad, torque },
    supports: { first: { running: running.first, peak: peak.first }, second: { running: running.second, peak: peak.second } },
    bendingMoment: { running: running.moment, peak: peak.moment },
    section,
    bendingStress: sigma,
    torsionalStress: tau,
    vonMisesStress: sigmaVm,
    stressCycle: shaft === "live" ? "fully-reversed" : "steady",
    safetyFactor: safety,
    deflection: { running: running.deflection, peak: peak.deflection },
    bearingLoads,
    bearing: { ...check, requiredLifeHours, staticSafetyGuide: guide },
    criteria,
    verdict: governing.verdict,
    governs: governing.criterion,
    reason: "",
  };
  result.reason = shaftReason(result, governing);
  return result;
}

function figure(x: number): string {
  return Number(x.toPrecision(2)).toString();
}

function shaftReason(r: WeaponShaftCheck, c: ShaftCriterion): string {
  const basis = r.material.basis === "typical" ? " (typical strength: the specified minimum can be lower)" : "";
  if (c.value === null) return "Nothing loads the shaft or the bearings.";
  switch (c.criterion) {
    case "shaft-yield": {
      const cycle = r.stressCycle === "fully-reversed" ? "; the live shaft's bending is fully reversed, so check fatigue too" : "";
      if (c.verdict === "fails")
        return `The shaft yields at the peak of a hit: safety factor ${figure(c.value)} on yield${basis}, below ${figure(c.failBelow)}.`;
      if (c.verdict === "marginal")
        return `The shaft's safety factor on yield at the peak of a hit is ${figure(c.value)}${basis}, below ${figure(c.marginalBelow)}${cycle}.`;
      return `Every check holds; the closest is the shaft, at a safety factor of ${figure(c.value)} on yield at the peak of a hit${basis}${cycle}.`;
    }
    case "bearing-static":
      if (c.verdict === "fails") return `A hit overloads the bearings: static safety factor s0 = ${figure(c.value)}, below 1, so the raceways dent.`;
      if (c.verdict === "marginal")
        return `The bearings' static safety factor under a hit is ${figure(c.value)}, below the guideline of ${figure(c.marginalBelow)} for shock loads.`;
      return `Every check holds; the closest is the bearings' static safety factor under a hit, ${figure(c.value)} against a guideline of ${figure(c.marginalBelow)}.`;
    case "bearing-life":
      if (c.verdict === "fails") return `The bearings' rating life is ${figure(c.value)} times the life required: fewer than 90 % of them would last.`;
      if (c.verdict === "marginal") return `The bearings' rating life is only ${figure(c.value)} times the life required.`;
      return `Every check holds; the closest is the bearings' rating life, ${figure(c.value)} times the life required.`;
  }
}

/**
 * An invented scenario (no real robot or part): the 2.5 kg, 180 mm steel disc of
 * `DEMO_VERTICAL_SPINNER_TURN` at 8000 rpm on a dead 12 mm shaft of quenched-and-tempered 4340
 * steel, clamped by two frame plates 60 mm apart with the disc in the middle; the disc turns on
 * two deep-groove ball bearings of 12 mm bore 20 mm apart in its hub (C = 5.4 kN, C0 = 2.36 kN,
 * a generic size class); the robot yaws at 360 °/s; 20 g·mm of residual unbalance; a glancing
 * hit of 8 kN peak (an invented figure: a full-bite hit, as `DEMO_HIT` estimates, is far
 * harder); 20 h of running wanted. Result: the gyroscopic couple (53 N·m) puts 2.7 kN on each
 * hub bearing in the turn, so their life is 17 h (short of 20 h), and with the hit they see
 * 6.7 kN against C0 = 2.36 kN (s0 = 0.35: the raceways dent), which governs; the shaft's
 * safety factor on yield is 0.96. For the chapter's worked example.
 */
export const DEMO_SHAFT: WeaponShaftInput = {
  layout: "between",
  shaft: "dead",
  axle: "horizontal",
  bearingType: "ball",
  material: "steel-4340-qt650",
  rotorMass: 2.5,
  rotorInertia: 0.010125,
  weaponSpeed: rpmToRadPerSecond(8000),
  turnRate: 2 * Math.PI,
  unbalance: 2e-5,
  impactForce: 8000,
  motorTorque: 1.5,
  bearingSpan: 0.06,
  rotorPosition: 0.03,
  overhang: 0.02,
  hubBearingSpacing: 0.02,
  shaftDiameter: 0.012,
  shaftBore: 0,
  dynamicLoadRating: 5400,
  staticLoadRating: 2360,
  axialLoad: 0,
  radialFactor: 1,
  axialFactor: 0,
  requiredLife: 20 * 3600,
  failBelow: 1,
  marginalBelow: 2,
};
