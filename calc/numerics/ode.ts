/**
 * A general explicit ODE integrator: Dormand–Prince RK5(4)7M with first-same-as-last (FSAL),
 * automatic step-size control, its 4th-order continuous extension (dense output), event location
 * on the dense output, exact landing on time events, and a step budget (dormand-prince-1980;
 * hairer-norsett-wanner-1 §II.4 step control and starting step, §II.5 the DOPRI5 pair, §II.6
 * dense output; the constants and the starting-step exponent as in hairer-dopri5-code).
 *
 * What it solves: y' = f(t, y), y(t0) = y0, forward in time from t0 to tEnd, y a vector of n
 * numbers held in a Float64Array. No allocation happens inside the step loop: one integrator
 * (`new DormandPrince45(n)`) keeps its stage buffers and can run many problems of the same size.
 *
 * Step control (hairer-norsett-wanner-1 §II.4, eq. (4.11)–(4.13)): the local error estimate
 * e = h·Σ(b_i − b̂_i)k_i is measured in the RMS norm err = √(1/n Σ (e_i/sc_i)²) with
 * sc_i = atol_i + rtol_i·max(|y_i|, |y1_i|); a step is accepted when err ≤ 1, and the next step
 * is h·min(10, max(0.2, 0.9·err^(−1/5))), never growing right after a rejection (the factors of
 * hairer-dopri5-code). A component with atol = Infinity is left out of the norm.
 *
 * Events: each event i is a function g_i(t, y). After every accepted step g_i is evaluated at the
 * step's end; a change of side (g ≤ 0 is one side, g > 0 the other) that passes the event's
 * direction filter is located on the dense output by the Illinois variant of false position
 * (dowell-jarratt-1971), with a bisection step whenever the bracket fails to halve, to a time
 * tolerance `eventTolerance` (default 1e-13·(tEnd − t0), and never below 8 ulp of t). The point
 * returned is the end of the final bracket that lies on the NEW side, so that after a restart g
 * is already past its zero and the same crossing is not found twice. Crossings inside one step
 * are handled in time order; the `onEvent` callback answers "continue" (nothing changed: go on
 * with the step; that event's g is read again at the step's end, so a callback may move its own
 * event's zero, e.g. a revolution counter), "restart" (the callback changed y in place or a mode the right-hand side reads:
 * the step is cut at the event and integration restarts there with a fresh f(t, y)) or "stop".
 * A g that crosses zero twice inside one step is not seen; `maxStep` bounds that. A g that is
 * exactly 0 at the start (or where a restart leaves it) takes the side it moves to: no event there.
 *
 * Time events (a control loop's tick, a commanded change at a set time): `nextTimeEvent(t)`
 * gives the earliest pending time ≥ t; steps are shortened to land on it exactly, and
 * `onTimeEvent` may change y or the mode (integration restarts with a fresh f there). An
 * `onEvent` callback may schedule a time event inside the step just taken; the step is then cut
 * there on the dense output.
 *
 * Budget and failures: every trial step (accepted or rejected) and every event restart counts
 * against `maxSteps`; when it is spent the result says `status: "step-limit"` with the time
 * reached, never loops and never returns a non-finite number. A step that shrinks below 16 ulp of
 * t ends with "step-too-small". A non-finite derivative or event value that no step size can
 * avoid (at a restart point, or while shrinking to nothing) throws `OdeNonFiniteError`.
 */
import { CalcInputError, requireFinite, requireInRange, requirePositive } from "../core/errors.ts";
import * as T from "./dopri5-tableau.ts";
import { tolerances } from "./ode-tolerances.ts";

export * from "./ode-types.ts";
import {
  OdeNonFiniteError,
  type OdeRhs,
  type OdeEvent,
  type OdeAction,
  type OdeStepView,
  type OdeOptions,
  type OdeStatus,
  type OdeResult,
} from "./ode-types.ts";

// Step-size factors of hairer-dopri5-code (hairer-norsett-wanner-1 §II.4 (4.13)): safety, bounds, exponent 1/(q+1) with q = 4.
const SAFETY = 0.9;
const FAC_MIN = 0.2;
const FAC_MAX = 10;
const EXPONENT = 1 / 5;

/**
 * Dormand–Prince 5(4) integrator for systems of a fixed size (dormand-prince-1980,
 * hairer-norsett-wanner-1 §II.4–II.6, dowell-jarratt-1971 for events): see the module comment.
 *
 * Formula: $y_1 = y_0 + h\sum_i b_i k_i$, $\mathrm{err} = \sqrt{\tfrac1n\sum_i (e_i/sc_i)^2}$, $h_{new} = h\,\min(10, \max(0.2, 0.9\,\mathrm{err}^{-1/5}))$
 *
 * @returns (from `solve`) the status, the time reached, the state there, the counts and the samples (see `OdeResult`)
 * @example
 * const ode = new DormandPrince45(1);
 * ode.solve((t, y, dy) => { dy[0] = -y[0]; }, 0, [1], 1, { rtol: 1e-10, atol: 1e-12 }).y[0] // → 0.36787944 (e^−1)
 *
 * Sources: dormand-prince-1980, hairer-norsett-wanner-1, hairer-dopri5-code, dowell-jarratt-1971.
 */
export class DormandPrince45 implements OdeStepView {
  readonly dimension: number;
  readonly y: Float64Array;
  private readonly y1: Float64Array;
  private readonly yt: Float64Array;
  private k1: Float64Array;
  private readonly k2: Float64Array;
  private readonly k3: Float64Array;
  private readonly k4: Float64Array;
  private readonly k5: Float64Array;
  private readonly k6: Float64Array;
  private k7: Float64Array;
  private readonly r1: Float64Array;
  private readonly r2: Float64Array;
  private readonly r3: Float64Array;
  private readonly r4: Float64Array;
  private readonly r5: Float64Array;
  private readonly rtol: Float64Array;
  private readonly atol: Float64Array;
  private controlled = 0;
  private rhs: OdeRhs = () => {};
  private hStep = 0;
  // Stryker disable next-line BooleanLiteral: equivalent, solve() sets it false before any use, and before any solve the buffers are all 0 either way
  private denseReady = false;
  tPrev = 0;
  t = 0;
  steps = 0;
  private evaluations = 0;

  /** @param dimension n, the number of components, a whole number 1 to 100 000 */
  constructor(dimension: number) {
    requireInRange("dimension", dimension, "", { min: 1, max: 100_000 });
    if (!Number.isInteger(dimension)) throw new CalcInputError({ param: "dimension", value: dimension, expected: "a whole number", unit: "" });
    this.dimension = dimension;
    const make = () => new Float64Array(dimension);
    this.y = make();
    this.y1 = make();
    this.yt = make();
    this.k1 = make();
    this.k2 = make();
    this.k3 = make();
    this.k4 = make();
    this.k5 = make();
    this.k6 = make();
    this.k7 = make();
    this.r1 = make();
    this.r2 = make();
    this.r3 = make();
    this.r4 = make();
    this.r5 = make();
    this.rtol = make();
    this.atol = make();
  }

  private f(t: number, y: Float64Array, out: Float64Array): void {
    this.evaluations++;
    this.rhs(t, y, out);
  }

  /** Scaled RMS norm of v with sc_i = atol_i + rtol_i·|y_i| (hairer-norsett-wanner-1 §II.4 (4.11)). */
  private norm(v: Float64Array, y: Float64Array): number {
    let sum = 0;
    for (let i = 0; i < this.dimension; i++) {
      const sc = this.atol[i]! + this.rtol[i]! * Math.abs(y[i]!);
      const q = sc > 0 ? v[i]! / sc : v[i] === 0 ? 0 : Number.POSITIVE_INFINITY;
      if (sc !== Number.POSITIVE_INFINITY) sum += q * q;
    }
    return Math.sqrt(sum / this.controlled);
  }

  /** Starting step (hairer-norsett-wanner-1 §II.4, "Starting step size", steps a–f; exponent 1/5 as in hairer-dopri5-code). */
  private startingStep(t: number, hMax: number): number {
    const { y, k1, k2, yt, dimension: n } = this;
    const d0 = this.norm(y, y);
    const d1 = this.norm(k1, y);
    // An infinite ‖f‖ (a non-zero derivative where atol = 0 and y = 0, or a norm that overflows) says as little
    // about the step as a tiny one: 0.01·d0/∞ would start with a step of 0.
    let h0 = d0 < 1e-5 || d1 < 1e-5 || d1 === Number.POSITIVE_INFINITY ? 1e-6 : 0.01 * (d0 / d1);
    h0 = Math.min(h0, hMax);
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) yt[i] = y[i]! + h0 * k1[i]!;
    this.f(t + h0, yt, k2);
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) yt[i] = k2[i]! - k1[i]!;
    const d2 = this.norm(yt, y) / h0;
    const big = Math.max(d1, d2);
    const h1 = Number.isFinite(big) ? (big <= 1e-15 ? Math.max(1e-6, h0 * 1e-3) : (0.01 / big) ** EXPONENT) : h0 * 1e-3;
    return Math.min(100 * h0, h1, hMax);
  }

  /** One trial step of size h from (t, y) into y1, k7 = f(t + h, y1); returns err (Infinity for a non-finite stage). */
  private trial(t: number, h: number): number {
    const { y, y1, yt, k1, k2, k3, k4, k5, k6, k7, dimension: n } = this;
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) yt[i] = y[i]! + h * T.A21 * k1[i]!;
    this.f(t + T.C2 * h, yt, k2);
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) yt[i] = y[i]! + h * (T.A31 * k1[i]! + T.A32 * k2[i]!);
    this.f(t + T.C3 * h, yt, k3);
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) yt[i] = y[i]! + h * (T.A41 * k1[i]! + T.A42 * k2[i]! + T.A43 * k3[i]!);
    this.f(t + T.C4 * h, yt, k4);
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) yt[i] = y[i]! + h * (T.A51 * k1[i]! + T.A52 * k2[i]! + T.A53 * k3[i]! + T.A54 * k4[i]!);
    this.f(t + T.C5 * h, yt, k5);
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) yt[i] = y[i]! + h * (T.A61 * k1[i]! + T.A62 * k2[i]! + T.A63 * k3[i]! + T.A64 * k4[i]! + T.A65 * k5[i]!);
    this.f(t + h, yt, k6);
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) y1[i] = y[i]! + h * (T.A71 * k1[i]! + T.A73 * k3[i]! + T.A74 * k4[i]! + T.A75 * k5[i]! + T.A76 * k6[i]!);
    this.f(t + h, y1, k7);
    // hairer-norsett-wanner-1 §II.4 (4.11): err = √(1/n Σ (e_i/sc_i)²), sc_i = atol_i + rtol_i·max(|y0_i|, |y1_i|)
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const e = h * (T.E1 * k1[i]! + T.E3 * k3[i]! + T.E4 * k4[i]! + T.E5 * k5[i]! + T.E6 * k6[i]! + T.E7 * k7[i]!);
      const sc = this.atol[i]! + this.rtol[i]! * Math.max(Math.abs(y[i]!), Math.abs(y1[i]!));
      if (!Number.isFinite(y1[i]!) || !Number.isFinite(k7[i]!) || !Number.isFinite(e)) return Number.POSITIVE_INFINITY;
      const q = sc > 0 ? e / sc : e === 0 ? 0 : Number.POSITIVE_INFINITY;
      // Stryker disable next-line ConditionalExpression: equivalent, e is finite here (tested just above), so with sc = ∞ it adds (e/∞)² = 0
      if (sc !== Number.POSITIVE_INFINITY) sum += q * q;
    }
    this.denseReady = false;
    return Math.sqrt(sum / this.controlled);
  }

  /** Continuous extension of the accepted step (hairer-norsett-wanner-1 §II.6; hairer-dopri5-code CONTD5). */
  private prepareDense(): void {
    if (this.denseReady) return;
    const { y, y1, k1, k3, k4, k5, k6, k7, r1, r2, r3, r4, r5, hStep: h, dimension: n } = this;
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the writes to the Float64Arrays out of bounds are ignored
    for (let i = 0; i < n; i++) {
      const dy = y1[i]! - y[i]!;
      const bspl = h * k1[i]! - dy;
      r1[i] = y[i]!;
      r2[i] = dy;
      r3[i] = bspl;
      r4[i] = dy - h * k7[i]! - bspl;
      r5[i] = h * (T.D1 * k1[i]! + T.D3 * k3[i]! + T.D4 * k4[i]! + T.D5 * k5[i]! + T.D6 * k6[i]! + T.D7 * k7[i]!);
    }
    this.denseReady = true;
  }

  private denseAt(theta: number, out: Float64Array): void {
    const th1 = 1 - theta;
    const { r1, r2, r3, r4, r5, dimension: n } = this;
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) out[i] = r1[i]! + theta * (r2[i]! + th1 * (r3[i]! + theta * (r4[i]! + th1 * r5[i]!)));
  }

  interpolate(time: number, out: Float64Array): void {
    this.prepareDense();
    this.denseAt(this.hStep > 0 ? (time - this.tPrev) / this.hStep : 0, out);
  }

  interpolateComponent(index: number, time: number): number {
    this.prepareDense();
    const theta = this.hStep > 0 ? (time - this.tPrev) / this.hStep : 0;
    const th1 = 1 - theta;
    return this.r1[index]! + theta * (this.r2[index]! + th1 * (this.r3[index]! + theta * (this.r4[index]! + th1 * this.r5[index]!)));
  }

  get dydt(): Float64Array {
    return this.k1;
  }

  /** Evaluates f at the current point into k1 and throws if it is not finite. */
  private restartDerivative(): void {
    const { k1, y, dimension: n } = this;
    for (let i = 0; i < n; i++) if (!Number.isFinite(y[i]!)) throw new OdeNonFiniteError({ t: this.t, quantity: "state", index: i, value: y[i]! });
    this.f(this.t, y, k1);
    for (let i = 0; i < n; i++) if (!Number.isFinite(k1[i]!)) throw new OdeNonFiniteError({ t: this.t, quantity: "derivative", index: i, value: k1[i]! });
  }

  /**
   * Integrates y' = f(t, y) from t0 to tEnd (see the module comment for events and budget).
   *
   * @param rhs f, writing f(t, y) into its third argument
   * @param t0 start time, finite
   * @param y0 initial state, n finite numbers
   * @param tEnd end time, finite and greater than t0
   * @param options tolerances, steps, events and output (see `OdeOptions`)
   * @returns status, time reached, state there, counts, and the samples at `outputTimes`
   */
  solve(rhs: OdeRhs, t0: number, y0: ArrayLike<number>, tEnd: number, options: OdeOptions = {}): OdeResult {
    const n = this.dimension;
    const opts = options ?? {};
    requireFinite("t0", t0, "");
    requireFinite("tEnd", tEnd, "");
    if (!(tEnd > t0)) throw new CalcInputError({ param: "tEnd", value: tEnd, expected: `greater than t0 (${t0})`, unit: "" });
    if (typeof rhs !== "function") throw new CalcInputError({ param: "rhs", value: rhs, expected: "a function (t, y, dydt) => void", unit: "" });
    if (y0 === null || typeof y0 !== "object" || y0.length !== n) {
      throw new CalcInputError({ param: "y0", value: y0 === null || typeof y0 !== "object" ? y0 : y0.length, expected: `a list of ${n} numbers`, unit: "" });
    }
    for (let i = 0; i < n; i++) requireFinite(`y0[${i}]`, y0[i]!, "");
    tolerances("rtol", opts.rtol ?? 1e-6, n, this.rtol, 1e-14, 1, false);
    tolerances("atol", opts.atol ?? 1e-9, n, this.atol, 0, Number.MAX_VALUE, true);
    this.controlled = 0;
    for (let i = 0; i < n; i++) if (this.atol[i] !== Number.POSITIVE_INFINITY) this.controlled++;
    if (this.controlled === 0)
      throw new CalcInputError({ param: "atol", value: Number.POSITIVE_INFINITY, expected: "finite for at least one component", unit: "" });
    const span = tEnd - t0;
    const hMax = opts.maxStep === undefined ? span : requirePositive("maxStep", opts.maxStep, "");
    const maxSteps = opts.maxSteps ?? 100_000;
    requireInRange("maxSteps", maxSteps, "", { min: 1, max: 1e9 });
    if (!Number.isInteger(maxSteps)) throw new CalcInputError({ param: "maxSteps", value: maxSteps, expected: "a whole number", unit: "" });
    if (opts.initialStep !== undefined) requirePositive("initialStep", opts.initialStep, "");
    const eventTol = opts.eventTolerance === undefined ? 1e-13 * span : requirePositive("eventTolerance", opts.eventTolerance, "");
    const events = opts.events ?? [];
    const ne = events.length;
    const outTimes = opts.outputTimes;
    let output: Float64Array | null = null;
    if (outTimes !== undefined) {
      let prev = t0;
      for (let i = 0; i < outTimes.length; i++) {
        const v = requireInRange(`outputTimes[${i}]`, outTimes[i]!, "", { min: t0, max: tEnd });
        if (v < prev) throw new CalcInputError({ param: `outputTimes[${i}]`, value: v, expected: `at least the previous time (${prev})`, unit: "" });
        prev = v;
      }
      output = new Float64Array(outTimes.length * n);
    }
    const gOld = new Float64Array(ne);
    const gNew = new Float64Array(ne);
    const hitTheta = new Float64Array(ne);
    const hitOrder = new Int32Array(ne);
    const yEvent = new Float64Array(n);
    const { onEvent, onTimeEvent, onStep, nextTimeEvent, restartStep } = opts;

    this.rhs = rhs;
    this.evaluations = 0;
    this.steps = 0;
    this.t = t0;
    this.tPrev = t0;
    this.hStep = 0;
    this.denseReady = false;
    // Stryker disable next-line EqualityOperator: equivalent, at i = n the write to a Float64Array out of bounds is ignored
    for (let i = 0; i < n; i++) this.y[i] = y0[i]!;
    let accepted = 0;
    let rejected = 0;
    let eventCount = 0;
    let timeEventCount = 0;
    let outNext = 0;
    let status: OdeStatus = "done";

    const evalEvents = (time: number, state: Float64Array, into: Float64Array): void => {
      for (let e = 0; e < ne; e++) {
        const v = events[e]!.g(time, state);
        if (!Number.isFinite(v)) throw new OdeNonFiniteError({ t: time, quantity: "event", index: e, value: v });
        into[e] = v;
      }
    };
    const sample = (upTo: number, useDense: boolean): void => {
      // Stryker disable next-line LogicalOperator,ConditionalExpression: equivalent, output is null exactly when outTimes is undefined (the second test is for the type checker)
      if (output === null || outTimes === undefined) return;
      // Stryker disable next-line ConditionalExpression,EqualityOperator: equivalent, past the end outTimes[outNext] is undefined and undefined <= upTo is false
      while (outNext < outTimes.length && outTimes[outNext]! <= upTo) {
        const row = output.subarray(outNext * n, outNext * n + n);
        if (useDense) this.interpolate(outTimes[outNext]!, row);
        else row.set(this.y);
        outNext++;
      }
    };
    const fireTime = (): OdeAction => {
      timeEventCount++;
      return onTimeEvent ? (onTimeEvent(this.t, this.y) ?? "restart") : "restart";
    };
    const afterRestart = (): void => {
      this.restartDerivative();
      evalEvents(this.t, this.y, gOld);
    };

    this.restartDerivative();
    evalEvents(t0, this.y, gOld);
    sample(t0, false);
    let h = opts.initialStep ?? this.startingStep(t0, hMax);
    h = Math.min(h, hMax);
    let lastRejected = false;
    let nonFiniteSeen = false;

    while (status === "done" && this.t < tEnd) {
      if (this.steps >= maxSteps) {
        status = "step-limit";
        break;
      }
      const t = this.t;
      const tTime = nextTimeEvent ? nextTimeEvent(t) : Number.POSITIVE_INFINITY;
      if (tTime <= t + 16 * Number.EPSILON * Math.max(Math.abs(t), Math.abs(tEnd))) {
        // Due now (within round-off of t, or a callback broke the "strictly after t" rule): fire it here.
        this.steps++;
        const action = fireTime();
        if (action === "stop") status = "stopped";
        else if (action === "restart") afterRestart();
        continue;
      }
      const stopAt = Math.min(tEnd, tTime);
      const hPlanned = h;
      let landing = false;
      if (t + 1.01 * h >= stopAt) {
        // hairer-dopri5-code: the last step is stretched or shortened to end exactly at the stop
        h = stopAt - t;
        landing = true;
      }
      if (h <= 16 * Number.EPSILON * Math.max(Math.abs(t), Math.abs(tEnd))) {
        if (nonFiniteSeen) throw new OdeNonFiniteError({ t, quantity: "derivative", index: -1, value: Number.NaN });
        status = "step-too-small";
        break;
      }
      this.steps++;
      const err = this.trial(t, h);
      if (!(err <= 1)) {
        rejected++;
        nonFiniteSeen = !Number.isFinite(err);
        h *= nonFiniteSeen ? FAC_MIN : Math.max(FAC_MIN, SAFETY * err ** -EXPONENT);
        lastRejected = true;
        continue;
      }
      accepted++;
      nonFiniteSeen = false;
      // err = 0 needs no special case: 0^(−1/5) = ∞, so the factor is the largest, FAC_MAX.
      let factor = Math.min(FAC_MAX, Math.max(FAC_MIN, SAFETY * err ** -EXPONENT));
      if (lastRejected) factor = Math.min(1, factor);
      lastRejected = false;
      this.hStep = h;
      this.tPrev = t;
      const t1 = landing ? stopAt : t + h;

      // State events inside the step, located on the dense output, handled in time order.
      let cutAt = Number.NaN; // time where the step ends if an event or time event cuts it
      let cutKind = 0; // 1: state event asked to restart or stop; 2: time event
      // Stryker disable next-line StringLiteral: equivalent, read only where an event's callback has set it (cutKind 1)
      let cutAction: OdeAction = "continue";
      // Stryker disable next-line EqualityOperator: equivalent, with no events the block evaluates and loops over nothing
      if (ne > 0) {
        evalEvents(t1, this.y1, gNew);
        let hits = 0;
        // Stryker disable next-line EqualityOperator: equivalent, gOld[ne] and gNew[ne] read undefined, on the same side, so e = ne is skipped
        for (let e = 0; e < ne; e++) {
          // Stryker disable next-line EqualityOperator: equivalent, a g exactly 0 at the start is skipped below whichever side it is given
          const before = gOld[e]! > 0;
          const after = gNew[e]! > 0;
          // A g exactly 0 at the start or at a restart point takes the side it moves to: no event there.
          if (before === after || gOld[e] === 0) continue;
          const dir = events[e]!.direction ?? 0;
          if ((dir === 1 && after === false) || (dir === -1 && after === true)) continue;
          hitTheta[e] = this.locate(events[e]!, e, t, gOld[e]!, gNew[e]!, Math.max(eventTol, 8 * Number.EPSILON * Math.max(Math.abs(t), Math.abs(t1))), yEvent);
          let k = hits++;
          // Stryker disable next-line EqualityOperator: equivalent, at k = 0 hitOrder[−1] is undefined and the comparison is false, ending the loop as k > 0 does
          while (k > 0 && hitTheta[hitOrder[k - 1]!]! > hitTheta[e]!) {
            hitOrder[k] = hitOrder[k - 1]!;
            k--;
          }
          hitOrder[k] = e;
        }
        for (let k = 0; k < hits; k++) {
          const e = hitOrder[k]!;
          const tHit = hitTheta[e]! >= 1 ? t1 : t + hitTheta[e]! * h;
          const tDue = nextTimeEvent ? nextTimeEvent(t) : Number.POSITIVE_INFINITY;
          if (tDue < tHit) {
            cutAt = tDue;
            cutKind = 2;
            break;
          }
          // locate() prepared this step's dense output, and nothing before the next trial step discards it.
          this.denseAt(hitTheta[e]!, yEvent);
          eventCount++;
          // Stryker disable next-line StringLiteral: equivalent, any answer but "continue" cuts the step and only "stop" is told apart from "restart"
          const action = onEvent ? (onEvent({ index: e, t: tHit, direction: gNew[e]! > 0 ? 1 : -1 }, yEvent) ?? "restart") : "restart";
          // The callback may have moved its own event's zero (a counter's next target): read g again at the step's end.
          if (action === "continue") {
            gNew[e] = events[e]!.g(t1, this.y1);
            if (!Number.isFinite(gNew[e]!)) throw new OdeNonFiniteError({ t: t1, quantity: "event", index: e, value: gNew[e]! });
          }
          if (action !== "continue") {
            cutAt = tHit;
            cutKind = 1;
            cutAction = action;
            break;
          }
        }
      }
      if (cutKind === 0 && nextTimeEvent) {
        const tDue = nextTimeEvent(t);
        // A step that landed on a time event meets it here too (tDue = tTime = t1), unless a callback in this step
        // postponed or cancelled it: then it must not fire at the old time.
        if (tDue <= t1 && tDue > t) {
          cutAt = tDue;
          cutKind = 2;
        }
      }

      if (cutKind === 0) {
        sample(t1, true);
        // Stryker disable next-line ConditionalExpression: equivalent, preparing the dense output without an onStep to read it changes nothing
        if (onStep) this.prepareDense();
        this.t = t1;
        this.y.set(this.y1);
        const swap = this.k1;
        this.k1 = this.k7;
        this.k7 = swap;
        gOld.set(gNew);
      } else {
        sample(cutAt, true);
        if (cutKind === 1) {
          this.t = cutAt;
          this.y.set(yEvent);
          if (cutAction === "stop") status = "stopped";
        } else {
          this.prepareDense();
          if (cutAt === t1) this.y.set(this.y1);
          else this.denseAt((cutAt - t) / h, this.y);
          this.t = cutAt;
          const action = fireTime();
          if (action === "stop") status = "stopped";
        }
        if (status !== "stopped") {
          this.steps++;
          afterRestart();
        }
      }
      // A step shortened to land on a stop says little about the step the solution allows: keep the planned one.
      h = Math.min(hMax, landing && factor >= 1 ? Math.max(hPlanned, h * factor) : h * factor);
      if (cutKind !== 0 && restartStep) {
        const cap = restartStep(this.t);
        // Stryker disable next-line EqualityOperator: equivalent, at cap = h both branches leave h = cap
        if (cap > 0 && cap < h) h = cap;
      }
      if (status === "done" && onStep && onStep(this) === "stop") status = "stopped";
    }
    // No clamp to tEnd needed: every step that reaches tEnd lands on it exactly (t1 = stopAt), and none passes it.
    return {
      status,
      t: this.t,
      y: Float64Array.from(this.y),
      steps: this.steps,
      accepted,
      rejected,
      evaluations: this.evaluations,
      events: eventCount,
      timeEvents: timeEventCount,
      output,
      outputCount: outNext,
    };
  }

  /**
   * Locates a sign change of `ev.g` in the accepted step by the Illinois method (dowell-jarratt-1971)
   * with bisection safeguard; returns θ in (0, 1] on the new side of the crossing.
   */
  private locate(ev: OdeEvent, index: number, t: number, gA: number, gB: number, tolTime: number, scratch: Float64Array): number {
    this.prepareDense();
    const h = this.hStep;
    const newSide = gB > 0;
    let a = 0;
    let fa = gA;
    let b = 1;
    let fb = gB;
    let retained = 0; // +1: a kept twice, −1: b kept twice
    let widthBefore = 1;
    for (let it = 0; it < 200 && (b - a) * h > tolTime; it++) {
      let x = it % 3 === 2 && b - a > 0.5 * widthBefore ? 0.5 * (a + b) : (a * fb - b * fa) / (fb - fa);
      if (it % 3 === 2) widthBefore = b - a;
      if (!(x > a && x < b)) x = 0.5 * (a + b);
      this.denseAt(x, scratch);
      const fx = ev.g(t + x * h, scratch);
      if (!Number.isFinite(fx)) throw new OdeNonFiniteError({ t: t + x * h, quantity: "event", index, value: fx });
      if (fx > 0 === newSide) {
        b = x;
        fb = fx;
        if (retained === 1) fa /= 2; // Illinois: a kept twice, halve its value
        retained = 1;
      } else {
        a = x;
        fa = fx;
        if (retained === -1) fb /= 2;
        retained = -1;
      }
    }
    return b;
  }
}

/**
 * Integrates y' = f(t, y) once with a fresh `DormandPrince45` (dormand-prince-1980,
 * hairer-norsett-wanner-1): the convenience form of `DormandPrince45.solve`.
 *
 * Formula: $y' = f(t, y)$, $y(t_0) = y_0$, Dormand–Prince 5(4) with error control (see the module comment)
 *
 * @param rhs f(t, y, dydt)
 * @param t0 start, tEnd end (> t0), y0 initial state (n finite numbers)
 * @param options see `OdeOptions`
 * @returns see `OdeResult`
 *
 * @example
 * solveOde({ rhs: (t, y, dy) => { dy[0] = y[1]; dy[1] = -y[0]; }, t0: 0, y0: [0, 1], tEnd: Math.PI / 2, rtol: 1e-10, atol: 1e-12 }).y[0] // → 1 (sin π/2)
 *
 * Sources: dormand-prince-1980, hairer-norsett-wanner-1, hairer-dopri5-code, dowell-jarratt-1971.
 */
export function solveOde(problem: { rhs: OdeRhs; t0: number; y0: ArrayLike<number>; tEnd: number } & OdeOptions): OdeResult {
  if (problem === null || typeof problem !== "object")
    throw new CalcInputError({ param: "problem", value: problem, expected: "an object { rhs, t0, y0, tEnd, … }", unit: "" });
  // The object check is the one just above (with this function's own words), so no second one here.
  const { rhs, t0, y0, tEnd, ...options } = problem;
  if (y0 === null || typeof y0 !== "object" || !(y0.length >= 1)) {
    throw new CalcInputError({ param: "y0", value: y0 === null || typeof y0 !== "object" ? y0 : y0.length, expected: "a list of at least 1 number", unit: "" });
  }
  return new DormandPrince45(y0.length).solve(rhs, t0, y0, tEnd, options);
}
