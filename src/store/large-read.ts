import { createStore, get, type UseStore } from 'idb-keyval';
import { parseScenario } from '../scenario/schema';
import { describeError } from '../scenario/stored-slot';
import type { Scenario } from '../scenario/types';
import { LARGE_DB, LARGE_OBJECTS } from './large-db';
import type { LargeMarker } from './large-marker';

/**
 * The large store's reading side and its record shape (./large-store.ts has
 * the writing): apart, so the scenario reader worker (scenario-read.worker.ts)
 * reads records without the page's writer code.
 */

let db: UseStore | null = null;
export const open = (): UseStore => (db ??= createStore(LARGE_DB, LARGE_OBJECTS));

/** Columns shorter than this stay plain arrays (not worth a buffer). */
export const PACK_FROM = 1024;

/**
 * Copies list[from, to) into column while the entries are numbers; returns
 * where it stopped (to when all were numbers). A plain indexed loop:
 * Float64Array.from walks the list through its iterator, far slower on 10⁶ numbers.
 */
export function copyNumbers(list: readonly unknown[], column: Float64Array, from: number, to: number): number {
  for (let k = from; k < to; k++) {
    const x = list[k];
    if (typeof x !== 'number') return k;
    column[k] = x;
  }
  return to;
}

/** A deep copy in which every long array of numbers is a Float64Array (exact: both are IEEE doubles). */
export function pack(value: unknown): unknown {
  if (Array.isArray(value)) {
    const list = value as unknown[];
    if (list.length >= PACK_FROM) {
      const column = new Float64Array(list.length);
      if (copyNumbers(list, column, 0, list.length) === list.length) return column;
    }
    return list.map(pack);
  }
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = pack(v);
    return out;
  }
  return value;
}

/** The plain document back from a record: every Float64Array a plain array again. */
export function unpack(value: unknown): unknown {
  // ArrayBuffer.isView, not instanceof: a record's copy may come from another realm (a test's IndexedDB double under jsdom).
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    const column = value as unknown as ArrayLike<number>;
    const list = new Array<number>(column.length);
    for (let k = 0; k < column.length; k++) list[k] = column[k] as number;
    return list;
  }
  if (Array.isArray(value)) return value.map(unpack);
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = unpack(v);
    return out;
  }
  return value;
}

export type LargeRead =
  { readonly ok: true; readonly scenario: Scenario } | { readonly ok: false; readonly message: string };

/** The record a marker names, as stored; or why it cannot be had. Never throws. */
export async function readRecord(
  marker: LargeMarker,
): Promise<{ readonly ok: true; readonly raw: unknown } | { readonly ok: false; readonly message: string }> {
  let raw: unknown;
  try {
    raw = await get(marker.id, open());
  } catch (error) {
    return { ok: false, message: `This browser’s large store could not be read (${describeError(error)}).` };
  }
  if (raw === undefined) {
    return {
      ok: false,
      message: `This browser’s large store holds no record "${marker.id}" (it may have been cleared).`,
    };
  }
  return { ok: true, raw };
}

/** Reads the record a marker names, through the schema. Never throws. */
export async function readLarge(marker: LargeMarker): Promise<LargeRead> {
  const record = await readRecord(marker);
  if (!record.ok) return record;
  const parsed = parseScenario(unpack(record.raw));
  if (parsed.ok) return { ok: true, scenario: parsed.scenario };
  return {
    ok: false,
    message: `The record "${marker.id}" in this browser’s large store is damaged: ${parsed.problems.map((p) => p.message).join(' ')}`,
  };
}

export type LargeText = { readonly ok: true; readonly text: string } | { readonly ok: false; readonly message: string };

/**
 * The record a marker names as a scenario document's text, exactly as it was
 * kept (not read through the schema: a damaged or newer record is given back
 * as it is, for a download). Never throws.
 */
export async function readLargeText(marker: LargeMarker): Promise<LargeText> {
  const record = await readRecord(marker);
  if (!record.ok) return record;
  try {
    return { ok: true, text: JSON.stringify(unpack(record.raw)) };
  } catch (error) {
    return { ok: false, message: `The record "${marker.id}" could not be written out (${describeError(error)}).` };
  }
}
