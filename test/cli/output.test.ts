/** Files the command line writes are written all or nothing, through symbolic links, keeping permissions. */
import {
  chmodSync,
  lstatSync,
  mkdtempSync,
  readFileSync,
  readdirSync,
  rmSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { UsageError } from '../../src/cli/args.ts';
import { sameFile, writeAtomically, writeFileAtomic } from '../../src/cli/output.ts';

const dir = mkdtempSync(join(tmpdir(), 'pw-output-'));
const path = (name: string) => join(dir, name);
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const leftovers = () => readdirSync(dir).filter((f) => f.includes('.part'));

describe('atomic outputs', () => {
  it('replaces a file whole and keeps its permission bits', () => {
    writeFileSync(path('a.txt'), 'old');
    chmodSync(path('a.txt'), 0o640);
    writeFileAtomic(path('a.txt'), 'new text');
    expect(readFileSync(path('a.txt'), 'utf8')).toBe('new text');
    expect(statSync(path('a.txt')).mode & 0o777).toBe(0o640);
    expect(leftovers()).toEqual([]);
  });

  it('writes through a symbolic link: the file it names changes, the link stays a link', () => {
    writeFileSync(path('target.txt'), 'old');
    symlinkSync(path('target.txt'), path('link.txt'));
    writeFileAtomic(path('link.txt'), 'through');
    expect(lstatSync(path('link.txt')).isSymbolicLink()).toBe(true);
    expect(readFileSync(path('target.txt'), 'utf8')).toBe('through');
  });

  it('leaves the target as it was, and no temporary file, when the writer fails', async () => {
    writeFileSync(path('kept.wav'), 'good result');
    await expect(
      writeAtomically(path('kept.wav'), async (tmp) => {
        writeFileSync(tmp, 'half a result');
        throw new UsageError('the input ends early');
      }),
    ).rejects.toThrow('the input ends early');
    expect(readFileSync(path('kept.wav'), 'utf8')).toBe('good result');
    expect(leftovers()).toEqual([]);
    // On success the temporary file, named with the target's extension, becomes the target.
    const name = await writeAtomically(path('kept.wav'), async (tmp) => {
      writeFileSync(tmp, 'better');
      return tmp;
    });
    expect(name.endsWith('.wav')).toBe(true);
    expect(readFileSync(path('kept.wav'), 'utf8')).toBe('better');
  });

  it('knows the same file by real path and by inode', () => {
    writeFileSync(path('in.csv'), '1\n');
    symlinkSync(path('in.csv'), path('alias.csv'));
    expect(sameFile(path('in.csv'), path('alias.csv'))).toBe(true);
    expect(sameFile(path('in.csv'), join(dir, '.', 'in.csv'))).toBe(true);
    expect(sameFile(path('in.csv'), path('other.csv'))).toBe(false);
  });
});
