/**
 * What a reader sees on the built pages (`npm test` builds first): one safety notice per page, the
 * sources set as sentences (never "et al.."), subscripts set as subscripts (never a raw "a_c"), no
 * name from the code in the text, and the handbook's words.
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const dist = process.env.OUT_DIR ? resolve(process.env.OUT_DIR) : fileURLToPath(new URL("../../dist/", import.meta.url));
const chapterPages = readdirSync(join(dist, "chapters")).map((slug) => `chapters/${slug}/index.html`);
const pages = ["index.html", "404.html", "build-sheet/index.html", "search/index.html", ...chapterPages];

/** The text of a page as read: scripts, styles and formulas (their own subscripts) left out, tags dropped. */
function textOf(page: string): string {
  return readFileSync(join(dist, page), "utf8")
    .replace(/<(script|style)\b[\s\S]*?<\/\1>/g, " ")
    .replace(/<span class="katex">[\s\S]*?<\/math><\/span>/g, " ")
    .replace(/<[^>]+>/g, " ")
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, "&")
    .replace(/\s+/g, " ");
}

describe("what a reader sees", () => {
  it.each(pages)("shows %s's safety notice once", (page) => {
    const html = readFileSync(join(dist, page), "utf8");
    expect(html.match(/<strong>Safety[.:]<\/strong>/g)).toHaveLength(1);
  });

  it.each(chapterPages)("lists %s's sources as sentences with real subscripts", (page) => {
    const html = readFileSync(join(dist, page), "utf8");
    const sources = html.slice(html.indexOf('id="sources-heading"'));
    expect(sources).toContain("<li");
    expect(sources).not.toMatch(/\.\.(?!\.)/);
  });

  it.each(chapterPages)("has no raw underscore subscript or code name in the text of %s", (page) => {
    const text = textOf(page);
    expect(text).not.toMatch(/[\p{L}\p{N}'′)]_[\p{L}\p{N}{]/u);
    expect(text).not.toMatch(/\b[A-Z]+_[A-Z_]+\b/);
  });

  it("sets the bibliography's subscripts with <sub>", () => {
    const html = readFileSync(join(dist, "chapters/acceleration/index.html"), "utf8");
    expect(html).toContain("a<sub>c</sub> = rω²");
    expect(html).toContain("P. P. Urone, R. Hinrichs et al. <cite>");
  });

  it.each(chapterPages)("uses the handbook's words in %s", (page) => {
    const text = textOf(page);
    expect(text).not.toMatch(/[Bb]eacon|Thin below|Sensor step|\(1000 rpm\)|\bbias\b(?! \(this handbook's offset\))/);
    // "full-body" appears once, as the other name of a whole-body spinner, in the rims chapter.
    expect((text.match(/full-body/g) ?? []).length).toBe(page.includes("/rims/") ? 1 : 0);
  });
});
