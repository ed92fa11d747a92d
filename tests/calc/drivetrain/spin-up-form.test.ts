/**
 * The spin-up calculator's form (calc/drivetrain/spin-up-form.ts): which inputs apply to which drive
 * type, and when the no-load voltage is read. What a user sees of it is which fields the form shows
 * and which keys a link of the design carries (`textsOf` leaves out the inputs that do not apply).
 */
import { describe, expect, it } from "vitest";
import { textsOf } from "../../../calc/core/calculator.ts";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../../calc/drivetrain/demo-robots.ts";
import { drivetrainInputs } from "../../../calc/drivetrain/inputs.ts";
import { applies, form, SPINNER_ONLY } from "../../../calc/drivetrain/spin-up-form.ts";

const WHEEL_INPUTS = ["drivenWheels", "wheelRadius", "wheelOffset", "wheelInertia", "weightShare", "staticFriction", "kineticFriction"];

describe("applies: a weapon has no wheels", () => {
  it("leaves out exactly the seven wheel and grip inputs for a weapon", () => {
    const left = Object.keys(drivetrainInputs).filter((name) => !applies(name, "weapon"));
    expect(left.sort()).toEqual([...WHEEL_INPUTS].sort());
    expect([...SPINNER_ONLY].sort()).toEqual([...WHEEL_INPUTS].sort());
  });

  it("reads every input for a whole-body spinner", () => {
    expect(Object.keys(drivetrainInputs).filter((name) => !applies(name, "spinner"))).toEqual([]);
  });

  it("answers true or false, per input and drive type", () => {
    expect(applies("wheelRadius", "weapon")).toBe(false);
    expect(applies("wheelRadius", "spinner")).toBe(true);
    expect(applies("cellCount", "weapon")).toBe(true);
    expect(applies("cellCount", "spinner")).toBe(true);
  });
});

describe("the form's applies: drive type and no-load loss", () => {
  it("shows the wheel inputs only for a spinner, and takes a missing drive type as a weapon", () => {
    expect(form.applies!("wheelRadius", { driveType: "spinner" })).toBe(true);
    expect(form.applies!("wheelRadius", { driveType: "weapon" })).toBe(false);
    expect(form.applies!("wheelRadius", {})).toBe(false);
    expect(form.applies!("cellCount", {})).toBe(true);
  });

  it("reads the no-load voltage only when the loss grows with speed", () => {
    expect(form.applies!("noLoadVoltage", { driveType: "weapon", noLoadLoss: "speed" })).toBe(true);
    expect(form.applies!("noLoadVoltage", { driveType: "spinner", noLoadLoss: "speed" })).toBe(true);
    expect(form.applies!("noLoadVoltage", { driveType: "weapon", noLoadLoss: "constant" })).toBe(false);
    expect(form.applies!("noLoadVoltage", {})).toBe(false);
    // The loss model concerns the no-load voltage only.
    expect(form.applies!("cellCount", { noLoadLoss: "constant" })).toBe(true);
    expect(form.applies!("noLoadCurrent", { noLoadLoss: "constant" })).toBe(true);
  });

  it("a wheel input stays out for a weapon whatever the loss model", () => {
    expect(form.applies!("wheelRadius", { driveType: "weapon", noLoadLoss: "speed" })).toBe(false);
    expect(form.applies!("wheelRadius", { driveType: "spinner", noLoadLoss: "constant" })).toBe(true);
  });

  it("a link of the demo weapon carries no wheel keys and no no-load voltage; the demo spinner's carries the wheels", () => {
    const weapon = Object.keys(textsOf(form, DEMO_WEAPON, "metric").texts);
    expect(weapon.sort()).toEqual(
      Object.keys(drivetrainInputs)
        .filter((n) => !WHEEL_INPUTS.includes(n) && n !== "noLoadVoltage")
        .sort(),
    );
    const spinner = Object.keys(textsOf(form, DEMO_SPINNER, "metric").texts);
    expect(spinner.sort()).toEqual(
      Object.keys(drivetrainInputs)
        .filter((n) => n !== "noLoadVoltage")
        .sort(),
    );
    const speedLoss = textsOf(form, { ...DEMO_WEAPON, noLoadLoss: "speed" }, "metric").texts;
    // The demo's 10 V, in the field's unit (volts).
    expect(speedLoss.noLoadVoltage).toBe("10V");
  });
});
