/**
 * The code that changes a design's sample rate keeping it in hertz (store/sampleRate.ts and the composed
 * designs' core/model/partsRate.ts) is not in the page's first view: it loads after the first paint
 * (views/prefetch.ts) or when a rate change needs it first, as the design engine does (designEngine.ts).
 */
type RateChange = typeof import('./sampleRate.ts');

let loaded: RateChange | null = null;
let loading: Promise<RateChange> | null = null;

/** Loads the rate-change code (fetched once; a failed fetch is retried by the next call). */
export function loadRateChange(): Promise<RateChange> {
  if (loaded) return Promise.resolve(loaded);
  return (loading ??= import('./sampleRate.ts').then(
    (m) => (loaded = m),
    (e: unknown) => {
      loading = null;
      throw e;
    },
  ));
}

/** f of the rate-change code now, or once it has arrived (a promise; rejected when it cannot be fetched). */
export function withRateChange<T>(f: (m: RateChange) => T): T | Promise<Awaited<T>> {
  return loaded ? f(loaded) : (loadRateChange().then(f) as Promise<Awaited<T>>);
}
