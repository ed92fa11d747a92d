/**
 * The accelerometer-placement calculator (chapter "acceleration"): where a sensor can sit on a
 * spinning robot so it neither saturates at top speed nor starves at the lowest tracked speed.
 */
import { figureOf, type CheckCard } from "../core/check.ts";
import { defineCalculator, defineForm } from "../core/calculator.ts";
import { formatNumber, formatQuantity, type UnitSystem } from "../core/units.ts";
import { accelerometerPlacement, type AccelerometerPlacement, type AccelerometerPlacementInput } from "../rotation/rotation.ts";
import { accelerometerPlacementInputs } from "../rotation/placement-inputs.ts";

function card(values: AccelerometerPlacementInput, r: AccelerometerPlacement, system: UnitSystem): CheckCard {
  const len = (v: number) => formatQuantity(v, "length", { system }).text;
  // Stryker disable next-line ObjectLiteral: equivalent, acceleration shows in gₙ in both unit systems
  const g = (v: number) => formatQuantity(v, "acceleration", { system }).text;
  const window = `${len(r.minRadius)} to ${len(r.maxRadius)}`;
  const [status, margin] = (
    {
      fits: [
        "holds",
        `The sensor at ${len(values.radius)} lies inside the usable window, ${window}; it reads ${formatNumber(r.fullScaleUsed * 100)} % of full scale at top speed.`,
      ],
      "too-far-out": [
        "fails",
        `Too far out: at top speed the sensor would read ${g(r.accelerationAtTop)}, ${formatNumber(r.fullScaleUsed * 100)} % of its full scale. Move it in to ${len(r.maxRadius)} or less, or use a sensor with a larger range.`,
      ],
      "too-close-in": [
        "marginal",
        `Too close in: at the lowest tracked speed one reading resolves the spin rate only to ${formatNumber(r.resolutionAtLow * 100)} %. Move it out to ${len(r.minRadius)} or more (the window is ${window}).`,
      ],
      "no-window": [
        "fails",
        `No radius satisfies both limits: resolving the lowest speed needs at least ${len(r.minRadius)}, but staying under full scale at top speed needs at most ${len(r.maxRadius)}. Use a sensor with a larger range or finer steps, track from a higher speed, or accept coarser resolution.`,
      ],
    } as const
  )[r.verdict];
  return {
    title: "Accelerometer placement",
    status,
    rule: `Reading at top speed at most ${formatNumber((1 - values.margin) * 100)} % of full scale, and one count resolves speed to ${formatNumber(values.resolution * 100)} % at the lowest tracked speed`,
    margin,
    figure: figureOf("Sensor reading at top speed", r.accelerationAtTop, "acceleration", system),
    details: [
      figureOf("Smallest usable radius", r.minRadius, "length", system),
      figureOf("Largest usable radius", r.maxRadius, "length", system),
      figureOf("Pull on the other part's mounts", r.part.force, "force", system),
    ],
  };
}

export const form = /* @__PURE__ */ defineForm({
  id: "placement",
  title: "Accelerometer placement",
  chapter: "acceleration",
  anchor: "placement-calculator",
  order: 10,
  inputs: accelerometerPlacementInputs,
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export const run = accelerometerPlacement;

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards: (values, result, system) => [card(values, result, system)],
});
