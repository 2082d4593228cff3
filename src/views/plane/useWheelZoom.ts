/** Wheel (and trackpad pinch) zoom about the pointer; a non-passive listener so the page does not scroll. */
import { useEffect, type RefObject } from 'react';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { pixelToZ, zoomAbout, type PlaneScale } from './geometry.ts';

/** Zoom factor per pixel of wheel travel. */
const WHEEL_ZOOM_PER_PX = 0.0015;

export function useWheelZoom(
  svgRef: RefObject<SVGSVGElement | null>,
  scaleRef: RefObject<PlaneScale | null>,
) {
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const onWheel = (e: WheelEvent) => {
      const s = scaleRef.current;
      if (!s) return;
      e.preventDefault();
      const px = e.deltaMode === 1 ? 16 : e.deltaMode === 2 ? 400 : 1;
      const factor = Math.exp(e.deltaY * px * WHEEL_ZOOM_PER_PX);
      const rect = svg.getBoundingClientRect();
      const at = pixelToZ(s, e.clientX - rect.left, e.clientY - rect.top);
      const { view } = workbenchStore.getState();
      const v = zoomAbout({ span: view.planeSpan, centre: view.planeCentre }, factor, at);
      workbenchStore.getState().setView({ planeSpan: v.span, planeCentre: v.centre });
    };
    svg.addEventListener('wheel', onWheel, { passive: false });
    return () => svg.removeEventListener('wheel', onWheel);
  }, [svgRef, scaleRef]);
}
