/**
 * The steering simulation's computations, run in a worker beside the page: the simulated move
 * (calc/steering/simulate.ts), the top view's two-leg move (calc/steering/path.ts) and the
 * window-and-depth map (calc/steering/sweep.ts). The move's cost grows with the spin speed and
 * the values (a thousand to a few thousand integrator steps): in the page, on a slow phone, one
 * run held the main thread for 40 to 80 ms; here it holds none, whatever the values.
 *
 * The worker runs this module as the bundler built it for the page (`workerUrl`, read by the view
 * from the module it imports), so it shares the page's chunks: the integrator and the units are
 * fetched and cached once, and nothing is bundled twice. In the page the module only gives its URL.
 *
 * A move or a path asked for while the worker was busy and replaced since (the reader still typing)
 * is skipped: only the newest is run and answered. A map runs one cell at a time and lets messages
 * through between cells, so a newer map or a `cancel` (the values changed) stops it, with a reply
 * that says so.
 */
import type { SteeringInput } from "../../calc/steering/inputs.ts";
import { type SteeringPath, steeringPath } from "../../calc/steering/path.ts";
import { type SteeringResult, simulateSteering } from "../../calc/steering/simulate.ts";
import { type SteeringSweep, startSteeringSweep } from "../../calc/steering/sweep.ts";

/** Step budget of a run: a stiff set of values stops (and says so) instead of running on. */
const STEPS = 100_000;

export type Outcome<T> = { ok: true; value: T } | { ok: false; message: string };

export type SimulationRequest =
  | { id: number; kind: "move" | "path" | "sweep"; input: SteeringInput }
  /** Stops the map in progress, if any. */
  | { id: number; kind: "cancel" };

export type SimulationReply =
  | { id: number; kind: "move"; outcome: Outcome<SteeringResult> }
  | { id: number; kind: "path"; outcome: Outcome<SteeringPath> }
  | { id: number; kind: "sweep"; outcome: Outcome<SteeringSweep> }
  /** The map's cells done so far, after each cell. */
  | { id: number; kind: "progress"; done: number; total: number };

function attempt<T>(fn: () => T): Outcome<T> {
  try {
    return { ok: true, value: fn() };
  } catch (e) {
    return { ok: false, message: e instanceof Error ? e.message : String(e) };
  }
}

/** The worker's side of the channel (typed here: the project's DOM typings describe a page). */
const scope = globalThis as unknown as {
  onmessage: ((event: MessageEvent<SimulationRequest>) => void) | null;
  postMessage(reply: SimulationReply): void;
};

/** The map allowed to go on: a newer request for a map, or a cancel, ends the one running. */
let mapping = 0;

async function map(id: number, input: SteeringInput): Promise<void> {
  mapping = id;
  const started = attempt(() => startSteeringSweep({ input }));
  if (!started.ok) return scope.postMessage({ id, kind: "sweep", outcome: started });
  const run = started.value;
  for (;;) {
    scope.postMessage({ id, kind: "progress", done: run.done(), total: run.total });
    // Messages are handled between cells: a cancel sets `mapping` before the next one.
    await new Promise((resolve) => setTimeout(resolve, 0));
    if (mapping !== id) return scope.postMessage({ id, kind: "sweep", outcome: { ok: false, message: "The map was stopped: the values changed." } });
    const cell = attempt(() => run.step());
    if (!cell.ok) return scope.postMessage({ id, kind: "sweep", outcome: cell });
    if (cell.value) return scope.postMessage({ id, kind: "sweep", outcome: { ok: true, value: cell.value } });
  }
}

/** The newest move and path asked for: one asked for while the worker was busy and since replaced is skipped. */
const latest: { move?: { id: number; input: SteeringInput }; path?: { id: number; input: SteeringInput } } = {};
let draining = false;

function drain(): void {
  draining = false;
  const { move, path } = latest;
  latest.move = undefined;
  latest.path = undefined;
  if (move) scope.postMessage({ id: move.id, kind: "move", outcome: attempt(() => simulateSteering(move.input, { maxSteps: STEPS, revolutions: false })) });
  if (path) scope.postMessage({ id: path.id, kind: "path", outcome: attempt(() => steeringPath({ input: path.input, options: { maxSteps: STEPS } })) });
}

/** This module's address, which the view starts the worker with. */
export const workerUrl = import.meta.url;

// Only inside a worker: in the page (and at build time) the module just gives its address.
if ("WorkerGlobalScope" in globalThis)
  scope.onmessage = ({ data }) => {
    if (data.kind === "cancel") mapping = 0;
    else if (data.kind === "sweep") void map(data.id, data.input);
    else {
      latest[data.kind] = { id: data.id, input: data.input };
      // In a task after the messages already waiting, so that only the newest values are run.
      if (!draining) setTimeout(drain, 0);
      draining = true;
    }
  };
