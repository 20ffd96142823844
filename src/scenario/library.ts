import { isLossKind, readIsoDateTime } from '../core';
import { capProblems, describeValue, problem, type Problem } from './problems';
import { parseScenario } from './schema';
import { MAX_NAME_LENGTH } from './text-limits';
import { createStoredSlot, envelopeCodec, type StorageLike } from './stored-slot';
import type { Scenario } from './types';
import type { LossKind } from '../core';

export type { StorageLike } from './stored-slot';

/** A saved scenario. `id` is stable across renames; `savedAt` is ISO 8601 (UTC). */
export interface LibraryEntry {
  readonly id: string;
  readonly savedAt: string;
  readonly scenario: Scenario;
}

/**
 * Where a saved scenario too large for the list's localStorage key is:
 * its numbers are a record in the browser's large store (IndexedDB,
 * src/store/large-store.ts, read by src/store/large-library.ts), and the list
 * holds only this pointer with what the list shows. The record is written
 * before the entry naming it, so an entry always names a whole record; the
 * name here wins over the record's (a rename changes only the entry).
 */
export interface LargeRef {
  /** The record's key in the large store. */
  readonly record: string;
  /** How many numbers its columns hold (src/store/large-marker.ts, `columnNumbers`). */
  readonly numbers: number;
  readonly name: string;
  /** The storm's bars and the loss method, for the list's summary line. */
  readonly bars: number;
  readonly method: LossKind;
}

/** A saved scenario kept in the large store: the list holds its pointer, not its numbers. */
export interface LargeLibraryEntry {
  readonly id: string;
  readonly savedAt: string;
  readonly large: LargeRef;
}

/** An entry of the list, either kind. */
export type SavedEntry = LibraryEntry | LargeLibraryEntry;

/** A deleted scenario kept for undo, with where it stood in the list. */
export type DeletedEntry = SavedEntry & {
  readonly deletedAt: string;
  readonly position: number;
};

/** The scenario's name as the list shows it. */
export const entryName = (entry: SavedEntry): string => ('large' in entry ? entry.large.name : entry.scenario.name);

export interface LibraryListing {
  /** Saved scenarios in the user's order. */
  readonly entries: readonly SavedEntry[];
  /** Deleted scenarios that can be restored, most recently deleted first. */
  readonly deleted: readonly DeletedEntry[];
  /** Storage keys under which damaged saved data was set aside, oldest first. */
  readonly setAside: readonly string[];
  /** False when saving would overwrite data that could not be set aside. */
  readonly canWrite: boolean;
  /** What was found wrong with the stored list on this reading, if anything. */
  readonly problems: readonly Problem[];
}

/**
 * `problems` on success are notices (e.g. damaged data set aside while
 * reading). `freed`: large-store records that no entry (saved or deleted)
 * names after this change, for the caller to delete (records left behind
 * are deleted later by src/store/large-sweep.ts).
 */
export type LibraryResult<T> =
  | {
      readonly ok: true;
      readonly value: T;
      readonly problems: readonly Problem[];
      readonly freed?: readonly string[];
    }
  | { readonly ok: false; readonly problems: readonly Problem[] };

export interface ScenarioLibrary {
  list(): LibraryListing;
  get(id: string): LibraryResult<SavedEntry>;
  /** Saves a new entry, or replaces entry `id` when it is still in the list. */
  save(scenario: Scenario, id?: string): LibraryResult<LibraryEntry>;
  /** As `save`, for a scenario whose record is already written in the large store. */
  saveLarge(ref: LargeRef, id?: string): LibraryResult<LargeLibraryEntry>;
  rename(id: string, name: string): LibraryResult<SavedEntry>;
  /** A copy placed right after the original, named "… (copy)" (a large entry's copy names the same record). */
  duplicate(id: string): LibraryResult<SavedEntry>;
  /** Moves the entry to the deleted list, from which `restore` brings it back. */
  delete(id: string): LibraryResult<DeletedEntry>;
  restore(id: string): LibraryResult<SavedEntry>;
}

export interface LibraryOptions {
  /** Storage key of the list (default LIBRARY_KEY). */
  readonly key?: string;
  /** The clock, for time stamps (default: the system clock). */
  readonly now?: () => Date;
}

export const LIBRARY_KEY = 'raincut.library';
export const LIBRARY_FORMAT_TAG = 'raincut-library';
export const LIBRARY_VERSION = 1;
/** Deleted scenarios kept for undo; older deletions are dropped for good. */
export const MAX_DELETED = 20;

interface State {
  nextId: number;
  entries: SavedEntry[];
  deleted: DeletedEntry[];
  setAside: string[];
}

interface Loaded {
  readonly state: State;
  readonly canWrite: boolean;
  readonly problems: Problem[];
}

const isRecord = (x: unknown): x is Record<string, unknown> => x !== null && typeof x === 'object' && !Array.isArray(x);
const ISO_UTC = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d+)?Z$/;
/** A stamp as toISOString writes it, every field in range (the core's one reader: no 30 February). */
const isUtcStamp = (text: string): boolean => ISO_UTC.test(text) && readIsoDateTime(text) !== null;
const ID = /^s[1-9]\d{0,14}$/;
/** A large-store record's key: letters, digits and . : _ - (src/store/large-library.ts writes "library.<time>.<random>"). */
const RECORD = /^[\w.:-]{1,200}$/;

function emptyState(): State {
  return { nextId: 1, entries: [], deleted: [], setAside: [] };
}

/** Reads one stored entry; its problems are prefixed with where it stood. */
function readEntry(
  raw: unknown,
  where: string,
  deleted: boolean,
  problems: Problem[],
): DeletedEntry | SavedEntry | undefined {
  const fail = (text: string): undefined => {
    problems.push({ path: where, message: `${where}: ${text}` });
    return undefined;
  };
  if (!isRecord(raw)) return fail(`is not a saved scenario (got ${describeValue(raw)}).`);
  const { id, savedAt, scenario } = raw;
  if (typeof id !== 'string' || !ID.test(id)) return fail(`has no proper id (got ${describeValue(id)}).`);
  if (typeof savedAt !== 'string' || !isUtcStamp(savedAt))
    return fail(`has no proper savedAt time (got ${describeValue(savedAt)}).`);
  let entry: SavedEntry;
  if ('large' in raw) {
    const large = readLargeRef(raw['large']);
    if (typeof large === 'string') return fail(`its pointer into this browser’s larger database is damaged: ${large}`);
    entry = { id, savedAt, large };
  } else {
    const parsed = parseScenario(scenario);
    if (!parsed.ok) {
      const name =
        isRecord(scenario) && typeof scenario['name'] === 'string' ? ` "${scenario['name'].slice(0, 60)}"` : '';
      for (const p of parsed.problems) {
        problems.push({
          path: `${where}.scenario${p.path === '' ? '' : `.${p.path}`}`,
          message: `${where}${name}: ${p.message}`,
        });
      }
      return undefined;
    }
    entry = { id, savedAt, scenario: parsed.scenario };
  }
  if (!deleted) return entry;
  const { deletedAt, position } = raw;
  if (typeof deletedAt !== 'string' || !isUtcStamp(deletedAt))
    return fail(`has no proper deletedAt time (got ${describeValue(deletedAt)}).`);
  if (typeof position !== 'number' || !Number.isSafeInteger(position) || position < 0) {
    return fail(`has no proper position (got ${describeValue(position)}).`);
  }
  return { ...entry, deletedAt, position };
}

const isCount = (x: unknown): x is number => typeof x === 'number' && Number.isSafeInteger(x) && x >= 0;

/** A stored pointer into the large store, or what is wrong with it. */
export function readLargeRef(raw: unknown): LargeRef | string {
  if (!isRecord(raw)) return `it is not a pointer (got ${describeValue(raw)}).`;
  const { record, numbers, name, bars, method } = raw;
  if (typeof record !== 'string' || !RECORD.test(record))
    return `it names no proper record (got ${describeValue(record)}).`;
  if (typeof name !== 'string' || name.trim() === '' || name.length > MAX_NAME_LENGTH)
    return `it has no proper name (got ${describeValue(name)}).`;
  if (!isCount(numbers) || !isCount(bars))
    return `its counts are not whole numbers (got ${describeValue(numbers)}, ${describeValue(bars)}).`;
  if (!isLossKind(method)) return `its loss method is not one this version knows (got ${describeValue(method)}).`;
  return { record, numbers, name, bars, method };
}

/** The large-store records the entries name. */
function namedRecords(state: State): Set<string> {
  const names = new Set<string>();
  for (const e of [...state.entries, ...state.deleted]) if ('large' in e) names.add(e.large.record);
  return names;
}

/** Reads the body of a stored list (the envelope already checked): what could be read, and what was left out. */
function readBody(json: Record<string, unknown>): { value: State; damage: Problem[] } | { unreadable: string } {
  if (!Array.isArray(json['entries'])) return { unreadable: 'it has no list of entries' };
  const damage: Problem[] = [];
  const state = emptyState();
  const seen = new Set<string>();
  const take = (list: unknown, name: 'entries' | 'deleted'): void => {
    if (list === undefined && name === 'deleted') return;
    if (!Array.isArray(list)) {
      damage.push(problem(`The ${name} list was not a list (got ${describeValue(list)}).`));
      return;
    }
    list.forEach((raw, i) => {
      const entry = readEntry(raw, `${name}[${i}]`, name === 'deleted', damage);
      if (!entry) return;
      if (seen.has(entry.id)) {
        damage.push({ path: `${name}[${i}].id`, message: `${name}[${i}].id: "${entry.id}" is used twice.` });
        return;
      }
      seen.add(entry.id);
      if (name === 'entries') state.entries.push(entry);
      else state.deleted.push(entry as DeletedEntry);
    });
  };
  take(json['entries'], 'entries');
  take(json['deleted'], 'deleted');
  const setAside = json['setAside'] ?? [];
  if (Array.isArray(setAside) && setAside.every((k) => typeof k === 'string')) state.setAside = [...setAside];
  else damage.push(problem(`The list of set-aside keys was damaged (got ${describeValue(setAside)}).`));

  // Ids are never reused, so the counter must pass every id seen.
  let highest = 0;
  for (const id of seen) highest = Math.max(highest, Number(id.slice(1)));
  const nextId = json['nextId'];
  if (typeof nextId === 'number' && Number.isSafeInteger(nextId) && nextId > highest) state.nextId = nextId;
  else {
    state.nextId = highest + 1;
    if (nextId !== undefined)
      damage.push(
        problem(`The id counter was damaged (got ${describeValue(nextId)}); it now starts after the highest id.`),
      );
  }
  return { value: state, damage };
}

/** The stored list's envelope: { "$format": "raincut-library", "version": 1, nextId, entries, deleted, setAside }. */
const LIBRARY_CODEC = envelopeCodec<State>({
  format: LIBRARY_FORMAT_TAG,
  version: LIBRARY_VERSION,
  noun: 'list of scenarios',
  readBody,
  writeBody: (state) => state,
});

/**
 * The browser's named list of scenarios. Every call reads storage afresh (so
 * two tabs add to one list instead of undoing each other's changes) and
 * writes the whole list in one `setItem`, so a write either happens
 * completely or not at all. Damaged stored data is copied, as it was, to a
 * set-aside key before anything is written over it; if that copy cannot be
 * made, nothing is written at all (the stored-slot rules, ./stored-slot.ts).
 *
 * Two tabs: an entry this list last showed and another tab has changed
 * since (updated, renamed, deleted) is never updated, renamed or deleted
 * here without the user seeing that version first: the call is refused, and
 * the next `list()` shows the other tab's version.
 * Never throws.
 */
export function createScenarioLibrary(storage: StorageLike, options: LibraryOptions = {}): ScenarioLibrary {
  const key = options.key ?? LIBRARY_KEY;
  const now = (): string => (options.now ?? (() => new Date()))().toISOString();
  const slot = createStoredSlot(storage, {
    key,
    codec: LIBRARY_CODEC,
    ...(options.now ? { now: options.now } : {}),
  });
  /** Each entry as this list last showed it (its stored JSON), to tell another tab's change of it. */
  const shown = new Map<string, string>();
  const remember = (entries: readonly SavedEntry[]): void => {
    shown.clear();
    for (const e of entries) shown.set(e.id, JSON.stringify(e));
  };

  /** Writes the list; undefined on success, else the problem. */
  function write(state: State, what: string): Problem | undefined {
    const failed = slot.write(state);
    return failed === null
      ? undefined
      : problem(
          `${what} could not be saved: the browser refused to store the list (${failed}). ` +
            'Nothing saved before was changed; save the scenario as a file to keep it.',
        );
  }

  function load(): Loaded {
    const read = slot.read();
    if (read.kind === 'blocked') {
      return {
        state: emptyState(),
        canWrite: false,
        problems: [problem(`The saved scenarios could not be read from this browser (${read.reason}).`)],
      };
    }
    if (read.kind === 'empty') return { state: emptyState(), canWrite: true, problems: [] };
    if (read.kind === 'ok' && read.damage.length === 0) return { state: read.value, canWrite: true, problems: [] };
    if (read.kind === 'newer') {
      return {
        state: emptyState(),
        canWrite: false,
        problems: [
          problem(
            `The saved scenarios were written by a newer version of Raincut (list version ${read.version}); ` +
              'reload the page to use it. Nothing will be changed here.',
          ),
        ],
      };
    }

    // Damaged: keep an exact copy of what was stored, then carry on with what could be read.
    const state = read.kind === 'ok' ? read.value : emptyState();
    const details = capProblems(
      read.kind === 'ok' ? [...read.damage] : [problem(`The saved list could not be read: ${read.reason}.`)],
    );
    const aside = slot.setAside(read.text);
    if (!aside.ok) {
      return {
        state,
        canWrite: false,
        problems: [
          problem(
            `The saved scenarios are damaged and could not be set aside (${aside.reason}). They are left as they are ` +
              `under "${key}", and nothing will be saved over them.`,
          ),
          ...details,
        ],
      };
    }
    state.setAside = [...state.setAside, aside.key];
    const summary = problem(
      read.kind === 'ok'
        ? `Part of the saved list of scenarios was damaged and is left out (see below). The list as it was is kept under browser storage key "${aside.key}".`
        : `The saved list of scenarios was damaged and could not be read. It is kept as it was under browser storage key "${aside.key}".`,
    );
    const failed = write(state, 'The repaired list');
    return { state, canWrite: true, problems: failed ? [summary, ...details, failed] : [summary, ...details] };
  }

  /**
   * Refuses a change of an entry that another tab changed since this list
   * showed it; undefined when the entry is as shown (or was never shown).
   */
  function changedElsewhere(state: State, id: string, notices: readonly Problem[]): LibraryResult<never> | undefined {
    const seen = shown.get(id);
    if (seen === undefined) return undefined;
    const entry = state.entries.find((e) => e.id === id);
    if (entry && JSON.stringify(entry) === seen) return undefined;
    const name = entryName(JSON.parse(seen) as SavedEntry);
    return {
      ok: false,
      problems: [
        ...notices,
        problem(
          entry
            ? `“${name}” was changed in another tab since this list was shown; nothing was written over it. The list now shows that version.`
            : `“${name}” was deleted in another tab since this list was shown; nothing was written. The list now shows what is saved.`,
        ),
      ],
    };
  }

  function findEntry(state: State, id: string): number {
    return state.entries.findIndex((e) => e.id === id);
  }

  function missing(
    id: string,
    notices: readonly Problem[],
  ): { readonly ok: false; readonly problems: readonly Problem[] } {
    return {
      ok: false,
      problems: [
        ...notices,
        problem(`There is no saved scenario with id ${describeValue(id)}; it may have been deleted in another tab.`),
      ],
    };
  }

  /** Runs a change on a fresh reading and writes it back. */
  function change<T>(what: string, apply: (state: State, notices: Problem[]) => LibraryResult<T>): LibraryResult<T> {
    const loaded = load();
    if (!loaded.canWrite) {
      return {
        ok: false,
        problems: [...loaded.problems, problem(`${what} was not done: the saved list cannot be written safely now.`)],
      };
    }
    const before = namedRecords(loaded.state);
    const result = apply(loaded.state, loaded.problems);
    if (!result.ok) return result;
    const failed = write(loaded.state, what);
    if (failed) return { ok: false, problems: [...loaded.problems, failed] };
    // This list's own write is what it has shown from now on.
    remember(loaded.state.entries);
    const after = namedRecords(loaded.state);
    const freed = [...before].filter((r) => !after.has(r));
    return freed.length > 0 ? { ...result, freed } : result;
  }

  function copyName(state: State, name: string): string {
    const names = new Set(state.entries.map(entryName));
    const base = name.replace(/ \(copy( \d+)?\)$/, '');
    // The copy's name keeps within the cap: the original's is shortened to make room for the suffix.
    const named = (suffix: string): string => `${base.slice(0, MAX_NAME_LENGTH - suffix.length)}${suffix}`;
    let candidate = named(' (copy)');
    for (let n = 2; names.has(candidate); n++) candidate = named(` (copy ${n})`);
    return candidate;
  }

  /** Saves a new entry, or replaces entry `id` when it is still in the list (and was not changed in another tab). */
  function put<E extends SavedEntry>(id: string | undefined, make: (id: string, savedAt: string) => E) {
    return change<E>('The scenario', (state, notices) => {
      const conflict = id === undefined ? undefined : changedElsewhere(state, id, notices);
      if (conflict) return conflict;
      const index = id === undefined ? -1 : findEntry(state, id);
      const entry = make(index >= 0 ? (state.entries[index] as SavedEntry).id : `s${state.nextId++}`, now());
      if (index >= 0) state.entries[index] = entry;
      else state.entries.push(entry);
      return { ok: true, value: entry, problems: notices };
    });
  }

  return {
    list() {
      const { state, canWrite, problems } = load();
      remember(state.entries);
      return { entries: state.entries, deleted: state.deleted, setAside: state.setAside, canWrite, problems };
    },

    get(id) {
      const { state, problems } = load();
      const entry = state.entries.find((e) => e.id === id);
      return entry ? { ok: true, value: entry, problems } : missing(id, problems);
    },

    save(scenario, id) {
      const parsed = parseScenario(scenario);
      if (!parsed.ok) return { ok: false, problems: parsed.problems };
      return put(id, (entryId, savedAt) => ({ id: entryId, savedAt, scenario: parsed.scenario }));
    },

    saveLarge(ref, id) {
      const read = readLargeRef(ref);
      if (typeof read === 'string') return { ok: false, problems: [problem(`The pointer to the scenario: ${read}`)] };
      return put(id, (entryId, savedAt) => ({ id: entryId, savedAt, large: read }));
    },

    rename(id, name) {
      const trimmed = typeof name === 'string' ? name.trim() : '';
      if (trimmed === '')
        return { ok: false, problems: [problem('A saved scenario needs a name; the new name is empty.')] };
      if (trimmed.length > MAX_NAME_LENGTH) {
        return {
          ok: false,
          problems: [
            problem(`The new name has ${trimmed.length} characters; a name may have at most ${MAX_NAME_LENGTH}.`),
          ],
        };
      }
      return change<SavedEntry>('The new name', (state, notices) => {
        const conflict = changedElsewhere(state, id, notices);
        if (conflict) return conflict;
        const index = findEntry(state, id);
        if (index < 0) return missing(id, notices);
        const old = state.entries[index] as SavedEntry;
        const entry: SavedEntry =
          'large' in old
            ? { ...old, large: { ...old.large, name: trimmed } }
            : { ...old, scenario: { ...old.scenario, name: trimmed } };
        state.entries[index] = entry;
        return { ok: true, value: entry, problems: notices };
      });
    },

    duplicate(id) {
      return change<SavedEntry>('The copy', (state, notices) => {
        const index = findEntry(state, id);
        if (index < 0) return missing(id, notices);
        const original = state.entries[index] as SavedEntry;
        const base = { id: `s${state.nextId++}`, savedAt: now() };
        const name = copyName(state, entryName(original));
        const entry: SavedEntry =
          'large' in original
            ? { ...base, large: { ...original.large, name } }
            : { ...base, scenario: { ...original.scenario, name } };
        state.entries.splice(index + 1, 0, entry);
        return { ok: true, value: entry, problems: notices };
      });
    },

    delete(id) {
      return change<DeletedEntry>('The deletion', (state, notices) => {
        const conflict = changedElsewhere(state, id, notices);
        if (conflict) return conflict;
        const index = findEntry(state, id);
        if (index < 0) return missing(id, notices);
        const [entry] = state.entries.splice(index, 1) as [SavedEntry];
        const gone: DeletedEntry = { ...entry, deletedAt: now(), position: index };
        state.deleted = [gone, ...state.deleted].slice(0, MAX_DELETED);
        return { ok: true, value: gone, problems: notices };
      });
    },

    restore(id) {
      return change<SavedEntry>('The restore', (state, notices) => {
        const index = state.deleted.findIndex((e) => e.id === id);
        if (index < 0) {
          return {
            ok: false,
            problems: [...notices, problem(`There is no deleted scenario with id ${describeValue(id)} to restore.`)],
          };
        }
        const [gone] = state.deleted.splice(index, 1) as [DeletedEntry];
        const { deletedAt: _at, position: _position, ...entry } = gone;
        state.entries.splice(Math.min(gone.position, state.entries.length), 0, entry);
        return { ok: true, value: entry, problems: notices };
      });
    },
  };
}
