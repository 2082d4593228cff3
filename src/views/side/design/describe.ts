/** A designer description in words for the page: its name and its parameters with units, from the registry. */
import { textFor, variantOf, type DesignerSpec, type Parameter } from '../../../core/design/index.ts';
import { formatDb, formatHz, formatNumber } from '../../shared/format.ts';

export interface DesignerWords {
  /** e.g. "Notch", "Butterworth low-pass". */
  title: string;
  /** Parameter name and value with its unit, in reading order. */
  params: [string, string][];
}

/** A parameter's value with its unit. */
function valueWords(p: Parameter, v: unknown): string {
  const n = (x: number) => formatNumber(x, 6);
  switch (p.type) {
    case 'order':
      return v === 'auto' ? 'estimated' : String(v);
    case 'choice':
      return p.options.find((o) => o.value === v)?.label ?? String(v);
    case 'list': {
      const xs = v as number[];
      return p.unit === 'Hz' ? `${xs.map(n).join('–')} Hz` : xs.join(', ');
    }
    case 'number': {
      const x = v as number;
      if (p.unit === 'Hz') return formatHz(x, 6);
      if (p.unit === 'dB') return formatDb(x, 6);
      return p.unit ? `${n(x)} ${p.unit}` : n(x);
    }
  }
}

/** The title and parameters of a designer description. */
export function describeDesigner(spec: DesignerSpec): DesignerWords {
  const found = variantOf(spec);
  if (!found) return { title: spec.kind, params: [] };
  const { entry, variant } = found;
  const given = spec as unknown as Record<string, unknown>;
  const params: [string, string][] = [];
  for (const p of entry.parameters) {
    if (p.key in (variant.fixed ?? {}) || p.listed === false || given[p.key] === undefined) continue;
    params.push([p.short ?? textFor(p.label, given) ?? p.key, valueWords(p, given[p.key])]);
  }
  return { title: variant.title?.(given) ?? variant.label, params };
}
