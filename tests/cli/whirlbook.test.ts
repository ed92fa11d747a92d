/**
 * The command line: `whirlbook check design.json` with the same calc/ code as the site.
 */
import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { accelerometerPlacementInputs, demoDesign, designToText, newDesign, type Design } from "../../calc/index.ts";

const bin = fileURLToPath(new URL("../../bin/whirlbook.mjs", import.meta.url));
const dir = mkdtempSync(join(tmpdir(), "whirlbook-cli-"));

function write(name: string, text: string): string {
  const file = join(dir, name);
  writeFileSync(file, text);
  return file;
}

function run(...args: string[]) {
  const result = spawnSync(process.execPath, [bin, ...args], { encoding: "utf8" });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

const demoFile = write("demo.json", designToText(demoDesign()));

// Each case starts Node a few times (about half a second each on an idle machine): give a busy
// two-core machine room.
describe("whirlbook check", { timeout: 30_000 }, () => {
  it("prints the demo design's build sheet and exits 1 because a check fails", () => {
    const { code, stdout } = run("check", demoFile);
    expect(code).toBe(1);
    expect(stdout).toContain("Build sheet: Demo: invented 1.4 kg whole-body spinner");
    expect(stdout).toContain("✔ Holds            Accelerometer placement: Sensor reading at top speed 217 gₙ");
    expect(stdout).toContain("✖ Fails            Heading drift");
    expect(stdout).toContain("▲ Marginal         Balance");
    expect(stdout).toContain("                   rule:   Balance grade G 250 or finer");
  });

  it('prints the build sheet\'s own words, "For information" included, never a status key', () => {
    const { stdout } = run("check", demoFile);
    expect(stdout).toContain("i For information  True sensor radius");
    expect(stdout).not.toMatch(/\binfo\b|INFORMATION|HOLDS|FAILS/);
    expect(stdout).toMatch(/Overall: Fails\n/);
  });

  it("exits 0 when nothing fails: the demo without its heading drift is marginal (its balance is)", () => {
    const holding: Design = { ...demoDesign() };
    delete holding.headingDrift;
    const { code, stdout } = run("check", write("holding.json", designToText(holding)));
    expect(stdout).toContain("▲ Marginal         Balance");
    expect(stdout).not.toContain("✖ Fails");
    expect(stdout).toMatch(/\nOverall: Marginal\n/);
    expect(code).toBe(0);
  });

  describe("with a small one-check design (invented)", () => {
    // One accelerometer placement: 100 rad/s top speed, 1000 m/s² full scale with 20 % headroom, one
    // count of 1.25 m/s² resolving 50 % at 10 rad/s; the window is 10 to 80 mm (see
    // tests/calc/design/checks.test.ts for the working), the part pulls 0.1 kg × 100² × 0.05 m = 50 N.
    const defaults = Object.fromEntries(Object.entries(accelerometerPlacementInputs).map(([k, s]) => [k, s.default]));
    const placement = {
      ...defaults,
      topSpeed: 100,
      lowSpeed: 10,
      fullScale: 1000,
      margin: 0.2,
      step: 1.25,
      noise: 0,
      resolution: 0.5,
      partMass: 0.1,
      partRadius: 0.05,
    };
    const small = (radius: number): string =>
      write(`small-${radius}.json`, designToText({ ...newDesign("Small test robot", new Date("2026-12-01T00:00:00Z")), placement: { ...placement, radius } }));

    it("prints its whole build sheet, word for word, and exits 0 when it holds", () => {
      const { code, stdout, stderr } = run("check", small(0.05));
      expect(stderr).toBe("");
      expect(stdout).toBe(
        [
          "Build sheet: Small test robot",
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
      expect(code).toBe(0);
    });

    it("exits 0 for a marginal sheet (a sensor too close in), and 1 for a failing one (too far out)", () => {
      const marginal = run("check", small(0.005));
      expect(marginal.stdout).toContain("▲ Marginal         Accelerometer placement: Sensor reading at top speed 5.10 gₙ\n");
      expect(marginal.stdout).toMatch(/\nOverall: Marginal\n/);
      expect(marginal.code).toBe(0);
      const failing = run("check", small(0.1));
      expect(failing.stdout).toContain("✖ Fails            Accelerometer placement: Sensor reading at top speed 102 gₙ\n");
      expect(failing.stdout).toMatch(/\nOverall: Fails\n/);
      expect(failing.code).toBe(1);
    });

    it("gives the status key, the verdict word and the figure in SI with --json", () => {
      const report = JSON.parse(run("check", small(0.005), "--json").stdout);
      expect(report).toMatchObject({ overall: "marginal", overallVerdict: "Marginal", units: "metric" });
      expect(report.checks).toHaveLength(1);
      expect(report.checks[0]).toMatchObject({ id: "placement", status: "marginal", verdict: "Marginal" });
      expect(report.checks[0].figure).toEqual({ label: "Sensor reading at top speed", value: 50, unit: "m/s²", text: "5.10 gₙ" });
    });
  });

  it("prints machine-readable JSON with --json", () => {
    const { code, stdout } = run("check", demoFile, "--json");
    expect(code).toBe(1);
    const report = JSON.parse(stdout);
    expect(report.overall).toBe("fails");
    expect(report.checks.map((c: { id: string }) => c.id)).toContain("fasteners[0]");
    expect(report.checks[0].figure).toMatchObject({ label: "Sensor reading at top speed", unit: "m/s²", text: "217 gₙ" });
    // The status stays a key for programs; the verdict is the word the build sheet shows.
    expect(report.overallVerdict).toBe("Fails");
    expect(report.checks.find((c: { id: string }) => c.id === "mass.sensor")).toMatchObject({ status: "info", verdict: "For information" });
  });

  it("prints US units with --units us", () => {
    const { stdout } = run("check", demoFile, "--units", "us");
    expect(stdout).toContain("The sensor at 1.33 in");
  });

  it("explains a file that is not a design and exits 2", () => {
    const { code, stderr } = run("check", write("bad.json", '{"format": "something-else", "version": 1}'));
    expect(code).toBe(2);
    expect(stderr).toContain('is not a design Whirlbook can read:\n  format must be "whirlbook-design": this is not a Whirlbook design file.');
  });

  it("explains broken JSON, a missing file and bad usage, each with exit 2", () => {
    expect(run("check", write("broken.json", "{")).stderr).toMatch(/is not valid JSON/);
    expect(run("check", join(dir, "nope.json"))).toMatchObject({ code: 2, stderr: expect.stringContaining("no such file") });
    expect(run("frobnicate")).toMatchObject({ code: 2, stderr: expect.stringContaining('Unknown command "frobnicate"') });
    expect(run("check", demoFile, "--units", "imperial")).toMatchObject({ code: 2, stderr: expect.stringContaining('--units must be "metric" or "us"') });
  });

  it("keeps the valid values of a partly invalid file and lists the problems", () => {
    const broken = JSON.parse(designToText(demoDesign()));
    broken.placement.radius = -1;
    const { stdout } = run("check", write("partly.json", JSON.stringify(broken)));
    expect(stdout).toContain("Read ");
    expect(stdout).toContain(
      "Accelerometer placement (placement.radius): Sensor radius must be greater than 0 mm and at most 2000 mm (got -1000 mm); the default, 20 mm, was used.",
    );
  });

  describe("with a hostile design file", () => {
    /** Every control character a terminal could act on (C0 but the line feed, DEL, C1) and Unicode's line, paragraph and direction controls. */
    const CONTROL = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u2028\u2029\u200e\u200f\u202a-\u202e\u2066-\u2069]/u;
    const FORGED = "\r\nFAKE: all checks hold";
    const hostile = JSON.parse(designToText(demoDesign()));
    hostile.name = `Clears the screen\u001b[2J${FORGED}\u009b2J\u202e`;
    hostile[`extra${FORGED}`] = 1;
    hostile.placement.radius = `\u001b]0;retitled\u0007${FORGED}`;
    const file = write("hostile.json", JSON.stringify(hostile));

    it("escapes every control character in the text report, so nothing clears the screen or forges a line", () => {
      const { stdout, stderr } = run("check", file);
      expect(stderr).toBe("");
      expect(stdout).not.toMatch(CONTROL);
      expect(stdout).not.toMatch(/^FAKE/m);
      expect(stdout).toContain("Build sheet: Clears the screen\\u001b[2J\\r\\nFAKE: all checks hold\\u009b2J\\u202e\n");
      expect(stdout).toContain("  extra\\r\\nFAKE: all checks hold is not part of a design; it was ignored.\n");
    });

    it("escapes them in the JSON report too (the same text once parsed)", () => {
      const { stdout } = run("check", file, "--json");
      expect(stdout).not.toMatch(CONTROL);
      expect(JSON.parse(stdout).design).toBe(hostile.name);
    });

    it("escapes them in every message about the command line and the file", () => {
      const named = write(`named\u001b[2J${FORGED}.json`, designToText(demoDesign()));
      const broken = write(`broken\u001b[2J${FORGED}.json`, JSON.stringify({ format: `x${FORGED}`, version: 1 }));
      const messages = [
        run("check", join(dir, `missing\u001b[2J${FORGED}.json`)).stderr,
        run("check", broken).stderr,
        run("check", demoFile, "--units", `us\u001b[2J${FORGED}`).stderr,
        run("check", demoFile, `--bogus\u001b[2J${FORGED}`).stderr,
        run(`launch\u001b[2J${FORGED}`).stderr,
        run("check", demoFile, named).stderr,
      ];
      for (const message of messages) {
        expect(message).toContain("\\u001b[2J\\r\\nFAKE: all checks hold");
        expect(message).not.toMatch(CONTROL);
        expect(message).not.toMatch(/^FAKE/m);
      }
    });
  });
});
