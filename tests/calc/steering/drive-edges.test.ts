/**
 * Edge cases of the pack with several motor groups (calc/steering/drive.ts): a current-limited
 * group whose duty would leave 0…1, groups left alone past the count, and each refusal's field
 * and unit (from the mutation report of calc/steering/drive.ts).
 */
import { describe, expect, it } from "vitest";
import { PackSolver, steadyDuty } from "../../../calc/steering/drive.ts";
import { refusal } from "../../support/refusal.ts";

const params = { openCircuitVoltage: 16, packResistance: 0, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 30, motorsPerGroup: 1 };

describe("a current-limited group whose duty would leave 0…1 (erickson-power-electronics, ctms-dc-motor-speed)", () => {
  it("saturates at duty 0 when a motor turned backwards would need a negative duty to hold +I_lim, and passes the current that duty 0 gives", () => {
    // e = 0.01 × (−1000) = −10 V; at D = 0.1, I = (1.6 + 10)/0.1 = 116 A > 30 A, so the limit acts;
    // the duty for +30 A is (−10 + 30 × 0.1)/16 = −0.4375 < 0, so the stage sits at 0: I = (0 + 10)/0.1 = 100 A.
    const s = new PackSolver(params, 1);
    const i = new Float64Array(1);
    const d = new Float64Array(1);
    const ib = s.solve(Float64Array.of(0.1), Float64Array.of(-1000), i, d);
    expect(d[0]).toBe(0);
    expect(i[0]).toBeCloseTo(100, 10);
    expect(ib).toBe(0); // D·I = 0 × 100
    expect(s.batteryVoltage).toBe(16);
  });

  it("saturates at duty 1 when an overspeeding motor would need a duty above 1 to hold −I_lim, and passes the current that duty 1 gives", () => {
    // e = 0.01 × 2000 = 20 V; at D = 0.9, I = (14.4 − 20)/0.1 = −56 A < −30 A, so the limit acts;
    // the duty for −30 A is (20 − 3)/16 = 1.0625 > 1, so the stage sits at 1: I = (16 − 20)/0.1 = −40 A, I_b = 1 × (−40).
    const s = new PackSolver(params, 1);
    const i = new Float64Array(1);
    const d = new Float64Array(1);
    const ib = s.solve(Float64Array.of(0.9), Float64Array.of(2000), i, d);
    expect(d[0]).toBe(1);
    expect(i[0]).toBeCloseTo(-40, 10);
    expect(ib).toBeCloseTo(-40, 10);
  });

  it("saturates one group while the next is held at the limit and a third runs free, each at its own duty", () => {
    // Group 0 as above (duty 0, 100 A); group 1: e = 5 V, D = 1 → (16 − 5)/0.1 = 110 A > 30, duty (5 + 3)/16 = 0.5;
    // group 2: e = 7 V, D = 0.5 → (8 − 7)/0.1 = 10 A, free. I_b = 0 × 100 + 0.5 × 30 + 0.5 × 10 = 20 A.
    const s = new PackSolver(params, 3);
    const i = new Float64Array(3);
    const d = new Float64Array(3);
    const ib = s.solve(Float64Array.of(0.1, 1, 0.5), Float64Array.of(-1000, 500, 700), i, d);
    expect(Array.from(d)).toEqual([0, 0.5, 0.5]);
    expect(i[0]).toBeCloseTo(100, 10);
    expect(i[1]).toBe(30);
    expect(i[2]).toBeCloseTo(10, 10);
    expect(ib).toBeCloseTo(20, 10);
  });

  it("holds +I_lim at a small positive duty for a motor turned slowly backwards, and leaves a free one turned backwards at its commanded duty", () => {
    // Group 0: e = −1 V, D = 0.5 → (8 + 1)/0.1 = 90 A > 30, so the duty for +30 A is (−1 + 3)/16 = 0.125, inside 0…1.
    // Group 1: e = −1 V, D = 0.05 → (0.8 + 1)/0.1 = 18 A, under the limit: it keeps D = 0.05.
    const s = new PackSolver(params, 2);
    const i = new Float64Array(2);
    const d = new Float64Array(2);
    const ib = s.solve(Float64Array.of(0.5, 0.05), Float64Array.of(-100, -100), i, d);
    expect(i[0]).toBe(30);
    expect(d[0]).toBeCloseTo(0.125, 14);
    expect(d[1]).toBe(0.05);
    expect(i[1]).toBeCloseTo(18, 10);
    expect(ib).toBeCloseTo(0.125 * 30 + 0.05 * 18, 10); // 3.75 + 0.9 = 4.65 A
  });

  it("with a sagging pack, a group limited on the first pass then saturated as the voltage moves still balances power", () => {
    // R_p = 0.05 Ω, two motors a group. Power balance V_oc·I_b = R_p·I_b² + Σ m(I²R_m + e·I) holds whatever state each group ends in.
    const p = { ...params, packResistance: 0.05, motorsPerGroup: 2 };
    const s = new PackSolver(p, 2);
    const i = new Float64Array(2);
    const d = new Float64Array(2);
    const ib = s.solve(Float64Array.of(0.1, 0.9), Float64Array.of(-1000, 900), i, d);
    const e = [-10, 9];
    const load = 2 * (i[0]! ** 2 * 0.1 + e[0]! * i[0]! + i[1]! ** 2 * 0.1 + e[1]! * i[1]!);
    expect(16 * ib).toBeCloseTo(0.05 * ib * ib + load, 8);
    expect(d[0]).toBe(0);
    expect(i[0]).toBeCloseTo(100, 10); // at duty 0 the pack plays no part: (0 + 10)/0.1
  });

  it("leaves entries past the group count alone when the arrays are longer", () => {
    const s = new PackSolver(params, 1);
    const i = Float64Array.of(0, 7);
    const d = Float64Array.of(0, 7);
    s.solve(Float64Array.of(0.5, 0.5), Float64Array.of(600, 600), i, d);
    expect(i[0]).toBeCloseTo(20, 10); // (0.5 × 16 − 6)/0.1
    expect(i[1]).toBe(7);
    expect(d[1]).toBe(7);
  });
});

describe("the solver's and the steady duty's refusals name the field and its unit", () => {
  it.each([
    ["openCircuitVoltage", 0, "V"],
    ["packResistance", -1, "Ω"],
    ["motorResistance", 0, "Ω"],
    ["torqueConstant", 0, "N·m/A"],
    ["currentLimit", 0, "A"],
    ["motorsPerGroup", 0, ""],
  ])("PackSolver refuses %s = %d, naming it with unit %j", (field, value, unit) => {
    const e = refusal(() => new PackSolver({ ...params, [field]: value }, 1));
    expect(e.param).toBe(field);
    expect(e.unit).toBe(unit);
    expect(e.value).toBe(value);
  });

  it("PackSolver refuses 0 groups and a missing parameter set by name", () => {
    const g = refusal(() => new PackSolver(params, 0));
    expect([g.param, g.unit, g.message]).toEqual(["groups", "", "groups must be at least 1 and at most 16 (got 0)"]);
    expect(refusal(() => new PackSolver(null as unknown as typeof params, 1)).param).toBe("parameters");
  });

  it.each([
    ["groups", [params, 0, 100, 1], ""],
    ["motorSpeed", [params, 1, Number.NaN, 1], "rad/s"],
    ["current", [params, 1, 100, Number.NaN], "A"],
    ["parameters", [null, 1, 100, 1], ""],
  ] as const)("steadyDuty refuses a bad %s by name", (field, args, unit) => {
    const e = refusal(() => steadyDuty(...(args as unknown as Parameters<typeof steadyDuty>)));
    expect(e.param).toBe(field);
    expect(e.unit).toBe(unit);
  });
});

describe("the steady duty at its edges (battery-thevenin-model, erickson-power-electronics)", () => {
  it("counts every motor of every group in the sag: n = 2 groups of m = 2 at 10 A each through 0.05 Ω", () => {
    // c = 0.01 × 500 + 10 × 0.1 = 6 V, a = 2 × 2 × 10 × 0.05 = 2 V, D = 2c/(V_oc + √(V_oc² − 4ac)) = 12/(12 + √96) = 0.5505103;
    // check: 0.5505103 × (12 − 0.05 × 4 × 0.5505103 × 10) = 0.5505103 × 10.898979 = 6.000000.
    const p = { openCircuitVoltage: 12, packResistance: 0.05, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 50, motorsPerGroup: 2 };
    expect(steadyDuty(p, 2, 500, 10)).toBeCloseTo(0.5505103, 7);
  });

  it("returns null when the pack cannot deliver that power at any duty (no real root), and the duty at exactly the most it can", () => {
    // c = 0.01 × 500 + 100 × 0.1 = 15 V, a = 2 × 2 × 100 × 0.05 = 20 V: V_oc² − 4ac = 144 − 1200 < 0.
    const p = { openCircuitVoltage: 12, packResistance: 0.05, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 200, motorsPerGroup: 2 };
    expect(steadyDuty(p, 2, 500, 100)).toBeNull();
    // c = 0.0625 × 32 + 4 × 0.5 = 4 V, a = 4 × 2.25 = 9 V: 144 − 4 × 9 × 4 = 0, the double root D = 2c/V_oc = 8/12;
    // check: (2/3) × (12 − 2.25 × (2/3) × 4) = (2/3) × 6 = 4 = c.
    const edge = { openCircuitVoltage: 12, packResistance: 2.25, motorResistance: 0.5, torqueConstant: 0.0625, currentLimit: 50, motorsPerGroup: 1 };
    expect(steadyDuty(edge, 1, 32, 4)).toBeCloseTo(2 / 3, 14);
  });

  it("returns null for a duty below 0, gives exactly 0 and exactly 1 at the ends of the range", () => {
    const p = { openCircuitVoltage: 12, packResistance: 0, motorResistance: 0.1, torqueConstant: 0.01, currentLimit: 50, motorsPerGroup: 1 };
    expect(steadyDuty(p, 1, 0, -10)).toBeNull(); // c = 0 − 1 = −1 V: D = −1/12
    expect(steadyDuty(p, 1, 500, -50)).toBe(0); // c = 5 − 5 = 0: the motor brakes itself at −50 A with the switch off
    expect(steadyDuty(p, 1, 1000, 20)).toBe(1); // c = 10 + 2 = 12 V = V_oc: D = 24/(12 + 12)
    expect(steadyDuty(p, 1, 1000, 21)).toBeNull(); // c = 12.1 V > V_oc
  });
});
