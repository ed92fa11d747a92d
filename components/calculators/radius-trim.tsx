/**
 * The radius trim: the drift a builder sees (per turn, or timed per second at a known speed) and
 * the radius the firmware has now give the radius to set. calc/heading/drift-trim.ts computes it.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as trimCalculator, radiusTrimChoices, run as trimRun } from "../../calc/calculators/radius-trim.ts";
import { formatNumber, type UnitSystem } from "../../calc/core/units.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { inSystem } from "../heading/format.ts";

/** The island name: this file's name. */
export const island = "radius-trim";

export interface RadiusTrimCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

export default function RadiusTrimCalculator({ id = trimCalculator.anchor }: RadiusTrimCalculatorProps) {
  const model = useMemo(() => createCalculatorModel(trimCalculator, trimRun), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields, choices } = model;
  const system: UnitSystem = fields.system.value;
  const { result, error } = model.outcome.value;
  const perTurn = choices.measure.value !== "second";
  const field = (name: keyof typeof fields.specs) => (
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
  );
  const len = (v: number) => inSystem(v, "length", system, 4);
  const resultsId = `${id}-results`;
  return (
    <section class="calc" id={id} aria-label="Radius from a drift you see">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        <fieldset>
          <legend>What you saw</legend>
          {field("assumedRadius")}
          {(["sense", "measure"] as const).map((name) => (
            <div class="field" key={name}>
              <label for={`${id}-${name}`}>{radiusTrimChoices[name].label}</label>
              <select id={`${id}-${name}`} value={choices[name].value} onChange={(e) => (choices[name].value = e.currentTarget.value)}>
                {radiusTrimChoices[name].options.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </select>
            </div>
          ))}
          {perTurn ? field("driftPerTurn") : [field("driftRate"), field("angularSpeed")]}
        </fieldset>
      </form>
      {result ? (
        <ResultBar
          tone={null}
          resultsId={resultsId}
          figures={[
            { name: "radius", label: "Set the radius to", value: len(result.radius) },
            { name: "change", label: result.change >= 0 ? "Larger by" : "Smaller by", value: inSystem(Math.abs(result.change), "length", system, 3) },
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
            <p class="verdict verdict--ok">
              <strong>
                Set the firmware radius to <span data-out="radius">{len(result.radius)}</span>.
              </strong>{" "}
              The heading {result.driftPerRevolution >= 0 ? "ran ahead" : "fell behind"}{" "}
              <span data-out="drift-turn">{inSystem(Math.abs(result.driftPerRevolution), "angle", system, 3)}</span> per turn: the spin-rate estimate ran{" "}
              <span data-out="ratio">{formatNumber(Math.abs(result.speedRatio - 1) * 100)} %</span> {result.speedRatio >= 1 ? "fast" : "slow"}, so the radius
              goes {result.change >= 0 ? "up" : "down"} by <span data-out="change">{inSystem(Math.abs(result.change), "length", system, 3)}</span>.
            </p>
            <p class="field-help">
              Exact at the speed where the drift was seen. If part of the drift came from an offset left in the sensor, that part fades as the speed rises: trim
              at the speed you drive at, or check the whole budget in the drift chapter.
            </p>
          </>
        ) : (
          <p>{error && error.field === null ? error.message : "The answer appears when every field above holds a valid value."}</p>
        )}
      </div>
    </section>
  );
}
