import { describe, it } from "vitest";
import { unitTables } from "../../../calc/core/unit-table.ts";
import { expectRefusal } from "../../support/refusal.ts";

describe("unitTables: only the names of quantity kinds are kinds", () => {
  it("refuses what is not a list by name, with no unit", () => {
    expectRefusal(() => unitTables("length" as never), "kinds", "length", "", 'kinds must be a list of quantity kinds (got "length")');
  });

  it("refuses the names every object inherits (toString, constructor), not kinds although an object answers to them", () => {
    for (const name of ["toString", "constructor", "__proto__"]) {
      expectRefusal(() => unitTables([name as never]), "kinds", name, "", `kinds must be quantity kinds (length, mass, …) (got "${name}")`);
    }
  });

  it("refuses an entry that is not text even when it prints as a kind's name", () => {
    expectRefusal(() => unitTables([["length"] as never]), "kinds", ["length"], "", "kinds must be quantity kinds (length, mass, …) (got a list of 1)");
  });
});
