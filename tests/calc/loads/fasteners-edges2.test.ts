/**
 * The Eurocode 3 bolt resistances at their edges: the partial factor and k₂ outside their ranges,
 * and a resistance that would overflow, refused naming the input furthest from 1 in orders of
 * magnitude (the rule of requireFiniteResult in calc/core/spec-check.ts).
 */
import { describe, it } from "vitest";
import { eurocodeBoltShearResistance, eurocodeBoltTensionResistance } from "../../../calc/loads/fasteners.ts";
import { expectRefusal } from "../../support/refusal.ts";

// Class 4.6, M20 (en-1993-1-8 Table 3.4 with A_s = 245 mm², f_ub = 400 MPa), the doc comments' example.
const M20 = { ultimateStrength: 400e6 };

describe("the Eurocode 3 shear resistance at its edges", () => {
  it("refuses a partial factor γ_M2 below 1, naming it with its range", () => {
    expectRefusal(
      () => eurocodeBoltShearResistance({ ...M20, area: 245e-6, shearFactor: 0.6, partialFactor: 0.9 }),
      "partialFactor",
      0.9,
      "",
      "partialFactor must be at least 1 and at most 10 (got 0.9)",
    );
  });

  it("names the ultimate strength in pascals when α_v f_ub A overflows (f_ub = 1e300 Pa, A = 1e10 m²)", () => {
    expectRefusal(
      () => eurocodeBoltShearResistance({ area: 1e10, ultimateStrength: 1e300, shearFactor: 0.6 }),
      "ultimateStrength",
      1e300,
      "Pa",
      "ultimateStrength must be small enough for the shear resistance to stay finite (got 1e+300 Pa)",
    );
  });
});

describe("the Eurocode 3 tension resistance at its edges", () => {
  it("refuses k₂ = 0 (the range is open at 0) and a partial factor above 10", () => {
    expectRefusal(() => eurocodeBoltTensionResistance({ ...M20, stressArea: 245e-6, k2: 0 }), "k2", 0, "", "k2 must be greater than 0 and at most 1 (got 0)");
    expectRefusal(
      () => eurocodeBoltTensionResistance({ ...M20, stressArea: 245e-6, partialFactor: 11 }),
      "partialFactor",
      11,
      "",
      "partialFactor must be at least 1 and at most 10 (got 11)",
    );
  });

  it("names the ultimate strength in pascals when k₂ f_ub A_s overflows", () => {
    expectRefusal(
      () => eurocodeBoltTensionResistance({ stressArea: 1e10, ultimateStrength: 1e300 }),
      "ultimateStrength",
      1e300,
      "Pa",
      "ultimateStrength must be small enough for the tension resistance to stay finite (got 1e+300 Pa)",
    );
  });
});
