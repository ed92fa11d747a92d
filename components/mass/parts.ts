/**
 * One row of the mass-layout parts list as editable fields: its name, shape and mass source as
 * signals, and every dimension as a unit-aware text field (a fields model per part). Converts
 * between the fields and calc/'s `LayoutPart`. No DOM.
 */
import { signal, type Signal } from "../calc-ui/reactive.ts";
import { exactFieldText, fieldUnit, type InputSpec } from "../../calc/core/inputs.ts";
import { PART_INPUTS } from "../../calc/mass/part-inputs.ts";
import type { MaterialId } from "../../calc/materials/densities.ts";
import type { LayoutPart, PartShape, PartShapeKind } from "../../calc/mass/parts.ts";
import { fromSI, type UnitSystem, unitDef } from "../../calc/core/units.ts";
import { createFieldsModel, type FieldsModel } from "../calc-ui/fields.ts";

export { PART_INPUTS };

export type PartField = keyof typeof PART_INPUTS;

/** Each shape's name in the editor. */
export const SHAPE_NAMES: Record<PartShapeKind, string> = {
  point: "Small part (point)",
  disk: "Disk",
  ring: "Thin ring",
  annulus: "Thick ring (annulus)",
  plate: "Plate",
  rod: "Rod",
  cylinder: "Cylinder (upright)",
  lyingCylinder: "Cylinder (lying)",
  custom: "Custom (own inertia)",
};

/** The dimensions each shape needs. */
const SHAPE_FIELDS: Record<PartShapeKind, PartField[]> = {
  point: [],
  disk: ["radius"],
  ring: ["radius"],
  annulus: ["innerRadius", "outerRadius"],
  plate: ["length", "width", "angle"],
  rod: ["length", "angle"],
  cylinder: ["radius", "height"],
  lyingCylinder: ["radius", "length", "angle"],
  custom: ["inertiaZ", "productXZ", "productYZ"],
};

/** Where a part's mass comes from: weighed ("given") or a material of the table. */
export type MassSource = "given" | MaterialId;

export interface PartModel {
  /** Stable key for lists and element ids. */
  key: number;
  name: Signal<string>;
  shape: Signal<PartShapeKind>;
  source: Signal<MassSource>;
  fields: FieldsModel<typeof PART_INPUTS>;
  /** Whether its card is open. */
  open: Signal<boolean>;
}

/** Point and custom parts have no volume: their mass must be given. */
export const needsGivenMass = (shape: PartShapeKind) => shape === "point" || shape === "custom";

/** The fields a part shows, in order, for its shape and mass source. */
export function partFields(shape: PartShapeKind, source: MassSource): PartField[] {
  const massField: PartField[] =
    source === "given" || needsGivenMass(shape)
      ? ["mass"]
      : shape === "cylinder" || shape === "lyingCylinder"
        ? []
        : shape === "ring" || shape === "rod"
          ? ["section"]
          : ["thickness"];
  return [...massField, ...SHAPE_FIELDS[shape], "x", "y", "z"];
}

let nextKey = 1;

/** Field text for a value worked out here (a mirror image, a counterweight): 6 significant figures, float dust below 1e-9 shown as 0. */
function roundedText(spec: InputSpec, valueSI: number, system: UnitSystem): string {
  const unit = fieldUnit(spec, system);
  const n = Number(fromSI(valueSI, unit).toPrecision(6));
  const symbol = unitDef(unit).symbol;
  return `${Math.abs(n) < 1e-9 ? 0 : n}${symbol === "°" ? "" : " "}${symbol}`;
}

/** The values of a part, by field, in SI. */
function valuesOf(part: LayoutPart): Partial<Record<PartField, number>> {
  const { shape: s, mass: m } = part;
  const thick = m.kind === "material" ? m.thickness : undefined;
  return {
    ...(s as Partial<Record<PartField, number>>),
    x: part.x,
    y: part.y,
    z: part.z,
    mass: m.kind === "given" ? m.mass : undefined,
    thickness: thick,
    section: thick,
  };
}

/**
 * A new part model, from a calc/ part or with the defaults. A part read from a link or a design is
 * shown exactly (`exact`), so it keeps its stored value; one worked out here is shown rounded.
 */
export function createPart(system: UnitSystem, part?: LayoutPart, open = false, exact = false): PartModel {
  const fields = createFieldsModel(PART_INPUTS, system);
  const model: PartModel = {
    key: nextKey++,
    name: signal(part?.name ?? "part"),
    shape: signal(part?.shape.kind ?? "point"),
    source: signal(part?.mass.kind === "material" ? part.mass.material : "given"),
    fields,
    open: signal(open),
  };
  if (part) setValues(model, part, exact);
  return model;
}

/** Writes a calc/ part's values into the model's fields (in the current unit system). */
export function setValues(model: PartModel, part: LayoutPart, exact = false): void {
  const values = valuesOf(part);
  const system = model.fields.system.value;
  const textOf = exact ? exactFieldText : roundedText;
  for (const [name, value] of Object.entries(values) as [PartField, number | undefined][]) {
    if (value !== undefined && name in PART_INPUTS) model.fields.texts[name].value = textOf(PART_INPUTS[name], value, system);
  }
}

/** A copy of a part model with its texts as they stand (valid or not). */
export function copyPart(model: PartModel, name: string): PartModel {
  const copy = createPart(model.fields.system.value, undefined, true);
  copy.name.value = name;
  copy.shape.value = model.shape.value;
  copy.source.value = model.source.value;
  for (const key of Object.keys(PART_INPUTS) as PartField[]) copy.fields.texts[key].value = model.fields.texts[key].value;
  return copy;
}

/** The calc/ part the fields describe, or null while a field it needs does not read. */
export function readPart(model: PartModel): LayoutPart | null {
  const shape = model.shape.value;
  const source = model.source.value;
  const v: Partial<Record<PartField, number>> = {};
  for (const name of partFields(shape, source)) {
    const reading = model.fields.readings[name].value;
    if (!reading.ok) return null;
    v[name] = reading.value;
  }
  const d = v as Record<PartField, number>;
  const shapes: Record<PartShapeKind, PartShape> = {
    point: { kind: "point" },
    disk: { kind: "disk", radius: d.radius },
    ring: { kind: "ring", radius: d.radius },
    annulus: { kind: "annulus", innerRadius: d.innerRadius, outerRadius: d.outerRadius },
    plate: { kind: "plate", length: d.length, width: d.width, angle: d.angle },
    rod: { kind: "rod", length: d.length, angle: d.angle },
    cylinder: { kind: "cylinder", radius: d.radius, height: d.height },
    lyingCylinder: { kind: "lyingCylinder", radius: d.radius, length: d.length, angle: d.angle },
    custom: { kind: "custom", inertiaZ: d.inertiaZ, productXZ: d.productXZ, productYZ: d.productYZ },
  };
  return {
    name: model.name.value,
    shape: shapes[shape],
    mass:
      source === "given" || needsGivenMass(shape)
        ? { kind: "given", mass: d.mass }
        : { kind: "material", material: source, thickness: d.section ?? d.thickness },
    x: d.x,
    y: d.y,
    z: d.z,
  };
}
