/**
 * The steering simulation's worker (components/steering/simulation-worker.ts), driven here in Node
 * through its message handler as the page drives it: a move and a path are answered with what
 * calc/ gives for the same input; a move asked for while the worker was busy and replaced since is
 * skipped; a map reports its progress cell by cell and ends with calc/'s grid, or stops when the
 * values change. In the page (no worker scope) the module only gives its address.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { DEMO_STEERING_SPINNER } from "../../calc/steering/inputs.ts";
import { steeringPath } from "../../calc/steering/path.ts";
import { simulateSteering } from "../../calc/steering/simulate.ts";
import { sweepSteering } from "../../calc/steering/sweep.ts";
import type { SimulationReply, SimulationRequest } from "../../components/steering/simulation-worker.ts";

const scope = globalThis as unknown as {
  WorkerGlobalScope?: unknown;
  postMessage?: (reply: SimulationReply) => void;
  onmessage?: ((event: { data: SimulationRequest }) => void) | null;
};
const replies: SimulationReply[] = [];
const send = (data: SimulationRequest) => scope.onmessage!({ data });
/** Resolves once a reply for `id` that is not progress has come (or after 20 s of waiting, with what came). */
async function answer(id: number): Promise<SimulationReply | undefined> {
  for (let i = 0; i < 2000; i += 1) {
    const found = replies.find((r) => r.id === id && r.kind !== "progress");
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
  return undefined;
}

const input = { ...DEMO_STEERING_SPINNER, phaseLead: 1.3, commandedDistance: 0.8 };

describe("the steering simulation's worker", () => {
  it("in the page only gives its address (no handler outside a worker)", async () => {
    const module = await import("../../components/steering/simulation-worker.ts");
    expect(module.workerUrl).toMatch(/simulation-worker\.ts/);
    expect(scope.onmessage ?? null).toBeNull();
  });

  describe("in a worker", () => {
    beforeAll(async () => {
      scope.WorkerGlobalScope = class {};
      scope.postMessage = (reply) => replies.push(reply);
      vi.resetModules();
      await import("../../components/steering/simulation-worker.ts");
    });
    afterAll(() => {
      delete scope.WorkerGlobalScope;
      delete scope.postMessage;
      scope.onmessage = null;
    });

    it("answers a move and a path with what calc/ gives for the same input (a step budget of 100 000)", async () => {
      send({ id: 1, kind: "move", input });
      send({ id: 2, kind: "path", input });
      const move = await answer(1);
      const path = await answer(2);
      expect(move).toEqual({ id: 1, kind: "move", outcome: { ok: true, value: simulateSteering(input, { maxSteps: 100_000, revolutions: false }) } });
      expect(path).toEqual({ id: 2, kind: "path", outcome: { ok: true, value: steeringPath({ input, options: { maxSteps: 100_000 } }) } });
    });

    it("runs only the newest of the moves asked for before it could start (the reader still typing)", async () => {
      replies.length = 0;
      send({ id: 3, kind: "move", input: { ...input, commandedDistance: 0.5 } });
      send({ id: 4, kind: "move", input: { ...input, commandedDistance: 0.6 } });
      const newest = await answer(4);
      expect(newest?.kind === "move" && newest.outcome.ok && newest.outcome.value.timeToDistance).toBe(
        simulateSteering({ ...input, commandedDistance: 0.6 }, { maxSteps: 100_000, revolutions: false }).timeToDistance,
      );
      expect(replies.filter((r) => r.id === 3)).toEqual([]);
    });

    it("says why, field by field as calc/ words it, when the input does not hold", async () => {
      send({ id: 5, kind: "move", input: { ...input, spinSpeed: 2000 } });
      const reply = await answer(5);
      expect(reply?.kind === "move" && !reply.outcome.ok && reply.outcome.message).toMatch(/^spinSpeed must be /);
    });

    it("maps window and depth cell by cell, reporting progress, and ends with calc/'s grid", async () => {
      replies.length = 0;
      send({ id: 6, kind: "sweep", input });
      const reply = await answer(6);
      const expected = sweepSteering({ input });
      expect(reply).toEqual({ id: 6, kind: "sweep", outcome: { ok: true, value: expected } });
      const progress = replies.filter((r) => r.id === 6 && r.kind === "progress").map((r) => (r.kind === "progress" ? [r.done, r.total] : null));
      const total = expected.windowWidths.length * expected.depths.length;
      expect(progress).toEqual(Array.from({ length: total }, (_, done) => [done, total]));
    });

    it("stops a map when the values change (a cancel) and says so", async () => {
      replies.length = 0;
      send({ id: 7, kind: "sweep", input });
      send({ id: 0, kind: "cancel" });
      expect(await answer(7)).toEqual({ id: 7, kind: "sweep", outcome: { ok: false, message: "The map was stopped: the values changed." } });
      expect(replies.filter((r) => r.id === 7 && r.kind === "progress")).toHaveLength(1);
    });
  });
});
