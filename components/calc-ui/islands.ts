/**
 * The development server's calculator loader: every `[data-island]` element holds the HTML its
 * widget rendered on the server and its props as JSON; the widget module
 * (components/calculators/<name>.tsx) loads by file name and hydrates that HTML. A built site does
 * not use this file: the build gives each calculator its own module script
 * (scripts/site/island-entries.mjs).
 */
import type { ComponentType } from "preact";
// The development server registers every unit table; a built page, the kinds its code names.
import "../../calc/core/all-units.ts";
import { hydrateIslands } from "./hydrate.ts";

const widgets = import.meta.glob<{ default: ComponentType<object> }>("../calculators/*.tsx");

for (const element of document.querySelectorAll<HTMLElement>("[data-island]")) {
  const load = widgets[`../calculators/${element.dataset.island}.tsx`];
  if (load) void load().then((widget) => hydrateIslands(element.dataset.island!, widget.default));
}
