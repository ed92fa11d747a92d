import { NS, type SpinUpSystem } from "./model.ts";
import {
  A21,
  A31,
  A32,
  A41,
  A42,
  A43,
  A51,
  A52,
  A53,
  A54,
  A61,
  A62,
  A63,
  A64,
  A65,
  A71,
  A73,
  A74,
  A75,
  A76,
  E1,
  E3,
  E4,
  E5,
  E6,
  E7,
  D1,
  D3,
  D4,
  D5,
  D6,
  D7,
} from "../numerics/dopri5-tableau.ts";

/** One Dormand–Prince 5(4) step with its error estimate and dense output (dormand-prince-1980, hairer-norsett-wanner-1). */
export class Dopri5 {
  readonly y = new Float64Array(NS);
  readonly y1 = new Float64Array(NS);
  readonly yt = new Float64Array(NS);
  k1 = new Float64Array(NS);
  readonly k2 = new Float64Array(NS);
  readonly k3 = new Float64Array(NS);
  readonly k4 = new Float64Array(NS);
  readonly k5 = new Float64Array(NS);
  readonly k6 = new Float64Array(NS);
  k7 = new Float64Array(NS);
  readonly r1 = new Float64Array(NS);
  readonly r2 = new Float64Array(NS);
  readonly r3 = new Float64Array(NS);
  readonly r4 = new Float64Array(NS);
  readonly r5 = new Float64Array(NS);
  readonly atol = new Float64Array(NS);
  rtol = 1e-8;
  h = 0;
  denseReady = false;

  /** Takes a trial step of size h from y into y1 (k7 = f(y1)); returns the scaled error norm (≤ 1 to accept). */
  step(sys: SpinUpSystem): number {
    const { y, y1, yt, k1, k2, k3, k4, k5, k6, k7, atol, rtol, h } = this;
    // Stryker disable next-line EqualityOperator: equivalent, a write past the end of a Float64Array is dropped, so the extra pass changes nothing
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * A21 * k1[i]!;
    sys.deriv(yt, k2);
    // Stryker disable next-line EqualityOperator: equivalent, a write past the end of a Float64Array is dropped, so the extra pass changes nothing
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * (A31 * k1[i]! + A32 * k2[i]!);
    sys.deriv(yt, k3);
    // Stryker disable next-line EqualityOperator: equivalent, a write past the end of a Float64Array is dropped, so the extra pass changes nothing
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * (A41 * k1[i]! + A42 * k2[i]! + A43 * k3[i]!);
    sys.deriv(yt, k4);
    // Stryker disable next-line EqualityOperator: equivalent, a write past the end of a Float64Array is dropped, so the extra pass changes nothing
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * (A51 * k1[i]! + A52 * k2[i]! + A53 * k3[i]! + A54 * k4[i]!);
    sys.deriv(yt, k5);
    // Stryker disable next-line EqualityOperator: equivalent, a write past the end of a Float64Array is dropped, so the extra pass changes nothing
    for (let i = 0; i < NS; i++) yt[i] = y[i]! + h * (A61 * k1[i]! + A62 * k2[i]! + A63 * k3[i]! + A64 * k4[i]! + A65 * k5[i]!);
    sys.deriv(yt, k6);
    // Stryker disable next-line EqualityOperator: equivalent, a write past the end of a Float64Array is dropped, so the extra pass changes nothing
    for (let i = 0; i < NS; i++) y1[i] = y[i]! + h * (A71 * k1[i]! + A73 * k3[i]! + A74 * k4[i]! + A75 * k5[i]! + A76 * k6[i]!);
    sys.deriv(y1, k7);
    // Error estimate (hairer-norsett-wanner-1 §II.4): RMS of the 5th−4th order difference over the tolerance.
    let sum = 0;
    for (let i = 0; i < NS; i++) {
      const e = h * (E1 * k1[i]! + E3 * k3[i]! + E4 * k4[i]! + E5 * k5[i]! + E6 * k6[i]! + E7 * k7[i]!);
      const sc = atol[i]! + rtol * Math.max(Math.abs(y[i]!), Math.abs(y1[i]!));
      sum += (e / sc) * (e / sc);
    }
    this.denseReady = false;
    return Math.sqrt(sum / NS);
  }

  /** Builds the continuous extension of the accepted step (hairer-norsett-wanner-1 §II.6). */
  prepareDense(): void {
    if (this.denseReady) return;
    const { y, y1, k1, k3, k4, k5, k6, k7, r1, r2, r3, r4, r5, h } = this;
    // Stryker disable next-line EqualityOperator: equivalent, a write past the end of a Float64Array is dropped, so the extra pass changes nothing
    for (let i = 0; i < NS; i++) {
      const dy = y1[i]! - y[i]!;
      const bspl = h * k1[i]! - dy;
      r1[i] = y[i]!;
      r2[i] = dy;
      r3[i] = bspl;
      r4[i] = dy - h * k7[i]! - bspl;
      r5[i] = h * (D1 * k1[i]! + D3 * k3[i]! + D4 * k4[i]! + D5 * k5[i]! + D6 * k6[i]! + D7 * k7[i]!);
    }
    this.denseReady = true;
  }

  /** Component i at the fraction th of the accepted step (prepareDense first). */
  dense(i: number, th: number): number {
    const th1 = 1 - th;
    return this.r1[i]! + th * (this.r2[i]! + th1 * (this.r3[i]! + th * (this.r4[i]! + th1 * this.r5[i]!)));
  }

  /** Accepts y1 as the new state; k7 becomes k1 (first same as last). */
  advance(): void {
    this.y.set(this.y1);
    const swap = this.k1;
    this.k1 = this.k7;
    this.k7 = swap;
  }
}
