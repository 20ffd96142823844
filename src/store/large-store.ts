import { del, get, keys, set } from 'idb-keyval';
import { describeError, type StorageLike, type StoredSlot } from '../scenario/stored-slot';
import type { Scenario } from '../scenario/types';
import { columnNumbers, LARGE_MARKER_TAG, readLargeMarker, type LargeMarker } from './large-marker';
import { copyNumbers, open, PACK_FROM } from './large-read';
import { putOffPage } from './large-writer';
import { nextTask, SLICE } from './next-task';
import type { WorkbenchStore } from './scenario-store';

/**
 * The large store: scenarios too large for localStorage, kept in the
 * browser's IndexedDB through idb-keyval (one object store, key → value).
 * Loaded on first use: only when a large scenario is saved, or when the
 * current scenario's slot holds a marker at start-up (./large-marker.ts).
 *
 * A record holds the scenario with its long number columns as Float64Array
 * (`pack`): IndexedDB copies those as whole buffers, where 10⁶ JSON numbers
 * would have to be written out as 20 MB of text first. A record is read back
 * through the one schema (`parseScenario`), as every saved scenario is.
 *
 * A save writes a new record, then the marker naming it, then deletes the
 * record the old marker named: the marker always names a whole record.
 */

export { LARGE_DB, LARGE_OBJECTS } from './large-db';
export { pack, readLarge, readLargeText, unpack, type LargeRead, type LargeText } from './large-read';

/**
 * `pack`, with long columns copied a slice at a time and a pause for the
 * page between slices: the autosave of 10⁶ bars held the page ~100 ms in one
 * task otherwise (issue 11). `value` must not change meanwhile (a scenario
 * never does: every edit makes a new one).
 */
export async function packInSlices(value: unknown): Promise<unknown> {
  if (Array.isArray(value)) {
    const list = value as unknown[];
    if (list.length >= PACK_FROM) {
      const n = list.length;
      const column = new Float64Array(n);
      let done = 0;
      while (done < n) {
        if (done > 0) await nextTask();
        const to = Math.min(n, done + SLICE);
        if (copyNumbers(list, column, done, to) < to) break;
        done = to;
      }
      if (done === n) return column;
    }
    const out: unknown[] = [];
    for (const v of list) out.push(await packInSlices(v));
    return out;
  }
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = await packInSlices(v);
    return out;
  }
  return value;
}

export type LargeSaved =
  | { readonly kind: 'saved'; readonly marker: LargeMarker }
  | { readonly kind: 'changed' }
  | { readonly kind: 'failed'; readonly reason: string };

/** Waits for a quiet moment of the page (requestIdleCallback where there is one), so a save never runs inside an input's handling. */
export function idle(): Promise<void> {
  return new Promise((resolve) => {
    if (typeof requestIdleCallback === 'function') requestIdleCallback(() => resolve(), { timeout: 1000 });
    else setTimeout(resolve, 0);
  });
}

let counter = 0;

const largeMarkerText = (marker: LargeMarker): string => JSON.stringify({ $format: LARGE_MARKER_TAG, ...marker });

/**
 * Packs the scenario (in slices, ./large-store.ts `packInSlices`) and puts it
 * in the large store under `id`. IndexedDB copies a value on the thread that
 * puts it (90 to 145 ms of one task for 10⁶ bars on the page), so the writer
 * worker puts it, its columns handed over (./large-writer.ts); the page puts
 * it itself when there is no writer, when the writer failed to start, or
 * when asked (`fromPage`). Returns when packing ended (performance.now()),
 * for the benchmarks' measures. Throws IndexedDB's refusal.
 */
export async function putScenario(
  id: string,
  scenario: Scenario,
  options: { readonly fromPage?: boolean } = {},
): Promise<number> {
  let packed = await packInSlices(scenario);
  const packedAt = performance.now();
  const off = options.fromPage ? 'none' : await putOffPage(id, packed);
  if (off !== 'put') {
    if (off === 'lost') packed = await packInSlices(scenario);
    await set(id, packed, open());
  }
  return packedAt;
}

/**
 * Saves the scenario in the large store and points the slot's marker at it.
 * Nothing is written over another tab's newer save (`changed`): the slot's
 * stamp is checked after the record is written and before the marker is.
 * Never throws.
 */
export async function saveLarge(
  scenario: Scenario,
  slot: StoredSlot<Scenario>,
  now: Date,
  options: { readonly offPage?: boolean } = {},
): Promise<LargeSaved> {
  if (slot.changedElsewhere()) return { kind: 'changed' };
  const before = readLargeMarker(slot.peek());
  const marker: LargeMarker = {
    id: `scenario.${now.toISOString()}.${(counter++).toString(36)}${Math.random().toString(36).slice(2, 8)}`,
    numbers: columnNumbers(scenario),
    savedAt: now.toISOString(),
  };
  try {
    // Timed for the browser benchmark (test/browser/storage.spec.mjs): packing on the page's thread (in slices, pauses
    // included), then the whole write.
    const t0 = performance.now();
    // From the page when it is closing (a worker may not outlive it).
    const t1 = await putScenario(marker.id, scenario, { fromPage: !options.offPage });
    performance.measure('raincut:large-pack', { start: t0, end: t1 });
    performance.measure('raincut:large-save', { start: t0, end: performance.now() });
  } catch (error) {
    return { kind: 'failed', reason: describeError(error) };
  }
  const drop = (id: string): Promise<void> => del(id, open()).catch(() => undefined);
  if (slot.changedElsewhere()) {
    await drop(marker.id);
    return { kind: 'changed' };
  }
  const failed = slot.writeText(largeMarkerText(marker));
  if (failed !== null) {
    await drop(marker.id);
    return { kind: 'failed', reason: failed };
  }
  if (before && before.id !== marker.id) await drop(before.id);
  return { kind: 'saved', marker };
}

/** The record under `id` exactly as kept (undefined when there is none), so a delete can be undone. May throw. */
export async function keptRecord(id: string): Promise<unknown> {
  return get(id, open());
}

/** Puts back a record taken by `keptRecord` (before its marker is put back: a marker always names a whole record). May throw. */
export async function putRecord(id: string, raw: unknown): Promise<void> {
  await set(id, raw, open());
}

/** Deletes a record no marker names any more. Never throws. */
export async function dropLarge(id: string): Promise<void> {
  await del(id, open()).catch(() => undefined);
}

/** Every record's key in the large store (./large-sweep.ts). May throw. */
export async function recordKeys(): Promise<IDBValidKey[]> {
  return keys(open());
}

/** A start-up delay before the sweep (./large-sweep.ts), so it never competes with the first screen's work. */
const SWEEP_AFTER_MS = 10_000;
let sweeping = false;

/**
 * Deletes, once a page, the large store's records nothing names (./large-sweep.ts):
 * some seconds after start-up, at a quiet moment. Called where the large
 * store is already in use (its code loaded), so a page that never had a
 * large scenario never loads it for this. Never throws.
 */
export function sweepSoon(storage: StorageLike | null): void {
  if (sweeping || !storage) return;
  sweeping = true;
  setTimeout(() => {
    void idle()
      .then(() => import('./large-sweep'))
      .then((m) => m.sweepLarge(storage, new Date(), { keys: recordKeys, drop: dropLarge }))
      .catch(() => undefined);
  }, SWEEP_AFTER_MS);
}

/** Where a scenario too large for the usual storage is, told once a page when it is first saved there. */
export const LARGE_STORE_TEXT =
  'This scenario is too large for the browser’s usual storage, so it is kept in this browser’s larger database (IndexedDB) on this computer, and opens from there next time. Save it as a file to keep a copy elsewhere.';
let told = false;

export interface SaveTurn {
  readonly store: WorkbenchStore;
  readonly slot: StoredSlot<Scenario>;
  readonly scenario: Scenario;
  /** The page is closing: no wait for a quiet moment. */
  readonly urgent: boolean;
  /** Settles when the page starts to close later: a save already waiting for a quiet moment (which a hidden page may never have) then goes at once. */
  readonly hurried: Promise<void>;
  /** False once a newer change is queued, or saving stopped: this one is then skipped. */
  readonly current: () => boolean;
  readonly saved: () => void;
  /** Another tab saved since this tab last read or wrote. */
  readonly changed: () => void;
}

/**
 * One autosave of the current scenario in the large store, for
 * persistStore (./persistence.ts), which runs them one at a time. Off the
 * input path: it waits for a quiet moment of the page first (unless the
 * page is closing), and a save overtaken by a newer change is skipped.
 */
export async function saveInTurn(turn: SaveTurn): Promise<void> {
  if (!turn.current()) return;
  if (!turn.urgent) await Promise.race([idle(), turn.hurried]);
  if (!turn.current()) return;
  const outcome = await saveLarge(turn.scenario, turn.slot, new Date(), { offPage: !turn.urgent });
  if (!turn.current() && outcome.kind !== 'saved') return;
  const { actions, notice } = turn.store.getState();
  if (outcome.kind === 'saved') {
    turn.saved();
    if (!told || notice?.kind === 'save-failed') {
      told = true;
      actions.setNotice({ kind: 'large-store', message: LARGE_STORE_TEXT });
    }
  } else if (outcome.kind === 'changed') turn.changed();
  else {
    actions.setNotice({
      kind: 'save-failed',
      message: `The latest change could not be saved in this browser’s large store (${outcome.reason}). It stays on screen; export it to keep it.`,
    });
  }
}
