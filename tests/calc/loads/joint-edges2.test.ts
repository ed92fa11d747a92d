/**
 * The bolted joint at its exact boundaries: a load equal to the clamp's capacity, a bolt factor equal
 * to the failure threshold, a preload equal to the proof load, a tension joint loaded exactly to its
 * opening load, and the shank longer than the stack refused with its bound as data. The demo joint:
 * one M4 class 8.8 bolt into 6061-T6, a 5 mm stack, μ = 0.2 (the inputs' defaults).
 */
import { describe, expect, it } from "vitest";
import { BOLTED_JOINT_CHOICE_DEFAULTS, type BoltedJointInput, boltedJointInputs } from "../../../calc/loads/joint-inputs.ts";
import { boltedJointCheck } from "../../../calc/loads/joint.ts";
import { refusal } from "../../support/refusal.ts";

const defaultsOf = (specs: Record<string, { default: number }>) => Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.default]));
const JOINT = { ...defaultsOf(boltedJointInputs), ...BOLTED_JOINT_CHOICE_DEFAULTS } as BoltedJointInput;

describe("the bolted joint in shear at its boundaries", () => {
  it("says the clamp holds a load equal to its capacity μF_i n_b n_s (EN 1993-1-8 §3.9.1: F_v,Ed ≤ F_s,Rd)", () => {
    // 10 % of proof: F_i = 0.1 × 8.78 mm² × 580 MPa = 509.24 N (ISO 898-1); μF_i = 0.2 × 509.24 = 101.848 N.
    const light = { ...JOINT, preloadShare: 0.1, loadFrom: "force" as const };
    const capacity = boltedJointCheck(light).slip!.clampCapacity;
    expect(capacity).toBeCloseTo(101.848, 9);
    const r = boltedJointCheck({ ...light, load: capacity });
    expect([r.slip!.factor, r.slip!.slips, r.governs, r.verdict]).toEqual([1, false, "bending", "holds"]);
    expect(r.reason).toBe("The clamp holds up to 1.00 × the load; past that the joint slips and the bolt is bent over the 5.00 mm stack: n = 3.80.");
  });

  it("does not call a slipped bolt failing when its factor equals the threshold: a factor fails only below it", () => {
    const boltFactor = boltedJointCheck(JOINT).safetyFactors.bending!;
    expect(boltFactor).toBeCloseTo(2.186, 3);
    const r = boltedJointCheck({ ...JOINT, failBelow: boltFactor, marginalBelow: boltFactor });
    expect([r.governs, r.verdict]).toEqual(["friction", "holds"]);
    expect(r.reason).toBe("Holds by friction: the clamp carries 4.32 × the load. If it slips, the bolt is bent over the 5.00 mm stack: n = 2.19.");
  });

  it("accepts a preload of exactly the proof load, which a bolt carries without a permanent set (ISO 898-1)", () => {
    const r = boltedJointCheck({ ...JOINT, preloadShare: 1 });
    expect(r.preload.proofFactor).toBe(1);
    expect([r.governs, r.verdict, r.safetyFactors.tension]).toEqual(["friction", "holds", null]);
  });
});

describe("the bolted joint in tension at its opening load", () => {
  it("calls a joint loaded to P_0 = F_i/(1 − C) marginal, as it reports it separated (Shigley Eq. 8-30: no clamp left in the members)", () => {
    const T = { ...JOINT, jointMode: "tension" as const, loadFrom: "force" as const, preloadShare: 0.1 };
    const opening = boltedJointCheck(T).tension!.separationLoad;
    const r = boltedJointCheck({ ...T, load: opening });
    expect([r.tension!.separated, r.tension!.memberLoad, r.tension!.separationFactor]).toEqual([true, 0, 1]);
    expect([r.governs, r.verdict]).toEqual(["tension", "marginal"]);
    expect(r.reason).toMatch(/ But the joint opens at 914 N per bolt \(n_0 = 1\.00\): the bolt then carries the whole load and loosens\.$/);
  });
});

describe("the bolted joint's shank", () => {
  it("refuses a plain shank longer than the clamped thickness, with the limit as a length from that field", () => {
    const error = refusal(() => boltedJointCheck({ ...JOINT, shankLength: 0.006 }));
    expect([error.param, error.value, error.unit]).toEqual(["shankLength", 0.006, "m"]);
    expect(error.bound).toEqual({ relation: "at-most", limit: 0.005, kind: "length", other: "the clamped thickness" });
  });
});
