/**
 * The load checks at the edges the other tests leave: an overtightened bolt in either mode, an
 * untightened one, a plain shank in the grip, the root fibre with a light preload, a rim whose
 * yield exceeds its ultimate or whose bore reaches its rim, and each formula's refusal at the edge
 * of the doubles, naming the input. M4 class 8.8 figures: ISO 898-1 (proof 580 MPa on A_s = 8.78 mm²).
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { boltStress, FASTENER_CHOICE_DEFAULTS, fastenerCheck, fastenerCheckInputs, fastenerStressCurve } from "../../../calc/loads/bolts.ts";
import { BOLTED_JOINT_CHOICE_DEFAULTS, type BoltedJointInput, boltedJointInputs } from "../../../calc/loads/joint-inputs.ts";
import { boltedJointCheck } from "../../../calc/loads/joint.ts";
import { RIM_CHOICE_DEFAULTS, rimCheck, rimCheckInputs, thinRingLimitTipSpeed, tipSpeed } from "../../../calc/loads/rims.ts";

const defaultsOf = (specs: Record<string, { default: number }>) => Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.default]));
const JOINT = { ...defaultsOf(boltedJointInputs), ...BOLTED_JOINT_CHOICE_DEFAULTS } as BoltedJointInput;
const FASTENER = { ...defaultsOf(fastenerCheckInputs), ...FASTENER_CHOICE_DEFAULTS } as Parameters<typeof fastenerCheck>[0];
const RIM = { ...defaultsOf(rimCheckInputs), ...RIM_CHOICE_DEFAULTS } as Parameters<typeof rimCheck>[0];

const refuses = (run: () => unknown, message: string) => {
  expect(run).toThrow(CalcInputError);
  expect(run).toThrow(message);
};

describe("the bolted joint at its edges", () => {
  // 5 N·m on an M4 with K = 0.2: F_i = T/(K d) = 5/(0.2 × 0.004) = 6250 N, 1.23 × its proof load.
  const overtightened = { ...JOINT, preloadFrom: "torque" as const, tighteningTorque: 5 };

  it("fails a bolt tightened past proof in shear, and reports its proof factor as the tension factor", () => {
    const r = boltedJointCheck(overtightened);
    expect(r.preload.force).toBeCloseTo(6250, 9);
    expect(r.preload.proofFactor!).toBeLessThan(1);
    expect([r.verdict, r.governs, r.safetyFactor]).toEqual(["fails", "tension", r.preload.proofFactor]);
    expect(r.safetyFactors.tension).toBe(r.preload.proofFactor);
    expect(r.reason).toBe("The preload is 1.23 × the proof load: the bolt yields while it is tightened.");
  });

  it("keeps the load factor (0 past proof) as the tension factor in tension mode", () => {
    const r = boltedJointCheck({ ...overtightened, jointMode: "tension" });
    expect([r.verdict, r.governs, r.safetyFactors.tension]).toEqual(["fails", "tension", 0]);
    expect(r.safetyFactor).toBe(r.preload.proofFactor);
  });

  it("says an untightened joint slips, and gives no stripping factor for a thread that carries no preload", () => {
    const r = boltedJointCheck({ ...JOINT, preloadFrom: "torque", tighteningTorque: 0 });
    expect(r.safetyFactors.friction).toBe(0);
    expect(r.safetyFactors.stripping).toBeNull();
    expect([r.verdict, r.governs]).toEqual(["holds", "bending"]);
    expect(r.reason).toBe("With no preload the joint slips and the bolt is bent over the 5.00 mm stack: n = 2.19.");
  });

  it("holds by friction when the slipped bolt would still hold (the demo defaults)", () => {
    const r = boltedJointCheck(JOINT);
    expect([r.verdict, r.governs]).toEqual(["holds", "friction"]);
  });

  it("stiffens the bolt with a plain shank: k_b = E/(l_t/A_t + l_d/A_d), A_d = πd²/4 (Shigley 9th ed., Eq. 8-17)", () => {
    const plain = boltedJointCheck(JOINT);
    const shank = boltedJointCheck({ ...JOINT, shankLength: 0.003 });
    const E = plain.stiffness.bolt * (plain.stiffness.effectiveGrip / shank.thread!.stressArea);
    const Ad = (Math.PI / 4) * 0.004 ** 2;
    const lt = shank.stiffness.effectiveGrip - 0.003;
    expect(shank.stiffness.bolt).toBeCloseTo(E / (lt / shank.thread!.stressArea + 0.003 / Ad), 3);
    expect(shank.stiffness.bolt).toBeGreaterThan(plain.stiffness.bolt);
  });

  it("says whether the root fibre yields with the preload on: yes at 75 % of proof, no at 1 %", () => {
    expect(boltedJointCheck(JOINT).slip!.rootYieldsWithPreload).toBe(true);
    expect(boltedJointCheck({ ...JOINT, preloadShare: 0.01 }).slip!.rootYieldsWithPreload).toBe(false);
  });

  it("refuses a missing input and a shank longer than the clamped thickness, in words", () => {
    refuses(() => boltedJointCheck(null as never), "input must be an object with the joint's inputs (got null)");
    refuses(
      () => boltedJointCheck({ ...JOINT, shankLength: 0.006, gripLength: 0.005 }),
      "shankLength must be at most the clamped thickness (0.005 m) (got 0.006 m)",
    );
  });
});

describe("the fastener check at its edges", () => {
  it("lets the ultimate govern when the shear ratio is low enough (0.3 R_m against R_e/√3)", () => {
    const r = fastenerCheck({ ...FASTENER, mode: "shear", shearRatio: fastenerCheckInputs.shearRatio.min });
    expect(r.safetyFactorUltimate).toBeLessThan(r.safetyFactorYield);
    expect(r.governs).toBe("ultimate");
    expect(fastenerCheck({ ...FASTENER, mode: "shear" }).governs).toBe("yield");
  });

  it("refuses a bolt count that is not whole, a stress past the doubles and a stress curve to a negative speed", () => {
    refuses(() => boltStress({ force: 100, count: 1.5, area: 1e-5 }), "count must be a whole number (got 1.5)");
    refuses(() => boltStress({ force: 1e300, count: 1, area: 1e-10 }), "force must be small enough for the bolt stress to stay finite (got 1e+300 N)");
    refuses(() => fastenerStressCurve(FASTENER, { maxSpeed: -1 }), "maxSpeed must be greater than 0 rad/s (got -1 rad/s)");
  });
});

describe("the rim check at its edges", () => {
  it("refuses a yield strength above the ultimate, and a bore as large as the rim", () => {
    refuses(
      () => rimCheck({ ...RIM, yieldStrength: 300e6, ultimateStrength: 280e6 }),
      "yieldStrength must be at most ultimateStrength (280000000 Pa) (got 300000000 Pa)",
    );
    refuses(
      () => rimCheck({ ...RIM, shape: "annular-disk", innerRadius: RIM.outerRadius }),
      `innerRadius must be greater than 0 m and less than ${RIM.outerRadius} m (got ${RIM.outerRadius} m)`,
    );
  });

  it("names the input that takes a tip speed past the doubles", () => {
    refuses(() => tipSpeed({ angularSpeed: 1e300, radius: 1e300 }), "angularSpeed must be small enough for the tip speed to stay finite (got 1e+300 rad/s)");
    refuses(
      () => thinRingLimitTipSpeed({ strength: 1e300, density: 1e-300 }),
      "density must be large enough for the limit tip speed to stay finite (got 1e-300 kg/m³)",
    );
  });
});

describe("the fastener stress curve", () => {
  it("names the top speed when the curve's stress would leave the doubles", () => {
    refuses(() => fastenerStressCurve(FASTENER, { maxSpeed: 1e300 }), "maxSpeed must be small enough for the stress to stay finite (got 1e+300 rad/s)");
  });

  it("spaces its speeds evenly from 0 to the top speed", () => {
    const curve = fastenerStressCurve(FASTENER, { maxSpeed: 300, points: 4 });
    expect(curve.map((p) => p.angularSpeed)).toEqual([0, 100, 200, 300]);
  });
});
