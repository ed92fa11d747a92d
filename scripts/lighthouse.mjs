// Lighthouse's four scores for every page of the built site, served as `npm run serve` serves it
// (precompressed files, the site's headers), audited as a mobile visit with Lighthouse's default
// simulated throttling in Debian's chromium. Prints a table and, for each score under 100, the
// audits that cost it. A benchmark prints; it never asserts.
// Usage: npm run build && npm run lighthouse  (CHROME_PATH to use another chromium)
import { existsSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import * as chromeLauncher from "chrome-launcher";
import lighthouse from "lighthouse";
import { startStaticServer } from "./static-server.mjs";

const root = fileURLToPath(new URL("../", import.meta.url));
const dist = join(root, "dist");
const chromePath = process.env.CHROME_PATH ?? "/usr/bin/chromium";
if (!existsSync(join(dist, "index.html"))) {
  console.log("lighthouse skipped: build the site first (npm run build)");
  process.exit(0);
}
if (!existsSync(chromePath)) {
  console.log(`lighthouse skipped: no chromium at ${chromePath} (set CHROME_PATH)`);
  process.exit(0);
}

const pages = [
  "",
  "404.html",
  "build-sheet/",
  "search/",
  ...readdirSync(join(dist, "chapters"))
    .sort()
    .map((slug) => `chapters/${slug}/`),
];
const only = process.argv.slice(2);
const server = await startStaticServer({ root: `${dist}/`, port: 0 });
const chrome = await chromeLauncher.launch({ chromePath, chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu"] });
const CATEGORIES = ["performance", "accessibility", "best-practices", "seo"];

console.log(`lighthouse (mobile, simulated throttling): ${CATEGORIES.join(" / ")}`);
const below = [];
const machine = [];
try {
  for (const path of pages.filter((p) => only.length === 0 || only.some((o) => p.includes(o)))) {
    const result = await lighthouse(`${server.url}${path}`, { port: chrome.port, output: "json", logLevel: "error", onlyCategories: CATEGORIES });
    const lhr = result?.lhr;
    if (!lhr) continue;
    machine.push(lhr.environment?.benchmarkIndex ?? 0);
    const scores = CATEGORIES.map((c) => Math.round((lhr.categories[c]?.score ?? 0) * 100));
    const metric = (id) => lhr.audits[id]?.displayValue ?? "";
    console.log(
      `${(path || "/").padEnd(30)}${scores.map((s) => String(s).padStart(5)).join("")}   LCP ${metric("largest-contentful-paint")}, TBT ${metric("total-blocking-time")}, CLS ${metric("cumulative-layout-shift")}`,
    );
    for (const [i, c] of CATEGORIES.entries()) {
      if (scores[i] === 100) continue;
      const costs = lhr.categories[c].auditRefs
        .filter((ref) => ref.weight > 0 && (lhr.audits[ref.id]?.score ?? 1) < 1)
        .map((ref) => `${ref.id} (${lhr.audits[ref.id].displayValue ?? lhr.audits[ref.id].score})`);
      below.push(`${path || "/"} ${c} ${scores[i]}: ${costs.join(", ")}`);
    }
  }
} finally {
  await chrome.kill();
  await server.close();
}
// Lighthouse's own measure of this machine's speed (its benchmark index; a typical desktop scores
// about 1 000–1 500, for which its fourfold CPU slow-down stands for a mid-range phone).
if (machine.length) console.log(`\nthis machine: benchmark index ${Math.min(...machine)}–${Math.max(...machine)}`);
if (below.length) console.log(`\nunder 100, and the audits that cost it:\n  ${below.join("\n  ")}`);
else console.log("\nevery page scores 100 in all four categories");
