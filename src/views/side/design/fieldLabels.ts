/** Labels and units of the Design form's fields, which depend on the kind and family chosen. */
import type { IirFamily } from '../../../core/design/index.ts';
import type { FieldKey, FormKind } from './designKinds.ts';

export interface FieldLabel {
  label: string;
  unit?: string;
  hint?: string;
}

const EDGE_MEANING: Record<IirFamily, string> = {
  butterworth: 'the −3 dB point',
  chebyshev1: 'where the ripple band ends',
  chebyshev2: 'where the stop band starts',
  elliptic: 'where the ripple band ends',
};

/** Label, unit and hint of one field for a kind and family. */
export function fieldLabel(key: FieldKey, kind: FormKind, family: IirFamily): FieldLabel {
  switch (key) {
    case 'f0':
      if (kind === 'harmonicNotch') return { label: 'Fundamental', unit: 'Hz' };
      if (kind === 'comb')
        return { label: 'Tooth spacing', unit: 'Hz', hint: 'fs divided by a whole number' };
      if (kind === 'lowShelf' || kind === 'highShelf') return { label: 'Midpoint', unit: 'Hz' };
      return { label: 'Centre', unit: 'Hz' };
    case 'bandwidth':
      return { label: '−3 dB width', unit: 'Hz' };
    case 'q':
      return { label: 'Q' };
    case 'cutoff':
      return { label: '−3 dB at', unit: 'Hz' };
    case 'harmonics':
      return { label: 'Harmonics', hint: '1 = the fundamental' };
    case 'gainDb':
      return { label: 'Gain', unit: 'dB' };
    case 'octaves':
      return { label: 'Width', unit: 'octaves' };
    case 'slope':
      return { label: 'Slope', hint: '1 = steepest without overshoot' };
    case 'order':
      return { label: 'Order' };
    case 'edgeLow':
    case 'edgeHigh':
      return {
        label: kind === 'bandpass' || kind === 'bandstop' ? 'Edges' : 'Edge',
        unit: 'Hz',
        hint: EDGE_MEANING[family],
      };
    case 'passLow':
    case 'passHigh':
      if (kind === 'lowpass') return { label: 'Pass band up to', unit: 'Hz' };
      if (kind === 'highpass') return { label: 'Pass band from', unit: 'Hz' };
      return { label: kind === 'bandpass' ? 'Pass band' : 'Pass band below / above', unit: 'Hz' };
    case 'stopLow':
    case 'stopHigh':
      if (kind === 'lowpass') return { label: 'Stop band from', unit: 'Hz' };
      if (kind === 'highpass') return { label: 'Stop band up to', unit: 'Hz' };
      return { label: kind === 'bandpass' ? 'Stop band below / above' : 'Stop band', unit: 'Hz' };
    case 'ripple':
      return { label: 'Pass-band loss at most', unit: 'dB' };
    case 'attenuation':
      return { label: 'Stop band down by at least', unit: 'dB' };
  }
}

/** Accessible names of a pair's two inputs. */
export function pairNames(first: FieldKey): [string, string] {
  const what = first === 'edgeLow' ? 'Edge' : first === 'passLow' ? 'Pass band edge' : 'Stop band edge';
  return [`${what} low`, `${what} high`];
}
