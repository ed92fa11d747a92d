// @vitest-environment happy-dom
/**
 * The reactive state's Preact binding, rendered into a DOM. The binding hooks into Preact through
 * its internal option hooks (`options.__r`, `options.diffed`, `options.unmount`) and the component
 * field it keeps its observer in; these names are Preact internals, so an upgrade may rename them.
 * These tests fail when that happens: a component must re-render when a signal it read changes,
 * only the components that read it, and never after it is unmounted.
 */
import { describe, expect, it } from "vitest";
import { render } from "preact";
import { act } from "preact/test-utils";
import { computed, signal } from "../../components/calc-ui/reactive.ts";

function mount(node: preact.ComponentChild): HTMLElement {
  const root = document.createElement("div");
  document.body.append(root);
  act(() => render(node, root));
  return root;
}

describe("the reactive state in rendered components", () => {
  it("re-renders a component when a signal it read changes", () => {
    const count = signal(1);
    const Counter = () => <output>{count.value}</output>;
    const root = mount(<Counter />);
    expect(root.textContent).toBe("1");
    act(() => {
      count.value = 2;
    });
    expect(root.textContent).toBe("2");
  });

  it("follows a computed value and re-renders once per batch of writes", () => {
    const a = signal(2);
    const b = signal(3);
    const sum = computed(() => a.value + b.value);
    let renders = 0;
    const Sum = () => {
      renders++;
      return <output>{sum.value}</output>;
    };
    const root = mount(<Sum />);
    expect([root.textContent, renders]).toEqual(["5", 1]);
    act(() => {
      a.value = 10;
      b.value = 20;
    });
    expect([root.textContent, renders]).toEqual(["30", 2]);
  });

  it("re-renders only the component that read the signal, not its parent", () => {
    const inner = signal("x");
    let parentRenders = 0;
    let childRenders = 0;
    const Child = () => {
      childRenders++;
      return <span>{inner.value}</span>;
    };
    const Parent = () => {
      parentRenders++;
      return (
        <p>
          <Child />
        </p>
      );
    };
    const root = mount(<Parent />);
    act(() => {
      inner.value = "y";
    });
    expect(root.textContent).toBe("y");
    expect([parentRenders, childRenders]).toEqual([1, 2]);
  });

  it("stops following a signal the component no longer reads, and everything once unmounted", () => {
    const showB = signal(true);
    const b = signal(1);
    let renders = 0;
    const View = () => {
      renders++;
      return <output>{showB.value ? b.value : "-"}</output>;
    };
    const root = mount(<View />);
    act(() => {
      showB.value = false;
    });
    expect([root.textContent, renders]).toEqual(["-", 2]);
    act(() => {
      b.value = 2;
    });
    expect(renders).toBe(2);
    act(() => render(null, root));
    act(() => {
      showB.value = true;
    });
    expect(renders).toBe(2);
    expect(root.textContent).toBe("");
  });
});
