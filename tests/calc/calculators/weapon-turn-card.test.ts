import { describe, expect, it } from "vitest";
import weaponTurn from "../../../calc/calculators/weapon-turn.ts";
import { initialValues } from "../../../calc/core/calculator.ts";

// The page's defaults: J = 0.010125 kg·m², 8000 rpm (837.758 rad/s, so J·Ω = 8.4823 N·m·s), a 13.6 kg
// robot on a 280 mm track, centre of mass 45 mm up and centred, wheels 3.5 m/s, a 360 °/s turn entered,
// bearings 50 mm apart, lift margin 1.5.
const defaults = initialValues(weaponTurn);

function card(values: typeof defaults, system: "metric" | "us") {
  return weaponTurn.cards(values, weaponTurn.run(values), system)[0]!;
}

describe("turning-with-a-spinning-weapon card", () => {
  it("asks only for the horizontal axle's inputs, not the tilt and precession figures", () => {
    expect(weaponTurn.applies?.("tiltRate", defaults)).toBe(false);
    expect(weaponTurn.applies?.("precessionAngle", defaults)).toBe(false);
    expect(weaponTurn.applies?.("weaponSpeed", defaults)).toBe(true);
  });

  it("turning in place: the lift rate, the drive's limits, the moment and the bearing pair (hand-derived)", () => {
    const c = card({ ...defaults, forwardSpeed: 0 }, "metric");
    // Lift: m·g·t/2 / (J·Ω) = 13.6 × 9.80665 × 0.14 / 8.4823 = 2.2013 rad/s = 126 °/s.
    // Drive in place: 2 × 3.5 / 0.28 = 25 rad/s = 1430 °/s (3 significant figures).
    expect(c.margin).toBe("A wheel lifts turning left at 126 °/s; the drive reaches 1430 °/s at 0 m/s");
    expect([c.figure?.label, c.figure?.text]).toEqual(["Lift turn rate", "126 °/s"]);
    // Gyroscopic moment: 8.4823 × 2π = 53.3 N·m; over 50 mm bearings: 1066 N. Margin: 2.2013 / 25 = 0.0881.
    expect(c.details.map((d) => [d.label, d.text])).toEqual([
      ["Drive's fastest turn at that speed", "1430 °/s"],
      ["Drive's fastest turn in place", "1430 °/s"],
      ["Gyroscopic moment at the turn rate entered", "53.3 N·m"],
      ["Bearing force pair at that turn rate", "1070 N"],
      ["Lift margin", "0.0881"],
    ]);
    expect(c.status).toBe("fails");
  });

  it("at 1 m/s, in US units: the centrifugal moment offsets the gyroscopic one (hand-derived)", () => {
    const c = card(defaults, "us");
    // Lift: 18.672 / (8.4823 − 13.6 × 1 × 0.045) = 18.672 / 7.8703 = 2.3725 rad/s = 136 °/s.
    // Drive at 1 m/s: 2 × (3.5 − 1) / 0.28 = 17.86 rad/s = 1020 °/s; 1 m/s = 3.28 ft/s.
    expect(c.margin).toBe("A wheel lifts turning left at 136 °/s; the drive reaches 1020 °/s at 3.28 ft/s");
    // 53.3 N·m = 472 lbf·in; 1066 N = 240 lbf.
    expect(c.details.map((d) => d.text)).toEqual(["1020 °/s", "1430 °/s", "472 lbf·in", "240 lbf", "0.133"]);
    expect(c.rule).toBe(
      "A wheel lifts where J·Ω·ψ̇ (plus the centrifugal m·v·ψ̇·h) reaches m·g·(t/2 ± y_c); the lift turn rate should be at least 1.50 × the larger of the drive's fastest turn and the turn rate entered",
    );
  });

  it("when the centrifugal moment cancels the gyroscopic one, no turn lifts a wheel and there is no lift figure or margin", () => {
    // J·Ω = 0.5 × 2 = 1 N·m·s equals m·v·h = 10 × 1 × 0.1 = 1 N·m·s.
    const c = card({ ...defaults, rotorInertia: 0.5, weaponSpeed: 2, robotMass: 10, forwardSpeed: 1, comHeight: 0.1 }, "metric");
    expect(c.margin).toBe("No turn rate lifts a wheel: the moments cancel");
    expect(c.figure).toBeNull();
    expect(c.status).toBe("holds");
    // J·Ω·ψ̇ = 1 × 2π = 6.28 N·m; over 50 mm: 126 N.
    expect(c.details.map((d) => d.text)).toEqual(["1020 °/s", "1430 °/s", "6.28 N·m", "126 N"]);
  });
});
