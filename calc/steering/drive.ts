/**
 * The electrical side of a drive with several motor groups on one battery pack, each group with
 * its own duty: the pack sags under the total current, each controller is an averaged switching
 * stage, and each motor's current is limited in both directions.
 *
 * The spin-up model (calc/drivetrain/) solves the same physics for one group inside its private
 * system class; this file is the shared, exported form for several groups with different duties
 * (the steering model pulses each wheel's motor separately). The two can be unified later.
 *
 * Model (every symbol SI): pack of open-circuit voltage V_oc behind R_p (battery-thevenin-model);
 * group i has m identical motors, each with back-EMF e_i = K_e·ω_m,i (ctms-dc-motor-speed) and
 * winding resistance R_m, fed at duty D_i by an ideal averaged converter, D_i·V_b = e_i + I_i·R_m,
 * drawing m·D_i·I_i from the pack (erickson-power-electronics). When |I_i| would exceed I_lim the
 * controller moves its duty so that I_i = ±I_lim exactly (a duty outside 0…1 cannot be had: the
 * stage then saturates at 0 or 1 and the current is what that duty gives).
 */
import { requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/errors.ts";
import { requireInputObject } from "../core/spec-check.ts";

/** One pack, the motor constants, and the per-motor current limit. */
export interface PackDriveParameters {
  /** V_oc [V]. */
  openCircuitVoltage: number;
  /** R_p, the whole pack [Ω]. */
  packResistance: number;
  /** R_m, one motor's winding [Ω]. */
  motorResistance: number;
  /** K_t = K_e [N·m/A]. */
  torqueConstant: number;
  /** I_lim, per motor [A]. */
  currentLimit: number;
  /** m, motors in each group (they share speed and duty). */
  motorsPerGroup: number;
}

/**
 * Solves the pack and its motor groups at one instant, without allocating: the hot-path form used
 * by the steering simulation (battery-thevenin-model, erickson-power-electronics, ctms-dc-motor-speed).
 *
 * Formula: unlimited groups $I_i = \dfrac{D_iV_b - e_i}{R_m}$; limited $I_i = \pm I_{lim}$, $D_i' = \dfrac{e_i + I_iR_m}{V_b}$;
 * $V_b = V_{oc} - R_p\sum_i m\,D_i' I_i$, which with $A = \sum_u mD_i^2/R_m$, $B = \sum_u mD_ie_i/R_m$,
 * $P = \sum_\ell m\,I_i(e_i + I_iR_m)$ is the larger root of $(1 + R_pA)V_b^2 - (V_{oc} + R_pB)V_b + R_pP = 0$
 *
 * @returns (from `solve`) the battery current [A]; the currents [A] and applied duties [-] go into the arrays given
 * @example
 * new PackSolver({ openCircuitVoltage: 16, packResistance: 0, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 30, motorsPerGroup: 1 }, 1)
 *   .solve(Float64Array.of(0.5), Float64Array.of(600), new Float64Array(1), new Float64Array(1)) // → 10 (I = (8 − 6)/0.1 = 20 A at D = 0.5)
 *
 * Sources: battery-thevenin-model, erickson-power-electronics, ctms-dc-motor-speed.
 */
export class PackSolver {
  readonly groups: number;
  private readonly p: PackDriveParameters;
  private readonly state: Int8Array;
  /** Battery current after `solve` [A]. */
  batteryCurrent = 0;
  /** Battery terminal voltage after `solve` [V]. */
  batteryVoltage = 0;

  /**
   * @param parameters the pack and motors (see `PackDriveParameters`), checked here
   * @param groups number of motor groups, 1 to 16
   */
  constructor(parameters: PackDriveParameters, groups: number) {
    requireInputObject(parameters, "parameters");
    requirePositive("openCircuitVoltage", parameters.openCircuitVoltage, "V");
    requireNonNegative("packResistance", parameters.packResistance, "Ω");
    requirePositive("motorResistance", parameters.motorResistance, "Ω");
    requirePositive("torqueConstant", parameters.torqueConstant, "N·m/A");
    requirePositive("currentLimit", parameters.currentLimit, "A");
    requireInRange("motorsPerGroup", parameters.motorsPerGroup, "", { min: 1, max: 16 });
    requireInRange("groups", groups, "", { min: 1, max: 16 });
    this.p = { ...parameters };
    this.groups = groups;
    this.state = new Int8Array(groups);
    this.batteryVoltage = parameters.openCircuitVoltage;
  }

  /**
   * @param duty D_i commanded, each 0 to 1 [-]
   * @param motorSpeed ω_m,i [rad/s]
   * @param current out: I_i per motor [A]
   * @param appliedDuty out: the duty each controller ends up at [-]
   * @returns the battery current [A] (also in `batteryCurrent`; the voltage in `batteryVoltage`)
   */
  solve(duty: Float64Array, motorSpeed: Float64Array, current: Float64Array, appliedDuty: Float64Array): number {
    const { openCircuitVoltage: voc, packResistance: rp, motorResistance: rm, torqueConstant: kt, currentLimit: ilim, motorsPerGroup: m } = this.p;
    const n = this.groups;
    const st = this.state; // 0 free, ±1 limited at ±I_lim, 2 saturated at its duty (appliedDuty holds it)
    for (let i = 0; i < n; i++) {
      st[i] = 0;
      appliedDuty[i] = duty[i]!;
    }
    let vb = voc;
    for (let pass = 0; pass <= n; pass++) {
      let a = 0;
      let b = 0;
      let pw = 0;
      for (let i = 0; i < n; i++) {
        const e = kt * motorSpeed[i]!; // ctms-dc-motor-speed: e = K_e ω
        if (st[i] === 1 || st[i] === -1) {
          const amps = st[i]! * ilim;
          pw += m * amps * (e + amps * rm);
        } else {
          const d = appliedDuty[i]!;
          a += (m * d * d) / rm;
          b += (m * d * e) / rm;
        }
      }
      if (rp === 0) vb = voc;
      else {
        // battery-thevenin-model with erickson-power-electronics: V_b = V_oc − R_p·Σ m D' I
        const qa = 1 + rp * a;
        const qb = voc + rp * b;
        const disc = qb * qb - 4 * qa * rp * pw;
        vb = (qb + Math.sqrt(Math.max(disc, 0))) / (2 * qa);
      }
      // Stryker disable next-line BooleanLiteral: equivalent, a pass that changes no state repeats identically, so running the rest only costs time
      let changed = false;
      // Stryker disable next-line EqualityOperator: equivalent, st[n] is undefined, so an extra turn skips at the first test
      for (let i = 0; i < n; i++) {
        if (st[i] !== 0) continue;
        const amps = (appliedDuty[i]! * vb - kt * motorSpeed[i]!) / rm;
        if (amps > ilim || amps < -ilim) {
          // Stryker disable next-line EqualityOperator: equivalent, amps is past ±I_lim here, so never 0
          st[i] = amps > 0 ? 1 : -1;
          changed = true;
        }
      }
      // A limited group whose duty would leave 0…1 saturates there instead.
      // Stryker disable next-line EqualityOperator: equivalent, st[n] is undefined, so an extra turn skips at the first test
      for (let i = 0; i < n; i++) {
        if (st[i] !== 1 && st[i] !== -1) continue;
        const d = (kt * motorSpeed[i]! + st[i]! * ilim * rm) / vb;
        if (d > 1 || d < 0) {
          st[i] = 2;
          // Stryker disable next-line EqualityOperator: equivalent, d is above 1 or below 0 here, never exactly 1
          appliedDuty[i] = d > 1 ? 1 : 0;
          changed = true;
        }
      }
      // Stryker disable next-line ConditionalExpression: equivalent, a pass that changes no state repeats identically, so running the rest only costs time
      if (!changed) break;
    }
    let ib = 0;
    for (let i = 0; i < n; i++) {
      const e = kt * motorSpeed[i]!;
      if (st[i] === 1 || st[i] === -1) {
        current[i] = st[i]! * ilim;
        appliedDuty[i] = (e + current[i]! * rm) / vb;
      } else current[i] = (appliedDuty[i]! * vb - e) / rm;
      ib += m * appliedDuty[i]! * current[i]!; // erickson-power-electronics: I_in = D·I_out
    }
    this.batteryCurrent = ib;
    this.batteryVoltage = voc - rp * ib;
    return ib;
  }
}

/**
 * The duty that holds n identical motor groups at a steady speed and current from a sagging pack
 * (battery-thevenin-model, erickson-power-electronics, ctms-dc-motor-speed).
 *
 * Formula: $D\,(V_{oc} - R_p\,n\,m\,D\,I) = K_e\omega_m + I R_m$, the smaller root
 * $D = \dfrac{2c}{V_{oc} + \sqrt{V_{oc}^2 - 4ac}}$, $a = n\,m\,I\,R_p$, $c = K_e\omega_m + IR_m$
 *
 * @param parameters the pack and motors (see `PackDriveParameters`)
 * @param groups n, identical groups running alike, 1 to 16
 * @param motorSpeed ω_m [rad/s], finite
 * @param current I per motor [A], finite
 * @returns D [-]; null when no duty of 0 to 1 gives that speed and current (the pack cannot)
 *
 * @example
 * steadyDuty({ openCircuitVoltage: 12, packResistance: 0, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 50, motorsPerGroup: 1 }, 2, 1000, 2) // → 0.85
 *
 * Sources: battery-thevenin-model, erickson-power-electronics, ctms-dc-motor-speed.
 */
export function steadyDuty(parameters: PackDriveParameters, groups: number, motorSpeed: number, current: number): number | null {
  requireInputObject(parameters, "parameters");
  requireInRange("groups", groups, "", { min: 1, max: 16 });
  requireFinite("motorSpeed", motorSpeed, "rad/s");
  requireFinite("current", current, "A");
  const { openCircuitVoltage: voc, packResistance: rp, motorResistance: rm, torqueConstant: kt, motorsPerGroup: m } = parameters;
  // Checked, not trusted: a missing or non-numeric value would otherwise read as "cannot reach".
  requireFinite("openCircuitVoltage", voc, "V");
  requireFinite("packResistance", rp, "Ω");
  requireFinite("motorResistance", rm, "Ω");
  requireFinite("torqueConstant", kt, "N·m/A");
  requireFinite("motorsPerGroup", m, "");
  const c = kt * motorSpeed + current * rm; // ctms-dc-motor-speed: D·V_b = e + I·R
  const a = groups * m * current * rp; // battery-thevenin-model: V_b = V_oc − R_p·(n m D I)
  const disc = voc * voc - 4 * a * c;
  const d = (2 * c) / (voc + Math.sqrt(disc));
  // No real root (disc < 0) gives NaN, and a zero denominator ±∞: both fail the range test below.
  return d >= 0 && d <= 1 ? d : null;
}
