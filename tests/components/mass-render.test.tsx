import { describe, expect, it } from "vitest";
import { renderToString } from "preact-render-to-string";
import MassLayoutCalculator from "../../components/calculators/mass.tsx";
import { demoRobotParts } from "../../calc/mass/demo.ts";
import { encodeLayout } from "../../calc/mass/layout-text.ts";
import { MAX_PARTS } from "../../calc/mass/parts.ts";
import * as arithmetic from "../../components/mass/compute.ts";
import { startingResult } from "../../components/mass/model.ts";

describe("mass-layout calculator, server render (the path Astro islands take)", () => {
  // As the chapter places it: the starting result worked out at build time, the arithmetic not loaded.
  const layout = encodeLayout(demoRobotParts());
  const html = renderToString(<MassLayoutCalculator id="mc" layout={layout} initial={startingResult(layout, arithmetic)} />);

  it("renders every input and select with a label tied to it", () => {
    const ids = [...html.matchAll(/<(?:input|select)[^>]*id="([^"]+)"/g)].map((m) => m[1]);
    // Speed, grade select and field, mode (3 radios, labelled by wrapping), target, radius, z1, z2, sensor x and y.
    expect(ids.length).toBeGreaterThanOrEqual(9);
    for (const id of ids) expect(html).toContain(`for="${id}"`);
    for (const radio of html.match(/<input[^>]*type="radio"[^>]*>/g) ?? []) expect(radio).not.toContain("id=");
  });

  it("renders the demo's results, the top view and the sensor link, with no NaN or Infinity", () => {
    // 1.399 kg, offset 1.74 mm (tests/calc/mass.test.ts pins), U = 2432 g·mm.
    expect(html).toMatch(/data-out="total-mass">1\.40 kg</);
    expect(html).toMatch(/data-out="offset">1\.74 mm</);
    expect(html).toMatch(/data-out="unbalance">2430 g·mm</);
    expect(html).toMatch(/data-out="grade-met">G 630</);
    expect(html).toMatch(/data-out="cw-mass">39\.0 g</);
    expect(html).toContain("<svg");
    expect(html).toContain('href="/chapters/heading-drift/?v=1&amp;ra=32mm&amp;rpm=2400rpm&amp;rt=33.626119983792435mm&amp;u=metric#drift-calculator"');
    expect(html).not.toMatch(/NaN|Infinity/);
    // Drawing coordinates are rounded to 0.1 unit: no float dust in the paths.
    for (const [, d] of html.matchAll(/ d="([^"]+)"/g)) expect(d).not.toMatch(/\.\d{2}/);
  });

  it("shows closed part cards as summaries only, and asks for a part when the list is empty", () => {
    expect(html.match(/<details/g)).toHaveLength(9);
    expect(html).toContain("4. battery");
    expect(html).not.toMatch(/id="mc-p\d/);
    const empty = renderToString(<MassLayoutCalculator id="mc" layout="v1" />);
    expect(empty).toContain("Add a part to see results.");
    expect(empty).not.toMatch(/NaN|Infinity/);
  });

  it("says the list is full, not that no counterweight reaches the target, when an off-centre layout already has the most parts", () => {
    const demo = demoRobotParts();
    // The demo's parts, then copies of its off-centre battery up to the limit: no room left for a counterweight.
    const full = encodeLayout([...demo, ...Array.from({ length: MAX_PARTS - demo.length }, (_, i) => ({ ...demo[3]!, name: `copy ${i + 1}` }))]);
    const page = renderToString(<MassLayoutCalculator id="mc" layout={full} initial={startingResult(full, arithmetic)} />);
    expect(page).toContain(`The parts list is full (${MAX_PARTS} parts): remove a part to make room for a counterweight.`);
    expect(page).not.toContain("No counterweight of this kind reaches the target");
    expect(page).not.toContain("Apply: add it to the parts list");
  });
});
