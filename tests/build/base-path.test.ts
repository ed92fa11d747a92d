/**
 * Hosting under a sub-path: a build with BASE=/handbook/ points every link, stylesheet, font,
 * island and the offline cache at /handbook/, so the site works from any folder of a static host.
 */
import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { precachedFiles } from "../../scripts/site/precache.mjs";

const root = fileURLToPath(new URL("../../", import.meta.url));
const out = join(mkdtempSync(join(tmpdir(), "whirlbook-base-")), "site");

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(join(dir, e.name)) : [join(dir, e.name)]));
}

describe("a build under a sub-path (BASE=/handbook/)", () => {
  it("builds, and every root-absolute reference starts with /handbook/", { timeout: 180_000 }, () => {
    const build = spawnSync(process.execPath, [join(root, "node_modules/astro/bin/astro.mjs"), "build", "--silent"], {
      cwd: root,
      // A clean environment: the test runner sets variables (NODE_ENV, BASE_URL, …) meant for itself.
      env: { PATH: process.env.PATH ?? "", HOME: process.env.HOME ?? "", BASE: "/handbook/", OUT_DIR: out },
      encoding: "utf8",
    });
    expect(build.status, build.stderr).toBe(0);
    const wrong: string[] = [];
    for (const file of walk(out).filter((f) => f.endsWith(".html"))) {
      const html = readFileSync(file, "utf8");
      for (const m of html.matchAll(/\b(?:href|src|component-url|renderer-url)="(\/[^"]*)"/g)) {
        if (!m[1]!.startsWith("/handbook/")) wrong.push(`${file.slice(out.length)}: ${m[1]}`);
      }
    }
    expect(wrong).toEqual([]);
    const css = walk(out)
      .filter((f) => f.endsWith(".css"))
      .map((f) => readFileSync(f, "utf8"))
      .join("\n");
    for (const m of css.matchAll(/url\((\/[^)]*)\)/g)) expect(m[1]).toMatch(/^\/handbook\/_astro\//);
    expect(readFileSync(join(out, "sw.js"), "utf8")).toContain('const BASE = "/handbook/";');
    // The offline cache lists files under the base, every one of them built, and only the fonts in use.
    const precached = precachedFiles(out, "/handbook/");
    expect(precached.filter((f) => !existsSync(join(out, f)))).toEqual([]);
    expect(precached.filter((f) => f.endsWith(".woff2")).length).toBe(1);
  });
});
