/**
 * Reactive state for the calculators: signals, derived values (computed), effects, batching, and a
 * Preact binding that re-renders a component when a signal it read during its last render changes.
 *
 * Only what the calculators use, in well under 1 KB gzip: a full signals library and its Preact
 * binding cost about 3 KB on every calculator page, an eighth of the page's script budget.
 *
 * Semantics: reads inside a computed, an effect or a component render are tracked; a write
 * marks dependants stale; computeds recompute lazily when read; effects and re-renders run once
 * the outermost write or `batch` ends, so they always see a consistent state (no glitches).
 */
import { options, type VNode } from "preact";
import { useMemo } from "preact/hooks";

interface Observer {
  deps: Set<Signal<unknown>>;
  stale(): void;
}

let tracking: Observer | undefined;
let depth = 0;
let queue: Effect[] = [];

function subscribe(source: Signal<unknown>): void {
  if (tracking) {
    source.observers.add(tracking);
    tracking.deps.add(source);
  }
}

function unsubscribe(observer: Observer): void {
  for (const source of observer.deps) source.observers.delete(observer);
  observer.deps.clear();
}

/** Runs `fn` with `observer` collecting the signals it reads (dropping what it read before). */
function tracked<T>(observer: Observer, fn: () => T): T {
  unsubscribe(observer);
  const outer = tracking;
  tracking = observer;
  try {
    return fn();
  } finally {
    tracking = outer;
  }
}

/** Runs queued effects until none is left; an effect may write and so queue more. */
function flush(): void {
  depth++;
  let rounds = 0;
  let failure: unknown;
  try {
    while (queue.length > 0) {
      if (++rounds > 1000) {
        queue = [];
        throw new Error("effects keep re-triggering each other (a cycle)");
      }
      const run = queue;
      queue = [];
      for (const effect of run) {
        try {
          effect.run();
        } catch (error) {
          failure ??= error;
        }
      }
    }
  } finally {
    depth--;
  }
  if (failure !== undefined) throw failure;
}

/** Groups writes: dependants update once, after `fn` returns. */
export function batch<T>(fn: () => T): T {
  depth++;
  try {
    return fn();
  } finally {
    if (--depth === 0) flush();
  }
}

export interface ReadonlySignal<T> {
  readonly value: T;
  /** The value without subscribing to it. */
  peek(): T;
}

/** A value that notifies whatever read it when it changes. */
export class Signal<T> implements ReadonlySignal<T> {
  protected current: T;
  observers = new Set<Observer>();

  constructor(value: T) {
    this.current = value;
  }

  get value(): T {
    subscribe(this as Signal<unknown>);
    return this.current;
  }

  set value(next: T) {
    if (Object.is(next, this.current)) return;
    this.current = next;
    batch(() => {
      for (const observer of [...this.observers]) observer.stale();
    });
  }

  peek(): T {
    return this.current;
  }
}

class Computed<T> extends Signal<T> implements Observer {
  deps = new Set<Signal<unknown>>();
  private dirty = true;
  private readonly fn: () => T;

  constructor(fn: () => T) {
    super(undefined as T);
    this.fn = fn;
  }

  stale(): void {
    if (this.dirty) return;
    this.dirty = true;
    for (const observer of [...this.observers]) observer.stale();
  }

  override get value(): T {
    const value = this.peek();
    subscribe(this as Signal<unknown>);
    return value;
  }

  override peek(): T {
    if (this.dirty) {
      this.current = tracked(this, this.fn);
      this.dirty = false;
    }
    return this.current;
  }
}

class Effect implements Observer {
  deps = new Set<Signal<unknown>>();
  private queued = false;
  private disposed = false;
  private cleanup: (() => void) | undefined;
  private readonly fn: () => unknown;

  constructor(fn: () => unknown) {
    this.fn = fn;
  }

  stale(): void {
    if (this.queued || this.disposed) return;
    this.queued = true;
    queue.push(this);
  }

  run(): void {
    this.queued = false;
    if (this.disposed) return;
    this.cleanup?.();
    const result = tracked(this, this.fn);
    this.cleanup = typeof result === "function" ? (result as () => void) : undefined;
  }

  dispose(): void {
    this.disposed = true;
    unsubscribe(this);
    this.cleanup?.();
    this.cleanup = undefined;
  }
}

export function signal<T>(value: T): Signal<T> {
  return new Signal(value);
}

/** A value derived from signals, recomputed on read after any of them changed. */
export function computed<T>(fn: () => T): ReadonlySignal<T> {
  return new Computed(fn);
}

/**
 * Runs `fn` now and again whenever a signal it read changes; `fn` may return a cleanup that runs
 * before the next run and on dispose. Returns the dispose function.
 */
export function effect(fn: () => unknown): () => void {
  const e = new Effect(fn);
  batch(() => e.run());
  return () => e.dispose();
}

/** A signal that lives as long as the component that created it. */
export function useSignal<T>(value: T): Signal<T> {
  return useMemo(() => signal(value), []);
}

// ---------------------------------------------------------------------------------------------
// Preact binding. Preact calls `options.__r` just before a component renders, `options.diffed`
// after a vnode is diffed and `options.unmount` when it goes away (the same hooks preact/hooks
// uses). Tracking starts at a render and stops at the next render or diff: a render function
// returns before Preact renders its children, so reads never leak from one component to another.

interface RenderHooks {
  __r?: (vnode: VNode) => void;
  diffed?: (vnode: VNode) => void;
  unmount?: (vnode: VNode) => void;
}
interface Rendered {
  setState(state: object): void;
  __w?: Observer;
}
type ComponentVNode = VNode & { __c?: Rendered | null };

const hooks = options as RenderHooks;
const inBrowser = typeof window !== "undefined";
let rendering: Observer | undefined;

function stopRenderTracking(): void {
  if (rendering && tracking === rendering) tracking = undefined;
  rendering = undefined;
}

const beforeRender = hooks.__r;
hooks.__r = (vnode) => {
  stopRenderTracking();
  const component = (vnode as ComponentVNode).__c;
  if (inBrowser && component) {
    component.__w ??= { deps: new Set(), stale: () => component.setState({}) };
    const observer = component.__w;
    unsubscribe(observer);
    tracking = rendering = observer;
  }
  beforeRender?.(vnode);
};

const afterDiff = hooks.diffed;
hooks.diffed = (vnode) => {
  stopRenderTracking();
  afterDiff?.(vnode);
};

const beforeUnmount = hooks.unmount;
hooks.unmount = (vnode) => {
  const observer = (vnode as ComponentVNode).__c?.__w;
  if (observer) unsubscribe(observer);
  beforeUnmount?.(vnode);
};
