/**
 * KaTeX's stylesheet lists each font as woff2, woff and ttf, with `font-display: block`. Every
 * current browser takes woff2, so this drops the other two: the build then ships (and a page can
 * request) only woff2 files. It also sets `font-display: swap`: the formulas show at once in a
 * fallback serif and switch to KaTeX's faces when they arrive, instead of staying invisible for up
 * to three seconds on a slow connection (the two faces every chapter uses are preloaded, see
 * katex-fonts.mjs, so the switch usually happens before the first paint).
 * @returns {import("vite").Plugin}
 */
export function katexWoff2Only() {
  return {
    name: "whirlbook:katex-woff2-only",
    enforce: "pre",
    transform(code, id) {
      if (!/katex(\.min)?\.css($|\?)/.test(id)) return null;
      const trimmed = code
        .replace(/,\s*url\([^)]*\.woff\)\s*format\("woff"\)/g, "")
        .replace(/,\s*url\([^)]*\.ttf\)\s*format\("truetype"\)/g, "")
        .replace(/font-display:\s*block/g, "font-display: swap");
      return { code: trimmed, map: null };
    },
  };
}
