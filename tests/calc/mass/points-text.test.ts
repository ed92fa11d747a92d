/**
 * Mounting points as typed and as links carry them (calc/mass/points-text.ts): "55, 0; 0, 55", x, y
 * pairs separated by semicolons, bare numbers in mm (metric) or inches (US). 1 in = 25.4 mm exactly
 * (NIST SP 811, appendix B).
 */
import { describe, expect, it } from "vitest";
import { MAX_MOUNTING_POINTS, readMountingPoints, writeMountingPoints } from "../../../calc/mass/points-text.ts";

const ENTER = `Enter 1 to ${MAX_MOUNTING_POINTS} points, as x, y pairs separated by semicolons.`;

describe("mounting points as text", () => {
  it("reads x, y pairs in mm, skipping empty items between semicolons", () => {
    expect(readMountingPoints("55, 0; 0, 55", "metric")).toEqual({
      points: [
        { x: 0.055, y: 0 },
        { x: 0, y: 0.055 },
      ],
      error: null,
    });
    expect(readMountingPoints(" -40,10 ; ; ", "metric")).toEqual({ points: [{ x: -0.04, y: 0.01 }], error: null });
  });

  it("reads bare numbers in inches in US units, and numbers with their own unit in either system", () => {
    const us = readMountingPoints("1, 2", "us").points!;
    expect(us[0]!.x).toBeCloseTo(0.0254, 15);
    expect(us[0]!.y).toBeCloseTo(0.0508, 15);
    expect(readMountingPoints("25.4mm, 1in", "metric").points![0]!.y).toBeCloseTo(0.0254, 15);
  });

  it(`takes 1 to ${MAX_MOUNTING_POINTS} points and says so otherwise`, () => {
    const pairs = (n: number) => Array.from({ length: n }, (_, i) => `${i}, 0`).join("; ");
    expect(readMountingPoints(pairs(MAX_MOUNTING_POINTS), "metric").points).toHaveLength(MAX_MOUNTING_POINTS);
    expect(readMountingPoints(pairs(MAX_MOUNTING_POINTS + 1), "metric")).toEqual({ points: null, error: ENTER });
    expect(readMountingPoints("", "metric")).toEqual({ points: null, error: ENTER });
    expect(readMountingPoints(" ; ", "metric")).toEqual({ points: null, error: ENTER });
  });

  it("names the point that is not a pair, and why when a coordinate cannot be read", () => {
    expect(readMountingPoints("55, 0; 30", "metric")).toEqual({ points: null, error: "Point 2 must be two coordinates, x and y, separated by a comma." });
    expect(readMountingPoints("1, 2, 3", "metric").error).toBe("Point 1 must be two coordinates, x and y, separated by a comma.");
    const unreadable = readMountingPoints("55, abc", "metric");
    expect(unreadable.points).toBeNull();
    expect(unreadable.error).toMatch(/^Point 1 must be two coordinates, x and y, separated by a comma \(.+\)\.$/);
    // A coordinate beyond ±2 m is refused by its declared range.
    expect(readMountingPoints("3000, 0", "metric").error).toMatch(/^Point 1 must be two coordinates, x and y, separated by a comma \(.*2.*\)\.$/);
  });

  it("writes points that read back exactly, without spaces, in mm or inches", () => {
    const points = [
      { x: 0.055, y: -0.0125 },
      { x: 0, y: 0.0508 },
    ];
    const metric = writeMountingPoints(points, "metric");
    expect(metric).toBe("55mm,-12.5mm;0mm,50.8mm");
    expect(readMountingPoints(metric, "metric").points).toEqual(points);
    const us = writeMountingPoints(points, "us");
    expect(us).not.toContain(" ");
    expect(us.split(";")[1]).toBe("0in,2in");
    expect(readMountingPoints(us, "us").points).toEqual(points);
  });
});
