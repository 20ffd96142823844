import type { LargeLibraryEntry, LibraryResult, SavedEntry, ScenarioLibrary } from '../scenario/library';
import { problem } from '../scenario/problems';
import { scenarioToFileText } from '../scenario/file';
import { parseScenario } from '../scenario/schema';
import type { Scenario } from '../scenario/types';
import { columnNumbers, LARGE_NUMBERS, type LargeMarker } from './large-marker';

/**
 * The saved list's dealings with the large store (./large-store.ts): a
 * scenario too large for the list's localStorage key is kept as a record in
 * the browser's IndexedDB, and the list's entry holds only a pointer to it
 * (`LargeRef`, src/scenario/library.ts). The same write order as the current
 * scenario's: the record first, then the entry naming it, then the record
 * the entry named before is deleted (when no other entry names it). An entry
 * therefore always names a whole record; a record left without an entry (a
 * save stopped half-way, a deletion dropped past the undo list) is deleted
 * later by ./large-sweep.ts. Loaded with the saved list; idb-keyval is
 * fetched only when a large entry is saved or opened.
 */

type LargeModule = typeof import('./large-store');
const loadLarge = (): Promise<LargeModule> => import('./large-store');

const hasLargeStore = (): boolean => typeof indexedDB !== 'undefined';

/** Where an entry's scenario is, in the list's words. */
export const LIST_LARGE_TEXT =
  'It is too large for the browser’s usual storage, so it is kept in this browser’s larger database (IndexedDB) on this computer; save it as a file to keep a copy elsewhere.';

let counter = 0;

/** A new record key for a list entry: its time, then a random part (never reused, so a half-done save replaces nothing). */
function recordKey(now: Date): string {
  return `library.${now.toISOString()}.${(counter++).toString(36)}${Math.random().toString(36).slice(2, 8)}`;
}

/** Deletes records no entry names any more. Never throws. */
export async function dropFreed(freed: readonly string[] | undefined): Promise<void> {
  if (!freed || freed.length === 0) return;
  const large = await loadLarge().catch(() => null);
  if (large) for (const id of freed) await large.dropLarge(id);
}

/**
 * Saves the scenario to the list (as a new entry, or over entry `id`): in
 * the list itself when it fits, else its numbers in the large store and a
 * pointer in the list. The library's two-tab and damaged-data rules apply
 * to the entry as to any other. Never throws.
 */
export async function saveToList(
  library: ScenarioLibrary,
  scenario: Scenario,
  options: { readonly id?: string; readonly now: Date },
): Promise<LibraryResult<SavedEntry>> {
  if (columnNumbers(scenario) <= LARGE_NUMBERS || !hasLargeStore()) {
    const saved = library.save(scenario, options.id);
    // Too large for localStorage after all: the large store takes it.
    const full = !saved.ok && saved.problems.some((p) => /quota/i.test(p.message));
    if (!full || !hasLargeStore()) {
      if (saved.ok) await dropFreed(saved.freed);
      return saved;
    }
  }
  // Read through the one schema first, as `library.save` does: nothing unreadable is ever kept.
  const parsed = parseScenario(scenario);
  if (!parsed.ok) return { ok: false, problems: parsed.problems };
  const record = recordKey(options.now);
  let large: LargeModule;
  try {
    large = await loadLarge();
    // Timed for the browser benchmark (test/browser/storage.spec.mjs): packing in slices, then the IndexedDB write
    // from the large store's writer worker (the page's thread is free meanwhile).
    const t0 = performance.now();
    await large.putScenario(record, parsed.scenario);
    performance.measure('raincut:list-large-save', { start: t0, end: performance.now() });
  } catch (error) {
    return {
      ok: false,
      problems: [
        problem(
          `The scenario could not be saved: it is too large for the browser’s usual storage, and this browser’s larger database (IndexedDB) refused it (${describe(error)}). Nothing saved before was changed; save the scenario as a file to keep it.`,
        ),
      ],
    };
  }
  const s = parsed.scenario;
  const saved = library.saveLarge(
    { record, numbers: columnNumbers(s), name: s.name, bars: s.storm.depthsMm.length, method: s.method.kind },
    options.id,
  );
  // Refused (another tab's change, a list that cannot be written): the new record is no one's.
  if (!saved.ok) await large.dropLarge(record);
  else await dropFreed(saved.freed);
  return saved;
}

const describe = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/** The marker shape the large store reads by. */
const markerOf = (entry: LargeLibraryEntry): LargeMarker => ({
  id: entry.large.record,
  numbers: entry.large.numbers,
  savedAt: entry.savedAt,
});

/** Where a large entry is, for messages: what, and where. */
export const largeWhere = (record: string): string =>
  `kept in this browser’s larger database (IndexedDB) as record “${record}”`;

export type EntryRead =
  { readonly ok: true; readonly scenario: Scenario } | { readonly ok: false; readonly message: string };

/**
 * The entry's scenario: from the list, or read from the large store through
 * the schema (under the entry's name, which a rename changed). A missing or
 * damaged record is said, with where it was to be; never throws.
 */
export async function openEntry(entry: SavedEntry): Promise<EntryRead> {
  if (!('large' in entry)) return { ok: true, scenario: entry.scenario };
  // Read and checked off the page (./open-scenario.ts): 10⁶ bars held the page 1.1 s in one task on the page.
  const read = await import('./open-scenario')
    .then((m) => m.readLargeInSteps(markerOf(entry)))
    .catch((error: unknown) => ({
      ok: false as const,
      message: `The code of this browser’s large store could not be loaded (${describe(error)}).`,
    }));
  if (read.ok) return { ok: true, scenario: { ...read.scenario, name: entry.large.name } };
  return {
    ok: false,
    message: `“${entry.large.name}” is ${largeWhere(entry.large.record)}, and it cannot be opened: ${read.message} The entry stays in the list as it is; delete it if the record is gone for good.`,
  };
}

/**
 * The entry as a scenario file's text, for a download. A large record that
 * no longer reads through the schema is given as it was kept (so it can be
 * repaired), and said so in `note`. Never throws.
 */
export async function entryFileText(
  entry: SavedEntry,
): Promise<
  { readonly ok: true; readonly text: string; readonly note: string } | { readonly ok: false; readonly message: string }
> {
  const opened = await openEntry(entry);
  if (opened.ok) return { ok: true, text: scenarioToFileText(opened.scenario), note: '' };
  if (!('large' in entry)) return opened;
  const raw = await loadLarge()
    .then((large) => large.readLargeText(markerOf(entry)))
    .catch(() => null);
  if (raw?.ok) {
    return {
      ok: true,
      text: raw.text,
      note: ` It does not read as a scenario (${opened.message}), so it is the record exactly as it was kept.`,
    };
  }
  return opened;
}
