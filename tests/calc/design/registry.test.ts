/**
 * The registry of calculators (calc/design/registry.ts): every calculator module found by file
 * name, listed once in build-sheet order, its form found by section, and its whole descriptor
 * loaded on demand for the sections a design holds.
 */
import { readdirSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { FORMS, formFor, loadCalculators } from "../../../calc/design/registry.ts";

const files = readdirSync(new URL("../../../calc/calculators/", import.meta.url)).filter((f) => f.endsWith(".ts"));

describe("the registry of calculators", () => {
  it("lists one form per calculator module, in build-sheet order", () => {
    expect(FORMS).toHaveLength(files.length);
    expect(new Set(FORMS.map((f) => f.id)).size).toBe(FORMS.length);
    const orders = FORMS.map((f) => f.order);
    expect(orders).toEqual([...orders].sort((a, b) => a - b));
    expect(FORMS[0]!.id).toBe("placement");
  });

  it("finds a section's form by its id, and nothing for a section no calculator fills", () => {
    for (const form of FORMS) expect(formFor(form.id)).toBe(form);
    expect(formFor("colour")).toBeUndefined();
    expect(formFor("")).toBeUndefined();
  });

  it("loads the whole calculators of the sections asked for, once each, in build-sheet order, leaving unknown sections out", async () => {
    const loaded = await loadCalculators(["rims", "placement", "rims", "colour"]);
    expect(loaded.map((c) => c.id)).toEqual(["placement", "rims"]);
    for (const calculator of loaded) expect(typeof calculator.run).toBe("function");
    expect(await loadCalculators([])).toEqual([]);
  });
});
