/**
 * The bolt and rim calculators' models (choices in the URL, materials filling fields, errors on
 * the right field) and their server render (the path Astro islands take).
 */
import { beforeAll, describe, expect, it } from "vitest";
import { renderToString } from "preact-render-to-string";
import { demoRobotLoads, rimMaterialChoices } from "../../calc/loads/index.ts";
import fasteners from "../../calc/calculators/fasteners.ts";
import rims from "../../calc/calculators/rims.ts";
import { initialValues, linkQuery, readLink } from "../../calc/core/calculator.ts";
import { boltedJointCheck } from "../../calc/loads/joint.ts";
import type { BoltedJointCheck, BoltedJointInput } from "../../calc/loads/joint-inputs.ts";
import FastenerCalculator, { createFastenerModel, loadJointCheck } from "../../components/calculators/fasteners.tsx";
import RimCalculator, { createRimModel } from "../../components/calculators/rims.tsx";

const CUSTOM_MATERIAL = "custom";

const MATERIALS = rimMaterialChoices();

function close(actual: number | undefined, expected: number, rtol: number): void {
  expect(actual).toBeDefined();
  expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(rtol * Math.abs(expected));
}

/** The check the calculator runs, called directly: the model must give exactly its result. */
function jointFor(values: Partial<BoltedJointInput>): BoltedJointCheck {
  return boltedJointCheck({ ...(initialValues(fasteners) as unknown as BoltedJointInput), ...values });
}

describe("the bolt calculator before its check's code has loaded", () => {
  // Runs first: the check's code is loaded once per page and then stays.
  it("answers the defaults from the result computed at build time, without loading the check", () => {
    const model = createFastenerModel(jointFor({}));
    expect(model.outcome.value.result).toEqual(jointFor({}));
    expect(model.waiting.value).toBe(false);
  });

  it("waits for the check's code once an input changes, says so, and then answers", async () => {
    const model = createFastenerModel(jointFor({}));
    model.fields.texts.stackHeight.value = "8.4 mm";
    expect(model.outcome.value.result).toBeNull();
    expect(model.waiting.value).toBe(true);
    const html = renderToString(<FastenerCalculator id="w" />);
    expect(html).toContain("Working out the joint…");
    await loadJointCheck();
    expect(model.waiting.value).toBe(false);
    expect(model.outcome.value.result).toEqual(jointFor({ stackHeight: model.values.value!.stackHeight }));
    close(model.values.value!.stackHeight, 0.0084, 1e-12);
  });
});

describe("the bolt calculator's model", () => {
  beforeAll(() => loadJointCheck());

  it("starts on the joint check's defaults: an M4 8.8 tapped into 6061-T6, clamped at 75 % of proof, and friction governs", () => {
    const model = createFastenerModel();
    const result = model.outcome.value.result!;
    expect(result).toEqual(jointFor({}));
    expect(result.governs).toBe("friction");
    expect(result.verdict).toBe("holds");
    // F_i = 0.75 × 8.78 mm² × 580 MPa = 3819.3 N (tests/calc/loads/joint.test.ts).
    close(result.preload.force, 3819.3, 1e-9);
  });

  it("opens a link of the earlier average-shear check: its keys keep their meaning, and the retired ones are named in a notice", () => {
    const model = createFastenerModel();
    model.applyQuery("?v=1&u=metric&m=42g&r=55mm&rpm=2400rpm&n=1&size=M2&cls=4.6&mode=shear&plane=thread&sr=0.5");
    expect(model.fields.texts.partMass.value).toBe("42 g");
    expect(model.choices.size.value).toBe("M2");
    expect(model.choices.grade.value).toBe("4.6");
    expect(model.choices.jointMode.value).toBe("shear");
    expect(model.fields.notices.value).toHaveLength(1);
    expect(model.fields.notices.value[0]).toContain("Its shear ratio and shear plane are no longer read");
    const result = model.outcome.value.result!;
    expect(result).toEqual(jointFor({ partMass: 0.042, radius: 0.055, size: "M2", grade: "4.6" }));
  });

  it("says nothing about retired keys when a link has none", () => {
    const model = createFastenerModel();
    model.applyQuery("?m=42g&size=M3");
    expect(model.fields.notices.value).toEqual([]);
  });

  it("changes the governing mode when the loading mode changes", () => {
    const model = createFastenerModel();
    model.choices.jointMode.value = "tension";
    const result = model.outcome.value.result!;
    expect(result).toEqual(jointFor({ jointMode: "tension" }));
    expect(["tension", "stripping"]).toContain(result.governs);
    expect(result.safetyFactors.friction).toBeNull();
  });

  it("moves the grade to the nearest of the other system when the size does (8.8 ↔ SAE J429 grade 5, 12.9 ↔ ASTM A574)", () => {
    const model = createFastenerModel();
    model.pickSize("#10-32");
    expect(model.choices.grade.value).toBe("sae-5");
    expect(model.outcome.value.result?.thread.system).toBe("inch");
    model.choices.grade.value = "a574";
    model.pickSize("1/4-20");
    expect(model.choices.grade.value).toBe("a574");
    model.pickSize("M5");
    expect(model.choices.grade.value).toBe("12.9");
  });

  it("writes every choice into the link and leaves out the numbers the choices do not read", () => {
    const model = createFastenerModel();
    model.choices.size.value = "M6";
    model.choices.threadIn.value = "nut";
    const query = new URLSearchParams(model.queryFor(""));
    expect(query.get("v")).toBe("1");
    expect(query.get("size")).toBe("M6");
    expect(query.get("cls")).toBe("8.8");
    expect(query.get("mode")).toBe("shear");
    expect(query.get("into")).toBe("nut");
    expect(query.get("pre")).toBe("75%");
    expect(query.get("mu")).toBe("0.2");
    expect(query.get("h")).toBe("5mm");
    expect(query.get("m")).toBe("40g");
    expect(query.get("rpm")).toBe("2400rpm");
    // Not read: the torque (the preload is a share), the force (the load is a spinning part), the engagement (a nut).
    expect(query.has("T")).toBe(false);
    expect(query.has("F")).toBe(false);
    expect(query.has("le")).toBe(false);
    model.choices.preloadFrom.value = "torque";
    model.choices.jointMode.value = "tension";
    const torque = new URLSearchParams(model.queryFor(""));
    expect(torque.has("T")).toBe(true);
    expect(torque.has("pre")).toBe(false);
    expect(torque.has("h")).toBe(false);
    expect(torque.has("mu")).toBe(false);
  });

  it("reports a choice that is not on the list, and a repeated one, and keeps the default", () => {
    const model = createFastenerModel();
    model.applyQuery(`?size=M7&cls=8.8&cls=12.9&mode=${encodeURIComponent("<b>x</b>")}&colour=red`);
    expect(model.choices.size.value).toBe("M4");
    expect(model.choices.grade.value).toBe("8.8");
    expect(model.choices.jointMode.value).toBe("shear");
    expect(model.fields.notices.value).toEqual([
      'The link sets "cls" more than once; the first value was used.',
      'The link has a parameter "colour" that this calculator does not use; it was ignored.',
      `The link's thread size "M7" is not one this calculator offers; it was ignored.`,
      `The link's loading "<b>x</b>" is not one this calculator offers; it was ignored.`,
    ]);
  });

  it("names the grade when a link pairs an inch grade with a metric size", () => {
    const model = createFastenerModel();
    model.applyQuery("?size=M4&cls=a574");
    expect(model.outcome.value.result).toBeNull();
    expect(model.outcome.value.error?.field).toBe("grade");
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

  it("ignores a field the choices do not read, even when it does not read (the force, while the load is a spinning part)", () => {
    const model = createFastenerModel();
    model.fields.texts.load.value = "lots";
    expect(model.outcome.value.result).not.toBeNull();
  });

  it("builds a worked-example link that reopens exactly the demo joint", () => {
    const demo = demoRobotLoads();
    const model = createFastenerModel();
    model.applyQuery(`?${linkQuery(fasteners, demo.jointInput)}`);
    const result = model.outcome.value.result!;
    close(result.safetyFactor, demo.joint.safetyFactor, 1e-9);
    close(result.slip!.bendingStress, demo.joint.slip!.bendingStress, 1e-9);
    expect(result.governs).toBe(demo.joint.governs);
    expect(result.verdict).toBe(demo.joint.verdict);
    expect(model.fields.notices.value).toEqual([]);
  });
});

describe("the bolt calculator's server render", () => {
  it("shows each mode's factor, the governing one marked, and the basis of the strengths", () => {
    const html = renderToString(<FastenerCalculator id="f" initial={jointFor({})} />);
    expect(html).toContain('data-out="sf-friction"');
    expect(html).toContain('data-out="sf-bending"');
    expect(html).toContain('data-out="sf-stripping"');
    expect(html).toContain("joint-governs-mark");
    expect(html).toContain("Bolt strengths: ISO 898-1 specified minimum values");
    expect(html).toContain("from typical values of the materials table");
    // The inch grades are not offered beside a metric size.
    expect(html).not.toContain("SAE J429 grade 5");
    expect(html).toContain("<details");
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
  // Radios: the load source, loading mode and preload source (2 + 2 + 2) or the shape (3), plus the
  // toolbar's two unit radios. The bolt calculator's default shows 14 number fields (the force and the
  // torque are not read) and 5 menus (size, grade, thread, and the folded bending and clamped-part menus).
  const cases = [
    {
      name: "bolt calculator",
      html: renderToString(<FastenerCalculator id="fc" initial={jointFor({})} />),
      inputs: 14,
      selects: 5,
      radios: 8,
      verdict: "Holds.",
      out: "sf-friction",
      chart: false,
    },
    {
      name: "rim calculator",
      html: renderToString(<RimCalculator id="rc" materials={MATERIALS} />),
      inputs: 9,
      selects: 2,
      radios: 5,
      verdict: "Holds.",
      out: "speed-ult",
      chart: true,
    },
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

  it.each(cases)("renders the $name's verdict, outputs and any chart without NaN", ({ html, verdict, out, chart }) => {
    expect(html).toContain(verdict);
    expect(html).toContain(`data-out="${out}"`);
    expect(html.includes("<svg")).toBe(chart);
    expect(html).not.toMatch(/NaN|Infinity|undefined/);
  });

  it("marks the selected thread size and material in the server render", () => {
    expect(cases[0]!.html).toMatch(/<option[^>]*value="M4"[^>]*selected/);
    expect(cases[1]!.html).toMatch(/<option[^>]*value="al-6061-t6"[^>]*selected/);
  });
});
