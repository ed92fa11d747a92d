/**
 * The opposed-sensors card, as the build sheet shows it: the rule with the offset range, the
 * single sensor's worst drift per revolution (or the note that it gives no estimate), and the pair.
 */
import { describe, expect, it } from "vitest";
import opposed from "../../../calc/calculators/opposed-sensors.ts";
import type { UnitSystem } from "../../../calc/core/units.ts";

function cardFor(values: { angularSpeed: number; radius1: number; radius2: number; offset: number }, system: UnitSystem) {
  const cards = opposed.cards(values as never, opposed.run(values as never) as never, system);
  expect(cards).toHaveLength(1);
  return cards[0]!;
}

describe("the opposed-sensors card", () => {
  // 0.5 mm off with both sensors at 12 mm: one sensor at 11.5 mm reads ω√(11.5/12),
  // 360°·(1 − √(11.5/12)) = 360°·(1 − 0.978945) = 7.58° per revolution; the pair cancels e exactly.
  const offCentre = { angularSpeed: 100, radius1: 0.012, radius2: 0.012, offset: 0.0005 };

  it("gives one sensor's worst drift per revolution (7.58°) and the pair's (0 °/s), metric", () => {
    const card = cardFor(offCentre, "metric");
    expect(card.title).toBe("One sensor or an opposed pair");
    expect(card.status).toBe("info");
    expect(card.rule).toBe("Heading drift when the spin centre is anywhere within 0.500 mm of where the firmware assumes it");
    expect(card.margin).toBe("One sensor drifts up to 7.58° per revolution; the pair 0 °/s");
    expect(card.figure).toEqual({
      label: "One sensor, worst drift per revolution",
      value: expect.closeTo(2 * Math.PI * (1 - Math.sqrt(11.5 / 12)), 12),
      unit: "rad",
      text: "7.58°",
    });
    expect(card.details).toEqual([{ label: "Pair, worst drift rate", value: 0, unit: "rad/s", text: "0 °/s" }]);
  });

  it("states the offset range in inches in US units (0.5 mm / 25.4 = 0.0197 in), the drift still in degrees", () => {
    const card = cardFor(offCentre, "us");
    expect(card.rule).toBe("Heading drift when the spin centre is anywhere within 0.0197 in of where the firmware assumes it");
    expect(card.margin).toBe("One sensor drifts up to 7.58° per revolution; the pair 0 °/s");
    expect(card.figure!.text).toBe("7.58°");
  });

  it("says one sensor gives no estimate when the offset reaches its radius (e = r₁ = 10 mm), and shows no figure", () => {
    const atRadius = { angularSpeed: 100, radius1: 0.01, radius2: 0.01, offset: 0.01 };
    const metric = cardFor(atRadius, "metric");
    expect(metric.margin).toBe("One sensor gives no estimate at one end of ±10.0 mm; the pair is unaffected");
    expect(metric.figure).toBeNull();
    expect(metric.details).toEqual([{ label: "Pair, worst drift rate", value: 0, unit: "rad/s", text: "0 °/s" }]);
    // 10 mm / 25.4 = 0.3937 in
    expect(cardFor(atRadius, "us").margin).toBe("One sensor gives no estimate at one end of ±0.394 in; the pair is unaffected");
  });
});
