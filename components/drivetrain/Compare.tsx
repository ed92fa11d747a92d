/**
 * Design comparison: up to three variants of the design, each a copy with a few inputs changed,
 * on one speed-against-time chart and in one table.
 */
import { useSignal } from "../calc-ui/reactive.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Chart } from "../calc-ui/Chart.tsx";
import { formatNumber, radPerSecondToRpm } from "../../calc/core/units.ts";
import type { DriveType } from "../../calc/drivetrain/inputs.ts";
import { amps, fmt, rpm } from "./format.ts";
import { applies, NAMES, SPECS, VARIANT_KEYS, type Name, type SpinUpModel, type Variant } from "./model.ts";

const CURVES = ["plot-curve", "plot-curve-2 plot-dashed", "plot-curve-3 dt-dash-long", "dt-curve-4"];
const letter = (i: number) => (i === 0 ? "A" : VARIANT_KEYS[i - 1]!.toUpperCase());

function VariantEditor({ model, variant, index, idPrefix, type }: { model: SpinUpModel; variant: Variant; index: number; idPrefix: string; type: DriveType }) {
  const name = letter(index + 1);
  const id = `${idPrefix}-${VARIANT_KEYS[index]}`;
  const changed = variant.changed.value.filter((n) => applies(n, type));
  const free = NAMES.filter((n) => applies(n, type) && !changed.includes(n));
  const pick = useSignal<Name>("gearRatio");
  const chosen = free.includes(pick.value) ? pick.value : free[0];
  const error = model.variantInputs.value[index]?.error ?? null;
  return (
    <fieldset class="dt-variant">
      <legend>Variant {name}</legend>
      {changed.length === 0 ? <p class="field-help">A copy of the design: change an input below.</p> : null}
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
            Use the design's {SPECS[n].label.toLowerCase()}
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
              Change it in {name}
            </button>
          </>
        ) : null}
        <button type="button" class="button button--quiet" onClick={() => model.removeVariant(index)}>
          Remove variant {name}
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
  const rows = cmp
    ? [
        { result: cmp.base, changes: "—", error: null },
        ...cmp.variants.map((v, i) => ({ result: v.result, error: v.error, changes: describe(variants[i]!, type) })),
      ]
    : [];
  const shown = rows.map((row, i) => ({ ...row, i })).filter((row) => row.result);
  const end = Math.max(0, ...shown.map((row) => row.result!.endTime));
  const top = Math.max(0, ...shown.map((row) => Math.max(row.result!.topSpeed, row.result!.targetSpeed)));
  return (
    <section class="dt-section" aria-labelledby={`${idPrefix}-cmp-title`}>
      <h3 id={`${idPrefix}-cmp-title`}>Compare designs</h3>
      {variants.map((variant, i) => (
        <VariantEditor key={i} model={model} variant={variant} index={i} idPrefix={idPrefix} type={type} />
      ))}
      <button type="button" class="button" disabled={variants.length >= VARIANT_KEYS.length} onClick={model.addVariant}>
        Add variant {variants.length < VARIANT_KEYS.length ? letter(variants.length + 1) : "(three at most)"}
      </button>
      {cmp ? (
        <>
          <div class="dt-table-wrap" role="region" aria-label="Designs compared" tabIndex={0}>
            <table class="dt-table" data-out="comparison">
              <caption>Designs compared (A is the design above)</caption>
              <thead>
                <tr>
                  <th scope="col">Design</th>
                  <th scope="col">Differs in</th>
                  <th scope="col">Time to target</th>
                  <th scope="col">Top speed</th>
                  <th scope="col">Peak battery current</th>
                </tr>
              </thead>
              <tbody>
                {rows.map((row, i) => {
                  const key = letter(i).toLowerCase();
                  const r = row.result;
                  return (
                    <tr key={key}>
                      <th scope="row">{letter(i)}</th>
                      <td>{row.changes}</td>
                      {r ? (
                        <>
                          <td data-out={`cmp-${key}-time`}>
                            {r.timeToTarget === null ? `not reached (target ${rpm(r.targetSpeed)})` : fmt(r.timeToTarget, "time", system)}
                            {cmp.fastest === i && rows.length > 1 ? <strong> — fastest</strong> : null}
                          </td>
                          <td data-out={`cmp-${key}-top`}>
                            {rpm(r.topSpeed)}
                            {cmp.highest === i && rows.length > 1 ? <strong> — highest</strong> : null}
                          </td>
                          <td data-out={`cmp-${key}-peak`}>{amps(r.peakBatteryCurrent)}</td>
                        </>
                      ) : (
                        <td colSpan={3}>{row.error ? row.error.message : "Waiting for a valid value."}</td>
                      )}
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
          {end > 0 ? (
            <Chart
              title="Speed against time, all designs"
              summary={shown.map((row) => `${letter(row.i)} reaches ${formatNumber(radPerSecondToRpm(row.result!.topSpeed), 4)} rpm`).join("; ")}
              xLabel="Time (s)"
              yLabel="Speed (1000 rpm)"
              xDomain={[0, end]}
              yDomain={[0, (radPerSecondToRpm(top) * 1.08) / 1000]}
              series={shown.map((row) => ({
                label: `Design ${letter(row.i)}`,
                points: row.result!.series.map((p) => [p.time, radPerSecondToRpm(p.speed) / 1000] as const),
                className: CURVES[row.i]!,
              }))}
              hLines={[{ value: radPerSecondToRpm(cmp.base.targetSpeed) / 1000, label: "Target speed of A", className: "plot-limit plot-dashed" }]}
            />
          ) : null}
        </>
      ) : null}
    </section>
  );
}

/** "Reduction 3, Cells in series 6": what a variant changes, as typed. */
function describe(variant: Variant, type: DriveType): string {
  const changed = variant.changed.value.filter((n) => applies(n, type));
  return changed.length === 0 ? "nothing yet" : changed.map((n) => `${SPECS[n].label} ${variant.fields.texts[n].value}`).join(", ");
}
