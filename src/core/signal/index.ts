/** Real signals: WAV and CSV codecs, generators, streaming section filter, FFT, windows, Welch spectrum, tone levels. */
export * from './sampleFormat.ts';
export { decodeFrames, encodeFrames, encodeIntegerFrames } from './sampleCodec.ts';
export * from './wavHeader.ts';
export * from './wavDecoder.ts';
export * from './wavRead.ts';
export * from './wavWrite.ts';
export * from './csvCells.ts';
export * from './csvSignal.ts';
export * from './csvWrite.ts';
export * from './generators.ts';
export * from './pinkNoise.ts';
export * from './sectionFilter.ts';
export * from './fft.ts';
export * from './windows.ts';
export * from './welch.ts';
export * from './levels.ts';
export * from './toneFit.ts';
export * from './toneSearch.ts';
