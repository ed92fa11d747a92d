/**
 * Every calculator on a 390 px phone: each drop-down fits inside its calculator and on the screen,
 * wide enough to show its longest choice whole (the fastener property class and the rim and part
 * materials were cut off).
 */
import { describe, expect, it } from "vitest";
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { DIST_DIR, useSite } from "../support/browser.ts";

const { open } = useSite();
const CHAPTERS = readdirSync(join(DIST_DIR, "chapters")).filter((slug) => slug !== "index.html");

describe("calculators on a 390 px screen", () => {
  it.each(CHAPTERS)("shows every drop-down of %s whole", async (slug) => {
    const { page, context } = await open(`/chapters/${slug}/`, { width: 390 });
    // Open every folded part (the mass layout's part cards) so their menus are measured too.
    await page.evaluate(() => {
      for (const details of document.querySelectorAll<HTMLDetailsElement>(".calc details")) details.open = true;
    });
    await page.waitForTimeout(100);
    // An opened part card loads its fields (components/mass/PartEditor.tsx) on first opening.
    await page.waitForFunction(() => !document.querySelector(".calc")?.textContent?.includes("Loading the part's fields"));
    const cut = await page.evaluate(() => {
      const canvas = document.createElement("canvas").getContext("2d")!;
      const problems: string[] = [];
      let measured = 0;
      for (const select of document.querySelectorAll<HTMLSelectElement>(".calc select")) {
        const box = select.getBoundingClientRect();
        if (box.width === 0) continue;
        measured += 1;
        const calc = select.closest(".calc")!.getBoundingClientRect();
        const style = getComputedStyle(select);
        canvas.font = `${style.fontWeight} ${style.fontSize} ${style.fontFamily}`;
        const longest = Math.max(...[...select.options].map((o) => canvas.measureText(o.text).width));
        // The text area is the box less its padding, borders and the arrow (about 1.5 em). A unit
        // menu takes the browser's own width for its longest choice (width: auto), arrow included:
        // its text must fit the box less padding and borders.
        const arrow = select.closest(".field-entry") ? 0 : 1.5 * Number.parseFloat(style.fontSize);
        const room =
          box.width -
          Number.parseFloat(style.paddingLeft) -
          Number.parseFloat(style.paddingRight) -
          Number.parseFloat(style.borderLeftWidth) -
          Number.parseFloat(style.borderRightWidth) -
          arrow;
        const name = select.id || select.name;
        if (box.right > Math.min(calc.right, window.innerWidth) + 0.5) problems.push(`${name} runs past its calculator (${box.right} px)`);
        if (longest > room) problems.push(`${name} cuts its longest choice (${Math.round(longest)} px of text in ${Math.round(room)} px)`);
      }
      return { problems, measured };
    });
    expect(cut.problems).toEqual([]);
    // The mass layout's unfolded part cards add a shape and a material menu each.
    if (slug === "mass-layout") expect(cut.measured).toBeGreaterThan(4);
    await context.close();
  });
});

describe("unit menus beside the fields", () => {
  // A menu whose first choice shows while the field reads another unit told a builder that a nut
  // factor of 0.2 was 0.2 %: a field that reads plain numbers has no menu, and every menu shows the
  // unit its field's text is in.
  it.each(CHAPTERS)("shows, on %s, the unit each field reads and no menu beside a plain ratio", async (slug) => {
    const { page, context } = await open(`/chapters/${slug}/`, { width: 390 });
    const wrong = await page.evaluate(() =>
      [...document.querySelectorAll<HTMLSelectElement>(".calc .field-entry select")].flatMap((select) => {
        const input = select.parentElement!.querySelector("input")!;
        const typed = input.value.replace(/^[\s+\-−\d.,eE]*/, "").trim();
        const chosen = select.selectedOptions[0]?.text ?? "";
        return typed === chosen ? [] : [`${input.id}: "${input.value}" beside "${chosen}"`];
      }),
    );
    expect(wrong).toEqual([]);
    await context.close();
  });
});
