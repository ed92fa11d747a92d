// @vitest-environment happy-dom
/**
 * The build sheet is rendered at build time, where there is no storage, and the browser adopts that
 * markup on its first render instead of drawing it again (hydration keeps the markup's elements and
 * attributes). So the first render must not depend on what this browser has saved: a message or a
 * list that only the browser knows comes after, from an effect, and is drawn in full.
 */
import { preparedDemo } from "../support/prepared-demo.ts";
import { afterEach, describe, expect, it } from "vitest";
import { renderToString } from "preact-render-to-string";
import BuildSheet from "../../components/design/BuildSheet.tsx";
import { LEGACY_KEY as STORE_KEY } from "../../components/design/saved.ts";
import { demoDesign, designToText } from "../../calc/index.ts";

afterEach(() => localStorage.clear());

describe("the build sheet's first render", () => {
  const atBuild = renderToString(<BuildSheet demo={preparedDemo()} />);

  it.each([
    ["an unreadable store", "{not json"],
    [
      "a store with one readable design and one not",
      JSON.stringify({
        designs: [
          { id: "a", design: JSON.parse(designToText(demoDesign())) },
          { id: "b", design: {} },
        ],
      }),
    ],
  ])("is the build's markup whatever this browser has saved (%s)", (_, stored) => {
    localStorage.setItem(STORE_KEY, stored);
    expect(renderToString(<BuildSheet demo={preparedDemo()} />)).toBe(atBuild);
    // Reading the store (and keeping an unreadable one aside) waits for the page to be live.
    expect(localStorage.length).toBe(1);
  });
});
