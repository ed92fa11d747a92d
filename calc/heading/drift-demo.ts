/**
 * The heading-drift chapter's worked example: an invented demo spinner (not a real machine) and the
 * drift a radius mismatch causes.
 */
import { CalcInputError, requirePositive } from "../core/errors.ts";
import { rpmToRadPerSecond, unitDef } from "../core/units.ts";
import { type RadiusBand, type SpinRateErrorModel, assumedRadiusBand, headingDriftAt } from "./drift.ts";
import { requireInputObject, requireList } from "../core/spec-check.ts";

// 3. Worked example for the chapter.

/** One row of the radius-mismatch example, in SI and in the degrees the chapter prints. */
export interface RadiusMismatchRow {
  /** Spin speed [rpm] as given. */
  rpm: number;
  /** ω [rad/s]. */
  angularSpeed: number;
  /** ω̂ − ω [rad/s]. */
  driftRate: number;
  /** The same [°/s]. */
  driftRateDegreesPerSecond: number;
  /** Per revolution [rad]. */
  driftPerRevolution: number;
  /** The same [°]. */
  driftPerRevolutionDegrees: number;
}

export interface RadiusMismatchExample {
  assumedRadius: number;
  trueRadius: number;
  /** ω̂/ω = √(r/r̂) [-]. */
  speedRatio: number;
  rows: RadiusMismatchRow[];
  /** Assumed-radius band that would keep |drift| ≤ budget at the highest speed given. */
  bandAtTopSpeed: RadiusBand;
  /** Half the band's width as a fraction of the true radius, (high − low)/(2r) [-]; null when the band is open or undefined. */
  bandHalfWidthFraction: number | null;
  /** The budget used for the band [rad/s]. */
  budget: number;
}

/**
 * Drift from a radius mismatch alone at a few speeds, with degree figures for the text
 * (spinner-heading-practice, openstax-college-physics).
 *
 * Formula: $\hat\omega/\omega = \sqrt{r/\hat r}$, drift $= \omega(\sqrt{r/\hat r} - 1)$, per revolution $360°(\sqrt{r/\hat r} - 1)$
 *
 * @param assumedRadius r̂ [m], greater than 0
 * @param trueRadius r [m], greater than 0
 * @param speedsRpm speeds [rpm], each greater than 0, at least one
 * @param budget D for the radius band at the top speed [rad/s], greater than 0 (default 10 °/s)
 * @returns rows [rad/s, °/s, rad, °], the band [m] and its half-width as a fraction of r [-]
 *
 * @example
 * radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [1200, 2800] }) // → { speedRatio: 1.028753, bandHalfWidthFraction: 0.00119, … } (the demo spinner, see `demoSpinnerRadiusExample`)
 *
 * Sources: spinner-heading-practice, openstax-college-physics.
 */
export function radiusMismatchExample(input: {
  assumedRadius: number;
  trueRadius: number;
  speedsRpm: readonly number[];
  budget?: number;
}): RadiusMismatchExample {
  const { assumedRadius, trueRadius, speedsRpm, budget = (10 * Math.PI) / 180 } = requireInputObject(input);
  if (requireList(speedsRpm, "speedsRpm").length === 0) throw new CalcInputError({ param: "speedsRpm", value: 0, expected: "at least one speed", unit: "" });
  const model: SpinRateErrorModel = { assumedRadius, trueRadius, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 };
  const rows = speedsRpm.map((rpm, i) => {
    requirePositive(`speedsRpm[${i}]`, rpm, "rpm");
    const point = headingDriftAt({ ...model, angularSpeed: rpmToRadPerSecond(rpm) });
    // With no offset the reading is ω²r, 0 only where ω² underflows (below about 1e−161 rpm): no estimate, no drift.
    if (!point.defined)
      throw new CalcInputError({ param: `speedsRpm[${i}]`, value: rpm, expected: "large enough for the centripetal reading to be above 0", unit: "rpm" });
    const driftRate = point.driftRate!;
    const driftPerRevolution = point.driftPerRevolution!;
    // Both drifts in degrees are finite without a guard: with no offset headingDriftAt returns only a finite ω², r/r̂ and
    // ω̂², so both drifts stay below about 1e155.
    return {
      rpm,
      angularSpeed: point.angularSpeed,
      driftRate,
      driftRateDegreesPerSecond: driftRate / unitDef("deg/s").factor,
      driftPerRevolution,
      driftPerRevolutionDegrees: driftPerRevolution / unitDef("deg").factor,
    };
  });
  const top = Math.max(...speedsRpm);
  const band = assumedRadiusBand({ ...model, angularSpeed: rpmToRadPerSecond(top), budget });
  return {
    assumedRadius,
    trueRadius,
    speedRatio: Math.sqrt(trueRadius / assumedRadius),
    rows,
    bandAtTopSpeed: band,
    // Half-width of the band relative to r: (r̂_high − r̂_low) / 2 / r (spinner-heading-practice). A band with a
    // high end has a low end too (only "no-estimate" leaves the low end out, and it leaves out both).
    bandHalfWidthFraction: band.high === null ? null : (band.high - band.low!) / 2 / trueRadius,
    budget,
  };
}

/**
 * An invented demo robot for the chapter (not a real machine): its firmware assumes the sensor
 * sits 12.0 mm from the spin axis, but the real centre of mass puts it at 12.7 mm.
 */
export const DEMO_HEADING_SPINNER = {
  assumedRadius: 0.012,
  trueRadius: 0.0127,
  speedsRpm: [1200, 2800],
} as const;

/**
 * The chapter's worked example: the invented demo spinner's drift at 1200 and 2800 rpm
 * (spinner-heading-practice, openstax-college-physics).
 *
 * Formula: $\hat\omega/\omega = \sqrt{12.7/12.0} = 1.028753$; drift per revolution 10.35°
 *
 * @returns see `radiusMismatchExample`
 *
 * @example
 * demoSpinnerRadiusExample().rows.at(0) // → { rpm: 1200, driftRate: 3.613, driftRateDegreesPerSecond: 207.0, driftPerRevolutionDegrees: 10.35, … }
 * demoSpinnerRadiusExample().rows.at(1) // → { rpm: 2800, driftRate: 8.431, driftRateDegreesPerSecond: 483.1, driftPerRevolutionDegrees: 10.35, … }
 * demoSpinnerRadiusExample().bandAtTopSpeed // → { low: 0.0126849, high: 0.0127151, … } [m] (within 10 °/s at 2800 rpm)
 * demoSpinnerRadiusExample().bandHalfWidthFraction // → 0.0012 (about ±0.12 % of the true radius)
 *
 * Sources: spinner-heading-practice, openstax-college-physics.
 */
export function demoSpinnerRadiusExample(): RadiusMismatchExample {
  return radiusMismatchExample({ ...DEMO_HEADING_SPINNER });
}
