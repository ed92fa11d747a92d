/**
 * Centrifugal loads: what survives the spin. The pull a spinning part puts on the bolts that hold
 * it, the stress in those bolts against their property class, and the hoop and radial stresses in
 * a spinning ring or disk against its material, each with a safety factor, the speeds at which
 * yield and ultimate strength are reached, and a verdict. SI in and out: kg, m, rad/s, N, Pa, m/s.
 */
import { CalcInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "./errors.ts";
import { defineInputs, type InputSpecs } from "./inputs.ts";
import { partLoad, type PartLoad } from "./rotation.ts";
import { rpmToRadPerSecond, type QuantityKind } from "./units.ts";
import {
  metricThread,
  propertyClass as propertyClassRow,
  PROPERTY_CLASS_OPTIONS,
  requireChoice,
  THREAD_SIZE_OPTIONS,
  type ChoiceOption,
  type PropertyClassId,
  type ThreadSize,
} from "./fasteners.ts";
import { MATERIAL_IDS, MATERIALS, type MaterialId } from "./materials.ts";
import type { SourceKey } from "./sources.ts";

// ---------------------------------------------------------------------------------------------
// Safety factor, verdict and limit speed (shared by the bolt and the rim checks).

/** How a checked part stands: below `failBelow` it fails, below `marginalBelow` the margin is thin. */
export type LoadVerdict = "holds" | "marginal" | "fails";

/** Default verdict thresholds on the safety factor [-] (safety-factor-practice). */
export const DEFAULT_SAFETY_THRESHOLDS = { failBelow: 1, marginalBelow: 2 } as const;

/**
 * Safety factor of a stressed part: how many times the working stress fits into the strength
 * (safety-factor-practice).
 *
 * Formula: $n = \dfrac{S}{\sigma}$
 *
 * @param strength S, the strength compared with [Pa], greater than 0
 * @param stress σ, the working stress [Pa], greater than 0
 * @returns n [-]
 *
 * Example: 400 MPa against 20.1 MPa → 19.9. Sources: safety-factor-practice.
 */
export function safetyFactor({ strength, stress }: { strength: number; stress: number }): number {
  requirePositive("strength", strength, "Pa");
  requirePositive("stress", stress, "Pa");
  return strength / stress; // safety-factor-practice
}

/**
 * Verdict for a safety factor against two thresholds (safety-factor-practice).
 *
 * Formula: fails when $n < n_{fail}$, marginal when $n_{fail} \le n < n_{thin}$, holds otherwise
 *
 * @param safetyFactor n [-], greater than 0
 * @param failBelow n_fail [-], greater than 0 (default 1: the stress reaches the strength)
 * @param marginalBelow n_thin [-], at least n_fail (default 2, a common margin when loads are rough estimates)
 * @returns "fails", "marginal" or "holds"
 *
 * Example: n = 1.6 with the defaults → "marginal". Sources: safety-factor-practice.
 */
export function safetyVerdict({
  safetyFactor: n,
  failBelow = DEFAULT_SAFETY_THRESHOLDS.failBelow,
  marginalBelow = DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
}: {
  safetyFactor: number;
  failBelow?: number;
  marginalBelow?: number;
}): LoadVerdict {
  requirePositive("safetyFactor", n, "");
  requirePositive("failBelow", failBelow, "");
  requireMarginalAtLeastFail(failBelow, marginalBelow);
  return n < failBelow ? "fails" : n < marginalBelow ? "marginal" : "holds";
}

function requireMarginalAtLeastFail(failBelow: number, marginalBelow: number): void {
  requirePositive("marginalBelow", marginalBelow, "");
  if (!(marginalBelow >= failBelow)) {
    throw new CalcInputError({ param: "marginalBelow", value: marginalBelow, expected: `at least failBelow, ${failBelow}`, unit: "" });
  }
}

/**
 * Speed at which a stress that grows with the square of the speed reaches a limit: every
 * centrifugal stress here is proportional to ω² (newton-second-law: F = mω²r).
 *
 * Formula: $\omega_{lim} = \omega\,\sqrt{S / \sigma}$
 *
 * @param angularSpeed ω, the speed at which `stress` was found [rad/s], greater than 0
 * @param stress σ at ω [Pa], greater than 0
 * @param strength S, the limit [Pa], greater than 0
 * @returns ω_lim [rad/s]
 *
 * Example: σ = 2.665 MPa at 2400 rpm against 310 MPa → 25 900 rpm. Sources: newton-second-law.
 */
export function speedAtStress({ angularSpeed, stress, strength }: { angularSpeed: number; stress: number; strength: number }): number {
  requirePositive("angularSpeed", angularSpeed, "rad/s");
  return angularSpeed * Math.sqrt(safetyFactor({ strength, stress })); // σ ∝ ω², newton-second-law
}

// ---------------------------------------------------------------------------------------------
// Input validation against a declaration.

const SI_UNIT: Partial<Record<QuantityKind, string>> = {
  mass: "kg",
  length: "m",
  angularSpeed: "rad/s",
  stress: "Pa",
  density: "kg/m³",
  fraction: "",
  count: "",
};

/** Throws a `CalcInputError` naming `name` unless `value` lies in the declared range of `specs[name]`. */
function requireDeclared<T extends InputSpecs>(specs: T, name: keyof T & string, value: number): number {
  const spec = specs[name]!;
  const unit = SI_UNIT[spec.kind] ?? "";
  requireFinite(name, value, unit);
  const lowOk = spec.minOpen ? value > spec.min : value >= spec.min;
  if (!lowOk || !(value <= spec.max) || (spec.integer === true && !Number.isInteger(value))) {
    const shown = (bound: number) => `${Number(bound.toPrecision(6))}${unit ? ` ${unit}` : ""}`;
    const low = `${spec.minOpen ? "greater than" : "at least"} ${shown(spec.min)}`;
    const expected = `${spec.integer ? "a whole number " : ""}${low} and at most ${shown(spec.max)}`;
    throw new CalcInputError({ param: name, value, expected, unit });
  }
  return value;
}

// ---------------------------------------------------------------------------------------------
// Bolts holding a spinning part.

/** How the radial pull meets the bolts. */
export const LOADING_MODE_OPTIONS = [
  { value: "shear", label: "Shear: the pull runs across the bolts" },
  { value: "tension", label: "Tension: the pull runs along the bolts" },
] as const satisfies readonly ChoiceOption[];

export type LoadingMode = (typeof LOADING_MODE_OPTIONS)[number]["value"];

/** Where the shear plane cuts the bolt (only read in shear). */
export const SHEAR_PLANE_OPTIONS = [
  { value: "thread", label: "Through the thread (stress area A_s)" },
  { value: "shank", label: "Through the plain shank (nominal diameter)" },
] as const satisfies readonly ChoiceOption[];

export type ShearPlane = (typeof SHEAR_PLANE_OPTIONS)[number]["value"];

/**
 * Shear-to-tensile ratio used by default for the ultimate shear strength of a bolt: τ_u = 0.5 R_m
 * (shear-ultimate-ratio). ISO 898-1 specifies no shear strength; 0.5 is the lower Eurocode 3
 * thread-shear factor α_v (0.5 for 10.9, 0.6 for 4.6 and 8.8, en-1993-1-8 Table 3.4, class split
 * from memory) and the low end of the 0.5–0.75 spread of handbook rules, so it is conservative for
 * every class here. Status: a rule of practice, not a material constant; the check takes it as an input.
 */
export const DEFAULT_SHEAR_RATIO = 0.5;

/** Choice defaults of the fastener check (the numeric defaults are in `fastenerCheckInputs`). */
export const FASTENER_CHOICE_DEFAULTS = { size: "M4", propertyClass: "8.8", mode: "shear", shearPlane: "thread" } as const satisfies {
  size: ThreadSize;
  propertyClass: PropertyClassId;
  mode: LoadingMode;
  shearPlane: ShearPlane;
};

/** Numeric inputs of the fastener check, in SI. Choices: `THREAD_SIZE_OPTIONS`, `PROPERTY_CLASS_OPTIONS`, `LOADING_MODE_OPTIONS`, `SHEAR_PLANE_OPTIONS`. */
export const fastenerCheckInputs = defineInputs({
  partMass: {
    label: "Part mass",
    kind: "mass",
    min: 1e-4,
    max: 20,
    default: 0.04,
    urlKey: "m",
    help: "Everything the bolts hold up against the spin: the part, its washers, and the bolts' own heads if you want them counted.",
  },
  radius: {
    label: "Radius of the part",
    kind: "length",
    min: 0.001,
    max: 2,
    default: 0.07,
    urlKey: "r",
    help: "From the spin axis to the part's own centre of mass.",
  },
  angularSpeed: {
    label: "Speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(1),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The top speed the part will see.",
  },
  count: {
    label: "Number of bolts",
    kind: "count",
    min: 1,
    max: 64,
    default: 1,
    integer: true,
    urlKey: "n",
    help: "Bolts sharing the pull, assumed to share it equally.",
  },
  shearRatio: {
    label: "Shear-to-tensile ratio",
    kind: "fraction",
    min: 0.3,
    max: 1,
    default: DEFAULT_SHEAR_RATIO,
    unit: { metric: "frac", us: "frac" },
    urlKey: "sr",
    help: "Ultimate shear strength as a fraction of R_m. 0.5 is conservative; 0.6 is the common rule and Eurocode 3's value for 4.6 and 8.8.",
  },
  failBelow: {
    label: "Fails below",
    kind: "fraction",
    min: 1,
    max: 10,
    default: DEFAULT_SAFETY_THRESHOLDS.failBelow,
    unit: { metric: "frac", us: "frac" },
    urlKey: "fail",
    help: "Safety factor under which the bolt is called a failure.",
  },
  marginalBelow: {
    label: "Thin below",
    kind: "fraction",
    min: 1,
    max: 20,
    default: DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
    unit: { metric: "frac", us: "frac" },
    urlKey: "thin",
    help: "Safety factor under which the margin is flagged as thin.",
  },
});

export type FastenerCheckInput = { [K in keyof typeof fastenerCheckInputs]: number } & {
  /** A value of `THREAD_SIZE_OPTIONS`. */
  size: string;
  /** A value of `PROPERTY_CLASS_OPTIONS`. */
  propertyClass: string;
  /** A value of `LOADING_MODE_OPTIONS`. */
  mode: string;
  /** A value of `SHEAR_PLANE_OPTIONS`; read only in shear; "thread" when omitted. */
  shearPlane?: string;
};

export interface FastenerCheck {
  size: ThreadSize;
  propertyClass: PropertyClassId;
  mode: LoadingMode;
  shearPlane: ShearPlane;
  /** g at the part's radius and its total radial pull. */
  part: PartLoad;
  /** The pull on each bolt, total / count [N]. */
  forcePerBolt: number;
  /** Area the stress is taken on: A_s, or the shank area in shear through the shank [m²]. */
  area: number;
  /** Average tensile stress σ or shear stress τ on that area [Pa]. */
  stress: number;
  /** Yield the stress is compared with: R_eL/R_p0.2 (min) in tension, that ÷ √3 in shear [Pa]. */
  yieldStrength: number;
  /** Ultimate the stress is compared with: R_m,min in tension, shearRatio × R_m,min in shear [Pa]. */
  ultimateStrength: number;
  /** The shear-to-tensile ratio used (reported in tension too, though unused there) [-]. */
  shearRatio: number;
  /** yieldStrength / stress [-]. */
  safetyFactorYield: number;
  /** ultimateStrength / stress [-]. */
  safetyFactorUltimate: number;
  /** The smaller of the two [-]. */
  safetyFactor: number;
  /** Which limit gives `safetyFactor`. */
  governs: "yield" | "ultimate";
  /** Speed at which the bolts reach their yield strength [rad/s]. */
  speedAtYield: number;
  /** Speed at which the bolts reach their ultimate strength [rad/s]. */
  speedAtUltimate: number;
  /** Pull all bolts together carry at their ultimate strength [N]. */
  ultimateLoad: number;
  verdict: LoadVerdict;
}

/**
 * Average stress in a group of bolts sharing a load equally (iso-898-1: stresses of a threaded
 * bolt are taken on its stress area A_s).
 *
 * Formula: $\sigma = \dfrac{F}{n\,A}$
 *
 * @param force F, the total load [N], 0 or more
 * @param count n, bolts sharing it [-], a whole number, 1 or more
 * @param area A, each bolt's load-bearing area [m²], greater than 0
 * @returns σ (or τ in shear) [Pa]
 *
 * Example: 176.9 N on one M4 (8.78 mm²) → 20.1 MPa. Sources: iso-898-1.
 */
export function boltStress({ force, count, area }: { force: number; count: number; area: number }): number {
  requireNonNegative("force", force, "N");
  requireInRange("count", count, "", { min: 1, max: Number.MAX_SAFE_INTEGER });
  if (!Number.isInteger(count)) throw new CalcInputError({ param: "count", value: count, expected: "a whole number", unit: "" });
  requirePositive("area", area, "m²");
  return force / (count * area);
}

/**
 * The fastener check: the pull of a spinning part shared by its bolts, the stress on each bolt's
 * tensile stress area, and the safety factors against the property class's minimum strengths
 * (newton-second-law, iso-898-1, shigley-distortion-energy, shear-ultimate-ratio).
 *
 * Formula: $F = m\,\omega^2 r,\quad \sigma = \dfrac{F}{n\,A_s},\quad n_y = \dfrac{R_{p0.2,min}}{\sigma},\ n_u = \dfrac{R_{m,min}}{\sigma}$ in tension;
 * $\tau = \dfrac{F}{n\,A_s},\quad n_y = \dfrac{R_{p0.2,min}/\sqrt3}{\tau},\ n_u = \dfrac{k\,R_{m,min}}{\tau}$ in shear
 *
 * @param input the numeric fields of `fastenerCheckInputs` (SI) plus `size`, `propertyClass`, `mode` and optionally `shearPlane`
 * @returns the part's load, the stress per bolt, both safety factors, the limit speeds and a verdict
 *
 * Assumptions:
 * - The bolts share the pull equally; no prying, no bending (a stack of washers standing proud of
 *   the joint bends the bolt and raises its stress), no clamp friction (friction from the preload
 *   carries part of a shear load, so ignoring it is conservative).
 * - Shear is taken through the thread on A_s by default: the smaller area, so conservative when
 *   the shank may or may not reach the joint face.
 * - Strengths are the ISO 898-1 minimums (R_eL/R_p0.2 min, R_m,min), the values every bolt of
 *   the class is guaranteed to reach; the nominal values are in `PROPERTY_CLASSES` for comparison.
 * - Shear yield by the distortion-energy (von Mises) criterion, τ_y = R_p0.2/√3; ultimate shear as
 *   `shearRatio` × R_m (ISO 898-1 specifies no shear strength; see `DEFAULT_SHEAR_RATIO`).
 * - Steady spin only: impacts, fatigue and the threads of a nut or tapped hole are not checked.
 *
 * Example (invented): 40 g of washers on one M4 class 8.8 bolt, shear, at 70 mm and 2400 rpm:
 * 451 g, 176.9 N, τ = 20.1 MPa; n_y = 18.3 (yield governs), n_u = 19.9 → "holds".
 *
 * Sources: newton-second-law, iso-898-1, shigley-distortion-energy, shear-ultimate-ratio,
 * en-1993-1-8, safety-factor-practice.
 */
export function fastenerCheck(input: FastenerCheckInput): FastenerCheck {
  const size = requireChoice("size", input.size, THREAD_SIZE_OPTIONS);
  const classId = requireChoice("propertyClass", input.propertyClass, PROPERTY_CLASS_OPTIONS);
  const mode = requireChoice("mode", input.mode, LOADING_MODE_OPTIONS);
  const shearPlane = requireChoice("shearPlane", input.shearPlane ?? FASTENER_CHOICE_DEFAULTS.shearPlane, SHEAR_PLANE_OPTIONS);
  const partMass = requireDeclared(fastenerCheckInputs, "partMass", input.partMass);
  const radius = requireDeclared(fastenerCheckInputs, "radius", input.radius);
  const angularSpeed = requireDeclared(fastenerCheckInputs, "angularSpeed", input.angularSpeed);
  const count = requireDeclared(fastenerCheckInputs, "count", input.count);
  const shearRatio = requireDeclared(fastenerCheckInputs, "shearRatio", input.shearRatio);
  const failBelow = requireDeclared(fastenerCheckInputs, "failBelow", input.failBelow);
  const marginalBelow = requireDeclared(fastenerCheckInputs, "marginalBelow", input.marginalBelow);
  requireMarginalAtLeastFail(failBelow, marginalBelow);

  const thread = metricThread(size);
  const strengths = propertyClassRow(classId);
  const part = partLoad({ mass: partMass, radius, angularSpeed }); // newton-second-law
  const area =
    mode === "shear" && shearPlane === "shank"
      ? (Math.PI / 4) * thread.nominalDiameter * thread.nominalDiameter
      : thread.stressArea; // iso-898-1 Table 4
  const stress = boltStress({ force: part.force, count, area });
  const yieldStrength = mode === "tension" ? strengths.yieldStrengthMin : strengths.yieldStrengthMin / Math.sqrt(3); // shigley-distortion-energy
  const ultimateStrength = mode === "tension" ? strengths.tensileStrengthMin : shearRatio * strengths.tensileStrengthMin; // shear-ultimate-ratio
  const safetyFactorYield = safetyFactor({ strength: yieldStrength, stress });
  const safetyFactorUltimate = safetyFactor({ strength: ultimateStrength, stress });
  const governs = safetyFactorYield <= safetyFactorUltimate ? "yield" : "ultimate";
  const governing = Math.min(safetyFactorYield, safetyFactorUltimate);
  return {
    size,
    propertyClass: classId,
    mode,
    shearPlane,
    part,
    forcePerBolt: part.force / count,
    area,
    stress,
    yieldStrength,
    ultimateStrength,
    shearRatio,
    safetyFactorYield,
    safetyFactorUltimate,
    safetyFactor: governing,
    governs,
    speedAtYield: speedAtStress({ angularSpeed, stress, strength: yieldStrength }),
    speedAtUltimate: speedAtStress({ angularSpeed, stress, strength: ultimateStrength }),
    ultimateLoad: count * area * ultimateStrength,
    verdict: safetyVerdict({ safetyFactor: governing, failBelow, marginalBelow }),
  };
}

/** One point of a stress-against-speed curve. */
export interface StressAtSpeed {
  /** ω [rad/s]. */
  angularSpeed: number;
  /** Stress at that speed [Pa]. */
  stress: number;
}

/**
 * Bolt stress from standstill to a top speed, for a plot with the yield and ultimate lines of
 * `fastenerCheck` drawn across it (newton-second-law: σ ∝ ω²).
 *
 * Formula: $\sigma(\omega) = \dfrac{m\,\omega^2 r}{n\,A}$
 *
 * @param input as for `fastenerCheck`
 * @param maxSpeed the right end of the curve [rad/s], greater than 0
 * @param points number of points, a whole number from 2 to 1000 (default 50)
 * @returns `points` pairs from ω = 0 to maxSpeed, stress in [Pa]
 *
 * Sources: newton-second-law, iso-898-1.
 */
export function fastenerStressCurve(input: FastenerCheckInput, { maxSpeed, points = 50 }: { maxSpeed: number; points?: number }): StressAtSpeed[] {
  requirePositive("maxSpeed", maxSpeed, "rad/s");
  requirePointCount(points);
  const atInput = fastenerCheck(input);
  const perOmegaSquared = atInput.stress / (input.angularSpeed * input.angularSpeed);
  return Array.from({ length: points }, (_, i) => {
    const angularSpeed = i === points - 1 ? maxSpeed : (maxSpeed * i) / (points - 1);
    return { angularSpeed, stress: perOmegaSquared * angularSpeed * angularSpeed };
  });
}

function requirePointCount(points: number): void {
  requireInRange("points", points, "", { min: 2, max: 1000 });
  if (!Number.isInteger(points)) throw new CalcInputError({ param: "points", value: points, expected: "a whole number", unit: "" });
}

// ---------------------------------------------------------------------------------------------
// Spinning rings and disks.

/**
 * Tip speed of a point on a spinning body (openstax-college-physics, v = rω).
 *
 * Formula: $v = \omega R$
 *
 * @param angularSpeed ω [rad/s], 0 or more
 * @param radius R [m], 0 or more
 * @returns v [m/s]
 *
 * Example: 2400 rpm at 125 mm → 31.4 m/s. Sources: openstax-college-physics.
 */
export function tipSpeed({ angularSpeed, radius }: { angularSpeed: number; radius: number }): number {
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
  requireNonNegative("radius", radius, "m");
  return angularSpeed * radius; // openstax-college-physics
}

interface SpinningBody {
  /** ρ [kg/m³], greater than 0. */
  density: number;
  /** ω [rad/s], 0 or more. */
  angularSpeed: number;
}

function requireSpinningBody({ density, angularSpeed }: SpinningBody): void {
  requirePositive("density", density, "kg/m³");
  requireNonNegative("angularSpeed", angularSpeed, "rad/s");
}

function requirePoisson(poisson: number): void {
  requireInRange("poisson", poisson, "", { min: 0, max: 0.5 });
}

/**
 * Hoop stress of a thin spinning ring (carvill-data-handbook §1.2.7): independent of the
 * cross-section, set by the density and the speed of the ring alone.
 *
 * Formula: $\sigma_\theta = \rho v^2 = \rho\,\omega^2 R^2$
 *
 * @param density ρ [kg/m³], greater than 0
 * @param angularSpeed ω [rad/s], 0 or more
 * @param radius R, the ring's radius [m], 0 or more (the mean radius is exact for a thin ring; the outer radius is conservative)
 * @returns σ_θ [Pa]
 *
 * Assumptions: radial thickness small next to R; nothing inside the ring supports it (no spokes
 * or web). Example: steel, ρ = 7850 kg/m³, v = 100 m/s → 78.5 MPa. Sources: carvill-data-handbook,
 * timoshenko-goodier.
 */
export function thinRingHoopStress({ density, angularSpeed, radius }: SpinningBody & { radius: number }): number {
  requireSpinningBody({ density, angularSpeed });
  const v = tipSpeed({ angularSpeed, radius });
  return density * v * v; // carvill-data-handbook §1.2.7
}

/** Radial and hoop stress at one radius of a spinning disk [Pa]. */
export interface DiskStress {
  /** σ_r [Pa]. */
  radial: number;
  /** σ_θ [Pa]. */
  hoop: number;
}

/**
 * Radial and hoop stress at a radius of a spinning solid disk of uniform thickness
 * (timoshenko-goodier; roark-rotating-disks).
 *
 * Formula: $\sigma_r = \dfrac{3+\nu}{8}\rho\omega^2(b^2 - r^2),\quad \sigma_\theta = \dfrac{\rho\omega^2}{8}\left[(3+\nu)b^2 - (1+3\nu)r^2\right]$
 *
 * @param density ρ [kg/m³], greater than 0
 * @param poisson ν [-], 0 to 0.5
 * @param angularSpeed ω [rad/s], 0 or more
 * @param outerRadius b [m], greater than 0
 * @param radius r [m], 0 to b
 * @returns σ_r, σ_θ [Pa]
 *
 * Assumptions: plane stress (thin disk), isotropic and linear elastic, free rim, no hub load.
 * Example: steel (7850 kg/m³, ν = 0.3), b = 0.1 m, 10 000 rpm: centre 35.51 MPa both, rim hoop
 * 15.06 MPa. Sources: timoshenko-goodier, roark-rotating-disks, carvill-data-handbook.
 */
export function solidDiskStress({
  density,
  poisson,
  angularSpeed,
  outerRadius,
  radius,
}: SpinningBody & { poisson: number; outerRadius: number; radius: number }): DiskStress {
  requireSpinningBody({ density, angularSpeed });
  requirePoisson(poisson);
  requirePositive("outerRadius", outerRadius, "m");
  requireInRange("radius", radius, "m", { min: 0, max: outerRadius });
  const q = density * angularSpeed * angularSpeed;
  return {
    radial: ((3 + poisson) / 8) * q * (outerRadius * outerRadius - radius * radius), // timoshenko-goodier
    hoop: (q / 8) * ((3 + poisson) * outerRadius * outerRadius - (1 + 3 * poisson) * radius * radius), // timoshenko-goodier
  };
}

/**
 * Peak stress of a spinning solid disk: at the centre, where radial and hoop stress are equal
 * (carvill-data-handbook §1.2.7; timoshenko-goodier).
 *
 * Formula: $\sigma_{max} = \dfrac{3+\nu}{8}\,\rho\,\omega^2 b^2 = \dfrac{3+\nu}{8}\,\rho v^2$
 *
 * @param density ρ [kg/m³], greater than 0
 * @param poisson ν [-], 0 to 0.5
 * @param angularSpeed ω [rad/s], 0 or more
 * @param outerRadius b [m], greater than 0
 * @returns σ_max [Pa]
 *
 * Example: steel (7850 kg/m³, ν = 0.3), b = 0.1 m, 10 000 rpm → 35.51 MPa.
 * Sources: carvill-data-handbook, timoshenko-goodier, roark-rotating-disks.
 */
export function solidDiskCentreStress({ density, poisson, angularSpeed, outerRadius }: SpinningBody & { poisson: number; outerRadius: number }): number {
  return solidDiskStress({ density, poisson, angularSpeed, outerRadius, radius: 0 }).hoop;
}

function requireBore(innerRadius: number, outerRadius: number): void {
  requirePositive("outerRadius", outerRadius, "m");
  requireInRange("innerRadius", innerRadius, "m", { min: 0, max: outerRadius, minOpen: true, maxOpen: true });
}

/**
 * Radial and hoop stress at a radius of a spinning disk with a central bore, both edges free
 * (timoshenko-goodier; roark-rotating-disks).
 *
 * Formula: $\sigma_r = \dfrac{3+\nu}{8}\rho\omega^2\left(b^2 + a^2 - \dfrac{a^2b^2}{r^2} - r^2\right),\quad \sigma_\theta = \dfrac{3+\nu}{8}\rho\omega^2\left(b^2 + a^2 + \dfrac{a^2b^2}{r^2}\right) - \dfrac{1+3\nu}{8}\rho\omega^2 r^2$
 *
 * @param density ρ [kg/m³], greater than 0
 * @param poisson ν [-], 0 to 0.5
 * @param angularSpeed ω [rad/s], 0 or more
 * @param innerRadius a, the bore radius [m], greater than 0 and less than b
 * @param outerRadius b [m], greater than 0
 * @param radius r [m], a to b
 * @returns σ_r, σ_θ [Pa]
 *
 * Assumptions: plane stress, isotropic and linear elastic, nothing pressing on the bore (a disk
 * shrunk or keyed onto a shaft carries extra stress not counted here). Example: steel, a = 0.01 m,
 * b = 0.1 m, 10 000 rpm: bore hoop 71.17 MPa. Sources: timoshenko-goodier, roark-rotating-disks.
 */
export function annularDiskStress({
  density,
  poisson,
  angularSpeed,
  innerRadius,
  outerRadius,
  radius,
}: SpinningBody & { poisson: number; innerRadius: number; outerRadius: number; radius: number }): DiskStress {
  requireSpinningBody({ density, angularSpeed });
  requirePoisson(poisson);
  requireBore(innerRadius, outerRadius);
  requireInRange("radius", radius, "m", { min: innerRadius, max: outerRadius });
  const q = density * angularSpeed * angularSpeed;
  const a2 = innerRadius * innerRadius;
  const b2 = outerRadius * outerRadius;
  const r2 = radius * radius;
  return {
    radial: ((3 + poisson) / 8) * q * (b2 + a2 - (a2 * b2) / r2 - r2), // timoshenko-goodier
    hoop: ((3 + poisson) / 8) * q * (b2 + a2 + (a2 * b2) / r2) - ((1 + 3 * poisson) / 8) * q * r2, // timoshenko-goodier
  };
}

/**
 * Peak hoop stress of a spinning disk with a bore, which sits at the bore (timoshenko-goodier;
 * roark-rotating-disks). As a → 0 it tends to twice the solid disk's centre stress: a small
 * hole doubles the peak stress.
 *
 * Formula: $\sigma_\theta(a) = \dfrac{\rho\omega^2}{4}\left[(3+\nu)\,b^2 + (1-\nu)\,a^2\right]$
 *
 * @param density ρ [kg/m³], greater than 0
 * @param poisson ν [-], 0 to 0.5
 * @param angularSpeed ω [rad/s], 0 or more
 * @param innerRadius a [m], greater than 0 and less than b
 * @param outerRadius b [m], greater than 0
 * @returns σ_θ(a) [Pa]
 *
 * Example: steel (7850 kg/m³, ν = 0.3), a = 0.01 m, b = 0.1 m, 10 000 rpm → 71.17 MPa.
 * Sources: timoshenko-goodier, roark-rotating-disks.
 */
export function annularDiskBoreStress({
  density,
  poisson,
  angularSpeed,
  innerRadius,
  outerRadius,
}: SpinningBody & { poisson: number; innerRadius: number; outerRadius: number }): number {
  requireSpinningBody({ density, angularSpeed });
  requirePoisson(poisson);
  requireBore(innerRadius, outerRadius);
  const q = density * angularSpeed * angularSpeed;
  return (q / 4) * ((3 + poisson) * outerRadius * outerRadius + (1 - poisson) * innerRadius * innerRadius); // timoshenko-goodier
}

/**
 * Peak radial stress of a spinning disk with a bore and where it sits (timoshenko-goodier):
 * dσ_r/dr = 0 at r = √(ab).
 *
 * Formula: $\sigma_{r,max} = \dfrac{3+\nu}{8}\rho\omega^2 (b - a)^2$ at $r = \sqrt{ab}$
 *
 * @param density ρ [kg/m³], greater than 0
 * @param poisson ν [-], 0 to 0.5
 * @param angularSpeed ω [rad/s], 0 or more
 * @param innerRadius a [m], greater than 0 and less than b
 * @param outerRadius b [m], greater than 0
 * @returns stress σ_r,max [Pa] and radius √(ab) [m]
 *
 * Example: steel, a = 0.01 m, b = 0.1 m, 10 000 rpm → 28.76 MPa at 31.6 mm. Sources: timoshenko-goodier.
 */
export function annularDiskPeakRadialStress({
  density,
  poisson,
  angularSpeed,
  innerRadius,
  outerRadius,
}: SpinningBody & { poisson: number; innerRadius: number; outerRadius: number }): { stress: number; radius: number } {
  requireSpinningBody({ density, angularSpeed });
  requirePoisson(poisson);
  requireBore(innerRadius, outerRadius);
  const gap = outerRadius - innerRadius;
  return {
    stress: ((3 + poisson) / 8) * density * angularSpeed * angularSpeed * gap * gap, // timoshenko-goodier
    radius: Math.sqrt(innerRadius * outerRadius),
  };
}

/** Shapes the rim check knows. */
export const RIM_SHAPE_OPTIONS = [
  { value: "thin-ring", label: "Thin ring (a rim or shell with nothing inside)" },
  { value: "solid-disk", label: "Solid disk (no hole)" },
  { value: "annular-disk", label: "Disk with a bore" },
] as const satisfies readonly ChoiceOption[];

export type RimShape = (typeof RIM_SHAPE_OPTIONS)[number]["value"];

/** Materials offered for the rim check: the rows of the materials table, labelled name and condition. */
export const RIM_MATERIAL_OPTIONS: readonly ChoiceOption<MaterialId>[] = MATERIAL_IDS.map((id) => ({
  value: id,
  label: `${MATERIALS[id].name}, ${MATERIALS[id].condition}`,
}));

/** The rim check's material fields filled from a row of the materials table (param "material"). */
export function rimMaterial(id: string): { density: number; yieldStrength: number; ultimateStrength: number; poisson: number } {
  const row = MATERIALS[requireChoice("material", id, RIM_MATERIAL_OPTIONS)];
  return { density: row.density, yieldStrength: row.yieldStrength, ultimateStrength: row.ultimateStrength, poisson: row.poissonRatio };
}

/** Default material of the rim check. */
export const DEFAULT_RIM_MATERIAL: MaterialId = "al-6061-t6";
const DEFAULT_MATERIAL = MATERIALS[DEFAULT_RIM_MATERIAL];

/** Numeric inputs of the rim check, in SI. Choices: `RIM_SHAPE_OPTIONS` (and `RIM_MATERIAL_OPTIONS` to fill the material fields via `rimMaterial`). */
export const rimCheckInputs = defineInputs({
  outerRadius: {
    label: "Outer radius",
    kind: "length",
    min: 0.005,
    max: 2,
    default: 0.125,
    urlKey: "ro",
    help: "Radius of the outside edge: the tip of the rim or disk.",
  },
  innerRadius: {
    label: "Bore radius",
    kind: "length",
    min: 0,
    max: 2,
    default: 0.115,
    urlKey: "ri",
    help: "Radius of the central hole; read only for a disk with a bore, and must be less than the outer radius.",
  },
  density: {
    label: "Density",
    kind: "density",
    min: 100,
    max: 25000,
    default: DEFAULT_MATERIAL.density,
    urlKey: "rho",
    help: "Mass density of the material.",
  },
  yieldStrength: {
    label: "Yield strength",
    kind: "stress",
    min: 1e6,
    max: 5e9,
    default: DEFAULT_MATERIAL.yieldStrength,
    urlKey: "sy",
    help: "Yield or 0.2 % proof strength of the material in its actual condition.",
  },
  ultimateStrength: {
    label: "Ultimate strength",
    kind: "stress",
    min: 1e6,
    max: 5e9,
    default: DEFAULT_MATERIAL.ultimateStrength,
    urlKey: "su",
    help: "Ultimate tensile strength; at least the yield strength.",
  },
  poisson: {
    label: "Poisson's ratio",
    kind: "fraction",
    min: 0,
    max: 0.5,
    default: DEFAULT_MATERIAL.poissonRatio,
    unit: { metric: "frac", us: "frac" },
    urlKey: "nu",
    help: "About 0.3 for metals; read for disks only (a thin ring does not depend on it).",
  },
  angularSpeed: {
    label: "Speed",
    kind: "angularSpeed",
    min: rpmToRadPerSecond(1),
    max: rpmToRadPerSecond(100000),
    default: rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The top speed the part will see.",
  },
  failBelow: {
    label: "Fails below",
    kind: "fraction",
    min: 1,
    max: 10,
    default: DEFAULT_SAFETY_THRESHOLDS.failBelow,
    unit: { metric: "frac", us: "frac" },
    urlKey: "fail",
    help: "Safety factor under which the part is called a failure.",
  },
  marginalBelow: {
    label: "Thin below",
    kind: "fraction",
    min: 1,
    max: 20,
    default: DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
    unit: { metric: "frac", us: "frac" },
    urlKey: "thin",
    help: "Safety factor under which the margin is flagged as thin.",
  },
});

export type RimCheckInput = { [K in keyof typeof rimCheckInputs]: number } & {
  /** A value of `RIM_SHAPE_OPTIONS`. */
  shape: string;
};

/** Choice default of the rim check. */
export const RIM_CHOICE_DEFAULTS = { shape: "thin-ring" } as const satisfies { shape: RimShape };

export interface RimCheck {
  shape: RimShape;
  /** Speed of the outer edge, ω·b [m/s]. */
  tipSpeed: number;
  /** The largest hoop stress, which is also the largest principal stress [Pa]. */
  peakStress: number;
  /** Where it sits: b for a ring, 0 for a solid disk, a for a bored disk [m]. */
  peakStressRadius: number;
  /** σ_peak / (ρ v_tip²): 1 for a ring, (3+ν)/8 for a solid disk, up to (3+ν)/4 for a bored disk [-]. */
  shapeFactor: number;
  /** The largest radial stress [Pa] (0 for a thin ring). */
  peakRadialStress: number;
  /** Where it sits [m]. */
  peakRadialStressRadius: number;
  /** yieldStrength / peakStress [-]. */
  safetyFactorYield: number;
  /** ultimateStrength / peakStress [-]. */
  safetyFactorUltimate: number;
  /** The smaller of the two; with yield ≤ ultimate, the yield one [-]. */
  safetyFactor: number;
  /** Speed at which the peak stress reaches the yield strength [rad/s]. */
  speedAtYield: number;
  /** Speed at which the peak stress reaches the ultimate strength: the burst estimate [rad/s]. */
  speedAtUltimate: number;
  /** Tip speed at that burst estimate [m/s]. */
  tipSpeedAtUltimate: number;
  verdict: LoadVerdict;
}

/**
 * Peak hoop and radial stress of a spinning ring or disk (carvill-data-handbook,
 * timoshenko-goodier, roark-rotating-disks), whatever the shape. Used by `rimCheck`.
 */
function peakStresses(
  shape: RimShape,
  body: { density: number; poisson: number; angularSpeed: number; innerRadius: number; outerRadius: number },
): { hoop: number; hoopRadius: number; radial: number; radialRadius: number } {
  const { density, poisson, angularSpeed, innerRadius, outerRadius } = body;
  if (shape === "thin-ring") {
    return { hoop: thinRingHoopStress({ density, angularSpeed, radius: outerRadius }), hoopRadius: outerRadius, radial: 0, radialRadius: outerRadius };
  }
  if (shape === "solid-disk") {
    const centre = solidDiskCentreStress({ density, poisson, angularSpeed, outerRadius });
    return { hoop: centre, hoopRadius: 0, radial: centre, radialRadius: 0 };
  }
  const peakRadial = annularDiskPeakRadialStress({ density, poisson, angularSpeed, innerRadius, outerRadius });
  return {
    hoop: annularDiskBoreStress({ density, poisson, angularSpeed, innerRadius, outerRadius }),
    hoopRadius: innerRadius,
    radial: peakRadial.stress,
    radialRadius: peakRadial.radius,
  };
}

/**
 * The rim check: peak stress of a spinning thin ring, solid disk or bored disk, its safety factors
 * against the material's yield and ultimate strength, and the speeds at which it reaches them
 * (carvill-data-handbook, timoshenko-goodier, roark-rotating-disks).
 *
 * Formula: ring $\sigma = \rho\omega^2 b^2$; solid disk $\sigma = \tfrac{3+\nu}{8}\rho\omega^2 b^2$;
 * bored disk $\sigma = \tfrac{\rho\omega^2}{4}[(3+\nu)b^2 + (1-\nu)a^2]$; $\omega_{lim} = \omega\sqrt{S/\sigma}$
 *
 * @param input the fields of `rimCheckInputs` (SI) and `shape`
 * @returns tip speed, peak stresses and where they sit, safety factors, limit speeds and a verdict
 *
 * Assumptions:
 * - Uniform thickness, plane stress, isotropic linear elastic material; the thickness does not
 *   enter. Bolt holes, slots, teeth and welds concentrate stress and are not counted.
 * - A thin ring is taken at its outer radius (conservative: the exact thin-ring value uses the
 *   mean radius); no spokes or web hold it.
 * - The peak hoop stress is the largest principal stress everywhere in these shapes (σ_θ ≥ σ_r ≥ 0),
 *   so comparing it with the tensile strength is the Tresca check too.
 * - The speed at ultimate is a burst estimate from the elastic peak stress. A ring's stress is
 *   uniform already, so for a ring it is direct; a ductile disk yields at its peak and spreads the
 *   load first, so for a disk it is conservative. Impacts are not counted.
 *
 * Example (invented): a 6061-T6 ring rim of 125 mm radius at 2400 rpm: v = 31.4 m/s,
 * σ = 2.665 MPa, n_y = 104; reaches yield at 24 400 rpm and the burst estimate at 25 900 rpm.
 *
 * Sources: carvill-data-handbook, timoshenko-goodier, roark-rotating-disks, newton-second-law,
 * safety-factor-practice.
 */
export function rimCheck(input: RimCheckInput): RimCheck {
  const shape = requireChoice("shape", input.shape, RIM_SHAPE_OPTIONS);
  const outerRadius = requireDeclared(rimCheckInputs, "outerRadius", input.outerRadius);
  requireDeclared(rimCheckInputs, "innerRadius", input.innerRadius);
  const density = requireDeclared(rimCheckInputs, "density", input.density);
  const yieldStrength = requireDeclared(rimCheckInputs, "yieldStrength", input.yieldStrength);
  const ultimateStrength = requireDeclared(rimCheckInputs, "ultimateStrength", input.ultimateStrength);
  const poisson = requireDeclared(rimCheckInputs, "poisson", input.poisson);
  const angularSpeed = requireDeclared(rimCheckInputs, "angularSpeed", input.angularSpeed);
  const failBelow = requireDeclared(rimCheckInputs, "failBelow", input.failBelow);
  const marginalBelow = requireDeclared(rimCheckInputs, "marginalBelow", input.marginalBelow);
  requireMarginalAtLeastFail(failBelow, marginalBelow);
  if (!(yieldStrength <= ultimateStrength)) {
    throw new CalcInputError({ param: "yieldStrength", value: yieldStrength, expected: "at most the ultimate strength", unit: "Pa" });
  }
  if (shape === "annular-disk") requireBore(input.innerRadius, outerRadius);
  const innerRadius = shape === "annular-disk" ? input.innerRadius : 0; // not read for a ring or a solid disk

  const peak = peakStresses(shape, { density, poisson, angularSpeed, innerRadius, outerRadius });
  const v = tipSpeed({ angularSpeed, radius: outerRadius });
  const safetyFactorYield = safetyFactor({ strength: yieldStrength, stress: peak.hoop });
  const safetyFactorUltimate = safetyFactor({ strength: ultimateStrength, stress: peak.hoop });
  const speedAtUltimate = speedAtStress({ angularSpeed, stress: peak.hoop, strength: ultimateStrength });
  return {
    shape,
    tipSpeed: v,
    peakStress: peak.hoop,
    peakStressRadius: peak.hoopRadius,
    shapeFactor: peak.hoop / (density * v * v),
    peakRadialStress: peak.radial,
    peakRadialStressRadius: peak.radialRadius,
    safetyFactorYield,
    safetyFactorUltimate,
    safetyFactor: safetyFactorYield,
    speedAtYield: speedAtStress({ angularSpeed, stress: peak.hoop, strength: yieldStrength }),
    speedAtUltimate,
    tipSpeedAtUltimate: speedAtUltimate * outerRadius,
    verdict: safetyVerdict({ safetyFactor: safetyFactorYield, failBelow, marginalBelow }),
  };
}

/** One point of a disk stress distribution. */
export interface DiskStressPoint extends DiskStress {
  /** r [m]. */
  radius: number;
}

/**
 * Radial and hoop stress across a spinning ring or disk, for a plot (timoshenko-goodier;
 * roark-rotating-disks; carvill-data-handbook for the ring).
 *
 * Formula: as `solidDiskStress` and `annularDiskStress`; a thin ring is one point, σ_θ = ρω²b², σ_r = 0
 *
 * @param input the fields of `rimCheckInputs` and `shape` (strengths and thresholds are checked, not used)
 * @param points number of points from the inside to the outer edge, a whole number from 2 to 1000 (default 41)
 * @returns points from r = 0 (solid) or a (bored) to b, stresses in [Pa]; a single point at b for a thin ring
 *
 * Sources: timoshenko-goodier, roark-rotating-disks, carvill-data-handbook.
 */
export function rimStressProfile(input: RimCheckInput, { points = 41 }: { points?: number } = {}): DiskStressPoint[] {
  requirePointCount(points);
  const { shape } = rimCheck(input); // validates every field
  const { density, poisson, angularSpeed, innerRadius, outerRadius } = input;
  if (shape === "thin-ring") {
    return [{ radius: outerRadius, radial: 0, hoop: thinRingHoopStress({ density, angularSpeed, radius: outerRadius }) }];
  }
  const start = shape === "solid-disk" ? 0 : innerRadius;
  return Array.from({ length: points }, (_, i) => {
    const radius = i === points - 1 ? outerRadius : start + ((outerRadius - start) * i) / (points - 1);
    const stress =
      shape === "solid-disk"
        ? solidDiskStress({ density, poisson, angularSpeed, outerRadius, radius })
        : annularDiskStress({ density, poisson, angularSpeed, innerRadius, outerRadius, radius });
    return { radius, ...stress };
  });
}

// ---------------------------------------------------------------------------------------------
// Worked example.

/** The invented demo robot's inputs and results. */
export interface DemoRobotLoads {
  /** What the scenario is. */
  description: string;
  boltInput: FastenerCheckInput;
  bolt: FastenerCheck;
  rimInput: RimCheckInput;
  rim: RimCheck;
}

/**
 * Worked example on a demo robot of our own invention (not a real machine): a full-body spinner
 * with a 6061-T6 ring rim of 125 mm outer radius, topping out at 2400 rpm, balanced by 40 g of steel
 * washers stacked under one M4 class 8.8 bolt at 70 mm radius, the bolt loaded in shear.
 *
 * Formula: as `fastenerCheck` and `rimCheck`
 *
 * @returns the inputs and results of both checks
 *
 * Example: the bolt sees 176.9 N, τ = 20.1 MPa, n = 18.3 → holds; the rim sees 2.665 MPa at
 * 31.4 m/s tip speed, n = 104, burst estimate 25 900 rpm.
 *
 * Sources: newton-second-law, iso-898-1, shear-ultimate-ratio, carvill-data-handbook,
 * safety-factor-practice.
 */
export function demoRobotLoads(): DemoRobotLoads {
  const topSpeed = rpmToRadPerSecond(2400);
  const boltInput: FastenerCheckInput = {
    partMass: 0.04,
    radius: 0.07,
    angularSpeed: topSpeed,
    count: 1,
    shearRatio: DEFAULT_SHEAR_RATIO,
    failBelow: DEFAULT_SAFETY_THRESHOLDS.failBelow,
    marginalBelow: DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
    size: "M4",
    propertyClass: "8.8",
    mode: "shear",
    shearPlane: "thread",
  };
  const rimInput: RimCheckInput = {
    shape: "thin-ring",
    outerRadius: 0.125,
    innerRadius: 0.115,
    ...rimMaterial("al-6061-t6"),
    angularSpeed: topSpeed,
    failBelow: DEFAULT_SAFETY_THRESHOLDS.failBelow,
    marginalBelow: DEFAULT_SAFETY_THRESHOLDS.marginalBelow,
  };
  return {
    description:
      "An invented full-body spinner (not a real robot): 6061-T6 ring rim, 125 mm outer radius, 2400 rpm top speed; 40 g of steel washers under one M4 class 8.8 bolt at 70 mm radius, in shear.",
    boltInput,
    bolt: fastenerCheck(boltInput),
    rimInput,
    rim: rimCheck(rimInput),
  };
}

/** Source keys this module relies on (checked by the meta test). */
export const LOADS_SOURCES: readonly SourceKey[] = [
  "newton-second-law",
  "openstax-college-physics",
  "iso-898-1",
  "shigley-distortion-energy",
  "shear-ultimate-ratio",
  "en-1993-1-8",
  "carvill-data-handbook",
  "timoshenko-goodier",
  "roark-rotating-disks",
  "safety-factor-practice",
];
