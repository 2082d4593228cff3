/** View settings: how the panels show the design. None of this changes the filter. */
import type { RootRef } from '../core/model/design.ts';

export type SnapMode = 'none' | 'circle' | 'real-axis' | 'radius' | 'frequency';
export type TimeInput = 'impulse' | 'step' | 'sine' | 'noise';

export interface ViewSettings {
  /** Frequency view. */
  magnitudeScale: 'db' | 'linear';
  phaseMode: 'wrapped' | 'unwrapped';
  delayUnit: 'samples' | 'ms';
  frequencyAxis: 'linear' | 'log';
  /** Number of frequency points on [0, fs/2]. */
  responsePoints: number;
  /** Hold the frequency-view axes still while dragging. */
  holdScale: boolean;
  /** Time view. */
  timeInput: TimeInput;
  /** Sinusoid frequency for the time view, Hz. */
  sineHz: number;
  timeSamples: number;
  timeStyle: 'stems' | 'line';
  noiseSeed: number;
  /** Z-plane. */
  snap: SnapMode;
  /** Radius used by the 'radius' snap. */
  snapRadius: number;
  /** Frequency step in Hz used by the 'frequency' snap. */
  snapFrequencyHz: number;
  shading: boolean;
  /** Visible half-width of the plane around its centre, in z units; 1.3 shows the unit circle with margin. */
  planeSpan: number;
  planeCentre: { re: number; im: number };
  /** Angle unit for editing a root by number. */
  angleUnit: 'deg' | 'rad' | 'hz';
  /** Draw the fixed-point filter over the ideal one (plane, magnitude) while the design has implementation settings; absent = true. */
  showQuantized?: boolean;
}

export const defaultView: ViewSettings = {
  magnitudeScale: 'db',
  phaseMode: 'unwrapped',
  delayUnit: 'samples',
  frequencyAxis: 'linear',
  responsePoints: 2048,
  holdScale: false,
  timeInput: 'impulse',
  sineHz: 50,
  timeSamples: 256,
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
