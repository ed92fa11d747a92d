// After the build (last, once every file is final): a brotli (.br, quality 11) and a gzip (.gz,
// level 9) copy beside every text file, so a server can send compressed bytes without compressing
// on each request. scripts/static-server.mjs picks one by the request's Accept-Encoding; most static
// hosts do the same with such files or compress on their own (README.md, Hosting).
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { promisify } from "node:util";
import { brotliCompress, constants, gzip } from "node:zlib";

/** Text files worth compressing. (Fonts and images are compressed already.) */
export const COMPRESSIBLE = /\.(html|css|js|mjs|json|svg|txt|xml|webmanifest|map)$/;

const brotli = promisify(brotliCompress);
const gz = promisify(gzip);

function walk(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? walk(join(dir, entry.name)) : [join(dir, entry.name)]));
}

/**
 * Writes `.br` and `.gz` beside every compressible file under `root`.
 * @param {string} root
 * @returns {Promise<{ files: number, raw: number, br: number, gz: number }>}
 */
export async function precompress(root) {
  const files = walk(root).filter((file) => COMPRESSIBLE.test(file));
  const totals = { files: files.length, raw: 0, br: 0, gz: 0 };
  await Promise.all(
    files.map(async (file) => {
      const data = readFileSync(file);
      const [br, gzipped] = await Promise.all([
        brotli(data, {
          params: {
            [constants.BROTLI_PARAM_QUALITY]: constants.BROTLI_MAX_QUALITY,
            [constants.BROTLI_PARAM_MODE]: constants.BROTLI_MODE_TEXT,
            [constants.BROTLI_PARAM_SIZE_HINT]: data.length,
          },
        }),
        gz(data, { level: constants.Z_BEST_COMPRESSION }),
      ]);
      writeFileSync(`${file}.br`, br);
      writeFileSync(`${file}.gz`, gzipped);
      totals.raw += data.length;
      totals.br += br.length;
      totals.gz += gzipped.length;
    }),
  );
  return totals;
}

/** Astro integration: precompress the finished build. Keep it last in the integration list. */
export function precompressPlugin() {
  return {
    name: "whirlbook:precompress",
    hooks: {
      "astro:build:done": async ({ dir, logger }) => {
        const t = await precompress(fileURLToPath(dir));
        const kb = (n) => `${(n / 1024).toFixed(0)} KB`;
        logger.info(`precompressed ${t.files} text files: ${kb(t.raw)} raw, ${kb(t.gz)} gzip, ${kb(t.br)} brotli`);
      },
    },
  };
}
