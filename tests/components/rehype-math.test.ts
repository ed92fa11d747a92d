/**
 * Formulas as the build prepares KaTeX's MathML for the browser (scripts/site/rehype-math.mjs) and
 * the characters the math face must keep for them (scripts/site/math-font.mjs).
 */
import { describe, expect, it } from "vitest";
import katex from "katex";
import { fromHtml } from "hast-util-from-html";
import { toHtml } from "hast-util-to-html";
import { mathCharacters } from "../../scripts/site/math-font.mjs";
import { mathItalic, rehypeMath, styledCharacter } from "../../scripts/site/rehype-math.mjs";

const prepared = (tex: string, displayMode = false) => {
  const tree = fromHtml(katex.renderToString(tex, { output: "mathml", throwOnError: true, displayMode }), { fragment: true });
  rehypeMath()(tree);
  return toHtml(tree);
};

describe("KaTeX's MathML prepared for the page", () => {
  it("leaves out the TeX source", () => {
    const html = prepared("a = \\omega^2 r");
    expect(html).not.toContain("<annotation");
    expect(html).not.toContain("<semantics");
    expect(html).toContain("<msup><mi>ω</mi><mn>2</mn></msup>");
  });

  it("writes bold letters as Unicode's mathematical bold, which MathML Core draws without mathvariant", () => {
    const html = prepared("\\mathbf{F} = m\\,\\mathbf{a}");
    // U+1D405 MATHEMATICAL BOLD CAPITAL F, U+1D41A MATHEMATICAL BOLD SMALL A (Unicode 15, block 1D400).
    expect(html).toContain("\u{1d405}");
    expect(html).toContain("\u{1d41a}");
    expect(html).not.toContain('mathvariant="bold"');
  });

  it("keeps upright (mathvariant normal), which MathML Core supports", () => {
    expect(prepared("\\Omega")).toContain('mathvariant="normal"');
  });

  it("sets a prime beside its letter, with the subscript after it", () => {
    expect(prepared("I'_j")).toContain('<msub><mrow><mi>I</mi><mo lspace="0em" rspace="0em">′</mo></mrow><mi>j</mi></msub>');
    expect(prepared("\\sigma'")).toMatch(
      /^<span class="katex"><math[^>]*><mrow><mrow><mi>σ<\/mi><mo lspace="0em" rspace="0em">′<\/mo><\/mrow><\/mrow><\/math><\/span>$/,
    );
  });

  it("writes a hat accent as the modifier letter circumflex", () => {
    const html = prepared("\\hat r");
    expect(html).toContain("<mo>\u02c6</mo>");
    expect(html).not.toContain("<mo>^</mo>");
  });

  it("makes a display formula a keyboard-reachable, labelled scroll region; inline ones stay plain", () => {
    expect(prepared("x", true)).toMatch(
      /^<span class="katex formula" tabindex="0" role="group" aria-label="Formula \(scrolls sideways on narrow screens\)"><math[^>]*display="block"/,
    );
    expect(prepared("x")).toMatch(/^<span class="katex"><math/);
  });

  it("refuses a style it cannot map, naming it", () => {
    expect(() => prepared("\\mathcal{F}")).toThrow(/mathvariant="script"/);
  });
});

describe("mathematical letters (Unicode Technical Report #25; code points from the Unicode 15 charts)", () => {
  it.each([
    ["a", "italic", "\u{1d44e}"],
    ["h", "italic", "\u210e"],
    ["Z", "italic", "\u{1d44d}"],
    ["ω", "italic", "\u{1d714}"],
    ["Ω", "italic", "\u{1d6fa}"],
    ["ϕ", "italic", "\u{1d719}"],
    ["∂", "italic", "\u{1d715}"],
    ["A", "bold", "\u{1d400}"],
    ["z", "bold", "\u{1d433}"],
    ["7", "bold", "\u{1d7d5}"],
    ["α", "bold", "\u{1d6c2}"],
    ["x", "bold-italic", "\u{1d499}"],
    ["7", "italic", "7"],
    ["(", "bold", "("],
  ] as const)("%s in %s is %s", (char, variant, expected) => {
    expect(styledCharacter(char, variant)).toBe(expected);
  });

  it("the face keeps what the browser draws: single letters as their italics, the rest as written", () => {
    const chars = mathCharacters(prepared("\\omega_n = \\max(x, 2\\,\\text{rad})"));
    for (const c of ["\u{1d714}", "\u{1d45b}", "\u{1d465}", "m", "a", "x", "=", "(", ",", "2", "r", "d"]) expect(chars.has(c), c).toBe(true);
    expect(mathItalic("m")).toBe("\u{1d45a}");
    // "max" is one multi-letter identifier: drawn upright, so its italics are not needed.
    expect(chars.has("\u{1d45a}")).toBe(false);
  });
});

describe("signs and fences set as TeX sets them", () => {
  it("sets tight a sign with no operand before it, and spaces one between two operands", () => {
    expect(prepared("s = \\pm 1")).toContain('<mo>=</mo><mo lspace="0em" rspace="0em">±</mo><mn>1</mn>');
    expect(prepared("-x")).toContain('<mo lspace="0em" rspace="0em">−</mo><mi>x</mi>');
    expect(prepared("a - b")).toContain("<mi>a</mi><mo>−</mo><mi>b</mi>");
    expect(prepared("(a) - b")).toContain("<mo>−</mo><mi>b</mi>");
    expect(prepared("x' - b")).toContain("<mo>−</mo><mi>b</mi>");
  });

  it("sets |…| fences tight", () => {
    expect(prepared("\\left| s + m \\right|")).toMatch(/<mo fence="true" lspace="0em" rspace="0em">∣<\/mo><mi>s<\/mi>/);
  });
});
