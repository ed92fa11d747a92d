/**
 * The general integrator (calc/numerics/ode.ts) on published ODE test problems, independently of
 * any drive model: the Arenstorf orbit, linear and oscillator problems with exact solutions, the
 * Brusselator against a second integrator, convergence order, events and the step budget.
 */
import { createRequire } from "node:module";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { DormandPrince45, type OdeRhs, OdeNonFiniteError, solveOde } from "../../../calc/numerics/ode.ts";
import { oscillator, sineCrossings } from "../../support/ode-problems.ts";

// odex ships TypeScript source without declarations; loading it through require keeps tsc out of it.
interface OdexSolver {
  relativeTolerance: number;
  absoluteTolerance: number;
  maxSteps: number;
  solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], x1: number): { y: number[]; outcome: number };
}
const { Solver } = createRequire(import.meta.url)("odex") as { Solver: new (n: number) => OdexSolver };

/** |actual − expected| ≤ rtol·|expected| + atol. */
const close = (actual: number, expected: number, rtol: number, atol = 0) => {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);
};

// Arenstorf orbit: the restricted three-body problem of hairer-norsett-wanner-1 §II.0, eq. (0.1), with
// the initial values (0.2) and period T as printed in the driver dr_dopri5.f distributed with
// Hairer's DOPRI5 code (hairer-dopri5-code): μ = 0.012277471, y(0) = (0.994, 0, 0, −2.00158510637908252240537862224),
// T = 17.0652165601579625588917206249.
const MU = 0.012277471;
const MUP = 1 - MU;
// The published digits are kept as text: a double holds about 17 of them.
const ARENSTORF_Y0 = [0.994, 0, 0, Number("-2.00158510637908252240537862224")];
const ARENSTORF_T = Number("17.0652165601579625588917206249");
const arenstorf: OdeRhs = (_t, y, f) => {
  const r1 = ((y[0]! + MU) ** 2 + y[1]! ** 2) ** 1.5;
  const r2 = ((y[0]! - MUP) ** 2 + y[1]! ** 2) ** 1.5;
  f[0] = y[2]!;
  f[1] = y[3]!;
  f[2] = y[0]! + 2 * y[3]! - (MUP * (y[0]! + MU)) / r1 - (MU * (y[0]! - MUP)) / r2;
  f[3] = y[1]! - 2 * y[2]! - (MUP * y[1]!) / r1 - (MU * y[1]!) / r2;
};
const arenstorfArray = (_t: number, y: number[]): number[] => {
  const out = new Float64Array(4);
  arenstorf(0, Float64Array.from(y), out);
  return Array.from(out);
};

// Brusselator (hairer-norsett-wanner-1 §II.10, problem BRUS with A = 1, B = 3): y1' = 1 + y1²y2 − 4y1,
// y2' = 3y1 − y1²y2, y(0) = (1.5, 3), on [0, 20].
const brusselator: OdeRhs = (_t, y, f) => {
  const y1 = y[0]!;
  const y2 = y[1]!;
  f[0] = 1 + y1 * y1 * y2 - 4 * y1;
  f[1] = 3 * y1 - y1 * y1 * y2;
};

describe("the Arenstorf orbit (hairer-norsett-wanner-1 §II.0 (0.1)–(0.2); values of hairer-dopri5-code's driver)", () => {
  it.each([
    { rtol: 1e-7, bound: 1e-4, note: "the driver's own tolerance" },
    { rtol: 1e-10, bound: 1e-7, note: "tight" },
  ])("closes after T = 17.0652165601579625588917206249 at rtol = atol = $rtol ($note)", ({ rtol, bound }) => {
    const r = solveOde({ rhs: arenstorf, t0: 0, y0: ARENSTORF_Y0, tEnd: ARENSTORF_T, rtol, atol: rtol });
    expect(r.status).toBe("done");
    expect(r.t).toBe(ARENSTORF_T);
    // The orbit is periodic: position and velocity return to the initial values. Bounds: the global error
    // of an error-per-step controller is mostly a phase error δt along the orbit, some hundred times rtol
    // in position (speed ≈ 2). The start point passes 0.006 from the Moon, where the acceleration is
    // about 300, so the same δt shows some 150 times larger in velocity: its bound is 300 times larger.
    for (let i = 0; i < 2; i++) close(r.y[i]!, ARENSTORF_Y0[i]!, 0, bound);
    for (let i = 2; i < 4; i++) close(r.y[i]!, ARENSTORF_Y0[i]!, 0, 300 * bound);
    expect(r.rejected).toBeGreaterThan(0); // the close approach forces rejections at these tolerances
  });

  it("agrees with odex (Hairer's GBS extrapolation code, a second method) along the orbit", () => {
    const s = new Solver(4);
    s.relativeTolerance = 1e-12;
    s.absoluteTolerance = 1e-12;
    s.maxSteps = 100000;
    const times = [2, 5, 8.5, 12, 16];
    const r = solveOde({ rhs: arenstorf, t0: 0, y0: ARENSTORF_Y0, tEnd: ARENSTORF_T, rtol: 1e-11, atol: 1e-11, outputTimes: times });
    expect(r.outputCount).toBe(times.length);
    times.forEach((time, k) => {
      const ref = s.solve(arenstorfArray, 0, ARENSTORF_Y0, time).y;
      // Dense output at rtol 1e-11; the reference integrator at 1e-12: agreement to 1e-7 absolute (positions are O(1)).
      for (let i = 0; i < 4; i++) close(r.output![k * 4 + i]!, ref[i]!, 0, 1e-7);
    });
  });

  it("converges as the tolerance falls: the end error shrinks about in proportion to it (slope 0.8 to 1.2 in log–log)", () => {
    const tols = [1e-6, 1e-7, 1e-8, 1e-9, 1e-10, 1e-11];
    const errs = tols.map((tol) => {
      const r = solveOde({ rhs: arenstorf, t0: 0, y0: ARENSTORF_Y0, tEnd: ARENSTORF_T, rtol: tol, atol: tol });
      return Math.hypot(r.y[0]! - ARENSTORF_Y0[0]!, r.y[1]! - ARENSTORF_Y0[1]!);
    });
    for (let i = 1; i < errs.length; i++) expect(errs[i]!).toBeLessThan(errs[i - 1]!);
    // Least-squares slope of log(err) against log(tol).
    const xs = tols.map(Math.log10);
    const ys = errs.map(Math.log10);
    const mx = xs.reduce((a, b) => a + b) / xs.length;
    const my = ys.reduce((a, b) => a + b) / ys.length;
    const slope = xs.reduce((s, x, i) => s + (x - mx) * (ys[i]! - my), 0) / xs.reduce((s, x) => s + (x - mx) ** 2, 0);
    expect(slope).toBeGreaterThan(0.8);
    expect(slope).toBeLessThan(1.2);
  });
});

describe("order of the method (dormand-prince-1980: 5th-order solution, 4th-order continuous extension)", () => {
  // One step of size h on y' = −y from y = 1 (tolerances loose enough that the step is always accepted).
  const oneStep = (h: number, theta = 1) => {
    let mid = Number.NaN;
    const r = solveOde({
      rhs: (_t, y, f) => {
        f[0] = -y[0]!;
      },
      t0: 0,
      y0: [1],
      tEnd: h,
      initialStep: h,
      rtol: 1,
      atol: 1,
      onStep: (s) => {
        mid = s.interpolateComponent(0, theta * h);
        return undefined;
      },
    });
    expect(r.accepted).toBe(1);
    return { end: Math.abs(r.y[0]! - Math.exp(-h)), dense: Math.abs(mid - Math.exp(-theta * h)) };
  };

  it("has local error O(h⁶): halving the step divides the one-step error by about 2⁶ = 64", () => {
    const ratio = oneStep(0.2).end / oneStep(0.1).end;
    expect(ratio).toBeGreaterThan(50);
    expect(ratio).toBeLessThan(80);
  });

  it("has dense output error O(h⁵) inside the step: halving the step divides it by about 2⁵ = 32", () => {
    const ratio = oneStep(0.4, 0.5).dense / oneStep(0.2, 0.5).dense;
    expect(ratio).toBeGreaterThan(25);
    expect(ratio).toBeLessThan(40);
  });
});

describe("problems with exact solutions", () => {
  it.each([
    { lambda: -1, tEnd: 5 },
    { lambda: 1, tEnd: 5 },
    { lambda: -50, tEnd: 1 },
  ])("y' = λy with λ = $lambda follows e^(λt) (the linear test equation, hairer-norsett-wanner-1 §II.4)", ({ lambda, tEnd }) => {
    const times = Array.from({ length: 11 }, (_, i) => (i * tEnd) / 10);
    const r = solveOde({
      rhs: (_t, y, f) => {
        f[0] = lambda * y[0]!;
      },
      t0: 0,
      y0: [1],
      tEnd,
      rtol: 1e-10,
      atol: 1e-14,
      outputTimes: times,
    });
    // Global error of an rtol = 1e-10 run over a few time constants: within 1e-8 relative.
    for (const [k, time] of times.entries()) close(r.output![k]!, Math.exp(lambda * time), 1e-8, 1e-14);
  });

  it("keeps a harmonic oscillator's energy ½(x² + v²) to 1e-8 over ten periods and follows cos t, −sin t", () => {
    let worst = 0;
    const r = solveOde({
      rhs: (_t, y, f) => {
        f[0] = y[1]!;
        f[1] = -y[0]!;
      },
      t0: 0,
      y0: [1, 0],
      tEnd: 20 * Math.PI,
      rtol: 1e-11,
      atol: 1e-13,
      onStep: (s) => {
        worst = Math.max(worst, Math.abs(0.5 * (s.y[0]! ** 2 + s.y[1]! ** 2) - 0.5));
        return undefined;
      },
    });
    expect(worst).toBeLessThan(1e-8);
    close(r.y[0]!, 1, 0, 1e-8);
    close(r.y[1]!, 0, 0, 1e-8);
  });
});

describe("step-size control (hairer-norsett-wanner-1 §II.4) on the Brusselator (§II.10, BRUS)", () => {
  const ref = new Solver(2);
  ref.relativeTolerance = 1e-12;
  ref.absoluteTolerance = 1e-12;
  ref.maxSteps = 100000;
  const refEnd = ref.solve((_x, [a, b]) => [1 + a! * a! * b! - 4 * a!, 3 * a! - a! * a! * b!], 0, [1.5, 3], 20).y;

  it("matches odex at t = 20 to within 1e-6 at rtol = 1e-9", () => {
    const r = solveOde({ rhs: brusselator, t0: 0, y0: [1.5, 3], tEnd: 20, rtol: 1e-9, atol: 1e-9 });
    close(r.y[0]!, refEnd[0]!, 0, 1e-6);
    close(r.y[1]!, refEnd[1]!, 0, 1e-6);
  });

  it("adapts the step to the solution: steps vary by more than 10× along the limit cycle", () => {
    const sizes: number[] = [];
    solveOde({
      rhs: brusselator,
      t0: 0,
      y0: [1.5, 3],
      tEnd: 20,
      rtol: 1e-6,
      atol: 1e-6,
      onStep: (s) => {
        sizes.push(s.t - s.tPrev);
        return undefined;
      },
    });
    const inner = sizes.slice(1, -1);
    expect(Math.max(...inner) / Math.min(...inner)).toBeGreaterThan(10);
  });

  it("takes about 10^(1/5) ≈ 1.6 times more steps for each tenfold tighter tolerance (error ∝ h⁵ per step)", () => {
    const counts = [1e-5, 1e-7, 1e-9].map((tol) => solveOde({ rhs: brusselator, t0: 0, y0: [1.5, 3], tEnd: 20, rtol: tol, atol: tol }).accepted);
    const perDecade = (counts[2]! / counts[0]!) ** (1 / 4);
    expect(perDecade).toBeGreaterThan(1.4);
    expect(perDecade).toBeLessThan(1.9);
  });

  it("starts with the step of the §II.4 algorithm (d0, d1, d2 and h1 = (0.01/max(d1, d2))^(1/5)), then adapts", () => {
    let first = 0;
    solveOde({
      rhs: brusselator,
      t0: 0,
      y0: [1.5, 3],
      tEnd: 20,
      rtol: 1e-6,
      atol: 1e-6,
      onStep: (s) => {
        if (first === 0) first = s.t - s.tPrev;
        return undefined;
      },
    });
    // The algorithm written out here independently: sc_i = atol + rtol·|y0_i|, RMS norms.
    const y0 = [1.5, 3];
    const f0 = [1 + 1.5 * 1.5 * 3 - 6, 4.5 - 1.5 * 1.5 * 3];
    const sc = y0.map((v) => 1e-6 + 1e-6 * Math.abs(v));
    const rms = (v: number[]) => Math.sqrt(v.reduce((s, x, i) => s + (x / sc[i]!) ** 2, 0) / 2);
    const d0 = rms(y0);
    const d1 = rms(f0);
    const h0 = 0.01 * (d0 / d1);
    const y1 = y0.map((v, i) => v + h0 * f0[i]!);
    const f1 = [1 + y1[0]! ** 2 * y1[1]! - 4 * y1[0]!, 3 * y1[0]! - y1[0]! ** 2 * y1[1]!];
    const d2 = rms(f1.map((v, i) => v - f0[i]!)) / h0;
    const h = Math.min(100 * h0, (0.01 / Math.max(d1, d2)) ** 0.2);
    // The first accepted step is this h or a rejected-and-shrunk version of it.
    expect(first).toBeLessThanOrEqual(h * (1 + 1e-12));
    expect(first).toBeGreaterThan(0.2 * h);
  });
});

describe("events located on the dense output (Illinois method, dowell-jarratt-1971)", () => {
  it("finds the zero of sin t at π (y = sin t from y'' = −y), to within 1e-9", () => {
    const hits: number[] = [];
    solveOde({
      rhs: oscillator,
      t0: 0,
      y0: [0, 1],
      tEnd: 4,
      rtol: 1e-10,
      atol: 1e-12,
      events: [{ g: (_t, y) => y[0]! }],
      onEvent: (hit) => {
        hits.push(hit.t);
        return "continue";
      },
    });
    expect(hits).toHaveLength(1);
    close(hits[0]!, Math.PI, 0, 1e-9);
  });

  it("keeps only the crossings its direction filter asks for: falling at π and 3π, rising at 2π", () => {
    const falling: number[] = [];
    const rising: number[] = [];
    solveOde({
      rhs: oscillator,
      t0: 0,
      y0: [0, 1],
      tEnd: 10,
      rtol: 1e-10,
      atol: 1e-12,
      events: [
        { g: (_t, y) => y[0]!, direction: -1 },
        { g: (_t, y) => y[0]!, direction: 1 },
      ],
      onEvent: (hit) => {
        (hit.index === 0 ? falling : rising).push(hit.t);
        expect(hit.direction).toBe(hit.index === 0 ? -1 : 1);
        return "continue";
      },
    });
    expect(falling.map((t) => t / Math.PI)).toEqual([expect.closeTo(1, 9), expect.closeTo(3, 9)]);
    expect(rising.map((t) => t / Math.PI)).toEqual([expect.closeTo(2, 9)]);
  });

  it("bounces a ball at the exact impact times of free fall, restarting cleanly after each (h = ½gt², e = 0.8)", () => {
    // Free fall (openstax-university-physics-1 §3.5): from 10 m at rest the first impact is at √(2h/g);
    // with restitution e the k-th flight lasts 2·e^k·v₁/g, v₁ = g·t₁.
    const g = 9.81;
    const e = 0.8;
    const impacts: number[] = [];
    const r = solveOde({
      rhs: (_t, y, f) => {
        f[0] = y[1]!;
        f[1] = -g;
      },
      t0: 0,
      y0: [10, 0],
      tEnd: 12,
      rtol: 1e-10,
      atol: 1e-12,
      maxStep: 0.05, // a flight is never shorter than this here, so no bounce hides inside one step
      events: [{ g: (_t, y) => y[0]!, direction: -1 }],
      onEvent: (hit, y) => {
        impacts.push(hit.t);
        y[0] = 0;
        y[1] = -e * y[1]!;
        return "restart";
      },
    });
    const t1 = Math.sqrt((2 * 10) / g);
    const expected = [t1];
    while (expected.length < impacts.length) expected.push(expected.at(-1)! + (2 * e ** expected.length * g * t1) / g);
    expect(impacts.length).toBeGreaterThanOrEqual(5);
    for (const [k, t] of impacts.entries()) close(t, expected[k]!, 0, 1e-9);
    expect(r.events).toBe(impacts.length);
  });

  it("stops at an event when the callback says so, with the state there", () => {
    const r = solveOde({
      rhs: oscillator,
      t0: 0,
      y0: [0, 1],
      tEnd: 10,
      rtol: 1e-10,
      atol: 1e-12,
      events: [{ g: (_t, y) => y[0]! - 0.5, direction: 1 }],
      onEvent: () => "stop",
    });
    expect(r.status).toBe("stopped");
    close(r.t, Math.PI / 6, 0, 1e-9);
    close(r.y[0]!, 0.5, 0, 1e-9);
  });

  it("restarts with at most the step restartStep allows, and shows f(t, y) at each accepted point", () => {
    const firstAfter: number[] = [];
    let cut = false;
    let next = false;
    solveOde({
      rhs: oscillator,
      t0: 0,
      y0: [0, 1],
      tEnd: 4,
      rtol: 1e-8,
      atol: 1e-10,
      events: [{ g: (_t, y) => y[0]! }],
      onEvent: () => {
        cut = true;
        return "restart";
      },
      restartStep: () => 1e-4,
      onStep: (s) => {
        close(s.dydt[0]!, s.y[1]!, 1e-15, 1e-15);
        close(s.dydt[1]!, -s.y[0]!, 1e-15, 1e-15);
        if (next) {
          firstAfter.push(s.t - s.tPrev);
          next = false;
        }
        if (cut) {
          next = true; // this step ended at the event: the next one is the first after the restart
          cut = false;
        }
        return undefined;
      },
    });
    expect(firstAfter.length).toBe(1);
    expect(firstAfter[0]!).toBeLessThanOrEqual(1e-4 * (1 + 1e-9)); // t − tPrev carries the round-off of t ≈ π
  });

  it("gives the same solution whether a record-only event continues or restarts", () => {
    const run = (action: "continue" | "restart") => sineCrossings({ rtol: 1e-10, atol: 1e-12, onEvent: () => action });
    const a = run("continue");
    const b = run("restart");
    close(a.y[0]!, b.y[0]!, 0, 1e-9);
    expect(b.steps).toBeGreaterThan(a.steps);
  });
});

describe("time events", () => {
  it("lands exactly on each tick and applies a switched input there (a drive toggled at 0.1 s ticks)", () => {
    let u = 1;
    const seen: number[] = [];
    const r = solveOde({
      rhs: (_t, _y, f) => {
        f[0] = u;
      },
      t0: 0,
      y0: [0],
      tEnd: 1,
      nextTimeEvent: (t) => Math.floor(t * 10 + 1 + 1e-9) / 10,
      onTimeEvent: (t) => {
        seen.push(t);
        u = 1 - u;
        return "restart";
      },
    });
    expect(seen).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]);
    // On for 0.1 s out of every 0.2 s: y(1) = 0.5 exactly up to round-off.
    close(r.y[0]!, 0.5, 0, 1e-12);
  });

  it("cuts a step at a time event an event callback schedules inside it (sample and hold after a crossing)", () => {
    let drive = 0;
    let pending = Number.POSITIVE_INFINITY;
    const r = solveOde({
      rhs: (_t, _y, f) => {
        f[0] = 1;
        f[1] = drive;
      },
      t0: 0,
      y0: [0, 0],
      tEnd: 2,
      events: [{ g: (t) => t - 0.3 }],
      onEvent: (hit) => {
        pending = hit.t + 0.25; // switch on 0.25 after the crossing
        return "continue";
      },
      nextTimeEvent: () => pending,
      onTimeEvent: () => {
        drive = 1;
        pending = Number.POSITIVE_INFINITY;
        return "restart";
      },
    });
    // ∫ drive = 2 − 0.55.
    close(r.y[1]!, 2 - 0.55, 0, 1e-9);
    expect(r.timeEvents).toBe(1);
  });
});

describe("the step budget and failures", () => {
  it("stops a stiff problem at the budget and says so, with finite numbers (Van der Pol, μ = 1000)", () => {
    // Van der Pol (hairer-norsett-wanner-1 §I.16): y1' = y2, y2' = μ((1 − y1²)y2 − y1), stiff for large μ.
    const r = solveOde({
      rhs: (_t, y, f) => {
        f[0] = y[1]!;
        f[1] = 1000 * ((1 - y[0]! ** 2) * y[1]! - y[0]!);
      },
      t0: 0,
      y0: [2, 0],
      tEnd: 3000,
      maxSteps: 2000,
    });
    expect(r.status).toBe("step-limit");
    expect(r.steps).toBe(2000);
    expect(r.t).toBeGreaterThan(0);
    expect(r.t).toBeLessThan(3000);
    for (const v of r.y) expect(Number.isFinite(v)).toBe(true);
  });

  it("never loops forever on an event that keeps firing (a chattering switch spends the budget)", () => {
    let mode = 1;
    const r = solveOde({
      rhs: (_t, _y, f) => {
        f[0] = mode;
      },
      t0: 0,
      y0: [-1],
      tEnd: 10,
      maxSteps: 500,
      events: [{ g: (_t, y) => y[0]! }],
      onEvent: () => {
        mode = -mode;
        return "restart";
      },
    });
    expect(r.status).toBe("step-limit");
  });

  it("throws a named OdeNonFiniteError when the derivative is not finite at the start", () => {
    const bad = () =>
      solveOde({
        rhs: (_t, _y, f) => {
          f[0] = Number.NaN;
        },
        t0: 0,
        y0: [1],
        tEnd: 1,
      });
    expect(bad).toThrowError(OdeNonFiniteError);
    expect(bad).toThrowError("the derivative 0 is not a finite number (NaN) at t = 0");
  });

  it("throws a named OdeNonFiniteError when no step can get past a point where the derivative is NaN", () => {
    const bad = () =>
      solveOde({
        rhs: (t, _y, f) => {
          f[0] = Math.sqrt(1 - t);
        },
        t0: 0,
        y0: [0],
        tEnd: 2,
      });
    expect(bad).toThrowError(OdeNonFiniteError);
  });

  it.each([
    { what: "tEnd not after t0", args: { tEnd: 0 }, param: "tEnd" },
    { what: "a NaN start time", args: { t0: Number.NaN }, param: "t0" },
    { what: "a state of the wrong length", args: { y0: [1, 2] }, param: "y0" },
    { what: "a NaN in the state", args: { y0: [Number.NaN] }, param: "y0[0]" },
    { what: "rtol 0", args: { rtol: 0 }, param: "rtol" },
    { what: "a negative atol", args: { atol: -1 }, param: "atol" },
    { what: "a fractional budget", args: { maxSteps: 10.5 }, param: "maxSteps" },
    { what: "output times out of order", args: { outputTimes: [0.5, 0.2] }, param: "outputTimes[1]" },
    { what: "a negative maximum step", args: { maxStep: -1 }, param: "maxStep" },
  ])("refuses $what with a CalcInputError naming $param", ({ args, param }) => {
    const ode = new DormandPrince45(1);
    const base = { t0: 0, y0: [1] as ArrayLike<number>, tEnd: 1 };
    const { t0, y0, tEnd, ...opts } = { ...base, ...args };
    try {
      ode.solve(
        (_t, y, f) => {
          f[0] = -y[0]!;
        },
        t0,
        y0,
        tEnd,
        opts,
      );
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CalcInputError);
      expect((e as CalcInputError).param).toBe(param);
    }
  });

  it("reuses one integrator for many runs with the same answers", () => {
    const ode = new DormandPrince45(4);
    const a = ode.solve(arenstorf, 0, ARENSTORF_Y0, 3, { rtol: 1e-9, atol: 1e-9 });
    const b = ode.solve(arenstorf, 0, ARENSTORF_Y0, 3, { rtol: 1e-9, atol: 1e-9 });
    expect(Array.from(b.y)).toEqual(Array.from(a.y));
    expect(b.evaluations).toBe(a.evaluations);
  });

  it("never returns a non-finite number for random linear 2×2 systems and tolerances (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 4, maxLength: 4 }),
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 2, maxLength: 2 }),
        fc.double({ min: 1e-12, max: 1e-2, noNaN: true }),
        (m, y0, rtol) => {
          const r = solveOde({
            rhs: (_t, y, f) => {
              f[0] = m[0]! * y[0]! + m[1]! * y[1]!;
              f[1] = m[2]! * y[0]! + m[3]! * y[1]!;
            },
            t0: 0,
            y0,
            tEnd: 1,
            rtol,
            atol: rtol,
            maxSteps: 3000,
          });
          expect(["done", "step-limit"]).toContain(r.status);
          for (const v of r.y) expect(Number.isFinite(v)).toBe(true);
        },
      ),
      { numRuns: 150 },
    );
  });
});
