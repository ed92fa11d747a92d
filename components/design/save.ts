/**
 * "Save to design" on a calculator page: writes one calculator's values into one design saved in
 * this browser, and says exactly where. Loaded only when the button is pressed (or when the page
 * was opened from the build sheet, to say where saves go), with nothing of the other calculators.
 *
 * Where a save goes is kept in the page's link, beside the calculator's own keys:
 * `save.to` (a design's id, or `demo`), `save.in` (the section it was opened on), `save.entry` (its
 * entry, for list sections) and `save.title` (the section's name, for the line that tells). A page
 * opened from the build sheet carries them; on a plain visit the first save asks once, in a dialog,
 * and writes them. The demo never changes: saving into it makes a named copy first. A save that
 * would overwrite a change made elsewhere since this page read the entry asks first.
 */
import type { AnyForm, AnyValues } from "../../calc/core/calculator.ts";
import { newDesign } from "../../calc/design/format.ts";
import {
  ACTIVE_KEY,
  browserStorage,
  DEMO_KEY,
  faultMessage,
  migrateLegacy,
  put,
  newId,
  readRecord,
  storedIds,
  uniqueName,
  writeDesign,
  type RawRecord,
  type StoredDesign,
} from "./saved.ts";

/** Where saves from this page go, as its link says. */
interface Target {
  to: string | null;
  section: string | null;
  entry: number | null;
  title: string | null;
}

function targetInLink(): Target {
  const params = new URLSearchParams(window.location.search);
  const entry = Number(params.get("save.entry") ?? Number.NaN);
  return {
    to: params.get("save.to"),
    section: params.get("save.in"),
    entry: Number.isInteger(entry) && entry >= 0 ? entry : null,
    title: params.get("save.title"),
  };
}

function setTargetInLink(id: string, calc: AnyForm, entry: number | null): void {
  const params = new URLSearchParams(window.location.search);
  for (const key of [...params.keys()]) if (key.startsWith("save.")) params.delete(key);
  params.set("save.to", id);
  params.set("save.in", calc.id);
  if (entry !== null) params.set("save.entry", String(entry));
  params.set("save.title", calc.title);
  window.history.replaceState(window.history.state, "", `${window.location.pathname}?${params}${window.location.hash}`);
}

/**
 * The demo design as the build sheet left it when it opened this page (components/design/model.ts
 * writes it on "Open in the calculator"), so that this page copies it without loading its code.
 */
function demoSnapshot(storage: Storage): StoredDesign | null {
  try {
    const parsed = JSON.parse(storage.getItem(DEMO_KEY) ?? "null");
    return typeof parsed === "object" && parsed !== null && !Array.isArray(parsed) ? parsed : null;
  } catch {
    return null;
  }
}

/** Each design as this page last read or wrote it, to tell a change made elsewhere since. */
const seen = new Map<string, StoredDesign>();

const listOf = (design: StoredDesign, section: string): AnyValues[] => (Array.isArray(design[section]) ? (design[section] as AnyValues[]) : []);
const nameOf = (value: unknown, fallback: string) => (typeof value === "string" ? value : fallback);
const entryLabel = (calc: AnyForm, entry: AnyValues | undefined, index: number) =>
  nameOf(entry?.name, calc.section.kind === "list" ? `${calc.section.entryName} ${index + 1}` : calc.title);

/** The stored designs, oldest first, with their names (designs that cannot be read are left out). */
function storedDesigns(storage: Storage): RawRecord[] {
  const out: RawRecord[] = [];
  for (const id of storedIds(storage)) {
    const record = readRecord(storage, id);
    if (record && record !== "unreadable") out.push(record);
  }
  return out.sort((a, b) => String(a.design.created).localeCompare(String(b.design.created)));
}

/**
 * The line that says where saves go ("Saving into: “Robot” › “Weapon bolts”"), or null when this
 * page does not know yet. Remembers the design as read now, to tell a later change elsewhere.
 */
export async function describeTarget(): Promise<string | null> {
  const { to, section, entry, title } = targetInLink();
  const storage = browserStorage();
  if (!to || !section) return null;
  let design: StoredDesign;
  if (to === "demo") {
    const demo = typeof storage === "string" ? null : demoSnapshot(storage);
    if (!demo) return "Opened from the demo design; “Save to design” will ask where to save.";
    design = demo;
  } else {
    const record = typeof storage === "string" ? null : readRecord(storage, to);
    if (!record || record === "unreadable")
      return "The design this page was opened from is not saved in this browser; “Save to design” will ask where to save.";
    design = record.design;
    seen.set(to, record.design);
  }
  const what = entry === null ? (title ?? "this calculator") : nameOf(listOf(design, section)[entry]?.name, `entry ${entry + 1}`);
  const name = nameOf(design.name, "Unnamed robot");
  return to === "demo" ? `Saving into: a copy of “${name}” › “${what}” (the demo itself never changes).` : `Saving into: “${name}” › “${what}”.`;
}

// ---------------------------------------------------------------------------------------------
// A small modal dialog, built from the page's own elements and styles (site.css: .save-dialog).

type Child = Node | string | null | false;

function el<K extends keyof HTMLElementTagNameMap>(tag: K, props: Record<string, string | boolean> = {}, ...children: Child[]): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [key, value] of Object.entries(props)) {
    if (value === false) continue;
    node.setAttribute(key, value === true ? "" : value);
  }
  for (const child of children) if (child) node.append(child);
  return node;
}

let dialogs = 0;

/** Shows a modal dialog with `body` and buttons; resolves to the value of the button pressed ("" for Escape). */
function ask(title: string, body: Child[], buttons: [value: string, label: string][]): Promise<{ value: string; form: HTMLFormElement }> {
  dialogs += 1;
  const id = `save-dialog-${dialogs}`;
  const form = el(
    "form",
    { method: "dialog" },
    el("h2", { id }, title),
    ...body,
    el(
      "p",
      { class: "save-dialog-actions" },
      ...buttons.map(([value, label], i) =>
        el("button", { type: "submit", value, class: i === 0 ? "button" : "button button--quiet", formnovalidate: i > 0 }, label),
      ),
    ),
  );
  const dialog = el("dialog", { class: "save-dialog", "aria-labelledby": id }, form);
  document.body.append(dialog);
  return new Promise((resolve) => {
    dialog.addEventListener("close", () => {
      dialog.remove();
      resolve({ value: dialog.returnValue, form });
    });
    dialog.showModal();
  });
}

function radio(name: string, value: string, label: string, checked: boolean, extra?: HTMLElement): HTMLElement {
  const input = el("input", { type: "radio", name, value, checked });
  // Typing a name chooses what it names.
  extra?.addEventListener("focus", () => {
    input.checked = true;
    input.dispatchEvent(new Event("change", { bubbles: true }));
  });
  return el("div", { class: "save-dialog-choice" }, el("label", {}, input, ` ${label}`), extra ?? null);
}

/** Asks which design (and which entry) to save into; null when cancelled. */
async function chooseTarget(
  storage: Storage,
  calc: AnyForm,
  note: string | null,
): Promise<{ record: RawRecord | null; name: string; entry: number | null; entryName: string } | null> {
  const designs = storedDesigns(storage);
  const newName = uniqueName(
    designs.map((d) => nameOf(d.design.name, "")),
    "My robot",
  );
  const isList = calc.section.kind === "list";
  const entryBox = el("fieldset", { class: "save-dialog-entries" });
  const replaces = el("p", { class: "save-dialog-note", "aria-live": "polite" });
  const designRadios = el(
    "fieldset",
    {},
    el("legend", {}, "Design"),
    ...designs.map((d, i) => radio("design", d.id, nameOf(d.design.name, "Unnamed robot"), i === designs.length - 1)),
    radio(
      "design",
      "",
      "A new design, named:",
      designs.length === 0,
      el("input", { type: "text", name: "design-name", value: newName, maxlength: "80", "aria-label": "Name of the new design" }),
    ),
  );
  const chosen = () => designs.find((d) => d.id === (designRadios.querySelector("input:checked") as HTMLInputElement | null)?.value) ?? null;
  const fill = () => {
    const record = chosen();
    const list = record ? listOf(record.design, calc.id) : [];
    if (isList) {
      const section = calc.section as { entryName: string };
      const next = uniqueName(
        list.map((e, i) => entryLabel(calc, e, i)),
        `${section.entryName} ${list.length + 1}`,
      );
      entryBox.replaceChildren(
        el("legend", {}, `${calc.title}: which entry?`),
        ...list.map((e, i) => radio("entry", String(i), `Replace “${entryLabel(calc, e, i)}”`, false)),
        radio(
          "entry",
          "new",
          "A new entry, named:",
          true,
          el("input", { type: "text", name: "entry-name", value: next, maxlength: "80", "aria-label": "Name of the new entry" }),
        ),
      );
    }
    replaces.textContent =
      !isList && record?.design[calc.id] !== undefined
        ? `“${nameOf(record.design.name, "")}” already holds ${calc.title} values: saving replaces them (you can undo it from the build sheet).`
        : "";
  };
  designRadios.addEventListener("change", fill);
  fill();
  const { value, form } = await ask(
    `Save ${calc.title} into which design?`,
    [note ? el("p", { class: "save-dialog-note" }, note) : null, designRadios, isList && entryBox, replaces],
    [
      ["save", "Save"],
      ["cancel", "Cancel"],
    ],
  );
  if (value !== "save") return null;
  const data = new FormData(form);
  const record = chosen();
  const entryChoice = String(data.get("entry") ?? "new");
  const entry = isList && entryChoice !== "new" ? Number(entryChoice) : null;
  const list = record ? listOf(record.design, calc.id) : [];
  return {
    record,
    name: String(data.get("design-name") ?? "").trim() || newName,
    entry,
    entryName:
      entry === null
        ? String(data.get("entry-name") ?? "").trim() || `${(calc.section as { entryName?: string }).entryName ?? calc.title} ${list.length + 1}`
        : "",
  };
}

// ---------------------------------------------------------------------------------------------

/**
 * Puts `values` into a copy of `design`: the section's values, or the list entry `entry` (its name
 * kept), or a new entry named `entryName`. A message instead when the list is full.
 */
function withValues(
  design: StoredDesign,
  calc: AnyForm,
  values: AnyValues,
  entry: number | null,
  entryName: string,
): { design: StoredDesign; entry: number | null } | string {
  const next: StoredDesign = { ...design, modified: new Date().toISOString() };
  if (calc.section.kind === "single") {
    next[calc.id] = values;
    return { design: next, entry: null };
  }
  const list = [...listOf(design, calc.id)];
  if (entry !== null && entry < list.length) {
    list[entry] = { name: entryLabel(calc, list[entry], entry), ...values };
  } else {
    if (list.length >= calc.section.max)
      return `Not saved: ${calc.title} in “${nameOf(design.name, "")}” already holds ${list.length} entries, the most a design keeps. Choose an entry to replace, or delete one on the build sheet.`;
    list.push({ name: entryName || `${calc.section.entryName} ${list.length + 1}`, ...values });
    entry = list.length - 1;
  }
  next[calc.id] = list;
  return { design: next, entry };
}

const pick = (design: StoredDesign | undefined, calc: AnyForm, entry: number | null) =>
  JSON.stringify(entry === null ? design?.[calc.id] : listOf(design ?? {}, calc.id)[entry]);

/** Saves `values` where this page saves (asking once where that is); resolves to the message for the page. */
export async function saveFromPage(calc: AnyForm, values: AnyValues): Promise<string> {
  const storage = browserStorage();
  if (typeof storage === "string") return faultMessage(storage);
  // Designs saved by the first version move to their own keys before anything is listed or written.
  migrateLegacy(storage);
  const target = targetInLink();
  const entryHere = target.section === calc.id ? target.entry : null;
  let record: RawRecord | null = null;
  let entry: number | null = entryHere;
  let entryName = "";
  let created = "";
  let note: string | null = null;

  const demo = target.to === "demo" ? demoSnapshot(storage) : null;
  if (demo) {
    const name = uniqueName(
      storedDesigns(storage).map((d) => nameOf(d.design.name, "")),
      "Demo copy",
    );
    const stamp = new Date().toISOString();
    record = { id: newId(), rev: 0, design: { ...demo, name, created: stamp, modified: stamp } };
    created = `The demo itself never changes: saved into a new copy of it, “${name}”. `;
  } else if (target.to === "demo") {
    note = "This page was opened from the demo design, which this browser no longer holds a copy of. Choose where to save.";
  } else if (target.to) {
    const found = readRecord(storage, target.to);
    if (found === "unreadable") return "Not saved: the design this page saves into cannot be read. Open the build sheet to see why.";
    if (found) record = found;
    else note = "The design this page was opened from is no longer saved in this browser (deleted, or saved in another browser). Choose where to save.";
  }
  if (!record) {
    const choice = await chooseTarget(storage, calc, note);
    if (!choice) return "Not saved: no design was chosen.";
    const stamp = new Date().toISOString();
    record = choice.record ?? { id: newId(), rev: 0, design: { ...newDesign(choice.name), created: stamp } as StoredDesign };
    entry = choice.entry;
    entryName = choice.entryName;
    if (choice.record) seen.set(record.id, record.design);
  }

  // A change made elsewhere (another tab) to this entry since this page read it is never overwritten unasked.
  const before = seen.get(record.id);
  if (record.rev > 0 && before && pick(before, calc, entry) !== pick(record.design, calc, entry)) {
    const label = entry === null ? calc.title : `“${entryLabel(calc, listOf(record.design, calc.id)[entry], entry ?? 0)}”`;
    const { value } = await ask(
      `${calc.title} was changed elsewhere`,
      [
        el(
          "p",
          {},
          `${label} in “${nameOf(record.design.name, "")}” was changed after this page read it (in another tab, or on the build sheet). Saving here would replace that change.`,
        ),
      ],
      [...(calc.section.kind === "list" ? [["new", "Save as a new entry"] as [string, string]] : []), ["replace", "Replace it"], ["cancel", "Cancel"]],
    );
    if (value === "new") entry = null;
    else if (value !== "replace") return "Not saved: the other change was kept.";
  }

  const updated = withValues(record.design, calc, values, entry, entryName);
  if (typeof updated === "string") return updated;
  const finalName = entryLabel(calc, listOf(updated.design, calc.id)[updated.entry ?? 0], updated.entry ?? 0);
  const what = updated.entry === null ? calc.title : `“${finalName}”`;
  const outcome = writeDesign(
    storage,
    record.id,
    updated.design,
    record.rev === 0 ? null : record.rev,
    `${calc.title}${updated.entry === null ? "" : ` › ${finalName}`} saved from its calculator`,
  );
  if (!outcome.ok) {
    if (outcome.reason === "conflict") return "Not saved: the design was changed in another tab at the same moment. Press “Save to design” again to see it.";
    return faultMessage(outcome.reason);
  }
  seen.set(record.id, updated.design);
  setTargetInLink(record.id, calc, updated.entry);
  // The build sheet opens on the design saved into last.
  put(storage, ACTIVE_KEY, record.id);
  const undo = outcome.undoKept ? " You can undo it from the build sheet." : " (The storage is too full to keep it for undo.)";
  return `${created}Saved into “${nameOf(updated.design.name, "")}” › ${what} (revision ${outcome.record.rev}).${undo}`;
}
