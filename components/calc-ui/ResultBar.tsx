/**
 * The answer kept in view while a calculator is edited: the verdict in the handbook's words and the
 * one or two numbers that answer the chapter's question. Placed as a direct child of the calculator,
 * right after its fields, it stays pinned to the bottom of the screen while those fields are on it
 * (`position: sticky`, components/layout/site.css) and settles above the full results after them.
 */
import { STATUS_WORDS } from "../../calc/core/check.ts";

/** A widget's verdict tone: Holds, Marginal, Fails. */
export type Tone = "ok" | "warn" | "bad";

const STATUS_OF_TONE = { ok: "holds", warn: "marginal", bad: "fails" } as const;

export interface BarFigure {
  label: string;
  /** Formatted, with its unit. */
  value: string;
  /** The `data-bar` name tests and people can find it by. */
  name: string;
}

export interface ResultBarProps {
  /** The verdict, or null when the calculator judges nothing (only figures). */
  tone: Tone | null;
  /** The reason in a few words ("too far out"). */
  reason?: string;
  figures: readonly BarFigure[];
  /** Element id of the full results, for the "Details" link. */
  resultsId: string;
  /** Why there is no result (a field to correct); replaces verdict and figures. */
  missing?: string | null;
}

export function ResultBar({ tone, reason, figures, resultsId, missing }: ResultBarProps) {
  const more = (
    <a class="result-bar-more" href={`#${resultsId}`}>
      Details<span class="visually-hidden"> of the result</span> ↓
    </a>
  );
  // The link sits on the verdict's line (the bar stays short on a phone), else after the figures.
  const verdict = !missing && tone;
  return (
    <div class={`result-bar${verdict ? ` result-bar--${tone}` : ""}`} role="group" aria-label="Result summary" data-result-bar>
      {verdict && (
        <strong class="result-bar-verdict" data-bar="verdict">
          {STATUS_WORDS[STATUS_OF_TONE[tone]]}
          {reason ? `: ${reason}` : ""}
        </strong>
      )}
      {verdict && more}
      {missing ? (
        <span class="result-bar-missing">{missing}</span>
      ) : (
        figures.map((f) => (
          <span class="result-bar-figure" key={f.name}>
            <span class="result-bar-label">{f.label}</span> <span data-bar={f.name}>{f.value}</span>
          </span>
        ))
      )}
      {!verdict && more}
    </div>
  );
}
