import { describe, it, expect } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { runCli } from '../helpers/cli.ts';
import { expectClose } from '../helpers/expectClose.ts';

const EQ = 'y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]';

describe('polewright analyze', () => {
  it('analyses the difference equation: a double pole at 0.8, zeros at ±1', async () => {
    const r = await runCli(['analyze', '--eq', EQ, '--fs', '1000', '--json']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    for (const key of ['zeros', 'poles', 'gain', 'b', 'a', 'sections', 'stability'])
      expect(out).toHaveProperty(key);
    // (1 - z^-2)/(1 - 0.8 z^-1)^2 factors by hand: zeros +1 and -1, pole 0.8 twice, k = 1.
    const zeros = out.zeros.map((z: { re: number }) => z.re).sort((a: number, b: number) => a - b);
    expectClose(zeros, [-1, 1], { abs: 1e-12 }, 'zeros');
    expect(out.poles).toHaveLength(1);
    expectClose([out.poles[0].re, out.poles[0].im], [0.8, 0], { abs: 1e-12 }, 'pole');
    expect(out.poles[0].multiplicity).toBe(2);
    expectClose(out.gain, 1, { rel: 1e-14 }, 'gain');
    expect(out.b).toEqual([1, 0, -1]);
    expect(out.a).toEqual([1, -1.6, 0.64]);
    expect(out.stability.verdict).toBe('stable'); // common practice: every pole strictly inside the unit circle
    expectClose(out.stability.maxPoleRadius, 0.8, { abs: 1e-12 }, 'max radius');
    expect(out.sections).toHaveLength(1);
  });

  it('lists every conjugate of a complex pole pair', async () => {
    const r = await runCli(['analyze', '--b', '1', '--a', '1,-1.2,0.72', '--json']);
    const out = JSON.parse(r.stdout);
    // z^2 - 1.2 z + 0.72 = 0  ->  z = 0.6 ± 0.6j (quadratic formula).
    const ims = out.poles.map((p: { im: number }) => p.im).sort((a: number, b: number) => a - b);
    expectClose(ims, [-0.6, 0.6], { abs: 1e-12 }, 'pole imaginary parts');
  });

  it('calls a pole outside the circle unstable', async () => {
    const r = await runCli(['analyze', '--b', '1', '--a', '1,-1.05', '--json']);
    expect(JSON.parse(r.stdout).stability.verdict).toBe('unstable'); // common practice
  });

  it('prints a readable summary without --json', async () => {
    const r = await runCli(['analyze', '--eq', EQ, '--fs', '1000']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/stability: STABLE/);
  });
});

describe('polewright response and simulate', () => {
  it('response: frequencies span 0 to fs/2; magnitude of a 2-tap average is |cos(ω/2)|', async () => {
    const r = await runCli(['response', '--b', '0.5,0.5', '--fs', '100', '--points', '11', '--json']);
    const out = JSON.parse(r.stdout);
    expect(out.frequencies).toHaveLength(11);
    expect(out.frequencies[0]).toBe(0);
    expectClose(out.frequencies[10], 50, { rel: 1e-12 }, 'last frequency');
    const expected = out.frequencies.map(
      (f: number) => 20 * Math.log10(Math.abs(Math.cos((Math.PI * f) / 100))),
    );
    expectClose(out.magnitudeDb.slice(0, 10), expected.slice(0, 10), { abs: 1e-9 }, 'magnitude dB');
    // The average has a zero at Nyquist: -Infinity dB (printed as a string) or far below any real level.
    const atNyquist = out.magnitudeDb[10];
    expect(atNyquist === '-Infinity' || atNyquist < -200).toBe(true);
    expectClose(out.groupDelay.slice(0, 10), new Array(10).fill(0.5), { abs: 1e-9 }, 'group delay'); // linear phase: 0.5 samples
  });

  it('simulate: the impulse response follows the difference equation', async () => {
    const r = await runCli(['simulate', '--eq', EQ, '--input', 'impulse', '--samples', '30', '--json']);
    const out = JSON.parse(r.stdout);
    const h: number[] = [];
    for (let n = 0; n < 30; n++) {
      const x = (k: number) => (k === 0 ? 1 : 0);
      h.push(1.6 * (h[n - 1] ?? 0) - 0.64 * (h[n - 2] ?? 0) + x(n) - x(n - 2));
    }
    expectClose(out.output, h, { abs: 1e-12 }, 'impulse response');
  });

  it('simulate reads a CSV column', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-cli-'));
    const file = join(dir, 'in.csv');
    writeFileSync(file, 'value\n1\n2\n3\n');
    const r = await runCli(['simulate', '--b', '1,1', '--input', file, '--json']);
    expect(JSON.parse(r.stdout).output).toEqual([1, 3, 5]);
  });
});

describe('polewright errors', () => {
  it('a bad equation exits 2 and marks the place', async () => {
    const r = await runCli(['analyze', '--eq', 'y[n] = 0.5 y[n-1] + x[n', '--json']);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/--eq/);
    expect(r.stderr).toMatch(/\^/);
  });
  it('an unknown option names the accepted ones', async () => {
    const r = await runCli(['analyze', '--eq', EQ, '--jsn']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/Unknown option --jsn.*--json/);
  });
  it('no design says how to give one', async () => {
    const r = await runCli(['analyze']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--eq/);
  });
  it('a broken design file names the field', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-cli-'));
    const file = join(dir, 'd.json');
    writeFileSync(
      file,
      JSON.stringify({
        polewright: 'design',
        version: 1,
        sampleRate: -1,
        zeros: [],
        poles: [],
        gainRule: { kind: 'dc' },
      }),
    );
    const r = await runCli(['analyze', file]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/sampleRate/);
  });
});

describe('the installed bin', () => {
  const root = fileURLToPath(new URL('../..', import.meta.url));
  it('npx polewright analyze runs the bundled command line that npm ci built', () => {
    const out = execFileSync('npx', ['polewright', 'analyze', '--eq', EQ, '--fs', '1000', '--json'], {
      cwd: root,
      encoding: 'utf8',
    });
    expect(JSON.parse(out).stability.verdict).toBe('stable');
  });
  it('exits non-zero with the message on stderr', () => {
    const r = spawnSync('node', ['bin/polewright.cjs', 'analyze', '--b', 'x'], {
      cwd: root,
      encoding: 'utf8',
    });
    expect(r.status).toBe(2);
    expect(r.stderr.length).toBeGreaterThan(0);
  });
});
