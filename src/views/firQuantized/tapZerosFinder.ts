/**
 * Where the page finds the zeros of an FIR's quantized taps (store/firQuantizedDerived.ts `zerosOnPage`
 * decides): a short tap set on the page's own thread, in the render that draws it, so a small design never
 * shows a waiting key; a long one in a worker (workers/tapZeros.worker.ts), so letting go of a drag or
 * changing the word length does not stall the page for the root finding (an order-1024 polynomial takes
 * about a tenth of a second).
 * - While the worker works on the current taps, the answer is "finding": no zeros of other taps are shown.
 * - A reply for taps that have changed meanwhile is dropped; a new request supersedes the running one.
 * - A worker that cannot start or fails a job is not used again: the zeros are then found on the page, and
 *   the answer carries why, so the key can say so.
 * - Where there is no Worker (the tests in Node) everything is found on the page.
 * The state is a small store of its own; the decision for given taps is `answer`, a pure function of it.
 */
import { useEffect } from 'react';
import { useStore } from 'zustand';
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { TapZeros } from '../../core/fixed/firQuantized.ts';
import { sameTaps, zerosOfTaps, zerosOnPage } from '../../store/firQuantizedDerived.ts';
import { JobClient, type Endpoint, type JobRequest, type JobResponse } from '../../workers/jobs.ts';
import { TAP_ZEROS_JOB } from '../../workers/tapZerosJob.ts';

/** The page's end of the worker: a Worker, or in tests a port or a fake. */
export type TapZerosEndpoint = Endpoint<JobResponse, JobRequest> & {
  /** A Worker's load or run-time error (a script that did not load, an exception outside a job). */
  onerror?: ((e: Event) => void) | null;
  terminate?: () => void;
};

export interface TapZerosFinderState {
  /** The taps whose zeros the worker is finding, or null. */
  finding: readonly number[] | null;
  /** The last zeros the worker found, with their taps. */
  found: { taps: readonly number[]; zeros: TapZeros } | null;
  /** Why the worker is not used (it failed to start or failed a job); the zeros are then found on the page. */
  failure: string | null;
}

/** What the layers draw for the taps. */
export type TapZerosAnswer =
  | {
      status: 'found';
      zeros: TapZeros;
      /** 'page': found on the page's thread (short taps, no Worker, or after the worker failed). */
      where: 'page' | 'worker';
      /** The worker's failure, when that is why they were found on the page. */
      failure: string | null;
    }
  | { status: 'finding' };

const message = (err: unknown) => (err instanceof Error ? err.message : String(err)) || 'no reason given';

export class TapZerosFinder {
  readonly store: StoreApi<TapZerosFinderState> = createStore<TapZerosFinderState>()(() => ({
    finding: null,
    found: null,
    failure: null,
  }));
  private client: JobClient | null = null;
  private endpoint: TapZerosEndpoint | null = null;

  /** `makeEndpoint` null: no worker to use (everything is found on the page). */
  constructor(private readonly makeEndpoint: (() => TapZerosEndpoint) | null) {}

  /** Whether these taps' zeros are found on the page's thread, given the state. */
  onPage(taps: readonly number[], state: TapZerosFinderState = this.store.getState()): boolean {
    return this.makeEndpoint === null || state.failure !== null || zerosOnPage(taps);
  }

  /** What to draw for the taps in the state: their zeros (found now on the page if they go there) or "finding". */
  answer(taps: readonly number[], state: TapZerosFinderState = this.store.getState()): TapZerosAnswer {
    if (this.onPage(taps, state)) {
      // the failure matters only to taps that would have gone to the worker
      const failure = zerosOnPage(taps) ? null : state.failure;
      return { status: 'found', zeros: zerosOfTaps(taps), where: 'page', failure };
    }
    if (state.found && sameTaps(state.found.taps, taps))
      return { status: 'found', zeros: state.found.zeros, where: 'worker', failure: null };
    return { status: 'finding' };
  }

  /** Asks for the zeros of the taps (nothing to do when they are found on the page, known or being found). */
  want(taps: readonly number[]): void {
    const state = this.store.getState();
    if (this.onPage(taps, state)) return;
    if (state.found && sameTaps(state.found.taps, taps)) {
      // back to taps already solved (an undo): a search for others still running is no longer wanted
      if (state.finding) {
        this.client?.cancel(TAP_ZEROS_JOB);
        this.store.setState({ finding: null });
      }
      return;
    }
    if (state.finding && sameTaps(state.finding, taps)) return;
    const client = this.start();
    if (!client) return;
    this.store.setState({ finding: taps });
    void client.run<TapZeros>(TAP_ZEROS_JOB, taps).then((outcome) => {
      // a reply for taps no longer asked for (they changed meanwhile, or the worker failed) is dropped
      if (this.client !== client || this.store.getState().finding !== taps) return;
      if (outcome.status === 'done')
        this.store.setState({ finding: null, found: { taps, zeros: outcome.value } });
      else if (outcome.status === 'error') this.fail(`the worker failed (${outcome.message})`);
    });
  }

  /** The worker's client, started on first use; null when it could not start (the failure is recorded). */
  private start(): JobClient | null {
    if (this.client) return this.client;
    try {
      const endpoint = this.makeEndpoint!();
      endpoint.onerror = (e) => {
        if (this.endpoint !== endpoint) return;
        const text = (e as ErrorEvent).message;
        this.fail(text ? `the worker failed (${text})` : 'the worker could not be started');
      };
      this.endpoint = endpoint;
      this.client = new JobClient(endpoint);
      return this.client;
    } catch (err) {
      this.fail(`the worker could not be started (${message(err)})`);
      return null;
    }
  }

  /** Stops using the worker: from now on the zeros are found on the page. */
  private fail(reason: string): void {
    const endpoint = this.endpoint;
    this.client = null;
    this.endpoint = null;
    if (endpoint) endpoint.onerror = null;
    endpoint?.terminate?.();
    this.store.setState({ finding: null, failure: reason });
  }
}

/** The page's worker, started on the first long tap set. */
const pageEndpoint = (): TapZerosEndpoint =>
  new Worker(new URL('../../workers/tapZeros.worker.ts', import.meta.url), {
    type: 'module',
  }) as unknown as TapZerosEndpoint;

let pageFinder: TapZerosFinder | null = null;
/** The page's one finder (no worker where the platform has none). */
export function tapZerosFinder(): TapZerosFinder {
  pageFinder ??= new TapZerosFinder(typeof Worker === 'undefined' ? null : pageEndpoint);
  return pageFinder;
}

/** Tests: a finder over the given endpoint (null: none) for the layers to use. */
export function setTapZerosEndpoint(make: (() => TapZerosEndpoint) | null): void {
  pageFinder = new TapZerosFinder(make);
}

/** The zeros of the taps for a layer (null without taps): asks for them once the taps are drawn. */
export function useTapZeros(taps: readonly number[] | null): TapZerosAnswer | null {
  const finder = tapZerosFinder();
  const state = useStore(finder.store);
  useEffect(() => {
    if (taps) finder.want(taps);
  }, [finder, taps]);
  return taps ? finder.answer(taps, state) : null;
}
