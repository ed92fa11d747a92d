/**
 * The drift-budget calculator's model: the drift inputs (plain URL keys) and the opposed-sensors
 * inputs (keys scoped "p."), each with the calc/ result or the error it raised, mapped to its
 * field. No DOM.
 */
import { computed } from "../calc-ui/reactive.ts";
import { headingDrift, headingDriftInputs } from "../../calc/heading/drift-budget.ts";
import { opposedSensorsCheck, opposedSensorsInputs } from "../../calc/heading/opposed.ts";
import { formatQuantity, fromSI, radPerSecondToRpm, type UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";

/** URL scope of the opposed-sensors section. */
export const PAIR_SCOPE = "p";

const labelsOf = (specs: Record<string, { label: string }>) => Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.label]));
const DRIFT_LABELS = labelsOf(headingDriftInputs);
const PAIR_LABELS = labelsOf(opposedSensorsInputs);

const toDegPerSecond = (v: number) => fromSI(v, "deg/s");

export function createDriftModel(system: UnitSystem = "metric") {
  const fields = createFieldsModel(headingDriftInputs, system);
  const pair = createFieldsModel(opposedSensorsInputs, system, PAIR_SCOPE);

  const outcome = computed(() => {
    const values = fields.values.value;
    if (!values) return { result: null, error: null };
    if (!(values.highSpeed > values.lowSpeed)) {
      const low = formatQuantity(values.lowSpeed, "angularSpeed", { system: fields.system.value }).text;
      return { result: null, error: { field: "highSpeed", message: `${DRIFT_LABELS.highSpeed} must be greater than ${DRIFT_LABELS.lowSpeed} (${low}).` } };
    }
    try {
      return { result: headingDrift(values), error: null };
    } catch (error) {
      return { result: null, error: fieldMessage(error, DRIFT_LABELS) };
    }
  });

  /** The drift plot's curves [rpm, °/s]: exact drift, and the linearised speed-proportional and offset parts. */
  const curves = computed(() => {
    const result = outcome.value.result;
    if (!result) return null;
    const defined = result.series.filter((p) => p.driftRate !== null);
    const at = (pick: (p: (typeof defined)[number]) => number) => defined.map((p) => [radPerSecondToRpm(p.angularSpeed), toDegPerSecond(pick(p))] as const);
    return {
      exact: at((p) => p.driftRate!),
      proportional: at((p) => p.linear.speedProportional),
      offset: at((p) => p.linear.bias),
    };
  });

  const pairOutcome = computed(() => {
    const values = pair.values.value;
    if (!values) return { result: null, error: null };
    try {
      return { result: opposedSensorsCheck(values), error: null };
    } catch (error) {
      return { result: null, error: fieldMessage(error, PAIR_LABELS) };
    }
  });

  /** Switches both sections' unit system together. */
  function setSystem(next: UnitSystem): void {
    fields.setSystem(next);
    pair.setSystem(next);
  }

  return { fields, pair, outcome, curves, pairOutcome, setSystem };
}

export type DriftModel = ReturnType<typeof createDriftModel>;
