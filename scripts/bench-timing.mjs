// The timing harness of the bench scripts: each case runs untimed to warm up, then timed; the
// median, 90th percentile and minimum are printed against the case's target, with the load average
// (timings on a shared machine vary). It prints; it never fails a build.
import { loadavg } from "node:os";

/** Runs `fn` `warmup` times untimed, then `runs` times timed; returns times in ms, sorted, and the last result. */
export function time(fn, runs, warmup) {
  let last;
  for (let i = 0; i < warmup; i++) last = fn();
  const times = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    last = fn();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { times, last };
}

export const quantile = (sorted, q) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
export const ms = (x) => `${x.toFixed(3)} ms`;

/**
 * Times each case ({ label, target [ms], runs, warmup, fn, note(lastResult) }) and prints one line
 * per case under `title`, then whether every median met its target.
 */
export function printTimings(title, cases) {
  console.log(
    `${title} — Node ${process.version}, load average ${loadavg()
      .map((x) => x.toFixed(2))
      .join(" ")}`,
  );
  console.log("");
  let missed = 0;
  for (const c of cases) {
    const { times, last } = time(c.fn, c.runs, c.warmup);
    const median = quantile(times, 0.5);
    const ok = median < c.target;
    if (!ok) missed++;
    console.log(c.label);
    console.log(
      `  median ${ms(median)}   p90 ${ms(quantile(times, 0.9))}   min ${ms(times[0])}   over ${c.runs} runs   target < ${c.target} ms: ${ok ? "met" : "MISSED"}   (${c.note(last)})`,
    );
  }
  console.log("");
  console.log(missed === 0 ? "All targets met." : `${missed} target(s) missed.`);
}
