/**
 * The demo design that ships with the handbook: an invented 1.4 kg whole-body spinner (not a real
 * robot), assembled from the chapters' own demo data so that every check has something to show.
 * Its sensor radius and inertia come from its own mass layout, so the sections agree.
 */
import { initialValues } from "../core/calculator.ts";
import { form as fastenerCalculator } from "../calculators/fasteners.ts";
import { form as rimCalculator } from "../calculators/rims.ts";
import { DESIGN_FORMAT, DESIGN_VERSION, type Design } from "./design.ts";
import { demoRobotParts } from "../mass/demo.ts";
import { massBalanceInputs } from "../mass/mass-balance.ts";
import { massProperties } from "../mass/properties.ts";
import { DEMO_SPINNER } from "../drivetrain/demo.ts";
import { drivetrainInputs } from "../drivetrain/inputs.ts";
import { accelerometerPlacementInputs } from "../rotation/rotation.ts";
import { headingDriftInputs } from "../heading/drift-inputs.ts";
import { rimMaterial, DEFAULT_SAFETY_THRESHOLDS, demoRobotLoads } from "../loads/index.ts";
import { rpmToRadPerSecond } from "../core/units.ts";
import { STANDARD_GRAVITY } from "../core/constants.ts";

const defaults = <T extends Record<string, { default: number }>>(specs: T) =>
  Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.default])) as { [K in keyof T]: number };

/**
 * Builds the demo design (invented data). Pure: the same design every time, stamped with a fixed
 * date so that links and printouts of it are stable.
 *
 * @returns a complete, valid Design
 */
export function demoDesign(): Design {
  const speed = rpmToRadPerSecond(2400);
  const parts = demoRobotParts();
  const layout = massProperties(parts);
  const sensor = parts.find((p) => p.name === "accelerometer")!;
  const assumedRadius = Math.hypot(sensor.x, sensor.y);
  const trueRadius = Math.hypot(sensor.x - layout.centreX, sensor.y - layout.centreY);
  const stamp = "2026-11-30T12:00:00.000Z";
  const joint = demoRobotLoads({ washerMass: 0.042, washerRadius: 0.055, topSpeed: speed });
  const thresholds = { failBelow: DEFAULT_SAFETY_THRESHOLDS.failBelow, marginalBelow: DEFAULT_SAFETY_THRESHOLDS.marginalBelow };
  return {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    name: "Demo: invented 1.4 kg whole-body spinner",
    notes: "An invented robot for trying the handbook: not a real machine. Every value here is demo data.",
    created: stamp,
    modified: stamp,
    units: "metric",
    placement: {
      ...defaults(accelerometerPlacementInputs),
      topSpeed: speed,
      lowSpeed: rpmToRadPerSecond(400),
      radius: trueRadius,
      fullScale: 400 * STANDARD_GRAVITY,
      step: (800 / 4096) * STANDARD_GRAVITY,
      resolution: 0.02,
      partMass: 0.28,
      partRadius: Math.hypot(0.012 - layout.centreX, layout.centreY),
    },
    headingDrift: {
      ...defaults(headingDriftInputs),
      angularSpeed: speed,
      assumedRadius,
      trueRadius,
    },
    mass: {
      ...defaults(massBalanceInputs),
      spinSpeed: speed,
      balanceGrade: 0.25,
      mode: "p",
      parts,
      candidates: [
        { x: -0.055, y: 0 },
        { x: -0.05, y: 0.02 },
        { x: 0, y: -0.055 },
      ],
    },
    fasteners: [
      {
        ...initialValues(fastenerCalculator),
        ...joint.jointInput,
        ...thresholds,
        name: "Counterweight washers (one M4 bolt)",
      },
      {
        ...initialValues(fastenerCalculator),
        ...thresholds,
        name: "Battery bracket (two M3 bolts)",
        partMass: 0.3,
        radius: 0.016,
        angularSpeed: speed,
        count: 2,
        size: "M3",
        grade: "8.8",
        jointMode: "shear",
        // The bracket's 2 mm foot stands between the plate and the battery; the screws are tapped into the 5 mm base plate.
        stackHeight: 0.002,
        gripLength: 0.002,
        threadIn: "al-6061-t6",
        engagedLength: 0.005,
      },
    ],
    rims: [
      {
        ...initialValues(rimCalculator),
        name: "Steel armour ring",
        shape: "thin-ring",
        outerRadius: 0.075,
        innerRadius: 0.068,
        ...rimMaterial("steel-4130-normalized"),
        angularSpeed: speed,
        ...thresholds,
      },
    ],
    drivetrain: {
      ...defaults(drivetrainInputs),
      ...DEMO_SPINNER,
      inertia: layout.inertiaAboutCentre,
      robotMass: layout.totalMass,
      targetSpeed: speed,
      tipRadius: 0.075,
      driveType: "spinner",
    },
  };
}
