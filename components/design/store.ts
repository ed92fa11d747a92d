/**
 * The build sheet's view of the designs saved in this browser (components/design/saved.ts stores
 * them): each stored design read and checked as a design file is. A stored design that cannot be
 * read is kept aside once and taken out of the list; one whose values had to be reset is listed,
 * with what was reset said in words, and its stored original kept aside once.
 */
import { describeProblems, readDesign, type Design } from "../../calc/design/design.ts";
import { designKey, keepAside, migrateLegacy, parseRecord, storedIds } from "./saved.ts";

export interface SavedDesign {
  /** Local id, stable for the life of the entry. */
  id: string;
  /** The stored revision this copy was read from. */
  rev: number;
  design: Design;
}

/** Reads one stored design: null when there is none; otherwise the design, or why it is not listed, and what was reset. */
export function loadOne(storage: Storage, id: string): { saved: SavedDesign | null; messages: string[] } {
  const text = storage.getItem(designKey(id));
  const record = parseRecord(id, text);
  if (record === null || text === null) return { saved: null, messages: [] };
  const reading = record === "unreadable" ? null : readDesign(record.design);
  if (!reading?.ok) {
    // Kept aside once (the key is the data's checksum), then taken out of the list of designs.
    if (keepAside(storage, text)) {
      storage.removeItem(designKey(id));
      return { saved: null, messages: ["A saved design could not be read; a copy of the stored data was kept aside in this browser."] };
    }
    return { saved: null, messages: ["A saved design could not be read, and the storage is too full to keep a copy aside; it was left as it was."] };
  }
  const messages: string[] = [];
  if (reading.problems.length) {
    const kept = keepAside(storage, text) ? " The stored original was kept aside in this browser." : "";
    messages.push(
      `In the saved design “${reading.design.name}”, some values could not be read and were reset (saving it again keeps the reset values):${kept}`,
      ...describeProblems(reading.problems),
    );
  }
  return { saved: { id, rev: (record as { rev: number }).rev, design: reading.design }, messages };
}

/** Reads every stored design (moving a store of the first version first), oldest first. */
export function loadStore(storage: Storage): { designs: SavedDesign[]; messages: string[] } {
  const messages = migrateLegacy(storage);
  const designs: SavedDesign[] = [];
  for (const id of storedIds(storage)) {
    const one = loadOne(storage, id);
    messages.push(...one.messages);
    if (one.saved) designs.push(one.saved);
  }
  designs.sort((a, b) => (a.design.created < b.design.created ? -1 : a.design.created > b.design.created ? 1 : a.id < b.id ? -1 : 1));
  return { designs, messages };
}
