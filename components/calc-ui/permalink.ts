/**
 * Calculator state in the query string: readable, versioned, and safe to open from anywhere.
 * `?v=1&u=metric&rpm=2400rpm&r=32mm` — each field's text as typed (spaces removed), the unit
 * system, and the format version. Reading never executes or renders anything: values only ever
 * become field text, and every problem becomes a plain-text notice.
 */
import { fieldUnit, type InputSpecs } from "../../calc/core/inputs.ts";
import { quantityToText } from "../../calc/core/units.ts";
import type { UnitSystem } from "../../calc/core/units.ts";

/** The permalink format this code writes. */
export const PERMALINK_VERSION = 1;

/** Longest value read from a link; longer ones are refused with a notice. */
export const MAX_VALUE_LENGTH = 48;

/**
 * Several calculators can share one page and one URL. The page's main calculator uses plain keys
 * (`rpm=2400rpm`); any other takes a scope and prefixes its keys (`t.rpm=2400rpm`). `v` is shared.
 */
function scoped(scope: string, key: string): string {
  return scope ? `${scope}.${key}` : key;
}

export interface DecodedState {
  /** Field texts by input name, for the fields the link sets. */
  texts: Record<string, string>;
  /** The unit system, when the link sets a valid one. */
  system?: UnitSystem;
  /** Plain-text notes on what was ignored and why. */
  notices: string[];
}

/** Makes a short, printable rendering of untrusted text for a notice. */
function quote(text: string): string {
  const printable = text.replace(/[\u0000-\u001f\u007f]/g, "?");
  return `"${printable.length > 24 ? `${printable.slice(0, 24)}…` : printable}"`;
}

/**
 * Reads a query string against a calculator's inputs. Unknown keys (of this calculator's scope),
 * repeated keys, over-long values and a format version other than this one are reported and
 * ignored. `extraKeys` are keys of this scope that the caller reads itself.
 */
export function decodeState(specs: InputSpecs, search: string, scope = "", extraKeys: readonly string[] = []): DecodedState {
  const params = new URLSearchParams(search);
  const byUrlKey = new Map(Object.entries(specs).map(([name, spec]) => [spec.urlKey, name]));
  const texts: Record<string, string> = {};
  const notices: string[] = [];
  let system: UnitSystem | undefined;
  const seen = new Set<string>();

  const version = params.get("v");
  if (version !== null && version !== String(PERMALINK_VERSION) && scope === "") {
    notices.push(
      `This link says format version ${quote(version)}; this page reads version ${PERMALINK_VERSION}. Values were read where they made sense; check them.`,
    );
  }
  for (const [fullKey, value] of params) {
    if (fullKey === "v") continue;
    const dot = fullKey.indexOf(".");
    const keyScope = dot >= 0 ? fullKey.slice(0, dot) : "";
    if (keyScope !== scope) continue;
    const key = dot >= 0 ? fullKey.slice(dot + 1) : fullKey;
    if (seen.has(key)) {
      notices.push(`The link sets ${quote(fullKey)} more than once; the first value was used.`);
      continue;
    }
    seen.add(key);
    if (extraKeys.includes(key)) continue;
    if (key === "u") {
      if (value === "metric" || value === "us") system = value;
      else notices.push(`Unknown unit system ${quote(value)} in the link (use "metric" or "us"); kept the current one.`);
      continue;
    }
    const name = byUrlKey.get(key);
    if (name === undefined) {
      notices.push(`The link has a parameter ${quote(fullKey)} that this calculator does not use; it was ignored.`);
      continue;
    }
    if (value.length > MAX_VALUE_LENGTH) {
      notices.push(`The link's value for ${specs[name]!.label} is longer than ${MAX_VALUE_LENGTH} characters; it was ignored.`);
      continue;
    }
    texts[name] = value;
  }
  return { texts, system, notices };
}

/**
 * Writes this calculator's state into a query string (without "?"), keeping every other
 * calculator's keys found in `existing`.
 */
export function encodeState(
  specs: InputSpecs,
  texts: Record<string, string>,
  system: UnitSystem,
  scope = "",
  existing = "",
  extra: Record<string, string> = {},
): string {
  const params = new URLSearchParams(existing);
  for (const key of [...params.keys()]) {
    const dot = key.indexOf(".");
    if ((dot >= 0 ? key.slice(0, dot) : "") === scope && key !== "v") params.delete(key);
  }
  params.set("v", String(PERMALINK_VERSION));
  params.set(scoped(scope, "u"), system);
  for (const [name, spec] of Object.entries(specs)) {
    const text = texts[name];
    if (text !== undefined) params.set(scoped(scope, spec.urlKey), text.replace(/\s+/g, ""));
  }
  for (const [key, value] of Object.entries(extra)) params.set(scoped(scope, key), value);
  // "v" first, then this page's keys in a stable order, with "/" left readable.
  params.sort();
  const v = params.get("v");
  params.delete("v");
  return `v=${v}&${params.toString()}`.replace(/%2F/g, "/");
}

/**
 * The query string that opens a calculator on given SI values, for links in prose (worked
 * examples). Each value is written in the field's unit for `system`.
 */
export function permalinkQuery(specs: InputSpecs, values: Record<string, number>, system: UnitSystem, scope = ""): string {
  const texts: Record<string, string> = {};
  for (const [name, spec] of Object.entries(specs)) {
    const value = values[name];
    if (value !== undefined) texts[name] = quantityToText(value, fieldUnit(spec, system));
  }
  return encodeState(specs, texts, system, scope);
}
