/**
 * The reader's worker, or null when the page cannot start one (no Worker,
 * a policy that refuses it). The one-file build (vite.single.config.ts)
 * puts start-worker.page.ts in place of this file: that page has no file
 * beside it to load a worker from.
 */
export function startWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('./reader.worker.ts', import.meta.url), { type: 'module', name: 'raincut-reader' });
  } catch {
    return null;
  }
}
