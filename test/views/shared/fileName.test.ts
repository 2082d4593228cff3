import { describe, expect, it } from 'vitest';
import {
  cPrefix,
  designFileName,
  exportFileName,
  fileStem,
  MAX_STEM_CHARS,
} from '../../../src/views/shared/fileName.ts';
import { exportName } from '../../../src/views/signal/exportSignal.ts';
import type { LoadedSignal } from '../../../src/store/signal.ts';

describe('file names from design names', () => {
  it('joins plain words with hyphens', () => {
    expect(fileStem('Hopper scale: 50 Hz hum notches')).toBe('hopper-scale-50-hz-hum-notches');
    expect(designFileName('Hopper scale: 50 Hz hum notches')).toBe('hopper-scale-50-hz-hum-notches.json');
  });

  it('drops accents and anything a file system might refuse', () => {
    expect(fileStem('Kühlraum Brummfilter')).toBe('kuhlraum-brummfilter');
    expect(fileStem('a/b\\c:d*e?f"g<h>i|j')).toBe('a-b-c-d-e-f-g-h-i-j');
    expect(fileStem('<img src=x onerror=alert(1)>')).toBe('img-src-x-onerror-alert-1');
  });

  it('falls back to a fixed stem when nothing usable is left', () => {
    expect(fileStem('')).toBe('polewright-design');
    expect(fileStem('   ---   ')).toBe('polewright-design');
    expect(fileStem('滤波器')).toBe('polewright-design');
  });

  it('keeps long names short and never ends on a hyphen', () => {
    const stem = fileStem('word '.repeat(40));
    expect(stem.length).toBeLessThanOrEqual(MAX_STEM_CHARS);
    expect(stem.endsWith('-')).toBe(false);
  });
});

describe('export file names and C prefixes from the design name', () => {
  it('keeps letters and digits, joins words, and names a C header after its prefix', () => {
    expect(exportFileName('Hopper scale: 50 Hz hum notches', 'json')).toBe(
      'hopper-scale-50-hz-hum-notches.json',
    );
    expect(exportFileName('Hopper scale: 50 Hz hum notches', 'h')).toBe('hopper_scale_50_hz_hum_notches.h');
    expect(cPrefix('Pump skid — 3.15 kHz bracket')).toBe('pump_skid_3_15_khz_bracket');
  });

  it('never starts a C name with a digit and falls back when nothing is left', () => {
    expect(cPrefix('4th-order anti-alias')).toBe('f_4th_order_anti_alias');
    expect(cPrefix('→ ←')).toBe('pw_filter');
    expect(exportFileName('', 'csv')).toBe('filter.csv');
    expect(/^[A-Za-z_][A-Za-z0-9_]*$/.test(cPrefix('Ünïcödé names, too!'))).toBe(true);
  });

  it('stops at whole words when a name is long', () => {
    const p = cPrefix('a very long design name that goes on and on about its hum notches');
    expect(p.length).toBeLessThanOrEqual(32);
    expect(p.endsWith('_')).toBe(false);
    expect('a_very_long_design_name_that_goes_on'.startsWith(p)).toBe(true);
  });
});

describe('one sanitiser for every saved file', () => {
  const signal = (name: string, source: LoadedSignal['source'] = 'wav') => ({ name, source }) as LoadedSignal;

  it('names a filtered recording after the recording, in the same words as designs and exports', () => {
    expect(exportName(signal('hopper-hum.wav'), 'wav')).toBe('hopper-hum-filtered.wav');
    expect(exportName(signal('Pump skid (bracket) 3.15kHz.WAV'), 'csv')).toBe(
      'pump-skid-bracket-3-15khz-filtered.csv',
    );
    expect(exportName(signal('滤波.wav'), 'wav')).toBe('signal-filtered.wav');
    expect(exportName(signal('tones + hum', 'generated'), 'wav')).toBe('generated-filtered.wav');
  });

  it('cuts a long name at a whole word, and a single overlong word at the limit', () => {
    const long = 'hopper scale load cell bridge amplifier with mains hum notches at fifty hertz';
    const stem = fileStem(long);
    expect(stem.length).toBeLessThanOrEqual(MAX_STEM_CHARS);
    expect(long.replace(/ /g, '-').startsWith(stem + '-')).toBe(true);
    expect(fileStem('x'.repeat(100))).toBe('x'.repeat(MAX_STEM_CHARS));
    expect(exportFileName(long, 'json')).toBe(`${stem}.json`);
  });
});
