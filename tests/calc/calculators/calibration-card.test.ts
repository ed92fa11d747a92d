/**
 * The calibration card, as the build sheet shows it, and how the readings are read from a design
 * file and from a link (what is kept, what is left out, and the notice that says so).
 */
import { describe, expect, it } from "vitest";
import calibration from "../../../calc/calculators/calibration.ts";
import { initialValues } from "../../../calc/core/calculator.ts";
import type { UnitSystem } from "../../../calc/core/units.ts";

const defaults = initialValues(calibration as never) as Record<string, unknown>;
const rowsSpec = calibration.extras.rows;

// Readings exactly on a = r·ω² + b with r = 12 mm and b = 2 m/s² at 100…300 rad/s: the fit gives
// r = 12.00 mm (0.012/0.0254 = 0.4724 in), b = 2/9.80665 = 0.2039 gₙ, and R² = 1.
const onALine = [100, 150, 200, 250, 300].map((w) => ({ angularSpeed: w, acceleration: 0.012 * w * w + 2 }));

function cardFor(system: UnitSystem) {
  const values = { ...defaults, rows: onALine } as never;
  const cards = calibration.cards(values, calibration.run(values) as never, system);
  expect(cards).toHaveLength(1);
  return cards[0]!;
}

describe("the calibration card", () => {
  it("gives the radius and offset of readings on an exact line, metric (12.00 mm, 0.2039 gₙ, R² 1.000)", () => {
    const card = cardFor("metric");
    expect(card.title).toBe("Calibration fit");
    expect(card.status).toBe("info");
    expect(card.rule).toBe("The firmware's radius and offset from logged readings, a = r·ω² + b");
    expect(card.margin).toBe("Radius 12.00 mm, offset 0.2039 gₙ from 5 readings (least squares)");
    expect(card.figure).toMatchObject({ label: "Radius for the firmware", text: "12.00 mm" });
    expect(card.details).toEqual([
      { label: "Offset for the firmware", value: expect.closeTo(2, 9), unit: "m/s²", text: "0.2039 gₙ" },
      { label: "R² of the least-squares line", value: expect.closeTo(1, 12), unit: "", text: "1.000" },
    ]);
  });

  it("gives the radius in inches in US units, to four figures (0.4724 in)", () => {
    const card = cardFor("us");
    expect(card.margin).toBe("Radius 0.4724 in, offset 0.2039 gₙ from 5 readings (least squares)");
    expect(card.figure!.text).toBe("0.4724 in");
  });
  it("shows no R² when the readings do not vary (R² = 1 − SSE/Syy needs Syy > 0): a constant 5 m/s² gives radius 0, offset 5/9.80665 = 0.5099 gₙ", () => {
    const values = { ...defaults, rows: [100, 150, 200].map((w) => ({ angularSpeed: w, acceleration: 5 })) } as never;
    const card = calibration.cards(values, calibration.run(values) as never, "metric")[0]!;
    expect(card.margin).toBe(
      "No usable radius: the readings do not rise with speed (check which column is speed, which is reading, and their units). Radius 0 mm, offset 0.5099 gₙ from 3 readings (least squares)",
    );
    expect(card.status).toBe("fails");
    expect(card.details!.map((d) => d.label)).toEqual(["Offset for the firmware"]);
  });
  it("fails a fit whose radius comes out below 0 (readings falling with speed, e.g. the columns swapped): a = 5 − 0.0001·ω² gives −0.1 mm", () => {
    const rows = [100, 150, 200].map((w) => ({ angularSpeed: w, acceleration: 5 - 0.0001 * w * w }));
    const values = { ...defaults, rows } as never;
    const card = calibration.cards(values, calibration.run(values) as never, "metric")[0]!;
    expect(card.status).toBe("fails");
    expect(card.margin).toMatch(/^No usable radius: the readings do not rise with speed .*Radius −0\.1000 mm, /);
  });
  it("names the spikes it left out: one reading 100 m/s² off the line among nine is flagged, and the rest give 12.00 mm and 0.2039 gₙ again", () => {
    const rows = [100, 125, 150, 175, 200, 225, 250, 275, 300].map((w) => ({ angularSpeed: w, acceleration: 0.012 * w * w + 2 + (w === 200 ? 100 : 0) }));
    const values = { ...defaults, rows } as never;
    const card = calibration.cards(values, calibration.run(values) as never, "metric")[0]!;
    expect(card.margin).toBe("Radius 12.00 mm, offset 0.2039 gₙ from 9 readings (least squares without spikes; 1 flagged as spikes)");
  });
});

describe("the readings from a design file", () => {
  it("refuses anything but a list", () => {
    expect(rowsSpec.fromDesign!({})).toEqual({ value: null, problems: [{ path: "", message: "must be a list of readings" }] });
  });

  it("keeps a reading at 0 rpm and leaves out a missing row, a negative speed, a non-number and an infinite reading, naming each", () => {
    const read = rowsSpec.fromDesign!([
      null,
      { angularSpeed: -1, acceleration: 1 },
      { angularSpeed: 0, acceleration: 1 },
      { angularSpeed: 1, acceleration: "x" },
      { angularSpeed: 1, acceleration: Number.POSITIVE_INFINITY },
      { angularSpeed: Number.NaN, acceleration: 1 },
      { acceleration: 1 },
      { angularSpeed: Number.POSITIVE_INFINITY, acceleration: 1 },
    ]);
    expect(read.value).toEqual([{ angularSpeed: 0, acceleration: 1 }]);
    const why = (n: number) => `Reading ${n} must be a speed of 0 rpm or more and an acceleration, both numbers; it was left out`;
    expect(read.problems).toEqual([0, 1, 3, 4, 5, 6, 7].map((i) => ({ path: `[${i}]`, message: why(i + 1) })));
  });

  it("reads at most 500 readings and says how many the file listed; exactly 500 read without a word", () => {
    const row = { angularSpeed: 10, acceleration: 1 };
    const full = rowsSpec.fromDesign!(Array.from({ length: 500 }, () => row));
    expect(full.value).toHaveLength(500);
    expect(full.problems).toEqual([]);
    const over = rowsSpec.fromDesign!(Array.from({ length: 501 }, () => row));
    expect(over.value).toHaveLength(500);
    expect(over.problems).toEqual([{ path: "", message: "lists 501 readings; only the first 500 were read" }]);
  });
});

describe("the readings from a link", () => {
  it("skips a reading it cannot read, naming it, and keeps the rest (1200 rpm = 125.66 rad/s, 31.5 g = 308.909 m/s²)", () => {
    const read = rowsSpec.read("v1:1200:31.5,abc", "metric");
    expect(read.value).toEqual([{ angularSpeed: expect.closeTo((1200 * 2 * Math.PI) / 60, 9), acceleration: expect.closeTo(31.5 * 9.80665, 9) }]);
    expect(read.notices).toEqual(['The link\'s reading 2 ("abc"): expected speed:acceleration (rpm:g); it was skipped.']);
  });

  it("gives no readings for text without a version tag and nothing readable, with both notices", () => {
    expect(rowsSpec.read("zz", "metric")).toEqual({
      value: null,
      notices: ["The link's readings: no version tag; read as v1.", 'The link\'s reading 1 ("zz"): expected speed:acceleration (rpm:g); it was skipped.'],
    });
  });
});
