/**
 * Formulas as text for the search index: KaTeX 0.16's HTML read back into one line (the index has
 * no TeX source, since pages carry KaTeX's HTML only). Each case is rendered here by KaTeX itself.
 */
import { describe, expect, it } from "vitest";
import katex from "katex";
import { katexToText, withFormulasAsText } from "../../scripts/site/katex-text.mjs";

const render = (tex: string) => katex.renderToString(tex, { output: "html", throwOnError: true });

describe("a formula as text", () => {
  it.each([
    { tex: "a = \\omega^2 r", text: "a = ω²r" },
    { tex: "\\omega = \\frac{2\\pi n}{60}", text: "ω = 2πn/60" },
    { tex: "v_{lim} = \\sqrt{S/\\rho}", text: "v_lim = √(S/ρ)" },
    { tex: "n_y = \\frac{S_y}{\\sigma_{peak}}", text: "n_y = S_y/σ_peak" },
    { tex: "x = \\frac{a + b}{c}", text: "x = (a + b)/c" },
    { tex: "e^{-t/\\tau}", text: "e^(−t/τ)" },
  ])("reads $tex as “$text”", ({ tex, text }) => {
    expect(katexToText(render(tex))).toBe(text);
  });

  it("replaces every formula of a page by its text and leaves the rest alone", () => {
    const page = `<p>At ${render("r")} from the axis, ${render("a = \\omega^2 r")}.</p>`;
    expect(withFormulasAsText(page)).toBe('<p>At <span class="formula-text">r</span> from the axis, <span class="formula-text">a = ω²r</span>.</p>');
  });
});
