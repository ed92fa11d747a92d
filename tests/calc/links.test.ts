/**
 * Calculator links: what a query string sets, what is ignored and said so, and that a link written
 * from values reads back as those values. The placement calculator's form stands in for all.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { form as placement } from "../../calc/calculators/placement.ts";
import { linkFor, linkQuery, pageLink, readLink, writeLink } from "../../calc/core/calculator.ts";
import { MAX_VALUE_LENGTH } from "../../calc/core/permalink.ts";
import { quantityToText } from "../../calc/core/units.ts";

const texts = (search: string) => readLink(placement, search).texts;

describe("calculator links", () => {
  it("reads the readable form ?v=1&rpm=2400&r=32mm", () => {
    expect(readLink(placement, "?v=1&rpm=2400&r=32mm")).toEqual({
      texts: { topSpeed: "2400", radius: "32mm" },
      choices: {},
      extras: {},
      system: undefined,
      notices: [],
    });
  });

  it("reports unknown parameters politely and ignores them", () => {
    const read = readLink(placement, "?v=1&rpm=2400&colour=red");
    expect(read.texts).toEqual({ topSpeed: "2400" });
    expect(read.notices).toEqual(['The link has a parameter "colour" that this calculator does not use; it was ignored.']);
  });

  it("keeps hostile values as plain text for the field to reject, never as markup", () => {
    expect(texts(`?r=${encodeURIComponent("<img src=x onerror=alert(1)>")}`).radius).toBe("<img src=x onerror=alert(1)>");
  });

  it("refuses over-long values", () => {
    const read = readLink(placement, `?r=${"9".repeat(MAX_VALUE_LENGTH + 1)}`);
    expect(read.texts).toEqual({});
    expect(read.notices[0]).toContain("longer than 48 characters");
  });

  it("notes a newer format version and repeated keys", () => {
    const read = readLink(placement, "?v=7&r=1mm&r=2mm");
    expect(read.texts.radius).toBe("1mm");
    expect(read.notices).toEqual([
      'This link says format version "7"; this page reads version 1. Values were read where they made sense; check them.',
      'The link sets "r" more than once; the first value was used.',
    ]);
  });

  it("reads the unit system and rejects an unknown one", () => {
    expect(readLink(placement, "?u=us").system).toBe("us");
    expect(readLink(placement, "?u=imperial").notices[0]).toContain('Unknown unit system "imperial"');
  });

  it("keeps another calculator's scoped keys and writes only its own", () => {
    const query = writeLink(placement, { texts: { radius: "20 mm" }, choices: {}, extras: {} }, "metric", "v=1&t.rpm=100&t.u=us");
    expect(query).toBe("v=1&r=20mm&t.rpm=100&t.u=us&u=metric");
    expect(readLink({ ...placement, scope: "t" }, `?${query}`).texts).toEqual({ topSpeed: "100" });
  });

  it("writes a link that reads back to the same texts (round trip, property)", () => {
    fc.assert(
      fc.property(
        fc.record({ radius: fc.string({ maxLength: 20 }), topSpeed: fc.string({ maxLength: 20 }) }),
        fc.constantFrom("metric", "us") as fc.Arbitrary<"metric" | "us">,
        (given, system) => {
          const read = readLink(placement, `?${writeLink(placement, { texts: given, choices: {}, extras: {} }, system)}`);
          expect(read.system).toBe(system);
          expect(read.texts.radius).toBe(given.radius.replace(/\s+/g, ""));
          expect(read.texts.topSpeed).toBe(given.topSpeed.replace(/\s+/g, ""));
          expect(read.notices).toEqual([]);
        },
      ),
    );
  });

  it("builds links for prose from SI values: the query, from the chapter itself, and from anywhere", () => {
    const values = { radius: 0.012, topSpeed: 314.1592653589793, margin: 0.2 };
    expect(linkQuery(placement, values)).toBe("v=1&m=20pct&r=12mm&rpm=3000rpm&u=metric");
    expect(pageLink(placement, values)).toBe("?v=1&m=20pct&r=12mm&rpm=3000rpm&u=metric#placement-calculator");
    expect(linkFor(placement, values, { system: "us" })).toBe(
      "chapters/acceleration/?v=1&m=20pct&r=0.4724409448818898in&rpm=3000rpm&u=us#placement-calculator",
    );
  });

  it("writes plain decimals that read back exactly, and the SI unit when no number in the field's unit does", () => {
    expect(quantityToText(1e-4, "mm")).toBe("0.1mm");
    expect(quantityToText(0.0337379, "mm")).toBe("33.7379mm");
    // 0.3 m is no product n × 0.0254 of a double n: it is written in metres.
    const text = quantityToText(0.3, "in");
    expect(Number.parseFloat(text) * (text.endsWith("in") ? 0.0254 : 1)).toBe(0.3);
  });
});
