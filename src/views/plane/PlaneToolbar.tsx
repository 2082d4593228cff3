/** The plane's toolbar: add roots, snapping, zoom, and the |H| shading switch. */
import type { MouseEvent } from 'react';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { fitView, HOME_VIEW, zoomAbout } from './geometry.ts';
import { SnapControl } from './SnapControl.tsx';
import type { Placement } from './usePlanePointer.ts';
import { ZOOM_STEP } from './usePlaneKeys.ts';

const ADDS: { kind: 'pole' | 'zero'; pair: boolean; words: string }[] = [
  { kind: 'pole', pair: true, words: 'Pole pair' },
  { kind: 'pole', pair: false, words: 'Real pole' },
  { kind: 'zero', pair: true, words: 'Zero pair' },
  { kind: 'zero', pair: false, words: 'Real zero' },
];

interface Props {
  placing: Placement | null;
  setPlacing: (p: Placement | null) => void;
  /** Adds a root at a spot in view at once (keyboard activation). */
  addAtDefault: (p: Placement) => void;
}

function zoom(factor: number) {
  const { view, setView } = workbenchStore.getState();
  const v = zoomAbout({ span: view.planeSpan, centre: view.planeCentre }, factor, view.planeCentre);
  setView({ planeSpan: v.span, planeCentre: v.centre });
}

function fitRoots() {
  const { design, setView } = workbenchStore.getState();
  const pts = [...design.zeros, ...design.poles].flatMap((r) => [r, { re: r.re, im: -r.im }]);
  const v = fitView(pts);
  setView({ planeSpan: v.span, planeCentre: v.centre });
}

export function PlaneToolbar({ placing, setPlacing, addAtDefault }: Props) {
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
        {ADDS.map(({ kind, pair, words }) => (
          <button
            key={words}
            type="button"
            className={`pw-add pw-add-${kind}`}
            aria-pressed={placing?.kind === kind && placing.pair === pair}
            title={`Click, then click in the plane to place a ${words.toLowerCase()} (Enter adds one in view)`}
            onClick={onAdd({ kind, pair })}
          >
            <span aria-hidden="true" className={`pw-add-glyph pw-add-glyph-${kind}`} />
            {words}
          </button>
        ))}
      </span>
      <span className="pw-plane-group" role="group" aria-label="Zoom">
        <button type="button" title="Zoom out (−)" aria-label="Zoom out" onClick={() => zoom(ZOOM_STEP)}>
          −
        </button>
        <button type="button" title="Zoom in (+)" aria-label="Zoom in" onClick={() => zoom(1 / ZOOM_STEP)}>
          +
        </button>
        <button type="button" title="Frame every root" onClick={fitRoots}>
          Fit roots
        </button>
        <button
          type="button"
          title="Show the whole unit circle"
          onClick={() =>
            workbenchStore.getState().setView({ planeSpan: HOME_VIEW.span, planeCentre: HOME_VIEW.centre })
          }
        >
          Unit circle
        </button>
      </span>
      <SnapControl />
      <label className="pw-shading-switch" title="Shade the plane by |H(z)| in dB">
        <input
          type="checkbox"
          checked={shading}
          onChange={(e) => workbenchStore.getState().setView({ shading: e.target.checked })}
        />{' '}
        |H| shading
      </label>
    </div>
  );
}
