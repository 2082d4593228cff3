/**
 * Bounds on the containers a design travels in: design files, links and the open-ended parts of a link.
 * They are checked before anything is allocated or computed, so a hostile input costs at most a few
 * milliseconds and a clear message. They follow from the design's own bounds (src/core/model/limits.ts):
 * test/share/worstCase.test.ts builds the largest design those bounds allow, with the costliest characters,
 * and checks that its file, link and saved session fit within these.
 */
import { MAX_HARMONICS, MAX_MASK_REGIONS, MAX_PARTS } from '../../core/model/limits.ts';

/** Longest design file, characters. */
export const MAX_FILE_CHARS = 4_000_000;
/** Longest design file, bytes: UTF-8 takes at most 3 bytes per UTF-16 unit (and a 3-byte mark may lead). */
export const MAX_FILE_BYTES = MAX_FILE_CHARS * 3 + 3;
/** Deepest nesting of arrays and objects in a design file (a design needs 4). */
export const MAX_FILE_DEPTH = 32;
/** Longest link fragment, characters. */
export const MAX_LINK_CHARS = 2_000_000;
/** Deepest nesting of the open-ended parts of a link (designer, parts, mask, implementation, view). */
export const MAX_VALUE_DEPTH = 8;
/** Values one designer description may take in a link: the object, at most 10 fields, a harmonics list. */
const DESIGNER_VALUES = 1 + 10 + 1 + MAX_HARMONICS;
/**
 * Most values in the open-ended parts of a link: a mask region is an object of at most 7 fields (8 values
 * with the object itself); a designer, or the parts of a composed design (each an object of 4 fields with
 * a designer); the rest is a few dozen.
 */
export const MAX_VALUE_NODES = MAX_MASK_REGIONS * 8 + 1 + MAX_PARTS * (5 + DESIGNER_VALUES) + 256;
