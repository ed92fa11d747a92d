/**
 * The fastener form's remaining behaviour: the inputs each choice reads are kept in links (and the
 * ones no choice affects always are), a grade outside the menus is named as given, and the basis of
 * the bolt's strengths is worded with the standard that gives them (ISO 898-1 for property classes,
 * SAE J429 for inch grades, ASTM A574 for socket-head cap screws).
 */
import { describe, expect, it } from "vitest";
import { BOLTED_JOINT_CHOICE_DEFAULTS, type BoltedJointInput, boltedJointInputs } from "../../../calc/loads/joint-inputs.ts";
import { boltedJointCheck } from "../../../calc/loads/joint.ts";
import { fastenerInputApplies, gradeWords, strengthBasisWords } from "../../../calc/loads/joint-form.ts";

const defaultsOf = (specs: Record<string, { default: number }>) => Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.default]));
const JOINT = { ...defaultsOf(boltedJointInputs), ...BOLTED_JOINT_CHOICE_DEFAULTS } as BoltedJointInput;

describe("the inputs the fastener form reads", () => {
  it.each([
    [{ loadFrom: "spin" }, ["partMass", "radius", "angularSpeed"]],
    [{ loadFrom: "force" }, ["load"]],
    [{ preloadFrom: "share" }, ["preloadShare"]],
    [{ preloadFrom: "torque" }, ["tighteningTorque"]],
    [{ threadIn: "al-6061-t6" }, ["engagedLength"]],
    [{ jointMode: "shear" }, ["stackHeight", "frictionCoefficient", "interfaces"]],
  ] as const)("reads, with %o, the inputs %o", (choice, read) => {
    for (const name of read) expect(fastenerInputApplies(name, choice)).toBe(true);
  });

  it("reads, with no choice made, what the defaults read: the spinning part, the share of proof, the tapped thread and the shear inputs", () => {
    // Defaults: load from a spinning part, preload as a share of proof, threaded into 6061-T6, in shear.
    const read = ["partMass", "radius", "angularSpeed", "preloadShare", "engagedLength", "stackHeight", "frictionCoefficient", "interfaces"];
    for (const name of read) expect(fastenerInputApplies(name, {})).toBe(true);
    for (const name of ["load", "tighteningTorque"]) expect(fastenerInputApplies(name, {})).toBe(false);
  });

  it("always reads the inputs no choice affects", () => {
    const choices = { loadFrom: "force", preloadFrom: "torque", threadIn: "nut", jointMode: "tension" };
    for (const name of ["count", "gripLength", "shankLength", "nutFactor", "failBelow", "marginalBelow"]) {
      expect(fastenerInputApplies(name, choices)).toBe(true);
    }
  });
});

describe("the fastener form's words", () => {
  it("names a grade outside the menus as given", () => {
    expect(gradeWords("stainless")).toBe("stainless");
  });

  it.each([
    ["M4", "8.8", "ISO 898-1 specified minimum"],
    ["1/4-20", "sae-5", "SAE J429 specified minimum"],
    ["1/4-20", "a574", "ASTM A574 specified minimum"],
  ] as const)("words the strengths of a %s bolt of grade %s as %s", (size, grade, words) => {
    expect(strengthBasisWords(boltedJointCheck({ ...JOINT, size, grade }))).toBe(words);
  });
});
