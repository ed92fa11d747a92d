/**
 * The heading timing-and-smoothing calculator: what the loop period, latency and heading LED on-time
 * cost in heading at top speed and what meets the targets; then what an exponential moving average
 * (after an optional running median) costs in lag during a spin-up and does to one spike, with a
 * comparison of median windows and a trade-off plot over the smoothing factor α.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as timingCalculator, run as timingRun } from "../../calc/calculators/heading-timing.ts";
import { form as smoothingCalculator, run as smoothingRun } from "../../calc/calculators/heading-smoothing.ts";
import type { HeadingTimingResult, headingTimingInputs } from "../../calc/heading/timing.ts";
import { headingSmoothing, smoothingTradeoffSeries, type headingSmoothingInputs } from "../../calc/heading/smoothing.ts";
import { formatNumber, formatQuantity, fromSI } from "../../calc/core/units.ts";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { syncWithUrl } from "../calc-ui/url-sync.ts";
import { computed } from "../calc-ui/reactive.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { fieldMessage } from "../calc-ui/fields.ts";
import { saveAll } from "../calc-ui/save.ts";
import { degPerSecond, degrees, inSystem, plain } from "../heading/format.ts";
import { DataTable, Empty, FieldsForm, Outputs, Verdict, type FieldGroup } from "../heading/ui.tsx";
import type { UnitSystem } from "../../calc/core/units.ts";

/** The island name: this file's name. */
export const island = "heading-timing";

/** Median windows the comparison always shows (the chosen one is added when it is not among them). */
const MEDIAN_WINDOWS = [1, 3, 5];

/** The loop timing (plain link keys) and the smoothing (keys "s."), with the median-window comparison and the trade-off over α. */
export function createTimingModel() {
  const timing = createCalculatorModel(timingCalculator, timingRun);
  const smoothing = createCalculatorModel(smoothingCalculator, smoothingRun);
  const labels = Object.fromEntries(Object.entries(smoothingCalculator.inputs).map(([k, s]) => [k, s.label]));
  // headingSmoothing names the median window "medianLength"; smoothingFigures' helpers call it "windowLength".
  labels.windowLength = smoothingCalculator.inputs.medianLength.label;
  const smoothingOutcome = computed(() => {
    const values = smoothing.values.value;
    if (!values) return { result: null, error: null, medians: [], tradeoff: [] };
    try {
      const result = headingSmoothing(values);
      const windows = MEDIAN_WINDOWS.includes(values.medianLength) ? MEDIAN_WINDOWS : [...MEDIAN_WINDOWS, values.medianLength];
      const medians = windows.map((medianLength) => ({
        medianLength,
        result: medianLength === values.medianLength ? result : headingSmoothing({ ...values, medianLength }),
      }));
      return { result, error: null, medians, tradeoff: smoothingTradeoffSeries(values, { smallestFactor: Math.min(0.005, values.smoothingFactor) }) };
    } catch (error) {
      return { result: null, error: fieldMessage(error, labels, smoothing.system.value), medians: [], tradeoff: [] };
    }
  });
  return {
    timingModel: timing,
    smoothingModel: smoothing,
    timing: timing.fields,
    smoothing: smoothing.fields,
    timingOutcome: timing.outcome,
    smoothingOutcome,
    /** Switches both sections' unit system together. */
    setSystem(next: UnitSystem) {
      timing.setSystem(next);
      smoothing.setSystem(next);
    },
  };
}

type TimingModel = ReturnType<typeof createTimingModel>;
import { Chart } from "../calc-ui/Chart.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

export interface HeadingTimingCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

const TIMING_GROUPS: FieldGroup<typeof headingTimingInputs>[] = [
  { legend: "Robot and loop", names: ["topSpeed", "loopRate", "latency", "onTime"] },
  { legend: "Targets at top speed", names: ["targetStep", "targetArc"] },
];
const SMOOTHING_GROUPS: FieldGroup<typeof headingSmoothingInputs>[] = [
  { legend: "Filter", names: ["sampleRate", "smoothingFactor", "medianLength"] },
  { legend: "Spin-up", names: ["spinUpAcceleration", "speedChange"] },
  { legend: "One spike", names: ["speed", "assumedRadius", "spike"] },
];

const deg = (v: number) => degrees(v, false);

/** The verdict as the build sheet gives it: one target missed is marginal, both fail. */
function timingVerdict(r: HeadingTimingResult, t: { targetStep: number; targetArc: number }, rpm: string, time: (v: number) => string) {
  const step = `each loop update turns ${deg(r.headingStep)} (allowed ${deg(t.targetStep)})`;
  const arc = `the heading LED sweeps ${deg(r.arcWidth)} (wanted ${deg(t.targetArc)} at most)`;
  const fixStep = `run the loop at ${formatQuantity(r.loopRateNeeded, "frequency").text} or faster`;
  const fixArc = `light the heading LED for ${time(r.onTimeNeeded)} or less`;
  switch (r.verdict) {
    case "ok":
      return { tone: "ok" as const, detail: `At ${rpm} ${step}; ${arc}.` };
    case "step-too-large":
      return { tone: "warn" as const, reason: "heading step too large", detail: `At ${rpm} ${step}: ${fixStep}.` };
    case "arc-too-wide":
      return { tone: "warn" as const, reason: "heading LED arc too wide", detail: `At ${rpm} ${arc}: ${fixArc}.` };
    case "both":
      return { tone: "bad" as const, reason: "step too large and arc too wide", detail: `At ${rpm} ${step}: ${fixStep}; ${arc}: ${fixArc}.` };
  }
}

const NO_RESULT = "No result yet: correct the marked field.";

/** The loop verdict, the heading step and the heading LED arc, in view while editing. */
function TimingBar({ model, id }: { model: TimingModel; id: string }) {
  const { result, error } = model.timingOutcome.value;
  const values = model.timing.values.value;
  const resultsId = `${id}-timing-results`;
  if (!result || !values) return <ResultBar tone={null} figures={[]} resultsId={resultsId} missing={error?.field === null ? error.message : NO_RESULT} />;
  const verdict = timingVerdict(result, values, "", (v) => inSystem(v, "time", model.timing.system.value));
  return (
    <ResultBar
      tone={verdict.tone}
      reason={verdict.reason}
      resultsId={resultsId}
      figures={[
        { name: "step", label: "Step per update", value: deg(result.headingStep) },
        { name: "arc", label: "Heading LED arc", value: deg(result.arcWidth) },
      ]}
    />
  );
}

/** The smoothing's delay and the heading error it leaves after a spin-up, in view while editing. */
function SmoothingBar({ model, id }: { model: TimingModel; id: string }) {
  const { result, error } = model.smoothingOutcome.value;
  const resultsId = `${id}-smoothing-results`;
  if (!result) return <ResultBar tone={null} figures={[]} resultsId={resultsId} missing={error?.field === null ? error.message : NO_RESULT} />;
  const time = (v: number) => inSystem(v, "time", model.smoothing.system.value);
  return (
    <ResultBar
      tone={null}
      resultsId={resultsId}
      figures={[
        { name: "delay", label: "Delay", value: time(result.totalDelay) },
        { name: "heading-after", label: "Behind after the spin-up", value: deg(result.headingErrorAfterSpinUp) },
      ]}
    />
  );
}

function TimingResults({ model, id }: { model: TimingModel; id: string }) {
  const { result, error } = model.timingOutcome.value;
  const values = model.timing.values.value;
  if (!result || !values) return <Empty error={error} id={`${id}-timing-results`} />;
  const system = model.timing.system.value;
  const time = (v: number) => inSystem(v, "time", system);
  const verdict = timingVerdict(result, values, inSystem(values.topSpeed, "angularSpeed", system, 4), time);
  return (
    <div class="calc-results" id={`${id}-timing-results`} aria-live="polite">
      <Verdict tone={verdict.tone} reason={verdict.reason}>
        {verdict.detail}
      </Verdict>
      <Outputs
        items={[
          ["Loop period", "loop-period", time(result.loopPeriod)],
          ["Heading step per update", "step", deg(result.headingStep)],
          ["Updates per revolution", "updates-rev", formatNumber(result.updatesPerRevolution)],
          ["Heading lag from latency (an offset, not a drift)", "lag", deg(result.latencyLag)],
          ["Heading LED arc", "arc", deg(result.arcWidth)],
          ["Loop rate for the step wanted", "loop-needed", formatQuantity(result.loopRateNeeded, "frequency", { system }).text],
          ["On-time for the arc wanted", "on-needed", time(result.onTimeNeeded)],
        ]}
      />
      {result.onTimeBelowLoopPeriod ? (
        <p class="calc-note" data-out="timer-note">
          The on-time is shorter than one loop period: switch the heading LED from a timer, not from the loop.
        </p>
      ) : null}
    </div>
  );
}

function SmoothingResults({ model, id }: { model: TimingModel; id: string }) {
  const { result, error, medians } = model.smoothingOutcome.value;
  const values = model.smoothing.values.value;
  if (!result || !values) return <Empty error={error} id={`${id}-smoothing-results`} />;
  const system = model.smoothing.system.value;
  const time = (v: number) => inSystem(v, "time", system);
  const speed = (v: number) => inSystem(v, "angularSpeed", system, 3);
  const removed = result.spikesRejectedPerWindow > 0 ? " (the median removes it)" : "";
  return (
    <div class="calc-results" id={`${id}-smoothing-results`} aria-live="polite">
      <Verdict tone="info" reason={`${time(result.totalDelay)} of delay`}>
        During the spin-up the heading falls behind at {degPerSecond(-result.driftRateDuringSpinUp, false)}; once the speed settles it is{" "}
        {deg(result.headingErrorAfterSpinUp)} behind, unless the firmware corrects it.
      </Verdict>
      <Outputs
        items={[
          ["Time constant τ (≈ Δt/α)", "tau", `${time(result.timeConstant)} (≈ ${time(result.timeConstantApproximation)})`],
          ["Delay: average + median", "delay", `${time(result.emaLag)} + ${time(result.medianDelay)}`],
          ["Drift during the spin-up", "spinup-drift", degPerSecond(result.driftRateDuringSpinUp)],
          ["Spin-up lasts", "spinup-time", time(result.spinUpDuration)],
          ["Heading error after the spin-up", "heading-after", deg(result.headingErrorAfterSpinUp)],
          ["Heading error at the end of the ramp", "heading-ramp-end", deg(result.headingErrorAtRampEnd)],
          ["Noise left after the average", "noise", formatQuantity(result.noiseFactor, "fraction").text],
          ["One spike: speed error in that sample", "spike-rate", speed(result.spikeRateError)],
          ["One spike: first step of the average", "spike-shift", `${speed(result.spikeFirstShift)}${removed}`],
          ["One spike: samples until below 1 %", "spike-settle", `${result.spikeSettleSamples}${removed}`],
          ["One spike: heading error it leaves", "spike-heading", `${deg(result.spikeHeadingError)}${removed}`],
        ]}
      />
      <DataTable
        id={`${id}-medians`}
        caption={`Median window before the average (α = ${plain(values.smoothingFactor)})`}
        head={["Median of", "Delay", "Error after spin-up", "One spike leaves", "Spikes in a row removed"]}
      >
        {medians.map(({ medianLength, result: m }) => (
          <tr key={medianLength} data-out={`median-${medianLength}`}>
            <th scope="row">{medianLength === 1 ? "1 (none)" : medianLength}</th>
            <td>{time(m.totalDelay)}</td>
            <td>{deg(m.headingErrorAfterSpinUp)}</td>
            <td>{deg(m.spikeHeadingError)}</td>
            <td>{m.spikesRejectedPerWindow}</td>
          </tr>
        ))}
      </DataTable>
    </div>
  );
}

/** Ticks of a log axis: 1, 2 and 5 in each decade of the domain. */
function decadeTicks(low: number, high: number): number[] {
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(low)); e <= Math.ceil(Math.log10(high)); e++) {
    for (const m of [1, 2, 5]) {
      const v = Number((m * 10 ** e).toPrecision(3));
      if (v >= low * (1 - 1e-9) && v <= high * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

function TradeoffChart({ model }: { model: TimingModel }) {
  const { tradeoff } = model.smoothingOutcome.value;
  const values = model.smoothing.values.value;
  if (!values || tradeoff.length === 0) return null;
  const error = tradeoff.map((f) => [f.smoothingFactor, fromSI(f.headingErrorAfterSpinUp, "deg")] as const);
  const noise = tradeoff.map((f) => [f.smoothingFactor, f.noiseFactor * 100] as const);
  const top = Math.max(...error.map(([, y]) => y)) * 1.05 || 1;
  const axis = {
    xLog: true,
    xTicks: decadeTicks(tradeoff[0]!.smoothingFactor, 1),
    xDomain: [tradeoff[0]!.smoothingFactor, 1] as const,
    xLabel: "Smoothing factor α (log scale)",
    height: 240,
  };
  const chosen = [{ value: values.smoothingFactor, label: "Chosen α", className: "plot-marker plot-dashed" }];
  return (
    <>
      <Chart
        {...axis}
        title="Smoothing trade-off: heading error"
        summary={`A smaller α leaves a larger heading error after the spin-up: from ${deg(tradeoff[0]!.headingErrorAfterSpinUp)} at α = ${formatNumber(tradeoff[0]!.smoothingFactor)} to ${deg(tradeoff[tradeoff.length - 1]!.headingErrorAfterSpinUp)} at α = 1.`}
        yLabel="Error after spin-up (°)"
        yDomain={[0, top]}
        series={[{ label: "Heading error after the spin-up", points: error, className: "plot-curve" }]}
        vLines={chosen}
      />
      <Chart
        {...axis}
        title="Smoothing trade-off: noise left"
        summary={`A smaller α leaves less of the sensor noise: ${formatNumber(noise[0]![1])} % at α = ${formatNumber(tradeoff[0]!.smoothingFactor)}, 100 % at α = 1.`}
        yLabel="Noise left (%)"
        yDomain={[0, 105]}
        series={[{ label: "Noise left after the average", points: noise, className: "plot-curve-2" }]}
        vLines={chosen}
      />
    </>
  );
}

export default function HeadingTimingCalculator({ id = "timing-calculator" }: HeadingTimingCalculatorProps) {
  const model = useMemo(() => createTimingModel(), []);
  useEffect(() => {
    const stops = [syncWithUrl(model.timingModel), syncWithUrl(model.smoothingModel)];
    return () => {
      for (const stop of stops) stop();
    };
  }, [model]);
  const link = () => {
    const { origin, pathname, search } = window.location;
    return `${origin}${pathname}?${model.smoothingModel.queryFor(model.timingModel.queryFor(search))}#${id}`;
  };
  return (
    <section class="calc" id={id} aria-label="Heading timing and smoothing calculator">
      <Notices notices={model.timing.notices} />
      <Notices notices={model.smoothing.notices} />
      <Toolbar
        idPrefix={id}
        system={model.timing.system}
        onSystem={model.setSystem}
        link={link}
        save={() => saveAll([model.timingModel, model.smoothingModel])}
      />
      <h3 id={`${id}-timing-title`}>Loop, latency and heading LED</h3>
      <FieldsForm fields={model.timing} groups={TIMING_GROUPS} idPrefix={id} error={() => model.timingOutcome.value.error} />
      <HydrateLater>
        <TimingBar model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <TimingResults model={model} id={id} />
      </HydrateLater>
      <div class="calc-section" role="group" aria-labelledby={`${id}-smoothing-title`}>
        <h3 id={`${id}-smoothing-title`}>Smoothing the spin-rate estimate</h3>
        <FieldsForm fields={model.smoothing} groups={SMOOTHING_GROUPS} idPrefix={`${id}-s`} error={() => model.smoothingOutcome.value.error} />
        <HydrateLater>
          <SmoothingBar model={model} id={id} />
        </HydrateLater>
        <HydrateLater>
          <SmoothingResults model={model} id={id} />
        </HydrateLater>
        <HydrateLater>
          <TradeoffChart model={model} />
        </HydrateLater>
      </div>
    </section>
  );
}
