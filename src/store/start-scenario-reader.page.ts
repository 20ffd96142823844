/**
 * The one-file build's stand-in for start-scenario-reader.ts: no worker, so
 * scenarios are read on the page. The served app uses start-scenario-reader.ts.
 */
export function startScenarioReader(): Worker | null {
  return null;
}
