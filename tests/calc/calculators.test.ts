/**
 * Every calculator of the registry, through its descriptor: any valid values survive a link and a
 * design file exactly (value → link → value; value → design section → build-sheet link → value),
 * and every descriptor is complete.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type AnyCalculator, type AnyValues, linkFor, linkQuery, readLink, valuesOf } from "../../calc/core/calculator.ts";
import { readSection, type DesignProblem } from "../../calc/design/sections.ts";
import { CALCULATORS } from "../../calc/design/calculators.ts";
import { valuesArb } from "../support/arbitraries.ts";

const systems = fc.constantFrom("metric", "us") as fc.Arbitrary<"metric" | "us">;

/** What a calculator reads back for the inputs that apply (the others are left out of links). */
function applying(calc: AnyCalculator, values: AnyValues): AnyValues {
  return Object.fromEntries(Object.entries(values).filter(([name]) => !(name in calc.inputs) || !calc.applies || calc.applies(name, values)));
}

/** Reads a link back into values, as a calculator page does. */
function readBack(calc: AnyCalculator, query: string, system: "metric" | "us") {
  const linked = readLink(calc, `?${query}`);
  expect(linked.notices).toEqual([]);
  expect(linked.system).toBe(system);
  return valuesOf(calc, linked, system);
}

describe.each(CALCULATORS.map((calc) => [calc.id, calc] as const))("calculator %s", (_, calc) => {
  it("lives at a chapter and an anchor, with a title and a verdict card for its defaults", () => {
    expect(calc.chapter).toMatch(/^[a-z-]+$/);
    expect(calc.anchor).toMatch(/-calculator$/);
    expect(calc.title.length).toBeGreaterThan(3);
  });

  it("gives back exactly the same values from a link (value → link → value, property)", () => {
    fc.assert(
      fc.property(valuesArb(calc), systems, (values, system) => {
        const read = readBack(calc, linkQuery(calc, values, { system }), system);
        expect(read.errors).toEqual([]);
        expect(applying(calc, read.values!)).toEqual(applying(calc, values));
      }),
      { numRuns: 60 },
    );
  });

  it("gives back exactly the same values from a design file and its build-sheet link (property)", () => {
    fc.assert(
      fc.property(valuesArb(calc), systems, (values, system) => {
        const stored = JSON.parse(JSON.stringify(calc.section.kind === "list" ? [{ name: "entry", ...values }] : values));
        const problems: DesignProblem[] = [];
        const section = readSection(calc, stored, calc.id, problems);
        expect(problems).toEqual([]);
        const entry = Array.isArray(section) ? section[0]! : section;
        const { name: _name, ...fromFile } = entry;
        expect(fromFile).toEqual(values);
        const link = linkFor(calc, fromFile, { system });
        expect(link.startsWith(`chapters/${calc.chapter}/?`)).toBe(true);
        const read = readBack(calc, link.slice(link.indexOf("?") + 1, link.indexOf("#")), system);
        expect(applying(calc, read.values!)).toEqual(applying(calc, values));
      }),
      { numRuns: 40 },
    );
  });
});
