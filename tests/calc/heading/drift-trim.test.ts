/**
 * The radius trim's refusals (calc/heading/drift-trim.ts): the field each names, its unit and its
 * wording, for a sense or a measure it does not know and for a timed drift past half a turn per turn.
 */
import { describe, expect, it } from "vitest";
import { toSI } from "../../../calc/core/units.ts";
import { radiusTrim, type RadiusTrimInput } from "../../../calc/heading/drift-trim.ts";
import { refusal } from "../../support/refusal.ts";

const BASE: RadiusTrimInput = { assumedRadius: 0.008, sense: "ahead", measure: "turn", driftPerTurn: toSI(20, "deg"), driftRate: 0, angularSpeed: 200 };

describe("radiusTrim refusals", () => {
  it("names a sense it does not know and lists the two it takes, with no unit", () => {
    const error = refusal(() => radiusTrim({ ...BASE, sense: "sideways" as never }));
    expect(error.param).toBe("sense");
    expect(error.unit).toBe("");
    expect(error.message).toBe('sense must be one of ahead, behind (got "sideways")');
  });

  it("names a measure it does not know and lists the two it takes, with no unit", () => {
    const error = refusal(() => radiusTrim({ ...BASE, measure: "hour" as never }));
    expect(error.param).toBe("measure");
    expect(error.unit).toBe("");
    expect(error.message).toBe('measure must be one of turn, second (got "hour")');
  });

  it("refuses a timed drift past 180° a turn in rad/s: 3600 °/s at 0.1 rad/s is 2π × 62.83/0.1 = 3948 rad a turn", () => {
    const driftRate = toSI(3600, "deg/s");
    const error = refusal(() => radiusTrim({ ...BASE, measure: "second", driftRate, angularSpeed: 0.1 }));
    expect(error.param).toBe("driftRate");
    expect(error.value).toBe(driftRate);
    expect(error.unit).toBe("rad/s");
    expect(error.expected).toBe("at most 180° of drift per turn at this spin speed");
  });
});
