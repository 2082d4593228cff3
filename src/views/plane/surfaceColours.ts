/**
 * Colours of the |H| shading: valleys lean to the zero colour, hills to the pole colour, 0 dB is paper.
 * Levels are banded so the shading reads like contour lines.
 */

/** Lowest and highest level the shading distinguishes, dB; beyond them the end colours hold. */
export const SURFACE_DB_MIN = -60;
export const SURFACE_DB_MAX = 40;
/** Width of one colour band, dB. */
export const SURFACE_BAND_DB = 5;

/** Colour stops (dB, CSS colour): light tints of --pw-zero below 0 dB and of --pw-pole above. */
export const SURFACE_STOPS: [number, string][] = [
  [-60, '#3f9d92'],
  [-30, '#9fd1ca'],
  [0, '#f7f5ef'],
  [20, '#f3c3a3'],
  [40, '#cf6a33'],
];

/** Red, green and blue (0…255) of a `#rrggbb` stop. */
function channels(hex: string): [number, number, number] {
  const v = parseInt(hex.slice(1), 16);
  return [(v >> 16) & 255, (v >> 8) & 255, v & 255];
}

/** Red, green and blue (0…255, whole) for a level in dB (banded): straight lines between the stops. */
function surfaceRgb(db: number): [number, number, number] {
  const band = Math.floor(db / SURFACE_BAND_DB) * SURFACE_BAND_DB + SURFACE_BAND_DB / 2;
  const x = Math.min(SURFACE_DB_MAX, Math.max(SURFACE_DB_MIN, band));
  let i = 1;
  while (i < SURFACE_STOPS.length - 1 && x > SURFACE_STOPS[i]![0]) i++;
  const [d0, c0] = SURFACE_STOPS[i - 1]!;
  const [d1, c1] = SURFACE_STOPS[i]!;
  const t = (x - d0) / (d1 - d0);
  const a = channels(c0);
  const b = channels(c1);
  return [0, 1, 2].map((k) => Math.round(a[k]! + t * (b[k]! - a[k]!))) as [number, number, number];
}

/** CSS colour for a level in dB (banded). */
export function surfaceColour(db: number): string {
  const [r, g, b] = surfaceRgb(db);
  return `rgb(${r}, ${g}, ${b})`;
}

/** Number of entries in the lookup table, one per 0.5 dB over the range. */
const LUT_SIZE = 2 * (SURFACE_DB_MAX - SURFACE_DB_MIN) + 1;
let lut: Uint8ClampedArray | null = null;

function table(): Uint8ClampedArray {
  if (lut) return lut;
  lut = new Uint8ClampedArray(LUT_SIZE * 3);
  for (let i = 0; i < LUT_SIZE; i++) {
    lut.set(surfaceRgb(SURFACE_DB_MIN + i / 2), 3 * i);
  }
  return lut;
}

/** Fills RGBA pixels (opaque) from dB values, one pixel per value. */
export function paintLevels(db: Float32Array, pixels: Uint8ClampedArray, count: number): void {
  const t = table();
  for (let p = 0; p < count; p++) {
    const v = db[p]!;
    const x = Number.isNaN(v) ? SURFACE_DB_MAX : v;
    const i = Math.round(2 * (Math.min(SURFACE_DB_MAX, Math.max(SURFACE_DB_MIN, x)) - SURFACE_DB_MIN));
    pixels[4 * p] = t[3 * i]!;
    pixels[4 * p + 1] = t[3 * i + 1]!;
    pixels[4 * p + 2] = t[3 * i + 2]!;
    pixels[4 * p + 3] = 255;
  }
}
