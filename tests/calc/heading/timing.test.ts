/**
 * Heading timing (calc/heading/timing.ts): the timing check's verdicts and their closed bounds, the
 * loop period, and the input a result past the largest double is blamed on, for each θ = ωt helper.
 */
import { describe, expect, it } from "vitest";
import {
  beaconArc,
  headingStepPerLoop,
  headingTiming,
  headingTimingInputs,
  latencyHeadingLag,
  loopRateForStep,
  onTimeForArc,
  type HeadingTimingInput,
} from "../../../calc/heading/timing.ts";
import { refusal } from "../../support/refusal.ts";

const DEFAULTS = Object.fromEntries(Object.entries(headingTimingInputs).map(([k, v]) => [k, v.default])) as HeadingTimingInput;

// Powers of two keep every product and quotient below exact: 64 rad/s at 1024 Hz turns 1/16 rad per
// update, and a 1/1024 s on-time lights 1/16 rad.
const EXACT: HeadingTimingInput = { topSpeed: 64, loopRate: 1024, latency: 0, onTime: 1 / 1024, targetArc: 1 / 16, targetStep: 1 / 16 };

describe("the timing check's verdict", () => {
  it("a step exactly at the largest allowed and an arc exactly as wide as wanted both pass (hand: 64/1024 = 64 × 1/1024 = 0.0625 rad)", () => {
    const r = headingTiming(EXACT);
    expect(r.headingStep).toBe(0.0625);
    expect(r.arcWidth).toBe(0.0625);
    expect(r).toMatchObject({ stepOk: true, arcOk: true, verdict: "ok" });
  });

  it("names the step when only the step is too large, the arc when only the arc is too wide, and both when both are", () => {
    // Half the allowed step (1/32 rad) fails a step of 1/16; half the wanted arc fails an arc of 1/16.
    expect(headingTiming({ ...EXACT, targetStep: 1 / 32 })).toMatchObject({ stepOk: false, arcOk: true, verdict: "step-too-large" });
    expect(headingTiming({ ...EXACT, targetArc: 1 / 32 })).toMatchObject({ stepOk: true, arcOk: false, verdict: "arc-too-wide" });
    expect(headingTiming({ ...EXACT, targetStep: 1 / 32, targetArc: 1 / 32 })).toMatchObject({ stepOk: false, arcOk: false, verdict: "both" });
  });

  it("gives the loop period 1/f and says whether the LED's on-time is shorter than one period (1/1024 s at 1024 Hz is not; 1/2048 s is)", () => {
    const r = headingTiming(EXACT);
    expect(r.loopPeriod).toBe(1 / 1024);
    expect(r.onTimeBelowLoopPeriod).toBe(false);
    const short = headingTiming({ ...EXACT, onTime: 1 / 2048 });
    expect(short.onTimeBelowLoopPeriod).toBe(true);
    // the defaults: 1 ms on at 1 kHz, exactly one period
    expect(headingTiming(DEFAULTS)).toMatchObject({ loopPeriod: 0.001, onTimeBelowLoopPeriod: false });
  });

  it("gives 2πf/ω updates per revolution (hand: 2π × 1024 / 64 = 32π = 100.53)", () => {
    expect(headingTiming(EXACT).updatesPerRevolution).toBeCloseTo(32 * Math.PI, 12);
  });
});

describe("a θ = ωt figure past the largest double names the input that took it there, in its unit", () => {
  it("the heading step ω/f: the speed in rad/s, or the loop rate in Hz", () => {
    const bySpeed = refusal(() => headingStepPerLoop({ angularSpeed: 1e300, loopRate: 1e-10 }));
    expect(bySpeed).toMatchObject({ param: "angularSpeed", value: 1e300, unit: "rad/s" });
    expect(bySpeed.message).toBe("angularSpeed must be small enough for the heading step to stay finite (got 1e+300 rad/s)");
    const byRate = refusal(() => headingStepPerLoop({ angularSpeed: 1e10, loopRate: 1e-300 }));
    expect(byRate).toMatchObject({ param: "loopRate", value: 1e-300, unit: "Hz" });
    expect(byRate.message).toBe("loopRate must be large enough for the heading step to stay finite (got 1e-300 Hz)");
  });

  it("the latency lag ωL: the speed in rad/s, or the latency in s", () => {
    const bySpeed = refusal(() => latencyHeadingLag({ angularSpeed: 1e300, latency: 1e10 }));
    expect(bySpeed).toMatchObject({ param: "angularSpeed", value: 1e300, unit: "rad/s" });
    expect(bySpeed.message).toBe("angularSpeed must be small enough for the heading lag to stay finite (got 1e+300 rad/s)");
    const byLatency = refusal(() => latencyHeadingLag({ angularSpeed: 1e10, latency: 1e300 }));
    expect(byLatency).toMatchObject({ param: "latency", value: 1e300, unit: "s" });
    expect(byLatency.message).toBe("latency must be small enough for the heading lag to stay finite (got 1e+300 s)");
  });

  it("the beacon arc ωt_on: the speed in rad/s, or the on-time in s", () => {
    const bySpeed = refusal(() => beaconArc({ angularSpeed: 1e300, onTime: 1e10 }));
    expect(bySpeed).toMatchObject({ param: "angularSpeed", value: 1e300, unit: "rad/s" });
    expect(bySpeed.message).toBe("angularSpeed must be small enough for the beacon arc to stay finite (got 1e+300 rad/s)");
    const byOnTime = refusal(() => beaconArc({ angularSpeed: 1e10, onTime: 1e300 }));
    expect(byOnTime).toMatchObject({ param: "onTime", value: 1e300, unit: "s" });
    expect(byOnTime.message).toBe("onTime must be small enough for the beacon arc to stay finite (got 1e+300 s)");
  });

  it("the loop rate needed ω/Δψ: the speed in rad/s, or the target step in rad", () => {
    const bySpeed = refusal(() => loopRateForStep({ angularSpeed: 1e300, targetStep: 1e-10 }));
    expect(bySpeed).toMatchObject({ param: "angularSpeed", value: 1e300, unit: "rad/s" });
    expect(bySpeed.message).toBe("angularSpeed must be small enough for the loop rate to stay finite (got 1e+300 rad/s)");
    const byStep = refusal(() => loopRateForStep({ angularSpeed: 1e10, targetStep: 1e-300 }));
    expect(byStep).toMatchObject({ param: "targetStep", value: 1e-300, unit: "rad" });
    expect(byStep.message).toBe("targetStep must be large enough for the loop rate to stay finite (got 1e-300 rad)");
  });

  it("the on-time needed w/ω: the target arc in rad, or the speed in rad/s", () => {
    const byArc = refusal(() => onTimeForArc({ angularSpeed: 1e-10, targetArc: 1e300 }));
    expect(byArc).toMatchObject({ param: "targetArc", value: 1e300, unit: "rad" });
    expect(byArc.message).toBe("targetArc must be small enough for the on-time to stay finite (got 1e+300 rad)");
    const bySpeed = refusal(() => onTimeForArc({ angularSpeed: 1e-300, targetArc: 1e10 }));
    expect(bySpeed).toMatchObject({ param: "angularSpeed", value: 1e-300, unit: "rad/s" });
    expect(bySpeed.message).toBe("angularSpeed must be large enough for the on-time to stay finite (got 1e-300 rad/s)");
  });
});
