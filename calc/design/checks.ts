/**
 * The build sheet: every check of the handbook run on one design, each with a status (holds,
 * marginal, fails, or info), the rule and margin that decided it, and its key figure. The same
 * code feeds the build-sheet page and the command line.
 */
import { accelerometerPlacement } from "../rotation/rotation.ts";
import { headingDrift } from "../heading/drift-budget.ts";
import { massBalance } from "../mass/mass-balance.ts";
import { fastenerCheck, rimCheck } from "../loads/index.ts";
import { simulateSpinUp } from "../drivetrain/simulate.ts";
import type { DrivetrainInput } from "../drivetrain/inputs.ts";
import { CalcInputError } from "../core/errors.ts";
import { formatNumber, formatQuantity, type QuantityKind, type UnitId, type UnitSystem } from "../core/units.ts";
import type { Design, DesignSection } from "./design.ts";

export type CheckStatus = "holds" | "marginal" | "fails" | "info";

export interface CheckFigure {
  label: string;
  /** The value in SI (or a plain ratio). */
  value: number;
  /** The SI unit of `value`, "" for a ratio. */
  unit: string;
  /** Formatted for the chosen unit system. */
  text: string;
}

export interface CheckResult {
  /** Stable id, e.g. "fasteners[1]". */
  id: string;
  section: DesignSection;
  /** Index within a list section (fasteners, rims), else null. */
  index: number | null;
  title: string;
  status: CheckStatus;
  /** The rule that decides the status, in words. */
  rule: string;
  /** Where the design stands against the rule, in words with numbers. */
  margin: string;
  /** The headline figure. */
  figure: CheckFigure | null;
  /** Other figures worth a glance. */
  details: CheckFigure[];
}

const SI_UNIT: Partial<Record<QuantityKind, string>> = {
  length: "m",
  mass: "kg",
  acceleration: "m/s²",
  angularSpeed: "rad/s",
  angle: "rad",
  time: "s",
  force: "N",
  speed: "m/s",
  energy: "J",
  power: "W",
  stress: "Pa",
  unbalance: "kg·m",
  current: "A",
  voltage: "V",
  inertia: "kg·m²",
};

function figureOf(label: string, value: number, kind: QuantityKind, system: UnitSystem, unit?: UnitId, significant = 3): CheckFigure {
  return { label, value, unit: SI_UNIT[kind] ?? "", text: formatQuantity(value, kind, { system, unit, significant }).text };
}

function ratioFigure(label: string, value: number): CheckFigure {
  return { label, value, unit: "", text: formatNumber(value, 3) };
}

function failedInput(section: DesignSection, index: number | null, title: string, error: unknown): CheckResult {
  const message = error instanceof CalcInputError ? error.message : error instanceof Error ? error.message : String(error);
  return {
    id: index === null ? section : `${section}[${index}]`,
    section,
    index,
    title,
    status: "fails",
    rule: "The inputs must be valid before anything can be checked",
    margin: `Could not compute: ${message}`,
    figure: null,
    details: [],
  };
}

const VERDICT_STATUS = { holds: "holds", marginal: "marginal", fails: "fails" } as const;

/**
 * Runs every check the design has inputs for, in build-sheet order.
 *
 * @param design a design read by `readDesign` (every value already within its declared range)
 * @param system units for the texts ("metric" or "us")
 * @returns one CheckResult per check; a check whose inputs cannot be computed fails with the reason
 *
 * Sources: those of each chapter's entry function (openstax-college-physics, iso-21940-11,
 * iso-898-1, timoshenko-goodier, …).
 */
export function runChecks(design: Design, system: UnitSystem = design.units): CheckResult[] {
  const results: CheckResult[] = [];
  const q = (value: number, kind: QuantityKind, unit?: UnitId) => formatQuantity(value, kind, { system, unit }).text;

  if (design.placement) {
    const title = "Accelerometer placement";
    try {
      const r = accelerometerPlacement(design.placement);
      const status: CheckStatus = r.verdict === "fits" ? "holds" : r.verdict === "too-close-in" ? "marginal" : "fails";
      const margin =
        r.verdict === "no-window"
          ? `No radius works: low-speed resolution needs at least ${q(r.minRadius, "length")}, full scale allows at most ${q(r.maxRadius, "length")}`
          : `Sensor at ${q(design.placement.radius, "length")}; usable window ${q(r.minRadius, "length")} to ${q(r.maxRadius, "length")}; reads ${formatNumber(r.fullScaleUsed * 100)} % of full scale at top speed`;
      results.push({
        id: "placement",
        section: "placement",
        index: null,
        title,
        status,
        rule: `Reading at top speed at most ${formatNumber((1 - design.placement.margin) * 100)} % of full scale, and one count resolves speed to ${formatNumber(design.placement.resolution * 100)} % at the lowest tracked speed`,
        margin,
        figure: figureOf("Sensor reading at top speed", r.accelerationAtTop, "acceleration", system),
        details: [
          figureOf("Smallest usable radius", r.minRadius, "length", system),
          figureOf("Largest usable radius", r.maxRadius, "length", system),
          figureOf("Pull on the other part's mounts", r.part.force, "force", system),
        ],
      });
    } catch (error) {
      results.push(failedInput("placement", null, title, error));
    }
  }

  if (design.headingDrift) {
    const title = "Heading drift";
    try {
      const r = headingDrift(design.headingDrift);
      const drift = r.atSpeed.driftRate;
      const status: CheckStatus = r.verdict === "within-budget" ? "holds" : "fails";
      results.push({
        id: "headingDrift",
        section: "headingDrift",
        index: null,
        title,
        status,
        rule: `Drift at ${q(design.headingDrift.angularSpeed, "angularSpeed")} within ±${q(design.headingDrift.budget, "angularSpeed", "deg/s")}`,
        margin:
          drift === null
            ? `No estimate at this speed: the corrected reading is zero or negative`
            : `Drifts ${q(drift, "angularSpeed", "deg/s")} (${q(r.atSpeed.driftPerRevolution ?? 0, "angle")} per revolution)`,
        figure: drift === null ? null : figureOf("Drift rate", drift, "angularSpeed", system, "deg/s"),
        details: [],
      });
    } catch (error) {
      results.push(failedInput("headingDrift", null, title, error));
    }
  }

  if (design.mass && design.mass.parts.length > 0) {
    const title = "Balance";
    try {
      const r = massBalance({ ...design.mass.scalars, parts: design.mass.parts, candidates: design.mass.candidates });
      const chosen = design.mass.scalars.balanceGrade;
      const status: CheckStatus = r.gradeVerdict === "meets-grade" ? "holds" : r.equivalentGrade <= chosen * 2.5 ? "marginal" : "fails";
      results.push({
        id: "mass",
        section: "mass",
        index: null,
        title,
        status,
        rule: `Balance grade G ${formatNumber(chosen * 1000)} or finer at ${q(design.mass.scalars.spinSpeed, "angularSpeed")} (ISO 21940-11); marginal up to one grade step (× 2.5) coarser`,
        margin: `Centre of mass ${q(r.layout.offset, "length")} off the geometric centre: equivalent grade G ${formatNumber(r.equivalentGrade * 1000)}; ${r.fix.method === "none" || r.fix.method === "too-heavy" ? "no counterweight suggested" : `a ${q(r.fix.after.totalMass - r.fix.before.totalMass, "mass")} counterweight brings it to ${q(r.fix.after.offset, "length")}`}`,
        figure: figureOf("Equivalent balance grade", r.equivalentGrade, "speed", system, "mm/s"),
        details: [
          figureOf("Total mass", r.layout.totalMass, "mass", system),
          figureOf("Static unbalance", r.static.unbalance, "unbalance", system),
          figureOf("Rotating force from the unbalance", r.static.force, "force", system),
          figureOf("Moment of inertia about the spin axis", r.layout.inertiaAboutCentre, "inertia", system),
        ],
      });
      const s = r.sensor.before;
      results.push({
        id: "mass.sensor",
        section: "mass",
        index: null,
        title: "True sensor radius",
        status: "info",
        rule: "The firmware's radius should be the radius about the centre of mass, not the geometric centre",
        margin: `Sensor is ${q(s.radiusTrue, "length")} from the centre of mass and ${q(s.radiusAssumed, "length")} from the geometric centre: ${q(s.driftPerRevolution, "angle")} of drift per revolution if the firmware uses the latter`,
        figure: figureOf("Drift per revolution", s.driftPerRevolution, "angle", system),
        details: [figureOf("Radius about the centre of mass", s.radiusTrue, "length", system)],
      });
    } catch (error) {
      results.push(failedInput("mass", null, title, error));
    }
  }

  (design.fasteners ?? []).forEach((entry, index) => {
    const title = `Fasteners: ${entry.name}`;
    try {
      const r = fastenerCheck(entry);
      results.push({
        id: `fasteners[${index}]`,
        section: "fasteners",
        index,
        title,
        status: VERDICT_STATUS[r.verdict],
        rule: `Safety factor at least ${formatNumber(entry.marginalBelow)} holds, below ${formatNumber(entry.failBelow)} fails (${entry.count} × ${r.size} class ${r.propertyClass} in ${r.mode}, ISO 898-1 minimum strengths)`,
        margin: `${q(r.part.force, "force")} pull at ${q(entry.angularSpeed, "angularSpeed")}: ${q(r.stress, "stress")} per bolt, safety factor ${formatNumber(r.safetyFactor)} (${r.governs})`,
        figure: ratioFigure("Safety factor", r.safetyFactor),
        details: [
          figureOf("Speed at which the bolts yield", r.speedAtYield, "angularSpeed", system),
          figureOf("Load on each bolt", r.forcePerBolt, "force", system),
        ],
      });
    } catch (error) {
      results.push(failedInput("fasteners", index, title, error));
    }
  });

  (design.rims ?? []).forEach((entry, index) => {
    const title = `Rim: ${entry.name}`;
    try {
      const r = rimCheck(entry);
      results.push({
        id: `rims[${index}]`,
        section: "rims",
        index,
        title,
        status: VERDICT_STATUS[r.verdict],
        rule: `Safety factor against yield at least ${formatNumber(entry.marginalBelow)} holds, below ${formatNumber(entry.failBelow)} fails`,
        margin: `Peak stress ${q(r.peakStress, "stress")} at ${q(entry.angularSpeed, "angularSpeed")} (tip speed ${q(r.tipSpeed, "speed")}); yields at ${q(r.speedAtYield, "angularSpeed")}, bursts near ${q(r.speedAtUltimate, "angularSpeed")}`,
        figure: ratioFigure("Safety factor against yield", r.safetyFactorYield),
        details: [figureOf("Estimated burst speed", r.speedAtUltimate, "angularSpeed", system), figureOf("Tip speed", r.tipSpeed, "speed", system)],
      });
    } catch (error) {
      results.push(failedInput("rims", index, title, error));
    }
  });

  if (design.drivetrain) {
    const title = "Spin-up";
    try {
      const r = simulateSpinUp(design.drivetrain as DrivetrainInput, { series: false });
      const status: CheckStatus = r.verdict === "reaches-target" ? "holds" : "fails";
      results.push({
        id: "drivetrain",
        section: "drivetrain",
        index: null,
        title,
        status,
        rule: `Reaches the target speed ${q(r.targetSpeed, "angularSpeed")}`,
        margin:
          r.timeToTarget !== null
            ? `Reaches it in ${q(r.timeToTarget, "time")} (90 % in ${q(r.timeTo90 ?? r.timeToTarget, "time")}); peak battery current ${q(r.peakBatteryCurrent, "current")}, battery sags to ${q(r.minBatteryVoltage, "voltage")}`
            : `Tops out at ${q(r.topSpeed, "angularSpeed")}${r.verdict === "stalled" ? " (does not move)" : ""}`,
        figure:
          r.timeToTarget !== null
            ? figureOf("Time to target speed", r.timeToTarget, "time", system)
            : figureOf("Top speed reached", r.topSpeed, "angularSpeed", system),
        details: [
          figureOf("Peak battery current", r.peakBatteryCurrent, "current", system),
          figureOf("Lowest battery voltage", r.minBatteryVoltage, "voltage", system),
        ],
      });
      // At the operating (target) speed when it is reached, else at the top speed the drive gets to.
      const top = r.timeToTarget !== null ? r.atTargetSpeed : r.atTopSpeed;
      results.push({
        id: "drivetrain.energy",
        section: "drivetrain",
        index: null,
        title: "Stored energy",
        status: "info",
        rule: "Kinetic energy ½·J·Ω² at the target speed (or the top speed reached): what the enclosure and the event's rules must contain",
        margin: `${q(top.storedEnergy, "energy")} at ${q(top.angularSpeed, "angularSpeed")}, tip speed ${q(top.tipSpeed, "speed")}`,
        figure: figureOf("Stored energy", top.storedEnergy, "energy", system),
        details: [{ label: "Energy per kilogram of robot", value: top.energyPerMass, unit: "J/kg", text: `${formatNumber(top.energyPerMass)} J/kg` }],
      });
    } catch (error) {
      results.push(failedInput("drivetrain", null, title, error));
    }
  }
  return results;
}

/** The worst status of a set of results (info does not count). */
export function overallStatus(results: readonly CheckResult[]): CheckStatus | "empty" {
  const ranked = results.filter((r) => r.status !== "info");
  if (ranked.length === 0) return "empty";
  if (ranked.some((r) => r.status === "fails")) return "fails";
  if (ranked.some((r) => r.status === "marginal")) return "marginal";
  return "holds";
}

/** Plain-text build sheet, as the command line prints it. */
export function buildSheetText(design: Design, results: readonly CheckResult[]): string {
  const mark: Record<CheckStatus, string> = { holds: "HOLDS   ", marginal: "MARGINAL", fails: "FAILS   ", info: "info    " };
  const lines = [`Build sheet: ${design.name}`, `Design saved ${design.modified.slice(0, 10)}; units ${design.units}`, ""];
  for (const r of results) {
    lines.push(`${mark[r.status]}  ${r.title}${r.figure ? `: ${r.figure.label} ${r.figure.text}` : ""}`);
    lines.push(`          rule:   ${r.rule}`);
    lines.push(`          result: ${r.margin}`);
    for (const d of r.details) lines.push(`          ${d.label}: ${d.text}`);
  }
  const overall = overallStatus(results);
  lines.push("", `Overall: ${overall === "empty" ? "nothing to check" : overall}`);
  lines.push(
    "",
    "Safety: figures come from simplified models and typical strengths; they certify nothing. Spin up only in a rated enclosure; your event's rules and local codes come first.",
  );
  return `${lines.join("\n")}\n`;
}
