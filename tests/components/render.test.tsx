import { describe, expect, it } from "vitest";
import { renderToString } from "preact-render-to-string";
import PlacementCalculator from "../../components/calculators/placement.tsx";

describe("server render (the path Astro islands take)", () => {
  const html = renderToString(<PlacementCalculator id="pc" />);

  it("renders every input with a label tied to it", () => {
    const ids = [...html.matchAll(/<input[^>]*id="([^"]+)"/g)].map((m) => m[1]);
    expect(ids.length).toBe(10);
    for (const id of ids) expect(html).toContain(`for="${id}"`);
  });

  it("renders the default result and the chart without touching window or document", () => {
    expect(html).toContain("Holds.");
    expect(html).toContain('data-out="max-radius"');
    expect(html).toContain("<svg");
    expect(html).not.toMatch(/NaN|Infinity/);
  });
});
