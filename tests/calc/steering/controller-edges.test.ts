/**
 * The drive modulation's timing and windows (calc/steering/controller.ts), driven directly with a
 * bare stand-in for the model (only the wheel count and the drive modes are read): which window a
 * wheel is in, when a change reaches the wheels (sample and hold after the latency,
 * franklin-powell-workman-digital-control), commanded legs, restarts and the pending-change limit
 * (from the mutation report of calc/steering/controller.ts).
 */
import { describe, expect, it } from "vitest";
import { Modulator, type SteeringLeg } from "../../../calc/steering/controller.ts";
import { S_TH, type SteeringModel } from "../../../calc/steering/model.ts";

const stand = (n: number) => ({ n, mode: new Int8Array(n) }) as unknown as SteeringModel & { mode: Int8Array };

const at = (heading: number) => {
  const y = new Float64Array(8);
  y[S_TH] = heading;
  return y;
};

const make = (
  n: number,
  o: Partial<{ windowWidth: number; oppositeWindow: boolean; phaseLead: number; loopRate: number; latency: number; legs: SteeringLeg[] }> = {},
) => {
  const model = stand(n);
  const m = new Modulator(model, {
    windowWidth: Math.PI / 2,
    oppositeWindow: true,
    phaseLead: 0,
    loopRate: 1000,
    latency: 0.002,
    legs: [{ start: 0, direction: 0 }],
    ...o,
  });
  return { model, m };
};

// Wheel 0 (body angle 0) rolls along θ + π/2: with ψ = 0 and no lead its add window is centred on θ = −π/2
// (cos(θ + π/2) = 1) and its opposite window on θ = π/2 (−cos(π) = 1); at θ = 0 it is in neither (cos(π/2) = 0 < cos(π/4)).
describe("which window a wheel is in", () => {
  it("puts wheel 0 in its add window at θ = −π/2, its opposite window at θ = π/2, and neither at θ = 0", () => {
    const { m } = make(1);
    const out = new Int8Array(1);
    m.membership(at(-Math.PI / 2), out);
    expect(out[0]).toBe(1);
    m.membership(at(Math.PI / 2), out);
    expect(out[0]).toBe(-1);
    m.membership(at(0), out);
    expect(out[0]).toBe(0);
  });

  it("never puts a wheel in an opposite window when that window is off", () => {
    const { m } = make(1, { oppositeWindow: false });
    const out = new Int8Array(1);
    m.membership(at(Math.PI / 2), out);
    expect(out[0]).toBe(0);
  });

  it("counts a wheel exactly on its window edge as outside: a full 2π window at θ = π/2 has cos(π) = −1 = cos(π) on the add edge", () => {
    const { m } = make(1, { windowWidth: 2 * Math.PI });
    const out = new Int8Array(1);
    m.membership(at(Math.PI / 2), out); // add: cos(π) − cos(π) = 0, not > 0; opposite: cos(2π) − cos(π) = 2 > 0
    expect(out[0]).toBe(-1);
  });

  it("shares an edge between wheels whose windows coincide: four wheels with opposite windows have 4 distinct edges, three have 6", () => {
    // Four wheels at 0, π/2, π, 3π/2: each one's opposite window (angle + π) is another wheel's add window.
    expect(make(4).m.edgeCount).toBe(4);
    expect(make(3).m.edgeCount).toBe(6); // 0, 2π/3, 4π/3 and π/3, π, 5π/3
    expect(make(3, { oppositeWindow: false }).m.edgeCount).toBe(3);
    expect(make(2).m.edgeCount).toBe(2); // 0 and π, each the other's opposite
  });
});

describe("when a change reaches the wheels (sample and hold after the latency)", () => {
  it("applies the first reading at once with no latency, and at the first tick at or after L otherwise", () => {
    const now = make(1, { latency: 0 });
    now.m.start(at(-Math.PI / 2));
    expect(now.model.mode[0]).toBe(1);
    expect(now.m.switches).toBe(1);
    expect(now.m.nextTimeEvent(0)).toBe(Number.POSITIVE_INFINITY);

    const late = make(1, { latency: 0.0025 }); // 1 kHz: the tick at or after 2.5 ms is 3 ms
    late.m.start(at(-Math.PI / 2));
    expect(late.model.mode[0]).toBe(0);
    expect(late.m.nextTimeEvent(0)).toBeCloseTo(0.003, 15);
  });

  it("queues a crossing read exactly one latency before a tick for that tick, not the next", () => {
    // Reading at 1 ms + L = 2 ms → 3 ms, a tick itself (3 × 1 ms).
    const { model, m } = make(1);
    m.start(at(0));
    expect(m.onEdge(0.001, at(-Math.PI / 2))).toBe("continue"); // queued, nothing applied now
    expect(m.nextTimeEvent(0.001)).toBeCloseTo(0.003, 15);
    expect(m.onTime(0.003 - 1e-7, at(-Math.PI / 2))).toBe("restart"); // 0.1 µs early: beyond the 1 ps slack, nothing due
    expect(model.mode[0]).toBe(0);
    m.onTime(0.003, at(-Math.PI / 2));
    expect(model.mode[0]).toBe(1);
    expect(m.switches).toBe(1);
    expect(m.nextTimeEvent(0.003)).toBe(Number.POSITIVE_INFINITY);
  });

  it("applies a crossing at once when the latency is zero and the reading falls on a tick, and says so to the integrator", () => {
    const { model, m } = make(1, { latency: 0 });
    m.start(at(0));
    expect(m.onEdge(0.004, at(-Math.PI / 2))).toBe("restart");
    expect(model.mode[0]).toBe(1);
  });

  it("refuses more than 4096 pending changes with a message that names the cause", () => {
    const { m } = make(1, { latency: 1 });
    m.start(at(0));
    for (let k = 0; k < 4096; k++) m.onEdge(1e-6 * (k + 1), at(k % 2 === 0 ? -Math.PI / 2 : 0));
    expect(() => m.onEdge(0.5, at(-Math.PI / 2))).toThrowError("steering: too many drive changes pending (loop rate far below the spin rate)");
  });
});

describe("commanded legs and restarts", () => {
  it("takes a leg given within the latency of the start (here exactly at it) as the first direction", () => {
    const { m } = make(1, {
      legs: [
        { start: 0, direction: 0 },
        { start: 0.002, direction: Math.PI },
      ],
    });
    m.start(at(0));
    expect(m.direction).toBe(Math.PI);
    expect(m.nextTimeEvent(0)).toBe(Number.POSITIVE_INFINITY);
  });

  it("reads a later leg L before it is given, and takes it up at that time", () => {
    const { m } = make(1, {
      legs: [
        { start: 0, direction: 0 },
        { start: 0.5, direction: Math.PI },
      ],
    });
    m.start(at(0));
    expect(m.direction).toBe(0);
    expect(m.nextTimeEvent(0)).toBeCloseTo(0.498, 15);
    expect(m.onTime(0.498, at(0))).toBe("restart");
    expect(m.direction).toBe(Math.PI);
  });

  it("starts a second run from rest: no drive left on from the first, nothing queued", () => {
    const { model, m } = make(1, { latency: 0 });
    m.start(at(-Math.PI / 2));
    expect(model.mode[0]).toBe(1);
    m.start(at(0));
    expect(model.mode[0]).toBe(0);
    expect(m.switches).toBe(0);
    expect(m.nextTimeEvent(0)).toBe(Number.POSITIVE_INFINITY);
    m.onEdge(0.001, at(-Math.PI / 2));
    expect(model.mode[0]).toBe(1); // the change from 0 is seen again
  });
});

describe("exact ties at a window edge and at the time slack", () => {
  it("counts a wheel exactly on its opposite window's edge as outside", () => {
    // With the lead chosen so that θ + π + π/2 + φ = 1 exactly at θ = 0, and w/2 = 1: the opposite event is cos(1) − cos(1) = 0,
    // and the add event cos(1 − π) − cos(1) = −2cos(1) < 0.
    const lead = 1 - (Math.PI + Math.PI / 2);
    expect(0 + Math.PI + Math.PI / 2 + lead - 0).toBe(1);
    const { m } = make(1, { windowWidth: 2, phaseLead: lead });
    const out = new Int8Array(1);
    m.membership(at(0), out);
    expect(out[0]).toBe(0);
  });

  it("applies a change, and takes up a leg, due exactly one slack (a billionth of the period) after the time event", () => {
    const slack = 1e-9 * 0.001;
    const q = make(1);
    q.m.start(at(0));
    q.m.onEdge(0.001, at(-Math.PI / 2)); // due at the 3 ms tick
    const t = 0.003 - slack;
    expect(t + slack).toBe(0.003);
    q.m.onTime(t, at(-Math.PI / 2));
    expect(q.model.mode[0]).toBe(1);

    const reading = 0.5 - 0.002;
    const l = make(1, {
      legs: [
        { start: 0, direction: 0 },
        { start: 0.5, direction: Math.PI },
      ],
    });
    l.m.start(at(0));
    const u = reading - slack;
    expect(u + slack).toBe(reading);
    l.m.onTime(u, at(0));
    expect(l.m.direction).toBe(Math.PI);
  });
});
