/**
 * The steering estimate: the closed forms gathered for the chapter's calculator (calc/steering/estimate.ts).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";
import { SKID_LIFT_MARGIN, steeringEstimate, steeringEstimateInputs } from "../../../calc/steering/estimate.ts";
import { DEMO_STEERING_SPINNER } from "../../../calc/steering/inputs.ts";
import { simulateSteering } from "../../../calc/steering/simulate.ts";

const close = (actual: number, expected: number, rtol: number) => {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));
};
const RPM = rpmToRadPerSecond(1);
const DEG = Math.PI / 180;
const demo = { ...DEMO_STEERING_SPINNER };

describe("the steering estimate against the closed forms worked by hand", () => {
  it.each([
    {
      source: "oppenheim-willsky-signals",
      locator: "§3.3, periodic square wave, a₁ = sin(ω₀T₁)/π; siegwart-autonomous-robots ch. 3, v = (v_R + v_L)/2",
      inputs: demo,
      // δ = 0.25 · 4 · 4.1 V · 1100 rpm/V · 0.018 m = 8.50115 m/s; v̄ = 2 · δ · sin 60° / π
      expected: (2 * (0.25 * 16.4 * 1100 * RPM * 0.018) * Math.sin(60 * DEG)) / Math.PI,
      rtol: 1e-12,
      note: "120° window with the opposite window: 4.687 m/s",
    },
    {
      source: "oppenheim-willsky-signals",
      locator: "§3.3, a 50 % duty square wave (w = π): c₁ = 1/π",
      inputs: { ...demo, windowWidth: Math.PI, oppositeWindow: 0 },
      expected: (0.25 * 16.4 * 1100 * RPM * 0.018) / Math.PI,
      rtol: 1e-12,
      note: "add window only, half a turn wide",
    },
  ])("$source, $locator: translation speed ($note)", ({ inputs, expected, rtol }) => {
    close(steeringEstimate(inputs).translationSpeed, expected, rtol);
  });

  it("gives the direction error Ω(L + 1/(2f)) = 314.16 rad/s · (0.3 ms + 0.25 ms) = 0.17279 rad (franklin-powell-workman-digital-control: the hold delays by half a period) and a lead that cancels it", () => {
    const r = steeringEstimate(demo);
    close(r.directionError, 3000 * RPM * 0.00055, 1e-12);
    close(r.leadToCancel, r.directionError, 1e-12);
    expect(Math.abs(steeringEstimate({ ...demo, phaseLead: r.leadToCancel }).directionError)).toBeLessThan(1e-12);
  });

  it("gives the wheel's gyroscopic moment (J_w + J_m)(R/r_w)Ω² = 7e-6 · (0.07/0.018) · 314.16² = 2.6867 N·m (meriam-kraige-dynamics, steady precession)", () => {
    close(steeringEstimate(demo).gyroscopicMoment, 7e-6 * (0.07 / 0.018) * (3000 * RPM) ** 2, 1e-12);
  });

  it("has no skid lift speed with two wheels, and with one wheel lifts the skid near 1857 rpm, so the demo at 3000 rpm fails (meriam-kraige-dynamics)", () => {
    expect(steeringEstimate(demo).skidLiftSpeed).toBeNull();
    const one = steeringEstimate({ ...demo, wheelCount: 1 });
    close(one.skidLiftSpeed ?? 0, Math.sqrt((1.5 * 9.80665 * 0.018) / 7e-6), 1e-12);
    expect(one.status).toBe("fails");
    expect(one.reason).toMatch(/skid lifts/);
  });

  it("judges the direction error against the tolerance: within holds, up to twice marginal, beyond fails", () => {
    expect(steeringEstimate(demo).status).toBe("holds");
    expect(steeringEstimate({ ...demo, latency: 0.0008 }).status).toBe("marginal");
    expect(steeringEstimate({ ...demo, latency: 0.002 }).status).toBe("fails");
  });

  it(`calls a one-wheel robot marginal from ${SKID_LIFT_MARGIN * 100} % of the skid lift speed`, () => {
    const r = steeringEstimate({ ...demo, wheelCount: 1, spinSpeed: 1600 * RPM, phaseLead: 0.1 });
    expect(r.status).toBe("marginal");
  });

  it("refuses a window wider than half a turn with the opposite window on, naming the window width", () => {
    expect(() => steeringEstimate({ ...demo, windowWidth: 200 * DEG })).toThrow(CalcInputError);
    try {
      steeringEstimate({ ...demo, windowWidth: 200 * DEG });
    } catch (e) {
      expect((e as CalcInputError).param).toBe("windowWidth");
    }
  });

  it("is an upper limit: the simulation of the demo robot translates slower than the kinematic speed (second method)", () => {
    const sim = simulateSteering({ ...demo, duration: 0.6 });
    const estimate = steeringEstimate(demo);
    expect(sim.kinematicLimitSpeed).toBeGreaterThan(0);
    expect(sim.translationSpeed).toBeLessThan(estimate.translationSpeed);
  });

  it("returns only finite numbers or a CalcInputError for any double in any field", () => {
    const names = Object.keys(steeringEstimateInputs) as (keyof typeof steeringEstimateInputs)[];
    fc.assert(
      fc.property(fc.constantFrom(...names), fc.double({ noNaN: false }), (name, value) => {
        try {
          const r = steeringEstimate({ ...demo, [name]: value });
          for (const v of Object.values(r)) if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(CalcInputError);
        }
      }),
      { numRuns: 500 },
    );
  });
});
