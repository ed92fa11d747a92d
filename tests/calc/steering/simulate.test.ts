/**
 * The steering simulation (calc/steering/simulate.ts and the model behind it) against its limits
 * and closed forms: the kinematic limit, a robot that is not driven, a frictionless floor,
 * symmetric modulation, the energy ledger, the gyroscopic wheel loads, latency, the verdict, the
 * step budget, the map and the path.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import type { InputSpec } from "../../../calc/core/inputs.ts";
import { wheelNormalLoads } from "../../../calc/steering/gyro.ts";
import {
  DEMO_STEERING_SPINNER,
  drivePulseBias,
  kinematicRimSpeedDepth,
  kinematicTranslationSpeed,
  type SteeringInput,
  type SteeringParameter,
  SteeringModel,
  simulateSteering,
  steeringInputs,
  startSteeringSweep,
  steeringPath,
  sweepSteering,
} from "../../../calc/steering/index.ts";

const close = (actual: number, expected: number, rtol: number, atol = 0) => {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected) + atol);
};
const DEG = Math.PI / 180;
const D = DEMO_STEERING_SPINNER;

/** Every number inside a value, with its path. */
function numbersIn(value: unknown, path = "result"): [string, number][] {
  if (typeof value === "number") return [[path, value]];
  if (value === null || typeof value !== "object") return [];
  return Object.entries(value).flatMap(([k, v]) => numbersIn(v, `${path}.${k}`));
}

// A robot built to approach the kinematic limit (an invented test case): stiff motors (R_m = 0.1 mΩ,
// so the wheels are speed sources), no current limit or sag, stiff grippy tyres (μ = 3, C = 200·F_z),
// no drag, a slow spin (20 rad/s) and a small depth, so the tyres stay far from sliding; a 100 kHz loop
// with no latency; heavy wheels keep the wheel time constant near 0.1 ms, which the integrator resolves.
const KINEMATIC: SteeringInput = {
  ...D,
  spinSpeed: 20,
  motorKv: 10,
  motorResistance: 1e-4,
  noLoadCurrent: 0,
  motorRotorInertia: 0,
  wheelInertia: 0.01,
  cellCount: 2,
  cellResistance: 0,
  currentLimit: 1000,
  tyreFriction: 3,
  slipStiffness: 200,
  skidFriction: 0,
  spinDragTorque: 0,
  windowWidth: Math.PI / 2,
  depth: 0.01,
  oppositeWindow: 1,
  phaseLead: 0,
  loopRate: 100000,
  latency: 0,
  duration: 1.6,
};

describe("the kinematic limit (siegwart-autonomous-robots, oppenheim-willsky-signals): within 1 % at high grip and modest speed", () => {
  it.each([
    { windowWidth: 90 * DEG, oppositeWindow: 1 },
    { windowWidth: 150 * DEG, oppositeWindow: 1 },
    { windowWidth: 90 * DEG, oppositeWindow: 0 },
  ])("w = $windowWidth rad, opposite window $oppositeWindow: the simulated mean speed is δ·sin(w/2)/π (×2 with the opposite window)", (cell) => {
    const input = { ...KINEMATIC, ...cell };
    const r = simulateSteering(input);
    const rim = kinematicRimSpeedDepth({ dutyStep: input.depth, voltage: 2 * input.cellVoltage, kv: input.motorKv, wheelRadius: input.wheelRadius });
    const limit = kinematicTranslationSpeed({ depth: rim, windowWidth: input.windowWidth, oppositeWindow: input.oppositeWindow === 1 });
    expect(r.status).toBe("done");
    close(r.translationSpeed, limit, 0.01);
    close(r.kinematicLimitSpeed, limit, 1e-12);
    // and along the commanded direction: the tyres' lag at this spin is a fraction of a degree
    expect(Math.abs(r.directionError)).toBeLessThan(1 * DEG);
    expect(r.peakGripShare).toBeLessThan(1);
  });
});

describe("limits that follow from momentum and symmetry", () => {
  it("keeps the centre of mass put when nothing is modulated: two wheels to 1e-12 m (their forces cancel exactly)", () => {
    const r = simulateSteering({ ...D, depth: 0, duration: 0.5 });
    close(r.displacement.x, 0, 0, 1e-12);
    close(r.displacement.y, 0, 0, 1e-12);
    close(r.finalSpin, D.spinSpeed, 1e-9);
    expect(r.verdict).toBe("fails");
    expect(r.reason).toMatch(/does not translate/);
  });

  it("keeps a one-wheel robot's centre within 0.1 mm: it circles by F/(M·Ω²) once per turn (the wobble) and goes nowhere", () => {
    const r = simulateSteering({ ...D, wheelCount: 1, spinSpeed: 150, depth: 0, duration: 0.5 });
    expect(Math.hypot(r.displacement.x, r.displacement.y)).toBeLessThan(1e-4);
  });

  it("does not translate at all on a frictionless floor, whatever the wheels do: no horizontal force, no change of momentum", () => {
    const r = simulateSteering({ ...D, tyreFriction: 0, skidFriction: 0, spinDragTorque: 0, duration: 0.5 });
    expect(r.pulseEdges).toBeGreaterThan(50);
    expect(r.displacement).toEqual({ x: 0, y: 0 });
    close(r.finalSpin, D.spinSpeed, 1e-9);
  });

  it("leaves the spin unchanged on average with symmetric modulation, while the add window alone speeds it up", () => {
    // Linear drive (no current limit, no sag) and a small depth, so that adding and taking away are mirror images.
    const lin = { ...D, currentLimit: 1000, cellResistance: 0, depth: 0.02, duration: 1 };
    const mean = (r: ReturnType<typeof simulateSteering>) => r.revolutions.slice(-10).reduce((s, x) => s + x.spinSpeed, 0) / 10;
    const none = mean(simulateSteering({ ...lin, depth: 0 }));
    const sym = mean(simulateSteering(lin));
    const add = mean(simulateSteering({ ...lin, oppositeWindow: 0 }));
    // What symmetric modulation costs the spin is the translation's own energy and slip: second order in δ.
    expect(Math.abs(sym - none)).toBeLessThan(2e-4 * none);
    expect(Math.abs(add - none)).toBeGreaterThan(30 * Math.abs(sym - none));
  });

  it("holds the steady spin it starts from (base duty and tyre slip worked out in closed form) to 1e-9", () => {
    for (const wheelCount of [2, 3, 4]) close(simulateSteering({ ...D, wheelCount, depth: 0, duration: 0.3 }).finalSpin, D.spinSpeed, 1e-9);
  });
});

describe("the energy ledger: drawn = kinetic stored + losses", () => {
  it.each([
    { label: "the demo robot", input: D },
    { label: "add-only windows", input: { ...D, oppositeWindow: 0 } },
    { label: "three wheels", input: { ...D, wheelCount: 3 } },
    { label: "one wheel and a skid", input: { ...D, wheelCount: 1, spinSpeed: 150, depth: 0.1 } },
    { label: "two wheels and a centre skid", input: { ...D, weightShare: 0.8 } },
  ])("closes to 1e-4 of the energy drawn for $label", ({ input }) => {
    const r = simulateSteering({ ...input, duration: 0.6 });
    expect(r.energy.balanceError).toBeLessThan(1e-4);
    const e = r.energy;
    close(e.totalLoss, e.packLoss + e.copperLoss + e.noLoadLoss + e.slipLoss + e.skidLoss + e.dragLoss, 1e-14);
    for (const loss of [e.packLoss, e.copperLoss, e.noLoadLoss, e.slipLoss, e.skidLoss, e.dragLoss]) expect(loss).toBeGreaterThanOrEqual(0);
  });
});

describe("the wheels' gyroscopic moment in the model (gyro.ts: meriam-kraige-dynamics)", () => {
  it("loads a one-wheel robot's wheel exactly as wheelNormalLoads says, at any spin and rolling wheel speed", () => {
    const input = { ...D, wheelCount: 1, spinSpeed: 150 };
    const model = new SteeringModel(input);
    for (const spin of [50, 150, 190]) {
      model.setLoads(spin, (spin * input.wheelOffset) / input.wheelRadius);
      const ref = wheelNormalLoads({
        wheelCount: 1,
        robotMass: input.robotMass,
        wheelInertia: input.wheelInertia,
        rotorInertia: input.motorRotorInertia,
        wheelRadius: input.wheelRadius,
        contactRadius: input.wheelOffset,
        spinSpeed: spin,
      });
      close(model.loadWheel, ref.wheelLoad, 1e-13);
      close(model.loadSkid, ref.skidLoad, 1e-12);
    }
  });

  it("fails a one-wheel robot spun past its skid-lift speed and says why", () => {
    const r = simulateSteering({ ...D, wheelCount: 1, spinSpeed: 250, depth: 0.05, duration: 0.2 });
    expect(r.skidLiftSpeed!).toBeLessThan(250);
    expect(r.skidLiftedShare).toBeGreaterThan(0.5);
    expect(r.verdict).toBe("fails");
    expect(r.reason).toMatch(/lifts the skid/);
  });
});

describe("direction: latency, the loop's hold, the wheels' own lag, and the lead that cancels them", () => {
  it("turns the travel forward by Ω·ΔL when the latency grows by ΔL (latencyHeadingLag, θ = ωt), within 5 %", () => {
    const fast = { ...D, loopRate: 20000, duration: 1 };
    const a = simulateSteering({ ...fast, latency: 0.0003 });
    const b = simulateSteering({ ...fast, latency: 0.0013 });
    close(b.directionError - a.directionError, D.spinSpeed * 0.001, 0.05);
    close(b.latencyDirectionError - a.latencyDirectionError, D.spinSpeed * 0.001, 1e-12);
  });

  it("goes where it is told once the firmware leads by the angle the result names (within 2°)", () => {
    const first = simulateSteering({ ...D, duration: 1 });
    expect(first.verdict).toBe("fails");
    const led = simulateSteering({ ...D, phaseLead: first.leadToCancel });
    expect(Math.abs(led.directionError)).toBeLessThan(2 * DEG);
    expect(led.verdict).toBe("holds");
    expect(led.timeToDistance!).toBeLessThan(D.duration);
  });

  it("is marginal when it keeps the direction but cannot cover the distance in time", () => {
    const lead = simulateSteering({ ...D, duration: 1 }).leadToCancel;
    const r = simulateSteering({ ...D, phaseLead: lead, commandedDistance: 50 });
    expect(r.verdict).toBe("marginal");
    expect(r.timeToDistance).toBeNull();
  });
});

describe("the demo robot (invented for the chapter)", () => {
  const r = simulateSteering(D);

  it("translates at about 1.1 m/s, some 75° ahead of the commanded direction without a lead (regression pin, our own digits)", () => {
    close(r.translationSpeed, 1.15, 0.1);
    close(r.directionError, 75 * DEG, 0.1);
    expect(r.responseLag).toBeGreaterThan(r.latencyDirectionError);
  });

  it("reports only finite numbers, a per-revolution list, and the pulse edges it ran", () => {
    for (const [path, v] of numbersIn(r)) expect(Number.isFinite(v), path).toBe(true);
    expect(r.revolutions.length).toBeGreaterThan(60);
    expect(r.pulseEdges).toBeGreaterThan(4 * r.revolutions.length);
  });

  it("has an opposed pair of accelerometers that does not drift at all (sensor-bias.ts)", () => {
    expect(r.sensor.opposedPairDriftRate).toBe(0);
  });
});

describe("drive pulses on one accelerometer (sensor-bias.ts; drift as in calc/heading/drift.ts)", () => {
  // A fast loop, so that the sampling jitter of the pulse edges does not blur the comparison.
  const one = { ...D, wheelCount: 1, oppositeWindow: 0, spinSpeed: 150, depth: 0.1, duration: 1, loopRate: 20000 };
  const addOnly = simulateSteering({ ...one, sensorAngle: Math.PI / 2 });

  it("biases a one-wheel robot's sensor against the wheel's rolling direction with add-only windows: b < 0 at β = 90°, as −(ΔF/M)(w/2π)·sin β says", () => {
    expect(addOnly.sensor.bias).toBeLessThan(-0.05);
    expect(drivePulseBias({ pulseForce: 1, robotMass: 1.5, windowWidth: one.windowWidth, sensorAngle: Math.PI / 2 })).toBeLessThan(0);
    expect(addOnly.sensor.driftRate!).toBeLessThan(0);
  });

  it("leaves a sensor on the line through the wheel, and symmetric modulation, nearly unbiased (under a fifth)", () => {
    const onLine = simulateSteering({ ...one, sensorAngle: 0 });
    const symmetric = simulateSteering({ ...one, oppositeWindow: 1, sensorAngle: Math.PI / 2 });
    expect(Math.abs(onLine.sensor.bias)).toBeLessThan(0.2 * Math.abs(addOnly.sensor.bias));
    expect(Math.abs(symmetric.sensor.bias)).toBeLessThan(0.2 * Math.abs(addOnly.sensor.bias));
  });

  it("cancels between two opposed wheels pulsed alike: under a tenth of the one-wheel bias over 3 s", () => {
    const two = simulateSteering({ ...D, loopRate: 20000, duration: 3 });
    expect(Math.abs(two.sensor.bias)).toBeLessThan(0.1 * Math.abs(addOnly.sensor.bias));
  });
});

describe("the step budget", () => {
  it("stops at the budget, says so in the builder's words, and still returns only finite numbers", () => {
    const r = simulateSteering(D, { maxSteps: 100 });
    expect(r.status).toBe("step-limit");
    expect(r.verdict).toBe("marginal");
    expect(r.warnings[0]).toMatch(/^stopped: too stiff to resolve in \d+ steps/);
    for (const [path, v] of numbersIn(r)) expect(Number.isFinite(v), path).toBe(true);
  });
});

describe("inputs", () => {
  const names = Object.keys(steeringInputs) as SteeringParameter[];
  it.each(names.map((n) => [n]))("refuses %s below its declared range, by name", (name) => {
    const spec = steeringInputs[name];
    try {
      simulateSteering({ ...D, [name]: spec.min - 1 - Math.abs(spec.min) });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CalcInputError);
      expect((e as CalcInputError).param).toBe(name);
    }
  });

  it.each([
    { what: "a window wider than half a turn with the opposite window on", input: { windowWidth: 200 * DEG }, param: "windowWidth" },
    { what: "a depth beyond the duty left above the spin's", input: { depth: 0.5 }, param: "depth" },
    { what: "a spin the pack cannot hold", input: { spinSpeed: 6000 * ((2 * Math.PI) / 60), depth: 0 }, param: "spinSpeed" },
    { what: "tyres too slippery to hold the spin against drag", input: { tyreFriction: 0 }, param: "tyreFriction" },
    { what: "a fractional wheel count", input: { wheelCount: 2.5 }, param: "wheelCount" },
    { what: "a NaN", input: { latency: Number.NaN }, param: "latency" },
  ])("refuses $what, naming $param", ({ input, param }) => {
    try {
      simulateSteering({ ...D, ...input });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CalcInputError);
      expect((e as CalcInputError).param).toBe(param);
    }
  });

  it("refuses a missing input and bad options by name", () => {
    expect(() => simulateSteering(null as unknown as SteeringInput)).toThrowError(CalcInputError);
    expect(() => simulateSteering(D, { relativeTolerance: 1 })).toThrowError("relativeTolerance must be at least 1e-9 and at most 0.001 (got 1)");
  });

  it("never returns a non-finite number for random valid inputs: a result or a named CalcInputError (fast-check)", () => {
    const field = (name: SteeringParameter) => {
      const s: InputSpec = steeringInputs[name];
      return s.integer ? fc.integer({ min: s.min, max: s.max }) : fc.double({ min: s.min, max: s.max, noNaN: true, minExcluded: s.minOpen === true });
    };
    const arb = fc.record(Object.fromEntries(names.map((n) => [n, field(n)])) as Record<SteeringParameter, fc.Arbitrary<number>>);
    fc.assert(
      fc.property(arb, fc.double({ min: 0.05, max: 0.12, noNaN: true }), (input, duration) => {
        try {
          const r = simulateSteering({ ...input, duration, spinSpeed: Math.min(input.spinSpeed, 800) }, { maxSteps: 3000, revolutions: false });
          for (const [path, v] of numbersIn(r)) expect(Number.isFinite(v), path).toBe(true);
          expect(["holds", "marginal", "fails"]).toContain(r.verdict);
        } catch (e) {
          expect(e).toBeInstanceOf(CalcInputError);
        }
      }),
      { numRuns: 60 },
    );
  });
});

describe("the window-and-depth map", () => {
  const map = sweepSteering({ input: D, windowWidths: [60 * DEG, 120 * DEG, 180 * DEG], depths: [0.05, 0.15, 0.4], duration: 0.3 });

  it("marks the fastest feasible cell, and only that one", () => {
    const all = map.cells.flat();
    const best = all.filter((c) => c.isBest);
    expect(best).toHaveLength(1);
    const fastest = Math.max(...all.filter((c) => c.feasible).map((c) => c.speed!));
    expect(best[0]!.speed).toBe(fastest);
    expect(map.cells[map.best!.row]![map.best!.column]!.isBest).toBe(true);
  });

  it("leaves cells whose depth exceeds the duty left unrun (null), and speeds up with the window at a fixed depth", () => {
    for (const row of map.cells) expect(row[2]!.feasible).toBe(false);
    const column = map.cells.map((row) => row[1]!.speed!);
    expect(column[1]!).toBeGreaterThan(column[0]!);
    expect(column[2]!).toBeGreaterThan(column[1]!);
  });

  it("runs one cell per step when started step by step, and ends with the same grid as the sweep run at once", () => {
    const args = { input: D, windowWidths: [60 * DEG, 120 * DEG, 180 * DEG], depths: [0.05, 0.15, 0.4], duration: 0.3 };
    const run = startSteeringSweep(args);
    expect(run.total).toBe(9);
    const seen: number[] = [];
    let sweep = run.step();
    while (!sweep) {
      seen.push(run.done());
      sweep = run.step();
    }
    expect(seen).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(sweep).toEqual(map);
    expect(run.step()).toBe(sweep);
  });

  it("checks every input before the first cell when started step by step", () => {
    expect(() => startSteeringSweep({ input: D, depths: [0.1, -1] })).toThrowError("depths[1] must be at least 0 and at most 1 (got -1)");
    expect(() => startSteeringSweep({ input: { ...D, spinSpeed: -1 } })).toThrowError(CalcInputError);
  });

  it("refuses a bad grid by name", () => {
    expect(() => sweepSteering({ input: D, windowWidths: [] })).toThrowError(CalcInputError);
    expect(() => sweepSteering({ input: D, depths: [2] })).toThrowError("depths[0] must be at least 0 and at most 1 (got 2)");
  });
});

describe("the path of a commanded move", () => {
  it("goes one way for 0.5 s and then turns to 90° for 0.5 s, with the lead the simulation names (the wobble sampled 12 times a turn)", () => {
    const lead = simulateSteering({ ...D, duration: 1 }).leadToCancel;
    const p = steeringPath({ input: { ...D, phaseLead: lead } });
    expect(p.status).toBe("done");
    expect(p.points.length).toBeGreaterThan(500);
    const [first, second] = p.legEnds as [{ x: number; y: number }, { x: number; y: number }];
    expect(first.x).toBeGreaterThan(0.1);
    expect(Math.abs(first.y)).toBeLessThan(0.3 * first.x);
    expect(second.y - first.y).toBeGreaterThan(0.1);
    for (const q of p.points) expect(Math.abs(q.heading)).toBeLessThanOrEqual(Math.PI);
  });

  it("measures the wobble of a one-wheel robot that is not steered as the circle r = a/Ω² its body-fixed force drives (uniform circular motion, openstax-up1-rotational-kinematics), within 0.5 %", () => {
    // The wheel and skid forces of a one-wheel robot sum to a force fixed in the body; its acceleration a
    // (the model's own right-hand side at steady spin, a second method) turns with the body, so the
    // centre of mass runs round a circle of radius a/Ω². The path's wobble is taken about the mean over
    // one turn; the 0.15 % it reads low is the start from rest, which this comparison leaves in.
    const still = { ...D, wheelCount: 1, spinSpeed: 150, depth: 0 };
    const a = simulateSteering({ ...still, duration: 0.5 }).sensor.steadyBodyAcceleration;
    const radius = Math.hypot(a.x, a.y) / 150 ** 2;
    for (const pointsPerRevolution of [12, 13, 24]) {
      close(steeringPath({ input: still, legs: [{ direction: 0, duration: 0.5 }], pointsPerRevolution }).wobble, radius, 5e-3);
    }
  });

  it("has no wobble for two opposed wheels that are not steered: their forces cancel", () => {
    expect(steeringPath({ input: { ...D, depth: 0 }, legs: [{ direction: 0, duration: 0.3 }] }).wobble).toBeLessThan(1e-12);
  });

  it("refuses bad legs by name", () => {
    expect(() => steeringPath({ input: D, legs: [] })).toThrowError(CalcInputError);
    expect(() => steeringPath({ input: D, legs: [{ direction: Number.NaN, duration: 1 }] })).toThrowError(
      "legs[0].direction must be a finite number (got not a number)",
    );
  });
});
