/**
 * The HTML the search index reads (scripts/site/offline-and-search.mjs): ids only on headings, so
 * pagefind stores headings alone as anchors, table headers kept apart, and formulas as text;
 * everything else as served.
 */
import { describe, expect, it } from "vitest";
import { htmlForSearch } from "../../scripts/site/offline-and-search.mjs";

describe("a page as the search index reads it", () => {
  it("keeps the id of every heading level, h1 to h6", () => {
    const html = [1, 2, 3, 4, 5, 6].map((n) => `<h${n} id="part-${n}">Part ${n}</h${n}>`).join("");
    expect(htmlForSearch(html)).toBe(html);
  });

  it("drops the id of any other element and keeps its other attributes and text", () => {
    expect(htmlForSearch('<main id="content"><ol><li id="source-iso-281" class="entry">ISO 281.</li></ol></main>')).toBe(
      '<main><ol><li class="entry">ISO 281.</li></ol></main>',
    );
    expect(htmlForSearch('<section class="calc" id="rim-calculator" aria-label="Rim">x</section>')).toBe('<section class="calc" aria-label="Rim">x</section>');
  });

  it("ends a table's caption and each header cell with a space, so their words stay apart", () => {
    expect(htmlForSearch("<table><caption>Classes</caption><tr><th>Class</th><th>R<sub>m</sub></th></tr></table>")).toBe(
      "<table><caption>Classes </caption><tr><th>Class </th><th>R<sub>m</sub> </th></tr></table>",
    );
  });

  it("tells a heading from a header, and an id from a data-id", () => {
    expect(htmlForSearch('<header id="top" class="h2" data-id="x">Top</header>')).toBe('<header class="h2" data-id="x">Top</header>');
  });
});
