/** Zoom controls floating in the plane's corner: in, out, frame every root, whole unit circle. */
import { workbenchStore } from '../../store/useWorkbench.ts';
import { fitView, HOME_VIEW, zoomAbout } from './geometry.ts';
import { ZOOM_STEP } from './usePlaneKeys.ts';

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

function home() {
  workbenchStore.getState().setView({ planeSpan: HOME_VIEW.span, planeCentre: HOME_VIEW.centre });
}

export function ZoomButtons() {
  return (
    <div className="pw-zoom" role="group" aria-label="Zoom">
      <button
        type="button"
        aria-label="Zoom in"
        title="Zoom in (+; or the mouse wheel)"
        onClick={() => zoom(1 / ZOOM_STEP)}
      >
        +
      </button>
      <button type="button" aria-label="Zoom out" title="Zoom out (−)" onClick={() => zoom(ZOOM_STEP)}>
        −
      </button>
      <button type="button" aria-label="Fit roots" title="Frame every root" onClick={fitRoots}>
        <svg width="14" height="14" viewBox="0 0 14 14" aria-hidden="true">
          <path d="M1 5V1h4M9 1h4v4M13 9v4H9M5 13H1V9" />
        </svg>
      </button>
      <button type="button" aria-label="Whole unit circle" title="Show the whole unit circle" onClick={home}>
        <svg width="14" height="14" viewBox="0 0 14 14" aria-hidden="true">
          <circle cx="7" cy="7" r="5.5" />
        </svg>
      </button>
    </div>
  );
}
