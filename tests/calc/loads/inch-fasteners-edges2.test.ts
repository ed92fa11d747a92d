/**
 * The inch fastener tables at their edges: the pitch at which the root diameter reaches 0, the 6 in
 * the ASME B1.1 tolerance formulas are stated for, the 2A pitch tolerance of a 1/4-20 screw, the
 * words of each table lookup, and the grades' size scopes at both ends.
 */
import { describe, expect, it } from "vitest";
import { INCH } from "../../../calc/core/constants.ts";
import { fastenerGrade, fastenerThread, gradeForSize, inchGrade, unifiedClass2Limits, unifiedThreadDiameters } from "../../../calc/loads/inch-fasteners.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

describe("the Unified thread formulas at their edges", () => {
  it("refuses a pitch whose root diameter D − 1.299 038 P would be 0, and words the limit D ÷ 1.299 in metres", () => {
    // Root diameter 0 at P = D/(3√3/4) (asme-b1-1: d_r = D − 1.299 038 P).
    const D = 0.25 * INCH;
    const error = refusal(() => unifiedThreadDiameters({ nominalDiameter: D, pitch: D / ((3 * Math.sqrt(3)) / 4) }));
    expect([error.param, error.unit]).toEqual(["pitch", "m"]);
    // 0.00635 / 1.299 038 = 0.004 888 m.
    expectRefusal(
      () => unifiedThreadDiameters({ nominalDiameter: D, pitch: 0.005 }),
      "pitch",
      0.005,
      "m",
      "pitch must be less than the nominal diameter ÷ 1.299, 0.004888 m (got 0.005 m)",
    );
  });

  it("works a 6 in thread, the largest the tolerance formulas are stated for, and words the limit as 0.1524 m beyond it", () => {
    // 6-4 UNC (4 threads per inch, from memory) at exactly 6 in.
    const six = unifiedClass2Limits({ nominalDiameter: 6 * INCH, pitch: INCH / 4 });
    expect(six.externalMajorMin).toBeLessThan(6 * INCH);
    expectRefusal(
      () => unifiedClass2Limits({ nominalDiameter: 0.2, pitch: 0.005 }),
      "nominalDiameter",
      0.2,
      "m",
      "nominalDiameter must be at most 6 in (0.1524 m) (got 0.2 m)",
    );
  });

  it("gives a 1/4-20 screw the class 2A pitch tolerance 0.0037 in and allowance 0.0011 in (ASME B1.1 table, 1/4-20 UNC-2A pitch diameter 0.2164 to 0.2127 in, from memory)", () => {
    // T = 0.0015 × 0.25^(1/3) + 0.0015 × √0.25 + 0.015 × 0.05^(2/3) = 0.000945 + 0.00075 + 0.002036 = 0.003731 → 0.0037 in.
    const limits = unifiedClass2Limits({ nominalDiameter: 0.25 * INCH, pitch: INCH / 20 });
    expect(limits.pitchTolerance2A / INCH).toBeCloseTo(0.0037, 10);
    expect(limits.allowance2A / INCH).toBeCloseTo(0.0011, 10);
  });
});

describe("the lookups' words", () => {
  it("names an unknown inch grade under the grade field by default", () => {
    expect(refusal(() => inchGrade("sae-9")).param).toBe("grade");
  });

  it("says an inch thread's limits are of the 2A/2B classes", () => {
    expect(fastenerThread("1/4-20").toleranceClasses).toBe("2A/2B");
  });

  it("labels a grade with its own menu label", () => {
    expect(fastenerGrade("sae-5").label).toBe("SAE J429 grade 5");
    expect(fastenerGrade("10.9").label).toBe("10.9 (Q&T)");
  });
});

describe("the grades' size scopes at their ends", () => {
  it("gives the ISO classes the sizes of the table, M2 to M12, and finds both ends within scope", () => {
    expect(fastenerGrade("8.8").scope).toEqual([0.002, 0.012]);
    expect(gradeForSize({ grade: "8.8", size: "M2" })).toMatchObject({ withinScope: true, scopeNote: "" });
    expect(gradeForSize({ grade: "8.8", size: "M12" })).toMatchObject({ withinScope: true, scopeNote: "" });
  });

  it("finds a 1/4 in screw within SAE J429, whose rows start at 1/4 in (Shigley Table 8-9 size ranges)", () => {
    expect(gradeForSize({ grade: "sae-5", size: "1/4-20" }).withinScope).toBe(true);
    expect(gradeForSize({ grade: "sae-5", size: "#10-24" }).withinScope).toBe(false);
  });
});
