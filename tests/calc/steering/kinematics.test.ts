/**
 * Closed forms of steering while spinning (calc/steering/kinematics.ts): the pulse train's
 * fundamental, the kinematic limit, differential-drive kinematics and the latency error.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { solveOde } from "../../../calc/numerics/ode.ts";
import {
  differentialDriveKinematics,
  differentialDriveWheelSpeeds,
  kinematicRimSpeedDepth,
  kinematicTranslationSpeed,
  latencyDirectionError,
  phaseLeadForLatency,
  pulseTrainFundamental,
} from "../../../calc/steering/kinematics.ts";
import { rpmToRadPerSecond } from "../../../calc/core/units.ts";

const close = (actual: number, expected: number, rtol: number, atol = 0) => {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);
};
const DEG = Math.PI / 180;

describe("the Fourier fundamental of a rectangular pulse train (oppenheim-willsky-signals §3.3)", () => {
  it.each([
    {
      source: "oppenheim-willsky-signals",
      locator: "§3.3, periodic square wave with T = 4T₁ (a₁ = sin(π/2)/π)",
      inputs: { windowWidth: Math.PI },
      expected: { dutyCycle: 0.5, fundamental: 1 / Math.PI },
      rtol: 1e-12,
      note: "an exact closed form",
    },
    {
      source: "oppenheim-willsky-signals",
      locator: "§3.3, a_k = sin(kω₀T₁)/(kπ) with ω₀T₁ = π/4",
      inputs: { windowWidth: Math.PI / 2 },
      expected: { dutyCycle: 0.25, fundamental: Math.sin(Math.PI / 4) / Math.PI },
      rtol: 1e-12,
      note: "sin 45°/π = 0.225079079",
    },
  ])("$source, $locator: duty $expected.dutyCycle, c₁ = $expected.fundamental ($note)", ({ inputs, expected, rtol }) => {
    const f = pulseTrainFundamental(inputs);
    close(f.dutyCycle, expected.dutyCycle, rtol);
    close(f.fundamental, expected.fundamental, rtol);
    close(f.cosineAmplitude, 2 * expected.fundamental, rtol);
  });

  it.each([30, 60, 90, 120, 180, 300])("agrees at w = %i° with (1/2π)∫cos φ dφ over the window, integrated numerically (a second method)", (deg) => {
    const w = deg * DEG;
    // Composite Simpson's rule, 2000 panels: error far below 1e-10 for a cosine.
    const n = 2000;
    const h = w / n;
    let sum = 0;
    for (let i = 0; i <= n; i++) sum += (i === 0 || i === n ? 1 : i % 2 ? 4 : 2) * Math.cos(-w / 2 + i * h);
    close(pulseTrainFundamental({ windowWidth: w }).fundamental, (sum * h) / 3 / (2 * Math.PI), 1e-10);
  });
});

describe("the kinematic limit: δ·sin(w/2)/π along the commanded direction (siegwart-autonomous-robots, oppenheim-willsky-signals)", () => {
  it("gives δ·sin(w/2)/π with the add window only, and twice that with the opposite window", () => {
    close(kinematicTranslationSpeed({ depth: 0.4, windowWidth: Math.PI / 2 }), (0.4 * Math.sin(Math.PI / 4)) / Math.PI, 1e-14);
    close(kinematicTranslationSpeed({ depth: 0.4, windowWidth: Math.PI / 2, oppositeWindow: true }), (0.8 * Math.sin(Math.PI / 4)) / Math.PI, 1e-14);
  });

  /**
   * A second method: the two-wheel differential drive written out in the world frame and integrated
   * over one turn. Body heading θ; wheel 1 at +R, rolling along e_t = (−sin θ, cos θ), wheel 2 at −R.
   * v_body = (v₁ − v₂)/2 along e_t, θ̇ = (v₁ + v₂)/(2R) (siegwart-autonomous-robots); each wheel's rim
   * speed is v₀ plus δ while its own rolling direction lies within ±w/2 of ψ = 0 (and minus δ within the
   * opposite window).
   */
  function integratedMeanSpeed(depth: number, w: number, opposite: boolean): { along: number; across: number } {
    const v0 = 5;
    const R = 0.1;
    const pulse = (rolling: number) => {
      const c = Math.cos(rolling);
      return c > Math.cos(w / 2) ? depth : opposite && -c > Math.cos(w / 2) ? -depth : 0;
    };
    const rhs = (_t: number, y: Float64Array, f: Float64Array) => {
      const th = y[2]!;
      const v1 = v0 + pulse(th + Math.PI / 2);
      const v2 = v0 + pulse(th - Math.PI / 2);
      const u = (v1 - v2) / 2;
      f[0] = -u * Math.sin(th);
      f[1] = u * Math.cos(th);
      f[2] = (v1 + v2) / (2 * R);
    };
    let tTurn = Number.NaN;
    const r = solveOde({
      rhs,
      t0: 0,
      y0: [0, 0, 0],
      tEnd: 10,
      rtol: 1e-11,
      atol: 1e-13,
      maxStep: 0.001,
      maxSteps: 1_000_000,
      events: [{ g: (_t, y) => y[2]! - 2 * Math.PI, direction: 1 }],
      onEvent: (hit) => {
        tTurn = hit.t;
        return "stop";
      },
    });
    return { along: r.y[0]! / tTurn, across: r.y[1]! / tTurn };
  }

  it.each([
    { deg: 90, opposite: true },
    { deg: 150, opposite: true },
    { deg: 180, opposite: true },
  ])("matches the integrated kinematics over one turn for w = $deg° with the opposite window (spin unchanged: exact)", ({ deg, opposite }) => {
    const m = integratedMeanSpeed(0.05, deg * DEG, opposite);
    // The discontinuous pulses are stepped over by events-free integration with a 1 ms cap: 1e-4 relative.
    close(m.along, kinematicTranslationSpeed({ depth: 0.05, windowWidth: deg * DEG, oppositeWindow: opposite }), 1e-4);
    close(m.across, 0, 0, 1e-5);
  });

  it("matches to first order in δ/v₀ with the add window only (the spin rises by δ/(2R) during each pulse)", () => {
    const m = integratedMeanSpeed(0.005, 90 * DEG, false);
    close(m.along, kinematicTranslationSpeed({ depth: 0.005, windowWidth: 90 * DEG }), 2e-3);
  });

  it("turns a duty step into a rim-speed step ΔD·V·Kv·r_w/G with stiff motors (motor-constants-wikipedia)", () => {
    close(kinematicRimSpeedDepth({ dutyStep: 0.1, voltage: 12, kv: 100, wheelRadius: 0.02 }), 2.4, 1e-14);
    close(kinematicRimSpeedDepth({ dutyStep: 0.1, voltage: 12, kv: 100, wheelRadius: 0.02, gearRatio: 2 }), 1.2, 1e-14);
  });
});

describe("differential-drive kinematics (siegwart-autonomous-robots ch. 3)", () => {
  it.each([
    {
      source: "Siegwart, Nourbakhsh & Scaramuzza, Introduction to Autonomous Mobile Robots, differential-drive kinematics, worked by hand",
      locator: "turn in place: left +0.381π, right −0.381π m/s, track 0.762 m",
      inputs: { leftSpeed: 0.381 * Math.PI, rightSpeed: -0.381 * Math.PI, track: 0.762 },
      expected: { speed: 0, turnRate: -Math.PI },
      rtol: 1e-12,
    },
    {
      source: "Siegwart, Nourbakhsh & Scaramuzza, differential-drive kinematics, worked by hand",
      locator: "straight: 3 and 3 m/s",
      inputs: { leftSpeed: 3, rightSpeed: 3, track: 0.762 },
      expected: { speed: 3, turnRate: 0 },
      rtol: 1e-12,
    },
    {
      source: "computed from v = (v_R + v_L)/2, ω = (v_R − v_L)/b (siegwart-autonomous-robots)",
      locator: "v_R = 2, v_L = 1, b = 0.25",
      inputs: { leftSpeed: 1, rightSpeed: 2, track: 0.25 },
      expected: { speed: 1.5, turnRate: 4 },
      rtol: 1e-12,
    },
  ])("$source, $locator", ({ inputs, expected, rtol }) => {
    const m = differentialDriveKinematics(inputs);
    close(m.speed, expected.speed, rtol, 1e-15);
    close(m.turnRate, expected.turnRate, rtol, 1e-15);
  });

  it("gives the turn radius v/ω, and null when driving straight", () => {
    close(differentialDriveKinematics({ leftSpeed: 1, rightSpeed: 2, track: 0.25 }).turnRadius!, 0.375, 1e-12);
    expect(differentialDriveKinematics({ leftSpeed: 3, rightSpeed: 3, track: 0.762 }).turnRadius).toBeNull();
  });

  it("inverts: ω = π on a 0.762 m track needs ∓0.381π m/s (differential-drive kinematics inverted, worked by hand), and round-trips", () => {
    const w = differentialDriveWheelSpeeds({ speed: 0, turnRate: Math.PI, track: 0.762 });
    close(w.left, -0.381 * Math.PI, 1e-12);
    close(w.right, 0.381 * Math.PI, 1e-12);
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 10, noNaN: true }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        (v, om, b) => {
          const s = differentialDriveWheelSpeeds({ speed: v, turnRate: om, track: b });
          const back = differentialDriveKinematics({ leftSpeed: s.left, rightSpeed: s.right, track: b });
          close(back.speed, v, 1e-12, 1e-12);
          close(back.turnRate, om, 1e-9, 1e-9);
        },
      ),
    );
  });
});

describe("direction error from latency and the loop's hold, and the lead that cancels it", () => {
  it("is Ω·L for a fast loop: 0.5 ms at 3000 rpm is 0.157 rad (openstax-up1-rotational-kinematics, θ = ωt)", () => {
    close(latencyDirectionError({ spinSpeed: rpmToRadPerSecond(3000), latency: 0.0005, loopRate: 1e9 }), 0.15707963, 2e-6);
  });

  it("adds half a loop period of hold (franklin-powell-workman-digital-control): 3000 rpm, 2 kHz → +0.0785 rad", () => {
    const om = rpmToRadPerSecond(3000);
    close(latencyDirectionError({ spinSpeed: om, latency: 0.0005, loopRate: 2000 }), om * (0.0005 + 0.00025), 1e-14);
  });

  it("is cancelled exactly by the lead it names", () => {
    const p = { spinSpeed: 300, latency: 0.0007, loopRate: 1500 };
    close(latencyDirectionError({ ...p, phaseLead: phaseLeadForLatency(p) }), 0, 0, 1e-15);
  });
});

describe("inputs", () => {
  it.each([
    { fn: () => pulseTrainFundamental({ windowWidth: 0 }), param: "windowWidth" },
    { fn: () => kinematicTranslationSpeed({ depth: 1, windowWidth: 4, oppositeWindow: true }), param: "windowWidth" },
    { fn: () => kinematicTranslationSpeed({ depth: -1, windowWidth: 1 }), param: "depth" },
    { fn: () => differentialDriveKinematics({ leftSpeed: 1, rightSpeed: 1, track: 0 }), param: "track" },
    { fn: () => differentialDriveKinematics({ leftSpeed: Number.MAX_VALUE, rightSpeed: -Number.MAX_VALUE, track: 1e-300 }), param: "track" },
    { fn: () => latencyDirectionError({ spinSpeed: Number.MAX_VALUE, latency: 10, loopRate: 50 }), param: "spinSpeed" },
    { fn: () => latencyDirectionError({ spinSpeed: 1, latency: -1, loopRate: 50 }), param: "latency" },
    { fn: () => pulseTrainFundamental(null as unknown as { windowWidth: number }), param: "input" },
    { fn: () => differentialDriveKinematics(undefined as unknown as { leftSpeed: number; rightSpeed: number; track: number }), param: "input" },
  ])("refuses a bad input with a named CalcInputError ($param)", ({ fn, param }) => {
    try {
      fn();
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CalcInputError);
      expect((e as CalcInputError).param).toBe(param);
    }
  });

  it("returns only finite numbers or a CalcInputError over the whole double range (fast-check)", () => {
    const any = fc.oneof(fc.double(), fc.constantFrom(0, -0, Number.MIN_VALUE, Number.MAX_VALUE, -Number.MAX_VALUE, 1e300));
    fc.assert(
      fc.property(any, any, any, fc.boolean(), (a, b, c, opp) => {
        for (const fn of [
          () => [kinematicTranslationSpeed({ depth: a, windowWidth: b, oppositeWindow: opp })],
          () => Object.values(differentialDriveKinematics({ leftSpeed: a, rightSpeed: b, track: c })).filter((v) => v !== null) as number[],
          () => Object.values(differentialDriveWheelSpeeds({ speed: a, turnRate: b, track: c })),
          () => [latencyDirectionError({ spinSpeed: a, latency: b, loopRate: c })],
          () => [kinematicRimSpeedDepth({ dutyStep: a, voltage: b, kv: c, wheelRadius: 0.02 })],
        ]) {
          try {
            for (const v of fn()) expect(Number.isFinite(v)).toBe(true);
          } catch (e) {
            expect(e).toBeInstanceOf(CalcInputError);
          }
        }
      }),
      { numRuns: 500 },
    );
  });
});
