/**
 * Search ranking for the calculators' fields, and the word test for pages. Whole words only: a
 * query matches a field when every one of its words is a word of the field's label, names or
 * help (a word's start counts from three letters on: "counterw" finds "counterweight"), so a
 * nonsense word matches nothing. Exact labels and symbols (the field's names in code and links)
 * come first.
 */
import type { SearchEntry } from "./entries.ts";

/** Lower-case words of a text: letters and digits, with camelCase names split ("motorKv" → motor, kv). */
export function words(text: string): string[] {
  return text
    .replace(/([a-z0-9])([A-Z])/g, "$1 $2")
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean);
}

/** Whether every query word is a word of `candidates`, or (from three letters on) the start of one. */
function allFound(query: string[], candidates: string[], prefix: boolean): boolean {
  return query.every((q) => candidates.some((w) => w === q || (prefix && q.length >= 3 && w.startsWith(q))));
}

/** How well a field matches a query; 0 when it does not. */
export function fieldScore(entry: SearchEntry, query: string): number {
  const q = words(query);
  if (q.length === 0) return 0;
  const label = words(entry.label);
  const compact = q.join("");
  if (label.join(" ") === q.join(" ")) return 100;
  if (entry.keys.some((k) => k.toLowerCase() === compact)) return 90;
  // Shorter labels first ("Tip speed" before "Tip speed at the bite"); among labels of one length,
  // the field whose name in code says it too ("Counterweight mass", counterweightMass).
  if (allFound(q, label, false)) return 80 - Math.min(label.length - q.length, 9) + (allFound(q, entry.keys.flatMap(words), false) ? 0.5 : 0);
  if (entry.unit.split(", ").some((u) => u.toLowerCase() === query.trim().toLowerCase())) return 65;
  if (allFound(q, entry.keys.flatMap(words), false)) return 60;
  if (allFound(q, label, true)) return 50;
  const all = [...label, ...entry.keys.flatMap(words), ...words(entry.help)];
  if (allFound(q, all, false)) return 30;
  if (allFound(q, all, true)) return 20;
  return 0;
}

/** Scores from here up are exact: the label, a symbol, or every word of the label. */
export const STRONG_MATCH = 60;

/** The fields that match, best first (ties keep the registry's order). */
export function rankFields(entries: readonly SearchEntry[], query: string): { entry: SearchEntry; score: number }[] {
  return entries
    .map((entry, index) => ({ entry, score: fieldScore(entry, query), index }))
    .filter((hit) => hit.score > 0)
    .sort((a, b) => b.score - a.score || a.index - b.index)
    .map(({ entry, score }) => ({ entry, score }));
}

/** Whether a page's text holds every word of the query (as a word, or the start of one from three letters on). */
export function textMatches(text: string, query: string): boolean {
  return holdsAll(new Set(words(text)), query);
}

/** The same test on a page's words read once (`new Set(words(text))`), for searching many times. */
export function holdsAll(pageWords: ReadonlySet<string>, query: string): boolean {
  const q = words(query);
  return q.length > 0 && q.every((t) => pageWords.has(t) || (t.length >= 3 && [...pageWords].some((w) => w.startsWith(t))));
}

/** A piece of an excerpt: text, and whether it is a word of the query. */
export interface ExcerptPart {
  text: string;
  marked: boolean;
}

/**
 * A short excerpt of `text` around the first word of the query it holds, with the query's words
 * marked (as words, or the start of one from three letters on); the whole start of the text when it
 * holds none. About `length` words long, with "…" where it cuts the text.
 */
export function excerptParts(text: string, query: string, length = 36): ExcerptPart[] {
  const q = words(query);
  const isMatch = (word: string) => {
    const w = words(word).join("");
    return w !== "" && q.some((t) => w === t || (t.length >= 3 && w.startsWith(t)));
  };
  const tokens = text.split(/(\s+)/).filter(Boolean);
  const wordAt: number[] = [];
  tokens.forEach((t, i) => {
    if (!/^\s+$/.test(t)) wordAt.push(i);
  });
  const first = wordAt.findIndex((i) => isMatch(tokens[i]!));
  // From the start when the first match fits in the excerpt with a few words after it; else from a
  // third of the excerpt before it.
  const from = first < 0 || first < length - 6 ? 0 : first - Math.floor(length / 3);
  const to = Math.min(wordAt.length, from + length);
  const parts: ExcerptPart[] = [];
  const push = (t: string, marked: boolean) => {
    const last = parts[parts.length - 1];
    if (last && last.marked === marked) last.text += t;
    else parts.push({ text: t, marked });
  };
  if (from > 0) push("… ", false);
  for (let w = from; w < to; w += 1) {
    const token = tokens[wordAt[w]!]!;
    // A word's punctuation stays unmarked: "(Kv)" marks "Kv" only.
    const m = /^([^\p{L}\p{N}]*)(.*?)([^\p{L}\p{N}]*)$/u.exec(token)!;
    if (m[2] && isMatch(m[2])) {
      if (m[1]) push(m[1], false);
      push(m[2], true);
      if (m[3]) push(m[3], false);
    } else push(token, false);
    if (w < to - 1) push(" ", false);
  }
  if (to < wordAt.length) push(" …", false);
  return parts;
}
