import { describe, expect, it } from "vitest";
import { type ChoiceOption, choiceLabel, defineChoices, requireChoice } from "../../../calc/core/choices.ts";
import { expectRefusal } from "../../support/refusal.ts";

const SHAPES = [
  { value: "disc", label: "Solid disc" },
  { value: "ring", label: "Thin ring" },
] as const;

describe("defineChoices: a default must be one of its options", () => {
  it("returns the declaration itself when every default is an option", () => {
    const specs = { shape: { label: "Shape", urlKey: "s", options: SHAPES, default: "ring" } } as const;
    expect(defineChoices(specs)).toBe(specs);
  });

  it("throws naming the choice and its default otherwise", () => {
    expect(() => defineChoices({ shape: { label: "Shape", urlKey: "s", options: SHAPES, default: "bar" as "disc" } })).toThrow(
      'choice "shape": default "bar" is not one of its options',
    );
  });
});

describe("requireChoice: a value that is not on the list is refused by name, whatever the list holds", () => {
  it("lists the allowed values", () => {
    expect(requireChoice("shape", "ring", SHAPES)).toBe("ring");
    expectRefusal(() => requireChoice("shape", "bar", SHAPES), "shape", "bar", "", 'shape must be one of disc, ring (got "bar")');
  });

  it("a list with an empty entry still refuses with the list's values", () => {
    const options = [null, ...SHAPES] as unknown as ChoiceOption<"disc" | "ring">[];
    expect(requireChoice("shape", "disc", options)).toBe("disc");
    expectRefusal(() => requireChoice("shape", "bar", options), "shape", "bar", "", 'shape must be one of , disc, ring (got "bar")');
  });

  it("no list at all refuses every value, nothing included", () => {
    expectRefusal(() => requireChoice("shape", undefined, null as never), "shape", undefined, "", "shape must be one of  (got nothing)");
  });
});

describe("choiceLabel: the words for a choice's value", () => {
  const spec = { label: "Shape", urlKey: "s", options: SHAPES, default: "disc" } as const;

  it("gives an option's label, and a value that is not an option as it is", () => {
    expect(choiceLabel(spec, "ring")).toBe("Thin ring");
    expect(choiceLabel(spec, "bar")).toBe("bar");
  });
});
