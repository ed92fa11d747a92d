/**
 * The calc contract at the extremes. Every function calc/index.ts exports is called with inputs
 * over the whole double range and with missing arguments, and must either return only finite
 * numbers (the result walked deeply; strings, booleans and null are fine) or throw a
 * CalcInputError. Nothing else: no NaN, no ±Infinity, no TypeError or RangeError, no plain Error.
 *
 * How the calls are made: `CALLS` below holds one or more valid calls of each public function (an
 * explicit table, typed by the exports: a new export without an entry fails the type check and the
 * first test). Each run copies one of them and changes one to three places in it: a number becomes
 * an extreme double (±0, the subnormals, the smallest normal, ±1e-300, ±1e300, ±Number.MAX_VALUE,
 * 2^53, an end of a declared input range, or any finite double) or is scaled by a modest factor, any
 * argument, field or list item becomes null or undefined, a text (a unit, an option) becomes one no
 * table holds, or the call loses all its arguments. An entry with an input declaration
 * (`DECLARED`) is also called with one, a few or all of its declared inputs drawn anywhere inside
 * their declared ranges, ends and subnormals included, and must refuse, naming the input, every
 * value outside them. Places marked as code in an entry (a calculator descriptor, an input
 * declaration, a callback, another function's result) are replaced whole but never changed inside:
 * they come from the program, not from a user.
 *
 * Cost: about 168 000 calls (291 functions and constructors, 600 runs each, fewer for the
 * simulations) in about 6 s of one worker on a 2-core machine. `CONTRACT_RUNS=10` multiplies every
 * run count, `CONTRACT_SEED=…` picks another seed (the default is fixed so that CI is repeatable),
 * `CONTRACT_ONLY=name,name` runs those functions alone, and `CONTRACT_TALLY=1` counts every breach
 * per function instead of stopping at the first, and prints the table with the share of calls that
 * returned a result.
 */
import { afterAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import * as api from "../../calc/index.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import type { AnyCalculator } from "../../calc/core/calculator.ts";
import type { InputSpec, InputSpecs } from "../../calc/core/inputs.ts";
import { CALCULATORS } from "../../calc/design/calculators.ts";
import { requireDeclared } from "../../calc/core/spec-check.ts";
import { inputArb, invalidInputArb, mutateCall, mutationsArb, nonFinitePlace } from "../support/arbitraries.ts";

type Api = typeof api;
/** The public API by name. */
const API = api as unknown as Record<string, unknown>;
const fnOf = (name: string) => API[name] as (...args: unknown[]) => unknown;
/** The names of the exported functions (classes are constructors, listed apart). */
type PublicFunction = { [K in keyof Api]: Api[K] extends (...args: never[]) => unknown ? K : never }[keyof Api];
type PublicClass = { [K in keyof Api]: Api[K] extends abstract new (...args: never[]) => unknown ? K : never }[keyof Api];

/** One public function's valid calls, and how the fuzzer may change them. */
interface Entry {
  /** Valid argument lists. */
  calls: () => unknown[][];
  /** Places that are code, not input ("1": the second argument; "0.fit": its field), changed only whole. */
  code?: readonly string[];
  /** Runs per test run (default 600): fewer for the simulations. */
  runs?: number;
}

const calc = (id: string): AnyCalculator => {
  const found = CALCULATORS.find((c) => c.id === id);
  if (!found) throw new Error(`no calculator "${id}"`);
  return found;
};
const defaults = (specs: InputSpecs): Record<string, number> => Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.default]));
const disk = { name: "disk", shape: { kind: "disk", radius: 0.1 }, mass: { kind: "given", mass: 2 }, x: 0, y: 0, z: 0 };
const plate = {
  name: "plate",
  shape: { kind: "plate", length: 0.04, width: 0.02, angle: 0.5 },
  mass: { kind: "material", material: "al-6061-t6", thickness: 0.005 },
  x: 0.03,
  y: 0.04,
  z: 0.01,
};
const weight = { name: "weight", shape: { kind: "point" }, mass: { kind: "given", mass: 0.1 }, x: 0.1, y: 0, z: 0 };
const parts = () => [disk, plate, weight];
const placementSpec = () => api.accelerometerPlacementInputs.radius;
const massInput = (): api.MassBalanceInput => {
  const { mode: _mode, ...values } = api.initialValues(calc("mass"));
  return { ...(values as unknown as api.MassBalanceInput), parts: api.demoRobotParts(), candidates: [{ x: -0.05, y: 0 }] };
};
const fastenerValues = () => ({ ...defaults(api.fastenerCheckInputs), ...api.FASTENER_CHOICE_DEFAULTS });
const rimValues = () => api.initialValues(calc("rims"));
const jointValues = () => ({ ...defaults(api.boltedJointInputs), ...api.BOLTED_JOINT_CHOICE_DEFAULTS });
const rhs = (_t: number, y: ArrayLike<number>, dy: Float64Array | number[]) => {
  dy[0] = y[1]!;
  dy[1] = -y[0]!;
};
const quickSteering = () => ({ ...api.DEMO_STEERING_SPINNER, duration: 0.05 });
const c =
  (...calls: unknown[][]) =>
  () =>
    calls;

/** Valid calls of every public function (built lazily: some need other functions' results). */
const CALLS: Record<PublicFunction, Entry> = {
  // core: errors, sources, units, inputs
  quickBalance: {
    calls: c(
      [
        {
          robotMass: 1.5,
          spinSpeed: 251,
          limit: "grade",
          grade: "100",
          wobbleForce: 50,
          change: "added",
          partMass: 0.012,
          partRadius: 0.045,
          moveDistance: 0.01,
          counterweightRadius: 0.05,
        },
      ],
      [
        {
          robotMass: 1.5,
          spinSpeed: 251,
          limit: "force",
          grade: "16",
          wobbleForce: 30,
          change: "moved",
          partMass: 0.18,
          partRadius: 0.045,
          moveDistance: 0.004,
          counterweightRadius: 0.05,
        },
      ],
    ),
  },
  radiusTrim: {
    calls: c(
      [{ assumedRadius: 0.008, sense: "ahead", measure: "turn", driftPerTurn: 0.35, driftRate: 0.17, angularSpeed: 200 }],
      [{ assumedRadius: 0.012, sense: "behind", measure: "second", driftPerTurn: 0.1, driftRate: 0.17, angularSpeed: 209 }],
    ),
  },
  requireRelation: {
    calls: c(
      ["radius", 0.1, "greater", 0, { kind: "length", unit: "m" }],
      ["lowSpeed", 1, "at-most", 2, { kind: "angularSpeed", unit: "rad/s", other: "topSpeed" }],
    ),
  },
  requireFinite: { calls: c(["radius", 0.1, "m"]) },
  requirePositive: { calls: c(["radius", 0.1, "m"]) },
  requireNonNegative: { calls: c(["radius", 0.1, "m"]) },
  requireInRange: { calls: c(["margin", 0.2, "", { min: 0, max: 0.95 }], ["radius", 0.1, "m", { min: 0, max: 1, minOpen: true, maxOpen: true }]) },
  isSourceKey: { calls: c(["iso-281"]) },
  unitsOfKind: { calls: c(["length"]) },
  useUnits: { calls: c([[]], [[{ kind: "length", units: {}, display: [[]] }]]) },
  unitTables: { calls: c([], [["length", "mass"]]) },
  unitsLoaded: { calls: c(["length"], ["count"]) },
  unitDef: { calls: c(["mm"], ["rpm", "speed"]) },
  lookupUnit: { calls: c(["mm"], ["furlong"]) },
  toSI: { calls: c([32, "mm"], [2400, "rpm"]) },
  fromSI: { calls: c([0.032, "mm"], [251, "rpm"]) },
  convert: { calls: c([1, "in", "mm"], [100, "rpm", "rad/s"]) },
  rpmToRadPerSecond: { calls: c([2000], [10000], [100]) },
  radPerSecondToRpm: { calls: c([251.3]) },
  displayUnit: { calls: c(["length", "metric", 0.5], ["mass", "us", 2]) },
  formatNumber: { calls: c([32.04, 3], [1234567], [-0.000123, 5]) },
  formatQuantity: { calls: c([0.032, "length", { system: "metric" }], [0.45, "mass", { unit: "g", significant: 4 }]) },
  plainNumber: { calls: c([0.0001], [1.5e-7]) },
  siUnit: { calls: c(["length"]) },
  exactQuantity: { calls: c([0.032, "mm"]) },
  quantityToText: { calls: c([0.032, "mm"], [251.32741228718345, "rpm"]) },
  exactNumberText: { calls: c([0.0127, 0.001]) },
  readExactNumber: { calls: c(["12.7", 0.001], ["0.0127si", 0.001]) },
  findUnit: { calls: c(["mm", "length"], ["RPM", "angularSpeed"]) },
  kindName: { calls: c(["angularSpeed"]) },
  parseQuantity: { calls: c(["32 mm", "length", "mm"], ["2400", "angularSpeed", "rpm"]) },
  requireUnitOfKind: { calls: c(["unit", "mm", "length"]) },
  defineInputs: { calls: c([{ radius: { label: "Radius", kind: "length", min: 0, minOpen: true, max: 1, default: 0.1, urlKey: "r" } }]) },
  fieldUnit: { calls: () => [[placementSpec(), "metric"]], code: ["0"] },
  describeRange: { calls: () => [[placementSpec(), "us"]], code: ["0"] },
  checkValue: { calls: () => [[placementSpec(), 0.02, "metric"]], code: ["0"] },
  readField: { calls: () => [[placementSpec(), "20 mm", "metric"]], code: ["0"] },
  defaultText: { calls: () => [[placementSpec(), "metric"]], code: ["0"] },
  exactFieldText: { calls: () => [[placementSpec(), 0.0127, "us"]], code: ["0"] },
  urlText: { calls: () => [[placementSpec(), 0.02, "mm"]], code: ["0"] },
  // rotation
  centripetalAcceleration: { calls: c([{ angularSpeed: 209.43951023931953, radius: 0.089 }]) },
  centripetalAccelerationCurve: { calls: c([{ radius: 0.012, maxSpeed: 400, intervals: 2 }]) },
  radiusForAcceleration: { calls: c([{ angularSpeed: 209.43951023931953, acceleration: 3903.9292984999997 }]) },
  angularSpeedForAcceleration: { calls: c([{ radius: 0.089, acceleration: 3903.98 }]) },
  maxSensorRadius: { calls: c([{ fullScale: 1961.33, margin: 0.2, topSpeed: 314.1592653589793 }]) },
  speedResolution: { calls: c([{ step: 9.80665, angularSpeed: 41.8879020478639, radius: 0.02 }]) },
  sensorCountSize: { calls: c([{ span: 3922.66, bits: 12 }]) },
  minSensorRadius: { calls: c([{ step: 0.980665, lowSpeed: 41.8879020478639, resolution: 0.01 }]) },
  partLoad: { calls: c([{ mass: 0.05, radius: 0.06, angularSpeed: 251.32741228718345 }]) },
  accelerometerPlacement: { calls: () => [[api.initialValues(calc("placement"))]] },
  // heading
  headingDriftAt: {
    calls: c([{ angularSpeed: 209.43951023931953, assumedRadius: 0.008, trueRadius: 0.009, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 }]),
  },
  lowestEstimableSpeed: { calls: c([{ assumedRadius: 0.012, trueRadius: 0.012, scaleError: 0, bias: 0, biasCorrection: 4.903325, tilt: 0 }]) },
  assumedRadiusBand: {
    calls: c([
      {
        angularSpeed: 293.21531433504737,
        budget: 0.17453292519943295,
        assumedRadius: 0.012,
        trueRadius: 0.0127,
        scaleError: 0,
        bias: 0,
        biasCorrection: 0,
        tilt: 0,
      },
    ]),
  },
  speedRangeWithinBudget: {
    calls: c(
      [{ budget: 0.17453292519943295, assumedRadius: 0.012, trueRadius: 0.0127, scaleError: 0, bias: 0, biasCorrection: 0, tilt: 0 }],
      [{ budget: 0.17453292519943295, assumedRadius: 0.01269, trueRadius: 0.0127, scaleError: 0, bias: 0.196133, biasCorrection: 0, tilt: 0 }],
    ),
  },
  headingDriftSeries: {
    calls: c([
      {
        lowSpeed: 125.66370614359172,
        highSpeed: 293.21531433504737,
        points: 3,
        assumedRadius: 0.012,
        trueRadius: 0.0127,
        scaleError: 0,
        bias: 0,
        biasCorrection: 0,
        tilt: 0,
      },
    ]),
  },
  headingDrift: { calls: () => [[api.initialValues(calc("headingDrift"))]] },
  opposedSensorsDrift: { calls: c([{ angularSpeed: 209.43951023931953, radius1: 0.012, radius2: 0.012, offset: 0.0005 }]) },
  opposedSensorsCheck: { calls: () => [[api.initialValues(calc("opposedSensors"))]] },
  radiusMismatchExample: { calls: c([{ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [1200, 2800] }]) },
  demoSpinnerRadiusExample: { calls: c([]) },
  headingStepPerLoop: { calls: c([{ angularSpeed: 314.1592653589793, loopRate: 1000 }]) },
  latencyHeadingLag: { calls: c([{ angularSpeed: 314.1592653589793, latency: 0.0005 }]) },
  beaconArc: { calls: c([{ angularSpeed: 314.1592653589793, onTime: 0.001 }]) },
  loopRateForStep: { calls: c([{ angularSpeed: 314.1592653589793, targetStep: 0.08726646259971647 }]) },
  onTimeForArc: { calls: c([{ angularSpeed: 314.1592653589793, targetArc: 0.3490658503988659 }]) },
  headingTiming: { calls: () => [[api.initialValues(calc("headingTiming"))]] },
  emaTimeConstant: { calls: c([{ smoothingFactor: 0.1, samplePeriod: 0.001 }]) },
  emaFactorForTimeConstant: { calls: c([{ timeConstant: 0.01, samplePeriod: 0.001 }]) },
  emaRampLag: { calls: c([{ smoothingFactor: 0.1, samplePeriod: 0.001 }]) },
  emaNoiseFactor: { calls: c([{ smoothingFactor: 0.1 }]) },
  spikeRateError: { calls: c([{ angularSpeed: 209.43951023931953, assumedRadius: 0.012, spike: 490.3325 }]) },
  medianFilterDelay: { calls: c([{ windowLength: 3, samplePeriod: 0.001 }]) },
  headingSmoothing: { calls: () => [[api.initialValues(calc("headingSmoothing"))]] },
  smoothingTradeoffSeries: { calls: () => [[api.initialValues(calc("headingSmoothing"))]] },
  // mass
  requireLength: { calls: c(["radius", 0.1]) },
  requireCoordinate: { calls: c(["x", -0.1]) },
  checkPart: { calls: c([disk], [plate, "parts[1]"]) },
  partVolume: { calls: c([plate]) },
  partMass: { calls: c([plate], [disk]) },
  massOf: { calls: c([plate]) },
  partOwnInertia: { calls: c([disk], [plate]) },
  ownInertiaOf: { calls: c([{ kind: "disk", radius: 0.1 }, 2], [{ kind: "plate", length: 0.04, width: 0.02, angle: 0.5 }, 0.1]) },
  directionOf: { calls: c([1, 0.5]) },
  massProperties: { calls: c([parts()], [[{ ...plate, mass: { kind: "material", material: "al-6061-t6", thickness: 0.001 } }]]) },
  addPart: { calls: c([parts(), weight], [parts(), weight, 0]) },
  duplicatePart: { calls: c([parts(), 1]) },
  removePart: { calls: c([parts(), 0]) },
  movePart: { calls: c([parts(), 0, 2]) },
  mirrorPart: { calls: c([plate, "x"], [plate, "y"]) },
  suffixedName: { calls: c(["washer", " (copy)"], ["n".repeat(60), " (mirror)"]) },
  mirrorPartInList: { calls: c([parts(), 1, "x"]) },
  addMirrorCopy: { calls: c([parts(), 1, "y"]) },
  encodeLayout: { calls: c([parts()]) },
  parseLayout: { calls: c(["v1~pt_a_0_0_0_10~blob_b_0_0_0_1"]), code: [] },
  partOutline: { calls: c([plate], [disk]) },
  layoutDrawing: { calls: c([parts()]) },
  staticUnbalance: { calls: c([{ totalMass: 1.4, offset: 0.002, angularSpeed: 251.32741228718345 }]) },
  equivalentBalanceGrade: { calls: c([{ offset: 0.00002005, angularSpeed: 314.1592653589793 }]) },
  standardBalanceGrade: { calls: c([0.0063], [0.005]) },
  finestGradeMet: { calls: c([0.0063], [0.00631]) },
  permissibleResidualUnbalance: { calls: c([{ totalMass: 453.59237, grade: 0.0025, angularSpeed: 1570.7963267948965 }]) },
  coupleUnbalance: { calls: c([{ productXZ: 0.00001, productYZ: 0, angularSpeed: 251.32741228718345 }]) },
  twoPlaneCorrection: { calls: c([{ firstMomentX: 0.0005, firstMomentY: 0, productXZ: 0.000005, productYZ: 0, planeZ1: 0, planeZ2: 0.02, radius: 0.05 }]) },
  counterweightAtRadius: { calls: c([{ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, radius: 0.055 }]) },
  counterweightRadiusForMass: {
    calls: c(
      [{ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, mass: 0.05, maxRadius: 1 }],
      [{ totalMass: 1.4, centreX: 0.002, centreY: 0, targetOffset: 0.0002, mass: 0.05, maxRadius: 0.045 }],
    ),
  },
  counterweightAtCandidates: {
    calls: c([
      {
        totalMass: 1.4,
        centreX: 0.002,
        centreY: 0,
        targetOffset: 0.0002,
        candidates: [
          { x: -0.055, y: 0 },
          { x: 0.055, y: 0 },
        ],
      },
    ]),
  },
  applyCounterweight: { calls: c([{ parts: [{ ...weight, x: 0.01 }], mass: 0.1, x: -0.1, y: 0, z: 0 }]) },
  trueSensorRadius: { calls: c([{ centreX: 0.002, centreY: 0, sensorX: -0.032, sensorY: 0 }]) },
  spinCentre: {
    calls: c(
      [{ centreX: 0.0001, centreY: 0, angularSpeed: 251.32741228718345, sideGrip: 0.8, gripShare: 0.9 }],
      [{ centreX: 0.002, centreY: 0.001, angularSpeed: 251.32741228718345, sideGrip: 0.8, gripShare: 0.9 }],
    ),
  },
  coupleLift: { calls: c([{ couple: 0.00001, totalMass: 1.4, supportRadius: 0.07, angularSpeed: 251.32741228718345 }]) },
  massBalance: { calls: () => [[massInput()]] },
  counterweightPlan: {
    calls: () => {
      const input = massInput();
      return (["radius", "mass", "points"] as const).map((mode) => [{ input, balance: api.massBalance(input), mode }]);
    },
    code: ["0.balance"],
  },
  demoRobotParts: { calls: c([]) },
  demoRobotBalance: { calls: c([]) },
  // loads
  rimMaterial: { calls: c(["al-6061-t6"]) },
  rimMaterialChoices: { calls: c([]) },
  demoRobotLoads: { calls: c([], [{ washerMass: 0.02, washerRadius: 0.05, topSpeed: 300 }]) },
  requireChoice: { calls: c(["mode", "shear", [{ value: "shear", label: "Shear" }]]), code: ["2"] },
  safetyThresholdInputs: { calls: c(["bolt"]) },
  safetyFactor: { calls: c([{ strength: 400000000, stress: 20100000 }]) },
  safetyVerdict: { calls: c([{ safetyFactor: 1.6 }], [{ safetyFactor: 1.6, failBelow: 1.5, marginalBelow: 2 }]) },
  requireMarginalAtLeastFail: { calls: c([1.5, 2]) },
  speedAtStress: { calls: c([{ angularSpeed: 251.32741228718345, stress: 2665000, strength: 310000000 }]) },
  requirePointCount: { calls: c([50]) },
  vonMisesStress: { calls: c([{ normalStress: 100000000, shearStress: 50000000 }]) },
  boltStress: { calls: c([{ force: 176.9, count: 1, area: 0.00000878 }]) },
  fastenerStrengths: { calls: c([{ propertyClass: "8.8", mode: "shear", shearRatio: 0.5 }]) },
  fastenerCheck: { calls: () => [[fastenerValues()]] },
  fastenerStressCurve: { calls: () => [[fastenerValues(), { maxSpeed: 500, points: 3 }]] },
  tipSpeed: { calls: c([{ angularSpeed: 251.32741228718345, radius: 0.125 }]) },
  thinRingHoopStress: { calls: c([{ density: 7850, angularSpeed: 1000, radius: 0.1 }]) },
  thinRingLimitTipSpeed: { calls: c([{ density: 2700, strength: 310000000 }]) },
  solidDiskStress: { calls: c([{ density: 7850, poisson: 0.3, angularSpeed: 1047.1975511965977, outerRadius: 0.1, radius: 0.05 }]) },
  solidDiskCentreStress: { calls: c([{ density: 7850, poisson: 0.3, angularSpeed: 1047.1975511965977, outerRadius: 0.1 }]) },
  annularDiskStress: { calls: c([{ density: 7850, poisson: 0.3, angularSpeed: 1047.1975511965977, innerRadius: 0.01, outerRadius: 0.1, radius: 0.05 }]) },
  annularDiskBoreStress: { calls: c([{ density: 7850, poisson: 0.3, angularSpeed: 1047.1975511965977, innerRadius: 0.01, outerRadius: 0.1 }]) },
  annularDiskPeakRadialStress: { calls: c([{ density: 7850, poisson: 0.3, angularSpeed: 1047.1975511965977, innerRadius: 0.01, outerRadius: 0.1 }]) },
  rimCheck: { calls: () => [[rimValues()], [{ ...rimValues(), shape: "annular-disk" }], [{ ...rimValues(), shape: "solid-disk" }]] },
  rimStressProfile: { calls: () => [[{ ...rimValues(), shape: "annular-disk" }, { points: 5 }]] },
  // drive train
  rotorKineticEnergy: { calls: c([{ inertia: 0.0001, angularSpeed: 760 }]) },
  rotorTipSpeed: { calls: c([{ angularSpeed: 1047.1975511965977, radius: 0.06 }]) },
  biteDepth: { calls: c([{ closingSpeed: 3, angularSpeed: 1047.1975511965977, impactors: 2 }]) },
  tractionLimitedAcceleration: { calls: c([{ frictionCoefficient: 0.8, normalForce: 13.24, contactRadius: 0.07, inertia: 0.005, frictionTorque: 0.01 }]) },
  currentLimitedAcceleration: {
    calls: c([
      {
        currentLimit: 60,
        torqueConstant: 0.0068,
        inertia: 6.3e-4,
        motorCount: 1,
        ratio: 2,
        efficiency: 0.95,
        noLoadCurrent: 1.2,
        frictionTorque: 0.01,
        motorRotorInertia: 8e-6,
      },
    ]),
  },
  requireDriveType: { calls: c(["weapon"]) },
  validateDrivetrainInput: { calls: () => [[api.DEMO_WEAPON], [api.DEMO_SPINNER]] },
  simulateSpinUp: { calls: () => [[api.DEMO_WEAPON], [api.DEMO_SPINNER, { series: false, maxPoints: 10, relativeTolerance: 1e-6 }]], runs: 100 },
  compareDrivetrains: { calls: () => [[[api.DEMO_WEAPON, { ...api.DEMO_WEAPON, cellCount: 6 }], { series: false }]], runs: 50 },
  sweepValues: { calls: c([{ parameter: "gearRatio", from: 1, to: 4, points: 4 }], [{ parameter: "cellCount", from: 2, to: 8, points: 50 }]) },
  sweepPoint: { calls: () => [[{ base: api.DEMO_WEAPON, parameter: "gearRatio", value: 3 }]], runs: 100 },
  markSweepOptimum: {
    calls: c([
      [
        { timeToTarget: null, topSpeed: 100 },
        { timeToTarget: 1.2, topSpeed: 200 },
        { timeToTarget: 1, topSpeed: 300 },
      ],
    ]),
  },
  summariseSweep: {
    calls: c([
      [
        { timeToTarget: null, topSpeed: 100 },
        { timeToTarget: 1.2, topSpeed: 200 },
        { timeToTarget: 1, topSpeed: 300 },
      ],
    ]),
  },
  sweepDrivetrain: { calls: () => [[{ base: api.DEMO_WEAPON, parameter: "gearRatio", from: 1, to: 4, points: 3 }]], runs: 38 },
  drivetrainWorkedExample: { calls: c([]), runs: 8 },
  torqueConstantFromKv: { calls: c([{ kv: 10.471975511965976 }]) },
  motorLine: { calls: c([{ kv: 10.471975511965976, resistance: 0.1, voltage: 24, noLoadCurrent: 1 }]) },
  torqueSpeedLine: { calls: c([{ kv: 10.471975511965976, resistance: 0.1, voltage: 24 }, { points: 3 }]) },
  spinUpTimeConstant: { calls: c([{ inertia: 0.01, resistance: 0.1, torqueConstant: 0.09549296585513721 }]) },
  voltageLimitedSpeed: { calls: c([{ finalSpeed: 251.327, timeConstant: 0.109662, time: 0.1 }]) },
  timeToSpeedFraction: { calls: c([{ timeConstant: 0.1096622711, fraction: 0.9 }]) },
  dcMotorSteadySpeed: { calls: c([{ torqueConstant: 0.01, resistance: 1, viscousFriction: 0.1, voltage: 1 }]) },
  // numerics
  logGamma: { calls: c([0.5], [5]) },
  studentTCdf: { calls: c([{ t: 1, degreesOfFreedom: 1 }], [{ t: -2, degreesOfFreedom: 7.5 }]) },
  studentTQuantile: { calls: c([{ probability: 0.975, degreesOfFreedom: 1 }], [{ probability: 0.975, degreesOfFreedom: 2 }]) },
  normalCdf: { calls: c([{ z: 1.959964 }], [{ z: -3 }]) },
  normalQuantile: { calls: c([{ probability: 0.975 }]) },
  median: { calls: c([[3, 1, 2]], [[4, 1, 3, 2]]) },
  countDistinct: { calls: c([[1, 1, 2]]) },
  requireFitOptions: { calls: c([0.95, 3.5, 1.345]) },
  fitStraightLine: {
    calls: c([{ x: [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5], y: [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68] }]),
  },
  fitChecked: { calls: c([[1, 2, 3, 4], [2.1, 3.9, 6.2, 7.8], 0.95, 3.5, 1.345, "x"]) },
  solveOde: { calls: c([{ rhs, t0: 0, y0: [0, 1], tEnd: 1.5707963267948966, rtol: 1e-8, atol: 1e-10 }]), code: ["0.rhs"], runs: 300 },
  // heading: calibration
  fitCalibration: { calls: () => [[api.demoCalibrationRows()], [api.demoCalibrationRows(), { confidence: 0.9, spikeThreshold: 3, huberTuning: 1.5 }]] },
  demoCalibrationRows: { calls: c([]) },
  calibrationCurve: { calls: () => [[{ fit: api.fitCalibration(api.demoCalibrationRows()), lowSpeed: 0, highSpeed: 209.44, points: 5 }]], code: ["0.fit"] },
  encodeCalibrationRows: { calls: c([[{ angularSpeed: 125.66370614359172, acceleration: 308.909475 }]]) },
  decodeCalibrationRows: { calls: c(["v1:1200:31.5,abc"]) },
  parseCalibrationCsv: { calls: c(["rpm;g\n1200;31,5"]) },
  // materials and fasteners
  isMaterialId: { calls: c(["al-6061-t6"]) },
  metricThread: { calls: c(["M4"], ["M6", "size"]) },
  threadDiameters: { calls: c([{ nominalDiameter: 0.004, pitch: 0.0007 }]) },
  tensileStressArea: { calls: c([{ nominalDiameter: 0.004, pitch: 0.0007 }]) },
  propertyClass: { calls: c(["8.8"]) },
  minimumUltimateTensileLoad: { calls: c([{ size: "M6", propertyClass: "8.8" }]) },
  proofLoad: { calls: c([{ size: "M4", propertyClass: "8.8" }]) },
  boltShearStrengths: { calls: c([{ yieldStrength: 940000000, tensileStrength: 1040000000 }]) },
  propertyClassShearStrengths: { calls: c([{ propertyClass: "12.9" }]) },
  eurocodeBoltShearResistance: { calls: c([{ area: 0.000245, ultimateStrength: 400000000, shearFactor: 0.6 }]) },
  eurocodeBoltTensionResistance: { calls: c([{ stressArea: 0.000245, ultimateStrength: 400000000 }]) },
  inchThread: { calls: c(["1/4-20"]) },
  unifiedThreadDiameters: { calls: c([{ nominalDiameter: 0.00635, pitch: 0.00127 }]) },
  unifiedTensileStressArea: { calls: c([{ nominalDiameter: 0.00635, pitch: 0.00127 }]) },
  unifiedClass2Limits: { calls: c([{ nominalDiameter: 0.00635, pitch: 0.00127 }]) },
  inchGrade: { calls: c(["sae-5"]) },
  fastenerThread: { calls: c(["M4"], ["1/4-20"]) },
  fastenerGrade: { calls: c(["a574"], ["8.8"]) },
  gradeForSize: { calls: c([{ grade: "sae-8", size: "#10-32" }]) },
  boltStiffness: { calls: c([{ shankArea: 0.3068, stressArea: 0.226, shankLength: 0.75, threadLength: 0.75, youngsModulus: 30000000 }]) },
  memberStiffness: { calls: c([{ youngsModulus: 14000000, nominalDiameter: 0.625, gripLength: 1.5 }]) },
  jointStiffnessFactor: { calls: c([{ boltStiffness: 5210000, memberStiffness: 8950000 }]) },
  tensionJointLoads: { calls: c([{ preload: 10330.5, stiffnessFactor: 0.453734, externalLoad: 2000 }]) },
  tensionJointFactors: { calls: c([{ preload: 14400, stiffnessFactor: 0.368, externalLoad: 6000, proofLoad: 19210 }]) },
  preloadFromTorque: { calls: c([{ torque: 5.10996, nutFactor: 0.2, nominalDiameter: 0.004 }]) },
  tighteningTorque: { calls: c([{ preload: 25000, nutFactor: 0.2, nominalDiameter: 0.75 }]) },
  recommendedPreload: { calls: c([{ proofLoad: 8516.6, use: "reusable" }]) },
  slipResistance: { calls: c([{ preload: 6387.45, frictionCoefficient: 0.2, boltCount: 4, interfaces: 1 }]) },
  boltBendingMoment: { calls: c([{ force: 146, height: 0.005, endCondition: "cantilever" }]) },
  rootBendingStress: { calls: c([{ moment: 0.73, rootDiameter: 0.0031411915 }]) },
  eurocodePackingFactor: { calls: c([{ nominalDiameter: 0.004, packingThickness: 0.005 }]) },
  internalThreadShearArea: { calls: c([{ engagedLength: 0.0254, pitch: 0.00127, externalMajorMin: 0.00611632, internalPitchMax: 0.00564896 }]) },
  materialShearStrength: { calls: c([{ ultimateStrength: 310000000 }]) },
  tappedThreadStrength: {
    calls: () => [[{ thread: api.fastenerThread("M4"), boltTensileStrength: 1220000000, partUltimateStrength: 345000000, engagedLength: 0.008 }]],
    code: ["0.thread"],
  },
  boltedJointCheck: { calls: () => [[jointValues()], [{ ...jointValues(), jointMode: "tension", preloadFrom: "torque", loadFrom: "force" }]] },
  // design file and build sheet
  sectionsIn: { calls: () => [[api.demoDesign()]] },
  migrateDesign: { calls: c([{ format: "whirlbook-design", version: 1, mass: { scalars: { spinSpeed: 250 }, parts: [] } }]) },
  readDesign: { calls: () => [[api.demoDesign()]], runs: 200 },
  readDesignText: { calls: () => [[api.designToText(api.demoDesign())]], runs: 200 },
  designToText: { calls: () => [[api.demoDesign()]] },
  describeProblems: { calls: c([[{ path: "placement.radius", message: "is missing", action: "default-used" }]]), code: ["0"] },
  sectionValues: { calls: () => [[api.demoDesign(), calc("placement")]], code: ["1"] },
  sectionEntries: { calls: () => [[api.demoDesign(), calc("fasteners")]], code: ["1"] },
  newDesign: { calls: c(["Invented test robot"]) },
  cardsFor: { calls: () => [[calc("placement"), api.initialValues(calc("placement")), "metric"]], code: ["0"] },
  runChecks: { calls: () => [[api.demoDesign()]], runs: 100 },
  runChecksWith: { calls: () => [[[], api.demoDesign()]] },
  overallStatus: { calls: () => [[api.runChecks(api.demoDesign())]], code: ["0"] },
  terminalSafe: { calls: c(["a\u0007b\nc"]) },
  linkSpelling: { calls: c(["200 gₙ"], ["8 mΩ"], ["12.7 mm"], ["abc"]) },
  describeReceived: { calls: c([0.012, "mm"], [-3], ["abc"], [null]) },
  describePartProblem: {
    calls: c([new api.CalcInputError({ param: "parts.0.shape.radius", value: -0.005, expected: "greater than 0", unit: "m" })], ["not an error"]),
  },
  buildSheetText: { calls: () => [[api.demoDesign(), api.runChecks(api.demoDesign())]], code: ["1"], runs: 200 },
  demoDesign: { calls: c([]) },
  // calculator descriptors and links
  defineForm: {
    calls: () => [[{ id: "test", title: "Test", chapter: "acceleration", anchor: "test", order: 1, inputs: api.accelerometerPlacementInputs }]],
    code: ["0.inputs"],
  },
  defineCalculator: { calls: () => [[calc("placement"), { run: api.accelerometerPlacement, cards: () => [] }]], code: ["0", "1"] },
  initialValues: { calls: () => [[calc("placement")]], code: ["0"] },
  linkKeys: { calls: () => [[calc("placement")]], code: ["0"] },
  readLink: { calls: () => [[calc("placement"), "?v=1&rpm=2400rpm&r=20mm"]], code: ["0"] },
  writeLink: { calls: () => [[calc("placement"), { texts: { radius: "20 mm" }, choices: {}, extras: {} }, "metric"]], code: ["0"] },
  textsOf: { calls: () => [[calc("placement"), api.initialValues(calc("placement")), "us"]], code: ["0"] },
  valuesOf: { calls: () => [[calc("placement"), { texts: { radius: "20 mm" } }, "metric"]], code: ["0"] },
  linkQuery: { calls: () => [[calc("placement"), api.initialValues(calc("placement")), { system: "metric" }]], code: ["0"] },
  pageLink: { calls: () => [[calc("placement"), api.initialValues(calc("placement")), { system: "us", existing: "a.x=1" }]], code: ["0"] },
  linkFor: { calls: () => [[calc("placement"), api.initialValues(calc("placement"))]], code: ["0"] },
  // weapon
  spinAxis: { calls: c(["horizontal", "front-up"], ["vertical", "counterclockwise"]) },
  angularMomentum: { calls: c([{ inertia: 0.01, spinSpeed: 500 }]) },
  gyroscopicMoment: { calls: c([{ inertia: 0.01, spinSpeed: 500, turnRate: 5 }]) },
  bearingForcePair: { calls: c([{ moment: 9.2, bearingSpan: 0.1 }]) },
  gyroscopicReaction: { calls: c([{ axle: "horizontal", spin: "front-up", motion: "yaw-left", inertia: 0.01, spinSpeed: 500, rate: 5 }]) },
  rollMomentWhileTurning: { calls: c([{ inertia: 0.01, spinSpeed: 500, spin: "front-up", turnRate: 5, robotMass: 10, forwardSpeed: 1, comHeight: 0.05 }]) },
  requireComInsideTrack: { calls: c([0.01, 0.3]) },
  weightRestoringMoment: { calls: c([{ robotMass: 10, trackWidth: 0.3, side: "left" }]) },
  liftTurnRate: { calls: c([{ inertia: 0.01, spinSpeed: 500, spin: "front-up", robotMass: 10, trackWidth: 0.3, turn: "left" }]) },
  differentialDriveTurnRate: { calls: c([{ leftWheelSpeed: 1, rightWheelSpeed: 2, trackWidth: 0.25 }]) },
  driveTurnRateLimit: { calls: c([{ wheelTopSpeed: 3, trackWidth: 0.3 }]) },
  precessionRate: { calls: c([{ moment: 30, inertia: 0.05, spinSpeed: 209.44 }]) },
  precessionTime: { calls: c([{ angle: 0.5, moment: 30, inertia: 0.05, spinSpeed: 209.44 }]) },
  weaponTurnCheck: { calls: () => [[api.DEMO_VERTICAL_SPINNER_TURN]] },
  roundSection: { calls: c([{ diameter: 0.012 }]) },
  bendingStress: { calls: c([{ moment: 30, diameter: 0.012 }]) },
  torsionalStress: { calls: c([{ torque: 10, diameter: 0.012 }]) },
  simplySupportedPointLoad: { calls: c([{ force: 2000, span: 0.06, position: 0.03, youngsModulus: 200000000000, secondMoment: 1.0179e-9 }]) },
  simplySupportedCouple: { calls: c([{ moment: 60, span: 0.06, position: 0.02, youngsModulus: 200000000000, secondMoment: 1.0179e-9 }]) },
  overhungPointLoad: { calls: c([{ force: 1000, span: 0.04, overhang: 0.02, youngsModulus: 200000000000, secondMoment: 1.0179e-9 }]) },
  overhungCouple: { calls: c([{ moment: 20, span: 0.04, overhang: 0.02, youngsModulus: 200000000000, secondMoment: 1.0179e-9 }]) },
  cantileverEndLoad: { calls: c([{ force: 5000, length: 0.03, youngsModulus: 200000000000, secondMoment: 7.854e-9 }]) },
  lifeExponent: { calls: c([{ bearingType: "roller" }]) },
  equivalentDynamicLoad: { calls: c([{ radialLoad: 1000, axialLoad: 400, radialFactor: 0.56, axialFactor: 1.71 }]) },
  equivalentStaticLoad: { calls: c([{ radialLoad: 1000, axialLoad: 1000 }]) },
  basicRatingLife: { calls: c([{ dynamicLoadRating: 16, equivalentLoad: 2, bearingType: "ball" }]) },
  ratingLifeHours: { calls: c([{ ratingLife: 91.125, angularSpeed: 942.48 }]) },
  requiredDynamicLoadRating: { calls: c([{ equivalentLoad: 10279, ratingLife: 1440, bearingType: "roller" }]) },
  staticSafetyFactor: { calls: c([{ staticLoadRating: 2360, staticEquivalentLoad: 1800 }]) },
  staticSafetyGuide: { calls: c([{ bearingType: "ball" }]) },
  bearingCheck: {
    calls: c([{ bearingType: "ball", dynamicLoadRating: 5400, staticLoadRating: 2360, radialLoad: 1200, shockRadialLoad: 1800, angularSpeed: 942.48 }]),
  },
  weaponShaftCheck: { calls: () => [[api.DEMO_SHAFT]] },
  effectiveTipMass: { calls: c([{ inertia: 0.05, tipRadius: 0.1 }]) },
  rotorImpact: { calls: c([{ inertia: 0.05, spinSpeed: 500, tipRadius: 0.1, targetMass: 13.6, restitution: 0.2 }]) },
  impactForceEstimate: { calls: c([{ energy: 3600, stoppingDistance: 0.01 }]) },
  halfSinePeakForce: { calls: c([{ impulse: 2, duration: 0.001 }]) },
  weaponHit: { calls: () => [[api.DEMO_HIT]] },
  // steering
  pulseTrainFundamental: { calls: c([{ windowWidth: 1.5707963267948966 }]) },
  kinematicTranslationSpeed: { calls: c([{ depth: 1, windowWidth: 1.5707963267948966 }]) },
  kinematicRimSpeedDepth: { calls: c([{ dutyStep: 0.1, voltage: 12, kv: 100, wheelRadius: 0.02, gearRatio: 2 }]) },
  differentialDriveKinematics: { calls: c([{ leftSpeed: 1, rightSpeed: 2, track: 0.25 }]) },
  differentialDriveWheelSpeeds: { calls: c([{ speed: 0, turnRate: Math.PI, track: 0.762 }]) },
  latencyDirectionError: { calls: c([{ spinSpeed: 314, latency: 0.0005, loopRate: 2000, phaseLead: 0.1 }]) },
  phaseLeadForLatency: { calls: c([{ spinSpeed: 314.159, latency: 0.0005, loopRate: 2000 }]) },
  wheelGyroscopicMoment: { calls: c([{ wheelInertia: 0.0140625, wheelSpeed: 104.72, spinSpeed: 6.2832 }]) },
  rollingWheelGyroscopicMoment: {
    calls: c([{ wheelInertia: 0.000004, rotorInertia: 0.000003, wheelRadius: 0.018, contactRadius: 0.07, spinSpeed: 314.16, gearRatio: 2, rotorSense: -1 }]),
  },
  gyroscopicBearingForce: { calls: c([{ moment: 9.2528, bearingSpacing: 0.1 }]) },
  skidLiftSpeed: { calls: c([{ robotMass: 1.5, wheelRadius: 0.018, wheelInertia: 4e-6, rotorInertia: 3e-6, gearRatio: 1, rotorSense: 1 }]) },
  wheelNormalLoads: {
    calls: c([{ wheelCount: 1, robotMass: 1.5, wheelInertia: 0.000004, rotorInertia: 0.000003, wheelRadius: 0.018, contactRadius: 0.07, spinSpeed: 100 }]),
  },
  drivePulseBias: { calls: c([{ pulseForce: 3, robotMass: 1.5, windowWidth: 1.57, oppositeWindow: true, wheelCount: 2, sensorAngle: 0.5 }]) },
  drivePulseHeadingDrift: { calls: c([{ bias: -0.5, angularSpeed: 314.16, sensorRadius: 0.012 }]) },
  brushTyreForce: {
    calls: c([{ slipVelocityX: 0.3, slipVelocityY: 0.4, rollingSpeed: 0, normalLoad: 33.34261, frictionCoefficient: 0.9, slipStiffness: 300 }]),
  },
  steadyDuty: {
    calls: c([{ openCircuitVoltage: 12, packResistance: 0, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 50, motorsPerGroup: 1 }, 2, 1000, 2]),
  },
  steeringUnit: { calls: c(["spinSpeed"]) },
  validateSteeringInput: { calls: () => [[api.DEMO_STEERING_SPINNER]] },
  readSteeringOptions: { calls: c([{ relativeTolerance: 1e-6, maxSteps: 1000, revolutions: false }], [undefined]) },
  simulateSteering: { calls: () => [[quickSteering(), { maxSteps: 20_000 }]], runs: 30 },
  sweepSteering: { calls: () => [[{ input: quickSteering(), windowWidths: [1, 2], depths: [0.1], duration: 0.05 }]], runs: 20 },
  steeringPath: { calls: () => [[{ input: quickSteering() }]], runs: 20 },
  startSteeringSweep: { calls: () => [[{ input: quickSteering(), windowWidths: [1, 2], depths: [0.1], duration: 0.05 }]], runs: 20 },
  steeringEstimate: { calls: () => [[{ ...api.DEMO_STEERING_SPINNER }], [{ ...api.DEMO_STEERING_SPINNER, wheelCount: 1, oppositeWindow: 0, windowWidth: 4 }]] },
};

/** Constructors the public API exports, with valid arguments; the error classes are the contract's own vocabulary. */
const CONSTRUCTORS: Record<PublicClass, Entry | "error class"> = {
  CalcInputError: "error class",
  OdeNonFiniteError: "error class",
  DormandPrince45: { calls: c([2], [1]) },
  SteeringModel: { calls: () => [[api.DEMO_STEERING_SPINNER]] },
  PackSolver: {
    calls: c([{ openCircuitVoltage: 12, packResistance: 0.04, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 50, motorsPerGroup: 1 }, 2]),
  },
};

/**
 * Entry functions with an input declaration: each is also called with every declared input drawn
 * inside its declared range, and must refuse every value outside it.
 */
const DECLARED: Partial<Record<PublicFunction, InputSpecs>> = {
  accelerometerPlacement: api.accelerometerPlacementInputs,
  radiusTrim: api.radiusTrimInputs,
  quickBalance: api.quickBalanceInputs,
  headingDrift: api.headingDriftInputs,
  opposedSensorsCheck: api.opposedSensorsInputs,
  headingTiming: api.headingTimingInputs,
  headingSmoothing: api.headingSmoothingInputs,
  smoothingTradeoffSeries: api.headingSmoothingInputs,
  massBalance: api.massBalanceInputs,
  fastenerCheck: api.fastenerCheckInputs,
  rimCheck: api.rimCheckInputs,
  boltedJointCheck: api.boltedJointInputs,
  simulateSpinUp: api.drivetrainInputs,
  validateDrivetrainInput: api.drivetrainInputs,
  weaponTurnCheck: api.weaponTurnInputs,
  weaponShaftCheck: api.weaponShaftInputs,
  weaponHit: api.weaponHitInputs,
  validateSteeringInput: api.steeringInputs,
  simulateSteering: api.steeringInputs,
  fitCalibration: api.calibrationFitInputs,
  steeringPath: api.steeringInputs,
  sweepSteering: api.steeringInputs,
  startSteeringSweep: api.steeringInputs,
  steeringEstimate: api.steeringEstimateInputs,
};
/** Entries that take their declared values in another argument than the first. */
const DECLARED_AT: Partial<Record<PublicFunction, readonly (string | number)[]>> = {
  fitCalibration: [1],
  steeringPath: [0, "input"],
  sweepSteering: [0, "input"],
  startSteeringSweep: [0, "input"],
};

/** The object of declared values inside a call (a copy the caller may change). */
function declaredObject(args: unknown[], name: string): Record<string, unknown> {
  const [first, ...rest] = DECLARED_AT[name as PublicFunction] ?? [0];
  let node = args as unknown as Record<string | number, unknown>;
  for (const key of [first!, ...rest].slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  const last = [first!, ...rest].at(-1)!;
  node[last] = { ...(node[last] as object) };
  return node[last] as Record<string, unknown>;
}

/** Every declaration the API exports (the `…Inputs` objects), so that none is left out of `DECLARED`. */
const EXPORTED_DECLARATIONS = Object.entries(api).filter(
  ([name, value]) =>
    /Inputs$/.test(name) && typeof value === "object" && value !== null && Object.values(value).every((s) => typeof s === "object" && "urlKey" in s),
);

const RUN_SCALE = Number(process.env.CONTRACT_RUNS ?? 1);
const SEED = Number(process.env.CONTRACT_SEED ?? 20_240_611);
const TALLY = process.env.CONTRACT_TALLY === "1";
const DEFAULT_RUNS = 600;

/** Every end of every declared range, drawn often as a value. */
const RANGE_ENDS = [...new Set(EXPORTED_DECLARATIONS.flatMap(([, specs]) => Object.values(specs as InputSpecs).flatMap((s) => [s.min, s.max])))];

type Outcome = { ok: true; returned: boolean } | { ok: false; kind: "non-finite" | "wrong-error"; detail: string };

/** Calls `fn` and judges the outcome against the contract. */
function judge(run: () => unknown): Outcome {
  let result: unknown;
  try {
    result = run();
  } catch (error) {
    if (error instanceof CalcInputError) return { ok: true, returned: false };
    const name = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
    return { ok: false, kind: "wrong-error", detail: name.slice(0, 200) };
  }
  const place = nonFinitePlace(result);
  return place === null ? { ok: true, returned: true } : { ok: false, kind: "non-finite", detail: place };
}

const shown = (args: unknown[]): string => {
  const text = JSON.stringify(args, (_k, v) =>
    v === undefined
      ? "<undefined>"
      : typeof v === "number" && !Number.isFinite(v)
        ? String(v)
        : typeof v === "function"
          ? "<function>"
          : ArrayBuffer.isView(v)
            ? "<typed array>"
            : v,
  );
  return text.length > 600 ? `${text.slice(0, 600)}…` : text;
};

/** Arguments built from an entry's valid calls: mutated, or (for a declared entry) drawn inside the declared ranges and then perhaps mutated. */
function callsArb(name: string, entry: Entry): fc.Arbitrary<unknown[]> {
  const seeds = entry.calls();
  const code = new Set(entry.code ?? []);
  const seedArb = fc.constantFrom(...seeds);
  const mutated = fc.tuple(seedArb, mutationsArb(RANGE_ENDS)).map(([args, m]) => mutateCall(args, m, code));
  const specs = DECLARED[name as PublicFunction];
  if (!specs) return mutated;
  // Declared inputs drawn anywhere in their ranges (ends and subnormals included): one to three of
  // them beside the valid call's other values, or all at once.
  const drawn = (names: string[]) => fc.record(Object.fromEntries(names.map((k) => [k, inputArb(specs[k]!)])));
  const some = fc.subarray(Object.keys(specs), { minLength: 1, maxLength: Math.min(3, Object.keys(specs).length) }).chain(drawn);
  const values = fc.oneof({ weight: 3, arbitrary: some }, { weight: 1, arbitrary: drawn(Object.keys(specs)) });
  const inRange = fc.tuple(seedArb, values).map(([args, drawnValues]) => {
    const copy = mutateCall(args, [], code);
    Object.assign(declaredObject(copy, name), drawnValues);
    return copy;
  });
  return fc.oneof(
    mutated,
    inRange,
    fc.tuple(inRange, mutationsArb(RANGE_ENDS)).map(([args, m]) => mutateCall(args, m, code)),
  );
}

const tally = new Map<string, { calls: number; returned: number; nonFinite: number; wrongError: number; first: string }>();

function checkContract(name: string, entry: Entry, invoke: (args: unknown[]) => unknown): void {
  const runs = Math.max(1, Math.round((entry.runs ?? DEFAULT_RUNS) * RUN_SCALE));
  const counts = { calls: 0, returned: 0, nonFinite: 0, wrongError: 0, first: "" };
  tally.set(name, counts);
  fc.assert(
    fc.property(callsArb(name, entry), (args) => {
      counts.calls++;
      const outcome = judge(() => invoke(args));
      if (outcome.ok) {
        if (outcome.returned) counts.returned++;
        return true;
      }
      if (outcome.kind === "non-finite") counts.nonFinite++;
      else counts.wrongError++;
      const message = `${name} ${outcome.kind === "non-finite" ? `returned a non-finite number at ${outcome.detail}` : `threw ${outcome.detail}`}, given ${shown(args)}`;
      counts.first ||= message;
      if (TALLY && ONLY) console.log(message.replace(shown(args), JSON.stringify(args)));
      if (TALLY) return true;
      throw new Error(message);
    }),
    { numRuns: runs, seed: SEED, endOnFailure: true },
  );
}

afterAll(() => {
  const rows = [...tally.entries()];
  const sum = (key: "calls" | "returned" | "nonFinite" | "wrongError") => rows.reduce((s, [, r]) => s + r[key], 0);
  if (!TALLY) return;
  const bad = rows.filter(([, r]) => r.nonFinite + r.wrongError > 0);
  console.log(
    [
      `contract tally: ${rows.length} functions, ${sum("calls")} calls (${sum("returned")} returned a result, the rest refused), ${sum("nonFinite")} non-finite results, ${sum("wrongError")} errors other than CalcInputError`,
      `  fewest results: ${rows
        .map(([n, r]) => [n, r.returned / r.calls] as const)
        .sort((a, b) => a[1] - b[1])
        .slice(0, 25)
        .map(([n, share]) => `${n} ${(100 * share).toFixed(0)} %`)
        .join(", ")}`,
      ...bad.map(([n, r]) => `  ${n}: ${r.calls} calls, ${r.nonFinite} non-finite, ${r.wrongError} wrong errors; first: ${r.first.slice(0, 500)}`),
    ].join("\n"),
  );
});

const functionNames = Object.entries(api)
  .filter(([, v]) => typeof v === "function" && !/^class\b/.test(Function.prototype.toString.call(v)))
  .map(([k]) => k)
  .sort();
/** `CONTRACT_ONLY=simulateSpinUp,normalCdf` runs the contract for those functions alone. */
const ONLY = process.env.CONTRACT_ONLY?.split(",");
const chosen = (name: string) => !ONLY || ONLY.includes(name);
const classNames = Object.entries(api)
  .filter(([, v]) => typeof v === "function" && /^class\b/.test(Function.prototype.toString.call(v)))
  .map(([k]) => k)
  .sort();

describe("the calc contract at the extremes", () => {
  it("has valid calls for every function and constructor calc/index.ts exports, and for nothing else", () => {
    expect(Object.keys(CALLS).sort()).toEqual(functionNames);
    expect(Object.keys(CONSTRUCTORS).sort()).toEqual(classNames);
  });

  it("knows the entry of every input declaration the API exports", () => {
    const covered = new Set(Object.values(DECLARED));
    const missing = EXPORTED_DECLARATIONS.filter(([, specs]) => !covered.has(specs as InputSpecs)).map(([name]) => name);
    expect(missing).toEqual([]);
  });

  it("starts from calls that are valid: each returns only finite numbers", () => {
    for (const [name, entry] of Object.entries(CALLS) as [PublicFunction, Entry][]) {
      for (const args of entry.calls()) {
        const fn = fnOf(name);
        const outcome = judge(() => fn(...args));
        expect(outcome, `${name}(${shown(args)})`).toEqual({ ok: true, returned: true });
        expect(nonFinitePlace(fn(...args)), name).toBeNull();
      }
    }
  }, 60_000);

  it.each(functionNames.filter(chosen))(
    "%s returns only finite numbers or throws CalcInputError, whatever it is given",
    (name) => {
      const entry = CALLS[name as PublicFunction];
      const fn = fnOf(name);
      checkContract(name, entry, (args) => fn(...args));
    },
    60_000,
  );

  it.each(classNames.filter((n) => CONSTRUCTORS[n as PublicClass] !== "error class"))(
    "new %s gives an instance holding only finite numbers, or throws CalcInputError",
    (name) => {
      const Ctor = API[name] as new (...args: unknown[]) => unknown;
      checkContract(`new ${name}`, CONSTRUCTORS[name as PublicClass] as Entry, (args) => new Ctor(...args));
    },
    60_000,
  );
});

describe("every entry refuses what its input declaration refuses, naming the input", () => {
  it.each(Object.keys(DECLARED))(
    "%s",
    (name) => {
      const specs = DECLARED[name as PublicFunction]!;
      const entry = CALLS[name as PublicFunction];
      const fn = fnOf(name);
      const [base] = entry.calls();
      const names = Object.keys(specs);
      const runs = Math.max(names.length * 4, Math.round(60 * RUN_SCALE));
      fc.assert(
        fc.property(
          fc.constantFrom(...names).chain((input) => fc.tuple(fc.constant(input), invalidInputArb(specs[input] as InputSpec))),
          ([input, value]) => {
            const args = mutateCall(base!, []);
            declaredObject(args, name)[input] = value;
            try {
              fn(...args);
            } catch (error) {
              expect(error, `${input} = ${value}`).toBeInstanceOf(CalcInputError);
              expect((error as CalcInputError).param, `${input} = ${value}`).toBe(input);
              return;
            }
            throw new Error(`${name} accepted ${input} = ${value}, outside its declared range`);
          },
        ),
        { numRuns: runs, seed: SEED },
      );
    },
    60_000,
  );
});

/** Runs `run`, expecting a CalcInputError naming `param`; returns it for further checks. */
function refusal(run: () => unknown, param: string): CalcInputError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(CalcInputError);
    expect((error as CalcInputError).param).toBe(param);
    return error as CalcInputError;
  }
  throw new Error(`expected a CalcInputError naming ${param}`);
}

describe("regressions: one case for each class of fault the contract found", () => {
  it("a closed form that would overflow names the input that took it there (ω = 1e300 rad/s)", () => {
    const error = refusal(() => api.centripetalAcceleration({ angularSpeed: 1e300, radius: 0.79 }), "angularSpeed");
    expect(error.message).toBe("angularSpeed must be small enough for the acceleration to stay finite (got 1e+300 rad/s)");
    refusal(() => api.radiusForAcceleration({ angularSpeed: 1e-300, acceleration: 3904 }), "angularSpeed");
    refusal(() => api.radPerSecondToRpm(Number.MAX_VALUE), "value");
  });

  it("a special function answers in its far tails, or names its input where the answer leaves the doubles", () => {
    expect(api.normalCdf({ z: -1e300 })).toBe(0);
    expect(api.normalCdf({ z: 1e300 })).toBe(1);
    // ln Γ(x) = −ln x − γx near 0 (abramowitz-stegun-1964 6.1.33): −ln(5e-324) = 744.44 (Math.log).
    expect(api.logGamma(Number.MIN_VALUE)).toBeCloseTo(-Math.log(Number.MIN_VALUE), 10);
    refusal(() => api.logGamma(Number.MAX_VALUE), "x");
  });

  it("a part whose volume underflows is refused by the dimension that took it there, not given a NaN centre", () => {
    const plate = { name: "plate", shape: { kind: "plate" as const, length: 0.04, width: 0.02, angle: 0 }, x: 0.01, y: 0, z: 0 };
    const thin = { ...plate, mass: { kind: "material" as const, material: "al-6061-t6" as const, thickness: Number.MIN_VALUE } };
    refusal(() => api.massProperties([thin]), "parts[0].mass.thickness");
    // A mass near the smallest doubles keeps its centre: the sums are scaled (by a power of two) before they round.
    const tiny = api.massProperties([{ ...plate, mass: { kind: "given", mass: 1e-320 } }]);
    expect(tiny.centreX).toBe(0.01);
  });

  it("a composite entry refuses what its input declaration refuses (a top speed of 1e300 rad/s, declared up to 6283)", () => {
    const values = api.initialValues(calc("placement"));
    refusal(() => api.accelerometerPlacement({ ...values, topSpeed: 1e300 } as never), "topSpeed");
    refusal(() => api.massBalance({ ...massInput(), spinSpeed: 1e300 }), "spinSpeed");
    refusal(() => api.fitCalibration(api.demoCalibrationRows(), { confidence: 0.1 }), "confidence");
  });

  it("an in-range edge value that would give an infinite result is refused, also through a design file (placement.lowSpeed = 5e-324)", () => {
    const values = api.initialValues(calc("placement"));
    const error = refusal(() => api.accelerometerPlacement({ ...values, lowSpeed: Number.MIN_VALUE } as never), "lowSpeed");
    expect(error.message).toMatch(/^lowSpeed must be large enough for the smallest radius to stay finite/);
    const demo = api.demoDesign();
    const reading = api.readDesign({ ...demo, placement: { ...(demo.placement as object), lowSpeed: Number.MIN_VALUE } });
    if (!reading.ok) throw new Error("the design should read: 5e-324 rad/s lies inside the declared range");
    const card = api.runChecks(reading.design).find((r) => r.section === "placement")!;
    expect(card.status).toBe("fails");
    expect(card.margin).toMatch(/^Could not compute: lowSpeed must be large enough/);
  });

  it("an unknown unit, kind or option is a CalcInputError, not a TypeError", () => {
    refusal(() => api.toSI(1, "furlong" as never), "from");
    refusal(() => api.fromSI(1, "furlong" as never), "to");
    refusal(() => api.convert(1, "mm", "kg"), "to");
    refusal(() => api.displayUnit("colour" as never, "metric"), "kind");
    refusal(() => api.parseQuantity("3 mm", "length", "furlong" as never), "defaultUnit");
    refusal(() => api.steeringUnit("colour" as never), "name");
  });

  it("a precision outside 1 to 100 figures is a CalcInputError, not a RangeError", () => {
    refusal(() => api.formatNumber(1, 0), "significant");
    refusal(() => api.formatNumber(1, 101), "significant");
    refusal(() => api.formatQuantity(0.1, "length", { significant: 2.5 }), "significant");
  });

  it("a declaration, a design version or a name the code does not know is a CalcInputError, not a plain Error", () => {
    refusal(() => api.defineInputs({ x: { label: "X", kind: "length", min: 0, max: 1, default: 2, urlKey: "x" } }), "x.default");
    refusal(() => api.migrateDesign({ format: "whirlbook-design", version: 0 }), "version");
    refusal(() => requireDeclared(api.accelerometerPlacementInputs["noSuchInput" as "radius"], "noSuchInput", 1), "noSuchInput");
    refusal(
      () =>
        api.defineForm({
          id: "t",
          title: "T",
          chapter: "c",
          anchor: "a",
          order: 1,
          inputs: { a: { ...api.accelerometerPlacementInputs.radius, urlKey: "v" } },
        }),
      "urlKey",
    );
  });

  it("null or undefined in place of an argument is a CalcInputError naming it, not a TypeError", () => {
    refusal(() => api.centripetalAcceleration(null as never), "input");
    refusal(() => api.simulateSpinUp(undefined as never), "input");
    refusal(() => api.toSI(undefined as never, "mm"), "value");
    refusal(() => api.terminalSafe(null as never), "text");
    refusal(() => api.linkKeys(null as never), "calc");
    refusal(() => api.addPart(undefined as never, null as never), "parts");
    expect(api.readDesignText(null as never)).toEqual({ ok: false, problems: [expect.objectContaining({ action: "not-read" })] });
  });

  it("an integrator's non-finite derivative is a CalcInputError naming the function that gave it", () => {
    const error = refusal(
      () =>
        api.solveOde({
          rhs: (_t, _y, f) => {
            f[0] = Number.NaN;
          },
          t0: 0,
          y0: [1],
          tEnd: 1,
        }),
      "rhs",
    );
    expect(error).toBeInstanceOf(api.OdeNonFiniteError);
  });
});

/** Field names (separated by spaces), each with the unit. */
const fields = (unit: string, names: string) => names.split(" ").map((name) => [name, unit] as const);
/**
 * The SI unit of every field the public functions take outside an input declaration, by name, as
 * each function's documentation states it (its @param lines; "[-]" is a pure number, written ""):
 * a refusal of the field reports its value in this unit. Declared inputs take their kind's unit.
 * A name that means two things is told apart by function in FIELD_UNIT_IN.
 */
const FIELD_UNIT: ReadonlyMap<string, string> = new Map([
  ...fields("", "atol axialFactor bits boltCount count degreesOfFreedom dutyStep efficiency failBelow fraction"),
  ...fields("", "frictionCoefficient from gearRatio gripShare impactors interfaces intervals margin marginalBelow"),
  ...fields("", "maxSteps motorCount motorsPerGroup nutFactor points poisson probability radialFactor ratingLife"),
  ...fields("", "ratio relativeTolerance resolution restitution rotorSense rtol safetyFactor scaleError shearFactor"),
  ...fields("", "shearRatio sideGrip smoothingFactor stiffnessFactor t t0 tEnd to value wheelCount windowLength"),
  ...fields("A", "currentLimit noLoadCurrent"),
  ...fields("Hz", "loopRate"),
  ...fields("J", "energy"),
  ...fields("kg", "mass partMass robotMass targetMass totalMass"),
  ...fields("kg·m", "firstMomentX firstMomentY"),
  ...fields("kg·m²", "couple inertia motorRotorInertia productXZ productYZ rotorInertia wheelInertia"),
  ...fields("kg/m³", "density"),
  ...fields("m", "assumedRadius bearingSpacing bearingSpan centreX centreY comHeight contactRadius diameter"),
  ...fields("m", "engagedLength externalMajorMin gripLength height innerRadius internalPitchMax length maxRadius"),
  ...fields("m", "nominalDiameter offset outerRadius overhang packingThickness pitch planeZ1 planeZ2 position radius"),
  ...fields("m", "radius1 radius2 rootDiameter sensorRadius sensorX sensorY shankLength span stoppingDistance"),
  ...fields("m", "supportRadius targetOffset threadLength tipRadius track trackWidth trueRadius wheelRadius x y z"),
  ...fields("m/s", "closingSpeed depth forwardSpeed grade leftSpeed leftWheelSpeed rightSpeed rightWheelSpeed"),
  ...fields("m/s", "rollingSpeed slipVelocityX slipVelocityY speed wheelTopSpeed"),
  ...fields("m/s²", "acceleration bias biasCorrection fullScale spike step"),
  ...fields("m²", "area shankArea stressArea"),
  ...fields("m⁴", "secondMoment"),
  ...fields("N", "axialLoad dynamicLoadRating equivalentLoad externalLoad force normalForce normalLoad preload"),
  ...fields("N", "proofLoad pulseForce radialLoad shockRadialLoad slipStiffness staticEquivalentLoad staticLoadRating"),
  ...fields("N·m", "frictionTorque moment torque"),
  ...fields("N·m·s/rad", "viscousFriction"),
  ...fields("N·m/A", "torqueConstant"),
  ...fields("N·s", "impulse"),
  ...fields("N/m", "boltStiffness memberStiffness"),
  ...fields("Pa", "boltTensileStrength normalStress partUltimateStrength shearStress strength stress tensileStrength"),
  ...fields("Pa", "ultimateStrength yieldStrength youngsModulus"),
  ...fields("rad", "angle phaseLead sensorAngle targetArc targetStep tilt windowWidth"),
  ...fields("rad/(s·V)", "kv"),
  ...fields("rad/s", "angularSpeed budget finalSpeed highSpeed lowSpeed maxSpeed rate spinSpeed topSpeed turnRate"),
  ...fields("rad/s", "wheelSpeed"),
  ...fields("s", "duration latency onTime samplePeriod time timeConstant"),
  ...fields("V", "openCircuitVoltage voltage"),
  ...fields("Ω", "motorResistance packResistance resistance"),
]);
const FIELD_UNIT_IN: Partial<Record<PublicFunction, Record<string, string>>> = {
  // The spread of the readings a sensor must count (an acceleration), not a beam's span.
  sensorCountSize: { span: "m/s²" },
  // The standard normal variable.
  normalCdf: { z: "" },
};
/** A refusal a person can read: it says what was expected, in words, without a program's leftovers. */
const readable = (error: CalcInputError): boolean =>
  error.expected.trim().length > 2 && !/undefined|\[object |NaN(?! )|\bnull\b|^\s|\s$/.test(error.expected) && error.unit.trim() === error.unit;

/** The SI unit a field is refused in: a declared input's kind's, or the documented one. */
function fieldUnit(name: PublicFunction, key: string): string | undefined {
  const spec = DECLARED[name]?.[key];
  if (!spec) return FIELD_UNIT_IN[name]?.[key] ?? FIELD_UNIT.get(key);
  const si = api.unitsOfKind(spec.kind).find((u) => api.unitDef(u).factor === 1);
  return si === undefined ? "" : api.unitDef(si).symbol;
}

describe("every public function names the field of a number it refuses", () => {
  // Functions that take declarations, forms or documents rather than physical inputs (their numbers
  // are a declaration's limits or a document's version), and the sweep point, which names the input
  // it sweeps.
  const NOT_INPUTS = new Set([
    "fieldUnit",
    "describeRange",
    "checkValue",
    "readField",
    "defaultText",
    "exactFieldText",
    "urlText",
    "sectionsIn",
    "migrateDesign",
    "readDesign",
    "designToText",
    "sectionValues",
    "sectionEntries",
    "cardsFor",
    "runChecks",
    "buildSheetText",
    "defineForm",
    "defineCalculator",
    "sweepPoint",
    // Calculator descriptors: their numbers are an order, not an input.
    "initialValues",
    "linkKeys",
    "readLink",
    "writeLink",
    "textsOf",
    "valuesOf",
    "linkQuery",
    "pageLink",
    "linkFor",
  ]);
  /** Fields a valid call carries that the function does not read (a shared parameters object). */
  const UNREAD: Partial<Record<PublicFunction, readonly string[]>> = { steadyDuty: ["currentLimit"] };

  it("each top-level number of a valid call, made NaN, is refused by a CalcInputError naming it (or its path ending in it), in its SI unit", () => {
    const wrong: string[] = [];
    let checked = 0;
    for (const [name, entry] of Object.entries(CALLS) as [PublicFunction, Entry][]) {
      if (NOT_INPUTS.has(name)) continue;
      const [base] = entry.calls();
      if (!base || typeof base[0] !== "object" || base[0] === null || Array.isArray(base[0])) continue;
      // A function with an input declaration reads the declared fields; the valid call may carry more.
      const declared = DECLARED[name];
      for (const [key, value] of Object.entries(base[0] as Record<string, unknown>)) {
        if (typeof value !== "number" || (declared && !(key in declared)) || UNREAD[name]?.includes(key)) continue;
        const args = mutateCall(base, []);
        (args[0] as Record<string, unknown>)[key] = Number.NaN;
        checked++;
        try {
          fnOf(name)(...args);
          wrong.push(`${name}.${key}: accepted NaN`);
        } catch (error) {
          if (!(error instanceof CalcInputError)) wrong.push(`${name}.${key}: ${String(error)}`);
          else if (error.param !== key && !error.param.endsWith(`.${key}`)) wrong.push(`${name}.${key}: named ${error.param}`);
          else if (!Number.isNaN(error.value)) wrong.push(`${name}.${key}: reported the value ${String(error.value)}`);
          else if (!readable(error)) wrong.push(`${name}.${key}: ${error.message}`);
          else {
            // In the field's SI unit, as the message shows it ("m/s²"): a declared input's kind's, any
            // other field's as its documentation gives it.
            const unit = fieldUnit(name, key);
            if (unit === undefined) wrong.push(`${name}.${key}: no unit listed for this field in FIELD_UNIT`);
            else if (error.unit !== unit) wrong.push(`${name}.${key}: unit ${JSON.stringify(error.unit)}, expected ${JSON.stringify(unit)}`);
          }
        }
      }
    }
    expect(wrong).toEqual([]);
    // Every public function with an object of numbers is in it: some 800 fields.
    expect(checked).toBeGreaterThan(750);
  });
});

describe("every public function names the field that took a result out of range", () => {
  it("each top-level number of a valid call set to ±1e300 or 1e-300, then all of them at once, is either used or refused naming a field of the call, its value and unit, and the quantity it would overflow", () => {
    const wrong: string[] = [];
    let refused = 0;
    for (const [name, entry] of Object.entries(CALLS) as [PublicFunction, Entry][]) {
      // The sweep point names the input it sweeps (its `value` is that input's value).
      if (name === "sweepPoint") continue;
      const [base] = entry.calls();
      if (!base || typeof base[0] !== "object" || base[0] === null || Array.isArray(base[0])) continue;
      const given = base[0] as Record<string, unknown>;
      const fields = Object.keys(given);
      const numbers = fields.filter((key) => typeof given[key] === "number");
      // One number at a time; then every number at once, so that a product or quotient of two
      // inputs (ω·r, S/ρ) also leaves the doubles.
      const variants: [string, Record<string, number>][] = [
        ...numbers.flatMap((key) => [1e300, -1e300, 1e-300].map((x): [string, Record<string, number>] => [`${key} = ${x}`, { [key]: x }])),
        ...[1e300, 1e-300].map((x): [string, Record<string, number>] => [`every number = ${x}`, Object.fromEntries(numbers.map((key) => [key, x]))]),
      ];
      for (const [label, changes] of variants) {
        const args = mutateCall(base, []);
        Object.assign(args[0] as object, changes);
        const changed = Object.keys(changes);
        const one = changed.length === 1 ? changed[0] : undefined;
        try {
          fnOf(name)(...args);
        } catch (error) {
          if (!(error instanceof CalcInputError)) {
            wrong.push(`${name}.${label}: ${String(error)}`);
            continue;
          }
          refused++;
          const top = error.param.split(/[.[]/)[0]!;
          const sent = (args[0] as Record<string, unknown>)[error.param];
          if (!fields.includes(top) && !fields.some((f) => error.param.endsWith(`.${f}`))) wrong.push(`${name}.${label}: named ${error.param}`);
          else if (!readable(error)) wrong.push(`${name}.${label}: ${error.message}`);
          else if (/for the {2}to stay finite|^\S+ must be {2}/.test(error.message)) wrong.push(`${name}.${label}: ${error.message}`);
          else if (typeof sent === "number" && !Object.is(error.value, sent))
            wrong.push(`${name}.${label}: ${error.param} reported as ${String(error.value)}, sent ${sent}`);
          else if (one !== undefined && / enough for the .+ to stay finite$/.test(error.expected) && error.param !== one && !error.param.endsWith(`.${one}`))
            // The one number changed is the one that took the result out of the doubles: blaming
            // another (a valid value of its own) would send the user to the wrong field.
            wrong.push(`${name}.${label}: an overflow blamed ${error.param}, not ${one}`);
          else if (fields.includes(error.param)) {
            // The field it names, in that field's SI unit.
            const unit = fieldUnit(name, error.param);
            if (unit !== undefined && error.unit !== unit)
              wrong.push(`${name}.${label}: ${error.param} in ${JSON.stringify(error.unit)}, expected ${JSON.stringify(unit)}`);
          }
        }
      }
    }
    expect(wrong).toEqual([]);
    expect(refused).toBeGreaterThan(1000);
  });
});
