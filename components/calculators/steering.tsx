/**
 * The steering estimate: a whole-body spinner's spin, wheels, drive and steering settings give the
 * kinematic translation speed, the direction error latency causes and the lead that cancels it,
 * the wheels' gyroscopic moment and, with one wheel, the skid lift speed
 * (calc/steering/estimate.ts). A button runs the full simulation once for the same values.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as steeringCalculator, run as steeringRun } from "../../calc/calculators/steering.ts";
import { formatQuantity, type QuantityKind, type UnitSystem } from "../../calc/core/units.ts";
import { STATUS_WORDS } from "../../calc/core/check.ts";
import { DEMO_STEERING_SPINNER } from "../../calc/steering/inputs.ts";
import { type SteeringResult, simulateSteering } from "../../calc/steering/simulate.ts";
import { formParts } from "../calc-ui/form-parts.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { ResultBar, type Tone } from "../calc-ui/ResultBar.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { useSignal } from "../calc-ui/reactive.ts";

/** The island name: this file's name. */
export const island = "steering";

export interface SteeringCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

const TONE = { holds: "ok", marginal: "warn", fails: "bad" } as const satisfies Record<string, Tone>;

type Simulated = { values: unknown; result: SteeringResult | null; message: string | null };

export default function SteeringCalculator({ id = steeringCalculator.anchor }: SteeringCalculatorProps) {
  const model = useMemo(() => createCalculatorModel(steeringCalculator, steeringRun), []);
  useEffect(() => syncWithUrl(model), [model]);
  const simulated = useSignal<Simulated | null>(null);
  const { fields } = model;
  const system: UnitSystem = fields.system.value;
  const { result, error } = model.outcome.value;
  const values = model.values.value;
  const { field } = formParts(model, id);
  const q = (v: number, kind: QuantityKind, significant = 3) => formatQuantity(v, kind, { system, significant }).text;
  const resultsId = `${id}-results`;
  const tone = result ? TONE[result.status] : null;
  const last = simulated.value;
  const sim = last && last.values === values ? last : null;
  const simulate = () => {
    if (!values) return;
    try {
      simulated.value = { values, result: simulateSteering({ ...DEMO_STEERING_SPINNER, ...values }), message: null };
    } catch (e) {
      simulated.value = { values, result: null, message: e instanceof Error ? e.message : String(e) };
    }
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
                  ["Skid lift speed", "skid-lift", result.skidLiftSpeed === null ? "no skid (two wheels or more)" : q(result.skidLiftSpeed, "angularSpeed", 4)],
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
              These are limits: a real drive sags, slips and lags, and reaches less. The simulation below integrates the motion for the same values (the motor,
              battery and tyre figures it also needs are the chapter's demo robot's).
            </p>
            <p>
              <button type="button" class="button" data-action="simulate" onClick={simulate}>
                Simulate the move once
              </button>
            </p>
            {sim ? (
              sim.result ? (
                <dl class="results-grid" data-out="simulation">
                  <div>
                    <dt>Translation speed reached</dt>
                    <dd data-out="sim-speed">{q(sim.result.translationSpeed, "speed")}</dd>
                  </div>
                  <div>
                    <dt>Spin speed lost</dt>
                    <dd data-out="sim-spin-lost">{q(sim.result.spinLost, "angularSpeed")}</dd>
                  </div>
                  <div>
                    <dt>Direction error, simulated</dt>
                    <dd data-out="sim-direction-error">{q(sim.result.directionError, "angle")}</dd>
                  </div>
                  <div>
                    <dt>Simulation verdict</dt>
                    <dd data-out="sim-verdict">
                      {STATUS_WORDS[sim.result.verdict]}: {sim.result.reason}
                    </dd>
                  </div>
                </dl>
              ) : (
                <p data-out="sim-error">{sim.message}</p>
              )
            ) : null}
          </>
        ) : (
          <p>{error && error.field === null ? error.message : "The answer appears when every field above holds a valid value."}</p>
        )}
      </div>
    </section>
  );
}
