/**
 * Passes values on at most once per animation frame: the first value in a frame goes through at once (no
 * added latency), later ones wait for the next frame, and only the newest waiting value is kept. flush()
 * hands over a waiting value immediately, so the final position of a drag is never dropped.
 */
export interface FrameCoalescer<T> {
  push(value: T): void;
  flush(): void;
  cancel(): void;
}

export function frameCoalescer<T>(commit: (value: T) => void): FrameCoalescer<T> {
  let pending: { value: T } | null = null;
  let frame: number | null = null;
  const run = () => {
    if (!pending) return;
    const { value } = pending;
    pending = null;
    commit(value);
    frame = requestAnimationFrame(() => {
      frame = null;
      run();
    });
  };
  return {
    push(value) {
      pending = { value };
      if (frame === null) run();
    },
    flush() {
      if (pending) {
        const { value } = pending;
        pending = null;
        commit(value);
      }
    },
    cancel() {
      pending = null;
      if (frame !== null) cancelAnimationFrame(frame);
      frame = null;
    },
  };
}
