/**
 * The turn check (chapter "weapon-turn"): how fast a robot with a weapon on a horizontal axle
 * across it (a vertical disc, a drum, a bar) can turn before the weapon's gyroscopic moment lifts
 * its wheels on one side, against the turn rate its drive reaches.
 */
import { figureOf, ratioFigure } from "../core/check.ts";
import { type ValuesOf, defineCalculator, defineForm } from "../core/calculator.ts";
import { defineChoices } from "../core/choices.ts";
import { type QuantityKind, type UnitId, formatNumber, formatQuantity } from "../core/units.ts";
import type { HORIZONTAL_SPIN_OPTIONS } from "../weapon/gyroscopic.ts";
import { weaponTurnCheck } from "../weapon/turn-check.ts";
import { WEAPON_TURN_CHOICE_DEFAULTS, weaponTurnInputs } from "../weapon/turn-inputs.ts";

/** Which way the weapon spins. */
export const weaponTurnChoices = /* @__PURE__ */ defineChoices({
  horizontalSpin: {
    label: "The weapon's front edge moves",
    urlKey: "spin",
    // The values of HORIZONTAL_SPIN_OPTIONS, with labels short enough for a phone's menu.
    options: [
      { value: "front-up", label: "up" },
      { value: "front-down", label: "down" },
    ] as const satisfies readonly { value: (typeof HORIZONTAL_SPIN_OPTIONS)[number]["value"]; label: string }[],
    default: WEAPON_TURN_CHOICE_DEFAULTS.horizontalSpin,
  },
});

/** Inputs of the entry this page does not ask for: the tilt and precession figures (a horizontal axle's verdict does not read them). */
const NOT_ASKED = new Set(["tiltRate", "tiltingMoment", "precessionAngle"]);

export const form = /* @__PURE__ */ defineForm({
  id: "weaponTurn",
  title: "Turning with a spinning weapon",
  chapter: "weapon-turn",
  anchor: "weapon-turn-calculator",
  order: 90,
  inputs: weaponTurnInputs,
  choices: weaponTurnChoices,
  applies: (input) => !NOT_ASKED.has(input),
});

/** What the calculator computes: the turn check for a weapon on a horizontal axle across the robot. */
export const run = (values: ValuesOf<typeof form>) =>
  weaponTurnCheck({ ...values, axle: "horizontal", verticalSpin: WEAPON_TURN_CHOICE_DEFAULTS.verticalSpin });

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(values, r, system) {
    const q = (v: number, kind: QuantityKind, unit?: UnitId) => formatQuantity(v, kind, { system, unit }).text;
    const turn = r.turn!;
    const lift = turn.liftTurnRate;
    return [
      {
        title: "Turn rate before a wheel lifts",
        status: r.verdict,
        rule: `A wheel lifts where J·Ω·ψ̇ (plus the centrifugal m·v·ψ̇·h) reaches m·g·(t/2 ± y_c); the lift turn rate should be at least ${formatNumber(values.liftMargin)} × the larger of the drive's fastest turn and the turn rate entered`,
        margin:
          lift === null
            ? "No turn rate lifts a wheel: the moments cancel"
            : `A wheel lifts turning ${turn.liftTurn} at ${q(lift, "angularSpeed", "deg/s")}; the drive reaches ${q(turn.driveTurnRate, "angularSpeed", "deg/s")} at ${q(values.forwardSpeed, "speed")}`,
        figure: lift === null ? null : figureOf("Lift turn rate", lift, "angularSpeed", system, "deg/s"),
        details: [
          figureOf("Drive's fastest turn at that speed", turn.driveTurnRate, "angularSpeed", system, "deg/s"),
          figureOf("Drive's fastest turn in place", turn.driveTurnRateInPlace, "angularSpeed", system, "deg/s"),
          figureOf("Gyroscopic moment at the turn rate entered", turn.gyroscopicMoment, "torque", system),
          figureOf("Bearing force pair at that turn rate", turn.bearingForce, "force", system),
          ...(turn.margin === null ? [] : [ratioFigure("Lift margin", turn.margin)]),
        ],
      },
    ];
  },
});
