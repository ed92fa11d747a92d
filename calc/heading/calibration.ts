/**
 * Calibration of an accelerometer-based spin-rate estimate: fit the radial reading against a
 * reference speed, a = r·ω² + b, to get the effective radius r (which absorbs the sensor's scale
 * error and tilt) and the offset b; the calculator's inputs, its demo data and the fitted curve.
 * SI in and out.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requireRelation } from "../core/errors.ts";
import { defineInputs } from "../core/inputs.ts";
import { toSI } from "../core/units.ts";
import { type StraightLineFit, countDistinct, fitChecked, requireFitOptions } from "../numerics/line-fit.ts";
import { requireDeclared, requireFiniteFields, requireInputObject } from "../core/spec-check.ts";

// The calibration fit.

/** One calibration reading: a reference spin rate and the radial acceleration read at it. */
export interface CalibrationRow {
  /** ω, from a tachometer or a timed video [rad/s], 0 or more. */
  angularSpeed: number;
  /** a, the radial reading at that speed [m/s²]. */
  acceleration: number;
}

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
  if (!Array.isArray(rows)) throw new CalcInputError({ param: "rows", value: String(rows), expected: "a list of readings", unit: "" });
  rows.forEach((row, i) => {
    requireNonNegative(`rows[${i}].angularSpeed`, row?.angularSpeed, "rad/s");
    requireFinite(`rows[${i}].acceleration`, row?.acceleration, "m/s²");
  });
  requireDeclared(calibrationFitInputs.confidence, "confidence", confidence);
  requireDeclared(calibrationFitInputs.spikeThreshold, "spikeThreshold", spikeThreshold);
  requireFitOptions(confidence, spikeThreshold, huberTuning);
  const speedSquared = rows.map((r) => r.angularSpeed * r.angularSpeed);
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

/** Inputs of the calibration calculator besides the readings themselves, in SI. */
export const calibrationFitInputs = /* @__PURE__ */ defineInputs({
  spikeThreshold: {
    label: "Spike threshold k",
    kind: "fraction",
    min: 0,
    minOpen: true,
    max: 100,
    default: 3.5,
    unit: { metric: "frac", us: "frac" },
    urlKey: "k",
    help: "A reading is flagged when its residual lies more than k robust standard deviations (1.4826 × MAD) from the median residual.",
  },
  confidence: {
    label: "Confidence level",
    kind: "fraction",
    min: 0.5,
    max: 0.999,
    default: 0.95,
    urlKey: "cl",
    help: "How sure the intervals around the fitted radius and offset should be.",
  },
});

/**
 * Invented calibration readings for the chapter's demo robot (not a real machine and not
 * measured): [reference speed (rpm), radial reading (g)]. Made from a = 12.7 mm · ω² + 0.2 g,
 * rounded to 0.01 g, with scatter of up to ±0.24 g written in by hand and one reading at 2000 rpm
 * made 6 g high, as a knock against the test stand would.
 */
export const DEMO_CALIBRATION_READINGS: readonly (readonly [number, number])[] = [
  [600, 5.37],
  [800, 9.18],
  [1000, 14.54],
  [1200, 20.6],
  [1400, 28.26],
  [1600, 36.39],
  [1800, 46.3],
  [2000, 63.01],
  [2200, 68.7],
  [2400, 82.13],
  [2600, 96.12],
  [2800, 111.73],
];

/**
 * The demo readings in SI (unit conversion only: nist-sp811 rpm, cgpm-1901 standard gravity).
 *
 * Formula: ω = n·2π/60, a = a_[g]·g_n
 *
 * @returns the rows of `DEMO_CALIBRATION_READINGS` [rad/s, m/s²]
 *
 * @example
 * demoCalibrationRows().at(0) // → { angularSpeed: 62.83, acceleration: 52.66 } (the first row, 600 rpm and 5.37 g)
 *
 * Sources: nist-sp811, cgpm-1901.
 */
export function demoCalibrationRows(): CalibrationRow[] {
  return DEMO_CALIBRATION_READINGS.map(([rpm, g]) => ({ angularSpeed: toSI(rpm, "rpm"), acceleration: toSI(g, "gn") }));
}

/** A point of the calibration plot. */
export interface CalibrationCurvePoint {
  /** ω [rad/s]. */
  angularSpeed: number;
  /** Least-squares line at ω [m/s²]. */
  leastSquares: number;
  /** Theil–Sen line at ω [m/s²]. */
  theilSen: number;
  /** The recommended line at ω [m/s²]. */
  recommended: number;
}

/**
 * The fitted calibration curves over a speed range, for a plot over the readings
 * (openstax-college-physics, a = r ω² + b).
 *
 * Formula: $a(\omega) = \hat r\,\omega^2 + \hat b$ for each fit
 *
 * @param fit the result of `fitCalibration`
 * @param lowSpeed ω_lo [rad/s], 0 or more
 * @param highSpeed ω_hi [rad/s], greater than ω_lo
 * @param points number of speeds [-], whole, 2 to 2001 (default 61)
 * @returns one point per speed [rad/s, m/s²]
 *
 * @example
 * const fit = fitCalibration([600, 1200, 1800, 2400].map((rpm) => ({ angularSpeed: rpmToRadPerSecond(rpm), acceleration: 0.0127 * rpmToRadPerSecond(rpm) ** 2 })));
 * calibrationCurve({ fit, lowSpeed: 0, highSpeed: rpmToRadPerSecond(2000), points: 2 }).at(-1) // → { angularSpeed: 209.44, leastSquares: 557.1, recommended: 557.1, … } (r = 12.7 mm, b = 0 at 2000 rpm)
 *
 * Sources: openstax-college-physics.
 */
export function calibrationCurve(input: { fit: CalibrationFit; lowSpeed: number; highSpeed: number; points?: number }): CalibrationCurvePoint[] {
  const { fit, lowSpeed, highSpeed, points = 61 } = requireInputObject(input);
  requireInputObject(fit, "fit");
  requireNonNegative("lowSpeed", lowSpeed, "rad/s");
  requireFinite("highSpeed", highSpeed, "rad/s");
  requireRelation("highSpeed", highSpeed, "greater", lowSpeed, { kind: "angularSpeed", unit: "rad/s", other: "lowSpeed" });
  requireInRange("points", points, "", { min: 2, max: 2001 });
  if (!Number.isInteger(points)) throw new CalcInputError({ param: "points", value: points, expected: "a whole number", unit: "" });
  const out: CalibrationCurvePoint[] = [];
  for (let i = 0; i < points; i++) {
    // Evenly spaced speeds, and a = r·ω² + b on each line (openstax-college-physics).
    const w = i === points - 1 ? highSpeed : lowSpeed + ((highSpeed - lowSpeed) * i) / (points - 1);
    const x = w * w;
    out.push({
      angularSpeed: w,
      leastSquares: fit.leastSquares.slope * x + fit.leastSquares.intercept,
      theilSen: fit.theilSen.slope * x + fit.theilSen.intercept,
      recommended: fit.radius * x + fit.bias,
    });
  }
  return requireFiniteFields(out, "calibration curve", { highSpeed: [highSpeed, "rad/s"] });
}

// ---------------------------------------------------------------------------------------------
