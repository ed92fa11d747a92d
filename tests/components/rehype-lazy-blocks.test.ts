/**
 * Which of a chapter's blocks the build lets the browser draw late (scripts/site/rehype-lazy-blocks.mjs):
 * everything past the opening that is safe to hold at a guessed height until it nears the screen.
 */
import { describe, expect, it } from "vitest";
import { fromHtml } from "hast-util-from-html";
import { toHtml } from "hast-util-to-html";
import { estimatedLines, lazyClasses, rehypeLazyBlocks } from "../../scripts/site/rehype-lazy-blocks.mjs";

const marked = (html: string) => {
  const tree = fromHtml(html, { fragment: true });
  rehypeLazyBlocks()(tree);
  return tree.children
    .filter((n) => n.type === "element")
    .map((n) => `${n.tagName}${(n.properties.className as string[] | undefined)?.includes("lazy-block") ? "*" : ""}`);
};

describe("the blocks a chapter lets the browser draw when they near the screen", () => {
  it("leaves the opening, the first section heading and the two blocks after it as they are, and marks the rest", () => {
    expect(marked('<p class="lede">a</p><p>b</p><h2 id="x">X</h2><p>c</p><p>d</p><p>e</p><ul><li>f</li></ul><table><tr><td>g</td></tr></table>')).toEqual([
      "p",
      "p",
      "h2",
      "p",
      "p",
      "p*",
      "ul*",
      "table*",
    ]);
  });

  it("keeps headings, blocks with an id, code listings and blocks holding a picture or a chart drawn", () => {
    expect(
      marked(
        '<h2>X</h2><p>1</p><p>2</p><h3 id="y">Y</h3><p id="z">z</p><pre>code</pre><p>an <svg></svg></p><div><img alt="" src="a.png"></div><p>a <a href="#y">link</a></p>',
      ),
    ).toEqual(["h2", "p", "p", "h3", "p", "pre", "p", "div", "p*"]);
  });

  it("marks a display formula (its wrapper is focusable itself, so it stays reachable) and keeps a class it had", () => {
    const tree = fromHtml('<h2>X</h2><p>1</p><p>2</p><span class="katex formula" tabindex="0"><math display="block"><mi>x</mi></math></span>', {
      fragment: true,
    });
    rehypeLazyBlocks()(tree);
    expect(toHtml(tree)).toMatch(/<span class="katex formula lazy-block lazy-h-\d+" tabindex="0">/);
  });

  it("marks a <div> or <table> written in MDX through its class attribute, and leaves components alone", () => {
    const jsx = (name: string, attributes: unknown[] = []) => ({ type: "mdxJsxFlowElement", name, attributes, children: [] });
    const worked = jsx("div", [{ type: "mdxJsxAttribute", name: "class", value: "worked" }]);
    const table = {
      ...jsx("table", [{ type: "mdxJsxAttribute", name: "tabindex", value: "0" }]),
      children: [{ type: "mdxFlowExpression", value: "rows.map(row)" }],
    };
    const calculator = jsx("Calculator");
    const anchored = jsx("div", [{ type: "mdxJsxAttribute", name: "id", value: "here" }]);
    const tree = {
      type: "root",
      children: [{ type: "element", tagName: "h2", properties: {}, children: [] }, jsx("SafetyNotice"), jsx("aside"), worked, table, calculator, anchored],
    };
    rehypeLazyBlocks()(tree);
    const classOf = (node: { attributes: unknown[] }) => (node.attributes as { name: string; value: string }[]).find((a) => a.name === "class")?.value;
    expect(classOf(worked)).toBe("worked lazy-block lazy-h-4");
    // Rows built by an expression count as many: the table is held tall rather than short.
    expect(classOf(table)).toBe("lazy-block lazy-h-128");
    expect(calculator.attributes).toEqual([]);
    expect(anchored.attributes).toHaveLength(1);
  });

  it("holds a block at a height estimated on the high side, in steps", () => {
    const block = (html: string) => fromHtml(html, { fragment: true }).children[0];
    const short = estimatedLines(block("<p>One short line.</p>"));
    const long = estimatedLines(block(`<p>${"word ".repeat(200)}</p>`));
    // 1 000 characters at 30 a line (a 320 px phone) are 34 lines; held at 1.4 times that, plus one.
    expect(long).toBeCloseTo(1.4 * (999 / 30 + 1.5) + 1, 6);
    expect(short).toBeLessThan(4);
    expect(estimatedLines(block("<table><tr><td>a</td></tr><tr><td>b</td></tr></table>"))).toBeCloseTo(2 + 4 * 2 + 2 / 60, 6);
    expect(lazyClasses(short)).toEqual(["lazy-block", "lazy-h-4"]);
    expect(lazyClasses(long)).toEqual(["lazy-block", "lazy-h-64"]);
    expect(lazyClasses(1e6)).toEqual(["lazy-block", "lazy-h-384"]);
  });
});
