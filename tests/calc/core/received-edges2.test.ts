import { describe, expect, it } from "vitest";
import { describeReceived } from "../../../calc/core/received.ts";
import type { UnitId } from "../../../calc/core/units.ts";
import { readDesign } from "../../../calc/design/design.ts";

describe("describeReceived: a stored or linked value in words, for the (got …) of a message", () => {
  it("a number in the field's unit, to six figures, with its symbol, or bare without a unit", () => {
    // -3 m in a millimetre field: -3 / 0.001 = -3000 mm.
    expect(describeReceived(-3, "mm")).toBe("-3000 mm");
    // 0.0123456789 to six significant figures is 0.0123457.
    expect(describeReceived(0.0123456789)).toBe("0.0123457");
    // A count has no symbol: the number alone, no trailing space.
    expect(describeReceived(3, "count")).toBe("3");
    // A unit that is not one of calc/core's ids is left out rather than guessed.
    expect(describeReceived(3, "furlong" as UnitId)).toBe("3");
  });

  it("not a number, and the two infinities JSON's 1e999 and -1e999 read as, by name", () => {
    expect(describeReceived(Number.NaN, "mm")).toBe("not a number");
    expect(describeReceived(JSON.parse("1e999"), "mm")).toBe("a number too large to store");
    expect(describeReceived(JSON.parse("-1e999"), "mm")).toBe("a negative number too large to store");
  });

  it("a finite SI value that overflows in the field's unit (1e308 m is 1e311 mm) as too large to show", () => {
    expect(describeReceived(1e308, "mm")).toBe("a number too large to show in that unit");
    expect(describeReceived(1e308, "m")).toBe("1e+308 m");
  });

  it("a design file whose sensor radius is 1e308 m is read, the radius reported in words and its default used", () => {
    const reading = readDesign({ format: "whirlbook-design", version: 3, units: "metric", placement: { radius: 1e308 } });
    expect(reading.ok).toBe(true);
    expect(reading.problems).toContainEqual({
      path: "placement.radius",
      section: "Accelerometer placement",
      message: "Sensor radius must be greater than 0 mm and at most 2000 mm (got a number too large to show in that unit); the default, 20 mm, was used",
      action: "default-used",
    });
  });

  it("text quoted as JSON writes it, cut after 40 characters with an ellipsis", () => {
    expect(describeReceived("fast")).toBe('the text "fast"');
    expect(describeReceived('say "hi"')).toBe('the text "say \\"hi\\""');
    const forty = "a".repeat(40);
    expect(describeReceived(forty)).toBe(`the text "${forty}"`);
    expect(describeReceived(`${forty}bc`)).toBe(`the text "${forty}…"`);
  });

  it("null, nothing, a list, an object and anything else by what it is", () => {
    expect(describeReceived(null)).toBe("nothing (null)");
    expect(describeReceived(undefined)).toBe("nothing");
    expect(describeReceived([1, 2])).toBe("a list");
    expect(describeReceived({ mm: 3 })).toBe("an object");
    expect(describeReceived(true)).toBe("true");
  });
});
