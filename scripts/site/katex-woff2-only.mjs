/**
 * KaTeX's stylesheet lists each font as woff2, woff and ttf. Every current browser takes woff2, so
 * this drops the other two: the build then ships (and a page can request) only woff2 files.
 * @returns {import("vite").Plugin}
 */
export function katexWoff2Only() {
  return {
    name: "whirlbook:katex-woff2-only",
    enforce: "pre",
    transform(code, id) {
      if (!/katex(\.min)?\.css($|\?)/.test(id)) return null;
      const trimmed = code.replace(/,\s*url\([^)]*\.woff\)\s*format\("woff"\)/g, "").replace(/,\s*url\([^)]*\.ttf\)\s*format\("truetype"\)/g, "");
      return { code: trimmed, map: null };
    },
  };
}
