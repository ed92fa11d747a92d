// The pages' search index: each built page's text in sections (the page's own, then one per heading
// with an id), with formulas as text and without what a search is not for (the calculators, the
// navigation, charts, anything marked .no-search). Written after the build as search-pages.json;
// the search page loads it on the first search and indexes it in the browser
// (components/search/search.ts, with MiniSearch). Plain text only: no markup reaches the page.
import { fromHtml } from "hast-util-from-html";
import { withFormulasAsText } from "./math-text.mjs";

/** Elements whose class names one of these are left out of the index. */
export const NOT_SEARCHED = ["calc", "site-nav", "chapter-nav", "chart", "no-search"];
/** Elements whose text is never page text. */
const SKIPPED_TAGS = new Set(["script", "style", "template", "noscript", "svg", "nav", "button", "select", "math"]);
/** Elements that end a run of text: their text is kept apart from the next element's. */
const BLOCK = new Set([
  ..."p li dt dd td th tr caption table figure figcaption blockquote pre div section article aside header footer ul ol dl br hr h1 h2 h3 h4 h5 h6".split(" "),
]);

/**
 * @typedef {{ anchor: string, heading: string, text: string }} Section
 * @typedef {{ title: string, sections: Section[] }} PageText
 */

/**
 * A built page's text for search, in sections.
 * @param {string} html the page as built
 * @returns {PageText}
 */
export function pageSections(html) {
  const tree = fromHtml(withFormulasAsText(html));
  /** @type {any} */
  let main;
  /** @type {string} */
  let title = "";
  const find = (/** @type {any} */ node) => {
    if (main) return;
    if (node.type === "element" && node.tagName === "main") main = node;
    else if (node.type === "element" && node.tagName === "title" && !title) title = textOf(node).trim();
    for (const child of node.children ?? []) find(child);
  };
  find(tree);
  /** @type {Section[]} */
  const sections = [{ anchor: "", heading: "", text: "" }];
  /** @type {string[]} */
  let parts = [];
  const close = () => {
    sections[sections.length - 1].text = parts.join("").replace(/\s+/g, " ").trim();
    parts = [];
  };
  const walk = (/** @type {any} */ node) => {
    if (node.type === "text") {
      parts.push(node.value);
      return;
    }
    if (node.type !== "element") return;
    const classes = node.properties?.className ?? [];
    if (SKIPPED_TAGS.has(node.tagName) || NOT_SEARCHED.some((c) => classes.includes(c))) return;
    if (node.tagName === "h1") {
      title = textOf(node).replace(/\s+/g, " ").trim();
      return;
    }
    if (/^h[2-6]$/.test(node.tagName) && node.properties?.id) {
      close();
      sections.push({ anchor: String(node.properties.id), heading: textOf(node).replace(/\s+/g, " ").trim(), text: "" });
      return;
    }
    for (const child of node.children ?? []) walk(child);
    if (BLOCK.has(node.tagName)) parts.push(" ");
  };
  if (main) walk(main);
  close();
  return { title, sections: sections.filter((s) => s.text || s.heading) };
}

/** @param {any} node @returns {string} */
function textOf(node) {
  if (node.type === "text") return node.value;
  return (node.children ?? []).map(textOf).join("");
}
