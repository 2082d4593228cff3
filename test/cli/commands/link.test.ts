import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../helpers/cli.ts';
import { writeSharedFile } from '../../../src/share/designFile.ts';
import { decodeLink, encodeLink } from '../../../src/share/link/index.ts';
import { demoDesign } from '../../../src/store/demo.ts';
import { bitwiseDifference } from '../../share/arbitraries.ts';

const EQ = 'y[n] = 1.6 y[n-1] - 0.64 y[n-2] + x[n] - x[n-2]';

describe('polewright link', () => {
  it('prints a link to the development page that opens the file’s design bit for bit', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-link-'));
    const file = join(dir, 'hopper.json');
    const shared = {
      design: { ...demoDesign(), designer: { kind: 'notch' as const, fs: 2000, f0: 50, q: 30 } },
      view: { timeInput: 'step' as const },
    };
    writeFileSync(file, writeSharedFile(shared));
    const r = await runCli(['link', file]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^http:\/\/127\.0\.0\.1:5173\/#pw1\.[A-Za-z0-9_-]+\n$/);
    const back = decodeLink(r.stdout.trim());
    expect(back.ok && bitwiseDifference(back.value, shared)).toBeNull();
  });

  it('takes --base and a design given as an equation, keeping the typed text', async () => {
    const r = await runCli(['link', '--eq', EQ, '--fs', '1000', '--base', 'https://example.org/pw/']);
    expect(r.code).toBe(0);
    expect(r.stdout.startsWith('https://example.org/pw/#pw1.')).toBe(true);
    const back = decodeLink(r.stdout.trim());
    expect(back.ok).toBe(true);
    if (!back.ok) return;
    expect(back.value.design.typed).toEqual({ b: [1, 0, -1], a: [1, -1.6, 0.64], text: EQ });
    expect(back.value.design.sampleRate).toBe(1000);
  });

  it('refuses a bad --base', async () => {
    const r = await runCli(['link', '--eq', EQ, '--base', 'javascript:alert(1)']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--base must be an http\(s\) address/);
  });
});

describe('a link as the design of other commands', () => {
  const link = `http://127.0.0.1:5173/#${encodeLink({ design: demoDesign(), view: {} })}`;

  it('analyze reads a full URL and a bare fragment alike', async () => {
    const a = await runCli(['analyze', link, '--json']);
    const b = await runCli(['analyze', link.slice(link.indexOf('#') + 1), '--json']);
    expect(a.code).toBe(0);
    expect(a.stderr).toBe('');
    expect(b.stdout).toBe(a.stdout);
    const out = JSON.parse(a.stdout);
    expect(out.sampleRate).toBe(2000);
    expect(out.poles).toHaveLength(6); // three stored pole pairs, each with its conjugate
  });

  it('response and simulate accept it too', async () => {
    expect((await runCli(['response', link, '--points', '16', '--json'])).code).toBe(0);
    expect((await runCli(['simulate', link, '--samples', '8', '--json'])).code).toBe(0);
  });

  it('a damaged link is a usage error with the reason', async () => {
    const r = await runCli(['analyze', link.slice(0, 60)]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/the design link: The link (cannot be read|is damaged)/);
  });
});
