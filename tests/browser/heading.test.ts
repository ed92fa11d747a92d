/**
 * The three heading chapters in a real browser (Debian chromium via playwright-core): open a
 * permalink and read the outputs, change an input and see the outputs and the URL follow, see an
 * error beside a bad value; paste logged readings with a spike, see it flagged, carry the fitted
 * radius into the drift budget and reopen the permalink; load a file; survive malformed and hostile
 * links; and axe-core finds no violations in light or dark.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { axeViolations, showCalculator, useSite, waitForIslands } from "../support/browser.ts";
import { decodeCalibrationRows, encodeCalibrationRows } from "../../calc/heading/calibration-rows.ts";
import { fitCalibration } from "../../calc/heading/calibration.ts";
import { parseCalibrationCsv } from "../../calc/heading/csv.ts";
import { formatQuantity } from "../../calc/core/units.ts";

const site = useSite();
const { origin, open } = site;

const out = (page: Page, name: string) => page.locator(`[data-out="${name}"]`).first().textContent();
const param = (page: Page, key: string) => new URL(page.url()).searchParams.get(key);

// The invented demo mismatch of the drift chapter: firmware 12.0 mm, true 12.7 mm, at 2800 rpm.
const DRIFT_LINK =
  "/chapters/heading-drift/?v=1&u=metric&rpm=2800rpm&ra=12mm&rt=12.7mm&k=0pct&b=0g&bh=0g&tilt=0deg&budget=10deg/s&lo=200rpm&hi=3000rpm&n=0g&p.rpm=2000rpm&p.r1=12mm&p.r2=12mm&p.e=0.5mm";

describe("heading drift budget", () => {
  it("answers a permalink with the right numbers in both sections", async () => {
    const { page, context, problems } = await open(DRIFT_LINK);
    // ω̂/ω = √(12.7/12) = 1.028753; 2800 rpm = 293.2 rad/s → drift 8.431 rad/s = 483.1 °/s, 10.35° per turn
    // (tests/calc/heading.test.ts pins the same demo; hand: 293.2 × 0.028753 = 8.43 rad/s)
    expect(await out(page, "drift-rate")).toBe("+483 °/s");
    expect(await out(page, "drift-rev")).toBe("+10.4°");
    expect(await out(page, "speed-ratio")).toBe("1.0288");
    // band 12.6849–12.7151 mm within ±10 °/s at 2800 rpm (calc doc example); exact radius 12.700 mm
    expect(await out(page, "radius-band")).toBe("12.685 mm to 12.715 mm");
    expect(await out(page, "radius-zero")).toBe("12.700 mm");
    // only up to 6.07 rad/s (57.96 rpm) is the drift within 10 °/s: closed below by standstill
    expect(await out(page, "speed-range")).toBe("from standstill to 57.96 rpm");
    expect(await out(page, "term-radius")).toBe("+490 °/s"); // first order: ω/2 · 0.7/12 = 146.6 × 0.05833 = 8.552 rad/s
    expect(await page.locator(".verdict").first().textContent()).toContain("Fails: over the trim budget.");
    // pair section: one sensor, centre 0.5 mm toward it, 2000 rpm: 209.44 × (√(11.5/12) − 1) = −4.4097 rad/s
    expect(await out(page, "pair-s1-toward")).toBe("−253 °/s");
    expect(await out(page, "pair-s1-away")).toBe("+247 °/s");
    expect(await out(page, "pair-drift")).toBe("0 °/s");
    expect(await out(page, "pair-offset")).toBe("0.500 mm");
    expect(await page.inputValue("#drift-calculator-p-radius1")).toBe("12 mm");
    expect(problems).toEqual([]);
    await context.close();
  });

  it("updates outputs and the URL when inputs change, keeping the other section's keys", async () => {
    const { page, context } = await open(DRIFT_LINK);
    await page.fill("#drift-calculator-assumedRadius", "12.69 mm");
    await page.fill("#drift-calculator-bias", "0.02 g");
    // r̂ = 12.69 mm with 0.02 g left in: within ±10 °/s from 49.79 to 393.2 rad/s (calc doc example)
    await expect.poll(() => out(page, "speed-range")).toBe("from 475.4 rpm to 3755 rpm");
    expect(await out(page, "drift-rate")).toBe("+8.13 °/s");
    expect(await page.locator(".verdict").first().textContent()).toContain("Holds: within the trim budget.");
    await expect.poll(() => param(page, "ra")).toBe("12.69mm");
    expect(param(page, "b")).toBe("0.02g");
    expect(param(page, "p.e")).toBe("0.5mm");
    await page.fill("#drift-calculator-p-offset", "1 mm");
    await expect.poll(() => param(page, "p.e")).toBe("1mm");
    expect(await out(page, "pair-s1-rev")).toBe("15.3°"); // 360° × (√(11/12) − 1) = −15.33°
    expect(param(page, "ra")).toBe("12.69mm");
    await context.close();
  });

  it("shows errors beside the fields they concern, and no NaN anywhere", async () => {
    const { page, context } = await open("/chapters/heading-drift/");
    await page.fill("#drift-calculator-assumedRadius", "abc");
    await expect.poll(() => page.locator("#drift-calculator-assumedRadius-error").textContent()).toContain("Radius in firmware must start with a number");
    expect(await page.getAttribute("#drift-calculator-assumedRadius", "aria-invalid")).toBe("true");
    await page.fill("#drift-calculator-assumedRadius", "12 mm");
    await page.fill("#drift-calculator-highSpeed", "100 rpm");
    await expect.poll(() => page.locator("#drift-calculator-highSpeed-error").textContent()).toBe("Plot to must be greater than the plot from (200 rpm).");
    // The pair section opens on demand (its code loads then), with its fields in the page's units.
    await page.getByRole("button", { name: "Compare with two opposed sensors" }).click();
    await expect.poll(() => page.inputValue("#drift-calculator-p-radius1")).toBe("12 mm");
    expect(new URL(page.url()).searchParams.has("p.r1")).toBe(false); // opening alone changes no link
    await page.fill("#drift-calculator-p-radius2", "-3 mm");
    await expect
      .poll(() => page.locator("#drift-calculator-p-radius2-error").textContent())
      .toContain("Sensor 2 radius must be between 0.1 mm and 1000 mm (got -3 mm)");
    const body = (await page.textContent("body")) ?? "";
    expect(body).not.toMatch(/\bNaN\b|Infinity/);
    await context.close();
  });

  it("treats a hostile query string as text and explains what it ignored", async () => {
    const hostile = `?ra=${encodeURIComponent('"><img src=x onerror=alert(1)>')}&p.zz=1&${encodeURIComponent("<script>alert(2)</script>")}=1`;
    const { page, context, problems, requests } = await open(`/chapters/heading-drift/${hostile}`);
    expect(await page.locator("main img").count()).toBe(0);
    expect(await page.inputValue("#drift-calculator-assumedRadius")).toBe('"><img src=x onerror=alert(1)>');
    // The pair's key opens its section at once, and its notice names the key it does not use.
    await expect
      .poll(() => page.locator(".calc-notices").allTextContents())
      .toEqual([expect.stringContaining("does not use"), expect.stringContaining('"p.zz"')]);
    expect(problems).toEqual([]);
    expect(requests.filter((url) => !url.startsWith(origin()))).toEqual([]);
    await context.close();
  });
});

describe("heading timing and smoothing", () => {
  // The invented demo of the timing chapter: 2800 rpm, 2 kHz loop, 0.3 ms latency, 1 ms beacon; α = 0.05 at 2 kHz after a median of 3.
  const LINK =
    "/chapters/heading-timing/?v=1&u=metric&rpm=2800rpm&hz=2000Hz&lat=0.3ms&on=1ms&arc=15deg&step=10deg&s.fs=2000Hz&s.a=0.05&s.med=3&s.acc=2000rpm/s&s.dw=2800rpm&s.rpm=2000rpm&s.r=12.7mm&s.spk=50g";

  it("answers a permalink, follows an edit in each section into the URL, and shows errors beside their fields", async () => {
    const { page, context, problems } = await open(LINK);
    // 2800 rpm = 16 800 °/s: 8.40° per 0.5 ms update, 5.04° in 0.3 ms, 16.8° in 1 ms; 15° needs 0.893 ms
    expect(await out(page, "step")).toBe("8.40°");
    expect(await out(page, "lag")).toBe("5.04°");
    expect(await out(page, "arc")).toBe("16.8°");
    expect(await out(page, "on-needed")).toBe("893 µs");
    expect(await page.locator(".verdict").first().textContent()).toContain("Marginal: heading LED arc too wide.");
    // EMA delay 0.5 ms × 0.95/0.05 = 9.5 ms, median +0.5 ms; 293.2 rad/s × 10 ms = 2.93 rad = 168°
    expect(await out(page, "delay")).toBe("9.50 ms + 500 µs");
    expect(await out(page, "heading-after")).toBe("168°");
    expect(await out(page, "spinup-drift")).toBe("−120 °/s");
    await page.fill("#timing-calculator-loopRate", "4000");
    await expect.poll(() => out(page, "step")).toBe("4.20°");
    await expect.poll(() => param(page, "hz")).toBe("4000");
    await page.fill("#timing-calculator-s-smoothingFactor", "0.2");
    // 0.5 ms × 0.8/0.2 = 2 ms, + 0.5 ms → 2.5 ms × 293.2 rad/s = 0.733 rad = 42.0°
    await expect.poll(() => out(page, "heading-after")).toBe("42.0°");
    await expect.poll(() => param(page, "s.a")).toBe("0.2");
    expect(param(page, "hz")).toBe("4000");
    // errors beside their fields
    await page.fill("#timing-calculator-s-medianLength", "4");
    await expect.poll(() => page.locator("#timing-calculator-s-medianLength-error").textContent()).toBe("Median window must be an odd whole number.");
    await page.fill("#timing-calculator-loopRate", "0");
    await expect.poll(() => page.locator("#timing-calculator-loopRate-error").textContent()).toContain("Control-loop rate must be");
    expect((await page.textContent("body")) ?? "").not.toMatch(/\bNaN\b|Infinity/);
    expect(problems).toEqual([]);
    await context.close();
  });
});

describe("calibration from logged readings", () => {
  // Made from a = 15.0 mm · ω² + 0.5 g with ±0.12 g of scatter, one 8 g knock at 1500 rpm (line 8),
  // semicolons with decimal commas, and one unreadable line (line 7).
  const PASTED =
    "# pasted from a stand log\nspeed_rpm;accel_g\n500;4,74\n750;9,85\n1000;17,39\n1250;26,64\n1300;n/a\n1500;46,24\n1750;51,97\n2000;67,48\n2250;85,48\n2500;105,30";
  // What the page must show, from calc/ (the rows as the link carries them, then the fit)
  const rows = decodeCalibrationRows(encodeCalibrationRows(parseCalibrationCsv(PASTED).rows)).rows;
  const fit = fitCalibration(rows);
  const radius = formatQuantity(fit.radius, "length", { significant: 5 }).text;
  const bias = formatQuantity(fit.bias, "acceleration").text;

  it("flags the spike, lists the bad line, carries the radius into the drift budget, and reopens the same fit", async () => {
    expect(radius).toBe("14.996 mm"); // hand check: the readings were made from 15.0 mm
    expect(fit.spikes.flagged).toEqual([4]);
    const { page, context, problems } = await open("/chapters/calibration/");
    await page.fill("#calibration-calculator-data", PASTED);
    await expect.poll(() => out(page, "radius")).toBe(radius);
    expect(await out(page, "bias")).toBe(bias);
    expect(await out(page, "flagged")).toContain("Line 8: 1500 rpm");
    expect(await out(page, "flagged-count")).toBe("1");
    expect(await out(page, "skipped")).toContain('Line 7 (1300;n/a): acceleration "n/a" must start with a number');
    await expect.poll(() => param(page, "d")).toMatch(/^v1:500:4\.74,750:9\.85,/);
    const permalink = page.url().replace(origin(), "");
    expect(permalink).toContain("d=v1:500:4.74,"); // readable in the address bar
    // one click into the drift budget
    await page.locator('#calibration-calculator [data-out="handoff"]').click();
    await page.waitForURL(/\/chapters\/heading-drift\//);
    await waitForIslands(page);
    // the link carries the fit exactly: the drift budget gets the very radius and offset fitted
    const handedRadius = await page.inputValue("#drift-calculator-assumedRadius");
    expect(handedRadius).toMatch(/^14\.996\d* mm$/);
    expect(Number(handedRadius.replace(" mm", "")) * 0.001).toBe(fit.radius);
    const offset = await page.inputValue("#drift-calculator-biasCorrection");
    // in gₙ when a number in gₙ reads back exactly, else in m/s²
    expect(offset.endsWith(" gₙ") ? Number(offset.replace(" gₙ", "")) * 9.80665 : Number(offset.replace(" m/s²", ""))).toBe(fit.bias);
    expect(await page.locator(".calc-notices").count()).toBe(0);
    expect(problems).toEqual([]);
    await context.close();
    // the calibration permalink, opened fresh, gives the same numbers
    const again = await open(permalink);
    // readings other than the demo's: the fitting code loads with the page, then the figures follow
    await expect.poll(() => out(again.page, "radius")).toBe(radius);
    expect(await out(again.page, "bias")).toBe(bias);
    expect(await out(again.page, "radius-se")).toBe(`± ${formatQuantity(fit.leastSquaresWithoutSpikes!.slopeStdError, "length").text}`);
    expect(await out(again.page, "flagged")).toContain("1500 rpm");
    // rows from the link come with their reading: the text reader loads only when the text box is used
    const readerLoaded = () => again.requests.some((url) => /\/_astro\/csv\.[\w-]+\.js$/.test(url));
    expect(readerLoaded()).toBe(false);
    await again.page.focus("#calibration-calculator-data");
    await expect.poll(readerLoaded).toBe(true);
    expect(again.problems).toEqual([]);
    await again.context.close();
  });

  it("opens with the figures the fitting code computes (the page's build-time data equals the live fit), and loads that code only once a field is used", async () => {
    const { page, context, problems, requests } = await open("/chapters/calibration/");
    const loaded = (chunk: string) => requests.some((url) => new RegExp(`/_astro/${chunk}\\.[\\w-]+\\.js$`).test(url));
    // Everything the calculator shows: the results, the bar, the hand-over link, and each chart's drawing.
    const shown = () =>
      page.evaluate(() => {
        const calc = document.getElementById("calibration-calculator")!;
        return {
          results: calc.querySelector(".calibration-results")!.textContent,
          bar: calc.querySelector("[data-result-bar]")!.textContent,
          handoff: calc.querySelector('[data-out="handoff"]')!.getAttribute("href"),
          charts: [...calc.querySelectorAll(".chart")].map((chart) => chart.outerHTML),
          text: (calc.querySelector("textarea") as HTMLTextAreaElement).value,
        };
      });
    await showCalculator(page, "#calibration-calculator");
    const opened = await shown();
    expect(opened.results).toContain("12.703 mm");
    expect(opened.charts).toHaveLength(2);
    expect(loaded("calibration-engine")).toBe(false);
    expect(loaded("calibration-results")).toBe(false);
    // Edit the confidence level, then put it back: the figures are now the live computation's.
    const field = "#calibration-calculator-confidence";
    const level = await page.inputValue(field);
    const before = await out(page, "radius-ci");
    await page.fill(field, "90 %");
    await expect.poll(() => out(page, "radius-ci")).not.toBe(before);
    expect(loaded("calibration-engine")).toBe(true);
    expect(loaded("calibration-results")).toBe(true);
    await page.fill(field, level);
    await expect.poll(shown).toEqual(opened);
    expect(problems).toEqual([]);
    await context.close();
  });

  it("reads a file locally with FileReader and sends it nowhere", async () => {
    const { page, context, requests } = await open("/chapters/calibration/");
    const sent: string[] = [];
    page.on("request", (request) => {
      if (request.method() !== "GET" || request.postData()) sent.push(`${request.method()} ${request.url()}`);
    });
    await page.setInputFiles("#calibration-calculator-file", { name: "log.csv", mimeType: "text/csv", buffer: Buffer.from(PASTED) });
    await expect.poll(() => out(page, "radius")).toBe(radius);
    expect(await page.inputValue("#calibration-calculator-data")).toBe(PASTED);
    expect(sent).toEqual([]);
    expect(requests.filter((url) => !url.startsWith(origin()))).toEqual([]);
    // a bad threshold: the error sits beside its field
    await page.fill("#calibration-calculator-spikeThreshold", "0");
    await expect.poll(() => page.locator("#calibration-calculator-spikeThreshold-error").textContent()).toContain("Spike threshold k must be greater than 0");
    expect((await page.textContent("body")) ?? "").not.toMatch(/\bNaN\b|Infinity/);
    await context.close();
  });

  it("explains a malformed link instead of crashing", async () => {
    const { page, context, problems } = await open(
      `/chapters/calibration/?v=1&d=${encodeURIComponent("v1:600:5.4,zz,1200:20.6,1800:46.3,<i>x</i>")}&su=furlongs`,
    );
    const notices = (await page.locator(".calc-notices").textContent()) ?? "";
    expect(notices).toContain('reading 2 ("zz")');
    expect(notices).toContain("bare speeds");
    expect(await page.locator("main i").count()).toBe(0);
    await expect.poll(() => page.locator("#calibration-calculator-data").inputValue()).toContain("1800,46.3");
    await expect.poll(() => out(page, "flagged-count")).toBe("0");
    const unknown = await open("/chapters/calibration/?v=1&d=v7:1:2");
    expect(await unknown.page.locator(".calc-notices").textContent()).toContain("unknown version 7");
    await expect.poll(() => unknown.page.locator("#calibration-calculator-data-error").textContent()).toContain("at least 3 readings at different speeds");
    expect([...problems, ...unknown.problems]).toEqual([]);
    await unknown.context.close();
    await context.close();
  });
});

describe("accessibility of the heading chapters (axe-core)", () => {
  const paths = ["/chapters/heading-drift/", "/chapters/heading-timing/", "/chapters/calibration/", "/chapters/calibration/?k=abc&d=v1:1:2"];
  for (const path of paths) {
    it(`finds no violations on ${path}, light and dark`, async () => {
      const { page, context } = await open(path);
      const found: Record<string, string[]> = {};
      for (const colorScheme of ["light", "dark"] as const) {
        await page.emulateMedia({ colorScheme });
        found[colorScheme] = await axeViolations(page);
      }
      expect(found).toEqual({ light: [], dark: [] });
      await context.close();
    });
  }
});
