/**
 * The spin-up page's own link keys: its comparison variants ("variants", "b.", "c.", "d.") and its
 * sweep ("s."), read and written beside the design's keys (calc/drivetrain/spin-up-form.ts).
 */
import { fieldUnit } from "../core/inputs.ts";
import { MAX_VALUE_LENGTH, quoteForNotice } from "../core/permalink.ts";
import { quantityToText, type UnitSystem } from "../core/units.ts";
import { type DrivetrainParameter, drivetrainInputs } from "./inputs.ts";
import { applies } from "./spin-up-form.ts";

/** Link scopes of the comparison variants, in order (the design itself is A). */
export const VARIANT_SCOPES = ["b", "c", "d"] as const;
/** Link key of the number of variants. */
export const VARIANTS_KEY = "variants";
/** Link scope of the sweep settings. */
export const SWEEP_SCOPE = "s";

/** Inputs the sweep offers, in menu order (the spinner-only ones only for a spinner). */
export const SWEEPABLE: readonly DrivetrainParameter[] = [
  "gearRatio",
  "cellCount",
  "currentLimit",
  "motorKv",
  "motorCount",
  "motorResistance",
  "throttle",
  "cellResistance",
  "inertia",
  "wheelRadius",
  "wheelOffset",
  "weightShare",
  "staticFriction",
];

/** The page's comparison and sweep as text, the way its fields hold them. */
export interface SpinUpViewText {
  /** Each variant's changed inputs: field text by input name. */
  variants: Record<string, string>[];
  /** The sweep when one is shown: the input swept (its name), the range as field text, the point count. */
  sweep: { parameter: DrivetrainParameter; from: string; to: string; points: string } | null;
}

/** The page's comparison and sweep as values, for links in prose. */
export interface SpinUpView {
  variants?: Partial<Record<DrivetrainParameter, number>>[];
  sweep?: { parameter: DrivetrainParameter; from: number; to: number; points: number };
}

/** The link keys of a comparison and a sweep (merged with the design's keys by the caller). */
export function spinUpViewKeys(view: SpinUpViewText, driveType: string): Record<string, string> {
  const out: Record<string, string> = {};
  if (view.variants.length > 0) out[VARIANTS_KEY] = String(view.variants.length);
  view.variants.forEach((changed, i) => {
    for (const [name, text] of Object.entries(changed)) {
      const spec = drivetrainInputs[name as DrivetrainParameter];
      if (spec && applies(name, driveType)) out[`${VARIANT_SCOPES[i]}.${spec.urlKey}`] = text.replace(/\s/g, "");
    }
  });
  if (view.sweep) {
    out[`${SWEEP_SCOPE}.p`] = drivetrainInputs[view.sweep.parameter].urlKey;
    out[`${SWEEP_SCOPE}.from`] = view.sweep.from.replace(/\s/g, "");
    out[`${SWEEP_SCOPE}.to`] = view.sweep.to.replace(/\s/g, "");
    out[`${SWEEP_SCOPE}.n`] = view.sweep.points.replace(/\s/g, "");
  }
  return out;
}

/** The text of a comparison and a sweep given in values (each number exactly, in its field's unit). */
export function spinUpViewText(view: SpinUpView, system: UnitSystem): SpinUpViewText {
  const text = (name: DrivetrainParameter, value: number) => quantityToText(value, fieldUnit(drivetrainInputs[name], system));
  return {
    variants: (view.variants ?? []).map((changed) =>
      Object.fromEntries(Object.entries(changed).map(([name, value]) => [name, text(name as DrivetrainParameter, value as number)])),
    ),
    sweep: view.sweep
      ? {
          parameter: view.sweep.parameter,
          from: text(view.sweep.parameter, view.sweep.from),
          to: text(view.sweep.parameter, view.sweep.to),
          points: String(view.sweep.points),
        }
      : null,
  };
}

/**
 * Reads the comparison variants and the sweep from a link: field text as written, and a notice for
 * everything ignored (an unknown scope or key, a repeated key, a count out of range, a sweep of an
 * input that cannot be swept for the drive type). Never throws.
 */
export function readSpinUpView(search: string, driveType: string): { view: SpinUpViewText; notices: string[] } {
  const params = new URLSearchParams(search);
  const notices: string[] = [];
  const byKey = new Map<string, DrivetrainParameter>();
  for (const [name, spec] of Object.entries(drivetrainInputs)) byKey.set(spec.urlKey, name as DrivetrainParameter);
  const scoped = new Map<string, Map<string, string>>();
  let count = 0;
  const counts = params.getAll(VARIANTS_KEY);
  if (counts.length > 1) notices.push(`The link sets ${quoteForNotice(VARIANTS_KEY)} more than once; the first value was used.`);
  if (counts[0] !== undefined) {
    if (/^[0-3]$/.test(counts[0])) count = Number(counts[0]);
    else notices.push(`The link's number of variants ${quoteForNotice(counts[0])} is not 0 to 3; it was ignored.`);
  }
  for (const [key, value] of params) {
    const dot = key.indexOf(".");
    if (dot < 0) continue;
    const scope = key.slice(0, dot);
    const name = key.slice(dot + 1);
    if (!(VARIANT_SCOPES as readonly string[]).includes(scope) && scope !== SWEEP_SCOPE) {
      if (!scoped.has(scope))
        notices.push(`The link has parameters for ${quoteForNotice(`${scope}.`)}, which this calculator does not use; they were ignored.`);
      scoped.set(scope, new Map());
      continue;
    }
    const given = scoped.get(scope) ?? new Map<string, string>();
    scoped.set(scope, given);
    if (given.has(name)) notices.push(`The link sets ${quoteForNotice(key)} more than once; the first value was used.`);
    else if (value.length > MAX_VALUE_LENGTH)
      notices.push(`The link's value for ${quoteForNotice(key)} is longer than ${MAX_VALUE_LENGTH} characters; it was ignored.`);
    else given.set(name, value);
  }
  const variants: Record<string, string>[] = [];
  VARIANT_SCOPES.forEach((scope, i) => {
    if (scoped.has(scope)) count = Math.max(count, i + 1);
  });
  for (let i = 0; i < count; i++) {
    const changed: Record<string, string> = {};
    for (const [key, value] of scoped.get(VARIANT_SCOPES[i]!) ?? []) {
      const name = byKey.get(key);
      if (name !== undefined) changed[name] = value;
      // A variant's unit system ("u", which no input uses as its key) is passed over quietly.
      else if (key !== "u")
        notices.push(`The link has a parameter ${quoteForNotice(`${VARIANT_SCOPES[i]}.${key}`)} that this calculator does not use; it was ignored.`);
    }
    variants.push(changed);
  }
  let sweep: SpinUpViewText["sweep"] = null;
  const s = scoped.get(SWEEP_SCOPE);
  if (s && s.size > 0) {
    for (const key of s.keys()) {
      if (!["p", "from", "to", "n"].includes(key))
        notices.push(`The link has a parameter ${quoteForNotice(`${SWEEP_SCOPE}.${key}`)} that this calculator does not use; it was ignored.`);
    }
    const key = s.get("p");
    const name = SWEEPABLE.find((n) => drivetrainInputs[n].urlKey === key);
    if (!name || !applies(name, driveType)) {
      notices.push(
        key === undefined
          ? "The link has sweep settings but no input to sweep (s.p); they were ignored."
          : `The link asks to sweep ${quoteForNotice(key)}, which this calculator cannot sweep for this drive type; the sweep was left off.`,
      );
    } else sweep = { parameter: name, from: s.get("from") ?? "", to: s.get("to") ?? "", points: s.get("n") ?? "" };
  }
  return { view: { variants, sweep }, notices };
}
