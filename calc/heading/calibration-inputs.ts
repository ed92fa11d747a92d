/**
 * The calibration calculator's inputs besides the readings, the chapter's invented demo readings,
 * and the fitted curve for a plot: what the calibration page needs before anything is edited,
 * apart from the fit itself (calc/heading/calibration.ts), so that a page can hold these without
 * the fitting code. SI in and out.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requireRelation } from "../core/errors.ts";
import { defineInputs } from "../core/inputs.ts";
import { toSI } from "../core/units.ts";
import { requireFiniteFields, requireInputObject } from "../core/spec-check.ts";

/** One calibration reading: a reference spin rate and the radial acceleration read at it. */
export interface CalibrationRow {
  /** ω, from a tachometer or a timed video [rad/s], 0 or more. */
  angularSpeed: number;
  /** a, the radial reading at that speed [m/s²]. */
  acceleration: number;
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

/** The lines a calibration fit gives (a `CalibrationFit` of calibration.ts is one): what `calibrationCurve` plots. */
export interface CurveLines {
  leastSquares: { slope: number; intercept: number };
  theilSen: { slope: number; intercept: number };
  /** The recommended line's slope [m] and intercept [m/s²]. */
  radius: number;
  bias: number;
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
export function calibrationCurve(input: { fit: CurveLines; lowSpeed: number; highSpeed: number; points?: number }): CalibrationCurvePoint[] {
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
