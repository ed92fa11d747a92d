/**
 * Provenance that stands on its own: every value in the project names its published source (book,
 * edition and table, standard and clause, NIST, or "common practice" / "from memory"), never a
 * working note kept outside the repository. This walks the project's own text and fails on any
 * locator that points outside it or on a status label copied from such a note.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("../../", import.meta.url));
const FOLDERS = ["tests", "calc", "components", "content", "scripts"];

// Built from parts so that this file does not match itself.
const BANNED = [
  ["references", ".md"],
  ["references", " §"],
  ["shared", "/references"],
  ["CONFIR", "MED"],
  ["COMPU", "TED"],
].map((parts) => parts.join(""));

function filesUnder(folder: string): string[] {
  const dir = join(root, folder);
  return (readdirSync(dir, { recursive: true }) as string[])
    .map((name) => join(dir, name))
    .filter((path) => statSync(path).isFile())
    .sort();
}

const FILES = FOLDERS.flatMap(filesUnder);

describe("provenance stands on its own", () => {
  it("walks a real tree: source, test and chapter files are all found", () => {
    expect(FILES.length).toBeGreaterThan(100);
    expect(FILES.some((f) => f.endsWith("provenance.test.ts"))).toBe(true);
  });

  it.each(BANNED)("no file in tests/, calc/, components/, content/ or scripts/ contains %j", (banned) => {
    const offenders: string[] = [];
    for (const file of FILES) {
      const text = readFileSync(file, "utf8");
      text.split("\n").forEach((line, i) => {
        if (line.includes(banned)) offenders.push(`${relative(root, file)}:${i + 1}: ${line.trim()}`);
      });
    }
    expect(offenders).toEqual([]);
  });
});
