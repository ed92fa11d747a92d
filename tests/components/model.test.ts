import { describe, expect, it } from "vitest";
import placement, { form, run } from "../../calc/calculators/placement.ts";
import { createCalculatorModel } from "../../components/calc-ui/model.ts";

const createPlacementModel = () => createCalculatorModel(form, run);

describe("a calculator model (the placement calculator for all)", () => {
  it("computes a result from the defaults", () => {
    const model = createPlacementModel();
    expect(model.outcome.value.result?.verdict).toBe("fits");
    expect(model.fields.texts.radius.value).toBe("20 mm");
  });

  it("applies a permalink and shows compact link values spaced out", () => {
    const model = createPlacementModel();
    model.applyQuery("?v=1&rpm=3000rpm&r=12mm");
    expect(model.fields.texts.topSpeed.value).toBe("3000 rpm");
    expect(model.fields.texts.radius.value).toBe("12 mm");
    expect(model.outcome.value.result?.accelerationAtTop).toBeCloseTo(314.1592653589793 ** 2 * 0.012, 9);
  });

  it("withholds results while a field is invalid, and names the field", () => {
    const model = createPlacementModel();
    model.fields.texts.radius.value = "abc";
    expect(model.fields.values.value).toBeNull();
    expect(model.outcome.value.result).toBeNull();
    const reading = model.fields.readings.radius.value;
    expect(!reading.ok && reading.error.param).toBe("Sensor radius");
  });

  it("maps a rule across fields to the field it names", () => {
    const model = createPlacementModel();
    model.fields.texts.lowSpeed.value = "5000 rpm";
    expect(model.outcome.value.error).toEqual({ field: "lowSpeed", message: "Lowest tracked speed must be at most the top speed (2400 rpm)." });
  });

  it("switches to US units and back without rounding drift", () => {
    const model = createPlacementModel();
    model.fields.setSystem("us");
    expect(model.fields.texts.radius.value).toBe("0.787402 in");
    expect(model.fields.texts.partMass.value).toBe("1.7637 oz");
    model.fields.setSystem("metric");
    expect(model.fields.texts.radius.value).toBe("20 mm");
  });

  it("gives back the text a field had when the units are switched there and back untouched, though the round trip at 6 figures does not close (70 mm → 2.75591 in → 70.0001 mm)", () => {
    const model = createPlacementModel();
    model.fields.texts.radius.value = "70 mm";
    model.fields.setSystem("us");
    expect(model.fields.texts.radius.value).toBe("2.75591 in");
    model.fields.setSystem("metric");
    expect(model.fields.texts.radius.value).toBe("70 mm");
    expect(model.queryFor("")).toContain("r=70mm");
    // Edited while in inches: the edit is kept and converted.
    model.fields.setSystem("us");
    model.fields.texts.radius.value = "2.5 in";
    model.fields.setSystem("metric");
    expect(model.fields.texts.radius.value).toBe("63.5 mm");
  });

  it("writes the state into the query string", () => {
    const model = createPlacementModel();
    model.fields.texts.radius.value = "1.5 in";
    expect(model.queryFor("")).toContain("r=1.5in");
    expect(model.queryFor("")).toMatch(/^v=1&/);
  });

  it("gives the values and result the calculator's cards (what the build sheet shows) speak of, with its verdict in the handbook's words", () => {
    const model = createPlacementModel();
    const cards = () => placement.cards(model.values.value!, model.outcome.value.result!, model.system.value);
    expect(cards()[0]).toMatchObject({ status: "holds", title: "Accelerometer placement" });
    model.fields.texts.radius.value = "200 mm";
    expect(cards()[0]!.status).toBe("fails");
  });

  it("reports what a link sets wrongly as notices, and keeps the rest", () => {
    const model = createPlacementModel();
    model.applyQuery("?v=1&r=12mm&colour=red");
    expect(model.fields.texts.radius.value).toBe("12 mm");
    expect(model.notices.value).toEqual(['The link has a parameter "colour" that this calculator does not use; it was ignored.']);
  });
});
