/** The one parameter check a registry entry makes itself (the harmonics' check), light for the first view. */
import { shortNumber } from '../shortNumber.ts';
import { DesignInputError } from './validate.ts';

const fmt = (v: number) => shortNumber(v, 10);

/** A frequency strictly inside (0, fs/2), named `name` in messages. */
export function checkInBand(name: string, f: unknown, fs: number, key: string, index?: number): number {
  const expected = `a frequency between 0 and ${fmt(fs / 2)} Hz (fs/2), exclusive`;
  if (typeof f !== 'number' || !Number.isFinite(f) || !(f > 0 && f < fs / 2))
    throw new DesignInputError(
      `${name} = ${typeof f === 'number' ? fmt(f) : String(f)} Hz lies outside (0, ${fmt(fs / 2)}) Hz`,
      expected,
      key,
      index,
    );
  return f;
}
