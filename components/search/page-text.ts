/**
 * A page's text for search, read from the page itself (the built HTML, fetched on the first search:
 * from the offline copy once it is saved): the page's own section, then one per heading with an id,
 * with formulas as text and without what a search is not for (the calculators, the navigation,
 * charts, buttons and menus, anything marked .no-search). Plain text only: no markup is kept.
 */
import { mathToText } from "./math-text.mjs";

export interface PageSection {
  /** The heading's id ("" for the text before the first heading). */
  anchor: string;
  heading: string;
  text: string;
}
export interface PageText {
  title: string;
  sections: PageSection[];
}

/** Elements whose class names one of these are not searched. */
export const NOT_SEARCHED = ["calc", "site-nav", "chapter-nav", "chart", "no-search"];
/** Elements whose text is never page text. */
const SKIPPED = new Set(["script", "style", "template", "noscript", "svg", "nav", "button", "select"]);
/** Elements that end a run of text: their words stay apart from the next element's. */
const BLOCK = new Set(
  "p li dt dd td th tr caption table figure figcaption blockquote pre div section article aside header footer ul ol dl br hr h1 h2 h3 h4 h5 h6".split(" "),
);

const clean = (text: string) => text.replace(/\s+/g, " ").trim();

/** The sections of a parsed page (DOMParser's document, or the page's own). */
export function pageSections(doc: Document): PageText {
  let title = clean(doc.querySelector("main h1")?.textContent ?? doc.title);
  const sections: PageSection[] = [{ anchor: "", heading: "", text: "" }];
  let parts: string[] = [];
  const close = () => {
    sections[sections.length - 1]!.text = clean(parts.join(""));
    parts = [];
  };
  const walk = (node: Node) => {
    if (node.nodeType === 3) {
      parts.push(node.nodeValue ?? "");
      return;
    }
    if (node.nodeType !== 1) return;
    const element = node as Element;
    const tag = element.localName;
    if (SKIPPED.has(tag) || NOT_SEARCHED.some((c) => element.classList.contains(c))) return;
    if (tag === "math") {
      parts.push(mathToText(element.outerHTML));
      return;
    }
    if (tag === "h1") {
      title = clean(element.textContent ?? "");
      return;
    }
    if (/^h[2-6]$/.test(tag) && element.id) {
      close();
      sections.push({ anchor: element.id, heading: clean(element.textContent ?? ""), text: "" });
      return;
    }
    for (const child of element.childNodes) walk(child);
    if (BLOCK.has(tag)) parts.push(" ");
  };
  const main = doc.querySelector("main");
  if (main) walk(main);
  close();
  return { title, sections: sections.filter((s) => s.text || s.heading) };
}
