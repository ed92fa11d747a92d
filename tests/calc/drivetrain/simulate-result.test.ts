/**
 * simulateSpinUp's result assembled from a run: crossing times, currents, charge and energy against
 * closed forms of a DC motor turning a pure inertia, the samples kept for a plot, the drive summary,
 * the speed figures, the option refusals and the notes on a run that stopped early.
 */
import { describe, expect, it } from "vitest";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../../calc/drivetrain/demo.ts";
import type { DrivetrainInput } from "../../../calc/drivetrain/inputs.ts";
import { simulateSpinUp } from "../../../calc/drivetrain/simulate.ts";
import { refusal } from "../../support/refusal.ts";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/**
 * A DC motor on a pure inertia, nothing else: one motor, K_t = 1/K_v = 1/(100 rad/s/V) = 0.01 N·m/A,
 * R = 1 Ω, no no-load loss, no rotor inertia, 4 cells × 4 V = 16 V with no internal resistance, a
 * 1:1 drive at 100 %, J = 1e-5 kg·m², no friction and no drag, no current limit.
 * ctms-dc-motor-speed: J·Ω̇ = K_t·(V − K_e·Ω)/R, so Ω(t) = Ω_nl·(1 − e^(−t/τ)) with
 * Ω_nl = V/K_e = 16/0.01 = 1600 rad/s and τ = J·R/K_t² = 1e-5·1/1e-4 = 0.1 s; I(t) = (V/R)·e^(−t/τ).
 */
const IDEAL: DrivetrainInput = {
  ...DEMO_WEAPON,
  currentLimitAt: "none",
  noLoadLoss: "constant",
  motorCount: 1,
  motorKv: 100,
  motorResistance: 1,
  noLoadCurrent: 0,
  motorRotorInertia: 0,
  currentLimit: 1000,
  throttle: 1,
  cellCount: 4,
  cellVoltage: 4,
  cellResistance: 0,
  gearRatio: 1,
  gearEfficiency: 1,
  inertia: 1e-5,
  frictionTorque: 0,
  dragTorque: 0,
  targetSpeed: 1000,
  maxTime: 10,
  tipRadius: 0.05,
  closingSpeed: 2,
  impactors: 2,
};

describe("spin-up of a pure inertia, against the closed form Ω = Ω_nl·(1 − e^(−t/τ))", () => {
  const r = simulateSpinUp(IDEAL, { maxPoints: 5000 });

  it("crosses 50 %, 90 % and 100 % of the target at t = −τ·ln(1 − Ω/Ω_nl)", () => {
    // 500/1600 = 0.3125: t = −0.1·ln 0.6875 = 0.0374693449 s; 900/1600: −0.1·ln 0.4375 = 0.0826678573 s;
    // 1000/1600: −0.1·ln 0.375 = 0.0980829253 s (worked by hand).
    expect(rel(r.timeTo50!, 0.0374693449)).toBeLessThan(1e-8);
    expect(rel(r.timeTo90!, 0.0826678573)).toBeLessThan(1e-8);
    expect(rel(r.timeToTarget!, 0.0980829253)).toBeLessThan(1e-8);
    expect(r.verdict).toBe("reaches-target");
    expect(r.endReason).toBe("steady-state");
    expect(r.warnings).toEqual([]);
  });

  it("draws Q = (V/R)·τ·(1 − e^(−t/τ)) up to the target: 16·0.1·0.625 = 1 C, so 1/0.0980829 = 10.1955 A on average and V·Q = 16 J", () => {
    expect(rel(r.averageBatteryCurrentToTarget!, 1 / 0.0980829253)).toBeLessThan(1e-7);
    expect(rel(r.energyToTarget!, 16)).toBeLessThan(1e-7);
  });

  it("averages the whole charge over the whole run, and it settles near Ω_nl with ½·J·Ω² = ½·1e-5·1600² = 12.8 J stored", () => {
    // Q(T) = 1.6·(1 − e^(−T/τ)) C; the run stops when e^(−T/τ) is about 1e-5, so Q is 1.6 C to 1e-4.
    expect(rel(r.chargeDrawn, 1.6)).toBeLessThan(1e-4);
    expect(rel(r.averageBatteryCurrent, r.chargeDrawn / r.endTime)).toBeLessThan(1e-12);
    expect(r.endTime).toBeGreaterThan(1);
    expect(r.averageBatteryCurrent).toBeLessThan(1.6);
    expect(rel(r.energy.kinetic, 12.8)).toBeLessThan(1e-4);
    expect(rel(r.energy.kinetic, 0.5 * 1e-5 * r.topSpeed ** 2)).toBeLessThan(1e-9);
    // All the rest went into the winding: drawn = kinetic + copper loss, V·Q = 16·1.6 = 25.6 J.
    expect(rel(r.energy.drawn, 25.6)).toBeLessThan(1e-4);
    expect(r.energy.balanceError).toBeLessThan(1e-6);
  });

  it("reports the stall current V/R = 16 A as the peak, and the speed figures at the target from ½·J·Ω², Ω·r and 2π·v/(n·Ω)", () => {
    expect(rel(r.peakMotorCurrent, 16)).toBeLessThan(1e-12);
    expect(rel(r.drive.stallCurrent, 16)).toBeLessThan(1e-12);
    const t = r.atTargetSpeed;
    // ½·1e-5·1000² = 5 J; 5/9.80665 = 0.509858 m per kilogram; 1000·0.05 = 50 m/s; 2π·2/(2·1000) = 6.2832 mm.
    expect(rel(t.storedEnergy, 5)).toBeLessThan(1e-12);
    expect(rel(t.dropHeightPerKilogram, 5 / STANDARD_GRAVITY)).toBeLessThan(1e-12);
    expect(rel(t.dropHeightPerKilogram, 0.509858)).toBeLessThan(1e-6);
    expect(rel(t.tipSpeed, 50)).toBeLessThan(1e-12);
    expect(rel(t.bite!, Math.PI / 500)).toBeLessThan(1e-12);
    expect(rel(t.energyPerMass, 5 / IDEAL.robotMass)).toBeLessThan(1e-12);
  });

  it("gives the ideal no-load speed D·V/K_e = 1600 rad/s and the time constant 0.1 s", () => {
    expect(rel(r.drive.idealNoLoadSpeed, 1600)).toBeLessThan(1e-12);
    expect(rel(r.drive.timeConstant, 0.1)).toBeLessThan(1e-12);
    expect(r.drive.addedInertiaShare).toBe(0);
  });
});

describe("spin-up with the motor current held at its limit, then free", () => {
  // IDEAL with an 8 A limit on the motor: the current is held until (16 − 0.01·Ω)/1 = 8, at Ω_s = 800 rad/s,
  // with Ω̇ = K_t·I_lim/J = 0.08/1e-5 = 8000 rad/s², so at t_s = 800/8000 = 0.1 s; then
  // Ω = 1600 − 800·e^(−(t − 0.1)/0.1) (worked by hand from ctms-dc-motor-speed).
  const input: DrivetrainInput = { ...IDEAL, currentLimitAt: "motor", currentLimit: 8, targetSpeed: 1200 };
  const r = simulateSpinUp(input, { series: false });
  // The switch sits inside a step whose dense output spans the kink in the current, so it lands within
  // about 2e-6 of t_s at the default tolerance, and everything after it carries that offset.

  it("ends the current-limited stretch at t_s = 0.1 s and crosses 50 % on the straight line, 90 % and 100 % on the exponential", () => {
    expect(r.regimes[0]!.regime).toBe("current-limit");
    expect(rel(r.regimes[0]!.end, 0.1)).toBeLessThan(1e-5);
    expect(r.regimes[1]!.regime).toBe("voltage");
    // 600/8000 = 0.075 s; 1080 = 1600 − 800·e^(−x): x = −ln 0.65 = 0.430783, t = 0.1430783 s;
    // 1200: x = ln 2, t = 0.1 + 0.0693147 = 0.1693147 s.
    expect(rel(r.timeTo50!, 0.075)).toBeLessThan(1e-9);
    expect(rel(r.timeTo90!, 0.14307829161)).toBeLessThan(1e-5);
    expect(rel(r.timeToTarget!, 0.16931471806)).toBeLessThan(1e-5);
  });

  it("gives the straight-line time to 50 % from the limited acceleration, ½·1200/8000 = 0.075 s", () => {
    expect(rel(r.drive.currentLimitedAcceleration, 8000)).toBeLessThan(1e-12);
    expect(rel(r.straightLineTimeTo50!, 0.075)).toBeLessThan(1e-12);
  });

  it("draws 0.6 C while limited (I_b = D·I = 8·(0.01·8000·t + 8)/16 = 4 + 40·t) and 8·0.1·(1 − ½) = 0.4 C after, 1 C in 0.1693 s", () => {
    expect(rel(r.averageBatteryCurrentToTarget!, 1 / 0.16931471806)).toBeLessThan(1e-5);
    expect(rel(r.energyToTarget!, 16)).toBeLessThan(1e-5);
    expect(rel(r.peakMotorCurrent, 8)).toBeLessThan(1e-12);
    // The pack's current peaks where the limit lets go: D = 1, I = 8 A.
    expect(rel(r.peakBatteryCurrent, 8)).toBeLessThan(1e-9);
  });
});

describe("the drive summary", () => {
  // Two motors of 1 g·cm²·10 = 1e-6 kg·m² rotor inertia through 2:1 at 90 %, 1 A no-load, 0.01 N·m friction.
  const geared: DrivetrainInput = {
    ...IDEAL,
    motorCount: 2,
    motorRotorInertia: 1e-6,
    gearRatio: 2,
    gearEfficiency: 0.9,
    noLoadCurrent: 1,
    frictionTorque: 0.01,
    currentLimitAt: "motor",
    currentLimit: 8,
    targetSpeed: 300,
  };

  it("reflects the rotors through η·k²: J_eff = 1e-5 + 0.9·2²·2·1e-6 = 1.72e-5 kg·m², 72 % added (serway-beichner-5e)", () => {
    const r = simulateSpinUp(geared, { series: false });
    expect(rel(r.drive.effectiveInertia, 1.72e-5)).toBeLessThan(1e-12);
    expect(rel(r.drive.addedInertiaShare, 0.72)).toBeLessThan(1e-12);
    // D·V/(K_e·G) = 16/(0.01·2) = 800 rad/s.
    expect(rel(r.drive.idealNoLoadSpeed, 800)).toBeLessThan(1e-12);
    // (η·k·N·K_t·(I_lim − I₀) − T_f)/J_eff = (0.9·2·2·0.01·7 − 0.01)/1.72e-5 = 0.242/1.72e-5 = 14069.767 rad/s².
    expect(rel(r.drive.currentLimitedAcceleration, 14069.767442)).toBeLessThan(1e-9);
  });

  it("uses the stall current with no limit: D·V/R = 16 A, so (0.9·2·2·0.01·15 − 0.01)/1.72e-5 = 30813.953 rad/s²", () => {
    const r = simulateSpinUp({ ...geared, currentLimitAt: "none" }, { series: false });
    expect(rel(r.drive.stallCurrent, 16)).toBeLessThan(1e-12);
    expect(rel(r.drive.currentLimitedAcceleration, 30813.953488)).toBeLessThan(1e-9);
  });

  it("takes a motor limit above the stall current at its word: K_t·I_lim/J = 0.01·1000/1e-5 = 1e6 rad/s², though the motor stalls at 16 A", () => {
    const r = simulateSpinUp({ ...IDEAL, currentLimitAt: "motor", currentLimit: 1000 }, { series: false });
    expect(rel(r.drive.stallCurrent, 16)).toBeLessThan(1e-12);
    expect(rel(r.drive.currentLimitedAcceleration, 1e6)).toBeLessThan(1e-12);
  });

  it("gives no straight-line time when friction eats all the limited torque", () => {
    // 0.9·2·2·0.01·(8 − 1) = 0.252 N·m at the output against 0.3 N·m of friction.
    const r = simulateSpinUp({ ...geared, frictionTorque: 0.3 }, { series: false });
    expect(r.drive.currentLimitedAcceleration).toBe(0);
    expect(r.straightLineTimeTo50).toBeNull();
    expect(r.verdict).toBe("stalled");
    expect(r.atTopSpeed.bite).toBeNull();
    expect(r.atTopSpeed.storedEnergy).toBe(0);
    expect(r.timeToTarget).toBeNull();
    expect(r.averageBatteryCurrentToTarget).toBeNull();
  });

  it("leaves the figures up to the target null when the drive falls short of it", () => {
    const r = simulateSpinUp({ ...IDEAL, targetSpeed: 2000 }, { series: false });
    expect(r.verdict).toBe("falls-short");
    expect(r.timeTo50).not.toBeNull();
    expect(r.timeToTarget).toBeNull();
    expect(r.averageBatteryCurrentToTarget).toBeNull();
    expect(r.energyToTarget).toBeNull();
  });
});

describe("a spinner's energy ledger with a reduction", () => {
  it("counts the wheels at ω_m/G: with a 3:1 reduction the balance still closes to 1e-6", () => {
    const r = simulateSpinUp({ ...DEMO_SPINNER, gearRatio: 3, wheelInertia: 4e-5 }, { series: false });
    expect(r.energy.balanceError).toBeLessThan(1e-6);
  });
});

describe("the samples kept for a plot", () => {
  const all = simulateSpinUp(IDEAL, { maxPoints: 5000 }).series;
  const times = all.map((p) => p.time);
  const t1 = times[times.length - 1]!;

  it("keeps every step when there are no more than maxPoints of them, from rest at t = 0 to the end", () => {
    expect(all.length).toBeGreaterThan(40);
    expect(all.length).toBeLessThan(5000);
    expect(all[0]).toMatchObject({ time: 0, speed: 0, motorSpeed: 0 });
    expect(simulateSpinUp(IDEAL, { maxPoints: all.length }).series).toEqual(all);
  });

  it.each([2, 3, 7, 20, 40])(
    "keeps at most %i samples: first and last, and for each of that many evenly spaced times the first step at or after it",
    (count) => {
      const kept = simulateSpinUp(IDEAL, { maxPoints: count }).series;
      expect(kept.length).toBeLessThanOrEqual(count);
      expect(kept[0]).toEqual(all[0]);
      expect(kept[kept.length - 1]).toEqual(all[all.length - 1]);
      for (let j = 1; j < kept.length; j++) expect(kept[j]!.time).toBeGreaterThan(kept[j - 1]!.time);
      for (const point of kept) expect(all).toContainEqual(point);
      for (let p = 0; p < count; p++) {
        const want = (t1 * p) / (count - 1);
        const first = all.find((point) => point.time >= want) ?? all[all.length - 1]!;
        expect(kept, `time ${want}`).toContainEqual(first);
      }
    },
  );

  it("keeps nothing when asked for no series", () => {
    expect(simulateSpinUp(IDEAL, { series: false }).series).toEqual([]);
  });
});

describe("the options, refused by name", () => {
  it("refuses options that are not an object, naming them", () => {
    const e = refusal(() => simulateSpinUp(IDEAL, null as never));
    expect(e.param).toBe("options");
    expect(e.message).toBe("options must be an object of named inputs (got null)");
  });

  it("refuses a number of points outside 2 to 5000 or not whole", () => {
    expect(refusal(() => simulateSpinUp(IDEAL, { maxPoints: 1 })).message).toBe("maxPoints must be a whole number at least 2 and at most 5000 (got 1)");
    expect(refusal(() => simulateSpinUp(IDEAL, { maxPoints: 2.5 })).param).toBe("maxPoints");
  });

  it("refuses a tolerance outside 1e-12 to 1e-3, a plain number without a unit", () => {
    const e = refusal(() => simulateSpinUp(IDEAL, { relativeTolerance: 1e-2 }));
    expect(e.param).toBe("relativeTolerance");
    expect(e.unit).toBe("");
    expect(e.message).toBe("relativeTolerance must be at least 1e-12 and at most 0.001 (got 0.01)");
  });
});

describe("drives whose time constant leaves the doubles", () => {
  it("refuses a weapon's gear efficiency of 5e-324, naming it", () => {
    const e = refusal(() => simulateSpinUp({ ...IDEAL, gearEfficiency: 5e-324 }));
    expect(e.param).toBe("gearEfficiency");
    expect(e.message).toBe("gearEfficiency must be large enough for the drive's time constant to stay finite (got 5e-324)");
  });

  it("refuses a spinner whose body time constant overflows while the wheels' does not", () => {
    // A 100 kg·m² body on 2 wheels of 1e-8 kg·m², ρ = R/r_w = 0.005/0.5 = 0.01: τ_locked ≈ 1e9/η s and
    // τ_wheel ≈ 2e-5/η s (worked by hand), so η = 1e-305 overflows the first (1e314) and not the second.
    const heavy = { ...DEMO_SPINNER, inertia: 100, wheelInertia: 1e-8, motorRotorInertia: 0, wheelOffset: 0.005, wheelRadius: 0.5, gearEfficiency: 1e-305 };
    const e = refusal(() => simulateSpinUp(heavy, { series: false }));
    expect(e.param).toBe("gearEfficiency");
    expect(e.message).toBe("gearEfficiency must be large enough for the drive's time constant to stay finite (got 1e-305)");
  });
  it("refuses a target speed so small that its bite overflows by its own name, not by the bite's internal argument", () => {
    // 2π·3 m/s/(2·1e-315 rad/s) ≈ 9.4e315 m passes the largest double.
    const e = refusal(() => simulateSpinUp({ ...DEMO_WEAPON, targetSpeed: 1e-315 }, { series: false }));
    expect(e.param).toBe("targetSpeed");
    expect(e.message).toBe("targetSpeed must be large enough for the bite depth to stay finite (got 1e-315 rad/s)");
  });
});

describe("a run stopped by its step budget says why", () => {
  it("a weapon with a 44 µs time constant run to 300 s: too stiff for 50000 steps, before the speed settled", () => {
    const r = simulateSpinUp({ ...DEMO_WEAPON, inertia: 1e-7, motorRotorInertia: 0, maxTime: 300 }, { series: false, stopAtSteadyState: false });
    expect(r.endReason).toBe("step-limit");
    expect(r.solver.acceptedSteps + r.solver.rejectedSteps).toBe(50000);
    expect(r.solver.rejectedSteps).toBeGreaterThan(0);
    expect(r.warnings).toEqual([`Stopped at ${r.endTime.toPrecision(3)} s: too stiff to resolve in 50000 steps, before the speed settled.`]);
  });

  it("a spinner whose wheels settle in 20 µs and slip on: the note names the wheel and rotor inertias", () => {
    // Skids holding 100 N·m keep the body still while the wheels slip, so the stiff wheel side is never left.
    const slipping = { ...DEMO_SPINNER, wheelInertia: 1e-8, motorRotorInertia: 0, frictionTorque: 100, maxTime: 300 };
    const r = simulateSpinUp(slipping, { series: false, stopAtSteadyState: false });
    expect(r.endReason).toBe("step-limit");
    expect(r.drive.wheelTimeConstant!).toBeLessThan(1e-4);
    expect(r.warnings).toEqual([
      `Stopped at ${r.endTime.toPrecision(3)} s: too stiff to resolve in 50000 steps; the wheels and motor rotors settle in ${r.drive.wheelTimeConstant!.toPrecision(2)} s, too fast to simulate beside the rest. Check the wheel and motor rotor inertias.`,
    ]);
  });
  it("a drag of 0.02 N·m already at 1e-100 rad/s: the step shrinks below 1e-14 of the time, and the note counts the steps", () => {
    // T = c·Ω² with c = 0.02/(1e-100)² = 2e198 N·m·s² (quadratic-air-drag): the drive settles within no time a double can step.
    const r = simulateSpinUp({ ...DEMO_WEAPON, dragReferenceSpeed: 1e-100 }, { series: false });
    expect(r.endReason).toBe("step-limit");
    const steps = r.solver.acceptedSteps + r.solver.rejectedSteps;
    expect(steps).toBeLessThan(50000);
    expect(r.warnings).toEqual([
      `Stopped at ${r.endTime.toPrecision(3)} s: too stiff to resolve: after ${steps} steps the step size fell below 10⁻¹⁴ of the time, before the speed settled.`,
    ]);
  });
  it("a spinner whose wheels settle slower than 1e-4 s, stopped by the same drag: the note leaves the wheels out", () => {
    const r = simulateSpinUp({ ...DEMO_SPINNER, dragReferenceSpeed: 1e-100 }, { series: false });
    expect(r.endReason).toBe("step-limit");
    expect(r.drive.wheelTimeConstant!).toBeGreaterThan(1e-4);
    expect(r.warnings[0]).toMatch(
      /^Stopped at .* s: too stiff to resolve: after \d+ steps the step size fell below 10⁻¹⁴ of the time, before the speed settled\.$/,
    );
  });
  it("names the wheels only below a wheel time constant of 1e-4 s: at exactly 1e-4 s the note leaves them out", () => {
    // τ_w = n·J_w·R/(η·G²·N·K_t²) = 4·4e-8·0.04/(1·1·1·0.008²) = 6.4e-9/6.4e-5 = 1e-4 s (worked by hand),
    // with K_t = 1/(125 rad/s/V), no rotor inertia and a pack without internal resistance.
    const edge = {
      ...DEMO_SPINNER,
      motorCount: 1,
      motorKv: 125,
      motorResistance: 0.04,
      motorRotorInertia: 0,
      cellResistance: 0,
      drivenWheels: 4,
      wheelInertia: 4e-8,
      dragReferenceSpeed: 1e-100,
    };
    const r = simulateSpinUp(edge, { series: false });
    expect(r.drive.wheelTimeConstant).toBe(1e-4);
    expect(r.endReason).toBe("step-limit");
    expect(r.warnings[0]).toMatch(/, before the speed settled\.$/);
  });
});

describe("the note on the skid lifting (one driven wheel)", () => {
  it("stays silent when the robot never turns, even with the whole weight on the wheel (lift speed 0)", () => {
    // Share 1: M·g already on the wheel, so the lift speed √((M·g − s·M·g)/(gyroLoad·k)) is 0; skids holding
    // 100 N·m keep the body at 0 rad/s, which does not exceed it.
    const held = { ...DEMO_SPINNER, drivenWheels: 1, weightShare: 1, frictionTorque: 100 };
    const r = simulateSpinUp(held, { series: false });
    expect(r.topSpeed).toBe(0);
    expect(r.warnings.filter((w) => w.includes("gyroscopic"))).toEqual([]);
  });

  it("warns once the robot turns past the lift speed", () => {
    const r = simulateSpinUp({ ...DEMO_SPINNER, drivenWheels: 1, weightShare: 1 }, { series: false });
    expect(r.topSpeed).toBeGreaterThan(0);
    expect(r.warnings).toContain(
      "The wheel's gyroscopic moment lifts the skid at 0 rpm; above it the robot tilts onto its wheel, which this model does not follow.",
    );
  });
});
