import { describe, expect, it } from "vitest";
import weaponShaft from "../../../calc/calculators/weapon-shaft.ts";
import { initialValues } from "../../../calc/core/calculator.ts";

// The page's defaults: a 2.5 kg rotor (J = 0.010125 kg·m²) at 8000 rpm (837.758 rad/s), turning at 360 °/s,
// unbalance 20 g·mm, an 8 kN hit; a dead 12 mm 4340 shaft (yield 834 MPa) between supports 60 mm apart with
// the rotor in the middle; ball bearings C = 5400 N, C0 = 2360 N; 20 h required.
const defaults = initialValues(weaponShaft);
const MATERIAL = "AISI 4340 steel, oil quenched from 800 °C, tempered at 650 °C (50 mm round)";

function cards(values: typeof defaults, system: "metric" | "us") {
  return weaponShaft.cards(values, weaponShaft.run(values), system);
}

describe("weapon shaft and bearings cards", () => {
  it("a vertical axle not turning, with no unbalance: the hit alone bends the shaft; no running load on the bearings (hand-derived)", () => {
    const [shaft, life, shock] = cards({ ...defaults, axle: "vertical", turnRate: 0, unbalance: 0 }, "metric");
    // Hit in the middle of a 60 mm span: M = F L / 4 = 8000 × 0.06 / 4 = 120 N·m; σ = 32 M / (π d³) = 3840 / (π × 1.728e-6) = 707 MPa;
    // 834 / 707 = 1.18, marginal (below 2).
    expect(shaft!.rule).toBe(`Safety factor on yield (${MATERIAL}) at the peak of a hit, with the turn's gyroscopic moment: fails below 1, marginal below 2`);
    expect(shaft!.margin).toBe("1.2 on yield at 120 N·m of bending (707 MPa against 834 MPa); 0.173 mm of deflection at the rotor");
    expect([shaft!.status, shaft!.figure?.label, shaft!.figure?.text]).toEqual(["marginal", "Safety factor on yield", "1.18"]);
    expect(shaft!.details.map((d) => [d.label, d.text])).toEqual([
      ["Gyroscopic moment", "0 N·m"],
      ["Unbalance force", "0 N"],
      ["Bending moment, running", "0 N·m"],
    ]);
    // 72000 s = 20 h required.
    expect(life!.key).toBe("life");
    expect(life!.title).toBe("Weapon bearings: life");
    expect(life!.rule).toBe(
      "ISO 281 rating life L10 of the busier bearing in the rotor's hub, running at 8000 rpm in the turn: fails below the 20 h required, marginal below 2 times it",
    );
    expect([life!.margin, life!.figure, life!.status]).toEqual(["No running load on the bearings", null, "holds"]);
    // Each hub bearing takes half the hit: P0 = 4000 N; s0 = 2360 / 4000 = 0.59.
    expect(shock!.key).toBe("shock");
    expect(shock!.title).toBe("Weapon bearings: shock");
    expect(shock!.rule).toBe("ISO 76 static safety factor s0 = C0/P0 under the hit: fails below 1, marginal below 1.5 (rotating, shock loads)");
    expect(shock!.margin).toBe("s0 = 0.59 at 4000 N against C0 = 2360 N");
    expect([shock!.figure?.label, shock!.figure?.text, shock!.status]).toEqual(["Static safety factor s0", "0.590", "fails"]);
  });

  it("with no hit and no running load, the shaft and the life have no figure and say 'no load'", () => {
    const [shaft, life] = cards({ ...defaults, axle: "vertical", turnRate: 0, unbalance: 0, impactForce: 0 }, "metric");
    expect(shaft!.margin).toBe("no load on yield at 0 N·m of bending (0 MPa against 834 MPa); 0 mm of deflection at the rotor");
    expect(shaft!.figure).toBeNull();
    expect(life!.figure).toBeNull();
  });

  it("the defaults in US units: the turn's gyroscopic moment and the unbalance show, the dead shaft's hub bearings wear out (hand-checked)", () => {
    const [shaft, life, shock] = cards(defaults, "us");
    // Gyroscopic: 0.010125 × 837.758 × 2π = 53.3 N·m = 472 lbf·in; unbalance 2e-5 × 837.758² = 14.0 N = 3.16 lbf.
    expect(shaft!.details.map((d) => d.text)).toEqual(["472 lbf·in", "3.16 lbf", "241 lbf·in"]);
    expect(shaft!.margin).toBe("0.96 on yield at 1300 lbf·in of bending (126 ksi against 121 ksi); 0.00683 in of deflection at the rotor");
    // L10 = (C/P)³ × 10⁶ / (60 n) = (5400 / 2682)³ × 10⁶ / (60 × 8000) = 17.0 h (P = 603 lbf = 2682 N, from the check).
    expect(life!.margin).toBe("L10 = 17 h at 603 lbf against C = 1210 lbf");
    expect([life!.figure?.label, life!.figure?.unit, life!.figure?.text]).toEqual(["Rating life L10", "s", "17.0 h"]);
    expect((life!.figure?.value ?? 0) / 3600).toBeCloseTo(17.0, 1); // the figure is in seconds
    // s0 = 2360 N / 6684 N (1500 lbf) = 0.353; 2360 N = 531 lbf.
    expect(shock!.margin).toBe("s0 = 0.35 at 1500 lbf against C0 = 531 lbf");
  });

  it("a live shaft: the bearings are at the supports (hand-checked life)", () => {
    const [, life, shock] = cards({ ...defaults, shaft: "live" }, "metric");
    // (5400 / 908)³ × 10⁶ / (60 × 8000) = 210.3 × 2.083 = 438 h (P = 908 N, from the check); s0 = 2360 / 4910 = 0.48.
    expect(life!.rule).toBe(
      "ISO 281 rating life L10 of the busier bearing at the supports, running at 8000 rpm in the turn: fails below the 20 h required, marginal below 2 times it",
    );
    expect(life!.margin).toBe("L10 = 440 h at 908 N against C = 5400 N");
    expect(life!.figure?.text).toBe("439 h");
    expect(shock!.margin).toBe("s0 = 0.48 at 4910 N against C0 = 2360 N");
  });
});
