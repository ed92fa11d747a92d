/**
 * Every calculator of the handbook, found by file name: each module in calc/calculators/ exports
 * its form (inputs, link keys, where it lives) as `form` and its whole descriptor (the form with its
 * calc entry and its build-sheet cards) as its default. The build sheet, the design file, the
 * command line and search iterate these lists; nothing else lists the calculators. (The bundler
 * expands the file lists; the command line's module hook, scripts/node-glob.mjs, does the same under
 * Node.)
 */
import type { AnyCalculator, AnyForm } from "../core/calculator.ts";

// Each list imports the modules under its own module id ("?form", "?check"; calc/design/calculators.ts
// "?registry"): a chapter imports only a descriptor's `form` and `run`, and the bundler can leave the
// cards (build-sheet sentences) out of its pages; the forms alone stay free of the physics. Every
// whole calculator at once is in calc/design/calculators.ts, which pages do not import.
// Stryker disable next-line all: the bundler reads these arguments as written (a mutated one is no longer a static glob)
const forms = import.meta.glob<AnyForm>("../calculators/*.ts", { eager: true, import: "form", query: "?form" });
// Stryker disable next-line all: the bundler reads these arguments as written (a mutated one is no longer a static glob)
const later = import.meta.glob<AnyCalculator>("../calculators/*.ts", { import: "default", query: "?check" });

/** `list` sorted in build-sheet order (ascending `order`), in place. */
const byOrder = <T extends { order: number }>(list: T[]): readonly T[] => list.sort((a, b) => a.order - b.order);

/** Every calculator's form, in build-sheet order: what reading a design and writing links need. */
export const FORMS: readonly AnyForm[] = /* @__PURE__ */ byOrder(Object.values(forms));

/** The file of each calculator, by id, for loading its check on demand. */
const FILE_BY_ID = /* @__PURE__ */ new Map(Object.entries(forms).map(([file, form]) => [form.id, file]));

/** The form of the calculator that fills a design section, if there is one. */
export function formFor(section: string): AnyForm | undefined {
  return FORMS.find((f) => f.id === section);
}

/**
 * Loads the whole calculators (calc entry and cards) of the given sections, each as its own chunk
 * in the browser: a page that shows a design's checks fetches the code of the checks the design
 * holds, not every check of the handbook. Unknown sections are left out.
 */
export async function loadCalculators(sections: Iterable<string>): Promise<readonly AnyCalculator[]> {
  const files = [...new Set(sections)].map((id) => FILE_BY_ID.get(id)).filter((file): file is string => file !== undefined);
  return byOrder(await Promise.all(files.map((file) => later[file]!())));
}
