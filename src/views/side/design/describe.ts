/** A designer description in words for the page: its name and its parameters with units. */
import type { DesignerSpec } from '../../../core/design/index.ts';
import { formatDb, formatHz, formatNumber } from '../../shared/format.ts';
import { FAMILIES, KINDS } from './designKinds.ts';

export interface DesignerWords {
  /** e.g. "Notch", "Butterworth low-pass". */
  title: string;
  /** Parameter name and value with its unit, in reading order. */
  params: [string, string][];
}

const hz = (v: number) => formatHz(v, 6);
const hzList = (v: readonly number[]) => v.map((x) => formatNumber(x, 6)).join('–') + ' Hz';

/** The title and parameters of a designer description. */
export function describeDesigner(spec: DesignerSpec): DesignerWords {
  const kindLabel = (k: string) => KINDS.find((x) => x.kind === k)?.label ?? k;
  const params: [string, string][] = [];
  const width = (s: { q?: number; bandwidthHz?: number }) => {
    if (s.bandwidthHz !== undefined) params.push(['−3 dB width', hz(s.bandwidthHz)]);
    if (s.q !== undefined) params.push(['Q', formatNumber(s.q, 6)]);
  };
  switch (spec.kind) {
    case 'notch':
    case 'peak':
      params.push(['f0', hz(spec.f0)]);
      width(spec);
      return { title: kindLabel(spec.kind), params };
    case 'harmonicNotch':
      params.push(['fundamental', hz(spec.f0)], ['harmonics', spec.harmonics.join(', ')]);
      width(spec);
      return { title: kindLabel(spec.kind), params };
    case 'comb':
      params.push(['spacing', hz(spec.f0)], ['teeth', spec.type === 'notch' ? 'notches' : 'peaks']);
      width(spec);
      return { title: kindLabel(spec.kind), params };
    case 'dcBlocker':
      params.push(['−3 dB at', hz(spec.cutoffHz)]);
      return { title: kindLabel(spec.kind), params };
    case 'peakingEq':
    case 'lowShelf':
    case 'highShelf':
      params.push(['f0', hz(spec.f0)], ['gain', formatDb(spec.gainDb, 6)]);
      if (spec.q !== undefined) params.push(['Q', formatNumber(spec.q, 6)]);
      if (spec.kind === 'peakingEq' && spec.bandwidthOctaves !== undefined)
        params.push(['width', `${formatNumber(spec.bandwidthOctaves, 6)} octaves`]);
      if (spec.kind !== 'peakingEq' && spec.slope !== undefined)
        params.push(['slope', formatNumber(spec.slope, 6)]);
      return { title: kindLabel(spec.kind), params };
    case 'iir': {
      const family = FAMILIES.find((f) => f.family === spec.family)?.label ?? spec.family;
      params.push(['order', spec.order === 'auto' ? 'estimated' : String(spec.order)]);
      if (spec.edgesHz) params.push(['edges', hzList(spec.edgesHz)]);
      if (spec.passbandHz) params.push(['pass band edge', hzList(spec.passbandHz)]);
      if (spec.stopbandHz) params.push(['stop band edge', hzList(spec.stopbandHz)]);
      if (spec.rippleDb !== undefined) params.push(['ripple', formatDb(spec.rippleDb, 6)]);
      if (spec.attenuationDb !== undefined) params.push(['attenuation', formatDb(spec.attenuationDb, 6)]);
      return { title: `${family} ${kindLabel(spec.response).toLowerCase()}`, params };
    }
  }
}
