import { describe, it, expect } from 'vitest';
import { UsageError, intFlag, numberFlag, parseArgs, readFlagList, sineInputHz } from '../../src/cli/args.ts';
import { designerFromArgs } from '../../src/cli/commands/design.ts';
import {
  HZ_FIELD_CASES,
  NO_UNIT_CASES,
  expectListPolicy,
  expectNumberPolicy,
} from '../helpers/numberPolicy.ts';

/** A flag's reading as the command does it: the value, or the usage error's message. */
function flag(read: (raw: string) => number | number[]) {
  return (raw: string) => {
    try {
      return { ok: true as const, value: read(raw) as never };
    } catch (e) {
      if (!(e instanceof UsageError)) throw e;
      return { ok: false as const, message: e.message };
    }
  };
}
const args = (name: string, raw: string) => parseArgs([`--${name}=${raw}`], [name], []);

describe('numbers on the command line follow the number policy', () => {
  it('a number flag reads like a page field (with its unit where it has one)', () => {
    expectNumberPolicy(
      { read: flag((raw) => numberFlag(args('gain', raw), 'gain', 0)), admissible: () => true },
      NO_UNIT_CASES,
    );
    expectNumberPolicy(
      { read: flag((raw) => numberFlag(args('fs', raw), 'fs', 1, 'Hz')), admissible: () => true },
      HZ_FIELD_CASES,
    );
  });
  it('a whole-number flag takes whole numbers in its range, whatever way they are typed', () => {
    const read = flag((raw) => intFlag(args('points', raw), 'points', 512, 2, 65536));
    expectNumberPolicy(
      { read, admissible: (x) => Number.isInteger(x) && x >= 2 && x <= 65536 },
      NO_UNIT_CASES.slice(1),
    );
  });
  it('the sine input sine:<Hz> reads its frequency like a frequency field', () => {
    const read = flag((raw) => {
      // "sine:" with nothing after it is not a sine input at all (the name is then taken as a file).
      const hz = sineInputHz(`sine:${raw}`, 1000);
      if (hz === null) throw new UsageError('nothing is typed');
      return hz;
    });
    expectNumberPolicy(
      { read, admissible: (x) => x >= 0 && x <= 1000 },
      HZ_FIELD_CASES.filter(([t]) => t !== 'kHz'),
    );
    expect(sineInputHz('impulse', 1000)).toBeNull();
  });
  it('a list flag reads commas as separators', () => {
    expectListPolicy(flag((raw) => readFlagList('edge', raw)) as never);
  });
  it('design parameters are read the same way: --f0 0,5 is one half, --f0 1,000 is refused as ambiguous', () => {
    const f0 = (raw: string) => designerFromArgs(['notch', '--fs', '1000', '--f0', raw, '--q', '10']).spec;
    expect(f0('0,5')).toMatchObject({ f0: 0.5 });
    expect(f0('1/3')).toMatchObject({ f0: 1 / 3 });
    expect(f0('−50')).toMatchObject({ f0: -50 });
    expect(() => f0('1,000')).toThrow(/ambiguous/);
    expect(
      designerFromArgs([
        'bandpass',
        '--fs',
        '1000',
        '--family',
        'butterworth',
        '--order',
        '4',
        '--edge',
        '100,200',
      ]).spec,
    ).toMatchObject({ edgesHz: [100, 200] });
  });
});
