/**
 * The heading calculators' models and server render: defaults compute, links apply (both scopes of
 * a page), errors land on the field they concern, the calibration rows survive their link, and
 * every input renders with a label and no NaN.
 */
import { describe, expect, it } from "vitest";
import { renderToString } from "preact-render-to-string";
import { headingDriftInputs } from "../../calc/heading/drift-inputs.ts";
import { STANDARD_GRAVITY } from "../../calc/core/constants.ts";
import HeadingDriftCalculator, { createDriftModel } from "../../components/calculators/heading-drift.tsx";
import HeadingTimingCalculator, { createTimingModel } from "../../components/calculators/heading-timing.tsx";
import CalibrationCalculator from "../../components/heading/calibration-server.tsx";
import { createCalibrationModel } from "../../components/heading/calibration-model.ts";
import * as engine from "../../components/heading/calibration-engine.ts";
import { parseCalibrationCsv } from "../../calc/heading/csv.ts";

/** The calibration page's start, as the chapter computes it when the site is built. */
const start = engine.calibrationStart();
const DEMO_TEXT = start.text;
/** A calibration model with its reader and fitting code at hand (the server, a test). */
const calibrationModel = () => createCalibrationModel(start, { reader: parseCalibrationCsv, engine });

const DEG = Math.PI / 180;

describe("drift-budget model", () => {
  it("computes the defaults: the invented demo mismatch, 12.0 mm assumed, 12.7 mm true, 0.2 g left in", () => {
    const model = createDriftModel();
    const { result, error } = model.outcome.value;
    expect(error).toBeNull();
    expect(result!.verdict).toBe("over-budget");
    // regression pin from tests/calc/heading.test.ts: 366.752 °/s at 2000 rpm
    expect(result!.atSpeed.driftRate! / DEG).toBeCloseTo(366.75202097162, 6);
    expect(model.curves.value!.exact).toHaveLength(61);
    expect(model.pair.value).toBeNull(); // the pair section's code loads only when it is opened
  });

  it("opens the opposed pair on demand: r₁ = r₂ = 12 mm, e = 0.5 mm, 2000 rpm → one sensor up to 4.4097 rad/s", async () => {
    const model = createDriftModel();
    const pair = await model.openPair();
    expect(await model.openPair()).toBe(pair); // once
    expect(pair.outcome.value.result!.singleWorstDriftRate!).toBeCloseTo(4.409746715664806, 9);
  });

  it("applies a link to both sections, each from its own keys, and reports what it does not use", async () => {
    const model = createDriftModel();
    const link = "?v=1&rpm=2800rpm&ra=12.69mm&b=0.02g&p.r1=10mm&p.e=1mm&p.rpm=1500rpm&zz=1";
    const pair = await model.openPair();
    model.drift.applyQuery(link);
    pair.applyQuery(link);
    expect(model.fields.texts.angularSpeed.value).toBe("2800 rpm");
    expect(model.fields.texts.assumedRadius.value).toBe("12.69 mm");
    expect(pair.fields.texts.radius1.value).toBe("10 mm");
    expect(pair.fields.texts.offset.value).toBe("1 mm");
    expect(model.fields.notices.value.join(" ")).toContain('"zz"');
    expect(pair.fields.notices.value).toEqual([]);
    const query = new URLSearchParams(pair.queryFor(model.drift.queryFor("")));
    expect(query.get("ra")).toBe("12.69mm");
    expect(query.get("p.r1")).toBe("10mm");
    expect(query.get("v")).toBe("1");
  });

  it("puts the plot-range rule on the 'Plot to' field, in the user's units", () => {
    const model = createDriftModel();
    model.fields.texts.highSpeed.value = "100 rpm";
    expect(model.outcome.value.error).toEqual({ field: "highSpeed", message: "Plot to must be greater than the plot from (200 rpm)." });
    expect(model.curves.value).toBeNull();
  });

  it("gives no single-sensor figure, not NaN, once the uncertainty reaches a sensor", async () => {
    const pair = await createDriftModel().openPair();
    pair.fields.texts.offset.value = "13 mm";
    const r = pair.outcome.value.result!;
    expect(r.singleWorstDriftRate).toBeNull();
    expect(r.pairWorstDriftRate).toBeLessThan(1e-9);
  });

  it("switches both sections to US units together, and opens the pair in the page's units", async () => {
    const model = createDriftModel();
    const pair = await model.openPair();
    model.setSystem("us");
    expect(model.fields.texts.assumedRadius.value).toBe("0.472441 in");
    expect(pair.fields.texts.radius1.value).toBe("0.472441 in");
    const later = createDriftModel();
    later.setSystem("us");
    expect((await later.openPair()).fields.texts.radius1.value).toBe("0.472441 in");
  });
});

describe("timing and smoothing model", () => {
  it("computes the defaults: 18° steps at 3000 rpm and 1 kHz are over the 5° allowed", () => {
    const model = createTimingModel();
    const t = model.timingOutcome.value.result!;
    expect(t.verdict).toBe("step-too-large");
    expect(t.headingStep / DEG).toBeCloseTo(18, 9); // 3000 rpm = 18 000 °/s, over 1000 updates a second
    expect(t.loopRateNeeded).toBeCloseTo(3600, 9);
    const s = model.smoothingOutcome.value;
    expect(s.result!.totalDelay).toBeCloseTo(0.01, 12); // 9 ms (EMA, α = 0.1) + 1 ms (median of 3)
    expect(s.medians.map((m) => m.medianLength)).toEqual([1, 3, 5]);
    expect(s.tradeoff).toHaveLength(60);
  });

  it("adds the chosen median window to the comparison, and names an even one as the problem", () => {
    const model = createTimingModel();
    model.smoothing.texts.medianLength.value = "7";
    expect(model.smoothingOutcome.value.medians.map((m) => m.medianLength)).toEqual([1, 3, 5, 7]);
    model.smoothing.texts.medianLength.value = "4";
    expect(model.smoothingOutcome.value.error).toEqual({ field: "medianLength", message: "Median window must be an odd whole number." });
  });

  it("keeps the smoothing keys in their own scope", () => {
    const model = createTimingModel();
    model.smoothingModel.applyQuery("?v=1&rpm=2500rpm&s.a=0.05&s.rpm=1000rpm");
    model.timingModel.applyQuery("?v=1&rpm=2500rpm&s.a=0.05&s.rpm=1000rpm");
    expect(model.timing.texts.topSpeed.value).toBe("2500 rpm");
    expect(model.smoothing.texts.speed.value).toBe("1000 rpm");
    expect(model.smoothing.texts.smoothingFactor.value).toBe("0.05");
    expect(model.timing.notices.value).toEqual([]);
  });
});

describe("calibration model", () => {
  it("fits the invented demo readings and flags the knock at 2000 rpm on line 10", () => {
    const model = calibrationModel();
    expect(model.text.value).toBe(DEMO_TEXT);
    const fit = model.outcome.value.fit!;
    expect(fit.spikes.flagged).toEqual([7]);
    expect(model.data.value.lines[7]).toBe(10); // a comment line and a header come first
    expect(fit.method).toBe("least-squares-without-spikes");
    expect(fit.radius * 1000).toBeCloseTo(12.703056937531846, 9); // pinned in tests/calc/calibration.test.ts
  });

  it("comes with the demo's outcome exactly as the fitting code computes it, in a form that survives JSON (the page's props)", () => {
    expect(JSON.parse(JSON.stringify(start))).toEqual(start);
    const model = calibrationModel();
    expect(model.outcome.value).toEqual(start.outcome);
    expect(model.parsed.value).toEqual(parseCalibrationCsv(start.text));
    expect(model.handoff.value).toBe(start.outcome.handoff!.metric);
  });

  it("shows the start's outcome without the fitting code, and loads that code on the first change of a setting", async () => {
    const model = createCalibrationModel(start);
    expect(model.outcome.value).toBe(start.outcome);
    expect(model.pending.value).toBe(false);
    model.fields.texts.spikeThreshold.value = "5";
    expect(model.pending.value).toBe(true);
    expect(model.outcome.value).toBe(start.outcome); // the last outcome stands for a moment
    await model.loadEngine();
    expect(model.pending.value).toBe(false);
    expect(model.outcome.value.fit!.spikes.threshold).toBe(5);
    model.fields.texts.spikeThreshold.value = "3.5";
    expect(model.outcome.value).toEqual(start.outcome);
  });

  it("shows a link's readings once the fitting code that writes them into the text box is here, and links them meanwhile", async () => {
    const model = createCalibrationModel(start);
    model.applyQuery("?v=1&d=v1:600:5.4,1200:20.6,1800:46.3");
    expect(model.pending.value).toBe(true);
    expect(model.queryFor("")).toContain("d=v1:600:5.4,1200:20.6,1800:46.3");
    await model.loadEngine();
    expect(model.pending.value).toBe(false);
    expect(model.text.value).toBe("speed (rpm),reading (gₙ)\n600,5.4\n1200,20.6\n1800,46.3\n");
    expect(model.outcome.value.fit!.count).toBe(3);
  });

  it("shows text it wrote itself without its reader, and loads the reader on the first edit", async () => {
    const model = createCalibrationModel(start);
    // the demo and a link's rows come with their reading: the same the reader gives
    expect(model.parsed.value).toEqual(parseCalibrationCsv(DEMO_TEXT));
    const before = model.outcome.value.fit!.radius;
    model.text.value = "rpm,g\n600,5.4\n1200,20.6\n1800,46.1\n";
    expect(model.outcome.value.fit!.radius).toBe(before); // the last reading stands for a moment
    await model.loadTextReader();
    expect(model.parsed.value.rows.map((r) => r.line)).toEqual([2, 3, 4]);
    expect(model.outcome.value.fit!.count).toBe(3);
  });

  it("lists a malformed line by number and reason, and fits the rest", () => {
    const model = calibrationModel();
    model.text.value = "rpm,g\n600,5.4\nsix hundred,7\n1200,20.6\n1800,46.1\n";
    expect(model.parsed.value.problems.map((p) => p.line)).toEqual([3]);
    expect(model.parsed.value.problems[0]!.reason).toContain("speed");
    expect(model.outcome.value.fit!.count).toBe(3);
  });

  it("says how many readings the fit needs when there are too few", () => {
    const model = calibrationModel();
    model.text.value = "1200,20\n1800,46\n";
    expect(model.outcome.value.error).toEqual({ field: "rows", message: "The fit needs at least 3 readings at different speeds; the text gives 2 usable." });
  });

  it("writes the rows into a readable, versioned link and reads back exactly the same fit", () => {
    const model = calibrationModel();
    const query = model.queryFor("");
    expect(query).toContain("d=v1:600:5.37,800:9.18,");
    expect(query).toMatch(/^v=1&/);
    const again = calibrationModel();
    again.text.value = "";
    again.applyQuery(`?${query}`);
    expect(again.fields.notices.value).toEqual([]);
    expect(again.outcome.value.fit!.radius).toBe(model.outcome.value.fit!.radius);
    expect(again.outcome.value.fit!.bias).toBe(model.outcome.value.fit!.bias);
  });

  it("explains a malformed or foreign link and never throws", () => {
    const model = calibrationModel();
    model.applyQuery(`?v=1&d=v9:1:2&su=furlongs`);
    expect(model.fields.notices.value.join(" ")).toContain("unknown version 9");
    expect(model.fields.notices.value.join(" ")).toContain("bare speeds");
    expect(model.outcome.value.fit).toBeNull();
    const other = calibrationModel();
    other.applyQuery(`?d=${encodeURIComponent("v1:600:5.37,abc,1200:20.6,1800:46.3,<b>")}`);
    expect(other.fields.notices.value.some((n) => n.includes('reading 2 ("abc")'))).toBe(true);
    expect(other.outcome.value.fit!.count).toBe(3);
  });

  it("hands the fitted radius and offset to the drift page under the keys that page reads", () => {
    const model = calibrationModel();
    const link = new URL(model.handoff.value!, "https://example.org/");
    expect(link.pathname).toBe("/chapters/heading-drift/");
    // the drift page's own keys, each value written so that it reads back exactly
    expect(link.searchParams.get(headingDriftInputs.assumedRadius.urlKey)).toMatch(/^12\.703\d*mm$/);
    expect(Number(link.searchParams.get("ra")!.replace("mm", "")) * 0.001).toBe(model.outcome.value.fit!.radius);
    expect(Number(link.searchParams.get(headingDriftInputs.biasCorrection.urlKey)!.replace("g", "")) * STANDARD_GRAVITY).toBe(model.outcome.value.fit!.bias);
    expect(link.hash).toBe("#drift-calculator");
  });

  it("hands over in inches when the page is in US units", () => {
    const model = calibrationModel();
    model.fields.setSystem("us");
    const link = new URL(model.handoff.value!, "https://example.org/");
    expect(link.searchParams.get("u")).toBe("us");
    expect(link.searchParams.get("ra")).toMatch(/^0\.50012\d*in$/); // 12.70306 mm / 25.4 = 0.5001204 in
  });

  it("reads bare numbers in the units chosen, and keeps those in the link", () => {
    const model = calibrationModel();
    model.speedUnit.value = "rad/s";
    model.accelerationUnit.value = "m/s2";
    model.text.value = "100,127\n200,508\n300,1143\n";
    // 127 m/s² at 100 rad/s is 12.7 mm exactly; the link carries every reading exactly
    expect(Math.abs(model.outcome.value.fit!.radius / 0.0127 - 1)).toBeLessThan(1e-12);
    const query = new URLSearchParams(model.queryFor(""));
    expect(query.get("su")).toBe("rad/s");
    expect(query.get("au")).toBe("m/s2");
  });
});

describe("server render (the path Astro islands take)", () => {
  const pages = {
    drift: renderToString(<HeadingDriftCalculator id="hd" />),
    timing: renderToString(<HeadingTimingCalculator id="ht" />),
    calibration: renderToString(<CalibrationCalculator id="hc" start={start} />),
  };

  it.each(Object.entries(pages))("%s: labels every input, select and text box", (_, html) => {
    const ids = [...html.matchAll(/<(?:input|select|textarea)[^>]*id="([^"]+)"/g)].map((m) => m[1]);
    expect(ids.length).toBeGreaterThan(3);
    for (const id of ids) expect(html, id).toContain(`for="${id}"`);
  });

  it.each(Object.entries(pages))("%s: renders results and a chart without NaN or Infinity", (_, html) => {
    expect(html).toContain("data-out=");
    expect(html).toContain("<svg");
    expect(html).not.toMatch(/NaN|Infinity/);
  });

  it("counts the inputs each page declares", () => {
    // Fields, menus and radios; each quantity field's unit menu is part of its field, not counted.
    const count = (html: string) => [...html.matchAll(/<(?:input|select|textarea)\b(?![^>]*: unit")/g)].length;
    expect(count(pages.drift)).toBe(11 + 2); // drift fields, unit radios (the pair section opens on demand)
    expect(count(pages.timing)).toBe(6 + 8 + 2);
    expect(count(pages.calibration)).toBe(1 + 1 + 2 + 2 + 2); // text, file, two selects, k and level, radios
  });
});
