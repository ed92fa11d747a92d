/**
 * The check of a whole spin-up input: the choices refused by name with the options listed, and the
 * two rules between inputs (V₀ above the winding's drop at I₀, sliding at most grip) applied only
 * where they mean something, with the rule kept as data for the form.
 */
import { describe, expect, it } from "vitest";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../../calc/drivetrain/demo-robots.ts";
import { type DrivetrainInput, validateDrivetrainInput } from "../../../calc/drivetrain/inputs.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

/** A whole input with a field set to something its type does not allow, as a link or a stored design could hold. */
const withField = (base: Readonly<DrivetrainInput>, field: string, value: unknown) => ({ ...base, [field]: value }) as DrivetrainInput;

describe("the choices of a spin-up input", () => {
  it("refuses a place for the current limit that is not an option, listing the three", () => {
    expectRefusal(
      () => validateDrivetrainInput(withField(DEMO_WEAPON, "currentLimitAt", "fuse")),
      "currentLimitAt",
      "fuse",
      "",
      'currentLimitAt must be one of "motor", "battery", "none" (got "fuse")',
    );
  });

  it("refuses a no-load loss model that is not an option, listing the two", () => {
    expectRefusal(
      () => validateDrivetrainInput(withField(DEMO_WEAPON, "noLoadLoss", "cubic")),
      "noLoadLoss",
      "cubic",
      "",
      'noLoadLoss must be one of "constant", "speed" (got "cubic")',
    );
  });

  it("words a number given for a choice without a unit", () => {
    expectRefusal(
      () => validateDrivetrainInput(withField(DEMO_WEAPON, "noLoadLoss", 2)),
      "noLoadLoss",
      2,
      "",
      'noLoadLoss must be one of "constant", "speed" (got 2)',
    );
    expectRefusal(
      () => validateDrivetrainInput(withField(DEMO_WEAPON, "driveType", 3)),
      "driveType",
      3,
      "",
      'driveType must be one of "weapon", "spinner" (got 3)',
    );
  });

  it("refuses something that is not an object at all", () => {
    expectRefusal(() => validateDrivetrainInput(null as unknown as DrivetrainInput), "input", null, "", "input must be an object of spin-up inputs (got null)");
  });
});

describe("the no-load voltage rule: V₀ above I₀·R (ctms-dc-motor-speed, the steady state at V₀)", () => {
  // I₀·R = 20 A × 0.05 Ω = 1 V: measured at 0.5 V, the motor could not turn at all.
  const low = { ...DEMO_WEAPON, noLoadVoltage: 0.5, noLoadCurrent: 20, motorResistance: 0.05 };

  it("refuses V₀ at or below the winding's drop when the loss grows with speed, in volts, with the rule as data", () => {
    const run = () => validateDrivetrainInput({ ...low, noLoadLoss: "speed" });
    expectRefusal(run, "noLoadVoltage", 0.5, "V", "noLoadVoltage must be greater than 1 V (got 0.5 V)");
    expect(refusal(run).bound).toEqual({ relation: "greater", limit: 1, kind: "voltage" });
  });

  it("leaves V₀ alone with a constant loss, which does not read it", () => {
    expect(validateDrivetrainInput({ ...low, noLoadLoss: "constant" })).toEqual({ driveType: "weapon", currentLimitAt: "motor", noLoadLoss: "constant" });
  });
});

describe("the friction rule: sliding at most grip", () => {
  it("is kept as data naming the grip coefficient, for a spinner", () => {
    const error = refusal(() => validateDrivetrainInput({ ...DEMO_SPINNER, kineticFriction: 1.2 }));
    expect(error.param).toBe("kineticFriction");
    expect(error.bound).toEqual({ relation: "at-most", limit: 1, kind: "fraction", other: "staticFriction" });
  });

  it("is not applied to a weapon, whose wheel fields are not read", () => {
    expect(validateDrivetrainInput({ ...DEMO_WEAPON, kineticFriction: 1.2, staticFriction: 1 })).toEqual({
      driveType: "weapon",
      currentLimitAt: "motor",
      noLoadLoss: "constant",
    });
  });
});
