/**
 * Sample formats of WAV files and how their samples map to numbers. Integer samples are normalised to
 * [-1, 1) by dividing by 2^(bits-1): 8-bit (stored unsigned, offset 128) divides (byte - 128) by 128, 16-bit
 * by 32768, 24-bit by 8388608, 32-bit by 2147483648. Every such quotient is exact in float64, so
 * round(x · 2^(bits-1)) gives the stored integer back bit for bit. Float samples are taken as they are.
 */

/** A stored sample format: unsigned 8-bit, signed 16/24/32-bit integer, or 32/64-bit IEEE float. */
export type SampleFormat = 'u8' | 'i16' | 'i24' | 'i32' | 'f32' | 'f64';

/** Every sample format, in the order messages list them. */
export const SAMPLE_FORMATS: readonly SampleFormat[] = ['u8', 'i16', 'i24', 'i32', 'f32', 'f64'];

/** Bytes one sample of the format takes. */
export function bytesPerSample(format: SampleFormat): number {
  switch (format) {
    case 'u8':
      return 1;
    case 'i16':
      return 2;
    case 'i24':
      return 3;
    case 'i32':
    case 'f32':
      return 4;
    case 'f64':
      return 8;
  }
}

/** True for the IEEE float formats, which store values beyond ±1 without clipping. */
export function isFloatFormat(format: SampleFormat): boolean {
  return format === 'f32' || format === 'f64';
}

/** The divisor that maps an integer sample to [-1, 1): 2^(bits-1); 1 for the float formats. */
export function integerScale(format: SampleFormat): number {
  switch (format) {
    case 'u8':
      return 128;
    case 'i16':
      return 32768;
    case 'i24':
      return 8388608;
    case 'i32':
      return 2147483648;
    default:
      return 1;
  }
}

/** A plain-words description of a format, for messages ("16-bit integer PCM"). */
export function describeFormat(format: SampleFormat): string {
  switch (format) {
    case 'u8':
      return '8-bit unsigned integer PCM';
    case 'f32':
      return '32-bit IEEE float';
    case 'f64':
      return '64-bit IEEE float';
    default:
      return `${format.slice(1)}-bit integer PCM`;
  }
}

/** Reads a format name as typed on the command line or in an option ("i16", "f32", ...); null if unknown. */
export function parseSampleFormat(text: string): SampleFormat | null {
  const t = text.trim().toLowerCase();
  return (SAMPLE_FORMATS as readonly string[]).includes(t) ? (t as SampleFormat) : null;
}
