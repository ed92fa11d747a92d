import { describe, expect, it } from "vitest";
import { parseQuantity, rpmToRadPerSecond, STANDARD_GRAVITY } from "#calc";

describe("units (smoke)", () => {
  it("defines standard gravity as 9.80665 m/s² exactly (cgpm-1901)", () => {
    expect(STANDARD_GRAVITY).toBe(9.80665);
  });
  it("reads 350 g as a mass or as an acceleration, as the field's kind says", () => {
    expect(parseQuantity("350 g", "mass", "g")).toMatchObject({ ok: true, valueSI: expect.closeTo(0.35, 12) });
    expect(parseQuantity("350 g", "acceleration", "gn")).toMatchObject({ ok: true, valueSI: expect.closeTo(350 * 9.80665, 9) });
    expect(rpmToRadPerSecond(3000)).toBeCloseTo(314.159265358979, 10);
  });
});
