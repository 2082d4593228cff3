import { describe, it, expect } from 'vitest';
import { surfaceLevelsDb, SURFACE_FLOOR_DB } from '../../../src/core/response/index.ts';
import type { Zpk } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('surfaceLevelsDb: |H(z)| in dB over the plane', () => {
  it('matches the product form evaluated directly with complex arithmetic', () => {
    // H(z) = 0.5 (z - 1)(z^2 + 0.81) / ((z - 0.3)^2 (z^2 - 1.2z + 0.72)): distances written out by hand below.
    const zpk: Zpk = {
      gain: 0.5,
      zeros: [
        { re: 1, im: 0, multiplicity: 1 },
        { re: 0, im: 0.9, multiplicity: 1 },
      ],
      poles: [
        { re: 0.3, im: 0, multiplicity: 2 },
        { re: 0.6, im: 0.6, multiplicity: 1 },
      ],
    };
    const rect = { re0: -1.5, re1: 1.5, imTop: 1.5, imBottom: -1.5 };
    const nx = 7;
    const ny = 5;
    const out = new Float32Array(nx * ny);
    surfaceLevelsDb(zpk, rect, nx, ny, 0, ny, out);
    const expected: number[] = [];
    for (let j = 0; j < ny; j++) {
      const y = 1.5 - ((j + 0.5) * 3) / ny;
      for (let i = 0; i < nx; i++) {
        const x = -1.5 + ((i + 0.5) * 3) / nx;
        const d = (a: number, b: number) => Math.hypot(x - a, y - b);
        const mag = (0.5 * d(1, 0) * d(0, 0.9) * d(0, -0.9)) / (d(0.3, 0) ** 2 * d(0.6, 0.6) * d(0.6, -0.6));
        expected.push(20 * Math.log10(mag));
      }
    }
    expectClose(Array.from(out), expected, { abs: 1e-4 }, 'dB'); // float32 storage
  });

  it('writes the floor on an exact zero and stays finite at order 256', () => {
    const out = new Float32Array(1);
    surfaceLevelsDb(
      { gain: 1, zeros: [{ re: 0, im: 0, multiplicity: 1 }], poles: [] },
      { re0: -1, re1: 1, imTop: 1, imBottom: -1 },
      1,
      1,
      0,
      1,
      out,
    );
    expect(out[0]).toBe(SURFACE_FLOOR_DB);
    // 256 zeros and 256 poles: the level is a difference of large sums, each far beyond the clamp range.
    const many: Zpk = {
      gain: 1,
      zeros: [{ re: 0.5, im: 0.5, multiplicity: 128 }],
      poles: [{ re: 0.52, im: 0.5, multiplicity: 128 }],
    };
    surfaceLevelsDb(many, { re0: -3, re1: -2, imTop: -2, imBottom: -3 }, 1, 1, 0, 1, out);
    const dz = Math.hypot(3, 3) * Math.hypot(3, 2); // z = -2.5 - 2.5j to 0.5 ± 0.5j
    const dp = Math.hypot(3.02, 3) * Math.hypot(3.02, 2);
    expectClose(out[0]!, 128 * 20 * Math.log10(dz / dp), { rel: 1e-5 }, 'order 256');
  });
});
