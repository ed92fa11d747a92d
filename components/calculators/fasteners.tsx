/**
 * The fastener calculator: a bolted joint holding a spinning part (or carrying a known load). The
 * clamp from the preload, whether it slips, the slipped bolt's shear and bending over the stack, the
 * bolt in tension, the thread tapped into the part; each mode's safety factor, the one that governs
 * and the verdict, with the basis of every strength it uses.
 */
import { useEffect, useMemo } from "preact/hooks";
import {
  form as fastenerCalculator,
  fastenerChoices as FASTENER_CHOICES,
  JOINT_MODE_WORDS,
  RETIRED_LINK_KEYS,
  strengthBasisWords,
} from "../../calc/loads/joint-form.ts";
import type { BoltedJointCheck, BoltedJointInput, boltedJointInputs, JointModeName } from "../../calc/loads/joint-inputs.ts";
import { type AnyValues, initialValues } from "../../calc/core/calculator.ts";
import type { ComponentChildren } from "preact";
import type { ChoiceSpec } from "../../calc/core/choices.ts";
import { formatNumber } from "../../calc/core/units.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { linkFor, syncWithUrl } from "../calc-ui/url-sync.ts";
import { createCalculatorModel, type PageState } from "../calc-ui/model.ts";
import { computed, signal } from "../calc-ui/reactive.ts";
import { ChoiceField } from "../loads/ChoiceField.tsx";
import { area, Outputs, q, VERDICT_TONE, verdictRule } from "../loads/format.tsx";
import { Verdict } from "../calc-ui/Verdict.tsx";
import { whenIdle } from "../calc-ui/idle.ts";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "fasteners";

/** The grade a size of the other system starts with when the size changes system (the nearest strength). */
const MATCHING_GRADE: Record<string, string> = {
  "4.6": "sae-2",
  "8.8": "sae-5",
  "10.9": "sae-8",
  "12.9": "a574",
  "sae-2": "4.6",
  "sae-5": "8.8",
  "sae-8": "10.9",
  a574: "12.9",
};

const isMetricSize = (size: string) => size.startsWith("M");
const isMetricGrade = (grade: string) => /^\d/.test(grade);

/** The earlier average-shear check's link keys: accepted, and the reader told they no longer count. */
const retiredKeys: PageState = {
  apply(params) {
    return RETIRED_LINK_KEYS.some((key) => params.has(key))
      ? [
          "This link was made for the earlier average-shear check. Its shear ratio and shear plane are no longer read: the joint check takes shear through the thread, with one rule for the shear strengths (0.6 × the minimum tensile strength, and the minimum yield ÷ √3).",
        ]
      : [];
  },
  write: () => ({}),
};

// The joint check's code (calc/loads/joint.ts, with the thread, grade and material tables) loads on
// the first input that leaves the defaults; the defaults' result comes with the page, computed at
// build time. Once loaded it stays for every calculator on the page.
type JointCheck = (input: BoltedJointInput) => BoltedJointCheck;
const loadedCheck = signal<JointCheck | null>(null);
const loadFailed = signal(false);
let loading: Promise<void> | null = null;

/** Loads the joint check (once); resolves when it can run. */
export function loadJointCheck(): Promise<void> {
  loading ??= import("../../calc/loads/joint.ts").then(
    (module) => {
      loadedCheck.value = module.boltedJointCheck;
      loadFailed.value = false;
    },
    () => {
      loading = null;
      loadFailed.value = true;
    },
  );
  return loading;
}

/** Whether two sets of values are the same (numbers and choices). */
function sameValues(a: AnyValues, b: AnyValues): boolean {
  return Object.keys(b).every((key) => Object.is(a[key], b[key]));
}

/** Thrown while the check's code is on its way: the widget shows that it is coming, not an error. */
class CheckLoading extends Error {}

/**
 * The calculator's model. `initial` is the check's result for the calculator's defaults (computed at
 * build time): it answers until an input changes, and then the check's code is loaded.
 */
export function createFastenerModel(initial?: BoltedJointCheck | null) {
  const defaults = initialValues(fastenerCalculator) as AnyValues;
  const run = (values: BoltedJointInput): BoltedJointCheck => {
    const check = loadedCheck.value;
    if (check) return check(values);
    if (initial && sameValues(values, defaults)) return initial;
    if (typeof window !== "undefined") void loadJointCheck();
    throw new CheckLoading();
  };
  const model = createCalculatorModel(fastenerCalculator, run, "metric", retiredKeys);
  // Fetched once the page is idle, so the first edit computes at once instead of loading the code
  // and drawing twice in the same moment (a 55-90 ms task at 4x CPU slowdown, measured).
  whenIdle(() => void loadJointCheck());
  /** True while the values wait for the check's code (the outcome's error is then not the user's). */
  const waiting = computed(() => model.values.value !== null && loadedCheck.value === null && !(initial && sameValues(model.values.value, defaults)));
  /** Picks a size; a grade of the other system becomes the nearest grade of the size's system. */
  function pickSize(size: string): void {
    model.choices.size.value = size;
    const grade = model.choices.grade.value;
    if (isMetricSize(size) !== isMetricGrade(grade)) model.choices.grade.value = MATCHING_GRADE[grade] ?? grade;
  }
  return { ...model, input: model.values, pickSize, waiting, loadFailed };
}

type FastenerModel = ReturnType<typeof createFastenerModel>;

export interface FastenerCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
  /** The check's result for the defaults, computed at build time (the chapter passes it). */
  initial?: BoltedJointCheck | null;
}

/** What stands in for the results while the check's code loads, or when it could not. */
function waitingText(model: FastenerModel): string | null {
  if (!model.waiting.value) return null;
  return model.loadFailed.value ? "The joint check could not be loaded: reload the page to try again." : "Working out the joint…";
}

type FieldName = keyof typeof boltedJointInputs;
type ChoiceName = keyof typeof FASTENER_CHOICES;
type Item = FieldName | ChoiceName;

const GROUPS: { legend: string; items: Item[] }[] = [
  { legend: "The load", items: ["loadFrom", "partMass", "radius", "angularSpeed", "load", "count"] },
  { legend: "The bolt", items: ["size", "grade", "jointMode"] },
  { legend: "The clamp", items: ["preloadFrom", "preloadShare", "tighteningTorque", "nutFactor", "frictionCoefficient", "stackHeight"] },
  { legend: "The thread", items: ["threadIn", "engagedLength"] },
];

/** Inputs most joints leave at their defaults, folded away. */
const MORE: Item[] = ["interfaces", "endCondition", "gripLength", "shankLength", "memberMaterial", "failBelow", "marginalBelow"];

/** Choices read only in one mode. */
const CHOICE_APPLIES: Partial<Record<ChoiceName, (model: FastenerModel) => boolean>> = {
  endCondition: (m) => m.choices.jointMode.value === "shear",
};

const RADIOS = new Set<Item>(["loadFrom", "jointMode", "preloadFrom"]);

function Field({ model, id, name, error }: { model: FastenerModel; id: string; name: Item; error: (name: string) => string | null }) {
  const { fields, choices } = model;
  if (name in FASTENER_CHOICES) {
    const choice = name as ChoiceName;
    if (CHOICE_APPLIES[choice] && !CHOICE_APPLIES[choice]!(model)) return null;
    const full: ChoiceSpec = FASTENER_CHOICES[choice];
    // Only the grades of the size's system are offered.
    const spec = choice === "grade" ? { ...full, options: full.options.filter((o) => isMetricGrade(o.value) === isMetricSize(choices.size.value)) } : full;
    return (
      <ChoiceField
        idPrefix={id}
        name={choice}
        spec={spec}
        value={choices[choice]}
        as={RADIOS.has(choice) ? "radio" : "select"}
        onPick={choice === "size" ? model.pickSize : undefined}
        error={error(choice)}
      />
    );
  }
  const field = name as FieldName;
  const current = Object.fromEntries(Object.entries(choices).map(([k, s]) => [k, s.value]));
  if (fastenerCalculator.applies && !fastenerCalculator.applies(field, current)) return null;
  return (
    <QuantityField
      idPrefix={id}
      name={field}
      spec={fields.specs[field]}
      text={fields.texts[field]}
      reading={fields.readings[field]}
      system={fields.system.value}
      extraError={error(field)}
    />
  );
}

/** The verdict, the governing mode and its safety factor, in view while editing. */
function FastenerBar({ model, id }: { model: FastenerModel; id: string }) {
  const { result, error } = model.outcome.value;
  const resultsId = `${id}-results`;
  const waiting = waitingText(model);
  if (!result)
    return (
      <ResultBar
        tone={null}
        figures={[]}
        resultsId={resultsId}
        missing={waiting ?? (error?.field === null ? error.message : "No result yet: correct the marked field.")}
      />
    );
  return (
    <ResultBar
      tone={VERDICT_TONE[result.verdict]}
      resultsId={resultsId}
      figures={[
        { name: "sf", label: "Safety factor", value: formatNumber(result.safetyFactor) },
        { name: "governs", label: "Governs", value: result.governs },
      ]}
    />
  );
}

/** The menu name of the tapped part's material. */
const partName = (threadIn: string) => FASTENER_CHOICES.threadIn.options.find((o) => o.value === threadIn)?.label ?? threadIn;

/** Each mode's safety factor, the governing one marked. */
function ModeTable({ r }: { r: BoltedJointCheck }) {
  const modes = (Object.keys(JOINT_MODE_WORDS) as JointModeName[]).filter((m) => r.safetyFactors[m] !== null);
  return (
    <table class="joint-modes">
      <caption>Safety factor of each way the joint can give</caption>
      <thead>
        <tr>
          <th scope="col">Mode</th>
          <th scope="col">Safety factor</th>
        </tr>
      </thead>
      <tbody>
        {modes.map((m) => (
          <tr key={m} class={m === r.governs ? "joint-governs" : undefined}>
            <th scope="row">
              {JOINT_MODE_WORDS[m]}
              {m === r.governs ? <strong class="joint-governs-mark"> governs</strong> : null}
            </th>
            <td data-out={`sf-${m}`}>{formatNumber(r.safetyFactors[m]!)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function Results({ model, id }: { model: FastenerModel; id: string }) {
  const system = model.fields.system.value;
  const { result: r, error } = model.outcome.value;
  const values = model.fields.values.value;
  if (!r || !values) {
    const waiting = waitingText(model);
    return (
      <div class="calc-results calc-results--empty" id={`${id}-results`} aria-live="polite">
        <p>{waiting ?? (error && error.field === null ? error.message : "Results appear when every field above holds a valid value.")}</p>
      </div>
    );
  }
  const s = r.strengths;
  const basis = strengthBasisWords(r);
  const rows: [string, string, string][] = [];
  if (r.part) {
    rows.push(["Acceleration at the part", "part-g", q(r.part.acceleration, "acceleration", system)]);
    rows.push(["Radial pull of the part", "part-force", q(r.part.force, "force", system)]);
  } else rows.push(["Load on the joint", "part-force", q(r.totalLoad, "force", system)]);
  rows.push(["Load on each bolt", "bolt-force", q(r.loadPerBolt, "force", system)]);
  rows.push(["Proof load of the bolt, Aₛ·Sₚ", "proof", q(r.preload.proofLoad, "force", system)]);
  rows.push(["Preload per bolt", "preload", `${q(r.preload.force, "force", system)} (${formatNumber(100 * r.preload.shareOfProof)} % of proof)`]);
  rows.push([
    r.preloadFrom === "torque" ? "From the tightening torque" : "Tightening torque for it",
    "torque",
    `${q(r.preload.torque, "torque", system)} at K = ${Number(values.nutFactor.toPrecision(3))}`,
  ]);
  if (r.slip) {
    rows.push(["Shear the clamp carries, μ·Fᵢ·n·faces", "clamp", q(r.slip.clampCapacity, "force", system)]);
    rows.push(["Once slipped: shear stress on Aₛ", "shear-stress", q(r.slip.shearStress, "stress", system)]);
    rows.push(["Once slipped: bending stress at the root", "bending-stress", q(r.slip.bendingStress, "stress", system)]);
    rows.push(["Once slipped: von Mises stress", "equivalent", q(r.slip.equivalentStress, "stress", system)]);
  }
  if (r.tension) {
    rows.push(["Stiffness factor C", "stiffness", formatNumber(r.stiffness.factor)]);
    rows.push(["Bolt load with the load on", "bolt-load", q(r.tension.boltLoad, "force", system)]);
    rows.push(["Load per bolt that opens the joint", "separation", q(r.tension.separationLoad, "force", system)]);
  }
  if (r.tappedThread) {
    rows.push(["Stripping load of the part's thread", "strip", q(r.tappedThread.strippingLoad, "force", system)]);
    rows.push(["Engagement for the bolt to break first", "engage-full", q(r.tappedThread.engagementForFullStrength, "length", system)]);
  }
  rows.push(["Stress area Aₛ", "area", area(r.thread.stressArea, system)]);
  const yieldName =
    s.id === "4.6" ? (
      <>
        R<sub>eL,min</sub>
      </>
    ) : (
      <>
        R<sub>p0.2,min</sub>
      </>
    );
  const tensileName = (
    <>
      R<sub>m,min</sub>
    </>
  );
  const strengthRows: [ComponentChildren, string, string][] = [
    [<>Yield, {yieldName}</>, "yield", q(s.yieldStrength, "stress", system)],
    [<>Tensile, {tensileName}</>, "tensile", q(s.tensileStrength, "stress", system)],
    ["Proof, Sₚ", "proof-stress", q(s.proofStress, "stress", system)],
    [<>Shear yield, {yieldName}/√3</>, "shear-yield", q(s.shearYield, "stress", system)],
    [<>Shear ultimate, 0.6 {tensileName}</>, "shear-ultimate", q(s.shearUltimate, "stress", system)],
  ];
  return (
    <div class="calc-results" id={`${id}-results`} aria-live="polite">
      <Verdict tone={VERDICT_TONE[r.verdict]} out="verdict">
        {r.reason} Governs: {JOINT_MODE_WORDS[r.governs]}, safety factor {formatNumber(r.safetyFactor)}. Rule:{" "}
        {verdictRule(values.failBelow, values.marginalBelow)}.
      </Verdict>
      <ModeTable r={r} />
      {r.slip?.rootYieldsWithPreload ? (
        <p class="joint-note" data-out="root-yields">
          With the preload still in it, the bolt's root would see {q(r.slip.rootFibreWithPreload, "stress", system)} at the outer fibre once the stack slips,
          above its yield: it would stretch and lose clamp. Keep the clamp from slipping, or shorten the stack.
        </p>
      ) : null}
      {r.gradeScopeNote ? (
        <p class="joint-note" data-out="scope">
          {r.gradeScopeNote}
        </p>
      ) : null}
      <Outputs rows={rows} />
      <p class="joint-basis" data-out="basis">
        Bolt strengths: {basis} values
      </p>
      <Outputs rows={strengthRows} />
      {r.tappedThread ? (
        <p class="joint-note" data-out="part-basis">
          The part's thread: τ = 0.6 R<sub>m</sub> of {partName(r.threadIn)}, {q(r.tappedThread.shearStrength, "stress", system)}, from{" "}
          {r.tappedThread.materialBasis} values of the materials table.
        </p>
      ) : null}
    </div>
  );
}

export default function FastenerCalculator({ id = fastenerCalculator.anchor, initial = null }: FastenerCalculatorProps) {
  const model = useMemo(() => createFastenerModel(initial), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields } = model;
  const error = model.outcome.value.error;
  const errorFor = (name: string) => (error && error.field === name ? error.message : null);
  // The folded inputs open when one of them holds an error.
  const moreOpen = MORE.some((name) => errorFor(name) || (name in fields.readings && !fields.readings[name as FieldName].value.ok));
  return (
    <section class="calc" id={id} aria-label="Bolted joint calculator">
      <Notices notices={model.notices} />
      <Toolbar idPrefix={id} system={fields.system} onSystem={fields.setSystem} link={() => linkFor(model, id)} save={model.save} />
      <form class="calc-form" onSubmit={(event) => event.preventDefault()} noValidate>
        {GROUPS.map((group) => (
          <fieldset key={group.legend}>
            <legend>{group.legend}</legend>
            {group.items.map((name) => (
              <Field key={name} model={model} id={id} name={name} error={errorFor} />
            ))}
          </fieldset>
        ))}
        <details class="joint-more" open={moreOpen || undefined}>
          <summary>More inputs: slip faces, bending, grip, clamped material, verdict thresholds</summary>
          <fieldset>
            <legend>Less often changed</legend>
            {MORE.map((name) => (
              <Field key={name} model={model} id={id} name={name} error={errorFor} />
            ))}
          </fieldset>
        </details>
      </form>
      <HydrateLater>
        <FastenerBar model={model} id={id} />
      </HydrateLater>
      <HydrateLater>
        <Results model={model} id={id} />
      </HydrateLater>
    </section>
  );
}
