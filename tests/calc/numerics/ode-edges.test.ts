import { describe, expect, it } from "vitest";
import { DormandPrince45, type OdeOptions, type OdeRhs, OdeNonFiniteError, solveOde } from "../../../calc/numerics/ode.ts";
import { decay, eventOrder, one, oscillator, sineCrossings } from "../../support/ode-problems.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

const zero: OdeRhs = (_t, _y, f) => {
  f[0] = 0;
};

/** A run on [0, 1] by default that also records each accepted step's length and trial count. */
function run(options: Partial<{ rhs: OdeRhs; t0: number; y0: number[]; tEnd: number }> & OdeOptions = {}) {
  const sizes: number[] = [];
  const trials: number[] = [];
  const { onStep, ...rest } = options;
  const result = solveOde({
    rhs: one,
    t0: 0,
    y0: [0],
    tEnd: 1,
    ...rest,
    onStep: (s) => {
      sizes.push(s.t - s.tPrev);
      trials.push(s.steps);
      return onStep ? onStep(s) : undefined;
    },
  });
  return { result, sizes, trials };
}

describe("step control worked by hand on problems the method integrates exactly (error estimate 0)", () => {
  it("y' = 1 from 0: starting step 1e-4, then ×10 per step (the largest factor) and a last step stretched to land on 1", () => {
    // Starting step (hairer-norsett-wanner-1 §II.4): d0 = ‖y0‖ = 0 < 1e-5 ⇒ h0 = 1e-6; d1 = ‖f‖ = 1/(1e-9 + 1e-6·0) = 1e9,
    // d2 = 0 (f is constant); h1 = (0.01/1e9)^(1/5) = 10^(−2.2) = 0.00631; h = min(100·h0, h1, 1) = 1e-4.
    // The estimate is 0 every step, so each step is 10 times the last: 1e-4, 1e-3, 1e-2, 0.1 reach 0.1111, and
    // the next step of 1 passes the end: it is cut to 0.8889 and lands on 1 exactly.
    const { result, sizes } = run();
    expect(result).toMatchObject({ status: "done", t: 1, steps: 5, accepted: 5, rejected: 0, events: 0, timeEvents: 0, output: null, outputCount: 0 });
    expect(result.y[0]).toBeCloseTo(1, 15);
    expect(sizes.map((h) => Number(h.toPrecision(10)))).toEqual([1e-4, 1e-3, 1e-2, 0.1, 0.8889]);
    // f at the start, once for the starting step's trial point, then 6 per step (first same as last).
    expect(result.evaluations).toBe(2 + 6 * 5);
  });

  it("y' = 1 from 1: h0 = 0.01·d0/d1 = 0.01 and h1 = (0.01/d1)^(1/5) with d1 = 1/(1e-9 + 1e-6) (the h1 branch)", () => {
    // d0 = d1 = 1/(1e-9 + 1e-6) = 999 000.999 ⇒ h0 = 0.01·d0/d1 = 0.01, h1 = (0.01/999 000.999)^(1/5) = 0.0251239;
    // h = min(100·0.01, 0.0251239, 1) = 0.0251239; then 0.251239; then 0.723637 lands on 1.
    const { result, sizes } = run({ y0: [1] });
    expect(sizes[0]).toBeCloseTo((0.01 / (1 / (1e-9 + 1e-6))) ** 0.2, 15);
    expect(sizes[1]).toBeCloseTo(10 * sizes[0]!, 14);
    expect(result.accepted).toBe(3);
    expect(result.evaluations).toBe(20);
    expect(result.y[0]).toBeCloseTo(2, 14);
  });

  it("y' = 0: d1 = d2 = 0 gives the smallest start, max(1e-6, 1e-3·h0) = 1e-6, then ×10 per step", () => {
    const { result, sizes } = run({ rhs: zero });
    expect(sizes[0]).toBe(1e-6);
    expect(result.accepted).toBe(7); // 1e-6 … 0.1 reach 0.111111, then 0.888889 lands on 1
    expect(result.y[0]).toBe(0);
  });

  it("y' = 1 with atol = 0: ‖f‖ is infinite at y = 0, so the start is 1e-3·h0 = 1e-9", () => {
    // sc = 0 at y = 0: a non-zero component counts as infinitely large (an exactly zero one as 0).
    const { result, sizes } = run({ atol: 0 });
    expect(sizes[0]).toBe(1e-9);
    expect(result.accepted).toBe(10);
    expect(result.status).toBe("done");
  });

  it("takes ‖y0‖ = 1e-5 exactly as large enough to use: h0 = 0.01·d0/d1 = 1e-7 and a first step of 100·h0 = 1e-5", () => {
    // atol = 1, rtol = 1e-14 and |y| ≤ 1e-3 make sc = 1 exactly, so d0 = |y0| and d1 = |f|.
    // y0 = 1e-5, f = 1: d0 = 1e-5 (not below 1e-5), d1 = 1, h0 = 1e-7; d2 = 0, h1 = (0.01/1)^(1/5) = 0.398; h = min(1e-5, 0.398, 1).
    const { sizes } = run({ y0: [1e-5], atol: 1, rtol: 1e-14 });
    expect(sizes[0]).toBeCloseTo(1e-5, 18);
  });

  it("takes ‖f‖ = 1e-5 exactly as large enough to use: h0 = 0.01·1e-3/1e-5 = 1, one step over [0, 1]", () => {
    // y0 = 1e-3, f = 1e-5: d0 = 1e-3, d1 = 1e-5 ⇒ h0 = 1; h1 = (0.01/1e-5)^(1/5) = 3.98; h = min(100, 3.98, 1) = 1.
    const { result, sizes } = run({
      y0: [1e-3],
      atol: 1,
      rtol: 1e-14,
      rhs: (_t, _y, f) => {
        f[0] = 1e-5;
      },
    });
    expect(sizes).toEqual([1]);
    expect(result.accepted).toBe(1);
  });

  it("treats max(d1, d2) = 1e-15 exactly as too small to tell: the start is max(1e-6, 1e-3·h0) = 1e-6", () => {
    // f = 1e-15, sc = 1: d1 = 1e-15 < 1e-5 ⇒ h0 = 1e-6; d2 = 0; max(d1, d2) = 1e-15 ⇒ h1 = 1e-6 (not (0.01/1e-15)^(1/5) = 398).
    const { sizes } = run({
      y0: [1e-3],
      atol: 1,
      rtol: 1e-14,
      rhs: (_t, _y, f) => {
        f[0] = 1e-15;
      },
    });
    expect(sizes[0]).toBe(1e-6);
  });

  it("stretches a step to the end when the end lies within 1.01 steps, the bound included", () => {
    // initialStep 0.5 and tEnd = 1.01·0.5: one step of 0.505 (not 0.5 and then 0.005).
    const { result, sizes } = run({ initialStep: 0.5, tEnd: 1.01 * 0.5 });
    expect(sizes).toEqual([1.01 * 0.5]);
    expect(result.accepted).toBe(1);
    const { sizes: beyond } = run({ initialStep: 0.5, tEnd: 0.51 });
    expect(beyond).toEqual([0.5, expect.closeTo(0.01, 15)]);
  });

  it("keeps each step within maxStep: 1e-4 … 0.1, then 0.3, 0.3 and a last step of 0.2889", () => {
    const { result, sizes } = run({ maxStep: 0.3 });
    expect(sizes.map((h) => Number(h.toPrecision(10)))).toEqual([1e-4, 1e-3, 1e-2, 0.1, 0.3, 0.3, 0.2889]);
    expect(result.accepted).toBe(7);
  });

  it("starts with the given initial step, and skips the starting-step algorithm's evaluation", () => {
    const { result, sizes } = run({ initialStep: 0.05 });
    expect(sizes[0]).toBe(0.05);
    expect(sizes[1]).toBeCloseTo(0.5, 15);
    expect(result.evaluations).toBe(1 + 6 * result.accepted);
  });

  it("never starts with a step above maxStep, even when initialStep asks for more", () => {
    const { sizes } = run({ initialStep: 0.5, maxStep: 0.2 });
    expect(sizes[0]).toBe(0.2);
  });

  it("does not keep a landing step's length: after a time event the planned step goes on", () => {
    // y' = 1 with ticks at 0.25, 0.5, 0.75: the step sequence grows ×10 until a tick cuts it, and after each tick the
    // planned (uncut) step is kept, so no step after the first tick is shorter than the ticks force.
    const { result, sizes } = run({
      nextTimeEvent: (t) => (t < 0.25 ? 0.25 : t < 0.5 ? 0.5 : t < 0.75 ? 0.75 : Number.POSITIVE_INFINITY),
      onTimeEvent: () => "continue",
    });
    expect(result.timeEvents).toBe(3);
    expect(sizes.slice(-3).map((h) => Number(h.toPrecision(12)))).toEqual([0.25, 0.25, 0.25]);
  });
});

describe("problems whose right-hand side depends on t", () => {
  it("follows y' = cos t to sin t over [0, 10] (every stage at its own time t + c_i·h)", () => {
    const times = [1, 2.5, 5, 7.5, 10];
    const r = solveOde({
      rhs: (t, _y, f) => {
        f[0] = Math.cos(t);
      },
      t0: 0,
      y0: [0],
      tEnd: 10,
      rtol: 1e-10,
      atol: 1e-12,
      outputTimes: times,
    });
    for (const [k, t] of times.entries()) expect(Math.abs(r.output![k]! - Math.sin(t))).toBeLessThan(1e-8);
  });

  it("follows y' = t − y from y(0) = 1 to y = t − 1 + 2e^(−t) (a right-hand side of both t and y)", () => {
    const times = [0.5, 1, 3, 6];
    const r = solveOde({
      rhs: (t, y, f) => {
        f[0] = t - y[0]!;
      },
      t0: 0,
      y0: [1],
      tEnd: 6,
      rtol: 1e-10,
      atol: 1e-12,
      outputTimes: times,
    });
    for (const [k, t] of times.entries()) expect(Math.abs(r.output![k]! - (t - 1 + 2 * Math.exp(-t)))).toBeLessThan(1e-9);
  });

  it("integrates y' = 5t⁴ from t = 1 exactly to t⁵ (a 5th-order quadrature is exact for degree 4)", () => {
    const r = solveOde({
      rhs: (t, _y, f) => {
        f[0] = 5 * t ** 4;
      },
      t0: 1,
      y0: [1],
      tEnd: 2,
      rtol: 1e-6,
      atol: 1e-9,
    });
    expect(r.y[0]).toBeCloseTo(32, 12);
  });

  it("evaluates the starting step's trial point at t0 + h0 (y' = t² from t0 = 1: d2 = ‖f(1.01) − f(1)‖/h0 = 2.01/sc)", () => {
    // sc = 1e-9 + 1e-6·|1| for y0 = 1: d0 = d1 = 1/sc, h0 = 0.01; f(1.01) − f(1) = 0.0201 ⇒ d2 = 2.01/sc > d1;
    // h1 = (0.01·sc/2.01)^(1/5) (at t0 − h0 it would be 1.99 instead of 2.01).
    const sizes: number[] = [];
    solveOde({
      rhs: (t, _y, f) => {
        f[0] = t * t;
      },
      t0: 1,
      y0: [1],
      tEnd: 2,
      onStep: (s) => {
        sizes.push(s.t - s.tPrev);
        return undefined;
      },
    });
    expect(sizes[0]).toBeCloseTo(((0.01 * (1e-9 + 1e-6)) / 2.01) ** 0.2, 15);
  });
});

describe("step control on a problem with rejections", () => {
  // The Arenstorf-like close approach is not needed: y' = −y from a far too large first step is rejected.
  const tight = { rhs: decay, y0: [1], tEnd: 10, rtol: 1e-10, atol: 1e-12, initialStep: 5 };

  it("counts every trial: steps = accepted + rejected, f evaluated once at the start and 6 times per trial", () => {
    const { result } = run(tight);
    expect(result.rejected).toBeGreaterThan(0);
    expect(result.steps).toBe(result.accepted + result.rejected);
    expect(result.evaluations).toBe(1 + 6 * result.steps);
    expect(result.y[0]).toBeCloseTo(Math.exp(-10), 12);
  });

  it("grows a step at most 10 times and shrinks it at most 5 times, and never grows the step right after a rejection", () => {
    const { sizes, trials } = run({ ...tight, tEnd: 30, rtol: 1e-6, atol: 1e-9 });
    let afterRejection = 0;
    for (let k = 1; k < sizes.length - 1; k++) {
      const rejectedBefore = trials[k]! - trials[k - 1]! > 1; // trials between two accepted steps
      if (!rejectedBefore) {
        expect(sizes[k]! / sizes[k - 1]!).toBeLessThanOrEqual(10 * (1 + 1e-12));
        expect(sizes[k]! / sizes[k - 1]!).toBeGreaterThanOrEqual(0.2 * (1 - 1e-12));
      }
      if (trials[k]! - trials[k - 1]! > 1) {
        afterRejection++;
        expect(sizes[k + 1]!).toBeLessThanOrEqual(sizes[k]! * (1 + 1e-12));
      }
    }
    expect(trials[0]).toBeGreaterThan(1); // the first step of 5 was rejected at least once
    expect(afterRejection + (trials[0]! > 1 ? 1 : 0)).toBeGreaterThan(0);
    expect(sizes[1]!).toBeLessThanOrEqual(sizes[0]! * (1 + 1e-12));
  });
});

describe("the step budget and the smallest step", () => {
  it("spends a budget of 1 on one step and says step-limit, with the time and state reached", () => {
    const r = run({ maxSteps: 1 }).result;
    expect(r).toMatchObject({ status: "step-limit", steps: 1, accepted: 1, rejected: 0 });
    expect(r.t).toBeCloseTo(1e-4, 18);
    expect(r.y[0]).toBeCloseTo(1e-4, 18);
  });

  it("finishes within a budget exactly as large as the steps it needs (5 for y' = 1)", () => {
    expect(run({ maxSteps: 5 }).result.status).toBe("done");
    expect(run({ maxSteps: 4 }).result).toMatchObject({ status: "step-limit", steps: 4 });
  });

  it("says step-too-small when the span is no more than 16 ulp of the times, and takes a span of 32 ulp", () => {
    // t0 = −1: 16·ε·|t0| = 2^−48 = 3.55e-15.
    const tiny = solveOde({ rhs: one, t0: -1, y0: [0], tEnd: -1 + 16 * Number.EPSILON });
    expect(tiny).toMatchObject({ status: "step-too-small", t: -1, steps: 0, accepted: 0 });
    const small = solveOde({ rhs: one, t0: -1, y0: [0], tEnd: -1 + 32 * Number.EPSILON });
    expect(small).toMatchObject({ status: "done", steps: 1, accepted: 1 });
    expect(small.t).toBe(-1 + 32 * Number.EPSILON);
  });
});

describe("tolerances", () => {
  it("leaves a component with atol = Infinity out of the error norm: the same steps as the other component alone", () => {
    const alone = solveOde({ rhs: decay, t0: 0, y0: [1], tEnd: 5, rtol: 1e-8, atol: 1e-10 });
    const pair = solveOde({
      rhs: (_t, y, f) => {
        f[0] = -y[0]!;
        f[1] = 50 * Math.cos(50 * y[1]!); // wild, but not counted
      },
      t0: 0,
      y0: [1, 0],
      tEnd: 5,
      rtol: [1e-8, 1e-8],
      atol: [1e-10, Number.POSITIVE_INFINITY],
    });
    expect({ steps: pair.steps, accepted: pair.accepted, rejected: pair.rejected }).toEqual({
      steps: alone.steps,
      accepted: alone.accepted,
      rejected: alone.rejected,
    });
    expect(pair.y[0]).toBe(alone.y[0]);
  });

  it("measures the error in the RMS norm: two copies of a problem take exactly the steps of one", () => {
    // err = √(1/n Σ (e_i/sc_i)²): n equal terms give the single term back (hairer-norsett-wanner-1 §II.4 (4.11)).
    const single = solveOde({ rhs: decay, t0: 0, y0: [1], tEnd: 5, rtol: 1e-8, atol: 1e-10, initialStep: 2 });
    const twice = solveOde({
      rhs: (_t, y, f) => {
        f[0] = -y[0]!;
        f[1] = -y[1]!;
      },
      t0: 0,
      y0: [1, 1],
      tEnd: 5,
      rtol: 1e-8,
      atol: 1e-10,
      initialStep: 2,
    });
    expect(single.rejected).toBeGreaterThan(0);
    expect({ accepted: twice.accepted, rejected: twice.rejected }).toEqual({ accepted: single.accepted, rejected: single.rejected });
    expect(twice.y[0]).toBe(single.y[0]);
  });

  it("takes per-component tolerances: a looser one on a component takes fewer steps", () => {
    const both = (rtol: number[]) => solveOde({ rhs: oscillator, t0: 0, y0: [0, 1], tEnd: 10, rtol, atol: 1e-12 }).accepted;
    expect(both([1e-4, 1e-4])).toBeLessThan(both([1e-10, 1e-4]));
    expect(both([1e-10, 1e-10])).toBeGreaterThan(both([1e-10, 1e-4]));
  });

  it("lets a component held at exactly 0 with atol = 0 count as no error (0/0 is taken as 0)", () => {
    // y₀' = 0 from 0 and y₁' = 1 from 1: with atol = 0 the first component's scale is 0, and so is its error.
    // Starting step: d0 = d1 = √((0 + (1/1e-6)²)/2) = 707 107 ⇒ h0 = 0.01, h1 = (0.01/707 107)^(1/5) = 0.0270.
    const { result: r, sizes } = run({
      rhs: (_t, _y, f) => {
        f[0] = 0;
        f[1] = 1;
      },
      y0: [0, 1],
      atol: 0,
    });
    expect(sizes[0]).toBeCloseTo((0.01 / (1e6 / Math.SQRT2)) ** 0.2, 15);
    expect(r.status).toBe("done");
    expect(Array.from(r.y)).toEqual([0, expect.closeTo(2, 14)]);
  });

  it("still refuses a non-finite state in a component left out of the error norm", () => {
    // y₁' = √(1 − t) turns NaN after t = 1: atol = ∞ leaves y₁ out of the norm, but not out of the finiteness check.
    const call = () =>
      solveOde({
        rhs: (t, _y, f) => {
          f[0] = 1;
          f[1] = Math.sqrt(1 - t);
        },
        t0: 0,
        y0: [0, 0],
        tEnd: 2,
        atol: [1e-9, Number.POSITIVE_INFINITY],
      });
    expect(call).toThrowError(OdeNonFiniteError);
  });

  it("refuses tolerances out of range, lists of the wrong length and an atol that leaves every component out", () => {
    const ode = new DormandPrince45(2);
    const go = (opts: OdeOptions) => () => ode.solve(oscillator, 0, [0, 1], 1, opts);
    expectRefusal(go({ rtol: 0 }), "rtol", 0, "", "rtol must be at least 1e-14 and at most 1 (got 0)");
    expectRefusal(go({ rtol: 2 }), "rtol", 2, "", "rtol must be at least 1e-14 and at most 1 (got 2)");
    expectRefusal(go({ rtol: Number.POSITIVE_INFINITY }), "rtol", Number.POSITIVE_INFINITY, "", "rtol must be a finite number (got infinity)");
    expectRefusal(go({ rtol: [1e-6, 1e-15] }), "rtol[1]", 1e-15, "", "rtol[1] must be at least 1e-14 and at most 1 (got 1e-15)");
    expectRefusal(go({ rtol: [1e-6] }), "rtol", 1, "", "rtol must be a number or a list of 2 (got 1)");
    expectRefusal(go({ rtol: [1e-6, Number.POSITIVE_INFINITY] }), "rtol[1]", Number.POSITIVE_INFINITY, "", "rtol[1] must be a finite number (got infinity)");
    expectRefusal(go({ atol: "1" as never }), "atol", "1", "", 'atol must be a number or a list of 2 (got "1")');
    expectRefusal(go({ atol: [1e-9, -1] }), "atol[1]", -1, "", "atol[1] must be at least 0 and at most 1.7976931348623157e+308 (got -1)");
    expectRefusal(
      go({ atol: Number.POSITIVE_INFINITY }),
      "atol",
      Number.POSITIVE_INFINITY,
      "",
      "atol must be finite for at least one component (got infinity)",
    );
    expectRefusal(
      go({ atol: [Number.POSITIVE_INFINITY, Number.POSITIVE_INFINITY] }),
      "atol",
      Number.POSITIVE_INFINITY,
      "",
      "atol must be finite for at least one component (got infinity)",
    );
    expect(ode.solve(oscillator, 0, [0, 1], 1, { rtol: 1, atol: [0, Number.POSITIVE_INFINITY] }).status).toBe("done");
    expect(ode.solve(oscillator, 0, [0, 1], 1, { rtol: 1e-14, atol: 1e-300 }).status).toBe("done");
  });

  it("integrates with atol = 0 (pure relative control) from a state with a zero component", () => {
    // sin and cos from (0, 1): ‖f(t0)‖ is infinite (a non-zero derivative where sc = 0). Before, the starting step came out
    // as 0.01·d0/∞ = 0 and the run ended at once with "step-too-small".
    const r = solveOde({ rhs: oscillator, t0: 0, y0: [0, 1], tEnd: 1, rtol: 1e-10, atol: 0 });
    expect(r.status).toBe("done");
    expect(r.y[0]).toBeCloseTo(Math.sin(1), 9);
    expect(r.y[1]).toBeCloseTo(Math.cos(1), 9);
  });
});

describe("refusals of the problem and options", () => {
  const ode = new DormandPrince45(1);
  const go =
    (opts: OdeOptions, t0 = 0, tEnd = 1, y0: ArrayLike<number> = [1], rhs: OdeRhs = decay) =>
    () =>
      ode.solve(rhs, t0, y0, tEnd, opts);

  it("names t0, tEnd, rhs and y0", () => {
    expectRefusal(go({}, Number.NaN), "t0", Number.NaN, "", "t0 must be a finite number (got not a number)");
    expectRefusal(go({}, 0, Number.POSITIVE_INFINITY), "tEnd", Number.POSITIVE_INFINITY, "", "tEnd must be a finite number (got infinity)");
    expectRefusal(go({}, 2, 2), "tEnd", 2, "", "tEnd must be greater than t0 (2) (got 2)");
    expectRefusal(go({}, 2, 1), "tEnd", 1, "", "tEnd must be greater than t0 (2) (got 1)");
    expectRefusal(go({}, 0, 1, [1], 5 as never), "rhs", 5, "", "rhs must be a function (t, y, dydt) => void (got 5)");
    expectRefusal(go({}, 0, 1, [1, 2]), "y0", 2, "", "y0 must be a list of 1 numbers (got 2)");
    expectRefusal(go({}, 0, 1, null as never), "y0", null, "", "y0 must be a list of 1 numbers (got null)");
    expectRefusal(go({}, 0, 1, 5 as never), "y0", 5, "", "y0 must be a list of 1 numbers (got 5)");
    expectRefusal(go({}, 0, 1, [Number.NaN]), "y0[0]", Number.NaN, "", "y0[0] must be a finite number (got not a number)");
  });

  it("names maxStep, maxSteps, initialStep and eventTolerance", () => {
    expectRefusal(go({ maxStep: 0 }), "maxStep", 0, "", "maxStep must be greater than 0 (got 0)");
    expectRefusal(go({ maxSteps: 0 }), "maxSteps", 0, "", "maxSteps must be at least 1 and at most 1000000000 (got 0)");
    expectRefusal(go({ maxSteps: 1e9 + 1 }), "maxSteps", 1e9 + 1, "", "maxSteps must be at least 1 and at most 1000000000 (got 1000000000)");
    expectRefusal(go({ maxSteps: 2.5 }), "maxSteps", 2.5, "", "maxSteps must be a whole number (got 2.5)");
    expectRefusal(go({ initialStep: 0 }), "initialStep", 0, "", "initialStep must be greater than 0 (got 0)");
    expectRefusal(go({ eventTolerance: -1 }), "eventTolerance", -1, "", "eventTolerance must be greater than 0 (got -1)");
    expect(go({ maxSteps: 1e9 })().status).toBe("done");
  });

  it("names an output time outside [t0, tEnd] or before the one before it", () => {
    expectRefusal(go({ outputTimes: [0.5, 1.5] }), "outputTimes[1]", 1.5, "", "outputTimes[1] must be at least 0 and at most 1 (got 1.5)");
    expectRefusal(go({ outputTimes: [0.5, 0.2] }), "outputTimes[1]", 0.2, "", "outputTimes[1] must be at least the previous time (0.5) (got 0.2)");
    expectRefusal(go({ outputTimes: [-0.1] }), "outputTimes[0]", -0.1, "", "outputTimes[0] must be at least 0 and at most 1 (got -0.1)");
    expect(go({ outputTimes: [0, 0.5, 0.5, 1] })().outputCount).toBe(4);
  });

  it("refuses a dimension that is not a whole number from 1 to 100 000", () => {
    expectRefusal(() => new DormandPrince45(0), "dimension", 0, "", "dimension must be at least 1 and at most 100000 (got 0)");
    expectRefusal(() => new DormandPrince45(100_001), "dimension", 100_001, "", "dimension must be at least 1 and at most 100000 (got 100001)");
    expectRefusal(() => new DormandPrince45(1.5), "dimension", 1.5, "", "dimension must be a whole number (got 1.5)");
    expect(new DormandPrince45(100_000).dimension).toBe(100_000);
  });

  it("solveOde names the problem and a y0 with no numbers", () => {
    expectRefusal(() => solveOde(null as never), "problem", null, "", "problem must be an object { rhs, t0, y0, tEnd, … } (got null)");
    expectRefusal(() => solveOde({ rhs: decay, t0: 0, y0: [], tEnd: 1 }), "y0", 0, "", "y0 must be a list of at least 1 number (got 0)");
    expectRefusal(() => solveOde({ rhs: decay, t0: 0, y0: 3 as never, tEnd: 1 }), "y0", 3, "", "y0 must be a list of at least 1 number (got 3)");
    expectRefusal(() => solveOde({ rhs: decay, t0: 0, y0: null as never, tEnd: 1 }), "y0", null, "", "y0 must be a list of at least 1 number (got null)");
    // A null tolerance means the default, as an omitted one does.
    expect(solveOde({ rhs: decay, t0: 0, y0: [1], tEnd: 1, rtol: null as never, atol: null as never })).toEqual(
      solveOde({ rhs: decay, t0: 0, y0: [1], tEnd: 1 }),
    );
  });
});

describe("output times", () => {
  it("samples t0 from the initial state and later times from the dense output, leaving rows past a stop at 0", () => {
    const r = solveOde({ rhs: decay, t0: 0, y0: [1], tEnd: 2, rtol: 1e-10, atol: 1e-12, outputTimes: [0, 0.5, 1, 1.5, 2] });
    expect(r.outputCount).toBe(5);
    expect(r.output![0]).toBe(1);
    for (const [k, t] of [0.5, 1, 1.5, 2].entries()) expect(r.output![k + 1]!).toBeCloseTo(Math.exp(-t), 9);
    const stopped = solveOde({
      rhs: decay,
      t0: 0,
      y0: [1],
      tEnd: 2,
      rtol: 1e-10,
      atol: 1e-12,
      outputTimes: [0.5, 1, 1.5],
      events: [{ g: (t) => t - 1.2 }],
      onEvent: () => "stop",
    });
    expect(stopped.status).toBe("stopped");
    expect(stopped.outputCount).toBe(2);
    expect(Array.from(stopped.output!).slice(2)).toEqual([0]);
    expect(stopped.t).toBeCloseTo(1.2, 12);
  });
});

describe("output times in a step an event cuts", () => {
  it("samples times before a restarting event from the step it cut, with the state before the change", () => {
    // One step over [0, 1] of y' = 1; the crossing at 0.5 moves y to 10: y(0.25) = 0.25 and y(0.75) = 10.25.
    const r = solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      outputTimes: [0.25, 0.75],
      events: [{ g: (t) => t - 0.5 }],
      onEvent: (_hit, y) => {
        y[0] = 10;
        return "restart";
      },
    });
    expect(r.output![0]).toBeCloseTo(0.25, 12);
    expect(r.output![1]).toBeCloseTo(10.25, 9);
  });
});

describe("events: sides, directions, tolerance and actions", () => {
  it("sees no event where g starts at exactly 0 and moves away (it takes the side it moves to)", () => {
    const r = solveOde({ rhs: one, t0: 0, y0: [0], tEnd: 1, events: [{ g: (_t, y) => y[0]! }] });
    expect(r.events).toBe(0);
    expect(r.status).toBe("done");
  });

  it("treats g = 0 as the non-positive side: a fall from 1 − t > 0 to exactly 0 at the end is an event (g ≤ 0 is one side)", () => {
    const hits: number[] = [];
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      events: [{ g: (t) => 1 - t }],
      onEvent: (hit) => {
        hits.push(hit.t);
        expect(hit.direction).toBe(-1);
        return "continue";
      },
    });
    expect(hits).toHaveLength(1);
    expect(hits[0]).toBeCloseTo(1, 12);
  });

  it("locates a crossing to the requested event tolerance, on the new side", () => {
    for (const eventTolerance of [1e-2, 1e-6, 1e-12]) {
      let at = Number.NaN;
      solveOde({
        rhs: oscillator,
        t0: 0,
        y0: [0, 1],
        tEnd: 2,
        rtol: 1e-12,
        atol: 1e-14,
        eventTolerance,
        events: [{ g: (_t, y) => y[0]! - 0.5, direction: 1 }],
        onEvent: (hit, y) => {
          at = hit.t;
          expect(y[0]!).toBeGreaterThan(0.5); // on the new side
          return "continue";
        },
      });
      expect(at).toBeGreaterThanOrEqual(Math.PI / 6 - 1e-13);
      expect(at - Math.PI / 6).toBeLessThanOrEqual(eventTolerance);
    }
  });

  it("locates to about 1e-13 of the span by default", () => {
    let at = Number.NaN;
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      events: [{ g: (t) => t * t - 0.3 }],
      onEvent: (hit) => {
        at = hit.t;
        return "continue";
      },
    });
    expect(Math.abs(at - Math.sqrt(0.3))).toBeLessThanOrEqual(1e-13);
    expect(at * at).toBeGreaterThan(0.3);
  });

  it("scales the default event tolerance with the span: the same crossing scaled in time takes the same evaluations", () => {
    // g = t − span/2 on one step over [0, span]: the default tolerance 1e-13·span makes the search scale-free.
    const locate = (span: number) => {
      let calls = 0;
      let at = Number.NaN;
      solveOde({
        rhs: one,
        t0: 0,
        y0: [0],
        tEnd: span,
        initialStep: span,
        events: [
          {
            g: (t) => {
              calls++;
              return t - span / 2;
            },
          },
        ],
        onEvent: (hit) => {
          at = hit.t;
          return "stop";
        },
      });
      return { calls, error: at - span / 2 };
    };
    const unit = locate(1);
    const large = locate(1e6);
    expect(large.calls).toBe(unit.calls);
    expect(large.error).toBeGreaterThan(0);
    expect(large.error).toBeLessThanOrEqual(1e-13 * 1e6);
  });

  it("never refines below 8 ulp of t, however small the event tolerance asked for", () => {
    // A crossing near t = 1000 with eventTolerance 1e-300: doubles there are 1.1e-13 apart, so the search stops at
    // about 9e-13 instead of running to its 200-iteration cap.
    let calls = 0;
    let at = Number.NaN;
    solveOde({
      rhs: one,
      t0: 1000,
      y0: [0],
      tEnd: 1001,
      initialStep: 1,
      eventTolerance: 1e-300,
      events: [
        {
          g: (t) => {
            calls++;
            return t - 1000.5;
          },
        },
      ],
      onEvent: (hit) => {
        at = hit.t;
        return "stop";
      },
    });
    expect(at - 1000.5).toBeGreaterThan(0);
    expect(at - 1000.5).toBeLessThanOrEqual(8 * Number.EPSILON * 1001);
    expect(calls).toBeLessThan(60);
  });

  it("takes the 8-ulp floor from the larger end of the step, so a step ending at t = 0 does not search to the iteration cap", () => {
    // One step over [−1, 0]; the crossing at −0.5 with eventTolerance 1e-300. Before, the floor came from |t1| = 0 alone,
    // and the search ran its 200 iterations against doubles 1.1e-16 apart.
    let calls = 0;
    let at = Number.NaN;
    solveOde({
      rhs: one,
      t0: -1,
      y0: [0],
      tEnd: 0,
      initialStep: 1,
      eventTolerance: 1e-300,
      events: [
        {
          g: (t) => {
            calls++;
            return t + 0.5;
          },
        },
      ],
      onEvent: (hit) => {
        at = hit.t;
        return "stop";
      },
    });
    expect(at + 0.5).toBeGreaterThan(0);
    expect(at + 0.5).toBeLessThanOrEqual(8 * Number.EPSILON);
    expect(calls).toBeLessThan(60);
  });

  it("reports crossings inside one step in time order", () => {
    expect(eventOrder([(t) => t - 0.7, (t) => t - 0.2, (t) => t - 0.5])).toEqual([1, 2, 0]);
    expect(eventOrder([(t) => t - 0.2, (t) => t - 0.7, (t) => t - 0.5])).toEqual([0, 2, 1]);
  });

  it("counts each restart as a step and evaluates f once more there", () => {
    const restartRun = sineCrossings({ rtol: 1e-8, atol: 1e-10, onEvent: () => "restart" });
    expect(restartRun.events).toBe(3); // sin t = 0 at π, 2π, 3π
    expect(restartRun.steps).toBe(restartRun.accepted + restartRun.rejected + restartRun.events);
    expect(restartRun.evaluations).toBe(2 + 6 * (restartRun.accepted + restartRun.rejected) + restartRun.events);
    const continueRun = sineCrossings({ rtol: 1e-8, atol: 1e-10, onEvent: () => "continue" });
    expect(continueRun.events).toBe(3);
    expect(continueRun.steps).toBe(continueRun.accepted + continueRun.rejected);
  });

  it("restarts by default when there is no onEvent, and stops at the state the callback sees", () => {
    const r = sineCrossings();
    expect(r.events).toBe(3);
    expect(r.steps).toBe(r.accepted + r.rejected + 3);
    const undecided = sineCrossings({ onEvent: () => undefined });
    expect(undecided.steps).toBe(undecided.accepted + undecided.rejected + 3);
  });

  it("reads a continued event's g again at the step's end, so a callback can move the zero it counts (a revolution counter)", () => {
    // y = t on [0, 1] in steps of at most 0.05; the event's target moves 0.1 further at each crossing. Read again at the
    // step's end, g is below the new target there, so the next step sees the next crossing; with the stale value (above
    // the old target) every later step would start on the positive side and see nothing.
    let target = 0.1;
    const seen: number[] = [];
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      maxStep: 0.05,
      events: [{ g: (_t, y) => y[0]! - target }],
      onEvent: (hit) => {
        expect(hit.direction).toBe(1); // never a false falling crossing from a stale g
        seen.push(Number(hit.t.toFixed(9)));
        target += 0.1;
        return "continue";
      },
    });
    expect(seen).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9]); // the target 1 is reached only at the end, g = 0: no crossing
  });

  it("names an event whose g turns non-finite when read again after its callback, at the step's end", () => {
    let broken = false;
    const error = refusal(() =>
      solveOde({
        rhs: one,
        t0: 0,
        y0: [0],
        tEnd: 1,
        initialStep: 1,
        events: [{ g: (t) => (broken ? Number.NaN : t - 0.5) }],
        onEvent: () => {
          broken = true;
          return "continue";
        },
      }),
    ) as OdeNonFiniteError;
    expect(error.param).toBe("events[0]");
    expect(error.t).toBe(1);
  });

  it("finds a crossing that the first secant hits exactly (g = ±(t − 0.5) on one step over [0, 1]), bisecting from there", () => {
    const locate = (sign: number) => {
      let at = Number.NaN;
      let calls = 0;
      solveOde({
        rhs: one,
        t0: 0,
        y0: [0],
        tEnd: 1,
        initialStep: 1,
        events: [
          {
            g: (t) => {
              calls++;
              return sign * (t - 0.5);
            },
          },
        ],
        onEvent: (hit) => {
          at = hit.t;
          return "continue";
        },
      });
      return { at, calls };
    };
    // Rising: the new side is g > 0, so the point returned lies just after 0.5; falling: g ≤ 0 is the new side, 0.5 itself.
    const rising = locate(1);
    expect(rising.at).toBeGreaterThan(0.5);
    expect(rising.at - 0.5).toBeLessThanOrEqual(1e-13);
    const falling = locate(-1);
    expect(falling.at).toBe(0.5);
    // Halving [0, 0.5] down to 1e-13 takes about 42 bisections (2^−42 = 2.3e-13), far below the 200-iteration cap.
    expect(rising.calls).toBeLessThanOrEqual(60);
    expect(falling.calls).toBeLessThanOrEqual(60);
  });

  it("names the event whose g is not finite inside the step, where the crossing is being located", () => {
    // g is finite at both ends of the one step [0, 1] but NaN in (0.3, 0.6), where the search for its zero looks.
    // Before, the error named "events[-1]".
    const error = refusal(() =>
      solveOde({
        rhs: one,
        t0: 0,
        y0: [0],
        tEnd: 1,
        initialStep: 1,
        events: [{ g: () => 1 }, { g: (t) => (t > 0.3 && t < 0.6 ? Number.NaN : t - 0.45) }],
      }),
    ) as OdeNonFiniteError;
    expect(error.param).toBe("events[1]");
    expect(error.index).toBe(1);
    expect(error.t).toBeGreaterThan(0.3);
    expect(error.t).toBeLessThan(0.6);
  });

  it("locates a crossing of a strongly curved g in few evaluations (Illinois false position, dowell-jarratt-1971)", () => {
    // One step over [0, 1]; g = ±(e^(5t) − e^2.5) (convex rising, concave falling) and ±(1 − e^(2.5 − 5t)) (concave rising,
    // convex falling), all crossing at 0.5: plain false position
    // would keep one end for ever and creep; the Illinois halving and the bisection safeguard keep it fast.
    const curves = [
      (t: number) => Math.exp(5 * t) - Math.exp(2.5),
      (t: number) => Math.exp(2.5) - Math.exp(5 * t),
      (t: number) => 1 - Math.exp(2.5 - 5 * t),
      (t: number) => Math.exp(2.5 - 5 * t) - 1,
    ];
    for (const curve of curves) {
      let calls = 0;
      let at = Number.NaN;
      solveOde({
        rhs: one,
        t0: 0,
        y0: [0],
        tEnd: 1,
        initialStep: 1,
        events: [
          {
            g: (t) => {
              calls++;
              return curve(t);
            },
          },
        ],
        onEvent: (hit) => {
          at = hit.t;
          return "continue";
        },
      });
      expect(Math.abs(at - 0.5)).toBeLessThanOrEqual(1e-13);
      expect(calls - 2).toBeLessThanOrEqual(15); // evaluations inside the step, besides its two ends
    }
  });

  it("names an event function that gives a non-finite value", () => {
    const error = refusal(() => solveOde({ rhs: one, t0: 0, y0: [0], tEnd: 1, events: [{ g: () => 1 }, { g: () => Number.NaN }] }));
    expect(error).toBeInstanceOf(OdeNonFiniteError);
    expect({ param: error.param, unit: error.unit, expected: error.expected }).toEqual({
      param: "events[1]",
      unit: "",
      expected: "a finite event function at every step",
    });
    expect(error.message).toBe("the event 1 is not a finite number (NaN) at t = 0");
    expect(error.name).toBe("OdeNonFiniteError");
    expect(error).toBeInstanceOf(RangeError);
  });

  it("names a state an event callback made non-finite", () => {
    const error = refusal(() =>
      solveOde({
        rhs: one,
        t0: 0,
        y0: [0],
        tEnd: 1,
        events: [{ g: (t) => t - 0.5 }],
        onEvent: (_hit, y) => {
          y[0] = Number.POSITIVE_INFINITY;
          return "restart";
        },
      }),
    ) as OdeNonFiniteError;
    expect(error.param).toBe("rhs");
    expect(error.quantity).toBe("state");
    expect(error.index).toBe(0);
    expect(error.t).toBeCloseTo(0.5, 12);
    expect(error.message).toMatch(/^the state 0 is not a finite number \(Infinity\) at t = 0\.5/);
  });
});

describe("time events", () => {
  it("fires a time event that is due now (at t0) before the first step", () => {
    const times: number[] = [];
    let fired = false;
    const r = solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      nextTimeEvent: (t) => (fired ? Number.POSITIVE_INFINITY : t),
      onTimeEvent: (t) => {
        times.push(t);
        fired = true;
        return "continue";
      },
    });
    expect(times).toEqual([0]);
    expect(r.timeEvents).toBe(1);
    expect(r.steps).toBe(r.accepted + 1);
    expect(r.evaluations).toBe(2 + 6 * r.accepted); // "continue": no fresh f(t, y)
  });

  it("restarts when onTimeEvent answers nothing", () => {
    let fired = false;
    const r = solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      nextTimeEvent: (t) => (fired ? Number.POSITIVE_INFINITY : t),
      onTimeEvent: () => {
        fired = true;
        return undefined;
      },
    });
    expect(r.evaluations).toBe(2 + 6 * r.accepted + 1);
  });

  it("restarts with a fresh f(t, y) after a due-now time event by default, and stops there when told", () => {
    let fired = false;
    const onceNow = (t: number) => {
      if (fired) return Number.POSITIVE_INFINITY;
      fired = true;
      return t;
    };
    const restarted = solveOde({ rhs: one, t0: 0, y0: [0], tEnd: 1, nextTimeEvent: onceNow });
    expect(restarted.timeEvents).toBe(1);
    expect(restarted.evaluations).toBe(2 + 6 * restarted.accepted + 1);
    const stopped = solveOde({ rhs: one, t0: 0, y0: [0], tEnd: 1, nextTimeEvent: (t) => t, onTimeEvent: () => "stop" });
    expect(stopped).toMatchObject({ status: "stopped", t: 0, steps: 1, accepted: 0, timeEvents: 1 });
  });

  it("fires a time event 16 ulp after t at t itself (within round-off), rather than trying a step too small to take", () => {
    // t0 = −1, tEnd = 0: 16·ε·max(|t|, |tEnd|) = 2^−48; a time event at −1 + 2^−48 is due now.
    const seen: number[] = [];
    let fired = false;
    const r = solveOde({
      rhs: one,
      t0: -1,
      y0: [0],
      tEnd: 0,
      nextTimeEvent: () => (fired ? Number.POSITIVE_INFINITY : -1 + 16 * Number.EPSILON),
      onTimeEvent: (t) => {
        seen.push(t);
        fired = true;
        return "continue";
      },
    });
    expect(seen).toEqual([-1]);
    expect(r.status).toBe("done");
  });

  it("stops at a time event when its callback says so, with the state there", () => {
    let after = 0;
    const r = solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      nextTimeEvent: () => 0.4,
      onTimeEvent: () => "stop",
      onStep: (s) => {
        if (s.t >= 0.4) after++;
        return undefined;
      },
    });
    expect(r).toMatchObject({ status: "stopped", t: 0.4, timeEvents: 1 });
    // No restart after a stop (no extra step, no fresh f), and no onStep for the step that stopped.
    expect(r.steps).toBe(r.accepted + r.rejected);
    expect(r.evaluations).toBe(2 + 6 * r.steps);
    expect(after).toBe(0);
    expect(r.y[0]).toBeCloseTo(0.4, 15);
  });

  it("lands on a time event at tEnd and fires it there", () => {
    const seen: number[] = [];
    const r = solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      nextTimeEvent: (t) => (t < 1 ? 1 : Number.POSITIVE_INFINITY),
      onTimeEvent: (t) => {
        seen.push(t);
        return "continue";
      },
    });
    expect(seen).toEqual([1]);
    expect(r.status).toBe("done");
    expect(r.t).toBe(1);
  });

  it("lands exactly on a time event whose time t + (tEvent − t) would miss by an ulp (0.3 then 6/7)", () => {
    // In doubles 0.3 + (6/7 − 0.3) ≠ 6/7: the landing step must end at the event's own time.
    const seen: number[] = [];
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 0.3,
      nextTimeEvent: (t) => (t < 6 / 7 ? 6 / 7 : Number.POSITIVE_INFINITY),
      onTimeEvent: (t) => {
        seen.push(t);
        return "continue";
      },
    });
    expect(0.3 + (6 / 7 - 0.3)).not.toBe(6 / 7);
    expect(seen).toEqual([6 / 7]);
  });

  it("reports a crossing exactly at the end of a landing step at the end's own time", () => {
    const seen: number[] = [];
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 6 / 7,
      initialStep: 0.3,
      events: [{ g: (t) => 6 / 7 - t }],
      onEvent: (hit) => {
        seen.push(hit.t);
        return "continue";
      },
    });
    expect(seen).toEqual([6 / 7]);
  });

  it("handles a time event that an event callback schedules before a later crossing in the same step first", () => {
    const log: string[] = [];
    let pending = Number.POSITIVE_INFINITY;
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      events: [{ g: (t) => t - 0.2 }, { g: (t) => t - 0.7 }],
      onEvent: (hit) => {
        log.push(`event ${hit.index} at ${hit.t.toFixed(6)}`);
        if (hit.index === 0) pending = 0.4;
        return "continue";
      },
      nextTimeEvent: (t) => (t < pending ? pending : Number.POSITIVE_INFINITY),
      onTimeEvent: (t) => {
        log.push(`time event at ${t.toFixed(6)}`);
        pending = Number.POSITIVE_INFINITY;
        return "restart";
      },
    });
    expect(log).toEqual(["event 0 at 0.200000", "time event at 0.400000", "event 1 at 0.700000"]);
  });

  it("does not fire a time event at its old time when an event callback postpones it during the step that lands on it", () => {
    // Steps 0.3 then a landing on the time event at 0.8; the crossing at 0.5 inside that step moves the time event to 0.9.
    // Before, it fired at 0.8 as well as at 0.9.
    let pending = 0.8;
    const seen: number[] = [];
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 0.3,
      events: [{ g: (t) => t - 0.5 }],
      onEvent: () => {
        pending = 0.9;
        return "continue";
      },
      nextTimeEvent: (t) => (t < pending ? pending : Number.POSITIVE_INFINITY),
      onTimeEvent: (t) => {
        seen.push(t);
        pending = Number.POSITIVE_INFINITY;
        return "continue";
      },
    });
    expect(seen).toEqual([0.9]);
  });

  it("never fires a time event back in time when a callback schedules one before the step's start: it fires at once, later", () => {
    let pending = Number.POSITIVE_INFINITY;
    const seen: number[] = [];
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 2,
      initialStep: 0.3,
      maxStep: 0.3,
      events: [{ g: (t) => t - 0.5 }],
      onEvent: () => {
        pending = 0.3; // the start of the step that holds the crossing (steps of 0.3 from 0): already past
        return "continue";
      },
      nextTimeEvent: () => pending,
      onTimeEvent: (t) => {
        seen.push(t);
        pending = Number.POSITIVE_INFINITY;
        return "continue";
      },
    });
    expect(seen).toHaveLength(1);
    expect(seen[0]!).toBeGreaterThanOrEqual(0.5);
  });

  it("lets a state event's restart stand when a time event lies later in the same step", () => {
    // One step over [0, 1]; the crossing at 0.5 moves y to 10 and restarts; the time event at 0.8 then sees y = 10.3.
    let atTick = Number.NaN;
    solveOde({
      rhs: one,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      events: [{ g: (t) => t - 0.5 }],
      onEvent: (_hit, y) => {
        y[0] = 10;
        return "restart";
      },
      nextTimeEvent: (t) => (t < 0.8 ? 0.8 : Number.POSITIVE_INFINITY),
      onTimeEvent: (_t, y) => {
        atTick = y[0]!;
        return "continue";
      },
    });
    expect(atTick).toBeCloseTo(10.3, 9);
  });

  it("takes the state at a time event the step landed on from the step's end, the same as a run ending there", () => {
    const ending = solveOde({ rhs: decay, t0: 0, y0: [1], tEnd: 6 / 7, initialStep: 0.3, rtol: 1e-3, atol: 1e-6 });
    const ticked = solveOde({
      rhs: decay,
      t0: 0,
      y0: [1],
      tEnd: 1,
      initialStep: 0.3,
      rtol: 1e-3,
      atol: 1e-6,
      nextTimeEvent: () => 6 / 7,
      onTimeEvent: () => "stop",
    });
    expect(ticked.t).toBe(6 / 7);
    expect(ticked.y[0]).toBe(ending.y[0]);
    expect(ticked.accepted).toBe(ending.accepted);
  });

  it("keeps the planned step after a short landing step (0.5, then a landing of 0.01 on a time event, then 0.49 to the end)", () => {
    const { sizes } = run({ initialStep: 0.5, nextTimeEvent: (t) => (t < 0.51 ? 0.51 : Number.POSITIVE_INFINITY), onTimeEvent: () => "continue" });
    expect(sizes.map((h) => Number(h.toPrecision(12)))).toEqual([0.5, 0.01, 0.49]);
  });

  it("applies restartStep only after a restart, not to ordinary steps", () => {
    expect(run({ restartStep: () => 1e-3 }).sizes).toEqual(run().sizes);
  });

  it("caps the first step after a time event by restartStep, and only when the cap is positive and smaller", () => {
    const firstStepAfterTick = (cap: number) => {
      let tickSeen = false;
      let first = Number.NaN;
      solveOde({
        rhs: one,
        t0: 0,
        y0: [0],
        tEnd: 1,
        nextTimeEvent: (t) => (t < 0.5 ? 0.5 : Number.POSITIVE_INFINITY),
        restartStep: () => cap,
        onStep: (s) => {
          if (tickSeen && Number.isNaN(first)) first = s.t - s.tPrev;
          if (s.t === 0.5) tickSeen = true;
          return undefined;
        },
      });
      return first;
    };
    expect(firstStepAfterTick(1e-3)).toBeCloseTo(1e-3, 15);
    expect(firstStepAfterTick(0)).toBeCloseTo(0.5, 15); // a cap of 0 is ignored: the planned step lands on 1
    expect(firstStepAfterTick(10)).toBeCloseTo(0.5, 15);
  });
});

describe("the step view", () => {
  it("interpolates the state at the step's ends and agrees component by component", () => {
    const out = new Float64Array(2);
    let previous = Float64Array.from([0, 1]);
    solveOde({
      rhs: oscillator,
      t0: 0,
      y0: [0, 1],
      tEnd: 3,
      rtol: 1e-9,
      atol: 1e-12,
      onStep: (s) => {
        s.interpolate(s.tPrev, out);
        expect(Array.from(out)).toEqual(Array.from(previous));
        s.interpolate(s.t, out);
        expect(out[0]).toBeCloseTo(s.y[0]!, 14);
        expect(out[1]).toBeCloseTo(s.y[1]!, 14);
        const inside = s.tPrev + 0.3 * (s.t - s.tPrev);
        s.interpolate(inside, out);
        expect(s.interpolateComponent(0, inside)).toBe(out[0]);
        expect(s.interpolateComponent(1, inside)).toBe(out[1]);
        expect(out[0]).toBeCloseTo(Math.sin(inside), 8);
        expect(out[1]).toBeCloseTo(Math.cos(inside), 8);
        previous = Float64Array.from(s.y);
        return undefined;
      },
    });
  });

  it("gives the initial state as the dense output after a run that took no step", () => {
    const ode = new DormandPrince45(1);
    const r = ode.solve(one, -1, [0.25], -1 + 16 * Number.EPSILON);
    expect(r.status).toBe("step-too-small");
    expect(ode.interpolateComponent(0, -1)).toBe(0.25);
    const out = new Float64Array(1);
    ode.interpolate(-1, out);
    expect(out[0]).toBe(0.25);
  });

  it("samples t0 from the state itself on a reused integrator whose last run ended on a non-finite trial", () => {
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
    const r = ode.solve(decay, 0, [1], 1, { outputTimes: [0, 1], rtol: 1e-10, atol: 1e-12 });
    expect(r.output![0]).toBe(1);
    expect(r.output![1]).toBeCloseTo(Math.exp(-1), 9);
  });

  it("takes options of null as the defaults", () => {
    const ode = new DormandPrince45(1);
    expect(ode.solve(decay, 0, [1], 1, null as never)).toEqual(ode.solve(decay, 0, [1], 1));
  });

  it("stops after the step onStep answers stop", () => {
    let calls = 0;
    const r = run({
      onStep: () => {
        calls++;
        return calls === 2 ? "stop" : undefined;
      },
    });
    expect(r.result).toMatchObject({ status: "stopped", accepted: 2 });
    expect(r.result.t).toBeCloseTo(1.1e-3, 15);
  });
});
