/**
 * The sampled path of a commanded move: each refusal's field and wording, the legs' limits, and
 * the sampling (calc/steering/path.ts), from the mutation report.
 */
import { describe, expect, it } from "vitest";
import { DEMO_STEERING_SPINNER } from "../../../calc/steering/inputs.ts";
import { steeringPath } from "../../../calc/steering/path.ts";
import { refusal } from "../../support/refusal.ts";

const D = { ...DEMO_STEERING_SPINNER };
const leg = { direction: 0, duration: 0.05 };

describe("steeringPath refuses a bad move by name", () => {
  it("refuses a missing argument object as args", () => {
    const e = refusal(() => steeringPath(null as never));
    expect(e.param).toBe("args");
    expect(e.message).toBe("args must be an object of named inputs (got null)");
  });

  it("refuses an empty list and a list of 21 legs, giving the count, and a non-list", () => {
    const none = refusal(() => steeringPath({ input: D, legs: [] }));
    expect(none.param).toBe("legs");
    expect(none.value).toBe(0);
    expect(none.expected).toBe("a list of 1 to 20 legs");
    expect(none.unit).toBe("");
    const many = refusal(() => steeringPath({ input: D, legs: Array.from({ length: 21 }, () => ({ direction: 0, duration: 0.01 })) }));
    expect(many.param).toBe("legs");
    expect(many.value).toBe(21);
    const notList = refusal(() => steeringPath({ input: D, legs: "north" as never }));
    expect(notList.param).toBe("legs");
    expect(notList.value).toBe("north");
  });

  it("takes 20 legs, the most allowed (20 · 0.01 s = 0.2 s in all)", () => {
    const path = steeringPath({ input: D, legs: Array.from({ length: 20 }, (_, i) => ({ direction: i, duration: 0.01 })), pointsPerRevolution: 4 });
    expect(path.legs).toHaveLength(20);
    expect(path.legEnds).toHaveLength(20);
    expect(path.legs[19]!.start).toBeCloseTo(0.19, 12);
  });

  it("refuses a leg that is not an object by its index", () => {
    for (const bad of [null, 3]) {
      const e = refusal(() => steeringPath({ input: D, legs: [leg, bad as never] }));
      expect(e.param).toBe("legs[1]");
      expect(e.value).toBe(bad);
      expect(e.expected).toBe("an object { direction, duration }");
      expect(e.unit).toBe("");
    }
  });

  it("refuses a leg's direction in rad and its duration in s, by index", () => {
    const dir = refusal(() => steeringPath({ input: D, legs: [leg, { direction: Number.POSITIVE_INFINITY, duration: 0.1 }] }));
    expect(dir.param).toBe("legs[1].direction");
    expect(dir.unit).toBe("rad");
    const dur = refusal(() => steeringPath({ input: D, legs: [leg, { direction: 0, duration: 11 }] }));
    expect(dur.param).toBe("legs[1].duration");
    expect(dur.unit).toBe("s");
    expect(dur.message).toBe("legs[1].duration must be at least 0.001 s and at most 10 s (got 11 s)");
  });

  it("refuses legs of 0.04 s in all, under the 0.05 s least, naming the total in s", () => {
    const e = refusal(() =>
      steeringPath({
        input: D,
        legs: [
          { direction: 0, duration: 0.02 },
          { direction: 1, duration: 0.02 },
        ],
      }),
    );
    expect(e.param).toBe("total duration of the legs");
    expect(e.unit).toBe("s");
  });

  it("refuses 3 points a revolution and 9 or 10.5 points in all, naming them without a unit", () => {
    const per = refusal(() => steeringPath({ input: D, legs: [leg], pointsPerRevolution: 3 }));
    expect(per.param).toBe("pointsPerRevolution");
    expect(per.message).toBe("pointsPerRevolution must be at least 4 and at most 64 (got 3)");
    const few = refusal(() => steeringPath({ input: D, legs: [leg], maxPoints: 9 }));
    expect(few.param).toBe("maxPoints");
    expect(few.message).toBe("maxPoints must be at least 10 and at most 20000 (got 9)");
    const part = refusal(() => steeringPath({ input: D, legs: [leg], maxPoints: 10.5 }));
    expect(part.param).toBe("maxPoints");
    expect(part.value).toBe(10.5);
    expect(part.message).toBe("maxPoints must be a whole number (got 10.5)");
  });
});

describe("steeringPath's sampling", () => {
  // Two legs of 0.05 s with at most 11 points: Δt = max(2π/(314.16 rad/s · 12), 0.1 s/10) = max(1.667 ms, 10 ms) = 10 ms.
  const coarse = steeringPath({ input: D, legs: [leg, { direction: 1, duration: 0.05 }], maxPoints: 11 });

  it("spreads at most maxPoints samples evenly over the move, the first at rest at the start at the starting spin", () => {
    expect(coarse.points.map((p) => p.time)).toEqual([0, 0.01, 0.02, 0.03, 0.04, 0.05, 0.06, 0.07, 0.08, 0.09, 0.1]);
    expect(coarse.points[0]).toEqual({ time: 0, x: 0, y: 0, heading: 0, spinSpeed: D.spinSpeed });
    expect(coarse.endTime).toBe(0.1);
  });

  it("places a leg's end at the sample taken at its end time (0.05 s), and the last leg's at the final state", () => {
    const atEnd = coarse.points.find((p) => p.time === 0.05)!;
    expect(coarse.legEnds[0]).toEqual({ x: atEnd.x, y: atEnd.y });
    expect(coarse.legs).toEqual([
      { start: 0, direction: 0 },
      { start: 0.05, direction: 1 },
    ]);
  });

  it("gives no wobble with fewer than 4 samples a turn (10 ms at 314.16 rad/s is 2π/3.14 = 2 samples a turn)", () => {
    expect(coarse.wobble).toBe(0);
  });

  it("reads the demo's wobble on a 0.5 s straight move the same within 10 % at 4, 5, 12 and 13 samples a turn (about 0.08 mm; the one-turn mean follows the 0.29 m the body travels)", () => {
    const wobble = (pointsPerRevolution: number) => steeringPath({ input: D, legs: [{ direction: 0, duration: 0.5 }], pointsPerRevolution }).wobble;
    const fine = wobble(24);
    expect(fine).toBeGreaterThan(5e-5);
    expect(fine).toBeLessThan(1e-4);
    for (const pointsPerRevolution of [4, 5, 12, 13]) expect(Math.abs(wobble(pointsPerRevolution) - fine)).toBeLessThan(0.1 * fine);
  });
});
