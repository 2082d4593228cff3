/**
 * Fixed-point implementation: settings, Q formats, quantization, word-length search, bit-exact simulation
 * (whole or streamed), limit cycles, round-off noise and the comparison of arrangements.
 */
export {
  DEFAULT_IMPLEMENTATION,
  MIN_WORD_LENGTH,
  MAX_WORD_LENGTH,
  MAX_ACCUMULATOR_BITS,
  validateSettings,
} from './settings.ts';
export type { ImplementationSettings, Structure, Rounding, Overflow, FeedbackSign } from './settings.ts';
export { qName, codeRange, quantizeValue, codeValue, autoFractionBits } from './qformat.ts';
export type { QFormat } from './qformat.ts';
export { quantizeCascade, storedValues } from './quantize.ts';
export type { FixedSection, QuantizedCoefficients } from './quantize.ts';
export { buildImplementation, cascadeFor, quantizedResponse } from './implementation.ts';
export type { Implementation, SectionRoots } from './implementation.ts';
export { smallestWordLength } from './wordSearch.ts';
export type { QuantizedCheck, WordLengthSearch, WordLengthTrial } from './wordSearch.ts';
export { makeArith, makeBigArith, DOUBLE_PATH_MAX_BITS } from './arith.ts';
export type { Arith, DataPath } from './arith.ts';
export { FixedCascade } from './kernel.ts';
export type { OverflowEvent, OverflowPlace } from './kernel.ts';
export {
  simulateFixed,
  runFixedCodes,
  quantizeInput,
  fixedCascadeOf,
  MAX_OVERFLOW_EVENTS,
} from './simulate.ts';
export type { FixedSimulation } from './simulate.ts';
export { detectLimitCycle, LIMIT_CYCLE_MAX_SAMPLES } from './limitCycle.ts';
export type { LimitCycleReport } from './limitCycle.ts';
export { inputSignal, DEFAULT_SIGNAL_AMPLITUDE } from './signal.ts';
export type { SignalSpec } from './signal.ts';
export { zeroInputVerdict } from './limitCycle.ts';
export { FixedRun, meanSquareDbfs } from './run.ts';
export type { DifferenceStats, FixedRunReport } from './run.ts';
export { roundoffNoise, roundingError } from './noise.ts';
export type { RoundoffNoise, SectionNoise } from './noise.ts';
export {
  compareArrangements,
  quietestSafe,
  headroomOf,
  accumulatorSafe,
  HEADROOM_TOLERANCE,
  SNR_TIE_DB,
  ORDERINGS,
  SCALINGS,
  STRUCTURES,
} from './arrangements.ts';
export type { Arrangement, Headroom } from './arrangements.ts';
export { containerFormat, containerBits, codesToValues } from './codes.ts';
// The FIR forms (fir.ts) are imported from their own module, not from here: this index is in the page's
// first view, and every module it names is built into it.
