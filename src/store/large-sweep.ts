import { describeError, type StorageLike } from '../scenario/stored-slot';

/**
 * Deletes records of the large store (./large-store.ts) that nothing names
 * any more: a save stopped between its record and its marker, a deletion
 * dropped past the saved list's undo list, a delete whose record could not
 * be removed at the time. Runs off the input path, after start-up, only in
 * a page that already uses the large store (`sweepSoon`).
 *
 * What names a record: any text this origin keeps in localStorage (the
 * current scenario's marker, the saved list's pointers, set-aside copies,
 * even damaged ones, whose text still holds the record's key). Matched as
 * plain text, so anything that might name a record keeps it.
 *
 * The safe-age rule. A save writes its record first and the marker naming it
 * after (a whole record is never named half-written); in another tab, that
 * gap lasts as long as its packing and IndexedDB write, and a tab frozen in
 * the background may stretch it. So a record is deleted only when it has
 * been seen unnamed by a sweep at least ORPHAN_AGE_MS before, is unnamed
 * now, and is still unnamed when read again just before the delete. When it
 * was first seen unnamed is kept under SWEEP_KEY; a record found named again
 * leaves that list, so its next time unnamed starts the wait afresh. A save
 * in progress in another tab is therefore deleted only if it stayed between
 * its record and its marker for a whole ORPHAN_AGE_MS. Anything unreadable
 * here (the keys, the list of first sightings, the clock going backwards)
 * keeps records: the cost of an error is disk space, never the user's work.
 */

/** Where the sweeps keep when they first saw each unnamed record. */
export const SWEEP_KEY = 'raincut.large-sweep';
const SWEEP_FORMAT = 'raincut-large-sweep';
/** How long a record must stay unnamed before it is deleted: a day (common practice, no source: far above any save's seconds). */
export const ORPHAN_AGE_MS = 24 * 60 * 60 * 1000;

/** Every text this origin keeps, except the sweep's own list; null when the keys cannot be listed (then nothing is deleted). */
function storedTexts(storage: StorageLike): string[] | null {
  const { length, key } = storage;
  if (typeof length !== 'number' || typeof key !== 'function') return null;
  try {
    const texts: string[] = [];
    for (let i = 0; i < length; i++) {
      const k = key.call(storage, i);
      if (k === null || k === SWEEP_KEY) continue;
      const text = storage.getItem(k);
      if (text !== null) texts.push(text);
    }
    return texts;
  } catch {
    return null;
  }
}

/** When each record was first seen unnamed (ISO 8601); empty when nothing, or nothing readable, is kept. */
function readSightings(storage: StorageLike): Record<string, string> {
  try {
    const json = JSON.parse(storage.getItem(SWEEP_KEY) ?? 'null') as unknown;
    if (json === null || typeof json !== 'object' || (json as Record<string, unknown>)['$format'] !== SWEEP_FORMAT)
      return {};
    const orphans = (json as Record<string, unknown>)['orphans'];
    if (orphans === null || typeof orphans !== 'object') return {};
    const out: Record<string, string> = {};
    for (const [id, at] of Object.entries(orphans)) if (typeof at === 'string') out[id] = at;
    return out;
  } catch {
    return {};
  }
}

export interface SweepOutcome {
  /** Records deleted. */
  readonly dropped: readonly string[];
  /** Records unnamed but not yet old enough, kept. */
  readonly waiting: readonly string[];
  /** Why the sweep did nothing, if it did nothing. */
  readonly skipped?: string;
}

/** The large store's records, as the sweep needs them (./large-store.ts: `recordKeys`, `dropLarge`). */
export interface LargeRecords {
  keys(): Promise<readonly IDBValidKey[]>;
  /** Never throws. */
  drop(id: string): Promise<void>;
}

/** One sweep (see above). Never throws. */
export async function sweepLarge(storage: StorageLike, now: Date, records: LargeRecords): Promise<SweepOutcome> {
  let ids: string[];
  try {
    ids = (await records.keys()).filter((k): k is string => typeof k === 'string');
  } catch (error) {
    return { dropped: [], waiting: [], skipped: `the large store could not be read (${describeError(error)})` };
  }
  const texts = storedTexts(storage);
  if (texts === null) return { dropped: [], waiting: [], skipped: 'the browser’s storage could not be listed' };
  const namedIn = (all: readonly string[], id: string): boolean => all.some((t) => t.includes(id));
  const seen = readSightings(storage);
  const nowMs = now.getTime();
  const next: Record<string, string> = {};
  const dropped: string[] = [];
  for (const id of ids) {
    if (namedIn(texts, id)) continue;
    const first = Date.parse(seen[id] ?? '');
    const known = Number.isFinite(first) && first <= nowMs;
    if (known && nowMs - first >= ORPHAN_AGE_MS) {
      // Read again just before the delete: a marker written since the first reading keeps it.
      const fresh = storedTexts(storage);
      if (fresh !== null && !namedIn(fresh, id)) {
        await records.drop(id);
        dropped.push(id);
        continue;
      }
      // Named now: no longer an orphan; unnamed again later, it waits a whole day afresh.
      if (fresh !== null) continue;
    }
    next[id] = known ? (seen[id] as string) : now.toISOString();
  }
  try {
    if (Object.keys(next).length === 0) storage.removeItem(SWEEP_KEY);
    else storage.setItem(SWEEP_KEY, JSON.stringify({ $format: SWEEP_FORMAT, orphans: next }));
  } catch {
    // Not kept: the next sweep starts the wait afresh, so nothing is deleted early.
  }
  return { dropped, waiting: Object.keys(next) };
}
