import { describe, expect, it } from "vitest";
import { simulateSpinUp } from "../../../calc/drivetrain/simulate.ts";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../../calc/drivetrain/demo.ts";
import type { DrivetrainInput } from "../../../calc/drivetrain/inputs.ts";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { RPM } from "../../../calc/drivetrain/inputs.ts";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const quick = { series: false } as const;

describe("where the current limit acts: reference checks", () => {
  it("Ohm's law for a stalled motor with no limit (ctms-dc-motor-speed: V = I·R + K_e·ω, ω = 0): I = D·V_oc/(R + N·D²·R_p)", () => {
    // Demo weapon: 4 × 4.1 V, 4 × 8 mΩ, one 45 mΩ motor, full throttle: 16.4 / 0.077 = 212.99 A, worked by hand.
    const r = simulateSpinUp({ ...DEMO_WEAPON, currentLimitAt: "none" }, quick);
    expect(rel(r.drive.stallCurrent, 212.987)).toBeLessThan(5e-6);
    expect(r.drive.stallBatteryCurrent).toBeCloseTo(r.drive.stallCurrent, 9);
  });

  it("an ideal controller passes its input power on (erickson-power-electronics, ch. 2): with a battery limit, at standstill V_b·I_b = N·I²·R", () => {
    const input = { ...DEMO_WEAPON, currentLimitAt: "battery" as const };
    const r = simulateSpinUp(input, quick);
    const vb = input.cellCount * input.cellVoltage - input.cellCount * input.cellResistance * input.currentLimit;
    expect(rel(r.drive.stallBatteryCurrent, input.motorCount * input.currentLimit)).toBeLessThan(1e-12);
    expect(rel(vb * r.drive.stallBatteryCurrent, input.motorCount * r.drive.stallCurrent ** 2 * input.motorResistance)).toBeLessThan(1e-12);
    // The motor current at standstill is well above the battery-side limit: √(I_lim·V_b/R).
    expect(rel(r.drive.stallCurrent, Math.sqrt((input.currentLimit * vb) / input.motorResistance))).toBeLessThan(1e-12);
  });
});

describe("where the current limit acts: behaviour", () => {
  it("keeps the earlier model when the choice is left out (old links and designs)", () => {
    const { currentLimitAt: _a, noLoadLoss: _b, ...old } = DEMO_WEAPON;
    const before = simulateSpinUp(old as DrivetrainInput, quick);
    const now = simulateSpinUp({ ...DEMO_WEAPON, currentLimitAt: "motor", noLoadLoss: "constant" }, quick);
    expect(now.timeToTarget).toBe(before.timeToTarget);
    expect(now.topSpeed).toBe(before.topSpeed);
  });

  it("holds the pack to N·I_lim with a battery limit, and spins up faster than with the same motor limit", () => {
    const battery = simulateSpinUp({ ...DEMO_WEAPON, currentLimitAt: "battery" }, quick);
    const motor = simulateSpinUp({ ...DEMO_WEAPON, currentLimitAt: "motor" }, quick);
    expect(battery.peakBatteryCurrent).toBeLessThanOrEqual(DEMO_WEAPON.currentLimit * (1 + 1e-6));
    expect(battery.peakMotorCurrent).toBeGreaterThan(DEMO_WEAPON.currentLimit);
    expect(battery.timeToTarget!).toBeLessThan(motor.timeToTarget!);
    expect(battery.energy.balanceError).toBeLessThan(1e-6);
  });

  it("draws the stall current with no limit, and closes the energy balance", () => {
    const r = simulateSpinUp({ ...DEMO_SPINNER, currentLimitAt: "none" }, quick);
    expect(r.peakMotorCurrent).toBeGreaterThan(DEMO_SPINNER.currentLimit);
    expect(r.energy.balanceError).toBeLessThan(1e-6);
  });

  it("refuses an unknown place for the limit by name", () => {
    let caught: unknown;
    try {
      simulateSpinUp({ ...DEMO_WEAPON, currentLimitAt: "fuse" }, quick);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(CalcInputError);
    expect((caught as CalcInputError).param).toBe("currentLimitAt");
  });
});

describe("no-load loss growing with speed", () => {
  // CTMS DC motor speed model: J = 0.01 kg·m², b = 0.1 N·m·s, K = 0.01, R = 1 Ω; 1 V step gives 0.1 rad/s in steady state.
  // The viscous term b·ω is our loss K·I₀·ω/ω₀: with V₀ = 1 V, ω₀ = K/(bR + K²) = 0.0999 rad/s and I₀ = b·ω₀/K.
  const K = 0.01;
  const w0 = K / (0.1 * 1 + K * K);
  const ctms: DrivetrainInput = {
    ...DEMO_WEAPON,
    motorKv: 1 / K,
    motorResistance: 1,
    noLoadCurrent: (0.1 * w0) / K,
    noLoadVoltage: 1,
    noLoadLoss: "speed",
    motorRotorInertia: 0,
    currentLimit: 1000,
    cellCount: 1,
    cellVoltage: 1,
    cellResistance: 0,
    gearRatio: 1,
    gearEfficiency: 1,
    inertia: 0.01,
    frictionTorque: 0,
    dragTorque: 0,
    targetSpeed: 0.2,
    maxTime: 10,
  };

  it("Control Tutorials for MATLAB and Simulink, DC motor speed (open-loop step): 0.1 rad/s in steady state", () => {
    const r = simulateSpinUp(ctms, quick);
    expect(rel(r.topSpeed, 0.1)).toBeLessThan(5e-2);
    // Second method: the same steady state in closed form, K·V/(b·R + K²).
    expect(rel(r.topSpeed, w0)).toBeLessThan(1e-4);
  });

  it("lowers the top speed when I₀ was quoted at a lower voltage than the drive runs at (the review's case)", () => {
    const constant = simulateSpinUp({ ...DEMO_WEAPON, targetSpeed: 20000 * RPM }, quick);
    const atTen = simulateSpinUp({ ...DEMO_WEAPON, targetSpeed: 20000 * RPM, noLoadLoss: "speed", noLoadVoltage: 10 }, quick);
    expect(atTen.topSpeed).toBeLessThan(constant.topSpeed);
    // Quoted at the running voltage, the loss at top speed is about the constant one.
    const atRun = simulateSpinUp({ ...DEMO_WEAPON, targetSpeed: 20000 * RPM, noLoadLoss: "speed", noLoadVoltage: 16.4 }, quick);
    expect(rel(atRun.topSpeed, constant.topSpeed)).toBeLessThan(0.01);
  });

  it("refuses a measuring voltage the winding's own drop at I₀ would use up", () => {
    let caught: unknown;
    try {
      simulateSpinUp({ ...DEMO_WEAPON, noLoadLoss: "speed", noLoadVoltage: 0.5, noLoadCurrent: 20, motorResistance: 0.05 }, quick);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(CalcInputError);
    expect((caught as CalcInputError).param).toBe("noLoadVoltage");
  });
});
