/**
 * Turning with a spinning weapon: a weapon on a horizontal axle across the robot, the robot's mass,
 * track and centre of mass, and its drive give the turn rate at which a wheel lifts, the turn rate
 * the drive reaches, and a verdict. calc/weapon/turn-check.ts computes it.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as turnCalculator, run as turnRun } from "../../calc/calculators/weapon-turn.ts";
import { formatNumber, formatQuantity, type QuantityKind, type UnitId, type UnitSystem } from "../../calc/core/units.ts";
import { formParts } from "../calc-ui/form-parts.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { ResultBar, type Tone } from "../calc-ui/ResultBar.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "weapon-turn";

export interface WeaponTurnCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
}

const TONE = { holds: "ok", marginal: "warn", fails: "bad" } as const satisfies Record<string, Tone>;

/** The verdict in a few words, for the result bar (the full reason is in the results). */
const SHORT_REASON = { holds: "the wheels stay down", marginal: "a thin margin before a wheel lifts", fails: "a full turn lifts a wheel" } as const;

const EFFECT_WORDS: Record<string, string> = {
  "left-up": "lifts the left side",
  "right-up": "lifts the right side",
  "nose-up": "lifts the nose",
  "nose-down": "dips the nose",
  "yaw-left": "turns it left",
  "yaw-right": "turns it right",
};

export default function WeaponTurnCalculator({ id = turnCalculator.anchor }: WeaponTurnCalculatorProps) {
  const model = useMemo(() => createCalculatorModel(turnCalculator, turnRun), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields } = model;
  const system: UnitSystem = fields.system.value;
  const { result, error } = model.outcome.value;
  const { field, choice } = formParts(model, id);
  const q = (v: number, kind: QuantityKind, unit?: UnitId, significant = 3) => formatQuantity(v, kind, { system, unit, significant }).text;
  const rate = (v: number) => q(v, "angularSpeed", "deg/s");
  const resultsId = `${id}-results`;
  const tone = result ? TONE[result.verdict] : null;
  const turn = result?.turn ?? null;
  return (
    <section class="calc" id={id} aria-label="Turning with a spinning weapon">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        <fieldset>
          <legend>The weapon</legend>
          {field("rotorInertia")}
          {field("weaponSpeed")}
          {choice("horizontalSpin")}
          {field("bearingSpan")}
        </fieldset>
        <fieldset>
          <legend>The robot</legend>
          {field("robotMass")}
          {field("trackWidth")}
          {field("comHeight")}
          {field("comOffset")}
        </fieldset>
        <fieldset>
          <legend>The turn</legend>
          {field("wheelTopSpeed")}
          {field("forwardSpeed")}
          {field("turnRate")}
          {field("liftMargin")}
        </fieldset>
      </form>
      {/* The outputs are attached to the page after the form, in a task of their own. */}
      <HydrateLater>
        {result && tone && turn ? (
          <ResultBar
            tone={tone}
            reason={SHORT_REASON[result.verdict]}
            resultsId={resultsId}
            figures={[
              { name: "lift", label: "Wheel lifts at", value: turn.liftTurnRate === null ? "no turn rate" : rate(turn.liftTurnRate) },
              { name: "drive", label: "Drive reaches", value: rate(turn.driveTurnRate) },
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
          {result && turn ? (
            <>
              <p class={`verdict verdict--${tone}`}>
                <strong>
                  {turn.liftTurnRate === null ? (
                    <>No turn lifts a wheel.</>
                  ) : (
                    <>
                      Turning {turn.liftTurn}, the {turn.liftTurn === "left" ? turn.left.wheel : turn.right.wheel} wheels lift from{" "}
                      <span data-out="lift">{rate(turn.liftTurnRate)}</span>.
                    </>
                  )}
                </strong>{" "}
                {result.reason}
              </p>
              <dl class="results-grid">
                {(
                  [
                    ["Drive's fastest turn at the forward speed", "drive", rate(turn.driveTurnRate)],
                    ["Drive's fastest turn in place", "drive-in-place", rate(turn.driveTurnRateInPlace)],
                    ["Lift turn rate, turning left", "lift-left", turn.left.liftTurnRate === null ? "none" : rate(turn.left.liftTurnRate)],
                    ["Lift turn rate, turning right", "lift-right", turn.right.liftTurnRate === null ? "none" : rate(turn.right.liftTurnRate)],
                    ["Margin (lift ÷ fastest turn)", "margin", turn.margin === null ? "—" : formatNumber(turn.margin)],
                    ["Angular momentum H = J·Ω", "momentum", `${formatNumber(result.angularMomentum)} N·m·s`],
                    ["Gyroscopic moment J·Ω·ψ̇ at the turn rate entered", "moment", q(turn.gyroscopicMoment, "torque")],
                    ["Centrifugal moment m·v·ψ̇·h at that rate", "centrifugal", q(turn.centrifugalMoment, "torque")],
                    ["Force pair on the weapon's bearings at that rate", "bearing", q(turn.bearingForce, "force")],
                    [
                      "Turning left, the weapon",
                      "effect",
                      turn.gyroscopicEffectTurningLeft ? (EFFECT_WORDS[turn.gyroscopicEffectTurningLeft] ?? turn.gyroscopicEffectTurningLeft) : "—",
                    ],
                  ] as const
                ).map(([label, name, text]) => (
                  <div key={name}>
                    <dt>{label}</dt>
                    <dd data-out={name}>{text}</dd>
                  </div>
                ))}
              </dl>
              <p class="field-help">
                Steady turn on flat, level ground with the weapon at full speed. A bump, a hit or a change of spin speed is not in these numbers: keep a margin.
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
