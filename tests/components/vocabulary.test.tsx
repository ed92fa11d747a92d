// @vitest-environment happy-dom
/**
 * One vocabulary and one set of controls across the calculators: every verdict line leads with
 * Holds, Marginal, Fails or For information (then the reason), as the result bar, the build sheet
 * and the command line do; every calculator opens with its units switch, its link and "Save to
 * design"; the trade's words are used one way everywhere (gₙ for acceleration, offset, heading LED,
 * gear ratio, marginal, resolution); labels carry real subscripts; the spin-up panel leads with what
 * limits the acceleration and where the energy went, and compares named variants in one table.
 * Widgets are rendered on the server (the path Astro islands take) and, for states a link sets, into
 * a DOM.
 */
import { preparedDemo } from "../support/prepared-demo.ts";
import { afterEach, beforeAll, describe, expect, it } from "vitest";
import type { ComponentChild, VNode } from "preact";
import { render } from "preact";
import { act } from "preact/test-utils";
import { renderToString } from "preact-render-to-string";
import PlacementCalculator, { createPlacementModel } from "../../components/calculators/placement.tsx";
import FastenerCalculator from "../../components/calculators/fasteners.tsx";
import fastenerDescriptor from "../../calc/calculators/fasteners.ts";
import { initialValues as fastenerInitial } from "../../calc/core/calculator.ts";

/** The fastener calculator's result for its defaults, as the chapter computes it at build time. */
const fastenerDefaults = fastenerDescriptor.run(fastenerInitial(fastenerDescriptor));
import RimCalculator from "../../components/calculators/rims.tsx";
import HeadingDriftCalculator, { createDriftModel } from "../../components/calculators/heading-drift.tsx";
import HeadingTimingCalculator from "../../components/calculators/heading-timing.tsx";
import CalibrationCalculator from "../../components/heading/calibration-server.tsx";
import { calibrationStart } from "../../components/heading/calibration-engine.ts";
import MassLayoutCalculator from "../../components/calculators/mass.tsx";
import SpinUpCalculator from "../../components/calculators/spin-up.tsx";
import BuildSheet from "../../components/design/BuildSheet.tsx";
import * as CompareModule from "../../components/drivetrain/Compare.tsx";
import { createSpinUpModel } from "../../components/drivetrain/model.ts";
import { Results } from "../../components/drivetrain/Results.tsx";
import { demoRobotParts } from "../../calc/mass/demo.ts";
import { encodeLayout } from "../../calc/mass/layout-text.ts";
import * as massArithmetic from "../../components/mass/compute.ts";
import { loadMassCompute, startingResult } from "../../components/mass/model.ts";
import { rimMaterialChoices } from "../../calc/loads/index.ts";
import { DEMO_WEAPON, drivetrainWorkedExample } from "../../calc/drivetrain/demo.ts";
import * as simulation from "../../calc/drivetrain/simulate.ts";
import { readField } from "../../calc/core/inputs.ts";
import { accelerometerPlacementInputs } from "../../calc/rotation/rotation.ts";
import { STANDARD_GRAVITY } from "../../calc/core/constants.ts";

// The mass layout's arithmetic loads on a page's first change; here it is loaded for the changes below.
beforeAll(() => loadMassCompute());

/** Every calculator of the handbook, as its chapter places it. */
const WIDGETS: [string, () => ComponentChild][] = [
  ["placement", () => <PlacementCalculator id="w" />],
  ["fasteners", () => <FastenerCalculator id="w" initial={fastenerDefaults} />],
  ["rims", () => <RimCalculator id="w" materials={rimMaterialChoices()} />],
  ["heading-drift", () => <HeadingDriftCalculator id="w" />],
  ["heading-timing", () => <HeadingTimingCalculator id="w" />],
  ["calibration", () => <CalibrationCalculator id="w" start={calibrationStart()} />],
  [
    "mass",
    () => <MassLayoutCalculator id="w" layout={encodeLayout(demoRobotParts())} initial={startingResult(encodeLayout(demoRobotParts()), massArithmetic)} />,
  ],
  // The chapter passes the worked example's weapon, computed at build time, as the default design's result.
  ["spin-up", () => <SpinUpCalculator id="w" prepared={drivetrainWorkedExample().weapon} />],
];

/** The text a reader sees: tags dropped, attributes gone, entities of the few kinds Preact writes decoded. */
const textOf = (html: string) =>
  html
    .replace(/<[^>]+>/g, " ")
    .replace(/&amp;/g, "&")
    .replace(/&#39;/g, "'")
    .replace(/&quot;/g, '"')
    .replace(/\s+/g, " ");

/** The bold lead of every verdict line. */
const verdictLeads = (html: string) => [...html.matchAll(/<p class="verdict[^"]*"[^>]*><strong>([^<]*)<\/strong>/g)].map((m) => m[1]!);

const LEAD = /^(Holds|Marginal|Fails|For information)(: [a-z0-9].*)?\.$/;

const mounted: HTMLElement[] = [];
afterEach(() => {
  for (const root of mounted.splice(0)) {
    act(() => render(null, root));
    root.remove();
  }
  window.history.replaceState(null, "", "/");
});

/** Renders a widget into the document the way a browser opens `link`, and returns its verdict leads. */
function openWith(link: string, node: ComponentChild): string[] {
  window.history.replaceState(null, "", link);
  const root = document.createElement("div");
  document.body.append(root);
  mounted.push(root);
  act(() => render(node, root));
  return [...root.querySelectorAll(".verdict > strong")].map((s) => s.textContent ?? "");
}

describe("verdict words: Holds, Marginal, Fails or For information, then the reason", () => {
  it.each(WIDGETS)("leads every verdict line of the %s calculator with one of the four words", (_name, widget) => {
    const leads = verdictLeads(renderToString(widget() as VNode));
    expect(leads.length).toBeGreaterThan(0);
    for (const lead of leads) expect(lead).toMatch(LEAD);
  });

  it("says where the accelerometer stands in the same words: holds, fails when too far out, marginal when too close in", () => {
    expect(openWith("/?v=1&r=20mm", <PlacementCalculator id="p" />)).toEqual(["Holds."]);
    // 2400 rpm at 60 mm: ω²r = 251.3² × 0.06 = 3790 m/s² = 386 gₙ, past 80 % of 200 gₙ.
    expect(openWith("/?v=1&r=60mm", <PlacementCalculator id="q" />)).toEqual(["Fails: too far out."]);
    // 5 mm is inside the 13.8 mm a 0.1 gₙ resolution needs for 2 % at 400 rpm.
    expect(openWith("/?v=1&r=5mm", <PlacementCalculator id="s" />)).toEqual(["Marginal: too close in."]);
  });

  it("judges the loop timing as the build sheet does: one target missed is marginal, both fail", () => {
    // 2800 rpm, 2 kHz, 1 ms on-time: the heading LED sweeps 16.8° against 15° wanted; the step, 8.4°, is within 10°.
    expect(openWith("/?v=1&rpm=2800rpm&hz=2kHz&on=1ms&arc=15deg&step=10deg", <HeadingTimingCalculator id="t" />)[0]).toBe(
      "Marginal: heading LED arc too wide.",
    );
    expect(openWith("/?v=1&rpm=2800rpm&hz=500Hz&on=1ms&arc=15deg&step=10deg", <HeadingTimingCalculator id="u" />)[0]).toBe(
      "Fails: step too large and arc too wide.",
    );
  });

  it("gives the drift budget, the opposed pair and the smoothing their words", async () => {
    const drift = verdictLeads(renderToString(<HeadingDriftCalculator id="d" />));
    expect(drift).toEqual(["Fails: over the trim budget."]);
    // The opposed pair opens on demand, with its own verdict line.
    const model = createDriftModel();
    const pair = await model.openPair();
    const { PairSection } = await import("../../components/heading/opposed-pair.tsx");
    expect(verdictLeads(renderToString(<PairSection model={pair} id="d" budget={undefined} />))).toEqual(["For information: the pair cancels the offset."]);
    expect(verdictLeads(renderToString(<HeadingTimingCalculator id="t" />))[1]).toMatch(/^For information: \d.* of delay\.$/);
    expect(verdictLeads(renderToString(<CalibrationCalculator id="c" start={calibrationStart()} />))[0]).toMatch(/^For information: radius .*, offset .*\.$/);
  });

  it("judges the balance grade the way the build sheet does, with the grade as the reason", () => {
    const layout = encodeLayout(demoRobotParts());
    const html = renderToString(<MassLayoutCalculator id="m" layout={layout} />);
    // The demo layout's equivalent grade is G 437: more than one grade step (× 2.5) over G 100 fails…
    expect(html.match(/data-out="grade-verdict"><strong>([^<]*)</)![1]).toBe("Fails: exceeds G 100.");
    expect(html).toMatch(/data-out="offset-verdict"><strong>(Holds: offset within the target|Fails: offset outside the target)\.</);
    // …and within one step of G 250 is marginal, as the build sheet says of the demo design.
    expect(openWith("/?v=1&G=250mm/s", <MassLayoutCalculator id="n" layout={layout} />)[0]).toBe("Marginal: exceeds G 250 by less than one grade step.");
  });

  it("says how the spin-up ends in the same words", () => {
    expect(verdictLeads(renderToString(<Results r={simulation.simulateSpinUp(DEMO_WEAPON)} input={DEMO_WEAPON} system="metric" />))).toEqual([
      "Holds: reaches the target.",
    ]);
  });

  it("shows the build sheet's badges with the same words, For information included, and leads the summary with the word", () => {
    const html = renderToString(<BuildSheet demo={preparedDemo()} />);
    const badges = [...html.matchAll(/<span class="badge badge--(\w+)"><span aria-hidden="true">(.)<\/span> ([^<]+)<\/span>/g)].map((m) => [m[1], m[2], m[3]]);
    expect(badges).toContainEqual(["info", "i", "For information"]);
    expect(badges).toContainEqual(["holds", "✔", "Holds"]);
    expect(badges.map((b) => b[2])).not.toContain("Info");
    expect(html).toMatch(/data-out="overall"><strong>(Holds|Marginal|Fails): [a-z ]+\.<\/strong>/);
  });
});

describe("one set of controls at the top of every calculator", () => {
  it.each(WIDGETS)("opens the %s calculator with its units switch, Copy link and Save to design, before any field", (_name, widget) => {
    const html = renderToString(widget() as VNode);
    const units = html.indexOf("<legend>Units</legend>");
    const firstField = html.search(/<(input|select|textarea)(?![^>]*name="w-units")/);
    expect(units).toBeGreaterThan(-1);
    expect(units).toBeLessThan(firstField);
    const toolbar = html.slice(units, firstField);
    expect(toolbar).toContain("Copy link to this check");
    expect(toolbar).toContain("Save to design");
  });
});

describe("one term per idea", () => {
  // The unit menus list symbols, not quantities: they are read apart (below).
  const withoutMenus = (html: string) => html.replace(/<select\b.*?<\/select>/gs, " ");
  const texts = Object.fromEntries(WIDGETS.map(([name, widget]) => [name, textOf(withoutMenus(renderToString(widget() as VNode)))]));

  it.each(WIDGETS.map(([name]) => name))("uses the handbook's terms in the %s calculator", (name) => {
    const text = texts[name]!;
    expect(text).not.toMatch(/Thin below|Sensor step|[Bb]eacon|Reduction|full-body|\bbias\b|\(1000 rpm\)/);
    // An acceleration never reads like grams: a number then a bare "g" is a mass only.
    for (const [, before] of text.matchAll(/(\S+) g(?![ₙ·\w])/g)) expect(Number(before)).not.toBeNaN();
  });

  it("shows acceleration in gₙ and grams in g, on one panel, and still reads a typed g as standard gravity", () => {
    const html = renderToString(<PlacementCalculator id="p" />);
    expect(html).toMatch(/data-out="accel-top">129 gₙ</);
    expect(html).toContain('value="200 gₙ"');
    expect(html).toContain('value="50 g"');
    // The acceleration fields' unit menus offer gₙ (and m/s², ft/s²), never a bare g.
    const menus = [...html.matchAll(/<select aria-label="([^"]*): unit"[^>]*>(.*?)<\/select>/gs)];
    const accelerationMenus = menus.filter((m) => m[2]!.includes('value="gn"'));
    expect(accelerationMenus.length).toBeGreaterThan(0);
    for (const [, , options] of accelerationMenus) expect(options).toMatch(/<option selected value="gn">gₙ<\/option>/);
    const typed = readField(accelerometerPlacementInputs.fullScale, "200 g", "metric");
    expect(typed).toMatchObject({ ok: true, value: 200 * STANDARD_GRAVITY });
    // The link stays plain ASCII: the field's "200 gₙ" travels as "200g".
    expect(new URLSearchParams(createPlacementModel().queryFor("")).get("fs")).toBe("200g");
  });

  it("names the battery cells with their S, the gearing as a gear ratio, the resolution as data sheets do, and the marginal threshold", () => {
    expect(texts["spin-up"]).toContain("Cells in series (S)");
    expect(texts["spin-up"]).toContain("Gear ratio");
    expect(texts["spin-up"]).toContain("Speed (× 1000 rpm)");
    expect(texts.placement).toContain("Resolution (1 LSB)");
    expect(texts.fasteners).toContain("Marginal below");
    expect(texts.fasteners).toContain("Friction coefficient");
    expect(texts["heading-timing"]).toContain("Heading LED arc");
    expect(texts.calibration).toContain("Offset b̂");
  });
});

describe("the spin-up panel", () => {
  it("leads with what limits the acceleration and where the energy went, then the figures, and keeps its self-check off the screen", () => {
    const html = renderToString(<Results r={simulation.simulateSpinUp(DEMO_WEAPON)} input={DEMO_WEAPON} system="metric" />);
    const limits = html.indexOf("What limits the acceleration, over time");
    const energy = html.indexOf("Where the energy went");
    const grid = html.indexOf('class="results-grid"');
    expect(limits).toBeGreaterThan(-1);
    expect(limits).toBeLessThan(energy);
    expect(energy).toBeLessThan(grid);
    expect(html).not.toContain("energy-balance");
    expect(html).not.toContain("Drawn − stored − losses");
  });

  it("compares named variants in one table: a column per design, the changed inputs as rows, then the results", () => {
    // Everything at hand and run at once (the page loads the simulation and the comparison on demand).
    const model = createSpinUpModel({ modules: { simulation, compare: CompareModule }, schedule: (next) => next() });
    model.addVariant();
    model.changeInVariant(0, "cellCount");
    model.variants.value[0]!.fields.texts.cellCount.value = "6";
    model.addVariant();
    model.changeInVariant(1, "gearRatio");
    model.variants.value[1]!.fields.texts.gearRatio.value = "1.5";
    const html = renderToString(<CompareModule.Compare model={model} idPrefix="su" />);
    const head = [...html.matchAll(/<th scope="col">([^<]+)<\/th>/g)].map((m) => m[1]);
    expect(head).toEqual(["This design", "Variant 1", "Variant 2"]);
    const rows = [...html.matchAll(/<tr[^>]*><th scope="row">([^<]+)<\/th>((?:<td[^>]*>.*?<\/td>)+)<\/tr>/g)].map((m) => [
      m[1],
      [...m[2]!.matchAll(/<td[^>]*>(.*?)<\/td>/g)].map((c) => textOf(c[1]!).trim()),
    ]);
    expect(rows.map((r) => r[0])).toEqual(["Cells in series (S)", "Gear ratio", "Time to target", "Top speed", "Peak battery current"]);
    expect(rows[0]![1]).toEqual(["4", "6", "same"]);
    expect(rows[1]![1]).toEqual(["2", "same", "1.5"]);
    // compareDrivetrains' doc comment: 4 cells 1.01 s, 6 cells 0.928 s (fastest), 1.5:1 1.22 s.
    expect(rows[2]![1]).toEqual(["1.01 s", "928 ms — fastest", "1.22 s"]);
    expect(html).toContain("Add variant 3");
    expect(html).toContain("Remove variant 1");
    expect(html).not.toMatch(/Variant [BCD]\b|Design [ABCD]\b/);
  });
});

describe("real subscripts", () => {
  const noRawSubscript = (html: string) => expect(textOf(html)).not.toMatch(/[\p{L}\p{N}]_[\p{L}\p{N}{]/u);

  it("sets the bolt strengths' symbols with <sub> and the stress area as Aₛ", () => {
    const html = renderToString(<FastenerCalculator id="f" initial={fastenerDefaults} />);
    expect(html).toContain("R<sub>p0.2,min</sub>");
    expect(html).toContain("R<sub>m,min</sub>");
    expect(html).toContain("Stress area Aₛ");
    noRawSubscript(html);
  });

  it("sets the products of inertia as I<sub>xz</sub> and I<sub>yz</sub>", () => {
    const html = renderToString(<MassLayoutCalculator id="m" layout={encodeLayout(demoRobotParts())} />);
    expect(html).toContain("I<sub>xz</sub>");
    expect(html).toContain("I<sub>yz</sub>");
    noRawSubscript(html);
  });

  it.each(WIDGETS)("leaves no raw underscore subscript in the %s calculator", (_name, widget) => {
    noRawSubscript(renderToString(widget() as VNode));
  });
});
