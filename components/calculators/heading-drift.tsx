/**
 * The heading drift-budget calculator: how far a spin-rate estimate ω̂ = √((a − b̂)/r̂) drifts at a
 * speed, which error terms grow or fall with speed, the firmware radii and the speeds that keep it
 * within the driver's trim, a plot of drift against speed; and, in a second section, one sensor
 * against an opposed pair when the spin centre is uncertain.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as driftCalculator, run as driftRun } from "../../calc/calculators/heading-drift.ts";
import { form as opposedCalculator, run as opposedRun } from "../../calc/calculators/opposed-sensors.ts";
import type { HeadingDriftResult } from "../../calc/heading/drift-budget.ts";
import type { headingDriftInputs } from "../../calc/heading/drift-inputs.ts";
import type { opposedSensorsInputs } from "../../calc/heading/opposed.ts";
import type { RadiusBand, SpeedRange } from "../../calc/heading/drift.ts";
import { formatNumber, fromSI, radPerSecondToRpm, type UnitSystem } from "../../calc/core/units.ts";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { Chart } from "../calc-ui/Chart.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { syncWithUrl } from "../calc-ui/url-sync.ts";
import { computed } from "../calc-ui/reactive.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { saveAll } from "../calc-ui/save.ts";
import { degPerSecond, degrees, inSystem } from "../heading/format.ts";
import { DataTable, Empty, FieldsForm, Outputs, Verdict, type FieldGroup } from "../heading/ui.tsx";

/** The island name: this file's name. */
export const island = "heading-drift";

/** The drift budget (plain link keys) and the opposed-sensors comparison (keys "p."). */
export function createDriftModel() {
  const drift = createCalculatorModel(driftCalculator, driftRun);
  const pair = createCalculatorModel(opposedCalculator, opposedRun);
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
    pairModel: pair,
    fields: drift.fields,
    pair: pair.fields,
    outcome: drift.outcome,
    pairOutcome: pair.outcome,
    curves,
    /** Switches both sections' unit system together. */
    setSystem(next: UnitSystem) {
      drift.setSystem(next);
      pair.setSystem(next);
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
const PAIR_GROUPS: FieldGroup<typeof opposedSensorsInputs>[] = [
  { legend: "Two sensors, one each side", names: ["angularSpeed", "radius1", "radius2", "offset"] },
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

function PairResults({ model }: { model: DriftModel }) {
  const { result, error } = model.pairOutcome.value;
  const values = model.pair.values.value;
  if (!result || !values) return <Empty error={error} />;
  const system = model.pair.system.value;
  const e = inSystem(values.offset, "length", system);
  const budget = model.fields.values.value?.budget;
  const one = result.singleWorstDriftRate;
  // Zero in exact arithmetic; anything left is round-off far below what can be shown.
  const pair = result.pairWorstDriftRate < 1e-9 ? "0 °/s" : size(result.pairWorstDriftRate);
  const s1 = (r: typeof result.towardSensor1) => (r.sensor1.driftRate === null ? "no estimate" : degPerSecond(r.sensor1.driftRate));
  const over = one === null || (budget !== undefined && one > budget);
  return (
    <div class="calc-results" aria-live="polite">
      <Verdict tone="info" reason="the pair cancels the offset">
        {one === null
          ? `With the centre up to ${e} off, sensor 1 may sit at or past it and give no estimate`
          : `With the centre anywhere within ±${e}, sensor 1 alone drifts up to ${size(one)}${budget === undefined ? "" : `, ${over ? "over" : "within"} the ±${size(budget)} budget`}`}
        ; the pair drifts {pair}.
      </Verdict>
      <Outputs
        items={[
          [`Sensor 1 alone, centre ${e} toward it`, "pair-s1-toward", s1(result.towardSensor1)],
          [`Sensor 1 alone, centre ${e} away`, "pair-s1-away", s1(result.towardSensor2)],
          [
            "Sensor 1 alone, worst per revolution",
            "pair-s1-rev",
            result.singleWorstPerRevolution === null ? "no estimate" : degrees(result.singleWorstPerRevolution, false),
          ],
          ["The pair, (a₁ + a₂)/(r₁ + r₂)", "pair-drift", pair],
          [
            "Offset found from a₁ − a₂",
            "pair-offset",
            result.towardSensor1.offsetEstimate === null ? "none" : inSystem(result.towardSensor1.offsetEstimate, "length", system),
          ],
        ]}
      />
    </div>
  );
}

export default function HeadingDriftCalculator({ id = driftCalculator.anchor }: HeadingDriftCalculatorProps) {
  const model = useMemo(() => createDriftModel(), []);
  useEffect(() => {
    const stops = [syncWithUrl(model.drift), syncWithUrl(model.pairModel)];
    return () => {
      for (const stop of stops) stop();
    };
  }, [model]);
  const link = () => {
    const { origin, pathname, search } = window.location;
    return `${origin}${pathname}?${model.pairModel.queryFor(model.drift.queryFor(search))}#${id}`;
  };
  return (
    <section class="calc" id={id} aria-label="Heading drift budget calculator">
      <Notices notices={model.fields.notices} />
      <Notices notices={model.pair.notices} />
      <Toolbar idPrefix={id} system={model.fields.system} onSystem={model.setSystem} link={link} save={() => saveAll([model.drift, model.pairModel])} />
      <FieldsForm fields={model.fields} groups={DRIFT_GROUPS} idPrefix={id} error={model.outcome.value.error} />
      <DriftBar model={model} id={id} />
      <DriftResults model={model} id={id} />
      <DriftChart model={model} />
      <div class="calc-section" role="group" aria-labelledby={`${id}-pair-title`}>
        <h3 id={`${id}-pair-title`}>Two opposed sensors</h3>
        <FieldsForm fields={model.pair} groups={PAIR_GROUPS} idPrefix={`${id}-p`} error={model.pairOutcome.value.error} />
        <PairResults model={model} />
      </div>
    </section>
  );
}
