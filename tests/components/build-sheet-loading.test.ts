// @vitest-environment happy-dom
/**
 * The build sheet loads the code of the checks a design of the builder's own holds. When that code
 * cannot arrive (offline before the site was cached, a broken deploy), the sheet says so and stops
 * saying it is loading, instead of waiting for ever.
 */
import { describe, expect, it, vi } from "vitest";
import { designToText } from "../../calc/index.ts";
import { createBuildSheetModel } from "../../components/design/model.ts";
import { preparedDemo } from "../support/prepared-demo.ts";
import { MemoryStorage } from "../support/memory-storage.ts";

vi.mock("../../calc/design/registry.ts", async (original) => ({
  ...(await original<typeof import("../../calc/design/registry.ts")>()),
  loadCalculators: () => Promise.reject(new Error("network")),
}));

describe("checks that cannot be loaded", () => {
  it("are reported in words, and the sheet stops showing that it is loading", async () => {
    const demo = preparedDemo();
    const model = createBuildSheetModel(new MemoryStorage(), demo);
    model.importText(designToText({ ...demo.design, name: "From a file" }), "robot.json");
    expect(model.pending.value.length).toBeGreaterThan(0);
    await vi.waitFor(() => expect(model.messages.value.join(" ")).toContain("Some checks could not be loaded"));
    expect(model.pending.value).toEqual([]);
    expect(model.results.value).toEqual([]);
  });
});
