/** Downloads of the recording's fixed-point run: integer WAV of the codes, CSV of input and output codes. */
import { describe, it, expect } from 'vitest';
import { buildImplementation, DEFAULT_IMPLEMENTATION, simulateFixed } from '../../../src/core/fixed/index.ts';
import { readWav } from '../../../src/core/signal/index.ts';
import { makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { filteredCsv, fixedCsv, fixedWav } from '../../../src/views/signal/exportSignal.ts';
import { hum } from '../../helpers/fixedDesigns.ts';

function implement(dataWordLength: number) {
  const r = buildImplementation(hum, 2000, {
    ...DEFAULT_IMPLEMENTATION,
    dataWordLength,
    accumulatorBits: 56,
  });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('fixed-point downloads', () => {
  const x = makeWhiteNoise(3000, 2, 0.2);
  for (const [bits, format] of [
    [8, 'u8'],
    [12, 'i16'],
    [16, 'i16'],
    [20, 'i24'],
    [32, 'i32'],
  ] as const) {
    it(`${bits}-bit codes go to ${format}, in its top bits, and read back as the codes`, async () => {
      const impl = implement(bits);
      const sim = simulateFixed(impl, x);
      const { blob } = fixedWav(sim.output, 2000, impl);
      const r = readWav(new Uint8Array(await blob.arrayBuffer()));
      if (!r.ok) throw new Error(r.error.message);
      expect(r.value.info.format).toBe(format);
      expect(Array.from(r.value.channels[0]!, (v) => v * 2 ** (bits - 1))).toEqual(Array.from(sim.output));
    });
  }

  it('CSV: time, input codes (quantized as the run does) and output codes', async () => {
    const impl = implement(16);
    const sim = simulateFixed(impl, x);
    const text = await fixedCsv(x, sim.output, 2000, impl, 1.5).text();
    const lines = text.trim().split('\n');
    expect(lines[0]).toBe('time_s,input_code,output_code');
    expect(lines).toHaveLength(3001);
    expect(lines[11]).toBe(`${1.5 + 10 / 2000},${sim.input[10]},${sim.output[10]}`);
  });

  it('the filtered CSV carries the input beside the output', async () => {
    const y = x.map((v) => v / 2);
    const lines = (await filteredCsv(x, y, 1000).text()).trim().split('\n');
    expect(lines[0]).toBe('time_s,input,filtered');
    expect(lines[3]).toBe(`0.002,${x[2]},${y[2]}`);
  });
});
