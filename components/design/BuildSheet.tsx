/**
 * The build sheet: every check on one design at a glance, with the designs saved in this browser,
 * file export and import, a link that carries the whole design, and a print layout.
 */
import { useEffect, useMemo, useRef } from "preact/hooks";
import { useSignal } from "../calc-ui/reactive.ts";
import type { CheckResult } from "../../calc/design/checks.ts";
import { STATUS_MARKS, STATUS_WORDS } from "../../calc/core/check.ts";
import { linkFor } from "../../calc/core/calculator.ts";
import { FORMS, formFor } from "../../calc/design/registry.ts";
import type { AnyValues } from "../../calc/core/calculator.ts";
import { createBuildSheetModel, type BuildSheetModel, type PreparedDemo } from "./model.ts";
import { type PrintedInput, printedInputs } from "./print.ts";
import { browserStorage } from "./saved.ts";

const base = () => import.meta.env.BASE_URL.replace(/\/?$/, "/");

/** The print view's QR code module, loaded on the first print (see `preparePrint`). */
let printModule: typeof import("./print-qr.ts") | null = null;

/**
 * Fills the print view's QR code and date for the design on screen. Synchronous once the QR
 * module has loaded, so a print started with the browser's own command (beforeprint) gets it; the
 * first time, the module loads first and fills them when it arrives.
 */
function fillPrintBlock(block: HTMLElement | null, model: BuildSheetModel): boolean {
  if (!block || !printModule) return false;
  printModule.fillPrintBlock(block, model.current.value.design);
  return true;
}

async function preparePrint(block: HTMLElement | null, model: BuildSheetModel): Promise<void> {
  printModule ??= await import("./print-qr.ts");
  fillPrintBlock(block, model);
}

function CheckCard({ result, model, inputs }: { result: CheckResult; model: BuildSheetModel; inputs: PrintedInput[] | null }) {
  const design = model.current.value.design;
  const calc = formFor(result.section);
  const stored = design[result.section];
  const values = (result.index === null ? stored : (stored as AnyValues[] | undefined)?.[result.index]) as AnyValues | undefined;
  // The calculator opened from here saves back into this design and entry (the demo: into a copy).
  const { origin, id } = model.current.value;
  const target = origin === "saved" && id ? id : origin === "demo" ? "demo" : null;
  const into = target
    ? new URLSearchParams({
        "save.to": target,
        "save.in": result.section,
        ...(result.index === null ? { "save.title": calc?.title ?? result.title } : { "save.entry": String(result.index) }),
      })
    : "";
  const link = calc && values ? linkFor(calc, values, { system: design.units, existing: String(into) }) : null;
  return (
    <li class={`check check--${result.status}`} data-check={result.id}>
      <p class="check-head">
        <span class={`badge badge--${result.status}`}>
          <span aria-hidden="true">{STATUS_MARKS[result.status]}</span> {STATUS_WORDS[result.status]}
        </span>
        <strong class="check-title">{result.title}</strong>
        {result.figure ? (
          <span class="check-figure">
            {result.figure.label}: <b data-out={`${result.id}-figure`}>{result.figure.text}</b>
          </span>
        ) : null}
      </p>
      <p class="check-rule">
        <span class="check-label">Rule:</span> {result.rule}
      </p>
      <p class="check-margin">
        <span class="check-label">Result:</span> {result.margin}
      </p>
      {result.details.length ? (
        <ul class="check-details">
          {result.details.map((d) => (
            <li key={d.label}>
              {d.label}: {d.text}
            </li>
          ))}
        </ul>
      ) : null}
      {inputs?.length ? (
        <p class="check-inputs print-only">
          <span class="check-label">Inputs:</span>{" "}
          {inputs.map((input, i) => (
            <span key={input.label}>
              {i > 0 ? " · " : ""}
              {input.label} <b>{input.text}</b>
            </span>
          ))}
        </p>
      ) : null}
      {link ? (
        <p class="check-link no-print">
          <a href={`${base()}${link}`} onClick={model.handOverDemo} onAuxClick={model.handOverDemo}>
            Open in the calculator
          </a>
        </p>
      ) : null}
    </li>
  );
}

function Summary({ model }: { model: BuildSheetModel }) {
  const counts = { holds: 0, marginal: 0, fails: 0, info: 0 };
  for (const r of model.results.value) counts[r.status] += 1;
  const overall = model.overall.value;
  // The overall word leads, as on every calculator's verdict line: "Fails: at least one check fails."
  const text =
    overall === "empty"
      ? "Nothing to check yet"
      : `${STATUS_WORDS[overall]}: ${overall === "fails" ? "at least one check fails" : overall === "marginal" ? "everything holds or is marginal" : "every check holds"}`;
  return (
    <p class={`verdict verdict--${overall === "fails" ? "bad" : overall === "marginal" ? "warn" : "ok"}`} data-out="overall">
      <strong>{text}.</strong> {counts.holds} hold, {counts.marginal} marginal, {counts.fails} fail, {counts.info} for information.
    </p>
  );
}

/** Offers text as a file to save. */
function download(text: string, name: string): void {
  const a = document.createElement("a");
  a.href = URL.createObjectURL(new Blob([text], { type: "application/json" }));
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(a.href), 1000);
}

function DesignList({ model }: { model: BuildSheetModel }) {
  const designs = model.designs.value;
  return (
    <section class="designs no-print" aria-labelledby="designs-heading">
      <h2 id="designs-heading">Designs saved in this browser</h2>
      {designs.length === 0 ? <p>None yet. Save the design above to keep it here.</p> : null}
      <ul class="design-list">
        {designs.map((entry) => (
          <li key={entry.id} aria-current={entry.id === model.current.value.id ? "true" : undefined}>
            <span class="design-name">{entry.design.name}</span>
            <span class="design-date">changed {entry.design.modified.slice(0, 16).replace("T", " ")}</span>
            <span class="design-actions">
              <button type="button" class="button button--quiet" onClick={() => model.open(entry.id)} aria-label={`Open ${entry.design.name}`}>
                Open
              </button>
              <button type="button" class="button button--quiet" onClick={() => model.duplicate(entry.id)} aria-label={`Duplicate ${entry.design.name}`}>
                Duplicate
              </button>
              <button type="button" class="button button--quiet" onClick={() => model.remove(entry.id)} aria-label={`Delete ${entry.design.name}`}>
                Delete
              </button>
            </span>
          </li>
        ))}
      </ul>
      {model.aside.value.count ? (
        <p>
          {model.aside.value.count} unreadable item(s) kept aside in this browser ({Math.ceil(model.aside.value.size / 1024)} KB).{" "}
          <button type="button" class="button button--quiet" onClick={() => download(model.asideText(), "whirlbook-unreadable.json")}>
            Download them
          </button>{" "}
          <button type="button" class="button button--quiet" onClick={model.dropAside}>
            Delete them
          </button>
        </p>
      ) : null}
      {model.undo.value ? (
        <p class="undo" role="status">
          Deleted “{model.undo.value.entry.design.name}”.{" "}
          <button type="button" class="button" onClick={model.undoRemove}>
            Undo
          </button>
        </p>
      ) : null}
    </section>
  );
}

/** The inputs of the values a check was computed from, as the print view lists them. */
function inputsOf(result: CheckResult, design: BuildSheetModel["current"]["value"]["design"]): PrintedInput[] {
  const calc = formFor(result.section);
  const stored = design[result.section];
  const values = (result.index === null ? stored : (stored as AnyValues[] | undefined)?.[result.index]) as AnyValues | undefined;
  return calc && values ? printedInputs(calc, values, design.units) : [];
}

export interface BuildSheetProps {
  /** The demo design and its cards, computed when the site is built. */
  demo: PreparedDemo;
}

export default function BuildSheet({ demo }: BuildSheetProps) {
  const model = useMemo(() => createBuildSheetModel(typeof window === "undefined" ? null : browserStorage(), demo), []);
  const fileInput = useRef<HTMLInputElement>(null);
  const link = useSignal<string | null>(null);
  const printBlock = useRef<HTMLDivElement>(null);
  // The inputs under each check are drawn only for printing: the page's markup stays as light as before.
  const printing = useSignal(false);
  useEffect(() => {
    const beforePrint = () => {
      printing.value = true;
      if (!fillPrintBlock(printBlock.current, model)) void preparePrint(printBlock.current, model);
    };
    window.addEventListener("beforeprint", beforePrint);
    return () => window.removeEventListener("beforeprint", beforePrint);
  }, [model]);
  useEffect(() => {
    model.loadSaved();
    void model.openFromLocation(window.location.hash);
    const onHash = () => void model.openFromLocation(window.location.hash);
    // Another tab saved, deleted or undid: read that design again.
    const onStorage = (event: StorageEvent) => model.onStorage(event.key);
    window.addEventListener("hashchange", onHash);
    window.addEventListener("storage", onStorage);
    return () => {
      window.removeEventListener("hashchange", onHash);
      window.removeEventListener("storage", onStorage);
    };
  }, [model]);
  // Once a design is saved here, the address no longer points at the demo or a shared link:
  // reloading shows the saved design.
  useEffect(() => {
    if (model.current.value.origin === "saved" && window.location.hash) window.history.replaceState(window.history.state, "", window.location.pathname);
  }, [model.current.value.origin]);

  const { design, origin } = model.current.value;
  const presentSections = new Set(model.results.value.map((r) => r.section));
  const missing = FORMS.filter((c) => !presentSections.has(c.id) && !FORMS.some((o) => o.chapter === c.chapter && o.order < c.order));
  const originText: Record<typeof origin, string> = {
    saved: "Saved in this browser; changes are saved as you make them.",
    link: "Opened from a link; not saved in this browser yet.",
    file: "Opened from a file; not saved in this browser yet.",
    demo: "The demo design: an invented robot, for trying the build sheet. It never changes: saving, here or from a calculator, makes a copy.",
    new: "Not saved in this browser yet.",
  };

  async function copyLink() {
    const url = `${window.location.origin}${window.location.pathname}#${await model.fragment()}`;
    link.value = url;
    try {
      await navigator.clipboard.writeText(url);
      model.status.value = `Link copied (${url.length} characters).`;
    } catch {
      model.status.value = "Copy the selected link below.";
    }
  }

  function exportFile() {
    const name = `${design.name.replace(/[^\w.-]+/g, "-").replace(/^-+|-+$/g, "") || "design"}.whirlbook.json`;
    download(model.fileText(), name);
    model.status.value = `Exported ${name}.`;
  }

  function importFile(event: Event) {
    const input = event.currentTarget as HTMLInputElement;
    const file = input.files?.[0];
    if (!file) return;
    const reader = new FileReader();
    reader.onload = () => model.importText(String(reader.result ?? ""), file.name);
    reader.onerror = () => (model.messages.value = [`${file.name} could not be read from disk.`]);
    reader.readAsText(file);
    input.value = "";
  }

  return (
    <div class="build-sheet">
      {model.messages.value.length ? (
        <div class="calc-notices" role="alert">
          {model.messages.value.map((m, i) => (
            <p key={i}>{m}</p>
          ))}
          <button type="button" class="button button--quiet no-print" onClick={() => (model.messages.value = [])}>
            Dismiss
          </button>
        </div>
      ) : null}
      {model.conflict.value ? (
        <div class="calc-notices no-print" role="alertdialog" aria-labelledby="conflict-text">
          <p id="conflict-text">A saved design is already called “{model.conflict.value.design.name}”. Replace it, or keep both?</p>
          <p class="design-actions">
            <button type="button" class="button" onClick={() => model.resolveConflict("replace")}>
              Replace the saved one
            </button>
            <button type="button" class="button button--quiet" onClick={() => model.resolveConflict("both")}>
              Keep both
            </button>
            <button type="button" class="button button--quiet" onClick={() => model.resolveConflict("cancel")}>
              Cancel
            </button>
          </p>
        </div>
      ) : null}

      {model.stale.value ? (
        <div class="calc-notices no-print" role="alertdialog" aria-labelledby="stale-text">
          <p id="stale-text">
            Not saved: “{model.stale.value.mine.name}” was changed in another tab after this sheet read it, and this sheet does not save over that change. This
            sheet now shows the other tab's version; your version is kept until you choose.
          </p>
          <p class="design-actions">
            <button type="button" class="button" onClick={model.keepMineAsCopy}>
              Save my version as a copy
            </button>
            <button type="button" class="button button--quiet" onClick={model.takeTheirs}>
              Drop my version
            </button>
          </p>
        </div>
      ) : null}

      <section class="sheet-head" aria-label="Design">
        <div class="field">
          <label for="design-name">Design name</label>
          <input
            id="design-name"
            type="text"
            value={design.name}
            maxLength={80}
            onInput={(e) => model.edit({ name: (e.currentTarget as HTMLInputElement).value })}
          />
        </div>
        <p class="print-only print-title">{design.name}</p>
        <p class="sheet-meta">
          <span class="no-print">{originText[origin]} </span>
          <span class="print-only">Build sheet. Units: {design.units === "us" ? "US customary" : "metric"}. </span>
          Last changed {design.modified.slice(0, 10)}.
          <span class="print-only">
            {" "}
            Printed <span data-print="date" />.
          </span>
        </p>
        <fieldset class="segmented no-print">
          <legend>Units</legend>
          {(["metric", "us"] as const).map((u) => (
            <label key={u}>
              <input type="radio" name="sheet-units" value={u} checked={design.units === u} onChange={() => model.edit({ units: u })} />
              <span>{u === "metric" ? "Metric" : "US"}</span>
            </label>
          ))}
        </fieldset>
        <div class="calc-actions no-print">
          {origin !== "saved" ? (
            <button type="button" class="button" onClick={model.saveCurrent}>
              Save in this browser
            </button>
          ) : null}
          {origin === "saved" && model.lastSave.value ? (
            <button type="button" class="button button--quiet" onClick={model.undoSave} aria-describedby="last-save">
              Undo last save
            </button>
          ) : null}
          <button type="button" class="button button--quiet" onClick={copyLink}>
            Copy link to this design
          </button>
          <button type="button" class="button button--quiet" onClick={exportFile}>
            Export file
          </button>
          <button type="button" class="button button--quiet" onClick={() => fileInput.current?.click()}>
            Import file
          </button>
          <input
            ref={fileInput}
            type="file"
            accept=".json,application/json"
            class="visually-hidden"
            tabIndex={-1}
            aria-label="Design file to import"
            onChange={importFile}
          />
          <button
            type="button"
            class="button button--quiet"
            onClick={async () => {
              printing.value = true;
              await preparePrint(printBlock.current, model);
              window.print();
            }}
          >
            Print
          </button>
          <button type="button" class="button button--quiet" onClick={() => model.startNew("empty")}>
            New design
          </button>
        </div>
        <p class="calc-status no-print" role="status" aria-live="polite">
          {model.status.value}
        </p>
        {origin === "saved" && model.lastSave.value ? (
          <p class="sheet-meta no-print" id="last-save">
            Last save: {model.lastSave.value}.
          </p>
        ) : null}
        {link.value ? (
          <div class="field no-print">
            <label for="design-link">Link to this design</label>
            <input id="design-link" type="text" readOnly value={link.value} ref={(el) => el?.select()} />
          </div>
        ) : null}
      </section>

      {model.problems.value.length ? (
        <div class="calc-notices" role="status">
          <p>Some values could not be read and were replaced; everything else was kept:</p>
          <ul>
            {model.problems.value.map((p, i) => (
              <li key={i}>{p}</li>
            ))}
          </ul>
        </div>
      ) : null}

      <div class="print-link print-only" ref={printBlock} hidden>
        <div data-print="code" />
        <p data-print="note" />
      </div>
      <Summary model={model} />
      {model.pending.value.length ? (
        <p class="sheet-status" role="status">
          Loading the checks…
        </p>
      ) : null}
      <ol class="checks">
        {model.results.value.map((r, i, all) => {
          // A check's inputs are printed once, under the first card of its values.
          const first = i === 0 || all[i - 1]!.section !== r.section || all[i - 1]!.index !== r.index;
          return <CheckCard key={r.id} result={r} model={model} inputs={printing.value && first ? inputsOf(r, design) : null} />;
        })}
      </ol>
      {missing.length ? (
        <p class="sheet-missing">
          Not in this design:{" "}
          {missing.map((c, i) => (
            <span key={c.id}>
              {i > 0 ? ", " : ""}
              <a href={`${base()}chapters/${c.chapter}/`}>{c.title}</a>
            </span>
          ))}
          .<span class="no-print"> Open a calculator and use “Save to design” to add it.</span>
        </p>
      ) : null}
      <div class="field no-print">
        <label for="design-notes">Notes</label>
        <textarea
          id="design-notes"
          rows={3}
          maxLength={4000}
          value={design.notes}
          onInput={(e) => model.edit({ notes: (e.currentTarget as HTMLTextAreaElement).value })}
        />
      </div>
      {design.notes ? <p class="print-only">Notes: {design.notes}</p> : null}
      <DesignList model={model} />
    </div>
  );
}
