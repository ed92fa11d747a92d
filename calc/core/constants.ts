/**
 * Physical constants, each with its definition and source key (see sources.ts).
 */

/**
 * Standard acceleration of gravity g_n [m/s²], exact by definition.
 * Source: cgpm-1901 (3rd CGPM declaration, Comptes Rendus p. 70); repeated in nist-sp811.
 */
export const STANDARD_GRAVITY = 9.80665;

/** Full turn [rad]. */
export const TURN = 2 * Math.PI;

/** 1 in = 0.0254 m exactly [m] (nist-sp811; the international yard and pound of 1959, intl-yard-pound-1959). */
export const INCH = 0.0254;
/** 1 ft = 0.3048 m exactly [m] (nist-sp811). */
export const FOOT = 0.3048;
/** 1 lb = 0.453 592 37 kg exactly [kg] (nist-sp811). */
export const POUND = 0.45359237;
/** 1 lbf = 1 lb × standard gravity = 4.448 221 615 260 5 N exactly [N] (nist-sp811). */
export const POUND_FORCE = POUND * STANDARD_GRAVITY;
/** 1 rpm = 2π/60 rad/s exactly [rad/s] (1 rev = 2π rad). */
export const RAD_PER_S_PER_RPM = TURN / 60;
