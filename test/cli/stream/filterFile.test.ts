import { describe, it, expect } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../helpers/cli.ts';
import { filterStream } from '../../../src/cli/stream/filterFile.ts';
import { WavFileSink } from '../../../src/cli/stream/sinks.ts';
import type { SignalSource } from '../../../src/cli/stream/sources.ts';
import { readCsvSignal, readWav, writeWav, makeTones } from '../../../src/core/signal/index.ts';
import { makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { filterSections, filterTf } from '../../../src/core/time/filter.ts';
import { zpkToSections, compressRoots } from '../../../src/core/system/index.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';
import type { Section } from '../../../src/core/types.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const dir = mkdtempSync(join(tmpdir(), 'pw-stream-'));
const path = (name: string) => join(dir, name);

/** A notch-like second-order filter with a pole pair: the one the CLI tests run. */
const B = '1,-1.9,1';
const A = '1,-1.8,0.9';
function sectionsOf(b: number[], a: number[]): Section[] {
  const z = tfToZpk({ b, a });
  return zpkToSections({ zeros: compressRoots(z.zeros), poles: compressRoots(z.poles), gain: z.gain });
}
const SECTIONS = sectionsOf([1, -1.9, 1], [1, -1.8, 0.9]);
/** The same design as typed with --b/--a: simulate runs it as typed (direct form II transposed). */
const TYPED = { b: [1, -1.9, 1], a: [1, -1.8, 0.9] };
const asTyped = (x: ArrayLike<number>) => filterTf(TYPED, x);

function readBack(file: string) {
  const r = readWav(readFileSync(file));
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('simulate --output (streaming)', () => {
  const frames = 150_001; // more than one 256 KiB read, odd so frames straddle chunk edges
  const left = makeTones(frames, 48000, [{ frequencyHz: 50, amplitude: 0.25 }]).map(
    (v, i) => v + 0.01 * Math.sin(i),
  );
  const right = makeWhiteNoise(frames, 4, 0.1);
  const input = writeWav({ format: 'i24', sampleRate: 48000, channels: [left, right] });
  writeFileSync(path('in24.wav'), input.bytes);
  const decoded = readBack(path('in24.wav'));

  it('WAV in, WAV out: same rate and format, every channel filtered, bytes equal to one-shot filtering', async () => {
    const r = await runCli([
      'simulate',
      '--b',
      B,
      '--a',
      A,
      '--input',
      path('in24.wav'),
      '--output',
      path('out24.wav'),
    ]);
    expect(r.stderr).toMatch(/^note: filtering with b and a exactly as typed/);
    expect(r.code).toBe(0);
    const oneShot = writeWav({
      format: 'i24',
      sampleRate: 48000,
      channels: decoded.channels.map((x) => asTyped(x)),
    });
    expect(Buffer.from(readFileSync(path('out24.wav'))).equals(Buffer.from(oneShot.bytes))).toBe(true);
  });

  it('--channel picks one channel (1-based) and --output-format chooses the stored format', async () => {
    const r = await runCli([
      'simulate',
      '--b',
      B,
      '--a',
      A,
      '--input',
      path('in24.wav'),
      '--output',
      path('right.wav'),
      '--channel',
      '2',
      '--output-format',
      'f64',
      '--json',
    ]);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toMatchObject({ frames, channels: 1, format: 'f64', sampleRate: 48000 });
    const out = readBack(path('right.wav'));
    expect(out.info.format).toBe('f64');
    expect(out.channels).toHaveLength(1);
    const want = asTyped(decoded.channels[1]!);
    expect(out.channels[0]!.every((v, i) => v === want[i])).toBe(true);
  });

  it('clips to full scale in an integer format and says how many samples', async () => {
    const r = await runCli([
      'simulate',
      '--b',
      '4',
      '--input',
      path('in24.wav'),
      '--output',
      path('loud.wav'),
      '--output-format',
      'i16',
    ]);
    expect(r.code).toBe(0);
    const expected = decoded.channels.reduce(
      (n, x) =>
        n + x.filter((v) => Math.round(4 * v * 32768) > 32767 || Math.round(4 * v * 32768) < -32768).length,
      0,
    );
    expect(expected).toBeGreaterThan(0);
    expect(r.stderr).toMatch(
      new RegExp(`warning: ${expected} of ${2 * frames} output samples .* clipped to the i16 range`),
    );
    const out = readBack(path('loud.wav'));
    expect(Math.max(...out.channels[0]!.subarray(0, 2000))).toBe(32767 / 32768);
  });

  it('filters a CSV of time and value into a CSV with the same times', async () => {
    const x = makeWhiteNoise(3001, 7);
    const text =
      'time_s,volts\n' + Array.from(x, (v, k) => `${(0.25 + k / 1000).toFixed(3)},${v}`).join('\n');
    writeFileSync(path('in.csv'), text);
    const r = await runCli([
      'simulate',
      '--b',
      B,
      '--a',
      A,
      '--fs',
      '1000',
      '--input',
      path('in.csv'),
      '--output',
      path('out.csv'),
    ]);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/column 1 \("time_s"\) as time/);
    const lines = readFileSync(path('out.csv'), 'utf8').trim().split('\n');
    expect(lines[0]).toBe('time_s,value');
    expect(lines[1]).toBe(`0.25,${asTyped(x)[0]}`);
    const back = readCsvSignal(lines.join('\n'));
    if (back.status !== 'ok') throw new Error('unreadable output');
    expect(Array.from(back.signal.samples)).toEqual(Array.from(asTyped(x)));
    expect(back.signal.sampleRate).toBe(1000);
    expect(back.signal.startTime).toBe(0.25);
  });

  it('CSV in, WAV out (float by default, the rate from the time column); WAV in, CSV out', async () => {
    const r = await runCli([
      'simulate',
      '--b',
      B,
      '--a',
      A,
      '--input',
      path('in.csv'),
      '--output',
      path('fromcsv.wav'),
    ]);
    expect(r.code).toBe(0);
    const w = readBack(path('fromcsv.wav'));
    expect(w.info.format).toBe('f32');
    expect(w.sampleRate).toBe(1000);
    const r2 = await runCli([
      'simulate',
      '--b',
      B,
      '--a',
      A,
      '--input',
      path('fromcsv.wav'),
      '--output',
      path('fromwav.tsv'),
    ]);
    expect(r2.code).toBe(0);
    const lines = readFileSync(path('fromwav.tsv'), 'utf8').split('\n');
    expect(lines[0]).toBe('time_s\tvalue');
    expect(lines[2]!.split('\t')[0]).toBe('0.001');
  });

  it('a one-column CSV takes --input-rate, else the design rate', async () => {
    writeFileSync(path('col.csv'), '1\n2\n3\n4\n');
    const r = await runCli([
      'simulate',
      '--b',
      '1,1',
      '--input',
      path('col.csv'),
      '--output',
      path('col.wav'),
      '--input-rate',
      '8000',
    ]);
    expect(r.code).toBe(0);
    const w = readBack(path('col.wav'));
    expect(w.sampleRate).toBe(8000);
    expect(Array.from(w.channels[0]!)).toEqual([1, 3, 5, 7]);
  });

  it('matches scipy.signal.lfilter on the fixture recording (design given as b/a)', async () => {
    const fx = loadFixture<{
      fs: number;
      x: number[];
      cases: { name: string; b: number[]; a: number[]; y_tf: number[] }[];
    }>('signal_filter');
    const c = fx.cases.find((k) => k.name === 'notch')!;
    writeFileSync(
      path('fx.wav'),
      writeWav({ format: 'f64', sampleRate: fx.fs, channels: [Float64Array.from(fx.x)] }).bytes,
    );
    const r = await runCli([
      'simulate',
      '--b',
      c.b.join(','),
      '--a',
      c.a.join(','),
      '--input',
      path('fx.wav'),
      '--output',
      path('fx-out.wav'),
    ]);
    expect(r.code).toBe(0);
    const out = readBack(path('fx-out.wav'));
    expectClose(out.channels[0]!, c.y_tf, { abs: 1e-12 }, 'notch'); // scipy.signal.lfilter 1.17
  });
});

describe('filterStream', () => {
  it('blocks of odd sizes give one-shot filtering bit for bit', async () => {
    const x = makeWhiteNoise(20_000, 11);
    const sizes = [1, 3, 4097, 17, 999, 2];
    const source: SignalSource = {
      async *blocks() {
        for (let p = 0, i = 0; p < x.length; p += sizes[i++ % sizes.length]!) {
          yield { channels: [x.slice(p, p + sizes[i % sizes.length]!)], times: null };
        }
      },
      summary: () => ({ sampleRate: 44100, startTime: 0, notes: [] }),
    };
    const file = path('odd.wav');
    const s = await filterStream(source, (_rate) => WavFileSink.create(file, 'f64'), SECTIONS, {
      fallbackRate: 1,
      outputFormat: 'f64',
    });
    expect(s.frames).toBe(x.length);
    const out = readBack(file);
    expect(out.sampleRate).toBe(44100);
    expect(Buffer.from(out.channels[0]!.buffer).equals(Buffer.from(filterSections(SECTIONS, x).buffer))).toBe(
      true,
    );
  });
});

describe('simulate: in-memory modes and errors', () => {
  it('prints a WAV input filtered, channel 1 by default with a note for stereo', async () => {
    writeFileSync(
      path('small.wav'),
      writeWav({
        format: 'i16',
        sampleRate: 8000,
        channels: [Float64Array.of(0.5, 0, 0), Float64Array.of(0, 0, 0)],
      }).bytes,
    );
    const r = await runCli(['simulate', '--b', '1,1', '--input', path('small.wav'), '--json']);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toMatchObject({ sampleRate: 8000, output: [0.5, 0.5, 0] });
    expect(r.stderr).toMatch(/2 channels; channel 1 was used/);
  });

  it('a generated input can be written to a file', async () => {
    const r = await runCli([
      'simulate',
      '--b',
      '0.5',
      '--fs',
      '100',
      '--input',
      'step',
      '--samples',
      '10',
      '--output',
      path('step.wav'),
      '--output-format',
      'i16',
    ]);
    expect(r.code).toBe(0);
    const w = readBack(path('step.wav'));
    expect(Array.from(w.channels[0]!)).toEqual(new Array(10).fill(0.5));
    expect(w.sampleRate).toBe(100);
  });

  it('notes a signal rate that differs from the design rate', async () => {
    const r = await runCli(['simulate', '--b', '1', '--fs', '44100', '--input', path('small.wav'), '--json']);
    expect(r.stderr).toMatch(/signal's sample rate \(8000 Hz\) differs from the design's \(44100 Hz\)/);
  });

  it('broken input and bad flags exit 2 with the reason', async () => {
    writeFileSync(path('fake.wav'), 'time,value\n0,1\n');
    const cases: [string[], RegExp][] = [
      [
        ['--input', path('fake.wav'), '--output', path('x.wav')],
        /fake\.wav: Not a WAV file: it starts with "time"/,
      ],
      [
        ['--input', path('in24.wav'), '--output', path('x.wav'), '--output-format', 'i12'],
        /--output-format must be one of u8, i16, i24, i32, f32, f64/,
      ],
      [
        ['--input', path('in24.wav'), '--output', path('x.wav'), '--channel', '3'],
        /Channel 3 \(index 2\) was asked for; the file has 2 channel/,
      ],
      [
        ['--input', path('in.csv'), '--output', path('x.wav'), '--channel', '1'],
        /--channel applies to WAV input/,
      ],
      [['--input', path('nope.wav'), '--output', path('x.wav')], /Cannot read the input file .*ENOENT/],
      [['--input', 'step', '--output-format', 'f32'], /--output-format needs --output/],
    ];
    for (const [argv, pattern] of cases) {
      const r = await runCli(['simulate', '--b', '1', ...argv]);
      expect(r.code, argv.join(' ')).toBe(2);
      expect(r.stderr).toMatch(pattern);
    }
    const full = readFileSync(path('in24.wav'));
    writeFileSync(path('cut.wav'), full.subarray(0, 1000));
    const cut = await runCli(['simulate', '--b', '1', '--input', path('cut.wav'), '--output', path('x.wav')]);
    expect(cut.code).toBe(2);
    expect(cut.stderr).toMatch(/declares 900006 bytes .* ends after 956 bytes/);
  });
});
