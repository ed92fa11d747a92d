/**
 * The timing-and-smoothing calculator's model: the timing inputs (plain URL keys) and the
 * smoothing inputs (keys scoped "s."), each with the calc/ result or the error it raised, mapped to
 * its field; the median-window comparison and the trade-off series over α. No DOM.
 */
import { computed } from "../calc-ui/reactive.ts";
import { headingSmoothing, headingSmoothingInputs, smoothingTradeoffSeries } from "../../calc/heading/smoothing.ts";
import { headingTiming, headingTimingInputs } from "../../calc/heading/timing.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";

/** URL scope of the smoothing section. */
export const SMOOTHING_SCOPE = "s";

/** Median windows the comparison always shows (the chosen one is added when it is not among them). */
const MEDIAN_WINDOWS = [1, 3, 5];

const labelsOf = (specs: Record<string, { label: string }>) => Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.label]));
const TIMING_LABELS = labelsOf(headingTimingInputs);
// headingSmoothing names the median window "medianLength"; smoothingFigures' helpers call it "windowLength".
const SMOOTHING_LABELS = { ...labelsOf(headingSmoothingInputs), windowLength: headingSmoothingInputs.medianLength.label };

export function createTimingModel(system: UnitSystem = "metric") {
  const timing = createFieldsModel(headingTimingInputs, system);
  const smoothing = createFieldsModel(headingSmoothingInputs, system, SMOOTHING_SCOPE);

  const timingOutcome = computed(() => {
    const values = timing.values.value;
    if (!values) return { result: null, error: null };
    try {
      return { result: headingTiming(values), error: null };
    } catch (error) {
      return { result: null, error: fieldMessage(error, TIMING_LABELS) };
    }
  });

  const smoothingOutcome = computed(() => {
    const values = smoothing.values.value;
    if (!values) return { result: null, error: null, medians: [], tradeoff: [] };
    try {
      const result = headingSmoothing(values);
      const windows = MEDIAN_WINDOWS.includes(values.medianLength) ? MEDIAN_WINDOWS : [...MEDIAN_WINDOWS, values.medianLength];
      const medians = windows.map((medianLength) => ({
        medianLength,
        result: medianLength === values.medianLength ? result : headingSmoothing({ ...values, medianLength }),
      }));
      return { result, error: null, medians, tradeoff: smoothingTradeoffSeries(values, { smallestFactor: Math.min(0.005, values.smoothingFactor) }) };
    } catch (error) {
      return { result: null, error: fieldMessage(error, SMOOTHING_LABELS), medians: [], tradeoff: [] };
    }
  });

  /** Switches both sections' unit system together. */
  function setSystem(next: UnitSystem): void {
    timing.setSystem(next);
    smoothing.setSystem(next);
  }

  return { timing, smoothing, timingOutcome, smoothingOutcome, setSystem };
}

export type TimingModel = ReturnType<typeof createTimingModel>;
