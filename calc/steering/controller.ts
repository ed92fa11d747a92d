/**
 * The firmware's drive modulation, as the integrator sees it: which wheels are in their add or
 * opposite window, judged on the heading the firmware reads, and when each change reaches the
 * wheels.
 *
 * Timing model: the control loop runs at f (period T = 1/f) from t = 0. At each tick t_k = k·T it
 * reads the heading as it was L earlier (the latency L lumps sensing, filtering, computing and the
 * motor controller) and holds the drive it computes until the next tick (sample and hold,
 * franklin-powell-workman-digital-control). So the drive at a tick is decided by the true heading
 * at the reading time s = t_k − L. The simulation tracks window membership in reading time: each
 * crossing of a window edge by the true heading, at time s, is located as a state event, and the
 * change it causes is queued for the first tick at or after s + L, where a time event applies it.
 * A crossing in and back out between two ticks is queued as two changes at the same tick, which
 * cancel, exactly as the sampled firmware would never see it. A new commanded direction given at
 * time T_c applies to readings from T_c − L on, i.e. from the first tick at or after T_c.
 *
 * Windows: wheel i rolls along the body angle α_i + π/2 (its tangent); the firmware places its
 * window on the heading it reads plus the phase lead, so wheel i is in its add window while
 * cos(θ + α_i + π/2 + φ_lead − ψ) > cos(w/2) and in its opposite window (if used) while
 * −cos(…) > cos(w/2). The event functions are exactly these differences, one per distinct wheel
 * angle (wheels that share an edge share an event).
 */
import type { OdeAction, OdeEvent } from "../numerics/ode.ts";
import type { SteeringModel } from "./model.ts";
import { S_TH } from "./model.ts";

/** One leg of a commanded move: a direction from a start time on. */
export interface SteeringLeg {
  /** Time the firmware is given this direction [s]. */
  start: number;
  /** Commanded direction ψ, world frame, anticlockwise from +x [rad]. */
  direction: number;
}

const QUEUE = 4096;

/** The modulation controller of one run: memberships, the queue of pending changes, and the integrator callbacks. */
export class Modulator {
  private readonly model: SteeringModel;
  private readonly latency: number;
  private readonly period: number;
  private readonly lead: number;
  private readonly cosHalf: number;
  private readonly opposite: boolean;
  private readonly legs: readonly SteeringLeg[];
  private legNext = 1;
  /** Commanded direction in reading time. */
  direction: number;
  /** Offsets β of the distinct event functions (wheel angles, and wheel angles + π with the opposite window). */
  private readonly offsets: number[];
  /** For each wheel, the index of its add-window event and of its opposite-window event (−1 when unused). */
  private readonly addEvent: Int32Array;
  private readonly oppositeEvent: Int32Array;
  private readonly scheduled: Int8Array;
  private readonly target: Int8Array;
  private readonly qTime = new Float64Array(QUEUE);
  private readonly qWheel = new Int8Array(QUEUE);
  private readonly qMode = new Int8Array(QUEUE);
  private qHead = 0;
  private qCount = 0;
  /** Drive changes applied so far (pulse edges at the wheels). */
  switches = 0;
  readonly events: OdeEvent[];

  constructor(
    model: SteeringModel,
    p: { windowWidth: number; oppositeWindow: boolean; phaseLead: number; loopRate: number; latency: number; legs: readonly SteeringLeg[] },
  ) {
    this.model = model;
    this.latency = p.latency;
    this.period = 1 / p.loopRate;
    this.lead = p.phaseLead;
    this.cosHalf = Math.cos(p.windowWidth / 2);
    this.opposite = p.oppositeWindow;
    this.legs = p.legs;
    this.direction = p.legs[0]!.direction;
    this.scheduled = new Int8Array(model.n);
    this.target = new Int8Array(model.n);
    const seen: number[] = [];
    const indexOf = (beta: number): number => {
      const b = ((beta % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
      // For the wheel counts allowed (up to 4, and still up to 16) no edge lands within 1e-9 below 2π, so no pair needs matching across the wrap.
      // Stryker disable next-line EqualityOperator: equivalent, two edges here are either the same angle to rounding (~1e-15) or at least 2π/8 apart, never exactly 1e-9
      const k = seen.findIndex((x) => Math.abs(x - b) < 1e-9);
      if (k >= 0) return k;
      seen.push(b);
      return seen.length - 1;
    };
    this.addEvent = new Int32Array(model.n);
    this.oppositeEvent = new Int32Array(model.n).fill(-1);
    // Stryker disable next-line EqualityOperator: equivalent, an extra turn gives the angles 2π and 3π, which reduce to edges already seen (0 and π), and writes past the arrays' ends are dropped
    for (let i = 0; i < model.n; i++) {
      this.addEvent[i] = indexOf((2 * Math.PI * i) / model.n);
      // Stryker disable next-line ArithmeticOperator: equivalent, angle + π and angle − π reduce to the same edge modulo 2π
      if (this.opposite) this.oppositeEvent[i] = indexOf((2 * Math.PI * i) / model.n + Math.PI);
    }
    this.offsets = seen;
    this.events = seen.map((beta) => ({
      g: (_t: number, y: Float64Array) => Math.cos(y[S_TH]! + beta + Math.PI / 2 + this.lead - this.direction) - this.cosHalf,
    }));
  }

  /**
   * Window membership of every wheel at state y, into `out` (see the module comment). It reads the
   * event functions themselves, so that a located crossing and the membership it leads to agree to
   * the last bit.
   */
  membership(y: Float64Array, out: Int8Array): void {
    for (let i = 0; i < this.model.n; i++) {
      const opp = this.oppositeEvent[i]!;
      out[i] = this.events[this.addEvent[i]!]!.g(0, y) > 0 ? 1 : opp >= 0 && this.events[opp]!.g(0, y) > 0 ? -1 : 0;
    }
  }

  /** The first tick at or after `time`. */
  private tickAfter(time: number): number {
    return Math.ceil(time / this.period - 1e-9) * this.period;
  }

  /** Queues (or applies now) each wheel whose membership at state y differs from what is scheduled; true when a change was applied now. */
  private schedule(readingTime: number, y: Float64Array, now: number): boolean {
    this.membership(y, this.target);
    const due = this.tickAfter(readingTime + this.latency);
    let applied = false;
    // Stryker disable next-line EqualityOperator: equivalent, past the last wheel both typed arrays read undefined, so the extra turn skips
    for (let i = 0; i < this.model.n; i++) {
      const want = this.target[i]!;
      if (want === this.scheduled[i]) continue;
      this.scheduled[i] = want;
      if (due <= now) {
        this.model.mode[i] = want;
        this.switches++;
        applied = true;
        continue;
      }
      if (this.qCount >= QUEUE) throw new RangeError("steering: too many drive changes pending (loop rate far below the spin rate)");
      const k = (this.qHead + this.qCount) % QUEUE;
      this.qTime[k] = due;
      this.qWheel[k] = i;
      this.qMode[k] = want;
      this.qCount++;
    }
    return applied;
  }

  /** Starts the run: the first reading (at t = 0) sets the direction and the first changes. */
  start(y: Float64Array): void {
    this.model.mode.fill(0);
    this.scheduled.fill(0);
    this.qHead = 0;
    this.qCount = 0;
    this.switches = 0;
    this.legNext = 1;
    this.direction = this.legs[0]!.direction;
    // Legs whose readings start at or before 0 (given within the latency of the start): the last one holds.
    while (this.nextLegReading() <= 0) this.direction = this.legs[this.legNext++]!.direction;
    this.schedule(0, y, 0);
  }

  /** Reading time of the next leg change, or Infinity. */
  private nextLegReading(): number {
    return this.legNext < this.legs.length ? Math.max(0, this.legs[this.legNext]!.start - this.latency) : Number.POSITIVE_INFINITY;
  }

  /** For the integrator: the earliest pending change or leg change strictly after t. */
  nextTimeEvent(t: number): number {
    const q = this.qCount > 0 ? this.qTime[this.qHead]! : Number.POSITIVE_INFINITY;
    const leg = this.nextLegReading();
    void t; // every pending time lies after the current one: changes due now are applied when queued
    return Math.min(q, leg);
  }

  /** For the integrator: a window edge crossed at reading time t. */
  onEdge(t: number, y: Float64Array): OdeAction {
    return this.schedule(t, y, t) ? "restart" : "continue";
  }

  /** For the integrator: at a time event, apply what is due and take up a new leg. */
  onTime(t: number, y: Float64Array): OdeAction {
    const slack = 1e-9 * this.period;
    while (this.qCount > 0 && this.qTime[this.qHead]! <= t + slack) {
      this.model.mode[this.qWheel[this.qHead]!] = this.qMode[this.qHead]!;
      this.switches++;
      this.qHead = (this.qHead + 1) % QUEUE;
      this.qCount--;
    }
    while (this.nextLegReading() <= t + slack) {
      this.direction = this.legs[this.legNext]!.direction;
      this.legNext++;
      this.schedule(t, y, t);
    }
    return "restart";
  }

  /** Number of event functions (distinct window edges). */
  get edgeCount(): number {
    return this.offsets.length;
  }
}
