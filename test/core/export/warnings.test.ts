/** Export warnings: what makes a quantized implementation unsafe, carried in every format. */
import { describe, expect, it } from 'vitest';
import { EQUIRIPPLE_LOWPASS_8K } from '../../helpers/firDesigns.ts';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runDesigner, type DesignerSpec } from '../../../src/core/design/index.ts';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  type ImplementationSettings,
} from '../../../src/core/fixed/index.ts';
import {
  exportC,
  exportCsv,
  exportFirC,
  exportFirCsv,
  exportFirJson,
  exportJson,
  exportWarnings,
  firExportWarnings,
} from '../../../src/core/export/index.ts';
import {
  buildFirImplementation,
  DEFAULT_FIR_SETTINGS,
  firTapsOf,
  type FirSettings,
} from '../../../src/core/fixed/fir.ts';
import { maskFromDesigner } from '../../../src/core/mask/index.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';
import type { Zpk } from '../../../src/core/types.ts';
import { emptyDesign } from '../../../src/core/model/design.ts';
import { addDesignerPart, maskOfParts } from '../../../src/core/model/compose.ts';

function designed(spec: DesignerSpec): Zpk {
  const r = runDesigner(spec);
  if (!r.ok) throw new Error(r.error.message);
  return r.value.zpk;
}
function impl(zpk: Zpk, fs: number, patch: Partial<ImplementationSettings> = {}) {
  const r = buildImplementation(zpk, fs, { ...DEFAULT_IMPLEMENTATION, ...patch });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}
const keys = (ws: { key: string }[]) => ws.map((w) => w.key).sort();

const HUM: DesignerSpec = { kind: 'harmonicNotch', fs: 2000, f0: 50, harmonics: [1, 3, 5], bandwidthHz: 2 };

describe('exportWarnings', () => {
  it('a well-quantized design has none', () => {
    expect(exportWarnings(impl(designed(HUM), 2000, { wordLength: 24 }), maskFromDesigner(HUM)!)).toEqual([]);
  });

  it('4th-order Butterworth at 20 Hz, fs 48 kHz, 16 bits: all-zero numerators and poles exactly at z = 1', () => {
    // common practice: a cutoff at fs/2400 puts the numerator near (πfc/fs)² ≈ 1.7e-6, below half an LSB of
    // Q1.14 (3.1e-5), and the poles within about 2πfc/fs ≈ 0.003 of z = 1, where the Q1.14 grid rounds onto it.
    const i = impl(
      designed({
        kind: 'iir',
        family: 'butterworth',
        response: 'lowpass',
        order: 4,
        edgesHz: [20],
        fs: 48000,
      }),
      48000,
      { wordLength: 16 },
    );
    const ws = exportWarnings(i);
    expect(keys(ws)).toEqual([
      'numerator-all-zero',
      'numerator-all-zero',
      'poles-on-unit-circle',
      'poles-on-unit-circle',
      'quantized-unstable',
    ]);
    // The check reads the codes themselves: every numerator code 0, and 1 + a1 + a2 = 0 exactly.
    for (const [k, c] of i.quantized.codes.entries()) {
      expect(c.b).toEqual([0, 0, 0]);
      const [, , , , a1, a2] = i.quantized.sections[k]!;
      expect(1 + a1 + a2).toBe(0);
    }
    expect(ws.find((w) => w.key === 'poles-on-unit-circle')!.where).toBe('section 0');
  });

  it('a pole pair placed exactly on the circle by its codes is named, not only called marginal', () => {
    // a2 = 1 exactly: the pair 0.6 ± 0.8j has radius 1 (common practice: |p|² = a2 for a complex pair).
    const i = impl(tfToZpk({ b: [1, 0, 0], a: [1, -1.2, 1] }), 1000, {
      scaling: 'none',
      wordLength: 16,
      fractionBits: 14,
    });
    const ws = exportWarnings(i);
    expect(keys(ws)).toEqual(['poles-on-unit-circle']);
    expect(ws[0]!.message).toMatch(/a pair at radius 1/);
  });

  it('Q0.15 clamps the three hum sections to identical codes', () => {
    const i = impl(designed(HUM), 2000, { wordLength: 16, fractionBits: 15 });
    const ws = exportWarnings(i);
    expect(keys(ws)).toEqual([
      'coefficients-clamped',
      'coefficients-clamped',
      'coefficients-clamped',
      'identical-clamped-sections',
    ]);
    expect(ws.find((w) => w.key === 'identical-clamped-sections')!.where).toBe('sections 0, 1, 2');
    // Repeated sections that were not clamped (a double root pair) are legitimate and not warned about.
    const twice = impl(
      {
        zeros: [{ re: 0.9, im: 0.3, multiplicity: 2 }],
        poles: [{ re: 0.8, im: 0.3, multiplicity: 2 }],
        gain: 1,
      },
      1000,
      { wordLength: 24 },
    );
    expect(exportWarnings(twice)).toEqual([]);
  });

  it('the quantized filter failing the mask is a warning naming the region, the margin and where', () => {
    const i = impl(designed(HUM), 2000, { wordLength: 16 });
    const ws = exportWarnings(i, maskFromDesigner(HUM)!);
    expect(keys(ws)).toEqual(['mask-fails-quantized']);
    expect(ws[0]!.where).toBe('mask region "notch-50"');
    expect(ws[0]!.message).toMatch(
      /16-bit Q1\.14\) fails the requirement mask in 1 of \d+ regions, worst by [\d.]+ dB at 49\.9\d* Hz/,
    );
  });
});

describe('warnings inside the exported files', () => {
  const bad = impl(
    designed({ kind: 'iir', family: 'butterworth', response: 'lowpass', order: 4, edgesHz: [20], fs: 48000 }),
    48000,
    { wordLength: 16 },
  );
  const good = impl(designed(HUM), 2000, { wordLength: 24 });

  it('JSON has a warnings array (empty when there are none)', () => {
    expect(JSON.parse(exportJson(good)).warnings).toEqual([]);
    const doc = JSON.parse(exportJson(bad));
    expect(doc.warnings).toHaveLength(5);
    expect(Object.keys(doc.warnings[0]).sort()).toEqual(['key', 'message', 'where']);
  });

  it('CSV starts with the count and one comment line per warning', () => {
    expect(exportCsv(good).split('\n')[0]).toBe('# warnings: 0');
    const lines = exportCsv(bad).split('\n');
    expect(lines[0]).toBe('# warnings: 5');
    expect(lines.slice(1, 6).every((l) => l.startsWith('# warning: ['))).toBe(true);
  });

  it('C: a firmware build refuses the header with a static assertion on the warning count', () => {
    // gcc, C11 _Static_assert: the header with warnings must not compile, the clean one must.
    const dir = mkdtempSync(join(tmpdir(), 'pw-warn-c-'));
    const build = (header: string) => {
      writeFileSync(join(dir, 'filter.h'), header);
      writeFileSync(
        join(dir, 'main.c'),
        '#include "filter.h"\n_Static_assert(PW_FILTER_WARNINGS == 0, "warnings");\nint main(void) { return 0; }\n',
      );
      try {
        execFileSync('gcc', ['-std=c11', '-Wall', '-c', join(dir, 'main.c'), '-o', join(dir, 'main.o')], {
          stdio: 'pipe',
        });
        return 'compiled';
      } catch (e) {
        return String((e as { stderr: Buffer }).stderr);
      }
    };
    expect(build(exportC(good))).toBe('compiled');
    expect(build(exportC(bad))).toMatch(/static assertion failed: "warnings"/);
    expect(exportC(bad)).toMatch(/^\/\*\n \* pw_filter\.h - .*\n \*\n \* WARNINGS \(5\)/);
  });
});

describe('exportWarnings on FIR and composed designs', () => {
  it('an equiripple FIR that meets its two-sided mask ideally fails it quantized to 8 bits, and every format says so', () => {
    const spec = EQUIRIPPLE_LOWPASS_8K;
    const zpk = designed(spec);
    expect(zpk.poles.every((p) => p.re === 0 && p.im === 0)).toBe(true); // an FIR: poles at the origin only
    const mask = maskFromDesigner(spec)!;
    expect(mask.regions.find((r) => r.kind === 'pass')).toMatchObject({ lowerDb: -0.5, upperDb: 0.5 });
    // 24 bits keep it within the mask; 8 bits cannot hold 60 dB of stop band (common practice: about 6 dB
    // per bit of coefficient word, less for a cascade of many sections).
    expect(exportWarnings(impl(zpk, 8000, { wordLength: 24 }), mask)).toEqual([]);
    const eight = impl(zpk, 8000, { wordLength: 8 });
    const ws = exportWarnings(eight, mask);
    expect(keys(ws)).toContain('mask-fails-quantized');
    expect(exportC(eight, { mask })).toMatch(/mask-fails-quantized/);
    expect(JSON.parse(exportJson(eight, { mask })).warnings.map((w: { key: string }) => w.key)).toContain(
      'mask-fails-quantized',
    );
    expect(exportCsv(eight, { mask })).toMatch(/^#.*mask-fails-quantized/m);
  });

  it('a composed design (low-pass with a notch part) is judged against the mask its parts imply', () => {
    const FS = 1000;
    const lp = {
      kind: 'iir',
      family: 'butterworth',
      response: 'lowpass',
      order: 6,
      edgesHz: [125],
      passbandHz: [100],
      stopbandHz: [300],
      rippleDb: 1,
      attenuationDb: 40,
      fs: FS,
    } as unknown as DesignerSpec;
    const notch: DesignerSpec = { kind: 'notch', f0: 50, bandwidthHz: 4, fs: FS };
    const design = addDesignerPart(
      {
        ...emptyDesign(FS),
        ...(() => {
          const z = designed(lp);
          return {
            zeros: z.zeros,
            poles: z.poles,
            gainRule: { kind: 'fixed' as const, value: z.gain },
            designer: lp,
          };
        })(),
      },
      notch,
    );
    if (!design.ok) throw new Error(design.error.message);
    const d = design.value.design;
    const mask = maskOfParts(d)!;
    const zpk = { zeros: d.zeros, poles: d.poles, gain: (d.gainRule as { value: number }).value };
    expect(exportWarnings(impl(zpk, FS, { wordLength: 24 }), mask)).toEqual([]);
    const ws = exportWarnings(impl(zpk, FS, { wordLength: 8 }), mask);
    expect(keys(ws)).toContain('mask-fails-quantized');
  });
});

describe('firExportWarnings: an FIR exported as its taps', () => {
  const spec = EQUIRIPPLE_LOWPASS_8K;
  const taps = firTapsOf(designed(spec))!;
  const mask = maskFromDesigner(spec)!;
  const fir = (patch: Partial<FirSettings>) => {
    const r = buildFirImplementation(taps, 8000, { ...DEFAULT_FIR_SETTINGS, ...patch });
    if (!r.ok) throw new Error(r.error.message);
    return r.value;
  };

  it('judges the quantized taps against the mask: 24-bit taps pass, 8-bit taps fail, in every format', () => {
    expect(taps.length).toBeGreaterThan(20);
    // 24-bit taps stay within the 60 dB stop band and the ±0.5 dB pass band; 8 bits cannot hold 60 dB
    // (common practice: about 6 dB of stop band per bit of coefficient word).
    expect(firExportWarnings(fir({ wordLength: 24, accumulatorBits: 56 }), mask)).toEqual([]);
    const eight = fir({ wordLength: 8 });
    expect(keys(firExportWarnings(eight, mask))).toEqual(['mask-fails-quantized']);
    expect(exportFirC(eight, { mask })).toMatch(/#define PW_FILTER_WARNINGS 1\n/);
    expect(JSON.parse(exportFirJson(eight, { mask })).warnings[0].key).toBe('mask-fails-quantized');
    expect(exportFirCsv(eight, { mask })).toMatch(/^# warning: \[mask-fails-quantized\]/m);
    // without the mask nothing is judged
    expect(firExportWarnings(eight)).toEqual([]);
  });

  it('an accumulator narrower than the bits any input needs is a warning', () => {
    const wide = fir({});
    expect(wide.accumulatorSafe).toBe(true);
    const narrow = fir({ accumulatorBits: wide.accumulatorNeeded - 1 });
    expect(narrow.accumulatorSafe).toBe(false);
    expect(keys(firExportWarnings(narrow))).toEqual(['accumulator-can-overflow']);
    expect(exportFirC(narrow)).toMatch(/accumulator-can-overflow/);
  });
});
