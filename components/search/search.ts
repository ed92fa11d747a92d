/**
 * The search page's behaviour. On the first search it loads, from this site only, the calculators'
 * fields (search-fields.json), the list of pages (search-pages.json) and the search engine
 * (search-engine.js: MiniSearch and the page reader, components/search/page-text.ts); it fetches
 * the pages (from the offline copy once saved), reads their text in sections and indexes them, a
 * page at a time. Fields whose label or symbol match come first and
 * open the calculator at that field; then the pages that hold every word of the query, each at its
 * best-matching section; then fields whose help mentions it. Results are plain DOM built from
 * plain text. The query lives in the URL (?q=…).
 */
import type MiniSearch from "minisearch";
import type { SearchEntry } from "./entries.ts";
import type { PageText } from "./page-text.ts";
import { type ExcerptPart, excerptParts, holdsAll, rankFields, STRONG_MATCH, words } from "./rank.ts";

/** A page read: its address (relative to the base), title and sections. */
interface IndexedPage extends PageText {
  url: string;
}
/** A section as the engine indexes it. */
interface Section {
  id: number;
  page: number;
  anchor: string;
  title: string;
  heading: string;
  text: string;
}
interface Index {
  entries: SearchEntry[];
  pages: IndexedPage[];
  /** Each page's words, read once. */
  pageWords: Set<string>[];
  sections: Section[];
  engine: MiniSearch<Section>;
}

const base = import.meta.env.BASE_URL.replace(/\/?$/, "/");
/** Pages listed at most. */
const PAGES_SHOWN = 20;

const json = <T>(name: string): Promise<T> =>
  fetch(`${base}${name}`).then((r) => {
    if (!r.ok) throw new Error(`${name}: HTTP ${r.status}`);
    return r.json() as Promise<T>;
  });

const tick = () => new Promise((resolve) => setTimeout(resolve, 0));

let loading: Promise<Index> | null = null;
function loadIndex(): Promise<Index> {
  loading ??= Promise.all([
    json<SearchEntry[]>("search-fields.json"),
    json<string[]>("search-pages.json"),
    import(/* @vite-ignore */ `${base}search-engine.js`) as Promise<{ default: typeof MiniSearch; pageSections: (doc: Document) => PageText }>,
  ]).then(async ([entries, urls, { default: Engine, pageSections }]) => {
    // The same words as the fields' ranking (rank.ts): lower case, accents off, camelCase split.
    const engine = new Engine<Section>({
      fields: ["title", "heading", "text"],
      tokenize: words,
      processTerm: (term) => term,
      searchOptions: { boost: { title: 3, heading: 2 }, prefix: (term) => term.length >= 3 },
    });
    const texts = urls.map((url) =>
      fetch(`${base}${url}`).then((r) => {
        if (!r.ok) throw new Error(`${url}: HTTP ${r.status}`);
        return r.text();
      }),
    );
    const pages: IndexedPage[] = [];
    const sections: Section[] = [];
    const pageWords: Set<string>[] = [];
    const parser = new DOMParser();
    // A page at a time, parsed in one task and read in the next, so reading never holds the page
    // for long on a slow phone.
    for (const [p, url] of urls.entries()) {
      const doc = parser.parseFromString(await texts[p]!, "text/html");
      await tick();
      const page = { url, ...pageSections(doc) };
      pages.push(page);
      const own = page.sections.map((s, i) => ({ ...s, id: sections.length + i, page: p, title: page.title }));
      for (const s of own) sections.push(s);
      engine.addAll(own);
      pageWords.push(new Set(words([page.title, ...page.sections.flatMap((s) => [s.heading, s.text])].join(" "))));
      await tick();
    }
    return { entries, pages, pageWords, sections, engine };
  });
  loading.catch(() => (loading = null));
  return loading;
}

function appendExcerpt(target: HTMLElement, parts: ExcerptPart[]): void {
  for (const part of parts) {
    if (part.marked) target.appendChild(document.createElement("mark")).textContent = part.text;
    else target.append(part.text);
  }
}

function item(href: string, title: string, note: string, body: (p: HTMLParagraphElement) => void): HTMLLIElement {
  const li = document.createElement("li");
  const heading = document.createElement("p");
  heading.className = "search-title";
  const link = heading.appendChild(document.createElement("a"));
  link.href = href;
  link.textContent = title;
  if (note) heading.append(` ${note}`);
  const text = document.createElement("p");
  body(text);
  li.append(heading, text);
  return li;
}

function fieldItem(entry: SearchEntry): HTMLLIElement {
  const what = entry.kind === "output" ? "result" : "field";
  return item(`${base}${entry.url}`, `${entry.label}${entry.unit ? ` (${entry.unit})` : ""}`, `— ${what} of the ${entry.calculator} calculator`, (p) => {
    p.textContent = entry.help;
  });
}

function start(): void {
  const form = document.getElementById("search-form") as HTMLFormElement;
  const input = document.getElementById("search-input") as HTMLInputElement;
  const status = document.getElementById("search-status")!;
  const list = document.getElementById("search-results")!;
  let latest = 0;

  async function search(term: string): Promise<void> {
    const ticket = ++latest;
    list.replaceChildren();
    if (term.trim().length < 2) {
      status.textContent = term.trim() ? "Type at least two letters." : "";
      return;
    }
    status.textContent = "Searching…";
    try {
      const index = await loadIndex();
      const fields = rankFields(index.entries, term);
      // Each page once, at its best section; a page counts when it holds every word of the query
      // (tested once per page, not once per matching section).
      const best = new Map<number, Section | null>();
      for (const hit of index.engine.search(term)) {
        const section = index.sections[hit.id as number]!;
        if (!best.has(section.page)) best.set(section.page, holdsAll(index.pageWords[section.page]!, term) ? section : null);
      }
      const pages = [...best.values()].filter((section) => section !== null).slice(0, PAGES_SHOWN);
      if (ticket !== latest) return;
      const strong = fields.filter((f) => f.score >= STRONG_MATCH).slice(0, 8);
      const weak = fields.filter((f) => f.score < STRONG_MATCH).slice(0, 5);
      const fieldCount = strong.length + weak.length;
      const parts = [
        fieldCount ? `${fieldCount} calculator field${fieldCount === 1 ? "" : "s"}` : "",
        pages.length ? `${pages.length} page${pages.length === 1 ? "" : "s"}` : "",
      ];
      status.textContent =
        fieldCount || pages.length
          ? `${parts.filter(Boolean).join(" and ")} found.`
          : `Nothing found for “${term.trim()}”: no page or calculator field has that word.`;
      for (const hit of strong) list.appendChild(fieldItem(hit.entry));
      for (const section of pages) {
        const page = index.pages[section.page]!;
        const href = `${base}${page.url}${section.anchor ? `#${section.anchor}` : ""}`;
        const title = section.heading && section.heading !== page.title ? `${page.title} — ${section.heading}` : page.title;
        list.appendChild(item(href, title, "", (p) => appendExcerpt(p, excerptParts(section.text || section.heading, term))));
      }
      for (const hit of weak) list.appendChild(fieldItem(hit.entry));
    } catch (error) {
      // For whoever looks into it; the reader gets the words below.
      console.warn("search:", error);
      if (ticket === latest)
        status.textContent = "The search index could not be loaded. If you are offline, open the handbook once while online so it can be saved.";
    }
  }

  const initial = new URLSearchParams(location.search).get("q") || "";
  input.value = initial;
  if (initial) void search(initial);
  form.addEventListener("submit", (event) => {
    event.preventDefault();
    const term = input.value;
    history.replaceState(null, "", term ? `?q=${encodeURIComponent(term)}` : location.pathname);
    void search(term);
  });
  let timer: ReturnType<typeof setTimeout> | undefined;
  input.addEventListener("input", () => {
    clearTimeout(timer);
    timer = setTimeout(() => form.requestSubmit(), 250);
  });
}

start();
