/**
 * The one sanitiser of names that become file names or C identifiers: plain lower-case ASCII words (accents
 * dropped, everything else a separator), joined by hyphens or underscores, cut at a whole word.
 */

/** Longest file-name stem kept, characters (room for the extension and a browser's " (1)" suffix). */
export const MAX_STEM_CHARS = 60;
/** Longest C identifier prefix kept, characters. */
export const MAX_C_PREFIX_CHARS = 32;

/** The words of a name as lower-case ASCII letters and digits. */
function words(name: string): string[] {
  return name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter(Boolean);
}

/** The words joined by `sep`, stopping before the first word that would pass `max` (a first word too long is cut). */
function joined(name: string, sep: string, max: number): string {
  let out = '';
  for (const w of words(name)) {
    const next = out ? `${out}${sep}${w}` : w;
    if (next.length > max) return out || w.slice(0, max);
    out = next;
  }
  return out;
}

/** A file-name stem from a name, e.g. "Hopper scale: 50 Hz hum" → "hopper-scale-50-hz-hum"; `fallback` when none is left. */
export function fileStem(name: string, fallback = 'polewright-design'): string {
  return joined(name, '-', MAX_STEM_CHARS) || fallback;
}

/** A C identifier prefix from a name: "hopper_scale_50_hz" style, never starting with a digit. */
export function cPrefix(name: string): string {
  const s = joined(name, '_', MAX_C_PREFIX_CHARS);
  if (!s) return 'pw_filter';
  return /^[0-9]/.test(s) ? `f_${s}` : s;
}

/** The design file's name: stem plus .json. */
export function designFileName(name: string): string {
  return `${fileStem(name)}.json`;
}

/**
 * An export's file name: "hopper-scale-50-hz-hum-notches.json" (falling back to "filter"); a C header is
 * named after its C prefix, as its include guard and first comment line are ("hopper_scale_50_hz_hum_notches.h").
 */
export function exportFileName(designName: string, extension: string): string {
  if (extension === 'h') return `${cPrefix(designName)}.h`;
  return `${fileStem(designName, 'filter')}.${extension}`;
}
