/**
 * fast-check arbitraries shared by the tests: robot-sized parts for layouts, and any valid values
 * of any calculator, drawn from its own declaration.
 */
import { expect } from "vitest";
import fc from "fast-check";
import { CalcInputError } from "../../calc/core/errors.ts";
import type { AnyCalculator, AnyValues } from "../../calc/core/calculator.ts";
import type { InputSpec, InputSpecs } from "../../calc/core/inputs.ts";
import { MATERIAL_IDS } from "../../calc/materials/densities.ts";
import type { LayoutPart, PartShape } from "../../calc/mass/parts.ts";

// fast-check arbitraries: sensible robot-sized parts.
/** A double with no negative zero (a link or a file writes it as 0). */
const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((v) => (Object.is(v, -0) ? 0 : v));
export const len = (min = 0.001, max = 0.2) => num(min, max);
export const coord = num(-0.2, 0.2);
export const massArb = num(0.001, 2);
export const angleArb = num(-Math.PI, Math.PI);
export const shapeArb: fc.Arbitrary<PartShape> = fc.oneof(
  fc.constant({ kind: "point" as const }),
  len().map((radius) => ({ kind: "disk" as const, radius })),
  len().map((radius) => ({ kind: "ring" as const, radius })),
  fc.tuple(len(0, 0.1), len(0.001, 0.1)).map(([a, b]) => ({ kind: "annulus" as const, innerRadius: a, outerRadius: a + b })),
  fc.tuple(len(), len(), angleArb).map(([length, width, angle]) => ({ kind: "plate" as const, length, width, angle })),
  fc.tuple(len(), angleArb).map(([length, angle]) => ({ kind: "rod" as const, length, angle })),
  fc.tuple(len(), len()).map(([radius, height]) => ({ kind: "cylinder" as const, radius, height })),
  fc
    .tuple(num(0, 0.01), num(-0.001, 0.001), num(-0.001, 0.001))
    .map(([inertiaZ, productXZ, productYZ]) => ({ kind: "custom" as const, inertiaZ, productXZ, productYZ })),
);
export const partArb: fc.Arbitrary<LayoutPart> = fc
  .record({
    shape: shapeArb,
    m: massArb,
    x: coord,
    y: coord,
    z: coord,
    material: fc.constantFrom(...MATERIAL_IDS),
    useMaterial: fc.boolean(),
    t: len(0.001, 0.02),
    name: fc.constantFrom("body", "battery", "motor_1", "a~b", "wheel, left", "ünï"),
  })
  .map(({ shape, m, x, y, z, material, useMaterial, t, name }) => ({
    name,
    shape,
    mass:
      useMaterial && shape.kind !== "point" && shape.kind !== "custom"
        ? shape.kind === "cylinder"
          ? { kind: "material" as const, material }
          : { kind: "material" as const, material, thickness: t }
        : { kind: "given" as const, mass: m },
    x,
    y,
    z,
  }));

/** Any value a field accepts: within its declared range (open end respected), whole where it must be. */
export function inputArb(spec: InputSpec): fc.Arbitrary<number> {
  if (spec.integer) return fc.integer({ min: Math.ceil(spec.min + (spec.minOpen ? 1e-9 : 0)), max: Math.floor(spec.max) });
  return fc
    .double({ min: spec.min, max: spec.max, noNaN: true, noDefaultInfinity: true, minExcluded: spec.minOpen === true })
    .map((v) => (Object.is(v, -0) ? 0 : v));
}

/** Invalid numbers for a declared input: non-finite, below its range (−0 counts as 0), above it, or a fraction where a whole number is due. */
export function invalidInputArb(spec: InputSpec): fc.Arbitrary<number> {
  const options: fc.Arbitrary<number>[] = [
    fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY),
    // Filtered numerically: fast-check counts −0 as below 0, but −0 ≥ 0 is a valid input.
    fc.double({ max: spec.min, noNaN: true, noDefaultInfinity: true }).filter((v) => (spec.minOpen ? v <= spec.min : v < spec.min)),
    fc.double({ min: spec.max, noNaN: true, noDefaultInfinity: true }).filter((v) => v > spec.max),
  ];
  if (spec.integer) options.push(fc.double({ min: spec.min, max: spec.max, noNaN: true }).filter((v) => !Number.isInteger(v)));
  return fc.oneof(...options);
}

/** Fails unless every input of `specs` has a label, a URL key no other input uses, and a default inside its range. */
export function expectWellDeclared(specs: InputSpecs): void {
  const all = Object.values(specs);
  expect(new Set(all.map((s) => s.urlKey)).size).toBe(all.length);
  for (const spec of all) {
    expect(spec.label.length).toBeGreaterThan(0);
    expect(spec.default).toBeGreaterThanOrEqual(spec.min);
    expect(spec.default).toBeLessThanOrEqual(spec.max);
  }
}

/** Fails unless `run` throws a CalcInputError naming `param` whose message starts "<param> must be". */
export function expectParamError(run: () => unknown, param: string): void {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(CalcInputError);
    expect((error as CalcInputError).param).toBe(param);
    expect((error as CalcInputError).message.startsWith(`${param} must be`)).toBe(true);
    return;
  }
  throw new Error(`expected a CalcInputError naming ${param}`);
}

/** Arbitraries of the extra values calculators hold, by calculator id and value name. */
const EXTRAS: Record<string, Record<string, fc.Arbitrary<unknown>>> = {
  mass: {
    parts: fc.array(partArb, { minLength: 1, maxLength: 6 }),
    candidates: fc.array(fc.record({ x: coord, y: coord }), { maxLength: 4 }),
  },
  calibration: {
    rows: fc.array(
      fc.record({
        angularSpeed: fc.double({ min: 0, max: 1000, noNaN: true, noDefaultInfinity: true }).map((v) => (Object.is(v, -0) ? 0 : v)),
        acceleration: fc.double({ min: -1e4, max: 1e5, noNaN: true, noDefaultInfinity: true }).map((v) => (Object.is(v, -0) ? 0 : v)),
      }),
      { minLength: 0, maxLength: 12 },
    ),
  },
};

/** Any valid values of a calculator: each input in its range, each choice among its options, extras as declared above. */
export function valuesArb(calc: AnyCalculator): fc.Arbitrary<AnyValues> {
  const record: Record<string, fc.Arbitrary<unknown>> = {};
  for (const [name, spec] of Object.entries(calc.inputs)) record[name] = inputArb(spec);
  for (const [name, spec] of Object.entries(calc.choices)) record[name] = fc.constantFrom(...spec.options.map((o) => o.value));
  for (const name of Object.keys(calc.extras)) {
    const arb = EXTRAS[calc.id]?.[name];
    if (!arb) throw new Error(`no arbitrary for ${calc.id}.${name}: add one to tests/support/arbitraries.ts`);
    record[name] = arb;
  }
  return fc.record(record) as fc.Arbitrary<AnyValues>;
}
