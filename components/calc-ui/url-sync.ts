/**
 * Keeps one calculator's state in the page URL: reads the link once on start, then rewrites the
 * calculator's own keys (and only those) after each change. Browser-only; call from an effect.
 */
import { effect } from "./reactive.ts";
import type { FieldsModel } from "./fields.ts";
import type { InputSpecs } from "../../calc/inputs.ts";

/** Starts syncing; returns the function that stops it. */
export function syncWithUrl<S extends InputSpecs>(fields: FieldsModel<S>): () => void {
  fields.applyQuery(window.location.search);
  let first = true;
  return effect(() => {
    // Read every text and the system so the effect re-runs on any change.
    for (const text of Object.values(fields.texts)) void text.value;
    void fields.system.value;
    if (first) {
      first = false;
      return;
    }
    const query = fields.queryFor(window.location.search);
    window.history.replaceState(window.history.state, "", `${window.location.pathname}?${query}${window.location.hash}`);
  });
}

/** The full link to this page with the calculator's current state. */
export function linkFor<S extends InputSpecs>(fields: FieldsModel<S>, anchor: string): string {
  const { origin, pathname, search } = window.location;
  return `${origin}${pathname}?${fields.queryFor(search)}#${anchor}`;
}
