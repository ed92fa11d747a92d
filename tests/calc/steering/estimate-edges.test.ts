/**
 * The steering estimate's verdicts at their boundaries and the sentence each gives
 * (calc/steering/estimate.ts), from the mutation report.
 */
import { describe, expect, it } from "vitest";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";
import { steeringEstimate } from "../../../calc/steering/estimate.ts";
import { DEMO_STEERING_SPINNER } from "../../../calc/steering/inputs.ts";

const RPM = rpmToRadPerSecond(1);
const demo = { ...DEMO_STEERING_SPINNER };

describe("the steering estimate's direction verdict and sentence", () => {
  it("says the demo's push is on course: Ω(L + 1/(2f)) = 314.16 rad/s · 0.55 ms = 0.17279 rad = 9.9°, within the 10° tolerance (an angle under 10° to one decimal, 10° and over whole)", () => {
    const r = steeringEstimate(demo);
    expect(r.status).toBe("holds");
    expect(r.summary).toBe("push on course");
    expect(r.reason).toBe("The push points 9.9° off the commanded direction, within the 10° tolerance.");
  });

  it("says a push 19° off is beyond the tolerance and names the lead that cancels it: 314.16 rad/s · (0.8 ms + 0.25 ms) = 0.32987 rad = 18.9°", () => {
    const r = steeringEstimate({ ...demo, latency: 0.0008 });
    expect(r.status).toBe("marginal");
    expect(r.summary).toBe("push off course");
    expect(r.reason).toBe("The push points 19° off the commanded direction, beyond the 10° tolerance: a phase lead of 19° cancels it.");
  });

  it("keeps the sign of an over-led push and rounds it whole by its size: 0.17279 − 0.5 rad = −0.32721 rad = −18.7°", () => {
    const r = steeringEstimate({ ...demo, phaseLead: 0.5 });
    expect(r.status).toBe("marginal");
    expect(r.reason).toBe("The push points -19° off the commanded direction, beyond the 10° tolerance: a phase lead of 9.9° cancels it.");
  });

  it("shows a small negative error to one decimal: 1600 rpm · 0.55 ms − 0.1 rad = 0.092153 − 0.1 = −0.0078466 rad = −0.4°", () => {
    const r = steeringEstimate({ ...demo, spinSpeed: 1600 * RPM, phaseLead: 0.1 });
    expect(r.reason).toBe("The push points -0.4° off the commanded direction, within the 10° tolerance.");
  });

  it("holds with the error exactly at the tolerance and is marginal, not failed, at exactly twice it", () => {
    const error = steeringEstimate(demo).directionError;
    const at = steeringEstimate({ ...demo, directionTolerance: error });
    expect(at.status).toBe("holds");
    expect(at.summary).toBe("push on course");
    expect(at.reason).toBe("The push points 9.9° off the commanded direction, within the 9.9° tolerance.");
    const twice = steeringEstimate({ ...demo, directionTolerance: error / 2 });
    expect(twice.status).toBe("marginal");
    expect(twice.summary).toBe("push off course");
  });
});

describe("the steering estimate's skid verdict and sentence (one wheel)", () => {
  // Skid lift speed √(m g r_w / J_w) = √(1.5 · 9.80665 · 0.018 / 7e-6) = 194.49 rad/s = 1857 rpm (meriam-kraige-dynamics).
  const lift = steeringEstimate({ ...demo, wheelCount: 1 }).skidLiftSpeed ?? Number.NaN;

  it("says the skid lifts from 1857 rpm when the spin is exactly the lift speed", () => {
    const r = steeringEstimate({ ...demo, wheelCount: 1, spinSpeed: lift });
    expect(r.status).toBe("fails");
    expect(r.summary).toBe("skid lifts");
    expect(r.reason).toBe("The skid lifts: the wheel's gyroscopic moment carries the whole weight from 1857 rpm, below the spin speed.");
  });

  it("says the skid is close to lifting at 1600 rpm, 1600/1857.2 = 86 % of its lift speed", () => {
    const r = steeringEstimate({ ...demo, wheelCount: 1, spinSpeed: 1600 * RPM, phaseLead: 0.1 });
    expect(r.status).toBe("marginal");
    expect(r.summary).toBe("skid close to lifting");
    expect(r.reason).toBe("The skid is close to lifting: the spin speed is 86 % of the 1857 rpm at which it does.");
  });

  it("is marginal with the spin at exactly 80 % of the lift speed, and holds just below", () => {
    const at = steeringEstimate({ ...demo, wheelCount: 1, spinSpeed: 0.8 * lift, phaseLead: 0.1 });
    expect(at.summary).toBe("skid close to lifting");
    const below = steeringEstimate({ ...demo, wheelCount: 1, spinSpeed: 0.79 * lift, phaseLead: 0.1 });
    expect(below.status).toBe("holds");
    expect(below.summary).toBe("push on course");
  });

  it("keeps a failed direction's verdict and sentence when the skid is only close to lifting: 1600 rpm · 2.25 ms = 0.37699 rad = 21.6°", () => {
    const r = steeringEstimate({ ...demo, wheelCount: 1, spinSpeed: 1600 * RPM, latency: 0.002 });
    expect(r.status).toBe("fails");
    expect(r.summary).toBe("push off course");
    expect(r.reason).toBe("The push points 22° off the commanded direction, beyond the 10° tolerance: a phase lead of 22° cancels it.");
  });
});

describe("the steering estimate's rim speed", () => {
  it("is Ω·R = 314.159 rad/s · 0.07 m = 21.991 m/s for the demo (openstax-up1-rotational-kinematics, v = ωr)", () => {
    expect(steeringEstimate(demo).rimSpeed).toBeCloseTo(21.9911, 4);
  });
});
