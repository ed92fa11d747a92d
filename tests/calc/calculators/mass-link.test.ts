/**
 * The mass-layout calculator's link values (calc/calculators/mass.ts): the parts list ("l") and the
 * mounting points ("pts") read back from a link or a stored design, and the notice a user sees when
 * part of a link cannot be read. The layouts are invented.
 */
import { describe, expect, it } from "vitest";
import { form } from "../../../calc/calculators/mass.ts";
import { MAX_PARTS } from "../../../calc/mass/parts.ts";

const { parts, candidates } = form.extras;
const HUB_AND_LUG = "v1~pt_hub_0_0_0_990~pt_lug_5_0_0_10"; // 990 g on the axis, 10 g at x = 5 mm
const lug = { name: "lug", shape: { kind: "point" }, mass: { kind: "given", mass: 0.01 }, x: 0.005, y: 0, z: 0 };

describe("the parts list in a link", () => {
  it("reads a whole layout with no notice, and writes it back the same", () => {
    const read = parts.read(HUB_AND_LUG, "metric");
    expect(read.notices).toEqual([]);
    expect(read.value).toHaveLength(2);
    expect(read.value![1]).toEqual(lug);
    expect(parts.write(read.value!, "metric")).toBe(HUB_AND_LUG);
  });

  it("shows the example layout when the text cannot be read at all, and says why", () => {
    expect(parts.read("v9~x", "metric")).toEqual({
      value: null,
      notices: ["The parts list in the link could not be read (version 9 is not known; this reader understands v1); the example layout is shown."],
    });
  });

  it("keeps the readable parts and names the part (counted from 1) that was left out", () => {
    const read = parts.read(`${HUB_AND_LUG}~bad_part`, "metric");
    expect(read.value).toHaveLength(2);
    expect(read.notices).toEqual([
      'Part 3 of the link\'s parts list was left out: unknown shape "bad"; use one of pt, disk, ring, ann, plate, rod, cyl, lcyl, cust.',
    ]);
  });

  it("keeps the first parts of a list that is too long, and says the readable parts were kept", () => {
    const read = parts.read(`v1${"~pt_p_0_0_0_10".repeat(MAX_PARTS + 1)}`, "metric");
    expect(read.value).toHaveLength(MAX_PARTS);
    expect(read.notices).toEqual([
      `The parts list in the link could not be read (only the first ${MAX_PARTS} parts are read (got ${MAX_PARTS + 1})); the readable parts were kept.`,
    ]);
  });
});

describe("the parts list in a link, when nothing readable is left", () => {
  it("gives an empty list, not the example layout, when only parts (not the text) were unreadable", () => {
    const read = parts.read("v1~bad_part", "metric");
    expect(read.value).toEqual([]);
    expect(read.notices).toHaveLength(1);
  });

  it("shows the example layout when the list is too long and none of its parts can be read", () => {
    const read = parts.read(`v1${"~bad_part".repeat(MAX_PARTS + 1)}`, "metric");
    expect(read.value).toBeNull();
    expect(read.notices[0]).toBe(
      `The parts list in the link could not be read (only the first ${MAX_PARTS} parts are read (got ${MAX_PARTS + 1})); the example layout is shown.`,
    );
  });
});

describe("the mounting points in a link and in a stored design", () => {
  it("reads no points from an empty or blank value, without a notice", () => {
    expect(candidates.read("", "metric")).toEqual({ value: [], notices: [] });
    expect(candidates.read("  ", "metric")).toEqual({ value: [], notices: [] });
  });

  it("reads points in mm and writes them back", () => {
    expect(candidates.read("55mm,0mm;0mm,55mm", "metric")).toEqual({
      value: [
        { x: 0.055, y: 0 },
        { x: 0, y: 0.055 },
      ],
      notices: [],
    });
    expect(candidates.write([{ x: 0.055, y: 0 }], "metric")).toBe("55mm,0mm");
  });

  it("ignores unreadable points with a notice that says why", () => {
    const read = candidates.read("nonsense", "metric");
    expect(read.value).toBeNull();
    expect(read.notices).toEqual([
      "The link's mounting points were ignored: Point 1 must be two coordinates, x and y, separated by a comma (Coordinate must start with a number, e.g. 32 mm; allowed: between -2000 mm and 2000 mm).",
    ]);
  });

  it("reads a design's stored points, and names the problem of a value that is not a list of points", () => {
    const fromDesign = candidates.fromDesign!;
    expect(fromDesign([])).toEqual({ value: [], problems: [] });
    expect(fromDesign([{ x: 0.055, y: 0 }])).toEqual({ value: [{ x: 0.055, y: 0 }], problems: [] });
    // 5 m is outside the ±2000 mm a point may lie at: the stored points are left out, and the reason is named.
    const far = fromDesign([{ x: 5, y: 0 }]);
    expect(far.value).toEqual([]);
    expect(far.problems).toHaveLength(1);
    expect(far.problems[0]!.path).toBe("");
    expect(far.problems[0]!.message).toMatch(/ The points were left out$/);
    expect(fromDesign(null)).toEqual({ value: null, problems: [{ path: "", message: "must be a list of points" }] });
    expect(fromDesign([1])).toEqual({ value: [], problems: [{ path: "", message: "must be points { x, y } in metres; they were left out" }] });
  });
});
