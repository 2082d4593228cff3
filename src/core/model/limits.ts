/**
 * The one set of bounds on a design and on how it is shown. The store's actions, the page's fields, the
 * designers, the parser, the command line and the file/link/session schemas all read them here, and every
 * edit is checked against them (check.ts) before it is accepted, so a design the page holds always saves,
 * links and reopens. Each bound follows from the job; src/share/README.md states them for users.
 */

/** Largest sample rate, Hz. */
export const MAX_SAMPLE_RATE = 1e9;
/** Largest order of the zeros or of the poles (conjugates and multiplicities counted). */
export const MAX_ORDER = 1024;
/**
 * Largest multiplicity of one stored root: an FIR's poles all sit at the origin, one root whose multiplicity
 * is the FIR's order, so a root may be as repeated as the order allows.
 */
export const MAX_MULTIPLICITY = MAX_ORDER;
/** Most coefficients of b or of a: one more than the largest order. */
export const MAX_COEFFICIENTS = MAX_ORDER + 1;
/** Longest design name, characters. */
export const MAX_NAME_CHARS = 200;
/** Longest design note, characters. */
export const MAX_NOTE_CHARS = 20_000;
/**
 * Characters of typed text allowed per coefficient: a double written in full with its separator takes at
 * most 26 ("-1.2345678901234567e-300, "), a difference-equation term about 40 ("+ … * x[n-1024] ").
 */
export const TYPED_CHARS_PER_COEFFICIENT = 64;
/** Longest typed text (equation, H(z), coefficient lists): room for b and a at their most coefficients. */
export const MAX_TYPED_TEXT_CHARS = TYPED_CHARS_PER_COEFFICIENT * 2 * MAX_COEFFICIENTS;
/** Most harmonics a harmonic-notch designer may list (each brings a pole pair and a zero pair). */
export const MAX_HARMONICS = 64;
/** Most edges of a designer's band (low, high). */
export const MAX_EDGES = 2;
/**
 * Most parts of a composed design (parts.ts): room for a classical filter with a notch at every hum
 * harmonic a harmonic-notch designer may list, each as a part of its own; the order limit bounds the whole.
 */
export const MAX_PARTS = MAX_HARMONICS + 1;
/** Largest harmonic number (or other whole-number item of a designer's list). */
export const MAX_WHOLE_ITEM = 1_000_000;
/**
 * Most regions of a requirement mask. A notch comb of the largest order has MAX_ORDER/2 + 1 teeth, a stop
 * region at each and a pass band between two neighbours, so its own mask has MAX_ORDER + 1 regions.
 */
export const MAX_MASK_REGIONS = MAX_ORDER + 1;
/** Longest id of a mask region, characters. */
export const MAX_REGION_ID_CHARS = 64;
/** Longest label of a mask region, characters. */
export const MAX_REGION_LABEL_CHARS = MAX_NAME_CHARS;
/** Frequency points of the frequency view on [0, fs/2]. */
export const RESPONSE_POINTS_MIN = 16;
export const RESPONSE_POINTS_MAX = 65_536;
/** Samples of the time view (more would not redraw within a frame while dragging). */
export const TIME_SAMPLES_MIN = 8;
export const TIME_SAMPLES_MAX = 65_536;
/** Most undo steps kept, in the store and in an autosaved session; older ones are dropped. */
export const HISTORY_LIMIT = 500;
