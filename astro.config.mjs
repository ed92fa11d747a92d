// @ts-check
import { defineConfig } from "astro/config";
import mdx from "@astrojs/mdx";
import preact from "@astrojs/preact";
import { unified } from "@astrojs/markdown-remark";
import remarkMath from "remark-math";
import rehypeKatex from "rehype-katex";
import { rehypeBaseLinks } from "./scripts/site/rehype-base-links.mjs";
import { rehypeMath } from "./scripts/site/rehype-math.mjs";
import { rehypeLazyBlocks } from "./scripts/site/rehype-lazy-blocks.mjs";
import { mathFont } from "./scripts/site/math-font.mjs";
import { contentSecurityPolicyPlugin } from "./scripts/site/content-security-policy.mjs";
import { offlineAndSearch } from "./scripts/site/offline-and-search.mjs";
import { precompressPlugin } from "./scripts/site/precompress.mjs";
import { islandEntries } from "./scripts/site/island-entries.mjs";
import { sheetCopies } from "./scripts/site/sheet-copies.mjs";

/**
 * BASE: the sub-path the site is served under ("/" by default; e.g. BASE=/handbook/ for
 * https://example.org/handbook/). Set it at build time.
 */
const base = process.env.BASE || "/";
/** OUT_DIR: where the build goes (default ./dist); the tests read the same variable. */
const outDir = process.env.OUT_DIR || "./dist";

export default defineConfig({
  srcDir: ".",
  publicDir: "./public",
  outDir,
  cacheDir: process.env.OUT_DIR ? `${outDir}-cache` : "./node_modules/.astro",
  base,
  trailingSlash: "ignore",
  // A page's own stylesheet under 4 KB (vite.build.assetsInlineLimit) goes into its <head>, so the
  // first paint waits for one stylesheet, the site's, which every page shares from the cache.
  build: { format: "directory", inlineStylesheets: "auto" },
  // The build:done steps run in this order: each page's calculator scripts and their preloads
  // (HTML), font preloads (HTML), the security policy (hashes the final HTML's inline scripts), search index and offline cache (versioned by the final files),
  // then the compressed copies of everything.
  integrations: [preact(), mdx(), islandEntries(), mathFont(), contentSecurityPolicyPlugin(), offlineAndSearch(), precompressPlugin()],
  markdown: {
    // Code blocks stay plain (styled by the site's stylesheet): the highlighter colours them with
    // style attributes, which the security policy does not allow.
    syntaxHighlight: false,
    processor: unified({
      remarkPlugins: [remarkMath],
      rehypePlugins: [[rehypeKatex, { strict: "error", throwOnError: true, output: "mathml" }], rehypeMath, rehypeLazyBlocks, [rehypeBaseLinks, { base }]],
    }),
  },
  devToolbar: { enabled: false },
  vite: {
    plugins: [
      sheetCopies(),
      {
        // With module preloading off, the bundler's helper around each dynamic import() has nothing
        // left to do (it would preload the chunk's dependencies and report failures as an event) but
        // still costs 0.7 KB gzip on every calculator page: use a plain import instead. Guarded by
        // the page-weight test (tests/build/site.test.ts) should the helper's module id change.
        name: "whirlbook:plain-dynamic-import",
        enforce: "pre",
        load: (id) => (id === "\0vite/preload-helper.js" ? "export const __vitePreload = (load) => load();" : null),
      },
      {
        // Pages list their calculators' chunks as <link rel="modulepreload"> at build time
        // (scripts/site/island-entries.mjs), so the bundler's run-time preload helper is not needed.
        name: "whirlbook:no-preload-helper",
        configEnvironment: (name) => (name === "client" ? { build: { modulePreload: false } } : undefined),
      },
    ],
    build: {
      // Astro inlines stylesheets under this size; assets (the math font) are far larger, so none
      // becomes a data: URL, which the security policy would block.
      assetsInlineLimit: 4096,
      sourcemap: process.env.SOURCEMAP === "1",
      // NOMINIFY=1: readable bundles, for reading a CPU profile.
      minify: process.env.NOMINIFY === "1" ? false : undefined,
      rolldownOptions: {
        // calc/ is pure by rule (no DOM, no I/O, nothing runs on import): a calc module a chunk
        // imports but does not use is left out instead of being kept for its "side effects". The one
        // exception, calc/core/all-units.ts, registers every unit table when imported (the build, the
        // build sheet, the development server); calculator pages register their own kinds.
        treeshake: { moduleSideEffects: [{ test: /[\\/]calc[\\/](?!core[\\/]all-units\.ts)[^?]*\.ts(\?.*)?$/, sideEffects: false }] },
        output: {
          // Every calculator page needs the same runtime (Preact, reactive state, units, the shared
          // calculator parts): one chunk for it compresses better than nine small ones. Parts only
          // some pages use (the chart, the form helper) stay out of it, so the others do not carry them.
          codeSplitting: {
            groups: [
              {
                name: "runtime",
                test: /node_modules[\\/]preact[\\/]|calc[\\/]core[\\/](units|inputs|errors|constants|calculator|permalink|choices|spec-check)\.ts|components[\\/]calc-ui[\\/](?!Chart\.tsx|form-parts\.tsx)/,
              },
              // The heading chapters' shared view parts in one chunk rather than two small ones.
              { name: "heading-ui", test: /components[\\/]heading[\\/](ui\.tsx|format\.ts)/ },
              // The heading-timing chapter's two calculators (timing, smoothing) in one chunk: the build sheet
              // loads each one's check on its own, which would otherwise split them in two.
              { name: "timing", test: /calc[\\/]heading[\\/](timing|smoothing)(-inputs)?\.ts$/ },
              // The density table stays a chunk of its own (several calculators read it), ahead of the
              // group below, which would otherwise take it in as a dependency of the shaft check.
              { name: "densities", test: /calc[\\/]materials[\\/]densities\.ts$/ },
              // The shaft check and the strength table only it reads, in one chunk (one request and one
              // compressed stream on the weapon-shaft page instead of two).
              { name: "shaft-check", test: /calc[\\/](weapon[\\/]shaft-check|materials[\\/]strengths)\.ts$/ },
              // The steering simulation's inputs, read by its view and by its worker: a chunk of their own,
              // so the worker (components/steering/simulation-worker.ts) does not load the view. The
              // estimate's inputs they build on stay apart (the steering page and the build sheet load
              // only those), as the group before it keeps them.
              { name: "estimate-inputs", test: /calc[\\/]steering[\\/]estimate-inputs\.ts$/ },
              { name: "steering-inputs", test: /calc[\\/]steering[\\/]inputs\.ts$/ },
            ],
          },
        },
      },
    },
  },
});
