/**
 * Brings a chapter's calculators to life: every `[data-island]` element holds the HTML its widget
 * rendered at build time and its props as JSON; the widget module (components/calculators/<name>.tsx)
 * loads on its own, so a page downloads only the calculators it shows, and hydrates that HTML.
 */
import { h, hydrate, type ComponentType } from "preact";

const widgets = import.meta.glob<{ default: ComponentType<object> }>("../calculators/*.tsx");

for (const element of document.querySelectorAll<HTMLElement>("[data-island]")) {
  const load = widgets[`../calculators/${element.dataset.island}.tsx`];
  if (!load) continue;
  void load().then((widget) => {
    hydrate(h(widget.default, JSON.parse(element.dataset.props || "{}")), element);
    element.dataset.hydrated = "";
  });
}
