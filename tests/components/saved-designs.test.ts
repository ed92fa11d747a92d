/**
 * Designs saved in the browser: one key per design with a revision, the store of the first version
 * moved without loss, unreadable data kept aside once, undo of each save, and a full or disabled
 * storage told apart and never shown as saved.
 */
import { preparedDemo } from "../support/prepared-demo.ts";
import { describe, expect, it } from "vitest";
import { demoDesign, designToText } from "../../calc/index.ts";
import { createBuildSheetModel } from "../../components/design/model.ts";
import {
  ACTIVE_KEY,
  ASIDE_PREFIX,
  designKey,
  faultMessage,
  faultOf,
  LEGACY_KEY,
  migrateLegacy,
  readRecord,
  undoLastSave,
  uniqueName,
  writeDesign,
  type StoredDesign,
} from "../../components/design/saved.ts";
import { loadStore } from "../../components/design/store.ts";
import { MemoryStorage } from "../support/memory-storage.ts";

const stored = (name: string): StoredDesign => JSON.parse(designToText({ ...demoDesign(), name }));
const asideKeys = (storage: MemoryStorage) => storage.keys().filter((k) => k.startsWith(ASIDE_PREFIX));

function legacyStore(storage: Storage, designs: unknown[], activeId: string | null = null) {
  storage.setItem(LEGACY_KEY, JSON.stringify({ designs, activeId }));
}

describe("the store of the first version (one key for every design)", () => {
  it("moves each design to its own key without loss, keeps the active one, and removes the old key", () => {
    const storage = new MemoryStorage();
    const a = stored("Alpha");
    const b = stored("Beta");
    legacyStore(
      storage,
      [
        { id: "a", design: a },
        { id: "b", design: b },
      ],
      "b",
    );
    expect(migrateLegacy(storage)).toEqual([]);
    expect(storage.getItem(LEGACY_KEY)).toBeNull();
    expect(readRecord(storage, "a")).toEqual({ id: "a", rev: 1, design: a });
    expect(readRecord(storage, "b")).toEqual({ id: "b", rev: 1, design: b });
    expect(storage.getItem(ACTIVE_KEY)).toBe("b");
    const { designs, messages } = loadStore(storage);
    expect(designs.map((d) => d.design.name).sort()).toEqual(["Alpha", "Beta"]);
    expect(messages).toEqual([]);
  });

  it("keeps an entry that is not a design aside, once, and says so", () => {
    const storage = new MemoryStorage();
    legacyStore(storage, [{ id: "a", design: stored("Alpha") }, { id: 7 }]);
    expect(migrateLegacy(storage)).toEqual(["1 saved design(s) could not be read; a copy of the stored data was kept aside in this browser."]);
    expect(asideKeys(storage)).toHaveLength(1);
    expect(JSON.parse(storage.getItem(asideKeys(storage)[0]!)!)).toEqual({ id: 7 });
  });

  it("moves a store that fills the quota half-way by shrinking the old key as it goes, losing nothing", () => {
    const designs = ["A", "B", "C", "D"].map((n) => ({ id: n, design: { ...stored(n), notes: n.repeat(3000) } }));
    const text = JSON.stringify({ designs, activeId: "A" });
    // Room for the old key and a little more: not for every design twice.
    const storage = new MemoryStorage(LEGACY_KEY.length + text.length + 8000);
    storage.setItem(LEGACY_KEY, text);
    expect(migrateLegacy(storage)).toEqual([]);
    for (const d of designs) expect(readRecord(storage, d.id)).toEqual({ id: d.id, rev: 1, design: d.design });
    expect(storage.getItem(LEGACY_KEY)).toBeNull();
  });

  it("keeps an unreadable old store aside once: loading it again writes nothing more", () => {
    const storage = new MemoryStorage();
    storage.setItem(LEGACY_KEY, "{not json");
    expect(loadStore(storage).messages).toEqual(["The saved designs in this browser could not be read; a copy of the stored data was kept aside."]);
    expect(asideKeys(storage)).toHaveLength(1);
    expect(storage.getItem(asideKeys(storage)[0]!)).toBe("{not json");
    const writes = storage.writes;
    loadStore(storage);
    expect(storage.writes).toBe(writes);
  });
});

describe("a stored design that cannot be read, or holds values out of range", () => {
  it("is kept aside once and taken out of the list: a hundred loads do not grow the storage", () => {
    const storage = new MemoryStorage();
    storage.setItem(designKey("good"), JSON.stringify({ id: "good", rev: 1, design: stored("Good") }));
    storage.setItem(designKey("bad"), "{oops");
    const first = loadStore(storage);
    expect(first.designs.map((d) => d.design.name)).toEqual(["Good"]);
    expect(first.messages).toEqual(["A saved design could not be read; a copy of the stored data was kept aside in this browser."]);
    const used = storage.used;
    for (let i = 0; i < 100; i += 1) loadStore(storage);
    expect(storage.used).toBe(used);
    expect(asideKeys(storage)).toHaveLength(1);
  });

  it("reports each value reset to its default in the field's words, and keeps the stored original aside once", () => {
    const storage = new MemoryStorage();
    const design = stored("Odd");
    (design.placement as Record<string, unknown>).radius = -1;
    const text = JSON.stringify({ id: "odd", rev: 3, design });
    storage.setItem(designKey("odd"), text);
    const { designs, messages } = loadStore(storage);
    expect(designs[0]!.rev).toBe(3);
    expect(messages[0]).toContain("In the saved design “Odd”, some values could not be read and were reset");
    expect(messages).toContain(
      "Accelerometer placement (placement.radius): Sensor radius must be greater than 0 mm and at most 2000 mm (got -1000 mm); the default, 20 mm, was used.",
    );
    expect(asideKeys(storage).map((k) => storage.getItem(k))).toEqual([text]);
    loadStore(storage);
    expect(asideKeys(storage)).toHaveLength(1);
    // The stored design itself is left as it was until it is saved again.
    expect(storage.getItem(designKey("odd"))).toBe(text);
  });
});

describe("writing a design", () => {
  it("touches only that design's key and counts its revisions", () => {
    const storage = new MemoryStorage();
    expect(writeDesign(storage, "a", stored("A"), null, null)).toMatchObject({ ok: true, record: { rev: 1 } });
    expect(writeDesign(storage, "b", stored("B"), null, null)).toMatchObject({ ok: true, record: { rev: 1 } });
    const b = storage.getItem(designKey("b"));
    expect(writeDesign(storage, "a", stored("A2"), 1, null)).toMatchObject({ ok: true, record: { rev: 2 } });
    expect(storage.getItem(designKey("b"))).toBe(b);
  });

  it("refuses a write made from an older revision (another tab saved in between), and leaves the stored one", () => {
    const storage = new MemoryStorage();
    writeDesign(storage, "a", stored("A"), null, null);
    writeDesign(storage, "a", stored("A by the other tab"), 1, null);
    const outcome = writeDesign(storage, "a", stored("A by this tab"), 1, null);
    expect(outcome).toMatchObject({ ok: false, reason: "conflict", current: { rev: 2 } });
    expect((readRecord(storage, "a") as { design: StoredDesign }).design.name).toBe("A by the other tab");
    // A new design may not take the id of one that exists.
    expect(writeDesign(storage, "a", stored("X"), null, null)).toMatchObject({ ok: false, reason: "conflict" });
  });

  it("says “storage is full” and writes nothing when the quota is reached; tells a disabled storage apart", () => {
    const storage = new MemoryStorage(2000);
    const outcome = writeDesign(storage, "a", stored("A"), null, "Saved");
    expect(outcome).toEqual({ ok: false, reason: "full" });
    expect(storage.length).toBe(0);
    expect(faultMessage("full")).toContain("storage for this site is full");
    expect(faultMessage("full")).toContain("export the designs you want to keep");
    expect(faultOf(new DOMException("x", "QuotaExceededError"))).toBe("full");
    expect(faultOf(new DOMException("x", "SecurityError"))).toBe("disabled");
    expect(faultMessage("disabled")).toContain("does not let this site store data");
  });
});

describe("undoing a save", () => {
  const withBolts = (design: StoredDesign, count: number) => ({
    ...design,
    fasteners: (design.fasteners as Record<string, unknown>[]).map((f, i) => (i === 0 ? { ...f, count } : f)),
  });

  it("puts back what the save changed, and keeps later changes to other values", () => {
    const storage = new MemoryStorage();
    const original = stored("A");
    writeDesign(storage, "a", original, null, null);
    writeDesign(storage, "a", withBolts(original, 2), 1, "Fasteners › 1 saved");
    // A rename after the save (the build sheet) stays when the save is undone.
    const renamed = { ...withBolts(original, 2), name: "Renamed" };
    writeDesign(storage, "a", renamed, 2, null);
    expect(undoLastSave(storage, "a")).toMatchObject({ ok: true, label: "Fasteners › 1 saved", record: { rev: 4 } });
    const after = (readRecord(storage, "a") as { design: StoredDesign }).design;
    expect(after.fasteners).toEqual(original.fasteners);
    expect(after.name).toBe("Renamed");
    expect(undoLastSave(storage, "a")).toEqual({ ok: false, message: "There is no save of this design to undo." });
  });

  it("refuses to undo a save whose values were changed again since, and changes nothing", () => {
    const storage = new MemoryStorage();
    const original = stored("A");
    writeDesign(storage, "a", original, null, null);
    writeDesign(storage, "a", withBolts(original, 2), 1, "Fasteners › 1 saved");
    writeDesign(storage, "a", withBolts(original, 3), 2, null);
    const text = storage.getItem(designKey("a"));
    expect(undoLastSave(storage, "a")).toMatchObject({ ok: false, message: expect.stringContaining("has been changed again since") });
    expect(storage.getItem(designKey("a"))).toBe(text);
  });

  it("undoes the save that made a design by deleting it", () => {
    const storage = new MemoryStorage();
    writeDesign(storage, "a", stored("A"), null, "Saved “A”");
    expect(undoLastSave(storage, "a")).toMatchObject({ ok: true, record: null });
    expect(storage.length).toBe(0);
  });
});

describe("the build sheet's model", () => {
  it("saves the demo as a named copy and never changes the demo", () => {
    const storage = new MemoryStorage();
    const model = createBuildSheetModel(storage, preparedDemo());
    model.loadSaved();
    model.saveCurrent();
    expect(model.designs.value.map((d) => d.design.name)).toEqual(["Demo copy"]);
    expect(model.status.value).toContain("The demo itself never changes: saved a copy of it as “Demo copy”");
    expect(demoDesign().name).toBe("Demo: invented 1.4 kg whole-body spinner");
    model.startNew("demo");
    expect(model.current.value.design.name).toBe("Demo copy (2)");
  });

  it("shows nothing as saved when the storage is full, and says so with the way out", () => {
    const storage = new MemoryStorage(100);
    const model = createBuildSheetModel(storage, preparedDemo());
    model.loadSaved();
    model.saveCurrent();
    expect(model.designs.value).toEqual([]);
    expect(model.current.value.origin).toBe("demo");
    expect(model.status.value).toBe("");
    expect(model.messages.value).toEqual([faultMessage("full")]);
  });

  it("says storage is turned off when there is none, apart from a full one", () => {
    const model = createBuildSheetModel("disabled", preparedDemo());
    model.saveCurrent();
    expect(model.messages.value).toEqual([faultMessage("disabled")]);
  });

  it("does not save over a change another tab made first: it shows theirs and keeps this tab's as a copy on request", () => {
    const storage = new MemoryStorage();
    const model = createBuildSheetModel(storage, preparedDemo());
    model.loadSaved();
    model.saveCurrent();
    const id = model.current.value.id!;
    // Another tab renames it; its storage event has not arrived yet.
    writeDesign(storage, id, { ...(readRecord(storage, id) as { design: StoredDesign }).design, name: "Theirs" }, 1, null);
    model.edit({ name: "Mine" });
    expect(model.stale.value?.mine.name).toBe("Mine");
    expect(model.current.value.design.name).toBe("Theirs");
    expect((readRecord(storage, id) as { design: StoredDesign }).design.name).toBe("Theirs");
    model.keepMineAsCopy();
    expect(model.designs.value.map((d) => d.design.name).sort()).toEqual(["Mine (this tab)", "Theirs"]);
  });

  it("follows a design another tab changed (storage event) and says so", () => {
    const storage = new MemoryStorage();
    const model = createBuildSheetModel(storage, preparedDemo());
    model.loadSaved();
    model.saveCurrent();
    const id = model.current.value.id!;
    writeDesign(storage, id, { ...(readRecord(storage, id) as { design: StoredDesign }).design, name: "Renamed there" }, 1, null);
    model.onStorage(designKey(id));
    expect(model.current.value).toMatchObject({ id, rev: 2, design: { name: "Renamed there" } });
    expect(model.status.value).toContain("was changed in another tab");
  });

  it("picks names not yet used", () => {
    expect(uniqueName(["Robot", "Robot (2)"], "Robot")).toBe("Robot (3)");
    expect(uniqueName([], "Robot")).toBe("Robot");
  });
});
