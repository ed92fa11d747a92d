import { describe, expect, it } from "vitest";
import {
  accelerometerPlacement,
  accelerometerPlacementInputs,
  angularSpeedForAcceleration,
  centripetalAcceleration,
  centripetalAccelerationCurve,
  maxSensorRadius,
  minSensorRadius,
  partLoad,
  radiusForAcceleration,
  speedResolution,
} from "../../../calc/rotation/rotation.ts";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { refusal } from "../../support/refusal.ts";

const defaults = Object.fromEntries(Object.entries(accelerometerPlacementInputs).map(([k, s]) => [k, s.default])) as Parameters<
  typeof accelerometerPlacement
>[0];

describe("rotation: refusals name the input that drove the result past the largest double", () => {
  it("centripetal acceleration names the radius (m) when a huge radius overflows ω²r", () => {
    // ω²r = 1e20 · 1e300 = 1e320 > 1.8e308; the radius is 300 orders from 1, the speed 10.
    const e = refusal(() => centripetalAcceleration({ angularSpeed: 1e10, radius: 1e300 }));
    expect([e.param, e.unit, e.value]).toEqual(["radius", "m", 1e300]);
    expect(e.expected).toBe("small enough for the acceleration to stay finite");
  });

  it("radius for an acceleration names the acceleration (m/s²) when a/ω² overflows", () => {
    // a/ω² = 1e300 / 1e-20 = 1e320: overflow, the acceleration is the most extreme input.
    const e = refusal(() => radiusForAcceleration({ angularSpeed: 1e-10, acceleration: 1e300 }));
    expect([e.param, e.unit]).toEqual(["acceleration", "m/s²"]);
  });

  it("speed for an acceleration names a tiny radius (m) or a huge acceleration (m/s²), with the wording for each", () => {
    // √(1e10 / 1e-300) = √1e310: the quotient already overflows.
    const r = refusal(() => angularSpeedForAcceleration({ radius: 1e-300, acceleration: 1e10 }));
    expect([r.param, r.unit, r.expected]).toEqual(["radius", "m", "large enough for the speed to stay finite"]);
    const a = refusal(() => angularSpeedForAcceleration({ radius: 1e-10, acceleration: 1e300 }));
    expect([a.param, a.unit, a.expected]).toEqual(["acceleration", "m/s²", "small enough for the speed to stay finite"]);
  });

  it("largest sensor radius names the full scale (m/s²) when (1 − m)F/ω² overflows", () => {
    // 1e300 / (1e-10)² = 1e320.
    const e = refusal(() => maxSensorRadius({ fullScale: 1e300, margin: 0, topSpeed: 1e-10 }));
    expect([e.param, e.unit]).toEqual(["fullScale", "m/s²"]);
  });

  it("speed resolution names a tiny radius (m) or a huge step (m/s²)", () => {
    // ω²r = 1e-10 · 1e-300 = 1e-310, so Δa/(ω²r) = 1/1e-310 overflows.
    const r = refusal(() => speedResolution({ step: 1, angularSpeed: 1e-5, radius: 1e-300 }));
    expect([r.param, r.unit]).toEqual(["radius", "m"]);
    // 1e300 / (1e-10 · 1e-5) = 1e315.
    const s = refusal(() => speedResolution({ step: 1e300, angularSpeed: 1e-5, radius: 1e-5 }));
    expect([s.param, s.unit]).toEqual(["step", "m/s²"]);
  });

  it("smallest sensor radius names a huge step (m/s²) or a tiny resolution (no unit)", () => {
    // 1e300 / (1e-20 · 1 · 3) = 3.3e319.
    const s = refusal(() => minSensorRadius({ step: 1e300, lowSpeed: 1e-10, resolution: 1 }));
    expect([s.param, s.unit]).toEqual(["step", "m/s²"]);
    // 1 / (1e-10 · 1e-300 · 2) = 5e309: the resolution is a bare fraction, so no unit is shown.
    const p = refusal(() => minSensorRadius({ step: 1, lowSpeed: 1e-5, resolution: 1e-300 }));
    expect([p.param, p.unit, p.expected]).toEqual(["resolution", "", "large enough for the smallest radius to stay finite"]);
  });

  it("part load names mass (kg), speed (rad/s) or radius (m), whichever drove m·ω²r past the largest double", () => {
    // 1e300 · (1e5)² · 1 = 1e310 (the acceleration 1e10 itself is finite).
    const m = refusal(() => partLoad({ mass: 1e300, radius: 1, angularSpeed: 1e5 }));
    expect([m.param, m.unit, m.expected]).toEqual(["mass", "kg", "small enough for the force to stay finite"]);
    // 1e20 · (1e150)² · 10 = 1e321 with the acceleration 1e301 finite.
    const w = refusal(() => partLoad({ mass: 1e20, radius: 10, angularSpeed: 1e150 }));
    expect([w.param, w.unit]).toEqual(["angularSpeed", "rad/s"]);
    // 1e10 · 1² · 1e300 = 1e310.
    const r = refusal(() => partLoad({ mass: 1e10, radius: 1e300, angularSpeed: 1 }));
    expect([r.param, r.unit]).toEqual(["radius", "m"]);
  });
});

describe("rotation: curve and placement values", () => {
  it("a curve at radius 0 is all zero accelerations, not a refusal", () => {
    // a = ω² · 0 = 0 at every speed.
    const points = centripetalAccelerationCurve({ radius: 0, maxSpeed: 100, intervals: 2 });
    expect(points).toEqual([
      { angularSpeed: 0, acceleration: 0 },
      { angularSpeed: 50, acceleration: 0 },
      { angularSpeed: 100, acceleration: 0 },
    ]);
  });

  it("reports the reading limit (1 − m)·F: 200 g less 20 % headroom is 160 g", () => {
    // 0.8 · 200 · 9.80665 = 1569.064 m/s².
    const r = accelerometerPlacement({ ...defaults, fullScale: 200 * STANDARD_GRAVITY, margin: 0.2 });
    expect(r.readingLimit).toBeCloseTo(1569.064, 9);
  });

  it("a window whose two edges coincide still exists, and a sensor right on it fits", () => {
    // r_min = Δa/(ω_low²·p(2 + p)) = 1.25/(1 · 0.5 · 2.5) = 1 m; r_max = (1 − 0)·1/1² = 1 m.
    const r = accelerometerPlacement({ ...defaults, step: 1.25, noise: 0, lowSpeed: 1, resolution: 0.5, fullScale: 1, margin: 0, topSpeed: 1, radius: 1 });
    expect([r.minRadius, r.maxRadius]).toEqual([1, 1]);
    expect(r.windowExists).toBe(true);
    expect(r.verdict).toBe("fits");
  });

  it("a lowest speed above the top speed is refused as an angular speed bound against topSpeed", () => {
    const e = refusal(() => accelerometerPlacement({ ...defaults, lowSpeed: 2, topSpeed: 1 }));
    expect(e.param).toBe("lowSpeed");
    expect(e.bound).toEqual({ relation: "at-most", limit: 1, kind: "angularSpeed", other: "topSpeed" });
  });

  it("a full scale so small that the share of it used overflows names fullScale with its unit and wording", () => {
    // At 60000 rpm (6283.19 rad/s) and 2 m: a = 6283.19² · 2 = 7.9e7 m/s²; 7.9e7 / 1e-301 = 7.9e308 > 1.8e308.
    const top = accelerometerPlacementInputs.topSpeed.max;
    const e = refusal(() => accelerometerPlacement({ ...defaults, topSpeed: top, radius: 2, fullScale: 1e-301 }));
    expect([e.param, e.unit, e.expected]).toEqual(["fullScale", "m/s²", "large enough for the share of full scale to stay finite"]);
  });
});
