/**
 * Edges of the general integrator (calc/numerics/ode.ts) up to the main loop: the tolerance lists and
 * their refusals, the integrator's size, the starting step of hairer-norsett-wanner-1 §II.4 in its
 * special cases, the stage times of the Dormand–Prince tableau (dormand-prince-1980), the step-size
 * control after a rejection, the dense output read from a step callback, and time events that are
 * due at once or leave a gap of 16 ulp. Found by mutation testing (StrykerJS).
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { DormandPrince45, type OdeOptions, type OdeRhs, OdeNonFiniteError } from "../../../calc/numerics/ode.ts";
import { decay } from "../../support/ode-problems.ts";

/** Runs `fn`, which must throw a CalcInputError, and returns its fields. */
const refusal = (fn: () => unknown) => {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(CalcInputError);
    const c = e as CalcInputError;
    return { param: c.param, value: c.value, expected: c.expected, unit: c.unit, message: c.message };
  }
  throw new Error("no refusal");
};

/** Solves and records every accepted step's length [tPrev, t]. */
const stepsOf = (n: number, rhs: OdeRhs, t0: number, y0: number[], tEnd: number, opts: OdeOptions = {}) => {
  const lengths: number[] = [];
  const r = new DormandPrince45(n).solve(rhs, t0, y0, tEnd, {
    ...opts,
    onStep: (s) => {
      lengths.push(s.t - s.tPrev);
      return undefined;
    },
  });
  return { r, lengths };
};

describe("tolerances: a number or a list of one per component", () => {
  const solve2 = (opts: OdeOptions) =>
    new DormandPrince45(2).solve(
      (_t, y, f) => {
        f[0] = -y[0]!;
        f[1] = -2 * y[1]!;
      },
      0,
      [1, 1],
      1,
      opts,
    );

  it("refuses a list of the wrong length, naming the tolerance, the length it got and the length it needs", () => {
    expect(refusal(() => solve2({ atol: [1e-9] }))).toEqual({
      param: "atol",
      value: 1,
      expected: "a number or a list of 2",
      unit: "",
      message: "atol must be a number or a list of 2 (got 1)",
    });
    expect(refusal(() => solve2({ rtol: [1e-6, 1e-6, 1e-6] }))).toMatchObject({ param: "rtol", value: 3, expected: "a number or a list of 2" });
  });

  it("refuses a tolerance that is neither a number nor a list, reporting the value itself", () => {
    expect(refusal(() => solve2({ atol: true as unknown as number }))).toMatchObject({
      param: "atol",
      value: true,
      expected: "a number or a list of 2",
      unit: "",
    });
    expect(refusal(() => solve2({ rtol: "1e-6" as unknown as number }))).toMatchObject({
      param: "rtol",
      value: "1e-6",
      expected: "a number or a list of 2",
      unit: "",
    });
  });

  it("names the component of a list that is out of range", () => {
    expect(refusal(() => solve2({ rtol: [1e-6, 2] }))).toMatchObject({ param: "rtol[1]", value: 2, expected: "at least 1e-14 and at most 1", unit: "" });
    expect(refusal(() => solve2({ atol: [1e-9, -1] }))).toMatchObject({ param: "atol[1]", value: -1, unit: "" });
    // Infinity is allowed for atol only (it leaves a component out of the error norm), never for rtol.
    expect(refusal(() => solve2({ rtol: [1e-6, Number.POSITIVE_INFINITY] }))).toMatchObject({
      param: "rtol[1]",
      value: Number.POSITIVE_INFINITY,
      expected: "a finite number",
    });
    expect(refusal(() => solve2({ rtol: Number.POSITIVE_INFINITY }))).toMatchObject({
      param: "rtol",
      value: Number.POSITIVE_INFINITY,
      expected: "a finite number",
    });
    expect(refusal(() => solve2({ rtol: 2 }))).toMatchObject({ param: "rtol", value: 2, expected: "at least 1e-14 and at most 1" });
  });

  it("gives the same run for a list of equal tolerances as for the number", () => {
    const scalar = solve2({ rtol: 1e-7, atol: 1e-9 });
    const list = solve2({ rtol: [1e-7, 1e-7], atol: [1e-9, 1e-9] });
    expect(list).toEqual(scalar);
    // y1 = e^−1, y2 = e^−2 (closed form of y' = −y and y' = −2y)
    expect(Math.abs(scalar.y[0]! - Math.exp(-1))).toBeLessThan(1e-6);
    expect(Math.abs(scalar.y[1]! - Math.exp(-2))).toBeLessThan(1e-6);
  });

  it("leaves a component with atol = Infinity out of the norm; atol = Infinity everywhere is refused with its own words", () => {
    const one = new DormandPrince45(1).solve(decay, 0, [1], 1, { rtol: 1e-7, atol: 1e-9 });
    // The second component grows without bound control: it does not change the steps of the first.
    const both = new DormandPrince45(2).solve(
      (_t, y, f) => {
        f[0] = -y[0]!;
        f[1] = 50 * Math.cos(50 * y[1]!);
      },
      0,
      [1, 0],
      1,
      { rtol: 1e-7, atol: [1e-9, Number.POSITIVE_INFINITY] },
    );
    expect(both.steps).toBe(one.steps);
    expect(both.y[0]).toBe(one.y[0]);
    const all = { param: "atol", value: Number.POSITIVE_INFINITY, expected: "finite for at least one component", unit: "" };
    expect(refusal(() => solve2({ atol: Number.POSITIVE_INFINITY }))).toMatchObject(all);
    expect(refusal(() => solve2({ atol: [Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY] }))).toMatchObject(all);
  });
});

describe("the integrator's size and the other refusals, with their words", () => {
  it("refuses a size that is not a whole number from 1 to 100 000", () => {
    expect(refusal(() => new DormandPrince45(2.5))).toEqual({
      param: "dimension",
      value: 2.5,
      expected: "a whole number",
      unit: "",
      message: "dimension must be a whole number (got 2.5)",
    });
    expect(refusal(() => new DormandPrince45(0))).toMatchObject({ param: "dimension", value: 0, expected: "at least 1 and at most 100000", unit: "" });
  });

  it("refuses a state that is not a list, reporting it, and a wrong-length list by its length", () => {
    const ode = new DormandPrince45(2);
    expect(refusal(() => ode.solve(decay, 0, null as unknown as number[], 1))).toEqual({
      param: "y0",
      value: null,
      expected: "a list of 2 numbers",
      unit: "",
      message: "y0 must be a list of 2 numbers (got null)",
    });
    expect(refusal(() => ode.solve(decay, 0, 3 as unknown as number[], 1))).toMatchObject({ param: "y0", value: 3, expected: "a list of 2 numbers" });
    expect(refusal(() => ode.solve(decay, 0, [1, 2, 3], 1))).toMatchObject({ param: "y0", value: 3, expected: "a list of 2 numbers", unit: "" });
  });

  it("names tEnd, rhs, maxStep, maxSteps, initialStep, eventTolerance and outputTimes with their words", () => {
    const ode = new DormandPrince45(1);
    expect(refusal(() => ode.solve(decay, 2, [1], 2))).toEqual({
      param: "tEnd",
      value: 2,
      expected: "greater than t0 (2)",
      unit: "",
      message: "tEnd must be greater than t0 (2) (got 2)",
    });
    expect(refusal(() => ode.solve(undefined as unknown as OdeRhs, 0, [1], 1))).toMatchObject({
      param: "rhs",
      value: undefined,
      expected: "a function (t, y, dydt) => void",
      unit: "",
    });
    expect(refusal(() => ode.solve(decay, 0, [1], 1, { maxStep: 0 }))).toMatchObject({ param: "maxStep", value: 0, expected: "greater than 0", unit: "" });
    expect(refusal(() => ode.solve(decay, 0, [1], 1, { maxSteps: 0 }))).toMatchObject({
      param: "maxSteps",
      value: 0,
      expected: "at least 1 and at most 1000000000",
      unit: "",
    });
    expect(refusal(() => ode.solve(decay, 0, [1], 1, { maxSteps: 2.5 }))).toMatchObject({
      param: "maxSteps",
      value: 2.5,
      expected: "a whole number",
      unit: "",
    });
    expect(refusal(() => ode.solve(decay, 0, [1], 1, { initialStep: -1 }))).toMatchObject({
      param: "initialStep",
      value: -1,
      expected: "greater than 0",
      unit: "",
    });
    expect(refusal(() => ode.solve(decay, 0, [1], 1, { eventTolerance: 0 }))).toMatchObject({
      param: "eventTolerance",
      value: 0,
      expected: "greater than 0",
      unit: "",
    });
    expect(refusal(() => ode.solve(decay, 0, [1], 1, { outputTimes: [0.5, 2] }))).toMatchObject({
      param: "outputTimes[1]",
      value: 2,
      expected: "at least 0 and at most 1",
      unit: "",
    });
    expect(refusal(() => ode.solve(decay, 0, [1], 1, { outputTimes: [0.5, 0.25] }))).toMatchObject({
      param: "outputTimes[1]",
      value: 0.25,
      expected: "at least the previous time (0.5)",
      unit: "",
    });
  });

  it("refuses an event function that is not finite at the start, naming the event, its value and the time", () => {
    const ode = new DormandPrince45(1);
    try {
      ode.solve(decay, 0.5, [1], 1, { events: [{ g: () => 1 }, { g: () => Number.NaN }] });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(OdeNonFiniteError);
      const x = e as OdeNonFiniteError;
      expect([x.param, x.quantity, x.index, x.t, x.value]).toEqual(["events[1]", "event", 1, 0.5, Number.NaN]);
      expect(x.message).toBe("the event 1 is not a finite number (NaN) at t = 0.5");
    }
  });
});

describe("the starting step (hairer-norsett-wanner-1 §II.4, steps a–f; h1 exponent 1/5 of hairer-dopri5-code)", () => {
  // Notation of §II.4: sc_i = atol + rtol·|y0_i|, d0 = ‖y0‖, d1 = ‖f(t0, y0)‖, h0 = 0.01·d0/d1 (1e-6 when d0 or
  // d1 < 1e-5), d2 = ‖f(t0 + h0, y0 + h0·f0) − f0‖/h0, h1 = (0.01/max(d1, d2))^(1/5) (max(1e-6, h0·1e-3) when
  // max(d1, d2) ≤ 1e-15), first step = min(100·h0, h1, maxStep). Each case below is accepted at once.

  it("for y' = y² + t, y(0) = 1 at rtol = atol = 1e-3 is (0.01/1505)^(1/5) ≈ 0.0921", () => {
    // sc = 2e-3; d0 = d1 = 1/2e-3 = 500; h0 = 0.01·500/500 = 0.01; y0 + h0·f0 = 1.01, f there = 1.01² + 0.01 = 1.0301;
    // d2 = (0.0301/2e-3)/0.01 = 1505; h1 = (0.01/1505)^(1/5); 100·h0 = 1 does not bind.
    const { r, lengths } = stepsOf(
      1,
      (t, y, f) => {
        f[0] = y[0]! * y[0]! + t;
      },
      0,
      [1],
      0.5,
      { rtol: 1e-3, atol: 1e-3 },
    );
    expect(r.rejected).toBe(0);
    expect(lengths[0]! / (0.01 / 1505) ** 0.2 - 1).toBeCloseTo(0, 12);
  });

  it("is 100·h0 when d0 = d1 = 1e-5 exactly (the 1e-6 fallback is for strictly smaller norms)", () => {
    // y' = −y, y0 = 1e-5, atol = 1, rtol = 1e-14: sc = 1 (to the last bit), d0 = d1 = 1e-5, so h0 = 0.01·1 = 0.01;
    // d2 = (0.01·1e-5)/0.01 = 1e-5, h1 = (0.01/1e-5)^(1/5) = 1000^(1/5) ≈ 3.98; first step min(100·0.01, 3.98, 10) = 1.
    const { r, lengths } = stepsOf(1, decay, 0, [1e-5], 10, { rtol: 1e-14, atol: 1 });
    expect(r.rejected).toBe(0);
    expect(lengths[0]).toBeCloseTo(1, 14);
  });

  it("is 100·h0 with h0 = 0.01·d0/d1 when that binds (y' = −2y, y0 = 1e-5, atol = 1)", () => {
    // d0 = 1e-5, d1 = 2e-5: h0 = 0.01·(1e-5/2e-5) = 0.005; d2 = 4e-5, h1 = (0.01/4e-5)^(1/5) = 250^(1/5) ≈ 3.02;
    // first step min(100·0.005, 3.02, 10) = 0.5.
    const { lengths } = stepsOf(
      1,
      (_t, y, f) => {
        f[0] = -2 * y[0]!;
      },
      0,
      [1e-5],
      10,
      { rtol: 1e-14, atol: 1 },
    );
    expect(lengths[0]).toBeCloseTo(0.5, 14);
  });

  it("is max(1e-6, h0·1e-3) = 1e-6 when max(d1, d2) is exactly 1e-15 (y' = 1e-15 at atol = 1)", () => {
    // y0 = 0: d0 = 0 < 1e-5, so h0 = 1e-6; d1 = 1e-15/1 = 1e-15, d2 = 0 (f is constant): max = 1e-15 ≤ 1e-15,
    // so h1 = max(1e-6, 1e-9) = 1e-6; first step min(1e-4, 1e-6, 1) = 1e-6.
    const { lengths } = stepsOf(
      1,
      (_t, _y, f) => {
        f[0] = 1e-15;
      },
      0,
      [0],
      1,
      { rtol: 1e-14, atol: 1 },
    );
    expect(lengths[0]).toBe(1e-6);
  });

  it("is 1e-6 for y' = 0 (nothing moves, so d1 = d2 = 0)", () => {
    const { r, lengths } = stepsOf(
      1,
      (_t, _y, f) => {
        f[0] = 0;
      },
      0,
      [1],
      1,
    );
    expect(lengths[0]).toBe(1e-6);
    expect(r.y[0]).toBe(1);
    expect(r.status).toBe("done");
  });

  it("is h0·1e-3 when the norm of f is infinite (atol = 0 with y0 = 0: sc = 0), and grows tenfold after each exact step", () => {
    // y' = 1, y0 = 0, atol = 0: sc = 0 at the start, so d0 = 0 (0/0 taken as 0) and d1 = ∞ (1/0); h0 = min(1e-6, maxStep);
    // max(d1, d2) = ∞ is not finite: h1 = h0·1e-3; first step min(100·h0, h0·1e-3, maxStep) = h0·1e-3.
    const run = (maxStep?: number) =>
      stepsOf(
        1,
        (_t, _y, f) => {
          f[0] = 1;
        },
        0,
        [0],
        1,
        { rtol: 1e-6, atol: 0, ...(maxStep === undefined ? {} : { maxStep }) },
      );
    const free = run();
    expect(free.lengths[0]).toBeCloseTo(1e-9, 22);
    // y' = 1 is integrated exactly, err is about 0 and the step grows by the largest factor, 10.
    expect(free.lengths[1]! / free.lengths[0]!).toBeCloseTo(10, 9);
    expect(free.lengths[2]! / free.lengths[1]!).toBeCloseTo(10, 9);
    expect(free.r.y[0]).toBeCloseTo(1, 12);
    // maxStep = 1e-7 cuts h0 to 1e-7 before the trial evaluation: first step 1e-10.
    expect(run(1e-7).lengths[0]).toBeCloseTo(1e-10, 23);
  });

  it("ignores a component left out of the norm even where its derivative is infinite at the probe point", () => {
    // y0 = (0, 0): h0 = 1e-6 and f is probed at t = 1e-6, where the second component's f = 1/(t − 1e-6) is infinite.
    // Only the first (f = 1, atol = 1e-9) counts: d1 = 1e9, d2 = 0, h1 = (0.01/1e9)^(1/5) ≈ 0.0063; first step 100·h0 = 1e-4.
    const { lengths } = stepsOf(
      2,
      (t, _y, f) => {
        f[0] = 1;
        f[1] = 1 / (t - 1e-6);
      },
      0,
      [0, 0],
      1e-3,
      { atol: [1e-9, Number.POSITIVE_INFINITY] },
    );
    expect(lengths[0]).toBeCloseTo(1e-4, 17);
  });
});

describe("steps, counts and stage times", () => {
  it("counts 2 + 6 per trial step evaluations (one at the start, one for the starting step, FSAL reuse)", () => {
    const r = new DormandPrince45(1).solve(decay, 0, [1], 10, { rtol: 1e-8, atol: 1e-10 });
    expect(r.steps).toBe(r.accepted + r.rejected);
    expect(r.evaluations).toBe(2 + 6 * r.steps);
    const given = new DormandPrince45(1).solve(decay, 0, [1], 10, { rtol: 1e-8, atol: 1e-10, initialStep: 0.01 });
    expect(given.evaluations).toBe(1 + 6 * given.steps);
  });

  it("integrates y' = 5t⁴ + cos t exactly to the tolerance from t0 = 1 (the stages sit at t + c_i·h of dormand-prince-1980)", () => {
    // y(t) = t⁵ + sin t + C; y(1) = 1 + sin 1, so y(3) = 243 + sin 3.
    const r = new DormandPrince45(1).solve(
      (t, _y, f) => {
        f[0] = 5 * t ** 4 + Math.cos(t);
      },
      1,
      [1 + Math.sin(1)],
      3,
      { rtol: 1e-12, atol: 1e-12, maxStep: 0.5 },
    );
    expect(Math.abs(r.y[0]! - (243 + Math.sin(3)))).toBeLessThan(1e-9);
  });

  it("stretches the last step to tEnd when it is within 1 % of it (t + 1.01·h ≥ tEnd, equality included)", () => {
    // initialStep 1, tEnd 1.01: 0 + 1.01·1 = 1.01 exactly, so the only step is 1.01 long.
    const { r, lengths } = stepsOf(
      1,
      (_t, _y, f) => {
        f[0] = 1;
      },
      0,
      [0],
      1.01,
      { initialStep: 1 },
    );
    expect(lengths).toEqual([1.01]);
    expect(r.accepted).toBe(1);
    expect(r.y[0]).toBeCloseTo(1.01, 14);
  });

  it("does not grow the step right after a rejection (hairer-dopri5-code), and grows it again afterwards", () => {
    // initialStep 1 on y' = −y at rtol = atol = 1e-10 is far too large: rejected, shrunk, then accepted.
    const { r, lengths } = stepsOf(1, decay, 0, [1], 2, { rtol: 1e-10, atol: 1e-10, initialStep: 1 });
    expect(r.rejected).toBeGreaterThan(0);
    // The first accepted step follows rejections; the next one keeps its size (factor capped at 1) ...
    expect(lengths[1]).toBe(lengths[0]);
    // ... and the one after that may grow again.
    expect(lengths[2]!).toBeGreaterThan(lengths[1]!);
    expect(Math.abs(r.y[0]! - Math.exp(-2))).toBeLessThan(1e-9);
  });
});

describe("dense output read from a step callback (hairer-norsett-wanner-1 §II.6)", () => {
  it("interpolates the harmonic oscillator inside every step to about the tolerance, component by component", () => {
    let worst = 0;
    new DormandPrince45(2).solve(
      (_t, y, f) => {
        f[0] = y[1]!;
        f[1] = -y[0]!;
      },
      0,
      [1, 0],
      6,
      {
        rtol: 1e-9,
        atol: 1e-9,
        onStep: (s) => {
          for (const q of [0.25, 0.5, 0.75]) {
            const tm = s.tPrev + q * (s.t - s.tPrev);
            worst = Math.max(worst, Math.abs(s.interpolateComponent(1, tm) + Math.sin(tm)), Math.abs(s.interpolateComponent(0, tm) - Math.cos(tm)));
          }
          return undefined;
        },
      },
    );
    // x = cos t, v = −sin t; the 4th-order extension keeps the error near the step tolerance.
    expect(worst).toBeLessThan(1e-7);
    expect(worst).toBeGreaterThan(0);
  });
});

describe("time events due at once", () => {
  it("fires a time event due at the start before any step: a restart there takes the changed state and a fresh f", () => {
    let fired = 0;
    const ode = new DormandPrince45(1);
    const at0 = new Float64Array(1);
    const r = ode.solve(decay, 0, [1], 1, {
      rtol: 1e-9,
      atol: 1e-12,
      nextTimeEvent: () => (fired === 0 ? 0 : Number.POSITIVE_INFINITY),
      onTimeEvent: (_t, y) => {
        fired++;
        ode.interpolate(0, at0); // before any step the dense output is the state itself
        y[0] = 5;
        return undefined; // default: restart
      },
    });
    expect(at0[0]).toBe(1);
    expect(r.status).toBe("done");
    expect(r.timeEvents).toBe(1);
    // y = 5·e^−t: y(1) = 5/e
    expect(Math.abs(r.y[0]! - 5 * Math.exp(-1))).toBeLessThan(1e-8);
    // The time event counts as a step; evaluations: start, starting step, restart, then 6 per trial.
    expect(r.steps).toBe(r.accepted + r.rejected + 1);
    expect(r.evaluations).toBe(3 + 6 * (r.accepted + r.rejected));
  });

  it("stops at the start when a time event due there answers stop", () => {
    const r = new DormandPrince45(1).solve(decay, 0, [1], 1, {
      nextTimeEvent: () => 0,
      onTimeEvent: () => "stop",
    });
    expect(r).toMatchObject({ status: "stopped", t: 0, steps: 1, accepted: 0, timeEvents: 1, evaluations: 2 });
    expect(r.y[0]).toBe(1);
  });

  it("continues without a fresh f when a time event due at the start answers continue", () => {
    let fired = 0;
    const r = new DormandPrince45(1).solve(decay, 0, [1], 1, {
      nextTimeEvent: () => (fired === 0 ? 0 : Number.POSITIVE_INFINITY),
      onTimeEvent: () => {
        fired++;
        return "continue";
      },
    });
    expect(r.evaluations).toBe(2 + 6 * (r.steps - 1));
    expect(r.timeEvents).toBe(1);
  });

  it("fires at once a time event within 16 ulp of the time scale max(|t|, |tEnd|) after t", () => {
    // t0 = 0, tEnd = 4: the margin is 16·2^−52·4 = 2^−46; a tick at 2^−47 is due at once, not a step of 2^−47.
    let fired = 0;
    const r = new DormandPrince45(1).solve(decay, 0, [1], 4, {
      nextTimeEvent: () => (fired === 0 ? 2 ** -47 : Number.POSITIVE_INFINITY),
      onTimeEvent: () => {
        fired++;
        return "continue";
      },
    });
    expect(r.status).toBe("done");
    expect(r.timeEvents).toBe(1);
    expect(Math.abs(r.y[0]! - Math.exp(-4))).toBeLessThan(1e-6);
  });

  it("ends with step-too-small when the gap to tEnd is exactly 16 ulp of the time scale", () => {
    // tEnd = 2: 16·2^−52·2 = 2^−47. A tick at 2 − 2^−47 is landed on; the remaining step of 2^−47 is too small.
    let fired = 0;
    const r = new DormandPrince45(1).solve(decay, 0, [1], 2, {
      nextTimeEvent: () => (fired === 0 ? 2 - 2 ** -47 : Number.POSITIVE_INFINITY),
      onTimeEvent: () => {
        fired++;
        return "continue";
      },
    });
    expect(r.status).toBe("step-too-small");
    expect(r.t).toBe(2 - 2 ** -47);
    expect(r.timeEvents).toBe(1);
  });
});

describe("non-finite values after a restart", () => {
  it("refuses a state a time event made non-finite, naming the state component", () => {
    try {
      new DormandPrince45(2).solve(
        (_t, y, f) => {
          f[0] = -y[0]!;
          f[1] = 0;
        },
        0,
        [1, 1],
        1,
        {
          nextTimeEvent: (t) => (t < 0.5 ? 0.5 : Number.POSITIVE_INFINITY),
          onTimeEvent: (_t, y) => {
            y[1] = Number.POSITIVE_INFINITY;
            return "restart";
          },
        },
      );
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(OdeNonFiniteError);
      const x = e as OdeNonFiniteError;
      expect([x.quantity, x.index, x.t, x.value, x.param]).toEqual(["state", 1, 0.5, Number.POSITIVE_INFINITY, "rhs"]);
    }
  });

  it("names no component (index −1, NaN) when the steps shrink to nothing against a NaN derivative", () => {
    try {
      new DormandPrince45(1).solve(
        (t, _y, f) => {
          f[0] = Math.sqrt(1 - t);
        },
        0,
        [0],
        2,
      );
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(OdeNonFiniteError);
      const x = e as OdeNonFiniteError;
      expect([x.quantity, x.index, x.value, x.param]).toEqual(["derivative", -1, Number.NaN, "rhs"]);
      expect(Math.abs(x.t - 1)).toBeLessThan(1e-12);
    }
  });
});

describe("more edges of the error norm, the span and the restarts", () => {
  it("takes exactly the steps of one copy for a system of two identical copies (the RMS norm divides by n)", () => {
    const one = new DormandPrince45(1).solve(decay, 0, [1], 5, { rtol: 1e-8, atol: 1e-10 });
    const two = new DormandPrince45(2).solve(
      (_t, y, f) => {
        f[0] = -y[0]!;
        f[1] = -y[1]!;
      },
      0,
      [1, 1],
      5,
      { rtol: 1e-8, atol: 1e-10 },
    );
    expect([two.accepted, two.rejected, two.y[0], two.y[1]]).toEqual([one.accepted, one.rejected, one.y[0], one.y[0]]);
  });

  it("accepts a component resting at 0 under a purely relative tolerance (atol = 0: 0/0 counts as no error)", () => {
    const r = new DormandPrince45(1).solve(
      (_t, _y, f) => {
        f[0] = 0;
      },
      0,
      [0],
      1,
      { atol: 0 },
    );
    expect(r).toMatchObject({ status: "done", t: 1, rejected: 0 });
    expect(r.y[0]).toBe(0);
  });

  it("never accepts a step whose state overflows: y' = 1e308 ends in an OdeNonFiniteError at t ≈ Number.MAX_VALUE/1e308", () => {
    // y = 1e308·t reaches the largest double, 1.7976931348623157e308, at t ≈ 1.7977.
    try {
      new DormandPrince45(1).solve(
        (_t, _y, f) => {
          f[0] = 1e308;
        },
        0,
        [0],
        10,
      );
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(OdeNonFiniteError);
      expect(Math.abs((e as OdeNonFiniteError).t - 1.7976931348623157)).toBeLessThan(1e-9);
    }
  });

  it("ends at once with step-too-small, not an error, over a span of 4 ulp", () => {
    const r = new DormandPrince45(1).solve(
      (_t, _y, f) => {
        f[0] = 1;
      },
      1,
      [0],
      1 + 2 ** -50,
    );
    expect(r).toMatchObject({ status: "step-too-small", t: 1, steps: 0, evaluations: 2 });
  });

  it("integrates from a negative start (y' = 5t⁴ + cos t from −1 to 1) with the default largest step tEnd − t0", () => {
    // y = t⁵ + sin t: y(−1) = −1 − sin 1, y(1) = 1 + sin 1.
    const r = new DormandPrince45(1).solve(
      (t, _y, f) => {
        f[0] = 5 * t ** 4 + Math.cos(t);
      },
      -1,
      [-1 - Math.sin(1)],
      1,
      { rtol: 1e-10, atol: 1e-10 },
    );
    expect(r.status).toBe("done");
    expect(Math.abs(r.y[0]! - (1 + Math.sin(1)))).toBeLessThan(1e-8);
  });

  it("restarts with a fresh f at a tick when there is no onTimeEvent (the default answer), counting the restart as a step", () => {
    const r = new DormandPrince45(1).solve(decay, 0, [1], 1, { nextTimeEvent: (t) => (t < 0.5 ? 0.5 : Number.POSITIVE_INFINITY) });
    expect(r.timeEvents).toBe(1);
    expect(r.steps).toBe(r.accepted + r.rejected + 1);
    // start + starting step + one restart + 6 per trial step
    expect(r.evaluations).toBe(3 + 6 * (r.accepted + r.rejected));
  });

  it("reads the dense output of one component at the start before any step as the state", () => {
    const ode = new DormandPrince45(2);
    let x = Number.NaN;
    let fired = false;
    ode.solve(
      (_t, y, f) => {
        f[0] = y[1]!;
        f[1] = -y[0]!;
      },
      0,
      [1, 2],
      1,
      {
        nextTimeEvent: () => (fired ? Number.POSITIVE_INFINITY : 0),
        onTimeEvent: () => {
          fired = true;
          x = ode.interpolateComponent(1, 0);
          return "continue";
        },
      },
    );
    expect(x).toBe(2);
  });

  it("samples the start exactly with an integrator reused after a run that failed on a NaN derivative", () => {
    const ode = new DormandPrince45(1);
    expect(() =>
      ode.solve(
        (t, _y, f) => {
          f[0] = Math.sqrt(1 - t);
        },
        0,
        [0],
        2,
      ),
    ).toThrowError(OdeNonFiniteError);
    const r = ode.solve(decay, 0, [1], 1, { outputTimes: [0, 0.5], rtol: 1e-10, atol: 1e-12 });
    expect(r.output?.[0]).toBe(1);
    // e^−0.5
    expect(Math.abs(r.output![1]! - Math.exp(-0.5))).toBeLessThan(1e-9);
  });

  it("names a NaN start state component with no unit", () => {
    expect(refusal(() => new DormandPrince45(2).solve(decay, 0, [1, Number.NaN], 1))).toMatchObject({ param: "y0[1]", unit: "", expected: "a finite number" });
  });
});

describe("stage times, exact ticks and the refusal of a text state", () => {
  it("follows y' = 2t − (y − t²) to y = t² + e^−t (every stage at its own time t + c_i·h, dormand-prince-1980)", () => {
    // Check: y' = 2t − e^−t and 2t − (y − t²) = 2t − e^−t. y(0) = 1, so y(2) = 4 + e^−2.
    const r = new DormandPrince45(1).solve(
      (t, y, f) => {
        f[0] = 2 * t - (y[0]! - t * t);
      },
      0,
      [1],
      2,
      { rtol: 1e-12, atol: 1e-12 },
    );
    expect(Math.abs(r.y[0]! - (4 + Math.exp(-2)))).toBeLessThan(1e-10);
  });

  it("refuses a state given as text, reporting the text, even when it has n characters", () => {
    expect(refusal(() => new DormandPrince45(2).solve(decay, 0, "12" as unknown as number[], 1))).toMatchObject({
      param: "y0",
      value: "12",
      expected: "a list of 2 numbers",
    });
  });

  it("fires at once a time event exactly 16 ulp of the time scale after t (the margin is inclusive)", () => {
    // t0 = 0, tEnd = 4: the margin is 16·2^−52·4 = 2^−46.
    let fired = 0;
    const r = new DormandPrince45(1).solve(decay, 0, [1], 4, {
      nextTimeEvent: () => (fired === 0 ? 2 ** -46 : Number.POSITIVE_INFINITY),
      onTimeEvent: () => {
        fired++;
        return "continue";
      },
    });
    expect(r.status).toBe("done");
    expect(r.timeEvents).toBe(1);
  });

  it("restarts with a fresh f at a time event due at the start when there is no onTimeEvent", () => {
    let calls = 0;
    const r = new DormandPrince45(1).solve(decay, 0, [1], 1, { nextTimeEvent: () => (calls++ === 0 ? 0 : Number.POSITIVE_INFINITY) });
    expect(r.timeEvents).toBe(1);
    // start + starting step + the restart + 6 per trial step
    expect(r.evaluations).toBe(3 + 6 * (r.accepted + r.rejected));
  });

  it("hands onTimeEvent the tick's time exactly even where t + (tick − t) rounds past it (0.2 + (0.9 − 0.2) = 0.8999999999999999)", () => {
    const seen: number[] = [];
    const r = new DormandPrince45(1).solve(
      (_t, _y, f) => {
        f[0] = 0;
      },
      0,
      [1],
      1,
      {
        initialStep: 0.5,
        nextTimeEvent: (t) => (t < 0.2 ? 0.2 : t < 0.9 ? 0.9 : Number.POSITIVE_INFINITY),
        onTimeEvent: (t) => {
          seen.push(t);
          return "continue";
        },
      },
    );
    expect(seen).toEqual([0.2, 0.9]);
    expect(r.t).toBe(1);
  });
});

describe("a purely relative tolerance on a state so small that rtol·|y| underflows to 0", () => {
  it("still reaches tEnd (y' = −y from 1e-310 at atol = 0): the starting step no longer divides ∞ by ∞", () => {
    // sc = 1e-14·1e-310 rounds to 0, so ‖y0‖ = ‖f‖ = ∞; the §II.4 ratio d0/d1 was NaN, every step NaN, and the run
    // spent its whole budget at t = 0. y(1) = 1e-310·e^−1 ≈ 3.68e-311 (a subnormal, still 12 digits).
    const r = new DormandPrince45(1).solve(decay, 0, [1e-310], 1, { atol: 0, rtol: 1e-14 });
    expect(r.status).toBe("done");
    expect(r.t).toBe(1);
    expect(Math.abs(r.y[0]! / (1e-310 * Math.exp(-1)) - 1)).toBeLessThan(1e-6);
  });
});

describe("the order seen in the step counts", () => {
  it.each([
    {
      name: "y' = y·cos t (y = e^sin t) on [0, 10]",
      rhs: ((t, y, f) => {
        f[0] = Math.cos(t) * y[0]!;
      }) as OdeRhs,
      tEnd: 10,
    },
    {
      name: "y' = 2t − (y − t²) (y = t² + e^−t) on [0, 2]",
      rhs: ((t, y, f) => {
        f[0] = 2 * t - (y[0]! - t * t);
      }) as OdeRhs,
      tEnd: 2,
    },
  ])("needs about 10^(3/5) ≈ 3.98 times the steps for a 1000 times tighter tolerance, as a 5th-order method does: $name", ({ rhs, tEnd }) => {
    // Error per step ∝ h⁵ (hairer-norsett-wanner-1 §II.4): the step scales as tol^(1/5), the count as tol^(−1/5).
    // A method that lost an order (a stage at the wrong time) would need 10^(3/4) ≈ 5.62 times as many.
    const steps = (tol: number) => new DormandPrince45(1).solve(rhs, 0, [1], tEnd, { rtol: tol, atol: tol }).steps;
    const ratio = steps(1e-12) / steps(1e-9);
    expect(ratio).toBeGreaterThan(3);
    expect(ratio).toBeLessThan(4.7);
  });
});
