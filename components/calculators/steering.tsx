/**
 * The steering estimate: a whole-body spinner's spin, wheels, drive and steering settings give the
 * kinematic translation speed, the direction error latency causes and the lead that cancels it,
 * the wheels' gyroscopic moment and, with one wheel, the skid lift speed
 * (calc/steering/estimate.ts). A button loads the simulation view (components/steering/simulation.tsx,
 * its own chunk) for the same values; the link then carries `sim=1` (and the distance, `dist`), so
 * it opens with the simulation shown.
 */
import type { ComponentType } from "preact";
import { useEffect, useMemo } from "preact/hooks";
import { form as steeringCalculator, run as steeringRun } from "../../calc/calculators/steering.ts";
import { formatQuantity, type QuantityKind, type UnitSystem } from "../../calc/core/units.ts";
import { STATUS_WORDS } from "../../calc/core/check.ts";
import type { SteeringSimulationProps } from "../steering/simulation.tsx";
import { formParts } from "../calc-ui/form-parts.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { ResultBar, type Tone } from "../calc-ui/ResultBar.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel, type PageState } from "../calc-ui/model.ts";
import { type Signal, signal } from "../calc-ui/reactive.ts";
import { whenIdle } from "../calc-ui/idle.ts";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "steering";

export interface SteeringCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

const TONE = { holds: "ok", marginal: "warn", fails: "bad" } as const satisfies Record<string, Tone>;

/** The simulation's state in the page link: shown or not, and the distance field's text. */
interface SimulationState extends PageState {
  shown: Signal<boolean>;
  distance: Signal<string>;
  view: Signal<ComponentType<SteeringSimulationProps> | null | "loading" | "failed">;
}

function simulationState(): SimulationState {
  const shown = signal(false);
  const distance = signal("");
  return {
    shown,
    distance,
    view: signal(null),
    apply(params) {
      shown.value = params.get("sim") === "1";
      distance.value = params.get("dist") ?? "";
      return [];
    },
    write: () => (shown.value ? { sim: "1", ...(distance.value ? { dist: distance.value } : {}) } : {}),
  };
}

/** Loads the simulation view once (its own chunk; the integrator runs in the view's worker). */
function loadView(state: SimulationState): void {
  if (state.view.value !== null && state.view.value !== "failed") return;
  state.view.value = "loading";
  import("../steering/simulation.tsx").then(
    (m) => (state.view.value = m.SteeringSimulation),
    () => (state.view.value = "failed"),
  );
}

export default function SteeringCalculator({ id = steeringCalculator.anchor }: SteeringCalculatorProps) {
  const sim = useMemo(simulationState, []);
  const model = useMemo(() => createCalculatorModel(steeringCalculator, steeringRun, "metric", sim), []);
  useEffect(() => {
    const stop = syncWithUrl(model);
    if (sim.shown.value) loadView(sim);
    // The simulation's view, fetched and evaluated once the page is idle: a press then only draws
    // (and starts the worker that computes).
    else whenIdle(() => void import("../steering/simulation.tsx"));
    return stop;
  }, [model]);
  const { fields } = model;
  const system: UnitSystem = fields.system.value;
  const { result, error } = model.outcome.value;
  const values = model.values.value;
  const { field } = formParts(model, id);
  const q = (v: number, kind: QuantityKind, significant = 3) => formatQuantity(v, kind, { system, significant }).text;
  const resultsId = `${id}-results`;
  const tone = result ? TONE[result.status] : null;
  const view = sim.view.value;
  const show = () => {
    sim.shown.value = true;
    loadView(sim);
  };
  return (
    <section class="calc" id={id} aria-label="Steering while spinning">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        <fieldset>
          <legend>The robot and its wheels</legend>
          {field("spinSpeed")}
          {field("robotMass")}
          {field("wheelCount")}
          {field("wheelRadius")}
          {field("wheelOffset")}
          {field("wheelInertia")}
        </fieldset>
        <fieldset>
          <legend>The drive</legend>
          {field("motorsPerWheel")}
          {field("motorRotorInertia")}
          {field("gearRatio")}
          {field("motorKv")}
          {field("cellCount")}
          {field("cellVoltage")}
        </fieldset>
        <fieldset>
          <legend>The steering</legend>
          {field("windowWidth")}
          {field("depth")}
          {field("oppositeWindow")}
          {field("phaseLead")}
          {field("loopRate")}
          {field("latency")}
          {field("directionTolerance")}
        </fieldset>
      </form>
      {/* The outputs are attached to the page after the form, in a task of their own. */}
      <HydrateLater>
        {result && tone ? (
          <ResultBar
            tone={tone}
            reason={result.summary}
            resultsId={resultsId}
            figures={[
              { name: "speed", label: "Speed", value: q(result.translationSpeed, "speed") },
              { name: "error", label: "Direction error", value: q(result.directionError, "angle") },
            ]}
          />
        ) : (
          <ResultBar
            tone={null}
            figures={[]}
            resultsId={resultsId}
            missing={error?.field === null ? error.message : "No result yet: correct the marked field."}
          />
        )}
        <div class={`calc-results${result ? "" : " calc-results--empty"}`} id={resultsId} aria-live="polite">
          {result ? (
            <>
              <p class={`verdict verdict--${tone}`}>
                <strong>
                  {STATUS_WORDS[result.status]}: at most <span data-out="translation-speed">{q(result.translationSpeed, "speed")}</span> along the commanded
                  direction, with the wheels rolling and following the drive at once.
                </strong>{" "}
                {result.reason}
              </p>
              <dl class="results-grid">
                {(
                  [
                    ["Rim-speed depth δ", "rim-depth", q(result.rimSpeedDepth, "speed")],
                    ["Rim speed ΩR", "rim-speed", q(result.rimSpeed, "speed")],
                    ["Direction error Δψ", "direction-error", q(result.directionError, "angle")],
                    ["Phase lead that cancels it", "lead", q(result.leadToCancel, "angle")],
                    ["Gyroscopic moment per wheel", "gyro", q(result.gyroscopicMoment, "torque")],
                    [
                      "Skid lift speed",
                      "skid-lift",
                      result.skidLiftSpeed === null ? "no skid (two wheels or more)" : q(result.skidLiftSpeed, "angularSpeed", 4),
                    ],
                    ["Pack voltage, no load", "voltage", q(result.openCircuitVoltage, "voltage")],
                  ] as const
                ).map(([label, name, text]) => (
                  <div key={name}>
                    <dt>{label}</dt>
                    <dd data-out={name}>{text}</dd>
                  </div>
                ))}
              </dl>
              <p class="field-help">
                These are limits: a real drive sags, slips and lags, and reaches less. The simulation integrates the motion for the same values (the motor,
                battery and tyre figures it also needs are the chapter's demo robot's); once shown, the page's link opens with it.
              </p>
              {sim.shown.value && typeof view === "function" && values ? (
                <SimulationView view={view} values={values as unknown as Record<string, number>} system={system} distanceText={sim.distance} idPrefix={id} />
              ) : (
                <p>
                  <button type="button" class="button" data-action="simulate" onClick={show} disabled={view === "loading"}>
                    {view === "loading" ? "Loading the simulation…" : "Simulate the move"}
                  </button>
                  {view === "failed" ? <span role="status"> The simulation could not be loaded; check the connection and try again.</span> : null}
                </p>
              )}
            </>
          ) : (
            <p>{error && error.field === null ? error.message : "The answer appears when every field above holds a valid value."}</p>
          )}
        </div>
      </HydrateLater>
    </section>
  );
}

function SimulationView({ view: View, ...props }: SteeringSimulationProps & { view: ComponentType<SteeringSimulationProps> }) {
  return <View {...props} />;
}
