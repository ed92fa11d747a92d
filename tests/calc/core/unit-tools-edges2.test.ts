import { describe, it } from "vitest";
import { convert, requireUnitOfKind } from "../../../calc/core/unit-tools.ts";
import { expectRefusal } from "../../support/refusal.ts";

describe("unit tools: a unit of the wrong kind is refused by name, with no unit of its own", () => {
  it("convert names the target unit and the kind the source unit measures", () => {
    expectRefusal(() => convert(1, "mm", "kg"), "to", "kg", "", 'to must be a unit of length, as mm is (got "kg")');
  });

  it("requireUnitOfKind lists the units of the kind it wants", () => {
    expectRefusal(
      () => requireUnitOfKind("radiusUnit", "kg", "length"),
      "radiusUnit",
      "kg",
      "",
      'radiusUnit must be a unit of length (m, cm, mm, in, ft) (got "kg")',
    );
    expectRefusal(
      () => requireUnitOfKind("radiusUnit", 3, "length"),
      "radiusUnit",
      "3",
      "",
      'radiusUnit must be a unit of length (m, cm, mm, in, ft) (got "3")',
    );
  });
});
