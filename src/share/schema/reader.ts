/**
 * Reading design documents without holding up the page. The zod schemas (full.ts) are a quarter of the
 * first view's code, so the page starts without them: what the workbench itself wrote (its autosaved
 * session, its links and files) is read by the hand-written reader (quick.ts), and anything that reader is
 * not sure of waits for the full one, which the page fetches right after its first paint. A synchronous
 * read that needs the full reader before it has arrived throws FullReaderPending (and starts fetching it);
 * the caller waits for loadFullReader() and reads again. Nothing is ever refused or altered for want of the
 * full reader. The command line and the tests install it at start (installFullReader).
 */
import type { SharedView } from '../../core/model/view.ts';
import type { DocumentResult } from './migrate.ts';
import { quickReadDocument, quickReadView } from './quick.ts';

export interface FullReader {
  readDocument(json: unknown): DocumentResult;
  readView(json: unknown): SharedView | null;
}

/** A read needed the full reader before it was loaded: await loadFullReader() and read again. */
export class FullReaderPending extends Error {
  constructor() {
    super('the design reader is still loading');
    this.name = 'FullReaderPending';
  }
}

let full: FullReader | null = null;
let loading: Promise<FullReader> | null = null;

/** Makes the full reader available at once (the command line and the tests); null removes it (tests). */
export function installFullReader(reader: FullReader | null): void {
  full = reader;
  loading = null;
}

/** Whether the full reader has arrived. */
export const fullReaderLoaded = () => full !== null;

/** Fetches the full reader (once; a failed fetch may be retried). */
export function loadFullReader(): Promise<FullReader> {
  if (full) return Promise.resolve(full);
  return (loading ??= import('./full.ts').then(
    (m) => (full = m),
    (e: unknown) => {
      loading = null;
      throw e;
    },
  ));
}

function pending(): never {
  void loadFullReader().catch(() => undefined); // the caller's own wait reports a failure
  throw new FullReaderPending();
}

/** Validates and migrates a parsed document; throws FullReaderPending when that needs the full reader. */
export function readDocumentNow(json: unknown): DocumentResult {
  const quick = quickReadDocument(json);
  if (quick) return { ok: true, document: quick };
  return full ? full.readDocument(json) : pending();
}

/** The shared view settings of a session, null when damaged; throws FullReaderPending like readDocumentNow. */
export function readViewNow(json: unknown): SharedView | null {
  const quick = quickReadView(json);
  if (quick) return quick;
  return full ? full.readView(json) : pending();
}

/** Runs a read, and again once the full reader has loaded if the first attempt needed it. */
export async function readWhenReady<T>(read: () => T): Promise<T> {
  try {
    return read();
  } catch (e) {
    if (!(e instanceof FullReaderPending)) throw e;
  }
  await loadFullReader();
  return read();
}
