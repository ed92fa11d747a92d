import { CalcInputError, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

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
  // Each quotient is formed so that no intermediate overflows before the last step. With 0 ≤ a ≤ l,
  // a/l and b/l are at most 1, so a reaction is never more than F and needs no finiteness check.
  return {
    leftReaction: force * (b / span), // shigley-beam-deflection-table 6: R1 = F·b/l
    rightReaction: force * (a / span), // R2 = F·a/l
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
    // a/l and b/l are at most 1 (0 ≤ a ≤ l), so neither moment is more than M and needs no finiteness check.
    momentBeforeCouple: moment * (a / span), // M_AB = M_B·x/l at x = a
    momentAfterCouple: moment * (b / span), // M_BC = M_B·(x − l)/l at x = a
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
