/**
 * The designs saved in this browser, as stored: a list of { id, design } under one key, with the
 * active design's id. This module reads and writes the stored JSON without judging the designs
 * (that is calc/design/design.ts, which knows every calculator), so that saving one calculator's
 * values loads nothing of the others. All functions take the Storage, so tests pass their own.
 */

export const STORE_KEY = "whirlbook.designs.v1";

/** A design as stored: its header and sections as plain JSON, not yet read. */
export type StoredDesign = Record<string, unknown> & { name?: unknown };

export interface RawEntry {
  id: string;
  design: StoredDesign;
}

export interface RawStore {
  designs: RawEntry[];
  activeId: string | null;
}

/** The store as saved, or null when there is none or it is not JSON of the expected shape. */
export function readRawStore(storage: Storage): RawStore | null {
  const text = storage.getItem(STORE_KEY);
  if (text === null) return { designs: [], activeId: null };
  try {
    const parsed = JSON.parse(text) as { designs?: unknown; activeId?: unknown };
    if (!Array.isArray(parsed.designs)) return null;
    const designs = parsed.designs.filter(
      (e): e is RawEntry =>
        typeof e === "object" &&
        e !== null &&
        typeof (e as RawEntry).id === "string" &&
        typeof (e as RawEntry).design === "object" &&
        (e as RawEntry).design !== null,
    );
    return { designs, activeId: typeof parsed.activeId === "string" ? parsed.activeId : null };
  } catch {
    return null;
  }
}

export function writeRawStore(storage: Storage, store: RawStore): void {
  storage.setItem(STORE_KEY, JSON.stringify(store));
}

export function newId(): string {
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
}
