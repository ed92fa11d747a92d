/**
 * Counterweights that bring the centre of mass back within a target offset: the mass needed at a
 * radius, the radius needed for a mass, the best of a set of mounting points, and the layout with
 * the counterweight added.
 */
import { CalcInputError, requireInRange, requirePositive } from "../core/errors.ts";

import { type LayoutPart, MAX_PART_MASS, checkPart, requireCoordinate, requireLength } from "./parts.ts";
import { directionOf } from "./parts.ts";
import { type MassProperties, massProperties } from "./properties.ts";
import { type NamedValue, requireFiniteFields, requireInputObject } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// Counterweights: bring the centre of mass back within a target offset.

interface CentreInput {
  /** M, mass before the counterweight [kg] */
  totalMass: number;
  /** x̄ [m] */
  centreX: number;
  /** ȳ [m] */
  centreY: number;
  /** e_target, the largest acceptable offset [m], greater than 0 */
  targetOffset: number;
}

function checkCentre({ totalMass, centreX, centreY, targetOffset }: CentreInput): number {
  requirePositive("totalMass", totalMass, "kg");
  requireCoordinate("centreX", centreX);
  requireCoordinate("centreY", centreY);
  requirePositive("targetOffset", targetOffset, "m");
  return Math.hypot(centreX, centreY);
}

/** The centre inputs by name, for the finiteness guard. */
function centreInputs(input: CentreInput, extra: Record<string, NamedValue> = {}): Record<string, NamedValue> {
  return { totalMass: [input.totalMass, "kg"], targetOffset: [input.targetOffset, "m"], ...extra };
}

/** Plan offset of the centre of mass after adding mass m at (px, py). */
function offsetWith(totalMass: number, centreX: number, centreY: number, mass: number, px: number, py: number): number {
  const total = totalMass + mass;
  return Math.hypot((totalMass * centreX + mass * px) / total, (totalMass * centreY + mass * py) / total);
}

export interface CounterweightAtRadius {
  /** "not-needed" when the offset is already within the target. */
  status: "not-needed" | "placed";
  /** Least mass that brings the offset to the target [kg] (0 when not needed). */
  mass: number;
  /** Mass that brings the offset to exactly 0: M e / r [kg]. */
  massForZero: number;
  /** Largest mass that still keeps the offset within the target [kg]; null when any larger mass also works (r ≤ e_target). */
  maxMass: number | null;
  /** Direction to mount it, opposite the offset [rad]. */
  angle: number;
  /** [m] */
  x: number;
  /** [m] */
  y: number;
  /** Offset after adding `mass` [m]. */
  offsetAfter: number;
}

/**
 * Counterweight at a given radius: how much mass, and in which direction, brings the centre of
 * mass within a target offset (centre-of-mass).
 *
 * Formula: placed opposite the offset, $|M e - m r| \le e_t (M + m)$, so
 * $m_{min} = \dfrac{M (e - e_t)}{r + e_t}$, $m_0 = \dfrac{M e}{r}$, $m_{max} = \dfrac{M (e + e_t)}{r - e_t}$
 *
 * @param totalMass M [kg], centreX x̄ [m], centreY ȳ [m], targetOffset e_t [m] > 0
 * @param radius r, where the counterweight's centre will sit [m], greater than 0
 * @returns status, mass [kg], massForZero [kg], maxMass [kg] or null, angle [rad], x, y [m], offsetAfter [m]
 *
 * Assumptions: the counterweight is a point mass. The direction opposite the offset needs the least
 * mass at any radius (it shortens the first moment the most for each gram).
 * @example
 * counterweightAtRadius({ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, radius: 0.055 }) // → { mass: 0.04565, massForZero: 0.05091, … }
 * Sources: centre-of-mass.
 */
export function counterweightAtRadius(input: CentreInput & { radius: number }): CounterweightAtRadius {
  const e = checkCentre(requireInputObject(input));
  const { totalMass, centreX, centreY, targetOffset, radius } = requireInputObject(input);
  requireLength("radius", radius);
  const angle = e > 0 ? directionOf(-centreX, -centreY) : 0;
  const x = radius * Math.cos(angle);
  const y = radius * Math.sin(angle);
  const massForZero = (totalMass * e) / radius;
  const maxMass = radius > targetOffset ? (totalMass * (e + targetOffset)) / (radius - targetOffset) : null;
  const named = centreInputs(input, { radius: [radius, "m"] });
  if (e <= targetOffset) {
    return requireFiniteFields({ status: "not-needed", mass: 0, massForZero, maxMass, angle, x, y, offsetAfter: e }, "counterweight", named);
  }
  const mass = (totalMass * (e - targetOffset)) / (radius + targetOffset);
  const offsetAfter = offsetWith(totalMass, centreX, centreY, mass, x, y);
  return requireFiniteFields({ status: "placed", mass, massForZero, maxMass, angle, x, y, offsetAfter }, "counterweight", named);
}

export interface CounterweightForMass {
  /** "too-far-out" when even the smallest workable radius exceeds the max radius. */
  status: "not-needed" | "placed" | "too-far-out";
  /**
   * Recommended radius: the zero-offset radius when it fits inside the max radius, else the max
   * radius itself (the workable radius nearest the zero-offset one, which leaves the smallest
   * offset) [m]; null when impossible.
   */
  radius: number | null;
  /** Radius for zero offset, M e / m [m]. */
  radiusForZero: number;
  /** Smallest radius that meets the target, (M e − e_t(M+m))/m, not below 0 [m]. */
  minRadius: number;
  /** Largest radius that meets the target, (M e + e_t(M+m))/m [m]. */
  maxRadiusWithinTarget: number;
  /** Direction to mount it, opposite the offset [rad]. */
  angle: number;
  /** Position at the recommended radius [m]; null when impossible. */
  x: number | null;
  y: number | null;
  /** Offset after mounting at the recommended radius [m]; null when impossible. */
  offsetAfter: number | null;
}

/**
 * Counterweight of a given mass: at what radius, and in which direction, it brings the centre of
 * mass within the target, and whether that radius fits inside the robot (centre-of-mass).
 *
 * Formula: opposite the offset, $|M e - m r| \le e_t (M + m)$ gives
 * $r \in \left[\dfrac{M e - e_t (M+m)}{m},\ \dfrac{M e + e_t (M+m)}{m}\right]$, with $r_0 = M e / m$
 *
 * @param totalMass M [kg], centreX, centreY [m], targetOffset e_t [m] > 0
 * @param mass m, the counterweight [kg], greater than 0
 * @param maxRadius the largest radius a counterweight can be mounted at [m], greater than 0
 * @returns status, radius (recommended) [m] or null, radiusForZero, minRadius, maxRadiusWithinTarget [m], angle [rad], x, y, offsetAfter
 *
 * Assumptions: when r_0 lies beyond the max radius but the workable band reaches inside it, the
 * max radius is recommended: it is the closest to r_0 the robot allows, so it leaves the smallest
 * offset, rather than the band's inner edge, where the offset sits exactly on the target and any
 * mounting tolerance pushes it out.
 * @example
 * counterweightRadiusForMass({ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, mass: 0.05, maxRadius: 1 }) // → { radius: 0.056, minRadius: 0.0502, maxRadiusWithinTarget: 0.0618, … }
 * counterweightRadiusForMass({ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, mass: 0.05, maxRadius: 0.053 }) // → { radius: 0.053, offsetAfter: 0.000103, … }
 * counterweightRadiusForMass({ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, mass: 0.05, maxRadius: 0.045 }) // → { status: "too-far-out", radius: null, … }
 * Sources: centre-of-mass.
 */
export function counterweightRadiusForMass(input: CentreInput & { mass: number; maxRadius: number }): CounterweightForMass {
  const e = checkCentre(requireInputObject(input));
  const { totalMass, centreX, centreY, targetOffset, mass, maxRadius } = requireInputObject(input);
  requirePositive("mass", mass, "kg");
  // Stryker disable next-line BooleanLiteral: equivalent, requirePositive just above already refuses 0
  requireInRange("mass", mass, "kg", { min: 0, max: MAX_PART_MASS, minOpen: true });
  requireLength("maxRadius", maxRadius);
  const angle = e > 0 ? directionOf(-centreX, -centreY) : 0;
  const radiusForZero = (totalMass * e) / mass;
  const minRadius = Math.max(0, (totalMass * e - targetOffset * (totalMass + mass)) / mass);
  const maxRadiusWithinTarget = (totalMass * e + targetOffset * (totalMass + mass)) / mass;
  const status: CounterweightForMass["status"] = e <= targetOffset ? "not-needed" : minRadius > maxRadius ? "too-far-out" : "placed";
  if (status === "too-far-out") {
    return requireFiniteFields(
      { status, radius: null, radiusForZero, minRadius, maxRadiusWithinTarget, angle, x: null, y: null, offsetAfter: null },
      "counterweight",
      centreInputs(input, { mass: [mass, "kg"] }),
    );
  }
  const radius = Math.min(radiusForZero, maxRadius);
  const x = radius * Math.cos(angle);
  const y = radius * Math.sin(angle);
  return requireFiniteFields(
    { status, radius, radiusForZero, minRadius, maxRadiusWithinTarget, angle, x, y, offsetAfter: offsetWith(totalMass, centreX, centreY, mass, x, y) },
    "counterweight",
    centreInputs(input, { mass: [mass, "kg"] }),
  );
}

/** A mounting point offered for a counterweight [m]. */
export interface MountingPoint {
  x: number;
  y: number;
}

export interface CandidateResult {
  index: number;
  x: number;
  y: number;
  /** False when no mass at this point reaches the target. */
  feasible: boolean;
  /** Least mass that reaches the target [kg]; null when infeasible. */
  mass: number | null;
  /** Offset with that mass [m]; null when infeasible. */
  offsetAfter: number | null;
  /** Why a point is infeasible, or "already within target". */
  reason: string | null;
}

export interface CandidateChoice {
  /** Index of the point needing the least mass, or null when none works. */
  best: number | null;
  candidates: readonly CandidateResult[];
}

/**
 * Picks, among given mounting points, the one that needs the least added mass to bring the centre
 * of mass within the target, solved exactly along the line from the centre of mass toward each
 * point (centre-of-mass).
 *
 * Formula: with $\mathbf c$ the offset and $\mathbf p$ the point, the least $m \ge 0$ with
 * $|M\mathbf c + m\mathbf p| \le e_t (M + m)$ is the first root of
 * $A m^2 + B m + C = 0$, $A = |\mathbf p|^2 - e_t^2$, $B = 2M(\mathbf c\cdot\mathbf p - e_t^2)$,
 * $C = M^2(|\mathbf c|^2 - e_t^2)$: $m = \dfrac{2C}{-B + \sqrt{B^2 - 4AC}}$
 *
 * @param totalMass M [kg], centreX, centreY [m], targetOffset e_t [m] > 0
 * @param candidates 1 to 100 mounting points (x, y) [m]
 * @returns best index or null, and each point's mass [kg], offsetAfter [m] or the reason it fails
 *
 * Assumptions: each point takes only mass (m ≥ 0), as a point mass. As m grows the centre of mass
 * slides from c toward p; a point works when that segment enters the target circle. The root form
 * used is free of cancellation and covers A > 0, A = 0 and A < 0 alike.
 * @example
 * counterweightAtCandidates({ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, candidates: [{ x: -0.055, y: 0 }, { x: 0.055, y: 0 }] }).candidates[0] // → { feasible: true, mass: 0.04565, … } (at (−55 mm, 0))
 * counterweightAtCandidates({ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, candidates: [{ x: -0.055, y: 0 }, { x: 0.055, y: 0 }] }).candidates[1] // → { feasible: false, mass: null, … } (at (55 mm, 0))
 * Sources: centre-of-mass.
 */
export function counterweightAtCandidates(input: CentreInput & { candidates: readonly MountingPoint[] }): CandidateChoice {
  const e = checkCentre(requireInputObject(input));
  const { totalMass: M, centreX: cx, centreY: cy, targetOffset: et, candidates } = requireInputObject(input);
  if (!Array.isArray(candidates) || candidates.length === 0 || candidates.length > 100) {
    throw new CalcInputError({
      param: "candidates",
      value: Array.isArray(candidates) ? candidates.length : String(candidates),
      expected: "a list of 1 to 100 mounting points",
      unit: "",
    });
  }
  const results = candidates.map((c, index): CandidateResult => {
    requireInputObject(c, `candidates[${index}]`);
    requireCoordinate(`candidates[${index}].x`, c.x);
    requireCoordinate(`candidates[${index}].y`, c.y);
    if (e <= et) return { index, x: c.x, y: c.y, feasible: true, mass: 0, offsetAfter: e, reason: "already within target" };
    const A = c.x * c.x + c.y * c.y - et * et;
    const B = 2 * M * (cx * c.x + cy * c.y - et * et);
    const C = M * M * (e - et) * (e + et);
    const D = B * B - 4 * A * C;
    const denominator = -B + Math.sqrt(Math.max(D, 0));
    if (D < 0 || !(denominator > 0)) {
      return {
        index,
        x: c.x,
        y: c.y,
        feasible: false,
        mass: null,
        offsetAfter: null,
        reason: "the line from the centre of mass toward this point never enters the target circle",
      };
    }
    const mass = (2 * C) / denominator;
    return { index, x: c.x, y: c.y, feasible: true, mass, offsetAfter: offsetWith(M, cx, cy, mass, c.x, c.y), reason: null };
  });
  let best: number | null = null;
  for (const r of results) if (r.feasible && (best === null || r.mass! < results[best]!.mass!)) best = r.index;
  return requireFiniteFields({ best, candidates: results }, "counterweight", centreInputs(input));
}

export interface AppliedCounterweight {
  /** The new parts list, ending with the counterweight. */
  parts: LayoutPart[];
  before: MassProperties;
  after: MassProperties;
}

/**
 * Adds a counterweight point mass to the layout and reports the mass properties before and after
 * (centre-of-mass; parallel-axis-theorem).
 *
 * @param parts the parts list (checked)
 * @param mass [kg], greater than 0
 * @param x, y, z where its centre sits [m]
 * @param name row name, default "counterweight"
 * @returns the new list, and MassProperties before and after
 *
 * @example
 * applyCounterweight({ parts: [{ name: "hub", shape: { kind: "point" }, mass: { kind: "given", mass: 1 }, x: 0.01, y: 0, z: 0 }], mass: 0.1, x: -0.1, y: 0, z: 0 }).after // → { totalMass: 1.1, offset: 0.0000, … } (centre of mass on the axis)
 *
 * Assumptions: a counterweight at the height of the centre of mass (z = z̄) leaves the products of
 * inertia about the centre of mass unchanged; any other height adds couple unbalance.
 * Sources: centre-of-mass, parallel-axis-theorem.
 */
export function applyCounterweight(input: {
  parts: readonly LayoutPart[];
  mass: number;
  x: number;
  y: number;
  z: number;
  name?: string;
}): AppliedCounterweight {
  const { parts, mass, x, y, z, name = "counterweight" } = requireInputObject(input);
  const before = massProperties(parts);
  requireInRange("mass", mass, "kg", { min: 0, max: MAX_PART_MASS, minOpen: true });
  const counterweight: LayoutPart = { name, shape: { kind: "point" }, mass: { kind: "given", mass }, x, y, z };
  checkPart(counterweight, "counterweight");
  const next = [...parts, counterweight];
  return { parts: next, before, after: massProperties(next) };
}
