/**
 * Edges where a plausible slip in the code would go unnoticed by the middle-of-the-range tests:
 * a negative value that crosses a display-unit switch, a sensor exactly on the largest or the
 * smallest usable radius, a link value of exactly the longest length read, the robust scale of a
 * calibration fit on its usual (MAD) path, and a bolt in tension whose shank reaches the joint face.
 */
import { medianAbsoluteDeviation } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { readLink, valuesOf } from "../../calc/core/calculator.ts";
import { MAX_VALUE_LENGTH } from "../../calc/core/permalink.ts";
import { displayUnit, formatQuantity } from "../../calc/core/units.ts";
import placement from "../../calc/calculators/placement.ts";
import { fastenerCheck } from "../../calc/loads/bolts.ts";
import { fitStraightLine } from "../../calc/numerics/line-fit.ts";
import { accelerometerPlacement } from "../../calc/rotation/rotation.ts";

describe("a negative value shows in the unit its size calls for, with a minus sign", () => {
  it.each([
    { value: -2.3, kind: "mass", system: "metric", text: "−2.30 kg", note: "past the 1 kg switch from g to kg" },
    { value: -0.45, kind: "mass", system: "metric", text: "−450 g", note: "below it" },
    { value: -1, kind: "mass", system: "metric", text: "−1.00 kg", note: "exactly at it" },
    { value: -0.999, kind: "mass", system: "metric", text: "−999 g", note: "just short of it" },
    { value: -12, kind: "length", system: "metric", text: "−12.0 m", note: "past the 10 m switch from mm to m" },
    { value: -0.032, kind: "length", system: "metric", text: "−32.0 mm", note: "below it" },
    { value: -4, kind: "length", system: "us", text: "−13.1 ft", note: "past the 10 ft switch from in to ft (4 m = 13.12 ft)" },
    { value: -1, kind: "mass", system: "us", text: "−2.20 lb", note: "past the 1 lb switch from oz to lb (1 kg = 2.205 lb)" },
    { value: -0.1, kind: "mass", system: "us", text: "−3.53 oz", note: "below it (100 g = 3.527 oz)" },
    { value: -2e4, kind: "force", system: "metric", text: "−20.0 kN", note: "past the 10 kN switch" },
    { value: -5e4, kind: "energy", system: "metric", text: "−50.0 kJ", note: "past the 10 kJ switch" },
    { value: -0.0025, kind: "time", system: "metric", text: "−2.50 ms", note: "between the µs and s switches" },
    { value: -20, kind: "resistance", system: "metric", text: "−20.0 Ω", note: "past the 10 Ω switch from mΩ" },
    { value: -2, kind: "torque", system: "us", text: "−17.7 lbf·in", note: "past the 1 lbf·in switch from ozf·in (2 N·m = 17.70 lbf·in)" },
  ] as const)("$value SI of $kind ($system) shows as $text: $note", ({ value, kind, system, text }) => {
    expect(formatQuantity(value, kind, { system }).text).toBe(text);
    expect(displayUnit(kind, system, value)).toBe(displayUnit(kind, system, -value));
    expect(formatQuantity(-value, kind, { system }).text).toBe(text.replace("−", ""));
  });
});

describe("a sensor exactly on the edge of the usable window", () => {
  // Top speed 100 rad/s, full scale 1000 m/s² with 20 % headroom: largest radius 800/100² = 0.08 m.
  // Lowest speed 10 rad/s, one count 1.25 m/s², resolution 50 %: smallest radius 1.25/(100 × 0.5 × 2.5) = 0.01 m.
  const inputs = { topSpeed: 100, lowSpeed: 10, fullScale: 1000, margin: 0.2, step: 1.25, noise: 0, resolution: 0.5, partMass: 0.05, partRadius: 0.06 };

  it("sits on both edges exactly in floating point (so the cases below test the comparison, not rounding)", () => {
    const r = accelerometerPlacement({ ...inputs, radius: 0.05 });
    expect(r.maxRadius).toBe(0.08);
    expect(r.minRadius).toBe(0.01);
  });

  it.each([
    { radius: 0.08, verdict: "fits", status: "holds", why: "on the largest radius: the reading is exactly 80 % of full scale, which is allowed" },
    { radius: 0.01, verdict: "fits", status: "holds", why: "on the smallest radius: one count resolves exactly 50 %, which is allowed" },
    { radius: 0.08 * (1 + 2 ** -52), verdict: "too-far-out", status: "fails", why: "one step past the largest radius" },
    { radius: 0.01 * (1 - 2 ** -52), verdict: "too-close-in", status: "marginal", why: "one step inside the smallest radius" },
  ])("radius $radius m: $verdict ($why)", ({ radius, verdict, status }) => {
    const values = { ...inputs, radius };
    const result = accelerometerPlacement(values);
    expect(result.verdict).toBe(verdict);
    expect(placement.cards(values, result, "metric")[0]!.status).toBe(status);
  });

  it("reads 80.0 % of full scale on the largest radius, and says so", () => {
    const values = { ...inputs, radius: 0.08 };
    const card = placement.cards(values, accelerometerPlacement(values), "metric")[0]!;
    expect(card.margin).toBe("The sensor at 80.0 mm lies inside the usable window, 10.0 mm to 80.0 mm; it reads 80.0 % of full scale at top speed.");
  });
});

describe("a link value of exactly the longest length read", () => {
  it(`reads a ${MAX_VALUE_LENGTH}-character value and refuses one of ${MAX_VALUE_LENGTH + 1}`, () => {
    expect(MAX_VALUE_LENGTH).toBe(48);
    const longest = `20.${"0".repeat(MAX_VALUE_LENGTH - 5)}mm`;
    expect(longest).toHaveLength(48);
    const read = readLink(placement, `?r=${longest}`);
    expect(read.notices).toEqual([]);
    expect(read.texts.radius).toBe(longest);
    expect(valuesOf(placement, read, "metric").values!.radius).toBe(0.02);

    const tooLong = `20.${"0".repeat(MAX_VALUE_LENGTH - 4)}mm`;
    const refused = readLink(placement, `?r=${tooLong}`);
    expect(refused.texts.radius).toBeUndefined();
    expect(refused.notices).toEqual(["The link's value for Sensor radius is longer than 48 characters; it was ignored."]);
  });
});

describe("the robust scale of a calibration fit on its usual path", () => {
  // Points on y = 2x + 1 with small scattered deviations: the MAD of the Theil–Sen residuals is not 0,
  // so the scale is σ̂ = MAD/Φ⁻¹(3/4) = 1.4826·MAD (Iglewicz & Hoaglin 1993, ch. 3, the modified
  // z-score; Φ⁻¹(3/4) = 0.674 490 to six places, Abramowitz & Stegun Table 26.5).
  const x = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11];
  const noise = [0.3, -0.2, 0.05, 0.4, -0.35, 0.1, -0.05, 0.25, -0.15, 0.2, -0.3];
  const y = x.map((xi, i) => 2 * xi + 1 + noise[i]!);

  it("divides the median absolute deviation by the normal quartile 0.674490 (1.4826 × MAD), from the MAD", () => {
    const fit = fitStraightLine({ x, y });
    expect(fit.spikes.scaleFrom).toBe("mad");
    // A second computation of the MAD, by simple-statistics, of the residuals the fit reports.
    const mad = medianAbsoluteDeviation(fit.theilSen.residuals);
    expect(mad).toBeGreaterThan(0.05);
    expect(Math.abs(fit.spikes.scale - mad / 0.67449) / (mad / 0.67449)).toBeLessThan(2e-6);
    expect(fit.spikes.scale / mad).toBeCloseTo(1.4826, 4);
  });

  it("flags a reading 3.5 robust standard deviations out, and not one at 3", () => {
    const fit = fitStraightLine({ x, y });
    const { center, scale } = fit.spikes;
    const z = fit.spikes.modifiedZ;
    for (const [i, r] of fit.theilSen.residuals.entries()) expect(z[i]).toBeCloseTo((r - center) / scale, 12);
    expect(fit.spikes.bounds.high - center).toBeCloseTo(3.5 * scale, 12);
    expect(fit.spikes.flagged).toEqual([]);
  });
});

describe("a bolt in tension whose shank reaches the joint face", () => {
  // In tension the whole bolt carries the load; it breaks where it is thinnest, in the thread: the
  // stress area A_s (ISO 898-1:2013 Table 4, M4: 8.78 mm²), whatever the shear plane says. Only a
  // shear plane through the plain shank may take the full nominal area π/4·d² = 12.57 mm².
  const bolt = { partMass: 0.04, radius: 0.07, angularSpeed: 251.32741228718345, count: 1, shearRatio: 0.5, failBelow: 1, marginalBelow: 2 };

  it("takes the stress area A_s = 8.78 mm² in tension, with the shank choice or without", () => {
    const shank = fastenerCheck({ ...bolt, size: "M4", propertyClass: "8.8", mode: "tension", shearPlane: "shank" });
    const thread = fastenerCheck({ ...bolt, size: "M4", propertyClass: "8.8", mode: "tension", shearPlane: "thread" });
    expect(shank.area).toBe(8.78e-6);
    expect(shank).toEqual({ ...thread, shearPlane: "shank" });
  });

  it("takes the nominal area π/4·d² in shear through the shank only", () => {
    const shear = fastenerCheck({ ...bolt, size: "M4", propertyClass: "8.8", mode: "shear", shearPlane: "shank" });
    expect(shear.area).toBeCloseTo((Math.PI / 4) * 0.004 ** 2, 15);
    expect(shear.area).toBeCloseTo(12.566e-6, 9);
  });
});
