/**
 * How a bibliography entry reads on a chapter page: its parts as sentences (a part that already ends
 * in a full stop, as "et al." does, gets no second one), and the subscripts its plain text writes as
 * "a_c", "R_p0.2,min" or "y_{t−1}" split out so the page can set them as real subscripts.
 * Pure functions for SourceList.astro; nothing reaches the browser.
 */
import type { Source } from "../../calc/sources/types.ts";

/** A run of text, set as a subscript or not. */
export interface TextRun {
  text: string;
  sub: boolean;
}

/**
 * A subscript in plain text: "_" after a letter, digit, prime or closing bracket, then either a
 * braced group ("y_{t−1}") or letters and digits, which may be joined by "." or "," ("R_p0.2,min").
 */
const SUBSCRIPT = /(?<=[\p{L}\p{N}'′)])_(?:\{([^}]*)\}|([\p{L}\p{N}]+(?:[.,][\p{L}\p{N}]+)*))/gu;

/** Splits plain text into runs, the subscripts written "x_y" or "x_{…}" apart: "a_c = rω²" → "a", "c" (sub), " = rω²". */
export function subscriptRuns(text: string): TextRun[] {
  const runs: TextRun[] = [];
  let at = 0;
  for (const match of text.matchAll(SUBSCRIPT)) {
    if (match.index > at) runs.push({ text: text.slice(at, match.index), sub: false });
    runs.push({ text: match[1] ?? match[2]!, sub: true });
    at = match.index + match[0].length;
  }
  if (at < text.length || runs.length === 0) runs.push({ text: text.slice(at), sub: false });
  return runs;
}

/** The text with a closing full stop, unless it already ends in one (or in "?" or "!"). */
export function asSentence(text: string): string {
  return /[.?!]$/.test(text.trimEnd()) ? text.trimEnd() : `${text.trimEnd()}.`;
}

/**
 * An entry's three parts as the list shows them: "Author.", "Title." and "Publication, locator.";
 * the last also split where the locator starts (`rest` is `publication` + `locator`), so the page can
 * keep the locator out of the search index.
 */
export function sourceSentences(source: Source): { author: string; title: string; rest: string; publication: string; locator: string } {
  const publication = source.locator ? `${source.publication}, ` : asSentence(source.publication);
  const locator = source.locator ? asSentence(source.locator) : "";
  return { author: asSentence(source.author), title: asSentence(source.title), rest: publication + locator, publication, locator };
}
