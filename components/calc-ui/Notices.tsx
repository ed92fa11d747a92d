/** Plain-text notices about a link that was read (ignored parameters and the like). */
import type { Signal } from "./reactive.ts";

export function Notices({ notices }: { notices: Signal<string[]> }) {
  if (notices.value.length === 0) return null;
  return (
    <div class="calc-notices" role="status">
      <p>Some parts of the link were not used:</p>
      <ul>
        {notices.value.map((notice, index) => (
          <li key={index}>{notice}</li>
        ))}
      </ul>
      <button type="button" class="button button--quiet" onClick={() => (notices.value = [])}>
        Dismiss
      </button>
    </div>
  );
}
