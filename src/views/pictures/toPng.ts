/**
 * PNG from a picture's SVG: the SVG is drawn as an image onto a canvas at `scale` times its size, over a
 * white background and, for the z-plane, over the shading canvas (drawn directly, so nothing passes
 * through an image URL it need not). Needs `img-src blob:` in the page's Content-Security-Policy.
 */

/** Pixel scale of PNG pictures: sharp on high-density screens and in printed reports. */
export const PNG_SCALE = 2;

async function svgImage(svgText: string): Promise<HTMLImageElement> {
  const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
  try {
    const img = new Image();
    img.src = url;
    await img.decode();
    return img;
  } finally {
    URL.revokeObjectURL(url);
  }
}

export interface Underlay {
  canvas: HTMLCanvasElement;
  /** Where it goes in the picture, px (before scaling). */
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A PNG of the SVG text (width × height px before scaling), with an optional raster under it. */
export async function svgToPng(
  svgText: string,
  width: number,
  height: number,
  underlay: Underlay | null,
  scale = PNG_SCALE,
): Promise<Blob> {
  const img = await svgImage(svgText);
  const canvas = document.createElement('canvas');
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('this browser gives no 2-D canvas to draw the picture on');
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, canvas.width, canvas.height);
  if (underlay) {
    ctx.imageSmoothingEnabled = true;
    ctx.imageSmoothingQuality = 'high';
    const u = underlay;
    ctx.drawImage(u.canvas, u.x * scale, u.y * scale, u.width * scale, u.height * scale);
  }
  ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
  return new Promise((resolve, reject) =>
    canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('the PNG could not be encoded'))), 'image/png'),
  );
}
