/**
 * The recording worker's job protocol, both sides joined by a MessageChannel (no worker needed): slices,
 * progress, last-wins cancellation, errors, and the fixed-point run job against the one-shot simulation.
 */
import { describe, it, expect, afterEach } from 'vitest';
import {
  JobClient,
  serveJobs,
  type Endpoint,
  type JobContext,
  type JobRequest,
  type JobResponse,
} from '../../src/workers/jobs.ts';
import {
  FIXED_RUN_JOB,
  fixedRecordingJob,
  type FixedRecordingResult,
} from '../../src/workers/fixedRecordingJob.ts';
import { buildImplementation, DEFAULT_IMPLEMENTATION, simulateFixed } from '../../src/core/fixed/index.ts';
import { makeWhiteNoise } from '../../src/core/time/inputs.ts';
import { hum } from '../helpers/fixedDesigns.ts';

const channels: MessageChannel[] = [];
afterEach(() => {
  for (const c of channels.splice(0)) {
    c.port1.close();
    c.port2.close();
  }
});

/** A client and a served "worker" on the two ends of a channel. */
function pair(handlers: Parameters<typeof serveJobs>[1]): JobClient {
  const channel = new MessageChannel();
  channels.push(channel);
  serveJobs(channel.port2 as unknown as Endpoint<JobRequest, JobResponse>, handlers);
  return new JobClient(channel.port1 as unknown as Endpoint<JobResponse, JobRequest>);
}

/** Sums 0..n−1 in slices of 10, with a checkpoint after each. */
async function count(payload: { n: number }, ctx: JobContext) {
  let sum = 0;
  for (let i = 0; i < payload.n; i += 10) {
    for (let k = i; k < Math.min(payload.n, i + 10); k++) sum += k;
    await ctx.checkpoint(Math.min(1, (i + 10) / payload.n));
  }
  return { value: sum };
}

describe('jobs', () => {
  it('runs a sliced job, reporting progress, and hands back its value', async () => {
    const client = pair({ count: count as never });
    const seen: number[] = [];
    const r = await client.run<number>('count', { n: 100 }, (f) => seen.push(f));
    expect(r).toEqual({ status: 'done', value: 4950 });
    expect(seen).toHaveLength(10);
    expect(seen.at(-1)).toBe(1);
  });

  it('last wins: a new job of the same kind cancels the running one', async () => {
    const client = pair({ count: count as never });
    const first = client.run<number>('count', { n: 100_000 });
    const second = client.run<number>('count', { n: 100 });
    expect(await first).toEqual({ status: 'cancelled' });
    expect(await second).toEqual({ status: 'done', value: 4950 });
    const third = client.run<number>('count', { n: 100_000 });
    client.cancel('count');
    expect(await third).toEqual({ status: 'cancelled' });
    expect(client.busy('count')).toBe(false);
  });

  it('reports a failing job and an unknown kind as errors', async () => {
    const client = pair({
      broken: (async () => {
        throw new Error('the samples are gone');
      }) as never,
    });
    expect(await client.run('broken', {})).toEqual({ status: 'error', message: 'the samples are gone' });
    expect(await client.run('nothing', {})).toEqual({ status: 'error', message: 'no job of kind "nothing"' });
  });
});

describe('fixed-point run of a recording', () => {
  it('gives the one-shot simulation’s codes, its differences and report', async () => {
    const built = buildImplementation(hum, 2000, { ...DEFAULT_IMPLEMENTATION, structure: 'df1' });
    if (!built.ok) throw new Error(built.error.message);
    const impl = built.value;
    const x = makeWhiteNoise(100_000, 4, 0.2);
    const client = pair({ [FIXED_RUN_JOB]: fixedRecordingJob as never });
    client.put('rec', x);
    const r = await client.run<FixedRecordingResult>(FIXED_RUN_JOB, {
      implementation: impl,
      recordingKey: 'rec',
    });
    if (r.status !== 'done') throw new Error(JSON.stringify(r));
    const whole = simulateFixed(impl, x);
    expect(Array.from(r.value.output)).toEqual(Array.from(whole.output));
    let max = 0;
    for (let i = 0; i < x.length; i++)
      max = Math.max(max, Math.abs(whole.output[i]! - whole.reference[i]! * 32768));
    const diffMax = r.value.differenceLsb.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
    expect(diffMax).toBeCloseTo(max, 3); // stored as float32
    expect(r.value.report.ideal.maxLsb).toBeCloseTo(max, 9);
    expect(r.value.report.samples).toBe(100_000);
    expect(['rest', 'cycle', 'undecided']).toContain(r.value.report.afterInput.verdict);
  });

  it('says so when the recording is missing', async () => {
    const built = buildImplementation(hum, 2000, DEFAULT_IMPLEMENTATION);
    if (!built.ok) throw new Error(built.error.message);
    const client = pair({ [FIXED_RUN_JOB]: fixedRecordingJob as never });
    const r = await client.run(FIXED_RUN_JOB, { implementation: built.value, recordingKey: 'none' });
    expect(r).toEqual({ status: 'error', message: 'no recording to run (it was closed)' });
  });
});
