// The build sheet's own copies of the modules that declare calculators' inputs.
//
// The sheet imports every calculator's form at once (calc/design/registry.ts, as "?form": what
// reading designs and writing links need) and each calculator's check only for a design that holds
// it ("?check"). A form's declarations live apart from its physics (calc/weapon/shaft-inputs.ts
// beside shaft-check.ts, …), so the sheet loads the physics only with a check. But a module that the
// sheet loads with the page and a chapter's widget also imports is cut out of the widget's code
// into a chunk of its own, shared by both pages: every chapter page whose declarations the sheet
// shares would load one more file (0.2 to 0.6 KB gzip more each).
//
// This plugin gives those declaration modules, when the sheet's forms or the design reader
// (calc/design/) import them, the module id "?sheet": the sheet holds its own copy, and a chapter's
// widget keeps its declarations in one chunk with its physics, as before they were split. The cost
// is the copies themselves in the offline cache (about 9 KB gzip). Copied: every declaration module
// (a file named *-inputs.ts, so a new calculator needs no entry here), and the mass layout's modules (its parts list's codec and checks, which
// the sheet needs as a whole). calc/ modules keep no state, so a copy behaves like the original.
const SHEET = /\?(?:form|sheet)$|[\\/]calc[\\/]design[\\/][^?]*\.ts$/;
const COPIED = /[\\/]calc[\\/](?:[^?]*-inputs|mass[\\/][^\\/?]*)\.ts$/;

/** @returns {import("vite").Plugin} */
export function sheetCopies() {
  return {
    name: "whirlbook:sheet-copies",
    enforce: "pre",
    async resolveId(source, importer, options) {
      if (!importer || !SHEET.test(importer) || !source.startsWith(".")) return null;
      const resolved = await this.resolve(source, importer, { ...options, skipSelf: true });
      if (!resolved || resolved.external || !COPIED.test(resolved.id)) return resolved;
      return { ...resolved, id: `${resolved.id}?sheet` };
    },
  };
}
