/**
 * Edges of the steering inputs (calc/steering/inputs.ts): a valid input passing through unchanged,
 * the window that fits once a turn but not twice, and the wording of each refusal.
 */
import { describe, expect, it } from "vitest";
import { DEMO_STEERING_SPINNER, type SteeringInput, steeringUnit, validateSteeringInput } from "../../../calc/steering/inputs.ts";
import { refusal } from "../../support/refusal.ts";

const WIDE = 3.5; // rad ≈ 200.5°: more than half a turn (π ≈ 3.14159), less than a whole one

describe("validateSteeringInput", () => {
  it("passes the demo spinner through unchanged", () => {
    expect(validateSteeringInput(DEMO_STEERING_SPINNER)).toBe(DEMO_STEERING_SPINNER);
  });

  it("accepts a window wider than half a turn when the opposite window is off", () => {
    const input: SteeringInput = { ...DEMO_STEERING_SPINNER, oppositeWindow: 0, windowWidth: WIDE };
    expect(validateSteeringInput(input).windowWidth).toBe(WIDE);
  });

  it("refuses a window wider than half a turn with the opposite window on, naming the width in rad", () => {
    const error = refusal(() => validateSteeringInput({ ...DEMO_STEERING_SPINNER, oppositeWindow: 1, windowWidth: WIDE }));
    expect(error.param).toBe("windowWidth");
    expect(error.value).toBe(WIDE);
    expect(error.unit).toBe("rad");
    expect(error.expected).toBe("at most π rad (180°) with the opposite window on");
  });

  it("refuses something that is not an object of inputs", () => {
    const error = refusal(() => validateSteeringInput(null as unknown as SteeringInput));
    expect(error.param).toBe("input");
    expect(error.expected).toBe("an object of steering inputs");
    expect(error.unit).toBe("");
  });
});

describe("steeringUnit", () => {
  it("gives the SI symbol of a declared input (the window width in rad)", () => {
    expect(steeringUnit("windowWidth")).toBe("rad");
  });

  it("refuses a name that is not a steering input, with the name as given", () => {
    const error = refusal(() => steeringUnit("wingspan" as "windowWidth"));
    expect(error.param).toBe("name");
    expect(error.value).toBe("wingspan");
    expect(error.expected).toBe("the name of a steering input");
    expect(error.unit).toBe("");
  });
});
