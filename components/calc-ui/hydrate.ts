/**
 * Brings a server-rendered calculator to life: every `[data-island="name"]` element holds the
 * HTML the component rendered at build time and its props as JSON; `hydrate` attaches the
 * component to that HTML instead of drawing it again. Each calculator's module script (emitted by
 * the build, scripts/site/island-entries.mjs) and the build sheet's call this, so a page loads only
 * the calculators it shows.
 *
 * This replaces a framework-agnostic island loader (props encoding, several frameworks, slots,
 * load strategies) that cost about 2.5 KB gzip on every calculator page; ours needs none of that.
 */
import { h, hydrate, type ComponentType } from "preact";
import { hydrateInParts } from "./hydrate-later.ts";

export function hydrateIslands<P extends object>(name: string, component: ComponentType<P>): void {
  for (const element of document.querySelectorAll<HTMLElement>(`[data-island="${name}"]`)) {
    // Each island in a task of its own, after the one that evaluated the page's modules: on a slow
    // phone, evaluating the code and attaching the calculator in one go made one task over 50 ms.
    // (Island.astro always writes data-props, "{}" at least.)
    setTimeout(() => {
      hydrateInParts(() => hydrate(h(component, JSON.parse(element.dataset.props!) as P), element));
      element.dataset.hydrated = "";
    });
  }
}
