/**
 * Every doc comment's example runs: a line `call(…) // → value` under `@example` in calc/ is
 * evaluated against the public API (calc/index.ts) and its result compared with the value written
 * there, to the precision the value is printed with (a number to its significant figures; an object
 * field by field; null, true and false exactly). An example whose value is prose ("1.16 m/s, but …")
 * is counted, and that count may not grow: write new examples as checkable values.
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import * as api from "../../calc/index.ts";

const root = fileURLToPath(new URL("../../calc/", import.meta.url));

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : name.endsWith(".ts") ? [path] : [];
  });
}

interface Example {
  where: string;
  /** Statements the example needs first ("const ode = new DormandPrince45(1);"). */
  setup: string;
  code: string;
  expected: string;
}

/** The `call // → value` pairs of every `@example` block in calc/. */
function examples(): Example[] {
  const out: Example[] = [];
  for (const file of files(root)) {
    const text = readFileSync(file, "utf8");
    for (const block of text.matchAll(/\/\*\*([\s\S]*?)\*\//g)) {
      const lines = block[1]!.split("\n").map((l) => l.replace(/^\s*\* ?/, ""));
      const start = lines.findIndex((l) => l.trim().startsWith("@example"));
      if (start < 0) continue;
      let pending = "";
      for (const line of lines.slice(start + 1)) {
        if (/^\s*(@|Sources?:|Assumptions)/.test(line)) break;
        pending += ` ${line.trim()}`;
        if (!pending.includes("// →")) continue;
        // One line may hold two examples ("a(1) // → 2; a(3) // → 4"); a statement before an example
        // ("const ode = …;") is its set-up.
        let setup = "";
        for (const piece of pending.split(/;\s+(?=[A-Za-z_$][\w$.]*[\s(.])/)) {
          const [code, expected] = piece.split("// →").map((s) => s.trim());
          if (expected === undefined) setup += `${code};`;
          else if (code) out.push({ where: `${relative(root, file)}: ${code.slice(0, 60)}`, code, expected, setup });
        }
        pending = "";
      }
    }
  }
  return out;
}

const NUMBER = /^[-+]?(?:\d{1,3}(?:[\u202f ]\d{3})+|\d+)(?:\.\d+)?(?:e[-+]?\d+)?/i;

/** The largest difference a printed number allows: half a unit of its last printed digit, plus a margin for binary rounding. */
function allowance(printed: string): number {
  const [mantissa, exponent = "0"] = printed
    .replace(/[\s\u202f]/g, "")
    .toLowerCase()
    .split("e");
  const decimals = mantissa!.includes(".") ? mantissa!.split(".")[1]!.length : 0;
  return 0.5 * 10 ** (Number(exponent) - decimals) * (1 + 1e-9) + 1e-15;
}

type Check =
  | { kind: "number"; value: number; tolerance: number }
  | { kind: "exact"; value: unknown }
  | { kind: "fields"; fields: [string, Check][] }
  | { kind: "skip" }
  | { kind: "prose" };

/** Reads one printed value at `text[at]`: a number, a string, null/true/false, "…" (not checked) or an object of such values. */
function readValue(text: string, at: number): { check: Check; end: number } | null {
  const rest = text.slice(at);
  const space = rest.length - rest.trimStart().length;
  const start = at + space;
  const here = text.slice(start);
  if (here.startsWith("…")) return { check: { kind: "skip" }, end: start + 1 };
  const word = /^(null|true|false)\b/.exec(here);
  if (word) return { check: { kind: "exact", value: JSON.parse(word[1]!) }, end: start + word[0].length };
  const string = /^"([^"]*)"/.exec(here);
  if (string) return { check: { kind: "exact", value: string[1] }, end: start + string[0].length };
  const number = NUMBER.exec(here);
  if (number) {
    const printed = number[0].trimEnd();
    return { check: { kind: "number", value: Number(printed.replace(/[\s\u202f]/g, "")), tolerance: allowance(printed) }, end: start + printed.length };
  }
  if (!here.startsWith("{")) return null;
  const fields: [string, Check][] = [];
  let i = start + 1;
  for (;;) {
    while (/\s|,/.test(text[i] ?? "")) i++;
    if (text[i] === "}") return { check: { kind: "fields", fields }, end: i + 1 };
    if (text[i] === "…") {
      i++;
      continue;
    }
    const key = /^([A-Za-z_]\w*):/.exec(text.slice(i));
    if (!key) return null;
    const value = readValue(text, i + key[0].length);
    if (!value) return null;
    fields.push([key[1]!, value.check]);
    i = value.end;
  }
}

function parseExpected(raw: string): Check {
  const text = raw.replace(/−/g, "-").trim();
  const read = readValue(text, 0);
  if (!read || read.check.kind === "skip") return { kind: "prose" };
  const rest = text.slice(read.end).trim();
  // After the value: nothing, a note or unit in brackets, ": a remark", or (after a number) a unit.
  if (rest === "" || /^[([:;]/.test(rest)) return read.check;
  if (read.check.kind === "number" && /^[A-Za-z°%µ/·²³]+(\s*[(,;:]|$)/.test(rest)) return read.check;
  return { kind: "prose" };
}

function check(actual: unknown, expected: Check, path: string): void {
  if (expected.kind === "number") {
    expect(typeof actual, path).toBe("number");
    expect(Math.abs((actual as number) - expected.value), `${path}: ${actual} vs ${expected.value}`).toBeLessThanOrEqual(expected.tolerance);
  } else if (expected.kind === "exact") {
    expect(actual, path).toBe(expected.value);
  } else if (expected.kind === "fields") {
    expect(actual, path).toBeTypeOf("object");
    for (const [key, inner] of expected.fields) check((actual as Record<string, unknown>)[key], inner, `${path}.${key}`);
  }
}

const scope = api as unknown as Record<string, unknown>;
const names = Object.keys(scope);
const all = examples();
const checkable = all.map((e) => ({ ...e, check: parseExpected(e.expected) })).filter((e) => e.check.kind !== "prose");

describe("doc-comment examples", () => {
  it("finds the examples", () => {
    expect(all.length).toBeGreaterThanOrEqual(80);
  });

  it.each(checkable.map((e) => [e.where, e] as const))("%s", (_, e) => {
    const run = new Function(...names, `${e.setup} return (${e.code});`) as (...args: unknown[]) => unknown;
    check(run(...names.map((n) => scope[n])), e.check, e.code);
  });

  it("keeps prose-only examples from growing (write new ones as checkable values)", () => {
    const prose = all.filter((e) => parseExpected(e.expected).kind === "prose");
    expect(prose.length, prose.map((e) => `${e.where} // → ${e.expected}`).join("\n")).toBeLessThanOrEqual(PROSE_EXAMPLES);
  });

  it("keeps the older sentence-style examples ('Example: 3000 rpm … 0.314 rad') from growing: new ones go under @example", () => {
    const sentences = files(root).flatMap((file) =>
      readFileSync(file, "utf8")
        .split("\n")
        .filter((line) => /^\s*\*.*\bExample\b/.test(line))
        .map((line) => `${relative(root, file)}: ${line.trim()}`),
    );
    expect(sentences.length, sentences.join("\n")).toBeLessThanOrEqual(SENTENCE_EXAMPLES);
  });
});

/** Examples under @example whose value is written as prose. */
const PROSE_EXAMPLES = 0;
/** Doc comments whose example is still a sentence ("Example: …", "Example (invented): …"), not run; convert them to @example lines. */
const SENTENCE_EXAMPLES = 13;
