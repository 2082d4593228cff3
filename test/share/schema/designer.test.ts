import { describe, it, expect } from 'vitest';
import { DESIGNER_VARIANTS, runDesigner, type DesignerSpec } from '../../../src/core/design/index.ts';
import { designerSpec } from '../../../src/share/schema/designer.ts';

/** A full description of each variant at fs: its starting values, the first of each alternative pair, its fixed values. */
function startSpec(fs: number): DesignerSpec[] {
  return DESIGNER_VARIANTS.map(({ entry, variant }) => {
    const spec: Record<string, unknown> = { kind: entry.kind, fs, ...variant.start(fs), ...variant.fixed };
    for (const alt of entry.alternatives ?? []) delete spec[alt.keys[1]];
    return spec as DesignerSpec;
  });
}

describe('the designer schema, built from the registry', () => {
  it('accepts the description of every kind as it is, and the engine designs each', () => {
    for (const spec of startSpec(2000)) {
      expect(designerSpec.parse(spec), spec.kind).toEqual(spec);
      expect(runDesigner(spec).ok, JSON.stringify(spec)).toBe(true);
    }
  });

  it('refuses unknown kinds and choices, wrong types and lists beyond their limits', () => {
    const [notch] = startSpec(2000);
    const bad: unknown[] = [
      { ...notch, kind: 'fir' },
      { kind: 'comb', fs: 1000, f0: 50, type: 'hump', q: 3 },
      { kind: 'iir', fs: 1000, family: 'bessel', response: 'lowpass', order: 4 },
      { kind: 'iir', fs: 1000, family: 'butterworth', response: 'lowpass', order: 65 },
      { kind: 'iir', fs: 1000, family: 'butterworth', response: 'lowpass', order: 4, edgesHz: [1, 2, 3] },
      { kind: 'harmonicNotch', fs: 1000, f0: 50, harmonics: [0.5], q: 3 },
      { kind: 'notch', fs: 1000, f0: '50', q: 3 },
      { kind: 'notch', fs: 1000, q: 3 },
    ];
    for (const b of bad) expect(designerSpec.safeParse(b).success, JSON.stringify(b)).toBe(false);
  });

  it('takes an FIR family up to its own order limit, an IIR family only to 64', () => {
    const fir = { kind: 'iir', fs: 1000, family: 'equiripple', response: 'lowpass', order: 300 };
    const more = { passbandHz: [100], stopbandHz: [150], rippleDb: 1, attenuationDb: 60 };
    expect(designerSpec.safeParse({ ...fir, ...more }).success).toBe(true);
    expect(designerSpec.safeParse({ ...fir, order: 513 }).success).toBe(false);
    const iir = designerSpec.safeParse({ ...fir, family: 'butterworth', edgesHz: [100] });
    expect(iir.success).toBe(false);
    expect(iir.error?.issues[0]?.path).toEqual(['order']);
  });
});
