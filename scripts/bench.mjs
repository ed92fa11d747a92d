// Prints the handbook's figures: build time, per-page bytes (gzip) and render-blocking requests, the
// offline cache's first download, how long each calculator takes to recompute after one input
// changes, and in chromium how long a typed value takes to reach the page at 1× and 4× CPU
// slowdown. A benchmark prints; it never asserts.
// Usage: npm run bench  (SKIP_BUILD=1 to weigh an existing dist/)
import { execFileSync } from "node:child_process";
import { readdirSync, existsSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { performance } from "node:perf_hooks";
import { createWeigher } from "./site/page-weight.mjs";
import { precachedFiles, precacheSelection, transferSize } from "./site/precache.mjs";

const root = fileURLToPath(new URL("../", import.meta.url));
const dist = join(root, "dist");
const kb = (bytes) => `${(bytes / 1024).toFixed(1)} KB`;

if (!process.env.SKIP_BUILD) {
  const start = performance.now();
  execFileSync(process.execPath, [join(root, "node_modules/astro/bin/astro.mjs"), "build", "--silent"], { cwd: root, stdio: "ignore" });
  console.log(`build: ${((performance.now() - start) / 1000).toFixed(2)} s`);
}

console.log("\npage weight (gzip)                              html      css       js     total   render-blocking");
const weigh = createWeigher(dist, "/");
const pages = [
  "index.html",
  "404.html",
  "build-sheet/index.html",
  "search/index.html",
  ...readdirSync(join(dist, "chapters")).map((slug) => `chapters/${slug}/index.html`),
];
for (const page of pages.filter((p) => existsSync(join(dist, p)))) {
  const w = weigh(page);
  console.log(
    `${page.padEnd(44)}${kb(w.html).padStart(9)}${kb(w.css).padStart(9)}${kb(w.js).padStart(9)}${kb(w.total).padStart(10)}${String(w.renderBlocking).padStart(10)}`,
  );
}

// What a first visit downloads for offline use (fonts and the search index count at their own,
// already compressed, size), and what the build leaves out of it.
const precache = transferSize(dist, precachedFiles(dist, "/"));
const left = precacheSelection(dist).excluded;
console.log(
  `\noffline cache (first visit): ${precache.files} files, ${kb(precache.raw)} raw, ${kb(precache.gzip)} gzip, ${kb(precache.brotli)} brotli` +
    ` (${left.size} built files left out: nothing uses them)`,
);
const parts = Map.groupBy(precachedFiles(dist, "/"), (file) =>
  /^search-(fields|pages)\.json$|^search-engine\.js$/.test(file)
    ? "search (engine, pages, fields)"
    : /\.html$/.test(file)
      ? "pages (html)"
      : /\.m?js$/.test(file)
        ? "scripts (js)"
        : /\.css$/.test(file)
          ? "stylesheets (css)"
          : /\.woff2$/.test(file)
            ? "fonts (math)"
            : "other",
);
for (const [part, files] of parts) {
  const size = transferSize(dist, files);
  console.log(`  ${part.padEnd(28)}${String(size.files).padStart(4)} files${kb(size.gzip).padStart(10)} gzip${kb(size.brotli).padStart(10)} brotli`);
}

/** Median time of `fn` over `runs` runs, in microseconds. */
function median(fn, runs) {
  const times = [];
  for (let i = 0; i < runs; i += 1) {
    const t = performance.now();
    fn(i);
    times.push((performance.now() - t) * 1000);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

console.log("\ncalculator recompute (one input changed, result and plot data read), median:");
// The page's model as the widget builds it (components/calc-ui/model.ts over the placement
// descriptor), without the component: the plot's points are the calc curve the widget draws.
const { createCalculatorModel } = await import("../components/calc-ui/model.ts");
// Node reads and shows every quantity kind (a page registers only its own).
await import("../calc/core/all-units.ts");
const { default: placement } = await import("../calc/calculators/placement.ts");
const { centripetalAccelerationCurve } = await import("../calc/rotation/rotation.ts");
const model = createCalculatorModel(placement);
const placementUs = median((i) => {
  model.fields.texts.radius.value = `${10 + (i % 50)} mm`;
  void model.outcome.value;
  const values = model.values.value;
  if (values) centripetalAccelerationCurve({ radius: values.radius, maxSpeed: values.topSpeed * 1.2, intervals: 60 });
}, 2000);
console.log(`  accelerometer placement: ${placementUs.toFixed(1)} µs per update`);

for (const name of ["bench-drivetrain.mjs", "bench-steering.mjs", "bench-browser.mjs"]) {
  const extra = join(root, "scripts", name);
  if (!existsSync(extra)) continue;
  console.log("");
  execFileSync(process.execPath, [extra], { cwd: root, stdio: "inherit" });
}
