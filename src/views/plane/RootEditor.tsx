/**
 * The strip under the plane: the selected root by number (radius and angle, or real and imaginary parts),
 * its multiplicity, split/join and delete. Enter applies the typed position as one undo step; text that is
 * not a number shows a message and changes nothing.
 */
import { useState, type FormEvent } from 'react';
import type { Root } from '../../core/types.ts';
import type { RootRef } from '../../core/model/design.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { formatNumber } from '../shared/format.ts';
import { MultiplicityControl } from './MultiplicityControl.tsx';
import { parseCartesian, parsePolar, parseReal, radiansToAngle, type AngleUnit } from './numberEntry.ts';
import { NUDGE_FINE_STEP, NUDGE_STEP } from './nudge.ts';

type Form = 'polar' | 'cartesian';
const FIELD_DIGITS = 6;
const fmt = (x: number) => formatNumber(x, FIELD_DIGITS);

/** Text of the two fields for a root in a form and angle unit. */
function fieldsOf(root: Root, form: Form, unit: AngleUnit, fs: number): [string, string] {
  if (form === 'cartesian' || root.im === 0) return [fmt(root.re), fmt(root.im)];
  return [fmt(Math.hypot(root.re, root.im)), fmt(radiansToAngle(Math.atan2(root.im, root.re), unit, fs))];
}

function Editor({ target: ref, root }: { target: RootRef; root: Root }) {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const unit = useWorkbench((s) => s.view.angleUnit);
  const [form, setForm] = useState<Form>('polar');
  const [f0, f1] = fieldsOf(root, form, unit, fs);
  const [a, setA] = useState(f0);
  const [b, setB] = useState(f1);
  const [error, setError] = useState<string | null>(null);
  // The fields follow the root as it moves: adjusted while rendering (React's way to derive state from
  // changing props), so a drag commits once per move rather than once more from an effect.
  const [shown, setShown] = useState<[string, string]>([f0, f1]);
  if (shown[0] !== f0 || shown[1] !== f1) {
    setShown([f0, f1]);
    setA(f0);
    setB(f1);
  }
  const real = root.im === 0;
  const st = workbenchStore.getState;

  const apply = (e: FormEvent) => {
    e.preventDefault();
    if (real) {
      const x = parseReal(a);
      if (!x.ok) return setError(x.message);
      setError(null);
      return st().moveRoot(ref, x.value, 0);
    }
    const p = form === 'polar' ? parsePolar(a, b, unit, fs) : parseCartesian(a, b);
    if (!p.ok) return setError(p.message);
    setError(null);
    st().moveRoot(ref, p.value.re, p.value.im);
  };
  const polar = form === 'polar' && !real;
  return (
    <form className="pw-root-editor" onSubmit={apply} aria-label="Selected root by number">
      <span className={`pw-editor-kind pw-editor-${ref.kind}`}>
        {real ? `Real ${ref.kind}` : `${ref.kind === 'pole' ? 'Pole' : 'Zero'} pair`} {ref.index + 1}
      </span>
      {!real && (
        <select aria-label="Coordinates" value={form} onChange={(e) => setForm(e.target.value as Form)}>
          <option value="polar">radius, angle</option>
          <option value="cartesian">re, im</option>
        </select>
      )}
      <label>
        {real ? 'z' : polar ? 'r' : 're'}{' '}
        <input className="pw-num" inputMode="decimal" value={a} onChange={(e) => setA(e.target.value)} />
      </label>
      {!real && (
        <label>
          {polar ? '∠' : 'im'}{' '}
          <input className="pw-num" inputMode="decimal" value={b} onChange={(e) => setB(e.target.value)} />
        </label>
      )}
      {polar && (
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
      <button type="submit" title="Move the root to the typed position (Enter)">
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

/** The strip: the editor for the selected root, or a hint when none is selected. */
export function RootEditor() {
  const sel = useWorkbench((s) => s.selection);
  const root = useWorkbench((s) =>
    sel ? (sel.kind === 'zero' ? s.design.zeros : s.design.poles)[sel.index] : undefined,
  );
  if (!sel || !root) {
    return (
      <p className="pw-root-editor pw-root-editor-empty">
        Select a root (click, or Tab to it) to edit it by number. Arrow keys nudge it by {NUDGE_STEP} (Shift
        or Alt: {NUDGE_FINE_STEP}); Delete removes it.
      </p>
    );
  }
  return <Editor key={`${sel.kind}${sel.index}`} target={sel} root={root} />;
}
