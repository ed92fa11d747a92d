// The handbook's Content Security Policy, computed after the build when every page's HTML is
// final: scripts only from this site plus the SHA-256 hashes of the few inline scripts (the offline
// registration and the search page's script), stylesheets only from this site plus the hashes of the
// pages' small inline stylesheets, no style attributes, no other origin for anything. The policy goes into a
// <meta http-equiv> at the top of every page's <head> and into `_headers` (the format Netlify and
// Cloudflare Pages read; scripts/static-server.mjs reads it too), which adds what a <meta> policy
// cannot carry (frame-ancestors).
//
// Why each source is there:
// - style-src-elem 'sha256-…': a page's own stylesheet, when small, is inlined in its <head> (one
//   request fewer before the first paint; astro.config.mjs, inlineStylesheets), each by its hash.
// - style-src-attr 'none': no page carries a style attribute (the build refuses one; formulas are
//   MathML, laid out by the browser); scripts set styles through the CSSOM, which the policy allows.
// - style-src 'self' + the same hashes: the fallback for browsers that do not know the -elem/-attr
//   directives (before 2022).
import { createHash } from "node:crypto";
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { fileURLToPath } from "node:url";

/** Script types a browser runs (an absent type is JavaScript); other types are inert data blocks. */
const RUNNABLE = /^(|text\/javascript|application\/javascript|module|importmap)$/i;

/** The headers file a host reads (and the bundled server applies). */
export const HEADERS_FILE = "_headers";

/**
 * The SHA-256 sources ("'sha256-…'") for the inline scripts of one page, in order of appearance.
 * @param {string} html
 */
export function inlineScriptHashes(html) {
  const hashes = [];
  for (const m of html.matchAll(/<script\b((?:[^>"']|"[^"]*"|'[^']*')*)>([\s\S]*?)<\/script\s*>/gi)) {
    const attributes = m[1];
    if (/\bsrc\s*=/i.test(attributes)) continue;
    const type = /\btype\s*=\s*["']?([^"'\s>]*)/i.exec(attributes)?.[1] ?? "";
    if (!RUNNABLE.test(type)) continue;
    hashes.push(`'sha256-${createHash("sha256").update(m[2], "utf8").digest("base64")}'`);
  }
  return hashes;
}

/**
 * The SHA-256 sources for the inline stylesheets (<style> elements) of one page, in order of appearance.
 * @param {string} html
 */
export function inlineStyleHashes(html) {
  return [...html.matchAll(/<style\b[^>]*>([\s\S]*?)<\/style\s*>/gi)].map((m) => `'sha256-${createHash("sha256").update(m[1], "utf8").digest("base64")}'`);
}

/**
 * Markup a strict policy would block, which the build refuses to ship: event-handler attributes,
 * javascript: URLs and style attributes.
 * @param {string} html
 * @returns {string[]}
 */
export function policyBreakers(html) {
  const found = [];
  const withoutScripts = html.replace(/<script\b[^>]*>[\s\S]*?<\/script\s*>/gi, "");
  for (const m of withoutScripts.matchAll(/<[a-zA-Z][\w:-]*\b((?:[^>"']|"[^"]*"|'[^']*')*)>/g)) {
    const handler = /\s(on[a-z]+)\s*=/i.exec(m[1]);
    if (handler) found.push(`event-handler attribute ${handler[1]}`);
    if (/\s(?:href|src|action|formaction)\s*=\s*["']?\s*javascript:/i.test(m[1])) found.push("javascript: URL");
    if (/\sstyle\s*=/i.test(m[1])) found.push("style attribute");
  }
  return found;
}

/**
 * The policy for the whole site, given the hash sources of every inline script and inline
 * stylesheet on any page.
 * @param {string[]} scriptHashes
 * @param {string[]} [styleHashes]
 */
export function contentSecurityPolicy(scriptHashes, styleHashes = []) {
  const styles = ["'self'", ...[...new Set(styleHashes)].sort()].join(" ");
  return [
    "default-src 'self'",
    `script-src ${["'self'", ...[...new Set(scriptHashes)].sort()].join(" ")}`,
    `style-src ${styles}`,
    `style-src-elem ${styles}`,
    "style-src-attr 'none'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
  ].join("; ");
}

/** What the header adds to the <meta> policy (a <meta> policy may not carry it). */
export const HEADER_ONLY = "frame-ancestors 'none'";

function walk(dir) {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => (entry.isDirectory() ? walk(join(dir, entry.name)) : [join(dir, entry.name)]));
}

/**
 * Parses a `_headers` file (Netlify / Cloudflare Pages format): a path pattern on its own line, then
 * indented `Name: value` lines. `*` in a pattern matches any run of characters.
 * @param {string} text
 * @returns {{ pattern: RegExp, headers: [string, string][] }[]}
 */
export function parseHeadersFile(text) {
  const blocks = [];
  for (const line of text.split(/\r?\n/)) {
    if (!line.trim() || line.trim().startsWith("#")) continue;
    if (!/^\s/.test(line)) {
      const source = line
        .trim()
        .replace(/[.+?^${}()|[\]\\]/g, "\\$&")
        .replace(/\*/g, ".*");
      blocks.push({ pattern: new RegExp(`^${source}$`), headers: [] });
    } else if (blocks.length) {
      const colon = line.indexOf(":");
      if (colon > 0) blocks[blocks.length - 1].headers.push([line.slice(0, colon).trim(), line.slice(colon + 1).trim()]);
    }
  }
  return blocks;
}

/**
 * Astro integration: after the build, hash the inline scripts of every page, put the policy into a
 * <meta> right after <meta charset> on every page, and write `_headers`.
 */
export function contentSecurityPolicyPlugin() {
  return {
    name: "whirlbook:content-security-policy",
    hooks: {
      "astro:build:done": ({ dir, logger }) => {
        const root = fileURLToPath(dir);
        const pages = walk(root).filter((f) => f.endsWith(".html"));
        const hashes = [];
        const styleHashes = [];
        const problems = [];
        for (const file of pages) {
          const html = readFileSync(file, "utf8");
          hashes.push(...inlineScriptHashes(html));
          styleHashes.push(...inlineStyleHashes(html));
          for (const problem of policyBreakers(html)) problems.push(`${relative(root, file)}: ${problem}`);
          if (/http-equiv="content-security-policy"/i.test(html)) problems.push(`${relative(root, file)}: already has a policy`);
        }
        if (problems.length) throw new Error(`content security policy: the built pages would break it:\n${problems.join("\n")}`);
        const policy = contentSecurityPolicy(hashes, styleHashes);
        const meta = `<meta http-equiv="Content-Security-Policy" content="${policy}">`;
        for (const file of pages) {
          const html = readFileSync(file, "utf8");
          const charset = /<meta charset="[^"]*"\s*\/?>/i.exec(html);
          if (!charset) throw new Error(`content security policy: ${relative(root, file).split(sep).join("/")} has no <meta charset>`);
          const at = charset.index + charset[0].length;
          writeFileSync(file, html.slice(0, at) + meta + html.slice(at));
        }
        writeFileSync(
          join(root, HEADERS_FILE),
          [
            "# Response headers for every file of the handbook, written by the build (Netlify and Cloudflare",
            "# Pages read this file as is; for other hosts see README.md, Hosting). The hashes change when an",
            "# inline script or a page's inline stylesheet changes: copy the policy again after such a change.",
            "/*",
            `  Content-Security-Policy: ${policy}; ${HEADER_ONLY}`,
            "/_astro/*",
            "  Cache-Control: public, max-age=31536000, immutable",
            "",
          ].join("\n"),
        );
        logger.info(
          `content security policy: ${new Set(hashes).size} inline script and ${new Set(styleHashes).size} inline stylesheet hash(es), on ${pages.length} pages and in ${HEADERS_FILE}`,
        );
      },
    },
  };
}
