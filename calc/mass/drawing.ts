import { type LayoutPart, checkPart } from "./parts.ts";
import { massProperties } from "./properties.ts";

// ---------------------------------------------------------------------------------------------
// Top-view drawing data (pure geometry in metres; the widget turns it into SVG).

export type Point2 = readonly [number, number];

/** A part's outline in the xy plane. */
export type PartOutline =
  | { kind: "point"; centre: Point2 }
  | { kind: "circle"; centre: Point2; radius: number }
  | { kind: "hoop"; centre: Point2; radius: number }
  | { kind: "annulus"; centre: Point2; innerRadius: number; outerRadius: number }
  | { kind: "polygon"; centre: Point2; corners: readonly Point2[] }
  | { kind: "segment"; centre: Point2; from: Point2; to: Point2 };

/**
 * The outline of one part seen from above: a circle for a disk or cylinder, a hoop for a thin
 * ring, inner and outer circles for an annulus, the four rotated corners of a plate
 * (counter-clockwise; a lying cylinder's too, length along its axis and width its diameter), the
 * end points of a rod, and a marker for point and custom parts.
 *
 * @param part the part (checked)
 * @returns the outline [m]
 *
 * A 40 × 20 mm plate at (100, 0) mm turned 90° has corners (110, −20), (110, 20), (90, 20), (90, −20) mm.
 * @example
 * partOutline({ name: "plate", shape: { kind: "plate", length: 0.04, width: 0.02, angle: Math.PI / 2 }, mass: { kind: "given", mass: 0.1 }, x: 0.1, y: 0, z: 0 }).corners[0][0] // → 0.11 [m]
 * partOutline({ name: "plate", shape: { kind: "plate", length: 0.04, width: 0.02, angle: Math.PI / 2 }, mass: { kind: "given", mass: 0.1 }, x: 0.1, y: 0, z: 0 }).corners[0][1] // → -0.02 [m]
 * Sources: none (plane geometry, no formula).
 */
export function partOutline(part: LayoutPart): PartOutline {
  checkPart(part);
  const centre: Point2 = [part.x, part.y];
  const s = part.shape;
  switch (s.kind) {
    case "point":
    case "custom":
      return { kind: "point", centre };
    case "disk":
    case "cylinder":
      return { kind: "circle", centre, radius: s.radius };
    case "ring":
      return { kind: "hoop", centre, radius: s.radius };
    case "annulus":
      return { kind: "annulus", centre, innerRadius: s.innerRadius, outerRadius: s.outerRadius };
    case "plate":
    case "lyingCylinder": {
      const c = Math.cos(s.angle);
      const n = Math.sin(s.angle);
      const hl = s.length / 2;
      const hw = s.kind === "plate" ? s.width / 2 : s.radius;
      const corner = (u: number, v: number): Point2 => [part.x + u * c - v * n, part.y + u * n + v * c];
      return { kind: "polygon", centre, corners: [corner(-hl, -hw), corner(hl, -hw), corner(hl, hw), corner(-hl, hw)] };
    }
    case "rod": {
      const dx = (s.length / 2) * Math.cos(s.angle);
      const dy = (s.length / 2) * Math.sin(s.angle);
      return { kind: "segment", centre, from: [part.x - dx, part.y - dy], to: [part.x + dx, part.y + dy] };
    }
  }
}

export interface LayoutDrawing {
  /** One outline per part, in list order. */
  outlines: readonly { index: number; name: string; outline: PartOutline }[];
  /** The centre of mass in plan [m]. */
  centreOfMass: Point2;
  /** The geometric centre (always the origin). */
  geometricCentre: Point2;
  /** Box holding every outline and both centres [m]. */
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
}

function outlineExtent(o: PartOutline): Point2[] {
  switch (o.kind) {
    case "point":
      return [o.centre];
    case "circle":
    case "hoop":
      return [
        [o.centre[0] - o.radius, o.centre[1] - o.radius],
        [o.centre[0] + o.radius, o.centre[1] + o.radius],
      ];
    case "annulus":
      return [
        [o.centre[0] - o.outerRadius, o.centre[1] - o.outerRadius],
        [o.centre[0] + o.outerRadius, o.centre[1] + o.outerRadius],
      ];
    case "polygon":
      return [...o.corners];
    case "segment":
      return [o.from, o.to];
  }
}

/**
 * Everything a top-view drawing of the layout needs: outlines, both centres and a bounding box.
 *
 * @param parts the parts list (checked)
 * @returns outlines and bounds [m]
 *
 * Sources: centre-of-mass (for the marked centre).
 */
export function layoutDrawing(parts: readonly LayoutPart[]): LayoutDrawing {
  const props = massProperties(parts);
  const outlines = parts.map((part, index) => ({ index, name: part.name, outline: partOutline(part) }));
  const points: Point2[] = [[0, 0], [props.centreX, props.centreY], ...outlines.flatMap((o) => outlineExtent(o.outline))];
  return {
    outlines,
    centreOfMass: [props.centreX, props.centreY],
    geometricCentre: [0, 0],
    bounds: {
      minX: Math.min(...points.map((p) => p[0])),
      minY: Math.min(...points.map((p) => p[1])),
      maxX: Math.max(...points.map((p) => p[0])),
      maxY: Math.max(...points.map((p) => p[1])),
    },
  };
}
