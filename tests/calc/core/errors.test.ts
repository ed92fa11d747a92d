import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { fitCalibration } from "../../../calc/heading/calibration.ts";

const messageOf = (value: unknown) => new CalcInputError({ param: "rows", value, expected: "a list of readings", unit: "" }).message;

describe("a refusal shows what it got in words a person can read", () => {
  it("numbers to six figures, the non-finite ones in words, and text quoted and cut at 40 characters", () => {
    expect(new CalcInputError({ param: "radius", value: 0.0123456789, expected: "at most 0.01", unit: "m" }).message).toBe(
      "radius must be at most 0.01 (got 0.0123457 m)",
    );
    expect(messageOf(Number.NaN)).toBe("rows must be a list of readings (got not a number)");
    expect(messageOf(-Infinity)).toBe("rows must be a list of readings (got minus infinity)");
    expect(messageOf("x".repeat(41))).toBe(`rows must be a list of readings (got "${"x".repeat(40)}…")`);
  });

  it("an object, a list, a function or nothing by what it is, never [object Object] or its items run together", () => {
    expect(messageOf(undefined)).toBe("rows must be a list of readings (got nothing)");
    expect(messageOf({ a: 1 })).toBe("rows must be a list of readings (got an object)");
    expect(messageOf([1, 2, 3])).toBe("rows must be a list of readings (got a list of 3)");
    expect(messageOf(() => 0)).toBe("rows must be a list of readings (got a function)");
    expect(messageOf(null)).toBe("rows must be a list of readings (got null)");
    expect(messageOf(true)).toBe("rows must be a list of readings (got true)");
  });

  it("the calibration fit names rows that are not a list by what they are", () => {
    expect(() => fitCalibration(undefined as never)).toThrow("rows must be a list of readings (got nothing)");
    expect(() => fitCalibration({ rows: [] } as never)).toThrow("rows must be a list of readings (got an object)");
  });
});
