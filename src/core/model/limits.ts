/**
 * The workbench's own bounds on a design and on how it is shown. The store's actions, the page's fields and
 * the file/link schemas all read them here, so a value one of them accepts is never refused by another.
 */

/** Largest sample rate, Hz. */
export const MAX_SAMPLE_RATE = 1e9;
/** Largest multiplicity of one stored root. */
export const MAX_MULTIPLICITY = 64;
/** Frequency points of the frequency view on [0, fs/2]. */
export const RESPONSE_POINTS_MIN = 16;
export const RESPONSE_POINTS_MAX = 65_536;
/** Samples of the time view (more would not redraw within a frame while dragging). */
export const TIME_SAMPLES_MIN = 8;
export const TIME_SAMPLES_MAX = 65_536;
/** Most undo steps kept, in the store and in an autosaved session; older ones are dropped. */
export const HISTORY_LIMIT = 500;
