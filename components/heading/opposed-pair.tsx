/**
 * The heading-drift page's second section, one sensor against an opposed pair (link keys "p."):
 * loaded when the builder opens it or when the link already carries its keys, so the drift budget
 * alone does not carry its code.
 */
import { form as opposedCalculator, run as opposedRun } from "../../calc/calculators/opposed-sensors.ts";
import type { opposedSensorsInputs } from "../../calc/heading/opposed.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { degPerSecond, degrees, inSystem } from "./format.ts";
import { Empty, FieldsForm, Outputs, Verdict, type FieldGroup } from "./ui.tsx";

const PAIR_GROUPS: FieldGroup<typeof opposedSensorsInputs>[] = [
  { legend: "Two sensors, one each side", names: ["angularSpeed", "radius1", "radius2", "offset"] },
];

/** The pair's model in the page's unit system. */
export function openPair(system: UnitSystem) {
  const model = createCalculatorModel(opposedCalculator, opposedRun);
  model.setSystem(system);
  return model;
}

export type PairModel = ReturnType<typeof openPair>;

/** A drift rate without its sign: "10 °/s". */
const size = (v: number) => degPerSecond(v, false);

function PairResults({ model, budget }: { model: PairModel; budget: number | undefined }) {
  const { result, error } = model.outcome.value;
  const values = model.fields.values.value;
  if (!result || !values) return <Empty error={error} />;
  const system = model.fields.system.value;
  const e = inSystem(values.offset, "length", system);
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

/** The pair's fields and results; `budget` is the drift budget's trim [rad/s], when valid. */
export function PairSection({ model, id, budget }: { model: PairModel; id: string; budget: number | undefined }) {
  return (
    <>
      <FieldsForm fields={model.fields} groups={PAIR_GROUPS} idPrefix={`${id}-p`} error={() => model.outcome.value.error} />
      <PairResults model={model} budget={budget} />
    </>
  );
}
