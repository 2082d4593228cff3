/** File names and C identifiers made from the design's name, so exports of different designs do not clash. */

/** Longest slug kept from a design name for a file name and for a C prefix, characters. */
const MAX_FILE_SLUG = 40;
const MAX_C_SLUG = 32;

/** Lower-case words of the name joined by `sep` (ASCII letters and digits only), or '' when none remain. */
function slug(name: string, sep: string, max: number): string {
  const words = name
    .normalize('NFKD')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .trim()
    .split(' ')
    .filter(Boolean);
  let out = '';
  for (const w of words) {
    const next = out ? `${out}${sep}${w}` : w;
    if (next.length > max) break;
    out = next;
  }
  return out;
}

/**
 * A file name for the export: "hopper-scale-50-hz-hum-notches.json" (falls back to "filter"); a C header is
 * named after its C prefix, as its include guard and first comment line are ("hopper_scale_50_hz_hum_notches.h").
 */
export function exportFileName(designName: string, extension: string): string {
  if (extension === 'h') return `${cPrefix(designName)}.h`;
  return `${slug(designName, '-', MAX_FILE_SLUG) || 'filter'}.${extension}`;
}

/** A C identifier prefix for the export's names: "hopper_scale_50_hz" style, never starting with a digit. */
export function cPrefix(designName: string): string {
  const s = slug(designName, '_', MAX_C_SLUG);
  if (!s) return 'pw_filter';
  return /^[0-9]/.test(s) ? `f_${s}` : s;
}
