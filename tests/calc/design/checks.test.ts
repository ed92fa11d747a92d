/**
 * The build sheet, check by check: for every calculator one small design entry is driven into
 * each status its card can take (Holds, Marginal where the check has a marginal band, Fails, or
 * For information), and the status, the word and mark the build sheet prints, and the key figure
 * are pinned. The figures are worked by hand from the formula and its source beside each case;
 * a figure that is our own digits (a simulation, a fit of invented data) is marked as a
 * regression pin.
 *
 * The thresholds that decide a status come from:
 * - ISO 21940-11:2016, Table 1 and §5: balance grade G = e_per·Ω [mm/s]; the grades step by a
 *   factor of 2.5 (G 6.3, G 16, G 40, …), which is the width of the marginal band of the mass
 *   layout and the quick balance check (one grade step coarser);
 * - ISO 898-1:2013, Tables 3 and 4: the minimum yield of class 8.8 (640 MPa) and the stress area
 *   of M4 (8.78 mm²);
 * - common practice (the handbook's own defaults, editable): a safety factor below 1 fails, below
 *   2 is marginal; a lift turn rate below 1.5 × the drive's is marginal; a push within its
 *   tolerance holds, within twice it is marginal.
 */
import { describe, expect, it } from "vitest";
import { type AnyCalculator, type AnyValues, initialValues } from "../../../calc/core/calculator.ts";
import { STATUS_MARKS, STATUS_WORDS, type CheckStatus } from "../../../calc/core/check.ts";
import { STANDARD_GRAVITY } from "../../../calc/core/constants.ts";
import { CalcInputError } from "../../../calc/core/errors.ts";
import { buildSheetText, type CheckResult, cardsFor, overallStatus, terminalSafe } from "../../../calc/design/checks.ts";
import { runChecks } from "../../../calc/design/run-checks.ts";
import { type Design, newDesign } from "../../../calc/design/format.ts";
import { calculatorFor } from "../../../calc/design/calculators.ts";
import type { LayoutPart } from "../../../calc/mass/parts.ts";

const DEG = Math.PI / 180;

/** A design holding one entry of one calculator: its defaults with `values` over them. */
function designWith(id: string, values: AnyValues, units: "metric" | "us" = "metric"): Design {
  const calc = calculatorFor(id);
  if (!calc) throw new Error(`no calculator ${id}`);
  const entry = { ...initialValues(calc), ...values };
  const design: Design = { ...newDesign("Invented test robot", new Date("2026-12-01T00:00:00Z")), units };
  design[id] = calc.section.kind === "list" ? [{ name: "entry", ...entry }] : entry;
  return design;
}

/** The cards of that design, and the build sheet's text of it. */
function sheet(id: string, values: AnyValues) {
  const design = designWith(id, values);
  const results = runChecks(design, "metric");
  return { results, text: buildSheetText(design, results), lines: buildSheetText(design, results).split("\n") };
}

/** The build sheet's line for a status: its mark and word, padded to the title column ("✔ Holds            Title"). */
function lead(status: CheckStatus): string {
  return `${STATUS_MARKS[status]} ${STATUS_WORDS[status]}`.padEnd(17);
}

interface StatusCase {
  /** The calculator (design section). */
  id: string;
  /** What the entry is, in words. */
  what: string;
  values: AnyValues;
  status: CheckStatus;
  /** The build sheet's line for the card, exactly. */
  line: string;
  /** The key figure in SI, worked by hand, with its relative tolerance. */
  figure: number | null;
  rtol: number;
  /** Where the figure and the status come from. */
  source: string;
}

// Accelerometer placement, all cases: top speed 100 rad/s, lowest tracked speed 10 rad/s, full
// scale 1000 m/s² with 20 % headroom, one count 1.25 m/s², speed resolution wanted 50 %.
// Largest radius r = (1 − 0.2)·1000/100² = 0.08 m; smallest r = 1.25/(10²·0.5·(2 + 0.5)) = 0.01 m.
const placement = { topSpeed: 100, lowSpeed: 10, fullScale: 1000, margin: 0.2, step: 1.25, noise: 0, resolution: 0.5 };
const PLACEMENT_SOURCE = "OpenStax College Physics ch. 6, a = ω²r; one count resolves ω to √(1 + s/(ω²r)) − 1 (sensor quantisation)";

// Heading drift: the firmware divides by 10 mm, the sensor sits at 12.1 mm, spin 10 rad/s, no
// offset: ω̂ = ω·√(r/r̂) = 10·√1.21 = 11 rad/s, a drift of 1 rad/s = 57.3 °/s.
const drift = { angularSpeed: 10, assumedRadius: 0.01, trueRadius: 0.0121, bias: 0, biasCorrection: 0, scaleError: 0, tilt: 0 };
const DRIFT_SOURCE = "OpenStax College Physics ch. 6: the firmware solves a = ω̂²r̂ for a reading a = ω²r";

// Loop timing at 100 rad/s: a 1000 Hz loop steps ω/f = 0.1 rad = 5.73°; a 1 ms LED lights ω·t = 0.1 rad = 5.73°.
const timing = { topSpeed: 100, loopRate: 1000, onTime: 0.001, latency: 0.0005 };
const TIMING_SOURCE = "OpenStax University Physics vol. 1 §10.1, θ = ωt";

// Quick balance, grade G 6.3 at 100 rad/s with 10 g added to a 990 g robot (1 kg after):
// e_per = G/Ω = 0.0063/100 = 63 µm, U_per = M·e_per = 63 g·mm.
const quick = { limit: "grade", grade: "6.3", change: "added", robotMass: 0.99, partMass: 0.01, spinSpeed: 100, counterweightRadius: 0.05 };
const QUICK_SOURCE = "ISO 21940-11:2016 Table 1, e_per = G/Ω, U_per = M·e_per; the counterweight U/r_cw cancels U = m·r";

// Steering at 100 rad/s with 1 ms latency and a 1000 Hz loop: the push turns Ω(L + 1/2f) = 0.15 rad = 8.59°.
const steering = { spinSpeed: 100, latency: 0.001, loopRate: 1000, phaseLead: 0 };

// Turning with a weapon: J = 0.01 kg·m² at 500 rad/s in a 10 kg robot with a 0.4 m track, standing
// (no centrifugal term): a wheel lifts at ψ̇ = m·g·(t/2)/(J·Ω) = 10 × 9.80665 × 0.2/(0.01 × 500) = 3.92266 rad/s
// (225 °/s). The drive turns in place at 2·v/t.
const turn = { rotorInertia: 0.01, weaponSpeed: 500, robotMass: 10, trackWidth: 0.4, comOffset: 0, forwardSpeed: 0, turnRate: 1, liftMargin: 1.5 };
const LIFT = (10 * STANDARD_GRAVITY * 0.2) / (0.01 * 500);
const TURN_SOURCE = "Khurmi & Gupta ch. 14, C = I·ω·ω_P, against the weight's moment m·g·t/2 (Gillespie ch. 9)";

// Fasteners: one M4 class 8.8 bolt in tension holding m at 100 mm and 1000 rad/s: F = m·ω²r = m·10⁵ N;
// it yields at R_p0.2,min·A_s = 640 MPa × 8.78 mm² = 5619.2 N, so the safety factor is 5619.2/F.
/** One M4 8.8 bolt pulled by a spinning part, tightened to 75 % of its proof load, into a nut: the joint check's tension mode. */
const bolt = {
  radius: 0.1,
  angularSpeed: 1000,
  load: 100,
  count: 1,
  stackHeight: 0.005,
  gripLength: 0.005,
  shankLength: 0,
  preloadShare: 0.75,
  tighteningTorque: 3,
  nutFactor: 0.2,
  frictionCoefficient: 0.2,
  interfaces: 1,
  engagedLength: 0.008,
  failBelow: 1,
  marginalBelow: 2,
  loadFrom: "spin",
  size: "M4",
  grade: "8.8",
  jointMode: "tension",
  preloadFrom: "share",
  threadIn: "nut",
  endCondition: "cantilever",
  memberMaterial: "al-6061-t6",
};
const BOLT_SOURCE =
  "ISO 898-1:2013 Table 3 (8.8, d ≤ 16 mm: stress under proof load S_p 580 MPa) and Table 4 (M4: A_s 8.78 mm²); load factor n = (S_p·A_s − F_i)/(C·P) (Shigley's Mechanical Engineering Design, 10th ed., §8-9); F = mω²r";

// Rims: a thin steel-like ring, 100 mm outer radius, ρ = 8000 kg/m³, yield 400 MPa: σ = ρv², v = ωr.
const ring = {
  shape: "thin-ring",
  outerRadius: 0.1,
  innerRadius: 0.09,
  density: 8000,
  yieldStrength: 400e6,
  ultimateStrength: 500e6,
  failBelow: 1,
  marginalBelow: 2,
};
const RING_SOURCE = "Carvill, Mechanical Engineer's Data Handbook §1.2.7, thin ring σ = ρv²";

/** Two point masses: 990 g on the axis and a 10 g lug at `x`, so the centre of mass sits at x/100. */
function lugAt(x: number): LayoutPart[] {
  return [
    { name: "hub", shape: { kind: "point" }, mass: { kind: "given", mass: 0.99 }, x: 0, y: 0, z: 0 },
    { name: "lug", shape: { kind: "point" }, mass: { kind: "given", mass: 0.01 }, x, y: 0, z: 0 },
  ];
}
// The mass layout at 100 rad/s against G 6.3: equivalent grade G = e·Ω = (x/100)·100 = x [m/s].
const layout = { spinSpeed: 100, balanceGrade: 0.0063, mode: "r", candidates: [] };
const LAYOUT_SOURCE = "ISO 21940-11:2016 Table 1, G = e·Ω; marginal up to one grade step (× 2.5) coarser";

const CASES: StatusCase[] = [
  // Accelerometer placement: inside the window holds, too close in is marginal (it still reads), too far out or no window fails.
  {
    id: "placement",
    what: "a sensor inside the usable window",
    values: { ...placement, radius: 0.05 },
    status: "holds",
    line: "✔ Holds            Accelerometer placement: Sensor reading at top speed 51.0 gₙ",
    figure: 500, // 100² × 0.05
    rtol: 1e-12,
    source: PLACEMENT_SOURCE,
  },
  {
    id: "placement",
    what: "a sensor too close in to resolve the lowest speed",
    values: { ...placement, radius: 0.005 },
    status: "marginal",
    line: "▲ Marginal         Accelerometer placement: Sensor reading at top speed 5.10 gₙ",
    figure: 50,
    rtol: 1e-12,
    source: PLACEMENT_SOURCE,
  },
  {
    id: "placement",
    what: "a sensor so far out it saturates at top speed",
    values: { ...placement, radius: 0.1 },
    status: "fails",
    line: "✖ Fails            Accelerometer placement: Sensor reading at top speed 102 gₙ",
    figure: 1000,
    rtol: 1e-12,
    source: PLACEMENT_SOURCE,
  },
  {
    id: "placement",
    what: "a sensor whose steps are too coarse for any radius (no window: 100 mm needed, 80 mm allowed)",
    values: { ...placement, step: 12.5, radius: 0.05 },
    status: "fails",
    line: "✖ Fails            Accelerometer placement: Sensor reading at top speed 51.0 gₙ",
    figure: 500,
    rtol: 1e-12,
    source: PLACEMENT_SOURCE,
  },
  // Heading drift: within the trim budget holds, over it fails; no marginal band.
  {
    id: "headingDrift",
    what: "a drift of 1 rad/s against a budget of 1.1 rad/s",
    values: { ...drift, budget: 1.1 },
    status: "holds",
    line: "✔ Holds            Heading drift: Drift rate 57.3 °/s",
    figure: 1,
    rtol: 1e-12,
    source: DRIFT_SOURCE,
  },
  {
    id: "headingDrift",
    what: "a drift of 1 rad/s against a budget of 0.9 rad/s",
    values: { ...drift, budget: 0.9 },
    status: "fails",
    line: "✖ Fails            Heading drift: Drift rate 57.3 °/s",
    figure: 1,
    rtol: 1e-12,
    source: DRIFT_SOURCE,
  },
  {
    id: "headingDrift",
    what: "an offset so large the corrected reading is negative (1.21 − 10 m/s²): no estimate",
    values: { ...drift, bias: -10, budget: 1.1 },
    status: "fails",
    line: "✖ Fails            Heading drift",
    figure: null,
    rtol: 0,
    source: DRIFT_SOURCE,
  },
  // Loop timing: both targets met holds, one missed is marginal, both missed fails.
  {
    id: "headingTiming",
    what: "a 5.73° step and arc against 10° targets",
    values: { ...timing, targetStep: 10 * DEG, targetArc: 10 * DEG },
    status: "holds",
    line: "✔ Holds            Loop timing: Heading step per loop 5.73°",
    figure: 0.1,
    rtol: 1e-12,
    source: TIMING_SOURCE,
  },
  {
    id: "headingTiming",
    what: "the step within 10° but the arc over 5°",
    values: { ...timing, targetStep: 10 * DEG, targetArc: 5 * DEG },
    status: "marginal",
    line: "▲ Marginal         Loop timing: Heading step per loop 5.73°",
    figure: 0.1,
    rtol: 1e-12,
    source: TIMING_SOURCE,
  },
  {
    id: "headingTiming",
    what: "the step and the arc both over 5° targets",
    values: { ...timing, targetStep: 5 * DEG, targetArc: 5 * DEG },
    status: "fails",
    line: "✖ Fails            Loop timing: Heading step per loop 5.73°",
    figure: 0.1,
    rtol: 1e-12,
    source: TIMING_SOURCE,
  },
  // Mass layout: G 5 meets G 6.3; G 15 is within one grade step (15.75) but over 2× (12.6); G 20 is beyond it.
  {
    id: "mass",
    what: "a 10 g lug at 5 mm: G 5.0 against G 6.3",
    values: { ...layout, parts: lugAt(0.005) },
    status: "holds",
    line: "✔ Holds            Balance: Equivalent balance grade 5.00 mm/s",
    figure: 0.005,
    rtol: 1e-12,
    source: LAYOUT_SOURCE,
  },
  {
    id: "mass",
    what: "a 10 g lug at 15 mm: G 15 against G 6.3, within 2.5 × (and beyond 2 ×)",
    values: { ...layout, parts: lugAt(0.015) },
    status: "marginal",
    line: "▲ Marginal         Balance: Equivalent balance grade 15.0 mm/s",
    figure: 0.015,
    rtol: 1e-12,
    source: LAYOUT_SOURCE,
  },
  {
    id: "mass",
    what: "a 10 g lug at 20 mm: G 20 against G 6.3, beyond 2.5 ×",
    values: { ...layout, parts: lugAt(0.02) },
    status: "fails",
    line: "✖ Fails            Balance: Equivalent balance grade 20.0 mm/s",
    figure: 0.02,
    rtol: 1e-12,
    source: LAYOUT_SOURCE,
  },
  // Quick balance: U/U_per ≤ 1 holds, ≤ 2.5 is marginal, beyond fails. Figure: the counterweight U/r_cw at 50 mm.
  {
    id: "quickBalance",
    what: "10 g added at 5 mm: U = 50 g·mm against 63 g·mm",
    values: { ...quick, partRadius: 0.005 },
    status: "holds",
    line: "✔ Holds            Quick balance check: Counterweight that cancels it 1.00 g",
    figure: 0.001,
    rtol: 1e-12,
    source: QUICK_SOURCE,
  },
  {
    id: "quickBalance",
    what: "10 g added at 14.5 mm: U = 145 g·mm, 2.30 × the limit (within 2.5 ×, beyond 2 ×)",
    values: { ...quick, partRadius: 0.0145 },
    status: "marginal",
    line: "▲ Marginal         Quick balance check: Counterweight that cancels it 2.90 g",
    figure: 0.0029,
    rtol: 1e-12,
    source: QUICK_SOURCE,
  },
  {
    id: "quickBalance",
    what: "10 g added at 20 mm: U = 200 g·mm, 3.17 × the limit",
    values: { ...quick, partRadius: 0.02 },
    status: "fails",
    line: "✖ Fails            Quick balance check: Counterweight that cancels it 4.00 g",
    figure: 0.004,
    rtol: 1e-12,
    source: QUICK_SOURCE,
  },
  // Fasteners: proof load S_p·A_s = 580 MPa × 8.78 mm² = 5092.4 N. Tightened to 75 % (F_i = 3819.3 N)
  // the load factor is (5092.4 − 3819.3)/(C·P) with C = 0.48197 (the joint's stiffness factor, a
  // regression pin of calc/loads/joint-stiffness.ts); untightened the joint opens at any load
  // (marginal, however far from proof), and past proof it fails: 5092.4 N / F.
  {
    id: "fasteners",
    what: "10 g on one M4 8.8 bolt in tension, tightened to 75 % of proof: 1000 N, load factor 1273.1/481.97 = 2.64",
    values: { ...bolt, partMass: 0.01 },
    status: "holds",
    line: "✔ Holds            Fasteners: entry: Safety factor 2.64",
    figure: 2.641462,
    rtol: 1e-6,
    source: BOLT_SOURCE,
  },
  {
    id: "fasteners",
    what: "10 g, untightened: 5092.4/1000 = 5.09 from proof, but the joint opens",
    values: { ...bolt, partMass: 0.01, preloadShare: 0 },
    status: "marginal",
    line: "▲ Marginal         Fasteners: entry: Safety factor 5.09",
    figure: 5.0924,
    rtol: 1e-9,
    source: BOLT_SOURCE,
  },
  {
    id: "fasteners",
    what: "100 g, untightened: 10 kN, safety factor 0.509",
    values: { ...bolt, partMass: 0.1, preloadShare: 0 },
    status: "fails",
    line: "✖ Fails            Fasteners: entry: Safety factor 0.509",
    figure: 0.50924,
    rtol: 1e-9,
    source: BOLT_SOURCE,
  },
  // Rims: safety factor 400 MPa/(ρv²).
  {
    id: "rims",
    what: "v = 100 m/s: 80 MPa, safety factor 5",
    values: { ...ring, angularSpeed: 1000 },
    status: "holds",
    line: "✔ Holds            Rim: entry: Safety factor against yield 5.00",
    figure: 5,
    rtol: 1e-12,
    source: RING_SOURCE,
  },
  {
    id: "rims",
    what: "v = 200 m/s: 320 MPa, safety factor 1.25",
    values: { ...ring, angularSpeed: 2000 },
    status: "marginal",
    line: "▲ Marginal         Rim: entry: Safety factor against yield 1.25",
    figure: 1.25,
    rtol: 1e-12,
    source: RING_SOURCE,
  },
  {
    id: "rims",
    what: "v = 300 m/s: 720 MPa, safety factor 0.556",
    values: { ...ring, angularSpeed: 3000 },
    status: "fails",
    line: "✖ Fails            Rim: entry: Safety factor against yield 0.556",
    figure: 400 / 720,
    rtol: 1e-12,
    source: RING_SOURCE,
  },
  // Steering: the push within its tolerance holds, within twice it is marginal, beyond fails.
  // The figure (translation speed, 4.69 m/s) does not depend on the tolerance: our own digits, pinned
  // below as a regression value.
  {
    id: "steering",
    what: "a push 8.59° off against a 10° tolerance",
    values: { ...steering, directionTolerance: 10 * DEG },
    status: "holds",
    line: "✔ Holds            Steering while spinning: Kinematic translation speed 4.69 m/s",
    figure: 4.686929485281381, // regression pin
    rtol: 1e-9,
    source: "Franklin, Powell & Workman (digital control): delay L + T/2; regression pin for the speed",
  },
  {
    id: "steering",
    what: "a push 8.59° off against a 6° tolerance (1.43 ×)",
    values: { ...steering, directionTolerance: 6 * DEG },
    status: "marginal",
    line: "▲ Marginal         Steering while spinning: Kinematic translation speed 4.69 m/s",
    figure: 4.686929485281381, // regression pin
    rtol: 1e-9,
    source: "Franklin, Powell & Workman (digital control): delay L + T/2; regression pin for the speed",
  },
  {
    id: "steering",
    what: "a push 8.59° off against a 4° tolerance (2.15 ×)",
    values: { ...steering, directionTolerance: 4 * DEG },
    status: "fails",
    line: "✖ Fails            Steering while spinning: Kinematic translation speed 4.69 m/s",
    figure: 4.686929485281381, // regression pin
    rtol: 1e-9,
    source: "Franklin, Powell & Workman (digital control): delay L + T/2; regression pin for the speed",
  },
  // Turning with a weapon: margin = lift rate / the drive's turn rate in place (2v/t).
  {
    id: "weaponTurn",
    what: "a drive turning 1 rad/s in place (wheels 0.2 m/s): margin 3.92",
    values: { ...turn, wheelTopSpeed: 0.2 },
    status: "holds",
    line: "✔ Holds            Turn rate before a wheel lifts: Lift turn rate 225 °/s",
    figure: LIFT,
    rtol: 1e-12,
    source: TURN_SOURCE,
  },
  {
    id: "weaponTurn",
    what: "a drive turning 3 rad/s in place (wheels 0.6 m/s): margin 1.31, under 1.5",
    values: { ...turn, wheelTopSpeed: 0.6 },
    status: "marginal",
    line: "▲ Marginal         Turn rate before a wheel lifts: Lift turn rate 225 °/s",
    figure: LIFT,
    rtol: 1e-12,
    source: TURN_SOURCE,
  },
  {
    id: "weaponTurn",
    what: "a drive turning 5 rad/s in place (wheels 1 m/s): margin 0.78",
    values: { ...turn, wheelTopSpeed: 1 },
    status: "fails",
    line: "✖ Fails            Turn rate before a wheel lifts: Lift turn rate 225 °/s",
    figure: LIFT,
    rtol: 1e-12,
    source: TURN_SOURCE,
  },
];

describe("build-sheet checks: each calculator's verdict card in each status it can take", () => {
  it.each(CASES)("$id: $what → $status ($source)", ({ id, values, status, line, figure, rtol }) => {
    const { results, lines } = sheet(id, values);
    const card = results[0]!;
    expect(card.section).toBe(id);
    expect(card.status).toBe(status);
    expect(lines).toContain(line);
    expect(line.startsWith(lead(status))).toBe(true);
    if (figure === null) expect(card.figure).toBeNull();
    else expect(Math.abs(card.figure!.value - figure)).toBeLessThanOrEqual(rtol * Math.abs(figure));
    expect(overallStatus(results)).toBe(status);
  });

  it("spells each status with its own word and mark, and never another's", () => {
    expect(STATUS_WORDS).toEqual({ holds: "Holds", marginal: "Marginal", fails: "Fails", info: "For information" });
    expect(STATUS_MARKS).toEqual({ holds: "✔", marginal: "▲", fails: "✖", info: "i" });
  });

  it("gives the part's pull on its mounts and the window's radii beside the placement figure", () => {
    const card = sheet("placement", { ...placement, radius: 0.05, partMass: 0.1, partRadius: 0.05 }).results[0]!;
    // F = m·ω²·r = 0.1 × 100² × 0.05 = 50 N (Newton's second law with a = ω²r).
    expect(card.details.map((d) => [d.label, d.text])).toEqual([
      ["Smallest usable radius", "10.0 mm"],
      ["Largest usable radius", "80.0 mm"],
      ["Pull on the other part's mounts", "50.0 N"],
    ]);
    expect(card.margin).toBe("The sensor at 50.0 mm lies inside the usable window, 10.0 mm to 80.0 mm; it reads 50.0 % of full scale at top speed.");
    expect(card.rule).toBe("Reading at top speed at most 80.0 % of full scale, and one count resolves speed to 50.0 % at the lowest tracked speed");
  });

  it("says why a heading drift has no figure: the corrected reading is not positive", () => {
    const card = sheet("headingDrift", { ...drift, bias: -10, budget: 1.1 }).results[0]!;
    expect(card.margin).toBe("No estimate at this speed: the corrected reading is zero or negative");
  });

  it("names the missed timing targets in the margin: the arc alone, then both", () => {
    const one = sheet("headingTiming", { ...timing, targetStep: 10 * DEG, targetArc: 5 * DEG }).results[0]!;
    // The 5° arc needs t_on = 5°/ω = 0.0872665 rad/100 rad/s = 873 µs.
    expect(one.margin).toBe("At top speed the heading LED lights 5.73° per turn (873 µs on-time gives 5.00°)");
    const both = sheet("headingTiming", { ...timing, targetStep: 5 * DEG, targetArc: 5 * DEG }).results[0]!;
    // A 5° step needs f = ω/5° = 100/0.0872665 = 1146 Hz.
    expect(both.margin).toBe(
      "At top speed the heading moves 5.73° per loop (a 1150 Hz loop meets 5.00°); the heading LED lights 5.73° per turn (873 µs on-time gives 5.00°)",
    );
  });

  it("states the balance rule with the chosen grade and the ISO 21940-11 step, and gives the mass figures", () => {
    const card = sheet("mass", { ...layout, parts: lugAt(0.015) }).results[0]!;
    expect(card.rule).toBe("Balance grade G 6.30 or finer at 955 rpm (ISO 21940-11); marginal up to one grade step (× 2.5) coarser");
    // 1 kg in all; U = 10 g × 15 mm = 150 g·mm; F = U·Ω² = 0.00015 × 100² = 1.5 N.
    expect(card.details.slice(0, 3).map((d) => d.text)).toEqual(["1.00 kg", "150 g·mm", "1.50 N"]);
  });

  it("gives the balance card a sensor card for information: the drift per turn of the firmware's radius", () => {
    // With no side grip the robot turns about its centre of mass (with grip, a 0.05 mm offset is held on
    // its orbit by the wheels, e ≤ μ·s·g/Ω² = 0.71 mm here, and the sensor reads its own radius).
    const { results, lines } = sheet("mass", { ...layout, parts: lugAt(0.005), sensorX: -0.032, sensorY: 0, sideGrip: 0 });
    const sensor = results.find((r) => r.id === "mass.sensor")!;
    expect(sensor.status).toBe("info");
    // The centre of mass is 0.05 mm towards +x: the sensor at −32 mm is 32.05 mm from it. The firmware
    // dividing by 32 mm reads ω̂ = ω√(32.05/32): 2π(√(32.05/32) − 1) = 0.004907 rad = 0.281° per turn.
    expect(sensor.figure!.value).toBeCloseTo(2 * Math.PI * (Math.sqrt(32.05 / 32) - 1), 12);
    expect(lines).toContain("i For information  True sensor radius: Drift per revolution 0.281°");
    expect(overallStatus(results)).toBe("holds");
  });

  it("puts the class, the size and the mode of a fastener in its rule", () => {
    const card = sheet("fasteners", { ...bolt, partMass: 0.04, preloadShare: 0 }).results[0]!;
    expect(card.rule).toBe("Safety factor at least 2.00 holds, below 1.00 fails (1 × M4 × 0.7 class 8.8 in tension, ISO 898-1 specified minimum strengths)");
    // 4000 N against the proof load 580 MPa × 8.78 mm² = 5092.4 N: n_p = 1.27, with no preload.
    expect(card.margin).toContain("4000 N pull at 9550 rpm, preload 0 N per bolt: bolt tension governs, safety factor 1.27.");
    expect(card.details.map((d) => d.text)).toEqual(["1.27", "0 N", "4000 N"]);
  });

  it("gives a rim's burst estimate from the ultimate strength: ω·√(500/320) at 2000 rad/s", () => {
    const card = sheet("rims", { ...ring, angularSpeed: 2000 }).results[0]!;
    // 2000·√(500/320) = 2500 rad/s = 23 873 rpm; tip speed v = 2000 × 0.1 = 200 m/s.
    expect(card.details.map((d) => [d.label, d.value])).toEqual([
      ["Estimated burst speed", expect.closeTo(2500, 9)],
      ["Tip speed", expect.closeTo(200, 9)],
    ]);
    expect(card.margin).toBe("Peak stress 320 MPa at 19100 rpm (tip speed 200 m/s); yields at 21400 rpm, bursts near 23900 rpm");
  });

  it("gives the weapon's turn margin as a ratio: the lift rate over the larger of the drive's turn and the turn entered", () => {
    const card = sheet("weaponTurn", { ...turn, wheelTopSpeed: 0.6 }).results[0]!;
    const margin = card.details.find((d) => d.label === "Lift margin")!;
    expect(margin.value).toBeCloseTo(LIFT / 3, 12);
    expect(margin.text).toBe("1.31");
    // The turn entered (1 rad/s) governs when the drive is slower: 0.2 m/s wheels turn 1 rad/s, the same.
    const slow = sheet("weaponTurn", { ...turn, wheelTopSpeed: 0.1, turnRate: 2 }).results[0]!;
    expect(slow.details.find((d) => d.label === "Lift margin")!.value).toBeCloseTo(LIFT / 2, 12);
  });

  it("marks a one-wheel spinner whose spin nears the skid-lift speed as marginal, and one past it as failing", () => {
    // A 0.5 kg robot on one wheel: the skid lifts where the wheel's gyroscopic moment carries the weight.
    const skid = { ...steering, directionTolerance: 30 * DEG, wheelCount: 1, robotMass: 0.5 };
    const lift = sheet("steering", skid).results[0]!.details.find((d) => d.label === "Skid lift speed")!.value;
    expect(sheet("steering", { ...skid, spinSpeed: 0.79 * lift }).results[0]!.status).toBe("holds");
    expect(sheet("steering", { ...skid, spinSpeed: 0.81 * lift }).results[0]!.status).toBe("marginal");
    expect(sheet("steering", { ...skid, spinSpeed: 1.01 * lift }).results[0]!.status).toBe("fails");
  });
});

describe("build-sheet checks that only inform", () => {
  it("gives the radius trim for information: r̂′ = r̂·(1 + X/360°)² = 8 mm × (1 + 20/360)² = 8.914 mm", () => {
    const { results, lines } = sheet("radiusTrim", { assumedRadius: 0.008, driftPerTurn: 20 * DEG, sense: "ahead", measure: "turn" });
    expect(results[0]!.status).toBe("info");
    expect(results[0]!.figure!.value).toBeCloseTo(0.008 * (1 + 20 / 360) ** 2, 15);
    expect(lines).toContain("i For information  Radius from a drift you see: Radius to set 8.914 mm");
    expect(overallStatus(results)).toBe("empty");
  });

  it("gives one sensor's worst drift against an opposed pair for information: 360°·(1 − √(11.5/12)) = 7.58°", () => {
    const { results, lines } = sheet("opposedSensors", { angularSpeed: 100, radius1: 0.012, radius2: 0.012, offset: 0.0005 });
    expect(results[0]!.status).toBe("info");
    // The spin centre 0.5 mm off: one sensor at 11.5 mm reads ω̂ = ω√(11.5/12), losing the most per turn.
    expect(results[0]!.figure!.value).toBeCloseTo(2 * Math.PI * (1 - Math.sqrt(11.5 / 12)), 12);
    expect(lines).toContain("i For information  One sensor or an opposed pair: One sensor, worst drift per revolution 7.58°");
  });

  it("gives the smoothing delay for information: (1 − α)/α + (N − 1)/2 samples = 9 + 1 samples at 1 kHz = 10 ms", () => {
    const { results, lines } = sheet("headingSmoothing", { sampleRate: 1000, smoothingFactor: 0.1, medianLength: 3 });
    expect(results[0]!.status).toBe("info");
    expect(results[0]!.figure!.value).toBeCloseTo(0.01, 15);
    expect(lines).toContain("i For information  Smoothing: Delay of the estimate 10.0 ms");
  });

  it("gives the calibration fit for information (its radius from the invented demo readings is a regression pin)", () => {
    const { results, lines } = sheet("calibration", {});
    expect(results[0]!.status).toBe("info");
    expect(results[0]!.figure!.value).toBeCloseTo(0.012703056937531846, 12); // regression pin
    expect(lines).toContain("i For information  Calibration fit: Radius for the firmware 12.70 mm");
  });

  it("gives a spin-up that reaches its target a holding card and its stored energy for information (simulation: regression pins)", () => {
    const { results, lines } = sheet("drivetrain", {});
    expect(results.map((r) => [r.id, r.status])).toEqual([
      ["drivetrain", "holds"],
      ["drivetrain.energy", "info"],
    ]);
    expect(results[0]!.figure!.value).toBeCloseTo(1.0085107625179481, 6); // regression pin [s]
    expect(lines).toContain("✔ Holds            Spin-up: Time to target speed 1.01 s");
    // ½·J·Ω² at the target, 10 000 rpm with J = 0.00063 kg·m²… plus the motor's rotor through the gear: our own digits.
    expect(lines).toContain("i For information  Stored energy: Stored energy 345 J");
  });

  it("fails a spin-up whose target lies above the no-load speed Kv·V/gear, and shows the top speed it reaches", () => {
    const { results, lines } = sheet("drivetrain", { targetSpeed: 1256.6370614359173 }); // 12 000 rpm
    expect(results[0]!.status).toBe("fails");
    expect(results[0]!.figure!.label).toBe("Top speed reached");
    // The no-load speed bounds it (motor constants): 1400 rpm/V × 16.4 V / 2 = 1202 rad/s.
    expect(results[0]!.figure!.value).toBeLessThan((146.60765716752368 * 4 * 4.1) / 2);
    expect(results[0]!.figure!.value).toBeCloseTo(1179.9834068467585, 4); // regression pin [rad/s]
    expect(lines).toContain("✖ Fails            Spin-up: Top speed reached 11300 rpm");
  });
});

describe("the overall status of a build sheet", () => {
  /** Results with the given statuses (everything else as in any card). */
  const results = (...statuses: CheckStatus[]): CheckResult[] =>
    statuses.map((status, i) => ({ id: `c${i}`, section: "c", index: null, title: "C", status, rule: "r", margin: "m", figure: null, details: [] }));

  it.each([
    { statuses: [], overall: "empty", why: "nothing checked" },
    { statuses: ["info"], overall: "empty", why: "information alone judges nothing" },
    { statuses: ["info", "info", "holds"], overall: "holds", why: "information does not count" },
    { statuses: ["holds", "marginal", "holds"], overall: "marginal", why: "one marginal card makes the sheet marginal" },
    { statuses: ["marginal", "info"], overall: "marginal", why: "marginal counts, information does not" },
    { statuses: ["info", "marginal", "holds", "fails", "marginal"], overall: "fails", why: "one failing card fails the sheet" },
    { statuses: ["fails", "holds"], overall: "fails", why: "the order does not matter" },
    { statuses: ["holds", "holds"], overall: "holds", why: "all hold" },
  ] as { statuses: CheckStatus[]; overall: string; why: string }[])("$statuses → $overall ($why)", ({ statuses, overall }) => {
    expect(overallStatus(results(...statuses))).toBe(overall);
  });

  it("prints the overall word last, before the safety notice: Marginal for a marginal and an informing card", () => {
    const design = designWith("placement", { ...placement, radius: 0.005 });
    design.radiusTrim = initialValues(calculatorFor("radiusTrim")!);
    const text = buildSheetText(design, runChecks(design));
    expect(text).toMatch(/\nOverall: Marginal\n\nSafety: /);
    expect(buildSheetText(newDesign("Empty"), [])).toContain("\nOverall: nothing to check\n");
  });
});

describe("the build sheet as text", () => {
  it("prints a one-check design exactly: header, card, rule, result, figures, overall and the safety notice", () => {
    const design = designWith("placement", { ...placement, radius: 0.05, partMass: 0.1, partRadius: 0.05 });
    const text = buildSheetText(design, runChecks(design));
    expect(text).toBe(
      [
        "Build sheet: Invented test robot",
        "Design saved 2026-12-01; units metric",
        "",
        "✔ Holds            Accelerometer placement: Sensor reading at top speed 51.0 gₙ",
        "                   rule:   Reading at top speed at most 80.0 % of full scale, and one count resolves speed to 50.0 % at the lowest tracked speed",
        "                   result: The sensor at 50.0 mm lies inside the usable window, 10.0 mm to 80.0 mm; it reads 50.0 % of full scale at top speed.",
        "                   Smallest usable radius: 10.0 mm",
        "                   Largest usable radius: 80.0 mm",
        "                   Pull on the other part's mounts: 50.0 N",
        "",
        "Overall: Holds",
        "",
        "Safety: figures come from simplified models and typical strengths; they certify nothing. Spin up only in a rated enclosure; your event's rules and local codes come first.",
        "",
      ].join("\n"),
    );
  });

  it("prints the same design in US units when asked: 1.97 in, 0.394 in and 3.15 in, 11.2 lbf", () => {
    const design = designWith("placement", { ...placement, radius: 0.05, partMass: 0.1, partRadius: 0.05 }, "us");
    const text = buildSheetText(design, runChecks(design));
    // 50 mm = 1.97 in, 10 mm = 0.394 in, 80 mm = 3.15 in (1 in = 25.4 mm); 50 N = 11.2 lbf (1 lbf = 4.448 N).
    expect(text).toContain("result: The sensor at 1.97 in lies inside the usable window, 0.394 in to 3.15 in; it reads 50.0 % of full scale at top speed.");
    expect(text).toContain("Pull on the other part's mounts: 11.2 lbf");
  });

  it("titles each entry of a list section with its name, and numbers its id", () => {
    const design = designWith("fasteners", { ...bolt, partMass: 0.01 });
    design.fasteners = [
      { ...(design.fasteners as AnyValues[])[0], name: "lid screws" },
      { ...(design.fasteners as AnyValues[])[0], name: "hub bolt", partMass: 0.1 },
    ];
    const results = runChecks(design);
    expect(results.map((r) => [r.id, r.index, r.title, r.status])).toEqual([
      ["fasteners[0]", 0, "Fasteners: lid screws", "holds"],
      ["fasteners[1]", 1, "Fasteners: hub bolt", "fails"],
    ]);
    expect(overallStatus(results)).toBe("fails");
  });
});

describe("a design that did not come through readDesign", () => {
  // runChecks is also called on designs built in code or read without checking: a section of the
  // wrong shape gives a failing card with the reason, and never throws.
  const failing = (design: Design) => runChecks(design).map((r) => [r.id, r.status, r.margin]);

  it("fails a list section that is not a list, saying it must be one", () => {
    const design: Design = { ...newDesign("Odd"), fasteners: { ...bolt, partMass: 0.01 } };
    expect(failing(design)).toEqual([["fasteners[0]", "fails", "Could not compute: fasteners must be a list"]]);
  });

  it("fails a section that is not an object of named values: null, a number, a list entry that is null", () => {
    expect(failing({ ...newDesign("Odd"), placement: null })).toEqual([
      ["placement", "fails", "Could not compute: placement must be an object of named values"],
    ]);
    expect(failing({ ...newDesign("Odd"), placement: 5 })).toEqual([["placement", "fails", "Could not compute: placement must be an object of named values"]]);
    expect(failing({ ...newDesign("Odd"), fasteners: [null] })).toEqual([
      ["fasteners[0]", "fails", "Could not compute: fasteners must be an object of named values"],
    ]);
  });

  it("gives the failing card its own rule, no figure and no details", () => {
    const card = runChecks({ ...newDesign("Odd"), placement: null })[0]!;
    expect(card).toMatchObject({
      title: "Accelerometer placement",
      rule: "The inputs must be valid before anything can be checked",
      figure: null,
      details: [],
    });
  });

  it("leaves out a mass layout with no parts (nothing to check), and fails one whose parts are not a list", () => {
    const mass = { ...initialValues(calculatorFor("mass")!), parts: [] };
    expect(runChecks({ ...newDesign("Empty layout"), mass })).toEqual([]);
    // "a disk" has a length, so the layout counts as present; null has none, so asking throws: both fail.
    for (const parts of ["a disk", null]) {
      const broken = runChecks({ ...newDesign("Broken layout"), mass: { ...mass, parts } });
      expect(broken.map((r) => [r.id, r.status])).toEqual([["mass", "fails"]]);
      expect(broken[0]!.margin).toMatch(/^Could not compute: parts must be a list of 1 to 200 parts/);
    }
  });

  it("fails a set of values its calculator cannot compute, with the calculator's message", () => {
    const card = runChecks(designWith("placement", { ...placement, radius: 0.05, lowSpeed: 200 }))[0]!;
    expect(card.status).toBe("fails");
    expect(card.margin).toBe("Could not compute: lowSpeed must be at most topSpeed (100 rad/s) (got 200 rad/s)");
  });
});

describe("the build sheet's entry points refuse what is not theirs, naming it", () => {
  it.each([
    { call: () => runChecks(undefined as unknown as Design), message: /^design must be an object of named inputs/ },
    { call: () => buildSheetText(null as unknown as Design, []), message: /^design must be an object of named inputs/ },
    { call: () => buildSheetText(newDesign("x"), "none" as unknown as CheckResult[]), message: /^results must be a list/ },
    { call: () => overallStatus({} as unknown as CheckResult[]), message: /^results must be a list of check results \(got / },
    { call: () => terminalSafe(5 as unknown as string), message: /^text must be text/ },
    { call: () => cardsFor(null as unknown as AnyCalculator, {}, "metric"), message: /^calc must be an object of named inputs/ },
  ])("$message", ({ call, message }) => {
    expect(call).toThrow(CalcInputError);
    expect(call).toThrow(message);
  });

  it("gives no unit with a number that is not a list of results, nor with one that is not text", () => {
    expect(() => overallStatus("fails" as unknown as CheckResult[])).toThrow('results must be a list of check results (got "fails")');
    expect(() => overallStatus(5 as unknown as CheckResult[])).toThrow(/^results must be a list of check results \(got 5\)$/);
    expect(() => terminalSafe(5 as unknown as string)).toThrow(/^text must be text \(got 5\)$/);
  });
});

describe("cards of one set of values (cardsFor)", () => {
  const calc = calculatorFor("placement")!;
  const throwing = (thrown: unknown): AnyCalculator => ({
    ...calc,
    run: () => {
      throw thrown;
    },
  });

  it("turns any Error of a calculator into the failing card, a CalcInputError or another", () => {
    expect(cardsFor(throwing(new RangeError("out of its model")), {}, "metric")[0]!.margin).toBe("Could not compute: out of its model");
    const named = new CalcInputError({ param: "radius", value: -1, expected: "greater than 0", unit: "m" });
    expect(cardsFor(throwing(named), {}, "metric")[0]!.margin).toBe(`Could not compute: ${named.message}`);
  });

  it("lets a thrown value that is not an Error through: that is a bug, not a design's problem", () => {
    expect(() => cardsFor(throwing("a bare string"), {}, "metric")).toThrow("a bare string");
  });

  it("gives a ratio figure no unit, and a quantity figure its SI unit", () => {
    expect(sheet("fasteners", { ...bolt, partMass: 0.01 }).results[0]!.figure).toMatchObject({ label: "Safety factor", unit: "", text: "2.64" });
    expect(sheet("placement", { ...placement, radius: 0.05 }).results[0]!.figure).toMatchObject({ unit: "m/s²", text: "51.0 gₙ" });
  });
});
