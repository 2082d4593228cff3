/**
 * C99 header: the coefficient arrays and processing functions for the implementation's structure, in double
 * precision and in fixed point. The fixed-point function repeats src/core/fixed/kernel.ts step for step
 * (same order of additions, same accumulator fitting, rounding and overflow), so its output is bit-exact
 * with the simulation. Only C99 with <stdint.h> is assumed: no right shift of a negative value, no signed
 * overflow, no conversion of an out-of-range value to a signed type.
 */
import type { Implementation, ImplementationSettings } from '../fixed/index.ts';
import { conventionLines, structureName } from './conventions.ts';
import { cInteger, float17 } from './numbers.ts';
import { noiseLines } from './noise.ts';
import type { RequirementMask } from '../mask/index.ts';
import { exportWarnings, warningLine, type ExportWarning } from './warnings.ts';

/** Options of the C export. */
export interface CExportOptions {
  /** Prefix of every name in the header, a C identifier (default "pw_filter"). */
  name?: string;
  /** The design's requirement mask: the quantized filter failing it is a warning in the file. */
  mask?: RequirementMask;
}

export const IDENT = /^[A-Za-z_][A-Za-z0-9_]*$/;

/** What the integer helpers depend on: the data path's settings and the post-shift (IIR and FIR alike). */
export interface DataPathOf {
  settings: Pick<ImplementationSettings, 'overflow' | 'accumulatorBits' | 'rounding' | 'dataWordLength'>;
  postShift: number;
}

/** The C helpers of the data path: fit, accumulate, shift back to data (the rules of core/fixed/arith.ts). */
export function helpers(impl: DataPathOf, p: string, P: string): string {
  const s = impl.settings;
  const sat = s.overflow === 'saturate';
  const fitBody = sat
    ? `  return v < lo ? lo : hi;`
    : `  {
    const uint64_t half = UINT64_C(1) << (bits - 1);
    const uint64_t u = ((uint64_t)v + half) & ((half << 1) - 1u);
    return (int64_t)u - (int64_t)half;
  }`;
  const add64 = sat
    ? `    return b > 0 ? INT64_MAX : INT64_MIN;`
    : `    {
      const uint64_t u = (uint64_t)a + (uint64_t)b;
      return u <= (uint64_t)INT64_MAX ? (int64_t)u : -(int64_t)(UINT64_MAX - u) - 1;
    }`;
  const addBody =
    s.accumulatorBits === 64
      ? `  if ((b > 0 && a > INT64_MAX - b) || (b < 0 && a < INT64_MIN - b)) {
    *ovf = 1;
${add64}
  }
  return a + b;`
      : `  /* |a| <= 2^(ACC_BITS-1) and |b| <= 2^62: the sum cannot overflow int64_t before it is fitted */
  return ${p}_fit(a + b, ${P}_ACC_BITS, ovf);`;
  const shift = impl.postShift;
  const round =
    shift === 0
      ? `  int64_t r = acc;`
      : `  int64_t r = ${p}_floor_shift(acc, ${P}_POST_SHIFT);${s.rounding === 'nearest' ? `\n  r += ${p}_floor_shift(acc, ${P}_POST_SHIFT - 1) & 1;` : ''}`;
  return `/* v fitted to a signed word of 'bits' bits (bits <= 63); sets *ovf when that changed v. */
static inline int64_t ${p}_fit(int64_t v, int bits, int *ovf) {
  const int64_t hi = (int64_t)((UINT64_C(1) << (bits - 1)) - 1u);
  const int64_t lo = -hi - 1;
  if (v >= lo && v <= hi) return v;
  *ovf = 1;
${fitBody}
}

/* a + b fitted to the accumulator (${s.overflow}). */
static inline int64_t ${p}_add(int64_t a, int64_t b, int *ovf) {
${addBody}
}

${
  shift === 0
    ? ''
    : `/* floor(v / 2^s) without right-shifting a negative value (int64_t is two's complement by C99 7.18.1.1). */
static inline int64_t ${p}_floor_shift(int64_t v, int s) {
  return v >= 0 ? v >> s : ~((~v) >> s);
}
`
}
/* Accumulator -> data word: post-shift with ${s.rounding === 'nearest' ? 'rounding to nearest (ties up)' : 'truncation (floor)'}, then ${s.overflow} to ${s.dataWordLength} bits. */
static inline int64_t ${p}_to_data(int64_t acc, int *ovf) {
${round}
  return ${p}_fit(r, ${P}_DATA_BITS, ovf);
}
`;
}

function fixedBody(impl: Implementation, p: string): string {
  const fb = impl.settings.feedbackSign === 'negated' ? '' : '-';
  if (impl.settings.structure === 'df1') {
    return `      int64_t *s = st->s[k]; /* x[n-1], x[n-2], y[n-1], y[n-2] */
      int64_t acc = ${p}_add(0, (int64_t)c[0] * v, &ao);
      acc = ${p}_add(acc, (int64_t)c[1] * s[0], &ao);
      acc = ${p}_add(acc, (int64_t)c[2] * s[1], &ao);
      acc = ${p}_add(acc, ${fb}((int64_t)c[3] * s[2]), &ao);
      acc = ${p}_add(acc, ${fb}((int64_t)c[4] * s[3]), &ao);
      yk = ${p}_to_data(acc, &oo);
      s[1] = s[0];
      s[0] = v;
      s[3] = s[2];
      s[2] = yk;`;
  }
  return `      int64_t *s = st->s[k]; /* s1, s2 in accumulator precision */
      int64_t t;
      int64_t acc = ${p}_add(${p}_add(0, (int64_t)c[0] * v, &ao), s[0], &ao);
      yk = ${p}_to_data(acc, &oo);
      t = ${p}_add(0, (int64_t)c[1] * v, &ao);
      t = ${p}_add(t, s[1], &ao);
      s[0] = ${p}_add(t, ${fb}((int64_t)c[3] * yk), &ao);
      t = ${p}_add(0, (int64_t)c[2] * v, &ao);
      s[1] = ${p}_add(t, ${fb}((int64_t)c[4] * yk), &ao);`;
}

function floatBody(impl: Implementation): string {
  const fb = impl.settings.feedbackSign === 'negated' ? '+' : '-';
  if (impl.settings.structure === 'df1') {
    return `      double *s = st->s[k]; /* x[n-1], x[n-2], y[n-1], y[n-2] */
      yk = c[0] * v + c[1] * s[0] + c[2] * s[1] ${fb} c[3] * s[2] ${fb} c[4] * s[3];
      s[1] = s[0];
      s[0] = v;
      s[3] = s[2];
      s[2] = yk;`;
  }
  return `      double *s = st->s[k];
      yk = c[0] * v + s[0];
      s[0] = c[1] * v + s[1] ${fb} c[3] * yk;
      s[1] = c[2] * v ${fb} c[4] * yk;`;
}

/** The comment lines that list an export's warnings (or say there are none), and name the count constant. */
export function cWarningBlock(warnings: readonly ExportWarning[], p: string): string {
  const P = p.toUpperCase();
  return warnings.length
    ? ` *
 * WARNINGS (${warnings.length}): this implementation is not safe to use as it stands.
${warnings.map((w) => ` *   ${warningLine(w).replace(/\*\//g, '* /')}`).join('\n')}
 * ${P}_WARNINGS holds their number; a build can refuse this file with
 *   _Static_assert(${P}_WARNINGS == 0, "${p}.h carries warnings");
`
    : ` * No warnings (${P}_WARNINGS is 0).
`;
}

/** The C99 header text for the implementation. Throws a RangeError for a name that is not a C identifier. */
export function exportC(impl: Implementation, options: CExportOptions = {}): string {
  const p = options.name ?? 'pw_filter';
  if (!IDENT.test(p))
    throw new RangeError(`"${p}" is not a C identifier (letters, digits, _; not starting with a digit)`);
  const P = p.toUpperCase();
  const s = impl.settings;
  const n = impl.cascade.sections.length;
  const coefType = s.wordLength <= 16 ? 'int16_t' : 'int32_t';
  const sampleType = s.dataWordLength <= 16 ? 'int16_t' : 'int32_t';
  const stateLen = s.structure === 'df1' ? 4 : 2;
  const floatRows = impl.cascade.sections.map((sec) => {
    const c = sec.coefficients;
    const f = s.feedbackSign === 'negated' ? -1 : 1;
    return `  { ${[c[0], c[1], c[2], f * c[4], f * c[5]].map(float17).join(', ')} }`;
  });
  const fixedRows = impl.quantized.codes.map((c) => `  { ${[...c.b, ...c.a].map(cInteger).join(', ')} }`);
  const comment = [...conventionLines(impl), ...noiseLines(impl)].map((l) => ` * ${l}`).join('\n');
  const warnings = exportWarnings(impl, options.mask);
  const warningBlock = cWarningBlock(warnings, p);
  return `/*
 * ${p}.h - second-order sections exported by Polewright.
${warningBlock} *
${comment}
 *
 * ${p}_float_process: the unquantized coefficients in double precision, same structure.
 * ${p}_fixed_process: the quantized coefficients in integer arithmetic; returns the number of overflow
 *   events (per sample and section: one for any accumulator overflow, one for fitting the output).
 * Both keep their state in a struct; set it to zero (the *_reset functions) before the first sample.
 */
#ifndef ${P}_H
#define ${P}_H

#include <stddef.h>
#include <stdint.h>

#define ${P}_WARNINGS ${warnings.length}
#define ${P}_SECTIONS ${n}
#define ${P}_SAMPLE_RATE ${float17(impl.sampleRate)}
#define ${P}_OUTPUT_GAIN ${float17(impl.cascade.outputGain)}
#define ${P}_COEF_BITS ${s.wordLength}
#define ${P}_COEF_FRACTION_BITS ${impl.quantized.format.fractionBits}
#define ${P}_DATA_BITS ${s.dataWordLength}
#define ${P}_ACC_BITS ${s.accumulatorBits}
#define ${P}_POST_SHIFT ${impl.postShift}

typedef ${coefType} ${p}_coef;
typedef ${sampleType} ${p}_sample;

/* Rows: b0, b1, b2, ${s.feedbackSign === 'negated' ? '-a1, -a2' : 'a1, a2'} (a0 = 1). */
static const double ${p}_coef_float[${P}_SECTIONS][5] = {
${floatRows.join(',\n')}
};

/* The same rows as ${s.wordLength}-bit codes, value = code / 2^${P}_COEF_FRACTION_BITS. */
static const ${p}_coef ${p}_coef_fixed[${P}_SECTIONS][5] = {
${fixedRows.join(',\n')}
};

/* ${structureName(impl)} in double precision. */
typedef struct {
  double s[${P}_SECTIONS][${stateLen}];
} ${p}_float_state;

static inline void ${p}_float_reset(${p}_float_state *st) {
  size_t k, j;
  for (k = 0; k < ${P}_SECTIONS; k++)
    for (j = 0; j < ${stateLen}; j++) st->s[k][j] = 0.0;
}

static inline void ${p}_float_process(${p}_float_state *st, const double *x, double *y, size_t count) {
  size_t i, k;
  for (i = 0; i < count; i++) {
    double v = x[i];
    for (k = 0; k < ${P}_SECTIONS; k++) {
      const double *c = ${p}_coef_float[k];
      double yk;
${floatBody(impl)}
      v = yk;
    }
    y[i] = v;
  }
}

/* ${structureName(impl)} in fixed point. */
typedef struct {
  int64_t s[${P}_SECTIONS][${stateLen}];
} ${p}_fixed_state;

static inline void ${p}_fixed_reset(${p}_fixed_state *st) {
  size_t k, j;
  for (k = 0; k < ${P}_SECTIONS; k++)
    for (j = 0; j < ${stateLen}; j++) st->s[k][j] = 0;
}

${helpers(impl, p, P)}
static inline unsigned long ${p}_fixed_process(${p}_fixed_state *st, const ${p}_sample *x, ${p}_sample *y, size_t count) {
  unsigned long events = 0;
  size_t i, k;
  for (i = 0; i < count; i++) {
    int64_t v = x[i];
    for (k = 0; k < ${P}_SECTIONS; k++) {
      const ${p}_coef *c = ${p}_coef_fixed[k];
      int ao = 0, oo = 0;
      int64_t yk;
${fixedBody(impl, p)}
      events += (unsigned long)(ao + oo);
      v = yk;
    }
    y[i] = (${p}_sample)v;
  }
  return events;
}

#endif /* ${P}_H */
`;
}
