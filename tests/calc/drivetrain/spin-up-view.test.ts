/**
 * The spin-up page's own link keys (calc/drivetrain/spin-up-view.ts): its comparison variants
 * ("variants", "b.", "c.", "d.") and its sweep ("s."), written from field text or from values and
 * read back with a notice for everything ignored. The keys and the notices' wording are what a user
 * sees (in the address bar and above the calculator), so they are pinned exactly.
 */
import { describe, expect, it } from "vitest";
import { readSpinUpView, type SpinUpView, type SpinUpViewText, spinUpViewKeys, spinUpViewText } from "../../../calc/drivetrain/spin-up-view.ts";

/** The comparison the chapter links to: 6 cells, then a 1.5:1 reduction, and a sweep of the ratio from 1 to 4 in 31 points. */
const CHAPTER_COMPARISON: SpinUpView = { variants: [{ cellCount: 6 }, { gearRatio: 1.5 }], sweep: { parameter: "gearRatio", from: 1, to: 4, points: 31 } };

const read = (search: string, driveType = "weapon") => readSpinUpView(search, driveType);

describe("spinUpViewText: values to the text the fields hold", () => {
  it("writes nothing for a page with no comparison and no sweep", () => {
    expect(spinUpViewText({}, "us")).toEqual({ variants: [], sweep: null });
    expect(spinUpViewText({ variants: [] }, "metric")).toEqual({ variants: [], sweep: null });
  });

  it("writes each number in its field's metric unit, spelled for a link", () => {
    const text = spinUpViewText(
      {
        variants: [{ cellCount: 6 }, { gearRatio: 1.5, wheelRadius: 0.025, currentLimit: 80, throttle: 0.5, cellResistance: 0.005 }],
        sweep: { parameter: "inertia", from: 0.001, to: 0.002, points: 5 },
      },
      "metric",
    );
    // 0.025 m = 25 mm; 0.5 of full throttle = 50 %; 0.005 Ω = 5 mΩ (the field's unit); the inertia field is in kg·m².
    expect(text).toEqual({
      variants: [{ cellCount: "6" }, { gearRatio: "1.5", wheelRadius: "25mm", currentLimit: "80A", throttle: "50pct", cellResistance: "5mohm" }],
      sweep: { parameter: "inertia", from: "0.001kgm2", to: "0.002kgm2", points: "5" },
    });
  });

  it("writes US units when asked: 0.0254 m is 1 in and 0.0254² m² × 0.45359237 kg is 1 lb·in² (NIST SP 811, by definition)", () => {
    const text = spinUpViewText(
      { variants: [{ wheelRadius: 0.0254, inertia: 0.0254 * 0.0254 * 0.45359237 }], sweep: { parameter: "wheelOffset", from: 0.0254, to: 0.0508, points: 3 } },
      "us",
    );
    expect(text).toEqual({ variants: [{ wheelRadius: "1in", inertia: "1lb-in2" }], sweep: { parameter: "wheelOffset", from: "1in", to: "2in", points: "3" } });
  });
});

describe("spinUpViewKeys: the link keys of a comparison and a sweep", () => {
  it("adds no key when there is neither", () => {
    expect(spinUpViewKeys({ variants: [], sweep: null }, "weapon")).toEqual({});
    expect(spinUpViewKeys({ variants: [], sweep: null }, "spinner")).toEqual({});
  });

  it("gives the chapter's comparison link its keys: the count, one scope per variant, the sweep", () => {
    expect(spinUpViewKeys(spinUpViewText(CHAPTER_COMPARISON, "metric"), "weapon")).toEqual({
      variants: "2",
      "b.cells": "6",
      "c.ratio": "1.5",
      "s.p": "ratio",
      "s.from": "1",
      "s.to": "4",
      "s.n": "31",
    });
  });

  it("scopes the third variant as d.", () => {
    const view = { variants: [{ cellCount: "5" }, { cellCount: "6" }, { cellCount: "7" }], sweep: null };
    expect(spinUpViewKeys(view, "weapon")).toEqual({ variants: "3", "b.cells": "5", "c.cells": "6", "d.cells": "7" });
  });

  it("strips every run of white space from the text as typed", () => {
    const view = {
      variants: [{ motorKv: " 1 400  rpm/V", currentLimit: "80 A\t" }],
      sweep: { parameter: "inertia" as const, from: " 0.5 kg·m2", to: "1  kg·m2 ", points: " 1 1 " },
    };
    expect(spinUpViewKeys(view, "weapon")).toEqual({
      variants: "1",
      "b.kv": "1400rpm/V",
      "b.ilim": "80A",
      "s.p": "j",
      "s.from": "0.5kg·m2",
      "s.to": "1kg·m2",
      "s.n": "11",
    });
  });

  it("leaves a weapon's variants without wheel keys, and keeps them for a spinner", () => {
    const view = { variants: [{ wheelRadius: "25 mm", cellCount: "6" }], sweep: null };
    expect(spinUpViewKeys(view, "weapon")).toEqual({ variants: "1", "b.cells": "6" });
    expect(spinUpViewKeys(view, "spinner")).toEqual({ variants: "1", "b.rw": "25mm", "b.cells": "6" });
  });

  it("passes over a name that is not an input", () => {
    expect(spinUpViewKeys({ variants: [{ colour: "red", cellCount: "6" }], sweep: null }, "weapon")).toEqual({ variants: "1", "b.cells": "6" });
  });

  it("reads back as it was written", () => {
    const view: SpinUpViewText = {
      variants: [{ gearRatio: "3" }, {}, { wheelRadius: "20mm" }],
      sweep: { parameter: "wheelOffset", from: "50mm", to: "90mm", points: "9" },
    };
    const search = new URLSearchParams(spinUpViewKeys(view, "spinner")).toString();
    expect(read(search, "spinner")).toEqual({ view, notices: [] });
  });
});

describe("readSpinUpView: a link's comparison and sweep", () => {
  it("reads the page's keys beside the design's, with no notice", () => {
    const { view, notices } = read("?v=1&u=metric&type=weapon&ratio=2.5&cells=6&variants=2&b.ratio=3&c.cells=5&s.p=ratio&s.from=1&s.to=4&s.n=31");
    expect(notices).toEqual([]);
    expect(view).toEqual({
      variants: [{ gearRatio: "3" }, { cellCount: "5" }],
      sweep: { parameter: "gearRatio", from: "1", to: "4", points: "31" },
    });
  });

  it("finds no comparison and no sweep in a link of the design alone", () => {
    expect(read("?v=1&u=us&type=weapon&ratio=2")).toEqual({ view: { variants: [], sweep: null }, notices: [] });
    expect(read("")).toEqual({ view: { variants: [], sweep: null }, notices: [] });
  });

  it("shows as many variants as the count asks for, blank ones included", () => {
    expect(read("?variants=3&b.cells=6")).toEqual({ view: { variants: [{ cellCount: "6" }, {}, {}], sweep: null }, notices: [] });
    expect(read("?variants=1")).toEqual({ view: { variants: [{}], sweep: null }, notices: [] });
    expect(read("?variants=0")).toEqual({ view: { variants: [], sweep: null }, notices: [] });
  });

  it("shows at least up to the last variant the link gives keys for", () => {
    expect(read("?c.ratio=1.5").view.variants).toEqual([{}, { gearRatio: "1.5" }]);
    expect(read("?variants=1&c.ratio=1.5").view.variants).toEqual([{}, { gearRatio: "1.5" }]);
    expect(read("?variants=0&d.cells=5").view.variants).toEqual([{}, {}, { cellCount: "5" }]);
    expect(read("?b.cells=6").view.variants).toEqual([{ cellCount: "6" }]);
  });

  it("ignores a count that is not 0 to 3, and uses the first of two", () => {
    expect(read("?variants=9")).toEqual({
      view: { variants: [], sweep: null },
      notices: ['The link\'s number of variants "9" is not 0 to 3; it was ignored.'],
    });
    for (const count of ["12", "-1", "2x", ""]) {
      const { view, notices } = read(`?variants=${count}`);
      expect(view.variants, count).toEqual([]);
      expect(notices, count).toEqual([`The link's number of variants "${count}" is not 0 to 3; it was ignored.`]);
    }
    expect(read("?variants=2&variants=3")).toEqual({
      view: { variants: [{}, {}], sweep: null },
      notices: ['The link sets "variants" more than once; the first value was used.'],
    });
  });

  it("reports a scope it does not use once, however many keys it has, and still reads the rest", () => {
    expect(read("?e.ratio=3&e.cells=4&b.ratio=3")).toEqual({
      view: { variants: [{ gearRatio: "3" }], sweep: null },
      notices: ['The link has parameters for "e.", which this calculator does not use; they were ignored.'],
    });
    expect(read("?.ratio=3").notices).toEqual(['The link has parameters for ".", which this calculator does not use; they were ignored.']);
  });

  it("uses the first of a repeated key", () => {
    expect(read("?b.cells=6&b.cells=7")).toEqual({
      view: { variants: [{ cellCount: "6" }], sweep: null },
      notices: ['The link sets "b.cells" more than once; the first value was used.'],
    });
  });

  it("takes a value of 48 characters and ignores a longer one", () => {
    const longest = "1".repeat(48);
    expect(read(`?b.cells=${longest}`)).toEqual({ view: { variants: [{ cellCount: longest }], sweep: null }, notices: [] });
    expect(read(`?b.cells=${longest}1`)).toEqual({
      view: { variants: [{}], sweep: null },
      notices: ['The link\'s value for "b.cells" is longer than 48 characters; it was ignored.'],
    });
  });

  it("reports a variant key it does not know, but not a variant's unit system", () => {
    expect(read("?variants=1&b.colour=red&b.u=us&b.cells=6")).toEqual({
      view: { variants: [{ cellCount: "6" }], sweep: null },
      notices: ['The link has a parameter "b.colour" that this calculator does not use; it was ignored.'],
    });
  });

  it("reads a sweep and reports a sweep key it does not know", () => {
    expect(read("?s.p=cells&s.from=2&s.to=8&s.n=7&s.q=1")).toEqual({
      view: { variants: [], sweep: { parameter: "cellCount", from: "2", to: "8", points: "7" } },
      notices: ['The link has a parameter "s.q" that this calculator does not use; it was ignored.'],
    });
  });

  it("leaves a sweep's missing range and count empty", () => {
    expect(read("?s.p=ratio")).toEqual({ view: { variants: [], sweep: { parameter: "gearRatio", from: "", to: "", points: "" } }, notices: [] });
  });

  it("leaves the sweep off when the link names no input to sweep", () => {
    expect(read("?s.from=1&s.to=4")).toEqual({
      view: { variants: [], sweep: null },
      notices: ["The link has sweep settings but no input to sweep (s.p); they were ignored."],
    });
  });

  it("sweeps a wheel input only for a spinner", () => {
    const search = "?s.p=rw&s.from=10mm&s.to=30mm&s.n=5";
    expect(read(search, "weapon")).toEqual({
      view: { variants: [], sweep: null },
      notices: ['The link asks to sweep "rw", which this calculator cannot sweep for this drive type; the sweep was left off.'],
    });
    expect(read(search, "spinner")).toEqual({
      view: { variants: [], sweep: { parameter: "wheelRadius", from: "10mm", to: "30mm", points: "5" } },
      notices: [],
    });
  });

  it("does not sweep an input the sweep does not offer, nor a key that is no input", () => {
    for (const key of ["eff", "zz"]) {
      expect(read(`?s.p=${key}`, "spinner")).toEqual({
        view: { variants: [], sweep: null },
        notices: [`The link asks to sweep "${key}", which this calculator cannot sweep for this drive type; the sweep was left off.`],
      });
    }
  });

  it("says nothing more of a sweep whose only key was too long", () => {
    expect(read(`?s.p=${"r".repeat(49)}`)).toEqual({
      view: { variants: [], sweep: null },
      notices: ['The link\'s value for "s.p" is longer than 48 characters; it was ignored.'],
    });
  });
});
