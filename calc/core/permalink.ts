/**
 * Calculator state in the query string: readable, versioned, and safe to open from anywhere.
 * `?v=1&u=metric&rpm=2400rpm&r=32mm` — each field's text as typed (spaces removed), the unit
 * system, and the format version. Reading never executes or renders anything: values only ever
 * become text for the calculator to read, and every problem becomes a plain-text notice.
 *
 * Several calculators can share one page and one URL. The page's main calculator uses plain keys
 * (`rpm=2400rpm`); any other takes a scope and prefixes its keys (`t.rpm=2400rpm`). `v` is shared.
 */
import type { UnitSystem } from "./units.ts";

/** The permalink format this code writes. */
export const PERMALINK_VERSION = 1;

/** Longest value of a single field read from a link; longer ones are refused with a notice. */
export const MAX_VALUE_LENGTH = 48;

/** One key a calculator reads from a link: the key, what it is called in a notice, its longest value. */
export interface LinkKey {
  key: string;
  label: string;
  maxLength: number;
}

export interface LinkReading {
  /** The value of each known key the link sets, by key. */
  values: Record<string, string>;
  /** The unit system, when the link sets a valid one. */
  system?: UnitSystem;
  /** Plain-text notes on what was ignored and why. */
  notices: string[];
}

function scoped(scope: string, key: string): string {
  return scope ? `${scope}.${key}` : key;
}

/** Makes a short, printable rendering of untrusted text for a notice. */
export function quoteForNotice(text: string): string {
  const printable = text.replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]/g, "?");
  return `"${printable.length > 24 ? `${printable.slice(0, 24)}…` : printable}"`;
}

/**
 * Reads the keys of one scope from a query string. Unknown keys of the scope, repeated keys,
 * over-long values and a format version other than this one are reported and ignored; keys in
 * `passthrough` belong to the caller and are neither read nor reported.
 */
export function readLinkKeys(search: string, scope: string, keys: readonly LinkKey[], passthrough: readonly string[]): LinkReading {
  const params = new URLSearchParams(search);
  const known = new Map(keys.map((k) => [k.key, k]));
  const values: Record<string, string> = {};
  const notices: string[] = [];
  let system: UnitSystem | undefined;
  const seen = new Set<string>();

  const version = params.get("v");
  if (version !== null && version !== String(PERMALINK_VERSION) && scope === "") {
    notices.push(
      `This link says format version ${quoteForNotice(version)}; this page reads version ${PERMALINK_VERSION}. Values were read where they made sense; check them.`,
    );
  }
  for (const [fullKey, value] of params) {
    if (fullKey === "v") continue;
    const dot = fullKey.indexOf(".");
    // Stryker disable next-line EqualityOperator: equivalent, a dot at 0 leaves the empty scope either way
    const keyScope = dot >= 0 ? fullKey.slice(0, dot) : "";
    if (keyScope !== scope) continue;
    const key = fullKey.slice(dot + 1); // the whole key when it has no dot (dot is -1)
    if (seen.has(key)) {
      notices.push(`The link sets ${quoteForNotice(fullKey)} more than once; the first value was used.`);
      continue;
    }
    seen.add(key);
    if (passthrough.includes(key)) continue;
    if (key === "u") {
      if (value === "metric" || value === "us") system = value;
      else notices.push(`Unknown unit system ${quoteForNotice(value)} in the link (use "metric" or "us"); kept the current one.`);
      continue;
    }
    const spec = known.get(key);
    if (spec === undefined) {
      notices.push(`The link has a parameter ${quoteForNotice(fullKey)} that this calculator does not use; it was ignored.`);
      continue;
    }
    if (value.length > spec.maxLength) {
      notices.push(`The link's value for ${spec.label} is longer than ${spec.maxLength} characters; it was ignored.`);
      continue;
    }
    values[key] = value;
  }
  return { values, system, notices };
}

/**
 * Writes one scope's keys into a query string (without "?"): the format version, the unit system
 * and `values` by key, keeping every other scope's keys found in `existing`. Keys come out in a
 * stable order, "v" first, with "/", ",", ";", ":" and "~" left readable.
 */
export function writeLinkKeys(existing: string, scope: string, system: UnitSystem, values: Readonly<Record<string, string>>): string {
  const params = new URLSearchParams(existing);
  for (const key of [...params.keys()]) {
    const dot = key.indexOf(".");
    // "v" is in no scope but the main one's; it is deleted below whatever the scope.
    // Stryker disable next-line EqualityOperator: equivalent, a dot at 0 leaves the empty scope either way
    if ((dot >= 0 ? key.slice(0, dot) : "") === scope) params.delete(key);
  }
  params.delete("v");
  params.set(scoped(scope, "u"), system);
  for (const [key, value] of Object.entries(values)) params.set(scoped(scope, key), value);
  params.sort();
  return `v=${PERMALINK_VERSION}&${params.toString()}`
    .replace(/%2F/gi, "/")
    .replace(/%2C/gi, ",")
    .replace(/%3B/gi, ";")
    .replace(/%3A/gi, ":")
    .replace(/%7E/gi, "~");
}
