/**
 * Top-view drawing data (calc/mass/drawing.ts): a plate's corners at a general angle, and the box
 * that holds every outline, both centres and nothing more. Every expected value is worked by hand
 * from plane geometry in the comments (cos 30° = √3/2 ≈ 0.866 025 404, sin 30° = 1/2).
 */
import { describe, expect, it } from "vitest";
import { type LayoutDrawing, layoutDrawing, partOutline } from "../../../calc/mass/drawing.ts";
import type { LayoutPart, PartShape } from "../../../calc/mass/parts.ts";

const part = (shape: PartShape, x: number, y: number, mass = 0.1): LayoutPart => ({ name: "p", shape, mass: { kind: "given", mass }, x, y, z: 0 });
const COS30 = Math.sqrt(3) / 2;

function expectPoints(actual: readonly (readonly [number, number])[], expected: readonly (readonly [number, number])[]): void {
  expect(actual).toHaveLength(expected.length);
  actual.forEach(([x, y], i) => {
    expect(x).toBeCloseTo(expected[i]![0], 14);
    expect(y).toBeCloseTo(expected[i]![1], 14);
  });
}

function expectBounds(d: LayoutDrawing, minX: number, minY: number, maxX: number, maxY: number): void {
  expect(d.bounds.minX).toBeCloseTo(minX, 14);
  expect(d.bounds.minY).toBeCloseTo(minY, 14);
  expect(d.bounds.maxX).toBeCloseTo(maxX, 14);
  expect(d.bounds.maxY).toBeCloseTo(maxY, 14);
}

// A 40 × 20 mm plate centred at (100, 0) mm, turned 30°: half-length 20 mm along (cos 30°, sin 30°),
// half-width 10 mm along (−sin 30°, cos 30°). Corner (u, v) = centre + u·(c, s) + v·(−s, c):
//   (−20, −10): x = 100 − 17.320 508 + 5 = 87.679 492,  y = −10 − 8.660 254 = −18.660 254
//   ( 20, −10): x = 100 + 17.320 508 + 5 = 122.320 508, y = 10 − 8.660 254 = 1.339 746
//   ( 20,  10): x = 100 + 17.320 508 − 5 = 112.320 508, y = 10 + 8.660 254 = 18.660 254
//   (−20,  10): x = 100 − 17.320 508 − 5 = 77.679 492,  y = −10 + 8.660 254 = −1.339 746
const TURNED_CORNERS = [
  [0.1 - 0.02 * COS30 + 0.005, -0.01 - 0.01 * COS30],
  [0.1 + 0.02 * COS30 + 0.005, 0.01 - 0.01 * COS30],
  [0.1 + 0.02 * COS30 - 0.005, 0.01 + 0.01 * COS30],
  [0.1 - 0.02 * COS30 - 0.005, -0.01 + 0.01 * COS30],
] as const;

describe("outlines at a general angle", () => {
  it("turns a plate's corners counter-clockwise about its centre", () => {
    const o = partOutline(part({ kind: "plate", length: 0.04, width: 0.02, angle: Math.PI / 6 }, 0.1, 0));
    expect(o.kind).toBe("polygon");
    expectPoints((o as { corners: readonly (readonly [number, number])[] }).corners, TURNED_CORNERS);
  });

  it("draws a lying cylinder as the plate of its length and diameter", () => {
    const o = partOutline(part({ kind: "lyingCylinder", radius: 0.01, length: 0.04, angle: Math.PI / 6 }, 0.1, 0));
    expectPoints((o as { corners: readonly (readonly [number, number])[] }).corners, TURNED_CORNERS);
  });
});

describe("the drawing's box", () => {
  it("holds point parts by their centres", () => {
    // Equal masses at (100, 20) and (−100, −20) mm: centre of mass at the origin, box from the parts alone.
    expectBounds(layoutDrawing([part({ kind: "point" }, 0.1, 0.02), part({ kind: "point" }, -0.1, -0.02)]), -0.1, -0.02, 0.1, 0.02);
  });

  it("holds a hoop, a disk and an annulus by their outer radius", () => {
    // Radius 50 mm about (10, 20) mm: x from −40 to 60 mm, y from −30 to 70 mm.
    for (const shape of [
      { kind: "ring", radius: 0.05 },
      { kind: "disk", radius: 0.05 },
      { kind: "annulus", innerRadius: 0.03, outerRadius: 0.05 },
    ] as const) {
      expectBounds(layoutDrawing([part(shape, 0.01, 0.02)]), -0.04, -0.03, 0.06, 0.07);
    }
  });

  it("holds a turned plate by its corners, and the origin with it", () => {
    // Corners above: x up to 122.320 508 mm, y from −18.660 254 to 18.660 254 mm; the origin sets minX = 0.
    expectBounds(
      layoutDrawing([part({ kind: "plate", length: 0.04, width: 0.02, angle: Math.PI / 6 }, 0.1, 0)]),
      0,
      -0.01 - 0.01 * COS30,
      0.1 + 0.02 * COS30 + 0.005,
      0.01 + 0.01 * COS30,
    );
  });

  it("holds a rod by its end points", () => {
    // 100 mm at 60° about (−20, 30) mm: half-length 50 mm → (25, 43.301 270) mm each way;
    // ends (−45, −13.301 270) and (5, 73.301 270) mm.
    const d = layoutDrawing([part({ kind: "rod", length: 0.1, angle: Math.PI / 3 }, -0.02, 0.03)]);
    expectBounds(d, -0.045, 0.03 - 0.05 * COS30, 0.005, 0.03 + 0.05 * COS30);
    expect(d.centreOfMass).toEqual([-0.02, 0.03]);
    expect(d.geometricCentre).toEqual([0, 0]);
  });
});
