/**
 * Category inputs: a value on the list or a refusal that lists the list; a declaration whose
 * default is not one of its options; the label shown for a value.
 */
import { describe, expect, it } from "vitest";
import { choiceLabel, defineChoices, requireChoice } from "../../../calc/core/choices.ts";
import { expectRefusal } from "../../support/refusal.ts";

const modes = [
  { value: "shear", label: "Shear" },
  { value: "tension", label: "Tension" },
] as const;

describe("requireChoice", () => {
  it("returns a value on the list", () => {
    expect(requireChoice("mode", "tension", modes)).toBe("tension");
  });

  it("refuses anything else and lists the allowed values", () => {
    expectRefusal(() => requireChoice("mode", "Tension", modes), "mode", "Tension", "", 'mode must be one of shear, tension (got "Tension")');
    expectRefusal(() => requireChoice("mode", undefined, modes), "mode", undefined, "", "mode must be one of shear, tension (got nothing)");
    expectRefusal(() => requireChoice("mode", { value: "shear" }, modes), "mode", { value: "shear" }, "", "mode must be one of shear, tension (got an object)");
  });

  it("refuses every value when the list is missing or holds gaps", () => {
    expectRefusal(() => requireChoice("mode", "shear", null as never), "mode", "shear", "", 'mode must be one of  (got "shear")');
    expect(requireChoice("mode", "shear", [null, ...modes] as never)).toBe("shear");
    expectRefusal(() => requireChoice("mode", "x", [null, ...modes] as never), "mode", "x", "", 'mode must be one of , shear, tension (got "x")');
  });
});

describe("defineChoices", () => {
  it("returns the declaration when each default is one of its options", () => {
    const specs = { mode: { label: "Loading", urlKey: "mode", options: modes, default: "shear" } } as const;
    expect(defineChoices(specs)).toBe(specs);
  });

  it("refuses a default that is not one of its options, naming the choice and the default", () => {
    expect(() => defineChoices({ mode: { label: "Loading", urlKey: "mode", options: modes, default: "bending" as never } })).toThrow(
      'choice "mode": default "bending" is not one of its options',
    );
  });
});

describe("choiceLabel", () => {
  const spec = { label: "Loading", urlKey: "mode", options: modes, default: "shear" } as const;
  it("gives the label of a value, and the value itself when it is not on the list", () => {
    expect(choiceLabel(spec, "tension")).toBe("Tension");
    expect(choiceLabel(spec, "bending")).toBe("bending");
  });
});
