import { describe, expect, it } from "vitest";
import { type LinkKey, quoteForNotice, readLinkKeys, writeLinkKeys } from "../../../calc/core/permalink.ts";

const KEYS: LinkKey[] = [
  { key: "r", label: "Sensor radius", maxLength: 48 },
  { key: "rpm", label: "Top speed", maxLength: 48 },
];

describe("quoteForNotice: untrusted link text, quoted short and printable", () => {
  it("replaces control characters, C1 controls and the line and paragraph separators with ?", () => {
    expect(quoteForNotice("a\u0000b\u001fc\u007fd\u009fe\u2028f\u2029g")).toBe('"a?b?c?d?e?f?g"');
    // The characters just outside those ranges stay as they are.
    expect(quoteForNotice(" ~\u00a0\u2027\u202a")).toBe('" ~\u00a0\u2027\u202a"');
  });

  it("keeps 24 characters whole and cuts a longer text after 24 with an ellipsis", () => {
    const twentyFour = "x".repeat(24);
    expect(quoteForNotice(twentyFour)).toBe(`"${twentyFour}"`);
    expect(quoteForNotice(`${twentyFour}yz`)).toBe(`"${twentyFour}…"`);
  });
});

describe("readLinkKeys: which keys a scope reads", () => {
  it("a scoped calculator leaves the format version to the page's main one: no notice for v=7", () => {
    expect(readLinkKeys("?v=7&t.r=1mm", "t", KEYS, [])).toEqual({ values: { r: "1mm" }, system: undefined, notices: [] });
    expect(readLinkKeys("?v=7&t.r=1mm", "", KEYS, []).notices).toEqual([
      'This link says format version "7"; this page reads version 1. Values were read where they made sense; check them.',
    ]);
  });

  it("reads a key written with an empty scope before its dot (.r) as the main calculator's key", () => {
    expect(readLinkKeys("?.r=5mm&rpm=2400", "", KEYS, [])).toEqual({ values: { r: "5mm", rpm: "2400" }, system: undefined, notices: [] });
  });

  it("reads a scoped key by the part after the dot, and leaves the main calculator's keys alone", () => {
    expect(readLinkKeys("?r=1mm&t.rpm=100&t.u=us", "t", KEYS, [])).toEqual({ values: { rpm: "100" }, system: "us", notices: [] });
  });
});

describe("writeLinkKeys: writing one scope replaces all of that scope's old keys and keeps the others", () => {
  it("drops the main calculator's old keys, known or not, and keeps a scoped calculator's", () => {
    expect(writeLinkKeys("v=1&r=1mm&colour=red&t.rpm=100", "", "metric", { rpm: "2400" })).toBe("v=1&rpm=2400&t.rpm=100&u=metric");
  });

  it("drops a scoped calculator's old keys, and keeps the main one's and another scope's", () => {
    expect(writeLinkKeys("v=1&r=1mm&t.rpm=100&t.u=us&s.r=2mm", "t", "metric", { r: "3mm" })).toBe("v=1&r=1mm&s.r=2mm&t.r=3mm&t.u=metric");
  });

  it("writes the format version once and first, whatever version the old link said", () => {
    expect(writeLinkKeys("v=7&v=8", "", "us", {})).toBe("v=1&u=us");
  });
});
