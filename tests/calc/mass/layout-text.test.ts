/**
 * The parts list as URL text (calc/mass/layout-text.ts): what the writer refuses, and what the reader
 * says about a text it cannot read, in its own words and limits (200 parts, 20 000 characters).
 * The format is the project's own, so every expected text below is written out by hand from the
 * format description at the top of the module (lengths in mm, masses in g).
 */
import { describe, expect, it } from "vitest";
import { encodeLayout, parseLayout } from "../../../calc/mass/layout-text.ts";
import { MAX_PARTS, type LayoutPart } from "../../../calc/mass/parts.ts";
import { refusal } from "../../support/refusal.ts";

const point = (mass: number, x = 0, name = "p"): LayoutPart => ({ name, shape: { kind: "point" }, mass: { kind: "given", mass }, x, y: 0, z: 0 });

/** The one problem the reader reports for a single-part text. */
const partProblem = (token: string): string => {
  const r = parseLayout(`v1~${token}`);
  expect(r.ok).toBe(false);
  expect(r.parts).toEqual([]);
  expect(r.problems).toHaveLength(1);
  expect(r.problems[0]!.index).toBe(0);
  return r.problems[0]!.reason;
};

describe("writing the parts list as text", () => {
  it(`refuses more than ${MAX_PARTS} parts, and anything that is not a list, by the name "parts"`, () => {
    const many = Array.from({ length: MAX_PARTS + 1 }, () => point(0.01));
    const e = refusal(() => encodeLayout(many));
    expect(e.param).toBe("parts");
    expect(e.message).toBe("parts must be a list of at most 200 parts (got 201)");
    const notList = refusal(() => encodeLayout("pt_a_0_0_0_10" as never));
    expect(notList.param).toBe("parts");
    expect(notList.message).toBe('parts must be a list of at most 200 parts (got "pt_a_0_0_0_10")');
  });

  it(`writes exactly ${MAX_PARTS} parts, one token each`, () => {
    const text = encodeLayout(Array.from({ length: MAX_PARTS }, () => point(0.01)));
    // 0.01 kg = 10 g; every token "pt_p_0_0_0_10".
    expect(text).toBe(`v1${"~pt_p_0_0_0_10".repeat(MAX_PARTS)}`);
  });

  it("names a bad part by its place in the list", () => {
    const bad: LayoutPart = { ...point(0.01), shape: { kind: "annulus", innerRadius: 0.06, outerRadius: 0.05 } };
    const e = refusal(() => encodeLayout([point(0.01), bad]));
    expect(e.param).toBe("parts[1].shape.innerRadius");
    expect(e.message).toBe("parts[1].shape.innerRadius must be less than outerRadius (0.05 m) (got 0.06 m)");
  });
});

describe("reading the parts list back: the whole text", () => {
  it("says a value that is not text must be text, and reads nothing", () => {
    expect(parseLayout(42)).toEqual({ ok: false, version: null, parts: [], problems: [{ index: null, reason: "the layout must be text" }] });
    expect(parseLayout(undefined)).toEqual({ ok: false, version: null, parts: [], problems: [{ index: null, reason: "the layout must be text" }] });
  });

  it("reads a text of up to 20 000 characters and refuses a longer one whole", () => {
    // Surrounding blanks count toward the length but are not part of the layout.
    const longest = `${" ".repeat(19_998)}v1`;
    expect(longest).toHaveLength(20_000);
    expect(parseLayout(longest)).toEqual({ ok: true, version: 1, parts: [], problems: [] });
    expect(parseLayout(` ${longest}`)).toEqual({
      ok: false,
      version: null,
      parts: [],
      problems: [{ index: null, reason: "the layout text is longer than 20000 characters" }],
    });
  });

  it("reads a text with blanks or a line break around it", () => {
    const r = parseLayout("  v1~pt_a_15_0_0_280\n");
    expect(r.ok).toBe(true);
    // 15 mm = 0.015 m, 280 g = 0.28 kg.
    expect(r.parts).toEqual([point(0.28, 0.015, "a")]);
  });

  it('needs the text to start with exactly a version such as "v1", and only one it knows', () => {
    const noVersion = { ok: false, version: null, parts: [], problems: [{ index: null, reason: 'the layout text must start with a version such as "v1"' }] };
    expect(parseLayout("pt_a_0_0_0_1")).toEqual(noVersion);
    expect(parseLayout("xv1~pt_a_0_0_0_1")).toEqual(noVersion);
    expect(parseLayout("v1x~pt_a_0_0_0_1")).toEqual(noVersion);
    expect(parseLayout("V1~pt_a_0_0_0_1")).toEqual(noVersion);
    expect(parseLayout("v12~pt_a_0_0_0_1")).toEqual({
      ok: false,
      version: 12,
      parts: [],
      problems: [{ index: null, reason: "version 12 is not known; this reader understands v1" }],
    });
  });

  it(`reads the first ${MAX_PARTS} parts of a longer list and says how many it left out`, () => {
    const r = parseLayout(`v1${"~pt_a_0_0_0_10".repeat(MAX_PARTS + 1)}`);
    expect(r.ok).toBe(false);
    expect(r.parts).toHaveLength(MAX_PARTS);
    expect(r.problems).toEqual([{ index: null, reason: "only the first 200 parts are read (got 201)" }]);
    const full = parseLayout(`v1${"~pt_a_0_0_0_10".repeat(MAX_PARTS)}`);
    expect(full.ok).toBe(true);
    expect(full.parts).toHaveLength(MAX_PARTS);
    expect(full.problems).toEqual([]);
  });
});

describe("reading the parts list back: one part", () => {
  it("reads a point as a shape with no dimensions at all", () => {
    const r = parseLayout("v1~pt_a_0_0_0_10");
    expect(r.parts[0]!.shape).toStrictEqual({ kind: "point" });
  });

  it("names the shapes it knows when it meets another, quoting at most 12 characters of it", () => {
    expect(partProblem("blob_x_0_0_0_1")).toBe('unknown shape "blob"; use one of pt, disk, ring, ann, plate, rod, cyl, lcyl, cust');
    expect(partProblem("abcdefghijklmnopq_x_0_0_0_1")).toMatch(/^unknown shape "abcdefghijkl"; /);
  });

  it("says how many fields a shape needs: five, its dimensions and a mass", () => {
    // pt: shape, name, x, y, z, mass = 6; disk adds its radius = 7; plate adds three = 9.
    expect(partProblem("pt_a_0_0_0")).toBe("a pt part needs 6 fields, got 5");
    expect(partProblem("disk_a_0_0_0_50")).toBe("a disk part needs 7 fields, got 6");
    expect(partProblem("plate_a_0_0_0_50_20")).toBe("a plate part needs 9 fields, got 7");
    expect(partProblem("plate_a_0_0_0_50_20_0")).toBe("a plate part needs 9 fields, got 8");
    expect(partProblem("cust_a")).toBe("a cust part needs 9 fields, got 2");
  });

  it("quotes at most 12 characters of a field that is not a number, and 20 of a mass that is neither grams nor a material", () => {
    expect(partProblem("pt_a_0_0_123456789abcdefgh_10")).toBe('field 5 ("123456789abc") is not a number');
    expect(partProblem("pt_a_0_0_0_abcdefghijklmnopqrstuvwxyz")).toBe('mass "abcdefghijklmnopqrst" is neither a number of grams nor a known material');
  });
});
