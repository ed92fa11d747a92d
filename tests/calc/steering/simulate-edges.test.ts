/**
 * Edge cases of the steering simulation's reported figures (from the mutation report of
 * calc/steering/simulate.ts and run.ts): the per-revolution list and the figures drawn from it, the
 * pack's sag, the tyres' grip and sliding time, and the reason's exact wording for each verdict.
 */
import { describe, expect, it } from "vitest";
import { skidLiftSpeed } from "../../../calc/steering/gyro.ts";
import { DEMO_STEERING_SPINNER, simulateSteering } from "../../../calc/steering/index.ts";
import { refusal } from "../../support/refusal.ts";

const D = DEMO_STEERING_SPINNER;
const DEG = Math.PI / 180;
const deg = (a: number) => `${a >= 0 ? "" : "−"}${Math.abs(a / DEG).toFixed(1)}°`;

/** The largest change between consecutive revolutions' mean velocities over the time between their midpoints [m/s²]. */
function peakChange(list: readonly { time: number; x: number; y: number }[]): number {
  let peak = 0;
  let prev = { time: 0, x: 0, y: 0 };
  let prevV: { x: number; y: number; mid: number } | null = null;
  for (const rev of list) {
    const dt = rev.time - prev.time;
    const v = { x: (rev.x - prev.x) / dt, y: (rev.y - prev.y) / dt, mid: (rev.time + prev.time) / 2 };
    if (prevV) peak = Math.max(peak, Math.hypot(v.x - prevV.x, v.y - prevV.y) / (v.mid - prevV.mid));
    prevV = v;
    prev = rev;
  }
  return peak;
}

describe("the per-revolution list and the figures drawn from it (demo robot, 1 s)", () => {
  const r = simulateSteering({ ...D, duration: 1 });
  const list = r.revolutions;

  it("gives each revolution's speed as the distance between its end and the previous one's over the time between (the first from rest at the origin), and its spin as one turn over that time", () => {
    let prev = { time: 0, x: 0, y: 0 };
    for (const rev of list) {
      const dt = rev.time - prev.time;
      expect(rev.speed).toBeCloseTo(Math.hypot(rev.x - prev.x, rev.y - prev.y) / dt, 9);
      expect(rev.spinSpeed).toBeCloseTo((2 * Math.PI) / dt, 6);
      prev = rev;
    }
  });

  it("reports the fastest revolution as the peak speed, the last one's spin as the final spin and the slowest one's shortfall as the spin lost", () => {
    expect(r.peakTranslationSpeed).toBe(Math.max(...list.map((v) => v.speed)));
    expect(r.finalSpin).toBe(list[list.length - 1]!.spinSpeed);
    expect(r.spinLost).toBeCloseTo(Math.max(0, D.spinSpeed - Math.min(...list.map((v) => v.spinSpeed))), 9);
  });

  it("takes the travel speed over the last ten revolutions (the net displacement over the time they take)", () => {
    const k = list.length;
    const a = list[k - 11]!;
    const b = list[k - 1]!;
    expect(r.translationSpeed).toBeCloseTo(Math.hypot(b.x - a.x, b.y - a.y) / (b.time - a.time), 9);
  });

  it("takes the peak acceleration as the largest change of a revolution's mean velocity over the time between the revolutions' midpoints", () => {
    expect(r.peakAcceleration).toBeCloseTo(peakChange(list), 6);
  });

  it("leaves the list empty when asked to, with every other figure the same", () => {
    const bare = simulateSteering({ ...D, duration: 1 }, { revolutions: false });
    expect(bare.revolutions).toEqual([]);
    expect(bare.translationSpeed).toBe(r.translationSpeed);
    expect(bare.peakAcceleration).toBe(r.peakAcceleration);
  });
});

describe("the pack, the motors and the tyres over the demo run", () => {
  const r = simulateSteering({ ...D, duration: 1 });

  it("sags the pack to V = V_oc − n·R_cell·I at its peak current (battery-thevenin-model), the lowest voltage at the highest current", () => {
    expect(r.peakBatteryCurrent).toBeGreaterThan(0);
    expect(r.minBatteryVoltage).toBeLessThan(r.openCircuitVoltage);
    expect(r.minBatteryVoltage).toBeCloseTo(r.openCircuitVoltage - D.cellCount * D.cellResistance * r.peakBatteryCurrent, 9);
  });

  it("drives the motors up to their current limit on the pulses and no further", () => {
    expect(r.peakMotorCurrent).toBeCloseTo(D.currentLimit, 9);
  });

  it("keeps the demo's tyres gripping: the largest share of the grip used is about 0.92 (regression pin, our own digits) and no time is spent sliding", () => {
    expect(r.peakGripShare).toBeGreaterThan(0.9);
    expect(r.peakGripShare).toBeLessThan(0.94);
    expect(r.slidingTimeShare).toBe(0);
  });

  it("slides tyres of friction 0.2 at the full grip for part of the run, about 60 % of it (regression pin, our own digits)", () => {
    const slick = simulateSteering({ ...D, duration: 1, tyreFriction: 0.2 });
    expect(slick.peakGripShare).toBe(1);
    expect(slick.slidingTimeShare).toBeGreaterThan(0.55);
    expect(slick.slidingTimeShare).toBeLessThan(0.65);
  });
});

describe("runs shorter than two turns", () => {
  // Spin 60 rad/s: one turn takes 2π/60 = 0.105 s.
  const slow = { ...D, spinSpeed: 60, depth: 0.1 };

  it("takes the travel speed as the whole displacement over the whole run when no turn is complete, and the final spin from the state", () => {
    const r = simulateSteering({ ...slow, duration: 0.05 });
    expect(r.revolutions).toEqual([]);
    expect(r.translationSpeed).toBeGreaterThan(0);
    expect(r.translationSpeed).toBeCloseTo(Math.hypot(r.displacement.x, r.displacement.y) / 0.05, 9);
    expect(r.spinLost).toBeCloseTo(Math.max(0, 60 - r.finalSpin), 9);
  });

  it("takes the travel speed the same way after one turn, with that turn's spin as the final spin", () => {
    const r = simulateSteering({ ...slow, duration: 0.15 });
    expect(r.revolutions.length).toBe(1);
    expect(r.translationSpeed).toBeCloseTo(Math.hypot(r.displacement.x, r.displacement.y) / 0.15, 9);
    expect(r.finalSpin).toBe(r.revolutions[0]!.spinSpeed);
  });

  it("takes the travel speed over the last turn after two turns (the last ten, or the later half when fewer)", () => {
    const r = simulateSteering({ ...slow, duration: 0.25 });
    expect(r.revolutions.length).toBe(2);
    expect(r.translationSpeed).toBeCloseTo(r.revolutions[1]!.speed, 9);
    expect(r.revolutions[1]!.speed).toBeGreaterThan(1.5 * r.revolutions[0]!.speed);
  });

  it("counts the spin lost down to the slowest turn and the peak acceleration from the first turn's velocity on, over three turns of a spin that sags", () => {
    const r = simulateSteering({ ...slow, duration: 0.35 });
    const spins = r.revolutions.map((v) => v.spinSpeed);
    expect(spins.length).toBe(3);
    expect(spins[2]!).toBeLessThan(spins[0]!);
    expect(r.spinLost).toBeCloseTo(60 - Math.min(...spins), 9);
    expect(r.peakAcceleration).toBeCloseTo(peakChange(r.revolutions), 6);
  });
});

describe("the time to the distance", () => {
  it("is the first crossing: a one-wheel robot that is not steered wobbles across a line half its wobble radius ahead once a turn, and is timed within its first turn", () => {
    // The wobble radius a/Ω² (uniform circular motion, openstax-up1-rotational-kinematics) from the model's steady acceleration.
    const still = { ...D, wheelCount: 1, spinSpeed: 150, depth: 0, duration: 0.5 };
    const a = simulateSteering(still).sensor.steadyBodyAcceleration;
    const radius = Math.hypot(a.x, a.y) / 150 ** 2;
    const r = simulateSteering({ ...still, commandedDistance: radius / 2 });
    expect(r.timeToDistance!).toBeGreaterThan(0);
    expect(r.timeToDistance!).toBeLessThan((2 * Math.PI) / 150);
  });
});

describe("angles reported within (−180°, 180°]", () => {
  const first = simulateSteering({ ...D, duration: 1 });
  const within = (a: number) => a > -Math.PI && a <= Math.PI;
  const sameAngle = (a: number, b: number) => Math.abs(Math.atan2(Math.sin(a - b), Math.cos(a - b)));

  it.each([-2.5, 2.5, -3.1, 3.1])("names the same lead to cancel (within 3°) and wraps the lags whatever lead (%f rad) is tried", (phaseLead) => {
    const r = simulateSteering({ ...D, duration: 1, phaseLead });
    for (const a of [r.directionError, r.responseLag, r.leadToCancel]) expect(within(a)).toBe(true);
    expect(sameAngle(r.leadToCancel, first.leadToCancel)).toBeLessThan(3 * DEG);
    expect(sameAngle(r.responseLag, r.directionError - r.latencyDirectionError)).toBeLessThan(1e-12);
  });
});

describe("the verdict's reason, word for word", () => {
  const first = simulateSteering({ ...D, duration: 1 });
  const tol = D.directionTolerance;

  it("fails a robot more than twice the tolerance off, naming the angle (with a minus sign when it is clockwise) and the lead that cancels it", () => {
    expect(first.verdict).toBe("fails");
    expect(first.reason).toBe(
      `It travels ${deg(first.directionError)} off the commanded direction, more than twice the ${deg(tol)} tolerance; a phase lead of ${deg(first.leadToCancel)} would cancel it.`,
    );
    const behind = simulateSteering({ ...D, duration: 1, phaseLead: first.leadToCancel + 0.6 });
    expect(behind.directionError).toBeLessThan(-2 * tol);
    expect(behind.reason).toMatch(/^It travels −\d+\.\d° off the commanded direction, more than twice the 10\.0° tolerance/);
  });

  it("calls a robot between one and two tolerances off marginal and says by how much", () => {
    const r = simulateSteering({ ...D, duration: 1, phaseLead: first.leadToCancel - 1.5 * tol });
    expect(r.verdict).toBe("marginal");
    expect(r.reason).toBe(`It travels ${deg(r.directionError)} off the commanded direction, beyond the 10.0° tolerance.`);
  });

  it("says when the robot holds its direction, and how long it takes to cover the distance", () => {
    const r = simulateSteering({ ...D, phaseLead: first.leadToCancel });
    expect(r.verdict).toBe("holds");
    expect(r.reason).toBe(`It travels within 10.0° of the commanded direction and covers 1 m in ${r.timeToDistance!.toFixed(3)} s.`);
  });

  it("says when it keeps the direction but falls short of the distance", () => {
    const r = simulateSteering({ ...D, phaseLead: first.leadToCancel, commandedDistance: 50 });
    expect(r.reason).toBe("It keeps to the direction but does not cover 50 m in 1.5 s.");
  });

  it("says where a run cut short by its step budget stopped", () => {
    const r = simulateSteering(D, { maxSteps: 100 });
    expect(r.reason).toBe(`The run stopped at its step budget at ${r.endTime.toPrecision(3)} s; the figures cover only that part.`);
  });

  it("gives no warning for a run that ends in time with its skid down", () => {
    expect(first.warnings).toEqual([]);
  });

  it("warns that a lifted skid would tip the robot", () => {
    const r = simulateSteering({ ...D, wheelCount: 1, spinSpeed: 250, depth: 0.05, duration: 0.2 });
    expect(r.warnings).toContain("The skid lifts off the floor: the robot would ride on its wheel and tip, which this planar model does not follow.");
  });
});

describe("figures drawn from the run's ledgers and inputs", () => {
  const two = simulateSteering({ ...D, duration: 1 });
  const one = { ...D, wheelCount: 1, oppositeWindow: 0, spinSpeed: 150, depth: 0.1 };

  it("gives the share of the drawn energy lost to tyre slip as the slip loss over the energy drawn", () => {
    expect(two.energy.slipLoss).toBeGreaterThan(0);
    expect(two.slipEnergyShare).toBeCloseTo(two.energy.slipLoss / two.energy.drawn, 12);
  });

  it("names a skid-lift speed for a one-wheel robot only, from its mass, wheel and the motors' rotors geared up (gyro.ts)", () => {
    expect(two.skidLiftSpeed).toBeNull();
    const r = simulateSteering({ ...one, duration: 0.2 });
    const expected = skidLiftSpeed({
      robotMass: one.robotMass,
      wheelRadius: one.wheelRadius,
      wheelInertia: one.wheelInertia,
      rotorInertia: one.motorsPerWheel * one.motorRotorInertia,
      gearRatio: one.gearRatio,
    });
    expect(one.motorsPerWheel * one.motorRotorInertia).toBeGreaterThan(0);
    expect(r.skidLiftSpeed).toBe(expected);
  });

  it("takes the steady body acceleration at the start, whatever happens later, and the bias as the pulses' change along the sensor's inward axis: −(ā − ā₀)·e_r(β)", () => {
    // Runs ending at several points of a turn (one turn is 2π/150 = 42 ms), some inside a drive window.
    const long = simulateSteering({ ...one, duration: 0.5, sensorAngle: Math.PI / 3 });
    for (const duration of [0.2, 0.21, 0.22, 0.23]) {
      expect(simulateSteering({ ...one, duration }).sensor.steadyBodyAcceleration).toEqual(long.sensor.steadyBodyAcceleration);
    }
    const { meanBodyAcceleration: a, steadyBodyAcceleration: a0, bias } = long.sensor;
    expect(Math.hypot(a.x - a0.x, a.y - a0.y)).toBeGreaterThan(0);
    expect(bias).toBeCloseTo(-((a.x - a0.x) * Math.cos(Math.PI / 3) + (a.y - a0.y) * Math.sin(Math.PI / 3)), 12);
  });
});

describe("narrow gaps between the drive windows", () => {
  // Add windows only, a fast loop without latency: each wheel enters and leaves its window once a turn.
  const wide = { ...D, duration: 0.5, oppositeWindow: 0, loopRate: 100000, latency: 0 };

  it("switches each of the two wheels out and back in every turn when the gap is only 0.05 rad (under 3°): at least 4 edges a turn", () => {
    const r = simulateSteering({ ...wide, windowWidth: 2 * Math.PI - 0.05 });
    expect(r.status).toBe("done");
    expect(r.pulseEdges).toBeGreaterThanOrEqual(4 * r.revolutions.length);
  });

  it("does not chase a gap under 1 mrad step by step: the run still ends in time within its step budget", () => {
    const r = simulateSteering({ ...wide, duration: 0.2, windowWidth: 2 * Math.PI - 5e-4 });
    expect(r.status).toBe("done");
    expect(r.endTime).toBe(0.2);
  });
});

describe("refusals", () => {
  it("names a bad input before a bad option when both are wrong: the robot is checked first", () => {
    const error = refusal(() => simulateSteering({ ...D, spinSpeed: -1 }, { maxSteps: 1 }));
    expect(error.param).toBe("spinSpeed");
    expect(error.unit).toBe("rad/s");
  });
});
