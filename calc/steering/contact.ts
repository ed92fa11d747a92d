/**
 * Wheel–floor and skid–floor forces of the steering model.
 *
 * A driven wheel: Pacejka's isotropic brush model with combined slip (pacejka-tyre-dynamics ch. 3).
 * The slip velocity V_s (the velocity of the tyre material at the contact, relative to the floor)
 * divided by the rolling speed V_r gives the theoretical slip σ = −V_s/V_r (ch. 2); the force
 * points along σ (opposite the slip velocity) with magnitude
 * F = μF_z·(3θσ − 3(θσ)² + (θσ)³) for θσ < 1 and μF_z beyond (full sliding), θ = C/(3μF_z),
 * where C is the slip stiffness (force per unit slip at small slip). The force can never leave the
 * friction circle |F| ≤ μF_z (circle-of-forces; Pacejka) and always opposes the slip, so slip only
 * dissipates. Longitudinal and lateral slip share the one curve: the wheel both spins the robot and
 * pushes it sideways. Turn slip (the contact patch turning at Ω) is neglected: the patch is small
 * next to R.
 *
 * At very low rolling speed σ is undefined; V_r is replaced by √(V_r² + v_ε²) with v_ε = 0.05 m/s,
 * which turns the model smoothly into a regularised Coulomb friction there (a spinning robot's
 * wheels roll at metres per second, far above v_ε).
 *
 * A skid: Coulomb sliding friction μF_N opposite its sliding velocity (serway-beichner-5e),
 * regularised as μF_N·V/√(V² + v_ε²) (the square-root regularisation of the Coulomb jump).
 */
import { CalcInputError, requireFinite, requireNonNegative } from "../core/errors.ts";
import { requireInputObject } from "../core/spec-check.ts";

/** Regularisation speed v_ε [m/s] (see the module comment). */
export const LOW_SPEED = 0.05;

/**
 * Brush-model force on a wheel for a slip velocity, written into `out` (pacejka-tyre-dynamics, isotropic brush, combined slip):
 * the allocation-free form used inside the simulation. Returns |F|/(μF_z), the share of grip in use (1 when sliding).
 *
 * Formula: $\sigma = \dfrac{|V_s|}{\sqrt{V_r^2 + v_\varepsilon^2}}$, $u = \dfrac{C\sigma}{3\mu F_z}$, $F = \mu F_z\,(3u - 3u^2 + u^3)$ for u < 1, else μF_z; $\vec F = -F\,\vec V_s/|V_s|$
 *
 * @param slipX, slipY V_s components [m/s]; rollingSpeed V_r [m/s]; load F_z [N]; mu μ [-]; stiffness C [N per unit slip]; out: [F_x, F_y] [N]
 *
 * Unchecked, for the simulation's inner loop; callers outside it use `brushTyreForce`. @internal
 */
export function brushForceInto(slipX: number, slipY: number, rollingSpeed: number, load: number, mu: number, stiffness: number, out: Float64Array): number {
  const vs = Math.sqrt(slipX * slipX + slipY * slipY);
  const limit = mu * load;
  if (vs === 0 || limit <= 0) {
    out[0] = 0;
    out[1] = 0;
    return 0;
  }
  const sigma = vs / Math.sqrt(rollingSpeed * rollingSpeed + LOW_SPEED * LOW_SPEED); // pacejka-tyre-dynamics: σ = |V_s|/V_r
  const u = (stiffness * sigma) / (3 * limit); // pacejka-tyre-dynamics: θσ with θ = C/(3μF_z)
  const v = Math.min(u, 1); // full sliding from θσ = 1, where the cubic reaches 1·(3 − 3 + 1) = 1
  const share = v * (3 - 3 * v + v * v); // pacejka-tyre-dynamics: 3θσ − 3(θσ)² + (θσ)³
  const scale = (-limit * share) / vs;
  out[0] = scale * slipX;
  out[1] = scale * slipY;
  return share;
}

/**
 * Force of a wheel on the floor by Pacejka's isotropic brush model with combined slip
 * (pacejka-tyre-dynamics ch. 2–3): see the module comment.
 *
 * Formula: $\vec F = -\mu F_z\,f(u)\,\dfrac{\vec V_s}{|V_s|}$, $f(u) = 3u - 3u^2 + u^3$ (u < 1) or 1, $u = \dfrac{C}{3\mu F_z}\dfrac{|V_s|}{\sqrt{V_r^2 + v_\varepsilon^2}}$
 *
 * @param slipVelocityX, slipVelocityY V_s, velocity of the tyre at the contact relative to the floor [m/s], finite
 * @param rollingSpeed V_r, the wheel's rim speed ω·r_w [m/s], finite
 * @param normalLoad F_z [N], 0 or more
 * @param frictionCoefficient μ [-], 0 or more
 * @param slipStiffness C, force per unit slip at small slip [N], 0 or more
 * @returns the force on the wheel [N] (x, y), its magnitude [N], and the share of grip in use [-] (1 = sliding)
 *
 * Assumptions: the same stiffness and friction in every direction (isotropic brush); no turn slip;
 * steady state (no relaxation length). @example
 * brushTyreForce({ slipVelocityX: 0.3, slipVelocityY: 0.4, rollingSpeed: 0, normalLoad: 33.34261, frictionCoefficient: 0.9, slipStiffness: 300 }).forceX // → −18.005 (full sliding)
 *
 * Sources: pacejka-tyre-dynamics.
 */
export function brushTyreForce(input: {
  slipVelocityX: number;
  slipVelocityY: number;
  rollingSpeed: number;
  normalLoad: number;
  frictionCoefficient: number;
  slipStiffness: number;
}): { forceX: number; forceY: number; force: number; gripShare: number } {
  const { slipVelocityX, slipVelocityY, rollingSpeed, normalLoad, frictionCoefficient, slipStiffness } = requireInputObject(input);
  requireFinite("slipVelocityX", slipVelocityX, "m/s");
  requireFinite("slipVelocityY", slipVelocityY, "m/s");
  requireFinite("rollingSpeed", rollingSpeed, "m/s");
  requireNonNegative("normalLoad", normalLoad, "N");
  requireNonNegative("frictionCoefficient", frictionCoefficient, "");
  requireNonNegative("slipStiffness", slipStiffness, "N");
  const limit = normalLoad * frictionCoefficient;
  if (!Number.isFinite(limit))
    throw new CalcInputError({ param: "normalLoad", value: normalLoad, expected: "small enough that μ·F_z is a finite number", unit: "N" });
  const vs = Math.hypot(slipVelocityX, slipVelocityY);
  if (vs === 0 || limit === 0) return { forceX: 0, forceY: 0, force: 0, gripShare: 0 };
  const sigma = vs / Math.hypot(rollingSpeed, LOW_SPEED); // pacejka-tyre-dynamics: σ = |V_s|/V_r (may be Infinity: full sliding)
  const product = (slipStiffness / (3 * limit)) * sigma; // θσ, θ = C/(3μF_z)
  const u = Number.isNaN(product) ? 0 : product; // 0·∞ only when C/(3μF_z) underflows: no grip built up
  const v = Math.min(u, 1); // full sliding from θσ = 1, where the cubic reaches 1·(3 − 3 + 1) = 1
  const gripShare = v * (3 - 3 * v + v * v); // pacejka-tyre-dynamics: 3θσ − 3(θσ)² + (θσ)³
  const force = limit * gripShare;
  return { forceX: -force * (slipVelocityX / vs), forceY: -force * (slipVelocityY / vs), force, gripShare };
}

/**
 * Regularised Coulomb friction of a skid sliding at velocity V (serway-beichner-5e, f_k = μ_k·n;
 * the square-root regularisation), written into `out`; returns the power it dissipates [W].
 *
 * Formula: $\vec F = -\mu N\,\dfrac{\vec V}{\sqrt{|V|^2 + v_\varepsilon^2}}$
 *
 * @param vx, vy V [m/s]; load N [N]; mu μ [-]; out: [F_x, F_y] [N]
 *
 * Unchecked, for the simulation's inner loop (not part of the public API). @internal
 */
export function skidForceInto(vx: number, vy: number, load: number, mu: number, out: Float64Array): number {
  const scale = (-mu * load) / Math.sqrt(vx * vx + vy * vy + LOW_SPEED * LOW_SPEED); // serway-beichner-5e: f_k = μ_k n, regularised
  out[0] = scale * vx;
  out[1] = scale * vy;
  return -(out[0] * vx + out[1] * vy);
}
