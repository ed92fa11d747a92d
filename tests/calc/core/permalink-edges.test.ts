/**
 * The link codec's keys: scopes, the format version, repeated and over-long values, the unit
 * system, keys a page reads itself, and the text a notice quotes from an untrusted link.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type LinkKey, PERMALINK_VERSION, quoteForNotice, readLinkKeys, writeLinkKeys } from "../../../calc/core/permalink.ts";

const keys: LinkKey[] = [
  { key: "r", label: "Radius", maxLength: 5 },
  { key: "rpm", label: "Top speed", maxLength: 48 },
];

describe("quoteForNotice", () => {
  it("quotes up to 24 characters whole and cuts a longer text", () => {
    expect(quoteForNotice("x".repeat(24))).toBe(`"${"x".repeat(24)}"`);
    expect(quoteForNotice("x".repeat(25))).toBe(`"${"x".repeat(24)}…"`);
    expect(quoteForNotice("")).toBe('""');
  });

  it("replaces control characters and line separators with a question mark", () => {
    expect(quoteForNotice("a\u0000b\u001fc\u007fd\u009fe\u2028f\u2029g\nh")).toBe('"a?b?c?d?e?f?g?h"');
    expect(quoteForNotice("\u00a0é ~")).toBe('"\u00a0é ~"');
  });
});

describe("readLinkKeys", () => {
  it("reads the known keys of the main scope and leaves other scopes alone", () => {
    expect(readLinkKeys("?v=1&r=20mm&t.r=5mm&t.u=us&u=us", "", keys, [])).toEqual({ values: { r: "20mm" }, system: "us", notices: [] });
    expect(readLinkKeys("v=1&r=20mm&t.r=5mm&t.u=us", "t", keys, [])).toEqual({ values: { r: "5mm" }, system: "us", notices: [] });
  });

  it("speaks of the format version once, from the main scope, and only when it differs", () => {
    const newer = 'This link says format version "2"; this page reads version 1. Values were read where they made sense; check them.';
    expect(PERMALINK_VERSION).toBe(1);
    expect(readLinkKeys("v=2&r=1", "", keys, []).notices).toEqual([newer]);
    expect(readLinkKeys("v=2&t.r=1", "t", keys, []).notices).toEqual([]);
    expect(readLinkKeys("v=1&r=1", "", keys, []).notices).toEqual([]);
    expect(readLinkKeys("r=1", "", keys, []).notices).toEqual([]);
    expect(readLinkKeys("v=", "", keys, []).notices).toEqual([
      'This link says format version ""; this page reads version 1. Values were read where they made sense; check them.',
    ]);
  });

  it("takes a value of exactly the longest length and refuses a longer one", () => {
    expect(readLinkKeys("r=12345", "", keys, [])).toEqual({ values: { r: "12345" }, system: undefined, notices: [] });
    expect(readLinkKeys("r=123456", "", keys, [])).toEqual({
      values: {},
      system: undefined,
      notices: ["The link's value for Radius is longer than 5 characters; it was ignored."],
    });
  });

  it("uses the first of a repeated key, the unit system too, and says so with the key as written", () => {
    expect(readLinkKeys("t.u=us&t.u=metric&t.r=1&t.r=2", "t", keys, [])).toEqual({
      values: { r: "1" },
      system: "us",
      notices: ['The link sets "t.u" more than once; the first value was used.', 'The link sets "t.r" more than once; the first value was used.'],
    });
  });

  it("refuses an unknown unit system and keeps none", () => {
    expect(readLinkKeys("u=imperial", "", keys, [])).toEqual({
      values: {},
      system: undefined,
      notices: ['Unknown unit system "imperial" in the link (use "metric" or "us"); kept the current one.'],
    });
    expect(readLinkKeys("u=metric", "", keys, []).system).toBe("metric");
  });

  it("neither reads nor reports the keys a page reads itself, but reports them repeated", () => {
    expect(readLinkKeys("cmp=a&rpm=1", "", keys, ["cmp"])).toEqual({ values: { rpm: "1" }, system: undefined, notices: [] });
    expect(readLinkKeys("cmp=a&cmp=b", "", keys, ["cmp"]).notices).toEqual(['The link sets "cmp" more than once; the first value was used.']);
    expect(readLinkKeys("colour=red", "", keys, []).notices).toEqual(['The link has a parameter "colour" that this calculator does not use; it was ignored.']);
    expect(readLinkKeys("t.colour=red", "t", keys, []).notices).toEqual([
      'The link has a parameter "t.colour" that this calculator does not use; it was ignored.',
    ]);
  });

  it("reads a key with nothing before its dot as the main scope's", () => {
    expect(readLinkKeys(".r=5", "", keys, [])).toEqual({ values: { r: "5" }, system: undefined, notices: [] });
    expect(writeLinkKeys(".r=5&t.r=1", "", "us", {})).toBe("v=1&t.r=1&u=us");
  });

  it("reads a key whose value holds a dot, and a scope only before the first dot", () => {
    expect(readLinkKeys("r=1.5", "", keys, []).values).toEqual({ r: "1.5" });
    expect(readLinkKeys("a.b.r=1", "a", keys, []).notices).toEqual(['The link has a parameter "a.b.r" that this calculator does not use; it was ignored.']);
  });
});

describe("writeLinkKeys", () => {
  it("writes v first, then its own keys and every other scope's in order, with / , ; : ~ left readable", () => {
    expect(writeLinkKeys("", "", "metric", { r: "1/2 in", rpm: "a,b;c:d~e" })).toBe("v=1&r=1/2+in&rpm=a,b;c:d~e&u=metric");
  });

  it("replaces its own scope's keys and keeps the others", () => {
    expect(writeLinkKeys("v=1&r=5mm&t.r=1mm&zz=1&u=us", "", "metric", { rpm: "100" })).toBe("v=1&rpm=100&t.r=1mm&u=metric");
    expect(writeLinkKeys("v=1&r=5mm&t.r=1mm&t.rpm=9", "t", "us", { r: "2mm" })).toBe("v=1&r=5mm&t.r=2mm&t.u=us");
  });

  it("writes the version it reads, whatever the old link said", () => {
    expect(writeLinkKeys("v=7", "t", "us", {})).toBe("v=1&t.u=us");
  });
});

describe("a link written for one scope reads back, and keeps the other scope's values (property)", () => {
  it("round-trips any text within the longest length, in either scope", () => {
    // Up to 5 characters for the radius; up to 24 graphemes (at most 48 UTF-16 units) for the speeds.
    const short = fc.string({ maxLength: 5 });
    const text = fc.string({ maxLength: 24, unit: "grapheme" }).filter((t) => t.length <= 48);
    fc.assert(
      fc.property(
        short,
        text,
        text,
        fc.constantFrom("", "t"),
        fc.constantFrom("metric", "us") as fc.Arbitrary<"metric" | "us">,
        (r, rpm, other, scope, system) => {
          const otherScope = scope === "" ? "t" : "";
          const existing = writeLinkKeys("", otherScope, "metric", { rpm: other });
          const query = writeLinkKeys(existing, scope, system, { r, rpm });
          expect(readLinkKeys(query, scope, keys, [])).toEqual({ values: { r, rpm }, system, notices: [] });
          expect(readLinkKeys(query, otherScope, keys, [])).toEqual({ values: { rpm: other }, system: "metric", notices: [] });
        },
      ),
      { numRuns: 500 },
    );
  });
});
