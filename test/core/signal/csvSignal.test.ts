import { describe, it, expect } from 'vitest';
import {
  CsvSignalReader,
  readCsvSignal,
  writeCsvSignal,
  TIME_STEP_TOLERANCE,
} from '../../../src/core/signal/index.ts';
import { SINGLE_FIELD_CASES } from '../../helpers/numberPolicy.ts';

function ok(text: string, options = {}) {
  const r = readCsvSignal(text, options);
  if (r.status !== 'ok') throw new Error(JSON.stringify(r));
  return r.signal;
}

describe('readCsvSignal', () => {
  it('reads every value cell by the number policy (one cell per line, so commas never separate here)', () => {
    // Texts the policy reads, in a one-column file; a comma can only be a decimal mark in such a file.
    const cases = SINGLE_FIELD_CASES.filter(
      ([t, v]) => v !== null && t.trim() !== '' && !/\s/.test(t.trim()),
    );
    const text = cases.map(([t]) => t.trim()).join('\n');
    const samples = ok(text, { sampleRate: 1, decimal: ',', delimiter: ';' }).samples;
    expect(Array.from(samples)).toEqual(cases.map(([, v]) => v));
    for (const [t, v] of SINGLE_FIELD_CASES) {
      if (v !== null || t.trim() === '' || /\s/.test(t.trim()) || t.includes(',')) continue;
      expect(readCsvSignal(`1\n${t}\n`, { sampleRate: 1 }).status, t).toBe('error');
    }
  });

  it('one column without a sample rate asks for one, with the samples read', () => {
    const r = readCsvSignal('# comment\nvalue\n1\n2.5\n\n-3e-1\n');
    expect(r.status).toBe('needs-sample-rate');
    if (r.status === 'needs-sample-rate') {
      expect(Array.from(r.samples)).toEqual([1, 2.5, -0.3]);
      expect(r.header).toEqual(['value']);
    }
    expect(ok('1\n2\n', { sampleRate: 100 }).sampleRate).toBe(100);
  });

  it('time and value columns: the rate from the time step, start time kept', () => {
    const s = ok('time,volts\r\n0.5,1\r\n0.501,2\r\n0.502,3\r\n0.503,4');
    expect(Array.from(s.samples)).toEqual([1, 2, 3, 4]);
    expect(s.sampleRate).toBe(1000);
    expect(s.startTime).toBe(0.5);
    expect(s.timing?.uniform).toBe(true);
    expect(s.notes[0]).toMatch(/column 1 \("time"\) as time.*column 2 \("volts"\)/);
  });

  it('times printed with few digits still count as even (rounding allowed for)', () => {
    const lines = Array.from({ length: 500 }, (_, k) => `${(k / 48000).toFixed(6)}\t${k}`);
    const s = ok(lines.join('\n'));
    expect(s.timing?.uniform).toBe(true);
    expect(s.sampleRate).toBeCloseTo(48000, -1);
  });

  it('says so when the time column is uneven, naming the line', () => {
    const text = 't,v\n0,1\n0.1,1\n0.2,1\n0.35,1\n0.4,1\n';
    const s = ok(text);
    expect(s.timing?.uniform).toBe(false);
    expect(s.timing?.worstLine).toBe(5);
    expect(s.notes.join(' ')).toMatch(new RegExp(`line 5.*beyond the ${100 * TIME_STEP_TOLERANCE} %`));
  });

  it('semicolons with decimal commas, tabs, spaces and quoted cells', () => {
    expect(Array.from(ok('0;1,5\n0,001;-2,25\n').samples)).toEqual([1.5, -2.25]);
    expect(Array.from(ok('0\t1\n1\t2\n').samples)).toEqual([1, 2]);
    expect(Array.from(ok('  0   7\n  1   8\n').samples)).toEqual([7, 8]);
    expect(Array.from(ok('"t","v"\n"0","0.5"\n"1","0.25"\n').samples)).toEqual([0.5, 0.25]);
    expect(Array.from(ok('1,2,\n', { layout: 'samples', sampleRate: 1, valueColumn: 1 }).samples)).toEqual([
      2,
    ]);
  });

  it('broken lines give the line number, the cell, and what is accepted', () => {
    const bad = (text: string, options = {}) => {
      const r = readCsvSignal(text, options);
      if (r.status !== 'error') throw new Error('expected an error');
      return r.error;
    };
    const e1 = bad('v\n1\n2\nabc\n', { sampleRate: 1 });
    expect(e1.line).toBe(4);
    expect(e1.message).toBe('Line 4, column 1 holds "abc", not a number.');
    expect(e1.expected).toMatch(/decimal number/);
    expect(bad('t,v\n0,1\n1\n').message).toMatch(/Line 3 has 1 column\(s\); column 2 is read/);
    expect(bad('t,v\n0,1\n0,2\n').message).toMatch(/Line 3: time 0 is not after the previous time 0/);
    expect(bad('0,1\n1,,2\n').message).toMatch(/Line 2, column 2 is empty/);
    expect(bad('1\n0x10\n', { sampleRate: 1 }).message).toMatch(/"0x10"/);
    expect(bad('# only a comment\n\n').message).toMatch(/no samples/);
  });

  it('text pushed in pieces of any size reads the same as one piece', () => {
    const text =
      '\uFEFFtime_s,value\n' +
      Array.from({ length: 300 }, (_, k) => `${k / 100},${Math.sin(k)}`).join('\r\n');
    const whole = ok(text);
    for (const size of [1, 7, 64]) {
      const reader = new CsvSignalReader();
      const got: number[] = [];
      for (let p = 0; p < text.length; p += size) {
        const r = reader.push(text.slice(p, p + size));
        if (!r.ok) throw new Error(r.error.message);
        got.push(...r.value.samples);
      }
      const end = reader.finish();
      if (!end.ok) throw new Error(end.error.message);
      got.push(...end.value.block.samples);
      expect(got).toEqual(Array.from(whole.samples));
      expect(end.value.timing?.meanStep).toBeCloseTo(0.01, 12);
    }
  });

  it('writing and reading back gives the same float64 values', () => {
    const x = Float64Array.of(0.1, -1 / 3, 1e-300, 12345.678901234567);
    const text = writeCsvSignal([x], 48000);
    expect(text.split('\n')[0]).toBe('time_s,value');
    const back = ok(text);
    expect(Array.from(back.samples)).toEqual(Array.from(x));
    expect(back.sampleRate).toBe(48000);
  });
});
