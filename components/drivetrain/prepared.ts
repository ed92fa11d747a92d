/**
 * The default design's result as the page ships it (used when the site is built; the page reads it
 * from the calculator's props). The figures travel exactly as calc/ computed them; the time series,
 * which only the charts read, to six significant figures (a millionth of the chart's height, far
 * below a pixel), which takes about 1.7 KB gzip off the page.
 */
import type { SpinUpPoint } from "../../calc/drivetrain/results.ts";
import type { SpinUpPrepared } from "./model.ts";

const six = (x: number) => Number(x.toPrecision(6));

export function shippedPrepared({ input, result }: SpinUpPrepared): SpinUpPrepared {
  const series = result.series.map(
    (p): SpinUpPoint => ({
      ...p,
      time: six(p.time),
      speed: six(p.speed),
      motorSpeed: six(p.motorSpeed),
      batteryCurrent: six(p.batteryCurrent),
      batteryVoltage: six(p.batteryVoltage),
      motorCurrent: six(p.motorCurrent),
    }),
  );
  return { input, result: { ...result, series } };
}
