/**
 * asCallerNames: a helper's refusal renamed to the field the caller wrote, with the rule, the unit,
 * the bound and the range kept; anything else passes through untouched.
 */
import { describe, expect, it } from "vitest";
import { asCallerNames } from "../../../calc/core/caller-names.ts";
import { CalcInputError, requireInRange, requireRelation } from "../../../calc/core/errors.ts";
import { refusal } from "../../support/refusal.ts";

describe("asCallerNames", () => {
  it("returns what the helper returns", () => {
    expect(asCallerNames({ radius: "r1" }, () => 42)).toBe(42);
  });

  it("renames a refusal under the caller's name, keeping the value, rule, unit and bound", () => {
    const error = refusal(() => asCallerNames({ radius: "hubRadius" }, () => requireRelation("radius", 0.05, "at-most", 0.04, { kind: "length", unit: "m" })));
    expect(error.message).toBe("hubRadius must be at most 0.04 m (got 0.05 m)");
    expect(error).toMatchObject({ param: "hubRadius", value: 0.05, expected: "at most 0.04 m", unit: "m" });
    expect(error.bound).toEqual({ relation: "at-most", limit: 0.04, kind: "length" });
  });

  it("reports the caller's own value when the helper was given one derived from it", () => {
    const range = { min: 0, max: 1000 };
    // The helper saw a speed sampled inside the caller's range; the caller's field held 1500 rad/s.
    const error = refusal(() => asCallerNames({ angularSpeed: ["highSpeed", 1500] }, () => requireInRange("angularSpeed", 1200, "rad/s", range)));
    expect(error.message).toBe("highSpeed must be at least 0 rad/s and at most 1000 rad/s (got 1500 rad/s)");
    expect(error).toMatchObject({ param: "highSpeed", value: 1500, unit: "rad/s" });
    expect(error.range).toBe(range);
  });

  it("passes a refusal of a name it was not given through as it is", () => {
    const original = new CalcInputError({ param: "mass", value: -1, expected: "greater than 0 kg", unit: "kg" });
    const thrown = (() => {
      try {
        asCallerNames({ radius: "r1" }, () => {
          throw original;
        });
      } catch (error) {
        return error;
      }
    })();
    expect(thrown).toBe(original);
  });

  it("renames only refusals: another error that happens to carry a name it knows passes through as it is", () => {
    const original = Object.assign(new Error("radius broke"), { param: "radius", value: 1 });
    expect(() =>
      asCallerNames({ radius: "r1" }, () => {
        throw original;
      }),
    ).toThrow(original);
  });

  it("passes any other error through as it is", () => {
    const original = new TypeError("not a function");
    expect(() =>
      asCallerNames({ radius: "r1" }, () => {
        throw original;
      }),
    ).toThrow(original);
  });
});
