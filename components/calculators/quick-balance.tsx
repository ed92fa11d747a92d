/**
 * The quick balance check: the robot's mass and spin speed and a limit (a balance grade or a
 * wobble force), then one part added or moved, give the offset it causes, the counterweight that
 * cancels it and a verdict. calc/mass/quick-balance.ts computes it.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as quickCalculator, run as quickRun } from "../../calc/calculators/quick-balance.ts";
import { formatNumber, formatQuantity, type QuantityKind, type UnitSystem } from "../../calc/core/units.ts";
import { formParts } from "../calc-ui/form-parts.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { ResultBar, type Tone } from "../calc-ui/ResultBar.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "quick-balance";

export interface QuickBalanceCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

const TONE = { holds: "ok", marginal: "warn", fails: "bad" } as const satisfies Record<string, Tone>;

export default function QuickBalanceCalculator({ id = quickCalculator.anchor }: QuickBalanceCalculatorProps) {
  const model = useMemo(() => createCalculatorModel(quickCalculator, quickRun), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields, choices } = model;
  const system: UnitSystem = fields.system.value;
  const { result, error } = model.outcome.value;
  const moved = choices.change.value === "moved";
  const byForce = choices.limit.value === "force";
  const { field, choice } = formParts(model, id);
  const q = (v: number, kind: QuantityKind, significant = 3) => formatQuantity(v, kind, { system, significant }).text;
  const resultsId = `${id}-results`;
  const tone = result ? TONE[result.status] : null;
  return (
    <section class="calc" id={id} aria-label="Quick balance check">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        <fieldset>
          <legend>The robot and the limit</legend>
          {field("robotMass")}
          {field("spinSpeed")}
          {choice("limit")}
          {byForce ? field("wobbleForce") : choice("grade")}
        </fieldset>
        <fieldset>
          <legend>The part</legend>
          {choice("change")}
          {field("partMass")}
          {moved ? field("moveDistance") : field("partRadius")}
          {field("counterweightRadius")}
        </fieldset>
      </form>
      {/* The outputs are attached to the page after the form, in a task of their own. */}
      <HydrateLater>
        {result && tone ? (
          <ResultBar
            tone={tone}
            reason={result.reason}
            resultsId={resultsId}
            figures={[
              { name: "counterweight", label: "Counterweight", value: q(result.counterweight, "mass") },
              { name: "offset", label: "Offset", value: q(result.offset, "length") },
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
                  A counterweight of <span data-out="counterweight">{q(result.counterweight, "mass")}</span> at{" "}
                  {q(model.values.value?.counterweightRadius ?? 0, "length")}, {moved ? "opposite the way the part moved" : "opposite the part"}, cancels it.
                </strong>{" "}
                The part {moved ? "moved" : "added"} puts the centre of mass <span data-out="offset">{q(result.offset, "length")}</span> off the spin axis
                against <span data-out="offset-limit">{q(result.allowance.offset, "length")}</span> allowed (
                {result.allowance.grade ? result.allowance.grade.label : `${q(result.allowance.force, "force")} of wobble`}):{" "}
                <span data-out="share">{formatNumber(result.shareOfLimit * 100)} %</span> of the limit.
              </p>
              <dl class="results-grid">
                {(
                  [
                    ["Least counterweight within the limit", "least", result.leastCounterweight > 0 ? q(result.leastCounterweight, "mass") : "none needed"],
                    [`Unbalance U = m·${moved ? "d" : "r"}`, "unbalance", q(result.unbalance, "unbalance")],
                    ["Rotating force U·Ω²", "force", q(result.force, "force")],
                    ["Unbalance allowed, Uₚₑᵣ", "unbalance-limit", q(result.allowance.unbalance, "unbalance")],
                    [
                      result.allowance.grade ? "Force at the limit" : "The limit as a grade",
                      "limit-other",
                      result.allowance.grade ? q(result.allowance.force, "force") : `G ${formatNumber(result.allowance.equivalentGrade * 1000)}`,
                    ],
                    ["Robot mass after the change", "mass", q(result.totalMass, "mass", 4)],
                  ] as const
                ).map(([label, name, text]) => (
                  <div key={name}>
                    <dt>{label}</dt>
                    <dd data-out={name}>{text}</dd>
                  </div>
                ))}
              </dl>
              <p class="field-help">
                The robot is taken as balanced before the change: this judges the part alone. For a whole layout, or parts above and below the centre of mass (a
                rocking couple), use the mass-layout calculator.
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
