/**
 * The fastener calculator's model: quantity fields and category choices (thread size, property
 * class, loading mode, shear plane) in, the calc/ fastener check (or the error it raised, mapped to
 * its field) and the stress-against-speed curve out. No DOM.
 */
import { computed } from "../calc-ui/reactive.ts";
import {
  FASTENER_CHOICE_DEFAULTS,
  fastenerCheck,
  fastenerCheckInputs,
  fastenerStressCurve,
  LOADING_MODE_OPTIONS,
  SHEAR_PLANE_OPTIONS,
  type FastenerCheckInput,
} from "../../calc/loads/bolts.ts";
import { PROPERTY_CLASS_OPTIONS, THREAD_SIZE_OPTIONS } from "../../calc/loads/fasteners.ts";
import { fieldUnit } from "../../calc/core/inputs.ts";
import { quantityToText, type UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";
import { encodeState } from "../calc-ui/permalink.ts";
import { createChoices, withChoices, type ChoiceSpecs } from "./choices.ts";

/** The category inputs of the fastener check, with their URL keys. */
export const FASTENER_CHOICES = {
  size: {
    label: "Thread size",
    urlKey: "size",
    options: THREAD_SIZE_OPTIONS,
    default: FASTENER_CHOICE_DEFAULTS.size,
    help: "ISO metric coarse thread: nominal diameter × pitch, in mm.",
  },
  propertyClass: {
    label: "Property class",
    urlKey: "cls",
    options: PROPERTY_CLASS_OPTIONS,
    default: FASTENER_CHOICE_DEFAULTS.propertyClass,
    help: "The number stamped on the head; the strengths are the ISO 898-1 minimums.",
  },
  mode: {
    label: "Loading",
    urlKey: "mode",
    options: LOADING_MODE_OPTIONS,
    default: FASTENER_CHOICE_DEFAULTS.mode,
    help: "A bolt parallel to the spin axis is loaded in shear; one pointing at the axis, in tension.",
  },
  shearPlane: {
    label: "Shear plane",
    urlKey: "plane",
    options: SHEAR_PLANE_OPTIONS,
    default: FASTENER_CHOICE_DEFAULTS.shearPlane,
    help: "Read in shear only. Through the thread is the safe choice unless the plain shank surely spans the joint face.",
  },
} as const satisfies ChoiceSpecs;

const LABELS: Record<string, string> = Object.fromEntries([
  ...Object.entries(fastenerCheckInputs).map(([k, s]) => [k, s.label]),
  ...Object.entries(FASTENER_CHOICES).map(([k, s]) => [k, s.label]),
]);

/** Number of points on the stress-against-speed curve. */
const CURVE_POINTS = 60;
/** The curve runs at least this far past the operating speed… */
const CURVE_PAST_TOP = 1.25;
/** …and past the ultimate speed, but never beyond this multiple of the operating speed. */
const CURVE_PAST_LIMIT = 1.15;
const CURVE_MAX_MULTIPLE = 10;

export function createFastenerModel(system: UnitSystem = "metric") {
  const fields = createFieldsModel(fastenerCheckInputs, system);
  const choices = createChoices(FASTENER_CHOICES);
  const sync = withChoices(fields, FASTENER_CHOICES, choices);
  /** The full input of the check, or null while a field does not read. */
  const input = computed((): FastenerCheckInput | null => {
    const values = fields.values.value;
    if (!values) return null;
    return {
      ...values,
      size: choices.size.value,
      propertyClass: choices.propertyClass.value,
      mode: choices.mode.value,
      shearPlane: choices.shearPlane.value,
    };
  });
  const outcome = computed(() => {
    const current = input.value;
    if (!current) return { result: null, error: null };
    try {
      return { result: fastenerCheck(current), error: null };
    } catch (error) {
      return { result: null, error: fieldMessage(error, LABELS) };
    }
  });
  /** Bolt stress [Pa] against speed [rad/s], from standstill past the ultimate speed where it fits. */
  const curve = computed(() => {
    const current = input.value;
    const result = outcome.value.result;
    if (!current || !result) return null;
    const top = current.angularSpeed;
    const maxSpeed = Math.max(top * CURVE_PAST_TOP, Math.min(result.speedAtUltimate * CURVE_PAST_LIMIT, top * CURVE_MAX_MULTIPLE));
    return { maxSpeed, points: fastenerStressCurve(current, { maxSpeed, points: CURVE_POINTS }) };
  });
  return { fields, choices, sync, input, outcome, curve };
}

export type FastenerModel = ReturnType<typeof createFastenerModel>;

/**
 * The query string that opens the fastener calculator on a given check (for links in prose):
 * each quantity in its field's unit for `system`, and the four choices.
 */
export function fastenerLink(input: FastenerCheckInput, system: UnitSystem = "metric"): string {
  const texts: Record<string, string> = {};
  for (const [name, spec] of Object.entries(fastenerCheckInputs)) {
    texts[name] = quantityToText(input[name as keyof typeof fastenerCheckInputs], fieldUnit(spec, system));
  }
  return encodeState(fastenerCheckInputs, texts, system, "", "", {
    size: input.size,
    cls: input.propertyClass,
    mode: input.mode,
    plane: input.shearPlane ?? FASTENER_CHOICE_DEFAULTS.shearPlane,
  });
}
