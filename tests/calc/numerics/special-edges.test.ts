import { describe, expect, it } from "vitest";
import { logGamma, normalCdf, normalQuantile, studentTCdf, studentTQuantile } from "../../../calc/numerics/special.ts";
import { expectRefusal } from "../../support/refusal.ts";

/** Relative difference |got − expected|/|expected|. */
const rel = (got: number, expected: number) => Math.abs(got - expected) / Math.abs(expected);

describe("logGamma", () => {
  it("gives ln Γ(1) = ln Γ(2) = 0 and ln Γ(3) = ln 2 (Γ(n) = (n − 1)!)", () => {
    expect(logGamma(1)).toBeCloseTo(0, 14);
    expect(logGamma(2)).toBeCloseTo(0, 14);
    expect(logGamma(3)).toBeCloseTo(Math.LN2, 14);
  });

  it("gives ln 170! = 706.5730622457874 (the largest factorial below the largest double; from memory)", () => {
    expect(rel(logGamma(171), 706.5730622457874)).toBeLessThan(1e-14);
  });

  it("follows Stirling's series at x = 10¹⁰: (x − ½)ln x − x + ½ln 2π + 1/(12x) (abramowitz-stegun-1964 6.1.41)", () => {
    const x = 1e10;
    const stirling = (x - 0.5) * Math.log(x) - x + 0.5 * Math.log(2 * Math.PI) + 1 / (12 * x);
    expect(rel(logGamma(x), stirling)).toBeLessThan(1e-14);
  });

  it("uses ln Γ(x) = −ln x − γx near 0, finite down to the smallest double (the reflection's π/sin πx would overflow there)", () => {
    // γ = 0.5772156649 (abramowitz-stegun-1964 6.1.3)
    expect(logGamma(Number.MIN_VALUE)).toBe(-Math.log(Number.MIN_VALUE));
    expect(logGamma(Number.MIN_VALUE)).toBeCloseTo(744.4400719213812, 12);
    expect(rel(logGamma(1e-12), -Math.log(1e-12) - 0.5772156649015329e-12)).toBeLessThan(1e-15);
  });

  it("reflects below ½: ln Γ(0.25) = ln 3.625609908221908 (Γ(¼), from memory)", () => {
    expect(rel(logGamma(0.25), Math.log(3.625609908221908))).toBeLessThan(1e-13);
    expect(rel(logGamma(1e-5), Math.log(99999.42279422554))).toBeLessThan(1e-12); // Γ(x) ≈ 1/x − γ near 0
  });

  it("refuses x of 0 or less and an x whose ln Γ passes the largest double, naming x", () => {
    expectRefusal(() => logGamma(0), "x", 0, "", "x must be greater than 0 (got 0)");
    expectRefusal(() => logGamma(-2), "x", -2, "", "x must be greater than 0 (got -2)");
    expectRefusal(() => logGamma(Number.NaN), "x", Number.NaN, "", "x must be a finite number (got not a number)");
    expectRefusal(() => logGamma(Number.MAX_VALUE), "x", Number.MAX_VALUE, "", "x must be small enough for the ln Γ(x) to stay finite (got 1.79769e+308)");
  });
});

describe("normalCdf", () => {
  // Φ(−z) values from memory, to the digits printed by standard tables extended to 15 significant figures
  // (abramowitz-stegun-1964 Table 26.1 prints Φ(1) = 0.8413447461, Φ(2) = 0.9772498681, Φ(3) = 0.9986501020).
  const tails = [
    { z: -1, p: 0.15865525393145705 },
    { z: -2, p: 0.02275013194817921 },
    { z: -3, p: 0.0013498980316300946 },
    { z: -5, p: 2.866515718791939e-7 },
    { z: -10, p: 7.619853024160527e-24 },
  ];
  it.each(tails)("gives Φ($z) = $p and Φ(−z) = 1 − Φ(z)", ({ z, p }) => {
    expect(rel(normalCdf({ z }), p)).toBeLessThan(1e-13);
    expect(normalCdf({ z: -z })).toBeCloseTo(1 - p, 15);
  });

  it("follows its Taylor series near 0: Φ(z) = ½ + (z − z³/6)/√(2π) + O(z⁵)", () => {
    for (const z of [-1e-8, -1e-3, 2e-3]) {
      expect(Math.abs(normalCdf({ z }) - (0.5 + (z - z ** 3 / 6) / Math.sqrt(2 * Math.PI))), String(z)).toBeLessThan(1e-15);
    }
    // Normal table (from memory): Φ(−0.1) = 0.460172, Φ(−0.5) = 0.308538, and z₀.₆ = 0.253347.
    expect(normalCdf({ z: -0.1 })).toBeCloseTo(0.460172, 6);
    expect(normalCdf({ z: -0.5 })).toBeCloseTo(0.308538, 6);
    expect(normalQuantile({ probability: 0.6 })).toBeCloseTo(0.253347, 6);
  });

  it("gives ½ at 0, 0 and 1 from |z| = 40 on, and a positive tail just inside", () => {
    expect(normalCdf({ z: 0 })).toBe(0.5);
    expect(normalCdf({ z: -0 })).toBe(0.5);
    expect(normalCdf({ z: -40 })).toBe(0);
    expect(normalCdf({ z: 40 })).toBe(1);
    expect(normalCdf({ z: -37 })).toBeGreaterThan(5e-300);
    expect(normalCdf({ z: -37 })).toBeLessThan(6e-300); // Φ(−37) = 5.73e-300 (Mills ratio φ(z)/|z| to 0.1 %)
  });

  it("refuses a z that is not a finite number, and a call without an object", () => {
    expectRefusal(() => normalCdf({ z: Number.NaN }), "z", Number.NaN, "", "z must be a finite number (got not a number)");
    expectRefusal(() => normalCdf({ z: Number.NEGATIVE_INFINITY }), "z", Number.NEGATIVE_INFINITY, "", "z must be a finite number (got minus infinity)");
    expectRefusal(() => normalCdf(null as never), "input", null, "", "input must be an object of named inputs (got null)");
  });
});

describe("normalQuantile", () => {
  // Normal table (from memory): z₀.₉ = 1.281552, z₀.₉₅ = 1.644854, z₀.₉₉ = 2.326348, z₀.₉₉₉ = 3.090232.
  const table = [
    { p: 0.9, z: 1.281552 },
    { p: 0.95, z: 1.644854 },
    { p: 0.99, z: 2.326348 },
    { p: 0.999, z: 3.090232 },
  ];
  it.each(table)("gives z($p) = $z to 6 decimals, and −z at 1 − p", ({ p, z }) => {
    expect(Math.abs(normalQuantile({ probability: p }) - z)).toBeLessThan(5e-7);
    expect(Math.abs(normalQuantile({ probability: 1 - p }) + z)).toBeLessThan(5e-7);
  });

  it("gives exactly +0 at p = ½", () => {
    expect(normalQuantile({ probability: 0.5 })).toBe(0);
  });

  it("inverts Φ deep in the lower tail, down to the smallest double", () => {
    const z = normalQuantile({ probability: 1e-300 });
    expect(z).toBeCloseTo(-37.0471, 4);
    expect(rel(normalCdf({ z }), 1e-300)).toBeLessThan(1e-12);
    expect(normalQuantile({ probability: Number.MIN_VALUE })).toBeCloseTo(-38.4616, 4);
  });

  it("refuses a probability of 0 or 1 by name", () => {
    expectRefusal(() => normalQuantile({ probability: 0 }), "probability", 0, "", "probability must be greater than 0 and less than 1 (got 0)");
    expectRefusal(() => normalQuantile({ probability: 1 }), "probability", 1, "", "probability must be greater than 0 and less than 1 (got 1)");
    expectRefusal(() => normalQuantile(undefined as never), "input", undefined, "", "input must be an object of named inputs (got nothing)");
  });
});

describe("studentTCdf", () => {
  it("is the Cauchy law at ν = 1: F(t) = ½ + arctan(t)/π (abramowitz-stegun-1964 26.7.3)", () => {
    for (const t of [-1e6, -3, -1, -0.25, 0.5, 2, 10, 1e6]) {
      expect(Math.abs(studentTCdf({ t, degreesOfFreedom: 1 }) - (0.5 + Math.atan(t) / Math.PI)), String(t)).toBeLessThan(1e-15);
    }
  });

  it("gives F(t) = ½ + t/(2√(2 + t²)) at ν = 2", () => {
    for (const t of [-5, -1, 0.3, 4]) {
      expect(Math.abs(studentTCdf({ t, degreesOfFreedom: 2 }) - (0.5 + t / (2 * Math.sqrt(2 + t * t)))), String(t)).toBeLessThan(1e-15);
    }
  });

  it("gives F(t) = ½ + [t/(√3(1 + t²/3)) + arctan(t/√3)]/π at ν = 3 (abramowitz-stegun-1964 26.7.3)", () => {
    for (const t of [-3, -1, 0.5, 2, 10]) {
      const exact = 0.5 + (t / (Math.sqrt(3) * (1 + (t * t) / 3)) + Math.atan(t / Math.sqrt(3))) / Math.PI;
      expect(Math.abs(studentTCdf({ t, degreesOfFreedom: 3 }) - exact), String(t)).toBeLessThan(1e-15);
    }
  });

  it("gives ½ at t = 0 whatever ν", () => {
    for (const nu of [0.5, 1, 3, 1e7]) expect(studentTCdf({ t: 0, degreesOfFreedom: nu })).toBe(0.5);
  });

  it("matches the t table at ν = 10: F(2.228) = 0.975 (t table, from memory, 3 decimals)", () => {
    expect(Math.abs(studentTCdf({ t: 2.228, degreesOfFreedom: 10 }) - 0.975)).toBeLessThan(1e-4);
  });

  it("stays a probability at a degree of freedom so small that ν/(ν + t²) is 0", () => {
    expect(studentTCdf({ t: 1e10, degreesOfFreedom: Number.MIN_VALUE })).toBe(1);
    expect(studentTCdf({ t: -1e10, degreesOfFreedom: Number.MIN_VALUE })).toBe(0);
  });

  it("refuses a t that is not finite and a ν of 0 or less, by name", () => {
    expectRefusal(() => studentTCdf({ t: Number.NaN, degreesOfFreedom: 3 }), "t", Number.NaN, "", "t must be a finite number (got not a number)");
    expectRefusal(() => studentTCdf({ t: 1, degreesOfFreedom: 0 }), "degreesOfFreedom", 0, "", "degreesOfFreedom must be greater than 0 (got 0)");
    expectRefusal(() => studentTCdf({ t: 1, degreesOfFreedom: -1 }), "degreesOfFreedom", -1, "", "degreesOfFreedom must be greater than 0 (got -1)");
  });
});

describe("studentTQuantile", () => {
  it("gives t = −cot(πp) at ν = 1 (Cauchy), in both tails", () => {
    for (const p of [1e-10, 0.01, 0.3]) {
      expect(rel(studentTQuantile({ probability: p, degreesOfFreedom: 1 }), -1 / Math.tan(Math.PI * p)), String(p)).toBeLessThan(1e-12);
      // The upper tail of the double nearest 1 − p is 1 − (1 − p), not p itself (1e-10 is known there only to 1e-6).
      const upper = 1 - p;
      expect(rel(studentTQuantile({ probability: upper, degreesOfFreedom: 1 }), 1 / Math.tan(Math.PI * (1 - upper))), String(p)).toBeLessThan(1e-12);
    }
  });

  it("gives t = (2p − 1)/√(2p(1 − p)) at ν = 2", () => {
    for (const p of [1e-10, 0.01, 0.3, 0.7, 0.999999]) {
      const exact = (2 * p - 1) / Math.sqrt(2 * p * (1 - p));
      expect(rel(studentTQuantile({ probability: p, degreesOfFreedom: 2 }), exact), String(p)).toBeLessThan(1e-10);
    }
  });

  it("gives exactly 0 at p = ½, for small and large ν", () => {
    expect(studentTQuantile({ probability: 0.5, degreesOfFreedom: 3 })).toBe(0);
    expect(studentTQuantile({ probability: 0.5, degreesOfFreedom: 1e7 })).toBe(0);
  });

  it("uses the expansion about the normal quantile from ν = 10⁶ on, to second order (abramowitz-stegun-1964 26.7.5)", () => {
    const z = normalQuantile({ probability: 0.995 });
    const nu = 1e6;
    const second = z + (z ** 3 + z) / (4 * nu) + (5 * z ** 5 + 16 * z ** 3 + 3 * z) / (96 * nu * nu);
    expect(rel(studentTQuantile({ probability: 0.995, degreesOfFreedom: nu }), second)).toBeLessThan(1e-12);
    expect(rel(studentTQuantile({ probability: 0.005, degreesOfFreedom: nu }), -second)).toBeLessThan(1e-12);
  });

  it("refuses a probability outside (0, 1) and a ν of 0, by name", () => {
    expectRefusal(
      () => studentTQuantile({ probability: 0, degreesOfFreedom: 3 }),
      "probability",
      0,
      "",
      "probability must be greater than 0 and less than 1 (got 0)",
    );
    expectRefusal(
      () => studentTQuantile({ probability: 0.9, degreesOfFreedom: 0 }),
      "degreesOfFreedom",
      0,
      "",
      "degreesOfFreedom must be greater than 0 (got 0)",
    );
    expectRefusal(() => studentTQuantile(7 as never), "input", 7, "", "input must be an object of named inputs (got 7)");
  });
});
