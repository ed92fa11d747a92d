/**
 * A calculator's verdict line above its results, in the handbook's words: "Holds.", "Marginal: thin
 * margin." or "Fails: too far out." (the word, then the reason in a few words), then the detail.
 * The words come from calc/core/check.ts, as on the result bar, the build sheet and the command line.
 */
import type { ComponentChildren } from "preact";
import { STATUS_WORDS } from "../../calc/core/check.ts";

/** The verdict's tone: Holds, Marginal, Fails, or a figure for information. */
export type VerdictTone = "ok" | "warn" | "bad" | "info";

const WORD = { ok: STATUS_WORDS.holds, warn: STATUS_WORDS.marginal, bad: STATUS_WORDS.fails, info: STATUS_WORDS.info };

export interface VerdictProps {
  tone: VerdictTone;
  /** The reason in a few words, lower case ("too far out"); none when the word says it all. */
  reason?: string;
  /** `data-out` name of the line, for tests and people. */
  out?: string;
  children?: ComponentChildren;
}

export function Verdict({ tone, reason, out, children }: VerdictProps) {
  return (
    <p class={`verdict verdict--${tone}`} data-out={out}>
      <strong>
        {WORD[tone]}
        {reason ? `: ${reason}` : ""}.
      </strong>{" "}
      {children}
    </p>
  );
}
