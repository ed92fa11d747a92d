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

// ---------------------------------------------------------------------------------------------
// The calc contract at the extremes (tests/calc/contract.test.ts): calls built from a valid one by
// putting extreme doubles, null or undefined, or an unknown option in a few of its places.

/** Doubles at the edges of the format: ±0, the subnormals, the normal floor, ±1e±300, ±Number.MAX_VALUE, 2^53. */
export const EXTREME_DOUBLES: readonly number[] = [
  0,
  -0,
  Number.MIN_VALUE,
  -Number.MIN_VALUE,
  2.2250738585072014e-308,
  1e-300,
  -1e-300,
  1e-150,
  1e-15,
  0.5,
  1,
  -1,
  2 ** 53,
  1e15,
  1e150,
  1e300,
  -1e300,
  Number.MAX_VALUE,
  -Number.MAX_VALUE,
];

/** Any finite double, with the edges of the format (and `extra`, e.g. the ends of declared ranges) drawn often. */
export function extremeDoubleArb(extra: readonly number[] = []): fc.Arbitrary<number> {
  return fc.oneof(
    { weight: 2, arbitrary: fc.constantFrom(...EXTREME_DOUBLES, ...extra) },
    { weight: 2, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
    // Sizes a robot has, and their negatives: an extreme in one place beside ordinary values elsewhere.
    { weight: 1, arbitrary: fc.double({ min: -1e4, max: 1e4, noNaN: true, noDefaultInfinity: true }) },
  );
}

/** A place in an argument list: argument index, then keys and indices. */
export type CallPath = readonly (string | number)[];

/** Every place of `value` (itself included) as paths, with what is there; code paths (prefixes of `code`) are not entered. */
function placesOf(value: unknown, path: CallPath, code: ReadonlySet<string>, out: { path: CallPath; value: unknown }[]): void {
  out.push({ path, value });
  if (code.has(path.join("."))) return;
  if (Array.isArray(value)) for (const [i, v] of value.entries()) placesOf(v, [...path, i], code, out);
  else if (isPlainObject(value)) for (const [k, v] of Object.entries(value)) placesOf(v, [...path, k], code, out);
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  if (value === null || typeof value !== "object") return false;
  const proto = Object.getPrototypeOf(value);
  return proto === Object.prototype || proto === null;
}

/** A copy of arrays and plain objects (frozen or not); anything else (functions, descriptors, typed arrays) is shared. */
export function copyCall<T>(value: T): T {
  if (Array.isArray(value)) return value.map(copyCall) as T;
  if (isPlainObject(value)) return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, copyCall(v)])) as T;
  return value;
}

function setAt(root: unknown[], path: CallPath, value: unknown): void {
  let node = root as unknown as Record<string | number, unknown>;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  node[path[path.length - 1]!] = value;
}

/** One change to a call: a number replaced, a place emptied, an option or unit replaced by an unknown one, or no arguments at all. */
export type Mutation =
  | { kind: "number"; pick: number; value: number }
  | { kind: "scale"; pick: number; value: number }
  | { kind: "empty"; pick: number; value: null | undefined }
  | { kind: "text"; pick: number; value: string }
  | { kind: "no-arguments" };

/** Applies `mutations` to a copy of `args`; a mutation with no place of its kind to go is skipped. */
export function mutateCall(args: readonly unknown[], mutations: readonly Mutation[], code: ReadonlySet<string> = new Set()): unknown[] {
  let out = copyCall([...args]);
  for (const m of mutations) {
    if (m.kind === "no-arguments") {
      out = [];
      continue;
    }
    const places: { path: CallPath; value: unknown }[] = [];
    for (const [i, arg] of out.entries()) placesOf(arg, [i], code, places);
    const numeric = m.kind === "number" || m.kind === "scale";
    const eligible = places.filter((p) => (numeric ? typeof p.value === "number" : m.kind === "text" ? typeof p.value === "string" : true));
    if (eligible.length === 0) continue;
    const place = eligible[m.pick % eligible.length]!;
    const value = m.kind === "scale" ? (place.value as number) * m.value : m.value;
    // A scaled extreme may leave the doubles: the calls stay finite, as the contract's inputs are.
    if (typeof value !== "number" || Number.isFinite(value)) setAt(out, place.path, value);
  }
  return out;
}

/**
 * One to three mutations, numbers most often (`extra`: doubles to draw often, such as declared range
 * ends); a number scaled by a modest factor keeps most calls valid, so the deeper paths run too.
 */
export function mutationsArb(extra: readonly number[] = []): fc.Arbitrary<Mutation[]> {
  const pick = fc.nat({ max: 1 << 20 });
  const mutation: fc.Arbitrary<Mutation> = fc.oneof(
    { weight: 12, arbitrary: fc.record({ kind: fc.constant("number" as const), pick, value: extremeDoubleArb(extra) }) },
    { weight: 4, arbitrary: fc.record({ kind: fc.constant("scale" as const), pick, value: fc.constantFrom(0, 0.1, 0.5, 0.9, 1.1, 2, 10) }) },
    { weight: 3, arbitrary: fc.record({ kind: fc.constant("empty" as const), pick, value: fc.constantFrom(null, undefined) }) },
    { weight: 2, arbitrary: fc.record({ kind: fc.constant("text" as const), pick, value: fc.constantFrom("no-such-option", "", "__proto__", "toString") }) },
    { weight: 1, arbitrary: fc.constant({ kind: "no-arguments" as const }) },
  );
  return fc.array(mutation, { minLength: 1, maxLength: 3 });
}

/** Where a result holds a number that is not finite ("minRadius", "series[3].speed"), or null when every number in it is finite. */
export function nonFinitePlace(value: unknown, path = "", seen = new Set<unknown>()): string | null {
  if (typeof value === "number") return Number.isFinite(value) ? null : path || "(the result)";
  if (typeof value === "bigint" || value === null || typeof value !== "object") return null;
  if (seen.has(value)) return null;
  seen.add(value);
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    const list = value as unknown as ArrayLike<number>;
    for (let i = 0; i < list.length; i++) if (typeof list[i] === "number" && !Number.isFinite(list[i])) return `${path}[${i}]`;
    return null;
  }
  if (value instanceof Map) {
    for (const [k, v] of value) {
      const found = nonFinitePlace(v, `${path}.get(${String(k)})`, seen);
      if (found) return found;
    }
    return null;
  }
  const entries = Array.isArray(value)
    ? value.map((v, i) => [`[${i}]`, v] as const)
    : Object.entries(value).map(([k, v]) => [`${path ? "." : ""}${k}`, v] as const);
  for (const [key, v] of entries) {
    const found = nonFinitePlace(v, `${path}${key}`, seen);
    if (found) return found;
  }
  return null;
}
