// Formulas as plain text for the search index: each formula's MathML (KaTeX's MathML output, set at
// build time; see rehype-math.mjs) read into one line of text, such as "a = ω²r, ω = 2πn/60", so
// that search excerpts keep their formulas instead of leaving a gap.

/** @typedef {{ name: string, attributes: string, children: Node[] }} Element */
/** @typedef {Element | string} Node */

const SUPERSCRIPT = /** @type {Record<string, string>} */ ({
  0: "⁰",
  1: "¹",
  2: "²",
  3: "³",
  4: "⁴",
  5: "⁵",
  6: "⁶",
  7: "⁷",
  8: "⁸",
  9: "⁹",
  "-": "⁻",
  "−": "⁻",
  "+": "⁺",
  n: "ⁿ",
  i: "ⁱ",
});

/** Accents as the combining marks that put them over the letter before. */
const ACCENT = /** @type {Record<string, string>} */ ({
  "^": "\u0302",
  ˆ: "\u0302",
  "~": "\u0303",
  "˜": "\u0303",
  ˉ: "\u0304",
  "¯": "\u0304",
  "‾": "\u0305",
  "˙": "\u0307",
  "→": "\u20d7",
});

/** Operators read with a space on each side when they stand between two operands. */
const SPACED = new Set([..."=+−-×·≈≤≥<>≠∝±⇒⟹→"]);

/**
 * Text of markup with its character references read (named: the five XML ones and &nbsp;; numeric).
 * @param {string} text
 */
export const decode = (text) =>
  text
    .replace(/&#x([0-9a-f]+);/gi, (_, hex) => String.fromCodePoint(Number.parseInt(hex, 16)))
    .replace(/&#(\d+);/g, (_, dec) => String.fromCodePoint(Number(dec)))
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&quot;/g, '"')
    .replace(/&nbsp;/g, "\u00a0")
    .replace(/&amp;/g, "&");

/**
 * Parses MathML (well-formed, as KaTeX writes it) into a tree.
 * @param {string} markup
 * @returns {Element}
 */
function parse(markup) {
  /** @type {Element} */
  const root = { name: "", attributes: "", children: [] };
  const stack = [root];
  for (const m of markup.matchAll(/<(\/?)([a-zA-Z][\w-]*)([^>]*?)(\/?)>|([^<]+)/g)) {
    const [, closing, name, attributes = "", selfClosing, text] = m;
    const top = /** @type {Element} */ (stack[stack.length - 1]);
    if (text !== undefined) top.children.push(decode(text));
    else if (closing) {
      if (stack.length > 1) stack.pop();
    } else {
      /** @type {Element} */
      const element = { name: name.toLowerCase(), attributes, children: [] };
      top.children.push(element);
      if (!selfClosing) stack.push(element);
    }
  }
  return root;
}

/** Puts a multi-part expression in parentheses: "2πn" and "g_n" stay, "a + b" becomes "(a + b)". */
const group = (/** @type {string} */ text) => (/^[\p{L}\p{M}\p{N}.′_⁰¹²³⁴⁵⁶⁷⁸⁹⁻⁺ⁿⁱ]+$/u.test(text) ? text : `(${text})`);

/** @param {Node[]} children */
const elements = (children) => /** @type {Element[]} */ (children.filter((c) => typeof c !== "string"));

/** @param {string} text a superscript's text, in superscript characters where all have one */
const superscript = (text) => ([...text].every((c) => c in SUPERSCRIPT) ? [...text].map((c) => SUPERSCRIPT[c]).join("") : `^${group(text)}`);

/**
 * @param {Node} node
 * @returns {string}
 */
function read(node) {
  if (typeof node === "string") return node;
  const parts = elements(node.children);
  const part = (/** @type {number} */ i) => (parts[i] ? read(parts[i]).trim() : "");
  switch (node.name) {
    case "annotation":
    case "annotation-xml":
    case "mphantom":
      return "";
    case "mspace":
      return " ";
    case "mfrac":
      return `${group(part(0))}/${group(part(1))}`;
    case "msqrt":
      return `√${group(readRow(node.children).trim())}`;
    case "mroot":
      return `${group(part(1))}√${group(part(0))}`;
    case "msup":
      return `${part(0)}${superscript(part(1))}`;
    case "msub":
      return `${part(0)}_${group(part(1))}`;
    case "msubsup":
      return `${part(0)}_${group(part(1))}${superscript(part(2))}`;
    case "mover":
    case "munder":
    case "munderover": {
      const over = node.name === "munder" ? "" : part(node.name === "mover" ? 1 : 2);
      const under = node.name === "mover" ? "" : part(1);
      if (node.name === "mover" && /accent="true"/.test(node.attributes) && over in ACCENT) return `${part(0)}${ACCENT[over]}`;
      return `${part(0)}${under ? `_${group(under)}` : ""}${over ? superscript(over) : ""}`;
    }
    default:
      return readRow(node.children);
  }
}

/**
 * A row: operators that stand between two operands get a space on each side (a leading minus does not).
 * @param {Node[]} children
 */
function readRow(children) {
  let out = "";
  let operand = false;
  for (const child of children) {
    const text = read(child);
    if (typeof child !== "string" && child.name === "mo") {
      const op = text.trim();
      if (SPACED.has(op) && operand) out += ` ${op} `;
      else if (op === "," || op === ";") out += `${op} `;
      else out += text;
      // After a closing bracket or a prime, an operand has just ended.
      operand = /^[)\]|′″‴]+$/.test(op);
    } else {
      out += text;
      operand = typeof child !== "string" && child.name !== "mspace" ? text.trim() !== "" || operand : operand;
    }
  }
  return out;
}

/**
 * One formula's MathML as a line of text.
 * @param {string} markup the markup of one formula (its <math> element, or an element around it)
 * @returns {string}
 */
export function mathToText(markup) {
  return read(parse(markup))
    .replace(/\s+/g, " ")
    .replace(/\s+([,.;)])/g, "$1")
    .replace(/\(\s+/g, "(")
    .trim();
}

/**
 * A page's HTML with each formula (KaTeX's `<span class="katex…">` around a <math> element)
 * replaced by its text (for the search index only; the page served is unchanged).
 * @param {string} page
 * @returns {string}
 */
export function withFormulasAsText(page) {
  return page.replace(
    /<span class="katex[^"]*"[^>]*>\s*(<math\b[\s\S]*?<\/math>)\s*<\/span>/g,
    (_, math) => `<span class="formula-text">${mathToText(math)}</span>`,
  );
}
