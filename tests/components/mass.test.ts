import { beforeAll, describe, expect, it, vi } from "vitest";
import { demoRobotBalance, demoRobotParts } from "../../calc/mass/demo.ts";
import { encodeLayout, parseLayout } from "../../calc/mass/layout-text.ts";
import * as arithmetic from "../../components/mass/compute.ts";
import { createMassModel, loadMassCompute, readPoints, startingResult } from "../../components/mass/model.ts";
import { createPart, partFields, readPart } from "../../components/mass/parts.ts";

const DEMO = encodeLayout(demoRobotParts());
const demo = demoRobotBalance().balance;

/** The model's result, failing the test when there is none. */
function resultOf(model: ReturnType<typeof createMassModel>) {
  const o = model.outcome.value;
  if (!o || o.error) throw new Error(`no result: ${JSON.stringify(o?.error)}`);
  return o;
}

function rel(actual: number, expected: number) {
  return Math.abs(actual - expected) / Math.abs(expected);
}

// Runs first: the arithmetic is not loaded yet (it loads once per page and then serves every model).
describe("mass-layout model before its arithmetic loads", () => {
  it("shows the starting result handed in and waits, without a result, once something changes", () => {
    const initial = startingResult(DEMO, arithmetic)!;
    expect(initial.balance.gradeMet?.label).toBe("G 630");
    const model = createMassModel("metric", DEMO, initial);
    expect(model.waiting.value).toBe(false);
    expect(resultOf(model).balance).toEqual(initial.balance);
    const start = model.fields.texts.spinSpeed.value;
    model.fields.texts.spinSpeed.value = "3000 rpm";
    expect(model.waiting.value).toBe(true);
    expect(model.outcome.value).toBeNull();
    // Back to the starting input: the starting result answers again.
    model.fields.texts.spinSpeed.value = start;
    expect(model.waiting.value).toBe(false);
    expect(resultOf(model).balance).toEqual(initial.balance);
    // Without a starting result, a layout waits from the start; an empty list needs nothing.
    expect(createMassModel("metric", DEMO).waiting.value).toBe(true);
    expect(createMassModel("metric", "").waiting.value).toBe(false);
  });

  it("works out the same starting result at build time as after loading", async () => {
    const initial = startingResult(DEMO, arithmetic);
    await loadMassCompute();
    expect(resultOf(createMassModel("metric", DEMO))).toMatchObject(JSON.parse(JSON.stringify(initial)));
  });
});

describe("mass-layout model", () => {
  beforeAll(() => loadMassCompute());

  it("computes the invented demo robot from its layout text with the default inputs", () => {
    const model = createMassModel("metric", DEMO);
    expect(model.parts.value).toHaveLength(9);
    const { balance } = resultOf(model);
    // Same calc, same inputs: the field texts (6 significant figures) reproduce the chapter's figures.
    expect(rel(balance.layout.totalMass, demo.layout.totalMass)).toBeLessThan(1e-6);
    expect(rel(balance.layout.centreX, demo.layout.centreX)).toBeLessThan(1e-6);
    expect(rel(balance.static.unbalance, 0.002432)).toBeLessThan(1e-6);
    expect(balance.gradeMet?.label).toBe("G 630");
  });

  it("turns each part's fields into the calc part and back", () => {
    for (const part of demoRobotParts()) {
      const model = createPart("metric", part);
      const read = readPart(model)!;
      expect(read.name).toBe(part.name);
      expect(read.shape.kind).toBe(part.shape.kind);
      expect(read.mass).toEqual(part.mass.kind === "material" && part.shape.kind === "cylinder" ? { ...part.mass, thickness: undefined } : part.mass);
      expect(Math.abs(read.x - part.x)).toBeLessThan(1e-9);
    }
    expect(partFields("ring", "steel-4130-normalized")).toEqual(["section", "radius", "x", "y", "z"]);
    expect(partFields("custom", "al-6061-t6")).toEqual(["mass", "inertiaZ", "productXZ", "productYZ", "x", "y", "z"]);
    expect(partFields("cylinder", "al-6061-t6")).toEqual(["radius", "height", "x", "y", "z"]);
  });

  it("applies a permalink: scalars, parts list, mode and mounting points", () => {
    const model = createMassModel("metric", DEMO);
    model.applyQuery("?v=1&rpm=3000rpm&l=v1~pt_a_10_0_0_100~disk_b_0_0_0_50_al-6061-t6_5&cw=p&pts=-40,0;0,-40");
    expect(model.fields.texts.spinSpeed.value).toBe("3000 rpm");
    expect(model.parts.value.map((p) => p.name.value)).toEqual(["a", "b"]);
    expect(model.mode.value).toBe("p");
    expect(model.points.value).toBe("-40, 0; 0, -40");
    expect(model.notices.value).toEqual([]);
    const { plan } = resultOf(model);
    expect(plan.counterweight?.x).toBeCloseTo(-0.04, 12);
  });

  it("writes a link that reopens the same check (round trip)", () => {
    const first = createMassModel("metric", DEMO);
    first.parts.value[3]!.fields.texts.x.value = "15 mm";
    first.mode.value = "m";
    first.fields.texts.counterweightMass.value = "60 g";
    const query = first.queryFor("");
    expect(query).toMatch(/^v=1&/);
    expect(query).toContain("cw=m");
    expect(query).toContain("cm=60g");
    expect(query).toContain("l=v1~disk_base%2520plate_0_0_2.5_70_al-6061-t6_5~");
    const second = createMassModel("metric", "v1");
    second.applyQuery(`?${query}`);
    expect(second.notices.value).toEqual([]);
    const a = resultOf(first).balance;
    const b = resultOf(second).balance;
    expect(b.layout.centreX).toBe(a.layout.centreX);
    expect(b.counterweight.forMass.radius).toBe(a.counterweight.forMass.radius);
  });

  it("explains a malformed parts list part by part, in the parts editor's words, and keeps the readable parts", async () => {
    const model = createMassModel("metric", DEMO);
    model.applyQuery("?v=1&l=v1~pt_a_0_0_0_10~blob_b_0_0_0_1~disk_c_0_0_0_-5_20");
    expect(model.parts.value.map((p) => p.name.value)).toEqual(["a"]);
    // The wording of a part that breaks a rule loads on demand.
    await vi.waitFor(() => expect(model.notices.value[1]).toMatch(/^Part 3 of the link's parts list was left out: Radius/));
    expect(model.notices.value).toEqual([
      'Part 2 of the link\'s parts list was left out: unknown shape "blob"; use one of pt, disk, ring, ann, plate, rod, cyl, lcyl, cust.',
      "Part 3 of the link's parts list was left out: Radius must be greater than 0 mm and at most 100000 mm (got -5 mm).",
    ]);
  });

  it("keeps the example layout when the whole list cannot be read, and reports other link problems", () => {
    const model = createMassModel("metric", DEMO);
    model.applyQuery("?v=1&l=v9~pt_a_0_0_0_10&l=v1&cw=zz&colour=red");
    expect(model.parts.value).toHaveLength(9);
    expect(model.notices.value).toEqual([
      'The link sets "l" more than once; the first value was used.',
      'The link has a parameter "colour" that this calculator does not use; it was ignored.',
      `The link's counterweight question "zz" is not one this calculator offers; it was ignored.`,
      "The parts list in the link could not be read (version 9 is not known; this reader understands v1); the example layout is shown.",
    ]);
    expect(model.mode.value).toBe("r");
  });

  it("ignores over-long mounting points from a link, with a notice", () => {
    const model = createMassModel("metric", DEMO);
    model.applyQuery(`?v=1&pts=${"1,1;".repeat(101)}`);
    expect(model.points.value).toBe("55, 0; 0, 55; -55, 0; 0, -55");
    expect(model.notices.value).toEqual(["The link's value for Mounting points is longer than 400 characters; it was ignored."]);
  });

  it("maps a rule across a part's fields to that part's field", () => {
    const model = createMassModel("metric", "v1~ann_ring_0_0_0_10_20_100");
    model.parts.value[0]!.fields.texts.innerRadius.value = "30 mm";
    expect(model.outcome.value?.error).toEqual({ part: 0, field: "innerRadius", message: "Inner radius must be less than the outer radius (20 mm)." });
  });

  it("maps scalar rules to their fields and waits for fields that do not read", () => {
    const model = createMassModel("metric", DEMO);
    model.fields.texts.planeZ2.value = "4 mm";
    expect(model.outcome.value?.error).toEqual({
      part: null,
      field: "planeZ2",
      message: "Upper correction plane must be a height different from the other plane (0.004 m).",
    });
    model.fields.texts.planeZ2.value = "24 mm";
    model.fields.texts.sensorX.value = "0";
    expect(model.outcome.value?.error?.field).toBe("sensorX");
    model.fields.texts.sensorX.value = "-32 mm";
    model.parts.value[0]!.fields.texts.radius.value = "abc";
    expect(model.outcome.value).toBeNull();
    expect(model.parts.value[0]!.fields.readings.radius.value.ok).toBe(false);
  });

  it("adds, duplicates, moves and removes parts, copying texts as typed", () => {
    const model = createMassModel("metric", "v1~pt_a_10_0_0_100");
    const added = model.add();
    expect(added.name.value).toBe("part 2");
    expect(readPart(added)).toEqual({ name: "part 2", shape: { kind: "point" }, mass: { kind: "given", mass: 0.05 }, x: 0, y: 0, z: 0 });
    added.fields.texts.mass.value = "oops";
    model.duplicate(1);
    expect(model.parts.value.map((p) => p.name.value)).toEqual(["a", "part 2", "part 2 (copy)"]);
    expect(model.parts.value[2]!.fields.texts.mass.value).toBe("oops");
    model.move(2, -2);
    expect(model.parts.value.map((p) => p.name.value)).toEqual(["part 2 (copy)", "a", "part 2"]);
    model.move(0, 1);
    expect(model.parts.value.map((p) => p.name.value)).toEqual(["a", "part 2 (copy)", "part 2"]);
    model.remove(1);
    model.remove(1);
    expect(model.parts.value.map((p) => p.name.value)).toEqual(["a"]);
    model.remove(0);
    expect(model.outcome.value).toBeNull();
  });

  it("mirrors a part in place or as a copy, through calc's mirrorPart", () => {
    const model = createMassModel("metric", "v1~plate_battery_30_40_10_70_35_30_280");
    expect(model.mirror(0, "x", true)).toBe(true);
    const copy = model.parts.value[1]!;
    expect(copy.name.value).toBe("battery (mirror)");
    expect([copy.fields.texts.x.value, copy.fields.texts.y.value, copy.fields.texts.angle.value]).toEqual(["30 mm", "-40 mm", "-30°"]);
    expect(model.mirror(0, "y", false)).toBe(true);
    expect([model.parts.value[0]!.fields.texts.x.value, model.parts.value[0]!.fields.texts.angle.value]).toEqual(["-30 mm", "150°"]);
    model.parts.value[0]!.fields.texts.x.value = "";
    expect(model.mirror(0, "y", false)).toBe(false);
  });

  it("applies the proposed counterweight and undoes it", () => {
    const model = createMassModel("metric", DEMO);
    const before = resultOf(model);
    expect(before.plan.status).toBe("apply");
    model.apply();
    expect(model.parts.value).toHaveLength(10);
    const cw = model.parts.value[9]!;
    expect([cw.name.value, cw.shape.value, cw.fields.texts.mass.value, cw.fields.texts.x.value, cw.fields.texts.y.value]).toEqual([
      "counterweight",
      "point",
      "39 g",
      "-55 mm",
      "0 mm",
    ]);
    const after = resultOf(model);
    expect(after.balance.offsetVerdict).toBe("within-target");
    expect(after.plan.status).toBe("not-needed");
    // Hand sum as in tests/calc/mass.test.ts: 0.19953 mm, through 6-figure field texts.
    expect(rel(after.balance.layout.offset, 0.00019953)).toBeLessThan(1e-4);
    expect(model.applied.value?.before.met).toBe("G 630");
    expect(model.applied.value?.after.met).toBe("G 100");
    model.undo();
    expect(model.parts.value).toHaveLength(9);
    expect(model.applied.value).toBeNull();
    expect(resultOf(model).balance.layout.offset).toBe(before.balance.layout.offset);
  });

  it("starts empty and puts the parts back with undo, the link following both", () => {
    const model = createMassModel("metric", DEMO);
    model.clear();
    expect(model.parts.value).toHaveLength(0);
    expect(model.outcome.value).toBeNull();
    // An empty list is written as the bare layout version, and reads back as empty.
    const empty = model.queryFor("");
    expect(new URLSearchParams(empty).get("l")).toBe("v1");
    const reopened = createMassModel("metric", DEMO);
    reopened.applyQuery(empty);
    expect(reopened.parts.value).toHaveLength(0);
    model.restore();
    expect(model.parts.value).toHaveLength(9);
    expect(model.cleared.value).toBeNull();
    expect(new URLSearchParams(model.queryFor("")).get("l")).toBe(DEMO);
    // Undo is offered only while the list is still empty: a part added after it keeps the new list.
    model.clear();
    model.add();
    model.restore();
    expect(model.parts.value).toHaveLength(1);
  });

  it("switches units for every part and the mounting points, and back", () => {
    const model = createMassModel("metric", DEMO);
    model.mode.value = "p";
    model.setSystem("us");
    expect(model.parts.value[3]!.fields.texts.x.value).toBe("0.472441 in");
    expect(model.parts.value[3]!.fields.texts.mass.value).toBe("9.87671 oz");
    expect(model.points.value).toBe("2.16535, 0; 0, 2.16535; -2.16535, 0; 0, -2.16535");
    expect(model.queryFor("")).toContain("u=us");
    model.setSystem("metric");
    expect(model.parts.value[3]!.fields.texts.x.value).toBe("12 mm");
    expect(model.points.value).toBe("55, 0; 0, 55; -55, 0; 0, -55");
  });

  it("reads mounting points and says which one is wrong", () => {
    expect(readPoints("55, 0; 0 in, -2 in", "metric")).toEqual({
      points: [
        { x: 0.055, y: 0 },
        { x: 0, y: -0.0508 },
      ],
      error: null,
    });
    expect(readPoints(" ", "metric").error).toBe("Enter 1 to 20 points, as x, y pairs separated by semicolons.");
    expect(readPoints("55, 0; 12", "metric").error).toBe("Point 2 must be two coordinates, x and y, separated by a comma.");
    expect(readPoints("55, zz", "metric").error).toMatch(
      /^Point 1 must be two coordinates, x and y, separated by a comma \(Coordinate must start with a number/,
    );
  });

  it("round-trips the demo layout text through the fields exactly enough", () => {
    const model = createMassModel("metric", DEMO);
    const text = model.queryFor("");
    const l = new URLSearchParams(text).get("l")!;
    expect(parseLayout(l).parts).toEqual(parseLayout(DEMO).parts);
  });
});
