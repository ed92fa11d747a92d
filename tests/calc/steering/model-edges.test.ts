/**
 * The steering model's set-up refusals (calc/steering/model.ts): the depth of modulation the
 * steady duty leaves room for, with and without the opposite window, and a spin the pack cannot
 * hold (from the mutation report of calc/steering/model.ts).
 */
import { describe, expect, it } from "vitest";
import { DEMO_STEERING_SPINNER as D } from "../../../calc/steering/inputs.ts";
import { SteeringModel } from "../../../calc/steering/model.ts";
import { refusal } from "../../support/refusal.ts";

describe("the room the steady duty leaves for the modulation", () => {
  // Six cells instead of four: the duty that holds the demo's spin falls below one half, so the room
  // below it (D) and above it (1 − D) differ.
  const six = { ...D, cellCount: 6 };
  const base = new SteeringModel({ ...six, depth: 0 }).baseDuty;

  it("holds the demo spin at a duty below one half on six cells", () => {
    expect(base).toBeGreaterThan(0);
    expect(base).toBeLessThan(0.5);
  });

  it("with the opposite window, allows a depth up to the duty itself (the room below it) and refuses more, saying so", () => {
    expect(() => new SteeringModel({ ...six, depth: base })).not.toThrow();
    const e = refusal(() => new SteeringModel({ ...six, depth: 0.5 }));
    expect(e.param).toBe("depth");
    expect(e.unit).toBe("");
    const b = Number(base.toPrecision(3));
    expect(e.message).toBe(`depth must be at most ${b}, the duty left above and below the ${b} that holds the spin (got 0.5)`);
  });

  it("without the opposite window, allows a depth up to 1 − D (only the room above is used) and refuses more, saying so", () => {
    expect(() => new SteeringModel({ ...six, depth: 0.5, oppositeWindow: 0 })).not.toThrow();
    const e = refusal(() => new SteeringModel({ ...six, depth: 0.9, oppositeWindow: 0 }));
    expect(e.message).toBe(
      `depth must be at most ${Number((1 - base).toPrecision(3))}, the duty left above the ${Number(base.toPrecision(3))} that holds the spin (got 0.9)`,
    );
  });
});

describe("a spin the pack cannot hold", () => {
  it("refuses the demo spin on one cell (4.1 V) by the spin speed, in rad/s, with the reason", () => {
    const e = refusal(() => new SteeringModel({ ...D, cellCount: 1 }));
    expect(e.param).toBe("spinSpeed");
    expect(e.unit).toBe("rad/s");
    expect(e.message).toBe("spinSpeed must be a speed the pack can hold at full duty (got 314.159 rad/s)");
  });
});
