/**
 * The design file: one robot's inputs for every chapter, in SI, versioned. Structure is validated
 * with valibot; every number's allowed range comes from the calculators' own input declarations,
 * so a design can hold nothing a calculator would refuse. Reading is forgiving and explicit: a
 * malformed or partly invalid file keeps what is valid and explains the rest, field by field.
 */
import * as v from "valibot";
import { describeRange, type InputSpecs } from "../core/inputs.ts";
import { accelerometerPlacementInputs } from "../rotation/rotation.ts";
import { headingDriftInputs } from "../heading/drift-budget.ts";
import { checkPart, type LayoutPart } from "../mass/parts.ts";
import { massBalanceInputs } from "../mass/mass-balance.ts";
import type { MountingPoint } from "../mass/counterweight.ts";
import {
  fastenerCheckInputs,
  rimCheckInputs,
  FASTENER_CHOICE_DEFAULTS,
  RIM_CHOICE_DEFAULTS,
  LOADING_MODE_OPTIONS,
  SHEAR_PLANE_OPTIONS,
  RIM_SHAPE_OPTIONS,
} from "../loads/index.ts";
import { THREAD_SIZE_OPTIONS, PROPERTY_CLASS_OPTIONS } from "../loads/fasteners.ts";
import { drivetrainInputs, DRIVE_TYPE_OPTIONS } from "../drivetrain/inputs.ts";
import { CalcInputError } from "../core/errors.ts";

/** The format tag every design file carries. */
export const DESIGN_FORMAT = "whirlbook-design";
/** The version this code writes. */
export const DESIGN_VERSION = 1;
/** Most fasteners or rims one design may list. */
export const MAX_ITEMS = 24;

type Numbers<S extends InputSpecs> = { [K in keyof S]: number };

export interface FastenerEntry extends Numbers<typeof fastenerCheckInputs> {
  /** What the bolts hold, e.g. "weapon pulley bolts". */
  name: string;
  size: string;
  propertyClass: string;
  mode: string;
  shearPlane: string;
}

export interface RimEntry extends Numbers<typeof rimCheckInputs> {
  name: string;
  shape: string;
}

export interface Design {
  format: typeof DESIGN_FORMAT;
  version: typeof DESIGN_VERSION;
  /** The robot's name as the team calls it. */
  name: string;
  /** Free notes. */
  notes: string;
  /** ISO 8601 timestamps. */
  created: string;
  modified: string;
  /** Units the team reads the build sheet in. */
  units: "metric" | "us";
  placement?: Numbers<typeof accelerometerPlacementInputs>;
  headingDrift?: Numbers<typeof headingDriftInputs>;
  mass?: { scalars: Numbers<typeof massBalanceInputs>; parts: LayoutPart[]; candidates: MountingPoint[] };
  fasteners?: FastenerEntry[];
  rims?: RimEntry[];
  drivetrain?: Numbers<typeof drivetrainInputs> & { driveType: string };
}

/** The sections a design may hold, in build-sheet order. */
export const DESIGN_SECTIONS = ["placement", "headingDrift", "mass", "fasteners", "rims", "drivetrain"] as const;
export type DesignSection = (typeof DESIGN_SECTIONS)[number];

export const SECTION_TITLES: Record<DesignSection, string> = {
  placement: "Accelerometer placement",
  headingDrift: "Heading drift",
  mass: "Mass layout and balance",
  fasteners: "Fasteners",
  rims: "Rims and disks",
  drivetrain: "Spin-up and stored energy",
};

/** One thing wrong with a file, and what was done about it. */
export interface DesignProblem {
  /** Where, as a path: "placement.radius", "fasteners[2].size", "" for the whole file. */
  path: string;
  message: string;
  /** What happened: the field took its default, the item was dropped, the section was dropped, or nothing could be read. */
  action: "default-used" | "item-dropped" | "section-dropped" | "not-read";
}

export type DesignReading = { ok: true; design: Design; problems: DesignProblem[]; migratedFrom: number | null } | { ok: false; problems: DesignProblem[] };

// ---------------------------------------------------------------------------------------------
// Numbers checked against the calculators' declarations.

function numbersOf<S extends InputSpecs>(specs: S): Numbers<S> {
  return Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, s.default])) as Numbers<S>;
}

/** A finite number inside the spec's declared range. */
function inRange(spec: InputSpecs[string]) {
  return v.pipe(
    v.number("must be a number"),
    v.finite("must be a finite number"),
    v.check(
      (n) => (spec.minOpen ? n > spec.min : n >= spec.min) && n <= spec.max && (!spec.integer || Number.isInteger(n)),
      `must be ${describeRange(spec, "metric")}`,
    ),
  );
}

/**
 * Reads the numbers of one calculator section: each bad or missing field takes its default and is
 * reported; unknown fields are reported and ignored.
 */
function readNumbers<S extends InputSpecs>(specs: S, raw: unknown, path: string, problems: DesignProblem[]): Numbers<S> {
  const out = numbersOf(specs);
  if (typeof raw !== "object" || raw === null || Array.isArray(raw)) {
    problems.push({ path, message: "must be an object of named values", action: "section-dropped" });
    throw new SectionDropped();
  }
  const record = raw as Record<string, unknown>;
  for (const [name, spec] of Object.entries(specs)) {
    if (!(name in record)) {
      problems.push({ path: `${path}.${name}`, message: `is missing; the default (${spec.default} SI) was used`, action: "default-used" });
      continue;
    }
    const result = v.safeParse(inRange(spec), record[name]);
    if (result.success) (out as Record<string, number>)[name] = result.output;
    else
      problems.push({
        path: `${path}.${name}`,
        message: `${result.issues[0].message} (got ${preview(record[name])}); the default was used`,
        action: "default-used",
      });
  }
  return out;
}

class SectionDropped extends Error {}

function preview(value: unknown): string {
  const text = typeof value === "string" ? JSON.stringify(value) : String(JSON.stringify(value) ?? value);
  return text.length > 40 ? `${text.slice(0, 40)}…` : text;
}

function readChoice(
  raw: Record<string, unknown>,
  key: string,
  options: readonly { value: string }[],
  fallback: string,
  path: string,
  problems: DesignProblem[],
): string {
  const value = raw[key];
  if (typeof value === "string" && options.some((o) => o.value === value)) return value;
  problems.push({
    path: `${path}.${key}`,
    message: `must be one of ${options.map((o) => o.value).join(", ")} (got ${preview(value)}); "${fallback}" was used`,
    action: "default-used",
  });
  return fallback;
}

function readName(raw: Record<string, unknown>, path: string, fallback: string, problems: DesignProblem[]): string {
  const result = v.safeParse(v.pipe(v.string(), v.maxLength(80)), raw.name);
  if (result.success) return result.output;
  if (raw.name !== undefined)
    problems.push({ path: `${path}.name`, message: "must be text of at most 80 characters; a default name was used", action: "default-used" });
  return fallback;
}

// ---------------------------------------------------------------------------------------------
// Structure of the parts list (valibot), then each part's physics (mass.ts checkPart).

const lengthSchema = v.pipe(v.number(), v.finite());
const shapeSchema = v.variant("kind", [
  v.object({ kind: v.literal("point") }),
  v.object({ kind: v.literal("disk"), radius: lengthSchema }),
  v.object({ kind: v.literal("ring"), radius: lengthSchema }),
  v.object({ kind: v.literal("annulus"), innerRadius: lengthSchema, outerRadius: lengthSchema }),
  v.object({ kind: v.literal("plate"), length: lengthSchema, width: lengthSchema, angle: lengthSchema }),
  v.object({ kind: v.literal("rod"), length: lengthSchema, angle: lengthSchema }),
  v.object({ kind: v.literal("cylinder"), radius: lengthSchema, height: lengthSchema }),
  v.object({ kind: v.literal("custom"), inertiaZ: lengthSchema, productXZ: lengthSchema, productYZ: lengthSchema }),
]);
const partSchema = v.object({
  name: v.pipe(v.string(), v.maxLength(80)),
  shape: shapeSchema,
  mass: v.variant("kind", [
    v.object({ kind: v.literal("given"), mass: lengthSchema }),
    v.object({ kind: v.literal("material"), material: v.string(), thickness: v.optional(lengthSchema) }),
  ]),
  x: lengthSchema,
  y: lengthSchema,
  z: lengthSchema,
});
const pointSchema = v.object({ x: lengthSchema, y: lengthSchema });

function issuePath(issue: v.BaseIssue<unknown>): string {
  return (issue.path ?? []).map((p) => (typeof p.key === "number" ? `[${p.key}]` : `.${String(p.key)}`)).join("");
}

function readList<T>(raw: unknown, path: string, problems: DesignProblem[], readItem: (item: unknown, itemPath: string) => T): T[] {
  if (!Array.isArray(raw)) {
    problems.push({ path, message: "must be a list", action: "section-dropped" });
    throw new SectionDropped();
  }
  if (raw.length > MAX_ITEMS * 4) {
    problems.push({ path, message: `lists ${raw.length} items; only the first ${MAX_ITEMS * 4} were read`, action: "item-dropped" });
  }
  const out: T[] = [];
  raw.slice(0, MAX_ITEMS * 4).forEach((item, index) => {
    try {
      out.push(readItem(item, `${path}[${index}]`));
    } catch (error) {
      if (error instanceof ItemDropped)
        problems.push({ path: `${path}[${index}]${error.where}`, message: `${error.message}; the item was left out`, action: "item-dropped" });
      else throw error;
    }
  });
  return out;
}

class ItemDropped extends Error {
  readonly where: string;
  constructor(message: string, where = "") {
    super(message);
    this.where = where;
  }
}

function readPart(item: unknown): LayoutPart {
  const result = v.safeParse(partSchema, item);
  if (!result.success) {
    const issue = result.issues[0];
    throw new ItemDropped(issue.message.replace(/^Invalid /, "invalid "), issuePath(issue));
  }
  const part = result.output as LayoutPart;
  try {
    checkPart(part, "");
  } catch (error) {
    if (error instanceof CalcInputError)
      throw new ItemDropped(`must be ${error.expected} (got ${preview(error.value)})`, error.param.startsWith(".") ? error.param : `.${error.param}`);
    throw error;
  }
  return part;
}

// ---------------------------------------------------------------------------------------------
// Migrations: each takes a design of version N and returns version N + 1. None exist yet; the
// chain runs whatever is registered here when a later version is introduced.

export type Migration = (design: Record<string, unknown>) => Record<string, unknown>;
export const MIGRATIONS: Readonly<Record<number, Migration>> = {};

/** Brings a raw design of an older version forward to `DESIGN_VERSION`, step by step. */
export function migrateDesign(
  raw: Record<string, unknown>,
  migrations: Readonly<Record<number, Migration>> = MIGRATIONS,
  target = DESIGN_VERSION,
): Record<string, unknown> {
  let current = raw;
  let version = Number(current.version);
  while (version < target) {
    const step = migrations[version];
    if (!step) throw new Error(`no migration from design version ${version}`);
    current = { ...step(current), version: version + 1 };
    version += 1;
  }
  return current;
}

// ---------------------------------------------------------------------------------------------
// Reading and writing.

/** A new, empty design (no sections) with the given name. */
export function newDesign(name: string, now = new Date()): Design {
  const stamp = now.toISOString();
  return { format: DESIGN_FORMAT, version: DESIGN_VERSION, name, notes: "", created: stamp, modified: stamp, units: "metric" };
}

/** Default values of a section, as the calculators start. */
export function defaultSection<K extends DesignSection>(section: K): NonNullable<Design[K]> {
  switch (section) {
    case "placement":
      return numbersOf(accelerometerPlacementInputs) as unknown as NonNullable<Design[K]>;
    case "headingDrift":
      return numbersOf(headingDriftInputs) as unknown as NonNullable<Design[K]>;
    case "mass":
      return { scalars: numbersOf(massBalanceInputs), parts: [], candidates: [] } as unknown as NonNullable<Design[K]>;
    case "fasteners":
      return [{ name: "Fasteners 1", ...numbersOf(fastenerCheckInputs), ...FASTENER_CHOICE_DEFAULTS }] as unknown as NonNullable<Design[K]>;
    case "rims":
      return [{ name: "Rim 1", ...numbersOf(rimCheckInputs), ...RIM_CHOICE_DEFAULTS }] as unknown as NonNullable<Design[K]>;
    case "drivetrain":
      return { ...numbersOf(drivetrainInputs), driveType: DRIVE_TYPE_OPTIONS[0]!.value } as unknown as NonNullable<Design[K]>;
  }
  throw new Error(`unknown section ${String(section)}`);
}

const headerSchema = v.object({
  format: v.literal(DESIGN_FORMAT, `must be "${DESIGN_FORMAT}"`),
  version: v.pipe(v.number("must be a whole number"), v.integer("must be a whole number"), v.minValue(1, "must be 1 or more")),
});

/**
 * Reads a design from parsed JSON. Never throws: a file that cannot be read at all says why; a
 * readable one keeps every valid field and lists every problem and what was done about it.
 */
export function readDesign(raw: unknown): DesignReading {
  const problems: DesignProblem[] = [];
  if (typeof raw !== "object" || raw === null || Array.isArray(raw)) {
    return { ok: false, problems: [{ path: "", message: "is not a design: expected a JSON object", action: "not-read" }] };
  }
  if (!("format" in raw)) {
    return {
      ok: false,
      problems: [{ path: "format", message: 'is missing: this is not a Whirlbook design file (it has no "format": "whirlbook-design")', action: "not-read" }],
    };
  }
  const header = v.safeParse(headerSchema, raw);
  if (!header.success) {
    const issue = header.issues[0];
    return {
      ok: false,
      problems: [{ path: issuePath(issue).replace(/^\./, ""), message: `${issue.message}: this is not a Whirlbook design file`, action: "not-read" }],
    };
  }
  if (header.output.version > DESIGN_VERSION) {
    return {
      ok: false,
      problems: [
        {
          path: "version",
          message: `is ${header.output.version}, newer than this handbook reads (${DESIGN_VERSION}); open it with a newer version of the handbook`,
          action: "not-read",
        },
      ],
    };
  }
  let record = raw as Record<string, unknown>;
  const migratedFrom = header.output.version < DESIGN_VERSION ? header.output.version : null;
  if (migratedFrom !== null) record = migrateDesign(record);

  const stamp = new Date().toISOString();
  const text = (key: string, max: number, fallback: string) => {
    const result = v.safeParse(v.pipe(v.string(), v.maxLength(max)), record[key]);
    if (result.success) return result.output;
    if (record[key] !== undefined)
      problems.push({ path: key, message: `must be text of at most ${max} characters; "${fallback}" was used`, action: "default-used" });
    return fallback;
  };
  const design: Design = {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    name: text("name", 80, "Unnamed robot"),
    notes: text("notes", 4000, ""),
    created: text("created", 40, stamp),
    modified: text("modified", 40, stamp),
    units: record.units === "us" ? "us" : "metric",
  };
  if (record.units !== undefined && record.units !== "us" && record.units !== "metric") {
    problems.push({ path: "units", message: `must be "metric" or "us" (got ${preview(record.units)}); metric was used`, action: "default-used" });
  }

  const known = new Set<string>(["format", "version", "name", "notes", "created", "modified", "units", ...DESIGN_SECTIONS]);
  for (const key of Object.keys(record)) {
    if (!known.has(key)) problems.push({ path: key, message: "is not part of a design; it was ignored", action: "section-dropped" });
  }

  const section = <K extends DesignSection>(key: K, read: (raw: unknown) => NonNullable<Design[K]>) => {
    if (record[key] === undefined) return;
    try {
      design[key] = read(record[key]) as Design[K];
    } catch (error) {
      if (!(error instanceof SectionDropped)) throw error;
    }
  };
  section("placement", (raw) => readNumbers(accelerometerPlacementInputs, raw, "placement", problems));
  section("headingDrift", (raw) => readNumbers(headingDriftInputs, raw, "headingDrift", problems));
  section("mass", (raw) => {
    if (typeof raw !== "object" || raw === null) {
      problems.push({ path: "mass", message: "must be an object with scalars, parts and candidates", action: "section-dropped" });
      throw new SectionDropped();
    }
    const m = raw as Record<string, unknown>;
    return {
      scalars: readNumbers(massBalanceInputs, m.scalars ?? {}, "mass.scalars", problems),
      parts: readList(m.parts ?? [], "mass.parts", problems, (item) => readPart(item)),
      candidates: readList(m.candidates ?? [], "mass.candidates", problems, (item) => {
        const result = v.safeParse(pointSchema, item);
        if (!result.success) throw new ItemDropped("must be a point { x, y } in metres");
        return result.output;
      }),
    };
  });
  section("fasteners", (raw) =>
    readList(raw, "fasteners", problems, (item, path) => {
      if (typeof item !== "object" || item === null) throw new ItemDropped("must be an object");
      const r = item as Record<string, unknown>;
      return {
        name: readName(r, path, "Fasteners", problems),
        ...readNumbers(fastenerCheckInputs, r, path, problems),
        size: readChoice(r, "size", THREAD_SIZE_OPTIONS, FASTENER_CHOICE_DEFAULTS.size, path, problems),
        propertyClass: readChoice(r, "propertyClass", PROPERTY_CLASS_OPTIONS, FASTENER_CHOICE_DEFAULTS.propertyClass, path, problems),
        mode: readChoice(r, "mode", LOADING_MODE_OPTIONS, FASTENER_CHOICE_DEFAULTS.mode, path, problems),
        shearPlane: readChoice(r, "shearPlane", SHEAR_PLANE_OPTIONS, FASTENER_CHOICE_DEFAULTS.shearPlane, path, problems),
      };
    }).slice(0, MAX_ITEMS),
  );
  section("rims", (raw) =>
    readList(raw, "rims", problems, (item, path) => {
      if (typeof item !== "object" || item === null) throw new ItemDropped("must be an object");
      const r = item as Record<string, unknown>;
      return {
        name: readName(r, path, "Rim", problems),
        ...readNumbers(rimCheckInputs, r, path, problems),
        shape: readChoice(r, "shape", RIM_SHAPE_OPTIONS, RIM_CHOICE_DEFAULTS.shape, path, problems),
      };
    }).slice(0, MAX_ITEMS),
  );
  section("drivetrain", (raw) => {
    const numbers = readNumbers(drivetrainInputs, raw, "drivetrain", problems);
    return {
      ...numbers,
      driveType: readChoice(raw as Record<string, unknown>, "driveType", DRIVE_TYPE_OPTIONS, DRIVE_TYPE_OPTIONS[0]!.value, "drivetrain", problems),
    };
  });
  return { ok: true, design, problems, migratedFrom };
}

/** Reads a design from JSON text (a file's contents). Never throws. */
export function readDesignText(text: string): DesignReading {
  if (text.length > 2_000_000) return { ok: false, problems: [{ path: "", message: "is larger than 2 MB: not a design file", action: "not-read" }] };
  let raw: unknown;
  try {
    raw = JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch (error) {
    const where = error instanceof SyntaxError ? error.message : "unknown position";
    return { ok: false, problems: [{ path: "", message: `is not valid JSON (${where})`, action: "not-read" }] };
  }
  return readDesign(raw);
}

/** The design as pretty JSON text for a file. */
export function designToText(design: Design): string {
  return `${JSON.stringify(design, null, 2)}\n`;
}

/** A description of the problems for people, one line each. */
export function describeProblems(problems: readonly DesignProblem[]): string[] {
  return problems.map((p) => `${p.path || "The file"} ${p.message}.`);
}
