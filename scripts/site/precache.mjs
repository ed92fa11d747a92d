// What the offline cache downloads on a first visit: every file of the build that a page can use,
// and nothing it cannot. Left out, each for a stated reason:
// - scripts, stylesheets and fonts under _astro/ that no page, stylesheet or script names (bundler
//   output nothing loads, such as the unused framework island loader);
// - the precompressed .br/.gz copies (the server picks one per request), source maps, the headers
//   file and the service worker itself.
// Anything else is kept, so a file of a kind this list does not know stays available offline.
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { brotliCompressSync, constants, gzipSync } from "node:zlib";
import { HEADERS_FILE } from "./content-security-policy.mjs";

function walk(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? walk(join(dir, entry.name)) : [join(dir, entry.name)]));
}

/** Files derived from others or never fetched by a page. */
const NEVER = (/** @type {string} */ file) => file === "sw.js" || file === HEADERS_FILE || /\.(br|gz|map)$/.test(file);

/**
 * The files to precache (paths relative to the build folder, "/"-separated, sorted) and those left
 * out with the reason for each.
 * @param {string} root the built site's folder
 */
export function precacheSelection(root) {
  const files = walk(root)
    .map((file) => relative(root, file).split(sep).join("/"))
    .filter((file) => !NEVER(file))
    .sort();
  /** @type {Map<string, string>} */
  const excluded = new Map();

  // Bundler output that nothing refers to: reachable = named by a page or by a reachable file.
  const bundled = files.filter((file) => /(^|\/)_astro\/[^/]+\.(m?js|css|woff2?)$/.test(file));
  const name = (file) => file.slice(file.lastIndexOf("/") + 1);
  const reachable = new Set();
  const queue = files.filter((file) => /\.(html|js|mjs|css|json)$/.test(file) && !bundled.includes(file));
  while (queue.length) {
    const text = readFileSync(join(root, queue.pop()), "utf8");
    for (const file of bundled) {
      if (!reachable.has(file) && text.includes(name(file))) {
        reachable.add(file);
        queue.push(file);
      }
    }
  }
  for (const file of bundled) if (!reachable.has(file)) excluded.set(file, "bundled file no page loads");

  return { files: files.filter((file) => !excluded.has(file)), excluded };
}

/** File types the build stores compressed already: compressing them again gains nothing. */
const PACKED = /\.(woff2|png|jpe?g|webp|avif|gif|wasm)$/;

/**
 * Bytes of a list of built files: raw, as gzip (level 9) and as brotli (quality 11), for files that
 * are sent compressed; already-compressed files count at their own size in every column.
 * @param {string} root
 * @param {string[]} files relative paths
 */
export function transferSize(root, files) {
  let raw = 0;
  let gzip = 0;
  let brotli = 0;
  for (const file of files) {
    const path = join(root, file);
    const size = statSync(path).size;
    raw += size;
    if (PACKED.test(file)) {
      gzip += size;
      brotli += size;
      continue;
    }
    const gz = existsSync(`${path}.gz`) ? statSync(`${path}.gz`).size : gzipSync(readFileSync(path), { level: 9 }).length;
    const br = existsSync(`${path}.br`)
      ? statSync(`${path}.br`).size
      : brotliCompressSync(readFileSync(path), { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }).length;
    gzip += Math.min(size, gz);
    brotli += Math.min(size, br);
  }
  return { files: files.length, raw, gzip, brotli };
}

/**
 * The files the built service worker precaches, read back from sw.js, as relative paths.
 * @param {string} root
 * @param {string} base
 */
export function precachedFiles(root, base = "/") {
  const sw = readFileSync(join(root, "sw.js"), "utf8");
  const urls = /** @type {string[]} */ (JSON.parse(/const FILES = (\[.*\]);/.exec(sw)?.[1] ?? "[]"));
  return urls.map((url) => {
    const path = url.slice(base.length);
    return path === "" || path.endsWith("/") ? `${path}index.html` : path;
  });
}
