/**
 * Saved designs in this browser (localStorage). A storage entry that cannot be read is kept aside,
 * never silently thrown away. All functions take the Storage, so tests pass their own.
 */
import { readDesign, type Design } from "../../calc/design/design.ts";

import { newId, STORE_KEY } from "./saved.ts";

export { newId, STORE_KEY };

export interface SavedDesign {
  /** Local id, stable for the life of the entry. */
  id: string;
  design: Design;
}

export interface DesignStore {
  designs: SavedDesign[];
  /** The design the build sheet and "Save to design" use. */
  activeId: string | null;
}

/** Reads the store; a damaged store is moved to a backup key and reported, not discarded. */
export function loadStore(storage: Storage): { store: DesignStore; warning: string | null } {
  const raw = storage.getItem(STORE_KEY);
  if (raw === null) return { store: { designs: [], activeId: null }, warning: null };
  try {
    const parsed = JSON.parse(raw) as { designs?: unknown; activeId?: unknown };
    const designs: SavedDesign[] = [];
    let dropped = 0;
    for (const entry of Array.isArray(parsed.designs) ? parsed.designs : []) {
      const e = entry as { id?: unknown; design?: unknown };
      const reading = readDesign(e.design);
      if (typeof e.id === "string" && reading.ok) designs.push({ id: e.id, design: reading.design });
      else dropped += 1;
    }
    const activeId = typeof parsed.activeId === "string" && designs.some((d) => d.id === parsed.activeId) ? parsed.activeId : (designs[0]?.id ?? null);
    if (dropped > 0) storage.setItem(`${STORE_KEY}.unreadable.${Date.now()}`, raw);
    return {
      store: { designs, activeId },
      warning: dropped > 0 ? `${dropped} saved design(s) could not be read; a copy of the stored data was kept aside in this browser.` : null,
    };
  } catch {
    storage.setItem(`${STORE_KEY}.unreadable.${Date.now()}`, raw);
    storage.removeItem(STORE_KEY);
    return {
      store: { designs: [], activeId: null },
      warning: "The saved designs in this browser could not be read; a copy of the stored data was kept aside.",
    };
  }
}

export function saveStore(storage: Storage, store: DesignStore): void {
  storage.setItem(STORE_KEY, JSON.stringify(store));
}

/** A name not yet used in the store: "Robot", "Robot (2)", … */
export function uniqueName(store: DesignStore, wanted: string): string {
  const names = new Set(store.designs.map((d) => d.design.name));
  if (!names.has(wanted)) return wanted;
  for (let n = 2; ; n += 1) if (!names.has(`${wanted} (${n})`)) return `${wanted} (${n})`;
}
