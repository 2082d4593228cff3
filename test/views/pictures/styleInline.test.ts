import { describe, expect, it } from 'vitest';
import {
  INHERITED_PROPERTIES,
  presentationAttributes,
  type StyleReader,
} from '../../../src/views/pictures/styleInline.ts';
import { plotTitleText } from '../../../src/views/pictures/views.ts';

/** A computed-style reader over a plain map; unknown properties read as '' like getPropertyValue. */
function styles(map: Record<string, string>): StyleReader {
  return (p) => map[p] ?? '';
}

describe('presentationAttributes', () => {
  const parent = styles({ fill: 'rgb(0, 0, 0)', stroke: 'none', 'font-size': '12px', opacity: '1' });

  it('writes every inherited property at the top, where nothing is inherited', () => {
    const own = styles({ fill: 'rgb(0, 0, 0)', 'font-size': '12px', opacity: '1' });
    expect(presentationAttributes(own, null, false)).toEqual([
      ['fill', 'rgb(0, 0, 0)'],
      ['font-size', '12px'],
    ]);
  });

  it('leaves out what the parent already gives and writes what differs', () => {
    const own = styles({ fill: 'rgb(0, 0, 0)', stroke: 'rgb(31, 79, 191)', 'font-size': '12px' });
    expect(presentationAttributes(own, parent, false)).toEqual([['stroke', 'rgb(31, 79, 191)']]);
  });

  it('writes a value equal to the SVG default when the parent differs (no silent inheritance)', () => {
    const own = styles({ fill: 'rgb(0, 0, 0)', stroke: 'none', 'text-anchor': 'start' });
    const endParent = styles({ fill: 'rgb(0, 0, 0)', stroke: 'none', 'text-anchor': 'end' });
    expect(presentationAttributes(own, endParent, false)).toEqual([['text-anchor', 'start']]);
  });

  it('writes opacity only when not 1', () => {
    const same = { fill: 'rgb(0, 0, 0)', stroke: 'none', 'font-size': '12px' };
    expect(presentationAttributes(styles({ ...same, opacity: '1' }), parent, false)).toEqual([]);
    expect(presentationAttributes(styles({ ...same, opacity: '0.5' }), parent, false)).toEqual([
      ['opacity', '0.5'],
    ]);
  });

  it('writes a CSS transform only where the element has no transform attribute', () => {
    const own = styles({
      fill: 'rgb(0, 0, 0)',
      stroke: 'none',
      'font-size': '12px',
      transform: 'matrix(1.35, 0, 0, 1.35, 0, 0)',
      'transform-origin': '0px 0px',
    });
    expect(presentationAttributes(own, parent, false)).toEqual([
      ['transform', 'matrix(1.35, 0, 0, 1.35, 0, 0)'],
      ['transform-origin', '0px 0px'],
    ]);
    expect(presentationAttributes(own, parent, true)).toEqual([]);
  });

  it('covers the properties that decide how axes and labels look', () => {
    // common practice: SVG text and line styling lives in these properties
    for (const p of [
      'fill',
      'stroke',
      'stroke-width',
      'stroke-dasharray',
      'font-family',
      'font-size',
      'text-anchor',
    ])
      expect(INHERITED_PROPERTIES).toContain(p);
  });
});

describe('plotTitleText', () => {
  it('adds the unit in brackets, or after a comma when the name has its own', () => {
    expect(plotTitleText('Magnitude', 'dB')).toBe('Magnitude (dB)');
    expect(plotTitleText('Phase (°)', 'unwrapped')).toBe('Phase (°), unwrapped');
    expect(plotTitleText('Group delay', 'samples')).toBe('Group delay (samples)');
    expect(plotTitleText('Group delay', null)).toBe('Group delay');
  });
});
