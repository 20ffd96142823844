/**
 * The large store's writer (large-write.worker.ts), or null when the page
 * cannot start one (no Worker, a policy that refuses it). The one-file build
 * (vite.single.config.ts) puts start-large-writer.page.ts in place of this
 * file: that page has no file beside it to load a worker from.
 */
export function startLargeWriter(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('./large-write.worker.ts', import.meta.url), { type: 'module', name: 'raincut-store' });
  } catch {
    return null;
  }
}
