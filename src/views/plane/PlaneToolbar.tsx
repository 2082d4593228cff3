/** The plane's toolbar: add roots, snapping, and the |H| shading switch (zoom floats on the plane). */
import { memo, type MouseEvent } from 'react';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { PictureMenu } from '../pictures/PictureMenu.tsx';
import { SnapControl } from './SnapControl.tsx';
import type { Placement } from './usePlanePointer.ts';

/** The four add buttons: the marker glyph says pole or zero, the word says pair or real. */
const ADDS: { kind: 'pole' | 'zero'; pair: boolean; words: string; short: string }[] = [
  { kind: 'pole', pair: true, words: 'Pole pair', short: 'pair' },
  { kind: 'pole', pair: false, words: 'Real pole', short: 'real' },
  { kind: 'zero', pair: true, words: 'Zero pair', short: 'pair' },
  { kind: 'zero', pair: false, words: 'Real zero', short: 'real' },
];

interface Props {
  placing: Placement | null;
  setPlacing: (p: Placement | null) => void;
  /** Adds a root at a spot in view at once (keyboard activation). */
  addAtDefault: (p: Placement) => void;
}

export const PlaneToolbar = memo(function PlaneToolbar({ placing, setPlacing, addAtDefault }: Props) {
  const shading = useWorkbench((s) => s.view.shading);
  const onAdd = (p: Placement) => (e: MouseEvent) => {
    // A click arms placing (next click in the plane puts the root there); Enter/Space adds one in view.
    if (e.detail === 0) addAtDefault(p);
    else setPlacing(placing?.kind === p.kind && placing.pair === p.pair ? null : p);
  };
  return (
    <div className="pw-plane-toolbar" role="toolbar" aria-label="z-plane tools">
      <span className="pw-plane-group" role="group" aria-label="Add a root">
        <span className="pw-plane-group-title">Add</span>
        {ADDS.map(({ kind, pair, words, short }) => (
          <button
            key={words}
            type="button"
            className={`pw-add pw-add-${kind}`}
            aria-label={words}
            aria-pressed={placing?.kind === kind && placing.pair === pair}
            title={`Click, then click in the plane to place a ${words.toLowerCase()} (Enter adds one in view)`}
            onClick={onAdd({ kind, pair })}
          >
            <span aria-hidden="true" className={`pw-add-glyph pw-add-glyph-${kind}`} />
            {short}
          </button>
        ))}
      </span>
      <label className="pw-shading-switch" title="Shade the plane by |H(z)| in dB">
        <input
          type="checkbox"
          checked={shading}
          onChange={(e) => workbenchStore.getState().setView({ shading: e.target.checked })}
        />{' '}
        |H| shading
      </label>
      <SnapControl />
      <PictureMenu view="plane" />
    </div>
  );
});
