import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { accelerometerPlacementInputs, CalcInputError, checkValue, defaultText, defineInputs, describeRange, readField, STANDARD_GRAVITY } from "#calc";

const { radius, topSpeed, margin, fullScale } = accelerometerPlacementInputs;

describe("input declarations: reading a field", () => {
  it("reads a value with a unit into SI", () => {
    expect(readField(radius, "1.25 in", "metric")).toEqual({ ok: true, value: 0.03175, unit: "in" });
  });

  it("reads a bare number in the field's unit for the chosen system", () => {
    expect(readField(radius, "32", "metric")).toMatchObject({ ok: true, value: 0.032 });
    expect(readField(radius, "1", "us")).toMatchObject({ ok: true, value: 0.0254 });
  });

  it("reports an empty field with its name and allowed range", () => {
    const reading = readField(topSpeed, "", "metric");
    expect(reading.ok).toBe(false);
    if (!reading.ok) {
      expect(reading.error).toBeInstanceOf(CalcInputError);
      expect(reading.error.message).toBe("Top speed is required; allowed: greater than 0 rpm and at most 60000 rpm");
    }
  });

  it("reports a negative radius in the user's units", () => {
    const reading = readField(radius, "-3 mm", "metric");
    expect(!reading.ok && reading.error.message).toBe("Sensor radius must be greater than 0 mm and at most 2000 mm (got -3 mm)");
  });

  it("reports zero rpm", () => {
    const reading = readField(topSpeed, "0", "metric");
    expect(!reading.ok && reading.error.message).toBe("Top speed must be greater than 0 rpm and at most 60000 rpm (got 0 rpm)");
  });

  it("reports text that is not a number", () => {
    const reading = readField(radius, "abc", "us");
    expect(!reading.ok && reading.error.message).toBe("Sensor radius must start with a number, e.g. 32 in; allowed: greater than 0 in and at most 78.74 in");
  });

  it("reports an absurd unit and lists the right ones", () => {
    const reading = readField(radius, "3 parsecs", "metric");
    expect(!reading.ok && reading.error.message).toBe(
      'Sensor radius has a unit "parsecs" that is not a length unit; use m, cm, mm, in, ft; allowed: greater than 0 mm and at most 2000 mm',
    );
  });

  it("shows a value typed in another unit converted to the field's unit", () => {
    const reading = readField(radius, "3 m", "metric");
    expect(!reading.ok && reading.error.message).toBe("Sensor radius must be greater than 0 mm and at most 2000 mm (got 3000 mm)");
  });

  it("keeps the field's structured fields (param, value, expected, unit)", () => {
    const error = checkValue(margin, 0.99, "metric");
    expect(error).toMatchObject({ param: "Headroom kept", value: 99, expected: "between 0 % and 95 %", unit: "%" });
  });

  it("describes ranges without trailing zeros", () => {
    expect(describeRange(fullScale, "metric")).toBe("greater than 0 gₙ and at most 10000 gₙ");
  });

  it("starts each field on its default, in the system's unit", () => {
    expect(defaultText(radius, "metric")).toBe("20 mm");
    expect(defaultText(radius, "us")).toBe("0.787402 in");
    expect(defaultText(fullScale, "us")).toBe("200 gₙ");
    expect(fullScale.default).toBe(200 * STANDARD_GRAVITY);
  });

  it("refuses a declaration whose default lies outside its range", () => {
    const define = () => defineInputs({ x: { label: "X", kind: "length", min: 0, max: 1, default: 2, urlKey: "x" } });
    expect(define).toThrow(CalcInputError);
    expect(define).toThrow("x.default must be within the declared range, from 0 to 1 (got 2)");
  });

  it("never throws and never accepts a non-finite value, whatever is typed (property)", () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 40 }), fc.constantFrom("metric", "us") as fc.Arbitrary<"metric" | "us">, (text, system) => {
        const reading = readField(radius, text, system);
        if (reading.ok) {
          expect(Number.isFinite(reading.value)).toBe(true);
          expect(reading.value).toBeGreaterThan(0);
        } else {
          expect(reading.error.message).toMatch(/^Sensor radius /);
        }
      }),
      { numRuns: 2000 },
    );
  });
});
