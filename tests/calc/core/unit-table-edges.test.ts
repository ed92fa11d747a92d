/**
 * unitTables: the tables a page registers, refused by name for anything that is not a list of
 * quantity kinds.
 */
import { describe, expect, it } from "vitest";
import { DISPLAY, unitTables } from "../../../calc/core/unit-table.ts";
import { expectRefusal } from "../../support/refusal.ts";

describe("unitTables refuses what is not a quantity kind", () => {
  it.each([
    { kind: ["length"], got: "a list of 1", why: "a list holding a kind's name" },
    { kind: 5, got: "5", why: "a number" },
    { kind: "toString", got: '"toString"', why: "a name of an object's machinery" },
    { kind: "colour", got: '"colour"', why: "an unknown kind" },
    { kind: undefined, got: "nothing", why: "nothing" },
  ])("refuses $why, and says what it got in words", ({ kind, got }) => {
    expectRefusal(() => unitTables([kind] as never), "kinds", kind, "", `kinds must be quantity kinds (length, mass, …) (got ${got})`);
  });

  it("refuses a list that is not one, never writing it as [object Object]", () => {
    expectRefusal(() => unitTables({ length: 1 } as never), "kinds", { length: 1 }, "", "kinds must be a list of quantity kinds (got an object)");
    expectRefusal(() => unitTables("length" as never), "kinds", "length", "", 'kinds must be a list of quantity kinds (got "length")');
  });

  it("gives an empty list for no kinds, and each kind's display steps as declared", () => {
    expect(unitTables([])).toEqual([]);
    expect(unitTables(["time"])[0]!.display).toBe(DISPLAY.time);
    expect(Object.keys(unitTables(["time"])[0]!.units)).toEqual(["s", "h", "ms", "us"]);
  });
});
