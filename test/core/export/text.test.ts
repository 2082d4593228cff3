import { describe, it, expect } from 'vitest';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  type Implementation,
  type ImplementationSettings,
  roundoffNoise,
} from '../../../src/core/fixed/index.ts';
import {
  canonicalJson,
  designHash,
  exportC,
  exportCsv,
  exportJson,
  fnv1a64,
  float17,
} from '../../../src/core/export/index.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';

const zpk = tfToZpk({ b: [0.1, 0.2, 0.1], a: [1, -1.6, 0.8] });
function implement(over: Partial<ImplementationSettings> = {}, fs = 48000): Implementation {
  const r = buildImplementation(zpk, fs, { ...DEFAULT_IMPLEMENTATION, ...over });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('hash', () => {
  it('FNV-1a 64 test vectors', () => {
    // Fowler–Noll–Vo reference test vectors (FNV-1a, 64-bit), from memory
    expect(fnv1a64('')).toBe('cbf29ce484222325');
    expect(fnv1a64('a')).toBe('af63dc4c8601ec8c');
    expect(fnv1a64('foobar')).toBe('85944171f73967e8');
  });

  it('canonical JSON sorts keys, so key order does not change the hash', () => {
    expect(canonicalJson({ b: 1, a: [2, { d: 3, c: 0.1 }] })).toBe('{"a":[2,{"c":0.1,"d":3}],"b":1}');
    expect(designHash(implement())).toBe(designHash(implement()));
    expect(designHash(implement({ wordLength: 15 }))).not.toBe(designHash(implement()));
    expect(designHash(implement({}, 44100))).not.toBe(designHash(implement()));
    expect(designHash(implement())).toMatch(/^[0-9a-f]{16}$/);
  });
});

describe('float17', () => {
  it('prints 17 significant digits that read back exactly', () => {
    expect(float17(0.1)).toBe('0.10000000000000001');
    for (const x of [Math.PI, -1 / 3, 1e-300, 123456.789]) expect(Number(float17(x))).toBe(x);
  });
});

describe('exportJson', () => {
  it('carries floats, integer codes, the Q format, conventions and the hash', () => {
    const impl = implement({ feedbackSign: 'negated', wordLength: 16 });
    const text = exportJson(impl);
    const doc = JSON.parse(text);
    expect(doc.format).toBe('polewright-sections');
    expect(doc.designHash).toBe(designHash(impl));
    expect(doc.sampleRate).toBe(48000);
    expect(doc.structure).toBe('df2t');
    expect(doc.coefficientOrder).toEqual(['b0', 'b1', 'b2', '-a1', '-a2']);
    expect(doc.coefficientFormat).toEqual({ q: 'Q1.14', wordLength: 16, integerBits: 1, fractionBits: 14 });
    expect(doc.postShift).toBe(14);
    const sec = doc.sections[0];
    // negated feedback: stored −a1 = +1.6, quantized 1.6·2^14 = 26214.4 → 26214
    expect(sec.fixed[3]).toBe(26214);
    expectFloatClose(sec.float[3], 1.6);
    // every float field has 17 significant digits in the text
    expect(text).toMatch(/"outputGain": -?\d\.\d{16}/);
    expect(doc.conventions.join('\n')).toMatch(/recursion ADDS/);
  });
});

function expectFloatClose(a: number, b: number) {
  expect(Math.abs(a - b)).toBeLessThan(1e-12);
}

describe('exportCsv', () => {
  it('has # convention lines, a header and one row per section with codes', () => {
    const impl = implement({ structure: 'df1' });
    const lines = exportCsv(impl).trim().split('\n');
    const comments = lines.filter((l) => l.startsWith('#'));
    const data = lines.filter((l) => !l.startsWith('#'));
    expect(comments.join(' ')).toMatch(/direct form I/);
    expect(comments.join(' ')).toMatch(new RegExp(designHash(impl)));
    expect(comments.join(' ')).toMatch(/48000 Hz/);
    expect(data[0]).toBe(
      'section,b0,b1,b2,a1,a2,b0_code,b1_code,b2_code,a1_code,a2_code,scale,pole_radius,peak_gain_db',
    );
    expect(data).toHaveLength(2);
    const cells = data[1]!.split(',');
    // denominator sign: a1 = −1.6 → round(−1.6·2^14) = −26214
    expect(cells[9]).toBe('-26214');
    expect(Number(cells[4])).toBeCloseTo(-1.6, 15);
  });
});

describe('exportC', () => {
  it('states structure, Q format, post-shift, sample rate and hash, and uses the asked name', () => {
    const impl = implement({ structure: 'df1', rounding: 'truncate', overflow: 'wrap' });
    const c = exportC(impl, { name: 'hopper_notch' });
    expect(c).toMatch(/#define HOPPER_NOTCH_COEF_FRACTION_BITS 14/);
    expect(c).toMatch(/Q1\.14/);
    expect(c).toMatch(/post-shift: 14 bits/);
    expect(c).toMatch(/direct form I/);
    expect(c).toMatch(/sample rate: 48000 Hz/);
    expect(c).toContain(designHash(impl));
    expect(c).toMatch(/hopper_notch_fixed_process/);
    expect(c).toMatch(/wrap around/);
    expect(() => exportC(impl, { name: '9lives' })).toThrow(/C identifier/);
  });

  it('spells the most negative 32-bit code the way C allows', () => {
    const r = buildImplementation({ zeros: [], poles: [], gain: -1 }, 1, {
      ...DEFAULT_IMPLEMENTATION,
      wordLength: 32,
      accumulatorBits: 47,
      scaling: 'none',
    });
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.quantized.codes[0]!.b[0]).toBe(-2147483648);
    expect(exportC(r.value)).toContain('(-2147483647 - 1)');
  });
});

describe('round-off noise in the exports', () => {
  it('JSON carries the prediction; the C header and CSV state it in their comments', () => {
    const impl = implement({ structure: 'df1', rounding: 'truncate' });
    const noise = roundoffNoise(impl);
    const doc = JSON.parse(exportJson(impl));
    expect(doc.roundoffNoise.powerDbfs).toBe(noise.powerDbfs);
    expect(doc.roundoffNoise.snrFullScaleSineDb).toBe(noise.snrDb);
    expect(doc.roundoffNoise.effectiveBits).toBe(noise.effectiveBits);
    expect(doc.roundoffNoise.sections).toHaveLength(1);
    expect(doc.roundoffNoise.droppedBits).toBe(14);
    const total = new RegExp(`total ${noise.powerDbfs.toFixed(1)} dBFS`);
    const c = exportC(impl);
    expect(c.slice(0, c.indexOf('*/'))).toMatch(total);
    expect(c).toMatch(
      new RegExp(`SNR ${noise.snrDb.toFixed(1)} dB for a full-scale input sine at the peak gain`),
    );
    expect(exportCsv(impl)).toMatch(new RegExp(`# +${total.source}`));
  });

  it('says there is no rounding when the post-shift is 0', () => {
    const impl = implement({ fractionBits: 0, wordLength: 8, scaling: 'none' });
    expect(exportC(impl)).toMatch(/round-off noise: none/);
  });
});
