/** File names made from a design's name: plain ASCII words joined by hyphens, safe on every file system. */

/** Longest stem kept, characters (room for the extension and a browser's " (1)" suffix). */
export const MAX_STEM_CHARS = 60;

/** A file-name stem from a design name, e.g. "Hopper scale: 50 Hz hum" → "hopper-scale-50-hz-hum". */
export function fileStem(name: string, fallback = 'polewright-design'): string {
  const stem = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .slice(0, MAX_STEM_CHARS)
    .replace(/^-+|-+$/g, '');
  return stem || fallback;
}

/** The design file's name: stem plus .json. */
export function designFileName(name: string): string {
  return `${fileStem(name)}.json`;
}
