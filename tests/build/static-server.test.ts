/**
 * The bundled server (`npm run serve`, the browser tests): sends the precompressed copy the request
 * accepts (brotli before gzip before none), with the headers a cache and a browser need, and the
 * headers the build wrote to `_headers`. Runs on a small folder of its own, no build needed.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { request } from "node:http";
import { mkdtempSync, mkdirSync, utimesSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { brotliCompressSync, brotliDecompressSync, gunzipSync, gzipSync } from "node:zlib";
import { chooseEncoding, startStaticServer } from "../../scripts/static-server.mjs";

const PAGE = `<!doctype html><title>t</title>${"<p>compressible text</p>".repeat(200)}`;
const CSS = `body{color:red}${".a{margin:0}".repeat(100)}`;
const POLICY = "default-src 'self'; frame-ancestors 'none'";

const root = mkdtempSync(join(tmpdir(), "whirlbook-server-"));
function file(path: string, body: string | Buffer, { compressed = true } = {}) {
  writeFileSync(join(root, path), body);
  if (compressed) {
    writeFileSync(join(root, `${path}.br`), brotliCompressSync(body));
    writeFileSync(join(root, `${path}.gz`), gzipSync(body));
  }
}
mkdirSync(join(root, "docs"));
mkdirSync(join(root, "_astro"));
file("index.html", PAGE);
file("docs/index.html", PAGE);
file("404.html", "<!doctype html><title>Not found</title><h1>Not found</h1>");
file("_astro/site.abc123.css", CSS);
file("font.woff2", Buffer.from([0x77, 0x4f, 0x46, 0x32, 1, 2, 3]), { compressed: false });
file("plain.js", "console.log(1)", { compressed: false });
file("_headers", `/*\n  Content-Security-Policy: ${POLICY}\n/_astro/*\n  Cache-Control: public, max-age=31536000, immutable\n`, { compressed: false });
// A file edited after the build: its compressed copies are older than it and must not be sent.
file("edited.js", "console.log('old')");
writeFileSync(join(root, "edited.js"), "console.log('new')");
const past = new Date(Date.now() - 60_000);
utimesSync(join(root, "edited.js.br"), past, past);
utimesSync(join(root, "edited.js.gz"), past, past);

let server: Awaited<ReturnType<typeof startStaticServer>>;
beforeAll(async () => {
  server = await startStaticServer({ root: `${root}/` });
});
afterAll(async () => {
  await server?.close();
});

/** A raw GET (no automatic decompression), returning status, headers and the bytes as sent. */
function get(path: string, headers: Record<string, string> = {}, method = "GET") {
  return new Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: Buffer }>((resolve, reject) => {
    const req = request(new URL(path, server.url), { method, headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
    });
    req.on("error", reject);
    req.end();
  });
}
const decode = (r: { headers: Record<string, unknown>; body: Buffer }) =>
  r.headers["content-encoding"] === "br" ? brotliDecompressSync(r.body) : r.headers["content-encoding"] === "gzip" ? gunzipSync(r.body) : r.body;

describe("choosing a content coding from Accept-Encoding", () => {
  const both = new Set(["br", "gzip"]);
  it.each([
    { header: "gzip, deflate, br, zstd", expected: "br", note: "a current browser: brotli first" },
    { header: "br", expected: "br", note: "brotli only" },
    { header: "gzip", expected: "gzip", note: "gzip only" },
    { header: "x-gzip", expected: "gzip", note: "the old name of gzip" },
    { header: "deflate", expected: "identity", note: "nothing the build wrote" },
    { header: "", expected: "identity", note: "empty header" },
    { header: undefined, expected: "identity", note: "no header" },
    { header: "br;q=0, gzip", expected: "gzip", note: "brotli refused" },
    { header: "gzip;q=1, br;q=0.5", expected: "gzip", note: "the client prefers gzip" },
    { header: "br;q=0.8, gzip;q=0.8", expected: "br", note: "a tie: brotli first" },
    { header: "*", expected: "br", note: "anything: brotli first" },
    { header: "*;q=0, identity", expected: "identity", note: "identity only" },
    { header: "GZIP ; Q=0.5", expected: "gzip", note: "case and spaces do not matter" },
  ])("$header → $expected ($note)", ({ header, expected }) => {
    expect(chooseEncoding(header, both)).toBe(expected);
  });

  it("falls back to what exists: gzip when there is no brotli copy, else none", () => {
    expect(chooseEncoding("br, gzip", new Set(["gzip"]))).toBe("gzip");
    expect(chooseEncoding("br, gzip", new Set())).toBe("identity");
  });
});

describe("serving", () => {
  it.each([
    { accept: "gzip, deflate, br", encoding: "br", label: "as brotli" },
    { accept: "gzip", encoding: "gzip", label: "as gzip" },
    { accept: "identity", encoding: undefined, label: "as it is" },
  ])("sends a page $label for Accept-Encoding: $accept, with its own type and the sent length", async ({ accept, encoding }) => {
    const r = await get("/", { "accept-encoding": accept });
    expect(r.status).toBe(200);
    expect(r.headers["content-encoding"]).toBe(encoding);
    expect(r.headers["content-type"]).toBe("text/html; charset=utf-8");
    expect(r.headers.vary).toBe("Accept-Encoding");
    expect(Number(r.headers["content-length"])).toBe(r.body.length);
    expect(decode(r).toString()).toBe(PAGE);
    if (encoding) expect(r.body.length).toBeLessThan(PAGE.length / 5);
  });

  it("compresses a folder's index and a stylesheet too, and says Vary even when it sends no coding", async () => {
    const docs = await get("/docs/", { "accept-encoding": "br" });
    expect(docs.headers["content-encoding"]).toBe("br");
    expect(decode(docs).toString()).toBe(PAGE);
    const css = await get("/_astro/site.abc123.css", { "accept-encoding": "gzip" });
    expect(css.headers["content-type"]).toBe("text/css; charset=utf-8");
    expect(decode(css).toString()).toBe(CSS);
    const plain = await get("/_astro/site.abc123.css");
    expect(plain.headers["content-encoding"]).toBeUndefined();
    expect(plain.headers.vary).toBe("Accept-Encoding");
  });

  it("sends files without a compressed copy as they are, and never a copy older than its file", async () => {
    const font = await get("/font.woff2", { "accept-encoding": "br, gzip" });
    expect(font.headers["content-encoding"]).toBeUndefined();
    expect(font.headers["content-type"]).toBe("font/woff2");
    expect(font.headers.vary).toBeUndefined();
    const plain = await get("/plain.js", { "accept-encoding": "br, gzip" });
    expect(plain.headers["content-encoding"]).toBeUndefined();
    expect(plain.body.toString()).toBe("console.log(1)");
    const edited = await get("/edited.js", { "accept-encoding": "br, gzip" });
    expect(edited.headers["content-encoding"]).toBeUndefined();
    expect(edited.body.toString()).toBe("console.log('new')");
  });

  it("sends the not-found page compressed, with status 404", async () => {
    const r = await get("/no/such/page/", { "accept-encoding": "br" });
    expect(r.status).toBe(404);
    expect(r.headers["content-encoding"]).toBe("br");
    expect(decode(r).toString()).toContain("<h1>Not found</h1>");
  });

  it("applies _headers: the security policy on every response, a year's caching for hashed assets", async () => {
    for (const path of ["/", "/_astro/site.abc123.css", "/font.woff2", "/missing"]) {
      expect((await get(path)).headers["content-security-policy"], path).toBe(POLICY);
    }
    expect((await get("/_astro/site.abc123.css")).headers["cache-control"]).toBe("public, max-age=31536000, immutable");
    expect((await get("/")).headers["cache-control"]).toBe("no-cache");
    expect((await get("/_headers")).status).toBe(404);
  });

  it("answers a revalidation with 304 per coding, and HEAD with headers only", async () => {
    const first = await get("/", { "accept-encoding": "br" });
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/-br"$/);
    const again = await get("/", { "accept-encoding": "br", "if-none-match": etag });
    expect(again.status).toBe(304);
    expect(again.body.length).toBe(0);
    // The same ETag never stands for another coding's bytes.
    expect((await get("/", { "accept-encoding": "gzip", "if-none-match": etag })).status).toBe(200);
    const head = await get("/", { "accept-encoding": "gzip" }, "HEAD");
    expect(head.status).toBe(200);
    expect(head.body.length).toBe(0);
    expect(Number(head.headers["content-length"])).toBe(gzipSync(PAGE).length);
  });
});
