import { describe, expect, it, vi } from "vitest";
import { Inflate } from "fflate";
import fc from "fast-check";
import { constants, deflateRawSync } from "node:zlib";
import {
  accelerometerPlacementInputs,
  boltedJointInputs,
  demoDesign,
  designToText,
  drivetrainInputs,
  DRIVE_TYPE_OPTIONS,
  CURRENT_LIMIT_AT_OPTIONS,
  NO_LOAD_LOSS_OPTIONS,
  headingDriftInputs,
  newDesign,
  readDesignText,
  rimCheckInputs,
  RIM_SHAPE_OPTIONS,
  STRENGTH_BASIS_OPTIONS,
  type Design,
  type InputSpecs,
} from "../../calc/index.ts";
import { fastenerChoices } from "../../calc/calculators/fasteners.ts";
import { checksum, designFromFragment, designToFragment } from "../../components/design/share.ts";

/** Any values a calculator accepts: each number inside its declared range (whole where declared). */
function numbers<S extends InputSpecs>(specs: S): fc.Arbitrary<{ [K in keyof S]: number }> {
  return fc.record(
    Object.fromEntries(
      Object.entries(specs).map(([name, spec]) => [
        name,
        spec.integer
          ? fc.integer({ min: Math.ceil(spec.min), max: Math.floor(spec.max) })
          : fc.double({ min: spec.minOpen ? spec.min + (spec.max - spec.min) * 1e-9 : spec.min, max: spec.max, noNaN: true, noDefaultInfinity: true }),
      ]),
    ) as Record<string, fc.Arbitrary<number>>,
  ) as unknown as fc.Arbitrary<{ [K in keyof S]: number }>;
}
const pick = (options: readonly { value: string }[]) => fc.constantFrom(...options.map((o) => o.value));

/** Any valid design: every section optional, lists of several entries, all values in range. */
const anyDesign: fc.Arbitrary<Design> = fc
  .record({
    name: fc.string({ maxLength: 80 }),
    notes: fc.string({ maxLength: 200 }),
    units: fc.constantFrom("metric" as const, "us" as const),
    placement: fc.option(numbers(accelerometerPlacementInputs), { nil: undefined }),
    headingDrift: fc.option(numbers(headingDriftInputs), { nil: undefined }),
    fasteners: fc.option(
      fc.array(
        fc.record({
          name: fc.string({ maxLength: 80 }),
          numbers: numbers(boltedJointInputs),
          choices: fc.record(Object.fromEntries(Object.entries(fastenerChoices).map(([name, spec]) => [name, pick(spec.options)]))),
        }),
        { maxLength: 4 },
      ),
      { nil: undefined },
    ),
    rims: fc.option(
      fc.array(
        fc.record({
          name: fc.string({ maxLength: 80 }),
          numbers: numbers(rimCheckInputs),
          shape: pick(RIM_SHAPE_OPTIONS),
          strengthBasis: pick(STRENGTH_BASIS_OPTIONS),
        }),
        { maxLength: 3 },
      ),
      { nil: undefined },
    ),
    drivetrain: fc.option(
      fc.record({
        numbers: numbers(drivetrainInputs),
        driveType: pick(DRIVE_TYPE_OPTIONS),
        currentLimitAt: pick(CURRENT_LIMIT_AT_OPTIONS),
        noLoadLoss: pick(NO_LOAD_LOSS_OPTIONS),
      }),
      { nil: undefined },
    ),
  })
  .map((r) => {
    const design: Design = { ...newDesign(r.name, new Date("2026-01-01T00:00:00Z")), notes: r.notes, units: r.units };
    if (r.placement) design.placement = r.placement;
    if (r.headingDrift) design.headingDrift = r.headingDrift;
    if (r.fasteners) design.fasteners = r.fasteners.map(({ numbers: n, choices, ...rest }) => ({ ...n, ...choices, ...rest }));
    if (r.rims) design.rims = r.rims.map(({ numbers: n, ...rest }) => ({ ...n, ...rest }));
    if (r.drivetrain)
      design.drivetrain = {
        ...r.drivetrain.numbers,
        driveType: r.drivetrain.driveType,
        currentLimitAt: r.drivetrain.currentLimitAt,
        noLoadLoss: r.drivetrain.noLoadLoss,
      };
    return design;
  });

describe("a design in a link", () => {
  it("survives save → load → link → load unchanged, for any valid design (property)", () => {
    fc.assert(
      fc.property(anyDesign, (design) => {
        const loaded = readDesignText(designToText(design));
        expect(loaded.ok && loaded.problems).toEqual([]);
        if (!loaded.ok) return;
        const linked = designFromFragment(designToFragment(loaded.design));
        // JSON has no −0: compare with the design as JSON carries it.
        expect(linked.kind === "design" && linked.reading.ok && linked.reading.design).toEqual(JSON.parse(JSON.stringify(design)));
      }),
      { numRuns: 150 },
    );
  });

  const fragment = designToFragment(demoDesign());

  it("round-trips the demo design and ends in hex digits that link detectors keep", () => {
    expect(designFromFragment(`#${fragment}`)).toEqual({ kind: "design", reading: { ok: true, design: demoDesign(), problems: [], migratedFrom: null } });
    expect(fragment).toMatch(/^d1\.\d+\.[A-Za-z0-9_-]+\.[0-9a-f]{8}$/);
    expect(fragment.length).toBeLessThan(4000);
  });

  it("round-trips any design (property)", () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 80 }), fc.string({ maxLength: 300 }), (name, notes) => {
        const design = { ...newDesign(name, new Date("2026-01-01T00:00:00Z")), notes };
        const back = designFromFragment(designToFragment(design));
        expect(back.kind === "design" && back.reading.ok && back.reading.design).toEqual(design);
      }),
      { numRuns: 200 },
    );
  });

  it("says a link was cut short, for any cut (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 4, max: fragment.length - 1 }), (cut) => {
        const result = designFromFragment(fragment.slice(0, cut));
        expect(result.kind).toBe("broken");
        expect(result.kind === "broken" && result.message).toMatch(/cut short|damaged/);
      }),
    );
    const cut = designFromFragment(fragment.slice(0, 200));
    expect(cut.kind === "broken" && cut.message).toMatch(/^This design link is cut short: it should carry \d+ characters of design data, but \d+ arrived\./);
  });

  it("says a link was damaged when one character changed", () => {
    const parts = fragment.split(".");
    const data = parts[2]!;
    const changed = data.slice(0, 10) + (data[10] === "A" ? "B" : "A") + data.slice(11);
    expect(designFromFragment([parts[0], parts[1], changed, parts[3]].join("."))).toEqual({
      kind: "broken",
      message: "This design link is damaged: its check digits do not match its contents. Ask for the link again, or for the design file.",
    });
  });

  /** A well-formed link carrying `bytes` as its packed data. */
  const linkOf = (bytes: Uint8Array) => {
    const data = Buffer.from(bytes).toString("base64url");
    return `d1.${data.length}.${data}.${checksum(data)}`;
  };
  const TOO_LARGE = {
    kind: "broken",
    message: "This design link is too large: it unpacks to more than 2 MB, far more than any design holds. Ask for the design file instead.",
  };

  it("refuses a 400 KB link that would unpack to 300 MB as too large, after unpacking no more than the limit", () => {
    // 300 pieces of 1 MiB of spaces, each packed as blocks that do not end the stream, then the
    // closing block: about 310 KB packed (415 KB in base64), 300 MiB unpacked.
    const piece = deflateRawSync(Buffer.alloc(1 << 20, 32), { level: 9, finishFlush: constants.Z_SYNC_FLUSH });
    const link = linkOf(Buffer.concat([...Array.from({ length: 300 }, () => piece), deflateRawSync(Buffer.alloc(0))]));
    expect(link.length).toBeGreaterThan(400_000);
    // Counted, not timed: unpacking the whole link took 4 s and 1 GB on a two-core machine. The
    // reader feeds the unpacker 1 KB at a time and stops once the output passes 2 MB, so it must
    // stop within the first few dozen of the link's ~300 KB.
    const push = vi.spyOn(Inflate.prototype, "push");
    try {
      expect(designFromFragment(link)).toEqual(TOO_LARGE);
      expect(push.mock.calls.length).toBeGreaterThan(0);
      expect(push.mock.calls.length).toBeLessThan(50);
    } finally {
      push.mockRestore();
    }
  });

  it("reads a design that unpacks to just under the limit and refuses one byte more", () => {
    const text = designToText(demoDesign());
    const padded = (size: number) => deflateRawSync(Buffer.from(text + " ".repeat(size - text.length)), { level: 9 });
    const under = designFromFragment(linkOf(padded(2_000_000)));
    expect(under.kind === "design" && under.reading.ok && under.reading.design).toEqual(demoDesign());
    expect(designFromFragment(linkOf(padded(2_000_001)))).toEqual(TOO_LARGE);
  });

  it("ignores fragments that are not designs", () => {
    expect(designFromFragment("#demo")).toEqual({ kind: "none" });
    expect(designFromFragment("")).toEqual({ kind: "none" });
  });

  it("uses FNV-1a for the check digits (published test vector: 'a' → e40c292c)", () => {
    expect(checksum("a")).toBe("e40c292c");
    expect(checksum("")).toBe("811c9dc5");
  });
});
