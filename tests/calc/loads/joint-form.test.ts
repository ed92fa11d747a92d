/**
 * The fastener calculator's form (calc/loads/joint-form.ts): its menus offer exactly what the joint
 * check accepts, its defaults are the check's, the inputs a choice does not read are left out of
 * links, and the earlier check's link keys still open.
 */
import { describe, expect, it } from "vitest";
import { initialValues, linkQuery, readLink } from "../../../calc/core/calculator.ts";
import { FASTENER_GRADE_OPTIONS, FASTENER_SIZE_OPTIONS } from "../../../calc/loads/inch-fasteners.ts";
import {
  BOLTED_JOINT_CHOICE_DEFAULTS,
  boltedJointInputs,
  JOINT_MODE_OPTIONS,
  LOAD_SOURCE_OPTIONS,
  MEMBER_MATERIAL_OPTIONS,
  PRELOAD_SOURCE_OPTIONS,
  THREAD_IN_OPTIONS,
} from "../../../calc/loads/joint-inputs.ts";
import { END_CONDITION_OPTIONS } from "../../../calc/loads/slip.ts";
import { fastenerChoices, fastenerInputApplies, form, gradeWords } from "../../../calc/loads/joint-form.ts";
import fasteners from "../../../calc/calculators/fasteners.ts";

const values = (options: readonly { value: string }[]) => options.map((o) => o.value);

describe("the fastener calculator's form", () => {
  it.each([
    ["size", FASTENER_SIZE_OPTIONS],
    ["grade", FASTENER_GRADE_OPTIONS],
    ["jointMode", JOINT_MODE_OPTIONS],
    ["endCondition", END_CONDITION_OPTIONS],
    ["preloadFrom", PRELOAD_SOURCE_OPTIONS],
    ["loadFrom", LOAD_SOURCE_OPTIONS],
    ["threadIn", THREAD_IN_OPTIONS],
    ["memberMaterial", MEMBER_MATERIAL_OPTIONS],
  ] as const)("offers exactly the %s values the joint check accepts", (name, options) => {
    expect(values(fastenerChoices[name].options)).toEqual(values(options));
  });

  it("starts on the joint check's own defaults", () => {
    const start = initialValues(form);
    for (const [name, spec] of Object.entries(boltedJointInputs)) expect(start[name as keyof typeof start]).toBe(spec.default);
    for (const [name, value] of Object.entries(BOLTED_JOINT_CHOICE_DEFAULTS)) expect(start[name as keyof typeof start]).toBe(value);
  });

  it("is the descriptor's form: the build sheet and the page read the same fields", () => {
    expect(fasteners.inputs).toBe(form.inputs);
    expect(fasteners.choices).toBe(form.choices);
  });

  it.each([
    [{ loadFrom: "spin" }, ["load"]],
    [{ loadFrom: "force" }, ["partMass", "radius", "angularSpeed"]],
    [{ preloadFrom: "share" }, ["tighteningTorque"]],
    [{ preloadFrom: "torque" }, ["preloadShare"]],
    [{ threadIn: "nut" }, ["engagedLength"]],
    [{ jointMode: "tension" }, ["stackHeight", "frictionCoefficient", "interfaces"]],
  ] as const)("leaves out of a link the inputs %o does not read", (choice, unread) => {
    for (const name of unread) expect(fastenerInputApplies(name, choice)).toBe(false);
    const query = new URLSearchParams(linkQuery(fasteners, { ...initialValues(fasteners), ...choice }));
    for (const name of unread) expect(query.has(boltedJointInputs[name].urlKey)).toBe(false);
  });

  it("reads a link of the earlier average-shear check: class and mode keep their keys, the shear ratio and plane are accepted", () => {
    const read = readLink(fasteners, "?v=1&m=42g&r=55mm&rpm=2400rpm&n=1&size=M2&cls=4.6&mode=tension&plane=shank&sr=0.6&fail=1&thin=2");
    expect(read.notices).toEqual([]);
    expect(read.choices).toEqual({ size: "M2", grade: "4.6", jointMode: "tension" });
    expect(read.texts).toEqual({ partMass: "42g", radius: "55mm", angularSpeed: "2400rpm", count: "1", failBelow: "1", marginalBelow: "2" });
  });

  it("names a grade the way the build sheet prints it", () => {
    expect(gradeWords("8.8")).toBe("class 8.8");
    expect(gradeWords("sae-5")).toBe("SAE J429 grade 5");
    expect(gradeWords("a574")).toBe("ASTM A574 socket head");
  });
});
