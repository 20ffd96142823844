// Puts the large store's records in IndexedDB off the page's thread (large-writer.ts): a 10⁶-bar scenario's
// record held the page 90 to 145 ms of IndexedDB's own copying in one task (issue 11).
import { createStore, set } from 'idb-keyval';
import { LARGE_DB, LARGE_OBJECTS, type LargeWrite, type LargeWritten } from './large-db';

// The worker's global, typed by hand: the project's types are the page's (DOM), not the worker's.
interface WorkerScope {
  onmessage: ((event: MessageEvent<LargeWrite>) => void) | null;
  postMessage(message: LargeWritten): void;
}
const scope = self as unknown as WorkerScope;
const records = createStore(LARGE_DB, LARGE_OBJECTS);

scope.onmessage = (event: MessageEvent<LargeWrite>) => {
  const { job, key, value } = event.data;
  set(key, value, records).then(
    () => scope.postMessage({ job, ok: true }),
    (error: unknown) =>
      scope.postMessage({ job, ok: false, message: error instanceof Error ? error.message : String(error) }),
  );
};
