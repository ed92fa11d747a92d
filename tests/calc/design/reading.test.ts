/**
 * Reading a design file, line by line of calc/design/design.ts: each refusal and each repair says
 * exactly which field, what was wrong and what was done, and older files come forward value by
 * value. (Written against the mutation report of calc/design: these messages, boundaries and
 * migrations were not pinned by any test.)
 */
import { describe, expect, it } from "vitest";
import { initialValues } from "../../../calc/core/calculator.ts";
import { CalcInputError } from "../../../calc/core/errors.ts";
import {
  DESIGN_FORMAT,
  DESIGN_TEXT_LIMIT,
  DESIGN_VERSION,
  describeProblems,
  MIGRATIONS,
  migrateDesign,
  readDesign,
  newDesign,
  readDesignText,
  sectionEntries,
  sectionsIn,
  sectionValues,
} from "../../../calc/design/design.ts";
import { CALCULATORS } from "../../../calc/design/calculators.ts";
import { FORMS } from "../../../calc/design/registry.ts";
import { boltedJointInputs } from "../../../calc/loads/joint-inputs.ts";

const header = { format: DESIGN_FORMAT, version: DESIGN_VERSION };
const notRead = (reading: ReturnType<typeof readDesign>) => {
  expect(reading.ok).toBe(false);
  return reading.problems;
};
const defaultsOf = (id: string) => initialValues(FORMS.find((f) => f.id === id)!) as Record<string, unknown>;

describe("a file that is not a design is refused, saying why", () => {
  it.each([
    ["null", null],
    ["a list", []],
    ["a number", 3],
    ["text", "design"],
  ])("%s: not an object", (_, raw) => {
    expect(notRead(readDesign(raw))).toEqual([{ path: "", message: "is not a design: expected a JSON object", action: "not-read" }]);
  });

  it("an object without a format", () => {
    expect(notRead(readDesign({ version: 3 }))).toEqual([
      { path: "format", message: 'is missing: this is not a Whirlbook design file (it has no "format": "whirlbook-design")', action: "not-read" },
    ]);
  });

  it("another format, or a version that is not a whole number of 1 or more, names the field", () => {
    expect(notRead(readDesign({ format: "other", version: 3 }))).toEqual([
      { path: "format", message: 'must be "whirlbook-design": this is not a Whirlbook design file', action: "not-read" },
    ]);
    expect(notRead(readDesign({ format: DESIGN_FORMAT, version: "3" }))).toEqual([
      { path: "version", message: "must be a whole number: this is not a Whirlbook design file", action: "not-read" },
    ]);
    expect(notRead(readDesign({ format: DESIGN_FORMAT, version: 2.5 }))[0]!.message).toBe("must be a whole number: this is not a Whirlbook design file");
    expect(notRead(readDesign({ format: DESIGN_FORMAT, version: 0 }))[0]).toEqual({
      path: "version",
      message: "must be 1 or more: this is not a Whirlbook design file",
      action: "not-read",
    });
  });

  it("a newer version than this handbook reads", () => {
    expect(notRead(readDesign({ format: DESIGN_FORMAT, version: DESIGN_VERSION + 1 }))).toEqual([
      {
        path: "version",
        message: `is ${DESIGN_VERSION + 1}, newer than this handbook reads (${DESIGN_VERSION}); open it with a newer version of the handbook`,
        action: "not-read",
      },
    ]);
  });
});

describe("a design's own fields", () => {
  it("keeps a name of up to 80 characters and notes of up to 4000, exactly at the limit too", () => {
    const reading = readDesign({ ...header, name: "n".repeat(80), notes: "x".repeat(4000), units: "us" });
    expect(reading.ok && reading.design.name).toBe("n".repeat(80));
    expect(reading.ok && reading.design.notes).toBe("x".repeat(4000));
    expect(reading.ok && reading.design.units).toBe("us");
    expect(reading.problems).toEqual([]);
  });

  it("replaces a name, notes or date that is too long or not text by the fallback, and says so", () => {
    const reading = readDesign({ ...header, name: "n".repeat(81), notes: 7, created: "c".repeat(41) });
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    expect(reading.design.name).toBe("Unnamed robot");
    expect(reading.design.notes).toBe("");
    expect(reading.design.created).toMatch(/^\d{4}-\d\d-\d\dT/);
    expect(reading.problems).toEqual([
      { path: "name", message: 'must be text of at most 80 characters; "Unnamed robot" was used', action: "default-used" },
      { path: "notes", message: 'must be text of at most 4000 characters; "" was used', action: "default-used" },
      { path: "created", message: `must be text of at most 40 characters; "${reading.design.created}" was used`, action: "default-used" },
    ]);
  });

  it("reads metric when the units are missing (silently) or anything but metric or us (saying so)", () => {
    const missing = readDesign({ ...header });
    expect(missing.ok && missing.design.units).toBe("metric");
    expect(missing.problems).toEqual([]);
    const metric = readDesign({ ...header, units: "metric" });
    expect(metric.problems).toEqual([]);
    const wrong = readDesign({ ...header, units: "imperial" });
    expect(wrong.ok && wrong.design.units).toBe("metric");
    expect(wrong.problems).toEqual([{ path: "units", message: 'must be "metric" or "us" (got the text "imperial"); metric was used', action: "default-used" }]);
  });

  it("ignores a key that is not part of a design, saying so, and keeps the rest", () => {
    const reading = readDesign({ ...header, name: "Kept", wheels: 4 });
    expect(reading.ok && reading.design.name).toBe("Kept");
    expect(reading.problems).toEqual([{ path: "wheels", message: "is not part of a design; it was ignored", action: "section-dropped" }]);
  });

  it("lists the sections a design holds, in the build sheet's order", () => {
    const reading = readDesign({ ...header, rims: [defaultsOf("rims")], mass: defaultsOf("mass") });
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    const ids = sectionsIn(reading.design).map((f) => f.id);
    expect(ids).toEqual(FORMS.map((f) => f.id).filter((id) => id === "rims" || id === "mass"));
    expect(sectionsIn({ ...reading.design, rims: undefined } as never).map((f) => f.id)).toEqual(["mass"]);
    expect(() => sectionsIn(null as never)).toThrow(CalcInputError);
    expect(() => sectionsIn(null as never)).toThrow(/design/);
  });
});

describe("a design's text", () => {
  it("refuses what is not text, or more than 2 000 000 characters, before reading it", () => {
    expect(notRead(readDesignText(42 as never))).toEqual([{ path: "", message: "is not text: a design file is JSON text", action: "not-read" }]);
    expect(notRead(readDesignText(" ".repeat(DESIGN_TEXT_LIMIT + 1)))).toEqual([
      { path: "", message: "is larger than 2 MB: not a design file", action: "not-read" },
    ]);
    // At the limit it is read (and here found not to be JSON).
    expect(notRead(readDesignText(" ".repeat(DESIGN_TEXT_LIMIT)))[0]!.message).toMatch(/^is not valid JSON \(/);
  });

  it("reads past a byte-order mark, and names a JSON error's place", () => {
    const reading = readDesignText(`\uFEFF${JSON.stringify({ ...header, name: "BOM" })}`);
    expect(reading.ok && reading.design.name).toBe("BOM");
    const broken = notRead(readDesignText('{"format": '));
    expect(broken).toHaveLength(1);
    expect(broken[0]).toMatchObject({ path: "", action: "not-read" });
    expect(broken[0]!.message).toMatch(/^is not valid JSON \(.+\)$/);
    expect(broken[0]!.message).not.toContain("unknown position");
  });

  it("describes problems one line each, naming the section and field, or the file", () => {
    expect(
      describeProblems([
        { path: "radius", section: "rims 1", message: "must be 1 mm or more", action: "default-used" },
        { path: "units", message: "must be metric or us", action: "default-used" },
        { path: "", message: "is not valid JSON (x)", action: "not-read" },
      ]),
    ).toEqual(["rims 1 (radius): must be 1 mm or more.", "units must be metric or us.", "The file is not valid JSON (x)."]);
    expect(() => describeProblems("no" as never)).toThrow(CalcInputError);
    expect(() => describeProblems("no" as never)).toThrow(/problems/);
  });
});

describe("older designs come forward, value by value", () => {
  it("1 → 2: the mass section's numbers move out of scalars beside the parts", () => {
    expect(MIGRATIONS[1]!({ version: 1, mass: { scalars: { spinSpeed: 300 }, parts: "p" } })).toEqual({ version: 1, mass: { spinSpeed: 300, parts: "p" } });
    expect(MIGRATIONS[1]!({ version: 1, mass: { scalars: null, parts: "p" } })).toEqual({ version: 1, mass: { parts: "p" } });
    expect(MIGRATIONS[1]!({ version: 1, mass: { parts: "p" } })).toEqual({ version: 1, mass: { parts: "p" } });
    for (const mass of [null, [1], "m", undefined]) expect(MIGRATIONS[1]!({ version: 1, mass })).toEqual({ version: 1, mass });
  });

  it("2 → 3: a fastener entry's class and mode are renamed, the old shear fields dropped, the joint's new values written", () => {
    const next = MIGRATIONS[2]!({
      version: 2,
      fasteners: [{ propertyClass: "10.9", mode: "tension", shearPlane: "thread", shearRatio: 0.6, count: 4 }, "odd"],
    });
    const [entry, odd] = next.fasteners as [Record<string, unknown>, unknown];
    expect(odd).toBe("odd");
    expect(entry).toMatchObject({ grade: "10.9", jointMode: "tension", count: 4 });
    expect(entry).not.toHaveProperty("propertyClass");
    expect(entry).not.toHaveProperty("mode");
    expect(entry).not.toHaveProperty("shearPlane");
    expect(entry).not.toHaveProperty("shearRatio");
    expect(entry.stackHeight).toBe(boltedJointInputs.stackHeight.default);
    expect(entry.nutFactor).toBe(boltedJointInputs.nutFactor.default);
    // A value the entry already has wins over the renamed one and over the defaults.
    const kept = (
      MIGRATIONS[2]!({ version: 2, fasteners: [{ propertyClass: "8.8", grade: "12.9", mode: "shear", jointMode: "tension", nutFactor: 0.15 }] })
        .fasteners as Record<string, unknown>[]
    )[0]!;
    expect(kept).toMatchObject({ grade: "12.9", jointMode: "tension", nutFactor: 0.15 });
    const bare = (MIGRATIONS[2]!({ version: 2, fasteners: [{ count: 1 }] }).fasteners as Record<string, unknown>[])[0]!;
    expect(bare).not.toHaveProperty("grade");
    expect(bare).not.toHaveProperty("jointMode");
    expect(MIGRATIONS[2]!({ version: 2, fasteners: "x" }).fasteners).toBe("x");
  });

  it("2 → 3: the values version 3 added are written at their defaults where missing, in single and listed sections", () => {
    const mass = defaultsOf("mass");
    const drivetrain = defaultsOf("drivetrain");
    const next = MIGRATIONS[2]!({ version: 2, mass: { spinSpeed: 1 }, drivetrain: [{ supplyCells: 3 }, 5], rims: [{ sideGrip: "kept" }] });
    expect(next.mass).toEqual({ spinSpeed: 1, sideGrip: mass.sideGrip, gripShare: mass.gripShare, supportRadius: mass.supportRadius });
    const [first, second] = next.drivetrain as [Record<string, unknown>, unknown];
    expect(first).toEqual({
      supplyCells: 3,
      currentLimitAt: drivetrain.currentLimitAt,
      noLoadLoss: drivetrain.noLoadLoss,
      noLoadVoltage: drivetrain.noLoadVoltage,
    });
    expect(second).toBe(5);
    expect((next.rims as Record<string, unknown>[])[0]).toEqual({ sideGrip: "kept", strengthBasis: defaultsOf("rims").strengthBasis });
    expect("weaponTurn" in MIGRATIONS[2]!({ version: 2 })).toBe(false);
    // A value already there is kept.
    expect((MIGRATIONS[2]!({ version: 2, mass: { sideGrip: 0.5 } }).mass as Record<string, unknown>).sideGrip).toBe(0.5);
  });

  it("steps one version at a time to the current one; an unknown step or a bad argument is refused by name", () => {
    const seen: number[] = [];
    const steps = {
      1: (d: Record<string, unknown>) => {
        seen.push(Number(d.version));
        return { ...d, a: 1 };
      },
      2: (d: Record<string, unknown>) => {
        seen.push(Number(d.version));
        return { ...d, b: 2 };
      },
    };
    expect(migrateDesign({ version: 1 }, steps, 3)).toEqual({ version: 3, a: 1, b: 2 });
    expect(seen).toEqual([1, 2]);
    expect(migrateDesign({ version: 3 }, steps, 3)).toEqual({ version: 3 });
    expect(() => migrateDesign({ version: 0 }, steps, 3)).toThrow(/a design version this handbook can bring forward \(1 to 3\)/);
    expect(() => migrateDesign(null as never)).toThrow(/raw/);
    expect(() => migrateDesign({ version: 1 }, null as never)).toThrow(/migrations/);
  });

  it("reading an older file brings it forward and says from which version", () => {
    const reading = readDesign({ format: DESIGN_FORMAT, version: 1, name: "Old", mass: { scalars: { spinSpeed: 314 } } });
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    expect(reading.migratedFrom).toBe(1);
    expect(reading.design.version).toBe(DESIGN_VERSION);
    expect((reading.design.mass as Record<string, unknown>).spinSpeed).toBe(314);
    const current = readDesign({ ...header });
    expect(current.ok && current.migratedFrom).toBe(null);
  });
});

describe("a design's sections", () => {
  const rims = FORMS.find((f) => f.id === "rims")!;
  const mass = FORMS.find((f) => f.id === "mass")!;
  const rim = () => ({ ...defaultsOf("rims") });
  const read = (sections: Record<string, unknown>) => {
    const reading = readDesign({ ...header, ...sections });
    if (!reading.ok) throw new Error("not read");
    return reading;
  };

  it("drops a list section that is not a list, and a single section that is not an object, saying so", () => {
    const listed = read({ rims: { radius: 1 } });
    expect(listed.design.rims).toBeUndefined();
    expect(listed.problems).toEqual([{ path: "rims", message: "must be a list", action: "section-dropped" }]);
    const single = read({ mass: [1] });
    expect(single.design.mass).toBeUndefined();
    expect(single.problems).toEqual([{ path: "mass", section: mass.title, message: "must be an object of named values", action: "section-dropped" }]);
  });

  it("reads at most the declared number of entries, leaves out an entry that is not an object, and names entries", () => {
    expect(rims.section).toMatchObject({ kind: "list", max: 24, entryName: "Rim" });
    const many = read({ rims: Array.from({ length: 25 }, rim) });
    expect((many.design.rims as unknown[]).length).toBe(24);
    expect(many.problems).toEqual([{ path: "rims", message: "lists 25 entries; only the first 24 were read", action: "item-dropped" }]);
    expect(read({ rims: Array.from({ length: 24 }, rim) }).problems).toEqual([]);
    const mixed = read({ rims: [rim(), 7, { ...rim(), name: "Outer ring" }, { ...rim(), name: "n".repeat(80) }, { ...rim(), name: "n".repeat(81) }] });
    expect((mixed.design.rims as { name: string }[]).map((r) => r.name)).toEqual(["Rim 1", "Outer ring", "n".repeat(80), "Rim 5"]);
    expect(mixed.problems).toEqual([
      { path: "rims[1]", message: "must be an object; the entry was left out", action: "item-dropped" },
      { path: "rims[4].name", message: "must be text of at most 80 characters; a default name was used", action: "default-used" },
    ]);
  });

  it("reports a missing value and a value that is not the calculator's, keeping the rest", () => {
    const { spinSpeed: _s, ...withoutSpeed } = defaultsOf("mass");
    const reading = read({ mass: { ...withoutSpeed, colour: "red" } });
    const values = reading.design.mass as Record<string, unknown>;
    expect(values.spinSpeed).toBe(defaultsOf("mass").spinSpeed);
    expect(reading.problems).toHaveLength(2);
    expect(reading.problems[0]).toMatchObject({ path: "mass.spinSpeed", section: mass.title, action: "default-used" });
    expect(reading.problems[0]!.message).toMatch(/ is missing; the default, .+, was used$/);
    expect(reading.problems[1]).toEqual({ path: "mass.colour", message: "is not a value of this calculator; it was ignored", action: "default-used" });
  });

  it("names a list entry's section by its calculator and entry name", () => {
    const first = Object.keys(rims.inputs)[0]!;
    const entry: Record<string, unknown> = { ...rim(), name: "Hub" };
    delete entry[first];
    const reading = read({ rims: [entry] });
    expect(reading.problems).toHaveLength(1);
    expect(reading.problems[0]).toMatchObject({ path: `rims[0].${first}`, section: `${rims.title}: Hub`, action: "default-used" });
  });
});

describe("a design's sections by calculator", () => {
  const single = CALCULATORS.find((c) => c.section.kind === "single")!;
  const list = CALCULATORS.find((c) => c.section.kind === "list")!;

  it("a new design is empty, metric, stamped with the time given", () => {
    expect(newDesign("Test bot", new Date("2026-01-02T03:04:05.000Z"))).toEqual({
      format: "whirlbook-design",
      version: DESIGN_VERSION,
      name: "Test bot",
      notes: "",
      created: "2026-01-02T03:04:05.000Z",
      modified: "2026-01-02T03:04:05.000Z",
      units: "metric",
    });
  });

  it("gives a single calculator's values, and none for a list calculator", () => {
    const values = { a: 1 };
    const design = { ...newDesign("x"), [single.id]: values, [list.id]: [{ name: "one" }] };
    expect(sectionValues(design, single)).toBe(values);
    expect(sectionValues(design, list)).toBeUndefined();
    expect(sectionValues(newDesign("x"), single)).toBeUndefined();
  });

  it("gives a list calculator's entries (none when absent), and none for a single calculator", () => {
    const entries = [{ name: "one" }];
    const design = { ...newDesign("x"), [single.id]: { a: 1 }, [list.id]: entries };
    expect(sectionEntries(design, list)).toBe(entries);
    expect(sectionEntries(newDesign("x"), list)).toEqual([]);
    expect(sectionEntries(design, single)).toEqual([]);
  });

  it("refuses what is not a design or a calculator, by name", () => {
    expect(() => sectionValues(null as never, single)).toThrow(/^design /);
    expect(() => sectionValues(newDesign("x"), null as never)).toThrow(/^calc /);
    expect(() => sectionEntries(null as never, list)).toThrow(/^design /);
    expect(() => sectionEntries(newDesign("x"), null as never)).toThrow(/^calc /);
  });
});
