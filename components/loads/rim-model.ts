/**
 * The rim calculator's model: quantity fields, the shape, and a material picked from the materials
 * table (which fills the density, strength and Poisson fields) or typed in as custom values; out
 * come the calc/ rim check (or its error, mapped to a field) and the stress profile. No DOM.
 */
import { batch, computed } from "../calc-ui/reactive.ts";
import {
  DEFAULT_RIM_MATERIAL,
  RIM_CHOICE_DEFAULTS,
  RIM_SHAPE_OPTIONS,
  rimCheck,
  rimCheckInputs,
  rimStressProfile,
  type RimCheckInput,
  type RimMaterialValues,
} from "../../calc/loads/rims.ts";
import { defaultText, fieldUnit } from "../../calc/core/inputs.ts";
import { quantityToText, type UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";
import { encodeState } from "../calc-ui/permalink.ts";
import { createChoices, withChoices, type ChoiceSpecs } from "./choices.ts";

/** The value of the material choice when the fields hold values of the user's own. */
export const CUSTOM_MATERIAL = "custom";

/** A material the calculator offers: its value and label, and the values it fills in (calc/loads.ts `rimMaterialChoices`). */
export interface MaterialChoice extends RimMaterialValues {
  value: string;
  label: string;
}

/** The category inputs of the rim check, with their URL keys; the materials come from the page. */
export function rimChoices(materials: readonly MaterialChoice[]) {
  return {
    shape: {
      label: "Shape",
      urlKey: "shape",
      options: RIM_SHAPE_OPTIONS,
      default: RIM_CHOICE_DEFAULTS.shape,
      help: "A ring is checked at its outer radius; a disk with a bore peaks at the bore.",
    },
    material: {
      label: "Material",
      urlKey: "mat",
      options: [...materials.map(({ value, label }) => ({ value, label })), { value: CUSTOM_MATERIAL, label: "Custom: type the values below" }],
      default: materials.some((m) => m.value === DEFAULT_RIM_MATERIAL) ? DEFAULT_RIM_MATERIAL : CUSTOM_MATERIAL,
      help: "Fills density, strengths and Poisson's ratio from the materials table; editing any of them makes it custom.",
    },
  } as const satisfies ChoiceSpecs;
}

export type RimChoices = ReturnType<typeof rimChoices>;

/** The four fields a material fills. */
const MATERIAL_FIELDS = ["density", "yieldStrength", "ultimateStrength", "poisson"] as const;

/** Field values written as text keep 6 significant figures; a reading this close still matches. */
const MATCH_RTOL = 1e-5;

const LABELS: Record<string, string> = {
  ...Object.fromEntries(Object.entries(rimCheckInputs).map(([k, s]) => [k, s.label])),
  shape: "Shape",
  material: "Material",
};

/** The model; `materials` are the table rows offered (none: custom values only). */
export function createRimModel(materials: readonly MaterialChoice[] = [], system: UnitSystem = "metric") {
  const specs = rimChoices(materials);
  const fields = createFieldsModel(rimCheckInputs, system);
  const choices = createChoices(specs);
  const rowOf = (id: string) => materials.find((m) => m.value === id);
  /** The material as the fields show it: the picked row while all four fields still hold its values, else custom. */
  const material = computed(() => {
    const picked = choices.material.value;
    const row = rowOf(picked);
    if (!row) return CUSTOM_MATERIAL;
    const matches = MATERIAL_FIELDS.every((name) => {
      const reading = fields.readings[name].value;
      return reading.ok && Math.abs(reading.value - row[name]) <= MATCH_RTOL * Math.abs(row[name]);
    });
    return matches ? picked : CUSTOM_MATERIAL;
  });
  /** Picks a material; a row of the table fills the four material fields in the current units. */
  function pickMaterial(id: string): void {
    batch(() => {
      choices.material.value = id;
      const row = rowOf(id);
      if (!row) return;
      for (const name of MATERIAL_FIELDS) fields.texts[name].value = defaultText({ ...rimCheckInputs[name], default: row[name] }, fields.system.value);
    });
  }
  const sync = withChoices(fields, specs, choices, {
    urlValues: () => ({ shape: choices.shape.value, mat: material.value }),
    apply: (values) => {
      if (values.material !== undefined) pickMaterial(values.material);
    },
  });
  /** The full input of the check, or null while a field does not read. */
  const input = computed((): RimCheckInput | null => {
    const values = fields.values.value;
    return values ? { ...values, shape: choices.shape.value } : null;
  });
  const outcome = computed(() => {
    const current = input.value;
    if (!current) return { result: null, error: null };
    try {
      return { result: rimCheck(current), error: null };
    } catch (error) {
      return { result: null, error: fieldMessage(error, LABELS) };
    }
  });
  /** Radial and hoop stress across the radius [Pa] at radii [m]; one point for a thin ring. */
  const profile = computed(() => {
    const current = input.value;
    return current && outcome.value.result ? rimStressProfile(current) : null;
  });
  return { specs, fields, choices, material, pickMaterial, sync, input, outcome, profile };
}

export type RimModel = ReturnType<typeof createRimModel>;

/**
 * The query string that opens the rim calculator on a given check (for links in prose): each
 * quantity in its field's unit for `system`, the shape, and the material when it is a table row.
 */
export function rimLink(input: RimCheckInput, material: string, system: UnitSystem = "metric"): string {
  const texts: Record<string, string> = {};
  for (const [name, spec] of Object.entries(rimCheckInputs)) {
    texts[name] = quantityToText(input[name as keyof typeof rimCheckInputs], fieldUnit(spec, system));
  }
  return encodeState(rimCheckInputs, texts, system, "", "", { shape: input.shape, mat: material });
}
