/**
 * Compiles an exported C header with a small driver and runs it: with the machine's gcc, or cross-compiled
 * for 32-bit ARM (arm-linux-gnueabihf-gcc, linked static) and run under qemu-arm. A missing compiler or
 * emulator makes the calling test fail; nothing is skipped.
 */
import { execFileSync } from 'node:child_process';
import { closeSync, mkdirSync, mkdtempSync, openSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** The driver: reads "n v0 v1 …", filters in two pieces (state must carry over), prints y and the event count. */
export const DRIVER_C = `#include <stdio.h>
#include <stdlib.h>
#include "filter.h"

/* usage: prog x|f < "n v0 v1 ..." (x: fixed point, codes; f: double precision) */
int main(int argc, char **argv) {
  unsigned long count;
  size_t n, i, third;
  if (argc < 2 || scanf("%lu", &count) != 1) return 2;
  n = (size_t)count;
  third = n / 3;
  if (argv[1][0] == 'x') {
    pw_filter_sample *x = calloc(n + 1, sizeof *x), *y = calloc(n + 1, sizeof *y);
    pw_filter_fixed_state st;
    unsigned long events;
    for (i = 0; i < n; i++) {
      long long v;
      if (scanf("%lld", &v) != 1) return 3;
      x[i] = (pw_filter_sample)v;
    }
    pw_filter_fixed_reset(&st);
    events = pw_filter_fixed_process(&st, x, y, third);
    events += pw_filter_fixed_process(&st, x + third, y + third, n - third);
    for (i = 0; i < n; i++) printf("%lld\\n", (long long)y[i]);
    printf("events %lu\\n", events);
  } else {
    double *x = calloc(n + 1, sizeof *x), *y = calloc(n + 1, sizeof *y);
    pw_filter_float_state st;
    for (i = 0; i < n; i++)
      if (scanf("%lf", &x[i]) != 1) return 3;
    pw_filter_float_reset(&st);
    pw_filter_float_process(&st, x, y, third);
    pw_filter_float_process(&st, x + third, y + third, n - third);
    for (i = 0; i < n; i++) printf("%.17g\\n", y[i]);
  }
  return 0;
}
`;

/** 'host': the machine's gcc; 'arm32': arm-linux-gnueabihf-gcc for 32-bit ARM, run under qemu-arm. */
export type CTarget = 'host' | 'arm32';

/** A compiled driver. */
export interface CProgram {
  /** Runs the fixed-point ('fixed', integer codes) or double ('float') path; returns the printed lines. */
  run(mode: 'fixed' | 'float', values: ArrayLike<number>, format?: (v: number) => string): string[];
}

const STRICT = ['-std=c99', '-O2', '-Wall', '-Wextra', '-pedantic', '-Werror'];
let work: string | null = null;
let built = 0;

/** Checks that the target's compiler (and emulator) are installed; throws otherwise. */
export function requireToolchain(target: CTarget): void {
  if (target === 'host') execFileSync('gcc', ['--version']);
  else {
    execFileSync('arm-linux-gnueabihf-gcc', ['--version']);
    execFileSync('qemu-arm', ['--version']);
  }
}

/** Compiles the header (saved as filter.h) with the driver, or `driver` instead, for the target. */
export function compileFilter(header: string, target: CTarget = 'host', driver = DRIVER_C): CProgram {
  work ??= mkdtempSync(join(tmpdir(), 'polewright-c-'));
  const dir = join(work, `b${built++}`);
  mkdirSync(dir);
  writeFileSync(join(dir, 'filter.h'), header);
  writeFileSync(join(dir, 'main.c'), driver);
  const exe = join(dir, 'prog');
  const cc = target === 'host' ? 'gcc' : 'arm-linux-gnueabihf-gcc';
  const link = target === 'host' ? [] : ['-static'];
  execFileSync(cc, [...STRICT, ...link, '-o', exe, join(dir, 'main.c')], { stdio: 'pipe' });
  if (target === 'arm32') {
    // ELF header: class 1 = 32-bit (byte 4), machine 40 = ARM (bytes 18-19, little-endian) — a real ARM binary.
    const head = readFileSync(exe).subarray(0, 20);
    if (head[4] !== 1 || head[18] !== 40 || head[19] !== 0)
      throw new Error(`${exe} is not a 32-bit ARM executable`);
  }
  const [cmd, pre] = target === 'host' ? [exe, []] : ['qemu-arm', [exe]];
  let runs = 0;
  return {
    run(mode, values, format = String) {
      // The input goes through a file, not a pipe: a driver that stops early then fails with its own exit
      // status instead of an EPIPE on our side of the pipe.
      const inputFile = join(dir, `input${runs++}.txt`);
      writeFileSync(inputFile, `${values.length}\n${Array.from(values, format).join('\n')}\n`);
      const fd = openSync(inputFile, 'r');
      try {
        return execFileSync(cmd, [...pre, mode === 'fixed' ? 'x' : 'f'], {
          stdio: [fd, 'pipe', 'pipe'],
          maxBuffer: 1 << 26,
        })
          .toString()
          .trim()
          .split('\n');
      } finally {
        closeSync(fd);
      }
    },
  };
}
