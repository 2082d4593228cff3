import { describe, it, expect } from 'vitest';
import { evaluateMask, maskFromDesigner, maskFromRequirement } from '../../../src/core/mask/index.ts';
import { requirementMargin, runDesigner, type IirSpec } from '../../../src/core/design/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const FS = 1000;
const cases: Omit<IirSpec, 'kind' | 'fs' | 'family' | 'order'>[] = [
  { response: 'lowpass', passbandHz: [120], stopbandHz: [200], rippleDb: 1, attenuationDb: 60 },
  { response: 'highpass', passbandHz: [200], stopbandHz: [120], rippleDb: 0.5, attenuationDb: 50 },
  { response: 'bandpass', passbandHz: [150, 250], stopbandHz: [100, 320], rippleDb: 1, attenuationDb: 40 },
  { response: 'bandstop', passbandHz: [100, 320], stopbandHz: [150, 250], rippleDb: 1, attenuationDb: 40 },
];

describe('maskFromRequirement', () => {
  it('lays out the regions of each band shape', () => {
    const shapes = cases.map((c) => {
      const m = maskFromRequirement({ ...(c as Required<typeof c>), fs: FS });
      return m.regions.map((r) => [r.id, r.fromHz, r.toHz, r.lowerDb ?? null, r.upperDb ?? null]);
    });
    expect(shapes).toEqual([
      [
        ['pass', 0, 120, -1, 1],
        ['stop', 200, 500, null, -60],
      ],
      [
        ['stop', 0, 120, null, -50],
        ['pass', 200, 500, -0.5, 0.5],
      ],
      [
        ['stop-1', 0, 100, null, -40],
        ['pass', 150, 250, -1, 1],
        ['stop-2', 320, 500, null, -40],
      ],
      [
        ['pass-1', 0, 100, -1, 1],
        ['stop', 150, 250, null, -40],
        ['pass-2', 320, 500, -1, 1],
      ],
    ]);
  });

  it('a stated upper pass limit replaces the +ripple ceiling of every pass region', () => {
    const m = maskFromRequirement({ ...(cases[3] as Required<IirSpec>), fs: FS }, { passUpperDb: 0.1 });
    expect(m.regions.filter((r) => r.kind === 'pass').map((r) => r.upperDb)).toEqual([0.1, 0.1]);
  });

  for (const family of ['butterworth', 'chebyshev1', 'chebyshev2', 'elliptic'] as const) {
    it(`judges least-order ${family} designs as requirementMargin does, and passes them`, () => {
      for (const c of cases) {
        const spec: IirSpec = { kind: 'iir', fs: FS, family, order: 'auto', ...c };
        const r = runDesigner(spec);
        if (!r.ok) throw new Error(r.error.message);
        const mask = maskFromDesigner(spec);
        expect(mask).not.toBeNull();
        const verdict = evaluateMask(mask!, r.value.zpk, FS);
        const margin = requirementMargin(r.value.zpk, { ...(c as Required<typeof c>), fs: FS });
        const pass = Math.min(
          ...verdict.regions.filter((x) => x.id.startsWith('pass')).map((x) => x.worstMarginDb),
        );
        const stop = Math.min(
          ...verdict.regions.filter((x) => x.id.startsWith('stop')).map((x) => x.worstMarginDb),
        );
        // Two searches of the same quantity (different grids and refinements) must agree closely.
        expectClose(pass, margin.passMarginDb, { abs: 1e-7 }, `${family} ${c.response} pass`);
        expectClose(stop, margin.stopMarginDb, { abs: 1e-7 }, `${family} ${c.response} stop`);
        expect(verdict.pass, `${family} ${c.response}`).toBe(true);
      }
    });
  }

  it('a Chebyshev I design has exactly its ripple: pass margin 0 at the edge, and still passes', () => {
    // Chebyshev I: the pass-band loss equals the ripple at the pass-band edge (common practice).
    const spec: IirSpec = {
      kind: 'iir',
      fs: FS,
      family: 'chebyshev1',
      order: 5,
      edgesHz: [120],
      ...cases[0]!,
    };
    const r = runDesigner(spec);
    if (!r.ok) throw new Error(r.error.message);
    const verdict = evaluateMask(maskFromDesigner(spec)!, r.value.zpk, FS);
    const pass = verdict.regions.find((x) => x.id === 'pass')!;
    expectClose(pass.worstMarginDb, 0, { abs: 1e-9 }, 'ripple margin');
    expect(pass.pass).toBe(true);
  });

  it('gives no mask for designers without a requirement', () => {
    expect(maskFromDesigner({ kind: 'peak', fs: FS, f0: 50, q: 30 })).toBeNull();
    expect(
      maskFromDesigner({
        kind: 'iir',
        fs: FS,
        family: 'butterworth',
        response: 'lowpass',
        order: 4,
        edgesHz: [100],
      }),
    ).toBeNull();
  });
});

describe('the mask a notching designer implies', () => {
  it('a notch gets a stop region at its centre and flat pass bands clear of it', () => {
    const mask = maskFromDesigner({ kind: 'notch', fs: 2000, f0: 50, bandwidthHz: 2 })!;
    const stop = mask.regions.filter((r) => r.kind === 'stop');
    const pass = mask.regions.filter((r) => r.kind === 'pass');
    expect(stop).toHaveLength(1);
    expect(stop[0]!.fromHz).toBeLessThan(50);
    expect(stop[0]!.toHz).toBeGreaterThan(50);
    // No pass region may reach into the notch's own −3 dB width (50 ± 1 Hz).
    for (const r of pass) expect(r.toHz <= 49 || r.fromHz >= 51).toBe(true);
    expect(pass.some((r) => r.fromHz === 0)).toBe(true);
    expect(pass.some((r) => r.toHz === 1000)).toBe(true);
  });
});
