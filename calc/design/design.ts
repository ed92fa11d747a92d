/**
 * The design file: one robot's inputs for every calculator, in SI, versioned. Each calculator of
 * the registry (calc/design/registry.ts) owns one section, named by its id, and declares what the
 * section holds (calc/design/sections.ts reads it), so a design can hold nothing a calculator would
 * refuse. Reading is forgiving and explicit: a malformed or partly invalid file keeps what is valid
 * and explains the rest, field by field.
 */
import * as v from "valibot";
import { type AnyForm, initialValues } from "../core/calculator.ts";
import { CalcInputError } from "../core/errors.ts";
import { describeReceived } from "../core/received.ts";
import { requireInputObject } from "../core/spec-check.ts";
import { FORMS } from "./registry.ts";
import { DESIGN_FORMAT, DESIGN_VERSION, type Design, HEADER_FIELDS } from "./format.ts";
import { readSection, type DesignProblem, SectionDropped } from "./sections.ts";
import { BOLTED_JOINT_CHOICE_DEFAULTS, boltedJointInputs } from "../loads/joint-inputs.ts";

export type { DesignProblem } from "./sections.ts";
export * from "./format.ts";

export type DesignReading = { ok: true; design: Design; problems: DesignProblem[]; migratedFrom: number | null } | { ok: false; problems: DesignProblem[] };

/** The forms of the sections a design holds, in build-sheet order. */
export function sectionsIn(design: Design): AnyForm[] {
  requireInputObject(design, "design");
  return FORMS.filter((c) => design[c.id] !== undefined);
}

// ---------------------------------------------------------------------------------------------
// Migrations: each takes a design of version N and returns version N + 1.

export type Migration = (design: Record<string, unknown>) => Record<string, unknown>;

export const MIGRATIONS: Readonly<Record<number, Migration>> = {
  // 1 → 2: the mass section's numbers moved out of "scalars" to sit beside the parts list, as in
  // every other section.
  1: (design) => {
    const mass = design.mass;
    if (typeof mass !== "object" || mass === null || Array.isArray(mass)) return design;
    const { scalars, ...rest } = mass as Record<string, unknown>;
    // null spreads to nothing, as {} does.
    return { ...design, mass: { ...(typeof scalars === "object" ? scalars : {}), ...rest } };
  },
  // 2 → 3: the fastener check became the bolted-joint check. "propertyClass" is now "grade" and
  // "mode" is "jointMode" (same values); the shear ratio and shear plane are no longer read (one
  // shear rule, shear through the thread). The joint's new values are written out explicitly, so
  // that the entry reads without a missing-value report.
  // The same step also writes out the values the review's corrections added (the wheels' side grip
  // and the support radius of the mass layout, where the current limit acts and how the no-load loss
  // grows in the drive train, the strengths' basis of a rim) at their calculators' defaults, so an
  // older file reads without a missing-value report.
  2: (design) => {
    const next: Record<string, unknown> = {
      ...design,
      fasteners: Array.isArray(design.fasteners) ? design.fasteners.map(migrateFastenerEntry) : design.fasteners,
    };
    for (const [section, names] of Object.entries(ADDED_IN_3)) {
      const stored = next[section];
      if (stored === undefined) continue;
      next[section] = Array.isArray(stored) ? stored.map((entry) => withDefaults(section, names, entry)) : withDefaults(section, names, stored);
    }
    return next;
  },
};

/** Values design version 3 added beside the joint check, by section. */
const ADDED_IN_3: Readonly<Record<string, readonly string[]>> = {
  mass: ["sideGrip", "gripShare", "supportRadius"],
  drivetrain: ["currentLimitAt", "noLoadLoss", "noLoadVoltage"],
  rims: ["strengthBasis"],
};

/** `entry` with each of `names` it lacks at its calculator's default; anything not an object is passed on for the reader to report. */
function withDefaults(section: string, names: readonly string[], entry: unknown): unknown {
  const calc = FORMS.find((c) => c.id === section);
  if (!calc || typeof entry !== "object" || entry === null || Array.isArray(entry)) return entry;
  const defaults = initialValues(calc);
  const out: Record<string, unknown> = { ...(entry as Record<string, unknown>) };
  for (const name of names) if (!(name in out) && name in defaults) out[name] = defaults[name];
  return out;
}

/**
 * What an entry of the earlier average-shear fastener check becomes: the same part, speed, bolts,
 * size, class and thresholds, with the joint check's defaults for the clamp, the stack and the
 * thread (`FASTENER_JOINT_DEFAULTS`). An entry that is not an object is passed on for the reader to
 * report.
 */
function migrateFastenerEntry(entry: unknown): unknown {
  if (typeof entry !== "object" || entry === null || Array.isArray(entry)) return entry;
  const { propertyClass, mode, shearPlane: _plane, shearRatio: _ratio, ...rest } = entry as Record<string, unknown>;
  return {
    ...FASTENER_JOINT_DEFAULTS,
    ...rest,
    ...(propertyClass !== undefined && rest.grade === undefined ? { grade: propertyClass } : {}),
    ...(mode !== undefined && rest.jointMode === undefined ? { jointMode: mode } : {}),
  };
}

/**
 * The joint check's values an entry of design version 2 did not have, at the calculator's
 * defaults (calc/loads/joint-inputs.ts): a bolt tightened to 75 % of proof, μ = 0.2, a 5 mm stack,
 * tapped 8 mm deep into 6061-T6.
 */
const FASTENER_JOINT_DEFAULTS: Readonly<Record<string, number | string>> = {
  load: boltedJointInputs.load.default,
  stackHeight: boltedJointInputs.stackHeight.default,
  gripLength: boltedJointInputs.gripLength.default,
  shankLength: boltedJointInputs.shankLength.default,
  preloadShare: boltedJointInputs.preloadShare.default,
  tighteningTorque: boltedJointInputs.tighteningTorque.default,
  nutFactor: boltedJointInputs.nutFactor.default,
  frictionCoefficient: boltedJointInputs.frictionCoefficient.default,
  interfaces: boltedJointInputs.interfaces.default,
  engagedLength: boltedJointInputs.engagedLength.default,
  loadFrom: BOLTED_JOINT_CHOICE_DEFAULTS.loadFrom,
  preloadFrom: BOLTED_JOINT_CHOICE_DEFAULTS.preloadFrom,
  threadIn: BOLTED_JOINT_CHOICE_DEFAULTS.threadIn,
  endCondition: BOLTED_JOINT_CHOICE_DEFAULTS.endCondition,
  memberMaterial: BOLTED_JOINT_CHOICE_DEFAULTS.memberMaterial,
};

/** Brings a raw design of an older version forward to `DESIGN_VERSION`, step by step. */
export function migrateDesign(
  raw: Record<string, unknown>,
  migrations: Readonly<Record<number, Migration>> = MIGRATIONS,
  target = DESIGN_VERSION,
): Record<string, unknown> {
  requireInputObject(raw, "raw");
  requireInputObject(migrations, "migrations");
  let current = raw;
  let version = Number(current.version);
  while (version < target) {
    const step = migrations[version];
    if (!step)
      throw new CalcInputError({ param: "version", value: version, expected: `a design version this handbook can bring forward (1 to ${target})`, unit: "" });
    current = { ...step(current), version: version + 1 };
    version += 1;
  }
  return current;
}

// ---------------------------------------------------------------------------------------------
// Reading and writing.

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
    // Stryker disable next-line ArrayDeclaration,StringLiteral: equivalent, every header issue names one top-level key (format or version)
    const path = (issue.path ?? []).map((p) => String(p.key)).join(".");
    return { ok: false, problems: [{ path, message: `${issue.message}: this is not a Whirlbook design file`, action: "not-read" }] };
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
  const migratedFrom = header.output.version < DESIGN_VERSION ? header.output.version : null;
  const record = migrateDesign(raw as Record<string, unknown>); // a design of this version passes through unchanged

  const stamp = new Date().toISOString();
  const text = (key: string, max: number, fallback: string) => {
    const value = record[key];
    if (typeof value === "string" && value.length <= max) return value;
    if (value !== undefined) problems.push({ path: key, message: `must be text of at most ${max} characters; "${fallback}" was used`, action: "default-used" });
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
    problems.push({ path: "units", message: `must be "metric" or "us" (got ${describeReceived(record.units)}); metric was used`, action: "default-used" });
  }

  const known = new Set<string>([...HEADER_FIELDS, ...FORMS.map((c) => c.id)]);
  for (const key of Object.keys(record)) {
    if (!known.has(key)) problems.push({ path: key, message: "is not part of a design; it was ignored", action: "section-dropped" });
  }
  for (const calc of FORMS) {
    if (record[calc.id] === undefined) continue;
    try {
      design[calc.id] = readSection(calc, record[calc.id], calc.id, problems, design.units);
      // Stryker disable next-line BlockStatement: equivalent, readSection throws nothing but SectionDropped (the rethrow is for a fault in the code)
    } catch (error) {
      // Stryker disable next-line ConditionalExpression: equivalent, as above
      if (!(error instanceof SectionDropped)) throw error;
    }
  }
  return { ok: true, design, problems, migratedFrom };
}

/** The most text a design may take [characters]: far more than any design needs, little enough to read at once. */
export const DESIGN_TEXT_LIMIT = 2_000_000;

/** Reads a design from JSON text (a file's contents). Never throws. */
export function readDesignText(text: string): DesignReading {
  if (typeof text !== "string") return { ok: false, problems: [{ path: "", message: "is not text: a design file is JSON text", action: "not-read" }] };
  if (text.length > DESIGN_TEXT_LIMIT) return { ok: false, problems: [{ path: "", message: "is larger than 2 MB: not a design file", action: "not-read" }] };
  let raw: unknown;
  try {
    raw = JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch (error) {
    const where = (error as SyntaxError).message; // JSON.parse of text throws only a SyntaxError
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
  if (!Array.isArray(problems)) throw new CalcInputError({ param: "problems", value: problems, expected: "a list of problems", unit: "" });
  return problems.map((p) => (p.section ? `${p.section} (${p.path}): ${p.message}.` : `${p.path || "The file"} ${p.message}.`));
}
