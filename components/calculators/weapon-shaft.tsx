/**
 * The weapon shaft and its bearings: the rotor, the layout, the shaft, the loads of a turn and a
 * hit, and the bearings give the shaft's safety factor on yield, its deflection, the bearings'
 * rating life in hours and their static safety factor, with a verdict naming what governs.
 * calc/weapon/shaft-check.ts computes it.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as shaftCalculator, shaftInputApplies, run as shaftRun } from "../../calc/calculators/weapon-shaft.ts";
import { formatNumber, formatQuantity, type QuantityKind, type UnitId, type UnitSystem } from "../../calc/core/units.ts";
import { formParts } from "../calc-ui/form-parts.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { ResultBar, type Tone } from "../calc-ui/ResultBar.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { Verdict } from "../calc-ui/Verdict.tsx";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "weapon-shaft";

export interface WeaponShaftCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

const TONE = { holds: "ok", marginal: "warn", fails: "bad" } as const satisfies Record<string, Tone>;

/** What governs, in a few words for the result bar. */
const GOVERNS = { "shaft-yield": "the shaft's strength", "bearing-static": "the bearings under a hit", "bearing-life": "the bearings' life" } as const;

type Field = keyof typeof shaftCalculator.inputs;

export default function WeaponShaftCalculator({ id = shaftCalculator.anchor }: WeaponShaftCalculatorProps) {
  const model = useMemo(() => createCalculatorModel(shaftCalculator, shaftRun), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields, choices } = model;
  const system: UnitSystem = fields.system.value;
  const { result, error } = model.outcome.value;
  const { field, choice } = formParts(model, id);
  const current = { layout: choices.layout.value, shaft: choices.shaft.value };
  // A field the layout does not read is hidden, unless it holds a value that does not read.
  const shown = (name: Field) => (shaftInputApplies(name, current) || !fields.readings[name].value.ok ? field(name) : null);
  const q = (v: number, kind: QuantityKind, unit?: UnitId, significant = 3) => formatQuantity(v, kind, { system, unit, significant }).text;
  const ratio = (v: number | null) => (v === null ? "no load" : formatNumber(v, 3));
  const hours = (v: number | null) => (v === null ? "no load" : `${formatNumber(v, 3)} h`);
  const resultsId = `${id}-results`;
  const tone = result ? TONE[result.verdict] : null;
  const short = result && result.verdict !== "holds" ? GOVERNS[result.governs] : undefined;
  return (
    <section class="calc" id={id} aria-label="Weapon shaft and bearings">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        <fieldset>
          <legend>The rotor</legend>
          {field("rotorMass")}
          {field("rotorInertia")}
          {field("weaponSpeed")}
          {field("unbalance")}
        </fieldset>
        <fieldset>
          <legend>The layout</legend>
          {choice("axle")}
          {choice("layout")}
          {choice("shaft")}
          {field("bearingSpan")}
          {shown("rotorPosition")}
          {shown("overhang")}
          {shown("hubBearingSpacing")}
        </fieldset>
        <fieldset>
          <legend>The shaft</legend>
          {choice("material")}
          {field("shaftDiameter")}
          {field("shaftBore")}
          {shown("motorTorque")}
        </fieldset>
        <fieldset>
          <legend>Turn and hit</legend>
          {field("turnRate")}
          {field("impactForce")}
          {field("axialLoad")}
        </fieldset>
        <fieldset>
          <legend>The bearings</legend>
          {choice("bearingType")}
          {field("dynamicLoadRating")}
          {field("staticLoadRating")}
          {field("radialFactor")}
          {field("axialFactor")}
          {field("requiredLife")}
        </fieldset>
        <fieldset>
          <legend>Verdict</legend>
          {field("failBelow")}
          {field("marginalBelow")}
        </fieldset>
      </form>
      {/* The outputs are attached to the page after the form, in a task of their own. */}
      <HydrateLater>
        <ResultBar
          tone={tone}
          reason={short}
          resultsId={resultsId}
          figures={
            result
              ? [
                  { name: "sf", label: "Shaft on yield", value: ratio(result.safetyFactor) },
                  { name: "life", label: "Bearing L10", value: hours(result.bearing.ratingLifeHours) },
                  { name: "s0", label: "s0 in a hit", value: ratio(result.bearing.staticSafetyFactor) },
                ]
              : []
          }
          missing={result ? undefined : error?.field === null ? error.message : "No result yet: correct the marked field."}
        />
        <div class={`calc-results${result ? "" : " calc-results--empty"}`} id={resultsId} aria-live="polite">
          {result ? (
            <>
              <Verdict tone={tone!} reason={short} out="verdict">
                {result.reason}
              </Verdict>
              <dl class="results-grid">
                {(
                  [
                    ["Gyroscopic moment J·Ω·q", "gyro", q(result.loads.gyroscopicMoment, "torque")],
                    ["Unbalance force U·Ω²", "unbalance", q(result.loads.unbalanceForce, "force")],
                    ["Peak load with a hit", "peak", q(result.loads.peakForce, "force")],
                    ["Bending moment, peak", "moment", q(result.bendingMoment.peak, "torque")],
                    ["Von Mises stress, peak", "stress", q(result.vonMisesStress, "stress")],
                    [`Yield strength (${result.material.basis})`, "yield", q(result.material.yieldStrength, "stress")],
                    ["Safety factor on yield", "safety", ratio(result.safetyFactor)],
                    ["Deflection at the rotor, running", "deflection-running", q(result.deflection.running, "length", undefined, 2)],
                    ["Deflection at the rotor, peak", "deflection", q(result.deflection.peak, "length", undefined, 2)],
                    [
                      "Busier bearing's load, running / hit",
                      "bearing-load",
                      `${q(result.bearing.equivalentLoad, "force")} / ${q(result.bearing.staticEquivalentLoad, "force")}`,
                    ],
                    ["Bearing rating life L10", "life", hours(result.bearing.ratingLifeHours)],
                    ["Static safety factor s0, hit", "s0", ratio(result.bearing.staticSafetyFactor)],
                  ] as const
                ).map(([label, name, text]) => (
                  <div key={name}>
                    <dt>{label}</dt>
                    <dd data-out={name}>{text}</dd>
                  </div>
                ))}
              </dl>
              <p class="field-help">
                {result.stressCycle === "fully-reversed" ? "A live shaft's bending reverses every turn: check fatigue too. " : ""}
                Loads add in the plane that hurts most.
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
