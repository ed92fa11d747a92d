// The offline registration (inlined into every page at build time, minified, inside a function
// that defines `base`; see OfflineRegistration.astro).
const sw = navigator.serviceWorker;
const had = sw ? sw.controller : null;
let reloaded = false;

/** Shows (or updates) the notice `id` at the bottom of the page: a sentence and one button. */
function say(id, text, label, act) {
  const d = document.getElementById(id) || document.body.appendChild(document.createElement("div"));
  const b = document.createElement("button");
  d.id = id;
  d.className = "update-ready";
  d.setAttribute("role", "status");
  d.textContent = `${text} `;
  b.className = "button";
  b.textContent = label;
  b.onclick = act;
  d.appendChild(b);
}

/** The offline copy could not be set up (first visit) or updated (returning visit). Offline, a failed check is expected. */
function fail(why) {
  if (!navigator.onLine) return;
  const text = had
    ? `Offline copy not updated: ${why}. Your saved copy still works offline.`
    : `Offline copy unavailable: ${why}. The handbook works while you are online.`;
  say("sw-notice", text, "Dismiss", function () {
    this.parentNode.remove();
  });
}

/** A new version is installed and waiting: offer to switch (only to a visitor who has an old one). */
function offer(worker) {
  if (sw.controller)
    say("sw-update", "A new version of the handbook is ready.", "Reload to update", () => {
      worker.postMessage("whirlbook:activate");
    });
}

/** Offers a worker once it has installed (the browser may have begun installing before this page loaded). */
function watch(worker) {
  if (worker)
    worker.onstatechange = () => {
      if (worker.state === "installed") offer(worker);
    };
}

// The worker's install says which file of the offline copy it could not download. Listening from
// the start (not from "load") also lets through what an install the browser began on its own says.
if (sw)
  sw.onmessage = (event) => {
    const data = event.data || {};
    if (data.type === "whirlbook:offline-failed") fail(data.reason);
  };

if (sw)
  addEventListener("load", () => {
    navigator.serviceWorker
      .register(`${base}sw.js`)
      .then((registration) => {
        if (registration.waiting) offer(registration.waiting);
        watch(registration.installing);
        registration.onupdatefound = () => watch(registration.installing);
        // register() does not look for a new worker when one is installed; the browser's own check
        // fails silently (sw.js gone from a deploy), so a returning visit checks here.
        if (had) return registration.update();
      })
      .catch((error) => {
        const status = /\((\d{3})\)/.exec(error.message);
        fail(`${base}sw.js could not be loaded${status ? ` (HTTP ${status[1]})` : ""}`);
      });
    sw.oncontrollerchange = () => {
      if (document.getElementById("sw-update") && !reloaded) {
        reloaded = true;
        location.reload();
      }
    };
  });
