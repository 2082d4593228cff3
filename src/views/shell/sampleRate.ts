/** Reading and showing the sample rate in the header field. */
import { MAX_SAMPLE_RATE } from '../../core/model/limits.ts';
import { readNumberField, type FieldReading, type NumberFieldRule } from '../shared/fieldReading.ts';

export type RateUnit = 'Hz' | 'kHz';

/** Hz in one of the field's units. */
export const RATE_FACTOR: Record<RateUnit, number> = { Hz: 1, kHz: 1000 };

/** The unit a rate reads best in: kHz from 1 kHz up. */
export function preferredUnit(hz: number): RateUnit {
  return hz >= 1000 ? 'kHz' : 'Hz';
}

/** The rate as the field shows it in the given unit (plain digits, no exponent for ordinary rates). */
export function rateText(hz: number, unit: RateUnit): string {
  return String(Number((hz / RATE_FACTOR[unit]).toPrecision(12)));
}

/** Why a rate in Hz is not acceptable, or null. */
export function rateProblem(hz: number): string | null {
  if (!(hz > 0)) return 'The sample rate must be above zero.';
  if (hz > MAX_SAMPLE_RATE) return `The sample rate must be at most ${MAX_SAMPLE_RATE / 1e6} MHz.`;
  return null;
}

/** How the field reads in a unit: a bare number is in that unit, a typed unit (Hz, kHz, MHz) wins over it. */
export function rateRule(unit: RateUnit): NumberFieldRule {
  return { typedUnit: 'Hz', bareFactor: RATE_FACTOR[unit], check: rateProblem };
}

/**
 * Reads what the user typed into a rate in Hz: a bare number is in the chosen unit, and a typed unit (Hz,
 * kHz, MHz) wins over it; or says what is wrong and what is accepted.
 */
export function parseRate(text: string, unit: RateUnit): FieldReading<number> {
  const r = readNumberField(text, rateRule(unit));
  return r.ok ? { ok: true, value: r.value! } : r;
}
