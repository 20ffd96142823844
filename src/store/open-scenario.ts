import type { ScenarioResult } from '../scenario/problems';
import type { Scenario } from '../scenario/types';
import { stormProblem } from './checked';
import type { LargeRead } from './large-read';
import type { LargeMarker } from './large-marker';
import { nextTask, plainArrayInSlices } from './next-task';
import { PLACE_IN_STEPS_FROM } from './place-storm';
import type { ScenarioReadAnswer, ScenarioReadRequest } from './scenario-read-messages';
import type { WorkbenchStore } from './scenario-store';
import { startScenarioReader } from './start-scenario-reader';

// Imported by path, on first use (a scenario file opened, a saved entry opened, a large scenario restored at start-up).

/**
 * Opening a whole scenario without holding the page (issue 11's rule: no
 * task of the page over 100 ms): a long scenario file, or the large store's
 * record, is read and checked through the one schema in a worker
 * (scenario-read.worker.ts); its long columns come back handed over as
 * Float64Arrays and become the document's plain lists in slices here; the
 * storm's check and the results' arrays are made in tasks of their own
 * (`placeScenario`); then one undoable edit. Measured on 10⁶ bars before:
 * a file held the page 1.3 s in one task, a saved list's entry 1.1 s, the
 * start-up restore 0.9 s (bench:ui open1e6, list1e6, restore1e6).
 */

/** Files from this size on are read off the page; a shorter one is read on the page in a few ms. */
export const READ_OFF_PAGE_FROM_BYTES = 1 << 20;

let reader: Worker | null | undefined;
let jobs = 0;
const waiting = new Map<number, (answer: ScenarioReadAnswer | 'lost') => void>();

function started(): Worker | null {
  if (reader !== undefined) return reader;
  reader = startScenarioReader();
  if (reader) {
    reader.onmessage = (event: MessageEvent<ScenarioReadAnswer>) => {
      const done = waiting.get(event.data.job);
      waiting.delete(event.data.job);
      done?.(event.data);
    };
    // The script could not be loaded or run: every read waiting, and every later one, is made on the page.
    reader.onerror = (event) => {
      event.preventDefault();
      reader?.terminate();
      reader = null;
      for (const done of waiting.values()) done('lost');
      waiting.clear();
    };
  }
  return reader;
}

type Request = ScenarioReadRequest extends infer R ? (R extends { job: number } ? Omit<R, 'job'> : never) : never;

/** The reader's answer; 'none' when there is no reader (no Worker, the one-file build), 'lost' when it failed to start. */
function offPage(request: Request): Promise<ScenarioReadAnswer | 'none' | 'lost'> {
  const w = started();
  if (!w) return Promise.resolve('none');
  const job = ++jobs;
  return new Promise((done) => {
    waiting.set(job, done);
    w.postMessage({ ...request, job });
  });
}

/**
 * The plain document back from the reader's answer: every Float64Array a
 * plain list, copied a slice at a time with a pause between slices; a part
 * met twice stays one object.
 */
export async function unpackInSlices(value: unknown, seen = new Map<object, unknown>()): Promise<unknown> {
  if (value === null || typeof value !== 'object') return value;
  const known = seen.get(value);
  if (known !== undefined) return known;
  let out: unknown;
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    out = await plainArrayInSlices(value as unknown as ArrayLike<number>);
  } else if (Array.isArray(value)) {
    const list: unknown[] = [];
    for (const v of value as unknown[]) list.push(await unpackInSlices(v, seen));
    out = list;
  } else {
    const copy: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) copy[k] = await unpackInSlices(v, seen);
    out = copy;
  }
  seen.set(value, out);
  return out;
}

/**
 * A scenario file of at least READ_OFF_PAGE_FROM_BYTES read and checked off
 * the page (scenario/file.ts `scenarioFromFileText`, in the worker); null
 * when it was not (a short file, or no reader): the caller reads it on the page.
 */
export async function readScenarioFileOffPage(file: Blob): Promise<ScenarioResult | null> {
  if (file.size < READ_OFF_PAGE_FROM_BYTES) return null;
  const answer = await offPage({ kind: 'file', file });
  if (answer === 'none' || answer === 'lost') return null;
  if (!answer.ok) return { ok: false, problems: answer.problems };
  return { ok: true, scenario: (await unpackInSlices(answer.packed)) as Scenario };
}

/**
 * A share link's fragment read and checked off the page (scenario/link-read.ts
 * `readScenarioLink`, in the worker): the largest link the reader accepts
 * holds half a million bars in 3 kB, and held the page 519 ms (bench:ui
 * link-largest). Null when there is no reader: the link session reads it.
 */
export async function readLinkOffPage(fragment: string): Promise<ScenarioResult | null> {
  const answer = await offPage({ kind: 'link', fragment });
  if (answer === 'none' || answer === 'lost') return null;
  if (!answer.ok) return { ok: false, problems: answer.problems };
  return { ok: true, scenario: (await unpackInSlices(answer.packed)) as Scenario };
}

/** The large store's record a marker names, read through the schema off the page (large-read.ts `readLarge`). Never throws. */
export async function readLargeInSteps(marker: LargeMarker): Promise<LargeRead> {
  const answer = await offPage({ kind: 'record', marker });
  if (answer === 'none' || answer === 'lost') return (await import('./large-read')).readLarge(marker);
  if (!answer.ok) return { ok: false, message: answer.problems.map((p) => p.message).join(' ') };
  return { ok: true, scenario: (await unpackInSlices(answer.packed)) as Scenario };
}

/**
 * Makes ready what the first draw of the store's storm reads, when it is
 * long: the core's check of the storm (remembered, ./checked.ts) and the
 * results' arrays (./loss-ring.ts), each in tasks of their own. For a store
 * just made on a restored scenario, before it is drawn.
 */
export async function prepareLongStorm(store: WorkbenchStore, storm: Scenario['storm']): Promise<void> {
  if (storm.depthsMm.length < PLACE_IN_STEPS_FROM) return;
  await nextTask();
  stormProblem(storm);
  await store.derived.prepareStorm(storm);
  await nextTask();
}

/**
 * Replaces the scenario with one opened whole (a file, a saved entry) as
 * one undoable edit, as replaceScenario does, with a long storm's check and
 * arrays made ready first in tasks of their own.
 */
export async function placeScenario(store: WorkbenchStore, scenario: Scenario, label: string): Promise<void> {
  await prepareLongStorm(store, scenario.storm);
  store.getState().actions.replaceScenario(scenario, label);
}
