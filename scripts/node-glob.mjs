// A Node module hook that expands `import.meta.glob("./dir/*.ts", { eager: true })` the way the
// bundler does, so calc/ modules that find their siblings by file name (calc/design/registry.ts)
// also run under plain Node: the command line, scripts and benchmarks. A single `*` in the file name
// is supported, which is all calc/ uses; without `eager: true` each entry is a function that imports
// the module; `import: "name"` takes that export of each module, and `query` (a bundler-only module
// id, for chunking) is ignored.
// Usage: `import { register } from "node:module"; register("./node-glob.mjs", import.meta.url);`
// or `node --import ./scripts/node-glob-register.mjs …`.
import { readdirSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";
import { dirname, join } from "node:path";

const GLOB = /import\.meta\.glob(?:<[^>]*>)?\(\s*(["'])([^"']+)\1\s*,\s*\{\s*((?:(?:eager:\s*true|(?:import|query):\s*"[^"]*")\s*,?\s*)*)\}\s*\)/g;

export async function load(url, context, nextLoad) {
  const result = await nextLoad(url, context);
  if (!url.startsWith("file:") || !/\.(ts|mts|js|mjs)$/.test(url)) return result;
  const source = String(result.source ?? "");
  if (!source.includes("import.meta.glob")) return result;
  const here = dirname(fileURLToPath(url));
  const imports = [];
  const expanded = source.replace(GLOB, (_, _q, pattern, options) => {
    const name = /import:\s*"([^"]*)"/.exec(options)?.[1];
    const eager = /eager:\s*true/.test(options);
    const star = pattern.lastIndexOf("*");
    if (star < 0 || pattern.indexOf("*") !== star || pattern.slice(0, star).includes("*")) throw new Error(`node-glob: unsupported pattern ${pattern}`);
    const dir = pattern.slice(0, pattern.lastIndexOf("/", star) + 1);
    const prefix = pattern.slice(dir.length, star);
    const suffix = pattern.slice(star + 1);
    const names = readdirSync(join(here, dir))
      .filter((name) => name.startsWith(prefix) && name.endsWith(suffix) && name.length >= prefix.length + suffix.length)
      .sort();
    const entries = names.map((file) => {
      const href = JSON.stringify(pathToFileURL(join(here, dir, file)).href);
      const pick = (m) => (name ? `${m}[${JSON.stringify(name)}]` : m);
      if (!eager) return `${JSON.stringify(dir + file)}: () => import(${href}).then((m) => ${pick("m")})`;
      const id = `__glob_${imports.length}`;
      imports.push(`import * as ${id} from ${href};`);
      return `${JSON.stringify(dir + file)}: ${pick(id)}`;
    });
    return `{ ${entries.join(", ")} }`;
  });
  return { ...result, source: `${imports.join("\n")}\n${expanded}` };
}
