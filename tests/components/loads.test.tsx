/**
 * The bolt and rim calculators' models (choices in the URL, materials filling fields, errors on
 * the right field) and their server render (the path Astro islands take).
 */
import { describe, expect, it } from "vitest";
import { renderToString } from "preact-render-to-string";
import { demoRobotLoads, rimMaterialChoices } from "../../calc/loads/index.ts";
import fasteners from "../../calc/calculators/fasteners.ts";
import rims from "../../calc/calculators/rims.ts";
import { linkQuery, readLink } from "../../calc/core/calculator.ts";
import FastenerCalculator, { createFastenerModel } from "../../components/calculators/fasteners.tsx";
import RimCalculator, { createRimModel } from "../../components/calculators/rims.tsx";

const CUSTOM_MATERIAL = "custom";

const MATERIALS = rimMaterialChoices();

function close(actual: number | undefined, expected: number, rtol: number): void {
  expect(actual).toBeDefined();
  expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));
}

describe("the bolt calculator's model", () => {
  it("computes a verdict from the defaults (40 g, 70 mm, 2400 rpm, one M4 8.8 in shear)", () => {
    const model = createFastenerModel();
    const result = model.outcome.value.result;
    // τ = 0.04 × (80π)² × 0.07 / 8.78 mm² = 20.1 MPa; τ_y = 640/√3 = 370 MPa → n = 18.3 (tests/calc/loads.test.ts).
    expect(result?.verdict).toBe("holds");
    close(result?.stress, 20.1e6, 5e-3);
    close(result?.safetyFactor, 18.3, 5e-3);
    expect(model.curve.value?.points).toHaveLength(60);
  });

  it("applies a permalink with its choices: 42 g at 55 mm on one M2 class 4.6 screw is marginal", () => {
    const model = createFastenerModel();
    model.applyQuery("?v=1&u=metric&m=42g&r=55mm&rpm=2400rpm&n=1&size=M2&cls=4.6&mode=shear&plane=thread");
    expect(model.fields.texts.partMass.value).toBe("42 g");
    expect(model.choices.size.value).toBe("M2");
    expect(model.choices.propertyClass.value).toBe("4.6");
    const result = model.outcome.value.result;
    // F = 0.042 × (80π)² × 0.055 = 145.9 N; τ = 145.9 / 2.07 mm² = 70.5 MPa; τ_y = 240/√3 = 138.6 MPa → n = 1.97.
    close(result?.stress, 70.5e6, 5e-3);
    close(result?.safetyFactor, 1.97, 5e-3);
    expect(result?.verdict).toBe("marginal");
    expect(model.fields.notices.value).toEqual([]);
  });

  it("changes the result when the loading mode changes", () => {
    const model = createFastenerModel();
    model.applyQuery("?m=42g&r=55mm&size=M2&cls=4.6");
    model.choices.mode.value = "tension";
    // In tension the same 70.5 MPa meets R_eL,min = 240 MPa: n = 3.40 → holds.
    close(model.outcome.value.result?.safetyFactor, 3.4, 5e-3);
    expect(model.outcome.value.result?.verdict).toBe("holds");
  });

  it("writes every choice into the link next to the quantities", () => {
    const model = createFastenerModel();
    model.choices.size.value = "M6";
    model.choices.mode.value = "tension";
    const query = new URLSearchParams(model.queryFor(""));
    expect(query.get("v")).toBe("1");
    expect(query.get("size")).toBe("M6");
    expect(query.get("cls")).toBe("8.8");
    expect(query.get("mode")).toBe("tension");
    expect(query.get("plane")).toBe("thread");
    expect(query.get("m")).toBe("40g");
    expect(query.get("rpm")).toBe("2400rpm");
  });

  it("reports a choice that is not on the list, and a repeated one, and keeps the default", () => {
    const model = createFastenerModel();
    model.applyQuery(`?size=M7&cls=8.8&cls=12.9&mode=${encodeURIComponent("<b>x</b>")}&colour=red`);
    expect(model.choices.size.value).toBe("M4");
    expect(model.choices.propertyClass.value).toBe("8.8");
    expect(model.choices.mode.value).toBe("shear");
    expect(model.fields.notices.value).toEqual([
      'The link sets "cls" more than once; the first value was used.',
      'The link has a parameter "colour" that this calculator does not use; it was ignored.',
      `The link's thread size "M7" is not one this calculator offers; it was ignored.`,
      `The link's loading "<b>x</b>" is not one this calculator offers; it was ignored.`,
    ]);
  });

  it("maps a rule across fields to the field it names", () => {
    const model = createFastenerModel();
    model.fields.texts.failBelow.value = "3";
    expect(model.outcome.value.result).toBeNull();
    expect(model.outcome.value.error).toEqual({ field: "marginalBelow", message: "Marginal below must be at least the fails below (3)." });
  });

  it("withholds results while a field does not read, and names it", () => {
    const model = createFastenerModel();
    model.fields.texts.count.value = "1.5";
    expect(model.outcome.value.result).toBeNull();
    const reading = model.fields.readings.count.value;
    expect(!reading.ok && reading.error.message).toContain("Number of bolts must be a whole number between 1 and 64");
  });

  it("builds a worked-example link that reopens exactly the demo check", () => {
    const demo = demoRobotLoads();
    const model = createFastenerModel();
    model.applyQuery(`?${linkQuery(fasteners, demo.boltInput)}`);
    const result = model.outcome.value.result!;
    close(result.stress, demo.bolt.stress, 1e-5);
    close(result.speedAtYield, demo.bolt.speedAtYield, 1e-5);
    expect(result.verdict).toBe(demo.bolt.verdict);
    expect(model.fields.notices.value).toEqual([]);
  });
});

describe("reading choices from a link", () => {
  it("reads the choices apart from the fields' texts", () => {
    const read = readLink(fasteners, "?v=1&size=M3&r=5mm");
    expect(read.choices).toEqual({ size: "M3" });
    expect(read.texts).toEqual({ radius: "5mm" });
  });
});

describe("the rim calculator's model", () => {
  it("starts on a 6061-T6 thin ring that holds, with the material shown as picked", () => {
    const model = createRimModel(MATERIALS);
    expect(model.material.value).toBe("al-6061-t6");
    // σ = 2700 × (2400 rpm × 0.125 m)² = 2.66 MPa; n_y = 276/2.66 = 104 (tests/calc/loads.test.ts).
    close(model.outcome.value.result?.peakStress, 2.665e6, 5e-3);
    expect(model.outcome.value.result?.verdict).toBe("holds");
    expect(model.profile.value).toHaveLength(1);
  });

  it("fills the four material fields from a table row, and turns custom when one is edited", () => {
    const model = createRimModel(MATERIALS);
    model.pickMaterial("steel-4130-normalized");
    expect(model.fields.texts.density.value).toBe("7.85 g/cm³");
    expect(model.fields.texts.yieldStrength.value).toBe("435 MPa");
    expect(model.fields.texts.poisson.value).toBe("0.29");
    expect(model.material.value).toBe("steel-4130-normalized");
    model.fields.texts.yieldStrength.value = "400 MPa";
    expect(model.material.value).toBe(CUSTOM_MATERIAL);
    expect(new URLSearchParams(model.queryFor("")).get("mat")).toBe("custom");
  });

  it("keeps the material picked when the units switch to US", () => {
    const model = createRimModel(MATERIALS);
    model.pickMaterial("ti-6al-4v-annealed");
    model.fields.setSystem("us");
    expect(model.fields.texts.yieldStrength.value).toMatch(/ ksi$/);
    expect(model.material.value).toBe("ti-6al-4v-annealed");
  });

  it("applies a permalink: a 4130 disk with a 10 mm bore at 10 000 rpm peaks at the bore", () => {
    const model = createRimModel(MATERIALS);
    model.applyQuery("?v=1&shape=annular-disk&mat=steel-4130-normalized&ro=100mm&ri=10mm&rpm=10000rpm");
    expect(model.fields.texts.density.value).toBe("7.85 g/cm³");
    const result = model.outcome.value.result!;
    // σ_θ(a) = ρω²/4 · [(3+ν)b² + (1−ν)a²] = 7850 × 1047.2² / 4 × (3.29 × 0.01 + 0.71 × 0.0001) = 71.0 MPa; n_y = 435/71.0 = 6.13.
    close(result.peakStress, 70.96e6, 5e-3);
    expect(result.peakStressRadius).toBe(0.01);
    close(result.safetyFactorYield, 6.13, 5e-3);
    expect(model.profile.value).toHaveLength(41);
    expect(model.material.value).toBe("steel-4130-normalized");
  });

  it("lets the link's own values override the material's, and then calls the material custom", () => {
    const model = createRimModel(MATERIALS);
    model.applyQuery("?mat=al-6061-t6&sy=240MPa&su=290MPa");
    expect(model.fields.texts.yieldStrength.value).toBe("240 MPa");
    expect(model.material.value).toBe(CUSTOM_MATERIAL);
  });

  it("reports an unknown material and keeps the default", () => {
    const model = createRimModel(MATERIALS);
    model.applyQuery("?mat=unobtainium");
    expect(model.material.value).toBe("al-6061-t6");
    expect(model.fields.notices.value).toEqual([`The link's material "unobtainium" is not one this calculator offers; it was ignored.`]);
  });

  it("puts a bore as large as the rim on the bore field, and a yield above ultimate on the yield field", () => {
    const model = createRimModel(MATERIALS);
    model.choices.shape.value = "annular-disk";
    model.fields.texts.innerRadius.value = "130 mm";
    expect(model.outcome.value.error?.field).toBe("innerRadius");
    expect(model.outcome.value.error?.message).toMatch(/^Bore radius must be /);
    model.fields.texts.innerRadius.value = "20 mm";
    model.fields.texts.yieldStrength.value = "400 MPa";
    expect(model.outcome.value.error).toEqual({ field: "yieldStrength", message: "Yield strength must be at most the ultimate strength (262.001 MPa)." });
  });

  it("builds a worked-example link that reopens exactly the demo rim", () => {
    const demo = demoRobotLoads();
    const model = createRimModel(MATERIALS);
    model.applyQuery(`?${linkQuery(rims, demo.rimInput)}`);
    expect(model.material.value).toBe("al-6061-t6");
    close(model.outcome.value.result?.peakStress, demo.rim.peakStress, 1e-5);
    close(model.outcome.value.result?.speedAtUltimate, demo.rim.speedAtUltimate, 1e-5);
  });

  it("works with custom values alone when the page offers no table", () => {
    const model = createRimModel([]);
    expect(model.material.value).toBe(CUSTOM_MATERIAL);
    expect(model.outcome.value.result?.verdict).toBe("holds");
  });
});

describe("server render (the path Astro islands take)", () => {
  // Radios: the loading mode and shear plane (2 + 2) or the shape (3), plus the toolbar's two unit radios.
  const cases = [
    { name: "bolt calculator", html: renderToString(<FastenerCalculator id="fc" />), inputs: 7, selects: 2, radios: 6, verdict: "Holds." },
    { name: "rim calculator", html: renderToString(<RimCalculator id="rc" materials={MATERIALS} />), inputs: 9, selects: 2, radios: 5, verdict: "Holds." },
  ];

  it.each(cases)("labels every text field and select of the $name", ({ html, inputs, selects }) => {
    const ids = [...html.matchAll(/<(?:input|select)[^>]*\bid="([^"]+)"/g)].map((m) => m[1]);
    expect(ids.length).toBe(inputs + selects);
    for (const id of ids) expect(html).toContain(`for="${id}"`);
  });

  it.each(cases)("puts every radio button of the $name inside a label, in a fieldset with a legend", ({ html, radios }) => {
    expect([...html.matchAll(/<label><input type="radio"/g)].length).toBe(radios);
    expect(html.match(/<fieldset class="loads-radios"[^>]*><legend>/g)?.length).toBeGreaterThan(0);
  });

  it.each(cases)("renders the $name's verdict, outputs and chart without NaN", ({ html, verdict }) => {
    expect(html).toContain(verdict);
    expect(html).toContain('data-out="speed-ult"');
    expect(html).toContain("<svg");
    expect(html).not.toMatch(/NaN|Infinity|undefined/);
  });

  it("marks the selected thread size and material in the server render", () => {
    expect(cases[0]!.html).toMatch(/<option[^>]*value="M4"[^>]*selected/);
    expect(cases[1]!.html).toMatch(/<option[^>]*value="al-6061-t6"[^>]*selected/);
  });
});
