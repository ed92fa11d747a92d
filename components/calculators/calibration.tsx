/**
 * The calibration calculator: readings of (reference speed, radial acceleration) pasted or loaded
 * from a local file, fitted to a = r·ω² + b by least squares, Theil–Sen and a Huber M-fit, with
 * uncertainties, spike flags, skipped lines, plots of the data, the fits and the residuals, and a
 * link that carries the fitted radius and offset into the drift budget.
 */
import { useEffect, useMemo } from "preact/hooks";
import type { CalibrationCurvePoint } from "../../calc/heading/calibration.ts";
import type { ConfidenceInterval } from "../../calc/numerics/line-fit.ts";
import { formatNumber, fromSI, radPerSecondToRpm, type UnitSystem } from "../../calc/core/units.ts";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { ACCELERATION_UNITS, createCalibrationModel, SPEED_UNITS, type CalibrationModel } from "../heading/calibration-model.ts";
import { inSystem, plain } from "../heading/format.ts";
import { DataTable, Empty, Outputs, Verdict } from "../heading/ui.tsx";

/** The island name: this file's name. */
export const island = "calibration";
import { Chart } from "../calc-ui/Chart.tsx";

export interface CalibrationCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

/** Largest file read, in bytes (a log of 500 readings is a few kilobytes). */
const MAX_FILE_BYTES = 1_000_000;

const METHOD_NAMES = {
  "least-squares": "least squares, all readings",
  "least-squares-without-spikes": "least squares without the flagged readings",
  "theil-sen": "Theil–Sen (too few readings left for least squares)",
};

function DataField({ model, id }: { model: CalibrationModel; id: string }) {
  const error = model.outcome.value.error;
  const message = error && error.field === "rows" ? error.message : null;
  const fileError = model.fileError.value;
  const readFile = (event: Event) => {
    const input = event.currentTarget as HTMLInputElement;
    const file = input.files?.[0];
    if (!file) return;
    void model.loadTextReader();
    if (file.size > MAX_FILE_BYTES) {
      model.fileError.value = `That file is ${formatNumber(file.size / 1e6)} MB; this page reads files up to 1 MB.`;
      return;
    }
    const reader = new FileReader();
    reader.onload = () => {
      model.fileError.value = null;
      model.text.value = String(reader.result ?? "");
    };
    reader.onerror = () => (model.fileError.value = "The file could not be read.");
    reader.readAsText(file);
  };
  return (
    <fieldset>
      <legend>Readings</legend>
      <div class={`field${message ? " field--error" : ""}`}>
        <label for={`${id}-data`}>Speed and radial reading, one pair per line</label>
        <textarea
          id={`${id}-data`}
          rows={12}
          spellcheck={false}
          autoComplete="off"
          value={model.text.value}
          aria-invalid={message ? "true" : undefined}
          aria-describedby={`${id}-data-help${message ? ` ${id}-data-error` : ""}`}
          onFocus={() => void model.loadTextReader()}
          onInput={(event) => (model.text.value = (event.currentTarget as HTMLTextAreaElement).value)}
        />
        <p class="field-help" id={`${id}-data-help`}>
          Commas, semicolons, tabs or spaces; a header line may name the units; # starts a comment.
        </p>
        {message ? (
          <p class="field-error" id={`${id}-data-error`} role="alert">
            {message}
          </p>
        ) : null}
      </div>
      <div class={`field${fileError ? " field--error" : ""}`}>
        <label for={`${id}-file`}>Or load a .csv or .txt file</label>
        <input id={`${id}-file`} type="file" accept=".csv,.txt,.tsv,text/csv,text/plain" aria-describedby={`${id}-file-help`} onChange={readFile} />
        <p class="field-help" id={`${id}-file-help`}>
          The file is read in this browser; nothing is uploaded.
        </p>
        {fileError ? (
          <p class="field-error" role="alert">
            {fileError}
          </p>
        ) : null}
      </div>
    </fieldset>
  );
}

function UnitSelect<K extends string>({ id, label, options, value }: { id: string; label: string; options: Record<K, string>; value: { value: K } }) {
  return (
    <div class="field">
      <label for={id}>{label}</label>
      <select
        id={id}
        aria-describedby={`${id}-help`}
        value={value.value}
        onChange={(event) => (value.value = (event.currentTarget as HTMLSelectElement).value as K)}
      >
        {(Object.keys(options) as K[]).map((key) => (
          <option key={key} value={key}>
            {key === "g" ? "gₙ (standard gravity)" : key === "m/s2" ? "m/s²" : key}
          </option>
        ))}
      </select>
      <p class="field-help" id={`${id}-help`}>
        Used when the header names no unit.
      </p>
    </div>
  );
}

function Settings({ model, id }: { model: CalibrationModel; id: string }) {
  const { fields } = model;
  const error = model.outcome.value.error;
  return (
    <fieldset>
      <legend>Reading and fitting</legend>
      <UnitSelect id={`${id}-su`} label="Bare speeds are in" options={SPEED_UNITS} value={model.speedUnit} />
      <UnitSelect id={`${id}-au`} label="Bare readings are in" options={ACCELERATION_UNITS} value={model.accelerationUnit} />
      {(["spikeThreshold", "confidence"] as const).map((name) => (
        <QuantityField
          key={name}
          idPrefix={id}
          name={name}
          spec={fields.specs[name]}
          text={fields.texts[name]}
          reading={fields.readings[name]}
          system={fields.system.value}
          extraError={error && error.field === name ? error.message : null}
        />
      ))}
    </fieldset>
  );
}

/** The fitted radius and offset, in view while the readings are edited. */
function CalibrationBar({ model, id }: { model: CalibrationModel; id: string }) {
  const { fit } = model.outcome.value;
  const system: UnitSystem = model.fields.system.value;
  const resultsId = `${id}-results`;
  if (!fit) return <ResultBar tone={null} figures={[]} resultsId={resultsId} missing="No fit yet: see the readings above." />;
  if (!model.handoff.value) return <ResultBar tone="bad" reason="no usable radius" figures={[]} resultsId={resultsId} />;
  return (
    <ResultBar
      tone={null}
      resultsId={resultsId}
      figures={[
        { name: "radius", label: "Radius r̂", value: inSystem(fit.radius, "length", system, 5) },
        { name: "bias", label: "Offset b̂", value: inSystem(fit.bias, "acceleration", system, 3) },
      ]}
    />
  );
}

function Results({ model, id }: { model: CalibrationModel; id: string }) {
  const { fit, error } = model.outcome.value;
  const { lines, rows, dropped } = model.data.value;
  const parsed = model.parsed.value;
  const system: UnitSystem = model.fields.system.value;
  const len = (v: number) => inSystem(v, "length", system, 5);
  const acc = (v: number) => inSystem(v, "acceleration", system, 3);
  const interval = (i: ConfidenceInterval | null | undefined, f: (v: number) => string) => (i ? `${f(i.low)} to ${f(i.high)}` : "—");
  const skipped = [
    ...parsed.problems.map((p) => `Line ${p.line}${p.text ? ` (${p.text})` : ""}: ${p.reason}.`),
    ...(dropped > 0 ? [`${dropped} readings after the first 500 are not used.`] : []),
  ];
  const skippedList = skipped.length ? (
    <>
      <h3>Lines skipped</h3>
      <ul class="calc-list" data-out="skipped">
        {skipped.map((s, i) => (
          <li key={i}>{s}</li>
        ))}
      </ul>
    </>
  ) : null;
  if (!fit) {
    return (
      <>
        <Empty error={error && error.field === "rows" ? null : error} id={`${id}-results`} />
        {skippedList}
      </>
    );
  }
  const used = fit.method === "least-squares" ? fit.leastSquares : fit.method === "least-squares-without-spikes" ? fit.leastSquaresWithoutSpikes! : null;
  const pct = `${plain(fit.confidence * 100)} %`;
  const handoff = model.handoff.value;
  const fits = [
    ["ls", "Least squares, all readings", fit.leastSquares],
    ["ls-clean", "Least squares without flagged", fit.leastSquaresWithoutSpikes],
    ["ts", "Theil–Sen", fit.theilSen],
    ["huber", `Huber M-fit (c = ${fit.huber.tuning})`, fit.huber],
  ] as const;
  return (
    <div class="calc-results" id={`${id}-results`} aria-live="polite">
      <Verdict tone={handoff ? "info" : "bad"} reason={handoff ? `radius ${len(fit.radius)}, offset ${acc(fit.bias)}` : "no usable radius"}>
        {handoff
          ? `From ${METHOD_NAMES[fit.method]}, ${rows.length - fit.spikes.flagged.length} of ${rows.length} readings; ${fit.spikes.flagged.length} flagged as spikes (residual beyond k = ${plain(fit.spikes.threshold)} robust σ, σ = 1.4826 × MAD).`
          : "The fitted radius is 0 or less: check which column is speed and which is reading, and their units."}
      </Verdict>
      <Outputs
        items={[
          ["Radius r̂ for the firmware", "radius", len(fit.radius)],
          ["Radius: standard error", "radius-se", used ? `± ${inSystem(used.slopeStdError, "length", system)}` : "—"],
          [`Radius: ${pct} interval`, "radius-ci", interval(used ? used.slopeInterval : fit.theilSen.slopeInterval, len)],
          ["Offset b̂ for the firmware", "bias", acc(fit.bias)],
          ["Offset: standard error", "bias-se", used ? `± ${acc(used.interceptStdError)}` : "—"],
          [`Offset: ${pct} interval`, "bias-ci", interval(used?.interceptInterval, acc)],
          ["R² of the fit used", "r2", used?.rSquared == null ? "—" : formatNumber(used.rSquared, 5)],
          ["Readings flagged as spikes", "flagged-count", String(fit.spikes.flagged.length)],
        ]}
      />
      {handoff ? (
        <a class="button handoff" href={handoff} data-out="handoff">
          Use this calibration in the drift budget
        </a>
      ) : null}
      <DataTable
        id={`${id}-fits`}
        caption={`Every fit, with ${pct} intervals where the method gives one`}
        head={["Fit", "Radius", "Interval", "Offset", "Interval"]}
      >
        {fits.map(([key, name, line]) =>
          line ? (
            <tr key={key} data-out={`fit-${key}`}>
              <th scope="row">{name}</th>
              <td>{len(line.slope)}</td>
              <td>{interval("slopeInterval" in line ? line.slopeInterval : null, len)}</td>
              <td>{acc(line.intercept)}</td>
              <td>{interval("interceptInterval" in line ? line.interceptInterval : null, acc)}</td>
            </tr>
          ) : null,
        )}
      </DataTable>
      {fit.spikes.flagged.length ? (
        <>
          <h3>Readings flagged as spikes</h3>
          <ul class="calc-list" data-out="flagged">
            {fit.spikes.flagged.map((i) => (
              <li key={i}>
                Line {lines[i]}: {inSystem(rows[i]!.angularSpeed, "angularSpeed", system, 4)}, {acc(rows[i]!.acceleration)}; residual{" "}
                {acc(fit.theilSen.residuals[i]!)}, {formatNumber(fit.spikes.robustDistance[i]!)} robust σ from the median.
              </li>
            ))}
          </ul>
        </>
      ) : null}
      {skippedList}
      <p class="calc-note" data-out="read-notes">
        Read as: {parsed.notes.join("; ")}.
      </p>
    </div>
  );
}

function Charts({ model }: { model: CalibrationModel }) {
  const { fit, curve } = model.outcome.value;
  if (!fit || !curve) return null;
  const { rows } = model.data.value;
  const flagged = new Set(fit.spikes.flagged);
  const g = (v: number) => fromSI(v, "gn");
  const point = (i: number, y: number) => [radPerSecondToRpm(rows[i]!.angularSpeed), g(y)] as const;
  const split = (ys: readonly number[]) =>
    [ys.flatMap((y, i) => (flagged.has(i) ? [] : [point(i, y)])), ys.flatMap((y, i) => (flagged.has(i) ? [point(i, y)] : []))] as const;
  const [readings, spikes] = split(rows.map((r) => r.acceleration));
  const [residuals, spikeResiduals] = split(fit.theilSen.residuals);
  const xMax = radPerSecondToRpm(curve[curve.length - 1]!.angularSpeed);
  const line = (pick: (p: CalibrationCurvePoint) => number) => curve.map((p) => [radPerSecondToRpm(p.angularSpeed), g(pick(p))] as const);
  const ys = rows.map((r) => g(r.acceleration));
  const rs = fit.theilSen.residuals.map(g);
  const low = Math.min(g(fit.spikes.bounds.low), ...rs);
  const high = Math.max(g(fit.spikes.bounds.high), ...rs);
  const pad = (high - low) * 0.08 || 1;
  return (
    <>
      <Chart
        title="Readings and fitted lines"
        summary={`${rows.length} readings from ${formatNumber(Math.min(...ys))} gₙ to ${formatNumber(Math.max(...ys))} gₙ; ${spikes.length} flagged. The fitted line rises as the square of the speed.`}
        xLabel="Reference speed (rpm)"
        yLabel="Radial reading (gₙ)"
        xDomain={[0, xMax]}
        yDomain={[Math.min(0, ...ys), Math.max(0, ...ys) * 1.08 || 1]}
        series={[
          { label: "Fit used", points: line((p) => p.recommended), className: "plot-curve" },
          { label: "Least squares, all readings", points: line((p) => p.leastSquares), className: "plot-curve-2 plot-dashed" },
          { label: "Theil–Sen", points: line((p) => p.theilSen), className: "plot-curve-thin plot-dashed" },
        ]}
        dots={[
          { label: "Reading", points: readings, className: "plot-dot" },
          { label: "Flagged reading", points: spikes, className: "plot-dot-flag" },
        ]}
      />
      <Chart
        title="Residuals from the Theil–Sen line"
        summary={`Residuals from ${formatNumber(Math.min(...rs))} gₙ to ${formatNumber(Math.max(...rs))} gₙ; readings outside the shaded band are flagged.`}
        xLabel="Reference speed (rpm)"
        yLabel="Residual (gₙ)"
        xDomain={[0, xMax]}
        yDomain={[low - pad, high + pad]}
        height={220}
        hBands={[
          {
            from: g(fit.spikes.bounds.low),
            to: g(fit.spikes.bounds.high),
            label: `Within k = ${plain(fit.spikes.threshold)} robust σ of the median`,
            className: "plot-safe",
          },
        ]}
        hLines={[{ value: 0, label: "Zero residual", className: "plot-marker" }]}
        dots={[
          { label: "Residual", points: residuals, className: "plot-dot" },
          { label: "Flagged residual", points: spikeResiduals, className: "plot-dot-flag" },
        ]}
      />
    </>
  );
}

export default function CalibrationCalculator({ id = "calibration-calculator" }: CalibrationCalculatorProps) {
  const model = useMemo(() => createCalibrationModel(), []);
  useEffect(() => syncWithUrl(model), [model]);
  return (
    <section class="calc" id={id} aria-label="Calibration fit calculator">
      <Notices notices={model.fields.notices} />
      <Toolbar idPrefix={id} system={model.fields.system} onSystem={model.fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        <DataField model={model} id={id} />
        <Settings model={model} id={id} />
      </form>
      <CalibrationBar model={model} id={id} />
      <Results model={model} id={id} />
      <Charts model={model} />
    </section>
  );
}
