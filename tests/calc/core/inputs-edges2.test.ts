import { describe, expect, it } from "vitest";
import { accelerometerPlacementInputs } from "../../../calc/rotation/placement-inputs.ts";
import { steeringEstimateInputs } from "../../../calc/steering/estimate-inputs.ts";
import { checkValue, defineInputs, exactFieldText, type InputSpec, readField, urlText } from "../../../calc/core/inputs.ts";
import { expectRefusal } from "../../support/refusal.ts";

/** A declaration of one input named x, with the given range and default. */
const declare = (kind: InputSpec["kind"], min: number, max: number, start: number, minOpen?: boolean, unit?: InputSpec["unit"]) => ({
  x: { label: "X", kind, min, max, default: start, urlKey: "x", ...(minOpen === undefined ? {} : { minOpen }), ...(unit ? { unit } : {}) },
});

describe("defineInputs: a default inside its finite range is accepted as declared, anything else is refused", () => {
  it("returns the declaration itself when the default sits inside, or on a closed end of, its range", () => {
    for (const specs of [declare("length", 0, 1, 0.5), declare("length", 0, 1, 0), declare("length", 0, 1, 1), declare("length", 0, 1, 1, true)]) {
      expect(defineInputs(specs)).toBe(specs);
    }
  });

  it("refuses a default below the minimum, above the maximum or on an open minimum, saying from or above", () => {
    expectRefusal(() => defineInputs(declare("length", 0, 1, -1)), "x.default", -1, "", "x.default must be within the declared range, from 0 to 1 (got -1)");
    expectRefusal(() => defineInputs(declare("length", 0, 1, 2)), "x.default", 2, "", "x.default must be within the declared range, from 0 to 1 (got 2)");
    expectRefusal(
      () => defineInputs(declare("length", 0, 1, 0, true)),
      "x.default",
      0,
      "",
      "x.default must be within the declared range, above 0 to 1 (got 0)",
    );
  });

  it("refuses a range with an infinite end, even when the default lies inside it", () => {
    expectRefusal(
      () => defineInputs(declare("length", Number.NEGATIVE_INFINITY, 1, 0)),
      "x.default",
      0,
      "",
      "x.default must be within the declared range, from -Infinity to 1 (got 0)",
    );
    expectRefusal(
      () => defineInputs(declare("length", 0, Number.POSITIVE_INFINITY, 0)),
      "x.default",
      0,
      "",
      "x.default must be within the declared range, from 0 to Infinity (got 0)",
    );
  });

  it("names a missing declaration, or a missing set of them, as the spec", () => {
    expectRefusal(() => defineInputs(null as never), "spec", null, "", "spec must be an input declaration (got null)");
    expectRefusal(() => defineInputs({ x: undefined } as never), "spec", undefined, "", "spec must be an input declaration (got nothing)");
  });
});

describe("checkValue: the ends of a range and whole numbers", () => {
  const { margin } = accelerometerPlacementInputs;
  const { cellCount } = steeringEstimateInputs;

  it("accepts a value on a closed minimum (0 % headroom is allowed, 0 to 95 %)", () => {
    expect((margin as InputSpec).minOpen).toBeUndefined();
    expect(checkValue(margin, 0, "metric")).toBeNull();
  });

  it("refuses a cell count that is not whole, in the field's words", () => {
    const error = checkValue(cellCount, 4.5, "metric");
    expect(error?.message).toBe("Cells in series (S) must be a whole number between 1 and 24 (got 4.5)");
    expect(checkValue(cellCount, 4, "metric")).toBeNull();
  });
});

describe("readField: text that does not read as a number keeps the field's name, the text and the range as data", () => {
  it("names the field, the text as typed, the allowed range, and no unit", () => {
    const reading = readField(accelerometerPlacementInputs.radius, "abc", "metric");
    expect(reading.ok).toBe(false);
    if (reading.ok) return;
    expect({ param: reading.error.param, value: reading.error.value, expected: reading.error.expected, unit: reading.error.unit }).toEqual({
      param: "Sensor radius",
      value: "abc",
      expected: "greater than 0 mm and at most 2000 mm",
      unit: "",
    });
  });
});

describe("exactFieldText: the text a field shows for a stored value", () => {
  it("puts a space before a unit symbol: 0.0127 m in an inch field reads 0.5 in", () => {
    // 0.0127 m / 0.0254 m/in = 0.5 in exactly (1 in = 0.0254 m, NIST SP 811).
    expect(exactFieldText(declare("length", 0, 1, 0.1).x, 0.0127, "us")).toBe("0.5 in");
  });

  it("writes degrees against the number (30°), a count as the bare number, and a plain ratio with its alias x", () => {
    // π/6 rad = 30° (180° = π rad).
    expect(exactFieldText(declare("angle", 0, 7, 1).x, Math.PI / 6, "metric")).toBe("30°");
    expect(exactFieldText(declare("count", 0, 10, 1).x, 3, "metric")).toBe("3");
    expect(exactFieldText(declare("fraction", 0, 1, 0.5, undefined, { metric: "frac", us: "frac" }).x, 0.5, "metric")).toBe("0.5 x");
  });

  it("reads back as the same value through the field", () => {
    const angle = declare("angle", 0, 7, 1).x;
    const text = exactFieldText(angle, 0.3, "metric");
    expect(text.endsWith("°")).toBe(true);
    expect(readField(angle, text, "metric")).toMatchObject({ ok: true, value: 0.3 });
  });
});

describe("urlText: a value as link text", () => {
  it("writes 32 mm as 32mm, without a space", () => {
    expect(urlText(declare("length", 0, 1, 0.1).x, 0.032, "mm")).toBe("32mm");
  });
});
