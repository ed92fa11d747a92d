/**
 * Rolling bearings (calc/weapon/bearings.ts) at their edges: the ISO 76 static load of a ball
 * bearing that also takes an axial load in a hit, a life in hours past the largest double, the
 * refusals of the optional factors and of an axial load on a roller bearing with their units and
 * wording, and the input a result past the largest double is blamed on.
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import {
  bearingCheck,
  equivalentDynamicLoad,
  equivalentStaticLoad,
  ratingLifeHours,
  requiredDynamicLoadRating,
  staticSafetyFactor,
  staticSafetyGuide,
} from "../../../calc/weapon/bearings.ts";
import { expectClose } from "./support.ts";

/** The field, value, unit and rule of the refusal `run` throws (fails the test otherwise). */
function refused(run: () => unknown): { param: string; value: unknown; unit: string; expected: string } {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(CalcInputError);
    const { param, value, unit, expected } = error as CalcInputError;
    return { param, value, unit, expected };
  }
  throw new Error("expected a refusal");
}

const TINY = Number.MIN_VALUE; // 5e-324, the smallest subnormal
const BALL = { bearingType: "ball", dynamicLoadRating: 5400, staticLoadRating: 2360, radialLoad: 1200, shockRadialLoad: 1000, angularSpeed: 942.48 };

describe("bearingCheck under a hit with an axial load", () => {
  it("takes a ball bearing's P0 as 0.6·F_r + 0.5·F_a when that passes F_r (ISO 76 for a single-row radial ball bearing, as printed in a bearing maker's technical pages: 'P0r=0.6Fr+0.5Fa', 'when P0r<Fr ; P0r=Fr')", () => {
    // hand: 0.6·1000 + 0.5·1000 = 1100 N > 1000 N; s0 = 2360/1100 = 2.1454545
    const r = bearingCheck({ ...BALL, axialLoad: 1000 });
    expectClose(r.staticEquivalentLoad, 1100, 1e-15);
    expectClose(r.staticSafetyFactor!, 2360 / 1100, 1e-15);
  });

  it("keeps P0 = F_r while 0.6·F_r + 0.5·F_a is smaller (hand: 0.6·1000 + 0.5·700 = 950 N < 1000 N)", () => {
    expect(bearingCheck({ ...BALL, axialLoad: 700 }).staticEquivalentLoad).toBe(1000);
  });

  it("refuses a negative axial load, naming axialLoad in N", () => {
    expect(refused(() => bearingCheck({ ...BALL, axialLoad: -1 }))).toEqual({ param: "axialLoad", value: -1, unit: "N", expected: "0 N or more" });
  });

  it("refuses an axial load on a roller bearing, saying why and what to use instead", () => {
    expect(refused(() => bearingCheck({ ...BALL, bearingType: "roller", axialLoad: 5 }))).toEqual({
      param: "axialLoad",
      value: 5,
      unit: "N",
      expected: "0 N for a roller bearing (a cylindrical roller bearing is taken to carry no axial load: use a ball bearing or a separate thrust bearing)",
    });
  });

  it("gives no life in hours (null, never infinity) when the speed is so slow that the hours pass the largest double", () => {
    // L10 = (5400/1200)³ = 91.125 million revolutions; at 5e-324 rad/s the revolutions per hour round to 0
    const r = bearingCheck({ ...BALL, angularSpeed: TINY });
    expectClose(r.ratingLife!, 91.125, 1e-14);
    expect(r.ratingLifeHours).toBeNull();
  });

  it("names the shock load or the axial load, whichever is larger, when P0 passes the largest double (0.6·1.7e308 + 0.5·1.6e308 = 1.82e308)", () => {
    expect(refused(() => bearingCheck({ ...BALL, shockRadialLoad: 1.7e308, axialLoad: 1.6e308 }))).toEqual({
      param: "shockRadialLoad",
      value: 1.7e308,
      unit: "N",
      expected: "small enough for the static equivalent load to stay finite",
    });
    // 0.6·1.6e308 + 0.5·1.79e308 = 1.855e308
    expect(refused(() => bearingCheck({ ...BALL, shockRadialLoad: 1.6e308, axialLoad: 1.79e308 }))).toEqual({
      param: "axialLoad",
      value: 1.79e308,
      unit: "N",
      expected: "small enough for the static equivalent load to stay finite",
    });
  });
});

describe("the optional factors of the equivalent loads", () => {
  it("equivalentStaticLoad refuses X0 of 0 and a negative Y0, each named as a pure number", () => {
    expect(refused(() => equivalentStaticLoad({ radialLoad: 1000, radialFactor: 0 }))).toEqual({
      param: "radialFactor",
      value: 0,
      unit: "",
      expected: "greater than 0",
    });
    expect(refused(() => equivalentStaticLoad({ radialLoad: 1000, axialFactor: -0.5 }))).toEqual({
      param: "axialFactor",
      value: -0.5,
      unit: "",
      expected: "0 or more",
    });
  });
});

describe("the input a result past the largest double is blamed on", () => {
  const loads = [
    // [the field made extreme, the call's fields]: 1e300 times 1e10 passes the doubles either way round
    ["radialLoad", { radialLoad: 1e300, radialFactor: 1e10 }],
    ["radialFactor", { radialLoad: 1e10, radialFactor: 1e300 }],
    ["axialLoad", { radialLoad: 1, axialLoad: 1e300, axialFactor: 1e10 }],
    ["axialFactor", { radialLoad: 1, axialLoad: 1e10, axialFactor: 1e300 }],
  ] as const;
  const units: Record<string, string> = { radialLoad: "N", axialLoad: "N", radialFactor: "", axialFactor: "" };

  it.each(loads)("equivalentDynamicLoad and equivalentStaticLoad blame %s, in its unit", (param, fields) => {
    const value = (fields as Record<string, number>)[param];
    expect(refused(() => equivalentDynamicLoad(fields))).toEqual({
      param,
      value,
      unit: units[param],
      expected: "small enough for the equivalent load to stay finite",
    });
    expect(refused(() => equivalentStaticLoad(fields))).toEqual({
      param,
      value,
      unit: units[param],
      expected: "small enough for the static equivalent load to stay finite",
    });
  });

  it("ratingLifeHours blames a life of 1e305 million revolutions, or a speed in the subnormals", () => {
    // 1e305·1e6 = 1e311 revolutions
    expect(refused(() => ratingLifeHours({ ratingLife: 1e305, angularSpeed: 100 }))).toEqual({
      param: "ratingLife",
      value: 1e305,
      unit: "",
      expected: "small enough for the rating life in hours to stay finite",
    });
    expect(refused(() => ratingLifeHours({ ratingLife: 91.125, angularSpeed: TINY }))).toEqual({
      param: "angularSpeed",
      value: TINY,
      unit: "rad/s",
      expected: "large enough for the rating life in hours to stay finite",
    });
  });

  it("requiredDynamicLoadRating blames the load or the life, whichever is further from 1", () => {
    // 1e300·(1e30)^(1/3) = 1e310
    expect(refused(() => requiredDynamicLoadRating({ equivalentLoad: 1e300, ratingLife: 1e30, bearingType: "ball" }))).toEqual({
      param: "equivalentLoad",
      value: 1e300,
      unit: "N",
      expected: "small enough for the load rating to stay finite",
    });
    // 1e300·(1e308)^(1/3) ≈ 4.6e402
    expect(refused(() => requiredDynamicLoadRating({ equivalentLoad: 1e300, ratingLife: 1e308, bearingType: "ball" }))).toEqual({
      param: "ratingLife",
      value: 1e308,
      unit: "",
      expected: "small enough for the load rating to stay finite",
    });
  });

  it("staticSafetyFactor blames the rating or the load, whichever is further from 1", () => {
    expect(refused(() => staticSafetyFactor({ staticLoadRating: 1e300, staticEquivalentLoad: 1e-10 }))).toEqual({
      param: "staticLoadRating",
      value: 1e300,
      unit: "N",
      expected: "small enough for the static safety factor to stay finite",
    });
    expect(refused(() => staticSafetyFactor({ staticLoadRating: 2360, staticEquivalentLoad: TINY }))).toEqual({
      param: "staticEquivalentLoad",
      value: TINY,
      unit: "N",
      expected: "large enough for the static safety factor to stay finite",
    });
  });
});

describe("staticSafetyGuide refusals", () => {
  it("names an unknown bearing type, and a rotating flag that is not true or false", () => {
    expect(refused(() => staticSafetyGuide({ bearingType: "needle" })).param).toBe("bearingType");
    expect(refused(() => staticSafetyGuide({ bearingType: "ball", rotating: "yes" as unknown as boolean }))).toEqual({
      param: "rotating",
      value: "yes",
      unit: "",
      expected: "true or false",
    });
  });
});
