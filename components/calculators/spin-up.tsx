/**
 * The spin-up calculator: a spinning weapon or a whole-body spinner from rest to speed — times to
 * 50, 90 and 100 % of the target, top speed, what limits it over time, battery current and sag,
 * stored energy and where the rest of the energy went; variants of the design in one table; and a sweep of
 * one input with the best value marked. The simulation is calc/drivetrain/.
 */
import { useEffect, useMemo } from "preact/hooks";
import { CURRENT_LIMIT_AT_OPTIONS, DRIVE_TYPE_OPTIONS, type DriveType, NO_LOAD_LOSS_OPTIONS } from "../../calc/drivetrain/inputs.ts";
import type { Signal } from "../calc-ui/reactive.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createSpinUpModel, SPINNER_ONLY, type Name, type SpinUpModel } from "../drivetrain/model.ts";
import { Empty, Results, SpinUpBar, SpinUpCharts } from "../drivetrain/Results.tsx";
import { Compare } from "../drivetrain/Compare.tsx";
import { Sweep } from "../drivetrain/Sweep.tsx";
import { form as spinUp } from "../../calc/calculators/spin-up.ts";

/** The island name: this file's name. */
export const island = "spin-up";

export interface SpinUpCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
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
  const error = model.outcome.value.error;
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

export default function SpinUpCalculator({ id = spinUp.anchor }: SpinUpCalculatorProps) {
  const model = useMemo(() => createSpinUpModel(), []);
  useEffect(() => {
    const stopUrl = syncWithUrl(model.link);
    const stopSweeps = model.runSweeps();
    return () => {
      stopUrl();
      stopSweeps();
    };
  }, [model]);
  const type = model.driveType.value;
  const { input, result, error } = model.outcome.value;
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
      <SpinUpBar r={result && input ? result : null} system={model.fields.system.value} error={error} resultsId={`${id}-results`} />
      {result && input ? (
        <>
          <Results r={result} input={input} system={model.fields.system.value} id={`${id}-results`} />
          <SpinUpCharts r={result} input={input} />
        </>
      ) : (
        <Empty error={error} id={`${id}-results`} />
      )}
      <Compare model={model} idPrefix={id} />
      <Sweep model={model} idPrefix={id} />
    </section>
  );
}
