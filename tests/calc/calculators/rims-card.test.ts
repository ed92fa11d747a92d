import { describe, expect, it } from "vitest";
import rims from "../../../calc/calculators/rims.ts";
import { initialValues, linkKeys } from "../../../calc/core/calculator.ts";

// The page's defaults: a thin 6061-T6 ring, outer radius 125 mm, 2700 kg/m³, yield 241 MPa (35 ksi) and
// ultimate 262 MPa (38 ksi), at 2400 rpm (251.327 rad/s), holds from 2, fails below 1.
const defaults = initialValues(rims);

function card(values: typeof defaults, system: "metric" | "us") {
  return rims.cards(values, rims.run(values), system)[0]!;
}

describe("rim card", () => {
  it("a thin ring on minimum strengths, in US units (hand-derived)", () => {
    const c = card(defaults, "us");
    // Tip speed 0.125 × 251.327 = 31.42 m/s = 103 ft/s; hoop stress ρ v² = 2700 × 31.42² = 2.665 MPa = 0.386 ksi.
    // Yield at v = √(241.3e6 / 2700) = 299.0 m/s → 2392 rad/s = 22800 rpm; burst at √(262.0e6 / 2700) = 311.5 m/s → 23800 rpm.
    expect(c.rule).toBe("Safety factor against yield at least 2.00 holds, below 1.00 fails; on specified minimum strengths");
    expect(c.margin).toBe("Peak stress 0.386 ksi at 2400 rpm (tip speed 103 ft/s); yields at 22800 rpm, bursts near 23800 rpm");
    // 241.3 / 2.665 = 90.6.
    expect([c.figure?.label, c.figure?.text, c.status]).toEqual(["Safety factor against yield", "90.6", "holds"]);
    expect(c.details.map((d) => [d.label, d.text])).toEqual([
      ["Estimated burst speed", "23800 rpm"],
      ["Tip speed", "103 ft/s"],
    ]);
  });

  it("on typical strengths the rule warns that a part may fall short of them (metric, hand-derived)", () => {
    const c = card({ ...defaults, strengthBasis: "typical" }, "metric");
    expect(c.rule).toBe("Safety factor against yield at least 2.00 holds, below 1.00 fails; on typical strengths, which a part may fall short of");
    expect(c.margin).toBe("Peak stress 2.66 MPa at 2400 rpm (tip speed 31.4 m/s); yields at 22800 rpm, bursts near 23800 rpm");
  });

  it("the form: a list of up to 24 rims, the shape and strength menus with their link keys and help, the page's material menu", () => {
    expect([rims.id, rims.title, rims.chapter]).toEqual(["rims", "Rims and disks", "rims"]);
    expect(rims.section).toEqual({ kind: "list", max: 24, entryName: "Rim" });
    expect(rims.pageKeys).toEqual(["mat"]);
    expect(linkKeys(rims).slice(-2)).toEqual([
      { key: "shape", label: "Shape", maxLength: 48 },
      { key: "basis", label: "Strengths are", maxLength: 48 },
    ]);
    expect(rims.choices.shape.default).toBe("thin-ring");
    expect(rims.choices.strengthBasis.default).toBe("minimum");
    expect(rims.choices.shape.help).toBe("A ring is checked at its outer radius; a disk with a bore peaks at the bore.");
    expect(rims.choices.strengthBasis.help).toBe("A standard's minimums (design on these) or typical values (not for design).");
  });
});
