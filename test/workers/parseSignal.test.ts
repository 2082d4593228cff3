import { describe, expect, it } from 'vitest';
import { parseSignalFile, sniffKind, type ParseMessage } from '../../src/workers/parseSignal.ts';
import { writeWav, makeTones } from '../../src/core/signal/index.ts';

async function parse(
  bytes: Uint8Array | string,
  name: string,
  opts: { channel?: number; sampleRate?: number } = {},
) {
  const messages: ParseMessage[] = [];
  const file = new Blob([bytes as BlobPart]);
  await parseSignalFile(
    { file, name, ...opts },
    (m) => {
      messages.push(m);
    },
    4096,
  );
  return messages;
}

const last = (ms: ParseMessage[]) => ms[ms.length - 1]!;

describe('parseSignalFile', () => {
  it('reads the chosen channel of a 24-bit stereo WAV exactly, in small slices, with rising progress', async () => {
    const left = makeTones(5000, 8000, [{ frequencyHz: 440, amplitude: 0.5 }]);
    const right = makeTones(5000, 8000, [{ frequencyHz: 50, amplitude: 0.25 }]);
    const { bytes } = writeWav({ format: 'i24', sampleRate: 8000, channels: [left, right] });
    const ms = await parse(bytes, 'two.wav', { channel: 1 });
    const progress = ms.filter((m) => m.type === 'progress').map((m) => m.fraction);
    expect(progress.length).toBeGreaterThan(5);
    expect(progress).toEqual([...progress].sort((a, b) => a - b));
    const done = last(ms);
    if (done.type !== 'done') throw new Error(JSON.stringify(done));
    expect(done.signal).toMatchObject({
      sampleRate: 8000,
      channel: 1,
      channelCount: 2,
      format: 'i24',
      source: 'wav',
    });
    // The file stores round(x·2^23); reading divides by 2^23 (sampleFormat.ts), so each sample is within half a step.
    const got = done.signal.samples.subarray(0);
    expect(got.length).toBe(5000);
    let worst = 0;
    for (let k = 0; k < got.length; k++) worst = Math.max(worst, Math.abs(got[k]! - right[k]!));
    expect(worst).toBeLessThanOrEqual(0.5 / 8388608);
  });

  it('takes the sample rate from a time column, and asks for it without one', async () => {
    const timed =
      '# bench log\ntime,value\n' +
      Array.from({ length: 100 }, (_, i) => `${(i / 500).toFixed(3)},${i % 7}`).join('\n');
    const a = last(await parse(timed, 'log.csv'));
    expect(a.type === 'done' && a.signal.sampleRate).toBe(500);
    const plain = Array.from({ length: 50 }, (_, i) => String(i)).join('\n');
    const b = last(await parse(plain, 'plain.txt'));
    expect(b.type).toBe('needs-sample-rate');
    if (b.type === 'needs-sample-rate') expect(Array.from(b.samples.subarray(0, 3))).toEqual([0, 1, 2]);
    const c = last(await parse(plain, 'plain.txt', { sampleRate: 1000 }));
    expect(c.type === 'done' && c.signal.sampleRate).toBe(1000);
  });

  it("reports the engine's message for broken files, with the line for CSV", async () => {
    const bad = last(await parse('1\n2\nthree\n4\n', 'x.csv'));
    expect(bad.type === 'error' && bad.error).toMatchObject({ line: 3 });
    expect(bad.type === 'error' && bad.error.message).toContain('"three"');
    const notWav = last(await parse('hello world, this is not audio', 'x.wav'));
    expect(notWav.type === 'error' && notWav.error.message).toContain('Not a WAV file');
    const empty = last(await parse('', 'x.wav'));
    expect(empty.type === 'error' && empty.error.message).toContain('empty');
  });
});

describe('sniffKind', () => {
  it('tells WAV by its RIFF tag, other audio by name, text by having no NUL bytes', () => {
    const riff = new Uint8Array([82, 73, 70, 70, 0, 0]);
    expect(sniffKind(riff, 'recording.bin')).toBe('wav');
    expect(sniffKind(new TextEncoder().encode('1,2\n'), 'data')).toBe('csv');
    const mp3 = sniffKind(new Uint8Array([0xff, 0xfb, 0, 0]), 'a.mp3');
    expect(typeof mp3 === 'object' && mp3.message).toContain('MP3');
    const bin = sniffKind(new Uint8Array([1, 0, 2, 3]), 'a.bin');
    expect(typeof bin === 'object' && bin.expected).toContain('CSV/TSV');
  });
});
