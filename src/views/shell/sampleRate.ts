/** Reading and showing the sample rate in the header field. */
import { MAX_SAMPLE_RATE } from '../../core/model/limits.ts';

export type RateUnit = 'Hz' | 'kHz';

const FACTOR: Record<RateUnit, number> = { Hz: 1, kHz: 1000 };

/** The unit a rate reads best in: kHz from 1 kHz up. */
export function preferredUnit(hz: number): RateUnit {
  return hz >= 1000 ? 'kHz' : 'Hz';
}

/** The rate as the field shows it in the given unit (plain digits, no exponent for ordinary rates). */
export function rateText(hz: number, unit: RateUnit): string {
  return String(Number((hz / FACTOR[unit]).toPrecision(12)));
}

/** Parses what the user typed into a rate in Hz, or says what is wrong and what is accepted. */
export function parseRate(
  text: string,
  unit: RateUnit,
): { ok: true; hz: number } | { ok: false; message: string } {
  const t = text.trim().replace(',', '.');
  if (t === '') return { ok: false, message: 'Type a sample rate, e.g. 2 (kHz) or 48000 (Hz).' };
  if (!/^[+]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t)) {
    return { ok: false, message: `"${text.trim()}" is not a number; type a positive number such as 44.1.` };
  }
  const hz = Number(t) * FACTOR[unit];
  if (!(hz > 0)) return { ok: false, message: 'The sample rate must be above zero.' };
  if (hz > MAX_SAMPLE_RATE)
    return { ok: false, message: `The sample rate must be at most ${MAX_SAMPLE_RATE / 1e6} MHz.` };
  return { ok: true, hz };
}
