// One module script per calculator. The client build emits an entry chunk for every widget in
// components/calculators/ (the widget plus the call that hydrates it); after the build, each page
// gets the scripts of the calculators it shows, with <link rel="modulepreload"> for every chunk
// those scripts import, so a page downloads only its own calculators and fetches their chunks in
// one round trip instead of finding them one import at a time. The development server has no build
// output to point at: there, every page loads components/calc-ui/islands.ts, which finds widgets
// by file name at run time.
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { kindsNamed, sourceGraph } from "./unit-kinds.mjs";

const PREFIX = "whirlbook-island:";
const UNITS_PREFIX = "whirlbook-units:";
const widgetsDir = fileURLToPath(new URL("../../components/calculators/", import.meta.url));
const hydrateModule = fileURLToPath(new URL("../../components/calc-ui/hydrate.ts", import.meta.url));
const devLoader = fileURLToPath(new URL("../../components/calc-ui/islands.ts", import.meta.url));
const unitsModule = fileURLToPath(new URL("../../calc/core/units.ts", import.meta.url));
const unitTableModule = new URL("../../calc/core/unit-table.ts", import.meta.url);

/** The widget names: the file names in components/calculators/. */
export const widgetNames = () =>
  readdirSync(widgetsDir)
    .filter((f) => f.endsWith(".tsx"))
    .map((f) => f.slice(0, -".tsx".length))
    .sort();

/** The HTML files under a folder. */
const htmlFiles = (dir) =>
  readdirSync(dir, { recursive: true })
    .filter((f) => String(f).endsWith(".html"))
    .map((f) => join(dir, String(f)));

export function islandEntries() {
  /** Widget name → its entry's file and the chunks it imports (all paths under the build's output). */
  const built = new Map();
  let base = "/";

  /** @type {import("vite").Plugin} */
  const plugin = {
    name: "whirlbook:island-entries",
    apply: "build",
    applyToEnvironment: (environment) => environment.name === "client",
    buildStart() {
      for (const name of widgetNames()) this.emitFile({ type: "chunk", id: PREFIX + name, name: `island-${name}` });
    },
    resolveId: (id) => (id.startsWith(PREFIX) || id.startsWith(UNITS_PREFIX) ? `\0${id}` : null),
    async load(id) {
      if (id.startsWith(`\0${UNITS_PREFIX}`)) {
        // The unit tables of the kinds the widget's code names, registered before the widget's
        // modules run (this module is the entry's first import).
        const { UNITS, unitTables } = await import(pathToFileURL(fileURLToPath(unitTableModule)).href);
        const widget = join(widgetsDir, `${id.slice(UNITS_PREFIX.length + 1)}.tsx`);
        const tables = unitTables(kindsNamed(sourceGraph(widget), UNITS));
        return `import { useUnits } from ${JSON.stringify(unitsModule)};\nuseUnits(${JSON.stringify(tables)});`;
      }
      if (!id.startsWith(`\0${PREFIX}`)) return null;
      const name = id.slice(PREFIX.length + 1);
      return [
        `import ${JSON.stringify(UNITS_PREFIX + name)};`,
        `import widget from ${JSON.stringify(join(widgetsDir, `${name}.tsx`))};`,
        `import { hydrateIslands } from ${JSON.stringify(hydrateModule)};`,
        `hydrateIslands(${JSON.stringify(name)}, widget);`,
      ].join("\n");
    },
    generateBundle(_options, bundle) {
      const chunks = new Map(
        Object.values(bundle)
          .filter((c) => c.type === "chunk")
          .map((c) => [c.fileName, c]),
      );
      const closure = (file, seen = new Set()) => {
        for (const imported of chunks.get(file)?.imports ?? []) if (!seen.has(imported)) closure(imported, seen.add(imported));
        return seen;
      };
      for (const chunk of chunks.values()) {
        if (!chunk.isEntry || !chunk.facadeModuleId?.startsWith(`\0${PREFIX}`)) continue;
        built.set(chunk.facadeModuleId.slice(PREFIX.length + 1), { file: chunk.fileName, imports: [...closure(chunk.fileName)] });
      }
    },
  };

  return {
    name: "whirlbook:island-entries",
    hooks: {
      "astro:config:setup": ({ command, updateConfig, injectScript }) => {
        if (command === "build") updateConfig({ vite: { plugins: [plugin] } });
        else injectScript("page", `import ${JSON.stringify(devLoader)};`);
      },
      "astro:config:done": ({ config }) => {
        base = config.base.endsWith("/") ? config.base : `${config.base}/`;
      },
      "astro:build:done": ({ dir }) => {
        const out = fileURLToPath(dir);
        for (const file of htmlFiles(out)) {
          const html = readFileSync(file, "utf8");
          const names = [...new Set([...html.matchAll(/\bdata-island="([\w-]+)"/g)].map((m) => m[1]))].filter((name) => built.has(name));
          if (names.length === 0) continue;
          const scripts = names.map((name) => `<script type="module" src="${base}${built.get(name).file}"></script>`);
          const preloads = [...new Set(names.flatMap((name) => built.get(name).imports))].map((chunk) => `<link rel="modulepreload" href="${base}${chunk}">`);
          writeFileSync(file, html.replace("</head>", `${[...preloads, ...scripts].join("")}</head>`));
        }
      },
    },
  };
}
