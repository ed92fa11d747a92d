/**
 * The radius trim: the drift a builder sees (per turn, or timed per second at a known speed) and
 * the radius the firmware has now give the radius to set. calc/heading/drift-trim.ts computes it.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as trimCalculator, run as trimRun } from "../../calc/calculators/radius-trim.ts";
import { formatNumber, type UnitSystem } from "../../calc/core/units.ts";
import { formParts } from "../calc-ui/form-parts.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { inSystem } from "../heading/format.ts";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

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
  const { field, choice } = formParts(model, id);
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
          {choice("sense")}
          {choice("measure")}
          {perTurn ? field("driftPerTurn") : [field("driftRate"), field("angularSpeed")]}
        </fieldset>
      </form>
      {/* The outputs are attached to the page after the form, in a task of their own. */}
      <HydrateLater>
        {result ? (
          <ResultBar
            tone={null}
            resultsId={resultsId}
            figures={[
              { name: "radius", label: "Set the radius to", value: len(result.radius) },
              {
                name: "change",
                label: result.change === 0 ? "Change" : result.change > 0 ? "Larger by" : "Smaller by",
                value: inSystem(Math.abs(result.change), "length", system, 3),
              },
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
              {result.driftPerRevolution === 0 ? (
                <p class="verdict verdict--ok">
                  <strong>
                    Keep the firmware radius at <span data-out="radius">{len(result.radius)}</span>.
                  </strong>{" "}
                  No drift: the spin-rate estimate is right at this speed.
                </p>
              ) : (
                <p class="verdict verdict--ok">
                  <strong>
                    Set the firmware radius to <span data-out="radius">{len(result.radius)}</span>.
                  </strong>{" "}
                  The heading {result.driftPerRevolution > 0 ? "ran ahead" : "fell behind"}{" "}
                  <span data-out="drift-turn">{inSystem(Math.abs(result.driftPerRevolution), "angle", system, 3)}</span> per turn: the spin-rate estimate ran{" "}
                  <span data-out="ratio">{formatNumber(Math.abs(result.speedRatio - 1) * 100)} %</span> {result.speedRatio >= 1 ? "fast" : "slow"}, so the
                  radius goes {result.change >= 0 ? "up" : "down"} by <span data-out="change">{inSystem(Math.abs(result.change), "length", system, 3)}</span>.
                </p>
              )}
              <p class="field-help">
                Exact at the speed where the drift was seen. If part of the drift came from an offset left in the sensor, that part fades as the speed rises:
                trim at the speed you drive at, or check the whole budget in the drift chapter.
              </p>
            </>
          ) : (
            <p>{error && error.field === null ? error.message : "The answer appears when every field above holds a valid value."}</p>
          )}
        </div>
      </HydrateLater>
    </section>
  );
}
