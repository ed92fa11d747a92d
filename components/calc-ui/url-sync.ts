/**
 * Keeps one calculator's state in the page URL: reads the link once on start, then rewrites the
 * calculator's own keys (and only those) after each change. Browser-only; call from an effect.
 */
import { effect } from "./reactive.ts";

/** What a calculator's state needs to live in a link: read a query string, write one. */
export interface UrlState {
  /** Applies a query string (a permalink). */
  applyQuery(search: string): void;
  /** The query string for the current state, keeping the keys of `existing` that are not its own. */
  queryFor(existing: string): string;
}

/**
 * Starts syncing; returns the function that stops it. The effect re-runs whenever a signal that
 * `queryFor` reads changes, so whatever the state's link carries is what triggers a rewrite.
 */
export function syncWithUrl(state: UrlState): () => void {
  state.applyQuery(window.location.search);
  let first = true;
  return effect(() => {
    const query = state.queryFor(window.location.search);
    if (first) {
      first = false;
      return;
    }
    window.history.replaceState(window.history.state, "", `${window.location.pathname}?${query}${window.location.hash}`);
  });
}

/** The full link to this page with the calculator's current state. */
export function linkFor(state: UrlState, anchor: string): string {
  const { origin, pathname, search } = window.location;
  return `${origin}${pathname}?${state.queryFor(search)}#${anchor}`;
}
