/**
 * The calibration calculator's results: the bar with the fitted radius and offset, the verdict, the fitted radius and offset with their
 * uncertainties, the hand-over to the drift budget, every fit in a table, the readings flagged as
 * spikes and the lines skipped. The page comes with these rendered for its demo readings
 * (components/calculators/calibration.tsx keeps that HTML), so this view loads only when something
 * it shows changes: an edit, another unit system, or a link that carries other readings.
 */
import type { ConfidenceInterval } from "../../calc/numerics/line-fit.ts";
import { formatNumber, type UnitSystem } from "../../calc/core/units.ts";
import type { CalibrationModel } from "./calibration-model.ts";
import { inSystem, plain } from "./format.ts";
import { DataTable, Empty, Outputs, Verdict } from "./ui.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";

const METHOD_NAMES = {
  "least-squares": "least squares, all readings",
  "least-squares-without-spikes": "least squares without the flagged readings",
  "theil-sen": "Theil–Sen (too few readings left for least squares)",
};

/** The fitted radius and offset, in view while the readings are edited. */
export function Bar({ model, id }: { model: CalibrationModel; id: string }) {
  const { fit } = model.shown.value.outcome;
  const system: UnitSystem = model.fields.system.value;
  const resultsId = `${id}-results`;
  if (!fit) return <ResultBar tone={null} figures={[]} resultsId={resultsId} missing="No fit yet: see the readings above." />;
  if (!model.handoff.value) return <ResultBar tone="bad" reason="no usable radius" figures={[]} resultsId={resultsId} />;
  return (
    <ResultBar
      tone={null}
      resultsId={resultsId}
      figures={[
        { name: "radius", label: "Radius r̂", value: inSystem(fit.radius, "length", system, 5) },
        { name: "bias", label: "Offset b̂", value: inSystem(fit.bias, "acceleration", system, 3) },
      ]}
    />
  );
}

export function Results({ model, id }: { model: CalibrationModel; id: string }) {
  const { outcome, data, parsed } = model.shown.value;
  const { fit, error } = outcome;
  const { lines, rows, dropped } = data;
  const system: UnitSystem = model.fields.system.value;
  const len = (v: number) => inSystem(v, "length", system, 5);
  const acc = (v: number) => inSystem(v, "acceleration", system, 3);
  const interval = (i: ConfidenceInterval | null | undefined, f: (v: number) => string) => (i ? `${f(i.low)} to ${f(i.high)}` : "—");
  const skipped = [
    ...parsed.problems.map((p) => `Line ${p.line}${p.text ? ` (${p.text})` : ""}: ${p.reason}.`),
    ...(dropped > 0 ? [`${dropped} readings after the first 500 are not used.`] : []),
  ];
  const skippedList = skipped.length ? (
    <>
      <h3>Lines skipped</h3>
      <ul class="calc-list" data-out="skipped">
        {skipped.map((s, i) => (
          <li key={i}>{s}</li>
        ))}
      </ul>
    </>
  ) : null;
  if (!fit) {
    return (
      <>
        <Empty error={error && error.field === "rows" ? null : error} id={`${id}-results`} />
        {skippedList}
      </>
    );
  }
  const used = fit.method === "least-squares" ? fit.leastSquares : fit.method === "least-squares-without-spikes" ? fit.leastSquaresWithoutSpikes! : null;
  const pct = `${plain(fit.confidence * 100)} %`;
  const handoff = model.handoff.value;
  const fits = [
    ["ls", "Least squares, all readings", fit.leastSquares],
    ["ls-clean", "Least squares without flagged", fit.leastSquaresWithoutSpikes],
    ["ts", "Theil–Sen", fit.theilSen],
    ["huber", `Huber M-fit (c = ${fit.huber.tuning})`, fit.huber],
  ] as const;
  return (
    <div class="calc-results" id={`${id}-results`} aria-live="polite">
      <Verdict tone={handoff ? "info" : "bad"} reason={handoff ? `radius ${len(fit.radius)}, offset ${acc(fit.bias)}` : "no usable radius"}>
        {handoff
          ? `From ${METHOD_NAMES[fit.method]}, ${rows.length - fit.spikes.flagged.length} of ${rows.length} readings; ${fit.spikes.flagged.length} flagged as spikes (residual beyond k = ${plain(fit.spikes.threshold)} robust σ, σ = 1.4826 × MAD).`
          : "The fitted radius is 0 or less: check which column is speed and which is reading, and their units."}
      </Verdict>
      <Outputs
        items={[
          ["Radius r̂ for the firmware", "radius", len(fit.radius)],
          ["Radius: standard error", "radius-se", used ? `± ${inSystem(used.slopeStdError, "length", system)}` : "—"],
          [`Radius: ${pct} interval`, "radius-ci", interval(used ? used.slopeInterval : fit.theilSen.slopeInterval, len)],
          ["Offset b̂ for the firmware", "bias", acc(fit.bias)],
          ["Offset: standard error", "bias-se", used ? `± ${acc(used.interceptStdError)}` : "—"],
          [`Offset: ${pct} interval`, "bias-ci", interval(used?.interceptInterval, acc)],
          ["R² of the fit used", "r2", used?.rSquared == null ? "—" : formatNumber(used.rSquared, 5)],
          ["Readings flagged as spikes", "flagged-count", String(fit.spikes.flagged.length)],
        ]}
      />
      {handoff ? (
        <a class="button handoff" href={handoff} data-out="handoff">
          Use this calibration in the drift budget
        </a>
      ) : null}
      <DataTable
        id={`${id}-fits`}
        caption={`Every fit, with ${pct} intervals where the method gives one`}
        head={["Fit", "Radius", "Interval", "Offset", "Interval"]}
      >
        {fits.map(([key, name, line]) =>
          line ? (
            <tr key={key} data-out={`fit-${key}`}>
              <th scope="row">{name}</th>
              <td>{len(line.slope)}</td>
              <td>{interval("slopeInterval" in line ? line.slopeInterval : null, len)}</td>
              <td>{acc(line.intercept)}</td>
              <td>{interval("interceptInterval" in line ? line.interceptInterval : null, acc)}</td>
            </tr>
          ) : null,
        )}
      </DataTable>
      {fit.spikes.flagged.length ? (
        <>
          <h3>Readings flagged as spikes</h3>
          <ul class="calc-list" data-out="flagged">
            {fit.spikes.flagged.map((i) => (
              <li key={i}>
                Line {lines[i]}: {inSystem(rows[i]!.angularSpeed, "angularSpeed", system, 4)}, {acc(rows[i]!.acceleration)}; residual{" "}
                {acc(fit.theilSen.residuals[i]!)}, {formatNumber(fit.spikes.robustDistance[i]!)} robust σ from the median.
              </li>
            ))}
          </ul>
        </>
      ) : null}
      {skippedList}
      <p class="calc-note" data-out="read-notes">
        Read as: {parsed.notes.join("; ")}.
      </p>
    </div>
  );
}
