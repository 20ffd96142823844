import type { LargeWrite, LargeWritten } from './large-db';
import { startLargeWriter } from './start-large-writer';

/**
 * Puts records through the large store's writer, a worker: IndexedDB copies
 * a value on the thread that puts it, and a 10⁶-bar record's copy held the
 * page 90 to 145 ms in one task (issue 11). The record's columns are handed
 * over (transferred), not copied: the caller gives up `value`. Settles
 * 'put'; or 'none' when there is no writer (no Worker, the one-file build;
 * `value` is untouched), or 'lost' when the writer failed to start after
 * `value` went to it: either way the caller puts the record from the page.
 * Throws IndexedDB's refusal as an Error.
 */
export type OffPage = 'put' | 'none' | 'lost';

let writer: Worker | null | undefined;
let jobs = 0;
const waiting = new Map<number, { done: (outcome: OffPage) => void; failed: (error: Error) => void }>();

function started(): Worker | null {
  if (writer !== undefined) return writer;
  writer = startLargeWriter();
  if (writer) {
    writer.onmessage = (event: MessageEvent<LargeWritten>) => {
      const answer = event.data;
      const job = waiting.get(answer.job);
      waiting.delete(answer.job);
      if (answer.ok) job?.done('put');
      else job?.failed(new Error(answer.message));
    };
    // The script could not be loaded or run: every write waiting, and every later one, goes from the page.
    writer.onerror = (event) => {
      event.preventDefault();
      writer?.terminate();
      writer = null;
      for (const job of waiting.values()) job.done('lost');
      waiting.clear();
    };
  }
  return writer;
}

/** The Float64Array buffers in a packed record (large-store.ts `pack`), to hand over with it. */
function buffersOf(value: unknown, into: ArrayBuffer[] = []): ArrayBuffer[] {
  if (value instanceof Float64Array) {
    if (!into.includes(value.buffer as ArrayBuffer)) into.push(value.buffer as ArrayBuffer);
  } else if (Array.isArray(value)) for (const v of value) buffersOf(v, into);
  else if (value !== null && typeof value === 'object') for (const v of Object.values(value)) buffersOf(v, into);
  return into;
}

/** Puts `value` under `key` from the writer (see above). */
export function putOffPage(key: string, value: unknown): Promise<OffPage> {
  const w = started();
  if (!w) return Promise.resolve('none');
  const job = ++jobs;
  return new Promise((done, failed) => {
    waiting.set(job, { done, failed });
    const message: LargeWrite = { job, key, value };
    w.postMessage(message, buffersOf(value));
  });
}
