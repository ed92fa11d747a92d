/**
 * The sweep: one input varied over a range, time to target and top speed against it, the best
 * value marked. The points run in small batches (see `runSweeps` in the model).
 */
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Chart } from "../calc-ui/Chart.tsx";
import { fieldUnit, type InputSpec } from "../../calc/core/inputs.ts";
import { formatNumber, fromSI, radPerSecondToRpm, type UnitSystem, unitDef } from "../../calc/core/units.ts";
import { summariseSweep } from "../../calc/drivetrain/compare.ts";
import { fmt, inSentence, rpm } from "./format.ts";
import { applies, SPECS, SWEEPABLE, type Name, type SpinUpModel, type SweepPart } from "./model.ts";
import { POINTS_SPEC, type SweepState, sweepSpec } from "./sweep.ts";

export { createSweep } from "./sweep.ts";

type Done = Extract<SweepState, { status: "done" }>;

function status(state: SweepState): string {
  switch (state.status) {
    case "off":
      return "";
    case "waiting":
      return "The sweep waits for valid values in the design and the sweep fields.";
    case "error":
      return state.message;
    case "running":
      return `Simulating: ${state.done} of ${state.total} values…`;
    case "done":
      return `${state.points.length} values simulated.${state.skipped ? ` ${state.skipped} skipped: ${state.skippedReason}` : ""}`;
  }
}

function SweepResults({ state, target, system }: { state: Done; target: number; system: UnitSystem }) {
  const spec: InputSpec = SPECS[state.parameter];
  const unit = fieldUnit(spec, system);
  const symbol = unitDef(unit).symbol;
  const x = (v: number) => fromSI(v, unit);
  const show = (v: number) => `${spec.integer ? String(v) : formatNumber(x(v), 4)}${symbol ? ` ${symbol}` : ""}`;
  const best = state.points[state.optimumIndex]!;
  const xs = state.points.map((p) => x(p.value));
  const xDomain: [number, number] = [Math.min(...xs), Math.max(...xs)];
  // Runs of consecutive points that reach the target, drawn as separate lines.
  const runs: (readonly [number, number])[][] = [];
  let run: (readonly [number, number])[] = [];
  for (const p of state.points) {
    if (p.timeToTarget === null) {
      if (run.length) runs.push(run);
      run = [];
    } else run.push([x(p.value), p.timeToTarget]);
  }
  if (run.length) runs.push(run);
  const summary = summariseSweep(state.points);
  const tops = state.points.map((p) => radPerSecondToRpm(p.topSpeed) / 1000);
  const axis = `${spec.label}${symbol ? ` (${symbol})` : ""}`;
  const marker = [{ value: x(best.value), label: `Best: ${show(best.value)}`, className: "plot-marker plot-dashed" }];
  return (
    <>
      <p class="verdict verdict--ok" data-out="sweep-optimum">
        <strong>
          Best {inSentence(spec.label)}: {show(best.value)}.
        </strong>{" "}
        {state.optimumBy === "time-to-target"
          ? `It reaches the target soonest, in ${fmt(best.timeToTarget!, "time", system)} (shortest time to target of the values swept).`
          : `No value reaches the target; this one tops out highest, at ${rpm(best.topSpeed)}.`}
      </p>
      {runs.length > 0 ? (
        <Chart
          title={`Time to target against ${inSentence(spec.label)}`}
          summary={`Shortest time to target ${formatNumber(summary.shortestTimeToTarget!)} s at ${show(best.value)}; ${summary.missedCount} of ${state.points.length} values do not reach the target.`}
          xLabel={axis}
          yLabel="Time to target (s)"
          xDomain={xDomain}
          yDomain={[0, summary.longestTimeToTarget! * 1.1]}
          series={runs.map((points, i) => ({ label: i === 0 ? "Time to target" : `Time to target (part ${i + 1})`, points, className: "plot-curve" }))}
          vLines={state.optimumBy === "time-to-target" ? marker : []}
        />
      ) : null}
      <Chart
        title={`Top speed against ${inSentence(spec.label)}`}
        summary={`Top speed from ${formatNumber(radPerSecondToRpm(summary.lowestTopSpeed), 4)} to ${formatNumber(radPerSecondToRpm(summary.highestTopSpeed), 4)} rpm; target ${formatNumber(radPerSecondToRpm(target), 4)} rpm.`}
        xLabel={axis}
        yLabel="Top speed (× 1000 rpm)"
        xDomain={xDomain}
        yDomain={[0, Math.max(radPerSecondToRpm(target) / 1000, ...tops) * 1.08]}
        series={[{ label: "Top speed", points: state.points.map((_p, i) => [xs[i]!, tops[i]!] as const), className: "plot-curve-2" }]}
        hLines={[{ value: radPerSecondToRpm(target) / 1000, label: "Target speed", className: "plot-limit plot-dashed" }]}
        vLines={marker}
      />
      <details class="dt-details">
        <summary>Every value swept</summary>
        <div class="dt-table-wrap" role="region" aria-label="Every value swept" tabIndex={0}>
          <table class="dt-table">
            <thead>
              <tr>
                <th scope="col">{axis}</th>
                <th scope="col">Time to target</th>
                <th scope="col">Top speed</th>
                <th scope="col">Peak battery current</th>
              </tr>
            </thead>
            <tbody>
              {state.points.map((p) => (
                <tr key={p.value} class={p.isOptimum ? "dt-best" : undefined}>
                  <th scope="row">
                    {show(p.value)}
                    {p.isOptimum ? " (best)" : ""}
                  </th>
                  <td>{p.timeToTarget === null ? "not reached" : fmt(p.timeToTarget, "time", system)}</td>
                  <td>{rpm(p.topSpeed)}</td>
                  <td>{formatNumber(p.peakBatteryCurrent)} A</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </>
  );
}

/** The status line and the results: re-drawn as the sweep runs, apart from its form. */
function SweepOutput({ model, part: s }: { model: SpinUpModel; part: SweepPart }) {
  const system = model.fields.system.value;
  const state = s.state.value;
  // While a change reruns the sweep, the previous results stay in view until the new ones are in.
  const shown = state.status === "done" ? state : state.status === "running" ? s.last.value : null;
  const target = model.values.value?.targetSpeed;
  return (
    <>
      <p class="calc-status" role="status" data-out="sweep-status" data-ms={state.status === "done" ? state.elapsed.toFixed(2) : undefined}>
        {status(state)}
      </p>
      {shown && target !== undefined ? <SweepResults state={shown} target={target} system={system} /> : null}
    </>
  );
}

/** The sweep's form, status and results (its code loads on first use: see `SweepSection` in the widget). */
export function Sweep({ model, part: s, idPrefix }: { model: SpinUpModel; part: SweepPart; idPrefix: string }) {
  const system = model.fields.system.value;
  const type = model.driveType.value;
  const parameter = s.parameter.value;
  return (
    <section class="dt-section" aria-labelledby={`${idPrefix}-sweep-title`}>
      <h3 id={`${idPrefix}-sweep-title`}>Sweep one input</h3>
      <div class="dt-sweep-form">
        <div class="field">
          <label for={`${idPrefix}-sweep-p`}>Input to vary</label>
          <select id={`${idPrefix}-sweep-p`} value={parameter} onChange={(event) => s.setParameter((event.currentTarget as HTMLSelectElement).value as Name)}>
            {SWEEPABLE.filter((n) => applies(n, type)).map((n) => (
              <option key={n} value={n}>
                {SPECS[n].label}
              </option>
            ))}
          </select>
        </div>
        <QuantityField idPrefix={idPrefix} name="sweepFrom" spec={sweepSpec(parameter, "from")} text={s.from} reading={s.fromReading} system={system} />
        <QuantityField
          idPrefix={idPrefix}
          name="sweepTo"
          spec={sweepSpec(parameter, "to")}
          text={s.to}
          reading={s.toReading}
          system={system}
          extraError={s.rangeError.value}
        />
        <QuantityField idPrefix={idPrefix} name="sweepPoints" spec={POINTS_SPEC} text={s.points} reading={s.pointsReading} system={system} />
      </div>
      <div class="dt-row">
        {s.on.value ? (
          <button type="button" class="button button--quiet" onClick={() => (s.on.value = false)}>
            Hide the sweep
          </button>
        ) : (
          <button type="button" class="button" onClick={s.start}>
            Run the sweep
          </button>
        )}
      </div>
      <SweepOutput model={model} part={s} />
    </section>
  );
}
