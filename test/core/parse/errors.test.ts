import { describe, expect, it } from 'vitest';
import { parseCoefficients, parseNumber, parseRoots, parseSystem } from '../../../src/core/parse/index.ts';
import type { InputError, Result } from '../../../src/core/types.ts';

function error<T>(r: Result<T>): InputError {
  if (r.ok) throw new Error(`expected an error, got ${JSON.stringify(r.value)}`);
  return r.error;
}

// [input, 0-based position (counted by hand), words the message must contain]
const CASES: [string, number, RegExp][] = [
  ['y[2n] = x[n]', 2, /expected a sample index like n-1 after 'y\['/],
  ['y[n] = x[k]', 9, /sample index like n-1 after 'x\['/],
  ['y[n-1.5] = x[n]', 4, /whole-number offset/],
  ['y[n = x[n]', 4, /expected '\]' to close 'y\['/],
  ['y[n] = x[n]^2', 11, /power of a signal sample is not linear/],
  ['y[n]*x[n] = x[n]', 4, /product of two signal samples is not linear/],
  ['y[n] = x[n]/y[n-1]', 11, /dividing by a signal sample/],
  ['y[n] = x[n] + 1', 14, /constant term/],
  ['x[n] = 0.5 x[n-1]', 0, /no output term y/],
  ['y[n] = 0.5 y[n-1]', 0, /no input term x/],
  ['y[n] = x[n+1]', 0, /future input/],
  ['y[n] + x[n]', 11, /expected '='/],
  ['y[n] = ', 7, /expected terms after '='/],
  ['y[n] = x[n] = x[n-1]', 12, /end of the equation/],
  ['y[n] = q x[n]', 7, /unknown name 'q'/],
  ['1/(z - z)', 1, /division by a zero polynomial/],
  ['z^0.5/(z-1)', 1, /power of z must be a whole number/],
  ['(1+z^-1)^5000', 8, /beyond 1024/],
  ['z^5000/z^5000', 1, /beyond 1024/],
  ['0/(1 - 0.5z^-1)', 0, /numerator is zero/],
  ['(1 - 0.5z^-1', 12, /expected '\)' to close the '\(' at column 1/],
  ['H(z) = 1/(1 - 0.5w)', 17, /unknown name 'w'/],
  ['1/(1 - 0.5z^-1) $', 16, /unexpected character '\$'/],
  ['b = [0, 1]; a = [0, 1]', 0, /a\[0\] is zero/],
  ['b = [0, 0]; a = [1]', 0, /numerator is zero/],
  ['1, 2\n3, 4\n5, 6', 10, /at most two lists/],
  ['a = [1, 2]', 10, /numerator list b is missing/],
  ['b = [1, , 2]', 8, /value before this comma/],
  ['b = [1, 2]; b = [3]', 12, /given twice/],
  ['1, 1e999', 3, /too large/],
  ['zeros: 0.5^2', 10, /'\^' is not used in a root.*x2/],
  ['poles: 0.9∠30', 13, /angle needs its unit/],
  ['poles: 0.5 x0', 12, /repeat count/],
  ['gain: 0', 6, /gain of 0/],
  ['zeros: 1; zeros: 2', 10, /given twice/],
  ['poles: 1/(0.5 - 0.5)', 8, /division by zero/],
];

describe('error messages name what was wrong and where', () => {
  it.each(CASES)('%s -> position %i', (text, position, words) => {
    const e = error(parseSystem(text));
    expect(e.message).toMatch(words);
    expect(e.position).toBe(position);
    expect(e.message).toContain(`column ${position + 1}`);
  });

  it('says what would be accepted', () => {
    expect(error(parseSystem('y[2n] = x[n]')).expected).toMatch(/n-1/);
    expect(error(parseSystem('poles: 0.9∠30')).expected).toMatch(/°|deg|rad/);
  });

  it('parseRoots without a label explains the syntax', () => {
    const e = error(parseRoots('0.5, 0.2'));
    expect(e.message).toMatch(/expected 'zeros:', 'poles:' or 'gain:'/);
    expect(e.expected).toMatch(/zeros: .*poles: .*gain: /);
  });

  it('parseNumber and parseCoefficients reject NaN/Infinity sources', () => {
    expect(error(parseNumber('0^-1')).message).toMatch(/not a finite number/);
    expect(error(parseNumber('(-8)^(1/3)')).message).toMatch(/not a finite number/);
    expect(error(parseNumber('1/0')).position).toBe(1);
    expect(error(parseCoefficients('1e308*10')).message).toMatch(/not a finite number/);
    expect(error(parseNumber('')).position).toBe(0);
  });

  it('stops at very deep nesting with a message instead of a crash', () => {
    const text = '('.repeat(5000) + '1' + ')'.repeat(5000);
    expect(error(parseNumber(text)).message).toMatch(/nested too deeply/);
  });
});
