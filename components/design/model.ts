/**
 * The build sheet's model: the saved designs of this browser, the design on screen (saved, opened
 * from a link, imported from a file, or the demo), its checks, and every action on them. Each write
 * touches one design and names the revision it was made from; a design changed in another tab is
 * read again (`storage` events), and a write that would overwrite such a change is refused and
 * said in words, with both versions kept. Nothing is shown as saved that was not; the demo never
 * changes (saving it makes a named copy); a save or a deletion can be undone.
 */
import { batch, computed, effect, signal } from "../calc-ui/reactive.ts";
import { describeProblems, newDesign, readDesignText, designToText, type Design } from "../../calc/design/design.ts";
import { type CheckResult, overallStatus, runChecksWith } from "../../calc/design/checks.ts";
import { FORMS, loadCalculators } from "../../calc/design/registry.ts";
import type { AnyCalculator } from "../../calc/core/calculator.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import type { FragmentReading } from "./share.ts";
import {
  ACTIVE_KEY,
  DEMO_KEY,
  DESIGN_PREFIX,
  faultMessage,
  keptAside,
  newId,
  put,
  removeDesign,
  UNDO_PREFIX,
  undoLastSave,
  undoSteps,
  uniqueName,
  writeDesign,
  type Fault,
  type StoredDesign,
} from "./saved.ts";
import { loadOne, loadStore, type SavedDesign } from "./store.ts";

export type Origin = "saved" | "link" | "file" | "demo" | "new";

export interface OnScreen {
  design: Design;
  origin: Origin;
  /** Id of the saved design it is, when origin is "saved". */
  id: string | null;
  /** The stored revision it was read from or last written as, when saved. */
  rev: number;
}

/** A file or link design that has the same name as a saved one: the user chooses. */
export interface Conflict {
  design: Design;
  existingId: string;
}

/** A change on screen that was not saved because the stored design changed first (another tab). */
export interface StaleWrite {
  mine: Design;
  id: string;
}

/** The name a copy of the demo takes. */
export const DEMO_COPY_NAME = "Demo copy";

/**
 * The model starts as the page is rendered at build time: no saved designs, the demo on screen.
 * `loadSaved` then reads this browser's storage, once the page is live: the first render in the
 * browser must match the build's markup, which the browser adopts instead of drawing it again.
 */
/**
 * The demo design and its cards in each unit system, computed when the site is built: the page
 * carries them as data, and needs neither the code that builds the demo nor any check's code to
 * show it.
 */
export type PreparedDemo = Readonly<Record<UnitSystem, readonly CheckResult[]> & { design: Design }>;

export function createBuildSheetModel(storage: Storage | Fault | null, prepared: PreparedDemo) {
  /** A fresh copy of the demo design (it is plain data). */
  const demoDesign = (): Design => structuredClone(prepared.design);
  const designs = signal<SavedDesign[]>([]);
  const current = signal<OnScreen>({ design: demoDesign(), origin: "demo", id: null, rev: 0 });
  const messages = signal<string[]>([]);
  const problems = signal<string[]>([]);
  const conflict = signal<Conflict | null>(null);
  const stale = signal<StaleWrite | null>(null);
  const undo = signal<{ entry: SavedDesign; index: number } | null>(null);
  /** The last save of the design on screen that can be undone, by its label. */
  const lastSave = signal<string | null>(null);
  const status = signal("");
  /** Unreadable data kept aside in this browser: how many items, how many characters. */
  const aside = signal({ count: 0, size: 0 });
  const store = typeof storage === "object" && storage !== null ? storage : null;

  /** The checks' code loaded so far, by section: only the sections a design on screen holds. */
  const loaded = signal<ReadonlyMap<string, AnyCalculator>>(new Map());
  /** The sections of the design on screen whose check code is still loading. */
  /** Set when a check's code could not be fetched (offline before the site was cached, a broken deploy). */
  const loadFailed = signal(false);
  const pending = computed(() => {
    const { design, origin } = current.value;
    if (origin === "demo" || loadFailed.value) return [];
    return FORMS.filter((f) => design[f.id] !== undefined && !loaded.value.has(f.id)).map((f) => f.id);
  });
  const results = computed((): readonly CheckResult[] => {
    const { design, origin } = current.value;
    // The demo's sections never change on this page (saving makes a copy): its cards come with the page.
    if (origin === "demo") return prepared[design.units];
    const calculators = FORMS.map((f) => (design[f.id] === undefined ? undefined : loaded.value.get(f.id))).filter((c) => c !== undefined);
    return runChecksWith(calculators, design, design.units);
  });
  if (typeof window !== "undefined") {
    effect(() => {
      const wanted = pending.value;
      if (wanted.length === 0) return;
      loadCalculators(wanted).then(
        (list) => {
          loaded.value = new Map([...loaded.peek(), ...list.map((c) => [c.id, c] as const)]);
        },
        () => {
          batch(() => {
            loadFailed.value = true;
            say("Some checks could not be loaded (the page's code did not arrive): reload the page when this device is online.");
          });
        },
      );
    });
  }
  const overall = computed(() => overallStatus(results.value));
  const say = (...lines: string[]) => {
    messages.value = [...messages.value, ...lines];
  };

  function refreshLastSave(): void {
    const id = current.value.origin === "saved" ? current.value.id : null;
    lastSave.value = store && id ? (undoSteps(store, id).at(-1)?.label ?? null) : null;
  }

  function show(design: Design, origin: Origin, id: string | null = null, rev = 0): void {
    batch(() => {
      current.value = { design, origin, id, rev };
      undo.value = null;
      stale.value = null;
      refreshLastSave();
    });
  }

  function setListed(entry: SavedDesign): void {
    const list = designs.value;
    designs.value = list.some((d) => d.id === entry.id) ? list.map((d) => (d.id === entry.id ? entry : d)) : [...list, entry];
  }

  /**
   * Writes one design (made from revision `fromRev`, null for a new one). On success lists and
   * returns it; otherwise says why (storage full or off, or changed elsewhere) and returns null.
   */
  function write(id: string, design: Design, fromRev: number | null, undoLabel: string | null): SavedDesign | null {
    if (!store) {
      say(faultMessage(storage === "full" ? "full" : "disabled"));
      status.value = "";
      return null;
    }
    const outcome = writeDesign(store, id, design as StoredDesign, fromRev, undoLabel);
    if (outcome.ok) {
      const entry = { id, rev: outcome.record.rev, design };
      setListed(entry);
      if (!outcome.undoKept) say("Saved, but the storage is too full to keep this save for undo.");
      return entry;
    }
    status.value = "";
    if (outcome.reason === "conflict") {
      stale.value = { mine: design, id };
      reread(id);
    } else say(faultMessage(outcome.reason));
    return null;
  }

  /** Reads the designs saved in this browser, and says what could not be read or was reset. */
  function loadSaved(): void {
    if (!store) return;
    const loaded = loadStore(store);
    batch(() => {
      designs.value = loaded.designs;
      if (loaded.messages.length) say(...loaded.messages);
      countAside();
    });
  }

  function countAside(): void {
    const texts = store ? Object.values(keptAside(store)) : [];
    aside.value = { count: texts.length, size: texts.reduce((n, t) => n + t.length, 0) };
  }

  /** The data kept aside, as one JSON text for a file. */
  const asideText = () => `${JSON.stringify(store ? keptAside(store) : {}, null, 2)}\n`;

  /** Deletes the data kept aside (after it has been downloaded, or when it is not wanted), to make room. */
  function dropAside(): void {
    if (!store) return;
    for (const key of Object.keys(keptAside(store))) store.removeItem(key);
    countAside();
    status.value = "Deleted the unreadable data kept aside.";
  }

  /** Reads one design again (another tab wrote it); the design on screen follows, and says so. */
  function reread(id: string): void {
    if (!store) return;
    const { saved, messages: lines } = loadOne(store, id);
    batch(() => {
      if (saved) setListed(saved);
      else designs.value = designs.value.filter((d) => d.id !== id);
      const on = current.value;
      if (on.origin !== "saved" || on.id !== id) return;
      if (!saved) {
        current.value = { ...on, origin: "new", id: null, rev: 0 };
        status.value = `“${on.design.name}” was deleted in another tab. It is still shown here: save it to keep it.`;
      } else if (saved.rev !== on.rev) {
        current.value = { design: saved.design, origin: "saved", id, rev: saved.rev };
        status.value = `“${saved.design.name}” was changed in another tab; this sheet shows the latest (revision ${saved.rev}).`;
        if (lines.length) say(...lines);
      }
      refreshLastSave();
    });
  }

  /** What another tab wrote: re-read the design it touched (or everything, when storage was cleared). */
  function onStorage(key: string | null): void {
    if (key === null) {
      designs.value = [];
      loadSaved();
      const on = current.value;
      if (on.origin === "saved" && on.id) reread(on.id);
    } else if (key.startsWith(DESIGN_PREFIX)) reread(key.slice(DESIGN_PREFIX.length));
    else if (key.startsWith(UNDO_PREFIX)) refreshLastSave();
  }

  /**
   * Opens what the page was linked to: #d1.… (a shared design), #demo, or the active saved design.
   * The link codec (with its compression library) loads only when a link carries a design.
   */
  async function openFromLocation(hash: string): Promise<void> {
    const shared: FragmentReading = /^#d\d/.test(hash) ? (await import("./share.ts")).designFromFragment(hash) : { kind: "none" };
    if (shared.kind === "broken") {
      say(shared.message);
    } else if (shared.kind === "design") {
      if (shared.reading.ok) {
        show(shared.reading.design, "link");
        problems.value = describeProblems(shared.reading.problems);
        return;
      }
      say(`This link's design cannot be read: ${describeProblems(shared.reading.problems).join(" ")}`);
    }
    if (hash === "#demo") return show(demoDesign(), "demo");
    const wanted = store?.getItem(ACTIVE_KEY);
    const active = designs.value.find((d) => d.id === wanted) ?? designs.value.at(-1);
    if (active) show(active.design, "saved", active.id, active.rev);
    else show(demoDesign(), "demo");
  }

  /** Saves the design on screen as a new entry (the demo as a named copy; a name already used asks). */
  function saveCurrent(): void {
    const { design, origin, id } = current.value;
    if (origin === "saved" && id) return;
    if (origin === "demo") {
      // A name typed over the demo's is the builder's; otherwise the copy is called "Demo copy".
      const name = uniqueName(
        designs.value.map((d) => d.design.name),
        design.name === demoDesign().name ? DEMO_COPY_NAME : design.name,
      );
      if (addToStore({ ...design, name }))
        status.value = `The demo itself never changes: saved a copy of it as “${name}”. Changes from here on go into the copy.`;
      return;
    }
    const existing = designs.value.find((d) => d.design.name === design.name);
    if (existing) {
      conflict.value = { design, existingId: existing.id };
      return;
    }
    if (addToStore(design)) status.value = `Saved “${design.name}” in this browser.`;
  }

  function addToStore(design: Design): SavedDesign | null {
    const stamp = new Date().toISOString();
    const entry = write(newId(), { ...design, created: stamp, modified: stamp }, null, `Saved “${design.name}”`);
    if (!entry) return null;
    if (store) put(store, ACTIVE_KEY, entry.id);
    show(entry.design, "saved", entry.id, entry.rev);
    return entry;
  }

  /** Resolves a name conflict: replace the saved design (the replaced one can be undone), keep both, or cancel. */
  function resolveConflict(choice: "replace" | "both" | "cancel"): void {
    const c = conflict.value;
    conflict.value = null;
    if (!c || choice === "cancel") return;
    if (choice === "both") {
      const name = uniqueName(
        designs.value.map((d) => d.design.name),
        c.design.name,
      );
      if (addToStore({ ...c.design, name })) status.value = `Saved “${name}” in this browser.`;
      return;
    }
    const existing = designs.value.find((d) => d.id === c.existingId);
    if (!existing) return;
    const entry = write(
      existing.id,
      { ...c.design, created: existing.design.created, modified: new Date().toISOString() },
      existing.rev,
      `Replaced “${c.design.name}”`,
    );
    if (!entry) return;
    show(entry.design, "saved", entry.id, entry.rev);
    status.value = `Replaced the saved “${entry.design.name}”. Undo last save puts the old one back.`;
  }

  /** Edits the design on screen (name, notes, units); a saved one is saved at once. */
  function edit(change: Partial<Pick<Design, "name" | "notes" | "units">>): void {
    const { design, origin, id, rev } = current.value;
    const next = { ...design, ...change, modified: new Date().toISOString() };
    current.value = { design: next, origin, id, rev };
    if (origin !== "saved" || !id || stale.value) return;
    const entry = write(id, next, rev, null);
    if (entry) current.value = { design: next, origin, id, rev: entry.rev };
  }

  /** After a refused write: show the stored (latest) version, dropping the change on screen. */
  function takeTheirs(): void {
    const s = stale.value;
    stale.value = null;
    const latest = s && designs.value.find((d) => d.id === s.id);
    if (latest) show(latest.design, "saved", latest.id, latest.rev);
    else if (s) current.value = { ...current.value, origin: "new", id: null, rev: 0 };
  }

  /** After a refused write: keep the change on screen as a new design beside the stored one. */
  function keepMineAsCopy(): void {
    const s = stale.value;
    if (!s) return;
    const name = uniqueName(
      designs.value.map((d) => d.design.name),
      `${s.mine.name} (this tab)`,
    );
    stale.value = null;
    if (addToStore({ ...s.mine, name })) status.value = `Saved this tab's version as “${name}”, beside the other tab's.`;
  }

  function open(id: string): void {
    const entry = designs.value.find((d) => d.id === id);
    if (!entry) return;
    if (store) put(store, ACTIVE_KEY, id);
    show(entry.design, "saved", id, entry.rev);
    problems.value = [];
  }

  function duplicate(id: string): void {
    const entry = designs.value.find((d) => d.id === id);
    if (!entry) return;
    const stamp = new Date().toISOString();
    const name = uniqueName(
      designs.value.map((d) => d.design.name),
      `${entry.design.name} (copy)`,
    );
    if (write(newId(), { ...entry.design, name, created: stamp, modified: stamp }, null, `Duplicated as “${name}”`)) status.value = `Duplicated as “${name}”.`;
  }

  function remove(id: string): void {
    const index = designs.value.findIndex((d) => d.id === id);
    if (index < 0 || !store) return;
    const entry = designs.value[index]!;
    removeDesign(store, id);
    designs.value = designs.value.filter((d) => d.id !== id);
    if (current.value.id === id) current.value = { ...current.value, origin: "new", id: null, rev: 0 };
    undo.value = { entry, index };
    refreshLastSave();
    status.value = `Deleted “${entry.design.name}”.`;
  }

  function undoRemove(): void {
    const u = undo.value;
    if (!u) return;
    const entry = write(u.entry.id, u.entry.design, null, null);
    if (!entry) return;
    designs.value = [
      ...designs.value.filter((d) => d.id !== entry.id).slice(0, u.index),
      entry,
      ...designs.value.filter((d) => d.id !== entry.id).slice(u.index),
    ];
    undo.value = null;
    show(entry.design, "saved", entry.id, entry.rev);
    status.value = `Restored “${entry.design.name}”.`;
  }

  /** Undoes the last save into the design on screen (from a calculator, or a replacement). */
  function undoSave(): void {
    const { id, design } = current.value;
    if (!store || !id) return;
    const outcome = undoLastSave(store, id);
    if (!outcome.ok) {
      say(outcome.message);
      return;
    }
    if (outcome.record === null) {
      designs.value = designs.value.filter((d) => d.id !== id);
      current.value = { ...current.value, origin: "new", id: null, rev: 0 };
      lastSave.value = null;
      status.value = `Undone: ${outcome.label}. “${design.name}” is no longer saved in this browser; it is still shown here.`;
      return;
    }
    reread(id);
    status.value = `Undone: ${outcome.label}.`;
  }

  function startNew(from: "empty" | "demo"): void {
    const names = designs.value.map((d) => d.design.name);
    const design = from === "demo" ? { ...demoDesign(), name: uniqueName(names, DEMO_COPY_NAME) } : newDesign(uniqueName(names, "New robot"));
    show(design, "new");
    problems.value = [];
  }

  /** Reads a file's text; shows what was wrong; never replaces a saved design without asking. */
  function importText(text: string, fileName: string): void {
    const reading = readDesignText(text);
    if (!reading.ok) {
      problems.value = [];
      messages.value = [`${fileName} could not be opened: ${describeProblems(reading.problems).join(" ")}`];
      return;
    }
    messages.value =
      reading.migratedFrom !== null ? [`${fileName} was written by an older version (${reading.migratedFrom}) and has been brought up to date.`] : [];
    problems.value = describeProblems(reading.problems);
    show(reading.design, "file");
    status.value = `Opened ${fileName}. It is not saved in this browser until you save it.`;
  }

  /** Before a calculator opens from the demo: leaves the demo where that page can copy it from (one key). */
  function handOverDemo(): void {
    if (store && current.value.origin === "demo") put(store, DEMO_KEY, JSON.stringify(current.value.design));
  }

  const fileText = () => designToText(current.value.design);
  const fragment = async () => (await import("./share.ts")).designToFragment(current.value.design);

  return {
    designs,
    current,
    results,
    pending,
    overall,
    messages,
    problems,
    conflict,
    stale,
    undo,
    lastSave,
    status,
    loadSaved,
    onStorage,
    openFromLocation,
    saveCurrent,
    resolveConflict,
    edit,
    takeTheirs,
    keepMineAsCopy,
    open,
    duplicate,
    remove,
    undoRemove,
    undoSave,
    startNew,
    importText,
    handOverDemo,
    fileText,
    fragment,
    aside,
    asideText,
    dropAside,
  };
}

export type BuildSheetModel = ReturnType<typeof createBuildSheetModel>;
