/**
 * The cards of the heading calculators (drift budget, loop timing, smoothing) as the build sheet
 * shows them: verdict, rule, margin line and figures, in both unit systems. Every figure is worked
 * by hand from the formulas of calc/heading/ (arithmetic beside it).
 */
import { describe, expect, it } from "vitest";
import { type AnyCalculator, type AnyValues, initialValues } from "../../../calc/core/calculator.ts";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import headingDrift from "../../../calc/calculators/heading-drift.ts";
import headingSmoothing from "../../../calc/calculators/heading-smoothing.ts";
import headingTiming from "../../../calc/calculators/heading-timing.ts";

function cardOf(calc: AnyCalculator, changes: AnyValues, system: "metric" | "us") {
  const values = { ...initialValues(calc), ...changes };
  const cards = calc.cards(values, calc.run(values), system);
  expect(cards).toHaveLength(1);
  return cards[0]!;
}

describe("drift-budget card", () => {
  it.each(["metric", "us"] as const)("fails at the defaults with the drift rate and drift per revolution (%s)", (system) => {
    // Defaults: 2000 rpm (209.44 rad/s), radius 12.0 mm in firmware, 12.7 mm true, offset 0.2 g, budget 10 °/s.
    // Reading = ω²·r_true + b = 209.44² × 0.0127 + 1.961 = 557.09 + 1.961 = 559.05 m/s²;
    // estimate = √(559.05 / 0.012) = √46587 = 215.84 rad/s; drift = 6.401 rad/s = 366.8 °/s → "367 °/s";
    // per revolution: 6.401 / 209.44 × 360° = 11.0°.
    const card = cardOf(headingDrift, {}, system);
    expect(card.status).toBe("fails");
    expect(card.rule).toBe("Drift at 2000 rpm within ±10.0 °/s");
    expect(card.margin).toBe("Drifts 367 °/s (11.0° per revolution)");
    expect(card.figure).toMatchObject({ label: "Drift rate", unit: "rad/s", text: "367 °/s" });
    expect(card.details).toEqual([]);
  });

  it("holds when the firmware radius is the true one and the sensor has no offset (zero drift)", () => {
    // Reading = ω²·r exactly, so the estimate is ω and the drift 0.
    const card = cardOf(headingDrift, { trueRadius: 0.012, bias: 0 }, "metric");
    expect(card.status).toBe("holds");
    expect(card.margin).toBe("Drifts 0 °/s (0° per revolution)");
  });

  it("says there is no estimate when the offset drives the corrected reading below zero", () => {
    // At 60 rpm (6.283 rad/s): ω²·r = 39.48 × 0.0127 = 0.50 m/s², an offset of −1 g (−9.81 m/s²) leaves −9.3.
    const card = cardOf(headingDrift, { angularSpeed: 2 * Math.PI, bias: -STANDARD_GRAVITY }, "us");
    expect(card.status).toBe("fails");
    expect(card.rule).toBe("Drift at 60.0 rpm within ±10.0 °/s");
    expect(card.margin).toBe("No estimate at this speed: the corrected reading is zero or negative");
    expect(card.figure).toBeNull();
  });
});

describe("loop-timing card", () => {
  // Defaults: top speed 3000 rpm (314.16 rad/s), 1000 Hz loop, latency 0.5 ms, LED on 1 ms, arc ≤ 20°, step ≤ 5°.
  // Step = ω / f = 0.31416 rad = 18.0°; arc = ω·t_on = 18.0°; latency offset = ω·0.0005 s = 9.00°.
  it.each(["metric", "us"] as const)("is marginal at the defaults: only the step per loop is too big (%s)", (system) => {
    const card = cardOf(headingTiming, {}, system);
    expect(card.status).toBe("marginal");
    expect(card.rule).toBe("At 3000 rpm: heading step per loop at most 5.00°, heading LED arc at most 20.0°");
    // Loop rate needed = ω / 5° = 314.16 / 0.087266 = 3600 Hz.
    expect(card.margin).toBe("At top speed the heading moves 18.0° per loop (a 3600 Hz loop meets 5.00°)");
    expect(card.figure).toMatchObject({ label: "Heading step per loop", text: "18.0°" });
    expect(card.details.map((d) => [d.label, d.text])).toEqual([
      ["Offset from latency", "9.00°"],
      ["Heading LED arc", "18.0°"],
    ]);
  });

  it("holds with a 4000 Hz loop and reports step, arc and latency offset", () => {
    // Step = 314.16 / 4000 = 0.07854 rad = 4.50°.
    const card = cardOf(headingTiming, { loopRate: 4000 }, "metric");
    expect(card.status).toBe("holds");
    expect(card.margin).toBe("Step 4.50° per loop, arc 18.0°, latency offset 9.00°");
  });

  it("fails when both the step and the LED arc are too big, naming the on-time that would meet the arc", () => {
    // Arc = 314.16 × 0.002 = 0.6283 rad = 36.0°; on-time for 20° = 0.34907 / 314.16 = 1.111 ms.
    const card = cardOf(headingTiming, { onTime: 0.002 }, "us");
    expect(card.status).toBe("fails");
    expect(card.margin).toBe(
      "At top speed the heading moves 18.0° per loop (a 3600 Hz loop meets 5.00°); the heading LED lights 36.0° per turn (1.11 ms on-time gives 20.0°)",
    );
  });
});

describe("smoothing card", () => {
  it.each(["metric", "us"] as const)("shows the delay and the heading lost over the spin-up at the defaults (%s)", (system) => {
    // Defaults: 1000 Hz, α = 0.1, median of 3, spin-up 2000 rpm/s (209.44 rad/s²) over 3000 rpm.
    // Average lag = (1 − α)/(α·f) = 0.9 / 100 = 9 ms; median of 3 = 1 sample = 1 ms; delay 10.0 ms.
    // Rate lag = 209.44 × 0.010 = 2.094 rad/s = 120 °/s (the estimate reads low: −120 °/s);
    // spin-up lasts 3000 / 2000 = 1.5 s, so the heading falls 120 × 1.5 = 180° behind.
    const card = cardOf(headingSmoothing, {}, system);
    expect(card.status).toBe("info");
    expect(card.rule).toBe("What the smoothing costs: the delay of the estimate, and the heading it loses over a spin-up");
    expect(card.margin).toBe("Delay 10.0 ms; the heading falls 180° behind over the spin-up");
    expect(card.figure).toMatchObject({ label: "Delay of the estimate", text: "10.0 ms" });
    expect(card.details.map((d) => [d.label, d.text])).toEqual([["Drift rate during the spin-up", "−120 °/s"]]);
  });
});
