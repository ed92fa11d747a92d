/**
 * The mass-layout calculator's model: the scalar fields, the parts list (one fields model per
 * part), the counterweight mode and mounting points in; calc/'s mass-and-balance result, the
 * counterweight plan and the top-view geometry (or the error, mapped to its part and field) out.
 * List edits, mirroring, applying and undoing a counterweight, and the permalink. No DOM.
 */
import { batch, computed, signal } from "../calc-ui/reactive.ts";
import type { Worked } from "./compute.ts";
import { CalcInputError } from "../../calc/core/errors.ts";
import type { InputSpec } from "../../calc/core/inputs.ts";
import { encodeLayout, parseLayout } from "../../calc/mass/layout-text.ts";
import { readMountingPoints } from "../../calc/mass/points-text.ts";
import { form as massCalculator } from "../../calc/calculators/mass.ts";
import { readLink, writeLink } from "../../calc/core/calculator.ts";
import { saveToDesign } from "../calc-ui/save.ts";
import { mirrorPart, type MirrorAxis, suffixedName } from "../../calc/mass/editing.ts";
import type { LayoutPart } from "../../calc/mass/parts.ts";
import type { MountingPoint } from "../../calc/mass/counterweight.ts";
import { fromSI, type UnitSystem } from "../../calc/core/units.ts";
import { createFieldsModel, fieldMessage } from "../calc-ui/fields.ts";
import { copyPart, createPart, PART_INPUTS, readPart, setValues, type PartModel } from "./parts.ts";
import { whenIdle } from "../calc-ui/idle.ts";

/** Counterweight modes by URL value: at a chosen radius, for a mass in hand, at the best mounting point. */
export const MODES = { r: "radius", m: "mass", p: "points" } as const;
export type ModeKey = keyof typeof MODES;

/** An error to show: beside a part's field, beside a scalar field, or above the results. */
export interface MassError {
  part: number | null;
  field: string | null;
  message: string;
}

/** Reads "55, 0; 0, 55" (x, y pairs in the length unit, or with units) into mounting points. */
export const readPoints = readMountingPoints;

function mapError(error: unknown, system: { value: UnitSystem }): MassError {
  const match = error instanceof CalcInputError ? /^parts\[(\d+)\]\.(?:\w+\.)?(\w+)$/.exec(error.param) : null;
  if (match) {
    const field = match[2]! in PART_INPUTS ? match[2]! : null;
    const e = error as CalcInputError;
    // The part's own fields, under the names the error uses (its full path, and a bound's other field).
    const fields = Object.fromEntries(Object.entries(PART_INPUTS).map(([name, spec]) => [name, spec as InputSpec]));
    const named = { ...fields, [e.param]: field ? fields[field]! : match[2]! };
    return { part: Number(match[1]), field, message: fieldMessage(e, named, system.value).message };
  }
  return { part: null, ...fieldMessage(error, massCalculator.inputs, system.value) };
}

type Compute = typeof import("./compute.ts");

// The arithmetic (calc/mass/mass-balance.ts and the top view's geometry, ./compute.ts) loads on the
// first change that needs a new result: the starting layout's result comes with the page, worked out
// at build time. Once loaded it serves every mass calculator on the page.
const loadedCompute = signal<Compute | null>(null);
const computeFailed = signal(false);
let loadingCompute: Promise<void> | null = null;

/** Loads the arithmetic (once); resolves when results can be worked out. */
export function loadMassCompute(): Promise<void> {
  loadingCompute ??= import("./compute.ts").then(
    (module) => {
      loadedCompute.value = module;
      computeFailed.value = false;
    },
    () => {
      loadingCompute = null;
      computeFailed.value = true;
    },
  );
  return loadingCompute;
}

/**
 * The starting layout's result as the widget shows it before any change, worked out with the
 * arithmetic handed in (the chapter does this at build time and passes it to the widget).
 */
export function startingResult(layoutText: string, module: Compute): Worked | null {
  const o = createMassModel("metric", layoutText, null, module).outcome.value;
  return o && !o.error ? { balance: o.balance, plan: o.plan, drawing: o.drawing } : null;
}

/** Balance figures shown before and after a counterweight. */
export interface Snapshot {
  offset: number;
  grade: number;
  met: string;
  drift: number;
}

/**
 * The model. `initial` is the starting state's result (computed at build time): it answers until
 * something changes, and then the arithmetic is loaded. `module` hands the arithmetic in directly.
 */
export function createMassModel(system: UnitSystem = "metric", layoutText = "", initial: Worked | null = null, module?: Compute) {
  const fields = createFieldsModel(massCalculator.inputs, system);
  const parts = signal(parseLayout(layoutText).parts.map((p) => createPart(system, p, false, true)));
  const mode = signal<ModeKey>("r");
  const points = signal("55, 0; 0, 55; -55, 0; 0, -55");
  const notices = signal<string[]>([]);
  /** The counterweight last added with "Apply", for undo and the before/after line. */
  const applied = signal<{ key: number; before: Snapshot; after: Snapshot } | null>(null);
  /** The list "Start empty" took away, for undo while the list stays empty. */
  const cleared = signal<PartModel[] | null>(null);
  let lastLayoutText = layoutText;

  const layout = computed(() => {
    const list = parts.value.map(readPart);
    return list.every(Boolean) ? (list as LayoutPart[]) : null;
  });
  const mounting = computed(() => readPoints(points.value, fields.system.value));
  /** The input for calc/ and a key that tells whether it is still the starting one. */
  const request = computed(() => {
    const values = fields.values.value;
    const list = layout.value;
    if (!values || !list || list.length === 0) return null;
    const input = { ...values, parts: list, candidates: mounting.value.points ?? undefined };
    return { input, key: JSON.stringify([input, mode.value]) };
  });
  const startKey = request.value?.key;
  const fresh = (r: { key: string }) => initial !== null && r.key === startKey;
  /** True while a result waits for the arithmetic to load (or it could not). */
  const waiting = computed(() => {
    const r = request.value;
    return r !== null && !module && loadedCompute.value === null && !fresh(r);
  });
  // Fetched once the page is idle, so the first edit works out the balance at once.
  if (!module) whenIdle(() => void loadMassCompute());
  const outcome = computed(() => {
    const r = request.value;
    if (!r) return null;
    const { input } = r;
    const c = module ?? loadedCompute.value;
    if (!c) {
      if (fresh(r)) return { input, ...initial!, error: null };
      if (typeof window !== "undefined") void loadMassCompute();
      return null;
    }
    try {
      return { input, ...c.workOut(input, MODES[mode.value]), error: null };
    } catch (error) {
      return { error: mapError(error, fields.system), input: undefined, balance: undefined, plan: undefined, drawing: undefined };
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
    parts.value = at(parts.value, index + 1, copyPart(p, suffixedName(p.name.value, " (copy)")));
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
        parts.value = at(parts.value, index + 1, createPart(fields.system.value, { ...image, name: suffixedName(part.name, " (mirror)") }, true));
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
  /** Removes every part; `restore` puts them back while the list is still empty. */
  function clear(): void {
    batch(() => {
      cleared.value = parts.value;
      parts.value = [];
    });
  }
  function restore(): void {
    batch(() => {
      if (parts.value.length === 0 && cleared.value) parts.value = cleared.value;
      cleared.value = null;
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

  /**
   * A part of a link that breaks a rule is described in the parts editor's words, in the link's own
   * units (mm, g, degrees); that wording loads only when a link needs it.
   */
  function reword(text: string): void {
    const broken = parseLayout(text).problems.filter((p) => p.error);
    if (broken.length)
      import("../../calc/mass/part-messages.ts").then(
        ({ describePartProblem }) =>
          (notices.value = notices.value.map((notice) =>
            broken.reduce((line, p) => line.replace(p.reason, Object.values(describePartProblem(p.error, p)).join(" ")), notice),
          )),
        () => {},
      );
  }

  /** Applies a link: numbers, the counterweight question, the parts list and the mounting points as the calculator declares them. */
  function applyQuery(search: string): void {
    const read = readLink(massCalculator, search);
    const notes = [...read.notices];
    batch(() => {
      fields.applyTexts(read.texts, read.system);
      if (read.choices.mode !== undefined) mode.value = read.choices.mode as ModeKey;
      if (read.extras.parts !== undefined) {
        const parsed = massCalculator.extras.parts.read(read.extras.parts, fields.system.value);
        notes.push(...parsed.notices);
        if (parsed.value !== null) {
          parts.value = parsed.value.map((p) => createPart(fields.system.value, p, false, true));
          lastLayoutText = read.extras.parts;
        }
        reword(read.extras.parts);
      }
      if (read.extras.candidates !== undefined) points.value = read.extras.candidates.replace(/;/g, "; ").replace(/,/g, ", ");
      notices.value = notes;
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
    return writeLink(
      massCalculator,
      { texts, choices: { mode: mode.value }, extras: { parts: lastLayoutText, candidates: points.value.replace(/\s+/g, "") } },
      fields.system.value,
      existing,
    );
  }

  /** Saves the numbers, the parts list and the mounting points into a design. */
  function save(): Promise<string> {
    const values = fields.values.value;
    const list = layout.value;
    return saveToDesign(massCalculator, values && list ? { ...values, mode: mode.value, parts: list, candidates: mounting.value.points ?? [] } : null);
  }

  return {
    fields,
    parts,
    mode,
    points,
    notices,
    applied,
    cleared,
    layout,
    mounting,
    outcome,
    waiting,
    computeFailed,
    add,
    duplicate,
    remove,
    move,
    mirror,
    apply,
    undo,
    clear,
    restore,
    setSystem,
    applyQuery,
    queryFor,
    save,
  };
}

export type MassModel = ReturnType<typeof createMassModel>;
