/**
 * The z-plane panel: toolbar, the plane (|H| shading canvas under an SVG of grid and roots) and the
 * number strip for the selected root. Roots drag with any pointer, and the plane works by keyboard alone.
 */
import { useCallback, useMemo, useRef, useState, type FocusEvent } from 'react';
import { selectStability } from '../../store/derived.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';
import { planeScale, type PlaneScale } from './geometry.ts';
import { PlaneGrid } from './PlaneGrid.tsx';
import { PLANE_OVERLAYS } from './overlays.ts';
import { PlaneToolbar } from './PlaneToolbar.tsx';
import { RootEditor } from './RootEditor.tsx';
import { RootsLayer } from './RootsLayer.tsx';
import { SurfaceCanvas } from './SurfaceCanvas.tsx';
import { SurfaceLegend } from './SurfaceLegend.tsx';
import { useElementSize } from '../chart/useElementSize.ts';
import { NUDGE_FINE_STEP, NUDGE_STEP } from './nudge.ts';
import { usePlaneKeys } from './usePlaneKeys.ts';
import { rootTargetOf } from './rootTarget.ts';
import { usePlanePointer, type Placement } from './usePlanePointer.ts';
import { useWheelZoom } from './useWheelZoom.ts';
import { ZoomButtons } from './ZoomButtons.tsx';
import './plane.css';

export function ZPlanePanel() {
  const boxRef = useRef<HTMLDivElement>(null);
  const svgRef = useRef<SVGSVGElement>(null);
  const scaleRef = useRef<PlaneScale | null>(null);
  const placingRef = useRef<Placement | null>(null);
  const [placing, setPlacingState] = useState<Placement | null>(null);
  const setPlacing = useCallback((p: Placement | null) => {
    placingRef.current = p;
    setPlacingState(p);
  }, []);

  const { width, height } = useElementSize(boxRef);
  const span = useWorkbench((s) => s.view.planeSpan);
  const centre = useWorkbench((s) => s.view.planeCentre);
  const shading = useWorkbench((s) => s.view.shading);
  const zeros = useWorkbench((s) => s.design.zeros);
  const poles = useWorkbench((s) => s.design.poles);
  const fs = useWorkbench((s) => s.design.sampleRate);
  const selection = useWorkbench((s) => s.selection);
  const unstable = useWorkbench((s) => selectStability(s)?.verdict === 'unstable');

  const scale = useMemo(() => planeScale({ span, centre }, width, height), [span, centre, width, height]);
  scaleRef.current = scale;

  const pointer = usePlanePointer({ svgRef, scaleRef, placingRef, onPlaced: () => setPlacing(null) });
  const [keyNote, say] = useState<string | null>(null);
  const onKeyDown = usePlaneKeys({
    svgRef,
    cancelPlacing: () => (placingRef.current ? (setPlacing(null), true) : false),
    say,
  });
  // Tab (or N/P, or a click) onto a root selects it, so the number strip and the keys act on it.
  const onFocus = (e: FocusEvent) => {
    const hit = rootTargetOf(e.target);
    const sel = workbenchStore.getState().selection;
    if (hit && !hit.mirror && !(sel && sel.kind === hit.ref.kind && sel.index === hit.ref.index))
      workbenchStore.getState().select(hit.ref);
  };
  useWheelZoom(svgRef, scaleRef);

  // Stable, so the memoised toolbar skips the re-render every root move brings to this panel.
  const addAtDefault = useCallback(
    (p: Placement) => {
      const { view, addRoot } = workbenchStore.getState();
      const c = view.planeCentre;
      const s = view.planeSpan;
      addRoot(p.kind, { re: c.re + 0.25 * s, im: p.pair ? Math.abs(c.im) + 0.35 * s : 0, multiplicity: 1 });
      setPlacing(null);
      requestAnimationFrame(() =>
        svgRef.current?.querySelector<SVGGElement>('g[aria-pressed="true"]')?.focus(),
      );
    },
    [setPlacing],
  );

  const ready = width > 0 && height > 0;
  return (
    <section aria-label="z-plane" className="pw-panel pw-plane" onKeyDown={onKeyDown}>
      <PlaneToolbar placing={placing} setPlacing={setPlacing} addAtDefault={addAtDefault} />
      <div ref={boxRef} className={`pw-plane-box${placing ? ' pw-placing' : ''}`}>
        {ready && shading && <SurfaceCanvas scale={scale} />}
        <svg
          ref={svgRef}
          className="pw-plane-svg"
          width={width}
          height={height}
          tabIndex={0}
          role="application"
          aria-roledescription="z-plane"
          aria-label="z-plane: Tab reaches the roots, N and P walk them; arrows move the selected root (or pan when none is selected), Page Up/Down step its radius, comma and period its frequency; + and − zoom"
          onFocus={onFocus}
          {...pointer}
        >
          {ready && <PlaneGrid scale={scale} sampleRate={fs} unstable={unstable} />}
          {ready && (
            <g className="pw-plane-overlays" pointerEvents="none">
              {PLANE_OVERLAYS.map(({ id, Layer }) => (
                <Layer key={id} scale={scale} />
              ))}
            </g>
          )}
          {ready && (
            <RootsLayer zeros={zeros} poles={poles} sampleRate={fs} selection={selection} scale={scale} />
          )}
        </svg>
        {shading && <SurfaceLegend />}
        <ZoomButtons />
        <p className="pw-plane-hint" aria-live="polite">
          {placing
            ? `Click in the plane to place a ${placing.pair ? `${placing.kind} pair` : `real ${placing.kind}`} — Esc cancels`
            : (keyNote ??
              `N/P roots · arrows ${NUDGE_STEP} (Shift ${NUDGE_FINE_STEP}) · PgUp/Dn radius · , . freq`)}
        </p>
      </div>
      <RootEditor />
    </section>
  );
}
