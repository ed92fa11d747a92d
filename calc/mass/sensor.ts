/**
 * How far an accelerometer really sits from the spin axis when the centre of mass is off the
 * geometric centre, and the heading drift per revolution a firmware radius about the geometric
 * centre then causes.
 */
import { CalcInputError } from "../core/errors.ts";

import { requireCoordinate } from "./parts.ts";
import { requireFiniteFields, requireInputObject } from "../core/spec-check.ts";

// ---------------------------------------------------------------------------------------------
// True sensor radius and the heading drift it causes.

export interface TrueSensorRadius {
  /** r, distance from the actual spin axis (the centre of mass) [m]. */
  radiusTrue: number;
  /** r̂, distance from the geometric centre, which the firmware assumes [m]. */
  radiusAssumed: number;
  /** r − r̂ [m]. */
  difference: number;
  /** ω̂/ω = √(r/r̂) [-]. */
  rateRatio: number;
  /** ω̂/ω − 1 [-]. */
  rateError: number;
  /** Heading drift per true revolution, 2π(√(r/r̂) − 1) [rad] (positive: the estimate runs ahead). */
  driftPerRevolution: number;
  /** Angle between the true radial direction and the direction to the geometric centre [rad]. */
  axisMisalignment: number;
  /** The same figures for a single sensing axis aimed at the geometric centre; null when its reading would be 0 or negative. */
  singleAxis: { radialComponent: number; rateRatio: number; driftPerRevolution: number } | null;
}

/**
 * Where a sensor really sits relative to the spin axis, and the heading drift when the firmware
 * assumes the geometric radius (openstax-college-physics, a = ω² r).
 *
 * Formula: $r = |\mathbf p - \bar{\mathbf c}|$, $\hat r = |\mathbf p|$, $a = \omega^2 r$,
 * $\hat\omega = \sqrt{a / \hat r} = \omega\sqrt{r/\hat r}$, drift per revolution $= 2\pi\left(\sqrt{r/\hat r} - 1\right)$
 *
 * @param centreX x̄ [m], centreY ȳ [m] (the centre of mass the body spins about)
 * @param sensorX sensor position x [m], sensorY [m]; not at the geometric centre
 * @returns radii [m], ratios [-], drift [rad per revolution], misalignment [rad], single-axis figures
 *
 * Assumptions: steady spin about the centre of mass; `rateRatio` is for a reading of the whole
 * in-plane acceleration (two axes combined). A single axis aimed at the geometric centre reads only
 * the component ω²(r̂ − c·p̂) and gives `singleAxis`.
 * @example
 * trueSensorRadius({ centreX: 0.002, centreY: 0, sensorX: -0.032, sensorY: 0 }) // → { radiusTrue: 0.034, rateRatio: 1.0308, driftPerRevolution: 0.1934, … } (drift +11.1° per revolution)
 * Sources: openstax-college-physics.
 */
export function trueSensorRadius(input: { centreX: number; centreY: number; sensorX: number; sensorY: number }): TrueSensorRadius {
  const { centreX, centreY, sensorX, sensorY } = requireInputObject(input);
  requireCoordinate("centreX", centreX);
  requireCoordinate("centreY", centreY);
  requireCoordinate("sensorX", sensorX);
  requireCoordinate("sensorY", sensorY);
  const radiusAssumed = Math.hypot(sensorX, sensorY);
  if (!(radiusAssumed > 0)) {
    throw new CalcInputError({
      param: "sensorX",
      value: sensorX,
      expected: "a sensor position away from the geometric centre (radius greater than 0 m)",
      unit: "m",
    });
  }
  const dx = sensorX - centreX;
  const dy = sensorY - centreY;
  const radiusTrue = Math.hypot(dx, dy);
  const rateRatio = Math.sqrt(radiusTrue / radiusAssumed);
  const radialComponent = (sensorX * dx + sensorY * dy) / radiusAssumed;
  const sideways = (sensorX * dy - sensorY * dx) / radiusAssumed;
  const axisMisalignment = radiusTrue > 0 ? Math.atan2(sideways, radialComponent) : 0;
  const singleRatio = radialComponent > 0 ? Math.sqrt(radialComponent / radiusAssumed) : null;
  return requireFiniteFields(
    {
      radiusTrue,
      radiusAssumed,
      difference: radiusTrue - radiusAssumed,
      rateRatio,
      rateError: rateRatio - 1,
      driftPerRevolution: 2 * Math.PI * (rateRatio - 1),
      axisMisalignment,
      singleAxis: singleRatio === null ? null : { radialComponent, rateRatio: singleRatio, driftPerRevolution: 2 * Math.PI * (singleRatio - 1) },
    },
    "rate ratio",
    { sensorX: [sensorX, "m"], sensorY: [sensorY, "m"] },
  );
}
