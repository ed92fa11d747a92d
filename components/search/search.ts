/**
 * The search page's behaviour: loads the pagefind index on first use (from this site only), runs
 * the query in ?q=, and renders results as plain DOM (excerpts' <mark> tags become elements; no
 * other markup from the index is trusted). Each result links to the best-matching section.
 */
interface PagefindResultData {
  url: string;
  excerpt: string;
  meta: { title?: string };
  sub_results?: { title: string; url: string; excerpt: string }[];
}
interface Pagefind {
  search(term: string): Promise<{ results: { data(): Promise<PagefindResultData> }[] }>;
}

let loading: Promise<Pagefind> | null = null;

function loadIndex(): Promise<Pagefind> {
  const base = import.meta.env.BASE_URL.replace(/\/?$/, "/");
  loading ??= import(/* @vite-ignore */ `${base}pagefind/pagefind.js`) as Promise<Pagefind>;
  return loading;
}

/** Appends an excerpt to `target`: text stays text, only <mark>…</mark> becomes a highlight. */
export function appendExcerpt(target: HTMLElement, excerpt: string): void {
  const decode = (text: string) => {
    const area = document.createElement("textarea");
    area.innerHTML = text;
    return area.value;
  };
  const parts = excerpt.split(/(<mark>|<\/mark>)/);
  let marked = false;
  for (const part of parts) {
    if (part === "<mark>") marked = true;
    else if (part === "</mark>") marked = false;
    else if (part) {
      const text = document.createTextNode(decode(part.replace(/<[^>]*>/g, "")));
      if (marked) {
        const mark = document.createElement("mark");
        mark.appendChild(text);
        target.appendChild(mark);
      } else target.appendChild(text);
    }
  }
}

export function runSearch(): void {
  const form = document.getElementById("search-form") as HTMLFormElement;
  const input = document.getElementById("search-input") as HTMLInputElement;
  const status = document.getElementById("search-status") as HTMLElement;
  const list = document.getElementById("search-results") as HTMLOListElement;
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
      const pagefind = await loadIndex();
      const found = await pagefind.search(term);
      const data = await Promise.all(found.results.slice(0, 12).map((r) => r.data()));
      if (ticket !== latest) return;
      status.textContent = data.length ? `${found.results.length} page${found.results.length === 1 ? "" : "s"} found.` : `Nothing found for “${term}”.`;
      for (const page of data) {
        const best = page.sub_results?.[0];
        const item = document.createElement("li");
        const link = document.createElement("a");
        link.href = best?.url ?? page.url;
        link.textContent = best && best.title !== page.meta.title ? `${page.meta.title ?? page.url} — ${best.title}` : page.meta.title ?? page.url;
        const heading = document.createElement("p");
        heading.className = "search-title";
        heading.appendChild(link);
        const excerpt = document.createElement("p");
        appendExcerpt(excerpt, best?.excerpt ?? page.excerpt);
        item.append(heading, excerpt);
        list.appendChild(item);
      }
    } catch {
      if (ticket === latest) status.textContent = "The search index could not be loaded. If you are offline, open the handbook once while online so it can be saved.";
    }
  }

  const initial = new URLSearchParams(location.search).get("q") ?? "";
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
