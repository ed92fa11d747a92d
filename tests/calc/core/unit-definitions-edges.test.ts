/**
 * Each unit's definition in words (calc/core/unit-definitions.ts) states the factor the unit table
 * uses: the definition is read as arithmetic ("lb × (0.0254 m)²", "2π/60 rad/s", "0.453 592 37 kg
 * exactly") with the named non-SI units at their exact values and the SI unit symbols dropped, and
 * the result must be the table's factor. A definition that stops saying what the factor is fails
 * its own row.
 *
 * The non-SI units a definition may name, at their exact values: inch 0.0254 m and pound
 * 0.453 592 37 kg (1959 international yard and pound agreement), standard gravity 9.806 65 m/s²
 * (3rd CGPM, 1901), pound-force = lb × g_n, ounce = lb/16, ounce-force = lbf/16 (NIST SP 811 App. B.8).
 */
import { describe, expect, it } from "vitest";
import { UNIT_DEFINITIONS } from "../../../calc/core/unit-definitions.ts";
import { UNITS, type UnitId } from "../../../calc/core/unit-table.ts";

const NAMED: Record<string, string> = {
  lbf: "(0.45359237 * 9.80665)",
  ozf: "(0.45359237 * 9.80665 / 16)",
  lb: "(0.45359237)",
  oz: "(0.45359237 / 16)",
  g_n: "(9.80665)",
  in: "(0.0254)",
};
const SUPERSCRIPT_DIGITS: Record<string, string> = {
  "⁻": "-",
  "⁰": "0",
  "¹": "1",
  "²": "2",
  "³": "3",
  "⁴": "4",
  "⁵": "5",
  "⁶": "6",
  "⁷": "7",
  "⁸": "8",
  "⁹": "9",
};
const SI_NAME = "(?:rad|kg|m|s|N|J|W|Pa|Hz|V|Ω)";
const SI_UNIT = new RegExp(`(?<![\\w.])${SI_NAME}[²³]?(?:[·/](?:\\(${SI_NAME}(?:[·/]${SI_NAME})*\\)|${SI_NAME})[²³]?)*`, "g");

/** The number a definition in words states, in the kind's SI unit; null for one that names no number ("SI unit", "ratio"). */
function statedFactor(definition: string): number | null {
  if (/^SI\b/.test(definition) || definition === "ratio" || definition === "a whole number") return null;
  let text = definition
    // A remark in brackets ("(1 rev = 2π rad)"), but not a bracket a power applies to.
    .replace(/\s\([^)]*\)(?![²³])/g, "");
  text = text.slice(text.lastIndexOf("=") + 1);
  text = text
    .slice(text.indexOf(", ") + 1)
    .replace("exactly", "")
    .replace(/(\d) (?=\d)/g, "$1")
    .replace(/10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)/g, (_, power: string) => `1e${[...power].map((c) => SUPERSCRIPT_DIGITS[c]).join("")}`)
    .replace(/\bper\b/g, "/")
    .replace(/\b(lbf|ozf|lb|oz|g_n|in)\b/g, (name) => NAMED[name]!)
    .replace(SI_UNIT, "")
    .replace(/(\d)π/g, "$1*π")
    .replace(/π/g, "Math.PI")
    .replace(/×/g, "*")
    .replace(/²/g, "**2")
    .replace(/³/g, "**3")
    .replace(/(\d)\s+\(/g, "$1*(");
  return Number(new Function(`return ${text};`)());
}

describe("each unit's definition in words states its factor", () => {
  it("reads the definitions' arithmetic as intended (a few worked by hand)", () => {
    expect(statedFactor("0.453 592 37 kg exactly")).toBe(0.45359237);
    expect(statedFactor("6.4516 × 10⁻⁴ m² exactly (0.0254 m squared)")).toBeCloseTo(6.4516e-4, 18);
    expect(statedFactor("2π/60 rad/(s·V)")).toBeCloseTo(Math.PI / 30, 15);
    expect(statedFactor("1609.344 m per 3600 s")).toBeCloseTo(0.44704, 15);
    expect(statedFactor("SI unit, 1/s")).toBeNull();
  });

  it.each(Object.entries(UNIT_DEFINITIONS) as [UnitId, { definition: string }][])("%s: %o", (id, { definition }) => {
    const stated = statedFactor(definition);
    const factor = UNITS[id].factor;
    if (stated === null) expect(factor).toBe(1);
    else expect(Math.abs(stated - factor) / factor).toBeLessThanOrEqual(1e-12);
  });
});
