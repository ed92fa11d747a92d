/**
 * The gyroscopic functions at the edge of the double range: a product that passes the largest
 * double is refused naming the input that took it there, with that input's unit, and the message
 * says which quantity would not stay finite.
 */
import { describe, expect, it } from "vitest";
import { angularMomentum, bearingForcePair, gyroscopicMoment, gyroscopicReaction } from "../../../calc/weapon/gyroscopic.ts";
import { refusal } from "../../support/refusal.ts";

describe("angularMomentum past the largest double", () => {
  it("blames the rotor inertia when it is the extreme input: 1e300 kg·m² × 1e10 rad/s = 1e310 N·m·s", () => {
    const e = refusal(() => angularMomentum({ inertia: 1e300, spinSpeed: 1e10 }));
    expect(e).toMatchObject({ param: "inertia", value: 1e300, unit: "kg·m²", expected: "small enough for the angular momentum to stay finite" });
  });

  it("blames the spin speed when it is the extreme input: 1e10 kg·m² × 1e300 rad/s", () => {
    const e = refusal(() => angularMomentum({ inertia: 1e10, spinSpeed: 1e300 }));
    expect(e).toMatchObject({ param: "spinSpeed", value: 1e300, unit: "rad/s", expected: "small enough for the angular momentum to stay finite" });
  });
});

describe("gyroscopicMoment past the largest double", () => {
  const what = "small enough for the gyroscopic moment to stay finite";
  it("blames the inertia for 1e300 × 1e5 × 1e5", () => {
    expect(refusal(() => gyroscopicMoment({ inertia: 1e300, spinSpeed: 1e5, turnRate: 1e5 }))).toMatchObject({
      param: "inertia",
      unit: "kg·m²",
      expected: what,
    });
  });

  it("blames the spin speed for 1e5 × 1e300 × 1e5", () => {
    expect(refusal(() => gyroscopicMoment({ inertia: 1e5, spinSpeed: 1e300, turnRate: 1e5 }))).toMatchObject({
      param: "spinSpeed",
      unit: "rad/s",
      expected: what,
    });
  });

  it("blames the turn rate for 1e5 × 1e5 × 1e300", () => {
    expect(refusal(() => gyroscopicMoment({ inertia: 1e5, spinSpeed: 1e5, turnRate: 1e300 }))).toMatchObject({
      param: "turnRate",
      unit: "rad/s",
      expected: what,
    });
  });
});

describe("bearingForcePair past the largest double", () => {
  it("blames a huge moment: 1e300 N·m over 1e-10 m is 1e310 N", () => {
    expect(refusal(() => bearingForcePair({ moment: 1e300, bearingSpan: 1e-10 }))).toMatchObject({
      param: "moment",
      value: 1e300,
      unit: "N·m",
      expected: "small enough for the bearing force to stay finite",
    });
  });

  it("blames a tiny span: 1e10 N·m over 1e-300 m is 1e310 N, and asks for a larger span", () => {
    expect(refusal(() => bearingForcePair({ moment: 1e10, bearingSpan: 1e-300 }))).toMatchObject({
      param: "bearingSpan",
      value: 1e-300,
      unit: "m",
      expected: "large enough for the bearing force to stay finite",
    });
  });
});

describe("gyroscopicReaction past the largest double", () => {
  const base = { axle: "horizontal", spin: "front-up", motion: "yaw-left" };
  const what = "small enough for the gyroscopic moment to stay finite";
  it("blames the inertia, the spin speed or the rate, whichever is extreme, with its unit", () => {
    expect(refusal(() => gyroscopicReaction({ ...base, inertia: 1e300, spinSpeed: 1e5, rate: 1e5 }))).toMatchObject({
      param: "inertia",
      unit: "kg·m²",
      expected: what,
    });
    expect(refusal(() => gyroscopicReaction({ ...base, inertia: 1e5, spinSpeed: 1e300, rate: 1e5 }))).toMatchObject({
      param: "spinSpeed",
      unit: "rad/s",
      expected: what,
    });
    expect(refusal(() => gyroscopicReaction({ ...base, inertia: 1e5, spinSpeed: 1e5, rate: 1e300 }))).toMatchObject({
      param: "rate",
      unit: "rad/s",
      expected: what,
    });
  });
});
