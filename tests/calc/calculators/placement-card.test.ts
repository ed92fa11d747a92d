/**
 * The accelerometer-placement card, as the build sheet shows it, for a sensor placed too far out:
 * the reading at top speed in standard gravities, the largest radius to move it in to, and the
 * calculator's place in the handbook.
 */
import { describe, expect, it } from "vitest";
import placement from "../../../calc/calculators/placement.ts";
import type { UnitSystem } from "../../../calc/core/units.ts";

// Top speed 100 rad/s, full scale 1000 m/s² with 20 % headroom: largest radius 800/100² = 0.08 m.
// Lowest speed 10 rad/s, one count 1.25 m/s², resolution 50 %: smallest radius 1.25/(100 × 0.5 × 2.5) = 0.01 m.
// The sensor at 0.1 m reads ω²r = 100² × 0.1 = 1000 m/s² = 1000/9.80665 = 101.97 gₙ, 100 % of full scale.
// The other part: m ω² r = 0.05 × 100² × 0.06 = 30 N (30/4.44822 = 6.74 lbf).
const tooFarOut = {
  topSpeed: 100,
  lowSpeed: 10,
  fullScale: 1000,
  margin: 0.2,
  step: 1.25,
  noise: 0,
  resolution: 0.5,
  partMass: 0.05,
  partRadius: 0.06,
  radius: 0.1,
};

function cardsFor(system: UnitSystem) {
  return placement.cards(tooFarOut, placement.run(tooFarOut), system);
}

describe("the accelerometer-placement card", () => {
  it("lives in the acceleration chapter at its own anchor", () => {
    expect(placement.title).toBe("Accelerometer placement");
    expect(placement.chapter).toBe("acceleration");
    expect(placement.anchor).toBe("placement-calculator");
  });

  it("fails a sensor too far out, giving its reading in gₙ (102 gₙ, 100 %) and where to move it (80.0 mm), metric", () => {
    const cards = cardsFor("metric");
    expect(cards).toHaveLength(1);
    const card = cards[0]!;
    expect(card.title).toBe("Accelerometer placement");
    expect(card.status).toBe("fails");
    expect(card.rule).toBe("Reading at top speed at most 80.0 % of full scale, and one count resolves speed to 50.0 % at the lowest tracked speed");
    expect(card.margin).toBe(
      "Too far out: at top speed the sensor would read 102 gₙ, 100 % of its full scale. Move it in to 80.0 mm or less, or use a sensor with a larger range.",
    );
    expect(card.figure).toEqual({ label: "Sensor reading at top speed", value: 1000, unit: "m/s²", text: "102 gₙ" });
    expect(card.details!.map((d) => [d.label, d.text])).toEqual([
      ["Smallest usable radius", "10.0 mm"],
      ["Largest usable radius", "80.0 mm"],
      ["Pull on the other part's mounts", "30.0 N"],
    ]);
  });

  it("keeps the reading in gₙ in US units and gives the radii in inches (80 mm / 25.4 = 3.15 in)", () => {
    const card = cardsFor("us")[0]!;
    expect(card.margin).toBe(
      "Too far out: at top speed the sensor would read 102 gₙ, 100 % of its full scale. Move it in to 3.15 in or less, or use a sensor with a larger range.",
    );
    expect(card.details!.map((d) => d.text)).toEqual(["0.394 in", "3.15 in", "6.74 lbf"]);
  });
});
