/**
 * The spin-up calculator's build-sheet cards (calc/calculators/spin-up.ts): the verdict, the words
 * and the figures a user reads, for a run that reaches its target, one that tops out below it, one
 * that never moves, without a current limit, and in US units. Inputs are the form's invented demo
 * values; simulated times and currents are regression pins of the simulation (its physics is
 * checked in tests/calc/drivetrain.test.ts), the rest is checked by hand in the comments.
 */
import { describe, expect, it } from "vitest";
import spinUp, { run } from "../../../calc/calculators/spin-up.ts";
import { initialValues } from "../../../calc/core/calculator.ts";
import type { UnitSystem } from "../../../calc/core/units.ts";

const demo = initialValues(spinUp);
const cardsFor = (values: Partial<typeof demo>, system: UnitSystem = "metric") => {
  const v = { ...demo, ...values };
  return spinUp.cards(v, run(v), system);
};

describe("the spin-up cards", () => {
  it("holds when the demo weapon reaches 10 000 rpm, and gives its time, currents and stored energy", () => {
    const [spin, energy] = cardsFor({});
    expect(spin!.status).toBe("holds");
    expect(spin!.rule).toBe("Reaches the target speed 10000 rpm");
    // Times and the sag are simulation regression pins; 60 A is the demo's current limit.
    expect(spin!.margin).toBe("Reaches it in 1.01 s (90 % in 844 ms); peak battery current 60.0 A, battery sags to 14.5 V");
    expect(spin!.figure).toMatchObject({ label: "Time to target speed", unit: "s", text: "1.01 s" });
    expect(spin!.details.map((d) => [d.label, d.text])).toEqual([
      ["Peak battery current", "60.0 A"],
      // 4 cells × 4.1 V − 60 A × 4 × 0.008 Ω = 16.4 − 1.92 = 14.48 V
      ["Lowest battery voltage", "14.5 V"],
      // limited at the motor: 60 A at standstill
      ["Motor current at standstill", "60.0 A"],
    ]);
    expect(energy!.key).toBe("energy");
    expect(energy!.status).toBe("info");
    expect(energy!.rule).toBe("Kinetic energy ½·J·Ω² at the target speed (or the top speed reached): what the enclosure and the event's rules must contain");
    // tip speed 1047.2 rad/s × 0.06 m = 62.83 m/s; 345 J is a regression pin (rotor J plus the motor's rotor through the gear)
    expect(energy!.margin).toBe("345 J at 10000 rpm, tip speed 62.8 m/s");
    expect(energy!.figure).toMatchObject({ label: "Stored energy", unit: "J", text: "345 J" });
    // 345.436 J / 1.5 kg = 230.3 J/kg
    expect(energy!.details).toEqual([
      { label: "Energy per kilogram of robot", value: expect.closeTo(345.43615403812754 / 1.5, 9), unit: "J/kg", text: "230 J/kg" },
    ]);
  });

  it("fails a target above the no-load speed and speaks of the top speed it reaches (not the target)", () => {
    const [spin, energy] = cardsFor({ targetSpeed: 1256.6370614359173 }); // 12 000 rpm
    expect(spin!.status).toBe("fails");
    expect(spin!.rule).toBe("Reaches the target speed 12000 rpm");
    expect(spin!.margin).toBe("Tops out at 11300 rpm"); // regression pin; below Kv·V/gear = 1400 × 16.4 / 2 = 11 480 rpm
    expect(spin!.figure).toMatchObject({ label: "Top speed reached", unit: "rad/s", text: "11300 rpm" });
    // The energy at the top speed: ½·J·Ω² grows by (1180/1047.2)² ≈ 1.27 over the 345 J at 10 000 rpm.
    expect(energy!.margin).toBe("439 J at 11300 rpm, tip speed 70.8 m/s");
  });

  it("fails a rotor whose friction exceeds the stall torque and says it does not move", () => {
    // Stall torque at the 60 A limit: Kt·(I − I0) = (1/146.6 N·m/A) × (60 − 1.2) A ≈ 0.40 N·m, × gear 2 ≪ 100 N·m
    const [spin] = cardsFor({ frictionTorque: 100 });
    expect(spin!.status).toBe("fails");
    expect(spin!.margin).toBe("Tops out at 0 rpm (does not move)");
    expect(spin!.figure).toMatchObject({ label: "Top speed reached", text: "0 rpm" });
  });

  it("names the motor's stall current when nothing limits it: V/R with the battery's resistance in series", () => {
    const [spin] = cardsFor({ currentLimitAt: "none" });
    const stall = spin!.details[2]!;
    expect(stall.label).toBe("Stall current per motor (no limit)");
    // 16.4 V / (0.045 Ω motor + 4 × 0.008 Ω battery) = 16.4 / 0.077 = 213.0 A
    expect(stall.value).toBeCloseTo(16.4 / 0.077, 6);
    expect(stall.text).toBe("213 A");
  });

  it("writes the figures in US units when the sheet is in US units", () => {
    const [, energy] = cardsFor({}, "us");
    // 345.44 J / 1.35582 J per ft·lbf = 254.8 ft·lbf; 62.83 m/s / 0.3048 = 206.1 ft/s
    expect(energy!.margin).toBe("255 ft·lbf at 10000 rpm, tip speed 206 ft/s");
    expect(energy!.figure!.text).toBe("255 ft·lbf");
  });

  it("runs without the time series: the build sheet and the command line get the figures alone", () => {
    expect(run(demo).series).toEqual([]);
  });
});
