/** Small timing helpers for the benchmarks: medians of repeated runs, read with performance.now(). */
import { openSync, readSync } from 'node:fs';

/** Median of a list of numbers. */
export function median(xs: number[]): number {
  const s = xs.slice().sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

/** Percentile p (0..100) of a list, by nearest rank. */
export function percentile(xs: number[], p: number): number {
  const s = xs.slice().sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))]!;
}

/** Median milliseconds per call of fn, over enough repeats to last about `budgetMs`. */
export function timeMs(fn: () => void, budgetMs = 200, minRuns = 5): number {
  fn(); // warm up
  const times: number[] = [];
  const start = performance.now();
  while (times.length < minRuns || performance.now() - start < budgetMs) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
    if (times.length > 10_000) break;
  }
  return median(times);
}

/** A number for a table cell, 3 significant digits. */
export function cell(x: number): string {
  return Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : String(x);
}

/**
 * Processor time of the calling thread so far, in ms (Linux: the first field of /proc/thread-self/schedstat,
 * nanoseconds on the processor). Unlike process.cpuUsage() it leaves out V8's garbage-collector and compiler
 * helper threads, which on an idle machine run beside the work on another core rather than adding to its wall
 * time; python's time.thread_time() is the same measure for the process on the other side of a comparison.
 * NaN where the file does not exist (not Linux). The file is opened once, by the first caller: call it from
 * one thread (the main thread here).
 */
export function threadCpuMs(): number {
  if (schedstat === undefined) {
    try {
      schedstat = openSync('/proc/thread-self/schedstat', 'r');
    } catch {
      schedstat = null;
    }
  }
  if (schedstat === null) return NaN;
  // Re-read from offset 0 into one buffer: about 2 µs and no allocation (reading the whole file afresh took
  // 13 µs and made garbage, which a spin of freshThreadCpu would collect on this thread).
  const length = readSync(schedstat, schedstatBuffer, 0, schedstatBuffer.length, 0);
  let ns = 0;
  for (let k = 0; k < length; k++) {
    const digit = schedstatBuffer[k]! - 48;
    if (digit < 0 || digit > 9) break;
    ns = ns * 10 + digit;
  }
  return ns / 1e6;
}

/** The open schedstat file of the thread that first asked (null where it does not exist). */
let schedstat: number | null | undefined;
const schedstatBuffer = Buffer.alloc(128);

/** A step of a spin longer than this (ms) holds a switch-out: the thread was off the processor in it. */
const SWITCHED_OUT_MS = 0.2;

/**
 * Spins until threadCpuMs changes and returns the new reading, with the processor time the spin spent
 * before the change (wall time of its steps, leaving out a step in which the thread was switched out). The
 * kernel brings a running thread's figure up to date only at its scheduler tick (4 ms here) and when the
 * thread is switched out, so a plain read is stale by up to a tick: two plain reads around 4 ms of busy work
 * differed from its wall time by −2.3 to +1.7 ms (5th–95th percentile, idle machine). Read as it changes,
 * the figure is exact at a known point of the spin: within one step (one read, about 2 µs) of it.
 */
function freshThreadCpu(since: number): { thread: number; spun: number } {
  const stale = threadCpuMs();
  let last = since;
  let spun = 0;
  for (let k = 0; k < 1e6; k++) {
    const now = performance.now();
    if (now - last < SWITCHED_OUT_MS) spun += now - last;
    last = now;
    const thread = threadCpuMs();
    if (thread !== stale) return { thread, spun };
  }
  return { thread: threadCpuMs(), spun };
}

/**
 * Runs fn once and returns its wall time and the calling thread's processor time in ms. Both ends of the
 * thread time are read as the counter ticks over (freshThreadCpu), and the spin after fn is taken off: busy
 * loops of 0.5–4 ms measured within 0.065 ms of their wall time (5th–95th percentile, not switched out). Costs about one
 * scheduler tick (2 ms on average) of spinning per call, so time batches, not single calls. The thread time
 * is NaN where threadCpuMs is.
 */
export function threadCpuSpan(fn: () => void): { wallMs: number; threadMs: number } {
  const start = freshThreadCpu(performance.now());
  const w0 = performance.now();
  fn();
  const w1 = performance.now();
  const end = freshThreadCpu(w1);
  return { wallMs: w1 - w0, threadMs: end.thread - start.thread - end.spun };
}
