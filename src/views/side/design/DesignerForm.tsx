/**
 * The Design form: choose a kind, state its parameters in Hz and dB, and press Design. Designing (or
 * re-running) replaces the roots in one undo step; the mask follows the requirement when asked.
 */
import { useMemo, useState, type ReactNode } from 'react';
import { runDesignerWithMask } from './runFromForm.ts';
import { Segmented } from '../../chart/Segmented.tsx';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { selectDesignerStatus } from '../../../store/derived.ts';
import type { IirFamily } from '../../../core/design/index.ts';
import {
  FAMILIES,
  KINDS,
  hasNotchWidth,
  isBand,
  isClassical,
  visibleFields,
  withKind,
  type DesignFormState,
  type FieldKey,
  type FormKind,
} from './designKinds.ts';
import { readForm, type FieldErrors } from './designForm.ts';
import { errorField, errorText } from './designErrors.ts';
import { fieldLabel, pairNames } from './fieldLabels.ts';
import { FormField, PairField } from './FormField.tsx';
import { maskFromDesigner } from '../../../core/mask/index.ts';

const GROUPS = [...new Set(KINDS.map((k) => k.group))];
const PAIRS: Partial<Record<FieldKey, FieldKey>> = {
  edgeLow: 'edgeHigh',
  passLow: 'passHigh',
  stopLow: 'stopHigh',
};
const SECOND = new Set<FieldKey>(['edgeHigh', 'passHigh', 'stopHigh']);
const REQUIREMENT = new Set<FieldKey>([
  'passLow',
  'passHigh',
  'stopLow',
  'stopHigh',
  'ripple',
  'attenuation',
]);

export interface DesignerFormProps {
  form: DesignFormState;
  setForm: (f: DesignFormState) => void;
}

export function DesignerForm({ form, setForm }: DesignerFormProps) {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const status = useWorkbench(selectDesignerStatus);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [general, setGeneral] = useState<string | null>(null);
  const [done, setDone] = useState<{ note: string; replacedEdits: boolean } | null>(null);
  const [withMask, setWithMask] = useState(true);

  const reading = useMemo(() => readForm(form, fs), [form, fs]);
  const impliedMask = useMemo(() => (reading.ok ? maskFromDesigner(reading.spec) : null), [reading]);
  const fields = visibleFields(form);
  const sameKind =
    status !== null && (status.spec.kind === 'iir' ? status.spec.response : status.spec.kind) === form.kind;

  const update = (patch: Partial<DesignFormState>) => {
    setForm({ ...form, ...patch });
    setDone(null);
    setGeneral(null);
  };
  const setValue = (k: FieldKey, text: string) => {
    update({ values: { ...form.values, [k]: text } });
    if (errors[k]) setErrors({ ...errors, [k]: undefined });
  };
  const submit = () => {
    setDone(null);
    if (!reading.ok) {
      setErrors(reading.errors);
      setGeneral('Some values are not accepted; see the messages above.');
      return;
    }
    const replacedEdits = status?.editedByHand ?? false;
    const r = runDesignerWithMask(workbenchStore.getState(), reading.spec, withMask && impliedMask !== null);
    if (r.ok) {
      setErrors({});
      setGeneral(null);
      setDone({ note: r.value.note, replacedEdits });
      return;
    }
    const field = errorField(r.error, form);
    setErrors(field ? { [field]: errorText(r.error) } : {});
    setGeneral(field ? 'Not designed: see the message above.' : `Not designed: ${errorText(r.error)}`);
  };

  const field = (k: FieldKey): ReactNode => {
    if (SECOND.has(k)) return null;
    const info = fieldLabel(k, form.kind, form.family);
    const pair = isBand(form.kind) ? PAIRS[k] : undefined;
    if (pair)
      return (
        <PairField
          key={k}
          label={info.label}
          names={pairNames(k)}
          values={[form.values[k], form.values[pair]]}
          errors={[errors[k], errors[pair]]}
          unit={info.unit ?? ''}
          onChange={(i, t) => setValue(i === 0 ? k : pair, t)}
          onEnter={submit}
        />
      );
    return (
      <FormField
        key={k}
        label={info.label}
        value={form.values[k]}
        error={errors[k]}
        wide={k === 'harmonics'}
        onChange={(t) => setValue(k, t)}
        onEnter={submit}
        hint={k.startsWith('edge') ? undefined : info.hint}
        {...(info.unit !== undefined && { unit: info.unit })}
      />
    );
  };

  const classical = isClassical(form.kind);
  const main = fields.filter((k) => !classical || !REQUIREMENT.has(k));
  const req = fields.filter((k) => classical && REQUIREMENT.has(k));
  const edgeHint = classical && !form.autoOrder ? fieldLabel('edgeLow', form.kind, form.family).hint : null;

  return (
    <section className="pw-side-section pw-dz" aria-labelledby="pw-dz-form-h" data-testid="designer-form">
      <h2 id="pw-dz-form-h">{status ? 'Change or replace the design' : 'Design from a requirement'}</h2>
      <div className="pw-dz-row">
        <label className="pw-dz-field">
          <span>Kind</span>
          <select
            value={form.kind}
            onChange={(e) => {
              setForm(withKind(form, e.target.value as FormKind, fs));
              setErrors({});
              setGeneral(null);
              setDone(null);
            }}
          >
            {GROUPS.map((g) => (
              <optgroup key={g} label={g}>
                {KINDS.filter((k) => k.group === g).map((k) => (
                  <option key={k.kind} value={k.kind}>
                    {k.label}
                  </option>
                ))}
              </optgroup>
            ))}
          </select>
        </label>
        {classical && (
          <label className="pw-dz-field">
            <span>Family</span>
            <select value={form.family} onChange={(e) => update({ family: e.target.value as IirFamily })}>
              {FAMILIES.map((f) => (
                <option key={f.family} value={f.family}>
                  {f.label}
                </option>
              ))}
            </select>
          </label>
        )}
      </div>
      {hasNotchWidth(form.kind) && (
        <div className="pw-dz-choices">
          <Segmented
            mini
            caption="Width as"
            label="Width as"
            value={form.width}
            options={[
              { value: 'bandwidth', label: '−3 dB width (Hz)' },
              { value: 'q', label: 'Q' },
            ]}
            onChange={(v) => update({ width: v })}
          />
          {form.kind === 'comb' && (
            <Segmented
              mini
              caption="Teeth"
              label="Teeth"
              value={form.combType}
              options={[
                { value: 'notch', label: 'notches' },
                { value: 'peak', label: 'peaks' },
              ]}
              onChange={(v) => update({ combType: v })}
            />
          )}
        </div>
      )}
      {(form.kind === 'peakingEq' || form.kind === 'lowShelf' || form.kind === 'highShelf') && (
        <div className="pw-dz-choices">
          <Segmented
            mini
            caption="Width as"
            label="Width as"
            value={form.eqWidth === 'q' ? 'q' : 'other'}
            options={[
              { value: 'q', label: 'Q' },
              form.kind === 'peakingEq'
                ? { value: 'other', label: 'octaves' }
                : { value: 'other', label: 'slope' },
            ]}
            onChange={(v) =>
              update({ eqWidth: v === 'q' ? 'q' : form.kind === 'peakingEq' ? 'octaves' : 'slope' })
            }
          />
        </div>
      )}
      {classical && (
        <label className="pw-dz-check">
          <input
            type="checkbox"
            checked={form.autoOrder}
            onChange={(e) => update({ autoOrder: e.target.checked })}
          />
          Least order that meets the requirement
        </label>
      )}
      <div className="pw-dz-fields">{main.map(field)}</div>
      {edgeHint && <p className="pw-hint pw-dz-note">Edge: {edgeHint}.</p>}
      {classical && (
        <fieldset className="pw-dz-req">
          <legend>Requirement</legend>
          {!form.autoOrder && (
            <p className="pw-hint pw-dz-note">Optional with a given order: gives margins and a mask.</p>
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
      <div className="pw-dz-actions">
        <button type="button" className="pw-primary" onClick={submit}>
          {sameKind ? 'Re-run' : 'Design'}
        </button>
        <span className="pw-hint">
          {status ? 'replaces the roots · one undo step' : 'puts the filter on the plane · one undo step'}
        </span>
      </div>
      {general && (
        <p role="alert" className="pw-field-error pw-dz-general">
          {general}
        </p>
      )}
      {done && (
        <p role="status" className="pw-dz-done" data-testid="designer-done">
          {done.replacedEdits ? 'Hand edits replaced by: ' : 'Designed: '}
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
