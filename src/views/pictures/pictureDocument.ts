/**
 * The picture around a view: a stand-alone SVG document with a title line (design name, view, sample
 * rate) above the view's own drawing, on white. Pure string building, so it runs and is tested without a
 * page; every piece of text from the design is escaped, never interpreted as markup.
 */

/** Height of the title band above the view, px. */
export const TITLE_BAND_PX = 30;
/** Left margin of the title, px. */
export const TITLE_INSET_PX = 12;
export const TITLE_FONT = "system-ui, -apple-system, 'Segoe UI', Roboto, 'Helvetica Neue', Arial, sans-serif";
export const TITLE_COLOUR = '#1d2330';
export const MUTED_COLOUR = '#5f6b7a';

/** Escapes text for an XML text node or attribute value. */
export function escapeXml(text: string): string {
  return text.replace(/[<>&"']/g, (c) =>
    c === '<' ? '&lt;' : c === '>' ? '&gt;' : c === '&' ? '&amp;' : c === '"' ? '&quot;' : '&apos;',
  );
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

/** The title shortened with an ellipsis so it does not run into the subtitle on a picture `width` px wide. */
export function fitTitle(title: string, subtitle: string, width: number): string {
  const room = width - 2 * TITLE_INSET_PX - subtitle.length * SUBTITLE_CHAR_PX - 16;
  const max = Math.max(8, Math.floor(room / TITLE_CHAR_PX));
  const chars = Array.from(title);
  return chars.length <= max
    ? title
    : `${chars
        .slice(0, max - 1)
        .join('')
        .trimEnd()}…`;
}

/** Total size of the picture, px. */
export function pictureSize(width: number, height: number): { width: number; height: number } {
  return { width: Math.ceil(width), height: Math.ceil(height) + TITLE_BAND_PX };
}

/** The stand-alone SVG document. */
export function pictureDocument(p: PictureParts): string {
  const { width, height } = pictureSize(p.width, p.height);
  const base = TITLE_BAND_PX - 10;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" version="1.1"`,
    ` width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">`,
    p.background ? `<rect width="${width}" height="${height}" fill="#ffffff"/>` : '',
    `<text x="${TITLE_INSET_PX}" y="${base}" font-family="${escapeXml(TITLE_FONT)}" font-size="14"`,
    ` font-weight="600" fill="${TITLE_COLOUR}">${escapeXml(fitTitle(p.title, p.subtitle, width))}</text>`,
    `<text x="${width - TITLE_INSET_PX}" y="${base}" text-anchor="end" font-family="${escapeXml(TITLE_FONT)}"`,
    ` font-size="12" fill="${MUTED_COLOUR}">${escapeXml(p.subtitle)}</text>`,
    `<g transform="translate(0,${TITLE_BAND_PX})">`,
    p.underlay
      ? `<image x="0" y="0" width="${p.width}" height="${p.height}" preserveAspectRatio="none" href="${escapeXml(p.underlay)}"/>`
      : '',
    p.body,
    `</g></svg>`,
  ].join('');
}
