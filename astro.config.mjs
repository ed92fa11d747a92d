// @ts-check
import { defineConfig } from "astro/config";
import mdx from "@astrojs/mdx";
import preact from "@astrojs/preact";
import { unified } from "@astrojs/markdown-remark";
import remarkMath from "remark-math";
import rehypeKatex from "rehype-katex";
import { rehypeBaseLinks } from "./scripts/site/rehype-base-links.mjs";
import { rehypeScrollableMath } from "./scripts/site/rehype-scrollable-math.mjs";
import { katexWoff2Only } from "./scripts/site/katex-woff2-only.mjs";
import { katexFontPreload } from "./scripts/site/katex-fonts.mjs";
import { contentSecurityPolicyPlugin } from "./scripts/site/content-security-policy.mjs";
import { offlineAndSearch } from "./scripts/site/offline-and-search.mjs";
import { precompressPlugin } from "./scripts/site/precompress.mjs";

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
  build: { format: "directory", inlineStylesheets: "never" },
  // The build:done steps run in this order: font preloads (HTML), the security policy (hashes the
  // final HTML's inline scripts), search index and offline cache (versioned by the final files),
  // then the compressed copies of everything.
  integrations: [preact(), mdx(), katexFontPreload(), contentSecurityPolicyPlugin(), offlineAndSearch(), precompressPlugin()],
  markdown: {
    processor: unified({
      remarkPlugins: [remarkMath],
      rehypePlugins: [[rehypeKatex, { strict: "error", throwOnError: true, output: "html" }], rehypeScrollableMath, [rehypeBaseLinks, { base }]],
    }),
  },
  devToolbar: { enabled: false },
  vite: {
    plugins: [
      katexWoff2Only(),
      {
        // Pages list their calculator's chunks as <link rel="modulepreload"> at build time
        // (scripts/site/modulepreload.mjs), so the bundler's run-time preload helper is not needed.
        name: "whirlbook:no-preload-helper",
        configEnvironment: (name) => (name === "client" ? { build: { modulePreload: false } } : undefined),
      },
    ],
    build: {
      assetsInlineLimit: 0,
      sourcemap: process.env.SOURCEMAP === "1",
      rolldownOptions: {
        output: {
          // Every calculator page needs the same runtime (Preact, reactive state, units, the shared
          // calculator parts): one chunk for it compresses better than nine small ones.
          codeSplitting: {
            groups: [
              {
                name: "runtime",
                test: /node_modules[\\/](preact|d3-array)[\\/]|calc[\\/]core[\\/](units|inputs|errors|constants|check|calculator|permalink|choices|spec-check)\.ts|components[\\/]calc-ui[\\/]/,
              },
            ],
          },
        },
      },
    },
  },
});
