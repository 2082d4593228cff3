/** What the plots' zoom needs beyond the first view: the gestures and the zoom buttons, one chunk. */
export { axisZoomGestures } from './axisZoomGestures.ts';
export { ZoomControls } from './ZoomControls.tsx';
