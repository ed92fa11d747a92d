/**
 * Small problems shared by the tests of the general integrator (calc/numerics/ode.ts): right-hand
 * sides with exact solutions, and the two event set-ups the tests keep coming back to.
 */
import { type OdeEvent, type OdeOptions, type OdeResult, type OdeRhs, solveOde } from "../../calc/numerics/ode.ts";

/** y' = 1: y = y0 + (t − t0) exactly, so one step can cover any span. */
export const one: OdeRhs = (_t, _y, f) => {
  f[0] = 1;
};

/** y' = −y: y = y0·e^−(t − t0). */
export const decay: OdeRhs = (_t, y, f) => {
  f[0] = -y[0]!;
};

/** y'' = −y as (y, y'): from (0, 1) this is (sin t, cos t). */
export const oscillator: OdeRhs = (_t, y, f) => {
  f[0] = y[1]!;
  f[1] = -y[0]!;
};

/** The event g = y[0]: on the oscillator from (0, 1), the zeros of sin t. */
const sineZero: OdeEvent = { g: (_t, y) => y[0]! };

/**
 * sin t on [0, 10] (the oscillator from (0, 1)) with an event at each zero of y[0] (π, 2π, 3π);
 * `options` adds to or replaces any of that, tolerances and onEvent included.
 */
export function sineCrossings(options: Partial<{ tEnd: number }> & OdeOptions = {}): OdeResult {
  return solveOde({ rhs: oscillator, t0: 0, y0: [0, 1], tEnd: 10, events: [sineZero], ...options });
}

/**
 * The order in which the crossings of `gs` (functions of t) are reported when y' = 1 runs over [0, 1]
 * in a single step, so that every crossing falls inside that one step.
 */
export function eventOrder(gs: ((t: number) => number)[]): number[] {
  const order: number[] = [];
  solveOde({
    rhs: one,
    t0: 0,
    y0: [0],
    tEnd: 1,
    initialStep: 1,
    maxStep: 1,
    events: gs.map((g) => ({ g })),
    onEvent: (hit) => {
      order.push(hit.index);
      return "continue";
    },
  });
  return order;
}
