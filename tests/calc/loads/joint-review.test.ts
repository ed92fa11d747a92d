/**
 * The engineering review's cases as the builder now sees them: the chapter's washer stack names its
 * governing mode (friction, then bending once slipped) instead of "holds, safety factor 22", the
 * joint check takes shear by one rule for 10.9 and 12.9, and every bolt strength carries its basis
 * on the build sheet. Values marked "regression pin" are our own digits (python3 from the same
 * formulas); the others name their published source.
 */
import { describe, expect, it } from "vitest";
import fasteners from "../../../calc/calculators/fasteners.ts";
import { cardsFor } from "../../../calc/design/checks.ts";
import { initialValues } from "../../../calc/core/calculator.ts";
import { DEMO_WASHER_JOINT, demoRobotLoads } from "../../../calc/loads/index.ts";
import { boltedJointCheck } from "../../../calc/loads/joint.ts";
import type { BoltedJointInput } from "../../../calc/loads/joint-inputs.ts";
import { FASTENER_GRADE_OPTIONS, fastenerGrade } from "../../../calc/loads/inch-fasteners.ts";

const MPa = 1e6;

function expectClose(actual: number, expected: number, rtol: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));
}

const demo = demoRobotLoads();

describe("the chapter's washer stack as a joint (invented demo: 42 g at 55 mm, 2400 rpm, one M4 8.8 and a nut, 8.4 mm stack)", () => {
  it("is bolted as the chapter says: seven 1.2 mm washers, 75 % of proof, K = 0.2, μ = 0.2, a nut", () => {
    expect(demo.jointInput).toMatchObject({
      size: "M4",
      grade: "8.8",
      jointMode: "shear",
      threadIn: "nut",
      preloadShare: 0.75,
      nutFactor: 0.2,
      frictionCoefficient: 0.2,
    });
    expect(demo.jointInput.stackHeight).toBe(DEMO_WASHER_JOINT.stackHeight);
    expectClose(DEMO_WASHER_JOINT.stackHeight / 7, 0.0012, 1e-12);
  });

  it("names friction as governing (regression pin 5.235 064 89), with the slipped bolt's bending next (1.584 842 21), not the average shear's 22.2", () => {
    const joint = demo.joint;
    expect(joint.governs).toBe("friction");
    expect(joint.verdict).toBe("holds");
    expectClose(joint.safetyFactor, 5.23506489, 1e-8);
    expectClose(joint.safetyFactors.bending!, 1.584842213, 1e-9);
    expectClose(joint.safetyFactors.shear!, 22.23423355, 1e-9);
    // The earlier average-shear check of the same bolt gave 22.2 (shigley-distortion-energy yield, ISO 898-1 A_s = 8.78 mm²).
    expectClose(demo.bolt.safetyFactor, 22.2, 5e-3);
    expect(joint.reason).toContain("bent over the 8.40 mm stack");
  });

  it("lets bending govern once the clamp is gone: the same bolt untightened is marginal (regression pin 1.584 842 21)", () => {
    const loose = boltedJointCheck({ ...demo.jointInput, preloadShare: 0 });
    expect(loose.governs).toBe("bending");
    expect(loose.verdict).toBe("marginal");
    expectClose(loose.safetyFactor, 1.584842213, 1e-9);
  });

  it("bends at σ_b = 403 MPa over the stack (the review's cantilever figure for 8.4 mm at V = 146 N, regression pin 403.04)", () => {
    expectClose(demo.joint.slip!.bendingStress, 402.7985 * MPa, 2e-3);
  });

  it("shows the governing mode on the build sheet's card, beside the bending factor", () => {
    const [card] = cardsFor(fasteners, { ...initialValues(fasteners), ...demo.jointInput }, "metric");
    expect(card!.status).toBe("holds");
    expect(card!.margin).toContain("friction (the clamp) governs, safety factor 5.24");
    expect(card!.details.map((d) => [d.label, d.text])).toContainEqual(["Safety factor, bolt bending over the stack", "1.58"]);
  });
});

describe("one shear rule in the joint check (ISO 898-1 Table 3 minimums, τ_y = R_p0.2/√3 below τ_u = 0.6 R_m)", () => {
  const base = { ...(initialValues(fasteners) as unknown as BoltedJointInput), preloadShare: 0, stackHeight: 0, threadIn: "nut" };
  it.each([
    { grade: "10.9", yieldMin: 940, tensileMin: 1040 },
    { grade: "12.9", yieldMin: 1100, tensileMin: 1220 },
  ])("class $grade: the slipped bolt's shear factor is τ_y/τ with τ_y = $yieldMin MPa/√3 (iso-898-1 Table 3)", ({ grade, yieldMin, tensileMin }) => {
    const check = boltedJointCheck({ ...base, grade });
    expectClose(check.strengths.shearYield, (yieldMin * MPa) / Math.sqrt(3), 1e-12);
    expectClose(check.strengths.shearUltimate, 0.6 * tensileMin * MPa, 1e-12);
    expect(check.strengths.shearYield).toBeLessThan(check.strengths.shearUltimate);
    expectClose(check.safetyFactors.shear!, check.strengths.shearYield / check.slip!.shearStress, 1e-12);
    expect(check.governs).toBe("shear");
  });
});

describe("the basis of every bolt strength", () => {
  it.each(FASTENER_GRADE_OPTIONS.map((o) => o.value))("grade %s: specified minimum values of its standard", (id) => {
    const grade = fastenerGrade(id);
    expect(grade.basis).toBe("specified minimum");
    expect(grade.standard).toBe(grade.system === "metric" ? "iso-898-1" : id === "a574" ? "astm-a574" : "sae-j429");
  });

  it("states the basis on the build sheet's card: the bolt's standard, and the tapped part's typical values", () => {
    const [metric] = cardsFor(fasteners, initialValues(fasteners), "metric");
    expect(metric!.rule).toContain("class 8.8 in shear, ISO 898-1 specified minimum strengths; part thread typical values");
    const [inch] = cardsFor(fasteners, { ...initialValues(fasteners), size: "1/4-20", grade: "a574", threadIn: "nut" }, "us");
    expect(inch!.rule).toContain("ASTM A574 socket head in shear, ASTM A574 specified minimum strengths)");
  });
});
