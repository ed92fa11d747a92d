/**
 * The mass-layout calculator's model: the scalar fields, the parts list (one fields model per
 * part), the counterweight mode and mounting points in; calc/'s mass-and-balance result, the
 * counterweight plan and the top-view geometry (or the error, mapped to its part and field) out.
 * List edits, mirroring, applying and undoing a counterweight, and the permalink. No DOM.
 */
import { batch, computed, signal } from "../calc-ui/reactive.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import { readField, type InputSpec } from "../../calc/core/inputs.ts";
import { counterweightPlan, massBalance, massBalanceInputs } from "../../calc/mass/mass-balance.ts";
import { encodeLayout, parseLayout } from "../../calc/mass/layout-text.ts";
import { layoutDrawing } from "../../calc/mass/drawing.ts";
import { mirrorPart, type MirrorAxis } from "../../calc/mass/editing.ts";
import type { LayoutPart } from "../../calc/mass/parts.ts";
import type { MountingPoint } from "../../calc/mass/counterweight.ts";
import { fromSI, type UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";
import { encodeState } from "../calc-ui/permalink.ts";
import { copyPart, createPart, PART_INPUTS, readPart, setValues, type PartField, type PartModel } from "./parts.ts";

/** Counterweight modes by URL value: at a chosen radius, for a mass in hand, at the best mounting point. */
export const MODES = { r: "radius", m: "mass", p: "points" } as const;
export type ModeKey = keyof typeof MODES;

const LABELS = Object.fromEntries(Object.entries(massBalanceInputs).map(([k, s]) => [k, s.label]));
const POINT: InputSpec = { label: "Coordinate", kind: "length", min: -2, max: 2, default: 0, urlKey: "", unit: { metric: "mm", us: "in" } };
/** Most mounting points read from the text field. */
const MAX_POINTS = 20;

/** An error to show: beside a part's field, beside a scalar field, or above the results. */
export interface MassError {
  part: number | null;
  field: string | null;
  message: string;
}

/** Reads "55, 0; 0, 55" (x, y pairs in the length unit, or with units) into mounting points. */
export function readPoints(text: string, system: UnitSystem): { points: MountingPoint[] | null; error: string | null } {
  const items = text.split(";").filter((item) => item.trim() !== "");
  if (items.length === 0 || items.length > MAX_POINTS)
    return { points: null, error: `Enter 1 to ${MAX_POINTS} points, as x, y pairs separated by semicolons.` };
  const points: MountingPoint[] = [];
  for (const [i, item] of items.entries()) {
    const xy = item.split(",");
    const read = xy.map((t) => readField(POINT, t, system));
    const bad = read.find((r) => !r.ok);
    if (xy.length !== 2 || bad) {
      return {
        points: null,
        error: `Point ${i + 1} must be two coordinates, x and y, separated by a comma${bad && !bad.ok ? ` (${bad.error.message})` : ""}.`,
      };
    }
    points.push({ x: (read[0] as { value: number }).value, y: (read[1] as { value: number }).value });
  }
  return { points, error: null };
}

function mapError(error: unknown): MassError {
  const match = error instanceof CalcInputError ? /^parts\[(\d+)\]\.(?:\w+\.)?(\w+)$/.exec(error.param) : null;
  if (match) {
    const field = match[2]! in PART_INPUTS ? match[2]! : null;
    const label = field ? PART_INPUTS[field as PartField].label : match[2];
    return { part: Number(match[1]), field, message: `${label} must be ${(error as CalcInputError).expected}.` };
  }
  return { part: null, ...fieldMessage(error, LABELS) };
}

/** Balance figures shown before and after a counterweight. */
export interface Snapshot {
  offset: number;
  grade: number;
  met: string;
  drift: number;
}

export function createMassModel(system: UnitSystem = "metric", layoutText = "") {
  const fields = createFieldsModel(massBalanceInputs, system);
  const parts = signal(parseLayout(layoutText).parts.map((p) => createPart(system, p)));
  const mode = signal<ModeKey>("r");
  const points = signal("55, 0; 0, 55; -55, 0; 0, -55");
  const notices = signal<string[]>([]);
  /** The counterweight last added with "Apply", for undo and the before/after line. */
  const applied = signal<{ key: number; before: Snapshot; after: Snapshot } | null>(null);
  let lastLayoutText = layoutText;

  const layout = computed(() => {
    const list = parts.value.map(readPart);
    return list.every(Boolean) ? (list as LayoutPart[]) : null;
  });
  const mounting = computed(() => readPoints(points.value, fields.system.value));
  const outcome = computed(() => {
    const values = fields.values.value;
    const list = layout.value;
    if (!values || !list || list.length === 0) return null;
    const input = { ...values, parts: list, candidates: mounting.value.points ?? undefined };
    try {
      const balance = massBalance(input);
      return { input, balance, plan: counterweightPlan({ input, balance, mode: MODES[mode.value] }), drawing: layoutDrawing(list), error: null };
    } catch (error) {
      return { error: mapError(error) };
    }
  });

  const at = (list: PartModel[], index: number, ...items: PartModel[]) => [...list.slice(0, index), ...items, ...list.slice(index)];
  function add(): PartModel {
    const part = createPart(fields.system.value, undefined, true);
    part.name.value = `part ${parts.value.length + 1}`;
    parts.value = [...parts.value, part];
    return part;
  }
  function duplicate(index: number): void {
    const p = parts.value[index]!;
    parts.value = at(parts.value, index + 1, copyPart(p, `${p.name.value} (copy)`.slice(0, 60)));
  }
  function remove(index: number): void {
    parts.value = parts.value.filter((_, i) => i !== index);
  }
  function move(index: number, by: number): void {
    const list = parts.value.filter((_, i) => i !== index);
    parts.value = at(list, index + by, parts.value[index]!);
  }
  /** Mirrors a part in place, or inserts its mirror image after it; false when its fields do not read. */
  function mirror(index: number, axis: MirrorAxis, asCopy: boolean): boolean {
    const p = parts.value[index]!;
    const part = readPart(p);
    if (!part) return false;
    try {
      const image = mirrorPart(part, axis);
      if (asCopy) {
        parts.value = at(parts.value, index + 1, createPart(fields.system.value, { ...image, name: `${part.name} (mirror)`.slice(0, 60) }, true));
      } else {
        setValues(p, image);
      }
      return true;
    } catch {
      return false;
    }
  }
  function apply(): void {
    const o = outcome.value;
    if (!o?.plan?.after) return;
    const { balance, plan } = o;
    const after = plan.after!;
    const part = createPart(fields.system.value, after.parts.at(-1));
    batch(() => {
      applied.value = {
        key: part.key,
        before: {
          offset: balance.layout.offset,
          grade: balance.equivalentGrade,
          met: balance.gradeMet?.label ?? "",
          drift: balance.sensor.before.driftPerRevolution,
        },
        after: { offset: after.offset, grade: after.equivalentGrade, met: after.gradeMet?.label ?? "", drift: after.sensor.driftPerRevolution },
      };
      parts.value = [...parts.value, part];
    });
  }
  function undo(): void {
    const key = applied.value?.key;
    batch(() => {
      parts.value = parts.value.filter((p) => p.key !== key);
      applied.value = null;
    });
  }

  /** Mounting-point text last shown in each system, to switch back without rounding drift (same to 5 figures). */
  const pointsShown: Partial<Record<UnitSystem, string>> = {};
  const key = (list: MountingPoint[] | null) => JSON.stringify(list?.map((p) => [p.x.toPrecision(5), p.y.toPrecision(5)]));
  function setSystem(next: UnitSystem): void {
    const read = mounting.value.points;
    pointsShown[fields.system.value] = points.value;
    batch(() => {
      fields.setSystem(next);
      for (const p of parts.value) p.fields.setSystem(next);
      const back = pointsShown[next];
      const num = (v: number) => Number(fromSI(v, next === "us" ? "in" : "mm").toPrecision(6));
      if (back !== undefined && key(readPoints(back, next).points) === key(read)) points.value = back;
      else if (read) points.value = read.map((p) => `${num(p.x)}, ${num(p.y)}`).join("; ");
    });
  }

  function applyQuery(search: string): void {
    const params = new URLSearchParams(search);
    const mine: Record<string, string> = {};
    const notes: string[] = [];
    for (const key of ["l", "cw", "pts"]) {
      const all = params.getAll(key);
      if (all.length > 1) notes.push(`The link sets "${key}" more than once; the first value was used.`);
      if (all.length) mine[key] = all[0]!;
      params.delete(key);
    }
    batch(() => {
      fields.applyQuery(params.toString());
      if (mine.l !== undefined) {
        const read = parseLayout(mine.l);
        const whole = read.problems.some((p) => p.index === null);
        if (!whole || read.parts.length) {
          parts.value = read.parts.map((p) => createPart(fields.system.value, p));
          lastLayoutText = mine.l;
        }
        for (const p of read.problems) {
          notes.push(
            p.index === null
              ? `The parts list in the link could not be read (${p.reason}); ${whole && !read.parts.length ? "the example layout is shown" : "the readable parts were kept"}.`
              : `Part ${p.index + 1} of the link's parts list was left out: ${p.reason}.`,
          );
        }
      }
      if (mine.cw !== undefined) {
        if (mine.cw in MODES) mode.value = mine.cw as ModeKey;
        else notes.push(`Unknown counterweight mode in the link (use r, m or p); kept "at a radius".`);
      }
      if (mine.pts !== undefined && mine.pts.length > 400) notes.push("The link's mounting points are longer than 400 characters; they were ignored.");
      else if (mine.pts !== undefined) points.value = mine.pts.replace(/;/g, "; ").replace(/,/g, ", ");
      notices.value = [...fields.notices.value, ...notes];
    });
  }

  function queryFor(existing: string): string {
    const texts = Object.fromEntries(Object.entries(fields.texts).map(([k, t]) => [k, t.value]));
    const list = layout.value;
    try {
      if (list) lastLayoutText = encodeLayout(list);
    } catch {
      // A part that reads but breaks a rule across fields (inner radius ≥ outer): keep the last good list.
    }
    return encodeState(massBalanceInputs, texts, fields.system.value, "", existing, {
      l: lastLayoutText,
      cw: mode.value,
      pts: points.value.replace(/\s+/g, ""),
    })
      .replace(/%7E/g, "~")
      .replace(/%2C/g, ",")
      .replace(/%3B/g, ";");
  }

  return {
    fields,
    parts,
    mode,
    points,
    notices,
    applied,
    layout,
    mounting,
    outcome,
    add,
    duplicate,
    remove,
    move,
    mirror,
    apply,
    undo,
    setSystem,
    applyQuery,
    queryFor,
  };
}

export type MassModel = ReturnType<typeof createMassModel>;
