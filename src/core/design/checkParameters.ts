/**
 * The checks every designer description passes before its engine function runs, read from its registry
 * entry: the sample rate, each parameter's presence, range and count, and the alternatives. A failed check
 * throws DesignInputError naming the parameter (and the item of a list), so the page can mark that field.
 */
import { shortNumber } from '../shortNumber.ts';
import {
  orderMax,
  type DesignValues,
  type DesignerEntry,
  type ListParameter,
  type Parameter,
} from './parameters.ts';
import { DesignInputError } from './validate.ts';
import { checkInBand } from './checkInBand.ts';

export { checkInBand } from './checkInBand.ts';
import { MAX_SAMPLE_RATE } from '../model/limits.ts';

const fmt = (v: number) => shortNumber(v, 10);
const unitText = (p: Parameter) => (p.unit ? ` ${p.unit}` : '');
const nameOf = (p: Parameter) => p.name ?? p.key;

/** Whether a parameter must be present for these values. */
export function isRequired(p: Parameter, values: DesignValues): boolean {
  return p.presence === 'required' || (p.requiredWhen?.(values) ?? false);
}

/** A finite number above `lower` (0 by default). */
export function checkAbove(name: string, v: unknown, unit: string, key: string, lower = 0): number {
  const expected = `a number greater than ${fmt(lower)}${unit}`;
  if (typeof v !== 'number' || !Number.isFinite(v) || !(v > lower))
    throw new DesignInputError(`${name} = ${fmt(Number(v))}${unit} is not accepted`, expected, key);
  return v;
}

/** The count a list parameter must have for these values, as words for messages. */
function countWords(p: ListParameter, n: number): string {
  const noun = p.noun ?? 'value';
  return n === 1 ? `one ${noun}` : n === 2 ? `two ${noun}s` : `${n} ${noun}s`;
}

function listExpected(p: ListParameter, n: number | null, fs: number): string {
  if (p.item === 'whole') return 'whole numbers from 1, e.g. 1, 3, 5';
  const band = `(0, ${fmt(fs / 2)}) Hz`;
  if (n === 1) return `one frequency in ${band}`;
  if (n === 2) return `two increasing frequencies low,high in ${band}`;
  return `frequencies in ${band}`;
}

function checkList(p: ListParameter, value: unknown, values: DesignValues, fs: number): void {
  const name = nameOf(p);
  const exactly = p.count.exactly ? p.count.exactly(values) : null;
  const list = Array.isArray(value) ? (value as unknown[]) : null;
  const expected = listExpected(p, exactly, fs);
  if (exactly !== null && (!list || list.length !== exactly))
    throw new DesignInputError(
      `${name} needs ${countWords(p, exactly)}, got ${list ? list.length : 'none'}`,
      expected,
      p.key,
    );
  if (!list || list.length === 0) throw new DesignInputError(`no ${name} chosen`, expected, p.key);
  if (list.length > p.count.max)
    throw new DesignInputError(`${list.length} ${name} is too many`, `at most ${p.count.max}`, p.key);
  list.forEach((v, i) => {
    if (p.item === 'band') checkInBand(`${name}[${i}]`, v, fs, p.key, i);
    else if (typeof v !== 'number' || !Number.isInteger(v) || v < 1)
      throw new DesignInputError(`${p.noun ?? name} ${String(v)} is not accepted`, expected, p.key, i);
  });
  const nums = list as number[];
  if (p.increasing && nums.some((v, i) => i > 0 && !(nums[i - 1]! < v)))
    throw new DesignInputError(
      `${name} = ${nums.map(fmt).join(',')}${unitText(p)} is not in increasing order`,
      expected,
      p.key,
    );
}

/** What a parameter accepts, in words, for these values. */
export function expectedOf(p: Parameter, values: DesignValues, fs: number): string {
  switch (p.type) {
    case 'number': {
      if (p.range === 'band') return `a frequency between 0 and ${fmt(fs / 2)} Hz (fs/2), exclusive`;
      if (p.range === 'finite') return `a finite number${unitText(p)}`;
      if (p.range === 'whole') return `a whole number from 1${p.max ? ` to ${p.max}` : ''}`;
      const lower = p.above?.when(values) ? values[p.above.key] : 0;
      return `a number greater than ${fmt(typeof lower === 'number' ? lower : 0)}${unitText(p)}`;
    }
    case 'order':
      return `a whole number from 1 to ${orderMax(p, values)}, or auto`;
    case 'list':
      return listExpected(p, p.count.exactly ? p.count.exactly(values) : null, fs);
    case 'choice':
      return p.options.map((o) => o.value).join(', ');
  }
}

function checkParameter(p: Parameter, value: unknown, values: DesignValues, fs: number): void {
  const name = nameOf(p);
  switch (p.type) {
    case 'number':
      if (p.range === 'band') checkInBand(name, value, fs, p.key);
      else if (p.range === 'whole') {
        if (typeof value !== 'number' || !Number.isInteger(value) || value < 1 || value > (p.max ?? Infinity))
          throw new DesignInputError(
            `${name} ${String(value)} is not accepted`,
            expectedOf(p, values, fs),
            p.key,
          );
      } else if (p.range === 'positive') {
        const lower = p.above?.when(values) ? values[p.above.key] : 0;
        checkAbove(name, value, unitText(p), p.key, typeof lower === 'number' ? lower : 0);
      } else if (typeof value !== 'number' || !Number.isFinite(value))
        throw new DesignInputError(
          `${name} = ${String(value)} is not accepted`,
          `a finite number${unitText(p)}`,
          p.key,
        );
      return;
    case 'order':
      if (value === 'auto') return;
      if (typeof value !== 'number' || !Number.isInteger(value) || value < 1 || value > orderMax(p, values))
        throw new DesignInputError(
          `${name} ${typeof value === 'number' ? fmt(value) : String(value)} is not accepted`,
          `a whole number from 1 to ${orderMax(p, values)}, or auto`,
          p.key,
        );
      return;
    case 'list':
      return checkList(p, value, values, fs);
    case 'choice':
      if (!p.options.some((o) => o.value === value))
        throw new DesignInputError(
          `${name} '${String(value)}' is not known`,
          p.options.map((o) => o.value).join(', '),
          p.key,
        );
  }
}

/**
 * Checks a designer description against its registry entry (throws DesignInputError naming the parameter):
 * the sample rate, then each parameter in the entry's order, then its alternatives.
 */
export function checkParameters(entry: DesignerEntry, spec: DesignValues): void {
  const fs = checkAbove('sample rate fs', spec.fs, ' Hz', 'fs');
  if (fs > MAX_SAMPLE_RATE)
    throw new DesignInputError(
      `sample rate fs = ${fmt(fs)} Hz is not accepted`,
      `a sample rate above 0 and at most ${fmt(MAX_SAMPLE_RATE)} Hz`,
      'fs',
    );
  for (const p of entry.parameters) {
    const value = spec[p.key];
    if (value === undefined) {
      if (!isRequired(p, spec)) continue;
      if (p.type === 'list') checkList(p, undefined, spec, fs);
      throw new DesignInputError(`${nameOf(p)} is missing`, expectedOf(p, spec, fs), p.key);
    }
    checkParameter(p, value, spec, fs);
  }
  for (const alt of entry.alternatives ?? []) {
    const [a, b] = alt.keys;
    if ((spec[a] === undefined) === (spec[b] === undefined))
      throw new DesignInputError(
        `give exactly one of ${a} and ${b}`,
        `${a} or ${b}, not both`,
        spec[a] === undefined ? a : b,
      );
  }
}
