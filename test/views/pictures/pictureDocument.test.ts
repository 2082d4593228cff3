import { describe, expect, it } from 'vitest';
import {
  escapeXml,
  fitText,
  labelSvg,
  pictureDocument,
  pictureSize,
  titleLayout,
  TITLE_BAND_PX,
  TITLE_BAND_TWO_LINES_PX,
} from '../../../src/views/pictures/pictureDocument.ts';

const HOSTILE = '<img src=x onerror=alert(1)> & "quotes"';

describe('escapeXml', () => {
  it('escapes the five XML specials and nothing else', () => {
    expect(escapeXml(`a<b>c&d"e'f ü`)).toBe('a&lt;b&gt;c&amp;d&quot;e&apos;f ü');
  });
});

describe('pictureDocument', () => {
  const base = { width: 600.4, height: 300, subtitle: 'z-plane · sample rate 2 kHz', body: '<g/>' };

  it('writes a design name with markup as text, never as an element', () => {
    const svg = pictureDocument({ ...base, title: HOSTILE, background: true });
    expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt; &amp; &quot;quotes&quot;');
    expect(svg).not.toContain('<img');
    expect(svg).not.toMatch(/onerror=alert\(1\)>/);
  });

  it('puts the view under a title band on white, sized to whole pixels', () => {
    const svg = pictureDocument({ ...base, title: 'Hum notch', background: true });
    // 600.4 px wide rounds up so nothing is cut; one title line fits in 600 px.
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    expect(svg).toContain(`width="601" height="${300 + TITLE_BAND_PX}"`);
    expect(svg).toContain(`<rect width="601" height="${300 + TITLE_BAND_PX}" fill="#ffffff"/>`);
    expect(svg).toContain(`<g transform="translate(0,${TITLE_BAND_PX})"><g/></g>`);
    expect(svg.endsWith('</svg>')).toBe(true);
  });

  it('leaves the background and the shading to the PNG path when asked', () => {
    const svg = pictureDocument({ ...base, title: 'Hum notch', background: false });
    expect(svg).not.toContain('fill="#ffffff"');
    expect(svg).not.toContain('<image');
  });

  it('embeds the shading raster under the drawing for SVG', () => {
    const svg = pictureDocument({
      ...base,
      title: 'Hum notch',
      background: true,
      underlay: 'data:image/png;base64,AAAA',
    });
    const image = svg.indexOf('<image');
    expect(image).toBeGreaterThan(0);
    expect(image).toBeLessThan(svg.indexOf('<g/>'));
    expect(svg).toContain('href="data:image/png;base64,AAAA"');
  });
});

describe('titleLayout', () => {
  it('keeps title and subtitle on one line when they fit', () => {
    const t = titleLayout('Hum notch', 'Time response · sample rate 48 kHz', 900);
    expect(t).toEqual({
      band: TITLE_BAND_PX,
      title: 'Hum notch',
      subtitle: 'Time response · sample rate 48 kHz',
      twoLines: false,
    });
  });

  it('moves the subtitle to a second line on a narrow view instead of cutting the name', () => {
    const t = titleLayout('Hopper scale: 50 Hz hum notches', 'z-plane · sample rate 2 kHz', 390);
    expect(t.twoLines).toBe(true);
    expect(t.band).toBe(TITLE_BAND_TWO_LINES_PX);
    expect(t.title).toBe('Hopper scale: 50 Hz hum notches');
    expect(pictureSize({ width: 390, height: 500, title: t.title, subtitle: t.subtitle }).top).toBe(
      TITLE_BAND_TWO_LINES_PX,
    );
  });

  it('shortens a name longer than the whole line with an ellipsis', () => {
    const long = 'A very long design name that goes on and on about hum and weighing and more';
    const t = titleLayout(long, 'z-plane', 300);
    expect(t.title.endsWith('…')).toBe(true);
    expect(Array.from(t.title).length).toBeLessThan(Array.from(long).length);
  });
});

describe('fitText', () => {
  it('cuts by characters, not UTF-16 units, so no surrogate pair is split', () => {
    const text = '😀'.repeat(20);
    const out = fitText(text, 10 * 8, 8);
    expect(Array.from(out)).toHaveLength(10);
    expect(out.endsWith('…')).toBe(true);
    expect(/\p{Cs}/u.test(out.replace('…', ''))).toBe(false);
  });
});

describe('labelSvg', () => {
  it('writes an HTML label as escaped SVG text', () => {
    expect(labelSvg({ x: 4, y: 12, text: 'Phase (°) <b>', bold: true })).toMatch(
      /^<text x="4" y="12" .*font-weight="600" fill="#1d2330">Phase \(°\) &lt;b&gt;<\/text>$/,
    );
  });
});
