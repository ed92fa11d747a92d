/**
 * The mass-layout calculator (chapter "mass-layout"): a parts list summed into mass, centre of mass
 * and inertia; the balance grade it meets; the counterweight that fixes it; and the sensor's true
 * radius about the centre of mass.
 */
import { figureOf } from "../core/check.ts";
import { defineChoices } from "../core/choices.ts";
import { defineCalculator, defineForm, type ExtraSpec, type ValuesOf } from "../core/calculator.ts";
import { formatNumber, formatQuantity, type QuantityKind } from "../core/units.ts";
import type { MountingPoint } from "../mass/counterweight.ts";
import { encodeLayout, parseLayout } from "../mass/layout-text.ts";
import { massBalance } from "../mass/mass-balance.ts";
import { massBalanceInputs } from "../mass/mass-balance-inputs.ts";
import { type LayoutPart, MAX_PARTS } from "../mass/parts.ts";
import { readMountingPoints, writeMountingPoints } from "../mass/points-text.ts";

/** The parts list, in a link as the compact layout text ("v1~disk_base_…"). */
const parts: ExtraSpec<LayoutPart[]> = {
  label: "Parts list",
  urlKey: "l",
  maxLength: 20_000,
  initial: () => [],
  write: (value) => encodeLayout(value),
  read(text) {
    const read = parseLayout(text);
    const whole = read.problems.some((p) => p.index === null);
    const notices = read.problems.map((p) =>
      p.index === null
        ? `The parts list in the link could not be read (${p.reason}); ${whole && !read.parts.length ? "the example layout is shown" : "the readable parts were kept"}.`
        : `Part ${p.index + 1} of the link's parts list was left out: ${p.reason}.`,
    );
    return { value: whole && read.parts.length === 0 ? null : read.parts, notices };
  },
};

/** Mounting points offered for a counterweight, in a link as "55mm,0mm;0mm,55mm". */
const candidates: ExtraSpec<MountingPoint[]> = {
  label: "Mounting points",
  urlKey: "pts",
  maxLength: 400,
  initial: () => [],
  write: (value, system) => writeMountingPoints(value, system),
  read(text, system) {
    if (text.trim() === "") return { value: [], notices: [] };
    const read = readMountingPoints(text, system);
    return { value: read.points, notices: read.error ? [`The link's mounting points were ignored: ${read.error}`] : [] };
  },
  // Stored points are read the way a link's are: written as text and read back.
  fromDesign(raw) {
    if (!Array.isArray(raw)) return { value: null, problems: [{ path: "", message: "must be a list of points" }] };
    try {
      const read = raw.length === 0 ? { points: [], error: null } : readMountingPoints(writeMountingPoints(raw as MountingPoint[], "metric"), "metric");
      return read.points ? { value: read.points, problems: [] } : { value: [], problems: [{ path: "", message: `${read.error} The points were left out` }] };
    } catch {
      return { value: [], problems: [{ path: "", message: "must be points { x, y } in metres; they were left out" }] };
    }
  },
};

/** Which counterweight question the page answers. */
export const counterweightModeChoice = defineChoices({
  mode: {
    label: "Counterweight question",
    urlKey: "cw",
    options: [
      { value: "r", label: "Mass at a radius" },
      { value: "m", label: "Radius for a mass" },
      { value: "p", label: "Best mounting point" },
    ],
    default: "r",
    help: "What to work out: the mass for a radius, the radius for a mass in hand, or the best of the mounting points.",
  },
});

export const form = /* @__PURE__ */ defineForm({
  id: "mass",
  title: "Mass layout and balance",
  chapter: "mass-layout",
  anchor: "mass-calculator",
  order: 50,
  inputs: massBalanceInputs,
  choices: counterweightModeChoice,
  extras: { parts, candidates },
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export function run(values: ValuesOf<typeof form>) {
  return massBalance({ ...values, candidates: values.candidates.length ? values.candidates : undefined });
}

export default /* @__PURE__ */ defineCalculator(form, {
  present: (values) => values.parts.length > 0,
  run,
  cards(values, r, system) {
    const q = (v: number, kind: QuantityKind) => formatQuantity(v, kind, { system }).text;
    const chosen = values.balanceGrade;
    const s = r.sensor.before;
    const turns = r.spinCentre.before;
    return [
      {
        title: "Balance",
        status: r.gradeVerdict === "meets-grade" ? "holds" : r.equivalentGrade <= chosen * 2.5 ? "marginal" : "fails",
        rule: `Balance grade G ${formatNumber(chosen * 1000)} or finer at ${q(values.spinSpeed, "angularSpeed")} (ISO 21940-11); marginal up to one grade step (× 2.5) coarser`,
        margin: `Centre of mass ${q(r.layout.offset, "length")} off the geometric centre: equivalent grade G ${formatNumber(r.equivalentGrade * 1000)}; ${r.fix.method === "list-full" ? `no room for a counterweight (the list holds ${MAX_PARTS} parts)` : r.fix.method === "none" || r.fix.method === "too-heavy" ? "no counterweight suggested" : `a ${q(r.fix.after.totalMass - r.fix.before.totalMass, "mass")} counterweight brings it to ${q(r.fix.after.offset, "length")}`}`,
        figure: figureOf("Equivalent balance grade", r.equivalentGrade, "speed", system, "mm/s"),
        details: [
          figureOf("Total mass", r.layout.totalMass, "mass", system),
          figureOf("Static unbalance", r.static.unbalance, "unbalance", system),
          figureOf("Rotating force from the unbalance", r.static.force, "force", system),
          figureOf("Moment of inertia about the spin axis", r.layout.inertiaAboutCentre, "inertia", system),
        ],
      },
      {
        key: "lift",
        title: "Couple lift",
        status: r.lift.ratio <= 0.5 ? "holds" : r.lift.ratio < 1 ? "marginal" : "fails",
        rule: `The couple's rocking moment Ω²·C against the weight's M·g·a on a ${q(values.supportRadius, "length")} support radius: one side lifts at 100 %; marginal above 50 %`,
        margin: `${formatNumber(r.lift.ratio * 100)} % of the weight's moment at ${q(values.spinSpeed, "angularSpeed")}; ${r.lift.liftSpeed === null ? "no couple, so no side lifts" : `one side lifts at ${q(r.lift.liftSpeed, "angularSpeed")}`}`,
        figure: figureOf("Rocking moment as a share of the weight's", r.lift.ratio, "fraction", system, "pct"),
        details: [
          figureOf("Rocking moment at speed", r.lift.rockingMoment, "torque", system),
          figureOf("Weight's restoring moment", r.lift.restoringMoment, "torque", system),
        ],
      },
      {
        key: "sensor",
        title: "True sensor radius",
        status: "info",
        rule: "The firmware's radius should be the radius about the spin centre (the wheels' centre while their side grip holds, else short of the centre of mass); confirm it by calibrating on the robot",
        margin: `${turns.state === "wheels-hold" ? "The wheels' grip holds: the robot turns about their centre" : `The wheels slide: the robot turns ${q(turns.distanceFromWheels, "length")} from their centre`}. Sensor is ${q(s.radiusTrue, "length")} from the spin centre and ${q(s.radiusAssumed, "length")} from the geometric centre: ${q(s.driftPerRevolution, "angle")} of drift per revolution if the firmware uses the latter`,
        figure: figureOf("Drift per revolution", s.driftPerRevolution, "angle", system),
        details: [
          figureOf("Radius about the spin centre", s.radiusTrue, "length", system),
          figureOf("Spin centre from the geometric centre", turns.distanceFromWheels, "length", system),
        ],
      },
    ];
  },
});
