/**
 * View settings: how the panels show the design. None of this changes the filter. The part that travels
 * with a design (DocumentView) is defined with the design model in src/core/model/view.ts.
 */
import type { Complex } from '../core/types.ts';
import type { RootRef } from '../core/model/design.ts';
import type { DocumentView } from '../core/model/view.ts';

export type SnapMode = 'none' | 'circle' | 'real-axis' | 'radius' | 'frequency';

export interface ViewSettings extends DocumentView {
  /** Hold the frequency-view axes still while dragging. */
  holdScale: boolean;
  /** Z-plane. */
  snap: SnapMode;
  /** Radius used by the 'radius' snap. */
  snapRadius: number;
  /** Frequency step in Hz used by the 'frequency' snap. */
  snapFrequencyHz: number;
  shading: boolean;
  /** Visible half-width of the plane around its centre, in z units; 1.3 shows the unit circle with margin. */
  planeSpan: number;
  planeCentre: Complex;
  /** Angle unit for editing a root by number. */
  angleUnit: 'deg' | 'rad' | 'hz';
  /** Draw the fixed-point filter over the ideal one (plane, magnitude) while the design has implementation settings; absent = true. */
  showQuantized?: boolean;
  /**
   * Pixel columns of the frequency plots, as the plot last measured them (absent before it is drawn): during a
   * root drag the response is computed on about one point per column (see derived.ts selectResponse).
   */
  responseColumns?: number;
}

export const defaultView: ViewSettings = {
  magnitudeScale: 'db',
  phaseMode: 'unwrapped',
  delayUnit: 'samples',
  frequencyAxis: 'linear',
  responsePoints: 2048,
  frequencySpan: null,
  holdScale: false,
  timeInput: 'impulse',
  sineHz: 50,
  timeSamples: 256,
  timeSpan: null,
  timeStyle: 'stems',
  noiseSeed: 1,
  snap: 'none',
  snapRadius: 0.9,
  snapFrequencyHz: 10,
  shading: false,
  planeSpan: 1.3,
  planeCentre: { re: 0, im: 0 },
  angleUnit: 'hz',
};

export interface ViewState {
  view: ViewSettings;
  selection: RootRef | null;
  /** True while a pointer drag is in progress (views may draw coarser then). */
  dragging: boolean;
}
