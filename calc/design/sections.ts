/**
 * One calculator's section of a design file: read from JSON the way its descriptor declares it
 * (numbers within their declared ranges, choices among their options, extras by their own
 * readers), and written back. A bad value takes its default and is reported; a bad list entry is
 * left out and reported; nothing is dropped silently.
 */
import { type AnyForm, type AnyValues, type ExtraSpec, initialValues, type ValueProblem } from "../core/calculator.ts";
import { choiceLabel } from "../core/choices.ts";
import { defaultText, describeRange, fieldUnit, type InputSpec } from "../core/inputs.ts";
import { describeReceived } from "../core/received.ts";
import type { UnitSystem } from "../core/units.ts";
import { describePartProblem } from "../mass/part-messages.ts";

/** One thing wrong with a file, and what was done about it. */
export interface DesignProblem {
  /** Where, as a path: "placement.radius", "fasteners[2].size", "" for the whole file. */
  path: string;
  /** The calculator (and list entry) the value belongs to, in the handbook's words: "Fasteners: Battery bracket". */
  section?: string;
  message: string;
  /** What happened: the field took its default, the item was dropped, the section was dropped, or nothing could be read. */
  action: "default-used" | "item-dropped" | "section-dropped" | "not-read";
}

/** Thrown inside section reading when a whole section cannot be read (the problem is already recorded). */
export class SectionDropped extends Error {}

/** Longest name of a list entry [characters]. */
export const MAX_ENTRY_NAME = 80;

/** Whether a stored number is one the field would accept (NaN and ±∞ fail the range: every declared range is finite). */
function numberFits(spec: InputSpec, value: unknown): value is number {
  return typeof value === "number" && (spec.minOpen ? value > spec.min : value >= spec.min) && value <= spec.max && (!spec.integer || Number.isInteger(value));
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** Whether a list reads back whole from the link text it is written as. */
function fits(spec: ExtraSpec<unknown>, list: unknown[]): boolean {
  try {
    // Stryker disable next-line OptionalChaining: equivalent, a null read then throws and the catch answers false, as the comparison does
    return (spec.read(spec.write(list, "metric"), "metric").value as unknown[] | null)?.length === list.length;
    // Stryker disable next-line BlockStatement: equivalent, an empty catch returns undefined, which the one caller reads as false
  } catch {
    return false;
  }
}

/**
 * Reads a stored list that has no reader of its own the way a link carries it: each entry written
 * as link text and read back, so a design holds nothing a link could not. An entry that cannot be
 * written is left out and reported in the parts editor's words (the mass layout's lists are the ones
 * read this way) and the design's units; a list longer than a link carries keeps its first entries.
 */
function readAsLink(spec: ExtraSpec<unknown>, raw: unknown, system: UnitSystem): { value: unknown[] | null; problems: ValueProblem[] } {
  if (!Array.isArray(raw)) return { value: null, problems: [{ path: "", message: `${spec.label} must be a list` }] };
  const value: unknown[] = [];
  const problems: ValueProblem[] = [];
  for (const [i, item] of raw.entries()) {
    const entry = `entry ${i + 1}${typeof item?.name === "string" ? ` “${item.name.slice(0, 60)}”` : ""} of the ${spec.label.toLowerCase()}`;
    try {
      // Stryker disable next-line ArrayDeclaration: equivalent, an entry that writes reads back (the link round trip), so the read is never null
      const [read] = (spec.read(spec.write([item], "metric"), "metric").value as unknown[] | null) ?? [];
      // Stryker disable next-line ConditionalExpression: equivalent, as above: a written entry always reads back as one
      if (read === undefined) throw new Error("unreadable");
      value.push(read);
    } catch (error) {
      const { label, rule } = describePartProblem(error, { system, shape: item?.shape?.kind, received: describeReceived });
      problems.push({ path: `[${i}]`, message: `${label} ${rule}, in ${entry}; it was left out` });
    }
  }
  // The longest start of the list that a link carries (fitting is monotone: binary search).
  let [low, high] = [0, value.length];
  while (low < high) {
    const middle = Math.ceil((low + high) / 2);
    if (fits(spec, value.slice(0, middle))) low = middle;
    else high = middle - 1;
  }
  if (low < value.length)
    problems.push({ path: "", message: `${spec.label} holds ${value.length} entries; only the first ${low} were read, as many as a link carries` });
  return { value: value.slice(0, low), problems };
}

/** How a section is read: the design's unit system (for messages), the section's words, keys besides the calculator's own. */
export interface ReadOptions {
  system?: UnitSystem;
  section?: string;
  allowed?: readonly string[];
}

/**
 * Reads one set of a calculator's values from a stored object: each bad or missing value takes its
 * default and is reported in the field's words and the design's units; fields that are not the
 * calculator's are reported and ignored.
 */
export function readValues(calc: AnyForm, raw: unknown, path: string, problems: DesignProblem[], options: ReadOptions = {}): AnyValues {
  const { system = "metric", section = calc.title, allowed = [] } = options;
  if (!isRecord(raw)) {
    problems.push({ path, section, message: "must be an object of named values", action: "section-dropped" });
    throw new SectionDropped();
  }
  const out: AnyValues = initialValues(calc);
  for (const [name, spec] of Object.entries(calc.inputs)) {
    const value = raw[name];
    const fallback = `the default, ${defaultText(spec, system)}, was used`;
    if (value === undefined) {
      problems.push({ path: `${path}.${name}`, section, message: `${spec.label} is missing; ${fallback}`, action: "default-used" });
    } else if (numberFits(spec, value)) {
      out[name] = value;
    } else {
      const rule = typeof value === "number" ? describeRange(spec, system) : "a number";
      const got = describeReceived(value, fieldUnit(spec, system));
      problems.push({ path: `${path}.${name}`, section, message: `${spec.label} must be ${rule} (got ${got}); ${fallback}`, action: "default-used" });
    }
  }
  for (const [name, spec] of Object.entries(calc.choices)) {
    const value = raw[name];
    const fallback = `${choiceLabel(spec, spec.default)} was used`;
    if (typeof value === "string" && spec.options.some((o) => o.value === value)) out[name] = value;
    else if (value === undefined) {
      problems.push({ path: `${path}.${name}`, section, message: `${spec.label} is missing; ${fallback}`, action: "default-used" });
    } else {
      problems.push({
        path: `${path}.${name}`,
        section,
        message: `${spec.label} must be one of ${spec.options.map((o) => o.value).join(", ")} (got ${describeReceived(value)}); ${fallback}`,
        action: "default-used",
      });
    }
  }
  for (const [name, spec] of Object.entries(calc.extras)) {
    const value = raw[name];
    if (value === undefined) continue;
    const read = spec.fromDesign ? spec.fromDesign(value) : readAsLink(spec, value, system);
    for (const p of read.problems)
      problems.push({ path: `${path}.${name}${p.path}`, section, message: p.message, action: read.value === null ? "default-used" : "item-dropped" });
    if (read.value !== null) out[name] = read.value;
  }
  const known = new Set([...Object.keys(calc.inputs), ...Object.keys(calc.choices), ...Object.keys(calc.extras), ...allowed]);
  for (const key of Object.keys(raw)) {
    if (!known.has(key)) problems.push({ path: `${path}.${key}`, message: "is not a value of this calculator; it was ignored", action: "default-used" });
  }
  return out;
}

/**
 * Reads a calculator's whole section: its values, or for a list calculator its named entries (at
 * most the declared number; each entry that is not an object is left out and reported).
 */
export function readSection(calc: AnyForm, raw: unknown, path: string, problems: DesignProblem[], system: UnitSystem = "metric"): AnyValues | AnyValues[] {
  if (calc.section.kind === "single") return readValues(calc, raw, path, problems, { system });
  const { max, entryName } = calc.section;
  if (!Array.isArray(raw)) {
    problems.push({ path, message: "must be a list", action: "section-dropped" });
    throw new SectionDropped();
  }
  if (raw.length > max) problems.push({ path, message: `lists ${raw.length} entries; only the first ${max} were read`, action: "item-dropped" });
  const entries: AnyValues[] = [];
  for (const [index, item] of raw.slice(0, max).entries()) {
    const itemPath = `${path}[${index}]`;
    if (!isRecord(item)) {
      problems.push({ path: itemPath, message: "must be an object; the entry was left out", action: "item-dropped" });
      continue;
    }
    let name = `${entryName} ${index + 1}`;
    if (typeof item.name === "string" && item.name.length <= MAX_ENTRY_NAME) name = item.name;
    else if (item.name !== undefined) {
      problems.push({
        path: `${itemPath}.name`,
        message: `must be text of at most ${MAX_ENTRY_NAME} characters; a default name was used`,
        action: "default-used",
      });
    }
    // No catch: readValues drops only what is not an object, and such an entry was left out just above.
    entries.push({ name, ...readValues(calc, item, itemPath, problems, { system, section: `${calc.title}: ${name}`, allowed: ["name"] }) });
  }
  return entries;
}
