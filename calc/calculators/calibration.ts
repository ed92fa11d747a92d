/**
 * The calibration calculator (chapter "calibration"): fit the radial reading against a reference
 * speed, a = r·ω² + b, to get the firmware's radius and offset from logged readings.
 */
import { figureOf } from "../core/check.ts";
import { defineCalculator, defineForm, type ExtraSpec, type ValueProblem, type ValuesOf } from "../core/calculator.ts";
import { formatNumber, formatQuantity } from "../core/units.ts";
import { CALIBRATION_ROWS_MAX, decodeCalibrationRows, encodeCalibrationRows } from "../heading/calibration-rows.ts";
import { fitCalibration } from "../heading/calibration.ts";
import { type CalibrationRow, calibrationFitInputs, demoCalibrationRows } from "../heading/calibration-inputs.ts";

/** The readings: reference speed and radial reading per row, in a link as "v1:1200:31.5,…" (rpm:g). */
const rows: ExtraSpec<CalibrationRow[]> = {
  label: "Readings",
  urlKey: "d",
  maxLength: 16_000,
  initial: demoCalibrationRows,
  write: (value) => encodeCalibrationRows(value),
  read(text) {
    const decoded = decodeCalibrationRows(text);
    const notices = decoded.problems.map((p) =>
      p.piece === 0 ? `The link's readings: ${p.reason}.` : `The link's reading ${p.piece} ("${p.text}"): ${p.reason}; it was skipped.`,
    );
    return { value: decoded.version === null && decoded.rows.length === 0 ? null : decoded.rows, notices };
  },
  fromDesign(raw) {
    const problems: ValueProblem[] = [];
    if (!Array.isArray(raw)) return { value: null, problems: [{ path: "", message: "must be a list of readings" }] };
    const value: CalibrationRow[] = [];
    for (const [i, row] of raw.slice(0, CALIBRATION_ROWS_MAX).entries()) {
      const r = row as { angularSpeed?: unknown; acceleration?: unknown } | null;
      const speed = r?.angularSpeed;
      const acceleration = r?.acceleration;
      if (typeof speed === "number" && Number.isFinite(speed) && speed >= 0 && typeof acceleration === "number" && Number.isFinite(acceleration)) {
        value.push({ angularSpeed: speed, acceleration });
      } else problems.push({ path: `[${i}]`, message: `Reading ${i + 1} must be a speed of 0 rpm or more and an acceleration, both numbers; it was left out` });
    }
    if (raw.length > CALIBRATION_ROWS_MAX)
      problems.push({ path: "", message: `lists ${raw.length} readings; only the first ${CALIBRATION_ROWS_MAX} were read` });
    return { value, problems };
  },
};

export const form = /* @__PURE__ */ defineForm({
  id: "calibration",
  title: "Calibration fit",
  chapter: "calibration",
  anchor: "calibration-calculator",
  order: 40,
  inputs: calibrationFitInputs,
  extras: { rows },
  pageKeys: ["su", "au"],
});

/** What the calculator computes: its page runs this; the cards below speak for the build sheet and the command line. */
export function run(values: ValuesOf<typeof form>) {
  const { rows, ...options } = values;
  return fitCalibration(rows, options);
}

export default /* @__PURE__ */ defineCalculator(form, {
  run,
  cards(_values, fit, system) {
    const len = (v: number) => formatQuantity(v, "length", { system, significant: 4 }).text;
    const flagged = fit.spikes.flagged.length;
    // A reading that does not rise with speed gives no radius to use (the page says the same).
    const usable = fit.radius > 0;
    return [
      {
        title: "Calibration fit",
        status: usable ? "info" : "fails",
        rule: "The firmware's radius and offset from logged readings, a = r·ω² + b",
        margin: `${usable ? "" : "No usable radius: the readings do not rise with speed (check which column is speed, which is reading, and their units). "}Radius ${len(fit.radius)}, offset ${formatQuantity(fit.bias, "acceleration", { system, significant: 4 }).text} from ${fit.count} readings (${fit.method.replaceAll("-", " ")}${flagged ? `; ${flagged} flagged as spikes` : ""})`,
        figure: figureOf("Radius for the firmware", fit.radius, "length", system, undefined, 4),
        details: [
          figureOf("Offset for the firmware", fit.bias, "acceleration", system, undefined, 4),
          ...(fit.leastSquares.rSquared === null
            ? []
            : [{ label: "R² of the least-squares line", value: fit.leastSquares.rSquared, unit: "", text: formatNumber(fit.leastSquares.rSquared, 4) }]),
        ],
      },
    ];
  },
});
