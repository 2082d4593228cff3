/**
 * The Design form: choose a kind, state its parameters in Hz and dB, and press Design. Kinds, fields,
 * labels, units and choices come from the designer registry. Designing (or re-running) replaces the roots
 * in one undo step; the mask follows the requirement when asked.
 */
import { useMemo, useState, type ReactNode } from 'react';
import { Segmented } from '../../chart/Segmented.tsx';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { selectDesignerStatus } from '../../../store/derived.ts';
import { isRequired, textFor, variantOf, type ChoiceParameter } from '../../../core/design/index.ts';
import {
  GROUPS,
  KINDS,
  fieldLabel,
  formValues,
  kindOf,
  openParameters,
  visibleFields,
  withKind,
  type DesignFormState,
  type FormField as Field,
} from './designKinds.ts';
import { readForm, type FieldErrors } from './designForm.ts';
import { errorField, errorText } from './designErrors.ts';
import { FormField, PairField } from './FormField.tsx';
import { maskFromDesigner } from '../../../core/mask/index.ts';
import { addPartEdit, rerunPartEdit } from '../../../store/partEdits.ts';
import { describeDesigner } from './describe.ts';

export interface DesignerFormProps {
  form: DesignFormState;
  setForm: (f: DesignFormState) => void;
  /** The part of a composed design the form changes (its index), or null for a new design or part. */
  editingPart?: number | null;
  /** Leaves the editing of a part. */
  onStopEditing?: () => void;
}

export function DesignerForm({ form, setForm, editingPart = null, onStopEditing }: DesignerFormProps) {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const hasRoots = useWorkbench((s) => s.design.zeros.length + s.design.poles.length > 0);
  const status = useWorkbench(selectDesignerStatus);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  // The last run's words, shown while the design still holds what that run made: its designer or its
  // parts (not after a rate change, and a note about part 3 goes once the parts change again).
  const [done, setDone] = useState<{
    note: string;
    replacedEdits: boolean;
    what?: string;
    /** The design's parts (or its one designer) the note was said for. */
    owner: unknown;
  } | null>(null);
  const owner = useWorkbench((s) => s.design.parts ?? s.design.designer);
  const [withMask, setWithMask] = useState(true);

  const { entry, variant } = kindOf(form.kind);
  const values = formValues(form);
  const reading = useMemo(() => readForm(form, fs), [form, fs]);
  const impliedMask = useMemo(() => (reading.ok ? maskFromDesigner(reading.spec) : null), [reading]);
  const fields = visibleFields(form);
  const sameKind = status !== null && variantOf(status.spec)?.variant.id === form.kind;
  const orderParameter = entry.parameters.find((p) => p.type === 'order');
  const choices = openParameters(entry, variant).filter((p): p is ChoiceParameter => p.type === 'choice');

  const update = (patch: Partial<DesignFormState>) => {
    setForm({ ...form, ...patch });
    setDone(null);
    setGeneral(null);
  };
  const setValue = (id: string, text: string) => {
    update({ values: { ...form.values, [id]: text } });
    if (errors[id]) setErrors({ ...errors, [id]: undefined });
  };
  const setChoice = (key: string, value: string) =>
    // "Any family" picks the family by least order, so it asks for the least order.
    update({
      choices: { ...form.choices, [key]: value },
      ...(key === 'family' && value === 'any' && { autoOrder: true }),
    });
  /** Runs the form's description: replaces the design, adds it as a part, or changes the part being edited. */
  const submit = (how: 'replace' | 'add' | 'part' = editingPart !== null ? 'part' : 'replace') => {
    setDone(null);
    if (!reading.ok) {
      setErrors(reading.errors);
      setGeneral('Some values are not accepted; see the messages above.');
      return;
    }
    const replacedEdits = how === 'replace' && (status?.editedByHand ?? false);
    const store = workbenchStore.getState();
    const spec = reading.spec;
    // One undo step each: the roots, and the mask when asked (the one its requirement implies; for a part,
    // carved into the whole's mask).
    const r =
      how === 'add'
        ? store.designerEdit(addPartEdit(spec, withMask && impliedMask ? 'fill' : 'keep'))
        : how === 'part'
          ? store.designerEdit(rerunPartEdit(editingPart!, () => spec))
          : store.runDesigner(spec, withMask && impliedMask ? 'replace' : 'keep', {
              title: describeDesigner(spec).title,
              ...(store.design.designer && { previousTitle: describeDesigner(store.design.designer).title }),
            });
    if (r.ok) {
      setErrors({});
      setGeneral(null);
      const what =
        how === 'add'
          ? `Added as part ${workbenchStore.getState().design.parts?.length ?? 2}: `
          : how === 'part'
            ? `Part ${editingPart! + 1} changed: `
            : undefined;
      const after = workbenchStore.getState().design;
      setDone({
        note: r.value.note,
        replacedEdits,
        ...(what && { what }),
        owner: after.parts ?? after.designer,
      });
      if (how === 'part') onStopEditing?.();
      return;
    }
    const field = errorField(r.error, form);
    setErrors(field ? { [field]: errorText(r.error) } : {});
    setGeneral(field ? 'Not designed: see the message above.' : `Not designed: ${errorText(r.error)}`);
  };

  const field = (f: Field): ReactNode => {
    if (f.item === 1) return null;
    const info = fieldLabel(f, form);
    const p = f.parameter;
    if (f.item === 0 && fields.some((g) => g.parameter === p && g.item === 1)) {
      const second = `${p.key}.1`;
      const stem = p.type === 'list' && p.pairLabel ? p.pairLabel : info.label;
      return (
        <PairField
          key={f.id}
          label={info.label}
          names={[`${stem} low`, `${stem} high`]}
          values={[form.values[f.id] ?? '', form.values[second] ?? '']}
          errors={[errors[f.id], errors[second]]}
          unit={info.unit ?? ''}
          onChange={(i, t) => setValue(i === 0 ? f.id : second, t)}
          onEnter={() => submit()}
        />
      );
    }
    return (
      <FormField
        key={f.id}
        label={info.label}
        value={form.values[f.id] ?? ''}
        error={errors[f.id]}
        wide={p.type === 'list' && !p.count.exactly}
        onChange={(t) => setValue(f.id, t)}
        onEnter={() => submit()}
        hint={f.item !== undefined ? undefined : info.hint}
        {...(info.unit !== undefined && { unit: info.unit })}
      />
    );
  };

  const main = fields.filter((f) => f.parameter.section !== 'requirement');
  const req = fields.filter((f) => f.parameter.section === 'requirement');
  // An edge list's hint (what an edge means for the family) reads best under the fields.
  const notes = main
    .filter((f) => f.item === 0)
    .map((f) => fieldLabel(f, form))
    .filter((l) => l.hint)
    .map((l) => `${l.label}: ${l.hint}.`);

  return (
    <section className="pw-side-section pw-dz" aria-labelledby="pw-dz-form-h" data-testid="designer-form">
      <h2 id="pw-dz-form-h">
        {editingPart !== null
          ? `Change part ${editingPart + 1}`
          : status || hasRoots
            ? 'Change, replace or add to the design'
            : 'Design from a requirement'}
      </h2>
      <div className="pw-dz-row">
        <label className="pw-dz-field">
          <span>Kind</span>
          <select
            value={form.kind}
            onChange={(e) => {
              setForm(withKind(form, e.target.value, fs));
              setErrors({});
              setGeneral(null);
              setDone(null);
            }}
          >
            {GROUPS.map((g) => (
              <optgroup key={g} label={g}>
                {KINDS.filter((k) => k.group === g).map((k) => (
                  <option key={k.id} value={k.id}>
                    {k.label}
                  </option>
                ))}
              </optgroup>
            ))}
          </select>
        </label>
        {choices
          .filter((p) => p.control === 'select')
          .map((p) => (
            <label key={p.key} className="pw-dz-field">
              <span>{textFor(p.label, values)}</span>
              <select value={form.choices[p.key]} onChange={(e) => setChoice(p.key, e.target.value)}>
                {p.options.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </select>
            </label>
          ))}
      </div>
      {(entry.alternatives?.length || choices.some((p) => p.control === 'segmented')) && (
        <div className="pw-dz-choices">
          {(entry.alternatives ?? []).map((alt) => {
            const options = alt.keys.map((k) => {
              const p = entry.parameters.find((q) => q.key === k)!;
              const label = textFor(p.label, values) ?? k;
              return { value: k, label: p.unit === 'Hz' ? `${label} (Hz)` : p.unit ? p.unit : label };
            });
            return (
              <Segmented
                key={alt.keys[0]}
                mini
                caption={alt.label}
                label={alt.label}
                value={form.choices[alt.keys[0]] ?? alt.keys[0]}
                options={options}
                onChange={(v) => setChoice(alt.keys[0], v)}
              />
            );
          })}
          {choices
            .filter((p) => p.control === 'segmented')
            .map((p) => {
              const label = textFor(p.label, values) ?? p.key;
              return (
                <Segmented
                  key={p.key}
                  mini
                  caption={label}
                  label={label}
                  value={form.choices[p.key] ?? p.options[0]!.value}
                  options={p.options}
                  onChange={(v) => setChoice(p.key, v)}
                />
              );
            })}
        </div>
      )}
      {orderParameter?.type === 'order' && (
        <label className="pw-dz-check">
          <input
            type="checkbox"
            checked={form.autoOrder}
            onChange={(e) => update({ autoOrder: e.target.checked })}
          />
          {orderParameter.autoLabel}
        </label>
      )}
      <div className="pw-dz-fields">{main.map(field)}</div>
      {notes.map((n) => (
        <p key={n} className="pw-hint pw-dz-note">
          {n}
        </p>
      ))}
      {req.length > 0 && (
        <fieldset className="pw-dz-req">
          <legend>Requirement</legend>
          {orderParameter && !form.autoOrder && (
            <p className="pw-hint pw-dz-note">
              {req.some((f) => isRequired(f.parameter, values))
                ? 'This method designs from the bands: they are needed at a given order too.'
                : 'Optional with a given order: gives margins and a mask.'}
            </p>
          )}
          <div className="pw-dz-fields">{req.map(field)}</div>
        </fieldset>
      )}
      {impliedMask && (
        <label className="pw-dz-check">
          <input type="checkbox" checked={withMask} onChange={(e) => setWithMask(e.target.checked)} />
          Set the mask from this requirement ({impliedMask.regions.length} regions)
        </label>
      )}
      {editingPart !== null ? (
        <div className="pw-dz-actions">
          <button type="button" className="pw-primary" onClick={() => submit('part')}>
            Update part {editingPart + 1}
          </button>
          <button type="button" onClick={onStopEditing}>
            Stop editing
          </button>
          <span className="pw-hint">changes only this part&apos;s roots · one undo step</span>
        </div>
      ) : (
        <div className="pw-dz-actions">
          <button type="button" className="pw-primary" onClick={() => submit('replace')}>
            {sameKind ? 'Re-run' : 'Design'}
          </button>
          {hasRoots && (
            <button
              type="button"
              onClick={() => submit('add')}
              title="Keep the design and add this filter to it as a part of the cascade"
            >
              Add to the design
            </button>
          )}
          <span className="pw-hint">
            {hasRoots
              ? 'Design replaces the roots; Add keeps them and cascades · one undo step'
              : 'puts the filter on the plane · one undo step'}
          </span>
        </div>
      )}
      {general && (
        <p role="alert" className="pw-field-error pw-dz-general">
          {general}
        </p>
      )}
      {done && done.owner === owner && (
        <p role="status" className="pw-dz-done" data-testid="designer-done">
          {done.what ?? (done.replacedEdits ? 'Hand edits replaced by: ' : 'Designed: ')}
          {done.note}.{' '}
          {done.replacedEdits && (
            <button
              type="button"
              className="pw-small-button"
              onClick={() => workbenchStore.getState().undo()}
            >
              Undo
            </button>
          )}
        </p>
      )}
    </section>
  );
}
