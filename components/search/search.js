// The search page's behaviour (inlined into /search/ at build time; `base` is defined by the page).
// Loads the pagefind index on first use, from this site only; runs the query in ?q=; renders
// results as plain DOM: excerpts' <mark> tags become elements, no other markup from the index is
// trusted. Each result links to the best-matching section.
(() => {
  const form = document.getElementById("search-form");
  const input = document.getElementById("search-input");
  const status = document.getElementById("search-status");
  const list = document.getElementById("search-results");
  let loading = null;
  let latest = 0;

  function loadIndex() {
    if (!loading) loading = import(`${base}pagefind/pagefind.js`);
    return loading;
  }

  function decode(text) {
    const area = document.createElement("textarea");
    area.innerHTML = text;
    return area.value;
  }

  function appendExcerpt(target, excerpt) {
    let marked = false;
    excerpt.split(/(<mark>|<\/mark>)/).forEach((part) => {
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
    });
  }

  async function search(term) {
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
      const count = found.results.length;
      status.textContent = count ? `${count} page${count === 1 ? "" : "s"} found.` : `Nothing found for “${term}”.`;
      data.forEach((page) => {
        const best = page.sub_results?.[0];
        const title = page.meta?.title || page.url;
        const item = document.createElement("li");
        const heading = document.createElement("p");
        const link = document.createElement("a");
        link.href = best ? best.url : page.url;
        link.textContent = best && best.title !== title ? `${title} — ${best.title}` : title;
        heading.className = "search-title";
        heading.appendChild(link);
        const excerpt = document.createElement("p");
        appendExcerpt(excerpt, best ? best.excerpt : page.excerpt);
        item.append(heading, excerpt);
        list.appendChild(item);
      });
    } catch {
      if (ticket === latest)
        status.textContent = "The search index could not be loaded. If you are offline, open the handbook once while online so it can be saved.";
    }
  }

  const initial = new URLSearchParams(location.search).get("q") || "";
  input.value = initial;
  if (initial) search(initial);
  form.addEventListener("submit", (event) => {
    event.preventDefault();
    const term = input.value;
    history.replaceState(null, "", term ? `?q=${encodeURIComponent(term)}` : location.pathname);
    search(term);
  });
  let timer;
  input.addEventListener("input", () => {
    clearTimeout(timer);
    timer = setTimeout(() => {
      form.requestSubmit();
    }, 250);
  });
})();
