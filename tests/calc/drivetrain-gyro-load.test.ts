/**
 * The spin-up model's wheel load for a whole-body spinner on one wheel and a skid: the wheels'
 * gyroscopic moment (meriam-kraige-dynamics, steady precession) moves weight from the skid onto the
 * wheel as the robot speeds up, so the wheel's grip grows with speed until the skid lifts. Checked
 * against the steering chapter's closed form (calc/steering/gyro.ts `wheelNormalLoads`, a second
 * implementation of the same moment balance), and for its effect on a spin-up.
 */
import { describe, expect, it } from "vitest";
import { DEMO_SPINNER } from "../../calc/drivetrain/demo.ts";
import { buildModel, SpinUpSystem } from "../../calc/drivetrain/model.ts";
import { simulateSpinUp } from "../../calc/drivetrain/simulate.ts";
import { skidLiftSpeed, wheelNormalLoads } from "../../calc/steering/gyro.ts";
import { rpmToRadPerSecond } from "../../calc/core/units.ts";

// The invented demo spinner rebuilt on one wheel and a skid opposite it, the centre of mass halfway
// (so half the weight on each at rest), one motor on the wheel.
const oneWheel = { ...DEMO_SPINNER, drivenWheels: 1, motorCount: 1, weightShare: 0.5 };
const system = new SpinUpSystem(buildModel(oneWheel, true));
const rolling = (spin: number) => (spin * oneWheel.gearRatio * oneWheel.wheelOffset) / oneWheel.wheelRadius; // motor speed when the wheel rolls

describe("the wheel load of a one-wheel spinner follows the wheels' gyroscopic moment", () => {
  it.each([50, 100, 150, 190])("equals wheelNormalLoads (calc/steering/gyro.ts) rolling at %i rad/s, to 1e-12", (spin) => {
    const loads = wheelNormalLoads({
      wheelCount: 1,
      robotMass: oneWheel.robotMass,
      wheelInertia: oneWheel.wheelInertia,
      rotorInertia: oneWheel.motorRotorInertia,
      gearRatio: oneWheel.gearRatio,
      wheelRadius: oneWheel.wheelRadius,
      contactRadius: oneWheel.wheelOffset,
      spinSpeed: spin,
    });
    const load = system.normalAt(spin, rolling(spin));
    expect(Math.abs(load - loads.wheelLoad)).toBeLessThanOrEqual(1e-12 * loads.wheelLoad);
    expect(system.staticLimitAt(spin, rolling(spin))).toBeCloseTo(oneWheel.staticFriction * loads.wheelLoad, 12);
  });

  it("carries the whole weight, no more, from the skid lift speed on", () => {
    const lift = skidLiftSpeed({
      robotMass: oneWheel.robotMass,
      wheelRadius: oneWheel.wheelRadius,
      wheelInertia: oneWheel.wheelInertia,
      rotorInertia: oneWheel.motorRotorInertia,
      gearRatio: oneWheel.gearRatio,
    });
    const weight = oneWheel.robotMass * 9.80665;
    if (lift === null) throw new Error("the demo wheel's skid lifts at some speed");
    expect(system.normalAt(lift * 0.999, rolling(lift * 0.999))).toBeLessThan(weight);
    expect(system.normalAt(lift * 1.5, rolling(lift * 1.5))).toBe(weight);
  });

  it("leaves two or more wheels at their constant share: the moments cancel on the body", () => {
    const two = new SpinUpSystem(buildModel(DEMO_SPINNER, true));
    expect(two.normalAt(300, rolling(300))).toBe(DEMO_SPINNER.weightShare * DEMO_SPINNER.robotMass * 9.80665);
  });

  it("speeds a slipping spin-up as the wheel load grows, and warns once the skid would lift", () => {
    // Half throttle tops out near 1690 rpm, below the lift speed (about 1860 rpm): it reaches 1500 rpm
    // sooner than with a wheel and rotor of negligible inertia, which gain no load.
    const target = { ...oneWheel, throttle: 0.5, targetSpeed: rpmToRadPerSecond(1500) };
    const withMoment = simulateSpinUp(target);
    const withoutMoment = simulateSpinUp({ ...target, wheelInertia: 1e-8, motorRotorInertia: 1e-8 });
    expect(withMoment.timeToTarget).not.toBeNull();
    expect(withMoment.timeToTarget!).toBeLessThan(withoutMoment.timeToTarget!);
    expect(withMoment.warnings.join(" ")).not.toMatch(/skid/);
    // At full throttle, on towards the demo's 3000 rpm, past the lift speed.
    expect(simulateSpinUp(oneWheel).warnings.join(" ")).toMatch(/lifts the skid at 18\d\d rpm/);
  });
});
