/**
 * The spin-up model's Dormand–Prince 5(4) stepper on the test equations y' = y and y' = −y: one
 * step against the method's stability polynomial and e^h, the error estimate's order, the dense
 * output at both ends of the step and its reuse after the step is cut at an event, and first same as
 * last (dormand-prince-1980; hairer-norsett-wanner-1 §II.4–§II.6).
 */
import { describe, expect, it } from "vitest";
import { Dopri5 } from "../../../calc/drivetrain/dopri5.ts";
import { NS, type SpinUpSystem } from "../../../calc/drivetrain/model.ts";

/** y'_i = λ_i·y_i with λ = +1 for even i and −1 for odd i: e^t and e^−t side by side in all 11 slots. */
const alternating = (i: number) => (i % 2 === 0 ? 1 : -1);
let slope: (i: number) => number = alternating;
const lambda = (i: number) => slope(i);
const linear = {
  evaluations: 0,
  deriv(y: Float64Array, dy: Float64Array) {
    for (let i = 0; i < NS; i++) dy[i] = lambda(i) * y[i]!;
    this.evaluations++;
  },
};
const sys = linear as unknown as SpinUpSystem;

/** A stepper at y = 1 in every slot with k1 = f(y), an absolute tolerance of 1 and no relative one. */
function start(h: number): Dopri5 {
  const st = new Dopri5();
  st.y.fill(1);
  linear.deriv(st.y, st.k1);
  st.atol.fill(1);
  st.rtol = 0;
  st.h = h;
  return st;
}

// The method's stability function, from memory (hairer-norsett-wanner-1; the 5th-order solution of
// y' = λy after one step is R(hλ)·y): R(z) = 1 + z + z²/2 + z³/6 + z⁴/24 + z⁵/120 + z⁶/600.
const R = (z: number) => 1 + z + z ** 2 / 2 + z ** 3 / 6 + z ** 4 / 24 + z ** 5 / 120 + z ** 6 / 600;

describe("one Dormand–Prince step on y' = ±y", () => {
  it("lands on the stability polynomial R(±h), within h⁶/7200 of e^(±h)", () => {
    const h = 0.1;
    const st = start(h);
    st.step(sys);
    for (let i = 0; i < NS; i++) {
      const z = lambda(i) * h;
      expect(Math.abs(st.y1[i]! - R(z))).toBeLessThan(1e-15);
      // e^z − R(z) = z⁶/720 − z⁶/600 + O(z⁷) = −z⁶/3600 + …: 2.8e-10 at h = 0.1.
      expect(Math.abs(st.y1[i]! - Math.exp(z))).toBeLessThan(h ** 6 / 3000);
    }
  });

  it("estimates an error that shrinks as h⁵ (the embedded 4th-order solution's local error)", () => {
    const err = start(0.1).step(sys);
    const half = start(0.05).step(sys);
    // Halving h divides the leading error term (∝ h⁵) by 2⁵ = 32; the h⁶ terms move it by about 1 %.
    expect(err).toBeGreaterThan(0);
    expect(err).toBeLessThan(0.1 ** 5 / 100);
    expect(err / half).toBeGreaterThan(31);
    expect(err / half).toBeLessThan(33);
  });

  it("scales the error by atol + rtol·max(|y|, |y₁|): the larger end on a growth and on a decay", () => {
    for (const sign of [1, -1]) {
      slope = () => sign;
      const abs = start(0.1).step(sys); // atol = 1: the error itself
      const rel = start(0.1);
      rel.atol.fill(0);
      rel.rtol = 1e-3;
      const err = rel.step(sys);
      // Growth: y₁ = e^0.1 > y = 1, so the scale is 1e-3·y₁; decay: y = 1 > y₁, so it is 1e-3.
      const scale = 1e-3 * (sign > 0 ? rel.y1[0]! : 1);
      expect(Math.abs(err * scale - abs)).toBeLessThan(1e-12 * abs);
    }
    slope = alternating;
  });

  it("uses six new evaluations per step and reuses the last as the next step's first (first same as last)", () => {
    const st = start(0.1);
    linear.evaluations = 0;
    st.step(sys);
    expect(linear.evaluations).toBe(6);
    const last = Float64Array.from(st.k7);
    st.advance();
    expect(Array.from(st.y)).toEqual(Array.from(st.y1));
    expect(Array.from(st.k1)).toEqual(Array.from(last));
    for (let i = 0; i < NS; i++) expect(st.k1[i]).toBe(lambda(i) * st.y[i]!);
  });
});

describe("dense output (hairer-norsett-wanner-1 §II.6)", () => {
  it("runs from y at θ = 0 to y₁ at θ = 1, and follows e^(±θh) between to about h⁵", () => {
    const h = 0.1;
    const st = start(h);
    st.step(sys);
    st.prepareDense();
    for (let i = 0; i < NS; i++) {
      expect(st.dense(i, 0)).toBe(1);
      expect(Math.abs(st.dense(i, 1) - st.y1[i]!)).toBeLessThan(1e-15);
      for (const th of [0.25, 0.5, 0.75]) expect(Math.abs(st.dense(i, th) - Math.exp(lambda(i) * th * h))).toBeLessThan(h ** 5 / 100);
    }
  });

  it("keeps the accepted step's interpolant when y₁ is then moved to an event inside the step", () => {
    const st = start(0.1);
    st.step(sys);
    st.prepareDense();
    const before = Array.from({ length: NS }, (_, i) => st.dense(i, 0.5));
    // The simulation cuts the step at an event: y₁ ← the dense value at θ = 0.3, then asks again.
    for (let i = 0; i < NS; i++) st.y1[i] = st.dense(i, 0.3);
    st.prepareDense();
    for (let i = 0; i < NS; i++) expect(st.dense(i, 0.5)).toBe(before[i]);
    // A new step builds a new interpolant.
    st.advance();
    st.step(sys);
    st.prepareDense();
    expect(Math.abs(st.dense(0, 0) - st.y[0]!)).toBe(0);
    expect(Math.abs(st.dense(0, 1) - st.y1[0]!)).toBeLessThan(1e-15);
  });

  it("a stepper filled by hand builds its interpolant on the first call", () => {
    const st = new Dopri5();
    st.h = 0.1;
    st.y.fill(2);
    st.y1.fill(3);
    for (const k of [st.k1, st.k3, st.k4, st.k5, st.k6, st.k7]) k.fill(10);
    st.prepareDense();
    for (let i = 0; i < NS; i++) {
      expect(st.dense(i, 0)).toBe(2);
      expect(Math.abs(st.dense(i, 1) - 3)).toBeLessThan(1e-15);
    }
  });
});
