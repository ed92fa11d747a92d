/**
 * calc/core/spec-check.ts at its edges: a declared input exactly on its limits, the words of each
 * refusal, and which input the finiteness guard blames when a result leaves the doubles.
 */
import { describe, expect, it } from "vitest";
import { defineInputs, type InputSpec } from "../../../calc/core/inputs.ts";
import {
  declaredInputs,
  ratioOrNull,
  requireDeclared,
  requireFiniteFields,
  requireFiniteResult,
  requireInputObject,
  requireList,
  requireWhole,
  requireWithinSpecs,
  siSymbol,
} from "../../../calc/core/spec-check.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

const specs = defineInputs({
  radius: { label: "Radius", kind: "length", min: 0, max: 1, minOpen: true, default: 0.02, urlKey: "r" },
  margin: { label: "Margin", kind: "fraction", min: 0, max: 0.95, default: 0.2, urlKey: "m" },
  count: { label: "Count", kind: "count", min: 1, max: 12, integer: true, default: 2, urlKey: "n" },
  inertia: { label: "Inertia", kind: "inertia", min: 1.234567e-7, max: 10, default: 1, urlKey: "i" },
});

describe("siSymbol", () => {
  it("gives the symbol of the kind's SI unit, empty for a ratio and a count", () => {
    expect(siSymbol({ kind: "length" })).toBe("m");
    expect(siSymbol({ kind: "inertia" })).toBe("kg·m²");
    expect(siSymbol({ kind: "angularSpeed" })).toBe("rad/s");
    expect(siSymbol({ kind: "fraction" })).toBe("");
    expect(siSymbol({ kind: "count" })).toBe("");
  });
});

describe("requireInputObject", () => {
  it.each([
    { input: null, got: "null" },
    { input: undefined, got: "nothing" },
    { input: 5, got: "5" },
    { input: "r=1", got: '"r=1"' },
    { input: () => 0, got: "a function" },
  ])("refuses $got by name", ({ input, got }) => {
    expectRefusal(() => requireInputObject(input), "input", input, "", `input must be an object of named inputs (got ${got})`);
    expect(refusal(() => requireInputObject(input, "options")).message).toBe(`options must be an object of named inputs (got ${got})`);
  });

  it("returns an object, and a list too (its fields are then checked one by one)", () => {
    const input = { radius: 1 };
    expect(requireInputObject(input)).toBe(input);
    expect(requireInputObject([])).toEqual([]);
  });
});

describe("requireDeclared exactly on its limits", () => {
  it("refuses the open low end and takes the closed high end", () => {
    expectRefusal(() => requireDeclared(specs.radius, "radius", 0), "radius", 0, "m", "radius must be greater than 0 m and at most 1 m (got 0 m)");
    expect(requireDeclared(specs.radius, "radius", 5e-324)).toBe(5e-324);
    expect(requireDeclared(specs.radius, "radius", 1)).toBe(1);
    expectRefusal(
      () => requireDeclared(specs.radius, "radius", 1.0000000000000002),
      "radius",
      1.0000000000000002,
      "m",
      "radius must be greater than 0 m and at most 1 m (got 1 m)",
    );
  });

  it("takes a closed low end, and words it 'at least'", () => {
    expect(requireDeclared(specs.margin, "margin", 0)).toBe(0);
    expectRefusal(() => requireDeclared(specs.margin, "margin", -0.01), "margin", -0.01, "", "margin must be at least 0 and at most 0.95 (got -0.01)");
  });

  it("refuses a fraction where a whole number is declared, and says so", () => {
    expect(requireDeclared(specs.count, "count", 12)).toBe(12);
    expectRefusal(() => requireDeclared(specs.count, "count", 2.5), "count", 2.5, "", "count must be a whole number at least 1 and at most 12 (got 2.5)");
    expectRefusal(() => requireDeclared(specs.count, "count", 13), "count", 13, "", "count must be a whole number at least 1 and at most 12 (got 13)");
  });

  it("writes the limits to six figures", () => {
    expectRefusal(
      () => requireDeclared(specs.inertia, "inertia", 0),
      "inertia",
      0,
      "kg·m²",
      "inertia must be at least 1.23457e-7 kg·m² and at most 10 kg·m² (got 0 kg·m²)",
    );
  });

  it("refuses what is not a finite number, and a name the declaration does not hold", () => {
    expectRefusal(() => requireDeclared(specs.radius, "radius", "0.02"), "radius", "0.02", "m", 'radius must be a finite number (got "0.02")');
    expectRefusal(() => requireDeclared(specs.radius, "radius", Number.NaN), "radius", Number.NaN, "m", "radius must be a finite number (got not a number)");
    expectRefusal(
      () => requireDeclared(undefined as unknown as InputSpec, "speed", 3),
      "speed",
      3,
      "",
      "speed must be an input this calculator declares (got 3)",
    );
    expectRefusal(() => requireDeclared(null as unknown as InputSpec, "speed", 3), "speed", 3, "", "speed must be an input this calculator declares (got 3)");
    // A name that is not text is named as text.
    expectRefusal(() => requireDeclared(null as unknown as InputSpec, 7 as never, 3), "7", 3, "", "7 must be an input this calculator declares (got 3)");
  });
});

describe("requireWithinSpecs and requireWhole", () => {
  it("returns only the declared inputs, as numbers", () => {
    expect(requireWithinSpecs(specs, { radius: 0.5, margin: 0.1, count: 3, inertia: 2, colour: "red" })).toEqual({
      radius: 0.5,
      margin: 0.1,
      count: 3,
      inertia: 2,
    });
  });

  it("refuses the first bad input in declaration order, and a missing one as nothing", () => {
    expect(refusal(() => requireWithinSpecs(specs, { radius: 0, margin: 2, count: 3, inertia: 2 })).param).toBe("radius");
    expectRefusal(
      () => requireWithinSpecs(specs, { radius: 0.5, margin: 0.1, inertia: 2 }),
      "count",
      undefined,
      "",
      "count must be a finite number (got nothing)",
    );
  });

  it("refuses a missing declaration or input object by name", () => {
    expectRefusal(() => requireWithinSpecs(null as never, {}), "specs", null, "", "specs must be an object of named inputs (got null)");
    expectRefusal(() => requireWithinSpecs(specs, undefined), "input", undefined, "", "input must be an object of named inputs (got nothing)");
  });

  it("requireWhole takes both ends and refuses a fraction", () => {
    expect(requireWhole("teeth", 1, 1, 200)).toBe(1);
    expect(requireWhole("teeth", 200, 1, 200)).toBe(200);
    expectRefusal(() => requireWhole("teeth", 0, 1, 200), "teeth", 0, "", "teeth must be a whole number at least 1 and at most 200 (got 0)");
    expectRefusal(() => requireWhole("teeth", 12.5, 1, 200), "teeth", 12.5, "", "teeth must be a whole number at least 1 and at most 200 (got 12.5)");
  });
});

describe("requireFiniteResult: which input it blames", () => {
  it("returns a finite result without asking for the inputs", () => {
    let asked = 0;
    expect(
      requireFiniteResult(-Number.MAX_VALUE, "moment", () => {
        asked += 1;
        return {};
      }),
    ).toBe(-Number.MAX_VALUE);
    expect(asked).toBe(0);
  });

  it("blames the input furthest from 1 in orders of magnitude, large or small", () => {
    // |log10 1e200| = 200 < |log10 1e-250| = 250: the small one took the result out of range.
    expectRefusal(
      () => requireFiniteResult(Number.POSITIVE_INFINITY, "gyroscopic moment", { inertia: [1e200, "kg·m²"], time: [1e-250, "s"] }),
      "time",
      1e-250,
      "s",
      "time must be large enough for the gyroscopic moment to stay finite (got 1e-250 s)",
    );
    expectRefusal(
      () => requireFiniteResult(Number.NaN, "stress", () => ({ force: [-1e300, "N"], area: [1e-3, "m²"] })),
      "force",
      -1e300,
      "N",
      "force must be small enough for the stress to stay finite (got -1e+300 N)",
    );
  });

  it("keeps the first of two inputs equally far from 1, and counts an input of 0 as 1", () => {
    expect(refusal(() => requireFiniteResult(Number.NaN, "x", { a: [1e10, "m"], b: [1e-10, "s"] })).param).toBe("a");
    expect(refusal(() => requireFiniteResult(Number.NaN, "x", { a: [0, "m"], b: [2, "s"] })).param).toBe("b");
    expect(refusal(() => requireFiniteResult(Number.NaN, "x", { a: [0, "m"], b: [1, "s"] })).param).toBe("a");
  });

  it("asks for a smaller value of an input of exactly 1, and a larger one below 1", () => {
    expect(refusal(() => requireFiniteResult(Number.NaN, "x", { a: [1, "m"] })).expected).toBe("small enough for the x to stay finite");
    expect(refusal(() => requireFiniteResult(Number.NaN, "x", { a: [-1, "m"] })).expected).toBe("small enough for the x to stay finite");
    expect(refusal(() => requireFiniteResult(Number.NaN, "x", { a: [0.9999999999999999, "m"] })).expected).toBe("large enough for the x to stay finite");
  });

  it("names the result itself when it has no inputs to blame", () => {
    expectRefusal(
      () => requireFiniteResult(Number.POSITIVE_INFINITY, "energy", {}),
      "input",
      Number.POSITIVE_INFINITY,
      "",
      "input must be small enough for the energy to stay finite (got infinity)",
    );
    expectRefusal(
      () => requireFiniteResult(Number.NaN, "energy", {}),
      "input",
      Number.NaN,
      "",
      "input must be large enough for the energy to stay finite (got not a number)",
    );
  });
});

describe("requireFiniteFields, ratioOrNull, requireList, declaredInputs", () => {
  it("returns the very result when every number in it, however deep, is finite", () => {
    const result = { a: 1, list: [1, { b: 2, text: "x", none: null, flag: true }], nested: { c: [[3]] } };
    expect(requireFiniteFields(result, "profile", {})).toBe(result);
  });

  it("refuses a result with one non-finite number anywhere, naming the input", () => {
    const inputs = { radius: [1e-300, "m"] } as const;
    for (const bad of [{ a: Number.NaN }, [1, [2, Number.POSITIVE_INFINITY]], { a: { b: [{ c: Number.NEGATIVE_INFINITY }] } }, Number.NaN]) {
      expectRefusal(
        () => requireFiniteFields(bad, "profile", inputs),
        "radius",
        1e-300,
        "m",
        "radius must be large enough for the profile to stay finite (got 1e-300 m)",
      );
    }
  });

  it("ratioOrNull gives the quotient, or null when it is not finite", () => {
    expect(ratioOrNull(6, 3)).toBe(2);
    expect(ratioOrNull(0, 5)).toBe(0);
    expect(ratioOrNull(1, 0)).toBeNull();
    expect(ratioOrNull(-1, 0)).toBeNull();
    expect(ratioOrNull(0, 0)).toBeNull();
    expect(ratioOrNull(1e308, 1e-10)).toBeNull();
    expect(ratioOrNull(Number.MAX_VALUE, 1)).toBe(Number.MAX_VALUE);
  });

  it("requireList takes a list, even an empty one, and refuses anything else by name", () => {
    const list: number[] = [];
    expect(requireList(list, "rows")).toBe(list);
    expectRefusal(() => requireList({ length: 0 } as never, "rows"), "rows", { length: 0 }, "", "rows must be a list (got an object)");
    expectRefusal(() => requireList("1,2" as never, "rows"), "rows", "1,2", "", 'rows must be a list (got "1,2")');
  });

  it("declaredInputs lists each declared input as a number with its SI unit", () => {
    expect(declaredInputs(specs, { radius: 0.5, margin: "0.1", count: 3, extra: 9 })).toEqual({
      radius: [0.5, "m"],
      margin: [0.1, ""],
      count: [3, ""],
      inertia: [Number.NaN, "kg·m²"],
    });
    expectRefusal(() => declaredInputs(specs, null), "input", null, "", "input must be an object of named inputs (got null)");
  });
});
