/** The zoom buttons of a plot, which arrive after the first paint with the zoom gestures (useAxisZoom.ts). */
import type { ZoomControlsProps } from './ZoomControls.tsx';
import { useZoomKit } from './useAxisZoom.ts';

export function LazyZoomControls(props: ZoomControlsProps) {
  const kit = useZoomKit();
  if (!kit) return <span className="pw-zoom-controls" aria-hidden="true" />;
  return <kit.ZoomControls {...props} />;
}
