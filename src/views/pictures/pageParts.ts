/**
 * Reads a view off the page for a picture: its SVG (styles inlined), the HTML labels drawn over it (plot
 * titles, the shading key) turned into SVG, and the shading canvas under the z-plane.
 */
import { svgContentMarkup } from './cloneSvg.ts';
import { labelSvg, type PictureLabel } from './pictureDocument.ts';
import { PICTURE_VIEWS, plotTitleText, type PictureView } from './views.ts';

export interface PageParts {
  width: number;
  height: number;
  /** SVG markup of the drawing and its labels, in the drawing's pixel coordinates. */
  body: string;
  /** The canvas under the drawing (plane shading), if shown. */
  underlay: HTMLCanvasElement | null;
}

/** Text of the chosen option in a radio group (a Segmented control), or null. */
function chosen(group: Element | null | undefined): string | null {
  return group?.querySelector('[role="radio"][aria-checked="true"]')?.textContent ?? null;
}

/** The frequency plots' HTML title rows as labels: name plus the unit chosen beside it. */
function plotTitles(section: Element, origin: DOMRect): PictureLabel[] {
  return Array.from(section.querySelectorAll('.pw-plot-title')).map((row) => {
    const groups = row.querySelectorAll('[role="radiogroup"]');
    const tabs = row.querySelector('.pw-seg-tabs');
    const name = row.querySelector('.pw-plot-name')?.textContent ?? chosen(tabs) ?? '';
    const unit = chosen(groups[groups.length - 1] === tabs ? null : groups[groups.length - 1]);
    const box = row.getBoundingClientRect();
    return {
      x: box.left - origin.left,
      y: box.top - origin.top + 13,
      text: plotTitleText(name, unit),
      bold: true,
    };
  });
}

/** The z-plane's shading key (an HTML figure with a small SVG) placed where it shows. */
function shadingKey(section: Element, origin: DOMRect): string {
  const figure = section.querySelector('.pw-surface-legend');
  const svg = figure?.querySelector('svg');
  if (!figure || !svg) return '';
  const f = figure.getBoundingClientRect();
  const s = svg.getBoundingClientRect();
  const caption = figure.querySelector('figcaption')?.textContent ?? '';
  const x = f.left - origin.left;
  const y = f.top - origin.top;
  return (
    `<rect x="${x}" y="${y}" width="${f.width}" height="${f.height}" fill="#ffffff" fill-opacity="0.9" rx="4"/>` +
    labelSvg({ x: x + 4, y: y + 12, text: caption, size: 11 }) +
    `<g transform="translate(${s.left - origin.left},${s.top - origin.top})">${svgContentMarkup(svg)}</g>`
  );
}

/** The parts of a view, or null when the view is not on the page (hidden or failed). */
export function readPageParts(view: PictureView, root: ParentNode = document): PageParts | null {
  const info = PICTURE_VIEWS[view];
  const section = root.querySelector(info.section);
  const svg = section?.querySelector<SVGSVGElement>(info.svg);
  if (!section || !svg) return null;
  const origin = svg.getBoundingClientRect();
  if (origin.width < 1 || origin.height < 1) return null;
  let body = svgContentMarkup(svg);
  if (view === 'frequency') body += plotTitles(section, origin).map(labelSvg).join('');
  if (view === 'plane') body += shadingKey(section, origin);
  const canvas = view === 'plane' ? section.querySelector<HTMLCanvasElement>('canvas.pw-surface') : null;
  return { width: origin.width, height: origin.height, body, underlay: canvas };
}
