import { describe, it, expect } from 'vitest';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../helpers/cli.ts';
import { readDesignFile } from '../../../src/share/designFile.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

async function json(argv: string[]) {
  const r = await runCli([...argv, '--json']);
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout);
}

/** |H(e^{iω})|² in dB from printed b/a (powers of z⁻¹), evaluated here by Horner's rule, not by the engine. */
function dbFromBa(b: number[], a: number[], f: number, fs: number): number {
  const w = (2 * Math.PI * f) / fs;
  const at = (c: number[]) => {
    let re = 0;
    let im = 0;
    c.forEach((v, k) => {
      re += v * Math.cos(-w * k);
      im += v * Math.sin(-w * k);
    });
    return re * re + im * im;
  };
  return 10 * Math.log10(at(b) / at(a));
}

/** The frequency in (lo, hi) Hz where g crosses the level, by bisection (g monotone there). */
function crossing(g: (f: number) => number, level: number, lo: number, hi: number): number {
  const sign = Math.sign(g(lo) - level);
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (Math.sign(g(mid) - level) === sign) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe('polewright design: notches and resonators', () => {
  it('a notch is infinitely deep at f0 and exactly the asked −3 dB width', async () => {
    const out = await json(['design', 'notch', '--fs', '1000', '--f0', '50', '--bandwidth', '2']);
    for (const key of ['zeros', 'poles', 'gain', 'b', 'a', 'sections', 'stability', 'readouts'])
      expect(out).toHaveProperty(key);
    expect(out.designer).toEqual({ kind: 'notch', fs: 1000, f0: 50, bandwidthHz: 2 });
    // Zeros on the unit circle at ±2π·50/1000 (common practice for a notch).
    for (const z of out.zeros) expectClose(Math.hypot(z.re, z.im), 1, { abs: 1e-12 }, 'zero radius');
    expectClose(
      Math.abs(Math.atan2(out.zeros[0].im, out.zeros[0].re)),
      (2 * Math.PI * 50) / 1000,
      { abs: 1e-12 },
      'angle',
    );
    const db = (f: number) => dbFromBa(out.b, out.a, f, 1000);
    expect(db(50)).toBeLessThan(-200);
    expectClose(db(0), 0, { abs: 1e-9 }, 'DC');
    const lo = crossing(db, 10 * Math.log10(0.5), 40, 50);
    const hi = crossing(db, 10 * Math.log10(0.5), 50, 60);
    expectClose(hi - lo, 2, { abs: 1e-9 }, '−3 dB width'); // the request, by the bilinear design's definition
  });

  it('--q 25 gives the same notch as --bandwidth 2 at 50 Hz', async () => {
    const a = await json(['design', 'notch', '--fs', '1000', '--f0', '50', '--q', '25']);
    const b = await json(['design', 'notch', '--fs', '1000', '--f0', '50', '--bandwidth', '2']);
    expectClose(a.a, b.a, { abs: 1e-14 }, 'a');
  });

  it('a peak has 0 dB at f0 and the asked width', async () => {
    const out = await json(['design', 'peak', '--fs', '8000', '--f0', '1200', '--q', '25']);
    const db = (f: number) => dbFromBa(out.b, out.a, f, 8000);
    expectClose(db(1200), 0, { abs: 1e-9 }, 'peak');
    const width =
      crossing(db, 10 * Math.log10(0.5), 1200, 1400) - crossing(db, 10 * Math.log10(0.5), 1000, 1200);
    expectClose(width, 1200 / 25, { abs: 1e-8 }, 'width');
  });

  it('a harmonic notch removes exactly the chosen harmonics (hopper-scale hum)', async () => {
    const out = await json([
      'design',
      'harmonic-notch',
      '--fs',
      '2000',
      '--f0',
      '50',
      '--harmonics',
      '1,3,5',
      '--bandwidth',
      '2',
    ]);
    const angles = out.zeros
      .filter((z: { im: number }) => z.im > 0)
      .map((z: { re: number; im: number }) => (Math.atan2(z.im, z.re) * 2000) / (2 * Math.PI))
      .sort((x: number, y: number) => x - y);
    expectClose(angles, [50, 150, 250], { abs: 1e-9 }, 'notch frequencies');
    expect(dbFromBa(out.b, out.a, 100, 2000)).toBeGreaterThan(-0.1); // the 2nd harmonic is left alone
  });

  it('a DC blocker is −3 dB at its cutoff and removes DC', async () => {
    const out = await json(['design', 'dc-blocker', '--fs', '1000', '--cutoff', '0.5']);
    expectClose(dbFromBa(out.b, out.a, 0.5, 1000), 10 * Math.log10(0.5), { abs: 1e-9 }, 'cutoff');
    expect(dbFromBa(out.b, out.a, 0, 1000)).toBeLessThan(-200);
  });

  it('equaliser sections reach their gain: a peaking EQ at f0, a low shelf at DC', async () => {
    const eq = await json([
      'design',
      'peaking-eq',
      '--fs',
      '48000',
      '--f0',
      '1000',
      '--gain-db',
      '6',
      '--q',
      '1.4',
    ]);
    expectClose(dbFromBa(eq.b, eq.a, 1000, 48000), 6, { abs: 1e-9 }, 'EQ at f0'); // audio-EQ cookbook (common practice)
    const shelf = await json([
      'design',
      'low-shelf',
      '--fs',
      '48000',
      '--f0',
      '200',
      '--gain-db',
      '-6',
      '--slope',
      '1',
    ]);
    expectClose(dbFromBa(shelf.b, shelf.a, 0, 48000), -6, { abs: 1e-9 }, 'shelf at DC');
    const comb = await json(['design', 'comb', '--fs', '1000', '--f0', '100', '--q', '30']);
    expect(dbFromBa(comb.b, comb.a, 300, 1000)).toBeLessThan(-200);
  });
});

describe('polewright design: classical families', () => {
  it('Butterworth is −3.01 dB at its edge', async () => {
    const out = await json([
      'design',
      'lowpass',
      '--family',
      'butterworth',
      '--order',
      '4',
      '--edge',
      '120',
      '--fs',
      '1000',
    ]);
    expectClose(dbFromBa(out.b, out.a, 120, 1000), -3.0103, { abs: 1e-4 }, 'edge'); // common practice: −3.01 dB
    expect(out.estimate).toBeUndefined();
  });

  it('Chebyshev I has exactly the requested ripple at the pass-band edge; a band-pass takes two edges', async () => {
    const lp = await json([
      'design',
      'lowpass',
      '--family',
      'chebyshev1',
      '--order',
      '5',
      '--edge',
      '120',
      '--ripple',
      '1',
      '--fs',
      '1000',
    ]);
    expectClose(dbFromBa(lp.b, lp.a, 120, 1000), -1, { abs: 1e-9 }, 'ripple'); // common practice
    const bp = await json([
      'design',
      'bandpass',
      '--family',
      'chebyshev1',
      '--order',
      '3',
      '--edge',
      '100,200',
      '--ripple',
      '0.5',
      '--fs',
      '1000',
    ]);
    expectClose(
      [dbFromBa(bp.b, bp.a, 100, 1000), dbFromBa(bp.b, bp.a, 200, 1000)],
      [-0.5, -0.5],
      { abs: 1e-9 },
      'edges',
    );
    expect(bp.poles).toHaveLength(6);
  });

  interface OrderCase {
    response: string;
    fs: number;
    passband: number[];
    stopband: number[];
    ripple: number;
    attenuation: number;
    families: Record<string, { order: number; naturalEdgesHz: number[] }>;
  }
  const cases = loadFixture<OrderCase[]>('mask_orders');

  for (const c of cases) {
    it(`--order auto: ${c.response} ${c.passband}/${c.stopband} Hz matches scipy's order estimates and passes`, async () => {
      for (const [family, ref] of Object.entries(c.families)) {
        const out = await json([
          'design',
          c.response,
          '--family',
          family,
          '--order',
          'auto',
          '--fs',
          String(c.fs),
          '--passband',
          c.passband.join(','),
          '--stopband',
          c.stopband.join(','),
          '--ripple',
          String(c.ripple),
          '--attenuation',
          String(c.attenuation),
        ]);
        expect(out.estimate.order, family).toBe(ref.order); // scipy.signal buttord/cheb1ord/cheb2ord/ellipord 1.17
        // scipy slides band-stop pass edges with fminbound (xtol 1e-5 on tan-warped values): a looser check there.
        const tol = c.response === 'bandstop' ? { rel: 1e-4 } : { rel: 1e-9 };
        expectClose(out.estimate.naturalEdgesHz, ref.naturalEdgesHz, tol, `${family} natural edges`); // scipy 1.17
        expect(out.margin.passMarginDb).toBeGreaterThan(-1e-9);
        expect(out.margin.stopMarginDb).toBeGreaterThan(-1e-9);
        expect(out.maskResult.pass, family).toBe(true);
        // The printed stop-band margin is a fact about the printed coefficients: check it by Horner's rule.
        const worst = dbFromBa(out.b, out.a, out.margin.worstStopHz, c.fs);
        expectClose(-worst - c.attenuation, out.margin.stopMarginDb, { abs: 1e-6 }, `${family} stop margin`);
      }
    });
  }

  it('scenario 4 in words: prints the order and the margins', async () => {
    const r = await runCli([
      'design',
      'lowpass',
      '--family',
      'butterworth',
      '--order',
      'auto',
      '--fs',
      '1000',
      '--passband',
      '120',
      '--stopband',
      '400',
      '--ripple',
      '1',
      '--attenuation',
      '60',
    ]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^order: 4 \(least order meeting the requirement\)$/m); // scipy.signal.buttord 1.17
    expect(r.stdout).toMatch(/^stop band: least attenuation [\d.]+ dB at 400 Hz, passes by [\d.]+ dB$/m);
    expect(r.stdout).toMatch(/^requirement mask: PASS$/m);
  });
});

describe('polewright design: errors', () => {
  it('an unknown or missing kind lists the kinds', async () => {
    for (const argv of [['design', 'wobble'], ['design']]) {
      const r = await runCli(argv);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(
        /notch, harmonic-notch, comb, peak, dc-blocker, peaking-eq, low-shelf, high-shelf, lowpass, highpass, bandpass, bandstop/,
      );
    }
  });

  it('a missing parameter is named, with an example', async () => {
    const r = await runCli(['design', 'notch', '--fs', '1000', '--f0', '50']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(
      /--bandwidth is missing .*Example: polewright design notch --fs 1000 --f0 50 --bandwidth 2/,
    );
    const e = await runCli([
      'design',
      'lowpass',
      '--family',
      'elliptic',
      '--order',
      '4',
      '--edge',
      '120',
      '--fs',
      '1000',
    ]);
    expect(e.stderr).toMatch(
      /--ripple is missing .*Example: polewright design lowpass --family elliptic --order 4 --edge 120 --ripple 1/,
    );
    const auto = await runCli([
      'design',
      'bandpass',
      '--family',
      'butterworth',
      '--order',
      'auto',
      '--fs',
      '1000',
      '--ripple',
      '1',
      '--attenuation',
      '40',
    ]);
    expect(auto.stderr).toMatch(/--passband is missing/);
  });

  it("bad values give the designer's message and what is accepted", async () => {
    const r = await runCli(['design', 'notch', '--fs', '1000', '--f0', '700', '--q', '3']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(
      /f0 = 700 Hz lies outside \(0, 500\) Hz\. Accepted: a frequency between 0 and 500 Hz/,
    );
    const order = await runCli([
      'design',
      'lowpass',
      '--family',
      'butterworth',
      '--order',
      '0',
      '--edge',
      '100',
      '--fs',
      '1000',
    ]);
    expect(order.stderr).toMatch(/order 0 is not accepted/);
    const nest = await runCli([
      'design',
      'lowpass',
      '--family',
      'butterworth',
      '--order',
      'auto',
      '--fs',
      '1000',
      '--passband',
      '300',
      '--stopband',
      '200',
      '--ripple',
      '1',
      '--attenuation',
      '40',
    ]);
    expect(nest.stderr).toMatch(/do not fit a low-pass/);
    const num = await runCli(['design', 'notch', '--fs', '1000', '--f0', 'fifty', '--q', '3']);
    expect(num.stderr).toMatch(/--f0 must be a number .*got "fifty"/);
  });

  it('a flag of another kind is refused, naming what the kind takes', async () => {
    const r = await runCli([
      'design',
      'notch',
      '--fs',
      '1000',
      '--f0',
      '50',
      '--q',
      '5',
      '--family',
      'elliptic',
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--family does not apply to notch; it takes --f0, --bandwidth, --q/);
  });

  it('--help lists every kind with an example', async () => {
    const r = await runCli(['design', '--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(
      /harmonic-notch +polewright design harmonic-notch --fs 2000 --f0 50 --harmonics 1,3,5/,
    );
  });
});

describe('polewright design --out', () => {
  it('writes a design file that reads back with the same roots and that analyze accepts', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'polewright-design-'));
    const file = join(dir, 'lowpass.json');
    const argv = [
      'design',
      'lowpass',
      '--family',
      'elliptic',
      '--order',
      'auto',
      '--fs',
      '1000',
      '--passband',
      '120',
      '--stopband',
      '200',
      '--ripple',
      '1',
      '--attenuation',
      '60',
    ];
    const r = await runCli([...argv, '--out', file, '--json']);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/wrote .*lowpass\.json/);
    const printed = JSON.parse(r.stdout);
    const read = readDesignFile(readFileSync(file, 'utf8'));
    if (!read.ok) throw new Error(read.message);
    expect(read.design.sampleRate).toBe(1000);
    expect(read.design.gainRule).toEqual({ kind: 'fixed', value: printed.gain });
    // The file keeps the designer (to re-run it in the workbench) and the requirement's mask.
    expect(read.design.designer).toEqual(printed.designer);
    expect(read.design.mask).toEqual(printed.mask);
    expect(read.design.mask?.regions.map((x) => x.id)).toEqual(['pass', 'stop']);
    const analysed = await json(['analyze', file]);
    expectClose(analysed.a, printed.a, { rel: 1e-12, abs: 1e-15 }, 'a');
    expectClose(analysed.b, printed.b, { rel: 1e-12, abs: 1e-15 }, 'b');
  });

  it('every kind of designer round-trips through a file', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'polewright-kinds-'));
    const help = (await runCli(['design', '--help'])).stdout;
    const examples = [...help.matchAll(/^ {2}\S+ +polewright (design .*)$/gm)].map((m) => m[1]!.split(' '));
    expect(examples).toHaveLength(14);
    for (const [i, argv] of examples.entries()) {
      const file = join(dir, `${i}.json`);
      const r = await runCli([...argv, '--out', file, '--json']);
      expect(r.code, argv.join(' ')).toBe(0);
      const read = readDesignFile(readFileSync(file, 'utf8'));
      if (!read.ok) throw new Error(`${argv.join(' ')}: ${read.message}`);
      expect(read.design.designer, argv.join(' ')).toEqual(JSON.parse(r.stdout).designer);
    }
  });
});

describe('design --family any', () => {
  it('prints the family picked, every family’s order beside it and how a tie was broken', async () => {
    const argv = ['design', 'lowpass', '--fs', '1000', '--family', 'any', '--order', 'auto'];
    const req = ['--passband', '100', '--stopband', '200', '--ripple', '1', '--attenuation', '20'];
    const r = await runCli([...argv, ...req]);
    expect(r.code).toBe(0);
    // scipy.signal buttord/cheb1ord/cheb2ord/ellipord 1.17: 4, 3, 3, 3
    expect(r.stdout).toMatch(
      /family: Chebyshev II, the least order of any family \(tied on order; least group-delay spread across the pass band decided\)/,
    );
    expect(r.stdout).toMatch(/Butterworth +order 4,/);
    expect(r.stdout).toMatch(/Elliptic +order 3,/);
    expect(r.stdout).toMatch(/Chebyshev II +order 3, .* <- picked/);
    const out = await json([...argv, ...req]);
    expect(out.family.picked).toBe('chebyshev2');
    expect(out.family.tieBreak).toBe('least group-delay spread across the pass band');
    expect(out.family.trials.map((t: { order: number }) => t.order)).toEqual([4, 3, 3, 3]);
  });

  it('refuses any family with a given order and says what to give', async () => {
    const r = await runCli([
      'design',
      'lowpass',
      '--fs',
      '1000',
      '--family',
      'any',
      '--order',
      '4',
      '--edge',
      '100',
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/order auto/);
  });
});

describe('design --add-to: a part added to a design file', () => {
  it('adds a notch to a low-pass file as a part of its cascade, keeps the file readable, and judges the whole', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-add-to-'));
    const file = join(dir, 'lowpass.json');
    const lp = [
      'design',
      'lowpass',
      '--fs',
      '1000',
      '--family',
      'butterworth',
      '--order',
      '6',
      '--edge',
      '125',
    ];
    const req = ['--passband', '100', '--stopband', '300', '--ripple', '1', '--attenuation', '40'];
    expect((await runCli([...lp, ...req, '--out', file])).code).toBe(0);
    // No --fs: the part is designed at the file's rate. The file is updated in place.
    const first = await runCli(['design', 'notch', '--f0', '50', '--bandwidth', '4', '--add-to', file]);
    expect(first.code).toBe(0);
    expect(first.stdout).toMatch(/parts of the design \(a cascade\):\n {2}1\. iir .*\n {2}2\. notch f0=50/);
    const both = join(dir, 'both.json');
    const added = await runCli([
      'design',
      'notch',
      '--f0',
      '73.3',
      '--bandwidth',
      '2',
      '--add-to',
      file,
      '--out',
      both,
      '--json',
    ]);
    expect(added.code).toBe(0);
    expect(added.stderr).toBe(`note: wrote ${both}\n`);
    const out = JSON.parse(added.stdout);
    expect(out.parts.map((p: { designer?: { kind: string } }) => p.designer?.kind)).toEqual([
      'iir',
      'notch',
      'notch',
    ]);
    expect(out.maskResult.pass).toBe(true);
    const read = readDesignFile(readFileSync(both, 'utf8'));
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.design.parts).toHaveLength(3);
    // The whole has a zero pair on the unit circle at each notch: |H| there is below −100 dB, evaluated here
    // from the printed b/a by Horner's rule (common practice: a notch's zeros sit on the circle at f0).
    expect(dbFromBa(out.b, out.a, 50, 1000)).toBeLessThan(-100);
    expect(dbFromBa(out.b, out.a, 73.3, 1000)).toBeLessThan(-100);
    // The low-pass alone, from scipy.signal.butter(6, 125, fs=1000) + freqz 1.17: −62.5818 dB at 300 Hz; the
    // notches add < 0.01 dB there.
    const low = readDesignFile(readFileSync(file, 'utf8'));
    expect(low.ok && low.design.parts).toHaveLength(2);
    expect(Math.abs(dbFromBa(out.b, out.a, 300, 1000) - -62.5818)).toBeLessThan(0.02);
  });

  it('refuses an --fs that differs from the design’s rate, and a file that is not there, leaving files alone', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-add-to-'));
    const file = join(dir, 'notch.json');
    expect(
      (await runCli(['design', 'notch', '--fs', '1000', '--f0', '50', '--bandwidth', '4', '--out', file]))
        .code,
    ).toBe(0);
    const before = readFileSync(file, 'utf8');
    const r = await runCli([
      'design',
      'notch',
      '--fs',
      '2000',
      '--f0',
      '60',
      '--bandwidth',
      '4',
      '--add-to',
      file,
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--fs 2000 differs from the sample rate of the design added to \(1000 Hz\)/);
    expect(readFileSync(file, 'utf8')).toBe(before);
    const missing = await runCli([
      'design',
      'notch',
      '--f0',
      '60',
      '--bandwidth',
      '4',
      '--add-to',
      join(dir, 'nope.json'),
    ]);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/nope\.json/);
  });
});
