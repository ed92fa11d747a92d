// The math font: the one face the formulas are drawn in (components/layout/math.css), cut at build
// time to the characters the built pages' MathML sets, renamed after its new content, and preloaded
// by every page with a formula.
import { createHash } from "node:crypto";
import { readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { fileURLToPath } from "node:url";
import subsetFont from "subset-font";
import { decode } from "../../components/search/math-text.mjs";
import { mathItalic } from "./rehype-math.mjs";

/** The face's file as the bundler names it (the package's file name, then a content hash). */
export const MATH_FONT = /noto-sans-math-[\w-]*?\.[\w-]+\.woff2$/;

/**
 * Kept beside the characters the formulas set: spaces, digits, parentheses and the usual operators,
 * so a formula added to a page by hand while editing still draws in the same face.
 */
export const ALWAYS_KEPT = " \u00a00123456789()+−=";

/** @param {string} dir @returns {string[]} */
function walk(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? walk(join(dir, entry.name)) : [join(dir, entry.name)]));
}

/**
 * The characters a browser draws for a page's formulas: the text of every <math> element, and for
 * each single-letter identifier without a mathvariant its mathematical italic, which is what MathML
 * Core draws for it.
 * @param {string} html
 * @returns {Set<string>}
 */
export function mathCharacters(html) {
  const chars = new Set();
  for (const [formula] of html.matchAll(/<math\b[\s\S]*?<\/math>/g)) {
    for (const m of formula.matchAll(/>([^<]+)</g)) for (const c of decode(m[1])) chars.add(c);
    for (const m of formula.matchAll(/<mi>([^<]+)<\/mi>/g)) {
      const text = [...decode(m[1])];
      if (text.length === 1) chars.add(mathItalic(text[0]));
    }
  }
  return chars;
}

/**
 * Which built pages set formulas, the math face's URL (from the stylesheets they link or carry
 * inline) and the characters all formulas use.
 * @param {string} root the built site's folder
 * @param {string} base the base path the site was built with ("/" or "/sub/")
 */
export function mathFontUsage(root, base = "/") {
  const fileFor = (/** @type {string} */ url) => join(root, (url.startsWith(base) ? url.slice(base.length) : url.replace(/^\//, "")).split(/[?#]/)[0]);
  /** @type {Map<string, boolean>} */
  const pages = new Map();
  /** @type {Set<string>} */
  const fonts = new Set();
  /** @type {Set<string>} */
  const chars = new Set();
  /** @type {Set<string>} */
  const sheetsRead = new Set();
  for (const file of walk(root).filter((f) => f.endsWith(".html"))) {
    const html = readFileSync(file, "utf8");
    const page = relative(root, file).split(sep).join("/");
    const used = mathCharacters(html);
    pages.set(page, used.size > 0);
    for (const c of used) chars.add(c);
    const css = [...html.matchAll(/<style\b[^>]*>([\s\S]*?)<\/style>/g)].map((m) => m[1]);
    for (const [, href] of html.matchAll(/<link\b[^>]*\brel="stylesheet"[^>]*\bhref="([^"]+)"/g)) {
      if (sheetsRead.has(href)) continue;
      sheetsRead.add(href);
      css.push(readFileSync(fileFor(href), "utf8"));
    }
    for (const text of css) for (const [, url] of text.matchAll(/url\(["']?([^)"']+)["']?\)/g)) if (MATH_FONT.test(url)) fonts.add(url);
  }
  return { pages, fonts: [...fonts].sort(), chars };
}

/** A content hash for a file name, as the bundler writes them (8 characters, URL-safe). @param {string | Uint8Array} bytes */
const contentHash = (bytes) => createHash("sha256").update(bytes).digest("base64url").slice(0, 8);

/**
 * Cuts the math face down to the characters the formulas use (and ALWAYS_KEPT): the face holds some
 * 3 000 characters and the handbook's formulas use about a hundred; the glyphs its MATH table builds
 * on them (larger and stretched brackets, radicals, accents) come along. The cut face is named after
 * its content, and so is every stylesheet file that names it (pages are rewritten to the new names,
 * and their inline stylesheets to the face's), so a browser that keeps hashed files for a year never
 * pairs a stylesheet with a face of another build.
 * @param {string} root the built site's folder
 * @param {string} base the base path the site was built with
 * @returns {Promise<{ url: string, before: number, after: number, characters: number }[]>}
 */
export async function subsetMathFont(root, base = "/") {
  const fileFor = (/** @type {string} */ url) => join(root, url.startsWith(base) ? url.slice(base.length) : url.replace(/^\//, ""));
  const { fonts, chars } = mathFontUsage(root, base);
  /** @type {Map<string, string>} */
  const renamed = new Map();
  const report = [];
  const text = [...new Set([...chars, ...ALWAYS_KEPT])].join("");
  for (const url of fonts) {
    const full = readFileSync(fileFor(url));
    const cut = await subsetFont(full, text, { targetFormat: "woff2" });
    const to = url.replace(/(\.[\w-]+)?\.woff2$/, `.${contentHash(cut)}.woff2`);
    writeFileSync(fileFor(to), cut);
    if (to !== url) rmSync(fileFor(url));
    renamed.set(url, to);
    report.push({ url: to, before: full.length, after: cut.length, characters: [...text].length });
  }
  const replaceAll = (/** @type {string} */ content, /** @type {Map<string, string>} */ names) => {
    let out = content;
    for (const [from, to] of names) out = out.split(from).join(to);
    return out;
  };
  /** @type {Map<string, string>} */
  const sheets = new Map();
  const files = walk(root);
  const urlOf = (/** @type {string} */ f) => base + relative(root, f).split(sep).join("/");
  for (const file of files.filter((f) => f.endsWith(".css"))) {
    const css = readFileSync(file, "utf8");
    const next = replaceAll(css, renamed);
    if (next === css) continue;
    const to = file.replace(/(\.[\w-]+)?\.css$/, `.${contentHash(next)}.css`);
    writeFileSync(to, next);
    if (to !== file) rmSync(file);
    sheets.set(urlOf(file), urlOf(to));
  }
  // Pages name the renamed stylesheets, and carry the face's URL in their inline stylesheets.
  for (const file of files.filter((f) => /\.(html|m?js|json)$/.test(f))) {
    const content = readFileSync(file, "utf8");
    const next = replaceAll(replaceAll(content, sheets), file.endsWith(".html") ? renamed : new Map());
    if (next !== content) writeFileSync(file, next);
  }
  return report;
}

/**
 * Astro integration: cuts the math face (`subsetMathFont`), then has every page with a formula
 * preload it, so it downloads with the stylesheet instead of after it.
 */
export function mathFont() {
  let base = "/";
  return {
    name: "whirlbook:math-font",
    hooks: {
      "astro:config:done": ({ config }) => {
        base = config.base.endsWith("/") ? config.base : `${config.base}/`;
      },
      "astro:build:done": async ({ dir, logger }) => {
        const root = fileURLToPath(dir);
        const cut = await subsetMathFont(root, base);
        const kb = (/** @type {number} */ bytes) => (bytes / 1024).toFixed(1);
        for (const face of cut) logger.info(`math face cut to the ${face.characters} characters the formulas use: ${kb(face.before)} → ${kb(face.after)} KB`);
        const { pages, fonts } = mathFontUsage(root, base);
        for (const [page, usesMath] of pages) {
          if (!usesMath || !fonts.length) continue;
          const file = join(root, page);
          const html = readFileSync(file, "utf8");
          if (!html.includes("</head>")) throw new Error(`math-font: ${page} has no </head>`);
          const links = fonts.map((url) => `<link rel="preload" href="${url}" as="font" type="font/woff2" crossorigin>`).join("");
          writeFileSync(file, html.replace("</head>", `${links}</head>`));
        }
      },
    },
  };
}
