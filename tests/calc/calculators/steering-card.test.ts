/**
 * The steering card as the build sheet shows it: rule, margin line and figures, in both unit
 * systems, with two wheels (no skid) and with one wheel and a skid (the skid lift speed joins the
 * rule, the margin and the figures). Figures worked by hand beside them.
 */
import { describe, expect, it } from "vitest";
import { type AnyValues, initialValues } from "../../../calc/core/calculator.ts";
import steering from "../../../calc/calculators/steering.ts";

function cardOf(changes: AnyValues, system: "metric" | "us") {
  const values = { ...initialValues(steering), ...changes };
  const cards = steering.cards(values, steering.run(values), system);
  expect(cards).toHaveLength(1);
  return cards[0]!;
}

// Defaults: 3000 rpm (314.16 rad/s), 1.5 kg, wheels 18 mm radius at 70 mm, wheel 4e-6 and rotor 3e-6 kg·m²,
// 1100 rpm/V on 4 × 4.1 V, 120° window with the opposite one, depth 0.25, 2000 Hz loop, 0.3 ms latency, 10° tolerance.
// Translation (as in tests/calc/steering/estimate.test.ts, Oppenheim–Willsky §3.3): δ = 0.25 · 16.4 V · 1100 rpm/V · 0.018 m
//   = 8.501 m/s; v = 2 · 8.501 · sin 60° / π = 4.687 m/s = 15.38 ft/s.
// Direction error = Ω(L + 1/(2f)) = 314.16 · 0.00055 = 0.17279 rad = 9.90°; the lead that cancels it is the same.
// Gyroscopic moment = (I_w + I_r) · ω_w · Ω with ω_w = Ω · 0.07 / 0.018 = 1221.7 rad/s:
//   7e-6 · 1221.7 · 314.16 = 2.687 N·m = 23.8 lbf·in (1 N·m = 8.851 lbf·in).
describe("steering card", () => {
  it("with two wheels: no skid clause in the rule or the margin, three figures (metric)", () => {
    const card = cardOf({}, "metric");
    expect(card.status).toBe("holds");
    expect(card.rule).toBe("Push within 10.0° of the commanded direction (marginal up to twice that)");
    expect(card.margin).toBe("The push points 9.9° off the commanded direction, within the 10° tolerance. Kinematic translation speed 4.69 m/s at 3000 rpm");
    expect(card.figure).toMatchObject({ label: "Kinematic translation speed", text: "4.69 m/s" });
    expect(card.details.map((d) => [d.label, d.text])).toEqual([
      ["Direction error", "9.90°"],
      ["Phase lead that cancels it", "9.90°"],
      ["Gyroscopic moment per wheel", "2.69 N·m"],
    ]);
  });

  it("in US units shows the speed in ft/s and the moment in lbf·in", () => {
    const card = cardOf({}, "us");
    expect(card.margin).toBe("The push points 9.9° off the commanded direction, within the 10° tolerance. Kinematic translation speed 15.4 ft/s at 3000 rpm");
    expect(card.details.map((d) => d.text)).toEqual(["9.90°", "9.90°", "23.8 lbf·in"]);
  });

  it("with one wheel and a skid: the rule adds the 80 % lift margin, the margin and the figures the lift speed", () => {
    // Lift when the moment I·ω_w·Ω = 7e-6 · (0.07/0.018) · Ω² equals the weight's moment about the wheel,
    // m·g·0.07 = 1.5 · 9.80665 · 0.07 = 1.0297 N·m: Ω² = 1.0297 / 2.7222e-5 = 37826, Ω = 194.49 rad/s = 1857 rpm.
    const card = cardOf({ wheelCount: 1 }, "metric");
    expect(card.status).toBe("fails");
    expect(card.rule).toBe("Push within 10.0° of the commanded direction (marginal up to twice that); the spin below 80 % of the skid lift speed");
    expect(card.margin).toBe(
      "The skid lifts: the wheel's gyroscopic moment carries the whole weight from 1857 rpm, below the spin speed. Kinematic translation speed 4.69 m/s at 3000 rpm; the skid lifts at 1860 rpm",
    );
    expect(card.details.map((d) => [d.label, d.text])).toEqual([
      ["Direction error", "9.90°"],
      ["Phase lead that cancels it", "9.90°"],
      ["Gyroscopic moment per wheel", "2.69 N·m"],
      ["Skid lift speed", "1860 rpm"],
    ]);
  });
});
