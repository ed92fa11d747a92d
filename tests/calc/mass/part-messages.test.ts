/**
 * A part's problem in the parts editor's words (calc/mass/part-messages.ts): the field's label, the
 * rule with its limits and the value received, in the units the editor shows (mm and g, or in and
 * oz). 1 in = 25.4 mm, 1 oz = 28.349 523 125 g (NIST SP 811, appendix B).
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { describePartProblem } from "../../../calc/mass/part-messages.ts";

const refusal = (param: string, value: unknown, extra: Partial<ConstructorParameters<typeof CalcInputError>[0]> = {}) =>
  new CalcInputError({ param, value, expected: "greater than 0 m", unit: "m", ...extra });

describe("a part's problem in the editor's words", () => {
  it("says a thing that is not a refusal is not a valid part", () => {
    expect(describePartProblem(new Error("boom"))).toEqual({ label: "The part", rule: "is not a valid part" });
  });

  it("gives a range in the editor's units, with the value received", () => {
    expect(describePartProblem(refusal("part.shape.radius", -0.005, { range: { min: 0, max: 2 } }))).toEqual({
      label: "Radius",
      rule: "must be greater than 0 mm and at most 2000 mm (got -5 mm)",
    });
    expect(describePartProblem(refusal("parts[2].shape.radius", -0.0254, { range: { min: 0, max: 2 } }), { system: "us" }).rule).toMatch(/\(got -1 in\)$/);
  });

  it("calls the thickness of a ring or a rod its section diameter, and of anything else its thickness", () => {
    const thin = refusal("part.mass.thickness", -0.001, { range: { min: 0, max: 2 } });
    expect(describePartProblem(thin, { shape: "ring" }).label).toBe("Section diameter");
    expect(describePartProblem(thin, { shape: "rod" }).label).toBe("Section diameter");
    expect(describePartProblem(thin, { shape: "disk" }).label).toBe("Thickness");
    expect(describePartProblem(thin).label).toBe("Thickness");
    // Only the thickness: a ring's radius is still its radius.
    expect(describePartProblem(refusal("part.shape.radius", -0.005, { range: { min: 0, max: 2 } }), { shape: "ring" }).label).toBe("Radius");
  });

  it("names the fields that hold no number by their words, and anything else as the part", () => {
    expect(describePartProblem(refusal("part.shape.kind", "blob", { expected: "one of point, disk, ring" }))).toEqual({
      label: "Shape",
      rule: "must be one of point, disk, ring",
    });
    expect(describePartProblem(refusal("part.mass.material", "mithril", { expected: "a known material" })).label).toBe("Material");
    expect(describePartProblem(refusal("part.colour", 3, { expected: "absent" }))).toEqual({ label: "The part", rule: "must be absent" });
    // The first segment of the path is the part itself ("part", "parts[2]"), never a field.
    expect(describePartProblem(refusal("mass", 3, { expected: "a part" })).label).toBe("The part");
  });

  it("says a missing value is missing", () => {
    expect(describePartProblem(refusal("part.x", undefined))).toEqual({ label: "x", rule: "is missing" });
    expect(describePartProblem(refusal("part.x", "missing"))).toEqual({ label: "x", rule: "is missing" });
  });

  it("says a value that is not a number must be a number, worded by the caller", () => {
    expect(describePartProblem(refusal("part.x", "abc"), { received: (v) => JSON.stringify(v) })).toEqual({ label: "x", rule: 'must be a number (got "abc")' });
    // Even when the rule it broke compares with a limit: the limit means nothing for text.
    const text = refusal("part.shape.radius", "abc", { bound: { kind: "length", relation: "greater", limit: 0 } });
    expect(describePartProblem(text, { received: (v) => JSON.stringify(v) })).toEqual({ label: "Radius", rule: 'must be a number (got "abc")' });
  });

  it("states a relation to another field by that field's label and value, or to a fixed limit by the limit", () => {
    const inner = refusal("part.shape.innerRadius", 0.05, { bound: { kind: "length", relation: "less", limit: 0.04, other: "outerRadius" } });
    expect(describePartProblem(inner).rule).toBe("must be less than the outer radius (40 mm) (got 50 mm)");
    const fixed = refusal("part.shape.radius", 0, { bound: { kind: "length", relation: "greater", limit: 0 } });
    expect(describePartProblem(fixed).rule).toBe("must be greater than 0 mm (got 0 mm)");
    const unknownOther = refusal("part.shape.radius", 0, { bound: { kind: "length", relation: "at-least", limit: 0.001, other: "colour" } });
    expect(describePartProblem(unknownOther).rule).toBe("must be at least 1 mm (got 0 mm)");
  });

  it("shows a custom part's own inertia in g·cm² unless told otherwise, the editor's unit, not kg·m²", () => {
    // 1 kg·m² = 1000 g × 10⁴ cm² = 10⁷ g·cm², so −10⁻⁴ kg·m² = −1000 g·cm².
    const own = refusal("part.shape.inertiaZ", -1e-4, { unit: "kg·m²", bound: { kind: "inertia", relation: "at-least", limit: 0 } });
    expect(describePartProblem(own)).toEqual({ label: "Own inertia about z", rule: "must be at least 0 g·cm² (got -1000 g·cm²)" });
  });

  it("shows a mass in grams, or ounces in US units", () => {
    const heavy = refusal("part.mass.mass", 200, { unit: "kg", range: { min: 0, max: 100 } });
    expect(describePartProblem(heavy).rule).toMatch(/\(got 200000 g\)$/);
    expect(describePartProblem(heavy, { system: "us" }).rule).toMatch(/\(got 7054\.79 oz\)$/);
  });
});
