import { describe, expect, it } from "vitest";
import { CalcInputError, requireFinite, requireInRange, requireRelation } from "../../../calc/core/errors.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

const SPEED = { kind: "angularSpeed", unit: "rad/s" };

describe("CalcInputError: what the message shows after (got …)", () => {
  it("keeps text of exactly 40 characters whole (a longer one is cut after 40)", () => {
    const forty = "y".repeat(40);
    expect(new CalcInputError({ param: "name", value: forty, expected: "a short name", unit: "" }).message).toBe(`name must be a short name (got "${forty}")`);
  });

  it("puts the unit after a finite number only, never after text, not a number, an infinity or nothing", () => {
    const message = (value: unknown, unit: string) => new CalcInputError({ param: "radius", value, expected: "at most 1 m", unit }).message;
    expect(message(3, "m")).toBe("radius must be at most 1 m (got 3 m)");
    expect(message(3, "")).toBe("radius must be at most 1 m (got 3)");
    expect(message("3", "m")).toBe('radius must be at most 1 m (got "3")');
    expect(message(Number.NaN, "m")).toBe("radius must be at most 1 m (got not a number)");
    expect(message(Number.POSITIVE_INFINITY, "m")).toBe("radius must be at most 1 m (got infinity)");
    expect(message(undefined, "m")).toBe("radius must be at most 1 m (got nothing)");
  });
});

describe("requireRelation: the rule in words and as data", () => {
  it("words each relation: greater than, at least, less than, at most", () => {
    expectRefusal(
      () => requireRelation("highSpeed", 10, "greater", 10, SPEED),
      "highSpeed",
      10,
      "rad/s",
      "highSpeed must be greater than 10 rad/s (got 10 rad/s)",
    );
    expectRefusal(() => requireRelation("highSpeed", 9, "at-least", 10, SPEED), "highSpeed", 9, "rad/s", "highSpeed must be at least 10 rad/s (got 9 rad/s)");
    expectRefusal(() => requireRelation("lowSpeed", 10, "less", 10, SPEED), "lowSpeed", 10, "rad/s", "lowSpeed must be less than 10 rad/s (got 10 rad/s)");
    expectRefusal(() => requireRelation("lowSpeed", 11, "at-most", 10, SPEED), "lowSpeed", 11, "rad/s", "lowSpeed must be at most 10 rad/s (got 11 rad/s)");
  });

  it("accepts a value on the limit where the relation allows it, and on the right side of it", () => {
    expect(requireRelation("x", 10, "at-least", 10, SPEED)).toBe(10);
    expect(requireRelation("x", 10, "at-most", 10, SPEED)).toBe(10);
    expect(requireRelation("x", 11, "greater", 10, SPEED)).toBe(11);
    expect(requireRelation("x", 11, "at-least", 10, SPEED)).toBe(11);
    expect(requireRelation("x", 9, "less", 10, SPEED)).toBe(9);
    expect(requireRelation("x", 9, "at-most", 10, SPEED)).toBe(9);
  });

  it("names the other input the limit comes from, with the limit's value", () => {
    const error = refusal(() => requireRelation("highSpeed", 5, "greater", 10, { ...SPEED, other: "lowSpeed" }));
    expect(error.message).toBe("highSpeed must be greater than lowSpeed (10 rad/s) (got 5 rad/s)");
    expect(error.bound).toEqual({ relation: "greater", limit: 10, kind: "angularSpeed", other: "lowSpeed" });
  });

  it("refuses a value that is not a finite number as such, before any comparison", () => {
    expectRefusal(
      () => requireRelation("lowSpeed", Number.NaN, "at-most", 10, SPEED),
      "lowSpeed",
      Number.NaN,
      "rad/s",
      "lowSpeed must be a finite number (got not a number)",
    );
  });

  it("without options, still refuses by name, with no unit and no kind", () => {
    const error = refusal(() => requireRelation("x", 1, "greater", 2, null as never));
    expect({ param: error.param, unit: error.unit, message: error.message }).toEqual({ param: "x", unit: "", message: "x must be greater than 2 (got 1)" });
    expect(error.bound).toEqual({ relation: "greater", limit: 2, kind: "" });
    expect(refusal(() => requireRelation("x", Number.NaN, "greater", 2, null as never)).unit).toBe("");
  });
});

describe("requireFinite and requireInRange: a value that is not a number is refused as not finite", () => {
  it("text, nothing and an infinity", () => {
    expectRefusal(() => requireFinite("mass", "3" as never, "kg"), "mass", "3", "kg", 'mass must be a finite number (got "3")');
    expectRefusal(() => requireFinite("mass", undefined as never, "kg"), "mass", undefined, "kg", "mass must be a finite number (got nothing)");
    expectRefusal(() => requireInRange("mass", "3" as never, "kg", { min: 0, max: 5 }), "mass", "3", "kg", 'mass must be a finite number (got "3")');
    expectRefusal(
      () => requireInRange("mass", Number.NEGATIVE_INFINITY, "kg", { min: 0, max: 5 }),
      "mass",
      Number.NEGATIVE_INFINITY,
      "kg",
      "mass must be a finite number (got minus infinity)",
    );
  });
});
