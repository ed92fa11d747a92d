/**
 * Every link reader refuses, with a notice, a value or key that is the name of something every
 * JavaScript object already has (`toString`, `__proto__`, `constructor`, `hasOwnProperty`,
 * `valueOf`): a lookup in a plain object (`value in OPTIONS`, `TABLE[value]`) finds those on the
 * object's prototype and would take them for a known value.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { readLink, valuesOf } from "../../calc/core/calculator.ts";
import { readSpinUpView } from "../../calc/calculators/spin-up.ts";
import { CALCULATORS } from "../../calc/design/calculators.ts";
import { rimMaterialChoices } from "../../calc/loads/index.ts";
import { parseLayout } from "../../calc/mass/layout-text.ts";
import { readMountingPoints } from "../../calc/mass/points-text.ts";
import { createRimModel } from "../../components/calculators/rims.tsx";
import { createCalibrationModel } from "../../components/heading/calibration-model.ts";
import { calibrationStart } from "../../components/heading/calibration-engine.ts";
import { createMassModel, loadMassCompute } from "../../components/mass/model.ts";

// The mass layout works out a link's layout once its arithmetic has loaded (the page loads it for a link).
beforeAll(() => loadMassCompute());

const NAMES = ["toString", "__proto__", "constructor", "hasOwnProperty", "valueOf"];
const link = (params: Record<string, string>) => `?${new URLSearchParams({ v: "1", ...params })}`;

describe("link keys", () => {
  // readLink looks values up by key in a plain object: a key named like an inherited property would
  // find the property where the link set nothing.
  it("are never named like a property every object inherits", () => {
    const keys = CALCULATORS.flatMap((calc) => [
      ...Object.values(calc.inputs).map((s) => s.urlKey),
      ...Object.values(calc.choices).map((s) => s.urlKey),
      ...Object.values(calc.extras).map((s) => s.urlKey),
      ...(calc.pageKeys ?? []),
    ]);
    expect(keys.filter((key) => key in Object.prototype || key === "__proto__")).toEqual([]);
  });
});

describe.each(NAMES)("a link that says %s", (name) => {
  const plain = CALCULATORS.filter((calc) => calc.scope === "");

  it.each(CALCULATORS.flatMap((calc) => Object.entries(calc.choices).map(([choice, spec]) => ({ calc, choice, spec }))))(
    "as the $calc.id calculator's $choice is refused with a notice",
    ({ calc, choice, spec }) => {
      const read = readLink(calc, link({ [`${calc.scope ? `${calc.scope}.` : ""}${spec.urlKey}`]: name }));
      expect(read.choices[choice]).toBeUndefined();
      expect(read.notices).toEqual([`The link's ${spec.label.toLowerCase()} "${name}" is not one this calculator offers; it was ignored.`]);
    },
  );

  it.each(plain)("as a key of the $id calculator is reported and sets nothing", (calc) => {
    const read = readLink(calc, link({ [name]: "1" }));
    expect(read).toMatchObject({ texts: {}, choices: {}, extras: {} });
    expect(read.notices).toEqual([`The link has a parameter "${name}" that this calculator does not use; it was ignored.`]);
  });

  it.each(CALCULATORS.flatMap((calc) => Object.entries(calc.extras).map(([extra, spec]) => ({ calc, extra, spec }))))(
    "as the $calc.id calculator's $extra, or inside it, is refused with a notice or an error, never thrown",
    ({ calc, extra, spec }) => {
      for (const text of [name, `v1~${name}_a_0_0_0_10_100`, `${name},${name}`]) {
        const { values, errors, notices } = valuesOf(calc, { extras: { [extra]: text } }, "metric");
        // A value that reads is one the calculator made itself (an empty list), never the prototype's.
        if (values) expect(values[extra]).not.toBe((Object.prototype as Record<string, unknown>)[name]);
        expect(errors.length + notices.length, `${spec.label} from ${text}`).toBeGreaterThan(0);
      }
    },
  );

  it("as a part's shape, material or unit in a parts list leaves the part out and says why", () => {
    const shape = parseLayout(`v1~${name}_a_0_0_0_10_100`);
    expect(shape.parts).toEqual([]);
    expect(shape.problems).toEqual([{ index: 0, reason: expect.stringMatching(/^unknown shape ".*"; use one of pt, disk, ring/) }]);
    const material = parseLayout(`v1~disk_a_0_0_0_10_${name}_3`);
    expect(material.parts).toEqual([]);
    expect(material.problems).toEqual([{ index: 0, reason: expect.stringContaining("is neither a number of grams nor a known material") }]);
    expect(readMountingPoints(`1 ${name}, 2 mm`, "metric").points).toBeNull();
  });

  it("as the spin-up page's variant count, variant key, sweep input or scope is reported", () => {
    const { view, notices } = readSpinUpView(link({ variants: name, [`b.${name}`]: "1", "s.p": name, [`${name}.x`]: "1" }), "spinner");
    expect(view.variants).toEqual([{}]);
    expect(view.sweep).toBeNull();
    expect(notices).toHaveLength(4);
  });

  it("as the rim page's material is refused with a notice", () => {
    const model = createRimModel(rimMaterialChoices());
    const before = model.material.value;
    model.applyQuery(link({ mat: name }));
    expect(model.material.value).toBe(before);
    expect(model.fields.notices.value).toEqual([`The link's material "${name}" is not one this calculator offers; it was ignored.`]);
  });

  it("as the calibration page's units for bare numbers is refused with a notice", () => {
    const model = createCalibrationModel(calibrationStart());
    const before = [model.speedUnit.value, model.accelerationUnit.value];
    model.applyQuery(link({ su: name, au: name }));
    expect([model.speedUnit.value, model.accelerationUnit.value]).toEqual(before);
    expect(model.fields.notices.value).toHaveLength(2);
  });

  it("as the mass-layout page's counterweight question, shape or material is refused with a notice, and the page keeps working", () => {
    const model = createMassModel("metric", "v1~pt_a_10_0_0_100");
    model.applyQuery(link({ cw: name, l: `v1~pt_a_10_0_0_100~${name}_b_0_0_0_10_100~disk_c_0_0_0_10_${name}_3` }));
    expect(model.mode.value).toBe("r");
    expect(model.parts.value).toHaveLength(1);
    expect(model.notices.value).toEqual([
      `The link's counterweight question "${name}" is not one this calculator offers; it was ignored.`,
      expect.stringMatching(/^Part 2 of the link's parts list was left out: unknown shape/),
      expect.stringMatching(/^Part 3 of the link's parts list was left out: mass ".*" is neither a number of grams nor a known material/),
    ]);
    expect(model.outcome.value?.error).toBeNull();
  });
});
