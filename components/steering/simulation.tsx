/**
 * The steering calculator's simulation view, loaded only when the reader asks for it (the page's
 * first script stays small): one simulated move for the calculator's values (calc/steering/simulate.ts),
 * the top view of a two-leg move (calc/steering/path.ts) and, on demand, the window-and-depth map
 * (calc/steering/sweep.ts). They run in a worker (simulation-worker.ts), so the page stays
 * responsive whatever the values; this view sends the values, then formats and draws what comes
 * back. Every number comes from calc/.
 */
import { useEffect, useMemo } from "preact/hooks";
import { STATUS_WORDS } from "../../calc/core/check.ts";
import { formatNumber, formatQuantity, type QuantityKind, type UnitSystem } from "../../calc/core/units.ts";
import { DEMO_STEERING_SPINNER, type SteeringInput, steeringInputs } from "../../calc/steering/inputs.ts";
import type { SteeringPath } from "../../calc/steering/path.ts";
import type { SteeringResult } from "../../calc/steering/simulate.ts";
import type { SteeringSweep } from "../../calc/steering/sweep.ts";
import { createFieldsModel } from "../calc-ui/fields.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { effect, type Signal, useSignal } from "../calc-ui/reactive.ts";
import type { Outcome, SimulationReply, SimulationRequest } from "./simulation-worker.ts";

const TONE = { holds: "ok", marginal: "warn", fails: "bad" } as const;

export interface SteeringSimulationProps {
  /** The calculator's values in SI (the estimate's fields); the rest of the model is the demo robot's. */
  values: Record<string, number>;
  system: UnitSystem;
  /** The distance field's text, kept in the page link (`dist`). */
  distanceText: Signal<string>;
  idPrefix: string;
}

/** The worker that runs the computations (simulation-worker.ts), started on first use. */
let worker: Promise<Worker> | null = null;
let lastId = 0;
type Kind = "move" | "path" | "sweep";
const listeners = new Map<number, { kind: Kind; hear: (reply: SimulationReply) => void }>();

/** Answers every waiting request with `message` and lets the next request start a new worker. */
function failAll(message: string): void {
  worker = null;
  const waiting = [...listeners];
  listeners.clear();
  for (const [id, { kind, hear }] of waiting) hear({ id, kind, outcome: { ok: false, message } });
}

function startWorker(): Promise<Worker> {
  return import("./simulation-worker.ts").then(({ workerUrl }) => {
    const started = new Worker(workerUrl, { type: "module", name: "steering-simulation" });
    started.onmessage = ({ data }: MessageEvent<SimulationReply>) => {
      const listener = listeners.get(data.id);
      if (data.kind !== "progress") listeners.delete(data.id); // the answer: nothing more comes
      listener?.hear(data);
    };
    started.onerror = (event) => {
      event.preventDefault();
      started.terminate();
      failAll("The simulation could not start; check the connection and try again.");
    };
    return started;
  });
}

/**
 * Sends a request to the worker; `hear` gets its replies until the answer (or the returned function
 * is called). A worker that cannot start (its script never fetched, and the page offline) answers
 * every waiting request with a message; the next request starts a new one.
 */
function ask(request: { kind: Kind; input: SteeringInput }, hear: (reply: SimulationReply) => void): () => void {
  worker ??= startWorker();
  lastId += 1;
  const id = lastId;
  listeners.set(id, { kind: request.kind, hear });
  worker.then(
    (w) => w.postMessage({ ...request, id } satisfies SimulationRequest),
    () => failAll("The simulation could not be loaded; check the connection and try again."),
  );
  return () => listeners.delete(id);
}

/** Stops the map the worker is running, if any (its values changed). */
function cancelMap(): void {
  void worker?.then((w) => w.postMessage({ kind: "cancel", id: 0 } satisfies SimulationRequest));
}

/** The worker's answer to `kind` for `input`: null before it comes and without an input. */
function useComputed<T>(input: SteeringInput | null, kind: "move" | "path"): Outcome<T> | null {
  const done = useSignal<{ input: SteeringInput; outcome: Outcome<T> } | null>(null);
  useEffect(() => {
    if (!input) return;
    return ask({ kind, input }, (reply) => {
      if (reply.kind === kind) done.value = { input, outcome: reply.outcome as Outcome<T> };
    });
  }, [input]);
  return input && done.value?.input === input ? done.value.outcome : null;
}

interface SweepState {
  input: SteeringInput;
  done: number;
  total: number;
  sweep: SteeringSweep | null;
  message: string | null;
}

export function SteeringSimulation({ values, system, distanceText, idPrefix }: SteeringSimulationProps) {
  const distance = useMemo(() => {
    const model = createFieldsModel({ commandedDistance: steeringInputs.commandedDistance }, system);
    if (distanceText.value) model.applyTexts({ commandedDistance: distanceText.value });
    effect(() => {
      distanceText.value = model.texts.commandedDistance.value;
    });
    return model;
  }, []);
  // The distance field follows the calculator's unit system.
  useEffect(() => distance.setSystem(system), [system]);
  const sweepState = useSignal<SweepState | null>(null);
  const reading = distance.readings.commandedDistance.value;
  const input = useMemo(
    (): SteeringInput | null => (reading.ok ? { ...DEMO_STEERING_SPINNER, ...values, commandedDistance: reading.value } : null),
    [values, reading.ok ? reading.value : Number.NaN],
  );
  // The read-outs' simulation, then the top view's (the move again, sampled for drawing), both in
  // the worker: the page only draws what comes back.
  const sim = useComputed<SteeringResult>(input, "move");
  const path = useComputed<SteeringPath>(input, "path");
  const q = (v: number, kind: QuantityKind, significant = 3) => formatQuantity(v, kind, { system, significant }).text;
  const pct = (share: number) => `${formatNumber(share * 100, 2)} %`;
  const degPerSecond = (rate: number) => formatQuantity(rate, "angularSpeed", { unit: "deg/s", significant: 2 }).text;

  const state = sweepState.value;
  const current = state && input && state.input === input ? state : null;
  const runSweep = () => {
    if (!input) return;
    sweepState.value = { input, done: 0, total: 0, sweep: null, message: null };
    ask({ kind: "sweep", input }, (reply) => {
      if (sweepState.value?.input !== input) return; // the values changed: this map is no longer wanted
      if (reply.kind === "progress") sweepState.value = { input, done: reply.done, total: reply.total, sweep: null, message: null };
      else if (reply.kind === "sweep")
        sweepState.value = reply.outcome.ok
          ? { input, done: sweepState.value.total, total: sweepState.value.total, sweep: reply.outcome.value, message: null }
          : { input, done: sweepState.value.done, total: sweepState.value.total, sweep: null, message: reply.outcome.message };
    });
  };
  // A map still running for values that changed is stopped.
  useEffect(
    () => () => {
      const running = sweepState.value;
      if (running && running.input === input && !running.sweep && !running.message) cancelMap();
    },
    [input],
  );

  const r: SteeringResult | null = sim?.ok ? sim.value : null;
  const distanceLabel = reading.ok ? q(reading.value, "length") : "the distance";
  return (
    <section class="steer-sim" aria-labelledby={`${idPrefix}-sim-title`} data-out="simulation">
      <h3 id={`${idPrefix}-sim-title`}>The simulated move</h3>
      <p class="field-help">
        The robot starts at rest, spinning steadily, and is asked to go along +x for {q(DEMO_STEERING_SPINNER.duration, "time")}. Motor resistance, the pack's
        sag, the current limit and tyre slip are in; their figures, the robot's inertia and the tyres are the chapter's demo robot's.
      </p>
      <div class="steer-sim-field">
        <QuantityField
          idPrefix={idPrefix}
          name="commandedDistance"
          spec={distance.specs.commandedDistance}
          text={distance.texts.commandedDistance}
          reading={distance.readings.commandedDistance}
          system={system}
        />
      </div>
      {input && !sim ? <p data-out="sim-pending">Simulating the move…</p> : null}
      {sim && !sim.ok ? <p data-out="sim-error">{sim.message}</p> : null}
      {r ? (
        <>
          <p class={`verdict verdict--${TONE[r.verdict]}`} data-out="sim-verdict">
            <strong>{STATUS_WORDS[r.verdict]}:</strong> {r.reason}
          </p>
          <dl class="results-grid">
            {(
              [
                ["Translation speed reached", "sim-speed", q(r.translationSpeed, "speed")],
                ["Acceleration reached", "sim-acceleration", q(r.peakAcceleration, "acceleration")],
                [`Time to cross ${distanceLabel}`, "sim-time", r.timeToDistance === null ? `not within ${q(r.endTime, "time")}` : q(r.timeToDistance, "time")],
                ["Spin speed lost while translating", "sim-spin-lost", q(r.spinLost, "angularSpeed")],
                ["Wheel slip: share of the energy drawn", "sim-slip", pct(r.slipEnergyShare)],
                ["Time a wheel slides", "sim-sliding", pct(r.slidingTimeShare)],
                ["Direction error, simulated", "sim-direction-error", q(r.directionError, "angle")],
                ["Latency and the loop's hold, less the lead", "sim-latency-error", q(r.latencyDirectionError, "angle")],
                ["Phase lead that cancels it", "sim-lead", q(r.leadToCancel, "angle")],
                ["Energy drawn from the pack", "sim-energy", q(r.energy.drawn, "energy")],
                ["One accelerometer's drift from the pulses", "sim-drift", r.sensor.driftRate === null ? "reading lost" : degPerSecond(r.sensor.driftRate)],
              ] as const
            ).map(([label, name, text]) => (
              <div key={name}>
                <dt>{label}</dt>
                <dd data-out={name}>{text}</dd>
              </div>
            ))}
          </dl>
          <p class="field-help">
            The energy drawn went {q(r.energy.copperLoss, "energy")} into the windings, {q(r.energy.slipLoss, "energy")} into tyre slip,{" "}
            {q(r.energy.dragLoss, "energy")} into air drag and {q(r.energy.packLoss + r.energy.noLoadLoss + r.energy.skidLoss, "energy")} elsewhere; the robot's
            kinetic energy changed by {q(r.energy.kineticStored, "energy")} (the books close to {formatNumber(r.energy.balanceError * 100, 2)} %). An opposed
            pair of accelerometers drifts {degPerSecond(r.sensor.opposedPairDriftRate)}.
          </p>
          {r.warnings.map((w) => (
            <p key={w} class="field-help">
              {w}
            </p>
          ))}
        </>
      ) : null}
      {path?.ok ? <PathView path={path.value} system={system} idPrefix={idPrefix} /> : path ? <p data-out="path-error">{path.message}</p> : null}
      <h4>Window width against depth</h4>
      <p class="field-help">
        Each cell is a {q(Math.min(DEMO_STEERING_SPINNER.duration, 0.4), "time")} simulation of the same robot with that window and depth; the fastest is
        marked. About 40 short runs: it takes a moment.
      </p>
      <p>
        <button
          type="button"
          class="button"
          data-action="sweep"
          onClick={runSweep}
          disabled={!input || (current !== null && current.sweep === null && !current.message)}
        >
          Map the speed over window and depth
        </button>{" "}
        {current && !current.sweep && !current.message ? (
          <span role="status" data-out="sweep-progress">
            {current.total === 0 ? "Starting…" : `${current.done} of ${current.total} cells…`}
          </span>
        ) : null}
      </p>
      {current?.message ? <p data-out="sweep-error">{current.message}</p> : null}
      {current?.sweep ? <SweepTable sweep={current.sweep} system={system} /> : null}
    </section>
  );
}

function SweepTable({ sweep, system }: { sweep: SteeringSweep; system: UnitSystem }) {
  const unit = formatQuantity(1, "speed", { system }).symbol;
  const best = sweep.best ? sweep.cells[sweep.best.row]![sweep.best.column]! : null;
  const speed = (v: number) => formatQuantity(v, "speed", { system, unit: formatQuantity(1, "speed", { system }).unit, significant: 2 }).number;
  return (
    <>
      <p data-out="sweep-best">
        {best && best.speed !== null ? (
          <>
            Fastest: a <strong>{formatQuantity(best.windowWidth, "angle", { system }).text}</strong> window at{" "}
            <strong>{formatNumber(best.depth * 100, 2)} %</strong> depth, {formatQuantity(best.speed, "speed", { system }).text} after{" "}
            {formatQuantity(sweep.duration, "time", { system }).text}.
          </>
        ) : (
          "No cell could run: the depth leaves no duty around the spin's own."
        )}
      </p>
      <p class="field-help" id="steer-sweep-caption">
        Speed ({unit}) after {formatQuantity(sweep.duration, "time", { system }).text}, by window width (rows) and depth in % (columns); — where the depth
        exceeds the duty left.
      </p>
      <div class="steer-table-wrap">
        <table class="steer-sweep" data-out="sweep-table" aria-describedby="steer-sweep-caption">
          <caption class="visually-hidden">Speed by window width and depth</caption>
          <thead>
            <tr>
              <th scope="col">Window</th>
              {sweep.depths.map((d) => (
                <th scope="col" key={d}>
                  {formatNumber(d * 100, 2)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {sweep.cells.map((row, i) => (
              <tr key={sweep.windowWidths[i]}>
                <th scope="row">{formatQuantity(sweep.windowWidths[i]!, "angle", { system }).text}</th>
                {row.map((cell) => (
                  <td key={cell.depth} class={cell.isBest ? "steer-best" : undefined}>
                    {cell.speed === null ? "—" : speed(cell.speed)}
                    {cell.isBest ? (
                      <>
                        <span aria-hidden="true"> ★</span>
                        <span class="visually-hidden"> (fastest)</span>
                      </>
                    ) : null}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}

const NICE = [0.001, 0.002, 0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50];

/** Top view of the centre of mass's path, equal scales on both axes, +y up; a scale bar instead of axes. */
function PathView({ path, system, idPrefix }: { path: SteeringPath; system: UnitSystem; idPrefix: string }) {
  const W = 340;
  const H = 280;
  const pad = 18;
  const pts = path.points;
  let x0 = 0;
  let x1 = 0;
  let y0 = 0;
  let y1 = 0;
  for (const p of pts) {
    x0 = Math.min(x0, p.x);
    x1 = Math.max(x1, p.x);
    y0 = Math.min(y0, p.y);
    y1 = Math.max(y1, p.y);
  }
  const span = Math.max(x1 - x0, y1 - y0, 0.01);
  const s = Math.min((W - 2 * pad) / Math.max(x1 - x0, span * 0.2), (H - 2 * pad - 24) / Math.max(y1 - y0, span * 0.2));
  const ox = (W - (x1 - x0) * s) / 2 - x0 * s;
  const oy = H - 24 - ((H - 24 - (y1 - y0) * s) / 2 - y0 * s);
  const px = (x: number) => Math.round((ox + x * s) * 10) / 10;
  const py = (y: number) => Math.round((oy - y * s) * 10) / 10;
  const split = path.legs[1]?.start ?? Number.POSITIVE_INFINITY;
  const line = (from: number, to: number) =>
    pts
      .filter((p) => p.time >= from && p.time <= to)
      .map((p, i) => `${i ? "L" : "M"}${px(p.x)} ${py(p.y)}`)
      .join("");
  const bar = NICE.filter((n) => n * s <= (W - 2 * pad) * 0.35).pop() ?? NICE[0]!;
  const end = path.legEnds[path.legEnds.length - 1]!;
  const first = path.legEnds[0]!;
  const m = (v: number) => q(v);
  function q(v: number) {
    return formatQuantity(v, "length", { system }).text;
  }
  const arrow = (x: number, y: number, dir: number) => {
    const len = Math.min(60, span * s * 0.3);
    const ex = px(x) + len * Math.cos(dir);
    const ey = py(y) - len * Math.sin(dir);
    return `M${px(x)} ${py(y)}L${ex} ${ey}M${ex - 6 * Math.cos(dir - 0.5)} ${ey + 6 * Math.sin(dir - 0.5)}L${ex} ${ey}L${ex - 6 * Math.cos(dir + 0.5)} ${ey + 6 * Math.sin(dir + 0.5)}`;
  };
  const summary =
    `Top view of the centre of mass over ${formatQuantity(path.endTime, "time", { system }).text}: asked along +x for ${formatQuantity(path.legs[1]?.start ?? path.endTime, "time", { system }).text} it reaches (${m(first.x)}, ${m(first.y)}); ` +
    (path.legs.length > 1 ? `then asked along +y it ends at (${m(end.x)}, ${m(end.y)}). ` : "") +
    `The body wobbles ${q(path.wobble)} about its mean path.`;
  return (
    <figure class="steer-path">
      <h4 id={`${idPrefix}-path-title`}>Top view of a two-leg move</h4>
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={summary} data-out="path-plot">
        <title>{summary}</title>
        <path class="steer-cmd" d={arrow(0, 0, path.legs[0]!.direction)} />
        {path.legs[1] ? <path class="steer-cmd" d={arrow(first.x, first.y, path.legs[1].direction)} /> : null}
        <path class="steer-leg1" d={line(0, split)} fill="none" />
        <path class="steer-leg2" d={line(split, Number.POSITIVE_INFINITY)} fill="none" />
        <circle class="steer-dot" cx={px(0)} cy={py(0)} r="4" />
        <circle class="steer-dot" cx={px(end.x)} cy={py(end.y)} r="4" />
        <text x={px(0) + 7} y={py(0) + 15}>
          start
        </text>
        <text x={px(end.x) > W - 50 ? px(end.x) - 8 : px(end.x) + 7} y={py(end.y) + 4} text-anchor={px(end.x) > W - 50 ? "end" : "start"}>
          end
        </text>
        <path class="steer-bar" d={`M${pad} ${H - 10}h${Math.round(bar * s)}`} />
        <text x={pad + Math.round(bar * s) + 6} y={H - 6}>
          {q(bar)}
        </text>
      </svg>
      <figcaption data-out="path-caption">
        <span class="swatch steer-leg1" aria-hidden="true" /> {formatQuantity(path.legs[1]?.start ?? path.endTime, "time", { system }).text} asked along +x
        (dashed arrow), <span class="swatch steer-leg2" aria-hidden="true" /> then along +y. It ends at ({m(end.x)}, {m(end.y)}). The body's wobble about its
        mean path is <span data-out="path-wobble">{q(path.wobble)}</span>, too small to see at this scale.
      </figcaption>
    </figure>
  );
}
