import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  accelerometerPlacementInputs,
  demoDesign,
  designToText,
  DESIGN_VERSION,
  migrateDesign,
  newDesign,
  readDesign,
  readDesignText,
  runChecks,
  overallStatus,
  buildSheetText,
  describeProblems,
  terminalSafe,
  type Design,
} from "#calc";

// Sections are read by their calculators; the tests look into them as plain objects.
// biome-ignore lint/suspicious/noExplicitAny: test access to any section
const demo = demoDesign() as Design & Record<string, any>;

/** Any valid placement section: every value inside its declared range. */
const placementArb = fc.record(
  Object.fromEntries(
    Object.entries(accelerometerPlacementInputs).map(([name, spec]) => [
      name,
      fc.double({ min: (spec as { minOpen?: boolean }).minOpen ? spec.min + (spec.max - spec.min) * 1e-6 : spec.min, max: spec.max, noNaN: true }),
    ]),
  ) as Record<keyof typeof accelerometerPlacementInputs, fc.Arbitrary<number>>,
);
const designArb = fc
  .record({
    name: fc.string({ maxLength: 80 }),
    notes: fc.string({ maxLength: 200 }),
    units: fc.constantFrom("metric", "us") as fc.Arbitrary<"metric" | "us">,
    placement: fc.option(placementArb, { nil: undefined }),
  })
  .map((d): Design => {
    const design: Design = { ...newDesign(d.name, new Date("2026-01-01T00:00:00Z")), notes: d.notes, units: d.units };
    if (d.placement) design.placement = d.placement;
    return design;
  });

describe("design file", () => {
  it("reads the demo design back unchanged, with no problems", () => {
    const reading = readDesignText(designToText(demo));
    expect(reading).toEqual({ ok: true, design: demo, problems: [], migratedFrom: null });
  });

  it("survives save → load unchanged for any valid design (property)", () => {
    fc.assert(
      fc.property(designArb, (design) => {
        const reading = readDesignText(designToText(design));
        expect(reading.ok && reading.design).toEqual(design);
        expect(reading.ok && reading.problems).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });

  it("refuses text that is not JSON, with the parser's reason", () => {
    const reading = readDesignText("{ not json");
    expect(reading.ok).toBe(false);
    expect(!reading.ok && reading.problems[0]!.message).toMatch(/^is not valid JSON \(/);
  });

  it("refuses a file of another kind", () => {
    expect(readDesign({ hello: 1 })).toEqual({
      ok: false,
      problems: [{ path: "format", message: 'is missing: this is not a Whirlbook design file (it has no "format": "whirlbook-design")', action: "not-read" }],
    });
    expect(readDesign({ format: "other", version: 1 })).toEqual({
      ok: false,
      problems: [{ path: "format", message: 'must be "whirlbook-design": this is not a Whirlbook design file', action: "not-read" }],
    });
  });

  it("refuses a design from a newer version and says so", () => {
    const reading = readDesign({ ...demo, version: DESIGN_VERSION + 1 });
    expect(reading.ok).toBe(false);
    expect(!reading.ok && reading.problems[0]!.message).toBe(
      `is ${DESIGN_VERSION + 1}, newer than this handbook reads (${DESIGN_VERSION}); open it with a newer version of the handbook`,
    );
  });

  it("keeps every valid value of a partly invalid file and explains the rest, field by field", () => {
    const broken = JSON.parse(designToText(demo));
    broken.placement.radius = -3;
    broken.placement.topSpeed = "fast";
    broken.fasteners[1].size = "M99";
    broken.mass.parts[2] = { name: "lid", shape: { kind: "blob" } };
    broken.colour = "red";
    const reading = readDesign(broken);
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    // biome-ignore lint/suspicious/noExplicitAny: test access to any section
    const read = reading.design as Record<string, any>;
    expect(read.placement!.radius).toBe(accelerometerPlacementInputs.radius.default);
    expect(read.placement!.fullScale).toBe(demo.placement!.fullScale);
    expect(read.fasteners![1]!.size).toBe("M4");
    expect(read.fasteners![1]!.partMass).toBe(demo.fasteners![1]!.partMass);
    expect(read.mass!.parts).toHaveLength(demo.mass!.parts.length - 1);
    const paths = reading.problems.map((p) => `${p.path}: ${p.action}`);
    expect(paths).toEqual([
      "colour: section-dropped",
      "placement.topSpeed: default-used",
      "placement.radius: default-used",
      "mass.parts[2]: item-dropped",
      "fasteners[1].size: default-used",
    ]);
    expect(reading.problems[2]!.message).toBe("Sensor radius must be greater than 0 mm and at most 2000 mm (got -3000 mm); the default, 20 mm, was used");
    expect(reading.problems[3]!.message).toBe("x is missing, in entry 3 “lid” of the parts list; it was left out");
    expect(reading.problems[4]!.message).toBe(
      'Thread size must be one of M2, M2.5, M3, M4, M5, M6, M8, M10, M12, #2-56, #4-40, #6-32, #8-32, #10-24, #10-32, 1/4-20, 5/16-18, 3/8-16 (got the text "M99"); M4 × 0.7 was used',
    );
  });

  it("migrates an older version forward step by step", () => {
    const migrations = {
      1: (d: Record<string, unknown>) => ({ ...d, renamed: d.old }),
      2: (d: Record<string, unknown>) => ({ ...d, units: "metric" }),
    };
    expect(migrateDesign({ version: 1, old: 5 }, migrations, 3)).toEqual({ version: 3, old: 5, renamed: 5, units: "metric" });
    expect(() => migrateDesign({ version: 1 }, {}, 2)).toThrow("version must be a design version this handbook can bring forward (1 to 2) (got 1)");
  });

  it('reads a version 1 file: the mass section\'s numbers move out of "scalars"', () => {
    const { mass, ...rest } = JSON.parse(designToText(demo));
    const { parts, candidates, mode, ...scalars } = mass;
    const reading = readDesign({ ...rest, version: 1, mass: { scalars, parts, candidates } });
    expect(reading.ok && reading.migratedFrom).toBe(1);
    expect(reading.ok && (reading.design.mass as Record<string, unknown>).spinSpeed).toBe(scalars.spinSpeed);
    expect(reading.ok && (reading.design.mass as Record<string, unknown>).parts).toEqual(parts);
  });
});

describe("a version 2 design: fasteners as the earlier average-shear check stored them", () => {
  /** The demo's two fastener entries as version 2 wrote them (class, mode, shear ratio, shear plane). */
  const version2 = () => {
    const { fasteners: _f, ...rest } = JSON.parse(designToText(demo));
    const old = (name: string, values: Record<string, unknown>) => ({
      name,
      partMass: 0.042,
      radius: 0.055,
      angularSpeed: (2400 * Math.PI) / 30,
      count: 1,
      shearRatio: 0.5,
      failBelow: 1,
      marginalBelow: 2,
      size: "M4",
      propertyClass: "8.8",
      mode: "shear",
      shearPlane: "thread",
      ...values,
    });
    return {
      ...rest,
      version: 2,
      fasteners: [
        old("Counterweight washers (one M4 bolt)", {}),
        old("Motor pod", { size: "M3", propertyClass: "12.9", mode: "tension", shearPlane: "shank", shearRatio: 0.6 }),
      ],
    };
  };

  it("reads without a single problem: the class becomes the grade, the mode the joint mode, the retired values are dropped", () => {
    const reading = readDesign(version2());
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    expect(reading.migratedFrom).toBe(2);
    expect(reading.problems).toEqual([]);
    // biome-ignore lint/suspicious/noExplicitAny: test access to any section
    const [washers, pod] = (reading.design as Record<string, any>).fasteners;
    expect(washers).toMatchObject({ size: "M4", grade: "8.8", jointMode: "shear", partMass: 0.042, count: 1 });
    expect(pod).toMatchObject({ size: "M3", grade: "12.9", jointMode: "tension" });
    for (const entry of [washers, pod]) {
      expect(entry).not.toHaveProperty("propertyClass");
      expect(entry).not.toHaveProperty("mode");
      expect(entry).not.toHaveProperty("shearRatio");
      expect(entry).not.toHaveProperty("shearPlane");
    }
  });

  it("reads a version 2 mass layout, drive train and rims without the values version 3 added, at their defaults and with no problem", () => {
    const raw = version2() as Record<string, Record<string, unknown> | Record<string, unknown>[]>;
    const strip = (entry: Record<string, unknown>, names: string[]) => Object.fromEntries(Object.entries(entry).filter(([k]) => !names.includes(k)));
    raw.mass = strip(raw.mass as Record<string, unknown>, ["sideGrip", "gripShare", "supportRadius"]);
    raw.drivetrain = strip(raw.drivetrain as Record<string, unknown>, ["currentLimitAt", "noLoadLoss", "noLoadVoltage"]);
    raw.rims = (raw.rims as Record<string, unknown>[]).map((r) => strip(r, ["strengthBasis"]));
    const reading = readDesign(raw);
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    expect(reading.problems).toEqual([]);
    // biome-ignore lint/suspicious/noExplicitAny: test access to any section
    const design = reading.design as Record<string, any>;
    expect(design.mass).toMatchObject({ sideGrip: 0.8, gripShare: 0.9, supportRadius: 0.07 });
    expect(design.drivetrain).toMatchObject({ currentLimitAt: "motor", noLoadLoss: "constant" });
    expect(design.rims[0]).toMatchObject({ strengthBasis: "minimum" });
  });

  it("gives the new joint values the calculator's defaults: 75 % of proof, μ = 0.2, a 5 mm stack, tapped 8 mm into 6061-T6", () => {
    const reading = readDesign(version2());
    // biome-ignore lint/suspicious/noExplicitAny: test access to any section
    const washers = reading.ok && (reading.design as Record<string, any>).fasteners[0];
    expect(washers).toMatchObject({
      preloadFrom: "share",
      preloadShare: 0.75,
      nutFactor: 0.2,
      frictionCoefficient: 0.2,
      stackHeight: 0.005,
      threadIn: "al-6061-t6",
      engagedLength: 0.008,
      loadFrom: "spin",
      endCondition: "cantilever",
    });
  });

  it("runs the joint check on the migrated entries: the washer stack holds by friction and names the mode on the build sheet", () => {
    const reading = readDesign(version2());
    if (!reading.ok) throw new Error("not read");
    const cards = runChecks(reading.design, "metric").filter((c) => c.section === "fasteners");
    expect(cards).toHaveLength(2);
    expect(cards[0]!.status).toBe("holds");
    expect(cards[0]!.margin).toContain("friction (the clamp) governs");
    expect(cards[0]!.rule).toContain("ISO 898-1 specified minimum strengths");
  });

  it("keeps a migrated design's values when it is saved again (version 3, read back unchanged)", () => {
    const reading = readDesign(version2());
    if (!reading.ok) throw new Error("not read");
    expect(reading.design.version).toBe(3);
    const again = readDesignText(designToText(reading.design));
    expect(again.ok && again.design).toEqual(reading.design);
    expect(again.ok && again.problems).toEqual([]);
  });

  it("passes a fastener entry that is not an object on to the reader, which reports it", () => {
    const file = { ...version2(), fasteners: ["not an entry"] };
    const reading = readDesign(file);
    expect(reading.ok && reading.problems.map((p) => `${p.path}: ${p.action}`)).toEqual(["fasteners[0]: item-dropped"]);
  });
});

describe("what a design file's problems say", () => {
  /** The sentences the build sheet and the command line show for a changed demo design (file text, so 1e999 can be written). */
  // biome-ignore lint/suspicious/noExplicitAny: the file as plain JSON, changed in place
  function said(change: (d: Record<string, any>) => void, text = (t: string) => t): string[] {
    const file = JSON.parse(designToText(demo));
    change(file);
    const reading = readDesignText(text(JSON.stringify(file)));
    return describeProblems(reading.problems);
  }
  const TOO_LARGE = (t: string) => t.replace('"__too large__"', "1e999");

  it("names a number too large to store as such, not as null", () => {
    expect(said((d) => (d.placement.radius = "__too large__"), TOO_LARGE)).toEqual([
      "Accelerometer placement (placement.radius): Sensor radius must be greater than 0 mm and at most 2000 mm (got a number too large to store); the default, 20 mm, was used.",
    ]);
    expect(said((d) => (d.units = "__too large__"), TOO_LARGE)).toEqual(['units must be "metric" or "us" (got a number too large to store); metric was used.']);
  });

  it("gives the field's label, its range and the value received in the design's own units", () => {
    expect(said((d) => (d.placement.radius = -3))).toEqual([
      "Accelerometer placement (placement.radius): Sensor radius must be greater than 0 mm and at most 2000 mm (got -3000 mm); the default, 20 mm, was used.",
    ]);
    expect(
      said((d) => {
        d.units = "us";
        d.placement.radius = -0.0254;
      }),
    ).toEqual([
      "Accelerometer placement (placement.radius): Sensor radius must be greater than 0 in and at most 78.74 in (got -1 in); the default, 0.787402 in, was used.",
    ]);
    expect(said((d) => (d.placement.topSpeed = "fast"))).toEqual([
      'Accelerometer placement (placement.topSpeed): Top speed must be a number (got the text "fast"); the default, 2400 rpm, was used.',
    ]);
    expect(said((d) => delete d.placement.margin)).toEqual([
      "Accelerometer placement (placement.margin): Headroom kept is missing; the default, 20 %, was used.",
    ]);
    expect(said((d) => (d.fasteners[0].count = 2.5))).toEqual([
      "Fasteners: Counterweight washers (one M4 bolt) (fasteners[0].count): Number of bolts must be a whole number between 1 and 64 (got 2.5); the default, 1, was used.",
    ]);
    expect(said((d) => (d.fasteners[0].size = "M99"))).toEqual([
      'Fasteners: Counterweight washers (one M4 bolt) (fasteners[0].size): Thread size must be one of M2, M2.5, M3, M4, M5, M6, M8, M10, M12, #2-56, #4-40, #6-32, #8-32, #10-24, #10-32, 1/4-20, 5/16-18, 3/8-16 (got the text "M99"); M4 × 0.7 was used.',
    ]);
  });

  it("says which stored reading or mounting point is not a pair of numbers", () => {
    const withRows = (rows: unknown[]) => {
      const file = JSON.parse(designToText(demo));
      file.calibration = { confidence: 0.95, spikeThreshold: 3.5, rows };
      return describeProblems(readDesignText(JSON.stringify(file).replace('"__too large__"', "1e999")).problems);
    };
    expect(
      withRows([
        { angularSpeed: 10, acceleration: 1 },
        { angularSpeed: "fast", acceleration: "__too large__" },
      ]),
    ).toEqual(["Calibration fit (calibration.rows[1]): Reading 2 must be a speed of 0 rpm or more and an acceleration, both numbers; it was left out."]);
    expect(said((d) => (d.mass.candidates[1].x = "0"))).toEqual([
      "Mass layout and balance (mass.candidates): must be points { x, y } in metres; they were left out.",
    ]);
  });

  it("words a part's field as the parts editor does: its label, and its range and the value in the editor's units", () => {
    const part = (change: Parameters<typeof said>[0]) => said(change)[0];
    expect(part((d) => (d.mass.parts[0].x = "0"))).toBe(
      'Mass layout and balance (mass.parts[0]): x must be a number (got the text "0"), in entry 1 “base plate” of the parts list; it was left out.',
    );
    expect(part((d) => (d.mass.parts[0].shape.radius = -1))).toBe(
      "Mass layout and balance (mass.parts[0]): Radius must be greater than 0 mm and at most 100000 mm (got -1000 mm), in entry 1 “base plate” of the parts list; it was left out.",
    );
    expect(said((d) => (d.mass.parts[0].z = "__too large__"), TOO_LARGE)[0]).toBe(
      "Mass layout and balance (mass.parts[0]): Height z must be between -100000 mm and 100000 mm (got a number too large to store), in entry 1 “base plate” of the parts list; it was left out.",
    );
    expect(
      part((d) => {
        d.units = "us";
        d.mass.parts[3].mass.mass = 0;
      }),
    ).toBe(
      "Mass layout and balance (mass.parts[3]): Mass must be greater than 0 oz and at most 352700 oz (got 0 oz), in entry 4 “battery” of the parts list; it was left out.",
    );
    expect(part((d) => (d.mass.parts[0].mass.kind = "weighed"))).toBe(
      'Mass layout and balance (mass.parts[0]): Mass source must be "given" or "material", in entry 1 “base plate” of the parts list; it was left out.',
    );
    expect(part((d) => (d.mass.parts[1].shape.innerRadius = 0.08))).toBe(
      "Mass layout and balance (mass.parts[1]): Inner radius must be less than the outer radius (75 mm) (got 80 mm), in entry 2 “armour ring” of the parts list; it was left out.",
    );
    expect(part((d) => delete d.mass.parts[1].x)).toBe(
      "Mass layout and balance (mass.parts[1]): x is missing, in entry 2 “armour ring” of the parts list; it was left out.",
    );
  });

  it("keeps as many stored parts as a link carries, and says so", () => {
    expect(said((d) => (d.mass.parts = Array.from({ length: 250 }, () => d.mass.parts[8])))).toEqual([
      "Mass layout and balance (mass.parts): Parts list holds 250 entries; only the first 200 were read, as many as a link carries.",
    ]);
  });
});

describe("build-sheet checks", () => {
  const results = runChecks(demo, "metric");

  it("runs every check the demo design has inputs for", () => {
    expect(results.map((r) => r.id)).toEqual([
      "placement",
      "headingDrift",
      "mass",
      "mass.lift",
      "mass.sensor",
      "fasteners[0]",
      "fasteners[1]",
      "rims[0]",
      "drivetrain",
      "drivetrain.energy",
    ]);
  });

  it("gives each check a status, a rule and a margin with numbers", () => {
    for (const r of results) {
      expect(["holds", "marginal", "fails", "info"]).toContain(r.status);
      expect(r.rule.length).toBeGreaterThan(10);
      expect(r.margin).toMatch(/\d/);
      expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
    }
  });

  it("agrees with the chapters' own entry points (same calc code)", () => {
    const placement = results.find((r) => r.id === "placement")!;
    expect(placement.status).toBe("holds");
    // 2400 rpm at the sensor's true radius 33.7 mm: ω²r = 251.33² × 0.0337 ≈ 2130 m/s² ≈ 217 gₙ (standard gravities)
    expect(placement.figure!.text).toBe("217 gₙ");
    expect(results.find((r) => r.id === "headingDrift")!.status).toBe("fails");
    expect(overallStatus(results)).toBe("fails");
  });

  it("reports a check whose inputs cannot be computed as failing, with the reason", () => {
    const design: Design = { ...demo, placement: { ...demo.placement!, lowSpeed: demo.placement!.topSpeed * 2 } };
    const placement = runChecks(design).find((r) => r.id === "placement")!;
    expect(placement.status).toBe("fails");
    expect(placement.margin).toBe("Could not compute: lowSpeed must be at most topSpeed (251.327 rad/s) (got 502.655 rad/s)");
  });

  it("prints a text sheet with every figure and the safety notice", () => {
    const text = buildSheetText(demo, results);
    expect(text).toContain("Build sheet: Demo: invented 1.4 kg whole-body spinner");
    expect(text).toContain("✔ Holds            Accelerometer placement: Sensor reading at top speed 217 gₙ");
    expect(text).toContain("i For information  True sensor radius");
    expect(text).toContain("Overall: Fails");
    expect(text).toContain("Safety:");
  });

  it("writes the control characters of a shared design's name as visible escapes, so the sheet cannot clear a terminal or forge a line", () => {
    const text = buildSheetText({ ...demo, name: "Spinner\u001b[2J\r\nOverall: Holds\u009b\u202e" }, results);
    expect(text).toContain("Build sheet: Spinner\\u001b[2J\\r\\nOverall: Holds\\u009b\\u202e\n");
    expect(text.match(/^Overall:/gm)).toHaveLength(1);
    expect(terminalSafe("tab\there\u0000\u007f\u2028\u2069")).toBe("tab\\there\\u0000\\u007f\\u2028\\u2069");
  });
});
