/**
 * The number strip of the selected root (loaded after the first view, see RootEditor.tsx): the root by number — radius and angle, real and imaginary parts, and
 * for a pole pair frequency with Q or −3 dB width, for a notch (a zero pair over a pole pair) frequency,
 * depth and width — its multiplicity, split/join and delete. Enter applies the typed values as one undo
 * step; text that is not accepted shows a message naming the field and changes nothing.
 */
import { useMemo, useState, type FormEvent } from 'react';
import type { Root } from '../../core/types.ts';
import type { RootRef } from '../../core/model/design.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { MultiplicityControl } from './MultiplicityControl.tsx';
import type { AngleUnit } from './numberEntry.ts';
import { fieldsOf, formsFor, notchPartner, readForm, type RootForm, type Selected } from './rootForms.ts';

function Editor({ target: ref, root }: { target: RootRef; root: Root }) {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const unit = useWorkbench((s) => s.view.angleUnit);
  const design = useWorkbench((s) => s.design);
  const partner = useMemo(() => (ref.kind === 'zero' ? notchPartner(design, ref) : null), [design, ref]);
  const sel: Selected = { ref, root, partner };
  const forms = formsFor(sel);
  const [chosen, setForm] = useState<RootForm>('polar');
  const form = forms.some((f) => f.form === chosen) ? chosen : 'polar';
  const fields = fieldsOf(form, sel, unit, fs);
  const shown = fields.map((f) => f.text).join('\u0000');
  const [texts, setTexts] = useState(() => fields.map((f) => f.text));
  const [error, setError] = useState<string | null>(null);
  // The fields follow the root as it moves: adjusted while rendering (React's way to derive state from
  // changing props), so a drag commits once per move rather than once more from an effect.
  const [was, setWas] = useState(shown);
  if (was !== shown) {
    setWas(shown);
    setTexts(shown.split('\u0000'));
  }
  const real = root.im === 0;
  const st = workbenchStore.getState;

  const apply = (e: FormEvent) => {
    e.preventDefault();
    const r = readForm(form, texts, sel, unit, fs);
    if (!r.ok) return setError(r.message);
    setError(null);
    st().moveRoots(r.value);
  };
  return (
    <form className="pw-root-editor" onSubmit={apply} aria-label="Selected root by number">
      <span className={`pw-editor-kind pw-editor-${ref.kind}`}>
        {real ? `Real ${ref.kind}` : `${ref.kind === 'pole' ? 'Pole' : 'Zero'} pair`} {ref.index + 1}
      </span>
      {forms.length > 1 && (
        <select aria-label="Coordinates" value={form} onChange={(e) => setForm(e.target.value as RootForm)}>
          {forms.map((f) => (
            <option key={f.form} value={f.form}>
              {f.label}
            </option>
          ))}
        </select>
      )}
      {fields.map((f, i) => (
        <label key={`${form}${i}`} title={f.title}>
          {f.label}{' '}
          <input
            className="pw-num"
            inputMode="decimal"
            value={texts[i] ?? ''}
            onChange={(e) => setTexts((t) => t.map((x, j) => (j === i ? e.target.value : x)))}
          />
          {f.unit && ` ${f.unit}`}
        </label>
      ))}
      {form === 'polar' && !real && (
        <select
          aria-label="Angle unit"
          value={unit}
          onChange={(e) => st().setView({ angleUnit: e.target.value as AngleUnit })}
        >
          <option value="hz">Hz</option>
          <option value="deg">degrees</option>
          <option value="rad">rad/sample</option>
        </select>
      )}
      <button type="submit" title="Move the root to the typed values (Enter)">
        Set
      </button>
      <MultiplicityControl root={ref} multiplicity={root.multiplicity} onError={setError} />
      {real ? (
        <button
          type="button"
          title="Turn it into a conjugate pair just off the axis"
          onClick={() => st().splitRoot(ref)}
        >
          Split into pair
        </button>
      ) : (
        <button
          type="button"
          title="Merge the pair into a double real root at its real part"
          onClick={() => st().joinPair(ref)}
        >
          Join to real
        </button>
      )}
      <button type="button" className="pw-danger-button" onClick={() => st().deleteRoot(ref)}>
        Delete
      </button>
      {error && (
        <p className="pw-editor-error" role="alert">
          {error}
        </p>
      )}
    </form>
  );
}

/** The editor of the selected root (RootEditor shows it only when a root is selected). */
export function RootNumbers() {
  const sel = useWorkbench((s) => s.selection);
  const root = useWorkbench((s) =>
    sel ? (sel.kind === 'zero' ? s.design.zeros : s.design.poles)[sel.index] : undefined,
  );
  if (!sel || !root) return null;
  return <Editor key={`${sel.kind}${sel.index}`} target={sel} root={root} />;
}
