/**
 * Hydration in parts. On a slow phone, attaching a whole calculator to its build-time HTML in one go
 * was the page load's longest task (about 100 ms at a fourfold CPU slow-down for the larger ones).
 * A part wrapped in `<HydrateLater>` keeps its build-time HTML and is attached in a task of its own after
 * the rest, one part per task, in page order: the form's fields first, then the results and charts.
 *
 * How: during hydration, `HydrateLater` throws a promise instead of rendering. Preact then keeps the
 * part's server-rendered DOM as it is (its suspended-hydration path, the one lazy components use)
 * and takes it up again when the part renders, which `HydrateLater` asks for when its turn comes.
 * It takes it up as a render over existing DOM, not as hydration: hydration attaches the event
 * handlers and corrects text but leaves attributes as built, and the state may have changed before
 * the part's turn (a link's values applied, an early edit); a render over existing DOM reuses the
 * same nodes and corrects their attributes too. The thrown promise is caught here (Preact's error
 * hook, `options.__e`, which preact/compat and @preact/signals hook too), so no error boundary is
 * needed. Preact internals used: `options.__e`, a component's vnode `__v` and the vnode's mode flags
 * `__u` (tests/components/hydrate-later.test.tsx fails if an upgrade renames them).
 *
 * A part is drawn inside a `<div class="calc-part">` (`display: contents`, so it changes no layout):
 * Preact keeps exactly one DOM node for a suspended part, and the wrapper is that node whatever the
 * part draws (one element, several, or nothing). A part holds no field: its turn sets each control to
 * the state's value, so text typed into a field before its turn would be replaced. Parts are outputs:
 * result bars, tables, charts, the sections that load more code on use. Outside hydration (a part
 * drawn later, the build), `HydrateLater` renders at once.
 */
import { Component, type ComponentChildren, h, options, type VNode } from "preact";

let hydrating = false;

/** Runs `attach` (a `hydrate` call) with the parts it meets deferred to later tasks. */
export function hydrateInParts(attach: () => void): void {
  hydrating = true;
  try {
    attach();
  } finally {
    hydrating = false;
  }
}

/** Settles in the next task after every earlier turn, so the parts attach one per task, in order. */
let queue: Promise<unknown> = Promise.resolve();

/** What a waiting part throws: Preact's suspended path needs only a promise to keep the part's DOM. */
const WAITING = Promise.resolve();

/** Preact's vnode mode flag for "resume as hydration" (MODE_HYDRATE in preact/src/constants.js). */
const MODE_HYDRATE = 1 << 5;
interface Internal {
  __v?: { __u?: number };
}
interface ErrorHook {
  __e?: (error: unknown, vnode: VNode, oldVNode?: VNode, info?: unknown) => void;
}
const hooks = options as ErrorHook;
const previous = hooks.__e;
hooks.__e = (error, vnode, oldVNode, info) => {
  // A part waiting for its turn: Preact has kept its DOM; nothing to report.
  if (error !== WAITING) previous?.(error, vnode, oldVNode, info);
};

/** A part of a calculator hydrated in a later task (see the module comment for the rules). */
export class HydrateLater extends Component<{ children?: ComponentChildren }> {
  private waiting = hydrating;

  constructor(props: { children?: ComponentChildren }) {
    super(props);
    // Met while hydrating: wait for a turn, then render over the DOM Preact kept.
    if (hydrating)
      queue = queue
        .then(() => new Promise((resolve) => setTimeout(resolve)))
        .then(() => {
          this.waiting = false;
          (this as Internal).__v!.__u! &= ~MODE_HYDRATE;
          this.forceUpdate();
        });
  }

  render() {
    if (this.waiting) throw WAITING;
    return h("div", { class: "calc-part" }, this.props.children);
  }
}
