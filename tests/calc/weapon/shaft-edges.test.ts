/**
 * The round shaft at its edges: a hollow section's area, a bore as large as the diameter or
 * negative, a bore or a diameter that leaves a second moment of area too small for a double, and
 * each stress refused by the input that took it past the largest double, named with its unit.
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { bendingStress, roundSection, torsionalStress } from "../../../calc/weapon/shaft.ts";

/** The largest double below a positive `x`. */
function nextDown(x: number): number {
  const bits = new BigInt64Array(new Float64Array([x]).buffer);
  bits[0]! -= 1n;
  return new Float64Array(bits.buffer)[0]!;
}

/** The CalcInputError `run` throws. */
function refusal(run: () => unknown): CalcInputError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(CalcInputError);
    return error as CalcInputError;
  }
  return expect.unreachable("no CalcInputError");
}

describe("roundSection at its edges", () => {
  it("gives a hollow section's area π(d² − d_i²)/4: 20 mm with a 10 mm bore is 2.356 cm²", () => {
    // By hand: π × (0.02² − 0.01²)/4 = π × 3e-4/4 = 2.35619449e-4 m².
    expect(roundSection({ diameter: 0.02, bore: 0.01 }).area).toBeCloseTo(2.35619449e-4, 12);
    // Solid 12 mm: π × 0.012²/4 = 1.13097336e-4 m².
    expect(roundSection({ diameter: 0.012 }).area).toBeCloseTo(1.13097336e-4, 12);
  });

  it("refuses a bore as large as the diameter, naming the bore and the diameter it must stay below", () => {
    const error = refusal(() => roundSection({ diameter: 0.012, bore: 0.012 }));
    expect([error.param, error.value, error.unit]).toEqual(["bore", 0.012, "m"]);
    expect(error.message).toBe("bore must be less than the outer diameter (0.012 m) (got 0.012 m)");
    expect(refusal(() => roundSection({ diameter: 0.012, bore: 0.02 })).message).toBe("bore must be less than the outer diameter (0.012 m) (got 0.02 m)");
  });

  it("refuses a negative bore by name rather than reading it as its size", () => {
    const error = refusal(() => roundSection({ diameter: 0.012, bore: -0.004 }));
    expect([error.param, error.value, error.unit]).toEqual(["bore", -0.004, "m"]);
    expect(error.message).toBe("bore must be 0 m or more (got -0.004 m)");
  });

  it("refuses a bore that leaves a wall whose second moment underflows by the bore, when the solid section would have one", () => {
    // d = 1e-80 m: solid, I = π × 1e-320/64 = 4.9e-322 m⁴, a (subnormal) double above 0. With the bore
    // one double below d, d² − d_i² ≈ 4.7e-176 and (d² − d_i²)(d² + d_i²) ≈ 9e-336 rounds to 0.
    const diameter = 1e-80;
    const bore = nextDown(diameter);
    expect(roundSection({ diameter }).secondMoment).toBeGreaterThan(0);
    const error = refusal(() => roundSection({ diameter, bore }));
    expect([error.param, error.value, error.unit]).toEqual(["bore", bore, "m"]);
    expect(error.expected).toBe("small enough to leave a wall with a second moment of area above 0");
  });

  it("refuses a solid diameter whose fourth power underflows (1e-90 m) by the diameter", () => {
    const error = refusal(() => roundSection({ diameter: 1e-90 }));
    expect(error.message).toBe("diameter must be large enough for the second moment of area to be above 0 (got 1e-90 m)");
  });
});

describe("the stresses at the edge of the doubles", () => {
  it("refuses a bending stress past the largest double by the moment when the moment took it there", () => {
    // σ = 32M/(πd³) = 32 × 1e300/(π × 1e-9) ≈ 1e310: the moment is the input furthest from 1.
    expect(refusal(() => bendingStress({ moment: 1e300, diameter: 0.001 })).message).toBe(
      "moment must be small enough for the bending stress to stay finite (got 1e+300 N·m)",
    );
  });

  it("refuses a bending stress past the largest double by the diameter when the diameter took it there", () => {
    // σ = 32 × 1e75/(π × 1e-234) ≈ 1e309, and 1e-78 m is 78 orders of magnitude from 1, the moment 75.
    expect(refusal(() => bendingStress({ moment: 1e75, diameter: 1e-78 })).message).toBe(
      "diameter must be large enough for the bending stress to stay finite (got 1e-78 m)",
    );
  });

  it("refuses a torsional stress past the largest double by the torque or the diameter, whichever took it there", () => {
    // τ = 16T/(πd³): 16 × 1e300/(π × 1e-9) ≈ 5e309; 16 × 1e75/(π × 1e-234) ≈ 5e309.
    expect(refusal(() => torsionalStress({ torque: 1e300, diameter: 0.001 })).message).toBe(
      "torque must be small enough for the torsional stress to stay finite (got 1e+300 N·m)",
    );
    expect(refusal(() => torsionalStress({ torque: 1e75, diameter: 1e-78 })).message).toBe(
      "diameter must be large enough for the torsional stress to stay finite (got 1e-78 m)",
    );
  });

  it("gives a torsional stress that is a double even when T·r alone is not (T = 1.5e308 N·m on a 4 m shaft)", () => {
    // τ = 16T/(πd³) = 16 × 1.5e308/(π × 64) = 1.1937e307 Pa, though T·r = 3e308 passes the largest double.
    expect(torsionalStress({ torque: 1.5e308, diameter: 4 }) / ((0.25 * 1.5e308) / Math.PI)).toBeCloseTo(1, 12);
  });
});
