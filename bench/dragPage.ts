/**
 * In-page instruments for the drag benchmark, passed to page.evaluate (so they must be self-contained:
 * no imports, no closures over module scope). They time each pointer move on the plane:
 * - `script`: from the first listener seeing the move to the end of the React render of every panel
 *   (a microtask queued after the plane's handler runs after React's synchronous flush);
 * - `render`: from the next animation-frame callback to a task posted from it, i.e. that frame's rAF work,
 *   style, layout and paint;
 * - `work`: script + render, the main-thread cost of the frame that shows the move (idle time excluded);
 * - `latency`: from the event's timestamp to the end of that frame's paint;
 * and whether the dragged root's marker moved (every pointer update drawn).
 */
export interface DragSample {
  script: number;
  render: number;
  work: number;
  latency: number;
  drawn: boolean;
}

declare global {
  interface Window {
    __dragBench?: { samples: DragSample[]; waiters: (() => void)[] };
  }
}

/** Installs the listeners; `selector` picks the dragged root's marker. */
export function installDragProbe(selector: string): void {
  if (window.__dragBench) return; // once per page: a second set of listeners would be measured too
  const state = { samples: [] as DragSample[], waiters: [] as (() => void)[] };
  window.__dragBench = state;
  let start = 0;
  let stamp = 0;
  let last = document.querySelector(selector)?.getAttribute('transform') ?? '';
  window.addEventListener(
    'pointermove',
    (e) => {
      start = performance.now();
      stamp = e.timeStamp;
      // Read by bench/dragTrace.ts (MOVE_MARK): where each move's main-thread work begins in the trace.
      performance.mark('pw-bench-move');
    },
    { capture: true },
  );
  window.addEventListener('pointermove', () => {
    const s0 = start;
    const ts = stamp;
    queueMicrotask(() => {
      const rendered = performance.now();
      requestAnimationFrame(() => {
        const raf = performance.now();
        const ch = new MessageChannel();
        ch.port1.onmessage = () => {
          const now = performance.now();
          const t = document.querySelector(selector)?.getAttribute('transform') ?? '';
          const script = rendered - s0;
          const render = now - raf;
          state.samples.push({ script, render, work: script + render, latency: now - ts, drawn: t !== last });
          last = t;
          state.waiters.splice(0).forEach((w) => w());
        };
        ch.port2.postMessage(0);
      });
    });
  });
}

/** Resolves once the sample for the latest move has been taken. */
export function nextSample(count: number): Promise<number> {
  const state = window.__dragBench!;
  if (state.samples.length >= count) return Promise.resolve(state.samples.length);
  return new Promise((resolve) => state.waiters.push(() => resolve(state.samples.length)));
}

/** Screen positions of the points z from the plane's drawn unit circle (all at once, before a drag). */
export function zToClient(zs: { re: number; im: number }[]): { x: number; y: number }[] {
  const svg = document.querySelector('svg.pw-plane-svg')!;
  const c = svg.querySelector('circle.pw-unit-circle')!;
  const box = svg.getBoundingClientRect();
  const r = Number(c.getAttribute('r'));
  return zs.map((z) => ({
    x: box.left + Number(c.getAttribute('cx')) + z.re * r,
    y: box.top + Number(c.getAttribute('cy')) - z.im * r,
  }));
}
