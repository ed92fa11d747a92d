// KaTeX's MathML output made ready for the page. The browser draws MathML itself (MathML Core), in
// the math font the chapter stylesheet names (components/layout/math.css), so a page carries no
// KaTeX markup, stylesheet or font beyond that one face. Per formula:
// - the TeX source KaTeX keeps in <semantics>/<annotation> is left out (browsers never show it);
// - styled letters (\mathbf) become the Unicode mathematical alphanumeric characters: MathML Core
//   supports the mathvariant attribute only for "normal" (upright), so "bold" would otherwise draw
//   as a plain letter (the mapping is Unicode's, UTR #25 "Unicode support for mathematics");
// - a prime written as a superscript (KaTeX's x') stands beside its letter at full size, with any
//   subscript after it: the prime character is already raised, and set as a superscript it shrinks
//   to a speck;
// - a hat accent is the modifier letter circumflex (U+02C6), which the math font places over the
//   letter, instead of the ASCII caret, which it draws as a separate, larger mark above;
// - a sign with no operand before it (the ± in "s = ±1", a leading minus) and a fence KaTeX marks
//   as one (|…| written \left| … \right|) are set tight, as TeX sets them: MathML Core otherwise
//   spaces them as the infix operators the same characters are between two operands;
// - a display formula scrolls sideways on narrow screens, and a scrollable region must be reachable
//   by keyboard: its wrapper gets the class "formula", tabindex="0", a role and a label.

/** First code points of the mathematical alphanumeric ranges (Unicode block 1D400–1D7FF). */
const STYLED = {
  bold: { upper: 0x1d400, lower: 0x1d41a, digit: 0x1d7ce, greekUpper: 0x1d6a8, greekLower: 0x1d6c2 },
  italic: { upper: 0x1d434, lower: 0x1d44e, digit: null, greekUpper: 0x1d6e2, greekLower: 0x1d6fc },
  "bold-italic": { upper: 0x1d468, lower: 0x1d482, digit: null, greekUpper: 0x1d71c, greekLower: 0x1d736 },
};
/** Letters whose styled form sits outside the block, in Letterlike Symbols (Unicode's holes). */
const HOLES = { italic: { h: "\u210e" } };

/**
 * One character in a mathematical style, or the character itself where Unicode has no styled form
 * (punctuation, a digit in italic).
 * @param {string} char
 * @param {keyof typeof STYLED} variant
 */
export function styledCharacter(char, variant) {
  const range = STYLED[variant];
  const hole = /** @type {Record<string, Record<string, string>>} */ (HOLES)[variant]?.[char];
  if (hole) return hole;
  const code = char.codePointAt(0) ?? 0;
  const at = (/** @type {number | null} */ first, /** @type {number} */ offset) => (first === null ? char : String.fromCodePoint(first + offset));
  if (code >= 0x41 && code <= 0x5a) return at(range.upper, code - 0x41);
  if (code >= 0x61 && code <= 0x7a) return at(range.lower, code - 0x61);
  if (code >= 0x30 && code <= 0x39) return at(range.digit, code - 0x30);
  // Greek capitals Α–Ω (U+0391–03A9, the unassigned U+03A2 included: its slot holds capital theta symbol).
  if (code >= 0x391 && code <= 0x3a9) return at(range.greekUpper, code - 0x391);
  // Greek small α–ω (U+03B1–03C9, final sigma included).
  if (code >= 0x3b1 && code <= 0x3c9) return at(range.greekLower, code - 0x3b1);
  // ∂ ϵ ϑ ϰ ϕ ϱ ϖ follow ω in each style's Greek range.
  const after = "∂ϵϑϰϕϱϖ".indexOf(char);
  if (after >= 0) return at(range.greekLower, 0x19 + after);
  return char;
}

/**
 * What a browser draws for one <mi> of a single letter without a mathvariant: its mathematical
 * italic (CSS `text-transform: math-auto`, MathML Core's default for such identifiers).
 * @param {string} char
 */
export const mathItalic = (char) => styledCharacter(char, "italic");

/** @param {any} node @returns {string | undefined} */
const mathVariantOf = (node) => node.properties?.mathVariant ?? node.properties?.mathvariant;

/** @param {any} node @param {(text: string) => string} map */
function mapText(node, map) {
  if (node.type === "text") node.value = map(node.value);
  for (const child of node.children ?? []) mapText(child, map);
}

const PRIMES = /^[′″‴]+$/;
/** @param {any} node the text of an element, if it is an <mo> or <mi> of text only */
const textOf = (node) =>
  node?.type === "element" && (node.tagName === "mo" || node.tagName === "mi") && node.children.every((/** @type {any} */ c) => c.type === "text")
    ? node.children.map((/** @type {any} */ c) => c.value).join("")
    : undefined;
/** @param {any[]} children */
const elementsOf = (children) => children.filter((c) => c.type === "element");

/** x' as KaTeX writes it (msup or msubsup with the prime as superscript) to x′ beside, subscript after. @param {any} node */
function primeBeside(node) {
  const parts = elementsOf(node.children);
  const prime = parts[node.tagName === "msup" ? 1 : 2];
  if (!PRIMES.test(textOf(prime) ?? "")) return;
  const primed = {
    type: "element",
    tagName: "mrow",
    properties: {},
    children: [parts[0], { type: "element", tagName: "mo", properties: { lspace: "0em", rspace: "0em" }, children: [{ type: "text", value: textOf(prime) }] }],
  };
  if (node.tagName === "msup") {
    node.tagName = "mrow";
    node.children = primed.children;
  } else {
    node.tagName = "msub";
    node.children = [primed, parts[1]];
  }
}

const SIGNS = new Set(["+", "−", "-", "±", "∓"]);
/** Operators after which an operand has just ended: closing brackets and primes. */
const ENDS_OPERAND = /^[)\]}|′″‴]+$/;

/** @param {any} mo */
const tight = (mo) => {
  mo.properties.lspace = "0em";
  mo.properties.rspace = "0em";
};

/** Sets tight the signs with no operand before them and the marked fences among `children`. @param {any[]} children */
function tightenSigns(children) {
  let previous;
  for (const child of elementsOf(children)) {
    if (child.tagName === "mo") {
      const text = textOf(child) ?? "";
      const fence = child.properties?.fence === "true" || child.properties?.fence === true;
      const afterOperand = previous !== undefined && (previous.tagName !== "mo" || ENDS_OPERAND.test(textOf(previous) ?? ""));
      if ((SIGNS.has(text) && !afterOperand) || (fence && /^[|∣‖]$/.test(text))) tight(child);
    }
    previous = child;
  }
}

/** @param {any} node */
function prepare(node) {
  if (node.type !== "element") return;
  if (node.tagName === "msup" || node.tagName === "msubsup") primeBeside(node);
  if (node.tagName === "mover") {
    const accent = elementsOf(node.children)[1];
    if (textOf(accent) === "^") accent.children = [{ type: "text", value: "\u02c6" }];
  }
  node.children = (node.children ?? []).flatMap((/** @type {any} */ child) =>
    child.type === "element" && child.tagName === "semantics"
      ? child.children.filter((/** @type {any} */ c) => c.type !== "element" || c.tagName !== "annotation")
      : [child],
  );
  const variant = mathVariantOf(node);
  if (variant !== undefined && variant !== "normal") {
    if (!(variant in STYLED)) throw new Error(`rehype-math: mathvariant="${variant}" has no Unicode mapping here (use \\mathbf, \\mathit or \\mathrm)`);
    mapText(node, (text) => [...text].map((c) => styledCharacter(c, /** @type {keyof typeof STYLED} */ (variant))).join(""));
    delete node.properties.mathVariant;
    delete node.properties.mathvariant;
  }
  if (node.tagName === "mrow" || node.tagName === "math") tightenSigns(node.children);
  for (const child of node.children) prepare(child);
}

export function rehypeMath() {
  /** @param {any} node */
  const visit = (node) => {
    if (node.type === "element" && node.tagName === "math") {
      prepare(node);
      return;
    }
    if (node.type === "element" && Array.isArray(node.properties?.className) && node.properties.className.includes("katex")) {
      const math = node.children?.find((/** @type {any} */ c) => c.type === "element" && c.tagName === "math");
      if (math?.properties?.display === "block") {
        node.properties.className = [...node.properties.className, "formula"];
        node.properties.tabIndex = 0;
        node.properties.role = "group";
        node.properties.ariaLabel = "Formula (scrolls sideways on narrow screens)";
      }
    }
    for (const child of node.children ?? []) visit(child);
  };
  return (/** @type {any} */ tree) => visit(tree);
}
