/**
 * The accelerometer-placement calculator: where a sensor can sit on a spinning robot, what it and
 * one other part see at top speed, with a plot of acceleration against speed.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as placement, run as placementRun } from "../../calc/calculators/placement.ts";
import { centripetalAccelerationCurve, type AccelerometerPlacement } from "../../calc/rotation/rotation.ts";
import { formatNumber, formatQuantity, fromSI, radPerSecondToRpm, type UnitSystem } from "../../calc/core/units.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { Chart } from "../calc-ui/Chart.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { Verdict } from "../calc-ui/Verdict.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { computed } from "../calc-ui/reactive.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "placement";

/** An acceleration as the sensor's data sheet gives it, in standard gravities: "217 gₙ". */
const accel = (v: number) => formatQuantity(v, "acceleration", { unit: "gn" }).text;

/** The plot runs past the top speed by this factor, to show the margin. */
const CURVE_PAST_TOP = 1.2;

export function createPlacementModel() {
  const model = createCalculatorModel(placement, placementRun);
  /** Acceleration [g] against speed [rpm] at the chosen radius, from 0 to 1.2 × top speed. */
  const curve = computed(() => {
    const values = model.values.value;
    if (!values || !model.outcome.value.result) return null;
    const curve = centripetalAccelerationCurve({ radius: values.radius, maxSpeed: values.topSpeed * CURVE_PAST_TOP, intervals: 60 });
    const points = curve.map((p) => [radPerSecondToRpm(p.angularSpeed), fromSI(p.acceleration, "gn")] as [number, number]);
    return { points, maxRpm: points.at(-1)![0] };
  });
  return { ...model, curve };
}

type PlacementModel = ReturnType<typeof createPlacementModel>;

export interface PlacementCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

const GROUPS: { legend: string; names: (keyof typeof placement.inputs)[] }[] = [
  { legend: "Speeds", names: ["topSpeed", "lowSpeed"] },
  { legend: "Sensor", names: ["radius", "fullScale", "margin", "step", "noise", "resolution"] },
  { legend: "Another part to check", names: ["partMass", "partRadius"] },
];

function verdictText(r: AccelerometerPlacement, system: UnitSystem): { tone: "ok" | "warn" | "bad"; reason?: string; detail: string } {
  const len = (v: number) => formatQuantity(v, "length", { system }).text;
  const window = `${len(r.minRadius)} to ${len(r.maxRadius)}`;
  switch (r.verdict) {
    case "fits":
      return { tone: "ok", detail: `The sensor radius lies inside the usable window, ${window}.` };
    case "too-far-out":
      return {
        tone: "bad",
        reason: "too far out",
        detail: `At top speed the sensor would read ${accel(r.accelerationAtTop)}, ${formatNumber(r.fullScaleUsed * 100)} % of its full scale. Move it in to ${len(r.maxRadius)} or less, or use a sensor with a larger range.`,
      };
    case "too-close-in":
      return {
        tone: "warn",
        reason: "too close in",
        detail: `At the lowest tracked speed one reading resolves the spin rate only to ${formatNumber(r.resolutionAtLow * 100)} %. Move it out to ${len(r.minRadius)} or more (the window is ${window}).`,
      };
    case "no-window":
      return {
        tone: "bad",
        reason: "no radius satisfies both limits",
        detail: `Resolving the lowest speed needs at least ${len(r.minRadius)}, but staying under full scale at top speed needs at most ${len(r.maxRadius)}. Use a sensor with a larger range or a finer resolution, track from a higher speed, or accept coarser speed resolution.`,
      };
  }
}

/** The verdict and the usable window, kept in view while the fields are edited. */
function PlacementBar({ model, id }: { model: PlacementModel; id: string }) {
  const system = model.fields.system.value;
  const { result, error } = model.outcome.value;
  if (!result) {
    const missing = error && error.field === null ? error.message : "No result yet: correct the marked field.";
    return <ResultBar tone={null} figures={[]} resultsId={`${id}-results`} missing={missing} />;
  }
  const verdict = verdictText(result, system);
  const len = (v: number) => formatQuantity(v, "length", { system }).text;
  const window = result.verdict === "no-window" ? "none" : `${len(result.minRadius)} – ${len(result.maxRadius)}`;
  return (
    <ResultBar
      tone={verdict.tone}
      reason={verdict.reason}
      resultsId={`${id}-results`}
      figures={[
        { name: "window", label: "Usable radius", value: window },
        { name: "accel-top", label: "At top speed", value: accel(result.accelerationAtTop) },
      ]}
    />
  );
}

function Results({ model, id }: { model: PlacementModel; id: string }) {
  const system = model.fields.system.value;
  const { result, error } = model.outcome.value;
  if (!result) {
    return (
      <div class="calc-results calc-results--empty" id={`${id}-results`} aria-live="polite">
        <p>{error && error.field === null ? error.message : "Results appear when every field above holds a valid value."}</p>
      </div>
    );
  }
  const q = (v: number, kind: Parameters<typeof formatQuantity>[1]) => formatQuantity(v, kind, { system }).text;
  const verdict = verdictText(result, system);
  return (
    <div class="calc-results" id={`${id}-results`} aria-live="polite">
      <Verdict tone={verdict.tone} reason={verdict.reason}>
        {verdict.detail}
      </Verdict>
      <dl class="results-grid">
        <div>
          <dt>Smallest usable radius</dt>
          <dd data-out="min-radius">{q(result.minRadius, "length")}</dd>
        </div>
        <div>
          <dt>Largest usable radius</dt>
          <dd data-out="max-radius">{q(result.maxRadius, "length")}</dd>
        </div>
        <div>
          <dt>Largest radius with no headroom (reads full scale at top speed)</dt>
          <dd data-out="max-radius-bare">{q(result.maxRadiusNoHeadroom, "length")}</dd>
        </div>
        <div>
          <dt>Sensor reading at top speed</dt>
          <dd data-out="accel-top">{accel(result.accelerationAtTop)}</dd>
        </div>
        <div>
          <dt>Share of full scale used</dt>
          <dd data-out="fs-used">{formatNumber(result.fullScaleUsed * 100)} %</dd>
        </div>
        <div>
          <dt>Speed at which the sensor saturates</dt>
          <dd data-out="sat-speed">{formatNumber(radPerSecondToRpm(result.saturationSpeed))} rpm</dd>
        </div>
        <div>
          <dt>Sensor reading at lowest tracked speed</dt>
          <dd data-out="accel-low">{accel(result.accelerationAtLow)}</dd>
        </div>
        <div>
          <dt>Speed resolution of one reading there</dt>
          <dd data-out="res-low">{formatNumber(result.resolutionAtLow * 100)} %</dd>
        </div>
        <div>
          <dt>Other part: load at top speed</dt>
          <dd data-out="part-g">{accel(result.part.acceleration)}</dd>
        </div>
        <div>
          <dt>Other part: pull on its mounts</dt>
          <dd data-out="part-force">{q(result.part.force, "force")}</dd>
        </div>
      </dl>
    </div>
  );
}

function PlacementChart({ model }: { model: PlacementModel }) {
  const values = model.fields.values.value;
  const curve = model.curve.value;
  const result = model.outcome.value.result;
  if (!values || !curve || !result) return null;
  const fullScaleG = fromSI(values.fullScale, "gn");
  const limitG = fromSI(result.readingLimit, "gn");
  const topG = fromSI(result.accelerationAtTop, "gn");
  const yMax = Math.max(fullScaleG, Math.min(topG * 1.44, fullScaleG * 3)) * 1.1;
  return (
    <Chart
      title="Acceleration at the sensor against spin speed"
      summary={`At the chosen radius the sensor reads ${accel(result.accelerationAtTop)} at top speed against a limit of ${accel(result.readingLimit)} (full scale ${accel(values.fullScale)}).`}
      xLabel="Spin speed (rpm)"
      yLabel="Acceleration (gₙ)"
      xDomain={[0, curve.maxRpm]}
      yDomain={[0, yMax]}
      hBands={[{ from: 0, to: limitG, label: "Safe region (below full scale less headroom)", className: "plot-safe" }]}
      series={[{ label: "Sensor reading at the chosen radius", points: curve.points, className: "plot-curve" }]}
      hLines={[
        { value: fullScaleG, label: "Sensor full scale", className: "plot-limit" },
        { value: limitG, label: "Full scale less headroom", className: "plot-limit plot-dashed" },
      ]}
      vLines={[
        { value: radPerSecondToRpm(values.topSpeed), label: "Top speed", className: "plot-marker" },
        { value: radPerSecondToRpm(values.lowSpeed), label: "Lowest tracked speed", className: "plot-marker plot-dashed" },
      ]}
    />
  );
}

export default function PlacementCalculator({ id = "placement-calculator" }: PlacementCalculatorProps) {
  const model = useMemo(() => createPlacementModel(), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields } = model;
  const system = fields.system.value;
  const error = model.outcome.value.error;
  return (
    <section class="calc" id={id} aria-label="Accelerometer placement calculator">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        {GROUPS.map((group) => (
          <fieldset key={group.legend}>
            <legend>{group.legend}</legend>
            {group.names.map((name) => (
              <QuantityField
                key={name}
                idPrefix={id}
                name={name}
                spec={fields.specs[name]}
                text={fields.texts[name]}
                reading={fields.readings[name]}
                system={system}
                extraError={error && error.field === name ? error.message : null}
              />
            ))}
          </fieldset>
        ))}
      </form>
      <HydrateLater>
        <PlacementBar model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <Results model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <PlacementChart model={model} />
      </HydrateLater>
    </section>
  );
}
