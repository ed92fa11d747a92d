/**
 * The quick balance card, as the build sheet shows it (a part added at a radius against a balance
 * grade; a part moved against a wobble force), and which inputs the form asks for in each case.
 */
import { describe, expect, it } from "vitest";
import quickBalance from "../../../calc/calculators/quick-balance.ts";
import { initialValues } from "../../../calc/core/calculator.ts";
import type { UnitSystem } from "../../../calc/core/units.ts";

// Defaults: robot 1.5 kg, 2400 rpm (ω = 251.327 rad/s, ω² = 63 165.5 s⁻²), part 12 g at 45 mm,
// moved 10 mm, counterweight at 50 mm, balance grade G 100.
const defaults = initialValues(quickBalance as never) as Record<string, unknown>;

function cardFor(change: Record<string, unknown>, system: UnitSystem) {
  const values = { ...defaults, ...change } as never;
  const cards = quickBalance.cards(values, quickBalance.run(values) as never, system);
  expect(cards).toHaveLength(1);
  return cards[0]!;
}

describe("the quick balance card", () => {
  it("a 12 g part added at 45 mm against G 100 holds, with the counterweight that cancels it (metric)", () => {
    // U = 0.012 × 0.045 = 5.40e-4 kg·m = 540 g·mm; offset U/(1.5 + 0.012) = 0.357 mm;
    // G 100: e_per = 0.1/251.327 = 0.398 mm, U_per = e_per × 1.512 kg = 602 g·mm (ISO 21940-11 grade definition);
    // counterweight U/0.05 m = 10.8 g; force U ω² = 5.40e-4 × 63 165.5 = 34.1 N; share 540/602 = 0.898.
    const card = cardFor({}, "metric");
    expect(card.title).toBe("Quick balance check");
    expect(card.status).toBe("holds");
    expect(card.rule).toBe("The part alone within G 100 (ISO 21940-11) at 2400 rpm: U ≤ U_per = 602 g·mm; marginal up to 2.5 × U_per");
    expect(card.margin).toBe(
      "The part added puts the centre of mass 0.357 mm off the axis (limit 0.398 mm): a 10.8 g counterweight at 50.0 mm, opposite, cancels it",
    );
    expect(card.figure).toMatchObject({ label: "Counterweight that cancels it", text: "10.8 g" });
    expect(card.details!.map((d) => [d.label, d.text])).toEqual([
      ["Least counterweight within the limit", "0 g"],
      ["Centre-of-mass offset", "0.357 mm"],
      ["Unbalance", "540 g·mm"],
      ["Rotating force", "34.1 N"],
      ["Share of the limit", "0.898"],
    ]);
  });

  it("gives the same card in US units (602 g·mm = 0.835 oz·in, 0.357 mm = 0.0141 in, 10.8 g = 0.381 oz)", () => {
    const card = cardFor({}, "us");
    expect(card.rule).toBe("The part alone within G 100 (ISO 21940-11) at 2400 rpm: U ≤ U_per = 0.835 oz·in; marginal up to 2.5 × U_per");
    expect(card.margin).toBe(
      "The part added puts the centre of mass 0.0141 in off the axis (limit 0.0157 in): a 0.381 oz counterweight at 1.97 in, opposite, cancels it",
    );
    expect(card.details!.map((d) => d.text)).toEqual(["0 oz", "0.0141 in", "0.750 oz·in", "7.67 lbf", "0.898"]);
  });

  it("a 12 g part moved 10 mm against a 50 N wobble force: the limit names the force", () => {
    // U = 0.012 × 0.010 = 1.20e-4 kg·m = 120 g·mm; offset U/1.5 = 0.0800 mm; U_per = 50/63 165.5 = 7.92e-4 kg·m
    // = 792 g·mm, offset limit 7.92e-4/1.5 = 0.528 mm; counterweight 1.20e-4/0.05 = 2.40 g; force 7.58 N.
    const card = cardFor({ limit: "force", change: "moved" }, "metric");
    expect(card.status).toBe("holds");
    expect(card.rule).toBe("The part alone within a wobble force of 50.0 N at 2400 rpm: U ≤ U_per = 792 g·mm; marginal up to 2.5 × U_per");
    expect(card.margin).toBe(
      "The part moved puts the centre of mass 0.0800 mm off the axis (limit 0.528 mm): a 2.40 g counterweight at 50.0 mm, opposite, cancels it",
    );
    expect(card.details!.map((d) => d.text)).toEqual(["0 g", "0.0800 mm", "120 g·mm", "7.58 N", "0.152"]);
    // 50 N / 4.44822 = 11.2 lbf
    expect(cardFor({ limit: "force", change: "moved" }, "us").rule).toBe(
      "The part alone within a wobble force of 11.2 lbf at 2400 rpm: U ≤ U_per = 1.10 oz·in; marginal up to 2.5 × U_per",
    );
  });
});

describe("the quick balance form asks only for the inputs that apply", () => {
  const applies = (input: string, values: Record<string, unknown>) => quickBalance.applies!(input, values as never);

  it("asks for the wobble force only when the limit is set by a force", () => {
    expect(applies("wobbleForce", { limit: "force" })).toBe(true);
    expect(applies("wobbleForce", { limit: "grade" })).toBe(false);
  });

  it("asks for the part's radius when it is added, and for the distance moved when it is moved", () => {
    expect(applies("partRadius", { change: "added" })).toBe(true);
    expect(applies("partRadius", { change: "moved" })).toBe(false);
    expect(applies("moveDistance", { change: "moved" })).toBe(true);
    expect(applies("moveDistance", { change: "added" })).toBe(false);
  });

  it("always asks for the other inputs", () => {
    for (const input of ["robotMass", "spinSpeed", "partMass", "counterweightRadius"]) {
      expect(applies(input, { limit: "grade", change: "added" })).toBe(true);
      expect(applies(input, { limit: "force", change: "moved" })).toBe(true);
    }
  });
});
