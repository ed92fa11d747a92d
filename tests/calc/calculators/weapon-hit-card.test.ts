import { describe, expect, it } from "vitest";
import weaponHit from "../../../calc/calculators/weapon-hit.ts";
import { initialValues } from "../../../calc/core/calculator.ts";

// The page's defaults: I = 0.010125 kg·m², 8000 rpm (837.758 rad/s), tip radius 90 mm, two impactors,
// 13.6 kg on both sides, restitution 0.2, closing at 2 m/s, a 20 mm crush.
const defaults = initialValues(weaponHit);

function card(values: typeof defaults, system: "metric" | "us") {
  return weaponHit.cards(values, weaponHit.run(values), system)[0]!;
}

// The impulse J and the contact forces are weaponHit's own (pinned by its tests); the rest is checked
// by hand from J: the rotor's speed drops by J r / I, the opponent takes J² / (2 m).
describe("what-a-hit-does card", () => {
  it("on an equal-mass opponent the rotor bounces back: the margin says 'backwards' (hand-checked)", () => {
    const c = card(defaults, "metric");
    // J = 95.54 N·s: Δω = 95.54 × 0.09 / 0.010125 = 849.2 rad/s, ω after = 837.76 − 849.2 = −11.4 rad/s = 109 rpm backwards.
    // To the opponent: 95.54² / (2 × 13.6) = 335.6 J. Stored: ½ × 0.010125 × 837.76² = 3553 J.
    expect(c.margin).toBe(
      "The rotor gives up 3550 J of 3550 J and drops to 109 rpm backwards; 336 J goes to the opponent; the contact force is 150 kN to 300 kN",
    );
    expect([c.figure?.label, c.figure?.text]).toEqual(["Energy to the opponent", "336 J"]);
    // Bite: 2 m/s / (2 impactors × 8000/60 rev/s) = 7.50 mm.
    expect(c.details.map((d) => [d.label, d.text])).toEqual([
      ["Impulse on your robot", "95.5 N·s"],
      ["Peak contact force (estimate)", "300 kN"],
      ["Bite", "7.50 mm"],
    ]);
    expect(c.details[0]!.unit).toBe("N·s");
  });

  it("on a light opponent the rotor keeps spinning forwards, in US units (hand-checked)", () => {
    const c = card({ ...defaults, targetMass: 1 }, "us");
    // J = 48.29 N·s: ω after = 837.76 − 48.29 × 0.09 / 0.010125 = 408.5 rad/s = 3900 rpm, forwards.
    // Rotor gives up ½ × 0.010125 × (837.76² − 408.5²) = 2708 J = 2000 ft·lbf (÷ 1.35582) of 3553 J = 2620 ft·lbf;
    // the opponent takes 48.29² / 2 = 1166 J = 860 ft·lbf.
    expect(c.margin).toBe(
      "The rotor gives up 2000 ft·lbf of 2620 ft·lbf and drops to 3900 rpm; 860 ft·lbf goes to the opponent; the contact force is 17100 lbf to 34100 lbf",
    );
    // 1 kg = 2.20 lb; 20 mm = 0.787 in.
    expect(c.rule).toBe("One clean hit at 8000 rpm on a free 2.20 lb opponent, restitution 0.2; the force is an estimate from a 0.787 in crush");
    expect(c.details.map((d) => d.text)).toEqual(["48.3 N·s", "34100 lbf", "0.295 in"]);
  });
});
