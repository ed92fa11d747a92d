/**
 * One hit (calc/weapon/impact.ts) at its edges: a target already moving, a tip that does not move
 * or only just reaches the target, the refusals of the optional fields (your robot's mass, the
 * target's velocity, the approach speed of the force estimate) with their units, the input a result
 * past the largest double is blamed on, and the demo's speed ratio worked by hand.
 */
import { describe, expect, it } from "vitest";
import { DEMO_HIT, effectiveTipMass, halfSinePeakForce, impactForceEstimate, rotorImpact, weaponHit } from "../../../calc/weapon/impact.ts";
import { expectClose } from "./support.ts";
import { refusal } from "../../support/refusal.ts";

/** The field, value, unit and rule of the refusal `run` throws. */
function refused(run: () => unknown): { param: string; value: unknown; unit: string; expected: string } {
  const { param, value, unit, expected } = refusal(run);
  return { param, value, unit, expected };
}

const TINY = Number.MIN_VALUE; // 5e-324, the smallest subnormal

describe("rotorImpact: a target already moving along the line", () => {
  it("closes at Ω·r − v_t, and the target gains ½·m_o·(v_t′² − v_t²), not ½·m_o·v_t′² (hand: J = 0.05 kg·m², r = 0.1 m, Ω = 500 rad/s, m_o = 5 kg, v_t = 10 m/s, e = 0)", () => {
    const r = rotorImpact({ inertia: 0.05, spinSpeed: 500, tipRadius: 0.1, targetMass: 5, restitution: 0, targetVelocity: 10 });
    // m_tip = J/r² = 5 kg; μ = (1/5 + 1/5)⁻¹ = 2.5 kg; v_a = 500·0.1 − 10 = 40 m/s
    expectClose(r.approachSpeed, 40, 1e-15);
    expectClose(r.reducedMass, 2.5, 1e-15);
    // P = (1 + 0)·2.5·40 = 100 N·s; ΔΩ = P·r/J = 200 rad/s; v_t′ = 10 + 100/5 = 30 m/s
    expectClose(r.impulse, 100, 1e-15);
    expectClose(r.spinSpeedAfter, 300, 1e-15);
    expectClose(r.targetVelocityAfter, 30, 1e-15);
    // e = 0: the tip moves on with the target, Ω′·r = 30 m/s
    expectClose(r.spinSpeedAfter * 0.1, r.targetVelocityAfter, 1e-15);
    // ½·5·(30² − 10²) = 2000 J to the target; ½·0.05·(500² − 300²) = 4000 J from the rotor; ½·2.5·40² = 2000 J lost
    expectClose(r.energyToTarget, 2000, 1e-15);
    expectClose(r.rotorEnergyDrop, 4000, 1e-15);
    expectClose(r.energyLost, 2000, 1e-15);
  });

  it("refuses a target moving exactly as fast as the tip, naming targetVelocity with the tip speed it must stay below (hand: Ω·r = 80·0.125 = 10 m/s)", () => {
    const run = () => rotorImpact({ inertia: 0.05, spinSpeed: 80, tipRadius: 0.125, targetMass: 5, restitution: 0.2, targetVelocity: 10 });
    expect(refused(run)).toEqual({
      param: "targetVelocity",
      value: 10,
      unit: "m/s",
      expected: "less than the tip speed Ω·r (10 m/s): otherwise the tip never reaches the target",
    });
    expect(run).toThrow("targetVelocity must be less than the tip speed Ω·r (10 m/s): otherwise the tip never reaches the target (got 10 m/s)");
  });

  it("refuses a target velocity that is not a number, in m/s", () => {
    expect(refused(() => rotorImpact({ inertia: 0.05, spinSpeed: 500, tipRadius: 0.1, targetMass: 5, restitution: 0.2, targetVelocity: Number.NaN }))).toEqual({
      param: "targetVelocity",
      value: Number.NaN,
      unit: "m/s",
      expected: "a finite number",
    });
  });
});

describe("rotorImpact: a tip that does not move", () => {
  it("a rotor at rest is refused by its speed, in rad/s", () => {
    expect(refused(() => rotorImpact({ inertia: 0.05, spinSpeed: 0, tipRadius: 0.1, targetMass: 5, restitution: 0.2 }))).toEqual({
      param: "spinSpeed",
      value: 0,
      unit: "rad/s",
      expected: "large enough that the tip moves (Ω·r greater than 0 m/s)",
    });
  });

  it("a spinning rotor whose Ω·r falls below the smallest double (1e-200 rad/s at 1e-200 m) is refused by its tip radius, in m", () => {
    // m_tip = J/r² = 1e-300/1e-400 = 1e100 kg stays finite; Ω·r = 1e-400 rounds to 0
    expect(refused(() => rotorImpact({ inertia: 1e-300, spinSpeed: 1e-200, tipRadius: 1e-200, targetMass: 5, restitution: 0.2 }))).toEqual({
      param: "tipRadius",
      value: 1e-200,
      unit: "m",
      expected: "large enough that the tip moves (Ω·r greater than 0 m/s)",
    });
  });
});

describe("effectiveTipMass: your robot's mass", () => {
  it("refuses a robot mass of 0 or less, naming selfMass in kg", () => {
    for (const selfMass of [0, -2])
      expect(refused(() => effectiveTipMass({ inertia: 0.05, tipRadius: 0.1, selfMass }))).toEqual({
        param: "selfMass",
        value: selfMass,
        unit: "kg",
        expected: "greater than 0 kg",
      });
  });
});

describe("the input a result past the largest double is blamed on", () => {
  const at = { inertia: 0.05, spinSpeed: 500, tipRadius: 0.1, targetMass: 5, restitution: 0.2 };

  it("effectiveTipMass: r²/J past the doubles blames the inertia or the radius, 1/M the robot's mass", () => {
    // r/J = 1/5e-324 overflows
    expect(refused(() => effectiveTipMass({ inertia: TINY, tipRadius: 1 }))).toEqual({
      param: "inertia",
      value: TINY,
      unit: "kg·m²",
      expected: "large enough for the tip compliance to stay finite",
    });
    // (1e200/1)·1e200 = 1e400
    expect(refused(() => effectiveTipMass({ inertia: 1, tipRadius: 1e200 }))).toEqual({
      param: "tipRadius",
      value: 1e200,
      unit: "m",
      expected: "small enough for the tip compliance to stay finite",
    });
    // 0.2 + 1/5e-324
    expect(refused(() => effectiveTipMass({ inertia: 0.05, tipRadius: 0.1, selfMass: TINY }))).toEqual({
      param: "selfMass",
      value: TINY,
      unit: "kg",
      expected: "large enough for the tip compliance to stay finite",
    });
  });

  it("rotorImpact: the tip speed Ω·r, by the spin speed or by the tip radius, whichever is further from 1", () => {
    // 1e300·1e10 = 1e310
    expect(refused(() => rotorImpact({ ...at, spinSpeed: 1e300, tipRadius: 1e10 }))).toEqual({
      param: "spinSpeed",
      value: 1e300,
      unit: "rad/s",
      expected: "small enough for the tip speed to stay finite",
    });
    // m_tip = 1e100/1e400 = 1e-300 kg is finite; Ω·r = 1e110·1e200 = 1e310
    expect(refused(() => rotorImpact({ ...at, inertia: 1e100, spinSpeed: 1e110, tipRadius: 1e200 }))).toEqual({
      param: "tipRadius",
      value: 1e200,
      unit: "m",
      expected: "small enough for the tip speed to stay finite",
    });
  });

  it("rotorImpact: a target rushing at the tip takes the approach speed past the doubles, blamed on its velocity", () => {
    // Ω·r = 1e300·1e8 = 1e308; v_a = 1e308 + 1.5e308
    expect(refused(() => rotorImpact({ ...at, spinSpeed: 1e300, tipRadius: 1e8, targetVelocity: -1.5e308 }))).toEqual({
      param: "targetVelocity",
      value: -1.5e308,
      unit: "m/s",
      expected: "small enough for the approach speed to stay finite",
    });
  });

  it("rotorImpact: a target mass in the subnormals is blamed for its compliance 1/m_o", () => {
    expect(refused(() => rotorImpact({ ...at, targetMass: TINY }))).toEqual({
      param: "targetMass",
      value: TINY,
      unit: "kg",
      expected: "large enough for the target compliance to stay finite",
    });
  });

  it("rotorImpact: the impulse (1 + e)·μ·v_a is blamed on the most extreme of the inertia, the target mass and your robot's mass", () => {
    // m_tip ≈ 1e305 kg, μ ≈ 1e300 kg, v_a = 1e10 m/s: P ≈ 1.2e310
    expect(refused(() => rotorImpact({ ...at, inertia: 1e305, tipRadius: 1, targetMass: 1e300, spinSpeed: 1e10 }))).toEqual({
      param: "inertia",
      value: 1e305,
      unit: "kg·m²",
      expected: "small enough for the impulse to stay finite",
    });
    // m_tip ≈ 1e300 kg (your robot of 1e305 kg in series), μ ≈ 5e299 kg: P ≈ 6e309
    expect(refused(() => rotorImpact({ ...at, inertia: 1e300, tipRadius: 1, targetMass: 1e300, spinSpeed: 1e10, selfMass: 1e305 }))).toEqual({
      param: "selfMass",
      value: 1e305,
      unit: "kg",
      expected: "small enough for the impulse to stay finite",
    });
  });

  it("rotorImpact: the speed drop, the target's velocity after and your robot's recoil, each named as the quantity that left the doubles", () => {
    const elastic = { ...at, restitution: 1, tipRadius: 1, spinSpeed: 1e308 };
    // m_tip = 1e-10 kg, μ ≈ 1e-10 kg, P ≈ 2e298 N·s; ΔΩ = P·r/J ≈ 2e308 rad/s
    expect(refusal(() => rotorImpact({ ...elastic, inertia: 1e-10, targetMass: 1 }))).toMatchObject({
      param: "spinSpeed",
      expected: "small enough for the speed drop to stay finite",
    });
    // m_tip = 1 kg, μ ≈ 1e-300 kg, P ≈ 2e8 N·s; v_t′ = P/m_o ≈ 2e308 m/s
    expect(refusal(() => rotorImpact({ ...elastic, inertia: 1, targetMass: 1e-300 }))).toMatchObject({
      param: "spinSpeed",
      expected: "small enough for the target velocity to stay finite",
    });
    // m_tip ≈ M = 1e-300 kg, P ≈ 2e8 N·s; V = −P/M ≈ −2e308 m/s
    expect(refusal(() => rotorImpact({ ...elastic, inertia: 1, targetMass: 1, selfMass: 1e-300 }))).toMatchObject({
      param: "spinSpeed",
      expected: "small enough for the recoil velocity to stay finite",
    });
  });

  it("rotorImpact: the energies, each named as the quantity that left the doubles", () => {
    // m_tip = 1e200, μ = 5e199 kg, v_a = 1e105 m/s: P = 5e304 N·s, ΔΩ = 5e104 rad/s, ½·J·ΔΩ·(Ω + Ω′) ≈ 3.75e409 J
    expect(refusal(() => rotorImpact({ ...at, restitution: 0, inertia: 1e200, tipRadius: 1, targetMass: 1e200, spinSpeed: 1e105 }))).toMatchObject({
      param: "inertia",
      expected: "small enough for the rotor energy drop to stay finite",
    });
    // A light rotor tip (m_tip = 1e57/1e-52 = 1e109 kg) bouncing elastically off a far heavier target (1e274 kg):
    // the rotor turns back at its own speed (it gives up nothing) while v_t′ = 2e299/1e274 = 2e25 m/s
    // and ½·m_o·v_t′² ≈ 2e324 J
    expect(refusal(() => rotorImpact({ ...at, restitution: 1, inertia: 1e57, tipRadius: 1e-26, targetMass: 1e274, spinSpeed: 1e216 }))).toMatchObject({
      param: "targetMass",
      expected: "small enough for the energy to the target to stay finite",
    });
    // r²/J = 1e-258/1e186 rounds to 0, so the tip presents your robot's whole mass (1e187 kg); a light target
    // (1e141 kg) rushing in at 1e112 m/s bounces back: P ≈ 2·1e141·1e112 = 2e253 N·s, V = P/M = 2e66 m/s,
    // ½·M·V² ≈ 2e319 J (the target leaves as fast as it came, so its own energy stays finite)
    expect(
      refusal(() =>
        rotorImpact({ ...at, restitution: 1, inertia: 1e186, tipRadius: 1e-129, spinSpeed: 1e88, targetMass: 1e141, selfMass: 1e187, targetVelocity: -1e112 }),
      ),
    ).toMatchObject({ param: "selfMass", expected: "small enough for the energy to your robot to stay finite" });
    // ½·μ·v_a² with μ ≈ m_tip = 1e-159/1e4 = 1e-163 kg and v_a = 1e267 m/s: ≈ 5e370 J (the impulse, 2e104 N·s, stays finite)
    expect(refusal(() => rotorImpact({ ...at, restitution: 1, inertia: 1e-159, tipRadius: 100, targetMass: 1e-78, spinSpeed: 1e265 }))).toMatchObject({
      param: "spinSpeed",
      expected: "small enough for the compression energy to stay finite",
    });
  });

  it("impactForceEstimate: the average force by the energy or the crush distance, the peak by the energy, the compression time by the approach speed", () => {
    // 1e300/1e-10 = 1e310
    expect(refused(() => impactForceEstimate({ energy: 1e300, stoppingDistance: 1e-10 }))).toEqual({
      param: "energy",
      value: 1e300,
      unit: "J",
      expected: "small enough for the average force to stay finite",
    });
    // 1e10/1e-300 = 1e310
    expect(refused(() => impactForceEstimate({ energy: 1e10, stoppingDistance: 1e-300 }))).toEqual({
      param: "stoppingDistance",
      value: 1e-300,
      unit: "m",
      expected: "large enough for the average force to stay finite",
    });
    // E/s = 1e308 N, 2E/s = 2e308 N
    expect(refused(() => impactForceEstimate({ energy: 1e308, stoppingDistance: 1 }))).toEqual({
      param: "energy",
      value: 1e308,
      unit: "J",
      expected: "small enough for the peak force to stay finite",
    });
    // (π/2)·0.02/5e-324
    expect(refused(() => impactForceEstimate({ energy: 3600, stoppingDistance: 0.02, approachSpeed: TINY }))).toEqual({
      param: "approachSpeed",
      value: TINY,
      unit: "m/s",
      expected: "large enough for the compression time to stay finite",
    });
  });

  it("impactForceEstimate refuses an approach speed of 0, naming it in m/s (the compression time needs one)", () => {
    expect(refused(() => impactForceEstimate({ energy: 3600, stoppingDistance: 0.02, approachSpeed: 0 }))).toEqual({
      param: "approachSpeed",
      value: 0,
      unit: "m/s",
      expected: "greater than 0 m/s",
    });
  });

  it("halfSinePeakForce: (π/2)·P/τ by the impulse or by the duration", () => {
    expect(refused(() => halfSinePeakForce({ impulse: 1e300, duration: 1e-10 }))).toEqual({
      param: "impulse",
      value: 1e300,
      unit: "N·s",
      expected: "small enough for the peak force to stay finite",
    });
    expect(refused(() => halfSinePeakForce({ impulse: 10, duration: TINY }))).toEqual({
      param: "duration",
      value: TINY,
      unit: "s",
      expected: "large enough for the peak force to stay finite",
    });
  });
});

describe("weaponHit: the demo's speed ratio", () => {
  it("Ω′/Ω = 1 − (1 + e)·μ·r²/J, whatever the speed (hand: r²/J = 0.0081/0.010125 = 0.8 kg⁻¹, μ = (0.8 + 2/13.6)⁻¹ = 1.0559006 kg, 1 − 1.2·1.0559006·0.8 = −0.0136646)", () => {
    const r = weaponHit(DEMO_HIT);
    expectClose(r.speedRatioAfter, -0.0136646, 1e-5);
    expectClose(r.impact.reducedMass, 1.0559006, 1e-7);
  });
});
