/**
 * Calculator descriptors: a form's link keys must be unique and never u or v; the values it starts
 * with; links written from values and texts, and read back, with every notice and refusal worded.
 * A small form of our own stands in for the handbook's calculators.
 */
import { describe, expect, it } from "vitest";
import {
  defineCalculator,
  defineForm,
  type ExtraSpec,
  initialValues,
  linkFor,
  linkKeys,
  linkQuery,
  pageLink,
  readLink,
  textsOf,
  valuesOf,
  writeLink,
} from "../../../calc/core/calculator.ts";
import { defineChoices } from "../../../calc/core/choices.ts";
import { defineInputs } from "../../../calc/core/inputs.ts";
import { MAX_VALUE_LENGTH } from "../../../calc/core/permalink.ts";
import { expectRefusal, refusal } from "../../support/refusal.ts";

const inputs = defineInputs({
  radius: { label: "Hub radius", kind: "length", min: 0, max: 1, minOpen: true, default: 0.02, urlKey: "r" },
  wheelGap: { label: "Wheel gap", kind: "length", min: 0, max: 0.1, default: 0.005, urlKey: "gap" },
});
const choices = defineChoices({
  drive: {
    label: "Drive Type",
    urlKey: "drive",
    options: [
      { value: "belt", label: "Belt" },
      { value: "direct", label: "Direct" },
    ],
    default: "belt",
  },
});
/** A list of whole numbers written "1~2~3"; refuses anything else. */
const teeth: ExtraSpec<number[]> = {
  label: "Tooth list",
  urlKey: "t",
  maxLength: 12,
  initial: () => [10, 20],
  write: (list) => list.join("~"),
  read: (text) => {
    const list = text.split("~").map(Number);
    return list.every(Number.isInteger) ? { value: list, notices: [] } : { value: null, notices: [`Tooth list ${text} is not a list of whole numbers.`] };
  },
};
const form = defineForm({
  id: "demo",
  title: "Demo",
  chapter: "demo-chapter",
  anchor: "demo-calculator",
  order: 1,
  inputs,
  choices,
  extras: { teeth },
  pageKeys: ["cmp"],
  // The wheel gap applies to a belt drive only.
  applies: (input, values) => input !== "wheelGap" || values.drive !== "direct",
});

describe("defineForm", () => {
  it("fills in the scope, the choices, the extras and the section shape", () => {
    const bare = defineForm({ id: "bare", title: "Bare", chapter: "c", anchor: "a", order: 2, inputs });
    expect(bare).toMatchObject({ id: "bare", scope: "", choices: {}, extras: {}, section: { kind: "single" } });
    const listed = defineForm({ id: "rims", title: "Rims", chapter: "c", anchor: "a", order: 2, inputs, scope: "p", list: { max: 6, entryName: "rim" } });
    expect(listed).toMatchObject({ scope: "p", section: { kind: "list", max: 6, entryName: "rim" } });
    expect(listed).not.toHaveProperty("list");
  });

  it.each([
    { pageKeys: ["r"], got: "r", why: "a page key that is an input's" },
    { pageKeys: ["u"], got: "u", why: "the unit system's key" },
    { pageKeys: ["v"], got: "v", why: "the version's key" },
    { pageKeys: ["drive", "x", "x"], got: "drive, x", why: "a choice's key, and one key twice" },
    { pageKeys: ["t"], got: "t", why: "an extra's key" },
  ])("refuses $why", ({ pageKeys, got }) => {
    expectRefusal(
      () => defineForm({ id: "demo", title: "Demo", chapter: "c", anchor: "a", order: 1, inputs, choices, extras: { teeth }, pageKeys }),
      "urlKey",
      got,
      "",
      `urlKey must be used once in calculator "demo", and not u or v (got "${got}")`,
    );
  });

  it("refuses a missing form or inputs by name", () => {
    expectRefusal(() => defineForm(null as never), "spec", null, "", "spec must be an object of named inputs (got null)");
    expect(refusal(() => defineForm({ id: "x", title: "X", chapter: "c", anchor: "a", order: 1 } as never)).param).toBe("inputs");
  });

  it("defineCalculator joins the form and the behaviour", () => {
    const run = () => 1;
    const cards = () => [];
    const calc = defineCalculator(form, { run, cards });
    expect(calc).toMatchObject({ id: "demo", run, cards, scope: "" });
  });
});

describe("initialValues and linkKeys", () => {
  it("starts on each input's and choice's default and each extra's first value", () => {
    expect(initialValues(form)).toEqual({ radius: 0.02, wheelGap: 0.005, drive: "belt", teeth: [10, 20] });
    expectRefusal(() => initialValues(undefined as never), "calc", undefined, "", "calc must be an object of named inputs (got nothing)");
  });

  it("reads inputs and choices up to the longest field value and extras up to their own", () => {
    expect(linkKeys(form)).toEqual([
      { key: "r", label: "Hub radius", maxLength: MAX_VALUE_LENGTH },
      { key: "gap", label: "Wheel gap", maxLength: MAX_VALUE_LENGTH },
      { key: "drive", label: "Drive Type", maxLength: MAX_VALUE_LENGTH },
      { key: "t", label: "Tooth list", maxLength: 12 },
    ]);
  });
});

describe("readLink", () => {
  it("reads texts, choices on the list and extras, leaving the page's own keys unreported", () => {
    expect(readLink(form, "?v=1&r=30mm&drive=direct&t=1~2&cmp=x&u=us")).toEqual({
      texts: { radius: "30mm" },
      choices: { drive: "direct" },
      extras: { teeth: "1~2" },
      system: "us",
      notices: [],
    });
  });

  it("holds no entry at all for a key the link does not set", () => {
    expect(readLink(form, "r=1mm")).toStrictEqual({ texts: { radius: "1mm" }, choices: {}, extras: {}, system: undefined, notices: [] });
    expect(readLink(form, "")).toStrictEqual({ texts: {}, choices: {}, extras: {}, system: undefined, notices: [] });
  });

  it("ignores a choice not on the list, naming it in lower case", () => {
    expect(readLink(form, "drive=chain").notices).toEqual(['The link\'s drive type "chain" is not one this calculator offers; it was ignored.']);
    expect(readLink(form, "drive=chain").choices).toEqual({});
  });

  it("refuses a query that is not text", () => {
    expectRefusal(() => readLink(form, 5 as never), "search", 5, "", "search must be a query string (got 5)");
  });
});

describe("writeLink", () => {
  const state = { texts: { radius: "30 mm" }, choices: { drive: "direct" }, extras: { teeth: "1~2" } };

  it("writes texts as a link spells them, choices and extras as they are, and page values over them", () => {
    expect(writeLink(form, state, "metric")).toBe("v=1&drive=direct&r=30mm&t=1~2&u=metric");
    expect(writeLink(form, state, "us", "", { cmp: "a", drive: "belt" })).toBe("v=1&cmp=a&drive=belt&r=30mm&t=1~2&u=us");
    expect(writeLink(form, { texts: {}, choices: {}, extras: {} } as never, "metric")).toBe("v=1&u=metric");
    expect(writeLink(form, {} as never, "metric")).toBe("v=1&u=metric");
  });

  it("writes a scoped calculator's keys alone when there is no query to keep", () => {
    const scoped = { ...form, scope: "p" };
    expect(writeLink(scoped, state, "us")).toBe("v=1&p.drive=direct&p.r=30mm&p.t=1~2&p.u=us");
    expect(linkQuery(scoped, { radius: 0.03 })).toBe("v=1&p.r=30mm&p.u=metric");
  });

  it("refuses a missing state or an existing query that is not text", () => {
    expectRefusal(() => writeLink(form, null as never, "metric"), "state", null, "", "state must be an object of named inputs (got null)");
    expectRefusal(() => writeLink(form, state, "metric", 5 as never), "existing", 5, "", "existing must be a query string (got 5)");
  });
});

describe("textsOf and links from values", () => {
  it("writes each value that applies in its field's unit, and leaves out those that do not", () => {
    expect(textsOf(form, { radius: 0.0254, wheelGap: 0.002, drive: "belt", teeth: [3, 4] }, "us")).toEqual({
      texts: { radius: "1in", wheelGap: "0.07874015748031496in" },
      choices: { drive: "belt" },
      extras: { teeth: "3~4" },
    });
    expect(textsOf(form, { radius: 0.03, wheelGap: 0.002, drive: "direct" }, "metric")).toEqual({
      texts: { radius: "30mm" },
      choices: { drive: "direct" },
      extras: {},
    });
  });

  it("holds no entry at all for a value left out", () => {
    expect(textsOf(form, { radius: 0.03 }, "metric")).toStrictEqual({ texts: { radius: "30mm" }, choices: {}, extras: {} });
  });

  it("refuses missing values by name", () => {
    expectRefusal(() => textsOf(form, null as never, "metric"), "values", null, "", "values must be an object of named inputs (got null)");
  });

  it("builds the query, the link from the chapter and the link from anywhere", () => {
    const values = { radius: 0.03, drive: "direct" };
    expect(linkQuery(form, values)).toBe("v=1&drive=direct&r=30mm&u=metric");
    // 0.03 m is no number of inches that multiplies back exactly: the US link writes it in metres.
    expect(pageLink(form, values, { system: "us", pageValues: { cmp: "b" } })).toBe("?v=1&cmp=b&drive=direct&r=0.03m&u=us#demo-calculator");
    expect(linkFor(form, values, { existing: "x.r=1" })).toBe("chapters/demo-chapter/?v=1&drive=direct&r=30mm&u=metric&x.r=1#demo-calculator");
    expectRefusal(() => linkQuery(form, values, null as never), "options", null, "", "options must be an object of named inputs (got null)");
  });
});

describe("valuesOf", () => {
  const calc = defineCalculator(form, { run: () => 0, cards: () => [] });

  it("reads each field, keeps defaults for the rest, and passes an extra's notices on", () => {
    expect(valuesOf(calc, { texts: { radius: "1 in" }, choices: { drive: "direct" }, extras: { teeth: "5~6" } }, "metric")).toEqual({
      values: { radius: 0.0254, wheelGap: 0.005, drive: "direct", teeth: [5, 6] },
      errors: [],
      notices: [],
    });
    expect(valuesOf(calc, {}, "metric").values).toEqual(initialValues(form));
  });

  it("gives no values and each error when a field or an extra does not read", () => {
    expect(valuesOf(calc, { texts: { radius: "0", wheelGap: "1 mm" }, extras: { teeth: "a~b" } }, "metric")).toEqual({
      values: null,
      errors: [
        { name: "radius", message: "Hub radius must be greater than 0 mm and at most 1000 mm (got 0 mm)" },
        { name: "teeth", message: "Tooth list could not be read." },
      ],
      notices: ["Tooth list a~b is not a list of whole numbers."],
    });
  });

  it("refuses a missing state by name", () => {
    expectRefusal(() => valuesOf(calc, null as never, "metric"), "state", null, "", "state must be an object of named inputs (got null)");
  });
});
