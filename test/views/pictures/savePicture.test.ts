import { describe, expect, it } from 'vitest';
import { designFileName, fileStem, MAX_STEM_CHARS } from '../../../src/views/shared/fileName.ts';
import { pictureFileName } from '../../../src/views/pictures/savePicture.ts';

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

  it('names pictures by design, view and format', () => {
    expect(pictureFileName('Hum notch', 'plane', 'png')).toBe('hum-notch-z-plane.png');
    expect(pictureFileName('Hum notch', 'frequency', 'svg')).toBe('hum-notch-frequency.svg');
    expect(pictureFileName('', 'time', 'svg')).toBe('polewright-design-time.svg');
  });
});
