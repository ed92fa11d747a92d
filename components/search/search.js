// The search page's behaviour (inlined into /search/ at build time; `base` is defined by the page).
// Loads the pagefind index on first use, from this site only; runs the query in ?q=; renders
// results as plain DOM: excerpts' <mark> tags become elements, no other markup from the index is
// trusted. Each result links to the best-matching section.
(function () {
  var form = document.getElementById("search-form");
  var input = document.getElementById("search-input");
  var status = document.getElementById("search-status");
  var list = document.getElementById("search-results");
  var loading = null;
  var latest = 0;

  function loadIndex() {
    if (!loading) loading = import(base + "pagefind/pagefind.js");
    return loading;
  }

  function decode(text) {
    var area = document.createElement("textarea");
    area.innerHTML = text;
    return area.value;
  }

  function appendExcerpt(target, excerpt) {
    var marked = false;
    excerpt.split(/(<mark>|<\/mark>)/).forEach(function (part) {
      if (part === "<mark>") marked = true;
      else if (part === "</mark>") marked = false;
      else if (part) {
        var text = document.createTextNode(decode(part.replace(/<[^>]*>/g, "")));
        if (marked) {
          var mark = document.createElement("mark");
          mark.appendChild(text);
          target.appendChild(mark);
        } else target.appendChild(text);
      }
    });
  }

  async function search(term) {
    var ticket = ++latest;
    list.replaceChildren();
    if (term.trim().length < 2) {
      status.textContent = term.trim() ? "Type at least two letters." : "";
      return;
    }
    status.textContent = "Searching…";
    try {
      var pagefind = await loadIndex();
      var found = await pagefind.search(term);
      var data = await Promise.all(found.results.slice(0, 12).map(function (r) { return r.data(); }));
      if (ticket !== latest) return;
      var count = found.results.length;
      status.textContent = count ? count + " page" + (count === 1 ? "" : "s") + " found." : "Nothing found for “" + term + "”.";
      data.forEach(function (page) {
        var best = page.sub_results && page.sub_results[0];
        var title = (page.meta && page.meta.title) || page.url;
        var item = document.createElement("li");
        var heading = document.createElement("p");
        var link = document.createElement("a");
        link.href = best ? best.url : page.url;
        link.textContent = best && best.title !== title ? title + " — " + best.title : title;
        heading.className = "search-title";
        heading.appendChild(link);
        var excerpt = document.createElement("p");
        appendExcerpt(excerpt, best ? best.excerpt : page.excerpt);
        item.append(heading, excerpt);
        list.appendChild(item);
      });
    } catch (error) {
      if (ticket === latest) status.textContent = "The search index could not be loaded. If you are offline, open the handbook once while online so it can be saved.";
    }
  }

  var initial = new URLSearchParams(location.search).get("q") || "";
  input.value = initial;
  if (initial) search(initial);
  form.addEventListener("submit", function (event) {
    event.preventDefault();
    var term = input.value;
    history.replaceState(null, "", term ? "?q=" + encodeURIComponent(term) : location.pathname);
    search(term);
  });
  var timer;
  input.addEventListener("input", function () {
    clearTimeout(timer);
    timer = setTimeout(function () { form.requestSubmit(); }, 250);
  });
})();
