import { describe, expect, it } from 'vitest';
import { spanFor, traceExtent, tracePathOf, visibleSamples } from '../../../src/views/signal/envelope.ts';

const frame = (kx: number, x0 = 10) => ({
  left: 10,
  right: 110,
  top: 0,
  bottom: 100,
  x0,
  kx,
  y0: 50,
  ky: 10,
});

describe('spanFor', () => {
  it('asks for the samples themselves when they are sparse, one band per column when dense', () => {
    expect(spanFor(frame(25), 4)).toEqual({ i0: 0, i1: 4, columns: 100, line: true });
    expect(spanFor(frame(0.01), 100_000)).toEqual({ i0: 0, i1: 10_000, columns: 100, line: false });
    // Scrolled: the band covers the samples inside the plot only.
    expect(spanFor(frame(0.01, -990), 100_000)).toEqual({
      i0: 100_000,
      i1: 100_000,
      columns: 100,
      line: true,
    });
    expect(spanFor(frame(0.01, -90), 100_000)).toEqual({ i0: 10_000, i1: 20_000, columns: 100, line: false });
  });

  it('the visible samples cover the frame with one to spare on each side', () => {
    expect(visibleSamples(frame(1, -90), 1000)).toEqual([100, 201]);
  });
});

describe('tracePathOf', () => {
  it('draws a line through the samples at their own places', () => {
    const line = { kind: 'line' as const, values: Float32Array.of(0, 1, -1, 0) };
    const d = tracePathOf(line, { id: 1, i0: 0, i1: 4, columns: 100, line: true }, frame(25)).d;
    expect(d).toBe('M10 50L35 40L60 60L85 50');
  });

  it('draws a closed band, two points per column, skipping empty columns; a range of columns on request', () => {
    const min = Float32Array.from({ length: 100 }, (_, c) => (c === 7 ? NaN : -1));
    const max = Float32Array.from({ length: 100 }, (_, c) => (c === 7 ? NaN : 1));
    const span = { id: 1, i0: 0, i1: 10_000, columns: 100, line: false };
    const band = tracePathOf({ kind: 'band', min, max }, span, frame(0.01));
    expect(band.band).toBe(true);
    expect(band.d.endsWith('Z')).toBe(true);
    expect(band.d.match(/[ML]/g)).toHaveLength(2 * 99);
    // Column c's middle sample (c + 0.5)·100 sits at 10 + (c + 0.5) px.
    expect(band.d.startsWith('M10.5 40L11.5 40')).toBe(true);
    const part = tracePathOf({ kind: 'band', min, max }, span, frame(0.01), 50, 60);
    expect(part.d.match(/[ML]/g)).toHaveLength(20);
    expect(part.d.startsWith('M60.5 40')).toBe(true);
  });

  it('draws a trace asked for an older frame at its samples’ places in the new one', () => {
    const max = Float32Array.from({ length: 10 }, () => 1);
    const min = Float32Array.from({ length: 10 }, () => -1);
    // Asked for samples 0..1000 over 10 columns; now samples 0..2000 span the 100 px.
    const d = tracePathOf(
      { kind: 'band', min, max },
      { id: 1, i0: 0, i1: 1000, columns: 10, line: false },
      frame(0.05),
    ).d;
    expect(d.startsWith('M12.5 40L17.5 40')).toBe(true);
  });
});

describe('traceExtent', () => {
  it('reads finite values of the first entries only; null for none', () => {
    expect(traceExtent({ kind: 'line', values: Float32Array.of(3, -1, 2) })).toEqual([-1, 3]);
    expect(traceExtent({ kind: 'line', values: Float32Array.of(3, -1, 2) }, 1)).toEqual([3, 3]);
    const band = {
      kind: 'band' as const,
      min: Float32Array.of(-2, NaN, -Infinity),
      max: Float32Array.of(1, NaN, Infinity),
    };
    expect(traceExtent(band)).toEqual([-2, 1]);
    expect(traceExtent({ kind: 'line', values: new Float32Array(0) })).toBeNull();
  });
});
