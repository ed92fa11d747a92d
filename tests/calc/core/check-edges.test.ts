/**
 * Check cards: the words and marks of each status, the figures in the system's units, and the
 * worst status of a set of cards.
 */
import { describe, expect, it } from "vitest";
import { type CheckStatus, figureOf, ratioFigure, STATUS_MARKS, STATUS_WORDS, worstStatus } from "../../../calc/core/check.ts";

describe("status words and marks", () => {
  it("shows each status in the handbook's words and a mark that prints in black and white", () => {
    expect(STATUS_WORDS).toEqual({ holds: "Holds", marginal: "Marginal", fails: "Fails", info: "For information" });
    expect(STATUS_MARKS).toEqual({ holds: "✔", marginal: "▲", fails: "✖", info: "i" });
  });
});

describe("figures", () => {
  it("formats a quantity in the system's display unit and keeps its SI value and unit", () => {
    // 0.0254 m = 1 in exactly (NIST SP 811 App. B.8).
    expect(figureOf("Radius", 0.0254, "length", "us")).toEqual({ label: "Radius", value: 0.0254, unit: "m", text: "1.00 in" });
    expect(figureOf("Radius", 0.0254, "length", "metric")).toEqual({ label: "Radius", value: 0.0254, unit: "m", text: "25.4 mm" });
    expect(figureOf("Speed", 314.1592653589793, "angularSpeed", "metric")).toMatchObject({ unit: "rad/s", text: "3000 rpm" });
  });

  it("takes an explicit unit and a number of figures", () => {
    expect(figureOf("Radius", 0.0254, "length", "metric", "m", 2).text).toBe("0.025 m");
    expect(figureOf("Share", 0.5, "fraction", "metric").unit).toBe("");
  });

  it("writes a ratio to three figures with no unit", () => {
    expect(ratioFigure("Safety factor", 1.5)).toEqual({ label: "Safety factor", value: 1.5, unit: "", text: "1.50" });
    expect(ratioFigure("Safety factor", Number.POSITIVE_INFINITY).text).toBe("—");
  });
});

describe("worstStatus", () => {
  it.each([
    { statuses: [], worst: "empty" },
    { statuses: ["info", "info"], worst: "empty" },
    { statuses: ["holds", "info"], worst: "holds" },
    { statuses: ["info", "marginal", "holds"], worst: "marginal" },
    { statuses: ["holds", "fails", "marginal"], worst: "fails" },
    { statuses: ["fails", "info"], worst: "fails" },
    { statuses: ["marginal"], worst: "marginal" },
  ] as { statuses: CheckStatus[]; worst: string }[])("$statuses → $worst", ({ statuses, worst }) => {
    expect(worstStatus(statuses)).toBe(worst);
  });
});
