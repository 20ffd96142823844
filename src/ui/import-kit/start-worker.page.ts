/**
 * The one-file build's stand-in for start-worker.ts: no worker, so long
 * imports are read on the page in steps (off-thread.ts). The served app
 * uses start-worker.ts.
 */
export function startWorker(): Worker | null {
  return null;
}
