import { describe, expect, it } from "vitest";
import { declaredInputs, requireDeclared, requireFiniteFields, requireFiniteResult, requireWithinSpecs } from "../../../calc/core/spec-check.ts";
import { defineInputs } from "../../../calc/core/inputs.ts";
import { expectRefusal } from "../../support/refusal.ts";

describe("requireDeclared and requireWithinSpecs: what is refused before any range check", () => {
  it("names an input the declaration does not hold (its spec missing or null)", () => {
    expectRefusal(() => requireDeclared(undefined as never, "colour", 3), "colour", 3, "", "colour must be an input this calculator declares (got 3)");
    expectRefusal(() => requireDeclared(null as never, "colour", 3), "colour", 3, "", "colour must be an input this calculator declares (got 3)");
  });

  it("names a missing declaration as specs", () => {
    expectRefusal(() => requireWithinSpecs(null as never, {}), "specs", null, "", "specs must be an object of named inputs (got null)");
  });
});

describe("requireFiniteResult: the input named when a result leaves the doubles", () => {
  it("with no inputs to blame, names the result itself as input", () => {
    expectRefusal(
      () => requireFiniteResult(Number.POSITIVE_INFINITY, "moment", {}),
      "input",
      Number.POSITIVE_INFINITY,
      "",
      "input must be small enough for the moment to stay finite (got infinity)",
    );
  });

  it("calls a function listing the inputs only when the result is not finite", () => {
    let calls = 0;
    const inputs = () => {
      calls += 1;
      return { radius: [1e300, "m"] as const, mass: [2, "kg"] as const };
    };
    expect(requireFiniteResult(5, "moment", inputs)).toBe(5);
    expect(calls).toBe(0);
    expectRefusal(
      () => requireFiniteResult(Number.NaN, "moment", inputs),
      "radius",
      1e300,
      "m",
      "radius must be small enough for the moment to stay finite (got 1e+300 m)",
    );
    expect(calls).toBe(1);
  });

  it("asks for a smaller value from 1 up (|1| is 0 orders of magnitude from 1) and a larger one below", () => {
    expectRefusal(
      () => requireFiniteResult(Number.POSITIVE_INFINITY, "moment", { mass: [1, "kg"] }),
      "mass",
      1,
      "kg",
      "mass must be small enough for the moment to stay finite (got 1 kg)",
    );
    expectRefusal(
      () => requireFiniteResult(Number.POSITIVE_INFINITY, "moment", { gap: [1e-300, "m"] }),
      "gap",
      1e-300,
      "m",
      "gap must be large enough for the moment to stay finite (got 1e-300 m)",
    );
  });
});

describe("requireFiniteFields: every number in a result, deeply", () => {
  it("passes a result holding null, text and a function, and refuses one with an infinity in a list", () => {
    const result = { a: null, b: "text", c: () => 0, d: [1, { e: 2 }] };
    expect(requireFiniteFields(result, "profile", {})).toBe(result);
    expectRefusal(
      () => requireFiniteFields({ d: [1, { e: Number.POSITIVE_INFINITY }] }, "profile", { rim: [2, "m"] }),
      "rim",
      2,
      "m",
      "rim must be small enough for the profile to stay finite (got 2 m)",
    );
  });
});

describe("declaredInputs: the declared inputs of an input object, each with its SI unit, as the finiteness guards name them", () => {
  const specs = defineInputs({
    radius: { label: "Radius", kind: "length", min: 0, max: 1, default: 0.1, urlKey: "r" },
    topSpeed: { label: "Top speed", kind: "angularSpeed", min: 0, max: 1000, default: 100, urlKey: "rpm" },
    margin: { label: "Margin", kind: "fraction", min: 0, max: 1, default: 0.2, urlKey: "m" },
  });

  it("reads each declared field as a number, ignores the others and names a missing object", () => {
    expect(declaredInputs(specs, { radius: 0.02, topSpeed: "300", colour: "red" })).toEqual({
      radius: [0.02, "m"],
      topSpeed: [300, "rad/s"],
      margin: [Number.NaN, ""],
    });
    expectRefusal(() => declaredInputs(specs, null), "input", null, "", "input must be an object of named inputs (got null)");
  });
});
