/**
 * The spin-up calculator: a spinning weapon or a whole-body spinner from rest to speed — times to
 * 50, 90 and 100 % of the target, top speed, what limits it over time, battery current and sag,
 * stored energy and where the rest of the energy went; variants of the design in one table; and a sweep of
 * one input with the best value marked. The simulation is calc/drivetrain/.
 *
 * The page opens on the default design's results, computed when the site was built (`prepared`,
 * from the chapter); the simulation's code loads on the first change. The comparison and the sweep
 * load when first used, or at once when the link holds them (see the model).
 */
import { useEffect, useMemo } from "preact/hooks";
import { CURRENT_LIMIT_AT_OPTIONS, DRIVE_TYPE_OPTIONS, type DriveType, NO_LOAD_LOSS_OPTIONS } from "../../calc/drivetrain/inputs.ts";
import type { Signal } from "../calc-ui/reactive.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";
import { Notices } from "../calc-ui/Notices.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createSpinUpModel, SPINNER_ONLY, type Name, type SpinUpModel, type SpinUpPrepared } from "../drivetrain/model.ts";
import { Empty, Results, SpinUpBar, SpinUpCharts } from "../drivetrain/Results.tsx";
import { form as spinUp } from "../../calc/drivetrain/spin-up-form.ts";

/** The island name: this file's name. */
export const island = "spin-up";

export interface SpinUpCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
  /** The default design and its result, computed at build time (the chapter passes the worked example's weapon). */
  prepared?: SpinUpPrepared | null;
}

interface Group {
  legend: string | Record<DriveType, string>;
  names: readonly Name[];
  spinnerOnly?: boolean;
}

// What is spun comes first: builders start from the weapon or the robot ("a 3 lb spinner").
const GROUPS: Group[] = [
  { legend: { weapon: "Rotor", spinner: "Robot" }, names: ["inertia", "robotMass", "tipRadius", "impactors"] },
  { legend: "Motors", names: ["motorCount", "motorKv", "motorResistance", "noLoadCurrent", "noLoadVoltage", "motorRotorInertia"] },
  { legend: "Battery", names: ["cellCount", "cellVoltage", "cellResistance"] },
  { legend: "Controller", names: ["currentLimit", "throttle"] },
  { legend: "Gearing", names: ["gearRatio", "gearEfficiency"] },
  { legend: "Wheels and traction", names: SPINNER_ONLY, spinnerOnly: true },
  { legend: "Resistive torques", names: ["frictionTorque", "dragTorque", "dragReferenceSpeed"] },
  { legend: "Target", names: ["targetSpeed", "closingSpeed", "maxTime"] },
];

/** A menu for one of the drive's model choices (where the current limit acts, the no-load loss). */
function Menu({ id, label, value, options }: { id: string; label: string; value: Signal<string>; options: readonly { value: string; label: string }[] }) {
  return (
    <div class="field">
      <label for={id}>{label}</label>
      <select id={id} value={value.value} onChange={(e) => (value.value = e.currentTarget.value)}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}

function Form({ model, id }: { model: SpinUpModel; id: string }) {
  const { fields } = model;
  const type = model.driveType.value;
  const error = model.fieldError.value;
  return (
    <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
      {GROUPS.map((group) => {
        const legend = typeof group.legend === "string" ? group.legend : group.legend[type];
        return (
          <fieldset key={legend}>
            <legend>{legend}</legend>
            {legend === "Motors" ? <Menu id={`${id}-loss`} label="No-load loss" value={model.noLoadLoss} options={NO_LOAD_LOSS_OPTIONS} /> : null}
            {legend === "Controller" ? (
              <Menu id={`${id}-limat`} label="Current limit acts on" value={model.currentLimitAt} options={CURRENT_LIMIT_AT_OPTIONS} />
            ) : null}
            {group.spinnerOnly && type !== "spinner" ? (
              <p class="field-help" data-out="wheels-note">
                Only a whole-body spinner has these inputs; choose that drive type above to edit them.
              </p>
            ) : (
              group.names.map((name) => (
                <QuantityField
                  key={name}
                  idPrefix={id}
                  name={name}
                  spec={fields.specs[name]}
                  text={fields.texts[name]}
                  reading={fields.readings[name]}
                  system={fields.system.value}
                  extraError={error && error.field === name ? error.message : null}
                />
              ))
            )}
          </fieldset>
        );
      })}
    </form>
  );
}

/** The result bar, the verdict and the figures: re-drawn when a run ends, apart from the form. */
function Outcome({ model, id }: { model: SpinUpModel; id: string }) {
  const { input, result, error } = model.outcome.value;
  const system = model.fields.system.value;
  return (
    <>
      <SpinUpBar r={result && input ? result : null} system={system} error={error} resultsId={`${id}-results`} />
      {result && input ? <Results r={result} input={input} system={system} id={`${id}-results`} /> : <Empty error={error} id={`${id}-results`} />}
    </>
  );
}

/** The speed and current charts: drawn a task after the figures (see `charted` in the model). */
function Charts({ model }: { model: SpinUpModel }) {
  const { input, result } = model.charted.value;
  return result && input ? <SpinUpCharts r={result} input={input} /> : null;
}

/** The variants: their code loads on the first "Add variant" (or with a link that holds some). */
function CompareSection({ model, id }: { model: SpinUpModel; id: string }) {
  const module = model.modules.value.compare;
  if (module && model.variantsPart.value) return <module.Compare model={model} idPrefix={id} />;
  return (
    <section class="dt-section" aria-labelledby={`${id}-cmp-title`}>
      <h3 id={`${id}-cmp-title`}>Variants of this design</h3>
      <p class="field-help">Each variant is this design with a few inputs changed; it follows every other edit of the design.</p>
      <button type="button" class="button" onClick={model.addVariant}>
        Add variant 1
      </button>
    </section>
  );
}

/** The sweep: its code loads when it is first run or set up (or with a link that holds one). */
function SweepSection({ model, id }: { model: SpinUpModel; id: string }) {
  const module = model.modules.value.sweep;
  const part = model.sweepPart.value;
  if (module && part) return <module.Sweep model={model} part={part} idPrefix={id} />;
  return (
    <section class="dt-section" aria-labelledby={`${id}-sweep-title`}>
      <h3 id={`${id}-sweep-title`}>Sweep one input</h3>
      <p class="field-help">Simulates the design over a range of one input (the gear ratio unless you choose another) and marks the best value.</p>
      <div class="dt-row">
        <button type="button" class="button" onClick={model.startSweep}>
          Run the sweep
        </button>
        <button type="button" class="button button--quiet" onClick={() => model.openSweep()}>
          Choose what to sweep
        </button>
      </div>
    </section>
  );
}

export default function SpinUpCalculator({ id = spinUp.anchor, prepared = null }: SpinUpCalculatorProps) {
  const model = useMemo(() => createSpinUpModel({ prepared }), []);
  useEffect(() => {
    const stopUrl = syncWithUrl(model.link);
    const stopRunning = model.start();
    return () => {
      stopUrl();
      stopRunning();
    };
  }, [model]);
  const type = model.driveType.value;
  return (
    <section class="calc" id={id} aria-label="Spin-up calculator">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={model.fields.system} onSystem={model.setSystem} link={() => linkFor(model.link, id)} save={model.save} />
      <fieldset class="dt-choice">
        <legend>Drive type</legend>
        {DRIVE_TYPE_OPTIONS.map((option) => (
          <label key={option.value}>
            <input type="radio" name={`${id}-type`} value={option.value} checked={type === option.value} onChange={() => model.setDriveType(option.value)} />
            <span>{option.label}</span>
          </label>
        ))}
      </fieldset>
      <Form model={model} id={id} />
      {/* The outputs are attached to the page after the form, each in a task of its own. */}
      <HydrateLater>
        <Outcome model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <Charts model={model} />
      </HydrateLater>
      <HydrateLater>
        <CompareSection model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <SweepSection model={model} id={id} />
      </HydrateLater>
    </section>
  );
}
