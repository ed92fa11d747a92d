/**
 * The spin-up calculator's model and server render: defaults compute, links apply (design, drive
 * type, variants, sweep) and round-trip, errors land beside the field they name, variants and the
 * batched sweep give the calc module's answers, and every input renders with its label.
 */
import { describe, expect, it, vi } from "vitest";
import { renderToString } from "preact-render-to-string";
import { DEMO_SPINNER, DEMO_WEAPON } from "../../calc/drivetrain/demo.ts";
import { simulateSpinUp } from "../../calc/drivetrain/simulate.ts";
import { compareDrivetrains, sweepDrivetrain } from "../../calc/drivetrain/compare.ts";
import { rpmToRadPerSecond } from "../../calc/core/units.ts";
import { applies, createSpinUpModel, NAMES, SPECS, SPINNER_ONLY, type SpinUpModel } from "../../components/drivetrain/model.ts";
import { defaultSweepRange } from "../../components/drivetrain/sweep.ts";
import * as simulation from "../../calc/drivetrain/simulate.ts";
import * as compare from "../../components/drivetrain/Compare.tsx";
import * as sweep from "../../components/drivetrain/Sweep.tsx";
import { drivetrainWorkedExample } from "../../calc/drivetrain/demo.ts";
import SpinUpCalculator from "../../components/calculators/spin-up.tsx";
import { Results, SpinUpCharts } from "../../components/drivetrain/Results.tsx";

const RPM = rpmToRadPerSecond(1);
const MODULES = { simulation, compare, sweep };
const now = (next: () => void) => next();
/** The model with every module at hand and its work run at once (the page loads them on demand and runs each run in a task of its own). */
const createModel = () => createSpinUpModel({ modules: MODULES, schedule: now });
/** The model's sweep (there from the start when its module is at hand). */
const sweepOf = (model: SpinUpModel) => model.sweepPart.value!;
const params = (query: string) => Object.fromEntries(new URLSearchParams(query));

/** Runs the model's sweep with batches run straight away; returns the final state. */
function sweepNow(model: SpinUpModel) {
  const stop = sweepOf(model).run((next) => next());
  const state = sweepOf(model).state.value;
  stop();
  return state;
}

describe("the spin-up model", () => {
  it("computes the invented demo weapon by default, as calc/drivetrain/ does", () => {
    const model = createModel();
    const { result, error } = model.outcome.value;
    expect(error).toBeNull();
    const expected = simulateSpinUp(DEMO_WEAPON);
    // Field text reads back to within rounding of the last digit ("80 g·cm²" is 8.000000000000001e-6 kg·m²).
    expect(result!.timeToTarget!).toBeCloseTo(expected.timeToTarget!, 12);
    // 10 000 rpm in 1.01 s (the calc doc comment's worked example).
    expect(result!.timeToTarget!).toBeCloseTo(1.0085, 4);
    expect(model.driveType.value).toBe("weapon");
  });

  it("applies a permalink: drive type, fields, variants and sweep", () => {
    const model = createModel();
    model.link.applyQuery("?v=1&u=metric&type=weapon&ratio=2.5&cells=6&variants=2&b.ratio=3&c.cells=5&s.p=ratio&s.from=1&s.to=4&s.n=31");
    expect(model.fields.notices.value).toEqual([]);
    expect(model.fields.texts.gearRatio.value).toBe("2.5");
    expect(model.values.value!.cellCount).toBe(6);
    expect(model.variants.value).toHaveLength(2);
    expect(model.variants.value[0]!.changed.value).toEqual(["gearRatio"]);
    expect(model.variantInputs.value[0]!.input!.gearRatio).toBe(3);
    expect(model.variantInputs.value[1]!.input!).toMatchObject({ gearRatio: 2.5, cellCount: 5 });
    expect(sweepOf(model).on.value).toBe(true);
    expect(sweepOf(model).parameter.value).toBe("gearRatio");
    expect(sweepOf(model).pointsReading.value).toMatchObject({ ok: true, value: 31 });
  });

  it("writes a readable link that reopens the same check, with only the inputs that apply", () => {
    const model = createModel();
    model.addVariant();
    model.changeInVariant(0, "cellCount");
    model.variants.value[0]!.fields.texts.cellCount.value = "6";
    sweepOf(model).start();
    const query = model.link.queryFor("");
    expect(query.startsWith("v=1&")).toBe(true);
    const p = params(query);
    expect(p).toMatchObject({ type: "weapon", variants: "1", "b.cells": "6", "s.p": "ratio", "s.from": "1", "s.to": "4", "s.n": "50", kv: "1400rpm/V" });
    for (const name of SPINNER_ONLY) expect(p[SPECS[name].urlKey], name).toBeUndefined();
    const again = createModel();
    again.link.applyQuery(`?${query}`);
    expect(again.link.queryFor("")).toBe(query);
    expect(again.comparison.value!.variants[0]!.result!.timeToTarget).toBe(model.comparison.value!.variants[0]!.result!.timeToTarget);
  });

  it("reports what it cannot use in a link, and ignores it", () => {
    const model = createModel();
    model.link.applyQuery("?v=1&type=tank&variants=9&e.ratio=3&b.colour=red&s.p=rw&s.q=1&ratio=2&type=weapon");
    const notices = model.fields.notices.value.join("\n");
    expect(notices).toContain('drive type "tank" is not one this calculator offers');
    expect(notices).toContain('number of variants "9" is not 0 to 3');
    expect(notices).toContain('parameters for "e.", which this calculator does not use');
    expect(notices).toContain('"b.colour" that this calculator does not use');
    expect(notices).toContain('"s.q" that this calculator does not use');
    expect(notices).toContain('sweep "rw", which this calculator cannot sweep for this drive type');
    expect(notices).toContain('sets "type" more than once');
    expect(model.driveType.value).toBe("weapon");
    expect(model.variants.value).toHaveLength(1);
    expect(sweepOf(model).on.value).toBe(false);
  });

  it("keeps hostile text as field text, never as anything else", () => {
    const model = createModel();
    model.link.applyQuery(`?ratio=${encodeURIComponent("<img src=x onerror=alert(1)>")}&b.cells=${encodeURIComponent("<b>6</b>")}`);
    expect(model.fields.texts.gearRatio.value).toBe("<img src=x onerror=alert(1)>");
    expect(model.fields.readings.gearRatio.value.ok).toBe(false);
    expect(model.variants.value[0]!.fields.texts.cellCount.value).toBe("<b>6</b>");
    expect(model.outcome.value.result).toBeNull();
  });

  it("switches the drive type, bringing in the demo spinner while the demo weapon is untouched", () => {
    const model = createModel();
    model.setDriveType("spinner");
    expect(model.driveType.value).toBe("spinner");
    for (const name of NAMES) expect(model.values.value![name], name).toBeCloseTo(DEMO_SPINNER[name], 9);
    // 3000 rpm in 2.23 s, slipping almost all the way (calc doc comment of drivetrainWorkedExample).
    expect(model.outcome.value.result!.timeToTarget!).toBeCloseTo(2.2305, 3);
    expect(params(model.link.queryFor("")).type).toBe("spinner");
    expect(params(model.link.queryFor("")).rw).toBe("18mm");
    model.setDriveType("weapon");
    expect(model.values.value!.gearRatio).toBe(2);
  });

  it("keeps edited values when the drive type switches", () => {
    const model = createModel();
    model.fields.texts.gearRatio.value = "3";
    model.setDriveType("spinner");
    expect(model.values.value!.gearRatio).toBe(3);
    expect(model.values.value!.inertia).toBe(DEMO_WEAPON.inertia);
  });

  it("ignores a bad value in a field the drive type does not read, and shows it when it does", () => {
    const model = createModel();
    model.fields.texts.wheelRadius.value = "abc";
    expect(applies("wheelRadius", "weapon")).toBe(false);
    expect(model.outcome.value.result).not.toBeNull();
    model.fields.texts.gearRatio.value = "3";
    model.setDriveType("spinner");
    expect(model.outcome.value.result).toBeNull();
    expect(model.fields.readings.wheelRadius.value.ok).toBe(false);
  });

  it("puts an error from the simulation beside the field it names", () => {
    const model = createModel();
    model.setDriveType("spinner");
    model.fields.texts.kineticFriction.value = "1.2";
    expect(model.outcome.value.error).toEqual({ field: "kineticFriction", message: "Sliding coefficient must be at most the grip coefficient (1)." });
  });

  it("compares variants with the calc module's results and names the fastest", () => {
    const model = createModel();
    model.addVariant();
    model.changeInVariant(0, "cellCount");
    expect(model.variants.value[0]!.fields.texts.cellCount.value).toBe("4");
    model.variants.value[0]!.fields.texts.cellCount.value = "6";
    model.addVariant();
    model.changeInVariant(1, "gearRatio");
    model.variants.value[1]!.fields.texts.gearRatio.value = "1.5";
    const cmp = model.comparison.value!;
    // calc doc comment of compareDrivetrains: 1.01 s, 0.93 s and 1.22 s; six cells is fastest.
    expect(cmp.variants[0]!.result!.timeToTarget!).toBeCloseTo(0.928, 3);
    expect(cmp.variants[1]!.result!.timeToTarget!).toBeCloseTo(1.221, 3);
    expect(cmp.fastest).toBe(1);
    expect(cmp.highest).toBe(1);
    model.fields.texts.targetSpeed.value = "9000 rpm";
    expect(model.comparison.value!.variants[0]!.result!.targetSpeed).toBeCloseTo(9000 * RPM, 9);
    model.removeVariant(0);
    expect(model.variants.value).toHaveLength(1);
    expect(params(model.link.queryFor(""))["b.ratio"]).toBe("1.5");
  });

  it("maps a variant's error to its own changed field, or says it under the variant", () => {
    const model = createModel();
    model.setDriveType("spinner");
    model.addVariant();
    model.changeInVariant(0, "staticFriction");
    model.variants.value[0]!.fields.texts.staticFriction.value = "0.5";
    expect(model.variantInputs.value[0]!.error).toEqual({
      field: "kineticFriction",
      message: "Sliding coefficient must be at most the grip coefficient (0.5).",
    });
    model.variants.value[0]!.fields.texts.staticFriction.value = "-1";
    expect(model.variantInputs.value[0]).toEqual({ input: null, result: null, error: null });
    expect(model.variants.value[0]!.fields.readings.staticFriction.value.ok).toBe(false);
    expect(model.comparison.value!.variants[0]!.result).toBeNull();
  });

  it("runs the sweep in batches and gets sweepDrivetrain's answer, optimum included", () => {
    const model = createModel();
    sweepOf(model).points.value = "31";
    sweepOf(model).start();
    const state = sweepNow(model);
    expect(state.status).toBe("done");
    if (state.status !== "done") return;
    // The design as read from its fields ("80 g·cm²" reads as 8.000000000000001e-6 kg·m²), swept in one go.
    const whole = sweepDrivetrain({ base: model.values.value!, parameter: "gearRatio", from: 1, to: 4, points: 31 });
    expect(state.points).toEqual(whole.points);
    expect(state.optimumIndex).toBe(whole.optimumIndex);
    expect(state.points[state.optimumIndex]!.value).toBeCloseTo(2, 12);
  });

  it("yields between batches, and a new input cancels the sweep in flight", () => {
    const model = createModel();
    sweepOf(model).points.value = "200";
    sweepOf(model).start();
    const queue: (() => void)[] = [];
    const stop = sweepOf(model).run((next) => queue.push(next));
    expect(sweepOf(model).state.value).toEqual({ status: "running", done: 0, total: 200 });
    queue.shift()!();
    sweepOf(model).points.value = "3";
    // The old run's next batch does nothing; the new run starts afresh.
    while (queue.length) queue.shift()!();
    const state = sweepOf(model).state.value;
    expect(state.status).toBe("done");
    if (state.status === "done") expect(state.points.map((p) => p.value)).toEqual([1, 2.5, 4]);
    stop();
  });

  it("skips sweep values the simulation refuses and says why", () => {
    const model = createModel();
    model.setDriveType("spinner");
    sweepOf(model).setParameter("staticFriction");
    sweepOf(model).from.value = "0.5";
    sweepOf(model).to.value = "1.5";
    sweepOf(model).points.value = "11";
    sweepOf(model).start();
    const state = sweepNow(model);
    expect(state.status).toBe("done");
    if (state.status === "done") {
      expect(state.skipped).toBe(3);
      expect(state.skippedReason).toBe("Sliding coefficient must be at most the grip coefficient (0.5).");
      expect(state.points[0]!.value).toBeCloseTo(0.8, 12);
    }
  });

  it("waits for a valid range, and refuses a range of one value", () => {
    const model = createModel();
    sweepOf(model).start();
    sweepOf(model).to.value = "1";
    expect(sweepOf(model).rangeError.value).toBe("To must differ from From.");
    expect(sweepNow(model)).toEqual({ status: "waiting" });
    sweepOf(model).to.value = "500";
    expect(sweepOf(model).toReading.value.ok).toBe(false);
  });

  it("suggests sweep ranges inside each input's declared range", () => {
    expect(defaultSweepRange("gearRatio", 2)).toEqual([1, 4]);
    expect(defaultSweepRange("cellCount", 2)).toEqual([1, 6]);
    expect(defaultSweepRange("throttle", 1)).toEqual([0.5, 1]);
    expect(defaultSweepRange("cellResistance", 0.008)).toEqual([0.004, 0.016]);
  });

  it("re-expresses design, variant and sweep fields when the unit system changes", () => {
    const model = createModel();
    model.addVariant();
    model.changeInVariant(0, "tipRadius");
    sweepOf(model).setParameter("inertia");
    model.setSystem("us");
    expect(model.fields.texts.tipRadius.value).toBe("2.3622 in");
    expect(model.variants.value[0]!.fields.texts.tipRadius.value).toBe("2.3622 in");
    expect(sweepOf(model).from.value).toMatch(/lb·in²$/);
    // Six significant figures in the new unit: 2.3622 in is 0.05999988 m.
    expect(model.values.value!.tipRadius).toBeCloseTo(0.06, 6);
    expect(params(model.link.queryFor("")).u).toBe("us");
  });
});

describe("what the spin-up model computes when, and what it loads", () => {
  const prepared = drivetrainWorkedExample().weapon;

  it("opens on the result computed at build time: the default design simulates nothing and loads nothing", () => {
    const model = createSpinUpModel({ prepared, schedule: () => expect.unreachable("nothing to run") });
    expect(model.outcome.value.result).toBe(prepared.result);
    expect(model.charted.value.result).toBe(prepared.result);
    expect(model.pending.value).toBe(false);
    expect(model.modules.value).toEqual({});
  });

  it("simulates a change in a task of its own, the newest change winning, and simulates the defaults too once changed back", () => {
    const queue: (() => void)[] = [];
    const model = createSpinUpModel({ prepared, modules: { simulation }, schedule: (next) => queue.push(next) });
    model.fields.texts.gearRatio.value = "3";
    model.fields.texts.gearRatio.value = "1.5";
    // Nothing ran during the edits: the previous result stays in view meanwhile.
    expect(model.pending.value).toBe(true);
    expect(model.outcome.value.result).toBe(prepared.result);
    expect(queue).toHaveLength(2);
    queue.shift()!(); // the run for "3": stale, dropped
    expect(model.pending.value).toBe(true);
    queue.shift()!(); // the run for "1.5"
    expect(model.pending.value).toBe(false);
    // compareDrivetrains' doc comment: a 1.5:1 reduction reaches 10 000 rpm in 1.22 s.
    expect(model.outcome.value.result!.timeToTarget!).toBeCloseTo(1.221, 3);
    // The charts follow one task later.
    expect(model.charted.value.result).toBe(prepared.result);
    queue.shift()!();
    expect(model.charted.value.result).toBe(model.outcome.value.result);
    model.fields.texts.gearRatio.value = "2";
    expect(model.pending.value).toBe(true);
    queue.shift()!();
    const again = model.outcome.value.result!;
    expect(again).not.toBe(prepared.result);
    expect(again.timeToTarget!).toBeCloseTo(prepared.result.timeToTarget!, 12);
  });

  it("gives the same figures computed live as the prepared ones", () => {
    const live = createModel();
    const shipped = createSpinUpModel({ prepared, schedule: now });
    const a = live.outcome.value.result!;
    const b = shipped.outcome.value.result!;
    expect(a).not.toBe(b);
    expect(a.timeToTarget!).toBeCloseTo(b.timeToTarget!, 12);
    expect(a.topSpeed).toBeCloseTo(b.topSpeed, 9);
    expect(a.series.length).toBe(b.series.length);
  });

  it("simulates the variants one per task, reusing the design's own result, and drops a run that a change overtook", () => {
    const queue: (() => void)[] = [];
    const model = createSpinUpModel({ prepared, modules: MODULES, schedule: (next) => queue.push(next) });
    model.link.applyQuery("?v=1&variants=2&b.cells=6&c.ratio=1.5");
    expect(model.comparison.value).toBeNull();
    queue.shift()!(); // variant 1
    expect(model.comparison.value).toBeNull();
    model.variants.value[1]!.fields.texts.gearRatio.value = "3"; // overtakes the run in flight
    while (queue.length) queue.shift()!();
    const cmp = model.comparison.value!;
    expect(cmp.base).toBe(prepared.result);
    // compareDrivetrains on the same three designs ranks them the same way.
    const whole = compareDrivetrains([DEMO_WEAPON, { ...DEMO_WEAPON, cellCount: 6 }, { ...DEMO_WEAPON, gearRatio: 3 }]);
    expect(cmp.variants.map((v) => v.result!.timeToTarget)).toEqual(whole.results.slice(1).map((r) => r.timeToTarget));
    expect([cmp.fastest, cmp.highest]).toEqual([whole.fastestIndex, whole.topSpeedIndex]);
  });

  it("loads the simulation on the first change, and the comparison and the sweep on first use or with a link that holds them", async () => {
    const model = createSpinUpModel({ prepared, schedule: now });
    model.fields.texts.cellCount.value = "6";
    await vi.waitUntil(() => !model.pending.value);
    // compareDrivetrains' doc comment: six cells reach 10 000 rpm in 0.93 s.
    expect(model.outcome.value.result!.timeToTarget!).toBeCloseTo(0.928, 3);
    expect(model.modules.value.compare).toBeUndefined();
    model.addVariant();
    await vi.waitUntil(() => model.variants.value.length === 1);
    expect(model.modules.value.sweep).toBeUndefined();
    const linked = createSpinUpModel({ prepared, schedule: now });
    linked.link.applyQuery("?v=1&variants=1&b.ratio=1.5&s.p=cells&s.from=2&s.to=8&s.n=7");
    // While their code loads, the link keeps what it was given.
    expect(params(linked.link.queryFor(""))).toMatchObject({ variants: "1", "b.ratio": "1.5", "s.p": "cells", "s.n": "7" });
    await vi.waitUntil(() => linked.variants.value.length === 1 && linked.sweepPart.value !== null);
    expect(linked.sweepPart.value!.on.value).toBe(true);
    expect(params(linked.link.queryFor(""))).toMatchObject({ variants: "1", "b.ratio": "1.5", "s.p": "cells", "s.from": "2", "s.to": "8", "s.n": "7" });
  });
});

describe("server render of the spin-up calculator (the path Astro islands take)", () => {
  // The chapter passes the worked example's weapon, computed at build time, as the default design's result.
  const html = renderToString(<SpinUpCalculator id="su" prepared={drivetrainWorkedExample().weapon} />);

  it("renders every input with a label tied to it", () => {
    const ids = [...html.matchAll(/<(?:input|select)[^>]*id="([^"]+)"/g)].map((m) => m[1]);
    // 23 design fields for a weapon and the two model menus (no-load loss, where the limit acts); the sweep's fields load on first use.
    expect(ids.length).toBe(NAMES.length - SPINNER_ONLY.length + 2);
    for (const id of ids) expect(html).toContain(`for="${id}"`);
  });

  it("labels the drive-type radio group, and says why the wheel inputs are hidden", () => {
    expect(html).toMatch(/<legend>Drive type<\/legend>/);
    expect((html.match(/type="radio" name="su-type"/g) ?? []).length).toBe(2);
    expect(html).toContain("Only a whole-body spinner has these inputs");
  });

  it("renders the default results, the regimes, the energy table and the charts, with no NaN", () => {
    expect(html).toContain("Holds: reaches the target.");
    expect(html).toMatch(/data-out="time-100">1.01 s</);
    expect(html).toContain('data-out="regimes"');
    expect(html).toContain('data-out="energy-losses"');
    expect((html.match(/<svg/g) ?? []).length).toBe(3);
    expect(html).not.toMatch(/NaN|Infinity/);
  });

  it("says plainly when the drive falls short or never moves, still with no NaN, Infinity or negative time", () => {
    const short = { ...DEMO_WEAPON, targetSpeed: 15000 * RPM };
    const shortHtml = renderToString(<Results r={simulateSpinUp(short)} input={short} system="metric" />);
    // Tops out at 11 270 rpm: 24.9 % below 15 000 rpm.
    expect(shortHtml).toContain("Fails: falls short of the target.");
    expect(shortHtml).toMatch(/11270 rpm \(settles by 3.\d+ s\), 24.9 % below the 15000 rpm target/);
    expect(shortHtml).toContain("not reached — tops out at 11270 rpm");
    const stuck = { ...DEMO_WEAPON, frictionTorque: 5 };
    const r = simulateSpinUp(stuck);
    expect(r.verdict).toBe("stalled");
    const stuckHtml = renderToString(<Results r={r} input={stuck} system="us" />) + renderToString(<SpinUpCharts r={r} input={stuck} />);
    expect(stuckHtml).toContain("Fails: does not move.");
    expect(stuckHtml).toContain("The drive never moves");
    expect(stuckHtml).toContain("none at rest");
    expect(stuckHtml).not.toMatch(/NaN|Infinity|−\d/);
  });
});
