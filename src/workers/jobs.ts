/**
 * Long computations on a recording, run in a worker in slices: a small protocol, the worker's side (handlers
 * registered by kind) and the page's side (a client). Shared by every recording job (the fixed-point run now;
 * filtering and min/max pyramids can register beside it).
 *
 * - Data that several jobs use (the recording's samples) is sent once with `put` and kept in the worker under
 *   a key, so a job's request stays small.
 * - A job works in slices and calls `checkpoint()` between them: that lets newer messages in, reports progress,
 *   and ends the job (with JobCancelled) once it has been cancelled.
 * - Last wins: a new job of a kind cancels the one of that kind still running, on both sides.
 * None of this touches the DOM, so tests drive both sides through a pair of message ports.
 */

/** Page → worker. */
export type JobRequest =
  | { type: 'put'; key: string; value: unknown }
  | { type: 'drop'; key: string }
  | { type: 'run'; id: number; kind: string; payload: unknown }
  | { type: 'cancel'; id: number };

/** Worker → page. */
export type JobResponse =
  | { type: 'progress'; id: number; fraction: number }
  | { type: 'done'; id: number; value: unknown }
  | { type: 'error'; id: number; message: string }
  | { type: 'cancelled'; id: number };

/** What a job sees of the worker. */
export interface JobContext {
  /** A value sent with `put` (or kept by a job with `set`), or undefined. */
  get<T>(key: string): T | undefined;
  /** Keeps a value in the worker for later jobs (a recording read there, what was computed from it). */
  set(key: string, value: unknown): void;
  /** Forgets a kept value. */
  drop(key: string): void;
  /** Reports progress (0..1) and yields to the worker's message loop; throws JobCancelled once cancelled. */
  checkpoint(fraction: number): Promise<void>;
}

/** A job's work: the result and the buffers to transfer with it. */
export type JobHandler = (
  payload: never,
  ctx: JobContext,
) => Promise<{ value: unknown; transfer?: Transferable[] }>;

/** Thrown by checkpoint() in a cancelled job. */
export class JobCancelled extends Error {
  constructor() {
    super('cancelled');
  }
}

/** The two ends a side talks through: a worker scope, a Worker, or a MessagePort. */
export interface Endpoint<In, Out> {
  postMessage(message: Out, transfer?: Transferable[]): void;
  onmessage: ((e: MessageEvent<In>) => void) | null;
}

/**
 * Yields to the event loop without setTimeout's clamping (which adds 4 ms per nested slice): one message
 * channel for the whole worker, so a long job's thousands of slices make no channels (and no garbage) each.
 */
let turnChannel: MessageChannel | null = null;
const waiting: (() => void)[] = [];
function nextTurn(): Promise<void> {
  if (!turnChannel) {
    turnChannel = new MessageChannel();
    turnChannel.port1.onmessage = () => waiting.shift()?.();
    // Node (tests) would otherwise stay alive for the open port; browsers have no unref.
    (turnChannel.port1 as { unref?: () => void }).unref?.();
  }
  const channel = turnChannel;
  return new Promise((resolve) => {
    waiting.push(resolve);
    channel.port2.postMessage(null);
  });
}

/** The worker's side: answers requests with the handlers, by kind. */
export function serveJobs(
  scope: Endpoint<JobRequest, JobResponse>,
  handlers: Record<string, JobHandler>,
): void {
  const store = new Map<string, unknown>();
  const cancelled = new Set<number>();
  const runningByKind = new Map<string, number>();
  scope.onmessage = (e) => {
    const m = e.data;
    if (m.type === 'put') store.set(m.key, m.value);
    else if (m.type === 'drop') store.delete(m.key);
    else if (m.type === 'cancel') cancelled.add(m.id);
    else void run(m.id, m.kind, m.payload);
  };
  async function run(id: number, kind: string, payload: unknown): Promise<void> {
    const previous = runningByKind.get(kind);
    if (previous !== undefined) cancelled.add(previous);
    runningByKind.set(kind, id);
    const handler = handlers[kind];
    const ctx: JobContext = {
      get: <T>(key: string) => store.get(key) as T | undefined,
      set: (key, value) => void store.set(key, value),
      drop: (key) => void store.delete(key),
      checkpoint: async (fraction) => {
        if (cancelled.has(id)) throw new JobCancelled();
        scope.postMessage({ type: 'progress', id, fraction });
        await nextTurn();
        if (cancelled.has(id)) throw new JobCancelled();
      },
    };
    try {
      if (!handler) throw new Error(`no job of kind "${kind}"`);
      const { value, transfer } = await handler(payload as never, ctx);
      if (cancelled.has(id)) scope.postMessage({ type: 'cancelled', id });
      else scope.postMessage({ type: 'done', id, value }, transfer ?? []);
    } catch (err) {
      if (err instanceof JobCancelled) scope.postMessage({ type: 'cancelled', id });
      else
        scope.postMessage({ type: 'error', id, message: err instanceof Error ? err.message : String(err) });
    } finally {
      cancelled.delete(id);
      if (runningByKind.get(kind) === id) runningByKind.delete(kind);
    }
  }
}

/** How a job ended, as the page sees it. */
export type JobOutcome<T> =
  { status: 'done'; value: T } | { status: 'error'; message: string } | { status: 'cancelled' };

interface Pending {
  kind: string;
  resolve: (o: JobOutcome<unknown>) => void;
  onProgress?: (fraction: number) => void;
}

/** The page's side: sends data and jobs to one worker and hands back their outcomes. */
export class JobClient {
  private nextId = 1;
  private readonly pending = new Map<number, Pending>();
  private readonly latest = new Map<string, number>();

  constructor(private readonly worker: Endpoint<JobResponse, JobRequest>) {
    worker.onmessage = (e) => this.receive(e.data);
  }

  /** Keeps a value in the worker under the key (copied, or moved when its buffers are listed in transfer). */
  put(key: string, value: unknown, transfer: Transferable[] = []): void {
    this.worker.postMessage({ type: 'put', key, value }, transfer);
  }

  /** Forgets a value kept in the worker. */
  drop(key: string): void {
    this.worker.postMessage({ type: 'drop', key });
  }

  /**
   * Runs a job; a job of the same kind still running is cancelled (its promise resolves as cancelled).
   * `onProgress` hears the fraction done after each slice.
   */
  run<T>(kind: string, payload: unknown, onProgress?: (fraction: number) => void): Promise<JobOutcome<T>> {
    this.cancel(kind);
    const id = this.nextId++;
    this.latest.set(kind, id);
    return new Promise((resolve) => {
      this.pending.set(id, {
        kind,
        resolve: resolve as (o: JobOutcome<unknown>) => void,
        ...(onProgress ? { onProgress } : {}),
      });
      this.worker.postMessage({ type: 'run', id, kind, payload });
    });
  }

  /** Cancels the running job of the kind, if any. */
  cancel(kind: string): void {
    const id = this.latest.get(kind);
    if (id === undefined || !this.pending.has(id)) return;
    this.worker.postMessage({ type: 'cancel', id });
    this.settle(id, { status: 'cancelled' });
  }

  /** Whether a job of the kind is running. */
  busy(kind: string): boolean {
    const id = this.latest.get(kind);
    return id !== undefined && this.pending.has(id);
  }

  private settle(id: number, outcome: JobOutcome<unknown>): void {
    const p = this.pending.get(id);
    if (!p) return;
    this.pending.delete(id);
    p.resolve(outcome);
  }

  private receive(m: JobResponse): void {
    if (m.type === 'progress') this.pending.get(m.id)?.onProgress?.(m.fraction);
    else if (m.type === 'done') this.settle(m.id, { status: 'done', value: m.value });
    else if (m.type === 'error') this.settle(m.id, { status: 'error', message: m.message });
    else this.settle(m.id, { status: 'cancelled' });
  }
}
