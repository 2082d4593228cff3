/**
 * The exact checks (core/stability/exactChecks.ts: the stability verdict, the check of the multiplied-out
 * coefficients, the error bounds of typed roots) are not in the page's first view: they load right after
 * the first paint (views/prefetch.ts), as the design algorithms do (designEngine.ts). Until they arrive
 * the store's verdict is null and the stability banner says it is being checked; a verdict is shown only
 * once the exact test has run. Every store follows the status (store.ts keeps it as `exactChecks`).
 */
import { exactChecks, installExactChecks } from '../core/stability/exactChecksSlot.ts';
import { importExactChecks } from './exactChecksImport.ts';

/** checking: not arrived yet (or being fetched again); failed: the fetch failed, with its message. */
export type ExactChecksStatus =
  { state: 'checking' } | { state: 'ready' } | { state: 'failed'; message: string };

const CHECKING: ExactChecksStatus = { state: 'checking' };
const READY: ExactChecksStatus = { state: 'ready' };

let failure: ExactChecksStatus | null = null;
let loading: Promise<void> | null = null;
const listeners = new Set<(status: ExactChecksStatus) => void>();

/** Where the exact checks are now. */
export function exactChecksStatus(): ExactChecksStatus {
  return exactChecks() ? READY : (failure ?? CHECKING);
}

/**
 * Calls listener with every change of the status; returns the function that stops it. Ready is the last
 * status there is: once it has been told, every listener is let go (a store made after that is not kept
 * alive by this module).
 */
export function watchExactChecks(listener: (status: ExactChecksStatus) => void): () => void {
  if (exactChecks()) return () => {};
  listeners.add(listener);
  return () => listeners.delete(listener);
}

function tell(): void {
  const status = exactChecksStatus();
  for (const l of [...listeners]) l(status);
}

/** Loads and installs the exact checks (fetched once; after a failed fetch the next call tries again). */
export function loadExactChecks(): Promise<void> {
  if (exactChecks()) return Promise.resolve();
  if (!loading) {
    if (failure) {
      failure = null; // checking again
      tell();
    }
    loading = importExactChecks().then(
      (m) => {
        loading = null;
        installExactChecks(m.EXACT_CHECKS);
        tell();
        listeners.clear();
      },
      (e: unknown) => {
        loading = null;
        failure = { state: 'failed', message: e instanceof Error ? e.message : String(e) };
        tell();
        throw e;
      },
    );
  }
  return loading;
}
