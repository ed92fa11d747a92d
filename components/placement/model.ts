/**
 * The accelerometer-placement calculator's model: field signals in, the calc/ result (or the
 * error it raised, mapped to its field) out. No DOM.
 */
import { computed } from "../calc-ui/reactive.ts";
import { accelerometerPlacement, accelerometerPlacementInputs, centripetalAcceleration } from "../../calc/rotation/rotation.ts";
import { STANDARD_GRAVITY } from "../../calc/core/constants.ts";
import { radPerSecondToRpm, rpmToRadPerSecond, type UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";

const LABELS = Object.fromEntries(Object.entries(accelerometerPlacementInputs).map(([k, s]) => [k, s.label]));

export function createPlacementModel(system: UnitSystem = "metric") {
  const fields = createFieldsModel(accelerometerPlacementInputs, system);
  const outcome = computed(() => {
    const values = fields.values.value;
    if (!values) return { result: null, error: null };
    try {
      return { result: accelerometerPlacement(values), error: null };
    } catch (error) {
      return { result: null, error: fieldMessage(error, LABELS) };
    }
  });
  /** Acceleration [g] against speed [rpm] at the chosen radius, from 0 to 1.2 × top speed. */
  const curve = computed(() => {
    const values = fields.values.value;
    if (!values || !outcome.value.result) return null;
    const maxRpm = radPerSecondToRpm(values.topSpeed) * 1.2;
    const points: [number, number][] = [];
    for (let i = 0; i <= 60; i += 1) {
      const rpm = (maxRpm * i) / 60;
      points.push([rpm, centripetalAcceleration({ angularSpeed: rpmToRadPerSecond(rpm), radius: values.radius }) / STANDARD_GRAVITY]);
    }
    return { points, maxRpm };
  });
  return { fields, outcome, curve };
}

export type PlacementModel = ReturnType<typeof createPlacementModel>;
