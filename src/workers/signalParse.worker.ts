/**
 * The parsing worker: one request per worker. The page cancels by terminating the worker, which stops a
 * read at once wherever it is (no cooperative check needed).
 */
import { parseSignalFile, type ParseMessage, type ParseRequest } from './parseSignal.ts';

interface WorkerScope {
  onmessage: ((e: MessageEvent<ParseRequest>) => void) | null;
  postMessage(message: ParseMessage, transfer?: Transferable[]): void;
}

const scope = self as unknown as WorkerScope;

scope.onmessage = (e) => {
  void parseSignalFile(e.data, (m, transfer) => scope.postMessage(m, transfer ?? [])).catch((err: unknown) =>
    scope.postMessage({
      type: 'error',
      error: { message: `The file could not be read: ${err instanceof Error ? err.message : String(err)}` },
    }),
  );
};
