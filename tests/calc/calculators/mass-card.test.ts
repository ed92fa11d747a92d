/**
 * The mass-layout calculator's build-sheet cards (calc/calculators/mass.ts): balance, couple lift and
 * the true sensor radius, with the words and figures a user reads. The layout is an invented 1 kg
 * rotor: a 0.99 kg hub on the axis and a 10 g lug at x (and height z), spun at 100 rad/s against
 * G 6.3 (ISO 21940-11:2016 Table 1, G = e·Ω), so the equivalent grade G = (0.01·x / 1 kg)·100 = x [m/s].
 */
import { describe, expect, it } from "vitest";
import mass, { run } from "../../../calc/calculators/mass.ts";
import { initialValues } from "../../../calc/core/calculator.ts";
import { type LayoutPart, MAX_PARTS } from "../../../calc/mass/parts.ts";

const lugAt = (x: number, z = 0): LayoutPart[] => [
  { name: "hub", shape: { kind: "point" }, mass: { kind: "given", mass: 0.99 }, x: 0, y: 0, z: 0 },
  { name: "lug", shape: { kind: "point" }, mass: { kind: "given", mass: 0.01 }, x, y: 0, z },
];
const base = { ...initialValues(mass), spinSpeed: 100, balanceGrade: 0.0063 };
const cardsFor = (x: number, z = 0, more: Partial<typeof base> = {}) => {
  const v = { ...base, parts: lugAt(x, z), ...more };
  return mass.cards(v, run(v), "metric");
};

describe("the balance card", () => {
  it("holds at G 5 against G 6.3, with the mass figures (U = 10 g × 5 mm = 50 g·mm, F = U·Ω² = 0.5 N)", () => {
    const [balance] = cardsFor(0.005);
    expect(balance!.status).toBe("holds");
    expect(balance!.margin).toBe("Centre of mass 0.0500 mm off the geometric centre: equivalent grade G 5.00; no counterweight suggested");
    expect(balance!.figure).toMatchObject({ label: "Equivalent balance grade", text: "5.00 mm/s" });
    // J = 0.01 kg × (5 mm)² − 1 kg × (0.05 mm)² = 2.5e-7 − 2.5e-9 = 2.48e-7 kg·m²
    expect(balance!.details.map((d) => [d.label, d.text])).toEqual([
      ["Total mass", "1.00 kg"],
      ["Static unbalance", "50.0 g·mm"],
      ["Rotating force from the unbalance", "0.500 N"],
      ["Moment of inertia about the spin axis", "2.48 × 10⁻⁷ kg·m²"],
    ]);
  });

  it("is marginal up to and including one grade step coarser: G 6.3 × 2.5 = G 15.75 exactly", () => {
    expect(cardsFor(0.015)[0]!.status).toBe("marginal");
    const [edge] = cardsFor(0.01575);
    expect(edge!.status).toBe("marginal");
    expect(edge!.figure!.text).toBe("15.8 mm/s");
  });

  it("fails at G 50 and suggests the counterweight that brings the centre of mass to the target offset", () => {
    const [balance] = cardsFor(0.05);
    expect(balance!.status).toBe("fails");
    // Target 0.2 mm: a mass m at the 55 mm correction radius moving 1 kg's 0.5 mm offset to 0.2 mm:
    // (1 kg × 0.5 mm − m × 55 mm)/(1 kg + m) = 0.2 mm → m = 0.3 kg·mm / 55.2 mm = 5.43 g
    expect(balance!.margin).toBe("Centre of mass 0.500 mm off the geometric centre: equivalent grade G 50.0; a 5.43 g counterweight brings it to 0.200 mm");
  });

  it("suggests no counterweight when it would pass the 10 000 kg part limit (the layout is left as it is)", () => {
    // Two 5000 kg points, one on the axis and one at 1 m: the centre of mass is 0.5 m out, and the mass at
    // the 55 mm correction radius that brings it to 0.2 mm is about 10 000 kg × 0.5 / 0.055 ≈ 91 000 kg.
    const parts: LayoutPart[] = [
      { name: "a", shape: { kind: "point" }, mass: { kind: "given", mass: 5000 }, x: 0, y: 0, z: 0 },
      { name: "b", shape: { kind: "point" }, mass: { kind: "given", mass: 5000 }, x: 1, y: 0, z: 0 },
    ];
    const v = { ...base, parts };
    const r = run(v);
    expect(r.fix.method).toBe("too-heavy");
    expect(mass.cards(v, r, "metric")[0]!.margin).toMatch(/; no counterweight suggested$/);
  });

  it(`says a full list (${MAX_PARTS} parts) has no room for the counterweight it needs, rather than suggesting none`, () => {
    // 200 parts of 10 g, one of them 50 mm out: e = 0.5 g·m / 2 kg = 0.25 mm, G = e·Ω = 25 mm/s at 100 rad/s.
    const parts: LayoutPart[] = Array.from({ length: MAX_PARTS }, (_, i) => ({
      name: `p${i}`,
      shape: { kind: "point" },
      mass: { kind: "given", mass: 0.01 },
      x: i === 0 ? 0.05 : 0,
      y: 0,
      z: 0,
    }));
    const v = { ...base, parts };
    const r = run(v);
    expect(r.fix.method).toBe("list-full");
    expect(mass.cards(v, r, "metric")[0]!.margin).toBe(
      `Centre of mass 0.250 mm off the geometric centre: equivalent grade G 25.0; no room for a counterweight (the list holds ${MAX_PARTS} parts)`,
    );
  });

  it("writes the figures in US units when the sheet is in US units", () => {
    const v = { ...base, parts: lugAt(0.005) };
    const [balance] = mass.cards(v, run(v), "us");
    // 1 kg = 2.20 lb; 0.05 mm = 0.00197 in
    expect(balance!.details[0]!.text).toBe("2.20 lb");
    expect(balance!.margin).toMatch(/^Centre of mass 0\.00197 in off the geometric centre/);
  });
});

describe("the couple-lift card", () => {
  it("holds with no couple and says no side lifts, against the weight's moment M·g·a = 1 × 9.80665 × 0.07 = 0.686 N·m", () => {
    const [, lift] = cardsFor(0.005);
    expect(lift!.key).toBe("lift");
    expect(lift!.status).toBe("holds");
    expect(lift!.rule).toBe(
      "The couple's rocking moment Ω²·C against the weight's M·g·a on a 70.0 mm support radius: one side lifts at 100 %; marginal above 50 %",
    );
    expect(lift!.margin).toBe("0 % of the weight's moment at 955 rpm; no couple, so no side lifts");
    expect(lift!.details.map((d) => [d.label, d.text])).toEqual([
      ["Rocking moment at speed", "0 N·m"],
      ["Weight's restoring moment", "0.686 N·m"],
    ]);
  });

  it("gives the share and the lift speed for a couple: C = 0.01 × 0.03 × 0.05 − 1 × 0.0003 × 0.0005 = 1.485e-5 kg·m²", () => {
    const [, lift] = cardsFor(0.03, 0.05);
    // Ω²·C = 1e4 × 1.485e-5 = 0.1485 N·m; / 0.6865 = 21.6 %; lifts at 100/√0.2163 = 215 rad/s = 2050 rpm
    expect(lift!.status).toBe("holds");
    expect(lift!.margin).toBe("21.6 % of the weight's moment at 955 rpm; one side lifts at 2050 rpm");
    expect(lift!.figure).toMatchObject({ label: "Rocking moment as a share of the weight's", text: "21.6 %" });
    expect(lift!.details[0]!.text).toBe("0.148 N·m");
  });

  it("is marginal above 50 % and fails from 100 % (the couple grows with the lug's height z)", () => {
    // z = 0.15 m: C ≈ 3 × 1.485e-5 → about 65 %; z = 0.3 m → about 130 %.
    const marginal = cardsFor(0.03, 0.15)[1]!;
    expect(marginal.status).toBe("marginal");
    expect(marginal.figure!.value).toBeGreaterThan(0.5);
    const fails = cardsFor(0.03, 0.3)[1]!;
    expect(fails.status).toBe("fails");
    expect(fails.figure!.value).toBeGreaterThan(1);
  });
});

describe("the true-sensor-radius card", () => {
  it("says the wheels' grip holds and the sensor reads its own radius (e ≤ μ·s·g/Ω² keeps the offset on its orbit)", () => {
    const [, , sensor] = cardsFor(0.005);
    expect(sensor!.key).toBe("sensor");
    expect(sensor!.status).toBe("info");
    expect(sensor!.rule).toBe(
      "The firmware's radius should be the radius about the spin centre (the wheels' centre while their side grip holds, else short of the centre of mass); confirm it by calibrating on the robot",
    );
    expect(sensor!.margin).toBe(
      "The wheels' grip holds: the robot turns about their centre. Sensor is 32.0 mm from the spin centre and 32.0 mm from the geometric centre: 0° of drift per revolution if the firmware uses the latter",
    );
  });

  it("says the wheels slide without side grip, and gives the drift 2π(√(32.05/32) − 1) = 0.281° per turn", () => {
    const [, , sensor] = cardsFor(0.005, 0, { sideGrip: 0 });
    expect(sensor!.margin).toBe(
      "The wheels slide: the robot turns 0.0500 mm from their centre. Sensor is 32.1 mm from the spin centre and 32.0 mm from the geometric centre: 0.281° of drift per revolution if the firmware uses the latter",
    );
    expect(sensor!.figure).toMatchObject({ label: "Drift per revolution", text: "0.281°" });
    expect(sensor!.details.map((d) => [d.label, d.text])).toEqual([
      ["Radius about the spin centre", "32.1 mm"],
      ["Spin centre from the geometric centre", "0.0500 mm"],
    ]);
  });
});
