/**
 * The rim formulas at the edge of the doubles: a result that would overflow is refused, naming the
 * input furthest from 1 in orders of magnitude, in its SI unit (the rule of requireFiniteResult in
 * calc/core/spec-check.ts); and the rim check's refusal of a yield above the ultimate strength, as
 * data a screen words in the user's units.
 */
import { describe, expect, it } from "vitest";
import {
  annularDiskStress,
  RIM_CHOICE_DEFAULTS,
  rimStressProfile,
  rimCheck,
  rimCheckInputs,
  solidDiskStress,
  thinRingHoopStress,
  thinRingLimitTipSpeed,
  tipSpeed,
} from "../../../calc/loads/rims.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

const defaultsOf = (specs: Record<string, { default: number }>) => Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.default]));
const RIM = { ...defaultsOf(rimCheckInputs), ...RIM_CHOICE_DEFAULTS } as Parameters<typeof rimCheck>[0];

describe("rim formulas whose result would leave the doubles", () => {
  it("names the radius of a tip speed ωR = 1e10 × 1e300 in metres", () => {
    expectRefusal(
      () => tipSpeed({ angularSpeed: 1e10, radius: 1e300 }),
      "radius",
      1e300,
      "m",
      "radius must be small enough for the tip speed to stay finite (got 1e+300 m)",
    );
  });

  it("names the density, the speed or the radius of a thin ring's hoop stress ρω²R², each in its SI unit", () => {
    // ρ v² = 1e300 × (1e6)² = 1e312: density is the furthest from 1.
    expectRefusal(
      () => thinRingHoopStress({ density: 1e300, angularSpeed: 1e6, radius: 1 }),
      "density",
      1e300,
      "kg/m³",
      "density must be small enough for the hoop stress to stay finite (got 1e+300 kg/m³)",
    );
    // v = 1e200 m/s is finite, v² = 1e400 is not.
    expectRefusal(
      () => thinRingHoopStress({ density: 1, angularSpeed: 1e200, radius: 1 }),
      "angularSpeed",
      1e200,
      "rad/s",
      "angularSpeed must be small enough for the hoop stress to stay finite (got 1e+200 rad/s)",
    );
    expectRefusal(
      () => thinRingHoopStress({ density: 1, angularSpeed: 1, radius: 1e200 }),
      "radius",
      1e200,
      "m",
      "radius must be small enough for the hoop stress to stay finite (got 1e+200 m)",
    );
  });

  it("names the strength of a limit tip speed √(S/ρ) = √(1e300/1e-200) in pascals", () => {
    expectRefusal(
      () => thinRingLimitTipSpeed({ density: 1e-200, strength: 1e300 }),
      "strength",
      1e300,
      "Pa",
      "strength must be small enough for the limit tip speed to stay finite (got 1e+300 Pa)",
    );
  });

  it("names the density of a solid disk's stress when ρω² = 1e300 × 1e20 overflows", () => {
    expectRefusal(
      () => solidDiskStress({ density: 1e300, poisson: 0.3, angularSpeed: 1e10, outerRadius: 1, radius: 0.5 }),
      "density",
      1e300,
      "kg/m³",
      "density must be small enough for the solid disk stress to stay finite (got 1e+300 kg/m³)",
    );
  });

  it("names a radius of 1e-300 m, further from 1 than a rim of 1e160 m whose square overflows, as too small", () => {
    expectRefusal(
      () => solidDiskStress({ density: 1, poisson: 0.3, angularSpeed: 1, outerRadius: 1e160, radius: 1e-300 }),
      "radius",
      1e-300,
      "m",
      "radius must be large enough for the solid disk stress to stay finite (got 1e-300 m)",
    );
  });

  it("names the density of a bored disk's stress when ρω² overflows", () => {
    expectRefusal(
      () => annularDiskStress({ density: 1e300, poisson: 0.3, angularSpeed: 1e10, innerRadius: 0.1, outerRadius: 1, radius: 0.5 }),
      "density",
      1e300,
      "kg/m³",
      "density must be small enough for the annular disk stress to stay finite (got 1e+300 kg/m³)",
    );
  });
});

describe("the rim check's strengths", () => {
  it("refuses a yield strength above the ultimate, with the limit as a stress from the ultimate strength field", () => {
    const error = refusal(() => rimCheck({ ...RIM, yieldStrength: 300e6, ultimateStrength: 250e6 }));
    expect([error.param, error.value, error.unit]).toEqual(["yieldStrength", 300e6, "Pa"]);
    expect(error.bound).toEqual({ relation: "at-most", limit: 250e6, kind: "stress", other: "ultimateStrength" });
  });

  it("refuses a bore as large as the rim of a bored disk, naming the bore", () => {
    const error = refusal(() => rimCheck({ ...RIM, shape: "annular-disk", innerRadius: 0.125, outerRadius: 0.125 }));
    expect([error.param, error.value, error.unit]).toEqual(["innerRadius", 0.125, "m"]);
    expect(error.range).toEqual({ min: 0, max: 0.125, minOpen: true, maxOpen: true });
  });
});

describe("the rim's stress profile", () => {
  it("ends exactly at the rim, where b·3/3 would miss it by an ulp (a 100 mm solid disk, 4 points)", () => {
    // 0.1 × 3 / 3 = 0.10000000000000002 in doubles: past the rim, where the disk formula would refuse the radius.
    const profile = rimStressProfile({ ...RIM, shape: "solid-disk", outerRadius: 0.1 }, { points: 4 });
    expect(profile.map((p) => p.radius)).toEqual([0, 0.1 / 3, 0.2 / 3, 0.1]);
    // At the free rim the radial stress is 0 (timoshenko-goodier: σ_r ∝ b² − r²).
    expect(profile[3]!.radial).toBe(0);
  });
});
