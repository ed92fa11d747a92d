/**
 * The heading drift-budget calculator: how far a spin-rate estimate ω̂ = √((a − b̂)/r̂) drifts at a
 * speed, which error terms grow or fall with speed, the firmware radii and the speeds that keep it
 * within the driver's trim, a plot of drift against speed; and, in a second section, one sensor
 * against an opposed pair when the spin centre is uncertain.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as driftCalculator, run as driftRun } from "../../calc/calculators/heading-drift.ts";
import type { HeadingDriftResult } from "../../calc/heading/drift-budget.ts";
import type { headingDriftInputs } from "../../calc/heading/drift-inputs.ts";
import type { RadiusBand, SpeedRange } from "../../calc/heading/drift.ts";
import { formatNumber, fromSI, radPerSecondToRpm, type UnitSystem } from "../../calc/core/units.ts";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { Chart } from "../calc-ui/Chart.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { syncWithUrl } from "../calc-ui/url-sync.ts";
import { computed, signal } from "../calc-ui/reactive.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { saveAll } from "../calc-ui/save.ts";
import { degPerSecond, degrees, inSystem } from "../heading/format.ts";
import { DataTable, Empty, FieldsForm, Outputs, Verdict, type FieldGroup } from "../heading/ui.tsx";
import type { PairModel } from "../heading/opposed-pair.tsx";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "heading-drift";

/**
 * The drift budget (plain link keys) and, once opened, the opposed-sensors comparison (keys "p."),
 * whose code loads only then (components/heading/opposed-pair.tsx).
 */
export function createDriftModel() {
  const drift = createCalculatorModel(driftCalculator, driftRun);
  /** The pair section's code and model, once loaded. */
  const pair = signal<{ model: PairModel; view: typeof import("../heading/opposed-pair.tsx") } | null>(null);
  let opening: Promise<PairModel> | null = null;
  /** The drift plot's curves [rpm, °/s]: exact drift, and the linearised speed-proportional and offset parts. */
  const curves = computed(() => {
    const result = drift.outcome.value.result;
    if (!result) return null;
    const defined = result.series.filter((p) => p.driftRate !== null);
    const at = (pick: (p: (typeof defined)[number]) => number) => defined.map((p) => [radPerSecondToRpm(p.angularSpeed), fromSI(pick(p), "deg/s")] as const);
    return { exact: at((p) => p.driftRate!), proportional: at((p) => p.linear.speedProportional), offset: at((p) => p.linear.bias) };
  });
  return {
    drift,
    fields: drift.fields,
    outcome: drift.outcome,
    pair,
    curves,
    /** Loads and opens the pair section (once); resolves to its model. */
    openPair(): Promise<PairModel> {
      opening ??= import("../heading/opposed-pair.tsx").then((view) => {
        const model = view.openPair(drift.fields.system.value);
        pair.value = { model, view };
        return model;
      });
      return opening;
    },
    /** Switches both sections' unit system together. */
    setSystem(next: UnitSystem) {
      drift.setSystem(next);
      pair.value?.model.setSystem(next);
    },
  };
}

type DriftModel = ReturnType<typeof createDriftModel>;

export interface HeadingDriftCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

const DRIFT_GROUPS: FieldGroup<typeof headingDriftInputs>[] = [
  { legend: "Speed and budget", names: ["angularSpeed", "budget"] },
  { legend: "Radius", names: ["assumedRadius", "trueRadius"] },
  { legend: "Sensor", names: ["scaleError", "bias", "biasCorrection", "tilt", "accelerationNoise"] },
  { legend: "Plot range", names: ["lowSpeed", "highSpeed"] },
];

/** A drift rate without its sign: "10 °/s". */
const size = (v: number) => degPerSecond(v, false);

function bandText(band: RadiusBand, system: UnitSystem): string {
  const len = (v: number) => inSystem(v, "length", system, 5);
  if (band.status === "no-estimate") return "none: no estimate at this speed";
  if (band.status === "upper-unbounded") return `${len(band.low!)} or more (no upper limit: the budget is at least the spin rate)`;
  return `${len(band.low!)} to ${len(band.high!)}`;
}

function rangeText(range: SpeedRange, system: UnitSystem): string {
  const s = (v: number) => inSystem(v, "angularSpeed", system, 4);
  if (range.status === "empty") return "none: over budget at every speed";
  const from =
    range.lowLimit === "standstill"
      ? "from standstill"
      : `from ${s(range.low!)}${range.lowLimit === "estimate-undefined" ? " (where an estimate starts)" : ""}`;
  return range.status === "unbounded-above" ? `${from} up, with no upper limit` : `${from} to ${s(range.high!)}`;
}

function DriftVerdict({ r, speed, budget }: { r: HeadingDriftResult; speed: string; budget: string }) {
  const drift = r.atSpeed.driftRate;
  if (drift === null || r.budgetMargin === null) {
    return (
      <Verdict tone="bad" reason="no estimate">
        At {speed} the reading minus the firmware offset is 0 or less: there is no spin rate to integrate.
      </Verdict>
    );
  }
  const within = r.verdict === "within-budget";
  return (
    <Verdict tone={within ? "ok" : "bad"} reason={within ? "within the trim budget" : "over the trim budget"}>
      At {speed} the heading {drift > 0 ? "runs ahead" : "falls behind"} at {size(drift)}; the driver can trim ±{budget},{" "}
      {within ? `leaving ${size(r.budgetMargin)} to spare` : `${size(r.budgetMargin)} short`}.
    </Verdict>
  );
}

/** The verdict, the drift per revolution and the radius that zeroes it, in view while editing. */
function DriftBar({ model, id }: { model: DriftModel; id: string }) {
  const { result, error } = model.outcome.value;
  const resultsId = `${id}-results`;
  if (!result)
    return (
      <ResultBar tone={null} figures={[]} resultsId={resultsId} missing={error?.field === null ? error.message : "No result yet: correct the marked field."} />
    );
  const system = model.fields.system.value;
  const p = result.atSpeed;
  if (p.driftRate === null || result.budgetMargin === null)
    return <ResultBar tone="bad" reason="no estimate at this speed" figures={[]} resultsId={resultsId} />;
  const zero = result.radiusBand.zeroDriftRadius;
  return (
    <ResultBar
      tone={result.verdict === "within-budget" ? "ok" : "bad"}
      reason={result.verdict === "within-budget" ? undefined : "over the trim budget"}
      resultsId={resultsId}
      figures={[
        { name: "drift-rev", label: p.driftRate > 0 ? "Ahead per turn" : "Behind per turn", value: degrees(Math.abs(p.driftPerRevolution!), false) },
        { name: "radius-zero", label: "Radius for zero drift", value: zero === null ? "none" : inSystem(zero, "length", system, 5) },
      ]}
    />
  );
}

function DriftResults({ model, id }: { model: DriftModel; id: string }) {
  const { result, error } = model.outcome.value;
  const values = model.fields.values.value;
  if (!result || !values) return <Empty error={error} id={`${id}-results`} />;
  const system = model.fields.system.value;
  const speed = inSystem(values.angularSpeed, "angularSpeed", system, 4);
  const p = result.atSpeed;
  const none = "no estimate";
  const zero = result.radiusBand.zeroDriftRadius;
  const terms = [
    ["radius", "Radius (true vs firmware)", p.linear.radius, "grows ∝ ω"],
    ["scale", "Scale error", p.linear.scale, "grows ∝ ω"],
    ["tilt", "Axis tilt", p.linear.tilt, "grows ∝ ω"],
    ["bias", "Offset left in, b − b̂", p.linear.bias, "falls ∝ 1/ω"],
    ["sum", "Sum, to first order", p.linear.total, ""],
  ] as const;
  return (
    <div class="calc-results" id={`${id}-results`} aria-live="polite">
      <DriftVerdict r={result} speed={speed} budget={size(values.budget)} />
      <Outputs
        items={[
          [`Drift rate at ${speed}`, "drift-rate", p.driftRate === null ? none : degPerSecond(p.driftRate)],
          ["Heading error per revolution", "drift-rev", p.driftPerRevolution === null ? none : degrees(p.driftPerRevolution)],
          ["Estimated ÷ true speed", "speed-ratio", p.speedRatio === null ? none : formatNumber(p.speedRatio, 5)],
          [`Firmware radius within budget at ${speed}`, "radius-band", bandText(result.radiusBand, system)],
          ["Firmware radius for zero drift there", "radius-zero", zero === null ? "none" : inSystem(zero, "length", system, 5)],
          ["Speeds within budget", "speed-range", rangeText(result.speedRange, system)],
          ["No estimate below", "lowest-speed", inSystem(result.lowestEstimableSpeed, "angularSpeed", system, 4)],
          ["Scatter of one speed estimate (1σ)", "rate-noise", result.rateNoise === null || values.accelerationNoise === 0 ? null : size(result.rateNoise)],
        ]}
      />
      <DataTable id={`${id}-terms`} caption={`Where the drift at ${speed} comes from`} head={["Term", "Drift", "With speed"]}>
        {terms.map(([key, label, value, trend]) => (
          <tr key={key}>
            <th scope="row">{label}</th>
            <td data-out={`term-${key}`}>{degPerSecond(value)}</td>
            <td>{trend}</td>
          </tr>
        ))}
      </DataTable>
    </div>
  );
}

function DriftChart({ model }: { model: DriftModel }) {
  const values = model.fields.values.value;
  const curves = model.curves.value;
  if (!values || !curves || curves.exact.length === 0) return null;
  const budget = size(values.budget);
  const limit = fromSI(values.budget, "deg/s");
  const ys = curves.exact.map(([, y]) => y);
  const low = Math.min(-limit, ...ys);
  const high = Math.max(limit, ...ys);
  const pad = (high - low) * 0.08;
  const hi = radPerSecondToRpm(values.highSpeed);
  return (
    <Chart
      title="Heading drift against spin speed"
      summary={`Drift from ${formatNumber(ys[0]!)} °/s at ${formatNumber(curves.exact[0]![0], 4)} rpm to ${formatNumber(ys[ys.length - 1]!)} °/s at ${formatNumber(hi, 4)} rpm; budget ±${budget}.`}
      xLabel="Spin speed (rpm)"
      yLabel="Drift (°/s)"
      xDomain={[radPerSecondToRpm(values.lowSpeed), hi]}
      yDomain={[low - pad, high + pad]}
      hBands={[{ from: -limit, to: limit, label: `Within ±${budget}`, className: "plot-safe" }]}
      series={[
        { label: "Drift, exact", points: curves.exact, className: "plot-curve" },
        { label: "Radius, scale and tilt terms (∝ ω)", points: curves.proportional, className: "plot-curve-2 plot-dashed" },
        { label: "Offset term (∝ 1/ω)", points: curves.offset, className: "plot-curve-3 plot-dashed" },
      ]}
      vLines={[{ value: radPerSecondToRpm(values.angularSpeed), label: "Chosen speed", className: "plot-marker plot-dashed" }]}
    />
  );
}

/** The pair section: a button until opened (or opened at once when the link carries its keys). */
function PairPart({ model, id }: { model: DriftModel; id: string }) {
  const open = model.pair.value;
  if (!open)
    return (
      <p>
        <button type="button" class="button" aria-controls={`${id}-pair`} aria-expanded="false" onClick={() => void model.openPair()}>
          Compare with two opposed sensors
        </button>
      </p>
    );
  return <open.view.PairSection model={open.model} id={id} budget={model.fields.values.value?.budget} />;
}

export default function HeadingDriftCalculator({ id = driftCalculator.anchor }: HeadingDriftCalculatorProps) {
  const model = useMemo(() => createDriftModel(), []);
  useEffect(() => {
    const stop = syncWithUrl(model.drift);
    if (/(?:^|[?&])p\./.test(window.location.search)) void model.openPair();
    return stop;
  }, [model]);
  const opened = model.pair.value?.model;
  useEffect(() => (opened ? syncWithUrl(opened) : undefined), [opened]);
  const pairModel = () => model.pair.value?.model;
  const link = () => {
    const { origin, pathname, search } = window.location;
    const query = model.drift.queryFor(search);
    return `${origin}${pathname}?${pairModel()?.queryFor(query) ?? query}#${id}`;
  };
  const save = () => {
    const pair = pairModel();
    return saveAll(pair ? [model.drift, pair] : [model.drift]);
  };
  const pairNotices = model.pair.value?.model.fields.notices;
  return (
    <section class="calc" id={id} aria-label="Heading drift budget calculator">
      <Notices notices={model.fields.notices} />
      {pairNotices && <Notices notices={pairNotices} />}
      <Toolbar idPrefix={id} system={model.fields.system} onSystem={model.setSystem} link={link} save={save} />
      <FieldsForm fields={model.fields} groups={DRIFT_GROUPS} idPrefix={id} error={() => model.outcome.value.error} />
      <HydrateLater>
        <DriftBar model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <DriftResults model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <DriftChart model={model} />
      </HydrateLater>
      <div class="calc-section" role="group" aria-labelledby={`${id}-pair-title`} id={`${id}-pair`}>
        <h3 id={`${id}-pair-title`}>Two opposed sensors</h3>
        <PairPart model={model} id={id} />
      </div>
    </section>
  );
}
