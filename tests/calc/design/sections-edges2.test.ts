/**
 * Reading a design's sections (calc/design/sections.ts) at the edges the other tests leave: a
 * number stored as text, at an open minimum or above the maximum; a parts list that is not a list,
 * holds entries that are not parts, or is longer than a link carries; a missing choice; a missing
 * list of points; and a section read without naming the unit system. The design is the invented
 * demo robot's.
 */
import { describe, expect, it } from "vitest";
import { demoDesign, designToText, readDesign } from "#calc";
import { type DesignProblem, readSection, readValues } from "../../../calc/design/sections.ts";
import { FORMS } from "../../../calc/design/registry.ts";

// biome-ignore lint/suspicious/noExplicitAny: a design file as plain JSON
const demo = (): Record<string, any> => JSON.parse(designToText(demoDesign()));
// biome-ignore lint/suspicious/noExplicitAny: test access to any section
const read = (file: unknown): { problems: DesignProblem[]; design: Record<string, any> } => {
  const reading = readDesign(file);
  if (!reading.ok) throw new Error("the design was not read");
  return { problems: reading.problems, design: reading.design };
};
const placement = (message: string) => ({ path: "placement.radius", section: "Accelerometer placement", message, action: "default-used" });

describe("a stored number the field would not accept", () => {
  it("takes the default for a number stored as text, saying it must be a number", () => {
    const file = demo();
    file.placement.radius = "0.02";
    const { problems, design } = read(file);
    expect(design.placement.radius).toBe(0.02);
    expect(problems).toEqual([placement('Sensor radius must be a number (got the text "0.02"); the default, 20 mm, was used')]);
  });

  it("refuses a radius of exactly 0 (its range is open there) and one above the 2000 mm maximum", () => {
    for (const [radius, got] of [
      [0, "0 mm"],
      [3, "3000 mm"],
    ] as const) {
      const file = demo();
      file.placement.radius = radius;
      expect(read(file).problems).toEqual([
        placement(`Sensor radius must be greater than 0 mm and at most 2000 mm (got ${got}); the default, 20 mm, was used`),
      ]);
    }
  });

  it("refuses an infinite number handed in as an object (JSON cannot hold one)", () => {
    const file = demo();
    file.placement.radius = Number.POSITIVE_INFINITY;
    expect(read(file).problems).toEqual([
      placement("Sensor radius must be greater than 0 mm and at most 2000 mm (got a number too large to store); the default, 20 mm, was used"),
    ]);
  });
});

describe("a stored parts list", () => {
  it("that is not a list: the layout starts empty, and the file says so", () => {
    const file = demo();
    file.mass.parts = "plate";
    const { problems, design } = read(file);
    expect(design.mass.parts).toEqual([]);
    expect(problems).toEqual([{ path: "mass.parts", section: "Mass layout and balance", message: "Parts list must be a list", action: "default-used" }]);
  });

  it("leaves out an entry that is nothing, one with no shape, and names one by at most the first 60 characters of its name", () => {
    const file = demo();
    const long = "n".repeat(70);
    file.mass.parts = [null, { name: "lid" }, { name: long, shape: { kind: "blob" } }];
    const { problems, design } = read(file);
    expect(design.mass.parts).toEqual([]);
    const section = "Mass layout and balance";
    expect(problems).toEqual([
      { path: "mass.parts[0]", section, message: "The part must be a part object, in entry 1 of the parts list; it was left out", action: "item-dropped" },
      { path: "mass.parts[1]", section, message: "x is missing, in entry 2 “lid” of the parts list; it was left out", action: "item-dropped" },
      {
        path: "mass.parts[2]",
        section,
        message: `Name must be text of at most 60 characters, in entry 3 “${"n".repeat(60)}” of the parts list; it was left out`,
        action: "item-dropped",
      },
    ]);
  });

  it("longer than a link carries (200 parts, MAX_PARTS in calc/mass/parts.ts): keeps the first 200 and says so", () => {
    const file = demo();
    const plate = file.mass.parts[0];
    file.mass.parts = Array.from({ length: 201 }, () => plate);
    const { problems, design } = read(file);
    expect(design.mass.parts).toHaveLength(200);
    expect(problems).toEqual([
      {
        path: "mass.parts",
        section: "Mass layout and balance",
        message: "Parts list holds 201 entries; only the first 200 were read, as many as a link carries",
        action: "item-dropped",
      },
    ]);
  });

  it("reads a mass section without mounting points silently, with none", () => {
    const file = demo();
    delete file.mass.candidates;
    const { problems, design } = read(file);
    expect(problems).toEqual([]);
    expect(design.mass.candidates).toEqual([]);
  });
});

describe("a missing choice", () => {
  it("takes the choice's default and names it in the entry's words", () => {
    const file = demo();
    delete file.fasteners[0].size;
    const { problems, design } = read(file);
    expect(design.fasteners[0].size).toBe("M4");
    expect(problems).toEqual([
      {
        path: "fasteners[0].size",
        section: "Fasteners: Counterweight washers (one M4 bolt)",
        message: "Thread size is missing; M4 × 0.7 was used",
        action: "default-used",
      },
    ]);
  });
});

describe("a section read on its own", () => {
  it("words its messages in metric units when no unit system is named", () => {
    const problems: DesignProblem[] = [];
    const form = FORMS.find((f) => f.id === "placement")!;
    const values = readSection(form, { ...demo().placement, radius: -3 }, "placement", problems) as Record<string, unknown>;
    expect(values.radius).toBe(0.02);
    expect(problems).toEqual([placement("Sensor radius must be greater than 0 mm and at most 2000 mm (got -3000 mm); the default, 20 mm, was used")]);
  });
});

describe("a listed section read on its own", () => {
  it("words a fraction in the field's own metric unit when no unit system is named", () => {
    const problems: DesignProblem[] = [];
    const form = FORMS.find((f) => f.id === "rims")!;
    readSection(form, [{ ...demo().rims[0], poisson: 0.7 }], "rims", problems);
    // Poisson's ratio is declared in "frac" (a plain fraction) in both systems (calc/loads/rim-inputs.ts).
    expect(problems.map((p) => p.message)).toEqual(["Poisson's ratio must be between 0 and 0.5 (got 0.7); the default, 0.33, was used"]);
  });

  it("reads one entry's values in metric, under the calculator's title, when no options are given", () => {
    const problems: DesignProblem[] = [];
    const form = FORMS.find((f) => f.id === "rims")!;
    readValues(form, { ...demo().rims[0], poisson: 0.7 }, "rims[0]", problems);
    expect(problems).toEqual([
      {
        path: "rims[0].poisson",
        section: form.title,
        message: "Poisson's ratio must be between 0 and 0.5 (got 0.7); the default, 0.33, was used",
        action: "default-used",
      },
      { path: "rims[0].name", message: "is not a value of this calculator; it was ignored", action: "default-used" },
    ]);
  });
});
