/**
 * The shaft and bearings check (chapter "weapon-shaft"): the loads a spinning weapon puts on its
 * shaft (gyroscopic moment in a turn, residual unbalance, weight, a hit) for a rotor between two
 * supports or overhung, on a dead or a live shaft; the shaft's safety factor on yield and its
 * deflection; the bearings' rating life in hours at the weapon speed and their static safety
 * factor under the hit.
 */
import { figureOf, ratioFigure } from "../core/check.ts";
import { type ValuesOf, defineCalculator, defineForm } from "../core/calculator.ts";
import { defineChoices } from "../core/choices.ts";
import { type QuantityKind, type UnitId, formatNumber, formatQuantity } from "../core/units.ts";
import { MATERIAL_DENSITIES, MATERIAL_IDS } from "../materials/densities.ts";
import { type ShaftCriterion, weaponShaftCheck } from "../weapon/shaft-check.ts";
import {
  BEARING_TYPE_OPTIONS,
  SHAFT_AXLE_OPTIONS,
  SHAFT_KIND_OPTIONS,
  SHAFT_LAYOUT_OPTIONS,
  WEAPON_SHAFT_CHOICE_DEFAULTS,
  weaponShaftInputs,
} from "../weapon/shaft-inputs.ts";

/** Axle, layout, shaft kind, bearing family (the calc's own options) and shaft material (by its menu name). */
export const weaponShaftChoices = /* @__PURE__ */ defineChoices({
  axle: { label: "Direction", urlKey: "ax", options: SHAFT_AXLE_OPTIONS, default: WEAPON_SHAFT_CHOICE_DEFAULTS.axle },
  layout: { label: "Layout", urlKey: "lay", options: SHAFT_LAYOUT_OPTIONS, default: WEAPON_SHAFT_CHOICE_DEFAULTS.layout },
  shaft: { label: "Kind", urlKey: "sh", options: SHAFT_KIND_OPTIONS, default: WEAPON_SHAFT_CHOICE_DEFAULTS.shaft },
  bearingType: { label: "Bearing type", urlKey: "brg", options: BEARING_TYPE_OPTIONS, default: WEAPON_SHAFT_CHOICE_DEFAULTS.bearingType },
  material: {
    label: "Shaft material",
    urlKey: "mat",
    options: /* @__PURE__ */ MATERIAL_IDS.map((id) => ({ value: id, label: MATERIAL_DENSITIES[id].menuName })),
    default: WEAPON_SHAFT_CHOICE_DEFAULTS.material,
  },
});

/** Inputs read only in one layout or for one kind of shaft (links leave the others out). */
const ONLY_WHEN: Partial<Record<string, (v: { layout?: string; shaft?: string }) => boolean>> = {
  rotorPosition: (v) => v.layout !== "overhung",
  overhang: (v) => v.layout === "overhung",
  hubBearingSpacing: (v) => v.shaft !== "live",
  motorTorque: (v) => v.shaft === "live",
};

/** True when input `input` is read for this layout and kind of shaft (the widget hides the others; links leave them out). */
export function shaftInputApplies(input: string, values: { layout?: string; shaft?: string }): boolean {
  return ONLY_WHEN[input]?.(values) ?? true;
}

export const form = /* @__PURE__ */ defineForm({
  id: "weaponShaft",
  title: "Weapon shaft and bearings",
  chapter: "weapon-shaft",
  anchor: "weapon-shaft-calculator",
  order: 92,
  inputs: weaponShaftInputs,
  choices: weaponShaftChoices,
  applies: (input, values) => shaftInputApplies(input, values),
});

/** What the calculator computes: the shaft and bearing check. */
export const run = (values: ValuesOf<typeof form>) => weaponShaftCheck(values);

const CARD_OF: Record<ShaftCriterion["criterion"], number> = { "shaft-yield": 0, "bearing-life": 1, "bearing-static": 2 };

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: QuantityKind, unit?: UnitId) => formatQuantity(v, kind, { system, unit }).text;
    const [yieldCheck, life, shock] = [...r.criteria].sort((a, b) => CARD_OF[a.criterion] - CARD_OF[b.criterion]) as [
      ShaftCriterion,
      ShaftCriterion,
      ShaftCriterion,
    ];
    const plain = (x: number) => String(Number(x.toPrecision(3)));
    const n = (x: number | null) => (x === null ? "no load" : formatNumber(x, 2));
    const where = r.shaft === "live" ? "at the supports" : "in the rotor's hub";
    const life10 = r.bearing.ratingLifeHours;
    return [
      {
        title: "Weapon shaft",
        status: yieldCheck.verdict,
        rule: `Safety factor on yield (${r.material.name}, ${r.material.condition}) at the peak of a hit, with the turn's gyroscopic moment: fails below ${plain(yieldCheck.failBelow)}, marginal below ${plain(yieldCheck.marginalBelow)}`,
        margin: `${n(yieldCheck.value)} on yield at ${q(r.bendingMoment.peak, "torque")} of bending (${q(r.vonMisesStress, "stress")} against ${q(r.material.yieldStrength, "stress")}); ${q(r.deflection.peak, "length")} of deflection at the rotor`,
        figure: r.safetyFactor === null ? null : ratioFigure("Safety factor on yield", r.safetyFactor),
        details: [
          figureOf("Gyroscopic moment", r.loads.gyroscopicMoment, "torque", system),
          figureOf("Unbalance force", r.loads.unbalanceForce, "force", system),
          figureOf("Bending moment, running", r.bendingMoment.running, "torque", system),
        ],
      },
      {
        key: "life",
        title: "Weapon bearings: life",
        status: life.verdict,
        rule: `ISO 281 rating life L10 of the busier bearing ${where}, running at ${q(values.weaponSpeed, "angularSpeed")} in the turn: fails below the ${plain(r.bearing.requiredLifeHours)} h required, marginal below ${plain(life.marginalBelow)} times it`,
        margin:
          life10 === null
            ? "No running load on the bearings"
            : `L10 = ${formatNumber(life10, 2)} h at ${q(r.bearing.equivalentLoad, "force")} against C = ${q(values.dynamicLoadRating, "force")}`,
        figure: life10 === null ? null : { label: "Rating life L10", value: life10 * 3600, unit: "s", text: `${formatNumber(life10, 3)} h` },
        details: [],
      },
      {
        key: "shock",
        title: "Weapon bearings: shock",
        status: shock.verdict,
        rule: `ISO 76 static safety factor s0 = C0/P0 under the hit: fails below 1, marginal below ${plain(shock.marginalBelow)} (rotating, shock loads)`,
        margin: `s0 = ${n(shock.value)} at ${q(r.bearing.staticEquivalentLoad, "force")} against C0 = ${q(values.staticLoadRating, "force")}`,
        figure: shock.value === null ? null : ratioFigure("Static safety factor s0", shock.value),
        details: [],
      },
    ];
  },
});
