/**
 * Variants of the design: up to three copies with a few inputs changed, in one table (a column per
 * design, the changed inputs as rows above the results) and on one speed-against-time chart.
 */
import { useSignal } from "../calc-ui/reactive.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Chart } from "../calc-ui/Chart.tsx";
import { formatNumber, radPerSecondToRpm } from "../../calc/core/units.ts";
import type { DriveType } from "../../calc/drivetrain/inputs.ts";
import type { SpinUpResult } from "../../calc/drivetrain/results.ts";
import type { ComponentChildren } from "preact";
import { amps, fmt, inSentence, rpm } from "./format.ts";
import { applies, NAMES, SPECS, VARIANT_KEYS, type Name, type SpinUpModel, type Variant } from "./model.ts";

export { createVariants } from "./variants.ts";

const CURVES = ["plot-curve", "plot-curve-2 plot-dashed", "plot-curve-3 dt-dash-long", "dt-curve-4"];
/** What each column is called: the design on the page, then its variants by number. */
const nameOf = (i: number) => (i === 0 ? "This design" : `Variant ${i}`);
/** The `data-out` key of a column: "a" for the design, then the variant's link scope. */
const keyOf = (i: number) => (i === 0 ? "a" : VARIANT_KEYS[i - 1]!);

function VariantEditor({ model, variant, index, idPrefix, type }: { model: SpinUpModel; variant: Variant; index: number; idPrefix: string; type: DriveType }) {
  const name = nameOf(index + 1);
  const id = `${idPrefix}-${VARIANT_KEYS[index]}`;
  const changed = variant.changed.value.filter((n) => applies(n, type));
  const free = NAMES.filter((n) => applies(n, type) && !changed.includes(n));
  const pick = useSignal<Name>("gearRatio");
  const chosen = free.includes(pick.value) ? pick.value : free[0];
  const error = model.variantInputs.value[index]?.error ?? null;
  return (
    <fieldset class="dt-variant">
      <legend>{name}</legend>
      {changed.length === 0 ? <p class="field-help">A copy of this design: change an input below.</p> : null}
      {changed.map((n) => (
        <div class="dt-change" key={n}>
          <QuantityField
            idPrefix={id}
            name={n}
            spec={SPECS[n]}
            text={variant.fields.texts[n]}
            reading={variant.fields.readings[n]}
            system={model.fields.system.value}
            extraError={error && error.field === n ? error.message : null}
          />
          <button type="button" class="button button--quiet" onClick={() => model.unchangeInVariant(index, n)}>
            Use this design's {inSentence(SPECS[n].label)}
          </button>
        </div>
      ))}
      {error && !changed.includes(error.field as Name) ? (
        <p class="field-error" role="alert">
          {error.message}
        </p>
      ) : null}
      <div class="dt-row">
        {chosen ? (
          <>
            <div class="field">
              <label for={`${id}-pick`}>Input to change</label>
              <select id={`${id}-pick`} value={chosen} onChange={(event) => (pick.value = (event.currentTarget as HTMLSelectElement).value as Name)}>
                {free.map((n) => (
                  <option key={n} value={n}>
                    {SPECS[n].label}
                  </option>
                ))}
              </select>
            </div>
            <button type="button" class="button" onClick={() => model.changeInVariant(index, chosen)}>
              Change it in {name.toLowerCase()}
            </button>
          </>
        ) : null}
        <button type="button" class="button button--quiet" onClick={() => model.removeVariant(index)}>
          Remove {name.toLowerCase()}
        </button>
      </div>
    </fieldset>
  );
}

export function Compare({ model, idPrefix }: { model: SpinUpModel; idPrefix: string }) {
  const variants = model.variants.value;
  const type = model.driveType.value;
  const system = model.fields.system.value;
  const cmp = model.comparison.value;
  const columns = cmp ? [{ result: cmp.base, error: null }, ...cmp.variants] : [];
  const shown = columns.map((column, i) => ({ ...column, i })).filter((column) => column.result);
  const end = Math.max(0, ...shown.map((column) => column.result!.endTime));
  const top = Math.max(0, ...shown.map((column) => Math.max(column.result!.topSpeed, column.result!.targetSpeed)));
  // The inputs some variant changes, each once, in the form's order: the rows above the results.
  const inputs = NAMES.filter((n) => applies(n, type) && variants.some((v) => v.changed.value.includes(n)));
  /** A result row: its label, its `data-out` suffix, and the cell of each column that has a result. */
  const results: [string, string, (r: SpinUpResult, i: number) => ComponentChildren][] = [
    [
      "Time to target",
      "time",
      (r, i) => (
        <>
          {r.timeToTarget === null ? `not reached (target ${rpm(r.targetSpeed)})` : fmt(r.timeToTarget, "time", system)}
          {cmp!.fastest === i ? <strong> — fastest</strong> : null}
        </>
      ),
    ],
    [
      "Top speed",
      "top",
      (r, i) => (
        <>
          {rpm(r.topSpeed)}
          {cmp!.highest === i ? <strong> — highest</strong> : null}
        </>
      ),
    ],
    ["Peak battery current", "peak", (r) => amps(r.peakBatteryCurrent)],
  ];
  return (
    <section class="dt-section" aria-labelledby={`${idPrefix}-cmp-title`}>
      <h3 id={`${idPrefix}-cmp-title`}>Variants of this design</h3>
      <p class="field-help">Each variant is this design with a few inputs changed; it follows every other edit of the design.</p>
      {variants.map((variant, i) => (
        <VariantEditor key={i} model={model} variant={variant} index={i} idPrefix={idPrefix} type={type} />
      ))}
      <button type="button" class="button" disabled={variants.length >= VARIANT_KEYS.length} onClick={model.addVariant}>
        {variants.length < VARIANT_KEYS.length ? `Add variant ${variants.length + 1}` : "Add a variant (three at most)"}
      </button>
      {cmp ? (
        <>
          <div class="dt-table-wrap" role="region" aria-label="This design and its variants" tabIndex={0}>
            <table class="dt-table" data-out="comparison">
              <caption>This design and its variants: the inputs they change, then the results</caption>
              <thead>
                <tr>
                  <td />
                  {columns.map((_, i) => (
                    <th scope="col" key={i}>
                      {nameOf(i)}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {inputs.map((n) => (
                  <tr key={n}>
                    <th scope="row">{SPECS[n].label}</th>
                    <td>{model.fields.texts[n].value}</td>
                    {variants.map((v, i) => (
                      <td key={i}>{v.changed.value.includes(n) ? v.fields.texts[n].value : "same"}</td>
                    ))}
                  </tr>
                ))}
                {results.map(([label, key, cell]) => (
                  <tr key={key} class={key === "time" ? "dt-first-result" : undefined}>
                    <th scope="row">{label}</th>
                    {columns.map((column, i) => (
                      <td key={i} data-out={`cmp-${keyOf(i)}-${key}`}>
                        {column.result ? cell(column.result, i) : key === "time" ? (column.error?.message ?? "Waiting for a valid value.") : "—"}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {end > 0 ? (
            <Chart
              title="Speed against time, this design and its variants"
              summary={shown.map((column) => `${nameOf(column.i)} reaches ${formatNumber(radPerSecondToRpm(column.result!.topSpeed), 4)} rpm`).join("; ")}
              xLabel="Time (s)"
              yLabel="Speed (× 1000 rpm)"
              xDomain={[0, end]}
              yDomain={[0, (radPerSecondToRpm(top) * 1.08) / 1000]}
              series={shown.map((column) => ({
                label: nameOf(column.i),
                points: column.result!.series.map((p) => [p.time, radPerSecondToRpm(p.speed) / 1000] as const),
                className: CURVES[column.i]!,
              }))}
              hLines={[{ value: radPerSecondToRpm(cmp.base.targetSpeed) / 1000, label: "Target speed of this design", className: "plot-limit plot-dashed" }]}
            />
          ) : null}
        </>
      ) : null}
    </section>
  );
}
