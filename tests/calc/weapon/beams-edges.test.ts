/**
 * The beam cases at their edges: a load or a couple placed past the far support is refused by its
 * position, with the span it must stay within, and each support reaction that would pass the
 * largest double is refused as a reaction, naming the input that took it there.
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { overhungCouple, overhungPointLoad, simplySupportedCouple, simplySupportedPointLoad } from "../../../calc/weapon/beams.ts";

const STIFF = { youngsModulus: 200e9, secondMoment: 1e-9 };

/** The message of the CalcInputError `run` throws. */
function refusal(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(CalcInputError);
    return (error as CalcInputError).message;
  }
  return expect.unreachable("no CalcInputError");
}

describe("a load between two supports placed past the far one", () => {
  it("is refused by its position, with the span, for a point load and for a couple", () => {
    expect(refusal(() => simplySupportedPointLoad({ force: 1000, span: 0.06, position: 0.07, ...STIFF }))).toBe(
      "position must be at most the span (0.06 m) (got 0.07 m)",
    );
    expect(refusal(() => simplySupportedCouple({ moment: 20, span: 0.06, position: 0.07, ...STIFF }))).toBe(
      "position must be at most the span (0.06 m) (got 0.07 m)",
    );
  });

  it("is taken at the far support itself: all of a point load goes to that support", () => {
    const r = simplySupportedPointLoad({ force: 1000, span: 0.06, position: 0.06, ...STIFF });
    expect([r.leftReaction, r.rightReaction, r.momentAtLoad, r.deflectionAtLoad]).toEqual([0, 1000, 0, 0]);
  });
});

describe("support reactions at the edge of the doubles", () => {
  it("refuses a couple's reaction pair M/L past the largest double as a reaction, by the couple", () => {
    // M/L = 1e300/1e-10 = 1e310; the couple (300 orders of magnitude from 1) took it there, not the span (10).
    const message = "moment must be small enough for the reaction to stay finite (got 1e+300 N·m)";
    expect(refusal(() => simplySupportedCouple({ moment: 1e300, span: 1e-10, position: 0, ...STIFF }))).toBe(message);
    expect(refusal(() => overhungCouple({ moment: 1e300, span: 1e-10, overhang: 0, ...STIFF }))).toBe(message);
  });

  it("refuses an overhung load's far reaction F·c/L past the largest double as a reaction, by the force", () => {
    // F·c/L = 1e300 × 1/1e-10 = 1e310.
    expect(refusal(() => overhungPointLoad({ force: 1e300, span: 1e-10, overhang: 1, ...STIFF }))).toBe(
      "force must be small enough for the reaction to stay finite (got 1e+300 N)",
    );
  });

  it("refuses an overhung load's near reaction F(L + c)/L past the largest double when the far one, F·c/L, is still a double", () => {
    // c = L: the far reaction is F = 1e308 N, the near one 2F = 2e308 N, past the largest double (1.8e308).
    expect(refusal(() => overhungPointLoad({ force: 1e308, span: 1, overhang: 1, ...STIFF }))).toBe(
      "force must be small enough for the reaction to stay finite (got 1e+308 N)",
    );
  });
});
