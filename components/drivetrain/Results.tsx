/**
 * The spin-up results: the verdict and the simulation's warnings, then what limits the acceleration
 * over time and where the energy went, then the figures (times to speed, battery, stored energy);
 * and the speed and current plots with the regime strip between them.
 */
import type { DrivetrainInput } from "../../calc/drivetrain/inputs.ts";
import type { SpinUpRegime, SpinUpResult } from "../../calc/drivetrain/results.ts";
import type { UnitSystem } from "../../calc/core/units.ts";
import { formatNumber, radPerSecondToRpm } from "../../calc/core/units.ts";
import { Chart, useDrawWidth } from "../calc-ui/Chart.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { Verdict } from "../calc-ui/Verdict.tsx";
import { amps, fmt, mAh, percent, REGIME_NAME, REGIME_TEXT, rpm, seconds } from "./format.ts";
import type { FieldError } from "./model.ts";

/** Chart geometry shared with the regime strip so that the strip lines up with the time axis. */
const WIDTH = 640;
const LEFT = 56;
const RIGHT = 16;

export function Empty({ error, id }: { error: FieldError; id?: string }) {
  return (
    <div class="calc-results calc-results--empty" id={id} aria-live="polite">
      <p>{error && error.field === null ? error.message : "Results appear when every field above holds a valid value."}</p>
    </div>
  );
}

function SpinUpVerdict({ r }: { r: SpinUpResult }) {
  const target = rpm(r.targetSpeed);
  const end = seconds(r.endTime);
  const settled = r.endReason === "steady-state" ? `settles by ${end}` : `is still rising at ${end}`;
  if (r.verdict === "stalled") {
    return (
      <Verdict tone="bad" reason="does not move">
        Friction and the motors' no-load loss exceed the torque the motors give at the current limit.
      </Verdict>
    );
  }
  if (r.verdict === "falls-short") {
    return (
      <Verdict tone="bad" reason="falls short of the target">
        It tops out at {rpm(r.topSpeed)} ({settled}), {percent(-r.topSpeedMargin)} below the {target} target.
      </Verdict>
    );
  }
  return (
    <Verdict tone="ok" reason="reaches the target">
      {target} in {seconds(r.timeToTarget!)}; it tops out at {rpm(r.topSpeed)} ({settled}), {percent(r.topSpeedMargin)} above the target.
    </Verdict>
  );
}

/** The verdict, the time to target and the stored energy, in view while editing. */
export function SpinUpBar({ r, system, error, resultsId }: { r: SpinUpResult | null; system: UnitSystem; error: FieldError; resultsId: string }) {
  if (!r)
    return (
      <ResultBar tone={null} figures={[]} resultsId={resultsId} missing={error?.field === null ? error.message : "No result yet: correct the marked field."} />
    );
  const reached = r.verdict === "reaches-target";
  return (
    <ResultBar
      tone={reached ? "ok" : "bad"}
      reason={reached ? undefined : r.verdict === "stalled" ? "does not move" : "falls short of the target"}
      resultsId={resultsId}
      figures={[
        reached
          ? { name: "time-100", label: "Time to target", value: seconds(r.timeToTarget!) }
          : { name: "top-speed", label: "Tops out at", value: rpm(r.topSpeed) },
        { name: "stored-energy", label: "Stored", value: fmt(r.atTopSpeed.storedEnergy, "energy", system) },
      ]}
    />
  );
}

export function Results({ r, input, system, id }: { r: SpinUpResult; input: DrivetrainInput; system: UnitSystem; id?: string }) {
  const q = (v: number, kind: Parameters<typeof fmt>[1]) => fmt(v, kind, system);
  const time = (v: number | null) => (v === null ? `not reached — tops out at ${rpm(r.topSpeed)}` : q(v, "time"));
  const top = r.atTopSpeed;
  const e = r.energy;
  const spinner = r.driveType === "spinner";
  const items: [string, string, string][] = [
    ["Time to 50 % of target", "time-50", time(r.timeTo50)],
    ["Time to 90 % of target", "time-90", time(r.timeTo90)],
    ["Time to target", "time-100", time(r.timeToTarget)],
    ["Top speed reached", "top-speed", rpm(r.topSpeed)],
    ["Peak battery current", "peak-current", amps(r.peakBatteryCurrent)],
    [
      r.averageBatteryCurrentToTarget === null ? "Average battery current over the run" : "Average battery current to target",
      "avg-current",
      amps(r.averageBatteryCurrentToTarget ?? r.averageBatteryCurrent),
    ],
    ["Peak current in each motor", "motor-current", amps(r.peakMotorCurrent)],
    [
      r.drive.currentLimitAt === "none" ? "Stall current in each motor (no limit)" : "Current in each motor at standstill",
      "stall-current",
      amps(r.drive.stallCurrent),
    ],
    ["Lowest battery voltage (sag)", "min-voltage", `${q(r.minBatteryVoltage, "voltage")} of ${q(r.openCircuitVoltage, "voltage")}`],
    ["Charge drawn over the run", "charge", mAh(r.chargeDrawn)],
    [`Stored energy ½JΩ² at ${rpm(top.angularSpeed)}`, "stored-energy", q(top.storedEnergy, "energy")],
    [`Stored energy at the ${rpm(r.targetSpeed)} target`, "stored-target", q(r.atTargetSpeed.storedEnergy, "energy")],
    ["Tip speed at top speed", "tip-speed", q(top.tipSpeed, "speed")],
    ["Stored energy per kg of robot", "energy-per-kg", `${formatNumber(top.energyPerMass)} J/kg`],
    [`Bite per impactor at ${q(input.closingSpeed, "speed")} closing`, "bite", top.bite === null ? "none at rest" : q(top.bite, "length")],
    [
      r.drive.currentLimitAt === "motor" ? "Acceleration at the current limit" : "Acceleration from standstill",
      "accel-limit",
      `${formatNumber(radPerSecondToRpm(r.drive.currentLimitedAcceleration))} rpm/s`,
    ],
    ["Mechanical time constant", "tau", q(r.drive.timeConstant, "time")],
  ];
  if (spinner && r.drive.tractionLimitedAcceleration !== null) {
    items.push(["Acceleration while the wheels slip", "accel-slip", `${formatNumber(radPerSecondToRpm(r.drive.tractionLimitedAcceleration))} rpm/s`]);
  }
  const losses: [string, string, number][] = [
    ["Battery internal resistance", "battery", e.batteryLoss],
    ["Motor windings (I²R)", "copper", e.copperLoss],
    ["Motor no-load loss", "motor", e.motorLoss],
    ["Gearing", "gear", e.gearLoss],
    ["Friction torque", "friction", e.frictionLoss],
    ["Air drag", "drag", e.dragLoss],
  ];
  if (spinner) losses.push(["Wheel slip", "slip", e.slipLoss]);
  return (
    <div class="calc-results" id={id} aria-live="polite">
      <SpinUpVerdict r={r} />
      {r.warnings.length > 0 ? (
        <ul class="dt-warnings" data-out="warnings">
          {r.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      ) : null}
      <h3 class="dt-h">What limits the acceleration, over time</h3>
      <ol class="dt-list" data-out="regimes">
        {r.regimes.map((s) => (
          <li key={s.start}>
            {seconds(s.start)} to {seconds(s.end)}: {REGIME_TEXT[s.regime]}
          </li>
        ))}
      </ol>
      <div class="dt-table-wrap" role="region" aria-label="Where the energy went" tabIndex={0}>
        <table class="dt-table">
          <caption>Where the energy went, 0 to {seconds(r.endTime)}</caption>
          <tbody>
            <tr>
              <th scope="row">Drawn from the cells</th>
              <td data-out="energy-drawn">{q(e.drawn, "energy")}</td>
            </tr>
            <tr>
              <th scope="row">Stored as motion (rotor or robot, wheels, motor rotors)</th>
              <td data-out="energy-kinetic">{q(e.kinetic, "energy")}</td>
            </tr>
            {losses.map(([label, key, value]) => (
              <tr key={key}>
                <th scope="row" class="dt-indent">
                  Lost: {label}
                </th>
                <td data-out={`energy-${key}`}>{q(value, "energy")}</td>
              </tr>
            ))}
            <tr>
              <th scope="row">All losses</th>
              <td data-out="energy-losses">{q(e.totalLoss, "energy")}</td>
            </tr>
          </tbody>
        </table>
      </div>
      <h3 class="dt-h">The run in figures</h3>
      <dl class="results-grid">
        {items.map(([label, name, value]) => (
          <div key={name}>
            <dt>{label}</dt>
            <dd data-out={name}>{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

const REGIME_CLASS = (regime: SpinUpRegime) => `dt-reg-${regime}`;

/** The regimes as a coloured strip on the same time axis as the charts (drawn at their width and margins). */
function RegimeStrip({ r }: { r: SpinUpResult }) {
  const [width, ref] = useDrawWidth(WIDTH);
  const span = r.endTime;
  const x = (t: number) => LEFT + (t / span) * (width - LEFT - RIGHT);
  const present = [...new Set(r.regimes.map((s) => s.regime))];
  return (
    <figure class="chart dt-strip" ref={ref}>
      <svg
        viewBox={`0 0 ${width} 28`}
        role="img"
        aria-label={`Limiting regime over time: ${r.regimes.map((s) => `${REGIME_NAME[s.regime]} from ${formatNumber(s.start)} s to ${formatNumber(s.end)} s`).join("; ")}.`}
      >
        {r.regimes.map((s) => (
          <rect
            key={s.start}
            class={REGIME_CLASS(s.regime)}
            x={x(s.start).toFixed(1)}
            width={Math.max(1, x(s.end) - x(s.start)).toFixed(1)}
            y="4"
            height="20"
          />
        ))}
      </svg>
      <figcaption>
        <ul class="chart-legend">
          {present.map((regime) => (
            <li key={regime}>
              <span class={`swatch ${REGIME_CLASS(regime)}`} aria-hidden="true" />
              {REGIME_NAME[regime]}
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}

export function SpinUpCharts({ r, input }: { r: SpinUpResult; input: DrivetrainInput }) {
  if (!(r.endTime > 0) || r.series.length < 2) return null;
  const x: [number, number] = [0, r.endTime];
  // Speeds are plotted in thousands of rpm so that the axis figures stay short.
  const speeds = r.series.map((p) => [p.time, radPerSecondToRpm(p.speed) / 1000] as const);
  const battery = r.series.map((p) => [p.time, p.batteryCurrent] as const);
  const motor = r.series.map((p) => [p.time, p.motorCurrent] as const);
  const targetRpm = radPerSecondToRpm(r.targetSpeed);
  const topRpm = radPerSecondToRpm(r.topSpeed);
  const peak = Math.max(r.peakBatteryCurrent, r.peakMotorCurrent, Math.min(input.currentLimit, 2 * r.peakMotorCurrent));
  return (
    <div class="dt-charts">
      <Chart
        title="Speed against time"
        summary={`From rest to ${formatNumber(topRpm, 4)} rpm in ${formatNumber(r.endTime)} s; target ${formatNumber(targetRpm, 4)} rpm${r.timeToTarget === null ? ", not reached" : `, reached at ${formatNumber(r.timeToTarget)} s`}.`}
        xLabel="Time (s)"
        yLabel="Speed (× 1000 rpm)"
        xDomain={x}
        yDomain={[0, (Math.max(targetRpm, topRpm) * 1.08) / 1000]}
        series={[{ label: r.driveType === "spinner" ? "Robot speed" : "Weapon speed", points: speeds, className: "plot-curve" }]}
        hLines={[{ value: targetRpm / 1000, label: "Target speed", className: "plot-limit plot-dashed" }]}
        vLines={r.timeToTarget === null ? [] : [{ value: r.timeToTarget, label: "Target reached", className: "plot-marker plot-dashed" }]}
      />
      <RegimeStrip r={r} />
      <Chart
        title="Current against time"
        summary={`Battery current peaks at ${formatNumber(r.peakBatteryCurrent)} A; each motor peaks at ${formatNumber(r.peakMotorCurrent)} A${r.drive.currentLimitAt === "none" ? " with no limit" : ` against a ${r.drive.currentLimitAt} limit of ${formatNumber(input.currentLimit)} A`}.`}
        xLabel="Time (s)"
        yLabel="Current (A)"
        xDomain={x}
        yDomain={[0, peak * 1.1 || 1]}
        series={[
          { label: "Battery current", points: battery, className: "plot-curve" },
          { label: "Current in each motor", points: motor, className: "plot-curve-2 plot-dashed" },
        ]}
        hLines={input.currentLimit <= peak * 1.1 ? [{ value: input.currentLimit, label: "Current limit per motor", className: "plot-limit plot-dashed" }] : []}
      />
    </div>
  );
}
