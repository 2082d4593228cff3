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

/**
 * XML 1.0 (Fifth Edition), production [2]: Char ::= #x9 | #xA | #xD | [#x20-#xD7FF] | [#xE000-#xFFFD] |
 * [#x10000-#x10FFFF], from memory. A well-formed document holds nothing else, not even as a reference.
 */
const XML_CHAR = /^[\t\n\r\u0020-\ud7ff\ue000-\ufffd\u{10000}-\u{10ffff}]*$/u;

describe('escapeXml', () => {
  it('escapes the five XML specials, keeps other characters, and writes tab and line ends as references', () => {
    expect(escapeXml(`a<b>c&d"e'f ü 𝄞`)).toBe('a&lt;b&gt;c&amp;d&quot;e&apos;f ü 𝄞');
    expect(escapeXml('a\tb\nc\rd')).toBe('a&#9;b&#10;c&#13;d');
  });

  it('never lets through a character XML forbids, whatever the name holds (every UTF-16 code unit)', () => {
    const every = Array.from({ length: 0x10000 }, (_, i) => String.fromCharCode(i)).join('');
    const out = escapeXml(every + '\ud834\udd1e' + '\udd1e\ud834');
    expect(out).toMatch(XML_CHAR);
    // Forbidden ones become U+FFFD, one each; the valid pair stays a pair.
    expect(escapeXml('a\u0001b\u001fc\uffffd\ud800e')).toBe('a\ufffdb\ufffdc\ufffdd\ufffde');
    expect(escapeXml('\ud834\udd1e')).toBe('𝄞');
  });
});

describe('pictureDocument', () => {
  const base = { width: 600.4, height: 300, subtitle: 'z-plane · sample rate 2 kHz', body: '<g/>' };

  it('is made only of characters XML allows when the name holds control characters', () => {
    const svg = pictureDocument({ ...base, title: 'Hum\u0001 notch\u0008\u001b[31m', background: true });
    expect(svg).toMatch(XML_CHAR);
    expect(svg).toContain('Hum\ufffd notch\ufffd\ufffd[31m');
  });

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
