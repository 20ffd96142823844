/**
 * The one-file build's stand-in for start-large-writer.ts: no worker, so
 * the large store's records are put from the page. The served app uses
 * start-large-writer.ts.
 */
export function startLargeWriter(): Worker | null {
  return null;
}
