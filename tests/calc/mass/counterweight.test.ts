/**
 * Counterweights (calc/mass/counterweight.ts) at the edges a user can reach: a layout already on
 * the axis, a band edge met exactly, a mounting point whose line only touches the target circle,
 * the size of the list of points, and the refusals (each names the field, its value and SI unit).
 * Exact cases use lengths that are powers of two times small whole numbers, so every step of the
 * formulas is exact in doubles and the boundary is met exactly, not up to rounding.
 */
import { describe, expect, it } from "vitest";
import { applyCounterweight, counterweightAtCandidates, counterweightAtRadius, counterweightRadiusForMass, type LayoutPart } from "#calc";
import { expectRefusal } from "../../support/refusal.ts";

// The worked robot of the functions' documentation: 1.4 kg, target 0.2 mm.
const robot = { totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002 };
// The same robot with its centre of mass 0.1 mm off, already within the target.
const within = { ...robot, centreX: 0.0001 };

describe("a layout with its centre of mass exactly on the axis", () => {
  it("needs no counterweight at a radius, and points along +x (direction 0), not at 180°", () => {
    const a = counterweightAtRadius({ ...robot, centreX: 0, centreY: 0, radius: 0.055 });
    expect(a).toMatchObject({ status: "not-needed", mass: 0, massForZero: 0, angle: 0, x: 0.055, y: 0, offsetAfter: 0 });
  });

  it("needs no counterweight of a given mass, at direction 0", () => {
    const f = counterweightRadiusForMass({ ...robot, centreX: 0, centreY: 0, mass: 0.05, maxRadius: 0.065 });
    expect(f).toMatchObject({ status: "not-needed", radius: 0, radiusForZero: 0, angle: 0 });
  });
});

describe("counterweight of a given mass at the inner edge of its band", () => {
  it("places it when the largest mounting radius equals the smallest workable radius, leaving the offset on the target", () => {
    // M = 1 kg, e = 15.625 mm, e_t = 0.9765625 mm, m = 0.25 kg:
    // r_min = (M e − e_t (M + m))/m = (0.015625 − 0.0009765625 × 1.25)/0.25 = 0.014404296875/0.25 = 0.0576171875 m.
    const rMin = 0.0576171875;
    const f = counterweightRadiusForMass({ totalMass: 1, centreX: 0.015625, centreY: 0, targetOffset: 0.0009765625, mass: 0.25, maxRadius: rMin });
    expect(f.minRadius).toBe(rMin);
    expect(f.status).toBe("placed");
    expect(f.radius).toBe(rMin);
    // e' = (M e − m r)/(M + m) = (0.015625 − 0.25 × 0.0576171875)/1.25 = 0.0009765625 m, the target.
    expect(f.offsetAfter).toBeCloseTo(0.0009765625, 15);
    // A hair less room and it no longer fits.
    const tooSmall = counterweightRadiusForMass({
      totalMass: 1,
      centreX: 0.015625,
      centreY: 0,
      targetOffset: 0.0009765625,
      mass: 0.25,
      maxRadius: rMin * (1 - 1e-12),
    });
    expect(tooSmall).toMatchObject({ status: "too-far-out", radius: null, offsetAfter: null });
  });
});

describe("mounting points at the edge of the target circle", () => {
  it("takes a point whose line from the centre of mass just touches the target circle, with the mass that lands on the touching point", () => {
    // M = 1 kg, c = (11.71875, 15.625) mm (e = 19.53125 mm, a 3-4-5 triangle), e_t = 15.625 mm,
    // p = (−31.25, 15.625) mm: the line y = 15.625 mm from c through p touches the target circle.
    // With u = 1/256 m: A = |p|² − e_t² = 64u², B = 2M(c·p − e_t²) = −48u², C = M²(e² − e_t²) = 9u²,
    // B² − 4AC = 2304u⁴ − 2304u⁴ = 0, a double root m = 2C/(−B) = 18/48 = 0.375 kg.
    const c = counterweightAtCandidates({
      totalMass: 1,
      centreX: 0.01171875,
      centreY: 0.015625,
      targetOffset: 0.015625,
      candidates: [{ x: -0.03125, y: 0.015625 }],
    });
    expect(c.best).toBe(0);
    expect(c.candidates[0]).toMatchObject({ feasible: true, mass: 0.375, reason: null });
    // The centre moves to (c + m p)/(M + m) = (0, 15.625) mm, on the circle.
    expect(c.candidates[0]!.offsetAfter).toBeCloseTo(0.015625, 15);
  });

  it("refuses a point on the target circle itself on the heavy side: only an endless mass would bring the centre there", () => {
    // M = 1 kg, c = (3.90625, 0) mm, e_t = 1.953125 mm, p = (1.953125, 0) mm: A = |p|² − e_t² = 0, so
    // the equation is B m + C = 0 with B = 2(c·p − e_t²) > 0 and C > 0: no root m ≥ 0.
    const c = counterweightAtCandidates({ totalMass: 1, centreX: 0.00390625, centreY: 0, targetOffset: 0.001953125, candidates: [{ x: 0.001953125, y: 0 }] });
    expect(c.best).toBeNull();
    expect(c.candidates[0]).toMatchObject({
      feasible: false,
      mass: null,
      offsetAfter: null,
      reason: "the line from the centre of mass toward this point never enters the target circle",
    });
  });
});

describe("the list of mounting points", () => {
  const point = { x: -0.055, y: 0 };

  it("takes up to 100 points and refuses none or 101, naming the list and its length", () => {
    expect(counterweightAtCandidates({ ...robot, candidates: Array.from({ length: 100 }, () => point) }).candidates).toHaveLength(100);
    expectRefusal(
      () => counterweightAtCandidates({ ...robot, candidates: Array.from({ length: 101 }, () => point) }),
      "candidates",
      101,
      "",
      "candidates must be a list of 1 to 100 mounting points (got 101)",
    );
    expectRefusal(
      () => counterweightAtCandidates({ ...robot, candidates: [] }),
      "candidates",
      0,
      "",
      "candidates must be a list of 1 to 100 mounting points (got 0)",
    );
  });

  it("names a missing point and a coordinate out of range by their place in the list", () => {
    const missing = [point, null] as unknown as { x: number; y: number }[];
    expectRefusal(
      () => counterweightAtCandidates({ ...robot, candidates: missing }),
      "candidates[1]",
      null,
      "",
      "candidates[1] must be an object of named inputs (got null)",
    );
    expectRefusal(
      () => counterweightAtCandidates({ ...robot, candidates: [point, { x: 150, y: 0 }] }),
      "candidates[1].x",
      150,
      "m",
      "candidates[1].x must be at least -100 m and at most 100 m (got 150 m)",
    );
  });
});

describe("counterweight refusals name the input that took a figure out of the doubles", () => {
  it("names a radius so small that the mass for zero offset passes the largest double, whether or not a counterweight is needed", () => {
    // m₀ = M e / r = 1.4 × 0.0001 / 1e-315 = 1.4e311 kg (within the target) and 1.4 × 0.002 / 1e-315 = 2.8e312 kg.
    for (const centre of [within, robot]) {
      expectRefusal(
        () => counterweightAtRadius({ ...centre, radius: 1e-315 }),
        "radius",
        1e-315,
        "m",
        "radius must be large enough for the counterweight to stay finite (got 1e-315 m)",
      );
    }
  });

  it("names a counterweight mass so small that its radius passes the largest double, whether or not one is needed", () => {
    // Needed: r_min = (M e − e_t (M + m))/m = (0.0028 − 0.00028)/1e-315 = 2.52e312 m, too far out.
    // Not needed: r₀ = M e / m = 1.4e-4 / 1e-315 = 1.4e311 m.
    for (const centre of [robot, within]) {
      expectRefusal(
        () => counterweightRadiusForMass({ ...centre, mass: 1e-315, maxRadius: 0.065 }),
        "mass",
        1e-315,
        "kg",
        "mass must be large enough for the counterweight to stay finite (got 1e-315 kg)",
      );
    }
  });

  it("names a target offset or a total mass that takes the band of radii past the largest double", () => {
    // r_max = (M e + e_t (M + m))/m = (1.4e-4 + 1e308 × 1.45)/0.05 = 2.9e309 m.
    expectRefusal(
      () => counterweightRadiusForMass({ ...within, targetOffset: 1e308, mass: 0.05, maxRadius: 0.065 }),
      "targetOffset",
      1e308,
      "m",
      "targetOffset must be small enough for the counterweight to stay finite (got 1e+308 m)",
    );
    // M e = 1e307 kg × 100 m = 1e309 kg·m.
    expectRefusal(
      () => counterweightRadiusForMass({ ...robot, totalMass: 1e307, centreX: 100, mass: 0.05, maxRadius: 0.065 }),
      "totalMass",
      1e307,
      "kg",
      "totalMass must be small enough for the counterweight to stay finite (got 1e+307 kg)",
    );
  });

  it("names a total mass whose quadratic for a mounting point passes the largest double", () => {
    // C = M²(e² − e_t²) with M = 1e160 kg: M² = 1e320, past the doubles.
    expectRefusal(
      () => counterweightAtCandidates({ ...robot, totalMass: 1e160, candidates: [{ x: 0.0001, y: 0 }] }),
      "totalMass",
      1e160,
      "kg",
      "totalMass must be small enough for the counterweight to stay finite (got 1e+160 kg)",
    );
  });
});

describe("adding a counterweight to the layout", () => {
  const parts: LayoutPart[] = [{ name: "hub", shape: { kind: "point" }, mass: { kind: "given", mass: 1 }, x: 0.01, y: 0, z: 0 }];

  it("refuses a counterweight of no mass, naming its mass in kg", () => {
    expectRefusal(
      () => applyCounterweight({ parts, mass: 0, x: -0.1, y: 0, z: 0 }),
      "mass",
      0,
      "kg",
      "mass must be greater than 0 kg and at most 10000 kg (got 0 kg)",
    );
  });

  it("names a position out of range as the counterweight's", () => {
    expectRefusal(
      () => applyCounterweight({ parts, mass: 0.1, x: 150, y: 0, z: 0 }),
      "counterweight.x",
      150,
      "m",
      "counterweight.x must be at least -100 m and at most 100 m (got 150 m)",
    );
  });
});
