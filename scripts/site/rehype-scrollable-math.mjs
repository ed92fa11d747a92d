/**
 * Display formulas scroll sideways on narrow screens; a scrollable region must be reachable by
 * keyboard, so each KaTeX display block gets tabindex="0" and a label.
 */
export function rehypeScrollableMath() {
  /** @param {any} node */
  const visit = (node) => {
    if (node.type === "element") {
      const className = node.properties?.className;
      if (Array.isArray(className) && className.includes("katex-display")) {
        node.properties.tabIndex = 0;
        node.properties.role = "group";
        node.properties.ariaLabel = "Formula (scrolls sideways on narrow screens)";
      }
    }
    for (const child of node.children ?? []) visit(child);
  };
  return (/** @type {any} */ tree) => visit(tree);
}
