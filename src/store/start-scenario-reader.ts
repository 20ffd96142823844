/**
 * The scenario reader (scenario-read.worker.ts), or null when the page
 * cannot start one (no Worker, a policy that refuses it). The one-file build
 * (vite.single.config.ts) puts start-scenario-reader.page.ts in place of
 * this file: that page has no file beside it to load a worker from.
 */
export function startScenarioReader(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('./scenario-read.worker.ts', import.meta.url), { type: 'module', name: 'raincut-open' });
  } catch {
    return null;
  }
}
