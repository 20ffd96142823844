import { readIsoDateTime } from '../core';
import { parseScenario, readLargeRef, type LargeLibraryEntry, type Problem } from '../scenario';
import type { Scenario } from '../scenario/types';
import { readLargeMarker, type LargeMarker } from './large-marker';
import type { StorageLike } from './persistence';

/**
 * Set-aside copies: saved data Raincut could not open (damaged, written by a
 * newer version, past the limits this version reads, or the scenario that
 * stopped the screen), kept as it was under a key of its own rather than
 * deleted. Every store of saved data sets aside under "<its key>.damaged.<time>"
 * (persistence.ts, the saved list, the pins); this finds them all, so the
 * saved list can show each one with Restore, Download and Delete.
 */

/** What a copy held, by the key it was set aside from. */
export type SetAsideKind = 'scenario' | 'list' | 'pins' | 'other';

export interface SetAsideCopy {
  readonly key: string;
  readonly kind: SetAsideKind;
  /** When it was set aside (ISO 8601, from the key), or null when the key does not say. */
  readonly setAsideAt: string | null;
  /** Length of the stored text, characters. */
  readonly chars: number;
  /** When the copy is a large-store marker: the record it names (the scenario is there, not in the text). */
  readonly large?: LargeMarker;
}

const MARK = '.damaged.';
const OWN = /^raincut\./;
const STAMP = /^(\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(?:\.\d+)?Z)(?:-\d+)?$/;
const KINDS: Readonly<Record<string, SetAsideKind>> = {
  'raincut.scenario': 'scenario',
  'raincut.library': 'list',
  'raincut.pins': 'pins',
};

/** Whether the storage can list its keys (localStorage can; a bare test double may not). */
function keysOf(storage: StorageLike): string[] | null {
  const { length, key } = storage;
  if (typeof length !== 'number' || typeof key !== 'function') return null;
  const keys: string[] = [];
  for (let i = 0; i < length; i++) {
    const k = key.call(storage, i);
    if (k !== null) keys.push(k);
  }
  return keys;
}

/** The set-aside copies in storage, oldest first; a problem when storage cannot be read. Never throws. */
export function listSetAside(storage: StorageLike): {
  readonly copies: SetAsideCopy[];
  readonly problem: string | null;
} {
  let keys: string[] | null;
  try {
    keys = keysOf(storage);
  } catch (error) {
    return { copies: [], problem: `The set-aside copies could not be listed (${why(error)}).` };
  }
  const copies: SetAsideCopy[] = [];
  for (const key of keys ?? []) {
    const at = key.indexOf(MARK);
    if (at < 0 || !OWN.test(key)) continue;
    let text: string | null;
    try {
      text = storage.getItem(key);
    } catch {
      text = null;
    }
    if (text === null) continue;
    const stamp = STAMP.exec(key.slice(at + MARK.length));
    const large = readLargeMarker(text);
    copies.push({
      key,
      kind: KINDS[key.slice(0, at)] ?? 'other',
      setAsideAt: stamp && readIsoDateTime(stamp[1] as string) !== null ? (stamp[1] as string) : null,
      chars: text.length,
      ...(large ? { large } : {}),
    });
  }
  copies.sort((a, b) => (a.setAsideAt ?? '').localeCompare(b.setAsideAt ?? '') || a.key.localeCompare(b.key));
  return { copies, problem: null };
}

const why = (error: unknown): string => (error instanceof Error ? error.message : String(error));
const isRecord = (x: unknown): x is Record<string, unknown> => x !== null && typeof x === 'object' && !Array.isArray(x);

/** What a copy gives back: the scenarios in it that this version reads, and why the others do not. */
export interface Recovered {
  readonly scenarios: Scenario[];
  /**
   * Entries of a saved list that point into the large store: their scenarios
   * are records there (read by ../store/large-library.ts `openEntry`), not
   * text in the copy.
   */
  readonly pointers: LargeLibraryEntry[];
  readonly problems: Problem[];
}

/**
 * The scenarios held in a set-aside text: a scenario document itself, or the
 * `scenario` of each item in a saved list's `entries` and `deleted` or the
 * pins' `pins`. Each is read through the schema; what does not read is said,
 * by where it stood. A list's entry holding a large-store pointer instead of
 * a scenario is given back as that pointer. Never throws.
 */
export function recoverScenarios(text: string): Recovered {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return {
      scenarios: [],
      pointers: [],
      problems: [{ path: '', message: `The copy is not valid JSON (${why(error)}).` }],
    };
  }
  const found: { where: string; doc: unknown }[] = [];
  const pointers: LargeLibraryEntry[] = [];
  const problems: Problem[] = [];
  if (isRecord(json) && 'version' in json && 'storm' in json) found.push({ where: 'the scenario', doc: json });
  else if (isRecord(json)) {
    for (const list of ['entries', 'deleted', 'pins']) {
      const items = json[list];
      if (!Array.isArray(items)) continue;
      items.forEach((item: unknown, k: number) => {
        if (!isRecord(item)) return;
        const where = `${list}[${k}]`;
        if (!('large' in item)) {
          found.push({ where, doc: item['scenario'] });
          return;
        }
        const ref = readLargeRef(item['large']);
        const { id, savedAt } = item;
        if (typeof ref === 'string') problems.push({ path: where, message: `${where}: ${ref}` });
        else if (typeof id !== 'string' || typeof savedAt !== 'string' || readIsoDateTime(savedAt) === null)
          problems.push({ path: where, message: `${where}: its pointer has no proper id or time saved.` });
        else pointers.push({ id, savedAt, large: ref });
      });
    }
  }
  if (found.length === 0 && pointers.length === 0 && problems.length === 0) {
    return {
      scenarios: [],
      pointers: [],
      problems: [{ path: '', message: 'The copy holds no scenario that can be found.' }],
    };
  }
  const scenarios: Scenario[] = [];
  for (const { where, doc } of found) {
    const read = parseScenario(doc);
    if (read.ok) scenarios.push(read.scenario);
    else problems.push({ path: where, message: `${where}: ${read.problems.map((p) => p.message).join(' ')}` });
  }
  return { scenarios, pointers, problems };
}
