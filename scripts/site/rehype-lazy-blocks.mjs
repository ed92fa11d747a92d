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
// a block with an id, code listings, and a block holding a picture or a chart (one laid out late
// would measure a width of 0). The calculator itself (components/calc-ui/Calculator.astro) and the
// sources (components/ui/SourceList.astro) carry the class from their own components; a component
// in the MDX is left alone, except a plain <div>, <section>, <aside> or <table> written there.

/** Elements a block may not hold to be marked: they measure their own size when drawn. */
const MEASURED = new Set(["svg", "img", "picture", "video", "canvas", "iframe", "object", "embed"]);
const NEVER = new Set(["h1", "h2", "h3", "h4", "h5", "h6", "pre", "hr", "script", "style", "template"]);
const JSX_BLOCKS = new Set(["div", "section", "aside", "table"]);
/** How many blocks after the first section heading stay rendered (about the rest of a phone's first screen). */
const KEEP_AFTER_FIRST_HEADING = 2;
export const LAZY_CLASS = "lazy-block";

/** @param {any} node */
function measured(node) {
  if ((node.type === "element" && MEASURED.has(node.tagName)) || (node.type === "mdxJsxFlowElement" && MEASURED.has(node.name))) return true;
  return (node.children ?? []).some(measured);
}

/** @param {any} node @returns {any} the node's `class` attribute, for an MDX JSX element */
const jsxClass = (node) => node.attributes?.find((/** @type {any} */ a) => a.type === "mdxJsxAttribute" && (a.name === "class" || a.name === "className"));

/** @param {any} node a top-level node of the chapter */
export function markable(node) {
  if (node.type === "element") return !NEVER.has(node.tagName) && node.properties?.id == null && !measured(node);
  if (node.type === "mdxJsxFlowElement") {
    if (!JSX_BLOCKS.has(node.name) || measured(node)) return false;
    const cls = jsxClass(node);
    const hasId = node.attributes?.some((/** @type {any} */ a) => a.type === "mdxJsxAttribute" && a.name === "id");
    return !hasId && (cls === undefined || typeof cls.value === "string");
  }
  return false;
}

/** @param {any} node */
function mark(node) {
  if (node.type === "element") {
    const classes = Array.isArray(node.properties.className) ? node.properties.className : [];
    node.properties.className = [...classes, LAZY_CLASS];
    return;
  }
  const cls = jsxClass(node);
  if (cls) cls.value = `${cls.value} ${LAZY_CLASS}`;
  else node.attributes = [...(node.attributes ?? []), { type: "mdxJsxAttribute", name: "class", value: LAZY_CLASS }];
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
