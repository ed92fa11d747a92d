// A small static file server for dist/: used by `npm start` and by the browser tests.
// Serves only files under the root, on 127.0.0.1; no directory listings; index.html for folders.
import { createServer } from "node:http";
import { readFile, stat } from "node:fs/promises";
import { extname, join, normalize, sep } from "node:path";
import { fileURLToPath } from "node:url";

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
  ".pf_meta": "application/octet-stream",
  ".pf_index": "application/octet-stream",
  ".pf_fragment": "application/octet-stream",
  ".pagefind": "application/octet-stream",
  ".wasm": "application/wasm",
};

/**
 * @param {{ root: URL | string, port?: number, base?: string, host?: string }} options
 * @returns {Promise<{ url: string, close: () => Promise<void> }>}
 */
export async function startStaticServer({ root, port = 0, base = "/", host = "127.0.0.1" }) {
  const rootPath = typeof root === "string" ? root : fileURLToPath(root);
  const prefix = base.endsWith("/") ? base : `${base}/`;
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
      const body = await readFile(file).catch(() => null);
      if (!body) {
        const notFound = await readFile(join(rootPath, "404.html")).catch(() => null);
        response.writeHead(404, { "content-type": TYPES[".html"] });
        return response.end(notFound ?? "Not found");
      }
      response.writeHead(200, { "content-type": TYPES[extname(file)] ?? "application/octet-stream", "cache-control": "no-cache" });
      response.end(body);
    } catch {
      send(response, 400, "Bad request");
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
