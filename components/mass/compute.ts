/**
 * The mass-layout widget's arithmetic: calc/'s mass-and-balance check, the counterweight plan and
 * the top view's geometry, as one step. The page comes with the starting layout's result (worked
 * out at build time by the same step); this loads on the first change that needs a new result.
 */
import { counterweightPlan, massBalance, type CounterweightMode } from "../../calc/mass/mass-balance.ts";
import { layoutDrawing } from "../../calc/mass/drawing.ts";

type MassBalanceInput = Parameters<typeof massBalance>[0];

/**
 * The balance, the counterweight plan for the chosen question, and the top view of a layout. The
 * balance leaves out its suggested fix (the build sheet's card uses it; the widget has its own
 * counterweight questions), which would only make the page's starting result longer.
 */
export function workOut(input: MassBalanceInput, mode: CounterweightMode) {
  const full = massBalance(input);
  const { fix: _fix, ...balance } = full;
  return { balance, plan: counterweightPlan({ input, balance: full, mode }), drawing: layoutDrawing(input.parts) };
}

/** What `workOut` gives: the widget's result. */
export type Worked = ReturnType<typeof workOut>;
