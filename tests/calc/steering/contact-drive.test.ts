/**
 * The tyre and skid forces (calc/steering/contact.ts) and the pack with several motor groups
 * (calc/steering/drive.ts), including a check against the spin-up model's own electrical solution.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEMO_WEAPON } from "../../../calc/drivetrain/demo.ts";
import { simulateSpinUp } from "../../../calc/drivetrain/simulate.ts";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { brushForceInto, brushTyreForce, skidForceInto } from "../../../calc/steering/contact.ts";
import { PackSolver, steadyDuty } from "../../../calc/steering/drive.ts";

const close = (actual: number, expected: number, rtol: number, atol = 0) => {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);
};

describe("the brush tyre model with combined slip (pacejka-tyre-dynamics ch. 3)", () => {
  it("slides at μN opposite the slip velocity: 0.9 × 33.34261 N with slip (0.3, 0.4) m/s → (−18.005, −24.007) N (computed from the friction circle)", () => {
    const f = brushTyreForce({ slipVelocityX: 0.3, slipVelocityY: 0.4, rollingSpeed: 0, normalLoad: 33.34261, frictionCoefficient: 0.9, slipStiffness: 300 });
    close(f.forceX, -18.0050094, 1e-8);
    close(f.forceY, -24.0066792, 1e-8);
    expect(f.gripShare).toBe(1);
  });

  it("is linear at small slip, F = C·σ with σ = |V_s|/V_r (the slip stiffness's definition)", () => {
    const f = brushTyreForce({ slipVelocityX: 1e-4, slipVelocityY: 0, rollingSpeed: 20, normalLoad: 10, frictionCoefficient: 1, slipStiffness: 100 });
    close(-f.forceX, (100 * 1e-4) / Math.hypot(20, 0.05), 1e-4); // the next term of the curve is −3u², u ≈ 2e-5
  });

  it("follows μF_z(3u − 3u² + u³) = μF_z(1 − (1 − u)³) and reaches μF_z at u = 1 with zero slope", () => {
    for (const u of [0.1, 0.5, 0.9, 1]) {
      const sigma = (3 * 10 * u) / 100; // u = Cσ/(3μF_z) with C = 100, μF_z = 10
      const f = brushTyreForce({
        slipVelocityX: sigma * Math.hypot(20, 0.05),
        slipVelocityY: 0,
        rollingSpeed: 20,
        normalLoad: 10,
        frictionCoefficient: 1,
        slipStiffness: 100,
      });
      close(f.force, 10 * (1 - (1 - u) ** 3), 1e-12);
    }
  });

  it("never leaves the friction circle and always opposes the slip, so slip only dissipates (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        (vx, vy, vr, n, mu, c) => {
          const f = brushTyreForce({ slipVelocityX: vx, slipVelocityY: vy, rollingSpeed: vr, normalLoad: n, frictionCoefficient: mu, slipStiffness: c });
          expect(f.force).toBeLessThanOrEqual(mu * n * (1 + 1e-12));
          expect(f.forceX * vx + f.forceY * vy).toBeLessThanOrEqual(1e-12);
          const out = new Float64Array(2);
          brushForceInto(vx, vy, vr, n, mu, c, out);
          close(out[0]!, f.forceX, 1e-9, 1e-12);
          close(out[1]!, f.forceY, 1e-9, 1e-12);
        },
      ),
    );
  });

  it("returns only finite numbers or a CalcInputError over the whole double range", () => {
    const any = fc.oneof(fc.double(), fc.constantFrom(0, -0, Number.MIN_VALUE, Number.MAX_VALUE, -Number.MAX_VALUE));
    fc.assert(
      fc.property(any, any, any, any, any, any, (a, b, c, d, e, f) => {
        try {
          const r = brushTyreForce({ slipVelocityX: a, slipVelocityY: b, rollingSpeed: c, normalLoad: d, frictionCoefficient: e, slipStiffness: f });
          for (const v of Object.values(r)) expect(Number.isFinite(v)).toBe(true);
        } catch (err) {
          expect(err).toBeInstanceOf(CalcInputError);
        }
      }),
      { numRuns: 500 },
    );
  });

  it("makes a skid slide at μN, regularised below 0.05 m/s (serway-beichner-5e: f_k = μ_k n)", () => {
    const out = new Float64Array(2);
    const p = skidForceInto(30, 0, 5, 0.3, out);
    close(-out[0]!, 1.5, 2e-6);
    close(p, -out[0]! * 30, 1e-12);
  });
});

describe("one pack, several motor groups (battery-thevenin-model, erickson-power-electronics, ctms-dc-motor-speed)", () => {
  const params = { openCircuitVoltage: 16, packResistance: 0.04, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 30, motorsPerGroup: 1 };

  it("solves I = (D·V_b − e)/R_m with V_b = V_oc − R_p·ΣD·I, and balances power: V_oc·I_b = R_p·I_b² + Σ(I²R_m + e·I)", () => {
    const s = new PackSolver(params, 2);
    const duty = Float64Array.of(0.6, 0.4);
    const speed = Float64Array.of(700, 500);
    const i = new Float64Array(2);
    const d = new Float64Array(2);
    const ib = s.solve(duty, speed, i, d);
    const vb = s.batteryVoltage;
    close(vb, 16 - 0.04 * ib, 1e-14);
    expect(Math.abs(i[0]!)).toBeLessThan(30); // below the limit: the plain solution
    close(i[0]!, (0.6 * vb - 7) / 0.1, 1e-12);
    close(i[1]!, (0.4 * vb - 5) / 0.1, 1e-12);
    close(16 * ib, 0.04 * ib * ib + i[0]! ** 2 * 0.1 + 7 * i[0]! + i[1]! ** 2 * 0.1 + 5 * i[1]!, 1e-12);
  });

  it("holds a driving motor at +I_lim and a braking one at −I_lim, each at the duty that gives it", () => {
    const s = new PackSolver(params, 2);
    const i = new Float64Array(2);
    const d = new Float64Array(2);
    s.solve(Float64Array.of(1, 0), Float64Array.of(500, 900), i, d);
    expect(i[0]).toBe(30);
    expect(i[1]).toBe(-30);
    close(d[0]! * s.batteryVoltage, 5 + 30 * 0.1, 1e-12);
    close(d[1]! * s.batteryVoltage, 9 - 30 * 0.1, 1e-12);
  });

  it("finds the duty that holds a speed and current (a round trip through the solver)", () => {
    const duty = steadyDuty(params, 2, 800, 3)!;
    const s = new PackSolver(params, 2);
    const i = new Float64Array(2);
    s.solve(Float64Array.of(duty, duty), Float64Array.of(800, 800), i, new Float64Array(2));
    close(i[0]!, 3, 1e-10);
    close(i[1]!, 3, 1e-10);
    expect(steadyDuty(params, 2, 2000, 3)).toBeNull(); // back-EMF 20 V > 16 V
  });

  it("gives the spin-up model's battery current, voltage and motor current at each recorded point (same physics, calc/drivetrain/)", () => {
    const p = DEMO_WEAPON;
    const run = simulateSpinUp(p, { maxPoints: 40 });
    const s = new PackSolver(
      {
        openCircuitVoltage: p.cellCount * p.cellVoltage,
        packResistance: p.cellCount * p.cellResistance,
        motorResistance: p.motorResistance,
        torqueConstant: 1 / p.motorKv,
        currentLimit: p.currentLimit,
        motorsPerGroup: 1,
      },
      p.motorCount,
    );
    const i = new Float64Array(p.motorCount);
    for (const point of run.series) {
      s.solve(new Float64Array(p.motorCount).fill(p.throttle), new Float64Array(p.motorCount).fill(point.motorSpeed), i, new Float64Array(p.motorCount));
      close(s.batteryCurrent, point.batteryCurrent, 1e-10, 1e-10);
      close(s.batteryVoltage, point.batteryVoltage, 1e-12);
      close(i[0]!, point.motorCurrent, 1e-10, 1e-10);
    }
  });

  it("refuses a missing or bad parameter set with a named error", () => {
    expect(() => new PackSolver(null as unknown as typeof params, 1)).toThrowError(CalcInputError);
    expect(() => new PackSolver({ ...params, motorResistance: 0 }, 1)).toThrowError("motorResistance must be greater than 0 Ω (got 0 Ω)");
  });
});
