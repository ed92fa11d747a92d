/**
 * The mass-layout and balance calculator: a parts list editor, the mass properties and a top view
 * of the layout, its balance (static unbalance, balance grade, couple, two-plane correction), a
 * counterweight solver that can add its answer to the list (and take it back), and the sensor's
 * true radius. Explanations live in the chapter; this shows numbers.
 */
import type { ComponentChildren } from "preact";
import { signal, useSignal } from "../calc-ui/reactive.ts";
import { useEffect, useMemo } from "preact/hooks";
import { BALANCE_GRADES, standardBalanceGrade } from "../../calc/mass/balance-grades.ts";
import type { MirrorAxis } from "../../calc/mass/editing.ts";
import { MAX_PARTS } from "../../calc/mass/parts.ts";
import { formatNumber, formatQuantity, fromSI, type QuantityKind, type UnitId, type UnitSystem } from "../../calc/core/units.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import { Toolbar } from "../calc-ui/Toolbar.tsx";
import { ResultBar } from "../calc-ui/ResultBar.tsx";
import { Verdict } from "../calc-ui/Verdict.tsx";
import { Notices } from "../calc-ui/Notices.tsx";
import { syncWithUrl } from "../calc-ui/url-sync.ts";
import type { Worked } from "../mass/compute.ts";
import { createMassModel, type MassError, type MassModel, type ModeKey, type Snapshot } from "../mass/model.ts";
import { partFields, SHAPE_NAMES, type PartModel } from "../mass/parts.ts";
import { focusLater } from "../mass/focus.ts";
import { TopView } from "../mass/TopView.tsx";
import { linkFor } from "../../calc/core/calculator.ts";
import { form as massCalculator } from "../../calc/calculators/mass.ts";
import { headingDriftForm as headingDrift } from "../../calc/heading/drift-inputs.ts";
import { siteUrl } from "../calc-ui/site.ts";
import { HydrateLater } from "../calc-ui/hydrate-later.ts";

/** The island name: this file's name. */
export const island = "mass";

export interface MassLayoutCalculatorProps {
  /** Element id of the calculator (the link's anchor). */
  id?: string;
  /** The starting parts list, in calc/'s layout text ("v1~…"). */
  layout?: string;
  /** The starting layout's result, worked out at build time (the chapter passes it: model.ts `startingResult`). */
  initial?: Worked | null;
}

const MODE_NAMES: Record<ModeKey, string> = { r: "Mass at a radius", m: "Radius for a mass", p: "Best mounting point" };
// An open card's fields and actions (components/mass/PartEditor.tsx) load when the builder first opens
// a card, or a card opens on an error; closed cards show only their summary line.
const editor = signal<typeof import("../mass/PartEditor.tsx") | null>(null);
const editorFailed = signal(false);
let loadingEditor: Promise<void> | null = null;

/** Loads the part editor (once); resolves when it can render. */
export function loadPartEditor(): Promise<void> {
  loadingEditor ??= import("../mass/PartEditor.tsx").then(
    (module) => {
      editor.value = module;
      editorFailed.value = false;
    },
    () => {
      loadingEditor = null;
      editorFailed.value = true;
    },
  );
  return loadingEditor;
}

type Fmt = (value: number, kind: QuantityKind, unit?: UnitId, significant?: number) => string;

/** Output rows: [label, data-out name, text]. */
function Outs({ rows }: { rows: [ComponentChildren, string, string][] }) {
  return (
    <dl class="results-grid">
      {rows.map(([label, name, text]) => (
        <div key={name}>
          <dt>{label}</dt>
          <dd data-out={name}>{text}</dd>
        </div>
      ))}
    </dl>
  );
}

function PartCard({ model, part, index, id, error, q }: { model: MassModel; part: PartModel; index: number; id: string; error: MassError | null; q: Fmt }) {
  const axis = useSignal<MirrorAxis>("y");
  const pid = `${id}-p${part.key}`;
  const { fields } = part;
  const shape = part.shape.value;
  const names = partFields(shape, part.source.value);
  const mine = error && error.part === index ? error : null;
  const bad = mine || names.some((n) => !fields.readings[n].value.ok);
  const open = part.open.value || !!bad;
  const name = part.name.value;
  const row = model.outcome.value?.balance?.layout.parts[index];
  useEffect(() => {
    if (open) void loadPartEditor();
  }, [open]);
  return (
    <li>
      <details open={open} onToggle={(e) => (part.open.value = (e.currentTarget as HTMLDetailsElement).open)}>
        <summary>
          {index + 1}. {name || "(no name)"}
          <span class="mass-sub">
            {" "}
            · {SHAPE_NAMES[shape]}
            {row ? ` · ${q(row.mass, "mass")}` : ""}
            {bad ? " · check the fields" : ""}
          </span>
        </summary>
        {/* A closed card renders no fields: the page stays light with many parts. */}
        {open ? (
          editor.value ? (
            <editor.value.PartEditor model={model} part={part} index={index} id={id} pid={pid} names={names} mine={mine} bad={!!bad} axis={axis} />
          ) : (
            <p class="mass-card">
              {editorFailed.value ? "The part's fields could not be loaded: reload the page to try again." : "Loading the part's fields…"}
            </p>
          )
        ) : null}
      </details>
    </li>
  );
}

export default function MassLayoutCalculator({ id = massCalculator.anchor, layout = "", initial = null }: MassLayoutCalculatorProps) {
  const model = useMemo(() => createMassModel("metric", layout, initial), []);
  useEffect(() => syncWithUrl(model), [model]);
  const { fields } = model;
  const system: UnitSystem = fields.system.value;
  const o = model.outcome.value;
  const error = o?.error ?? null;
  const ok = o && !o.error ? o : null;
  const q: Fmt = (v, kind, unit, significant) => formatQuantity(v, kind, { system, unit, significant }).text;
  /** Products of inertia and couples are small: g·cm² or oz·in². */
  const small = (v: number) => q(v, "inertia", system === "us" ? "oz·in2" : "g·cm2");
  const mm = (v: number) => q(v, "speed", "mm/s");
  const field = (name: keyof typeof fields.specs) => (
    <QuantityField
      key={name}
      idPrefix={id}
      name={name}
      spec={fields.specs[name]}
      text={fields.texts[name]}
      reading={fields.readings[name]}
      system={system}
      extraError={error && error.part === null && error.field === name ? error.message : null}
    />
  );
  const g = fields.readings.balanceGrade.value;
  const grade = g.ok ? standardBalanceGrade(g.value) : null;
  const mode = model.mode.value;
  const pointsError = model.mounting.value.error;
  const parts = model.parts.value;
  const applied = model.applied.value && parts.some((p) => p.key === model.applied.value!.key) ? model.applied.value : null;
  const waiting = model.waiting.value
    ? model.computeFailed.value
      ? "The layout's arithmetic could not be loaded: reload the page to try again."
      : "Working out the layout…"
    : null;
  const empty = (
    <p class="calc-results--empty">
      {waiting
        ? waiting
        : error && error.part === null && error.field === null
          ? error.message
          : parts.length
            ? "Results appear when every field holds a valid value."
            : "Add a part to see results."}
    </p>
  );
  const snap = (s: Snapshot) => [q(s.offset, "length"), `${mm(s.grade)} (${s.met || "over G 4000"})`, `${q(s.drift, "angle")} per rev`];

  let mass = null;
  let balance = null;
  let counter = null;
  let sensor = null;
  let couple = null;
  if (ok) {
    const { balance: b, plan, input, drawing } = ok;
    const L = b.layout;
    const at = b.counterweight.atRadius;
    const fm = b.counterweight.forMass;
    const cand = b.counterweight.candidates;
    const s = b.sensor.before;
    const chosen = grade?.label ?? `G ${formatNumber(g.ok ? fromSI(g.value, "mm/s") : 0)}`;
    const meets = b.gradeVerdict === "meets-grade";
    // As the build sheet judges it (calc/calculators/mass.ts): up to one grade step (× 2.5) coarser is marginal.
    const tone = meets ? "ok" : g.ok && b.equivalentGrade <= g.value * 2.5 ? "warn" : "bad";
    const cw = plan.counterweight;
    const where = (c: { radius: number; angle: number }) => `${q(c.radius, "length")} at ${q(c.angle, "angle")}`;
    mass = (
      <>
        <Outs
          rows={[
            ["Total mass M", "total-mass", q(L.totalMass, "mass")],
            ["Centre of mass x̄", "com-x", q(L.centreX, "length")],
            ["Centre of mass ȳ", "com-y", q(L.centreY, "length")],
            ["Centre of mass height z̄", "com-z", q(L.centreZ, "length")],
            ["Offset e from the geometric centre", "offset", q(L.offset, "length")],
            ["Direction of the offset", "offset-angle", q(L.offsetAngle, "angle")],
            ["I about the centre of mass", "inertia-com", q(L.inertiaAboutCentre, "inertia", undefined, 4)],
            ["I about the geometric centre", "inertia-geo", q(L.inertiaAboutOrigin, "inertia", undefined, 4)],
            [
              <>
                Product of inertia I<sub>xz</sub>
              </>,
              "product-xz",
              small(L.productXZ),
            ],
            [
              <>
                Product of inertia I<sub>yz</sub>
              </>,
              "product-yz",
              small(L.productYZ),
            ],
          ]}
        />
        <TopView
          drawing={drawing}
          sensor={[input.sensorX, input.sensorY]}
          counterweight={cw ? [cw.x, cw.y] : null}
          system={system}
          summary={`${L.parts.length} parts. Centre of mass ${q(L.offset, "length")} from the geometric centre toward ${q(L.offsetAngle, "angle")}; sensor ${q(s.radiusTrue, "length")} from it.${cw ? ` Counterweight ${q(cw.mass, "mass")} at ${where(cw)}.` : ""}`}
        />
      </>
    );
    balance = (
      <>
        <Verdict tone={tone} reason={`${meets ? "meets" : "exceeds"} ${chosen}${tone === "warn" ? " by less than one grade step" : ""}`} out="grade-verdict">
          U = {q(b.static.unbalance, "unbalance")} is {formatNumber(b.unbalanceShareOfPermissible * 100)} % of the permissible{" "}
          {q(b.permissible.unbalance, "unbalance")}
          {b.gradeMet ? `; the finest grade it meets is ${b.gradeMet.label}.` : "; it is coarser than G 4000."}
        </Verdict>
        <Outs
          rows={[
            ["Static unbalance U = M·e", "unbalance", q(b.static.unbalance, "unbalance")],
            ["Its rotating force at speed", "unbalance-force", q(b.static.force, "force")],
            ["Equivalent grade e·Ω", "grade", mm(b.equivalentGrade)],
            ["Finest standard grade met", "grade-met", b.gradeMet?.label ?? "coarser than G 4000"],
            [`Permissible U for ${chosen}`, "u-per", q(b.permissible.unbalance, "unbalance")],
            ["Permissible offset", "e-per", q(b.permissible.specificUnbalance, "length")],
          ]}
        />
      </>
    );
    const rocks = b.coupleShareOfPermissible > 1;
    // One line says what the couple means here; the two-plane figures show only when it matters.
    couple = (
      <>
        <p data-out="couple-note">
          Parts above and below the centre of mass rock it: {formatNumber(b.coupleShareOfPermissible * 100)} % of the {chosen} allowance per plane.{" "}
          {rocks ? "A mass in each plane cancels rocking and offset:" : "One counterweight at the height of the centre of mass will do."}
        </p>
        <p data-out="couple-lift" class={b.lift.ratio >= 1 ? "field-error" : undefined}>
          Rocking moment {formatNumber(b.lift.ratio * 100)} % of the weight's on the support radius
          {b.lift.liftSpeed === null ? ": no side lifts." : `; one side lifts at ${q(b.lift.liftSpeed, "angularSpeed")}.`}
        </p>
        {rocks && (
          <Outs
            rows={[
              ["Couple unbalance", "couple", small(b.couple.couple)],
              ["Rocking moment at speed", "rocking", q(b.couple.moment, "torque")],
              [
                `Lower plane, at ${q(input.correctionRadius, "length")}`,
                "plane-lower",
                `${q(b.twoPlane.lower.mass, "mass")} at ${q(b.twoPlane.lower.angle, "angle")}`,
              ],
              [
                `Upper plane, at ${q(input.correctionRadius, "length")}`,
                "plane-upper",
                `${q(b.twoPlane.upper.mass, "mass")} at ${q(b.twoPlane.upper.angle, "angle")}`,
              ],
            ]}
          />
        )}
      </>
    );
    const within = b.offsetVerdict === "within-target";
    counter = (
      <>
        <Verdict tone={within ? "ok" : "bad"} reason={within ? "offset within the target" : "offset outside the target"} out="offset-verdict">
          e = {q(L.offset, "length")}, {formatNumber(b.offsetShareOfTarget * 100)} % of the {q(input.targetOffset, "length")} target.
        </Verdict>
        {within ? null : mode === "r" ? (
          <Outs
            rows={[
              ["Least mass at this radius", "cw-least", q(at.mass, "mass")],
              ["Mass for zero offset", "cw-zero", q(at.massForZero, "mass")],
              ["Most mass within target", "cw-most", at.maxMass === null ? "no limit" : q(at.maxMass, "mass")],
              ["Direction", "cw-angle", q(at.angle, "angle")],
            ]}
          />
        ) : mode === "m" ? (
          <Outs
            rows={[
              ["Radius for zero offset", "cw-zero", q(fm.radiusForZero, "length")],
              ["Workable radii", "cw-band", `${q(fm.minRadius, "length")} to ${q(fm.maxRadiusWithinTarget, "length")}`],
              ["Mount it at", "cw-radius", fm.radius === null ? `beyond ${q(input.maxRadius, "length")}: too light` : q(fm.radius, "length")],
              ["Direction", "cw-angle", q(fm.angle, "angle")],
            ]}
          />
        ) : cand ? (
          <ol class="mass-points" data-out="cw-points">
            {cand.candidates.map((c) => (
              <li key={c.index}>
                ({q(c.x, "length")}, {q(c.y, "length")}): {c.mass === null ? "cannot reach the target" : q(c.mass, "mass")}
                {c.index === cand.best ? " ← least" : ""}
              </li>
            ))}
          </ol>
        ) : null}
        {cw && plan.after ? (
          <>
            <table class="mass-compare">
              <caption>
                Add <span data-out="cw-mass">{q(cw.mass, "mass")}</span> at <span data-out="cw-where">{where(cw)}</span>, height {q(cw.z, "length")}
              </caption>
              <thead>
                <tr>
                  <th scope="col">Figure</th>
                  <th scope="col">Now</th>
                  <th scope="col">With it</th>
                </tr>
              </thead>
              <tbody>
                {(() => {
                  const now = snap({ offset: L.offset, grade: b.equivalentGrade, met: b.gradeMet?.label ?? "", drift: s.driftPerRevolution });
                  const next = snap({
                    offset: plan.after.offset,
                    grade: plan.after.equivalentGrade,
                    met: plan.after.gradeMet?.label ?? "",
                    drift: plan.after.sensor.driftPerRevolution,
                  });
                  return ["Offset e", "Grade", "Sensor drift"].map((label, i) => (
                    <tr key={label}>
                      <th scope="row">{label}</th>
                      <td>{now[i]}</td>
                      <td data-out={`after-${i}`}>{next[i]}</td>
                    </tr>
                  ));
                })()}
              </tbody>
            </table>
            <button type="button" class="button" onClick={model.apply}>
              Apply: add it to the parts list
            </button>
          </>
        ) : within ? null : input.parts.length >= MAX_PARTS ? (
          <p class="field-error">The parts list is full ({MAX_PARTS} parts): remove a part to make room for a counterweight.</p>
        ) : (
          <p class="field-error">No counterweight of this kind reaches the target; try another radius, mass or point.</p>
        )}
      </>
    );
    const link = siteUrl(linkFor(headingDrift, { assumedRadius: s.radiusAssumed, trueRadius: s.radiusTrue, angularSpeed: input.spinSpeed }, { system }));
    sensor = (
      <>
        <Outs
          rows={[
            [
              "Robot turns about",
              "spin-centre",
              b.spinCentre.before.state === "wheels-hold"
                ? "the wheels' centre (their grip holds)"
                : `${q(b.spinCentre.before.distanceFromWheels, "length")} out (wheels slide)`,
            ],
            ["True radius (about the spin centre)", "sensor-true", q(s.radiusTrue, "length")],
            ["Assumed radius (about the geometric centre)", "sensor-assumed", q(s.radiusAssumed, "length")],
            ["Difference", "sensor-diff", q(s.difference, "length")],
            ["Speed read high by √(r/r̂)", "sensor-ratio", `× ${formatNumber(s.rateRatio, 5)}`],
            ["Heading drift per revolution", "sensor-drift", q(s.driftPerRevolution, "angle")],
          ]}
        />
        <p>
          <a href={link} data-out="drift-link">
            Check this in the drift budget
          </a>
        </p>
      </>
    );
  }

  return (
    <section class="calc mass-calc" id={id} aria-label="Mass layout and balance calculator">
      <Notices notices={model.notices} />
      <Toolbar
        idPrefix={id}
        system={fields.system}
        onSystem={model.setSystem}
        link={() => `${location.origin}${location.pathname}?${model.queryFor(location.search)}#${id}`}
        save={model.save}
      />
      <form onSubmit={(e) => e.preventDefault()} noValidate>
        <fieldset>
          <legend>Speed</legend>
          {field("spinSpeed")}
        </fieldset>
        <fieldset class="mass-parts">
          <legend>Parts ({parts.length})</legend>
          <ol>
            {parts.map((part, index) => (
              <PartCard key={part.key} model={model} part={part} index={index} id={id} error={error} q={q} />
            ))}
          </ol>
          <button
            type="button"
            class="button"
            id={`${id}-add`}
            onClick={() => {
              const key = model.add().key;
              void loadPartEditor().then(() => focusLater(`${id}-p${key}-name`));
            }}
          >
            Add a part
          </button>{" "}
          {parts.length ? (
            <button
              type="button"
              class="button button--quiet"
              id={`${id}-clear`}
              onClick={() => {
                model.clear();
                focusLater(`${id}-restore`);
              }}
            >
              Start empty
            </button>
          ) : (
            model.cleared.value && (
              <button
                type="button"
                class="button button--quiet"
                id={`${id}-restore`}
                onClick={() => {
                  model.restore();
                  focusLater(`${id}-clear`);
                }}
              >
                Undo: put the parts back
              </button>
            )
          )}
        </fieldset>

        <h3 id={`${id}-results`}>Mass properties and top view</h3>
        <HydrateLater>{mass ?? empty}</HydrateLater>

        <h3>Balance</h3>
        <div class="mass-grid">
          <div class="field">
            <label for={`${id}-grade`}>Standard balance grade</label>
            <select
              id={`${id}-grade`}
              value={grade?.label ?? ""}
              onChange={(e) => {
                const label = e.currentTarget.value;
                if (label) fields.texts.balanceGrade.value = `${label.slice(2)} mm/s`;
                else focusLater(`${id}-balanceGrade`);
              }}
            >
              {BALANCE_GRADES.map((s) => (
                <option key={s.label} value={s.label}>
                  {s.label}
                </option>
              ))}
              <option value="">Other (type it)</option>
            </select>
          </div>
          {field("balanceGrade")}
        </div>
        <HydrateLater>{balance}</HydrateLater>

        <h3>Counterweight</h3>
        <fieldset class="segmented mass-modes">
          <legend>Counterweight question</legend>
          {(Object.keys(MODE_NAMES) as ModeKey[]).map((key) => (
            <label key={key}>
              <input type="radio" name={`${id}-mode`} value={key} checked={mode === key} onChange={() => (model.mode.value = key)} />
              <span>{MODE_NAMES[key]}</span>
            </label>
          ))}
        </fieldset>
        <div class="mass-grid">
          {field("targetOffset")}
          {mode === "r" ? (
            field("correctionRadius")
          ) : mode === "m" ? (
            [field("counterweightMass"), field("maxRadius")]
          ) : (
            <div class={`field${pointsError ? " field--error" : ""}`}>
              <label for={`${id}-points`}>
                Mounting points <span class="field-unit">({system === "us" ? "in" : "mm"}: x, y; x, y …)</span>
              </label>
              <input
                id={`${id}-points`}
                type="text"
                value={model.points.value}
                aria-invalid={pointsError ? "true" : undefined}
                aria-describedby={`${id}-points-help${pointsError ? ` ${id}-points-error` : ""}`}
                onInput={(e) => (model.points.value = e.currentTarget.value)}
              />
              <p class="field-help" id={`${id}-points-help`}>
                Each point as x, y; separate points with semicolons.
              </p>
              {pointsError ? (
                <p class="field-error" id={`${id}-points-error`} role="alert">
                  {pointsError}
                </p>
              ) : null}
            </div>
          )}
        </div>
        <HydrateLater>{counter}</HydrateLater>
        {applied ? (
          <p class="verdict verdict--ok" role="status" data-out="applied">
            Counterweight added: offset {snap(applied.before)[0]} → {snap(applied.after)[0]}; grade {snap(applied.before)[1]} → {snap(applied.after)[1]}; sensor
            drift {snap(applied.before)[2]} → {snap(applied.after)[2]}.{" "}
            <button type="button" class="button button--quiet" onClick={model.undo}>
              Undo
            </button>
          </p>
        ) : null}

        <h3>Couple and two-plane correction</h3>
        <div class="mass-grid">
          {field("planeZ1")}
          {field("planeZ2")}
          {mode === "r" ? null : field("correctionRadius")}
          {field("supportRadius")}
        </div>
        <HydrateLater>{couple}</HydrateLater>

        <h3>Sensor radius</h3>
        <div class="mass-grid">
          {field("sensorX")}
          {field("sensorY")}
          {field("sideGrip")}
          {field("gripShare")}
        </div>
        <HydrateLater>{sensor}</HydrateLater>
        <HydrateLater>
          {ok ? (
            <ResultBar
              tone={ok.balance.offsetVerdict === "within-target" ? "ok" : "bad"}
              reason={ok.balance.offsetVerdict === "within-target" ? undefined : "offset outside the target"}
              resultsId={`${id}-results`}
              figures={[
                { name: "offset", label: "Offset e", value: q(ok.balance.layout.offset, "length") },
                { name: "unbalance", label: "Unbalance U", value: q(ok.balance.static.unbalance, "unbalance") },
              ]}
            />
          ) : (
            <ResultBar
              tone={null}
              figures={[]}
              resultsId={`${id}-results`}
              missing={waiting ?? (parts.length ? "No result yet: correct the marked field." : "Add a part to see results.")}
            />
          )}
        </HydrateLater>
      </form>
    </section>
  );
}
