/**
 * The demo design (calc/design/demo.ts): an invented robot that says so, whose sections agree with
 * its own mass layout, and what the build sheet shows for it. The figures pinned here are demo data
 * (an invented 1.4 kg spinner), kept so that a changed demo value or check is noticed: the chapters'
 * worked examples, the build sheet's first view and shared links of the demo all show them.
 */
import { describe, expect, it } from "vitest";
import { demoDesign, demoRobotParts, massProperties, overallStatus, rpmToRadPerSecond, runChecks, STANDARD_GRAVITY, type Design } from "#calc";

// biome-ignore lint/suspicious/noExplicitAny: test access to the sections as plain objects
const demo = demoDesign() as Design & Record<string, any>;
const TOP = rpmToRadPerSecond(2400);

describe("the demo design", () => {
  it("says it is invented, in its name and its notes", () => {
    expect(demo.name).toBe("Demo: invented 1.4 kg whole-body spinner");
    expect(demo.notes).toMatch(/^An invented robot .*not a real machine\. Every value here is demo data\.$/);
    expect(demo.units).toBe("metric");
    expect(demo.created).toBe("2026-11-30T12:00:00.000Z");
    expect(demo.modified).toBe(demo.created);
  });

  it("is the same design every time (stable links and printouts)", () => {
    expect(demoDesign()).toEqual(demo);
  });

  it("takes its sensor radius, inertia and mass from its own mass layout, so that the sections agree", () => {
    const parts = demoRobotParts();
    const layout = massProperties(parts);
    const sensor = parts.find((p) => p.name === "accelerometer")!;
    // The sensor's true radius: its distance from the spin centre (the mass centre of the layout).
    const trueRadius = Math.hypot(sensor.x - layout.centreX, sensor.y - layout.centreY);
    // What a firmware would assume: its distance from the geometric centre (the layout's origin).
    const assumedRadius = Math.hypot(sensor.x, sensor.y);
    expect(trueRadius).not.toBeCloseTo(assumedRadius, 4);
    expect(demo.placement.radius).toBe(trueRadius);
    expect(demo.headingDrift.trueRadius).toBe(trueRadius);
    expect(demo.headingDrift.assumedRadius).toBe(assumedRadius);
    expect(demo.placement.partRadius).toBe(Math.hypot(0.012 - layout.centreX, layout.centreY));
    expect(demo.drivetrain.inertia).toBe(layout.inertiaAboutCentre);
    expect(demo.drivetrain.robotMass).toBe(layout.totalMass);
    expect(demo.mass.parts).toEqual(parts);
  });

  it("runs every section at 2400 rpm", () => {
    for (const value of [
      demo.placement.topSpeed,
      demo.headingDrift.angularSpeed,
      demo.mass.spinSpeed,
      demo.fasteners[1].angularSpeed,
      demo.rims[0].angularSpeed,
      demo.drivetrain.targetSpeed,
    ])
      expect(value).toBe(TOP);
    expect(demo.placement.lowSpeed).toBe(rpmToRadPerSecond(400));
  });

  it("holds the demo sensor's figures: ±400 gₙ full scale, 800 gₙ over 4096 counts, 2 % speed resolution", () => {
    expect(demo.placement.fullScale).toBe(400 * STANDARD_GRAVITY);
    expect(demo.placement.step).toBe((800 / 4096) * STANDARD_GRAVITY);
    expect(demo.placement.resolution).toBe(0.02);
    expect(demo.placement.partMass).toBe(0.28);
  });

  it("holds its mass section's grade, mode and three counterweight places", () => {
    expect(demo.mass.balanceGrade).toBe(0.25);
    expect(demo.mass.mode).toBe("p");
    expect(demo.mass.candidates).toEqual([
      { x: -0.055, y: 0 },
      { x: -0.05, y: 0.02 },
      { x: 0, y: -0.055 },
    ]);
  });

  it("holds two bolted joints and one rim, each named, with the chapters' thresholds", () => {
    expect(demo.fasteners.map((f: { name: string }) => f.name)).toEqual(["Counterweight washers (one M4 bolt)", "Battery bracket (two M3 bolts)"]);
    const bracket = demo.fasteners[1];
    expect([bracket.size, bracket.grade, bracket.jointMode, bracket.threadIn, bracket.count]).toEqual(["M3", "8.8", "shear", "al-6061-t6", 2]);
    expect([bracket.partMass, bracket.radius, bracket.stackHeight, bracket.gripLength, bracket.engagedLength]).toEqual([0.3, 0.016, 0.002, 0.002, 0.005]);
    for (const entry of [...demo.fasteners, ...demo.rims]) expect([entry.failBelow, entry.marginalBelow]).toEqual([1, 2]);
    expect(demo.rims).toHaveLength(1);
    expect([demo.rims[0].name, demo.rims[0].shape, demo.rims[0].outerRadius, demo.rims[0].innerRadius]).toEqual([
      "Steel armour ring",
      "thin-ring",
      0.075,
      0.068,
    ]);
    expect([demo.drivetrain.driveType, demo.drivetrain.tipRadius]).toEqual(["spinner", 0.075]);
  });

  it("shows these results on the build sheet (demo data)", () => {
    const results = runChecks(demo, "metric");
    expect(results.map((r) => [r.id, r.status, r.figure?.label, r.figure?.text])).toEqual([
      ["placement", "holds", "Sensor reading at top speed", "217 gₙ"],
      ["headingDrift", "fails", "Drift rate", "393 °/s"],
      ["mass", "marginal", "Equivalent balance grade", "437 mm/s"],
      ["mass.lift", "holds", "Rocking moment as a share of the weight's", "6.11 %"],
      ["mass.sensor", "info", "Drift per revolution", "9.03°"],
      ["fasteners[0]", "holds", "Safety factor", "5.24"],
      ["fasteners[1]", "holds", "Safety factor", "2.89"],
      ["rims[0]", "holds", "Safety factor against yield", "156"],
      ["drivetrain", "holds", "Time to target speed", "1.65 s"],
      ["drivetrain.energy", "info", "Stored energy", "137 J"],
    ]);
    expect(overallStatus(results)).toBe("fails");
    expect(results.find((r) => r.id === "mass")!.margin).toBe(
      "Centre of mass 1.74 mm off the geometric centre: equivalent grade G 437; a 39.0 g counterweight brings it to 0.200 mm",
    );
    expect(results.find((r) => r.id === "drivetrain")!.margin).toBe(
      "Reaches it in 1.65 s (90 % in 1.48 s); peak battery current 60.0 A, battery sags to 10.5 V",
    );
  });

  it("stores the kinetic energy ½Iω² of its own layout at 2400 rpm (137 J) and a tip speed ωr of 18.8 m/s", () => {
    // E = ½ I ω², v = ω r: W. Moebs, S. J. Ling, J. Sanny, University Physics vol. 1, OpenStax 2016, §10.4 and §10.3.
    const { inertiaAboutCentre } = massProperties(demoRobotParts());
    const energy = 0.5 * inertiaAboutCentre * TOP ** 2;
    expect(energy).toBeGreaterThan(136.5);
    expect(energy).toBeLessThan(137.5);
    const energyCheck = runChecks(demo, "metric").find((r) => r.id === "drivetrain.energy")!;
    expect(energyCheck.margin).toBe(`137 J at 2400 rpm, tip speed ${(TOP * 0.075).toFixed(1)} m/s`);
  });
});
