/**
 * The general integrator's vocabulary (ode.ts): the right-hand side, events and what a callback
 * may answer, the step view, the options, the result, and the error for a derivative that cannot
 * be made finite.
 */
import { CalcInputError } from "../core/errors.ts";

/** The right-hand side: writes f(t, y) into `dydt`; must not keep `y` or `dydt`. */
export type OdeRhs = (t: number, y: Float64Array, dydt: Float64Array) => void;

/** A state event: a sign change of `g`. */
export interface OdeEvent {
  /** g(t, y); must not modify y. */
  g: (t: number, y: Float64Array) => number;
  /** +1: only rising crossings (g from ≤ 0 to > 0); −1: only falling ones; 0 (default): both. */
  direction?: -1 | 0 | 1;
}

/** What the integration does after a callback: "restart" when it changed the state or a mode. */
export type OdeAction = "continue" | "restart" | "stop";

/** A located state event. */
export interface OdeEventHit {
  /** Index in `events`. */
  index: number;
  /** Time of the crossing (on the new side, within the event tolerance) [same unit as t]. */
  t: number;
  /** +1 rising, −1 falling. */
  direction: 1 | -1;
}

/** What `onStep` can read after each accepted step (and after any event handled in it). */
export interface OdeStepView {
  /** Start of the step just taken. */
  readonly tPrev: number;
  /** Current time: the end of the step, or where an event cut it. */
  readonly t: number;
  /** Current state (after any change an event made); read only. */
  readonly y: Float64Array;
  /** f(t, y) at the current point (the next step's first stage); read only. */
  readonly dydt: Float64Array;
  /** Trial steps so far (accepted + rejected + restarts). */
  readonly steps: number;
  /** Writes the dense-output state at `time` in [tPrev, t] into `out` (the state before any event change at t). */
  interpolate(time: number, out: Float64Array): void;
  /** One component of the dense output at `time` in [tPrev, t]. */
  interpolateComponent(index: number, time: number): number;
}

export interface OdeOptions {
  /** Relative tolerance, scalar or one per component, each 1e-14 to 1 (default 1e-6). */
  rtol?: number | ArrayLike<number>;
  /** Absolute tolerance, scalar or one per component, each ≥ 0; Infinity leaves a component out of the error norm (default 1e-9). */
  atol?: number | ArrayLike<number>;
  /** First step; if omitted, chosen by the starting-step algorithm of hairer-norsett-wanner-1 §II.4. */
  initialStep?: number;
  /** Largest step (default tEnd − t0). */
  maxStep?: number;
  /** Budget of trial steps, accepted + rejected + restarts, 1 to 1e9 (default 100 000). */
  maxSteps?: number;
  /** State events. */
  events?: readonly OdeEvent[];
  /** Called for each located event in time order; y is the state there and may be changed in place (then answer "restart"). Default answer "restart". */
  onEvent?: (hit: OdeEventHit, y: Float64Array) => OdeAction | undefined;
  /** Time tolerance of event location (default 1e-13·(tEnd − t0); never below 8 ulp of t). */
  eventTolerance?: number;
  /** The earliest time event strictly after t (Infinity when none); a callback may add new ones while the run goes on. */
  nextTimeEvent?: (t: number) => number;
  /** Called when the integration lands on a time event; y may be changed in place. Default answer "restart". */
  onTimeEvent?: (t: number, y: Float64Array) => OdeAction | undefined;
  /** Largest first step after a restart (an event or time event), given the time there; by default the step controller's proposal is kept. */
  restartStep?: (t: number) => number;
  /** Called after each accepted step; answer "stop" to end the run there. */
  onStep?: (step: OdeStepView) => "stop" | undefined;
  /** Times (ascending, within [t0, tEnd]) at which to sample the solution from the dense output. */
  outputTimes?: ArrayLike<number>;
}

/** How a run ended: "done" at tEnd; "stopped" by a callback; "step-limit" when the budget was spent; "step-too-small" when the step underflowed. */
export type OdeStatus = "done" | "stopped" | "step-limit" | "step-too-small";

export interface OdeResult {
  status: OdeStatus;
  /** Time reached. */
  t: number;
  /** State at `t` (a copy). */
  y: Float64Array;
  /** Trial steps used: accepted + rejected + restarts. */
  steps: number;
  accepted: number;
  rejected: number;
  /** Right-hand-side evaluations. */
  evaluations: number;
  /** State events handled (passed to `onEvent`). */
  events: number;
  /** Time events handled. */
  timeEvents: number;
  /** Samples at `outputTimes`, row after row (n values per time); rows past `t` are left 0. Null without `outputTimes`. */
  output: Float64Array | null;
  /** Rows of `output` filled. */
  outputCount: number;
}

/**
 * A derivative or event value that is not a finite number where no smaller step can help: a
 * `CalcInputError` naming the problem's function that gave it ("rhs", or "events[i]"), so that
 * a caller of calc/ meets one error family.
 */
export class OdeNonFiniteError extends CalcInputError {
  /** Time of the evaluation. */
  readonly t: number;
  /** "derivative" (component `index` of f) or "event" (event `index`). */
  readonly quantity: "derivative" | "event" | "state";
  readonly index: number;
  declare readonly value: number;

  constructor(fields: { t: number; quantity: "derivative" | "event" | "state"; index: number; value: number }) {
    super({
      param: fields.quantity === "event" ? `events[${fields.index}]` : "rhs",
      value: fields.value,
      expected: `a finite ${fields.quantity === "event" ? "event function" : "derivative"} at every step`,
      unit: "",
    });
    this.message = `the ${fields.quantity} ${fields.index} is not a finite number (${fields.value}) at t = ${fields.t}`;
    this.name = "OdeNonFiniteError";
    this.t = fields.t;
    this.quantity = fields.quantity;
    this.index = fields.index;
  }
}
