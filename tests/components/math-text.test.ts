/**
 * Formulas as text for the search index: each formula's MathML read back into one line. Each case is
 * rendered here by KaTeX itself (MathML output) and prepared as the build prepares it (rehype-math).
 */
import { describe, expect, it } from "vitest";
import katex from "katex";
import { fromHtml } from "hast-util-from-html";
import { toHtml } from "hast-util-to-html";
import { mathToText, withFormulasAsText } from "../../components/search/math-text.mjs";
import { rehypeMath } from "../../scripts/site/rehype-math.mjs";

const render = (tex: string, displayMode = false) => {
  const tree = fromHtml(katex.renderToString(tex, { output: "mathml", throwOnError: true, displayMode }), { fragment: true });
  rehypeMath()(tree);
  return toHtml(tree);
};

describe("a formula as text", () => {
  it.each([
    { tex: "a = \\omega^2 r", text: "a = ω²r" },
    { tex: "\\omega = \\frac{2\\pi n}{60}", text: "ω = 2πn/60" },
    { tex: "v_{lim} = \\sqrt{S/\\rho}", text: "v_lim = √(S/ρ)" },
    { tex: "n_y = \\frac{S_y}{\\sigma_{peak}}", text: "n_y = S_y/σ_peak" },
    { tex: "x = \\frac{a + b}{c}", text: "x = (a + b)/c" },
    { tex: "e^{-t/\\tau}", text: "e^(−t/τ)" },
    { tex: "\\hat r = \\bar x", text: "r\u0302 = x\u0304" },
    { tex: "\\sigma' = \\sqrt{\\sigma^2 + 3\\tau^2}", text: "σ′ = √(σ² + 3τ²)" },
    { tex: "I'_j + m_j d_j^2", text: "I′_j + m_jd_j²" },
    { tex: "\\sum_{j} m_j", text: "∑_jm_j" },
  ])("reads $tex as “$text”", ({ tex, text }) => {
    expect(mathToText(render(tex))).toBe(text);
  });

  it("replaces every formula of a page, inline or display, by its text and leaves the rest alone", () => {
    const page = `<p>At ${render("r")} from the axis, ${render("a = \\omega^2 r")}.</p>${render("F = m a", true)}`;
    expect(withFormulasAsText(page)).toBe(
      '<p>At <span class="formula-text">r</span> from the axis, <span class="formula-text">a = ω²r</span>.</p><span class="formula-text">F = ma</span>',
    );
  });
});
