/**
 * Direct checks of helpers the other tests reach only through larger calls: the heading chapter's
 * radius-mismatch example, the steering inputs' units and cross-field rule, the rotor's spin axis
 * and the tipping check's track rule.
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../calc/core/errors.ts";
import type { InputSpec } from "../../calc/core/inputs.ts";
import { unitDef, unitsOfKind } from "../../calc/core/units.ts";
import "../../calc/core/all-units.ts";
import { radiusMismatchExample } from "../../calc/heading/drift-demo.ts";
import { DEMO_STEERING_SPINNER, type SteeringParameter, steeringInputs, steeringUnit, validateSteeringInput } from "../../calc/steering/inputs.ts";
import { readSteeringOptions } from "../../calc/steering/simulate.ts";
import { spinAxis } from "../../calc/weapon/gyroscopic.ts";
import { requireComInsideTrack } from "../../calc/weapon/tipping.ts";

const cross = (a: readonly number[], b: readonly number[]) =>
  [a[1]! * b[2]! - a[2]! * b[1]!, a[2]! * b[0]! - a[0]! * b[2]!, a[0]! * b[1]! - a[1]! * b[0]!].map((x) => x + 0); // + 0: no −0

describe("the radius-mismatch example (a firmware assuming r̂ = 12.0 mm for a sensor at r = 12.7 mm: invented demo data)", () => {
  // ω̂/ω = √(r/r̂); drift = ω(√(r/r̂) − 1); per turn 360°(√(r/r̂) − 1) (centripetal a = ω²r, OpenStax College Physics ch. 6).
  const ratio = Math.sqrt(0.0127 / 0.012);
  const example = radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [1200, 2800] });

  it("gives the speed ratio √(r/r̂) = 1.028753 and the same drift per turn at every speed, 10.35°", () => {
    expect(example.speedRatio).toBeCloseTo(ratio, 12);
    expect(example.speedRatio).toBeCloseTo(1.028753, 6);
    for (const row of example.rows) {
      expect(row.driftPerRevolutionDegrees).toBeCloseTo(360 * (ratio - 1), 9);
      expect(row.driftRateDegreesPerSecond).toBeCloseTo(row.rpm * 6 * (ratio - 1), 9);
      expect(row.driftRate).toBeCloseTo(((row.rpm * 2 * Math.PI) / 60) * (ratio - 1), 9);
    }
    expect(example.rows.map((r) => r.rpm)).toEqual([1200, 2800]);
  });

  it("sets the radius band at the top speed with the default budget of 10 °/s, and its half-width relative to r", () => {
    expect(example.budget).toBeCloseTo((10 * Math.PI) / 180, 15);
    const { low, high } = example.bandAtTopSpeed;
    expect(low!).toBeLessThan(0.0127);
    expect(high!).toBeGreaterThan(0.0127);
    expect(example.bandHalfWidthFraction).toBeCloseTo((high! - low!) / 2 / 0.0127, 15);
    const wider = radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [1200, 2800], budget: (20 * Math.PI) / 180 });
    expect(wider.bandHalfWidthFraction!).toBeGreaterThan(example.bandHalfWidthFraction!);
  });

  it("refuses an empty list of speeds and a speed that is not positive, naming it", () => {
    expect(() => radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [] })).toThrow("speedsRpm must be at least one speed");
    expect(() => radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [1200, 0] })).toThrow(CalcInputError);
    expect(() => radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [1200, 0] })).toThrow(/^speedsRpm\[1\] must be greater than 0/);
  });
});

describe("the steering inputs", () => {
  it("states each input's refusal in its kind's SI unit", () => {
    for (const name of Object.keys(steeringInputs) as SteeringParameter[]) {
      const si = unitsOfKind(steeringInputs[name].kind).find((u) => unitDef(u).factor === 1);
      expect(steeringUnit(name), name).toBe(si === undefined ? "" : unitDef(si).symbol);
    }
    expect(() => steeringUnit("colour" as never)).toThrow(`name must be the name of a steering input (got "colour")`);
  });

  it("takes the demo robot as it is, and refuses a window wider than half a turn with the opposite window on", () => {
    expect(validateSteeringInput(DEMO_STEERING_SPINNER)).toBe(DEMO_STEERING_SPINNER);
    expect(() => validateSteeringInput({ ...DEMO_STEERING_SPINNER, oppositeWindow: 1, windowWidth: Math.PI + 0.01 })).toThrow(
      "windowWidth must be at most π rad (180°) with the opposite window on (got 3.15159 rad)",
    );
    expect(validateSteeringInput({ ...DEMO_STEERING_SPINNER, oppositeWindow: 1, windowWidth: Math.PI }).windowWidth).toBe(Math.PI);
  });

  it("refuses a fraction where a whole number is declared, and a missing input object", () => {
    const whole = (Object.keys(steeringInputs) as SteeringParameter[]).find((name) => (steeringInputs[name] as InputSpec).integer)!;
    const spec = steeringInputs[whole];
    expect(() => validateSteeringInput({ ...DEMO_STEERING_SPINNER, [whole]: spec.min + 0.5 })).toThrow(`${whole} must be a whole number`);
    expect(() => validateSteeringInput(null as never)).toThrow("input must be an object of steering inputs");
  });
});

describe("the rotor's spin axis (right-hand rule) and the track rule", () => {
  it("points a horizontal rotor whose front edge rises along −y: ω × x̂ = +ẑ, the front edge at +x moving up", () => {
    expect(cross(spinAxis("horizontal", "front-up"), [1, 0, 0])).toEqual([0, 0, 1]);
    expect(cross(spinAxis("horizontal", "front-down"), [1, 0, 0])).toEqual([0, 0, -1]);
  });

  it("points a vertical-axle rotor turning counterclockwise seen from above along +z", () => {
    expect(spinAxis("vertical", "counterclockwise")).toEqual([0, 0, 1]);
    expect(spinAxis("vertical", "clockwise")).toEqual([0, 0, -1]);
    expect(() => spinAxis("vertical", "front-up")).toThrow(CalcInputError);
  });

  it("keeps the centre of mass strictly between the wheels", () => {
    expect(() => requireComInsideTrack(0.099, 0.2)).not.toThrow();
    expect(() => requireComInsideTrack(-0.099, 0.2)).not.toThrow();
    expect(() => requireComInsideTrack(0.1, 0.2)).toThrow(
      "comOffset must be less than half the track (0.1 m) either way: the centre of mass must lie between the wheels (got 0.1 m)",
    );
    expect(() => requireComInsideTrack(-0.1, 0.2)).toThrow(CalcInputError);
  });
});

describe("the steering run's options", () => {
  it("defaults to a relative tolerance of 1e-6, 500 000 steps and the per-revolution list", () => {
    expect(readSteeringOptions(undefined)).toEqual({ relativeTolerance: 1e-6, maxSteps: 500_000, revolutions: true });
    expect(readSteeringOptions({ revolutions: false, maxSteps: 100 })).toEqual({ relativeTolerance: 1e-6, maxSteps: 100, revolutions: false });
  });

  it("takes the ends of its ranges and refuses past them, and a step budget that is not whole", () => {
    expect(readSteeringOptions({ relativeTolerance: 1e-9, maxSteps: 1e7 })).toMatchObject({ relativeTolerance: 1e-9, maxSteps: 1e7 });
    expect(readSteeringOptions({ relativeTolerance: 1e-3 }).relativeTolerance).toBe(1e-3);
    expect(() => readSteeringOptions({ relativeTolerance: 2e-3 })).toThrow(/^relativeTolerance must be at least 1e-9 and at most 0\.001 \(got 0\.002\)$/);
    expect(() => readSteeringOptions({ maxSteps: 99 })).toThrow(/^maxSteps must be at least 100 and at most 10000000 \(got 99\)$/);
    expect(() => readSteeringOptions({ maxSteps: 1000.5 })).toThrow("maxSteps must be a whole number (got 1000.5)");
  });
});
