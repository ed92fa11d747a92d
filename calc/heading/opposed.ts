/**
 * Two opposed sensors: why their difference does not care where the centre of mass is, and the
 * calculator that compares one sensor with a pair.
 */
import { requireFinite, requirePositive } from "../core/errors.ts";
import { TURN } from "../core/constants.ts";
import { requireWithinSpecs, requireInputObject, requireFiniteFields } from "../core/spec-check.ts";

// 2. Two opposed sensors.

export interface OpposedSensorEstimate {
  /** False when the corrected reading is 0 or less. */
  defined: boolean;
  /** ω̂ [rad/s], null when not defined. */
  estimate: number | null;
  /** ω̂ − ω [rad/s], null when not defined. */
  driftRate: number | null;
  /** Heading error per revolution [rad], null when not defined. */
  driftPerRevolution: number | null;
}

export interface OpposedSensorsResult {
  /** Sensor 1 alone, dividing by its nominal radius r₁. */
  sensor1: OpposedSensorEstimate;
  /** Sensor 2 alone, dividing by its nominal radius r₂. */
  sensor2: OpposedSensorEstimate;
  /** The pair: (a₁ + a₂)/(r₁ + r₂). */
  pair: OpposedSensorEstimate;
  /** Centre-of-mass offset recovered from the difference a₁ − a₂ with the pair's ω̂ [m], null when not defined. */
  offsetEstimate: number | null;
}

function estimateFrom(reading: number, radius: number, angularSpeed: number): OpposedSensorEstimate {
  if (!(reading > 0)) return { defined: false, estimate: null, driftRate: null, driftPerRevolution: null };
  const estimate = Math.sqrt(reading / radius);
  // ω̂ − ω = (ω̂² − ω²)/(ω̂ + ω)
  const drift = (reading / radius - angularSpeed * angularSpeed) / (estimate + angularSpeed);
  return { defined: true, estimate, driftRate: drift, driftPerRevolution: (TURN * drift) / angularSpeed };
}

/**
 * One sensor vs an opposed pair when the spin centre is not where the firmware thinks
 * (hibbeler-dynamics-2016 §16.7, a_P = a_O + ω × (ω × r) for a rigid body; openstax-college-physics).
 *
 * Formula: with the spin centre moved by e toward sensor 1,
 * $a_1 = \omega^2(r_1 - e) - a_L + \delta_1$, $a_2 = \omega^2(r_2 + e) + a_L + \delta_2$;
 * single: $\hat\omega_1 = \sqrt{a_1/r_1}$; pair: $\hat\omega = \sqrt{\dfrac{a_1 + a_2}{r_1 + r_2}}$,
 * in which e and the common acceleration a_L cancel; $\hat e = \tfrac12\left[(r_1 - r_2) - (a_1 - a_2)/\hat\omega^2\right]$
 *
 * @param angularSpeed ω [rad/s], greater than 0
 * @param radius1 r₁, sensor 1's distance from the nominal centre [m], greater than 0
 * @param radius2 r₂, sensor 2's distance on the other side [m], greater than 0
 * @param offset e, spin-centre offset toward sensor 1 along the line through both [m], finite (signed)
 * @param residualBias1 δ₁, offset left in sensor 1 after correction [m/s²] (default 0)
 * @param residualBias2 δ₂, the same for sensor 2 [m/s²] (default 0)
 * @param linearAcceleration a_L, the body's acceleration along the line, toward sensor 1 [m/s²] (default 0)
 * @returns each estimate with its drift [rad/s] and drift per revolution [rad], and ê [m]
 *
 * Assumptions: both sensing axes point at the nominal centre and lie in the spin plane; steady
 * spin.
 *
 * @example
 * opposedSensorsDrift({ angularSpeed: rpmToRadPerSecond(2000), radius1: 0.012, radius2: 0.012, offset: 0.0005 }) // → { sensor1: { driftRate: −4.410, driftPerRevolution: −0.1323, … }, sensor2: { driftRate: 4.319, … }, pair: { driftRate: 0.000, … }, offsetEstimate: 0.00050 } (sensor 1 alone −7.58° per revolution; the pair 0; ê = 0.5 mm)
 *
 * Sources: hibbeler-dynamics-2016, openstax-college-physics, spinner-heading-practice.
 */
export function opposedSensorsDrift(input: {
  angularSpeed: number;
  radius1: number;
  radius2: number;
  offset: number;
  residualBias1?: number;
  residualBias2?: number;
  linearAcceleration?: number;
}): OpposedSensorsResult {
  const { angularSpeed, radius1, radius2, offset, residualBias1 = 0, residualBias2 = 0, linearAcceleration = 0 } = requireInputObject(input);
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  requirePositive("radius1", radius1, "m");
  requirePositive("radius2", radius2, "m");
  requireFinite("offset", offset, "m");
  requireFinite("residualBias1", residualBias1, "m/s²");
  requireFinite("residualBias2", residualBias2, "m/s²");
  requireFinite("linearAcceleration", linearAcceleration, "m/s²");
  const w2 = angularSpeed * angularSpeed;
  // hibbeler-dynamics-2016: centripetal part ω²·(distance to the true centre), plus the common translation
  const a1 = w2 * (radius1 - offset) - linearAcceleration + residualBias1;
  const a2 = w2 * (radius2 + offset) + linearAcceleration + residualBias2;
  const pair = estimateFrom(a1 + a2, radius1 + radius2, angularSpeed);
  const offsetEstimate = pair.estimate === null ? null : (radius1 - radius2 - (a1 - a2) / (pair.estimate * pair.estimate)) / 2;
  return requireFiniteFields(
    {
      sensor1: estimateFrom(a1, radius1, angularSpeed),
      sensor2: estimateFrom(a2, radius2, angularSpeed),
      pair,
      offsetEstimate,
    },
    "opposed sensors drift",
    {
      angularSpeed: [angularSpeed, "rad/s"],
      radius1: [radius1, "m"],
      radius2: [radius2, "m"],
      offset: [offset, "m"],
      residualBias1: [residualBias1, "m/s²"],
      residualBias2: [residualBias2, "m/s²"],
      linearAcceleration: [linearAcceleration, "m/s²"],
    },
  );
}

export { opposedSensorsInputs, type OpposedSensorsInput } from "./opposed-inputs.ts";
import { opposedSensorsInputs, type OpposedSensorsInput } from "./opposed-inputs.ts";

export interface OpposedSensorsCheck {
  /** The spin centre moved e toward sensor 1 (offset +e). */
  towardSensor1: OpposedSensorsResult;
  /** The spin centre moved e toward sensor 2 (offset −e). */
  towardSensor2: OpposedSensorsResult;
  /** Largest |ω̂₁ − ω| of sensor 1 alone for any offset within ±e [rad/s]; null when it gives no estimate at one end. */
  singleWorstDriftRate: number | null;
  /** The same per true revolution [rad]; null likewise. */
  singleWorstPerRevolution: number | null;
  /** Largest |ω̂ − ω| of the pair within ±e [rad/s] (0 up to round-off). */
  pairWorstDriftRate: number;
}

/**
 * The opposed-sensors comparison at one speed: sensor 1 alone against the pair, with the spin
 * centre anywhere within ±e of where the firmware assumes it (hibbeler-dynamics-2016 §16.7;
 * openstax-college-physics; see `opposedSensorsDrift`).
 *
 * Formula: $\hat\omega_1 - \omega = \omega\left(\sqrt{(r_1 \mp e)/r_1} - 1\right)$ for one sensor;
 * $\hat\omega = \sqrt{\dfrac{a_1 + a_2}{r_1 + r_2}} = \omega$ for the pair, whatever e
 *
 * @param input every field of `opposedSensorsInputs`, SI
 * @returns both ends of the offset range, the worst single-sensor drift [rad/s] and per revolution
 * [rad] (null when sensor 1 gives no estimate at an end, e ≥ r₁), and the pair's worst drift [rad/s]
 *
 * Assumptions: as `opposedSensorsDrift`, with no residual offsets and no common acceleration; one
 * sensor's drift is monotone in e, so the worst case sits at one end of ±e.
 *
 * @example
 * opposedSensorsCheck({ angularSpeed: rpmToRadPerSecond(2000), radius1: 0.012, radius2: 0.012, offset: 0.0005 }) // → { singleWorstDriftRate: 4.410, singleWorstPerRevolution: 0.1323, pairWorstDriftRate: 0.000, … } (one sensor up to 252.7 °/s, 7.58° per revolution; the pair 0)
 *
 * Sources: hibbeler-dynamics-2016, openstax-college-physics, spinner-heading-practice.
 */
export function opposedSensorsCheck(input: OpposedSensorsInput): OpposedSensorsCheck {
  requireWithinSpecs(opposedSensorsInputs, input);
  const common = { angularSpeed: input.angularSpeed, radius1: input.radius1, radius2: input.radius2 };
  const towardSensor1 = opposedSensorsDrift({ ...common, offset: input.offset });
  const towardSensor2 = opposedSensorsDrift({ ...common, offset: -input.offset });
  const a = towardSensor1.sensor1;
  const b = towardSensor2.sensor1;
  const worst = a.driftRate === null || b.driftRate === null ? null : Math.max(Math.abs(a.driftRate), Math.abs(b.driftRate));
  // No finiteness guard: the declared ranges keep every figure below 1e9.
  return {
    towardSensor1,
    towardSensor2,
    singleWorstDriftRate: worst,
    singleWorstPerRevolution: worst === null ? null : (TURN * worst) / input.angularSpeed,
    pairWorstDriftRate: Math.max(Math.abs(towardSensor1.pair.driftRate ?? 0), Math.abs(towardSensor2.pair.driftRate ?? 0)),
  };
}

// ---------------------------------------------------------------------------------------------
