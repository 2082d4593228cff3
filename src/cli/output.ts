/**
 * Files the command line writes, all or nothing: the output goes to a temporary file beside the target and
 * is renamed over it only when everything was written, so a run that fails (bad input, a full disk, Ctrl-C)
 * leaves an existing file as it was and no half-written one. A target that is a symbolic link is written
 * through (the file it points to is replaced, the link stays). An output that is the same file as an input
 * — by real path, so through symbolic links, or by inode, so through hard links — is refused.
 */
import {
  chmodSync,
  closeSync,
  fsyncSync,
  openSync,
  realpathSync,
  renameSync,
  statSync,
  unlinkSync,
  writeSync,
} from 'node:fs';
import { basename, dirname, extname, join } from 'node:path';
import { UsageError } from './args.ts';

/** A failure that is not the user's input and not a bug (a full disk, a vanished folder): exit 1, no "internal error". */
export class CliFailure extends Error {}

function reason(e: unknown): string {
  return (e as NodeJS.ErrnoException).code ?? (e as Error).message;
}

/** The path a write to `target` really lands on: symbolic links in it (and in its folder) resolved. */
export function realTarget(target: string): string {
  let real: string;
  try {
    real = realpathSync(target);
  } catch {
    // Not there yet: the real folder, and the name in it.
    try {
      return join(realpathSync(dirname(target)), basename(target));
    } catch (e) {
      throw new UsageError(
        `Cannot write ${target}: its folder ${dirname(target)} cannot be used (${reason(e)}).`,
      );
    }
  }
  if (statSync(real).isDirectory())
    throw new UsageError(`Cannot write ${target}: it is a folder; give a file name.`);
  return real;
}

/** True when the two paths name the same existing file (same real path, or same device and inode). */
export function sameFile(a: string, b: string): boolean {
  let ra: string;
  let rb: string;
  try {
    ra = realpathSync(a);
    rb = realTarget(b);
  } catch {
    return false;
  }
  if (ra === rb) return true;
  try {
    const sa = statSync(ra);
    const sb = statSync(rb);
    return sa.dev === sb.dev && sa.ino === sb.ino;
  } catch {
    return false;
  }
}

/** Refuses an output that is one of the inputs (each given with what it is, for the message). */
export function refuseOverwritingInputs(
  output: string,
  flag: string,
  inputs: readonly (string | undefined)[],
): void {
  for (const input of inputs) {
    if (input !== undefined && sameFile(input, output))
      throw new UsageError(
        `${flag} ${output} is the same file as the input ${input}; writing it would destroy the input. Choose another name.`,
      );
  }
}

let counter = 0;

/**
 * A fresh temporary path beside the real target, ending in the target's extension, so that writers that
 * choose a format by the name (.wav, .tsv) choose the same for it.
 */
function temporaryBeside(real: string): string {
  counter += 1;
  const ext = extname(real);
  return join(dirname(real), `.${basename(real, ext)}.${process.pid}-${counter}.part${ext}`);
}

/** The permission bits of an existing target, so the replacement keeps them. */
function modeOf(path: string): number | undefined {
  try {
    return statSync(path).mode & 0o7777;
  } catch {
    return undefined;
  }
}

/**
 * Runs `write` on a temporary path beside the target and renames the result over the target when it
 * succeeds; when it throws, the temporary file is removed, the target is untouched, and the error goes on.
 */
export async function writeAtomically<T>(
  target: string,
  write: (temporary: string) => Promise<T>,
): Promise<T> {
  const real = realTarget(target);
  const temporary = temporaryBeside(real);
  let result: T;
  try {
    result = await write(temporary);
    commit(temporary, real, target);
  } catch (e) {
    try {
      unlinkSync(temporary);
    } catch {
      // Never created, or already gone.
    }
    throw e;
  }
  return result;
}

/** Flushes the temporary file to disk, gives it the target's permissions and renames it over the target. */
function commit(temporary: string, real: string, target: string): void {
  try {
    const fd = openSync(temporary, 'r+');
    try {
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
    const mode = modeOf(real);
    if (mode !== undefined) chmodSync(temporary, mode);
    renameSync(temporary, real);
  } catch (e) {
    throw new CliFailure(`Cannot write ${target}: ${reason(e)}`);
  }
}

/** Writes text or bytes to the target all or nothing. */
export function writeFileAtomic(target: string, data: string | Uint8Array): void {
  const real = realTarget(target);
  const temporary = temporaryBeside(real);
  try {
    const fd = openSync(temporary, 'wx');
    try {
      const bytes = typeof data === 'string' ? Buffer.from(data, 'utf8') : data;
      let off = 0;
      while (off < bytes.length) off += writeSync(fd, bytes, off, bytes.length - off);
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
    const mode = modeOf(real);
    if (mode !== undefined) chmodSync(temporary, mode);
    renameSync(temporary, real);
  } catch (e) {
    try {
      unlinkSync(temporary);
    } catch {
      // Never created.
    }
    throw new CliFailure(`Cannot write ${target}: ${reason(e)}`);
  }
}
