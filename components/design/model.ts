/**
 * The build sheet's model: the saved designs of this browser, the design on screen (saved, opened
 * from a link, imported from a file, or the demo), its checks, and every action on them. Nothing
 * overwrites a saved design without asking; a deletion can be undone.
 */
import { batch, computed, signal } from "../calc-ui/reactive.ts";
import { describeProblems, newDesign, readDesignText, designToText, type Design } from "../../calc/design/design.ts";
import { runChecks, overallStatus } from "../../calc/design/checks.ts";
import { demoDesign } from "../../calc/design/demo.ts";
import type { FragmentReading } from "./share.ts";
import { loadStore, newId, saveStore, uniqueName, type DesignStore, type SavedDesign } from "./store.ts";

export type Origin = "saved" | "link" | "file" | "demo" | "new";

export interface OnScreen {
  design: Design;
  origin: Origin;
  /** Id of the saved design it is, when origin is "saved". */
  id: string | null;
}

/** A file or link design that has the same name as a saved one: the user chooses. */
export interface Conflict {
  design: Design;
  existingId: string;
}

/**
 * The model starts as the page is rendered at build time: no saved designs, the demo on screen.
 * `loadSaved` then reads this browser's storage, once the page is live: the first render in the
 * browser must match the build's markup, which the browser adopts instead of drawing it again.
 */
export function createBuildSheetModel(storage: Storage | null) {
  const store = signal<DesignStore>({ designs: [], activeId: null });
  const current = signal<OnScreen>({ design: demoDesign(), origin: "demo", id: null });
  const messages = signal<string[]>([]);
  const problems = signal<string[]>([]);
  const conflict = signal<Conflict | null>(null);
  const undo = signal<{ entry: SavedDesign; index: number } | null>(null);
  const status = signal("");

  const results = computed(() => runChecks(current.value.design, current.value.design.units));
  const overall = computed(() => overallStatus(results.value));

  function persist(next: DesignStore): void {
    store.value = next;
    if (storage) {
      try {
        saveStore(storage, next);
      } catch {
        messages.value = [...messages.value, "This browser refused to save (storage full or disabled); export the design to a file to keep it."];
      }
    }
  }

  /** Reads the designs saved in this browser, and says so when some could not be read. */
  function loadSaved(): void {
    if (!storage) return;
    const { store: saved, warning } = loadStore(storage);
    batch(() => {
      store.value = saved;
      if (warning) messages.value = [...messages.value, warning];
    });
  }

  function show(design: Design, origin: Origin, id: string | null = null): void {
    batch(() => {
      current.value = { design, origin, id };
      undo.value = null;
    });
  }

  /**
   * Opens what the page was linked to: #d1.… (a shared design), #demo, or the active saved design.
   * The link codec (with its compression library) loads only when a link carries a design.
   */
  async function openFromLocation(hash: string): Promise<void> {
    const shared: FragmentReading = /^#d\d/.test(hash) ? (await import("./share.ts")).designFromFragment(hash) : { kind: "none" };
    if (shared.kind === "broken") {
      messages.value = [...messages.value, shared.message];
    } else if (shared.kind === "design") {
      if (shared.reading.ok) {
        show(shared.reading.design, "link");
        problems.value = describeProblems(shared.reading.problems);
        return;
      }
      messages.value = [...messages.value, `This link's design cannot be read: ${describeProblems(shared.reading.problems).join(" ")}`];
    }
    if (hash === "#demo") return show(demoDesign(), "demo");
    const active = store.value.designs.find((d) => d.id === store.value.activeId);
    if (active) show(active.design, "saved", active.id);
    else show(demoDesign(), "demo");
  }

  /** Saves the design on screen as a new entry (or into its own entry when it is a saved one). */
  function saveCurrent(): void {
    const { design, origin, id } = current.value;
    if (origin === "saved" && id) return;
    const existing = store.value.designs.find((d) => d.design.name === design.name);
    if (existing) {
      conflict.value = { design, existingId: existing.id };
      return;
    }
    addToStore(design);
  }

  function addToStore(design: Design): void {
    const entry: SavedDesign = { id: newId(), design: { ...design, modified: new Date().toISOString() } };
    persist({ designs: [...store.value.designs, entry], activeId: entry.id });
    show(entry.design, "saved", entry.id);
    status.value = `Saved “${entry.design.name}” in this browser.`;
  }

  /** Resolves a name conflict: replace the saved design, keep both, or cancel. */
  function resolveConflict(choice: "replace" | "both" | "cancel"): void {
    const c = conflict.value;
    conflict.value = null;
    if (!c || choice === "cancel") return;
    if (choice === "both") {
      addToStore({ ...c.design, name: uniqueName(store.value, c.design.name) });
      return;
    }
    const design = { ...c.design, modified: new Date().toISOString() };
    persist({ designs: store.value.designs.map((d) => (d.id === c.existingId ? { id: d.id, design } : d)), activeId: c.existingId });
    show(design, "saved", c.existingId);
    status.value = `Replaced the saved “${design.name}”.`;
  }

  /** Edits the design on screen (name, notes, units); a saved one is saved at once. */
  function edit(change: Partial<Pick<Design, "name" | "notes" | "units">>): void {
    const { design, origin, id } = current.value;
    const next = { ...design, ...change, modified: new Date().toISOString() };
    current.value = { design: next, origin, id };
    if (origin === "saved" && id) persist({ ...store.value, designs: store.value.designs.map((d) => (d.id === id ? { id, design: next } : d)) });
  }

  function open(id: string): void {
    const entry = store.value.designs.find((d) => d.id === id);
    if (!entry) return;
    persist({ ...store.value, activeId: id });
    show(entry.design, "saved", id);
    problems.value = [];
  }

  function duplicate(id: string): void {
    const entry = store.value.designs.find((d) => d.id === id);
    if (!entry) return;
    const stamp = new Date().toISOString();
    const copy: SavedDesign = {
      id: newId(),
      design: { ...entry.design, name: uniqueName(store.value, `${entry.design.name} (copy)`), created: stamp, modified: stamp },
    };
    persist({ ...store.value, designs: [...store.value.designs, copy] });
    status.value = `Duplicated as “${copy.design.name}”.`;
  }

  function remove(id: string): void {
    const index = store.value.designs.findIndex((d) => d.id === id);
    if (index < 0) return;
    const entry = store.value.designs[index]!;
    const designs = store.value.designs.filter((d) => d.id !== id);
    persist({ designs, activeId: store.value.activeId === id ? (designs[0]?.id ?? null) : store.value.activeId });
    if (current.value.id === id) current.value = { ...current.value, origin: "new", id: null };
    undo.value = { entry, index };
    status.value = `Deleted “${entry.design.name}”.`;
  }

  function undoRemove(): void {
    const u = undo.value;
    if (!u) return;
    const designs = [...store.value.designs];
    designs.splice(Math.min(u.index, designs.length), 0, u.entry);
    persist({ designs, activeId: u.entry.id });
    undo.value = null;
    show(u.entry.design, "saved", u.entry.id);
    status.value = `Restored “${u.entry.design.name}”.`;
  }

  function startNew(from: "empty" | "demo"): void {
    const design = from === "demo" ? { ...demoDesign(), name: uniqueName(store.value, "Demo copy") } : newDesign(uniqueName(store.value, "New robot"));
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

  const fileText = () => designToText(current.value.design);
  const fragment = async () => (await import("./share.ts")).designToFragment(current.value.design);

  return {
    store,
    current,
    results,
    overall,
    messages,
    problems,
    conflict,
    undo,
    status,
    loadSaved,
    openFromLocation,
    saveCurrent,
    resolveConflict,
    edit,
    open,
    duplicate,
    remove,
    undoRemove,
    startNew,
    importText,
    fileText,
    fragment,
  };
}

export type BuildSheetModel = ReturnType<typeof createBuildSheetModel>;
