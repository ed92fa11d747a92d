import { expect } from "vitest";
import { CalcInputError } from "../../calc/core/errors.ts";

/** The CalcInputError `run` throws; fails the test when it returns, and rethrows any other error. */
export function refusal(run: () => unknown): CalcInputError {
  try {
    run();
  } catch (error) {
    if (error instanceof CalcInputError) return error;
    throw error;
  }
  throw new Error("expected a CalcInputError, but the call returned");
}

/** Checks the field, the value and the unit a call's refusal names, and its whole message. */
export function expectRefusal(run: () => unknown, param: string, value: unknown, unit: string, message: string): void {
  const error = refusal(run);
  expect({ param: error.param, value: error.value, unit: error.unit }).toEqual({ param, value, unit });
  expect(error.message).toBe(message);
}
