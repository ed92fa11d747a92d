/**
 * The heading chapter's radius-mismatch example (calc/heading/drift-demo.ts): its refusals and its
 * band when the budget leaves the band open above. Values derived by hand from r̂_lo = N/(ω + D)²,
 * N = ω²r (the band's formula in calc/heading/drift.ts; centripetal a = ω²r, OpenStax College Physics ch. 6).
 */
import { describe, expect, it } from "vitest";
import { radiusMismatchExample } from "../../../calc/heading/drift-demo.ts";
import { refusal } from "../../support/refusal.ts";

describe("radiusMismatchExample", () => {
  it("has no band half-width when the budget is at least the top speed (60 rpm = 2π rad/s, budget 10 rad/s)", () => {
    // ω = 2π, N = ω² × 0.0127 m; r̂_lo = N/(ω + 10)²; r̂_hi has no finite value when D ≥ ω.
    const w = 2 * Math.PI;
    const example = radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [30, 60], budget: 10 });
    expect(example.bandAtTopSpeed.status).toBe("upper-unbounded");
    expect(example.bandAtTopSpeed.low!).toBeCloseTo((w * w * 0.0127) / (w + 10) ** 2, 15);
    expect(example.bandAtTopSpeed.high).toBeNull();
    expect(example.bandHalfWidthFraction).toBeNull();
  });

  it("refuses an empty list of speeds as a count with no unit", () => {
    const error = refusal(() => radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [] }));
    expect(error.param).toBe("speedsRpm");
    expect(error.unit).toBe("");
    expect(error.message).toBe("speedsRpm must be at least one speed (got 0)");
  });

  it("refuses speeds that are not a list, naming them", () => {
    const error = refusal(() => radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: 1200 as never }));
    expect(error.param).toBe("speedsRpm");
    expect(error.expected).toBe("a list");
  });

  it("refuses a speed so small that its square underflows (1e−162 rpm: ω² ≈ 1e−326 rad²/s², below the smallest double), rather than show a drift of 0°", () => {
    const error = refusal(() => radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [1200, 1e-162] }));
    expect(error.param).toBe("speedsRpm[1]");
    expect(error.value).toBe(1e-162);
    expect(error.unit).toBe("rpm");
    expect(error.message).toBe("speedsRpm[1] must be large enough for the centripetal reading to be above 0 (got 1e-162 rpm)");
  });

  it("refuses a speed that is not positive in rpm, naming its place in the list", () => {
    const error = refusal(() => radiusMismatchExample({ assumedRadius: 0.012, trueRadius: 0.0127, speedsRpm: [1200, -5] }));
    expect(error.param).toBe("speedsRpm[1]");
    expect(error.unit).toBe("rpm");
    expect(error.message).toBe("speedsRpm[1] must be greater than 0 rpm (got -5 rpm)");
  });
});
