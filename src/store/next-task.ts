/**
 * Long passes on the page's thread (10⁶ numbers copied or packed) run in
 * slices with a pause between them, so input waits at most one slice
 * (issue 11: the page answers within 100 ms throughout a large import).
 */

/** Numbers a slice handles: about 2–5 ms of copying on a loaded laptop, far under the 50 ms of a long task. */
export const SLICE = 1 << 16;

interface Scheduler {
  readonly yield?: () => Promise<void>;
}

/**
 * Resolves in a later task of the page: scheduler.yield where the browser has
 * it (the rest of the work keeps its place ahead of other tasks), else a
 * MessageChannel message (no 4 ms clamp, as setTimeout has after a few nested
 * calls), else setTimeout (Node, for tests).
 */
export function nextTask(): Promise<void> {
  const scheduler = (globalThis as { scheduler?: Scheduler }).scheduler;
  if (typeof scheduler?.yield === 'function') return scheduler.yield();
  if (typeof MessageChannel === 'function') {
    return new Promise((resolve) => {
      const channel = new MessageChannel();
      channel.port1.onmessage = () => {
        channel.port1.close();
        resolve();
      };
      channel.port2.postMessage(null);
    });
  }
  return new Promise((resolve) => setTimeout(resolve, 0));
}

/** A column as a plain array, copied a slice at a time with a pause between slices; exact (both hold IEEE doubles). */
export async function plainArrayInSlices(column: ArrayLike<number>): Promise<number[]> {
  const n = column.length;
  const plain: number[] = [];
  for (let from = 0; from < n; from += SLICE) {
    if (from > 0) await nextTask();
    const to = Math.min(n, from + SLICE);
    for (let k = from; k < to; k++) plain.push(column[k] as number);
  }
  return plain;
}
