/**
 * The safety-factor thresholds every load check declares (fails below, marginal below). A module of
 * its own so that a check's input declaration, which a calculator page loads, does not bring the
 * checks' shared code (calc/loads/common.ts) with it.
 */

/** Default verdict thresholds on the safety factor [-] (safety-factor-practice). */
export const DEFAULT_SAFETY_THRESHOLDS = { failBelow: 1, marginalBelow: 2 } as const;

/**
 * The two verdict thresholds every load check declares, worded for what it checks ("bolt",
 * "part"): fails below `failBelow`, marginal below `marginalBelow` (safety-factor-practice).
 */
export function safetyThresholdInputs(subject: string) {
  return {
    failBelow: {
      label: "Fails below",
      kind: "fraction",
      min: 1,
      max: 10,
      default: DEFAULT_SAFETY_THRESHOLDS.failBelow,
      unit: { metric: "frac", us: "frac" },
      urlKey: "fail",
      help: `Safety factor under which the ${subject} is called a failure.`,
    },
    marginalBelow: {
      label: "Marginal below",
      kind: "fraction",
      min: 1,
      max: 20,
      default: DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
      unit: { metric: "frac", us: "frac" },
      urlKey: "thin",
      help: `Safety factor under which the ${subject} is called marginal.`,
    },
  } as const;
}
