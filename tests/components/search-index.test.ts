// @vitest-environment happy-dom
/**
 * A page as the search reads it (components/search/page-text.ts): sections at headings with an id,
 * plain text with formulas as text, and nothing from the calculators, navigation, charts or what is
 * marked .no-search.
 */
import { describe, expect, it } from "vitest";
import katex from "katex";
import { pageSections } from "../../components/search/page-text.ts";

const page = (main: string) =>
  new DOMParser().parseFromString(
    `<!doctype html><html><head><title>T — Handbook</title></head><body><nav class="site-nav">Home Search</nav><main>${main}</main></body></html>`,
    "text/html",
  );

describe("a page as the search reads it", () => {
  it("takes the title from the page's h1 and starts a section at each heading with an id", () => {
    const read = pageSections(
      page('<h1>Tip speed</h1><p>Lead.</p><h2 id="physics">The physics</h2><p>One.</p><h3>No id</h3><p>Two.</p><h3 id="more">More</h3><p>Three.</p>'),
    );
    expect(read).toEqual({
      title: "Tip speed",
      sections: [
        { anchor: "", heading: "", text: "Lead." },
        { anchor: "physics", heading: "The physics", text: "One. No id Two." },
        { anchor: "more", heading: "More", text: "Three." },
      ],
    });
  });

  it("keeps block elements' words apart and inline ones together", () => {
    const read = pageSections(page("<table><caption>Classes</caption><tr><th>Class</th><th>R<sub>m</sub></th></tr></table><p>a<em>b</em> c</p>"));
    expect(read.sections[0]!.text).toBe("Classes Class Rm ab c");
  });

  it("reads formulas as text", () => {
    const formula = katex.renderToString("a = \\omega^2 r", { output: "mathml" });
    expect(pageSections(page(`<p>So ${formula}.</p>`)).sections[0]!.text).toBe("So a = ω²r.");
  });

  it("leaves out calculators, navigation, charts, buttons and .no-search", () => {
    const read = pageSections(
      page(
        '<p>Kept.</p><section class="calc"><label>Radius</label></section><nav class="chapter-nav">Next</nav><div class="chart">12</div><button>Copy</button><span class="no-search">p. 4</span>',
      ),
    );
    expect(read.sections).toEqual([{ anchor: "", heading: "", text: "Kept." }]);
  });
});
