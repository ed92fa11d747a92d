/**
 * Prefixes root-absolute links in Markdown/MDX ("/chapters/x/") with the site's base path, which
 * Astro does not do by itself. Links to other origins, fragments and relative links are untouched.
 * @param {{ base?: string }} options
 */
export function rehypeBaseLinks({ base = "/" } = {}) {
  const prefix = base.endsWith("/") ? base.slice(0, -1) : base;
  /** @param {any} node */
  const visit = (node) => {
    if (node.type === "element" && node.tagName === "a" && typeof node.properties?.href === "string") {
      const href = node.properties.href;
      if (prefix && href.startsWith("/") && !href.startsWith("//") && !href.startsWith(`${prefix}/`)) {
        node.properties.href = prefix + href;
      }
    }
    for (const child of node.children ?? []) visit(child);
  };
  return (/** @type {any} */ tree) => visit(tree);
}
