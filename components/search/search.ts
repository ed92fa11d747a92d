/**
 * The search page's behaviour. On the first search it loads, from this site only, the calculators'
 * fields (search-fields.json) and the pages' index (pagefind). Fields whose label or symbol match
 * come first and open the calculator at that field; then the pages that hold every word of the
 * query; then fields whose help mentions it. Results are plain DOM: excerpts' <mark> tags become
 * elements, no other markup from the index is trusted. The query lives in the URL (?q=…).
 */
import type { SearchEntry } from "./entries.ts";
import { rankFields, STRONG_MATCH, textMatches } from "./rank.ts";

interface PagefindResult {
  url: string;
  content: string;
  excerpt: string;
  meta?: { title?: string };
  sub_results?: { url: string; title: string; excerpt: string }[];
}
interface Pagefind {
  options(options: { noWorker?: boolean }): Promise<void>;
  search(term: string): Promise<{ results: { data(): Promise<PagefindResult> }[] }>;
}

const base = import.meta.env.BASE_URL.replace(/\/?$/, "/");
/** Pages whose text is read to check the query's words (pagefind's best first). */
const PAGES_READ = 20;

let loading: Promise<[SearchEntry[], Pagefind]> | null = null;
function loadIndex(): Promise<[SearchEntry[], Pagefind]> {
  loading ??= Promise.all([
    fetch(`${base}search-fields.json`).then((r) => {
      if (!r.ok) throw new Error(`search-fields.json: HTTP ${r.status}`);
      return r.json() as Promise<SearchEntry[]>;
    }),
    (import(/* @vite-ignore */ `${base}pagefind/pagefind.js`) as Promise<Pagefind>).then(async (pagefind) => {
      // On the page, not in a web worker: the build ships no worker script (offline-and-search.mjs).
      await pagefind.options({ noWorker: true });
      return pagefind;
    }),
  ]);
  loading.catch(() => (loading = null));
  return loading;
}

function decode(text: string): string {
  const area = document.createElement("textarea");
  area.innerHTML = text;
  return area.value;
}

function appendExcerpt(target: HTMLElement, excerpt: string): void {
  let marked = false;
  for (const part of excerpt.split(/(<mark>|<\/mark>)/)) {
    if (part === "<mark>") marked = true;
    else if (part === "</mark>") marked = false;
    else if (part) {
      const text = document.createTextNode(decode(part.replace(/<[^>]*>/g, "")));
      if (marked) target.appendChild(document.createElement("mark")).appendChild(text);
      else target.appendChild(text);
    }
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
      const [entries, pagefind] = await loadIndex();
      const fields = rankFields(entries, term);
      const found = await pagefind.search(term);
      const pages = (await Promise.all(found.results.slice(0, PAGES_READ).map((r) => r.data()))).filter((page) => textMatches(page.content, term));
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
      for (const page of pages) {
        const best = page.sub_results?.[0];
        const title = page.meta?.title || page.url;
        list.appendChild(
          item(best ? best.url : page.url, best && best.title !== title ? `${title} — ${best.title}` : title, "", (p) =>
            appendExcerpt(p, best ? best.excerpt : page.excerpt),
          ),
        );
      }
      for (const hit of weak) list.appendChild(fieldItem(hit.entry));
    } catch {
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
