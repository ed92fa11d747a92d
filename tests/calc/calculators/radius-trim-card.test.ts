/**
 * The radius-trim card as the build sheet shows it (the radius to set for a drift seen per turn or
 * timed per second, ahead or behind, metric and US) and which inputs the form asks for in each
 * way of measuring. Figures worked by hand from r̂′ = r̂·(1 + X/360°)² beside them.
 */
import { describe, expect, it } from "vitest";
import { type AnyValues, initialValues } from "../../../calc/core/calculator.ts";
import radiusTrim, { form } from "../../../calc/calculators/radius-trim.ts";

const RULE = "The firmware radius that cancels the drift at the speed it was seen: r̂′ = r̂·(1 + X/360°)²";

function cardOf(changes: AnyValues, system: "metric" | "us") {
  const values = { ...initialValues(radiusTrim), ...changes };
  const cards = radiusTrim.cards(values, radiusTrim.run(values), system);
  expect(cards).toHaveLength(1);
  return cards[0]!;
}

describe("radius-trim card", () => {
  it("ahead 20° per turn with 8 mm: set 8.914 mm, 0.914 mm more (metric)", () => {
    // q = 1 + 20/360 = 1.05556, q² = 1.11420; 8 mm · 1.11420 = 8.9136 mm; change 0.9136 mm.
    const card = cardOf({}, "metric");
    expect(card.status).toBe("info");
    expect(card.rule).toBe(RULE);
    expect(card.margin).toBe("The heading ran ahead 20.0° per turn with 8.000 mm: set 8.914 mm");
    expect(card.figure).toMatchObject({ label: "Radius to set", text: "8.914 mm" });
    expect(card.details.map((d) => [d.label, d.text])).toEqual([["Change", "0.914 mm"]]);
  });

  it("behind 20° per turn: set 7.136 mm, 0.864 mm less", () => {
    // q = 1 − 20/360 = 0.94444, q² = 0.89198; 8 mm · 0.89198 = 7.1358 mm; change −0.8642 mm.
    const card = cardOf({ sense: "behind" }, "metric");
    expect(card.margin).toBe("The heading fell behind 20.0° per turn with 8.000 mm: set 7.136 mm");
    expect(card.details.map((d) => d.text)).toEqual(["−0.864 mm"]);
  });

  it("shows the radii in inches to four figures in US units", () => {
    // 8 mm = 0.31496 in; 8.9136 mm = 0.35093 in; change 0.9136 mm = 0.03597 in.
    const card = cardOf({}, "us");
    expect(card.margin).toBe("The heading ran ahead 20.0° per turn with 0.3150 in: set 0.3509 in");
    expect(card.details.map((d) => d.text)).toEqual(["0.0360 in"]);
  });

  it("turns a drift timed per second into a drift per turn at the spin speed", () => {
    // 10 °/s at 2000 rpm (33.33 turns/s): X = 10 / 33.33 = 0.300° per turn; q² = (1 + 0.3/360)² = 1.001667;
    // 8 mm · 1.001667 = 8.0133 mm.
    const card = cardOf({ measure: "second" }, "metric");
    expect(card.margin).toBe("The heading ran ahead 0.300° per turn with 8.000 mm: set 8.013 mm");
  });

  it('says a zero drift needs no change, whichever way it was marked (not "ran ahead 0°")', () => {
    for (const sense of ["ahead", "behind"]) {
      const card = cardOf({ sense, driftPerTurn: 0 }, "metric");
      expect(card.margin).toBe("No drift with 8.000 mm: keep it");
      expect(card.figure).toMatchObject({ label: "Radius to set", text: "8.000 mm" });
    }
  });
});

describe("radius-trim form", () => {
  it("asks for the drift per turn when measured per turn, and for the rate and the spin speed when timed", () => {
    const applies = form.applies!;
    const turn = { ...initialValues(radiusTrim), measure: "turn" as const };
    const second = { ...initialValues(radiusTrim), measure: "second" as const };
    expect(["assumedRadius", "driftPerTurn", "driftRate", "angularSpeed"].map((name) => applies(name, turn))).toEqual([true, true, false, false]);
    expect(["assumedRadius", "driftPerTurn", "driftRate", "angularSpeed"].map((name) => applies(name, second))).toEqual([true, false, true, true]);
  });
});
