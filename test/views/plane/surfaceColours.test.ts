import { describe, expect, it } from 'vitest';
import { paintLevels, surfaceColour } from '../../../src/views/plane/surfaceColours.ts';

/**
 * The shading's colours per 5 dB band, as d3-interpolate 3.0.2's interpolateRgb between the same stops gave
 * them (computed with it before the page dropped that package): linear in each sRGB channel, rounded.
 */
const D3_INTERPOLATE_RGB: [number, string][] = [
  [-70, 'rgb(63, 157, 146)'],
  [-65, 'rgb(63, 157, 146)'],
  [-60, 'rgb(71, 161, 151)'],
  [-55, 'rgb(87, 170, 160)'],
  [-50, 'rgb(103, 179, 169)'],
  [-45, 'rgb(119, 187, 179)'],
  [-40, 'rgb(135, 196, 188)'],
  [-35, 'rgb(151, 205, 197)'],
  [-30, 'rgb(166, 212, 205)'],
  [-25, 'rgb(181, 218, 211)'],
  [-20, 'rgb(196, 224, 217)'],
  [-15, 'rgb(210, 230, 224)'],
  [-10, 'rgb(225, 236, 230)'],
  [-5, 'rgb(240, 242, 236)'],
  [0, 'rgb(247, 239, 230)'],
  [5, 'rgb(246, 226, 211)'],
  [10, 'rgb(245, 214, 192)'],
  [15, 'rgb(244, 201, 173)'],
  [20, 'rgb(239, 184, 149)'],
  [25, 'rgb(230, 162, 121)'],
  [30, 'rgb(221, 139, 93)'],
  [35, 'rgb(212, 117, 65)'],
  [40, 'rgb(207, 106, 51)'],
  [45, 'rgb(207, 106, 51)'],
];

describe('surfaceColour', () => {
  it.each(D3_INTERPOLATE_RGB)('%d dB gives %s', (db, colour) => {
    expect(surfaceColour(db)).toBe(colour);
  });

  it('paints the pixels of a level with the colour of its band, NaN as the top colour', () => {
    const pixels = new Uint8ClampedArray(8);
    paintLevels(new Float32Array([-12, NaN]), pixels, 2);
    expect([...pixels]).toEqual([210, 230, 224, 255, 207, 106, 51, 255]);
  });
});
