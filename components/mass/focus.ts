/** Focuses the element with this id on the next frame (after the change that renders it). */
export const focusLater = (id: string) => requestAnimationFrame(() => document.getElementById(id)?.focus());
