import { expect } from "vitest";
import { CalcInputError } from "../../calc/core/errors.ts";

/** The CalcInputError `run` throws; fails the test when it returns or throws anything else. */
export function refusal(run: () => unknown): CalcInputError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(CalcInputError);
    return error as CalcInputError;
  }
  throw new Error("expected a CalcInputError, but the call returned");
}
