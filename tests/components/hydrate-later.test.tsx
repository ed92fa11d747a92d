// @vitest-environment happy-dom
/**
 * Hydration in parts (components/calc-ui/hydrate-later.ts): a part keeps its build-time DOM, is
 * attached a task after the rest, one part per task in page order, and then works like any other
 * part of the calculator. The mechanism rests on Preact internals (its suspended-hydration path and
 * the error hook `options.__e`), so these tests are what fails if an upgrade changes them.
 */
import { describe, expect, it } from "vitest";
import { h, hydrate } from "preact";
import { renderToString } from "preact-render-to-string";
import { HydrateLater, hydrateInParts } from "../../components/calc-ui/hydrate-later.ts";
import { signal } from "../../components/calc-ui/reactive.ts";

const nextTask = () => new Promise<void>((resolve) => setTimeout(resolve));

/** Renders `node` to HTML as the build does, then hydrates it in parts, as a calculator page does. */
function buildAndHydrate(node: () => preact.VNode): HTMLElement {
  const root = document.createElement("div");
  root.innerHTML = renderToString(node());
  document.body.append(root);
  hydrateInParts(() => hydrate(node(), root));
  return root;
}

describe("a calculator hydrated in parts", () => {
  it("renders a part at once, in a display: contents wrapper, where nothing is being hydrated (the build)", () => {
    expect(renderToString(h(HydrateLater, null, h("p", null, "out")))).toBe('<div class="calc-part"><p>out</p></div>');
    expect(renderToString(h(HydrateLater, null))).toBe('<div class="calc-part"></div>');
  });

  it("keeps each part's build-time nodes and attaches the parts one task after another, in page order", async () => {
    const count = signal(1);
    const order: string[] = [];
    const Part = ({ name }: { name: string }) => {
      if (typeof window !== "undefined") order.push(name);
      return (
        <button type="button" data-name={name} onClick={() => count.value++}>
          {name} {count.value}
        </button>
      );
    };
    const page = () => (
      <section>
        <Part name="form" />
        <HydrateLater>
          <Part name="bar" />
        </HydrateLater>
        <HydrateLater>
          <Part name="results" />
          <Part name="chart" />
        </HydrateLater>
      </section>
    );
    const root = buildAndHydrate(page);
    const built = [...root.querySelectorAll("button")];
    expect(built.map((b) => b.textContent)).toEqual(["form 1", "bar 1", "results 1", "chart 1"]);
    order.length = 0;
    // The hydrating pass attached the form only; the parts still show their build-time HTML.
    await Promise.resolve();
    expect(order).toEqual([]);
    await nextTask();
    expect(order).toEqual(["bar"]);
    await nextTask();
    expect(order).toEqual(["bar", "results", "chart"]);
    // The same nodes as built, now live: a click in a late part updates every part.
    expect([...root.querySelectorAll("button")]).toEqual(built);
    built[3]!.click();
    await nextTask();
    expect([...root.querySelectorAll("button")].map((b) => b.textContent)).toEqual(["form 2", "bar 2", "results 2", "chart 2"]);
    expect([...root.querySelectorAll("button")]).toEqual(built);
  });

  it("shows a change made before a part's turn once the part is attached (text and attributes)", async () => {
    const speed = signal("1000 rpm");
    const Out = () => <output data-speed={speed.value}>{speed.value}</output>;
    const Field = () => <input value={speed.value} onInput={(e) => (speed.value = e.currentTarget.value)} />;
    const root = buildAndHydrate(() => (
      <form>
        <Field />
        <HydrateLater>
          <Out />
        </HydrateLater>
      </form>
    ));
    const built = root.querySelector("output");
    // An edit in the attached form before the output part's turn.
    const input = root.querySelector("input")!;
    input.value = "2000 rpm";
    input.dispatchEvent(new Event("input"));
    await nextTask();
    await nextTask();
    const output = root.querySelector("output")!;
    expect(output).toBe(built);
    expect(output.textContent).toBe("2000 rpm");
    expect(output.dataset.speed).toBe("2000 rpm");
  });

  it("passes every other error on to Preact (a part that fails still reports it)", () => {
    const Broken = () => {
      throw new Error("broken part");
    };
    const root = document.createElement("div");
    expect(() => hydrate(h(HydrateLater, null, h(Broken, null)), root)).toThrow("broken part");
  });
});
