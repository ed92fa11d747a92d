/**
 * The quick balance check: one part added to or moved within a balanced robot. Checked against the
 * published ISO 21940-11 example (the same one tests/calc/mass.test.ts uses), against the hand
 * formulas, against the full mass layout (calc/mass/properties.ts and mass-balance.ts) for the same
 * robot drawn as one disk plus the part, and over the whole double range.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { CalcInputError } from "../../calc/core/errors.ts";
import { fromSI, rpmToRadPerSecond, toSI } from "../../calc/core/units.ts";
import { BALANCE_GRADES, permissibleResidualUnbalance } from "../../calc/mass/balance.ts";
import { massBalance, massBalanceInputs, type MassBalanceScalars } from "../../calc/mass/mass-balance.ts";
import type { LayoutPart } from "../../calc/mass/parts.ts";
import { massProperties } from "../../calc/mass/properties.ts";
import { type QuickBalanceInput, quickBalance, quickBalanceInputs } from "../../calc/mass/quick-balance.ts";
import { expectParamError, expectWellDeclared, inputArb, invalidInputArb } from "../support/arbitraries.ts";
import { refusal } from "../support/refusal.ts";

const base: QuickBalanceInput = {
  robotMass: 1.5,
  spinSpeed: rpmToRadPerSecond(2400),
  limit: "grade",
  grade: "100",
  wobbleForce: 50,
  change: "added",
  partMass: 0.012,
  partRadius: 0.045,
  moveDistance: 0.01,
  counterweightRadius: 0.05,
};

const disk = (mass: number): LayoutPart => ({ name: "robot", shape: { kind: "disk", radius: 0.06 }, mass: { kind: "given", mass }, x: 0, y: 0, z: 0 });
const point = (mass: number, x: number, y: number, name = "part"): LayoutPart => ({
  name,
  shape: { kind: "point" },
  mass: { kind: "given", mass },
  x,
  y,
  z: 0,
});

describe("the allowance from a balance grade (published example)", () => {
  // The rotor of the example is the whole "robot": a moved part of no mass leaves M = M₀.
  const rotor = { ...base, robotMass: toSI(1000, "lb"), spinSpeed: rpmToRadPerSecond(15000), grade: "2.5", change: "moved", partMass: 0 } as const;
  it.each([
    {
      source: "energy-tech-balancing-example",
      locator: "p. 4, 1000 lb, 15 000 rpm, G 2.5",
      inputs: rotor,
      expected: 1.0,
      pick: (r: ReturnType<typeof quickBalance>) => fromSI(r.allowance.unbalance, "oz·in"),
      rtol: 0.05,
      note: "printed 1.0 oz·in: ± half a unit in the last digit",
    },
    {
      source: "iso-21940-11",
      locator: "Table 1 and e_per = G/Ω: G 2.5 at 15 000 rpm (1570.8 rad/s)",
      inputs: rotor,
      expected: 0.0025 / 1570.796,
      pick: (r: ReturnType<typeof quickBalance>) => r.allowance.offset,
      rtol: 5e-7,
      note: "Ω = 15 000 × 2π/60 printed to 7 significant figures",
    },
  ])("$source, $locator", ({ inputs, expected, pick, rtol, note }) => {
    expect(Math.abs(pick(quickBalance(inputs)) / expected - 1), note).toBeLessThanOrEqual(rtol);
  });

  it("reuses the grade table: every grade of iso-21940-11 Table 1 gives e_per = G/Ω and U_per = M·G/Ω exactly as permissibleResidualUnbalance", () => {
    for (const g of BALANCE_GRADES) {
      const r = quickBalance({ ...base, grade: g.label.slice(2) });
      const per = permissibleResidualUnbalance({ totalMass: r.totalMass, grade: g.value, angularSpeed: base.spinSpeed });
      expect(r.allowance.grade).toBe(g);
      expect(r.allowance.offset).toBe(per.specificUnbalance);
      expect(r.allowance.unbalance).toBe(per.unbalance);
    }
  });

  it("reads a wobble force as the same limit: F = U_per·Ω² set as the force gives back the grade's e_per and U_per (round trip)", () => {
    const byGrade = quickBalance(base);
    const byForce = quickBalance({ ...base, limit: "force", wobbleForce: byGrade.allowance.force });
    expect(byForce.allowance.offset / byGrade.allowance.offset).toBeCloseTo(1, 14);
    expect(byForce.allowance.unbalance / byGrade.allowance.unbalance).toBeCloseTo(1, 14);
    expect(byForce.allowance.equivalentGrade).toBeCloseTo(0.1, 15);
    expect(byForce.allowance.grade).toBeNull();
  });
});

describe("one added or moved part (hand formulas)", () => {
  const W = rpmToRadPerSecond(2400);
  // Hand formulas (centre-of-mass; rigid-rotor-unbalance): e = m·r/M, U = m·r, F = U·Ω², m_cw = U/r_cw.
  it.each([
    {
      source: "hand formula (centre-of-mass, rigid-rotor-unbalance)",
      locator: "12 g added at 45 mm to a 1.5 kg robot, 2400 rpm",
      inputs: base,
      expected: { totalMass: 1.512, offset: 0.00054 / 1.512, unbalance: 0.00054, force: 0.00054 * W * W, counterweight: 0.00054 / 0.05 },
      rtol: 1e-14,
      note: "exact arithmetic on the inputs",
    },
    {
      source: "hand formula (centre-of-mass, rigid-rotor-unbalance)",
      locator: "a 180 g battery moved 4 mm in a 1.5 kg robot",
      inputs: { ...base, change: "moved", partMass: 0.18, moveDistance: 0.004 },
      expected: { totalMass: 1.5, offset: 0.00072 / 1.5, unbalance: 0.00072, force: 0.00072 * W * W, counterweight: 0.00072 / 0.05 },
      rtol: 1e-14,
      note: "a moved part keeps M = M₀",
    },
    {
      source: "hand formula (newton-second-law: F = m·ω²·r)",
      locator: "1 g at 100 mm, 6000 rpm: F = 0.001 × 628.3² × 0.1 = 39.48 N",
      inputs: { ...base, partMass: 0.001, partRadius: 0.1, spinSpeed: rpmToRadPerSecond(6000) },
      expected: { totalMass: 1.501, offset: 0.0001 / 1.501, unbalance: 0.0001, force: 39.478, counterweight: 0.002 },
      rtol: 5e-5,
      note: "force printed to 5 significant figures",
    },
  ] as const)("$source: $locator", ({ inputs, expected, rtol, note }) => {
    const r = quickBalance(inputs);
    for (const [name, value] of Object.entries(expected)) {
      expect(Math.abs(r[name as keyof typeof expected] / value - 1), `${name}: ${note}`).toBeLessThanOrEqual(rtol);
    }
  });

  it("gives the least counterweight from the offset limit M(e − e_per)/(r_cw + e_per) for a grade and (U − U_per)/r_cw for a force (hand formulas, centre-of-mass)", () => {
    const tight = { ...base, grade: "16" };
    const g = quickBalance(tight);
    expect(g.leastCounterweight).toBeCloseTo((g.totalMass * (g.offset - g.allowance.offset)) / (0.05 + g.allowance.offset), 15);
    const f = quickBalance({ ...base, limit: "force", wobbleForce: 10 });
    expect(f.leastCounterweight).toBeCloseTo((f.unbalance - 10 / base.spinSpeed ** 2) / 0.05, 15);
    expect(quickBalance({ ...base, grade: "250" }).leastCounterweight).toBe(0);
  });

  it("judges U/U_per: Holds at or below 1, Marginal up to 2.5 (one grade step), Fails beyond", () => {
    // U_per for G 100 at 2400 rpm and M = 1.512 kg is 601.6 g·mm; U = m × 45 mm.
    const at = (m: number) => quickBalance({ ...base, partMass: m });
    expect(at(0.012).status).toBe("holds");
    expect(at(0.02).status).toBe("marginal");
    expect(at(0.05).status).toBe("fails");
    expect(at(0).shareOfLimit).toBe(0);
  });
});

describe("the same robot in the full mass layout (second method)", () => {
  const scalars = Object.fromEntries(Object.entries(massBalanceInputs).map(([k, spec]) => [k, spec.default])) as MassBalanceScalars;

  it("an added part: the robot as one disk plus the part at (r cos θ, r sin θ) has the quick check's offset and unbalance (massProperties, massBalance)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 100, noNaN: true }),
        fc.double({ min: 0.0001, max: 5, noNaN: true }),
        fc.double({ min: 0.001, max: 0.5, noNaN: true }),
        fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }),
        (robotMass, partMass, partRadius, angle) => {
          const quick = quickBalance({ ...base, robotMass, partMass, partRadius });
          const parts = [disk(robotMass), point(partMass, partRadius * Math.cos(angle), partRadius * Math.sin(angle))];
          const layout = massProperties(parts);
          const full = massBalance({ ...scalars, spinSpeed: base.spinSpeed, parts });
          // Summed in another order and through cos/sin: a few units in the last place.
          expect(quick.offset / layout.offset).toBeCloseTo(1, 12);
          expect(quick.unbalance / full.static.unbalance).toBeCloseTo(1, 12);
          expect(quick.force / full.static.force).toBeCloseTo(1, 12);
          expect(quick.totalMass / layout.totalMass).toBeCloseTo(1, 14);
        },
      ),
    );
  });

  it("a moved part: a balanced robot (disk, the part and its twin opposite) whose part moves from P₁ to P₂ has e = m·|P₂ − P₁|/M (massProperties)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 100, noNaN: true }),
        fc.double({ min: 0.001, max: 0.2, noNaN: true }),
        fc.tuple(fc.double({ min: -0.1, max: 0.1, noNaN: true }), fc.double({ min: -0.1, max: 0.1, noNaN: true })),
        fc.tuple(fc.double({ min: -0.1, max: 0.1, noNaN: true }), fc.double({ min: -0.1, max: 0.1, noNaN: true })),
        (robotMass, share, [x1, y1], [x2, y2]) => {
          const partMass = robotMass * share;
          const before = massProperties([disk(robotMass - 2 * partMass), point(partMass, x1, y1), point(partMass, -x1, -y1, "twin")]);
          expect(before.offset).toBeLessThan(1e-12);
          const after = massProperties([disk(robotMass - 2 * partMass), point(partMass, x2, y2), point(partMass, -x1, -y1, "twin")]);
          const moveDistance = Math.hypot(x2 - x1, y2 - y1);
          const quick = quickBalance({ ...base, change: "moved", robotMass, partMass, moveDistance });
          expect(quick.offset).toBeCloseTo(after.offset, 12);
          expect(quick.unbalance).toBeCloseTo(after.totalMass * after.offset, 12);
        },
      ),
    );
  });

  it("the counterweight it names, placed opposite at r_cw, brings the layout's offset to zero; the least one brings it to e_per exactly (massProperties)", () => {
    const q = quickBalance({ ...base, grade: "16" });
    const parts = [disk(base.robotMass), point(base.partMass, base.partRadius, 0)];
    expect(massProperties([...parts, point(q.counterweight, -0.05, 0, "cw")]).offset).toBeLessThan(1e-18);
    const least = massProperties([...parts, point(q.leastCounterweight, -0.05, 0, "cw")]);
    expect(least.offset / q.allowance.offset).toBeCloseTo(1, 12);
    // With a force limit the unbalance after the least counterweight is U_per.
    const f = quickBalance({ ...base, limit: "force", wobbleForce: 10 });
    const withF = massProperties([...parts, point(f.leastCounterweight, -0.05, 0, "cw")]);
    expect((withF.totalMass * withF.offset) / f.allowance.unbalance).toBeCloseTo(1, 12);
  });
});

describe("inputs and edges", () => {
  it("declares every input with a label, its own link key and a default inside its range", () => {
    expectWellDeclared(quickBalanceInputs);
  });

  it("never returns a non-finite number for any valid input, over the whole declared range of each field", () => {
    const specs = quickBalanceInputs;
    fc.assert(
      fc.property(
        fc.record({
          robotMass: inputArb(specs.robotMass),
          spinSpeed: inputArb(specs.spinSpeed),
          wobbleForce: inputArb(specs.wobbleForce),
          partMass: inputArb(specs.partMass),
          partRadius: inputArb(specs.partRadius),
          moveDistance: inputArb(specs.moveDistance),
          counterweightRadius: inputArb(specs.counterweightRadius),
          limit: fc.constantFrom("grade", "force"),
          grade: fc.constantFrom(...BALANCE_GRADES.map((g) => g.label.slice(2))),
          change: fc.constantFrom("added", "moved"),
        }),
        (input) => {
          let r: ReturnType<typeof quickBalance>;
          try {
            r = quickBalance(input as QuickBalanceInput);
          } catch (error) {
            // The one refusal inside the ranges: a moved part heavier than the robot, or a force that underflows.
            expect(error).toBeInstanceOf(CalcInputError);
            expect(["partMass", "wobbleForce"]).toContain((error as CalcInputError).param);
            return;
          }
          const numbers = [r.totalMass, r.offset, r.unbalance, r.force, r.equivalentGrade, r.shareOfLimit, r.counterweight, r.leastCounterweight];
          numbers.push(r.allowance.offset, r.allowance.unbalance, r.allowance.force, r.allowance.equivalentGrade);
          for (const v of numbers) expect(Number.isFinite(v)).toBe(true);
        },
      ),
    );
  });

  it("names the field for every invalid number, over the whole double range and ±Infinity and NaN", () => {
    for (const [name, spec] of Object.entries(quickBalanceInputs)) {
      fc.assert(
        fc.property(invalidInputArb(spec), (bad) => {
          expectParamError(() => quickBalance({ ...base, [name]: bad }), name);
        }),
        { numRuns: 50 },
      );
    }
  });

  it("names the choice or the argument that is wrong, never a TypeError", () => {
    expectParamError(() => quickBalance({ ...base, grade: "5" }), "grade");
    expectParamError(() => quickBalance({ ...base, limit: "torque" as never }), "limit");
    expectParamError(() => quickBalance({ ...base, change: "removed" as never }), "change");
    expectParamError(() => quickBalance({ ...base, change: "moved", partMass: 2 }), "partMass");
    expectParamError(() => quickBalance({ ...base, limit: "force", wobbleForce: 5e-324, spinSpeed: 6000 }), "wobbleForce");
    expect(() => quickBalance(null as never)).toThrow(CalcInputError);
    expect(() => quickBalance(undefined as never)).toThrow(CalcInputError);
  });
});

describe("regression pins (our own digits, not a source)", () => {
  it("the default: 12 g at 45 mm on 1.5 kg at 2400 rpm, G 100: e = 0.357 mm, U = 540 g·mm, F = 34.1 N, 10.8 g at 50 mm", () => {
    const r = quickBalance(base);
    expect(r.offset * 1000).toBeCloseTo(0.357143, 6);
    expect(r.force).toBeCloseTo(34.1094, 4);
    expect(r.counterweight * 1000).toBeCloseTo(10.8, 10);
    expect(r.status).toBe("holds");
  });
});

describe("the quick balance's verdict at its edges (iso-21940-11: holds when U ≤ U_per)", () => {
  // Numbers exact in binary, so that U/U_per lands exactly on the edges: Ω = 64 rad/s (Ω² = 4096),
  // a force limit of 128 N is U_per = 128/4096 = 1/32 kg·m.
  const exact = { ...base, limit: "force" as const, spinSpeed: 64, robotMass: 2, wobbleForce: 128, partRadius: 0.0625 };

  it("holds at exactly the limit, U = U_per", () => {
    const r = quickBalance({ ...exact, partMass: 0.5 });
    expect([r.shareOfLimit, r.status, r.reason]).toEqual([1, "holds", "within the limit"]);
  });

  it("is marginal up to exactly 2.5 × the limit, and fails past it", () => {
    const edge = quickBalance({ ...exact, partMass: 1.25 });
    expect([edge.shareOfLimit, edge.status, edge.reason]).toEqual([2.5, "marginal", "over the limit, by up to 2.5 times (one grade step)"]);
    const past = quickBalance({ ...exact, partMass: 1.25 * (1 + 1e-12) });
    expect([past.status, past.reason]).toEqual(["fails", "more than 2.5 times the limit"]);
  });

  it("takes a moved part as heavy as the robot, and refuses a heavier one", () => {
    expect(quickBalance({ ...base, change: "moved", partMass: base.robotMass }).totalMass).toBe(base.robotMass);
    expect(() => quickBalance({ ...base, change: "moved", partMass: base.robotMass + 0.001 })).toThrow(
      "partMass must be at most the robot's mass (1.5 kg): a moved part is part of the robot (got 1.501 kg)",
    );
  });
});

describe("the quick balance's refusals as the page words them", () => {
  it("lists the grade numbers of iso-21940-11 Table 1, in mm/s, for a grade that is not one of them", () => {
    const e = refusal(() => quickBalance({ ...base, grade: "5" }));
    expect([e.param, e.value, e.unit]).toEqual(["grade", "5", "mm/s"]);
    expect(e.message).toBe('grade must be one of 0.4, 1, 2.5, 6.3, 16, 40, 100, 250, 630, 1600, 4000 (got "5")');
  });

  it("lists the choices of limit and change, with no unit", () => {
    const limit = refusal(() => quickBalance({ ...base, limit: "torque" as never }));
    expect([limit.param, limit.value, limit.unit, limit.message]).toEqual(["limit", "torque", "", 'limit must be one of grade, force (got "torque")']);
    const change = refusal(() => quickBalance({ ...base, change: "removed" as never }));
    expect([change.param, change.value, change.unit, change.message]).toEqual(["change", "removed", "", 'change must be one of added, moved (got "removed")']);
  });

  it("names a wobble force that allows no offset at all at the top speed, in N", () => {
    // U_per = F/Ω² = 5e-324 N / 6000² underflows to 0 kg·m: no part would be allowed.
    const e = refusal(() => quickBalance({ ...base, limit: "force", wobbleForce: 5e-324, spinSpeed: 6000 }));
    expect([e.param, e.value, e.unit]).toEqual(["wobbleForce", 5e-324, "N"]);
    expect(e.message).toBe("wobbleForce must be large enough to allow some offset at this spin speed (got 5e-324 N)");
  });

  it("names a wobble force so small that U/U_per passes the largest double, in N", () => {
    // At the slowest speed, Ω = 0.1 rad/s: U_per = 5e-324 N / 0.01 = 4.9e-322 kg·m, still above 0, but
    // U/U_per = (0.012 kg × 0.045 m) / 4.9e-322 kg·m = 1.1e318, past the largest double (about 1.8e308).
    const e = refusal(() => quickBalance({ ...base, limit: "force", wobbleForce: 5e-324, spinSpeed: 0.1 }));
    expect([e.param, e.value, e.unit]).toEqual(["wobbleForce", 5e-324, "N"]);
    expect(e.message).toBe("wobbleForce must be a limit large enough that U/U_per stays finite (got 5e-324 N)");
  });
});
