/** fast-check generators of valid shared designs, and a bitwise comparison (Object.is on every number). */
import fc from 'fast-check';
import type { Root } from '../../src/core/types.ts';
import type { SharedDesign } from '../../src/share/document.ts';
import type { DesignerSpec } from '../../src/core/design/index.ts';

/** Any finite double, with −0, exact zeros, short decimals and values on the unit circle well represented. */
export const anyFinite = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(0, -0, 1, -1, 0.5, 1.6, -0.64, 1e-300, 5e-324, Number.MAX_VALUE, -Number.MIN_VALUE),
  fc.integer({ min: -1_000_000, max: 1_000_000 }).map((n) => n / 1000),
);

const nonNegative = fc.oneof(
  anyFinite.map(Math.abs),
  fc.constant(-0), // −0 ≥ 0 holds, so the schema accepts it; a link must keep its sign
);

/** A root on the unit circle, nudged by a few ulps as a designer's cos/sin would be. */
const circleRoot = fc
  .record({
    w: fc.double({ min: 1e-6, max: Math.PI - 1e-6, noNaN: true }),
    m: fc.integer({ min: 1, max: 3 }),
  })
  .map(({ w, m }): Root => ({ re: Math.cos(w), im: Math.sin(w), multiplicity: m }));

export const anyRoot: fc.Arbitrary<Root> = fc.oneof(
  fc.record({ re: anyFinite, im: nonNegative, multiplicity: fc.integer({ min: 1, max: 64 }) }),
  fc.record({ re: anyFinite, im: fc.constant(0), multiplicity: fc.integer({ min: 1, max: 8 }) }),
  circleRoot,
);

const text = (max: number) =>
  fc.oneof(
    fc.string({ unit: 'grapheme', maxLength: max }),
    fc.constantFrom(
      '',
      '<img src=x onerror=alert(1)>',
      '"quoted" \\ back\nslash',
      'Kühlschrank ☃ 𝄞',
      '__proto__',
    ),
  );

const designer: fc.Arbitrary<DesignerSpec> = fc.oneof(
  fc.record(
    { kind: fc.constantFrom('notch' as const, 'peak' as const), fs: anyFinite, f0: anyFinite, q: anyFinite },
    { requiredKeys: ['kind', 'fs', 'f0'] },
  ),
  fc.record({ kind: fc.constant('dcBlocker' as const), fs: anyFinite, cutoffHz: anyFinite }),
  fc.record({
    kind: fc.constant('harmonicNotch' as const),
    fs: anyFinite,
    f0: anyFinite,
    harmonics: fc.array(fc.integer({ min: 1, max: 40 }), { maxLength: 6 }),
    bandwidthHz: anyFinite,
  }),
  fc.record(
    {
      kind: fc.constant('iir' as const),
      fs: anyFinite,
      family: fc.constantFrom(
        'butterworth' as const,
        'chebyshev1' as const,
        'chebyshev2' as const,
        'elliptic' as const,
      ),
      response: fc.constantFrom(
        'lowpass' as const,
        'highpass' as const,
        'bandpass' as const,
        'bandstop' as const,
      ),
      order: fc.oneof(fc.integer({ min: 1, max: 64 }), fc.constant('auto' as const)),
      edgesHz: fc.array(anyFinite, { minLength: 1, maxLength: 2 }),
      rippleDb: anyFinite,
      attenuationDb: anyFinite,
      passbandHz: fc.array(anyFinite, { minLength: 1, maxLength: 2 }),
    },
    { requiredKeys: ['kind', 'fs', 'family', 'response', 'order'] },
  ),
);

const mask = fc.record({
  regions: fc
    .array(
      fc.record(
        {
          kind: fc.constantFrom('pass' as const, 'stop' as const, 'band' as const),
          fromHz: anyFinite,
          toHz: anyFinite,
          upperDb: anyFinite,
          lowerDb: anyFinite,
          label: text(20),
        },
        { requiredKeys: ['kind', 'fromHz', 'toHz'] },
      ),
      { maxLength: 4 },
    )
    .map((rs) => rs.map((r, i) => ({ ...r, id: `r${i}` }))),
});

const implementation = fc
  .record({
    structure: fc.constantFrom('df1' as const, 'df2t' as const),
    wordLength: fc.integer({ min: 8, max: 32 }),
    dataWordLength: fc.integer({ min: 8, max: 32 }),
    rounding: fc.constantFrom('nearest' as const, 'truncate' as const),
    overflow: fc.constantFrom('saturate' as const, 'wrap' as const),
    scaling: fc.constantFrom('linf' as const, 'l2' as const, 'l1' as const, 'none' as const),
    ordering: fc.constantFrom('ascending' as const, 'descending' as const),
    gainDistribution: fc.constantFrom('first' as const, 'spread' as const),
    pairing: fc.constantFrom('nearest' as const, 'keep-odd' as const),
    feedbackSign: fc.constantFrom('denominator' as const, 'negated' as const),
    auto: fc.boolean(),
  })
  .map(({ auto, ...s }) => ({
    ...s,
    fractionBits: auto ? ('auto' as const) : s.wordLength - 1,
    accumulatorBits: Math.min(64, s.wordLength + s.dataWordLength + 8),
  }));

const view = fc.record(
  {
    magnitudeScale: fc.constantFrom('db' as const, 'linear' as const),
    frequencyAxis: fc.constantFrom('linear' as const, 'log' as const),
    responsePoints: fc.integer({ min: 16, max: 65536 }),
    timeInput: fc.constantFrom('impulse' as const, 'step' as const, 'sine' as const, 'noise' as const),
    sineHz: anyFinite.map(Math.abs),
    timeSamples: fc.integer({ min: 8, max: 65536 }),
    noiseSeed: fc.integer({ min: 0, max: 0xffffffff }),
    // Zoomed bands: [low, high] with low < high (low ≥ 0 in Hz, ≥ −1 in samples), or the whole axis.
    frequencySpan: fc.option(
      fc
        .tuple(anyFinite.map(Math.abs), anyFinite.map(Math.abs))
        .filter(([a, b]) => a !== b)
        .map(([a, b]) => (a < b ? ([a, b] as const) : ([b, a] as const))),
      { nil: null },
    ),
    timeSpan: fc.option(
      fc
        .tuple(fc.double({ min: -1, max: 1e6, noNaN: true }), fc.double({ min: -1, max: 1e6, noNaN: true }))
        .filter(([a, b]) => a !== b)
        .map(([a, b]) => (a < b ? ([a, b] as const) : ([b, a] as const))),
      { nil: null },
    ),
  },
  { requiredKeys: [] },
);

/** A valid design with every optional part sometimes present. */
export const anySharedDesign: fc.Arbitrary<SharedDesign> = fc
  .record({
    sampleRate: fc.oneof(fc.double({ min: 1e-300, max: 1e9, noNaN: true }), fc.constantFrom(1, 48000, 2000)),
    zeros: fc.array(anyRoot, { maxLength: 8 }),
    poles: fc.array(anyRoot, { maxLength: 8 }),
    gainRule: fc.oneof(
      anyFinite.map((value) => ({ kind: 'fixed' as const, value })),
      fc.constantFrom({ kind: 'dc' as const }, { kind: 'nyquist' as const }, { kind: 'peak' as const }),
      nonNegative.map((hz) => ({ kind: 'frequency' as const, hz })),
    ),
    name: text(40),
    note: text(200),
    typed: fc.option(
      fc.record({
        b: fc.array(anyFinite, { minLength: 1, maxLength: 9 }),
        a: fc.array(anyFinite, { minLength: 1, maxLength: 9 }),
        text: text(80),
      }),
      { nil: undefined },
    ),
    designer: fc.option(designer, { nil: undefined }),
    mask: fc.option(mask, { nil: undefined }),
    implementation: fc.option(implementation, { nil: undefined }),
    view,
  })
  .map(({ typed, designer: spec, mask: m, implementation: impl, view: v, ...rest }) => ({
    design: {
      ...rest,
      ...(typed ? { typed } : {}),
      ...(spec ? { designer: spec } : {}),
      ...(m ? { mask: m } : {}),
      ...(impl ? { implementation: impl } : {}),
    },
    view: v,
  }));

/** Deep equality where numbers must be the same bits (Object.is); returns the first difference, or null. */
export function bitwiseDifference(a: unknown, b: unknown, path = '$'): string | null {
  if (typeof a === 'number' || typeof b === 'number')
    return Object.is(a, b) ? null : `${path}: ${String(a)} vs ${String(b)}`;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) {
    return a === b ? null : `${path}: ${JSON.stringify(a)} vs ${JSON.stringify(b)}`;
  }
  if (Array.isArray(a) !== Array.isArray(b)) return `${path}: array vs object`;
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const k of keys) {
    const d = bitwiseDifference(
      (a as Record<string, unknown>)[k],
      (b as Record<string, unknown>)[k],
      `${path}.${k}`,
    );
    if (d) return d;
  }
  return null;
}
