import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { accelerometerPlacementInputs as specs } from "../../calc/rotation/rotation.ts";
import { decodeState, encodeState, MAX_VALUE_LENGTH, permalinkQuery } from "../../components/calc-ui/permalink.ts";

describe("permalinks", () => {
  it("reads the readable form ?v=1&rpm=2400&r=32mm", () => {
    expect(decodeState(specs, "?v=1&rpm=2400&r=32mm")).toEqual({ texts: { topSpeed: "2400", radius: "32mm" }, system: undefined, notices: [] });
  });

  it("reports unknown parameters politely and ignores them", () => {
    const decoded = decodeState(specs, "?v=1&rpm=2400&colour=red");
    expect(decoded.texts).toEqual({ topSpeed: "2400" });
    expect(decoded.notices).toEqual(['The link has a parameter "colour" that this calculator does not use; it was ignored.']);
  });

  it("keeps hostile values as plain text for the field to reject, never as markup", () => {
    const decoded = decodeState(specs, `?r=${encodeURIComponent("<img src=x onerror=alert(1)>")}`);
    expect(decoded.texts.radius).toBe("<img src=x onerror=alert(1)>");
  });

  it("refuses over-long values", () => {
    const decoded = decodeState(specs, `?r=${"9".repeat(MAX_VALUE_LENGTH + 1)}`);
    expect(decoded.texts).toEqual({});
    expect(decoded.notices[0]).toContain("longer than 48 characters");
  });

  it("notes a newer format version and repeated keys", () => {
    const decoded = decodeState(specs, "?v=7&r=1mm&r=2mm");
    expect(decoded.texts.radius).toBe("1mm");
    expect(decoded.notices).toEqual([
      'This link says format version "7"; this page reads version 1. Values were read where they made sense; check them.',
      'The link sets "r" more than once; the first value was used.',
    ]);
  });

  it("reads the unit system and rejects an unknown one", () => {
    expect(decodeState(specs, "?u=us").system).toBe("us");
    expect(decodeState(specs, "?u=imperial").notices[0]).toContain('Unknown unit system "imperial"');
  });

  it("keeps another calculator's scoped keys and reads only its own scope", () => {
    const query = encodeState(specs, { radius: "20 mm" }, "metric", "", "v=1&t.rpm=100&t.u=us");
    expect(query).toBe("v=1&r=20mm&t.rpm=100&t.u=us&u=metric");
    expect(decodeState(specs, `?${query}`, "t").texts).toEqual({ topSpeed: "100" });
    expect(decodeState(specs, `?${query}`, "t").system).toBe("us");
  });

  it("writes a link that reads back to the same values (round trip, property)", () => {
    fc.assert(
      fc.property(
        fc.record({ radius: fc.string({ maxLength: 20 }), topSpeed: fc.string({ maxLength: 20 }) }),
        fc.constantFrom("metric", "us") as fc.Arbitrary<"metric" | "us">,
        (texts, system) => {
          const decoded = decodeState(specs, `?${encodeState(specs, texts, system)}`);
          expect(decoded.system).toBe(system);
          expect(decoded.texts.radius).toBe(texts.radius.replace(/\s+/g, ""));
          expect(decoded.texts.topSpeed).toBe(texts.topSpeed.replace(/\s+/g, ""));
          expect(decoded.notices).toEqual([]);
        },
      ),
    );
  });

  it("builds a link for prose from SI values", () => {
    expect(permalinkQuery(specs, { radius: 0.012, topSpeed: 314.1592653589793, margin: 0.2 }, "metric")).toBe("v=1&m=20pct&r=12mm&rpm=3000rpm&u=metric");
  });
});
