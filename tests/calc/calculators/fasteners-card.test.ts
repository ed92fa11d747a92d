import { describe, expect, it } from "vitest";
import fasteners from "../../../calc/calculators/fasteners.ts";
import { initialValues } from "../../../calc/core/calculator.ts";

// The page's defaults: an M4 class 8.8 bolt in shear, preload 0.75 × proof load; a 40 g part at
// 70 mm and 2400 rpm (251.327 rad/s), or a given 100 N load.
const defaults = initialValues(fasteners);

function card(values: typeof defaults, system: "metric" | "us") {
  return fasteners.cards(values, fasteners.run(values), system)[0]!;
}

describe("fastener card", () => {
  it("says the spinning part's pull, in US units, and lists the preload and load per bolt (hand-derived)", () => {
    const c = card(defaults, "us");
    // Pull: m r ω² = 0.04 × 0.07 × 251.327² = 176.86 N = 39.8 lbf (÷ 4.44822).
    // Preload: 0.75 × 8.78 mm² (ISO 898-1 stress area, M4) × 580 MPa (ISO 898-1 proof stress, 8.8) = 3819.3 N = 859 lbf.
    expect(c.margin.startsWith("39.8 lbf pull at 2400 rpm, preload 859 lbf per bolt: ")).toBe(true);
    const tail = c.details.slice(-2).map((d) => [d.label, d.text]);
    expect(tail).toEqual([
      ["Preload per bolt", "859 lbf"],
      ["Load on each bolt", "39.8 lbf"],
    ]);
  });

  it("says a given load as a load, not as a pull at a speed (hand-derived)", () => {
    const values = { ...defaults, loadFrom: "force" as const };
    const metric = card(values, "metric");
    // Friction: 3819.3 N × 0.2 × 1 interface / 100 N = 7.64.
    expect(metric.margin.startsWith("100 N load, preload 3820 N per bolt: friction (the clamp) governs, safety factor 7.64.")).toBe(true);
    expect(card(values, "us").margin.startsWith("22.5 lbf load, preload 859 lbf per bolt: ")).toBe(true);
  });
});
