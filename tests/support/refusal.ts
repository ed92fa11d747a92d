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
