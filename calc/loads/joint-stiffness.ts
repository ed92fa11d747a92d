import { CalcInputError, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireFiniteResult, requireInputObject } from "../core/spec-check.ts";

// Joint stiffness and the share of an external tension.

/**
 * Axial stiffness of a bolt: its unthreaded shank and its threaded length in the grip act as two
 * springs in series (shigley-mechanical-design Eq. 8-17).
 *
 * Formula: $k_b = \dfrac{A_d\,A_t\,E}{A_d\,l_t + A_t\,l_d}$
 *
 * @param shankArea A_d, major-diameter area π d²/4 [m²], greater than 0
 * @param stressArea A_t, tensile stress area [m²], greater than 0
 * @param shankLength l_d, unthreaded length in the grip [m], 0 or more
 * @param threadLength l_t, threaded length in the grip [m], 0 or more; l_d + l_t greater than 0
 * @param youngsModulus E of the bolt [Pa], greater than 0
 * @returns k_b [N/m]
 *
 * @example
 * boltStiffness({ shankArea: 0.3068, stressArea: 0.226, shankLength: 0.75, threadLength: 0.75, youngsModulus: 30e6 }) // → 5.21e6 (Shigley Ex. 8-4, lbf/in)
 *
 * Sources: shigley-mechanical-design.
 */
export function boltStiffness(input: { shankArea: number; stressArea: number; shankLength: number; threadLength: number; youngsModulus: number }): number {
  const { shankArea, stressArea, shankLength, threadLength, youngsModulus } = requireInputObject(input);
  requirePositive("shankArea", shankArea, "m²");
  requirePositive("stressArea", stressArea, "m²");
  requireNonNegative("shankLength", shankLength, "m");
  requireNonNegative("threadLength", threadLength, "m");
  requirePositive("youngsModulus", youngsModulus, "Pa");
  if (!(shankLength + threadLength > 0)) {
    throw new CalcInputError({ param: "threadLength", value: threadLength, expected: "greater than 0 m when the shank length is 0", unit: "m" });
  }
  // Written as E / (l_t/A_t + l_d/A_d), the same expression, so that no product overflows.
  const compliance = threadLength / stressArea + shankLength / shankArea; // shigley-mechanical-design Eq. 8-17
  return requireFiniteResult(youngsModulus / compliance, "bolt stiffness", { youngsModulus: [youngsModulus, "Pa"] });
}

/**
 * Stiffness of the clamped members by the 30° frustum model, for members of one material, a washer
 * face of 1.5 d and a grip l (shigley-mechanical-design Eq. 8-22).
 *
 * Formula: $k_m = \dfrac{0.5774\,\pi E d}{2\ln\!\left(5\,\dfrac{0.5774\,l + 0.5\,d}{0.5774\,l + 2.5\,d}\right)}$
 *
 * @param youngsModulus E of the members [Pa], greater than 0
 * @param nominalDiameter d [m], greater than 0
 * @param gripLength l, the clamped thickness (for a cap screw in a tapped hole, the effective grip) [m], greater than 0
 * @returns k_m [N/m]
 *
 * Assumptions: both members of one material; the pressure cone of half-angle 30° fits inside the
 * members. Wileman's exponential fit (Shigley Eq. 8-23) gives values within a few per cent.
 *
 * @example
 * memberStiffness({ youngsModulus: 14e6, nominalDiameter: 0.625, gripLength: 1.5 }) // → 8.95e6 (Shigley Ex. 8-4, lbf/in)
 *
 * Sources: shigley-mechanical-design.
 */
export function memberStiffness(input: { youngsModulus: number; nominalDiameter: number; gripLength: number }): number {
  const { youngsModulus, nominalDiameter, gripLength } = requireInputObject(input);
  requirePositive("youngsModulus", youngsModulus, "Pa");
  requirePositive("nominalDiameter", nominalDiameter, "m");
  requirePositive("gripLength", gripLength, "m");
  const a = 0.5774 * gripLength;
  // ln(5(a + 0.5d)/(a + 2.5d)) = ln(1 + 4a/(a + 2.5d)), written with log1p for a short grip.
  const logTerm = Math.log1p((4 * a) / (a + 2.5 * nominalDiameter)); // shigley-mechanical-design Eq. 8-22
  const stiffness = (0.5774 * Math.PI * youngsModulus * nominalDiameter) / (2 * logTerm); // shigley-mechanical-design Eq. 8-22
  return requireFiniteResult(stiffness, "member stiffness", {
    youngsModulus: [youngsModulus, "Pa"],
    nominalDiameter: [nominalDiameter, "m"],
    gripLength: [gripLength, "m"],
  });
}

/**
 * Joint stiffness constant: the share of an external tension the bolt takes (shigley-mechanical-design).
 *
 * Formula: $C = \dfrac{k_b}{k_b + k_m}$
 *
 * @param boltStiffness k_b [N/m], greater than 0
 * @param memberStiffness k_m [N/m], greater than 0
 * @returns C [-], between 0 and 1
 *
 * @example
 * jointStiffnessFactor({ boltStiffness: 5.21e6, memberStiffness: 8.95e6 }) // → 0.368 (Shigley Ex. 8-4)
 *
 * Sources: shigley-mechanical-design.
 */
export function jointStiffnessFactor(input: { boltStiffness: number; memberStiffness: number }): number {
  const { boltStiffness: kb, memberStiffness: km } = requireInputObject(input);
  requirePositive("boltStiffness", kb, "N/m");
  requirePositive("memberStiffness", km, "N/m");
  return 1 / (1 + km / kb); // shigley-mechanical-design, C = k_b/(k_b + k_m), written so that no sum overflows
}

/** The loads in a preloaded joint under an external tension. */
export interface TensionJointLoads {
  /** F_b, tension in the bolt [N]. */
  boltLoad: number;
  /** F_m, compression left in the members (0 once separated) [N]. */
  memberLoad: number;
  /** P_0 = F_i/(1 − C), the external load at which the joint opens [N]. */
  separationLoad: number;
  /** True when P ≥ P_0: the members carry nothing and the bolt the whole load. */
  separated: boolean;
}

/**
 * Bolt and member loads of a preloaded joint under an external tension P per bolt
 * (shigley-mechanical-design p. 461; F_m written here as a compression, positive while clamped).
 *
 * Formula: $F_b = F_i + C\,P,\quad F_m = F_i - (1 - C)\,P,\quad P_0 = \dfrac{F_i}{1 - C}$; for $P \ge P_0$: $F_b = P,\ F_m = 0$
 *
 * @param preload F_i [N], 0 or more
 * @param stiffnessFactor C [-], greater than 0 and less than 1
 * @param externalLoad P, external tension per bolt [N], 0 or more
 * @returns F_b, F_m, P_0 [N] and whether the joint has separated
 *
 * @example
 * tensionJointLoads({ preload: 10330.5, stiffnessFactor: 0.453734, externalLoad: 2000 }) // → { boltLoad: 11237.97, memberLoad: 9237.97, separationLoad: 18911.1, separated: false }
 *
 * Sources: shigley-mechanical-design.
 */
export function tensionJointLoads(input: { preload: number; stiffnessFactor: number; externalLoad: number }): TensionJointLoads {
  const { preload, stiffnessFactor, externalLoad } = requireInputObject(input);
  requireNonNegative("preload", preload, "N");
  requireInRange("stiffnessFactor", stiffnessFactor, "", { min: 0, max: 1, minOpen: true, maxOpen: true });
  requireNonNegative("externalLoad", externalLoad, "N");
  const separationLoad = requireFiniteResult(preload / (1 - stiffnessFactor), "separation load", { preload: [preload, "N"] }); // shigley-mechanical-design Eq. 8-30 (P_0)
  if (externalLoad >= separationLoad) return { boltLoad: externalLoad, memberLoad: 0, separationLoad, separated: true };
  return {
    boltLoad: preload + stiffnessFactor * externalLoad, // shigley-mechanical-design, F_b = CP + F_i
    memberLoad: preload - (1 - stiffnessFactor) * externalLoad, // shigley-mechanical-design, F_m = (1 − C)P − F_i, sign turned
    separationLoad,
    separated: false,
  };
}

/** Shigley's three safety factors of a preloaded bolt under an external tension. */
export interface TensionJointFactors {
  /** n_p = F_p/F_b: proof load over bolt load, with the load on (Shigley's yielding factor, Eq. 8-28) [-]. */
  yieldFactor: number;
  /** n_L: how many times P can grow before the bolt reaches its proof load (Eq. 8-29), 0 if the preload alone reaches it [-]. */
  loadFactor: number;
  /** n_0 = P_0/P: how many times P can grow before the joint opens (Eq. 8-30) [-]. */
  separationFactor: number;
}

/**
 * Safety factors of a preloaded bolt in tension (shigley-mechanical-design Eqs. 8-28 to 8-30, 9th ed.;
 * some editions call the load factor n_p). The load factor is extended past separation: once the joint
 * opens the bolt takes the whole load, so the proof load is reached at P = F_p instead.
 *
 * Formula: $n_p = \dfrac{S_p A_t}{C P + F_i},\quad n_L = \dfrac{S_p A_t - F_i}{C P}\ \text{(while } S_p A_t \le P_0\text{, else } S_p A_t / P),\quad n_0 = \dfrac{F_i}{P(1 - C)}$
 *
 * @param preload F_i [N], 0 or more
 * @param stiffnessFactor C [-], greater than 0 and less than 1
 * @param externalLoad P per bolt [N], greater than 0
 * @param proofLoad F_p = S_p A_t [N], greater than 0
 * @returns n_p, n_L and n_0 [-]
 *
 * Assumptions: static load; the bolt is judged at its proof load as Shigley does. A bolt tightened
 * to 0.75 F_p starts with n_p = 1.33 at most, whatever the load: most of its strength is already used.
 *
 * @example
 * tensionJointFactors({ preload: 14400, stiffnessFactor: 0.368, externalLoad: 6000, proofLoad: 19210 }) // → { yieldFactor: 1.16, loadFactor: 2.18, separationFactor: 3.80 } (Shigley Ex. 8-4, in lbf)
 *
 * Sources: shigley-mechanical-design.
 */
export function tensionJointFactors(input: { preload: number; stiffnessFactor: number; externalLoad: number; proofLoad: number }): TensionJointFactors {
  const { preload, stiffnessFactor, externalLoad, proofLoad } = requireInputObject(input);
  requirePositive("externalLoad", externalLoad, "N");
  requirePositive("proofLoad", proofLoad, "N");
  const { boltLoad, separationLoad } = tensionJointLoads({ preload, stiffnessFactor, externalLoad });
  const yieldFactor = proofLoad / boltLoad; // shigley-mechanical-design Eq. 8-28
  let loadAtProof: number;
  // Stryker disable next-line EqualityOperator: equivalent, at F_i = F_p the next branch also gives (F_p − F_i)/C = 0
  if (preload >= proofLoad) loadAtProof = 0;
  // Stryker disable next-line EqualityOperator: equivalent, at F_p = F_i/(1 − C) both branches give F_p
  else if (proofLoad <= separationLoad)
    loadAtProof = (proofLoad - preload) / stiffnessFactor; // shigley-mechanical-design Eq. 8-29
  else loadAtProof = proofLoad; // separated: the bolt alone carries P
  return {
    yieldFactor: requireFiniteResult(yieldFactor, "yield factor", { externalLoad: [externalLoad, "N"] }),
    loadFactor: requireFiniteResult(loadAtProof / externalLoad, "load factor", { externalLoad: [externalLoad, "N"] }),
    separationFactor: requireFiniteResult(separationLoad / externalLoad, "separation factor", { externalLoad: [externalLoad, "N"] }), // shigley-mechanical-design Eq. 8-30
  };
}

// ---------------------------------------------------------------------------------------------
