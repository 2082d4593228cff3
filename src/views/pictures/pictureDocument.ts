/**
 * The picture around a view: a stand-alone SVG document with a title line (design name, view, sample
 * rate) above the view's own drawing, on white. Pure string building, so it runs and is tested without a
 * page; every piece of text from the design is escaped, never interpreted as markup.
 */
import { fitText } from './fitText.ts';

export { fitText };

/** Height of the title band above the view when title and subtitle share one line, and when they take two, px. */
export const TITLE_BAND_PX = 30;
export const TITLE_BAND_TWO_LINES_PX = 46;
/** Left and right margin of the title, px. */
export const TITLE_INSET_PX = 12;
export const TITLE_FONT = "system-ui, -apple-system, 'Segoe UI', Roboto, 'Helvetica Neue', Arial, sans-serif";
export const TITLE_COLOUR = '#1d2330';
export const MUTED_COLOUR = '#5f6b7a';

/**
 * Characters XML 1.0 does not allow anywhere in a document, not even as a character reference (its Char
 * production): C0 controls other than tab, line feed and carriage return, U+FFFE, U+FFFF, and halves of
 * surrogate pairs standing alone.
 */
const NOT_XML =
  // eslint-disable-next-line no-control-regex -- these control characters are what the pattern is for
  /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;

const REFERENCES: Record<string, string> = {
  '<': '&lt;',
  '>': '&gt;',
  '&': '&amp;',
  '"': '&quot;',
  "'": '&apos;',
  // As references, so an attribute value keeps them (a parser turns literal ones into spaces there).
  '\t': '&#9;',
  '\n': '&#10;',
  '\r': '&#13;',
};

/**
 * Escapes text for an XML text node or attribute value: markup characters and white space other than the
 * space as references, and every character XML forbids (NOT_XML) as U+FFFD, the replacement character, so the
 * picture is always well-formed whatever a design's name holds.
 */
export function escapeXml(text: string): string {
  return text.replace(NOT_XML, '\ufffd').replace(/[<>&"'\t\n\r]/g, (c) => REFERENCES[c]!);
}

/** A label drawn as SVG text (for parts of a view the page writes in HTML, e.g. plot titles). */
export interface PictureLabel {
  x: number;
  /** Baseline, px. */
  y: number;
  text: string;
  size?: number;
  bold?: boolean;
  colour?: string;
}

/** One label as an SVG <text> element. */
export function labelSvg(l: PictureLabel): string {
  const weight = l.bold ? ' font-weight="600"' : '';
  return (
    `<text x="${l.x}" y="${l.y}" font-family="${escapeXml(TITLE_FONT)}" font-size="${l.size ?? 12}"` +
    `${weight} fill="${l.colour ?? TITLE_COLOUR}">${escapeXml(l.text)}</text>`
  );
}

export interface PictureParts {
  /** Size of the view's drawing, px. */
  width: number;
  height: number;
  /** Left part of the title line, e.g. the design name. */
  title: string;
  /** Right part of the title line, e.g. "z-plane · sample rate 2 kHz". */
  subtitle: string;
  /** The view's drawing as SVG markup, in its own pixel coordinates (already safe: serialised elements). */
  body: string;
  /** A raster under the drawing (the plane's shading) as a data URL; left out of PNGs, which draw it themselves. */
  underlay?: string;
  /** White background; off when a PNG paints its own background and underlay first. */
  background: boolean;
}

/** Rough widths of a character of the title (14 px, semibold) and subtitle (12 px), px: generous for digits and capitals. */
export const TITLE_CHAR_PX = 8.2;
export const SUBTITLE_CHAR_PX = 6.8;
/** Least gap between title and subtitle on one line, px. */
const TITLE_GAP_PX = 16;

/** How the title band is laid out on a picture `width` px wide: one line when both parts fit, else two. */
export interface TitleLayout {
  band: number;
  title: string;
  subtitle: string;
  twoLines: boolean;
}

export function titleLayout(title: string, subtitle: string, width: number): TitleLayout {
  const room = width - 2 * TITLE_INSET_PX;
  const need = Array.from(title).length * TITLE_CHAR_PX + TITLE_GAP_PX + subtitle.length * SUBTITLE_CHAR_PX;
  if (need <= room) return { band: TITLE_BAND_PX, title, subtitle, twoLines: false };
  return {
    band: TITLE_BAND_TWO_LINES_PX,
    title: fitText(title, room, TITLE_CHAR_PX),
    subtitle: fitText(subtitle, room, SUBTITLE_CHAR_PX),
    twoLines: true,
  };
}

/** Total size of the picture and where the view starts in it, px. */
export function pictureSize(p: Pick<PictureParts, 'width' | 'height' | 'title' | 'subtitle'>): {
  width: number;
  height: number;
  top: number;
} {
  const width = Math.ceil(p.width);
  const { band } = titleLayout(p.title, p.subtitle, width);
  return { width, height: Math.ceil(p.height) + band, top: band };
}

/** The stand-alone SVG document. */
export function pictureDocument(p: PictureParts): string {
  const { width, height, top } = pictureSize(p);
  const t = titleLayout(p.title, p.subtitle, width);
  const font = `font-family="${escapeXml(TITLE_FONT)}"`;
  const sub = t.twoLines
    ? `<text x="${TITLE_INSET_PX}" y="${top - 8}" ${font} font-size="12" fill="${MUTED_COLOUR}">`
    : `<text x="${width - TITLE_INSET_PX}" y="${top - 10}" text-anchor="end" ${font} font-size="12" fill="${MUTED_COLOUR}">`;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" version="1.1"`,
    ` width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">`,
    p.background ? `<rect width="${width}" height="${height}" fill="#ffffff"/>` : '',
    `<text x="${TITLE_INSET_PX}" y="20" ${font} font-size="14" font-weight="600" fill="${TITLE_COLOUR}">`,
    `${escapeXml(t.title)}</text>`,
    `${sub}${escapeXml(t.subtitle)}</text>`,
    `<g transform="translate(0,${top})">`,
    p.underlay
      ? `<image x="0" y="0" width="${p.width}" height="${p.height}" preserveAspectRatio="none" href="${escapeXml(p.underlay)}"/>`
      : '',
    p.body,
    `</g></svg>`,
  ].join('');
}
