/**
 * Edges of the integrator's events, time events, restarts, step budget and refusals
 * (calc/numerics/ode.ts, ode-types.ts): problems whose answers are known in closed form, so that
 * each case says where an event lands, in which order callbacks run and what a result reports.
 */
import { describe, expect, it } from "vitest";
import { type OdeRhs, OdeNonFiniteError, solveOde } from "../../../calc/numerics/ode.ts";
import { oscillator, sineCrossings } from "../../support/ode-problems.ts";
import { refusal } from "../../support/refusal.ts";

/** y' = 1 from y(t0) = y0: y = y0 + (t − t0) exactly, so one step can cover the whole span. */
const ramp: OdeRhs = (_t, _y, f) => {
  f[0] = 1;
};

/** The OdeNonFiniteError a call throws (fails the test otherwise). */
const nonFinite = (run: () => unknown): OdeNonFiniteError => {
  const error = refusal(run);
  expect(error).toBeInstanceOf(OdeNonFiniteError);
  return error as OdeNonFiniteError;
};

describe("OdeNonFiniteError names the function that gave a non-finite number", () => {
  it("an event function that is NaN at the start: events[1], 'a finite event function at every step'", () => {
    const error = nonFinite(() => solveOde({ rhs: ramp, t0: 0, y0: [0], tEnd: 1, events: [{ g: (t) => t }, { g: () => Number.NaN }] }));
    expect({ param: error.param, unit: error.unit, expected: error.expected, name: error.name }).toEqual({
      param: "events[1]",
      unit: "",
      expected: "a finite event function at every step",
      name: "OdeNonFiniteError",
    });
    expect({ t: error.t, quantity: error.quantity, index: error.index }).toEqual({ t: 0, quantity: "event", index: 1 });
    expect(error.value).toBeNaN();
    expect(error.message).toBe("the event 1 is not a finite number (NaN) at t = 0");
  });

  it("a derivative that is infinite at the start: rhs, 'a finite derivative at every step'", () => {
    const error = nonFinite(() =>
      solveOde({
        rhs: (_t, _y, f) => {
          f[0] = 1;
          f[1] = Number.POSITIVE_INFINITY;
        },
        t0: 0,
        y0: [0, 0],
        tEnd: 1,
      }),
    );
    expect({ param: error.param, unit: error.unit, expected: error.expected, name: error.name, quantity: error.quantity, index: error.index }).toEqual({
      param: "rhs",
      unit: "",
      expected: "a finite derivative at every step",
      name: "OdeNonFiniteError",
      quantity: "derivative",
      index: 1,
    });
    expect(error.message).toBe("the derivative 1 is not a finite number (Infinity) at t = 0");
  });

  it("a state an event callback makes NaN: the restart names rhs and the state component", () => {
    const error = nonFinite(() =>
      solveOde({
        rhs: ramp,
        t0: 0,
        y0: [0],
        tEnd: 1,
        initialStep: 1,
        events: [{ g: (_t, y) => y[0]! - 0.5 }],
        onEvent: (_hit, y) => {
          y[0] = Number.NaN;
          return "restart";
        },
      }),
    );
    expect({ param: error.param, expected: error.expected, quantity: error.quantity, index: error.index }).toEqual({
      param: "rhs",
      expected: "a finite derivative at every step",
      quantity: "state",
      index: 0,
    });
    // y = t on a single step [0, 1]: the crossing of 0.5 is located to the default 1e-13.
    expect(error.t).toBeCloseTo(0.5, 12);
  });

  it("an event function that is NaN only inside a step names that event and the time tried", () => {
    // g = t − 1 at both ends of the single step [0, 2] (−1 and 1); false position tries the
    // straight line's zero first, t = 1, where this g is NaN.
    const error = nonFinite(() =>
      solveOde({ rhs: ramp, t0: 0, y0: [0], tEnd: 2, initialStep: 2, events: [{ g: () => 1 }, { g: (t) => (t > 0.5 && t < 1.5 ? Number.NaN : t - 1) }] }),
    );
    expect({ param: error.param, quantity: error.quantity, index: error.index, t: error.t }).toEqual({
      param: "events[1]",
      quantity: "event",
      index: 1,
      t: 1,
    });
    expect(error.message).toBe("the event 1 is not a finite number (NaN) at t = 1");
  });

  it("an event function a 'continue' callback leaves NaN is read again at the step's end and refused there", () => {
    let broken = false;
    const error = nonFinite(() =>
      solveOde({
        rhs: ramp,
        t0: 0,
        y0: [0],
        tEnd: 1,
        initialStep: 1,
        events: [{ g: (_t, y) => (broken ? Number.NaN : y[0]! - 0.5) }],
        onEvent: () => {
          broken = true;
          return "continue";
        },
      }),
    );
    // The single step [0, 1] ends at t = 1, where g is read again after the callback.
    expect({ param: error.param, quantity: error.quantity, index: error.index, t: error.t }).toEqual({ param: "events[0]", quantity: "event", index: 0, t: 1 });
    expect(error.message).toBe("the event 0 is not a finite number (NaN) at t = 1");
  });
});

describe("where an event lands and in which order events are handled", () => {
  it("hands crossings inside one step to the callback in time order, and equal times in index order", () => {
    // y = t on the single step [0, 1]; the events cross at 0.7, 0.5, 0.3, 0.5 (indices 0 to 3).
    const seen: [number, number][] = [];
    const r = solveOde({
      rhs: ramp,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      events: [{ g: (t) => t - 0.7 }, { g: (t) => t - 0.5 }, { g: (t) => t - 0.3 }, { g: (t) => t - 0.5 }],
      onEvent: (hit) => {
        seen.push([hit.index, hit.t]);
        return "continue";
      },
    });
    expect(r.accepted).toBe(1);
    expect(seen.map(([i]) => i)).toEqual([2, 1, 3, 0]);
    for (const [i, t] of seen) expect(t).toBeCloseTo([0.7, 0.5, 0.3, 0.5][i]!, 12);
  });

  it("returns the point on the new side of the crossing, within the event tolerance", () => {
    // y'' = −y from (0, 1): y = sin t falls through 0 at π (y' = cos π = −1 there).
    for (const eventTolerance of [1e-3, 1e-6, 1e-12]) {
      let at = Number.NaN;
      let y0 = Number.NaN;
      solveOde({
        rhs: oscillator,
        t0: 0,
        y0: [0, 1],
        tEnd: 4,
        rtol: 1e-12,
        atol: 1e-14,
        eventTolerance,
        events: [{ g: (_t, y) => y[0]!, direction: -1 }],
        onEvent: (hit, y) => {
          at = hit.t;
          y0 = y[0]!;
          return "stop";
        },
      });
      expect(at).toBeGreaterThanOrEqual(Math.PI - 1e-11);
      expect(at - Math.PI).toBeLessThanOrEqual(eventTolerance + 1e-11);
      expect(y0).toBeLessThanOrEqual(0); // the new side (g ≤ 0 after a fall)
    }
  });

  it("reports a crossing that reaches exactly 0 at the step's end as falling, at that end exactly", () => {
    // g = 0.9 − t from t0 = 0.2 on one step: g(0.9) = 0 exactly. 0.2 + (0.9 − 0.2) is 0.8999999999999999
    // in double arithmetic, so the time reported must be the step's end itself.
    const hits: { t: number; direction: number }[] = [];
    const r = solveOde({
      rhs: ramp,
      t0: 0.2,
      y0: [0],
      tEnd: 0.9,
      initialStep: 1,
      events: [{ g: (t) => 0.9 - t }],
      onEvent: (hit) => {
        hits.push({ t: hit.t, direction: hit.direction });
        return "continue";
      },
    });
    expect(hits).toEqual([{ t: 0.9, direction: -1 }]);
    expect(r.events).toBe(1);
  });

  it("locates a smooth crossing in a handful of event evaluations (false position converges superlinearly)", () => {
    // g = y^p − 0.5 on y = t, one step [0, 1]: zero at 0.5^(1/p); its mirror 0.5 − (1 − y)^p, zero at
    // 1 − 0.5^(1/p). Illinois (dowell-jarratt-1971) needs few evaluations where plain false position
    // creeps from one side (a convex g keeps one end fixed, the mirror the other); count g's calls
    // between the step-end evaluations.
    const shapes = [2, 20].flatMap((p) => [
      { g: (y: number) => y ** p - 0.5, zero: 0.5 ** (1 / p) },
      { g: (y: number) => 0.5 - (1 - y) ** p, zero: 1 - 0.5 ** (1 / p) },
    ]);
    for (const shape of shapes) {
      let calls = 0;
      let inside = Number.NaN;
      let at = Number.NaN;
      solveOde({
        rhs: ramp,
        t0: 0,
        y0: [0],
        tEnd: 1,
        initialStep: 1,
        events: [
          {
            g: (_t, y) => {
              calls++;
              return shape.g(y[0]!);
            },
          },
        ],
        onEvent: (hit) => {
          inside = calls - 2; // minus the evaluations at t = 0 and t = 1
          at = hit.t;
          return "continue";
        },
      });
      expect(at).toBeGreaterThanOrEqual(shape.zero);
      expect(at - shape.zero).toBeLessThanOrEqual(1e-13);
      expect(inside).toBeGreaterThanOrEqual(1);
      expect(inside).toBeLessThanOrEqual(15);
    }
  });

  it("never asks for a time tolerance below 8 ulp of t: a 1e-300 tolerance ends like the default", () => {
    const count = (eventTolerance?: number) => {
      let calls = 0;
      let at = Number.NaN;
      solveOde({
        rhs: oscillator,
        t0: 0,
        y0: [0, 1],
        tEnd: 4,
        rtol: 1e-10,
        atol: 1e-12,
        eventTolerance,
        events: [
          {
            g: (_t, y) => {
              calls++;
              return y[0]!;
            },
          },
        ],
        onEvent: (hit) => {
          at = hit.t;
          return "stop";
        },
      });
      return { calls, at };
    };
    const tiny = count(1e-300);
    expect(tiny.at).toBeCloseTo(Math.PI, 9);
    expect(tiny.calls).toBeLessThanOrEqual(count().calls + 5);
  });

  it("stops locating at 8 ulp of the step's larger end when the tolerance asked is below it (a step from −1 to 0, tolerance 1e-300)", () => {
    // A step ending at t = 0 has no 8-ulp floor (8·ε·|0| = 0): a 1e-300 tolerance cannot be met in
    // θ ∈ [0, 1] with doubles, so the search must stop on its own and still return a point after the zero.
    let calls = 0;
    let at = Number.NaN;
    const r = solveOde({
      rhs: ramp,
      t0: -1,
      y0: [-1],
      tEnd: 0,
      initialStep: 1,
      eventTolerance: 1e-300,
      events: [
        {
          g: (_t, y) => {
            calls++;
            return y[0]! + 0.25;
          },
        },
      ],
      onEvent: (hit) => {
        at = hit.t;
        return "continue";
      },
    });
    expect(r.status).toBe("done");
    expect(at).toBeGreaterThanOrEqual(-0.25);
    // The floor is 8·ε·max(|t|, |t1|) = 8·ε·1 ≈ 1.8e-15, not 8·ε·|t1| = 0 (which ran the search to its cap).
    // The bracket ends within that floor; the time reported, t + θ·h, adds its own rounding (2.0e-15 here).
    expect(Math.abs(at + 0.25)).toBeLessThanOrEqual(16 * Number.EPSILON);
    expect(Math.abs(at + 0.25)).toBeGreaterThan(0); // not searched down to the 1e-300 asked
    // g read at t = −1 and t = 0, again after the "continue", and at most 200 tries in between.
    expect(calls).toBeLessThanOrEqual(3 + 200);
  });

  it("counts only the crossings a direction filter keeps (sin t on [0, 10]: falling at π, 3π; rising at 2π)", () => {
    const r = solveOde({
      rhs: oscillator,
      t0: 0,
      y0: [0, 1],
      tEnd: 10,
      rtol: 1e-10,
      atol: 1e-12,
      events: [
        { g: (_t, y) => y[0]!, direction: 1 },
        { g: (_t, y) => y[0]!, direction: 1 },
      ],
      onEvent: () => "continue",
    });
    expect(r.events).toBe(2);
    const both = sineCrossings({ rtol: 1e-10, atol: 1e-12, onEvent: () => "continue" });
    expect(both.events).toBe(3);
  });
});

describe("what continue, restart and stop do", () => {
  it("'continue' reads the event again, so a callback can move its own zero (a counter of 0.25 marks on y = t)", () => {
    let target = 0.25;
    const marks: number[] = [];
    const r = solveOde({
      rhs: ramp,
      t0: 0,
      y0: [0],
      tEnd: 1.1,
      maxStep: 0.2,
      events: [{ g: (_t, y) => y[0]! - target }],
      onEvent: (hit) => {
        marks.push(hit.t);
        target += 0.25;
        return "continue";
      },
    });
    expect(marks).toHaveLength(4);
    for (const [k, t] of marks.entries()) expect(t).toBeCloseTo(0.25 * (k + 1), 12);
    expect(r.events).toBe(4);
  });

  it("'restart' applies the callback's change of state at the event, and the sampled output follows it", () => {
    // y = t until the crossing of 0.6, then y jumps by 10: y(1) = 1 + 10; the sample at 0.5 is 0.5.
    const r = solveOde({
      rhs: ramp,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      outputTimes: [0.5, 0.8],
      events: [{ g: (_t, y) => y[0]! - 0.6, direction: 1 }],
      onEvent: (_hit, y) => {
        y[0]! += 10;
        return "restart";
      },
    });
    expect(r.status).toBe("done");
    expect(r.t).toBe(1);
    expect(r.y[0]!).toBeCloseTo(11, 12);
    expect(r.output![0]!).toBeCloseTo(0.5, 12);
    expect(r.output![1]!).toBeCloseTo(10.8, 12);
    expect(r.events).toBe(1);
    // One restart counted as a step: accepted + rejected + 1.
    expect(r.steps).toBe(r.accepted + r.rejected + 1);
  });

  it("'restart' at an event inside a step that lands on a time event keeps the event's change", () => {
    // Time event at 0.5 (the first step lands on it), the event at 0.3 adds 10 to y.
    const ticks: number[] = [];
    const r = solveOde({
      rhs: ramp,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      events: [{ g: (_t, y) => y[0]! - 0.3, direction: 1 }],
      onEvent: (_hit, y) => {
        y[0]! += 10;
        return "restart";
      },
      nextTimeEvent: (t) => (t < 0.5 ? 0.5 : Number.POSITIVE_INFINITY),
      onTimeEvent: (t) => {
        ticks.push(t);
        return "continue";
      },
    });
    expect(ticks).toEqual([0.5]);
    expect(r.y[0]!).toBeCloseTo(11, 12);
    expect(r.timeEvents).toBe(1);
  });

  it("the default answer (no onEvent) is a restart: the same end state, one more step per event", () => {
    const plain = solveOde({ rhs: ramp, t0: 0, y0: [0], tEnd: 1, initialStep: 1, events: [{ g: (t) => t - 0.4 }] });
    expect(plain.events).toBe(1);
    expect(plain.y[0]!).toBeCloseTo(1, 12);
    expect(plain.steps).toBe(plain.accepted + plain.rejected + 1);
  });

  it("'stop' ends the run at the event: onStep never sees that point, and onStep's own 'stop' ends it too", () => {
    const stepEnds: number[] = [];
    const r = solveOde({
      rhs: oscillator,
      t0: 0,
      y0: [0, 1],
      tEnd: 10,
      rtol: 1e-10,
      atol: 1e-12,
      events: [{ g: (_t, y) => y[0]!, direction: -1 }],
      onEvent: () => "stop",
      onStep: (s) => {
        stepEnds.push(s.t);
        return undefined;
      },
    });
    expect(r.status).toBe("stopped");
    expect(r.t).toBeCloseTo(Math.PI, 9);
    expect(stepEnds.every((t) => t < Math.PI - 1e-9)).toBe(true);
    expect(r.steps).toBe(r.accepted + r.rejected);

    const byStep = solveOde({ rhs: ramp, t0: 0, y0: [0], tEnd: 10, maxStep: 1, onStep: (s) => (s.t >= 3 ? "stop" : undefined) });
    expect(byStep.status).toBe("stopped");
    expect(byStep.t).toBeGreaterThanOrEqual(3);
    expect(byStep.t).toBeLessThan(10);
    expect(byStep.y[0]!).toBeCloseTo(byStep.t, 12);
  });

  it("after a 'stop' the event function is not called again", () => {
    let calls = 0;
    let atStop = -1;
    solveOde({
      rhs: ramp,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      events: [
        {
          g: (t) => {
            calls++;
            return t - 0.5;
          },
        },
      ],
      onEvent: () => {
        atStop = calls;
        return "stop";
      },
    });
    expect(calls).toBe(atStop);
  });

  it("a tick the right-hand side schedules at the very end of a step fires there, with no restart counted after a 'stop'", () => {
    // One step [0, 1] of a run to 2 (not a landing step); f schedules a tick at 1 while it is tried.
    let pending = Number.POSITIVE_INFINITY;
    const stepEnds: number[] = [];
    const r = solveOde({
      rhs: (t, _y, f) => {
        f[0] = 1;
        if (t > 0.3) pending = 1;
      },
      t0: 0,
      y0: [0],
      tEnd: 2,
      initialStep: 1,
      nextTimeEvent: () => pending,
      onTimeEvent: () => "stop",
      onStep: (s) => {
        stepEnds.push(s.t);
        return undefined;
      },
    });
    expect(r.status).toBe("stopped");
    expect(r.t).toBe(1);
    expect(r.steps).toBe(r.accepted + r.rejected);
    expect(stepEnds).toEqual([]);
  });

  it("a time event's 'stop' ends the run on the tick itself with no restart counted", () => {
    const r = solveOde({ rhs: ramp, t0: 0, y0: [0], tEnd: 1, initialStep: 1, nextTimeEvent: () => 0.5, onTimeEvent: () => "stop" });
    expect(r.status).toBe("stopped");
    expect(r.t).toBe(0.5);
    expect(r.y[0]!).toBeCloseTo(0.5, 14);
    expect(r.timeEvents).toBe(1);
    expect(r.steps).toBe(r.accepted + r.rejected);
  });

  it("a time event a state event schedules before a later crossing in the same step runs first", () => {
    // y = t on one step [0, 1]: event 0 at 0.3 schedules a tick at 0.5; event 1 crosses at 0.7.
    const order: string[] = [];
    let pending = Number.POSITIVE_INFINITY;
    const r = solveOde({
      rhs: ramp,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      events: [{ g: (t) => t - 0.3 }, { g: (t) => t - 0.7 }],
      onEvent: (hit) => {
        order.push(`event ${hit.index} at ${hit.t.toFixed(6)}`);
        if (hit.index === 0) pending = 0.5;
        return "continue";
      },
      nextTimeEvent: () => pending,
      onTimeEvent: (t) => {
        order.push(`tick at ${t}`);
        pending = Number.POSITIVE_INFINITY;
        return "restart";
      },
    });
    expect(order).toEqual(["event 0 at 0.300000", "tick at 0.5", "event 1 at 0.700000"]);
    expect(r.events).toBe(2);
  });

  it("a tick scheduled at the very time of a crossing comes after that crossing's callbacks", () => {
    // Two events cross together at 0.4; the first schedules a tick at its own time.
    const order: string[] = [];
    let pending = Number.POSITIVE_INFINITY;
    solveOde({
      rhs: ramp,
      t0: 0,
      y0: [0],
      tEnd: 1,
      initialStep: 1,
      events: [{ g: (t) => t - 0.4 }, { g: (t) => t - 0.4 }],
      onEvent: (hit) => {
        order.push(`event ${hit.index}`);
        if (hit.index === 0) pending = hit.t;
        return "continue";
      },
      nextTimeEvent: () => pending,
      onTimeEvent: () => {
        order.push("tick");
        pending = Number.POSITIVE_INFINITY;
        return "continue";
      },
    });
    expect(order).toEqual(["event 0", "event 1", "tick"]);
  });

  it("a tick the right-hand side schedules inside a step cuts it there with the interpolated state", () => {
    // y = t on one step [0, 2]; while the step is tried, f schedules a tick at 0.5.
    let pending = Number.POSITIVE_INFINITY;
    let seen = Number.NaN;
    const r = solveOde({
      rhs: (t, _y, f) => {
        f[0] = 1;
        if (t > 0.3 && pending === Number.POSITIVE_INFINITY) pending = 0.5;
      },
      t0: 0,
      y0: [0],
      tEnd: 2,
      initialStep: 2,
      nextTimeEvent: () => pending,
      onTimeEvent: (_t, y) => {
        seen = y[0]!;
        pending = 10;
        return "stop";
      },
    });
    expect(r.status).toBe("stopped");
    expect(r.t).toBe(0.5);
    expect(seen).toBeCloseTo(0.5, 14);
  });

  it("a tick that a callback puts in the past fires at the step's end: time never goes back", () => {
    let pending = Number.POSITIVE_INFINITY;
    const ticks: number[] = [];
    const r = solveOde({
      rhs: (t, _y, f) => {
        f[0] = 1;
        if (t > 0.3 && ticks.length === 0) pending = 0;
      },
      t0: 0,
      y0: [0],
      tEnd: 2,
      initialStep: 1,
      nextTimeEvent: () => pending,
      onTimeEvent: (t) => {
        ticks.push(t);
        pending = Number.POSITIVE_INFINITY;
        return "continue";
      },
    });
    expect(ticks).toEqual([1]);
    expect(r.t).toBe(2);
  });
});

describe("the step after a landing or a restart", () => {
  it("after a step shortened to land on a tick, goes on with the step it had planned", () => {
    // y = t: every error estimate is 0, so the step grows tenfold: 0.3, then 3 planned; the tick at
    // 0.31 cuts the second step to 0.01, and the third is the planned 3 (not 10 × 0.01).
    const lengths: number[] = [];
    solveOde({
      rhs: ramp,
      t0: 0,
      y0: [0],
      tEnd: 10,
      initialStep: 0.3,
      nextTimeEvent: (t) => (t < 0.31 ? 0.31 : Number.POSITIVE_INFINITY),
      onTimeEvent: () => "continue",
      onStep: (s) => {
        lengths.push(s.t - s.tPrev);
        return undefined;
      },
    });
    expect(lengths[0]!).toBeCloseTo(0.3, 15);
    expect(lengths[1]!).toBeCloseTo(0.01, 15);
    expect(lengths[2]!).toBeCloseTo(3, 15);
  });

  it("asks restartStep only at restarts, and ignores a cap of 0, a negative one or one above the step", () => {
    const asked: number[] = [];
    const run = (cap: number) =>
      solveOde({
        rhs: ramp,
        t0: 0,
        y0: [0],
        tEnd: 10,
        maxStep: 2,
        initialStep: 1,
        events: [{ g: (_t, y) => y[0]! - 1.5 }],
        restartStep: (t) => {
          asked.push(t);
          return cap;
        },
        onStep: (s) => {
          expect(s.t - s.tPrev).toBeLessThanOrEqual(2);
          return undefined;
        },
      });
    const free = run(100);
    expect(asked).toHaveLength(1);
    expect(asked[0]!).toBeCloseTo(1.5, 11); // default tolerance 1e-13·10
    for (const cap of [0, -1]) {
      const r = run(cap);
      expect(r.status).toBe("done");
      expect(r.accepted).toBe(free.accepted);
    }
    const capped = run(1e-3);
    expect(capped.accepted).toBeGreaterThan(free.accepted);
  });

  it("grows steps smoothly on the Brusselator and never grows one right after a rejection", () => {
    // hairer-norsett-wanner-1 §II.4: h_new = h·min(10, max(0.2, 0.9·err^(−1/5))), and no growth after a
    // rejected step. Rejections are seen as extra right-hand-side calls (6 per trial step, FSAL).
    let calls = 0;
    let last = 0;
    const steps: { h: number; afterRejection: boolean }[] = [];
    solveOde({
      rhs: (_t, y, f) => {
        calls++;
        const a = y[0]!;
        const b = y[1]!;
        f[0] = 1 + a * a * b - 4 * a;
        f[1] = 3 * a - a * a * b;
      },
      t0: 0,
      y0: [1.5, 3],
      tEnd: 20,
      rtol: 1e-6,
      atol: 1e-6,
      onStep: (s) => {
        steps.push({ h: s.t - s.tPrev, afterRejection: calls - last > 6 });
        last = calls;
        return undefined;
      },
    });
    const smooth: number[] = [];
    let afterRejections = 0;
    // Leave out the first step (the starting-step estimate calls f too) and the last (it lands on tEnd).
    for (let k = 1; k + 2 < steps.length; k++) {
      const ratio = steps[k + 1]!.h / steps[k]!.h;
      if (steps[k]!.afterRejection) {
        afterRejections++;
        expect(ratio).toBeLessThanOrEqual(1 + 1e-12);
      } else if (!steps[k + 1]!.afterRejection) smooth.push(ratio);
    }
    expect(afterRejections).toBeGreaterThan(5);
    smooth.sort((x, y) => x - y);
    // An accepted step has err ≤ 1, so the factor is at least 0.9; on a smooth solution it stays near 1.
    expect(smooth[0]!).toBeGreaterThanOrEqual(0.9 - 1e-12);
    expect(smooth[0]!).toBeLessThan(1); // and an accepted step with err above 0.9^5 shrinks the next one
    expect(smooth[Math.floor(smooth.length / 2)]!).toBeLessThan(2);
  });
});

describe("solveOde's refusals of the problem object and y0", () => {
  it.each([
    [null, null],
    [7, 7],
  ])("a problem that is not an object (%s) names problem", (problem, value) => {
    const error = refusal(() => solveOde(problem as never));
    expect({ param: error.param, value: error.value, unit: error.unit, expected: error.expected }).toEqual({
      param: "problem",
      value,
      unit: "",
      expected: "an object { rhs, t0, y0, tEnd, … }",
    });
  });

  it.each([
    [null, null],
    [3, 3],
    ["ab", "ab"],
    [[], 0],
    [{ length: 0 }, 0],
    [{}, undefined],
  ])("a y0 of %j names y0 with what it got", (y0, value) => {
    const error = refusal(() => solveOde({ rhs: ramp, t0: 0, y0: y0 as never, tEnd: 1 }));
    expect({ param: error.param, value: error.value, unit: error.unit, expected: error.expected }).toEqual({
      param: "y0",
      value,
      unit: "",
      expected: "a list of at least 1 number",
    });
  });
});
