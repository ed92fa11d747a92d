/**
 * The fastener calculator: the pull of a spinning part, the stress it puts on the bolts that hold
 * it, the safety factors against the bolts' property class, the speeds at which they yield and
 * break, and a plot of bolt stress against speed.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as fastenerCalculator, fastenerChoices as FASTENER_CHOICES, run as fastenerRun } from "../../calc/calculators/fasteners.ts";
import { fastenerStressCurve, type fastenerCheckInputs, type FastenerCheck } from "../../calc/loads/bolts.ts";
import { formatNumber, radPerSecondToRpm } from "../../calc/core/units.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { Chart } from "../calc-ui/Chart.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { computed } from "../calc-ui/reactive.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { ChoiceField } from "../loads/ChoiceField.tsx";
import { area, axis, Outputs, q, rpm, VERDICT_TONE, verdictRule } from "../loads/format.tsx";
import { Verdict } from "../calc-ui/Verdict.tsx";
import type { ComponentChildren } from "preact";

/** The island name: this file's name. */
export const island = "fasteners";

/** Number of points on the stress-against-speed curve. */
const CURVE_POINTS = 60;
/** The curve runs at least this far past the operating speed… */
const CURVE_PAST_TOP = 1.25;
/** …and past the ultimate speed, but never beyond this multiple of the operating speed. */
const CURVE_PAST_LIMIT = 1.15;
const CURVE_MAX_MULTIPLE = 10;

export function createFastenerModel() {
  const model = createCalculatorModel(fastenerCalculator, fastenerRun);
  /** Bolt stress [Pa] against speed [rad/s], from standstill past the ultimate speed where it fits. */
  const curve = computed(() => {
    const current = model.values.value;
    const result = model.outcome.value.result;
    if (!current || !result) return null;
    const top = current.angularSpeed;
    const maxSpeed = Math.max(top * CURVE_PAST_TOP, Math.min(result.speedAtUltimate * CURVE_PAST_LIMIT, top * CURVE_MAX_MULTIPLE));
    return { maxSpeed, points: fastenerStressCurve(current, { maxSpeed, points: CURVE_POINTS }) };
  });
  return { ...model, input: model.values, curve };
}

type FastenerModel = ReturnType<typeof createFastenerModel>;

export interface FastenerCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

type FieldName = keyof typeof fastenerCheckInputs;
type ChoiceName = keyof typeof FASTENER_CHOICES;

const GROUPS: { legend: string; items: (FieldName | ChoiceName)[] }[] = [
  { legend: "The part", items: ["partMass", "radius", "angularSpeed"] },
  { legend: "The bolts", items: ["size", "propertyClass", "count", "mode", "shearPlane"] },
  { legend: "Strength rule and verdict", items: ["shearRatio", "failBelow", "marginalBelow"] },
];

/** What the stress is compared with, in words with the standard's symbols (ISO 898-1), and in plain words for the chart. */
function strengthNames(r: FastenerCheck): { yield: ComponentChildren; ultimate: ComponentChildren; yieldLine: string; ultimateLine: string } {
  const proof =
    r.propertyClass === "4.6" ? (
      <>
        R<sub>eL,min</sub>
      </>
    ) : (
      <>
        R<sub>p0.2,min</sub>
      </>
    );
  const tensile = (
    <>
      R<sub>m,min</sub>
    </>
  );
  return r.mode === "shear"
    ? {
        yield: <>shear yield, {proof} ÷ √3</>,
        ultimate: (
          <>
            ultimate shear, {Number(r.shearRatio.toPrecision(3))} × {tensile}
          </>
        ),
        yieldLine: "shear yield",
        ultimateLine: "ultimate shear strength",
      }
    : { yield: <>yield, {proof}</>, ultimate: <>ultimate, {tensile}</>, yieldLine: "yield", ultimateLine: "ultimate strength" };
}

/** The verdict, the safety factor and the speed at which the bolts yield, in view while editing. */
function FastenerBar({ model, id }: { model: FastenerModel; id: string }) {
  const { result, error } = model.outcome.value;
  const resultsId = `${id}-results`;
  if (!result)
    return (
      <ResultBar tone={null} figures={[]} resultsId={resultsId} missing={error?.field === null ? error.message : "No result yet: correct the marked field."} />
    );
  return (
    <ResultBar
      tone={VERDICT_TONE[result.verdict]}
      resultsId={resultsId}
      figures={[
        { name: "sf", label: "Safety factor", value: formatNumber(result.safetyFactor) },
        { name: "speed-yield", label: "Yields at", value: rpm(result.speedAtYield) },
      ]}
    />
  );
}

function Results({ model, id }: { model: FastenerModel; id: string }) {
  const system = model.fields.system.value;
  const { result, error } = model.outcome.value;
  const values = model.fields.values.value;
  if (!result || !values) {
    return (
      <div class="calc-results calc-results--empty" id={`${id}-results`} aria-live="polite">
        <p>{error && error.field === null ? error.message : "Results appear when every field above holds a valid value."}</p>
      </div>
    );
  }
  const names = strengthNames(result);
  const governing =
    result.governs === "yield" ? (
      <>
        {names.yield}, {q(result.yieldStrength, "stress", system)}
      </>
    ) : (
      <>
        {names.ultimate}, {q(result.ultimateStrength, "stress", system)}
      </>
    );
  const stressName = result.mode === "shear" ? "Shear stress τ on each bolt" : "Tensile stress σ on each bolt";
  const areaName = result.mode === "shear" && result.shearPlane === "shank" ? "shank area" : "stress area Aₛ";
  return (
    <div class="calc-results" id={`${id}-results`} aria-live="polite">
      <Verdict tone={VERDICT_TONE[result.verdict]} out="verdict">
        Safety factor {formatNumber(result.safetyFactor)} against {governing}. Rule: {verdictRule(values.failBelow, values.marginalBelow)}.
      </Verdict>
      <Outputs
        rows={[
          ["Acceleration at the part", "part-g", q(result.part.acceleration, "acceleration", system)],
          ["Radial pull of the part", "part-force", q(result.part.force, "force", system)],
          ["Pull on each bolt", "bolt-force", q(result.forcePerBolt, "force", system)],
          [`Area per bolt (${areaName})`, "area", area(result.area, system)],
          [stressName, "stress", q(result.stress, "stress", system)],
          [<>Compared with {names.yield}</>, "yield", q(result.yieldStrength, "stress", system)],
          [<>Compared with {names.ultimate}</>, "ultimate", q(result.ultimateStrength, "stress", system)],
          ["Safety factor against yield", "sf-yield", formatNumber(result.safetyFactorYield)],
          ["Safety factor against ultimate", "sf-ult", formatNumber(result.safetyFactorUltimate)],
          ["Speed at which the bolts yield", "speed-yield", rpm(result.speedAtYield)],
          ["Speed at which the bolts break", "speed-ult", rpm(result.speedAtUltimate)],
          ["Pull all bolts carry at ultimate", "ult-load", q(result.ultimateLoad, "force", system)],
        ]}
      />
    </div>
  );
}

function StressChart({ model }: { model: FastenerModel }) {
  const curve = model.curve.value;
  const result = model.outcome.value.result;
  const input = model.input.value;
  if (!curve || !result || !input) return null;
  const stress = axis("stress", model.fields.system.value);
  // Speeds in thousands of rpm: the axis runs to several times the operating speed.
  const krpm = (w: number) => radPerSecondToRpm(w) / 1000;
  const top = krpm(input.angularSpeed);
  const end = curve.points[curve.points.length - 1]!.stress;
  const yMax = Math.max(end, result.ultimateStrength < end * 1.5 ? result.ultimateStrength : 0) * 1.08;
  const names = strengthNames(result);
  const limits = [
    { value: result.yieldStrength, label: `Bolt ${names.yieldLine}`, className: "plot-limit plot-dashed" },
    { value: result.ultimateStrength, label: `Bolt ${names.ultimateLine}`, className: "plot-limit" },
  ].filter((line) => line.value <= yMax);
  const above = limits.length < 2 ? ` The ${limits.length === 0 ? "yield and ultimate lines lie" : "ultimate line lies"} above this plot.` : "";
  return (
    <>
      <Chart
        title="Bolt stress against spin speed"
        summary={`The stress grows with the square of the speed: ${q(result.stress, "stress", model.fields.system.value)} at ${rpm(input.angularSpeed)}; the bolts reach yield at ${rpm(result.speedAtYield)} and break at ${rpm(result.speedAtUltimate)}.${above}`}
        xLabel="Spin speed (× 1000 rpm)"
        yLabel={`Bolt stress (${stress.symbol})`}
        xDomain={[0, krpm(curve.maxSpeed)]}
        yDomain={[0, stress.of(yMax)]}
        series={[
          {
            label: "Stress on each bolt",
            points: curve.points.map((p) => [krpm(p.angularSpeed), stress.of(p.stress)] as const),
            className: "plot-curve",
          },
        ]}
        hLines={limits.map((line) => ({ ...line, value: stress.of(line.value) }))}
        vLines={[{ value: top, label: "Operating speed", className: "plot-marker" }]}
      />
      {above ? (
        <p class="loads-chart-note">
          {above.trim()} Yield at {rpm(result.speedAtYield)}, ultimate at {rpm(result.speedAtUltimate)}.
        </p>
      ) : null}
    </>
  );
}

export default function FastenerCalculator({ id = fastenerCalculator.anchor }: FastenerCalculatorProps) {
  const model = useMemo(() => createFastenerModel(), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields, choices } = model;
  const system = fields.system.value;
  const error = model.outcome.value.error;
  const errorFor = (name: string) => (error && error.field === name ? error.message : null);
  return (
    <section class="calc" id={id} aria-label="Bolt load calculator">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        {GROUPS.map((group) => (
          <fieldset key={group.legend}>
            <legend>{group.legend}</legend>
            {group.items.map((name) =>
              name in FASTENER_CHOICES ? (
                <ChoiceField
                  key={name}
                  idPrefix={id}
                  name={name}
                  spec={FASTENER_CHOICES[name as ChoiceName]}
                  value={choices[name as ChoiceName]}
                  as={name === "mode" || name === "shearPlane" ? "radio" : "select"}
                  note={name === "shearPlane" && choices.mode.value === "tension" ? "Not read in tension." : null}
                  error={errorFor(name)}
                />
              ) : (
                <QuantityField
                  key={name}
                  idPrefix={id}
                  name={name}
                  spec={fields.specs[name as FieldName]}
                  text={fields.texts[name as FieldName]}
                  reading={fields.readings[name as FieldName]}
                  system={system}
                  extraError={errorFor(name)}
                />
              ),
            )}
          </fieldset>
        ))}
      </form>
      <FastenerBar model={model} id={id} />
      <Results model={model} id={id} />
      <StressChart model={model} />
    </section>
  );
}
