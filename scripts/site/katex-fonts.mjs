// Which KaTeX font files each built page really uses, found from the page's own markup and
// stylesheets: every piece of text inside rendered math gets the font family, weight and style the
// stylesheet's rules give it (as a browser would cascade them), and that is matched to the
// @font-face the browser would download. KaTeX's @font-face rules have no unicode-range, so a face
// is downloaded as soon as any text is set in it. Used to cut each face in use down to the characters
// the math sets in it, to precache only the fonts in use and to preload the faces every page with
// math needs (see `katexFontPreload`).
import { createHash } from "node:crypto";
import { readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { fileURLToPath } from "node:url";
import subsetFont from "subset-font";

/** Elements that never have a closing tag. */
const VOID = new Set(["area", "base", "br", "col", "embed", "hr", "img", "input", "link", "meta", "source", "track", "wbr"]);
/** Elements whose content is raw text, not markup. */
const RAW_TEXT = new Set(["script", "style", "textarea", "title"]);

const WEIGHTS = { normal: 400, bold: 700, lighter: 300, bolder: 700 };

/** @param {string} value */
const weightOf = (value) => WEIGHTS[value] ?? (Number.parseInt(value, 10) || 400);
/** @param {string} list a font-family list; its first family */
const firstFamily = (list) =>
  list
    .split(",")[0]
    .trim()
    .replace(/^["']|["']$/g, "");

/**
 * Splits CSS text into flat rules (at-rule conditions are not evaluated: a rule inside @media counts
 * as if it always applied) and @font-face blocks.
 * @param {string} css
 */
export function parseCss(css) {
  /** @type {{ selector: string, body: string }[]} */
  const rules = [];
  /** @type {string[]} */
  const fontFaces = [];
  const text = css.replace(/\/\*[\s\S]*?\*\//g, "");
  const walkBlock = (from, to) => {
    let i = from;
    while (i < to) {
      const open = text.indexOf("{", i);
      if (open < 0 || open >= to) return;
      const prelude = text.slice(i, open).trim();
      // find the matching brace
      let depth = 1;
      let j = open + 1;
      while (j < to && depth > 0) {
        if (text[j] === "{") depth += 1;
        else if (text[j] === "}") depth -= 1;
        j += 1;
      }
      const close = j - 1;
      if (prelude.startsWith("@font-face")) fontFaces.push(text.slice(open + 1, close));
      else if (prelude.startsWith("@")) {
        if (/^@(media|supports|layer|container)\b/.test(prelude)) walkBlock(open + 1, close);
      } else rules.push({ selector: prelude, body: text.slice(open + 1, close) });
      i = j;
    }
  };
  walkBlock(0, text.length);
  return { rules, fontFaces };
}

/** @param {string} body declarations */
function declarations(body) {
  return body
    .split(";")
    .map((d) => {
      const colon = d.indexOf(":");
      return colon < 0
        ? null
        : [
            d.slice(0, colon).trim().toLowerCase(),
            d
              .slice(colon + 1)
              .replace(/!important/, "")
              .trim(),
          ];
    })
    .filter((d) => d !== null);
}

/**
 * The font settings a declaration block makes: family, weight, style (each only if set). The
 * `font` shorthand resets weight and style to normal when it does not name them.
 * @param {string} body
 */
function fontSettings(body) {
  /** @type {{ family?: string, weight?: number, style?: string }} */
  const set = {};
  for (const [name, value] of declarations(body)) {
    if (name === "font-family") set.family = firstFamily(value);
    else if (name === "font-weight") set.weight = weightOf(value);
    else if (name === "font-style") set.style = value === "normal" ? "normal" : "italic";
    else if (name === "font") {
      // [style] [variant] [weight] size[/line-height] family[, family]…
      const match = /^(.*?)(?:^|\s)((?:[\d.]+(?:[a-z]+|%))|(?:xx?-small|small|medium|large|xx?-large|smaller|larger))(?:\/\S+)?\s+(.+)$/i.exec(value);
      if (!match) continue;
      set.weight = 400;
      set.style = "normal";
      for (const word of match[1].trim().split(/\s+/).filter(Boolean)) {
        if (word === "italic" || word === "oblique") set.style = "italic";
        else if (word in WEIGHTS || /^\d{3}$/.test(word)) set.weight = weightOf(word);
      }
      set.family = firstFamily(match[3]);
    }
  }
  return set;
}

/**
 * A selector as compounds from left to right, each with the combinator that joins it to the one
 * before; null for syntax this matcher does not handle (pseudo-classes, attributes, siblings).
 * @param {string} selector
 */
function parseSelector(selector) {
  const parts = selector
    .trim()
    .replace(/\s*>\s*/g, " > ")
    .split(/\s+/);
  /** @type {{ tag: string | null, classes: string[], combinator: " " | ">" }[]} */
  const compounds = [];
  let combinator = /** @type {" " | ">"} */ (" ");
  for (const part of parts) {
    if (part === ">") {
      combinator = ">";
      continue;
    }
    const m = /^([a-zA-Z][\w-]*|\*)?((?:\.[\w-]+)*)$/.exec(part);
    if (!m) return null;
    compounds.push({ tag: m[1] && m[1] !== "*" ? m[1].toLowerCase() : null, classes: m[2] ? m[2].slice(1).split(".") : [], combinator });
    combinator = " ";
  }
  return compounds.length ? compounds : null;
}

/** @param {{ tag: string | null, classes: string[] }} compound @param {{ tag: string, classes: Set<string> }} element */
const matchesCompound = (compound, element) => (!compound.tag || compound.tag === element.tag) && compound.classes.every((c) => element.classes.has(c));

/**
 * Whether the element at the top of `stack` matches `compounds` (right to left, with backtracking
 * over ancestors for descendant combinators).
 */
function matches(compounds, stack, index = compounds.length - 1, at = stack.length - 1) {
  if (!matchesCompound(compounds[index], stack[at])) return false;
  if (index === 0) return true;
  if (compounds[index].combinator === ">") return at > 0 && matches(compounds, stack, index - 1, at - 1);
  for (let up = at - 1; up >= 0; up -= 1) if (matches(compounds, stack, index - 1, up)) return true;
  return false;
}

/**
 * The font rules and faces of a page's stylesheets.
 * @param {string} css all the page's CSS, in document order
 */
export function fontRules(css) {
  const { rules, fontFaces } = parseCss(css);
  const faces = fontFaces.map((body) => {
    const d = Object.fromEntries(declarations(body));
    const woff2 = /url\(\s*["']?([^"')]+\.woff2)["']?\s*\)/.exec(d.src ?? "");
    return {
      family: firstFamily(d["font-family"] ?? ""),
      weight: weightOf(d["font-weight"] ?? "400"),
      style: d["font-style"] === "italic" ? "italic" : "normal",
      url: woff2?.[1] ?? null,
    };
  });
  /** @type {{ compounds: NonNullable<ReturnType<typeof parseSelector>>, specificity: number, order: number, set: ReturnType<typeof fontSettings> }[]} */
  const fontRuleList = [];
  rules.forEach((rule, order) => {
    const set = fontSettings(rule.body);
    if (!Object.keys(set).length) return;
    for (const selector of rule.selector.split(",")) {
      const compounds = parseSelector(selector);
      if (!compounds) {
        // Math text could be styled by a rule this matcher cannot read: fail loudly rather than
        // leave a font out of the offline cache.
        if (/katex/.test(selector)) throw new Error(`katex-fonts: cannot evaluate the selector "${selector.trim()}"`);
        continue;
      }
      const specificity = compounds.reduce((sum, c) => sum + c.classes.length * 1000 + (c.tag ? 1 : 0), 0);
      fontRuleList.push({ compounds, specificity, order, set });
    }
  });
  fontRuleList.sort((a, b) => a.specificity - b.specificity || a.order - b.order);
  return { faces, rules: fontRuleList };
}

/**
 * The font face (as its stylesheet URL) a browser picks for family/weight/style, following the
 * CSS font matching steps in short: same style if there is one, then the nearest weight.
 */
function pickFace(faces, family, weight, style) {
  const candidates = faces.filter((f) => f.family === family && f.url);
  if (!candidates.length) return null;
  const sameStyle = candidates.filter((f) => f.style === style);
  const pool = sameStyle.length ? sameStyle : candidates;
  return pool.reduce((best, f) => (Math.abs(f.weight - weight) < Math.abs(best.weight - weight) ? f : best)).url;
}

const ENTITIES = /** @type {Record<string, string>} */ ({ amp: "&", lt: "<", gt: ">", quot: '"', apos: "'", nbsp: "\u00a0" });
/** Text of an HTML text node, its character references decoded. @param {string} text */
const decodeText = (text) =>
  text.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (all, ref) =>
    ref[0] === "#"
      ? String.fromCodePoint(Number.parseInt(ref.slice(ref[1] === "x" || ref[1] === "X" ? 2 : 1), ref[1] === "x" || ref[1] === "X" ? 16 : 10))
      : (ENTITIES[ref] ?? all),
  );

/**
 * Font files used by the text inside rendered math (`.katex`) of one HTML page, with how many text
 * runs use each.
 * @param {string} html
 * @param {ReturnType<typeof fontRules>} fonts
 * @param {Map<string, Set<string>>} [chars] if given, receives every character set in each font file
 * @returns {Map<string, number>}
 */
export function katexFacesUsed(html, fonts, chars) {
  /** @type {Map<string, number>} */
  const used = new Map();
  /** @type {{ tag: string, classes: Set<string>, font: { family: string, weight: number, style: string } | null, math: boolean }[]} */
  const stack = [{ tag: "#root", classes: new Set(), font: null, math: false }];
  const token = /<!--[\s\S]*?-->|<!\w[^>]*>|<(\/?)([a-zA-Z][\w:-]*)((?:[^>"']|"[^"]*"|'[^']*')*)>|([^<]+)/g;
  let m = token.exec(html);
  while (m) {
    const [, closing, rawTag, attributes, text] = m;
    if (text !== undefined) {
      const top = stack[stack.length - 1];
      if (top.math && top.font && /[^ \t\r\n\f]/.test(text)) {
        const url = pickFace(fonts.faces, top.font.family, top.font.weight, top.font.style);
        if (url) used.set(url, (used.get(url) ?? 0) + 1);
        if (url && chars) {
          const set = chars.get(url) ?? new Set();
          for (const c of decodeText(text)) set.add(c);
          chars.set(url, set);
        }
      }
    } else if (rawTag) {
      const tag = rawTag.toLowerCase();
      if (closing) {
        const at = stack.map((e) => e.tag).lastIndexOf(tag);
        if (at > 0) stack.length = at;
      } else {
        const classes = new Set((/\bclass\s*=\s*"([^"]*)"/.exec(attributes)?.[1] ?? "").split(/\s+/).filter(Boolean));
        const parent = stack[stack.length - 1];
        const element = { tag, classes, font: parent.font, math: parent.math || classes.has("katex") };
        // MathML copies are visually hidden and set in the browser's math font, not KaTeX's.
        if (classes.has("katex-mathml")) element.math = false;
        stack.push(element);
        if (element.math) {
          let font = element.font ?? { family: "", weight: 400, style: "normal" };
          for (const rule of fonts.rules) {
            if (matches(rule.compounds, stack)) font = { ...font, ...rule.set };
          }
          element.font = font;
        }
        const selfClosing = /\/\s*$/.test(attributes);
        if (VOID.has(tag) || selfClosing) stack.pop();
        else if (RAW_TEXT.has(tag)) {
          const end = html.toLowerCase().indexOf(`</${tag}`, token.lastIndex);
          stack.pop();
          token.lastIndex = end < 0 ? html.length : html.indexOf(">", end) + 1;
        }
      }
    }
    m = token.exec(html);
  }
  return used;
}

function walk(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? walk(join(dir, entry.name)) : [join(dir, entry.name)]));
}

/**
 * For every HTML page of a build: the KaTeX font files its math uses (URLs as the stylesheets write
 * them) and how many text runs use each; `used` is their union over the site, `chars` the characters
 * set in each of them over the site, and `declared` every font the stylesheets declare.
 * @param {string} root the built site's folder
 * @param {string} base the base path the site was built with ("/" or "/sub/")
 */
export function katexFontUsage(root, base = "/") {
  const fileFor = (url) => join(root, (url.startsWith(base) ? url.slice(base.length) : url.replace(/^\//, "")).split(/[?#]/)[0]);
  /** @type {Map<string, ReturnType<typeof fontRules>>} */
  const byStylesheets = new Map();
  /** @type {Map<string, Map<string, number>>} */
  const pages = new Map();
  const declared = new Set();
  /** @type {Map<string, Set<string>>} */
  const chars = new Map();
  for (const file of walk(root).filter((f) => f.endsWith(".html"))) {
    const html = readFileSync(file, "utf8");
    const sheets = [...html.matchAll(/<link\b[^>]*\brel="stylesheet"[^>]*\bhref="([^"]+)"/g)].map((m) => m[1]);
    const key = sheets.join("\n");
    if (!byStylesheets.has(key)) byStylesheets.set(key, fontRules(sheets.map((href) => readFileSync(fileFor(href), "utf8")).join("\n")));
    const fonts = byStylesheets.get(key);
    for (const face of fonts.faces) if (face.url && /KaTeX_/.test(face.url)) declared.add(face.url);
    pages.set(relative(root, file).split(sep).join("/"), html.includes('class="katex"') ? katexFacesUsed(html, fonts, chars) : new Map());
  }
  const used = new Set([...pages.values()].flatMap((faces) => [...faces.keys()]));
  return { pages, used, chars, declared };
}

/**
 * Kept in every cut face beside the characters the math sets: spaces, the digits and parentheses
 * (KaTeX's stylesheet writes equation numbers as generated text, which no page's markup shows).
 */
export const ALWAYS_KEPT = " \u00a00123456789()";

/** A content hash for a file name, as the bundler writes them (8 characters, URL-safe). @param {string | Uint8Array} bytes */
const contentHash = (bytes) => createHash("sha256").update(bytes).digest("base64url").slice(0, 8);

/**
 * Cuts every KaTeX face the math uses down to the characters it sets in that face (and
 * ALWAYS_KEPT), in place of the full face: a face holds a few hundred glyphs and the handbook's math
 * uses a few dozen of them. Each cut face gets a file name after its new content, and so does each
 * stylesheet that names it (the pages are rewritten to the stylesheet's new name), so a browser that
 * keeps hashed files for a year never pairs a stylesheet with a face of another build. Faces no
 * formula uses are left as they are (and out of the offline cache, see precache.mjs).
 * @param {string} root the built site's folder
 * @param {string} base the base path the site was built with
 * @returns {Promise<{ url: string, before: number, after: number }[]>} the faces cut, with their sizes [B]
 */
export async function subsetKatexFonts(root, base = "/") {
  const fileFor = (/** @type {string} */ url) => join(root, url.startsWith(base) ? url.slice(base.length) : url.replace(/^\//, ""));
  const { chars } = katexFontUsage(root, base);
  /** @type {Map<string, string>} */
  const renamed = new Map();
  const report = [];
  for (const [url, set] of [...chars].sort(([a], [b]) => a.localeCompare(b))) {
    const full = readFileSync(fileFor(url));
    const cut = await subsetFont(full, [...set, ...ALWAYS_KEPT].join(""), { targetFormat: "woff2" });
    const to = url.replace(/(\.[\w-]+)?\.woff2$/, `.${contentHash(cut)}.woff2`);
    writeFileSync(fileFor(to), cut);
    if (to !== url) rmSync(fileFor(url));
    renamed.set(url, to);
    report.push({ url: to, before: full.length, after: cut.length });
  }
  const replaceAll = (/** @type {string} */ text, /** @type {Map<string, string>} */ names) => {
    let out = text;
    for (const [from, to] of names) out = out.split(from).join(to);
    return out;
  };
  /** @type {Map<string, string>} */
  const sheets = new Map();
  const files = walk(root);
  for (const file of files.filter((f) => f.endsWith(".css"))) {
    const css = readFileSync(file, "utf8");
    const next = replaceAll(css, renamed);
    if (next === css) continue;
    const to = file.replace(/(\.[\w-]+)?\.css$/, `.${contentHash(next)}.css`);
    writeFileSync(to, next);
    if (to !== file) rmSync(file);
    const url = (/** @type {string} */ f) => base + relative(root, f).split(sep).join("/");
    sheets.set(url(file), url(to));
  }
  for (const file of files.filter((f) => /\.(html|m?js|json)$/.test(f))) {
    const text = readFileSync(file, "utf8");
    const next = replaceAll(text, sheets);
    if (next !== text) writeFileSync(file, next);
  }
  return report;
}

/**
 * The faces to preload: those every page with math uses, most used first, at most `limit`.
 * @param {Map<string, Map<string, number>>} pages
 */
export function commonFaces(pages, limit = 2) {
  const withMath = [...pages.values()].filter((faces) => faces.size > 0);
  if (!withMath.length) return [];
  const totals = new Map();
  for (const faces of withMath) for (const [url, count] of faces) totals.set(url, (totals.get(url) ?? 0) + count);
  return [...totals.keys()]
    .filter((url) => withMath.every((faces) => faces.has(url)))
    .sort((a, b) => totals.get(b) - totals.get(a) || a.localeCompare(b))
    .slice(0, limit);
}

/**
 * Astro integration: cuts the KaTeX faces in use to the characters the math sets in them
 * (`subsetKatexFonts`), then on every page with math preloads the faces that every such page uses
 * (found by `katexFontUsage`), so the formulas' fonts download with the stylesheet instead of after it.
 */
export function katexFontPreload() {
  let base = "/";
  return {
    name: "whirlbook:katex-font-preload",
    hooks: {
      "astro:config:done": ({ config }) => {
        base = config.base.endsWith("/") ? config.base : `${config.base}/`;
      },
      "astro:build:done": async ({ dir, logger }) => {
        const root = fileURLToPath(dir);
        const cut = await subsetKatexFonts(root, base);
        const kb = (/** @type {number} */ bytes) => (bytes / 1024).toFixed(1);
        const sum = (/** @type {"before" | "after"} */ key) => cut.reduce((total, face) => total + face[key], 0);
        logger.info(`KaTeX faces in use cut to the characters the math sets: ${kb(sum("before"))} → ${kb(sum("after"))} KB`);
        const { pages, used, declared } = katexFontUsage(root, base);
        const preload = commonFaces(pages);
        for (const [page, faces] of pages) {
          const wanted = preload.filter((url) => faces.has(url));
          if (!wanted.length) continue;
          const file = join(root, page);
          const html = readFileSync(file, "utf8");
          if (!html.includes("</head>")) throw new Error(`katex-font-preload: ${page} has no </head>`);
          const links = wanted.map((url) => `<link rel="preload" href="${url}" as="font" type="font/woff2" crossorigin>`).join("");
          writeFileSync(file, html.replace("</head>", `${links}</head>`));
        }
        const names = (urls) => [...urls].map((u) => u.replace(/^.*\/(KaTeX_[^.]+)\..*$/, "$1")).join(", ");
        logger.info(`math uses ${used.size} of ${declared.size} KaTeX fonts (${names(used)}); preloading ${names(preload)}`);
      },
    },
  };
}
