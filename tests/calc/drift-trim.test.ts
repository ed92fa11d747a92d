/**
 * The radius trim: the firmware radius that cancels a drift seen in the pit. Checked against the
 * hand formula r̂′ = r̂·(1 + X/360°)², against the forward drift model it inverts (a true radius
 * gives a drift per turn; that drift gives the true radius back), and at its edges.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { CalcInputError } from "../../calc/core/errors.ts";
import { rpmToRadPerSecond, toSI } from "../../calc/core/units.ts";
import { headingDriftAt } from "../../calc/heading/drift.ts";
import { radiusTrim, type RadiusTrimInput } from "../../calc/heading/drift-trim.ts";

const base: RadiusTrimInput = { assumedRadius: 0.008, sense: "ahead", measure: "turn", driftPerTurn: toSI(20, "deg"), driftRate: 0, angularSpeed: 200 };
const deg = (v: number) => toSI(v, "deg");

describe("the radius that cancels a drift you see", () => {
  // Hand formula of the pit (common practice): r̂′ = r̂·(1 + X/360°)², X + when the heading runs ahead.
  it.each([
    { note: "8 mm, 20° a turn ahead", radius: 0.008, sense: "ahead", x: 20, expected: 0.008 * (1 + 20 / 360) ** 2 },
    { note: "8 mm, 20° a turn behind", radius: 0.008, sense: "behind", x: 20, expected: 0.008 * (1 - 20 / 360) ** 2 },
    { note: "12 mm, 3.6° a turn ahead (1 % fast: 2.01 % more radius)", radius: 0.012, sense: "ahead", x: 3.6, expected: 0.012 * 1.01 ** 2 },
    { note: "no drift keeps the radius", radius: 0.0127, sense: "ahead", x: 0, expected: 0.0127 },
  ] as const)("hand formula (common practice): $note", ({ radius, sense, x, expected }) => {
    const r = radiusTrim({ ...base, assumedRadius: radius, sense, driftPerTurn: deg(x) });
    expect(r.radius).toBeCloseTo(expected, 15);
    expect(r.change).toBeCloseTo(expected - radius, 15);
    expect(r.speedRatio).toBeCloseTo(1 + (sense === "ahead" ? x : -x) / 360, 15);
  });

  it("gives 8.914 mm for 20° a turn ahead at 8 mm (the pit example: 8 × (1 + 1/18)² = 8.91358 mm)", () => {
    expect(radiusTrim(base).radius * 1000).toBeCloseTo(8.91358, 5);
  });

  it("reads a drift timed per second as the drift per turn: 10 °/s at 2000 rpm is 0.3° a turn (2000 rpm = 33.3 turns/s)", () => {
    const timed = radiusTrim({
      ...base,
      assumedRadius: 0.012,
      sense: "behind",
      measure: "second",
      driftRate: toSI(10, "deg/s"),
      angularSpeed: rpmToRadPerSecond(2000),
    });
    const perTurn = radiusTrim({ ...base, assumedRadius: 0.012, sense: "behind", driftPerTurn: deg(0.3) });
    expect(timed.driftPerRevolution).toBeCloseTo(-deg(0.3), 14);
    expect(timed.radius).toBeCloseTo(perTurn.radius, 15);
  });

  it("inverts the forward drift model exactly: the drift a true radius causes gives that true radius back (second method: calc/heading/drift.ts)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.002, max: 0.2, noNaN: true }),
        fc.double({ min: 0.6, max: 1.4, noNaN: true }),
        fc.double({ min: 10, max: 600, noNaN: true }),
        (assumedRadius, ratio, angularSpeed) => {
          const trueRadius = assumedRadius * ratio;
          const seen = headingDriftAt({ angularSpeed, assumedRadius, trueRadius, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 });
          const x = seen.driftPerRevolution!;
          const r = radiusTrim({ ...base, assumedRadius, sense: x >= 0 ? "ahead" : "behind", driftPerTurn: Math.abs(x) });
          expect(r.radius / trueRadius).toBeCloseTo(1, 12);
        },
      ),
    );
  });

  it("names the input when no radius can cancel the drift, and never returns a non-finite number", () => {
    expect(() => radiusTrim({ ...base, driftPerTurn: deg(181) })).toThrow(CalcInputError);
    const fast = () => radiusTrim({ ...base, measure: "second", driftRate: toSI(3600, "deg/s"), angularSpeed: 0.1 });
    expect(fast).toThrow(CalcInputError);
    expect(fast).toThrow(/driftRate/);
    expect(() => radiusTrim({ ...base, sense: "sideways" as never })).toThrow(/sense/);
    expect(() => radiusTrim({ ...base, measure: "hour" as never })).toThrow(/measure/);
    expect(() => radiusTrim(null as never)).toThrow(CalcInputError);
    // 180° behind per turn: the estimate runs at half speed, r̂′ = r̂/4, still a radius.
    expect(radiusTrim({ ...base, sense: "behind", driftPerTurn: Math.PI }).radius).toBeCloseTo(0.002, 15);
  });
});
