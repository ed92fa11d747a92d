/**
 * Editing the parts list (calc/mass/editing.ts): which input a refusal names, in which words, and
 * how a mirror image turns each shape. Mirror images by hand: across the x axis a direction θ
 * becomes −θ, across the y axis π − θ, through the origin θ + π, each kept in (−π, π].
 */
import { describe, expect, it } from "vitest";
import { addMirrorCopy, addPart, duplicatePart, mirrorPart, mirrorPartInList, movePart, removePart, suffixedName } from "../../../calc/mass/editing.ts";
import { MAX_NAME_LENGTH, type LayoutPart, type PartShape } from "../../../calc/mass/parts.ts";
import { refusal } from "../../support/refusal.ts";

const part = (shape: PartShape, name = "p", x = 0.03, y = 0.04): LayoutPart => ({ name, shape, mass: { kind: "given", mass: 0.1 }, x, y, z: 0.01 });
const dot = (name: string) => part({ kind: "point" }, name);
const list = Object.freeze([dot("a"), dot("b"), dot("c")]);
const bad = part({ kind: "annulus", innerRadius: 0.06, outerRadius: 0.05 }, "bad");

describe("refusals of the list editing functions", () => {
  it("names the index it refuses and the range it takes, whatever the edit", () => {
    expect(refusal(() => removePart(list, 3)).message).toBe("index must be a whole number from 0 to 2 (got 3)");
    expect(refusal(() => duplicatePart(list, -1)).message).toBe("index must be a whole number from 0 to 2 (got -1)");
    expect(refusal(() => mirrorPartInList(list, 1.5, "x")).message).toBe("index must be a whole number from 0 to 2 (got 1.5)");
    expect(refusal(() => addMirrorCopy(list, 3, "x")).message).toBe("index must be a whole number from 0 to 2 (got 3)");
    // A new part may also go at the end: 0 … 3 in a list of three.
    expect(refusal(() => addPart(list, dot("d"), 4)).message).toBe("index must be a whole number from 0 to 3 (got 4)");
    expect(refusal(() => movePart(list, 3, 0)).message).toBe("from must be a whole number from 0 to 2 (got 3)");
    expect(refusal(() => movePart(list, 0, 3)).message).toBe("to must be a whole number from 0 to 2 (got 3)");
  });

  it("takes index 0 as the only place in a list of one, and says an empty list has no index", () => {
    expect(refusal(() => removePart([dot("a")], 1)).message).toBe("index must be a whole number from 0 to 0 (got 1)");
    expect(refusal(() => addPart([], dot("a"), 1)).message).toBe("index must be a whole number from 0 to 0 (got 1)");
    expect(addPart([], dot("a"), 0).map((p) => p.name)).toEqual(["a"]);
    const empty = refusal(() => removePart([], 0));
    expect(empty.message).toBe("index must be an index into a non-empty list (got 0)");
    expect(empty.unit).toBe("");
  });

  it('names a list that is not a list "parts"', () => {
    const notList = "a,b" as never;
    for (const run of [
      () => addPart(notList, dot("a")),
      () => duplicatePart(notList, 0),
      () => removePart(notList, 0),
      () => movePart(notList, 0, 0),
      () => mirrorPartInList(notList, 0, "x"),
      () => addMirrorCopy(notList, 0, "x"),
    ]) {
      expect(refusal(run).message).toBe('parts must be a list (got "a,b")');
    }
  });

  it("checks a part before adding it, naming it as the new part, and a part it copies by its place in the list", () => {
    expect(refusal(() => addPart(list, bad)).param).toBe("part.shape.innerRadius");
    expect(refusal(() => duplicatePart([dot("a"), bad], 1)).message).toBe("parts[1].shape.innerRadius must be less than outerRadius (0.05 m) (got 0.06 m)");
  });

  it('refuses a mirror line other than "x", "y" or "origin" by the name "axis", with no unit', () => {
    const e = refusal(() => mirrorPart(dot("a"), "z" as never));
    expect(e.param).toBe("axis");
    expect(e.unit).toBe("");
  });
});

describe("a name with a suffix", () => {
  it(`keeps the whole within ${MAX_NAME_LENGTH} characters, a suffix of exactly that length included`, () => {
    expect(suffixedName("washer", " (copy)")).toBe("washer (copy)");
    const longest = "s".repeat(MAX_NAME_LENGTH);
    expect(suffixedName("washer", longest)).toBe(longest);
  });

  it("refuses a name that is not text, and a suffix that is not text or too long, naming which, with no unit", () => {
    const name = refusal(() => suffixedName(42 as never, " (copy)"));
    expect(name.message).toBe('name must be text (got "42")');
    expect(name.param).toBe("name");
    expect(name.unit).toBe("");
    const long = refusal(() => suffixedName("washer", "s".repeat(MAX_NAME_LENGTH + 1)));
    expect(long.param).toBe("suffix");
    expect(long.message).toMatch(/^suffix must be text of at most 60 characters \(got "s{40}…"\)$/);
    expect(long.unit).toBe("");
    expect(refusal(() => suffixedName("washer", 7 as never)).message).toBe('suffix must be text of at most 60 characters (got "7")');
  });
});

describe("mirror images of each shape", () => {
  it("turns a rod's direction like a plate's", () => {
    const rod = part({ kind: "rod", length: 0.1, angle: Math.PI / 6 });
    // Across x: π/6 → −π/6; across y: π − π/6 = 5π/6; through the origin: π/6 + π = 7π/6 ≡ −5π/6.
    expect((mirrorPart(rod, "x").shape as { angle: number }).angle).toBeCloseTo(-Math.PI / 6, 15);
    expect((mirrorPart(rod, "y").shape as { angle: number }).angle).toBeCloseTo((5 * Math.PI) / 6, 15);
    expect((mirrorPart(rod, "origin").shape as { angle: number }).angle).toBeCloseTo((-5 * Math.PI) / 6, 15);
  });

  it("turns a plate along x half a turn to π, the top of the range (−π, π], not to −π", () => {
    const plate = part({ kind: "plate", length: 0.06, width: 0.02, angle: 0 });
    expect((mirrorPart(plate, "origin").shape as { angle: number }).angle).toBe(Math.PI);
    expect((mirrorPart(plate, "y").shape as { angle: number }).angle).toBe(Math.PI);
  });

  it("leaves round shapes, points and upright cylinders exactly as they are, moving only their place", () => {
    const shapes: PartShape[] = [
      { kind: "point" },
      { kind: "disk", radius: 0.05 },
      { kind: "ring", radius: 0.05 },
      { kind: "annulus", innerRadius: 0.03, outerRadius: 0.05 },
      { kind: "cylinder", radius: 0.01, height: 0.02 },
    ];
    for (const shape of shapes) {
      for (const axis of ["x", "y", "origin"] as const) {
        expect(mirrorPart(part(shape), axis).shape).toStrictEqual(shape);
      }
    }
    expect(mirrorPart(part({ kind: "disk", radius: 0.05 }), "x")).toMatchObject({ x: 0.03, y: -0.04, z: 0.01 });
  });
});
