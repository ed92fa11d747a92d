// A small static file server for dist/: used by `npm start` and by the browser tests.
// Serves only files under the root, on 127.0.0.1; no directory listings; index.html for folders.
// Sends the precompressed .br/.gz copy the build wrote when the request accepts it (brotli before
// gzip before none), with Content-Encoding and Vary: Accept-Encoding; applies the headers the build
// wrote to `_headers` (the Content-Security-Policy, long caching for hashed assets); everything else
// is `Cache-Control: no-cache` with an ETag, so a revalidation costs a 304.
import { createServer } from "node:http";
import { readFile, stat } from "node:fs/promises";
import { extname, join, normalize, sep } from "node:path";
import { fileURLToPath } from "node:url";
import { parseHeadersFile } from "./site/content-security-policy.mjs";
import { COMPRESSIBLE } from "./site/precompress.mjs";

const TYPES = {
  ".html": "text/html; charset=utf-8",
  ".css": "text/css; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".mjs": "text/javascript; charset=utf-8",
  ".json": "application/json; charset=utf-8",
  ".svg": "image/svg+xml",
  ".woff2": "font/woff2",
  ".png": "image/png",
  ".webmanifest": "application/manifest+json",
  ".txt": "text/plain; charset=utf-8",
  ".xml": "application/xml; charset=utf-8",
  ".map": "application/json; charset=utf-8",
  ".pf_meta": "application/octet-stream",
  ".pf_index": "application/octet-stream",
  ".pf_fragment": "application/octet-stream",
  ".wasm": "application/wasm",
};

/** Content codings the build writes, in order of preference, with the file suffix of each. */
const CODINGS = /** @type {const} */ ([
  ["br", ".br"],
  ["gzip", ".gz"],
]);

/**
 * The content coding to send for an Accept-Encoding header: the preferred one (br, then gzip) among
 * those the client accepts with q > 0 and `available` has, else "identity".
 * @param {string | undefined} header
 * @param {ReadonlySet<string>} available codings a compressed copy exists for
 * @returns {"br" | "gzip" | "identity"}
 */
export function chooseEncoding(header, available) {
  /** @type {Map<string, number>} */
  const q = new Map();
  for (const part of (header ?? "").split(",")) {
    const [rawName = "", ...params] = part.toLowerCase().split(";");
    const name = rawName.trim();
    if (!name) continue;
    const weight = params.map((p) => /^\s*q\s*=\s*([0-9.]+)\s*$/.exec(p)).find(Boolean);
    q.set(name === "x-gzip" ? "gzip" : name, weight ? Number(weight[1]) : 1);
  }
  const accepted = (coding) => (q.has(coding) ? q.get(coding) : (q.get("*") ?? 0));
  let best = /** @type {"br" | "gzip" | "identity"} */ ("identity");
  let bestQ = 0;
  for (const [coding] of CODINGS) {
    const weight = accepted(coding);
    if (available.has(coding) && weight > bestQ) {
      best = coding;
      bestQ = weight;
    }
  }
  return best;
}

/**
 * @param {{ root: URL | string, port?: number, base?: string, host?: string }} options
 * @returns {Promise<{ url: string, close: () => Promise<void> }>}
 */
export async function startStaticServer({ root, port = 0, base = "/", host = "127.0.0.1" }) {
  const rootPath = typeof root === "string" ? root : fileURLToPath(root);
  const prefix = base.endsWith("/") ? base : `${base}/`;
  /** Headers from the build's `_headers`, read per request so a redeploy into the folder takes effect. */
  const headerRules = async () => parseHeadersFile((await readFile(join(rootPath, "_headers"), "utf8").catch(() => "")) || "");

  /**
   * Sends a file (or its compressed copy) with status, type, encoding, caching and policy headers.
   * @param {import("node:http").IncomingMessage} request
   * @param {import("node:http").ServerResponse} response
   */
  async function sendFile(request, response, status, file, sitePath) {
    const type = TYPES[extname(file)] ?? "application/octet-stream";
    const headers = { "content-type": type, "cache-control": "no-cache" };
    let body = file;
    if (COMPRESSIBLE.test(file)) {
      headers.vary = "Accept-Encoding";
      // A copy older than its file (the file was edited after the build) is never sent for it.
      const original = await stat(file);
      const available = new Set();
      for (const [coding, suffix] of CODINGS) {
        const copy = await stat(file + suffix).catch(() => null);
        if (copy && copy.mtimeMs >= original.mtimeMs) available.add(coding);
      }
      const coding = chooseEncoding(request.headers["accept-encoding"], available);
      if (coding !== "identity") {
        headers["content-encoding"] = coding;
        body = file + CODINGS.find(([name]) => name === coding)[1];
      }
    }
    for (const rule of await headerRules()) {
      if (rule.pattern.test(sitePath)) for (const [name, value] of rule.headers) headers[name.toLowerCase()] = value;
    }
    const info = await stat(body);
    headers.etag = `"${info.size.toString(36)}-${Math.floor(info.mtimeMs).toString(36)}${headers["content-encoding"] ? `-${headers["content-encoding"]}` : ""}"`;
    if (status === 200 && request.headers["if-none-match"] === headers.etag) {
      response.writeHead(304, headers);
      return response.end();
    }
    headers["content-length"] = String(info.size);
    response.writeHead(status, headers);
    response.end(request.method === "HEAD" ? undefined : await readFile(body));
  }

  const server = createServer(async (request, response) => {
    try {
      const url = new URL(request.url ?? "/", "http://localhost");
      let path = decodeURIComponent(url.pathname);
      if (!path.startsWith(prefix) && `${path}/` !== prefix) return send(response, 404, "Not found");
      path = path.slice(prefix.length - 1) || "/";
      const target = normalize(join(rootPath, path));
      if (!target.startsWith(normalize(rootPath + sep)) && target !== normalize(rootPath)) return send(response, 403, "Forbidden");
      let file = target;
      const info = await stat(file).catch(() => null);
      if (info?.isDirectory()) {
        if (!url.pathname.endsWith("/")) {
          response.writeHead(301, { location: `${url.pathname}/${url.search}` });
          return response.end();
        }
        file = join(file, "index.html");
      }
      const found = path !== "/_headers" && (await stat(file).catch(() => null))?.isFile();
      if (!found) {
        const notFound = join(rootPath, "404.html");
        if (await stat(notFound).catch(() => null)) return await sendFile(request, response, 404, notFound, path);
        return send(response, 404, "Not found");
      }
      await sendFile(request, response, 200, file, path);
    } catch {
      if (!response.headersSent) send(response, 400, "Bad request");
      else response.destroy();
    }
  });
  await new Promise((resolve) => server.listen(port, host, resolve));
  const address = server.address();
  const actualPort = typeof address === "object" && address ? address.port : port;
  return {
    url: `http://${host}:${actualPort}${prefix}`,
    close: () => new Promise((resolve) => server.close(() => resolve(undefined))),
  };
}

function send(response, status, text) {
  response.writeHead(status, { "content-type": "text/plain; charset=utf-8" });
  response.end(text);
}
