/** Precession time when the precession is too slow to represent. */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { precessionTime } from "../../../calc/weapon/precession.ts";

describe("precessionTime for a moment too small to represent the time", () => {
  const expected = "large enough for the precession time to stay finite";

  it("refuses a subnormal moment, naming it: Ω_p = 5e-324 rad/s, so θ/Ω_p = 1/5e-324 ≈ 2e323 s passes the largest double", () => {
    expect(() => precessionTime({ angle: 1, moment: Number.MIN_VALUE, inertia: 1, spinSpeed: 1 })).toThrow(
      expect.objectContaining({ name: "CalcInputError", param: "moment", value: Number.MIN_VALUE, unit: "N·m", expected }),
    );
  });

  it("refuses the same way when the rate itself underflows to 0: 5e-324 N·m / 1e10 N·m·s rounds to 0", () => {
    let error: unknown;
    try {
      precessionTime({ angle: 1, moment: Number.MIN_VALUE, inertia: 1e10, spinSpeed: 1 });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(CalcInputError);
    expect(error).toMatchObject({ param: "moment", unit: "N·m", expected });
    expect(String(error)).toMatch(/precession time/);
  });
});
