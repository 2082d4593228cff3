import { describe, expect, it } from 'vitest';
import { pictureFileName } from '../../../src/views/pictures/savePicture.ts';

describe('picture file names', () => {
  it('names pictures by design, view and format', () => {
    expect(pictureFileName('Hum notch', 'plane', 'png')).toBe('hum-notch-z-plane.png');
    expect(pictureFileName('Hum notch', 'frequency', 'svg')).toBe('hum-notch-frequency.svg');
    expect(pictureFileName('', 'time', 'svg')).toBe('polewright-design-time.svg');
  });
});
