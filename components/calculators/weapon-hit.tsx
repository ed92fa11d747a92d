/**
 * What a hit does: the rotor, the two robots and the crush distance give the energy the rotor
 * gives up and where it goes, the rotor's speed after the hit, the impulse on your own robot, the
 * bite, and an estimate of the contact force. calc/weapon/impact.ts computes it.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as hitCalculator, run as hitRun } from "../../calc/calculators/weapon-hit.ts";
import { formatNumber, formatQuantity, type QuantityKind, type UnitId, type UnitSystem } from "../../calc/core/units.ts";
import { formParts } from "../calc-ui/form-parts.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { Verdict } from "../calc-ui/Verdict.tsx";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "weapon-hit";

export interface WeaponHitCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

export default function WeaponHitCalculator({ id = hitCalculator.anchor }: WeaponHitCalculatorProps) {
  const model = useMemo(() => createCalculatorModel(hitCalculator, hitRun), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields } = model;
  const system: UnitSystem = fields.system.value;
  const { result, error } = model.outcome.value;
  const { field } = formParts(model, id);
  const q = (v: number, kind: QuantityKind, unit?: UnitId, significant = 3) => formatQuantity(v, kind, { system, unit, significant }).text;
  const resultsId = `${id}-results`;
  const hit = result?.impact ?? null;
  const after = (omega: number) => `${q(Math.abs(omega), "angularSpeed")}${omega < 0 ? " backwards" : ""}`;
  return (
    <section class="calc" id={id} aria-label="What a hit does">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        <fieldset>
          <legend>The weapon</legend>
          {field("rotorInertia")}
          {field("weaponSpeed")}
          {field("tipRadius")}
          {field("impactors")}
        </fieldset>
        <fieldset>
          <legend>The two robots</legend>
          {field("robotMass")}
          {field("targetMass")}
          {field("closingSpeed")}
        </fieldset>
        <fieldset>
          <legend>The contact</legend>
          {field("restitution")}
          {field("stoppingDistance")}
        </fieldset>
      </form>
      {/* The outputs are attached to the page after the form, in a task of their own. */}
      <HydrateLater>
        {result && hit ? (
          <ResultBar
            tone={null}
            resultsId={resultsId}
            figures={[
              { name: "given", label: "Rotor gives up", value: q(hit.rotorEnergyDrop, "energy") },
              { name: "force", label: "Force (estimate)", value: `${q(result.force.average, "force")} to ${q(result.force.peak, "force")}` },
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
          {result && hit ? (
            <>
              <Verdict tone="info" out="verdict">
                The rotor gives up {formatNumber(100 * result.energyFractionUsed, 4)} % of its energy and leaves the hit at {after(hit.spinSpeedAfter)}; the
                opponent takes {q(hit.energyToTarget, "energy")}.
              </Verdict>
              <dl class="results-grid">
                {(
                  [
                    ["Tip speed Ω·r", "tip", q(result.tipSpeed, "speed")],
                    ["Stored energy ½·J·Ω²", "stored", q(result.storedEnergy, "energy")],
                    ["Bite per impactor", "bite", q(result.bite, "length")],
                    ["Effective mass at the tip", "tip-mass", q(hit.effectiveTipMass, "mass")],
                    ["Impulse P (your robot takes it too)", "impulse", `${formatNumber(hit.impulse, 3)} N·s`],
                    ["Energy the rotor gives up", "given", q(hit.rotorEnergyDrop, "energy")],
                    ["Weapon speed after the hit", "after", after(hit.spinSpeedAfter)],
                    ["Speed drop", "drop", q(hit.speedDrop, "angularSpeed")],
                    ["Energy to the opponent", "target", q(hit.energyToTarget, "energy")],
                    ["Opponent's speed after the hit", "target-speed", q(hit.targetVelocityAfter, "speed")],
                    ["Energy to your robot's recoil", "self", q(hit.energyToSelf, "energy")],
                    ["Your robot's recoil speed", "self-speed", q(Math.abs(hit.selfVelocityAfter), "speed")],
                    ["Energy lost in the contact", "lost", q(hit.energyLost, "energy")],
                    ["Energy the crush absorbs ½·μ·v²", "crush", q(hit.compressionEnergy, "energy")],
                    ["Contact force, average over the crush", "force-average", q(result.force.average, "force")],
                    ["Contact force, peak of a linear contact", "force-peak", q(result.force.peak, "force")],
                    ["Time to the deepest crush", "time", result.force.compressionTime === null ? "—" : q(result.force.compressionTime, "time")],
                  ] as const
                ).map(([label, name, text]) => (
                  <div key={name}>
                    <dt>{label}</dt>
                    <dd data-out={name}>{text}</dd>
                  </div>
                ))}
              </dl>
              <p class="field-help">
                One clean, square hit with the full bite. The force is an estimate: it scales as one over the crush distance, which is rarely known to better
                than a factor of two or three; take the range, not one figure.
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
