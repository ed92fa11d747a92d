/**
 * What the quick balance check asks for: its numeric input declarations and the words of its
 * limit, apart from the check itself (calc/mass/quick-balance.ts) so that a page that only reads or
 * writes a design's quick-balance section does not carry the arithmetic.
 */
import { defineInputs } from "../core/inputs.ts";
import { rpmToRadPerSecond } from "../core/units.ts";

/** Inputs of the quick balance check, in SI. */
export const quickBalanceInputs = /* @__PURE__ */ defineInputs({
  robotMass: {
    label: "Robot mass",
    kind: "mass",
    min: 0.01,
    max: 1000,
    default: 1.5,
    urlKey: "M",
    help: "The whole robot as it stands before the change (for an added part, without it).",
  },
  spinSpeed: {
    label: "Spin speed",
    kind: "angularSpeed",
    min: 0.1,
    max: /* @__PURE__ */ rpmToRadPerSecond(60000),
    default: /* @__PURE__ */ rpmToRadPerSecond(2400),
    urlKey: "rpm",
    help: "The fastest the robot spins in service.",
  },
  wobbleForce: {
    label: "Wobble force you accept",
    kind: "force",
    min: 0,
    minOpen: true,
    max: 1e6,
    default: 50,
    urlKey: "F",
    help: "The largest rotating force from unbalance you will put up with at that speed: it shakes the robot and walks it across the floor.",
  },
  partMass: {
    label: "Part mass",
    kind: "mass",
    min: 0,
    max: 1000,
    default: 0.012,
    urlKey: "m",
    help: "The part you add or move, weighed.",
  },
  partRadius: {
    label: "Part's distance from the spin axis",
    kind: "length",
    min: 0,
    max: 2,
    default: 0.045,
    urlKey: "r",
    help: "From the spin axis to the centre of the added part, in the plane of spin.",
  },
  moveDistance: {
    label: "Distance it moved",
    kind: "length",
    min: 0,
    max: 4,
    default: 0.01,
    urlKey: "d",
    help: "How far the part's centre moved, in a straight line in the plane of spin (10 mm outward, or 10 mm sideways, both count as 10 mm).",
  },
  counterweightRadius: {
    label: "Counterweight radius",
    kind: "length",
    min: 0.001,
    max: 2,
    default: 0.05,
    urlKey: "rc",
    help: "Distance from the spin axis at which you can fix a counterweight.",
  },
});

/** How the limit is set: a balance grade, or the wobble force the builder accepts. */
export type QuickBalanceLimit = "grade" | "force";
/** Whether the part is added to the robot or moved within it. */
export type QuickBalanceChange = "added" | "moved";

/** The verdict is Marginal up to one step of the grade table (× 2.5) past the limit, as in the mass-layout check. */
export const QUICK_BALANCE_MARGIN = 2.5;
