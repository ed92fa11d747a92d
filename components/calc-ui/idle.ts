/**
 * Runs a task once the page is idle (after hydration, between frames), or a second later where the
 * browser has no idle callback. Used to fetch and evaluate a calculator's on-use code ahead of the
 * first edit or press, so that the edit does not load code and draw twice in one moment.
 */
export function whenIdle(task: () => void): void {
  if (typeof window === "undefined") return;
  if (typeof window.requestIdleCallback === "function") window.requestIdleCallback(task, { timeout: 4000 });
  else setTimeout(task, 1000);
}
