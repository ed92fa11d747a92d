/**
 * Unit-system switch and "copy link" for a calculator. The link is the page URL with the current
 * state; copying falls back to selecting the link text where the clipboard is unavailable.
 */
import { useEffect } from "preact/hooks";
import { useSignal } from "./reactive.ts";
import { showTarget } from "./save.ts";
import type { Signal } from "./reactive.ts";
import type { UnitSystem } from "../../calc/core/units.ts";

export interface ToolbarProps {
  idPrefix: string;
  system: Signal<UnitSystem>;
  onSystem(next: UnitSystem): void;
  /** Builds the full link to copy. */
  link(): string;
  /** Saves the calculator's values into a design and says how it went; shows "Save to design" when given. */
  save?: () => Promise<string>;
}

/**
 * The link as a teammate can use it: without the keys that tie this page to a design saved in this
 * browser (`save.*`, components/design/save.ts), which another browser has not got.
 */
const shareable = (link: string) =>
  link.replace(
    /\?[^#]*/,
    (query) =>
      `?${query
        .slice(1)
        .split("&")
        .filter((pair) => !pair.startsWith("save."))
        .join("&")}`,
  );

export function Toolbar({ idPrefix, system, onSystem, link, save }: ToolbarProps) {
  const status = useSignal("");
  const fallback = useSignal<string | null>(null);
  // Opened from the build sheet: say where "Save to design" writes.
  useEffect(() => showTarget(status), []);
  async function copy() {
    const url = shareable(link());
    try {
      await navigator.clipboard.writeText(url);
      status.value = "Link copied.";
      fallback.value = null;
    } catch {
      fallback.value = url;
      status.value = "Copy the selected link below.";
    }
  }
  async function saveToDesign() {
    if (save) status.value = await save();
  }
  return (
    <div class="calc-actions">
      <fieldset class="segmented">
        <legend>Units</legend>
        {(["metric", "us"] as const).map((option) => (
          <label key={option}>
            <input type="radio" name={`${idPrefix}-units`} value={option} checked={system.value === option} onChange={() => onSystem(option)} />
            <span>{option === "metric" ? "Metric" : "US"}</span>
          </label>
        ))}
      </fieldset>
      <button type="button" class="button" onClick={copy}>
        Copy link to this check
      </button>
      {save ? (
        <button type="button" class="button button--quiet" onClick={saveToDesign}>
          Save to design
        </button>
      ) : null}
      <p class="calc-status" role="status" aria-live="polite">
        {status.value}
      </p>
      {fallback.value ? (
        <label class="field">
          <span>Link to this check</span>
          <input type="text" readOnly value={fallback.value} ref={(el) => el?.select()} />
        </label>
      ) : null}
    </div>
  );
}
