/**
 * The calibration calculator: readings of (reference speed, radial acceleration) pasted or loaded
 * from a local file, fitted to a = r·ω² + b by least squares, Theil–Sen and a Huber M-fit, with
 * uncertainties, spike flags, skipped lines, plots of the data, the fits and the residuals, and a
 * link that carries the fitted radius and offset into the drift budget.
 *
 * The page brings the outcome for its demo readings as data (the `start` prop, computed when the
 * site is built), and its results already rendered: the fitting code and the results view load
 * when something they show first changes (components/heading/calibration-model.ts,
 * calibration-results.tsx); until then the results keep the HTML the page came with.
 */
import { useEffect, useMemo } from "preact/hooks";
import { calibrationCurve, type CalibrationCurvePoint } from "../../calc/heading/calibration-inputs.ts";
import { formatNumber, fromSI, radPerSecondToRpm } from "../../calc/core/units.ts";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { signal } from "../calc-ui/reactive.ts";
import { Chart } from "../calc-ui/Chart.tsx";
import { ACCELERATION_UNITS, createCalibrationModel, nextTask, SPEED_UNITS, type CalibrationModel } from "../heading/calibration-model.ts";
import type { CalibrationStart } from "../heading/calibration-engine.ts";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "calibration";

/** The results view (components/heading/calibration-results.tsx). */
export type ResultsView = typeof import("../heading/calibration-results.tsx");
/** The results view once loaded in the browser. */
const resultsView = signal<ResultsView | null>(null);
let resultsLoading: Promise<void> | null = null;
function loadResults(): Promise<void> {
  resultsLoading ??= import("../heading/calibration-results.tsx").then(async (view) => {
    await nextTask(); // drawn in a task apart from the one that evaluated the code
    resultsView.value = view;
  });
  return resultsLoading;
}

export interface CalibrationCalculatorProps {
  /** The page's state before any edit, computed when the site is built (`calibrationStart`). */
  start: CalibrationStart;
  /** Element id of the calculator (the link's anchor). */
  id?: string;
  /**
   * The results view, when the caller has it already: the build renders the page with it
   * (components/heading/calibration-server.tsx); in the browser it loads on demand.
   */
  results?: ResultsView;
}

function DataField({ model, id }: { model: CalibrationModel; id: string }) {
  const error = model.outcome.value.error;
  const message = error && error.field === "rows" ? error.message : null;
  const fileError = model.fileError.value;
  const readFile = (event: Event) => {
    const file = (event.currentTarget as HTMLInputElement).files?.[0];
    if (!file) return;
    void model.loadTextReader();
    void import("../heading/calibration-file.ts").then((m) => m.readReadingsFile(model, file));
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

/**
 * A part of the results view (the bar, the results): the HTML the page came with while nothing it
 * shows has changed, then the view's own rendering, once the view has loaded on that first change
 * (or as soon as the form is used).
 */
function Later({ model, id, given, part }: { model: CalibrationModel; id: string; given: ResultsView | undefined; part: "Bar" | "Results" }) {
  const view = resultsView.value ?? given;
  const shown = model.shown.value;
  const className = part === "Bar" ? "calibration-bar" : "calibration-results";
  if (view) {
    const Part = view[part];
    return (
      <div class={className}>
        <Part model={model} id={id} />
      </div>
    );
  }
  const changed =
    model.pending.value || shown.outcome !== model.start.outcome || shown.parsed !== model.start.reading || model.fields.system.value !== "metric";
  if (changed) void loadResults();
  // While hydrating, Preact leaves an element with inner HTML as it finds it: the server's HTML.
  return <div class={className} aria-busy={changed && part === "Results" ? "true" : undefined} dangerouslySetInnerHTML={{ __html: "" }} />;
}

function Charts({ model }: { model: CalibrationModel }) {
  const { outcome, data } = model.shown.value;
  const { fit } = outcome;
  if (!fit) return null;
  const { rows } = data;
  const curve = calibrationCurve({ fit, lowSpeed: 0, highSpeed: Math.max(...rows.map((r) => r.angularSpeed)) * 1.05 });
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
            label: `Within k = ${Number(fit.spikes.threshold.toPrecision(4))} robust σ of the median`,
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

export default function CalibrationCalculator({ start, id = "calibration-calculator", results }: CalibrationCalculatorProps) {
  const model = useMemo(() => createCalibrationModel(start), [start]);
  useEffect(() => syncWithUrl(model), [model]);
  return (
    <section class="calc" id={id} aria-label="Calibration fit calculator">
      <Notices notices={model.fields.notices} />
      <Toolbar idPrefix={id} system={model.fields.system} onSystem={model.fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form
        class="calc-form"
        onSubmit={(event) => event.preventDefault()}
        onFocusIn={() => {
          // About to edit: fetch the code an edit needs.
          void model.loadEngine();
          void loadResults();
        }}
        noValidate
      >
        <DataField model={model} id={id} />
        <Settings model={model} id={id} />
      </form>
      <Later model={model} id={id} given={results} part="Bar" />
      <Later model={model} id={id} given={results} part="Results" />
      <HydrateLater>
        <Charts model={model} />
      </HydrateLater>
    </section>
  );
}
