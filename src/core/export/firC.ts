/**
 * C99 header of an FIR implementation (core/fixed/fir.ts): the taps in double precision and as codes, and
 * the processing functions. The fixed-point function repeats FixedFir.step in the same order (delay line,
 * pre-add of mirrored samples in the symmetric form, every addition fitted to the accumulator, shift back to
 * data), so its output is bit-exact with the simulation. The functions have the same names and signatures
 * as the cascade's export (c.ts), so a program written for one takes the other.
 */
import { fnv1a64, canonicalJson } from './hash.ts';
import { cInteger, float17 } from './numbers.ts';
import { cWarningBlock, helpers, IDENT, type CExportOptions } from './c.ts';
import { firExportWarnings } from './firWarnings.ts';
import { qName } from '../fixed/index.ts';
import { type FirImplementation } from '../fixed/fir.ts';

const ROUNDING = {
  nearest: 'round to nearest, ties toward +infinity (add bit n-1 of the accumulator after the shift)',
  truncate: 'truncate toward -infinity (arithmetic right shift, low bits dropped)',
} as const;
const OVERFLOW = {
  saturate: 'saturate to the largest code of the same sign',
  wrap: "wrap around (two's complement)",
} as const;

/** A stable fingerprint of the FIR's taps, sample rate and settings (FNV-1a 64 of canonical JSON). */
export function firHash(impl: FirImplementation): string {
  return fnv1a64(canonicalJson({ taps: impl.taps, sampleRate: impl.sampleRate, settings: impl.settings }));
}

/** The conventions of an FIR export in words (every FIR format prints them). */
export function firConventionLines(impl: FirImplementation): string[] {
  const s = impl.settings;
  const n = impl.format.fractionBits;
  const d = s.dataWordLength;
  const L = impl.codes.length;
  const sym = impl.symmetry === 'odd' ? '-' : '+';
  return [
    `design hash: ${firHash(impl)} (FNV-1a 64 of the canonical JSON of taps, sample rate and settings)`,
    `sample rate: ${impl.sampleRate} Hz`,
    `FIR of ${L} taps, ${impl.symmetry === 'even' ? 'symmetric (linear phase)' : impl.symmetry === 'odd' ? 'antisymmetric (linear phase)' : 'neither symmetric nor antisymmetric'}: y[n] = sum over k of c[k] x[n-k], k = 0 .. ${L - 1}`,
    s.form === 'symmetric'
      ? `symmetric form: acc += c[k] (x[n-k] ${sym} x[n-${L - 1}+k]) for k = 0 .. ${Math.floor(L / 2) - 1}${L % 2 ? `, then acc += c[${(L - 1) / 2}] x[n-${(L - 1) / 2}]` : ''}; ${impl.multiplies} multiplies per sample; the pre-add of two ${d}-bit samples is exact in ${impl.preAddBits} bits (one bit of headroom)`
      : `direct form: acc += c[k] x[n-k] for k = 0 .. ${L - 1}, in that order; ${impl.multiplies} multiplies per sample`,
    `taps: ${s.wordLength}-bit two's-complement codes in ${qName(impl.format)} (${n} fraction bits): value = code / 2^${n}, quantized by ${ROUNDING[s.rounding].split(' (')[0]}, clamped to the word`,
    `data: ${d}-bit samples in Q0.${d - 1} (value = code / 2^${d - 1}) at input and output`,
    `accumulator: ${s.accumulatorBits} bits holding products with ${d - 1 + n} fraction bits; every addition is fitted to ${s.accumulatorBits} bits (${OVERFLOW[s.overflow]}); ${impl.accumulatorNeeded} bits hold any input without overflow (${impl.accumulatorSafe ? 'met' : 'NOT met: sums can overflow'})`,
    `post-shift: ${n} bits right from the accumulator to the data word, ${ROUNDING[s.rounding]}, then ${OVERFLOW[s.overflow]} to ${d} bits`,
    `worst-case gain: sum of |taps| = ${impl.worstGain.toPrecision(6)}${impl.worstGain > 1 ? ' (above 1: the output word can overflow for some full-scale input)' : ' (the output word cannot overflow)'}`,
    'floating-point values are printed with 17 significant digits, so they read back exactly',
  ];
}

/** The C99 header text for the FIR. Throws a RangeError for a name that is not a C identifier. */
export function exportFirC(impl: FirImplementation, options: CExportOptions = {}): string {
  const p = options.name ?? 'pw_filter';
  if (!IDENT.test(p))
    throw new RangeError(`"${p}" is not a C identifier (letters, digits, _; not starting with a digit)`);
  const P = p.toUpperCase();
  const s = impl.settings;
  const L = impl.codes.length;
  const coefType = s.wordLength <= 16 ? 'int16_t' : 'int32_t';
  const sampleType = s.dataWordLength <= 16 ? 'int16_t' : 'int32_t';
  const warnings = firExportWarnings(impl, options.mask);
  const warningBlock = cWarningBlock(warnings, p);
  const warningCount = warnings.length;
  const comment = firConventionLines(impl)
    .map((l) => ` * ${l}`)
    .join('\n');
  const rows = (xs: string[]) =>
    xs
      .map((x, i) => (i % 6 === 0 ? `\n  ${x}` : ` ${x}`))
      .join(',')
      .replace(/ \n/g, '\n');
  const half = Math.floor(L / 2);
  const pm = impl.symmetry === 'odd' ? '-' : '+';
  const fixedLoop =
    s.form === 'symmetric'
      ? `    for (k = 0; k < ${half}u; k++) {
      /* the pre-add: exact in ${impl.preAddBits} bits */
      const int64_t pre = ${p}_tap(st, k) ${pm} ${p}_tap(st, ${L - 1}u - k);
      acc = ${p}_add(acc, (int64_t)${p}_taps_fixed[k] * pre, &ao);
    }${L % 2 ? `\n    acc = ${p}_add(acc, (int64_t)${p}_taps_fixed[${half}] * ${p}_tap(st, ${half}u), &ao);` : ''}`
      : `    for (k = 0; k < ${P}_TAPS; k++) acc = ${p}_add(acc, (int64_t)${p}_taps_fixed[k] * ${p}_tap(st, k), &ao);`;
  return `/*
 * ${p}.h - an FIR filter exported by Polewright.
${warningBlock} *
${comment}
 *
 * ${p}_float_process: the unquantized taps in double precision, direct form.
 * ${p}_fixed_process: the quantized taps in integer arithmetic; returns the number of overflow events (per
 *   sample: one for any accumulator overflow, one for fitting the output).
 * Both keep their delay line in a struct; set it to zero (the *_reset functions) before the first sample.
 */
#ifndef ${P}_H
#define ${P}_H

#include <stddef.h>
#include <stdint.h>

#define ${P}_WARNINGS ${warningCount}
#define ${P}_TAPS ${L}
#define ${P}_SAMPLE_RATE ${float17(impl.sampleRate)}
#define ${P}_COEF_BITS ${s.wordLength}
#define ${P}_COEF_FRACTION_BITS ${impl.format.fractionBits}
#define ${P}_DATA_BITS ${s.dataWordLength}
#define ${P}_ACC_BITS ${s.accumulatorBits}
#define ${P}_POST_SHIFT ${impl.postShift}

typedef ${coefType} ${p}_coef;
typedef ${sampleType} ${p}_sample;

static const double ${p}_taps_float[${P}_TAPS] = {${rows(impl.taps.map(float17))}
};

/* The same taps as ${s.wordLength}-bit codes, value = code / 2^${P}_COEF_FRACTION_BITS. */
static const ${p}_coef ${p}_taps_fixed[${P}_TAPS] = {${rows(impl.codes.map(cInteger))}
};

typedef struct {
  double x[${P}_TAPS]; /* x[(head + j) % TAPS] is x[n - j] */
  size_t head;
} ${p}_float_state;

static inline void ${p}_float_reset(${p}_float_state *st) {
  size_t k;
  for (k = 0; k < ${P}_TAPS; k++) st->x[k] = 0.0;
  st->head = 0;
}

static inline void ${p}_float_process(${p}_float_state *st, const double *x, double *y, size_t count) {
  size_t i, k;
  for (i = 0; i < count; i++) {
    double acc = 0.0;
    st->head = (st->head + ${P}_TAPS - 1) % ${P}_TAPS;
    st->x[st->head] = x[i];
    for (k = 0; k < ${P}_TAPS; k++) acc += ${p}_taps_float[k] * st->x[(st->head + k) % ${P}_TAPS];
    y[i] = acc;
  }
}

typedef struct {
  int64_t x[${P}_TAPS]; /* input codes; x[(head + j) % TAPS] is x[n - j] */
  size_t head;
} ${p}_fixed_state;

static inline void ${p}_fixed_reset(${p}_fixed_state *st) {
  size_t k;
  for (k = 0; k < ${P}_TAPS; k++) st->x[k] = 0;
  st->head = 0;
}

/* x[n - j] from the delay line. */
static inline int64_t ${p}_tap(const ${p}_fixed_state *st, size_t j) {
  return st->x[(st->head + j) % ${P}_TAPS];
}

${helpers(impl, p, P)}
static inline unsigned long ${p}_fixed_process(${p}_fixed_state *st, const ${p}_sample *x, ${p}_sample *y, size_t count) {
  unsigned long events = 0;
  size_t i, k;
  for (i = 0; i < count; i++) {
    int ao = 0, oo = 0;
    int64_t acc = 0;
    st->head = (st->head + ${P}_TAPS - 1) % ${P}_TAPS;
    st->x[st->head] = x[i];
${fixedLoop}
    y[i] = (${p}_sample)${p}_to_data(acc, &oo);
    events += (unsigned long)(ao + oo);
  }
  return events;
}

#endif /* ${P}_H */
`;
}
