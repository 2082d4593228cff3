/** Takes a picture of one view and downloads it as SVG or PNG, titled with the design's name and sample rate. */
import { workbenchStore } from '../../store/useWorkbench.ts';
import { formatHz } from '../shared/format.ts';
import { downloadBlob } from '../shared/download.ts';
import { fileStem } from '../shared/fileName.ts';
import { readPageParts } from './pageParts.ts';
import { pictureDocument, pictureSize } from './pictureDocument.ts';
import { svgToPng } from './toPng.ts';
import { PICTURE_VIEWS, type PictureView } from './views.ts';

export type PictureFormat = 'svg' | 'png';

/** The picture's file name, e.g. "hopper-scale-50-hz-hum-z-plane.png". */
export function pictureFileName(designName: string, view: PictureView, format: PictureFormat): string {
  return `${fileStem(designName)}-${PICTURE_VIEWS[view].slug}.${format}`;
}

/** Makes the picture; throws with a message a user can act on when the view is not on the page. */
export async function makePicture(
  view: PictureView,
  format: PictureFormat,
): Promise<{ blob: Blob; fileName: string }> {
  const parts = readPageParts(view);
  if (!parts) {
    throw new Error(`The ${PICTURE_VIEWS[view].label} is not shown right now, so there is nothing to draw.`);
  }
  const { design } = workbenchStore.getState();
  const title = design.name.trim() || 'Untitled design';
  const subtitle = `${PICTURE_VIEWS[view].label} · sample rate ${formatHz(design.sampleRate)}`;
  const common = { width: parts.width, height: parts.height, title, subtitle, body: parts.body };
  const fileName = pictureFileName(design.name, view, format);
  if (format === 'svg') {
    const underlay = parts.underlay?.toDataURL('image/png');
    const text = pictureDocument({ ...common, background: true, ...(underlay ? { underlay } : {}) });
    return { blob: new Blob([text], { type: 'image/svg+xml' }), fileName };
  }
  const size = pictureSize(common);
  const text = pictureDocument({ ...common, background: false });
  const under = parts.underlay
    ? { canvas: parts.underlay, x: 0, y: size.top, width: parts.width, height: parts.height }
    : null;
  return { blob: await svgToPng(text, size.width, size.height, under), fileName };
}

/** Makes and downloads the picture; returns the file name. */
export async function savePicture(view: PictureView, format: PictureFormat): Promise<string> {
  const { blob, fileName } = await makePicture(view, format);
  downloadBlob(blob, fileName);
  return fileName;
}
