/**
 * What `checkPart` refuses, field by field: each refusal names the part's field by its path, with
 * its SI unit, so a page can put the message beside that field (calc/mass/part-messages.ts words it).
 */
import { describe, expect, it } from "vitest";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { checkPart, directionOf, type LayoutPart, MAX_NAME_LENGTH, ownInertiaOf, partVolume } from "../../../calc/mass/parts.ts";
import { refusal as thrown } from "../../support/refusal.ts";

const given = { kind: "given", mass: 0.1 } as const;
const part = (shape: object, mass: object = given, extra: object = {}) => ({ name: "p", shape, mass, x: 0, y: 0, z: 0, ...extra }) as unknown as LayoutPart;

/** The refusal `checkPart` throws for a part, as [param, unit, expected]. */
function refusal(p: unknown): [string, string, string] {
  try {
    checkPart(p as LayoutPart);
  } catch (error) {
    if (error instanceof CalcInputError) return [error.param, error.unit, error.expected];
    throw error;
  }
  throw new Error("accepted");
}

describe("checkPart names the field it refuses", () => {
  it.each([
    ["disk", { kind: "disk", radius: -1 }, "radius", "m"],
    ["ring", { kind: "ring", radius: 0 }, "radius", "m"],
    ["annulus inner", { kind: "annulus", innerRadius: -0.01, outerRadius: 0.02 }, "innerRadius", "m"],
    ["annulus outer", { kind: "annulus", innerRadius: 0.01, outerRadius: -0.02 }, "outerRadius", "m"],
    ["annulus order", { kind: "annulus", innerRadius: 0.03, outerRadius: 0.02 }, "innerRadius", "m"],
    ["plate length", { kind: "plate", length: 0, width: 0.02, angle: 0 }, "length", "m"],
    ["plate width", { kind: "plate", length: 0.04, width: 0, angle: 0 }, "width", "m"],
    ["plate angle", { kind: "plate", length: 0.04, width: 0.02, angle: 20 }, "angle", "rad"],
    ["rod length", { kind: "rod", length: -1, angle: 0 }, "length", "m"],
    ["rod angle", { kind: "rod", length: 0.05, angle: Number.NaN }, "angle", "rad"],
    ["cylinder radius", { kind: "cylinder", radius: 0, height: 0.02 }, "radius", "m"],
    ["cylinder height", { kind: "cylinder", radius: 0.02, height: 0 }, "height", "m"],
    ["lying cylinder angle", { kind: "lyingCylinder", radius: 0.01, length: 0.05, angle: 100 }, "angle", "rad"],
    ["custom inertia", { kind: "custom", inertiaZ: -1, productXZ: 0, productYZ: 0 }, "inertiaZ", "kg·m²"],
    ["custom product xz", { kind: "custom", inertiaZ: 1e-4, productXZ: 1e7, productYZ: 0 }, "productXZ", "kg·m²"],
    ["custom product yz", { kind: "custom", inertiaZ: 1e-4, productXZ: 0, productYZ: Number.NaN }, "productYZ", "kg·m²"],
  ])("%s", (_, shape, field, unit) => {
    const [param, got] = refusal(part(shape));
    expect([param, got]).toEqual([`part.shape.${field}`, unit]);
  });

  it("refuses what is not a part, a name too long, and a shape it does not know", () => {
    expect(refusal(null)).toEqual(["part", "", "a part object"]);
    expect(refusal(part({ kind: "point" }, given, { name: "n".repeat(MAX_NAME_LENGTH + 1) }))).toEqual([
      "part.name",
      "",
      `text of at most ${MAX_NAME_LENGTH} characters`,
    ]);
    expect(() => checkPart(part({ kind: "point" }, given, { name: "n".repeat(MAX_NAME_LENGTH) }))).not.toThrow();
    const [param, unit, expected] = refusal(part({ kind: "blob" }));
    expect([param, unit]).toEqual(["part.shape.kind", ""]);
    expect(expected).toMatch(/^one of point, disk, .*custom/);
  });

  it("asks a material part for a known material, a shape with a volume and its thickness", () => {
    const al = (extra: object = {}) => ({ kind: "material", material: "al-6061-t6", ...extra });
    expect(refusal(part({ kind: "disk", radius: 0.05 }, al({ material: "mithril", thickness: 0.003 })))).toEqual([
      "part.mass.material",
      "",
      "a material of the materials table",
    ]);
    expect(refusal(part({ kind: "point" }, al()))).toEqual(["part.mass.kind", "", '"given" for a point part (it has no volume)']);
    expect(refusal(part({ kind: "custom", inertiaZ: 1e-4, productXZ: 0, productYZ: 0 }, al()))).toEqual([
      "part.mass.kind",
      "",
      '"given" for a custom part (it has no volume)',
    ]);
    expect(refusal(part({ kind: "disk", radius: 0.05 }, al()))).toEqual([
      "part.mass.thickness",
      "",
      "a thickness (disk, annulus, plate) or section diameter (ring, rod) greater than 0 m",
    ]);
    // A missing thickness is reported as missing (the parts editor then says "is missing"), not as a number.
    expect(() => checkPart(part({ kind: "disk", radius: 0.05 }, al()))).toThrow(
      'part.mass.thickness must be a thickness (disk, annulus, plate) or section diameter (ring, rod) greater than 0 m (got "missing")',
    );
    expect(refusal(part({ kind: "disk", radius: 0.05 }, al({ thickness: -0.001 })))[0]).toBe("part.mass.thickness");
    // A cylinder's material needs no thickness: its height is in its shape.
    expect(() => checkPart(part({ kind: "cylinder", radius: 0.01, height: 0.02 }, al()))).not.toThrow();
    expect(refusal(part({ kind: "point" }, { kind: "weighed" }))).toEqual(["part.mass.kind", "", '"given" or "material"']);
  });

  it("names the smallest dimension when a material part's volume underflows to nothing", () => {
    const al = { kind: "material", material: "al-6061-t6", thickness: 1e-200 };
    // Equally small: the first in the part's order, its shape before its thickness.
    expect(refusal(part({ kind: "disk", radius: 1e-200 }, al))[0]).toBe("part.shape.radius");
    expect(refusal(part({ kind: "plate", length: 0.05, width: 1e-200, angle: 0 }, al))[0]).toBe("part.shape.width");
    expect(refusal(part({ kind: "plate", length: 0.05, width: 0.05, angle: 0 }, { ...al, thickness: 1e-322 }))).toEqual([
      "part.mass.thickness",
      "m",
      "large enough for the part's volume, and so its mass, to be greater than 0",
    ]);
    expect(refusal(part({ kind: "plate", length: 1e-322, width: 0.05, angle: 0 }, { ...al, thickness: 0.003 }))[0]).toBe("part.shape.length");
  });

  it("gives a volume only for a material part", () => {
    expect(
      partVolume(part({ kind: "plate", length: 0.04, width: 0.02, angle: 0 }, { kind: "material", material: "al-6061-t6", thickness: 0.005 })),
    ).toBeCloseTo(0.04 * 0.02 * 0.005, 15);
    expect(() => partVolume(part({ kind: "point" }))).toThrow('part.mass.kind must be "material" (a given mass has no volume here) (got "given")');
    expect(thrown(() => partVolume(part({ kind: "disk", radius: 0.05 }))).unit).toBe("");
  });
});

describe("the functions behind the layout's mass properties name what they refuse", () => {
  it("a part's own inertia: a negative mass in kg, a bad shape as the part's, an overflow by the mass", () => {
    expect(thrown(() => ownInertiaOf({ kind: "disk", radius: 0.05 }, -1)).message).toBe("m must be 0 kg or more (got -1 kg)");
    expect(thrown(() => ownInertiaOf({ kind: "disk", radius: -0.05 }, 1)).param).toBe("part.shape.radius");
    // ½·m·R² = ½ × 10³⁰⁸ kg × (2 m)² = 2 × 10³⁰⁸ kg·m², past the largest double (1.8 × 10³⁰⁸).
    expect(thrown(() => ownInertiaOf({ kind: "disk", radius: 2 }, 1e308)).message).toBe(
      "m must be small enough for the own inertia to stay finite (got 1e+308 kg)",
    );
  });

  it("a direction: each component of the vector by its name, with no unit (any plan vector)", () => {
    const vx = thrown(() => directionOf(Number.NaN, 1));
    expect([vx.param, vx.unit]).toEqual(["vx", ""]);
    const vy = thrown(() => directionOf(1, Number.POSITIVE_INFINITY));
    expect([vy.param, vy.unit]).toEqual(["vy", ""]);
  });

  it("a direction along +x is 0, never −0, and along −x π, never −π", () => {
    // atan2(−0, 1) = −0 and atan2(−0, −1) = −π (IEEE 754 atan2 of a signed zero).
    expect(Object.is(directionOf(1, -0), 0)).toBe(true);
    expect(directionOf(-1, -0)).toBe(Math.PI);
  });
});
