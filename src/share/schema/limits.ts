/**
 * Bounds on everything a design file, link or saved session may contain. They are checked before anything is
 * allocated or computed, so a hostile input costs at most a few milliseconds and a clear message. The
 * workbench's own bounds (sample rate, multiplicity, view sizes) are in src/core/model/limits.ts.
 */

/** Largest order of the zeros or of the poles (conjugates and multiplicities counted). */
export const MAX_ORDER = 1024;
/** Longest design name, characters. */
export const MAX_NAME_CHARS = 200;
/** Longest design note or typed-coefficient text, characters. */
export const MAX_TEXT_CHARS = 20_000;
/** Longest design file, characters. */
export const MAX_FILE_CHARS = 2_000_000;
/** Longest link fragment, characters (a full-order design with a long note fits in well under this). */
export const MAX_LINK_CHARS = 200_000;
/** Most harmonics a harmonic-notch designer may list, and most edges of a band. */
export const MAX_HARMONICS = 64;
export const MAX_EDGES = 2;
/** Deepest nesting and most values in the open-ended parts of a link (designer, mask, implementation). */
export const MAX_VALUE_DEPTH = 8;
export const MAX_VALUE_NODES = 10_000;
/** Most regions of a requirement mask. */
export const MAX_MASK_REGIONS = 64;
