// Formulas as plain text for the search index: KaTeX's HTML (set at build time, HTML output only,
// so the TeX source is not in the page) is read back into one line of text, such as
// "a = ω²r, ω = 2πn/60", so that search excerpts keep their formulas instead of leaving a gap.
// Reads KaTeX 0.16's markup: fractions and sub/superscripts are stacks ("vlist") whose items sit at
// a vertical offset ("top: …em"); everything else reads in document order.

/** @typedef {{ cls: string[], style: string, children: Node[] }} Element */
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

/**
 * Parses KaTeX's markup (well-formed spans, with svg drawings that are skipped) into a tree.
 * @param {string} html
 * @returns {Element}
 */
function parse(html) {
  /** @type {Element} */
  const root = { cls: [], style: "", children: [] };
  const stack = [root];
  const tags = /<(\/?)([a-zA-Z]+)([^>]*?)(\/?)>|([^<]+)/g;
  let skipping = 0;
  for (const m of html.matchAll(tags)) {
    const [, closing, name, attributes = "", selfClosing, text] = m;
    const top = /** @type {Element} */ (stack[stack.length - 1]);
    if (text !== undefined) {
      if (!skipping) top.children.push(text);
      continue;
    }
    if (name === "svg") {
      if (closing) skipping -= 1;
      else if (!selfClosing) skipping += 1;
      continue;
    }
    if (skipping || selfClosing || name !== "span") continue;
    if (closing) {
      if (stack.length > 1) stack.pop();
      continue;
    }
    /** @type {Element} */
    const element = {
      cls: (/class="([^"]*)"/.exec(attributes)?.[1] ?? "").split(/\s+/).filter(Boolean),
      style: /style="([^"]*)"/.exec(attributes)?.[1] ?? "",
      children: [],
    };
    top.children.push(element);
    stack.push(element);
  }
  return root;
}

/** @param {Node} node @param {string} name */
const has = (node, name) => typeof node !== "string" && node.cls.includes(name);

/**
 * The items of the first stack under `node`, highest first, with their offsets [em].
 * @param {Element} node
 * @returns {{ top: number, node: Element }[]}
 */
function stackItems(node) {
  /** @type {Element | undefined} */
  let list;
  const find = (/** @type {Element} */ n) => {
    for (const child of n.children) {
      if (list || typeof child === "string") continue;
      if (child.cls.includes("vlist")) list = child;
      else find(child);
    }
  };
  find(node);
  if (!list) return [];
  return list.children
    .filter((c) => typeof c !== "string" && /top:\s*-?[\d.]+em/.test(c.style))
    .map((c) => ({ top: Number(/top:\s*(-?[\d.]+)em/.exec(/** @type {Element} */ (c).style)?.[1]), node: /** @type {Element} */ (c) }))
    .sort((a, b) => a.top - b.top);
}

/** Puts a multi-part expression in parentheses: "2πn" and "g_n" stay, "a + b" becomes "(a + b)". */
const group = (/** @type {string} */ text) => (/^[\p{L}\p{N}.′_⁰¹²³⁴⁵⁶⁷⁸⁹⁻⁺ⁿⁱ]+$/u.test(text) ? text : `(${text})`);

/**
 * @param {Node} node
 * @returns {string}
 */
function read(node) {
  if (typeof node === "string") return node.replace(/\u200b/g, "");
  const cls = node.cls;
  if (["strut", "pstrut", "vlist-s", "frac-line", "nulldelimiter", "katex-mathml"].some((c) => cls.includes(c))) return "";
  if (cls.includes("mspace")) return " ";
  if (cls.includes("mfrac")) {
    const parts = stackItems(node).filter((item) => !item.node.children.some((c) => has(c, "frac-line")));
    if (parts.length === 2) return `${group(inner(parts[0].node).trim())}/${group(inner(parts[1].node).trim())}`;
  }
  if (cls.includes("msupsub")) {
    return stackItems(node)
      .map(({ top, node: item }) => {
        const text = inner(item).trim();
        if (top < -2.8) return [...text].every((c) => c in SUPERSCRIPT) ? [...text].map((c) => SUPERSCRIPT[c]).join("") : `^${group(text)}`;
        return `_${group(text)}`;
      })
      .join("");
  }
  if (cls.includes("sqrt")) {
    const body = stackItems(node).find((item) => !item.node.children.some((c) => has(c, "hide-tail")));
    if (body) return `√${group(inner(body.node).trim())}`;
  }
  const text = inner(node);
  return cls.includes("mrel") || cls.includes("mbin") ? ` ${text.trim()} ` : text;
}

/** @param {Element} node */
const inner = (node) => node.children.map(read).join("");

/**
 * One formula's KaTeX markup as a line of text.
 * @param {string} html the markup of one `<span class="katex">` element
 * @returns {string}
 */
export function katexToText(html) {
  return read(parse(html))
    .replace(/\s+/g, " ")
    .replace(/\s+([,.;)])/g, "$1")
    .replace(/\(\s+/g, "(")
    .trim();
}

/**
 * A page's HTML with each formula replaced by its text (for the search index only; the page
 * served is unchanged).
 * @param {string} page
 * @returns {string}
 */
export function withFormulasAsText(page) {
  let out = "";
  let at = 0;
  const open = '<span class="katex">';
  for (let start = page.indexOf(open); start >= 0; start = page.indexOf(open, at)) {
    // The element's end: the </span> that closes it, counting the spans opened inside.
    let depth = 0;
    let end = start;
    const spans = /<span\b|<\/span>/g;
    spans.lastIndex = start;
    for (let m = spans.exec(page); m; m = spans.exec(page)) {
      depth += m[0] === "</span>" ? -1 : 1;
      if (depth === 0) {
        end = m.index + m[0].length;
        break;
      }
    }
    if (end === start) break;
    out += `${page.slice(at, start)}<span class="formula-text">${katexToText(page.slice(start, end))}</span>`;
    at = end;
  }
  return out + page.slice(at);
}
