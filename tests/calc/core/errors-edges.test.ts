/**
 * The require* guards of calc/core/errors.ts exactly on their limits (a value equal to the limit,
 * ±0, the smallest double), and the words of each refusal, which are what a user reads.
 */
import { describe, expect, it } from "vitest";
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive, requireRelation } from "../../../calc/core/errors.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

describe("a CalcInputError", () => {
  it("is a RangeError named CalcInputError carrying its fields", () => {
    const error = new CalcInputError({
      param: "radius",
      value: 2,
      expected: "at most 1 m",
      unit: "m",
      bound: { relation: "at-most", limit: 1, kind: "length" },
      range: { min: 0, max: 1 },
    });
    expect(error).toBeInstanceOf(RangeError);
    expect(error.name).toBe("CalcInputError");
    expect(error.message).toBe("radius must be at most 1 m (got 2 m)");
    expect(error).toMatchObject({ param: "radius", value: 2, expected: "at most 1 m", unit: "m", bound: { relation: "at-most", limit: 1, kind: "length" } });
    expect(error.range).toEqual({ min: 0, max: 1 });
  });

  it("gives the unit after a finite number only", () => {
    const message = (value: unknown, unit: string) => new CalcInputError({ param: "r", value, expected: "x", unit }).message;
    expect(message(Number.POSITIVE_INFINITY, "m")).toBe("r must be x (got infinity)");
    expect(message(Number.NaN, "m")).toBe("r must be x (got not a number)");
    expect(message("3", "m")).toBe('r must be x (got "3")');
    expect(message(3, "")).toBe("r must be x (got 3)");
    expect(message(-0, "m")).toBe("r must be x (got 0 m)");
    expect(message(1 / 3, "m")).toBe("r must be x (got 0.333333 m)");
    expect(message("x".repeat(40), "")).toBe(`r must be x (got "${"x".repeat(40)}")`);
    expect(message(new CalcInputError({ param: "a", value: 1, expected: "b", unit: "" }), "")).toBe("r must be x (got an object)");
  });
});

describe("requireRelation exactly on its limit", () => {
  const length = { kind: "length", unit: "m" };
  it.each([
    { relation: "greater", value: 0.5, ok: false },
    { relation: "greater", value: 0.5000000000000001, ok: true },
    { relation: "at-least", value: 0.5, ok: true },
    { relation: "at-least", value: 0.49999999999999994, ok: false },
    { relation: "less", value: 0.5, ok: false },
    { relation: "less", value: 0.49999999999999994, ok: true },
    { relation: "at-most", value: 0.5, ok: true },
    { relation: "at-most", value: 0.5000000000000001, ok: false },
  ] as const)("$relation 0.5 m: $value passes: $ok", ({ relation, value, ok }) => {
    if (ok) expect(requireRelation("gap", value, relation, 0.5, length)).toBe(value);
    else expect(refusal(() => requireRelation("gap", value, relation, 0.5, length)).bound).toEqual({ relation, limit: 0.5, kind: "length" });
  });

  it("words each relation, with the limit to six figures and its unit", () => {
    const words = { greater: "greater than", "at-least": "at least", less: "less than", "at-most": "at most" } as const;
    for (const [relation, text] of Object.entries(words)) {
      const value = relation === "greater" || relation === "at-least" ? 0 : 1;
      expectRefusal(
        () => requireRelation("gap", value, relation as keyof typeof words, 1 / 3, length),
        "gap",
        value,
        "m",
        `gap must be ${text} 0.333333 m (got ${value} m)`,
      );
    }
  });

  it("names the input a limit comes from, and keeps it with the rule", () => {
    const error = refusal(() => requireRelation("highSpeed", 50, "greater", 52.35987755982988, { kind: "angularSpeed", unit: "rad/s", other: "lowSpeed" }));
    expect(error.message).toBe("highSpeed must be greater than lowSpeed (52.3599 rad/s) (got 50 rad/s)");
    expect(error.bound).toEqual({ relation: "greater", limit: 52.35987755982988, kind: "angularSpeed", other: "lowSpeed" });
  });

  it("keeps no name of another input in the rule when the limit is a plain number", () => {
    const error = refusal(() => requireRelation("gap", 2, "at-most", 1, length));
    expect(error.bound).toStrictEqual({ relation: "at-most", limit: 1, kind: "length" });
  });

  it("words a relation it does not know by its own name, and checks it as at most", () => {
    expectRefusal(() => requireRelation("gap", 3, "below" as never, 2, length), "gap", 3, "m", "gap must be below 2 m (got 3 m)");
    expect(requireRelation("gap", 2, "below" as never, 2, length)).toBe(2);
  });

  it("writes a limit without a unit when the quantity has none", () => {
    expectRefusal(() => requireRelation("ratio", 2, "at-most", 1, { kind: "fraction", unit: "" }), "ratio", 2, "", "ratio must be at most 1 (got 2)");
  });

  it("refuses a value that is not finite before comparing", () => {
    expectRefusal(() => requireRelation("gap", Number.NaN, "at-most", 1, length), "gap", Number.NaN, "m", "gap must be a finite number (got not a number)");
    expectRefusal(
      () => requireRelation("gap", Number.POSITIVE_INFINITY, "greater", 0, length),
      "gap",
      Number.POSITIVE_INFINITY,
      "m",
      "gap must be a finite number (got infinity)",
    );
  });

  it("still refuses in its own family when called without options or limit", () => {
    expectRefusal(() => requireRelation("gap", 1, "less", Number.NaN, null as never), "gap", 1, "", "gap must be less than NaN (got 1)");
    expect(requireRelation("gap", 1, "at-least", 0, null as never)).toBe(1);
    expect(refusal(() => requireRelation("gap", 2, "at-most", 1, null as never)).bound).toStrictEqual({ relation: "at-most", limit: 1, kind: "" });
  });
});

describe("requireFinite, requirePositive and requireNonNegative on zero and the smallest doubles", () => {
  it("takes any finite number and refuses the rest by name", () => {
    expect(requireFinite("x", -Number.MAX_VALUE, "m")).toBe(-Number.MAX_VALUE);
    expectRefusal(() => requireFinite("x", "1" as never, "m"), "x", "1", "m", 'x must be a finite number (got "1")');
    expectRefusal(
      () => requireFinite("x", Number.NEGATIVE_INFINITY, "m"),
      "x",
      Number.NEGATIVE_INFINITY,
      "m",
      "x must be a finite number (got minus infinity)",
    );
  });

  it("requirePositive: the smallest double passes, 0 and −0 do not", () => {
    expect(requirePositive("mass", 5e-324, "kg")).toBe(5e-324);
    expectRefusal(() => requirePositive("mass", 0, "kg"), "mass", 0, "kg", "mass must be greater than 0 kg (got 0 kg)");
    expectRefusal(() => requirePositive("mass", -0, "kg"), "mass", -0, "kg", "mass must be greater than 0 kg (got 0 kg)");
    expectRefusal(() => requirePositive("ratio", -1, ""), "ratio", -1, "", "ratio must be greater than 0 (got -1)");
    expectRefusal(() => requirePositive("mass", Number.NaN, "kg"), "mass", Number.NaN, "kg", "mass must be a finite number (got not a number)");
  });

  it("requireNonNegative: 0 and −0 pass, the smallest negative double does not", () => {
    expect(requireNonNegative("gap", 0, "m")).toBe(0);
    expect(Object.is(requireNonNegative("gap", -0, "m"), -0)).toBe(true);
    expectRefusal(() => requireNonNegative("gap", -5e-324, "m"), "gap", -5e-324, "m", "gap must be 0 m or more (got -5e-324 m)");
    expectRefusal(() => requireNonNegative("ratio", -1, ""), "ratio", -1, "", "ratio must be 0 or more (got -1)");
    expectRefusal(
      () => requireNonNegative("gap", Number.POSITIVE_INFINITY, "m"),
      "gap",
      Number.POSITIVE_INFINITY,
      "m",
      "gap must be a finite number (got infinity)",
    );
  });
});

describe("requireInRange on closed and open ends", () => {
  const closed = { min: 0, max: 0.95 };
  const open = { min: 0, max: 1, minOpen: true, maxOpen: true };

  it("takes both ends of a closed range and refuses one step past either", () => {
    expect(requireInRange("margin", 0, "", closed)).toBe(0);
    expect(requireInRange("margin", 0.95, "", closed)).toBe(0.95);
    expectRefusal(() => requireInRange("margin", -5e-324, "", closed), "margin", -5e-324, "", "margin must be at least 0 and at most 0.95 (got -5e-324)");
    expectRefusal(
      () => requireInRange("margin", 0.9500000000000001, "", closed),
      "margin",
      0.9500000000000001,
      "",
      "margin must be at least 0 and at most 0.95 (got 0.95)",
    );
  });

  it("refuses both ends of an open range, and takes what lies just inside", () => {
    expect(requireInRange("radius", 5e-324, "m", open)).toBe(5e-324);
    expect(requireInRange("radius", 0.9999999999999999, "m", open)).toBe(0.9999999999999999);
    expectRefusal(() => requireInRange("radius", 0, "m", open), "radius", 0, "m", "radius must be greater than 0 m and less than 1 m (got 0 m)");
    expectRefusal(() => requireInRange("radius", 1, "m", open), "radius", 1, "m", "radius must be greater than 0 m and less than 1 m (got 1 m)");
  });

  it("mixes an open low end with a closed high one", () => {
    expectRefusal(() => requireInRange("r", 2, "m", { min: 0, max: 1, minOpen: true }), "r", 2, "m", "r must be greater than 0 m and at most 1 m (got 2 m)");
    expectRefusal(() => requireInRange("r", -1, "m", { min: 0, max: 1, maxOpen: true }), "r", -1, "m", "r must be at least 0 m and less than 1 m (got -1 m)");
  });

  it("carries the range as data, also when the value is not a number", () => {
    expect(refusal(() => requireInRange("radius", 2, "m", open)).range).toBe(open);
    const error = refusal(() => requireInRange("radius", Number.NaN, "m", open));
    expect(error.message).toBe("radius must be a finite number (got not a number)");
    expect(error.range).toBe(open);
    expect(refusal(() => requireInRange("radius", "1" as never, "m", open)).message).toBe('radius must be a finite number (got "1")');
  });

  it("refuses every value when the range is missing", () => {
    expect(refusal(() => requireInRange("radius", 0.5, "m", null as never)).param).toBe("radius");
  });
});
