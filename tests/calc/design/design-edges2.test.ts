/**
 * Reading and bringing forward a design (calc/design/design.ts) at the edges the other tests
 * leave: a version 1 mass section whose numbers are not an object, a version 2 file without the
 * sections version 3 filled in, a byte-order mark's character inside the text, and describing
 * problems that are not a list.
 */
import { describe, expect, it } from "vitest";
import { DESIGN_FORMAT, DESIGN_VERSION, describeProblems, MIGRATIONS, readDesignText } from "../../../calc/design/design.ts";
import { expectRefusal } from "../../support/refusal.ts";

describe("older designs at their edges", () => {
  it("1 → 2: drops a mass section's numbers stored as text rather than spreading its characters into the section", () => {
    expect(MIGRATIONS[1]!({ version: 1, mass: { scalars: "abc", parts: "p" } })).toEqual({ version: 1, mass: { parts: "p" } });
  });

  it("2 → 3: adds no section the file did not have", () => {
    const next = MIGRATIONS[2]!({ version: 2, fasteners: [] });
    expect(Object.keys(next).sort()).toEqual(["fasteners", "version"]);
  });
});

describe("a design's text", () => {
  it("keeps a zero-width no-break space (U+FEFF) inside a name: only a leading one is a byte-order mark", () => {
    const text = JSON.stringify({ format: DESIGN_FORMAT, version: DESIGN_VERSION, name: "arm\uFEFFbar" });
    for (const file of [text, `\uFEFF${text}`]) {
      const reading = readDesignText(file);
      expect(reading.ok && reading.design.name).toBe("arm\uFEFFbar");
    }
  });

  it("refuses to describe problems that are not a list, naming them", () => {
    expectRefusal(() => describeProblems("none" as never), "problems", "none", "", 'problems must be a list of problems (got "none")');
  });
});
