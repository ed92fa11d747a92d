/**
 * calc/core/inputs.ts at its edges: declarations whose default sits on or past a limit, a field
 * value exactly on its limits, whole-number fields, and the words a field shows, in the user's
 * units.
 */
import { describe, expect, it } from "vitest";
import {
  checkValue,
  defaultText,
  defineInputs,
  describeRange,
  exactFieldText,
  fieldUnit,
  type InputSpec,
  readField,
  urlText,
} from "../../../calc/core/inputs.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

const specs = defineInputs({
  radius: { label: "Hub radius", kind: "length", min: 0, max: 1.23456, minOpen: true, default: 0.02, urlKey: "r" },
  margin: { label: "Headroom", kind: "fraction", min: 0, max: 0.95, default: 0.2, urlKey: "m" },
  share: { label: "Share", kind: "fraction", min: 0, max: 1, default: 0.25, urlKey: "s", unit: { metric: "frac", us: "frac" } },
  teeth: { label: "Teeth", kind: "count", min: 1, max: 12, integer: true, default: 3, urlKey: "n" },
  holes: { label: "Holes", kind: "count", min: 0, max: 8, minOpen: true, integer: true, default: 2, urlKey: "h" },
  angle: { label: "Lead angle", kind: "angle", min: 0, max: Math.PI, default: Math.PI / 12, urlKey: "a" },
});

describe("defineInputs refuses a default outside its range", () => {
  const one = (spec: Partial<InputSpec>) => () =>
    defineInputs({ x: { label: "X", kind: "length", min: 0, max: 1, default: 0.5, urlKey: "x", ...spec } as InputSpec });

  it("takes a default on either closed end", () => {
    expect(one({ default: 0 })).not.toThrow();
    expect(one({ default: 1 })).not.toThrow();
  });

  it.each([
    { spec: { default: -0.1 }, value: -0.1, message: "x.default must be within the declared range, from 0 to 1 (got -0.1)" },
    { spec: { default: 1.1 }, value: 1.1, message: "x.default must be within the declared range, from 0 to 1 (got 1.1)" },
    { spec: { default: 0, minOpen: true }, value: 0, message: "x.default must be within the declared range, above 0 to 1 (got 0)" },
    { spec: { min: Number.NaN }, value: 0.5, message: "x.default must be within the declared range, from NaN to 1 (got 0.5)" },
    { spec: { max: Number.POSITIVE_INFINITY }, value: 0.5, message: "x.default must be within the declared range, from 0 to Infinity (got 0.5)" },
    { spec: { min: Number.NEGATIVE_INFINITY }, value: 0.5, message: "x.default must be within the declared range, from -Infinity to 1 (got 0.5)" },
    { spec: { default: Number.NaN }, value: Number.NaN, message: "x.default must be within the declared range, from 0 to 1 (got not a number)" },
  ])("$message", ({ spec, value, message }) => {
    expectRefusal(one(spec), "x.default", value, "", message);
  });

  it("takes a default just above an open low end", () => {
    expect(one({ default: 5e-324, minOpen: true })).not.toThrow();
  });

  it("refuses a missing declaration by name", () => {
    expectRefusal(() => defineInputs(null as never), "spec", null, "", "spec must be an input declaration (got null)");
    expectRefusal(() => defineInputs({ x: undefined } as never), "spec", undefined, "", "spec must be an input declaration (got nothing)");
  });
});

describe("the unit a field shows", () => {
  it("is the declared one for the system, else the kind's display unit for the default", () => {
    expect(fieldUnit(specs.share, "us")).toBe("frac");
    expect(fieldUnit(specs.margin, "metric")).toBe("pct");
    expect(fieldUnit(specs.radius, "us")).toBe("in");
    expect(fieldUnit({ ...specs.radius, unit: { us: "ft" } }, "metric")).toBe("mm");
    expect(fieldUnit({ ...specs.radius, unit: { metric: "m", us: "ft" } }, "us")).toBe("ft");
    expectRefusal(() => fieldUnit(null as never, "metric"), "spec", null, "", "spec must be an input declaration (got null)");
  });
});

describe("describeRange", () => {
  it.each([
    { spec: specs.radius, system: "metric", text: "greater than 0 mm and at most 1235 mm", why: "four figures (1234.56 mm)" },
    { spec: specs.radius, system: "us", text: "greater than 0 in and at most 48.6 in", why: "1.23456 m = 48.6047 in" },
    { spec: specs.margin, system: "metric", text: "between 0 % and 95 %", why: "a closed range" },
    { spec: specs.share, system: "metric", text: "between 0 and 1", why: "a plain ratio has no symbol" },
    { spec: specs.teeth, system: "metric", text: "a whole number between 1 and 12", why: "a whole-number field" },
    { spec: specs.holes, system: "us", text: "a whole number greater than 0 and at most 8", why: "and one with an open low end" },
  ] as const)("$text: $why", ({ spec, system, text }) => {
    expect(describeRange(spec, system)).toBe(text);
  });

  it("refuses a missing declaration by name", () => {
    expect(refusal(() => describeRange(undefined as never, "metric")).param).toBe("spec");
  });
});

describe("checkValue exactly on the limits", () => {
  it("takes the closed high end and refuses one step past it", () => {
    expect(checkValue(specs.radius, 1.23456, "metric")).toBeNull();
    const error = checkValue(specs.radius, 1.2345600000000003, "metric")!;
    expect(error.message).toBe("Hub radius must be greater than 0 mm and at most 1235 mm (got 1234.56 mm)");
    expect(error).toMatchObject({ param: "Hub radius", value: 1234.56, unit: "mm", expected: "greater than 0 mm and at most 1235 mm" });
  });

  it("refuses the open low end and takes the smallest double above it", () => {
    expect(checkValue(specs.radius, 0, "metric")?.message).toBe("Hub radius must be greater than 0 mm and at most 1235 mm (got 0 mm)");
    expect(checkValue(specs.radius, 5e-324, "metric")).toBeNull();
  });

  it("takes the closed low end and refuses one step below it", () => {
    expect(checkValue(specs.margin, 0, "metric")).toBeNull();
    expect(checkValue(specs.margin, -5e-324, "metric")?.message).toBe("Headroom must be between 0 % and 95 % (got -4.94e-322 %)");
  });

  it("refuses a fraction in a whole-number field, inside its range", () => {
    expect(checkValue(specs.teeth, 12, "metric")).toBeNull();
    expect(checkValue(specs.teeth, 2.5, "metric")?.message).toBe("Teeth must be a whole number between 1 and 12 (got 2.5)");
    expect(checkValue(specs.holes, 0, "metric")?.message).toBe("Holes must be a whole number greater than 0 and at most 8 (got 0)");
  });

  it("refuses a value that is not finite, and says what it was", () => {
    expect(checkValue(specs.radius, Number.NEGATIVE_INFINITY, "metric")?.message).toBe(
      "Hub radius must be greater than 0 mm and at most 1235 mm (got minus infinity)",
    );
    expect(checkValue(specs.margin, Number.NaN, "metric")?.message).toBe("Headroom must be between 0 % and 95 % (got not a number)");
    expect(checkValue(specs.radius, Number.NaN, "metric")?.message).toBe("Hub radius must be greater than 0 mm and at most 1235 mm (got not a number)");
    expect(checkValue(specs.radius, Number.POSITIVE_INFINITY, "metric")?.message).toBe(
      "Hub radius must be greater than 0 mm and at most 1235 mm (got infinity)",
    );
  });

  it("states a value too large for the field's unit in the SI unit, never the SI number with the field's symbol", () => {
    // 1e308 m is 1e311 mm, past the largest double: the message must not say "1e+308 mm".
    const error = checkValue(specs.radius, 1e308, "metric")!;
    expect(error.message).toBe("Hub radius must be greater than 0 mm and at most 1235 mm (got 1e+308 m)");
    expect(error).toMatchObject({ value: 1e308, unit: "m" });
    const typed = readField(specs.radius, "1e308 m", "metric");
    expect(!typed.ok && typed.error.message).toBe("Hub radius must be greater than 0 mm and at most 1235 mm (got 1e+308 m)");
  });
});

describe("readField", () => {
  it("gives the value in SI and the unit it was typed in", () => {
    expect(readField(specs.radius, "1 in", "metric")).toEqual({ ok: true, value: 0.0254, unit: "in" });
    expect(readField(specs.radius, "1", "us")).toEqual({ ok: true, value: 0.0254, unit: "in" });
    expect(readField(specs.teeth, "12", "metric")).toEqual({ ok: true, value: 12, unit: "count" });
  });

  it("says what was wrong with the text, then the range, and keeps the text as the value", () => {
    const reading = readField(specs.teeth, "12 bolts", "metric");
    expect(reading.ok).toBe(false);
    if (reading.ok) return;
    expect(reading.error.message).toBe('Teeth takes a plain number, without a unit (got "bolts"); allowed: a whole number between 1 and 12');
    expect(reading.error).toMatchObject({ param: "Teeth", value: "12 bolts", unit: "", expected: "a whole number between 1 and 12" });
  });

  it("checks a readable value against the range", () => {
    const reading = readField(specs.margin, "96 %", "metric");
    expect(!reading.ok && reading.error.message).toBe("Headroom must be between 0 % and 95 % (got 96 %)");
  });
});

describe("the text a field starts with and carries", () => {
  it.each([
    { spec: specs.radius, system: "metric", text: "20 mm" },
    // 0.02 m = 0.787 401 57… in, to six figures.
    { spec: specs.radius, system: "us", text: "0.787402 in" },
    { spec: specs.margin, system: "metric", text: "20 %" },
    { spec: specs.share, system: "metric", text: "0.25" },
    { spec: specs.teeth, system: "us", text: "3" },
    // π/12 rad = 15°.
    { spec: specs.angle, system: "metric", text: "15 °" },
  ] as const)("defaultText: $text", ({ spec, system, text }) => {
    expect(defaultText(spec, system)).toBe(text);
  });

  it.each([
    { spec: specs.radius, value: 0.032, system: "metric", text: "32 mm", why: "a spaced symbol" },
    { spec: specs.radius, value: 0.0254, system: "us", text: "1 in", why: "" },
    { spec: specs.radius, value: 0.03, system: "us", text: "0.03 m", why: "no number of inches multiplies back to 0.03 m: metres" },
    { spec: specs.margin, value: 0.25, system: "metric", text: "25 %", why: "" },
    { spec: specs.margin, value: 0.7, system: "metric", text: "0.7 x", why: "no number of per cent multiplies back to 0.7: the plain ratio, by its alias" },
    { spec: specs.share, value: 0.25, system: "metric", text: "0.25 x", why: "a plain ratio field shows its alias, so that the text reads back in it" },
    { spec: specs.teeth, value: 7, system: "metric", text: "7", why: "a count has no symbol and no alias" },
    { spec: specs.angle, value: Math.PI / 2, system: "metric", text: "90°", why: "a degree sign sits on the number" },
  ] as const)("exactFieldText of $value: $text $why", ({ spec, value, system, text }) => {
    expect(exactFieldText(spec, value, system)).toBe(text);
    const back = readField(spec, text, system);
    expect(back.ok && back.value).toBe(value);
  });

  it("writes link text with urlText as a link spells it", () => {
    expect(urlText(specs.radius, 0.032, "mm")).toBe("32mm");
    expect(urlText(specs.margin, 0.7, "pct")).toBe("0.7x");
  });
});
