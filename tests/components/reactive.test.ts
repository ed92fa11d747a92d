import { describe, expect, it } from "vitest";
import { batch, computed, effect, signal } from "../../components/calc-ui/reactive.ts";

describe("reactive state", () => {
  it("a computed is lazy, cached, and follows its signals", () => {
    const a = signal(2);
    let runs = 0;
    const double = computed(() => {
      runs++;
      return a.value * 2;
    });
    expect(runs).toBe(0);
    expect(double.value).toBe(4);
    expect(double.value).toBe(4);
    expect(runs).toBe(1);
    a.value = 5;
    expect(runs).toBe(1);
    expect(double.value).toBe(10);
    expect(runs).toBe(2);
  });

  it("an effect sees a consistent state: a diamond runs once per write, never half-updated", () => {
    const a = signal(1);
    const b = computed(() => a.value + 1);
    const c = computed(() => a.value * 10);
    const seen: string[] = [];
    const stop = effect(() => {
      seen.push(`${b.value},${c.value}`);
    });
    a.value = 2;
    a.value = 3;
    expect(seen).toEqual(["2,10", "3,20", "4,30"]);
    stop();
    a.value = 4;
    expect(seen).toHaveLength(3);
  });

  it("batch defers effects to its end; writing the same value notifies nobody", () => {
    const x = signal(0);
    const y = signal(0);
    let runs = 0;
    effect(() => {
      void x.value;
      void y.value;
      runs++;
    });
    batch(() => {
      x.value = 1;
      y.value = 1;
      expect(runs).toBe(1);
    });
    expect(runs).toBe(2);
    x.value = 1;
    expect(runs).toBe(2);
  });

  it("dependencies are re-collected on each run (a branch no longer taken stops notifying)", () => {
    const useA = signal(true);
    const a = signal("a");
    const b = signal("b");
    let runs = 0;
    const pick = computed(() => (useA.value ? a.value : b.value));
    effect(() => {
      void pick.value;
      runs++;
    });
    useA.value = false;
    expect(runs).toBe(2);
    a.value = "a2";
    expect(runs).toBe(2);
    b.value = "b2";
    expect(runs).toBe(3);
    expect(pick.value).toBe("b2");
  });

  it("an effect may write other signals; its cleanup runs before the next run and on dispose", () => {
    const source = signal(1);
    const mirror = signal(0);
    const log: string[] = [];
    const stop = effect(() => {
      mirror.value = source.value * 100;
      const v = source.value;
      return () => log.push(`clean ${v}`);
    });
    expect(mirror.value).toBe(100);
    source.value = 2;
    expect(mirror.value).toBe(200);
    stop();
    expect(log).toEqual(["clean 1", "clean 2"]);
  });

  it("a cycle of effects is reported, not looped forever", () => {
    const n = signal(0);
    expect(() =>
      effect(() => {
        n.value = n.value + 1;
      }),
    ).toThrow(/cycle/);
  });

  it("a computed cannot be written; peek reads without subscribing", () => {
    const a = signal(1);
    const c = computed(() => a.value);
    expect(() => {
      (c as unknown as { value: number }).value = 2;
    }).toThrow(TypeError);
    let runs = 0;
    effect(() => {
      void a.peek();
      runs++;
    });
    a.value = 3;
    expect(runs).toBe(1);
  });
});
