// Marks the chapter's blocks that the browser may leave unrendered until they come near the screen
// (class "lazy-block", styled `content-visibility: auto` in components/layout/site.css). On a slow
// phone the first style and layout of a long chapter (its paragraphs, formulas, tables, worked
// example) was the page load's longest task; with every block past the opening marked, that first
// layout covers about one screen.
//
// Skipped content stays in the page: find-in-page, keyboard focus and links into it reveal it (CSS
// Containment Level 2, "content-visibility: auto"), and it is in the accessibility tree.
//
// Marked: each top-level block after the chapter's first section heading and the two blocks after
// it (the opening stays as it is). Not marked: headings (link targets keep their real positions),
// a block with an id, code listings, and a block holding a picture or a drawing (prose has no code
// to redraw one at the width it is shown at once drawn; a calculator's charts do). The calculator
// itself (components/calc-ui/Calculator.astro) and the sources (components/ui/SourceList.astro)
// carry the class from their own components; a component in the MDX is left alone, except a plain
// <div>, <section>, <aside> or <table> written there.

/** Elements a block may not hold to be marked: they measure their own size when drawn. */
const MEASURED = new Set(["svg", "img", "picture", "video", "canvas", "iframe", "object", "embed"]);
const NEVER = new Set(["h1", "h2", "h3", "h4", "h5", "h6", "pre", "hr", "script", "style", "template"]);
const JSX_BLOCKS = new Set(["div", "section", "aside", "table"]);
/** How many blocks after the first section heading stay rendered (about the rest of a phone's first screen). */
const KEEP_AFTER_FIRST_HEADING = 2;
const LAZY_CLASS = "lazy-block";

/** @param {any} node */
function measured(node) {
  if ((node.type === "element" && MEASURED.has(node.tagName)) || (node.type === "mdxJsxFlowElement" && MEASURED.has(node.name))) return true;
  return (node.children ?? []).some(measured);
}

/** @param {any} node */
const classesOf = (node) => (Array.isArray(node.properties?.className) ? node.properties.className : []);
/** @param {any} node a display formula (scripts/site/rehype-math.mjs gives its wrapper the class "formula") */
const isFormula = (node) => node.tagName === "span" && classesOf(node).includes("formula");
/** @param {any} node @returns {any} the node's `class` attribute, for an MDX JSX element */
const jsxClass = (node) => node.attributes?.find((/** @type {any} */ a) => a.type === "mdxJsxAttribute" && (a.name === "class" || a.name === "className"));

/** @param {any} node a top-level node of the chapter */
function markable(node) {
  if (node.type === "element") return !NEVER.has(node.tagName) && node.properties?.id == null && !measured(node);
  if (node.type === "mdxJsxFlowElement") {
    if (!JSX_BLOCKS.has(node.name) || measured(node)) return false;
    const cls = jsxClass(node);
    const hasId = node.attributes?.some((/** @type {any} */ a) => a.type === "mdxJsxAttribute" && a.name === "id");
    return !hasId && (cls === undefined || typeof cls.value === "string");
  }
  return false;
}

/**
 * The heights (in lines of the block's own text) a block may be held at before it is drawn; the
 * stylesheet gives each its `contain-intrinsic-size` (`lazy-h-<lines>`).
 */
const HEIGHT_STEPS = [4, 6, 8, 12, 16, 24, 32, 48, 64, 96, 128, 192, 256, 384];
/** Characters of running text per line on a 320 px phone (the narrowest screen the site is laid out for), rounded down. */
const CHARACTERS_PER_LINE = 30;
/** What a quantity tag <Q> prints, at most: "1.26 kg·m² (4 310 lb·in²)". */
const QUANTITY_CHARACTERS = 26;

/** @param {any} node @param {(n: any) => boolean} test */
const count = (node, test) => (test(node) ? 1 : 0) + (node.children ?? []).reduce((/** @type {number} */ sum, /** @type {any} */ c) => sum + count(c, test), 0);
/** @param {any} node */
const textLength = (node) =>
  node.type === "text"
    ? node.value.trim().length
    : node.type === "mdxJsxTextElement" && node.name === "Q"
      ? QUANTITY_CHARACTERS
      : (node.children ?? []).reduce((/** @type {number} */ sum, /** @type {any} */ c) => sum + textLength(c), 0);
/** @param {any} node @param {string} name */
const isTag = (node, name) => (node.type === "element" && node.tagName === name) || (node.type === "mdxJsxFlowElement" && node.name === name);

/**
 * Lines of running text on a narrow phone, over-estimated: `characters` of text in `blocks`
 * paragraphs, list items or entries (each adds a line and a half of spacing).
 * @param {number} characters
 * @param {number} blocks
 */
export const textLines = (characters, blocks) => 1.4 * (characters / CHARACTERS_PER_LINE + 1.5 * blocks) + 1;

/**
 * How many lines a block takes on a narrow phone, over-estimated on purpose: a block held shorter
 * than it is drawn would, when measured while not drawn (as an accessibility checker measures
 * every element), reach over the blocks after it.
 * @param {any} node
 */
export function estimatedLines(node) {
  if (isFormula(node)) return 3 + 2 * count(node, (n) => isTag(n, "mfrac") || isTag(n, "mtr"));
  // A table written in MDX may build its rows in an expression ({rows.map(…)}): each such expression counts as 30 rows.
  if (isTag(node, "table"))
    return (
      2 + 4 * (count(node, (n) => isTag(n, "tr")) + 30 * count(node, (n) => n.type === "mdxFlowExpression")) + textLength(node) / (2 * CHARACTERS_PER_LINE)
    );
  const blocks = count(node, (n) => ["p", "li", "dt", "dd", "h3", "h4", "tr", "div", "figure"].some((t) => isTag(n, t)));
  return textLines(textLength(node), blocks);
}

/**
 * The classes of a block held until drawn at about `lines` lines (the next height step up); for
 * the calculator and the sources, which their own components mark.
 * @param {number} lines
 */
export function lazyClasses(lines) {
  const step = HEIGHT_STEPS.find((h) => h >= lines) ?? HEIGHT_STEPS[HEIGHT_STEPS.length - 1];
  return [LAZY_CLASS, `lazy-h-${step}`];
}

/** @param {any} node */
function mark(node) {
  const added = lazyClasses(estimatedLines(node));
  if (node.type === "element") {
    node.properties.className = [...classesOf(node), ...added];
    return;
  }
  const cls = jsxClass(node);
  if (cls) cls.value = `${cls.value} ${added.join(" ")}`;
  else node.attributes = [...(node.attributes ?? []), { type: "mdxJsxAttribute", name: "class", value: added.join(" ") }];
}

export function rehypeLazyBlocks() {
  return (/** @type {any} */ tree) => {
    let seen = -1;
    for (const node of tree.children ?? []) {
      if (node.type !== "element" && node.type !== "mdxJsxFlowElement") continue;
      if (seen < 0) {
        if (node.type === "element" && node.tagName === "h2") seen = 0;
        continue;
      }
      seen += 1;
      if (seen > KEEP_AFTER_FIRST_HEADING && markable(node)) mark(node);
    }
  };
}
