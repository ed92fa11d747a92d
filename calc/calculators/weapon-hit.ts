/**
 * What a hit does (chapter "weapon-hit"): one clean hit of a spinning rotor on a free opponent,
 * by impulse and momentum with a coefficient of restitution: the energy the rotor gives up and
 * where it goes, the rotor's speed after the hit, the impulse your own robot takes, the bite, and
 * an estimate of the contact force from a crush distance.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatNumber, formatQuantity } from "../core/units.ts";
import { weaponHit } from "../weapon/impact.ts";
import { weaponHitInputs } from "../weapon/hit-inputs.ts";

export const form = /* @__PURE__ */ defineForm({
  id: "weaponHit",
  title: "What a hit does",
  chapter: "weapon-hit",
  anchor: "weapon-hit-calculator",
  order: 94,
  inputs: weaponHitInputs,
});

/** What the calculator computes: one hit. */
export const run = weaponHit;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: Parameters<typeof formatQuantity>[1]) => formatQuantity(v, kind, { system }).text;
    const hit = r.impact;
    return [
      {
        title: "What a hit does",
        status: "info",
        rule: `One clean hit at ${q(values.weaponSpeed, "angularSpeed")} on a free ${q(values.targetMass, "mass")} opponent, restitution ${String(Number(values.restitution.toPrecision(3)))}; the force is an estimate from a ${q(values.stoppingDistance, "length")} crush`,
        margin: `The rotor gives up ${q(hit.rotorEnergyDrop, "energy")} of ${q(r.storedEnergy, "energy")} and drops to ${q(Math.abs(hit.spinSpeedAfter), "angularSpeed")}${hit.spinSpeedAfter < 0 ? " backwards" : ""}; ${q(hit.energyToTarget, "energy")} goes to the opponent; the contact force is ${q(r.force.average, "force")} to ${q(r.force.peak, "force")}`,
        figure: figureOf("Energy to the opponent", hit.energyToTarget, "energy", system),
        details: [
          impulseFigure(hit.impulse),
          figureOf("Peak contact force (estimate)", r.force.peak, "force", system),
          figureOf("Bite", r.bite, "length", system),
        ],
      },
    ];
  },
});

/** The impulse in N·s (no unit kind of its own). */
function impulseFigure(impulse: number) {
  return { label: "Impulse on your robot", value: impulse, unit: "N·s", text: `${formatNumber(impulse, 3)} N·s` };
}
