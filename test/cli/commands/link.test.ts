import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../helpers/cli.ts';
import { writeSharedFile } from '../../../src/share/designFile.ts';
import { decodeLink, encodeLink } from '../../../src/share/link/index.ts';
import { toDocument } from '../../../src/share/document.ts';
import { toBase64Url } from '../../../src/share/link/base64url.ts';
import { encodePayload } from '../../../src/share/link/codec.ts';
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
    expect(r.stdout).toMatch(/^http:\/\/127\.0\.0\.1:5173\/#pw2\.[A-Za-z0-9_-]+\n$/);
    const back = decodeLink(r.stdout.trim());
    expect(back.ok && bitwiseDifference(back.value, shared)).toBeNull();
  });

  it('takes --base and a design given as an equation, keeping the typed text', async () => {
    const r = await runCli(['link', '--eq', EQ, '--fs', '1000', '--base', 'https://example.org/pw/']);
    expect(r.code).toBe(0);
    expect(r.stdout.startsWith('https://example.org/pw/#pw2.')).toBe(true);
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

  it('a cut or altered link is a usage error that says so', async () => {
    const cut = await runCli(['analyze', link.slice(0, 60)]);
    expect(cut.code).toBe(2);
    expect(cut.stderr).toMatch(/the design link: The link was altered or cut/);
    const i = link.length - 10;
    const flipped = link.slice(0, i) + (link[i] === 'A' ? 'B' : 'A') + link.slice(i + 1);
    const altered = await runCli(['analyze', flipped]);
    expect(altered.code).toBe(2);
    expect(altered.stderr).toMatch(/the design link: The link was altered or cut/);
  });

  it('opens a link of the first format with a note that damage to it cannot be detected', async () => {
    const old = 'http://x/#pw1.' + toBase64Url(encodePayload(toDocument({ design: demoDesign(), view: {} })));
    const r = await runCli(['analyze', old, '--json']);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/note: This link was made by an older Polewright and has no check value/);
  });
});
