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
