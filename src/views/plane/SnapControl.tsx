/** Choice of snapping for dragged roots, with the radius or frequency step it needs. */
import { useEffect, useState } from 'react';
import type { SnapMode } from '../../store/view.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { parseUserNumber } from './numberEntry.ts';

const MODES: [SnapMode, string][] = [
  ['none', 'off'],
  ['circle', 'unit circle'],
  ['real-axis', 'real axis'],
  ['radius', 'radius'],
  ['frequency', 'Hz grid'],
];

export function SnapControl() {
  const snap = useWorkbench((s) => s.view.snap);
  const radius = useWorkbench((s) => s.view.snapRadius);
  const stepHz = useWorkbench((s) => s.view.snapFrequencyHz);
  const param = snap === 'radius' ? radius : snap === 'frequency' ? stepHz : null;
  const [text, setText] = useState('');
  useEffect(() => setText(param === null ? '' : String(param)), [param]);
  const valid = (() => {
    const x = parseUserNumber(text);
    return x !== null && (snap === 'radius' ? x >= 0 : x > 0) ? x : null;
  })();
  const commit = () => {
    if (valid === null) return;
    workbenchStore.getState().setView(snap === 'radius' ? { snapRadius: valid } : { snapFrequencyHz: valid });
  };
  return (
    <span className="pw-snap">
      <label>
        Snap{' '}
        <select
          value={snap}
          onChange={(e) => workbenchStore.getState().setView({ snap: e.target.value as SnapMode })}
        >
          {MODES.map(([m, words]) => (
            <option key={m} value={m}>
              {words}
            </option>
          ))}
        </select>
      </label>
      {param !== null && (
        <label className={valid === null ? 'pw-invalid' : undefined}>
          <span className="pw-visually-hidden">{snap === 'radius' ? 'Snap radius' : 'Snap step in Hz'}</span>
          <input
            className="pw-num pw-num-short"
            value={text}
            inputMode="decimal"
            aria-invalid={valid === null}
            title={
              snap === 'radius'
                ? 'Radius roots snap to (≥ 0), Enter applies'
                : 'Frequency step in Hz (> 0), Enter applies'
            }
            onChange={(e) => setText(e.target.value)}
            onKeyDown={(e) => e.key === 'Enter' && commit()}
            onBlur={commit}
          />
          {snap === 'frequency' ? ' Hz' : ''}
        </label>
      )}
    </span>
  );
}
