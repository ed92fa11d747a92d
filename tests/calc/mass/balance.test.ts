/**
 * Balance of a spinning body (calc/mass/balance.ts) at the edges a user can reach: the direction
 * reported for no unbalance at all, and the refusals when a figure leaves the doubles (each names
 * the input that took it there, its value and SI unit, and the quantity, as the page shows them).
 * The largest double is about 1.8e308, so a product past it is refused, not shown as infinity.
 */
import { describe, expect, it } from "vitest";
import { coupleUnbalance, equivalentBalanceGrade, finestGradeMet, permissibleResidualUnbalance, staticUnbalance, twoPlaneCorrection } from "#calc";
import { expectRefusal } from "../../support/refusal.ts";

describe("static unbalance and equivalent grade: the input that overflows them is named", () => {
  it("names a total mass whose rotating force passes the largest double", () => {
    // U = 1e306 kg × 0.002 m = 2e303 kg·m; F = U·ω² = 2e303 × 1000² = 2e309 N, past 1.8e308.
    expectRefusal(
      () => staticUnbalance({ totalMass: 1e306, offset: 0.002, angularSpeed: 1000 }),
      "totalMass",
      1e306,
      "kg",
      "totalMass must be small enough for the static unbalance to stay finite (got 1e+306 kg)",
    );
  });

  it("names an offset whose rotating force passes the largest double", () => {
    // U = 1.4 kg × 1e306 m = 1.4e306 kg·m; F = 1.4e306 × 100² = 1.4e310 N.
    expectRefusal(
      () => staticUnbalance({ totalMass: 1.4, offset: 1e306, angularSpeed: 100 }),
      "offset",
      1e306,
      "m",
      "offset must be small enough for the static unbalance to stay finite (got 1e+306 m)",
    );
  });

  it("names the offset or the speed whose product e·Ω passes the largest double", () => {
    // G = e·Ω = 1e306 m × 1000 rad/s = 1e309 m/s.
    expectRefusal(
      () => equivalentBalanceGrade({ offset: 1e306, angularSpeed: 1000 }),
      "offset",
      1e306,
      "m",
      "offset must be small enough for the balance grade to stay finite (got 1e+306 m)",
    );
    // G = 100 m × 1e307 rad/s = 1e309 m/s.
    expectRefusal(
      () => equivalentBalanceGrade({ offset: 100, angularSpeed: 1e307 }),
      "angularSpeed",
      1e307,
      "rad/s",
      "angularSpeed must be small enough for the balance grade to stay finite (got 1e+307 rad/s)",
    );
  });

  it("refuses a negative grade when looking up the finest grade met, in m/s", () => {
    expectRefusal(() => finestGradeMet(-0.001), "grade", -0.001, "m/s", "grade must be 0 m/s or more (got -0.001 m/s)");
  });
});

describe("permissible residual unbalance: the input that overflows it is named", () => {
  it("names a total mass whose U_per = M·G/Ω passes the largest double", () => {
    // e_per = G/Ω = 4 / 0.001 = 4000 m; U_per = 1e306 × 4000 = 4e309 kg·m.
    expectRefusal(
      () => permissibleResidualUnbalance({ totalMass: 1e306, grade: 4, angularSpeed: 0.001 }),
      "totalMass",
      1e306,
      "kg",
      "totalMass must be small enough for the permissible unbalance to stay finite (got 1e+306 kg)",
    );
  });

  it("names a grade whose e_per = G/Ω passes the largest double", () => {
    // e_per = 1e306 / 0.001 = 1e309 m.
    expectRefusal(
      () => permissibleResidualUnbalance({ totalMass: 1.4, grade: 1e306, angularSpeed: 0.001 }),
      "grade",
      1e306,
      "m/s",
      "grade must be small enough for the permissible unbalance to stay finite (got 1e+306 m/s)",
    );
  });

  it("names a service speed so slow that U_per passes the largest double", () => {
    // e_per = 0.0025 / 1e-308 = 2.5e305 m; U_per = 1000 kg × 2.5e305 m = 2.5e308 kg·m.
    expectRefusal(
      () => permissibleResidualUnbalance({ totalMass: 1000, grade: 0.0025, angularSpeed: 1e-308 }),
      "angularSpeed",
      1e-308,
      "rad/s",
      "angularSpeed must be large enough for the permissible unbalance to stay finite (got 1e-308 rad/s)",
    );
  });
});

describe("couple unbalance at the edges", () => {
  it("gives no direction (0) for no couple, also for a product entered as −0", () => {
    // atan2(0, −0) would be π: with no couple there is no direction to report.
    const c = coupleUnbalance({ productXZ: -0, productYZ: 0, angularSpeed: 100 });
    expect([c.couple, c.moment, c.angle]).toEqual([0, 0, 0]);
  });

  it("names the product of inertia whose rocking moment passes the largest double", () => {
    // M = ω²·C = 1000² × 1e305 = 1e311 N·m.
    expectRefusal(
      () => coupleUnbalance({ productXZ: 1e305, productYZ: 0, angularSpeed: 1000 }),
      "productXZ",
      1e305,
      "kg·m²",
      "productXZ must be small enough for the couple unbalance to stay finite (got 1e+305 kg·m²)",
    );
    expectRefusal(
      () => coupleUnbalance({ productXZ: 0, productYZ: -1e305, angularSpeed: 1000 }),
      "productYZ",
      -1e305,
      "kg·m²",
      "productYZ must be small enough for the couple unbalance to stay finite (got -1e+305 kg·m²)",
    );
  });
});

describe("two-plane correction at the edges", () => {
  // The worked case of the function's documentation: 10 g at (50 mm, 0, 10 mm), planes 0 and 20 mm, r = 50 mm.
  const base = { firstMomentX: 5e-4, firstMomentY: 0, productXZ: 5e-6, productYZ: 0, planeZ1: 0, planeZ2: 0.02, radius: 0.05 };

  it("asks nothing of a balanced body: 0 kg in each plane, at direction 0 (the +x axis), not at 180°", () => {
    const fix = twoPlaneCorrection({ ...base, firstMomentX: 0, productXZ: 0 });
    for (const plane of [fix.lower, fix.upper]) {
      expect([plane.mass, plane.unbalance, plane.angle]).toEqual([0, 0, 0]);
      expect([plane.x, plane.y]).toEqual([0.05, 0]);
    }
    expect([fix.lower.z, fix.upper.z]).toEqual([0, 0.02]);
  });

  it("names a correction radius so small that the masses pass the largest double", () => {
    // u₁ = (z₂·U − C)/(z₁ − z₂) = (0.02 × 5e-4 − 5e-6)/(−0.02) = −2.5e-4 kg·m; m₁ = 2.5e-4 / 1e-315 = 2.5e311 kg.
    expectRefusal(
      () => twoPlaneCorrection({ ...base, radius: 1e-315 }),
      "radius",
      1e-315,
      "m",
      "radius must be large enough for the correction mass to stay finite (got 1e-315 m)",
    );
  });

  it("names the first moment or product of inertia whose correction mass passes the largest double", () => {
    // u₁ = (0.02 × 1e307 − 5e-6)/(−0.02) = −1e307 kg·m; m₁ = 1e307 / 0.05 = 2e308 kg.
    const cases = [
      ["firstMomentX", 1e307, "kg·m"],
      ["firstMomentY", 1e307, "kg·m"],
      // u₂ = (C − z₁·U)/(z₁ − z₂) = −1e307/0.02 = −5e308 kg·m.
      ["productXZ", 1e307, "kg·m²"],
      ["productYZ", -1e307, "kg·m²"],
    ] as const;
    for (const [param, value, unit] of cases) {
      expectRefusal(
        () => twoPlaneCorrection({ ...base, [param]: value }),
        param,
        value,
        unit,
        `${param} must be small enough for the correction mass to stay finite (got ${value < 0 ? "-" : ""}1e+307 ${unit})`,
      );
    }
  });

  it("names the upper plane, with the height it was given, when the planes are too close for the masses to stay finite", () => {
    // Planes 1e-315 m apart: u₁ = (z₂·U − C)/(z₁ − z₂) ≈ 5e-6 / 1e-315 = 5e309 kg·m.
    expectRefusal(
      () => twoPlaneCorrection({ ...base, planeZ1: 0, planeZ2: 1e-315 }),
      "planeZ2",
      1e-315,
      "m",
      "planeZ2 must be large enough for the correction mass to stay finite (got 1e-315 m)",
    );
    // With the lower plane off 0 the message still reports the height typed for the upper plane
    // (1e-315 m), not the gap between the planes (2e-315 m).
    expectRefusal(
      () => twoPlaneCorrection({ ...base, planeZ1: 3e-315, planeZ2: 1e-315 }),
      "planeZ2",
      1e-315,
      "m",
      "planeZ2 must be large enough for the correction mass to stay finite (got 1e-315 m)",
    );
    // The lower plane 1e-315 m off an upper plane at 0: the lower plane is the one named.
    expectRefusal(
      () => twoPlaneCorrection({ ...base, planeZ1: 1e-315, planeZ2: 0 }),
      "planeZ1",
      1e-315,
      "m",
      "planeZ1 must be large enough for the correction mass to stay finite (got 1e-315 m)",
    );
  });
});
