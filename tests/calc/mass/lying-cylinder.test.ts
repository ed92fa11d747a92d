import { describe, expect, it } from "vitest";
import { checkPart, partMass, partOwnInertia, partVolume, type LayoutPart } from "../../../calc/mass/parts.ts";
import { encodeLayout, parseLayout } from "../../../calc/mass/layout-text.ts";
import { partOutline } from "../../../calc/mass/drawing.ts";
import { CalcInputError } from "../../../calc/core/errors.ts";

const lying = (radius: number, length: number, angle = 0, mass = 2): LayoutPart => ({
  name: "drive motor",
  shape: { kind: "lyingCylinder", radius, length, angle },
  mass: { kind: "given", mass },
  x: 0,
  y: 0.04,
  z: 0.0175,
});

describe("a cylinder lying in the spin plane: reference checks", () => {
  it.each([
    {
      source: "Web-Formulas, Moment of Inertia",
      locator: "cylinder about a diameter through its centre, MR²/4 + ML²/12",
      inputs: { mass: 2, radius: 0.05, length: 0.2 },
      // 2 × 0.05²/4 + 2 × 0.2²/12 = 0.00125 + 0.0066667, worked by hand from the formula.
      expected: 0.007916666667,
      rtol: 1e-9,
      note: "an exact formula: the tolerance only covers rounding in the last digit",
    },
    {
      source: "Web-Formulas, Moment of Inertia",
      locator: "the same formula as a rod (bar ML²/12) as R → 0",
      inputs: { mass: 1, radius: 1e-6, length: 0.3 },
      expected: 0.0075,
      rtol: 1e-9,
      note: "bar ML²/12 = 0.0075 kg·m²; the radius adds 2.5e-13",
    },
  ])("$source, $locator", ({ inputs, expected, rtol }) => {
    const I = partOwnInertia(lying(inputs.radius, inputs.length, 0.3, inputs.mass)).inertiaZ;
    expect(Math.abs(I - expected) / expected).toBeLessThanOrEqual(rtol);
  });
});

describe("a cylinder lying in the spin plane: behaviour", () => {
  it("gives a radially lying drive motor its true inertia, where a rod of its length gives 0.6 of it (the review's case)", () => {
    // Length about 2.12 radii: 3R² = (2/3)L², so L²/12 is 0.6 of (3R² + L²)/12.
    const radius = 0.014;
    const length = radius * Math.sqrt(4.5);
    const asCylinder = partOwnInertia(lying(radius, length, Math.PI / 2, 0.075)).inertiaZ;
    const asRod = partOwnInertia({ ...lying(radius, length, 0, 0.075), shape: { kind: "rod", length, angle: Math.PI / 2 } }).inertiaZ;
    expect(asRod / asCylinder).toBeCloseTo(0.6, 12);
  });

  it("has no products of inertia of its own, at any direction (its axis is horizontal)", () => {
    for (const angle of [0, 0.7, Math.PI / 2, -2]) expect(partOwnInertia(lying(0.01, 0.03, angle))).toMatchObject({ productXZ: 0, productYZ: 0 });
  });

  it("takes its volume from its own length (π R² L), ignoring a thickness", () => {
    const part: LayoutPart = { ...lying(0.01, 0.05), mass: { kind: "material", material: "al-6061-t6" } };
    expect(partVolume(part)).toBeCloseTo(Math.PI * 0.01 ** 2 * 0.05, 15);
    expect(partMass(part)).toBeGreaterThan(0);
  });

  it("is drawn from above as a rectangle, its length along its direction and its diameter across", () => {
    const o = partOutline({ ...lying(0.01, 0.04, Math.PI / 2), x: 0.1, y: 0 });
    expect(o.kind).toBe("polygon");
    const corners = (o as unknown as { corners: [number, number][] }).corners;
    expect(corners[0]![0]).toBeCloseTo(0.11, 12);
    expect(corners[0]![1]).toBeCloseTo(-0.02, 12);
  });

  it("round-trips through the layout text, and the text of older layouts still reads as before", () => {
    const parts = [
      lying(0.014, 0.03, Math.PI / 2, 0.075),
      { ...lying(0.01, 0.05, 0.25), mass: { kind: "material" as const, material: "al-6061-t6" as const } },
    ];
    const text = encodeLayout(parts);
    expect(text).toBe("v1~lcyl_drive%20motor_0_40_17.5_14_30_90_75~lcyl_drive%20motor_0_40_17.5_10_50_14.32394487827058_al-6061-t6");
    expect(parseLayout(text)).toMatchObject({ ok: true, parts });
    const old = "v1~disk_body_0_0_2_70_al-6061-t6_5~cyl_motor_0_40_17.5_14_25_75~pt_battery_15_0_12_280";
    expect(parseLayout(old)).toMatchObject({ ok: true, problems: [] });
    expect(parseLayout(old).parts.map((p) => p.shape.kind)).toEqual(["disk", "cylinder", "point"]);
  });

  it("names the dimension that is out of range", () => {
    for (const [shape, param] of [
      [{ kind: "lyingCylinder", radius: 0, length: 0.03, angle: 0 }, "part.shape.radius"],
      [{ kind: "lyingCylinder", radius: 0.01, length: -1, angle: 0 }, "part.shape.length"],
      [{ kind: "lyingCylinder", radius: 0.01, length: 0.03, angle: 100 }, "part.shape.angle"],
    ] as const) {
      let caught: unknown;
      try {
        checkPart({ ...lying(0.01, 0.03), shape });
      } catch (error) {
        caught = error;
      }
      expect(caught).toBeInstanceOf(CalcInputError);
      expect((caught as CalcInputError).param).toBe(param);
    }
  });
});
