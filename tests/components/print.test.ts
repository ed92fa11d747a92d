/**
 * The printed build sheet's parts that are not cards: each check's inputs as printed, and the QR
 * code of the link that reopens the design (its matrix drawn as a path, its link read back).
 */
import { describe, expect, it } from "vitest";
import type { AnyValues } from "../../calc/core/calculator.ts";
import { calculatorFor } from "../../calc/design/calculators.ts";
import { demoDesign } from "../../calc/index.ts";
import { designAddress, printedInputs, qrPath } from "../../components/design/print.ts";
import { printedCode } from "../../components/design/print-qr.ts";
import { designFromFragment } from "../../components/design/share.ts";

const demo = demoDesign();
const byLabel = (items: { label: string; text: string }[]) => Object.fromEntries(items.map((i) => [i.label, i.text]));

describe("printed inputs", () => {
  it("prints a check's numbers to three figures in the field's unit, counts as whole numbers, choices by their words", () => {
    const inputs = byLabel(printedInputs(calculatorFor("fasteners")!, (demo.fasteners as AnyValues[])[0]!, "metric"));
    expect(inputs.Speed).toBe("2400 rpm");
    expect(inputs["Radius of the part"]).toBe("55.0 mm");
    expect(inputs["Number of bolts"]).toBe("1");
    expect(inputs["Thread size"]).toBe("M4 × 0.7");
  });

  it("prints in US units when the design is in US units", () => {
    const inputs = byLabel(printedInputs(calculatorFor("fasteners")!, (demo.fasteners as AnyValues[])[0]!, "us"));
    expect(inputs["Radius of the part"]).toBe("2.17 in");
  });

  it("prints a list (the mass layout's parts) by its count", () => {
    const inputs = byLabel(printedInputs(calculatorFor("mass")!, demo.mass as AnyValues, "metric"));
    expect(inputs["Parts list"]).toMatch(/^\d+ entries$/);
  });
});

describe("QR drawing", () => {
  it("draws one rectangle per horizontal run of dark modules", () => {
    expect(
      qrPath([
        [true, true, false, true],
        [false, false, false, false],
        [false, true, true, true],
      ]),
    ).toBe("M0 0h2v1h-2zM3 0h1v1h-1zM1 2h3v1h-3z");
  });

  it("joins the page's address and the design's fragment into the link", () => {
    expect(designAddress("https://example.org", "/sub/build-sheet/", "#d1.4.abcd.0123abcd")).toBe("https://example.org/sub/build-sheet/#d1.4.abcd.0123abcd");
  });

  it("holds a link that reads back as the same design, for the demo in a QR code of at most 161 modules a side", () => {
    const code = printedCode(demo, "http://127.0.0.1:4321", "/build-sheet/");
    expect(code.address.startsWith("http://127.0.0.1:4321/build-sheet/#d1.")).toBe(true);
    const reading = designFromFragment(code.address.slice(code.address.indexOf("#")));
    expect(reading.kind === "design" && reading.reading.ok && reading.reading.design).toEqual(demo);
    // Regression pin (our own figure): the demo's link (2 388 characters with the joint check's and
    // the review's new fields) needs version 36 (161 modules) at low error correction; a design that
    // grows past that prints smaller modules at the same size.
    expect(code.modules).toBeLessThanOrEqual(161);
    expect(code.svg).toMatch(/^<svg [^>]*viewBox="0 0 (\d+) \1"/);
  });
});
