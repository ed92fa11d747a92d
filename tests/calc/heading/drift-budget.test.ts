/**
 * The drift-budget check of calc/heading/drift-budget.ts: its verdict at the closed end of the
 * budget, with no estimate, and its refusal of a plot range upside down. Reference values are
 * derived by hand from ω̂² = (a_meas − b̂)/r̂ with a_meas = ω²r (centripetal a = ω²r, OpenStax College
 * Physics ch. 6), on radii picked so the arithmetic is exact in binary.
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { type HeadingDriftResult, headingDrift } from "../../../calc/heading/drift-budget.ts";
import type { HeadingDriftInput } from "../../../calc/heading/drift-inputs.ts";

/** r̂ = 1/128 m, r = 9/512 m: ω̂/ω = √(r/r̂) = √(9/4) = 1.5, so at ω = 2 rad/s the drift is exactly 1 rad/s. */
const BASE: HeadingDriftInput = {
  angularSpeed: 2,
  assumedRadius: 0.0078125,
  trueRadius: 0.017578125,
  scaleError: 0,
  bias: 0,
  biasCorrection: 0,
  tilt: 0,
  budget: 1,
  lowSpeed: 1,
  highSpeed: 3,
  accelerationNoise: 0,
};

const check = (fields: Partial<HeadingDriftInput>): HeadingDriftResult => headingDrift({ ...BASE, ...fields });

describe("the drift-budget verdict", () => {
  it("counts a drift exactly at the budget as within it, with no margin left: ω̂ = 1.5 × 2 = 3 rad/s, drift 1 rad/s, budget 1 rad/s", () => {
    const r = check({});
    expect(r.atSpeed.driftRate).toBe(1);
    expect(r.verdict).toBe("within-budget");
    expect(r.budgetMargin).toBe(0);
  });

  it("is over budget when the budget is a little smaller than the drift (0.9 rad/s: 0.1 rad/s over)", () => {
    const r = check({ budget: 0.9 });
    expect(r.verdict).toBe("over-budget");
    expect(r.budgetMargin!).toBeCloseTo(-0.1, 12);
  });

  it("has no verdict, margin or noise figure when the corrected reading is 0 or less (b̂ = 0.25 m/s² over ω²r = 4 × 9/512 = 0.0703 m/s²)", () => {
    const r = check({ biasCorrection: 0.25, accelerationNoise: 0.1 });
    expect(r.atSpeed.defined).toBe(false);
    expect(r.verdict).toBe("no-estimate");
    expect(r.budgetMargin).toBeNull();
    expect(r.rateNoise).toBeNull();
  });

  it("refuses a plot range whose top is not above its bottom, in rad/s", () => {
    let error: unknown;
    try {
      check({ lowSpeed: 3, highSpeed: 3 });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(CalcInputError);
    const refusal = error as CalcInputError;
    expect(refusal.param).toBe("highSpeed");
    expect(refusal.unit).toBe("rad/s");
    expect(refusal.bound).toEqual({ relation: "greater", limit: 3, kind: "angularSpeed", other: "lowSpeed" });
    expect(refusal.message).toBe("highSpeed must be greater than lowSpeed (3 rad/s) (got 3 rad/s)");
  });
});
