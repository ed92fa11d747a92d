/**
 * The spin-up calculator (chapter "spin-up"): how long a weapon rotor or a whole-body spinner takes
 * to reach its speed with given motors, reduction and battery, and the energy it then stores.
 * Its page also compares up to three variants and sweeps one input (link keys "variants", "b.",
 * "c.", "d.", "s."), which the page reads itself. The form (inputs, choices) is declared in
 * calc/drivetrain/spin-up-form.ts and the page's link keys in spin-up-view.ts, apart from the simulation.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator, type ValuesOf } from "../core/calculator.ts";
import { formatNumber, formatQuantity, type QuantityKind } from "../core/units.ts";
import { simulateSpinUp } from "../drivetrain/simulate.ts";
import { form } from "../drivetrain/spin-up-form.ts";

export { applies, driveTypeChoice, form, SPINNER_ONLY } from "../drivetrain/spin-up-form.ts";
export {
  readSpinUpView,
  type SpinUpView,
  type SpinUpViewText,
  spinUpViewKeys,
  spinUpViewText,
  SWEEP_SCOPE,
  SWEEPABLE,
  VARIANT_SCOPES,
  VARIANTS_KEY,
} from "../drivetrain/spin-up-view.ts";

/** What the calculator computes, for the build sheet and the command line (its page simulates with the time series, from the form alone); the cards below speak for them. */
export function run(values: ValuesOf<typeof form>) {
  return simulateSpinUp(values, { series: false });
}

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(_values, r, system) {
    const q = (v: number, kind: QuantityKind) => formatQuantity(v, kind, { system }).text;
    // At the operating (target) speed when it is reached, else at the top speed the drive gets to.
    const top = r.timeToTarget !== null ? r.atTargetSpeed : r.atTopSpeed;
    return [
      {
        title: "Spin-up",
        status: r.verdict === "reaches-target" ? "holds" : "fails",
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
          figureOf(
            r.drive.currentLimitAt === "none" ? "Stall current per motor (no limit)" : "Motor current at standstill",
            r.drive.stallCurrent,
            "current",
            system,
          ),
        ],
      },
      {
        key: "energy",
        title: "Stored energy",
        status: "info",
        rule: "Kinetic energy ½·J·Ω² at the target speed (or the top speed reached): what the enclosure and the event's rules must contain",
        margin: `${q(top.storedEnergy, "energy")} at ${q(top.angularSpeed, "angularSpeed")}, tip speed ${q(top.tipSpeed, "speed")}`,
        figure: figureOf("Stored energy", top.storedEnergy, "energy", system),
        details: [{ label: "Energy per kilogram of robot", value: top.energyPerMass, unit: "J/kg", text: `${formatNumber(top.energyPerMass)} J/kg` }],
      },
    ];
  },
});
