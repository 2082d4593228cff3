/**
 * Where the page finds the zeros of an FIR's quantized taps (views/firQuantized/tapZerosFinder.ts): short tap
 * sets on the page, long ones in the worker; while the worker works nothing of other taps is answered, stale
 * replies are dropped, and a worker that fails or cannot start gives way to the page with the reason. The
 * worker's side is driven by hand through a fake endpoint, and for real (serveJobs with the worker's job)
 * through a MessageChannel, where its zeros must equal the page's and numpy's (test/reference fixtures).
 */
import { afterEach, describe, expect, it } from 'vitest';
import { tapZeros, type TapZeros } from '../../../src/core/fixed/firQuantized.ts';
import { ZEROS_ON_PAGE_MAX_DEGREE, zerosOnPage } from '../../../src/store/firQuantizedDerived.ts';
import {
  TapZerosFinder,
  type TapZerosAnswer,
  type TapZerosEndpoint,
} from '../../../src/views/firQuantized/tapZerosFinder.ts';
import {
  serveJobs,
  type Endpoint,
  type JobContext,
  type JobRequest,
  type JobResponse,
} from '../../../src/workers/jobs.ts';
import { TAP_ZEROS_JOB, tapZerosJob } from '../../../src/workers/tapZerosJob.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

/** Deterministic taps on a 2^−15 grid (a small linear congruential generator), `n` of them. */
function tapsOf(n: number, seed = 1): number[] {
  let x = seed;
  return Array.from({ length: n }, () => {
    x = (x * 1103515245 + 12345) % 2 ** 31;
    return Math.round(((x / 2 ** 31) * 2 - 1) * 2 ** 12) / 2 ** 15;
  });
}
const LONG = ZEROS_ON_PAGE_MAX_DEGREE + 2; // taps: degree one past the page's limit

/** A hand-driven worker: what the page posted, and replies sent when the test says. */
class FakeWorker implements TapZerosEndpoint {
  posted: JobRequest[] = [];
  onmessage: ((e: MessageEvent<JobResponse>) => void) | null = null;
  onerror: ((e: Event) => void) | null = null;
  terminated = false;
  postMessage(m: JobRequest): void {
    this.posted.push(m);
  }
  terminate(): void {
    this.terminated = true;
  }
  runs() {
    return this.posted.filter((m) => m.type === 'run');
  }
  reply(m: JobResponse): void {
    this.onmessage?.({ data: m } as MessageEvent<JobResponse>);
  }
}

/** Lets the finder's promise callbacks run. */
const settle = () => new Promise((r) => setTimeout(r, 0));

/** An answer's zeros (fails the test when it is "finding"). */
function zerosOf(a: TapZerosAnswer): TapZeros {
  expect(a.status).toBe('found');
  return (a as Extract<TapZerosAnswer, { status: 'found' }>).zeros;
}

describe('which thread finds the zeros', () => {
  it('one rule by the degree: up to the limit on the page, beyond it in the worker', () => {
    expect(zerosOnPage(tapsOf(ZEROS_ON_PAGE_MAX_DEGREE + 1))).toBe(true);
    expect(zerosOnPage(tapsOf(LONG))).toBe(false);
  });

  it('short taps are answered on the page at once, with no message to the worker', () => {
    const w = new FakeWorker();
    const f = new TapZerosFinder(() => w);
    const taps = tapsOf(33);
    f.want(taps);
    expect(w.posted).toEqual([]);
    const a = f.answer(taps);
    expect(a).toMatchObject({ status: 'found', where: 'page', failure: null });
    expect(zerosOf(a)).toEqual(tapZeros(taps));
  });

  it('with no Worker (Node), long taps are answered on the page too', () => {
    const f = new TapZerosFinder(null);
    const taps = tapsOf(LONG);
    f.want(taps);
    const a = f.answer(taps);
    expect(a).toMatchObject({ status: 'found', where: 'page', failure: null });
    expect(zerosOf(a)).toEqual(tapZeros(taps));
  });
});

describe('long taps in the worker', () => {
  it('are "finding" until the reply, then the reply; the same values asked again start nothing', async () => {
    const w = new FakeWorker();
    const f = new TapZerosFinder(() => w);
    const taps = tapsOf(LONG);
    expect(f.answer(taps)).toEqual({ status: 'finding' });
    f.want(taps);
    f.want([...taps]); // the same values in a new array (a render with the taps rebuilt)
    expect(w.runs()).toHaveLength(1);
    const run = w.runs()[0] as Extract<JobRequest, { type: 'run' }>;
    expect(run.kind).toBe(TAP_ZEROS_JOB);
    expect(run.payload).toEqual(taps);
    expect(f.answer(taps)).toEqual({ status: 'finding' });
    const zeros = tapZeros(taps);
    w.reply({ type: 'done', id: run.id, value: zeros });
    await settle();
    expect(f.answer(taps)).toEqual({ status: 'found', zeros, where: 'worker', failure: null });
    f.want(taps);
    expect(w.runs()).toHaveLength(1);
  });

  it('never answers with the zeros of other taps, and drops a reply for taps that changed meanwhile', async () => {
    const w = new FakeWorker();
    const f = new TapZerosFinder(() => w);
    const a = tapsOf(LONG, 1);
    const b = tapsOf(LONG, 2);
    f.want(a);
    f.want(b); // the word length changed before the first reply
    const [runA, runB] = w.runs() as Extract<JobRequest, { type: 'run' }>[];
    expect(w.posted).toContainEqual({ type: 'cancel', id: runA!.id });
    // the worker still answers the first (it was busy with it when the cancel came): dropped
    w.reply({ type: 'done', id: runA!.id, value: tapZeros(a) });
    await settle();
    expect(f.answer(b)).toEqual({ status: 'finding' });
    expect(f.store.getState().found).toBeNull();
    w.reply({ type: 'done', id: runB!.id, value: tapZeros(b) });
    await settle();
    expect(zerosOf(f.answer(b))).toEqual(tapZeros(b));
    // the found zeros belong to b: a is "finding" again, not b's marks
    expect(f.answer(a)).toEqual({ status: 'finding' });
  });

  it('back to taps already solved (an undo) cancels the search for others and answers at once', async () => {
    const w = new FakeWorker();
    const f = new TapZerosFinder(() => w);
    const a = tapsOf(LONG, 1);
    const b = tapsOf(LONG, 2);
    f.want(a);
    const runA = w.runs()[0] as Extract<JobRequest, { type: 'run' }>;
    w.reply({ type: 'done', id: runA.id, value: tapZeros(a) });
    await settle();
    f.want(b);
    const runB = w.runs()[1] as Extract<JobRequest, { type: 'run' }>;
    f.want(a);
    expect(w.posted.at(-1)).toEqual({ type: 'cancel', id: runB.id });
    expect(f.store.getState().finding).toBeNull();
    expect(f.answer(a)).toMatchObject({ status: 'found', where: 'worker' });
    w.reply({ type: 'cancelled', id: runB.id });
    w.reply({ type: 'done', id: runB.id, value: tapZeros(b) });
    await settle();
    expect(f.answer(a)).toMatchObject({ status: 'found', where: 'worker' });
    expect(f.answer(b)).toEqual({ status: 'finding' });
  });
});

describe('a worker that fails', () => {
  it('a job error: the zeros are found on the page, with the reason, and the worker is not asked again', async () => {
    const w = new FakeWorker();
    const f = new TapZerosFinder(() => w);
    const taps = tapsOf(LONG);
    f.want(taps);
    const run = w.runs()[0] as Extract<JobRequest, { type: 'run' }>;
    w.reply({ type: 'error', id: run.id, message: 'out of memory' });
    await settle();
    const a = f.answer(taps);
    expect(a).toMatchObject({ status: 'found', where: 'page', failure: 'the worker failed (out of memory)' });
    expect(zerosOf(a)).toEqual(tapZeros(taps));
    expect(w.terminated).toBe(true);
    f.want(tapsOf(LONG, 5));
    expect(w.runs()).toHaveLength(1);
    expect(f.answer(tapsOf(LONG, 5))).toMatchObject({ status: 'found', where: 'page' });
    // short taps never needed the worker: their answer carries no failure
    expect(f.answer(tapsOf(33))).toMatchObject({ status: 'found', where: 'page', failure: null });
  });

  it('a worker whose script does not load: the error event ends the wait, a late reply is ignored', async () => {
    const w = new FakeWorker();
    const f = new TapZerosFinder(() => w);
    const taps = tapsOf(LONG);
    f.want(taps);
    expect(f.answer(taps)).toEqual({ status: 'finding' });
    w.onerror!(new Event('error'));
    expect(f.store.getState()).toMatchObject({ finding: null, failure: 'the worker could not be started' });
    expect(f.answer(taps)).toMatchObject({ status: 'found', where: 'page' });
    w.reply({ type: 'done', id: 1, value: tapZeros(tapsOf(LONG, 9)) });
    await settle();
    expect(f.store.getState().found).toBeNull();
    expect(zerosOf(f.answer(taps))).toEqual(tapZeros(taps));
  });

  it('a Worker that cannot be made at all: found on the page, with the reason', () => {
    const f = new TapZerosFinder(() => {
      throw new Error('workers are not allowed here');
    });
    const taps = tapsOf(LONG);
    f.want(taps);
    expect(f.answer(taps)).toMatchObject({
      status: 'found',
      where: 'page',
      failure: 'the worker could not be started (workers are not allowed here)',
    });
  });
});

describe("the worker's job over a message channel", () => {
  const channels: MessageChannel[] = [];
  afterEach(() => {
    for (const c of channels.splice(0)) {
      c.port1.close();
      c.port2.close();
    }
  });
  /** A finder served by the worker's job over a channel; `solved` hears each tap set whose zeros it found. */
  function served(solved: (taps: readonly number[]) => void = () => undefined): TapZerosFinder {
    const channel = new MessageChannel();
    channels.push(channel);
    serveJobs(channel.port2 as unknown as Endpoint<JobRequest, JobResponse>, {
      [TAP_ZEROS_JOB]: (async (taps: readonly number[], ctx: JobContext) => {
        const r = await tapZerosJob(taps, ctx);
        solved(taps);
        return r;
      }) as never,
    });
    return new TapZerosFinder(() => channel.port1 as unknown as TapZerosEndpoint);
  }
  async function found(f: TapZerosFinder, taps: readonly number[]): Promise<TapZerosAnswer> {
    f.want(taps);
    for (let i = 0; i < 200 && f.answer(taps).status === 'finding'; i++) await settle();
    return f.answer(taps);
  }

  it('gives exactly the zeros the page finds (the same code, the copy between threads loses nothing)', async () => {
    const f = served();
    for (const n of [LONG, 300]) {
      const taps = tapsOf(n, n);
      const a = await found(f, taps);
      expect(a).toMatchObject({ status: 'found', where: 'worker' });
      expect(zerosOf(a)).toEqual(tapZeros(taps));
    }
  });

  it('taps changed several times in a row: only the last set is solved, and that is the answer', async () => {
    const solved: number[] = [];
    const f = served((taps) => solved.push(taps.length));
    const sets = [LONG, LONG + 1, LONG + 2, LONG + 3].map((n) => tapsOf(n, n));
    for (const taps of sets) f.want(taps);
    const last = sets.at(-1)!;
    const a = await found(f, last);
    expect(zerosOf(a)).toEqual(tapZeros(last));
    expect(solved).toEqual([last.length]);
    for (const taps of sets.slice(0, -1)) expect(f.answer(taps)).toEqual({ status: 'finding' });
  });

  it("the 129-tap equiripple fixture's quantized taps: numpy.roots' zeros, each within twice its error bound", async () => {
    interface Case {
      name: string;
      codes: number[];
      fractionBits: number;
      zeros: { re: number[]; im: number[]; bound: number[] };
    }
    const c = loadFixture<Case[]>('fir_quantized').find((k) => k.codes.length === 129)!;
    const taps = c.codes.map((k) => k * 2 ** -c.fractionBits);
    // through the worker's job directly: the finder itself keeps 129 taps on the page
    const ctx: JobContext = {
      get: () => undefined,
      set: () => undefined,
      drop: () => undefined,
      checkpoint: () => Promise.resolve(),
    };
    const { value } = await tapZerosJob(taps, ctx);
    const ours = value.zeros.flatMap((z) =>
      Array.from({ length: z.multiplicity }, () =>
        z.im === 0 ? [{ re: z.re, im: 0 }] : [z, { re: z.re, im: -z.im }],
      ).flat(),
    );
    expect(ours).toHaveLength(c.zeros.re.length);
    c.zeros.re.forEach((re, i) => {
      const d = Math.min(...ours.map((z) => Math.hypot(z.re - re, z.im - c.zeros.im[i]!)));
      expect(d, `zero ${re} ${c.zeros.im[i]}i`).toBeLessThanOrEqual(2 * c.zeros.bound[i]!);
    });
  });
});
