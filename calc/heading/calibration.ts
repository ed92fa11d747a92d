/**
 * Calibration of an accelerometer-based spin-rate estimate: fit the radial reading against a
 * reference speed, a = r·ω² + b, to get the effective radius r (which absorbs the sensor's scale
 * error and tilt) and the offset b. The calculator's inputs, its demo data and the fitted curve are
 * in calibration-inputs.ts and exported from here too. SI in and out.
 */
import { CalcInputError, requireFinite, requireNonNegative } from "../core/errors.ts";
import { type StraightLineFit, countDistinct, fitChecked, requireFitOptions } from "../numerics/line-fit.ts";
import { requireDeclared, requireInputObject } from "../core/spec-check.ts";
import { type CalibrationRow, calibrationFitInputs } from "./calibration-inputs.ts";

// The inputs, the demo readings and the plotted curve live apart, in calibration-inputs.ts (a page
// holds them before anything is edited, without this file's fitting code); they are exported here too.
export {
  type CalibrationCurvePoint,
  type CalibrationRow,
  calibrationCurve,
  calibrationFitInputs,
  DEMO_CALIBRATION_READINGS,
  demoCalibrationRows,
} from "./calibration-inputs.ts";

// The calibration fit.

export type CalibrationMethod = "least-squares" | "least-squares-without-spikes" | "theil-sen";

export interface CalibrationFit extends StraightLineFit {
  /** The radius to put in firmware [m]: the recommended fit's slope (it absorbs scale error and tilt). */
  radius: number;
  /** The offset to subtract in firmware [m/s²]: the recommended fit's intercept. */
  bias: number;
  /** Which fit gave radius and bias. */
  method: CalibrationMethod;
  /** Standard error of the radius relative to it, SE(r̂)/r̂ [-]; null for Theil–Sen (no standard error) or when r̂ is 0 or too small for the ratio. */
  radiusRelativeStdError: number | null;
  /** x_i = ω_i² [rad²/s²], in input order. */
  speedSquared: number[];
}

/**
 * Fits the calibration line a = r·ω² + b to reference readings (openstax-college-physics a = ω²r
 * with ieee-1293-1998 offset and scale; fits as in `fitStraightLine`). The slope is the effective
 * radius and the intercept the offset; in slope and intercept fields, units are m and m/s².
 *
 * Formula: $a_i = \hat r\,\omega_i^2 + \hat b$, fitted in $x_i = \omega_i^2$
 *
 * @param rows readings, at least 3 at different speeds; ω [rad/s] ≥ 0 and a [m/s²] finite
 * @param options confidence [-] (0.95), spikeThreshold k [-] (3.5), each within its range in
 *   `calibrationFitInputs`; huberTuning c [-] (1.345), greater than 0
 * @returns every fit, the spike report, and the recommended radius [m] and offset [m/s²]:
 * least squares when nothing is flagged, least squares without the spikes when enough points
 * remain, else Theil–Sen; and the radius's standard error relative to it [-] (least-squares methods)
 *
 * Assumptions: the reference speed is right; the fitted radius is (1 + k) r cos θ, which is the
 * number the firmware needs (it cancels scale error and tilt at every speed).
 *
 * @example
 * const rows = [600, 1200, 1800, 2400].map((rpm) => ({ angularSpeed: rpmToRadPerSecond(rpm), acceleration: 0.0127 * rpmToRadPerSecond(rpm) ** 2 + 0.3 * STANDARD_GRAVITY }));
 * fitCalibration(rows) // → { radius: 0.0127, bias: 2.942, method: "least-squares", … } (readings made exactly from r = 12.7 mm and b = 0.3 g give both back)
 *
 * Sources: openstax-college-physics, ieee-1293-1998, draper-smith-1998, theil-1950, sen-1968,
 * gilbert-1987, iglewicz-hoaglin-1993.
 */
export function fitCalibration(
  rows: readonly CalibrationRow[],
  options: { confidence?: number; spikeThreshold?: number; huberTuning?: number } = {},
): CalibrationFit {
  const { confidence = 0.95, spikeThreshold = 3.5, huberTuning = 1.345 } = requireInputObject(options, "options");
  if (!Array.isArray(rows)) throw new CalcInputError({ param: "rows", value: rows, expected: "a list of readings", unit: "" });
  rows.forEach((row, i) => {
    requireNonNegative(`rows[${i}].angularSpeed`, row?.angularSpeed, "rad/s");
    // Stryker disable next-line OptionalChaining: equivalent, a missing row is refused on the line above, by its angularSpeed
    requireFinite(`rows[${i}].acceleration`, row?.acceleration, "m/s²");
  });
  requireDeclared(calibrationFitInputs.confidence, "confidence", confidence);
  requireDeclared(calibrationFitInputs.spikeThreshold, "spikeThreshold", spikeThreshold);
  requireFitOptions(confidence, spikeThreshold, huberTuning);
  const speedSquared = rows.map((r) => r.angularSpeed * r.angularSpeed);
  // A speed whose square leaves the doubles is refused by its row, not as a list the fit cannot use.
  const tooFast = speedSquared.indexOf(Number.POSITIVE_INFINITY);
  if (tooFast >= 0) {
    throw new CalcInputError({
      param: `rows[${tooFast}].angularSpeed`,
      value: rows[tooFast]!.angularSpeed,
      expected: "a speed whose square is a finite number (below about 1.3e154 rad/s)",
      unit: "rad/s",
    });
  }
  const distinct = countDistinct(speedSquared);
  if (rows.length < 3 || distinct < 3) {
    throw new CalcInputError({ param: "rows", value: distinct, expected: "at least 3 readings at different speeds", unit: "" });
  }
  const fit = fitChecked(
    speedSquared,
    rows.map((r) => r.acceleration),
    confidence,
    spikeThreshold,
    huberTuning,
    "rows",
  );
  const chosen =
    fit.spikes.flagged.length === 0
      ? { line: fit.leastSquares, method: "least-squares" as const }
      : fit.leastSquaresWithoutSpikes
        ? { line: fit.leastSquaresWithoutSpikes, method: "least-squares-without-spikes" as const }
        : { line: fit.theilSen, method: "theil-sen" as const };
  // Relative standard error of the slope, SE(r̂)/r̂, with SE(r̂) from least squares (draper-smith-1998).
  const relative = "slopeStdError" in chosen.line ? chosen.line.slopeStdError / Math.abs(chosen.line.slope) : Number.NaN;
  return {
    ...fit,
    radius: chosen.line.slope,
    bias: chosen.line.intercept,
    method: chosen.method,
    radiusRelativeStdError: Number.isFinite(relative) ? relative : null,
    speedSquared,
  };
}
