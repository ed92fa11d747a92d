/**
 * The rim calculator: tip speed, peak stress and where it sits in a spinning ring or disk, the
 * safety factors against its material, the speeds at which it yields and bursts, and a plot of
 * radial and hoop stress across the radius.
 */
import { useEffect, useMemo } from "preact/hooks";
import { form as rimCalculator, rimChoices, run as rimRun } from "../../calc/calculators/rims.ts";
import { DEFAULT_RIM_MATERIAL, rimStressProfile, type rimCheckInputs, type RimCheck, type RimMaterialValues } from "../../calc/loads/rims.ts";
import { defaultText } from "../../calc/core/inputs.ts";
import type { ChoiceSpec } from "../../calc/core/choices.ts";
import { formatNumber, type UnitSystem } from "../../calc/core/units.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { Chart } from "../calc-ui/Chart.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { batch, computed, signal } from "../calc-ui/reactive.ts";
import { createCalculatorModel } from "../calc-ui/model.ts";
import { quoteForNotice } from "../../calc/core/permalink.ts";
import { ChoiceField } from "../loads/ChoiceField.tsx";
import { Outputs, q, VERDICT_TONE, verdictRule } from "../loads/format.tsx";
import { axis, rpm } from "../loads/chart-format.ts";
import { Verdict } from "../calc-ui/Verdict.tsx";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "rims";

/** The value of the material menu when the fields hold values of the user's own. */
const CUSTOM_MATERIAL = "custom";

/** A material the calculator offers: its value and label, and the values it fills in (calc/loads `rimMaterialChoices`). */
export interface MaterialChoice extends RimMaterialValues {
  value: string;
  label: string;
  /** The full name and condition, shown under the menu once picked. */
  detail?: string;
  /** Whether the strengths it fills in are specified minimums or typical values. */
  strengthBasis?: string;
}

/** The four fields a material fills. */
const MATERIAL_FIELDS = ["density", "yieldStrength", "ultimateStrength", "poisson"] as const;

/** Field values written as text keep 6 significant figures; a reading this close still matches. */
const MATCH_RTOL = 1e-5;

/**
 * The rim model: the calculator's fields and shape, and a material picked from the materials table
 * (which fills the density, strength and Poisson fields) or typed in as custom values; the link
 * keeps the material under "mat".
 */
export function createRimModel(materials: readonly MaterialChoice[]) {
  const materialSpec: ChoiceSpec = {
    label: "Material",
    urlKey: "mat",
    options: [...materials.map(({ value, label }) => ({ value, label })), { value: CUSTOM_MATERIAL, label: "Custom values" }],
    default: materials.some((m) => m.value === DEFAULT_RIM_MATERIAL) ? DEFAULT_RIM_MATERIAL : CUSTOM_MATERIAL,
    help: "Fills density, strengths and Poisson's ratio from the materials table; editing any of them makes it custom.",
  };
  const picked = signal(materialSpec.default);
  const rowOf = (id: string) => materials.find((m) => m.value === id);
  // The model is made first; the page state below reads and writes the material through it.
  const page = {
    apply(params: URLSearchParams): string[] {
      const value = params.get("mat");
      if (value === null) return [];
      if (materialSpec.options.some((o) => o.value === value)) {
        pickMaterial(value);
        return [];
      }
      return [`The link's material ${quoteForNotice(value)} is not one this calculator offers; it was ignored.`];
    },
    write: (): Record<string, string> => ({ mat: material.value }),
  };
  const model = createCalculatorModel(rimCalculator, rimRun, "metric", page);
  const { fields } = model;
  /** The material as the fields show it: the picked row while all four fields still hold its values, else custom. */
  const material = computed((): string => {
    const row = rowOf(picked.value);
    if (!row) return CUSTOM_MATERIAL;
    const matches = MATERIAL_FIELDS.every((name): boolean => {
      const reading = fields.readings[name].value;
      return reading.ok && Math.abs(reading.value - row[name]) <= MATCH_RTOL * Math.abs(row[name]);
    });
    return matches ? picked.value : CUSTOM_MATERIAL;
  });
  /** Picks a material; a row of the table fills the four material fields in the current units. */
  function pickMaterial(id: string): void {
    batch(() => {
      picked.value = id;
      const row = rowOf(id);
      if (!row) return;
      for (const name of MATERIAL_FIELDS) fields.texts[name].value = defaultText({ ...rimCalculator.inputs[name], default: row[name] }, fields.system.value);
      model.choices.strengthBasis.value = row.strengthBasis ?? "typical";
    });
  }
  /** Radial and hoop stress across the radius [Pa] at radii [m]; one point for a thin ring. */
  const profile = computed(() => {
    const current = model.values.value;
    return current && model.outcome.value.result ? rimStressProfile(current) : null;
  });
  return { ...model, specs: { ...rimChoices, material: materialSpec }, material, pickMaterial, input: model.values, profile };
}

type RimModel = ReturnType<typeof createRimModel>;

export interface RimCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
  /** The materials offered, with their values (calc/loads/index.ts `rimMaterialChoices()`, built at build time). */
  materials?: readonly MaterialChoice[];
}

type FieldName = keyof typeof rimCheckInputs;
type ChoiceName = "shape" | "material" | "strengthBasis";

const GROUPS: { legend: string; items: (FieldName | ChoiceName)[] }[] = [
  { legend: "Shape and speed", items: ["shape", "outerRadius", "innerRadius", "angularSpeed"] },
  { legend: "Material", items: ["material", "density", "yieldStrength", "ultimateStrength", "strengthBasis", "poisson"] },
  { legend: "Verdict", items: ["failBelow", "marginalBelow"] },
];

/** Where a stress sits, in words. */
function where(r: RimCheck, radius: number, system: UnitSystem): string {
  if (radius === 0) return "at the centre";
  const at = `r = ${q(radius, "length", system)}`;
  if (r.shape === "thin-ring") return `through the ring, ${at}`;
  return radius === r.peakStressRadius && r.shape === "annular-disk" ? `at the bore, ${at}` : at;
}

/** The verdict, the safety factor and the tip speed, in view while editing. */
function RimBar({ model, id }: { model: RimModel; id: string }) {
  const { result, error } = model.outcome.value;
  const resultsId = `${id}-results`;
  if (!result)
    return (
      <ResultBar tone={null} figures={[]} resultsId={resultsId} missing={error?.field === null ? error.message : "No result yet: correct the marked field."} />
    );
  const system = model.fields.system.value;
  return (
    <ResultBar
      tone={VERDICT_TONE[result.verdict]}
      resultsId={resultsId}
      figures={[
        { name: "sf", label: "Safety factor", value: formatNumber(result.safetyFactor) },
        { name: "tip-speed", label: "Tip speed", value: q(result.tipSpeed, "speed", system) },
      ]}
    />
  );
}

function Results({ model, id }: { model: RimModel; id: string }) {
  const system = model.fields.system.value;
  const { result, error } = model.outcome.value;
  const values = model.fields.values.value;
  if (!result || !values) {
    return (
      <div class="calc-results calc-results--empty" id={`${id}-results`} aria-live="polite">
        <p>{error && error.field === null ? error.message : "Results appear when every field above holds a valid value."}</p>
      </div>
    );
  }
  const peak = `${q(result.peakStress, "stress", system)} ${where(result, result.peakStressRadius, system)}`;
  return (
    <div class="calc-results" id={`${id}-results`} aria-live="polite">
      <Verdict tone={VERDICT_TONE[result.verdict]} out="verdict">
        Safety factor {formatNumber(result.safetyFactor)} against yield ({q(values.yieldStrength, "stress", system)}) at the peak hoop stress, {peak}. Rule:{" "}
        {verdictRule(values.failBelow, values.marginalBelow)}.
      </Verdict>
      <Outputs
        rows={[
          ["Tip speed", "tip-speed", q(result.tipSpeed, "speed", system)],
          ["Peak hoop stress", "peak-stress", q(result.peakStress, "stress", system)],
          ["Where the hoop stress peaks", "peak-at", where(result, result.peakStressRadius, system)],
          ["Peak radial stress", "radial-stress", q(result.peakRadialStress, "stress", system)],
          [
            "Where the radial stress peaks",
            "radial-at",
            result.shape === "thin-ring" ? "none in a thin ring" : where(result, result.peakRadialStressRadius, system),
          ],
          ["Shape factor σ / (ρv²)", "shape-factor", formatNumber(result.shapeFactor)],
          ["Safety factor against yield", "sf-yield", formatNumber(result.safetyFactorYield)],
          ["Safety factor against ultimate", "sf-ult", formatNumber(result.safetyFactorUltimate)],
          ["Speed at which it yields", "speed-yield", rpm(result.speedAtYield)],
          ["Burst speed estimate (at ultimate)", "speed-ult", rpm(result.speedAtUltimate)],
          ["Tip speed at that burst estimate", "tip-burst", q(result.tipSpeedAtUltimate, "speed", system)],
        ]}
      />
    </div>
  );
}

function ProfileChart({ model }: { model: RimModel }) {
  const profile = model.profile.value;
  const result = model.outcome.value.result;
  const values = model.fields.values.value;
  if (!profile || !result || !values) return null;
  const system = model.fields.system.value;
  const stress = axis("stress", system);
  const length = axis("length", system);
  const ring = result.shape === "thin-ring";
  const peak = Math.max(result.peakStress, result.peakRadialStress);
  const near = (limit: number) => (limit < peak * 1.5 ? limit : 0);
  const yMax = Math.max(peak, near(values.ultimateStrength), near(values.yieldStrength)) * 1.1;
  const limits = [
    { value: values.yieldStrength, label: "Yield strength", className: "plot-limit plot-dashed" },
    { value: values.ultimateStrength, label: "Ultimate strength", className: "plot-limit" },
  ].filter((line) => line.value <= yMax);
  const points = (pick: "hoop" | "radial") => profile.map((p) => [length.of(p.radius), stress.of(p[pick])] as const);
  const series = ring
    ? [{ label: "Hoop stress of the ring (one value, at its outer radius)", points: [...points("hoop"), ...points("hoop")], className: "plot-dot" }]
    : [
        { label: "Hoop stress", points: points("hoop"), className: "plot-curve" },
        { label: "Radial stress", points: points("radial"), className: "plot-curve-2" },
      ];
  const note =
    limits.length < 2
      ? `The ${limits.length === 0 ? "yield and ultimate strengths lie" : "ultimate strength lies"} above this plot (safety factor ${formatNumber(result.safetyFactorYield)} against yield).`
      : "";
  return (
    <>
      <Chart
        title="Stress across the radius"
        summary={`Peak hoop stress ${q(result.peakStress, "stress", system)} ${where(result, result.peakStressRadius, system)}; peak radial stress ${q(result.peakRadialStress, "stress", system)}. ${note}`}
        xLabel={`Radius (${length.symbol})`}
        yLabel={`Stress (${stress.symbol})`}
        xDomain={[0, length.of(values.outerRadius) * (ring ? 1.1 : 1)]}
        yDomain={[0, stress.of(yMax)]}
        series={series}
        hLines={limits.map((line) => ({ ...line, value: stress.of(line.value) }))}
      />
      {note ? <p class="loads-chart-note">{note}</p> : null}
    </>
  );
}

export default function RimCalculator({ id = rimCalculator.anchor, materials = [] }: RimCalculatorProps) {
  const model = useMemo(() => createRimModel(materials), [materials]);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields, choices } = model;
  const system = fields.system.value;
  const error = model.outcome.value.error;
  const errorFor = (name: string) => (error && error.field === name ? error.message : null);
  return (
    <section class="calc" id={id} aria-label="Rim and disk stress calculator">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        {GROUPS.map((group) => (
          <fieldset key={group.legend}>
            <legend>{group.legend}</legend>
            {group.items.map((name) =>
              name === "shape" || name === "strengthBasis" ? (
                <ChoiceField
                  key={name}
                  idPrefix={id}
                  name={name}
                  spec={model.specs[name]}
                  value={choices[name]}
                  as={name === "shape" ? "radio" : undefined}
                  error={errorFor(name)}
                />
              ) : name === "material" ? (
                <ChoiceField
                  key={name}
                  idPrefix={id}
                  name={name}
                  spec={model.specs.material}
                  value={model.material}
                  onPick={model.pickMaterial}
                  note={materials.find((m) => m.value === model.material.value)?.detail}
                  error={errorFor(name)}
                />
              ) : (
                <QuantityField
                  key={name}
                  idPrefix={id}
                  name={name}
                  spec={fields.specs[name]}
                  text={fields.texts[name]}
                  reading={fields.readings[name]}
                  system={system}
                  extraError={errorFor(name)}
                />
              ),
            )}
          </fieldset>
        ))}
      </form>
      <HydrateLater>
        <RimBar model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <Results model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <ProfileChart model={model} />
      </HydrateLater>
    </section>
  );
}
