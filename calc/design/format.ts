/**
 * The design file's shape: its format tag and version, the header every design carries, and how a
 * calculator's section sits in it. Light on purpose: saving from a calculator page needs this and
 * nothing of the other calculators (reading a whole design is calc/design/design.ts).
 */
import type { AnyCalculator, AnyValues, ValuesOf } from "../core/calculator.ts";
import { requireInputObject } from "../core/spec-check.ts";

/** The format tag every design file carries. */
export const DESIGN_FORMAT = "whirlbook-design";
/**
 * The version this code writes. Version 2 stores the mass section's numbers beside its parts list;
 * version 3 stores each fastener entry as a bolted joint (grade, joint mode, clamp, stack, thread).
 */
export const DESIGN_VERSION = 3;

/** One entry of a list section: the calculator's values and a name for people ("weapon pulley bolts"). */
export type NamedValues = AnyValues & { name: string };

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
  /** One section per calculator id: its values, or a list of named entries for list calculators. */
  [section: string]: unknown;
}

/** The header fields of a design, which are not sections. */
export const HEADER_FIELDS = ["format", "version", "name", "notes", "created", "modified", "units"] as const;

/** The values a design holds for a single-section calculator, or undefined. */
export function sectionValues<K extends AnyCalculator>(design: Design, calc: K): ValuesOf<K> | undefined {
  requireInputObject(design, "design");
  requireInputObject(calc, "calc");
  return calc.section.kind === "single" ? (design[calc.id] as ValuesOf<K> | undefined) : undefined;
}

/** The named entries a design holds for a list calculator (empty when none). */
export function sectionEntries<K extends AnyCalculator>(design: Design, calc: K): (ValuesOf<K> & { name: string })[] {
  requireInputObject(design, "design");
  requireInputObject(calc, "calc");
  return calc.section.kind === "list" ? ((design[calc.id] as (ValuesOf<K> & { name: string })[] | undefined) ?? []) : [];
}

/** A new, empty design (no sections) with the given name. */
export function newDesign(name: string, now = new Date()): Design {
  const stamp = now.toISOString();
  return { format: DESIGN_FORMAT, version: DESIGN_VERSION, name, notes: "", created: stamp, modified: stamp, units: "metric" };
}
