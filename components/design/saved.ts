/**
 * The designs saved in this browser, as stored: one localStorage key per design
 * (`whirlbook.design.<id>` → { id, rev, design }), so that a write touches one design and never the
 * others. Every write names the revision it was made from and is refused when the stored one has
 * moved on (another tab saved in between): nothing is overwritten unseen. Each save keeps what it
 * changed (`whirlbook.undo.<id>`), so it can be undone from the build sheet. Data that cannot be
 * read is kept aside once, under a key named by its checksum (`whirlbook.unreadable.<sum>`).
 *
 * This module reads and writes JSON without judging the designs (that is calc/design/design.ts,
 * which knows every calculator), so that saving one calculator's values loads nothing of the
 * others. All functions take the Storage, so tests pass their own.
 */

/** The store of the first version: every design under one key. Read once, moved to per-design keys. */
export const LEGACY_KEY = "whirlbook.designs.v1";
export const DESIGN_PREFIX = "whirlbook.design.";
export const UNDO_PREFIX = "whirlbook.undo.";
export const ASIDE_PREFIX = "whirlbook.unreadable.";
/** The design the build sheet shows on a visit without a link. */
export const ACTIVE_KEY = "whirlbook.active";
/** The demo design, as the build sheet last opened a calculator from it (one key, rewritten each time). */
export const DEMO_KEY = "whirlbook.demo";
/** Saves kept for undo per design. */
export const UNDO_DEPTH = 10;

/** A design as stored: its header and sections as plain JSON, not yet read. */
export type StoredDesign = Record<string, unknown> & { name?: unknown };

export interface RawRecord {
  id: string;
  /** Counts the writes of this design: 1 for the first. */
  rev: number;
  design: StoredDesign;
}

/** What a save changed: each top-level key's value before and after (null: absent). */
export interface UndoStep {
  label: string;
  at: string;
  before: Record<string, unknown>;
  after: Record<string, unknown>;
  /** The save made the design: undoing it deletes the design. */
  created?: boolean;
}

/** Why a write did not happen. */
export type Fault = "full" | "disabled" | "refused";

export type WriteOutcome =
  | { ok: true; record: RawRecord; undoKept: boolean }
  | { ok: false; reason: Fault }
  | { ok: false; reason: "conflict"; current: RawRecord | null };

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** Tells a full store from storage that is turned off. */
export function faultOf(error: unknown): Fault {
  const name = (error as { name?: unknown })?.name;
  const code = (error as { code?: unknown })?.code;
  if (name === "QuotaExceededError" || name === "NS_ERROR_DOM_QUOTA_REACHED" || code === 22 || code === 1014) return "full";
  if (name === "SecurityError" || error instanceof TypeError) return "disabled";
  return "refused";
}

/** What to tell the builder when a write failed, with the way out. */
export function faultMessage(fault: Fault): string {
  if (fault === "full")
    return "Not saved: this browser's storage for this site is full. Make room on the build sheet: export the designs you want to keep (Export file), then delete them or others you no longer need, and save again.";
  if (fault === "disabled")
    return "Not saved: this browser does not let this site store data (storage is turned off, or blocked in this window). Export the design to a file to keep it.";
  return "Not saved: this browser refused to store the design. Export the design to a file to keep it.";
}

/** The browser's storage, or the reason there is none. */
export function browserStorage(): Storage | Fault {
  try {
    const storage = globalThis.localStorage;
    if (!storage) return "disabled";
    storage.getItem(ACTIVE_KEY);
    return storage;
  } catch (error) {
    return faultOf(error) === "full" ? "full" : "disabled";
  }
}

/** Writes one key; the fault instead of throwing. */
export function put(storage: Storage, key: string, text: string): Fault | null {
  try {
    storage.setItem(key, text);
    return null;
  } catch (error) {
    return faultOf(error);
  }
}

/** FNV-1a, 32 bits, as 8 hex digits: names data kept aside, so the same data is kept once. */
export function checksum(text: string): string {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash.toString(16).padStart(8, "0");
}

/** Keeps `text` aside, once: nothing is written when the same text is already kept. True when it is kept. */
export function keepAside(storage: Storage, text: string): boolean {
  const key = `${ASIDE_PREFIX}${checksum(text)}.${text.length}`;
  if (storage.getItem(key) === text) return true;
  return put(storage, key, text) === null;
}

/** What is kept aside, by key: the unreadable texts, as stored. */
export function keptAside(storage: Storage): Record<string, string> {
  const out: Record<string, string> = {};
  for (let i = 0; i < storage.length; i += 1) {
    const key = storage.key(i);
    if (key?.startsWith(ASIDE_PREFIX)) out[key] = storage.getItem(key) ?? "";
  }
  return out;
}

export const designKey = (id: string) => `${DESIGN_PREFIX}${id}`;

/** The ids of the designs stored, in no particular order. */
export function storedIds(storage: Storage): string[] {
  const ids: string[] = [];
  for (let i = 0; i < storage.length; i += 1) {
    const key = storage.key(i);
    if (key?.startsWith(DESIGN_PREFIX)) ids.push(key.slice(DESIGN_PREFIX.length));
  }
  return ids;
}

/** Reads a stored record: null when there is none, "unreadable" when its text is not a record. */
export function parseRecord(id: string, text: string | null): RawRecord | null | "unreadable" {
  if (text === null) return null;
  try {
    const parsed = JSON.parse(text) as Partial<RawRecord>;
    if (isObject(parsed) && parsed.id === id && Number.isInteger(parsed.rev) && isObject(parsed.design)) return parsed as RawRecord;
  } catch {}
  return "unreadable";
}

export const readRecord = (storage: Storage, id: string) => parseRecord(id, storage.getItem(designKey(id)));

/** The saves that can be undone for a design, oldest first. */
export function undoSteps(storage: Storage, id: string): UndoStep[] {
  try {
    const parsed = JSON.parse(storage.getItem(`${UNDO_PREFIX}${id}`) ?? "[]");
    return Array.isArray(parsed) ? parsed.filter(isObject).map((s) => s as unknown as UndoStep) : [];
  } catch {
    return [];
  }
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * Writes a design made from revision `fromRev` (null: a new design that must not exist yet). Refused
 * with the stored record when that has moved on. `undoLabel` keeps what changed for undo.
 */
export function writeDesign(storage: Storage, id: string, design: StoredDesign, fromRev: number | null, undoLabel: string | null): WriteOutcome {
  const current = readRecord(storage, id);
  const currentRev = current === null ? null : current === "unreadable" ? -1 : current.rev;
  if (currentRev !== fromRev) return { ok: false, reason: "conflict", current: current === "unreadable" ? null : current };
  const record: RawRecord = { id, rev: (fromRev ?? 0) + 1, design };
  const fault = put(storage, designKey(id), JSON.stringify(record));
  if (fault) return { ok: false, reason: fault };
  let undoKept = true;
  if (undoLabel !== null) {
    const before: Record<string, unknown> = {};
    const after: Record<string, unknown> = {};
    const old = current && current !== "unreadable" ? current.design : {};
    for (const key of new Set([...Object.keys(old), ...Object.keys(design)])) {
      if (key === "modified" || same(old[key], design[key])) continue;
      before[key] = old[key] ?? null;
      after[key] = design[key] ?? null;
    }
    const step: UndoStep = { label: undoLabel, at: new Date().toISOString(), before, after, ...(current === null ? { created: true } : {}) };
    const steps = [...(current === null ? [] : undoSteps(storage, id)), step].slice(-UNDO_DEPTH);
    undoKept = put(storage, `${UNDO_PREFIX}${id}`, JSON.stringify(steps)) === null;
  }
  return { ok: true, record, undoKept };
}

/**
 * Undoes the last save of a design: puts back what it changed, when nothing has changed those
 * values since. Returns the new record, a fault, or why it cannot be undone.
 */
export function undoLastSave(storage: Storage, id: string): { ok: true; record: RawRecord | null; label: string } | { ok: false; message: string } {
  const steps = undoSteps(storage, id);
  const step = steps.at(-1);
  const current = readRecord(storage, id);
  if (!step || !current || current === "unreadable") return { ok: false, message: "There is no save of this design to undo." };
  for (const [key, value] of Object.entries(step.after)) {
    if (!same(current.design[key] ?? null, value))
      return { ok: false, message: `Cannot undo “${step.label}”: it has been changed again since (perhaps in another tab). Nothing was changed.` };
  }
  if (step.created) {
    removeDesign(storage, id);
    return { ok: true, record: null, label: step.label };
  }
  const design: StoredDesign = { ...current.design, modified: new Date().toISOString() };
  for (const [key, value] of Object.entries(step.before)) {
    if (value === null) delete design[key];
    else design[key] = value;
  }
  const record: RawRecord = { id, rev: current.rev + 1, design };
  const fault = put(storage, designKey(id), JSON.stringify(record)) ?? put(storage, `${UNDO_PREFIX}${id}`, JSON.stringify(steps.slice(0, -1)));
  if (fault) return { ok: false, message: faultMessage(fault) };
  return { ok: true, record, label: step.label };
}

/** Removes a design and its undo steps. */
export function removeDesign(storage: Storage, id: string): void {
  storage.removeItem(designKey(id));
  storage.removeItem(`${UNDO_PREFIX}${id}`);
}

/**
 * Moves the store of the first version (every design under one key) to one key per design, without
 * loss: each entry is written before the old key goes; an entry that is not a design is kept aside;
 * when the storage fills up half-way, the old key keeps the entries not yet moved and the next
 * load goes on. Returns what to tell the builder (nothing when there was nothing to move).
 */
export function migrateLegacy(storage: Storage): string[] {
  const text = storage.getItem(LEGACY_KEY);
  if (text === null) return [];
  let parsed: { designs?: unknown; activeId?: unknown };
  try {
    parsed = JSON.parse(text);
    if (!isObject(parsed)) throw new Error("not an object");
  } catch {
    if (!keepAside(storage, text)) return [faultMessage("full").replace("Not saved", "The saved designs could not be read nor kept aside")];
    storage.removeItem(LEGACY_KEY);
    return ["The saved designs in this browser could not be read; a copy of the stored data was kept aside."];
  }
  const messages: string[] = [];
  let remaining = Array.isArray(parsed.designs) ? [...parsed.designs] : [];
  let asideCount = 0;
  let shrunk = false;
  while (remaining.length) {
    const entry = remaining[0] as { id?: unknown; design?: unknown };
    let fault: Fault | null = null;
    if (typeof entry?.id === "string" && entry.id && isObject(entry.design)) {
      if (storage.getItem(designKey(entry.id)) === null)
        fault = put(storage, designKey(entry.id), JSON.stringify({ id: entry.id, rev: 1, design: entry.design }));
    } else if (keepAside(storage, JSON.stringify(entry))) asideCount += 1;
    else fault = "full";
    if (fault === null) {
      remaining = remaining.slice(1);
      shrunk = false;
      continue;
    }
    // Full half-way: give the old key only what is still to move, which frees room, and try again once.
    if (shrunk || put(storage, LEGACY_KEY, JSON.stringify({ ...parsed, designs: remaining }))) {
      messages.push(`${remaining.length} saved design(s) could not be moved to the new store: ${faultMessage(fault).replace(/^Not saved: /, "")}`);
      return messages;
    }
    shrunk = true;
  }
  if (typeof parsed.activeId === "string" && storage.getItem(ACTIVE_KEY) === null) put(storage, ACTIVE_KEY, parsed.activeId);
  storage.removeItem(LEGACY_KEY);
  if (asideCount) messages.push(`${asideCount} saved design(s) could not be read; a copy of the stored data was kept aside in this browser.`);
  return messages;
}

export function newId(): string {
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
}

/** A name not used by `names`: "Robot", "Robot (2)", … */
export function uniqueName(names: Iterable<string>, wanted: string): string {
  const taken = new Set(names);
  if (!taken.has(wanted)) return wanted;
  for (let n = 2; ; n += 1) if (!taken.has(`${wanted} (${n})`)) return `${wanted} (${n})`;
}
