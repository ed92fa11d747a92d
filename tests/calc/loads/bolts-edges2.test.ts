/**
 * The bolt formulas and their shared checks at their edges: a bolt stress that would overflow,
 * refused naming the input furthest from 1 (the rule of requireFiniteResult in
 * calc/core/spec-check.ts); a stress curve that ends exactly at the top speed asked for; a point
 * count that is not whole; the thresholds' bound as data; and the von Mises stress of a value that
 * is not finite or would overflow.
 */
import { describe, expect, it } from "vitest";
import { boltStress, FASTENER_CHOICE_DEFAULTS, type fastenerCheck, fastenerCheckInputs, fastenerStressCurve } from "../../../calc/loads/bolts.ts";
import { vonMisesStress } from "../../../calc/loads/common.ts";
import { RIM_CHOICE_DEFAULTS, rimCheck, rimCheckInputs, rimStressProfile } from "../../../calc/loads/rims.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

const defaultsOf = (specs: Record<string, { default: number }>) => Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.default]));
const FASTENER = { ...defaultsOf(fastenerCheckInputs), ...FASTENER_CHOICE_DEFAULTS } as Parameters<typeof fastenerCheck>[0];
const RIM = { ...defaultsOf(rimCheckInputs), ...RIM_CHOICE_DEFAULTS } as Parameters<typeof rimCheck>[0];

describe("a bolt stress F/(nA) that would leave the doubles", () => {
  it("names the force in newtons when it is the furthest from 1", () => {
    expectRefusal(
      () => boltStress({ force: 1e300, count: 1, area: 1e-10 }),
      "force",
      1e300,
      "N",
      "force must be small enough for the bolt stress to stay finite (got 1e+300 N)",
    );
  });

  it("names the area in square metres as too small when it is the furthest from 1", () => {
    expectRefusal(
      () => boltStress({ force: 1e10, count: 1, area: 1e-300 }),
      "area",
      1e-300,
      "m²",
      "area must be large enough for the bolt stress to stay finite (got 1e-300 m²)",
    );
  });
});

describe("the stress curve's ends", () => {
  it("ends exactly at the top speed, where ω_max·3/3 would miss it by an ulp (2400 rpm, 4 points)", () => {
    // 251.32741228718345 × 3 / 3 = 251.32741228718342 in doubles.
    const top = 251.32741228718345;
    const curve = fastenerStressCurve(FASTENER, { maxSpeed: top, points: 4 });
    expect(curve.map((p) => p.angularSpeed)).toEqual([0, top / 3, (top * 2) / 3, top]);
    expect(curve[3]!.stress).toBe(fastenerStressCurve(FASTENER, { maxSpeed: top, points: 2 })[1]!.stress);
  });
});

describe("the loads' shared checks", () => {
  it("refuses a point count that is not a whole number", () => {
    expectRefusal(() => rimStressProfile(RIM, { points: 2.5 }), "points", 2.5, "", "points must be a whole number (got 2.5)");
  });

  it("refuses a marginal threshold below the failure one, with the limit as a fraction from that field", () => {
    const error = refusal(() => rimCheck({ ...RIM, failBelow: 2, marginalBelow: 1.5 }));
    expect([error.param, error.value, error.unit]).toEqual(["marginalBelow", 1.5, ""]);
    expect(error.bound).toEqual({ relation: "at-least", limit: 2, kind: "fraction", other: "failBelow" });
  });

  it("refuses a von Mises stress of a stress that is not finite, naming it in pascals", () => {
    expectRefusal(
      () => vonMisesStress({ normalStress: Number.NaN, shearStress: 1e6 }),
      "normalStress",
      Number.NaN,
      "Pa",
      "normalStress must be a finite number (got not a number)",
    );
    expectRefusal(
      () => vonMisesStress({ normalStress: 1e6, shearStress: Number.POSITIVE_INFINITY }),
      "shearStress",
      Number.POSITIVE_INFINITY,
      "Pa",
      "shearStress must be a finite number (got infinity)",
    );
  });

  it("names the shear stress when √3 τ overflows, and the normal stress when √(σ² + 3τ²) does", () => {
    // √3 × 1.5e308 = 2.6e308, past the largest double (1.8e308).
    expectRefusal(
      () => vonMisesStress({ normalStress: 1, shearStress: 1.5e308 }),
      "shearStress",
      1.5e308,
      "Pa",
      "shearStress must be small enough for the equivalent stress to stay finite (got 1.5e+308 Pa)",
    );
    // √(1.7e308² + 3 × 1e308²) = 2.4e308.
    expectRefusal(
      () => vonMisesStress({ normalStress: 1.7e308, shearStress: 1e308 }),
      "normalStress",
      1.7e308,
      "Pa",
      "normalStress must be small enough for the equivalent stress to stay finite (got 1.7e+308 Pa)",
    );
  });
});
