/**
 * How a stored or linked value is worded in a message ("got …"): in the field's unit, to six
 * figures, and never a crash while the message is being written, whatever the value.
 */
import { describe, expect, it } from "vitest";
import { describeReceived } from "../../../calc/core/received.ts";
import type { UnitId } from "../../../calc/core/units.ts";
import { form as placement } from "../../../calc/calculators/placement.ts";
import type { DesignProblem } from "../../../calc/design/design.ts";
import { readValues } from "../../../calc/design/sections.ts";

describe("describeReceived", () => {
  it.each([
    { value: -3, unit: "mm", text: "-3000 mm", why: "-3 m in a millimetre field" },
    { value: 0.0254, unit: "in", text: "1 in", why: "1 in = 0.0254 m exactly (NIST SP 811 App. B.8)" },
    { value: 0.25, unit: "pct", text: "25 %", why: "a ratio in per cent" },
    { value: 0.25, unit: "frac", text: "0.25", why: "a plain ratio has no symbol" },
    { value: 3, unit: "count", text: "3", why: "a count has no symbol" },
    { value: Math.PI, unit: "rad", text: "3.14159 rad", why: "six significant figures" },
    { value: 1 / 3, unit: undefined, text: "0.333333", why: "no unit: the number alone, six figures" },
    { value: -0, unit: "mm", text: "0 mm", why: "minus zero" },
  ] as const)("$value SI in $unit reads $text: $why", ({ value, unit, text }) => {
    expect(describeReceived(value, unit)).toBe(text);
  });

  it("words the values that are not numbers to show", () => {
    expect(describeReceived(Number.NaN, "mm")).toBe("not a number");
    expect(describeReceived(Number.POSITIVE_INFINITY, "mm")).toBe("a number too large to store");
    expect(describeReceived(Number.NEGATIVE_INFINITY)).toBe("a negative number too large to store");
    expect(describeReceived("fast")).toBe('the text "fast"');
    expect(describeReceived("x".repeat(40))).toBe(`the text "${"x".repeat(40)}"`);
    expect(describeReceived("x".repeat(41))).toBe(`the text "${"x".repeat(40)}…"`);
    expect(describeReceived('say "hi"')).toBe('the text "say \\"hi\\""');
    expect(describeReceived(null)).toBe("nothing (null)");
    expect(describeReceived(undefined)).toBe("nothing");
    expect(describeReceived([1, 2])).toBe("a list");
    expect(describeReceived({ a: 1 })).toBe("an object");
    expect(describeReceived(true)).toBe("true");
  });

  it("says a finite value too large for the field's unit is so, instead of failing while writing the message", () => {
    // 1e308 m is 1e311 mm, past the largest double (1.797 69 × 10³⁰⁸).
    expect(describeReceived(1e308, "mm")).toBe("a number too large to show in that unit");
    expect(describeReceived(-1e308, "ppm")).toBe("a number too large to show in that unit");
    expect(describeReceived(1e308, "m")).toBe("1e+308 m");
  });

  it("leaves out a unit it does not know rather than guessing or failing", () => {
    expect(describeReceived(-3, "furlong" as UnitId)).toBe("-3");
  });

  it("lets a design file with such a value be read, its default used and the value worded", () => {
    const problems: DesignProblem[] = [];
    const values = readValues(placement, { radius: 1e308 }, "placement", problems);
    expect(values.radius).toBe(placement.inputs.radius.default);
    expect(problems.find((p) => p.path === "placement.radius")?.message).toBe(
      "Sensor radius must be greater than 0 mm and at most 2000 mm (got a number too large to show in that unit); the default, 20 mm, was used",
    );
  });
});
