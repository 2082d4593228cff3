/**
 * Main-thread work per pointer move from a Chromium trace (steadier than wall-clock stopwatches on a loaded
 * machine: a task's duration on the renderer's main thread counts only while the thread is running it). The
 * page marks each move with performance.mark(MOVE_MARK) in a capturing pointermove listener; every top-level
 * task of that renderer's main thread from the task holding one mark up to the task holding the next belongs
 * to that move (its input dispatch, React render and commit, the animation frame, style, layout, paint and
 * the compositor commit on the main thread). Tasks that carry a DevTools protocol message (the benchmark's
 * own page.evaluate calls between moves) are left out.
 */

/** The mark the drag probe leaves on every pointer move. */
export const MOVE_MARK = 'pw-bench-move';

/** Trace categories: the top-level task events, the timeline's names for them, and user timing. */
export const TRACE_CATEGORIES = [
  'toplevel',
  'devtools.timeline',
  'disabled-by-default-devtools.timeline',
  'blink.user_timing',
].join(',');

/** One event of the Chromium trace-event format (only the fields read here). */
export interface TraceEvent {
  name: string;
  cat?: string;
  ph: string;
  pid: number;
  tid: number;
  /** Microseconds. */
  ts: number;
  dur?: number;
  /** Thread CPU time of a complete event, microseconds (what the thread spent running it). */
  tdur?: number;
  args?: Record<string, unknown>;
}

/** The top-level task names Chromium gives a unit of work on a thread's run loop. */
const TASK_NAMES = new Set(['RunTask', 'ThreadControllerImpl::RunTask', 'ThreadPool_RunTask']);

function isDevToolsMessage(e: TraceEvent): boolean {
  if (e.name !== 'Receive mojo message') return false;
  const info = e.args?.chrome_mojo_event_info as { mojo_interface_tag?: string } | undefined;
  return info?.mojo_interface_tag?.includes('DevTools') ?? false;
}

/**
 * Main-thread milliseconds per move, in move order, from the trace events: `cpu` sums the tasks' thread CPU
 * time (what the thread spent running them, whatever else the machine was doing), `wall` their durations
 * (which also count the time the thread was preempted by other work on a loaded machine).
 */
export function workPerMove(events: readonly TraceEvent[]): { cpu: number[]; wall: number[] } {
  const marks = events.filter((e) => e.name === MOVE_MARK && (e.ph === 'R' || e.ph === 'I' || e.ph === 'n'));
  if (marks.length === 0) return { cpu: [], wall: [] };
  const { pid, tid } = marks[0]!;
  const tasks = events
    .filter(
      (e) => e.pid === pid && e.tid === tid && e.ph === 'X' && TASK_NAMES.has(e.name) && e.dur !== undefined,
    )
    .sort((a, b) => a.ts - b.ts);
  const devtools = events
    .filter((e) => e.pid === pid && e.tid === tid && e.ph === 'X' && isDevToolsMessage(e))
    .map((e) => e.ts);
  // Keep only outermost tasks (a nested RunTask is already inside its parent's duration).
  const outer: TraceEvent[] = [];
  for (const t of tasks) {
    const last = outer[outer.length - 1];
    if (last && t.ts < last.ts + last.dur!) continue;
    outer.push(t);
  }
  const top = outer.filter((t) => !devtools.some((ts) => ts >= t.ts && ts <= t.ts + t.dur!));
  const starts = marks
    .filter((m) => m.pid === pid && m.tid === tid)
    .map((m) => {
      const holder = top.find((t) => t.ts <= m.ts && m.ts <= t.ts + t.dur!);
      return holder ? holder.ts : m.ts;
    })
    .sort((a, b) => a - b);
  const cpu = new Array<number>(starts.length).fill(0);
  const wall = new Array<number>(starts.length).fill(0);
  let k = 0;
  for (const t of top) {
    while (k + 1 < starts.length && t.ts >= starts[k + 1]!) k++;
    if (t.ts < starts[0]!) continue;
    cpu[k]! += (t.tdur ?? t.dur!) / 1000;
    wall[k]! += t.dur! / 1000;
  }
  return { cpu, wall };
}

/** One top-level task of a thread: its duration and thread CPU time, ms, and when it began (µs, trace clock). */
export interface TraceTask {
  ts: number;
  wall: number;
  cpu: number;
}

/**
 * The top-level tasks of the main thread of the renderer that left the mark `markName` (one performance.mark
 * before the action), from the mark on; tasks carrying a DevTools protocol message (the benchmark's own
 * calls) are left out.
 */
export function tasksAfterMark(events: readonly TraceEvent[], markName: string): TraceTask[] {
  const mark = events.find((e) => e.name === markName && (e.ph === 'R' || e.ph === 'I' || e.ph === 'n'));
  if (!mark) return [];
  const { pid, tid } = mark;
  const tasks = events
    .filter(
      (e) => e.pid === pid && e.tid === tid && e.ph === 'X' && TASK_NAMES.has(e.name) && e.dur !== undefined,
    )
    .sort((a, b) => a.ts - b.ts);
  const devtools = events
    .filter((e) => e.pid === pid && e.tid === tid && e.ph === 'X' && isDevToolsMessage(e))
    .map((e) => e.ts);
  const outer: TraceEvent[] = [];
  for (const t of tasks) {
    const last = outer[outer.length - 1];
    if (last && t.ts < last.ts + last.dur!) continue;
    outer.push(t);
  }
  return outer
    .filter((t) => t.ts + t.dur! >= mark.ts && !devtools.some((ts) => ts >= t.ts && ts <= t.ts + t.dur!))
    .map((t) => ({ ts: t.ts, wall: t.dur! / 1000, cpu: (t.tdur ?? t.dur!) / 1000 }));
}
