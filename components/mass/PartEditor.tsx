/**
 * An open part card of the mass-layout editor: the part's name, shape, mass source and dimension
 * fields, and its list actions (move, duplicate, remove, mirror). A closed card shows only its
 * summary line, so this loads when the builder first opens a card (or a card opens on an error).
 */
import type { Signal } from "../calc-ui/reactive.ts";
import { PART_SHAPE_KINDS } from "../../calc/mass/parts.ts";
import type { MirrorAxis } from "../../calc/mass/editing.ts";
import { MATERIAL_DENSITIES } from "../../calc/materials/densities.ts";
import { QuantityField } from "../calc-ui/QuantityField.tsx";
import type { MassError, MassModel } from "./model.ts";
import { focusLater } from "./focus.ts";
import { needsGivenMass, PART_INPUTS, SHAPE_NAMES, type PartField, type PartModel } from "./parts.ts";

const AXES: [MirrorAxis, string][] = [
  ["y", "the y axis (x → −x)"],
  ["x", "the x axis (y → −y)"],
  ["origin", "the centre (half turn)"],
];

/** A part's action button; its accessible name says which part it acts on ("Remove: Left wheel"). */
function Act({ label, part, ...rest }: { label: string; part: string; id?: string; disabled?: boolean; onClick: () => void }) {
  return (
    <button type="button" class="button button--quiet" aria-label={`${label}: ${part}`} {...rest}>
      {label}
    </button>
  );
}

export interface PartEditorProps {
  model: MassModel;
  part: PartModel;
  index: number;
  /** The calculator's element id (the add button's prefix). */
  id: string;
  /** The part's element-id prefix. */
  pid: string;
  /** The fields the part shows. */
  names: PartField[];
  /** The error that belongs to this part, if any. */
  mine: MassError | null;
  /** Whether a field of the part does not read (mirroring waits for it). */
  bad: boolean;
  /** The axis picked for mirroring (kept while the card is closed). */
  axis: Signal<MirrorAxis>;
}

export function PartEditor({ model, part, index, id, pid, names, mine, bad, axis }: PartEditorProps) {
  const { fields } = part;
  const shape = part.shape.value;
  const count = model.parts.value.length;
  const name = part.name.value;
  const move = (by: number) => {
    model.move(index, by);
    const edge = index + by === 0 || index + by === count - 1;
    focusLater(`${pid}-${edge ? (by < 0 ? "down" : "up") : by < 0 ? "up" : "down"}`);
  };
  return (
    <div class="mass-card">
      <div class="mass-grid">
        <div class="field mass-wide">
          <label for={`${pid}-name`}>Name</label>
          <input id={`${pid}-name`} type="text" maxLength={60} value={name} onInput={(e) => (part.name.value = e.currentTarget.value)} />
        </div>
        <div class="field mass-wide">
          <label for={`${pid}-shape`}>Shape</label>
          <select id={`${pid}-shape`} value={shape} onChange={(e) => (part.shape.value = e.currentTarget.value as typeof shape)}>
            {PART_SHAPE_KINDS.map((k) => (
              <option key={k} value={k}>
                {SHAPE_NAMES[k]}
              </option>
            ))}
          </select>
        </div>
        {needsGivenMass(shape) ? null : (
          <div class="field mass-wide">
            <label for={`${pid}-src`}>Mass from</label>
            <select id={`${pid}-src`} value={part.source.value} onChange={(e) => (part.source.value = e.currentTarget.value as typeof part.source.value)}>
              <option value="given">Weighed mass</option>
              {Object.values(MATERIAL_DENSITIES).map((m) => (
                <option key={m.id} value={m.id}>
                  {m.menuName}
                </option>
              ))}
            </select>
          </div>
        )}
        {names.map((n) => (
          <QuantityField
            key={n}
            idPrefix={pid}
            name={n}
            spec={PART_INPUTS[n]}
            text={fields.texts[n]}
            reading={fields.readings[n]}
            system={fields.system.value}
            extraError={mine && mine.field === n ? mine.message : null}
          />
        ))}
      </div>
      {mine && !mine.field ? <p class="field-error">{mine.message}</p> : null}
      <div class="mass-actions">
        <Act part={name} label="Move up" id={`${pid}-up`} disabled={index === 0} onClick={() => move(-1)} />
        <Act part={name} label="Move down" id={`${pid}-down`} disabled={index === count - 1} onClick={() => move(1)} />
        <Act part={name} label="Duplicate" onClick={() => model.duplicate(index)} />
        <Act
          part={name}
          label="Remove"
          onClick={() => {
            model.remove(index);
            focusLater(`${id}-add`);
          }}
        />
      </div>
      <div class="mass-actions">
        <div class="field">
          <label for={`${pid}-axis`}>Mirror across</label>
          <select id={`${pid}-axis`} value={axis.value} onChange={(e) => (axis.value = e.currentTarget.value as MirrorAxis)}>
            {AXES.map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </select>
        </div>
        <Act part={name} label="Mirror" disabled={bad} onClick={() => model.mirror(index, axis.value, false)} />
        <Act part={name} label="Add mirrored copy" disabled={bad} onClick={() => model.mirror(index, axis.value, true)} />
      </div>
    </div>
  );
}
