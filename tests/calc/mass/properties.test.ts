/**
 * The mass properties of a layout worked by hand for point masses, where every term is plain
 * arithmetic: the centre of mass x̄ = Σmᵢxᵢ/M (centre-of-mass), the moment of inertia about the spin
 * axis Σmᵢ(xᵢ² + yᵢ²) about the origin and about the centre (the parallel-axis theorem
 * I_O = I_G + M·e²: W. Moebs, S. J. Ling, J. Sanny, University Physics vol. 1, OpenStax 2016,
 * §10.5), and the products of inertia Σmᵢ·dxᵢ·dzᵢ, Σmᵢ·dyᵢ·dzᵢ about the centre (the sign
 * convention of calc/mass/properties.ts: positive sums, as for a couple that tilts the rotor).
 */
import { describe, expect, it } from "vitest";
import { CalcInputError, coupleUnbalance, type LayoutPart, MAX_PARTS, massProperties, twoPlaneCorrection } from "#calc";

const point = (name: string, mass: number, x: number, y: number, z: number): LayoutPart => ({
  name,
  shape: { kind: "point" },
  mass: { kind: "given", mass },
  x,
  y,
  z,
});

// 1 kg at (100, 200, 50) mm and 2 kg at (−50, 100, −20) mm.
const TWO = [point("a", 1, 0.1, 0.2, 0.05), point("b", 2, -0.05, 0.1, -0.02)];

describe("mass properties of two point masses, by hand", () => {
  const p = massProperties(TWO);

  it("puts the centre at Σmx/M, Σmy/M, Σmz/M: (0, 133.3, 3.33) mm", () => {
    expect(p.totalMass).toBe(3);
    expect(p.centreX).toBeCloseTo(0, 15);
    expect(p.centreY).toBeCloseTo(0.4 / 3, 15);
    expect(p.centreZ).toBeCloseTo(0.01 / 3, 15);
    expect(p.firstMomentX).toBeCloseTo(0, 15);
    expect(p.firstMomentY).toBeCloseTo(0.4, 15);
    // The centre lies on +y: 133.3 mm off the origin, at +90°.
    expect(p.offset).toBeCloseTo(0.4 / 3, 15);
    expect(p.offsetAngle).toBeCloseTo(Math.PI / 2, 12);
  });

  it("gives Σm(x² + y²) about the origin (0.075 kg·m²) and I_O − M·e² about the centre (0.021 667 kg·m²)", () => {
    expect(p.inertiaAboutOrigin).toBeCloseTo(1 * (0.01 + 0.04) + 2 * (0.0025 + 0.01), 15);
    expect(p.inertiaAboutCentre).toBeCloseTo(0.075 - 3 * (0.4 / 3) ** 2, 15);
  });

  it("gives the products of inertia about the centre (0.007 and 0.004 667 kg·m²) and about the origin", () => {
    const [cy, cz] = [0.4 / 3, 0.01 / 3];
    expect(p.productXZ).toBeCloseTo(1 * 0.1 * (0.05 - cz) + 2 * -0.05 * (-0.02 - cz), 15);
    expect(p.productYZ).toBeCloseTo(1 * (0.2 - cy) * (0.05 - cz) + 2 * (0.1 - cy) * (-0.02 - cz), 15);
    expect(p.productXZ).toBeCloseTo(0.007, 15);
    expect(p.productYZ).toBeCloseTo(0.014 / 3, 15);
    expect(p.productXZAboutOrigin).toBeCloseTo(1 * 0.1 * 0.05 + 2 * -0.05 * -0.02, 15);
    expect(p.productYZAboutOrigin).toBeCloseTo(1 * 0.2 * 0.05 + 2 * 0.1 * -0.02, 15);
  });

  it("lists each part's mass, radius from the origin and share of the mass", () => {
    expect(p.parts.map((q) => [q.name, q.mass, q.ownInertia])).toEqual([
      ["a", 1, 0],
      ["b", 2, 0],
    ]);
    expect(p.parts[0]!.radius).toBeCloseTo(Math.hypot(0.1, 0.2), 15);
    expect(p.parts[1]!.massFraction).toBeCloseTo(2 / 3, 15);
  });
});

describe("mass properties at the edges", () => {
  it("gives a layout centred on the origin no offset angle (0, not the angle of a rounding error)", () => {
    const centred = massProperties([point("a", 1, 0.1, 0, 0), point("b", 1, -0.1, 0, 0)]);
    expect([centred.offset, centred.offsetAngle]).toEqual([0, 0]);
  });

  it("keeps the centre and the shares of masses near the smallest doubles (they are scaled up exactly, then back)", () => {
    const tiny = 1e-160;
    const q = massProperties(TWO.map((part) => ({ ...part, mass: { kind: "given" as const, mass: (part.mass as { mass: number }).mass * tiny } })));
    const p = massProperties(TWO);
    expect(q.totalMass).toBeCloseTo(3 * tiny, 175);
    expect(q.totalMass / tiny).toBeCloseTo(3, 12);
    expect(q.centreY).toBeCloseTo(p.centreY, 15);
    expect(q.centreZ).toBeCloseTo(p.centreZ, 15);
    expect(q.firstMomentY / tiny).toBeCloseTo(p.firstMomentY, 12);
    expect(q.parts[1]!.massFraction).toBeCloseTo(2 / 3, 15);
  });

  it("gives both first moments of masses near the smallest doubles back in kg·m, scaled down again", () => {
    // One part of 1e-160 kg at (100, 200) mm: Σ m x = 1e-161 kg·m and Σ m y = 2e-161 kg·m.
    const q = massProperties([point("a", 1e-160, 0.1, 0.2, 0)]);
    expect(q.firstMomentX / 1e-161).toBeCloseTo(1, 12);
    expect(q.firstMomentY / 2e-161).toBeCloseTo(1, 12);
  });

  it("gives products of exactly 0 for point masses all at one height, wherever they sit in plan", () => {
    // All at z = 0.5 m: z̄ = Σ m z / M = 0.5 m exactly, so every z − z̄ is 0 and no couple is left, not
    // even a rounding residue (x̄ = 0.1/3 m is not exact, so Σ m (x − x̄) is not exactly 0).
    const p = massProperties([point("a", 1, 0, 0, 0.5), point("b", 1, 0, 0.03, 0.5), point("c", 1, 0.1, 0, 0.5)]);
    expect(p.centreZ).toBe(0.5);
    expect([p.productXZ, p.productYZ]).toEqual([0, 0]);
  });

  it(`takes up to ${MAX_PARTS} parts and refuses an empty list or one more`, () => {
    const many = Array.from({ length: MAX_PARTS }, (_, i) => point(`p${i}`, 0.01, 0.001 * i, 0, 0));
    expect(massProperties(many).parts).toHaveLength(MAX_PARTS);
    expect(() => massProperties([...many, point("extra", 0.01, 0, 0, 0)])).toThrow(CalcInputError);
    expect(() => massProperties([...many, point("extra", 0.01, 0, 0, 0)])).toThrow(`parts must be a list of 1 to ${MAX_PARTS} parts (got ${MAX_PARTS + 1})`);
    expect(() => massProperties([])).toThrow(`parts must be a list of 1 to ${MAX_PARTS} parts (got 0)`);
  });
});

describe("unbalance corrections worked by hand (rigid-rotor-unbalance)", () => {
  it("points the couple along its products of inertia: I_yz alone lies at +90°", () => {
    const c = coupleUnbalance({ productXZ: 0, productYZ: 1e-5, angularSpeed: 100 });
    expect(c.couple).toBe(1e-5);
    expect(c.moment).toBeCloseTo(100 ** 2 * 1e-5, 15);
    expect(c.angle).toBeCloseTo(Math.PI / 2, 12);
    expect(coupleUnbalance({ productXZ: 0, productYZ: 0, angularSpeed: 100 }).angle).toBe(0);
  });

  it("balances 10 g at (0, 50 mm, 10 mm) with 7.5 g and 2.5 g at −90° in planes at 5 and 25 mm, r = 50 mm", () => {
    // First moment m·y = 5e-4 kg·m, product m·y·z = 5e-6 kg·m²; the two corrections must cancel both:
    // U₁ + U₂ = −5e-4 and U₁·z₁ + U₂·z₂ = −5e-6 give U₁ = −3.75e-4, U₂ = −1.25e-4 kg·m.
    const fix = twoPlaneCorrection({ firstMomentX: 0, firstMomentY: 5e-4, productXZ: 0, productYZ: 5e-6, planeZ1: 0.005, planeZ2: 0.025, radius: 0.05 });
    expect(fix.lower.mass).toBeCloseTo(0.0075, 15);
    expect(fix.upper.mass).toBeCloseTo(0.0025, 15);
    expect(fix.lower.angle).toBeCloseTo(-Math.PI / 2, 12);
    expect(fix.upper.angle).toBeCloseTo(-Math.PI / 2, 12);
    expect([fix.lower.z, fix.upper.z]).toEqual([0.005, 0.025]);
    // After the corrections: no first moment and no product left.
    expect(5e-4 + fix.lower.mass * fix.lower.y + fix.upper.mass * fix.upper.y).toBeCloseTo(0, 15);
    expect(5e-6 + fix.lower.mass * fix.lower.y * 0.005 + fix.upper.mass * fix.upper.y * 0.025).toBeCloseTo(0, 15);
  });
});
